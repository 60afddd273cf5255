package actuator

import (
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Defaults for the optional fields of a [Column].
const (
	// DefaultBucklingFactor is the buckling safety factor required when
	// Column.Factor is 0: 3.5 on the critical load at relief-valve thrust
	// (common practice, which uses 3.5 to 4; ISO/TS 13725 leaves the factor
	// to the designer and asks that it be reported).
	DefaultBucklingFactor = 3.5
	// DefaultRodModulus is Young's modulus of a steel rod when Column.E is
	// 0: 210 GPa (common practice for carbon and alloy rod steels).
	DefaultRodModulus = 210 * units.Gigapascal
)

// BodyMount is how the cylinder body is mounted. A [Column] pairs it with a
// [RodEnd] to find the effective-length factor K of Euler's column cases.
type BodyMount uint8

// Body mountings. The rigid ones hold the body's axis square to the mount;
// the pinned ones let it swing.
const (
	Flange   BodyMount = iota // head or cap flange: rigid
	Feet                      // foot lugs, keyed or pinned against shear: rigid
	Trunnion                  // head, centre or cap trunnion: pinned about one axis
	Clevis                    // cap clevis, eye or spherical bearing: pinned
)

func (m BodyMount) rigid() bool { return m == Flange || m == Feet }

// RodEnd is how the rod end meets the load.
type RodEnd uint8

// Rod-end conditions.
const (
	RodPinned RodEnd = iota // rod eye or clevis on a pin of a guided load
	RodFixed                // rod end rigidly fixed to a load guided along the axis
	RodFree                 // rod end pushing an unguided load, free to move sideways
)

// EffectiveLengthFactor returns Euler's effective-length factor K for a
// body mount and rod end, the free buckling length being K·L:
//
//	body \ rod end        pinned, guided   fixed, guided   free
//	flange or feet         0.7 (case 3)     0.5 (case 4)    2 (case 1)
//	trunnion or clevis     1   (case 2)     0.7 (case 3)    — (no column: it swings)
//
// These are the theoretical factors of Euler's four cases (fixed–pinned,
// fixed–fixed, fixed–free, pinned–pinned; any strength-of-materials text).
// Design tables for real mounts often use larger ones (a flange is never
// perfectly rigid): pass Column.K to use them. A pinned body with a free rod
// end is a mechanism, not a column, and is refused with an error matching
// units.ErrRange.
func EffectiveLengthFactor(body BodyMount, rod RodEnd) (float64, error) {
	const fn = "actuator.EffectiveLengthFactor"
	if int(body) >= len(bodyNames) {
		return 0, validate.Fail(fn, "body", float64(body), "Flange, Feet, Trunnion or Clevis")
	}
	switch rod {
	case RodPinned:
		if body.rigid() {
			return 0.7, nil
		}
		return 1, nil
	case RodFixed:
		if body.rigid() {
			return 0.5, nil
		}
		return 0.7, nil
	case RodFree:
		if body.rigid() {
			return 2, nil
		}
		return 0, &units.RangeError{Func: fn, Param: "rod", Value: "RodFree",
			Valid: "RodPinned or RodFixed with a " + body.String() + " mount (a pinned body with a free rod end swings)"}
	}
	return 0, validate.Fail(fn, "rod", float64(rod), "RodPinned, RodFixed or RodFree")
}

// BucklingMethod names the formula that gave a critical load.
type BucklingMethod uint8

// Methods.
const (
	Euler   BucklingMethod = iota // elastic buckling of a slender rod
	Johnson                       // J. B. Johnson's parabola for a stocky rod
)

// CriticalLoad returns the buckling load of a solid round steel rod of
// diameter d over free buckling length lk = K·L, with Young's modulus e and
// yield strength yield, and the method that applies. With the radius of
// gyration i = d/4 the slenderness is λ = lk/i, and the transition is
// λ_c = √(2π²E/σ_y):
//
//	λ ≥ λ_c  Euler:    P = π²·E·I/lk²,              I = π·d⁴/64
//	λ < λ_c  Johnson:  P = A·σ_y·(1 − σ_y·λ²/(4π²E)), A = π·d²/4
//
// Johnson's parabola meets Euler's curve tangentially at λ_c, where both
// give σ_y/2 (J. B. Johnson's parabolic column formula, as in Shigley's
// Mechanical Engineering Design, section on columns, from memory; the form
// and the tangency were confirmed in the Wikipedia article "Johnson's
// parabolic formula"). The rod is taken straight and centrally loaded; side
// load, eccentric mounting and a bent rod lower the real critical load,
// which the safety factor must cover. All inputs must be finite and > 0;
// errors match units.ErrRange.
func CriticalLoad(d, lk units.Length, e, yield units.Pressure) (units.Force, BucklingMethod, error) {
	const fn = "actuator.CriticalLoad"
	for _, c := range [...]struct {
		name string
		v    float64
	}{{"d", float64(d)}, {"lk", float64(lk)}, {"e", float64(e)}, {"yield", float64(yield)}} {
		if err := validate.Positive(fn, c.name, c.v); err != nil {
			return 0, Euler, err
		}
	}
	p, m := critical(d, lk, e, yield)
	if _, err := validate.Checked(fn, "P", p); err != nil {
		return 0, Euler, err
	}
	return p, m, nil
}

func critical(d, lk units.Length, e, yield units.Pressure) (units.Force, BucklingMethod) {
	lam, lamC := slenderness(d, lk), transition(e, yield)
	if lam >= lamC {
		i := math.Pi * math.Pow(float64(d), 4) / 64
		return units.Force(math.Pi * math.Pi * float64(e) * i / (float64(lk) * float64(lk))), Euler
	}
	s := float64(yield)
	return units.Force(float64(units.CircleArea(d)) * s * (1 - s*lam*lam/(4*math.Pi*math.Pi*float64(e)))), Johnson
}

func slenderness(d, lk units.Length) float64 { return float64(4 * lk / d) }

func transition(e, yield units.Pressure) float64 { return math.Pi * math.Sqrt(2*float64(e/yield)) }

// Column is a cylinder seen as a column at full extension: its body mount
// and rod end, the length between the mounting point and the load point, and
// the relief-valve setting whose thrust it must carry.
//
// Where to measure Retracted, the length with the rod fully in (the stroke
// is added for full extension): for a clevis or trunnion body, from its pin
// or trunnion axis to the rod-end pin or load point; for a flange or feet,
// from the mounting face to the rod-end pin or load point. The whole length
// is treated as a rod of the rod's diameter, which is conservative (the
// tube is stiffer than the rod); ISO/TS 13725 models tube and rod
// separately and gives a higher critical load.
type Column struct {
	Cylinder  Cylinder       // bore, rod and stroke; sizing fills this in
	Body      BodyMount      // body mounting
	RodEnd    RodEnd         // rod-end condition
	Retracted units.Length   // mount-to-load length with the rod fully in, > 0
	Relief    units.Pressure // relief-valve setting on the extend side, > 0: the thrust checked is Relief × the extend area
	Yield     units.Pressure // rod yield strength, > 0 (for Johnson's formula)
	E         units.Pressure // rod Young's modulus, > 0; 0 means DefaultRodModulus
	K         float64        // effective-length factor, 0.1 to 10; 0 means EffectiveLengthFactor(Body, RodEnd)
	Factor    float64        // safety factor to reach, ≥ 1; 0 means DefaultBucklingFactor
}

// validateSetup checks every field but Cylinder; prefix names the fields
// in errors ("Column." or "Duty.Buckling.").
func (c Column) validateSetup(fn, prefix string) error {
	return prefixed(c.validateFields(fn), prefix)
}

func (c Column) validateFields(fn string) error {
	if int(c.Body) >= len(bodyNames) {
		return validate.Fail(fn, "Body", float64(c.Body), "Flange, Feet, Trunnion or Clevis")
	}
	if int(c.RodEnd) >= len(rodEndNames) {
		return validate.Fail(fn, "RodEnd", float64(c.RodEnd), "RodPinned, RodFixed or RodFree")
	}
	if err := validate.Positive(fn, "Retracted", c.Retracted); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Relief", c.Relief); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Yield", c.Yield); err != nil {
		return err
	}
	if c.E != 0 {
		if err := validate.Positive(fn, "E", c.E); err != nil {
			return err
		}
	}
	if c.K != 0 {
		if err := validate.InRange(fn, "K", c.K, 0.1, 10); err != nil {
			return err
		}
	} else if _, err := EffectiveLengthFactor(c.Body, c.RodEnd); err != nil {
		return &units.RangeError{Func: fn, Param: "RodEnd", Value: c.RodEnd.String(),
			Valid: "pinned and guided or fixed and guided with a " + c.Body.String() +
				" mount (a pinned body with a free rod end swings), or K set"}
	}
	if c.Factor != 0 {
		return validate.InRange(fn, "Factor", c.Factor, 1, 100)
	}
	return nil
}

