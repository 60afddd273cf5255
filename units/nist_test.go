package units

import (
	"math"
	"math/big"
	"strconv"
	"strings"
	"testing"
)

// This file checks every conversion factor in the unit registry, and every
// exported unit constant, against its definition.
//
// Source for every "def" below unless the row says otherwise: NIST Special
// Publication 811 (2008 ed.), "Guide for the Use of the International System
// of Units", Appendix B.8 (factors for units listed alphabetically) and B.9
// (factors by kind of quantity), with the defining values it rests on:
// inch = 0.0254 m, foot = 0.3048 m, pound (avoirdupois) = 0.45359237 kg,
// standard acceleration of gravity g₀ = 9.80665 m/s², US gallon = 231 in³,
// imperial gallon = 4.54609 L, British thermal unit (International Table)
// = 1055.05585262 J, T/K = (t/°F + 459.67)/1.8, T/K = t/°C + 273.15,
// T/K = (T/°R)/1.8, conventional inch of mercury = 13 595.1 kg/m³ · g₀ · 1 in.
// All of these are exact by definition; the decimal prefixes (SI Brochure,
// 9th ed., 2019) are exact too. Label [S] for the definitions.
//
// Each definition is evaluated exactly with math/big (rational arithmetic;
// π, needed only for the radian, is a 60-digit rational whose error is some
// 40 orders below half an ulp) and rounded once to float64. The registry and
// the constants are Go untyped constant expressions, also rounded once, so
// the comparison is exact (==): 0 ulp. No row needs a tolerance.
//
// The "printed" column holds NIST SP 811's rounded 7-significant-digit
// factor from Appendix B.8 where it prints one that is not exact. Those
// digits are quoted from memory ([M]); they are a second, independent look at
// each derived factor (a slip in a definition chain moves the 7th digit long
// before it moves anything else), compared to half a unit in the 7th digit.

// nistRow is one registered unit and its definition.
type nistRow struct {
	sym     string  // canonical symbol in the registry
	delta   bool    // the display-only temperature-difference entry of sym
	def     string  // exact factor to SI: decimal literals and "pi" joined by * and /
	offset  string  // exact SI offset of a temperature scale, "" for none
	c       float64 // the exported constant, 0 when the unit has none
	printed float64 // NIST's printed 7-digit factor, 0 when the factor is exact
}

