package contamination

import (
	"errors"
	"math"
	"strings"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
	"gonum.org/v1/gonum/unit"
)

// TestBalanceDimensions recomputes the population balance in coherent SI
// with gonum.org/v1/gonum/unit v0.17.0 (a general-purpose reference library
// that tracks dimensions): ingress in particles per second, flow in m³/s,
// fluid volume in m³. The dimensions must come out as 1/m³ for the
// concentration, 1 for the share caught and s for τ, and the values, turned
// to per mL by hand (1 mL = 10⁻⁶ m³, NIST SP 811), must match ours, which
// work in particles per minute and mL/min. [X] from the balance
// dN/dt = R − Q·C·(1 − 1/β).
func TestBalanceDimensions(t *testing.T) {
	// Demo data: a sawmill log turner, 250 L of oil, 90 L/min through the
	// return filter, 4.5 × 10⁶ particles ≥6 µm(c) per minute, β = 200.
	const perMinute, beta = 4.5e6, 200.0
	q := 90 * units.LitrePerMinute
	v := 250 * units.Litre

	rate := unit.New(perMinute/60, unit.Dimensions{unit.TimeDim: -1}) // particles/s
	flow := unit.New(90e-3/60, unit.Dimensions{unit.LengthDim: 3, unit.TimeDim: -1})
	capture := 1 - 1/beta
	conc := rate.Copy().Div(flow.Copy().Mul(unit.Dimless(capture)))
	if want := (unit.Dimensions{unit.LengthDim: -3}); !unit.DimensionsMatch(conc, unit.New(1, want)) {
		t.Fatalf("concentration has dimensions %v, want %v", conc.Dimensions(), want)
	}
	perML := conc.Value() * 1e-6 // 1/m³ → 1/mL
	got, err := SteadyState(perMinute, q, beta)
	if err != nil || math.Abs(got-perML) > 1e-13*perML {
		t.Errorf("SteadyState = %.15g, %v; SI recomputation gives %.15g per mL", got, err, perML)
	}
	// By hand: 4.5e6 / (90 000 mL/min × 0.995) = 50.2513 per mL.
	if math.Abs(got-50.25125628) > 1e-6 {
		t.Errorf("SteadyState = %.10g, hand value 50.25125628", got)
	}

	// The share a filter must catch is dimensionless.
	target := unit.New(80e6, unit.Dimensions{unit.LengthDim: -3}) // 80 per mL, top of 13
	share := rate.Copy().Div(flow.Copy().Mul(target))
	if len(share.Dimensions()) != 0 {
		t.Fatalf("share has dimensions %v, want none", share.Dimensions())
	}
	wantBeta := 1 / (1 - share.Value())
	b, err := RequiredBeta(perMinute, q, 80)
	if err != nil || math.Abs(b-wantBeta) > 1e-12*wantBeta {
		t.Errorf("RequiredBeta = %.15g, %v; SI recomputation gives %.15g", b, err, wantBeta)
	}
	// By hand: share 4.5e6 / (90 000 × 80) = 0.625, β = 1/0.375 = 8/3.
	if math.Abs(b-8.0/3) > 1e-12 {
		t.Errorf("RequiredBeta = %.15g, hand value 8/3", b)
	}

	// τ = V / (Q·(1 − 1/β)) is a time.
	tau := unit.New(0.25, unit.Dimensions{unit.LengthDim: 3}).Div(flow.Copy().Mul(unit.Dimless(capture)))
	if !unit.DimensionsMatch(tau, unit.Time(1)) {
		t.Fatalf("τ has dimensions %v, want s", tau.Dimensions())
	}
	d, err := TimeConstant(v, q, beta)
	if err != nil || math.Abs(d.Seconds()-tau.Value()) > 1e-6 {
		t.Errorf("TimeConstant = %v, %v; SI recomputation gives %.9g s", d, err, tau.Value())
	}
	// By hand: 250 L / (1.5 L/s × 0.995) = 167.504 s.
	if math.Abs(d.Seconds()-167.5041876) > 1e-6 {
		t.Errorf("TimeConstant = %v, hand value 167.5041876 s", d)
	}
}

