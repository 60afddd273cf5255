//go:build ignore

// gen writes the generated files of package units from the quantities
// table below, the one place where a unit is defined:
//
//   - quantities_gen.go: each quantity type, its unit constants and its
//     methods (accessors, In, String, Format, text marshalling, the typed
//     parser and the conversion from a dynamic Quantity);
//   - tables_gen.go: the data tables that parsing, conversion and
//     formatting read (type descriptions and the unit table);
//   - systems_gen.go: the presentation systems and their per-type methods;
//   - doc.go: the package documentation with every accepted spelling.
//
// Run it with go generate ./units (the directive is in defs.go).
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

// context is a spelling with a meaning for one type's parser only: a unit
// of the type it reads as, or a refusal that says what to write instead.
// The typed parser of the type tries it (letter case ignored) before the
// registry, so it never changes what a registered spelling means elsewhere.
type context struct {
	Spelling string
	Unit     string // symbol of the unit of this type it reads as; "" to refuse
	Read     string // or a function that reads the number (not a factor: SUS)
	Err      string // or, to refuse: the sentinel, such as "ErrAmbiguous"
	Detail   string // and what the error says
	UnitIdx  int    // index in unitTable of Unit (set by main)
}

// purpose is a use of a quantity type that a presentation system may write
// in a unit of its own. Where a system sets no unit for it, it follows the
// system's unit for the type.
type purpose struct {
	Name  string // method stem: "PistonSpeed" gives AppendPistonSpeed, …
	What  string // what it is, for doc comments
	US    string // the US customary unit; "" to follow the type's
	USIdx int    // index in unitTable of US (set by main)
}

// What the refusals of the context spellings say.
const (
	tonForce = `a ton is ambiguous as a force: write "tf" for a tonne-force (1000 kgf, 9.807 kN) ` +
		`or "US tonf" for a short ton-force (2000 lbf, 8.896 kN); "UK tonf" is the long ton-force (2240 lbf)`
	tonMass = `a ton is ambiguous: write "t" for a metric tonne (1000 kg), or the mass in lbm ` +
		`for a US short ton (2000 lb) or a UK long ton (2240 lb)`
	mercuryGauge = `a plain inch or millimetre of mercury is a barometric (absolute) reading: ` +
		`for a vacuum gauge reading write "inHg vac" or "mmHg vac" (a gauge pressure below ambient), ` +
		`or parse it as an AbsolutePressure`
)

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
	Context []context // spellings only this type's parser reads
	// Purposes name the values of this type that a trade writes in a unit
	// of their own (US piston speeds in in/s, line velocities in ft/s).
	Purposes []purpose
	NoType   bool // registry-only units (time, angle)

	MetricIdx int // index in unitTable of the metric unit (set by main)
	USIdx     int // index in unitTable of the US customary unit (set by main)
}

