// Package checktest holds test helpers shared by the tests of every hydrosize
// package. It is imported only from _test.go files.
//
// It does not import package units, so that units' own tests can use it: a
// *units.RangeError is a *validate.RangeError (units.RangeError is an alias
// of it), and units.ErrRange is validate.ErrRange.
package checktest

import (
	"errors"
	"regexp"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/validate"
)

// qualified is the naming rule for the function in an error: the package,
// then the function, or the type and its method ("units.Convert",
// "fluid.CurveThrough", "units.Pressure.UnmarshalText").
var qualified = regexp.MustCompile(`^[a-z][a-z0-9]*\.[A-Za-z_]\w*(\.[A-Za-z_]\w*)?$`)

// RangeError checks that err is a range error for parameter param: errors.As
// finds a *units.RangeError in it, it matches units.ErrRange with errors.Is,
// its Param is param and its Func a qualified name ("pkg.Func" or
// "pkg.Type.Method"), it states the value and the valid range, and its
// message names the parameter. It reports every failure with t.Errorf and
// returns the *units.RangeError, or nil when there is none.
func RangeError(t testing.TB, err error, param string) *validate.RangeError {
	t.Helper()
	if err == nil {
		t.Errorf("err = nil, want a *units.RangeError for %q", param)
		return nil
	}
	if !errors.Is(err, validate.ErrRange) {
		t.Errorf("err = %v: does not match units.ErrRange", err)
	}
	var re *validate.RangeError
	if !errors.As(err, &re) {
		t.Errorf("err = %v (%T): errors.As finds no *units.RangeError", err, err)
		return nil
	}
	if re.Param != param {
		t.Errorf("err = %v: names parameter %q, want %q", err, re.Param, param)
	}
	if !qualified.MatchString(re.Func) {
		t.Errorf("err = %v: function %q is not qualified as pkg.Func or pkg.Type.Method", err, re.Func)
	}
	if re.Value == "" || re.Valid == "" {
		t.Errorf("err = %v: want the value given and the valid range (Value %q, Valid %q)", err, re.Value, re.Valid)
	}
	if !strings.Contains(err.Error(), param) {
		t.Errorf("err = %q does not name the parameter %q", err, param)
	}
	return re
}

// RangeErrorIn is RangeError that also checks the function the error names.
func RangeErrorIn(t testing.TB, err error, fn, param string) *validate.RangeError {
	t.Helper()
	re := RangeError(t, err, param)
	if re != nil && re.Func != fn {
		t.Errorf("err = %v: names function %q, want %q", err, re.Func, fn)
	}
	return re
}
