package accumulator

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// TestStoredEnergyIntegral integrates p dV along p·Vⁿ = const from p back
// to p₀ by Simpson's rule and compares with the closed form.
func TestStoredEnergyIntegral(t *testing.T) {
	v0, p0, p := 10*units.Litre, 90*bara, 210*bara
	for _, n := range []float64{1, 1.2, 1.4, 1.7} {
		w, err := StoredEnergy(v0, p0, p, n)
		if err != nil {
			t.Fatal(err)
		}
		k := float64(p0) * math.Pow(float64(v0), n)
		va := float64(v0) * math.Pow(float64(p0/p), 1/n)
		vb := float64(v0)
		const steps = 2000
		h := (vb - va) / steps
		sum := 0.0
		for i := 0; i <= steps; i++ {
			v := va + float64(i)*h
			wt := 2.0
			if i == 0 || i == steps {
				wt = 1
			} else if i%2 == 1 {
				wt = 4
			}
			sum += wt * k / math.Pow(v, n)
		}
		integral := sum * h / 3
		if math.Abs(float64(w)-integral) > 1e-10*integral {
			t.Errorf("n %g: StoredEnergy %v J, Simpson ∫p dV %g J", n, float64(w), integral)
		}
	}
	// Isothermal by hand: p₀V₀·ln(p/p₀) = 9e6 Pa · 0.01 m³ · ln(210/90)
	// = 90 000 J · 0.8472979 = 76 256.8 J.
	if w, _ := StoredEnergy(v0, p0, p, 1); math.Abs(float64(w)-76256.8) > 0.05 {
		t.Errorf("isothermal energy %v J, want 76 256.8 J", float64(w))
	}
}

func TestShutdownDanger(t *testing.T) {
	f := ShutdownDanger(200*bara, 80*units.Kilojoule)
	if f.Severity != components.Danger || f.Hazard != components.StoredEnergy || f.Rule.Kind != components.Standard {
		t.Errorf("shutdown finding %v (%v)", f, f.Rule)
	}
}

func TestStoredEnergyBadInput(t *testing.T) {
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"v0", second(StoredEnergy(0, 90*bara, 200*bara, 1)), "v0"},
		{"p0", second(StoredEnergy(1e-3, 0, 200*bara, 1)), "p0"},
		{"p below p0", second(StoredEnergy(1e-3, 90*bara, 80*bara, 1)), "p"},
		{"n", second(StoredEnergy(1e-3, 90*bara, 200*bara, 2.5)), "n"},
	} {
		t.Run(c.name, func(t *testing.T) { checktest.RangeError(t, c.err, c.param) })
	}
}

func second[T any](_ T, err error) error { return err }
