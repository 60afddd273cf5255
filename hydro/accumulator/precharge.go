package accumulator

import (
	"cmp"
	"slices"
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// PrechargeRatio is the usual precharge as a share of the minimum working
// pressure: p₀ ≈ 0.9·p₁ (common practice; equivalently p₁ ≥ 1.1·p₀), close
// enough to p₁ to use most of the gas volume, far enough below it that a
// bladder or diaphragm does not strike the oil port at every cycle.
const PrechargeRatio = 0.9

// PrechargeAt returns the precharge p set at gas temperature from as it
// reads at gas temperature to, with the gas volume fixed (no oil in the
// accumulator): p₂ = p₁·T₂/T₁ in kelvin (the ideal-gas law at constant
// volume, Gay-Lussac's law). Both temperatures must be finite and above
// absolute zero, p finite and > 0.
func PrechargeAt(p units.AbsolutePressure, from, to units.Temperature) (units.AbsolutePressure, error) {
	const fn = "accumulator.PrechargeAt"
	if err := validate.Positive(fn, "p", p); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "from", from); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "to", to); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "p", atTemperature(p, from, to))
}

// atTemperature is Gay-Lussac's law, p·T₂/T₁, unchecked.
func atTemperature(p units.AbsolutePressure, from, to units.Temperature) units.AbsolutePressure {
	return p * units.AbsolutePressure(to/from)
}

// Kind is the construction of an accumulator, which limits how far its gas
// may be compressed.
type Kind uint8

// Accumulator kinds.
const (
	Bladder   Kind = iota + 1 // p₂ ≤ 4·p₀ (common practice)
	Diaphragm                 // p₂ ≤ 8·p₀ (common practice; makers give less for larger shells)
	Piston                    // no compression-ratio limit here; seal friction and the maker's limits govern
)

// String returns "bladder", "diaphragm" or "piston".
func (k Kind) String() string {
	switch k {
	case Bladder:
		return "bladder"
	case Diaphragm:
		return "diaphragm"
	case Piston:
		return "piston"
	}
	return "Kind(invalid)"
}

// maxRatio is the highest p₂/p₀ a kind accepts, 0 for no limit.
func (k Kind) maxRatio() float64 {
	switch k {
	case Bladder:
		return 4
	case Diaphragm:
		return 8
	}
	return 0
}

// Charging is what a precharge must suit: an accumulator of kind Kind
// working between Min and Max (absolute), with its gas at Working in normal
// running and anywhere from Coldest to Hottest over the year, charged at
// the fill temperature Fill.
type Charging struct {
	Kind             Kind
	Min, Max         units.AbsolutePressure
	Fill             units.Temperature // where the charge is set (the workshop)
	Working          units.Temperature // the gas in normal running
	Coldest, Hottest units.Temperature // the range the gas sees
}

// Precharge is a precharge and how it fares over the gas temperatures.
type Precharge struct {
	Fill    units.AbsolutePressure // to set at the fill temperature
	Working units.AbsolutePressure // the same charge at the working temperature
	Points  []PrechargePoint       // the charge at Coldest, Fill, Working and Hottest, coldest first
	// Hot holds the charge at the hottest gas temperature against Min: a
	// charge above Min lets the accumulator empty before the pressure
	// falls to Min.
	Hot components.Check[units.AbsolutePressure]
	// Ratio holds Max over the charge at the coldest gas temperature
	// against the kind's compression limit (unset for a piston).
	Ratio    components.Check[float64]
	Rule     components.Rule // where Fill comes from
	Findings components.Findings
}

// PrechargePoint is the precharge at one gas temperature.
type PrechargePoint struct {
	Temperature units.Temperature
	Pressure    units.AbsolutePressure
}

func (c Charging) validate(fn string) error {
	if c.Kind < Bladder || c.Kind > Piston {
		return validate.Fail(fn, "Kind", float64(c.Kind), "Bladder, Diaphragm or Piston")
	}
	if err := validate.Positive(fn, "Min", c.Min); err != nil {
		return err
	}
	if err := validate.Above(fn, "Max", c.Max, c.Min); err != nil {
		return err
	}
	for _, t := range []struct {
		name string
		v    units.Temperature
	}{{"Fill", c.Fill}, {"Working", c.Working}, {"Coldest", c.Coldest}} {
		if err := validate.Positive(fn, t.name, t.v); err != nil {
			return err
		}
	}
	if err := validate.Finite(fn, "Hottest", c.Hottest); err != nil {
		return err
	}
	return validate.InRange(fn, "Working", c.Working, c.Coldest, c.Hottest)
}

