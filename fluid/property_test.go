package fluid

import (
	"fmt"
	"math"
	"math/rand/v2"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// The property tests below call every exported function and method that
// takes numbers with wide random inputs (seeded, so a failure reproduces):
// special values, extremes of float64, random magnitudes of either sign, and
// values near the physical ranges. They check the package promise in doc.go:
// no panic, and never a NaN or ±Inf result with a nil error.

// propertyRuns is the number of random draws per function.
const propertyRuns = 4000

// specials are the float64 values most likely to break arithmetic.
var specials = []float64{
	0, math.Copysign(0, -1), 1, -1, math.NaN(), math.Inf(1), math.Inf(-1),
	math.MaxFloat64, -math.MaxFloat64, math.SmallestNonzeroFloat64, -math.SmallestNonzeroFloat64,
	0x1p-1022, 1e-300, 1e300, -1e300, 1e-12, 1e12,
}

// wide draws a float64: a special value, a random magnitude 10^±310 of
// either sign, or a value log-uniform in [lo, hi] (the plausible range),
// sometimes nudged by an ulp so that limits are hit from both sides.
func wide(r *rand.Rand, lo, hi float64) float64 {
	switch r.IntN(8) {
	case 0:
		return specials[r.IntN(len(specials))]
	case 1, 2:
		v := math.Pow(10, r.Float64()*620-310)
		if r.IntN(2) == 0 {
			v = -v
		}
		return v
	case 3:
		v := []float64{lo, hi}[r.IntN(2)]
		return math.Nextafter(v, []float64{math.Inf(1), math.Inf(-1), v}[r.IntN(3)])
	default:
		if lo > 0 {
			return lo * math.Pow(hi/lo, r.Float64())
		}
		return lo + (hi-lo)*r.Float64()
	}
}

// Plausible ranges, SI.
func wideT(r *rand.Rand) units.Temperature { return units.Temperature(wide(r, 150, 600)) }
func wideNu(r *rand.Rand) units.KinematicViscosity {
	return units.KinematicViscosity(wide(r, 1e-7, 30))
}
func wideP(r *rand.Rand) units.Pressure { return units.Pressure(wide(r, -2e5, 3e8)) }

// finite fails the test when err is nil and any of vs is NaN or ±Inf, or
// when err is not nil and any of vs is not zero (a failed call returns
// zero values, never a half-computed number).
func finite(t *testing.T, what string, err error, vs ...float64) {
	t.Helper()
	if err != nil {
		for _, v := range vs {
			if v != 0 {
				t.Fatalf("%s = %v with error %v: want zero values", what, vs, err)
			}
		}
		return
	}
	for _, v := range vs {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("%s = %v with nil error", what, vs)
		}
	}
}

// noPanic runs f and fails the test, naming what, if it panics.
func noPanic(t *testing.T, what string, f func()) {
	t.Helper()
	defer func() {
		if p := recover(); p != nil {
			t.Fatalf("%s panicked: %v", what, p)
		}
	}()
	f()
}

func TestPropertyCurve(t *testing.T) {
	r := rand.New(rand.NewPCG(1, 2))
	built := 0
	for range propertyRuns {
		t1, v1, t2, v2 := wideT(r), wideNu(r), wideT(r), wideNu(r)
		what := fmt.Sprintf("CurveThrough(%v, %v, %v, %v)", float64(t1), float64(v1), float64(t2), float64(v2))
		var c Curve
		var err error
		noPanic(t, what, func() { c, err = CurveThrough(t1, v1, t2, v2) })
		if err != nil {
			continue
		}
		built++
		checkCurve(t, r, what, c)
	}
	if built < propertyRuns/20 {
		t.Fatalf("only %d of %d random curves built: the draw misses the valid range", built, propertyRuns)
	}
	for range propertyRuns {
		a, b := wide(r, 5, 15), wide(r, 1, 6)
		what := fmt.Sprintf("NewCurve(%v, %v)", a, b)
		var c Curve
		var err error
		noPanic(t, what, func() { c, err = NewCurve(a, b) })
		if err == nil {
			checkCurve(t, r, what, c)
		}
	}
	for range propertyRuns {
		v40, vi := wideNu(r), wide(r, -50, 350)
		what := fmt.Sprintf("CurveFromVI(%v, %v)", float64(v40), vi)
		var c Curve
		var err error
		noPanic(t, what, func() { c, err = CurveFromVI(v40, vi) })
		if err == nil {
			checkCurve(t, r, what, c)
		}
	}
	checkCurve(t, r, "Curve{}", Curve{})
}

