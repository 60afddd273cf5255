package valve

import (
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Metering is where a flow control sits relative to the actuator it
// slows.
type Metering uint8

// Metering positions. The zero Metering is unset and fails checks.
const (
	MeterIn  Metering = iota + 1 // throttles the flow into the actuator
	MeterOut                     // throttles the flow out of the actuator
	BleedOff                     // bleeds part of the pump flow to tank beside the actuator
)

var meteringNames = [...]string{"", "meter-in", "meter-out", "bleed-off"}

// String returns "meter-in", "meter-out" or "bleed-off".
func (m Metering) String() string {
	if m > 0 && int(m) < len(meteringNames) {
		return meteringNames[m]
	}
	return "Metering(" + strconv.Itoa(int(m)) + ")"
}

// MeteringTraits is what a metering position does, as data.
//
//	            holds an overrunning load   intensifies the outlet   pump pressure follows the load
//	meter-in    no                          no                       no (the relief or compensator sets it)
//	meter-out   yes                         yes                      no
//	bleed-off   no                          no                       yes
type MeteringTraits struct {
	// HoldsOverrunning: the throttle backs the outlet, so a load pulling
	// the actuator cannot run ahead of the flow.
	HoldsOverrunning bool
	// Intensifies: the throttle is on the outlet, where the inlet pressure
	// times the area ratio (plus any overrunning load) can exceed supply.
	Intensifies bool
	// FollowsLoad: the pump works at the load pressure, not at the relief
	// setting, so the surplus flow costs less heat.
	FollowsLoad bool
}

// Traits returns what the metering position does. It fails with an error
// matching units.ErrRange for a Metering that is not one of the constants.
func (m Metering) Traits() (MeteringTraits, error) {
	switch m {
	case MeterIn:
		return MeteringTraits{}, nil
	case MeterOut:
		return MeteringTraits{HoldsOverrunning: true, Intensifies: true}, nil
	case BleedOff:
		return MeteringTraits{FollowsLoad: true}, nil
	}
	return MeteringTraits{}, &units.RangeError{Func: "valve.Metering.Traits", Param: "metering", Value: m.String(),
		Valid: "MeterIn, MeterOut or BleedOff"}
}

// MeteringNeed is a flow control on a cylinder stroke.
type MeteringNeed struct {
	Metering Metering          // where the flow control sits (required)
	Cylinder actuator.Cylinder // the cylinder, with its Rating for a meter-out check
	Stroke   actuator.Direction
	// Supply is the highest pressure at the cylinder's inlet: the relief
	// or compensator setting, which the inlet reaches when the load is
	// light or stalls (> 0).
	Supply units.Pressure
	// Resist is the load opposing the stroke in the worst case for the
	// outlet side: zero (the load lost) or negative (overrunning, pulling
	// the piston along).
	Resist units.Force
	// ValveRating is the flow control's own rated pressure (0: not
	// checked).
	ValveRating units.Pressure
}

// MeteringCheck is what a flow control on a cylinder stroke does.
type MeteringCheck struct {
	Traits MeteringTraits
	// Outlet is the outlet-side pressure a meter-out valve holds back,
	// from actuator.IntensifiedPressure; zero for the other positions.
	Outlet      units.Pressure
	Cylinder    components.Check[units.Pressure] // Outlet at most the cylinder's Rating (meter-out only)
	Valve       components.Check[units.Pressure] // Outlet at most ValveRating (meter-out with a rating only)
	Intensified float64                          // Outlet / Supply
	Findings    components.Findings
}

// CheckMetering judges a flow control on a cylinder stroke. Meter-in and
// bleed-off cannot hold an overrunning load (Resist < 0): the load runs
// ahead of the flow and cavitates the inlet side, a Warning of hazard
// Runaway. Meter-out holds it, but throttles the outlet side, whose
// pressure the cylinder intensifies: p_out = (p_supply·A_in − F)/A_out,
// computed by actuator.Cylinder.Intensification, the one implementation
// of that balance, and checked against the cylinder's rating (a Danger
// finding from hydro/actuator when exceeded) and the valve's own rating
// (a Danger finding here). A 2:1 cylinder extending against a metered-out
// annulus at a 200 bar relief holds 400 bar on its rod side. For a
// meter-out check the cylinder must be double-acting with a Rating > 0.
// Errors match units.ErrRange and name the field.
func CheckMetering(n MeteringNeed) (MeteringCheck, error) {
	const fn = "valve.CheckMetering"
	tr, err := n.Metering.Traits()
	if err != nil {
		return MeteringCheck{}, &units.RangeError{Func: fn, Param: "Metering", Value: n.Metering.String(), Valid: "MeterIn, MeterOut or BleedOff"}
	}
	if err := validate.Positive(fn, "Supply", n.Supply); err != nil {
		return MeteringCheck{}, err
	}
	if err := validate.Finite(fn, "Resist", n.Resist); err != nil {
		return MeteringCheck{}, err
	}
	if err := validate.NonNegative(fn, "ValveRating", n.ValveRating); err != nil {
		return MeteringCheck{}, err
	}
	if err := n.Cylinder.Validate(); err != nil {
		return MeteringCheck{}, validate.Renamed(err, fn, nil)
	}
	mc := MeteringCheck{Traits: tr}
	if !tr.HoldsOverrunning {
		if n.Resist < 0 {
			mc.Findings = components.Findings{components.NewFinding(components.Warning, components.Runaway, "valve.metering-overrun",
				components.PhysicsRule("an overrunning load outruns an inlet-side throttle"),
				"%v cannot hold a load that pulls the cylinder with %v: it runs ahead of the flow and cavitates the inlet side; meter out, or fit a counterbalance valve",
				n.Metering.String(), -n.Resist)}
		}
		return mc, nil
	}
	in, err := n.Cylinder.Intensification(n.Stroke, n.Supply, n.Resist)
	if err != nil {
		return MeteringCheck{}, validate.Renamed(err, fn, nil)
	}
	mc.Outlet, mc.Intensified, mc.Cylinder, mc.Findings = in.Pressure, in.Ratio, in.Rating, in.Findings
	if n.ValveRating > 0 {
		mc.Valve = components.Within(in.Pressure, n.ValveRating, components.CallerRule("ValveRating"))
		if !mc.Valve.OK() {
			mc.Findings = append(mc.Findings, components.NewFinding(components.Danger, components.Overpressure, "valve.meter-out-rating",
				ruleISO4413(), "the meter-out valve holds back %v, %v × the %v supply, above its own %v rating: it can burst",
				in.Pressure, in.Ratio, n.Supply, n.ValveRating))
		}
	}
	return mc, nil
}
