package pump

import (
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// finding returns the one finding under topic, failing the test unless
// there is exactly one.
func finding(t *testing.T, fs components.Findings, topic string) components.Finding {
	t.Helper()
	got := fs.Topic(topic)
	if len(got) != 1 {
		t.Fatalf("%d findings under %q; want 1. All: %v", len(got), topic, fs)
	}
	return got[0]
}

// power returns the last power a finding quotes: its heat.
func power(t *testing.T, f components.Finding) units.Power {
	t.Helper()
	var p units.Power
	found := false
	for _, a := range f.Args() {
		if v, ok := a.(units.Power); ok {
			p, found = v, true
		}
	}
	if !found {
		t.Fatalf("finding %q quotes no power", f.Topic)
	}
	return p
}

func compensated() Pump {
	p := baler()
	p.Variable, p.Control, p.Cutoff = true, PressureCompensated, 200*units.Bar
	return p
}

func loadSensing() Pump {
	p := baler()
	p.Variable, p.Control, p.Cutoff, p.Margin = true, LoadSensing, 250*units.Bar, 20*units.Bar
	return p
}

// With every valve centred. The baler pump delivers 45 cm³ × 1450 rpm ×
// 0.95 = 61.9875 L/min; its shaft power at p is D·n·p/η_hm =
// 45 cm³ × 1450 rpm × p / 0.92: 24 823.4 W at 210 bar, 709.2 W at 6 bar.
func TestCompatibilityCentred(t *testing.T) {
	relief := 210 * units.Bar
	fs, err := baler().Compatibility(Circuit{Center: valve.ClosedCenter, Relief: relief})
	if err != nil {
		t.Fatal(err)
	}
	f := finding(t, fs, "pump.deadhead")
	if f.Severity != components.Warning || f.Hazard != components.HotSurface {
		t.Errorf("deadhead: %v", f)
	}
	checktest.Near(t, "deadhead heat", power(t, f), 45e-6*1450/60*210e5/0.92, 1e-14)

	fs, _ = baler().Compatibility(Circuit{Center: valve.ClosedCenter, Relief: relief, Unloading: true})
	if len(fs.Topic("pump.deadhead")) != 0 {
		t.Errorf("an unloaded fixed pump does not deadhead: %v", fs)
	}
	fs, _ = baler().Compatibility(Circuit{Center: valve.TandemCenter, Relief: relief, CenterDrop: 6 * units.Bar})
	f = finding(t, fs, "pump.through-center")
	checktest.Near(t, "open-center heat", power(t, f), 45e-6*1450/60*6e5/0.92, 1e-14)

	fs, _ = compensated().Compatibility(Circuit{Center: valve.OpenCenter, Relief: 220 * units.Bar, CenterDrop: 6 * units.Bar})
	if f := finding(t, fs, "pump.open-center-compensated"); f.Severity != components.Caution {
		t.Errorf("open center on a compensated pump: %v", f)
	}
	fs, _ = compensated().Compatibility(Circuit{Center: valve.FloatCenter, Relief: 220 * units.Bar})
	f = finding(t, fs, "pump.standby")
	// Standby: 200 bar × 3.2625 L/min / 0.92 = 1182.1 W.
	checktest.Near(t, "standby heat", power(t, f), 200e5*45e-6*1450/60*0.05/0.92, 1e-14)

	fs, _ = loadSensing().Compatibility(Circuit{Center: valve.OpenCenter, Relief: 270 * units.Bar, CenterDrop: 5 * units.Bar})
	if f := finding(t, fs, "pump.open-center-load-sensing"); f.Severity != components.Caution || f.Hazard != components.HotSurface {
		t.Errorf("open center on a load-sensing pump: %v", f)
	}
	fs, _ = compensated().Compatibility(Circuit{Center: valve.ClosedCenter, Relief: 200 * units.Bar})
	finding(t, fs, "pump.cutoff-above-relief")

	fs, _ = baler().Compatibility(Circuit{Center: valve.RegenerativeCenter, Relief: relief})
	if f := finding(t, fs, "pump.regenerative-center"); f.Hazard != components.Runaway || f.Severity != components.Warning {
		t.Errorf("regenerative center: %v", f)
	}
	finding(t, fs, "pump.deadhead") // at stroke end the flow has nowhere to go
}

// A test-rig clamp takes 40 L/min at 120 bar from the 61.9875 L/min fixed
// pump; the rest, 21.9875 L/min, passes the 210 bar relief. The pump runs
// at 210 bar, so the heat is 210 bar × 61.9875 L/min − 120 bar × 40 L/min
// = 21 695.6 − 8000 = 13 695.6 W.
func TestCompatibilitySurplus(t *testing.T) {
	fs, err := baler().Compatibility(Circuit{Center: valve.TandemCenter, Relief: 210 * units.Bar, CenterDrop: 5 * units.Bar,
		Demands: []Demand{{Name: "clamp", Pressure: 120 * units.Bar, Flow: 40 * units.LitrePerMinute}}})
	if err != nil {
		t.Fatal(err)
	}
	f := finding(t, fs, "pump.surplus")
	checktest.Near(t, "surplus heat", power(t, f), 210e5*61.9875/60000-120e5*40.0/60000, 1e-13)
	// The same duty on a load-sensing pump costs only the margin: 20 bar × 40 L/min = 1333 W.
	fs, _ = loadSensing().Compatibility(Circuit{Center: valve.ClosedCenter, Relief: 270 * units.Bar,
		Demands: []Demand{{Name: "clamp", Pressure: 120 * units.Bar, Flow: 40 * units.LitrePerMinute}}})
	checktest.Near(t, "load-sensing metering heat", power(t, finding(t, fs, "pump.metering")), 20e5*40.0/60000, 1e-13)
}

// The same clamp on an open-center valve, metered by its spool as mobile
// valves are: the center stays partly open and bleeds the surplus
// 21.9875 L/min to tank at about the load's 120 bar, so the pump runs at
// 120 bar, not at the relief: 120 bar × 21.9875 L/min = 4397.5 W of heat
// (energy balance, Δp·Q). Moving together, the slew and boom of the
// sharing test bleed the surplus at the boom's 160 bar.
func TestCompatibilityBleedOff(t *testing.T) {
	clamp := Demand{Name: "clamp", Pressure: 120 * units.Bar, Flow: 40 * units.LitrePerMinute}
	fs, err := baler().Compatibility(Circuit{Center: valve.OpenCenter, Relief: 210 * units.Bar, CenterDrop: 5 * units.Bar,
		Demands: []Demand{clamp}})
	if err != nil {
		t.Fatal(err)
	}
	if len(fs.Topic("pump.surplus")) != 0 {
		t.Errorf("an open center sends no surplus over the relief: %v", fs)
	}
	checktest.Near(t, "bleed-off heat", power(t, finding(t, fs, "pump.bleed-off")), 120e5*21.9875/60000, 1e-13)
	slew := Demand{Name: "slew", Pressure: 80 * units.Bar, Flow: 20 * units.LitrePerMinute}
	boom := Demand{Name: "boom", Pressure: 160 * units.Bar, Flow: 35 * units.LitrePerMinute}
	fs, _ = baler().Compatibility(Circuit{Center: valve.OpenCenter, Relief: 210 * units.Bar, CenterDrop: 5 * units.Bar,
		Demands: []Demand{slew, boom}, Together: true})
	checktest.Near(t, "open-center sharing heat", power(t, finding(t, fs, "pump.sharing-heat")),
		(80e5*20+0*35)/60000+160e5*(61.9875-55)/60000, 1e-13)
}

// A forestry crane on a load-sensing pump (demo data): slew 20 L/min at
// 80 bar and boom 35 L/min at 160 bar together. The pump holds 160 + 20 =
// 180 bar; the slew section throttles 100 bar and the boom section the
// 20 bar margin: (100 bar × 20 + 20 bar × 35) L/min = 4500 W.
func TestCompatibilitySharing(t *testing.T) {
	slew := Demand{Name: "slew", Pressure: 80 * units.Bar, Flow: 20 * units.LitrePerMinute}
	boom := Demand{Name: "boom", Pressure: 160 * units.Bar, Flow: 35 * units.LitrePerMinute}
	c := Circuit{Center: valve.ClosedCenter, Relief: 270 * units.Bar, Demands: []Demand{slew, boom}, Together: true}
	fs, err := loadSensing().Compatibility(c)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "sharing heat", power(t, finding(t, fs, "pump.sharing-heat")), (100e5*20+20e5*35)/60000.0, 1e-13)
	if len(fs.Topic("pump.saturated")) != 0 || len(fs.Topic("pump.parallel-starve")) != 0 {
		t.Errorf("55 L/min is within the pump's 61.99 L/min and a load-sensing pump shares: %v", fs)
	}
	// Add a 15 L/min grapple rotator: 70 L/min asked, more than the pump gives.
	c.Demands = append(c.Demands, Demand{Name: "rotator", Pressure: 60 * units.Bar, Flow: 15 * units.LitrePerMinute})
	fs, _ = loadSensing().Compatibility(c)
	finding(t, fs, "pump.saturated")

	// The slew and boom on the fixed pump: the slew moves first and the
	// boom waits; throttled to share, the pump's 61.9875 L/min exceeds the
	// 55 L/min asked, so it runs at the 210 bar relief: 210 bar ×
	// 61.9875 L/min − (80 × 20 + 160 × 35) bar·L/min = 21 695.6 − 12 000 W.
	c = Circuit{Center: valve.TandemCenter, Relief: 210 * units.Bar, CenterDrop: 5 * units.Bar, Demands: []Demand{slew, boom}, Together: true}
	fs, _ = baler().Compatibility(c)
	if f := finding(t, fs, "pump.parallel-starve"); f.Severity != components.Caution {
		t.Errorf("starving: %v", f)
	}
	checktest.Near(t, "fixed sharing heat", power(t, finding(t, fs, "pump.sharing-heat")), 210e5*61.9875/60000-(80e5*20+160e5*35)/60000, 1e-13)

	// The same valves in series add their loads: 240 bar, above the relief.
	// Stalled, the whole shaft power is heat: D·n·p/η_hm = 45 cm³ ×
	// 1450/60 s⁻¹ × 210 bar / 0.92 = 24 823.37 W (by hand).
	c.Series = true
	fs, _ = baler().Compatibility(c)
	stall := finding(t, fs, "pump.series-stall")
	if stall.Hazard != components.HotSurface {
		t.Errorf("series stall hazard = %v; want hot surface", stall.Hazard)
	}
	checktest.Near(t, "series stall heat", power(t, stall), 45e-6*1450/60*210e5/0.92, 1e-12)
	// Moving at 80 + 100 = 180 bar the pump's own loss is shaft − p·Q =
	// 45e-6 × 1450/60 × 180e5 × (1/0.92 − 0.95) = 2680.93 W (by hand).
	c.Demands[1].Pressure = 100 * units.Bar
	fs, _ = baler().Compatibility(c)
	checktest.Near(t, "series pump loss", power(t, finding(t, fs, "pump.series")), 45e-6*1450/60*180e5*(1/0.92-0.95), 1e-12)
}

