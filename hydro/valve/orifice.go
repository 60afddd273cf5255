package valve

import (
	"math"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// SharpEdgedCd is a discharge coefficient for a sharp-edged orifice or
// spool metering edge in turbulent flow: 0.61. Values of 0.6–0.62 are
// common practice; 0.611 is π/(π+2), the free-streamline contraction of a
// sharp-edged slot (von Mises; Merritt, Hydraulic Control Systems, 1967,
// from memory). Rounded, chamfered or long orifices discharge more (0.7–0.9),
// and at low Reynolds number Cd falls with viscosity: use a measured value
// where there is one.
const SharpEdgedCd = 0.61

// OrificeFlow returns the flow through an orifice of area a and discharge
// coefficient cd at pressure drop dp in a fluid of density rho:
//
//	Q = Cd·A·√(2·Δp/ρ)
//
// (Bernoulli's equation across the vena contracta, turbulent flow). cd
// must be in (0, 1], a and rho finite and > 0, dp finite and ≥ 0; errors
// match units.ErrRange. OrificeFlow allocates nothing.
func OrificeFlow(cd float64, a units.Area, dp units.Pressure, rho units.Density) (units.Flow, error) {
	const fn = "valve.OrificeFlow"
	if err := checkOrifice(fn, cd, rho); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "a", a); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "dp", dp); err != nil {
		return 0, err
	}
	q := units.Flow(cd * float64(a) * math.Sqrt(2*float64(dp)/float64(rho)))
	return validate.Checked(fn, "flow", q)
}

// OrificeDrop returns the pressure drop that drives flow q through an
// orifice of area a and discharge coefficient cd in a fluid of density rho,
// the orifice equation solved for the drop:
//
//	Δp = (ρ/2)·(Q/(Cd·A))²
//
// cd must be in (0, 1], a and rho finite and > 0, q finite and ≥ 0; errors
// match units.ErrRange. OrificeDrop allocates nothing.
func OrificeDrop(cd float64, a units.Area, q units.Flow, rho units.Density) (units.Pressure, error) {
	const fn = "valve.OrificeDrop"
	if err := checkOrifice(fn, cd, rho); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "a", a); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "q", q); err != nil {
		return 0, err
	}
	v := float64(q) / (cd * float64(a))
	return validate.Checked(fn, "drop", units.Pressure(float64(rho)/2*v*v))
}

// OrificeArea returns the orifice area that passes flow q at pressure drop
// dp with discharge coefficient cd in a fluid of density rho, the orifice
// equation solved for the area:
//
//	A = Q / (Cd·√(2·Δp/ρ))
//
// cd must be in (0, 1], q, dp and rho finite and > 0; errors match
// units.ErrRange. OrificeArea allocates nothing.
func OrificeArea(cd float64, q units.Flow, dp units.Pressure, rho units.Density) (units.Area, error) {
	const fn = "valve.OrificeArea"
	if err := checkOrifice(fn, cd, rho); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "dp", dp); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "area", units.Area(float64(q)/(cd*math.Sqrt(2*float64(dp)/float64(rho)))))
}

func checkOrifice(fn string, cd float64, rho units.Density) error {
	if !(cd > 0 && cd <= 1) {
		return validate.Fail(fn, "cd", cd, "> 0 and ≤ 1")
	}
	return validate.Positive(fn, "rho", rho)
}
