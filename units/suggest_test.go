package units

import (
	"errors"
	"strconv"
	"strings"
	"testing"
)

// A typed parser suggests spellings of its own dimension: "cts" is one
// edit from both "cps" (centipoise) and "cSt"; only cSt fits viscosity.
func TestSuggestionsFollowTheType(t *testing.T) {
	_, err := ParseKinematicViscosity("46 cts")
	var pe *ParseError
	if !errors.As(err, &pe) || !errors.Is(err, ErrUnknownUnit) {
		t.Fatalf("err = %v, want a *ParseError matching ErrUnknownUnit", err)
	}
	if !strings.Contains(pe.Detail, `"cSt"`) || strings.Contains(pe.Detail, `"cps"`) {
		t.Errorf("detail = %q, want cSt suggested and not cps", pe.Detail)
	}
}

// Long unknown names get no suggestions, so the error path stays cheap on
// hostile input (an edit distance against every spelling would cost seconds
// on 100 kB).
func TestNoSuggestionsForLongNames(t *testing.T) {
	long := "1 " + strings.Repeat("x", 100_000)
	_, err := ParsePressure(long)
	var pe *ParseError
	if !errors.As(err, &pe) || !errors.Is(err, ErrUnknownUnit) {
		t.Fatalf("err = %v, want ErrUnknownUnit", err)
	}
	if strings.Contains(pe.Detail, "did you mean") {
		t.Errorf("suggestions offered for a 100 kB name")
	}
	if _, err := Parse(long); !errors.Is(err, ErrUnknownUnit) {
		t.Errorf("Parse: err = %v, want ErrUnknownUnit", err)
	}
}

func BenchmarkUnknownUnitLong(b *testing.B) {
	s := "1 " + strings.Repeat("x", 1000)
	b.ReportAllocs()
	for b.Loop() {
		_, _ = ParsePressure(s)
	}
}

func TestEditDistance(t *testing.T) {
	for _, c := range []struct {
		a, b string
		want int // half-edits
	}{
		{"bar", "bar", 0},
		{"bar", "Bar", 1},  // case only
		{"bra", "bara", 2}, // one insertion
		{"psx", "psi", 2},  // one substitution
		{"cts", "cst", 2},  // one transposition
		{"cts", "cSt", 3},  // transposition with a case change
		{"", "kPa", 6},     // three insertions
		{"mpa", "MPa", 2},  // two case changes
		{"lbfft", "lbf·ft", 2},
	} {
		if got := editDistance(c.a, c.b); got != c.want {
			t.Errorf("editDistance(%q, %q) = %d, want %d", c.a, c.b, got, c.want)
		}
	}
}

// BenchmarkParseUnknownUnit measures the error path for an unknown unit,
// whose message suggests the nearest spellings. Its cost grows with the
// length of the unknown word times the size of the registry (see the
// report on nearestSpellings): untrusted text should be bounded in length.
func BenchmarkParseUnknownUnit(b *testing.B) {
	for _, n := range []int{8, 1000} {
		s := "55 " + strings.Repeat("x", n)
		b.Run(strconv.Itoa(n)+"_letters", func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkPressure, sinkErr = ParsePressure(s)
			}
		})
	}
}
