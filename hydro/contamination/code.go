package contamination

import (
	"fmt"
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ErrOrder reports cumulative counts or scale numbers that grow with particle
// size: a count at ≥6 µm(c) includes every particle at ≥14 µm(c), so c4 ≥ c6
// ≥ c14 must hold. ErrOrder matches units.ErrRange, and the errors that
// carry it (except ParseCode's) are *units.RangeError values naming the
// number that grows.
var ErrOrder error = validate.Sentinel("cumulative counts grow with particle size")

// FewCounted is the raw count below which ISO 4406 marks a scale number with
// "≥": fewer than 20 particles counted in that size range (ISO 4406:2021).
const FewCounted = 20

// Form tells which sizes a code reports.
type Form uint8

const (
	// NoForm is the zero Form: no code at all (the zero Code).
	NoForm Form = iota
	// Counter is the three-number code of an automatic particle counter
	// calibrated per ISO 11171: cumulative counts at ≥4, ≥6 and ≥14 µm(c).
	Counter
	// Microscope is the two-number code of microscope counting (ISO 4407):
	// cumulative counts at ≥5 and ≥15 µm.
	Microscope
)

// Len returns how many numbers a code of form f has: 3 (Counter), 2
// (Microscope) or 0 (NoForm or an unknown form).
func (f Form) Len() int {
	switch f {
	case Counter:
		return 3
	case Microscope:
		return 2
	}
	return 0
}

var sizeLabels = [2][3]string{
	{"≥4 µm(c)", "≥6 µm(c)", "≥14 µm(c)"},
	{"≥5 µm", "≥15 µm", ""},
}

// SizeLabel names the size that number i of a code of form f counts, e.g.
// "≥14 µm(c)"; it returns "" when i is out of range.
func (f Form) SizeLabel(i int) string {
	if i < 0 || i >= f.Len() {
		return ""
	}
	return sizeLabels[f-Counter][i]
}

// String returns "counter", "microscope" or "no code".
func (f Form) String() string {
	switch f {
	case NoForm:
		return "no code"
	case Counter:
		return "counter"
	case Microscope:
		return "microscope"
	}
	return fmt.Sprintf("Form(%d)", uint8(f))
}

// Mark qualifies one number of a code.
type Mark uint8

const (
	// MarkNone: a plain scale number, e.g. "16".
	MarkNone Mark = iota
	// MarkNotMeasured: the size was not measured, written "-" (e.g.
	// -/16/13). Recalled from ISO 4406 practice (from memory).
	MarkNotMeasured
	// MarkFewCounted: fewer than 20 particles were counted in the size
	// range, written "≥" before the number (e.g. 14/12/≥7); the true number
	// may be higher. ISO 4406:2021.
	MarkFewCounted
	// MarkAbove: more than 2 500 000 particles per mL, above the table,
	// written ">28". Recalled from ISO 4406 practice (from memory).
	MarkAbove
	// MarkTooMany: too many particles to count (for example a microscope
	// membrane covered), written "*". Recalled from ISO 4406 practice
	// (from memory), not confirmed in the text.
	MarkTooMany
)

// Number is one number of a code: a scale number and its mark.
//
// Normal form: Scale is 0…28; for MarkAbove it is 28; for MarkNotMeasured
// and MarkTooMany it is 0. Constructors and ParseCode return numbers in
// normal form, so codes compare with ==.
type Number struct {
	Scale int
	Mark  Mark
}

// rank orders numbers by the count they stand for: MarkAbove is 29 and
// MarkTooMany 30. It returns −1 for MarkNotMeasured.
func (n Number) rank() int {
	switch n.Mark {
	case MarkNotMeasured:
		return -1
	case MarkAbove:
		return AboveTable
	case MarkTooMany:
		return AboveTable + 1
	}
	return n.Scale
}

// valid reports whether n is in normal form.
func (n Number) valid() bool {
	switch n.Mark {
	case MarkNone, MarkFewCounted:
		return n.Scale >= 0 && n.Scale <= MaxScale
	case MarkAbove:
		return n.Scale == MaxScale
	case MarkNotMeasured, MarkTooMany:
		return n.Scale == 0
	}
	return false
}

// numberFor codes a checked count per mL; few marks it "≥".
func numberFor(perML float64, few bool) Number {
	s := scale(perML)
	if s == AboveTable {
		return Number{Scale: MaxScale, Mark: MarkAbove}
	}
	if few {
		return Number{Scale: s, Mark: MarkFewCounted}
	}
	return Number{Scale: s}
}

// Code is an ISO 4406 solid-contamination code: three numbers for the
// cumulative counts per mL at ≥4/≥6/≥14 µm(c) (Counter form), or two numbers
// for ≥5/≥15 µm (Microscope form; N[2] is unused and zero).
//
// The zero Code (form NoForm) is no code at all: a sample field left unset.
// It fails Validate, so Compare refuses it and an unset sample can never
// pass a target; String writes "", MarshalText writes "" (so it travels in
// JSON as ""), and UnmarshalText reads "" back as the zero Code. IsZero
// reports it. The clean code 0/0/0 is CodeFromCounts(0, 0, 0). Build codes with CodeFromCounts,
// CodeFromSample, MakeCode or ParseCode; a Code put together by hand should be
// checked with Validate.
type Code struct {
	Form Form
	N    [3]Number
}

// Len returns the number of numbers in c: 3, 2, or 0 for the zero Code.
func (c Code) Len() int { return c.Form.Len() }

// IsZero reports whether c is the zero Code, which stands for no code.
func (c Code) IsZero() bool { return c == Code{} }

// Validate checks that c is well formed: a known form, numbers in normal
// form, N[2] zero in the microscope form, at least one size measured, and
// numbers that do not grow with particle size. The error is a
// *units.RangeError naming the field (Form, N[1], …) and matches
// units.ErrRange (and ErrOrder for the last rule).
func (c Code) Validate() error { return c.validate("contamination.Code.Validate", "") }

// validate is Validate for function fn, naming the fields prefix+field
// ("target.N[1]" when the code is a caller's argument target).
func (c Code) validate(fn, prefix string) error {
	if c.Form != Counter && c.Form != Microscope {
		return validate.Fail(fn, prefix+"Form", float64(c.Form), "Counter or Microscope (the zero Code is no code)")
	}
	if c.Form == Microscope && c.N[2] != (Number{}) {
		return numberError(fn, prefix, 2, c.N[2], "zero (Number{}) in the microscope form")
	}
	measured := false
	for i := range c.Len() {
		if !c.N[i].valid() {
			return numberError(fn, prefix, i, c.N[i], "a number in normal form (scale 0…28; 28 with MarkAbove; 0 with MarkNotMeasured or MarkTooMany)")
		}
		measured = measured || c.N[i].Mark != MarkNotMeasured
	}
	if !measured {
		return &units.RangeError{Func: fn, Param: prefix + "N", Value: c.String(), Valid: "at least one size measured"}
	}
	if i, j, ok := c.ordered(); !ok {
		return c.orderError(fn, fmt.Sprintf("%sN[%d]", prefix, i), fmt.Sprintf("%sN[%d]", prefix, j), i, j)
	}
	return nil
}

// numberError reports number i of a code, shown with its mark, that is not
// what valid asks for.
func numberError(fn, prefix string, i int, n Number, valid string) error {
	return &units.RangeError{Func: fn, Param: fmt.Sprintf("%sN[%d]", prefix, i),
		Value: fmt.Sprintf("Number{Scale: %d, Mark: %d}", n.Scale, n.Mark), Valid: valid}
}

// ordered reports whether the measured numbers of c do not grow with size;
// when they do, small and large are the first offending pair of sizes.
func (c *Code) ordered() (small, large int, ok bool) {
	prev, at := -1, 0
	for j := range c.Len() {
		r := c.N[j].rank()
		if r < 0 {
			continue
		}
		if prev >= 0 && r > prev {
			return at, j, false
		}
		prev, at = r, j
	}
	return 0, 0, true
}

// orderError reports numbers i and j of c that grow with size; pi and pj
// name them as the caller's parameters. The error names pj, the number at
// the larger size, and asks for at most the number pi: "n6 = 16 (≥6 µm(c))
// is out of range: want ≤ n4 = 13 (≥4 µm(c))".
func (c Code) orderError(fn, pi, pj string, i, j int) error {
	return orderError(fn, pi, pj, c.N[i].String(), c.N[j].String(), c.Form.SizeLabel(i), c.Form.SizeLabel(j))
}

// orderError reports value vj of parameter pj (at size labelled sj) above
// value vi of pi (at the smaller size si): a *units.RangeError for pj that
// also matches ErrOrder.
func orderError(fn, pi, pj, vi, vj, si, sj string) error {
	return validate.Kind(&units.RangeError{Func: fn, Param: pj, Value: vj + " (" + sj + ")",
		Valid: "≤ " + pi + " = " + vi + " (" + si + ")"}, ErrOrder)
}

// MakeCode returns the counter code n4/n6/n14 (≥4/≥6/≥14 µm(c)) of plain
// scale numbers. Each must be 0…28 and n4 ≥ n6 ≥ n14; otherwise the code is
// the zero Code and the error matches units.ErrRange (and ErrOrder for the
// ordering).
func MakeCode(n4, n6, n14 int) (Code, error) {
	c := Code{Form: Counter, N: [3]Number{{Scale: n4}, {Scale: n6}, {Scale: n14}}}
	if err := c.checkPlain("contamination.MakeCode", "n4", "n6", "n14"); err != nil {
		return Code{}, err
	}
	return c, nil
}

// MakeMicroscopeCode returns the microscope code n5/n15 (≥5/≥15 µm) of plain
// scale numbers, with the rules and errors of MakeCode.
func MakeMicroscopeCode(n5, n15 int) (Code, error) {
	c := Code{Form: Microscope, N: [3]Number{{Scale: n5}, {Scale: n15}}}
	if err := c.checkPlain("contamination.MakeMicroscopeCode", "n5", "n15", ""); err != nil {
		return Code{}, err
	}
	return c, nil
}

// checkPlain validates the plain numbers of a code built by MakeCode.
func (c Code) checkPlain(fn string, names ...string) error {
	for i := range c.Len() {
		if s := c.N[i].Scale; s < 0 || s > MaxScale {
			return validate.Fail(fn, names[i], float64(s), "a scale number from 0 to 28")
		}
	}
	if i, j, ok := c.ordered(); !ok {
		return c.orderError(fn, names[i], names[j], i, j)
	}
	return nil
}

// CodeFromCounts returns the counter code for cumulative counts per mL at
// ≥4, ≥6 and ≥14 µm(c), each number from ScaleNumber (ISO 4406:2021,
// Table 1); counts above 2 500 000 per mL give ">28". No number carries the
// "≥" mark, since the raw counts are not known: use CodeFromSample for that.
//
// Each count must be finite and ≥ 0 (units.ErrRange) and c4 ≥ c6 ≥ c14
// (ErrOrder, which also matches units.ErrRange). CodeFromCounts does not
// allocate unless it fails.
func CodeFromCounts(c4, c6, c14 float64) (Code, error) {
	const fn = "contamination.CodeFromCounts"
	if err := checkCounts(fn, "c4", "c6", "c14", c4, c6, c14); err != nil {
		return Code{}, err
	}
	return Code{Form: Counter, N: [3]Number{numberFor(c4, false), numberFor(c6, false), numberFor(c14, false)}}, nil
}

// MicroscopeCodeFromCounts returns the microscope code for cumulative counts
// per mL at ≥5 and ≥15 µm, with the rules of CodeFromCounts.
func MicroscopeCodeFromCounts(c5, c15 float64) (Code, error) {
	const fn = "contamination.MicroscopeCodeFromCounts"
	if err := checkCounts(fn, "c5", "c15", "", c5, c15, 0); err != nil {
		return Code{}, err
	}
	return Code{Form: Microscope, N: [3]Number{numberFor(c5, false), numberFor(c15, false)}}, nil
}

// checkCounts checks three cumulative counts (the third may be a zero
// placeholder with an empty name): finite, ≥ 0, not growing with size.
func checkCounts(fn, nA, nB, nC string, a, b, c float64) error {
	if a >= b && b >= c && c >= 0 && a <= math.MaxFloat64 { // all finite, ≥ 0, in order (NaN fails)
		return nil
	}
	if err := validate.NonNegative(fn, nA, a); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, nB, b); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, nC, c); err != nil {
		return err
	}
	if a < b {
		return countOrderError(fn, nA, nB, a, b)
	}
	if b < c {
		return countOrderError(fn, nB, nC, b, c)
	}
	return nil
}

