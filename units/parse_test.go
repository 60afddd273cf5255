package units

import (
	"errors"
	"math"
	"reflect"
	"strconv"
	"strings"
	"testing"
)

// TestParseTemperatureIntervalInExpression: found by FuzzParse once Parse
// began to reject points below absolute zero. "-1C0 C" is C⁰·C, an
// expression, so its temperature is an interval and may be negative; the
// lone spelling "-1 K" is a point below absolute zero; and the SI text of
// the interval, with its dimension in parentheses, reads back.
func TestParseTemperatureIntervalInExpression(t *testing.T) {
	q, err := Parse("-1C0 C")
	if err != nil || q.Value() != -1 || q.Dimension() != typeTemperature.dim {
		t.Fatalf("Parse(-1C0 C) = %v, %v; want the interval -1 K", q, err)
	}
	if d, err := q.TemperatureDifference(); err != nil || d != -1 {
		t.Errorf("Parse(-1C0 C).TemperatureDifference() = %v, %v; want -1 K", d, err)
	}
	if _, err := Parse("-1 K"); !errors.Is(err, ErrRange) {
		t.Errorf("Parse(-1 K): %v; want ErrRange (below absolute zero)", err)
	}
	back, err := Parse("-1 (K)")
	if err != nil || back != q {
		t.Errorf("Parse(-1 (K)) = %v, %v; want %v", back, err, q)
	}
}

// BenchmarkParsePressure compares ParsePressure with strconv.ParseFloat of
// the number alone, in one run, so the ratio is meaningful on any machine.
func BenchmarkParsePressure(b *testing.B) {
	b.Run("ParsePressure/55_bar", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkPressure, sinkErr = ParsePressure("55 bar")
		}
	})
	b.Run("ParsePressure/3000_psig", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkPressure, sinkErr = ParsePressure("3000 psig")
		}
	})
	b.Run("strconv.ParseFloat/55", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkFloat, sinkErr = strconv.ParseFloat("55", 64)
		}
	})
}

// BenchmarkParse measures the dynamic parser on a registered spelling and
// on an expression built from several units.
func BenchmarkParse(b *testing.B) {
	for _, s := range []string{"1.3 gal/min", "12 kW/(m²·K)", "2 kW·h/(m²·K)", "750 in^3/rev"} {
		b.Run(s, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkQuantity, sinkErr = Parse(s)
			}
		})
	}
}

// commonSeeds are inputs every parser sees, good and bad.
var commonSeeds = []string{
	"", " ", "55", "55 bar", "3000 psi", "1.3 gal/min", "20 °C", "68 degF", "5 ΔK",
	"750 in^3/rev", "12 kW/(m²·K)", "1 BTU/(lbm·°F)", "0.5 lbf·ft", "  3.3e-5 in³/rev  ",
	"-0 K", "1e309 bar", "1e308 ksi", "NaN bar", "Inf psi", "0x10 bar", "1_000 psi",
	"-300 °C", "1 psia", "1 atm", "55 bar!", "55 bar extra", "1 (in/m)^999", "12 W/(m²·K",
	"1 m⁻²", "1 m^-24", "1 ((m))", "1 µm", "1 um", "5e-324 m", "-1.7976931348623157e308 Pa",
	".5 mm", "5. mm", "+5 mm", "1e-400 bar", "1 mPa", "1 kgf/cm2", "1 \"Hg", "1 ℃", "9 min⁻¹",
	// Fractions, marks and feet with inches.
	"1-1/2 in", "1 1/2 in", "3/8 in", "-1/2 in", "1/0 in", "1 3/2 in", "1.5/2 in", "1/2 gpm", "9 1/min",
	"1.5\"", "6'", "2' 6\"", "5' 3-1/2\"", "2 ft 6 in", "2 ft 6", "-2 ft 6-1/2 in", "1'000 bar",
	// Vacuum and differential words, mercury, tons.
	"28 inHg vac", "28 inHgV", "600 mmHg vacuum", "-5 psi vac", "28 inHg", "720 mmHg", "500 Torr",
	"25 psid", "1 bar(d)", "2 (psia)", "50 ton", "50 tf", "110000 lbs", "500 kg",
	// Letter case and commas.
	"3000 PSI", "15 KW", "5 Mpa", "5 MM", "3,000 psi", "2,5 bar", "1,234.5 L/min",
}

