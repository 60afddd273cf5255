package line

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// colebrookBisect solves the Colebrook–White equation by bisection on
// x = 1/√f until the bracket closes to adjacent floats: a reference
// independent of the Newton iteration and its start.
func colebrookBisect(re, rr float64) float64 {
	g := func(x float64) float64 { return x + 2*math.Log10(rr/3.7+2.51*x/re) }
	lo, hi := 0.1, 1e4 // g(lo) < 0 < g(hi) for 2000 < Re ≤ MaxFloat64, 0 ≤ ε/D ≤ 0.1
	for {
		mid := lo + (hi-lo)/2
		if mid <= lo || mid >= hi {
			break
		}
		if g(mid) < 0 {
			lo = mid
		} else {
			hi = mid
		}
	}
	x := lo + (hi-lo)/2
	return 1 / (x * x)
}

func TestFrictionFactorPublished(t *testing.T) {
	for _, c := range []struct {
		re, rr, want, tol float64
		src               string
	}{
		// Colebrook–White, the published check value, printed to 7 digits.
		{1e5, 1e-4, 0.0185139, 5e-8, "[S] Colebrook, Re 1e5, ε/D 1e-4"},
		// Colebrook–White values computed from the confirmed formula,
		// printed to 5 significant digits.
		{1e4, 0, 0.030883, 5e-7, "[X] Re 1e4 smooth"},
		{1e4, 1e-3, 0.032382, 5e-7, "[X] Re 1e4, ε/D 1e-3"},
		{1e6, 0, 0.011645, 5e-7, "[X] Re 1e6 smooth"},
		{1e6, 1e-3, 0.019943, 5e-7, "[X] Re 1e6, ε/D 1e-3"},
		// Laminar: f = 64/Re exactly (Hagen–Poiseuille).
		{1000, 0.05, 0.064, 1e-17, "64/Re"},
		{2000, 0, 0.032, 1e-17, "64/Re at the laminar limit"},
	} {
		got, err := FrictionFactor(c.re, c.rr)
		if err != nil || math.Abs(got-c.want) > c.tol {
			t.Errorf("%s: FrictionFactor(%g, %g) = %.9g, %v; want %.9g ± %g", c.src, c.re, c.rr, got, err, c.want, c.tol)
		}
	}
}

// TestFrictionFactorFullPrecision holds the Newton solution to a bisection
// solved to adjacent floats, over the whole accepted range: relative error
// at most 1e-12 (the promise; in practice a few ulp).
func TestFrictionFactorFullPrecision(t *testing.T) {
	worst := 0.0
	for _, re := range []float64{2000.0001, 2300, 3000, 4000, 7500, 1e4, 3e4, 1e5, 4.2e5, 1e6, 1e7, 1e8, 1e9, 1e10} {
		for _, rr := range []float64{0, 1e-7, 1e-6, 1.5e-6 / 0.02, 1e-4, 1e-3, 0.01, 0.05, 0.1} {
			got, err := FrictionFactor(re, rr)
			if err != nil {
				t.Fatalf("FrictionFactor(%g, %g): %v", re, rr, err)
			}
			ref := colebrookBisect(re, rr)
			rel := math.Abs(got-ref) / ref
			worst = max(worst, rel)
			if rel > 1e-12 {
				t.Errorf("FrictionFactor(%g, %g) = %.17g, bisection %.17g: relative error %.2g > 1e-12", re, rr, got, ref, rel)
			}
		}
	}
	t.Logf("worst relative error against bisection: %.2g", worst)
	// Far beyond any line, up to the largest float: still the Colebrook
	// value, never NaN (s² in the iteration once overflowed).
	for _, re := range []float64{1e15, 1e100, 1e300, math.MaxFloat64} {
		for _, rr := range []float64{0, 1e-6, 0.0324, 0.1} {
			got, err := FrictionFactor(re, rr)
			ref := colebrookBisect(re, rr)
			if err != nil || !(math.Abs(got-ref) <= 1e-12*ref) {
				t.Errorf("FrictionFactor(%g, %g) = %.17g, %v; bisection %.17g", re, rr, got, err, ref)
			}
		}
	}
}