// countOrderError reports count b of parameter nb above count a of na.
func countOrderError(fn, na, nb string, a, b float64) error {
	return validate.Kind(validate.Fail(fn, nb, b, "≤ "+na+" = "+strconv.FormatFloat(a, 'g', -1, 64)), ErrOrder)
}

// CodeFromSample returns the counter code for raw cumulative counts n4, n6,
// n14 (particles counted at ≥4/≥6/≥14 µm(c)) in a sample of the given
// volume: each count is divided by the volume in mL and coded as in
// CodeFromCounts, and a number whose raw count is below 20 is marked "≥"
// (MarkFewCounted; ISO 4406:2021) unless it is above the table.
//
// Take samples per ISO 4021 through a sampling valve, never by cracking a
// pressurised fitting: a pinhole jet can inject oil through the skin, and
// hot oil burns.
//
// Raw counts are float64 so that averaged counts of several runs can be
// given. They must be finite and ≥ 0 and must not grow with size; sample must
// be finite and > 0. Errors match units.ErrRange (and ErrOrder).
func CodeFromSample(n4, n6, n14 float64, sample units.Volume) (Code, error) {
	const fn = "contamination.CodeFromSample"
	if err := checkCounts(fn, "n4", "n6", "n14", n4, n6, n14); err != nil {
		return Code{}, err
	}
	ml, err := sampleML(fn, sample)
	if err != nil {
		return Code{}, err
	}
	return Code{Form: Counter, N: [3]Number{
		numberFor(n4/ml, n4 < FewCounted),
		numberFor(n6/ml, n6 < FewCounted),
		numberFor(n14/ml, n14 < FewCounted),
	}}, nil
}

// MicroscopeCodeFromSample returns the microscope code for raw counts at ≥5
// and ≥15 µm in a sample of the given volume, with the rules of
// CodeFromSample.
func MicroscopeCodeFromSample(n5, n15 float64, sample units.Volume) (Code, error) {
	const fn = "contamination.MicroscopeCodeFromSample"
	if err := checkCounts(fn, "n5", "n15", "", n5, n15, 0); err != nil {
		return Code{}, err
	}
	ml, err := sampleML(fn, sample)
	if err != nil {
		return Code{}, err
	}
	return Code{Form: Microscope, N: [3]Number{
		numberFor(n5/ml, n5 < FewCounted),
		numberFor(n15/ml, n15 < FewCounted),
	}}, nil
}

// sampleML checks a sample volume and returns it in mL. A volume so small
// that a count per mL overflows gives +Inf per mL, which codes as ">28".
func sampleML(fn string, sample units.Volume) (float64, error) {
	if err := validate.Positive(fn, "sample", sample); err != nil {
		return 0, err
	}
	return sample.Millilitres(), nil
}