// seedsFor adds "1.5 spelling" for every spelling of every unit of info.
func seedsFor(info *typeInfo) []string {
	seeds := append([]string(nil), commonSeeds...)
	for i := range unitTable {
		u := &unitTable[i]
		if !fits(u, info) {
			continue
		}
		for _, sp := range append([]string{u.sym}, u.aliases...) {
			seeds = append(seeds, "1.5 "+sp, "-2e3"+sp)
		}
	}
	return seeds
}

// checkParseError: an error matches one of the sentinels and quotes the input.
func checkParseError(t *testing.T, fn, s string, v float64, err error) {
	t.Helper()
	if v != 0 {
		t.Errorf("%s(%q) = %g with error %v; want 0", fn, s, v, err)
	}
	known := false
	for _, sentinel := range []error{ErrSyntax, ErrUnknownUnit, ErrDimension, ErrRange, ErrReference, ErrAmbiguous} {
		known = known || errors.Is(err, sentinel)
	}
	if !known {
		t.Errorf("%s(%q): %v matches no sentinel", fn, s, err)
	}
	if !strings.Contains(err.Error(), strconv.Quote(s)) {
		t.Errorf("%s(%q): %v does not quote the input", fn, s, err)
	}
}

// fuzzTyped fuzzes the typed parser of one quantity type.
func fuzzTyped(f *testing.F, name string) {
	c, info := caseByName(name)
	for _, s := range seedsFor(info) {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		v, err := c.parse(s)
		if err != nil {
			checkParseError(t, "Parse"+name, s, v, err)
			return
		}
		checkTypedValue(t, c, info, s, v)
	})
}

// checkTypedValue checks a value that parsing s accepted.
func checkTypedValue(t *testing.T, c typedCase, info *typeInfo, s string, v float64) {
	t.Helper()
	if math.IsNaN(v) || math.IsInf(v, 0) {
		t.Fatalf("Parse%s(%q) = %g with no error", c.name, s, v)
	}
	if info.hasMin && v < info.min {
		t.Fatalf("Parse%s(%q) = %g, below %s", c.name, s, v, info.minText)
	}
	{
		text, err := c.marshal(v)
		if err != nil {
			t.Fatalf("Parse%s(%q) = %g: MarshalText: %v", c.name, s, v, err)
		}
		back, err := c.unmarshal(text)
		if err != nil || math.Float64bits(back) != math.Float64bits(v) {
			t.Fatalf("Parse%s(%q) = %.17g → %q → %.17g, %v", c.name, s, v, text, back, err)
		}
	}
	// String, and Format under every verb, must read back, even within
	// rounding of the largest float64.
	str := c.str(v)
	if _, err := c.parse(str); err != nil {
		t.Fatalf("Parse%s(%q) = %.17g, whose String %q does not parse: %v", c.name, s, v, str, err)
	}
	for _, verb := range formatVerbs {
		if out := c.sprintf(verb, v); readsBack(c, v, out) != nil {
			t.Fatalf("Parse%s(%q) = %.17g, whose %s form %q does not read back: %v", c.name, s, v, verb, out, readsBack(c, v, out))
		}
	}
}

func FuzzParseLength(f *testing.F) { fuzzTyped(f, "Length") }

func FuzzParseArea(f *testing.F) { fuzzTyped(f, "Area") }

func FuzzParseVolume(f *testing.F) { fuzzTyped(f, "Volume") }

func FuzzParseMass(f *testing.F) { fuzzTyped(f, "Mass") }

func FuzzParseForce(f *testing.F) { fuzzTyped(f, "Force") }

func FuzzParsePressure(f *testing.F) { fuzzTyped(f, "Pressure") }

func FuzzParseAbsolutePressure(f *testing.F) { fuzzTyped(f, "AbsolutePressure") }

func FuzzParseFlow(f *testing.F) { fuzzTyped(f, "Flow") }

func FuzzParseVelocity(f *testing.F) { fuzzTyped(f, "Velocity") }

