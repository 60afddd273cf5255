package units

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"
	"time"
)

// Regression tests from the acceptance audit of issue 2. Each names the
// defect it guards; every one failed before its fix.

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

// TestTextTinyValues: a value too small to show in the trade unit (5e-324 N
// is 0 kN; 1e-318 Pa is a subnormal number of bar with two significant
// bits) printed "0 kN" or a wrong number. It must print in the coherent SI
// unit, so that String, Append and Format read back to 4 digits.
func TestTextTinyValues(t *testing.T) {
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

// TestTextNearFloat64Limit: a finite value within rounding of the largest
// float64 printed as "1.798e+308 m", or "1.8e+308 L/min" under %.3g, which
// reads back as an overflow. String, Append and Format must print a number
// that reads back finite.
func TestTextNearFloat64Limit(t *testing.T) {
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

// TestConvertBelowAbsoluteZero: Convert(-300, "°C", "K") returned -26.85
// and Convert(-2, "bara", "psia") a negative absolute pressure, where the
// typed parsers reject both. A temperature below absolute zero or an
// absolute pressure below vacuum, on either side, is ErrRange.
func TestConvertBelowAbsoluteZero(t *testing.T) {
	for _, c := range []struct {
		v        float64
		from, to string
	}{
		{-300, "°C", "K"},
		{-500, "°F", "°C"},
		{-1, "K", "°R"},
		{-2, "bara", "psia"},
		{-1, "atm", "Pa"},
		{-1e6, "Pa", "bara"},
		{-300, "°C", "ΔK"},
	} {
		got, err := Convert(c.v, c.from, c.to)
		if !errors.Is(err, ErrRange) || got != 0 {
			t.Errorf("Convert(%g, %q, %q) = %g, %v; want ErrRange", c.v, c.from, c.to, got, err)
		}
	}
	for _, s := range []string{"-300 °C", "-1 K", "-460 °F", "-1 bara", "-14.8 psia", "-1 atm"} {
		q, err := Parse(s)
		if !errors.Is(err, ErrRange) || q.Value() != 0 {
			t.Errorf("Parse(%q) = %v, %v; want ErrRange", s, q, err)
		}
	}
	// In range: absolute zero itself, a vacuum gauge reading, and intervals.
	for _, c := range []struct {
		v        float64
		from, to string
		want     float64
	}{
		{-273.15, "°C", "K", 0},
		{-459.67, "°F", "K", 0},
		{-0.5, "bar", "psi", -0.5 * float64(Bar) / float64(PSI)},
		{-5, "ΔK", "Δ°F", -9},
		{-5, "Pa", "Pa", -5},
	} {
		got, err := Convert(c.v, c.from, c.to)
		if err != nil || math.Abs(got-c.want) > 1e-12*math.Max(1, math.Abs(c.want)) {
			t.Errorf("Convert(%g, %q, %q) = %.17g, %v; want %.17g", c.v, c.from, c.to, got, err, c.want)
		}
	}
}

// TestConvertDifferenceToPoint: Convert(5, "ΔK", "°C") returned 5, reading
// °C as an interval although a lone °C is a point on its scale and
// Parse("5 ΔK").Temperature() fails. A temperature difference converted to
// a temperature spelling is ErrReference, as for the typed values; a point
// may still be read as an interval (as ParseTemperatureDifference does).
func TestConvertDifferenceToPoint(t *testing.T) {
	for _, c := range []struct {
		from, to string
	}{
		{"ΔK", "°C"}, {"Δ°F", "°F"}, {"delta degC", "K"}, {"ΔK", "°R"},
	} {
		got, err := Convert(5, c.from, c.to)
		if !errors.Is(err, ErrReference) || got != 0 {
			t.Errorf("Convert(5, %q, %q) = %g, %v; want ErrReference", c.from, c.to, got, err)
		}
	}
	q, _ := Parse("5 ΔK")
	if got, err := q.In("°F"); !errors.Is(err, ErrReference) {
		t.Errorf("Parse(5 ΔK).In(°F) = %g, %v; want ErrReference", got, err)
	}
	// Point to interval, interval to interval, point to point still work.
	for _, c := range []struct {
		v        float64
		from, to string
		want     float64
	}{
		{20, "°C", "ΔK", 20},
		{10, "Δ°C", "Δ°F", 18},
		{20, "°C", "°F", 68},
		{1, "K/s", "°F/min", 108},
	} {
		got, err := Convert(c.v, c.from, c.to)
		if err != nil || math.Abs(got-c.want) > 1e-12*c.want {
			t.Errorf("Convert(%g, %q, %q) = %.17g, %v; want %g", c.v, c.from, c.to, got, err, c.want)
		}
	}
}

// TestQuotientsNeverInfinite: the quotients checked only their divisors, so
// a finite dividend over a tiny positive divisor returned +Inf with no error
// (1e300 N over 1e-10 m²), and a NaN dividend returned NaN, although the
// physics doc promises no result is ever ±Inf or NaN.
func TestQuotientsNeverInfinite(t *testing.T) {
	for _, c := range []struct {
		name string
		v    float64
		err  error
	}{
		{"Force.PerArea", float64(first(Force(1e300).PerArea(1e-10))), second(Force(1e300).PerArea(1e-10))},
		{"Force.PerArea NaN", float64(first(Force(math.NaN()).PerArea(1))), second(Force(math.NaN()).PerArea(1))},
		{"Flow.PerArea", float64(first(Flow(-1e300).PerArea(1e-10))), second(Flow(-1e300).PerArea(1e-10))},
		{"Flow.PerSpeed", float64(first(Flow(1e300).PerSpeed(1e-10))), second(Flow(1e300).PerSpeed(1e-10))},
		{"Power.PerSpeed", float64(first(Power(1e308).PerSpeed(1e-3))), second(Power(1e308).PerSpeed(1e-3))},
		{"Power.PerSpeed Inf", float64(first(Power(math.Inf(1)).PerSpeed(1))), second(Power(math.Inf(1)).PerSpeed(1))},
		{"Volume.PerDuration", float64(first(Volume(1e308).PerDuration(time.Nanosecond))), second(Volume(1e308).PerDuration(time.Nanosecond))},
	} {
		if !errors.Is(c.err, ErrRange) || c.v != 0 {
			t.Errorf("%s = %g, %v; want 0 and ErrRange", c.name, c.v, c.err)
		}
	}
	// Large but finite quotients still work.
	if p, err := Force(1e300).PerArea(1e-5); err != nil || p != 1e305 {
		t.Errorf("Force(1e300).PerArea(1e-5) = %v, %v; want 1e305 Pa", float64(p), err)
	}
}

func first[T any](v T, _ error) T { return v }

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
