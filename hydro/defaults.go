package hydro

import (
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

// Defaults of the design factors a [Spec] leaves out. Each is reported with
// its rule beside the result it shaped.
const (
	// DefaultPressure is the working pressure the actuators are sized at
	// when Design.Pressure and Design.PressureRange are not given: 160 bar,
	// the rating of the ISO 6020-2 16 MPa compact cylinder series, the
	// commonest industrial rating (our choice).
	DefaultPressure = 160 * units.Bar

	// DefaultReliefMargin is how far above the highest working pressure the
	// relief valve is set when Design.ReliefMargin is not given: the valve
	// family's default, 10 % (common practice), so the valve stays shut in
	// normal work.
	DefaultReliefMargin = valve.DefaultReliefMargin
)