var nistTable = []nistRow{
	// Length. inch and foot exact (B.8); micron = 1E-06 m exact.
	{sym: "m", def: "1", c: float64(Metre)},
	{sym: "mm", def: "0.001", c: float64(Millimetre)},
	{sym: "cm", def: "0.01", c: float64(Centimetre)},
	{sym: "µm", def: "0.000001", c: float64(Micrometre)},
	{sym: "in", def: "0.0254", c: float64(Inch)},
	{sym: "ft", def: "0.3048", c: float64(Foot)},

	// Area. in² = 6.4516E-04 m², ft² = 9.290304E-02 m², both exact.
	{sym: "m²", def: "1", c: float64(SquareMetre)},
	{sym: "mm²", def: "0.000001", c: float64(SquareMillimetre)},
	{sym: "cm²", def: "0.0001", c: float64(SquareCentimetre)},
	{sym: "in²", def: "0.0254*0.0254", c: float64(SquareInch)},
	{sym: "ft²", def: "0.3048*0.3048", c: float64(SquareFoot)},

	// Volume. litre = 1E-03 m³ exact; in³ = 1.6387064E-05 m³ exact;
	// gallon (US) = 231 in³ (printed 3.785412E-03); gallon (UK) = 4.54609E-03 exact.
	{sym: "m³", def: "1", c: float64(CubicMetre)},
	{sym: "L", def: "0.001", c: float64(Litre)},
	{sym: "mL", def: "0.000001", c: float64(Millilitre)},
	{sym: "cm³", def: "0.000001", c: float64(CubicCentimetre)},
	{sym: "in³", def: "0.0254*0.0254*0.0254", c: float64(CubicInch)},
	{sym: "gal", def: "231*0.0254*0.0254*0.0254", c: float64(USGallon), printed: 3.785412e-3},
	{sym: "UK gal", def: "0.00454609", c: float64(UKGallon)},

	// Mass. pound (avoirdupois) = 0.45359237 kg exact; ton (metric) = 1E+03 kg.
	{sym: "kg", def: "1", c: float64(Kilogram)},
	{sym: "g", def: "0.001", c: float64(Gram)},
	{sym: "t", def: "1000", c: float64(Tonne)},
	{sym: "lbm", def: "0.45359237", c: float64(PoundMass)},

	// Force. lbf = lb·g₀ (printed 4.448222); kgf = 9.80665 N exact.
	{sym: "N", def: "1", c: float64(Newton)},
	{sym: "kN", def: "1000", c: float64(Kilonewton)},
	{sym: "lbf", def: "0.45359237*9.80665", c: float64(PoundForce), printed: 4.448222},
	{sym: "kgf", def: "9.80665", c: float64(KilogramForce)},
	// Ton-forces: B.8 prints ton-force (2000 lbf) = 8.896 443 E+03 N; the
	// tonne-force is the metric ton (1000 kg, B.8) under g₀ = 1000 kgf, and
	// the long ton-force the long ton (2240 lb, B.8) under g₀ = 2240 lbf.
	{sym: "tf", def: "1000*9.80665", c: float64(TonneForce)},
	{sym: "US tonf", def: "2000*0.45359237*9.80665", c: float64(ShortTonForce), printed: 8.896443e3},
	{sym: "UK tonf", def: "2240*0.45359237*9.80665", c: float64(LongTonForce)},

	// Pressure (gauge). bar = 1E+05 Pa exact; psi = lbf/in² (printed
	// 6.894757E+03); ksi (printed 6.894757E+06); kgf/cm² = 9.80665E+04 Pa
	// exact; inch of mercury, conventional (printed 3.386389E+03).
	{sym: "Pa", def: "1", c: float64(Pascal)},
	{sym: "kPa", def: "1000", c: float64(Kilopascal)},
	{sym: "MPa", def: "1000000", c: float64(Megapascal)},
	{sym: "GPa", def: "1000000000", c: float64(Gigapascal)},
	{sym: "bar", def: "100000", c: float64(Bar)},
	{sym: "mbar", def: "100", c: float64(Millibar)},
	{sym: "psi", def: "0.45359237*9.80665/0.0254/0.0254", c: float64(PSI), printed: 6.894757e3},
	{sym: "ksi", def: "1000*0.45359237*9.80665/0.0254/0.0254", c: float64(KSI), printed: 6.894757e6},
	{sym: "kgf/cm²", def: "9.80665/0.0001", c: float64(KilogramForcePerSquareCentimetre)},
	{sym: "inHg", def: "13595.1*9.80665*0.0254", c: float64(InchOfMercury), printed: 3.386389e3},
	// Differences: the factors of psi, bar and kPa.
	{sym: "psid", def: "0.45359237*9.80665/0.0254/0.0254", printed: 6.894757e3},
	{sym: "bard", def: "100000"},
	{sym: "kPa(d)", def: "1000"},
	// Vacuum readings: the same factors below ambient, negative.
	{sym: "inHg vac", def: "-13595.1*9.80665*0.0254"},
	{sym: "mmHg vac", def: "-13595.1*9.80665*0.001"},
	{sym: "kPa vac", def: "-1000"},
	{sym: "bar vac", def: "-100000"},
	{sym: "psi vac", def: "-0.45359237*9.80665/0.0254/0.0254"},

	// Pressure (absolute): the same factors; atmosphere, standard = 1.01325E+05 Pa exact.
	{sym: "Pa(a)", def: "1", c: float64(PascalAbsolute)},
	{sym: "kPa(a)", def: "1000", c: float64(KilopascalAbsolute)},
	{sym: "MPa(a)", def: "1000000", c: float64(MegapascalAbsolute)},
	{sym: "bara", def: "100000", c: float64(BarAbsolute)},
	{sym: "psia", def: "0.45359237*9.80665/0.0254/0.0254", c: float64(PSIAbsolute), printed: 6.894757e3},
	{sym: "atm", def: "101325", c: float64(StandardAtmosphere)},
	// Millimetre of mercury, conventional = 13.5951 g/cm³·g₀·1 mm =
	// 133.322 387 415 Pa exactly (printed 1.333224 E+02); torr = 101 325/760
	// Pa (printed 1.333224 E+02).
	{sym: "mmHg", def: "13595.1*9.80665*0.001", c: float64(MillimetreOfMercury), printed: 1.333224e2},
	{sym: "Torr", def: "101325/760", c: float64(Torr), printed: 1.333224e2},

	// Flow. gallon (US) per minute (printed 6.309020E-05).
	{sym: "m³/s", def: "1", c: float64(CubicMetrePerSecond)},
	{sym: "L/min", def: "0.001/60", c: float64(LitrePerMinute)},
	{sym: "L/s", def: "0.001", c: float64(LitrePerSecond)},
	{sym: "m³/h", def: "1/3600", c: float64(CubicMetrePerHour)},
	{sym: "gpm", def: "231*0.0254*0.0254*0.0254/60", c: float64(USGallonPerMinute), printed: 6.309020e-5},
	{sym: "gph", def: "231*0.0254*0.0254*0.0254/3600"},
	{sym: "in³/s", def: "0.0254*0.0254*0.0254", c: float64(CubicInchPerSecond)},

	// Velocity. foot per second 3.048E-01, inch per second 2.54E-02, foot
	// per minute 5.08E-03, all exact.
	{sym: "m/s", def: "1", c: float64(MetrePerSecond)},
	{sym: "mm/s", def: "0.001", c: float64(MillimetrePerSecond)},
	{sym: "ft/s", def: "0.3048", c: float64(FootPerSecond)},
	{sym: "in/s", def: "0.0254", c: float64(InchPerSecond)},
	{sym: "ft/min", def: "0.3048/60", c: float64(FootPerMinute)},

	// Displacement, per revolution (our angle base is the revolution).
	{sym: "m³/rev", def: "1", c: float64(CubicMetrePerRevolution)},
	{sym: "cm³/rev", def: "0.000001", c: float64(CubicCentimetrePerRevolution)},
	{sym: "in³/rev", def: "0.0254*0.0254*0.0254", c: float64(CubicInchPerRevolution)},

	// Rotational speed in rev/s: rpm = 1/60 rev/s; 1 rad = 1/(2π) rev.
	{sym: "rev/s", def: "1", c: float64(RevolutionPerSecond)},
	{sym: "rpm", def: "1/60", c: float64(RevolutionPerMinute)},
	{sym: "rad/s", def: "1/2/pi", c: float64(RadianPerSecond)},

	// Torque. pound-force foot (printed 1.355818), pound-force inch
	// (printed 1.129848E-01).
	{sym: "N·m", def: "1", c: float64(NewtonMetre)},
	{sym: "kN·m", def: "1000", c: float64(KilonewtonMetre)},
	{sym: "lbf·ft", def: "0.45359237*9.80665*0.3048", c: float64(PoundForceFoot), printed: 1.355818},
	{sym: "lbf·in", def: "0.45359237*9.80665*0.0254", c: float64(PoundForceInch), printed: 1.129848e-1},

	// Power. horsepower (550 ft·lbf/s) printed 7.456999E+02; horsepower
	// (metric) = 75 kgf·m/s, printed 7.354988E+02; Btu_IT per hour printed
	// 2.930711E-01.
	{sym: "W", def: "1", c: float64(Watt)},
	{sym: "kW", def: "1000", c: float64(Kilowatt)},
	{sym: "hp", def: "550*0.3048*0.45359237*9.80665", c: float64(Horsepower), printed: 7.456999e2},
	{sym: "PS", def: "75*9.80665", c: float64(MetricHorsepower), printed: 7.354988e2},
	{sym: "BTU/h", def: "1055.05585262/3600", c: float64(BTUPerHour), printed: 2.930711e-1},

	// Energy. kilowatt hour = 3.6E+06 J exact; Btu_IT = 1.05505585262E+03 J
	// exact (B.8 footnote), printed 1.055056E+03.
	{sym: "J", def: "1", c: float64(Joule)},
	{sym: "kJ", def: "1000", c: float64(Kilojoule)},
	{sym: "MJ", def: "1000000", c: float64(Megajoule)},
	{sym: "kWh", def: "3600000", c: float64(KilowattHour)},
	{sym: "BTU", def: "1055.05585262", c: float64(BTU), printed: 1.055056e3},

	// Temperature, B.9: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8;
	// T/K = (T/°R)/1.8.
	{sym: "K", def: "1", c: float64(Kelvin)},
	{sym: "°R", def: "1/1.8", c: float64(Rankine)},
	{sym: "°C", def: "1", offset: "273.15"},
	{sym: "°F", def: "1/1.8", offset: "459.67/1.8"},

	// Temperature difference, B.9: an interval of 1 °C = 1 K; of 1 °F = 1 °R = K/1.8.
	{sym: "K", delta: true, def: "1", c: float64(DeltaKelvin)},
	{sym: "°C", delta: true, def: "1", c: float64(DeltaCelsius)},
	{sym: "°F", delta: true, def: "1/1.8", c: float64(DeltaFahrenheit)},
	{sym: "ΔK", def: "1"},
	{sym: "Δ°C", def: "1"},
	{sym: "Δ°F", def: "1/1.8"},

	// Kinematic viscosity. centistokes 1.0E-06 m²/s, stokes 1.0E-04 m²/s, exact.
	{sym: "m²/s", def: "1", c: float64(SquareMetrePerSecond)},
	{sym: "mm²/s", def: "0.000001", c: float64(SquareMillimetrePerSecond)},
	{sym: "cSt", def: "0.000001", c: float64(Centistokes)},
	{sym: "St", def: "0.0001", c: float64(Stokes)},

	// Dynamic viscosity. centipoise 1.0E-03 Pa·s, poise 1.0E-01 Pa·s, exact.
	{sym: "Pa·s", def: "1", c: float64(PascalSecond)},
	{sym: "mPa·s", def: "0.001", c: float64(MillipascalSecond)},
	{sym: "cP", def: "0.001", c: float64(Centipoise)},
	{sym: "P", def: "0.1", c: float64(Poise)},

	// Density. gram per cubic centimetre 1.0E+03 exact; pound per cubic
	// foot printed 1.601846E+01; pound per gallon (US) printed 1.198264E+02.
	{sym: "kg/m³", def: "1", c: float64(KilogramPerCubicMetre)},
	{sym: "g/cm³", def: "1000", c: float64(GramPerCubicCentimetre)},
	{sym: "kg/L", def: "1000", c: float64(KilogramPerLitre)},
	{sym: "lbm/ft³", def: "0.45359237/0.3048/0.3048/0.3048", c: float64(PoundPerCubicFoot), printed: 1.601846e1},
	{sym: "lbm/gal", def: "0.45359237/231/0.0254/0.0254/0.0254", c: float64(PoundPerUSGallon), printed: 1.198264e2},

	// Specific heat capacity. Btu_IT/(lb·°F) = 4.1868E+03 J/(kg·K) exact.
	{sym: "J/(kg·K)", def: "1", c: float64(JoulePerKilogramKelvin)},
	{sym: "kJ/(kg·K)", def: "1000", c: float64(KilojoulePerKilogramKelvin)},
	{sym: "BTU/(lbm·°F)", def: "1055.05585262*1.8/0.45359237", c: float64(BTUPerPoundFahrenheit)},

	// Heat transfer coefficient. Btu_IT/(h·ft²·°F) printed 5.678263.
	{sym: "W/(m²·K)", def: "1", c: float64(WattPerSquareMetreKelvin)},
	{sym: "BTU/(h·ft²·°F)", def: "1055.05585262*1.8/3600/0.3048/0.3048", c: float64(BTUPerHourSquareFootFahrenheit), printed: 5.678263},

	// Thermal conductivity. Btu_IT/(h·ft·°F) printed 1.730735.
	{sym: "W/(m·K)", def: "1", c: float64(WattPerMetreKelvin)},
	{sym: "BTU/(h·ft·°F)", def: "1055.05585262*1.8/3600/0.3048", c: float64(BTUPerHourFootFahrenheit), printed: 1.730735},

	// Stiffness. pound-force per inch printed 1.751268E+02.
	{sym: "N/m", def: "1", c: float64(NewtonPerMetre)},
	{sym: "N/mm", def: "1000", c: float64(NewtonPerMillimetre)},
	{sym: "kN/mm", def: "1000000", c: float64(KilonewtonPerMillimetre)},
	{sym: "lbf/in", def: "0.45359237*9.80665/0.0254", c: float64(PoundForcePerInch), printed: 1.751268e2},

	// Frequency.
	{sym: "Hz", def: "1", c: float64(Hertz)},
	{sym: "cpm", def: "1/60", c: float64(CyclePerMinute)},

	// Acceleration. standard acceleration of free fall 9.80665 m/s² exact;
	// foot per second squared 3.048E-01 exact.
	{sym: "m/s²", def: "1", c: float64(MetrePerSecondSquared)},
	{sym: "g₀", def: "9.80665", c: float64(StandardGravity)},
	{sym: "ft/s²", def: "0.3048", c: float64(FootPerSecondSquared)},

	// Registry-only units of time and angle used in expressions.
	{sym: "s", def: "1"},
	{sym: "ms", def: "0.001"},
	{sym: "min", def: "60"},
	{sym: "h", def: "3600"},
	{sym: "rev", def: "1"},
	{sym: "rad", def: "1/2/pi"},
}

