package units

import (
	"fmt"
	"math"
	"strconv"
)

// appendNumber appends v with the given number of significant digits in
// plain decimal notation, trailing zeros removed; very large or very small
// magnitudes use exponent notation.
func appendNumber(b []byte, v float64, digits int) []byte {
	if digits <= 0 {
		digits = 4
	}
	a := math.Abs(v)
	if a == 0 {
		return append(b, '0')
	}
	if a < 1e-4 || a >= 1e9 {
		return strconv.AppendFloat(b, v, 'g', digits, 64)
	}
	decimals := digits - 1 - int(math.Floor(math.Log10(a)))
	if decimals < 0 {
		decimals = 0
	}
	start := len(b)
	b = strconv.AppendFloat(b, v, 'f', decimals, 64)
	if decimals > 0 {
		for b[len(b)-1] == '0' {
			b = b[:len(b)-1]
		}
		if b[len(b)-1] == '.' {
			b = b[:len(b)-1]
		}
	}
	if string(b[start:]) == "-0" {
		b = append(b[:start], '0')
	}
	return b
}

// fromSI converts an SI value to a number of unit u.
func fromSI(v float64, u *unitDef) float64 {
	return (v - u.offset) / u.factor
}

// appendIn appends v as a number of unit u, a space and the unit symbol.
// A temperature at or near absolute zero is never rounded below its scale's
// zero (−459.67 °F prints as −459.67, not −459.7), so it reads back. A value
// that u cannot show faithfully is written in the coherent SI unit instead
// (see display), so String never prints ±Inf, or 0 for a value that is not
// zero, and what it prints reads back.
func appendIn(b []byte, v float64, u *unitDef, digits int) []byte {
	x, u, all := display(v, u)
	switch {
	case all:
		digits = 17
	case u.offset != 0 && v >= 0 && v < 1:
		digits = max(digits, 8)
	}
	b = appendNumber(b, x, digits)
	b = append(b, ' ')
	return append(b, u.sym...)
}

// nearMax is half the largest float64. A number of at most this magnitude,
// rounded to one or more significant digits, is still finite.
const nearMax = math.MaxFloat64 / 2

// display returns v as a number x of the unit to print it in: u, or the
// coherent SI unit of u's dimension when u cannot show v faithfully:
//   - x would overflow, or come within rounding of the float64 limit
//     (1e306 Pa·s is +Inf in mPa·s);
//   - x would underflow to zero or to a subnormal number that has lost
//     precision (5e-324 N is 0 kN; 1e-318 Pa is a subnormal number of bar);
//   - v itself is within rounding of the float64 limit; then all reports
//     that x must be written with every digit it needs (17) to read back.
//
// Temperature scales (°C, °F) are kept: their offset keeps x well away from
// both limits.
func display(v float64, u *unitDef) (x float64, unit *unitDef, all bool) {
	x = fromSI(v, u)
	all = math.Abs(v) > nearMax
	lost := u.offset == 0 && v != 0 && math.Abs(x) < minNormal && math.Abs(x) < math.Abs(v)
	if all || math.Abs(x) > nearMax || lost {
		u = coherentFor(u)
		x = fromSI(v, u)
	}
	return x, u, all
}

// minNormal is the smallest positive normal float64, 2⁻¹⁰²².
const minNormal = 0x1p-1022

// coherentFor returns the registered unit with u's dimension and reference
// whose factor is 1 and offset 0 (Pa for bar, Pa·s for mPa·s), or u itself
// when there is none.
func coherentFor(u *unitDef) *unitDef {
	if u.factor == 1 && u.offset == 0 {
		return u
	}
	if c := coherentUnit(u.dim, u.ref); c != nil {
		return c
	}
	if c := coherentUnit(u.dim, refNone|refGauge|refAbsolute|refPoint); c != nil {
		return c
	}
	return u
}

// coherentUnit returns the first registered unit of dimension dim with
// factor 1, offset 0 and one of the references refs, or nil.
func coherentUnit(dim Dimension, refs reference) *unitDef {
	for i := range unitTable {
		c := &unitTable[i]
		if c.dim == dim && c.factor == 1 && c.offset == 0 && !c.noReg && c.ref&refs != 0 {
			return c
		}
	}
	return nil
}

// goString formats v as "v * base", the shortest decimal that reads back.
func goString(v float64, base string) string {
	var buf [48]byte
	b := strconv.AppendFloat(buf[:0], v, 'g', -1, 64)
	b = append(b, " * "...)
	b = append(b, base...)
	return string(b)
}

// formatQuantity implements fmt.Formatter for every quantity type.
func formatQuantity(f fmt.State, verb rune, v float64, u *unitDef, typeName, base string) {
	var buf [64]byte
	var b []byte
	switch verb {
	case 'v', 's':
		if verb == 'v' && f.Flag('#') {
			b = append(buf[:0], goString(v, base)...)
			break
		}
		b = appendIn(buf[:0], v, u, 4)
	case 'e', 'E', 'f', 'F', 'g', 'G':
		prec, ok := f.Precision()
		if !ok {
			prec = -1
			if verb != 'g' && verb != 'G' {
				prec = 6
			}
		}
		x, du, all := display(v, u)
		if all {
			prec = -1 // every digit, so that it reads back finite
		}
		b = appendVerb(buf[:0], x, du, byte(verb), prec, f.Flag('+'))
		if du.offset != 0 && scaleBelowZero(b, du) {
			// Rounded below its scale's zero (%.0e of 0 K is -3e+02 °C):
			// write kelvins, which rounding keeps at or above zero.
			b = appendVerb(buf[:0], v, coherentFor(du), byte(verb), prec, f.Flag('+'))
		}
	default:
		fmt.Fprintf(f, "%%!%c(units.%s=%s)", verb, typeName, appendIn(buf[:0], v, u, 4))
		return
	}
	pad(f, b)
}

// appendVerb appends x formatted by strconv with the verb and precision,
// a space and the symbol of u. plus asks for a sign on a number without one
// (the + flag); −0 keeps its minus.
func appendVerb(b []byte, x float64, u *unitDef, verb byte, prec int, plus bool) []byte {
	if plus && !math.Signbit(x) {
		b = append(b, '+')
	}
	b = strconv.AppendFloat(b, x, verb, prec, 64)
	b = append(b, ' ')
	return append(b, u.sym...)
}

// scaleBelowZero reports whether the number at the start of b, read as a number
// of the temperature scale u, lies below absolute zero.
func scaleBelowZero(b []byte, u *unitDef) bool {
	n := scanNumber(string(b))
	y, err := strconv.ParseFloat(string(b[:n]), 64)
	return err == nil && float64(y*u.factor)+u.offset < 0
}

// pad writes b to f, padded with spaces to the width, if any.
func pad(f fmt.State, b []byte) {
	w, ok := f.Width()
	n := len([]rune(string(b)))
	if !ok || w <= n {
		f.Write(b)
		return
	}
	spaces := make([]byte, w-n)
	for i := range spaces {
		spaces[i] = ' '
	}
	if f.Flag('-') {
		f.Write(b)
		f.Write(spaces)
		return
	}
	f.Write(spaces)
	f.Write(b)
}
