package contamination

import (
	"math"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// MaxScale is the highest scale number in the ISO 4406 table (28: more than
// 1 300 000 up to and including 2 500 000 particles per mL).
const MaxScale = 28

// AboveTable is the number ScaleNumber returns for more than 2 500 000
// particles per mL: the count is above the table and is reported as ">28"
// (see MarkAbove). It is MaxScale+1 so that more particles never give a
// smaller number.
const AboveTable = MaxScale + 1

// upper holds the upper bound ("up to and including"), in particles per mL,
// of each scale number 0…28. ISO 4406:2021, Table 1. The bounds are the
// standard's rounded figures (1.3, 2.5, 1300 …), not powers of two.
var upper = [MaxScale + 1]float64{
	0.01, 0.02, 0.04, 0.08, 0.16, 0.32, 0.64, 1.3, 2.5, 5,
	10, 20, 40, 80, 160, 320, 640, 1300, 2500, 5000,
	10e3, 20e3, 40e3, 80e3, 160e3, 320e3, 640e3, 1.3e6, 2.5e6,
}

// boundSlack is the relative amount by which a count may exceed a table
// bound and still count as at the bound. It absorbs the rounding of unit
// conversions (0.1 L is 100.00000000000001 mL in float64) and is far below
// any difference a particle counter can resolve.
const boundSlack = 1e-12

// ScaleNumber returns the ISO 4406 scale number for a cumulative count of
// perML particles per millilitre: the number n whose row holds counts "more
// than" the bound of row n−1 "up to and including" the bound of row n
// (ISO 4406:2021, Table 1). Counts within 1 part in 10¹² above a bound count
// as at the bound (float rounding of unit conversions).
//
// A count of exactly zero lies below the table's lowest row (more than 0 up
// to 0.01 per mL); it is reported as scale number 0, the lowest the table
// has, so a clean reading never produces an error (our choice, not the
// standard's). Counts above 2 500 000
// per mL return AboveTable (reported as ">28", from memory; see MarkAbove).
//
// perML must be finite and ≥ 0; otherwise the error matches units.ErrRange.
// ScaleNumber does not allocate.
func ScaleNumber(perML float64) (int, error) {
	if err := validate.NonNegative("contamination.ScaleNumber", "perML", perML); err != nil {
		return 0, err
	}
	return scale(perML), nil
}

// scale is ScaleNumber for a checked, non-negative, finite count: the first
// scale number whose bound, widened by boundSlack, is not below the count.
// The bounds lie within 4 % of 0.01·2ⁿ (1.3 for 1.28, 2500 for 2560), so
// the binary exponent of 100·count is the scale number or next to it: one
// or two comparisons instead of a binary search.
func scale(perML float64) int {
	switch {
	case perML <= upperSlack[0]:
		return 0
	case perML > upperSlack[MaxScale]:
		return AboveTable
	}
	// 100·perML = f·2ⁿ with ½ ≤ f < 1 (math.Frexp's n), read from the
	// exponent bits: perML is a positive normal number here.
	n := int(math.Float64bits(perML*100)>>52) - 1022
	n = min(max(n, 1), MaxScale)
	for upperSlack[n-1] >= perML {
		n--
	}
	for upperSlack[n] < perML {
		n++
	}
	return n
}

// upperSlack holds each bound of upper widened by boundSlack, computed once
// at start-up and never changed.
var upperSlack = func() (t [MaxScale + 1]float64) {
	for i, u := range upper {
		t[i] = u * (1 + boundSlack)
	}
	return t
}()

// ScaleRange returns the count range, in particles per mL, that scale number
// n stands for: more than above, up to and including upTo (ISO 4406:2021,
// Table 1). For n = 0 above is 0. n must be 0…28; otherwise the error
// matches units.ErrRange.
func ScaleRange(n int) (above, upTo float64, err error) {
	if n < 0 || n > MaxScale {
		return 0, 0, validate.Fail("contamination.ScaleRange", "n", float64(n), "a scale number from 0 to 28")
	}
	if n > 0 {
		above = upper[n-1]
	}
	return above, upper[n], nil
}

// PerML returns the cumulative count per millilitre for count particles
// counted in a sample of the given volume: count ÷ volume in mL.
// count must be finite and ≥ 0, sample finite and > 0; otherwise the error
// matches units.ErrRange.
func PerML(count float64, sample units.Volume) (float64, error) {
	const fn = "contamination.PerML"
	if err := validate.NonNegative(fn, "count", count); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "sample", sample); err != nil {
		return 0, err
	}
	v := count/sample.Millilitres() + 0 // + 0 turns a count of −0 into +0
	if err := validate.Result(fn, "count per mL", v); err != nil {
		return 0, err
	}
	return v, nil
}

// Per100mL returns the cumulative count per 100 mL for count particles
// counted in a sample of the given volume: 100 × count ÷ volume in mL. The
// errors are those of PerML, named for Per100mL.
func Per100mL(count float64, sample units.Volume) (float64, error) {
	const fn = "contamination.Per100mL"
	v, err := PerML(count, sample)
	if err != nil {
		return 0, validate.Renamed(err, fn, nil)
	}
	v *= 100
	if err := validate.Result(fn, "count per 100 mL", v); err != nil {
		return 0, err
	}
	return v, nil
}
