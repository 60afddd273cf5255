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
	if i, ok := fastSpellings.get(u); ok {
		return resolvedOf(&unitTable[i]), failure{}
	}
	r, f := resolveInexact(u)
	if f != nil {
		return resolved{}, *f
	}
	return r, failure{}
}

// resolveInexact is resolveUnit for a unit u that is not a registered
// spelling exactly: by letter case, else as an expression. A failure is
// returned by pointer, nil on success, so that success copies little.
func resolveInexact(u string) (resolved, *failure) {
	if i, e, ok := lookupFold(u); ok {
		if i < 0 {
			return resolved{}, &failure{err: ErrAmbiguous, detail: ambiguousDetail(u, e)}
		}
		return resolvedOf(&unitTable[i]), nil
	}
	p := exprParser{s: u}
	f, dm, err := p.eval()
	if err == nil && p.i < len(p.s) {
		err = p.fail(ErrSyntax, "unexpected "+quoteRune(p.s, p.i))
	}
	if err != nil {
		return resolved{}, &failure{pos: p.errPos, err: err, detail: p.detail, word: p.word}
	}
	if f == 0 || math.IsInf(f, 0) || math.IsNaN(f) {
		return resolved{}, &failure{err: ErrRange, detail: "unit factor is not a finite non-zero number"}
	}
	ref, fl := exprReference(p.refs, dm)
	if fl.err != nil {
		return resolved{}, &failure{err: fl.err, detail: fl.detail}
	}
	return resolved{factor: f, dim: dm, ref: ref}, nil
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

// exprParser reads unit expressions by the grammar in the package
// documentation (expr, product, power, primary), with one loop per
// parenthesis level instead of one call per production. It allocates
// nothing unless it fails.
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

// eval reads the expression at p.i to the end of its top level and returns
// its factor and dimension.
func (p *exprParser) eval() (float64, Dimension, error) {
	f, d, err := p.level(0)
	if err != nil {
		return 0, Dimension{}, err
	}
	return f, d.unpack(), nil
}

// level reads one parenthesis level: operands (a name, "1", or a
// parenthesised expression, read by a call for the next level), each with
// its exponent, joined by multiplication signs into a product; after a "/"
// a product for the denominator, which divides the level's value when it
// ends, as the grammar's expr does ("everything after the first / divides",
// the way engineers read W/m²·K). It returns at the end of the text or
// before the ")" that closes the level.
func (p *exprParser) level(depth int) (float64, packedDim, error) {
	num, den := 1.0, 1.0 // the value so far; the denominator product being read
	dn, dd := dimZero, dimZero
	inDen := false
	for {
		if p.i >= len(p.s) {
			return 0, dimZero, p.fail(ErrSyntax, "missing unit")
		}
		var f float64
		var d packedDim
		var err error
		switch c := p.s[p.i]; {
		case c == '(':
			if depth >= maxDepth {
				return 0, dimZero, p.fail(ErrSyntax, "parentheses nested too deeply")
			}
			p.i++
			p.skipSpace()
			if f, d, err = p.level(depth + 1); err != nil {
				return 0, dimZero, err
			}
			p.skipSpace()
			if p.i >= len(p.s) || p.s[p.i] != ')' {
				return 0, dimZero, p.fail(ErrSyntax, "missing )")
			}
			p.i++
		case c == '1' && (p.i+1 == len(p.s) || p.s[p.i+1] < '0' || p.s[p.i+1] > '9'):
			p.i++
			f, d = 1, dimZero
		default:
			if f, d, err = p.name(); err != nil {
				return 0, dimZero, err
			}
		}
		n, ok, err := p.exponent()
		if err != nil {
			return 0, dimZero, err
		}
		if ok {
			if d, err = p.scale(d, n); err != nil {
				return 0, dimZero, err
			}
			f = intPow(f, n)
		}
		if inDen {
			den *= f
			dd, err = p.combine(dd, d, 1)
		} else {
			num *= f
			dn, err = p.combine(dn, d, 1)
		}
		if err != nil {
			return 0, dimZero, err
		}
		save := p.i
		if p.multiplySign() {
			continue // another factor of this product
		}
		p.i = save
		if inDen { // the denominator product ends
			num /= den
			if dn, err = p.combine(dn, dd, -1); err != nil {
				return 0, dimZero, err
			}
			inDen = false
		}
		p.skipSpace()
		if p.i >= len(p.s) || p.s[p.i] != '/' {
			return num, dn, nil
		}
		p.i++
		p.skipSpace()
		den, dd, inDen = 1, dimZero, true
	}
}

// scale multiplies every exponent of d by n (|n| ≤ maxExp), checking the
// range: every exponent must be within maxExp/|n| before, and the product
// is |n| sums that never leave the range.
func (p *exprParser) scale(d packedDim, n int) (packedDim, error) {
	if n == 0 {
		return dimZero, nil
	}
	k := max(n, -n)
	if !d.within(maxExp / k) {
		return d, p.fail(ErrRange, "dimension exponent too large")
	}
	r := dimZero
	for range k {
		if n > 0 {
			r = r + d - dimZero
		} else {
			r = r + dimZero - d
		}
	}
	return r, nil
}

// multiplySign consumes a multiplication sign, or the spaces that stand for
// one, and reports whether another factor follows.
func (p *exprParser) multiplySign() bool {
	spaces := p.skipSpace()
	if p.i >= len(p.s) {
		return false
	}
	switch c := p.s[p.i]; {
	case c == '*' || c == '.':
		p.i++
	case c == "·"[0] && strings.HasPrefix(p.s[p.i:], "·"):
		p.i += len("·")
	case c == "⋅"[0] && strings.HasPrefix(p.s[p.i:], "⋅"):
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

// combine returns d + sign·e, checking the range of every exponent.
func (p *exprParser) combine(d, e packedDim, sign int) (packedDim, error) {
	var r packedDim
	if sign > 0 {
		r = d + e - dimZero
	} else {
		r = d + dimZero - e
	}
	if !r.inRange() {
		return d, p.fail(ErrRange, "dimension exponent too large")
	}
	return r, nil
}

// packedDim is a Dimension with each exponent e stored as the byte e + 64
// of a uint64, so that the expression parser adds and subtracts dimensions
// and checks their range (|e| ≤ maxExp) with a few word operations instead
// of a loop over the bases. Every packedDim the parser holds is in range,
// so no byte carries into the next: a sum or difference of two lies within
// 64 ± 2·maxExp, from 16 to 112.
type packedDim uint64

const (
	dimOnes  packedDim = 0x0101010101010101
	dimZero            = 64 * dimOnes // the dimensionless packedDim
	dimHighs           = 0x80 * dimOnes
)

// packDim packs d, whose exponents are within ±maxExp.
func packDim(d Dimension) packedDim {
	var x packedDim
	for k := len(d.e) - 1; k >= 0; k-- {
		x = x<<8 | packedDim(uint8(int(d.e[k])+64))
	}
	return x
}

func (x packedDim) unpack() Dimension {
	var d Dimension
	for k := range d.e {
		d.e[k] = int8(int(x>>(8*k)&0xff) - 64)
	}
	return d
}

// inRange reports whether every exponent of x is within ±maxExp.
func (x packedDim) inRange() bool { return x.within(maxExp) }

// within reports whether every exponent of x is within ±k (0 ≤ k ≤
// maxExp): every byte from 64 − k to 64 + k, tested on all bytes at once (a
// byte above 64 + k sets its high bit when 127 − (64 + k) is added; a byte
// below 64 − k leaves it clear when 128 − (64 − k) is). Each byte of x is
// at most 64 + 2·maxExp, so neither sum carries into the next byte.
func (x packedDim) within(k int) bool {
	over := x + packedDim(127-(64+k))*dimOnes
	under := x + packedDim(128-(64-k))*dimOnes
	return (over|^under)&dimHighs == 0
}

// intPow returns f^n for the small integer exponents of units by
// multiplication, bit for bit what math.Pow(f, float64(n)) gives where no
// product leaves the normal range (math.Pow multiplies the mantissas and
// scales by the exponents, the same roundings); elsewhere it is math.Pow.
func intPow(f float64, n int) float64 {
	if a := math.Abs(f); a < 1e-60 || a > 1e60 {
		return math.Pow(f, float64(n))
	}
	switch n {
	case 0:
		return 1
	case 1:
		return f
	case 2:
		return f * f
	case 3:
		return f * (f * f)
	case -1:
		return 1 / f
	case -2:
		return 1 / (f * f)
	case -3:
		return 1 / (f * (f * f))
	}
	return math.Pow(f, float64(n))
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
	} else if c != 0xC2 && c != 0xE2 {
		return 0, false, nil // no superscript starts with another byte
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

// maxWords is the most words a registered spelling has ("in Hg vacuum").
const maxWords = 3

// name reads a registered unit name: a run of letters, °, µ, Δ and ℃-like
// signs. Following words, each after one space, are joined while the run is
// a registered spelling, the longest run winning (US gal, cu in, delta degC,
// liters per minute).
func (p *exprParser) name() (float64, packedDim, error) {
	start := p.i
	p.i += nameLen(p.s[p.i:])
	if p.i == start {
		return 0, dimZero, p.fail(ErrSyntax, "unexpected "+quoteRune(p.s, p.i))
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
		return 0, dimZero, p.fail(ErrUnknownUnit, unknownDetail(word, nil))
	case k < 0:
		p.i = start
		return 0, dimZero, p.fail(ErrAmbiguous, ambiguousDetail(word, e))
	}
	u := &unitTable[k]
	if u.isVacuum() {
		p.i = start
		return 0, dimZero, p.fail(ErrSyntax, `a vacuum reading ("`+word+`") stands alone, not inside a unit expression`)
	}
	p.refs |= u.ref & (refGauge | refAbsolute | refDiff)
	return u.factor, unitDims[k], nil
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
		} else if c == 0xC2 && n+1 < len(s) && (s[n+1] == 0xB7 || s[n+1] == 0xB2 || s[n+1] == 0xB3) {
			break // · ² ³ end a name
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

// unitDims holds the dimension of every unit of unitTable packed, built once
// at start-up and never changed.
var unitDims = func() (t [len(unitTable)]packedDim) {
	for i := range unitTable {
		t[i] = packDim(unitTable[i].dim)
	}
	return t
}()
