package drive

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// TypicalSlip is the full-load slip [MotorSpeeds] takes when the caller
// gives none: 3 %, within the 2–5 % of an induction motor at full load
// (common practice; small motors slip more, large ones less). A motor's
// nameplate speed is better than any typical value.
const TypicalSlip = 0.03

// Speeds are an induction motor's synchronous and full-load speeds.
type Speeds struct {
	Synchronous units.RotationalSpeed // n_s = 120·f/p rev/min (components.SynchronousSpeed)
	FullLoad    units.RotationalSpeed // n_s·(1 − Slip)
	Slip        float64               // full-load slip, the fraction below synchronous speed
	SlipRule    components.Rule       // where Slip comes from
}

// MotorSpeeds returns the synchronous speed of a motor with the given
// number of poles on mains of frequency mains, n_s = 120·f/p rev/min
// (components.SynchronousSpeed), and its full-load speed n_s·(1 − s). A nil
// slip takes TypicalSlip (common practice); pass the nameplate's own,
// s = 1 − n_nameplate/n_s, where known. poles must be an even number ≥ 2,
// mains finite and > 0, slip from 0 up to (not including) 1; errors match
// units.ErrRange. MotorSpeeds allocates nothing.
func MotorSpeeds(poles int, mains units.Frequency, slip *float64) (Speeds, error) {
	const fn = "drive.MotorSpeeds"
	ns, err := components.SynchronousSpeed(poles, mains)
	if err != nil {
		return Speeds{}, validate.Renamed(err, fn, nil)
	}
	s := Speeds{Synchronous: ns, Slip: TypicalSlip,
		SlipRule: components.PracticeRule("induction motor full-load slip 2–5 %, 3 % taken")}
	if slip != nil {
		if !(*slip >= 0 && *slip < 1) {
			return Speeds{}, validate.Fail(fn, "slip", *slip, "from 0 up to (not including) 1")
		}
		s.Slip, s.SlipRule = *slip, components.CallerRule("slip")
	}
	s.FullLoad = units.RotationalSpeed(float64(ns) * (1 - s.Slip))
	return s, nil
}
