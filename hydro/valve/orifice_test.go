package valve

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// The orifice equation against GNU units 2.22, which evaluates the same
// expression in its own unit definitions:
//
//	units -t -o %.17g '0.61 * (pi/4) * (3 mm)^2 * sqrt(2 * 70 bar / (870 kg/m^3))' 'L/min'  → 32.818435041685028
//	units -t -o %.17g '870 kg/m^3 / 2 * (25 L/min / (0.61 * (pi/4) * (4 mm)^2))^2' bar     → 12.852492984058475
//
// Tolerance 1e-14 relative: both evaluate in double precision.
func TestOrificeAgainstGNUUnits(t *testing.T) {
	mm := units.Millimetre
	q, err := OrificeFlow(0.61, units.CircleArea(3*mm), 70*units.Bar, 870)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "flow, L/min", q.LitresPerMinute(), 32.818435041685028, 1e-14)
	dp, err := OrificeDrop(0.61, units.CircleArea(4*mm), 25*units.LitrePerMinute, 870)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "drop, bar", dp.Bar(), 12.852492984058475, 1e-14)
	checktest.Near(t, "flow vs GNU units", q.LitresPerMinute(),
		checktest.GNUUnitsValue(t, checktest.GNUUnits(t), "0.61 * (pi/4) * (3 mm)^2 * sqrt(2 * 70 bar / (870 kg/m^3))", "L/min"), 1e-14)
	checktest.Near(t, "drop vs GNU units", dp.Bar(),
		checktest.GNUUnitsValue(t, checktest.GNUUnits(t), "870 kg/m^3 / 2 * (25 L/min / (0.61 * (pi/4) * (4 mm)^2))^2", "bar"), 1e-14)
}

// The three solutions are one equation: flow → drop → area round trips.
func TestOrificeRoundTrip(t *testing.T) {
	for _, c := range []struct {
		cd  float64
		a   units.Area
		dp  units.Pressure
		rho units.Density
	}{{0.61, 7.07e-6, 70e5, 870}, {0.7, 1e-4, 2e5, 1000}, {1, 3e-7, 350e5, 850}} {
		q, err := OrificeFlow(c.cd, c.a, c.dp, c.rho)
		if err != nil {
			t.Fatal(err)
		}
		dp, err := OrificeDrop(c.cd, c.a, q, c.rho)
		if err != nil {
			t.Fatal(err)
		}
		checktest.Near(t, "round-trip drop", dp, c.dp, 1e-14)
		a, err := OrificeArea(c.cd, q, c.dp, c.rho)
		if err != nil {
			t.Fatal(err)
		}
		checktest.Near(t, "round-trip area", a, c.a, 1e-14)
	}
	// Zero drop, zero flow.
	if q, err := OrificeFlow(0.61, 1e-6, 0, 870); err != nil || q != 0 {
		t.Errorf("OrificeFlow at no drop = %v, %v", q, err)
	}
}

// SharpEdgedCd against the free-streamline contraction of a sharp-edged
// slot, π/(π+2) = 0.6110 (von Mises; Merritt, Hydraulic Control Systems,
// 1967, from memory), to the two digits the constant carries.
func TestSharpEdgedCd(t *testing.T) {
	if c := math.Pi / (math.Pi + 2); math.Abs(SharpEdgedCd-c) > 0.0011 {
		t.Errorf("SharpEdgedCd = %v; π/(π+2) = %.4f", SharpEdgedCd, c)
	}
	if SharpEdgedCd < 0.6 || SharpEdgedCd > 0.62 {
		t.Errorf("SharpEdgedCd = %v, outside the common 0.6–0.62", SharpEdgedCd)
	}
}

