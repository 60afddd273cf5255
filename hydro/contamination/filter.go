package contamination

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"time"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ErrUnreachable reports a target concentration that no filter can hold:
// the ingress is at least what the flow can carry away even with every
// particle caught.
var ErrUnreachable = errors.New("no steady cleanliness can be held at this flow, ingress and beta")

// Efficiency returns the capture efficiency, in percent, of a filter with
// beta ratio beta: E = (1 − 1/β)·100 % (ISO 16889). beta must be finite and
// ≥ 1; otherwise the error matches units.ErrRange.
func Efficiency(beta float64) (float64, error) {
	if err := checkBeta("contamination.Efficiency", beta); err != nil {
		return 0, err
	}
	return (1 - 1/beta) * 100, nil
}

// BetaFromEfficiency returns the beta ratio for a capture efficiency in
// percent: β = 1 / (1 − E/100) (ISO 16889, inverted). percent must be from 0
// up to (not including) 100; otherwise the error matches units.ErrRange.
func BetaFromEfficiency(percent float64) (float64, error) {
	const fn = "contamination.BetaFromEfficiency"
	if math.IsNaN(percent) || percent < 0 || percent >= 100 {
		return 0, validate.Fail(fn, "percent", percent, "from 0 up to (not including) 100")
	}
	b := 1 / (1 - percent/100)
	return b, validate.Result(fn, "beta", b)
}

// BetaRatio returns β = upstream ÷ downstream for cumulative counts at the
// same size, ≥x µm(c), measured in a multi-pass test (ISO 16889). upstream
// must be finite and ≥ downstream, downstream finite and > 0; otherwise the
// error matches units.ErrRange (a β below 1 is a filter releasing
// particles, which these functions do not model).
func BetaRatio(upstream, downstream float64) (float64, error) {
	const fn = "contamination.BetaRatio"
	if err := validate.Positive(fn, "downstream", downstream); err != nil {
		return 0, err
	}
	if err := validate.Finite(fn, "upstream", upstream); err != nil {
		return 0, err
	}
	if upstream < downstream {
		return 0, validate.Fail(fn, "upstream", upstream, "≥ downstream ("+strconv.FormatFloat(downstream, 'g', -1, 64)+")")
	}
	b := upstream / downstream
	return b, validate.Result(fn, "beta", b)
}

func checkBeta(fn string, beta float64) error {
	if math.IsNaN(beta) || math.IsInf(beta, 0) || beta < 1 {
		return validate.Fail(fn, "beta", beta, "≥ 1 and finite")
	}
	return nil
}

// Rating is a filter element's rating: beta ratio Beta or better at particle
// size Size in µm(c), written β_x(c) ≥ value (ISO 16889), e.g.
// β_10(c) ≥ 1000.
type Rating struct {
	Size units.Length // x, the particle size, e.g. 10 * units.Micrometre
	Beta float64      // the least beta ratio at that size, ≥ 1
}

// Validate checks Size (finite, > 0) and Beta (finite, ≥ 1); errors match
// units.ErrRange.
func (r Rating) Validate() error {
	if err := validate.Positive("contamination.Rating", "Size", r.Size); err != nil {
		return err
	}
	return checkBeta("contamination.Rating", r.Beta)
}

// Efficiency returns the rating's least capture efficiency in percent at
// its size, (1 − 1/β)·100 % (ISO 16889).
func (r Rating) Efficiency() (float64, error) {
	if err := r.Validate(); err != nil {
		return 0, err
	}
	return Efficiency(r.Beta)
}

// String writes the rating as "β_10(c) ≥ 1000": the size in µm and the beta
// ratio, each in the shortest decimal that reads back.
func (r Rating) String() string {
	b := make([]byte, 0, 32)
	b = append(b, "β_"...)
	b = strconv.AppendFloat(b, r.Size.Micrometres(), 'g', -1, 64)
	b = append(b, "(c) ≥ "...)
	b = strconv.AppendFloat(b, r.Beta, 'g', -1, 64)
	return string(b)
}

// SteadyState returns the steady concentration, particles ≥x per mL, that
// a full-flow filter of beta ratio beta (at size x) holds for an ingress of
// perMinute particles ≥x per minute and flow q through the filter:
// C = R / (Q·(1 − 1/β)), R in particles per minute, Q in mL/min, C per mL
// (the population balance of the package documentation, an estimate to be
// confirmed with samples). A beta of exactly 1 catches nothing and gives an error
// matching ErrUnreachable. perMinute must be finite and ≥ 0, q finite and
// > 0, beta finite and ≥ 1 (units.ErrRange).
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
		return 0, fmt.Errorf("%s: beta = 1 catches nothing: %w", fn, ErrUnreachable)
	}
	c := mulDiv(perMinute, millilitrePerMinute, 1, float64(q), capture, 1)
	return c, validate.Result(fn, "concentration", c)
}

// RequiredBeta returns the least beta ratio (at size x) that holds a
// concentration of perML particles ≥x per mL for an ingress of perMinute
// particles ≥x per minute and flow q through a full-flow filter:
// β = 1 / (1 − R/(Q·C)), R per minute, Q in mL/min, C per mL: the steady
// state of the population balance (package documentation) solved for β.
// Zero ingress gives β = 1. When R ≥ Q·C no filter can hold the target (ErrUnreachable): more
// flow through the filter, less ingress or an additional (off-line) filter
// is needed. perMinute must be finite and ≥ 0, q and perML finite and > 0
// (units.ErrRange).
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
		return 0, fmt.Errorf("%s: ingress %g /min needs at least %g mL/min through a perfect filter to hold %g /mL, have %g mL/min: %w",
			fn, perMinute, perMinute/perML, perML, q.LitresPerMinute()*1000, ErrUnreachable)
	}
	b := 1 / (1 - share)
	return b, validate.Result(fn, "beta", b)
}

