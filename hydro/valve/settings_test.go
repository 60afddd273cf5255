package valve

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func TestReliefSetting(t *testing.T) {
	bar := units.Bar
	r, err := ReliefSetting(ReliefNeed{Working: 180 * bar, Override: 12 * bar, Rating: 250 * bar})
	if err != nil {
		t.Fatal(err)
	}
	// 180 bar + 10 % = 198 bar; at full flow 198 + 12 = 210 bar, within 250.
	checktest.Near(t, "setting", r.Setting, 198*bar, 1e-15)
	checktest.Near(t, "full flow", r.FullFlow, 210*bar, 1e-15)
	if r.Margin != DefaultReliefMargin || r.MarginRule.Kind != components.CommonPractice || !r.Protects.OK() || len(r.Findings) != 0 {
		t.Errorf("relief %+v", r)
	}
	r, _ = ReliefSetting(ReliefNeed{Working: 180 * bar, Margin: new(0.2), Override: 40 * bar, Rating: 250 * bar})
	// 216 + 40 = 256 bar: above the 250 bar rating.
	if r.MarginRule.Kind != components.CallerValue || r.Protects.OK() {
		t.Errorf("caller margin with a large override: %+v", r)
	}
	if f := r.Findings.Topic("valve.relief-above-rating"); len(f) != 1 || f[0].Severity != components.Warning || f[0].Hazard != components.Overpressure {
		t.Errorf("findings %v; want one overpressure warning", r.Findings)
	}
	r, _ = ReliefSetting(ReliefNeed{Working: 180 * bar, Rating: 250 * bar})
	if len(r.Findings.Topic("valve.relief-override")) != 1 {
		t.Errorf("no override given: findings %v; want the notice to read the curve", r.Findings)
	}
	for param, n := range map[string]ReliefNeed{
		"Working":  {Rating: 1e7},
		"Rating":   {Working: 1e7},
		"Override": {Working: 1e7, Rating: 2e7, Override: -1},
		"Margin":   {Working: 1e7, Rating: 2e7, Margin: new(1.5)},
	} {
		_, err := ReliefSetting(n)
		checktest.RangeErrorIn(t, err, "valve.ReliefSetting", param)
	}
}

func TestProtection(t *testing.T) {
	bar := units.Bar
	fs, err := Protection([]Part{
		{Name: "the pump", Rating: 250 * bar, Relief: 210 * bar},
		{Name: "the lift cylinder's cap side", Rating: 200 * bar},
		{Name: "the return filter", Rating: 10 * bar, Relief: 210 * bar},
	})
	if err != nil {
		t.Fatal(err)
	}
	if len(fs) != 2 || len(fs.Topic("valve.unprotected")) != 1 || len(fs.Topic("valve.over-rating")) != 1 {
		t.Errorf("findings %v; want one unprotected and one over-rating", fs)
	}
	for _, f := range fs {
		if f.Severity != components.Warning || f.Hazard != components.Overpressure || f.Rule.Kind != components.Standard {
			t.Errorf("finding %v: want an ISO 4413 overpressure warning", f)
		}
	}
	_, err = Protection([]Part{{Rating: 1e7, Relief: 1e7}, {Rating: 0}})
	checktest.RangeErrorIn(t, err, "valve.Protection", "parts[1].Rating")
}

// The common-practice counterbalance: set at 1.3 × the load-induced
// pressure, opened by (setting − load)/R (common practice; valve makers'
// formulas differ). 150 bar of load → 195 bar; R = 4.5 → 10 bar.
func TestCounterbalanceCommonPractice(t *testing.T) {
	bar := units.Bar
	cb, err := CounterbalanceSetting(CounterbalanceNeed{Load: 150 * bar, PilotRatio: 4.5})
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "setting", cb.Setting, 195*bar, 1e-15)
	checktest.Near(t, "pilot", cb.Pilot, (195-150)*bar/4.5, 1e-15)
	if cb.Ratio != 1.3 || cb.RatioRule.Kind != components.CommonPractice || len(cb.Findings) != 0 {
		t.Errorf("counterbalance %+v", cb)
	}
	// Back pressure adds to the setting of a non-vented valve, not of a
	// vented one: 5 bar of back pressure → (195 + 5 − 150)/4.5.
	cb, _ = CounterbalanceSetting(CounterbalanceNeed{Load: 150 * bar, PilotRatio: 4.5, Back: 5 * bar})
	checktest.Near(t, "pilot with back pressure", cb.Pilot, 50*bar/4.5, 1e-15)
	cb, _ = CounterbalanceSetting(CounterbalanceNeed{Load: 150 * bar, PilotRatio: 4.5, Back: 5 * bar, Vented: true})
	checktest.Near(t, "pilot, vented", cb.Pilot, 45*bar/4.5, 1e-15)
}