// setup returns K, E and the factor with their rules.
func (c Column) setup() (k float64, kr components.Rule, e units.Pressure, er components.Rule, n float64, nr components.Rule) {
	k, kr = c.K, components.CallerRule("Column.K")
	if k == 0 {
		k, _ = EffectiveLengthFactor(c.Body, c.RodEnd)
		kr = components.PhysicsRule("Euler's column cases: theoretical effective-length factor for the end conditions")
	}
	e, er = c.E, components.CallerRule("Column.E")
	if e == 0 {
		e, er = DefaultRodModulus, components.PracticeRule("E = 210 GPa for a steel rod")
	}
	n, nr = c.Factor, components.CallerRule("Column.Factor")
	if n == 0 {
		n, nr = DefaultBucklingFactor, components.PracticeRule("buckling safety factor 3.5 at relief-valve thrust")
	}
	return k, kr, e, er, n, nr
}

// BucklingCheck is the buckling check of a rod at full extension.
type BucklingCheck struct {
	Length      units.Length // L at full extension: Retracted + Stroke
	K           float64      // effective-length factor
	KRule       components.Rule
	FreeLength  units.Length   // free buckling length K·L
	E           units.Pressure // Young's modulus used
	ERule       components.Rule
	Slenderness float64                   // λ = K·L/i, i = d/4
	Transition  float64                   // λ_c = √(2π²E/σ_y), where Euler gives way to Johnson
	Method      BucklingMethod            // the formula that gave Critical
	Critical    units.Force               // buckling load
	Thrust      units.Force               // Relief × the extend area
	Safety      components.Check[float64] // Critical/Thrust at least the factor
	Findings    components.Findings       // a warning when Safety fails
}

