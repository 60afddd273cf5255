package units

import (
	"encoding"
	"fmt"
	"math"
	"math/rand/v2"
	"testing"
)

// caseByName returns the typed case and description of quantity type name.
func caseByName(name string) (typedCase, *typeInfo) {
	for _, c := range typedCases {
		if c.name == name {
			return c, typeByName(name)
		}
	}
	panic("no quantity type " + name) // a typo in a fuzz target
}

// typeByName returns the description of quantity type name, or nil.
func typeByName(name string) *typeInfo {
	for _, info := range allTypes {
		if info.name == name {
			return info
		}
	}
	return nil
}

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

// typedCase ties a quantity type to its parser, for the tests and fuzz
// targets that run over every type.
type typedCase struct {
	name      string
	text      func(t *testing.T, v float64)                             // MarshalText and JSON round trips (text_test.go)
	spellings func(t *testing.T, u *unitDef, x, v float64)              // "x sym" and "x alias" parse to v (parse_test.go)
	strBack   func(t *testing.T, v float64, metric *unitDef)            // String reads back (format_test.go)
	system    func(t *testing.T, info *typeInfo, u *unitDef, v float64) // a System in unit u reads back (system_test.go)
	parse     func(s string) (float64, error)
	marshal   func(v float64) ([]byte, error)
	unmarshal func(text []byte) (float64, error)
	str       func(v float64) string
	sprintf   func(format string, v float64) string
	zero      any // T(0), for reflection on the type
}