func TestCompatibilityStall(t *testing.T) {
	fs, err := compensated().Compatibility(Circuit{Center: valve.ClosedCenter, Relief: 220 * units.Bar,
		Demands: []Demand{{Name: "press", Pressure: 205 * units.Bar, Flow: 10 * units.LitrePerMinute}}})
	if err != nil {
		t.Fatal(err)
	}
	f := finding(t, fs, "pump.stall")
	if args := f.Args(); args[2] != units.Pressure(200*units.Bar) {
		t.Errorf("stall limit %v; want the 200 bar compensator, below the relief", args[2])
	}
}

func TestCompatibilityBadInput(t *testing.T) {
	good := Circuit{Center: valve.ClosedCenter, Relief: 2e7, Demands: []Demand{{Pressure: 1e7, Flow: 1e-4}}}
	for param, mut := range map[string]func(*Circuit){
		"Center":              func(c *Circuit) { c.Center = 0 },
		"Relief":              func(c *Circuit) { c.Relief = 0 },
		"CenterDrop":          func(c *Circuit) { c.CenterDrop = -1 },
		"Demands[0].Flow":     func(c *Circuit) { c.Demands = []Demand{{Pressure: 1e7}} },
		"Demands[1].Pressure": func(c *Circuit) { c.Demands = []Demand{{Pressure: 1e7, Flow: 1e-4}, {Pressure: -1, Flow: 1e-4}} },
		"Series":              func(c *Circuit) { c.Series = true },
	} {
		c := good
		mut(&c)
		fs, err := baler().Compatibility(c)
		if checktest.RangeErrorIn(t, err, "pump.Pump.Compatibility", param); fs != nil {
			t.Errorf("%s: findings %v beside the error", param, fs)
		}
	}
	_, err := (Pump{}).Compatibility(good)
	checktest.RangeErrorIn(t, err, "pump.Pump.Compatibility", "Displacement")
}