// A forestry crane's boom cylinder, 100 mm bore, 56 mm rod, holds its
// load on the cap side at 150 bar (demo data); lowering pressurises the
// annulus, which pushes the piston down too: c = A_ann/A_cap = 0.6864.
// The opening pilot must satisfy the two force balances at once:
//
//	held pressure     p_cap = p_load + c·p_x
//	valve poppet      p_cap + R·p_x = p_set + p_back
//
// The test checks the result against both balances, not against the
// formula that produced it.
func TestCounterbalanceCoupled(t *testing.T) {
	bar, mm := units.Bar, units.Millimetre
	cyl := actuator.Cylinder{Bore: 100 * mm, Rod: 56 * mm, Stroke: 800 * mm}
	c, err := Coupling(cyl, actuator.Retract)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "coupling", c, (100.0*100-56*56)/(100*100), 1e-14)
	cb, err := CounterbalanceSetting(CounterbalanceNeed{Load: 150 * bar, PilotRatio: 4.5, Back: 5 * bar, Coupling: c,
		Flow: 40 * units.LitrePerMinute, Rating: 250 * bar})
	if err != nil {
		t.Fatal(err)
	}
	pcap := 150*bar + units.Pressure(c)*cb.Pilot
	checktest.Near(t, "poppet balance", pcap+units.Pressure(4.5)*cb.Pilot, cb.Setting+5*bar, 1e-15)
	checktest.Near(t, "throttled drop", cb.Throttled, pcap-5*bar, 1e-15)
	checktest.Near(t, "heat", cb.Heat, (pcap - 5*bar).TimesFlow(40*units.LitrePerMinute), 1e-15)
	if cb.Pilot >= 50*bar/4.5 {
		t.Errorf("the coupling must lower the pilot pressure below the uncoupled %v: got %v", 50*bar/4.5, cb.Pilot)
	}
	if c, _ := Coupling(cyl, actuator.Extend); math.Abs(c-1/((100.0*100-56*56)/(100*100))) > 1e-14 {
		t.Errorf("coupling on the annulus port = %v; want φ", c)
	}
}

// A valve already set for the heaviest load it holds opens for a lighter
// one — the crane's empty boom coming down — at the same setting: the two
// force balances of TestCounterbalanceCoupled hold with the given setting,
// and the ratio reported is the setting over this load.
func TestCounterbalanceAtSetting(t *testing.T) {
	bar := units.Bar
	const c = 0.6864
	cb, err := CounterbalanceSetting(CounterbalanceNeed{Load: 20 * bar, Setting: 195 * bar, PilotRatio: 4.5, Back: 5 * bar,
		Coupling: c, Flow: 40 * units.LitrePerMinute})
	if err != nil {
		t.Fatal(err)
	}
	pcap := 20*bar + units.Pressure(c)*cb.Pilot
	checktest.Near(t, "setting", cb.Setting, 195*bar, 0)
	checktest.Near(t, "poppet balance", pcap+units.Pressure(4.5)*cb.Pilot, 195*bar+5*bar, 1e-15)
	checktest.Near(t, "throttled drop", cb.Throttled, pcap-5*bar, 1e-15)
	checktest.Near(t, "ratio", cb.Ratio, 195.0/20, 1e-15)
	if cb.RatioRule.Kind != components.CallerValue || len(cb.Findings) != 0 {
		t.Errorf("counterbalance %+v", cb)
	}
	for _, n := range []CounterbalanceNeed{
		{Load: 20 * bar, Setting: 20 * bar, PilotRatio: 3},                   // opens on the load alone
		{Load: 20 * bar, Setting: 195 * bar, Ratio: new(1.3), PilotRatio: 3}, // two settings
		{Load: 20 * bar, Setting: units.Pressure(math.Inf(1)), PilotRatio: 3},
	} {
		_, err := CounterbalanceSetting(n)
		checktest.RangeErrorIn(t, err, "valve.CounterbalanceSetting", "Setting")
	}
}