// piRat is π to 60 significant digits.
var piRat, _ = new(big.Rat).SetString("3.14159265358979323846264338327950288419716939937510582097494")

// ratOf evaluates a definition: decimal literals and "pi" joined by * and /,
// left to right, exactly.
func ratOf(t *testing.T, expr string) *big.Rat {
	t.Helper()
	acc := new(big.Rat).SetInt64(1)
	op := byte('*')
	for len(expr) > 0 {
		i := strings.IndexAny(expr, "*/")
		tok := expr
		if i >= 0 {
			tok = expr[:i]
		}
		var x *big.Rat
		if tok == "pi" {
			x = piRat
		} else {
			var ok bool
			if x, ok = new(big.Rat).SetString(tok); !ok {
				t.Fatalf("bad literal %q in %q", tok, expr)
			}
		}
		if op == '*' {
			acc.Mul(acc, x)
		} else {
			acc.Quo(acc, x)
		}
		if i < 0 {
			break
		}
		op, expr = expr[i], expr[i+1:]
	}
	return acc
}

// floatOf rounds an exact definition to the nearest float64.
func floatOf(t *testing.T, expr string) float64 {
	t.Helper()
	f, _ := ratOf(t, expr).Float64()
	return f
}

// ulpDiff returns the distance between a and b in units in the last place.
func ulpDiff(a, b float64) uint64 {
	if a == b {
		return 0
	}
	if math.Signbit(a) != math.Signbit(b) {
		return math.MaxUint64
	}
	x, y := math.Float64bits(a), math.Float64bits(b)
	if x > y {
		return x - y
	}
	return y - x
}

