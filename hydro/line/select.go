package line

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// TubeNeed is what a tube must do: carry Flow at no more than Limit, in a
// tube of the ISO 8434-1 series Class, and, when Pressure is set, hold
// Pressure by Barlow's formula on the outside diameter with the material's
// tensile strength Strength and safety factor Safety.
type TubeNeed struct {
	Flow     units.Flow
	Limit    VelocityLimit
	Class    components.TubeClass
	Pressure units.Pressure // working pressure to hold; 0 to choose for the bore alone
	Strength units.Pressure // tensile strength of the tube material, when Pressure is set
	Safety   float64        // safety factor on Strength, when Pressure is set
}

// TubeChoice is the tube chosen for a need.
type TubeChoice struct {
	Bore     components.Choice[units.Length]  // required inside diameter (MinBore) and the chosen tube's
	Tube     components.Tube                  // the zero Tube when none of the class meets the need
	Velocity components.Check[units.Velocity] // the velocity in the chosen tube against the limit
	Wall     WallRating                       // the chosen tube's rating when Pressure is set
	Pressure components.Check[units.Pressure] // Pressure against Wall.Working when Pressure is set
	Findings components.Findings
}

// tubeSeries are the tubes of each class, ascending, copied once at start-up
// from components.MetricTubes (which gives a fresh copy per call) and never
// written.
var tubeSeries = [...][]components.Tube{
	components.LightTube: components.MetricTubes(components.LightTube),
	components.HeavyTube: components.MetricTubes(components.HeavyTube),
}

// tubes returns the tubes of a class, nil for an unknown class, with the
// series' name and rule.
func tubes(class components.TubeClass) ([]components.Tube, string, components.Rule) {
	switch class {
	case components.LightTube:
		return tubeSeries[class], "ISO 8434-1 L-series tube",
			components.StandardRule("ISO 8434-1 L series outside diameters; walls common practice")
	case components.HeavyTube:
		return tubeSeries[class], "ISO 8434-1 S-series tube",
			components.StandardRule("ISO 8434-1 S series outside diameters; walls common practice")
	}
	return nil, "", components.Rule{}
}

// SelectTube returns the first tube of the class, in the order of
// components.MetricTubes (ascending inside diameter), whose bore is at
// least MinBore(Flow, Limit.Max) and, when Pressure is set, whose wall
// rating (Barlow on the outside diameter) reaches Pressure. When no tube of
// the class meets the need, the choice comes back with no tube (Bore.OK()
// false) and a finding. Flow and Limit.Max must be finite and > 0; with
// Pressure set, Strength and Safety as Barlow needs them. A need that a
// tube meets allocates nothing.
func SelectTube(n TubeNeed) (TubeChoice, error) {
	const fn = "line.SelectTube"
	d, err := minBore(fn, n.Flow, n.Limit)
	if err != nil {
		return TubeChoice{}, err
	}
	if err := validate.NonNegative(fn, "Pressure", n.Pressure); err != nil {
		return TubeChoice{}, err
	}
	list, series, rule := tubes(n.Class)
	if list == nil {
		return TubeChoice{}, validate.Fail(fn, "Class", float64(n.Class), "LightTube or HeavyTube")
	}
	c := TubeChoice{Bore: components.Choice[units.Length]{Required: d, Series: series, Rule: rule}}
	for _, t := range list {
		if t.ID() < d {
			continue
		}
		var w WallRating
		if n.Pressure > 0 {
			if w, err = Barlow(t.OD, t.Wall, n.Strength, n.Safety, OutsideDiameter); err != nil {
				return TubeChoice{}, validate.Renamed(err, fn, validate.Fields("", map[string]string{"strength": "Strength", "safety": "Safety"}))
			}
			if w.Working < n.Pressure {
				continue
			}
			c.Wall, c.Pressure = w, w.Check(n.Pressure)
		}
		c.Tube, c.Bore.Chosen = t, t.ID()
		v, _ := Velocity(n.Flow, t.ID())
		c.Velocity = components.Within(v, n.Limit.Max, n.Limit.Rule)
		return c, nil
	}
	c.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "line.no-tube", c.Bore.Rule,
		"no %v carries %v at %v or less%v; run lines in parallel or use pipe", series, n.Flow, n.Limit.Max, pressureClause(n.Pressure))}
	return c, nil
}

func pressureClause(p units.Pressure) string {
	if p == 0 {
		return ""
	}
	return " and holds " + p.String()
}

func minBore(fn string, q units.Flow, l VelocityLimit) (units.Length, error) {
	if err := validate.Positive(fn, "Flow", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "Limit.Max", l.Max); err != nil {
		return 0, err
	}
	return MinBore(q, l.Max)
}

// HoseChoice is the hose size chosen for a flow.
type HoseChoice struct {
	Bore     components.Choice[units.Length]  // required inside diameter and the chosen size's nominal bore
	Size     components.HoseSize              // 0 when no size meets the need
	Velocity components.Check[units.Velocity] // the velocity in the chosen size against the limit
	Findings components.Findings
}

// SelectHose returns the smallest SAE J517 dash size (components.HoseSizes)
// whose nominal bore is at least MinBore(q, limit.Max), with the velocity in
// it. A hose's pressure rating depends on its type and size: check it with
// HoseRun.Assess. When no size is large enough, the choice comes back with
// size 0 and a finding. q and limit.Max must be finite and > 0.
func SelectHose(q units.Flow, limit VelocityLimit) (HoseChoice, error) {
	const fn = "line.SelectHose"
	d, err := minBore(fn, q, limit)
	if err != nil {
		return HoseChoice{}, err
	}
	sizes := components.HoseSizes()
	ch, err := sizes.Select(d)
	if err != nil {
		return HoseChoice{}, err
	}
	c := HoseChoice{Bore: ch}
	if !ch.OK() {
		c.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "line.no-hose", ch.Rule,
			"no %v carries %v at %v or less; run hoses in parallel", sizes.Name(), q, limit.Max)}
		return c, nil
	}
	c.Size, _ = components.HoseSizeOf(ch.Chosen)
	v, _ := Velocity(q, ch.Chosen)
	c.Velocity = components.Within(v, limit.Max, limit.Rule)
	return c, nil
}