// Regressions for defects found by TestNoPanicNoNaN and by hand. Each row
// gave a wrong answer or a spurious error before the fix.
func TestBalanceExtremeInputs(t *testing.T) {
	// RequiredBeta(0, tiny q, tiny C): Q·C underflowed to 0, 0/0 = NaN, and
	// no ingress was reported as unreachable. With no ingress any filter
	// (β = 1) holds any target.
	if b, err := RequiredBeta(0, 5e-324, 5e-324); err != nil || b != 1 {
		t.Errorf("RequiredBeta(0, 5e-324, 5e-324) = %g, %v; want 1", b, err)
	}
	// Q·C = 2 × 10³⁰⁸ overflowed to +Inf, the share became 0 and β = 1 was
	// returned with a nil error; the share is ½, so β = 2 [X].
	q := units.Flow(2e154) * millilitrePerMinuteFlow
	if b, err := RequiredBeta(1e308, q, 1e154); err != nil || math.Abs(b-2) > 1e-12 {
		t.Errorf("RequiredBeta(1e308, 2e154 mL/min, 1e154) = %g, %v; want 2", b, err)
	}
	// SteadyState: 10³⁰⁸/min into 10³⁰⁸ mL/min at β = 2 holds 2 per mL [X];
	// Q·(1 − 1/β) in mL/min must not overflow on the way.
	if c, err := SteadyState(1e308, units.Flow(1e308)*millilitrePerMinuteFlow, 2); err != nil || math.Abs(c-2) > 1e-12 {
		t.Errorf("SteadyState(1e308, 1e308 mL/min, 2) = %g, %v; want 2", c, err)
	}
}

// Every bad argument gives 0 and a range error naming it. A target no filter
// can hold also matches ErrUnreachable and names the argument to change.
func TestBalanceBadInput(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	q := 100 * units.LitrePerMinute
	cases := []struct {
		name, fn, param string
		f               func() (float64, error)
		unreachable     bool
	}{
		// Each error names the function called (BetaForTarget, not the
		// RequiredBeta it calls) and its parameter.
		{"ingress < 0", "contamination.SteadyState", "perMinute", func() (float64, error) { return SteadyState(-1, q, 200) }, false},
		{"flow 0", "contamination.SteadyState", "q", func() (float64, error) { return SteadyState(1, 0, 200) }, false},
		{"flow NaN", "contamination.SteadyState", "q", func() (float64, error) { return SteadyState(1, units.Flow(nan), 200) }, false},
		{"beta 1", "contamination.SteadyState", "beta", func() (float64, error) { return SteadyState(1, q, 1) }, true},
		{"beta 0", "contamination.SteadyState", "beta", func() (float64, error) { return SteadyState(1, q, 0) }, false},
		// 10³⁰⁸ per minute into 10⁻³⁰⁰ m³/s: +Inf was returned beside the
		// error.
		{"steady overflow", "contamination.SteadyState", "concentration", func() (float64, error) { return SteadyState(1e308, units.Flow(1e-300), 2) }, false},
		// A non-zero ingress whose concentration underflows to 0.
		{"steady underflow", "contamination.SteadyState", "concentration", func() (float64, error) { return SteadyState(5e-324, units.Flow(1e10), 2) }, false},
		{"target 0", "contamination.RequiredBeta", "perML", func() (float64, error) { return RequiredBeta(1, q, 0) }, false},
		{"target NaN", "contamination.RequiredBeta", "perML", func() (float64, error) { return RequiredBeta(1, q, nan) }, false},
		{"ingress Inf", "contamination.RequiredBeta", "perMinute", func() (float64, error) { return RequiredBeta(inf, q, 10) }, false},
		{"unreachable", "contamination.RequiredBeta", "q", func() (float64, error) { return RequiredBeta(1e9, q, 10) }, true},
		{"scale 29", "contamination.BetaForTarget", "n", func() (float64, error) { return BetaForTarget(1, q, 29) }, false},
		{"target unreachable", "contamination.BetaForTarget", "q", func() (float64, error) { return BetaForTarget(3e6, q, 10) }, true},
	}
	for _, c := range cases {
		v, err := c.f()
		checktest.RangeErrorIn(t, err, c.fn, c.param)
		if v != 0 {
			t.Errorf("%s: %g with an error, want 0", c.name, v)
		}
		if errors.Is(err, ErrUnreachable) != c.unreachable {
			t.Errorf("%s: err = %v; ErrUnreachable %v, want %v", c.name, err, !c.unreachable, c.unreachable)
		}
	}
	for _, c := range []struct {
		name, param string
		v           units.Volume
		q           units.Flow
		beta        float64
	}{
		{"tau beta 1", "beta", units.Litre, q, 1},
		{"tau volume 0", "v", 0, q, 10},
		{"tau flow 0", "q", units.Litre, 0, 10},
		{"tau too long", "τ", 1e9 * units.Litre, units.Flow(1e-12), 10},
		{"tau below 1 ns", "τ", units.Volume(1e-30), units.Flow(1e10), 10},
	} {
		d, err := TimeConstant(c.v, c.q, c.beta)
		wantRangeError(t, err, c.param)
		if d != 0 {
			t.Errorf("%s: %v with an error, want 0", c.name, d)
		}
	}
}

