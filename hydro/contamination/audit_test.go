package contamination

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// Regressions from the acceptance audit of the package. Each test failed
// before its fix.

// TestOrderErrorsNameNumbers: an ordering error names the parameters and
// the numbers that grow with size, not only the sizes.
func TestOrderErrorsNameNumbers(t *testing.T) {
	_, errMake := MakeCode(13, 16, 18)
	_, errMicro := MakeMicroscopeCode(10, 11)
	cases := []struct {
		name string
		err  error
		want []string
	}{
		{"MakeCode", errMake, []string{"contamination.MakeCode", "n4 = 13", "n6 = 16", "want n4 ≥ n6"}},
		{"MakeMicroscopeCode", errMicro, []string{"n5 = 10", "n15 = 11", "want n5 ≥ n15"}},
		{"Validate", counter(num(10), num(12), num(1)).Validate(), []string{"contamination.Code.Validate", "N[0] = 10", "N[1] = 12"}},
		{"Validate marks", counter(num(28), above28, num(1)).Validate(), []string{"N[0] = 28", "N[1] = >28"}},
		{"Validate across -", counter(num(10), notMeasured, num(12)).Validate(), []string{"N[0] = 10", "N[2] = 12"}},
	}
	for _, c := range cases {
		if !errors.Is(c.err, ErrOrder) || !errors.Is(c.err, units.ErrRange) {
			t.Errorf("%s: err = %v, want ErrOrder and units.ErrRange", c.name, c.err)
			continue
		}
		for _, w := range c.want {
			if !strings.Contains(c.err.Error(), w) {
				t.Errorf("%s: %q does not contain %q", c.name, c.err, w)
			}
		}
	}
}

// TestBadNumberErrorsShowMark: a number refused for its mark is shown with
// its mark, not as a bare scale that looks valid.
func TestBadNumberErrorsShowMark(t *testing.T) {
	for _, c := range []Code{
		micro(num(10), num(2)).with(2, Number{Mark: MarkAbove}),
		counter(Number{Scale: 3, Mark: MarkNotMeasured}, num(1), num(1)),
	} {
		err := c.Validate()
		if !errors.Is(err, units.ErrRange) || !strings.Contains(err.Error(), "Mark:") {
			t.Errorf("%#v.Validate() = %v; want an error that shows the mark", c, err)
		}
	}
}

func (c Code) with(i int, n Number) Code { c.N[i] = n; return c }

// TestZeroCodeRangeError: the zero Code has no numbers; the error says so
// instead of asking for an index "from 0 to -1".
func TestZeroCodeRangeError(t *testing.T) {
	_, _, err := Code{}.Range(0)
	if !errors.Is(err, units.ErrRange) || strings.Contains(err.Error(), "-1") || !strings.Contains(err.Error(), "zero Code") {
		t.Errorf("Code{}.Range(0): err = %v; want an error naming the zero Code", err)
	}
}

// TestUnknownComponentWithBase: RecommendTarget documents an error for an
// unknown component; a caller base code for it must not let it through.
func TestUnknownComponentWithBase(t *testing.T) {
	base := counter(num(18), num(16), num(13))
	in := TargetInput{Components: []Component{componentCount + 3}, Pressure: 100 * units.Bar,
		Bases: map[Component]Code{componentCount + 3: base}}
	if tg, err := RecommendTarget(in); !errors.Is(err, units.ErrRange) {
		t.Errorf("unknown component with a base: %+v, %v; want units.ErrRange", tg, err)
	}
}

// TestNegativeZeroCount: a count of −0 is a count of zero; the count per mL
// is +0, not "-0".
func TestNegativeZeroCount(t *testing.T) {
	negZero := math.Copysign(0, -1)
	for name, f := range map[string]func(float64, units.Volume) (float64, error){"PerML": PerML, "Per100mL": Per100mL} {
		if v, err := f(negZero, units.Millilitre); err != nil || v != 0 || math.Signbit(v) {
			t.Errorf("%s(-0, 1 mL) = %g, %v; want +0", name, v, err)
		}
	}
}

// TestParseCodeReplacementChar: U+FFFD written correctly is valid UTF-8; it
// is refused as "want a scale number", and only broken bytes as invalid
// UTF-8.
func TestParseCodeReplacementChar(t *testing.T) {
	for _, c := range []struct{ in, detail string }{
		{"18/16/\uFFFD", "want a scale number"},
		{"18/16/\xff", "invalid UTF-8"},
	} {
		_, err := ParseCode(c.in)
		var pe *units.ParseError
		if !errors.As(err, &pe) || pe.Detail != c.detail || !errors.Is(err, units.ErrSyntax) {
			t.Errorf("ParseCode(%q): err = %v; want detail %q", c.in, err, c.detail)
		}
	}
}

// TestTargetNeedsPressure: an unset (zero) working pressure fell in the low
// band and gave a target one class dirtier; like the zero Code, an unset
// field must not loosen a target.
func TestTargetNeedsPressure(t *testing.T) {
	in := TargetInput{Components: []Component{ServoValve}}
	if tg, err := RecommendTarget(in); !errors.Is(err, units.ErrRange) || !strings.Contains(err.Error(), "Pressure") {
		t.Errorf("RecommendTarget without a pressure = %v, %v; want an error naming Pressure", tg.Code, err)
	}
}

// TestCountOrderErrorsGiveRange: an ordering error on counts says what is
// wanted, as the errors on codes do.
func TestCountOrderErrorsGiveRange(t *testing.T) {
	_, e1 := CodeFromCounts(10, 20, 1)
	_, e2 := CodeFromSample(10, 5, 6, units.Millilitre)
	_, e3 := MicroscopeCodeFromCounts(1, 2)
	for _, c := range []struct {
		err  error
		want string
	}{{e1, "c4 = 10 < c6 = 20; want c4 ≥ c6"}, {e2, "n6 = 5 < n14 = 6; want n6 ≥ n14"}, {e3, "c5 = 1 < c15 = 2; want c5 ≥ c15"}} {
		if !errors.Is(c.err, ErrOrder) || !strings.Contains(c.err.Error(), c.want) {
			t.Errorf("err = %v; want ErrOrder and %q", c.err, c.want)
		}
	}
}
