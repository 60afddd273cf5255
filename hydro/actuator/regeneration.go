package actuator

import (
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Regeneration is a regenerative extend stroke: the annulus side is
// connected to the cap side, so the oil it pushes out joins the pump flow
// and the piston moves as if its area were the rod section alone.
type Regeneration struct {
	Speed   units.Velocity // v = Q/A_rod
	Force   units.Force    // F = p·A_rod
	CapFlow units.Flow     // flow into the cap side, Q·A₁/A_rod (pump plus regenerated)
	RodFlow units.Flow     // flow out of the annulus side into the cap side, Q·A₂/A_rod
}

// Regenerative returns the speed, force and flows of a regenerative extend
// stroke with pump flow q at pressure p (both finite and > 0). With the two
// sides at one pressure, the net area is A₁ − A₂ = A_rod:
//
//	v = Q/A_rod,  F = p·A_rod,  Q_cap = v·A₁ = Q + Q_rod,  Q_rod = v·A₂
//
// (ideal: no line or valve losses between the sides, no friction). A 2:1
// cylinder extends regeneratively at its retract speed with half its
// extend force. The cylinder must be single-rod and double-acting; other
// cylinders are refused with an error matching units.ErrRange that names
// the field.
func (c Cylinder) Regenerative(q units.Flow, p units.Pressure) (Regeneration, error) {
	const fn = "actuator.Cylinder.Regenerative"
	if err := c.validate(fn); err != nil {
		return Regeneration{}, err
	}
	if c.Ends != SingleRod {
		return Regeneration{}, &units.RangeError{Func: fn, Param: "Cylinder.Ends", Value: "DoubleRod",
			Valid: "SingleRod (a double-rod cylinder has no net rod area to regenerate on)"}
	}
	if c.Action != DoubleActing {
		return Regeneration{}, &units.RangeError{Func: fn, Param: "Cylinder.Action", Value: "SingleActing",
			Valid: "DoubleActing (a single-acting cylinder has no annulus oil to return)"}
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return Regeneration{}, err
	}
	if err := validate.Positive(fn, "p", p); err != nil {
		return Regeneration{}, err
	}
	v, err := speedOf(fn, q, c.RodArea())
	if err != nil {
		return Regeneration{}, err
	}
	r := Regeneration{Speed: v, Force: p.TimesArea(c.RodArea()),
		CapFlow: v.TimesArea(c.CapArea()), RodFlow: v.TimesArea(c.AnnulusArea())}
	if err := finite(fn, output{"Force", float64(r.Force)}, output{"CapFlow", float64(r.CapFlow)},
		output{"RodFlow", float64(r.RodFlow)}); err != nil {
		return Regeneration{}, err
	}
	return r, nil
}
