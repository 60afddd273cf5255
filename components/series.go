package components

import (
	"encoding/json"
	"iter"
	"math"
	"slices"
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
)

// Series is an ordered list of standard sizes of one quantity — cylinder
// bores, motor ratings, tube diameters — with a name, the rule it comes from,
// and for each size whether it is a preferred (first-choice) or a
// second-choice value, as ISO 3320 marks its bores.
//
// A Series is immutable and safe for concurrent use; the zero Series is
// empty. Build one with [NewSeries].
type Series[T ~float64] struct {
	name   string
	rule   Rule
	values []T
	second []bool // parallel to values; nil when every value is preferred
}

// NewSeries returns a series of the given sizes, which must be finite,
// > 0 and strictly ascending; second lists the second-choice sizes, each of
// which must be one of sizes. The slices are copied. It fails with an error
// matching units.ErrRange naming the bad size.
func NewSeries[T ~float64](name string, rule Rule, sizes, second []T) (Series[T], error) {
	const fn = "components.NewSeries"
	for i, v := range sizes {
		p := "sizes[" + strconv.Itoa(i) + "]"
		if err := validate.Positive(fn, p, v); err != nil {
			return Series[T]{}, err
		}
		if i > 0 && v <= sizes[i-1] {
			return Series[T]{}, validate.Above(fn, p, v, sizes[i-1])
		}
	}
	s := Series[T]{name: name, rule: rule, values: slices.Clone(sizes)}
	if len(second) > 0 {
		s.second = make([]bool, len(sizes))
	}
	for i, v := range second {
		j, ok := slices.BinarySearch(s.values, v)
		if !ok {
			return Series[T]{}, validate.Fail(fn, "second["+strconv.Itoa(i)+"]", v, "one of sizes")
		}
		s.second[j] = true
	}
	return s, nil
}

// Name returns the series' name: "ISO 3320 cylinder bores".
func (s Series[T]) Name() string { return s.name }

// Rule returns where the series comes from.
func (s Series[T]) Rule() Rule { return s.rule }

// Len returns the number of sizes.
func (s Series[T]) Len() int { return len(s.values) }

// At returns the i-th size, smallest first, and whether it is preferred.
// It returns 0, false when i is out of range.
func (s Series[T]) At(i int) (size T, preferred bool) {
	if i < 0 || i >= len(s.values) {
		return 0, false
	}
	return s.values[i], s.second == nil || !s.second[i]
}

// All iterates over the sizes, smallest first, with whether each is
// preferred.
func (s Series[T]) All() iter.Seq2[T, bool] {
	return func(yield func(T, bool) bool) {
		for i := range s.values {
			if v, p := s.At(i); !yield(v, p) {
				return
			}
		}
	}
}

// Smallest returns the smallest size (0 for an empty series).
func (s Series[T]) Smallest() T {
	v, _ := s.At(0)
	return v
}

// Largest returns the largest size (0 for an empty series).
func (s Series[T]) Largest() T {
	v, _ := s.At(len(s.values) - 1)
	return v
}

// Preferred reports whether v is a size of the series and a preferred one.
func (s Series[T]) Preferred(v T) bool {
	i, ok := slices.BinarySearch(s.values, v)
	return ok && (s.second == nil || !s.second[i])
}

// Contains reports whether v is a size of the series.
func (s Series[T]) Contains(v T) bool {
	_, ok := slices.BinarySearch(s.values, v)
	return ok
}

// PreferredOnly returns the series without its second-choice sizes.
func (s Series[T]) PreferredOnly() Series[T] {
	if s.second == nil {
		return s
	}
	out := Series[T]{name: s.name + " (preferred)", rule: s.rule}
	for v, p := range s.All() {
		if p {
			out.values = append(out.values, v)
		}
	}
	return out
}

// Tolerance is the relative amount by which a requirement may exceed a
// size and still be met by it: 1e-9 (our choice). Binary arithmetic leaves
// 80 L/min for one minute at 80.000000000000014 L, which must select the
// 80 L reservoir, not the next; no engineering requirement is stated to
// nine significant digits. [Series.Next], [Series.Select], [Series.Above],
// [Series.Below], [Series.Floor] and [Choice.OK] all use it.
const Tolerance = 1e-9

