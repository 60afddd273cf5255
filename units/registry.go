package units

import (
	"math"
	"sort"
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"
)

// reference says what a pressure or temperature spelling is measured from.
type reference uint8

const (
	refNone     reference = 1 << iota // a plain unit, or a difference
	refGauge                          // measured from ambient: psi, psig, bar, barg
	refAbsolute                       // measured from vacuum: psia, bara, atm
	refPoint                          // a temperature on a scale (K, °C, °F, °R)
)

// unitDef is one registered unit. SI value = number·factor + offset; the
// offset applies only to a temperature read as a point on its scale.
type unitDef struct {
	sym     string
	factor  float64
	offset  float64
	dim     Dimension
	ref     reference
	noReg   bool     // sym belongs to another unit's spelling
	aliases []string // other spellings
}

// typeInfo describes a typed quantity for parsing and conversion.
type typeInfo struct {
	name      string // Go type name
	kind      string // lower-case name for messages
	dim       Dimension
	accept    reference // references the type accepts
	useOffset bool      // apply the unit's offset (Temperature)
	hasMin    bool
	min       float64 // inclusive lower bound, SI
	minText   string
	examples  string // unit spellings for messages
}

// spellings maps every accepted spelling to its index in unitTable. It is
// built once at start-up and never changed.
var spellings = buildSpellings()

