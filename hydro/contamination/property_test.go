package contamination

import (
	"math"
	"math/rand/v2"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// extremes are the inputs most likely to break arithmetic: zeros of both
// signs, the smallest subnormal, the largest finite value, non-finite values
// and the values around 1.
var extremes = []float64{
	0, math.Copysign(0, -1), 5e-324, -5e-324, 2.2250738585072014e-308,
	1e-300, 1e-12, 1, math.Nextafter(1, 2), math.Nextafter(1, 0), 20, 99.99999999999999, 100,
	1e300, 1e308, math.MaxFloat64, -1, -1e308, -math.MaxFloat64,
	math.NaN(), math.Inf(1), math.Inf(-1),
}

// wide draws a float64 from the extremes, from a wide log-uniform spread of
// either sign, or from raw random bits (any finite or non-finite value).
func wide(r *rand.Rand) float64 {
	switch r.IntN(4) {
	case 0:
		return extremes[r.IntN(len(extremes))]
	case 1:
		return math.Float64frombits(r.Uint64())
	case 2:
		return -math.Pow(10, r.Float64()*640-324)
	}
	return math.Pow(10, r.Float64()*640-324)
}

// wideInt draws an int near the valid scale numbers or anywhere.
func wideInt(r *rand.Rand) int {
	if r.IntN(2) == 0 {
		return r.IntN(40) - 5
	}
	return int(r.Uint64())
}

// wideNumber draws a Number in or out of normal form.
func wideNumber(r *rand.Rand) Number {
	if r.IntN(3) == 0 {
		return Number{Scale: wideInt(r), Mark: Mark(r.IntN(256))}
	}
	return Number{Scale: r.IntN(MaxScale + 1), Mark: Mark(r.IntN(int(MarkTooMany) + 1))}
}

func wideCode(r *rand.Rand) Code {
	f := Form(r.IntN(2))
	if r.IntN(10) == 0 {
		f = Form(r.IntN(256))
	}
	return Code{Form: f, N: [3]Number{wideNumber(r), wideNumber(r), wideNumber(r)}}
}

// finite fails the test when err is nil and any value is NaN or ±Inf.
func finite(t *testing.T, what string, err error, vs ...float64) {
	t.Helper()
	if err != nil {
		return
	}
	for _, v := range vs {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			t.Fatalf("%s = %v with a nil error", what, vs)
		}
	}
}

// TestNoPanicNoNaN calls every exported function and method that takes
// numbers with wide random and extreme inputs: none may panic, and none may
// return NaN, ±Inf or a negative duration with a nil error.
func TestNoPanicNoNaN(t *testing.T) {
	r := rand.New(rand.NewPCG(4406, 16889))
	n := 40000
	if testing.Short() {
		n = 4000
	}
	for range n {
		a, b, c, d, e := wide(r), wide(r), wide(r), wide(r), wide(r)
		k := wideInt(r)

		if s, err := ScaleNumber(a); err == nil && (s < 0 || s > AboveTable) {
			t.Fatalf("ScaleNumber(%g) = %d", a, s)
		}
		lo, hi, err := ScaleRange(k)
		finite(t, "ScaleRange", err, lo, hi)
		v, err := PerML(a, units.Volume(b))
		finite(t, "PerML", err, v)
		v, err = Per100mL(a, units.Volume(b))
		finite(t, "Per100mL", err, v)

		codes := make([]Code, 0, 6)
		if code, err := CodeFromCounts(a, b, c); err == nil {
			codes = append(codes, code)
		}
		if code, err := MicroscopeCodeFromCounts(a, b); err == nil {
			codes = append(codes, code)
		}
		if code, err := CodeFromSample(a, b, c, units.Volume(d)); err == nil {
			codes = append(codes, code)
		}
		if code, err := MicroscopeCodeFromSample(a, b, units.Volume(d)); err == nil {
			codes = append(codes, code)
		}
		if code, err := MakeCode(k, wideInt(r), wideInt(r)); err == nil {
			codes = append(codes, code)
		}
		if code, err := MakeMicroscopeCode(k, wideInt(r)); err == nil {
			codes = append(codes, code)
		}
		for _, code := range codes {
			if err := code.Validate(); err != nil {
				t.Fatalf("constructor gave invalid %#v: %v", code, err)
			}
		}
		codes = append(codes, wideCode(r), wideCode(r))
		for _, code := range codes {
			_ = code.String()
			_ = code.ASCII()
			_, _ = code.MarshalText()
			_ = code.Form.SizeLabel(k)
			lo, hi, err := code.Range(k % 4)
			finite(t, "Code.Range", err, lo, hi)
			if cmp, err := Compare(code, codes[r.IntN(len(codes))]); err == nil {
				for _, sc := range cmp.Sizes {
					finite(t, "Compare", nil, sc.Factor, sc.Check.Ratio(), sc.Check.Value, sc.Check.Limit)
				}
			}
		}

		v, err = Efficiency(a)
		finite(t, "Efficiency", err, v)
		v, err = BetaFromEfficiency(a)
		finite(t, "BetaFromEfficiency", err, v)
		v, err = BetaRatio(a, b)
		finite(t, "BetaRatio", err, v)
		rt := Rating{Size: units.Length(a), Beta: b}
		_ = rt.Validate()
		_ = rt.String()
		v, err = rt.Efficiency()
		finite(t, "Rating.Efficiency", err, v)

		v, err = SteadyState(a, units.Flow(b), c)
		finite(t, "SteadyState", err, v)
		v, err = RequiredBeta(a, units.Flow(b), c)
		finite(t, "RequiredBeta", err, v)
		v, err = BetaForTarget(a, units.Flow(b), k)
		finite(t, "BetaForTarget", err, v)
		if tau, err := TimeConstant(units.Volume(a), units.Flow(b), c); err == nil && tau < 0 {
			t.Fatalf("TimeConstant(%g, %g, %g) = %v", a, b, c, tau)
		}

		at := ElementPoint{Drop: units.Pressure(a), Flow: units.Flow(b), Viscosity: units.KinematicViscosity(c)}
		dp, err := CleanDrop(at, units.Flow(d), units.KinematicViscosity(e))
		finite(t, "CleanDrop", err, float64(dp))
		bc, err := CheckBypass(at, units.Flow(d), units.KinematicViscosity(e), units.Pressure(wide(r)))
		finite(t, "CheckBypass", err, float64(bc.Setting.Value), float64(bc.Setting.Limit), bc.Setting.Ratio(), float64(bc.Room.Limit))

		_, _ = BandFor(units.Pressure(a))
		_, _ = BaseTarget(Component(k))
		in := TargetInput{Components: []Component{Component(r.IntN(int(componentCount) + 2))}, Pressure: units.Pressure(a),
			Critical: r.IntN(2) == 0, SevereDuty: r.IntN(2) == 0}
		if r.IntN(3) == 0 {
			o := wideCode(r)
			in.Override = &o
		}
		if tg, err := RecommendTarget(in); err == nil {
			if err := tg.Code.Validate(); err != nil {
				t.Fatalf("RecommendTarget gave invalid %v: %v", tg.Code, err)
			}
		}
		_, _ = PlacementAdvice(Placement(k))
	}
}
