package fluid

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// Every candidate meets the window at its worst-case limits, and the list
// is ranked: optimum-band grades first, then by the smaller margin. Each
// candidate's findings follow from its margins and running viscosity.
func TestSelectGrades(t *testing.T) {
	site := Site{MinStart: celsius(-5), MaxRunning: celsius(60)} // a sawmill log turner, indoors
	w := DefaultWindow()
	cs, err := SelectGrades(site, 150, w)
	if err != nil {
		t.Fatal(err)
	}
	for i, c := range cs {
		thick, _ := CurveFromVI(c.Grade.Max(), 150)
		thin, _ := CurveFromVI(c.Grade.Min(), 150)
		start, _ := thick.At(site.MinStart)
		run, _ := thin.At(site.MaxRunning)
		if c.Start != components.Within(start, w.Max, c.Start.Rule) || c.Running != components.Reaches(run, w.Min, c.Running.Rule) ||
			!c.Start.OK() || !c.Running.OK() {
			t.Errorf("%v: start %v run %v, candidate %+v", c.Grade, start, run, c)
		}
		if c.Start.Rule.Kind != components.CommonPractice || c.Running.Rule.Kind != components.CommonPractice {
			t.Errorf("%v: DefaultWindow limits not labelled common practice: %v, %v", c.Grade, c.Start.Rule, c.Running.Rule)
		}
		if c.ColdMargin < 0 || c.HotMargin < 0 {
			t.Errorf("%v: margins %v, %v", c.Grade, c.ColdMargin, c.HotMargin)
		}
		wantTopics(t, c, w)
		if i > 0 {
			p := cs[i-1]
			if (!p.RunsInOptimum && c.RunsInOptimum) || (p.RunsInOptimum == c.RunsInOptimum && p.minMargin() < c.minMargin()) {
				t.Errorf("rank %d: %v before %v", i, p.Grade, c.Grade)
			}
		}
	}
	// A grade not listed fails the window: check the neighbours of the list.
	listed := map[Grade]bool{}
	for _, c := range cs {
		listed[c.Grade] = true
	}
	for _, g := range selectable {
		if listed[g] {
			continue
		}
		thick, _ := CurveFromVI(g.Max(), 150)
		thin, _ := CurveFromVI(g.Min(), 150)
		start, _ := thick.At(site.MinStart)
		run, _ := thin.At(site.MaxRunning)
		if start <= w.Max && run >= w.Min {
			t.Errorf("%v suits (start %v, run %v) but is not listed", g, start, run)
		}
	}
}

// wantTopics checks that a candidate carries exactly the findings its
// figures call for, with their severities and hazards.
func wantTopics(t *testing.T, c Candidate, w Window) {
	t.Helper()
	want := map[string]struct {
		on  bool
		sev components.Severity
		hz  components.Hazard
	}{
		TopicColdMargin:   {c.ColdMargin < MinTemperatureMargin, components.Caution, components.ColdStart},
		TopicHotMargin:    {c.HotMargin < MinTemperatureMargin, components.Caution, components.NoHazard},
		TopicAboveOptimum: {c.Running.Value > w.OptimumHigh, components.Notice, components.NoHazard},
		TopicBelowOptimum: {c.Running.Value < w.OptimumLow, components.Notice, components.NoHazard},
	}
	n := 0
	for topic, x := range want {
		got := c.Findings.Topic(topic)
		if !x.on {
			if len(got) != 0 {
				t.Errorf("%v: unexpected %s finding %v", c.Grade, topic, got)
			}
			continue
		}
		n++
		if len(got) != 1 || got[0].Severity != x.sev || got[0].Hazard != x.hz || got[0].Rule.Kind == components.Unstated {
			t.Errorf("%v: %s findings %v, want one %v about %v with a rule", c.Grade, topic, got, x.sev, x.hz)
		}
	}
	if len(c.Findings) != n {
		t.Errorf("%v: %d findings, want %d: %v", c.Grade, len(c.Findings), n, c.Findings)
	}
}

