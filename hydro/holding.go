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
			if h.lowering == nil || m.outFlow() > h.lowering.outFlow() {
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
		need.Back, need.Coupling, need.Flow = m.back, c, m.outFlow()
	}
	cb, err := valve.CounterbalanceSetting(need)
	if err != nil {
		return err
	}
	h.cb, h.lower = cb, cb
	for _, m := range a.moves {
		if m.overruns() {
			if err := lower(a, m, cb.Setting); err != nil {
				return err
			}
		}
	}
	if m := h.lowering; m != nil {
		h.lower = *m.holding
	}
	a.holder = h
	return nil
}

// lower works out the counterbalance valve set at setting on move m, which
// the load drives: the move's own load at the same setting gives the pilot
// pressure that opens the valve, which the pump must supply at the inlet
// port, and the drop it throttles the outlet oil across, down to the
// pressure past the valve (the return path's, or on a regenerative extend
// the cap side's).
func lower(a *act, m *mv, setting units.Pressure) error {
	dyn, err := (-m.forces.Total()).PerArea(a.cyl.OutletArea(m.dir))
	if err != nil {
		return err
	}
	c, err := valve.Coupling(a.cyl, m.dir)
	if err != nil {
		return err
	}
	if dyn >= setting {
		dyn = setting * (1 - 1e-12) // the valve set for the heaviest held load already: its own load is no more
	}
	need := valve.CounterbalanceNeed{Load: dyn, Setting: setting, PilotRatio: pilotRatio, Back: m.back, Coupling: c, Flow: m.outFlow()}
	if m.spec.Regenerative {
		need.Back, need.Joined = m.supplyDrop+m.returnDrop, true
	}
	cb, err := valve.CounterbalanceSetting(need)
	if err != nil {
		return err
	}
	m.holding, m.port = &cb, cb.Pilot
	if m.spec.Regenerative {
		m.back = m.port + need.Back
	}
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
		fs = fs.Merge(about(a.holder.cb.Findings, a.spec.Name)...)
	}
	return r, fs, nil
}
