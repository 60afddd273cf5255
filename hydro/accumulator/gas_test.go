package accumulator

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

const bara = units.BarAbsolute

// TestGasLawHandValues checks a worked case of p₀V₀ⁿ = p₁V₁ⁿ = p₂V₂ⁿ in
// absolute pressures, computed by hand from the gas law (the sizing
// formula of common practice): 5 L between 100 and 200 bar absolute with a
// 90 bar absolute precharge.
//
//	n = 1:   V₀ = 5 / (90/100 − 90/200) = 5/0.45 = 11.1111 L
//	n = 1.4: V₀ = 5 / (0.9^(1/1.4) − 0.45^(1/1.4))
//	            = 5 / (0.927505 − 0.565320) = 5/0.362184 = 13.8051 L
//
// (the powers evaluated with Python 3.11's math module as a calculator).
func TestGasLawHandValues(t *testing.T) {
	for _, c := range []struct {
		n, want float64 // litres, to 6 digits
	}{{Isothermal, 11.1111}, {Adiabatic, 13.8051}} {
		cy := Polytropic(90*bara, 100*bara, 200*bara, c.n)
		v0, err := cy.Size(5 * units.Litre)
		if err != nil || math.Abs(v0.Litres()-c.want) > 5e-5 {
			t.Errorf("n %g: Size = %.6f L, %v; want %g L", c.n, v0.Litres(), err, c.want)
		}
		// The volumes obey the gas law at each state.
		v2, v1, _ := cy.Volumes(v0)
		k0 := float64(cy.Precharge) * math.Pow(float64(v0), c.n)
		k1 := float64(cy.Min) * math.Pow(float64(v1), c.n)
		k2 := float64(cy.Max) * math.Pow(float64(v2), c.n)
		if math.Abs(k1/k0-1) > 1e-14 || math.Abs(k2/k0-1) > 1e-14 || math.Abs(float64(v1-v2)-0.005) > 1e-17 {
			t.Errorf("n %g: p·Vⁿ = %g, %g, %g; V₁ − V₂ = %v", c.n, k0, k1, k2, v1-v2)
		}
		if dv, _ := cy.Delivered(v0); math.Abs(dv.Litres()-5) > 1e-12 {
			t.Errorf("n %g: Delivered(Size(5 L)) = %v", c.n, dv)
		}
	}
	// Mixed: charged isothermally, discharged adiabatically:
	// V₂ = V₀·p₀/p₂ = 0.45·V₀, V₁ = V₂·2^(1/1.4) = 0.45·1.640671·V₀ =
	// 0.738302·V₀, so ΔV = 0.288302·V₀ (by hand).
	mixed := Cycle{Precharge: 90 * bara, Min: 100 * bara, Max: 200 * bara, Charge: Isothermal, Discharge: Adiabatic}
	if dv, _ := mixed.Delivered(10 * units.Litre); math.Abs(dv.Litres()-2.88302) > 5e-5 {
		t.Errorf("mixed cycle delivers %v from 10 L, want 2.88302 L", dv.Litres())
	}
}

// TestGasStaysInTheShell: charged fast (n 1.4) from 90 to 300 bar abs and
// discharged slowly (n 1) to 100 bar abs, the gas would go from
// V₂ = V₀·0.3^(1/1.4) = 0.423170·V₀ to V₂·(300/100) = 1.27·V₀, more than
// the shell holds. The
// gas stops at V₀ (the bladder on its poppet) above p₁, so the delivery is
// V₀ − V₂ = 0.576830·V₀ (0.3^(1/1.4) by hand, Python 3.11 math as a
// calculator).
func TestGasStaysInTheShell(t *testing.T) {
	c := Cycle{Precharge: 90 * bara, Min: 100 * bara, Max: 300 * bara, Charge: Adiabatic, Discharge: Isothermal}
	v2, v1, err := c.Volumes(10 * units.Litre)
	if err != nil || math.Abs(v2.Litres()-4.23170) > 5e-5 || v1 != 10*units.Litre {
		t.Errorf("Volumes(10 L) = %v, %v, %v; want 4.23170 L and the whole 10 L", v2, v1, err)
	}
	dv, err := c.Delivered(10 * units.Litre)
	if err != nil || math.Abs(dv.Litres()-5.76830) > 5e-5 {
		t.Errorf("Delivered(10 L) = %v, %v; want 5.76830 L", dv, err)
	}
	if v0, err := c.Size(dv); err != nil || math.Abs(v0.Litres()-10) > 1e-12 {
		t.Errorf("Size(Delivered(10 L)) = %v, %v", v0, err)
	}
}

