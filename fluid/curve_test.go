package fluid

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// ASTM D341-20 check, [X from S]: 32 mm²/s at 40 °C and
// 5.4 mm²/s at 100 °C give A = 9.53082, B = 3.74658 and 8.533 mm²/s at 80 °C.
// Tolerances: half a unit in the last printed digit.
func TestCurveD341Check(t *testing.T) {
	c, err := CurveThrough(celsius(40), mm2s(32), celsius(100), mm2s(5.4))
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(c.A()-9.53082) > 5e-6 || math.Abs(c.B()-3.74658) > 5e-6 {
		t.Errorf("A, B = %.6f, %.6f, want 9.53082, 3.74658", c.A(), c.B())
	}
	v, err := c.At(celsius(80))
	if err != nil {
		t.Fatal(err)
	}
	if got := v.SquareMillimetresPerSecond(); math.Abs(got-8.533) > 5e-4 {
		t.Errorf("ν(80 °C) = %.5f mm²/s, want 8.533", got)
	}
	// The fitted points themselves are reproduced to round-off.
	for _, p := range []struct{ c, v float64 }{{40, 32}, {100, 5.4}} {
		v, _ := c.At(celsius(p.c))
		if !checktest.Close(v.SquareMillimetresPerSecond(), p.v, 1e-12) {
			t.Errorf("ν(%g °C) = %.15g, want %g", p.c, v.SquareMillimetresPerSecond(), p.v)
		}
	}
	// NewCurve from the printed constants gives the same line.
	c2, err := NewCurve(c.A(), c.B())
	if err != nil {
		t.Fatal(err)
	}
	if v2, _ := c2.At(celsius(80)); v2 != v {
		t.Errorf("NewCurve: ν(80 °C) = %v, want %v", v2, v)
	}
}

// curves spans thin to thick oils, including a curve reaching 0.21 mm²/s.
func testCurves(t *testing.T) []Curve {
	t.Helper()
	var cs []Curve
	for _, p := range [][2]float64{{2.2, 1.0}, {10, 2.6}, {46, 6.8}, {46, 8.1}, {320, 24}, {1500, 70}} {
		c, err := CurveThrough(celsius(40), mm2s(p[0]), celsius(100), mm2s(p[1]))
		if err != nil {
			t.Fatal(err)
		}
		cs = append(cs, c)
	}
	return cs
}

// Round trips ν → T → ν and T → ν → T over each curve's whole range,
// including the low-viscosity region where D341's exponential term matters.
// Tolerance: 1e-12 relative (round-off of nested logarithms and powers).
func TestCurveRoundTrip(t *testing.T) {
	for _, c := range testCurves(t) {
		for k := 0; k <= 400; k++ {
			v := min(mm2s(0.21*math.Pow(2e7/0.21, float64(k)/400)), MaxViscosity)
			tt, err := c.TemperatureFor(v)
			if err != nil {
				t.Fatalf("TemperatureFor(%v): %v", v, err)
			}
			back, err := c.At(tt)
			if err != nil {
				t.Fatalf("At(%v): %v", tt, err)
			}
			if !checktest.Close(float64(back), float64(v), 1e-11) {
				t.Errorf("ν %v → T %v → ν %v", v, tt, back)
			}
		}
		lo, hi := c.Range()
		for k := 0; k <= 100; k++ {
			tt := min(lo+(hi-lo)*units.Temperature(k)/100, hi) // lo + (hi − lo) may round above hi
			v, err := c.At(tt)
			if err != nil {
				t.Fatalf("At(%v): %v", tt, err)
			}
			back, err := c.TemperatureFor(v)
			if err != nil {
				t.Fatalf("TemperatureFor(%v): %v", v, err)
			}
			if !checktest.Close(float64(back), float64(tt), 1e-11) {
				t.Errorf("T %v → ν %v → T %v", tt, v, back)
			}
		}
	}
}