var quantities = []quantity{
	{Name: "Length", Kind: "length", Dim: "dim(1, 0, 0, 0, 0)", Base: "Metre", Metric: "mm", US: "in",
		Doc: "Length is a length or distance in metres (m): bores, rods, strokes, line diameters and lengths.",
		Units: []unit{
			{Const: "Metre", Value: "1", Doc: "is the SI unit of length.", Accessor: "Metres", Symbol: "m", Aliases: []string{"metre", "meter"}},
			{Const: "Millimetre", Value: "1e-3", Doc: "is 10⁻³ m.", Accessor: "Millimetres", Symbol: "mm"},
			{Const: "Centimetre", Value: "1e-2", Doc: "is 10⁻² m.", Accessor: "Centimetres", Symbol: "cm"},
			{Const: "Micrometre", Value: "1e-6", Doc: "is 10⁻⁶ m, the micron of filtration ratings.", Accessor: "Micrometres", Symbol: "µm", Aliases: []string{"μm", "um", "micron", "microns", "micrometre", "micrometer"}},
			{Const: "Inch", Value: "inchM", Doc: "is 0.0254 m exactly (NIST SP 811).", Accessor: "Inches", Symbol: "in", Aliases: []string{"inch", "inches", "\"", "″"}},
			{Const: "Foot", Value: "footM", Doc: "is 0.3048 m exactly (NIST SP 811).", Accessor: "Feet", Symbol: "ft", Aliases: []string{"foot", "feet", "'", "′"}},
		}},
	{Name: "Area", Kind: "area", Dim: "dim(2, 0, 0, 0, 0)", Base: "SquareMetre", Metric: "cm²", US: "in²",
		Doc: "Area is an area in square metres (m²): piston and annulus areas, flow sections.",
		Units: []unit{
			{Const: "SquareMetre", Value: "1", Doc: "is the SI unit of area.", Accessor: "SquareMetres", Symbol: "m²", Aliases: []string{"m2", "m^2", "sq m"}},
			{Const: "SquareMillimetre", Value: "1e-6", Doc: "is 10⁻⁶ m².", Accessor: "SquareMillimetres", Symbol: "mm²", Aliases: []string{"mm2", "mm^2", "sq mm"}},
			{Const: "SquareCentimetre", Value: "1e-4", Doc: "is 10⁻⁴ m².", Accessor: "SquareCentimetres", Symbol: "cm²", Aliases: []string{"cm2", "cm^2", "sq cm"}},
			{Const: "SquareInch", Value: "inchM * inchM", Doc: "is 6.4516 cm² exactly (NIST SP 811).", Accessor: "SquareInches", Symbol: "in²", Aliases: []string{"in2", "in^2", "sq in"}},
			{Const: "SquareFoot", Value: "footM * footM", Doc: "is 0.09290304 m² exactly (NIST SP 811).", Accessor: "SquareFeet", Symbol: "ft²", Aliases: []string{"ft2", "ft^2", "sq ft"}},
		}},
	{Name: "Volume", Kind: "volume", Dim: "dim(3, 0, 0, 0, 0)", Base: "CubicMetre", Metric: "L", US: "gal",
		Doc: "Volume is a volume in cubic metres (m³): reservoirs, accumulators, swept volumes.",
		Units: []unit{
			{Const: "CubicMetre", Value: "1", Doc: "is the SI unit of volume.", Accessor: "CubicMetres", Symbol: "m³", Aliases: []string{"m3", "m^3", "cu m"}},
			{Const: "Litre", Value: "1e-3", Doc: "is 10⁻³ m³ exactly (CGPM 1964).", Accessor: "Litres", Symbol: "L", Aliases: []string{"l", "litre", "liter", "litres", "liters", "dm³", "dm3"}},
			{Const: "Millilitre", Value: "1e-6", Doc: "is 10⁻⁶ m³.", Accessor: "Millilitres", Symbol: "mL", Aliases: []string{"ml"}},
			{Const: "CubicCentimetre", Value: "1e-6", Doc: "is 10⁻⁶ m³ (one cc).", Accessor: "CubicCentimetres", Symbol: "cm³", Aliases: []string{"cm3", "cm^3", "cc", "ccm"}},
			{Const: "CubicInch", Value: "inchM * inchM * inchM", Doc: "is 16.387064 cm³ exactly (NIST SP 811).", Accessor: "CubicInches", Symbol: "in³", Aliases: []string{"in3", "in^3", "cu in", "cuin", "cid"}},
			{Const: "USGallon", Value: "usGallonM3", Doc: "is the US liquid gallon, 231 in³ = 3.785411784 L exactly (NIST SP 811).", Accessor: "USGallons", Symbol: "gal", Aliases: []string{"US gal", "USgal", "usgal", "gal(US)", "gallon", "gallons", "US gallon", "US gallons"}},
			{Const: "UKGallon", Value: "ukGallonM3", Doc: "is the imperial gallon, 4.54609 L exactly (NIST SP 811).", Accessor: "UKGallons", Symbol: "UK gal", Aliases: []string{"UKgal", "imp gal", "gal(UK)"}},
		}},
	{Name: "Mass", Kind: "mass", Dim: "dim(0, 1, 0, 0, 0)", Base: "Kilogram", Metric: "kg", US: "lbm",
		Doc: "Mass is a mass in kilograms (kg): payloads, moving parts, oil charges.",
		Units: []unit{
			{Const: "Kilogram", Value: "1", Doc: "is the SI unit of mass.", Accessor: "Kilograms", Symbol: "kg"},
			{Const: "Gram", Value: "1e-3", Doc: "is 10⁻³ kg.", Accessor: "Grams", Symbol: "g"},
			{Const: "Tonne", Value: "1e3", Doc: "is the metric ton, 1000 kg.", Accessor: "Tonnes", Symbol: "t", Aliases: []string{"tonne"}},
			{Const: "PoundMass", Value: "lbmKg", Doc: "is the avoirdupois pound, 0.45359237 kg exactly (NIST SP 811).", Accessor: "Pounds", Symbol: "lbm", Aliases: []string{"lb", "lbs"}},
		},
		Context: []context{
			{Spelling: "ton", Err: "ErrAmbiguous", Detail: tonMass},
			{Spelling: "tons", Err: "ErrAmbiguous", Detail: tonMass},
		}},
	{Name: "Force", Kind: "force", Dim: "dim(1, 1, -2, 0, 0)", Base: "Newton", Metric: "kN", US: "lbf",
		Doc: "Force is a force in newtons (N): loads, cylinder thrust and pull.",
		Units: []unit{
			{Const: "Newton", Value: "1", Doc: "is the SI unit of force.", Accessor: "Newtons", Symbol: "N"},
			{Const: "Kilonewton", Value: "1e3", Doc: "is 10³ N.", Accessor: "Kilonewtons", Symbol: "kN"},
			{Const: "PoundForce", Value: "lbfN", Doc: "is lbm·g₀ = 4.4482216152605 N exactly (NIST SP 811).", Accessor: "PoundsForce", Symbol: "lbf"},
			{Const: "KilogramForce", Value: "kgfN", Doc: "is 1 kg·g₀ = 9.80665 N exactly (NIST SP 811).", Accessor: "KilogramsForce", Symbol: "kgf", Aliases: []string{"kp"}},
			{Const: "TonneForce", Value: "tonneForceN", Doc: "is the weight of one tonne, 1000 kgf = 9806.65 N exactly (NIST SP 811: metric ton and kilogram-force).", Accessor: "TonnesForce", Symbol: "tf", Aliases: []string{"tonne-force", "tonnes-force", "t-force", "tonne force", "metric ton-force"}},
			{Const: "ShortTonForce", Value: "shortTonForceN", Doc: "is the US (short) ton-force, 2000 lbf = 8896.443230521 N exactly (NIST SP 811: ton-force, 2000 lbf).", Accessor: "ShortTonsForce", Symbol: "US tonf", Aliases: []string{"ton(US)", "tonf(US)", "short ton-force", "short tons-force", "sh tonf"}},
			{Const: "LongTonForce", Value: "longTonForceN", Doc: "is the UK (long) ton-force, 2240 lbf = 9964.01641818352 N exactly (NIST SP 811: long ton, 2240 lb, under g₀).", Accessor: "LongTonsForce", Symbol: "UK tonf", Aliases: []string{"ton(UK)", "tonf(UK)", "long ton-force", "long tons-force"}},
		},
		// As loads are spoken: a pound of load is a pound-force; a kilogram
		// or a plain ton is not a force until it says which.
		Context: []context{
			{Spelling: "lb", Unit: "lbf"},
			{Spelling: "lbs", Unit: "lbf"},
			{Spelling: "kg", Err: "ErrDimension", Detail: `"kg" is a mass; as a force write "kgf" (kilogram-force, 9.80665 N)`},
			{Spelling: "t", Err: "ErrAmbiguous", Detail: tonForce},
			{Spelling: "ton", Err: "ErrAmbiguous", Detail: tonForce},
			{Spelling: "tons", Err: "ErrAmbiguous", Detail: tonForce},
			{Spelling: "tonne", Err: "ErrAmbiguous", Detail: tonForce},
			{Spelling: "tonnes", Err: "ErrAmbiguous", Detail: tonForce},
			{Spelling: "tonf", Err: "ErrAmbiguous", Detail: tonForce},
		}},
	{Name: "Pressure", Kind: "pressure", Dim: "dim(-1, 1, -2, 0, 0)", Base: "Pascal", Metric: "bar", US: "psi",
		Accept: "refNone | refGauge | refDiff",
		Doc: `Pressure is a gauge or differential pressure in pascals (Pa): a pressure
// above (or below) the local ambient, or a difference between two pressures,
// such as a relief setting, a load pressure or a valve pressure drop. Plain
// bar and psi are read as gauge, as the trade writes them; psig and barg say
// so explicitly; psid and bard say that the value is a difference. Vacuum
// gauge readings ("28 inHg vac", "60 kPa vac") are gauge pressures below
// ambient, read as negative values. Use AbsolutePressure for gas laws and
// cavitation checks, and convert between the two only with an explicit
// ambient pressure.`,
		Units: []unit{
			{Const: "Pascal", Value: "1", Doc: "is the SI unit of pressure.", Accessor: "Pascals", Symbol: "Pa"},
			{Const: "Kilopascal", Value: "1e3", Doc: "is 10³ Pa.", Accessor: "Kilopascals", Symbol: "kPa"},
			{Const: "Megapascal", Value: "1e6", Doc: "is 10⁶ Pa (one N/mm²).", Accessor: "Megapascals", Symbol: "MPa", Aliases: []string{"N/mm²", "N/mm2"}},
			{Const: "Gigapascal", Value: "1e9", Doc: "is 10⁹ Pa, the usual unit of bulk and elastic moduli.", Accessor: "Gigapascals", Symbol: "GPa"},
			{Const: "Bar", Value: "barPa", Doc: "is 10⁵ Pa exactly (NIST SP 811).", Accessor: "Bar", Symbol: "bar", Aliases: []string{"barg", "bar(g)", "bar g"}, Ref: "refGauge"},
			{Const: "Millibar", Value: "1e-3 * barPa", Doc: "is 100 Pa.", Accessor: "Millibar", Symbol: "mbar"},
			{Const: "PSI", Value: "psiPa", Doc: "is one pound-force per square inch, ≈ 6894.757 Pa (exact ratio, NIST SP 811).", Accessor: "PSI", Symbol: "psi", Aliases: []string{"psig", "psi(g)", "lbf/in²", "lbf/in2"}, Ref: "refGauge"},
			{Const: "KSI", Value: "1e3 * psiPa", Doc: "is 1000 psi, used for material strengths.", Accessor: "KSI", Symbol: "ksi"},
			{Const: "KilogramForcePerSquareCentimetre", Value: "kgfN * 1e4", Doc: "is one kgf/cm² (the technical atmosphere, at), 98 066.5 Pa exactly (NIST SP 811). Parsing reads kg/cm² as kgf/cm², as gauges and data sheets write it.", Accessor: "KilogramsForcePerSquareCentimetre", Symbol: "kgf/cm²", Aliases: []string{"kgf/cm2", "kgf/cm^2", "at", "kg/cm²", "kg/cm2", "kg/cm^2"}, Ref: "refGauge"},
			{Const: "InchOfMercury", Value: "inHgPa", Doc: "is the conventional inch of mercury, 13 595.1 kg/m³·g₀·0.0254 m ≈ 3386.389 Pa (NIST SP 811, \"conventional\"). Parsing reads a plain inHg as a barometric (absolute) pressure: ParsePressure refuses it, and a vacuum gauge reading is written \"28 inHg vac\".", Accessor: "InchesOfMercury", Symbol: "inHg", Aliases: []string{"in Hg", "\"Hg"}, Ref: "refAbsolute"},
			// Differences: the same factors, said to be differences.
			{Value: "psiPa", Symbol: "psid", Aliases: []string{"psi(d)", "psi d"}, Ref: "refDiff"},
			{Value: "barPa", Symbol: "bard", Aliases: []string{"bar(d)", "bar d"}, Ref: "refDiff"},
			{Value: "1e3", Symbol: "kPa(d)", Aliases: []string{"kPa d", "kPad"}, Ref: "refDiff"},
			// Vacuum gauge readings: a depth below ambient, read as a negative
			// gauge pressure (the factor carries the sign).
			{Value: "-inHgPa", Symbol: "inHg vac", Aliases: []string{"inHgV", "inHg V", "inHg vacuum", "in Hg vac", "in Hg vacuum", "\"Hg vac", "\"Hg vacuum"}, Ref: "refGauge"},
			{Value: "-mmHgPa", Symbol: "mmHg vac", Aliases: []string{"mmHgV", "mmHg vacuum", "mm Hg vac", "mm Hg vacuum"}, Ref: "refGauge"},
			{Value: "-1e3", Symbol: "kPa vac", Aliases: []string{"kPa vacuum"}, Ref: "refGauge"},
			{Value: "-barPa", Symbol: "bar vac", Aliases: []string{"bar vacuum"}, Ref: "refGauge"},
			{Value: "-psiPa", Symbol: "psi vac", Aliases: []string{"psi vacuum"}, Ref: "refGauge"},
		},
		// A mercury column without "vac" is a barometric reading: absolute.
		Context: []context{
			{Spelling: "inHg", Err: "ErrReference", Detail: mercuryGauge},
			{Spelling: "in Hg", Err: "ErrReference", Detail: mercuryGauge},
			{Spelling: "\"Hg", Err: "ErrReference", Detail: mercuryGauge},
			{Spelling: "mmHg", Err: "ErrReference", Detail: mercuryGauge},
			{Spelling: "mm Hg", Err: "ErrReference", Detail: mercuryGauge},
			{Spelling: "Torr", Err: "ErrReference", Detail: mercuryGauge},
		}},
	{Name: "AbsolutePressure", Kind: "absolute pressure", Dim: "dim(-1, 1, -2, 0, 0)", Base: "PascalAbsolute", Metric: "bara", US: "psia",
		Accept: "refNone | refAbsolute", Min: "0", MinText: "≥ 0 Pa (absolute vacuum)",
		Doc: `AbsolutePressure is a pressure above absolute vacuum, in pascals (Pa):
// the pressure that gas laws (accumulators), vapour pressure and pump inlet
// checks need. It is never negative. Absolute spellings are bara, psia and atm;
// the SI units Pa, kPa, MPa and mbar are read as either kind.`,
		Units: []unit{
			{Const: "PascalAbsolute", Value: "1", Doc: "is one pascal above absolute vacuum.", Accessor: "Pascals", Symbol: "Pa(a)", Aliases: []string{"Pa abs"}, Ref: "refAbsolute"},
			{Const: "KilopascalAbsolute", Value: "1e3", Doc: "is 10³ Pa above absolute vacuum.", Accessor: "Kilopascals", Symbol: "kPa(a)", Aliases: []string{"kPaa", "kPa abs"}, Ref: "refAbsolute"},
			{Const: "MegapascalAbsolute", Value: "1e6", Doc: "is 10⁶ Pa above absolute vacuum.", Accessor: "Megapascals", Symbol: "MPa(a)", Aliases: []string{"MPa abs"}, Ref: "refAbsolute"},
			{Const: "BarAbsolute", Value: "barPa", Doc: "is 10⁵ Pa above absolute vacuum.", Accessor: "Bar", Symbol: "bara", Aliases: []string{"bar(a)", "bar a", "bar abs"}, Ref: "refAbsolute"},
			{Const: "PSIAbsolute", Value: "psiPa", Doc: "is one psi above absolute vacuum.", Accessor: "PSI", Symbol: "psia", Aliases: []string{"psi(a)", "psi abs"}, Ref: "refAbsolute"},
			{Const: "StandardAtmosphere", Value: "atmPa", Doc: "is the standard atmosphere, 101 325 Pa exactly (NIST SP 811), the usual ambient when no site value is known. It must still be passed explicitly.", Accessor: "Atmospheres", Symbol: "atm", Ref: "refAbsolute"},
			{Const: "MillimetreOfMercury", Value: "mmHgPa", Doc: "is the conventional millimetre of mercury, 13 595.1 kg/m³·g₀·1 mm = 133.322 387 415 Pa exactly (NIST SP 811, \"conventional\"), read as a barometric (absolute) pressure.", Accessor: "MillimetresOfMercury", Symbol: "mmHg", Aliases: []string{"mm Hg"}, Ref: "refAbsolute"},
			{Const: "Torr", Value: "torrPa", Doc: "is 1/760 of the standard atmosphere, 101 325/760 Pa ≈ 133.322 368 Pa (NIST SP 811), absolute as in vacuum work.", Accessor: "Torr", Symbol: "Torr", Aliases: []string{"torr"}, Ref: "refAbsolute"},
		}},
	{Name: "Flow", Kind: "volume flow", Dim: "dim(3, 0, -1, 0, 0)", Base: "CubicMetrePerSecond", Metric: "L/min", US: "gpm",
		Doc: "Flow is a volume flow rate in cubic metres per second (m³/s): pump delivery, cylinder and line flows.",
		Units: []unit{
			{Const: "CubicMetrePerSecond", Value: "1", Doc: "is the SI unit of volume flow.", Accessor: "CubicMetresPerSecond", Symbol: "m³/s", Aliases: []string{"m3/s", "m^3/s"}},
			{Const: "LitrePerMinute", Value: "1e-3 / minuteS", Doc: "is one litre per minute.", Accessor: "LitresPerMinute", Symbol: "L/min", Aliases: []string{"l/min", "lpm", "LPM", "litres/min", "liters/min", "litre/min", "liter/min", "litres per minute", "liters per minute", "litre per minute", "liter per minute"}},
			{Const: "LitrePerSecond", Value: "1e-3", Doc: "is one litre per second.", Accessor: "LitresPerSecond", Symbol: "L/s", Aliases: []string{"l/s"}},
			{Const: "CubicMetrePerHour", Value: "1.0 / hourS", Doc: "is one cubic metre per hour.", Accessor: "CubicMetresPerHour", Symbol: "m³/h", Aliases: []string{"m3/h", "m^3/h"}},
			{Const: "USGallonPerMinute", Value: "usGallonM3 / minuteS", Doc: "is one US gallon per minute.", Accessor: "USGallonsPerMinute", Symbol: "gpm", Aliases: []string{"GPM", "US gpm", "gal/min", "gallons per minute", "gallon per minute"}},
			{Value: "usGallonM3 / hourS", Symbol: "gph", Aliases: []string{"gal/h", "gal/hr", "gallons per hour", "gallon per hour"}},
			{Const: "CubicInchPerSecond", Value: "inchM * inchM * inchM", Doc: "is one cubic inch per second.", Accessor: "CubicInchesPerSecond", Symbol: "in³/s", Aliases: []string{"in3/s", "in^3/s"}},
		}},
	{Name: "Velocity", Kind: "velocity", Dim: "dim(1, 0, -1, 0, 0)", Base: "MetrePerSecond", Metric: "m/s", US: "ft/s",
		Doc: "Velocity is a speed in metres per second (m/s): piston speeds and fluid velocities in lines.",
		// The US trade writes a cylinder's speed in in/s and a line's in ft/s.
		Purposes: []purpose{
			{Name: "PistonSpeed", What: "the speed of a cylinder's piston and rod", US: "in/s"},
			{Name: "LineVelocity", What: "the mean velocity of the oil in a line", US: "ft/s"},
		},
		Units: []unit{
			{Const: "MetrePerSecond", Value: "1", Doc: "is the SI unit of velocity.", Accessor: "MetresPerSecond", Symbol: "m/s"},
			{Const: "MillimetrePerSecond", Value: "1e-3", Doc: "is one millimetre per second.", Accessor: "MillimetresPerSecond", Symbol: "mm/s"},
			{Const: "FootPerSecond", Value: "footM", Doc: "is 0.3048 m/s exactly.", Accessor: "FeetPerSecond", Symbol: "ft/s", Aliases: []string{"fps"}},
			{Const: "InchPerSecond", Value: "inchM", Doc: "is 0.0254 m/s exactly.", Accessor: "InchesPerSecond", Symbol: "in/s", Aliases: []string{"ips"}},
			{Const: "FootPerMinute", Value: "footM / minuteS", Doc: "is 0.00508 m/s exactly.", Accessor: "FeetPerMinute", Symbol: "ft/min", Aliases: []string{"fpm"}},
		}},
	{Name: "Displacement", Kind: "displacement", Dim: "dim(3, 0, 0, 0, -1)", Base: "CubicMetrePerRevolution", Metric: "cm³/rev", US: "in³/rev",
		Doc: `Displacement is the volume a pump or motor moves per revolution, in cubic
// metres per revolution (m³/rev). Revolutions, not radians, so that
// flow = displacement × speed holds without 2π.`,
		Units: []unit{
			{Const: "CubicMetrePerRevolution", Value: "1", Doc: "is the coherent unit of displacement.", Accessor: "CubicMetresPerRevolution", Symbol: "m³/rev", Aliases: []string{"m3/rev", "m^3/rev"}},
			{Const: "CubicCentimetrePerRevolution", Value: "1e-6", Doc: "is one cm³ (cc) per revolution.", Accessor: "CubicCentimetresPerRevolution", Symbol: "cm³/rev", Aliases: []string{"cm3/rev", "cm^3/rev", "cc/rev", "ccm/rev", "mL/rev", "ml/rev"}},
			{Const: "CubicInchPerRevolution", Value: "inchM * inchM * inchM", Doc: "is one cubic inch per revolution, 16.387064 cm³/rev exactly.", Accessor: "CubicInchesPerRevolution", Symbol: "in³/rev", Aliases: []string{"in3/rev", "in^3/rev", "cir", "cu in/rev"}},
		}},
	{Name: "RotationalSpeed", Kind: "rotational speed", Dim: "dim(0, 0, -1, 0, 1)", Base: "RevolutionPerSecond", Metric: "rpm", US: "rpm",
		Doc: "RotationalSpeed is a shaft speed in revolutions per second (rev/s).",
		Units: []unit{
			{Const: "RevolutionPerSecond", Value: "1", Doc: "is the coherent unit of rotational speed.", Accessor: "RevolutionsPerSecond", Symbol: "rev/s", Aliases: []string{"rps", "r/s"}},
			{Const: "RevolutionPerMinute", Value: "1.0 / minuteS", Doc: "is one revolution per minute.", Accessor: "RPM", Symbol: "rpm", Aliases: []string{"rev/min", "r/min", "RPM", "min⁻¹", "min^-1", "min-1", "1/min", "U/min"}},
			{Const: "RadianPerSecond", Value: "1 / revRad", Doc: "is 1/(2π) rev/s; not exact in binary floating point.", Accessor: "RadiansPerSecond", Symbol: "rad/s"},
		}},
	{Name: "Torque", Kind: "torque", Dim: "dim(2, 1, -2, 0, 0)", Base: "NewtonMetre", Metric: "N·m", US: "lbf·ft",
		Doc: "Torque is a moment in newton metres (N·m): pump shaft, motor and slew torques.",
		Units: []unit{
			{Const: "NewtonMetre", Value: "1", Doc: "is the SI unit of torque.", Accessor: "NewtonMetres", Symbol: "N·m", Aliases: []string{"Nm", "N*m", "N.m", "N m", "N-m", "N⋅m"}},
			{Const: "KilonewtonMetre", Value: "1e3", Doc: "is 10³ N·m.", Accessor: "KilonewtonMetres", Symbol: "kN·m", Aliases: []string{"kNm", "kN*m", "kN.m", "kN m"}},
			{Const: "PoundForceFoot", Value: "lbfN * footM", Doc: "is one lbf acting at one foot, ≈ 1.3558 N·m (exact product).", Accessor: "PoundForceFeet", Symbol: "lbf·ft", Aliases: []string{"lbf*ft", "lbf-ft", "lbf ft", "ft·lbf", "ft-lbf", "ft-lb", "lb-ft", "lbft", "ft·lb", "ft.lb", "ft*lb", "ft lb", "lb·ft", "lb.ft", "lb*ft", "lb ft"}},
			{Const: "PoundForceInch", Value: "lbfN * inchM", Doc: "is one lbf acting at one inch, ≈ 0.11298 N·m (exact product).", Accessor: "PoundForceInches", Symbol: "lbf·in", Aliases: []string{"lbf*in", "lbf-in", "lbf in", "in·lbf", "in-lbf", "in-lb", "lb-in", "lbin", "in·lb", "in.lb", "in*lb", "in lb", "lb·in", "lb.in", "lb*in", "lb in"}},
		}},
	{Name: "Power", Kind: "power", Dim: "dim(2, 1, -3, 0, 0)", Base: "Watt", Metric: "kW", US: "hp",
		Doc: "Power is a power in watts (W): hydraulic, shaft and electrical power, and heat flows.",
		Units: []unit{
			{Const: "Watt", Value: "1", Doc: "is the SI unit of power.", Accessor: "Watts", Symbol: "W"},
			{Const: "Kilowatt", Value: "1e3", Doc: "is 10³ W.", Accessor: "Kilowatts", Symbol: "kW"},
			{Const: "Horsepower", Value: "hpW", Doc: "is the mechanical (imperial) horsepower, 550 ft·lbf/s ≈ 745.69987 W (NIST SP 811).", Accessor: "Horsepower", Symbol: "hp", Aliases: []string{"HP"}},
			{Const: "MetricHorsepower", Value: "metricHpW", Doc: "is 75 kgf·m/s = 735.49875 W exactly (NIST SP 811).", Accessor: "MetricHorsepower", Symbol: "PS", Aliases: []string{"CV", "hp(M)"}},
			{Const: "BTUPerHour", Value: "btuJ / hourS", Doc: "is one International Table BTU per hour, ≈ 0.29307 W.", Accessor: "BTUPerHour", Symbol: "BTU/h", Aliases: []string{"Btu/h", "BTU/hr", "Btu/hr", "BTUH"}},
		}},
	{Name: "Energy", Kind: "energy", Dim: "dim(2, 1, -2, 0, 0)", Base: "Joule", Metric: "kJ", US: "BTU",
		Doc: "Energy is an energy or quantity of heat in joules (J): stored accumulator energy, heat per cycle.",
		Units: []unit{
			{Const: "Joule", Value: "1", Doc: "is the SI unit of energy.", Accessor: "Joules", Symbol: "J"},
			{Const: "Kilojoule", Value: "1e3", Doc: "is 10³ J.", Accessor: "Kilojoules", Symbol: "kJ"},
			{Const: "Megajoule", Value: "1e6", Doc: "is 10⁶ J.", Accessor: "Megajoules", Symbol: "MJ"},
			{Const: "KilowattHour", Value: "1e3 * hourS", Doc: "is 3.6 MJ exactly.", Accessor: "KilowattHours", Symbol: "kWh", Aliases: []string{"kW·h", "kW*h", "kW h"}},
			{Const: "BTU", Value: "btuJ", Doc: "is the International Table British thermal unit, 1055.05585262 J exactly (NIST SP 811).", Accessor: "BTU", Symbol: "BTU", Aliases: []string{"Btu", "btu"}},
		}},
	{Name: "Temperature", Kind: "temperature", Dim: "dim(0, 0, 0, 1, 0)", Base: "Kelvin", Metric: "°C", US: "°F",
		Accept: "refPoint", Offset: true, Min: "0", MinText: "≥ 0 K (absolute zero)",
		Doc: `Temperature is a thermodynamic (absolute) temperature in kelvins (K).
// Celsius and Fahrenheit are offset scales, so they are functions
// (TemperatureFromCelsius, t.Celsius) rather than constants. The difference of
// two temperatures is a TemperatureDifference: use t.Sub and t.Add.`,
		Units: []unit{
			{Const: "Kelvin", Value: "1", Doc: "is the SI unit of thermodynamic temperature.", Accessor: "Kelvin", Symbol: "K", Aliases: []string{"kelvin"}, Ref: "refPoint"},
			{Const: "Rankine", Value: "fahrenheitK", Doc: "is 5/9 K exactly; 0 °R is absolute zero.", Accessor: "Rankine", Symbol: "°R", Aliases: []string{"degR", "R"}, Ref: "refPoint"},
			{Value: "1", Symbol: "°C", Aliases: []string{"degC", "℃", "C", "deg C", "celsius", "ºC", "° C", "º C"}, Offset: "celsiusZeroK", Ref: "refPoint"},
			{Value: "fahrenheitK", Symbol: "°F", Aliases: []string{"degF", "℉", "F", "deg F", "fahrenheit", "ºF", "° F", "º F"}, Offset: "fahrenheitZeroK", Ref: "refPoint"},
		}},
	{Name: "TemperatureDifference", Kind: "temperature difference", Dim: "dim(0, 0, 0, 1, 0)", Base: "DeltaKelvin", Metric: "K", US: "°F",
		Accept: "refNone | refPoint",
		Doc: `TemperatureDifference is a temperature interval in kelvins (K): a rise
// through a relief valve, a cooler's approach. One kelvin and one degree
// Celsius are the same interval; one degree Fahrenheit is 5/9 K. Temperature
// spellings (K, °C, °F) parse as intervals here; Δ spellings (ΔK, Δ°C, Δ°F)
// say so explicitly.`,
		Units: []unit{
			{Const: "DeltaKelvin", Value: "1", Doc: "is an interval of one kelvin.", Accessor: "Kelvin", Symbol: "K", NoReg: true},
			{Const: "DeltaCelsius", Value: "1", Doc: "is an interval of one degree Celsius, equal to one kelvin.", Accessor: "Celsius", Symbol: "°C", NoReg: true},
			{Const: "DeltaFahrenheit", Value: "fahrenheitK", Doc: "is an interval of one degree Fahrenheit, 5/9 K exactly.", Accessor: "Fahrenheit", Symbol: "°F", NoReg: true},
			{Value: "1", Symbol: "ΔK", Aliases: []string{"delta K", "deltaK"}},
			{Value: "1", Symbol: "Δ°C", Aliases: []string{"delta degC", "deltaC", "ΔC", "delta C"}},
			{Value: "fahrenheitK", Symbol: "Δ°F", Aliases: []string{"delta degF", "deltaF", "ΔF", "delta F"}},
		}},
	{Name: "KinematicViscosity", Kind: "kinematic viscosity", Dim: "dim(2, 0, -1, 0, 0)", Base: "SquareMetrePerSecond", Metric: "mm²/s", US: "cSt",
		Doc: "KinematicViscosity is a kinematic viscosity in square metres per second (m²/s); oils are quoted in mm²/s (cSt).",
		Units: []unit{
			{Const: "SquareMetrePerSecond", Value: "1", Doc: "is the SI unit of kinematic viscosity.", Accessor: "SquareMetresPerSecond", Symbol: "m²/s", Aliases: []string{"m2/s", "m^2/s"}},
			{Const: "SquareMillimetrePerSecond", Value: "1e-6", Doc: "is 10⁻⁶ m²/s, the unit of ISO 3448 grades.", Accessor: "SquareMillimetresPerSecond", Symbol: "mm²/s", Aliases: []string{"mm2/s", "mm^2/s"}},
			{Const: "Centistokes", Value: "1e-6", Doc: "is one centistokes, 1 mm²/s exactly.", Accessor: "Centistokes", Symbol: "cSt", Aliases: []string{"cst", "CST"}},
			{Const: "Stokes", Value: "1e-4", Doc: "is one stokes, 1 cm²/s exactly.", Accessor: "Stokes", Symbol: "St"},
		},
		// Saybolt Universal Seconds are not a factor of a unit: the typed
		// parser reads them through ASTM D2161 at 100 °F.
		Context: []context{
			{Spelling: "SUS", Read: "readSaybolt"},
			{Spelling: "SSU", Read: "readSaybolt"},
			{Spelling: "SUS at 100 °F", Read: "readSaybolt"},
			{Spelling: "SSU at 100 °F", Read: "readSaybolt"},
		}},
	{Name: "DynamicViscosity", Kind: "dynamic viscosity", Dim: "dim(-1, 1, -1, 0, 0)", Base: "PascalSecond", Metric: "mPa·s", US: "cP",
		Doc: "DynamicViscosity is an absolute (dynamic) viscosity in pascal seconds (Pa·s).",
		Units: []unit{
			{Const: "PascalSecond", Value: "1", Doc: "is the SI unit of dynamic viscosity.", Accessor: "PascalSeconds", Symbol: "Pa·s", Aliases: []string{"Pa*s", "Pa.s", "Pa s", "Pas"}},
			{Const: "MillipascalSecond", Value: "1e-3", Doc: "is 10⁻³ Pa·s.", Accessor: "MillipascalSeconds", Symbol: "mPa·s", Aliases: []string{"mPa*s", "mPa.s", "mPa s", "mPas"}},
			{Const: "Centipoise", Value: "1e-3", Doc: "is one centipoise, 1 mPa·s exactly.", Accessor: "Centipoise", Symbol: "cP", Aliases: []string{"cp", "cps"}},
			{Const: "Poise", Value: "1e-1", Doc: "is one poise, 0.1 Pa·s exactly.", Accessor: "Poise", Symbol: "P"},
		}},
	{Name: "Density", Kind: "density", Dim: "dim(-3, 1, 0, 0, 0)", Base: "KilogramPerCubicMetre", Metric: "kg/m³", US: "lbm/ft³",
		Doc: "Density is a mass density in kilograms per cubic metre (kg/m³).",
		Units: []unit{
			{Const: "KilogramPerCubicMetre", Value: "1", Doc: "is the SI unit of density.", Accessor: "KilogramsPerCubicMetre", Symbol: "kg/m³", Aliases: []string{"kg/m3", "kg/m^3"}},
			{Const: "GramPerCubicCentimetre", Value: "1e3", Doc: "is one g/cm³ (g/mL), 1000 kg/m³.", Accessor: "GramsPerCubicCentimetre", Symbol: "g/cm³", Aliases: []string{"g/cm3", "g/cc", "g/mL", "g/ml"}},
			{Const: "KilogramPerLitre", Value: "1e3", Doc: "is one kg/L, 1000 kg/m³.", Accessor: "KilogramsPerLitre", Symbol: "kg/L", Aliases: []string{"kg/l"}},
			{Const: "PoundPerCubicFoot", Value: "lbmKg / (footM * footM * footM)", Doc: "is one lbm/ft³, ≈ 16.0185 kg/m³ (exact ratio).", Accessor: "PoundsPerCubicFoot", Symbol: "lbm/ft³", Aliases: []string{"lbm/ft3", "lb/ft³", "lb/ft3", "pcf"}},
			{Const: "PoundPerUSGallon", Value: "lbmKg / usGallonM3", Doc: "is one lbm per US gallon, ≈ 119.826 kg/m³ (exact ratio).", Accessor: "PoundsPerUSGallon", Symbol: "lbm/gal", Aliases: []string{"lb/gal", "ppg"}},
		}},
	{Name: "SpecificHeatCapacity", Kind: "specific heat capacity", Dim: "dim(2, 0, -2, -1, 0)", Base: "JoulePerKilogramKelvin", Metric: "kJ/(kg·K)", US: "BTU/(lbm·°F)",
		Doc: "SpecificHeatCapacity is a specific heat capacity in joules per kilogram kelvin (J/(kg·K)).",
		Units: []unit{
			{Const: "JoulePerKilogramKelvin", Value: "1", Doc: "is the SI unit of specific heat capacity.", Accessor: "JoulesPerKilogramKelvin", Symbol: "J/(kg·K)", Aliases: []string{"J/kg/K", "J/(kg*K)", "J/kgK"}},
			{Const: "KilojoulePerKilogramKelvin", Value: "1e3", Doc: "is 10³ J/(kg·K).", Accessor: "KilojoulesPerKilogramKelvin", Symbol: "kJ/(kg·K)", Aliases: []string{"kJ/kg/K", "kJ/(kg*K)", "kJ/kgK"}},
			{Const: "BTUPerPoundFahrenheit", Value: "btuJ / (lbmKg * fahrenheitK)", Doc: "is one BTU_IT/(lbm·°F), 4186.8 J/(kg·K) exactly (NIST SP 811).", Accessor: "BTUPerPoundFahrenheit", Symbol: "BTU/(lbm·°F)", Aliases: []string{"BTU/(lbm*°F)", "BTU/lbm/°F", "Btu/(lb·°F)", "Btu/lb/F", "BTU/lb/F"}},
		}},
	{Name: "HeatTransferCoefficient", Kind: "heat transfer coefficient", Dim: "dim(0, 1, -3, -1, 0)", Base: "WattPerSquareMetreKelvin", Metric: "W/(m²·K)", US: "BTU/(h·ft²·°F)",
		Doc: "HeatTransferCoefficient is a surface heat transfer coefficient in watts per square metre kelvin (W/(m²·K)): reservoir walls, coolers.",
		Units: []unit{
			{Const: "WattPerSquareMetreKelvin", Value: "1", Doc: "is the SI unit of heat transfer coefficient.", Accessor: "WattsPerSquareMetreKelvin", Symbol: "W/(m²·K)", Aliases: []string{"W/m²/K", "W/(m2*K)", "W/m2/K", "W/m2K", "W/(m^2*K)"}},
			{Const: "BTUPerHourSquareFootFahrenheit", Value: "btuJ / (hourS * footM * footM * fahrenheitK)", Doc: "is one BTU_IT/(h·ft²·°F), ≈ 5.6783 W/(m²·K) (exact ratio).", Accessor: "BTUPerHourSquareFootFahrenheit", Symbol: "BTU/(h·ft²·°F)", Aliases: []string{"BTU/(h*ft2*F)", "Btu/(h·ft²·°F)", "BTU/h/ft2/F"}},
		}},
	{Name: "ThermalConductivity", Kind: "thermal conductivity", Dim: "dim(1, 1, -3, -1, 0)", Base: "WattPerMetreKelvin", Metric: "W/(m·K)", US: "BTU/(h·ft·°F)",
		Doc: "ThermalConductivity is a thermal conductivity in watts per metre kelvin (W/(m·K)).",
		Units: []unit{
			{Const: "WattPerMetreKelvin", Value: "1", Doc: "is the SI unit of thermal conductivity.", Accessor: "WattsPerMetreKelvin", Symbol: "W/(m·K)", Aliases: []string{"W/m/K", "W/(m*K)", "W/mK"}},
			{Const: "BTUPerHourFootFahrenheit", Value: "btuJ / (hourS * footM * fahrenheitK)", Doc: "is one BTU_IT/(h·ft·°F), ≈ 1.7307 W/(m·K) (exact ratio).", Accessor: "BTUPerHourFootFahrenheit", Symbol: "BTU/(h·ft·°F)", Aliases: []string{"BTU/(h*ft*F)", "Btu/(h·ft·°F)", "BTU/h/ft/F"}},
		}},
	{Name: "Stiffness", Kind: "stiffness", Dim: "dim(0, 1, -2, 0, 0)", Base: "NewtonPerMetre", Metric: "kN/mm", US: "lbf/in",
		Doc: "Stiffness is a spring rate in newtons per metre (N/m): the hydraulic stiffness of a cylinder's oil columns.",
		Units: []unit{
			{Const: "NewtonPerMetre", Value: "1", Doc: "is the SI unit of stiffness.", Accessor: "NewtonsPerMetre", Symbol: "N/m"},
			{Const: "NewtonPerMillimetre", Value: "1e3", Doc: "is one N/mm, 10³ N/m.", Accessor: "NewtonsPerMillimetre", Symbol: "N/mm"},
			{Const: "KilonewtonPerMillimetre", Value: "1e6", Doc: "is one kN/mm, 10⁶ N/m.", Accessor: "KilonewtonsPerMillimetre", Symbol: "kN/mm"},
			{Const: "PoundForcePerInch", Value: "lbfN / inchM", Doc: "is one lbf/in, ≈ 175.127 N/m (exact ratio).", Accessor: "PoundsForcePerInch", Symbol: "lbf/in", Aliases: []string{"lb/in"}},
		}},
	{Name: "Frequency", Kind: "frequency", Dim: "dim(0, 0, -1, 0, 0)", Base: "Hertz", Metric: "Hz", US: "Hz",
		Doc: "Frequency is a frequency in hertz (Hz, 1/s): natural frequencies, supply frequency, cycle rates.",
		Units: []unit{
			{Const: "Hertz", Value: "1", Doc: "is the SI unit of frequency.", Accessor: "Hertz", Symbol: "Hz", Aliases: []string{"1/s", "s⁻¹", "s^-1"}},
			{Const: "CyclePerMinute", Value: "1.0 / minuteS", Doc: "is one cycle per minute.", Accessor: "CyclesPerMinute", Symbol: "cpm", Aliases: []string{"cycles/min"}},
		}},
	{Name: "Acceleration", Kind: "acceleration", Dim: "dim(1, 0, -2, 0, 0)", Base: "MetrePerSecondSquared", Metric: "m/s²", US: "ft/s²",
		Doc: "Acceleration is an acceleration in metres per second squared (m/s²).",
		Units: []unit{
			{Const: "MetrePerSecondSquared", Value: "1", Doc: "is the SI unit of acceleration.", Accessor: "MetresPerSecondSquared", Symbol: "m/s²", Aliases: []string{"m/s2", "m/s^2"}},
			{Const: "StandardGravity", Value: "gravity", Doc: "is g₀ = 9.80665 m/s² exactly (CGPM 1901).", Accessor: "StandardGravities", Symbol: "g₀", Aliases: []string{"gn"}},
			{Const: "FootPerSecondSquared", Value: "footM", Doc: "is 0.3048 m/s² exactly.", Accessor: "FeetPerSecondSquared", Symbol: "ft/s²", Aliases: []string{"ft/s2", "ft/s^2"}},
		}},
	{Name: "time", NoType: true, Kind: "time", Dim: "dim(0, 0, 1, 0, 0)",
		Units: []unit{
			{Value: "1", Symbol: "s", Aliases: []string{"sec"}},
			{Value: "1e-3", Symbol: "ms"},
			{Value: "minuteS", Symbol: "min"},
			{Value: "hourS", Symbol: "h", Aliases: []string{"hr"}},
		}},
	{Name: "angle", NoType: true, Kind: "angle", Dim: "dim(0, 0, 0, 0, 1)",
		Units: []unit{
			{Value: "1", Symbol: "rev", Aliases: []string{"r", "revolution"}},
			{Value: "1 / revRad", Symbol: "rad"},
		}},
}

