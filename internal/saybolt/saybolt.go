// Package saybolt is the one implementation of ASTM D2161's relation
// between kinematic viscosity and Saybolt Universal Seconds (SUS) at
// 100 °F, shared by package units (which reads "150 SUS" as a kinematic
// viscosity) and package fluid (SayboltSeconds, ViscosityFromSaybolt).
// Viscosities are in mm²/s (cSt).
package saybolt

// MinViscosity is the lower end of the D2161 equation, 1.81 mm²/s (about
// 32 SUS, the shortest efflux the Saybolt method reports).
const MinViscosity = 1.81

// LinearFrom is where D2161's linear form takes over: above 500 mm²/s,
// SUS = 4.632·ν.
const LinearFrom = 500.0

// equationTo is the largest ν the equation branch takes (see Seconds).
const equationTo = LinearFrom * (1 + 1e-12)

// Seconds returns the SUS at 100 °F of kinematic viscosity nu in mm²/s,
// per ASTM D2161:
//
//	SUS = 4.6324ν + (1 + 0.03264ν)/((3930.2 + 262.7ν + 23.97ν² + 1.646ν³)·10⁻⁵)
//
// for 1.81 ≤ ν ≤ 500 mm²/s, and SUS = 4.632ν above. The caller checks
// that nu is at least MinViscosity and finite. The branch test allows a
// relative 10⁻¹², so that 500 mm²/s given in m²/s (500.00000000000006 mm²/s
// in float64) takes the equation, as the standard says for ν ≤ 500.
func Seconds(nu float64) float64 {
	if nu > equationTo {
		return 4.632 * nu
	}
	return 4.6324*nu + (1+0.03264*nu)/((3930.2+262.7*nu+23.97*nu*nu+1.646*nu*nu*nu)*1e-5)
}

// Viscosity returns the kinematic viscosity in mm²/s whose SUS at 100 °F
// is s: the inverse of Seconds, by bisection to round-off (the relation is
// strictly increasing). The caller checks that s is at least
// Seconds(MinViscosity) and finite. The standard's two forms overlap by
// 0.2 SUS at 500 mm²/s; in that overlap the equation branch (ν ≤ 500 mm²/s)
// is returned.
func Viscosity(s float64) float64 {
	if s > Seconds(equationTo) {
		return s / 4.632
	}
	lo, hi := MinViscosity, equationTo
	for range 200 { // bisection: about 55 halvings reach round-off
		mid := 0.5 * (lo + hi)
		if mid <= lo || mid >= hi {
			break
		}
		if Seconds(mid) < s {
			lo = mid
		} else {
			hi = mid
		}
	}
	return max(0.5*(lo+hi), MinViscosity)
}