// Viscosity falls strictly as temperature rises over the whole range.
func TestCurveMonotone(t *testing.T) {
	for _, c := range testCurves(t) {
		lo, hi := c.Range()
		prev := units.KinematicViscosity(math.Inf(1))
		for k := 0; k <= 1000; k++ {
			v, err := c.At(lo + (hi-lo)*units.Temperature(k)/1000)
			if err != nil {
				t.Fatal(err)
			}
			if !(v < prev) {
				t.Fatalf("not decreasing at step %d: %v after %v", k, v, prev)
			}
			prev = v
		}
	}
}

// The Newton-refined inverse agrees with ASTM D341-20's explicit inverse
// ν = (Z − 0.7) − exp(−0.7487 − 3.295(Z−0.7) + 0.6119(Z−0.7)² − 0.3193(Z−0.7)³)
// to the explicit form's own accuracy, and satisfies Z(ν) exactly.
func TestNuFromZ(t *testing.T) {
	for nu := 0.21; nu < 20; nu *= 1.05 {
		z := zOf(nu)
		got := nuFromZ(z)
		if !checktest.Close(got, nu, 1e-13) {
			t.Errorf("nuFromZ(Z(%g)) = %.16g", nu, got)
		}
		w := z - 0.7
		explicit := w - math.Exp(-0.7487-3.295*w+0.6119*w*w-0.3193*w*w*w)
		if math.Abs(explicit-nu) > 0.01*nu {
			t.Errorf("D341 explicit inverse %g vs %g: more than 1 %% apart", explicit, nu)
		}
	}
}

func TestCurveBadInput(t *testing.T) {
	good := celsius(40)
	nan := math.NaN()
	cases := []struct {
		name, param string
		t1, t2      units.Temperature
		v1, v2      units.KinematicViscosity
	}{
		// temperatures
		{"t1 zero", "t1", 0, celsius(100), mm2s(32), mm2s(5)},
		{"t1 negative", "t1", -1, celsius(100), mm2s(32), mm2s(5)},
		{"t2 NaN", "t2", good, units.Temperature(nan), mm2s(32), mm2s(5)},
		{"t2 Inf", "t2", good, units.Temperature(math.Inf(1)), mm2s(32), mm2s(5)},
		{"t too close", "t2", good, good + 0.5, mm2s(32), mm2s(31)},
		// viscosities
		{"v1 zero", "v1", good, celsius(100), 0, mm2s(5)},
		{"v1 negative", "v1", good, celsius(100), mm2s(-3), mm2s(5)},
		{"v1 NaN", "v1", good, celsius(100), units.KinematicViscosity(nan), mm2s(5)},
		{"v1 above D341", "v1", good, celsius(100), mm2s(3e7), mm2s(5)},
		{"v2 below D341", "v2", good, celsius(100), mm2s(32), mm2s(0.2)},
		{"v2 Inf", "v2", good, celsius(100), mm2s(32), units.KinematicViscosity(math.Inf(1))},
		// shape
		{"rising", "v2", good, celsius(100), mm2s(5), mm2s(32)},
		{"flat", "v2", good, celsius(100), mm2s(32), mm2s(32)},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			_, err := CurveThrough(tc.t1, tc.v1, tc.t2, tc.v2)
			wantRangeError(t, err, tc.param)
		})
	}

	c, _ := CurveThrough(celsius(40), mm2s(46), celsius(100), mm2s(6.8))
	lo, hi := c.Range()
	for _, tt := range []units.Temperature{0, -5, lo - 1, hi + 1, units.Temperature(nan), units.Temperature(math.Inf(-1))} {
		v, err := c.At(tt)
		wantRangeError(t, err, "t")
		if v != 0 {
			t.Errorf("At(%v) = %v with an error, want 0", tt, v)
		}
	}
	for _, v := range []units.KinematicViscosity{0, mm2s(0.1), mm2s(3e7), units.KinematicViscosity(nan)} {
		_, err := c.TemperatureFor(v)
		wantRangeError(t, err, "v")
	}
	// The zero Curve is refused, not evaluated.
	_, err := Curve{}.At(celsius(40))
	wantRangeError(t, err, "curve")
	_, err = Curve{}.TemperatureFor(mm2s(10))
	wantRangeError(t, err, "curve")
	_, err = NewCurve(9, 0)
	wantRangeError(t, err, "b")
	_, err = NewCurve(nan, 3)
	wantRangeError(t, err, "a")
	_, err = NewCurve(2000, 3) // range beyond float64: 10^666 K
	wantRangeError(t, err, "a")
}

