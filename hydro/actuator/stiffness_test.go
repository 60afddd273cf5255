package actuator

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// rigidOil is an effective bulk modulus of 1.4 GPa: oil without free air in
// a rigid container.
func rigidOil() fluid.EffectiveBulk { return fluid.EffectiveBulk{Liquid: 1.4 * gpa} }

const bar100 = 100 * units.BarAbsolute

// TestCentredPiston: a symmetric double-rod cylinder without dead volumes
// is softest with the piston centred, where ω₀ = √(4·B·A²/(V_t·m)), V_t =
// A·S (Merritt, Hydraulic Control Systems, Wiley, 1967, from memory).
func TestCentredPiston(t *testing.T) {
	o := OilSpring{
		Cylinder: Cylinder{Bore: 80 * mm, Rod: 40 * mm, Stroke: 400 * mm, Ends: DoubleRod},
		Mass:     500 * units.Kilogram, Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100,
	}
	a := float64(o.Cylinder.AnnulusArea())
	w0 := math.Sqrt(4 * 1.4e9 * a * a / (a * 0.4 * 500))
	r, err := o.Lowest()
	if err != nil {
		t.Fatal(err)
	}
	if !checktest.Close(r.Position, 200*mm, 1e-12) || !checktest.Close(r.Frequency, units.Frequency(w0/(2*math.Pi)), 1e-12) {
		t.Errorf("Lowest = %+v; want 200 mm and %v Hz", r, w0/(2*math.Pi))
	}
	f, err := o.NaturalFrequency(200 * mm)
	if err != nil || !checktest.Close(f, r.Frequency, 1e-12) {
		t.Errorf("NaturalFrequency(S/2) = %v, %v; want %v", f, err, r.Frequency)
	}
	// The ramp rule: 18/ω₀ (common practice).
	want := time.Duration(18 / w0 * float64(time.Second))
	if (r.MinRamp-want).Abs() > time.Microsecond || r.RampRule.Kind != components.CommonPractice {
		t.Errorf("MinRamp = %v (%v); want %v", r.MinRamp, r.RampRule, want)
	}
}

// TestStiffnessByHand: a 100/70 cylinder, 500 mm stroke, 0.2 L and 0.3 L
// dead volumes, 1.4 GPa, piston at 200 mm:
// k = B·A₁²/(A₁·0.2 + 0.2 L) + B·A₂²/(A₂·0.3 + 0.3 L) = 48.77 + 14.96 MN/m
// (hand arithmetic [X]).
func TestStiffnessByHand(t *testing.T) {
	o := OilSpring{
		Cylinder: Cylinder{Bore: 100 * mm, Rod: 70 * mm, Stroke: 500 * mm},
		Mass:     1200, DeadCap: 0.2 * units.Litre, DeadRod: 0.3 * units.Litre,
		Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100,
	}
	a1, a2 := 7.853981634e-3, 4.005530633e-3
	want := 1.4e9*a1*a1/(a1*0.2+0.2e-3) + 1.4e9*a2*a2/(a2*0.3+0.3e-3)
	k, err := o.Stiffness(200 * mm)
	if err != nil || !checktest.Close(float64(k), want, 1e-9) || !checktest.Close(float64(k), 63.73e6, 1e-3) {
		t.Errorf("Stiffness(200 mm) = %v, %v; want %.6g N/m", k, err, want)
	}
}

// TestLowestIsTheMinimum: the closed-form position of the lowest frequency
// agrees with a scan of the stroke (single-rod, unequal dead volumes, air on
// the low-pressure rod side softening it).
func TestLowestIsTheMinimum(t *testing.T) {
	for _, o := range []OilSpring{
		{Cylinder: Cylinder{Bore: 125 * mm, Rod: 90 * mm, Stroke: 800 * mm}, Mass: 3000,
			DeadCap: 0.5 * units.Litre, DeadRod: 1.5 * units.Litre, Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100},
		{Cylinder: Cylinder{Bore: 63 * mm, Rod: 36 * mm, Stroke: 300 * mm}, Mass: 150,
			Bulk:        fluid.EffectiveBulk{Liquid: 1.6 * gpa, Air: fluid.EntrainedAir{Fraction: 0.005, N: 1.4}},
			CapPressure: 120 * units.BarAbsolute, RodPressure: 8 * units.BarAbsolute, DeadCap: 0.1 * units.Litre},
		{Cylinder: Cylinder{Bore: 50 * mm, Rod: 28 * mm, Stroke: 200 * mm, Action: SingleActing}, Mass: 80,
			DeadCap: 0.05 * units.Litre, Bulk: rigidOil(), CapPressure: bar100},
		{Cylinder: Cylinder{Bore: 80 * mm, Rod: 56 * mm, Stroke: 100 * mm}, Mass: 400,
			DeadCap: 4 * units.Litre, Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100}, // softest at full retraction
	} {
		r, err := o.Lowest()
		if err != nil {
			t.Fatal(err)
		}
		s := float64(o.Cylinder.Stroke)
		best, at := math.Inf(1), 0.0
		for i := 0; i <= 10000; i++ {
			x := s * float64(i) / 10000
			f, err := o.NaturalFrequency(units.Length(x))
			if err != nil {
				if x == 0 || x == s {
					continue // a zero dead volume at the end of stroke
				}
				t.Fatal(err)
			}
			if float64(f) < best {
				best, at = float64(f), x
			}
		}
		if float64(r.Frequency) > best*(1+1e-12) || math.Abs(float64(r.Position)-at) > s/5000 {
			t.Errorf("%+v: Lowest %v at %v; scan %v Hz at %v m", o.Cylinder, r.Frequency, r.Position, best, at)
		}
	}
}

