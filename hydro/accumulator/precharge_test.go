package accumulator

import (
	"math"
	"reflect"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func celsius(c float64) units.Temperature { return units.TemperatureFromCelsius(c) }

func TestPrechargeAt(t *testing.T) {
	// Gay-Lussac by hand: 90 bar abs set at 20 °C reads
	// 90 · 333.15/293.15 = 102.280 bar abs at 60 °C.
	p, err := PrechargeAt(90*bara, celsius(20), celsius(60))
	if err != nil || math.Abs(p.Bar()-102.280) > 5e-4 {
		t.Errorf("PrechargeAt = %v, %v; want 102.280 bar abs", p, err)
	}
}

func TestRecommend(t *testing.T) {
	c := Charging{Kind: Bladder, Min: 100 * bara, Max: 200 * bara,
		Fill: celsius(20), Working: celsius(50), Coldest: celsius(-10), Hottest: celsius(70)}
	p, err := c.Recommend()
	if err != nil {
		t.Fatal(err)
	}
	// 0.9 × 100 bar abs at 50 °C; at 20 °C that is 90 · 293.15/323.15 =
	// 81.6447 bar abs; at 70 °C 95.5702, at −10 °C 73.2895 (by hand).
	if math.Abs(p.Working.Bar()-90) > 1e-12 || math.Abs(p.Fill.Bar()-81.6447) > 5e-5 || p.Rule.Kind != components.CommonPractice {
		t.Errorf("recommend: working %v, fill %v (%v)", p.Working, p.Fill, p.Rule)
	}
	if len(p.Points) != 4 || p.Points[0].Temperature != celsius(-10) || math.Abs(p.Points[0].Pressure.Bar()-73.2895) > 5e-5 ||
		math.Abs(p.Points[3].Pressure.Bar()-95.5702) > 5e-5 {
		t.Errorf("points %v", p.Points)
	}
	if !p.Hot.OK() || !p.Ratio.OK() || len(p.Findings) != 1 || p.Findings[0].Topic != "accumulator.precharge" {
		t.Errorf("checks hot %v ratio %v findings %v", p.Hot, p.Ratio, p.Findings)
	}
	// A fill of 95 bar abs at 20 °C reads 111.2 bar abs at 70 °C: above Min.
	p, _ = c.Check(95 * bara)
	if p.Hot.OK() || len(p.Findings.Topic("accumulator.precharge-hot")) != 1 || p.Rule.Kind != components.CallerValue {
		t.Errorf("hot check: %v, %v", p.Hot, p.Findings)
	}
	// 400 bar abs over 73.3 bar abs at −10 °C is 5.5:1, beyond a bladder's 4:1
	// but within a diaphragm's 8:1; a piston has no ratio check.
	c.Max = 400 * bara
	p, _ = c.Recommend()
	if p.Ratio.OK() || len(p.Findings.Topic("accumulator.precharge-cold")) != 1 {
		t.Errorf("bladder ratio: %v, %v", p.Ratio, p.Findings)
	}
	c.Kind = Diaphragm
	if p, _ = c.Recommend(); !p.Ratio.OK() {
		t.Errorf("diaphragm ratio: %v", p.Ratio)
	}
	c.Kind = Piston
	if p, _ = c.Recommend(); p.Ratio != (components.Check[float64]{}) {
		t.Errorf("piston ratio check %v, want none", p.Ratio)
	}
}

func TestPrechargeBadInput(t *testing.T) {
	ok := Charging{Kind: Bladder, Min: 100 * bara, Max: 200 * bara,
		Fill: celsius(20), Working: celsius(50), Coldest: celsius(-10), Hottest: celsius(70)}
	bad := func(f func(*Charging)) error { c := ok; f(&c); _, err := c.Recommend(); return err }
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"kind", bad(func(c *Charging) { c.Kind = 0 }), "Kind"},
		{"min", bad(func(c *Charging) { c.Min = 0 }), "Min"},
		{"max", bad(func(c *Charging) { c.Max = 50 * bara }), "Max"},
		{"fill", bad(func(c *Charging) { c.Fill = 0 }), "Fill"},
		{"hottest", bad(func(c *Charging) { c.Hottest = units.Temperature(math.Inf(1)) }), "Hottest"},
		{"working", bad(func(c *Charging) { c.Working = celsius(90) }), "Working"},
		{"check fill", second(ok.Check(0)), "fill"},
		{"at p", second(PrechargeAt(0, 300, 300)), "p"},
		{"at to", second(PrechargeAt(1e6, 300, 0)), "to"},
		// Max over the coldest charge overflows: an error, not an +Inf check.
		{"ratio", bad(func(c *Charging) { c.Min, c.Max = 1e-300, 1e300 }), "Ratio"},
	} {
		t.Run(c.name, func(t *testing.T) { checktest.RangeError(t, c.err, c.param) })
	}
}

// A check that fails after the inputs pass (Max over the coldest charge
// overflows) returns the zero Precharge beside its error, with no rule set.
func TestPrechargeZeroBesideError(t *testing.T) {
	c := Charging{Kind: Bladder, Min: 1e-300, Max: 1e300,
		Fill: celsius(20), Working: celsius(50), Coldest: celsius(-10), Hottest: celsius(70)}
	if p, err := c.Recommend(); err == nil || !reflect.DeepEqual(p, Precharge{}) {
		t.Errorf("Recommend = %+v, %v; want the zero Precharge and an error", p, err)
	}
	if p, err := c.Check(1e-301); err == nil || !reflect.DeepEqual(p, Precharge{}) {
		t.Errorf("Check = %+v, %v; want the zero Precharge and an error", p, err)
	}
}