// A grade that suits with a 0.3 K cold-start margin carries a caution about
// cold starts that quotes the margin, and the sentence renders in metric and
// US customary units. The site is built on VG 32's own curve: its start is
// 0.3 K above where VG 32 (at its upper limit, VI 150) reaches 1000 mm²/s.
func TestSelectGradesThinMargin(t *testing.T) {
	w := DefaultWindow()
	thick, _ := CurveFromVI(VG32.Max(), 150)
	cold, _ := thick.TemperatureFor(w.Max)
	site := Site{MinStart: cold.Add(0.3 * units.DeltaKelvin), MaxRunning: celsius(45)}
	cs, err := SelectGrades(site, 150, w)
	if err != nil {
		t.Fatal(err)
	}
	var vg32 *Candidate
	for i := range cs {
		if cs[i].Grade == VG32 {
			vg32 = &cs[i]
		}
	}
	if vg32 == nil {
		t.Fatalf("VG 32 not among %v", cs)
	}
	if math.Abs(vg32.ColdMargin.Kelvin()-0.3) > 1e-9 {
		t.Fatalf("cold margin %v, want 0.3 K", vg32.ColdMargin)
	}
	fs := vg32.Findings.Topic(TopicColdMargin)
	if len(fs) != 1 || fs[0].Severity != components.Caution || fs[0].Hazard != components.ColdStart || fs[0].Rule.Kind != components.OurChoice {
		t.Fatalf("VG 32 findings %v, want one cold-start caution of our choice", vg32.Findings)
	}
	args := fs[0].Args()
	if len(args) != 4 || args[1] != vg32.ColdMargin || args[0] != site.MinStart || args[3] != w.Max {
		t.Errorf("finding quotes %v, want the start, the margin, the grade and the limit as typed values", args)
	}
	usSystem := units.USCustomary()
	metric, us := fs[0].Text(units.Metric()), fs[0].Text(usSystem)
	if !strings.Contains(metric, "0.3 K") || !strings.Contains(us, "0.54 °F") || !strings.Contains(us, "cSt") {
		t.Errorf("metric %q, US %q: the margin and limit do not render in each system", metric, us)
	}
	// A grade well clear of both limits carries no margin finding.
	for _, c := range cs {
		if c.ColdMargin >= MinTemperatureMargin && len(c.Findings.Topic(TopicColdMargin)) != 0 {
			t.Errorf("%v: cold margin %v but a cold-margin finding", c.Grade, c.ColdMargin)
		}
	}
}

// No grade spans an arctic start with a hot running limit; the error names
// the nearest grade and how far each end misses, recomputed here from each
// grade's own worst-case curves.
func TestSelectGradesNone(t *testing.T) {
	site := Site{MinStart: celsius(-40), MaxRunning: celsius(90)}
	w := DefaultWindow()
	cs, err := SelectGrades(site, 100, w)
	if cs != nil || !errors.Is(err, ErrNoGrade) || !errors.Is(err, units.ErrRange) {
		t.Fatalf("SelectGrades = %v, %v; want ErrNoGrade and units.ErrRange", cs, err)
	}
	wantRangeError(t, err, "s")
	var se *SelectError
	if !errors.As(err, &se) {
		t.Fatalf("err %v is not a *SelectError", err)
	}
	best, bestCold, bestHot := Grade(0), units.TemperatureDifference(0), units.TemperatureDifference(0)
	least := math.Inf(1)
	for _, g := range selectable {
		thick, _ := CurveFromVI(g.Max(), 100)
		thin, _ := CurveFromVI(g.Min(), 100)
		coldest, _ := thick.TemperatureFor(w.Max)
		hottest, _ := thin.TemperatureFor(w.Min)
		c, h := max(coldest.Sub(site.MinStart), 0), max(site.MaxRunning.Sub(hottest), 0)
		if float64(c+h) < least {
			least, best, bestCold, bestHot = float64(c+h), g, c, h
		}
	}
	if se.Nearest != best || math.Abs(float64(se.ColdMiss-bestCold)) > 1e-9 || math.Abs(float64(se.HotMiss-bestHot)) > 1e-9 {
		t.Errorf("SelectError %+v; want nearest %v missing %v cold, %v hot", se, best, bestCold, bestHot)
	}
	if !(se.ColdMiss > 0 || se.HotMiss > 0) {
		t.Errorf("nearest grade misses by nothing: %+v", se)
	}
	if !strings.Contains(err.Error(), se.Nearest.String()) || !strings.Contains(err.Error(), se.ColdMiss.String()) {
		t.Errorf("error %q does not say which grade misses and by how much", err)
	}
}