// checkCurve exercises the methods of one curve with random input.
func checkCurve(t *testing.T, r *rand.Rand, what string, c Curve) {
	t.Helper()
	lo, hi := c.Range()
	if c.b > 0 {
		finite(t, what+".A, B, Range", nil, c.A(), c.B(), float64(lo), float64(hi))
		if !(lo > 0 && hi > lo) {
			t.Fatalf("%s.Range() = %v, %v: want 0 < cold < hot", what, lo, hi)
		}
	}
	for range 8 {
		tt := wideT(r)
		if r.IntN(2) == 0 && hi > lo {
			tt = lo + units.Temperature(r.Float64())*(hi-lo)
		}
		var v units.KinematicViscosity
		var err error
		noPanic(t, what+".At", func() { v, err = c.At(tt) })
		finite(t, fmt.Sprintf("%s.At(%v)", what, float64(tt)), err, float64(v))
		if err == nil && !(v >= MinViscosity && v <= MaxViscosity) {
			t.Fatalf("%s.At(%v) = %v outside the D341 limits", what, float64(tt), v)
		}
		nu := wideNu(r)
		var tf units.Temperature
		noPanic(t, what+".TemperatureFor", func() { tf, err = c.TemperatureFor(nu) })
		finite(t, fmt.Sprintf("%s.TemperatureFor(%v)", what, float64(nu)), err, float64(tf))
		w := Window{Min: wideNu(r), OptimumLow: wideNu(r), OptimumHigh: wideNu(r), Max: wideNu(r)}
		if r.IntN(2) == 0 {
			w = DefaultWindow()
		}
		var s Span
		noPanic(t, what+".Span", func() { s, err = c.Span(w) })
		finite(t, fmt.Sprintf("%s.Span(%+v)", what, w), err,
			float64(s.Cold), float64(s.OptimumFrom), float64(s.OptimumTo), float64(s.Hot))
	}
}

func TestPropertyVI(t *testing.T) {
	r := rand.New(rand.NewPCG(3, 4))
	for range propertyRuns {
		u, y := wideNu(r), wideNu(r)
		if r.IntN(4) == 0 {
			y = units.KinematicViscosity(wide(r, 1.9e-6, 2.1e-6))
		}
		var vi float64
		var err error
		noPanic(t, "ViscosityIndex", func() { vi, err = ViscosityIndex(u, y) })
		finite(t, fmt.Sprintf("ViscosityIndex(%v, %v)", float64(u), float64(y)), err, vi)

		var l, h units.KinematicViscosity
		noPanic(t, "ReferenceViscosities", func() { l, h, err = ReferenceViscosities(y) })
		finite(t, fmt.Sprintf("ReferenceViscosities(%v)", float64(y)), err, float64(l), float64(h))

		want := wide(r, -50, 350)
		var v100 units.KinematicViscosity
		noPanic(t, "V100ForVI", func() { v100, err = V100ForVI(u, want) })
		finite(t, fmt.Sprintf("V100ForVI(%v, %v)", float64(u), want), err, float64(v100))

		if x := wide(r, -1e3, 1e3); !math.IsNaN(x) && !math.IsInf(x, 0) { // RoundVI passes NaN, ±Inf through, as documented
			finite(t, fmt.Sprintf("RoundVI(%v)", x), nil, RoundVI(x))
		}
	}
}

func TestPropertySaybolt(t *testing.T) {
	r := rand.New(rand.NewPCG(5, 6))
	for range propertyRuns {
		v := wideNu(r)
		var s float64
		var err error
		noPanic(t, "SayboltSeconds", func() { s, err = SayboltSeconds(v) })
		finite(t, fmt.Sprintf("SayboltSeconds(%v)", float64(v)), err, s)

		x := wide(r, 30, 1e8)
		var nu units.KinematicViscosity
		noPanic(t, "ViscosityFromSaybolt", func() { nu, err = ViscosityFromSaybolt(x) })
		finite(t, fmt.Sprintf("ViscosityFromSaybolt(%v)", x), err, float64(nu))
	}
}

func TestPropertyGrade(t *testing.T) {
	r := rand.New(rand.NewPCG(7, 8))
	for range propertyRuns {
		v := units.KinematicViscosity(wide(r, 1e-6, 2e-3))
		var err error
		noPanic(t, "GradeOf", func() {
			_, err = GradeOf(v)
			if err != nil {
				_ = err.Error()
			}
		})
		g := Grade(r.IntN(1 << 16))
		noPanic(t, "Grade methods", func() {
			finite(t, "Grade.Mid, Min, Max", nil, float64(g.Mid()), float64(g.Min()), float64(g.Max()))
			_ = g.String()
			_, _ = g.MarshalText()
		})
	}
}

func TestPropertyWindowAndSelect(t *testing.T) {
	r := rand.New(rand.NewPCG(9, 10))
	for range propertyRuns / 20 { // SelectGrades builds 16 curves per call
		s := Site{MinStart: wideT(r), MaxRunning: wideT(r)}
		vi := wide(r, -50, 350)
		w := DefaultWindow()
		if r.IntN(3) == 0 {
			w = Window{Min: wideNu(r), OptimumLow: wideNu(r), OptimumHigh: wideNu(r), Max: wideNu(r)}
		}
		var cs []Candidate
		var err error
		what := fmt.Sprintf("SelectGrades(%+v, %v, %+v)", s, vi, w)
		noPanic(t, what, func() { cs, err = SelectGrades(s, vi, w) })
		for _, c := range cs {
			finite(t, what, err, float64(c.Start.Value), float64(c.Running.Value),
				float64(c.ColdMargin), float64(c.HotMargin))
		}
	}
}

