package fluid

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// Default window, common practice (CHECKS.md and the issue): minimum
// 10 mm²/s, optimum 16–36 mm²/s, cold-start maximum 1000 mm²/s.
func TestDefaultWindow(t *testing.T) {
	w := DefaultWindow()
	if w.Min != mm2s(10) || w.OptimumLow != mm2s(16) || w.OptimumHigh != mm2s(36) || w.Max != mm2s(1000) {
		t.Errorf("DefaultWindow = %+v", w)
	}
	if err := w.Validate(); err != nil {
		t.Error(err)
	}
}

// Span's temperatures are where the curve meets each window viscosity.
func TestCurveSpan(t *testing.T) {
	c, _ := CurveFromVI(mm2s(46), 100)
	w := DefaultWindow()
	s, err := c.Span(w)
	if err != nil {
		t.Fatal(err)
	}
	for _, p := range []struct {
		t units.Temperature
		v units.KinematicViscosity
	}{{s.Cold, w.Max}, {s.OptimumFrom, w.OptimumHigh}, {s.OptimumTo, w.OptimumLow}, {s.Hot, w.Min}} {
		v, _ := c.At(p.t)
		if !near(float64(v), float64(p.v), 1e-11) {
			t.Errorf("ν(%v) = %v, want %v", p.t, v, p.v)
		}
	}
	if !(s.Cold < s.OptimumFrom && s.OptimumFrom < s.OptimumTo && s.OptimumTo < s.Hot) {
		t.Errorf("span out of order: %+v", s)
	}
	bad := []Window{
		{Min: 0, OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(1000)},
		{Min: mm2s(20), OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(1000)},
		{Min: mm2s(10), OptimumLow: mm2s(36), OptimumHigh: mm2s(16), Max: mm2s(1000)},
		{Min: mm2s(10), OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(20)},
		{Min: mm2s(10), OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(math.NaN())},
	}
	for _, w := range bad {
		if _, err := c.Span(w); !errors.Is(err, units.ErrRange) {
			t.Errorf("Span(%+v) err = %v", w, err)
		}
	}
}

// Every candidate meets the window at its worst-case limits, and the list
// is ranked: optimum-band grades first, then by the smaller margin.
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
		if start != c.AtStart || run != c.AtRunning || start > w.Max || run < w.Min {
			t.Errorf("%v: start %v run %v, candidate %+v", c.Grade, start, run, c)
		}
		if c.ColdMargin < 0 || c.HotMargin < 0 || !strings.HasPrefix(c.Reason, c.Grade.String()+": ") {
			t.Errorf("%v: %+v", c.Grade, c)
		}
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
	for _, g := range []Grade{VG10, VG15, VG22, VG32, VG46, VG68, VG100, VG150} {
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

func TestSelectGradesNone(t *testing.T) {
	// An arctic start with a hot running limit: no single grade spans it.
	_, err := SelectGrades(Site{MinStart: celsius(-40), MaxRunning: celsius(90)}, 100, DefaultWindow())
	if !errors.Is(err, ErrNoGrade) || !strings.Contains(err.Error(), "-40 °C") {
		t.Errorf("err = %v, want ErrNoGrade naming the site", err)
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
		{"Min", Site{celsius(0), celsius(60)}, 100, Window{}},
	}
	for _, c := range cases {
		_, err := SelectGrades(c.s, c.vi, c.w)
		wantRangeError(t, err, c.param)
	}
}

// Fluid.Span stops at the pour point when the curve alone would allow a
// colder start, and otherwise equals Curve.Span. Own check values: a VG 46
// HM preset with its pour point moved above the 1000 mm²/s temperature.
func TestFluidSpanPourPoint(t *testing.T) {
	f, err := Typical(HM, VG46)
	if err != nil {
		t.Fatal(err)
	}
	w := DefaultWindow()
	cs, _ := f.Curve.Span(w)
	fs, err := f.Span(w)
	if err != nil || fs != cs {
		t.Fatalf("Fluid.Span = %+v, %v; want Curve.Span %+v (pour point %v below Cold)", fs, err, cs, f.PourPoint)
	}
	f.PourPoint = cs.Cold.Add(5 * units.DeltaKelvin)
	fs, err = f.Span(w)
	if err != nil || fs.Cold != f.PourPoint || fs.Hot != cs.Hot || fs.OptimumFrom != cs.OptimumFrom {
		t.Errorf("Fluid.Span with pour point %v = %+v, %v; want Cold at the pour point, rest as %+v", f.PourPoint, fs, err, cs)
	}
	if _, err := f.Span(Window{}); !errors.Is(err, units.ErrRange) {
		t.Errorf("Fluid.Span(Window{}) err = %v, want ErrRange", err)
	}
}

// Site.Cautions flags running above the ISO 4413 pump inlet limit of 60 °C
// (ISO 4413, as CHECKS.md gives it) and starts below 0 °C (common practice),
// and says nothing for a temperate duty.
func TestSiteCautions(t *testing.T) {
	for _, c := range []struct {
		site Site
		want []string // substrings, one per caution, in order
	}{
		{Site{MinStart: celsius(10), MaxRunning: celsius(55)}, nil},
		{Site{MinStart: celsius(10), MaxRunning: celsius(60)}, nil},
		{Site{MinStart: celsius(10), MaxRunning: celsius(70)}, []string{"70 °C is above the 60 °C pump inlet limit of ISO 4413"}},
		{Site{MinStart: celsius(-25), MaxRunning: celsius(50)}, []string{"starting at -25 °C"}},
		{Site{MinStart: celsius(-25), MaxRunning: celsius(75)}, []string{"ISO 4413", "warm the oil"}},
	} {
		got := c.site.Cautions()
		if len(got) != len(c.want) {
			t.Errorf("%+v.Cautions() = %q, want %d cautions", c.site, got, len(c.want))
			continue
		}
		for i, w := range c.want {
			if !strings.Contains(got[i], w) {
				t.Errorf("%+v.Cautions()[%d] = %q, want it to contain %q", c.site, i, got[i], w)
			}
		}
	}
}
