package fluid

import (
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// Regression tests for defects found in the acceptance audit of the
// package; each case reproduces an input that failed before the fix.

// ViscosityIndex took any finite v40: 10³⁰⁰ mm²/s overflowed the D2270
// quadratics and the error named the result ("VI = +Inf … inputs too
// extreme") instead of the input and its range. v40 is now bounded by
// MaxViscosity, as everywhere else in the package.
func TestAuditViscosityIndexHugeV40(t *testing.T) {
	for _, u := range []units.KinematicViscosity{mm2s(1e300), units.KinematicViscosity(math.MaxFloat64), up(MaxViscosity)} {
		vi, err := ViscosityIndex(u, mm2s(3))
		wantRangeError(t, err, "v40")
		if vi != 0 {
			t.Errorf("VI = %g with an error, want 0", vi)
		}
	}
	// The bound itself is accepted, with a finite VI.
	if vi, err := ViscosityIndex(MaxViscosity, down(MaxViscosity)); err != nil || math.IsInf(vi, 0) || math.IsNaN(vi) {
		t.Errorf("VI at the bound = %v, %v", vi, err)
	}
}

// V100ForVI at v40 just above 2 mm²/s reported an inverted valid range
// ("from 6601.67 to 6601.43") and refused every VI: there the VI is not
// increasing in Y (it is in the thousands, far beyond real oils). The span
// is now reported low to high, and a VI inside it is solved.
func TestAuditV100ForVINearLowestY(t *testing.T) {
	u := mm2s(2.0002)
	lo, hi := viOf(2.0002, 2), viOf(2.0002, 2.0002*(1-1e-9))
	want := (lo + hi) / 2
	y, err := V100ForVI(u, want)
	if err != nil {
		t.Fatalf("V100ForVI(2.0002, %g): %v", want, err)
	}
	if got, _ := ViscosityIndex(u, y); math.Abs(got-want) > 1e-9*want {
		t.Errorf("VI(2.0002, %v) = %.12g, want %.12g", y, got, want)
	}
	_, err = V100ForVI(u, 100)
	wantRangeError(t, err, "vi")
	if !strings.Contains(err.Error(), "from 6601.4") {
		t.Errorf("span not low to high: %v", err)
	}
}
