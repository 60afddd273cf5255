package units

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"testing"
)

// Fuzz targets for every parser and for text unmarshalling. Their seed
// corpora run in every go test; .ci/run fuzzes each for a short time:
//
//	go test -run=^$ -fuzz=^FuzzParsePressure$ -fuzztime=20s ./units
//
// Properties: no panic; an error matches a sentinel and quotes the input,
// and comes with a zero value; a success is finite, and its MarshalText
// reads back to the same bits, and its String reads back.

// commonSeeds are inputs every parser sees, good and bad.
var commonSeeds = []string{
	"", " ", "55", "55 bar", "3000 psi", "1.3 gal/min", "20 °C", "68 degF", "5 ΔK",
	"750 in^3/rev", "12 kW/(m²·K)", "1 BTU/(lbm·°F)", "0.5 lbf·ft", "  3.3e-5 in³/rev  ",
	"-0 K", "1e309 bar", "1e308 ksi", "NaN bar", "Inf psi", "0x10 bar", "1_000 psi",
	"-300 °C", "1 psia", "1 atm", "55 bar!", "55 bar extra", "1 (in/m)^999", "12 W/(m²·K",
	"1 m⁻²", "1 m^-24", "1 ((m))", "1 µm", "1 um", "5e-324 m", "-1.7976931348623157e308 Pa",
	".5 mm", "5. mm", "+5 mm", "1e-400 bar", "1 mPa", "1 kgf/cm2", "1 \"Hg", "1 ℃", "9 min⁻¹",
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
	for _, sentinel := range []error{ErrSyntax, ErrUnknownUnit, ErrDimension, ErrRange, ErrReference} {
		known = known || errors.Is(err, sentinel)
	}
	if !known {
		t.Errorf("%s(%q): %v matches no sentinel", fn, s, err)
	}
	if !strings.Contains(err.Error(), strconv.Quote(s)) {
		t.Errorf("%s(%q): %v does not quote the input", fn, s, err)
	}
}

// caseByName returns the typed case and description of quantity type name.
func caseByName(name string) (typedCase, *typeInfo) {
	for _, c := range typedCases {
		if c.name == name {
			return c, typeByName(name)
		}
	}
	panic("no quantity type " + name) // a typo in a fuzz target
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

func FuzzParseLength(f *testing.F)           { fuzzTyped(f, "Length") }
func FuzzParseArea(f *testing.F)             { fuzzTyped(f, "Area") }
func FuzzParseVolume(f *testing.F)           { fuzzTyped(f, "Volume") }
func FuzzParseMass(f *testing.F)             { fuzzTyped(f, "Mass") }
func FuzzParseForce(f *testing.F)            { fuzzTyped(f, "Force") }
func FuzzParsePressure(f *testing.F)         { fuzzTyped(f, "Pressure") }
func FuzzParseAbsolutePressure(f *testing.F) { fuzzTyped(f, "AbsolutePressure") }
func FuzzParseFlow(f *testing.F)             { fuzzTyped(f, "Flow") }
func FuzzParseVelocity(f *testing.F)         { fuzzTyped(f, "Velocity") }
func FuzzParseDisplacement(f *testing.F)     { fuzzTyped(f, "Displacement") }
func FuzzParseRotationalSpeed(f *testing.F)  { fuzzTyped(f, "RotationalSpeed") }
func FuzzParseTorque(f *testing.F)           { fuzzTyped(f, "Torque") }
func FuzzParsePower(f *testing.F)            { fuzzTyped(f, "Power") }
func FuzzParseEnergy(f *testing.F)           { fuzzTyped(f, "Energy") }
func FuzzParseTemperature(f *testing.F)      { fuzzTyped(f, "Temperature") }
func FuzzParseTemperatureDifference(f *testing.F) {
	fuzzTyped(f, "TemperatureDifference")
}
func FuzzParseKinematicViscosity(f *testing.F) { fuzzTyped(f, "KinematicViscosity") }
func FuzzParseDynamicViscosity(f *testing.F)   { fuzzTyped(f, "DynamicViscosity") }
func FuzzParseDensity(f *testing.F)            { fuzzTyped(f, "Density") }
func FuzzParseSpecificHeatCapacity(f *testing.F) {
	fuzzTyped(f, "SpecificHeatCapacity")
}
func FuzzParseHeatTransferCoefficient(f *testing.F) {
	fuzzTyped(f, "HeatTransferCoefficient")
}
func FuzzParseThermalConductivity(f *testing.F) { fuzzTyped(f, "ThermalConductivity") }
func FuzzParseStiffness(f *testing.F)           { fuzzTyped(f, "Stiffness") }
func FuzzParseFrequency(f *testing.F)           { fuzzTyped(f, "Frequency") }
func FuzzParseAcceleration(f *testing.F)        { fuzzTyped(f, "Acceleration") }

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

// fuzzUnmarshal fuzzes UnmarshalText of one type: it must agree with the
// typed parser, and what it accepts must marshal back to the same bits.
func fuzzUnmarshal(f *testing.F, name string) {
	c, info := caseByName(name)
	for _, s := range seedsFor(info) {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, text []byte) {
		v, err := c.unmarshal(text)
		pv, perr := c.parse(string(text))
		if (err == nil) != (perr == nil) || (err == nil && math.Float64bits(v) != math.Float64bits(pv)) {
			t.Fatalf("%s.UnmarshalText(%q) = %g, %v; Parse%s gives %g, %v", name, text, v, err, name, pv, perr)
		}
		if err != nil {
			return // the parse error was checked by the typed target's properties
		}
		checkTypedValue(t, c, info, string(text), v)
	})
}

