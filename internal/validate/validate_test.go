package validate_test

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/validate"
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
		{"positive 1", validate.Positive("f", "x", 1.0), false},
		{"positive 0", validate.Positive("f", "x", 0.0), true},
		{"positive -1", validate.Positive("f", "x", -1.0), true},
		{"positive NaN", validate.Positive("f", "x", nan), true},
		{"positive Inf", validate.Positive("f", "x", inf), true},
		// NonNegative: 0 ≤ v < +Inf
		{"nonneg 0", validate.NonNegative("f", "x", 0.0), false},
		{"nonneg -tiny", validate.NonNegative("f", "x", -1e-300), true},
		{"nonneg Inf", validate.NonNegative("f", "x", inf), true},
		// InRange: lo ≤ v ≤ hi, both ends inclusive
		{"range lo", validate.InRange("f", "x", 2.0, 2, 5), false},
		{"range hi", validate.InRange("f", "x", 5.0, 2, 5), false},
		{"range above", validate.InRange("f", "x", 5.0000001, 2, 5), true},
		{"range NaN", validate.InRange("f", "x", nan, 2, 5), true},
		// Above: lo < v < +Inf
		{"above equal", validate.Above("f", "x", 2.0, 2), true},
		{"above", validate.Above("f", "x", 2.5, 2), false},
		// Finite and Result
		{"finite -Inf", validate.Finite("f", "x", math.Inf(-1)), true},
		{"finite 0", validate.Finite("f", "x", 0.0), false},
		{"result NaN", validate.Result("f", "y", nan), true},
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
	err := validate.Positive("fluid.CurveThrough", "v1", -3*units.SquareMillimetrePerSecond)
	want := "fluid.CurveThrough: v1 = -3 mm²/s is out of range: want > 0 and finite"
	if err == nil || err.Error() != want {
		t.Errorf("got %v, want %q", err, want)
	}
	err = validate.InRange("f", "n", 7*units.Bar, 1*units.Bar, 5*units.Bar)
	if err == nil || !strings.Contains(err.Error(), "from 1 bar to 5 bar") {
		t.Errorf("range text missing: %v", err)
	}
}

func TestNoAllocationsWhenValid(t *testing.T) {
	p := 3 * units.Bar
	if n := testing.AllocsPerRun(100, func() { _ = validate.Positive("f", "p", p) }); n != 0 {
		t.Errorf("Positive allocates %v times on a valid value", n)
	}
}

func TestChecked(t *testing.T) {
	if v, err := validate.Checked("pkg.F", "Q", 2.5); v != 2.5 || err != nil {
		t.Errorf("Checked(2.5) = %v, %v", v, err)
	}
	for _, bad := range []float64{math.NaN(), math.Inf(1), math.Inf(-1)} {
		v, err := validate.Checked("pkg.F", "Q", bad)
		var re *units.RangeError
		if v != 0 || !errors.As(err, &re) || re.Param != "Q" || re.Func != "pkg.F" {
			t.Errorf("Checked(%v) = %v, %v; want 0 and a RangeError naming Q", bad, v, err)
		}
	}
}

func TestRenamed(t *testing.T) {
	inner := validate.Positive("pkg.Inner", "strength", 0.0)
	err := validate.Renamed(inner, "pkg.Outer", validate.Fields("Need.", map[string]string{"strength": "Strength"}))
	var re *units.RangeError
	if !errors.As(err, &re) || re.Func != "pkg.Outer" || re.Param != "Strength" || !errors.Is(err, units.ErrRange) {
		t.Errorf("Renamed = %v, want pkg.Outer naming Strength", err)
	}
	if inner.(*units.RangeError).Param != "strength" {
		t.Errorf("Renamed changed the error it was given: %v", inner)
	}
	err = validate.Renamed(validate.Positive("pkg.Inner", "K0", 0.0), "pkg.Outer", validate.Fields("Fluid.", nil))
	if !errors.As(err, &re) || re.Param != "Fluid.K0" {
		t.Errorf("Renamed with a prefix = %v, want Fluid.K0", err)
	}
	other := errors.New("not a range error")
	if validate.Renamed(other, "pkg.Outer", validate.Fields("", nil)) != other || validate.Renamed(nil, "pkg.Outer", nil) != nil {
		t.Error("Renamed changed an error that is not a *RangeError, or nil")
	}
}
