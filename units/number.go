package units

// The number production of the grammar in the package documentation, under
// Parsing: a decimal, a fraction of whole numbers ("3/8") or a mixed number
// ("1-1/2", "1 1/2"), and the digit conventions a Parser may choose (a
// decimal comma, a thousands separator). A comma is refused unless a Parser
// says what it means.

import (
	"errors"
	"strconv"
	"strings"
)

// Parser reads quantities whose numbers follow a convention the caller
// chooses, where the package's functions refuse a comma as ambiguous
// ("3,000" is three thousand in the US and three in much of Europe):
//
//	eu := units.Parser{Decimal: ','}            // "2,5 bar" is 2.5 bar
//	us := units.Parser{Group: ','}              // "3,000 psi" is 3000 psi
//	de := units.Parser{Decimal: ',', Group: '.'} // "1.500,5 L/min"
//
// A number may then use the decimal mark Decimal and, in its whole part,
// the mark Group between groups of three digits (1–3 digits before the
// first). A mark the Parser does not name is still refused as ambiguous,
// so a decimal-comma Parser refuses "2.5 bar". Everything else is the
// package's grammar. The zero Parser reads as the package's functions do.
// A Parser is a plain value with no state of its own: any number of
// goroutines may use one at once.
type Parser struct {
	// Decimal is the decimal mark, '.' or ','; zero means '.'.
	Decimal rune
	// Group is the digit-group (thousands) mark, ',' or '.', other than
	// Decimal; zero means none.
	Group rune
}

// style returns the number style of p, or a *RangeError naming the field
// for the method fn.
func (p Parser) style(fn string) (numberStyle, error) {
	st := numberStyle{}
	switch p.Decimal {
	case 0, '.':
	case ',':
		st.decimal = ','
	default:
		return st, &RangeError{Func: fn, Param: "p.Decimal", Value: strconv.QuoteRune(p.Decimal), Valid: "'.' or ','"}
	}
	switch p.Group {
	case 0:
	case ',', '.':
		if byte(p.Group) == st.point() {
			return st, &RangeError{Func: fn, Param: "p.Group", Value: strconv.QuoteRune(p.Group), Valid: "0, or ',' or '.' other than the decimal mark"}
		}
		st.group = byte(p.Group)
	default:
		return st, &RangeError{Func: fn, Param: "p.Group", Value: strconv.QuoteRune(p.Group), Valid: "0, ',' or '.'"}
	}
	if st.decimal == '.' {
		st.decimal = 0
	}
	return st, nil
}

// Parse is units.Parse with the number convention of p.
func (p Parser) Parse(s string) (Quantity, error) {
	const fn = "units.Parser.Parse"
	st, err := p.style(fn)
	if err != nil {
		return Quantity{}, err
	}
	return parseQuantity(fn, s, st)
}

// parseTyped is the typed parsers' parseTyped with the number convention of p.
func (p Parser) parseTyped(fn, s string, t *typeInfo) (float64, error) {
	st, err := p.style(fn)
	switch {
	case err != nil:
		return 0, err
	case st == (numberStyle{}):
		return parseTyped(fn, s, t)
	}
	return parseTypedSlow(fn, s, t, st)
}

// numberStyle is a convention for the digits of a number: the decimal mark
// and the mark, if any, that groups thousands. The zero value is the
// package's own: a decimal point, no groups, and a comma refused as
// ambiguous.
type numberStyle struct {
	decimal byte // '.' or ','; 0 means '.'
	group   byte // ',' or '.', or 0 for none
}

func (st numberStyle) point() byte {
	if st.decimal == 0 {
		return '.'
	}
	return st.decimal
}

// maxFractionDigits bounds each whole number of a fraction, so that the
// numerator of a mixed number, w·d + n, stays exact in float64 arithmetic.
const maxFractionDigits = 7

// readNumber reads the number at the start of s (no leading spaces) in
// style st and returns its value and length. A failure carries the offset
// in s where the problem starts.
func readNumber(s string, st numberStyle) (float64, int, failure) {
	if st == (numberStyle{}) {
		if v, n, ok := fastNumber(s); ok && !continues(s, n) {
			return v, n, failure{}
		}
	}
	var buf [64]byte
	b, n, plain, f := normalizeNumber(buf[:0], s, st)
	if f.err != nil {
		return 0, 0, f
	}
	v, err := strconv.ParseFloat(string(b), 64)
	if err != nil {
		if errors.Is(err, strconv.ErrRange) {
			return 0, 0, failure{err: ErrRange, detail: "number overflows float64"}
		}
		return 0, 0, failure{err: ErrSyntax, detail: "want a decimal number first"}
	}
	if plain {
		if w, m, ok, f := fractionAfter(s, n); ok || f.err != nil {
			return w, m, f
		}
	} else if n < len(s) && s[n] == '/' && n+1 < len(s) && isDigit(s[n+1]) {
		return 0, 0, failure{pos: n, err: ErrSyntax, detail: "a fraction is written in whole numbers, such as 3/8 or 1-1/2"}
	}
	return v, n, failure{}
}

