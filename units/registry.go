package units

// The unit registry: every registered unit (unitTable, generated from gen.go
// into tables_gen.go), the references a pressure or temperature spelling can
// carry, the descriptions of the quantity types, and the map from every
// accepted spelling to its unit.

import (
	"sort"
	"strings"
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
	refDiff                           // a difference of two pressures: psid, bard
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
	examples  string            // unit spellings for messages
	context   []contextSpelling // spellings only this type's parser reads
}

// contextSpelling is a spelling with a meaning for one type's parser only
// (written in the table of gen.go): the unit of that type it reads as, or,
// with unit −1, an error that says what to write instead.
type contextSpelling struct {
	spelling string
	unit     int                              // index in unitTable, or −1
	read     func(float64) (float64, failure) // or: reads the number to SI (SUS)
	err      error                            // or: the sentinel of a refusal
	detail   string
}

// contextOf returns the context spelling of t that spelling matches,
// letter case ignored, or nil.
func (t *typeInfo) contextOf(spelling string) *contextSpelling {
	for i := range t.context {
		if c := &t.context[i]; len(c.spelling) == len(spelling) && strings.EqualFold(c.spelling, spelling) {
			return c
		}
	}
	return nil
}

// isVacuum reports whether u is a vacuum gauge reading ("inHg vac"): a
// depth below ambient, whose negative factor gives a negative gauge pressure.
func (u *unitDef) isVacuum() bool { return u.factor < 0 }

// valid describes the values of t a RangeError wants: "a finite pressure",
// "a finite temperature ≥ 0 K (absolute zero)".
func (t *typeInfo) valid() string {
	if t.hasMin {
		return "a finite " + t.kind + " " + t.minText
	}
	return "a finite " + t.kind
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

// Letter case. A spelling that matches no registered spelling exactly is
// looked up again with letters folded to lower case (see the package
// documentation, under Parsing). folds maps each folded registered spelling
// to the unit it reads as, or, when that could be more than one unit, to
// the spellings it could be. Among those are the prefix twins of the
// prefixed spellings: the m of milli and the M of mega differ only in case,
// so "MPa" folds together with "mPa" (which is not registered) and "Mpa" is
// ambiguous rather than a silent factor of 10⁹. Built once at start-up and
// never changed.
var folds = buildFolds()

// foldEntry is what a folded spelling reads as.
type foldEntry struct {
	unit  int      // index in unitTable, or −1 when ambiguous
	could []string // when ambiguous: the spellings it could be, sorted
	twins []string // those of them that are m/M prefix twins, not registered
}

// maxFold is the longest spelling, in bytes, that is looked up by case.
const maxFold = 64

func buildFolds() map[string]foldEntry {
	// A candidate is a spelling that folds to the key: a registered spelling
	// of unit, or (twin) the prefix twin of one.
	type cand struct {
		s    string
		unit int
		twin bool
	}
	all := map[string][]cand{}
	for s, i := range spellings {
		var buf [maxFold]byte
		k := string(appendFold(buf[:0], s))
		all[k] = append(all[k], cand{s, i, false})
		if twin, ok := prefixTwin(s, i); ok {
			k := string(appendFold(buf[:0], twin))
			all[k] = append(all[k], cand{twin, i, true})
		}
	}
	m := make(map[string]foldEntry, len(all))
	for k, cs := range all {
		// One spelling per reading: the unit's symbol where it folds to k
		// (or its twin), else the first in order.
		sort.Slice(cs, func(a, b int) bool { return cs[a].s < cs[b].s })
		pick := map[cand]string{}
		for _, c := range cs {
			key := cand{unit: c.unit, twin: c.twin}
			sym := unitTable[c.unit].sym
			if c.twin {
				sym, _ = prefixTwin(sym, c.unit)
			}
			if _, seen := pick[key]; !seen || c.s == sym {
				pick[key] = c.s
			}
		}
		if len(pick) == 1 && !cs[0].twin {
			m[k] = foldEntry{unit: cs[0].unit}
			continue
		}
		e := foldEntry{unit: -1}
		for key, s := range pick {
			e.could = append(e.could, s)
			if key.twin {
				e.twins = append(e.twins, s)
			}
		}
		sort.Strings(e.could)
		m[k] = e
	}
	return m
}

// prefixTwin returns the spelling s with its milli or mega prefix in the
// other case ("MPa" for "mPa", "Mm" for "mm"), when s is a prefixed spelling
// of unit i (the rest, "Pa" or "m", is a registered spelling of the same
// dimension) and the twin is not itself registered.
func prefixTwin(s string, i int) (string, bool) {
	if len(s) < 2 || (s[0] != 'm' && s[0] != 'M') {
		return "", false
	}
	j, ok := spellings[s[1:]]
	if !ok || unitTable[j].dim != unitTable[i].dim {
		return "", false
	}
	twin := string(s[0]^0x20) + s[1:]
	if _, taken := spellings[twin]; taken {
		return "", false
	}
	return twin, true
}

// appendFold appends s to b with every letter in lower case.
func appendFold(b []byte, s string) []byte {
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			if 'A' <= c && c <= 'Z' {
				c += 'a' - 'A'
			}
			b = append(b, c)
			i++
			continue
		}
		r, n := utf8.DecodeRuneInString(s[i:])
		switch {
		case r < 0xC0: // Latin-1 signs (° · ² ³ µ º): no case
			b = append(b, s[i:i+n]...)
		default:
			b = utf8.AppendRune(b, unicode.ToLower(r))
		}
		i += n
	}
	return b
}

