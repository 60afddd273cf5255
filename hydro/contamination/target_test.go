package contamination

import (
	"errors"
	"math"
	"reflect"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// The base table is common practice, our own; these tests pin how it is
// applied, not its figures against a source (there is none to cite).

func TestBandFor(t *testing.T) {
	cases := []struct {
		p    units.Pressure
		want PressureBand
	}{
		{0, BandLow},
		{140 * units.Bar, BandLow}, // "up to and including"
		{140.001 * units.Bar, BandMedium},
		{210 * units.Bar, BandMedium},
		{210.001 * units.Bar, BandHigh},
		{5000 * units.PSI, BandHigh},
	}
	for _, c := range cases {
		if got, err := BandFor(c.p); err != nil || got != c.want {
			t.Errorf("BandFor(%v) = %v, %v; want %v", c.p, got, err, c.want)
		}
	}
}

func TestRecommendTarget(t *testing.T) {
	cases := []struct {
		name  string
		in    TargetInput
		want  string
		basis Component
		steps int
	}{
		// Base at 140–210 bar.
		{"servo, medium", TargetInput{Components: []Component{ServoValve}, Pressure: 180 * units.Bar}, "16/14/11", ServoValve, 0},
		// Low band allows one class more.
		{"gear pump, low", TargetInput{Components: []Component{GearPump, Cylinder}, Pressure: 100 * units.Bar}, "20/18/16", GearPump, 1},
		// High band, critical, severe duty: three classes cleaner.
		{"servo, all strict", TargetInput{Components: []Component{Cylinder, ServoValve}, Pressure: 280 * units.Bar, Critical: true, SevereDuty: true}, "13/11/8", ServoValve, -3},
		// Strictest per size across components.
		{"prop valve + piston pump", TargetInput{Components: []Component{VariablePistonPump, ProportionalValve}, Pressure: 250 * units.Bar}, "16/14/11", ProportionalValve, -1},
		// Caller base codes replace the table for that component.
		{"caller base", TargetInput{Components: []Component{GearPump}, Pressure: 200 * units.Bar,
			Bases: map[Component]Code{GearPump: counter(num(18), num(16), num(13))}}, "18/16/13", GearPump, 0},
	}
	for _, c := range cases {
		got, err := RecommendTarget(c.in)
		if err != nil || got.Code.String() != c.want || got.Basis != c.basis || got.Steps != c.steps || got.Code != got.Table || got.Overridden {
			t.Errorf("%s: %+v, %v; want %s from %v, steps %d", c.name, got, err, c.want, c.basis, c.steps)
		}
		wantKind := components.CommonPractice
		if c.in.Bases != nil {
			wantKind = components.CallerValue
		}
		if got.Rule.Kind != wantKind || got.Rule.Source == "" || got.Findings != nil {
			t.Errorf("%s: rule %v, findings %v; want a %v rule and no findings", c.name, got.Rule, got.Findings, wantKind)
		}
	}
}

// An override replaces the code and says so in the rule; one dirtier than
// the table at a size carries a caution about contamination for that size.
func TestRecommendTargetOverride(t *testing.T) {
	o := counter(num(15), num(13), num(10))
	got, err := RecommendTarget(TargetInput{Components: []Component{GearPump}, Pressure: 100 * units.Bar, Override: &o})
	if err != nil || got.Code != o || got.Table.String() != "20/18/16" || !got.Overridden ||
		got.Rule != components.CallerRule("Override") || got.Findings != nil {
		t.Errorf("override: %+v, %v", got, err)
	}
	loose := counter(num(21), num(18), num(17)) // against 20/18/16: 1 and 1 class over at ≥4 and ≥14 µm(c)
	got, err = RecommendTarget(TargetInput{Components: []Component{GearPump}, Pressure: 100 * units.Bar, Override: &loose})
	if err != nil || got.Code != loose {
		t.Fatalf("loose override: %+v, %v", got, err)
	}
	fs := got.Findings.Topic(TopicOverrideLooser)
	if len(fs) != 2 || len(got.Findings) != 2 {
		t.Fatalf("loose override findings %v, want two", got.Findings)
	}
	for i, size := range []string{"≥4 µm(c)", "≥14 µm(c)"} {
		f := fs[i]
		want := []any{size, loose, loose.N[2*i], got.Table, got.Table.N[2*i]}
		if f.Severity != components.Caution || f.Hazard != components.Contamination || !reflect.DeepEqual(f.Args(), want) {
			t.Errorf("finding %d = %v quoting %v; want a contamination caution quoting %v", i, f, f.Args(), want)
		}
	}
}

// TestTargetNeverLooser: a more demanding input never gives a dirtier
// target (a property of the common-practice rules).
func TestTargetNeverLooser(t *testing.T) {
	for c := range componentCount {
		prev := Code{}
		for k, p := range []units.Pressure{300 * units.Bar, 180 * units.Bar, 50 * units.Bar} {
			for _, crit := range []bool{true, false} {
				got, err := RecommendTarget(TargetInput{Components: []Component{c, Cylinder}, Pressure: p, Critical: crit})
				if err != nil {
					t.Fatal(err)
				}
				if k > 0 || !crit {
					for i := range 3 {
						if got.Code.N[i].Scale < prev.N[i].Scale {
							t.Errorf("%v at %v critical %v: %v is stricter than the more demanding %v", c, p, crit, got.Code, prev)
						}
					}
				}
				prev = got.Code
			}
		}
		base, _ := BaseTarget(c)
		if err := checkTarget("test", "base", base); err != nil {
			t.Errorf("base of %v: %v", c, err)
		}
	}
}

func TestTargetClamp(t *testing.T) {
	o := counter(num(1), num(0), num(0))
	got, err := RecommendTarget(TargetInput{Components: []Component{ServoValve}, Pressure: 300 * units.Bar, Critical: true,
		Bases: map[Component]Code{ServoValve: o}})
	if err != nil || got.Table.String() != "0/0/0" {
		t.Errorf("clamp: %v, %v; want 0/0/0", got.Table, err)
	}
}

// Every bad input names the TargetInput field, down to the number of a
// code, and gives the zero Target.
func TestRecommendTargetBadInput(t *testing.T) {
	bad := counter(num(18), few(16), num(13))
	micro := micro(num(16), num(13))
	rising := counter(num(16), num(18), num(13))
	ok := counter(num(18), num(16), num(13))
	p := 100 * units.Bar
	cases := []struct {
		name, param string
		in          TargetInput
		err         error
	}{
		{"no component", "Components", TargetInput{Pressure: p}, ErrNoComponent},
		{"unknown component", "Components[1]", TargetInput{Components: []Component{GearPump, componentCount}, Pressure: p}, units.ErrRange},
		// A caller base code for an unknown component must not let it
		// through.
		{"unknown component with a base", "Components[0]", TargetInput{Components: []Component{componentCount + 3}, Pressure: p,
			Bases: map[Component]Code{componentCount + 3: ok}}, units.ErrRange},
		// An unset (zero) working pressure fell in the low band and gave a
		// target one class dirtier; like the zero Code, an unset field must
		// not loosen a target.
		{"zero pressure", "Pressure", TargetInput{Components: []Component{GearPump}}, units.ErrRange},
		{"negative pressure", "Pressure", TargetInput{Components: []Component{GearPump}, Pressure: -units.Bar}, units.ErrRange},
		{"NaN pressure", "Pressure", TargetInput{Components: []Component{GearPump}, Pressure: units.Pressure(math.NaN())}, units.ErrRange},
		{"marked base", "Bases[gear pump].N[1]", TargetInput{Components: []Component{GearPump}, Pressure: p, Bases: map[Component]Code{GearPump: bad}}, units.ErrRange},
		{"rising base", "Bases[gear pump].N[1]", TargetInput{Components: []Component{GearPump}, Pressure: p, Bases: map[Component]Code{GearPump: rising}}, ErrOrder},
		{"zero base", "Bases[gear pump].Form", TargetInput{Components: []Component{GearPump}, Pressure: p, Bases: map[Component]Code{GearPump: {}}}, units.ErrRange},
		{"microscope override", "Override", TargetInput{Components: []Component{GearPump}, Pressure: p, Override: &micro}, units.ErrRange},
		{"marked override", "Override.N[1]", TargetInput{Components: []Component{GearPump}, Pressure: p, Override: &bad}, units.ErrRange},
	}
	for _, c := range cases {
		tg, err := RecommendTarget(c.in)
		if !errors.Is(err, c.err) {
			t.Errorf("%s: err = %v, want %v", c.name, err, c.err)
		}
		wantRangeError(t, err, c.param)
		if !reflect.DeepEqual(tg, Target{}) {
			t.Errorf("%s: %+v with an error, want the zero Target", c.name, tg)
		}
	}
	_, err := BaseTarget(componentCount)
	wantRangeError(t, err, "c")
}

func TestTargetStrings(t *testing.T) {
	if ServoValve.String() != "servo valve" || Component(99).String() != "Component(99)" ||
		BandHigh.String() != "over 210 bar" || PressureBand(9).String() != "PressureBand(9)" {
		t.Error("String")
	}
}
