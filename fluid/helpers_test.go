package fluid

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

func celsius(c float64) units.Temperature { return units.TemperatureFromCelsius(c) }

// near reports whether got is within rel (relative) of want.
func near(got, want, rel float64) bool {
	return math.Abs(got-want) <= rel*math.Abs(want)
}

// wantRangeError checks that err matches units.ErrRange and names param.
func wantRangeError(t *testing.T, err error, param string) {
	t.Helper()
	if !errors.Is(err, units.ErrRange) {
		t.Fatalf("err = %v, want units.ErrRange", err)
	}
	var re *units.RangeError
	if !errors.As(err, &re) || re.Param != param {
		t.Fatalf("err = %v, want a *units.RangeError for %q", err, param)
	}
	if !strings.Contains(err.Error(), param) || re.Valid == "" {
		t.Fatalf("err = %q does not name %q and its valid range", err, param)
	}
}

func up(v units.KinematicViscosity) units.KinematicViscosity {
	return units.KinematicViscosity(math.Nextafter(float64(v), math.Inf(1)))
}

func down(v units.KinematicViscosity) units.KinematicViscosity {
	return units.KinematicViscosity(math.Nextafter(float64(v), math.Inf(-1)))
}
