package drive

import (
	"math"
	"slices"
	"strings"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// The worked cycle (RMS 11.49 kW, peak 30 kW, average 8 kW) on a 4-pole
// 50 Hz motor at 1455 rpm with a breakdown torque of 2.5 × rated: the
// thermal need is 11.49 kW and the torque need 30/2.5 = 12 kW, so 15 kW.
// Its rated torque is 15 kW/(2π × 1455/60 s) = 98.45 N·m; the peak torque
// 30 kW at 1455 rpm = 196.9 N·m, within 2.5 × 98.45 = 246.1 N·m. On the
// peak it would be 30 kW, on the average 11 kW.
func TestSelectMotor(t *testing.T) {
	d, err := Cycle(workedCycle())
	if err != nil {
		t.Fatal(err)
	}
	n := 1455 * units.RevolutionPerMinute
	m, err := SelectMotor(MotorNeed{Duty: d, Speed: n, Breakdown: 2.5})
	if err != nil {
		t.Fatal(err)
	}
	if m.Rating.Chosen != 15*units.Kilowatt || m.Rating.Required != 12*units.Kilowatt {
		t.Errorf("rating %+v; want 15 kW for a 12 kW need", m.Rating)
	}
	checktest.Near(t, "rated torque", m.RatedTorque, 15e3/(2*3.141592653589793*1455/60), 1e-14)
	checktest.Near(t, "peak torque", m.PeakTorque, 30e3/(2*3.141592653589793*1455/60), 1e-14)
	if !m.Thermal.OK() || !m.Torque.OK() || m.Thermal.Rule.Kind != components.CommonPractice {
		t.Errorf("checks: thermal %+v, torque %+v", m.Thermal, m.Torque)
	}
	f := m.Findings.Topic("drive.sizing-basis")
	if len(f) != 1 {
		t.Fatalf("findings %v; want the sizing-basis notice", m.Findings)
	}
	args := f[0].Args()
	if args[3] != units.Power(30*units.Kilowatt) || args[4] != units.Power(11*units.Kilowatt) {
		t.Errorf("peak and average sizing %v and %v; want 30 kW and 11 kW", args[3], args[4])
	}
	// With a weaker motor (breakdown 1.6) the torque decides: 30/1.6 =
	// 18.75 kW → 22 kW.
	m, _ = SelectMotor(MotorNeed{Duty: d, Speed: n, Breakdown: 1.6})
	if m.Rating.Chosen != 22*units.Kilowatt || !m.Torque.OK() {
		t.Errorf("breakdown 1.6: %+v; want 22 kW", m.Rating)
	}
	// In NEMA horsepower: 12 kW = 16.09 hp → 20 hp.
	m, _ = SelectMotor(MotorNeed{Duty: d, Speed: 1746 * units.RevolutionPerMinute, Breakdown: 2.5, Ratings: components.NEMAMotorRatings()})
	if m.Rating.Chosen != 20*units.Horsepower {
		t.Errorf("NEMA: %v; want 20 hp", m.Rating.Chosen)
	}
}

// A steady load sizes the same on every basis: no notice.
func TestSelectMotorSteady(t *testing.T) {
	d, _ := Cycle([]Phase{{Duration: time.Minute, Power: 6 * units.Kilowatt, Efficiency: 0.9}})
	m, err := SelectMotor(MotorNeed{Duty: d, Speed: 1455 * units.RevolutionPerMinute, Breakdown: 2.5})
	if err != nil || m.Rating.Chosen != 7.5*units.Kilowatt || len(m.Findings) != 0 {
		t.Errorf("steady 6 kW: %+v, %v, %v; want 7.5 kW and no finding", m.Rating, m.Findings, err)
	}
	d, _ = Cycle([]Phase{{Duration: time.Minute, Power: 400 * units.Kilowatt, Efficiency: 0.9}})
	m, err = SelectMotor(MotorNeed{Duty: d, Speed: 1455 * units.RevolutionPerMinute, Breakdown: 2.5})
	if err != nil || m.Rating.OK() || m.Thermal.OK() || len(m.Findings.Topic("drive.beyond-ratings")) != 1 {
		t.Errorf("400 kW: %+v, %v, %v; want a failed choice with a finding", m.Rating, m.Findings, err)
	}
}

func TestSelectMotorBadInput(t *testing.T) {
	d, _ := Cycle(workedCycle())
	_, err := SelectMotor(MotorNeed{Speed: 25, Breakdown: 2})
	checktest.RangeErrorIn(t, err, "drive.SelectMotor", "Duty")
	_, err = SelectMotor(MotorNeed{Duty: d, Breakdown: 2})
	checktest.RangeErrorIn(t, err, "drive.SelectMotor", "Speed")
	_, err = SelectMotor(MotorNeed{Duty: d, Speed: 25, Breakdown: 1})
	checktest.RangeErrorIn(t, err, "drive.SelectMotor", "Breakdown")
}

// A Duty built by hand rather than by Cycle: every power it carries must be
// finite and ≥ 0, and the checks' limits finite; the error names the field
// and SelectMotor, never a helper.
func TestSelectMotorHandBuiltDuty(t *testing.T) {
	d, _ := Cycle(workedCycle())
	for param, mut := range map[string]func(*MotorNeed){
		"Duty.Peak":    func(n *MotorNeed) { n.Duty.Peak = units.Power(math.Inf(1)) },
		"Duty.Average": func(n *MotorNeed) { n.Duty.Average = units.Power(math.NaN()) },
		"Duty.RMS":     func(n *MotorNeed) { n.Duty.RMS = units.Power(math.NaN()) },
		"Duty.Peak ":   func(n *MotorNeed) { n.Duty.Peak = -1 },
		// A speed so low that the rated torque overflows.
		"RatedTorque": func(n *MotorNeed) { n.Speed = 5e-324 },
		// A breakdown multiple so large that the torque limit overflows.
		"Torque.Limit": func(n *MotorNeed) { n.Breakdown = math.MaxFloat64 },
	} {
		n := MotorNeed{Duty: d, Speed: 1455 * units.RevolutionPerMinute, Breakdown: 2.5}
		mut(&n)
		m, err := SelectMotor(n)
		checktest.RangeErrorIn(t, err, "drive.SelectMotor", strings.TrimSpace(param))
		if m.Rating.Required != 0 || m.Findings != nil {
			t.Errorf("%s: %+v beside the error; want the zero Motor", param, m)
		}
	}
}

// The sizing-basis notice names only the basis that would choose
// differently: it never calls the chosen motor oversized or overheating.
//
//   - 50 s at 6 kW and 1 s at 8 kW: RMS √((36·50 + 64)/51) = 6.05 kW and
//     average 6.04 kW both take 7.5 kW; the 8 kW peak alone would take 11 kW.
//   - 6 s at 2.2 kW and 4 s idle: RMS 2.2·√0.6 = 1.70 kW and the peak both
//     take 2.2 kW; the 1.32 kW average alone would take 1.5 kW.
//   - 100 s at 10 kW and 1 s at 400 kW, breakdown 2.5: the torque needs
//     400/2.5 = 160 kW, and no IEC rating reaches the 400 kW peak itself.
func TestSelectMotorBasisNamesOnlyTheDifference(t *testing.T) {
	kW := units.Kilowatt
	n := 1455 * units.RevolutionPerMinute
	for _, c := range []struct {
		name         string
		phases       []Phase
		chosen, want units.Power
		say, never   string
	}{
		{"peak only", []Phase{{Duration: 50 * time.Second, Power: 6 * kW, Efficiency: 0.9}, {Duration: time.Second, Power: 8 * kW, Efficiency: 0.9}},
			7.5 * kW, 11 * kW, "oversized", "overheat"},
		{"average only", []Phase{{Duration: 6 * time.Second, Power: 2.2 * kW, Efficiency: 0.9}, {Duration: 4 * time.Second}},
			2.2 * kW, 1.5 * kW, "overheat", "oversized"},
		{"peak beyond the series", []Phase{{Duration: 100 * time.Second, Power: 10 * kW, Efficiency: 0.9}, {Duration: time.Second, Power: 400 * kW, Efficiency: 0.9}},
			160 * kW, 160 * kW, "no rating", "oversized"},
	} {
		d, err := Cycle(c.phases)
		if err != nil {
			t.Fatal(err)
		}
		m, err := SelectMotor(MotorNeed{Duty: d, Speed: n, Breakdown: 2.5})
		if err != nil || m.Rating.Chosen != c.chosen {
			t.Fatalf("%s: %+v, %v; want %v", c.name, m.Rating, err, c.chosen)
		}
		f := m.Findings.Topic("drive.sizing-basis")
		if len(f) != 1 {
			t.Fatalf("%s: findings %v; want the sizing-basis notice", c.name, m.Findings)
		}
		text := f[0].Text(units.Metric())
		if !strings.Contains(text, c.say) || strings.Contains(text, c.never) || !slices.Contains(f[0].Args(), any(c.want)) {
			t.Errorf("%s: %q; want it to say %q of %v and never %q", c.name, text, c.say, c.want, c.never)
		}
	}
}
