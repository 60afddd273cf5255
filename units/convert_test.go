package units

import (
	"errors"
	"math"
	"math/big"
	"strings"
	"testing"
)

// TestConvert: values Convert must give. Where the references allow it, a
// point may be read as an interval, a vacuum is a negative gauge reading,
// and absolute zero itself is in range.
func TestConvert(t *testing.T) {
	for _, c := range []struct {
		v        float64
		from, to string
		want     float64
	}{
		// Absolute zero and vacuum gauge readings.
		{-273.15, "°C", "K", 0},
		{-459.67, "°F", "K", 0},
		{-0.5, "bar", "psi", -0.5 * float64(Bar) / float64(PSI)},
		{-5, "Pa", "Pa", -5},
		// Intervals, and a point read as the interval above its zero.
		{-5, "ΔK", "Δ°F", -9},
		{20, "°C", "ΔK", 20},
		{10, "Δ°C", "Δ°F", 18},
		{1, "K/s", "°F/min", 108},
		// Point to point.
		{20, "°C", "°F", 68},
	} {
		got, err := Convert(c.v, c.from, c.to)
		if err != nil || math.Abs(got-c.want) > 1e-12*math.Max(1, math.Abs(c.want)) {
			t.Errorf("Convert(%g, %q, %q) = %.17g, %v; want %.17g", c.v, c.from, c.to, got, err, c.want)
		}
	}
}

// TestConvertRefuses: what Convert refuses, and the sentinel it matches; it
// returns 0 beside every error.
func TestConvertRefuses(t *testing.T) {
	for _, c := range []struct {
		v        float64
		from, to string
		want     error
	}{
		// Dimensions that differ; unknown or malformed units.
		{1, "psi", "L/min", ErrDimension},
		{1, "furlong", "m", ErrUnknownUnit},
		{1, "m", "furlong", ErrUnknownUnit},
		{1, "m/", "m", ErrSyntax},
		// Numbers that are not finite, given or produced.
		{math.NaN(), "bar", "psi", ErrRange},
		{math.Inf(1), "bar", "psi", ErrRange},
		{1e308, "ksi", "Pa", ErrRange},
		// Gauge and absolute do not mix without an ambient, whatever the sign.
		{1, "atm", "bar", ErrReference},
		{1, "psig", "psia", ErrReference},
		{-5, "bar", "bara", ErrReference},
		{-1, "psig", "psia", ErrReference},
		// A temperature difference is not a point on a scale (Convert used
		// to read 5 ΔK → °C as the interval 5), whatever its sign.
		{5, "ΔK", "°C", ErrReference},
		{5, "Δ°F", "°F", ErrReference},
		{5, "delta degC", "K", ErrReference},
		{5, "ΔK", "°R", ErrReference},
		{-5, "ΔK", "°C", ErrReference},
		// Below absolute zero or absolute vacuum, on either side (Convert
		// used to return −26.85 K for −300 °C).
		{-300, "°C", "K", ErrRange},
		{-500, "°F", "°C", ErrRange},
		{-1, "K", "°R", ErrRange},
		{-2, "bara", "psia", ErrRange},
		{-1, "atm", "Pa", ErrRange},
		{-1e6, "Pa", "bara", ErrRange},
		{-300, "°C", "ΔK", ErrRange},
	} {
		got, err := Convert(c.v, c.from, c.to)
		if !errors.Is(err, c.want) || got != 0 {
			t.Errorf("Convert(%g, %q, %q) = %g, %v; want 0 and %v", c.v, c.from, c.to, got, err, c.want)
		}
	}
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
			for _, sentinel := range []error{ErrSyntax, ErrUnknownUnit, ErrDimension, ErrRange, ErrReference, ErrAmbiguous} {
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

// TestQuantityConversionErrors: the dynamic layer names both sides, and
// checks the reference and range of what it converts to.
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
	q, _ := Parse("5 ΔK")
	if got, err := q.In("°F"); !errors.Is(err, ErrReference) || got != 0 {
		t.Errorf("Parse(5 ΔK).In(°F) = %g, %v; want ErrReference", got, err)
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
