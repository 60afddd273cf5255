//go:build ignore

// gen writes quantities_gen.go: the quantity types, their unit constants,
// accessors, formatting, text marshalling, typed parsers and the unit registry.
// Run it with go generate ./units (see doc.go).
package main

import (
	"bytes"
	"fmt"
	"go/format"
	"os"
	"strings"
	"text/template"
)

type unit struct {
	Const    string   // exported constant name; "" for a registry-only unit
	Value    string   // untyped Go constant expression, in the type's SI unit
	Doc      string   // doc comment text after the name
	Accessor string   // accessor method name; "" for none
	Symbol   string   // canonical spelling, used for formatting
	Aliases  []string // other accepted spellings
	Offset   string   // affine offset in SI (temperature scales), registry only
	Ref      string   // refNone (default), refGauge, refAbsolute, refPoint
	NoReg    bool     // Symbol is not registered (it belongs to another type)
}

type quantity struct {
	Name    string
	Doc     string
	Dim     string // dim(l, m, t, k, a)
	Kind    string // lower-case name for messages
	Base    string // constant of the SI unit (for GoString)
	Metric  string // symbol for String and the metric system
	US      string // symbol for the US customary system
	Accept  string // accepted references
	Offset  bool   // parsing applies the unit's offset (Temperature)
	Min     string // inclusive lower bound in SI, "" for none
	MinText string
	Units   []unit
	NoType  bool // registry-only units (time, angle)

	MetricIdx int // index in unitTable of the Metric unit (set by main)
}

