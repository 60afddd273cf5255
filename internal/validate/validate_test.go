package validate

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

func TestChecks(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	for _, c := range []struct {
		name string
		err  error
		bad  bool
	}{
		// Positive: 0 < v < +Inf
		{"positive 1", Positive("f", "x", 1.0), false},
		{"positive 0", Positive("f", "x", 0.0), true},
		{"positive -1", Positive("f", "x", -1.0), true},
		{"positive NaN", Positive("f", "x", nan), true},
		{"positive Inf", Positive("f", "x", inf), true},
		// NonNegative: 0 ≤ v < +Inf
		{"nonneg 0", NonNegative("f", "x", 0.0), false},
		{"nonneg -tiny", NonNegative("f", "x", -1e-300), true},
		{"nonneg Inf", NonNegative("f", "x", inf), true},
		// InRange: lo ≤ v ≤ hi, both ends inclusive
		{"range lo", InRange("f", "x", 2.0, 2, 5), false},
		{"range hi", InRange("f", "x", 5.0, 2, 5), false},
		{"range above", InRange("f", "x", 5.0000001, 2, 5), true},
		{"range NaN", InRange("f", "x", nan, 2, 5), true},
		// Above: lo < v < +Inf
		{"above equal", Above("f", "x", 2.0, 2), true},
		{"above", Above("f", "x", 2.5, 2), false},
		// Finite and Result
		{"finite -Inf", Finite("f", "x", math.Inf(-1)), true},
		{"finite 0", Finite("f", "x", 0.0), false},
		{"result NaN", Result("f", "y", nan), true},
	} {
		if (c.err != nil) != c.bad {
			t.Errorf("%s: err = %v, want error %v", c.name, c.err, c.bad)
		}
		if c.err != nil && !errors.Is(c.err, units.ErrRange) {
			t.Errorf("%s: %v does not match units.ErrRange", c.name, c.err)
		}
	}
}

func TestMessageNamesEverything(t *testing.T) {
	err := Positive("fluid.CurveThrough", "v1", -3*units.SquareMillimetrePerSecond)
	want := "fluid.CurveThrough: v1 = -3 mm²/s is out of range: want > 0 and finite"
	if err == nil || err.Error() != want {
		t.Errorf("got %v, want %q", err, want)
	}
	err = InRange("f", "n", 7*units.Bar, 1*units.Bar, 5*units.Bar)
	if err == nil || !strings.Contains(err.Error(), "from 1 bar to 5 bar") {
		t.Errorf("range text missing: %v", err)
	}
}

func TestNoAllocationsWhenValid(t *testing.T) {
	p := 3 * units.Bar
	if n := testing.AllocsPerRun(100, func() { _ = Positive("f", "p", p) }); n != 0 {
		t.Errorf("Positive allocates %v times on a valid value", n)
	}
}
