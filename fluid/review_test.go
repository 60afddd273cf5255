package fluid

import (
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// Regression tests for defects found in review; each case reproduces the
// input that failed before the fix.

// CurveThrough accepted a point at 1.5·10⁻³⁶ K and built a curve whose hot
// end was +Inf (Range returned +Inf and At clamped any hot temperature to
// MinViscosity). It now refuses such points, as NewCurve does.
func TestRegressionCurveThroughInfiniteRange(t *testing.T) {
	c, err := CurveThrough(241.29372034961386, 0.0943627383523415, 1.5014914489624588e-36, 1.9535889052799391)
	wantRangeError(t, err, "t2")
	if c != (Curve{}) {
		t.Errorf("curve = %+v with an error, want the zero Curve", c)
	}
}

// Fluid.Density and Fluid.DynamicViscosity returned +Inf with a nil error
// for a Density15 near the float64 limit (an exported field a caller may
// set).
func TestRegressionDensityOverflow(t *testing.T) {
	f, err := Typical(HM, VG46)
	if err != nil {
		t.Fatal(err)
	}
	f.Density15, f.Expansion = 1.79e308, 1e-5
	tt, p := units.Temperature(450.7727617364997), units.Pressure(1.2572436254431003e+08)
	if rho, err := f.Density(tt, p); err == nil || rho != 0 {
		t.Errorf("Density = %v, %v; want 0 and an error", rho, err)
	} else {
		wantRangeError(t, err, "density")
	}
	if mu, err := f.DynamicViscosity(tt, p); err == nil || mu != 0 {
		t.Errorf("DynamicViscosity = %v, %v; want 0 and an error", mu, err)
	}
}

// BulkModel.Modulus and TubeBulkModulus returned NaN beside their error;
// a failed call now returns 0, as every other function does. (The
// TubeBulkModulus input, diameters of 1e-200 m, no longer fails at all:
// see TestAuditTubeBulkModulusRatio.)
func TestRegressionNaNBesideError(t *testing.T) {
	m := BulkModel{K0: 1, M: 10, C: 0, Gamma: 1.1} // 1 Pa: 1 + M·p/K₀ < 0 at −0.5 bar
	k, err := m.Modulus(IsothermalSecant, celsius(40), -0.5*units.Bar)
	if err == nil || k != 0 {
		t.Errorf("Modulus = %v, %v; want 0 and an error", k, err)
	}
}

// GradeOf put the upper limit of nine grades in the gap above them when the
// viscosity was written in m²/s: 50.6e-6 m²/s is 50.60000000000001 mm²/s in
// float64. ISO 3448:1992, Table 1: limits are midpoint ± 10 % and belong to
// the grade [S] (CHECKS.md).
func TestRegressionGradeLimitsInSI(t *testing.T) {
	for _, r := range iso3448 {
		for _, x := range []float64{r.min, r.max} {
			for _, v := range []units.KinematicViscosity{
				units.KinematicViscosity(x * 1e-6),
				units.KinematicViscosity(x / 1e6),
				units.KinematicViscosity(x) * units.Centistokes,
			} {
				if g, err := GradeOf(v); g != r.g || err != nil {
					t.Errorf("GradeOf(%v m²/s) = %v, %v; want %v", float64(v), g, err, r.g)
				}
			}
		}
	}
	// Just outside a limit (1 part in 10⁹) is still in the gap.
	for _, v := range []float64{35.2 * (1 + 1e-9), 41.4 * (1 - 1e-9)} {
		if g, err := GradeOf(units.KinematicViscosity(v) * units.SquareMillimetrePerSecond); !errors.Is(err, ErrNoGrade) {
			t.Errorf("GradeOf(%v mm²/s) = %v, %v; want ErrNoGrade", v, g, err)
		}
	}
}
