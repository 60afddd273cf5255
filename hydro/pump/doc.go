// Package pump sizes and checks a hydraulic pump: delivered flow,
// displacement, shaft torque and power, the behaviour of its control
// (pressure-compensated, load-sensing, power-limited), sizing with a
// reported margin onto a standard displacement, its fit with the
// directional valves' center and with several actuators on one pump, and
// the absolute pressure at its inlet.
//
// # The model
//
// A [Pump] displaces D_g·n (D_g the displacement in use, n the speed) and
// loses its internal leakage Q_L from that: Q = D_g·n − Q_L, with
// Q_L = D·n·(1 − η_v) taken at full displacement D and, optionally, in
// proportion to pressure. Torque is T = D_g·p/(2π·η_hm) and shaft power
// 2π·n·T, so at full stroke P = p·Q/(η_v·η_hm). These are the textbook
// relations of a positive-displacement pump; the efficiencies vary with
// pressure, speed and viscosity, so take them at the working point from
// the maker's data. [Pump.At] gives the operating point at a pressure with
// the control acting; [Pump.Delivering] the point of a controlled pump
// giving less than it could; [Pump.Standby] the deadhead point, whose
// shaft power is all heat.
//
// # Sizing
//
// [Size] puts a margin on the computed flow and pressure — [DefaultMargin],
// 25 %, labelled common practice, unless the caller gives one — and picks
// the next displacement from the caller's list or from
// [CommonDisplacements] (the ISO 3 R20 preferred numbers, which makers'
// frame sizes mostly follow: common practice). The margin and its rule are
// always in the result.
//
// # The pump and the circuit
//
// [Pump.Compatibility] returns findings, not a verdict: a fixed pump behind
// a closed center deadheads over the relief and turns its whole input into
// heat; an open center keeps a compensated pump at full stroke; a
// load-sensing pump needs closed-center load-sensing valves; several
// actuators on one pump starve or are throttled, and each finding quotes
// the heat. This package imports hydro/valve for one reason: the center
// condition's connections (valve.Center.Traits) decide where the pump's
// flow goes. hydro/valve imports no pump.
//
// # Inlet
//
// [CheckInlet] gives the absolute pressure at the pump inlet from the
// ambient pressure over the reservoir ([SiteAltitude], the ISO 2533
// standard atmosphere, or [SitePressure]), a pressurised tank, the oil
// column above or below the inlet and the suction line's loss at the
// cold-start viscosity, held against the maker's minimum; a Warning of
// hazard Cavitation when it fails. The suction loss is an input: compute it
// with hydro/line or from the line's own data.
//
// # Cautions
//
// A deadheaded fixed pump heats its oil quickly, and hot oil and surfaces
// burn; ISO 4413 limits the pump inlet to 60 °C. A cavitating pump loses
// flow and fails. Every part of the circuit needs protection against
// over-pressure by a relief (ISO 4413). These results support, and do not
// replace, the pump maker's ratings, ISO 4413, local codes and licensed
// practice.
//
// All functions are safe for concurrent use. At, Delivering, Standby,
// Atmosphere and CheckInlet allocate nothing unless they return findings
// or fail.
package pump
