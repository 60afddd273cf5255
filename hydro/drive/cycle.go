package drive

import (
	"math"
	"strconv"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Use says where a phase's shaft power ends up, for the cycle's heat.
type Use uint8

// Uses.
const (
	Working   Use = iota // the hydraulic power goes into the load; the pump's own loss, (1 − η_o)·P, is heat
	Relieving            // the flow passes a relief or a throttle: the whole shaft power becomes heat
	Standby              // a compensated or load-sensing pump deadheaded: the whole shaft power becomes heat
)

var useNames = [...]string{"working", "relieving", "standby"}

// String returns "working", "relieving" or "standby".
func (u Use) String() string {
	if int(u) < len(useNames) {
		return useNames[u]
	}
	return "Use(" + strconv.Itoa(int(u)) + ")"
}

// Phase is one step of a machine's duty cycle as the drive sees it: how
// long it lasts and what it asks of the pump shaft, given either as the
// pump's pressure and flow with its overall efficiency, or as a shaft power.
type Phase struct {
	Name     string
	Duration time.Duration // > 0
	// Pressure and Flow are the pump's outlet pressure and delivered flow;
	// with Efficiency (the pump's overall efficiency, in (0, 1]) they give
	// the shaft power P = p·Q/η_o ([ShaftPower]).
	Pressure units.Pressure
	Flow     units.Flow
	// Power is the shaft power, given instead of Pressure and Flow (a
	// standby power from pump.Pump.Standby, a measured value). Zero is an
	// idle phase.
	Power units.Power
	// Efficiency is the pump's overall efficiency: required with Pressure
	// and Flow, and for a Working phase given by Power (its heat is
	// (1 − η_o)·P); unused otherwise.
	Efficiency float64
	Use        Use
}

// shaft returns the phase's shaft power and heat after checking it.
// Errors name the Phase field alone; Cycle puts the phase index before it.
func (ph Phase) shaft(fn string) (power, heat units.Power, err error) {
	if err := validate.PositiveDuration(fn, "Duration", ph.Duration); err != nil {
		return 0, 0, err
	}
	if int(ph.Use) >= len(useNames) {
		return 0, 0, &units.RangeError{Func: fn, Param: "Use", Value: ph.Use.String(), Valid: "Working, Relieving or Standby"}
	}
	if err := validate.NonNegative(fn, "Power", ph.Power); err != nil {
		return 0, 0, err
	}
	byFlow := ph.Pressure != 0 || ph.Flow != 0
	if byFlow && ph.Power != 0 {
		return 0, 0, validate.Fail(fn, "Power", ph.Power, "0 when Pressure and Flow are given (one or the other)")
	}
	power = ph.Power
	if byFlow {
		if power, err = ShaftPower(ph.Pressure, ph.Flow, ph.Efficiency); err != nil {
			return 0, 0, fields(validate.Renamed(err, fn, nil))
		}
	}
	if ph.Use != Working {
		return power, power, nil
	}
	if power != 0 || ph.Efficiency != 0 {
		if err := efficiency(fn, "Efficiency", ph.Efficiency); err != nil {
			return 0, 0, err
		}
	}
	return power, units.Power(float64(power) * (1 - ph.Efficiency)), nil
}

// Duty is what a duty cycle asks of its drive: the peak, the time-weighted
// average and the root-mean-square shaft power, the energy and heat per
// cycle, and findings.
type Duty struct {
	Period    time.Duration // Σ tᵢ
	Peak      units.Power   // the highest phase power
	PeakPhase int           // the index of the (first) peak phase
	Average   units.Power   // Σ Pᵢ·tᵢ / Σ tᵢ
	// RMS is √(Σ Pᵢ²·tᵢ / Σ tᵢ), the equivalent steady load whose heating
	// matches the cycle's: the usual basis of an induction motor's thermal
	// rating (RMSRule, common practice), valid when the cycle is short
	// against the motor's thermal time constant (minutes).
	RMS     units.Power
	RMSRule components.Rule
	Energy  units.Energy // Σ Pᵢ·tᵢ per cycle, at the shaft
	Heat    units.Energy // the part of Energy that ends as heat in the oil, per cycle
	Wasted  units.Energy // the part of Heat from Relieving and Standby phases
	// Findings holds a caution when relief and standby phases make more
	// than half the cycle's heat.
	Findings components.Findings
}

// Cycle returns the load a duty cycle puts on its drive: peak, average and
// RMS shaft power, P_rms = √(Σ Pᵢ²·tᵢ / Σ tᵢ) (the usual thermal basis
// for an induction motor, common practice), and the heat per cycle: the
// pump's loss (1 − η_o)·P in Working phases, the whole shaft power in
// Relieving and Standby ones. Line and valve losses of Working phases come
// on top, so Heat is a lower bound. When Relieving and Standby phases make
// more than half the heat, the result carries a Caution finding (hazard
// HotSurface): that heat buys nothing, and an unloading valve, a
// compensated pump or a shorter dwell removes it.
//
// phases must not be empty; each phase needs Duration > 0 and either
// Pressure and Flow (≥ 0) with Efficiency in (0, 1], or Power ≥ 0 (with
// Efficiency for a Working phase that draws power). Errors match
// units.ErrRange and name the phase ("phases[2].Duration"). Cycle allocates
// only when it returns a finding.
func Cycle(phases []Phase) (Duty, error) {
	const fn = "drive.Cycle"
	if len(phases) == 0 {
		return Duty{}, &units.RangeError{Func: fn, Param: "phases", Value: "[]", Valid: "at least one phase"}
	}
	var d Duty
	var sumSq float64
	for i, ph := range phases {
		p, heat, err := ph.shaft(fn)
		if err != nil {
			return Duty{}, inPhase(err, i)
		}
		t := ph.Duration.Seconds()
		d.Period += ph.Duration
		if p > d.Peak {
			d.Peak, d.PeakPhase = p, i
		}
		d.Energy += units.Energy(float64(p) * t)
		sumSq += float64(p) * float64(p) * t
		d.Heat += units.Energy(float64(heat) * t)
		if ph.Use != Working {
			d.Wasted += units.Energy(float64(heat) * t)
		}
	}
	if d.Period <= 0 { // a sum of positive durations that overflowed
		return Duty{}, &units.RangeError{Func: fn, Param: "phases", Value: strconv.Itoa(len(phases)) + " phases",
			Valid: "a total duration that fits a time.Duration"}
	}
	T := d.Period.Seconds()
	d.Average = units.Power(float64(d.Energy) / T)
	d.RMS = units.Power(math.Sqrt(sumSq / T))
	d.RMSRule = components.PracticeRule("RMS power over the cycle, the usual thermal basis of an induction motor")
	if err := validate.Result(fn, "RMS", d.RMS); err != nil {
		return Duty{}, err
	}
	if d.Wasted > d.Heat/2 {
		d.Findings = components.Findings{components.NewFinding(components.Caution, components.HotSurface, "drive.wasted-heat",
			components.PhysicsRule("energy balance: relieved and deadheaded power all becomes heat"),
			"relief and standby phases make %v of the %v of heat in each cycle, %v on average: that heat buys nothing; unload the pump, use a compensated pump, or shorten the dwell",
			d.Wasted, d.Heat, units.Power(float64(d.Heat)/T))}
	}
	return d, nil
}

// fields renames ShaftPower's parameters to the fields of Phase.
func fields(err error) error {
	re, ok := err.(*units.RangeError)
	if !ok {
		return err
	}
	c := *re
	switch c.Param {
	case "p":
		c.Param = "Pressure"
	case "q":
		c.Param = "Flow"
	case "overall":
		c.Param = "Efficiency"
	}
	return &c
}

// inPhase puts the phase before the field a range error names:
// "Duration" → "phases[2].Duration". It runs only on error.
func inPhase(err error, i int) error {
	re, ok := err.(*units.RangeError)
	if !ok {
		return err
	}
	c := *re
	c.Param = "phases[" + strconv.Itoa(i) + "]." + c.Param
	return &c
}
