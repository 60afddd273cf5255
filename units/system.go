package units

import "fmt"

// digits returns the significant digits of s, 4 when unset.
func (s *System) digits() int {
	if s.Digits <= 0 || s.Digits > 17 {
		return 4
	}
	return s.Digits
}

// unit resolves the spelling of a System field to a registered unit of type
// t, falling back to the metric unit when the spelling is empty, unknown, or
// does not fit t.
func (s *System) unit(spelling string, t *typeInfo, fallback int) *unitDef {
	if i, ok := spellings[spelling]; ok && fits(&unitTable[i], t) {
		return &unitTable[i]
	}
	if i, ok := displayOnly(spelling, t); ok {
		return &unitTable[i]
	}
	return &unitTable[fallback]
}

// displayOnly finds a unit whose symbol is shown but not registered for
// parsing under that spelling (the TemperatureDifference units K, °C, °F).
func displayOnly(spelling string, t *typeInfo) (int, bool) {
	for i := range unitTable {
		u := &unitTable[i]
		if u.noReg && u.sym == spelling && u.dim == t.dim && u.offset == 0 {
			return i, true
		}
	}
	return 0, false
}

func (s *System) checkField(field, spelling string, t *typeInfo) error {
	if i, ok := spellings[spelling]; ok && fits(&unitTable[i], t) {
		return nil
	}
	if _, ok := displayOnly(spelling, t); ok {
		return nil
	}
	return fmt.Errorf("units: System %q: field %s = %q is not a unit of %s: %w", s.Name, field, spelling, t.kind, ErrUnknownUnit)
}

// fits reports whether values of type t can be shown in unit u. A vacuum
// reading ("inHg vac") cannot show a pressure above ambient, so it is not a
// display unit.
func fits(u *unitDef, t *typeInfo) bool {
	return u.dim == t.dim && u.ref&t.accept != 0 && (t.useOffset || u.offset == 0) && !u.isVacuum()
}
