package hydro

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// TestPhaseEnergyBalance: in every phase of the demo, the crane and some
// variants of the demo (a regenerative approach that pushes a load, a
// fixed pump over its relief or through a tandem center, two moves at
// once at different loads), what
// goes in — the pump's shaft power and the power of a load that drives
// its actuator (a weight lowered, F·v with F < 0) — comes out as heat in
// the oil or as work at the rods and shafts (F·v, T·ω with the load
// opposing the motion): the first law, which the itemised heat of
// hydro/thermal must obey. Tolerance 0.5 % of the phase's input: the
// pressures come from the coupled passes, which stop at 0.05 bar.
func TestPhaseEnergyBalance(t *testing.T) {
	level := demoSpec(t) // a horizontal press: its regenerative approach pushes a load
	level.Actuators[0].Orientation, level.Actuators[0].Friction = "horizontal", 0.2
	gear := demoSpec(t) // a fixed pump, its surplus over the relief
	gear.Circuit.Pump, gear.Circuit.Control = "gear", ""
	tandem := gear // … or through a tandem center
	tandem.Circuit.Center = "tandem"
	together := demoSpec(t) // two moves at once, at different loads
	together.Cycle.Phases = append([]Phase{}, together.Cycle.Phases...)
	together.Cycle.Phases[3].Moves = append(together.Cycle.Phases[3].Moves, together.Cycle.Phases[4].Moves...)
	together.Cycle.Phases = append(together.Cycle.Phases[:4], together.Cycle.Phases[5:]...)
	for name, s := range map[string]Spec{"demo": demoSpec(t), "crane": craneSpec(t), "level": level, "gear": gear,
		"tandem": tandem, "together": together} {
		r, err := Size(s)
		if err != nil {
			t.Fatal(err)
		}
		for _, ph := range r.Phases {
			var work units.Power // > 0 done on the loads, < 0 given by them
			for _, a := range r.Actuators {
				for _, m := range a.Moves {
					if m.Phase != ph.Name {
						continue
					}
					work += m.Force.Value.TimesVelocity(m.Speed.Value)
					work += units.Power(float64(m.Torque.Value) * 2 * math.Pi * float64(m.ShaftSpeed.Value))
				}
			}
			in := ph.Shaft.Value + max(-work, 0)
			out := ph.Heat.Value + max(work, 0)
			if math.Abs(float64(out-in)) > 0.005*float64(in) {
				t.Errorf("%s, %q: heat %v + work %v = %v, but shaft %v + load %v = %v",
					name, ph.Name, ph.Heat.Value, max(work, 0), out, ph.Shaft.Value, max(-work, 0), in)
			}
		}
	}
}
