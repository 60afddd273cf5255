package actuator

import (
	"math"
	"time"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Direction is the stroke of a cylinder: [Extend] pushes the rod out,
// [Retract] pulls it in.
type Direction uint8

// The two strokes.
const (
	Extend  Direction = iota // oil into the cap side (the annulus of a double-rod cylinder)
	Retract                  // oil into the annulus side
)

// RodEnds says whether the rod leaves the cylinder at one end or both.
type RodEnds uint8

// Rod arrangements.
const (
	SingleRod RodEnds = iota // the usual differential cylinder: cap side and annulus side
	DoubleRod                // a through rod of one diameter: equal annulus areas both sides
)

// Action says which strokes oil drives.
type Action uint8

// Actions.
const (
	DoubleActing Action = iota // oil drives both strokes
	SingleActing               // oil extends; the load or a spring retracts
)

// Cylinder is a hydraulic cylinder: bore (piston diameter), rod diameter,
// stroke, rod arrangement and action, and optionally the maker's pressure
// rating. The zero values of Ends and Action are the common case, a
// single-rod double-acting cylinder.
//
// Cylinder is a plain value; its methods validate it and their inputs and
// return errors matching units.ErrRange for a bad field (Rod ≥ Bore,
// a size ≤ 0 or not finite) or argument. The area and volume methods without
// an error return are plain arithmetic on the fields (call [Cylinder.Validate]
// first when the fields come from a user).
type Cylinder struct {
	Bore   units.Length   // piston (tube inside) diameter D
	Rod    units.Length   // rod diameter d, 0 < d < D
	Stroke units.Length   // stroke S
	Ends   RodEnds        // SingleRod (the zero value) or DoubleRod
	Action Action         // DoubleActing (the zero value) or SingleActing
	Rating units.Pressure // the maker's maximum pressure; 0 when not known (checks that need it then fail)
}

// Validate checks Bore and Stroke (finite, > 0), Rod (finite, > 0 and below
// Bore), Ends and Action (one of their constants) and Rating (finite, ≥ 0).
// Errors name the field and match units.ErrRange.
func (c Cylinder) Validate() error { return c.validate("actuator.Cylinder.Validate") }

func (c Cylinder) validate(fn string) error {
	if err := validate.Positive(fn, "Cylinder.Bore", c.Bore); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Cylinder.Rod", c.Rod); err != nil {
		return err
	}
	if c.Rod >= c.Bore {
		return validate.Fail(fn, "Cylinder.Rod", c.Rod, "> 0 and < Bore ("+c.Bore.String()+")")
	}
	if err := validate.Positive(fn, "Cylinder.Stroke", c.Stroke); err != nil {
		return err
	}
	if c.Ends > DoubleRod {
		return validate.Fail(fn, "Cylinder.Ends", float64(c.Ends), "SingleRod or DoubleRod")
	}
	if c.Action > SingleActing {
		return validate.Fail(fn, "Cylinder.Action", float64(c.Action), "DoubleActing or SingleActing")
	}
	return validate.NonNegative(fn, "Cylinder.Rating", c.Rating)
}

// CapArea returns the full piston area A₁ = π·D²/4, the area the cap-side
// pressure acts on (plain arithmetic).
func (c Cylinder) CapArea() units.Area { return units.CircleArea(c.Bore) }

// RodArea returns the rod section π·d²/4 (plain arithmetic).
func (c Cylinder) RodArea() units.Area { return units.CircleArea(c.Rod) }

// AnnulusArea returns the annulus area A₂ = π·(D² − d²)/4 around the rod
// (plain arithmetic).
func (c Cylinder) AnnulusArea() units.Area { return c.CapArea() - c.RodArea() }

// Area returns the area the inlet pressure acts on for stroke dir: the cap
// area to extend a single-rod cylinder, the annulus area otherwise (plain
// arithmetic).
func (c Cylinder) Area(dir Direction) units.Area {
	if dir == Extend && c.Ends == SingleRod {
		return c.CapArea()
	}
	return c.AnnulusArea()
}

// OutletArea returns the area on the side oil leaves for stroke dir: the
// annulus area to extend, the cap area to retract a single-rod cylinder
// (plain arithmetic).
func (c Cylinder) OutletArea(dir Direction) units.Area {
	if dir == Retract && c.Ends == SingleRod {
		return c.CapArea()
	}
	return c.AnnulusArea()
}

// Volume returns the oil volume stroke dir takes in over the full stroke,
// V = A·S (plain arithmetic).
func (c Cylinder) Volume(dir Direction) units.Volume { return c.Area(dir).TimesLength(c.Stroke) }

// AreaRatio returns φ = A₁/A₂, cap area over annulus area: 1 for a
// double-rod cylinder, 2 for a "2:1" single-rod one. φ is also the ratio of
// retract to extend speed at one flow.
func (c Cylinder) AreaRatio() (float64, error) {
	const fn = "actuator.Cylinder.AreaRatio"
	if err := c.validate(fn); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "φ", float64(c.Area(Extend)/c.Area(Retract)))
}

