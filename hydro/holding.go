package hydro

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

// pilotRatio is the pilot ratio of the counterbalance valves the sizer
// fits: 3:1 (our choice, from the 3:1 to 8:1 makers offer: a low ratio
// keeps a load that varies steady, at the cost of pilot pressure).
const pilotRatio = 3.0

// holder is the counterbalance valve fitted at a cylinder port that holds
// a suspended or overrunning load.
type holder struct {
	suspended, overrunning bool
	load                   units.Pressure // the highest load-induced pressure on the held side
	cb                     valve.Counterbalance
	lowering               *mv                  // the move the load drives, whose pilot opens the valve
	lower                  valve.Counterbalance // the same valve on that move: its pilot and throttling
}

// holds reports whether the load can fall or run away: the spec says so, a
// move lets the load drive the cylinder, or its weight along the path
// exceeds the guide's friction.
func (a *act) holds() (suspended, overrunning bool) {
	suspended, overrunning = a.spec.Suspended, a.spec.Overrunning
	for _, m := range a.moves {
		if m.overruns() {
			overrunning = true
		}
		if m.forces.Gravity > m.forces.Friction {
			suspended = true
		}
	}
	return suspended, overrunning
}

// fitHolder sizes the counterbalance valve of cylinder a
// (valve.CounterbalanceSetting): its load pressure is the highest the load
// puts on the held side — on the outlet of a move the load drives, or on the
// inlet of a move or hold that raises it, held still — and the pilot
// pressure that opens it becomes the inlet pressure of the move the load
// drives. On the held side the process force counts with the weight: a
// load the spec gives as a force (a log on a crane's boom) falls as the
// weight does when pressure is lost, so the valve must hold it too.
func (z *sizer) fitHolder(a *act) error {
	a.holder = nil
	s, o := a.holds()
	if !a.cylinder() || !a.ok || !s && !o {
		return nil
	}
	h := &holder{suspended: s, overrunning: o}
	for _, m := range a.moves {
		switch {
		case m.overruns():
			p, err := (-m.forces.Total()).PerArea(a.cyl.OutletArea(m.dir))
			if err != nil {
				return err
			}
			h.load = max(h.load, p)
			if h.lowering == nil || m.ret > h.lowering.ret {
				h.lowering = m
			}
		case m.forces.Gravity > m.forces.Friction:
			p, err := heldPressure(a.cyl, m)
			if err != nil {
				return err
			}
			h.load = max(h.load, p)
		}
	}
	if h.load <= 0 {
		return nil
	}
	need := valve.CounterbalanceNeed{Load: h.load, PilotRatio: pilotRatio}
	if m := h.lowering; m != nil {
		c, err := valve.Coupling(a.cyl, m.dir)
		if err != nil {
			return err
		}
		need.Back, need.Coupling, need.Flow = m.back, c, m.ret
	}
	cb, err := valve.CounterbalanceSetting(need)
	if err != nil {
		return err
	}
	h.cb, h.lower = cb, cb
	if m := h.lowering; m != nil {
		// The move's own load, at the same setting: what opens the valve and
		// what it throttles while this move runs.
		dyn, err := (-m.forces.Total()).PerArea(a.cyl.OutletArea(m.dir))
		if err != nil {
			return err
		}
		need.Load, need.Setting = dyn, cb.Setting
		if h.lower, err = valve.CounterbalanceSetting(need); err != nil {
			return err
		}
		m.port = h.lower.Pilot // the pump must open the valve to lower the load
	}
	a.holder = h
	return nil
}

// heldPressure is the pressure a move that raises the load (or a hold
// against it) puts on the inlet side when it stops: its process force and
// the weight along the path, less the guide friction while it moves (none
// credited to a hold, which has no motion to set its direction).
func heldPressure(c actuator.Cylinder, m *mv) (units.Pressure, error) {
	f := m.forces.Process + m.forces.Gravity
	if !m.hold() {
		f -= m.forces.Friction
	}
	return f.PerArea(c.Area(m.dir))
}

// holdingResult reports the load-holding valve of an actuator with what
// the valve family says of it (valve.LoadHolding).
func (z *sizer) holdingResult(a *act) (*Holding, components.Findings, error) {
	s, o := a.holds()
	if !a.cylinder() || !s && !o {
		return nil, nil, nil // a motor's holding is the motor family's brake caution
	}
	l := valve.Load{Name: a.spec.Name, Suspended: s, Overrunning: o, Center: z.center()}
	var r *Holding
	if h := a.holder; h != nil {
		l.Holder, l.AtPort = valve.HeldByCounterbalance, true
		rule := h.cb.PilotRule
		r = &Holding{Valve: valve.HeldByCounterbalance.String(),
			Load:    Value[units.Pressure]{h.load, components.PhysicsRule("the load's force on the held side over its area")},
			Setting: Value[units.Pressure]{h.cb.Setting, h.cb.RatioRule},
			Pilot:   Value[units.Pressure]{h.lower.Pilot, rule},
			Ratio:   Value[float64]{pilotRatio, components.OurRule("pilot ratio 3:1")},
		}
	}
	fs, err := valve.LoadHolding(l)
	if err != nil {
		return nil, nil, err
	}
	if a.holder != nil {
		fs = fs.Merge(a.holder.cb.Findings...)
	}
	return r, fs, nil
}
