package contamination

import (
	"strconv"
	"strings"
	"unicode/utf8"

	"github.com/hydrosize/hydrosize/units"
)

// ParseCode reads an ISO 4406 code. Grammar:
//
//	code   = number "/" number [ "/" number ]
//	number = "-" | "*" | ">28" | [ "≥" | ">=" ] digits
//	digits = one or two decimal digits, value 0…28
//
// Three numbers give the counter form (≥4/≥6/≥14 µm(c)), two the microscope
// form (≥5/≥15 µm). "-" is a size not measured, "≥" (or its ASCII spelling
// ">=") a number from fewer than 20 counted particles, ">28" a count above
// the table, "*" too many to count. Spaces and tabs are allowed around the
// numbers. At least one size must be measured, and numbers must not grow
// with particle size ("*" ranks above ">28", which ranks above 28).
//
// Examples: "18/16/13", "-/16/13", "14/12/≥7", "14/12/>=7", ">28/26/20",
// "16/13". Errors are *units.ParseError values that quote the input and
// offset and match units.ErrSyntax, units.ErrRange or ErrOrder. ParseCode does not allocate unless it
// fails.
func ParseCode(s string) (c Code, err error) {
	if plainCode(&c, s) {
		return c, nil
	}
	return parseCode("ParseCode", s)
}

// plainCode is ParseCode's fast path for the usual text, read into c (left
// partly written when it reports false): two or three
// numbers of one or two digits, each perhaps marked "≥", separated by "/"
// without spaces ("18/16/13", "14/12/≥7"). It reports false for anything
// else (and for a code whose numbers grow with size), which parseCode then
// reads with full error reports; what it accepts, parseCode reads the same
// (TestPlainCodeAgrees).
func plainCode(c *Code, s string) bool {
	n, i := 0, 0
	for {
		m := MarkNone
		if i < len(s) && s[i] == "≥"[0] {
			if !strings.HasPrefix(s[i:], "≥") {
				return false
			}
			m, i = MarkFewCounted, i+len("≥")
		}
		if i >= len(s) || !isDigit(s[i]) {
			return false
		}
		v, j := int(s[i]-'0'), i+1
		if j < len(s) && isDigit(s[j]) {
			v, j = v*10+int(s[j]-'0'), j+1
		}
		if v > MaxScale || (j < len(s) && isDigit(s[j])) {
			return false
		}
		// Plain and "≥" numbers rank by their scale number, so the numbers
		// are in order (Code.ordered) when no scale exceeds the one before.
		if n > 0 && v > c.N[n-1].Scale {
			return false
		}
		c.N[n] = Number{Scale: v, Mark: m}
		n++
		if j == len(s) {
			break
		}
		if s[j] != '/' || n == 3 {
			return false
		}
		i = j + 1
	}
	switch n {
	case 2:
		c.Form = Microscope
	case 3:
		c.Form = Counter
	default:
		return false
	}
	return true
}

func parseCode(fn, s string) (Code, error) {
	var c Code
	var starts [3]int
	n, i := 0, 0
	for {
		if n == 3 {
			return Code{}, &units.ParseError{Func: "contamination." + fn, Input: s, Pos: i, Err: units.ErrSyntax, Detail: "at most three numbers"}
		}
		i = skipSpace(s, i)
		starts[n] = i
		num, j, perr := parseNumber(s, i)
		if perr != nil {
			perr.Func, perr.Input = "contamination."+fn, s
			return Code{}, perr
		}
		c.N[n] = num
		n++
		i = skipSpace(s, j)
		if i == len(s) {
			break
		}
		if s[i] != '/' {
			return Code{}, &units.ParseError{Func: "contamination." + fn, Input: s, Pos: i, Err: units.ErrSyntax, Detail: `want "/" between numbers`}
		}
		i++
	}
	if n < 2 {
		return Code{}, &units.ParseError{Func: "contamination." + fn, Input: s, Pos: len(s), Err: units.ErrSyntax, Detail: "want two or three numbers separated by /"}
	}
	c.Form = Counter
	if n == 2 {
		c.Form = Microscope
	}
	if c.N[0].Mark == MarkNotMeasured && c.N[1].Mark == MarkNotMeasured && (n == 2 || c.N[2].Mark == MarkNotMeasured) {
		return Code{}, &units.ParseError{Func: "contamination." + fn, Input: s, Pos: 0, Err: units.ErrSyntax, Detail: "no size measured"}
	}
	if small, large, ok := c.ordered(); !ok {
		return Code{}, &units.ParseError{Func: "contamination." + fn, Input: s, Pos: starts[large], Err: ErrOrder,
			Detail: "the number at " + c.Form.SizeLabel(large) + " is above the number at " + c.Form.SizeLabel(small)}
	}
	return c, nil
}

func skipSpace(s string, i int) int {
	for i < len(s) && (s[i] == ' ' || s[i] == '\t') {
		i++
	}
	return i
}

