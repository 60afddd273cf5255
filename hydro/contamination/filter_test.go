package contamination

import (
	"errors"
	"math"
	"strings"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/units"
)

func TestEfficiency(t *testing.T) {
	cases := []struct {
		beta, percent, tol float64
	}{
		// ISO 16889 definition E = (1 − 1/β)·100 % [S]; the pairs are
		// computed from it [X] (CHECKS.md), not read from a printed table.
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

// simulate integrates dN/dt = R − Q·(N/V)·(1 − 1/β) by classic Runge–Kutta
// from N = 0 for time span, and returns the concentration per mL. It is the
// defining balance solved by a different route from the closed forms.
func simulate(perMinute, qmlPerMin, beta, vml float64, span time.Duration) float64 {
	f := func(n float64) float64 { return perMinute - qmlPerMin*(n/vml)*(1-1/beta) }
	const steps = 20000
	h := span.Minutes() / steps
	n := 0.0
	for range steps {
		k1 := f(n)
		k2 := f(n + h/2*k1)
		k3 := f(n + h/2*k2)
		k4 := f(n + h*k3)
		n += h / 6 * (k1 + 2*k2 + 2*k3 + k4)
	}
	return n / vml
}

func TestSteadyStateAgainstBalance(t *testing.T) {
	// Demo data: a 400 L tank, 120 L/min through a return filter.
	const v = 400e3 // mL
	q := 120 * units.LitrePerMinute
	for _, c := range []struct{ ingress, beta float64 }{
		{2e6, 200}, {5e5, 2}, {1e8, 1000}, {0, 75},
	} {
		got, err := SteadyState(c.ingress, q, c.beta)
		if err != nil {
			t.Fatal(err)
		}
		// [X] computed from the defining population balance by integration
		// over 40 time constants; RK4 error far below the tolerance.
		tau, _ := TimeConstant(v*units.Millilitre, q, c.beta)
		want := simulate(c.ingress, 120e3, c.beta, v, 40*tau)
		if math.Abs(got-want) > 1e-9*want {
			t.Errorf("SteadyState(%g, %v, %g) = %.10g; balance gives %.10g", c.ingress, q, c.beta, got, want)
		}
		// One time constant closes 1 − 1/e of the gap [X].
		if c.ingress > 0 {
			at := simulate(c.ingress, 120e3, c.beta, v, tau)
			if math.Abs(at/got-(1-math.Exp(-1))) > 1e-8 {
				t.Errorf("after τ = %v: %g of steady state, want 1 − 1/e", tau, at/got)
			}
		}
		// The reverse gives the beta back.
		if c.ingress > 0 {
			b, err := RequiredBeta(c.ingress, q, got)
			if err != nil || math.Abs(b-c.beta) > 1e-9*c.beta {
				t.Errorf("RequiredBeta for %g /mL = %g, %v; want %g", got, b, err, c.beta)
			}
		}
	}
}

func TestBetaForTarget(t *testing.T) {
	// 14 µm(c) number 12 holds up to 40 per mL (ISO 4406:2021, Table 1 [S]).
	// 3e6 /min into 100 L/min = 1e5 mL/min: a perfect filter holds 30 /mL;
	// β = 1/(1 − 30/40) = 4 [X from the balance].
	b, err := BetaForTarget(3e6, 100*units.LitrePerMinute, 12)
	if err != nil || math.Abs(b-4) > 1e-12 {
		t.Errorf("BetaForTarget = %g, %v; want 4", b, err)
	}
	// Number 10 (10 /mL) cannot be held: 30 /mL even with β → ∞.
	if _, err := BetaForTarget(3e6, 100*units.LitrePerMinute, 10); !errors.Is(err, ErrUnreachable) {
		t.Errorf("unreachable target: err = %v", err)
	}
}

func TestCleanDropDarcy(t *testing.T) {
	// [X] Darcy's law for laminar flow through a porous medium:
	// Δp = μ·Q·L/(k·A), μ = ρ·ν. Demo element: k = 2e-13 m², L = 0.6 mm,
	// A = 0.35 m², ρ = 870 kg/m³.
	darcy := func(q units.Flow, nu units.KinematicViscosity) units.Pressure {
		const k, l, a, rho = 2e-13, 0.6e-3, 0.35, 870.0
		return units.Pressure(rho * float64(nu) * float64(q) * l / (k * a))
	}
	q0, nu0 := 100*units.LitrePerMinute, 32*units.Centistokes
	at := ElementPoint{Drop: darcy(q0, nu0), Flow: q0, Viscosity: nu0}
	for _, c := range []struct {
		q  units.Flow
		nu units.KinematicViscosity
	}{
		{150 * units.LitrePerMinute, 32 * units.Centistokes},
		{100 * units.LitrePerMinute, 400 * units.Centistokes},
		{40 * units.LitrePerMinute, 15 * units.Centistokes},
	} {
		got, err := CleanDrop(at, c.q, c.nu)
		want := darcy(c.q, c.nu)
		if err != nil || math.Abs(float64(got-want)) > 1e-12*float64(want) {
			t.Errorf("CleanDrop(%v, %v) = %v, %v; Darcy gives %v", c.q, c.nu, got, err, want)
		}
	}
}

func TestCheckBypass(t *testing.T) {
	at := ElementPoint{Drop: 0.3 * units.Bar, Flow: 100 * units.LitrePerMinute, Viscosity: 30 * units.Centistokes}
	cases := []struct {
		name         string
		nu           units.KinematicViscosity
		opens, tight bool
	}{
		{"working", 30 * units.Centistokes, false, false},   // 0.3 of 3 bar
		{"cool", 120 * units.Centistokes, false, true},      // 1.2 of 3 bar
		{"cold start", 600 * units.Centistokes, true, true}, // 6 of 3 bar
	}
	for _, c := range cases {
		r, err := CheckBypass(at, 100*units.LitrePerMinute, c.nu, 3*units.Bar)
		if err != nil || r.Opens != c.opens || r.Tight != c.tight {
			t.Errorf("%s: %+v, %v", c.name, r, err)
			continue
		}
		if !strings.Contains(strings.Join(r.Cautions, "\n"), "clogging indicator") {
			t.Errorf("%s: no clogging-indicator caution", c.name)
		}
	}
}

func TestFilterBadInput(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	q := 100 * units.LitrePerMinute
	at := ElementPoint{Drop: units.Bar, Flow: q, Viscosity: 30 * units.Centistokes}
	cases := []struct {
		name string
		f    func() error
		want error
	}{
		// Beta and efficiency.
		{"beta < 1", func() error { _, err := Efficiency(0.5); return err }, units.ErrRange},
		{"beta NaN", func() error { _, err := Efficiency(nan); return err }, units.ErrRange},
		{"beta Inf", func() error { _, err := Efficiency(inf); return err }, units.ErrRange},
		{"efficiency 100", func() error { _, err := BetaFromEfficiency(100); return err }, units.ErrRange},
		{"efficiency < 0", func() error { _, err := BetaFromEfficiency(-1); return err }, units.ErrRange},
		{"efficiency NaN", func() error { _, err := BetaFromEfficiency(nan); return err }, units.ErrRange},
		{"downstream 0", func() error { _, err := BetaRatio(10, 0); return err }, units.ErrRange},
		{"upstream < downstream", func() error { _, err := BetaRatio(1, 10); return err }, units.ErrRange},
		{"upstream Inf", func() error { _, err := BetaRatio(inf, 10); return err }, units.ErrRange},
		{"rating size 0", func() error { _, err := Rating{Beta: 200}.Efficiency(); return err }, units.ErrRange},
		{"rating beta 0", func() error { _, err := Rating{Size: units.Micrometre}.Efficiency(); return err }, units.ErrRange},
		// Balance.
		{"ingress < 0", func() error { _, err := SteadyState(-1, q, 200); return err }, units.ErrRange},
		{"flow 0", func() error { _, err := SteadyState(1, 0, 200); return err }, units.ErrRange},
		{"flow NaN", func() error { _, err := SteadyState(1, units.Flow(nan), 200); return err }, units.ErrRange},
		{"beta 1", func() error { _, err := SteadyState(1, q, 1); return err }, ErrUnreachable},
		{"beta 0", func() error { _, err := SteadyState(1, q, 0); return err }, units.ErrRange},
		{"steady overflow", func() error { _, err := SteadyState(1e308, units.Flow(1e-300), 2); return err }, units.ErrRange},
		{"target 0", func() error { _, err := RequiredBeta(1, q, 0); return err }, units.ErrRange},
		{"target NaN", func() error { _, err := RequiredBeta(1, q, nan); return err }, units.ErrRange},
		{"ingress Inf", func() error { _, err := RequiredBeta(inf, q, 10); return err }, units.ErrRange},
		{"unreachable", func() error { _, err := RequiredBeta(1e9, q, 10); return err }, ErrUnreachable},
		{"scale 29", func() error { _, err := BetaForTarget(1, q, 29); return err }, units.ErrRange},
		{"tau beta 1", func() error { _, err := TimeConstant(units.Litre, q, 1); return err }, units.ErrRange},
		{"tau volume 0", func() error { _, err := TimeConstant(0, q, 10); return err }, units.ErrRange},
		{"tau flow 0", func() error { _, err := TimeConstant(units.Litre, 0, 10); return err }, units.ErrRange},
		{"tau too long", func() error { _, err := TimeConstant(1e9*units.Litre, units.Flow(1e-12), 10); return err }, units.ErrRange},
		// Pressure drop.
		{"drop 0", func() error { _, err := CleanDrop(ElementPoint{Flow: q, Viscosity: 1}, q, 1); return err }, units.ErrRange},
		{"point flow 0", func() error { _, err := CleanDrop(ElementPoint{Drop: 1, Viscosity: 1}, q, 1); return err }, units.ErrRange},
		{"point nu 0", func() error { _, err := CleanDrop(ElementPoint{Drop: 1, Flow: q}, q, 1); return err }, units.ErrRange},
		{"nu NaN", func() error { _, err := CleanDrop(at, q, units.KinematicViscosity(nan)); return err }, units.ErrRange},
		{"q < 0", func() error { _, err := CleanDrop(at, -q, 1); return err }, units.ErrRange},
		{"drop overflow", func() error { _, err := CleanDrop(at, units.Flow(1e300), 1e300); return err }, units.ErrRange},
		{"bypass 0", func() error { _, err := CheckBypass(at, q, 1, 0); return err }, units.ErrRange},
		{"bypass, bad point", func() error { _, err := CheckBypass(ElementPoint{}, q, 1, units.Bar); return err }, units.ErrRange},
	}
	for _, c := range cases {
		if err := c.f(); !errors.Is(err, c.want) {
			t.Errorf("%s: err = %v, want %v", c.name, err, c.want)
		}
	}
}