func FuzzUnmarshalTextPressure(f *testing.F)         { fuzzUnmarshal(f, "Pressure") }
func FuzzUnmarshalTextAbsolutePressure(f *testing.F) { fuzzUnmarshal(f, "AbsolutePressure") }
func FuzzUnmarshalTextFlow(f *testing.F)             { fuzzUnmarshal(f, "Flow") }
func FuzzUnmarshalTextTemperature(f *testing.F)      { fuzzUnmarshal(f, "Temperature") }
func FuzzUnmarshalTextKinematicViscosity(f *testing.F) {
	fuzzUnmarshal(f, "KinematicViscosity")
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

// FuzzConvert: no panic; a success is finite; an error matches a sentinel.
func FuzzConvert(f *testing.F) {
	f.Add(1.0, "gpm", "L/min")
	f.Add(20.0, "°C", "°F")
	f.Add(1.0, "hp", "psi*gpm")
	f.Add(1.0, "atm", "bar")
	f.Add(1e308, "ksi", "Pa")
	f.Add(-500.0, "°F", "K")
	f.Add(3.0, "BTU/(h·ft²·°F)", "W/(m²·K)")
	f.Add(math.Inf(1), "bar", "psi")
	f.Add(1.0, "1", "(in/m)^-24")
	f.Add(-300.0, "°C", "K")
	f.Add(-1e6, "Pa", "bara")
	f.Add(5.0, "ΔK", "°C")
	f.Fuzz(func(t *testing.T, v float64, from, to string) {
		got, err := Convert(v, from, to)
		if err != nil {
			known := false
			for _, sentinel := range []error{ErrSyntax, ErrUnknownUnit, ErrDimension, ErrRange, ErrReference} {
				known = known || errors.Is(err, sentinel)
			}
			if !known || got != 0 {
				t.Fatalf("Convert(%g, %q, %q) = %g, %v", v, from, to, got, err)
			}
			return
		}
		if math.IsNaN(got) || math.IsInf(got, 0) {
			t.Fatalf("Convert(%g, %q, %q) = %g with no error", v, from, to, got)
		}
	})
}
