package hydro

import "testing"

// TestSurplusOfAFixedPump: the phases' working points and the pump
// family's findings tell the same story of a fixed pump's surplus. Through
// the crane's open center, metered by the spools, the surplus bleeds to
// tank at the load's pressure and none passes the relief while something
// moves; on the demo with
// a gear pump and a tandem center, whose valves shift fully, it passes the
// relief.
func TestSurplusOfAFixedPump(t *testing.T) {
	crane, err := Size(craneSpec(t))
	if err != nil {
		t.Fatal(err)
	}
	if f := crane.Findings.Topic("pump.surplus"); len(f) != 0 || len(crane.Findings.Topic("pump.bleed-off")) == 0 {
		t.Errorf("open center: %d surplus findings, %d bleed-off", len(f), len(crane.Findings.Topic("pump.bleed-off")))
	}
	for _, ph := range crane.Phases {
		if ph.Demand.Value > 0 && ph.Relief.Value != 0 {
			t.Errorf("open center, %q: %v over the relief", ph.Name, ph.Relief.Value)
		}
	}
	s := demoSpec(t)
	s.Circuit.Pump, s.Circuit.Control, s.Circuit.Center = "gear", "", "tandem"
	r, err := Size(s)
	if err != nil {
		t.Fatal(err)
	}
	if len(r.Findings.Topic("pump.surplus")) == 0 || len(r.Findings.Topic("pump.bleed-off")) != 0 {
		t.Errorf("tandem center: findings %v", r.Findings)
	}
	if ph := r.Phases[1]; ph.Relief.Value <= 0 { // pressing: 30 L/min of the pump's 138
		t.Errorf("tandem center, %q: nothing over the relief", ph.Name)
	}
}
