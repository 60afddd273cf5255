package fluid

import (
	"math"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
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
// KSlope·(t − 40 °C). A fluid's model must keep c and k > 0 from −60 °C to
// 200 °C (the model's temperature range).
type ThermalModel struct {
	C40    units.SpecificHeatCapacity // at 40 °C
	CSlope float64                    // J/(kg·K) per K
	K40    units.ThermalConductivity  // at 40 °C
	KSlope float64                    // W/(m·K) per K
}

// validate checks that c and k are finite and > 0 across the model's
// temperature range, naming the fields as prefix+field.
func (m ThermalModel) validate(fn, prefix string) error {
	if err := validate.Positive(fn, prefix+"C40", m.C40); err != nil {
		return err
	}
	if err := validate.Positive(fn, prefix+"K40", m.K40); err != nil {
		return err
	}
	for _, t := range []units.Temperature{minModelTemperature, maxModelTemperature} {
		dt := t.Celsius() - 40
		if c := float64(m.C40) + m.CSlope*dt; !(c > 0) || math.IsInf(c, 0) {
			return validate.Fail(fn, prefix+"CSlope", m.CSlope, "a slope that keeps c > 0 from −60 °C to 200 °C")
		}
		if k := float64(m.K40) + m.KSlope*dt; !(k > 0) || math.IsInf(k, 0) {
			return validate.Fail(fn, prefix+"KSlope", m.KSlope, "a slope that keeps k > 0 from −60 °C to 200 °C")
		}
	}
	return nil
}

// Fluid bundles the properties of one hydraulic fluid. Build it with
// Typical or FromDataSheet; its figures are read through methods and cannot
// be changed one by one, so they never contradict each other (the viscosity
// curve always passes through V40 and V100, Grade and Viscosity(40 °C)
// agree, the pour point lies below 40 °C). To adjust a fluid, change its
// DataSheet and build it again:
//
//	d := f.DataSheet()
//	d.PourPoint = units.TemperatureFromCelsius(-36) // the supplier's figure
//	f, err := fluid.FromDataSheet(d)
//
// The zero Fluid has no data: its methods return errors.
type Fluid struct {
	name      string
	class     Class
	curve     Curve // ASTM D341 curve through v40 at 40 °C and v100 at 100 °C
	v40, v100 units.KinematicViscosity
	pourPoint units.Temperature // viscosity is refused below it; 0 if unknown
	density15 units.Density     // at 15 °C and atmospheric pressure
	expansion float64           // volumetric thermal expansion coefficient, 1/K
	bulk      BulkModel
	thermal   ThermalModel
}

// Name returns the fluid's name: the data sheet's, or "HM VG 46 (typical)"
// for a preset.
func (f Fluid) Name() string { return f.name }

// Class returns the fluid's ISO 6743-4 class.
func (f Fluid) Class() Class { return f.class }

// Curve returns the fluid's ASTM D341 viscosity–temperature curve, through
// V40 at 40 °C and V100 at 100 °C.
func (f Fluid) Curve() Curve { return f.curve }

// V40 returns the kinematic viscosity at 40 °C the fluid was built from.
func (f Fluid) V40() units.KinematicViscosity { return f.v40 }

// V100 returns the kinematic viscosity at 100 °C the fluid was built from.
func (f Fluid) V100() units.KinematicViscosity { return f.v100 }

// PourPoint returns the pour point, below which Viscosity refuses to answer,
// or 0 when it is not known.
func (f Fluid) PourPoint() units.Temperature { return f.pourPoint }

// Density15 returns the density at 15 °C and atmospheric pressure.
func (f Fluid) Density15() units.Density { return f.density15 }

// Expansion returns the volumetric thermal expansion coefficient, 1/K.
func (f Fluid) Expansion() float64 { return f.expansion }

// Bulk returns the fluid's bulk-modulus model.
func (f Fluid) Bulk() BulkModel { return f.bulk }

// Thermal returns the fluid's specific heat and conductivity model.
func (f Fluid) Thermal() ThermalModel { return f.thermal }

// DataSheet returns the figures that build f again with FromDataSheet, with
// V100 given (VI 0) and the class's typical values written out, so that a
// caller can change one figure and rebuild the fluid.
func (f Fluid) DataSheet() DataSheet {
	return DataSheet{
		Name: f.name, Class: f.class, V40: f.v40, V100: f.v100, Density15: f.density15,
		PourPoint: f.pourPoint, Expansion: f.expansion, Bulk: f.bulk, Thermal: f.thermal,
	}
}

func checkPropertyInputs(fn string, t units.Temperature, p units.Pressure) error {
	if err := validate.InRange(fn, "t", t, minModelTemperature, maxModelTemperature); err != nil {
		return err
	}
	return validate.InRange(fn, "p", p, minModelPressure, maxModelPressure)
}

// Grade returns the ISO 3448 grade of the fluid's 40 °C viscosity, or an
// error matching ErrNoGrade, naming V40, when it lies between grades.
func (f Fluid) Grade() (Grade, error) { return gradeOf("fluid.Fluid.Grade", "V40", f.v40) }

// VI returns the viscosity index (ASTM D2270, unrounded) of V40 and V100;
// its errors are those of ViscosityIndex, naming the fields V40 and V100.
func (f Fluid) VI() (float64, error) {
	vi, err := ViscosityIndex(f.v40, f.v100)
	if err != nil {
		return 0, validate.Renamed(err, "fluid.Fluid.VI", validate.Fields("", map[string]string{"v40": "V40", "v100": "V100"}))
	}
	return vi, nil
}

// Viscosity returns the kinematic viscosity at temperature t from the D341
// curve. Below the pour point (when known) it fails: the oil no longer flows
// as the curve says.
func (f Fluid) Viscosity(t units.Temperature) (units.KinematicViscosity, error) {
	return f.viscosity("fluid.Fluid.Viscosity", t)
}

// viscosity is Viscosity for function fn.
func (f Fluid) viscosity(fn string, t units.Temperature) (units.KinematicViscosity, error) {
	if f.pourPoint > 0 && t < f.pourPoint {
		return 0, validate.Fail(fn, "t", t, "≥ pour point "+f.pourPoint.String())
	}
	nu, err := f.curve.At(t)
	if err != nil {
		return 0, validate.Renamed(err, fn, nil)
	}
	return nu, nil
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
	if err := f.bulk.checkPressure(fn, t, p); err != nil {
		return 0, err
	}
	rho := f.density(t, p)
	if err := validate.PositiveResult(fn, "density", rho); err != nil {
		return 0, err
	}
	return rho, nil
}

// checkDensity refuses the zero Fluid (and any fluid whose data a future
// change lets through unchecked), naming the field.
func (f Fluid) checkDensity(fn string) error {
	if err := validate.InRange(fn, "Density15", f.density15, minDensity15, maxDensity15); err != nil {
		return err
	}
	if err := validate.InRange(fn, "Expansion", f.expansion, 0, maxExpansion); err != nil {
		return err
	}
	return f.bulk.validate(fn, "Bulk.")
}

func (f Fluid) density(t units.Temperature, p units.Pressure) units.Density {
	rho := float64(f.density15) / (1 + f.expansion*float64(t.Sub(t15)))
	return units.Density(rho * f.bulk.compression(t, p))
}

// DynamicViscosity returns μ = ν·ρ at temperature t and gauge pressure p
// (ν from the D341 curve at atmospheric pressure: the rise of viscosity
// with pressure, about 15–30 % per 100 bar for mineral oil from memory, is
// not modelled).
func (f Fluid) DynamicViscosity(t units.Temperature, p units.Pressure) (units.DynamicViscosity, error) {
	const fn = "fluid.Fluid.DynamicViscosity"
	nu, err := f.viscosity(fn, t)
	if err != nil {
		return 0, err
	}
	rho, err := f.Density(t, p)
	if err != nil {
		return 0, validate.Renamed(err, fn, nil)
	}
	mu := units.DynamicViscosity(float64(nu) * float64(rho))
	if err := validate.Result(fn, "μ", mu); err != nil {
		return 0, err
	}
	return mu, nil
}

// SpecificHeat returns the specific heat capacity at temperature t from
// Thermal (linear in temperature).
func (f Fluid) SpecificHeat(t units.Temperature) (units.SpecificHeatCapacity, error) {
	const fn = "fluid.Fluid.SpecificHeat"
	if err := validate.Positive(fn, "Thermal.C40", f.thermal.C40); err != nil { // the zero Fluid
		return 0, err
	}
	if err := checkPropertyInputs(fn, t, 0); err != nil {
		return 0, err
	}
	c, err := linearFrom40(fn, "c", float64(f.thermal.C40), f.thermal.CSlope, t)
	return units.SpecificHeatCapacity(c), err
}

// ThermalConductivity returns the thermal conductivity at temperature t from
// Thermal (linear in temperature).
func (f Fluid) ThermalConductivity(t units.Temperature) (units.ThermalConductivity, error) {
	const fn = "fluid.Fluid.ThermalConductivity"
	if err := validate.Positive(fn, "Thermal.K40", f.thermal.K40); err != nil { // the zero Fluid
		return 0, err
	}
	if err := checkPropertyInputs(fn, t, 0); err != nil {
		return 0, err
	}
	k, err := linearFrom40(fn, "k", float64(f.thermal.K40), f.thermal.KSlope, t)
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
// and gauge pressure p (see BulkModel.Modulus); errors name the fluid's
// fields as Bulk.K0, ….
func (f Fluid) BulkModulus(kind BulkKind, t units.Temperature, p units.Pressure) (units.Pressure, error) {
	const fn = "fluid.Fluid.BulkModulus"
	if err := f.bulk.validate(fn, "Bulk."); err != nil {
		return 0, err
	}
	return f.bulk.modulus(fn, kind, t, p)
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
	if err := validate.InRange(fn, "sg", sg, minCragoeSG, maxCragoeSG); err != nil {
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
	if err := validate.InRange(fn, "sg", sg, minCragoeSG, maxCragoeSG); err != nil {
		return 0, err
	}
	if err := checkPropertyInputs(fn, t, 0); err != nil {
		return 0, err
	}
	k := 0.0677 / sg * (1 - 0.0003*(t.Fahrenheit()-32))
	return units.ThermalConductivity(k) * units.BTUPerHourFootFahrenheit, nil
}
