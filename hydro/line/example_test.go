package line_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/line"
	"github.com/hydrosize/hydrosize/units"
)

func ExampleFrictionFactor() {
	// A baling press pressure tube: Re 25 000 in drawn tube of 20 mm bore.
	f, _ := line.FrictionFactor(25000, float64(line.DrawnTubing/(20*units.Millimetre)))
	fmt.Printf("f = %.6f\n", f)
	// Output: f = 0.024705
}

func ExampleMinBore() {
	// The baling press pump delivers 95 L/min; its pressure line at the
	// default limit needs at least this bore.
	lim := line.PressureLine.Limit()
	d, _ := line.MinBore(95*units.LitrePerMinute, lim.Max)
	fmt.Printf("%.1f mm at %v (%v)\n", d.Millimetres(), lim.Max, lim.Rule)
	// Output: 18.3 mm at 6 m/s (common practice: pressure line velocity 3–6 m/s, upper end)
}

func ExamplePath_Drop() {
	// The return path of a log splitter: tube, elbows, a return filter
	// known from its data sheet, and the exit into the tank.
	mm := units.Millimetre
	ret := line.Path{Name: "splitter return", Elements: []line.Element{
		line.Pipe{Name: "return tube", Length: 3.5, Bore: 19 * mm, Roughness: line.DrawnTubing},
		line.Fitting{Name: "elbows", Kind: line.Elbow90, Bore: 19 * mm, Count: 3},
		line.Rated{Name: "return filter", Drop: 0.35 * units.Bar, Flow: 60 * units.LitrePerMinute,
			Law: line.Viscous, Viscosity: 32 * units.SquareMillimetrePerSecond, Bypass: 2.5 * units.Bar},
		line.Fitting{Name: "tank exit", Kind: line.Exit, Bore: 19 * mm},
	}}
	oil, _ := fluid.Typical(fluid.HM, fluid.VG46)
	state, _ := line.OilAt(oil, units.TemperatureFromCelsius(45))
	d, _ := ret.Drop(45*units.LitrePerMinute, state)
	for _, e := range d.Elements {
		fmt.Printf("%-14s %5.3f bar  inlet %5.3f bar\n", e.Name, e.Drop.Bar(), e.Inlet.Bar())
	}
	fmt.Printf("total %.2f bar, %v regime in the tube\n", d.Total.Bar(), d.Elements[0].Regime)
	// Output:
	// return tube    0.259 bar  inlet 0.658 bar
	// elbows         0.066 bar  inlet 0.398 bar
	// return filter  0.302 bar  inlet 0.332 bar
	// tank exit      0.030 bar  inlet 0.030 bar
	// total 0.66 bar, laminar regime in the tube
}

func ExampleColdStart() {
	// The same log splitter return path at a −15 °C morning start.
	mm := units.Millimetre
	ret := line.Path{Name: "splitter return", Elements: []line.Element{
		line.Pipe{Name: "return tube", Length: 3.5, Bore: 19 * mm, Roughness: line.DrawnTubing},
		line.Rated{Name: "return filter", Drop: 0.35 * units.Bar, Flow: 60 * units.LitrePerMinute,
			Law: line.Viscous, Viscosity: 32 * units.SquareMillimetrePerSecond, Bypass: 2.5 * units.Bar, Rating: 10 * units.Bar},
	}}
	oil, _ := fluid.Typical(fluid.HM, fluid.VG46)
	s, _ := line.ColdStart(ret, 45*units.LitrePerMinute, oil, units.TemperatureFromCelsius(-15), units.TemperatureFromCelsius(45))
	for _, f := range s.Findings {
		fmt.Println(f)
	}
	// Output:
	// notice (cold start): at -15 °C the path splitter return drops 21.35 bar, 38.03 times its 0.5614 bar at 45 °C
	// caution (filter bypass): return filter would drop 21.12 bar at this flow, above its bypass setting of 2.5 bar: the bypass opens and unfiltered oil passes
}

func ExampleHoseRun_Assess() {
	// The slew hose of a forestry crane runs past the operator's seat.
	a, _ := line.HoseRun{Name: "the slew hose", Pressure: 230 * units.Bar, Burst: 1000 * units.Bar, NearPeople: true}.Assess()
	fmt.Println(a.Rating.Working, a.Check.OK())
	for _, f := range a.Findings.Sorted() {
		fmt.Println(f.Severity, f.Hazard)
	}
	// Output:
	// 250 bar true
	// warning injection
	// warning burst
	// notice none
}

func ExampleClosure_Surge() {
	// A test-rig clamp valve slams shut on its 12 m supply tube.
	oil, _ := fluid.Typical(fluid.HM, fluid.VG32)
	c := line.Closure{Fluid: oil, Temperature: units.TemperatureFromCelsius(40), Pressure: 160 * units.Bar,
		Velocity: 4.5 * units.MetrePerSecond, Length: 12,
		Wall:   line.Wall{Bore: 16 * units.Millimetre, OD: 20 * units.Millimetre, Modulus: 206 * units.Gigapascal, Poisson: 0.3},
		Rating: 250 * units.Bar}
	s, _ := c.Surge()
	fmt.Printf("a = %.0f m/s, rise %.1f bar, peak %.1f bar, closures under %v\n",
		s.WaveSpeed.MetresPerSecond(), s.Rise.Bar(), s.Peak.Bar(), s.RoundTrip.Round(1e3))
	fmt.Println(s.Check.OK())
	// Output:
	// a = 1423 m/s, rise 55.4 bar, peak 215.4 bar, closures under 16.865ms
	// true
}

func ExampleBarlow() {
	// A 25 × 2.5 mm scissor-lift pressure tube, 450 MPa tensile strength,
	// safety factor 4, rated on the outside diameter.
	r, _ := line.Barlow(25*units.Millimetre, 2.5*units.Millimetre, 450*units.Megapascal, 4, line.OutsideDiameter)
	fmt.Println(r.Working, r.Rule)
	// Output: 225 bar physics: Barlow, p = 2·S·t/(D·SF) on the outside diameter
}

func ExampleSelectTube() {
	// The baling press pressure line: 95 L/min at up to 6 m/s, 250 bar in
	// S-series tube of 410 MPa steel with a safety factor of 4 (the
	// 25 × 3 mm tube has the bore but holds only 246 bar).
	c, _ := line.SelectTube(line.TubeNeed{Flow: 95 * units.LitrePerMinute, Limit: line.PressureLine.Limit(),
		Class: components.HeavyTube, Pressure: 250 * units.Bar, Strength: 410 * units.Megapascal, Safety: 4})
	fmt.Printf("%v: bore %.1f mm for %.1f mm needed, %.2f m/s, wall good for %.0f bar\n",
		c.Tube, c.Bore.Chosen.Millimetres(), c.Bore.Required.Millimetres(), c.Velocity.Value.MetresPerSecond(), c.Wall.Working.Bar())
	// Output: 30 × 5 mm (S): bore 20.0 mm for 18.3 mm needed, 5.04 m/s, wall good for 342 bar
}

func ExampleSelectHose() {
	// The forestry crane's pump suction hose: 40 L/min at up to 1.2 m/s.
	c, _ := line.SelectHose(40*units.LitrePerMinute, line.SuctionLine.Limit())
	fmt.Printf("dash %v, %.2f m/s\n", c.Size, c.Velocity.Value.MetresPerSecond())
	// Output: dash -20, 0.84 m/s
}
