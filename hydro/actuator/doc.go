// Package actuator sizes and checks hydraulic cylinders and motors: the
// standard bore and rod, or the displacement, that move a load at the
// chosen pressure and speed, and what a first pass forgets — the rod side,
// friction and acceleration, the return flow, regeneration,
// intensification, rod buckling, the stiffness of the oil, the real stroke
// time and the starting torque.
//
// # Cylinders
//
// A [Cylinder] is a bore D, a rod d and a stroke S, single-rod or
// double-rod, double- or single-acting. The cap area is A₁ = π·D²/4, the
// annulus A₂ = π·(D² − d²)/4, the area ratio φ = A₁/A₂. For a stroke
// ([Extend] or [Retract]) the inlet pressure acts on one area and the back
// pressure on the other:
//
//	F = p·A_in − p_back·A_out    v = Q/A_in    Q_out = Q·A_out/A_in
//
// so a 2:1 cylinder retracting returns twice the pump flow ([Cylinder.ReturnFlow]):
// size its return line, valve and filter for that. A regenerative extend
// ([Cylinder.Regenerative]) works on the rod area alone: v = Q/A_rod,
// F = p·A_rod. Pushing against a blocked or metered-out outlet intensifies
// the outlet pressure, p_out = (p·A_in − F)/A_out ([IntensifiedPressure],
// the one implementation other packages call): 2:1 at 200 bar holds 400 bar
// in the annulus, more with an overrunning load.
//
// # Sizing
//
// A [Duty] describes one stroke: the process force, the moving mass on a
// guide at an incline with friction, the speed and the distance or time to
// reach it, the pressure available and the back pressure. [Duty.Size] adds
// up the force ([LoadForces]: F + m·g·sin θ + μ·m·g·cos θ + m·a), takes a
// seal friction allowance off the driving force (η·p·A_in − p_back·A_out ≥ F,
// η = 0.90 unless given, common practice; friction never helps against the
// back pressure), finds the minimum bore, then the smallest standard bore and rod (ISO 3320
// unless the caller passes a series, such as components.InchBores or a
// maker's list) that deliver the force, and the pressure the chosen
// cylinder actually needs. The rod is the smallest standard rod giving at
// least the area ratio asked for (1.25 unless given, our choice) and, when
// a [Column] is given, passing the buckling check.
//
// A requirement beyond the largest standard size is not an error: the
// result carries a failed components.Choice (Chosen 0) and a finding, which
// reads better in a report than an error would. Errors are for bad input.
//
// # Buckling
//
// A [Column] is the cylinder at full extension under the relief-valve
// thrust (not only the working thrust: a jammed load sees the relief
// setting). The free buckling length is K·L, with L from the mounting point
// to the load point and K from Euler's cases by mounting
// ([EffectiveLengthFactor]):
//
//	body mount             rod end pinned, guided   rod end fixed, guided   rod end free
//	flange, feet (rigid)   K = 0.7                  K = 0.5                 K = 2
//	trunnion, clevis       K = 1                    K = 0.7                 —
//
// Clevis or eye at both ends, and a trunnion with a rod eye, are the
// pinned–pinned case over the pin-to-pin length. The slenderness
// λ = K·L/(d/4) decides the formula: Euler above λ_c = √(2π²E/σ_y),
// J. B. Johnson's parabola below it ([CriticalLoad]; the result names the
// method). The safety factor, 3.5 unless given (common practice), is always
// reported; falling short of it is a failed check with a warning, not an
// error. [Column.MinimumRod] finds the smallest standard rod that passes.
//
// # Stiffness and natural frequency
//
// An [OilSpring] is a cylinder holding a mass on its two oil columns, each
// the swept volume at the piston's position plus a dead volume (ports,
// manifold, lines). The columns act in parallel:
//
//	k(x) = B₁·A₁²/(A₁·x + V₀₁) + B₂·A₂²/(A₂·(S − x) + V₀₂),  f = (1/2π)·√(k/m)
//
// [OilSpring.Lowest] finds the softest point in closed form (k is convex
// in x), and the shortest ramp time the usual rule allows there,
// t = 18/ω₀, about three natural periods (common practice, a rule of thumb
// that the valve and the control refine). This is why actuator imports
// package fluid, and only for this: the stiffness of oil is its effective
// bulk modulus, fluid.EffectiveBulk (the liquid, entrained air and hose or
// tube compliance), taken at each chamber's pressure; one implementation
// of that physics lives in fluid.
//
// # Cycle time and cushioning
//
// A [Profile] accelerates, runs at constant speed and decelerates, or,
// over a short travel, only accelerates and decelerates (a triangular
// profile); [Cylinder.Move] times a stroke and gives the peak inlet and
// return flows the profile asks for. [Cylinder.Cushioning] gives the
// average pressure a cushion builds to stop the moving mass over its length
// while the drive pressure and the load still push, against the cylinder's
// rating; real cushions peak above the average.
//
// # Motors
//
// A [Motor] is a displacement D with volumetric and mechanical
// efficiencies (and a lower starting efficiency, 0.9 × the running one
// unless given, common practice):
//
//	T = D·Δp·η_m/(2π)    n = Q·η_v/D    Q = D·n/η_v    P = Δp·Q·η_v·η_m
//
// [MotorDuty.Size] sizes the displacement for the running and the
// breakaway torque and chooses from the caller's displacements. A hydraulic
// motor leaks, so it cannot hold a load still: a duty whose load can turn
// the motor carries the brake caution.
//
// # Cautions
//
// A cylinder that raises or lowers a load holds it on trapped oil: a burst
// hose or a leaking valve lets it fall or run away. Sizing reports a
// suspended or overrunning load with a warning to fit a load-holding
// (counterbalance or pilot-operated check) valve mounted at the cylinder
// port, as ISO 4413 requires; intensification above the cylinder's rating
// is a danger finding. Trapped and intensified oil stores energy: release
// it before work on the circuit. These results support, and do not
// replace, ISO 4413, the makers' ratings, local codes and licensed
// practice.
//
// All functions and methods are safe for concurrent use. Functions that
// return an error validate every input and return errors matching
// units.ErrRange that name the parameter or field; on error they return the
// zero value. Inputs at the ends of the float range whose arithmetic
// overflows (a denormal rod, a 1e300 m bore) give an error naming the
// result, never a NaN or ±Inf beside a nil error. Sizing, buckling checks, the oil spring, motions and the
// cylinder and motor calculations allocate nothing unless they return
// findings or fail.
package actuator
