package valve

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// twoToOne is a 2:1 cylinder: a 100 mm bore and a rod of 100/√2 mm, so the
// annulus is half the cap area; rated 350 bar (test data).
func twoToOne() actuator.Cylinder {
	mm := units.Millimetre
	return actuator.Cylinder{Bore: 100 * mm, Rod: units.Length(100/math.Sqrt2) * mm, Stroke: 500 * mm, Rating: 350 * units.Bar}
}

func TestMeteringTraits(t *testing.T) {
	for _, c := range []struct {
		m                              Metering
		holds, intensifies, followLoad bool
	}{{MeterIn, false, false, false}, {MeterOut, true, true, false}, {BleedOff, false, false, true}} {
		tr, err := c.m.Traits()
		if err != nil || tr.HoldsOverrunning != c.holds || tr.Intensifies != c.intensifies || tr.FollowsLoad != c.followLoad {
			t.Errorf("%v: %+v, %v", c.m, tr, err)
		}
	}
	if _, err := Metering(0).Traits(); err == nil {
		t.Error("the unset Metering has traits")
	}
}

// Meter-out on the annulus of the 2:1 cylinder extending at a 200 bar
// relief holds 400 bar on the rod side, as the force balance
// p_out = p·A_cap/A_ann says (hydro/actuator's example of the same): above
// the cylinder's 350 bar and the valve's 315 bar. An overrunning 20 kN
// adds 20 kN/A_ann.
func TestCheckMeteringMeterOut(t *testing.T) {
	bar := units.Bar
	mc, err := CheckMetering(MeteringNeed{Metering: MeterOut, Cylinder: twoToOne(), Stroke: actuator.Extend,
		Supply: 200 * bar, ValveRating: 315 * bar})
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "rod-side pressure", mc.Outlet, 400*bar, 1e-13)
	checktest.Near(t, "intensification", mc.Intensified, 2, 1e-13)
	if mc.Cylinder.OK() || mc.Valve.OK() {
		t.Errorf("checks %+v, %+v; want both failed", mc.Cylinder, mc.Valve)
	}
	if len(mc.Findings.Topic("actuator.intensification")) != 1 || len(mc.Findings.Topic("valve.meter-out-rating")) != 1 {
		t.Errorf("findings %v; want the cylinder's and the valve's danger", mc.Findings)
	}
	for _, f := range mc.Findings {
		if f.Severity != components.Danger || f.Hazard != components.Overpressure {
			t.Errorf("finding %v: want an overpressure danger", f)
		}
	}
	cyl := twoToOne()
	mc, _ = CheckMetering(MeteringNeed{Metering: MeterOut, Cylinder: cyl, Stroke: actuator.Extend, Supply: 100 * bar,
		Resist: -20 * units.Kilonewton})
	checktest.Near(t, "with an overrunning load", mc.Outlet, 200*bar+units.Pressure(20e3/float64(cyl.AnnulusArea())), 1e-13)
}

func TestCheckMeteringOverrunning(t *testing.T) {
	for _, m := range []Metering{MeterIn, BleedOff} {
		mc, err := CheckMetering(MeteringNeed{Metering: m, Cylinder: twoToOne(), Stroke: actuator.Retract,
			Supply: 150 * units.Bar, Resist: -12 * units.Kilonewton})
		if err != nil {
			t.Fatal(err)
		}
		if f := mc.Findings.Topic("valve.metering-overrun"); len(f) != 1 || f[0].Hazard != components.Runaway || f[0].Severity != components.Warning {
			t.Errorf("%v with an overrunning load: %v; want a runaway warning", m, mc.Findings)
		}
		mc, _ = CheckMetering(MeteringNeed{Metering: m, Cylinder: twoToOne(), Stroke: actuator.Retract, Supply: 150 * units.Bar,
			Resist: 12 * units.Kilonewton})
		if len(mc.Findings) != 0 || mc.Outlet != 0 {
			t.Errorf("%v with a resisting load: %+v", m, mc)
		}
	}
}