// findUnit returns the registry entry of sym (the display-only difference
// entry when delta is set).
func findUnit(sym string, delta bool) (int, bool) {
	for i := range unitTable {
		if unitTable[i].sym == sym && unitTable[i].noReg == delta {
			return i, true
		}
	}
	return 0, false
}

func TestNISTFactors(t *testing.T) {
	covered := make(map[int]bool)
	for _, r := range nistTable {
		i, ok := findUnit(r.sym, r.delta)
		if !ok {
			t.Errorf("%s: not in the unit registry", r.sym)
			continue
		}
		if covered[i] {
			t.Errorf("%s: listed twice", r.sym)
		}
		covered[i] = true
		u := &unitTable[i]
		want := floatOf(t, r.def)
		if u.factor != want {
			t.Errorf("%s: registry factor = %.17g, want %s = %.17g (%d ulp)", r.sym, u.factor, r.def, want, ulpDiff(u.factor, want))
		}
		if r.c != 0 && r.c != want {
			t.Errorf("%s: exported constant = %.17g, want %s = %.17g (%d ulp)", r.sym, r.c, r.def, want, ulpDiff(r.c, want))
		}
		wantOffset := 0.0
		if r.offset != "" {
			wantOffset = floatOf(t, r.offset)
		}
		if u.offset != wantOffset {
			t.Errorf("%s: offset = %.17g, want %s = %.17g", r.sym, u.offset, r.offset, wantOffset)
		}
		// NIST SP 811 App. B.8 printed factor, 7 significant digits (from memory).
		if r.printed != 0 && math.Abs(want-r.printed) > halfUnitIn7thDigit(r.printed) {
			t.Errorf("%s: exact factor %.10g does not round to NIST's printed %g", r.sym, want, r.printed)
		}
	}
	for i := range unitTable {
		if !covered[i] {
			t.Errorf("unit %q (registry entry %d) has no NIST row", unitTable[i].sym, i)
		}
	}
}

