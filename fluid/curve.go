package fluid

import (
	"math"
	"sync"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Curve is the ASTM D341 viscosity–temperature line of one fluid:
//
//	log₁₀ log₁₀ Z = A − B·log₁₀ T
//	Z = ν + 0.7 + exp(−1.47 − 1.84ν − 0.51ν²)
//
// with ν in mm²/s and T in kelvins (the equations of ASTM D341-20,
// Section 5, from which its charts are drawn).
// The zero Curve is not usable: its methods return errors. Build one with
// CurveThrough, CurveFromVI or a Fluid.
//
// A Curve is valid between the temperatures where it reaches MaxViscosity
// (cold end) and MinViscosity (hot end); see Range. Extrapolating far beyond
// the two fitted temperatures is allowed but less certain: D341 is a
// straight-line fit, and real oils (especially polymer-thickened HV oils
// and water-glycols) stray from it away from the measured points.
type Curve struct {
	a, b   float64
	lo, hi units.Temperature // valid range: ν(lo) = MaxViscosity, ν(hi) = MinViscosity
}

// CurveThrough returns the ASTM D341 curve through (t1, v1) and (t2, v2):
//
//	B = (log log Z₁ − log log Z₂) / (log T₂ − log T₁),  A = log log Z₁ + B·log T₁.
//
// Viscosities must lie within [MinViscosity, MaxViscosity], temperatures
// above absolute zero and at least 1 K apart, and the viscosity must fall as
// temperature rises (B > 0). Usually t1 = 40 °C and t2 = 100 °C.
func CurveThrough(t1 units.Temperature, v1 units.KinematicViscosity, t2 units.Temperature, v2 units.KinematicViscosity) (Curve, error) {
	const fn = "fluid.CurveThrough"
	if err := checkTemperature(fn, "t1", t1); err != nil {
		return Curve{}, err
	}
	if err := checkTemperature(fn, "t2", t2); err != nil {
		return Curve{}, err
	}
	if err := validate.InRange(fn, "v1", v1, MinViscosity, MaxViscosity); err != nil {
		return Curve{}, err
	}
	if err := validate.InRange(fn, "v2", v2, MinViscosity, MaxViscosity); err != nil {
		return Curve{}, err
	}
	if math.Abs(float64(t2-t1)) < minFitSpan {
		return Curve{}, validate.Fail(fn, "t2", t2, "at least 1 K from t1 = "+t1.String())
	}
	x1, x2 := log10T(t1), log10T(t2)
	y1, y2 := loglogZ(v1.SquareMillimetresPerSecond()), loglogZ(v2.SquareMillimetresPerSecond())
	b := (y1 - y2) / (x2 - x1)
	if !(b > 0) {
		return Curve{}, validate.Fail(fn, "v2", v2, "a viscosity that falls as temperature rises (v2 < v1 when t2 > t1)")
	}
	c := newCurve(y1+b*x1, b)
	if !c.rangeFinite() {
		return Curve{}, validate.Fail(fn, "t2", t2, "points whose curve crosses 0.21–2·10⁷ mm²/s at finite temperatures above 0 K")
	}
	return c, nil
}

// NewCurve returns the D341 curve with constants a and b (B > 0), for
// example as printed on a data sheet or taken from Curve.A and Curve.B.
func NewCurve(a, b float64) (Curve, error) {
	const fn = "fluid.NewCurve"
	if err := validate.Finite(fn, "a", a); err != nil {
		return Curve{}, err
	}
	if err := validate.Positive(fn, "b", b); err != nil {
		return Curve{}, err
	}
	c := newCurve(a, b)
	if !c.rangeFinite() {
		return Curve{}, validate.Fail(fn, "a", a, "constants whose curve crosses 0.21–2·10⁷ mm²/s above 0 K")
	}
	return c, nil
}

func newCurve(a, b float64) Curve {
	c := Curve{a: a, b: b}
	c.lo = c.temperatureOfLogLog(loglogZMaxViscosity)
	c.hi = c.temperatureOfLogLog(loglogZMinViscosity)
	return c
}

// The D341 log log Z of the viscosity limits, and the logarithms of the
// data-sheet temperatures 40 °C and 100 °C, computed once at start-up and
// never changed: building a curve does not recompute these constants.
var (
	loglogZMinViscosity = loglogZ(MinViscosity.SquareMillimetresPerSecond())
	loglogZMaxViscosity = loglogZ(MaxViscosity.SquareMillimetresPerSecond())
	log10T40            = math.Log10(float64(t40))
	log10T100           = math.Log10(float64(t100))
)

// log10T returns log₁₀ of t in kelvins, the same float64 as math.Log10,
// from the constants above for 40 °C and 100 °C.
func log10T(t units.Temperature) float64 {
	switch t {
	case t40:
		return log10T40
	case t100:
		return log10T100
	}
	return math.Log10(float64(t))
}

// rangeFinite reports whether the curve's valid range is a finite,
// non-empty span above 0 K.
func (c Curve) rangeFinite() bool {
	return c.hi > c.lo && c.lo > 0 && !math.IsInf(float64(c.hi), 0)
}

// A returns the constant A of log log Z = A − B·log T (T in K, ν in mm²/s).
func (c Curve) A() float64 { return c.a }

// B returns the slope B of log log Z = A − B·log T (T in K, ν in mm²/s).
func (c Curve) B() float64 { return c.b }

// Range returns the temperatures between which the curve is applied: cold is
// where it reaches MaxViscosity, hot where it falls to MinViscosity.
func (c Curve) Range() (cold, hot units.Temperature) { return c.lo, c.hi }

// At returns the kinematic viscosity at temperature t:
//
//	Z = 10^(10^(A − B·log₁₀ T)),  ν = Z − 0.7 − exp(−1.47 − 1.84ν − 0.51ν²).
//
// ASTM D341-20 gives an explicit approximate inverse for ν(Z); At starts
// from it and refines with Newton's method where the exponential term is not
// negligible (ν below about 7 mm²/s), so that At and TemperatureFor are exact
// inverses to round-off. It refuses t outside Range (for example below the
// pour-point region, where ν would exceed MaxViscosity). It does not
// allocate unless it fails.
func (c Curve) At(t units.Temperature) (units.KinematicViscosity, error) {
	if !(t >= c.lo && t <= c.hi) || c.b <= 0 {
		return 0, c.rangeError("fluid.Curve.At", "t", t)
	}
	// 10^(10^y) written with Exp and Log, about three times faster than Pow.
	y := c.a - c.b*math.Log(float64(t))*(1/math.Ln10)
	nu := nuFromZ(math.Exp(math.Ln10 * math.Exp(math.Ln10*y)))
	// t in range puts ν in range; clamp the last-bit round-off at the ends
	// so that TemperatureFor accepts every value At returns.
	nu = min(max(nu, minNu), maxNu)
	return units.KinematicViscosity(nu) * units.SquareMillimetrePerSecond, nil
}

const (
	minNu = float64(MinViscosity / units.SquareMillimetrePerSecond)
	maxNu = float64(MaxViscosity / units.SquareMillimetrePerSecond)
)

// TemperatureFor returns the temperature at which the curve has viscosity v:
// T = 10^((A − log₁₀ log₁₀ Z)/B). It is the exact inverse of At. v must lie
// in [MinViscosity, MaxViscosity].
func (c Curve) TemperatureFor(v units.KinematicViscosity) (units.Temperature, error) {
	const fn = "fluid.Curve.TemperatureFor"
	if c.b <= 0 {
		return 0, validate.Fail(fn, "curve", c.b, "a curve built by CurveThrough, NewCurve or CurveFromVI")
	}
	if err := validate.InRange(fn, "v", v, MinViscosity, MaxViscosity); err != nil {
		return 0, err
	}
	// v in range puts T in range; clamp the last-bit round-off at the ends
	// so that At accepts every temperature TemperatureFor returns.
	return min(max(c.temperatureAt(v.SquareMillimetresPerSecond()), c.lo), c.hi), nil
}

func (c Curve) temperatureAt(nu float64) units.Temperature {
	return c.temperatureOfLogLog(loglogZ(nu))
}

// temperatureOfLogLog returns T = 10^((A − y)/B) in kelvins, the temperature
// at which the curve's log log Z is y.
func (c Curve) temperatureOfLogLog(y float64) units.Temperature {
	return units.Temperature(exp10((c.a - y) / c.b))
}

// exp10 returns 10^x as 10^n · e^(f·ln 10) with n = ⌊x⌋ and 0 ≤ f < 1: an
// exact power of ten (math.Pow10) times one exponential of an argument below
// 2.31, whose rounding is carried into the result (math.FMA and the low part
// of ln 10), so that it is within 2 ulp of 10^x, at a fraction of the cost
// of math.Pow(10, x). Beyond the exact powers (n < 0 or n > 22) it is
// math.Pow.
func exp10(x float64) float64 {
	n := math.Floor(x)
	if !(n >= 0 && n <= 22) {
		return math.Pow(10, x)
	}
	f := x - n // exact: x and n share their binary exponent range
	y := f * math.Ln10
	lo := math.FMA(f, math.Ln10, -y) + f*ln10Low // the part of f·ln 10 that y rounded off
	return math.Pow10(int(n)) * (math.Exp(y) * (1 + lo))
}

// ln10Low is ln 10 − math.Ln10, the part of ln 10 below float64 precision:
// ln 10 = 2.302585092994045684017991454684364207601 (to 40 digits).
const ln10Low = -2.1707562233822494e-16

func (c Curve) rangeError(fn, param string, t units.Temperature) error {
	if c.b <= 0 {
		return validate.Fail(fn, "curve", c.b, "a curve built by CurveThrough, NewCurve or CurveFromVI")
	}
	return validate.InRange(fn, param, t, c.lo, c.hi)
}

// zOf is the D341-20 Z of ν (mm²/s).
func zOf(nu float64) float64 { return nu + 0.7 + math.Exp(-1.47-1.84*nu-0.51*nu*nu) }

func loglogZ(nu float64) float64 { return math.Log10(math.Log10(zOf(nu))) }

// nuFromZ inverts zOf, the ASTM D341 relation Z = ν + 0.7 + exp(−1.47 −
// 1.84ν − 0.51ν²). Above ν ≈ 7 mm²/s the exponential is below 10⁻¹⁷ of ν
// and ν = Z − 0.7. Below, it evaluates a piecewise Chebyshev interpolant of
// the correction Z − 0.7 − ν, fitted once on first use to nuFromZNewton (the
// exact inverse) and accurate to round-off (TestNuFromZDense); this takes
// one polynomial instead of three dependent exponentials.
func nuFromZ(z float64) float64 {
	w := z - 0.7
	if w > 7 {
		return w
	}
	fit := thinFit()
	if w < fit.lo {
		return nuFromZNewton(z) // only below the viscosities At accepts
	}
	return w - fit.at(w)
}

// Piecewise Chebyshev fit of the low-viscosity correction c(w) = w − ν(w),
// w = Z − 0.7, over the w of 0.21–7 mm²/s. c is an entire function that
// falls from about 0.15 to 10⁻¹⁷; 64 pieces of degree 10 reproduce the
// exact inverse to about 2·10⁻¹⁵ of ν, a few ulp (TestNuFromZDense). The
// lowest piece, nearest the complex singularities of the inverse, sets the
// size: 16 pieces of degree 12 left 2·10⁻¹² there.
const (
	thinPieces = 64
	thinDegree = 10
)

type chebFit struct {
	lo, inv float64 // w at the low end; pieces per unit of w
	c       [thinPieces][thinDegree + 1]float64
}

// thinFit is computed on first use (about 0.2 ms) and never written again.
var thinFit = sync.OnceValue(fitThin)

func fitThin() *chebFit {
	const n = thinDegree + 1
	lo := minNu + math.Exp(-1.47-1.84*minNu-0.51*minNu*minNu)
	width := (7 - lo) / thinPieces
	f := &chebFit{lo: lo, inv: 1 / width}
	var vals [n]float64
	for k := range thinPieces {
		mid := lo + (float64(k)+0.5)*width
		for j := range n {
			w := mid + width/2*math.Cos(math.Pi*(float64(j)+0.5)/n)
			vals[j] = w - nuFromZNewton(w+0.7)
		}
		for m := range n {
			sum := 0.0
			for j := range n {
				sum += vals[j] * math.Cos(math.Pi*float64(m)*(float64(j)+0.5)/n)
			}
			f.c[k][m] = 2 * sum / n
		}
		f.c[k][0] /= 2
	}
	return f
}

// at evaluates the fit at w (lo ≤ w ≤ 7) by Clenshaw's recurrence.
func (f *chebFit) at(w float64) float64 {
	u := (w - f.lo) * f.inv
	k := min(int(u), thinPieces-1)
	t := 2*(u-float64(k)) - 1
	c := &f.c[k]
	var b1, b2 float64
	for m := thinDegree; m >= 1; m-- {
		b1, b2 = 2*t*b1-b2+c[m], b1
	}
	return t*b1 - b2 + c[0]
}

// nuFromZNewton inverts zOf: the D341-20 explicit inverse, then two Newton steps
// where the exponential term matters. zOf is strictly increasing
// (dZ/dν ≥ 0.57 for ν ≥ 0), so Newton converges from the close start.
//
// The explicit form is within 2·10⁻⁴ of the root over 0.21–7 mm²/s; two
// Newton steps (quadratic convergence) reach round-off, as TestNuFromZ
// checks. Each step needs e = exp(−1.47 − 1.84ν − 0.51ν²); its exponent
// differs only slightly from the previous exponential's (the explicit
// form's, then the first step's), so expFrom reuses that value instead of
// calling math.Exp again: one exponential instead of three for thin oils.
func nuFromZNewton(z float64) float64 {
	w := z - 0.7
	if w > 7 {
		return w // exp term below 1e-17 of ν: nothing to refine
	}
	p := -0.7487 - 3.295*w + 0.6119*w*w - 0.3193*w*w*w
	ep := math.Exp(p)
	nu := w - ep
	a := -1.47 - 1.84*nu - 0.51*nu*nu
	e := expFrom(ep, a-p, a)
	nu -= (nu + 0.7 + e - z) / (1 - (1.84+1.02*nu)*e)
	a1 := -1.47 - 1.84*nu - 0.51*nu*nu
	e = expFrom(e, a1-a, a1)
	return nu - (nu+0.7+e-z)/(1-(1.84+1.02*nu)*e)
}

// maxTaylorStep bounds d in expFrom: for |d| ≤ 2·10⁻³ the Taylor series
// through d⁴ leaves a relative error below d⁵/120 ≈ 2.7·10⁻¹⁶.
const maxTaylorStep = 2e-3

// expFrom returns exp(x) given base = exp(x − d): base·exp(d), with exp(d)
// from its Taylor series when |d| ≤ maxTaylorStep, and math.Exp(x) when d
// is larger (or NaN).
func expFrom(base, d, x float64) float64 {
	if !(math.Abs(d) <= maxTaylorStep) {
		return math.Exp(x)
	}
	return base * (1 + d*(1+d*(1.0/2+d*(1.0/6+d*(1.0/24)))))
}

// checkTemperature refuses temperatures at or below absolute zero and
// non-finite ones.
func checkTemperature(fn, param string, t units.Temperature) error {
	return validate.Positive(fn, param, t)
}
