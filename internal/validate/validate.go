// Package validate holds the range error that every hydrosize package
// returns for a bad argument, and the checks that build it.
//
// RangeError and ErrRange are defined here, once, so that package units (which
// re-exports them as units.RangeError and units.ErrRange, as os.PathError is
// fs.PathError) and every other package share one type that errors.As finds
// and one sentinel that errors.Is matches.
//
// # Naming the function
//
// The function in an error is always qualified by its package, as a caller
// reads it in code: "units.Convert", "fluid.CurveThrough", and for a method
// "units.Force.PerArea" or "units.Pressure.UnmarshalText". Each function
// writes it once, as const fn = "pkg.Func".
//
// Every check treats NaN and ±Inf as out of range. The checks allocate only
// when they fail.
package validate

import (
	"errors"
	"fmt"
	"math"
	"strconv"
	"time"
)

// ErrRange is the sentinel every RangeError matches: a value is not finite,
// overflows, or lies outside the range a function accepts. It is re-exported
// as units.ErrRange.
var ErrRange = errors.New("value out of range")

// RangeError reports an argument that a function cannot accept. It names the
// function, the parameter, the value given and the valid range, and unwraps to
// ErrRange. It is re-exported as units.RangeError.
type RangeError struct {
	Func  string // qualified function name, e.g. "fluid.CurveThrough" or "units.Force.PerArea"
	Param string // parameter name, e.g. "v40", or "Site.Ambient" for a field
	Value string // the value given, formatted with its unit
	Valid string // the valid range, e.g. "> 0 mm²/s" or "a finite number"
}

// Error implements the error interface:
// "fn: param = value is out of range: want valid". Fields left empty are
// left out of the message; it never panics.
func (e *RangeError) Error() string {
	if e == nil {
		return "<nil RangeError>"
	}
	msg := ""
	if e.Func != "" {
		msg = e.Func + ": "
	}
	switch {
	case e.Param != "" && e.Value != "":
		msg += e.Param + " = " + e.Value + " "
	case e.Param != "" || e.Value != "":
		msg += e.Param + e.Value + " "
	}
	msg += "is out of range"
	if e.Valid != "" {
		msg += ": want " + e.Valid
	}
	return msg
}

// Unwrap returns ErrRange.
func (e *RangeError) Unwrap() error { return ErrRange }

// format writes v with its unit when T has a String method.
func format[T ~float64](v T) string {
	if s, ok := any(v).(fmt.Stringer); ok {
		return s.String()
	}
	return strconv.FormatFloat(float64(v), 'g', -1, 64)
}

func bad(v float64) bool { return math.IsNaN(v) || math.IsInf(v, 0) }

// Fail returns a *RangeError for parameter param of function fn.
func Fail[T ~float64](fn, param string, v T, valid string) error {
	return &RangeError{Func: fn, Param: param, Value: format(v), Valid: valid}
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

// Checked returns v and nil when v is finite, and the zero value with a
// Result error otherwise: the way a function returns a computed result, so
// that no error ever travels beside a NaN or ±Inf.
func Checked[T ~float64](fn, name string, v T) (T, error) {
	if err := Result(fn, name, v); err != nil {
		return 0, err
	}
	return v, nil
}

// PositiveDuration checks d > 0.
func PositiveDuration(fn, param string, d time.Duration) error {
	if d <= 0 {
		return &RangeError{Func: fn, Param: param, Value: d.String(), Valid: "> 0"}
	}
	return nil
}
