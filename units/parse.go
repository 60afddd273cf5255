package units

// Reading "number unit" text into a typed value: the number (a fast path for
// plain decimals, strconv otherwise) and the typed parsers' checks of
// dimension, reference and range. The unit itself is resolved by the
// registry and the expression parser (registry.go, expr.go).

import (
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/internal/saybolt"
)

// scanNumber returns the length of the decimal number at the start of s, the
// number production of the grammar in the package documentation (no
// hexadecimal, underscores, NaN or Inf).
func scanNumber(s string) int {
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	intStart := i
	i = skipDigits(s, i)
	digits := i > intStart
	if i < len(s) && s[i] == '.' {
		j := skipDigits(s, i+1)
		if j > i+1 {
			digits = true
		}
		if digits {
			i = j
		}
	}
	if !digits {
		return 0
	}
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		if k := skipDigits(s, j); k > j {
			i = k
		}
	}
	return i
}

func skipDigits(s string, i int) int {
	for i < len(s) && s[i] >= '0' && s[i] <= '9' {
		i++
	}
	return i
}

// splitNumber reads the number at the start of s (after leading spaces) in
// the number style st and returns it with the offset where the unit starts.
// Errors carry the offset.
func splitNumber(s string, st numberStyle) (float64, int, failure) {
	start := 0
	for start < len(s) && s[start] == ' ' {
		start++
	}
	v, n, f := readNumber(s[start:], st)
	if f.err != nil {
		f.pos += start
		return 0, 0, f
	}
	i := start + n
	for i < len(s) && s[i] == ' ' {
		i++
	}
	return v, i, failure{}
}

// failure is a parse problem: where, which sentinel, and what was wanted.
// A zero failure means success.
type failure struct {
	pos    int
	err    error
	detail string
	word   string // the unknown unit name, with ErrUnknownUnit
}

func (f failure) at(fn, input string, offset int) error {
	return &ParseError{Func: fn, Input: input, Pos: offset + f.pos, Err: f.err, Detail: f.detail}
}

// trimRight returns s without trailing spaces.
func trimRight(s string) string {
	for len(s) > 0 && s[len(s)-1] == ' ' {
		s = s[:len(s)-1]
	}
	return s
}

// parseTyped parses "number unit" into the SI value of type t. The fast
// path covers a plain decimal and a registered spelling that fits t; every
// other input, including every error, takes the general path.
func parseTyped(fn, s string, t *typeInfo) (float64, error) {
	in := trimRight(s)
	if num, n, ok := fastNumber(in); ok {
		at := n
		for at < len(in) && in[at] == ' ' {
			at++
		}
		if i, found := fastSpellings.get(in[at:]); found {
			u := &unitTable[i]
			if u.dim == t.dim && u.ref&t.accept != 0 && (num >= 0 || !u.isVacuum()) {
				v := float64(num * u.factor)
				if t.useOffset && u.offset != 0 {
					v += u.offset
				}
				if v-v == 0 && (!t.hasMin || v >= t.min) { // finite and in range
					return v, nil
				}
			}
		}
	}
	return parseTypedSlow(fn, s, t, numberStyle{})
}

// parseTypedSlow is the general path of parseTyped, with full error reports,
// reading the number in style st.
func parseTypedSlow(fn, s string, t *typeInfo, st numberStyle) (float64, error) {
	in := trimRight(s)
	num, at, f := splitNumber(in, st)
	if f.err != nil {
		return 0, f.at(fn, s, 0)
	}
	if at == len(in) {
		return 0, &ParseError{Func: fn, Input: s, Pos: at, Err: ErrSyntax,
			Detail: "missing unit; want a unit of " + t.kind + " such as " + t.examples}
	}
	if t == &typeLength {
		if v, ok, f := compoundLength(num, in, at, st); ok || f.err != nil {
			if f.err != nil {
				return 0, f.at(fn, s, 0)
			}
			return v, nil
		}
	}
	if c := t.contextOf(in[at:]); c != nil && c.read != nil {
		v, f := c.read(num)
		if f.err != nil {
			return 0, f.at(fn, s, 0)
		}
		return v, nil
	}
	r, f := resolveTyped(in[at:], t)
	if f.err != nil {
		if f.err == ErrUnknownUnit && f.word == in[at:] {
			f.detail = unknownDetail(f.word, t) // the whole unit: suggest units of t
		}
		if f.err == ErrUnknownUnit || f.err == ErrSyntax {
			f.detail += "; want a unit of " + t.kind + " such as " + t.examples
		}
		return 0, f.at(fn, s, at)
	}
	v, f := toTyped(num, r, t)
	if f.err != nil {
		return 0, f.at(fn, s, at)
	}
	return v, nil
}

