package hydro

import (
	"slices"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/hydro/drive"
	"github.com/hydrosize/hydrosize/hydro/line"
	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

// main lines of the power unit, and the filters in them.
type mainLines struct {
	suction, pressure, ret *lineRun
	returnFilter           units.Flow // rated flow of the return filter element; 0 when none fits
	pressureFilter         units.Flow // of the pressure filter, when one is fitted

	supply, back []line.Element // the supply path (pressure line and filter) and the return path (return line and filter)
}

// newLines sets up the main and work lines from the spec.
func (z *sizer) newLines() mainLines {
	c := z.spec.Circuit
	run := func(name, svc string, l Line, length units.Length, bends int, limit line.VelocityLimit) *lineRun {
		if l.Length != 0 {
			length, bends = l.Length, l.Bends
		}
		return &lineRun{name: name, service: svc, length: length, bends: bends, limit: limit}
	}
	ml := mainLines{
		suction:  run("suction line", "suction", c.Suction, 1*units.Metre, 1, z.limits[0]),
		pressure: run("pressure line", "pressure", c.Pressure, 4*units.Metre, 4, z.limits[1]),
		ret:      run("return line", "return", c.Return, 4*units.Metre, 4, z.limits[2]),
	}
	for _, a := range z.acts {
		length := a.spec.LineLength
		if length == 0 {
			length = defaultWorkLine
		}
		a.lineA = &lineRun{name: a.spec.Name + " line A", service: "work", length: length, bends: 2, limit: z.limits[1]}
		a.lineB = &lineRun{name: a.spec.Name + " line B", service: "work", length: length, bends: 2, limit: z.limits[1]}
	}
	return ml
}

// defaultWorkLine is the length of each work line when the spec gives
// none: 3 m, valve to actuator, with two bends (our choice).
const defaultWorkLine = 3 * units.Metre

// flows adds up each phase's pump flow and return flow from the moves.
func (z *sizer) flows() {
	for _, ph := range z.phases {
		ph.demand, ph.ret = 0, 0
		for _, m := range ph.moves {
			ph.demand += m.flow
			ph.ret += m.ret
		}
	}
}

// sizeValvesAndLines picks each actuator's directional valve and work
// lines for the highest flows through them, and the main lines for the
// pump's delivery and the highest return flow.
func (z *sizer) sizeValvesAndLines(ml *mainLines) error {
	for _, a := range z.acts {
		var qa, qb, q units.Flow
		for _, m := range a.moves {
			in, out := m.capFlow, m.ret
			if m.spec.Regenerative {
				out = m.capFlow - m.flow // the annulus oil crossing to the cap side
			}
			if l, _ := m.lines(); l.port == "B" { // oil in at B, out at A
				in, out = out, in
			}
			qa, qb = max(qa, in), max(qb, out)
			q = max(q, m.flow, m.capFlow, m.ret)
		}
		a.lineA.flow, a.lineB.flow = qa, qb
		a.lineA.hold, a.lineB.hold = z.reliefP, z.reliefP
		newA, err := z.choose(a.lineA)
		if err != nil {
			return err
		}
		newB, err := z.choose(a.lineB)
		if err != nil {
			return err
		}
		if v := pickValve(q); newA || newB || v != a.valve { // the lines are new on their first choice
			a.valve = v
			a.paths = branchPaths(a)
		}
	}
	ret := z.delivery
	for _, ph := range z.phases {
		ret = max(ret, ph.ret)
	}
	// The pressure line carries the pump's delivery, or more where an
	// accumulator adds its oil to it.
	ml.suction.flow, ml.pressure.flow, ml.ret.flow = z.delivery, max(z.delivery, z.peakDemand()), ret
	ml.pressure.hold = z.reliefP
	if _, err := z.choose(ml.suction); err != nil {
		return err
	}
	newP, err := z.choose(ml.pressure)
	if err != nil {
		return err
	}
	newR, err := z.choose(ml.ret)
	if err != nil {
		return err
	}
	rf, pf := pickFilter(ret), units.Flow(0)
	if z.pressureFiltered() {
		pf = pickFilter(ml.pressure.flow)
	}
	if newP || newR || rf != ml.returnFilter || pf != ml.pressureFilter {
		ml.returnFilter, ml.pressureFilter = rf, pf
		ml.supply, ml.back = ml.supplyElements(), ml.returnElements()
	}
	z.centerPath()
	return nil
}

// centerPath keeps the main valve's P→T path, the way an unloading center
// passes the pump's flow, in step with the valves chosen.
func (z *sizer) centerPath() {
	if v := z.mainValve(); z.centerEls == nil || v != z.centerValve {
		z.centerValve, z.centerEls = v, nonNil(valveElement("valve P→T", v))
	}
}

// pressureFiltered reports whether the circuit gets a pressure filter: when
// the most sensitive component is a servo or proportional valve (common
// practice: a pressure filter ahead of them).
func (z *sizer) pressureFiltered() bool {
	s := z.spec.Cleanliness.MostSensitive
	return s == "servo valve" || s == "proportional valve"
}

// paths of the circuit.
func (ml *mainLines) supplyElements() []line.Element {
	els := slices.Clip(ml.pressure.els)
	if ml.pressureFilter > 0 {
		els = append(els, filterElement("pressure filter", ml.pressureFilter, pressureBypass))
	}
	return els
}

func (ml *mainLines) returnElements() []line.Element {
	els := slices.Clip(ml.ret.els)
	if ml.returnFilter > 0 {
		els = append(els, filterElement("return filter", ml.returnFilter, returnBypass))
	}
	return els
}

// branches are an actuator's paths through its directional valve and work
// lines: in[i] from the pump to port i (the valve P→port, then the line),
// out[i] from port i to the tank (the line, then the valve port→T), with
// i 0 for port A and 1 for port B.
type branches struct {
	in, out [2][]line.Element
}

// branchPaths builds the branches of actuator a from its valve and lines.
func branchPaths(a *act) branches {
	var b branches
	for i, l := range [2]*lineRun{a.lineA, a.lineB} {
		b.in[i] = make([]line.Element, 0, len(l.els)+1)
		if v := valveElement(a.labels.valveIn[i], a.valve); v != nil {
			b.in[i] = append(b.in[i], v)
		}
		b.in[i] = append(b.in[i], l.els...)
		b.out[i] = make([]line.Element, len(l.els), len(l.els)+1)
		copy(b.out[i], l.els)
		if v := valveElement(a.labels.valveOut[i], a.valve); v != nil {
			b.out[i] = append(b.out[i], v)
		}
	}
	return b
}

// branchIn and branchOut are the valve and work line a move's oil passes
// on its way in and out: line A in on an extend (or a motor turning
// forward), line B in on a retract (or reverse).
func branchIn(m *mv) []line.Element {
	in, _ := m.lines()
	return m.act.paths.in[in.i]
}

func branchOut(m *mv) []line.Element {
	_, out := m.lines()
	return m.act.paths.out[out.i]
}

// port is a work line and the valve port it serves.
type port struct {
	run  *lineRun
	port string
	i    int // 0 for A, 1 for B
}

// lines returns the move's inlet and outlet work lines.
func (m *mv) lines() (in, out port) {
	a, b := port{m.act.lineA, "A", 0}, port{m.act.lineB, "B", 1}
	if m.dir == actuator.Retract || m.spec.Direction == "reverse" {
		return b, a
	}
	return a, b
}

// drops works out every path's drop at its flow with the oil of the pass:
// the branches of each move, the pressure line and the return path of each
// phase; and from them each move's back pressure and each phase's load and
// pump pressure.
func (z *sizer) drops(ml *mainLines) error {
	for _, ph := range z.phases {
		d, err := z.drop(ml.supply, ph.demand)
		if err != nil {
			return err
		}
		r, err := z.drop(ml.back, ph.ret)
		if err != nil {
			return err
		}
		ph.lineDrop, ph.retDrop = d, r
		for _, m := range ph.moves {
			in, err := z.drop(branchIn(m), m.capFlow)
			if err != nil {
				return err
			}
			out, err := z.drop(branchOut(m), m.outFlow())
			if err != nil {
				return err
			}
			m.supplyDrop, m.returnDrop = in, out
			switch {
			case m.spec.Regenerative:
				// The annulus oil joins the cap side's ahead of the valve: the
				// cap port's pressure (the last pass's) and the drops of its way.
				m.back = m.port + m.supplyDrop + m.returnDrop
			case m.ret > 0:
				m.back = m.returnDrop + ph.retDrop
			default:
				m.back = 0
			}
		}
	}
	return nil
}

// loads sets each phase's load and pump pressure from its moves.
func (z *sizer) loads() {
	z.pumpP = 0
	for _, ph := range z.phases {
		z.load(ph)
		z.pumpP = max(z.pumpP, ph.pumpP)
	}
}

// load sets phase ph's load and pump pressure from its moves.
func (z *sizer) load(ph *phase) {
	ph.load = 0
	for _, m := range ph.moves {
		ph.load = max(ph.load, m.port+m.supplyDrop)
	}
	ph.pumpP = ph.load
	if ph.working() {
		ph.pumpP += ph.lineDrop
	}
	if z.kind.control == pump.LoadSensing && ph.load > 0 {
		ph.pumpP += lsMargin // the pump holds its margin above the load it senses
	}
}

// dwell is the dwell that follows the moves of phase ph, as a phase of its
// own: the valves of the moves centred, the holds of ph still held. It is
// made once and its load worked out again on every pass.
func (z *sizer) dwell(ph *phase) *phase {
	if ph.after == nil {
		d := &phase{name: ph.name + ", dwell", spec: Phase{Name: ph.name + ", dwell", Dwell: ph.spec.Dwell}, time: ph.spec.Dwell}
		for _, m := range ph.moves {
			if m.hold() {
				d.moves = append(d.moves, m)
			}
		}
		ph.after = d
	}
	z.load(ph.after)
	return ph.after
}

// peakDemand is the highest pump flow of the cycle.
func (z *sizer) peakDemand() units.Flow {
	var q units.Flow
	for _, ph := range z.phases {
		q = max(q, ph.demand)
	}
	return q
}

// sizePump sizes the pump for the peak flow at the highest working
// pressure and builds the pump model the phases run on.
func (z *sizer) sizePump(flow units.Flow) (pump.Sizing, pump.Pump, error) {
	p := max(z.pumpP, units.Bar) // a circuit that only lowers loads still needs a little pressure
	s, err := pump.Size(pump.Need{Flow: flow, Pressure: p, Speed: z.speed, Volumetric: z.kind.volumetric, Margin: z.margin})
	if err != nil {
		return pump.Sizing{}, pump.Pump{}, err
	}
	model := pump.Pump{Displacement: s.Displacement.Chosen, Speed: z.speed, Volumetric: z.kind.volumetric,
		Mechanical: z.kind.mechanical, Variable: z.kind.variable, Control: z.kind.control}
	switch model.Control {
	case pump.PressureCompensated:
		model.Cutoff = z.cutoff()
	case pump.LoadSensing:
		model.Cutoff, model.Margin = z.cutoff(), lsMargin
	}
	return s, model, nil
}

// cutoff is a compensated pump's setting: halfway between the highest
// working pressure and the relief setting (our choice, so the compensator
// acts before the relief opens).
func (z *sizer) cutoff() units.Pressure { return (z.pumpP + z.reliefP) / 2 }

// setRelief sets the main relief its margin above the highest working pump
// pressure (valve.ReliefSetting), held against the lowest rating among
// ratings (the pump's rated pressure and the lines' wall ratings; the
// working pressure ×10, which any setting meets, when none is known yet).
func (z *sizer) setRelief(ratings ...units.Pressure) (valve.Relief, error) {
	var lowest units.Pressure
	for _, r := range ratings {
		if r > 0 && (lowest == 0 || r < lowest) {
			lowest = r
		}
	}
	working := max(z.pumpP, units.Bar)
	if lowest == 0 {
		lowest = 10 * working
	}
	r, err := valve.ReliefSetting(valve.ReliefNeed{Working: working, Margin: z.spec.Design.ReliefMargin, Rating: lowest})
	if err != nil {
		return valve.Relief{}, err
	}
	z.reliefP = r.Setting
	return r, nil
}

// operating is a phase's working point: how the pump runs and where its
// flow goes.
type operating struct {
	mode     string // "working", "relieving", "standby", "unloaded"
	point    pump.Point
	relief   units.Flow     // flow over the relief valve
	throttle units.Pressure // drop across the flow control, for the demand
	center   units.Pressure // P→T drop through an unloading center
	bleed    units.Flow     // surplus bled to tank through an open center at the pump's pressure
	use      drive.Use
}

// operate finds how the pump runs in phase ph (or, with ph nil, in the
// idle time between cycles).
func (z *sizer) operate(ph *phase, model pump.Pump) (operating, error) {
	if z.spec.Circuit.Accumulator.Use == "cycle" {
		return z.charging(ph, model)
	}
	if ph != nil && ph.working() {
		return z.working(ph, model)
	}
	holdP := units.Pressure(0)
	if ph != nil && ph.holding() {
		holdP = ph.load
	}
	switch {
	case holdP > 0 && model.Control == pump.NoControl:
		pt, err := model.At(z.reliefP)
		return operating{mode: "relieving", point: pt, relief: pt.Flow, use: drive.Relieving}, err
	case holdP > 0 && model.Control == pump.LoadSensing:
		pt, err := model.Delivering(min(ph.pumpP, model.Cutoff), 0)
		return operating{mode: "standby", point: pt, use: drive.Standby}, err
	case holdP > 0:
		pt, err := model.Standby()
		return operating{mode: "standby", point: pt, use: drive.Standby}, err
	}
	traits, _ := z.centerTraits()
	switch {
	case traits.Unloads():
		cd, err := z.drop(z.centerEls, model.Displacement.TimesSpeed(model.Speed))
		if err != nil {
			return operating{}, err
		}
		pt, err := model.At(cd)
		return operating{mode: "unloaded", point: pt, center: cd, use: drive.Working}, err
	case model.Control == pump.NoControl:
		pt, err := model.At(z.reliefP)
		return operating{mode: "relieving", point: pt, relief: pt.Flow, use: drive.Relieving}, err
	}
	pt, err := model.Standby()
	return operating{mode: "standby", point: pt, use: drive.Standby}, err
}

// charging is a phase of a circuit whose accumulator covers the peaks: the
// pump charges it at full flow up to its charge pressure, and the moves
// draw on it at that pressure through their flow controls.
func (z *sizer) charging(ph *phase, model pump.Pump) (operating, error) {
	p := z.chargeTo()
	pt, err := model.At(p)
	op := operating{mode: "charging", point: pt, use: drive.Working}
	if ph != nil && ph.working() {
		op.mode, op.throttle = "working", max(p-ph.pumpP, 0)
	}
	return op, err
}

// working is a phase in which actuators move: the pump gives the demand, a
// fixed pump's surplus going over the relief and a compensated pump
// stroking back, with a flow control metering the demand.
func (z *sizer) working(ph *phase, model pump.Pump) (operating, error) {
	p := max(ph.pumpP, 0)
	if model.Control == pump.LoadSensing {
		p = max(min(p, model.Cutoff), lsMargin)
		pt, err := model.At(p)
		if err != nil || ph.demand >= pt.Flow {
			return operating{mode: "working", point: pt, use: drive.Working}, err
		}
		pt, err = model.Delivering(p, ph.demand)
		return operating{mode: "working", point: pt, throttle: lsMargin, use: drive.Working}, err
	}
	pt, err := model.At(p)
	if err != nil || ph.demand >= pt.Flow || pt.Deadheaded {
		return operating{mode: "working", point: pt, use: drive.Working}, err
	}
	if model.Control == pump.NoControl && z.center() == valve.OpenCenter {
		// An open center, metered by its spool, bleeds a fixed pump's
		// surplus to tank at the load's pressure; a tandem or closed
		// center shifts fully and the surplus passes the relief (common
		// practice, as hydro/pump's Compatibility judges it).
		return operating{mode: "working", point: pt, bleed: pt.Flow - ph.demand, use: drive.Working}, nil
	}
	if model.Control == pump.NoControl {
		full, err := model.At(z.reliefP)
		if err != nil {
			return operating{}, err
		}
		return operating{mode: "working", point: full, relief: full.Flow - ph.demand, throttle: z.reliefP - p, use: drive.Working}, nil
	}
	pt, err = model.Delivering(model.Cutoff, ph.demand)
	return operating{mode: "working", point: pt, throttle: model.Cutoff - p, use: drive.Working}, err
}

// mainValve is the largest directional valve, the one whose center the
// pump unloads through.
func (z *sizer) mainValve() int {
	v := -1
	for _, a := range z.acts {
		v = max(v, a.valve)
	}
	return v
}

// opRule is the rule of a phase's working point.
var opRule = components.PhysicsRule("the pump family's operating point at the phase's pressure and flow")