// from returns the index of the first size that meets v (≥ v within
// Tolerance), or len(s.values).
func (s Series[T]) from(v T) int {
	i, _ := slices.BinarySearch(s.values, v*(1-Tolerance))
	return i
}

// beyondIndex returns the index of the first size above v by more than
// Tolerance, or len(s.values).
func (s Series[T]) beyondIndex(v T) int {
	i, found := slices.BinarySearch(s.values, v*(1+Tolerance))
	if found {
		i++
	}
	return i
}

// Next returns the smallest size at or above min (within [Tolerance]). It fails with an error
// matching units.ErrRange when min is not finite and > 0, or is above the
// largest size (the error names the largest).
func (s Series[T]) Next(min T) (T, error) {
	const fn = "components.Series.Next"
	if err := validate.Positive(fn, "min", min); err != nil {
		return 0, err
	}
	i := s.from(min)
	if i == len(s.values) {
		return 0, s.beyond(fn, "min", min)
	}
	return s.values[i], nil
}

// Above returns the smallest size strictly above v (the next larger size,
// one step up from a size that failed a check). It fails with an error
// matching units.ErrRange when v is not finite and > 0 or when no size is
// above it (the error names the largest).
func (s Series[T]) Above(v T) (T, error) {
	const fn = "components.Series.Above"
	if err := validate.Positive(fn, "v", v); err != nil {
		return 0, err
	}
	i := s.beyondIndex(v)
	if i == len(s.values) {
		if i == 0 {
			return 0, s.beyond(fn, "v", v)
		}
		return 0, validate.Fail(fn, "v", v, "< "+format(s.Largest())+", the largest of "+s.label())
	}
	return s.values[i], nil
}

// Floor returns the largest size at or below max: the coarsest filter
// rating that is no coarser than required, the largest bore that fits a
// space. It fails with an error matching units.ErrRange when max is not
// finite and > 0 or is below the smallest size (the error names the
// smallest).
func (s Series[T]) Floor(max T) (T, error) {
	const fn = "components.Series.Floor"
	if err := validate.Positive(fn, "max", max); err != nil {
		return 0, err
	}
	i := s.beyondIndex(max)
	if i == 0 {
		return 0, s.beneath(fn, "max", max)
	}
	return s.values[i-1], nil
}

// NextPreferred returns the smallest preferred size at or above min,
// skipping second-choice sizes, without building a new series as
// [Series.PreferredOnly] does. It fails as [Series.Next] does, naming the
// largest preferred size.
func (s Series[T]) NextPreferred(min T) (T, error) {
	const fn = "components.Series.NextPreferred"
	if err := validate.Positive(fn, "min", min); err != nil {
		return 0, err
	}
	if i := s.preferredFrom(min); i < len(s.values) {
		return s.values[i], nil
	}
	return 0, s.beyondPreferred(fn, "min", min)
}

// SelectPreferred returns the choice of the smallest preferred size at or
// above required, skipping second-choice sizes; otherwise it behaves as
// [Series.Select]. The choice names the whole series.
func (s Series[T]) SelectPreferred(required T) (Choice[T], error) {
	const fn = "components.Series.SelectPreferred"
	if err := validate.Positive(fn, "required", required); err != nil {
		return Choice[T]{}, err
	}
	return s.choice(fn, required, s.preferredFrom(required))
}

// choice returns the choice of the i-th size (none when i is past the
// end) for required. It fails when required is so small that the margin
// Chosen/Required − 1 overflows.
func (s Series[T]) choice(fn string, required T, i int) (Choice[T], error) {
	c := Choice[T]{Required: required, Series: s.name, Rule: s.rule}
	if i < len(s.values) {
		c.Chosen = s.values[i]
	}
	if c.Chosen > 0 && math.IsInf(float64(c.Chosen/required), 0) {
		return Choice[T]{}, validate.Fail(fn, "required", required,
			"large enough that the margin "+format(c.Chosen)+"/required is finite")
	}
	return c, nil
}

