package fluid

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// Boundary tests: each case sits exactly on a limit that a standard states,
// or one ulp either side of it.

func up(v units.KinematicViscosity) units.KinematicViscosity {
	return units.KinematicViscosity(math.Nextafter(float64(v), math.Inf(1)))
}

func down(v units.KinematicViscosity) units.KinematicViscosity {
	return units.KinematicViscosity(math.Nextafter(float64(v), math.Inf(-1)))
}

// ASTM D2270 defines VI for Y ≥ 2 mm²/s, and Table 1's first row is
// Y 2.0: L 7.994, H 6.394 [S] (CHECKS.md; shared CSV). Y = 2 is accepted
// and takes that row exactly; one ulp below is refused.
func TestBoundaryY2(t *testing.T) {
	l, h, err := ReferenceViscosities(mm2s(2))
	if err != nil || l != mm2s(7.994) || h != mm2s(6.394) {
		t.Errorf("L, H(2) = %v, %v, %v; want 7.994, 6.394", l, h, err)
	}
	if vi, err := ViscosityIndex(mm2s(7.994), mm2s(2)); err != nil || math.Abs(vi) > 1e-12 {
		t.Errorf("VI(L, 2) = %v, %v; want 0", vi, err)
	}
	_, err = ViscosityIndex(mm2s(10), down(mm2s(2)))
	wantRangeError(t, err, "v100")
	_, _, err = ReferenceViscosities(down(mm2s(2)))
	wantRangeError(t, err, "v100")
}

// ASTM D2270: Table 1 for 2 ≤ Y ≤ 70, the quadratics for Y > 70 [S]
// (CHECKS.md). Y = 70 takes the last row (L 4905, H 1558) [S]; one ulp above
// takes L = 0.8353Y² + 14.67Y − 216 = 4903.87, H = 0.1684Y² + 11.85Y − 97
// = 1557.66 [X], to 1e-9 relative (one ulp of Y moves them by ~1e-14).
func TestBoundaryY70(t *testing.T) {
	l, h, err := ReferenceViscosities(mm2s(70))
	if err != nil || l != mm2s(4905) || h != mm2s(1558) {
		t.Errorf("L, H(70) = %v, %v, %v; want 4905, 1558", l, h, err)
	}
	l, h, err = ReferenceViscosities(up(mm2s(70)))
	if err != nil || !near(l.SquareMillimetresPerSecond(), 4903.87, 1e-9) || !near(h.SquareMillimetresPerSecond(), 1557.66, 1e-9) {
		t.Errorf("L, H(70⁺) = %v, %v, %v; want 4903.87, 1557.66", l, h, err)
	}
}

// ASTM D2270: VI ≤ 100 by (L − U)/(L − H)·100 and VI ≥ 100 by
// (10^N − 1)/0.00715 + 100 [S]; both give exactly 100 at U = H, so the
// branch taken at U == H does not matter and VI is continuous across it.
func TestBoundaryUEqualsH(t *testing.T) {
	for _, y := range []float64{2, 5.05, 8.86, 70, 120} { // table rows, interpolated, quadratic
		_, h, err := ReferenceViscosities(mm2s(y))
		if err != nil {
			t.Fatal(err)
		}
		if vi, err := ViscosityIndex(h, mm2s(y)); err != nil || vi != 100 {
			t.Errorf("Y %g: VI(U = H) = %v, %v; want exactly 100", y, vi, err)
		}
		hu := h.SquareMillimetresPerSecond()
		above, _ := ViscosityIndex(mm2s(hu*(1+1e-9)), mm2s(y)) // first branch
		below, _ := ViscosityIndex(mm2s(hu*(1-1e-9)), mm2s(y)) // second branch
		if !(above < 100 && below > 100) || math.Abs(above-100) > 1e-5 || math.Abs(below-100) > 1e-5 {
			t.Errorf("Y %g: VI just either side of U = H: %v, %v; want 100 ∓ <1e-5", y, above, below)
		}
		// The inverse at VI exactly 100 returns Y (bisection to 1e-12),
		// except at 70 where the step between Table 1 and the quadratics
		// gives a second root about 0.01 mm²/s higher (2e-4 relative).
		tol := 1e-12
		if y == 70 {
			tol = 2e-4
		}
		if v100, err := V100ForVI(h, 100); err != nil || !near(v100.SquareMillimetresPerSecond(), y, tol) {
			t.Errorf("V100ForVI(H(%g), 100) = %v, %v; want %g", y, v100, err, y)
		}
	}
}

