package valve

import (
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// DefaultReliefMargin is the margin [ReliefSetting] puts between the
// highest working pressure and the relief's setting when the caller gives
// none: 10 % (common practice: high enough that the relief does not crack
// and bleed flow as heat in normal work, low enough to protect).
const DefaultReliefMargin = 0.10

// ruleISO4413 is the safety standard behind the over-pressure and
// load-holding findings.
func ruleISO4413() components.Rule {
	return components.StandardRule("ISO 4413:2010, safety requirements for hydraulic systems and their components")
}

// ReliefNeed describes what a relief valve protects.
type ReliefNeed struct {
	Working units.Pressure // the highest working pressure at the relief (required, > 0)
	// Margin is the fraction the setting lies above Working, from 0 to 1.
	// Nil selects DefaultReliefMargin (common practice): new(0.15) sets
	// your own.
	Margin *float64
	// Override is the relief's own pressure rise from its cracking
	// pressure (the setting) to its pressure at the full pump flow, read
	// from the maker's curve; zero when not known.
	Override units.Pressure
	// Rating is the lowest rated pressure among the parts the relief
	// protects (required, > 0).
	Rating units.Pressure
}

// Relief is a relief valve's setting and what it does at full flow.
type Relief struct {
	Working    units.Pressure
	Setting    units.Pressure // cracking pressure: Working·(1 + Margin)
	Margin     float64        // always reported
	MarginRule components.Rule
	FullFlow   units.Pressure                   // Setting + Override: the highest pressure the relief lets the circuit see
	Protects   components.Check[units.Pressure] // FullFlow at most Rating
	Findings   components.Findings
}

// ReliefSetting returns a relief's setting from the highest working
// pressure, p_set = p_work·(1 + margin), and the pressure at full flow,
// p_set + override, held against the lowest rating of the parts it
// protects: ISO 4413 asks that every part be protected against pressure
// above its rating. Above the rating the result carries a Warning of hazard
// Overpressure; an unknown Override a Notice to read it off the maker's
// curve. Errors match units.ErrRange and name the field. ReliefSetting
// allocates only for its findings.
func ReliefSetting(n ReliefNeed) (Relief, error) {
	const fn = "valve.ReliefSetting"
	if err := validate.Positive(fn, "Working", n.Working); err != nil {
		return Relief{}, err
	}
	if err := validate.NonNegative(fn, "Override", n.Override); err != nil {
		return Relief{}, err
	}
	if err := validate.Positive(fn, "Rating", n.Rating); err != nil {
		return Relief{}, err
	}
	m, rule, err := marginOf(fn, "Margin", n.Margin, 0, 1, DefaultReliefMargin,
		components.PracticeRule("relief set about 10 % above the highest working pressure"))
	if err != nil {
		return Relief{}, err
	}
	r := Relief{Working: n.Working, Setting: units.Pressure(float64(n.Working) * (1 + m)), Margin: m, MarginRule: rule}
	r.FullFlow = r.Setting + n.Override
	if err := validate.Result(fn, "FullFlow", r.FullFlow); err != nil {
		return Relief{}, err
	}
	r.Protects = components.Within(r.FullFlow, n.Rating, components.CallerRule("Rating"))
	if !r.Protects.OK() {
		r.Findings = append(r.Findings, components.NewFinding(components.Warning, components.Overpressure, "valve.relief-above-rating",
			ruleISO4413(), "at full flow the relief holds %v, above the %v rating of the parts it protects: they can burst; lower the setting, choose a relief with less override, or higher-rated parts",
			r.FullFlow, n.Rating))
	}
	if n.Override == 0 {
		r.Findings = append(r.Findings, components.NewFinding(components.Notice, components.NoHazard, "valve.relief-override",
			components.PhysicsRule("a relief's pressure rises with the flow it passes"),
			"the relief's pressure rises above its %v setting as it passes more flow: read its full-flow pressure off the maker's curve and hold it against the %v rating",
			r.Setting, n.Rating))
	}
	return r, nil
}

// marginOf returns *m, or the default with its rule when m is nil.
func marginOf(fn, param string, m *float64, lo, hi, def float64, rule components.Rule) (float64, components.Rule, error) {
	if m == nil {
		return def, rule, nil
	}
	if err := validate.InRange(fn, param, *m, lo, hi); err != nil {
		return 0, components.Rule{}, err
	}
	return *m, components.CallerRule(param), nil
}

// Part is one part of a circuit and the relief that limits its pressure.
type Part struct {
	Name   string
	Rating units.Pressure // the part's rated pressure (> 0)
	// Relief is the highest pressure a relief lets this part see: the
	// full-flow pressure of the relief that reaches it (the main relief,
	// a port relief, a counterbalance valve's relief function). Zero means
	// no relief reaches it: it sits behind a check, a blocked center or a
	// load-holding valve with no relief of its own.
	Relief units.Pressure
}

// Protection checks that every part of a circuit is protected against
// over-pressure by a relief, as ISO 4413 asks: a Warning (hazard
// Overpressure) for each part no relief reaches, and for each part whose
// relief lets it see more than its rating. Trapped oil warms and expands,
// and an overrunning or intensifying actuator raises it, so a part behind
// a closed valve needs a relief of its own. Each part needs Rating > 0 and
// Relief ≥ 0; errors match units.ErrRange and name the part
// ("parts[1].Rating").
func Protection(parts []Part) (components.Findings, error) {
	const fn = "valve.Protection"
	for i, p := range parts {
		if err := validate.Positive(fn, "Rating", p.Rating); err != nil {
			return nil, inList(err, "parts", i)
		}
		if err := validate.NonNegative(fn, "Relief", p.Relief); err != nil {
			return nil, inList(err, "parts", i)
		}
	}
	var fs components.Findings
	for _, p := range parts {
		switch {
		case p.Relief == 0:
			fs = append(fs, components.NewFinding(components.Warning, components.Overpressure, "valve.unprotected", ruleISO4413(),
				"no relief reaches %v, rated %v: trapped, heated or intensified oil can burst it; give it a relief of its own",
				p.Name, p.Rating))
		case p.Relief > p.Rating:
			fs = append(fs, components.NewFinding(components.Warning, components.Overpressure, "valve.over-rating", ruleISO4413(),
				"%v, rated %v, can see %v before its relief limits the pressure: lower the relief or fit a higher-rated part",
				p.Name, p.Rating, p.Relief))
		}
	}
	return fs, nil
}

// inList puts the list element before the field a range error names:
// "Rating" → "parts[1].Rating". It runs only on error.
func inList(err error, list string, i int) error {
	re, ok := err.(*units.RangeError)
	if !ok {
		return err
	}
	c := *re
	c.Param = list + "[" + strconv.Itoa(i) + "]." + c.Param
	return &c
}