// continues reports whether the text after a plain decimal of length n
// goes on as a number in a way fastNumber does not read: a comma followed
// by a digit, or a fraction.
func continues(s string, n int) bool {
	if n >= len(s) {
		return false
	}
	switch s[n] {
	case ',', '/', '-', ' ':
		return n+1 < len(s) && isDigit(s[n+1])
	}
	return false
}

// normalizeNumber copies the number at the start of s into b as strconv
// reads it (digits, '.', exponent), dropping the group marks of st and
// turning its decimal mark into '.'. It returns the length read in s and
// whether the number is a plain whole number (only digits), which a
// fraction may follow.
func normalizeNumber(b []byte, s string, st numberStyle) ([]byte, int, bool, failure) {
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		b = append(b, s[i])
		i++
	}
	intStart := i
	b, i, grouped, f := integerDigits(b, s, i, st)
	if f.err != nil {
		return b, 0, false, f
	}
	digits := i > intStart
	plain := digits && !grouped
	if i < len(s) && s[i] == st.point() {
		j := i + 1
		for j < len(s) && isDigit(s[j]) {
			j++
		}
		if j > i+1 || digits {
			b = append(b, '.')
			b = append(b, s[i+1:j]...)
			digits, plain, i = true, false, j
		}
	}
	if f := otherMark(s, i, intStart, st); f.err != nil {
		return b, 0, false, f
	}
	if !digits {
		return b, 0, false, failure{pos: intStart, err: ErrSyntax, detail: "want a decimal number first"}
	}
	if i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		j := i + 1
		if j < len(s) && (s[j] == '+' || s[j] == '-') {
			j++
		}
		k := j
		for k < len(s) && isDigit(s[k]) {
			k++
		}
		if k > j {
			b = append(b, s[i:k]...)
			i, plain = k, false
		}
	}
	if i < len(s) && (s[i] == '_' || (s[i] == 'x' || s[i] == 'X') && s[intStart:i] == "0") {
		return b, 0, false, failure{pos: i, err: ErrSyntax, detail: "hexadecimal numbers and underscores are not accepted"}
	}
	return b, i, plain, failure{}
}

// integerDigits appends the whole-number digits at s[i:] to b, reading the
// group mark of st between groups of three ("12,500"), and returns the end
// and whether a group mark was read.
func integerDigits(b []byte, s string, i int, st numberStyle) ([]byte, int, bool, failure) {
	start, grouped := i, false
	for i < len(s) && isDigit(s[i]) {
		i++
	}
	b = append(b, s[start:i]...)
	for st.group != 0 && i < len(s) && s[i] == st.group && i+1 < len(s) && isDigit(s[i+1]) {
		if !grouped && i-start > 3 || i == start {
			return b, 0, false, failure{pos: i, err: ErrSyntax, detail: "want at most three digits before the first " + quoteByte(st.group)}
		}
		j := i + 1
		for j < len(s) && isDigit(s[j]) {
			j++
		}
		if j-i-1 != 3 {
			return b, 0, false, failure{pos: i + 1, err: ErrSyntax, detail: "want groups of three digits after each " + quoteByte(st.group)}
		}
		b = append(b, s[i+1:j]...)
		i, grouped = j, true
	}
	return b, i, grouped, failure{}
}

// otherMark refuses a comma or point at s[i], followed by a digit, that st
// does not give a meaning to: by default every comma.
func otherMark(s string, i, start int, st numberStyle) failure {
	if i+1 >= len(s) || !isDigit(s[i+1]) || (s[i] != ',' && s[i] != '.') || s[i] == st.point() || s[i] == st.group {
		return failure{}
	}
	end := i + 1
	for end < len(s) && (isDigit(s[end]) || s[end] == ',' || s[end] == '.') {
		end++
	}
	num := s[start:end]
	if st == (numberStyle{}) {
		return failure{pos: i, err: ErrAmbiguous, detail: commaDetail(num)}
	}
	return failure{pos: i, err: ErrAmbiguous, detail: "this Parser reads " + quoteByte(st.point()) +
		" as the decimal mark and no " + quoteByte(s[i]) + ` between digits, so "` + num + `" is ambiguous`}
}

