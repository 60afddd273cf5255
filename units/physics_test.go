package units

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/internal/checktest"
)

// Esposito, Fluid Power with Applications, 7th ed., Example 6-1 (inputs);
// results by the book's method, printed to four digits: 20 gpm into a 2 in
// bore with a 1 in rod, 1000 lb load both ways → extend 318.3 psi, 2.042 ft/s,
// 3.71 hp; retract 424.4 psi, 2.722 ft/s, 4.95 hp. Tolerance: one unit in
// the last printed digit (two for the speeds), since the book rounds its
// intermediate values (its retraction speed and power come out 2.7233 ft/s
// and 4.9515 hp unrounded).
func TestCylinderWorkedExample(t *testing.T) {
	q := 20 * USGallonPerMinute
	load := 1000 * PoundForce
	bore := CircleArea(2 * Inch)
	annulus := bore - CircleArea(1*Inch)
	for _, c := range []struct {
		name             string
		area             Area
		psi, fps, hp     float64
		tolP, tolV, tolH float64
	}{
		{"extend", bore, 318.3, 2.042, 3.71, 0.1, 0.002, 0.01},
		{"retract", annulus, 424.4, 2.722, 4.95, 0.1, 0.002, 0.01},
	} {
		p, err := load.PerArea(c.area)
		if err != nil {
			t.Fatal(err)
		}
		v, err := q.PerArea(c.area)
		if err != nil {
			t.Fatal(err)
		}
		power := p.TimesFlow(q)
		if mech := load.TimesVelocity(v); !checktest.Close(float64(mech), float64(power), 1e-14) {
			t.Errorf("%s: F·v = %v, p·Q = %v; an ideal cylinder turns all of p·Q into F·v", c.name, mech, power)
		}
		if math.Abs(p.PSI()-c.psi) > c.tolP || math.Abs(v.FeetPerSecond()-c.fps) > c.tolV || math.Abs(power.Horsepower()-c.hp) > c.tolH {
			t.Errorf("%s: %.4f psi, %.4f ft/s, %.4f hp; want %v, %v, %v", c.name, p.PSI(), v.FeetPerSecond(), power.Horsepower(), c.psi, c.fps, c.hp)
		}
	}
}

// One horsepower is 550 ft·lbf/s by definition (NIST SP 811, Appendix B).
func TestForceTimesVelocity(t *testing.T) {
	if hp := (550 * PoundForce).TimesVelocity(1 * FootPerSecond).Horsepower(); !checktest.Close(hp, 1, 1e-15) {
		t.Errorf("550 lbf at 1 ft/s = %.17g hp, want 1", hp)
	}
	if kw := (10 * Kilonewton).TimesVelocity(0.1 * MetrePerSecond).Kilowatts(); !checktest.Close(kw, 1, 1e-15) {
		t.Errorf("10 kN at 0.1 m/s = %.17g kW, want 1", kw)
	}
}

// The trade's power constants follow from the unit definitions (NIST SP 811):
// hp = psi·gpm/1714.29 (1714 in print) and kW = bar·(L/min)/600 exactly.
func TestTradePowerConstants(t *testing.T) {
	hp := (1 * PSI).TimesFlow(1 * USGallonPerMinute).Horsepower()
	if !checktest.Close(1/hp, 1714.2857, 1e-7) { // 1714.285714… = 12000/7 from the definitions
		t.Errorf("psi·gpm per hp = %.7f, want 1714.2857", 1/hp)
	}
	kw := (1 * Bar).TimesFlow(1 * LitrePerMinute).Kilowatts()
	if !checktest.Close(1/kw, 600, 1e-15) {
		t.Errorf("bar·L/min per kW = %.15g, want 600", 1/kw)
	}
	// Torque [lbf·in] = 63 025·hp/rpm, the trade constant, derived from the
	// NIST SP 811 definitions of hp (550 ft·lbf/s), foot and inch.
	torque, err := (1 * Horsepower).PerSpeed(1 * RevolutionPerMinute)
	if err != nil || !checktest.Close(torque.PoundForceInches(), 63025, 1e-5) {
		t.Errorf("hp/rpm = %.2f lbf·in, want 63025 (%v)", torque.PoundForceInches(), err)
	}
	// Velocity [ft/s] = 0.3208·gpm/in², the trade constant, derived from the
	// NIST SP 811 definitions of the US gallon (231 in³) and the foot.
	v, err := (1 * USGallonPerMinute).PerArea(1 * SquareInch)
	if err != nil || math.Abs(v.FeetPerSecond()-0.3208) > 0.00005 { // half a unit in the last digit
		t.Errorf("gpm/in² = %.5f ft/s, want 0.3208 (%v)", v.FeetPerSecond(), err)
	}
}

