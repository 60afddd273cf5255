package hydro

import (
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/units"
)

// TestCounterbalanceHoldsEveryHeldLoad: the crane's boom lifts a log
// (12 000 lbf, given as the move's force) and the counterbalance valve on
// its cap port holds it while the crane slews, not only the boom's own
// weight (900 lb at 55°): set at least 1.3 × the highest load-induced
// pressure on that side (common practice). A hold of the same load, the
// boom's valve kept shifted, puts it there too.
func TestCounterbalanceHoldsEveryHeldLoad(t *testing.T) {
	hold := craneSpec(t)
	ph := &hold.Cycle.Phases[1]
	ph.Moves = append(ph.Moves, Move{Actuator: "boom", Direction: "hold", Force: 12000 * units.PoundForce})
	for _, s := range []Spec{craneSpec(t), hold} {
		counterbalanceHolds(t, s)
	}
}

func counterbalanceHolds(t *testing.T, s Spec) {
	t.Helper()
	r, err := Size(s)
	if err != nil {
		t.Fatal(err)
	}
	boom := r.Actuators[0]
	if boom.Holding == nil {
		t.Fatal("the boom has no load-holding valve")
	}
	c := actuator.Cylinder{Bore: boom.Bore.Chosen, Rod: boom.Rod.Chosen}
	weight := 12000*units.PoundForce + (900*units.PoundMass).TimesAcceleration(units.StandardGravity)*units.Force(math.Sin(55*math.Pi/180))
	held := units.Pressure(float64(weight) / float64(c.CapArea()))
	if boom.Holding.Load.Value < held*(1-1e-12) {
		t.Errorf("held load %v, below the %v the hold puts on the cap side", boom.Holding.Load.Value, held)
	}
	if want := 1.3 * held; boom.Holding.Setting.Value < want*(1-1e-12) {
		t.Errorf("counterbalance set at %v, below 1.3 × %v = %v", boom.Holding.Setting.Value, held, want)
	}
}

// TestMotorHoldingSaidOnce: the crane's slew motor carries an overrunning
// load; the motor family's warning (brake and counterbalance) says what to
// do, and the sizer's general load-holding warning is not added beside it.
func TestMotorHoldingSaidOnce(t *testing.T) {
	r, err := Size(craneSpec(t))
	if err != nil {
		t.Fatal(err)
	}
	if f := r.Findings.Topic("hydro.load-holding"); len(f) != 0 {
		t.Errorf("a second load-holding warning: %v", f)
	}
	held := 0
	for _, f := range r.Findings.AtLeast(components.Warning) {
		if f.Hazard == components.OverrunningLoad || f.Hazard == components.SuspendedLoad {
			held++
		}
	}
	if held != 2 { // the boom's and the slew's
		t.Errorf("%d load-holding warnings, want 2: %v", held, r.Findings)
	}
}

// TestFindingsNameTheirActuator: a press with two identical rams side by
// side gets the cylinder family's load-holding warnings for each ram, each
// naming its ram; merged by their sentences alone, one would vanish and the
// other would not say which ram it is about.
func TestFindingsNameTheirActuator(t *testing.T) {
	s := demoSpec(t)
	twin := s.Actuators[0]
	twin.Name = "press 2"
	s.Actuators = append(s.Actuators, twin)
	for i := range 4 { // the press's phases: both rams move together
		ph := &s.Cycle.Phases[i]
		m := ph.Moves[0]
		m.Actuator = "press 2"
		ph.Moves = append(ph.Moves[:1:1], m)
	}
	r, err := Size(s)
	if err != nil {
		t.Fatal(err)
	}
	for _, name := range []string{"press", "press 2"} {
		n := 0
		for _, f := range r.Findings.Topic("actuator.overrunning") {
			if strings.HasPrefix(f.Text(units.Metric()), name+": ") {
				n++
			}
		}
		if n != 1 {
			t.Errorf("%s: %d overrunning-load warnings naming it, want 1; all: %v", name, n, r.Findings.Topic("actuator.overrunning"))
		}
	}
}
