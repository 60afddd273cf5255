package drive

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ShaftPower returns the shaft power that drives a pump delivering flow q
// at pressure p with overall efficiency overall:
//
//	P = Δp·Q/η_o
//
// the hydraulic power Δp·Q (units.Pressure.TimesFlow) over the pump's
// overall efficiency. In the trade's units this is the familiar
// kW = bar·(L/min)/(600·η_o) and hp = psi·gpm/(1714·η_o); both constants
// follow from the unit definitions (bar = 10⁵ Pa, L/min = 10⁻³/60 m³/s;
// hp = 550 ft·lbf/s, gal = 231 in³: 1714.29 = 550·12·60/231), which is how
// this function computes them: it types no conversion constant. p must be
// finite and ≥ 0, q finite and ≥ 0, overall in (0, 1]; errors match
// units.ErrRange. ShaftPower allocates nothing.
func ShaftPower(p units.Pressure, q units.Flow, overall float64) (units.Power, error) {
	const fn = "drive.ShaftPower"
	if err := validate.NonNegative(fn, "p", p); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "q", q); err != nil {
		return 0, err
	}
	if err := efficiency(fn, "overall", overall); err != nil {
		return 0, err
	}
	pw := units.Power(float64(p.TimesFlow(q)) / overall)
	if err := validate.Result(fn, "power", pw); err != nil {
		return 0, err
	}
	return pw, nil
}

// efficiency checks 0 < eta ≤ 1.
func efficiency(fn, param string, eta float64) error {
	if !(eta > 0 && eta <= 1) {
		return validate.Fail(fn, param, eta, "> 0 and ≤ 1")
	}
	return nil
}

// NextIEC returns the smallest IEC 60072-1 rated output at or above p
// (components.IECMotorRatings, 0.06–315 kW). A requirement above the
// largest rating is not an error: the choice comes back with Chosen 0 (OK
// false). p must be finite and > 0; the error matches units.ErrRange.
// NextIEC allocates nothing.
func NextIEC(p units.Power) (components.Choice[units.Power], error) {
	c, err := components.IECMotorRatings().Select(p)
	return c, validate.Renamed(err, "drive.NextIEC", validate.Param("p"))
}

// NextNEMA returns the smallest NEMA MG 1 horsepower rating at or above p
// (components.NEMAMotorRatings, ½–500 hp), as [NextIEC] does.
func NextNEMA(p units.Power) (components.Choice[units.Power], error) {
	c, err := components.NEMAMotorRatings().Select(p)
	return c, validate.Renamed(err, "drive.NextNEMA", validate.Param("p"))
}
