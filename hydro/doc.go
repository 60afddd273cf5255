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
// # Defaults
//
// Every design factor is optional. Left out, it takes the default below;
// the report says for each whether it was given or defaulted, and by what
// rule:
//
//	design.pressure          160 bar (DefaultPressure; ISO 6020-2 16 MPa series, our choice)
//	design.relief_margin     10 % above the highest working pressure (DefaultReliefMargin; common practice)
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
// efficiency and buckling factor (hydro/actuator) and line velocity limits
// (hydro/line).
//
// # Safety
//
// Hydraulic systems store energy and can kill or maim: stored pressure,
// suspended and overrunning loads, hose and fitting burst, hot oil and
// fluid injection. A sizing here supports, and does not replace, the
// judgement of a qualified engineer: design and verify to ISO 4413, the
// component makers' ratings, local codes and licensed practice.
package hydro