// randomFluid returns a preset or data-sheet fluid, or one rebuilt from a
// preset's data sheet with some figures replaced by wide random values, as
// a caller may do (a refused sheet gives the zero Fluid, whose methods must
// fail cleanly too).
func randomFluid(r *rand.Rand) Fluid {
	var d DataSheet
	if r.IntN(2) == 0 {
		f, _ := Typical(HM, VG46)
		d = f.DataSheet()
	} else {
		d = DataSheet{Class: Class(r.IntN(7)), V40: wideNu(r), V100: wideNu(r),
			VI: wide(r, -50, 350), Density15: units.Density(wide(r, 500, 2000)), PourPoint: wideT(r)}
	}
	if r.IntN(2) == 0 {
		d.Density15 = units.Density(wide(r, 500, 2000))
	}
	if r.IntN(2) == 0 {
		d.Expansion = wide(r, 1e-5, 2e-3)
	}
	if r.IntN(2) == 0 {
		d.Bulk = randomBulk(r)
	}
	if r.IntN(2) == 0 {
		d.Thermal = ThermalModel{C40: units.SpecificHeatCapacity(wide(r, 1000, 4000)), CSlope: wide(r, -5, 5),
			K40: units.ThermalConductivity(wide(r, 0.05, 0.6)), KSlope: wide(r, -1e-3, 1e-3)}
	}
	if r.IntN(4) == 0 {
		d.PourPoint = wideT(r)
	}
	f, _ := FromDataSheet(d)
	return f
}

func randomBulk(r *rand.Rand) BulkModel {
	return BulkModel{K0: units.Pressure(wide(r, 1e8, 1e10)), M: wide(r, 0.1, 30), C: wide(r, 0, 0.05), Gamma: wide(r, 1, 2)}
}

func TestPropertyFluid(t *testing.T) {
	r := rand.New(rand.NewPCG(11, 12))
	for range propertyRuns {
		f := randomFluid(r)
		tt, p := wideT(r), wideP(r)
		what := fmt.Sprintf("%+v at t = %v, p = %v", f, float64(tt), float64(p))
		noPanic(t, what, func() {
			v, err := f.Viscosity(tt)
			finite(t, what+": Viscosity", err, float64(v))
			rho, err := f.Density(tt, p)
			finite(t, what+": Density", err, float64(rho))
			mu, err := f.DynamicViscosity(tt, p)
			finite(t, what+": DynamicViscosity", err, float64(mu))
			c, err := f.SpecificHeat(tt)
			finite(t, what+": SpecificHeat", err, float64(c))
			k, err := f.ThermalConductivity(tt)
			finite(t, what+": ThermalConductivity", err, float64(k))
			kb, err := f.BulkModulus(BulkKind(r.IntN(5)), tt, p)
			finite(t, what+": BulkModulus", err, float64(kb))
			vi, err := f.VI()
			finite(t, what+": VI", err, vi)
			_, _ = f.Grade()
		})
	}
}

func TestPropertyBulkAndHeat(t *testing.T) {
	r := rand.New(rand.NewPCG(13, 14))
	for range propertyRuns {
		tt, p := wideT(r), wideP(r)
		m := randomBulk(r)
		kind := BulkKind(r.IntN(5))
		what := fmt.Sprintf("%+v.Modulus(%v, %v, %v)", m, kind, float64(tt), float64(p))
		var k units.Pressure
		var err error
		noPanic(t, what, func() { k, err = m.Modulus(kind, tt, p) })
		finite(t, what, err, float64(k))

		e := EffectiveBulk{Liquid: units.Pressure(wide(r, 1e8, 1e10)), Container: units.Pressure(wide(r, 1e7, 1e11)),
			Air: EntrainedAir{Fraction: wide(r, 0, 0.2), N: wide(r, 1, 1.4)}}
		pa := units.AbsolutePressure(wide(r, 1e3, 3e8))
		what = fmt.Sprintf("%+v.At(%v)", e, float64(pa))
		noPanic(t, what, func() { k, err = e.At(pa) })
		finite(t, what, err, float64(k))

		di, do := units.Length(wide(r, 1e-3, 0.1)), units.Length(wide(r, 1e-3, 0.1))
		ym, nu := units.Pressure(wide(r, 1e9, 3e11)), wide(r, 0, 0.5)
		what = fmt.Sprintf("TubeBulkModulus(%v, %v, %v, %v)", float64(di), float64(do), float64(ym), nu)
		noPanic(t, what, func() { k, err = TubeBulkModulus(di, do, ym, nu) })
		finite(t, what, err, float64(k))

		sg := wide(r, 0.6, 1.1)
		var c units.SpecificHeatCapacity
		noPanic(t, "CragoeSpecificHeat", func() { c, err = CragoeSpecificHeat(sg, tt) })
		finite(t, fmt.Sprintf("CragoeSpecificHeat(%v, %v)", sg, float64(tt)), err, float64(c))
		var kc units.ThermalConductivity
		noPanic(t, "CragoeConductivity", func() { kc, err = CragoeConductivity(sg, tt) })
		finite(t, fmt.Sprintf("CragoeConductivity(%v, %v)", sg, float64(tt)), err, float64(kc))
	}
}
