package hydro

import (
	"errors"
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/units"
)

// FieldError is one problem with a [Spec]: where it is, as a JSON path
// ("actuators[1].stroke", "cycle.phases[0].moves[2].speed"; "" for the
// document as a whole), and what is wrong. Err says what would be valid and
// matches a units sentinel with errors.Is: [units.ErrRange] for a value
// out of range, missing or contradicting another (then errors.As finds a
// *units.RangeError whose Param is the path), [units.ErrSyntax],
// [units.ErrUnknownUnit], [units.ErrDimension] or [units.ErrAmbiguous] for
// text that does not read as what the field holds (a *units.ParseError). Paths use the JSON
// field names also for a spec built in Go.
type FieldError struct {
	Path string // JSON path of the field
	Err  error  // the problem; never nil
}

// Error returns "path: problem".
func (e *FieldError) Error() string {
	if e == nil {
		return "<nil FieldError>"
	}
	where := e.Path
	if where == "" {
		where = "spec"
	}
	var re *units.RangeError
	if errors.As(e.Err, &re) && re.Param == e.Path {
		switch {
		case re.Value == "missing":
			return where + ": missing: want " + re.Valid
		case re.Value != "":
			return where + ": " + re.Value + " is out of range: want " + re.Valid
		}
		return where + ": out of range: want " + re.Valid
	}
	var pe *units.ParseError
	if errors.As(e.Err, &pe) && pe.Func == decodeFn {
		if pe.Input == "" {
			return where + ": " + pe.Detail
		}
		return where + ": " + pe.Input + ": " + pe.Detail
	}
	if e.Err == nil {
		return where + ": invalid"
	}
	return where + ": " + e.Err.Error()
}

// Unwrap returns the problem.
func (e *FieldError) Unwrap() error { return e.Err }

// SpecError lists every problem found in a spec: those met reading JSON
// first, in the order of the text, then those of validation, in the order
// of the spec's fields. It
// unwraps to its *FieldError values, so errors.Is(err, units.ErrRange) and
// errors.As(err, &fieldErr) look through it.
type SpecError struct {
	Problems []*FieldError
}

// Error returns a count and one problem per line.
func (e *SpecError) Error() string {
	if e == nil || len(e.Problems) == 0 {
		return "hydro: spec has no problems"
	}
	var b strings.Builder
	b.WriteString("hydro: the spec has ")
	if len(e.Problems) == 1 {
		b.WriteString("1 problem:")
	} else {
		b.WriteString(strconv.Itoa(len(e.Problems)))
		b.WriteString(" problems:")
	}
	for _, p := range e.Problems {
		b.WriteString("\n  ")
		b.WriteString(p.Error())
	}
	return b.String()
}

// Unwrap returns the problems as errors.
func (e *SpecError) Unwrap() []error {
	out := make([]error, len(e.Problems))
	for i, p := range e.Problems {
		out[i] = p
	}
	return out
}

// problems collects the problems of a spec as they are found.
type problems struct {
	list []*FieldError
}

// add records err at path.
func (ps *problems) add(path string, err error) {
	ps.list = append(ps.list, &FieldError{Path: path, Err: err})
}

// rangeErr records a value out of range at path: value is what was there,
// valid what would be.
func (ps *problems) rangeErr(path, value, valid string) {
	ps.add(path, &units.RangeError{Func: validateFn, Param: path, Value: value, Valid: valid})
}

// missing records a required field left out.
func (ps *problems) missing(path, valid string) { ps.rangeErr(path, "missing", valid) }

// syntax records text that does not read as the field's kind.
func (ps *problems) syntax(path, input, detail string) {
	ps.add(path, &units.ParseError{Func: decodeFn, Input: input, Err: units.ErrSyntax, Detail: detail})
}

// err returns the problems as a *SpecError, or nil when there are none.
func (ps *problems) err() error {
	if len(ps.list) == 0 {
		return nil
	}
	return &SpecError{Problems: ps.list}
}