func TestSelectGradesBadInput(t *testing.T) {
	w := DefaultWindow()
	cases := []struct {
		param string
		s     Site
		vi    float64
		w     Window
	}{
		{"MinStart", Site{0, celsius(60)}, 100, w},
		{"MaxRunning", Site{celsius(60), celsius(20)}, 100, w},
		{"MaxRunning", Site{celsius(0), units.Temperature(math.NaN())}, 100, w},
		{"vi", Site{celsius(0), celsius(60)}, math.NaN(), w},
		{"vi", Site{celsius(0), celsius(60)}, 900, w},
		{"w.Min", Site{celsius(0), celsius(60)}, 100, Window{}},
	}
	for _, c := range cases {
		cs, err := SelectGrades(c.s, c.vi, c.w)
		wantRangeError(t, err, c.param)
		if cs != nil {
			t.Errorf("candidates %v with an error", cs)
		}
	}
}

// Site.Findings cautions about running above the ISO 4413 pump inlet limit
// of 60 °C (ISO 4413:2010) and about starts below 0 °C (common practice),
// and says nothing for a temperate duty.
func TestSiteFindings(t *testing.T) {
	inlet := components.NewFinding(components.Caution, components.HotSurface, TopicInletTemperature, components.Rule{}, "")
	cold := components.NewFinding(components.Caution, components.ColdStart, TopicColdStart, components.Rule{}, "")
	for _, c := range []struct {
		site Site
		want []components.Finding // severity, hazard and topic, in order
	}{
		{Site{MinStart: celsius(10), MaxRunning: celsius(55)}, nil},
		{Site{MinStart: celsius(10), MaxRunning: celsius(60)}, nil},
		{Site{MinStart: celsius(0), MaxRunning: celsius(60)}, nil},
		{Site{MinStart: celsius(10), MaxRunning: celsius(70)}, []components.Finding{inlet}},
		{Site{MinStart: celsius(-25), MaxRunning: celsius(50)}, []components.Finding{cold}},
		{Site{MinStart: celsius(-25), MaxRunning: celsius(75)}, []components.Finding{inlet, cold}},
	} {
		got := c.site.Findings()
		if len(got) != len(c.want) {
			t.Errorf("%+v.Findings() = %v, want %d findings", c.site, got, len(c.want))
			continue
		}
		for i, w := range c.want {
			if g := got[i]; g.Severity != w.Severity || g.Hazard != w.Hazard || g.Topic != w.Topic || g.Rule.Kind == components.Unstated {
				t.Errorf("%+v.Findings()[%d] = %v (%s, %v), want %v about %v (%s) with a rule", c.site, i, g, g.Topic, g.Rule, w.Severity, w.Hazard, w.Topic)
			}
		}
	}
	// The inlet finding quotes the temperatures as typed values.
	f := Site{MinStart: celsius(10), MaxRunning: celsius(70)}.Findings()[0]
	if args := f.Args(); len(args) != 2 || args[0] != celsius(70) || args[1] != MaxPumpInlet || f.Rule.Kind != components.Standard {
		t.Errorf("inlet finding %v quotes %v under %v", f, args, f.Rule)
	}
}
