package units

import (
	"strconv"
	"strings"
	"testing"
)

// Benchmarks for the hot paths (issue 2, item 12). The targets are for
// benchmarks, never timed tests: a typed conversion about as fast as the
// bare multiply (~1 ns, 0 allocs); ParsePressure("55 bar") 0 allocs and
// within 2× of strconv.ParseFloat("55", 64) in the same run;
// Parse("1.3 gal/min") 0 allocs; Append formatting 0 allocs.
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

// BenchmarkConvertIn reads a Flow in gpm through In(unit).
func BenchmarkConvertIn(b *testing.B) {
	b.ReportAllocs()
	var s float64
	for i := 0; b.Loop(); i++ {
		s += Flow(benchInputs[i&7] * 1e-10).In(USGallonPerMinute)
	}
	sinkFloat = s
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
	for _, s := range []string{"1.3 gal/min", "12 kW/(m²·K)", "750 in^3/rev"} {
		b.Run(s, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkQuantity, sinkErr = Parse(s)
			}
		})
	}
}

// BenchmarkAppend measures formatting into a caller's buffer.
func BenchmarkAppend(b *testing.B) {
	buf := make([]byte, 0, 64)
	p := 172.5 * Bar
	b.Run("Pressure.Append", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkBytes = p.Append(buf[:0])
		}
	})
	b.Run("USCustomary.AppendPressure", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkBytes = USCustomary.AppendPressure(buf[:0], p)
		}
	})
	b.Run("Pressure.String", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkBytes = []byte(p.String())
		}
	})
	b.Run("Pressure.MarshalText", func(b *testing.B) {
		b.ReportAllocs()
		for b.Loop() {
			sinkBytes, sinkErr = p.MarshalText()
		}
	})
}

// BenchmarkConvert measures the dynamic conversion between unit expressions.
func BenchmarkConvert(b *testing.B) {
	for _, c := range []struct{ from, to string }{
		{"gpm", "L/min"},
		{"°C", "°F"},
		{"BTU/(h·ft²·°F)", "W/(m²·K)"},
	} {
		b.Run(c.from+"_to_"+c.to, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkFloat, sinkErr = Convert(1.3, c.from, c.to)
			}
		})
	}
}

// TestZeroAllocs backs the zero-allocation claims of the docs and README.
func TestZeroAllocs(t *testing.T) {
	buf := make([]byte, 0, 64)
	p := 172.5 * Bar
	q := 1.3 * USGallonPerMinute
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
		{"USCustomary.AppendPressure", func() { sinkBytes = USCustomary.AppendPressure(buf[:0], p) }},
		{"Metric.AppendFlow", func() { sinkBytes = Metric.AppendFlow(buf[:0], q) }},
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

// BenchmarkParseUnknownUnit measures the error path for an unknown unit,
// whose message suggests the nearest spellings. Its cost grows with the
// length of the unknown word times the size of the registry (see the
// report on nearestSpellings): untrusted text should be bounded in length.
func BenchmarkParseUnknownUnit(b *testing.B) {
	for _, n := range []int{8, 1000} {
		s := "55 " + strings.Repeat("x", n)
		b.Run(strconv.Itoa(n)+"_letters", func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkPressure, sinkErr = ParsePressure(s)
			}
		})
	}
}