// Saturated: two cylinders of a baling press ask 100 L/min each, at 50 and
// 150 bar, of the fixed pump's 61.9875 L/min. The pump cannot give more
// than it has, so the heat must close the energy balance on what it
// delivers: pump output 150 bar × 61.9875 L/min = the loads' useful power
// on their shares of that flow + the heat. With the flow shared in
// proportion to the demands (each gets 61.9875/200 of its ask) that is
// 15 496.9 − (50 + 150) bar × 30.99 L/min = 5165.6 W, where charging the
// full 200 L/min asked would give 16 666.7 W, more than the pump delivers.
func TestCompatibilitySaturatedHeat(t *testing.T) {
	lpm := units.LitrePerMinute
	c := Circuit{Center: valve.TandemCenter, Relief: 210 * units.Bar, CenterDrop: 5 * units.Bar, Together: true,
		Demands: []Demand{{Name: "ram", Pressure: 50 * units.Bar, Flow: 100 * lpm}, {Name: "gate", Pressure: 150 * units.Bar, Flow: 100 * lpm}}}
	fs, err := baler().Compatibility(c)
	if err != nil {
		t.Fatal(err)
	}
	finding(t, fs, "pump.saturated")
	q := 61.9875 / 60000 // m³/s the pump delivers
	share := q / 2       // each cylinder's share, 100/200 of it
	want := 150e5*q - (50e5*share + 150e5*share)
	checktest.Near(t, "saturated heat by energy balance", power(t, finding(t, fs, "pump.sharing-heat")), units.Power(want), 1e-13)
}

