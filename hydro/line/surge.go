package line

import (
	"math"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// WaveSpeed returns the speed of a pressure wave in oil of density rho and
// bulk modulus fluidBulk in a line whose wall has container modulus
// wallBulk (V/(dV/dp); 0 for a rigid wall):
//
//	a = √(K_eff/ρ),  1/K_eff = 1/K_fluid + 1/K_wall
//
// (Korteweg's correction for wall elasticity; for a thin tube
// K_wall = E·e/D, see fluid.TubeBulkModulus). Pressure waves are fast, so
// K_fluid should be the isentropic modulus. rho and fluidBulk must be finite
// and > 0, wallBulk finite and ≥ 0.
func WaveSpeed(rho units.Density, fluidBulk, wallBulk units.Pressure) (units.Velocity, error) {
	const fn = "line.WaveSpeed"
	if err := validate.Positive(fn, "rho", rho); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "fluidBulk", fluidBulk); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "wallBulk", wallBulk); err != nil {
		return 0, err
	}
	inv := 1 / float64(fluidBulk)
	if wallBulk > 0 {
		inv += 1 / float64(wallBulk)
	}
	a := units.Velocity(math.Sqrt(1 / inv / float64(rho)))
	return validate.Checked(fn, "a", a)
}

// Joukowsky returns the pressure rise when a column of oil of density rho
// moving at dv is stopped at once, with pressure waves travelling at a:
// Δp = ρ·a·Δv (Joukowsky, 1898). It holds for a closure faster than the
// wave's round trip 2L/a and is the upper bound of the rise: a slower
// closure, line friction and a softer wall give less. rho and a must be
// finite and > 0, dv finite and ≥ 0.
func Joukowsky(rho units.Density, a, dv units.Velocity) (units.Pressure, error) {
	const fn = "line.Joukowsky"
	if err := validate.Positive(fn, "rho", rho); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "a", a); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "dv", dv); err != nil {
		return 0, err
	}
	p := units.Pressure(float64(rho) * float64(a) * float64(dv))
	return validate.Checked(fn, "Δp", p)
}

// Wall is the elastic wall of a line for the wave speed: a tube of inside
// diameter Bore and outside diameter OD, of Young's modulus Modulus and
// Poisson's ratio Poisson. The zero Wall is rigid. Steel tube: about
// 206 GPa and 0.3 (typical, from memory); hoses are far softer, and their
// makers give a volumetric expansion instead.
type Wall struct {
	Bore, OD units.Length
	Modulus  units.Pressure
	Poisson  float64
}

func (w Wall) bulk() (units.Pressure, error) {
	if w == (Wall{}) {
		return 0, nil
	}
	return fluid.TubeBulkModulus(w.Bore, w.OD, w.Modulus, w.Poisson)
}

// Closure is a valve that closes suddenly on a moving column of oil.
type Closure struct {
	Fluid       fluid.Fluid
	Temperature units.Temperature
	Pressure    units.Pressure // gauge working pressure before the closure
	Velocity    units.Velocity // mean velocity of the column that is stopped
	Length      units.Length   // from the valve to the end where the wave reflects (a reservoir, a large volume)
	Wall        Wall           // the zero Wall is rigid
	Rating      units.Pressure // the line's working-pressure rating; 0 to leave it unchecked
}

// Surge is the pressure rise of a sudden closure.
type Surge struct {
	Bulk      units.Pressure // effective bulk modulus of oil and wall
	WaveSpeed units.Velocity
	Rise      units.Pressure // ρ·a·Δv, the upper bound of the rise
	Peak      units.Pressure // Pressure + Rise
	RoundTrip time.Duration  // 2L/a: a closure faster than this sees the full rise
	Check     components.Check[units.Pressure]
	Findings  components.Findings
}

// Surge returns the pressure rise of the closure by Joukowsky's equation
// with the wave speed of WaveSpeed: the oil's isentropic tangent bulk
// modulus at the temperature and working pressure
// (fluid.Fluid.BulkModulus) in series with the wall's container modulus
// (fluid.TubeBulkModulus, Lamé's thick-wall form, which tends to E·e/D for
// thin walls). Entrained air would lower the wave speed and the rise; it is
// left out, so the figure stays an upper bound. The findings label it so,
// and warn when the peak exceeds the rating. Velocity and Length must be
// finite and > 0, and 2L/a must fit a time.Duration (292 years). Errors
// name the Closure's fields: Temperature, Pressure, Fluid.… for the fluid's
// data, Wall.Bore, Wall.OD, Wall.Modulus, Wall.Poisson.
func (c Closure) Surge() (Surge, error) {
	const fn = "line.Closure.Surge"
	if err := validate.Positive(fn, "Velocity", c.Velocity); err != nil {
		return Surge{}, err
	}
	if err := validate.Positive(fn, "Length", c.Length); err != nil {
		return Surge{}, err
	}
	if err := validate.NonNegative(fn, "Rating", c.Rating); err != nil {
		return Surge{}, err
	}
	kf, err := c.Fluid.BulkModulus(fluid.IsentropicTangent, c.Temperature, c.Pressure)
	if err != nil {
		return Surge{}, validate.Renamed(err, fn, fluidFields("Fluid.", "Temperature", "Pressure"))
	}
	rho, err := c.Fluid.Density(c.Temperature, c.Pressure)
	if err != nil {
		return Surge{}, validate.Renamed(err, fn, fluidFields("Fluid.", "Temperature", "Pressure"))
	}
	kw, err := c.Wall.bulk()
	if err != nil {
		return Surge{}, validate.Renamed(err, fn, validate.Fields("Wall.",
			map[string]string{"di": "Wall.Bore", "do": "Wall.OD", "e": "Wall.Modulus", "nu": "Wall.Poisson", "B": "Wall.Modulus"}))
	}
	var s Surge
	if s.WaveSpeed, err = WaveSpeed(rho, kf, kw); err != nil {
		return Surge{}, err
	}
	s.Bulk = units.Pressure(float64(rho) * float64(s.WaveSpeed) * float64(s.WaveSpeed))
	if s.Rise, err = Joukowsky(rho, s.WaveSpeed, c.Velocity); err != nil {
		return Surge{}, err
	}
	s.Peak = c.Pressure + s.Rise
	trip := 2 * float64(c.Length) / float64(s.WaveSpeed) // s
	if !(trip <= float64(math.MaxInt64)/float64(time.Second)) {
		return Surge{}, validate.Fail(fn, "Length", c.Length, "short enough for a wave round trip 2L/a within 292 years")
	}
	s.RoundTrip = time.Duration(trip * float64(time.Second))
	rule := components.PhysicsRule("Joukowsky, Δp = ρ·a·Δv, for a closure faster than 2L/a: an upper bound")
	s.Findings = components.Findings{components.NewFinding(components.Notice, components.Overpressure, "line.surge-bound", rule,
		"closing in less than %v on oil moving at %v can raise the line by up to %v, to %v; slower closure gives less",
		s.RoundTrip.String(), c.Velocity, s.Rise, s.Peak)}
	if c.Rating > 0 {
		s.Check = components.Within(s.Peak, c.Rating, components.CallerRule("Closure.Rating"))
		if !s.Check.OK() {
			s.Findings = s.Findings.Merge(components.NewFinding(components.Warning, components.Burst, "line.surge-rating", rule,
				"a sudden closure can take the line to %v, above its rating of %v: slow the closure or fit surge protection",
				s.Peak, c.Rating))
		}
	}
	return s, nil
}
