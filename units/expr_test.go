package units

import (
	"math"
	"math/rand/v2"
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

// TestIntPow: the small integer powers of unit factors are bit for bit
// math.Pow's, over factors from 1e-59 to 1e59 and both signs.
func TestIntPow(t *testing.T) {
	r := rand.New(rand.NewPCG(3, 4))
	for range 20000 {
		f := math.Pow(10, -59+118*r.Float64())
		if r.IntN(2) == 0 {
			f = -f
		}
		for n := -4; n <= 4; n++ {
			if got, want := intPow(f, n), math.Pow(f, float64(n)); math.Float64bits(got) != math.Float64bits(want) {
				t.Fatalf("intPow(%.17g, %d) = %.17g, math.Pow %.17g", f, n, got, want)
			}
		}
	}
	for _, f := range []float64{0.0254, 0.3048, 1e-3, 1e3, 3600, 1.0 / 60} {
		for n := -3; n <= 3; n++ {
			if got, want := intPow(f, n), math.Pow(f, float64(n)); got != want {
				t.Errorf("intPow(%g, %d) = %.17g, math.Pow %.17g", f, n, got, want)
			}
		}
	}
}

// TestPackedDimensions: the parser's packed dimensions round-trip every
// registered unit's dimension and test the exponent range at its edges.
func TestPackedDimensions(t *testing.T) {
	for i := range unitTable {
		if d := unitTable[i].dim; packDim(d).unpack() != d || unitDims[i] != packDim(d) {
			t.Errorf("%q: dimension %v does not round-trip packed", unitTable[i].sym, d)
		}
	}
	for k := 0; k <= maxExp; k++ {
		for base := range numBases {
			for _, e := range []int{-maxExp, -k - 1, -k, 0, k, k + 1, maxExp} {
				var d Dimension
				d.e[base] = int8(e)
				want := e >= -k && e <= k
				if got := packDim(d).within(k); got != want {
					t.Errorf("within(%d) of exponent %d at base %d = %v, want %v", k, e, base, got, want)
				}
			}
		}
	}
}
