package units

import "strconv"

// System is a presentation system: for each quantity type, the unit that
// reports write it in, and the number of significant digits. Metric and
// USCustomary return the two trade systems; a caller adjusts its own copy
// with the With methods, each of which returns a changed copy:
//
//	shop, err := units.USCustomary().WithVelocity("in/s") // every velocity in in/s
//
// Where the trade writes one type in two units by purpose, a System names a
// unit per purpose: USCustomary writes a piston speed in in/s
// (FormatPistonSpeed) and a line velocity in ft/s (FormatLineVelocity); a
// purpose a System sets no unit for follows its unit for the type.
//
// A System is a value: copies are independent, and no caller can change the
// systems another caller gets from Metric or USCustomary. Every unit it
// holds is a registered unit that fits its type, checked by the With
// methods. The zero System writes every type in its metric trade unit with
// four significant digits, as Metric does, and has no name.
type System struct {
	name   string
	digits int
	units  [numSlots]uint16 // per type and purpose, 1 + the index in unitTable of its unit; 0 means the metric unit (for a purpose, the type's)
}

// Metric returns the metric trade system: bar, L/min, kN, mm, cm³/rev, kW,
// °C, mm²/s, with four significant digits.
func Metric() System { return metricSystem }

// USCustomary returns the US customary trade system: psi, gpm, lbf, in,
// in³/rev, hp, °F, piston speeds in in/s and line velocities in ft/s, with
// four significant digits.
func USCustomary() System { return usCustomarySystem }

// Name returns the label of s, such as "metric" or "US customary".
func (s System) Name() string { return s.name }

// WithName returns a copy of s labelled name.
func (s System) WithName(name string) System {
	s.name = name
	return s
}

// Digits returns the significant digits s writes (4 unless changed).
func (s System) Digits() int {
	if s.digits == 0 {
		return 4
	}
	return s.digits
}

// WithDigits returns a copy of s that writes n significant digits, from 1
// to 17. It fails with ErrRange, returning the zero System, for any other n.
func (s System) WithDigits(n int) (System, error) {
	if n < 1 || n > 17 {
		return System{}, &RangeError{Func: "units.System.WithDigits", Param: "n", Value: strconv.Itoa(n), Valid: "from 1 to 17"}
	}
	s.digits = n
	return s, nil
}

// unit returns the unit of slot, or the metric unit when none was set.
func (s *System) unit(slot, metric int) *unitDef {
	if i := s.units[slot]; i != 0 {
		return &unitTable[i-1]
	}
	return &unitTable[metric]
}

// purposeUnit returns the unit of the purpose slot, or, when s sets none,
// the unit of the type's slot typeSlot (the metric unit when that is unset).
func (s *System) purposeUnit(slot, typeSlot, metric int) *unitDef {
	if i := s.units[slot]; i != 0 {
		return &unitTable[i-1]
	}
	return s.unit(typeSlot, metric)
}

// with sets the unit of slot to the registered spelling for type t, for the
// method fn.
func (s System) with(slot int, fn, spelling string, t *typeInfo) (System, error) {
	i, err := systemUnit(fn, spelling, t)
	if err != nil {
		return System{}, err
	}
	s.units[slot] = uint16(i + 1)
	return s, nil
}

// systemUnit returns the index in unitTable of the registered unit spelled
// spelling that values of t can be shown in, or a *ParseError: the spelling
// is unknown (ErrUnknownUnit, with the nearest spellings of t), of another
// dimension (ErrDimension) or of another reference (ErrReference).
func systemUnit(fn, spelling string, t *typeInfo) (int, error) {
	i, known := spellings[spelling]
	if known && fits(&unitTable[i], t) {
		return i, nil
	}
	if j, ok := displayOnly(spelling, t); ok {
		return j, nil
	}
	e := &ParseError{Func: fn, Input: spelling, Err: ErrUnknownUnit}
	switch {
	case !known:
		e.Detail = unknownDetail(spelling, t) + "; a System writes registered units of " + t.kind + " such as " + t.examples
	case unitTable[i].dim != t.dim:
		e.Err, e.Detail = ErrDimension, "unit of "+dimName(unitTable[i].dim)+", want a unit of "+t.kind+" such as "+t.examples
	default:
		e.Err, e.Detail = ErrReference, refDetail(unitTable[i].ref, t)
	}
	return 0, e
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

// fits reports whether values of type t can be shown in unit u. A vacuum
// reading ("inHg vac") cannot show a pressure above ambient, so it is not a
// display unit.
func fits(u *unitDef, t *typeInfo) bool {
	return u.dim == t.dim && u.ref&t.accept != 0 && (t.useOffset || u.offset == 0) && !u.isVacuum()
}
