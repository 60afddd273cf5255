package fluid

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func celsius(c float64) units.Temperature { return units.TemperatureFromCelsius(c) }

// near reports whether got is within rel (relative) of want.
func near(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Abs(want)
}

// wantRangeError checks that err is a range error for param, with the
// shared checks of internal/checktest (matches units.ErrRange, errors.As
// finds a *units.RangeError, a qualified function, the value and the valid
// range), and stops the test when there is none.
func wantRangeError(t *testing.T, err error, param string) {
	t.Helper()
	if checktest.RangeError(t, err, param) == nil {
		t.FailNow()
	}
}

func up(v units.KinematicViscosity) units.KinematicViscosity {
	return units.KinematicViscosity(math.Nextafter(float64(v), math.Inf(1)))
}

func down(v units.KinematicViscosity) units.KinematicViscosity {
	return units.KinematicViscosity(math.Nextafter(float64(v), math.Inf(-1)))
}