func FuzzParseDisplacement(f *testing.F) { fuzzTyped(f, "Displacement") }

func FuzzParseRotationalSpeed(f *testing.F) { fuzzTyped(f, "RotationalSpeed") }

func FuzzParseTorque(f *testing.F) { fuzzTyped(f, "Torque") }

func FuzzParsePower(f *testing.F) { fuzzTyped(f, "Power") }

func FuzzParseEnergy(f *testing.F) { fuzzTyped(f, "Energy") }

func FuzzParseTemperature(f *testing.F) { fuzzTyped(f, "Temperature") }

func FuzzParseTemperatureDifference(f *testing.F) {
	fuzzTyped(f, "TemperatureDifference")
}

func FuzzParseKinematicViscosity(f *testing.F) { fuzzTyped(f, "KinematicViscosity") }

func FuzzParseDynamicViscosity(f *testing.F) { fuzzTyped(f, "DynamicViscosity") }

func FuzzParseDensity(f *testing.F) { fuzzTyped(f, "Density") }

func FuzzParseSpecificHeatCapacity(f *testing.F) {
	fuzzTyped(f, "SpecificHeatCapacity")
}

func FuzzParseHeatTransferCoefficient(f *testing.F) {
	fuzzTyped(f, "HeatTransferCoefficient")
}

func FuzzParseThermalConductivity(f *testing.F) { fuzzTyped(f, "ThermalConductivity") }

func FuzzParseStiffness(f *testing.F) { fuzzTyped(f, "Stiffness") }

func FuzzParseFrequency(f *testing.F) { fuzzTyped(f, "Frequency") }

func FuzzParseAcceleration(f *testing.F) { fuzzTyped(f, "Acceleration") }

// TestFuzzTargetsComplete: one fuzz target per typed parser.
func TestFuzzTargetsComplete(t *testing.T) {
	targets := map[string]func(*testing.F){
		"Length": FuzzParseLength, "Area": FuzzParseArea, "Volume": FuzzParseVolume, "Mass": FuzzParseMass,
		"Force": FuzzParseForce, "Pressure": FuzzParsePressure, "AbsolutePressure": FuzzParseAbsolutePressure,
		"Flow": FuzzParseFlow, "Velocity": FuzzParseVelocity, "Displacement": FuzzParseDisplacement,
		"RotationalSpeed": FuzzParseRotationalSpeed, "Torque": FuzzParseTorque, "Power": FuzzParsePower,
		"Energy": FuzzParseEnergy, "Temperature": FuzzParseTemperature,
		"TemperatureDifference": FuzzParseTemperatureDifference, "KinematicViscosity": FuzzParseKinematicViscosity,
		"DynamicViscosity": FuzzParseDynamicViscosity, "Density": FuzzParseDensity,
		"SpecificHeatCapacity": FuzzParseSpecificHeatCapacity, "HeatTransferCoefficient": FuzzParseHeatTransferCoefficient,
		"ThermalConductivity": FuzzParseThermalConductivity, "Stiffness": FuzzParseStiffness,
		"Frequency": FuzzParseFrequency, "Acceleration": FuzzParseAcceleration,
	}
	for _, info := range allTypes {
		if targets[info.name] == nil {
			t.Errorf("no fuzz target for Parse%s", info.name)
		}
	}
}

// FuzzParse fuzzes the dynamic parser: a success is finite, and writing its
// SI value and dimension ("5.5e+06 (kg·m^-1·s^-2)") reads back to the same
// value and dimension.
func FuzzParse(f *testing.F) {
	for _, s := range commonSeeds {
		f.Add(s)
	}
	for i := range unitTable {
		f.Add("2.5 " + unitTable[i].sym)
	}
	f.Fuzz(func(t *testing.T, s string) {
		q, err := Parse(s)
		if err != nil {
			checkParseError(t, "Parse", s, q.Value(), err)
			return
		}
		v := q.Value()
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("Parse(%q) = %g with no error", s, v)
		}
		// The dimension in parentheses is an expression, never a lone
		// spelling: "-1 (K)" is an interval, where "-1 K" would be a
		// temperature below absolute zero.
		si := strconv.FormatFloat(v, 'g', -1, 64) + " (" + q.Dimension().String() + ")"
		back, err := Parse(si)
		if err != nil || back.Value() != v || back.Dimension() != q.Dimension() {
			t.Fatalf("Parse(%q) = %v; %q reads back as %v, %v", s, q, si, back, err)
		}
		if _, err := q.In(q.Dimension().String()); err != nil && !errors.Is(err, ErrReference) && !errors.Is(err, ErrRange) {
			t.Fatalf("Parse(%q).In(%q): %v", s, q.Dimension().String(), err)
		}
	})
}