// TestTransitionTakenTurbulent checks the documented choice: in the band
// 2000 < Re < 4000 the Colebrook value, which is above 64/Re.
func TestTransitionTakenTurbulent(t *testing.T) {
	for _, re := range []float64{2000.5, 2500, 3999} {
		f, _ := FrictionFactor(re, 0)
		if want := colebrookBisect(re, 0); math.Abs(f-want) > 1e-12*want || f <= 64/re {
			t.Errorf("Re %g: f = %g, want the Colebrook value %g above 64/Re = %g", re, f, want, 64/re)
		}
	}
	for re, want := range map[float64]Regime{1: Laminar, 2000: Laminar, 2000.1: Transitional, 3999: Transitional, 4000: Turbulent, 1e9: Turbulent, 0: 0, -1: 0} {
		if got := RegimeOf(re); got != want {
			t.Errorf("RegimeOf(%g) = %v, want %v", re, got, want)
		}
	}
	if RegimeOf(math.NaN()) != 0 || RegimeOf(math.Inf(1)) != 0 {
		t.Error("RegimeOf of NaN or +Inf is not 0")
	}
}

func TestExplicitApproximations(t *testing.T) {
	// Blasius: f = 0.3164/Re^0.25 (Blasius, 1913); at Re 1e4, 0.3164/10.
	if f, err := Blasius(1e4); err != nil || math.Abs(f-0.03164) > 1e-15 {
		t.Errorf("Blasius(1e4) = %v, %v; want 0.03164", f, err)
	}
	// Blasius fits smooth-pipe data for 3000 < Re < 1e5: within 3 % of
	// Colebrook for smooth pipe from 4000 to 1e5 (the two are fits to the
	// same measurements; 3 % is what they share there).
	for re := 4000.0; re <= 1e5; re *= 1.25 {
		b, _ := Blasius(re)
		c, _ := FrictionFactor(re, 0)
		if math.Abs(b-c)/c > 0.03 {
			t.Errorf("Re %g: Blasius %g, Colebrook %g differ by more than 3 %%", re, b, c)
		}
	}
	// Swamee–Jain and Haaland against Colebrook: the accuracy their doc
	// comments state over the accepted ranges (3.2 % and 1.4 %).
	worstSJ, worstH := 0.0, 0.0
	for re := 4000.0; re <= 1e8; re *= 1.7 {
		for _, rr := range []float64{0, 1e-6, 1e-5, 1e-4, 1e-3, 0.005, 0.01, 0.02, 0.05} {
			c, _ := FrictionFactor(re, rr)
			if rr <= 0.01 {
				sj, err := SwameeJain(re, rr)
				if err != nil {
					t.Fatal(err)
				}
				worstSJ = max(worstSJ, math.Abs(sj-c)/c)
			}
			h, err := Haaland(re, rr)
			if err != nil {
				t.Fatal(err)
			}
			worstH = max(worstH, math.Abs(h-c)/c)
		}
	}
	if worstSJ > 0.032 || worstH > 0.014 {
		t.Errorf("worst deviation from Colebrook: Swamee–Jain %.3g, Haaland %.3g; want ≤ 3.2 %% and 1.4 %%", worstSJ, worstH)
	}
	t.Logf("worst deviation from Colebrook: Swamee–Jain %.3g, Haaland %.3g", worstSJ, worstH)
}

