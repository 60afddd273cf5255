package checktest

import (
	"math"
	"strconv"
	"testing"
)

// Close reports whether got is within rel (relative) of want:
// |got − want| ≤ rel·|want|. A NaN got or want is never close.
func Close[T ~float64](got, want T, rel float64) bool {
	return math.Abs(float64(got-want)) <= rel*math.Abs(float64(want))
}

// Near reports an error through t unless got is within rel (relative) of
// want, naming what was compared and the tolerance.
func Near[T ~float64](t testing.TB, what string, got, want T, rel float64) {
	t.Helper()
	if !Close(got, want, rel) {
		t.Errorf("%s = %s; want %s (±%g relative)", what, g12(float64(got)), g12(float64(want)), rel)
	}
}

func g12(v float64) string { return strconv.FormatFloat(v, 'g', 12, 64) }