// checkSpellings: "x sym" and "x alias" parse to exactly x in unit u.
func checkSpellings[T quantity](t *testing.T, parse func(string) (T, error), u *unitDef, x float64, v T) {
	t.Helper()
	num := strconv.FormatFloat(x, 'g', -1, 64)
	for _, sp := range append([]string{u.sym}, u.aliases...) {
		forms := []string{num + " " + sp, num + sp}
		if sp[0] >= '0' && sp[0] <= '9' {
			forms = forms[:1] // "55" + "1/min" would read as the number 551
		}
		for _, s := range forms {
			got, err := parse(s)
			if err != nil {
				t.Errorf("parse %q: %v", s, err)
			} else if got != v {
				t.Errorf("parse %q = %.17g, want %.17g", s, float64(got), float64(v))
			}
		}
	}
}

// parseErr adapts a typed parser to the bad-input table.
func parseErr[T any](f func(string) (T, error)) func(string) (float64, error) {
	return func(s string) (float64, error) {
		v, err := f(s)
		return reflect.ValueOf(v).Float(), err
	}
}

// parseDynamic adapts Parse to the bad-input table.
func parseDynamic(s string) (float64, error) {
	q, err := Parse(s)
	return q.Value(), err
}

func unmarshalPressure(s string) (float64, error) {
	var p Pressure
	err := p.UnmarshalText([]byte(s))
	return float64(p), err
}

