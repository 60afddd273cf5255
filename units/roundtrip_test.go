package units

import (
	"encoding"
	"encoding/json"
	"errors"
	"fmt"
	"math"
	"math/big"
	"math/rand/v2"
	"reflect"
	"strconv"
	"strings"
	"testing"
)

// quantity is what every generated quantity type implements.
type quantity interface {
	~float64
	String() string
	MarshalText() ([]byte, error)
}

// textQuantity is a pointer to a quantity, which unmarshals text.
type textQuantity[T quantity] interface {
	*T
	encoding.TextUnmarshaler
}

// box is a struct holding one quantity, for the JSON round trip.
type box[T any] struct {
	V T `json:"v"`
}

// typedCase ties a quantity type to its parser, for the tests and fuzz
// targets that run over every type.
type typedCase struct {
	name      string
	check     func(t *testing.T, info *typeInfo)
	parse     func(s string) (float64, error)
	marshal   func(v float64) ([]byte, error)
	unmarshal func(text []byte) (float64, error)
	str       func(v float64) string
	sprintf   func(format string, v float64) string
}

func typed[T quantity, P textQuantity[T]](name string, parse func(string) (T, error)) typedCase {
	return typedCase{
		name:    name,
		check:   roundTripType[T, P](parse),
		parse:   func(s string) (float64, error) { v, err := parse(s); return float64(v), err },
		marshal: func(v float64) ([]byte, error) { return T(v).MarshalText() },
		unmarshal: func(text []byte) (float64, error) {
			var v T
			err := P(&v).UnmarshalText(text)
			return float64(v), err
		},
		str:     func(v float64) string { return T(v).String() },
		sprintf: func(format string, v float64) string { return fmt.Sprintf(format, T(v)) },
	}
}

// typedCases lists every quantity type (TestTypedCasesComplete keeps it so).
var typedCases = []typedCase{
	typed[Length]("Length", ParseLength),
	typed[Area]("Area", ParseArea),
	typed[Volume]("Volume", ParseVolume),
	typed[Mass]("Mass", ParseMass),
	typed[Force]("Force", ParseForce),
	typed[Pressure]("Pressure", ParsePressure),
	typed[AbsolutePressure]("AbsolutePressure", ParseAbsolutePressure),
	typed[Flow]("Flow", ParseFlow),
	typed[Velocity]("Velocity", ParseVelocity),
	typed[Displacement]("Displacement", ParseDisplacement),
	typed[RotationalSpeed]("RotationalSpeed", ParseRotationalSpeed),
	typed[Torque]("Torque", ParseTorque),
	typed[Power]("Power", ParsePower),
	typed[Energy]("Energy", ParseEnergy),
	typed[Temperature]("Temperature", ParseTemperature),
	typed[TemperatureDifference]("TemperatureDifference", ParseTemperatureDifference),
	typed[KinematicViscosity]("KinematicViscosity", ParseKinematicViscosity),
	typed[DynamicViscosity]("DynamicViscosity", ParseDynamicViscosity),
	typed[Density]("Density", ParseDensity),
	typed[SpecificHeatCapacity]("SpecificHeatCapacity", ParseSpecificHeatCapacity),
	typed[HeatTransferCoefficient]("HeatTransferCoefficient", ParseHeatTransferCoefficient),
	typed[ThermalConductivity]("ThermalConductivity", ParseThermalConductivity),
	typed[Stiffness]("Stiffness", ParseStiffness),
	typed[Frequency]("Frequency", ParseFrequency),
	typed[Acceleration]("Acceleration", ParseAcceleration),
}

func TestTypedCasesComplete(t *testing.T) {
	if len(typedCases) != len(allTypes) {
		t.Fatalf("%d typed cases for %d quantity types", len(typedCases), len(allTypes))
	}
	for i, c := range typedCases {
		if allTypes[i].name != c.name {
			t.Errorf("typed case %d is %s, quantity type %d is %s", i, c.name, i, allTypes[i].name)
		}
	}
}