// halfUnitIn7thDigit returns half a unit in the 7th significant digit of p
// (with a hair of slack for the float64 arithmetic of the comparison).
func halfUnitIn7thDigit(p float64) float64 {
	return 0.5 * math.Pow(10, math.Floor(math.Log10(math.Abs(p)))-6) * (1 + 1e-9)
}

// TestNISTAliases checks that every alias resolves to its unit's factor,
// offset and reference: aliases are spellings, never new definitions.
func TestNISTAliases(t *testing.T) {
	for i := range unitTable {
		u := &unitTable[i]
		for _, a := range u.aliases {
			r, f := resolveUnit(a)
			if f.err != nil {
				t.Errorf("alias %q of %q: %v", a, u.sym, f.err)
				continue
			}
			if r.factor != u.factor || r.offset != u.offset || r.dim != u.dim || r.ref != u.ref {
				t.Errorf("alias %q of %q resolves to %+v", a, u.sym, r)
			}
		}
	}
}

// tradeSpellings lists the trade's spellings that the package promises to
// read, with the NIST row (symbol) that defines each. A spelling that is registered whole
// must give the factor exactly; one built as an expression (lbm/US gal) is
// a quotient of two correctly rounded factors, so it may differ by the
// rounding of that division and of its inputs: at most 2 ulp.
var tradeSpellings = []struct{ spelling, def string }{
	{"Pa", "1"}, {"kPa", "1000"}, {"MPa", "1000000"}, {"GPa", "1000000000"}, {"bar", "100000"}, {"mbar", "100"},
	{"psi", "0.45359237*9.80665/0.0254/0.0254"}, {"ksi", "1000*0.45359237*9.80665/0.0254/0.0254"},
	{"kgf/cm²", "98066.5"}, {"inHg", "13595.1*9.80665*0.0254"}, {"atm", "101325"},
	{"mm", "0.001"}, {"cm", "0.01"}, {"m", "1"}, {"µm", "0.000001"}, {"in", "0.0254"}, {"ft", "0.3048"},
	{"mm²", "0.000001"}, {"cm²", "0.0001"}, {"m²", "1"}, {"in²", "0.0254*0.0254"},
	{"mL", "0.000001"}, {"L", "0.001"}, {"m³", "1"}, {"cm³", "0.000001"}, {"cc", "0.000001"},
	{"in³", "0.0254*0.0254*0.0254"}, {"US gal", "231*0.0254*0.0254*0.0254"}, {"UK gal", "0.00454609"},
	{"L/min", "0.001/60"}, {"m³/s", "1"}, {"m³/h", "1/3600"}, {"gpm", "231*0.0254*0.0254*0.0254/60"},
	{"in³/s", "0.0254*0.0254*0.0254"}, {"cm³/rev", "0.000001"}, {"in³/rev", "0.0254*0.0254*0.0254"},
	{"rpm", "1/60"}, {"rev/s", "1"}, {"rad/s", "1/2/pi"},
	{"N", "1"}, {"kN", "1000"}, {"lbf", "0.45359237*9.80665"}, {"kgf", "9.80665"},
	{"kg", "1"}, {"lbm", "0.45359237"}, {"t", "1000"},
	{"W", "1"}, {"kW", "1000"}, {"hp", "550*0.3048*0.45359237*9.80665"}, {"PS", "75*9.80665"},
	{"BTU/h", "1055.05585262/3600"},
	{"J", "1"}, {"kJ", "1000"}, {"BTU", "1055.05585262"}, {"kWh", "3600000"},
	{"N·m", "1"}, {"lbf·ft", "0.45359237*9.80665*0.3048"}, {"lbf·in", "0.45359237*9.80665*0.0254"},
	{"m/s", "1"}, {"ft/s", "0.3048"}, {"in/s", "0.0254"}, {"mm/s", "0.001"},
	{"°C", "1"}, {"°F", "1/1.8"}, {"K", "1"}, {"°R", "1/1.8"},
	{"cSt", "0.000001"}, {"mm²/s", "0.000001"}, {"St", "0.0001"}, {"cP", "0.001"}, {"mPa·s", "0.001"}, {"Pa·s", "1"},
	{"kg/m³", "1"}, {"g/cm³", "1000"}, {"lbm/ft³", "0.45359237/0.3048/0.3048/0.3048"},
	{"lbm/US gal", "0.45359237/231/0.0254/0.0254/0.0254"},
	{"J/(kg·K)", "1"}, {"BTU/(lbm·°F)", "4186.8"}, {"W/(m²·K)", "1"},
}

