package line

import (
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/units"
)

func TestColdStart(t *testing.T) {
	oil, err := fluid.Typical(fluid.HM, fluid.VG46)
	if err != nil {
		t.Fatal(err)
	}
	mm := units.Millimetre
	p := Path{Name: "return", Elements: []Element{
		Pipe{Name: "return tube", Length: 6, Bore: 16 * mm, Roughness: DrawnTubing},
		Fitting{Name: "elbows", Kind: Elbow90, Bore: 16 * mm, Count: 4},
		Rated{Name: "return filter", Drop: 0.5 * units.Bar, Flow: 60 * units.LitrePerMinute, Law: Viscous,
			Viscosity: 32 * units.SquareMillimetrePerSecond, Rating: 16 * units.Bar, Bypass: 3 * units.Bar},
	}}
	cold, run := units.TemperatureFromCelsius(-10), units.TemperatureFromCelsius(50)
	s, err := ColdStart(p, 60*units.LitrePerMinute, oil, cold, run)
	if err != nil {
		t.Fatal(err)
	}
	// The cold path's drop is what Path.Drop gives at OilAt(cold).
	oc, _ := OilAt(oil, cold)
	want, _ := p.Drop(60*units.LitrePerMinute, oc)
	if s.Cold.Total != want.Total || s.Ratio <= 1 || s.Ratio != float64(s.Cold.Total/s.Running.Total) {
		t.Errorf("cold %v (want %v), running %v, ratio %g", s.Cold.Total, want.Total, s.Running.Total, s.Ratio)
	}
	// At −10 °C VG 46 is near 1000 mm²/s: the tube runs laminar and the
	// filter bypasses; at 50 °C the tube is turbulent.
	if s.Cold.Elements[0].Regime != Laminar || s.Running.Elements[0].Regime == Laminar || !s.Cold.Elements[2].Bypassed {
		t.Errorf("regimes cold %v, running %v; filter bypassed %v", s.Cold.Elements[0].Regime, s.Running.Elements[0].Regime, s.Cold.Elements[2].Bypassed)
	}
	for _, topic := range []string{"line.cold-drop", "line.cold-regime", "line.bypass"} {
		if len(s.Findings.Topic(topic)) != 1 {
			t.Errorf("no %s finding in %v", topic, s.Findings)
		}
	}
	if len(s.Findings.Hazard(components.ColdStart)) != 2 {
		t.Errorf("cold-start findings: %v", s.Findings.Hazard(components.ColdStart))
	}
	// Bad input: cold above running.
	_, err = ColdStart(p, 60*units.LitrePerMinute, oil, run, cold)
	wantRangeError(t, "cold above running", err, "cold")
	// A flow so small that every drop underflows to 0 has no ratio: an
	// error, not NaN.
	tiny := Path{Elements: []Element{Rated{Drop: units.Bar, Flow: 1}}}
	s, err = ColdStart(tiny, 1e-200, oil, cold, run)
	if s.Ratio != 0 || s.Cold.Elements != nil {
		t.Errorf("underflowing drops: ratio %v beside %v", s.Ratio, err)
	}
	wantRangeError(t, "underflowing drops", err, "Ratio")
	// Errors from the fluid and the path name ColdStart's parameters.
	_, err = ColdStart(p, 60*units.LitrePerMinute, oil, units.TemperatureFromCelsius(-60), run)
	wantRangeErrorIn(t, "below the pour point", err, "line.ColdStart", "cold")
	_, err = ColdStart(p, 60*units.LitrePerMinute, oil, cold, units.TemperatureFromCelsius(400))
	wantRangeErrorIn(t, "running too hot", err, "line.ColdStart", "running")
	_, err = ColdStart(p, 60*units.LitrePerMinute, fluid.Fluid{}, cold, run)
	wantRangeErrorIn(t, "zero fluid", err, "line.ColdStart", "f.Curve")
	_, err = ColdStart(Path{Elements: []Element{Pipe{Bore: 0.01}}}, 60*units.LitrePerMinute, oil, cold, run)
	wantRangeErrorIn(t, "bad element", err, "line.ColdStart", "p.Elements[0].Length")
	_, err = ColdStart(p, 0, oil, cold, run)
	wantRangeErrorIn(t, "no flow", err, "line.ColdStart", "q")
	_, err = OilAt(oil, units.TemperatureFromCelsius(-60))
	wantRangeErrorIn(t, "OilAt pour point", err, "line.OilAt", "t")
	_, err = OilAt(fluid.Fluid{}, run)
	wantRangeErrorIn(t, "OilAt zero fluid", err, "line.OilAt", "f.Curve")
}
