package units

import (
	"testing"
	"unicode/utf8"
)

// TestSuperscriptDigits: the byte reader of superscript digits agrees with
// their code points (U+2070, U+00B9, U+00B2, U+00B3, U+2074–U+2079), and
// reads nothing else.
func TestSuperscriptDigits(t *testing.T) {
	for v, r := range []rune{'⁰', '¹', '²', '³', '⁴', '⁵', '⁶', '⁷', '⁸', '⁹'} {
		s := string(r) + "x"
		if got, n := superscript(s); got != v || n != utf8.RuneLen(r) {
			t.Errorf("superscript(%q) = %d, %d; want %d, %d", s, got, n, v, utf8.RuneLen(r))
		}
	}
	for _, s := range []string{"", "2", "\xc2", "\xe2\x81", "⁺", "⁻", "ⁱ", "·", "°", "µ", "\u2071", "\u2072", "\u2073", "\u207a"} {
		if got, n := superscript(s); got != -1 || n != 0 {
			t.Errorf("superscript(%q) = %d, %d; want -1, 0", s, got, n)
		}
	}
}