// Sizes returns a fresh copy of the sizes, smallest first.
func (s Series[T]) Sizes() []T { return slices.Clone(s.values) }

// preferredFrom returns the index of the first preferred size ≥ v, or
// len(s.values).
func (s Series[T]) preferredFrom(v T) int {
	i := s.from(v)
	for i < len(s.values) && s.second != nil && s.second[i] {
		i++
	}
	return i
}

// Below returns the largest size strictly below v (the next smaller
// size). It fails with an error matching units.ErrRange when v is not finite
// and > 0 or when no size is below it.
func (s Series[T]) Below(v T) (T, error) {
	const fn = "components.Series.Below"
	if err := validate.Positive(fn, "v", v); err != nil {
		return 0, err
	}
	i := s.from(v)
	if i == 0 {
		return 0, validate.Fail(fn, "v", v, "> "+format(s.Smallest())+", the smallest of "+s.label())
	}
	return s.values[i-1], nil
}

// Nearest returns the size closest to v on a ratio scale (standard series
// are geometric), the larger on a tie. It fails with an error matching
// units.ErrRange when v is not finite and > 0 or the series is empty.
func (s Series[T]) Nearest(v T) (T, error) {
	const fn = "components.Series.Nearest"
	if err := validate.Positive(fn, "v", v); err != nil {
		return 0, err
	}
	if len(s.values) == 0 {
		return 0, s.beyond(fn, "v", v)
	}
	i, _ := slices.BinarySearch(s.values, v)
	switch {
	case i == 0:
		return s.values[0], nil
	case i == len(s.values):
		return s.values[i-1], nil
	}
	lo, hi := s.values[i-1], s.values[i]
	if math.Log(float64(v/lo)) < math.Log(float64(hi/v)) {
		return lo, nil
	}
	return hi, nil
}

// Select returns the choice of the smallest size at or above required. A
// requirement above the largest size is not an error: the choice comes back
// with Chosen 0 and OK false, for the caller to report as a finding. It
// fails with an error matching units.ErrRange only when required is not
// finite and > 0, or so small (a denormal) that the margin overflows.
func (s Series[T]) Select(required T) (Choice[T], error) {
	const fn = "components.Series.Select"
	if err := validate.Positive(fn, "required", required); err != nil {
		return Choice[T]{}, err
	}
	return s.choice(fn, required, s.from(required))
}

func (s Series[T]) label() string {
	if s.name == "" {
		return "the series"
	}
	return s.name
}

func (s Series[T]) beyond(fn, param string, v T) error {
	if len(s.values) == 0 {
		return validate.Fail(fn, param, v, "a size of a non-empty series")
	}
	return validate.Fail(fn, param, v, "≤ "+format(s.Largest())+", the largest of "+s.label())
}

func (s Series[T]) beneath(fn, param string, v T) error {
	if len(s.values) == 0 {
		return validate.Fail(fn, param, v, "a size of a non-empty series")
	}
	return validate.Fail(fn, param, v, "≥ "+format(s.Smallest())+", the smallest of "+s.label())
}

func (s Series[T]) beyondPreferred(fn, param string, v T) error {
	for i := len(s.values) - 1; i >= 0; i-- {
		if top, p := s.At(i); p {
			return validate.Fail(fn, param, v, "≤ "+format(top)+", the largest preferred size of "+s.label())
		}
	}
	return validate.Fail(fn, param, v, "a size of a series with preferred sizes")
}

// fixed builds one of this package's own tables. It skips the checks of
// NewSeries, which a test applies to every table instead, so that building
// a table at start-up can neither fail nor panic.
func fixed[T ~float64](name string, rule Rule, sizes, second []T) Series[T] {
	s := Series[T]{name: name, rule: rule, values: sizes}
	if len(second) > 0 {
		s.second = make([]bool, len(sizes))
		for _, v := range second {
			if j, ok := slices.BinarySearch(sizes, v); ok {
				s.second[j] = true
			}
		}
	}
	return s
}

