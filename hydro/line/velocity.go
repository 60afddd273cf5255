package line

import (
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Velocity returns the mean velocity of flow q in a bore of inside diameter
// bore: v = Q/A, A = π·d²/4. q may be 0; bore must be finite and > 0.
func Velocity(q units.Flow, bore units.Length) (units.Velocity, error) {
	const fn = "line.Velocity"
	if err := validate.NonNegative(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "bore", bore); err != nil {
		return 0, err
	}
	v, err := q.PerArea(units.CircleArea(bore))
	if err != nil {
		if err := validate.Result(fn, "v", math.Inf(1)); err != nil {
			return 0, err
		}
		return 0, nil
	}
	return v, nil
}

// MinBore returns the least inside diameter that carries flow q at no more
// than mean velocity max: d = √(4·Q/(π·v)). q and max must be finite and
// > 0.
func MinBore(q units.Flow, max units.Velocity) (units.Length, error) {
	const fn = "line.MinBore"
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "max", max); err != nil {
		return 0, err
	}
	d := units.Length(math.Sqrt(4 * float64(q) / (math.Pi * float64(max))))
	if err := validate.Result(fn, "d", d); err != nil {
		return 0, err
	}
	if d <= 0 {
		return 0, validate.Fail(fn, "q", q, "large enough that the bore does not underflow")
	}
	return d, nil
}

// Service is what a line does in the circuit; it sets the velocity limit.
type Service uint8

// Line services.
const (
	SuctionLine   Service = iota + 1 // pump inlet, from the reservoir
	PressureLine                     // pump to valves and actuators
	ReturnLine                       // valves and actuators back to the reservoir
	DrainLine                        // pilot and valve drains to the reservoir
	CaseDrainLine                    // pump or motor case drain to the reservoir
)

var serviceNames = [...]string{"", "suction", "pressure", "return", "drain", "case drain"}

// String returns the service in words: "suction", "case drain", ….
func (s Service) String() string {
	if s >= SuctionLine && s <= CaseDrainLine {
		return serviceNames[s]
	}
	return "Service(invalid)"
}

// VelocityLimit is the highest mean velocity allowed in a line and where
// that limit comes from. Build one with Service.Limit for the defaults, or
// set Max and Rule (components.CallerRule) to use your own.
type VelocityLimit struct {
	Max  units.Velocity
	Rule components.Rule
}

// Limit returns the default velocity limit of the service, the upper end of
// the usual ranges of the trade (common practice; the ranges are found in
// most fluid power texts, the exact figures differ between them):
//
//	suction     1.2 m/s  (range 0.6–1.2 m/s; low, to keep the pump inlet above its minimum pressure)
//	pressure    6 m/s    (range 3–6 m/s; the lower end suits long lines and lower pressures)
//	return      3 m/s    (range 1.5–3 m/s)
//	drain       3 m/s    (as return)
//	case drain  1.5 m/s  (the low end of the return range: case pressure limits are low, often 1–2 bar)
//
// The drain and case-drain figures are our choice within the return range.
// The zero VelocityLimit comes back for a service that is not one of the
// constants.
func (s Service) Limit() VelocityLimit {
	ms := units.MetrePerSecond
	switch s {
	case SuctionLine:
		return VelocityLimit{1.2 * ms, components.PracticeRule("suction line velocity 0.6–1.2 m/s, upper end")}
	case PressureLine:
		return VelocityLimit{6 * ms, components.PracticeRule("pressure line velocity 3–6 m/s, upper end")}
	case ReturnLine:
		return VelocityLimit{3 * ms, components.PracticeRule("return line velocity 1.5–3 m/s, upper end")}
	case DrainLine:
		return VelocityLimit{3 * ms, components.OurRule("drain line velocity as a return line, 3 m/s")}
	case CaseDrainLine:
		return VelocityLimit{1.5 * ms, components.OurRule("case drain velocity at the low end of the return range, 1.5 m/s")}
	}
	return VelocityLimit{}
}
