package units

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
)

// TestErrorMethodsNeverPanic: the Error methods of the exported error types
// work on any value a caller can build: zero values, a nil Err, a nil
// pointer; and Unwrap gives what errors.Is needs.
func TestErrorMethodsNeverPanic(t *testing.T) {
	for _, c := range []struct {
		err  error
		want string
	}{
		{&ParseError{}, `parsing "" at offset 0`},
		{&ParseError{Func: "mypkg.ReadSpec", Input: "5 barr", Pos: 2}, `mypkg.ReadSpec: parsing "5 barr" at offset 2`},
		{&ParseError{Input: "x", Detail: "want a number"}, `parsing "x" at offset 0: want a number`},
		{&ParseError{Func: "units.ParsePressure", Input: "55", Pos: 2, Err: ErrSyntax, Detail: "missing unit"},
			`units.ParsePressure: parsing "55" at offset 2: invalid syntax: missing unit`},
		{(*ParseError)(nil), "<nil ParseError>"},
		{&ConversionError{}, "units: cannot convert  to "},
		{&ConversionError{From: "psi", To: "L/min"}, "units: cannot convert psi to L/min"},
		{&ConversionError{Func: "units.Convert", From: "psi", To: "L/min", Err: ErrDimension}, "units.Convert: cannot convert psi to L/min: dimension mismatch"},
		{(*ConversionError)(nil), "<nil ConversionError>"},
		{&RangeError{}, "is out of range"},
		{&RangeError{Param: "bore"}, "bore is out of range"},
		{&RangeError{Func: "mypkg.Size", Param: "bore", Value: "-5 mm", Valid: "> 0"}, "mypkg.Size: bore = -5 mm is out of range: want > 0"},
		{(*RangeError)(nil), "<nil RangeError>"},
	} {
		if got := c.err.Error(); got != c.want {
			t.Errorf("%#v.Error() = %q, want %q", c.err, got, c.want)
		}
	}
	if errors.Unwrap(&ParseError{}) != nil || errors.Unwrap(&ConversionError{}) != nil {
		t.Error("a ParseError or ConversionError without Err unwraps to something")
	}
	if !errors.Is(&RangeError{}, ErrRange) || !errors.Is(&ParseError{Err: ErrRange}, ErrRange) || !errors.Is(&ConversionError{Err: ErrReference}, ErrReference) {
		t.Error("Unwrap does not lead errors.Is to the sentinel")
	}
}

// TestRangeErrorIsOneType: every range error of units — Convert, the
// dynamic Quantity, the quotients, MarshalText, System.WithDigits — is the
// one *RangeError type, found by errors.As, naming a qualified function and
// its parameter.
func TestRangeErrorIsOneType(t *testing.T) {
	gauge, _ := Parse("-5 bar")
	_, inErr := gauge.In("bara")
	abs, _ := Parse("-5 (kg/(m·s²))")
	_, asErr := abs.AbsolutePressure()
	_, convertErr := Convert(-1, "bara", "psia")
	_, nanErr := Convert(math.NaN(), "bar", "psi")
	_, quotientErr := Force(1).PerArea(0)
	_, marshalErr := Temperature(-1).MarshalText()
	_, digitsErr := Metric().WithDigits(40)
	for _, c := range []struct {
		err       error
		fn, param string
	}{
		{convertErr, "units.Convert", "value"},
		{nanErr, "units.Convert", "value"},
		{asErr, "units.Quantity.AbsolutePressure", "q"},
		{quotientErr, "units.Force.PerArea", "a"},
		{marshalErr, "units.Temperature.MarshalText", "q"},
		{digitsErr, "units.System.WithDigits", "n"},
	} {
		checktest.RangeErrorIn(t, c.err, c.fn, c.param)
	}
	// A gauge reading asked for in an absolute unit is a reference error.
	if !errors.Is(inErr, ErrReference) {
		t.Errorf("Parse(-5 bar).In(bara): %v; want ErrReference", inErr)
	}
	// The valid range is said once ("want want" was a defect).
	if asErr == nil || strings.Contains(asErr.Error(), "want want") {
		t.Errorf("Quantity.AbsolutePressure of a negative value: %v", asErr)
	}
}