// ASTM D2161: the equation holds for 1.81 ≤ ν ≤ 500 mm²/s and
// SUS = 4.632ν above [S] (CHECKS.md). 1.81 is accepted, one ulp below is
// refused; 500 (also when given in m²/s, 500.00000000000006 mm²/s in
// float64) takes the equation, 500·(1 + 10⁻⁹) the linear form.
func TestBoundarySaybolt(t *testing.T) {
	if _, err := SayboltSeconds(mm2s(1.81)); err != nil {
		t.Errorf("SUS(1.81): %v", err)
	}
	_, err := SayboltSeconds(down(mm2s(1.81)))
	wantRangeError(t, err, "v")
	s500, _ := SayboltSeconds(mm2s(500))
	// 4.6324·500 + (1 + 16.32)/((3930.2 + 131350 + 5992500 + 205750000)·10⁻⁵) [X]
	if want := 2316.2 + 17.32/2118.777802; math.Abs(s500-want) > 1e-9 {
		t.Errorf("SUS(500) = %.12g, want %.12g", s500, want)
	}
	if s, _ := SayboltSeconds(5e-4); s != s500 {
		t.Errorf("SUS(5e-4 m²/s) = %.12g, want SUS(500 mm²/s) = %.12g", s, s500)
	}
	above := mm2s(500 * (1 + 1e-9))
	if s, _ := SayboltSeconds(above); s != 4.632*above.SquareMillimetresPerSecond() {
		t.Errorf("SUS(500⁺) = %.12g, want 4.632ν", s)
	}
}

// ISO 3448:1992 [S] (CHECKS.md): VG 2 starts at 1.98 mm²/s and VG 1500
// ends at 1650 mm²/s; the limits belong to the grade, beyond them no grade.
func TestBoundaryGradeEnds(t *testing.T) {
	for _, c := range []struct {
		v    units.KinematicViscosity
		want Grade
	}{
		{mm2s(1.98), VG2}, {mm2s(1650), VG1500},
		{mm2s(1.98 * (1 - 1e-9)), 0}, {mm2s(1650 * (1 + 1e-9)), 0},
	} {
		g, err := GradeOf(c.v)
		if g != c.want || (c.want == 0) != errors.Is(err, ErrNoGrade) {
			t.Errorf("GradeOf(%v) = %v, %v; want %v", c.v, g, err, c.want)
		}
	}
}

// A curve applies from where it reaches MaxViscosity (2·10⁷ mm²/s) to where
// it falls to MinViscosity (0.21 mm²/s), the ASTM D341 span (from memory).
// At the ends of Range, At returns the limits to round-off; one ulp
// outside it refuses.
func TestBoundaryCurveRange(t *testing.T) {
	c, err := CurveThrough(celsius(40), mm2s(32), celsius(100), mm2s(5.4))
	if err != nil {
		t.Fatal(err)
	}
	cold, hot := c.Range()
	if v, err := c.At(cold); err != nil || !near(float64(v), float64(MaxViscosity), 1e-12) {
		t.Errorf("At(cold) = %v, %v; want %v", v, err, MaxViscosity)
	}
	if v, err := c.At(hot); err != nil || !near(float64(v), float64(MinViscosity), 1e-12) {
		t.Errorf("At(hot) = %v, %v; want %v", v, err, MinViscosity)
	}
	_, err = c.At(units.Temperature(math.Nextafter(float64(cold), 0)))
	wantRangeError(t, err, "t")
	_, err = c.At(units.Temperature(math.Nextafter(float64(hot), math.Inf(1))))
	wantRangeError(t, err, "t")
	if tt, err := c.TemperatureFor(MinViscosity); err != nil || tt != hot {
		t.Errorf("TemperatureFor(MinViscosity) = %v, %v; want %v", tt, err, hot)
	}
	_, err = c.TemperatureFor(down(MinViscosity))
	wantRangeError(t, err, "v")
}