// Kv ⇄ Cv from the unit definitions: Cv/Kv = (m³/h ÷ gpm)·√(psi/bar).
// GNU units 2.22: units -t -o %.17g '1 m^3/hr * sqrt(psi/bar)' 'gal/min'
// → 1.1560992283536564; IEC 60534-1 and valve literature print 1.156
// (from memory).
func TestKvCv(t *testing.T) {
	checktest.Near(t, "Cv of Kv 1", float64(Kv(1).Cv()), 1.1560992283536564, 1e-15)
	checktest.Near(t, "Cv/Kv vs GNU units", float64(Kv(1).Cv()), checktest.GNUUnitsValue(t, checktest.GNUUnits(t), "1 m^3/hr * sqrt(psi/bar)", "gal/min"), 1e-15)
	if c := float64(Kv(1).Cv()); math.Round(c*1000)/1000 != 1.156 {
		t.Errorf("Cv/Kv = %v; the trade prints 1.156", c)
	}
	checktest.Near(t, "Kv of Cv 1.156…", float64(Kv(2.5).Cv().Kv()), 2.5, 1e-15)
	// The definitions themselves: Kv 1 passes 1 m³/h of water at 1 bar;
	// Cv 1 passes 1 US gpm of water at 1 psi.
	q, err := Kv(1).Flow(units.Bar, ReferenceDensity)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "Kv 1 at 1 bar", q.CubicMetresPerHour(), 1, 1e-15)
	q, err = Cv(1).Kv().Flow(units.PSI, ReferenceDensity)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "Cv 1 at 1 psi", q.USGallonsPerMinute(), 1, 1e-15)
	// Oil of 870 kg/m³ through Kv 4 at 5 bar: 4·√(5·1000/870) = 9.5893 m³/h.
	q, _ = Kv(4).Flow(5*units.Bar, 870)
	checktest.Near(t, "oil through Kv 4", q.CubicMetresPerHour(), 4*math.Sqrt(5*1000.0/870), 1e-15)
	dp, _ := Kv(4).Drop(q, 870)
	checktest.Near(t, "drop round trip", dp, 5*units.Bar, 1e-14)
	k, err := KvFor(q, 5*units.Bar, 870)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "KvFor round trip", float64(k), 4, 1e-14)
	// Equivalent area Cd·A of Kv 1: (1 m³/h)·√(1000/(2·10⁵)) = 19.64 mm².
	a, _ := Kv(1).Area()
	checktest.Near(t, "Cd·A of Kv 1", float64(a), 1.0/3600*math.Sqrt(1000/2e5), 1e-15)
}

// ScaleDrop against the two laws it stands for: the orifice equation
// (turbulent) and Hagen–Poiseuille, Δp = 128·μ·L·Q/(π·d⁴), for a laminar
// passage (any textbook of fluid mechanics).
func TestScaleDrop(t *testing.T) {
	mm := units.Millimetre
	a := units.CircleArea(5 * mm)
	dp0, _ := OrificeDrop(0.61, a, 40*units.LitrePerMinute, 850)
	ref := DropPoint{Flow: 40 * units.LitrePerMinute, Drop: dp0, Density: 850, Viscosity: 32 * units.SquareMillimetrePerSecond}
	got, err := ScaleDrop(ref, Turbulent, 60*units.LitrePerMinute, 900, 0)
	if err != nil {
		t.Fatal(err)
	}
	want, _ := OrificeDrop(0.61, a, 60*units.LitrePerMinute, 900)
	checktest.Near(t, "turbulent scaling", got, want, 1e-14)

	hp := func(q units.Flow, rho units.Density, nu units.KinematicViscosity) units.Pressure {
		d, l := 2e-3, 0.1
		return units.Pressure(128 * float64(nu) * float64(rho) * l * float64(q) / (math.Pi * math.Pow(d, 4)))
	}
	cold := 400 * units.SquareMillimetrePerSecond
	ref = DropPoint{Flow: 2 * units.LitrePerMinute, Drop: hp(2*units.LitrePerMinute, 870, 46e-6), Density: 870, Viscosity: 46e-6}
	got, err = ScaleDrop(ref, Laminar, 3*units.LitrePerMinute, 890, cold)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "laminar scaling", got, hp(3*units.LitrePerMinute, 890, cold), 1e-14)

	_, err = ScaleDrop(ref, Laminar, 1e-4, 870, 0)
	checktest.RangeErrorIn(t, err, "valve.ScaleDrop", "nu")
	_, err = ScaleDrop(DropPoint{Flow: 1e-3, Drop: 1e5, Density: 870}, Laminar, 1e-4, 870, 1e-5)
	checktest.RangeErrorIn(t, err, "valve.ScaleDrop", "ref.Viscosity")
	_, err = ScaleDrop(ref, 5, 1e-4, 870, 1e-5)
	checktest.RangeErrorIn(t, err, "valve.ScaleDrop", "regime")
	_, err = ScaleDrop(DropPoint{Drop: 1e5, Density: 870}, Turbulent, 1e-4, 870, 0)
	checktest.RangeErrorIn(t, err, "valve.ScaleDrop", "ref.Flow")
	_, err = ScaleDrop(ref, Turbulent, -1, 870, 0)
	checktest.RangeErrorIn(t, err, "valve.ScaleDrop", "q")
}