// Recommend returns the usual precharge, PrechargeRatio × Min at the
// working gas temperature (common practice, taken on absolute pressures
// here; on gauge pressures it differs by a tenth of the ambient pressure),
// converted to the fill temperature (PrechargeAt), with the checks of
// Check. Coldest ≤ Working ≤ Hottest, all above absolute zero, and
// 0 < Min < Max.
func (c Charging) Recommend() (Precharge, error) {
	const fn = "accumulator.Charging.Recommend"
	if err := c.validate(fn); err != nil {
		return Precharge{}, err
	}
	fill, err := PrechargeAt(PrechargeRatio*c.Min, c.Working, c.Fill)
	if err != nil {
		return Precharge{}, err
	}
	p, err := c.check(fn, fill)
	if err != nil {
		return Precharge{}, err
	}
	p.Rule = components.PracticeRule("precharge about 0.9 × the minimum working pressure at the working gas temperature")
	return p, nil
}

// Check returns how a precharge fill, set at the fill temperature, fares:
// its value at each gas temperature (the charge rises and falls with the
// absolute temperature), a check that it stays at or below Min when the
// gas is hottest, and a check that Max over the charge when the gas is
// coldest stays within the kind's compression limit (4:1 for a bladder,
// 8:1 for a diaphragm, common practice). A failed check carries a caution.
// A fill at or above Min is a failed check, not an error: it is a design
// question. The Charging must be valid as for Recommend, and fill finite
// and > 0; a charge or ratio that overflows is an error naming precharge
// or Ratio.
func (c Charging) Check(fill units.AbsolutePressure) (Precharge, error) {
	const fn = "accumulator.Charging.Check"
	if err := c.validate(fn); err != nil {
		return Precharge{}, err
	}
	if err := validate.Positive(fn, "fill", fill); err != nil {
		return Precharge{}, err
	}
	p, err := c.check(fn, fill)
	if err != nil {
		return Precharge{}, err
	}
	p.Rule = components.CallerRule("fill")
	return p, nil
}

func (c Charging) check(fn string, fill units.AbsolutePressure) (Precharge, error) {
	at := func(t units.Temperature) units.AbsolutePressure { return atTemperature(fill, c.Fill, t) }
	p := Precharge{Fill: fill, Working: at(c.Working)}
	for _, t := range []units.Temperature{c.Coldest, c.Fill, c.Working, c.Hottest} {
		if !slices.ContainsFunc(p.Points, func(q PrechargePoint) bool { return q.Temperature == t }) {
			p.Points = append(p.Points, PrechargePoint{t, at(t)})
		}
	}
	slices.SortFunc(p.Points, func(a, b PrechargePoint) int { return cmp.Compare(a.Temperature, b.Temperature) })
	hot, cold := at(c.Hottest), at(c.Coldest)
	if err := validate.Result(fn, "precharge", hot); err != nil {
		return Precharge{}, err
	}
	p.Hot = components.Within(hot, c.Min, components.PhysicsRule("the charge must stay below the minimum working pressure"))
	p.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "accumulator.precharge",
		components.PhysicsRule("ideal gas at constant volume: p ∝ T"),
		"set the precharge to %v at %v; it reads %v at %v, %v at %v and %v at %v",
		fill, c.Fill, cold, c.Coldest, p.Working, c.Working, hot, c.Hottest)}
	if !p.Hot.OK() {
		p.Findings = p.Findings.Merge(components.NewFinding(components.Caution, components.NoHazard, "accumulator.precharge-hot", p.Hot.Rule,
			"at %v the precharge rises to %v, above the minimum working pressure of %v: the accumulator empties before the pressure falls that far",
			c.Hottest, hot, c.Min))
	}
	if lim := c.Kind.maxRatio(); lim > 0 {
		ratio, err := validate.Checked(fn, "Ratio", float64(c.Max/cold))
		if err != nil {
			return Precharge{}, err
		}
		p.Ratio = components.Within(ratio, lim,
			components.PracticeRule(c.Kind.String()+" accumulator: maximum pressure at most "+strconv.FormatFloat(lim, 'g', -1, 64)+" × the precharge"))
		if !p.Ratio.OK() {
			p.Findings = p.Findings.Merge(components.NewFinding(components.Caution, components.NoHazard, "accumulator.precharge-cold", p.Ratio.Rule,
				"at %v the precharge falls to %v, and the maximum pressure of %v is %v times it, more than a %v accepts",
				c.Coldest, cold, c.Max, p.Ratio.Value, c.Kind.String()))
		}
	}
	return p, nil
}