func TestNISTTradeSpellings(t *testing.T) {
	for _, c := range tradeSpellings {
		r, f := resolveUnit(c.spelling)
		if f.err != nil {
			t.Errorf("%q: %v (%s)", c.spelling, f.err, f.detail)
			continue
		}
		want := floatOf(t, c.def)
		var tol uint64
		if _, whole := spellings[c.spelling]; !whole {
			tol = 2
		}
		if d := ulpDiff(r.factor, want); d > tol {
			t.Errorf("%q: factor %.17g, want %s = %.17g (%d ulp, allowed %d)", c.spelling, r.factor, c.def, want, d, tol)
		}
	}
}

// TestNISTTemperatureScales checks the scale functions against NIST SP 811
// B.9 (T/K = t/°C + 273.15, t/°F = 1.8·t/°C + 32). The definitions are
// exact, but a float64 kelvin value carries an absolute rounding of half an
// ulp of ~300 K (2.8e-14 K), and each scale step adds one rounding of the
// same size, so the check allows 4 ulp of the kelvin value (2.3e-13 K, or
// 4.1e-13 °F): the float64 sum cannot do better.
func TestNISTTemperatureScales(t *testing.T) {
	const tolK = 4 * 5.684341886080802e-14 // 4 ulp at 256–512 K
	for _, c := range []struct{ celsius, fahrenheit string }{
		{"-40", "-40"}, // the scales cross at −40 [X]
		{"0", "32"},    // ice point [S]
		{"20", "68"},
		{"40", "104"}, // ISO 3448 reference temperature
		{"100", "212"},
		{"-273.15", "-459.67"}, // absolute zero [S]
	} {
		cel, _ := strconv.ParseFloat(c.celsius, 64)
		fah, _ := strconv.ParseFloat(c.fahrenheit, 64)
		wantK, _ := new(big.Rat).Add(ratOf(t, c.celsius), ratOf(t, "273.15")).Float64()
		if got := float64(TemperatureFromCelsius(cel)); math.Abs(got-wantK) > tolK {
			t.Errorf("TemperatureFromCelsius(%s) = %.17g K, want %.17g", c.celsius, got, wantK)
		}
		if got := float64(TemperatureFromFahrenheit(fah)); math.Abs(got-wantK) > tolK {
			t.Errorf("TemperatureFromFahrenheit(%s) = %.17g K, want %.17g", c.fahrenheit, got, wantK)
		}
		if got := TemperatureFromCelsius(cel).Fahrenheit(); math.Abs(got-fah) > 1.8*tolK {
			t.Errorf("%s °C in °F = %.17g, want %s", c.celsius, got, c.fahrenheit)
		}
		if got := TemperatureFromFahrenheit(fah).Celsius(); math.Abs(got-cel) > tolK {
			t.Errorf("%s °F in °C = %.17g, want %s", c.fahrenheit, got, c.celsius)
		}
		if got, err := Convert(cel, "°C", "°F"); err != nil || math.Abs(got-fah) > 1.8*tolK {
			t.Errorf("Convert(%s, °C, °F) = %.17g, %v; want %s", c.celsius, got, err, c.fahrenheit)
		}
	}
}

