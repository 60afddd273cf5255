package units

import (
	"math"
	"time"

	"github.com/hydrosize/hydrosize/internal/validate"
)

// Physics across quantity types. Products are plain methods with float64
// semantics (see Overflow in the package documentation); quotients return an
// error when the divisor is zero, negative where that is meaningless, or not
// finite, and when the quotient itself is not finite, so that no quotient is
// ever ±Inf or NaN.

// CircleArea returns the area of a circle of diameter d: A = π·d²/4 (a bore
// or rod section).
func CircleArea(d Length) Area { return Area(math.Pi / 4 * float64(d) * float64(d)) }

// TimesArea returns the force of pressure p on area a: F = p·A.
func (p Pressure) TimesArea(a Area) Force { return Force(float64(p) * float64(a)) }

// PerArea returns the pressure that force f needs on area a: p = F/A.
// It fails with ErrRange unless a is finite and > 0 and the quotient finite.
func (f Force) PerArea(a Area) (Pressure, error) {
	const fn = "units.Force.PerArea"
	if err := validate.Positive(fn, "a", a); err != nil {
		return 0, err
	}
	return quotient[Pressure](fn, float64(f)/float64(a))
}

// TimesLength returns the volume swept by area a over length l: V = A·l.
func (a Area) TimesLength(l Length) Volume { return Volume(float64(a) * float64(l)) }

// TimesArea returns the flow that moves area a at velocity v: Q = v·A.
func (v Velocity) TimesArea(a Area) Flow { return Flow(float64(v) * float64(a)) }

// PerArea returns the mean velocity of flow q through area a: v = Q/A.
// It fails with ErrRange unless a is finite and > 0 and the quotient finite.
func (q Flow) PerArea(a Area) (Velocity, error) {
	const fn = "units.Flow.PerArea"
	if err := validate.Positive(fn, "a", a); err != nil {
		return 0, err
	}
	return quotient[Velocity](fn, float64(q)/float64(a))
}

// TimesDuration returns the volume that flow q delivers in d: V = Q·t.
func (q Flow) TimesDuration(d time.Duration) Volume { return Volume(float64(q) * d.Seconds()) }

// PerDuration returns the mean flow that moves volume v in d: Q = V/t.
// It fails with ErrRange unless d > 0 and the quotient is finite.
func (v Volume) PerDuration(d time.Duration) (Flow, error) {
	const fn = "units.Volume.PerDuration"
	if err := validate.PositiveDuration(fn, "d", d); err != nil {
		return 0, err
	}
	return quotient[Flow](fn, float64(v)/d.Seconds())
}

// TimesSpeed returns the geometric flow of displacement d at speed n:
// Q = D·n (no 2π: displacement is per revolution).
func (d Displacement) TimesSpeed(n RotationalSpeed) Flow { return Flow(float64(d) * float64(n)) }

// PerSpeed returns the displacement that delivers flow q at speed n:
// D = Q/n. It fails with ErrRange unless n is finite and > 0
// and the quotient finite.
func (q Flow) PerSpeed(n RotationalSpeed) (Displacement, error) {
	const fn = "units.Flow.PerSpeed"
	if err := validate.Positive(fn, "n", n); err != nil {
		return 0, err
	}
	return quotient[Displacement](fn, float64(q)/float64(n))
}

// TimesPressure returns the ideal torque of displacement d at pressure
// difference p: T = D·Δp/(2π), D in m³/rev.
func (d Displacement) TimesPressure(p Pressure) Torque {
	return Torque(float64(d) * float64(p) / revRad)
}

// TimesFlow returns the hydraulic power of flow q at pressure difference p:
// P = Δp·Q. In trade units this is kW = bar·(L/min)/600 and
// hp = psi·gpm/1714.29, both of which follow from the unit definitions.
func (p Pressure) TimesFlow(q Flow) Power { return Power(float64(p) * float64(q)) }

// TimesSpeed returns the shaft power of torque t at speed n: P = 2π·n·T,
// n in rev/s.
func (t Torque) TimesSpeed(n RotationalSpeed) Power {
	return Power(revRad * float64(n) * float64(t))
}

// PerSpeed returns the torque that carries power p at speed n:
// T = P/(2π·n). It fails with ErrRange unless n is finite and > 0
// and the quotient finite.
func (p Power) PerSpeed(n RotationalSpeed) (Torque, error) {
	const fn = "units.Power.PerSpeed"
	if err := validate.Positive(fn, "n", n); err != nil {
		return 0, err
	}
	return quotient[Torque](fn, float64(p)/(revRad*float64(n)))
}

// TimesDuration returns the energy of power p over d: E = P·t.
func (p Power) TimesDuration(d time.Duration) Energy { return Energy(float64(p) * d.Seconds()) }

// TimesVelocity returns the mechanical power of force f moving at velocity
// v: P = F·v (a cylinder's output power).
func (f Force) TimesVelocity(v Velocity) Power { return Power(float64(f) * float64(v)) }

// TimesDensity returns the dynamic viscosity of a fluid of kinematic
// viscosity v and density rho: μ = ν·ρ.
func (v KinematicViscosity) TimesDensity(rho Density) DynamicViscosity {
	return DynamicViscosity(float64(v) * float64(rho))
}

// TimesAcceleration returns the force that gives mass m acceleration a:
// F = m·a (weight when a is StandardGravity).
func (m Mass) TimesAcceleration(a Acceleration) Force { return Force(float64(m) * float64(a)) }

// quotient returns the quotient x as an R, or ErrRange when it is not
// finite: a NaN or infinite dividend, or a finite one over a divisor so small
// that the quotient overflows.
func quotient[R ~float64](fn string, x float64) (R, error) {
	if err := validate.Result(fn, "result", R(x)); err != nil {
		return 0, err
	}
	return R(x), nil
}