// The pour-point region: a cold start beyond the D341 range is refused.
func TestCurveRefusesPourPointRegion(t *testing.T) {
	c, _ := CurveThrough(celsius(40), mm2s(460), celsius(100), mm2s(31))
	lo, _ := c.Range()
	v, err := c.At(lo)
	if err != nil || !checktest.Close(float64(v), float64(MaxViscosity), 1e-10) {
		t.Fatalf("At(cold end) = %v, %v; want %v", v, err, MaxViscosity)
	}
	_, err = c.At(lo - 0.01)
	wantRangeError(t, err, "t")
}

func TestCurveAtAllocs(t *testing.T) {
	c, _ := CurveThrough(celsius(40), mm2s(46), celsius(100), mm2s(6.8))
	tt := celsius(57)
	if n := testing.AllocsPerRun(100, func() { _, _ = c.At(tt) }); n != 0 {
		t.Errorf("Curve.At allocates %v times, want 0", n)
	}
	thin := celsius(140) // low-viscosity branch with Newton refinement
	if n := testing.AllocsPerRun(100, func() { _, _ = c.At(thin) }); n != 0 {
		t.Errorf("Curve.At (thin) allocates %v times, want 0", n)
	}
}

var sinkV units.KinematicViscosity

func BenchmarkCurveAt(b *testing.B) {
	c, _ := CurveThrough(celsius(40), mm2s(46), celsius(100), mm2s(6.8))
	ts := [...]units.Temperature{celsius(-10), celsius(25), celsius(48), celsius(61.5), celsius(80)}
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		v, _ := c.At(ts[i%len(ts)])
		sinkV += v
	}
}

func BenchmarkCurveAtThin(b *testing.B) {
	c, _ := CurveThrough(celsius(40), mm2s(10), celsius(100), mm2s(2.6))
	t := celsius(150) // ≈ 1.5 mm²/s: Newton refinement runs, first step calls math.Exp
	b.ReportAllocs()
	for b.Loop() {
		v, _ := c.At(t)
		sinkV += v
	}
}

// expFrom (exp(x) from a known exp(x − d)) matches math.Exp to 4e-16
// relative (Taylor truncation below 2.7e-16 plus rounding), plus
// 2.3e-16·|x| for the rounding of x − d in the test's own input, on both
// sides of its guard, and falls back to math.Exp for large or NaN d.
func TestExpFrom(t *testing.T) {
	for _, x := range []float64{-1.6, -3.5, -9, -20} {
		for _, d := range []float64{0, 1e-9, -1e-5, 1e-3, -1.5e-3, maxTaylorStep, -maxTaylorStep, 3e-3, -0.05, 2} {
			got, want := expFrom(math.Exp(x-d), d, x), math.Exp(x)
			if !checktest.Close(got, want, 4e-16+2.3e-16*math.Abs(x)) {
				t.Errorf("expFrom(exp(%g − %g)) = %.17g, want %.17g", x, d, got, want)
			}
		}
		if got := expFrom(0, math.NaN(), x); got != math.Exp(x) {
			t.Errorf("expFrom with NaN d = %g, want math.Exp", got)
		}
	}
}