// check validates the cylinder for a stroke in dir.
func (c Cylinder) check(fn string, dir Direction) error {
	if err := c.validate(fn); err != nil {
		return err
	}
	if dir > Retract {
		return validate.Fail(fn, "dir", float64(dir), "Extend or Retract")
	}
	if dir == Retract && c.Action == SingleActing {
		return &units.RangeError{Func: fn, Param: "dir", Value: "Retract",
			Valid: "Extend (a single-acting cylinder retracts under its load or a spring)"}
	}
	return nil
}

// Force returns the force at the rod for stroke dir with inlet pressure p
// and back pressure back on the outlet side:
//
//	F = p·A_in − p_back·A_out
//
// (A_in, A_out from [Cylinder.Area] and [Cylinder.OutletArea]), ideal:
// seal friction is not deducted. It is negative when the back pressure wins.
// p must be finite and > 0, back finite and ≥ 0; a retract stroke of a
// single-acting cylinder is refused (an error matching units.ErrRange that
// names dir).
func (c Cylinder) Force(dir Direction, p, back units.Pressure) (units.Force, error) {
	const fn = "actuator.Cylinder.Force"
	if err := c.check(fn, dir); err != nil {
		return 0, err
	}
	if err := pressures(fn, p, back); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "F", c.force(dir, p, back))
}

func (c Cylinder) force(dir Direction, p, back units.Pressure) units.Force {
	return p.TimesArea(c.Area(dir)) - back.TimesArea(c.OutletArea(dir))
}

func pressures(fn string, p, back units.Pressure) error {
	if err := validate.Positive(fn, "p", p); err != nil {
		return err
	}
	return validate.NonNegative(fn, "back", back)
}

// PressureFor returns the inlet pressure that holds force load at the rod
// on stroke dir against back pressure back on the outlet side:
//
//	p = (F + p_back·A_out) / A_in
//
// the inverse of [Cylinder.Force]. load must be finite and ≥ 0, back finite
// and ≥ 0.
func (c Cylinder) PressureFor(dir Direction, load units.Force, back units.Pressure) (units.Pressure, error) {
	const fn = "actuator.Cylinder.PressureFor"
	if err := c.check(fn, dir); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "load", load); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "back", back); err != nil {
		return 0, err
	}
	return pressureOn(fn, load+back.TimesArea(c.OutletArea(dir)), c.Area(dir))
}

// pressureOn returns f/a, or an error naming fn when the quotient is not
// finite (a > 0 is the caller's invariant).
func pressureOn(fn string, f units.Force, a units.Area) (units.Pressure, error) {
	p, err := f.PerArea(a)
	if err != nil {
		return 0, validate.Fail(fn, "p", f, "a force giving a finite pressure on "+a.String())
	}
	return p, nil
}

// speedOf returns q/a, or an error naming fn when the quotient is not
// finite (a > 0 is the caller's invariant).
func speedOf(fn string, q units.Flow, a units.Area) (units.Velocity, error) {
	v, err := q.PerArea(a)
	if err != nil {
		return 0, validate.Fail(fn, "q", q, "a flow giving a finite speed through "+a.String())
	}
	return v, nil
}

// Speed returns the piston speed of stroke dir when flow q enters the inlet
// side: v = Q/A_in (no leakage). q must be finite and > 0.
func (c Cylinder) Speed(dir Direction, q units.Flow) (units.Velocity, error) {
	const fn = "actuator.Cylinder.Speed"
	if err := c.check(fn, dir); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	return speedOf(fn, q, c.Area(dir))
}

// FlowFor returns the inlet flow stroke dir needs for piston speed v:
// Q = v·A_in. v must be finite and > 0.
func (c Cylinder) FlowFor(dir Direction, v units.Velocity) (units.Flow, error) {
	const fn = "actuator.Cylinder.FlowFor"
	if err := c.check(fn, dir); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "v", v); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "Q", v.TimesArea(c.Area(dir)))
}

// ReturnFlow returns the flow leaving the outlet side when flow q enters
// the inlet side on stroke dir: Q_out = Q·A_out/A_in. Retracting a 2:1
// cylinder returns twice the pump flow: size the return line, valve and
// filter for it. A single-acting cylinder's rod side breathes air, so its
// extend stroke returns no oil (0). q must be finite and > 0.
func (c Cylinder) ReturnFlow(dir Direction, q units.Flow) (units.Flow, error) {
	const fn = "actuator.Cylinder.ReturnFlow"
	if err := c.check(fn, dir); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if c.Action == SingleActing {
		return 0, nil
	}
	return validate.Checked(fn, "Q_out", q*units.Flow(c.OutletArea(dir)/c.Area(dir)))
}

// StrokeTime returns the time for a full stroke dir at constant inlet flow
// q: t = A_in·S/Q (no acceleration; see [Profile] for ramps). q must be
// finite and > 0.
func (c Cylinder) StrokeTime(dir Direction, q units.Flow) (time.Duration, error) {
	const fn = "actuator.Cylinder.StrokeTime"
	if err := c.check(fn, dir); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	return seconds(fn, float64(c.Volume(dir))/float64(q))
}

// seconds converts s seconds to a Duration, failing when it does not fit.
func seconds(fn string, s float64) (time.Duration, error) {
	if err := validate.InRange(fn, "time (s)", s, 0, float64(math.MaxInt64)/1e9); err != nil {
		return 0, err
	}
	return time.Duration(s * float64(time.Second)), nil
}