var badInputs = []struct {
	fn     string // the Func the error must name
	parse  func(string) (float64, error)
	in     string
	want   error
	detail string // a piece of the message, "" for none
}{
	// Empty or blank.
	{"units.ParsePressure", parseErr(ParsePressure), "", ErrSyntax, "want a decimal number"},
	{"units.ParsePressure", parseErr(ParsePressure), "   ", ErrSyntax, "want a decimal number"},
	// A number without a unit.
	{"units.ParsePressure", parseErr(ParsePressure), "55", ErrSyntax, "missing unit; want a unit of pressure such as bar"},
	{"units.ParseFlow", parseErr(ParseFlow), "1.3  ", ErrSyntax, "missing unit"},
	// A unit without a number.
	{"units.ParsePressure", parseErr(ParsePressure), "bar", ErrSyntax, "want a decimal number"},
	{"units.ParsePressure", parseErr(ParsePressure), "- 5 bar", ErrSyntax, ""},
	{"units.ParseLength", parseErr(ParseLength), ". mm", ErrSyntax, ""},
	// Unknown units: the message suggests the nearest spellings.
	{"units.ParsePressure", parseErr(ParsePressure), "55 mPa", ErrUnknownUnit, `did you mean "MPa"`},
	{"units.ParseFlow", parseErr(ParseFlow), "1.3 gpn", ErrUnknownUnit, `"gpm"`},
	{"units.ParseLength", parseErr(ParseLength), "5 furlong", ErrUnknownUnit, `no registered unit "furlong"`},
	{"units.ParseKinematicViscosity", parseErr(ParseKinematicViscosity), "46 cSr", ErrUnknownUnit, `"cSt"`},
	// The wrong dimension: the message names both.
	{"units.ParsePressure", parseErr(ParsePressure), "55 L/min", ErrDimension, "(volume flow), want kg·m^-1·s^-2 (pressure)"},
	{"units.ParseFlow", parseErr(ParseFlow), "55 bar", ErrDimension, "(pressure)"},
	{"units.ParseTorque", parseErr(ParseTorque), "5 kW", ErrDimension, "(power)"},
	{"units.ParseDisplacement", parseErr(ParseDisplacement), "45 cm³", ErrDimension, "(volume)"},
	{"units.ParseRotationalSpeed", parseErr(ParseRotationalSpeed), "50 Hz", ErrDimension, "(frequency)"},
	{"units.ParseTemperature", parseErr(ParseTemperature), "20 m", ErrDimension, ""},
	{"units.ParseDynamicViscosity", parseErr(ParseDynamicViscosity), "46 cSt", ErrDimension, "(kinematic viscosity)"},
	// Numbers that are not plain decimals.
	{"units.ParsePressure", parseErr(ParsePressure), "NaN bar", ErrSyntax, ""},
	{"units.ParsePressure", parseErr(ParsePressure), "Inf bar", ErrSyntax, ""},
	{"units.ParsePressure", parseErr(ParsePressure), "+Inf psi", ErrSyntax, ""},
	{"units.ParsePressure", parseErr(ParsePressure), "-infinity bar", ErrSyntax, ""},
	{"units.ParsePressure", parseErr(ParsePressure), "0x1p4 bar", ErrSyntax, "hexadecimal"},
	{"units.ParsePressure", parseErr(ParsePressure), "0X10 bar", ErrSyntax, "hexadecimal"},
	{"units.ParsePressure", parseErr(ParsePressure), "1_000 psi", ErrSyntax, "underscores"},
	{"units.ParsePressure", parseErr(ParsePressure), "1e3_0 psi", ErrSyntax, "underscores"},
	// Trailing text.
	{"units.ParsePressure", parseErr(ParsePressure), "55 bar!", ErrSyntax, "unexpected '!'"},
	{"units.ParsePressure", parseErr(ParsePressure), "55 bar 3", ErrSyntax, "unexpected '3'"},
	{"units.ParsePressure", parseErr(ParsePressure), "55 bar)", ErrSyntax, ""},
	{"units.ParsePressure", parseErr(ParsePressure), "55 bar/", ErrSyntax, ""},
	{"units.ParsePressure", parseErr(ParsePressure), "55 bar extra", ErrUnknownUnit, `"extra"`},
	{"units.ParsePressure", parseErr(ParsePressure), "55 bar\t", ErrSyntax, ""},
	// Overflow.
	{"units.ParsePressure", parseErr(ParsePressure), "1e309 bar", ErrRange, "overflows"},
	{"units.ParsePressure", parseErr(ParsePressure), "-1e400 psi", ErrRange, "overflows"},
	{"units.ParsePressure", parseErr(ParsePressure), "1e308 ksi", ErrRange, "not finite"},
	// Gauge and absolute do not mix.
	{"units.ParsePressure", parseErr(ParsePressure), "1 psia", ErrReference, "absolute pressure spelling"},
	{"units.ParsePressure", parseErr(ParsePressure), "2 bara", ErrReference, "explicit ambient"},
	{"units.ParsePressure", parseErr(ParsePressure), "1 atm", ErrReference, ""},
	{"units.ParseAbsolutePressure", parseErr(ParseAbsolutePressure), "1 psi", ErrReference, "gauge pressure spelling"},
	{"units.ParseAbsolutePressure", parseErr(ParseAbsolutePressure), "1 barg", ErrReference, ""},
	{"units.Pressure.UnmarshalText", unmarshalPressure, "1 psia", ErrReference, ""},
	// A point where a difference is wanted, or the reverse.
	{"units.ParseTemperature", parseErr(ParseTemperature), "5 ΔK", ErrReference, "temperature difference"},
	{"units.ParseTemperature", parseErr(ParseTemperature), "5 delta degF", ErrReference, ""},
	// Below absolute zero or absolute vacuum.
	{"units.ParseTemperature", parseErr(ParseTemperature), "-300 °C", ErrRange, "absolute zero"},
	{"units.ParseTemperature", parseErr(ParseTemperature), "-1 K", ErrRange, "absolute zero"},
	{"units.ParseTemperature", parseErr(ParseTemperature), "-460 °F", ErrRange, "absolute zero"},
	{"units.ParseTemperature", parseErr(ParseTemperature), "-0.1 °R", ErrRange, ""},
	{"units.ParseAbsolutePressure", parseErr(ParseAbsolutePressure), "-1 bara", ErrRange, "absolute vacuum"},
	// The dynamic parser refuses the same (it used to accept them).
	{"units.Parse", parseDynamic, "-300 °C", ErrRange, "absolute zero"},
	{"units.Parse", parseDynamic, "-1 K", ErrRange, "absolute zero"},
	{"units.Parse", parseDynamic, "-460 °F", ErrRange, "absolute zero"},
	{"units.Parse", parseDynamic, "-1 bara", ErrRange, "absolute vacuum"},
	{"units.Parse", parseDynamic, "-14.8 psia", ErrRange, "absolute vacuum"},
	{"units.Parse", parseDynamic, "-1 atm", ErrRange, "absolute vacuum"},
	// Unit expressions that are malformed.
	{"units.ParseHeatTransferCoefficient", parseErr(ParseHeatTransferCoefficient), "12 W/(m²·K", ErrSyntax, "missing )"},
	{"units.ParseArea", parseErr(ParseArea), "3 m^", ErrSyntax, "integer exponent"},
	{"units.ParseArea", parseErr(ParseArea), "3 m^99", ErrRange, ""},
	{"units.ParseArea", parseErr(ParseArea), "3 ((((((((((((((((((m))))))))))))))))))^2", ErrSyntax, "nested"},
}