// TestRoundTrip runs, for every unit of every type and a spread of values:
// MarshalText → UnmarshalText (bit-identical), JSON in a struct
// (bit-identical), "x sym" and "x alias" → ParseX (exactly x·factor),
// String → ParseX (within the 4 significant digits String prints) and
// System.FormatX in that unit → ParseX (within 4 significant digits).
func TestRoundTrip(t *testing.T) {
	for i, c := range typedCases {
		t.Run(c.name, func(t *testing.T) { c.check(t, allTypes[i]) })
	}
}

// roundTripNumbers are the numbers of each unit tried: round, fractional,
// tiny, huge, negative, plus log-uniform random ones of both signs.
func roundTripNumbers() []float64 {
	xs := []float64{0, 1, 0.1, 55, 1234.5678, 3.3e-5, 7.25e9, 1.0 / 3, -2.5, 2.2e-300, 4e300}
	r := rand.New(rand.NewPCG(1, 2))
	for range 60 {
		x := math.Pow(10, -8+16*r.Float64())
		if r.IntN(4) == 0 {
			x = -x
		}
		xs = append(xs, x)
	}
	return xs
}

func roundTripType[T quantity, P textQuantity[T]](parse func(string) (T, error)) func(*testing.T, *typeInfo) {
	return func(t *testing.T, info *typeInfo) {
		units := 0
		for i := range unitTable {
			u := &unitTable[i]
			if !fits(u, info) {
				continue
			}
			units++
			for _, x := range roundTripNumbers() {
				v := float64(x * u.factor)
				if info.useOffset {
					v += u.offset
				}
				if math.IsInf(v, 0) || info.hasMin && v < info.min {
					continue
				}
				checkMarshal[T, P](t, T(v))
				checkJSON(t, T(v))
				checkSpellings(t, parse, u, x, T(v))
				checkString(t, parse, T(v), metricUnit(info))
				checkSystem(t, parse, info, u, T(v))
			}
		}
		if units < 2 {
			t.Errorf("%s: only %d units", info.name, units)
		}
		// Extremes and signed zero, for the text form only.
		for _, v := range []float64{math.MaxFloat64, -math.MaxFloat64, math.SmallestNonzeroFloat64, -math.SmallestNonzeroFloat64, 0, math.Copysign(0, -1)} {
			if info.hasMin && v < info.min {
				continue
			}
			checkMarshal[T, P](t, T(v))
			checkJSON(t, T(v))
		}
	}
}

// marshalFallbackBroken detects a past defect of marshalText: its SI
// fallback appended the SI number to the buffer that still held the last
// trial digits, so Area(1e-7) (0.1 mm²) marshalled to
// "9.9999999999999980e-041e-07 m²". FuzzParseFlow found it (1091 m³/h).
var marshalFallbackBroken = func() bool {
	b, err := Area(1e-7).MarshalText()
	if err != nil {
		return true
	}
	var back Area
	return back.UnmarshalText(b) != nil || back != Area(1e-7)
}()

// needsSIFallback reports whether MarshalText cannot write v in the metric
// unit u and must fall back to the SI unit: no decimal of 1–17 significant
// digits of v in u reads back, through the parser's arithmetic, to v.
func needsSIFallback(v float64, u *unitDef, info *typeInfo) bool {
	x := fromSI(v, u)
	if math.IsInf(x, 0) {
		return true
	}
	for prec := 1; prec <= 17; prec++ {
		y, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', prec, 64), 64)
		back := float64(y * u.factor)
		if info.useOffset {
			back += u.offset
		}
		if err == nil && back == v {
			return false
		}
	}
	return true
}

