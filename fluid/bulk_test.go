package fluid

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

var testBulk = BulkModel{K0: 1500 * units.Megapascal, M: 10, C: 0.0055, Gamma: 1.15}

// The tangent modulus is K = −V·dp/dV = ρ·dp/dρ (definition). Check it
// against a central difference of the isothermal density at pressure.
// Tolerance 1e-6: the difference quotient's truncation and round-off.
func TestBulkTangentIsDefinition(t *testing.T) {
	f, err := FromDataSheet(DataSheet{Class: HM, V40: mm2s(46), V100: mm2s(6.8), Density15: 870, Expansion: 6.5e-4, Bulk: testBulk})
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []float64{0, 40, 90} {
		for _, pb := range []float64{0, 50, 200, 400} {
			tt, p := celsius(tc), units.Pressure(pb)*units.Bar
			h := units.Pressure(1e4) // 0.1 bar
			r1, _ := f.Density(tt, p-h)
			r2, _ := f.Density(tt, p+h)
			r0, _ := f.Density(tt, p)
			fd := float64(r0) * float64(2*h) / float64(r2-r1)
			k, err := f.BulkModulus(IsothermalTangent, tt, p)
			if err != nil || !checktest.Close(float64(k), fd, 1e-6) {
				t.Errorf("%g °C %g bar: K = %v, ρ·dp/dρ = %g", tc, pb, k, fd)
			}
		}
	}
}

// The secant modulus is K̄ = p·V₀/(V₀ − V) (definition), with V/V₀ from
// integrating dV/V = −dp/K_T numerically (Simpson, 2000 steps), independent
// of the closed-form Murnaghan expression. Tolerance 1e-9.
func TestBulkSecantIsDefinition(t *testing.T) {
	tt := celsius(50)
	for _, pb := range []float64{1, 100, 350, 1000} {
		p := pb * 1e5
		const n = 2000
		sum := 0.0
		for i := 0; i <= n; i++ {
			q := p * float64(i) / n
			kq, _ := testBulk.Modulus(IsothermalTangent, tt, units.Pressure(q))
			w := 2.0
			if i == 0 || i == n {
				w = 1
			} else if i%2 == 1 {
				w = 4
			}
			sum += w / float64(kq)
		}
		ratio := math.Exp(-sum * p / n / 3) // V/V₀
		want := p / (1 - ratio)
		got, err := testBulk.Modulus(IsothermalSecant, tt, units.Pressure(p))
		if err != nil || !checktest.Close(float64(got), want, 1e-9) {
			t.Errorf("%g bar: secant %v, want %g", pb, got, want)
		}
	}
}

// Secant lies between K₀ and the tangent for p > 0, tends to K₀ as p → 0,
// and isentropic = Gamma × isothermal (K_S/K_T = c_p/c_v, an identity).
func TestBulkForms(t *testing.T) {
	tt := celsius(40)
	k0, _ := testBulk.Modulus(IsothermalTangent, tt, 0)
	if k0 != testBulk.K0 {
		t.Errorf("K(40 °C, 0) = %v, want K0", k0)
	}
	s0, _ := testBulk.Modulus(IsothermalSecant, tt, 0)
	s1, _ := testBulk.Modulus(IsothermalSecant, tt, 1)
	if s0 != k0 || !checktest.Close(float64(s1), float64(k0), 1e-8) {
		t.Errorf("secant at 0 and 1 Pa: %v, %v; want → %v", s0, s1, k0)
	}
	for _, pb := range []float64{10, 100, 300} {
		p := units.Pressure(pb) * units.Bar
		kt, _ := testBulk.Modulus(IsothermalTangent, tt, p)
		ks, _ := testBulk.Modulus(IsothermalSecant, tt, p)
		if !(ks > k0 && ks < kt) {
			t.Errorf("%g bar: secant %v not between %v and %v", pb, ks, k0, kt)
		}
		it, _ := testBulk.Modulus(IsentropicTangent, tt, p)
		is, _ := testBulk.Modulus(IsentropicSecant, tt, p)
		if !checktest.Close(float64(it), 1.15*float64(kt), 1e-15) || !checktest.Close(float64(is), 1.15*float64(ks), 1e-15) {
			t.Errorf("%g bar: isentropic %v, %v", pb, it, is)
		}
	}
	hot, _ := testBulk.Modulus(IsothermalTangent, celsius(80), 0)
	if !(hot < k0) {
		t.Errorf("modulus does not fall with temperature: %v at 80 °C", hot)
	}
	// Mineral oil typical preset, isentropic at 40 °C and 0 bar: 1.4–1.8 GPa
	// (common practice).
	f, _ := Typical(HM, VG46)
	k, _ := f.BulkModulus(IsentropicTangent, tt, 0)
	if k < 1400*units.Megapascal || k > 1800*units.Megapascal {
		t.Errorf("HM 46 isentropic modulus %v outside 1.4–1.8 GPa", k)
	}
}

