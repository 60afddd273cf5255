package fluid

import (
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// Regression tests for defects found in the acceptance audit of the
// package; each case reproduces an input that failed before the fix.

// ViscosityIndex took any finite v40: 10³⁰⁰ mm²/s overflowed the D2270
// quadratics and the error named the result ("VI = +Inf … inputs too
// extreme") instead of the input and its range. v40 is now bounded by
// MaxViscosity, as everywhere else in the package.
func TestAuditViscosityIndexHugeV40(t *testing.T) {
	for _, u := range []units.KinematicViscosity{mm2s(1e300), units.KinematicViscosity(math.MaxFloat64), up(MaxViscosity)} {
		vi, err := ViscosityIndex(u, mm2s(3))
		wantRangeError(t, err, "v40")
		if vi != 0 {
			t.Errorf("VI = %g with an error, want 0", vi)
		}
	}
	// The bound itself is accepted, with a finite VI.
	if vi, err := ViscosityIndex(MaxViscosity, down(MaxViscosity)); err != nil || math.IsInf(vi, 0) || math.IsNaN(vi) {
		t.Errorf("VI at the bound = %v, %v", vi, err)
	}
}

// BulkModel.Modulus returned a negative tangent modulus (−4.97 bar) with a
// nil error where the linear model K₀(t) + M·p passes through zero: a hot
// fluid with a steep temperature coefficient (C = 0.05/K, 200 °C) under
// suction (−1 bar gauge). The secant form and Fluid.Density returned NaN
// there, caught only as "inputs too extreme". All three now refuse p with
// the model's lower bound.
func TestAuditBulkModelBelowZeroModulus(t *testing.T) {
	m := BulkModel{K0: 1.5 * units.Gigapascal, M: 10, C: 0.05, Gamma: 1.15}
	hot := celsius(200)
	for _, kind := range []BulkKind{IsothermalTangent, IsothermalSecant, IsentropicTangent, IsentropicSecant} {
		k, err := m.Modulus(kind, hot, -1*units.Bar)
		wantRangeError(t, err, "p")
		if k != 0 {
			t.Errorf("%v: K = %v with an error, want 0", kind, k)
		}
	}
	f, _ := Typical(HM, VG46)
	f.Bulk = m
	rho, err := f.Density(hot, -1*units.Bar)
	wantRangeError(t, err, "p")
	if rho != 0 {
		t.Errorf("ρ = %v with an error, want 0", rho)
	}
	// Just inside the model's bound the modulus is positive.
	limit := -float64(m.K0) * math.Exp(-m.C*160) / m.M
	k, err := m.Modulus(IsothermalTangent, hot, units.Pressure(0.99*limit))
	if err != nil || !(k > 0) {
		t.Errorf("inside the bound: K = %v, %v", k, err)
	}
}

// V100ForVI at v40 just above 2 mm²/s reported an inverted valid range
// ("from 6601.67 to 6601.43") and refused every VI: there the VI is not
// increasing in Y (it is in the thousands, far beyond real oils). The span
// is now reported low to high, and a VI inside it is solved.
func TestAuditV100ForVINearLowestY(t *testing.T) {
	u := mm2s(2.0002)
	lo, hi := viOf(2.0002, 2), viOf(2.0002, 2.0002*(1-1e-9))
	want := (lo + hi) / 2
	y, err := V100ForVI(u, want)
	if err != nil {
		t.Fatalf("V100ForVI(2.0002, %g): %v", want, err)
	}
	if got, _ := ViscosityIndex(u, y); math.Abs(got-want) > 1e-9*want {
		t.Errorf("VI(2.0002, %v) = %.12g, want %.12g", y, got, want)
	}
	_, err = V100ForVI(u, 100)
	wantRangeError(t, err, "vi")
	if !strings.Contains(err.Error(), "from 6601.4") {
		t.Errorf("span not low to high: %v", err)
	}
}

// TubeBulkModulus failed on diameters whose squares under- or overflow
// (with an error naming the result, not an input), though B_c depends only
// on the diameter ratio. It now uses the ratio: a wall far thicker than
// the bore tends to the shear modulus E/(2(1 + ν)) (Lamé, r_o → ∞).
func TestAuditTubeBulkModulusRatio(t *testing.T) {
	e := 206 * units.Gigapascal
	ref, err := TubeBulkModulus(10*units.Millimetre, 20*units.Millimetre, e, 0.3)
	if err != nil {
		t.Fatal(err)
	}
	// (r_o² + r_i²)/(r_o² − r_i²) = 5/3 at r_o = 2r_i.
	if want := float64(e) / (2 * (5.0/3 + 0.3)); !near(float64(ref), want, 1e-15) {
		t.Errorf("B_c = %v, want %g", ref, want)
	}
	tiny, err := TubeBulkModulus(1e-200, 2e-200, e, 0.3)
	if err != nil || !near(float64(tiny), float64(ref), 1e-15) {
		t.Errorf("scaled to 1e-200 m: %v, %v; want %v", tiny, err, ref)
	}
	thick, err := TubeBulkModulus(0.01, 1e300, e, 0.3)
	if want := float64(e) / (2 * 1.3); err != nil || !near(float64(thick), want, 1e-15) {
		t.Errorf("bore in an unbounded wall: %v, %v; want %g", thick, err, want)
	}
}

// FromDataSheet passed V40 and V100 straight to CurveThrough, so its errors
// named "v1", "v2" or "t2" of fluid.CurveThrough, not the data-sheet fields.
func TestAuditFromDataSheetNamesFields(t *testing.T) {
	for _, c := range []struct {
		param string
		d     DataSheet
	}{
		{"V40", DataSheet{Class: HM, V40: 0, V100: mm2s(6), Density15: 870}},
		{"V40", DataSheet{Class: HM, V40: mm2s(3e7), V100: mm2s(6), Density15: 870}},
		{"V100", DataSheet{Class: HM, V40: mm2s(32), V100: mm2s(40), Density15: 870}},
		{"V100", DataSheet{Class: HM, V40: mm2s(32), V100: mm2s(-1), Density15: 870}},
		{"V100", DataSheet{Class: HM, V40: mm2s(46), V100: mm2s(46 * (1 - 1e-12)), Density15: 870}},
	} {
		f, err := FromDataSheet(c.d)
		wantRangeError(t, err, c.param)
		if !strings.Contains(err.Error(), "fluid.FromDataSheet") {
			t.Errorf("error %q does not name fluid.FromDataSheet", err)
		}
		if f != (Fluid{}) {
			t.Errorf("fluid %+v with an error", f)
		}
	}
}

// ISO 3448 designates a grade "ISO VG 46"; ParseGrade read that form but
// nothing wrote it.
func TestAuditGradeDesignation(t *testing.T) {
	for _, g := range Grades() {
		s := g.Designation()
		if s != "ISO "+g.String() {
			t.Errorf("%v: Designation %q", g, s)
		}
		if back, err := ParseGrade(s); err != nil || back != g {
			t.Errorf("ParseGrade(%q) = %v, %v", s, back, err)
		}
	}
	if s := Grade(47).Designation(); s != "Grade(47)" {
		t.Errorf("invalid grade: %q", s)
	}
}

// CurveFromVI passed the 100 °C viscosity of a VI near the top of its span
// (VG 46 at VI 743, where ν100 is within a hair of ν40) to CurveThrough,
// whose error named "t2 = 100 °C", not the caller's vi.
func TestAuditCurveFromVINamesVI(t *testing.T) {
	c, err := CurveFromVI(mm2s(46), 743)
	wantRangeError(t, err, "vi")
	if !strings.Contains(err.Error(), "fluid.CurveFromVI") {
		t.Errorf("error %q does not name fluid.CurveFromVI", err)
	}
	if c != (Curve{}) {
		t.Errorf("curve %+v with an error", c)
	}
}