// lookupFold looks s up by letter case. It returns the unit, or −1 with the
// entry when s could be more than one unit, or ok false when nothing folds
// to s. It allocates nothing.
func lookupFold(s string) (unit int, e *foldEntry, ok bool) {
	if len(s) > maxFold/2 || !foldFilter.mayFold(s) { // folding grows UTF-8 by at most half: the buffer holds it
		return 0, nil, false
	}
	var buf [maxFold]byte
	key, h := foldedHash(buf[:0], s)
	k, ok := foldIndex.getHashed(key, h)
	if !ok {
		return 0, nil, false
	}
	e = &foldEntries[k]
	for _, t := range e.twins {
		if s == t { // "mPa" is no unit: unknown, not ambiguous
			return 0, nil, false
		}
	}
	return e.unit, e, ok
}

// lookupName returns the unit of spelling s: exactly, else by letter case.
// A spelling that folds to more than one unit gives −1 and its entry.
func lookupName(s string) (int, *foldEntry, bool) {
	if i, ok := fastSpellings.get(s); ok {
		return i, nil, true
	}
	return lookupFold(s)
}

// foldedHash appends s folded to lower case to b, as appendFold does, and
// returns the FNV-1a hash of the result, in one pass.
func foldedHash(b []byte, s string) ([]byte, uint32) {
	h := uint32(2166136261)
	for i := 0; i < len(s); {
		c := s[i]
		if c < utf8.RuneSelf {
			if 'A' <= c && c <= 'Z' {
				c += 'a' - 'A'
			}
			b = append(b, c)
			h = (h ^ uint32(c)) * 16777619
			i++
			continue
		}
		start := len(b)
		r, n := utf8.DecodeRuneInString(s[i:])
		if r < 0xC0 {
			b = append(b, s[i:i+n]...)
		} else {
			b = utf8.AppendRune(b, unicode.ToLower(r))
		}
		for _, c := range b[start:] {
			h = (h ^ uint32(c)) * 16777619
		}
		i += n
	}
	return b, h
}

// ambiguousDetail says what s could be, for an ErrAmbiguous error.
func ambiguousDetail(s string, e *foldEntry) string {
	d := `"` + s + `" matches no spelling exactly; ignoring letter case it could be "` + strings.Join(e.could, `" or "`) + `"`
	if len(e.twins) > 0 {
		d += " (m is milli, 10⁻³; M is mega, 10⁶)"
	}
	return d + ": write the one you mean"
}

// contextHint says, for a spelling the registry does not know, which typed
// parser reads it or what to write instead ("; ParseKinematicViscosity reads
// it as a kinematic viscosity"), or "" when no type knows it either.
func contextHint(spelling string) string {
	for _, t := range allTypes {
		if c := t.contextOf(spelling); c != nil {
			if c.err != nil {
				return "; " + c.detail
			}
			return "; Parse" + t.name + " reads it as a " + t.kind
		}
	}
	return ""
}

