package thermal

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func demoUnit(t *testing.T) Lumped {
	t.Helper()
	oil, err := fluid.Typical(fluid.HM, fluid.VG46)
	if err != nil {
		t.Fatal(err)
	}
	return Lumped{Fluid: oil, Oil: 250 * units.Litre, Steel: 300, Dissipation: 45, Ambient: celsius(25), Load: 2 * units.Kilowatt}
}

// TestTransientConservesEnergy integrates the lumped balance
// C·dT/dt = P − h·A·(T − T_amb) with the classical Runge–Kutta method and
// holds the closed form of At to it; then checks the energy books of the
// closed form: the heat put in equals the heat stored plus the heat shed,
// P·t = C·(T(t) − T₀) + ∫h·A·(T − T_amb)dt, the integral by Simpson's rule.
func TestTransientConservesEnergy(t *testing.T) {
	l := demoUnit(t)
	start := celsius(20)
	r, err := l.Response(start)
	if err != nil {
		t.Fatal(err)
	}
	c, ua, p, ta := r.Capacity, float64(l.Dissipation), float64(l.Load), float64(l.Ambient)
	f := func(temp float64) float64 { return (p - ua*(temp-ta)) / c }
	const hours, steps = 6.0, 6000
	h := hours * 3600 / steps
	temp := float64(start)
	for range steps {
		k1 := f(temp)
		k2 := f(temp + h/2*k1)
		k3 := f(temp + h/2*k2)
		k4 := f(temp + h*k3)
		temp += h / 6 * (k1 + 2*k2 + 2*k3 + k4)
	}
	closed, err := l.At(start, time.Duration(hours*float64(time.Hour)))
	if err != nil || math.Abs(float64(closed)-temp) > 1e-9 {
		t.Errorf("At(6 h) = %v K, Runge–Kutta %v K", float64(closed), temp)
	}
	// Energy books over 6 h.
	n := 3000
	dt := hours * 3600 / float64(n)
	sum := 0.0
	for i := 0; i <= n; i++ {
		ti, _ := l.At(start, time.Duration(float64(i)*dt*1e9))
		w := 2.0
		if i == 0 || i == n {
			w = 1
		} else if i%2 == 1 {
			w = 4
		}
		sum += w * ua * (float64(ti) - ta)
	}
	shed := sum * dt / 3
	in := p * hours * 3600
	stored := c * (float64(closed) - float64(start))
	if math.Abs(in-stored-shed) > 1e-8*in {
		t.Errorf("energy in %g J, stored %g J + shed %g J = %g J", in, stored, shed, stored+shed)
	}
	// The capacity is the oil's ρ·V·c at the mean temperature plus the
	// steel's m·c, and τ = C/(h·A).
	mean := start + (r.Steady-start)/2
	rho, _ := l.Fluid.Density(mean, 0)
	co, _ := l.Fluid.SpecificHeat(mean)
	if want := float64(rho)*0.25*float64(co) + 300*490; math.Abs(c-want) > 1e-9*want ||
		math.Abs(r.TimeConstant.Seconds()-c/45) > 1e-6 || math.Abs(r.Steady.Celsius()-(25+2000/45.0)) > 1e-9 {
		t.Errorf("capacity %g (want %g), τ %v, steady %v", c, want, r.TimeConstant, r.Steady)
	}
}

func TestWarmUpAndCoolDown(t *testing.T) {
	l := demoUnit(t)
	start := celsius(20)
	d, err := l.TimeTo(start, celsius(50))
	if err != nil {
		t.Fatal(err)
	}
	if got, _ := l.At(start, d); math.Abs(got.Celsius()-50) > 1e-6 {
		t.Errorf("At(TimeTo(50 °C)) = %v", got)
	}
	// Cool-down with the load off: from 60 °C towards the 25 °C ambient.
	l.Load = 0
	d, err = l.TimeTo(celsius(60), celsius(30))
	if err != nil || d <= 0 {
		t.Fatalf("cool-down: %v, %v", d, err)
	}
	if got, _ := l.At(celsius(60), d); math.Abs(got.Celsius()-30) > 1e-6 {
		t.Errorf("cool-down At = %v, want 30 °C", got)
	}
	if d, _ := l.TimeTo(celsius(60), celsius(60)); d != 0 {
		t.Errorf("TimeTo(start) = %v", d)
	}
}

