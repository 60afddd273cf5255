package contamination

import (
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

func TestPlacementAdvice(t *testing.T) {
	all := AllPlacementAdvice()
	if len(all) != int(placementCount) {
		t.Fatalf("%d placements, want %d", len(all), placementCount)
	}
	for i, a := range all {
		if a.Placement != Placement(i) || a.Name == "" || a.Element == "" || a.Purpose == "" || a.Rule.Kind != components.CommonPractice {
			t.Errorf("placement %d: %+v", i, a)
		}
		if len(a.Findings) < 2 || a.Findings[len(a.Findings)-1].Topic != TopicIndicator {
			t.Errorf("%s: findings %v do not end with the clogging indicator", a.Name, a.Findings)
		}
		for _, f := range a.Findings {
			if f.Topic == "" || f.Rule.Kind == components.Unstated || f.Text(units.Metric()) == "" {
				t.Errorf("%s: finding %v lacks a topic, rule or sentence", a.Name, f)
			}
		}
		if a.Placement.String() != a.Name {
			t.Errorf("String() = %q, want %q", a.Placement.String(), a.Name)
		}
	}
	// What each placement warns of, by hazard (common practice): the pump
	// inlet and a blocked breather of cavitation, the pressure housing of
	// burst and of the pressure it holds.
	for _, c := range []struct {
		p     Placement
		topic string
		sev   components.Severity
		hz    components.Hazard
	}{
		{SuctionStrainer, TopicSuctionDrop, components.Caution, components.Cavitation},
		{PressureFilter, TopicHousingPressure, components.Warning, components.Burst},
		{PressureFilter, TopicRelievePressure, components.Warning, components.StoredEnergy},
		{PressureFilter, TopicServoNoBypass, components.Caution, components.FilterBypass},
		{ReturnFilter, TopicColdDrop, components.Notice, components.FilterBypass},
		{Breather, TopicBreatherBlocked, components.Caution, components.Cavitation},
	} {
		a, _ := PlacementAdvice(c.p)
		if f := a.Findings.Topic(c.topic); len(f) != 1 || f[0].Severity != c.sev || f[0].Hazard != c.hz {
			t.Errorf("%v: %s findings %v, want one %v about %v", c.p, c.topic, f, c.sev, c.hz)
		}
	}
	// The shared findings are written once: the pressure filter's
	// relieve-pressure finding is CheckBypass's.
	pf, _ := PlacementAdvice(PressureFilter)
	r, _ := CheckBypass(ElementPoint{Drop: 1e4, Flow: 1e-3, Viscosity: 3e-5}, 1e-3, 3e-5, 3e5)
	if a, b := pf.Findings.Topic(TopicRelievePressure), r.Findings.Topic(TopicRelievePressure); len(a) != 1 || len(b) != 1 ||
		a[0].Text(units.Metric()) != b[0].Text(units.Metric()) || a[0].Rule != b[0].Rule {
		t.Errorf("relieve-pressure findings differ: %v / %v", a, b)
	}
	// Callers may change what they get without touching the next call.
	s, _ := PlacementAdvice(SuctionStrainer)
	s.Findings[0] = components.Finding{}
	if again, _ := PlacementAdvice(SuctionStrainer); again.Findings[0].Topic != TopicSuctionDrop {
		t.Error("PlacementAdvice shares its findings")
	}
	if _, ok := PlacementAdvice(placementCount); ok || Placement(99).String() != "Placement(99)" {
		t.Error("unknown placement accepted")
	}
}
