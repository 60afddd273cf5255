// Package drive sizes what turns the pump: an electric motor from a
// standard rating series, checked against a duty cycle's heating and peak
// torque, or a combustion engine through its power take-off.
//
// # Power
//
// [ShaftPower] is P = Δp·Q/η_o. The trade's kW = bar·(L/min)/600 and
// hp = psi·gpm/1714 are not typed anywhere: they follow from the unit
// definitions in package units, and the tests check that they do.
// [NextIEC] and [NextNEMA] pick the next IEC 60072-1 kW or NEMA MG 1 hp
// rating (components.IECMotorRatings, components.NEMAMotorRatings);
// [MotorSpeeds] gives synchronous speed n_s = 120·f/p rev/min and a
// full-load speed with a slip that is the caller's or [TypicalSlip], 3 %
// (common practice, 2–5 %). Torque at a speed is units.Power.PerSpeed.
//
// # Duty cycles
//
// [Cycle] reduces a list of [Phase] values (duration, then pressure and
// flow with the pump's efficiency, or a shaft power) to peak, average and
// RMS power, P_rms = √(Σ Pᵢ²·tᵢ / Σ tᵢ). RMS power is the usual basis of an
// induction motor's thermal rating (common practice) for cycles short
// against the motor's thermal time constant; a cycle of long phases heats
// the motor to each phase's own load, so check the longest phase too.
// [SelectMotor] takes the smallest rating that carries the RMS load and
// whose breakdown torque, a multiple the caller gives from the maker's
// data, covers the peak torque; its findings say what sizing on the peak
// (oversized) or the average (overheats) would have chosen. A cycle whose
// relief and standby phases make most of its heat carries a caution.
//
// # Engines
//
// An [Engine] is a power curve the caller supplies, a PTO ratio and
// efficiency. [Engine.Load] checks a pump's shaft power, usually a duty's
// peak, against the curve at an engine speed, with the torques at both
// shafts.
//
// This package imports no other family: the pump's power enters as a
// pressure and flow or as a power (hydro/pump's Point.Shaft).
//
// # Cautions
//
// Motors and couplings are rotating machinery: guard them. A drive that
// stalls under a suspended load does not hold the load; the hydraulic
// circuit must. These results support, and do not replace, the motor and
// engine makers' ratings, IEC 60034 and NEMA MG 1 for motor duty, ISO 4413,
// local electrical codes and licensed practice.
//
// All functions are safe for concurrent use. ShaftPower, NextIEC, NextNEMA,
// MotorSpeeds, Engine.PowerAt and Cycle allocate nothing unless they fail
// or return findings.
package drive
