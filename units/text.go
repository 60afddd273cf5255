package units

// Text marshalling shared by every quantity type: MarshalText writes text that
// UnmarshalText (the typed parser) reads back to the identical float64.

import (
	"math"
	"strconv"
)

// marshalText writes v in unit u when the shortest decimal of the number reads
// back to exactly v, else in the SI unit; either way parsing restores v. A
// value that parsing would refuse (not finite, or below t's lower bound) is
// an error instead.
func marshalText(v float64, u *unitDef, t *typeInfo) ([]byte, error) {
	if math.IsInf(v, 0) || math.IsNaN(v) || t.hasMin && v < t.min {
		return nil, &RangeError{Func: "units." + t.name + ".MarshalText", Param: "q",
			Value: strconv.FormatFloat(v, 'g', -1, 64) + " " + siUnit(t).sym, Valid: t.valid()}
	}
	b := make([]byte, 0, 32)
	if x := fromSI(v, u); !math.IsInf(x, 0) {
		// The fewest digits that read back to exactly v: 20 °C, not
		// 20.000000000000057 °C.
		for prec := 1; prec <= 17; prec++ {
			b = strconv.AppendFloat(b[:0], x, 'e', prec-1, 64)
			y, err := strconv.ParseFloat(string(b), 64)
			back := float64(y * u.factor)
			if t.useOffset && u.offset != 0 {
				back += u.offset
			}
			if err == nil && math.Float64bits(back) == math.Float64bits(v) { // keeps −0
				b = strconv.AppendFloat(b[:0], y, 'g', -1, 64)
				b = append(b, ' ')
				return append(b, u.sym...), nil
			}
		}
	}
	si := siUnit(t)
	b = strconv.AppendFloat(b[:0], v, 'g', -1, 64)
	b = append(b, ' ')
	return append(b, si.sym...), nil
}

// siUnit returns the registered unit of t with factor 1 and no offset.
func siUnit(t *typeInfo) *unitDef {
	if c := coherentUnit(t.dim, t.accept); c != nil {
		return c
	}
	return &unitTable[0] // unreachable: every type has an SI unit (tested)
}
