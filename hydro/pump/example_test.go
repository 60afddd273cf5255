package pump_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

// The fixed gear pump of a baling press power unit at its working pressure
// (demo data).
func ExamplePump_At() {
	p := pump.Pump{Displacement: 45 * units.CubicCentimetrePerRevolution, Speed: 1450 * units.RevolutionPerMinute,
		Volumetric: 0.95, Mechanical: 0.92}
	pt, err := p.At(180 * units.Bar)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.1f delivered, %.1f, %.2f at the shaft\n", pt.Flow, pt.Torque, pt.Shaft)
	fmt.Printf("%.3g gpm, %.3g lbf·ft, %.3g hp\n", pt.Flow.USGallonsPerMinute(), pt.Torque.PoundForceFeet(), pt.Shaft.Horsepower())
	fmt.Printf("overall efficiency %.3f; the pump itself heats the oil by %.2f\n", p.Overall(), pt.Loss())
	// Output:
	// 62.0 L/min delivered, 140.1 N·m, 21.28 kW at the shaft
	// 16.4 gpm, 103 lbf·ft, 28.5 hp
	// overall efficiency 0.874; the pump itself heats the oil by 2.68 kW
}

// A power-limited piston pump on a 22 kW forestry crane engine take-off
// (demo data): full flow up to the corner, then falling flow at constant
// shaft power, and at the 280 bar cut-off only the standby loss.
func ExamplePump_CornerPressure() {
	p := pump.Pump{Displacement: 71 * units.CubicCentimetrePerRevolution, Speed: 1800 * units.RevolutionPerMinute,
		Volumetric: 0.95, Mechanical: 0.93, Variable: true, Control: pump.PowerLimited, PowerLimit: 22 * units.Kilowatt,
		Cutoff: 280 * units.Bar}
	corner, _ := p.CornerPressure()
	fmt.Printf("corner at %.0f\n", corner)
	for _, bar := range []units.Pressure{50, 100, 200, 280} {
		pt, _ := p.At(bar * units.Bar)
		fmt.Printf("%v: %.1f, %.1f\n", pt.Pressure, pt.Flow, pt.Shaft)
	}
	// Output:
	// corner at 96 bar
	// 50 bar: 121.4 L/min, 11.5 kW
	// 100 bar: 116.4 L/min, 22.0 kW
	// 200 bar: 55.0 L/min, 22.0 kW
	// 280 bar: 0.0 L/min, 3.2 kW
}

// Size the baling press pump: the margin is reported with its rule.
func ExampleSize() {
	s, err := pump.Size(pump.Need{Flow: 55 * units.LitrePerMinute, Pressure: 180 * units.Bar,
		Speed: 1450 * units.RevolutionPerMinute, Volumetric: 0.95})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("margin %.0f %% (%v)\n", 100*s.Margin, s.MarginRule)
	fmt.Printf("ask for %.2f at %v\n", s.RatedFlow, s.RatedPressure)
	fmt.Printf("need %.2f: choose %v from %s\n", s.Displacement.Required, s.Displacement.Chosen, s.Displacement.Series)
	fmt.Printf("it delivers %.1f\n", s.Delivered)
	// Output:
	// margin 25 % (common practice: pump rated 20–30 % above the computed flow and pressure)
	// ask for 68.75 L/min at 225 bar
	// need 49.91 cm³/rev: choose 50 cm³/rev from ISO 3 R20 pump displacements, 1–1000 cm³/rev
	// it delivers 68.9 L/min
}

// The same baling press pump behind closed-center valves, with a clamp
// that takes less than the pump gives.
func ExamplePump_Compatibility() {
	p := pump.Pump{Displacement: 45 * units.CubicCentimetrePerRevolution, Speed: 1450 * units.RevolutionPerMinute,
		Volumetric: 0.95, Mechanical: 0.92}
	fs, err := p.Compatibility(pump.Circuit{Center: valve.ClosedCenter, Relief: 210 * units.Bar,
		Demands: []pump.Demand{{Name: "the clamp", Pressure: 120 * units.Bar, Flow: 40 * units.LitrePerMinute}}})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, f := range fs.Sorted() {
		fmt.Println(f)
	}
	// Output:
	// warning (hot surface): with every valve centred the fixed pump's 61.99 L/min has nowhere to go but over the relief at 210 bar: all 24.82 kW of shaft power becomes heat and the oil overheats; use an open or tandem center, an unloading valve, or a pressure-compensated pump
	// caution (hot surface): while the clamp moves at 120 bar it takes 40 L/min of the pump's 61.99 L/min: the other 21.99 L/min passes the relief at 210 bar, and with the valve throttling the rest that is 13.7 kW of heat
}

// A log splitter's pump lifts its oil 0.4 m at a site 1800 m up, on a cold
// start (demo data).
func ExampleCheckInlet() {
	amb, err := pump.SiteAltitude(1800 * units.Metre)
	if err != nil {
		fmt.Println(err)
		return
	}
	r, err := pump.CheckInlet(pump.Inlet{Ambient: amb, Head: -0.4 * units.Metre, Density: 870 * units.KilogramPerCubicMetre,
		Loss: 0.12 * units.Bar, Minimum: 0.8 * units.BarAbsolute})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("ambient %.3f (%v)\n", amb.Pressure, amb.Rule)
	fmt.Printf("inlet %.3f, minimum %.3f: ok %v\n", r.Pressure, r.Check.Limit, r.Check.OK())
	for _, f := range r.Findings {
		fmt.Println(f.Severity, f.Hazard)
	}
	// Output:
	// ambient 0.815 bara (standard: ISO 2533:1975 standard atmosphere, troposphere, at 1800 m)
	// inlet 0.661 bara, minimum 0.800 bara: ok false
	// warning cavitation
}
