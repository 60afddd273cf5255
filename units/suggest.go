package units

// Spelling suggestions for an unknown unit: the registered spellings nearest
// by edit distance, of the wanted dimension when a typed parser asks.

import (
	"sort"
	"strings"
	"sync"
	"unicode"
	"unicode/utf8"
)

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