// On a regenerative extend the annulus oil the valve passes joins the cap
// side, so the pressure past the valve is the pilot pressure plus the
// drops of the way across: the poppet balance of TestCounterbalanceCoupled
// with p_back replaced by p_x + 3 bar.
func TestCounterbalanceJoined(t *testing.T) {
	bar := units.Bar
	const c = 2.566 // φ of a 160 mm × 125 mm cylinder, valve on the annulus port
	cb, err := CounterbalanceSetting(CounterbalanceNeed{Load: 16 * bar, Setting: 29 * bar, PilotRatio: 3, Back: 3 * bar,
		Coupling: c, Joined: true, Flow: 70 * units.LitrePerMinute})
	if err != nil {
		t.Fatal(err)
	}
	held, past := 16*bar+units.Pressure(c)*cb.Pilot, cb.Pilot+3*bar
	checktest.Near(t, "poppet balance", held+3*cb.Pilot, 29*bar+past, 1e-15)
	checktest.Near(t, "throttled drop", cb.Throttled, held-past, 1e-15)
	_, err = CounterbalanceSetting(CounterbalanceNeed{Load: 16 * bar, PilotRatio: 0.5, Joined: true})
	checktest.RangeErrorIn(t, err, "valve.CounterbalanceSetting", "PilotRatio")
}

func TestCounterbalanceFindings(t *testing.T) {
	bar := units.Bar
	cb, err := CounterbalanceSetting(CounterbalanceNeed{Load: 150 * bar, PilotRatio: 3, Ratio: new(1.1), Rating: 160 * bar})
	if err != nil {
		t.Fatal(err)
	}
	if cb.RatioRule.Kind != components.CallerValue {
		t.Errorf("rule %v", cb.RatioRule)
	}
	if f := cb.Findings.Topic("valve.counterbalance-low"); len(f) != 1 || f[0].Hazard != components.OverrunningLoad {
		t.Errorf("findings %v; want the low-ratio warning", cb.Findings)
	}
	if f := cb.Findings.Topic("valve.counterbalance-above-rating"); len(f) != 1 {
		t.Errorf("165 bar above a 160 bar rating: findings %v", cb.Findings)
	}
	for param, n := range map[string]CounterbalanceNeed{
		"Load":       {PilotRatio: 3},
		"PilotRatio": {Load: 1e7},
		"Back":       {Load: 1e7, PilotRatio: 3, Back: -1},
		"Coupling":   {Load: 1e7, PilotRatio: 3, Coupling: math.NaN()},
		"Ratio":      {Load: 1e7, PilotRatio: 3, Ratio: new(0.9)},
		"Flow":       {Load: 1e7, PilotRatio: 3, Flow: -1},
	} {
		_, err := CounterbalanceSetting(n)
		checktest.RangeErrorIn(t, err, "valve.CounterbalanceSetting", param)
	}
}

// Pilot-operated checks. A 4:1 valve holding 3000 psi with nothing
// downstream opens at 3000/4 = 750 psi, the usual illustration of pilot
// ratio (common practice). With back pressure the forms come from the
// poppet's force balance, which the test checks directly.
func TestPilotCheckPressure(t *testing.T) {
	psi, bar := units.PSI, units.Bar
	pc, err := PilotCheckPressure(PilotCheckNeed{Load: 3000 * psi, Ratio: 4})
	if err != nil || !pc.Opens {
		t.Fatal(pc, err)
	}
	checktest.Near(t, "4:1 at 3000 psi", pc.Pilot.PSI(), 750, 1e-14)
	ext, _ := PilotCheckPressure(PilotCheckNeed{Load: 200 * bar, Back: 10 * bar, Ratio: 4, Cracking: 2 * bar, ExternalDrain: true})
	checktest.Near(t, "externally drained", ext.Pilot, (200+2-10)*bar/4, 1e-15)
	// Balance with the piston's back side at tank: p_x·R + p_back = p_load + p_crack.
	checktest.Near(t, "external balance", ext.Pilot*4+10*bar, 202*bar, 1e-15)
	in, _ := PilotCheckPressure(PilotCheckNeed{Load: 200 * bar, Back: 10 * bar, Ratio: 4, Cracking: 2 * bar})
	checktest.Near(t, "internally drained", in.Pilot, (200+2+3*10)*bar/4, 1e-15)
	// Force balance of the internally drained valve at that pilot:
	// (p_x − p_back)·R + p_back = p_load + p_crack.
	checktest.Near(t, "internal balance", (in.Pilot-10*bar)*4+10*bar, 202*bar, 1e-15)
}

