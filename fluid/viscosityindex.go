package fluid

//go:generate go run gen_viscosityindex_table.go

import (
	"math"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// d2270Row is one row of ASTM D2270 Table 1, all in mm²/s.
type d2270Row struct{ y, l, h float64 }

// ViscosityIndex returns the viscosity index of an oil with kinematic
// viscosity v40 at 40 °C (U) and v100 at 100 °C (Y), per ASTM D2270
// (ASTM D2270-10(2016); VI 0–100 and VI ≥ 100), unrounded:
//
//	U > H:  VI = (L − U)/(L − H)·100                          (VI ≤ 100)
//	U ≤ H:  N = (log H − log U)/log Y,  VI = (10^N − 1)/0.00715 + 100
//
// L and H (mm²/s) come from Table 1 by linear interpolation for
// 2 ≤ Y ≤ 70 mm²/s (see ReferenceViscosities), and for Y > 70 mm²/s from
// L = 0.8353Y² + 14.67Y − 216 and H = 0.1684Y² + 11.85Y − 97. Report the
// result rounded with RoundVI. v100 must be at least 2 mm²/s and below v40,
// and v40 at most MaxViscosity. It does not allocate unless it fails.
func ViscosityIndex(v40, v100 units.KinematicViscosity) (float64, error) {
	const fn = "fluid.ViscosityIndex"
	if err := validate.Positive(fn, "v40", v40); err != nil {
		return 0, err
	}
	if err := validate.InRange(fn, "v40", v40, 0, MaxViscosity); err != nil {
		return 0, err
	}
	if err := validate.Above(fn, "v100", v100, 0); err != nil {
		return 0, err
	}
	if v100 < minVIY {
		return 0, validate.Fail(fn, "v100", v100, "≥ 2 mm²/s (ASTM D2270 defines no VI below)")
	}
	if v100 >= v40 {
		return 0, validate.Fail(fn, "v100", v100, "< v40 = "+v40.String())
	}
	vi := viOf(v40.SquareMillimetresPerSecond(), v100.SquareMillimetresPerSecond())
	if err := validate.Result(fn, "VI", vi); err != nil {
		return 0, err
	}
	return vi, nil
}

// viOf is the D2270 VI of U and Y in mm²/s (Y ≥ 2, U > Y assumed).
func viOf(u, y float64) float64 {
	l, h := lh(y)
	if u > h {
		return (l - u) / (l - h) * 100
	}
	n := (math.Log10(h) - math.Log10(u)) / math.Log10(y)
	return (math.Pow(10, n)-1)/0.00715 + 100
}

// lh returns D2270's L and H (mm²/s) for y ≥ 2 mm²/s.
func lh(y float64) (l, h float64) {
	if y > 70 {
		return 0.8353*y*y + 14.67*y - 216, 0.1684*y*y + 11.85*y - 97
	}
	t := d2270Table[:]
	i, j := 0, len(t)-1 // first row with t[i].y >= y; y ≤ 70 = t[last].y
	for i < j {
		m := int(uint(i+j) >> 1)
		if t[m].y < y {
			i = m + 1
		} else {
			j = m
		}
	}
	if i == 0 || t[i].y == y {
		return t[i].l, t[i].h
	}
	r0, r1 := t[i-1], t[i]
	f := (y - r0.y) / (r1.y - r0.y)
	return r0.l + f*(r1.l-r0.l), r0.h + f*(r1.h-r0.h)
}

// ReferenceViscosities returns ASTM D2270's L and H for a 100 °C viscosity
// v100: the 40 °C viscosities of the reference oils of VI 0 and VI 100 that
// share v100. From ASTM D2270 Table 1 with linear interpolation for
// 2–70 mm²/s, and from the standard's quadratics above 70 mm²/s.
func ReferenceViscosities(v100 units.KinematicViscosity) (l, h units.KinematicViscosity, err error) {
	const fn = "fluid.ReferenceViscosities"
	if err := validate.Finite(fn, "v100", v100); err != nil {
		return 0, 0, err
	}
	if err := validate.InRange(fn, "v100", v100, minVIY, MaxViscosity); err != nil {
		return 0, 0, err
	}
	lf, hf := lh(v100.SquareMillimetresPerSecond())
	return units.KinematicViscosity(lf) * units.SquareMillimetrePerSecond,
		units.KinematicViscosity(hf) * units.SquareMillimetrePerSecond, nil
}

// RoundVI rounds a viscosity index as ASTM D2270 reports it: to the nearest
// whole number, halves to the even neighbour. Like math.RoundToEven, it
// returns NaN and ±Inf unchanged; ViscosityIndex never returns them.
func RoundVI(vi float64) float64 { return math.RoundToEven(vi) }

// V100ForVI returns the 100 °C viscosity that gives an oil of 40 °C
// viscosity v40 the viscosity index vi (the inverse of ViscosityIndex in its
// second argument). It solves ViscosityIndex(v40, Y) = vi for Y by bisection
// on log Y to round-off; VI rises with Y at fixed v40, so the root is
// unique, except that Table 1 and the quadratics meet at Y = 70 mm²/s with a
// step of about 0.03 % in L and H: there VI drops by about 0.02 just above
// 70 mm²/s, and a VI reached at Y = 70 is reached again about 0.01 mm²/s
// higher (the result may be either). For v40 below about 2.4 mm²/s, VIs
// are in the thousands and need not rise with Y; the result is then one
// root between the VIs at the ends of the span.
// v40 must exceed 2 mm²/s, and vi must lie between the VI at Y = 2 mm²/s and
// the VI as Y approaches v40 (the error gives that span).
func V100ForVI(v40 units.KinematicViscosity, vi float64) (units.KinematicViscosity, error) {
	const fn = "fluid.V100ForVI"
	if err := validate.InRange(fn, "v40", v40, minVIU, MaxViscosity); err != nil {
		return 0, err
	}
	if err := validate.Finite(fn, "vi", vi); err != nil {
		return 0, err
	}
	u := v40.SquareMillimetresPerSecond()
	lo, hi := math.Log(2.0), math.Log(u*(1-1e-9))
	vlo, vhi := viOf(u, 2), viOf(u, math.Exp(hi))
	rising := vhi >= vlo // false only for v40 below about 2.4 mm²/s
	if !(vi >= min(vlo, vhi) && vi <= max(vlo, vhi)) {
		return 0, validate.InRange(fn, "vi", vi, min(vlo, vhi), max(vlo, vhi))
	}
	for range 200 {
		mid := 0.5 * (lo + hi)
		if mid <= lo || mid >= hi {
			break
		}
		if (viOf(u, math.Exp(mid)) < vi) == rising {
			lo = mid
		} else {
			hi = mid
		}
	}
	return units.KinematicViscosity(math.Exp(0.5*(lo+hi))) * units.SquareMillimetrePerSecond, nil
}

// CurveFromVI returns the D341 curve of an oil with 40 °C viscosity v40 and
// viscosity index vi: the curve through v40 at 40 °C and V100ForVI(v40, vi)
// at 100 °C. This is how a designer turns a grade and a VI into viscosity at
// any temperature. Errors name v40 or vi (a VI within a few units of the
// top of its span gives ν100 so close to v40 that the curve is refused).
func CurveFromVI(v40 units.KinematicViscosity, vi float64) (Curve, error) {
	const fn = "fluid.CurveFromVI"
	v100, err := V100ForVI(v40, vi)
	if err != nil {
		return Curve{}, validate.Renamed(err, fn, nil)
	}
	c, err := CurveThrough(t40, v40, t100, v100)
	if err != nil { // within a few VI of the top of the span: ν100 ≈ ν40
		return Curve{}, validate.Fail(fn, "vi", vi,
			"a VI whose 100 °C viscosity ("+v100.String()+") lies far enough below v40 = "+v40.String()+
				" that the D341 curve spans 0.21–2·10⁷ mm²/s at finite temperatures")
	}
	return c, nil
}