var quantities = []quantity{
	{Name: "Length", Kind: "length", Dim: "dim(1, 0, 0, 0, 0)", Base: "Metre", Metric: "mm", US: "in",
		Doc: "Length is a length or distance in metres (m): bores, rods, strokes, line diameters and lengths.",
		Units: []unit{
			{"Metre", "1", "is the SI unit of length.", "Metres", "m", []string{"metre", "meter"}, "", "", false},
			{"Millimetre", "1e-3", "is 10⁻³ m.", "Millimetres", "mm", nil, "", "", false},
			{"Centimetre", "1e-2", "is 10⁻² m.", "Centimetres", "cm", nil, "", "", false},
			{"Micrometre", "1e-6", "is 10⁻⁶ m, the micron of filtration ratings.", "Micrometres", "µm", []string{"μm", "um", "micron"}, "", "", false},
			{"Inch", "inchM", "is 0.0254 m exactly (NIST SP 811).", "Inches", "in", []string{"inch", "inches"}, "", "", false},
			{"Foot", "footM", "is 0.3048 m exactly (NIST SP 811).", "Feet", "ft", []string{"foot", "feet"}, "", "", false},
		}},
	{Name: "Area", Kind: "area", Dim: "dim(2, 0, 0, 0, 0)", Base: "SquareMetre", Metric: "cm²", US: "in²",
		Doc: "Area is an area in square metres (m²): piston and annulus areas, flow sections.",
		Units: []unit{
			{"SquareMetre", "1", "is the SI unit of area.", "SquareMetres", "m²", []string{"m2", "m^2", "sq m"}, "", "", false},
			{"SquareMillimetre", "1e-6", "is 10⁻⁶ m².", "SquareMillimetres", "mm²", []string{"mm2", "mm^2", "sq mm"}, "", "", false},
			{"SquareCentimetre", "1e-4", "is 10⁻⁴ m².", "SquareCentimetres", "cm²", []string{"cm2", "cm^2", "sq cm"}, "", "", false},
			{"SquareInch", "inchM * inchM", "is 6.4516 cm² exactly (NIST SP 811).", "SquareInches", "in²", []string{"in2", "in^2", "sq in"}, "", "", false},
			{"SquareFoot", "footM * footM", "is 0.09290304 m² exactly (NIST SP 811).", "SquareFeet", "ft²", []string{"ft2", "ft^2", "sq ft"}, "", "", false},
		}},
	{Name: "Volume", Kind: "volume", Dim: "dim(3, 0, 0, 0, 0)", Base: "CubicMetre", Metric: "L", US: "gal",
		Doc: "Volume is a volume in cubic metres (m³): reservoirs, accumulators, swept volumes.",
		Units: []unit{
			{"CubicMetre", "1", "is the SI unit of volume.", "CubicMetres", "m³", []string{"m3", "m^3", "cu m"}, "", "", false},
			{"Litre", "1e-3", "is 10⁻³ m³ exactly (CGPM 1964).", "Litres", "L", []string{"l", "litre", "liter", "dm³", "dm3"}, "", "", false},
			{"Millilitre", "1e-6", "is 10⁻⁶ m³.", "Millilitres", "mL", []string{"ml"}, "", "", false},
			{"CubicCentimetre", "1e-6", "is 10⁻⁶ m³ (one cc).", "CubicCentimetres", "cm³", []string{"cm3", "cm^3", "cc", "ccm"}, "", "", false},
			{"CubicInch", "inchM * inchM * inchM", "is 16.387064 cm³ exactly (NIST SP 811).", "CubicInches", "in³", []string{"in3", "in^3", "cu in", "cuin", "cid"}, "", "", false},
			{"USGallon", "usGallonM3", "is the US liquid gallon, 231 in³ = 3.785411784 L exactly (NIST SP 811).", "USGallons", "gal", []string{"US gal", "USgal", "usgal", "gal(US)"}, "", "", false},
			{"UKGallon", "ukGallonM3", "is the imperial gallon, 4.54609 L exactly (NIST SP 811).", "UKGallons", "UK gal", []string{"UKgal", "imp gal", "gal(UK)"}, "", "", false},
		}},
	{Name: "Mass", Kind: "mass", Dim: "dim(0, 1, 0, 0, 0)", Base: "Kilogram", Metric: "kg", US: "lbm",
		Doc: "Mass is a mass in kilograms (kg): payloads, moving parts, oil charges.",
		Units: []unit{
			{"Kilogram", "1", "is the SI unit of mass.", "Kilograms", "kg", nil, "", "", false},
			{"Gram", "1e-3", "is 10⁻³ kg.", "Grams", "g", nil, "", "", false},
			{"Tonne", "1e3", "is the metric ton, 1000 kg.", "Tonnes", "t", []string{"tonne"}, "", "", false},
			{"PoundMass", "lbmKg", "is the avoirdupois pound, 0.45359237 kg exactly (NIST SP 811).", "Pounds", "lbm", []string{"lb"}, "", "", false},
		}},
	{Name: "Force", Kind: "force", Dim: "dim(1, 1, -2, 0, 0)", Base: "Newton", Metric: "kN", US: "lbf",
		Doc: "Force is a force in newtons (N): loads, cylinder thrust and pull.",
		Units: []unit{
			{"Newton", "1", "is the SI unit of force.", "Newtons", "N", nil, "", "", false},
			{"Kilonewton", "1e3", "is 10³ N.", "Kilonewtons", "kN", nil, "", "", false},
			{"PoundForce", "lbfN", "is lbm·g₀ = 4.4482216152605 N exactly (NIST SP 811).", "PoundsForce", "lbf", nil, "", "", false},
			{"KilogramForce", "kgfN", "is 1 kg·g₀ = 9.80665 N exactly (NIST SP 811).", "KilogramsForce", "kgf", []string{"kp"}, "", "", false},
		}},
	{Name: "Pressure", Kind: "pressure", Dim: "dim(-1, 1, -2, 0, 0)", Base: "Pascal", Metric: "bar", US: "psi",
		Accept: "refNone | refGauge",
		Doc: `Pressure is a gauge or differential pressure in pascals (Pa): a pressure
// above (or below) the local ambient, or a difference between two pressures,
// such as a relief setting, a load pressure or a valve pressure drop. Plain
// bar and psi are read as gauge, as the trade writes them; psig and barg say
// so explicitly. Use AbsolutePressure for gas laws and cavitation checks, and
// convert between the two only with an explicit ambient pressure.`,
		Units: []unit{
			{"Pascal", "1", "is the SI unit of pressure.", "Pascals", "Pa", nil, "", "", false},
			{"Kilopascal", "1e3", "is 10³ Pa.", "Kilopascals", "kPa", nil, "", "", false},
			{"Megapascal", "1e6", "is 10⁶ Pa (one N/mm²).", "Megapascals", "MPa", []string{"N/mm²", "N/mm2"}, "", "", false},
			{"Gigapascal", "1e9", "is 10⁹ Pa, the usual unit of bulk and elastic moduli.", "Gigapascals", "GPa", nil, "", "", false},
			{"Bar", "barPa", "is 10⁵ Pa exactly (NIST SP 811).", "Bar", "bar", []string{"barg", "bar(g)", "bar g"}, "", "refGauge", false},
			{"Millibar", "1e-3 * barPa", "is 100 Pa.", "Millibar", "mbar", nil, "", "", false},
			{"PSI", "psiPa", "is one pound-force per square inch, ≈ 6894.757 Pa (exact ratio, NIST SP 811).", "PSI", "psi", []string{"psig", "psi(g)", "lbf/in²", "lbf/in2"}, "", "refGauge", false},
			{"KSI", "1e3 * psiPa", "is 1000 psi, used for material strengths.", "KSI", "ksi", nil, "", "", false},
			{"KilogramForcePerSquareCentimetre", "kgfN * 1e4", "is one kgf/cm² (the technical atmosphere, at), 98 066.5 Pa exactly (NIST SP 811).", "KilogramsForcePerSquareCentimetre", "kgf/cm²", []string{"kgf/cm2", "at"}, "", "refGauge", false},
			{"InchOfMercury", "inHgPa", "is the conventional inch of mercury, 13 595.1 kg/m³·g₀·0.0254 m ≈ 3386.389 Pa (NIST SP 811, \"conventional\").", "InchesOfMercury", "inHg", []string{"in Hg", "\"Hg"}, "", "", false},
		}},
	{Name: "AbsolutePressure", Kind: "absolute pressure", Dim: "dim(-1, 1, -2, 0, 0)", Base: "PascalAbsolute", Metric: "bara", US: "psia",
		Accept: "refNone | refAbsolute", Min: "0", MinText: "≥ 0 Pa (absolute vacuum)",
		Doc: `AbsolutePressure is a pressure above absolute vacuum, in pascals (Pa):
// the pressure that gas laws (accumulators), vapour pressure and pump inlet
// checks need. It is never negative. Absolute spellings are bara, psia and atm;
// the SI units Pa, kPa, MPa and mbar are read as either kind.`,
		Units: []unit{
			{"PascalAbsolute", "1", "is one pascal above absolute vacuum.", "Pascals", "Pa(a)", []string{"Pa abs"}, "", "refAbsolute", false},
			{"KilopascalAbsolute", "1e3", "is 10³ Pa above absolute vacuum.", "Kilopascals", "kPa(a)", []string{"kPaa", "kPa abs"}, "", "refAbsolute", false},
			{"MegapascalAbsolute", "1e6", "is 10⁶ Pa above absolute vacuum.", "Megapascals", "MPa(a)", []string{"MPa abs"}, "", "refAbsolute", false},
			{"BarAbsolute", "barPa", "is 10⁵ Pa above absolute vacuum.", "Bar", "bara", []string{"bar(a)", "bar a", "bar abs"}, "", "refAbsolute", false},
			{"PSIAbsolute", "psiPa", "is one psi above absolute vacuum.", "PSI", "psia", []string{"psi(a)", "psi abs"}, "", "refAbsolute", false},
			{"StandardAtmosphere", "atmPa", "is the standard atmosphere, 101 325 Pa exactly (NIST SP 811), the usual ambient when no site value is known. It must still be passed explicitly.", "Atmospheres", "atm", nil, "", "refAbsolute", false},
		}},
	{Name: "Flow", Kind: "volume flow", Dim: "dim(3, 0, -1, 0, 0)", Base: "CubicMetrePerSecond", Metric: "L/min", US: "gpm",
		Doc: "Flow is a volume flow rate in cubic metres per second (m³/s): pump delivery, cylinder and line flows.",
		Units: []unit{
			{"CubicMetrePerSecond", "1", "is the SI unit of volume flow.", "CubicMetresPerSecond", "m³/s", []string{"m3/s", "m^3/s"}, "", "", false},
			{"LitrePerMinute", "1e-3 / minuteS", "is one litre per minute.", "LitresPerMinute", "L/min", []string{"l/min", "lpm", "LPM"}, "", "", false},
			{"LitrePerSecond", "1e-3", "is one litre per second.", "LitresPerSecond", "L/s", []string{"l/s"}, "", "", false},
			{"CubicMetrePerHour", "1.0 / hourS", "is one cubic metre per hour.", "CubicMetresPerHour", "m³/h", []string{"m3/h", "m^3/h"}, "", "", false},
			{"USGallonPerMinute", "usGallonM3 / minuteS", "is one US gallon per minute.", "USGallonsPerMinute", "gpm", []string{"GPM", "US gpm", "gal/min"}, "", "", false},
			{"CubicInchPerSecond", "inchM * inchM * inchM", "is one cubic inch per second.", "CubicInchesPerSecond", "in³/s", []string{"in3/s", "in^3/s"}, "", "", false},
		}},
	{Name: "Velocity", Kind: "velocity", Dim: "dim(1, 0, -1, 0, 0)", Base: "MetrePerSecond", Metric: "m/s", US: "ft/s",
		Doc: "Velocity is a speed in metres per second (m/s): piston speeds and fluid velocities in lines.",
		Units: []unit{
			{"MetrePerSecond", "1", "is the SI unit of velocity.", "MetresPerSecond", "m/s", nil, "", "", false},
			{"MillimetrePerSecond", "1e-3", "is one millimetre per second.", "MillimetresPerSecond", "mm/s", nil, "", "", false},
			{"FootPerSecond", "footM", "is 0.3048 m/s exactly.", "FeetPerSecond", "ft/s", []string{"fps"}, "", "", false},
			{"InchPerSecond", "inchM", "is 0.0254 m/s exactly.", "InchesPerSecond", "in/s", []string{"ips"}, "", "", false},
			{"FootPerMinute", "footM / minuteS", "is 0.00508 m/s exactly.", "FeetPerMinute", "ft/min", []string{"fpm"}, "", "", false},
		}},
	{Name: "Displacement", Kind: "displacement", Dim: "dim(3, 0, 0, 0, -1)", Base: "CubicMetrePerRevolution", Metric: "cm³/rev", US: "in³/rev",
		Doc: `Displacement is the volume a pump or motor moves per revolution, in cubic
// metres per revolution (m³/rev). Revolutions, not radians, so that
// flow = displacement × speed holds without 2π.`,
		Units: []unit{
			{"CubicMetrePerRevolution", "1", "is the coherent unit of displacement.", "CubicMetresPerRevolution", "m³/rev", []string{"m3/rev", "m^3/rev"}, "", "", false},
			{"CubicCentimetrePerRevolution", "1e-6", "is one cm³ (cc) per revolution.", "CubicCentimetresPerRevolution", "cm³/rev", []string{"cm3/rev", "cm^3/rev", "cc/rev", "ccm/rev", "mL/rev", "ml/rev"}, "", "", false},
			{"CubicInchPerRevolution", "inchM * inchM * inchM", "is one cubic inch per revolution, 16.387064 cm³/rev exactly.", "CubicInchesPerRevolution", "in³/rev", []string{"in3/rev", "in^3/rev", "cir", "cu in/rev"}, "", "", false},
		}},
	{Name: "RotationalSpeed", Kind: "rotational speed", Dim: "dim(0, 0, -1, 0, 1)", Base: "RevolutionPerSecond", Metric: "rpm", US: "rpm",
		Doc: "RotationalSpeed is a shaft speed in revolutions per second (rev/s).",
		Units: []unit{
			{"RevolutionPerSecond", "1", "is the coherent unit of rotational speed.", "RevolutionsPerSecond", "rev/s", []string{"rps", "r/s"}, "", "", false},
			{"RevolutionPerMinute", "1.0 / minuteS", "is one revolution per minute.", "RPM", "rpm", []string{"rev/min", "r/min", "RPM", "min⁻¹", "min^-1", "1/min"}, "", "", false},
			{"RadianPerSecond", "1 / revRad", "is 1/(2π) rev/s; not exact in binary floating point.", "RadiansPerSecond", "rad/s", nil, "", "", false},
		}},
	{Name: "Torque", Kind: "torque", Dim: "dim(2, 1, -2, 0, 0)", Base: "NewtonMetre", Metric: "N·m", US: "lbf·ft",
		Doc: "Torque is a moment in newton metres (N·m): pump shaft, motor and slew torques.",
		Units: []unit{
			{"NewtonMetre", "1", "is the SI unit of torque.", "NewtonMetres", "N·m", []string{"Nm", "N*m", "N.m", "N m", "N-m", "N⋅m"}, "", "", false},
			{"KilonewtonMetre", "1e3", "is 10³ N·m.", "KilonewtonMetres", "kN·m", []string{"kNm", "kN*m", "kN.m", "kN m"}, "", "", false},
			{"PoundForceFoot", "lbfN * footM", "is one lbf acting at one foot, ≈ 1.3558 N·m (exact product).", "PoundForceFeet", "lbf·ft", []string{"lbf*ft", "lbf-ft", "lbf ft", "ft·lbf", "ft-lbf", "ft-lb", "lb-ft", "lbft"}, "", "", false},
			{"PoundForceInch", "lbfN * inchM", "is one lbf acting at one inch, ≈ 0.11298 N·m (exact product).", "PoundForceInches", "lbf·in", []string{"lbf*in", "lbf-in", "lbf in", "in·lbf", "in-lbf", "in-lb", "lb-in", "lbin"}, "", "", false},
		}},
	{Name: "Power", Kind: "power", Dim: "dim(2, 1, -3, 0, 0)", Base: "Watt", Metric: "kW", US: "hp",
		Doc: "Power is a power in watts (W): hydraulic, shaft and electrical power, and heat flows.",
		Units: []unit{
			{"Watt", "1", "is the SI unit of power.", "Watts", "W", nil, "", "", false},
			{"Kilowatt", "1e3", "is 10³ W.", "Kilowatts", "kW", nil, "", "", false},
			{"Horsepower", "hpW", "is the mechanical (imperial) horsepower, 550 ft·lbf/s ≈ 745.69987 W (NIST SP 811).", "Horsepower", "hp", []string{"HP"}, "", "", false},
			{"MetricHorsepower", "metricHpW", "is 75 kgf·m/s = 735.49875 W exactly (NIST SP 811).", "MetricHorsepower", "PS", []string{"CV", "hp(M)"}, "", "", false},
			{"BTUPerHour", "btuJ / hourS", "is one International Table BTU per hour, ≈ 0.29307 W.", "BTUPerHour", "BTU/h", []string{"Btu/h", "BTU/hr", "Btu/hr", "BTUH"}, "", "", false},
		}},
	{Name: "Energy", Kind: "energy", Dim: "dim(2, 1, -2, 0, 0)", Base: "Joule", Metric: "kJ", US: "BTU",
		Doc: "Energy is an energy or quantity of heat in joules (J): stored accumulator energy, heat per cycle.",
		Units: []unit{
			{"Joule", "1", "is the SI unit of energy.", "Joules", "J", nil, "", "", false},
			{"Kilojoule", "1e3", "is 10³ J.", "Kilojoules", "kJ", nil, "", "", false},
			{"Megajoule", "1e6", "is 10⁶ J.", "Megajoules", "MJ", nil, "", "", false},
			{"KilowattHour", "1e3 * hourS", "is 3.6 MJ exactly.", "KilowattHours", "kWh", []string{"kW·h", "kW*h", "kW h"}, "", "", false},
			{"BTU", "btuJ", "is the International Table British thermal unit, 1055.05585262 J exactly (NIST SP 811).", "BTU", "BTU", []string{"Btu", "btu"}, "", "", false},
		}},
	{Name: "Temperature", Kind: "temperature", Dim: "dim(0, 0, 0, 1, 0)", Base: "Kelvin", Metric: "°C", US: "°F",
		Accept: "refPoint", Offset: true, Min: "0", MinText: "≥ 0 K (absolute zero)",
		Doc: `Temperature is a thermodynamic (absolute) temperature in kelvins (K).
// Celsius and Fahrenheit are offset scales, so they are functions
// (TemperatureFromCelsius, t.Celsius) rather than constants. The difference of
// two temperatures is a TemperatureDifference: use t.Sub and t.Add.`,
		Units: []unit{
			{"Kelvin", "1", "is the SI unit of thermodynamic temperature.", "Kelvin", "K", []string{"kelvin"}, "", "refPoint", false},
			{"Rankine", "fahrenheitK", "is 5/9 K exactly; 0 °R is absolute zero.", "Rankine", "°R", []string{"degR", "R"}, "", "refPoint", false},
			{"", "1", "", "", "°C", []string{"degC", "℃", "C", "deg C", "celsius"}, "celsiusZeroK", "refPoint", false},
			{"", "fahrenheitK", "", "", "°F", []string{"degF", "℉", "F", "deg F", "fahrenheit"}, "fahrenheitZeroK", "refPoint", false},
		}},
	{Name: "TemperatureDifference", Kind: "temperature difference", Dim: "dim(0, 0, 0, 1, 0)", Base: "DeltaKelvin", Metric: "K", US: "°F",
		Accept: "refNone | refPoint",
		Doc: `TemperatureDifference is a temperature interval in kelvins (K): a rise
// through a relief valve, a cooler's approach. One kelvin and one degree
// Celsius are the same interval; one degree Fahrenheit is 5/9 K. Temperature
// spellings (K, °C, °F) parse as intervals here; Δ spellings (ΔK, Δ°C, Δ°F)
// say so explicitly.`,
		Units: []unit{
			{"DeltaKelvin", "1", "is an interval of one kelvin.", "Kelvin", "K", nil, "", "", true},
			{"DeltaCelsius", "1", "is an interval of one degree Celsius, equal to one kelvin.", "Celsius", "°C", nil, "", "", true},
			{"DeltaFahrenheit", "fahrenheitK", "is an interval of one degree Fahrenheit, 5/9 K exactly.", "Fahrenheit", "°F", nil, "", "", true},
			{"", "1", "", "", "ΔK", []string{"delta K", "deltaK"}, "", "", false},
			{"", "1", "", "", "Δ°C", []string{"delta degC", "deltaC", "ΔC", "delta C"}, "", "", false},
			{"", "fahrenheitK", "", "", "Δ°F", []string{"delta degF", "deltaF", "ΔF", "delta F"}, "", "", false},
		}},
	{Name: "KinematicViscosity", Kind: "kinematic viscosity", Dim: "dim(2, 0, -1, 0, 0)", Base: "SquareMetrePerSecond", Metric: "mm²/s", US: "cSt",
		Doc: "KinematicViscosity is a kinematic viscosity in square metres per second (m²/s); oils are quoted in mm²/s (cSt).",
		Units: []unit{
			{"SquareMetrePerSecond", "1", "is the SI unit of kinematic viscosity.", "SquareMetresPerSecond", "m²/s", []string{"m2/s", "m^2/s"}, "", "", false},
			{"SquareMillimetrePerSecond", "1e-6", "is 10⁻⁶ m²/s, the unit of ISO 3448 grades.", "SquareMillimetresPerSecond", "mm²/s", []string{"mm2/s", "mm^2/s"}, "", "", false},
			{"Centistokes", "1e-6", "is one centistokes, 1 mm²/s exactly.", "Centistokes", "cSt", []string{"cst", "CST"}, "", "", false},
			{"Stokes", "1e-4", "is one stokes, 1 cm²/s exactly.", "Stokes", "St", nil, "", "", false},
		}},
	{Name: "DynamicViscosity", Kind: "dynamic viscosity", Dim: "dim(-1, 1, -1, 0, 0)", Base: "PascalSecond", Metric: "mPa·s", US: "cP",
		Doc: "DynamicViscosity is an absolute (dynamic) viscosity in pascal seconds (Pa·s).",
		Units: []unit{
			{"PascalSecond", "1", "is the SI unit of dynamic viscosity.", "PascalSeconds", "Pa·s", []string{"Pa*s", "Pa.s", "Pa s", "Pas"}, "", "", false},
			{"MillipascalSecond", "1e-3", "is 10⁻³ Pa·s.", "MillipascalSeconds", "mPa·s", []string{"mPa*s", "mPa.s", "mPa s", "mPas"}, "", "", false},
			{"Centipoise", "1e-3", "is one centipoise, 1 mPa·s exactly.", "Centipoise", "cP", []string{"cp", "cps"}, "", "", false},
			{"Poise", "1e-1", "is one poise, 0.1 Pa·s exactly.", "Poise", "P", nil, "", "", false},
		}},
	{Name: "Density", Kind: "density", Dim: "dim(-3, 1, 0, 0, 0)", Base: "KilogramPerCubicMetre", Metric: "kg/m³", US: "lbm/ft³",
		Doc: "Density is a mass density in kilograms per cubic metre (kg/m³).",
		Units: []unit{
			{"KilogramPerCubicMetre", "1", "is the SI unit of density.", "KilogramsPerCubicMetre", "kg/m³", []string{"kg/m3", "kg/m^3"}, "", "", false},
			{"GramPerCubicCentimetre", "1e3", "is one g/cm³ (g/mL), 1000 kg/m³.", "GramsPerCubicCentimetre", "g/cm³", []string{"g/cm3", "g/cc", "g/mL", "g/ml"}, "", "", false},
			{"KilogramPerLitre", "1e3", "is one kg/L, 1000 kg/m³.", "KilogramsPerLitre", "kg/L", []string{"kg/l"}, "", "", false},
			{"PoundPerCubicFoot", "lbmKg / (footM * footM * footM)", "is one lbm/ft³, ≈ 16.0185 kg/m³ (exact ratio).", "PoundsPerCubicFoot", "lbm/ft³", []string{"lbm/ft3", "lb/ft³", "lb/ft3", "pcf"}, "", "", false},
			{"PoundPerUSGallon", "lbmKg / usGallonM3", "is one lbm per US gallon, ≈ 119.826 kg/m³ (exact ratio).", "PoundsPerUSGallon", "lbm/gal", []string{"lb/gal", "ppg"}, "", "", false},
		}},
	{Name: "SpecificHeatCapacity", Kind: "specific heat capacity", Dim: "dim(2, 0, -2, -1, 0)", Base: "JoulePerKilogramKelvin", Metric: "kJ/(kg·K)", US: "BTU/(lbm·°F)",
		Doc: "SpecificHeatCapacity is a specific heat capacity in joules per kilogram kelvin (J/(kg·K)).",
		Units: []unit{
			{"JoulePerKilogramKelvin", "1", "is the SI unit of specific heat capacity.", "JoulesPerKilogramKelvin", "J/(kg·K)", []string{"J/kg/K", "J/(kg*K)", "J/kgK"}, "", "", false},
			{"KilojoulePerKilogramKelvin", "1e3", "is 10³ J/(kg·K).", "KilojoulesPerKilogramKelvin", "kJ/(kg·K)", []string{"kJ/kg/K", "kJ/(kg*K)", "kJ/kgK"}, "", "", false},
			{"BTUPerPoundFahrenheit", "btuJ / (lbmKg * fahrenheitK)", "is one BTU_IT/(lbm·°F), 4186.8 J/(kg·K) exactly (NIST SP 811).", "BTUPerPoundFahrenheit", "BTU/(lbm·°F)", []string{"BTU/(lbm*°F)", "BTU/lbm/°F", "Btu/(lb·°F)", "Btu/lb/F", "BTU/lb/F"}, "", "", false},
		}},
	{Name: "HeatTransferCoefficient", Kind: "heat transfer coefficient", Dim: "dim(0, 1, -3, -1, 0)", Base: "WattPerSquareMetreKelvin", Metric: "W/(m²·K)", US: "BTU/(h·ft²·°F)",
		Doc: "HeatTransferCoefficient is a surface heat transfer coefficient in watts per square metre kelvin (W/(m²·K)): reservoir walls, coolers.",
		Units: []unit{
			{"WattPerSquareMetreKelvin", "1", "is the SI unit of heat transfer coefficient.", "WattsPerSquareMetreKelvin", "W/(m²·K)", []string{"W/m²/K", "W/(m2*K)", "W/m2/K", "W/m2K", "W/(m^2*K)"}, "", "", false},
			{"BTUPerHourSquareFootFahrenheit", "btuJ / (hourS * footM * footM * fahrenheitK)", "is one BTU_IT/(h·ft²·°F), ≈ 5.6783 W/(m²·K) (exact ratio).", "BTUPerHourSquareFootFahrenheit", "BTU/(h·ft²·°F)", []string{"BTU/(h*ft2*F)", "Btu/(h·ft²·°F)", "BTU/h/ft2/F"}, "", "", false},
		}},
	{Name: "ThermalConductivity", Kind: "thermal conductivity", Dim: "dim(1, 1, -3, -1, 0)", Base: "WattPerMetreKelvin", Metric: "W/(m·K)", US: "BTU/(h·ft·°F)",
		Doc: "ThermalConductivity is a thermal conductivity in watts per metre kelvin (W/(m·K)).",
		Units: []unit{
			{"WattPerMetreKelvin", "1", "is the SI unit of thermal conductivity.", "WattsPerMetreKelvin", "W/(m·K)", []string{"W/m/K", "W/(m*K)", "W/mK"}, "", "", false},
			{"BTUPerHourFootFahrenheit", "btuJ / (hourS * footM * fahrenheitK)", "is one BTU_IT/(h·ft·°F), ≈ 1.7307 W/(m·K) (exact ratio).", "BTUPerHourFootFahrenheit", "BTU/(h·ft·°F)", []string{"BTU/(h*ft*F)", "Btu/(h·ft·°F)", "BTU/h/ft/F"}, "", "", false},
		}},
	{Name: "Stiffness", Kind: "stiffness", Dim: "dim(0, 1, -2, 0, 0)", Base: "NewtonPerMetre", Metric: "kN/mm", US: "lbf/in",
		Doc: "Stiffness is a spring rate in newtons per metre (N/m): the hydraulic stiffness of a cylinder's oil columns.",
		Units: []unit{
			{"NewtonPerMetre", "1", "is the SI unit of stiffness.", "NewtonsPerMetre", "N/m", nil, "", "", false},
			{"NewtonPerMillimetre", "1e3", "is one N/mm, 10³ N/m.", "NewtonsPerMillimetre", "N/mm", nil, "", "", false},
			{"KilonewtonPerMillimetre", "1e6", "is one kN/mm, 10⁶ N/m.", "KilonewtonsPerMillimetre", "kN/mm", nil, "", "", false},
			{"PoundForcePerInch", "lbfN / inchM", "is one lbf/in, ≈ 175.127 N/m (exact ratio).", "PoundsForcePerInch", "lbf/in", []string{"lb/in"}, "", "", false},
		}},
	{Name: "Frequency", Kind: "frequency", Dim: "dim(0, 0, -1, 0, 0)", Base: "Hertz", Metric: "Hz", US: "Hz",
		Doc: "Frequency is a frequency in hertz (Hz, 1/s): natural frequencies, supply frequency, cycle rates.",
		Units: []unit{
			{"Hertz", "1", "is the SI unit of frequency.", "Hertz", "Hz", []string{"1/s", "s⁻¹", "s^-1"}, "", "", false},
			{"CyclePerMinute", "1.0 / minuteS", "is one cycle per minute.", "CyclesPerMinute", "cpm", []string{"cycles/min"}, "", "", false},
		}},
	{Name: "Acceleration", Kind: "acceleration", Dim: "dim(1, 0, -2, 0, 0)", Base: "MetrePerSecondSquared", Metric: "m/s²", US: "ft/s²",
		Doc: "Acceleration is an acceleration in metres per second squared (m/s²).",
		Units: []unit{
			{"MetrePerSecondSquared", "1", "is the SI unit of acceleration.", "MetresPerSecondSquared", "m/s²", []string{"m/s2", "m/s^2"}, "", "", false},
			{"StandardGravity", "gravity", "is g₀ = 9.80665 m/s² exactly (CGPM 1901).", "StandardGravities", "g₀", []string{"gn"}, "", "", false},
			{"FootPerSecondSquared", "footM", "is 0.3048 m/s² exactly.", "FeetPerSecondSquared", "ft/s²", []string{"ft/s2", "ft/s^2"}, "", "", false},
		}},
	{Name: "time", NoType: true, Kind: "time", Dim: "dim(0, 0, 1, 0, 0)",
		Units: []unit{
			{"", "1", "", "", "s", []string{"sec"}, "", "", false},
			{"", "1e-3", "", "", "ms", nil, "", "", false},
			{"", "minuteS", "", "", "min", nil, "", "", false},
			{"", "hourS", "", "", "h", []string{"hr"}, "", "", false},
		}},
	{Name: "angle", NoType: true, Kind: "angle", Dim: "dim(0, 0, 0, 0, 1)",
		Units: []unit{
			{"", "1", "", "", "rev", []string{"r", "revolution"}, "", "", false},
			{"", "1 / revRad", "", "", "rad", nil, "", "", false},
		}},
}

