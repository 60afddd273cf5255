package accumulator

import (
	"math"
	"strings"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// demoSizes is a demo maker's range of nominal gas volumes.
func demoSizes(t *testing.T) components.Series[units.Volume] {
	t.Helper()
	l := units.Litre
	s, err := components.NewSeries("demo bladder accumulators", components.CallerRule("demo range"),
		[]units.Volume{1 * l, 2.5 * l, 4 * l, 6 * l, 10 * l, 20 * l, 32 * l, 50 * l}, nil)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

func TestSelect(t *testing.T) {
	cy := Polytropic(90*bara, 100*bara, 200*bara, Isothermal)
	s, err := cy.Select(5*units.Litre, demoSizes(t))
	if err != nil {
		t.Fatal(err)
	}
	// 11.11 L needed (TestGasLawHandValues); the 20 L size delivers
	// 20·(0.9 − 0.45) = 9 L and stores p₀V₀·ln(p₂/p₀) = 9e6·0.02·ln(200/90)
	// = 180 000 J · 0.798508 = 143 731.4 J (by hand).
	if s.Volume.Chosen != 20*units.Litre || math.Abs(s.Delivered.Litres()-9) > 1e-12 ||
		math.Abs(float64(s.Energy)-143731.4) > 0.05 {
		t.Errorf("select: %v, delivers %v, stores %v", s.Volume, s.Delivered, s.Energy)
	}
	if len(s.Findings) != 1 || s.Findings[0].Severity != components.Danger || s.Findings[0].Hazard != components.StoredEnergy {
		t.Errorf("findings %v, want the shutdown danger", s.Findings)
	}
	s, _ = cy.Select(100*units.Litre, demoSizes(t))
	if s.Volume.OK() || len(s.Findings.Topic("accumulator.no-size")) != 1 || s.Findings[0].Severity != components.Danger {
		t.Errorf("too large: %v, %v", s.Volume, s.Findings)
	}
	// So far beyond the range that the count of accumulators in parallel
	// does not fit an int: the notice still gives it, as a number.
	s, err = cy.Select(1e300, demoSizes(t))
	if f := s.Findings.Topic("accumulator.no-size"); err != nil || len(f) != 1 || strings.Contains(f[0].Text(units.Metric()), "-9") {
		t.Errorf("far too large: %v, %v", s.Findings, err)
	}
	t.Run("empty sizes", func(t *testing.T) {
		_, err := cy.Select(1e-3, components.Series[units.Volume]{})
		checktest.RangeError(t, err, "sizes")
	})
}

func TestEmergency(t *testing.T) {
	// An 80 mm bore over 0.5 m: 2.5133 L, 10 % margin: 2.7646 L.
	e := Emergency{Area: units.CircleArea(80 * units.Millimetre), Stroke: 0.5, Margin: 0.1,
		Cycle: Cycle{Precharge: 90 * bara, Min: 100 * bara, Max: 200 * bara, Charge: Isothermal, Discharge: Adiabatic},
		Sizes: demoSizes(t)}
	s, err := e.Size()
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(s.Need.Litres()-2.76460) > 5e-5 {
		t.Errorf("need %v, want 2.7646 L", s.Need.Litres())
	}
	// Mixed cycle yield 0.288302 (TestGasLawHandValues): V₀ = 9.5893 L → 10 L.
	if s.Volume.Chosen != 10*units.Litre || math.Abs(s.Volume.Required.Litres()-2.76460/0.288302) > 1e-4 {
		t.Errorf("emergency: %v", s.Volume)
	}
	if len(s.Findings.Hazard(components.StoredEnergy)) != 2 {
		t.Errorf("findings %v", s.Findings)
	}
	t.Run("margin", func(t *testing.T) { e := e; e.Margin = 2; _, err := e.Size(); checktest.RangeError(t, err, "Margin") })
}

func TestSupplement(t *testing.T) {
	// The duty cycle of a worked example in Practical Hydraulic Systems:
	// Operation and Troubleshooting for Engineers and Technicians, section
	// 7.5 (inputs): 100 L/min for 10 s once a minute, between 150 and 200
	// bar. Alone, a pump must deliver the 100 L/min peak; the mean demand
	// is 100·10/60 = 16.667 L/min. With a pump at the mean the
	// accumulator gives (100 − 16.667)·10/60 = 13.889 L each cycle (volume
	// balance by hand; the book's own accumulator figures are not at hand).
	cycle := []Phase{{"press", 10 * time.Second, 100 * units.LitrePerMinute}, {"dwell", 50 * time.Second, 0}}
	// 150 and 200 bar gauge are about 151 and 201 bar abs; precharge 140
	// bar abs. Adiabatic yield (140/201)^(1/1.4)·((201/151)^(1/1.4) − 1)
	// = 0.175067 (Python 3.11 math as a calculator): V₀ = 79.335 L.
	big, _ := components.NewSeries("demo piston accumulators", components.CallerRule("demo range"),
		[]units.Volume{20 * units.Litre, 50 * units.Litre, 100 * units.Litre}, nil)
	s := Supplement{Phases: cycle, Cycle: Polytropic(140*bara, 151*bara, 201*bara, Adiabatic), Sizes: big}
	r, err := s.Size()
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(r.Mean.LitresPerMinute()-16.6667) > 5e-5 || r.Peak != 100*units.LitrePerMinute || r.Pump != r.Mean ||
		math.Abs(r.Swing.Litres()-13.8889) > 5e-5 || math.Abs(r.Volume.Required.Litres()-79.335) > 5e-4 ||
		r.Volume.Chosen != 100*units.Litre {
		t.Errorf("mean %v, peak %v, pump %v, swing %v, %v", r.Mean, r.Peak, r.Pump, r.Swing, r.Volume)
	}
	// A 30 L/min pump: the draw is (100 − 30)·10/60 = 11.667 L, refilled in
	// the dwell with room to spare.
	s.Pump = 30 * units.LitrePerMinute
	r, _ = s.Size()
	if math.Abs(r.Swing.Litres()-11.6667) > 5e-5 || r.Volume.Chosen != 100*units.Litre {
		t.Errorf("30 L/min pump: swing %v", r.Swing)
	}
	// The order of the phases does not change the repeating swing.
	s.Phases = []Phase{cycle[1], cycle[0]}
	if r2, _ := s.Size(); math.Abs(float64(r2.Swing-r.Swing)) > 1e-15 {
		t.Errorf("rotated cycle: swing %v, want %v", r2.Swing, r.Swing)
	}
	// A pump that meets the peak needs no accumulator.
	s.Pump = 100 * units.LitrePerMinute
	if r, _ = s.Size(); r.Swing != 0 || len(r.Findings.Topic("accumulator.not-needed")) != 1 || r.Volume.Chosen != 0 {
		t.Errorf("no accumulator needed: %v, %v", r.Swing, r.Findings)
	}
	for _, c := range []struct {
		name  string
		s     Supplement
		param string
	}{
		{"no phases", Supplement{Cycle: s.Cycle, Sizes: s.Sizes}, "Phases"},
		{"duration", Supplement{Phases: []Phase{cycle[0], {Duration: 0}}, Cycle: s.Cycle, Sizes: s.Sizes}, "Phases[1].Duration"},
		{"flow", Supplement{Phases: []Phase{{Duration: time.Second, Flow: -1}}, Cycle: s.Cycle, Sizes: s.Sizes}, "Phases[0].Flow"},
		{"pump below mean", Supplement{Phases: cycle, Pump: 10 * units.LitrePerMinute, Cycle: s.Cycle, Sizes: s.Sizes}, "Pump"},
		// A cycle longer than a time.Duration holds, and one whose demand
		// overflows: errors, not a wrapped negative total or +Inf.
		{"cycle too long", Supplement{Phases: []Phase{{"a", math.MaxInt64/2 + 1, 1e-3}, {"b", math.MaxInt64/2 + 1, 0}},
			Cycle: s.Cycle, Sizes: s.Sizes}, "Phases[1].Duration"},
		{"demand overflows", Supplement{Phases: []Phase{{"a", time.Second, 1e308}, {"b", 10 * time.Second, 1e308}},
			Cycle: s.Cycle, Sizes: s.Sizes}, "Mean"},
	} {
		t.Run(c.name, func(t *testing.T) { _, err := c.s.Size(); checktest.RangeError(t, err, c.param) })
	}
}
