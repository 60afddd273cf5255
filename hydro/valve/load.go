package valve

import (
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// Holder is the valve that holds an actuator's load.
type Holder uint8

// Holders.
const (
	HeldBySpool          Holder = iota // nothing but the directional valve's spool, which leaks
	HeldByPilotCheck                   // a pilot-operated check valve: holds leak-free, does not control a load coming down
	HeldByCounterbalance               // a counterbalance (over-center) valve: holds and controls an overrunning load
	HeldByFlowControl                  // a plain flow control or throttle: limits speed, does not hold
)

var holderNames = [...]string{"no load-holding valve", "pilot-operated check", "counterbalance valve", "plain flow control"}

// String returns the holder in words: "counterbalance valve".
func (h Holder) String() string {
	if int(h) < len(holderNames) {
		return holderNames[h]
	}
	return "Holder(" + strconv.Itoa(int(h)) + ")"
}

// Load says how an actuator's load behaves and what holds it.
type Load struct {
	Name        string // how findings name it: "the lift table"
	Suspended   bool   // gravity holds the load on trapped oil: it falls if the oil escapes
	Overrunning bool   // the load pulls the actuator in some motion (lowering, a slew down a slope, braking a mass)
	Holder      Holder
	// AtPort says the holder is mounted on the actuator port, flanged or
	// on rigid tube, with no hose between.
	AtPort bool
	// HoseBurstValve says a hose-burst (pipe-rupture) valve sits on the
	// actuator port.
	HoseBurstValve bool
	// Center is the directional valve's center; zero when not known (the
	// pilot-venting check is then skipped).
	Center Center
}

// LoadHolding returns what a load and its holding valve call for, per
// ISO 4413, which asks that loss of pressure, a burst line or a leaking
// valve must not let a load fall or run away:
//
//   - a suspended or overrunning load with no load-holding valve: Danger
//     (SuspendedLoad or Runaway) — fit a counterbalance or pilot-operated
//     check at the cylinder port;
//   - a plain flow control on a suspended or overrunning (overhung) load:
//     Warning — it limits speed but does not hold, and a burst downstream
//     drops the load;
//   - a pilot-operated check on an overrunning load: Warning (Runaway) —
//     it chatters or lets go as the load runs ahead; use a counterbalance;
//   - a holder down a hose from a suspended load, with no hose-burst valve
//     at the port: Warning (Burst) — a burst between them drops the load;
//   - a load-holding valve behind a center that blocks its actuator ports
//     (closed, tandem): Caution — trapped pilot pressure can hold it open,
//     so the load creeps; a float or open center vents the pilot;
//   - a load-holding valve behind a regenerative center, which joins the
//     pump to both actuator ports: Warning — pump pressure pilots it open
//     and the actuator moves with the valve centred.
//
// Errors match units.ErrRange for a Holder or a non-zero Center that is
// not one of the constants.
func LoadHolding(l Load) (components.Findings, error) {
	const fn = "valve.LoadHolding"
	if int(l.Holder) >= len(holderNames) {
		return nil, &units.RangeError{Func: fn, Param: "Holder", Value: l.Holder.String(),
			Valid: "HeldBySpool, HeldByPilotCheck, HeldByCounterbalance or HeldByFlowControl"}
	}
	var tr CenterTraits
	if l.Center != 0 {
		var err error
		if tr, err = l.Center.Traits(); err != nil {
			return nil, &units.RangeError{Func: fn, Param: "Center", Value: l.Center.String(),
				Valid: "zero (not known) or one of closed, open, tandem, float, regenerative"}
		}
	}
	if !l.Suspended && !l.Overrunning {
		return nil, nil
	}
	name := l.Name
	if name == "" {
		name = "the load"
	}
	var fs components.Findings
	add := func(sev components.Severity, hz components.Hazard, topic, format string, args ...any) {
		fs = append(fs, components.NewFinding(sev, hz, topic, ruleISO4413(), format, args...))
	}
	hz := components.SuspendedLoad
	if !l.Suspended {
		hz = components.Runaway
	}
	switch {
	case l.Holder == HeldBySpool:
		add(components.Danger, hz, "valve.no-holding",
			"%v is held only by the directional valve's spool, which leaks, and falls or runs away if a line bursts: fit a counterbalance valve or pilot-operated check on the cylinder port", name)
	case l.Holder == HeldByFlowControl:
		add(components.Warning, components.OverrunningLoad, "valve.flow-control-overhung",
			"a plain flow control limits the speed of %v but does not hold it: it drifts down past the spool and drops if a line bursts; fit a counterbalance valve on the cylinder port", name)
	case l.Holder == HeldByPilotCheck && l.Overrunning:
		add(components.Warning, components.Runaway, "valve.pilot-check-overrunning",
			"a pilot-operated check holds %v but does not control it coming down: as the load runs ahead the pilot pressure collapses and the valve chatters or lets go; use a counterbalance valve", name)
	}
	if l.Suspended && l.Holder != HeldBySpool && !l.AtPort && !l.HoseBurstValve {
		add(components.Warning, components.Burst, "valve.hose-burst",
			"the %v sits down a line from the cylinder holding %v: a burst between them drops the load; mount it on the cylinder port or fit a hose-burst valve there", l.Holder.String(), name)
	}
	if l.Center != 0 && (l.Holder == HeldByPilotCheck || l.Holder == HeldByCounterbalance) {
		fs = append(fs, pilotVenting(l, tr, hz, name)...)
	}
	return fs, nil
}

// pilotVenting says what the center does to a load-holding valve's pilot:
// nothing when it vents the actuator ports, a trapped pilot when it
// blocks them, a pressurised one when it joins them to the pump.
func pilotVenting(l Load, tr CenterTraits, hz components.Hazard, name string) components.Findings {
	switch {
	case tr.Vents():
		return nil
	case tr.Actuator == Joined:
		return components.Findings{components.NewFinding(components.Warning, hz, "valve.pilot-pressurised",
			components.PhysicsRule("a regenerative center puts pump pressure on both actuator ports"),
			"with a %v center the pump feeds both actuator ports, so pump pressure reaches the pilot of the %v and opens it: %v can move with the valve centred; a float or open center vents the pilot",
			l.Center.String(), l.Holder.String(), name)}
	}
	return components.Findings{components.NewFinding(components.Caution, hz, "valve.pilot-trapped",
		components.PracticeRule("load-holding valves want their pilot vented in the center"),
		"with a %v center the actuator ports are blocked, so pilot pressure can stay trapped and hold the %v open: %v creeps; a float or open center vents it",
		l.Center.String(), l.Holder.String(), name)}
}
