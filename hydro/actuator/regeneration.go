package actuator

import (
	"math"

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
	if err := c.regenerable(fn); err != nil {
		return Regeneration{}, err
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

// regenerable checks that c can extend regeneratively: a valid
// single-rod, double-acting cylinder.
func (c Cylinder) regenerable(fn string) error {
	if err := c.validate(fn); err != nil {
		return err
	}
	if c.Ends != SingleRod {
		return &units.RangeError{Func: fn, Param: "Cylinder.Ends", Value: "DoubleRod",
			Valid: "SingleRod (a double-rod cylinder has no net rod area to regenerate on)"}
	}
	if c.Action != DoubleActing {
		return &units.RangeError{Func: fn, Param: "Cylinder.Action", Value: "SingleActing",
			Valid: "DoubleActing (a single-acting cylinder has no annulus oil to return)"}
	}
	return nil
}

// RegenerativeNeed is what a regenerative extend stroke needs to move a
// load at a speed: see [Cylinder.RegenerativeFor].
type RegenerativeNeed struct {
	Flow     units.Flow     // pump flow, v·A_rod
	CapFlow  units.Flow     // flow into the cap side, v·A₁
	RodFlow  units.Flow     // flow out of the annulus into the cap side, v·A₂
	Pressure units.Pressure // cap (inlet) pressure for the load
}

// RegenerativeFor returns the pump flow and inlet pressure a regenerative
// extend stroke needs to move load f (the force opposing the stroke, ≥ 0)
// at speed v (≥ 0), with seal efficiency eta (in (0, 1]) and the annulus
// oil reaching the cap side dp (≥ 0) above the cap pressure, the drop of
// its way across (line, valve):
//
//	Q = v·A_rod,  Q_cap = v·A₁,  Q_rod = v·A₂,  p = (F + Δp·A₂)/(η·A_rod)
//
// from the piston's balance p·A₁ − (p + Δp)·A₂ = p·A_rod − Δp·A₂, seal
// friction taking 1 − η of the pressure's force as [Duty.Size] takes it
// (p = (F + p_back·A_out)/(η·A_in)). With Δp = 0 and η = 1 it is the
// inverse of [Cylinder.Regenerative]. A load that drives the stroke
// (F < 0) is the load-holding valve's to meter, not this; the cylinder
// must be single-rod and double-acting. Errors match units.ErrRange and
// name the argument or field.
func (c Cylinder) RegenerativeFor(v units.Velocity, f units.Force, dp units.Pressure, eta float64) (RegenerativeNeed, error) {
	const fn = "actuator.Cylinder.RegenerativeFor"
	if err := c.regenerable(fn); err != nil {
		return RegenerativeNeed{}, err
	}
	if err := validate.NonNegative(fn, "v", v); err != nil {
		return RegenerativeNeed{}, err
	}
	if err := validate.NonNegative(fn, "f", f); err != nil {
		return RegenerativeNeed{}, err
	}
	if err := validate.NonNegative(fn, "dp", dp); err != nil {
		return RegenerativeNeed{}, err
	}
	if err := validate.InRange(fn, "eta", eta, math.SmallestNonzeroFloat64, 1); err != nil {
		return RegenerativeNeed{}, err
	}
	rod := c.RodArea()
	r := RegenerativeNeed{Flow: v.TimesArea(rod), CapFlow: v.TimesArea(c.CapArea()), RodFlow: v.TimesArea(c.AnnulusArea()),
		Pressure: units.Pressure((float64(f) + float64(dp)*float64(c.AnnulusArea())) / (eta * float64(rod)))}
	if err := finite(fn, output{"Flow", float64(r.Flow)}, output{"CapFlow", float64(r.CapFlow)},
		output{"RodFlow", float64(r.RodFlow)}, output{"Pressure", float64(r.Pressure)}); err != nil {
		return RegenerativeNeed{}, err
	}
	return r, nil
}
