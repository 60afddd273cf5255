package fluid

import (
	"github.com/hydrosize/hydrosize/internal/saybolt"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// The upper bound of SayboltSeconds, MaxViscosity, is this package's (the
// D341 limit), not the standard's: it keeps results finite and consistent
// with Curve. The D2161 equation itself is written once, in
// internal/saybolt, which package units also reads "150 SUS" with.

// SayboltSeconds returns the Saybolt Universal viscosity at 100 °F (37.8 °C),
// in Saybolt Universal Seconds (SUS), of kinematic viscosity v, per
// ASTM D2161, ν in mm²/s:
//
//	SUS = 4.6324ν + (1 + 0.03264ν)/((3930.2 + 262.7ν + 23.97ν² + 1.646ν³)·10⁻⁵)
//
// for 1.81 ≤ ν ≤ 500 mm²/s, and SUS = 4.632ν above 500 mm²/s. v must lie
// from 1.81 mm²/s to MaxViscosity.
func SayboltSeconds(v units.KinematicViscosity) (float64, error) {
	if err := validate.InRange("fluid.SayboltSeconds", "v", v, minSUSViscosity, MaxViscosity); err != nil {
		return 0, err
	}
	return saybolt.Seconds(v.SquareMillimetresPerSecond()), nil
}

// ViscosityFromSaybolt returns the kinematic viscosity whose Saybolt
// Universal viscosity at 100 °F is s seconds: the inverse of SayboltSeconds,
// solved to round-off (the D2161 relation is strictly increasing). s must
// lie from SayboltSeconds(1.81 mm²/s) ≈ 32.0 SUS to SayboltSeconds of
// MaxViscosity. The standard's two forms overlap by 0.2 SUS at 500 mm²/s;
// in that overlap the equation branch (ν ≤ 500 mm²/s) is returned.
func ViscosityFromSaybolt(s float64) (units.KinematicViscosity, error) {
	lo, hi := saybolt.Seconds(saybolt.MinViscosity), saybolt.Seconds(MaxViscosity.SquareMillimetresPerSecond())
	if err := validate.InRange("fluid.ViscosityFromSaybolt", "s", s, lo, hi); err != nil {
		return 0, err
	}
	return mm2s(saybolt.Viscosity(s)), nil
}
