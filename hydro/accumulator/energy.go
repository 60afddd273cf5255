package accumulator

import (
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// StoredEnergy returns the work the nitrogen of an accumulator of nominal
// gas volume v0 and precharge p0 does when it expands with polytropic index
// n from absolute pressure p back to p0, the energy the oil port can
// release:
//
//	W = ∫ p dV = p₀·V₀·ln(p/p₀)                          (n = 1)
//	W = (p·V − p₀·V₀)/(n − 1) = p₀·V₀·((p/p₀)^((n−1)/n) − 1)/(n − 1)   (n > 1)
//
// in absolute pressures (work of a polytropic process of an ideal gas). It
// counts the gas's work, not the share the oil delivers against
// atmospheric pressure, so it errs high as a hazard figure should. Even
// with the oil drained the gas still holds its precharge, which only the
// gas valve releases. p0 must be finite and > 0, p at least p0, v0 finite
// and > 0, n in [1, 2].
func StoredEnergy(v0 units.Volume, p0, p units.AbsolutePressure, n float64) (units.Energy, error) {
	const fn = "accumulator.StoredEnergy"
	if err := validate.Positive(fn, "v0", v0); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "p0", p0); err != nil {
		return 0, err
	}
	if err := validate.InRange(fn, "p", p, p0, units.AbsolutePressure(math.MaxFloat64)); err != nil {
		return 0, err
	}
	if err := validate.InRange(fn, "n", n, minIndex, maxIndex); err != nil {
		return 0, err
	}
	lr := math.Log(float64(p / p0))
	w := float64(p0) * float64(v0)
	if n == 1 {
		w *= lr
	} else {
		w *= math.Expm1((n-1)/n*lr) / (n - 1)
	}
	return validate.Checked(fn, "W", units.Energy(w))
}

// iso4413 is the rule behind the shutdown finding.
var iso4413 = components.StandardRule("ISO 4413:2010, gas-loaded accumulators")

// ShutdownDanger returns the danger finding every accumulator carries: it
// holds pressure p and energy w after the pump stops, and ISO 4413 asks
// that an accumulator circuit discharge the oil or isolate the accumulator
// automatically when the machine is switched off, or carry a warning
// label where that cannot be done; and the gas precharge stays in the shell
// when the oil is drained.
func ShutdownDanger(p units.AbsolutePressure, w units.Energy) components.Finding {
	return components.NewFinding(components.Danger, components.StoredEnergy, "accumulator.shutdown", iso4413,
		"the accumulator holds %v and %v of gas energy after the pump stops: discharge it or isolate it automatically at shutdown, or mark it with a warning, and remember the gas precharge stays when the oil is drained",
		p, w)
}
