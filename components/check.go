package components

import (
	"encoding/json"
	"fmt"

	"github.com/hydrosize/hydrosize/internal/enum"
	"github.com/hydrosize/hydrosize/internal/validate"
)

// Bound says which side of a [Check]'s limit passes.
type Bound uint8

// Bounds.
const (
	AtMost  Bound = iota // the value passes when it is at or below the limit (a velocity, a temperature)
	AtLeast              // the value passes when it is at or above the limit (a safety factor, an inlet pressure)
)

var boundNames = [...]string{"at most", "at least"}

// String returns "at most" or "at least".
func (b Bound) String() string {
	if int(b) < len(boundNames) {
		return boundNames[b]
	}
	return fmt.Sprintf("Bound(%d)", uint8(b))
}

// MarshalText writes "at most" or "at least".
func (b Bound) MarshalText() ([]byte, error) {
	return enum.Marshal("components.Bound.MarshalText", b, boundNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (b *Bound) UnmarshalText(t []byte) error {
	return enum.Unmarshal("components.Bound.UnmarshalText", t, b, boundNames[:])
}

// Check holds a computed value against a limit: the value, the limit,
// which side passes, and the rule the limit comes from. The ratio and the
// verdict are computed from these, so a Check cannot contradict itself.
//
// A failed check is a result, not an error: the family that returns it adds
// a finding where failing can hurt someone.
type Check[T ~float64] struct {
	Value T     // the computed value
	Limit T     // the limit it is held against
	Bound Bound // which side of Limit passes
	Rule  Rule  // where Limit comes from
}

// Within returns a check that passes when value ≤ limit.
func Within[T ~float64](value, limit T, rule Rule) Check[T] {
	return Check[T]{Value: value, Limit: limit, Bound: AtMost, Rule: rule}
}

// Reaches returns a check that passes when value ≥ limit.
func Reaches[T ~float64](value, limit T, rule Rule) Check[T] {
	return Check[T]{Value: value, Limit: limit, Bound: AtLeast, Rule: rule}
}

// OK reports whether the value passes: Value ≤ Limit for [AtMost],
// Value ≥ Limit for [AtLeast]. A NaN value or limit never passes.
func (c Check[T]) OK() bool {
	if c.Bound == AtLeast {
		return c.Value >= c.Limit
	}
	return c.Value <= c.Limit
}

// Ratio returns Value/Limit: at most 1 passes an [AtMost] check, at least 1
// an [AtLeast] one. It returns 0 when Limit is 0 (no finite ratio exists).
func (c Check[T]) Ratio() float64 {
	if c.Limit == 0 {
		return 0
	}
	return float64(c.Value / c.Limit)
}

// checkJSON is the stable JSON form of a check.
type checkJSON[T ~float64] struct {
	Value T       `json:"value"`
	Limit T       `json:"limit"`
	Bound Bound   `json:"bound"`
	Ratio float64 `json:"ratio"`
	OK    bool    `json:"ok"`
	Rule  Rule    `json:"rule"`
}

// MarshalJSON writes {"value","limit","bound","ratio","ok","rule"}; the
// quantities are written by their own MarshalText (a unit string). It fails
// with a *units.RangeError naming Value, Limit or Ratio when one is not
// finite, which JSON cannot hold.
func (c Check[T]) MarshalJSON() ([]byte, error) {
	const fn = "components.Check.MarshalJSON"
	ratio := c.Ratio()
	if err := finiteFields(fn, "Value", c.Value, "Limit", c.Limit, "Ratio", ratio); err != nil {
		return nil, err
	}
	return json.Marshal(checkJSON[T]{c.Value, c.Limit, c.Bound, ratio, c.OK(), c.Rule})
}

// finiteFields checks that the two quantities and the derived ratio a JSON
// form writes are finite, naming the first that is not.
func finiteFields[T ~float64](fn, na string, a T, nb string, b T, nr string, r float64) error {
	if err := validate.Finite(fn, na, a); err != nil {
		return err
	}
	if err := validate.Finite(fn, nb, b); err != nil {
		return err
	}
	return validate.Result(fn, nr, r)
}

// UnmarshalJSON reads the form MarshalJSON writes; ratio and ok are
// recomputed, not read.
func (c *Check[T]) UnmarshalJSON(b []byte) error {
	var j checkJSON[T]
	if err := decodeJSON("components.Check.UnmarshalJSON", b, &j); err != nil {
		return err
	}
	*c = Check[T]{Value: j.Value, Limit: j.Limit, Bound: j.Bound, Rule: j.Rule}
	return nil
}