func buildSpellings() map[string]int {
	m := make(map[string]int, 4*len(unitTable))
	for i := range unitTable {
		u := &unitTable[i]
		if !u.noReg {
			m[u.sym] = i
		}
		for _, a := range u.aliases {
			m[a] = i
		}
	}
	return m
}

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
// registered units, in which temperatures count as intervals. On failure it
// returns the byte offset within u and the sentinel, with detail text.
func resolveUnit(u string) (resolved, failure) {
	if i, ok := spellings[u]; ok {
		d := &unitTable[i]
		return resolved{d.factor, d.offset, d.dim, d.ref}, failure{}
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
	return resolved{factor: f, dim: dm, ref: refNone}, failure{}
}

// exprParser is a recursive-descent parser for unit expressions:
//
//	expr    = product { "/" product }   (everything after "/" divides)
//	product = power { ("*" | "·" | "⋅" | "." | "-" | " ") power }
//	power   = primary [ "^" int | superscript | digits ]
//	primary = "(" expr ")" | "1" | name
//
// It allocates nothing unless it fails.
type exprParser struct {
	s      string
	i      int
	errPos int
	detail string
	word   string // an unknown name, when the parse failed on one
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
	case strings.HasPrefix(p.s[p.i:], "·"), strings.HasPrefix(p.s[p.i:], "⋅"):
		_, n := utf8.DecodeRuneInString(p.s[p.i:])
		p.i += n
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

var superscripts = map[rune]int{'⁰': 0, '¹': 1, '²': 2, '³': 3, '⁴': 4, '⁵': 5, '⁶': 6, '⁷': 7, '⁸': 8, '⁹': 9}

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
	if c := p.s[p.i]; c >= '0' && c <= '9' {
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
		r, size := utf8.DecodeRuneInString(p.s[p.i:])
		v, ok := superscripts[r]
		if !ok {
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

// name reads a registered unit name: a run of letters, °, µ, Δ and ℃-like
// signs. A following space and name are joined when the pair is registered
// (US gal, cu in, delta degC).
func (p *exprParser) name() (float64, Dimension, error) {
	start := p.i
	p.i += nameLen(p.s[p.i:])
	if p.i == start {
		return 0, Dimension{}, p.fail(ErrSyntax, "unexpected "+quoteRune(p.s, p.i))
	}
	word := p.s[start:p.i]
	if j := p.i; j < len(p.s) && p.s[j] == ' ' {
		if n := nameLen(p.s[j+1:]); n > 0 {
			if _, ok := spellings[p.s[start:j+1+n]]; ok {
				p.i = j + 1 + n
				word = p.s[start:p.i]
			}
		}
	}
	k, ok := spellings[word]
	if !ok {
		p.i = start
		p.word = word
		return 0, Dimension{}, p.fail(ErrUnknownUnit, unknownDetail(word, nil))
	}
	return unitTable[k].factor, unitTable[k].dim, nil
}

// nameLen returns the length of the unit name at the start of s.
func nameLen(s string) int {
	n := 0
	for n < len(s) {
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
	case r == '°', r == 'µ', r == 'μ', r == 'Δ', r == '℃', r == '℉', r == '₀', r == '"', r == 'Ω':
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

// unknownDetail names the nearest registered spellings to word; with a
// type, only spellings of that type's dimension.
func unknownDetail(word string, t *typeInfo) string {
	near := nearestSpellings(word, t, 3)
	if len(near) == 0 {
		return `no registered unit "` + word + `"`
	}
	return `no registered unit "` + word + `"; did you mean ` + strings.Join(near, ", ") + "?"
}

// maxSuggest is the longest unknown name for which suggestions are sought;
// it keeps the error path cheap on long or hostile input.
const maxSuggest = 24

// spelling is a registered spelling as runes, for suggestions.
type spelling struct {
	s     string
	runes []rune
	unit  int // index in unitTable
}

// spellingList holds every registered spelling in sorted order, built once.
var spellingList = sync.OnceValue(func() []spelling {
	out := make([]spelling, 0, len(spellings))
	for s, i := range spellings {
		out = append(out, spelling{s, []rune(s), i})
	}
	sort.Slice(out, func(i, j int) bool { return out[i].s < out[j].s })
	return out
})

// nearestSpellings returns up to n registered spellings closest to word by
// edit distance (case differences count half), best first.
func nearestSpellings(word string, t *typeInfo, n int) []string {
	type cand struct {
		s string
		d int
	}
	runes := utf8.RuneCountInString(word)
	if runes > maxSuggest {
		return nil
	}
	var cs []cand
	var d distance
	ra := []rune(word)
	limit := 2 + runes/3 // in half-edits
	for _, sp := range spellingList() {
		if t != nil && unitTable[sp.unit].dim != t.dim {
			continue
		}
		if diff := len(sp.runes) - runes; 2*diff > limit || -2*diff > limit {
			continue
		}
		if dist := d.between(ra, sp.runes, limit); dist <= limit {
			cs = append(cs, cand{sp.s, dist})
		}
	}
	sort.SliceStable(cs, func(i, j int) bool { return cs[i].d < cs[j].d })
	var out []string
	for i := 0; i < len(cs) && i < n; i++ {
		out = append(out, `"`+cs[i].s+`"`)
	}
	return out
}

// editDistance is the optimal-string-alignment distance between a and b in
// runes (Levenshtein plus adjacent transpositions), in units of half an
// edit: a change of letter case costs 1, any other edit 2.
func editDistance(a, b string) int {
	var d distance
	ra, rb := []rune(a), []rune(b)
	return d.between(ra, rb, 2*(len(ra)+len(rb))) // no edit costs more than that
}

// distance holds the buffers of editDistance, reused across calls.
type distance struct {
	pp, prev, cur []int
}

// between returns the distance from ra to rb, or a number above limit as
// soon as every alignment costs more than limit.
func (d *distance) between(ra, rb []rune, limit int) int {
	n := len(rb) + 1
	if cap(d.pp) < n {
		d.pp, d.prev, d.cur = make([]int, n), make([]int, n), make([]int, n)
	}
	pp, prev, cur := d.pp[:n], d.prev[:n], d.cur[:n]
	for j := range prev {
		prev[j] = 2 * j
	}
	bestPrev := 0
	for i := 1; i <= len(ra); i++ {
		cur[0] = 2 * i
		best := cur[0]
		for j := 1; j <= len(rb); j++ {
			cur[j] = min(prev[j]+2, cur[j-1]+2, prev[j-1]+subCost(ra[i-1], rb[j-1]))
			if i > 1 && j > 1 && sameFold(ra[i-1], rb[j-2]) && sameFold(ra[i-2], rb[j-1]) {
				cost := 2 + subCost(ra[i-1], rb[j-2]) + subCost(ra[i-2], rb[j-1])
				cur[j] = min(cur[j], pp[j-2]+cost)
			}
			best = min(best, cur[j])
		}
		if min(best, bestPrev) > limit { // later rows build on these two
			return limit + 1
		}
		bestPrev = best
		pp, prev, cur = prev, cur, pp
	}
	return prev[len(rb)]
}

func subCost(x, y rune) int {
	switch {
	case x == y:
		return 0
	case sameFold(x, y):
		return 1
	}
	return 2
}

func sameFold(x, y rune) bool {
	if x == y {
		return true
	}
	if x < utf8.RuneSelf && y < utf8.RuneSelf {
		lx := x | 0x20
		return lx == y|0x20 && 'a' <= lx && lx <= 'z'
	}
	return unicode.SimpleFold(x) == y || unicode.SimpleFold(y) == x
}
