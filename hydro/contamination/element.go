package contamination

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ElementPoint is one clean-element pressure drop read from a filter data
// sheet: Drop at flow Flow and kinematic viscosity Viscosity.
type ElementPoint struct {
	Drop      units.Pressure
	Flow      units.Flow
	Viscosity units.KinematicViscosity
}

// CleanDrop scales a data-sheet clean-element pressure drop to flow q and
// viscosity nu: Δp = Δp₀ · (Q/Q₀) · (ν/ν₀). This assumes laminar (Darcy)
// flow through the filter medium, common practice for elements; it does not
// cover the housing, whose loss grows about with Q² and should be added
// from the maker's curve. All inputs must be finite and > 0
// (units.ErrRange; errors name at.Drop, at.Flow, at.Viscosity, q or nu),
// and the drop must be finite and > 0: one that overflows or underflows to
// 0 (subnormal inputs) is an error, never 0.
func CleanDrop(at ElementPoint, q units.Flow, nu units.KinematicViscosity) (units.Pressure, error) {
	return cleanDrop("contamination.CleanDrop", at, q, nu)
}

func cleanDrop(fn string, at ElementPoint, q units.Flow, nu units.KinematicViscosity) (units.Pressure, error) {
	if err := at.check(fn); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "nu", nu); err != nil {
		return 0, err
	}
	dp := units.Pressure(mulDiv(float64(at.Drop), float64(q), float64(nu), float64(at.Flow), float64(at.Viscosity), 1))
	if err := validate.PositiveResult(fn, "drop", dp); err != nil {
		return 0, err
	}
	return dp, nil
}

func (at ElementPoint) check(fn string) error {
	if err := validate.Positive(fn, "at.Drop", at.Drop); err != nil {
		return err
	}
	if err := validate.Positive(fn, "at.Flow", at.Flow); err != nil {
		return err
	}
	return validate.Positive(fn, "at.Viscosity", at.Viscosity)
}

// CleanShareLimit is the largest clean-element drop, as a fraction of the
// bypass valve setting, that leaves room for the element to load before the
// bypass opens: about a third (common practice).
const CleanShareLimit = 1.0 / 3

// BypassCheck is the result of CheckBypass: the clean-element drop held
// against the bypass valve setting and against the share of it that leaves
// room for dirt, and what to tell the reader.
type BypassCheck struct {
	// Setting holds the clean drop (Value) against the bypass valve's
	// cracking setting (Limit, the caller's): it fails when the clean
	// element alone opens the bypass, so fluid passes unfiltered. Its
	// Ratio is the share of the setting the clean element uses.
	Setting components.Check[units.Pressure]
	// Room holds the clean drop against CleanShareLimit times the setting
	// (common practice): it fails when little room is left for dirt before
	// the bypass opens.
	Room components.Check[units.Pressure]
	// Findings: the bypass opening (TopicBypassOpen, a caution) or little
	// room (TopicBypassRoom, a notice), and always the clogging indicator,
	// relieving pressure before opening the housing, hot oil and the
	// cold-start drop.
	Findings components.Findings
}

// CheckBypass scales a clean-element drop (CleanDrop) to flow q and
// viscosity nu and holds it against the bypass valve setting: the Setting
// check fails when the drop is above the setting, the Room check when it is
// above CleanShareLimit of it (common practice). Check it at the coldest
// start-up viscosity as well as at working temperature: a cold start can
// open the bypass of a clean element, and an element in bypass passes
// unfiltered fluid. The result carries findings to show (clogging
// indicator, relieve pressure before opening a housing, hot oil). Inputs
// must be finite and > 0, and the share finite (units.ErrRange).
func CheckBypass(at ElementPoint, q units.Flow, nu units.KinematicViscosity, bypass units.Pressure) (BypassCheck, error) {
	const fn = "contamination.CheckBypass"
	if err := validate.Positive(fn, "bypass", bypass); err != nil {
		return BypassCheck{}, err
	}
	dp, err := cleanDrop(fn, at, q, nu)
	if err != nil {
		return BypassCheck{}, err
	}
	if err := validate.Result(fn, "drop ÷ bypass", float64(dp/bypass)); err != nil {
		return BypassCheck{}, err
	}
	r := BypassCheck{
		Setting: components.Within(dp, bypass, components.CallerRule("bypass")),
		Room: components.Within(dp, units.Pressure(CleanShareLimit*float64(bypass)),
			components.PracticeRule("clean element within a third of the bypass setting")),
	}
	switch {
	case !r.Setting.OK():
		r.Findings = append(r.Findings, components.NewFinding(components.Caution, components.FilterBypass, TopicBypassOpen,
			r.Setting.Rule,
			"The clean element's drop of %v at %v and %v is above the %v bypass setting: fluid passes unfiltered; choose a larger element or a lower flow, or warm the fluid before load.",
			dp, q, nu, bypass))
	case !r.Room.OK():
		r.Findings = append(r.Findings, components.NewFinding(components.Notice, components.FilterBypass, TopicBypassRoom,
			r.Room.Rule,
			"The clean element's drop of %v at %v and %v uses more than a third of the %v bypass setting: little dirt-holding life before the bypass opens.",
			dp, q, nu, bypass))
	}
	r.Findings = append(r.Findings, indicatorFinding(), relieveFinding(), hotOilFinding(), coldDropFinding())
	return r, nil
}
