package actuator

import (
	"math"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Profile is the motion of one stroke: accelerate from rest at Accel, run
// at Speed, decelerate to rest at Decel.
type Profile struct {
	Speed    units.Velocity     // the constant speed aimed for, > 0
	Accel    units.Acceleration // acceleration from rest, > 0
	Decel    units.Acceleration // deceleration to rest, > 0; 0 means equal to Accel
	Distance units.Length       // travel, > 0; 0 means the full stroke (in Cylinder.Move)
}

// Motion is the timing of a [Profile].
type Motion struct {
	Time       time.Duration  // the whole stroke
	AccelTime  time.Duration  // the ramp up, v/a
	CruiseTime time.Duration  // at constant speed
	DecelTime  time.Duration  // the ramp down, v/d
	PeakSpeed  units.Velocity // Speed, or less when the travel is too short to reach it
	Triangular bool           // the travel is too short to reach Speed: no constant-speed part
}

// Time returns the timing of the profile over Distance (which must be
// set) with uniform acceleration and deceleration:
//
//	s_a = v²/(2a), s_d = v²/(2d); if s_a + s_d ≤ s: t = v/a + (s − s_a − s_d)/v + v/d
//	otherwise (triangular): v_p = √(2·s·a·d/(a + d)), t = v_p/a + v_p/d
//
// (the kinematics of uniform acceleration from rest). Errors match units.ErrRange and
// name the field.
func (p Profile) Time() (Motion, error) {
	const fn = "actuator.Profile.Time"
	if err := p.validate(fn); err != nil {
		return Motion{}, err
	}
	if err := validate.Positive(fn, "Profile.Distance", p.Distance); err != nil {
		return Motion{}, err
	}
	return p.motion(fn)
}

func (p Profile) validate(fn string) error {
	if err := validate.Positive(fn, "Profile.Speed", p.Speed); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Profile.Accel", p.Accel); err != nil {
		return err
	}
	if p.Decel != 0 {
		if err := validate.Positive(fn, "Profile.Decel", p.Decel); err != nil {
			return err
		}
	}
	return validate.NonNegative(fn, "Profile.Distance", p.Distance)
}

func (p Profile) motion(fn string) (Motion, error) {
	s, v, a, d := float64(p.Distance), float64(p.Speed), float64(p.Accel), float64(p.Decel)
	if d == 0 {
		d = a
	}
	m := Motion{PeakSpeed: p.Speed}
	cruise := 0.0
	if ramps := v * v / (2 * a) * (1 + a/d); ramps <= s {
		cruise = (s - ramps) / v
	} else {
		v = math.Sqrt(2 * s * a * d / (a + d))
		m.PeakSpeed, m.Triangular = units.Velocity(v), true
	}
	var err error
	for _, x := range []struct {
		t *time.Duration
		s float64
	}{{&m.AccelTime, v / a}, {&m.CruiseTime, cruise}, {&m.DecelTime, v / d}, {&m.Time, v/a + cruise + v/d}} {
		if *x.t, err = seconds(fn, x.s); err != nil {
			return Motion{}, err
		}
	}
	return m, nil
}

// StrokeMotion is a cylinder stroke run on a [Profile]: its timing and the
// peak flows it asks for.
type StrokeMotion struct {
	Motion
	PeakFlow   units.Flow // inlet flow at the peak speed: what the pump and valve must deliver
	PeakReturn units.Flow // outlet flow at the peak speed: what the return path must pass
}

// Move returns the timing of stroke dir run on profile p (Distance 0 means
// the full stroke; otherwise at most the stroke) and the peak inlet and
// outlet flows, v_peak·A_in and v_peak·A_out. A single-acting cylinder
// returns no oil on extend and has no powered retract. Errors match
// units.ErrRange and name the field.
func (c Cylinder) Move(dir Direction, p Profile) (StrokeMotion, error) {
	const fn = "actuator.Cylinder.Move"
	if err := c.check(fn, dir); err != nil {
		return StrokeMotion{}, err
	}
	if err := p.validate(fn); err != nil {
		return StrokeMotion{}, err
	}
	if p.Distance == 0 {
		p.Distance = c.Stroke
	}
	if err := validate.InRange(fn, "Profile.Distance", p.Distance, 0, c.Stroke); err != nil {
		return StrokeMotion{}, err
	}
	m, err := p.motion(fn)
	if err != nil {
		return StrokeMotion{}, err
	}
	r := StrokeMotion{Motion: m, PeakFlow: m.PeakSpeed.TimesArea(c.Area(dir))}
	if c.Action == DoubleActing {
		r.PeakReturn = m.PeakSpeed.TimesArea(c.OutletArea(dir))
	}
	if err := finite(fn, output{"PeakFlow", float64(r.PeakFlow)}, output{"PeakReturn", float64(r.PeakReturn)}); err != nil {
		return StrokeMotion{}, err
	}
	return r, nil
}

