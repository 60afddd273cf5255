package checktest

import (
	"math"
	"testing"
)

func TestClose(t *testing.T) {
	for _, c := range []struct {
		got, want, rel float64
		ok             bool
	}{
		{1.0000001, 1, 1e-6, true},
		{1.000002, 1, 1e-6, false},
		{-2.000001, -2, 1e-6, true},
		{0, 0, 0, true},
		{math.NaN(), 1, 1, false},
		{1, math.NaN(), 1, false},
		{math.Inf(1), 1, 1e300, false},
	} {
		if got := Close(c.got, c.want, c.rel); got != c.ok {
			t.Errorf("Close(%v, %v, %v) = %v", c.got, c.want, c.rel, got)
		}
	}
	r := &recorder{}
	Near(r, "x", 1.1, 1.0, 0.01)
	if len(r.failed) != 1 {
		t.Errorf("Near reported %d failures for 1.1 against 1 ±1 %%; want 1", len(r.failed))
	}
}

// 1 psi is 6894.757293168361 Pa (NIST SP 811: lbf/in² from the exact
// inch, pound and standard gravity).
func TestGNUUnitsValue(t *testing.T) {
	path := GNUUnits(t)
	if got := GNUUnitsValue(t, path, "1 psi", "Pa"); !Close(got, 6894.757293168361, 1e-15) {
		t.Errorf("GNU units 1 psi = %v Pa", got)
	}
	if got := GNUUnitsValue(t, path, "-40", "1"); got != -40 {
		t.Errorf("GNU units -40 = %v; a negative value must reach it after --", got)
	}
}
