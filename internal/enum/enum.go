// Package enum writes and reads the names of hydrosize's small enumerations
// (severities, hazards, mounting styles, …) in text and JSON, with the
// errors every package promises: a *units.RangeError matching
// units.ErrRange for a value outside the table, a *units.ParseError
// matching units.ErrSyntax, listing the names, for text that is none of
// them.
package enum

import (
	"fmt"
	"strings"

	"github.com/hydrosize/hydrosize/units"
)

// Name returns names[v], or "Type(v)" for a value outside the table.
func Name[T ~uint8](typ string, v T, names []string) string {
	if int(v) < len(names) {
		return names[v]
	}
	return fmt.Sprintf("%s(%d)", typ, uint8(v))
}

// Marshal writes names[v] for the MarshalText method fn
// ("components.Severity.MarshalText"), or fails for a value outside the table.
func Marshal[T ~uint8](fn string, v T, names []string) ([]byte, error) {
	if int(v) >= len(names) {
		return nil, &units.RangeError{Func: fn, Param: "value",
			Value: fmt.Sprint(uint8(v)), Valid: "0 to " + fmt.Sprint(len(names)-1)}
	}
	return []byte(names[v]), nil
}

// Unmarshal reads one of names, exactly as written, into v for the
// UnmarshalText method fn.
func Unmarshal[T ~uint8](fn string, b []byte, v *T, names []string) error {
	for i, n := range names {
		if n == string(b) {
			*v = T(i)
			return nil
		}
	}
	return &units.ParseError{Func: fn, Input: string(b), Err: units.ErrSyntax,
		Detail: "want one of " + strings.Join(names, ", ")}
}