type seriesJSON[T ~float64] struct {
	Name   string `json:"name"`
	Rule   Rule   `json:"rule"`
	Sizes  []T    `json:"sizes"`
	Second []T    `json:"second,omitempty"`
}

// MarshalJSON writes {"name","rule","sizes","second"}: every size smallest
// first, and the second-choice sizes again under "second" (left out when
// there are none).
func (s Series[T]) MarshalJSON() ([]byte, error) {
	j := seriesJSON[T]{Name: s.name, Rule: s.rule, Sizes: s.values}
	if j.Sizes == nil {
		j.Sizes = []T{}
	}
	for v, p := range s.All() {
		if !p {
			j.Second = append(j.Second, v)
		}
	}
	return json.Marshal(j)
}

// UnmarshalJSON reads the form MarshalJSON writes — a caller's own catalog
// series, say — with the checks of [NewSeries].
func (s *Series[T]) UnmarshalJSON(b []byte) error {
	var j seriesJSON[T]
	if err := decodeJSON("components.Series.UnmarshalJSON", b, &j); err != nil {
		return err
	}
	v, err := NewSeries(j.Name, j.Rule, j.Sizes, j.Second)
	if err != nil {
		return err
	}
	*s = v
	return nil
}

// format writes v with its unit when T has a String method.
func format[T ~float64](v T) string {
	if st, ok := any(v).(interface{ String() string }); ok {
		return st.String()
	}
	return strconv.FormatFloat(float64(v), 'g', -1, 64)
}

// Choice is a standard size picked for a computed requirement: the
// required value, the chosen size (0 when no size of the series meets it),
// the series' name and its rule. The margin and the verdict are computed.
type Choice[T ~float64] struct {
	Required T
	Chosen   T
	Series   string
	Rule     Rule
}

// OK reports whether a size was chosen that meets the requirement.
// A size within [Tolerance] below the requirement meets it.
func (c Choice[T]) OK() bool { return c.Chosen > 0 && c.Chosen >= c.Required*(1-Tolerance) }

// Margin returns Chosen/Required − 1, the fraction the chosen size is above
// the requirement (0.12 for 12 %), or 0 when nothing was chosen or the
// requirement is 0.
func (c Choice[T]) Margin() float64 {
	if c.Chosen == 0 || c.Required == 0 {
		return 0
	}
	m := float64(c.Chosen/c.Required) - 1
	if m < 0 && c.OK() {
		return 0 // within Tolerance: the size meets the requirement exactly
	}
	return m
}

type choiceJSON[T ~float64] struct {
	Required T       `json:"required"`
	Chosen   T       `json:"chosen"`
	Series   string  `json:"series"`
	Margin   float64 `json:"margin"`
	OK       bool    `json:"ok"`
	Rule     Rule    `json:"rule"`
}

// MarshalJSON writes {"required","chosen","series","margin","ok","rule"}.
// It fails with a *units.RangeError naming Required, Chosen or Margin when
// one is not finite, which JSON cannot hold.
func (c Choice[T]) MarshalJSON() ([]byte, error) {
	const fn = "components.Choice.MarshalJSON"
	margin := c.Margin()
	if err := finiteFields(fn, "Required", c.Required, "Chosen", c.Chosen, "Margin", margin); err != nil {
		return nil, err
	}
	return json.Marshal(choiceJSON[T]{c.Required, c.Chosen, c.Series, margin, c.OK(), c.Rule})
}

// UnmarshalJSON reads the form MarshalJSON writes; margin and ok are
// recomputed, not read.
func (c *Choice[T]) UnmarshalJSON(b []byte) error {
	var j choiceJSON[T]
	if err := decodeJSON("components.Choice.UnmarshalJSON", b, &j); err != nil {
		return err
	}
	*c = Choice[T]{Required: j.Required, Chosen: j.Chosen, Series: j.Series, Rule: j.Rule}
	return nil
}
