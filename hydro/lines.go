package hydro

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/line"
	"github.com/hydrosize/hydrosize/units"
)

// lineRun is one line of the circuit: where it runs, the flow it is sized
// for and the bore chosen.
type lineRun struct {
	name    string
	service string // "suction", "pressure", "return", "work"
	length  units.Length
	bends   int
	limit   line.VelocityLimit
	hold    units.Pressure // pressure its wall must hold; 0 for suction and return
	flow    units.Flow     // the highest flow over the cycle

	bore     components.Choice[units.Length]
	velocity components.Check[units.Velocity]
	rating   components.Check[units.Pressure]
	size     string
	inner    units.Length // the chosen bore; 0 when none is large enough
	findings components.Findings
	els      []line.Element // the line's pipe and fittings, for the drops
	tube     namedTube      // the last tube chosen

	chosen    bool     // the line has been chosen for need
	chosenFor lineNeed // the need of the last choice
}

// lineNeed is what a line's choice depends on besides its fixed route and
// limit: the flow and the pressure its wall must hold.
type lineNeed struct {
	flow units.Flow
	hold units.Pressure
}

// choose picks the tube or hose for the line's flow and builds its
// elements; it reports whether the elements changed. A line whose need is
// the same as at its last choice keeps that choice (the choice depends on
// nothing else), so the passes do not repeat it.
func (z *sizer) choose(l *lineRun) (bool, error) {
	need := lineNeed{l.flow, l.hold}
	if l.chosen && l.chosenFor == need {
		return false, nil
	}
	first, inner, size := !l.chosen, l.inner, l.size
	if err := z.chooseFor(l); err != nil {
		return false, err
	}
	l.chosen, l.chosenFor = true, need
	if !first && l.inner == inner && l.size == size {
		return false, nil
	}
	l.els = l.elements()
	return true, nil
}

// chooseFor picks the tube or hose for the line's flow.
func (z *sizer) chooseFor(l *lineRun) error {
	l.inner, l.size, l.findings = 0, "", nil
	if l.flow <= 0 {
		return nil
	}
	hose := z.spec.Circuit.Conductor == "hose"
	if !hose {
		ok, err := z.chooseTube(l)
		if err != nil || ok {
			return err
		}
		hose = true // no tube of the series is large enough: take hose (or pipe)
	}
	if hose {
		h, err := line.SelectHose(l.flow, l.limit)
		if err != nil {
			return err
		}
		l.bore, l.velocity, l.findings = h.Bore, h.Velocity, h.Findings
		if h.Size != 0 {
			l.inner, l.size = h.Bore.Chosen, "hose "+h.Size.String()
		}
		if l.hold > 0 {
			a, err := line.HoseRun{Name: l.name, Pressure: l.hold, NearPeople: true}.Assess()
			if err != nil {
				return err
			}
			l.findings = l.findings.Merge(a.Findings...)
		}
	}
	return nil
}

// chooseTube picks the tube for the line; false when none is large enough.
func (z *sizer) chooseTube(l *lineRun) (bool, error) {
	class := components.LightTube
	if l.hold > 0 {
		class = components.HeavyTube
	}
	n := line.TubeNeed{Flow: l.flow, Limit: l.limit, Class: class}
	if l.hold > 0 {
		n.Pressure, n.Strength, n.Safety = l.hold, tubeStrength, tubeSafety
	}
	t, err := line.SelectTube(n)
	if err != nil {
		return false, err
	}
	l.bore, l.velocity, l.rating, l.findings = t.Bore, t.Velocity, t.Pressure, t.Findings
	if t.Bore.OK() {
		if l.tube.size == "" || l.tube.tube != t.Tube {
			l.tube = namedTube{t.Tube, "tube " + t.Tube.String()}
		}
		l.inner, l.size = t.Tube.ID(), l.tube.size
	}
	return t.Bore.OK(), nil
}

// namedTube is a tube with its name in the bill, written when the tube is
// chosen and kept while it stays chosen.
type namedTube struct {
	tube components.Tube
	size string
}

// elements are the line's pipe and bends (and its entrance or exit).
func (l *lineRun) elements() []line.Element {
	if l.inner == 0 {
		return nil
	}
	rough := line.DrawnTubing
	if l.size != "" && l.size[0] == 'h' {
		rough = 0 // a hose bore is taken as smooth
	}
	els := make([]line.Element, 0, 3)
	if l.service == "suction" {
		els = append(els, line.Fitting{Name: "tank outlet", Kind: line.Entrance, Bore: l.inner})
	}
	els = append(els, line.Pipe{Name: l.name, Length: l.length, Bore: l.inner, Roughness: rough})
	if l.bends > 0 {
		els = append(els, line.Fitting{Name: l.name + " bends", Kind: line.Elbow90, Bore: l.inner, Count: l.bends})
	}
	if l.service == "return" {
		els = append(els, line.Fitting{Name: "tank inlet", Kind: line.Exit, Bore: l.inner})
	}
	return els
}

// drop is the pressure drop of a path of elements at flow q with the oil of
// the pass (line.Path.TotalDrop); zero for no flow or no elements.
func (z *sizer) drop(els []line.Element, q units.Flow) (units.Pressure, error) {
	if q <= 0 || len(els) == 0 {
		return 0, nil
	}
	return line.Path{Elements: els}.TotalDrop(q, z.oil)
}

// valveElement is the directional valve of size i as a rated element, one
// way through it (P→A or B→T).
func valveElement(name string, i int) line.Element {
	if i < 0 {
		return nil
	}
	return line.Rated{Name: name, Drop: valveDrop, Flow: valveSizes[i].flow}
}

// pickValve returns the smallest valve size whose listed flow covers q, or
// −1.
func pickValve(q units.Flow) int {
	for i, v := range valveSizes {
		if v.flow >= q {
			return i
		}
	}
	return -1
}

// filterElement is a filter of rated flow q as a rated element: its clean
// drop scales with flow and viscosity (line.Viscous), held against the
// bypass setting.
func filterElement(name string, q units.Flow, bypass units.Pressure) line.Element {
	return line.Rated{Name: name, Drop: filterDrop, Flow: q, Law: line.Viscous, Viscosity: filterViscosity, Bypass: bypass}
}

// pickFilter returns the smallest filter rated flow at which q loads it no
// more than filterLoad, or 0.
func pickFilter(q units.Flow) units.Flow {
	for _, f := range filterFlows {
		if r := units.Flow(f) * units.LitrePerMinute; float64(q) <= filterLoad*float64(r) {
			return r
		}
	}
	return 0
}

// nonNil drops the nil elements of a path.
func nonNil(els ...line.Element) []line.Element {
	out := els[:0:0]
	for _, e := range els {
		if e != nil {
			out = append(out, e)
		}
	}
	return out
}
