package units

import (
	"errors"
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/internal/validate"
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
	// a function accepts (for example a negative viscosity). Every
	// *RangeError matches it.
	ErrRange error = validate.ErrRange
	// ErrReference: a gauge pressure was given where an absolute one is
	// needed (or the reverse), or a temperature where a temperature
	// difference is needed (or the reverse).
	ErrReference = errors.New("gauge/absolute or point/difference mismatch")
	// ErrAmbiguous: the text could mean more than one thing (a unit that
	// matches registered spellings only by letter case and more than one
	// of them, a comma in a number, a plain ton as a force); the message
	// lists the readings and how to write the one meant. Nothing is guessed.
	ErrAmbiguous = errors.New("ambiguous")
)

// ParseError records a failed parse, in the pattern of strconv.NumError.
// It quotes the input and the byte offset where the problem starts, and
// unwraps to one of the package's sentinel errors.
type ParseError struct {
	Func   string // the function that failed, qualified: "units.ParsePressure", "units.Pressure.UnmarshalText", "contamination.ParseCode"
	Input  string // the text given
	Pos    int    // byte offset into Input where the problem starts
	Err    error  // sentinel: ErrSyntax, ErrUnknownUnit, ErrDimension, ErrRange, ErrReference or ErrAmbiguous
	Detail string // what was expected, nearest known spellings, and so on
}

// Error implements the error interface:
// "Func: parsing "Input" at offset Pos: Err: Detail". Fields left empty are
// left out; it never panics, whatever the fields hold.
func (e *ParseError) Error() string {
	if e == nil {
		return "<nil ParseError>"
	}
	var b strings.Builder
	if e.Func != "" {
		b.WriteString(e.Func)
		b.WriteString(": ")
	}
	b.WriteString("parsing ")
	b.WriteString(strconv.Quote(e.Input))
	b.WriteString(" at offset ")
	b.WriteString(strconv.Itoa(e.Pos))
	if e.Err != nil {
		b.WriteString(": ")
		b.WriteString(e.Err.Error())
	}
	if e.Detail != "" {
		b.WriteString(": ")
		b.WriteString(e.Detail)
	}
	return b.String()
}

// Unwrap returns the sentinel error.
func (e *ParseError) Unwrap() error { return e.Err }

// RangeError reports an argument that a function cannot accept, for every
// hydrosize package: one type, which errors.As finds, and which unwraps to
// ErrRange. Its fields are
//
//	Func  string // the qualified function, "fluid.CurveThrough" or "units.Force.PerArea"
//	Param string // the parameter, "v40", or "Site.Ambient" for a field of one
//	Value string // the value given, formatted with its unit
//	Valid string // the valid range, "> 0 mm²/s" or "a finite number"
//
// and its message is "Func: Param = Value is out of range: want Valid".
// (It is defined in an internal package so that the input checks of every
// package build the same type; this alias is its public name.)
type RangeError = validate.RangeError

// ConversionError reports a dynamic Quantity or unit expression converted to
// an incompatible type or unit, or to a number that overflows it. It names
// both sides and unwraps to ErrDimension, ErrReference or ErrRange.
type ConversionError struct {
	Func string // the function that failed, qualified: "units.Convert", "units.Quantity.Pressure"
	From string // what was there: a dimension or a unit expression
	To   string // what was wanted
	Err  error  // ErrDimension, ErrReference or ErrRange
}

// Error implements the error interface:
// "Func: cannot convert From to To: Err". Fields left empty are left out
// (a ConversionError without Func starts "units: "); it never panics.
func (e *ConversionError) Error() string {
	if e == nil {
		return "<nil ConversionError>"
	}
	fn := e.Func
	if fn == "" {
		fn = "units"
	}
	msg := fn + ": cannot convert " + e.From + " to " + e.To
	if e.Err != nil {
		msg += ": " + e.Err.Error()
	}
	return msg
}

// Unwrap returns the sentinel error.
func (e *ConversionError) Unwrap() error { return e.Err }
