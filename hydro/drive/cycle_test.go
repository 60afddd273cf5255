package drive

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// A duty-cycle RMS worked by hand: 2 s at 30 kW, 8 s at 10 kW, 10 s at
// 2 kW.
//
//	Σ tᵢ        = 20 s
//	Σ Pᵢ·tᵢ     = 60 + 80 + 20 = 160 kJ          → average 160/20 = 8 kW
//	Σ Pᵢ²·tᵢ    = 900·2 + 100·8 + 4·10 = 2640 kW²·s
//	P_rms       = √(2640/20) = √132 = 11.489 kW
//
// The heat at η_o 0.85 is 15 % of the 160 kJ: 24 kJ per cycle.
func TestCycleWorked(t *testing.T) {
	d, err := Cycle(workedCycle())
	if err != nil {
		t.Fatal(err)
	}
	if d.Period != 20*time.Second || d.Peak != 30e3 || d.PeakPhase != 0 {
		t.Errorf("period %v, peak %v (phase %d)", d.Period, d.Peak, d.PeakPhase)
	}
	checktest.Near(t, "average", d.Average, 8e3, 1e-15)
	checktest.Near(t, "RMS", d.RMS, units.Power(math.Sqrt(132)*1e3), 1e-15)
	checktest.Near(t, "energy", d.Energy, 160e3, 1e-15)
	checktest.Near(t, "heat", d.Heat, 24e3, 1e-14)
	if d.Wasted != 0 || len(d.Findings) != 0 || d.RMSRule.Kind != components.CommonPractice {
		t.Errorf("wasted %v, findings %v, rule %v", d.Wasted, d.Findings, d.RMSRule)
	}
}

// A baling press cycle (demo data): 6 s pressing at 180 bar and 60 L/min,
// then 20 s holding with the fixed pump's 62 L/min over the 210 bar
// relief, both at η_o 0.87. Pressing draws 180 bar × 60 L/min / 0.87 =
// 20 689.7 W and loses 13 % of it; holding draws 210 bar × 62 L/min / 0.87
// = 24 942.5 W, all heat: 498.9 kJ of the cycle's 515.0 kJ. A caution.
func TestCycleWastedHeat(t *testing.T) {
	lpm := units.LitrePerMinute
	d, err := Cycle([]Phase{
		{Name: "press", Duration: 6 * time.Second, Pressure: 180 * units.Bar, Flow: 60 * lpm, Efficiency: 0.87},
		{Name: "hold", Duration: 20 * time.Second, Pressure: 210 * units.Bar, Flow: 62 * lpm, Efficiency: 0.87, Use: Relieving},
	})
	if err != nil {
		t.Fatal(err)
	}
	press, hold := 180e5*60/60000/0.87, 210e5*62/60000/0.87
	checktest.Near(t, "peak", d.Peak, units.Power(hold), 1e-14)
	checktest.Near(t, "wasted", d.Wasted, units.Energy(hold*20), 1e-14)
	checktest.Near(t, "heat", d.Heat, units.Energy(hold*20+press*6*0.13), 1e-13)
	fs := d.Findings.Topic("drive.wasted-heat")
	if len(fs) != 1 || fs[0].Severity != components.Caution || fs[0].Hazard != components.HotSurface {
		t.Fatalf("findings %v; want one hot-surface caution", d.Findings)
	}
	// The same cycle with a compensated pump on standby at 600 W: 12 kJ of
	// standby heat against 16.1 kJ lost while pressing.
	d, err = Cycle([]Phase{
		{Duration: 6 * time.Second, Pressure: 180 * units.Bar, Flow: 60 * lpm, Efficiency: 0.87},
		{Duration: 20 * time.Second, Power: 600, Use: Standby},
	})
	if err != nil || len(d.Findings) != 0 {
		t.Errorf("standby cycle: %v, %v; want no finding (%v of %v wasted)", d.Findings, err, d.Wasted, d.Heat)
	}
}

func TestCycleBadInput(t *testing.T) {
	_, err := Cycle(nil)
	checktest.RangeErrorIn(t, err, "drive.Cycle", "phases")
	good := Phase{Duration: time.Second, Pressure: 1e7, Flow: 1e-3, Efficiency: 0.9}
	for param, mut := range map[string]func(*Phase){
		"phases[1].Duration":   func(p *Phase) { p.Duration = 0 },
		"phases[1].Power":      func(p *Phase) { p.Power = 100 }, // with Pressure and Flow: ambiguous
		"phases[1].Efficiency": func(p *Phase) { p.Efficiency = 1.2 },
		"phases[1].Pressure":   func(p *Phase) { p.Pressure = -1 },
		"phases[1].Flow":       func(p *Phase) { p.Flow = units.Flow(math.Inf(1)) },
		"phases[1].Use":        func(p *Phase) { p.Use = 7 },
	} {
		bad := good
		mut(&bad)
		d, err := Cycle([]Phase{good, bad})
		if checktest.RangeErrorIn(t, err, "drive.Cycle", param); d.RMS != 0 || d.Findings != nil {
			t.Errorf("%s: %+v; want the zero Duty", param, d)
		}
	}
	// A Working phase given by power needs the efficiency for its heat.
	_, err = Cycle([]Phase{{Duration: time.Second, Power: 5e3}})
	checktest.RangeErrorIn(t, err, "drive.Cycle", "phases[0].Efficiency")
	_, err = Cycle([]Phase{{Duration: -time.Second, Power: 5e3, Use: Relieving}})
	checktest.RangeErrorIn(t, err, "drive.Cycle", "phases[0].Duration")
	// Durations that overflow time.Duration together.
	huge := Phase{Duration: math.MaxInt64 / 2, Power: 1, Use: Relieving}
	_, err = Cycle([]Phase{huge, huge, huge})
	checktest.RangeErrorIn(t, err, "drive.Cycle", "phases")
}
