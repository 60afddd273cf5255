// Package thermal balances the heat of a hydraulic power unit: the heat load
// of a duty cycle item by item (pump and motor inefficiency, throttling,
// relief and compensator standby flow, line losses) beside the trade's
// share-of-input guess; the reservoir's nominal volume from the pump flow,
// its standard size, its wetted area and natural dissipation; the steady
// oil temperature, warm-up and cool-down of oil and steel as one lumped
// body; the temperature rise across a relief valve or throttle; and the
// duty a cooler must meet to hold a maximum oil temperature at the hottest
// ambient, in kW, BTU/h and kW/K of entering temperature difference.
//
// # The balance
//
// The power unit is taken as one body at one temperature (oil and the steel
// that warms with it) that gains the heat load P and sheds h·A·(T − T_amb)
// through its surfaces:
//
//	(m·c)·dT/dt = P − h·A·(T − T_amb),   T_ss = T_amb + P/(h·A),   τ = m·c/(h·A)
//
// This is a first estimate: a real tank has a warm top and a cool bottom,
// and h depends on air movement. Oil properties come from package fluid.
//
// # Cautions
//
// Hot oil and hot surfaces burn, and oil above its rated temperature ages
// fast and thins below its pump's minimum viscosity. ISO 4413 asks for pump
// inlet oil at or below 60 °C. These results support, and do not replace,
// ISO 4413, the component makers' data, local codes and licensed practice.
//
// Every function validates its input and returns an error matching
// units.ErrRange that names the parameter (and field); none panics on
// caller input or returns NaN or ±Inf. All functions are safe for
// concurrent use.
package thermal
