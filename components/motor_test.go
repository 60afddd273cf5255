package components

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func TestSynchronousSpeed(t *testing.T) {
	// n = 120 f / p (the synchronous speed of an AC machine); the values are
	// the synchronous speeds by pole count as motor tables commonly print
	// them for 50 Hz and 60 Hz mains (common practice).
	for _, c := range []struct {
		poles   int
		hz, rpm float64
	}{
		{2, 50, 3000}, {4, 50, 1500}, {6, 50, 1000}, {8, 50, 750}, {10, 50, 600}, {12, 50, 500},
		{2, 60, 3600}, {4, 60, 1800}, {6, 60, 1200}, {8, 60, 900}, {10, 60, 720}, {12, 60, 600},
	} {
		got, err := SynchronousSpeed(c.poles, units.Frequency(c.hz)*units.Hertz)
		// One division and one unit scaling: 2 ulp.
		if err != nil || !checktest.Close(got.RPM(), c.rpm, 4.5e-16) {
			t.Errorf("SynchronousSpeed(%d, %v Hz) = %v rev/min, %v; want %v", c.poles, c.hz, got.RPM(), err, c.rpm)
		}
	}
}

func TestSynchronousSpeedBadInput(t *testing.T) {
	for _, c := range []struct {
		poles int
		mains units.Frequency
		param string
	}{
		{0, 50, "poles"}, {3, 50, "poles"}, {-4, 50, "poles"},
		{4, 0, "mains"}, {4, -50, "mains"}, {4, units.Frequency(math.NaN()), "mains"},
		{4, units.Frequency(math.Inf(1)), "mains"},
		{4, 5e-324, "n"}, // the speed underflows to 0: an error naming the result, not a 0 rev/s
	} {
		got, err := SynchronousSpeed(c.poles, c.mains)
		if got != 0 {
			t.Errorf("SynchronousSpeed(%d, %v) = %v beside %v; want 0", c.poles, c.mains, got, err)
		}
		checktest.RangeErrorIn(t, err, "components.SynchronousSpeed", c.param)
	}
	// The largest finite mains frequency gives a finite speed.
	if got, err := SynchronousSpeed(2, math.MaxFloat64); err != nil || math.IsInf(float64(got), 0) {
		t.Errorf("SynchronousSpeed(2, max) = %v, %v", got, err)
	}
}
