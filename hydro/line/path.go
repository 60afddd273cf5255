package line

import (
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Path is a run of elements that one flow passes through in order, from its
// upstream end to its downstream end: pump to actuator, or actuator back to
// the reservoir. A cylinder changes the flow (by its area ratio) and the
// pressure, so the supply and the return side of an actuator are two paths.
type Path struct {
	Name     string
	Elements []Element
	// Outlet is the gauge pressure at the downstream end: 0 for a path
	// that ends in the reservoir above the oil, the actuator's working
	// pressure for a supply path. Inlet pressures and ratings are checked
	// against it.
	Outlet units.Pressure
}

// PathDrop is the pressure budget of a path at one flow and oil state.
type PathDrop struct {
	Name     string
	Flow     units.Flow
	Oil      Oil
	Elements []ElementDrop                      // in path order
	Total    units.Pressure                     // sum of the element drops
	Checks   []components.Check[units.Pressure] // each Rated element's rating and bypass setting
	Findings components.Findings
}

// Inlet returns the gauge pressure at the path's upstream end: its outlet
// pressure plus the total drop.
func (d PathDrop) Inlet() units.Pressure {
	if len(d.Elements) == 0 {
		return 0
	}
	return d.Elements[0].Inlet
}

// Power returns the hydraulic power the path turns into heat: P = Δp·Q.
func (d PathDrop) Power() units.Power { return d.Total.TimesFlow(d.Flow) }

// Drop returns the pressure drop of every element of the path at flow q
// with oil state o, their total, and the gauge pressure at each element's
// inlet (the path's Outlet plus every drop downstream of it, the element's
// own included). A Rated element whose own drop exceeds its Bypass setting
// is taken at that setting and marked Bypassed; one whose inlet pressure
// exceeds its Rating fails that check. Findings report a failed check, a
// pipe in the transition band (its drop computed as turbulent) and a
// fitting in laminar flow (its K factor understates the loss).
//
// q must be finite and > 0, o's viscosity and density > 0, and the path
// must have at least one element; an error about an element names it as
// Elements[i] and matches units.ErrRange.
func (p Path) Drop(q units.Flow, o Oil) (PathDrop, error) {
	const fn = "line.Path.Drop"
	if err := p.check(fn, q, o); err != nil {
		return PathDrop{}, err
	}
	out := PathDrop{Name: p.Name, Flow: q, Oil: o, Elements: make([]ElementDrop, len(p.Elements))}
	own := make([]units.Pressure, len(p.Elements))
	total, err := p.sum(fn, q, o, func(i int, d ElementDrop, ownDrop units.Pressure) {
		if d.Name == "" {
			d.Name = "element " + strconv.Itoa(i+1)
		}
		out.Elements[i], own[i] = d, ownDrop
	})
	if err != nil {
		return PathDrop{}, err
	}
	out.Total = total
	at := p.Outlet
	for i := len(out.Elements) - 1; i >= 0; i-- {
		at += out.Elements[i].Drop
		out.Elements[i].Inlet = at
	}
	for i, e := range p.Elements {
		out.assess(e, out.Elements[i], own[i])
	}
	if len(out.Findings) > 1 { // merged once, not one by one
		out.Findings = components.Findings(nil).Merge(out.Findings...)
	}
	return out, nil
}

// TotalDrop returns the path's total drop at flow q with oil state o: the
// Total that [Path.Drop] returns, from the same element drops in the same
// order (a Rated element taken at most at its Bypass setting), with the
// same errors, but without the element breakdown, checks or findings. It
// allocates nothing, for a sizing loop that needs only the total.
func (p Path) TotalDrop(q units.Flow, o Oil) (units.Pressure, error) {
	const fn = "line.Path.TotalDrop"
	if err := p.check(fn, q, o); err != nil {
		return 0, err
	}
	return p.sum(fn, q, o, nil)
}

// check validates the flow, the oil and the path for fn.
func (p Path) check(fn string, q units.Flow, o Oil) error {
	if err := validate.Positive(fn, "q", q); err != nil {
		return err
	}
	if err := o.check(fn); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "Outlet", p.Outlet); err != nil {
		return err
	}
	if len(p.Elements) == 0 {
		return validate.Fail(fn, "Elements", 0.0, "at least one element")
	}
	return nil
}

// sum adds up the elements' drops at flow q, each Rated element's capped at
// its bypass setting, and hands each element's drop (with its own drop
// before the cap) to each when each is not nil.
func (p Path) sum(fn string, q units.Flow, o Oil, each func(i int, d ElementDrop, own units.Pressure)) (units.Pressure, error) {
	var total units.Pressure
	for i, e := range p.Elements {
		if e == nil {
			return 0, validate.Fail(fn, "Elements["+strconv.Itoa(i)+"]", 0.0, "a Pipe, Fitting or Rated element, not nil")
		}
		d, err := e.loss(q, o)
		if err != nil {
			return 0, nameElement(fn, err, i)
		}
		own := d.Drop
		if r, ok := e.(Rated); ok {
			d.Drop, d.Bypassed = capped(d.Drop, r.Bypass)
		}
		if each != nil {
			each(i, d, own)
		}
		total += d.Drop
	}
	if err := validate.Result(fn, "Total", total); err != nil {
		return 0, err
	}
	return total, nil
}

// nameElement names fn in a range error and prefixes its parameter with
// Elements[i].
func nameElement(fn string, err error, i int) error {
	return validate.Renamed(err, fn, validate.Fields("Elements["+strconv.Itoa(i)+"].", nil))
}

// assess adds the checks and findings of one element; Drop merges the
// findings once all are in.
func (d *PathDrop) assess(e Element, ed ElementDrop, own units.Pressure) {
	switch e := e.(type) {
	case Rated:
		if e.Bypass > 0 {
			c := components.Within(own, e.Bypass, components.CallerRule(ed.Name+": bypass setting"))
			d.Checks = append(d.Checks, c)
			if !c.OK() {
				d.Findings = append(d.Findings, components.NewFinding(components.Caution, components.FilterBypass,
					"line.bypass", c.Rule, "%v would drop %v at this flow, above its bypass setting of %v: the bypass opens and unfiltered oil passes",
					ed.Name, own, e.Bypass))
			}
		}
		if e.Rating > 0 {
			c := components.Within(ed.Inlet, e.Rating, components.CallerRule(ed.Name+": pressure rating"))
			d.Checks = append(d.Checks, c)
			if !c.OK() {
				d.Findings = append(d.Findings, components.NewFinding(components.Warning, components.Burst,
					"line.rating", c.Rule, "%v sees %v at its inlet, above its rating of %v: it can burst",
					ed.Name, ed.Inlet, e.Rating))
			}
		}
	case Pipe:
		if ed.Regime == Transitional {
			d.Findings = append(d.Findings, components.NewFinding(components.Notice, components.NoHazard,
				"line.transitional", components.OurRule("transition band taken as turbulent"),
				"the flow in %v is transitional (Re %v): its drop is taken as turbulent and may be lower", ed.Name, ed.Reynolds))
		}
	case Fitting:
		if ed.Regime == Laminar {
			d.Findings = append(d.Findings, components.NewFinding(components.Notice, components.NoHazard,
				"line.fitting-laminar", ed.Rule,
				"the flow through %v is laminar (Re %v): its K factor is for turbulent flow and understates the loss", ed.Name, ed.Reynolds))
		}
	}
}
