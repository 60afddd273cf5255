package units

// The unit expression parser: a unit that is not one registered spelling is
// read as an expression of registered names (the grammar is in the package
// documentation, under Parsing).

import (
	"math"
	"strings"
	"unicode/utf8"
)

// resolved is a unit expression reduced to SI: factor, offset, dimension and
// the reference of a lone pressure or temperature spelling.
type resolved struct {
	factor float64
	offset float64
	dim    Dimension
	ref    reference
}

// maxDepth bounds parenthesis nesting in unit expressions.
const maxDepth = 16

// maxExp bounds the magnitude of any dimension exponent.
const maxExp = 24

// resolveUnit reduces a unit expression. A whole registered spelling keeps
// its offset and reference; anything else is parsed as an expression of
// registered units, in which temperatures count as intervals and a pressure
// keeps the gauge, absolute or differential reference of the spellings in
// it. On failure it returns the byte offset within u and the sentinel, with
// detail text.
func resolveUnit(u string) (resolved, failure) {
	if i, e, ok := lookupName(u); ok {
		if i < 0 {
			return resolved{}, failure{err: ErrAmbiguous, detail: ambiguousDetail(u, e)}
		}
		return resolvedOf(&unitTable[i]), failure{}
	}
	p := exprParser{s: u}
	f, dm, err := p.expr(0)
	if err == nil && p.i < len(p.s) {
		err = p.fail(ErrSyntax, "unexpected "+quoteRune(p.s, p.i))
	}
	if err != nil {
		return resolved{}, failure{pos: p.errPos, err: err, detail: p.detail, word: p.word}
	}
	if f == 0 || math.IsInf(f, 0) || math.IsNaN(f) {
		return resolved{}, failure{err: ErrRange, detail: "unit factor is not a finite non-zero number"}
	}
	ref, fl := exprReference(p.refs, dm)
	if fl.err != nil {
		return resolved{}, fl
	}
	return resolved{factor: f, dim: dm, ref: ref}, failure{}
}

func resolvedOf(d *unitDef) resolved { return resolved{d.factor, d.offset, d.dim, d.ref} }

// exprReference returns the reference of an expression of dimension dm
// whose names carried the pressure references refs: an expression of
// pressure dimension keeps them ("(psia)" is absolute, as "psia" is), and
// one that mixes absolute with gauge or differential spellings is refused.
func exprReference(refs reference, dm Dimension) (reference, failure) {
	switch {
	case refs&refAbsolute != 0 && refs&(refGauge|refDiff) != 0:
		return 0, failure{err: ErrReference, detail: "the expression mixes absolute and gauge (or differential) pressure spellings"}
	case dm != typePressure.dim || refs == 0:
		return refNone, failure{}
	case refs&refAbsolute != 0:
		return refAbsolute, failure{}
	case refs&refGauge != 0:
		return refGauge, failure{}
	}
	return refDiff, failure{}
}

// exprParser is a recursive-descent parser for unit expressions, one method
// per production of the grammar in the package documentation (expr,
// product, power, primary). It allocates nothing unless it fails.
type exprParser struct {
	s      string
	i      int
	errPos int
	detail string
	word   string    // an unknown name, when the parse failed on one
	refs   reference // the gauge, absolute and differential references of the names read
}

func (p *exprParser) fail(err error, detail string) error {
	p.errPos, p.detail = p.i, detail
	return err
}

// expr parses a quotient. Following the way engineers write W/m²·K, every
// factor after the first "/" at one parenthesis level is in the denominator.
func (p *exprParser) expr(depth int) (float64, Dimension, error) {
	f, d, err := p.product(depth)
	if err != nil {
		return 0, d, err
	}
	for p.skipSpace(); p.i < len(p.s) && p.s[p.i] == '/'; p.skipSpace() {
		p.i++
		p.skipSpace()
		g, e, err := p.product(depth)
		if err != nil {
			return 0, d, err
		}
		f /= g
		if d, err = p.combine(d, e, -1); err != nil {
			return 0, d, err
		}
	}
	return f, d, nil
}

func (p *exprParser) product(depth int) (float64, Dimension, error) {
	f, d, err := p.power(depth)
	if err != nil {
		return 0, d, err
	}
	for {
		save := p.i
		if !p.multiplySign() {
			p.i = save
			return f, d, nil
		}
		g, e, err := p.power(depth)
		if err != nil {
			return 0, d, err
		}
		f *= g
		if d, err = p.combine(d, e, 1); err != nil {
			return 0, d, err
		}
	}
}

