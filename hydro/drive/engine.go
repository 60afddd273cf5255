package drive

import (
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// CurvePoint is one point of an engine's power curve.
type CurvePoint struct {
	Speed units.RotationalSpeed // engine speed
	Power units.Power           // net power the engine delivers at that speed, from its maker's curve
}

// Engine is a combustion engine driving a pump, directly or through a
// power take-off (PTO) or pump drive gearbox.
type Engine struct {
	// Curve is the engine's net power curve: at least two points, speeds
	// strictly ascending, powers ≥ 0. Power between points is interpolated
	// linearly; outside the curve the engine is not rated.
	Curve []CurvePoint
	// Ratio is pump speed over engine speed through the PTO or gearbox
	// (1 for a pump on the crankshaft), > 0.
	Ratio float64
	// Efficiency is the PTO's or gearbox's, in (0, 1]; 1 for a direct drive.
	Efficiency float64
}

func (e Engine) check(fn string) error {
	if len(e.Curve) < 2 {
		return &units.RangeError{Func: fn, Param: "Curve", Value: strconv.Itoa(len(e.Curve)) + " points", Valid: "at least 2 points"}
	}
	for i, pt := range e.Curve {
		if err := e.checkPoint(fn, i, pt); err != nil {
			return inCurve(err, i)
		}
	}
	if err := validate.Positive(fn, "Ratio", e.Ratio); err != nil {
		return err
	}
	return efficiency(fn, "Efficiency", e.Efficiency)
}

// checkPoint checks curve point i; errors name the field alone.
func (e Engine) checkPoint(fn string, i int, pt CurvePoint) error {
	if err := validate.Positive(fn, "Speed", pt.Speed); err != nil {
		return err
	}
	if i > 0 && pt.Speed <= e.Curve[i-1].Speed {
		return validate.Above(fn, "Speed", pt.Speed, e.Curve[i-1].Speed)
	}
	return validate.NonNegative(fn, "Power", pt.Power)
}

// inCurve puts the curve point before the field a range error names:
// "Speed" → "Curve[1].Speed". It runs only on error.
func inCurve(err error, i int) error {
	re, ok := err.(*units.RangeError)
	if !ok {
		return err
	}
	c := *re
	c.Param = "Curve[" + strconv.Itoa(i) + "]." + c.Param
	return &c
}

// PowerAt returns the engine's power at engine speed n, interpolated
// linearly on the curve. n must lie within the curve's speeds; the engine
// must pass its checks (see [Engine]); errors match units.ErrRange.
// PowerAt allocates nothing unless it fails.
func (e Engine) PowerAt(n units.RotationalSpeed) (units.Power, error) {
	const fn = "drive.Engine.PowerAt"
	if err := e.check(fn); err != nil {
		return 0, err
	}
	return e.powerAt(fn, n)
}

func (e Engine) powerAt(fn string, n units.RotationalSpeed) (units.Power, error) {
	lo, hi := e.Curve[0], e.Curve[len(e.Curve)-1]
	if err := validate.InRange(fn, "n", n, lo.Speed, hi.Speed); err != nil {
		return 0, err
	}
	for i := 1; i < len(e.Curve); i++ {
		a, b := e.Curve[i-1], e.Curve[i]
		if n <= b.Speed {
			f := float64((n - a.Speed) / (b.Speed - a.Speed))
			return a.Power + units.Power(f*float64(b.Power-a.Power)), nil
		}
	}
	return hi.Power, nil
}

// EngineLoad is an engine's check against a pump's shaft power at an
// engine speed.
type EngineLoad struct {
	EngineSpeed  units.RotationalSpeed
	PumpSpeed    units.RotationalSpeed         // EngineSpeed × Ratio
	Required     units.Power                   // at the engine: the pump's shaft power / Efficiency
	Available    units.Power                   // the curve at EngineSpeed
	Power        components.Check[units.Power] // Required at most Available
	EngineTorque units.Torque                  // Required / EngineSpeed
	PumpTorque   units.Torque                  // the pump's shaft power / PumpSpeed
	Findings     components.Findings           // a caution when the engine cannot carry the load
}

// Load checks the engine against a pump shaft power shaft at engine speed
// n: the pump turns at n·Ratio, the engine must give shaft/Efficiency, and
// its curve at n must reach that. For a duty cycle pass Duty.Peak: an
// engine is limited by the power it can give at each instant, not by an
// RMS heating load. A shortfall is a failed check with a Caution finding
// (the engine lugs down and may stall, and the pump's flow falls with its
// speed), not an error. shaft must be finite and ≥ 0, n within the curve,
// and the results (Required, PumpSpeed > 0, the torques) finite; errors
// match units.ErrRange and name the argument, field or result. Load allocates only when it returns a
// finding or fails.
func (e Engine) Load(shaft units.Power, n units.RotationalSpeed) (EngineLoad, error) {
	const fn = "drive.Engine.Load"
	if err := e.check(fn); err != nil {
		return EngineLoad{}, err
	}
	if err := validate.NonNegative(fn, "shaft", shaft); err != nil {
		return EngineLoad{}, err
	}
	avail, err := e.powerAt(fn, n)
	if err != nil {
		return EngineLoad{}, err
	}
	l := EngineLoad{EngineSpeed: n, PumpSpeed: units.RotationalSpeed(float64(n) * e.Ratio), Available: avail}
	if l.PumpSpeed <= 0 || validate.Result(fn, "PumpSpeed", l.PumpSpeed) != nil {
		return EngineLoad{}, validate.Fail(fn, "PumpSpeed", l.PumpSpeed, "a finite result > 0 (Ratio too extreme)")
	}
	if l.Required, err = validate.Checked(fn, "Required", units.Power(float64(shaft)/e.Efficiency)); err != nil {
		return EngineLoad{}, err
	}
	if l.EngineTorque, err = torque(fn, "EngineTorque", l.Required, n); err != nil {
		return EngineLoad{}, err
	}
	if l.PumpTorque, err = torque(fn, "PumpTorque", shaft, l.PumpSpeed); err != nil {
		return EngineLoad{}, err
	}
	l.Power = components.Within(l.Required, avail, components.CallerRule("engine power curve"))
	if !l.Power.OK() {
		l.Findings = components.Findings{components.NewFinding(components.Caution, components.NoHazard, "drive.engine-short",
			components.CallerRule("engine power curve"),
			"the pump needs %v from the engine at %v but the engine gives %v there: it lugs down and may stall, and the pump's flow falls with its speed; run faster, limit the pump's power, or take a larger engine",
			l.Required, n, avail)}
	}
	return l, nil
}