// spellTable is a read-only hash table from strings to small integers, for
// the look-ups on the parsing hot paths: a unit name costs one short hash
// (FNV-1a over its bytes) and one string compare, where a Go map hashes
// with the general-purpose runtime hash. Built once at start-up.
type spellTable struct {
	keys []string
	vals []int32
	mask uint32
}

// newSpellTable builds a table of m with at most a quarter of its slots
// used, so that a probe sequence is short.
func newSpellTable(m map[string]int) spellTable {
	n := uint32(8)
	for int(n) < 4*len(m) {
		n *= 2
	}
	t := spellTable{keys: make([]string, n), vals: make([]int32, n), mask: n - 1}
	for k, v := range m {
		h := fnv(k) & t.mask
		for t.vals[h] != 0 {
			h = (h + 1) & t.mask
		}
		t.keys[h], t.vals[h] = k, int32(v)+1
	}
	return t
}

// get returns the value of key s.
func (t *spellTable) get(s string) (int, bool) {
	for h := fnv(s) & t.mask; ; h = (h + 1) & t.mask {
		switch v := t.vals[h]; {
		case v == 0:
			return 0, false
		case t.keys[h] == s:
			return int(v) - 1, true
		}
	}
}

// getHashed returns the value of the key held in b, whose hash is h.
func (t *spellTable) getHashed(b []byte, h uint32) (int, bool) {
	for h &= t.mask; ; h = (h + 1) & t.mask {
		switch v := t.vals[h]; {
		case v == 0:
			return 0, false
		case t.keys[h] == string(b):
			return int(v) - 1, true
		}
	}
}

// fnv is the 32-bit FNV-1a hash of s.
func fnv(s string) uint32 {
	h := uint32(2166136261)
	for i := 0; i < len(s); i++ {
		h = (h ^ uint32(s[i])) * 16777619
	}
	return h
}

// fastSpellings is spellings as a spellTable; foldIndex maps each folded
// spelling to its entry in foldEntries. Both are built once at start-up.
var (
	fastSpellings          = newSpellTable(spellings)
	foldIndex, foldEntries = buildFoldIndex()
	foldFilter             = buildFoldFilter()
)

// foldSieve is a filter over the folded spellings by length, first byte
// and last byte: most unit expressions ("kW·h/(m²·K)") are no spelling in
// any case, and the filter says so without folding them.
type foldSieve struct {
	lenFirst [64]uint64 // bit first&63 of word len&63
	last     [4]uint64  // bit of the last byte
}

func buildFoldFilter() foldSieve {
	var f foldSieve
	for k := range folds {
		f.lenFirst[len(k)&63] |= 1 << (k[0] & 63)
		f.last[k[len(k)-1]>>6] |= 1 << (k[len(k)-1] & 63)
	}
	return f
}

// mayFold reports whether s could fold to a registered spelling. It is
// exact for the bytes it looks at: ASCII letters fold to lower case, and a
// string with a letter beyond Latin-1 signs (which may change length or its
// last byte when folded) is always looked up.
func (f *foldSieve) mayFold(s string) bool {
	if len(s) == 0 {
		return false
	}
	for i := 0; i < len(s); i++ {
		if c := s[i]; c >= 0xC3 { // a rune at or above U+00C0 (letters that fold)
			return true
		}
	}
	first, last := lowerASCII(s[0]), lowerASCII(s[len(s)-1])
	return f.lenFirst[len(s)&63]&(1<<(first&63)) != 0 && f.last[last>>6]&(1<<(last&63)) != 0
}

func lowerASCII(c byte) byte {
	if 'A' <= c && c <= 'Z' {
		return c + 'a' - 'A'
	}
	return c
}

func buildFoldIndex() (spellTable, []foldEntry) {
	idx := make(map[string]int, len(folds))
	entries := make([]foldEntry, 0, len(folds))
	for k, e := range folds {
		idx[k] = len(entries)
		entries = append(entries, e)
	}
	return newSpellTable(idx), entries
}
