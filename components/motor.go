package components

import (
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

const (
	kW = units.Kilowatt
	hp = units.Horsepower
)

var (
	iecMotorRatings = fixed("IEC 60072-1 motor ratings", StandardRule("IEC 60072-1:1991, rated output series"),
		[]units.Power{0.06 * kW, 0.09 * kW, 0.12 * kW, 0.18 * kW, 0.25 * kW, 0.37 * kW, 0.55 * kW, 0.75 * kW,
			1.1 * kW, 1.5 * kW, 2.2 * kW, 3 * kW, 4 * kW, 5.5 * kW, 7.5 * kW, 11 * kW, 15 * kW, 18.5 * kW,
			22 * kW, 30 * kW, 37 * kW, 45 * kW, 55 * kW, 75 * kW, 90 * kW, 110 * kW, 132 * kW, 160 * kW,
			200 * kW, 250 * kW, 315 * kW},
		nil)

	nemaMotorRatings = fixed("NEMA MG 1 motor ratings", StandardRule("NEMA MG 1, horsepower ratings"),
		[]units.Power{0.5 * hp, 0.75 * hp, 1 * hp, 1.5 * hp, 2 * hp, 3 * hp, 5 * hp, 7.5 * hp, 10 * hp,
			15 * hp, 20 * hp, 25 * hp, 30 * hp, 40 * hp, 50 * hp, 60 * hp, 75 * hp, 100 * hp, 125 * hp,
			150 * hp, 200 * hp, 250 * hp, 300 * hp, 350 * hp, 400 * hp, 450 * hp, 500 * hp},
		nil)
)

// IECMotorRatings returns the rated outputs of the IEC 60072-1 output
// series for induction motors, 0.06 kW to 315 kW: 0.06 0.09 0.12 0.18
// 0.25 0.37 0.55 0.75 1.1 1.5 2.2 3 4 5.5 7.5 11 15 18.5 22 30 37 45 55 75 90
// 110 132 160 200 250 315 kW. The values to 55 kW were confirmed in a
// published list; 75 kW and up are recalled (from memory). The Rule names
// the standard without a clause number, which was not confirmed.
func IECMotorRatings() Series[units.Power] { return iecMotorRatings }

// NEMAMotorRatings returns the horsepower ratings of NEMA MG 1 for
// integral-horsepower motors, ½ hp to 500 hp: ½ ¾ 1 1½ 2 3 5 7½ 10 15 20 25
// 30 40 50 60 75 100 125 150 200 250 300 350 400 450 500 hp (1 hp =
// 550 ft·lbf/s, [units.Horsepower]). The values to 150 hp were confirmed in a
// published list; 200 hp and up are recalled (from memory).
func NEMAMotorRatings() Series[units.Power] { return nemaMotorRatings }

// SynchronousSpeed returns the synchronous speed of an AC machine with the
// given number of poles on a supply of frequency mains:
//
//	n = 120·f/p rev/min = f/(p/2) rev/s
//
// (f in Hz, p poles; a machine with p poles has p/2 pole pairs). At 50 Hz a
// 4-pole motor turns at 1500 rev/min synchronous, at 60 Hz 1800 rev/min; an
// induction motor runs a few per cent below it by its slip. It fails with an
// error matching units.ErrRange when poles is not an even number ≥ 2,
// mains is not finite and > 0, or the speed underflows to 0.
func SynchronousSpeed(poles int, mains units.Frequency) (units.RotationalSpeed, error) {
	const fn = "components.SynchronousSpeed"
	if poles < 2 || poles%2 != 0 {
		return 0, &units.RangeError{Func: fn, Param: "poles", Value: strconv.Itoa(poles), Valid: "an even number ≥ 2"}
	}
	if err := validate.Positive(fn, "mains", mains); err != nil {
		return 0, err
	}
	n := units.RotationalSpeed(float64(mains) / float64(poles/2))
	if err := validate.PositiveResult(fn, "n", n); err != nil {
		return 0, err // a mains frequency so small that the speed underflows to 0
	}
	return n, nil
}
