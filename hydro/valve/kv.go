package valve

import (
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ReferenceDensity is the density of the water that defines Kv and Cv:
// 1000 kg/m³. IEC 60534 takes water at 5–40 °C for Kv and the Cv
// definition water at 60 °F (999.0 kg/m³); one value for both keeps
// Cv/Kv a pure ratio of unit definitions, and the 0.1 % difference moves a
// flow by 0.05 % (our choice).
const ReferenceDensity units.Density = 1000

// Kv is a valve's flow coefficient in the metric form: the flow of water,
// in m³/h, that passes it at a pressure drop of 1 bar. Its unit is
// (m³/h)/√bar; the type holds that number. For a fluid of density ρ,
//
//	Q = Kv·(1 m³/h)·√((Δp/1 bar)·(ρ_w/ρ))
//
// with ρ_w the ReferenceDensity: the square law of [OrificeFlow] with the
// equivalent area Cd·A = Kv·(1 m³/h)·√(ρ_w/(2·1 bar)) ([Kv.Area]).
type Kv float64

// Cv is a valve's flow coefficient in the US form: the flow of water, in
// US gal/min, that passes it at a pressure drop of 1 psi; unit
// gpm/√psi.
type Cv float64

// cvPerKv returns Cv/Kv from the unit definitions: one valve passes
// Kv·(m³/h)·√(Δp/bar) = Cv·(gpm)·√(Δp/psi), so Cv = Kv·(m³/h ÷ gpm)·√(psi/bar)
// ≈ 1.156 (m³/h = 4.402868 gpm, psi/bar = 0.0689476).
func cvPerKv() float64 {
	return float64(units.CubicMetrePerHour/units.USGallonPerMinute) * math.Sqrt(float64(units.PSI/units.Bar))
}

// Cv returns the same valve's coefficient in the US form, Kv × 1.156…,
// the factor computed from the unit definitions. It does not validate.
func (k Kv) Cv() Cv { return Cv(float64(k) * cvPerKv()) }

// Kv returns the same valve's coefficient in the metric form, Cv / 1.156….
// It does not validate.
func (c Cv) Kv() Kv { return Kv(float64(c) / cvPerKv()) }

// String returns "Kv 2.5".
func (k Kv) String() string { return "Kv " + strconv.FormatFloat(float64(k), 'g', 4, 64) }

// String returns "Cv 2.89".
func (c Cv) String() string { return "Cv " + strconv.FormatFloat(float64(c), 'g', 4, 64) }

// Area returns the orifice whose flow the coefficient describes, as the
// product Cd·A: Kv·(1 m³/h)·√(ρ_w/(2·1 bar)). Divide by a discharge
// coefficient for a geometric area. k must be finite and > 0; the error
// matches units.ErrRange.
func (k Kv) Area() (units.Area, error) {
	if err := validate.Positive("valve.Kv.Area", "k", float64(k)); err != nil {
		return 0, err
	}
	return k.area(), nil
}

func (k Kv) area() units.Area {
	return units.Area(float64(k) * float64(units.CubicMetrePerHour) * math.Sqrt(float64(ReferenceDensity)/(2*float64(units.Bar))))
}

// Flow returns the flow through a valve of coefficient k at pressure drop
// dp in a fluid of density rho: Q = Kv·(1 m³/h)·√((Δp/bar)·(ρ_w/ρ)),
// computed as the orifice equation on the equivalent area. k must be finite
// and > 0, dp ≥ 0, rho > 0; errors match units.ErrRange.
func (k Kv) Flow(dp units.Pressure, rho units.Density) (units.Flow, error) {
	const fn = "valve.Kv.Flow"
	if err := validate.Positive(fn, "k", float64(k)); err != nil {
		return 0, err
	}
	q, err := OrificeFlow(1, k.area(), dp, rho)
	return q, validate.Renamed(err, fn, nil)
}

// Drop returns the pressure drop of flow q through a valve of coefficient
// k in a fluid of density rho: Δp = 1 bar·(Q/(Kv·1 m³/h))²·(ρ/ρ_w). k must
// be finite and > 0, q ≥ 0, rho > 0; errors match units.ErrRange.
func (k Kv) Drop(q units.Flow, rho units.Density) (units.Pressure, error) {
	const fn = "valve.Kv.Drop"
	if err := validate.Positive(fn, "k", float64(k)); err != nil {
		return 0, err
	}
	dp, err := OrificeDrop(1, k.area(), q, rho)
	return dp, validate.Renamed(err, fn, nil)
}

// KvFor returns the coefficient a valve needs to pass flow q at pressure
// drop dp in a fluid of density rho. q, dp and rho must be finite and > 0,
// and the coefficient finite; errors match units.ErrRange.
func KvFor(q units.Flow, dp units.Pressure, rho units.Density) (Kv, error) {
	const fn = "valve.KvFor"
	a, err := OrificeArea(1, q, dp, rho)
	if err != nil {
		return 0, validate.Renamed(err, fn, nil)
	}
	return validate.Checked(fn, "coefficient", Kv(float64(a/Kv(1).area())))
}
