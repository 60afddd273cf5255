package valve

import (
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Regime is how the pressure drop of a valve or element follows flow.
type Regime uint8

// Regimes.
const (
	Turbulent Regime = iota // Δp ∝ ρ·Q²: orifices, spool edges, most valves at rated flow
	Laminar                 // Δp ∝ μ·Q = ρ·ν·Q: long narrow passages, filter media, cold oil
)

// DropPoint is one point of a data sheet's pressure-drop curve: the drop
// at a flow, in the fluid the curve was measured with.
type DropPoint struct {
	Flow      units.Flow
	Drop      units.Pressure
	Density   units.Density            // density of the test fluid
	Viscosity units.KinematicViscosity // viscosity of the test fluid (needed for Laminar)
}

// ScaleDrop carries a data sheet's pressure-drop point to another flow q,
// density rho and viscosity nu:
//
//	Turbulent  Δp = Δp₀·(Q/Q₀)²·(ρ/ρ₀)           (the orifice equation)
//	Laminar    Δp = Δp₀·(Q/Q₀)·(ρ·ν)/(ρ₀·ν₀)       (Hagen–Poiseuille: Δp ∝ μ·Q)
//
// Real valves lie between the two and drift towards laminar in cold oil;
// where the maker gives curves at several viscosities, use them. ref's
// Flow, Drop and Density must be finite and > 0 (and Viscosity for
// Laminar); q ≥ 0, rho > 0, and nu > 0 for Laminar (it is unused for
// Turbulent). Errors match units.ErrRange. ScaleDrop allocates nothing.
func ScaleDrop(ref DropPoint, regime Regime, q units.Flow, rho units.Density, nu units.KinematicViscosity) (units.Pressure, error) {
	const fn = "valve.ScaleDrop"
	if err := validate.Positive(fn, "ref.Flow", ref.Flow); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "ref.Drop", ref.Drop); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "ref.Density", ref.Density); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "rho", rho); err != nil {
		return 0, err
	}
	r := float64(q / ref.Flow)
	switch regime {
	case Turbulent:
		return validate.Checked(fn, "drop", units.Pressure(float64(ref.Drop)*r*r*float64(rho/ref.Density)))
	case Laminar:
		if err := validate.Positive(fn, "ref.Viscosity", ref.Viscosity); err != nil {
			return 0, err
		}
		if err := validate.Positive(fn, "nu", nu); err != nil {
			return 0, err
		}
		return validate.Checked(fn, "drop", units.Pressure(float64(ref.Drop)*r*float64(rho/ref.Density)*float64(nu/ref.Viscosity)))
	}
	return 0, &units.RangeError{Func: fn, Param: "regime", Value: "Regime(" + strconv.Itoa(int(regime)) + ")", Valid: "Turbulent or Laminar"}
}
