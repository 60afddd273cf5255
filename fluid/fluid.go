package fluid

import (
	"math"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Temperature limits for the density, heat and bulk-modulus models: −60 °C
// to 200 °C, wider than hydraulic service (ISO 4413 asks for pump inlet oil
// at or below 60 °C) but not so wide that the linear models mislead. Our
// choice, not a standard's.
var (
	minModelTemperature = units.TemperatureFromCelsius(-60)
	maxModelTemperature = units.TemperatureFromCelsius(200)
	t15                 = units.TemperatureFromCelsius(15)
)

// Class is a family of hydraulic fluid per ISO 6743-4.
type Class uint8

// The ISO 6743-4 classes this package has typical data for.
const (
	HM   Class = iota + 1 // mineral oil with anti-wear additives
	HV                    // HM with viscosity-index improver (wide temperature range)
	HFC                   // water-polymer (water-glycol) solution, fire resistant
	HFDU                  // anhydrous synthetic fluid (polyol ester), fire resistant
	HEES                  // environmentally acceptable synthetic ester
)

// String returns the ISO 6743-4 symbol, for example "HV".
func (c Class) String() string {
	switch c {
	case HM:
		return "HM"
	case HV:
		return "HV"
	case HFC:
		return "HFC"
	case HFDU:
		return "HFDU"
	case HEES:
		return "HEES"
	}
	return "Class(invalid)"
}

// ThermalModel gives specific heat and thermal conductivity linear in
// temperature about 40 °C: c(t) = C40 + CSlope·(t − 40 °C), k(t) = K40 +
// KSlope·(t − 40 °C).
type ThermalModel struct {
	C40    units.SpecificHeatCapacity // at 40 °C
	CSlope float64                    // J/(kg·K) per K
	K40    units.ThermalConductivity  // at 40 °C
	KSlope float64                    // W/(m·K) per K
}

// Fluid bundles the properties of one hydraulic fluid. Build it with
// Typical or FromDataSheet; the exported fields may then be overridden with
// the supplier's figures, which govern over the typical values here.
type Fluid struct {
	Name      string
	Class     Class
	Curve     Curve // ASTM D341 viscosity–temperature curve
	V40, V100 units.KinematicViscosity
	PourPoint units.Temperature // viscosity is refused below it; 0 if unknown
	Density15 units.Density     // at 15 °C and atmospheric pressure
	Expansion float64           // volumetric thermal expansion coefficient, 1/K
	Bulk      BulkModel
	Thermal   ThermalModel
}

func checkPropertyInputs(fn string, t units.Temperature, p units.Pressure) error {
	if err := validate.InRange(fn, "t", t, minModelTemperature, maxModelTemperature); err != nil {
		return err
	}
	return validate.InRange(fn, "p", p, minModelPressure, maxModelPressure)
}

// Grade returns the ISO 3448 grade of the fluid's 40 °C viscosity, or an
// error matching ErrNoGrade when it lies between grades.
func (f Fluid) Grade() (Grade, error) { return GradeOf(f.V40) }

// VI returns the viscosity index (ASTM D2270, unrounded) of V40 and V100.
func (f Fluid) VI() (float64, error) { return ViscosityIndex(f.V40, f.V100) }

// Viscosity returns the kinematic viscosity at temperature t from the D341
// curve. Below the pour point (when known) it fails: the oil no longer flows
// as the curve says.
func (f Fluid) Viscosity(t units.Temperature) (units.KinematicViscosity, error) {
	if f.PourPoint > 0 && t < f.PourPoint {
		return 0, validate.Fail("fluid.Fluid.Viscosity", "t", t, "≥ pour point "+f.PourPoint.String())
	}
	return f.Curve.At(t)
}

// Density returns the density at temperature t and gauge pressure p:
//
//	ρ(t, 0) = ρ₁₅ / (1 + α·(t − 15 °C))
//	ρ(t, p) = ρ(t, 0)·(1 + M·p/K₀(t))^(1/M)
//
// the first from the volumetric expansion coefficient α (Expansion), the
// second the Murnaghan equation of state of Bulk (isothermal).
func (f Fluid) Density(t units.Temperature, p units.Pressure) (units.Density, error) {
	const fn = "fluid.Fluid.Density"
	if err := f.checkDensity(fn); err != nil {
		return 0, err
	}
	if err := checkPropertyInputs(fn, t, p); err != nil {
		return 0, err
	}
	if err := f.Bulk.checkPressure(fn, t, p); err != nil {
		return 0, err
	}
	rho := f.density(t, p)
	if err := validate.Result(fn, "density", rho); err != nil {
		return 0, err
	}
	return rho, nil
}

func (f Fluid) checkDensity(fn string) error {
	if err := validate.Positive(fn, "Density15", f.Density15); err != nil {
		return err
	}
	if err := validate.InRange(fn, "Expansion", f.Expansion, 0, 2e-3); err != nil {
		return err
	}
	return f.Bulk.validate(fn)
}

func (f Fluid) density(t units.Temperature, p units.Pressure) units.Density {
	rho := float64(f.Density15) / (1 + f.Expansion*float64(t.Sub(t15)))
	return units.Density(rho * f.Bulk.compression(t, p))
}

// DynamicViscosity returns μ = ν·ρ at temperature t and gauge pressure p
// (ν from the D341 curve at atmospheric pressure: the rise of viscosity
// with pressure, about 15–30 % per 100 bar for mineral oil from memory, is
// not modelled).
func (f Fluid) DynamicViscosity(t units.Temperature, p units.Pressure) (units.DynamicViscosity, error) {
	nu, err := f.Viscosity(t)
	if err != nil {
		return 0, err
	}
	rho, err := f.Density(t, p)
	if err != nil {
		return 0, err
	}
	mu := units.DynamicViscosity(float64(nu) * float64(rho))
	if err := validate.Result("fluid.Fluid.DynamicViscosity", "μ", mu); err != nil {
		return 0, err
	}
	return mu, nil
}

// SpecificHeat returns the specific heat capacity at temperature t from
// Thermal (linear in temperature).
func (f Fluid) SpecificHeat(t units.Temperature) (units.SpecificHeatCapacity, error) {
	const fn = "fluid.Fluid.SpecificHeat"
	if err := checkPropertyInputs(fn, t, 0); err != nil {
		return 0, err
	}
	c, err := linearFrom40(fn, "c", float64(f.Thermal.C40), f.Thermal.CSlope, t)
	return units.SpecificHeatCapacity(c), err
}

// ThermalConductivity returns the thermal conductivity at temperature t from
// Thermal (linear in temperature).
func (f Fluid) ThermalConductivity(t units.Temperature) (units.ThermalConductivity, error) {
	const fn = "fluid.Fluid.ThermalConductivity"
	if err := checkPropertyInputs(fn, t, 0); err != nil {
		return 0, err
	}
	k, err := linearFrom40(fn, "k", float64(f.Thermal.K40), f.Thermal.KSlope, t)
	return units.ThermalConductivity(k), err
}

// linearFrom40 returns at40 + slope·(t − 40 °C), refused (0 and an error
// naming name) unless it is finite and > 0.
func linearFrom40(fn, name string, at40, slope float64, t units.Temperature) (float64, error) {
	x := at40 + slope*(t.Celsius()-40)
	if err := validate.Positive(fn, name, x); err != nil {
		return 0, err
	}
	return x, nil
}

// BulkModulus returns the bulk modulus of the given kind at temperature t
// and gauge pressure p (see BulkModel.Modulus).
func (f Fluid) BulkModulus(kind BulkKind, t units.Temperature, p units.Pressure) (units.Pressure, error) {
	return f.Bulk.Modulus(kind, t, p)
}

// CragoeSpecificHeat returns the specific heat of a petroleum oil of
// specific gravity sg (60/60 °F) at temperature t by Cragoe's correlation
// (US Bureau of Standards Misc. Publication 97, 1929, from memory):
//
//	c = (0.388 + 0.00045·t_°F)/√sg  BTU/(lb·°F)
//	  = (1.6848 + 0.003391·t_°C)/√sg  kJ/(kg·K)
//
// It is meant for mineral oils (sg about 0.75–0.96), not water-glycols or esters.
func CragoeSpecificHeat(sg float64, t units.Temperature) (units.SpecificHeatCapacity, error) {
	const fn = "fluid.CragoeSpecificHeat"
	if err := validate.InRange(fn, "sg", sg, 0.6, 1.1); err != nil {
		return 0, err
	}
	if err := checkPropertyInputs(fn, t, 0); err != nil {
		return 0, err
	}
	c := (0.388 + 0.00045*t.Fahrenheit()) / math.Sqrt(sg)
	return units.SpecificHeatCapacity(c) * units.BTUPerPoundFahrenheit, nil
}

// CragoeConductivity returns the thermal conductivity of a petroleum oil of
// specific gravity sg (60/60 °F) at temperature t by Cragoe's correlation
// (US Bureau of Standards Misc. Publication 97, 1929, from memory):
//
//	k = (0.0677/sg)·(1 − 0.0003·(t_°F − 32))  BTU/(h·ft·°F)
func CragoeConductivity(sg float64, t units.Temperature) (units.ThermalConductivity, error) {
	const fn = "fluid.CragoeConductivity"
	if err := validate.InRange(fn, "sg", sg, 0.6, 1.1); err != nil {
		return 0, err
	}
	if err := checkPropertyInputs(fn, t, 0); err != nil {
		return 0, err
	}
	k := 0.0677 / sg * (1 - 0.0003*(t.Fahrenheit()-32))
	return units.ThermalConductivity(k) * units.BTUPerHourFootFahrenheit, nil
}
