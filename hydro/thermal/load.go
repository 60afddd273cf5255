package thermal

import (
	"math"
	"strconv"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Source is where a heat load comes from.
type Source uint8

// Heat sources in a hydraulic circuit.
const (
	FromPump       Source = iota + 1 // pump inefficiency: volumetric and mechanical losses
	FromMotor                        // hydraulic motor or cylinder inefficiency
	FromThrottling                   // flow throttled across a valve or orifice: Δp·Q
	FromRelief                       // flow over a relief valve: p·Q
	FromStandby                      // a pressure-compensated pump at standby: its leakage and control flow
	FromLines                        // line, fitting and component pressure drops
	FromOther                        // a figure of the caller's
)

var sourceNames = [...]string{"", "pump", "motor", "throttling", "relief", "standby", "lines", "other"}

// String returns the source in a word: "pump", "relief", ….
func (s Source) String() string {
	if s >= FromPump && s <= FromOther {
		return sourceNames[s]
	}
	return "Source(invalid)"
}

// Load is one item of a heat budget: the power it turns into heat in the
// oil and, for a pump, the shaft power it draws.
type Load struct {
	Source Source
	Name   string
	Power  units.Power // heat into the oil
	Input  units.Power // shaft power drawn (a pump's); 0 for other items
	Rule   components.Rule
}

var energyRule = components.PhysicsRule("energy balance: power not delivered as work becomes heat")

// PumpLoss returns the heat a pump makes delivering flow q at pressure p
// with overall efficiency overall (volumetric × mechanical):
// input P_in = p·Q/η, heat P_in − p·Q = p·Q·(1/η − 1). All of it is counted
// into the oil (a pump's case is cooled mostly by its drain flow); the
// electric motor's own losses go to the air and are not counted. p and q
// must be finite and ≥ 0, overall in [0.001, 1].
func PumpLoss(name string, p units.Pressure, q units.Flow, overall float64) (Load, error) {
	const fn = "thermal.PumpLoss"
	hyd, err := hydraulic(fn, p, q)
	if err != nil {
		return Load{}, err
	}
	if err := validate.InRange(fn, "overall", overall, 1e-3, 1); err != nil {
		return Load{}, err
	}
	in, err := validate.Checked(fn, "input", hyd/units.Power(overall))
	if err != nil {
		return Load{}, err
	}
	return Load{Source: FromPump, Name: name, Power: in - hyd, Input: in, Rule: energyRule}, nil
}

// MotorLoss returns the heat a hydraulic motor (or cylinder) makes taking
// flow q across pressure difference dp with overall efficiency overall:
// Δp·Q·(1 − η). dp and q must be finite and ≥ 0, overall in [0.001, 1].
func MotorLoss(name string, dp units.Pressure, q units.Flow, overall float64) (Load, error) {
	const fn = "thermal.MotorLoss"
	hyd, err := hydraulic(fn, dp, q)
	if err != nil {
		return Load{}, err
	}
	if err := validate.InRange(fn, "overall", overall, 1e-3, 1); err != nil {
		return Load{}, err
	}
	return Load{Source: FromMotor, Name: name, Power: hyd * units.Power(1-overall), Rule: energyRule}, nil
}

// Throttling returns the heat of flow q throttled across pressure drop dp
// with no work done: Δp·Q (a flow control, a pressure-reducing valve, a
// meter-out orifice). dp and q must be finite and ≥ 0.
func Throttling(name string, dp units.Pressure, q units.Flow) (Load, error) {
	return simple("thermal.Throttling", FromThrottling, name, dp, q)
}

// ReliefFlow returns the heat of flow q passing a relief valve set at p to
// the tank: p·Q, all of it. p and q must be finite and ≥ 0.
func ReliefFlow(name string, p units.Pressure, q units.Flow) (Load, error) {
	return simple("thermal.ReliefFlow", FromRelief, name, p, q)
}

// Standby returns the heat of a pressure-compensated pump held at its
// compensator setting p with no flow demanded: its internal leakage and
// control flow q (the case-drain flow) throttled from p to the case, p·Q.
// The pump's mechanical standby losses add to it: take them from the
// maker's standby input power (as Other) where known. p and q must be
// finite and ≥ 0.
func Standby(name string, p units.Pressure, q units.Flow) (Load, error) {
	return simple("thermal.Standby", FromStandby, name, p, q)
}

// LineLoss returns the heat of flow q through lines and components that
// drop pressure dp: Δp·Q (for instance a hydro/line PathDrop's Total at
// its Flow). dp and q must be finite and ≥ 0.
func LineLoss(name string, dp units.Pressure, q units.Flow) (Load, error) {
	return simple("thermal.LineLoss", FromLines, name, dp, q)
}

// Other returns a heat load of the caller's, with the rule it comes from
// (a maker's figure, a measurement). power must be finite and ≥ 0.
func Other(name string, power units.Power, rule components.Rule) (Load, error) {
	if err := validate.NonNegative("thermal.Other", "power", power); err != nil {
		return Load{}, err
	}
	return Load{Source: FromOther, Name: name, Power: power, Rule: rule}, nil
}

func hydraulic(fn string, p units.Pressure, q units.Flow) (units.Power, error) {
	if err := validate.NonNegative(fn, "p", p); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "q", q); err != nil {
		return 0, err
	}
	w := p.TimesFlow(q)
	return validate.Checked(fn, "p·Q", w)
}

