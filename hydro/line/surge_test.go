package line

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/units"
)

func TestJoukowskyHandValue(t *testing.T) {
	// Hand value: oil of 870 kg/m³ and bulk modulus 1.5 GPa in a rigid
	// line: a = √(1.5e9/870) = 1313.0643 m/s; stopping 4 m/s gives
	// Δp = 870 · 1313.0643 · 4 = 4 569 464 Pa = 45.69 bar (worked by hand
	// to 5 significant digits).
	a, err := WaveSpeed(870, 1.5*units.Gigapascal, 0)
	if err != nil || !near(a.MetresPerSecond(), 1313.0643, 5e-4) {
		t.Errorf("WaveSpeed = %v, %v; want 1313.064 m/s", a.MetresPerSecond(), err)
	}
	dp, err := Joukowsky(870, a, 4*units.MetrePerSecond)
	if err != nil || !near(dp.Bar(), 45.695, 5e-3) {
		t.Errorf("Joukowsky = %v bar, %v; want 45.69 bar", dp.Bar(), err)
	}
	// Korteweg's thin-wall correction by hand: a 20 mm bore, 1 mm steel
	// wall (206 GPa): K_wall = E·e/D = 10.3 GPa, 1/K_eff = 1/1.5 + 1/10.3 GPa
	// → K_eff = 1.30932 GPa, a = √(K_eff/870) = 1226.77 m/s.
	a, _ = WaveSpeed(870, 1.5*units.Gigapascal, 10.3*units.Gigapascal)
	if !near(a.MetresPerSecond(), 1226.77, 0.01) {
		t.Errorf("thin-wall wave speed = %v, want 1226.77 m/s", a.MetresPerSecond())
	}
}

func TestClosureSurge(t *testing.T) {
	oil, err := fluid.Typical(fluid.HM, fluid.VG46)
	if err != nil {
		t.Fatal(err)
	}
	t40 := units.TemperatureFromCelsius(40)
	c := Closure{Fluid: oil, Temperature: t40, Pressure: 0, Velocity: 4 * units.MetrePerSecond, Length: 12,
		Wall:   Wall{Bore: 20 * units.Millimetre, OD: 22 * units.Millimetre, Modulus: 206 * units.Gigapascal, Poisson: 0.3},
		Rating: 40 * units.Bar}
	s, err := c.Surge()
	if err != nil {
		t.Fatal(err)
	}
	// Against the hand form: the fluid's isentropic modulus and density
	// from fluid, Korteweg's thin wall E·e/D = 206 GPa·1/20. The Lamé wall
	// of fluid.TubeBulkModulus is softer than the thin-wall form by about
	// 8 % at D/e 20, which moves the wave speed by under 1 %.
	kf, _ := oil.BulkModulus(fluid.IsentropicTangent, t40, 0)
	rho, _ := oil.Density(t40, 0)
	thin := 206e9 * 1 / 20
	keff := 1 / (1/float64(kf) + 1/thin)
	aHand := math.Sqrt(keff / float64(rho))
	if math.Abs(s.WaveSpeed.MetresPerSecond()-aHand)/aHand > 0.01 {
		t.Errorf("wave speed %v, thin-wall hand value %.1f m/s", s.WaveSpeed, aHand)
	}
	if want := float64(rho) * float64(s.WaveSpeed) * 4; math.Abs(float64(s.Rise)-want) > 1e-9*want {
		t.Errorf("rise %v, want ρ·a·Δv = %g Pa", s.Rise, want)
	}
	if want := time.Duration(24 / float64(s.WaveSpeed) * 1e9); s.RoundTrip != want {
		t.Errorf("round trip %v, want %v", s.RoundTrip, want)
	}
	if len(s.Findings.Topic("line.surge-bound")) != 1 || s.Check.OK() || len(s.Findings.Hazard(components.Burst)) != 1 {
		t.Errorf("rise %v above the 40 bar rating: check %v, findings %v", s.Rise, s.Check, s.Findings)
	}
	// A rigid wall (the zero Wall) gives a faster wave and a higher rise.
	c.Wall = Wall{}
	r, _ := c.Surge()
	if r.Rise <= s.Rise {
		t.Errorf("rigid rise %v not above elastic %v", r.Rise, s.Rise)
	}
}

func TestSurgeBadInput(t *testing.T) {
	oil, _ := fluid.Typical(fluid.HM, fluid.VG46)
	ok := Closure{Fluid: oil, Temperature: units.TemperatureFromCelsius(40), Velocity: 1, Length: 1}
	bad := func(f func(*Closure)) error { c := ok; f(&c); _, err := c.Surge(); return err }
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"rho", second(WaveSpeed(0, 1e9, 0)), "rho"},
		{"bulk", second(WaveSpeed(870, 0, 0)), "fluidBulk"},
		{"wall", second(WaveSpeed(870, 1e9, -1)), "wallBulk"},
		{"a", second(Joukowsky(870, 0, 1)), "a"},
		{"dv", second(Joukowsky(870, 1000, -1)), "dv"},
		{"velocity", bad(func(c *Closure) { c.Velocity = 0 }), "Velocity"},
		{"length", bad(func(c *Closure) { c.Length = units.Length(math.Inf(1)) }), "Length"},
		{"rating", bad(func(c *Closure) { c.Rating = -1 }), "Rating"},
		// 2L/a beyond what a time.Duration holds (about 292 years).
		{"round trip", bad(func(c *Closure) { c.Length = 1e300 }), "Length"},
	} {
		wantRangeError(t, c.name, c.err, c.param)
	}
	// Errors of the fluid and the wall name Surge and the Closure's fields.
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"wall od", bad(func(c *Closure) { c.Wall = Wall{Bore: 0.02, OD: 0.01, Modulus: 2e11} }), "Wall.OD"},
		{"wall bore", bad(func(c *Closure) { c.Wall = Wall{OD: 0.01, Modulus: 2e11} }), "Wall.Bore"},
		{"wall modulus", bad(func(c *Closure) { c.Wall = Wall{Bore: 0.01, OD: 0.012} }), "Wall.Modulus"},
		{"wall poisson", bad(func(c *Closure) { c.Wall = Wall{Bore: 0.01, OD: 0.012, Modulus: 2e11, Poisson: 0.7} }), "Wall.Poisson"},
		{"temperature", bad(func(c *Closure) { c.Temperature = units.TemperatureFromCelsius(400) }), "Temperature"},
		{"pressure", bad(func(c *Closure) { c.Pressure = units.Pressure(math.NaN()) }), "Pressure"},
		{"zero fluid", bad(func(c *Closure) { c.Fluid = fluid.Fluid{} }), "Fluid.Bulk.K0"},
	} {
		wantRangeErrorIn(t, c.name, c.err, "line.Closure.Surge", c.param)
	}
}