func TestParseBadInput(t *testing.T) {
	for _, c := range badInputs {
		v, err := c.parse(c.in)
		if err == nil {
			t.Errorf("%s(%q) = %g, want an error matching %v", c.fn, c.in, v, c.want)
			continue
		}
		if v != 0 {
			t.Errorf("%s(%q) returned %g with its error, want 0", c.fn, c.in, v)
		}
		if !errors.Is(err, c.want) {
			t.Errorf("%s(%q): %v; want errors.Is %v", c.fn, c.in, err, c.want)
		}
		msg := err.Error()
		if !strings.Contains(msg, strconv.Quote(c.in)) {
			t.Errorf("%s(%q): message does not quote the input: %s", c.fn, c.in, msg)
		}
		if !strings.Contains(msg, c.detail) {
			t.Errorf("%s(%q): message %q lacks %q", c.fn, c.in, msg, c.detail)
		}
		var pe *ParseError
		if !errors.As(err, &pe) {
			t.Errorf("%s(%q): %T is not a *ParseError", c.fn, c.in, err)
			continue
		}
		if pe.Func != c.fn || pe.Input != c.in || pe.Pos < 0 || pe.Pos > len(c.in) {
			t.Errorf("%s(%q): ParseError{Func: %q, Input: %q, Pos: %d}", c.fn, c.in, pe.Func, pe.Input, pe.Pos)
		}
	}
}

// TestParseErrorPosition: the offset points at the problem.
func TestParseErrorPosition(t *testing.T) {
	for _, c := range []struct {
		in  string
		pos int
	}{
		{"55", 2},        // where the unit should start
		{"55 mPa", 3},    // the unknown unit
		{"1_000 psi", 1}, // the underscore
		{"  x bar", 2},   // after leading spaces
		{"55 bar!", 6},   // the trailing character
		{"55 L/min", 3},  // the unit of the wrong dimension
		{"5 kW/furlong", 5},
	} {
		_, err := ParsePressure(c.in)
		var pe *ParseError
		if !errors.As(err, &pe) || pe.Pos != c.pos {
			t.Errorf("ParsePressure(%q): %v; want a ParseError at offset %d", c.in, err, c.pos)
		}
	}
}

// TestExponentLimit: a unit expression whose exponent is beyond the limit
// must fail, whatever its dimension.
func TestExponentLimit(t *testing.T) {
	q, err := Parse("1 (mm/m)^30")
	if !errors.Is(err, ErrRange) {
		t.Errorf("Parse(1 (mm/m)^30) = %g, %v; want ErrRange (exponent above the limit)", q.Value(), err)
	}
}

// TestParseEverySpelling: "x sym" and "x alias", with and without the space,
// parse to exactly x·factor for every spelling of every unit.
func TestParseEverySpelling(t *testing.T) {
	eachUnitValue(t, func(t *testing.T, c typedCase, _ *typeInfo, u *unitDef, x, v float64) { c.spellings(t, u, x, v) })
}
