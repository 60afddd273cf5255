package actuator

import (
	"errors"
	"math"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// DefaultRampFactor is the factor of the ramp-time rule when
// OilSpring.RampFactor is 0: accelerate or decelerate the load over at
// least t = 18/ω₀, about three natural periods (common practice; some use
// 35/ω₀ for precise positioning; it is a rule of thumb, not a law: the
// valve, the control and the friction decide what a real axis does).
const DefaultRampFactor = 18

// OilSpring is a cylinder holding a mass on its two trapped oil columns,
// the hydraulic spring of a valve-controlled axis. Each column is the
// oil between the control valve and the piston: the swept part, which
// changes with position, and a dead volume (ports, manifold, lines) that
// does not. The oil's stiffness is an effective bulk modulus from package
// fluid (the liquid, entrained air, and hose or tube compliance), taken at
// each chamber's absolute pressure.
type OilSpring struct {
	Cylinder    Cylinder               // bore, rod, stroke and arrangement
	Mass        units.Mass             // moving mass: load, rod and piston, > 0
	DeadCap     units.Volume           // cap-side oil at full retraction (valve to piston), ≥ 0
	DeadRod     units.Volume           // rod-side oil at full extension (valve to piston), ≥ 0
	Bulk        fluid.EffectiveBulk    // effective bulk modulus of the oil columns
	CapPressure units.AbsolutePressure // cap-side pressure at the working point, where Bulk is taken
	RodPressure units.AbsolutePressure // rod-side pressure at the working point (unused when single-acting)
	RampFactor  float64                // the ramp-time rule t = RampFactor/ω₀; 0 means DefaultRampFactor
}

// column is the spring of one oil column: k = B·A²/(A·s + V₀) with s the
// swept length of that side.
type column struct {
	b, a, v0 float64 // modulus (Pa), area (m²), dead volume (m³)
}

func (c column) k(s float64) float64 { return c.b * c.a * c.a / (c.a*s + c.v0) }

// springs validates o and returns its two columns (the rod column has b = 0
// for a single-acting cylinder, whose rod side breathes air).
func (o OilSpring) springs(fn string) (capCol, rodCol column, err error) {
	c := o.Cylinder
	if err := c.validate(fn); err != nil {
		return column{}, column{}, prefixed(err, "OilSpring.")
	}
	if err := validate.Positive(fn, "OilSpring.Mass", o.Mass); err != nil {
		return column{}, column{}, err
	}
	if err := validate.NonNegative(fn, "OilSpring.DeadCap", o.DeadCap); err != nil {
		return column{}, column{}, err
	}
	if err := validate.NonNegative(fn, "OilSpring.DeadRod", o.DeadRod); err != nil {
		return column{}, column{}, err
	}
	if o.RampFactor != 0 {
		if err := validate.InRange(fn, "OilSpring.RampFactor", o.RampFactor, 1, 1000); err != nil {
			return column{}, column{}, err
		}
	}
	b1, err := o.modulus(fn, o.CapPressure, "OilSpring.CapPressure")
	if err != nil {
		return column{}, column{}, err
	}
	capCol = column{b: float64(b1), a: float64(c.Area(Extend)), v0: float64(o.DeadCap)}
	rodCol = column{a: float64(c.Area(Retract)), v0: float64(o.DeadRod)}
	if c.Action == DoubleActing {
		b2, err := o.modulus(fn, o.RodPressure, "OilSpring.RodPressure")
		if err != nil {
			return column{}, column{}, err
		}
		rodCol.b = float64(b2)
	}
	return capCol, rodCol, nil
}

// modulus returns the effective modulus at p, with fluid's error renamed to
// fn and the field of OilSpring it concerns.
func (o OilSpring) modulus(fn string, p units.AbsolutePressure, field string) (units.Pressure, error) {
	b, err := o.Bulk.At(p)
	if err == nil {
		return b, nil
	}
	var re *units.RangeError
	if errors.As(err, &re) {
		c := *re
		c.Func = fn
		if c.Param == "p" {
			c.Param = field
		} else {
			c.Param = "OilSpring.Bulk." + c.Param
		}
		return 0, &c
	}
	return 0, err
}

// Stiffness returns the hydraulic spring rate with the piston at x from
// full retraction (0 ≤ x ≤ stroke): the two oil columns act in parallel on
// the piston,
//
//	k(x) = B₁·A₁²/(A₁·x + V₀₁) + B₂·A₂²/(A₂·(S − x) + V₀₂)
//
// with A₁ the extend area, A₂ the annulus and B the effective bulk modulus
// of each side (Merritt, Hydraulic Control Systems, Wiley, 1967, the
// hydraulic spring of a piston, from memory). A single-acting cylinder has
// only the first term. It fails with an error matching units.ErrRange for a
// bad field, an x outside the stroke, or a column of no volume at x (a dead
// volume of 0 at the end of stroke: infinitely stiff, which no real circuit
// is).
func (o OilSpring) Stiffness(x units.Length) (units.Stiffness, error) {
	k, err := o.at("actuator.OilSpring.Stiffness", x)
	return units.Stiffness(k), err
}

// at validates o and x and returns k(x) in N/m.
func (o OilSpring) at(fn string, x units.Length) (float64, error) {
	c1, c2, err := o.springs(fn)
	if err != nil {
		return 0, err
	}
	if err := validate.InRange(fn, "x", x, 0, o.Cylinder.Stroke); err != nil {
		return 0, err
	}
	k := o.k(c1, c2, float64(x))
	if err := validate.Result(fn, "k", k); err != nil {
		return 0, err
	}
	return k, nil
}

func (o OilSpring) k(c1, c2 column, x float64) float64 {
	k := c1.k(x)
	if c2.b > 0 {
		k += c2.k(float64(o.Cylinder.Stroke) - x)
	}
	return k
}

// NaturalFrequency returns the undamped natural frequency of the mass on
// the oil spring with the piston at x: f = (1/2π)·√(k(x)/m), k from
// [OilSpring.Stiffness]. The mass of oil in long lines, referred to the
// piston, adds to m and lowers f; it is not included.
func (o OilSpring) NaturalFrequency(x units.Length) (units.Frequency, error) {
	const fn = "actuator.OilSpring.NaturalFrequency"
	k, err := o.at(fn, x)
	if err != nil {
		return 0, err
	}
	return validate.Checked(fn, "f", frequency(k, float64(o.Mass)))
}

func frequency(k, m float64) units.Frequency {
	return units.Frequency(math.Sqrt(k/m) / (2 * math.Pi))
}

// Resonance is the softest point of an oil spring: where along the stroke
// the natural frequency is lowest, and the shortest ramp time the rule of
// thumb allows there.
type Resonance struct {
	Position  units.Length    // piston position from full retraction
	Stiffness units.Stiffness // k at Position
	Frequency units.Frequency // f₀ = (1/2π)·√(k/m) at Position
	MinRamp   time.Duration   // RampFactor/ω₀: the shortest acceleration or deceleration time
	RampRule  components.Rule // where the ramp rule comes from
}

// Lowest returns the lowest natural frequency over the stroke and where it
// occurs. k(x) is a sum of convex terms, so its one minimum is where the
// two terms' slopes cancel,
//
//	x* = (w₁·(A₂·S + V₀₂) − w₂·V₀₁) / (w₁·A₂ + w₂·A₁),  wᵢ = √(Bᵢ·Aᵢ³)
//
// clamped to the stroke (for a single-acting cylinder, full extension). For a
// symmetric double-rod cylinder without dead volumes x* = S/2 and
// ω₀ = √(4·B·A²/(V_t·m)), V_t = A·S, Merritt's result. The ramp time is
// RampFactor/ω₀, ω₀ = 2π·f₀ (common practice; see [DefaultRampFactor]).
func (o OilSpring) Lowest() (Resonance, error) {
	const fn = "actuator.OilSpring.Lowest"
	c1, c2, err := o.springs(fn)
	if err != nil {
		return Resonance{}, err
	}
	s := float64(o.Cylinder.Stroke)
	x := s
	if c2.b > 0 {
		w1, w2 := math.Sqrt(c1.b*c1.a*c1.a*c1.a), math.Sqrt(c2.b*c2.a*c2.a*c2.a)
		x = min(max((w1*(c2.a*s+c2.v0)-w2*c1.v0)/(w1*c2.a+w2*c1.a), 0), s)
	}
	r := Resonance{Position: units.Length(x), Stiffness: units.Stiffness(o.k(c1, c2, x))}
	if err := validate.Result(fn, "k", r.Stiffness); err != nil {
		return Resonance{}, err
	}
	if r.Frequency, err = validate.Checked(fn, "Frequency", frequency(float64(r.Stiffness), float64(o.Mass))); err != nil {
		return Resonance{}, err
	}
	n, rule := o.RampFactor, components.CallerRule("OilSpring.RampFactor")
	if n == 0 {
		n, rule = DefaultRampFactor, components.PracticeRule("ramp time at least 18/ω₀, about three natural periods")
	}
	r.RampRule = rule
	r.MinRamp, err = seconds(fn, n/(2*math.Pi*float64(r.Frequency)))
	if err != nil {
		return Resonance{}, err
	}
	return r, nil
}