// TestAirSoftens: free air lowers the frequency, and the more so at low
// pressure (property; the modulus is fluid.EffectiveBulk's).
func TestAirSoftens(t *testing.T) {
	o := OilSpring{Cylinder: Cylinder{Bore: 80 * mm, Rod: 45 * mm, Stroke: 500 * mm}, Mass: 600,
		DeadCap: 0.3 * units.Litre, DeadRod: 0.3 * units.Litre, Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100}
	dry, _ := o.Lowest()
	o.Bulk.Air = fluid.EntrainedAir{Fraction: 0.01, N: 1.4}
	wet, _ := o.Lowest()
	o.CapPressure, o.RodPressure = 20*units.BarAbsolute, 20*units.BarAbsolute
	low, err := o.Lowest()
	if err != nil || !(low.Frequency < wet.Frequency && wet.Frequency < dry.Frequency) {
		t.Errorf("dry %v, 1 %% air at 100 bar %v, at 20 bar %v (%v); want falling", dry.Frequency, wet.Frequency, low.Frequency, err)
	}
}

func TestOilSpringBadInput(t *testing.T) {
	ok := OilSpring{Cylinder: Cylinder{Bore: 80 * mm, Rod: 45 * mm, Stroke: 500 * mm}, Mass: 600,
		DeadCap: 0.3 * units.Litre, DeadRod: 0.3 * units.Litre, Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100}
	for _, w := range []struct {
		param string
		edit  func(*OilSpring)
	}{
		{"OilSpring.Cylinder.Rod", func(o *OilSpring) { o.Cylinder.Rod = 90 * mm }},
		{"OilSpring.Mass", func(o *OilSpring) { o.Mass = 0 }},
		{"OilSpring.DeadCap", func(o *OilSpring) { o.DeadCap = -1 }},
		{"OilSpring.DeadRod", func(o *OilSpring) { o.DeadRod = units.Volume(math.NaN()) }},
		{"OilSpring.RampFactor", func(o *OilSpring) { o.RampFactor = -1 }},
		{"OilSpring.Bulk.Liquid", func(o *OilSpring) { o.Bulk.Liquid = 0 }},
		{"OilSpring.Bulk.Air.Fraction", func(o *OilSpring) { o.Bulk.Air.Fraction = 0.9 }},
		{"OilSpring.CapPressure", func(o *OilSpring) { o.CapPressure = 0 }},
		{"OilSpring.RodPressure", func(o *OilSpring) { o.RodPressure = -1 }},
	} {
		o := ok
		w.edit(&o)
		_, err := o.Lowest()
		checktest.RangeErrorIn(t, err, "actuator.OilSpring.Lowest", w.param)
		_, err = o.Stiffness(0)
		checktest.RangeErrorIn(t, err, "actuator.OilSpring.Stiffness", w.param)
		_, err = o.NaturalFrequency(0)
		checktest.RangeErrorIn(t, err, "actuator.OilSpring.NaturalFrequency", w.param)
	}
	_, err := ok.Stiffness(501 * mm)
	checktest.RangeError(t, err, "x")
	_, err = ok.NaturalFrequency(-1 * mm)
	checktest.RangeError(t, err, "x")
	// No dead volume at the end of stroke: infinitely stiff, an error.
	stiff := ok
	stiff.DeadCap = 0
	_, err = stiff.Stiffness(0)
	checktest.RangeError(t, err, "k")
	// A single-acting cylinder needs no rod-side pressure.
	single := ok
	single.Cylinder.Action, single.RodPressure = SingleActing, 0
	if r, err := single.Lowest(); err != nil || r.Position != single.Cylinder.Stroke {
		t.Errorf("single-acting Lowest = %+v, %v; want full extension", r, err)
	}
}

func TestOilSpringAllocations(t *testing.T) {
	o := OilSpring{Cylinder: Cylinder{Bore: 80 * mm, Rod: 45 * mm, Stroke: 500 * mm}, Mass: 600,
		DeadCap: 0.3 * units.Litre, DeadRod: 0.3 * units.Litre, Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100}
	if n := testing.AllocsPerRun(100, func() { _, _ = o.Lowest() }); n != 0 {
		t.Errorf("Lowest allocates %v times; want 0", n)
	}
}

func BenchmarkOilSpringLowest(b *testing.B) {
	o := OilSpring{Cylinder: Cylinder{Bore: 80 * mm, Rod: 45 * mm, Stroke: 500 * mm}, Mass: 600,
		DeadCap: 0.3 * units.Litre, DeadRod: 0.3 * units.Litre, Bulk: rigidOil(), CapPressure: bar100, RodPressure: bar100}
	b.ReportAllocs()
	for b.Loop() {
		_, _ = o.Lowest()
	}
}
