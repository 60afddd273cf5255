package thermal

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func TestReliefHeatEsposito(t *testing.T) {
	// Esposito, Fluid Power with Applications, 7th ed., Example 11-2
	// (inputs): 10 gpm over a relief valve at 1000 psi generate
	// p·Q/1714 = 5.83 hp of heat by the book's method (its 1714 is the
	// rounded 1714.29 of the unit definitions; printed to 3 digits).
	l, err := ReliefFlow("relief", 1000*units.PSI, 10*units.USGallonPerMinute)
	if err != nil || math.Abs(l.Power.In(units.Horsepower)-5.83) > 0.005 || l.Source != FromRelief {
		t.Errorf("relief heat %v hp, %v", l.Power.In(units.Horsepower), err)
	}
}

func TestPumpAndMotorLoss(t *testing.T) {
	// By hand: 210 bar × 60 L/min = 21 kW hydraulic; at 85 % overall the
	// pump draws 24.7059 kW and makes 3.7059 kW of heat; a motor taking
	// 21 kW at 90 % makes 2.1 kW.
	p, err := PumpLoss("pump", 210*units.Bar, 60*units.LitrePerMinute, 0.85)
	if err != nil || math.Abs(p.Input.Kilowatts()-24.70588) > 5e-6 || math.Abs(p.Power.Kilowatts()-3.70588) > 5e-6 {
		t.Errorf("pump: input %v, heat %v, %v", p.Input, p.Power, err)
	}
	m, _ := MotorLoss("motor", 210*units.Bar, 60*units.LitrePerMinute, 0.9)
	if math.Abs(m.Power.Kilowatts()-2.1) > 1e-12 {
		t.Errorf("motor heat %v, want 2.1 kW", m.Power)
	}
}

// A fixed pump that relieves while the press dwells: the share guess
// understates its heat. The same press on a compensated pump: it
// overstates it.
func TestBudget(t *testing.T) {
	must := func(l Load, err error) Load {
		t.Helper()
		if err != nil {
			t.Fatal(err)
		}
		return l
	}
	q := 60 * units.LitrePerMinute
	pump := must(PumpLoss("pump", 210*units.Bar, q, 0.85)) // 3.7059 kW heat, 24.7059 kW input
	press := Phase{Name: "press", Duration: 20 * time.Second, Loads: []Load{
		pump,
		must(Throttling("flow control", 40*units.Bar, q)), // 4 kW
		must(LineLoss("lines", 8*units.Bar, q)),           // 0.8 kW
		must(MotorLoss("ram", 162*units.Bar, q, 0.95)),    // 16.2 kW × 5 % = 0.81 kW
	}}
	dwell := Phase{Name: "dwell", Duration: 40 * time.Second, Loads: []Load{pump,
		must(ReliefFlow("relief", 210*units.Bar, q))}} // 21 kW
	h, err := Budget([]Phase{press, dwell})
	if err != nil {
		t.Fatal(err)
	}
	// By hand: press 9.31588 kW for 20 s, dwell 24.70588 kW for 40 s:
	// mean (9.31588·20 + 24.70588·40)/60 = 19.57588 kW; input 24.70588 kW.
	if math.Abs(h.Mean.Kilowatts()-19.57588) > 5e-6 || math.Abs(h.Input.Kilowatts()-24.70588) > 5e-6 ||
		h.PeakPhase != "dwell" || math.Abs(h.Peak.Kilowatts()-24.70588) > 5e-6 {
		t.Errorf("mean %v, input %v, peak %v in %q", h.Mean, h.Input, h.Peak, h.PeakPhase)
	}
	if len(h.Sources) != 5 || h.Sources[0].Source != FromPump || math.Abs(h.Sources[0].Mean.Kilowatts()-3.70588) > 5e-6 {
		t.Errorf("sources %v", h.Sources)
	}
	if math.Abs(h.Guess.High.Kilowatts()-24.70588/3) > 5e-6 || h.Guess.Rule.Kind != components.CommonPractice {
		t.Errorf("guess %v", h.Guess)
	}
	if f := h.Findings.Topic("thermal.guess"); len(f) != 1 || !contains(f[0].Text(units.Metric()), "understates") {
		t.Errorf("relieving fixed pump: %v", h.Findings)
	}
	// Compensated: the pump delivers only what the ram takes, at 170 bar
	// (17 kW hydraulic, 20 kW input, 3 kW heat), for 50 s; at standby it
	// holds 210 bar with 2 L/min of leakage (0.7 kW) and draws 1.5 kW at
	// the shaft for 10 s. By hand: mean heat (4.61·50 + 1.5·10)/60 =
	// 4.0917 kW, input (20·50 + 1.5·10)/60 = 16.917 kW, 24.2 %.
	work := Phase{Name: "press", Duration: 50 * time.Second, Loads: []Load{
		must(PumpLoss("pump", 170*units.Bar, q, 0.85)),
		must(LineLoss("lines", 8*units.Bar, q)),
		must(MotorLoss("ram", 162*units.Bar, q, 0.95)),
	}}
	standby := Phase{Name: "dwell", Duration: 10 * time.Second, Input: 1.5 * units.Kilowatt, Loads: []Load{
		must(Standby("compensator", 210*units.Bar, 2*units.LitrePerMinute)),
		must(Other("mechanical", 0.8*units.Kilowatt, components.CallerRule("maker's standby input less leakage"))),
	}}
	h, _ = Budget([]Phase{work, standby})
	if f := h.Findings.Topic("thermal.guess"); len(f) != 1 || !contains(f[0].Text(units.Metric()), "overstates") ||
		math.Abs(h.Mean.Kilowatts()-4.09167) > 5e-6 || math.Abs(h.Input.Kilowatts()-16.91667) > 5e-6 {
		t.Errorf("compensated pump: mean %v of input %v: %v", h.Mean, h.Input, h.Findings)
	}
	// No input known: no guess.
	h, _ = Budget([]Phase{{Name: "run", Duration: time.Minute, Loads: []Load{must(Throttling("valve", 10*units.Bar, q))}}})
	if h.Guess != (Guess{}) || len(h.Findings.Topic("thermal.no-input")) != 1 {
		t.Errorf("no input: %v, %v", h.Guess, h.Findings)
	}
}

