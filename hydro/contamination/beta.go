package contamination

import (
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

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
	if err := validate.Result(fn, "beta", b); err != nil {
		return 0, err
	}
	return b, nil
}

// BetaRatio returns β = upstream ÷ downstream for cumulative counts at the
// same size, ≥x µm(c), measured in a multi-pass test (ISO 16889). upstream
// must be finite and ≥ downstream, downstream finite and > 0; otherwise the
// error matches units.ErrRange (a β below 1 is a filter releasing
// particles, which these functions do not model). A ratio beyond float64
// (upstream 1 over a subnormal downstream count) is refused, never +Inf.
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
	if err := validate.Result(fn, "beta", b); err != nil {
		return 0, err
	}
	return b, nil
}

func checkBeta(fn string, beta float64) error {
	if math.IsNaN(beta) || math.IsInf(beta, 0) || beta < 1 {
		return validate.Fail(fn, "beta", beta, "≥ 1 and finite")
	}
	return nil
}

// Rating is a filter element's rating: beta ratio Beta or better at particle
// size Size in µm(c), written β_x(c) ≥ value (ISO 16889), e.g.
// β_10(c) ≥ 1000. It is the only "rating" of this package: the placement
// advice describes its usual element in words (Advice.Element).
type Rating struct {
	Size units.Length // x, the particle size, e.g. 10 * units.Micrometre
	Beta float64      // the least beta ratio at that size, ≥ 1
}

// Validate checks Size (finite, > 0) and Beta (finite, ≥ 1); errors match
// units.ErrRange.
func (r Rating) Validate() error { return r.validate("contamination.Rating.Validate") }

func (r Rating) validate(fn string) error {
	if err := validate.Positive(fn, "Size", r.Size); err != nil {
		return err
	}
	return checkBeta(fn, r.Beta)
}

// Efficiency returns the rating's least capture efficiency in percent at
// its size, (1 − 1/β)·100 % (ISO 16889).
func (r Rating) Efficiency() (float64, error) {
	if err := r.validate("contamination.Rating.Efficiency"); err != nil {
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