// TestMarshalTextSIFallback checks values that MarshalText must write in the
// SI unit because no decimal in the metric unit reads back exactly.
func TestMarshalTextSIFallback(t *testing.T) {
	if marshalFallbackBroken {
		text, _ := Area(1e-7).MarshalText()
		t.Fatalf("regression: the SI fallback of marshalText appends to the last trial digits (Area(1e-7).MarshalText() = %q)", text)
	}
	for _, v := range []float64{1e-7, 9.9999999999999995e-08, 4.702378306500765e-14, 0.0002150533333333333} {
		if !needsSIFallback(v, metricUnit(&typeArea), &typeArea) {
			t.Errorf("Area(%g) does not exercise the SI fallback", v)
		}
		checkMarshal[Area](t, Area(v))
		checkJSON(t, Area(v))
	}
}

// metricUnit returns the unit String uses for info: the Metric system's.
func metricUnit(info *typeInfo) *unitDef {
	s := Metric
	return s.unit(reflect.ValueOf(s).FieldByName(info.name).String(), info, 0)
}

// checkMarshal: MarshalText, then UnmarshalText, restores the bits.
func checkMarshal[T quantity, P textQuantity[T]](t *testing.T, v T) {
	t.Helper()
	text, err := v.MarshalText()
	if err != nil {
		t.Errorf("%T(%g).MarshalText: %v", v, float64(v), err)
		return
	}
	var back T
	if err := P(&back).UnmarshalText(text); err != nil {
		t.Errorf("%T(%g): UnmarshalText(%q): %v", v, float64(v), text, err)
		return
	}
	if math.Float64bits(float64(back)) != math.Float64bits(float64(v)) {
		t.Errorf("%T(%.17g) → %q → %.17g: bits differ", v, float64(v), text, float64(back))
	}
}