// The low-viscosity inverse (D341 explicit start, Newton steps reusing the
// previous exponential) is exact to round-off over its whole span: dense
// sweep of 0.21–7.5 mm²/s, 1e-14 relative (one ulp of Z ≈ 1.06 is already
// 1e-15 of ν at 0.21 mm²/s, since dZ/dν ≈ 0.6 there), and the thin end of a curve
// round-trips At → TemperatureFor → At to 1e-13.
func TestNuFromZDense(t *testing.T) {
	for nu := 0.21; nu < 7.5; nu *= 1.0003 {
		if got := nuFromZ(zOf(nu)); !checktest.Close(got, nu, 1e-14) {
			t.Fatalf("nuFromZ(Z(%.17g)) = %.17g", nu, got)
		}
	}
	c, err := CurveThrough(celsius(40), mm2s(10), celsius(100), mm2s(2.6))
	if err != nil {
		t.Fatal(err)
	}
	hot, _ := c.TemperatureFor(mm2s(7.5))
	_, hi := c.Range()
	for k := 0; k <= 1000; k++ {
		tt := hot + (hi-hot)*units.Temperature(k)/1000
		v, err := c.At(tt)
		if err != nil {
			t.Fatal(err)
		}
		back, err := c.TemperatureFor(v)
		if err != nil {
			t.Fatal(err)
		}
		v2, _ := c.At(back)
		if !checktest.Close(float64(v2), float64(v), 1e-13) || !checktest.Close(float64(back), float64(tt), 1e-13) {
			t.Errorf("T %v → ν %v → T %v → ν %v", tt, v, back, v2)
		}
	}
}

func BenchmarkCurveAtVeryThin(b *testing.B) {
	c, _ := CurveThrough(celsius(40), mm2s(10), celsius(100), mm2s(2.6))
	t, _ := c.TemperatureFor(mm2s(0.8)) // both Newton steps reuse an exponential
	b.ReportAllocs()
	for b.Loop() {
		v, _ := c.At(t)
		sinkV += v
	}
}

// The thin-oil fit is built on first use; concurrent first calls must agree
// (run with -race in CI).
func TestCurveAtConcurrentFirstUse(t *testing.T) {
	c, err := CurveThrough(celsius(40), mm2s(10), celsius(100), mm2s(2.6))
	if err != nil {
		t.Fatal(err)
	}
	want := nuFromZNewton(zOf(3))
	done := make(chan float64, 8)
	for range 8 {
		go func() { done <- nuFromZ(zOf(3)) }()
	}
	for range 8 {
		if got := <-done; !checktest.Close(got, want, 1e-14) {
			t.Errorf("nuFromZ(Z(3)) = %.17g, want %.17g", got, want)
		}
	}
	if _, err := c.At(celsius(120)); err != nil {
		t.Error(err)
	}
}

// A curve applies from where it reaches MaxViscosity (2·10⁷ mm²/s) to where
// it falls to MinViscosity (0.21 mm²/s), the ASTM D341 span (from memory).
// At the ends of Range, At returns the limits to round-off; one ulp
// outside it refuses.
func TestCurveRangeEnds(t *testing.T) {
	c, err := CurveThrough(celsius(40), mm2s(32), celsius(100), mm2s(5.4))
	if err != nil {
		t.Fatal(err)
	}
	cold, hot := c.Range()
	if v, err := c.At(cold); err != nil || !checktest.Close(float64(v), float64(MaxViscosity), 1e-12) {
		t.Errorf("At(cold) = %v, %v; want %v", v, err, MaxViscosity)
	}
	if v, err := c.At(hot); err != nil || !checktest.Close(float64(v), float64(MinViscosity), 1e-12) {
		t.Errorf("At(hot) = %v, %v; want %v", v, err, MinViscosity)
	}
	_, err = c.At(units.Temperature(math.Nextafter(float64(cold), 0)))
	wantRangeError(t, err, "t")
	_, err = c.At(units.Temperature(math.Nextafter(float64(hot), math.Inf(1))))
	wantRangeError(t, err, "t")
	if tt, err := c.TemperatureFor(MinViscosity); err != nil || tt != hot {
		t.Errorf("TemperatureFor(MinViscosity) = %v, %v; want %v", tt, err, hot)
	}
	_, err = c.TemperatureFor(down(MinViscosity))
	wantRangeError(t, err, "v")
}

