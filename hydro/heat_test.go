package hydro

import (
	"math"
	"testing"
	"time"

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

// TestDwellAfterAMove: once the ejector is back, its phase dwells 2 s with
// nothing moving: the valves are centred and the load-sensing pump stands
// by, as between cycles; the 2 s are not charged at the working point of
// the move, neither to the drive's RMS nor to the heat.
func TestDwellAfterAMove(t *testing.T) {
	r := demoReport(t)
	rows := map[string]PhaseResult{}
	for _, ph := range r.Phases {
		rows[ph.Name] = ph
	}
	back, dwell, idle := rows["ejector back"], rows["ejector back, dwell"], rows["idle between cycles"]
	if dwell.Time != 2*time.Second || dwell.Mode != idle.Mode || dwell.Shaft != idle.Shaft {
		t.Errorf("dwell %+v; want 2 s like the idle time: %v, %v", dwell, idle.Mode, idle.Shaft.Value)
	}
	if m := r.Actuators[1].Moves[1]; back.Time != m.Time {
		t.Errorf("ejector back lasts %v, its move %v", back.Time, m.Time)
	}
	var cycle time.Duration
	for _, ph := range r.Phases {
		cycle += ph.Time
	}
	if cycle != 90*time.Second {
		t.Errorf("the rows add up to %v, want the 90 s cycle", cycle)
	}
}

// TestAccumulatorDrawsOnlyWhileMoving: the clamp's accumulator covers the
// quick strokes; the pump it leaves keeps up with the cycle's mean flow,
// the oil the strokes draw (flow × the time they move, not the dwell after
// them) over the cycle's hour share.
func TestAccumulatorDrawsOnlyWhileMoving(t *testing.T) {
	r, err := Size(clampSpec())
	if err != nil {
		t.Fatal(err)
	}
	var oil float64 // m³ a cycle
	for _, a := range r.Actuators {
		for _, m := range a.Moves {
			oil += float64(m.Flow.Value) * m.Time.Seconds()
		}
	}
	mean := oil / 60 // 60 cycles an hour: a 60 s cycle
	if a := r.Accumulator; a == nil || math.Abs(float64(a.PumpFlow.Value)-mean) > 0.01*mean {
		t.Errorf("pump flow with the accumulator %v, want the mean %v", r.Accumulator.PumpFlow.Value, units.Flow(mean))
	}
}
