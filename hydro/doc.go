// Package hydro sizes a whole hydraulic power unit and circuit from one
// description of the machine: from its actuators, duty cycle, supply, site,
// fluid and cleanliness needs to a list of sized components, a pressure
// budget, a heat balance, a filtration plan and the cautions that go with
// them.
//
// # The spec
//
// A [Spec] is built in Go with typed quantities, or read from JSON with
// [ParseSpec], where every quantity is a string with its unit:
//
//	{"actuators": [{"name": "press", "kind": "cylinder", "stroke": "950 mm", …}],
//	 "cycle": {"phases": [{"name": "pressing", "moves": [{"actuator": "press",
//	   "direction": "extend", "speed": "25 mm/s", "force": "250 kN"}]}, …]},
//	 "supply": {"mains": "50 Hz"}, "site": {"ambient_min": "-5 °C", "ambient_max": "35 °C"},
//	 "fluid": {"class": "HM", "grade": "VG 46"}, …}
//
// A bare number where a quantity belongs ("stroke": 950) is refused, with
// the unit it needs in the message: a number without a unit is a guess.
// Plain numbers are for what has no unit: counts, ratios, coefficients,
// viscosity index, and the few fields that name their unit
// ("incline_deg", "cycles_per_hour").
//
// [Spec.Validate] (and ParseSpec, which calls it) lists every problem at
// once in a *[SpecError]: one *[FieldError] per problem, with its JSON path
// ("actuators[1].stroke", "cycle.phases[2].moves[0].speed") and what would
// be valid, each matching a units sentinel (units.ErrRange for a value
// missing, out of range or contradicting another; units.ErrSyntax,
// ErrUnknownUnit or ErrDimension for text that does not read as the
// field's kind).
//
// # Sizing
//
// [Size] validates the spec, then works in the order an engineer does —
// actuators, the pressures and flows of each phase, valves and lines with
// the pressure budget of every phase, the relief and the pump, each phase's
// working point and heat, the heat balance with the reservoir and the
// cooler — and repeats that chain where the physics couples (the pump's
// pressure is the load's plus the losses at the oil's viscosity; the oil's
// temperature, its viscosity, the losses and the heat depend on each
// other) until it stops moving; then the drive, the pump's fit with the
// valve center and its inlet, the fluid at the site's extremes, the
// accumulator, the cleanliness plan, the bill of components and the
// findings. Every figure comes from a family: hydro/actuator,
// hydro/pump, hydro/drive, hydro/valve, hydro/line, hydro/accumulator,
// hydro/thermal, hydro/contamination and fluid; what this package adds is
// the order, the coupling and the round first-pass figures a spec does not
// give (pump and motor efficiencies, valve and filter data points, tank
// proportions), each reported with its rule.
//
// The [Report] holds every number with its unit and its rule
// (components.Rule) and the findings, merged and ordered most severe
// first; it marshals to JSON with the field names on its types and renders
// as text ([Report.Text]) and Markdown ([Report.Markdown]) in the spec's
// unit system or another ([Report.TextIn]). [Sweep] sizes the same machine
// over several working pressures (and pump speeds) at once, on every core,
// and returns a [Comparison].
//
// # Defaults
//
// Every design factor is optional. Left out, it takes the default below;
// the report says for each whether it was given or defaulted, and by what
// rule:
//
//	design.pressure          160 bar (DefaultPressure; ISO 6020-2 16 MPa series, our choice)
//	design.relief_margin     10 % above the highest working pressure (DefaultReliefMargin, hydro/valve's; common practice)
//	design.max_oil_temperature  60 °C (ISO 4413's pump inlet limit, fluid.MaxPumpInlet)
//	design.rod_yield         300 MPa (our choice: below common rod steels)
//	design.reservoir_minutes 3 minutes of pump flow, 1 when mobile (common practice)
//	design.bore_series       ISO 3320 for metric output, inch bores for US output
//	design.motor_series      IEC 60072-1 kW ratings for metric output, NEMA MG 1 hp for US
//	supply.poles             4
//	actuators[].retracted_length  stroke + 200 mm (our choice)
//	actuators[].line_length  3 m (our choice)
//	circuit lines            suction 1 m with 1 bend, pressure and return 4 m with 4 bends (our choice)
//	circuit.center, .pump, .conductor   tandem, gear, tube
//
// and the families' own defaults for the pump margin (hydro/pump), seal
// efficiency and buckling factor (hydro/actuator), line velocity limits
// (hydro/line), the counterbalance ratio (hydro/valve), the motor slip
// (hydro/drive), the reservoir dwell and tank dissipation
// (hydro/thermal).
//
// # Figures of ours
//
// Where neither the spec nor a family gives a figure, the sizer takes a
// round one and says so in the report's rules: pump efficiencies by type
// (gear 92 %/88 %, vane 92 %/90 %, piston 95 %/92 % volumetric/mechanical)
// and a 0.8 bar absolute inlet minimum; hydraulic motors 92 %/88 %; an
// electric motor's breakdown torque 2 × rated; a load-sensing margin of
// 20 bar; a compensator halfway between the highest working pressure and
// the relief; directional valves of ISO 4401 sizes known by 6 bar at a
// listed flow; return and pressure filter elements of ISO 3 R10 rated
// flows, 0.5 bar clean at that flow and 32 mm²/s, used to ⅔ of it, with
// 3 bar and 6 bar bypass settings and β_x(c) ≥ 200 (credited with β 2
// below x); counterbalance valves with a 3:1 pilot ratio; steel tube of
// 340 MPa tensile strength at a safety factor of 4; a flooded pump inlet
// 0.3 m below the oil; a tank twice as long as wide and deep, 80 % full;
// bladder accumulators of 0.2–50 L charged 20 % above the highest working
// pressure (or to the design pressure). The makers' data replace every one
// of them.
//
// # Safety
//
// Hydraulic systems store energy and can kill or maim: stored pressure,
// suspended and overrunning loads, hose and fitting burst, hot oil and
// fluid injection. A sizing here supports, and does not replace, the
// judgement of a qualified engineer: design and verify to ISO 4413, the
// component makers' ratings, local codes and licensed practice.
package hydro