// CurveThrough accepted a point at 1.5·10⁻³⁶ K and built a curve whose hot
// end was +Inf (Range returned +Inf and At clamped any hot temperature to
// MinViscosity). It now refuses such points, as NewCurve does.
func TestCurveThroughRefusesInfiniteRange(t *testing.T) {
	c, err := CurveThrough(241.29372034961386, 0.0943627383523415, 1.5014914489624588e-36, 1.9535889052799391)
	wantRangeError(t, err, "t2")
	if c != (Curve{}) {
		t.Errorf("curve = %+v with an error, want the zero Curve", c)
	}
}

// TestExp10: 10^x from an exact power of ten and one exponential is within
// 2 ulp of 10^x computed to 40 digits (Python 3.11 decimal module) at
// exactly representable x, agrees with math.Pow(10, x) to 4 ulp over the
// temperatures a curve meets (x = log₁₀ T from −0.5 to 4.5, 0.3 K to
// 30 000 K), and is exact at whole numbers.
func TestExp10(t *testing.T) {
	for _, c := range []struct{ x, want float64 }{
		{2.25, 177.8279410038922801225421195192684844736},
		{2.5, 316.2277660168379331998893544432718533720},
		{2.6875, 486.9675251658631149352974850343965752271},
		{2.75, 562.3413251903490803949510397764812314683},
		{3.125, 1333.521432163324025675931715295331092416},
	} {
		if got := exp10(c.x); math.Abs(got-c.want) > 2*ulp(c.want) {
			t.Errorf("exp10(%g) = %.17g, want %.17g", c.x, got, c.want)
		}
	}
	for k := 0; k <= 5000; k++ {
		x := -0.5 + float64(k)*0.001
		got, want := exp10(x), math.Pow(10, x)
		if math.Abs(got-want) > 4*ulp(want) { // each within 2 ulp of 10^x
			t.Errorf("exp10(%g) = %.17g, math.Pow(10, x) = %.17g", x, got, want)
		}
	}
	for n := 0; n <= 22; n++ {
		if got := exp10(float64(n)); got != math.Pow10(n) {
			t.Errorf("exp10(%d) = %g", n, got)
		}
	}
}

func ulp(x float64) float64 { return math.Nextafter(math.Abs(x), math.Inf(1)) - math.Abs(x) }

// BenchmarkCurveThrough fits the D341 curve through two points (the usual
// 40 °C and 100 °C data-sheet viscosities). Its floor, in the same run, is
// CurveAt: a fit costs four logarithms, two exponentials and the two
// log-log values of the data, where At costs one of each.
func BenchmarkCurveThrough(b *testing.B) {
	t1, t2 := celsius(40), celsius(100)
	v40 := [...]units.KinematicViscosity{mm2s(32), mm2s(46), mm2s(68), mm2s(100), mm2s(22)}
	v100 := [...]units.KinematicViscosity{mm2s(5.4), mm2s(6.8), mm2s(8.7), mm2s(11.2), mm2s(4.3)}
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		c, _ := CurveThrough(t1, v40[i%5], t2, v100[i%5])
		sinkV += units.KinematicViscosity(c.B())
	}
}

// TestLog10T: the constant logarithms of 40 °C and 100 °C are math.Log10's.
func TestLog10T(t *testing.T) {
	for _, tt := range []units.Temperature{celsius(40), celsius(100), t40, t100, celsius(60), 1} {
		if got, want := log10T(tt), math.Log10(float64(tt)); got != want {
			t.Errorf("log10T(%v) = %.17g, want %.17g", tt, got, want)
		}
	}
}