func TestCheckMeteringBadInput(t *testing.T) {
	good := MeteringNeed{Metering: MeterOut, Cylinder: twoToOne(), Supply: 2e7}
	for param, mut := range map[string]func(*MeteringNeed){
		"Metering":        func(n *MeteringNeed) { n.Metering = 0 },
		"Supply":          func(n *MeteringNeed) { n.Supply = 0 },
		"Resist":          func(n *MeteringNeed) { n.Resist = units.Force(math.NaN()) },
		"ValveRating":     func(n *MeteringNeed) { n.ValveRating = -1 },
		"Cylinder.Rod":    func(n *MeteringNeed) { n.Cylinder.Rod = n.Cylinder.Bore },
		"Cylinder.Rating": func(n *MeteringNeed) { n.Cylinder.Rating = 0 },
	} {
		n := good
		mut(&n)
		mc, err := CheckMetering(n)
		if checktest.RangeErrorIn(t, err, "valve.CheckMetering", param); mc.Outlet != 0 || mc.Findings != nil {
			t.Errorf("%s: %+v; want the zero result", param, mc)
		}
	}
}

func TestLoadHolding(t *testing.T) {
	for _, c := range []struct {
		name   string
		load   Load
		topics map[string]components.Severity
	}{
		{"nothing holds a suspended load", Load{Suspended: true},
			map[string]components.Severity{"valve.no-holding": components.Danger}},
		{"a plain flow control on an overhung load", Load{Suspended: true, Overrunning: true, Holder: HeldByFlowControl, AtPort: true},
			map[string]components.Severity{"valve.flow-control-overhung": components.Warning}},
		{"a pilot check on an overrunning load", Load{Suspended: true, Overrunning: true, Holder: HeldByPilotCheck, AtPort: true, Center: FloatCenter},
			map[string]components.Severity{"valve.pilot-check-overrunning": components.Warning}},
		{"a counterbalance down a hose", Load{Suspended: true, Overrunning: true, Holder: HeldByCounterbalance},
			map[string]components.Severity{"valve.hose-burst": components.Warning}},
		{"a counterbalance down a hose with a hose-burst valve", Load{Suspended: true, Holder: HeldByCounterbalance, HoseBurstValve: true},
			map[string]components.Severity{}},
		{"a counterbalance behind a closed center", Load{Suspended: true, Overrunning: true, Holder: HeldByCounterbalance, AtPort: true, Center: ClosedCenter},
			map[string]components.Severity{"valve.pilot-trapped": components.Caution}},
		// A regenerative center joins the pump to both actuator ports: the
		// pilot is not trapped but pressurised, and the actuator moves.
		{"a counterbalance behind a regenerative center", Load{Suspended: true, Overrunning: true, Holder: HeldByCounterbalance, AtPort: true, Center: RegenerativeCenter},
			map[string]components.Severity{"valve.pilot-pressurised": components.Warning}},
		{"done right", Load{Suspended: true, Overrunning: true, Holder: HeldByCounterbalance, AtPort: true, Center: FloatCenter},
			map[string]components.Severity{}},
		{"a resisting load needs nothing", Load{}, map[string]components.Severity{}},
	} {
		fs, err := LoadHolding(c.load)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if len(fs) != len(c.topics) {
			t.Errorf("%s: %d findings %v; want %v", c.name, len(fs), fs, c.topics)
			continue
		}
		for _, f := range fs {
			if sev, ok := c.topics[f.Topic]; !ok || f.Severity != sev {
				t.Errorf("%s: unexpected %s %v", c.name, f.Topic, f)
			}
		}
	}
	// A load that only overruns (a slew down a slope) runs away rather than falls.
	fs, _ := LoadHolding(Load{Overrunning: true})
	if len(fs) != 1 || fs[0].Hazard != components.Runaway {
		t.Errorf("overrunning, unheld: %v", fs)
	}
	_, err := LoadHolding(Load{Holder: 9})
	checktest.RangeErrorIn(t, err, "valve.LoadHolding", "Holder")
	_, err = LoadHolding(Load{Center: 9})
	checktest.RangeErrorIn(t, err, "valve.LoadHolding", "Center")
}

// The intensification ratio of a near-zero supply overflows: CheckMetering
// fails in its own name instead of returning +Inf.
func TestCheckMeteringRatioOverflow(t *testing.T) {
	mc, err := CheckMetering(MeteringNeed{Metering: MeterOut, Cylinder: twoToOne(), Stroke: actuator.Extend,
		Supply: 5e-324, Resist: -1e3})
	if checktest.RangeErrorIn(t, err, "valve.CheckMetering", "Ratio"); mc.Intensified != 0 || mc.Findings != nil {
		t.Errorf("CheckMetering = %+v beside the error; want the zero value", mc)
	}
}
