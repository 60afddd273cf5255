package actuator

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// IntensifiedPressure returns the pressure in the outlet chamber of a
// cylinder whose inlet chamber, of area inlet, is at pressure p while the
// outlet chamber, of area outlet, is blocked or metered out, with force
// resist at the rod opposing the motion (negative for an overrunning load
// that pulls the piston along):
//
//	p_out = (p·A_in − F_resist) / A_out
//
// the force balance on the piston, at rest or moving steadily. With no load
// the outlet pressure is p·A_in/A_out: a 2:1 cylinder extending against a
// blocked or metered-out annulus at 200 bar holds 400 bar in the annulus
// side, and an overrunning load adds to it. It returns 0 when the resisting
// load is more than p·A_in can push (the piston stalls and the outlet side
// is not compressed).
//
// This is the one implementation of the intensification balance: a family
// that checks a meter-out circuit calls it rather than repeating it. p must
// be finite and > 0, the
// areas finite and > 0, resist finite; errors match units.ErrRange.
func IntensifiedPressure(p units.Pressure, inlet, outlet units.Area, resist units.Force) (units.Pressure, error) {
	const fn = "actuator.IntensifiedPressure"
	if err := validate.Positive(fn, "p", p); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "inlet", inlet); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "outlet", outlet); err != nil {
		return 0, err
	}
	if err := validate.Finite(fn, "resist", resist); err != nil {
		return 0, err
	}
	f := p.TimesArea(inlet) - resist
	if f <= 0 {
		return 0, nil
	}
	return pressureOn(fn, f, outlet)
}

// Intensification is the outlet-side pressure of a cylinder pushing
// against a blocked or metered-out outlet, held against its rating.
type Intensification struct {
	Pressure units.Pressure                   // outlet-side pressure, from IntensifiedPressure
	Ratio    float64                          // Pressure / inlet pressure
	Rating   components.Check[units.Pressure] // Pressure at most Cylinder.Rating
	Findings components.Findings              // a danger finding when the rating is exceeded
}

// Intensification returns the outlet-side pressure of stroke dir with inlet
// pressure p against a blocked or metered-out outlet and a load resist
// opposing the motion (negative when it overruns), from
// [IntensifiedPressure], and checks it against Cylinder.Rating, which must
// be set (> 0). Above the rating the result carries a [components.Danger]
// finding: the cylinder or its seals can burst (ISO 4413 requires that no
// component sees more than its rated pressure).
func (c Cylinder) Intensification(dir Direction, p units.Pressure, resist units.Force) (Intensification, error) {
	const fn = "actuator.Cylinder.Intensification"
	if err := c.check(fn, dir); err != nil {
		return Intensification{}, err
	}
	if err := validate.Positive(fn, "Cylinder.Rating", c.Rating); err != nil {
		return Intensification{}, err
	}
	if c.Action == SingleActing {
		return Intensification{}, &units.RangeError{Func: fn, Param: "Cylinder.Action", Value: "SingleActing",
			Valid: "DoubleActing (a single-acting cylinder has no oil on its outlet side)"}
	}
	po, err := IntensifiedPressure(p, c.Area(dir), c.OutletArea(dir), resist)
	if err != nil {
		return Intensification{}, validate.Renamed(err, fn, nil)
	}
	ratio, err := validate.Checked(fn, "Ratio", float64(po/p))
	if err != nil {
		return Intensification{}, err // an inlet pressure so small that p_out/p overflows
	}
	r := Intensification{Pressure: po, Ratio: ratio,
		Rating: components.Within(po, c.Rating, components.CallerRule("Cylinder.Rating"))}
	if !r.Rating.OK() {
		r.Findings = components.Findings{components.NewFinding(components.Danger, components.Overpressure,
			"actuator.intensification", ruleISO4413(),
			"with %v at the inlet and the outlet side blocked or metered out, the outlet side of the cylinder reaches %v, above its rating of %v",
			p, po, c.Rating)}
	}
	return r, nil
}