// parseNumber reads one number of a code starting at s[i]; it returns the
// number and the offset after it. Its errors lack Func and Input.
func parseNumber(s string, i int) (Number, int, *units.ParseError) {
	syntax := func(pos int, detail string) (Number, int, *units.ParseError) {
		return Number{}, pos, &units.ParseError{Pos: pos, Err: units.ErrSyntax, Detail: detail}
	}
	if i == len(s) {
		return syntax(i, "want a number, -, * or >28")
	}
	switch {
	case isDigit(s[i]):
		return parseDigits(s, i, MarkNone)
	case s[i] == '-':
		return Number{Mark: MarkNotMeasured}, i + 1, nil
	case s[i] == '*':
		return Number{Mark: MarkTooMany}, i + 1, nil
	case strings.HasPrefix(s[i:], ">="):
		return parseDigits(s, i+2, MarkFewCounted)
	case strings.HasPrefix(s[i:], "≥"):
		return parseDigits(s, i+len("≥"), MarkFewCounted)
	case s[i] == '>':
		if strings.HasPrefix(s[i+1:], "28") && (i+3 == len(s) || !isDigit(s[i+3])) {
			return Number{Scale: MaxScale, Mark: MarkAbove}, i + 3, nil
		}
		return syntax(i, `">" must be followed by 28 (or "=" for ≥)`)
	}
	return parseDigits(s, i, MarkNone)
}

// parseDigits reads one or two decimal digits, value 0…28, at s[i].
func parseDigits(s string, i int, m Mark) (Number, int, *units.ParseError) {
	j, v := i, 0
	for j < len(s) && isDigit(s[j]) && j-i < 3 {
		v = v*10 + int(s[j]-'0')
		j++
	}
	switch {
	case j == i:
		detail := "want a scale number"
		if r, size := utf8.DecodeRuneInString(s[i:]); r == utf8.RuneError && size == 1 {
			detail = "invalid UTF-8"
		}
		return Number{}, i, &units.ParseError{Pos: i, Err: units.ErrSyntax, Detail: detail}
	case j-i > 2:
		return Number{}, i, &units.ParseError{Pos: i, Err: units.ErrSyntax, Detail: "a scale number has one or two digits"}
	case v > MaxScale:
		return Number{}, i, &units.ParseError{Pos: i, Err: units.ErrRange, Detail: "scale numbers run from 0 to 28 (>28 above the table)"}
	}
	return Number{Scale: v, Mark: m}, j, nil
}

func isDigit(b byte) bool { return '0' <= b && b <= '9' }

// AppendText appends the code as String writes it to b
// (encoding.TextAppender). It fails, returning nil and an error as Validate
// gives it, when c does not pass Validate.
func (c Code) AppendText(b []byte) ([]byte, error) {
	return c.appendText("contamination.Code.AppendText", b)
}

func (c Code) appendText(fn string, b []byte) ([]byte, error) {
	if err := c.validate(fn, ""); err != nil {
		return nil, err
	}
	return c.appendCode(b, "≥"), nil
}

// appendCode writes the numbers with the given spelling of the "≥" mark.
func (c Code) appendCode(b []byte, atLeast string) []byte {
	for i := range c.Len() {
		if i > 0 {
			b = append(b, '/')
		}
		b = c.N[i].appendNumber(b, atLeast)
	}
	return b
}

func (n Number) appendNumber(b []byte, atLeast string) []byte {
	switch n.Mark {
	case MarkNotMeasured:
		return append(b, '-')
	case MarkTooMany:
		return append(b, '*')
	case MarkAbove:
		return append(b, ">28"...)
	case MarkFewCounted:
		b = append(b, atLeast...)
	}
	if !n.valid() {
		return append(b, '?')
	}
	return strconv.AppendInt(b, int64(n.Scale), 10)
}

// String returns the code as ISO 4406 writes it, e.g. "18/16/13",
// "-/16/13", "14/12/≥7", ">28/27/22", "16/13". The "few counted" mark is
// written "≥" (U+2265); ASCII writes ">=" instead. A number not in normal
// form is written "?".
func (c Code) String() string {
	var buf [24]byte
	return string(c.appendCode(buf[:0], "≥"))
}

// ASCII returns the code as String does, but spells the "few counted" mark
// ">=" (e.g. "14/12/>=7") for systems that take only ASCII. ParseCode reads
// both spellings.
func (c Code) ASCII() string {
	var buf [24]byte
	return string(c.appendCode(buf[:0], ">="))
}

// String returns the number as a code writes it, e.g. "16", "≥7", ">28".
func (n Number) String() string {
	var buf [8]byte
	return string(n.appendNumber(buf[:0], "≥"))
}

// MarshalText writes the code as String does (encoding.TextMarshaler), so
// codes travel in JSON as strings such as "18/16/13"; the zero Code (no
// code) writes "". It fails, and so does json.Marshal, when a non-zero c
// does not pass Validate.
func (c Code) MarshalText() ([]byte, error) {
	if c.IsZero() {
		return []byte{}, nil
	}
	return c.appendText("contamination.Code.MarshalText", nil)
}

// UnmarshalText reads a code in any form ParseCode accepts
// (encoding.TextUnmarshaler), and "" as the zero Code (no code). On error c
// is left unchanged.
func (c *Code) UnmarshalText(text []byte) error {
	if len(text) == 0 {
		*c = Code{}
		return nil
	}
	v, err := parseCode("Code.UnmarshalText", string(text))
	if err != nil {
		return err
	}
	*c = v
	return nil
}
