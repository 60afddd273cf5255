package accumulator

import (
	"math"
	"strconv"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Sizing is an accumulator chosen for an oil volume.
type Sizing struct {
	Need      units.Volume                    // oil volume to deliver between Max and Min
	Volume    components.Choice[units.Volume] // nominal gas volume: required (Cycle.Size) and the chosen size
	Delivered units.Volume                    // what the chosen size delivers (0 when none was chosen)
	Energy    units.Energy                    // stored in the chosen size at Max (StoredEnergy, charge index)
	Findings  components.Findings
}

// Select returns the accumulator from the caller's list of nominal gas
// volumes sizes (a maker's range, as a components.Series) that delivers
// oil volume dv over the cycle: the required volume from Size, the
// smallest size at or above it, what that size delivers and the energy it
// stores at Max, with the ISO 4413 shutdown danger finding. When no size
// is large enough the choice comes back without one and a notice suggests
// accumulators in parallel. dv and the cycle as Size needs them; sizes must
// not be empty.
func (c Cycle) Select(dv units.Volume, sizes components.Series[units.Volume]) (Sizing, error) {
	const fn = "accumulator.Cycle.Select"
	v0, err := c.Size(dv)
	if err != nil {
		return Sizing{}, err
	}
	if sizes.Len() == 0 {
		return Sizing{}, validate.Fail(fn, "sizes", 0.0, "a non-empty series of nominal volumes")
	}
	ch, err := sizes.Select(v0)
	if err != nil {
		return Sizing{}, err
	}
	s := Sizing{Need: dv, Volume: ch}
	if !ch.OK() {
		n := math.Ceil(float64(v0 / sizes.Largest())) // a float64: it may not fit an int
		s.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "accumulator.no-size", ch.Rule,
			"no size of %v reaches %v: use %v accumulators of %v in parallel, or a wider pressure range", sizes.Name(), v0, n, sizes.Largest())}
		w, err := StoredEnergy(v0, c.Precharge, c.Max, c.Charge)
		if err != nil {
			return Sizing{}, err
		}
		s.Energy = w
	} else {
		if s.Delivered, err = c.Delivered(ch.Chosen); err != nil {
			return Sizing{}, err
		}
		if s.Energy, err = StoredEnergy(ch.Chosen, c.Precharge, c.Max, c.Charge); err != nil {
			return Sizing{}, err
		}
	}
	s.Findings = append(components.Findings{ShutdownDanger(c.Max, s.Energy)}, s.Findings...)
	return s, nil
}

// Emergency is an accumulator that finishes one stroke of an actuator when
// the pump stops: it fills Area over Stroke (a cylinder's bore or annulus
// area) with a margin for leakage, discharging from Max to Min.
type Emergency struct {
	Area   units.Area
	Stroke units.Length
	Margin float64 // share added to the swept volume for leakage and the valve's dead volume (0.1 for 10 %)
	// Cycle: typically charged slowly (Isothermal) and discharged in
	// seconds (Adiabatic); Min is the least pressure at which the
	// actuator still moves its load.
	Cycle Cycle
	Sizes components.Series[units.Volume]
}

// Size returns the accumulator for the emergency stroke: the oil volume
// A·s·(1 + Margin) selected as Cycle.Select does, with the shutdown danger
// finding and a warning that the stroke must finish at Min (the actuator's
// force at Min is the caller's check) and that the actuator moves on
// stored energy after power is lost. Area and Stroke must be finite and
// > 0, Margin in [0, 1].
func (e Emergency) Size() (Sizing, error) {
	const fn = "accumulator.Emergency.Size"
	if err := validate.Positive(fn, "Area", e.Area); err != nil {
		return Sizing{}, err
	}
	if err := validate.Positive(fn, "Stroke", e.Stroke); err != nil {
		return Sizing{}, err
	}
	if err := validate.InRange(fn, "Margin", e.Margin, 0, 1); err != nil {
		return Sizing{}, err
	}
	dv := e.Area.TimesLength(e.Stroke) * units.Volume(1+e.Margin)
	s, err := e.Cycle.Select(dv, e.Sizes)
	if err != nil {
		return Sizing{}, err
	}
	s.Findings = s.Findings.Merge(components.NewFinding(components.Warning, components.StoredEnergy, "accumulator.emergency-stroke",
		iso4413, "the actuator strokes on stored energy after power is lost, down to %v: keep people clear of its path and check it moves its load at that pressure",
		e.Cycle.Min))
	return s, nil
}

// Phase is one step of a duty cycle: the flow the circuit draws for a
// duration.
type Phase struct {
	Name     string
	Duration time.Duration
	Flow     units.Flow // demand, ≥ 0
}