func main() {
	seen := map[string]string{}
	fitting := map[string]bool{} // "Type spelling" for each spelling of a unit that fits Type
	idx := 0
	for i := range quantities {
		q := &quantities[i]
		for _, u := range q.Units {
			if !q.NoType && u.Symbol == q.Metric {
				q.MetricIdx = idx
			}
			for k := range q.Context {
				if c := &q.Context[k]; c.Unit == u.Symbol {
					c.UnitIdx = idx
				}
			}
			for k := range q.Purposes {
				if p := &q.Purposes[k]; p.US == u.Symbol {
					p.USIdx = idx
				}
			}
			if !q.NoType && u.Symbol == q.US {
				q.USIdx = idx
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
				for _, t := range quantities {
					if !t.NoType && t.Dim == q.Dim && strings.Contains(accept(t.Accept), ref(u.Ref)) {
						fitting[t.Name+" "+sp] = true
					}
				}
			}
		}
	}
	for _, q := range quantities {
		for _, c := range q.Context {
			if fitting[q.Name+" "+c.Spelling] {
				fail(fmt.Errorf("%s: context spelling %q is a registered spelling of a %s unit", q.Name, c.Spelling, q.Name))
			}
			kinds := 0
			for _, k := range []string{c.Unit, c.Read, c.Err} {
				if k != "" {
					kinds++
				}
			}
			if kinds != 1 || (c.Unit != "" && c.UnitIdx == 0) {
				fail(fmt.Errorf("%s: context spelling %q wants one of a unit of %s, a Read function or an error", q.Name, c.Spelling, q.Name))
			}
		}
	}
	for _, o := range outputs {
		write(o.file, o.tmpl)
	}
	writeDoc()
}