func main() {
	seen := map[string]string{}
	idx := 0
	for i := range quantities {
		q := &quantities[i]
		for _, u := range q.Units {
			if !q.NoType && u.Symbol == q.Metric {
				q.MetricIdx = idx
			}
			idx++
			spellings := u.Aliases
			if !u.NoReg {
				spellings = append([]string{u.Symbol}, spellings...)
			}
			for _, sp := range spellings {
				if other, ok := seen[sp]; ok {
					fail(fmt.Errorf("spelling %q of %s is also a spelling of %s", sp, q.Name, other))
				}
				seen[sp] = q.Name
			}
		}
	}
	var buf bytes.Buffer
	if err := tmpl.Execute(&buf, quantities); err != nil {
		fail(err)
	}
	out, err := format.Source(buf.Bytes())
	if err != nil {
		os.WriteFile("quantities_gen.go.broken", buf.Bytes(), 0o644)
		fail(err)
	}
	if err := os.WriteFile("quantities_gen.go", out, 0o644); err != nil {
		fail(err)
	}
	writeDoc()
}

// writeDoc writes doc.go: the package documentation with every spelling.
func writeDoc() {
	var b strings.Builder
	b.WriteString("// Code generated by gen.go; DO NOT EDIT. Edit docIntro in gen.go.\n\n")
	for _, line := range strings.Split(strings.TrimSpace(docIntro), "\n") {
		b.WriteString(strings.TrimRight("// "+line, " ") + "\n")
	}
	b.WriteString("//\n// # Spellings\n//\n")
	b.WriteString("// Every accepted spelling, by quantity type; the first is the one formatting\n")
	b.WriteString("// writes. Case is significant (MPa is not mPa). Inside expressions, these\n")
	b.WriteString("// names combine with *, ·, /, ^ and parentheses.\n//\n")
	for _, q := range quantities {
		name := q.Name
		if q.NoType {
			name = q.Kind + " (in expressions only)"
		}
		var sp []string
		for _, u := range q.Units {
			all := u.Aliases
			if !u.NoReg {
				all = append([]string{u.Symbol}, all...)
			}
			if len(all) > 0 {
				sp = append(sp, strings.Join(all, " "))
			}
		}
		b.WriteString("//   - " + name + ": " + strings.Join(sp, "; ") + "\n")
	}
	b.WriteString("package units\n")
	out, err := format.Source([]byte(b.String()))
	if err != nil {
		fail(err)
	}
	if err := os.WriteFile("doc.go", out, 0o644); err != nil {
		fail(err)
	}
}

