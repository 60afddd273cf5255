package pump

import (
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// The troposphere of the standard atmosphere (ISO 2533:1975, identical
// with the ICAO Standard Atmosphere, ICAO Doc 7488, and below 32 km with the
// U.S. Standard Atmosphere, 1976): sea-level pressure and temperature, the
// temperature lapse rate, and the constants of the barometric formula.
const (
	seaLevelPa    = float64(units.StandardAtmosphere) // p₀ = 101 325 Pa
	seaLevelK     = 288.15                            // T₀, K
	lapseKPerM    = 0.0065                            // L, K/m: the temperature falls by 6.5 K per km
	gravityMPerS2 = float64(units.StandardGravity)    // g₀ = 9.80665 m/s², the standard's and units' one value
	airMolarKg    = 0.0289644                         // M, kg/mol
	gasConstant   = 8.31432                           // R*, J/(mol·K), the value the standard atmospheres use
)

// Altitudes the troposphere formula accepts. The standard atmosphere is
// defined down to −2000 m (ISO 2533, from memory) and its lowest layer ends
// at the tropopause, 11 000 m.
const (
	LowestAltitude  units.Length = -2000
	HighestAltitude units.Length = 11000
)

// Atmosphere returns the pressure of the standard atmosphere at geopotential
// altitude h, from the troposphere's barometric formula
//
//	p = p₀·(1 − L·h/T₀)^(g₀·M/(R*·L))
//
// with p₀ = 101 325 Pa, T₀ = 288.15 K, L = 0.0065 K/m, g₀ = 9.80665 m/s²,
// M = 0.0289644 kg/mol, R* = 8.31432 J/(mol·K) (ISO 2533:1975; ICAO Doc 7488;
// U.S. Standard Atmosphere, 1976): p = 101 325·(1 − 2.25577·10⁻⁵·h)^5.25588
// Pa, h in m. Below 11 km geopotential and geometric altitude (a site's
// elevation) differ by less than 0.2 %, which moves the pressure by less
// than 0.05 %. Weather moves a site's real barometric pressure by a few
// percent either way: where a measured value is known, use it
// ([SitePressure]). h must be from LowestAltitude to HighestAltitude; the
// error matches units.ErrRange. Atmosphere allocates nothing.
func Atmosphere(h units.Length) (units.AbsolutePressure, error) {
	if err := validate.InRange("pump.Atmosphere", "h", h, LowestAltitude, HighestAltitude); err != nil {
		return 0, err
	}
	exponent := gravityMPerS2 * airMolarKg / (gasConstant * lapseKPerM)
	return units.AbsolutePressure(seaLevelPa * math.Pow(1-lapseKPerM*float64(h)/seaLevelK, exponent)), nil
}

// Ambient is the atmospheric pressure over a reservoir's free surface and
// where it comes from. Build it with [SiteAltitude] or [SitePressure]; the
// zero Ambient is unset and fails an inlet check, so no result rests on an
// ambient pressure nobody chose.
type Ambient struct {
	Pressure units.AbsolutePressure
	Rule     components.Rule
}

// SiteAltitude returns the ambient pressure of the standard atmosphere at a
// site's altitude h (see [Atmosphere]), with its rule.
func SiteAltitude(h units.Length) (Ambient, error) {
	p, err := Atmosphere(h)
	if err != nil {
		return Ambient{}, err
	}
	return Ambient{Pressure: p, Rule: components.StandardRule("ISO 2533:1975 standard atmosphere, troposphere, at " +
		strconv.FormatFloat(float64(h), 'f', -1, 64) + " m")}, nil
}

// SitePressure returns an ambient pressure the caller measured or chose
// (a design barometric pressure). p must be finite and > 0; the error
// matches units.ErrRange.
func SitePressure(p units.AbsolutePressure) (Ambient, error) {
	if err := validate.Positive("pump.SitePressure", "p", p); err != nil {
		return Ambient{}, err
	}
	return Ambient{Pressure: p, Rule: components.CallerRule("site ambient pressure")}, nil
}

// Inlet describes the suction side of a pump at its worst case, the cold
// start: the oil is thickest, so the suction line loses most.
type Inlet struct {
	Ambient Ambient // atmospheric pressure over the reservoir (required)

	// Tank is the gauge pressure of the air over the free surface: zero for
	// a breathing reservoir, above zero for a pressurised (boosted) one.
	Tank units.Pressure
	// Head is the height of the oil's free surface above the pump inlet:
	// positive for a flooded inlet (oil level above it), negative where
	// the pump lifts the oil (inlet above the oil level). Take the lowest
	// working oil level.
	Head units.Length
	// Density is the oil's density at the cold-start temperature (from
	// package fluid).
	Density units.Density
	// Loss is the suction line's pressure loss at the pump's flow and the
	// cold-start viscosity: strainer, entry, friction, fittings and the
	// velocity head at the port (from hydro/line, or the caller's own).
	Loss units.Pressure
	// Minimum is the pump maker's lowest permitted absolute inlet pressure
	// at this speed and viscosity (required).
	Minimum units.AbsolutePressure
}

// InletResult is the absolute pressure at a pump inlet and its check
// against the maker's minimum.
type InletResult struct {
	Ambient  Ambient                                  // the ambient pressure used, with its rule
	Static   units.Pressure                           // ρ·g₀·Head, negative where the pump lifts the oil
	Pressure units.AbsolutePressure                   // p_in = p_amb + p_tank + ρ·g₀·h − Δp_loss
	Check    components.Check[units.AbsolutePressure] // Pressure at least Minimum
	Findings components.Findings                      // a cavitation warning when the check fails
}

// CheckInlet returns the absolute pressure at the pump inlet,
//
//	p_in = p_amb + p_tank + ρ·g₀·h − Δp_loss
//
// (hydrostatics and the energy balance of the suction line), and checks it
// against the maker's minimum. A failed check is a result, with a Warning
// finding of hazard Cavitation: a starved pump cavitates, loses flow and is
// damaged. A computed pressure at or below zero means the line cannot feed
// the pump at all; it is reported as computed. Every field of in must be
// set as [Inlet] says: Ambient and Minimum > 0, Density > 0, Tank and Loss
// ≥ 0, Head finite. Errors match units.ErrRange.
func CheckInlet(in Inlet) (InletResult, error) {
	const fn = "pump.CheckInlet"
	if err := validate.Positive(fn, "Ambient.Pressure", in.Ambient.Pressure); err != nil {
		return InletResult{}, err
	}
	if err := validate.NonNegative(fn, "Tank", in.Tank); err != nil {
		return InletResult{}, err
	}
	if err := validate.Finite(fn, "Head", in.Head); err != nil {
		return InletResult{}, err
	}
	if err := validate.Positive(fn, "Density", in.Density); err != nil {
		return InletResult{}, err
	}
	if err := validate.NonNegative(fn, "Loss", in.Loss); err != nil {
		return InletResult{}, err
	}
	if err := validate.Positive(fn, "Minimum", in.Minimum); err != nil {
		return InletResult{}, err
	}
	static := units.Pressure(float64(in.Density) * float64(units.StandardGravity) * float64(in.Head))
	p := (in.Tank + static - in.Loss).Absolute(in.Ambient.Pressure)
	if err := validate.Result(fn, "inlet pressure", p); err != nil {
		return InletResult{}, err
	}
	r := InletResult{Ambient: in.Ambient, Static: static, Pressure: p,
		Check: components.Reaches(p, in.Minimum, components.CallerRule("pump maker's minimum inlet pressure"))}
	if !r.Check.OK() {
		r.Findings = components.Findings{components.NewFinding(components.Warning, components.Cavitation, "pump.inlet",
			components.PhysicsRule("suction line energy balance"),
			"the pump inlet sees %v at the cold start, below the maker's minimum of %v: the pump will cavitate; raise the oil level above the inlet, shorten or enlarge the suction line, or warm the oil before full speed",
			p, in.Minimum)}
	}
	return r, nil
}
