package line

import (
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

func TestBarlowEsposito(t *testing.T) {
	// Esposito, Fluid Power with Applications, 7th ed., Examples 10-4 and
	// 10-5 (inputs): 1 in OD steel tube, walls 0.049 and 0.065 in (ID 0.902
	// and 0.870 in), tensile strength 55 000 psi, safety factor 8, Barlow
	// on the inside diameter; results by the book's method, printed to
	// whole psi (the book rounds, so ±1 psi).
	for _, c := range []struct {
		wall, id, want float64
	}{{0.049, 0.902, 747}, {0.065, 0.870, 1027}} {
		r, err := Barlow(1*units.Inch, units.Length(c.wall)*units.Inch, 55000*units.PSI, 8, InsideDiameter)
		if err != nil || !near(r.Working.PSI(), c.want, 1) || !near(r.Diameter.Inches(), c.id, 1e-12) {
			t.Errorf("wall %g in: working %v psi on %v in, %v; want %g psi on %g in", c.wall, r.Working.PSI(), r.Diameter.Inches(), err, c.want, c.id)
		}
		if !near(float64(r.Burst/r.Working), 8, 1e-12) || r.Basis != InsideDiameter {
			t.Errorf("burst %v, working %v: want the factor 8", r.Burst, r.Working)
		}
	}
	// The outside-diameter form rates the same wall lower by ID/OD.
	in, _ := Barlow(1*units.Inch, 0.065*units.Inch, 55000*units.PSI, 8, InsideDiameter)
	out, _ := Barlow(1*units.Inch, 0.065*units.Inch, 55000*units.PSI, 8, OutsideDiameter)
	if !near(float64(out.Working/in.Working), 0.870, 1e-12) {
		t.Errorf("OD form / ID form = %g, want 0.870", out.Working/in.Working)
	}
	if c := out.Check(1000 * units.PSI); c.OK() {
		t.Errorf("1000 psi on the OD rating %v passes", out.Working)
	}
}

func TestHoseRating(t *testing.T) {
	// SAE J517: minimum burst pressure is four times the maximum working
	// pressure.
	r, err := HoseRating(1000 * units.Bar)
	if err != nil || r.Working != 250*units.Bar || r.Rule.Kind != components.Standard {
		t.Errorf("HoseRating(1000 bar) = %v (%v), %v; want 250 bar, SAE J517", r.Working, r.Rule, err)
	}
}

func TestHoseAssess(t *testing.T) {
	a, err := HoseRun{Name: "slew hose", Pressure: 210 * units.Bar, Burst: 1000 * units.Bar, NearPeople: true}.Assess()
	if err != nil {
		t.Fatal(err)
	}
	if len(a.Findings.Hazard(components.Injection)) != 1 || len(a.Findings.Hazard(components.Burst)) != 1 ||
		!a.Check.OK() || len(a.Findings.Hazard(components.Overpressure)) != 0 {
		t.Errorf("near people, unrestrained, within rating: %v, check %v", a.Findings, a.Check)
	}
	if w, _ := a.Findings.Worst(); w != components.Warning {
		t.Errorf("worst = %v, want warning", w)
	}
	a, _ = HoseRun{Pressure: 300 * units.Bar, Burst: 1000 * units.Bar, NearPeople: true, Restrained: true}.Assess()
	if len(a.Findings.Hazard(components.Burst)) != 0 || len(a.Findings.Hazard(components.Overpressure)) != 1 || a.Check.OK() {
		t.Errorf("restrained, over its rating: %v", a.Findings)
	}
	a, _ = HoseRun{Pressure: 100 * units.Bar}.Assess()
	if len(a.Findings.Topic("line.hose-unrated")) != 1 || a.Rating != (WallRating{}) {
		t.Errorf("no burst given: %v", a.Findings)
	}
}

func TestWallBadInput(t *testing.T) {
	in := units.Inch
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"od 0", second(Barlow(0, 0.1*in, 1e8, 4, InsideDiameter)), "od"},
		{"wall 0", second(Barlow(in, 0, 1e8, 4, InsideDiameter)), "wall"},
		{"wall solid", second(Barlow(in, 0.5*in, 1e8, 4, InsideDiameter)), "wall"},
		{"strength", second(Barlow(in, 0.1*in, 0, 4, InsideDiameter)), "strength"},
		{"safety", second(Barlow(in, 0.1*in, 1e8, 0.5, InsideDiameter)), "safety"},
		{"basis", second(Barlow(in, 0.1*in, 1e8, 4, 0)), "basis"},
		{"burst", second(HoseRating(-1)), "burst"},
		{"hose pressure", second(HoseRun{}.Assess()), "Pressure"},
		{"hose burst", second(HoseRun{Pressure: 1, Burst: -1}.Assess()), "Burst"},
	} {
		wantRangeError(t, c.name, c.err, c.param)
	}
}

// second returns the error of a (value, error) pair.
func second[T any](_ T, err error) error { return err }
