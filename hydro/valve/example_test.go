package valve_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

// The scissor lift table's directional valve has a float center: in
// neutral the pump port is blocked and both cylinder ports drain to tank.
func ExampleCenter_Traits() {
	tr, err := valve.FloatCenter.Traits()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("pump port:", tr.Pump, "| cylinder ports:", tr.Actuator)
	fmt.Println("deadheads a fixed pump:", tr.Deadheads(), "| vents a load-holding pilot:", tr.Vents())
	// Output:
	// pump port: blocked | cylinder ports: to tank
	// deadheads a fixed pump: true | vents a load-holding pilot: true
}

func ExampleParseCenter() {
	c, err := valve.ParseCenter("Tandem center")
	fmt.Println(c, err)
	_, err = valve.ParseCenter("motor spool")
	fmt.Println(err)
	// Output:
	// tandem <nil>
	// valve.ParseCenter: parsing "motor spool" at offset 0: invalid syntax: want one of closed, open, tandem, float, regenerative
}

// A test-rig clamp is slowed by a 1.2 mm sharp-edged orifice with 40 bar
// across it, in oil of 870 kg/m³ (demo data).
func ExampleOrificeFlow() {
	q, err := valve.OrificeFlow(valve.SharpEdgedCd, units.CircleArea(1.2*units.Millimetre), 40*units.Bar, 870*units.KilogramPerCubicMetre)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.2f (%.3f gpm)\n", q, q.USGallonsPerMinute())
	// Output:
	// 3.97 L/min (1.049 gpm)
}

// A baling press's directional valve is listed at Kv 2.4: its Cv, and its
// drop at 60 L/min of oil.
func ExampleKv() {
	k := valve.Kv(2.4)
	dp, err := k.Drop(60*units.LitrePerMinute, 870*units.KilogramPerCubicMetre)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%v = %v; %.2f at 60 L/min\n", k, k.Cv(), dp)
	// Output:
	// Kv 2.4 = Cv 2.775; 1.96 bar at 60 L/min
}

// A forestry crane's boom cylinder (100 mm bore, 56 mm rod; demo data)
// holds its load on the cap side at 150 bar through a 4.5:1 counterbalance
// valve with 5 bar in the return line.
func ExampleCounterbalanceSetting() {
	mm := units.Millimetre
	c, err := valve.Coupling(actuator.Cylinder{Bore: 100 * mm, Rod: 56 * mm, Stroke: 800 * mm}, actuator.Retract)
	if err != nil {
		fmt.Println(err)
		return
	}
	cb, err := valve.CounterbalanceSetting(valve.CounterbalanceNeed{Load: 150 * units.Bar, PilotRatio: 4.5,
		Back: 5 * units.Bar, Coupling: c, Flow: 40 * units.LitrePerMinute})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("set at %v (%.1f ×, %v)\n", cb.Setting, cb.Ratio, cb.RatioRule)
	fmt.Printf("opens at %.2f of pilot; lowering 40 L/min throttles %.1f: %.2f of heat\n", cb.Pilot, cb.Throttled, cb.Heat)
	// Output:
	// set at 195 bar (1.3 ×, common practice: counterbalance set at least 1.3 × the load-induced pressure)
	// opens at 9.64 bar of pilot; lowering 40 L/min throttles 151.6 bar: 10.11 kW of heat
}

// A scissor lift table holds its platform with a 4:1 pilot-operated check
// at 90 bar (demo data).
func ExamplePilotCheckPressure() {
	pc, err := valve.PilotCheckPressure(valve.PilotCheckNeed{Load: 90 * units.Bar, Ratio: 4, Back: 3 * units.Bar,
		Cracking: 1 * units.Bar})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("opens at %.2f\n", pc.Pilot)
	// Output:
	// opens at 25.00 bar
}

// The baling press ram's return stroke is metered out on its cap side:
// the annulus pushes at the 210 bar relief (demo data).
func ExampleCheckMetering() {
	mm := units.Millimetre
	mc, err := valve.CheckMetering(valve.MeteringNeed{Metering: valve.MeterOut,
		Cylinder: actuator.Cylinder{Bore: 125 * mm, Rod: 90 * mm, Stroke: 900 * mm, Rating: 250 * units.Bar},
		Stroke:   actuator.Retract, Supply: 210 * units.Bar, ValveRating: 315 * units.Bar})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("the cap side holds %.1f (%.2f × supply); cylinder ok %v, valve ok %v\n",
		mc.Outlet, mc.Intensified, mc.Cylinder.OK(), mc.Valve.OK())
	// Output:
	// the cap side holds 101.1 bar (0.48 × supply); cylinder ok true, valve ok true
}

// The scissor lift table's platform hangs on its cylinder: the
// pilot-operated check sits down a hose, behind a closed-center valve.
func ExampleLoadHolding() {
	fs, err := valve.LoadHolding(valve.Load{Name: "the platform", Suspended: true, Overrunning: true,
		Holder: valve.HeldByPilotCheck, Center: valve.ClosedCenter})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, f := range fs.Sorted() {
		fmt.Println(f)
	}
	// Output:
	// warning (runaway): a pilot-operated check holds the platform but does not control it coming down: as the load runs ahead the pilot pressure collapses and the valve chatters or lets go; use a counterbalance valve
	// warning (burst): the pilot-operated check sits down a line from the cylinder holding the platform: a burst between them drops the load; mount it on the cylinder port or fit a hose-burst valve there
	// caution (suspended load): with a closed center the actuator ports are blocked, so pilot pressure can stay trapped and hold the pilot-operated check open: the platform creeps; a float or open center vents it
}
