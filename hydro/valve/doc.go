// Package valve holds the physics of the valves that steer and hold a
// hydraulic load: orifice flow, flow coefficients, pressure-drop scaling,
// relief, counterbalance and pilot-operated check settings, meter-in
// against meter-out, directional valve center conditions as data, and the
// findings a load-holding circuit calls for.
//
// # Orifices and coefficients
//
// [OrificeFlow], [OrificeDrop] and [OrificeArea] solve Q = Cd·A·√(2Δp/ρ)
// for each of its terms; Cd is a parameter, [SharpEdgedCd] = 0.61 the
// usual value for a sharp edge in turbulent flow (0.6–0.62, common
// practice). [Kv] (m³/h of water at 1 bar) and [Cv] (US gpm of water at
// 1 psi) convert by Cv = Kv·(m³/h ÷ gpm)·√(psi/bar) ≈ 1.156·Kv, a ratio the
// code computes from the unit definitions; [Kv.Flow] and [Kv.Drop] are the
// orifice equation on the coefficient's equivalent area. [ScaleDrop] carries
// a data sheet's pressure-drop point to another flow, density and, where
// the flow is laminar, viscosity.
//
// # Settings
//
// [ReliefSetting] puts the relief a labelled margin above the working
// pressure (10 % unless the caller gives one: common practice) and holds
// its full-flow pressure, setting plus the relief's own override, against
// the rating of what it protects. [CounterbalanceSetting] sets a
// counterbalance valve at 1.3 × the load-induced pressure unless told
// otherwise (common practice) and gives the pilot pressure that opens it,
// p_x = (p_set + k·p_back − p_load)/(R + c), and [PilotCheckPressure] the
// pilot pressure of a pilot-operated check, both from a force balance on
// the valve and the actuator ([Coupling] gives c from the cylinder's
// areas). Valve makers' formulas differ in how they count back pressure
// and the actuator: where the maker gives its own, use it.
//
// # Meter-in and meter-out
//
// [Metering] names the position of a flow control and [Metering.Traits]
// says what it does. [CheckMetering] warns that meter-in and bleed-off do
// not hold an overrunning load and, for meter-out, computes the rod-side
// intensification with hydro/actuator's Cylinder.Intensification, the one
// implementation of that balance, against the cylinder's and the valve's
// ratings. This package imports hydro/actuator for that reason alone: the
// valve's pressure comes from the cylinder's areas.
//
// # Center conditions
//
// [Center] names what a directional valve connects in its neutral
// position — closed (blocked), open, tandem, float, regenerative — and
// [Center.Traits] says where the pump port and the actuator ports lead.
// hydro/pump imports this package to judge a pump and its control against
// the valve's center; [LoadHolding] reads it to see whether a load-holding
// valve's pilot vents.
//
// # Findings
//
// [LoadHolding] says what a suspended or overrunning load needs — a
// counterbalance or pilot-operated check on the cylinder port, more than a
// plain flow control for an overhung load, hose-burst protection where the
// load can fall — and [Protection] that every part of the circuit is
// protected against over-pressure by a relief. Both cite ISO 4413.
//
// # Cautions
//
// A spool valve leaks: it does not hold a suspended load. Trapped and
// intensified oil stores energy: release it before opening the circuit,
// and never loosen a fitting on a line that holds a load. Design and
// verify load holding, over-pressure protection and hose-burst protection
// to ISO 4413, the valve makers' data, local codes and licensed practice;
// these results support that judgement and do not replace it.
//
// All functions are safe for concurrent use. The orifice, coefficient and
// scaling functions allocate nothing; the settings allocate only for their
// findings.
package valve