// commaDetail explains why a number with a comma is refused, and how to
// write it.
func commaDetail(num string) string {
	point := strings.ReplaceAll(num, ",", ".")
	grouped := strings.ReplaceAll(num, ",", "")
	var b strings.Builder
	b.WriteString(`a comma in a number is ambiguous: "` + num + `" is `)
	if thousands(num) {
		b.WriteString(grouped + " where a comma groups thousands (as in the US) and " + point +
			" where it is the decimal mark (as in much of Europe); write " + grouped + " or " + point)
	} else {
		b.WriteString(point + " where a comma is the decimal mark; write " + point)
	}
	b.WriteString(`, or read it with a Parser that says which (units.Parser{Decimal: ','} or units.Parser{Group: ','})`)
	return b.String()
}

// thousands reports whether num (digits and commas) groups thousands
// correctly: one to three digits, then groups of three after each comma.
func thousands(num string) bool {
	parts := strings.Split(num, ",")
	if len(parts[0]) == 0 || len(parts[0]) > 3 || strings.Contains(num, ".") {
		return false
	}
	for _, p := range parts[1:] {
		if len(p) != 3 {
			return false
		}
	}
	return true
}

// fractionAfter reads a fraction that continues the whole number of
// length n at the start of s: "/d" (w/d) or, for a mixed number, "-n/d" or
// " n/d" with n < d (w + n/d). It reports false when no fraction follows.
func fractionAfter(s string, n int) (float64, int, bool, failure) {
	if n >= len(s) {
		return 0, 0, false, failure{}
	}
	neg := s[0] == '-'
	whole := strings.TrimLeft(s[:n], "+-")
	switch s[n] {
	case '/':
		den, end, ok := wholeNumber(s, n+1)
		if !ok {
			return 0, 0, false, failure{}
		}
		num, okNum := smallWhole(whole)
		if !okNum || den < 0 {
			return 0, 0, false, failure{pos: 0, err: ErrRange, detail: "a fraction of numbers of more than 7 digits"}
		}
		if den == 0 {
			return 0, 0, false, failure{pos: n + 1, err: ErrRange, detail: "a fraction with denominator 0"}
		}
		return signed(float64(num)/float64(den), neg), end, true, failure{}
	case '-', ' ':
		top, slash, ok := wholeNumber(s, n+1)
		if !ok || slash >= len(s) || s[slash] != '/' {
			return 0, 0, false, failure{}
		}
		den, end, ok := wholeNumber(s, slash+1)
		if !ok {
			return 0, 0, false, failure{}
		}
		wn, okW := smallWhole(whole)
		if !okW || top < 0 || den < 0 {
			return 0, 0, false, failure{pos: 0, err: ErrRange, detail: "a mixed number of more than 7 digits in a part"}
		}
		if den == 0 {
			return 0, 0, false, failure{pos: slash + 1, err: ErrRange, detail: "a fraction with denominator 0"}
		}
		if top >= den {
			return 0, 0, false, failure{pos: n + 1, err: ErrSyntax, detail: "the fraction of a mixed number is less than one, as in 1-1/2"}
		}
		return signed(float64(wn*den+top)/float64(den), neg), end, true, failure{}
	}
	return 0, 0, false, failure{}
}

// wholeNumber reads the digits at s[i:], returning their value (−1 when
// there are more than maxFractionDigits) and the end; ok is false when
// there is no digit.
func wholeNumber(s string, i int) (int64, int, bool) {
	j := i
	for j < len(s) && isDigit(s[j]) {
		j++
	}
	if j == i {
		return 0, i, false
	}
	v, ok := smallWhole(s[i:j])
	if !ok {
		return -1, j, true
	}
	return v, j, true
}

// smallWhole returns the value of the digits s, when there are at most
// maxFractionDigits of them.
func smallWhole(s string) (int64, bool) {
	if len(s) > maxFractionDigits {
		return 0, false
	}
	var v int64
	for i := 0; i < len(s); i++ {
		v = v*10 + int64(s[i]-'0')
	}
	return v, true
}

func signed(v float64, neg bool) float64 {
	if neg {
		return -v
	}
	return v
}

func isDigit(c byte) bool { return '0' <= c && c <= '9' }

func quoteByte(c byte) string { return "'" + string(rune(c)) + "'" }
