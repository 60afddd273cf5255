package fluid

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func celsius(c float64) units.Temperature { return units.TemperatureFromCelsius(c) }

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