func contains(s, sub string) bool {
	for i := 0; i+len(sub) <= len(s); i++ {
		if s[i:i+len(sub)] == sub {
			return true
		}
	}
	return false
}

func TestBudgetBadInput(t *testing.T) {
	ok := Load{Source: FromOther, Power: 100}
	for _, c := range []struct {
		name   string
		phases []Phase
		param  string
	}{
		{"none", nil, "phases"},
		{"duration", []Phase{{Duration: 0}}, "phases[0].Duration"},
		{"input", []Phase{{Duration: 1, Input: -1}}, "phases[0].Input"},
		{"source", []Phase{{Duration: 1, Loads: []Load{ok, {Power: 1}}}}, "phases[0].Loads[1].Source"},
		{"power", []Phase{{Duration: 1, Loads: []Load{{Source: FromOther, Power: -1}}}}, "phases[0].Loads[0].Power"},
		{"over input", []Phase{{Duration: 1, Input: 50, Loads: []Load{ok}}}, "phases[0].Loads"},
		// A cycle longer than a time.Duration holds (the total wrapped
		// negative) and an input energy that overflows.
		{"too long", []Phase{{Duration: math.MaxInt64/2 + 1, Loads: []Load{ok}}, {Duration: math.MaxInt64/2 + 1, Loads: []Load{ok}}}, "phases[1].Duration"},
		{"input overflows", []Phase{{Duration: 2 * time.Second, Input: math.MaxFloat64, Loads: []Load{ok}}}, "Input"},
	} {
		t.Run(c.name, func(t *testing.T) { _, err := Budget(c.phases); checktest.RangeError(t, err, c.param) })
	}
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"pump eff", second(PumpLoss("", 1e7, 1e-3, 0)), "overall"},
		{"pump p", second(PumpLoss("", -1, 1e-3, 0.9)), "p"},
		{"motor eff", second(MotorLoss("", 1e7, 1e-3, 1.2)), "overall"},
		{"throttle q", second(Throttling("", 1e7, -1)), "q"},
		{"other", second(Other("", -1, components.Rule{})), "power"},
	} {
		t.Run(c.name, func(t *testing.T) { checktest.RangeError(t, c.err, c.param) })
	}
}

// BenchmarkBudget totals a two-phase cycle of five loads.
func BenchmarkBudget(b *testing.B) {
	q := 60 * units.LitrePerMinute
	pump, _ := PumpLoss("pump", 210*units.Bar, q, 0.85)
	valve, _ := Throttling("flow control", 40*units.Bar, q)
	lines, _ := LineLoss("lines", 8*units.Bar, q)
	ram, _ := MotorLoss("ram", 162*units.Bar, q, 0.95)
	relief, _ := ReliefFlow("relief", 210*units.Bar, q)
	phases := []Phase{{Name: "press", Duration: 20 * time.Second, Loads: []Load{pump, valve, lines, ram}},
		{Name: "dwell", Duration: 40 * time.Second, Loads: []Load{pump, relief}}}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Budget(phases); err != nil {
			b.Fatal(err)
		}
	}
}
