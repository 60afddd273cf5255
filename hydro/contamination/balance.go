package contamination

import (
	"math"
	"strconv"
	"time"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ErrUnreachable reports a target concentration that no filter can hold:
// the ingress is at least what the flow can carry away even with every
// particle caught, or a beta of 1 that catches nothing. It also matches
// units.ErrRange, and the errors that carry it are *units.RangeError values
// naming the argument to change.
var ErrUnreachable error = validate.Sentinel("no steady cleanliness can be held at this flow, ingress and beta")

// SteadyState returns the steady concentration, particles ≥x per mL, that
// a full-flow filter of beta ratio beta (at size x) holds for an ingress of
// perMinute particles ≥x per minute and flow q through the filter:
// C = R / (Q·(1 − 1/β)), R in particles per minute, Q in mL/min, C per mL
// (the population balance of the package documentation, an estimate to be
// confirmed with samples). A beta of exactly 1 catches nothing and gives an
// error matching ErrUnreachable. perMinute must be finite and ≥ 0, q finite
// and > 0, beta finite and ≥ 1 (units.ErrRange). A concentration beyond
// float64, or one that underflows to 0 for a non-zero ingress, is an error.
func SteadyState(perMinute float64, q units.Flow, beta float64) (float64, error) {
	const fn = "contamination.SteadyState"
	if err := checkBalance(fn, perMinute, q); err != nil {
		return 0, err
	}
	if err := checkBeta(fn, beta); err != nil {
		return 0, err
	}
	capture := 1 - 1/beta
	if capture == 0 {
		return 0, validate.Kind(validate.Fail(fn, "beta", beta, "> 1: a beta of 1 catches nothing"), ErrUnreachable)
	}
	c := mulDiv(perMinute, millilitrePerMinute, 1, float64(q), capture, 1)
	if err := validate.Result(fn, "concentration", c); err != nil {
		return 0, err
	}
	if perMinute > 0 {
		if err := validate.PositiveResult(fn, "concentration", c); err != nil {
			return 0, err
		}
	}
	return c, nil
}

// IngressFrom returns the ingress, particles ≥x per minute, that a steady
// concentration of perML particles ≥x per mL implies with flow q through a
// full-flow filter of beta ratio beta (at size x): R = Q·C·(1 − 1/β), Q in
// mL/min, the steady state of the population balance (package
// documentation) solved for the ingress, SteadyState's inverse. Use it to
// work the ingress back from a sample of a machine like the one being
// sized, with the filter that held it there. perML must be finite and
// ≥ 0, q finite and > 0, beta finite and > 1 (a filter that catches
// nothing holds no steady state to work back from); errors match
// units.ErrRange.
func IngressFrom(perML float64, q units.Flow, beta float64) (float64, error) {
	const fn = "contamination.IngressFrom"
	if err := validate.NonNegative(fn, "perML", perML); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Above(fn, "beta", beta, 1); err != nil {
		return 0, err
	}
	r := mulDiv(perML, float64(q), 1-1/beta, millilitrePerMinute, 1, 1)
	if err := validate.Result(fn, "ingress", r); err != nil {
		return 0, err
	}
	if perML > 0 {
		if err := validate.PositiveResult(fn, "ingress", r); err != nil {
			return 0, err
		}
	}
	return r, nil
}

// RequiredBeta returns the least beta ratio (at size x) that holds a
// concentration of perML particles ≥x per mL for an ingress of perMinute
// particles ≥x per minute and flow q through a full-flow filter:
// β = 1 / (1 − R/(Q·C)), R per minute, Q in mL/min, C per mL: the steady
// state of the population balance (package documentation) solved for β.
// Zero ingress gives β = 1. When R ≥ Q·C no filter can hold the target:
// the error matches ErrUnreachable and names q with the least flow a
// perfect filter would need; more flow through the filter, less ingress or
// an additional (off-line) filter is needed. perMinute must be finite and
// ≥ 0, q and perML finite and > 0 (units.ErrRange).
func RequiredBeta(perMinute float64, q units.Flow, perML float64) (float64, error) {
	const fn = "contamination.RequiredBeta"
	if err := checkBalance(fn, perMinute, q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "perML", perML); err != nil {
		return 0, err
	}
	share := mulDiv(perMinute, millilitrePerMinute, 1, float64(q), perML, 1) // fraction that must be caught
	if !(share < 1) {
		need := units.Flow(mulDiv(perMinute, millilitrePerMinute, 1, perML, 1, 1))
		return 0, validate.Kind(&units.RangeError{Func: fn, Param: "q", Value: q.String(),
			Valid: "> " + need.String() + ", the flow a perfect filter needs to hold " + strconv.FormatFloat(perML, 'g', 4, 64) +
				" per mL against " + strconv.FormatFloat(perMinute, 'g', 4, 64) + " particles per minute"}, ErrUnreachable)
	}
	b := 1 / (1 - share)
	if err := validate.Result(fn, "beta", b); err != nil {
		return 0, err
	}
	return b, nil
}

// BetaForTarget returns the least beta ratio that holds target scale number
// n: RequiredBeta with the upper bound of n's count range (ISO 4406:2021,
// Table 1), the most particles per mL that still read n. The ingress and the
// beta ratio must be for the size the number counts (≥4, ≥6 or ≥14 µm(c)).
// n must be 0…28 (units.ErrRange); other errors are those of RequiredBeta,
// named for BetaForTarget.
func BetaForTarget(perMinute float64, q units.Flow, n int) (float64, error) {
	const fn = "contamination.BetaForTarget"
	if n < 0 || n > MaxScale {
		return 0, validate.Fail(fn, "n", float64(n), "a scale number from 0 to 28")
	}
	b, err := RequiredBeta(perMinute, q, upper[n])
	if err != nil {
		return 0, validate.Renamed(err, fn, nil)
	}
	return b, nil
}

// TimeConstant returns τ = V / (Q·(1 − 1/β)), V in m³ and Q in m³/s giving
// seconds, the time in which the population balance (package documentation)
// closes about 63 % of the gap between the present and the
// steady concentration (about 95 % in 3τ). v is the system's fluid volume.
// v and q must be finite and > 0, beta finite and > 1 (units.ErrRange);
// results beyond time.Duration's range or below its resolution (1 ns) are
// refused.
func TimeConstant(v units.Volume, q units.Flow, beta float64) (time.Duration, error) {
	const fn = "contamination.TimeConstant"
	if err := validate.Positive(fn, "v", v); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if math.IsNaN(beta) || math.IsInf(beta, 0) || beta <= 1 {
		return 0, validate.Fail(fn, "beta", beta, "> 1 and finite")
	}
	s := float64(v) / (float64(q) * (1 - 1/beta))
	if !(s < float64(math.MaxInt64)/float64(time.Second)) {
		return 0, validate.Fail(fn, "τ", s, "below about 292 years (time.Duration's range)")
	}
	d := time.Duration(s * float64(time.Second))
	if d <= 0 {
		return 0, validate.Fail(fn, "τ", s, "at least 1 ns (time.Duration's resolution)")
	}
	return d, nil
}

// checkBalance checks an ingress rate and a flow.
func checkBalance(fn string, perMinute float64, q units.Flow) error {
	if err := validate.NonNegative(fn, "perMinute", perMinute); err != nil {
		return err
	}
	return validate.Positive(fn, "q", q)
}

// millilitrePerMinute is 1 mL/min in m³/s.
const millilitrePerMinute = float64(units.LitrePerMinute) / 1000

// mulDiv returns a·b·c ÷ (d·e·f) for finite a, b, c ≥ 0 and d, e, f > 0
// without spurious overflow or underflow in the intermediate products: the
// mantissas and the binary exponents are combined separately, so the result
// is +Inf or 0 only when the true result is beyond float64's range.
func mulDiv(a, b, c, d, e, f float64) float64 {
	ma, ea := math.Frexp(a)
	mb, eb := math.Frexp(b)
	mc, ec := math.Frexp(c)
	md, ed := math.Frexp(d)
	me, ee := math.Frexp(e)
	mf, ef := math.Frexp(f)
	return math.Ldexp(ma*mb*mc/(md*me*mf), ea+eb+ec-ed-ee-ef)
}
