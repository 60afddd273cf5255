package actuator

import (
	"fmt"
	"strings"

	"github.com/hydrosize/hydrosize/units"
)

// The names the enumerations write in text and JSON; stable, part of the API.
var (
	directionNames = [...]string{"extend", "retract"}
	rodEndsNames   = [...]string{"single rod", "double rod"}
	actionNames    = [...]string{"double-acting", "single-acting"}
	methodNames    = [...]string{"Euler", "Johnson"}
	bodyNames      = [...]string{"flange", "feet", "trunnion", "clevis"}
	rodEndNames    = [...]string{"pinned and guided", "fixed and guided", "free"}
)

// nameOf returns names[v], or "Type(v)" for a value outside the table.
func nameOf[T ~uint8](typ string, v T, names []string) string {
	if int(v) < len(names) {
		return names[v]
	}
	return fmt.Sprintf("%s(%d)", typ, uint8(v))
}

// marshalName writes names[v] or fails for a value outside the table.
func marshalName[T ~uint8](typ string, v T, names []string) ([]byte, error) {
	if int(v) >= len(names) {
		return nil, &units.RangeError{Func: "actuator." + typ + ".MarshalText", Param: "value",
			Value: fmt.Sprint(uint8(v)), Valid: "0 to " + fmt.Sprint(len(names)-1)}
	}
	return []byte(names[v]), nil
}

// unmarshalName reads one of names into v; it fails with a
// *units.ParseError matching units.ErrSyntax that lists the names.
func unmarshalName[T ~uint8](typ string, b []byte, v *T, names []string) error {
	for i, n := range names {
		if n == string(b) {
			*v = T(i)
			return nil
		}
	}
	return &units.ParseError{Func: "actuator." + typ + ".UnmarshalText", Input: string(b), Err: units.ErrSyntax,
		Detail: "want one of " + strings.Join(names, ", ")}
}

// String returns "extend" or "retract".
func (d Direction) String() string { return nameOf("Direction", d, directionNames[:]) }

// MarshalText writes "extend" or "retract".
func (d Direction) MarshalText() ([]byte, error) {
	return marshalName("Direction", d, directionNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (d *Direction) UnmarshalText(b []byte) error {
	return unmarshalName("Direction", b, d, directionNames[:])
}

// String returns "single rod" or "double rod".
func (e RodEnds) String() string { return nameOf("RodEnds", e, rodEndsNames[:]) }

// MarshalText writes "single rod" or "double rod".
func (e RodEnds) MarshalText() ([]byte, error) { return marshalName("RodEnds", e, rodEndsNames[:]) }

// UnmarshalText reads a name written by MarshalText.
func (e *RodEnds) UnmarshalText(b []byte) error {
	return unmarshalName("RodEnds", b, e, rodEndsNames[:])
}

// String returns "double-acting" or "single-acting".
func (a Action) String() string { return nameOf("Action", a, actionNames[:]) }

// MarshalText writes "double-acting" or "single-acting".
func (a Action) MarshalText() ([]byte, error) { return marshalName("Action", a, actionNames[:]) }

// UnmarshalText reads a name written by MarshalText.
func (a *Action) UnmarshalText(b []byte) error {
	return unmarshalName("Action", b, a, actionNames[:])
}

// String returns "Euler" or "Johnson".
func (m BucklingMethod) String() string { return nameOf("BucklingMethod", m, methodNames[:]) }

// MarshalText writes "Euler" or "Johnson".
func (m BucklingMethod) MarshalText() ([]byte, error) {
	return marshalName("BucklingMethod", m, methodNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (m *BucklingMethod) UnmarshalText(b []byte) error {
	return unmarshalName("BucklingMethod", b, m, methodNames[:])
}

// String returns the mounting's name: "trunnion".
func (m BodyMount) String() string { return nameOf("BodyMount", m, bodyNames[:]) }

// MarshalText writes the mounting's name.
func (m BodyMount) MarshalText() ([]byte, error) { return marshalName("BodyMount", m, bodyNames[:]) }

// UnmarshalText reads a name written by MarshalText.
func (m *BodyMount) UnmarshalText(b []byte) error {
	return unmarshalName("BodyMount", b, m, bodyNames[:])
}

// String returns the condition in words: "pinned and guided".
func (e RodEnd) String() string { return nameOf("RodEnd", e, rodEndNames[:]) }

// MarshalText writes the condition in words.
func (e RodEnd) MarshalText() ([]byte, error) { return marshalName("RodEnd", e, rodEndNames[:]) }

// UnmarshalText reads a name written by MarshalText.
func (e *RodEnd) UnmarshalText(b []byte) error {
	return unmarshalName("RodEnd", b, e, rodEndNames[:])
}