// checkJSON: a struct field marshals as a JSON string and reads back.
func checkJSON[T quantity](t *testing.T, v T) {
	t.Helper()
	b, err := json.Marshal(box[T]{v})
	if err != nil {
		t.Errorf("json.Marshal(%T(%g)): %v", v, float64(v), err)
		return
	}
	if !strings.HasPrefix(string(b), `{"v":"`) {
		t.Errorf("json.Marshal(%T(%g)) = %s, want the value as a JSON string", v, float64(v), b)
	}
	var back box[T]
	if err := json.Unmarshal(b, &back); err != nil {
		t.Errorf("json.Unmarshal(%s): %v", b, err)
		return
	}
	if math.Float64bits(float64(back.V)) != math.Float64bits(float64(v)) {
		t.Errorf("%T(%.17g) → %s → %.17g: bits differ", v, float64(v), b, float64(back.V))
	}
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

// within4 reports whether b, read back from a value printed with 4
// significant digits, is within the rounding of a (both in the printed
// unit u): half a unit in the 4th digit, plus 4 ulp of the SI value for the
// conversion to and from u.
func within4(a, b, siValue float64, u *unitDef) bool {
	ulp := math.Nextafter(math.Abs(siValue), math.Inf(1)) - math.Abs(siValue)
	return math.Abs(a-b) <= 5e-4*math.Abs(a)+4*ulp/u.factor
}

// checkString: String prints the metric unit with 4 significant digits, and
// parsing it gives the value back to that precision.
func checkString[T quantity](t *testing.T, parse func(string) (T, error), v T, metric *unitDef) {
	t.Helper()
	s := v.String()
	if !strings.HasSuffix(s, " "+metric.sym) {
		t.Errorf("%T(%g).String() = %q, want the unit %s", v, float64(v), s, metric.sym)
	}
	back, err := parse(s)
	if err != nil {
		t.Errorf("%T(%.17g).String() = %q does not parse: %v", v, float64(v), s, err)
		return
	}
	if a, b := fromSI(float64(v), metric), fromSI(float64(back), metric); !within4(a, b, float64(v), metric) {
		t.Errorf("%T(%.17g).String() = %q reads back as %.17g %s", v, float64(v), s, b, metric.sym)
	}
}

// checkSystem formats v with a System whose unit for the type is u (through
// reflection, so that one helper covers every type) and parses it back.
func checkSystem[T quantity](t *testing.T, parse func(string) (T, error), info *typeInfo, u *unitDef, v T) {
	t.Helper()
	s := USCustomary
	s.Name = "test"
	sv := reflect.ValueOf(&s)
	sv.Elem().FieldByName(info.name).SetString(u.sym)
	if err := s.Check(); err != nil {
		t.Errorf("System with %s = %q: %v", info.name, u.sym, err)
		return
	}
	out := sv.MethodByName("Format" + info.name).Call([]reflect.Value{reflect.ValueOf(v)})[0].String()
	appended := sv.MethodByName("Append" + info.name).Call([]reflect.Value{reflect.ValueOf([]byte("x")), reflect.ValueOf(v)})[0].Bytes()
	if string(appended) != "x"+out {
		t.Errorf("Append%s = %q, Format%s = %q", info.name, appended, info.name, out)
	}
	if !strings.HasSuffix(out, " "+u.sym) {
		t.Errorf("Format%s(%.17g) in %s = %q", info.name, float64(v), u.sym, out)
	}
	back, err := parse(out)
	if err != nil {
		t.Errorf("Format%s(%.17g) in %s = %q does not parse: %v", info.name, float64(v), u.sym, out, err)
		return
	}
	if a, b := fromSI(float64(v), u), fromSI(float64(back), u); !within4(a, b, float64(v), u) {
		t.Errorf("Format%s(%.17g) = %q reads back as %.17g %s", info.name, float64(v), out, b, u.sym)
	}
}

// TestTemperatureNegativeZeroText: −0 K is a valid Temperature (not below
// absolute zero), so its text form should restore the sign bit too.
func TestTemperatureNegativeZeroText(t *testing.T) {
	negZero := Temperature(math.Copysign(0, -1))
	text, _ := negZero.MarshalText()
	var back Temperature
	if err := back.UnmarshalText(text); err == nil && !math.Signbit(float64(back)) {
		t.Fatalf("regression: Temperature(-0).MarshalText() = %q reads back as +0 K", text)
	}
	checkMarshal[Temperature](t, negZero)
}

// TestFormatAbsoluteZero: every temperature a System prints reads back.
func TestFormatAbsoluteZero(t *testing.T) {
	for _, s := range []System{Metric, USCustomary} {
		for _, v := range []Temperature{0, 1e-9, 0.01} {
			out := s.FormatTemperature(v)
			back, err := ParseTemperature(out)
			if err != nil {
				t.Errorf("%s.FormatTemperature(%g K) = %q: %v", s.Name, float64(v), out, err)
				continue
			}
			if math.Abs(float64(back-v)) > 0.06 { // half a unit in the 4th digit of 459.7 °F, in K
				t.Errorf("%s.FormatTemperature(%g K) = %q reads back as %g K", s.Name, float64(v), out, float64(back))
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

// TestQuantityConversionErrors: the dynamic layer names both sides.
func TestQuantityConversionErrors(t *testing.T) {
	flow, _ := Parse("55 L/min")
	if _, err := flow.Pressure(); !errors.Is(err, ErrDimension) ||
		!strings.Contains(err.Error(), "m^3·s^-1") || !strings.Contains(err.Error(), "Pressure") {
		t.Errorf("Parse(55 L/min).Pressure(): %v; want ErrDimension naming both dimensions", err)
	}
	psia, _ := Parse("14.7 psia")
	if _, err := psia.Pressure(); !errors.Is(err, ErrReference) {
		t.Errorf("Parse(14.7 psia).Pressure(): %v; want ErrReference", err)
	}
	if a, err := psia.AbsolutePressure(); err != nil || a != 14.7*PSIAbsolute {
		t.Errorf("Parse(14.7 psia).AbsolutePressure() = %v, %v", a, err)
	}
	for _, c := range []struct {
		v        float64
		from, to string
		want     error
	}{
		{1, "psi", "L/min", ErrDimension},
		{1, "atm", "bar", ErrReference},
		{1, "psig", "psia", ErrReference},
		{1, "furlong", "m", ErrUnknownUnit},
		{1, "m", "furlong", ErrUnknownUnit},
		{1, "m/", "m", ErrSyntax},
		{math.NaN(), "bar", "psi", ErrRange},
		{math.Inf(1), "bar", "psi", ErrRange},
		{1e308, "ksi", "Pa", ErrRange},
	} {
		got, err := Convert(c.v, c.from, c.to)
		if !errors.Is(err, c.want) || got != 0 {
			t.Errorf("Convert(%g, %q, %q) = %g, %v; want %v", c.v, c.from, c.to, got, err, c.want)
		}
	}
}

// TestStringHugeValues checks that a finite value too large for the trade
// unit (1e306 Pa·s is +Inf in mPa·s) prints in the coherent SI unit and reads
// back, for every type and both signs. Found by FuzzParseDynamicViscosity.
func TestStringHugeValues(t *testing.T) {
	for _, c := range typedCases {
		info := typeByName(c.name)
		for _, v := range []float64{1e306, -1e306, 1e300} {
			if info.hasMin && v < info.min {
				continue
			}
			str := c.str(v)
			back, err := c.parse(str)
			if err != nil {
				t.Errorf("%s(%g).String() = %q: does not parse: %v", c.name, v, str, err)
				continue
			}
			if math.Abs(back-v) > 5e-4*math.Abs(v) {
				t.Errorf("%s(%g).String() = %q reads back as %g", c.name, v, str, back)
			}
		}
	}
}

// TestConvertTemperatureScales checks Convert between every pair of
// temperature scales against the exact definitions °F = 1.8·°C + 32,
// K = °C + 273.15, °R = 1.8·°C + 491.67 (NIST SP 811, B.9), evaluated on the
// exact value of the input float with math/big and rounded once: readings
// from −100 to 1100 in steps of 0.1 convert to the correctly rounded result.
// So 20 °C is 68 °F, not 67.99999999999993. Readings below absolute zero
// (−100 K, −100 °R) are ErrRange.
func TestConvertTemperatureScales(t *testing.T) {
	type scale struct {
		sym     string
		a, b, d int64 // reading = (a·°C + b)/d
	}
	scales := []scale{{"°C", 1, 0, 1}, {"°F", 9, 160, 5}, {"K", 100, 27315, 100}, {"°R", 180, 49167, 100}}
	exact := func(x float64, from, to scale) float64 {
		c := new(big.Rat).SetFloat64(x) // °C = (d·x − b)/a
		c.Mul(c, big.NewRat(from.d, 1)).Sub(c, big.NewRat(from.b, 1)).Quo(c, big.NewRat(from.a, 1))
		c.Mul(c, big.NewRat(to.a, 1)).Add(c, big.NewRat(to.b, 1)).Quo(c, big.NewRat(to.d, 1))
		f, _ := c.Float64()
		return f
	}
	bad := 0
	for _, from := range scales {
		for _, to := range scales {
			for i := -1000; i <= 11000; i++ {
				x := float64(i) / 10
				got, err := Convert(x, from.sym, to.sym)
				if exact(x, from, scales[2]) < 0 { // below absolute zero
					if !errors.Is(err, ErrRange) || got != 0 {
						t.Errorf("Convert(%v, %s, %s) = %v, %v; want ErrRange (below absolute zero)", x, from.sym, to.sym, got, err)
					}
					continue
				}
				if want := exact(x, from, to); err != nil || got != want {
					if bad++; bad <= 10 {
						t.Errorf("Convert(%v, %s, %s) = %v, %v; want %v", x, from.sym, to.sym, got, err, want)
					}
				}
			}
		}
	}
	if bad > 0 {
		t.Errorf("%d conversions not correctly rounded", bad)
	}
	if got, _ := Convert(20, "°C", "°F"); got != 68 {
		t.Errorf("Convert(20, °C, °F) = %v, want 68", got)
	}
}