// Check returns the buckling check of the column's rod at full extension
// under relief-valve thrust: the critical load from [CriticalLoad] over the
// free length K·(Retracted + Stroke), and the safety factor Critical/Thrust
// held against the required factor, which the result always reports. A
// factor below the requirement is a failed check with a warning finding, not
// an error. Errors match units.ErrRange and name the field: the cylinder
// must be valid and the fields within the ranges of [Column].
func (c Column) Check() (BucklingCheck, error) {
	const fn = "actuator.Column.Check"
	if err := c.Cylinder.validate(fn); err != nil {
		return BucklingCheck{}, prefixed(err, "Column.")
	}
	if err := c.validateSetup(fn, "Column."); err != nil {
		return BucklingCheck{}, err
	}
	return c.checked(fn)
}

// checked returns the check of the column, or an error naming the first of
// its numbers that is NaN or ±Inf (inputs so extreme that the arithmetic
// overflows: a rod of a denormal diameter, a thrust that underflows to 0).
func (c Column) checked(fn string) (BucklingCheck, error) {
	r := c.check()
	if err := finite(fn, output{"Length", float64(r.Length)}, output{"FreeLength", float64(r.FreeLength)},
		output{"Slenderness", r.Slenderness}, output{"Transition", r.Transition},
		output{"Critical", float64(r.Critical)}, output{"Thrust", float64(r.Thrust)},
		output{"Safety", r.Safety.Value}); err != nil {
		return BucklingCheck{}, err
	}
	return r, nil
}

func (c Column) check() BucklingCheck {
	k, kr, e, er, n, nr := c.setup()
	r := BucklingCheck{Length: c.Retracted + c.Cylinder.Stroke, K: k, KRule: kr, E: e, ERule: er}
	r.FreeLength = units.Length(k) * r.Length
	r.Slenderness = slenderness(c.Cylinder.Rod, r.FreeLength)
	r.Transition = transition(e, c.Yield)
	r.Critical, r.Method = critical(c.Cylinder.Rod, r.FreeLength, e, c.Yield)
	r.Thrust = c.Relief.TimesArea(c.Cylinder.Area(Extend))
	r.Safety = components.Reaches(float64(r.Critical/r.Thrust), n, nr)
	if !r.Safety.OK() {
		r.Findings = components.Findings{components.NewFinding(components.Warning, components.Structural,
			"actuator.buckling", nr,
			"the %v rod buckles at %v (%v), only %v times the relief-valve thrust of %v; choose a thicker rod, a shorter free length or a stiffer mounting",
			c.Cylinder.Rod, r.Critical, r.Method.String(), r.Safety.Value, r.Thrust)}
	}
	return r
}