const docIntro = `
Package units provides typed, unit-checked physical quantities for sizing
hydraulic (fluid power) systems.

Each quantity is a named float64 holding its coherent SI value, in the manner
of time.Duration: Pressure in pascals, Flow in cubic metres per second, Force
in newtons, Temperature in kelvins. Displacement and RotationalSpeed count
revolutions (m³/rev, rev/s), so that flow = displacement × speed holds without
a factor of 2π. Values are built by multiplying a number by a unit constant
and read back by accessors that name the unit:

	p := 210 * units.Bar
	q := 45 * units.LitrePerMinute
	fmt.Println(p.PSI(), q.USGallonsPerMinute(), p.TimesFlow(q).Kilowatts())

Arithmetic on quantities compiles to plain float64 arithmetic. Physics across
types is typed (Pressure.TimesArea returns a Force; Flow.PerArea a Velocity).

# Exactness

Every factor is defined once, from the exact definitions of NIST SP 811,
Appendix B (inch = 0.0254 m, lbm = 0.45359237 kg, g₀ = 9.80665 m/s², US gallon
= 231 in³, hp = 550 ft·lbf/s, BTU = International Table BTU = 1055.05585262 J,
bar = 10⁵ Pa). Untyped constant arithmetic rounds each unit to float64 once.
The radian-based units are not exact (2π is irrational). Conversions between
units are exact up to float64 rounding of one multiply and one divide; compare
converted values with a relative tolerance of a few ulp, not ==.

# Gauge and absolute pressure, temperature and difference

Pressure is a gauge or differential pressure; AbsolutePressure is measured from
vacuum. They are different types, and crossing between them needs an explicit
ambient pressure (Pressure.Absolute, AbsolutePressure.Gauge); StandardAtmosphere
is provided but never implied. As the trade writes them, plain psi and bar are
gauge, psig and barg say so, and psia, bara and atm are absolute; the SI
spellings Pa, kPa, MPa, mbar and inHg are read as either. Parsing an absolute
spelling into a Pressure, or a gauge spelling into an AbsolutePressure, fails
with ErrReference.

Temperature is absolute (kelvins); °C and °F are offset scales, reached through
TemperatureFromCelsius, TemperatureFromFahrenheit, Temperature.Celsius and
Temperature.Fahrenheit. Temperature.Sub gives a TemperatureDifference and
Temperature.Add takes one.

# Parsing

The typed parsers (ParsePressure, ParseFlow, …) read a decimal number, optional
spaces, then a unit:

	number = [ "+" | "-" ] ( digits [ "." digits ] | "." digits ) [ ( "e" | "E" ) [ "+" | "-" ] digits ]

No hexadecimal, underscores, NaN or Inf. Leading and trailing spaces are
ignored. The unit is any registered spelling of the type (listed below) or a
unit expression of registered names with the right dimension:

	expr    = product { "/" product }
	product = power { ( "*" | "·" | "⋅" | "." | "-" | " " ) power }
	power   = primary [ "^" [ "+" | "-" ] digits | superscript digits | digits ]
	primary = "(" expr ")" | "1" | name

Everything after the first "/" at one parenthesis level divides, the way
engineers read W/m²·K. A lone spelling keeps its reference (gauge, absolute,
temperature point); inside a longer expression temperatures are intervals, as
in BTU/(lbm·°F). Parse reads into a dynamic Quantity that carries its SI
dimension and converts to a typed value only when the dimensions match;
Convert converts a number between two unit expressions.

Errors are *ParseError values that quote the input and the byte offset and
unwrap to ErrSyntax, ErrUnknownUnit (with the nearest known spellings),
ErrDimension, ErrRange or ErrReference. Parsing a registered unit allocates
nothing.

# Formatting

String writes the metric trade unit (bar, L/min, kN, mm, cm³/rev, kW, °C,
mm²/s) with four significant digits; Append does the same into a caller's
buffer without allocating; Format supports %v, %s, %#v, and %e/%f/%g with
width and precision. A System (Metric, USCustomary, or a copy changed by the
caller) chooses the unit of each type for reports. MarshalText writes text that
UnmarshalText reads back to the identical float64, so quantities travel through
JSON, YAML and flags.

# Errors for bad values

RangeError names a function, a parameter, the value and the valid range, and
unwraps to ErrRange. The hydrosize families return it for bad input.
`

