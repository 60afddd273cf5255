package line

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// near reports whether got is within tol (absolute) of want.
func near(got, want, tol float64) bool { return math.Abs(got-want) <= tol }

func TestMinBoreEsposito(t *testing.T) {
	// Esposito, Fluid Power with Applications, 7th ed., Example 10-1
	// (inputs); result by the book's method, printed to 3 decimals.
	d, err := MinBore(30*units.USGallonPerMinute, 20*units.FootPerSecond)
	if err != nil || !near(d.Inches(), 0.783, 0.0005) {
		t.Errorf("Ex. 10-1: MinBore(30 gpm, 20 ft/s) = %.5f in, %v; want 0.783 in", d.Inches(), err)
	}
	// Example 10-2 (inputs): 0.002 m³/s at 6.1 m/s → 20.4 mm, printed to
	// one decimal.
	d, err = MinBore(0.002*units.CubicMetrePerSecond, 6.1*units.MetrePerSecond)
	if err != nil || !near(d.Millimetres(), 20.4, 0.05) {
		t.Errorf("Ex. 10-2: MinBore = %.4f mm, %v; want 20.4 mm", d.Millimetres(), err)
	}
}

func TestVelocity(t *testing.T) {
	// The trade's constant v [ft/s] = 0.3208·gpm/A[in²], derived from the
	// unit definitions (231 in³/gal, 60 s, 12 in/ft: 231/720 = 0.32083…),
	// printed to 4 digits.
	bore := 1 * units.Inch
	v, err := Velocity(10*units.USGallonPerMinute, bore)
	a := units.CircleArea(bore).SquareInches()
	if err != nil || math.Abs(v.FeetPerSecond()-0.3208*10/a) > 5e-5*10/a {
		t.Errorf("Velocity(10 gpm, 1 in) = %v ft/s, %v; want 0.3208·10/%.4f", v.FeetPerSecond(), err, a)
	}
	// MinBore inverts Velocity.
	q := 120 * units.LitrePerMinute
	d, _ := MinBore(q, 4.5*units.MetrePerSecond)
	v, _ = Velocity(q, d)
	if math.Abs(v.MetresPerSecond()-4.5) > 1e-13 {
		t.Errorf("Velocity at MinBore = %v, want 4.5 m/s", v)
	}
	if v, err := Velocity(0, d); v != 0 || err != nil {
		t.Errorf("Velocity of no flow = %v, %v; want 0, nil", v, err)
	}
}

func TestServiceLimits(t *testing.T) {
	for _, c := range []struct {
		s    Service
		want float64
	}{{SuctionLine, 1.2}, {PressureLine, 6}, {ReturnLine, 3}, {DrainLine, 3}, {CaseDrainLine, 1.5}} {
		l := c.s.Limit()
		if l.Max.MetresPerSecond() != c.want || l.Rule.Source == "" {
			t.Errorf("%v: limit %v (%v), want %g m/s with a rule", c.s, l.Max, l.Rule, c.want)
		}
	}
	if l := Service(0).Limit(); l != (VelocityLimit{}) {
		t.Errorf("Service(0).Limit() = %v, want the zero limit", l)
	}
	if s := Service(9).String(); s != "Service(invalid)" {
		t.Errorf("Service(9) = %q", s)
	}
}

func TestVelocityBadInput(t *testing.T) {
	for _, c := range []struct {
		name  string
		f     func() (float64, error)
		param string
	}{
		{"bore 0", func() (float64, error) { v, err := Velocity(1, 0); return float64(v), err }, "bore"},
		{"q -1", func() (float64, error) { v, err := Velocity(-1, 0.01); return float64(v), err }, "q"},
		{"q NaN", func() (float64, error) { v, err := Velocity(units.Flow(math.NaN()), 0.01); return float64(v), err }, "q"},
		{"tiny bore", func() (float64, error) { v, err := Velocity(1, 1e-300); return float64(v), err }, "v"},
		{"min q 0", func() (float64, error) { d, err := MinBore(0, 1); return float64(d), err }, "q"},
		{"min max 0", func() (float64, error) { d, err := MinBore(1, 0); return float64(d), err }, "max"},
		{"min underflow", func() (float64, error) { d, err := MinBore(5e-324, 1e300); return float64(d), err }, "q"},
	} {
		got, err := c.f()
		if got != 0 {
			t.Errorf("%s: %v beside the error", c.name, got)
		}
		wantRangeError(t, c.name, err, c.param)
	}
}
