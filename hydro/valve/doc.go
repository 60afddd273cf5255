// Package valve holds the physics of the valves that steer and hold a
// hydraulic load: directional valve center conditions as data.
//
// # Center conditions
//
// [Center] names what a directional valve connects in its neutral
// position — closed (blocked), open, tandem, float, regenerative — and
// [Center.Traits] says where the pump port and the actuator ports lead.
// hydro/pump imports this package to judge a pump and its control against
// the valve's center; this package imports no other family.
//
// # Cautions
//
// A spool valve leaks: it does not hold a suspended load. Design and verify
// load holding, over-pressure protection and hose-burst protection to
// ISO 4413, the valve makers' data, local codes and licensed practice;
// these results support that judgement and do not replace it.
package valve
