package fluid

import (
	"math"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// BulkKind selects a bulk modulus: tangent (local slope, K = −V·dp/dV) or
// secant (average from atmospheric, K̄ = −p·V₀/(V − V₀)), isothermal (slow
// compression) or isentropic (fast: pressure waves, valve and pump
// dynamics).
type BulkKind uint8

// The bulk modulus forms.
const (
	IsothermalTangent BulkKind = iota
	IsothermalSecant
	IsentropicTangent
	IsentropicSecant
)

// String returns the form's name, for example "isentropic tangent".
func (k BulkKind) String() string {
	switch k {
	case IsothermalTangent:
		return "isothermal tangent"
	case IsothermalSecant:
		return "isothermal secant"
	case IsentropicTangent:
		return "isentropic tangent"
	case IsentropicSecant:
		return "isentropic secant"
	}
	return "BulkKind(invalid)"
}

// BulkModel describes a liquid's bulk modulus. The isothermal tangent
// modulus is taken linear in gauge pressure p and exponential in temperature
// (a usual engineering model, common practice; the coefficients are the
// caller's or the presets' typical values):
//
//	K_T(t, p) = K₀·exp(−C·(t − 40 °C)) + M·p
//
// Integrating −dV/V = dp/K_T gives the Murnaghan equation of state,
// V/V₀ = (1 + M·p/K₀(t))^(−1/M), from which the secant modulus and the
// density at pressure follow exactly. Isentropic moduli are Gamma times the
// isothermal ones (K_S/K_T = c_p/c_v, an exact thermodynamic identity, with
// Gamma taken independent of pressure: an approximation).
type BulkModel struct {
	K0    units.Pressure // isothermal tangent modulus at 40 °C, 0 bar gauge
	M     float64        // dK/dp, dimensionless
	C     float64        // temperature coefficient, 1/K
	Gamma float64        // c_p/c_v, isentropic over isothermal
}

// validate checks the model's fields, naming each as prefix+field: "K0"
// when the model is the caller's argument, "Bulk.K0" when it is a fluid's
// or a data sheet's field.
func (m BulkModel) validate(fn, prefix string) error {
	if err := validate.Positive(fn, prefix+"K0", m.K0); err != nil {
		return err
	}
	if err := validate.InRange(fn, prefix+"M", m.M, minBulkM, maxBulkM); err != nil {
		return err
	}
	if err := validate.InRange(fn, prefix+"C", m.C, 0, maxBulkC); err != nil {
		return err
	}
	return validate.InRange(fn, prefix+"Gamma", m.Gamma, minBulkGamma, maxBulkGamma)
}

// k0 is the isothermal tangent modulus at 0 bar gauge and t, in Pa.
func (m BulkModel) k0(t units.Temperature) float64 {
	return float64(m.K0) * math.Exp(-m.C*(t.Celsius()-40))
}

// Modulus returns the bulk modulus of the given kind at temperature t and
// gauge pressure p (from −1 to 2000 bar, and above −K₀(t)/M, where the
// model's tangent modulus reaches zero):
//
//	tangent: K = K₀(t) + M·p
//	secant:  K̄ = p / (1 − (1 + M·p/K₀(t))^(−1/M))   (→ K₀(t) as p → 0)
//
// times Gamma for the isentropic forms. Errors name the model's own fields
// (K0, M, C, Gamma) or the arguments.
func (m BulkModel) Modulus(kind BulkKind, t units.Temperature, p units.Pressure) (units.Pressure, error) {
	const fn = "fluid.BulkModel.Modulus"
	if err := m.validate(fn, ""); err != nil {
		return 0, err
	}
	return m.modulus(fn, kind, t, p)
}

// modulus is Modulus for a checked model.
func (m BulkModel) modulus(fn string, kind BulkKind, t units.Temperature, p units.Pressure) (units.Pressure, error) {
	if err := checkPropertyInputs(fn, t, p); err != nil {
		return 0, err
	}
	if err := m.checkPressure(fn, t, p); err != nil {
		return 0, err
	}
	if kind > IsentropicSecant {
		return 0, validate.Fail(fn, "kind", float64(kind), "one of the four BulkKind constants")
	}
	k0, pp := m.k0(t), float64(p)
	var k float64
	switch kind {
	case IsothermalTangent, IsentropicTangent:
		k = k0 + m.M*pp
	default:
		k = m.secant(k0, pp)
	}
	if kind >= IsentropicTangent {
		k *= m.Gamma
	}
	if err := validate.PositiveResult(fn, "K", k); err != nil {
		return 0, err
	}
	return units.Pressure(k), nil
}

// checkPressure refuses a gauge pressure at or below −K₀(t)/M, where the
// model's tangent modulus K₀(t) + M·p would be zero or negative and the
// Murnaghan volume ratio has no real value. Only a suction pressure with a
// very soft K₀(t) (a tiny K₀ or a steep temperature coefficient C at high
// temperature) gets there.
func (m BulkModel) checkPressure(fn string, t units.Temperature, p units.Pressure) error {
	floor := units.Pressure(-m.k0(t) / m.M)
	if p > floor {
		return nil
	}
	return validate.Above(fn, "p", p, floor)
}

// secant returns p/(1 − V/V₀) with V/V₀ = exp(−ln(1 + M·p/K₀)/M), written
// with Log1p and Expm1 so it stays accurate as p → 0.
func (m BulkModel) secant(k0, p float64) float64 {
	x := m.M * p / k0
	if math.Abs(x) < 1e-12 {
		return k0 + 0.5*(m.M+1)*p // series: K̄ ≈ K₀ + (M+1)p/2
	}
	return p / -math.Expm1(-math.Log1p(x)/m.M)
}

// compression returns ρ(p)/ρ(0) = (1 + M·p/K₀(t))^(1/M), the isothermal
// density ratio of the Murnaghan equation.
func (m BulkModel) compression(t units.Temperature, p units.Pressure) float64 {
	return math.Exp(math.Log1p(m.M*float64(p)/m.k0(t)) / m.M)
}

// EntrainedAir is undissolved air carried in the oil: Fraction is the air's
// share of the mixture volume at atmospheric pressure (0.01 = 1 %), and N the
// polytropic exponent of its compression (1 isothermal, 1.4 adiabatic).
type EntrainedAir struct {
	Fraction float64
	N        float64
}

// EffectiveBulk is the stiffness a trapped volume of oil presents: the
// liquid's modulus, the free air in it and the compliance of the container
// (hose or tube wall, see TubeBulkModulus). Container 0 means a rigid
// container.
type EffectiveBulk struct {
	Liquid    units.Pressure // the oil's modulus at the working point, e.g. from Fluid.BulkModulus
	Container units.Pressure // container modulus V/(dV/dp); 0 for rigid
	Air       EntrainedAir
}

// At returns the effective bulk modulus at absolute pressure p by the
// series-compliance form (as in Merritt, Hydraulic Control Systems, Wiley,
// 1967, chapter on fluid properties, from memory):
//
//	1/Bₑ = 1/B_liquid + (V_a/V_t)/(n·p) + 1/B_container
//
// where n·p is the polytropic bulk modulus of air (from p·Vⁿ = const) and
// V_a/V_t is the air's volume share at p: air compressed from atmospheric
// (101.325 kPa) by p·Vⁿ = const, the oil volume taken as constant. A few
// tenths of a percent of air lower Bₑ sharply at low pressure; the effect
// fades with pressure as the air shrinks and dissolves (dissolution is not
// modelled). Compressed oil and air store energy: release pressure before
// opening a circuit (ISO 4413). A result that under- or overflows (a
// subnormal Liquid or Container modulus) is an error, never 0.
func (e EffectiveBulk) At(p units.AbsolutePressure) (units.Pressure, error) {
	const fn = "fluid.EffectiveBulk.At"
	if err := validate.Positive(fn, "Liquid", e.Liquid); err != nil {
		return 0, err
	}
	if err := validate.NonNegative(fn, "Container", e.Container); err != nil {
		return 0, err
	}
	if err := validate.InRange(fn, "Air.Fraction", e.Air.Fraction, 0, maxAirFraction); err != nil {
		return 0, err
	}
	if err := validate.InRange(fn, "p", p, minEffectivePressure, units.AbsolutePressure(maxModelPressure)); err != nil {
		return 0, err
	}
	inv := 1 / float64(e.Liquid)
	if e.Container > 0 {
		inv += 1 / float64(e.Container)
	}
	if e.Air.Fraction > 0 {
		if err := validate.InRange(fn, "Air.N", e.Air.N, minAirN, maxAirN); err != nil {
			return 0, err
		}
		x := airShare(e.Air.Fraction, e.Air.N, float64(p))
		inv += x / (e.Air.N * float64(p))
	}
	b := units.Pressure(1 / inv)
	if err := validate.PositiveResult(fn, "Bₑ", b); err != nil {
		return 0, err
	}
	return b, nil
}

// airShare is V_a/V_t at absolute pressure p (Pa) for air fraction x0 at
// atmospheric pressure, compressed polytropically with exponent n.
func airShare(x0, n, p float64) float64 {
	va := x0 * math.Pow(float64(units.StandardAtmosphere)/p, 1/n)
	return va / (va + 1 - x0)
}

// TubeBulkModulus returns the container modulus V/(dV/dp) of a thick-walled
// tube of inner and outer diameters di and do, Young's modulus e and
// Poisson's ratio nu, with no axial stress in the wall (open ends, or end
// thrust carried by the structure) and the length held fixed:
//
//	B_c = E / (2·((r_o² + r_i²)/(r_o² − r_i²) + ν))
//
// from Lamé's thick-cylinder solution for the radial growth of the bore
// (Δr_i/r_i = (p/E)·((r_o² + r_i²)/(r_o² − r_i²) + ν)) and ΔV/V = 2Δr_i/r_i
// at fixed length (Timoshenko, Strength of Materials, Part II, from memory).
// For thin walls it tends to E·s/d_i (s the wall). A closed-ended tube
// carries an axial stress that reduces the bracket by ν·r_i²/(r_o² − r_i²)
// (same Lamé solution): this form is then softer by up to about ν/2 (15 %
// for thin steel walls, 5 % at r_o = 2r_i), which errs on the safe side for
// stiffness.
// Steel tube: E ≈ 206 GPa, ν ≈ 0.3 (typical, from memory). Hoses are far
// softer: use the hose maker's volumetric expansion. A result that
// underflows to 0 (a subnormal e) is an error, never 0.
func TubeBulkModulus(di, do units.Length, e units.Pressure, nu float64) (units.Pressure, error) {
	const fn = "fluid.TubeBulkModulus"
	if err := validate.Positive(fn, "di", di); err != nil {
		return 0, err
	}
	if err := validate.Above(fn, "do", do, di); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "e", e); err != nil {
		return 0, err
	}
	if err := validate.InRange(fn, "nu", nu, 0, maxPoisson); err != nil {
		return 0, err
	}
	q := float64(di/do) * float64(di/do) // r_i²/r_o², in (0, 1): no under- or overflow
	b := float64(e) / (2 * ((1+q)/(1-q) + nu))
	if err := validate.PositiveResult(fn, "B", b); err != nil {
		return 0, err
	}
	return units.Pressure(b), nil
}