// multiplySign consumes a multiplication sign, or the spaces that stand for
// one, and reports whether another factor follows.
func (p *exprParser) multiplySign() bool {
	spaces := p.skipSpace()
	if p.i >= len(p.s) {
		return false
	}
	switch {
	case p.s[p.i] == '*' || p.s[p.i] == '.':
		p.i++
	case strings.HasPrefix(p.s[p.i:], "·"):
		p.i += len("·")
	case strings.HasPrefix(p.s[p.i:], "⋅"):
		p.i += len("⋅")
	case p.s[p.i] == '-' && p.i+1 < len(p.s) && isNameStart(p.s[p.i+1:]):
		p.i++
	case spaces > 0 && (isNameStart(p.s[p.i:]) || p.s[p.i] == '('):
		return true
	default:
		return false
	}
	p.skipSpace()
	return true
}

func (p *exprParser) combine(d, e Dimension, sign int8) (Dimension, error) {
	if e == (Dimension{}) {
		return d, nil
	}
	for k := range d.e {
		n := int(d.e[k]) + int(sign)*int(e.e[k])
		if n > maxExp || n < -maxExp {
			return d, p.fail(ErrRange, "dimension exponent too large")
		}
		d.e[k] = int8(n)
	}
	return d, nil
}

func (p *exprParser) power(depth int) (float64, Dimension, error) {
	f, d, err := p.primary(depth)
	if err != nil {
		return 0, d, err
	}
	n, ok, err := p.exponent()
	if err != nil || !ok {
		return f, d, err
	}
	for k := range d.e {
		m := int(d.e[k]) * n
		if m > maxExp || m < -maxExp {
			return 0, d, p.fail(ErrRange, "dimension exponent too large")
		}
		d.e[k] = int8(m)
	}
	return math.Pow(f, float64(n)), d, nil
}

// superscript returns the value of the superscript digit at the start of
// s and its length in bytes, or −1: ¹ ² ³ are U+00B9, U+00B2, U+00B3 (two
// bytes, C2 B9/B2/B3); ⁰ and ⁴–⁹ are U+2070, U+2074–U+2079 (E2 81 B0,
// E2 81 B4–B9). Reading the bytes costs no map look-up after every name.
func superscript(s string) (int, int) {
	switch {
	case len(s) >= 2 && s[0] == 0xC2:
		switch s[1] {
		case 0xB9:
			return 1, 2
		case 0xB2:
			return 2, 2
		case 0xB3:
			return 3, 2
		}
	case len(s) >= 3 && s[0] == 0xE2 && s[1] == 0x81:
		if c := s[2]; c == 0xB0 || (c >= 0xB4 && c <= 0xB9) {
			return int(c - 0xB0), 3
		}
	}
	return -1, 0
}

// exponent reads "^n", "^-n", superscript digits (with ⁻), or plain digits
// written straight after a name (in3, mm2). It reports whether one was there.
func (p *exprParser) exponent() (int, bool, error) {
	if p.i >= len(p.s) {
		return 0, false, nil
	}
	if p.s[p.i] == '^' {
		p.i++
		neg := false
		if p.i < len(p.s) && (p.s[p.i] == '-' || p.s[p.i] == '+') {
			neg = p.s[p.i] == '-'
			p.i++
		}
		n, ok := p.digits()
		if !ok {
			return 0, false, p.fail(ErrSyntax, "want an integer exponent after ^")
		}
		if n > maxExp {
			return 0, false, p.fail(ErrRange, "exponent too large")
		}
		if neg {
			n = -n
		}
		return n, true, nil
	}
	if c := p.s[p.i]; c >= '0' && c <= '9' && p.i > 0 && isLetter(p.s[p.i-1]) {
		n, _ := p.digits()
		if n > maxExp {
			return 0, false, p.fail(ErrRange, "exponent too large")
		}
		return n, true, nil
	}
	neg := false
	if strings.HasPrefix(p.s[p.i:], "⁻") {
		neg = true
		p.i += len("⁻")
	}
	n, found := 0, false
	for p.i < len(p.s) {
		v, size := superscript(p.s[p.i:])
		if v < 0 {
			break
		}
		n, found = n*10+v, true
		p.i += size
		if n > maxExp {
			return 0, false, p.fail(ErrRange, "exponent too large")
		}
	}
	if !found {
		if neg {
			return 0, false, p.fail(ErrSyntax, "want superscript digits after ⁻")
		}
		return 0, false, nil
	}
	if neg {
		n = -n
	}
	return n, true, nil
}