// Supplement is a pump that runs through a duty cycle at a constant flow
// while an accumulator covers the phases that draw more: the pump refills
// it in the phases that draw less.
type Supplement struct {
	Phases []Phase
	Pump   units.Flow // the pump's delivery; 0 to size it at the mean demand
	Cycle  Cycle
	Sizes  components.Series[units.Volume]
}

// SupplementSizing is a pump flow and an accumulator that together meet a
// duty cycle.
type SupplementSizing struct {
	Mean  units.Flow   // time-weighted mean demand: the least pump that keeps up
	Peak  units.Flow   // the highest phase demand: the pump that would serve alone
	Pump  units.Flow   // the pump flow used
	Swing units.Volume // the oil volume the accumulator gives and takes back each cycle
	Sizing
}

// Size returns the pump flow and the accumulator that meet the duty cycle.
// The accumulator's oil volume follows the running deficit
// ∫(demand − pump)·dt from full: it falls when the demand exceeds the pump,
// refills when it is below, and stays full (the pump unloads or relieves)
// once refilled; the swing is the deepest draw over the cycle in its
// repeating state, which two passes of the cycle reach exactly. The pump
// must deliver at least the mean demand, or no accumulator keeps up.
// When the pump meets the peak, no accumulator is needed: the sizing is
// empty and a notice says so. Each phase needs a finite duration > 0 and a
// demand ≥ 0, the cycle at most 292 years in all and a finite mean demand;
// the pump, when given, at least the mean; the cycle and sizes as
// Cycle.Select needs them.
func (s Supplement) Size() (SupplementSizing, error) {
	const fn = "accumulator.Supplement.Size"
	if len(s.Phases) == 0 {
		return SupplementSizing{}, validate.Fail(fn, "Phases", 0.0, "at least one phase")
	}
	var out SupplementSizing
	var total time.Duration
	var volume units.Volume
	for i, p := range s.Phases {
		name := "Phases[" + strconv.Itoa(i) + "]"
		if p.Duration <= 0 {
			return SupplementSizing{}, validate.Fail(fn, name+".Duration", p.Duration.Seconds(), "> 0 s")
		}
		if p.Duration > math.MaxInt64-total {
			return SupplementSizing{}, validate.Fail(fn, name+".Duration", p.Duration.Seconds(), "short enough for a cycle of 292 years at most")
		}
		if err := validate.NonNegative(fn, name+".Flow", p.Flow); err != nil {
			return SupplementSizing{}, err
		}
		total += p.Duration
		volume += p.Flow.TimesDuration(p.Duration)
		out.Peak = max(out.Peak, p.Flow)
	}
	mean, err := volume.PerDuration(total)
	if err != nil { // the volume demanded overflowed
		return SupplementSizing{}, validate.Result(fn, "Mean", units.Flow(math.Inf(1)))
	}
	out.Mean = mean
	out.Pump = s.Pump
	if out.Pump == 0 {
		out.Pump = out.Mean
	} else if err := validate.Finite(fn, "Pump", s.Pump); err != nil {
		return SupplementSizing{}, err
	} else if s.Pump < out.Mean {
		return SupplementSizing{}, validate.Fail(fn, "Pump", s.Pump, "≥ the mean demand "+out.Mean.String()+" (or 0 to use it)")
	}
	out.Swing = s.swing(out.Pump)
	if out.Swing <= 0 {
		out.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "accumulator.not-needed",
			components.PhysicsRule("the pump meets the peak demand"), "a pump of %v meets the peak demand of %v without an accumulator", out.Pump, out.Peak)}
		return out, nil
	}
	sz, err := s.Cycle.Select(out.Swing, s.Sizes)
	if err != nil {
		return SupplementSizing{}, err
	}
	out.Sizing = sz
	out.Findings = out.Findings.Merge(components.NewFinding(components.Notice, components.NoHazard, "accumulator.supplement",
		components.PhysicsRule("volume balance over the duty cycle"),
		"a pump of %v with the accumulator serves a cycle that peaks at %v; the pressure swings from %v to %v in every cycle",
		out.Pump, out.Peak, s.Cycle.Max, s.Cycle.Min))
	return out, nil
}

// swing returns the deepest draw on a full accumulator over the cycle in
// its repeating state: the deficit d rises by (demand − pump)·t in each
// phase, never below 0 (full), over two passes; the second pass's maximum
// is the steady one (after the first refill the state repeats).
func (s Supplement) swing(pump units.Flow) units.Volume {
	var d, worst units.Volume
	for pass := range 2 {
		for _, p := range s.Phases {
			d = max(0, d+(p.Flow-pump).TimesDuration(p.Duration))
			if pass == 1 {
				worst = max(worst, d)
			}
		}
	}
	return worst
}
