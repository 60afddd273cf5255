package pump

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// The R20 preferred numbers of ISO 3 (ISO 3:1973, Table 1, rounded values;
// from memory): 1.00 1.12 1.25 1.40 1.60 1.80 2.00 2.24 2.50 2.80 3.15
// 3.55 4.00 4.50 5.00 5.60 6.30 7.10 8.00 9.00. Each is within 1.3 % of the
// exact 10^(i/20) the series rounds.
func TestCommonDisplacements(t *testing.T) {
	s := CommonDisplacements()
	if s.Len() != 61 {
		t.Fatalf("Len = %d; want 3 decades of 20 and 1000 cm³/rev", s.Len())
	}
	for i := 0; i < s.Len(); i++ {
		v, pref := s.At(i)
		exact := math.Pow(10, float64(i)/20)
		if r := v.CubicCentimetresPerRevolution() / exact; !pref || r < 0.987 || r > 1.013 {
			t.Errorf("size %d = %v (preferred %v); the R20 number there is %.4g", i, v, pref, exact)
		}
	}
	for _, cc := range []float64{28, 45, 71, 140, 180, 250} {
		if !s.Contains(units.Displacement(cc) * units.CubicCentimetrePerRevolution) {
			t.Errorf("%v cm³/rev is not in the list", cc)
		}
	}
	if s.Rule().Kind != components.CommonPractice {
		t.Errorf("rule %v; want common practice", s.Rule())
	}
}

// A baling press needs 55 L/min at 180 bar from a pump on a 1450 rpm motor
// with η_v 0.95 (demo data). With the default 25 %: rated 68.75 L/min and
// 225 bar; 68.75 L/min / (1450 rpm × 0.95) = 49.91 cm³/rev → 50 cm³/rev,
// which delivers 50 × 1450 × 0.95 = 68.875 L/min.
func TestSize(t *testing.T) {
	need := Need{Flow: 55 * units.LitrePerMinute, Pressure: 180 * units.Bar, Speed: 1450 * units.RevolutionPerMinute, Volumetric: 0.95}
	s, err := Size(need)
	if err != nil {
		t.Fatal(err)
	}
	if s.Margin != 0.25 || s.MarginRule.Kind != components.CommonPractice {
		t.Errorf("margin %v (%v); want the default 0.25, common practice", s.Margin, s.MarginRule)
	}
	checktest.Near(t, "rated flow", s.RatedFlow.LitresPerMinute(), 68.75, 1e-14)
	checktest.Near(t, "rated pressure", s.RatedPressure.Bar(), 225, 1e-14)
	checktest.Near(t, "required displacement", s.Displacement.Required.CubicCentimetresPerRevolution(), 68.75e3/(1450*0.95), 1e-13)
	if s.Displacement.Chosen != 50*units.CubicCentimetrePerRevolution || !s.Displacement.OK() {
		t.Errorf("chosen %v; want 50 cm³/rev", s.Displacement.Chosen)
	}
	checktest.Near(t, "delivered", s.Delivered.LitresPerMinute(), 68.875, 1e-13)

	for _, c := range []struct {
		margin float64
		want   units.Displacement // 55·(1+m) L/min over 1450 × 0.95
	}{{0, 40}, {0.1, 45}, {0.3, 56}} {
		need.Margin = new(c.margin)
		s, err := Size(need)
		if err != nil || s.Margin != c.margin || s.MarginRule.Kind != components.CallerValue ||
			s.Displacement.Chosen != c.want*units.CubicCentimetrePerRevolution {
			t.Errorf("margin %v: %+v, %v; want %v cm³/rev under the caller's rule", c.margin, s.Displacement, err, c.want)
		}
	}
}

func TestSizeOwnList(t *testing.T) {
	cc := units.CubicCentimetrePerRevolution
	list, err := components.NewSeries("maker's gear pumps", components.CallerRule("catalogue"),
		[]units.Displacement{8 * cc, 11 * cc, 16 * cc, 19 * cc, 22 * cc}, nil)
	if err != nil {
		t.Fatal(err)
	}
	// A test-rig clamp: 18 L/min at 1500 rpm, η_v 0.92, margin 25 %: 22.5
	// L/min / (1500 × 0.92) = 16.30 cm³/rev → 19 cm³/rev.
	s, err := Size(Need{Flow: 18 * units.LitrePerMinute, Pressure: 120 * units.Bar, Speed: 1500 * units.RevolutionPerMinute,
		Volumetric: 0.92, Displacements: list})
	if err != nil || s.Displacement.Chosen != 19*cc || s.Displacement.Series != "maker's gear pumps" {
		t.Errorf("Size = %+v, %v; want 19 cm³/rev from the maker's list", s.Displacement, err)
	}
	// Beyond the list: a failed choice and a finding, not an error.
	s, err = Size(Need{Flow: 90 * units.LitrePerMinute, Pressure: 120 * units.Bar, Speed: 1500 * units.RevolutionPerMinute,
		Volumetric: 0.92, Displacements: list})
	if err != nil || s.Displacement.OK() || len(s.Findings.Topic("pump.size-beyond-list")) != 1 || s.Delivered != 0 {
		t.Errorf("beyond the list: %+v, %v", s, err)
	}
}

func TestSizeBadInput(t *testing.T) {
	good := Need{Flow: 1e-3, Pressure: 1e7, Speed: 25, Volumetric: 0.9}
	for name, mut := range map[string]func(*Need){
		"zero flow":          func(n *Need) { n.Flow = 0 },
		"negative pressure":  func(n *Need) { n.Pressure = -1 },
		"zero speed":         func(n *Need) { n.Speed = 0 },
		"efficiency above 1": func(n *Need) { n.Volumetric = 1.2 },
		"efficiency zero":    func(n *Need) { n.Volumetric = 0 },
		"negative margin":    func(n *Need) { n.Margin = new(-0.1) },
		"NaN margin":         func(n *Need) { n.Margin = new(math.NaN()) },
		"margin above 100 %": func(n *Need) { n.Margin = new(1.5) },
	} {
		n := good
		mut(&n)
		s, err := Size(n)
		var re *units.RangeError
		if !errors.As(err, &re) || re.Func != "pump.Size" || s.RatedFlow != 0 {
			t.Errorf("%s: Size = %+v, %v; want the zero Sizing and a RangeError from pump.Size", name, s, err)
		}
	}
}

// A duty whose displacement overflows or underflows to zero fails in Size's
// own name, naming the result.
func TestSizeExtremes(t *testing.T) {
	for _, n := range []Need{
		{Flow: 1e300, Pressure: 1e7, Speed: 1e-300, Volumetric: 0.5},
		{Flow: 1e-300, Pressure: 1e7, Speed: math.MaxFloat64, Volumetric: 0.5},
	} {
		s, err := Size(n)
		if checktest.RangeErrorIn(t, err, "pump.Size", "Displacement"); s.RatedFlow != 0 {
			t.Errorf("Size(%+v) = %+v beside the error", n, s)
		}
	}
}