func fail(err error) {
	fmt.Fprintln(os.Stderr, "gen:", err)
	os.Exit(1)
}

func findSymbol(q quantity, sym string) string {
	for _, u := range q.Units {
		if u.Symbol == sym {
			return u.Symbol
		}
	}
	fail(fmt.Errorf("%s: display unit %q is not one of its units", q.Name, sym))
	return ""
}

var funcs = template.FuncMap{
	"ref": func(r string) string {
		if r == "" {
			return "refNone"
		}
		return r
	},
	"accept": func(a string) string {
		if a == "" {
			return "refNone"
		}
		return a
	},
	"offset": func(o string) string {
		if o == "" {
			return "0"
		}
		return o
	},
	"quote": func(s string) string { return fmt.Sprintf("%q", s) },
	"lower": strings.ToLower,
	"check": func(q quantity) string {
		if !q.NoType {
			findSymbol(q, q.Metric)
			findSymbol(q, q.US)
		}
		return ""
	},
	"examples": func(q quantity) string {
		s := []string{q.Metric}
		if q.US != q.Metric {
			s = append(s, q.US)
		}
		for _, u := range q.Units {
			if !u.NoReg && u.Symbol != q.Metric && u.Symbol != q.US {
				s = append(s, u.Symbol)
			}
		}
		if len(s) > 4 {
			s = s[:4]
		}
		return strings.Join(s, ", ")
	},
}