func (p *exprParser) digits() (int, bool) {
	n, start := 0, p.i
	for p.i < len(p.s) && p.s[p.i] >= '0' && p.s[p.i] <= '9' {
		n = n*10 + int(p.s[p.i]-'0')
		p.i++
		if n > maxExp {
			n = maxExp + 1 // caught by the exponent range check
		}
	}
	return n, p.i > start
}

func (p *exprParser) primary(depth int) (float64, Dimension, error) {
	if p.i >= len(p.s) {
		return 0, Dimension{}, p.fail(ErrSyntax, "missing unit")
	}
	switch c := p.s[p.i]; {
	case c == '(':
		if depth >= maxDepth {
			return 0, Dimension{}, p.fail(ErrSyntax, "parentheses nested too deeply")
		}
		p.i++
		p.skipSpace()
		f, d, err := p.expr(depth + 1)
		if err != nil {
			return 0, d, err
		}
		p.skipSpace()
		if p.i >= len(p.s) || p.s[p.i] != ')' {
			return 0, d, p.fail(ErrSyntax, "missing )")
		}
		p.i++
		return f, d, nil
	case c == '1' && (p.i+1 == len(p.s) || p.s[p.i+1] < '0' || p.s[p.i+1] > '9'):
		p.i++
		return 1, Dimension{}, nil
	}
	return p.name()
}

// maxWords is the most words a registered spelling has ("in Hg vacuum").
const maxWords = 3

// name reads a registered unit name: a run of letters, °, µ, Δ and ℃-like
// signs. Following words, each after one space, are joined while the run is
// a registered spelling, the longest run winning (US gal, cu in, delta degC,
// liters per minute).
func (p *exprParser) name() (float64, Dimension, error) {
	start := p.i
	p.i += nameLen(p.s[p.i:])
	if p.i == start {
		return 0, Dimension{}, p.fail(ErrSyntax, "unexpected "+quoteRune(p.s, p.i))
	}
	word := p.s[start:p.i]
	for j, words := p.i, 1; words < maxWords && j < len(p.s) && p.s[j] == ' '; words++ {
		n := nameLen(p.s[j+1:])
		if n == 0 {
			break
		}
		j += 1 + n
		if _, _, ok := lookupName(p.s[start:j]); ok {
			p.i = j
			word = p.s[start:j]
		}
	}
	k, e, ok := lookupName(word)
	switch {
	case !ok:
		p.i = start
		p.word = word
		return 0, Dimension{}, p.fail(ErrUnknownUnit, unknownDetail(word, nil))
	case k < 0:
		p.i = start
		return 0, Dimension{}, p.fail(ErrAmbiguous, ambiguousDetail(word, e))
	}
	u := &unitTable[k]
	if u.isVacuum() {
		p.i = start
		return 0, Dimension{}, p.fail(ErrSyntax, `a vacuum reading ("`+word+`") stands alone, not inside a unit expression`)
	}
	p.refs |= u.ref & (refGauge | refAbsolute | refDiff)
	return u.factor, u.dim, nil
}

func isLetter(c byte) bool { return c|0x20 >= 'a' && c|0x20 <= 'z' }

// nameLen returns the length of the unit name at the start of s.
func nameLen(s string) int {
	n := 0
	for n < len(s) {
		if c := s[n]; c < utf8.RuneSelf {
			if !isLetter(c) && c != '"' {
				break
			}
			n++
			continue
		}
		r, size := utf8.DecodeRuneInString(s[n:])
		if !isNameRune(r) {
			break
		}
		n += size
	}
	return n
}

func isNameStart(s string) bool {
	r, _ := utf8.DecodeRuneInString(s)
	return isNameRune(r)
}

func isNameRune(r rune) bool {
	switch {
	case r >= 'a' && r <= 'z', r >= 'A' && r <= 'Z':
		return true
	case r == '°', r == 'º', r == 'µ', r == 'μ', r == 'Δ', r == '℃', r == '℉', r == '₀', r == '"', r == 'Ω':
		return true
	}
	return false
}

func (p *exprParser) skipSpace() int {
	n := 0
	for p.i < len(p.s) && p.s[p.i] == ' ' {
		p.i++
		n++
	}
	return n
}

func quoteRune(s string, i int) string {
	if i >= len(s) {
		return "end of text"
	}
	r, _ := utf8.DecodeRuneInString(s[i:])
	return "'" + string(r) + "'"
}
