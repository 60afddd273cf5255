package hydro

import (
	"testing"

	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/units"
)

// TestCounterbalanceHoldsEveryHeldLoad: the crane's boom lifts a log and
// holds it while the crane slews; the counterbalance valve on its cap port
// must hold the log too, not only the boom's own weight: set at least
// 1.3 × the highest load-induced pressure on that side (common practice),
// here the hold's force over the cap area.
func TestCounterbalanceHoldsEveryHeldLoad(t *testing.T) {
	r, err := Size(craneSpec(t))
	if err != nil {
		t.Fatal(err)
	}
	boom := r.Actuators[0]
	if boom.Holding == nil {
		t.Fatal("the boom has no load-holding valve")
	}
	c := actuator.Cylinder{Bore: boom.Bore.Chosen, Rod: boom.Rod.Chosen}
	var held units.Pressure
	for _, m := range boom.Moves {
		if m.Direction == "hold (extend)" {
			held = units.Pressure(float64(m.Force.Value) / float64(c.CapArea()))
		}
	}
	if held == 0 {
		t.Fatal("no hold in the crane's cycle")
	}
	if boom.Holding.Load.Value < held*(1-1e-12) {
		t.Errorf("held load %v, below the %v the hold puts on the cap side", boom.Holding.Load.Value, held)
	}
	if want := 1.3 * held; boom.Holding.Setting.Value < want*(1-1e-12) {
		t.Errorf("counterbalance set at %v, below 1.3 × %v = %v", boom.Holding.Setting.Value, held, want)
	}
}
