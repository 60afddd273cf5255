package contamination

import (
	"errors"
	"math"
	"testing"

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
	// CleanDrop: Q/Q₀ = 10³¹⁰ overflowed to +Inf and gave an error, though
	// the drop, 10⁵ Pa × 10³¹⁰ × 10⁻²⁹⁵ = 10²⁰ Pa, is finite [X].
	at := ElementPoint{Drop: 1e5, Flow: 1e-300, Viscosity: 1e-5}
	if dp, err := CleanDrop(at, 1e10, 1e-300); err != nil || math.Abs(float64(dp)/1e20-1) > 1e-12 {
		t.Errorf("CleanDrop = %v, %v; want 1e20 Pa", dp, err)
	}
	// CheckBypass: a finite drop over a tiny bypass setting gave Share =
	// +Inf with a nil error; now it is an error naming the ratio.
	at = ElementPoint{Drop: 1e5, Flow: 1e-3, Viscosity: 46e-6}
	if r, err := CheckBypass(at, 1e300, 46e-6, 1e-10); !errors.Is(err, units.ErrRange) {
		t.Errorf("CheckBypass(…, bypass 1e-10 Pa) = %+v, %v; want an error matching units.ErrRange", r, err)
	}
}

// millilitrePerMinuteFlow is 1 mL/min as a Flow, from the units package's
// own constant.
const millilitrePerMinuteFlow = units.LitrePerMinute / 1000
