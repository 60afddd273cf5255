package units

import (
	"errors"
	"strconv"
	"strings"
)

// Sentinel errors. Every error returned by this package, and every input
// error returned by the hydrosize families, matches one of these with
// errors.Is.
var (
	// ErrSyntax: the text is not a number followed by a unit expression.
	ErrSyntax = errors.New("invalid syntax")
	// ErrUnknownUnit: a unit spelling is not in the registry.
	ErrUnknownUnit = errors.New("unknown unit")
	// ErrDimension: a unit or quantity has the wrong dimension for the target.
	ErrDimension = errors.New("dimension mismatch")
	// ErrRange: a value is not finite, overflows, or lies outside the range
	// a function accepts (for example a negative viscosity).
	ErrRange = errors.New("value out of range")
	// ErrReference: a gauge pressure was given where an absolute one is
	// needed (or the reverse), or a temperature where a temperature
	// difference is needed (or the reverse).
	ErrReference = errors.New("gauge/absolute or point/difference mismatch")
)

// ParseError records a failed parse, in the pattern of strconv.NumError.
// It quotes the input and the byte offset where the problem starts, and
// unwraps to one of the package's sentinel errors.
type ParseError struct {
	Func   string // the function that failed: "ParsePressure", or qualified as "contamination.ParseCode"
	Input  string // the text given
	Pos    int    // byte offset into Input where the problem starts
	Err    error  // sentinel: ErrSyntax, ErrUnknownUnit, ErrDimension, ErrRange or ErrReference
	Detail string // what was expected, nearest known spellings, and so on
}

// Error implements the error interface.
func (e *ParseError) Error() string {
	var b strings.Builder
	if !strings.Contains(e.Func, ".") {
		b.WriteString("units.")
	}
	b.WriteString(e.Func)
	b.WriteString(": parsing ")
	b.WriteString(strconv.Quote(e.Input))
	b.WriteString(" at offset ")
	b.WriteString(strconv.Itoa(e.Pos))
	b.WriteString(": ")
	b.WriteString(e.Err.Error())
	if e.Detail != "" {
		b.WriteString(": ")
		b.WriteString(e.Detail)
	}
	return b.String()
}

// Unwrap returns the sentinel error.
func (e *ParseError) Unwrap() error { return e.Err }

// RangeError reports an argument that a function cannot accept. It names the
// function, the parameter, the value given and the valid range, and unwraps to
// ErrRange. The hydrosize families return it for bad input.
type RangeError struct {
	Func  string // qualified function name, e.g. "fluid.CurveThrough"
	Param string // parameter name, e.g. "v40"
	Value string // the value given, formatted with its unit
	Valid string // the valid range, e.g. "> 0 mm²/s" or "finite"
}

// Error implements the error interface.
func (e *RangeError) Error() string {
	return e.Func + ": " + e.Param + " = " + e.Value + " is out of range: want " + e.Valid
}

// Unwrap returns ErrRange.
func (e *RangeError) Unwrap() error { return ErrRange }

// ConversionError reports a dynamic Quantity or unit expression converted to
// an incompatible type or unit, or to a number that overflows it. It names
// both sides and unwraps to ErrDimension, ErrReference or ErrRange.
type ConversionError struct {
	From string // what was there: a dimension or a unit expression
	To   string // what was wanted
	Err  error  // ErrDimension, ErrReference or ErrRange
}

// Error implements the error interface.
func (e *ConversionError) Error() string {
	return "units: cannot convert " + e.From + " to " + e.To + ": " + e.Err.Error()
}

// Unwrap returns the sentinel error.
func (e *ConversionError) Unwrap() error { return e.Err }