func simple(fn string, s Source, name string, p units.Pressure, q units.Flow) (Load, error) {
	w, err := hydraulic(fn, p, q)
	if err != nil {
		return Load{}, err
	}
	return Load{Source: s, Name: name, Power: w, Rule: energyRule}, nil
}

// Phase is one step of a duty cycle: its duration, its heat loads and the
// shaft power the pumps draw in it (Input; 0 to take the sum of the pump
// loads' Input).
type Phase struct {
	Name     string
	Duration time.Duration
	Loads    []Load
	Input    units.Power
}

// HeatLoad is the heat budget of a duty cycle.
type HeatLoad struct {
	Mean      units.Power   // itemised heat, time-weighted over the cycle
	Sources   []SourceShare // the mean by source, in Source order, for the sources present
	Peak      units.Power   // the heat of the hottest phase
	PeakPhase string
	Input     units.Power // shaft input power, time-weighted
	Guess     Guess       // the share-of-input estimate (zero when no input is known)
	Findings  components.Findings
}

// SourceShare is the mean heat of one source over a duty cycle.
type SourceShare struct {
	Source Source
	Mean   units.Power
}

// Guess is the trade's first estimate of heat: a share of the input power.
type Guess struct {
	Low, High units.Power
	Rule      components.Rule
}

// Shares of input power that the first guess takes as heat: a quarter to a
// third (common practice, for circuits without pressure compensation).
const (
	GuessLow  = 0.25
	GuessHigh = 1.0 / 3
)

