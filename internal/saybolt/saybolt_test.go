package saybolt

import (
	"math"
	"testing"
)

// ASTM D2161: 700 SUS → 151.0891 mm²/s (the standard's Appendix X1
// example), to the printed 4 decimals; 10 mm²/s → 58.84 SUS and 32 mm²/s →
// 150.49 SUS computed from the equation, to the printed 2 decimals; above
// 500 mm²/s, SUS = 4.632ν exactly.
func TestD2161(t *testing.T) {
	if nu := Viscosity(700); math.Abs(nu-151.0891) > 5e-5 {
		t.Errorf("700 SUS = %.6f mm²/s, want 151.0891", nu)
	}
	for _, c := range []struct{ nu, sus float64 }{{10, 58.84}, {32, 150.49}} {
		if s := Seconds(c.nu); math.Abs(s-c.sus) > 0.005 {
			t.Errorf("SUS(%g) = %.4f, want %g", c.nu, s, c.sus)
		}
	}
	if s := Seconds(1000); s != 4632 {
		t.Errorf("SUS(1000) = %g, want 4632", s)
	}
	if nu := Viscosity(4632); math.Abs(nu-1000) > 2.3e-13 { // 4.632 is inexact in binary: 2 ulp
		t.Errorf("4632 SUS = %.17g mm²/s, want 1000", nu)
	}
}

// TestInverse: Viscosity(Seconds(ν)) = ν to 1e-12 relative over the
// equation's range, and Seconds is strictly increasing.
func TestInverse(t *testing.T) {
	prev := 0.0
	for k := 0; k <= 1000; k++ {
		nu := MinViscosity * math.Pow(LinearFrom/MinViscosity, float64(k)/1000)
		s := Seconds(nu)
		if !(s > prev) {
			t.Fatalf("SUS not increasing at %g mm²/s", nu)
		}
		prev = s
		if back := Viscosity(s); math.Abs(back-nu) > 1e-12*nu {
			t.Errorf("ν %g → %g SUS → %.17g", nu, s, back)
		}
	}
}
