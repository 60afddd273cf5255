package fluid

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// Density: ρ(15 °C, 0) is the data-sheet figure; thermal expansion follows
// its definition ρ₁₅/ρ(t) − 1 = α·(t − 15 °C); mineral oil at 40 °C lies in
// 850–900 kg/m³ (common practice).
func TestDensity(t *testing.T) {
	f, _ := Typical(HM, VG46)
	r15, _ := f.Density(celsius(15), 0)
	if r15 != f.Density15() {
		t.Errorf("ρ(15 °C) = %v, want %v", r15, f.Density15())
	}
	r60, _ := f.Density(celsius(60), 0)
	if got := float64(f.Density15()/r60) - 1; !checktest.Close(got, f.Expansion()*45, 1e-12) {
		t.Errorf("expansion ratio %g, want %g", got, f.Expansion()*45)
	}
	r40, _ := f.Density(celsius(40), 0)
	if r40 < 850 || r40 > 900 {
		t.Errorf("ρ(40 °C) = %v outside 850–900", r40)
	}
	rp, _ := f.Density(celsius(40), 350*units.Bar)
	if !(rp > r40) || !(float64(rp/r40) < 1.03) {
		t.Errorf("ρ at 350 bar = %v vs %v", rp, r40)
	}
	mu, _ := f.DynamicViscosity(celsius(40), 0)
	if !checktest.Close(float64(mu), float64(f.V40())*float64(r40), 1e-12) { // ν from the curve: round-off
		t.Errorf("μ = %v, want ν·ρ", mu)
	}
}

// Cragoe's correlation in its printed US form [from memory] against the SI
// restatement c = (1.6848 + 0.003391·t)/√sg kJ/(kg·K), k = 0.11717/sg·(1 −
// 0.00054·t) W/(m·K): agreement to 1e-4 checks the unit conversions (BTU_IT,
// lb, °F exact per NIST SP 811). Mineral oil at 40 °C: c within 1.8–2.0
// kJ/(kg·K) (common practice).
func TestCragoe(t *testing.T) {
	for _, sg := range []float64{0.85, 0.88} {
		for _, tc := range []float64{0, 40, 100} {
			c, err := CragoeSpecificHeat(sg, celsius(tc))
			want := (1.6848 + 0.003391*tc) / math.Sqrt(sg) * 1e3
			if err != nil || !checktest.Close(float64(c), want, 1e-4) {
				t.Errorf("c(%g, %g °C) = %v, want %g", sg, tc, c, want)
			}
			k, _ := CragoeConductivity(sg, celsius(tc))
			wantK := 0.11717 / sg * (1 - 0.00054*tc)
			if !checktest.Close(float64(k), wantK, 1e-4) {
				t.Errorf("k(%g, %g °C) = %v, want %g", sg, tc, k, wantK)
			}
		}
	}
	f, _ := Typical(HM, VG46)
	c, _ := f.SpecificHeat(celsius(40))
	c80, _ := f.SpecificHeat(celsius(80))
	k, _ := f.ThermalConductivity(celsius(40))
	direct, _ := CragoeSpecificHeat(float64(f.Density15())/999.0, celsius(80))
	if c < 1800 || c > 2000 || !checktest.Close(float64(c80), float64(direct), 1e-12) || k < 0.12 || k > 0.14 {
		t.Errorf("HM 46: c %v, c80 %v (Cragoe %v), k %v", c, c80, direct, k)
	}
}

func TestFluidBadInput(t *testing.T) {
	f, _ := Typical(HM, VG46)
	_, err := f.Density(celsius(-80), 0)
	wantRangeError(t, err, "t")
	_, err = f.Density(celsius(40), units.Pressure(math.Inf(1)))
	wantRangeError(t, err, "p")
	_, err = f.SpecificHeat(units.Temperature(math.NaN()))
	wantRangeError(t, err, "t")
	_, err = f.ThermalConductivity(celsius(300))
	wantRangeError(t, err, "t")
	_, err = f.DynamicViscosity(celsius(-40), 0)
	wantRangeError(t, err, "t")
	_, err = Fluid{}.Density(celsius(40), 0)
	wantRangeError(t, err, "Density15")
	_, err = CragoeSpecificHeat(2, celsius(40))
	wantRangeError(t, err, "sg")
	g := f                 // a model FromDataSheet would refuse, set inside the package
	g.thermal.CSlope = -50 // c < 0 at 200 °C
	_, err = g.SpecificHeat(celsius(200))
	wantRangeError(t, err, "c")
	_, err = Fluid{}.BulkModulus(IsothermalTangent, celsius(40), 0)
	wantRangeError(t, err, "Bulk.K0")
	if HEES.String() != "HEES" || Class(99).String() != "Class(invalid)" {
		t.Error("Class.String")
	}
}

// TestFluidErrorsNameTheMethod: a Fluid method that hands its work to
// another function (Viscosity to Curve.At, Grade to GradeOf, VI to
// ViscosityIndex) reports its own name and the fluid's field, so a caller
// reads the function it called.
func TestFluidErrorsNameTheMethod(t *testing.T) {
	f, _ := Typical(HM, VG46)
	between, err := FromDataSheet(DataSheet{Class: HM, V40: 40 * units.Centistokes, VI: 100, Density15: 870})
	if err != nil {
		t.Fatal(err)
	}
	thin, err := FromDataSheet(DataSheet{Class: HM, V40: 3 * units.Centistokes, V100: 1.2 * units.Centistokes, Density15: 800})
	if err != nil {
		t.Fatal(err)
	}
	for _, c := range []struct {
		fn, param string
		err       error
	}{
		{"fluid.Fluid.Viscosity", "t", second(f.Viscosity(celsius(1500)))},
		{"fluid.Fluid.Viscosity", "curve", second(Fluid{}.Viscosity(celsius(40)))},
		{"fluid.Fluid.DynamicViscosity", "t", second(f.DynamicViscosity(celsius(1500), 0))},
		{"fluid.Fluid.DynamicViscosity", "t", second(f.DynamicViscosity(celsius(-45), 0))}, // below the pour point
		{"fluid.Fluid.DynamicViscosity", "p", second(f.DynamicViscosity(celsius(40), -2*units.Bar))},
		{"fluid.Fluid.Grade", "V40", second(between.Grade())},
		{"fluid.Fluid.Grade", "V40", second(Fluid{}.Grade())},
		{"fluid.Fluid.VI", "V100", second(thin.VI())},
		{"fluid.Fluid.VI", "V40", second(Fluid{}.VI())},
		{"fluid.Fluid.SpecificHeat", "Thermal.C40", second(Fluid{}.SpecificHeat(celsius(40)))},
		{"fluid.Fluid.ThermalConductivity", "Thermal.K40", second(Fluid{}.ThermalConductivity(celsius(40)))},
		{"fluid.CurveFromVI", "v40", second(CurveFromVI(1*units.Centistokes, 100))},
		{"fluid.CurveFromVI", "vi", second(CurveFromVI(46*units.Centistokes, 1e6))},
	} {
		checktest.RangeErrorIn(t, c.err, c.fn, c.param)
	}
	if _, err := between.Grade(); !errors.Is(err, ErrNoGrade) {
		t.Errorf("Grade of a fluid between grades: %v does not match ErrNoGrade", err)
	}
}

func second[T any](_ T, err error) error { return err }