// TestDerivedTradeConstants derives the trade's shortcut divisors from the
// unit definitions. Nothing here is typed in except the exact rational that
// the definitions reduce to, worked by hand beside each check [X]:
//
//	hp/(psi·gpm) = 550 ft·lbf/s ÷ (lbf/in² · 231 in³/min)
//	             = 550·12·60/231 = 12000/7 = 1714.2857…  (printed 1714.29, or 1714)
//	kW/(bar·L/min) = 1000 W ÷ (10⁵ Pa · 10⁻³ m³/60 s) = 600 exactly
//	(gpm/in²)/(ft/s) = 231 in³/min ÷ 1 in² ÷ (12 in · 60/min) = 231/720 = 0.3208…
//	(hp/rpm)/(lbf·in/rad) = 6600 in·lbf/s ÷ (1/60 rev/s) ÷ 2π rad/rev
//	                      = 396000/(2π) = 63 025.4 (the 63 025 of torque = 63 025·hp/rpm)
//
// Convert multiplies and divides correctly rounded factors: a few roundings,
// so the checks allow 4 ulp.
func TestDerivedTradeConstants(t *testing.T) {
	for _, c := range []struct {
		from, to string
		want     string // exact value of 1 from in to
		printed  string // the trade's rounded figure and the digits it keeps
		digits   int
	}{
		{"hp", "psi*gpm", "12000/7", "1714.29", 6},
		{"hp", "psi·gpm", "12000/7", "1714", 4},
		{"kW", "bar*L/min", "600", "600", 3},
		{"gpm/in²", "ft/s", "231/720", "0.3208", 4},
		{"hp/rpm", "lbf·in/rad", "396000/2/pi", "63025", 5},
	} {
		got, err := Convert(1, c.from, c.to)
		if err != nil {
			t.Errorf("Convert(1, %q, %q): %v", c.from, c.to, err)
			continue
		}
		want := floatOf(t, c.want)
		if d := ulpDiff(got, want); d > 4 {
			t.Errorf("1 %s = %.17g %s, want %s = %.17g (%d ulp)", c.from, got, c.to, c.want, want, d)
		}
		if s := strconv.FormatFloat(got, 'g', c.digits, 64); s != c.printed {
			t.Errorf("1 %s = %s %s at %d digits, the trade prints %s", c.from, s, c.to, c.digits, c.printed)
		}
	}

	// The same constants from typed arithmetic: hydraulic power = p·Q.
	hpDivisor := float64(PSI) * float64(USGallonPerMinute) / float64(Horsepower)
	if d := ulpDiff(1/hpDivisor, floatOf(t, "12000/7")); d > 4 {
		t.Errorf("hp/(psi·gpm) from constants = %.17g (%d ulp from 12000/7)", 1/hpDivisor, d)
	}
	kwDivisor := float64(Kilowatt) / (float64(Bar) * float64(LitrePerMinute))
	if d := ulpDiff(kwDivisor, 600); d > 2 {
		t.Errorf("kW/(bar·L/min) from constants = %.17g (%d ulp from 600)", kwDivisor, d)
	}
	// A baling-press circuit of our own: 2500 psi at 12 gpm, and 170 bar at 45 L/min.
	pUS, qUS := 2500*PSI, 12*USGallonPerMinute
	if got, want := Power(float64(pUS)*float64(qUS)).Horsepower(), 2500*12/floatOf(t, "12000/7"); ulpDiff(got, want) > 4 {
		t.Errorf("2500 psi × 12 gpm = %.17g hp, want %.17g", got, want)
	}
	pSI, qSI := 170*Bar, 45*LitrePerMinute
	if got, want := Power(float64(pSI)*float64(qSI)).Kilowatts(), 170*45/600.0; ulpDiff(got, want) > 4 {
		t.Errorf("170 bar × 45 L/min = %.17g kW, want %.17g", got, want)
	}
}