// TestTinyTimeConstant: a body whose τ is below a nanosecond (TimeConstant
// rounds to 0) still has a temperature at every time, never NaN.
func TestTinyTimeConstant(t *testing.T) {
	l := demoUnit(t)
	l.Oil, l.Steel, l.Dissipation = 1e-15, 0, 1e6
	for _, d := range []time.Duration{0, time.Nanosecond, time.Second} {
		got, err := l.At(celsius(20), d)
		r, _ := l.Response(celsius(20))
		want := r.Steady + (celsius(20)-r.Steady)*units.Temperature(math.Exp(-d.Seconds()*1e6/r.Capacity))
		if err != nil || math.IsNaN(float64(got)) || math.Abs(float64(got-want)) > 1e-9 {
			t.Errorf("At(%v) = %v, %v; want %v", d, got, err, want)
		}
	}
}

func TestTransientBadInput(t *testing.T) {
	ok := demoUnit(t)
	bad := func(f func(*Lumped)) error { l := ok; f(&l); _, err := l.Response(celsius(20)); return err }
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"oil", bad(func(l *Lumped) { l.Oil = 0 }), "Oil"},
		{"steel", bad(func(l *Lumped) { l.Steel = -1 }), "Steel"},
		{"steel heat", bad(func(l *Lumped) { l.SteelHeat = -1 }), "SteelHeat"},
		{"dissipation", bad(func(l *Lumped) { l.Dissipation = 0 }), "Dissipation"},
		{"load", bad(func(l *Lumped) { l.Load = -1 }), "Load"},
		{"ambient", bad(func(l *Lumped) { l.Ambient = 0 }), "Ambient"},
		{"start", second(ok.Response(0)), "start"},
		{"past steady", second(ok.TimeTo(celsius(20), celsius(90))), "target"},
		{"wrong side", second(ok.TimeTo(celsius(20), celsius(10))), "target"},
		{"d", second(ok.At(celsius(20), -time.Second)), "d"},
		// The zero fluid and a mean temperature beyond the fluid's models
		// name Lumped's fields.
		{"zero fluid", bad(func(l *Lumped) { l.Fluid = fluid.Fluid{} }), "Fluid.Density15"},
		{"too hot", bad(func(l *Lumped) { l.Load = 100 * units.Kilowatt }), "start"},
	} {
		t.Run(c.name, func(t *testing.T) { checktest.RangeError(t, c.err, c.param) })
	}
	t.Run("function", func(t *testing.T) {
		checktest.RangeErrorIn(t, bad(func(l *Lumped) { l.Fluid = fluid.Fluid{} }), "thermal.Lumped.Response", "Fluid.Density15")
	})
}

// BenchmarkLumpedAt evaluates the warm-up of the demo unit at a spread of
// times (fluid properties at the mean temperature each call).
func BenchmarkLumpedAt(b *testing.B) {
	oil, err := fluid.Typical(fluid.HM, fluid.VG46)
	if err != nil {
		b.Fatal(err)
	}
	l := Lumped{Fluid: oil, Oil: 250 * units.Litre, Steel: 300, Dissipation: 45, Ambient: celsius(25), Load: 2 * units.Kilowatt}
	start := celsius(20)
	b.ReportAllocs()
	var sink units.Temperature
	for i := 0; b.Loop(); i++ {
		t, _ := l.At(start, time.Duration(i%600)*time.Minute)
		sink += t
	}
	_ = sink
}