// Demands whose sums or heat overflow, though each number is finite, are
// an error, not a finding that quotes +Inf.
func TestCompatibilityOverflow(t *testing.T) {
	for topic, c := range map[string]Circuit{
		"pump.series-stall": {Center: valve.TandemCenter, Relief: 2e7, Series: true, Together: true,
			Demands: []Demand{{Pressure: 1e308, Flow: 1e-4}, {Pressure: 1e308, Flow: 1e-4}}},
		"pump.saturated": {Center: valve.ClosedCenter, Relief: 2e7, Together: true,
			Demands: []Demand{{Pressure: 1e5, Flow: 1e308}, {Pressure: 1e5, Flow: 1e308}}},
	} {
		fs, err := baler().Compatibility(c)
		if checktest.RangeErrorIn(t, err, "pump.Pump.Compatibility", topic); fs != nil {
			t.Errorf("%s: findings %v beside the error", topic, fs)
		}
	}
}

// An open center keeps a compensated pump at full stroke whether or not
// the caller knows the center's drop: without it the finding still says
// so (a Caution), and only the heat is left out.
func TestCompatibilityOpenCenterCompensatedNoDrop(t *testing.T) {
	fs, err := compensated().Compatibility(Circuit{Center: valve.OpenCenter, Relief: 220 * units.Bar})
	if err != nil {
		t.Fatal(err)
	}
	f := finding(t, fs, "pump.open-center-compensated")
	if f.Severity != components.Caution {
		t.Errorf("open center on a compensated pump, drop unknown: %v", f)
	}
	// It still quotes what the pump would cost on standby behind a closed center.
	checktest.Near(t, "standby on a closed center", power(t, f), 200e5*45e-6*1450/60*0.05/0.92, 1e-14)
}
