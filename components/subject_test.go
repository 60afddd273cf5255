package components

import (
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// TestAbout: a finding put about a subject names it first, in every unit
// system, keeps its severity, hazard, topic and rule, and two findings that
// differ only by their subjects both survive a merge: the left and the
// right lift cylinder each need their valve.
func TestAbout(t *testing.T) {
	f := NewFinding(Warning, SuspendedLoad, "actuator.load-holding", PracticeRule("hold it"),
		"the load's weight (%v) would drive the cylinder back", 10*units.Kilonewton)
	left, right := f.About("left lift"), f.About("right lift")
	if got, want := left.Text(units.Metric()), "left lift: the load's weight (10 kN) would drive the cylinder back"; got != want {
		t.Errorf("metric: %q, want %q", got, want)
	}
	if got, want := left.Text(units.USCustomary()), "left lift: the load's weight (2248 lbf) would drive the cylinder back"; got != want {
		t.Errorf("US: %q, want %q", got, want)
	}
	if left.Severity != f.Severity || left.Hazard != f.Hazard || left.Topic != f.Topic || left.Rule != f.Rule {
		t.Errorf("head changed: %+v", left)
	}
	if got := len(Findings{left}.Merge(right, left)); got != 2 {
		t.Errorf("merged %d findings, want 2", got)
	}
	if got, want := NewFinding(Notice, NoHazard, "x", Rule{}, "100 %v", "bar").About("50 % rig").Text(units.Metric()), "50 % rig: 100 bar"; got != want {
		t.Errorf("a %% in the subject: %q, want %q", got, want)
	}
	if f.Text(units.Metric()) != "the load's weight (10 kN) would drive the cylinder back" {
		t.Errorf("the original changed: %q", f.Text(units.Metric()))
	}
}
