package pump

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// DefaultMargin is the margin [Size] puts on the computed flow and pressure
// when the caller gives none: 25 %, the middle of the 20–30 % by which
// pumps are commonly rated above the computed duty (common practice).
const DefaultMargin = 0.25

// r20 holds the ISO 3 R20 preferred numbers of one decade, as the standard
// rounds them.
var r20 = [...]float64{1, 1.12, 1.25, 1.4, 1.6, 1.8, 2, 2.24, 2.5, 2.8, 3.15, 3.55, 4, 4.5, 5, 5.6, 6.3, 7.1, 8, 9}

// CommonDisplacements returns the series Size uses when the caller gives
// none: displacements from 1 to 1000 cm³/rev on the ISO 3 R20 preferred
// numbers (1, 1.12, 1.25, 1.4, 1.6, 1.8, 2, 2.24, 2.5, 2.8, 3.15, 3.55, 4,
// 4.5, 5, 5.6, 6.3, 7.1, 8, 9 and their decades). Pump makers' frame
// sizes mostly lie on these numbers (28, 45, 71, 140, 180, 250 cm³/rev …):
// that is common practice, not a standard for pumps, so check the chosen
// size against the maker's list and pass that list where it is known.
func CommonDisplacements() components.Series[units.Displacement] { return commonDisplacements }

// commonDisplacements is built once; a Series is immutable.
var commonDisplacements = buildCommonDisplacements()

func buildCommonDisplacements() components.Series[units.Displacement] {
	sizes := make([]units.Displacement, 0, 3*len(r20)+1)
	for _, decade := range []float64{1, 10, 100} {
		for _, r := range r20 {
			sizes = append(sizes, units.Displacement(r*decade)*units.CubicCentimetrePerRevolution)
		}
	}
	sizes = append(sizes, 1000*units.CubicCentimetrePerRevolution)
	s, _ := components.NewSeries("ISO 3 R20 pump displacements, 1–1000 cm³/rev",
		components.PracticeRule("pump frame sizes on the ISO 3 R20 preferred numbers"), sizes, nil)
	return s
}

// Need is the duty a pump is sized for.
type Need struct {
	Flow       units.Flow            // the computed flow the circuit takes at once (required, > 0)
	Pressure   units.Pressure        // the computed pump outlet pressure: load plus losses (required, > 0)
	Speed      units.RotationalSpeed // the drive speed, e.g. an electric motor's full-load speed (required, > 0)
	Volumetric float64               // expected volumetric efficiency at Pressure, in (0, 1]

	// Margin is the fraction added to Flow and Pressure (0.25 for 25 %),
	// from 0 to 1. Nil selects DefaultMargin (common practice); set it,
	// even to zero, to use your own: new(0.1).
	Margin *float64
	// Displacements is the list to choose from, a maker's frame sizes;
	// the zero Series selects CommonDisplacements.
	Displacements components.Series[units.Displacement]
}

// Sizing is the pump to ask for: the computed duty, the margin put on it
// and where the margin comes from, the rated flow and pressure, the
// displacement those need and the standard displacement chosen.
type Sizing struct {
	Flow, RatedFlow         units.Flow     // computed flow; Flow·(1 + Margin)
	Pressure, RatedPressure units.Pressure // computed pressure; Pressure·(1 + Margin), the continuous rating to ask for
	Margin                  float64        // the margin used, always reported
	MarginRule              components.Rule

	// Displacement is the choice from the list: Required is
	// RatedFlow/(Speed·Volumetric), Chosen the next size at or above it
	// (0 with a finding when the list has none that large).
	Displacement components.Choice[units.Displacement]
	Delivered    units.Flow // what the chosen size delivers at Speed: D·n·η_v
	Findings     components.Findings
}

// Size returns the pump for a duty: rated flow and pressure with the
// margin on both, the displacement needed for the rated flow at the speed,
// D = Q_rated/(n·η_v), and the next size at or above it from the list. A
// duty beyond the list's largest size is not an error: the choice comes
// back with Chosen 0 and a finding. Errors match units.ErrRange and name
// the field.
func Size(n Need) (Sizing, error) {
	const fn = "pump.Size"
	if err := validate.Positive(fn, "Flow", n.Flow); err != nil {
		return Sizing{}, err
	}
	if err := validate.Positive(fn, "Pressure", n.Pressure); err != nil {
		return Sizing{}, err
	}
	if err := validate.Positive(fn, "Speed", n.Speed); err != nil {
		return Sizing{}, err
	}
	if err := efficiency(fn, "Volumetric", n.Volumetric); err != nil {
		return Sizing{}, err
	}
	margin, rule, err := marginOf(fn, n.Margin)
	if err != nil {
		return Sizing{}, err
	}
	s := Sizing{Flow: n.Flow, Pressure: n.Pressure, Margin: margin, MarginRule: rule,
		RatedFlow: units.Flow(float64(n.Flow) * (1 + margin)), RatedPressure: units.Pressure(float64(n.Pressure) * (1 + margin))}
	if err := validate.Result(fn, "RatedFlow", s.RatedFlow); err != nil {
		return Sizing{}, err
	}
	if err := validate.Result(fn, "RatedPressure", s.RatedPressure); err != nil {
		return Sizing{}, err
	}
	d, err := DisplacementFor(s.RatedFlow, n.Speed, n.Volumetric)
	if err != nil {
		return Sizing{}, validate.Renamed(err, fn, validate.Param("Displacement"))
	}
	list := n.Displacements
	if list.Len() == 0 {
		list = CommonDisplacements()
	}
	if s.Displacement, err = list.Select(d); err != nil {
		return Sizing{}, validate.Renamed(err, fn, validate.Param("Displacement"))
	}
	if !s.Displacement.OK() {
		s.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "pump.size-beyond-list",
			list.Rule(), "no displacement of %v reaches the %v needed: use a faster drive, two pumps, or a larger frame",
			list.Name(), d)}
		return s, nil
	}
	s.Delivered = units.Flow(float64(s.Displacement.Chosen.TimesSpeed(n.Speed)) * n.Volumetric)
	return s, nil
}

// marginOf returns the margin to use and its rule: DefaultMargin for nil.
func marginOf(fn string, m *float64) (float64, components.Rule, error) {
	if m == nil {
		return DefaultMargin, components.PracticeRule("pump rated 20–30 % above the computed flow and pressure"), nil
	}
	if err := validate.InRange(fn, "Margin", *m, 0, 1); err != nil {
		return 0, components.Rule{}, err
	}
	return *m, components.CallerRule("Margin"), nil
}
