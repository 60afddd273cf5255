package hydro

import (
	"math"
	"strconv"
	"strings"
	"time"

	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/hydro/thermal"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

// act is one actuator through the passes.
type act struct {
	spec   Actuator
	index  int
	moves  []*mv
	labels labels

	// Set by each pass.
	cyl       actuator.Cylinder
	motor     actuator.Motor
	fit       fitted             // the governing cylinder sizing (without its findings) and its duty
	chosen    chosenSeries       // the chosen bore and rod as series
	msize     actuator.MotorSize // the governing motor sizing
	governing string             // the phase that set the size
	ok        bool               // a standard size was found
	valve     int                // index into valveSizes, −1 when none is large enough
	lineA     *lineRun           // work line to the cap side (or motor port A)
	lineB     *lineRun           // work line to the annulus side (or port B)
	paths     branches           // the paths through the valve and work lines
	holder    *holder            // the counterbalance valve fitted, if any
}

func (a *act) cylinder() bool { return a.spec.Kind == "cylinder" }

// labels are the names an actuator gives its valve's ways and its heat
// loads, written once rather than on every pass.
type labels struct {
	valveIn, valveOut [2]string // "press valve P→A", "press valve A→T"; [0] port A, [1] port B
	control           string    // its flow control
	in, out           string    // its valve and lines, in and out
	lowered, holder   string    // a lowered load, its counterbalance valve
	seal, motor       string    // a cylinder's seal friction, a motor's losses
	port              string    // its inlet port, in a pressure budget
	supply, back      string    // its valve and work line, on the way in and out
}

func labelsFor(name string) labels {
	// Each label is a slice of one string: the builder's bytes, once
	// written, do not change, so every slice of them stays as it was.
	var b strings.Builder
	b.Grow(14 * (len(name) + 20))
	l := func(suffix string) string {
		start := b.Len()
		b.WriteString(name)
		b.WriteString(suffix)
		return b.String()[start:]
	}
	return labels{
		valveIn:  [2]string{l(" valve P→A"), l(" valve P→B")},
		valveOut: [2]string{l(" valve A→T"), l(" valve B→T")},
		control:  l(" flow control"),
		in:       l(" valve and lines in"), out: l(" valve and lines out"),
		lowered: l(" lowered load"), holder: l(" counterbalance valve"),
		seal: l(" seal friction"), motor: l(" motor losses"),
		port: l(" inlet port"), supply: l(" valve and work line"), back: l(" work line and valve"),
	}
}

// mv is one move of an actuator in a phase.
type mv struct {
	spec  Move
	phase *phase
	act   *act
	dir   actuator.Direction
	dist  units.Length   // travel (cylinders)
	speed units.Velocity // rod speed (cylinders)
	shaft units.RotationalSpeed
	time  time.Duration // the move's time; 0 for a hold

	// Set by each pass.
	forces     actuator.LoadForces
	port       units.Pressure        // inlet port pressure
	back       units.Pressure        // outlet port pressure: the return path's drop
	flow       units.Flow            // pump flow the move takes
	capFlow    units.Flow            // flow into the inlet port (the cap flow of a regenerative extend)
	ret        units.Flow            // flow out of the outlet port to the return line
	supplyDrop units.Pressure        // valve and work line on the way in
	returnDrop units.Pressure        // work line and valve on the way out (the return line's share is in back too)
	holding    *valve.Counterbalance // the load-holding valve on a move the load drives: its pilot and throttling
	fit        fitted                // the family's sizing of the move on the chosen cylinder, for its findings
}

func (m *mv) hold() bool { return m.spec.Direction == "hold" }

// outFlow is the flow out of the outlet port: to the return line, or on a
// regenerative extend across to the cap side.
func (m *mv) outFlow() units.Flow {
	if m.spec.Regenerative {
		return m.capFlow - m.flow
	}
	return m.ret
}

// overruns reports a cylinder move whose load drives it (its total force
// is below 0): the pump only fills the inlet; a counterbalance valve holds
// the load back.
func (m *mv) overruns() bool { return m.act.cylinder() && !m.hold() && m.forces.Total() < 0 }

// phase is one phase of the cycle.
type phase struct {
	name  string
	spec  Phase
	moves []*mv
	time  time.Duration // moves and dwell
	move  time.Duration // the longest move

	// Set by each pass.
	demand   units.Flow     // pump flow the moves take
	ret      units.Flow     // flow back to the tank through the return line
	load     units.Pressure // highest inlet port pressure plus its branch drop
	pumpP    units.Pressure // pump outlet pressure
	lineDrop units.Pressure // pressure line drop at the phase's flow
	retDrop  units.Pressure // return line and filter drop at the phase's return flow
	loads    []thermal.Load // its heat loads, in a buffer each pass fills again
	after    *phase         // the dwell after its moves, once made (dwell)
}

// working reports a phase in which something moves.
func (ph *phase) working() bool {
	for _, m := range ph.moves {
		if !m.hold() {
			return true
		}
	}
	return false
}

// holding reports a phase in which an actuator holds a load.
func (ph *phase) holding() bool {
	for _, m := range ph.moves {
		if m.hold() {
			return true
		}
	}
	return false
}

// resolveCycle builds the actuators and phases and times every move.
func (z *sizer) resolveCycle() error {
	spec := z.spec
	acts := make([]act, len(spec.Actuators)) // one allocation for all, and one for all moves
	z.acts = make([]*act, len(acts))
	byName := make(map[string]*act, len(acts))
	for i, a := range spec.Actuators {
		acts[i] = act{spec: a, index: i, valve: -1, labels: labelsFor(a.Name)}
		z.acts[i] = &acts[i]
		byName[a.Name] = &acts[i]
	}
	count, each := 0, make([]int, len(acts)) // moves in all, and of each actuator
	for _, p := range spec.Cycle.Phases {
		count += len(p.Moves)
		for _, m := range p.Moves {
			each[byName[m.Actuator].index]++
		}
	}
	for i, a := range z.acts {
		a.moves = make([]*mv, 0, each[i])
	}
	moves := make([]mv, 0, count)
	phases := make([]phase, len(spec.Cycle.Phases))
	z.phases = make([]*phase, len(phases))
	for i, p := range spec.Cycle.Phases {
		ph := &phases[i]
		*ph = phase{name: p.Name, spec: p, moves: make([]*mv, 0, len(p.Moves))}
		if ph.name == "" {
			ph.name = "phase " + strconv.Itoa(i+1)
		}
		for _, m := range p.Moves {
			a := byName[m.Actuator]
			moves = append(moves, mv{spec: m, phase: ph, act: a, dir: direction(m.Direction)})
			x := &moves[len(moves)-1]
			x.timeIt()
			ph.moves = append(ph.moves, x)
			a.moves = append(a.moves, x)
		}
		z.phases[i] = ph
	}
	z.retime()
	return nil
}

// retime sets each phase's time from its moves' and the idle time between
// cycles.
func (z *sizer) retime() {
	var total time.Duration
	for _, ph := range z.phases {
		ph.move = 0
		for _, m := range ph.moves {
			ph.move = max(ph.move, m.time)
		}
		ph.time = ph.move + ph.spec.Dwell
		total += ph.time
	}
	z.idle = 0
	if cph := z.spec.Cycle.CyclesPerHour; cph > 0 {
		z.idle = max(time.Duration(float64(time.Hour)/cph)-total, 0)
	}
}

// timeIt works out a move's speed, travel and time from what the spec
// gives (distance over speed, or the time given).
func (m *mv) timeIt() {
	s := m.spec
	if m.hold() {
		return
	}
	if m.act.cylinder() {
		m.dist = m.act.spec.Stroke
		if s.Distance > 0 {
			m.dist = s.Distance
		}
		m.speed, m.time = s.Speed, s.Time
		switch {
		case s.Speed > 0:
			m.time = seconds2(float64(m.dist / units.Length(s.Speed)))
		case s.Time > 0:
			m.speed = units.Velocity(float64(m.dist) / s.Time.Seconds())
		}
		return
	}
	m.shaft, m.time = s.ShaftSpeed, s.Time
	switch {
	case s.Time > 0 && s.ShaftSpeed > 0:
	case s.Time > 0:
		m.shaft = units.RotationalSpeed(s.Turns / s.Time.Seconds())
	default:
		m.time = seconds2(s.Turns / float64(s.ShaftSpeed))
	}
}

// seconds2 converts seconds to a duration, rounded to the nanosecond.
func seconds2(s float64) time.Duration { return time.Duration(math.Round(s * 1e9)) }