func TestGasLawExtremes(t *testing.T) {
	// p₀/p₂ underflows to 0 and p₂/p₁ overflows: an error, never 0·Inf.
	c := Polytropic(5e-324, 2e-3, math.MaxFloat64, Isothermal)
	v2, v1, err := c.Volumes(1)
	if v2 != 0 || v1 != 0 {
		t.Errorf("Volumes = %v, %v beside %v", v2, v1, err)
	}
	t.Run("volumes", func(t *testing.T) { checktest.RangeError(t, err, "atMax") })
	dv, err := c.Delivered(1)
	if dv != 0 {
		t.Errorf("Delivered = %v beside %v", dv, err)
	}
	t.Run("delivered", func(t *testing.T) { checktest.RangeError(t, err, "ΔV") })
}

func TestGasLawBadInput(t *testing.T) {
	ok := Polytropic(90*bara, 100*bara, 200*bara, 1)
	for _, c := range []struct {
		name  string
		c     Cycle
		param string
	}{
		{"precharge 0", Polytropic(0, 100*bara, 200*bara, 1), "Precharge"},
		{"precharge at min", Polytropic(100*bara, 100*bara, 200*bara, 1), "Precharge"},
		{"precharge above min", Polytropic(120*bara, 100*bara, 200*bara, 1), "Precharge"},
		{"min NaN", Polytropic(90*bara, units.AbsolutePressure(math.NaN()), 200*bara, 1), "Min"},
		{"max below min", Polytropic(90*bara, 100*bara, 100*bara, 1), "Max"},
		{"index 0.9", Polytropic(90*bara, 100*bara, 200*bara, 0.9), "Charge"},
		{"discharge 3", Cycle{Precharge: 90 * bara, Min: 100 * bara, Max: 200 * bara, Charge: 1, Discharge: 3}, "Discharge"},
	} {
		v, err := c.c.Size(1e-3)
		if v != 0 {
			t.Errorf("%s: %v beside the error", c.name, v)
		}
		t.Run(c.name, func(t *testing.T) { checktest.RangeError(t, err, c.param) })
	}
	t.Run("dv", func(t *testing.T) { _, err := ok.Size(0); checktest.RangeError(t, err, "dv") })
	t.Run("v0", func(t *testing.T) { _, err := ok.Delivered(-1); checktest.RangeError(t, err, "v0") })
	t.Run("volumes", func(t *testing.T) { _, _, err := ok.Volumes(0); checktest.RangeError(t, err, "v0") })
}

// BenchmarkCycleSize sizes a mixed cycle (isothermal charge, adiabatic
// discharge) for a range of volumes.
func BenchmarkCycleSize(b *testing.B) {
	c := Cycle{Precharge: 90 * bara, Min: 100 * bara, Max: 200 * bara, Charge: Isothermal, Discharge: Adiabatic}
	dvs := [...]units.Volume{0.5e-3, 1e-3, 2.5e-3, 5e-3, 12e-3}
	b.ReportAllocs()
	var sink units.Volume
	for i := 0; b.Loop(); i++ {
		v, _ := c.Size(dvs[i%len(dvs)])
		sink += v
	}
	_ = sink
}