func typed[T quantity, P textQuantity[T]](name string, parse func(string) (T, error)) typedCase {
	return typedCase{
		name: name,
		text: func(t *testing.T, v float64) {
			t.Helper()
			checkMarshal[T, P](t, T(v))
			checkJSON(t, T(v))
		},
		spellings: func(t *testing.T, u *unitDef, x, v float64) { t.Helper(); checkSpellings(t, parse, u, x, T(v)) },
		strBack:   func(t *testing.T, v float64, metric *unitDef) { t.Helper(); checkString(t, parse, T(v), metric) },
		system: func(t *testing.T, info *typeInfo, u *unitDef, v float64) {
			t.Helper()
			checkSystem(t, parse, info, u, T(v))
		},
		parse:   func(s string) (float64, error) { v, err := parse(s); return float64(v), err },
		marshal: func(v float64) ([]byte, error) { return T(v).MarshalText() },
		unmarshal: func(text []byte) (float64, error) {
			var v T
			err := P(&v).UnmarshalText(text)
			return float64(v), err
		},
		str:     func(v float64) string { return T(v).String() },
		sprintf: func(format string, v float64) string { return fmt.Sprintf(format, T(v)) },
		zero:    T(0),
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

// eachUnitValue calls f, for every quantity type, every unit that fits it
// and every number x of roundTripNumbers, with v = x in that unit as an SI
// value; values out of the type's range are left out. It fails when a type
// has fewer than two units.
func eachUnitValue(t *testing.T, f func(t *testing.T, c typedCase, info *typeInfo, u *unitDef, x, v float64)) {
	for i, c := range typedCases {
		info := allTypes[i]
		t.Run(c.name, func(t *testing.T) {
			units := 0
			for j := range unitTable {
				u := &unitTable[j]
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
					f(t, c, info, u, x, v)
				}
			}
			if units < 2 {
				t.Errorf("%s: only %d units", info.name, units)
			}
		})
	}
}

// metricUnit returns the unit String uses for info: the Metric system's.
func metricUnit(info *typeInfo) *unitDef {
	m := Metric()
	for i, t := range allTypes {
		if t == info {
			return m.unit(i, 0) // a slot of System.units per type, in the order of allTypes
		}
	}
	return nil
}

// Benchmarks for the hot paths. The targets are for benchmarks, never timed
// tests, and are ratios within one run: a typed conversion costs no more
// than the b.Loop harness with a bare multiply (BenchmarkFloor);
// ParsePressure("55 bar") 0 allocs and within 2× of strconv.ParseFloat("55",
// 64); Parse of a registered spelling ("1.3 gal/min") within 2× of
// ParsePressure; Convert between two registered spellings about 50 ns or
// less, a four-name expression about 120 ns (on the README's machine); the
// letter-case fallback nothing on an exact match (BenchmarkParseCaseFallback);
// Append formatting 0 allocs. The parse, format and convert benchmarks are in
// their own test files.
//
//	go test -run=^$ -bench=. -benchmem ./units

// Sinks keep the compiler from removing the work.
var (
	sinkFloat    float64
	sinkPressure Pressure
	sinkQuantity Quantity
	sinkBytes    []byte
	sinkErr      error
)

// benchInputs varies the operand so the multiply cannot be folded.
var benchInputs = [8]float64{55e5, 21e6, 3.4e5, 1.2e7, 9.9e4, 2.5e5, 7.7e6, 1e5}

// BenchmarkConvertTyped reads a Pressure in bar through its accessor.
func BenchmarkConvertTyped(b *testing.B) {
	b.ReportAllocs()
	var s float64
	for i := 0; b.Loop(); i++ {
		p := Pressure(benchInputs[i&7])
		s += p.Bar()
	}
	sinkFloat = s
}

// BenchmarkConvertBare is the same arithmetic on a bare float64.
func BenchmarkConvertBare(b *testing.B) {
	b.ReportAllocs()
	var s float64
	for i := 0; b.Loop(); i++ {
		s += benchInputs[i&7] / 1e5
	}
	sinkFloat = s
}

// BenchmarkFloor measures, in one run, what a typed conversion is made of:
// the b.Loop harness with the operand load and the sum (harness), the same
// with a bare multiply and a bare divide, and a typed p.PSI(), which is one
// divide by a constant. A typed accessor costs the harness plus one divide;
// compare the sub-benchmarks with each other, not across runs.
func BenchmarkFloor(b *testing.B) {
	b.Run("harness", func(b *testing.B) {
		var s float64
		for i := 0; b.Loop(); i++ {
			s += benchInputs[i&7]
		}
		sinkFloat = s
	})
	b.Run("bare_multiply", func(b *testing.B) {
		var s float64
		for i := 0; b.Loop(); i++ {
			s += benchInputs[i&7] * 1.450377377302092e-4
		}
		sinkFloat = s
	})
	b.Run("bare_divide", func(b *testing.B) {
		var s float64
		for i := 0; b.Loop(); i++ {
			s += benchInputs[i&7] / 6894.757293168361
		}
		sinkFloat = s
	})
	b.Run("typed_PSI", func(b *testing.B) {
		var s float64
		for i := 0; b.Loop(); i++ {
			s += Pressure(benchInputs[i&7]).PSI()
		}
		sinkFloat = s
	})
}

// BenchmarkConvertIn reads a Flow in gpm through In(unit).
func BenchmarkConvertIn(b *testing.B) {
	b.ReportAllocs()
	var s float64
	for i := 0; b.Loop(); i++ {
		s += Flow(benchInputs[i&7] * 1e-10).In(USGallonPerMinute)
	}
	sinkFloat = s
}

// TestZeroAllocs backs the zero-allocation claims of the docs and README.
func TestZeroAllocs(t *testing.T) {
	buf := make([]byte, 0, 64)
	p := 172.5 * Bar
	q := 1.3 * USGallonPerMinute
	m, us := Metric(), USCustomary()
	for _, c := range []struct {
		name string
		f    func()
	}{
		{`ParsePressure("55 bar")`, func() { sinkPressure, sinkErr = ParsePressure("55 bar") }},
		{`ParsePressure("3000 psig")`, func() { sinkPressure, sinkErr = ParsePressure("3000 psig") }},
		{`Parse("1.3 gal/min")`, func() { sinkQuantity, sinkErr = Parse("1.3 gal/min") }},
		{`Parse("12 kW/(m²·K)")`, func() { sinkQuantity, sinkErr = Parse("12 kW/(m²·K)") }},
		{`Convert(1.3, "gpm", "L/min")`, func() { sinkFloat, sinkErr = Convert(1.3, "gpm", "L/min") }},
		{"p.Append(buf[:0])", func() { sinkBytes = p.Append(buf[:0]) }},
		{"USCustomary.AppendPressure", func() { sinkBytes = us.AppendPressure(buf[:0], p) }},
		{"Metric.AppendFlow", func() { sinkBytes = m.AppendFlow(buf[:0], q) }},
		{"p.Bar()", func() { sinkFloat = p.Bar() }},
		{"p.PSI()", func() { sinkFloat = p.PSI() }},
		{"q.LitresPerMinute()", func() { sinkFloat = q.LitresPerMinute() }},
		{"q.In(USGallonPerMinute)", func() { sinkFloat = q.In(USGallonPerMinute) }},
		{"TemperatureFromCelsius(40).Fahrenheit()", func() { sinkFloat = TemperatureFromCelsius(40).Fahrenheit() }},
	} {
		if n := testing.AllocsPerRun(100, c.f); n != 0 {
			t.Errorf("%s: %v allocs per run, want 0", c.name, n)
		}
	}
}
