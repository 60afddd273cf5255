package fluid

import (
	"github.com/hydrosize/hydrosize/internal/saybolt"
	"github.com/hydrosize/hydrosize/units"
)

// The limits of this package's models, in one place. Each says where it
// comes from: the standard that states it, the physics that forces it, or
// our choice (a bound that keeps a simple model from misleading, wider than
// hydraulic service).

// Limits of the ASTM D341 relation as this package applies it.
//
// MaxViscosity is 2·10⁷ mm²/s: ASTM D341-20 states its equations for
// kinematic viscosities up to about 2·10⁷ mm²/s (from memory: the figure
// could not be read in the text); above that, in the pour-point region where
// wax structure forms, the straight-line relation no longer holds, so Curve
// refuses such results.
//
// MinViscosity is 0.21 mm²/s: with the standard's low-viscosity terms the
// relation holds down to about 0.21 mm²/s (ASTM D341-20, from memory); below
// it Z approaches 1 and log log Z has no real value (Z < 1 below about
// 0.12 mm²/s, computed from the Z formula).
const (
	MaxViscosity = 2e7 * units.SquareMillimetrePerSecond
	MinViscosity = 0.21 * units.SquareMillimetrePerSecond
)

// minFitSpan is the least temperature between the two points of
// CurveThrough: points closer than 1 K give an ill-conditioned fit (our
// choice).
const minFitSpan = 1 // K

// Reference temperatures: 15 °C for density (ISO 3675 and data sheets), 40
// and 100 °C for viscosity (ISO 3448, ASTM D2270).
const (
	t15  units.Temperature = 288.15
	t40  units.Temperature = 313.15
	t100 units.Temperature = 373.15
)

// Temperature and pressure limits of the density, heat and bulk-modulus
// models: −60 °C to 200 °C and −1 bar gauge (a suction line near vacuum) to
// 2000 bar. Wider than hydraulic service (ISO 4413 asks for pump inlet oil
// at or below 60 °C) and beyond the typical data the models are fitted to,
// but not so wide that the linear models mislead. Our choice, not a
// standard's.
//
// The temperatures are what units.TemperatureFromCelsius returns (−60 °C is
// 213.14999999999998 K in float64, one ulp below the literal 213.15), so
// that a caller's TemperatureFromCelsius(-60) is accepted. They are set once
// and never written.
var (
	minModelTemperature = units.TemperatureFromCelsius(-60)
	maxModelTemperature = units.TemperatureFromCelsius(200)
)

const (
	minModelPressure = -1 * units.Bar
	maxModelPressure = 2000 * units.Bar
)

// minVIY is the smallest 100 °C viscosity for which ASTM D2270 defines a
// viscosity index (2 mm²/s); minVIU is the least 40 °C viscosity V100ForVI
// takes, just above it, so that a 100 °C viscosity below v40 exists.
const (
	minVIY = 2 * units.SquareMillimetrePerSecond
	minVIU = 2.0001 * units.SquareMillimetrePerSecond
)

// The viscosity indices SelectGrades accepts: −100 to 400, beyond the VIs
// of real hydraulic fluids (about 90 for a plain mineral oil to about 250
// for a shear-stable synthetic) on both sides. Our choice.
const (
	minSelectVI = -100
	maxSelectVI = 400
)

// The ASTM D2161 SUS equation holds from 1.81 mm²/s (about 32 SUS).
const minSUSViscosity = saybolt.MinViscosity * units.SquareMillimetrePerSecond

// Limits of a fluid's data (FromDataSheet and the Fluid methods): density at
// 15 °C from 500 to 2000 kg/m³, volumetric expansion from 0 to 2·10⁻³ 1/K,
// both beyond any hydraulic fluid (mineral oils about 870 kg/m³ and
// 6.5·10⁻⁴ 1/K, water-glycols about 1080 kg/m³; from memory), to catch a
// misplaced unit. Our choice.
// A pour point, when known, lies below 40 °C: V40 is measured on the
// flowing fluid (physics of the data sheet).
const (
	minDensity15 units.Density = 500
	maxDensity15 units.Density = 2000
	maxExpansion               = 2e-3
	maxPourPoint               = t40
)

// Cragoe's correlations are for petroleum oils of specific gravity about
// 0.75–0.96 (from memory); CragoeSpecificHeat and CragoeConductivity accept
// 0.6 to 1.1 (our choice).
const (
	minCragoeSG = 0.6
	maxCragoeSG = 1.1
)

// Limits of a BulkModel: dK/dp (M) from 0.1 to 30, temperature coefficient C
// from 0 to 0.05 1/K and Gamma = c_p/c_v from 1 to 2, around the typical M
// ≈ 10, C ≈ 0.005 1/K and Gamma ≈ 1.15 of hydraulic oils (from memory). Our
// choice. Gamma ≥ 1 is physics (c_p ≥ c_v).
const (
	minBulkM, maxBulkM         = 0.1, 30
	maxBulkC                   = 0.05
	minBulkGamma, maxBulkGamma = 1, 2
)

// Limits of EffectiveBulk: free air up to half the mixture volume, a
// polytropic exponent from 1 (isothermal) to 1.4 (adiabatic, air: physics)
// and absolute pressures from 1 kPa to 2000 bar.
const (
	maxAirFraction                              = 0.5
	minAirN, maxAirN                            = 1, 1.4
	minEffectivePressure units.AbsolutePressure = 1000
)

// Poisson's ratio of an isotropic solid lies from 0 to ½ for the materials
// of tubes and hoses (physics: ½ is incompressible).
const maxPoisson = 0.5