var tmpl = template.Must(template.New("gen").Funcs(funcs).Parse(`// Code generated by gen.go; DO NOT EDIT.

package units

import "fmt"

{{range $q := .}}{{if not $q.NoType}}{{check $q}}
// {{$q.Doc}}
//
// The zero value is zero. Arithmetic on {{$q.Name}} values is plain float64
// arithmetic; unit constants are exact where their definition is exact.
type {{$q.Name}} float64

// Units of {{$q.Name}}.
const (
{{- range $u := $q.Units}}{{if $u.Const}}
	// {{$u.Const}} {{$u.Doc}}
	{{$u.Const}} {{$q.Name}} = {{$u.Value}}
{{- end}}{{end}}
)
{{range $u := $q.Units}}{{if $u.Accessor}}
// {{$u.Accessor}} returns q as a number of {{$u.Symbol}}.
func (q {{$q.Name}}) {{$u.Accessor}}() float64 { return float64(q / {{$u.Const}}) }
{{end}}{{end}}
// In returns q as a number of unit u, such as q.In(units.{{$q.Base}}).
// It returns 0 when u is 0.
func (q {{$q.Name}}) In(u {{$q.Name}}) float64 {
	if u == 0 {
		return 0
	}
	return float64(q / u)
}

// String formats q in its metric trade unit ({{$q.Metric}}) with four
// significant digits, for example in logs and reports.
func (q {{$q.Name}}) String() string {
	var buf [40]byte
	return string(q.Append(buf[:0]))
}

// Append appends the String form of q to b and returns the extended buffer.
// It does not allocate when b has room.
func (q {{$q.Name}}) Append(b []byte) []byte {
	return appendIn(b, float64(q), &unitTable[metric{{$q.Name}}], 4)
}

// GoString formats q as a Go expression, such as "12.5 * units.{{$q.Base}}".
func (q {{$q.Name}}) GoString() string { return goString(float64(q), "units.{{$q.Base}}") }

// Format implements fmt.Formatter: %v and %s print the String form, %#v the
// GoString form, and %e, %f, %g (with flags, width and precision) format the
// number in {{$q.Metric}} followed by the unit.
func (q {{$q.Name}}) Format(f fmt.State, verb rune) {
	formatQuantity(f, verb, float64(q), &unitTable[metric{{$q.Name}}], "{{$q.Name}}", "units.{{$q.Base}}")
}

// MarshalText implements encoding.TextMarshaler. It writes the shortest
// decimal in {{$q.Metric}} when that reads back to the identical float64, and
// the coherent SI unit otherwise, so UnmarshalText restores q bit for bit.
func (q {{$q.Name}}) MarshalText() ([]byte, error) {
	return marshalText(float64(q), &unitTable[metric{{$q.Name}}], &type{{$q.Name}})
}

// UnmarshalText implements encoding.TextUnmarshaler. It accepts any text
// that Parse{{$q.Name}} accepts.
func (q *{{$q.Name}}) UnmarshalText(text []byte) error {
	v, err := parseTyped("UnmarshalText", string(text), &type{{$q.Name}})
	if err != nil {
		return err
	}
	*q = {{$q.Name}}(v)
	return nil
}

// Parse{{$q.Name}} reads a {{$q.Kind}}: a decimal number, optional spaces,
// then a unit of {{$q.Kind}} such as {{examples $q}} (see the package doc
// for the grammar and every spelling).
func Parse{{$q.Name}}(s string) ({{$q.Name}}, error) {
	v, err := parseTyped("Parse{{$q.Name}}", s, &type{{$q.Name}})
	return {{$q.Name}}(v), err
}

// {{$q.Name}} converts a dynamic quantity to a {{$q.Name}}. It fails with
// ErrDimension when the dimensions differ{{if ne $q.Accept ""}} and with ErrReference when the
// reference (gauge, absolute, temperature point or difference) does not fit{{end}}.
func (d Quantity) {{$q.Name}}() ({{$q.Name}}, error) {
	v, err := d.as(&type{{$q.Name}})
	return {{$q.Name}}(v), err
}

// Append{{$q.Name}} appends q in the system's unit for {{$q.Name}} to b.
// It does not allocate when b has room.
func (s *System) Append{{$q.Name}}(b []byte, q {{$q.Name}}) []byte {
	return appendIn(b, float64(q), s.unit(s.{{$q.Name}}, &type{{$q.Name}}, metric{{$q.Name}}), s.digits())
}

// Format{{$q.Name}} formats q in the system's unit for {{$q.Name}}.
func (s *System) Format{{$q.Name}}(q {{$q.Name}}) string {
	var buf [40]byte
	return string(s.Append{{$q.Name}}(buf[:0], q))
}
{{end}}{{end}}
// System is a presentation system: for each quantity type, the spelling of
// the unit that reports use. Copy Metric or USCustomary and change the fields
// you need; an empty or unknown field falls back to the metric unit (Check
// reports such fields).
type System struct {
	Name   string // a label, e.g. "metric"
	Digits int    // significant digits; 0 means 4
{{- range $q := .}}{{if not $q.NoType}}
	{{$q.Name}} string
{{- end}}{{end}}
}

// Metric is the metric trade system: bar, L/min, kN, mm, cm³/rev, kW, °C, mm²/s.
var Metric = System{Name: "metric", Digits: 4,
{{- range $q := .}}{{if not $q.NoType}}
	{{$q.Name}}: {{quote $q.Metric}},
{{- end}}{{end}}
}

// USCustomary is the US customary trade system: psi, gpm, lbf, in, in³/rev, hp, °F.
var USCustomary = System{Name: "US customary", Digits: 4,
{{- range $q := .}}{{if not $q.NoType}}
	{{$q.Name}}: {{quote $q.US}},
{{- end}}{{end}}
}

// Check reports the first field of s whose unit is unknown or of the wrong
// dimension or reference.
func (s *System) Check() error {
{{- range $q := .}}{{if not $q.NoType}}
	if err := s.checkField("{{$q.Name}}", s.{{$q.Name}}, &type{{$q.Name}}); err != nil {
		return err
	}
{{- end}}{{end}}
	return nil
}

// Type descriptions used by parsing and conversion.
var (
{{- range $q := .}}{{if not $q.NoType}}
	type{{$q.Name}} = typeInfo{name: "{{$q.Name}}", kind: "{{$q.Kind}}", dim: {{$q.Dim}}, accept: {{accept $q.Accept}}, useOffset: {{$q.Offset}}, {{if $q.Min}}hasMin: true, min: {{$q.Min}}, minText: {{quote $q.MinText}}, {{end}}examples: {{quote (examples $q)}}}
{{- end}}{{end}}
)

// allTypes lists every quantity type, in declaration order.
var allTypes = [...]*typeInfo{
{{- range $q := .}}{{if not $q.NoType}}
	&type{{$q.Name}},
{{- end}}{{end}}
}

// Indices into unitTable of each type's metric unit.
const (
{{- range $q := .}}{{if not $q.NoType}}
	metric{{$q.Name}} = {{$q.MetricIdx}}
{{- end}}{{end}}
)

// unitTable lists every unit: canonical symbol, factor to SI, offset, dimension, reference.
var unitTable = [...]unitDef{
{{- range $q := .}}{{range $u := $q.Units}}
	{sym: {{quote $u.Symbol}}, factor: {{$u.Value}}, offset: {{offset $u.Offset}}, dim: {{$q.Dim}}, ref: {{ref $u.Ref}}, noReg: {{$u.NoReg}}, aliases: []string{ {{range $a := $u.Aliases}}{{quote $a}}, {{end}} }},
{{- end}}{{end}}
}
`))