func TestOrificeBadInput(t *testing.T) {
	nan := math.NaN()
	for _, c := range []struct {
		name, fn, param string
		err             error
	}{
		{"cd 0", "valve.OrificeFlow", "cd", second(OrificeFlow(0, 1e-6, 1e5, 870))},
		{"cd above 1", "valve.OrificeFlow", "cd", second(OrificeFlow(1.1, 1e-6, 1e5, 870))},
		{"area 0", "valve.OrificeFlow", "a", second(OrificeFlow(0.61, 0, 1e5, 870))},
		{"negative drop", "valve.OrificeFlow", "dp", second(OrificeFlow(0.61, 1e-6, -1, 870))},
		{"NaN density", "valve.OrificeFlow", "rho", second(OrificeFlow(0.61, 1e-6, 1e5, units.Density(nan)))},
		{"negative flow", "valve.OrificeDrop", "q", second(OrificeDrop(0.61, 1e-6, -1, 870))},
		{"zero drop for an area", "valve.OrificeArea", "dp", second(OrificeArea(0.61, 1e-4, 0, 870))},
		{"overflow", "valve.OrificeDrop", "drop", second(OrificeDrop(1e-300, 1e-300, 1e300, 870))},
		{"Kv 0", "valve.Kv.Flow", "k", second(Kv(0).Flow(1e5, 870))},
		{"Kv drop, negative flow", "valve.Kv.Drop", "q", second(Kv(1).Drop(-1, 870))},
		{"KvFor zero flow", "valve.KvFor", "q", second(KvFor(0, 1e5, 870))},
		{"Kv area of NaN", "valve.Kv.Area", "k", second(Kv(nan).Area())},
	} {
		checktest.RangeErrorIn(t, c.err, c.fn, c.param)
	}
	if q, err := OrificeFlow(0, 1e-6, 1e5, 870); q != 0 || err == nil {
		t.Errorf("OrificeFlow with a bad cd = %v, %v; want 0 and an error", q, err)
	}
}

func second[T any](_ T, err error) error { return err }

func TestOrificeAllocations(t *testing.T) {
	ref := DropPoint{Flow: 1e-3, Drop: 5e5, Density: 870, Viscosity: 4.6e-5}
	if n := testing.AllocsPerRun(100, func() {
		_, _ = OrificeFlow(0.61, 1e-5, 5e6, 870)
		_, _ = OrificeDrop(0.61, 1e-5, 1e-3, 870)
		_, _ = OrificeArea(0.61, 1e-3, 5e6, 870)
		_, _ = Kv(3).Flow(5e5, 870)
		_, _ = KvFor(1e-3, 5e5, 870)
		_, _ = ScaleDrop(ref, Laminar, 2e-3, 880, 1e-4)
	}); n != 0 {
		t.Errorf("orifice, Kv and scaling calls allocate %v times per run; want 0", n)
	}
}

// A coefficient that overflows is an error, not +Inf beside nil: 1e308 m³/s
// at 1 Pa needs an area of 1e308 m², and Kv is that over Kv 1's 19.6 mm².
func TestKvForOverflow(t *testing.T) {
	k, err := KvFor(1e308, 1, 2)
	if checktest.RangeErrorIn(t, err, "valve.KvFor", "coefficient"); k != 0 {
		t.Errorf("KvFor overflowing = %v beside the error; want 0", k)
	}
}
