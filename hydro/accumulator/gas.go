package accumulator

import (
	"math"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Polytropic indices n of p·Vⁿ = constant for the nitrogen charge.
const (
	// Isothermal: slow compression or expansion, the gas at the
	// temperature of its surroundings (minutes, as in leakage make-up or
	// holding pressure).
	Isothermal = 1.0
	// Adiabatic: fast compression or expansion, no time to exchange heat
	// (seconds, as in an emergency stroke or a supplemented cycle); 1.4 is
	// the ratio of specific heats of nitrogen as an ideal diatomic gas.
	Adiabatic = 1.4
)

// Accepted range of the polytropic index. Real processes lie between
// isothermal (1) and adiabatic (1.4 for an ideal diatomic gas); nitrogen at
// high pressure departs from the ideal gas, and its effective index rises
// above 1.4 beyond about 200 bar (common practice, from memory), so values
// up to 2 are accepted for a caller's real-gas figure.
const (
	minIndex = 1.0
	maxIndex = 2.0
)

// Cycle is the gas side of an accumulator's working cycle, in absolute
// pressures (the gas law needs them; a gauge pressure does not compile
// here):
//
//   - Precharge p₀: the nitrogen charge with no oil in the accumulator, at
//     the gas temperature of the cycle (see PrechargeAt);
//   - Min p₁: the lowest working pressure, where the delivery ends;
//   - Max p₂: the highest working pressure, where the charging ends;
//   - Charge: the polytropic index from p₀ to p₂ (Isothermal when the
//     accumulator fills slowly);
//   - Discharge: the index from p₂ to p₁ (Adiabatic for a fast delivery).
//
// With both indices n the gas follows p₀V₀ⁿ = p₁V₁ⁿ = p₂V₂ⁿ. Build a
// single-index cycle with Polytropic.
type Cycle struct {
	Precharge, Min, Max units.AbsolutePressure
	Charge, Discharge   float64
}

// Polytropic returns the cycle p₀V₀ⁿ = p₁V₁ⁿ = p₂V₂ⁿ: charge and discharge
// both with index n.
func Polytropic(p0, p1, p2 units.AbsolutePressure, n float64) Cycle {
	return Cycle{Precharge: p0, Min: p1, Max: p2, Charge: n, Discharge: n}
}

// validate checks 0 < p₀ < p₁ < p₂ and both indices in [1, 2].
func (c Cycle) validate(fn string) error {
	if err := validate.Positive(fn, "Precharge", c.Precharge); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Min", c.Min); err != nil {
		return err
	}
	if c.Precharge >= c.Min {
		return validate.Fail(fn, "Precharge", c.Precharge, "below Min ("+c.Min.String()+"): at or above it the accumulator is empty by the time the pressure falls to Min")
	}
	if err := validate.Above(fn, "Max", c.Max, c.Min); err != nil {
		return err
	}
	if err := validate.InRange(fn, "Charge", c.Charge, minIndex, maxIndex); err != nil {
		return err
	}
	return validate.InRange(fn, "Discharge", c.Discharge, minIndex, maxIndex)
}

// lnVolumes returns ln(V₂/V₀) and ln(V₁/V₀): V₂ = V₀·(p₀/p₂)^(1/n_c),
// V₁ = V₂·(p₂/p₁)^(1/n_d), V₁ held at V₀ at most. In logarithms no ratio
// overflows.
func (c Cycle) lnVolumes() (l2, l1 float64) {
	l2 = math.Log(float64(c.Precharge/c.Max)) / c.Charge
	l1 = min(0, l2+math.Log(float64(c.Max/c.Min))/c.Discharge)
	return l2, l1
}

// yield is the oil volume delivered per unit of nominal gas volume,
// ΔV/V₀ = V₁/V₀ − V₂/V₀ = (V₂/V₀)·(exp(ln(V₁/V₂)) − 1), written so that it
// stays accurate when p₁ is close to p₂.
func (c Cycle) yield() float64 {
	l2, l1 := c.lnVolumes()
	return math.Exp(l2) * math.Expm1(l1-l2)
}

// Volumes returns the gas volumes of an accumulator of nominal gas volume
// v0 at the highest and the lowest working pressure:
//
//	V₂ = V₀·(p₀/p₂)^(1/n_c)   (charged from p₀ to p₂)
//	V₁ = V₂·(p₂/p₁)^(1/n_d)   (discharged from p₂ to p₁), at most V₀
//
// The gas cannot expand past the shell: when a charge index above the
// discharge index would put V₁ above V₀, the bladder closes on its poppet
// (the piston reaches its stop) at V₀ while the pressure is still above
// p₁, and atMin is V₀. v0 must be finite and > 0, and the cycle valid
// (0 < p₀ < p₁ < p₂, indices in [1, 2]); a V₂ that underflows to 0 is an
// error naming atMax.
func (c Cycle) Volumes(v0 units.Volume) (atMax, atMin units.Volume, err error) {
	const fn = "accumulator.Cycle.Volumes"
	if err := c.validate(fn); err != nil {
		return 0, 0, err
	}
	if err := validate.Positive(fn, "v0", v0); err != nil {
		return 0, 0, err
	}
	l2, l1 := c.lnVolumes()
	atMax = v0 * units.Volume(math.Exp(l2))
	if err := validate.PositiveResult(fn, "atMax", atMax); err != nil {
		return 0, 0, err
	}
	return atMax, v0 * units.Volume(math.Exp(l1)), nil
}

// Delivered returns the oil volume an accumulator of nominal gas volume v0
// delivers from p₂ down to p₁: ΔV = V₁ − V₂, with V₁ at most V₀ (see
// Volumes). v0 must be finite and > 0 and the cycle valid; a ΔV that
// underflows to 0 is an error.
func (c Cycle) Delivered(v0 units.Volume) (units.Volume, error) {
	const fn = "accumulator.Cycle.Delivered"
	if err := c.validate(fn); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "v0", v0); err != nil {
		return 0, err
	}
	dv := v0 * units.Volume(c.yield())
	if err := validate.PositiveResult(fn, "ΔV", dv); err != nil {
		return 0, err
	}
	return dv, nil
}

// Size returns the nominal gas volume that delivers oil volume dv from p₂
// down to p₁: V₀ = ΔV / ((p₀/p₂)^(1/n_c)·((p₂/p₁)^(1/n_d) − 1)); for one
// index n, V₀ = ΔV / ((p₀/p₁)^(1/n) − (p₀/p₂)^(1/n)); with V₁ held at V₀
// (see Volumes), V₀ = ΔV / (1 − (p₀/p₂)^(1/n_c)). dv must be finite
// and > 0 and the cycle valid; a precharge at or above Min fails, since
// the accumulator would deliver nothing above Min.
func (c Cycle) Size(dv units.Volume) (units.Volume, error) {
	const fn = "accumulator.Cycle.Size"
	if err := c.validate(fn); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "dv", dv); err != nil {
		return 0, err
	}
	v0 := dv / units.Volume(c.yield())
	return validate.Checked(fn, "V₀", v0)
}
