// Package validate builds the errors that hydrosize functions return for bad
// input: *units.RangeError values that name the function, the parameter, the
// value given and the valid range, and match units.ErrRange with errors.Is.
//
// Every check treats NaN and ±Inf as out of range. The checks allocate only
// when they fail.
package validate

import (
	"fmt"
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/units"
)

// format writes v with its unit when T has a String method.
func format[T ~float64](v T) string {
	if s, ok := any(v).(fmt.Stringer); ok {
		return s.String()
	}
	return strconv.FormatFloat(float64(v), 'g', -1, 64)
}

func bad(v float64) bool { return math.IsNaN(v) || math.IsInf(v, 0) }

// Fail returns a *units.RangeError for parameter param of function fn.
func Fail[T ~float64](fn, param string, v T, valid string) error {
	return &units.RangeError{Func: fn, Param: param, Value: format(v), Valid: valid}
}

// Finite checks that v is neither NaN nor infinite.
func Finite[T ~float64](fn, param string, v T) error {
	if bad(float64(v)) {
		return Fail(fn, param, v, "a finite number")
	}
	return nil
}

// Positive checks 0 < v < +Inf.
func Positive[T ~float64](fn, param string, v T) error {
	if bad(float64(v)) || v <= 0 {
		return Fail(fn, param, v, "> 0 and finite")
	}
	return nil
}

// NonNegative checks 0 ≤ v < +Inf.
func NonNegative[T ~float64](fn, param string, v T) error {
	if bad(float64(v)) || v < 0 {
		return Fail(fn, param, v, "≥ 0 and finite")
	}
	return nil
}

// InRange checks lo ≤ v ≤ hi.
func InRange[T ~float64](fn, param string, v, lo, hi T) error {
	if bad(float64(v)) || v < lo || v > hi {
		return Fail(fn, param, v, "from "+format(lo)+" to "+format(hi))
	}
	return nil
}

// Above checks lo < v < +Inf.
func Above[T ~float64](fn, param string, v, lo T) error {
	if bad(float64(v)) || v <= lo {
		return Fail(fn, param, v, "> "+format(lo)+" and finite")
	}
	return nil
}

// Result checks that a computed result is finite; it names the result as
// the parameter, so a caller sees which output overflowed.
func Result[T ~float64](fn, name string, v T) error {
	if bad(float64(v)) {
		return Fail(fn, name, v, "a finite result (inputs too extreme)")
	}
	return nil
}