// BetaForTarget returns the least beta ratio that holds target scale number
// n: RequiredBeta with the upper bound of n's count range (ISO 4406:2021,
// Table 1), the most particles per mL that still read n. The ingress and the
// beta ratio must be for the size the number counts (≥4, ≥6 or ≥14 µm(c)).
// n must be 0…28 (units.ErrRange); other errors are those of RequiredBeta.
func BetaForTarget(perMinute float64, q units.Flow, n int) (float64, error) {
	if n < 0 || n > MaxScale {
		return 0, validate.Fail("contamination.BetaForTarget", "n", float64(n), "a scale number from 0 to 28")
	}
	return RequiredBeta(perMinute, q, upper[n])
}

// TimeConstant returns τ = V / (Q·(1 − 1/β)), V in m³ and Q in m³/s giving
// seconds, the time in which the population balance (package documentation)
// closes about 63 % of the gap between the present and the
// steady concentration (about 95 % in 3τ). v is the system's fluid volume.
// v and q must be finite and > 0, beta finite and > 1 (units.ErrRange);
// results beyond time.Duration's range are refused.
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
		return 0, validate.Fail(fn, "time constant", s, "below about 292 years")
	}
	return time.Duration(s * float64(time.Second)), nil
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

// ElementPoint is one clean-element pressure drop read from a filter data
// sheet: Drop at flow Flow and kinematic viscosity Viscosity.
type ElementPoint struct {
	Drop      units.Pressure
	Flow      units.Flow
	Viscosity units.KinematicViscosity
}

// CleanDrop scales a data-sheet clean-element pressure drop to flow q and
// viscosity nu: Δp = Δp₀ · (Q/Q₀) · (ν/ν₀). This assumes laminar (Darcy)
// flow through the filter medium, common practice for elements; it does not
// cover the housing, whose loss grows about with Q² and should be added
// from the maker's curve. All inputs must be finite and > 0
// (units.ErrRange).
func CleanDrop(at ElementPoint, q units.Flow, nu units.KinematicViscosity) (units.Pressure, error) {
	const fn = "contamination.CleanDrop"
	if err := at.check(fn); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "nu", nu); err != nil {
		return 0, err
	}
	dp := units.Pressure(mulDiv(float64(at.Drop), float64(q), float64(nu), float64(at.Flow), float64(at.Viscosity), 1))
	return dp, validate.Result(fn, "drop", dp)
}

func (at ElementPoint) check(fn string) error {
	if err := validate.Positive(fn, "Drop", at.Drop); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Flow", at.Flow); err != nil {
		return err
	}
	return validate.Positive(fn, "Viscosity", at.Viscosity)
}

// CleanShareLimit is the largest clean-element drop, as a fraction of the
// bypass valve setting, that leaves room for the element to load before the
// bypass opens: about a third (common practice).
const CleanShareLimit = 1.0 / 3

// BypassCheck is the result of CheckBypass.
type BypassCheck struct {
	Drop   units.Pressure // clean-element drop at the given flow and viscosity
	Bypass units.Pressure // bypass valve cracking setting
	// Share is Drop ÷ Bypass.
	Share float64
	// Opens: the clean element alone reaches the bypass setting, so fluid
	// passes unfiltered.
	Opens bool
	// Tight: Share is above CleanShareLimit (common practice): little room
	// for dirt before bypass.
	Tight bool
	// Cautions to show with the result.
	Cautions []string
}

// CheckBypass scales a clean-element drop (CleanDrop) to flow q and
// viscosity nu and compares it with the bypass valve setting: Share =
// Δp ÷ bypass, Opens when Share ≥ 1, Tight above CleanShareLimit (common
// practice). Check it at the coldest start-up viscosity as well as at
// working temperature: a cold start can open the bypass of a clean element,
// and an element in bypass passes unfiltered fluid. The result carries
// cautions to show (clogging indicator, relieve pressure before opening a
// housing, hot oil). Inputs must be finite and > 0, and the share finite
// (units.ErrRange).
func CheckBypass(at ElementPoint, q units.Flow, nu units.KinematicViscosity, bypass units.Pressure) (BypassCheck, error) {
	const fn = "contamination.CheckBypass"
	if err := validate.Positive(fn, "bypass", bypass); err != nil {
		return BypassCheck{}, err
	}
	dp, err := CleanDrop(at, q, nu)
	if err != nil {
		return BypassCheck{}, err
	}
	share := float64(dp / bypass)
	if err := validate.Result(fn, "drop ÷ bypass", share); err != nil {
		return BypassCheck{}, err
	}
	r := BypassCheck{Drop: dp, Bypass: bypass, Share: share}
	r.Opens = dp >= bypass
	r.Tight = r.Share > CleanShareLimit
	switch {
	case r.Opens:
		r.Cautions = append(r.Cautions, "the clean element reaches the bypass setting: fluid passes unfiltered; choose a larger element or a lower flow, or warm the fluid before load")
	case r.Tight:
		r.Cautions = append(r.Cautions, "the clean element uses more than about a third of the bypass setting (common practice): little dirt-holding life before bypass")
	}
	r.Cautions = append(r.Cautions,
		"fit a clogging indicator set below the bypass setting and change the element when it trips",
		"relieve pressure before opening a filter housing (ISO 4413); hot oil burns")
	return r, nil
}
