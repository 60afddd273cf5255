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
// FromDataSheet builds a Fluid from a supplier's figures.
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
// units.ErrRange (with the parameter, the value and the valid range) for
// non-finite, non-positive or out-of-range values; no function panics on
// caller input or returns NaN or ±Inf. All functions are safe for concurrent
// use.
package fluid
