package contamination

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

func TestEfficiency(t *testing.T) {
	cases := []struct {
		beta, percent, tol float64
	}{
		// ISO 16889 definition E = (1 − 1/β)·100 % [S]; the pairs are
		// computed from it [X], not read from a printed table.
		{2, 50, 1e-13},      // [X]
		{75, 98.67, 0.005},  // [X], given to two decimals
		{200, 99.5, 1e-13},  // [X]
		{1000, 99.9, 1e-13}, // [X]
		{1, 0, 0},           // [X] β = 1 catches nothing
	}
	for _, c := range cases {
		e, err := Efficiency(c.beta)
		if err != nil || math.Abs(e-c.percent) > c.tol {
			t.Errorf("Efficiency(%g) = %.6g, %v; want %g ± %g", c.beta, e, err, c.percent, c.tol)
		}
		if c.tol > 0.001 {
			continue // a rounded efficiency does not give β back exactly
		}
		b, err := BetaFromEfficiency(c.percent)
		if err != nil || math.Abs(b-c.beta) > 1e-9*c.beta {
			t.Errorf("BetaFromEfficiency(%g) = %.12g, %v; want %g", c.percent, b, err, c.beta)
		}
	}
}

// TestBetaFromEfficiencyNearFull: the largest efficiency below 100 % gives a
// huge but finite β, never Inf.
func TestBetaFromEfficiencyNearFull(t *testing.T) {
	b, err := BetaFromEfficiency(math.Nextafter(100, 0))
	if err != nil || math.IsInf(b, 0) || b < 1e15 {
		t.Errorf("BetaFromEfficiency(100⁻) = %g, %v", b, err)
	}
}

func TestBetaRatio(t *testing.T) {
	// ISO 16889 definition β = upstream ÷ downstream [S].
	b, err := BetaRatio(12000, 60)
	if err != nil || b != 200 {
		t.Errorf("BetaRatio(12000, 60) = %g, %v; want 200", b, err)
	}
	r := Rating{Size: 10 * units.Micrometre, Beta: 1000}
	if s := r.String(); s != "β_10(c) ≥ 1000" {
		t.Errorf("Rating.String() = %q", s)
	}
	if e, err := r.Efficiency(); err != nil || math.Abs(e-99.9) > 1e-12 {
		t.Errorf("Rating.Efficiency() = %g, %v", e, err)
	}
}

// Every bad argument gives 0 and a range error naming it; a ratio beyond
// float64 is an error, never +Inf beside it.
func TestBetaBadInput(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	cases := []struct {
		name, param string
		f           func() (float64, error)
	}{
		{"beta < 1", "beta", func() (float64, error) { return Efficiency(0.5) }},
		{"beta NaN", "beta", func() (float64, error) { return Efficiency(nan) }},
		{"beta Inf", "beta", func() (float64, error) { return Efficiency(inf) }},
		{"efficiency 100", "percent", func() (float64, error) { return BetaFromEfficiency(100) }},
		{"efficiency < 0", "percent", func() (float64, error) { return BetaFromEfficiency(-1) }},
		{"efficiency NaN", "percent", func() (float64, error) { return BetaFromEfficiency(nan) }},
		{"downstream 0", "downstream", func() (float64, error) { return BetaRatio(10, 0) }},
		{"upstream < downstream", "upstream", func() (float64, error) { return BetaRatio(1, 10) }},
		{"upstream Inf", "upstream", func() (float64, error) { return BetaRatio(inf, 10) }},
		// 1/5e-324 overflowed: +Inf was returned beside the error.
		{"ratio overflow", "beta", func() (float64, error) { return BetaRatio(1, 5e-324) }},
		{"rating size 0", "Size", func() (float64, error) { return Rating{Beta: 200}.Efficiency() }},
		{"rating beta 0", "beta", func() (float64, error) { return Rating{Size: units.Micrometre}.Efficiency() }},
	}
	for _, c := range cases {
		v, err := c.f()
		wantRangeError(t, err, c.param)
		if v != 0 {
			t.Errorf("%s: %g with an error, want 0", c.name, v)
		}
	}
	wantRangeError(t, Rating{Size: -1, Beta: 2}.Validate(), "Size")
}