// Budget returns the itemised heat load of a duty cycle: each phase's loads
// summed, weighted by its duration, by source and in total, with the
// hottest phase; and, when input power is known, the trade's first guess
// (a quarter to a third of the input, common practice) beside it, with a
// notice comparing the two: the guess overstates the heat of a
// pressure-compensated or unloading circuit and understates that of a
// fixed pump that relieves. Each phase needs a duration > 0 and valid
// loads, the cycle at most 292 years in all; a phase whose loads exceed its
// input power is an error, and so is a mean heat or input that overflows.
func Budget(phases []Phase) (HeatLoad, error) {
	const fn = "thermal.Budget"
	if len(phases) == 0 {
		return HeatLoad{}, validate.Fail(fn, "phases", 0.0, "at least one phase")
	}
	var out HeatLoad
	var bySource [FromOther + 1]units.Energy
	var heat, input units.Energy
	var total time.Duration
	for i, ph := range phases {
		if ph.Duration <= 0 {
			return HeatLoad{}, validate.Fail(fn, phaseField(i, "Duration"), ph.Duration.Seconds(), "> 0 s")
		}
		if ph.Duration > math.MaxInt64-total {
			return HeatLoad{}, validate.Fail(fn, phaseField(i, "Duration"), ph.Duration.Seconds(), "short enough for a cycle of 292 years at most")
		}
		if err := validate.NonNegative(fn, "Input", ph.Input); err != nil {
			return HeatLoad{}, inPhase(err, fn, i, "")
		}
		var p, in units.Power
		for j, l := range ph.Loads {
			if err := l.check(fn); err != nil {
				return HeatLoad{}, inPhase(err, fn, i, "Loads["+strconv.Itoa(j)+"].")
			}
			p += l.Power
			in += l.Input
			bySource[l.Source] += l.Power.TimesDuration(ph.Duration)
		}
		if ph.Input > 0 {
			in = ph.Input
		}
		if in > 0 && p > in {
			return HeatLoad{}, validate.Fail(fn, phaseField(i, "Loads"), p, "at most the phase's input power "+in.String())
		}
		if p > out.Peak || i == 0 {
			out.Peak, out.PeakPhase = p, ph.Name
		}
		heat += p.TimesDuration(ph.Duration)
		input += in.TimesDuration(ph.Duration)
		total += ph.Duration
	}
	secs := total.Seconds()
	out.Mean, out.Input = units.Power(float64(heat)/secs), units.Power(float64(input)/secs)
	n := 0
	for _, e := range bySource {
		if e > 0 {
			n++
		}
	}
	if n > 0 {
		out.Sources = make([]SourceShare, 0, n)
	}
	for s := FromPump; s <= FromOther; s++ {
		if bySource[s] > 0 {
			out.Sources = append(out.Sources, SourceShare{s, units.Power(float64(bySource[s]) / secs)})
		}
	}
	if err := validate.Result(fn, "Mean", out.Mean); err != nil {
		return HeatLoad{}, err
	}
	if err := validate.Result(fn, "Input", out.Input); err != nil {
		return HeatLoad{}, err
	}
	out.compare()
	return out, nil
}

// phaseField names field of phases[i] in an error: "phases[2].Duration".
// Budget builds the name only for an error, so a valid budget allocates
// no names.
func phaseField(i int, field string) string {
	return "phases[" + strconv.Itoa(i) + "]." + field
}

// inPhase names fn in a range error and puts phases[i] and prefix before
// its parameter.
func inPhase(err error, fn string, i int, prefix string) error {
	return validate.Renamed(err, fn, validate.Fields(phaseField(i, prefix), nil))
}

// check validates a load for fn: a known source, power and input ≥ 0.
func (l Load) check(fn string) error {
	if l.Source < FromPump || l.Source > FromOther {
		return validate.Fail(fn, "Source", float64(l.Source), "one of the Source constants")
	}
	if err := validate.NonNegative(fn, "Power", l.Power); err != nil {
		return err
	}
	return validate.NonNegative(fn, "Input", l.Input)
}

// compare fills the share-of-input guess and the notice beside it.
func (h *HeatLoad) compare() {
	if h.Input == 0 {
		h.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "thermal.no-input",
			energyRule, "no input power is given, so the share-of-input estimate is not made")}
		return
	}
	rule := components.PracticeRule("a quarter to a third of the input power becomes heat (circuits without pressure compensation)")
	h.Guess = Guess{Low: h.Input * GuessLow, High: h.Input * GuessHigh, Rule: rule}
	share := 100 * float64(h.Mean/h.Input)
	text := "the itemised heat load is %v, %v %% of the input power; a quarter to a third of the input would give %v to %v"
	switch {
	case h.Mean < h.Guess.Low:
		text += ": the share guess overstates the heat of this circuit"
	case h.Mean > h.Guess.High:
		text += ": the share guess understates the heat of this circuit"
	}
	h.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "thermal.guess", rule,
		text, h.Mean, share, h.Guess.Low, h.Guess.High)}
}