// write executes t over the quantities table and writes the formatted
// result to file (or, when it does not format, file.broken for a look).
func write(file string, t *template.Template) {
	var buf bytes.Buffer
	if err := t.Execute(&buf, quantities); err != nil {
		fail(err)
	}
	out, err := format.Source(buf.Bytes())
	if err != nil {
		os.WriteFile(file+".broken", buf.Bytes(), 0o644)
		fail(fmt.Errorf("%s: %w", file, err))
	}
	if err := os.WriteFile(file, out, 0o644); err != nil {
		fail(err)
	}
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
	b.WriteString("// writes. An exact spelling always wins; letter case is ignored only as a\n")
	b.WriteString("// fallback (see Parsing). Inside expressions, these names combine with *,\n")
	b.WriteString("// ·, /, ^ and parentheses.\n//\n")
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
		if line := contextDoc(q); line != "" {
			b.WriteString("//     " + line + "\n")
		}
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

# Overflow

The helpers that return no error — the products (Pressure.TimesArea,
Displacement.TimesSpeed, …), CircleArea, In and the accessors, the
temperature and gauge/absolute crossings — follow float64 semantics, as the
arithmetic operators do: for absurd inputs (a product beyond about 1e308, an
In of a value near the float64 limit in a small unit) the result may be ±Inf,
and a NaN input gives NaN. Every function of this package that returns an
error checks its own result as well as its inputs, and never returns NaN or
±Inf beside a nil error; on error it returns the zero value.

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
spellings Pa, kPa, MPa and mbar are read as either. A differential spelling
(psid, bard, kPa(d)) reads as a Pressure, the difference between two
pressures. A mercury column is a barometric reading, so inHg, mmHg and Torr
are absolute; a vacuum gauge reading says so ("28 inHg vac", "60 kPa vac",
"0.8 bar vac") and reads as a negative gauge Pressure. A vacuum reading must
not itself be negative, and stands alone (not inside a longer expression).
Parsing an absolute spelling into a Pressure, or a gauge or differential
spelling into an AbsolutePressure, fails with ErrReference; so does a unit
expression that mixes gauge and absolute spellings. Nothing guesses a
reference or a sign.

Temperature is absolute (kelvins); °C and °F are offset scales, reached through
TemperatureFromCelsius, TemperatureFromFahrenheit, Temperature.Celsius and
Temperature.Fahrenheit. Temperature.Sub gives a TemperatureDifference and
Temperature.Add takes one.

# Parsing

The typed parsers (ParsePressure, ParseFlow, …) and Parse read a number,
optional spaces, then a unit:

	number   = [ "+" | "-" ] ( decimal | fraction | mixed )
	decimal  = ( digits [ "." digits ] | "." digits ) [ ( "e" | "E" ) [ "+" | "-" ] digits ]
	fraction = digits "/" digits
	mixed    = digits ( "-" | " " ) digits "/" digits

No hexadecimal, underscores, NaN or Inf. A fraction is of whole numbers of at
most seven digits, with a denominator other than 0, and in a mixed number it
is less than one: "3/8 in", "1-1/2 in", "1 1/2 in", "1/2 gpm". (A unit that
starts with a digit still reads as a unit: "9 1/min" is 9 rpm.)

A comma in a number is refused with ErrAmbiguous, and the error says why:
"3,000" is three thousand where a comma groups thousands (as in the US) and
three where it is the decimal mark (as in much of Europe). A Parser reads the
one convention its caller names: Parser{Decimal: ','} reads "2,5 bar" and
Parser{Group: ','} reads "3,000 psi", each with the grammar otherwise
unchanged. In JSON a quantity is a string with its unit ("210 bar"); a bare
number is refused with ErrSyntax and the text to write.

Leading and trailing spaces are ignored. The unit is any registered spelling of the type
(listed below) or a unit expression of registered names with the right
dimension:

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

ParseLength also reads feet and inches together, as US drawings write them:

	length = number foot [ " " ] number inch

where foot is a spelling of ft (ft, foot, feet, ' or ′) and inch one of in
(in, inch, inches, " or ″), as in 2 ft 6 in, 2' 6" and 5' 3-1/2". The value
is (12·feet + inches) inches, so 2 ft 6 in is exactly 30 in; a sign before
the feet applies to the whole. The inch and foot marks are spellings of in
and ft anywhere (1.5", 6').

Letter case. A unit, or a name inside an expression, is first looked up
exactly, and an exact spelling keeps its meaning ("mPa·s" is millipascal
seconds, "MPa" megapascals). A spelling that matches nothing exactly is looked
up again ignoring letter case, and accepted when every registered spelling it
then matches belongs to one unit: "PSI", "Bar", "BAR", "KW", "kw", "Hp", "LPM",
"°c", "Celsius". Where it could be more than one unit it is an ErrAmbiguous
error that lists them. The m of milli and the M of mega differ only in case,
so "Mpa" could be MPa or mPa, "MM" mm or Mm, and "MBAR" mbar or Mbar: each is
refused, never read as a guess.

A typed parser also reads a few spellings that mean something only for its
type, and refuses others with what to write instead (listed under Spellings):
ParseForce reads "lb" and "lbs" as pound-force, the US load convention, and
refuses "kg" (write kgf) and a plain "ton" or "t" (a tonne-force and a short
ton-force differ by 10 %); ParsePressure refuses a plain mercury column; and
ParseKinematicViscosity reads Saybolt Universal Seconds ("150 SUS", "150 SSU")
through the ASTM D2161 equation at 100 °F, from 31.95 SUS (1.81 mm²/s) up.
SUS are not a factor of a unit, so Parse and Convert do not read them.

Errors are *ParseError values that quote the input and the byte offset and
unwrap to ErrSyntax, ErrUnknownUnit (with the nearest known spellings),
ErrDimension, ErrRange, ErrReference or ErrAmbiguous (with what the text
could mean). Parsing a registered unit allocates nothing.

# Formatting

String writes the metric trade unit (bar, L/min, kN, mm, cm³/rev, kW, °C,
mm²/s) with four significant digits; Append does the same into a caller's
buffer without allocating; Format supports %v, %s, %#v, and %e/%f/%g with
width and precision. A System chooses the unit of each type for reports:
Metric and USCustomary return the trade systems, and a caller adjusts its own
copy with the System's With methods (no caller can change the systems that
another gets). Where the trade writes one type in two units by purpose, a
System names a unit per purpose: USCustomary writes a piston speed in in/s
(FormatPistonSpeed) and a line velocity in ft/s (FormatLineVelocity). MarshalText writes text that UnmarshalText reads back to the
identical float64, so quantities travel through JSON, YAML and flags; it
refuses, with ErrRange, every value that UnmarshalText would refuse (NaN, ±Inf,
a temperature below absolute zero, an absolute pressure below vacuum), so
json.Marshal never writes a document that cannot be read back.

# Errors

Every error matches one of the sentinels ErrSyntax, ErrUnknownUnit,
ErrDimension, ErrRange, ErrReference and ErrAmbiguous with errors.Is. A *ParseError
quotes the text; a *ConversionError names both sides of a failed conversion;
a *RangeError names a parameter, the value and the valid range, and is the one
type every hydrosize package returns for a bad argument (errors.As finds it).
The function an error names is always qualified by its package, as a caller
writes it: "units.ParsePressure", "units.Pressure.UnmarshalText",
"units.Quantity.In", "fluid.CurveThrough". The Error methods never panic,
whatever a caller put in the fields.
`

// contextDoc lists the spellings that only q's parser reads, for the
// package documentation.
func contextDoc(q quantity) string {
	var reads, refuses []string
	for _, c := range q.Context {
		switch {
		case c.Unit != "":
			reads = append(reads, c.Spelling+" as "+c.Unit)
		case c.Read != "":
			reads = append(reads, c.Spelling+" (ASTM D2161, at 100 °F)")
		default:
			refuses = append(refuses, c.Spelling)
		}
	}
	var parts []string
	if len(reads) > 0 {
		parts = append(parts, "reads "+strings.Join(reads, ", "))
	}
	if len(refuses) > 0 {
		parts = append(parts, "refuses "+strings.Join(refuses, ", ")+", saying what to write")
	}
	if len(parts) == 0 {
		return ""
	}
	return "(Parse" + q.Name + " " + strings.Join(parts, "; ") + ".)"
}

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

func ref(r string) string {
	if r == "" {
		return "refNone"
	}
	return r
}

func accept(a string) string {
	if a == "" {
		return "refNone"
	}
	return a
}

var funcs = template.FuncMap{
	"ref":    ref,
	"accept": accept,
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

// The generated files, each from its own template over the quantities table.
var outputs = []struct {
	file string
	tmpl *template.Template
}{
	{"quantities_gen.go", parse("quantities", quantitiesTmpl)},
	{"tables_gen.go", parse("tables", tablesTmpl)},
	{"systems_gen.go", parse("systems", systemsTmpl)},
}

func parse(name, text string) *template.Template {
	return template.Must(template.New(name).Funcs(funcs).Parse(text))
}

// quantitiesTmpl writes each type, its unit constants and its methods.
const quantitiesTmpl = `// Code generated by gen.go; DO NOT EDIT.

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
// the coherent SI unit otherwise, so UnmarshalText restores q bit for bit. It
// refuses, with a *RangeError, what UnmarshalText would refuse: NaN, ±Inf{{if $q.Min}},
// and a value below {{$q.MinText}}{{end}}.
func (q {{$q.Name}}) MarshalText() ([]byte, error) {
	return marshalText(float64(q), &unitTable[metric{{$q.Name}}], &type{{$q.Name}})
}

// UnmarshalText implements encoding.TextUnmarshaler. It accepts any text
// that Parse{{$q.Name}} accepts.
func (q *{{$q.Name}}) UnmarshalText(text []byte) error {
	v, err := parseTyped("units.{{$q.Name}}.UnmarshalText", string(text), &type{{$q.Name}})
	if err != nil {
		return err
	}
	*q = {{$q.Name}}(v)
	return nil
}

// UnmarshalJSON implements json.Unmarshaler: a JSON string is read as
// UnmarshalText reads it, and null leaves q as it was. A bare JSON number
// is refused with ErrSyntax: without a unit it could be in any unit, so
// the error shows it written with one ("55 {{$q.Metric}}").
func (q *{{$q.Name}}) UnmarshalJSON(data []byte) error {
	v, set, err := unmarshalJSON("units.{{$q.Name}}.UnmarshalJSON", data, &unitTable[metric{{$q.Name}}], &type{{$q.Name}})
	if set {
		*q = {{$q.Name}}(v)
	}
	return err
}

// Parse{{$q.Name}} reads a {{$q.Kind}}: a decimal number, optional spaces,
// then a unit of {{$q.Kind}} such as {{examples $q}} (see the package doc
// for the grammar and every spelling).
func Parse{{$q.Name}}(s string) ({{$q.Name}}, error) {
	v, err := parseTyped("units.Parse{{$q.Name}}", s, &type{{$q.Name}})
	return {{$q.Name}}(v), err
}

// Parse{{$q.Name}} is units.Parse{{$q.Name}} with the number convention of p.
func (p Parser) Parse{{$q.Name}}(s string) ({{$q.Name}}, error) {
	v, err := p.parseTyped("units.Parser.Parse{{$q.Name}}", s, &type{{$q.Name}})
	return {{$q.Name}}(v), err
}

// {{$q.Name}} converts a dynamic quantity to a {{$q.Name}}. It fails with
// ErrDimension when the dimensions differ{{if ne $q.Accept ""}} and with ErrReference when the
// reference (gauge, absolute, temperature point or difference) does not fit{{end}}.
func (d Quantity) {{$q.Name}}() ({{$q.Name}}, error) {
	v, err := d.as(&type{{$q.Name}})
	return {{$q.Name}}(v), err
}
{{end}}{{end}}`

// tablesTmpl writes the data tables: type descriptions and the unit table.
const tablesTmpl = `// Code generated by gen.go; DO NOT EDIT.

package units

// Type descriptions used by parsing and conversion.
var (
{{- range $q := .}}{{if not $q.NoType}}
	type{{$q.Name}} = typeInfo{name: "{{$q.Name}}", kind: "{{$q.Kind}}", dim: {{$q.Dim}}, accept: {{accept $q.Accept}}, useOffset: {{$q.Offset}}, {{if $q.Min}}hasMin: true, min: {{$q.Min}}, minText: {{quote $q.MinText}}, {{end}}examples: {{quote (examples $q)}}{{if $q.Context}},
		context: []contextSpelling{ {{range $c := $q.Context}}
			{spelling: {{quote $c.Spelling}}, {{if $c.Unit}}unit: {{$c.UnitIdx}}{{else if $c.Read}}unit: -1, read: {{$c.Read}}{{else}}unit: -1, err: {{$c.Err}}, detail: {{quote $c.Detail}}{{end}}},{{end}}
		}{{end}}}
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
`

// systemsTmpl writes the presentation systems.
const systemsTmpl = `// Code generated by gen.go; DO NOT EDIT.

package units

// Slots of System.units, one per quantity type, then one per purpose.
const (
{{- range $i, $q := .}}{{if not $q.NoType}}
	slot{{$q.Name}}{{if eq $i 0}} = iota{{end}}
{{- end}}{{end}}
{{- range $q := .}}{{range $p := $q.Purposes}}
	slot{{$p.Name}}
{{- end}}{{end}}
	numSlots
)

// metricSystem is the metric trade system: bar, L/min, kN, mm, cm³/rev, kW, °C, mm²/s.
var metricSystem = System{name: "metric", digits: 4, units: [numSlots]uint16{
{{- range $q := .}}{{if not $q.NoType}}
	slot{{$q.Name}}: {{$q.MetricIdx}} + 1, // {{$q.Metric}}
{{- end}}{{end}}
}}

// usCustomarySystem is the US customary trade system: psi, gpm, lbf, in, in³/rev, hp, °F.
var usCustomarySystem = System{name: "US customary", digits: 4, units: [numSlots]uint16{
{{- range $q := .}}{{if not $q.NoType}}
	slot{{$q.Name}}: {{$q.USIdx}} + 1, // {{$q.US}}
{{- end}}{{end}}
{{- range $q := .}}{{range $p := $q.Purposes}}{{if $p.US}}
	slot{{$p.Name}}: {{$p.USIdx}} + 1, // {{$p.US}}
{{- end}}{{end}}{{end}}
}}
{{range $q := .}}{{if not $q.NoType}}
// Append{{$q.Name}} appends q in the system's unit for {{$q.Name}} to b.
// It does not allocate when b has room.
func (s System) Append{{$q.Name}}(b []byte, q {{$q.Name}}) []byte {
	return appendIn(b, float64(q), s.unit(slot{{$q.Name}}, metric{{$q.Name}}), s.Digits())
}

// Format{{$q.Name}} formats q in the system's unit for {{$q.Name}}.
func (s System) Format{{$q.Name}}(q {{$q.Name}}) string {
	var buf [40]byte
	return string(s.Append{{$q.Name}}(buf[:0], q))
}

// {{$q.Name}}Unit returns the spelling of the unit s writes a {{$q.Name}} in,
// such as "{{$q.Metric}}".
func (s System) {{$q.Name}}Unit() string { return s.unit(slot{{$q.Name}}, metric{{$q.Name}}).sym }

// With{{$q.Name}} returns a copy of s that writes a {{$q.Name}} in the
// registered unit spelled unit, such as {{examples $q}}; s itself is not
// changed. It fails, returning the zero System, when unit is not a
// registered spelling of a unit of {{$q.Kind}}.
func (s System) With{{$q.Name}}(unit string) (System, error) {
	return s.with(slot{{$q.Name}}, "units.System.With{{$q.Name}}", unit, &type{{$q.Name}})
}
{{range $p := $q.Purposes}}
// Append{{$p.Name}} appends q, {{$p.What}}, to b in the system's unit for
// that purpose{{if $p.US}} ({{$p.US}} in USCustomary){{end}}, or in its unit for {{$q.Name}}
// where it sets none. It does not allocate when b has room.
func (s System) Append{{$p.Name}}(b []byte, q {{$q.Name}}) []byte {
	return appendIn(b, float64(q), s.purposeUnit(slot{{$p.Name}}, slot{{$q.Name}}, metric{{$q.Name}}), s.Digits())
}

// Format{{$p.Name}} formats q, {{$p.What}}, as Append{{$p.Name}} does.
func (s System) Format{{$p.Name}}(q {{$q.Name}}) string {
	var buf [40]byte
	return string(s.Append{{$p.Name}}(buf[:0], q))
}

// {{$p.Name}}Unit returns the spelling of the unit s writes {{$p.What}} in.
func (s System) {{$p.Name}}Unit() string {
	return s.purposeUnit(slot{{$p.Name}}, slot{{$q.Name}}, metric{{$q.Name}}).sym
}

// With{{$p.Name}} returns a copy of s that writes {{$p.What}} in the
// registered unit spelled unit; s itself is not changed. It fails,
// returning the zero System, when unit is not a registered spelling of a
// unit of {{$q.Kind}}.
func (s System) With{{$p.Name}}(unit string) (System, error) {
	return s.with(slot{{$p.Name}}, "units.System.With{{$p.Name}}", unit, &type{{$q.Name}})
}
{{end}}{{end}}{{end}}`
