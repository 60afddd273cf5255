package units

import (
	"fmt"
	"math"
	"strings"
	"testing"
)

// formatVerbs are the fmt verbs every quantity's text must read back from.
var formatVerbs = []string{"%v", "%s", "%g", "%e", "%f", "%.3g", "%+.2e", "%12.1f", "%-12.3g", "%G", "%E", "%.0e", "%.1g", "%+g"}

// readsBack reports whether s, the text of v, parses back to a finite
// value of v's sign (or zero).
func readsBack(c typedCase, v float64, s string) error {
	back, err := c.parse(strings.TrimSpace(s))
	if err != nil {
		return err
	}
	if math.IsInf(back, 0) || math.IsNaN(back) {
		return fmt.Errorf("reads back as %g", back)
	}
	if v != 0 && math.Signbit(back) != math.Signbit(v) && back != 0 {
		return fmt.Errorf("reads back as %g, sign flipped", back)
	}
	return nil
}

// TestFormatPlusFlagNegative: %+e of −0 (or of a tiny negative value that
// rounds to −0 in the trade unit) printed "+-0.00e+00 bar", which no parser
// reads. The + flag must not add a sign where the number has one.
func TestFormatPlusFlagNegative(t *testing.T) {
	negZero := math.Copysign(0, -1)
	for _, c := range []struct {
		v    any
		want string
	}{
		{Pressure(negZero), "-0.00e+00 bar"},
		{Pressure(-3 * float64(Bar)), "-3.00e+00 bar"},
		{Pressure(3 * float64(Bar)), "+3.00e+00 bar"},
		{Temperature(negZero), "-2.73e+02 °C"},
	} {
		if got := fmt.Sprintf("%+.2e", c.v); got != c.want {
			t.Errorf("%%+.2e of %T(%g) = %q, want %q", c.v, c.v, got, c.want)
		}
	}
}

// TestFormatTinyValues: a value too small to show in the trade unit (5e-324 N
// is 0 kN; 1e-318 Pa is a subnormal number of bar with two significant
// bits) printed "0 kN" or a wrong number. It must print in the coherent SI
// unit, so that String, Append and Format read back to 4 digits.
func TestFormatTinyValues(t *testing.T) {
	for _, c := range typedCases {
		info := typeByName(c.name)
		for _, v := range []float64{5e-324, -5e-324, 1e-320, 1e-318, -1.234e-315, 3e-310, 2.2250738585072014e-308} {
			if info.hasMin && v < info.min {
				continue
			}
			str := c.str(v)
			back, err := c.parse(str)
			if err != nil {
				t.Errorf("%s(%g).String() = %q: %v", c.name, v, str, err)
				continue
			}
			// A subnormal SI value has few significant bits of its own:
			// compare to half a unit in the 4th digit, or 1 ulp. A
			// temperature prints on its °C scale, to 8 digits near 0 K.
			tol := math.Max(5e-4*math.Abs(v), 5e-324)
			if info.useOffset {
				tol = 5e-6
			}
			if math.Abs(back-v) > tol {
				t.Errorf("%s(%g).String() = %q reads back as %g", c.name, v, str, back)
			}
			for _, verb := range formatVerbs {
				if s := c.sprintf(verb, v); readsBack(c, v, s) != nil {
					t.Errorf("%s(%g) %s = %q: %v", c.name, v, verb, s, readsBack(c, v, s))
				}
			}
		}
	}
}

// TestFormatNearFloat64Limit: a finite value within rounding of the largest
// float64 printed as "1.798e+308 m", or "1.8e+308 L/min" under %.3g, which
// reads back as an overflow. String, Append and Format must print a number
// that reads back finite.
func TestFormatNearFloat64Limit(t *testing.T) {
	for _, c := range typedCases {
		info := typeByName(c.name)
		for _, v := range []float64{math.MaxFloat64, -math.MaxFloat64, 0.9999 * math.MaxFloat64, 1.5e308, 2.994630016345118e+303, -2.994630016345118e+303, 1e306} {
			if info.hasMin && v < info.min {
				continue
			}
			str := c.str(v)
			if err := readsBack(c, v, str); err != nil {
				t.Errorf("%s(%g).String() = %q: %v", c.name, v, str, err)
			}
			for _, verb := range formatVerbs {
				if s := c.sprintf(verb, v); readsBack(c, v, s) != nil {
					t.Errorf("%s(%g) %s = %q: %v", c.name, v, verb, s, readsBack(c, v, s))
				}
			}
		}
	}
}

// TestFormatTemperatureNearAbsoluteZero: %.0e and %.1g of a temperature near
// 0 K printed "-3e+02 °C", below absolute zero, which ParseTemperature
// rejects. Format must print a temperature that reads back.
func TestFormatTemperatureNearAbsoluteZero(t *testing.T) {
	for _, v := range []Temperature{0, 1e-9, 0.001, 0.2, 1, 20, 1e-300} {
		for _, verb := range formatVerbs {
			s := fmt.Sprintf(verb, v)
			back, err := ParseTemperature(strings.TrimSpace(s))
			if err != nil {
				t.Errorf("Temperature(%g K) %s = %q: %v", float64(v), verb, s, err)
				continue
			}
			if math.Abs(float64(back-v)) > 30 { // %.0e of 273.15 K in °C
				t.Errorf("Temperature(%g K) %s = %q reads back as %g K", float64(v), verb, s, float64(back))
			}
		}
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
		us := USCustomary()
		b.ReportAllocs()
		for b.Loop() {
			sinkBytes = us.AppendPressure(buf[:0], p)
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

// TestStringReadsBack: String prints the metric trade unit with 4
// significant digits, and the typed parser reads it back to that precision.
func TestStringReadsBack(t *testing.T) {
	eachUnitValue(t, func(t *testing.T, c typedCase, info *typeInfo, _ *unitDef, _, v float64) {
		c.strBack(t, v, metricUnit(info))
	})
}
