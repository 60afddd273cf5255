package actuator

import (
	"math"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Defaults for the optional fields of a [Duty].
const (
	// DefaultSealEfficiency is the share of the ideal force p·A left at the
	// rod after seal friction when Duty.SealEfficiency is 0: 0.90, a 10 %
	// friction allowance (common practice; low-friction seal sets do
	// better, worn or cold ones worse: use the maker's figure when known).
	DefaultSealEfficiency = 0.90
	// DefaultAreaRatio is the least cap-to-annulus area ratio φ when
	// Duty.AreaRatio is 0: 1.25, a rod of at least 0.447 × bore (our
	// choice: the smallest rod ratio commonly offered with a bore).
	DefaultAreaRatio = 1.25
)

// Duty is what one stroke of a cylinder must do, the input to sizing. The
// load moves along a straight guide at InclineDegrees above horizontal in
// the direction of the stroke: positive raises the load, negative lowers
// it, 90 is a vertical lift, 0 a horizontal slide.
//
// Optional fields are marked; their zero value means "not present" or the
// documented default.
type Duty struct {
	Direction      Direction      // Extend pushes the load, Retract pulls it
	Force          units.Force    // process force at the rod (pressing, clamping, cutting), ≥ 0
	Mass           units.Mass     // moving mass: load, rod and piston, ≥ 0 (optional)
	InclineDegrees float64        // angle of travel above horizontal, −90 to 90 (optional)
	Friction       float64        // coefficient of friction of the load on its guide, ≥ 0 (optional)
	Speed          units.Velocity // speed the load is brought to, ≥ 0 (optional)
	AccelDistance  units.Length   // distance in which the load reaches Speed (optional; or AccelTime)
	AccelTime      time.Duration  // time in which the load reaches Speed (optional; or AccelDistance)
	Pressure       units.Pressure // pressure available at the inlet port for this stroke, > 0
	BackPressure   units.Pressure // pressure on the outlet side (return line, meter-out), ≥ 0 (optional)
	SealEfficiency float64        // share of p·A left after seal friction, (0, 1]; 0 means DefaultSealEfficiency
	AreaRatio      float64        // least cap/annulus area ratio φ, > 1; 0 means DefaultAreaRatio
	Stroke         units.Length   // stroke of the cylinder, > 0
	Ends           RodEnds        // rod arrangement of the cylinder to choose
	Action         Action         // action of the cylinder to choose; a SingleActing one cannot size a Retract duty

	// Bores and Rods are the standard sizes to choose from; an empty
	// Series means ISO 3320 (components.ISO3320Bores, ISO3320Rods).
	// Pass components.InchBores for inch cylinders or a maker's own list.
	Bores, Rods components.Series[units.Length]

	// Buckling, when not nil, also checks the chosen rod for buckling at
	// full extension and picks a larger standard rod where it fails; see
	// [Column] for its fields (its Cylinder is filled in by sizing).
	Buckling *Column
}

// LoadForces breaks down the force a stroke needs at the rod, each term
// positive when it opposes the motion:
//
//	F = F_process + m·g·sin θ + μ·m·g·cos θ + m·a
//
// with θ the incline and a the acceleration: a = v²/(2s) over distance s,
// or a = v/t over time t (uniform acceleration from rest).
type LoadForces struct {
	Process      units.Force        // Duty.Force
	Gravity      units.Force        // m·g·sin θ: > 0 raising, < 0 lowering
	Friction     units.Force        // μ·m·g·cos θ
	Acceleration units.Force        // m·a
	Accel        units.Acceleration // a
}

// Total returns the sum of the four terms: the force the rod must deliver
// (plain arithmetic).
func (l LoadForces) Total() units.Force { return l.Process + l.Gravity + l.Friction + l.Acceleration }

// Forces returns the breakdown of the force the stroke needs at the rod.
// It validates the duty (see [Duty.Size]); errors match units.ErrRange
// and name the field.
func (d Duty) Forces() (LoadForces, error) {
	const fn = "actuator.Duty.Forces"
	if err := d.validate(fn); err != nil {
		return LoadForces{}, err
	}
	return d.loads(fn)
}

// loads returns the breakdown of the force, or an error naming the first
// term that overflows (a mass or friction coefficient so large that m·g·μ
// is not finite).
func (d Duty) loads(fn string) (LoadForces, error) {
	l := d.forces()
	if err := finite(fn, output{"Gravity", float64(l.Gravity)}, output{"Friction", float64(l.Friction)},
		output{"Accel", float64(l.Accel)}, output{"Acceleration", float64(l.Acceleration)},
		output{"Total", float64(l.Total())}); err != nil {
		return LoadForces{}, err
	}
	return l, nil
}

func (d Duty) forces() LoadForces {
	s, c := math.Sincos(d.InclineDegrees * math.Pi / 180)
	w := d.Mass.TimesAcceleration(units.StandardGravity)
	var a units.Acceleration
	switch {
	case d.AccelDistance > 0:
		a = units.Acceleration(float64(d.Speed) * float64(d.Speed) / (2 * float64(d.AccelDistance)))
	case d.AccelTime > 0:
		a = units.Acceleration(float64(d.Speed) / d.AccelTime.Seconds())
	}
	return LoadForces{
		Process:      d.Force,
		Gravity:      w * units.Force(s),
		Friction:     w * units.Force(d.Friction*c),
		Acceleration: d.Mass.TimesAcceleration(a),
		Accel:        a,
	}
}

func (d Duty) validate(fn string) error {
	if d.Direction > Retract {
		return validate.Fail(fn, "Duty.Direction", float64(d.Direction), "Extend or Retract")
	}
	checks := [...]struct {
		name string
		v    float64
	}{
		{"Duty.Force", float64(d.Force)}, {"Duty.Mass", float64(d.Mass)}, {"Duty.Friction", d.Friction},
		{"Duty.Speed", float64(d.Speed)}, {"Duty.AccelDistance", float64(d.AccelDistance)},
		{"Duty.BackPressure", float64(d.BackPressure)},
	}
	for _, c := range checks {
		if err := validate.NonNegative(fn, c.name, c.v); err != nil {
			return err
		}
	}
	if err := validate.InRange(fn, "Duty.InclineDegrees", d.InclineDegrees, -90, 90); err != nil {
		return err
	}
	if d.AccelTime < 0 {
		return &units.RangeError{Func: fn, Param: "Duty.AccelTime", Value: d.AccelTime.String(), Valid: "≥ 0"}
	}
	if d.AccelTime > 0 && d.AccelDistance > 0 {
		return &units.RangeError{Func: fn, Param: "Duty.AccelTime", Value: d.AccelTime.String(),
			Valid: "0 when Duty.AccelDistance is set (give one of the two)"}
	}
	if err := validate.Positive(fn, "Duty.Pressure", d.Pressure); err != nil {
		return err
	}
	if err := validate.InRange(fn, "Duty.SealEfficiency", d.SealEfficiency, 0, 1); err != nil {
		return err
	}
	if d.AreaRatio != 0 {
		if err := validate.InRange(fn, "Duty.AreaRatio", d.AreaRatio, 1.0001, 100); err != nil {
			return err
		}
	}
	if err := validate.Positive(fn, "Duty.Stroke", d.Stroke); err != nil {
		return err
	}
	if d.Ends > DoubleRod {
		return validate.Fail(fn, "Duty.Ends", float64(d.Ends), "SingleRod or DoubleRod")
	}
	if d.Action > SingleActing {
		return validate.Fail(fn, "Duty.Action", float64(d.Action), "DoubleActing or SingleActing")
	}
	if d.Action == SingleActing && d.Direction == Retract {
		return &units.RangeError{Func: fn, Param: "Duty.Direction", Value: "Retract",
			Valid: "Extend (a single-acting cylinder retracts under its load or a spring)"}
	}
	return nil
}

// efficiency returns the seal efficiency and its rule.
func (d Duty) efficiency() (float64, components.Rule) {
	if d.SealEfficiency == 0 {
		return DefaultSealEfficiency, components.PracticeRule("seal friction allowance 10 % (efficiency 0.90)")
	}
	return d.SealEfficiency, components.CallerRule("Duty.SealEfficiency")
}

// ratio returns the least area ratio and its rule.
func (d Duty) ratio() (float64, components.Rule) {
	if d.AreaRatio == 0 {
		return DefaultAreaRatio, components.OurRule("least area ratio 1.25 when none is given")
	}
	return d.AreaRatio, components.CallerRule("Duty.AreaRatio")
}

// MinimumBore returns the smallest bore that gives the stroke's total force
// (see [LoadForces]) at the available pressure, with the seal efficiency η
// and a rod that gives the least area ratio φ = A₁/A₂:
//
//	η·p·A_in − p_back·A_out ≥ F,  A₁ = F / (η·p·a_in − p_back·a_out),  D = √(4·A₁/π)
//
// where a_in, a_out are 1 for the cap side and 1/φ for an annulus side.
// Seal friction takes its share (1 − η) of the driving force p·A_in (the
// allowance grows with the working pressure, as seal friction does); the
// back pressure opposes the motion in full, friction never helping against
// it. It
// fails with an error matching units.ErrRange for a bad field (see
// [Duty.Size]), when the total force is not > 0 (a lowering stroke the load
// drives on its own has nothing to size: size the lifting stroke, and hold
// the lowering with a load-holding valve), and when the back pressure leaves
// no net force.
func (d Duty) MinimumBore() (units.Length, error) {
	const fn = "actuator.Duty.MinimumBore"
	if err := d.validate(fn); err != nil {
		return 0, err
	}
	l, err := d.loads(fn)
	if err != nil {
		return 0, err
	}
	return d.minimumBore(fn, l.Total())
}

func (d Duty) minimumBore(fn string, total units.Force) (units.Length, error) {
	if total <= 0 {
		return 0, &units.RangeError{Func: fn, Param: "Duty.Force", Value: "a total load force of " + total.String(),
			Valid: "a total force > 0 (the load drives this stroke on its own: size the opposite stroke)"}
	}
	eta, _ := d.efficiency()
	phi, _ := d.ratio()
	in, out := 1/phi, 1/phi
	switch {
	case d.Ends == DoubleRod:
	case d.Direction == Extend:
		in = 1
	default:
		out = 1
	}
	net := eta*float64(d.Pressure)*in - float64(d.BackPressure)*out
	if net <= 0 {
		return 0, validate.Fail(fn, "Duty.BackPressure", d.BackPressure,
			"< "+units.Pressure(eta*float64(d.Pressure)*in/out).String()+
				" (the inlet pressure after seal friction times the area ratio)")
	}
	return validate.Checked(fn, "bore", diameterOf(units.Area(float64(total)/net)))
}

// CylinderSize is the result of sizing a cylinder for a [Duty]: the forces,
// the computed minimum bore, the standard bore and rod chosen, the chosen
// cylinder, and the pressure it needs against the pressure available.
type CylinderSize struct {
	Forces   LoadForces
	Bore     components.Choice[units.Length] // Required is the minimum bore
	Rod      components.Choice[units.Length] // Required is the least rod for the area ratio (or buckling)
	Cylinder Cylinder                        // the chosen cylinder; zero when no standard size meets the duty

	// Pressure is the pressure the chosen cylinder needs at the inlet for
	// the total force, p = (F + p_back·A_out)/(η·A_in) (seal friction takes
	// its share of p·A_in; the back pressure opposes in full), held at most
	// at Duty.Pressure. When no standard size meets the duty it is the
	// failed check of the largest bore tried with its standard rod, or, when
	// no bore could be tried (the minimum bore is beyond the series, or no
	// rod fits), the check of the largest bore with a rod of exactly the
	// least area ratio.
	Pressure components.Check[units.Pressure]

	SealEfficiency float64         // η used
	SealRule       components.Rule // where η comes from
	AreaRatio      float64         // least φ used to choose the rod
	AreaRatioRule  components.Rule // where φ comes from

	Buckling *BucklingCheck // the buckling check of the chosen rod, when Duty.Buckling is set

	// Flow and ReturnFlow are the chosen cylinder's inlet and outlet flows
	// at Duty.Speed, v·A_in and v·A_out: what the pump and valve must
	// deliver and what the return path must pass (φ times the inlet flow
	// on a single-rod retract). Both are 0 without a speed or a cylinder;
	// ReturnFlow is 0 for a single-acting cylinder.
	Flow, ReturnFlow units.Flow

	Findings components.Findings
}

// Size sizes a cylinder for the duty: the total force (see [LoadForces]),
// the minimum bore ([Duty.MinimumBore]), then the smallest standard bore at
// or above it whose rod, the smallest standard rod giving at least the area
// ratio (and, with Duty.Buckling set, passing the buckling check), lets the
// cylinder deliver the force at the available pressure; and the pressure
// that cylinder actually needs.
//
// A requirement beyond the largest standard bore or rod is not an error:
// the result carries failed bore and rod choices (Chosen 0, OK false), a
// zero Cylinder and a finding (with the buckling warning when no standard
// rod passes the buckling check), so a report can show it beside the rest.
//
// The result's findings include the load-holding cautions: a load the stroke
// raises (its weight along the path exceeding its friction) would drive the
// cylinder back if pressure were lost, and a load the stroke lowers
// overruns it; both need a load-holding valve at the cylinder port
// (ISO 4413).
//
// Errors, for bad input only, match units.ErrRange and name the field:
// Force, Mass, Friction, Speed, AccelDistance, AccelTime and BackPressure
// must be finite and ≥ 0 (AccelDistance and AccelTime not both set);
// InclineDegrees from −90 to 90; Pressure and Stroke finite and > 0;
// SealEfficiency in (0, 1] or 0; AreaRatio above 1 (up to 100) or 0; the
// total force > 0; the back pressure below what leaves a net force.
func (d Duty) Size() (CylinderSize, error) {
	r, last, err := d.size("actuator.Duty.Size")
	if err != nil {
		return CylinderSize{}, err
	}
	var why components.Findings
	if r.Bore.Chosen == 0 {
		why = last.findings(rodsOr(d.Rods))
	}
	r.Findings = d.findings(r, boresOr(d.Bores), why)
	return r, nil
}

// Fit sizes the cylinder as [Duty.Size] does and returns the same result
// without its findings (Findings is nil), with the same errors, naming
// Fit. It is for a loop that sizes a duty again and again, as a coupled
// sizing does, and takes the findings from one call of Size at the end.
// It allocates nothing but the buckling check, when Duty.Buckling is set.
func (d Duty) Fit() (CylinderSize, error) {
	r, _, err := d.size("actuator.Duty.Fit")
	if err != nil {
		return CylinderSize{}, err
	}
	return r, nil
}

// Findings returns the findings [Duty.Size] gives for the duty with r, the
// sizing [Duty.Fit] returned for it: d.Size() is d.Fit() with Findings set
// to d.Findings(r). A loop that fits a duty again and again asks for the
// findings of its last fit alone, without sizing it once more (except when
// no size was found, where the warning of the last bore tried is worked
// out again). For an r that is not d's fit the findings say nothing
// useful.
func (d Duty) Findings(r CylinderSize) components.Findings {
	var why components.Findings
	if r.Bore.Chosen == 0 {
		if _, last, err := d.size("actuator.Duty.Findings"); err == nil {
			why = last.findings(rodsOr(d.Rods))
		}
	}
	return d.findings(r, boresOr(d.Bores), why)
}

// size sizes the cylinder for fn without the findings; last says why the
// last bore tried had no rod.
func (d Duty) size(fn string) (CylinderSize, noRod, error) {
	if err := d.validate(fn); err != nil {
		return CylinderSize{}, noRod{}, err
	}
	forces, err := d.loads(fn)
	if err != nil {
		return CylinderSize{}, noRod{}, err
	}
	r := CylinderSize{Forces: forces}
	r.SealEfficiency, r.SealRule = d.efficiency()
	r.AreaRatio, r.AreaRatioRule = d.ratio()
	if d.Buckling != nil {
		if err := d.Buckling.validateSetup(fn, "Duty.Buckling."); err != nil {
			return CylinderSize{}, noRod{}, err
		}
	}
	total := r.Forces.Total()
	minBore, err := d.minimumBore(fn, total)
	if err != nil {
		return CylinderSize{}, noRod{}, err
	}
	bores, rods := boresOr(d.Bores), rodsOr(d.Rods)
	r.Bore = components.Choice[units.Length]{Required: minBore, Series: bores.Name(), Rule: bores.Rule()}
	found, tried := false, false
	var last noRod // why the last bore tried had no rod
	for b := range bores.All() {
		if b < minBore {
			continue
		}
		f, ok := d.tryBore(b, rods, r.AreaRatio)
		if !ok {
			r.Rod, last = f.rod, f.none
			continue
		}
		p, err := d.needs(f.cyl, total, r.SealEfficiency)
		if err != nil {
			return CylinderSize{}, noRod{}, validate.Renamed(err, fn, nil)
		}
		r.Bore.Chosen, r.Rod, r.Cylinder, r.Buckling, last = b, f.rod, f.cyl, f.bk, noRod{}
		r.Pressure = components.Within(p, d.Pressure, components.CallerRule("Duty.Pressure"))
		tried = true
		if found = r.Pressure.OK(); found {
			break
		}
	}
	if !found {
		r.Bore.Chosen, r.Rod.Chosen, r.Cylinder, r.Buckling = 0, 0, Cylinder{}, nil
		if !tried {
			r.Pressure = d.largestNeeds(bores.Largest(), r.AreaRatio, total, r.SealEfficiency)
		}
	} else if d.Speed > 0 {
		r.Flow = d.Speed.TimesArea(r.Cylinder.Area(d.Direction))
		if d.Action == DoubleActing {
			r.ReturnFlow = d.Speed.TimesArea(r.Cylinder.OutletArea(d.Direction))
		}
		if err := finite(fn, output{"Flow", float64(r.Flow)}, output{"ReturnFlow", float64(r.ReturnFlow)}); err != nil {
			return CylinderSize{}, noRod{}, err
		}
	}
	return r, last, nil
}

// needs returns the inlet pressure cylinder c needs for total force f with
// seal efficiency eta: p = (F + p_back·A_out)/(η·A_in).
func (d Duty) needs(c Cylinder, f units.Force, eta float64) (units.Pressure, error) {
	const fn = "actuator.Duty.Size"
	p, err := c.PressureFor(d.Direction, f, d.BackPressure)
	if err != nil {
		return 0, err
	}
	return validate.Checked(fn, "p", p/units.Pressure(eta))
}

// largestNeeds returns the failed pressure check of a duty no standard size
// meets: the pressure the largest bore would need with a rod of exactly the
// least area ratio.
func (d Duty) largestNeeds(bore units.Length, phi float64, f units.Force, eta float64) components.Check[units.Pressure] {
	c := Cylinder{Bore: bore, Rod: bore * units.Length(math.Sqrt(1-1/phi)), Stroke: d.Stroke, Ends: d.Ends}
	p, err := d.needs(c, f, eta)
	if err != nil {
		p = units.Pressure(math.MaxFloat64) // beyond any finite limit: still a failed check
	}
	return components.Within(p, d.Pressure, components.CallerRule("Duty.Pressure"))
}

// boreFit is a bore with the rod chosen for it: the cylinder, the rod
// choice, the buckling check when one was asked for, and, when no rod fits
// the bore, why.
type boreFit struct {
	cyl  Cylinder
	rod  components.Choice[units.Length]
	bk   *BucklingCheck
	none noRod
}

// noRod is why a bore had no rod, for its findings: the column, when every
// standard rod below the bore buckles in it. The zero noRod has no
// findings.
type noRod struct {
	col     Column
	buckles bool
}

// findings returns the buckling warning of a bore whose rods all buckle
// (Column.MinimumRod's), or nil.
func (n noRod) findings(rods components.Series[units.Length]) components.Findings {
	if !n.buckles {
		return nil
	}
	rc, err := n.col.MinimumRod(rods)
	if err != nil {
		return nil
	}
	return rc.Findings
}

// maxRodShare is the largest rod a bore takes, as a share of the bore,
// when the least area ratio does not ask for more: 0.8 (our choice:
// catalogue cylinders pair rods up to about 0.7 × the bore; beyond 0.8 the
// annulus leaves little room for the piston's seals and the rod's guide).
const maxRodShare = 0.8

// rodCeiling is the largest rod bore b takes: maxRodShare of it, or 1.25
// × least, the least rod the area ratio asks (a rod series' steps are
// below 25 %), when that is more.
func rodCeiling(b, least units.Length) units.Length { return max(maxRodShare*b, 1.25*least) }

// tryBore picks the rod for bore b: the smallest standard rod giving at
// least area ratio phi and, when d.Buckling is set, passing the buckling
// check, no thicker than rodCeiling. ok is false when no standard rod
// below the bore does; the fit's rod then has Chosen 0.
func (d Duty) tryBore(b units.Length, rods components.Series[units.Length], phi float64) (boreFit, bool) {
	c := Cylinder{Bore: b, Stroke: d.Stroke, Ends: d.Ends, Action: d.Action}
	least := b * units.Length(math.Sqrt(1-1/phi))
	rod, err := rods.Select(least)
	if err != nil || !rod.OK() || rod.Chosen >= b {
		rod.Chosen = 0
		return boreFit{rod: rod}, false
	}
	c.Rod = rod.Chosen
	if d.Buckling == nil {
		return boreFit{cyl: c, rod: rod}, true
	}
	col := *d.Buckling
	col.Cylinder = c
	bk, none, err := col.minimumRod("actuator.Column.MinimumRod", rods)
	if err != nil {
		return boreFit{}, false
	}
	if none {
		return boreFit{rod: bk.Rod, none: noRod{col: col, buckles: true}}, false
	}
	if bk.Rod.Chosen > rod.Chosen {
		rod = bk.Rod
		c.Rod = rod.Chosen
	}
	if rod.Chosen > rodCeiling(b, least) {
		rod.Chosen = 0 // the rod buckling asks leaves no annulus: a larger bore takes it
		return boreFit{rod: rod}, false
	}
	chk := bk.Check // the rod buckling chose, which MinimumRod has checked
	if c.Rod != bk.Rod.Chosen {
		col.Cylinder = c
		if chk, err = col.Check(); err != nil {
			rod.Chosen = 0
			return boreFit{rod: rod}, false
		}
	}
	return boreFit{cyl: c, rod: rod, bk: &chk}, true
}

// findings gathers the cautions and design notes of a sizing; why says why
// the last bore tried had no rod (a buckling warning), when that is why no
// size was chosen.
func (d Duty) findings(r CylinderSize, bores components.Series[units.Length], why components.Findings) components.Findings {
	var fs components.Findings
	if f, ok := d.holding(r.Forces); ok {
		fs = append(fs, f)
	}
	switch {
	case r.Bore.Chosen == 0:
		fs = append(fs, components.NewFinding(components.Notice, components.NoHazard, "actuator.no-standard-size",
			bores.Rule(), "no standard bore and rod up to %v in %v deliver %v at %v",
			bores.Largest(), bores.Name(), r.Forces.Total(), d.Pressure))
	case !bores.Preferred(r.Bore.Chosen):
		fs = append(fs, components.NewFinding(components.Notice, components.NoHazard, "actuator.second-choice-bore",
			bores.Rule(), "the chosen bore %v is a second-choice size; the preferred sizes are easier to buy",
			r.Bore.Chosen))
	}
	if d.Mass > 0 && d.Speed > 0 && d.AccelDistance == 0 && d.AccelTime == 0 {
		fs = append(fs, components.NewFinding(components.Notice, components.NoHazard, "actuator.no-acceleration",
			components.PhysicsRule("F = m·a"),
			"no acceleration distance or time is given, so the force to bring %v to %v is not included",
			d.Mass, d.Speed))
	}
	if r.Buckling != nil {
		fs = fs.Merge(r.Buckling.Findings...)
	}
	if r.Bore.Chosen == 0 {
		fs = fs.Merge(why...)
	}
	return fs
}

// holding returns the load-holding caution for a load whose weight along
// its path exceeds its guide friction.
func (d Duty) holding(l LoadForces) (components.Finding, bool) {
	switch {
	case l.Gravity > l.Friction:
		return components.NewFinding(components.Warning, components.SuspendedLoad, "actuator.load-holding",
			ruleISO4413(),
			"the load's weight along its path (%v) is more than its friction and would drive the cylinder back if pressure were lost: hold it with a load-holding valve mounted at the cylinder port",
			l.Gravity), true
	case -l.Gravity > l.Friction:
		return components.NewFinding(components.Warning, components.OverrunningLoad, "actuator.overrunning",
			ruleISO4413(),
			"the load's weight along its path (%v) is more than its friction, so the load drives the cylinder on this stroke: control it with a counterbalance valve mounted at the cylinder port",
			-l.Gravity), true
	}
	return components.Finding{}, false
}
