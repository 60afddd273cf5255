package line

import (
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

func TestSelectTube(t *testing.T) {
	mm := units.Millimetre
	// 60 L/min in a return line (3 m/s): MinBore = √(4·0.001/(π·3)) = 20.60 mm.
	need := TubeNeed{Flow: 60 * units.LitrePerMinute, Limit: ReturnLine.Limit(), Class: components.LightTube}
	c, err := SelectTube(need)
	if err != nil {
		t.Fatal(err)
	}
	// L series ascending by ID: 22 × 1.5 (19 mm) is too small; 28 × 2.5
	// (23 mm) is the first at or above 20.60 mm.
	if c.Tube != (components.Tube{OD: 28 * mm, Wall: 2.5 * mm, Class: components.LightTube}) ||
		!c.Bore.OK() || !c.Velocity.OK() || !near(c.Bore.Required.Millimetres(), 20.60, 0.005) {
		t.Errorf("return tube: %v, bore %v, velocity %v", c.Tube, c.Bore, c.Velocity)
	}
	v, _ := Velocity(need.Flow, c.Tube.ID())
	if c.Velocity.Value != v || c.Velocity.Limit != 3*units.MetrePerSecond {
		t.Errorf("velocity check %v, want %v against 3 m/s", c.Velocity, v)
	}
	// With a pressure to hold, the wall must be rated for it too: 250 bar
	// on a 4 L/min drain-sized flow in S-series tube of 410 MPa steel at
	// safety factor 4 (Barlow on the OD).
	need = TubeNeed{Flow: 4 * units.LitrePerMinute, Limit: PressureLine.Limit(), Class: components.HeavyTube,
		Pressure: 250 * units.Bar, Strength: 410 * units.Megapascal, Safety: 4}
	c, err = SelectTube(need)
	if err != nil || !c.Pressure.OK() || c.Wall.Working < 250*units.Bar || c.Bore.Chosen < c.Bore.Required {
		t.Fatalf("pressure tube: %v, wall %v, %v", c.Tube, c.Wall.Working, err)
	}
	for _, tb := range components.MetricTubes(components.HeavyTube) {
		if tb == c.Tube {
			break
		}
		w, _ := Barlow(tb.OD, tb.Wall, need.Strength, 4, OutsideDiameter)
		if tb.ID() >= c.Bore.Required && w.Working >= need.Pressure {
			t.Errorf("%v comes before %v and meets the need", tb, c.Tube)
		}
	}
	// Nothing in the series carries 2000 L/min.
	c, err = SelectTube(TubeNeed{Flow: 2000 * units.LitrePerMinute, Limit: ReturnLine.Limit(), Class: components.LightTube})
	if err != nil || c.Bore.OK() || len(c.Findings.Topic("line.no-tube")) != 1 {
		t.Errorf("no tube: %v, %v, %v", c.Bore, c.Findings, err)
	}
}

func TestSelectHose(t *testing.T) {
	// 40 L/min suction at 1.2 m/s: MinBore = √(4·(0.04/60)/(π·1.2)) =
	// 26.60 mm; the next dash size is -20 (1¼ in, 31.75 mm).
	c, err := SelectHose(40*units.LitrePerMinute, SuctionLine.Limit())
	if err != nil || c.Size != 20 || !c.Velocity.OK() || !near(c.Bore.Required.Millimetres(), 26.60, 0.005) {
		t.Errorf("suction hose: %v, %v, %v", c.Size, c.Bore, err)
	}
	c, _ = SelectHose(20000*units.LitrePerMinute, SuctionLine.Limit())
	if c.Size != 0 || len(c.Findings.Topic("line.no-hose")) != 1 {
		t.Errorf("no hose: %v, %v", c.Size, c.Findings)
	}
}

func TestSelectBadInput(t *testing.T) {
	ok := TubeNeed{Flow: 1e-3, Limit: ReturnLine.Limit()}
	bad := func(f func(*TubeNeed)) error { n := ok; f(&n); _, err := SelectTube(n); return err }
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"flow", bad(func(n *TubeNeed) { n.Flow = 0 }), "Flow"},
		{"limit", bad(func(n *TubeNeed) { n.Limit = VelocityLimit{} }), "Limit.Max"},
		{"class", bad(func(n *TubeNeed) { n.Class = 9 }), "Class"},
		{"pressure", bad(func(n *TubeNeed) { n.Pressure = -1 }), "Pressure"},

		{"hose flow", second(SelectHose(-1, SuctionLine.Limit())), "Flow"},
		{"hose limit", second(SelectHose(1e-3, VelocityLimit{})), "Limit.Max"},
	} {
		wantRangeError(t, c.name, c.err, c.param)
	}
	// Errors of the Barlow rating name SelectTube's fields.
	wantRangeErrorIn(t, "strength", bad(func(n *TubeNeed) { n.Pressure = 1e7; n.Safety = 4 }), "line.SelectTube", "Strength")
	wantRangeErrorIn(t, "safety", bad(func(n *TubeNeed) { n.Pressure = 1e7; n.Strength = 4e8 }), "line.SelectTube", "Safety")
}

// pressureTubeNeed is 95 L/min in a pressure line holding 220 bar, in
// S-series tube of 340 MPa steel at safety factor 4: a need a tube meets,
// so the choice has no findings.
func pressureTubeNeed() TubeNeed {
	return TubeNeed{Flow: 95 * units.LitrePerMinute, Limit: PressureLine.Limit(), Class: components.HeavyTube,
		Pressure: 220 * units.Bar, Strength: 340 * units.Megapascal, Safety: 4}
}

func TestSelectTubeAllocations(t *testing.T) {
	n := pressureTubeNeed()
	if c, err := SelectTube(n); err != nil || !c.Bore.OK() || len(c.Findings) != 0 {
		t.Fatalf("SelectTube = %v, %v; want a tube without findings", c, err)
	}
	if a := testing.AllocsPerRun(100, func() { _, _ = SelectTube(n) }); a != 0 {
		t.Errorf("SelectTube allocates %v times for a need a tube meets; want 0", a)
	}
}

func BenchmarkSelectTube(b *testing.B) {
	n := pressureTubeNeed()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := SelectTube(n); err != nil {
			b.Fatal(err)
		}
	}
}