// Flow = displacement × speed, torque = D·Δp/2π and P = 2π·n·T hold with
// revolution-based units: a 100 cm³/rev unit at 1500 rpm moves 150 L/min and at
// 100 bar needs 159.15 N·m (10⁻⁴·10⁷/2π) and 25 kW (= 100 bar·150 L/min/600).
func TestRotaryRelations(t *testing.T) {
	d := 100 * CubicCentimetrePerRevolution
	n := 1500 * RevolutionPerMinute
	if q := d.TimesSpeed(n); !checktest.Close(q.LitresPerMinute(), 150, 1e-14) {
		t.Errorf("flow = %v, want 150 L/min", q)
	}
	tq := d.TimesPressure(100 * Bar)
	if !checktest.Close(tq.NewtonMetres(), 1000/(2*math.Pi), 1e-14) {
		t.Errorf("torque = %v", tq)
	}
	if p := tq.TimesSpeed(n); !checktest.Close(p.Kilowatts(), 25, 1e-14) {
		t.Errorf("power = %v, want 25 kW", p)
	}
	back, err := d.TimesSpeed(n).PerSpeed(n)
	if err != nil || !checktest.Close(float64(back), float64(d), 1e-15) {
		t.Errorf("PerSpeed round trip = %v, %v", back, err)
	}
}

func TestProductsAndQuotients(t *testing.T) {
	if v := CircleArea(100 * Millimetre).TimesLength(1 * Metre); !checktest.Close(v.Litres(), 7.853981633974483, 1e-15) {
		t.Errorf("volume = %v", v)
	}
	if v := (30 * LitrePerMinute).TimesDuration(2 * time.Minute); !checktest.Close(v.Litres(), 60, 1e-15) {
		t.Errorf("volume = %v", v)
	}
	q, err := (60 * Litre).PerDuration(2 * time.Minute)
	if err != nil || !checktest.Close(q.LitresPerMinute(), 30, 1e-15) {
		t.Errorf("flow = %v, %v", q, err)
	}
	if e := (2 * Kilowatt).TimesDuration(30 * time.Minute); !checktest.Close(e.KilowattHours(), 1, 1e-15) {
		t.Errorf("energy = %v", e)
	}
	// 46 mm²/s at 870 kg/m³ is 40.02 mPa·s.
	if mu := (46 * Centistokes).TimesDensity(870 * KilogramPerCubicMetre); !checktest.Close(mu.MillipascalSeconds(), 40.02, 1e-12) {
		t.Errorf("dynamic viscosity = %v", mu)
	}
	// One kgf is one kilogram under standard gravity (NIST SP 811).
	if w := (1 * Kilogram).TimesAcceleration(StandardGravity); w != KilogramForce {
		t.Errorf("weight of 1 kg = %v N, want %v", float64(w), float64(KilogramForce))
	}
	if p := (3 * Bar).TimesArea(2 * SquareCentimetre); !checktest.Close(p.Newtons(), 60, 1e-15) {
		t.Errorf("force = %v", p)
	}
}