// RodChoice is the smallest standard rod that passes the buckling check.
type RodChoice struct {
	Rod      components.Choice[units.Length] // Required is the least diameter that reaches the factor
	Check    BucklingCheck                   // the check of the chosen rod; zero when none was chosen
	Findings components.Findings             // a warning when no standard rod below the bore passes
}

// MinimumRod returns the least rod diameter that reaches the safety factor
// at relief-valve thrust, and the smallest size of rods at or above it that
// is below the bore (an empty rods Series means ISO 3320). The least
// diameter comes in closed form from the Euler or Johnson formula of
// [CriticalLoad] (a quadratic in d² for a double-rod cylinder, whose thrust
// falls as the rod grows). The Column's own rod is ignored. No standard rod
// below the bore is not an error: the choice fails (Chosen 0) and the result
// carries a warning. Errors are those of [Column.Check].
func (c Column) MinimumRod(rods components.Series[units.Length]) (RodChoice, error) {
	const fn = "actuator.Column.MinimumRod"
	r, none, err := c.minimumRod(fn, rods)
	if err != nil {
		return RodChoice{}, err
	}
	if none {
		_, _, _, _, n, nr := c.setup()
		r.Findings = components.Findings{components.NewFinding(components.Warning, components.Structural,
			"actuator.buckling-no-rod", nr,
			"no standard rod below the %v bore reaches a buckling safety factor of %v (at least %v is needed); shorten the free length, stiffen the mounting or choose a larger bore",
			c.Cylinder.Bore, n, r.Rod.Required)}
	}
	return r, nil
}

// minimumRod is MinimumRod for fn without the finding; none reports that
// no standard rod below the bore passes (the choice's Chosen is then 0).
func (c Column) minimumRod(fn string, rods components.Series[units.Length]) (r RodChoice, none bool, err error) {
	if err := c.Cylinder.validate(fn); err != nil {
		return RodChoice{}, false, prefixed(err, "Column.")
	}
	if err := c.validateSetup(fn, "Column."); err != nil {
		return RodChoice{}, false, err
	}
	rods = rodsOr(rods)
	least := c.leastRod()
	if err := validate.Result(fn, "least rod", least); err != nil {
		return RodChoice{}, false, err
	}
	ch, err := rods.Select(least)
	if err != nil {
		return RodChoice{}, false, validate.Renamed(err, fn, nil)
	}
	r = RodChoice{Rod: ch}
	if !ch.OK() || ch.Chosen >= c.Cylinder.Bore {
		r.Rod.Chosen = 0
		return r, true, nil
	}
	c.Cylinder.Rod = ch.Chosen
	if r.Check, err = c.checked(fn); err != nil {
		return RodChoice{}, false, err
	}
	return r, false, nil
}

// leastRod returns the rod diameter whose critical load is exactly the
// factor times the relief thrust. With T(d) = p·(A₁ − s·π·d²/4), s = 1 for
// a double-rod cylinder and 0 otherwise:
//
//	Euler:   π³E·d⁴/(64·lk²) + n·p·s·π·d²/4 − n·p·A₁ = 0   (a quadratic in d²)
//	Johnson: d² = (n·p·A₁ + σ_y²·lk²/(π·E)) / ((π/4)·(σ_y + n·p·s))
//
// Euler's root is used when its slenderness is at least λ_c, Johnson's
// otherwise; both critical loads rise with d and meet at λ_c, so the root is
// unique.
func (c Column) leastRod() units.Length {
	k, _, e, _, n, _ := c.setup()
	lk := k * float64(c.Retracted+c.Cylinder.Stroke)
	p, a1, E, sy := float64(c.Relief), float64(c.Cylinder.CapArea()), float64(e), float64(c.Yield)
	s := 0.0
	if c.Cylinder.Ends == DoubleRod {
		s = 1
	}
	qa := math.Pow(math.Pi, 3) * E / (64 * lk * lk)
	qb := n * p * s * math.Pi / 4
	qc := n * p * a1
	d2 := 2 * qc / (qb + math.Sqrt(qb*qb+4*qa*qc)) // the positive root of qa·x² + qb·x − qc, written without cancellation
	d := math.Sqrt(d2)
	if 4*lk/d >= transition(e, c.Yield) {
		return units.Length(d)
	}
	d2 = (qc + sy*sy*lk*lk/(math.Pi*E)) / (math.Pi / 4 * (sy + n*p*s))
	return units.Length(math.Sqrt(d2))
}
