package line

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Start compares a path at its cold-start temperature with the same path at
// its running temperature.
type Start struct {
	Cold, Running PathDrop
	Ratio         float64 // Cold.Total / Running.Total
	Findings      components.Findings
}

// ColdStart returns the drop of path p at flow q with fluid f at the
// minimum start temperature cold and at the running temperature running
// (OilAt at each), so a designer sees what the first minutes ask of the
// pump and of every element: the drop, the regime of each pipe (cold oil
// is usually laminar, and a laminar drop rises in proportion to the
// viscosity), and every element that sees more than its rating or its
// bypass setting. Its findings are a cold-start note on the rise in drop,
// a note for each pipe whose regime changes between running and cold, and
// the cold path's own findings (a failed rating is a burst warning, a
// failed bypass setting a filter-bypass caution).
//
// cold must be at or below running; q and the path as Path.Drop needs them, and
// both temperatures within the fluid's curve and above its pour point. A
// flow so small that the running drop underflows to 0 leaves no ratio: the
// error names Ratio. Errors name ColdStart's parameters: cold or running for
// a temperature the fluid refuses, f.… for the fluid's data, p.Elements[i].…
// for the path.
func ColdStart(p Path, q units.Flow, f fluid.Fluid, cold, running units.Temperature) (Start, error) {
	const fn = "line.ColdStart"
	if err := validate.Finite(fn, "running", running); err != nil {
		return Start{}, err
	}
	if err := validate.InRange(fn, "cold", cold, 0, running); err != nil {
		return Start{}, err
	}
	oc, err := OilAt(f, cold)
	if err != nil {
		return Start{}, validate.Renamed(err, fn, validate.Fields("", map[string]string{"t": "cold"}))
	}
	or, err := OilAt(f, running)
	if err != nil {
		return Start{}, validate.Renamed(err, fn, validate.Fields("", map[string]string{"t": "running"}))
	}
	var s Start
	if s.Cold, err = p.Drop(q, oc); err != nil {
		return Start{}, validate.Renamed(err, fn, pathFields)
	}
	if s.Running, err = p.Drop(q, or); err != nil {
		return Start{}, validate.Renamed(err, fn, pathFields)
	}
	if s.Ratio, err = validate.Checked(fn, "Ratio", float64(s.Cold.Total/s.Running.Total)); err != nil {
		return Start{}, err // both drops underflowed to 0
	}
	s.Findings = components.Findings{components.NewFinding(components.Notice, components.ColdStart,
		"line.cold-drop", components.PhysicsRule("Darcy–Weisbach at the oil's viscosity at each temperature"),
		"at %v the path %v drops %v, %v times its %v at %v",
		cold, pathName(p), s.Cold.Total, s.Ratio, s.Running.Total, running)}
	for i, c := range s.Cold.Elements {
		if r := s.Running.Elements[i]; c.Regime != r.Regime && c.Friction > 0 {
			s.Findings = s.Findings.Merge(components.NewFinding(components.Notice, components.ColdStart,
				"line.cold-regime", components.OurRule("laminar at or below Re 2000, turbulent from Re 4000"),
				"the flow in %v is %v when cold (Re %v) and %v when running (Re %v)",
				c.Name, c.Regime.String(), c.Reynolds, r.Regime.String(), r.Reynolds))
		}
	}
	s.Findings = s.Findings.Merge(s.Cold.Findings...)
	return s, nil
}

// pathFields maps the parameters of Path.Drop to ColdStart's: q stays q, a
// field of the path goes under p.
var pathFields = validate.Fields("p.", map[string]string{"q": "q"})

func pathName(p Path) string {
	if p.Name == "" {
		return "(unnamed)"
	}
	return p.Name
}