// resolveTyped resolves unit u for a parser of type t: a context spelling of
// t first (lb as lbf for a force; a plain ton refused), then the registry
// and the expression parser.
func resolveTyped(u string, t *typeInfo) (resolved, failure) {
	if c := t.contextOf(u); c != nil {
		if c.unit < 0 {
			return resolved{}, failure{err: c.err, detail: c.detail}
		}
		return resolvedOf(&unitTable[c.unit]), failure{}
	}
	return resolveUnit(u)
}

// compoundLength reads the rest of a length in feet and inches, "2 ft 6 in",
// "2' 6\"", "5 ft 3-1/2 in", whose feet num the caller has read and whose
// unit starts at in[at:]. It reports false, with no failure, when the unit
// is not a foot spelling followed by a number. The value is
// (12·feet + inches)·0.0254 m, so "2 ft 6 in" is exactly "30 in".
func compoundLength(num float64, in string, at int, st numberStyle) (float64, bool, failure) {
	u := in[at:]
	d := 0
	for d < len(u) && !isDigit(u[d]) && u[d] != '.' {
		d++
	}
	if d == 0 || d == len(u) {
		return 0, false, failure{}
	}
	if k, _, ok := lookupName(trimRight(u[:d])); !ok || k < 0 || unitTable[k].factor != footM || unitTable[k].dim != typeLength.dim {
		return 0, false, failure{}
	}
	inches, n, f := readNumber(u[d:], st)
	if f.err != nil {
		f.pos += at + d
		return 0, false, f
	}
	rest := at + d + n
	for rest < len(in) && in[rest] == ' ' {
		rest++
	}
	k, _, ok := lookupName(in[rest:])
	if !ok || k < 0 || unitTable[k].factor != inchM || unitTable[k].dim != typeLength.dim {
		return 0, false, failure{pos: rest, err: ErrSyntax, detail: "want inches after the feet, as in 2 ft 6 in or 2' 6\""}
	}
	v := float64(math.Abs(num)*12+inches) * inchM
	if math.Signbit(num) {
		v = -v
	}
	if math.IsInf(v, 0) {
		return 0, false, failure{err: ErrRange, detail: "value is not finite"}
	}
	return v, true, failure{}
}

// readSaybolt reads sus Saybolt Universal Seconds at 100 °F as a kinematic
// viscosity in m²/s, through ASTM D2161 (the equation is in
// internal/saybolt, shared with package fluid). It wants at least the SUS of
// 1.81 mm²/s, where the standard's equation starts (about 31.95 SUS).
func readSaybolt(sus float64) (float64, failure) {
	least := saybolt.Seconds(saybolt.MinViscosity)
	if !(sus >= least) || math.IsInf(sus, 0) {
		return 0, failure{err: ErrRange, detail: "want at least " + strconv.FormatFloat(least, 'f', 2, 64) +
			" SUS (1.81 mm²/s, where the ASTM D2161 equation starts)"}
	}
	return saybolt.Viscosity(sus) * 1e-6, failure{}
}

// negativeVacuum is the failure of a negative vacuum reading.
func negativeVacuum() failure {
	return failure{err: ErrRange, detail: "a vacuum reading is a depth below ambient and is never negative; " +
		"write a pressure above ambient as a gauge pressure (psi, bar, kPa)"}
}