// TestQuotientsRefuse: a quotient refuses a divisor that is zero, negative,
// NaN or infinite, and a result that is not finite (a finite dividend over a
// tiny divisor used to return +Inf, a NaN dividend NaN); it returns 0 with a
// *RangeError that names the divisor or "result".
func TestQuotientsRefuse(t *testing.T) {
	for _, c := range []struct {
		name  string
		v     float64
		err   error
		fn    string
		param string
	}{
		// Divisors.
		{"force/0", float64(first(Force(1).PerArea(0))), second(Force(1).PerArea(0)), "units.Force.PerArea", "a"},
		{"force/-1", float64(first(Force(1).PerArea(-1))), second(Force(1).PerArea(-1)), "units.Force.PerArea", "a"},
		{"force/NaN", float64(first(Force(1).PerArea(Area(math.NaN())))), second(Force(1).PerArea(Area(math.NaN()))), "units.Force.PerArea", "a"},
		{"flow/Inf", float64(first(Flow(1).PerArea(Area(math.Inf(1))))), second(Flow(1).PerArea(Area(math.Inf(1)))), "units.Flow.PerArea", "a"},
		{"flow/0 speed", float64(first(Flow(1).PerSpeed(0))), second(Flow(1).PerSpeed(0)), "units.Flow.PerSpeed", "n"},
		{"power/0 speed", float64(first(Power(1).PerSpeed(0))), second(Power(1).PerSpeed(0)), "units.Power.PerSpeed", "n"},
		{"volume/0 s", float64(first(Volume(1).PerDuration(0))), second(Volume(1).PerDuration(0)), "units.Volume.PerDuration", "d"},
		{"volume/-1 s", float64(first(Volume(1).PerDuration(-time.Second))), second(Volume(1).PerDuration(-time.Second)), "units.Volume.PerDuration", "d"},
		// Results that are not finite.
		{"force 1e300/1e-10", float64(first(Force(1e300).PerArea(1e-10))), second(Force(1e300).PerArea(1e-10)), "units.Force.PerArea", "result"},
		{"force NaN/1", float64(first(Force(math.NaN()).PerArea(1))), second(Force(math.NaN()).PerArea(1)), "units.Force.PerArea", "result"},
		{"flow -1e300/1e-10", float64(first(Flow(-1e300).PerArea(1e-10))), second(Flow(-1e300).PerArea(1e-10)), "units.Flow.PerArea", "result"},
		{"flow 1e300/1e-10 speed", float64(first(Flow(1e300).PerSpeed(1e-10))), second(Flow(1e300).PerSpeed(1e-10)), "units.Flow.PerSpeed", "result"},
		{"power 1e308/1e-3 speed", float64(first(Power(1e308).PerSpeed(1e-3))), second(Power(1e308).PerSpeed(1e-3)), "units.Power.PerSpeed", "result"},
		{"power Inf/1 speed", float64(first(Power(math.Inf(1)).PerSpeed(1))), second(Power(math.Inf(1)).PerSpeed(1)), "units.Power.PerSpeed", "result"},
		{"volume 1e308/1 ns", float64(first(Volume(1e308).PerDuration(time.Nanosecond))), second(Volume(1e308).PerDuration(time.Nanosecond)), "units.Volume.PerDuration", "result"},
	} {
		if c.v != 0 {
			t.Errorf("%s = %g beside its error, want 0", c.name, c.v)
		}
		checktest.RangeErrorIn(t, c.err, c.fn, c.param)
	}
	// Large but finite quotients still work.
	if p, err := Force(1e300).PerArea(1e-5); err != nil || p != 1e305 {
		t.Errorf("Force(1e300).PerArea(1e-5) = %v, %v; want 1e305 Pa", float64(p), err)
	}
}

func first[T any](v T, _ error) T { return v }

func second[T any](_ T, err error) error { return err }

// Temperature scales: NIST SP 811, B.9 (t/°C = T/K − 273.15; t/°F = 1.8·t/°C + 32).
func TestTemperatureScales(t *testing.T) {
	for _, c := range []struct{ c, f, k float64 }{
		{0, 32, 273.15},
		{100, 212, 373.15},
		{-40, -40, 233.15},
		{-273.15, -459.67, 0},
	} {
		if got := TemperatureFromCelsius(c.c); !checktest.Close(float64(got), c.k, 1e-15) && c.k != 0 {
			t.Errorf("%v °C = %v K, want %v", c.c, float64(got), c.k)
		}
		if got := TemperatureFromFahrenheit(c.f); math.Abs(float64(got)-c.k) > 1e-12 {
			t.Errorf("%v °F = %v K, want %v", c.f, float64(got), c.k)
		}
		if got := Temperature(c.k).Fahrenheit(); math.Abs(got-c.f) > 1e-12 {
			t.Errorf("%v K = %v °F, want %v", c.k, got, c.f)
		}
		if got := Temperature(c.k).Celsius(); math.Abs(got-c.c) > 1e-12 {
			t.Errorf("%v K = %v °C, want %v", c.k, got, c.c)
		}
	}
	hot, cold := TemperatureFromCelsius(60), TemperatureFromCelsius(20)
	if d := hot.Sub(cold); d != 40 || cold.Add(d) != hot {
		t.Errorf("60 °C − 20 °C = %v; 20 °C + that = %v", d, cold.Add(d))
	}
}

// Gauge and absolute cross only with an explicit ambient: 100 bar gauge at a
// standard atmosphere (101 325 Pa, NIST SP 811) is 10 101 325 Pa absolute.
func TestGaugeAbsolute(t *testing.T) {
	a := (100 * Bar).Absolute(StandardAtmosphere)
	if float64(a) != 10101325 {
		t.Errorf("absolute = %v Pa", float64(a))
	}
	if g := a.Gauge(StandardAtmosphere); g != 100*Bar {
		t.Errorf("gauge = %v", g)
	}
	if (-2 * Bar).Absolute(StandardAtmosphere).Valid() {
		t.Error("−2 bar gauge at 1 atm is below vacuum but reported valid")
	}
	if !(0 * PascalAbsolute).Valid() || AbsolutePressure(math.Inf(1)).Valid() || AbsolutePressure(math.NaN()).Valid() {
		t.Error("Valid misjudges 0, +Inf or NaN")
	}
}
