package actuator

import "github.com/hydrosize/hydrosize/internal/enum"

// The names the enumerations write in text and JSON; stable, part of the API.
var (
	directionNames = [...]string{"extend", "retract"}
	rodEndsNames   = [...]string{"single rod", "double rod"}
	actionNames    = [...]string{"double-acting", "single-acting"}
	methodNames    = [...]string{"Euler", "Johnson"}
	bodyNames      = [...]string{"flange", "feet", "trunnion", "clevis"}
	rodEndNames    = [...]string{"pinned and guided", "fixed and guided", "free"}
)

// String returns "extend" or "retract".
func (d Direction) String() string { return enum.Name("Direction", d, directionNames[:]) }

// MarshalText writes "extend" or "retract".
func (d Direction) MarshalText() ([]byte, error) {
	return enum.Marshal("actuator.Direction.MarshalText", d, directionNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (d *Direction) UnmarshalText(b []byte) error {
	return enum.Unmarshal("actuator.Direction.UnmarshalText", b, d, directionNames[:])
}

// String returns "single rod" or "double rod".
func (e RodEnds) String() string { return enum.Name("RodEnds", e, rodEndsNames[:]) }

// MarshalText writes "single rod" or "double rod".
func (e RodEnds) MarshalText() ([]byte, error) {
	return enum.Marshal("actuator.RodEnds.MarshalText", e, rodEndsNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (e *RodEnds) UnmarshalText(b []byte) error {
	return enum.Unmarshal("actuator.RodEnds.UnmarshalText", b, e, rodEndsNames[:])
}

// String returns "double-acting" or "single-acting".
func (a Action) String() string { return enum.Name("Action", a, actionNames[:]) }

// MarshalText writes "double-acting" or "single-acting".
func (a Action) MarshalText() ([]byte, error) {
	return enum.Marshal("actuator.Action.MarshalText", a, actionNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (a *Action) UnmarshalText(b []byte) error {
	return enum.Unmarshal("actuator.Action.UnmarshalText", b, a, actionNames[:])
}

// String returns "Euler" or "Johnson".
func (m BucklingMethod) String() string { return enum.Name("BucklingMethod", m, methodNames[:]) }

// MarshalText writes "Euler" or "Johnson".
func (m BucklingMethod) MarshalText() ([]byte, error) {
	return enum.Marshal("actuator.BucklingMethod.MarshalText", m, methodNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (m *BucklingMethod) UnmarshalText(b []byte) error {
	return enum.Unmarshal("actuator.BucklingMethod.UnmarshalText", b, m, methodNames[:])
}

// String returns the mounting's name: "trunnion".
func (m BodyMount) String() string { return enum.Name("BodyMount", m, bodyNames[:]) }

// MarshalText writes the mounting's name.
func (m BodyMount) MarshalText() ([]byte, error) {
	return enum.Marshal("actuator.BodyMount.MarshalText", m, bodyNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (m *BodyMount) UnmarshalText(b []byte) error {
	return enum.Unmarshal("actuator.BodyMount.UnmarshalText", b, m, bodyNames[:])
}

// String returns the condition in words: "pinned and guided".
func (e RodEnd) String() string { return enum.Name("RodEnd", e, rodEndNames[:]) }

// MarshalText writes the condition in words.
func (e RodEnd) MarshalText() ([]byte, error) {
	return enum.Marshal("actuator.RodEnd.MarshalText", e, rodEndNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (e *RodEnd) UnmarshalText(b []byte) error {
	return enum.Unmarshal("actuator.RodEnd.UnmarshalText", b, e, rodEndNames[:])
}