// Effective bulk modulus with air, against the definition K = −V·dp/dV of
// a mixture whose parts follow their own laws: liquid V_l = V_l0·exp(−Δp/B_l),
// air p·Vⁿ = const. The series form (Merritt, from memory) counts the
// liquid compliance over the whole volume and the air share at constant
// liquid volume; both differ from the exact mixture by less than the air
// share times B_l/(n·p) of a percent here. Tolerance 0.5 %.
func TestEffectiveBulkAir(t *testing.T) {
	bl := 1600e6
	for _, air := range []EntrainedAir{{0.01, 1.4}, {0.002, 1}, {0.05, 1.4}} {
		e := EffectiveBulk{Liquid: units.Pressure(bl), Air: air}
		for _, pb := range []float64{2, 10, 50, 200} {
			p := pb*1e5 + 101325
			vol := func(p float64) float64 {
				vl := (1 - air.Fraction) * math.Exp(-(p-101325)/bl)
				va := air.Fraction * math.Pow(101325/p, 1/air.N)
				return vl + va
			}
			h := p * 1e-6
			exact := -vol(p) * 2 * h / (vol(p+h) - vol(p-h))
			got, err := e.At(units.AbsolutePressure(p))
			if err != nil || !checktest.Close(float64(got), exact, 5e-3) {
				t.Errorf("air %+v at %g bar: %v, exact %g", air, pb, got, exact)
			}
		}
	}
	// No air, rigid container: the liquid's modulus exactly.
	e := EffectiveBulk{Liquid: units.Pressure(bl)}
	if got, _ := e.At(units.BarAbsolute * 100); got != units.Pressure(bl) {
		t.Errorf("no air: %v", got)
	}
	// Series springs: 1/Bₑ = 1/B_l + 1/B_c.
	e.Container = 2500 * units.Megapascal
	want := 1 / (1/bl + 1/2500e6)
	if got, _ := e.At(units.BarAbsolute * 100); !checktest.Close(float64(got), want, 1e-15) {
		t.Errorf("container: %v, want %g", got, want)
	}
	// With 0.5 % air at 100 bar and a hose-like container, the result lies in
	// the common-practice effective range 0.7–1.4 GPa.
	e.Air = EntrainedAir{0.005, 1.4}
	got, _ := e.At((100 * units.Bar).Absolute(units.StandardAtmosphere))
	if got < 700*units.Megapascal || got > 1400*units.Megapascal {
		t.Errorf("typical effective modulus %v outside 0.7–1.4 GPa", got)
	}
}

// Thick-walled tube (Lamé) against the thin-wall limit from Barlow's hoop
// stress σ = p·d/(2s): ΔV/V = 2σ/E gives B_c = E·s/d. A 100 mm bore with a
// 0.1 mm wall matches to 0.2 % (Lamé adds terms of order s/d: wall thickness
// and the Poisson term).
func TestTubeBulkModulus(t *testing.T) {
	e := 206000 * units.Megapascal
	got, err := TubeBulkModulus(100*units.Millimetre, 100.2*units.Millimetre, e, 0.3)
	want := float64(e) * 0.1 / 100
	if err != nil || !checktest.Close(float64(got), want, 2e-3) {
		t.Errorf("thin tube: %v, want %g", got, want)
	}
	thick, _ := TubeBulkModulus(10*units.Millimetre, 20*units.Millimetre, e, 0.3)
	thicker, _ := TubeBulkModulus(10*units.Millimetre, 30*units.Millimetre, e, 0.3)
	if !(thicker > thick) {
		t.Errorf("thicker wall not stiffer: %v, %v", thick, thicker)
	}
}

