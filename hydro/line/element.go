package line

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Typical absolute roughness of line walls, for Pipe.Roughness. Typical
// values as fluid mechanics texts tabulate them beside the Moody chart
// (e.g. White, Fluid Mechanics, table of wall roughness, from memory); a
// used or corroded line is rougher.
const (
	DrawnTubing     units.Length = 1.5e-6 // cold-drawn steel, copper and brass tube: 1.5 µm
	CommercialSteel units.Length = 45e-6  // commercial steel or wrought iron pipe: 0.045 mm
)

// Element is one part of a Path that oil flows through: a Pipe, a Fitting
// or a Rated component. The interface is sealed: only this package's types
// implement it.
type Element interface {
	loss(q units.Flow, o Oil) (ElementDrop, error)
	label() string
}

// ElementDrop is the pressure drop across one element of a path and what
// it was computed from.
type ElementDrop struct {
	Name     string
	Drop     units.Pressure // across the element (capped at the bypass setting when it bypasses)
	Inlet    units.Pressure // gauge pressure at the element's inlet: the path's outlet plus every drop from here on
	Velocity units.Velocity // mean velocity in the bore (0 for a Rated component)
	Reynolds float64        // 0 for a Rated component
	Regime   Regime         // 0 for a Rated component
	Friction float64        // Darcy friction factor of a Pipe; 0 otherwise
	K        float64        // total loss coefficient of a Fitting (K × count); 0 otherwise
	Bypassed bool           // a Rated component's own drop reached its bypass setting
	Rule     components.Rule
}

// Pipe is a straight run of tube, pipe or hose of one bore. Its drop is
// Darcy–Weisbach: Δp = f·(L/D)·ρ·v²/2 with f from FrictionFactor.
type Pipe struct {
	Name      string
	Length    units.Length // > 0
	Bore      units.Length // inside diameter, > 0
	Roughness units.Length // absolute wall roughness ε; 0 is hydraulically smooth (see DrawnTubing)
}

func (p Pipe) label() string { return p.Name }

func (p Pipe) loss(q units.Flow, o Oil) (ElementDrop, error) {
	const fn = "line.Pipe"
	if err := validate.Positive(fn, "Length", p.Length); err != nil {
		return ElementDrop{}, err
	}
	if err := validate.Positive(fn, "Bore", p.Bore); err != nil {
		return ElementDrop{}, err
	}
	if err := validate.InRange(fn, "Roughness", p.Roughness, 0, units.Length(MaxRelativeRoughness)*p.Bore); err != nil {
		return ElementDrop{}, err
	}
	d, err := flowIn(fn, q, p.Bore, o)
	if err != nil {
		return ElementDrop{}, err
	}
	d.Name = p.Name
	d.Friction, err = FrictionFactor(d.Reynolds, float64(p.Roughness/p.Bore))
	if err != nil {
		return ElementDrop{}, err
	}
	d.Drop = units.Pressure(d.Friction * float64(p.Length/p.Bore) * float64(velocityHead(o.Density, d.Velocity)))
	d.Rule = components.PhysicsRule("Darcy–Weisbach, f by Colebrook–White (64/Re laminar)")
	if err := validate.Result(fn, "drop", d.Drop); err != nil {
		return ElementDrop{}, err
	}
	return d, nil
}

// flowIn fills velocity, Reynolds number and regime of flow q in bore.
func flowIn(fn string, q units.Flow, bore units.Length, o Oil) (ElementDrop, error) {
	v, err := Velocity(q, bore)
	if err != nil {
		return ElementDrop{}, err
	}
	re, err := Reynolds(v, bore, o.Viscosity)
	if err != nil {
		return ElementDrop{}, err
	}
	if !(re > 0) {
		return ElementDrop{}, validate.Fail(fn, "q", q, "large enough for a Reynolds number above 0")
	}
	return ElementDrop{Velocity: v, Reynolds: re, Regime: RegimeOf(re)}, nil
}

// Fitting is a minor loss: an elbow, tee, valve, entrance or exit in a
// bore, with loss Δp = K·n·ρ·v²/2 for n fittings of loss coefficient K.
// Leave K at 0 to take it from Kind (FittingKind.K, Crane TP-410); set K
// (and Rule) to use a maker's or your own coefficient. K factors are
// measured in turbulent flow: in laminar flow (cold oil) the real loss is
// higher, and Path.Drop says so in a finding.
type Fitting struct {
	Name  string
	Kind  FittingKind
	K     float64         // loss coefficient of one fitting; 0 means Kind's
	Rule  components.Rule // where K comes from when it is set
	Bore  units.Length    // inside diameter the velocity is taken in
	Count int             // number of such fittings; 0 means 1
}

func (f Fitting) label() string { return f.Name }

