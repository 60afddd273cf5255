// Package fluid gives the properties of hydraulic fluids that sizing needs:
// kinematic viscosity against temperature (ASTM D341), viscosity index
// (ASTM D2270), ISO 3448 viscosity grades, Saybolt Universal Seconds
// (ASTM D2161), density with temperature and pressure, dynamic viscosity,
// specific heat, thermal conductivity and bulk modulus (including the
// effective bulk modulus with entrained air and container compliance).
//
// A Curve is the D341 line through two measured viscosities; Curve.At is
// the hot path (no allocation; a few exponentials, two to three times
// slower below 7 mm²/s where D341's low-viscosity term needs Newton
// refinement), fit for a service that reads an oil temperature from a PLC
// thousands of times a second. A Fluid
// bundles a Curve with density, thermal and bulk-modulus data; presets give
// typical values for the ISO 6743-4 families HM, HV, HFC, HFDU and HEES, and
// FromDataSheet builds a Fluid from a supplier's figures. A Fluid's figures
// are read through methods and change only by building it again from its
// DataSheet, so they never contradict each other.
//
// SelectGrades picks the grades that keep a site's duty within a pump's
// viscosity Window. Its results speak the vocabulary of package components:
// each Candidate holds its two ends as components.Check values (the
// viscosity against the window's limit, with the rule the limit comes from)
// and carries components.Findings (a margin under MinTemperatureMargin, a
// running viscosity outside the optimum band); Site.Findings gives the
// cautions of the duty itself. Findings have a severity, a hazard kind and a
// stable topic key (TopicColdMargin, …) a program can act on, and quote
// their numbers as typed quantities, so they read in metric or US customary
// units.
//
// The limits of every model (the D341 viscosity span, the temperature and
// pressure range of the property models, the accepted ranges of a data
// sheet) are gathered, with their sources, in limits.go.
//
// Typical values are typical: the supplier's data sheet for the actual fluid
// governs. Where a correlation or value is recalled rather than read from the
// source, its documentation says "from memory"; rules of the trade say
// "common practice".
//
// Viscosity limits that protect a pump (the Window type) differ between pump
// makers: use the maker's figures where they exist. Hot oil burns, and oil
// under pressure injects through skin; grade selection here is arithmetic to
// support a design, not a substitute for ISO 4413, local codes and licensed
// practice.
//
// Every function validates its input and returns an error matching
// units.ErrRange (a *units.RangeError with the function, the parameter or
// field, the value and the valid range) for non-finite, non-positive or
// out-of-range values; the package's own sentinels ErrNoGrade and
// ErrNoPreset match units.ErrRange too. On error the result is the zero
// value; no function panics on caller input or returns NaN or ±Inf, and a
// result that must be positive but underflows to 0 is an error. All
// functions are safe for concurrent use.
package fluid