func TestBulkBadInput(t *testing.T) {
	tt := celsius(40)
	_, err := testBulk.Modulus(IsothermalTangent, tt, 3000*units.Bar)
	wantRangeError(t, err, "p")
	_, err = testBulk.Modulus(IsothermalTangent, celsius(250), 0)
	wantRangeError(t, err, "t")
	_, err = testBulk.Modulus(BulkKind(9), tt, 0)
	wantRangeError(t, err, "kind")
	// A model called directly names its own fields.
	_, err = BulkModel{}.Modulus(IsothermalTangent, tt, 0)
	wantRangeError(t, err, "K0")
	bad := testBulk
	bad.Gamma = math.NaN()
	_, err = bad.Modulus(IsentropicTangent, tt, 0)
	wantRangeError(t, err, "Gamma")

	ok := EffectiveBulk{Liquid: 1500 * units.Megapascal, Air: EntrainedAir{0.01, 1.4}}
	p := 50 * units.BarAbsolute
	for _, c := range []struct {
		param string
		e     EffectiveBulk
		p     units.AbsolutePressure
	}{
		{"Liquid", EffectiveBulk{}, p},
		{"Container", EffectiveBulk{Liquid: 1e9, Container: -1}, p},
		{"Air.Fraction", EffectiveBulk{Liquid: 1e9, Air: EntrainedAir{-0.1, 1}}, p},
		{"Air.N", EffectiveBulk{Liquid: 1e9, Air: EntrainedAir{0.01, 2}}, p},
		{"p", ok, 0},
		{"p", ok, units.AbsolutePressure(math.NaN())},
		// A subnormal modulus made 1/Bₑ overflow and Bₑ = 0 with a nil
		// error: a result that must be > 0 and underflows is an error.
		{"Bₑ", EffectiveBulk{Liquid: 5e-324}, p},
		{"Bₑ", EffectiveBulk{Liquid: 1e9, Container: 5e-324}, p},
	} {
		b, err := c.e.At(c.p)
		wantRangeError(t, err, c.param)
		if b != 0 {
			t.Errorf("%+v.At(%v) = %v with an error, want 0", c.e, c.p, b)
		}
	}
	for _, c := range []struct {
		param  string
		di, do units.Length
		e      units.Pressure
		nu     float64
	}{
		{"di", 0, 0.02, 2e11, 0.3}, {"do", 0.02, 0.01, 2e11, 0.3}, {"nu", 0.01, 0.02, 2e11, 0.7},
		{"e", 0.01, 0.02, 0, 0.3},
		// A subnormal E gave B = 0 with a nil error.
		{"B", 0.01, 0.02, 5e-324, 0.3},
	} {
		b, err := TubeBulkModulus(c.di, c.do, c.e, c.nu)
		wantRangeError(t, err, c.param)
		if b != 0 {
			t.Errorf("TubeBulkModulus = %v with an error, want 0", b)
		}
	}
	if got := IsentropicSecant.String(); got != "isentropic secant" {
		t.Errorf("String = %q", got)
	}
}

// BulkModel.Modulus returned a negative tangent modulus (−4.97 bar) with a
// nil error where the linear model K₀(t) + M·p passes through zero: a hot
// fluid with a steep temperature coefficient (C = 0.05/K, 200 °C) under
// suction (−1 bar gauge). The secant form and Fluid.Density returned NaN
// there, caught only as "inputs too extreme". All three now refuse p with
// the model's lower bound.
func TestBulkModelBelowZeroModulus(t *testing.T) {
	m := BulkModel{K0: 1.5 * units.Gigapascal, M: 10, C: 0.05, Gamma: 1.15}
	hot := celsius(200)
	for _, kind := range []BulkKind{IsothermalTangent, IsothermalSecant, IsentropicTangent, IsentropicSecant} {
		k, err := m.Modulus(kind, hot, -1*units.Bar)
		wantRangeError(t, err, "p")
		if k != 0 {
			t.Errorf("%v: K = %v with an error, want 0", kind, k)
		}
	}
	f, err := FromDataSheet(DataSheet{Class: HM, V40: mm2s(46), V100: mm2s(6.8), Density15: 870, Bulk: m})
	if err != nil {
		t.Fatal(err)
	}
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

// TubeBulkModulus failed on diameters whose squares under- or overflow
// (with an error naming the result, not an input), though B_c depends only
// on the diameter ratio. It now uses the ratio: a wall far thicker than
// the bore tends to the shear modulus E/(2(1 + ν)) (Lamé, r_o → ∞).
func TestTubeBulkModulusRatio(t *testing.T) {
	e := 206 * units.Gigapascal
	ref, err := TubeBulkModulus(10*units.Millimetre, 20*units.Millimetre, e, 0.3)
	if err != nil {
		t.Fatal(err)
	}
	// (r_o² + r_i²)/(r_o² − r_i²) = 5/3 at r_o = 2r_i.
	if want := float64(e) / (2 * (5.0/3 + 0.3)); !checktest.Close(float64(ref), want, 1e-15) {
		t.Errorf("B_c = %v, want %g", ref, want)
	}
	tiny, err := TubeBulkModulus(1e-200, 2e-200, e, 0.3)
	if err != nil || !checktest.Close(float64(tiny), float64(ref), 1e-15) {
		t.Errorf("scaled to 1e-200 m: %v, %v; want %v", tiny, err, ref)
	}
	thick, err := TubeBulkModulus(0.01, 1e300, e, 0.3)
	if want := float64(e) / (2 * 1.3); err != nil || !checktest.Close(float64(thick), want, 1e-15) {
		t.Errorf("bore in an unbounded wall: %v, %v; want %g", thick, err, want)
	}
}

// BulkModel.Modulus and TubeBulkModulus returned NaN beside their error;
// a failed call now returns 0, as every other function does. (The
// TubeBulkModulus input, diameters of 1e-200 m, no longer fails at all:
// see TestTubeBulkModulusRatio.)
func TestBulkNaNBesideError(t *testing.T) {
	m := BulkModel{K0: 1, M: 10, C: 0, Gamma: 1.1} // 1 Pa: 1 + M·p/K₀ < 0 at −0.5 bar
	k, err := m.Modulus(IsothermalSecant, celsius(40), -0.5*units.Bar)
	if err == nil || k != 0 {
		t.Errorf("Modulus = %v, %v; want 0 and an error", k, err)
	}
}
