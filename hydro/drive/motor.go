package drive

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// MotorNeed is what an electric motor is chosen for: a duty cycle, the
// motor's running speed and the torque reserve of its kind.
type MotorNeed struct {
	Duty  Duty                  // from Cycle
	Speed units.RotationalSpeed // the motor's running speed: its nameplate or MotorSpeeds' FullLoad (> 0)
	// Breakdown is the motor's breakdown (pull-out) torque as a multiple of
	// its rated torque, from the maker's data or the motor's design class
	// (> 1). Derate it for the supply: torque falls with the square of the
	// voltage, so a 10 % dip takes a fifth of it away.
	Breakdown float64
	// Ratings is the series to choose from; the zero Series selects
	// components.IECMotorRatings (use components.NEMAMotorRatings for hp).
	Ratings components.Series[units.Power]
}

// Motor is the electric motor chosen for a duty cycle.
type Motor struct {
	// Rating is the choice: Required is the larger of the RMS power
	// (thermal) and Peak/Breakdown (torque), Chosen the next rating.
	Rating      components.Choice[units.Power]
	RatedTorque units.Torque                   // Chosen / Speed
	PeakTorque  units.Torque                   // Duty.Peak / Speed
	Thermal     components.Check[units.Power]  // RMS power at most the rating
	Torque      components.Check[units.Torque] // peak torque at most Breakdown × RatedTorque
	Findings    components.Findings            // how peak and average sizing would differ, or no rating large enough
}

// SelectMotor returns the smallest motor rating that passes both of a
// duty cycle's demands: its RMS power, the usual basis of an induction
// motor's thermal rating (common practice), and its peak torque,
// T_peak = P_peak/n, which must stay within the breakdown torque
// Breakdown × P_rated/n. The result says what sizing on the peak power
// (oversized) or on the average (overheats) would have chosen instead. A
// duty beyond the largest rating is not an error: the choice comes back
// with Chosen 0, failed checks and a finding. need.Duty should come from
// Cycle; one built by hand needs finite powers ≥ 0, a Period > 0 and an
// RMS > 0. Speed must be finite and > 0, Breakdown finite and > 1; a
// torque that overflows is an error too. Errors match units.ErrRange and
// name the field.
func SelectMotor(need MotorNeed) (Motor, error) {
	const fn = "drive.SelectMotor"
	d := need.Duty
	if err := checkDuty(fn, d); err != nil {
		return Motor{}, err
	}
	if err := validate.Positive(fn, "Speed", need.Speed); err != nil {
		return Motor{}, err
	}
	if err := validate.Above(fn, "Breakdown", need.Breakdown, 1); err != nil {
		return Motor{}, err
	}
	ratings := need.Ratings
	if ratings.Len() == 0 {
		ratings = components.IECMotorRatings()
	}
	required := max(d.RMS, units.Power(float64(d.Peak)/need.Breakdown))
	c, err := ratings.Select(required)
	if err != nil {
		return Motor{}, validate.Renamed(err, fn, validate.Param("Duty"))
	}
	m := Motor{Rating: c}
	if m.RatedTorque, err = torque(fn, "RatedTorque", c.Chosen, need.Speed); err != nil {
		return Motor{}, err
	}
	if m.PeakTorque, err = torque(fn, "PeakTorque", d.Peak, need.Speed); err != nil {
		return Motor{}, err
	}
	limit, err := validate.Checked(fn, "Torque.Limit", units.Torque(need.Breakdown*float64(m.RatedTorque)))
	if err != nil {
		return Motor{}, err
	}
	m.Thermal = components.Within(d.RMS, c.Chosen, d.RMSRule)
	m.Torque = components.Within(m.PeakTorque, limit, components.CallerRule("Breakdown"))
	if !c.OK() {
		m.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "drive.beyond-ratings",
			ratings.Rule(), "no rating of %v reaches the %v this cycle needs: split the drive or take a larger motor series",
			ratings.Name(), required)}
		return m, nil
	}
	m.Findings = basis(d, ratings, c)
	return m, nil
}

// checkDuty checks a Duty, which a caller may have built by hand: its
// powers finite and ≥ 0, and a period and an RMS load above zero.
func checkDuty(fn string, d Duty) error {
	if err := validate.NonNegative(fn, "Duty.Peak", d.Peak); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "Duty.Average", d.Average); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "Duty.RMS", d.RMS); err != nil {
		return err
	}
	if d.Period <= 0 || d.RMS <= 0 {
		return &units.RangeError{Func: fn, Param: "Duty", Value: "a cycle with no load", Valid: "a Duty from Cycle that draws power"}
	}
	return nil
}

// basis says what sizing on the peak or on the average would have chosen,
// naming only a basis that chooses differently from c.
func basis(d Duty, ratings components.Series[units.Power], c components.Choice[units.Power]) components.Findings {
	peak, _ := ratings.Select(d.Peak)
	avg, _ := ratings.Select(max(d.Average, ratings.Smallest()))
	onPeak, onAvg := peak.Chosen != c.Chosen, avg.Chosen != c.Chosen
	note := func(format string, args ...any) components.Findings {
		return components.Findings{components.NewFinding(components.Notice, components.NoHazard, "drive.sizing-basis", d.RMSRule, format, args...)}
	}
	switch {
	case onPeak && !peak.OK():
		return note("this cycle peaks at %v and heats the motor like a steady %v: no rating of %v reaches the peak, but %v carries both the heating and the peak torque",
			d.Peak, d.RMS, ratings.Name(), c.Chosen)
	case onPeak && onAvg:
		return note("this cycle peaks at %v, averages %v and heats the motor like a steady %v: sized on the peak it would take %v (oversized), on the average %v (it would overheat); %v carries both the heating and the peak torque",
			d.Peak, d.Average, d.RMS, peak.Chosen, avg.Chosen, c.Chosen)
	case onPeak:
		return note("this cycle peaks at %v and heats the motor like a steady %v: sized on the peak it would take %v (oversized); %v carries both the heating and the peak torque",
			d.Peak, d.RMS, peak.Chosen, c.Chosen)
	case onAvg:
		return note("this cycle averages %v but heats the motor like a steady %v: sized on the average it would take %v (it would overheat); %v carries both the heating and the peak torque",
			d.Average, d.RMS, avg.Chosen, c.Chosen)
	}
	return nil
}

// torque returns P/(2π·n) (units.Power.PerSpeed), or an error naming the
// result name of fn when the quotient overflows.
func torque(fn, name string, p units.Power, n units.RotationalSpeed) (units.Torque, error) {
	t, err := p.PerSpeed(n)
	return t, validate.Renamed(err, fn, validate.Param(name))
}