// On the annulus port of a 2:1 cylinder piloted from the cap line, the
// pilot pressure intensifies into the held annulus (c = φ = 2): a 2:1
// valve can never open, and a 3:1 one opens at p_load/(3 − 2). The trade's
// rule that such a valve needs a ratio of at least 3:1 says the same.
func TestPilotCheckOnTheRodSide(t *testing.T) {
	bar := units.Bar
	pc, err := PilotCheckPressure(PilotCheckNeed{Load: 80 * bar, Ratio: 2, Coupling: 2, ExternalDrain: true})
	if err != nil || pc.Opens || pc.Pilot != 0 {
		t.Fatalf("2:1 valve on a 2:1 cylinder: %+v, %v; want it never to open", pc, err)
	}
	if f := pc.Findings.Topic("valve.pilot-check-locked"); len(f) != 1 || f[0].Hazard != components.SuspendedLoad {
		t.Errorf("findings %v", pc.Findings)
	}
	pc, _ = PilotCheckPressure(PilotCheckNeed{Load: 80 * bar, Ratio: 3, Coupling: 2, ExternalDrain: true})
	checktest.Near(t, "3:1 on a 2:1 cylinder", pc.Pilot, 80*bar, 1e-15)
	for param, n := range map[string]PilotCheckNeed{
		"Load":     {Ratio: 3},
		"Ratio":    {Load: 1e7},
		"Back":     {Load: 1e7, Ratio: 3, Back: -1},
		"Cracking": {Load: 1e7, Ratio: 3, Cracking: -1},
		"Coupling": {Load: 1e7, Ratio: 3, Coupling: -1},
	} {
		_, err := PilotCheckPressure(n)
		checktest.RangeErrorIn(t, err, "valve.PilotCheckPressure", param)
	}
}

func TestSettingsAllocations(t *testing.T) {
	cb := CounterbalanceNeed{Load: 150 * units.Bar, PilotRatio: 4.5, Back: 5 * units.Bar, Coupling: 0.69}
	pc := PilotCheckNeed{Load: 90 * units.Bar, Ratio: 4, Back: 3 * units.Bar}
	mm := units.Millimetre
	mn := MeteringNeed{Metering: MeterOut, Cylinder: actuator.Cylinder{Bore: 125 * mm, Rod: 90 * mm, Stroke: 900 * mm, Rating: 250 * units.Bar},
		Stroke: actuator.Retract, Supply: 210 * units.Bar}
	rn := ReliefNeed{Working: 180 * units.Bar, Override: 10 * units.Bar, Rating: 250 * units.Bar}
	if n := testing.AllocsPerRun(100, func() {
		_, _ = CounterbalanceSetting(cb)
		_, _ = PilotCheckPressure(pc)
		_, _ = CheckMetering(mn)
		_, _ = ReliefSetting(rn)
	}); n != 0 {
		t.Errorf("settings without findings allocate %v times per run; want 0", n)
	}
}

// Areas that pass the cylinder's own checks but overflow in the ratio are
// an error, not NaN beside nil.
func TestCouplingOverflow(t *testing.T) {
	c, err := Coupling(actuator.Cylinder{Bore: 1e300, Rod: 1, Stroke: 1}, actuator.Retract)
	if checktest.RangeErrorIn(t, err, "valve.Coupling", "coupling"); c != 0 {
		t.Errorf("Coupling = %v beside the error; want 0", c)
	}
}