// Ramp holds a ramp time t (an acceleration or deceleration time, in
// seconds) against the shortest ramp the oil spring allows,
// [Resonance].MinRamp: it passes when t is at least that long. A ramp
// shorter than the rule excites the mass on the oil spring.
func (r Resonance) Ramp(t time.Duration) components.Check[float64] {
	return components.Reaches(t.Seconds(), r.MinRamp.Seconds(), r.RampRule)
}

// Cushion is the end-of-stroke cushion of a cylinder: the moving mass
// entering it at Speed is stopped over Length while the inlet pressure
// Drive still pushes and other forces (Assist) act along the motion.
type Cushion struct {
	Length units.Length   // cushion length, > 0
	Mass   units.Mass     // moving mass: load, rod and piston, > 0
	Speed  units.Velocity // speed entering the cushion, > 0
	Drive  units.Pressure // inlet pressure during cushioning (often the relief setting), ≥ 0
	Assist units.Force    // other force along the motion: weight when lowering (> 0), friction or a resisting load (< 0)
	Area   units.Area     // area of the cushion chamber, at most the outlet area; 0 means the whole outlet area (a lower, optimistic pressure)
}

// CushionCheck is the average pressure a cushion builds, held against the
// cylinder's rating.
type CushionCheck struct {
	Decel    units.Acceleration               // average deceleration v²/(2L)
	Force    units.Force                      // m·a + p_drive·A_in + F_assist, carried by the cushion chamber
	Energy   units.Energy                     // the energy absorbed, Force·L = ½·m·v² + (p_drive·A_in + F_assist)·L (0 when Force is 0)
	Pressure units.Pressure                   // average cushion pressure Force/A_c
	Rating   components.Check[units.Pressure] // Pressure at most Cylinder.Rating
	Findings components.Findings              // a warning when the rating is exceeded
}

// Cushioning returns the average pressure in the cushion chamber that stops
// the moving mass over the cushion length at the end of stroke dir:
//
//	a = v²/(2·L),  p_c = (m·a + p_drive·A_in + F_assist) / A_c
//
// (Newton's second law at uniform deceleration), checked against
// Cylinder.Rating, which must be set (> 0). A cushion that stops the mass
// evenly holds this average; real cushions peak above it, so treat a result
// near the rating as over it. Above the rating the result carries a warning
// finding. A force balance that needs no cushion pressure (the resisting
// forces stop the mass on their own) gives 0. Errors match units.ErrRange and
// name the field.
func (c Cylinder) Cushioning(dir Direction, cu Cushion) (CushionCheck, error) {
	const fn = "actuator.Cylinder.Cushioning"
	if err := c.check(fn, dir); err != nil {
		return CushionCheck{}, err
	}
	if err := validate.Positive(fn, "Cylinder.Rating", c.Rating); err != nil {
		return CushionCheck{}, err
	}
	if err := cu.validate(fn); err != nil {
		return CushionCheck{}, err
	}
	ac := cu.Area
	if ac == 0 {
		ac = c.OutletArea(dir)
	}
	if err := validate.InRange(fn, "Cushion.Area", ac, 0, c.OutletArea(dir)); err != nil {
		return CushionCheck{}, err
	}
	push := cu.Drive.TimesArea(c.Area(dir)) + cu.Assist
	r := CushionCheck{Decel: units.Acceleration(float64(cu.Speed) * float64(cu.Speed) / (2 * float64(cu.Length)))}
	r.Force = max(cu.Mass.TimesAcceleration(r.Decel)+push, 0)
	r.Energy = units.Energy(float64(r.Force) * float64(cu.Length))
	p, err := pressureOn(fn, r.Force, ac)
	if err != nil {
		return CushionCheck{}, err
	}
	if err := finite(fn, output{"Decel", float64(r.Decel)}, output{"Energy", float64(r.Energy)}); err != nil {
		return CushionCheck{}, err
	}
	r.Pressure = p
	r.Rating = components.Within(p, c.Rating, components.CallerRule("Cylinder.Rating"))
	if !r.Rating.OK() {
		r.Findings = components.Findings{components.NewFinding(components.Warning, components.Overpressure,
			"actuator.cushion", ruleISO4413(),
			"stopping %v from %v in a %v cushion builds about %v on average, above the cylinder's rating of %v: lengthen the cushion, slow down before it or lower the drive pressure",
			cu.Mass, cu.Speed, cu.Length, p, c.Rating)}
	}
	return r, nil
}

func (cu Cushion) validate(fn string) error {
	if err := validate.Positive(fn, "Cushion.Length", cu.Length); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Cushion.Mass", cu.Mass); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Cushion.Speed", cu.Speed); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "Cushion.Drive", cu.Drive); err != nil {
		return err
	}
	if err := validate.Finite(fn, "Cushion.Assist", cu.Assist); err != nil {
		return err
	}
	return validate.NonNegative(fn, "Cushion.Area", cu.Area)
}
