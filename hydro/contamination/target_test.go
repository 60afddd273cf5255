package contamination

import (
	"errors"
	"math"
	"testing"

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
	}
}

func TestRecommendTargetOverride(t *testing.T) {
	o := counter(num(15), num(13), num(10))
	got, err := RecommendTarget(TargetInput{Components: []Component{GearPump}, Pressure: 100 * units.Bar, Override: &o})
	if err != nil || got.Code != o || got.Table.String() != "20/18/16" || !got.Overridden || got.Source != "caller's override" {
		t.Errorf("override: %+v, %v", got, err)
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

func TestRecommendTargetBadInput(t *testing.T) {
	bad := counter(num(18), few(16), num(13))
	micro := micro(num(16), num(13))
	cases := []struct {
		name string
		in   TargetInput
		err  error
	}{
		{"no component", TargetInput{Pressure: 100 * units.Bar}, ErrNoComponent},
		{"unknown component", TargetInput{Components: []Component{componentCount}, Pressure: 100 * units.Bar}, units.ErrRange},
		{"zero pressure", TargetInput{Components: []Component{GearPump}}, units.ErrRange},
		{"negative pressure", TargetInput{Components: []Component{GearPump}, Pressure: -units.Bar}, units.ErrRange},
		{"NaN pressure", TargetInput{Components: []Component{GearPump}, Pressure: units.Pressure(math.NaN())}, units.ErrRange},
		{"marked base", TargetInput{Components: []Component{GearPump}, Pressure: 100 * units.Bar, Bases: map[Component]Code{GearPump: bad}}, units.ErrRange},
		{"microscope override", TargetInput{Components: []Component{GearPump}, Pressure: 100 * units.Bar, Override: &micro}, units.ErrRange},
	}
	for _, c := range cases {
		if _, err := RecommendTarget(c.in); !errors.Is(err, c.err) {
			t.Errorf("%s: err = %v, want %v", c.name, err, c.err)
		}
	}
	if _, err := BaseTarget(componentCount); !errors.Is(err, units.ErrRange) {
		t.Errorf("BaseTarget(unknown): %v", err)
	}
}

func TestTargetStrings(t *testing.T) {
	if ServoValve.String() != "servo valve" || Component(99).String() != "Component(99)" ||
		BandHigh.String() != "over 210 bar" || PressureBand(9).String() != "PressureBand(9)" {
		t.Error("String")
	}
}