func (f Fitting) loss(q units.Flow, o Oil) (ElementDrop, error) {
	const fn = "line.Fitting"
	if err := validate.Positive(fn, "Bore", f.Bore); err != nil {
		return ElementDrop{}, err
	}
	if f.Count < 0 {
		return ElementDrop{}, validate.Fail(fn, "Count", float64(f.Count), "≥ 0 (0 means 1)")
	}
	k, rule := f.K, f.Rule
	if k == 0 {
		var err error
		if k, rule, err = f.Kind.K(f.Bore); err != nil {
			return ElementDrop{}, validate.Renamed(err, fn, validate.Fields("", map[string]string{"kind": "Kind", "bore": "Bore"}))
		}
	} else if err := validate.InRange(fn, "K", k, 0, 1e4); err != nil {
		return ElementDrop{}, err
	} else if rule.Kind == components.Unstated {
		rule = components.CallerRule("Fitting.K")
	}
	n := float64(max(f.Count, 1))
	d, err := flowIn(fn, q, f.Bore, o)
	if err != nil {
		return ElementDrop{}, err
	}
	d.Name, d.K, d.Rule = f.Name, k*n, rule
	d.Drop = units.Pressure(d.K * float64(velocityHead(o.Density, d.Velocity)))
	if err := validate.Result(fn, "drop", d.Drop); err != nil {
		return ElementDrop{}, err
	}
	return d, nil
}

// Law is how a Rated component's pressure drop scales with flow.
type Law uint8

// Scaling laws. The zero Law is Orifice.
const (
	// Orifice: Δp = Δp₀·(Q/Q₀)²·(ρ/ρ₀), the square law of turbulent flow
	// through an orifice, as for valves, coolers and fittings at their
	// rated flow (the orifice equation; common practice for scaling a
	// data-sheet point).
	Orifice Law = iota
	// Viscous: Δp = Δp₀·(Q/Q₀)·(ν·ρ)/(ν₀·ρ₀), linear in flow and dynamic
	// viscosity, as for the medium of a filter element (Darcy's law of
	// flow through porous media; common practice for element Δp curves,
	// which makers give at a stated viscosity).
	Viscous
)

// String returns "orifice" or "viscous".
func (l Law) String() string {
	switch l {
	case Orifice:
		return "orifice"
	case Viscous:
		return "viscous"
	}
	return "Law(invalid)"
}

// rule is the rule of a Rated element's drop scaled by the law.
func (l Law) rule() components.Rule {
	if l == Viscous {
		return components.CallerRule("Rated.Drop at Rated.Flow, scaled by the viscous law")
	}
	return components.CallerRule("Rated.Drop at Rated.Flow, scaled by the orifice law")
}

// Rated is a component known by one point of its data sheet's Δp–Q curve
// (a directional valve, a filter, a cooler, a check valve): drop Drop at
// flow Flow, with the test fluid's viscosity and density where the data
// sheet gives them. Its drop at another flow follows Law. Rating and
// Bypass, when set, are checked by Path.Drop.
type Rated struct {
	Name      string
	Drop      units.Pressure           // Δp₀ from the data sheet, > 0
	Flow      units.Flow               // Q₀, the flow Δp₀ is given at, > 0
	Law       Law                      // how Δp scales with flow (Orifice by default)
	Viscosity units.KinematicViscosity // ν₀ of the test fluid; 0 leaves viscosity out of the scaling
	Density   units.Density            // ρ₀ of the test fluid; 0 leaves density out of the scaling
	Rating    units.Pressure           // highest gauge pressure allowed at the inlet (a filter bowl, a cooler core); 0 for none
	Bypass    units.Pressure           // Δp at which a built-in bypass valve opens; 0 for none
}

func (r Rated) label() string { return r.Name }

func (r Rated) loss(q units.Flow, o Oil) (ElementDrop, error) {
	const fn = "line.Rated"
	if err := r.check(fn); err != nil {
		return ElementDrop{}, err
	}
	if err := validate.NonNegative(fn, "q", q); err != nil {
		return ElementDrop{}, err
	}
	ratio := float64(q / r.Flow)
	var scale float64
	switch r.Law {
	case Orifice:
		scale = ratio * ratio
		if r.Density > 0 {
			scale *= float64(o.Density / r.Density)
		}
	case Viscous:
		scale = ratio
		if r.Viscosity > 0 {
			scale *= float64(o.Viscosity / r.Viscosity)
		}
		if r.Density > 0 {
			scale *= float64(o.Density / r.Density)
		}
	}
	d := ElementDrop{Name: r.Name, Drop: r.Drop * units.Pressure(scale), Rule: r.Law.rule()}
	if err := validate.Result(fn, "drop", d.Drop); err != nil {
		return ElementDrop{}, err
	}
	return d, nil
}

func (r Rated) check(fn string) error {
	if err := validate.Positive(fn, "Drop", r.Drop); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Flow", r.Flow); err != nil {
		return err
	}
	if r.Law > Viscous {
		return validate.Fail(fn, "Law", float64(r.Law), "Orifice or Viscous")
	}
	for _, c := range []struct {
		name string
		v    float64
	}{{"Viscosity", float64(r.Viscosity)}, {"Density", float64(r.Density)}, {"Rating", float64(r.Rating)}, {"Bypass", float64(r.Bypass)}} {
		if err := validate.NonNegative(fn, c.name, c.v); err != nil {
			return err
		}
	}
	return nil
}

// capped returns the element's drop limited by a bypass valve that opens at
// setting (0 for none), and whether it opened. The bypass valve's own
// override above its cracking setting is not modelled.
func capped(drop, setting units.Pressure) (units.Pressure, bool) {
	if setting > 0 && drop > setting {
		return setting, true
	}
	return drop, false
}