// The unreachable error says, in flow units, how much flow a perfect filter
// would need: 10⁹ per minute held at 10 per mL needs 10⁸ mL/min =
// 100 000 L/min [X from the balance], not a bare float.
func TestRequiredBetaUnreachableNamesFlow(t *testing.T) {
	_, err := RequiredBeta(1e9, 100*units.LitrePerMinute, 10)
	var re *units.RangeError
	if !errors.As(err, &re) || !strings.Contains(re.Valid, (100000*units.LitrePerMinute).String()) {
		t.Errorf("err = %v; want the needed flow %v in the valid range", err, 100000*units.LitrePerMinute)
	}
}

// millilitrePerMinuteFlow is 1 mL/min as a Flow, from the units package's
// own constant.
const millilitrePerMinuteFlow = units.LitrePerMinute / 1000

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

// TestIngressFrom: the ingress worked back from a steady sample, R =
// Q·C·(1 − 1/β), the balance dN/dt = R − Q·C·(1 − 1/β) at rest [X]. By
// hand: 50.2513 per mL held at 90 000 mL/min through β = 200 takes
// 90 000 × 50.2513 × 0.995 = 4.5 × 10⁶ per minute, TestBalanceDimensions'
// ingress; and SteadyState of the ingress found gives the sample back.
func TestIngressFrom(t *testing.T) {
	q := 90 * units.LitrePerMinute
	r, err := IngressFrom(50.25125628140704, q, 200)
	if err != nil || math.Abs(r-4.5e6) > 1e-6 {
		t.Errorf("IngressFrom = %.10g, %v; hand value 4.5e6", r, err)
	}
	for _, c := range []struct{ perML, beta float64 }{{3000, 2}, {0.02, 1000}, {1e6, 1.0001}, {0, 75}} {
		r, err := IngressFrom(c.perML, q, c.beta)
		if err != nil {
			t.Fatal(err)
		}
		if back, err := SteadyState(r, q, c.beta); err != nil || math.Abs(back-c.perML) > 1e-12*c.perML {
			t.Errorf("SteadyState(IngressFrom(%v)) = %v, %v", c.perML, back, err)
		}
	}
	for param, f := range map[string]func() (float64, error){
		"perML": func() (float64, error) { return IngressFrom(-1, q, 200) },
		"q":     func() (float64, error) { return IngressFrom(10, 0, 200) },
		"beta":  func() (float64, error) { return IngressFrom(10, q, 1) },
	} {
		_, err := f()
		checktest.RangeErrorIn(t, err, "contamination.IngressFrom", param)
	}
}