// toTyped converts num in unit r to the SI value of type t, checking
// dimension, reference and range.
func toTyped(num float64, r resolved, t *typeInfo) (float64, failure) {
	if r.dim != t.dim {
		return 0, failure{err: ErrDimension, detail: "unit has dimension " + r.dim.String() + " (" + dimName(r.dim) +
			"), want " + t.dim.String() + " (" + t.kind + ")"}
	}
	if r.ref&t.accept == 0 {
		return 0, failure{err: ErrReference, detail: refDetail(r.ref, t)}
	}
	if num < 0 && r.factor < 0 {
		return 0, negativeVacuum()
	}
	v := float64(num * r.factor)
	if t.useOffset && r.offset != 0 { // adding 0 would turn −0 into +0
		v += r.offset
	}
	return checkValue(v, t)
}

func checkValue(v float64, t *typeInfo) (float64, failure) {
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, failure{err: ErrRange, detail: "value is not finite"}
	}
	if t.hasMin && v < t.min {
		return 0, failure{err: ErrRange, detail: "want " + t.kind + " " + t.minText}
	}
	return v, failure{}
}

func refDetail(got reference, t *typeInfo) string {
	switch got {
	case refAbsolute:
		return "an absolute pressure spelling where a gauge pressure is wanted; convert with an explicit ambient (AbsolutePressure.Gauge)"
	case refGauge:
		return "a gauge pressure spelling where an absolute pressure is wanted; use bara, psia or atm, or convert with an explicit ambient (Pressure.Absolute)"
	case refDiff:
		return "a differential pressure spelling where an absolute pressure is wanted; a difference of two pressures is a Pressure"
	case refNone:
		if t.dim == typeTemperature.dim {
			return "a temperature difference where a temperature is wanted; use K, °C or °F"
		}
	}
	return "unit does not fit " + t.kind
}

// dimName names the quantity type of dimension d, or "no hydrosize type".
func dimName(d Dimension) string {
	for _, t := range allTypes {
		if t.dim == d {
			return t.kind
		}
	}
	switch d {
	case dim(0, 0, 1, 0, 0):
		return "time"
	case Dimension{}:
		return "dimensionless"
	}
	return "no hydrosize type"
}

// pow10 holds the powers of ten that float64 represents exactly.
var pow10 = [...]float64{1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10,
	1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22}

// fastNumber reads the decimal number at the start of s (no leading spaces)
// when its value is exactly m·10^e with m < 2⁵³ and |e| ≤ 22. Then one
// correctly rounded multiply or divide gives the same float64 as
// strconv.ParseFloat (Clinger's fast path). It returns the value, the length
// read, and false when the number needs the general path (or is not there).
func fastNumber(s string) (float64, int, bool) {
	i, neg := 0, false
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		neg = s[i] == '-'
		i++
	}
	var mant uint64
	digits, frac, seenDot, anyDigit := 0, 0, false, false
	for ; i < len(s); i++ {
		c := s[i]
		if c == '.' && !seenDot {
			seenDot = true
			continue
		}
		if c < '0' || c > '9' {
			break
		}
		if digits >= 15 {
			return 0, 0, false
		}
		mant = mant*10 + uint64(c-'0')
		anyDigit = true
		if mant > 0 {
			digits++
		}
		if seenDot {
			frac++
		}
	}
	if !anyDigit {
		return 0, 0, false // no digits at all: let the general path report it
	}
	exp := 0
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j, eneg := i+1, false
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			eneg = s[j] == '-'
			j++
		}
		start := j
		for ; j < len(s) && s[j] >= '0' && s[j] <= '9'; j++ {
			if exp = exp*10 + int(s[j]-'0'); exp > 400 {
				return 0, 0, false
			}
		}
		if j == start {
			return 0, 0, false
		}
		if eneg {
			exp = -exp
		}
		i = j
	}
	if i < len(s) && (s[i] == '_' || s[i] == 'x' || s[i] == 'X' || s[i] == '.') {
		return 0, 0, false
	}
	e := exp - frac
	f := float64(mant)
	switch {
	case e == 0:
	case e > 0 && e <= 22:
		f *= pow10[e]
	case e < 0 && e >= -22:
		f /= pow10[-e]
	default:
		return 0, 0, false
	}
	if neg {
		f = -f
	}
	return f, i, true
}