func TestFrictionBadInput(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	for _, c := range []struct {
		name  string
		f     func() (float64, error)
		param string
	}{
		{"re 0", func() (float64, error) { return FrictionFactor(0, 0) }, "re"},
		{"re -1", func() (float64, error) { return FrictionFactor(-1, 0) }, "re"},
		{"re NaN", func() (float64, error) { return FrictionFactor(nan, 0) }, "re"},
		{"re Inf", func() (float64, error) { return FrictionFactor(inf, 0) }, "re"},
		{"rr -1e-9", func() (float64, error) { return FrictionFactor(1e5, -1e-9) }, "relativeRoughness"},
		{"rr 0.11", func() (float64, error) { return FrictionFactor(1e5, 0.11) }, "relativeRoughness"},
		{"rr NaN", func() (float64, error) { return FrictionFactor(1e5, nan) }, "relativeRoughness"},
		{"SJ laminar", func() (float64, error) { return SwameeJain(3000, 0) }, "re"},
		{"SJ rough", func() (float64, error) { return SwameeJain(1e5, 0.02) }, "relativeRoughness"},
		{"Haaland 1e9", func() (float64, error) { return Haaland(1e9, 0) }, "re"},
		{"Haaland rough", func() (float64, error) { return Haaland(1e5, 0.06) }, "relativeRoughness"},
		{"Blasius 2e5", func() (float64, error) { return Blasius(2e5) }, "re"},
		{"Reynolds d 0", func() (float64, error) { return Reynolds(1, 0, 1e-5) }, "d"},
		{"Reynolds nu 0", func() (float64, error) { return Reynolds(1, 0.01, 0) }, "nu"},
		{"Reynolds v -1", func() (float64, error) { return Reynolds(-1, 0.01, 1e-5) }, "v"},
		// A subnormal Reynolds number is > 0, but 64/Re overflows.
		{"re subnormal", func() (float64, error) { return FrictionFactor(5e-324, 0) }, "f"},
	} {
		got, err := c.f()
		if got != 0 {
			t.Errorf("%s: got %v beside the error, want 0", c.name, got)
		}
		wantRangeError(t, c.name, err, c.param)
	}
}

func TestReynolds(t *testing.T) {
	// Re = v·d/ν: 4 m/s in a 16 mm bore of 32 mm²/s oil is 2000 exactly
	// (as far as the binary fractions allow).
	re, err := Reynolds(4*units.MetrePerSecond, 16*units.Millimetre, 32*units.SquareMillimetrePerSecond)
	if err != nil || math.Abs(re-2000) > 1e-12 {
		t.Errorf("Reynolds = %v, %v; want 2000", re, err)
	}
}

func TestFrictionFactorDoesNotAllocate(t *testing.T) {
	if n := testing.AllocsPerRun(100, func() { _, _ = FrictionFactor(3.3e4, 1e-4) }); n != 0 {
		t.Errorf("FrictionFactor allocates %v times", n)
	}
}

// BenchmarkFrictionFactor: the target is about 200 ns or less and no
// allocation per call over a spread of turbulent inputs.
func BenchmarkFrictionFactor(b *testing.B) {
	res := [...]float64{4.2e3, 1.1e4, 3.3e4, 1e5, 2.5e5, 1e6, 7e6, 5e7}
	rrs := [...]float64{0, 1e-5, 1e-4, 1e-3, 1e-2}
	b.ReportAllocs()
	var sink float64
	for i := 0; b.Loop(); i++ {
		f, _ := FrictionFactor(res[i%len(res)], rrs[i%len(rrs)])
		sink += f
	}
	_ = sink
}

// wantRangeError checks, in a subtest called name, that err is a range
// error naming param, its qualified function, value and valid range.
func wantRangeError(t *testing.T, name string, err error, param string) {
	t.Helper()
	t.Run(name, func(t *testing.T) { checktest.RangeError(t, err, param) })
}

// wantRangeErrorIn is wantRangeError that also checks the function the
// error names: the one the caller called.
func wantRangeErrorIn(t *testing.T, name string, err error, fn, param string) {
	t.Helper()
	t.Run(name, func(t *testing.T) { checktest.RangeErrorIn(t, err, fn, param) })
}
