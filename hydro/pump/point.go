package pump

import (
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Point is a pump's operating point: what it delivers at an outlet
// pressure and what that costs at the shaft.
type Point struct {
	Pressure     units.Pressure     // outlet gauge pressure, standing for the pressure rise
	Flow         units.Flow         // delivered flow Q = D_g·n − Q_L
	Displacement units.Displacement // displacement in use D_g (≤ the pump's Displacement)
	Torque       units.Torque       // shaft torque T = D_g·p/(2π·η_hm)
	Shaft        units.Power        // shaft input power 2π·n·T
	Hydraulic    units.Power        // hydraulic output power p·Q
	Deadheaded   bool               // the control has stroked the pump back to make up its own leakage only
}

// Loss returns the power the pump itself turns into heat at this point,
// Shaft − Hydraulic (leakage and friction). Where the delivered flow goes
// over a relief or through a throttle, its hydraulic power is heat too.
func (pt Point) Loss() units.Power { return pt.Shaft - pt.Hydraulic }

// At returns the operating point at outlet pressure pr with the pump
// giving all the flow its control allows:
//
//   - NoControl: full stroke.
//   - PressureCompensated and LoadSensing: full stroke below Cutoff;
//     deadheaded (no delivered flow, displacement just making up leakage) at
//     or above it.
//   - PowerLimited: full stroke up to the corner pressure, then the
//     displacement whose shaft power is PowerLimit, D_g = P·η_hm/(p·n), so
//     the delivered flow falls along a hyperbola; deadheaded at or above a
//     Cutoff when one is set.
//
// A load-sensing pump in use delivers what its valves ask, not all it can:
// use [Pump.Delivering] for that point. pr must be finite and ≥ 0, and for
// a fixed pump low enough that leakage does not swallow the whole flow;
// errors match units.ErrRange. At allocates nothing.
func (p Pump) At(pr units.Pressure) (Point, error) {
	const fn = "pump.Pump.At"
	if err := p.check(fn); err != nil {
		return Point{}, err
	}
	if err := validate.NonNegative(fn, "pr", pr); err != nil {
		return Point{}, err
	}
	if p.deadheads(pr) {
		return p.point(fn, pr, p.leakage(pr), true)
	}
	qg := p.geometricAt(pr)
	if p.Control == PowerLimited {
		if qg <= p.leakage(pr) { // the limit cannot even make up leakage: the pump holds no flow here
			return p.point(fn, pr, p.leakage(pr), true)
		}
	}
	if qg < p.leakage(pr) {
		return Point{}, validate.Fail(fn, "pr", pr, "below the pressure at which leakage takes the whole flow ("+
			units.Pressure(float64(p.LeakagePressure)/(1-p.Volumetric)).String()+")")
	}
	return p.point(fn, pr, qg, false)
}

// Delivering returns the operating point of a controlled pump at outlet
// pressure pr delivering flow q, the pump stroked to D_g = (q + Q_L)/n: a
// load-sensing pump giving what its valves ask at any pr up to its Cutoff,
// or a compensated or cut-off pump at its Cutoff giving what the circuit
// takes. Below the Cutoff a pressure-compensated or power-limited pump runs
// on its curve, and a fixed pump (NoControl) always delivers its full flow:
// use [Pump.At] for those. q must be finite, ≥ 0 and at most what the pump
// can give at pr. Errors match units.ErrRange. Delivering allocates nothing.
func (p Pump) Delivering(pr units.Pressure, q units.Flow) (Point, error) {
	const fn = "pump.Pump.Delivering"
	if err := p.check(fn); err != nil {
		return Point{}, err
	}
	if p.Control == NoControl {
		return Point{}, &units.RangeError{Func: fn, Param: "Control", Value: p.Control.String(),
			Valid: "a controlled variable pump (a fixed pump delivers its full flow: use At)"}
	}
	if err := validate.NonNegative(fn, "pr", pr); err != nil {
		return Point{}, err
	}
	if p.Cutoff > 0 && pr > p.Cutoff {
		return Point{}, validate.InRange(fn, "pr", pr, 0, p.Cutoff)
	}
	if p.Control != LoadSensing && pr != p.Cutoff {
		return Point{}, validate.Fail(fn, "pr", pr, "the Cutoff ("+p.Cutoff.String()+
			"): elsewhere a "+p.Control.String()+" pump runs on its curve, so use At")
	}
	if err := validate.InRange(fn, "q", q, 0, p.capacity(pr)); err != nil {
		return Point{}, err
	}
	return p.point(fn, pr, q+p.leakage(pr), q == 0)
}

// Standby returns the deadhead point of a controlled pump with no flow
// taken: a pressure-compensated pump (or a power-limited one with a
// cut-off) at its Cutoff, a load-sensing pump at its Margin with its load
// signal vented. The whole shaft power is heat. The model strokes the pump
// just far enough to make up its own leakage; the maker's standby power or
// deadhead case-drain flow, where given, supersedes it. A fixed pump, or a
// power-limited one without a cut-off, has no standby: the error matches
// units.ErrRange.
func (p Pump) Standby() (Point, error) {
	const fn = "pump.Pump.Standby"
	if err := p.check(fn); err != nil {
		return Point{}, err
	}
	switch {
	case p.Control == LoadSensing:
		return p.point(fn, p.Margin, p.leakage(p.Margin), true)
	case p.Control != NoControl && p.Cutoff > 0:
		return p.point(fn, p.Cutoff, p.leakage(p.Cutoff), true)
	}
	return Point{}, &units.RangeError{Func: fn, Param: "Control", Value: p.Control.String(),
		Valid: "PressureCompensated, LoadSensing, or PowerLimited with a Cutoff (a pump without a cut-off has no standby)"}
}

// CornerPressure returns the pressure above which a PowerLimited pump's
// flow falls: the pressure at which full stroke reaches PowerLimit,
// p = P·η_hm/(D·n). Other controls fail with an error matching
// units.ErrRange.
func (p Pump) CornerPressure() (units.Pressure, error) {
	const fn = "pump.Pump.CornerPressure"
	if err := p.check(fn); err != nil {
		return 0, err
	}
	if p.Control != PowerLimited {
		return 0, &units.RangeError{Func: fn, Param: "Control", Value: p.Control.String(), Valid: "PowerLimited"}
	}
	c := units.Pressure(float64(p.PowerLimit) * p.Mechanical / float64(p.geometric()))
	if err := validate.Result(fn, "corner pressure", c); err != nil {
		return 0, err
	}
	return c, nil
}

// LoadSensingPressure returns the outlet pressure a LoadSensing pump holds
// for a highest load pressure load: load + Margin, capped at the Cutoff.
// Other controls fail with an error matching units.ErrRange, as does a
// load that is not finite and ≥ 0.
func (p Pump) LoadSensingPressure(load units.Pressure) (units.Pressure, error) {
	const fn = "pump.Pump.LoadSensingPressure"
	if err := p.check(fn); err != nil {
		return 0, err
	}
	if p.Control != LoadSensing {
		return 0, &units.RangeError{Func: fn, Param: "Control", Value: p.Control.String(), Valid: "LoadSensing"}
	}
	if err := validate.NonNegative(fn, "load", load); err != nil {
		return 0, err
	}
	return min(load+p.Margin, p.Cutoff), nil
}

// deadheads reports whether the control holds the pump at no delivered
// flow at pressure pr.
func (p Pump) deadheads(pr units.Pressure) bool {
	return p.Control != NoControl && p.Cutoff > 0 && pr >= p.Cutoff
}

// point builds the operating point at pressure pr with geometric flow qg.
func (p Pump) point(fn string, pr units.Pressure, qg units.Flow, deadheaded bool) (Point, error) {
	dg := units.Displacement(float64(qg) / float64(p.Speed))
	q := max(qg-p.leakage(pr), 0)
	t := units.Torque(float64(dg.TimesPressure(pr)) / p.Mechanical)
	pt := Point{Pressure: pr, Flow: q, Displacement: dg, Torque: t, Shaft: t.TimesSpeed(p.Speed),
		Hydraulic: pr.TimesFlow(q), Deadheaded: deadheaded}
	if err := validate.Result(fn, "shaft power", pt.Shaft); err != nil {
		return Point{}, err
	}
	if err := validate.Result(fn, "flow", pt.Flow); err != nil {
		return Point{}, err
	}
	if err := validate.Result(fn, "torque", pt.Torque); err != nil {
		return Point{}, err
	}
	if err := validate.Result(fn, "hydraulic power", pt.Hydraulic); err != nil {
		return Point{}, err
	}
	return pt, nil
}

// geometricAt returns the geometric flow D_g·n the control allows at
// pressure pr below any cut-off: full stroke, or for a power-limited pump
// the stroke whose shaft power is PowerLimit, D_g·n = P·η_hm/p.
func (p Pump) geometricAt(pr units.Pressure) units.Flow {
	qg := p.geometric()
	if p.Control == PowerLimited && pr > 0 {
		qg = min(qg, units.Flow(float64(p.PowerLimit)*p.Mechanical/float64(pr)))
	}
	return qg
}

// capacity returns the most flow the pump can deliver at pressure pr:
// the geometric flow its control allows less leakage, never below zero,
// and zero above a Cutoff.
func (p Pump) capacity(pr units.Pressure) units.Flow {
	if p.Control != NoControl && p.Cutoff > 0 && pr > p.Cutoff {
		return 0
	}
	return max(p.geometricAt(pr)-p.leakage(pr), 0)
}
