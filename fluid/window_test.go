package fluid

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// Default window, common practice: minimum 10 mm²/s, optimum 16–36 mm²/s,
// cold-start maximum 1000 mm²/s.
func TestDefaultWindow(t *testing.T) {
	w := DefaultWindow()
	if w.Min != mm2s(10) || w.OptimumLow != mm2s(16) || w.OptimumHigh != mm2s(36) || w.Max != mm2s(1000) {
		t.Errorf("DefaultWindow = %+v", w)
	}
	if err := w.Validate(); err != nil {
		t.Error(err)
	}
}

func TestWindowValidate(t *testing.T) {
	for _, c := range []struct {
		param string
		w     Window
	}{
		{"Min", Window{Min: 0, OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(1000)}},
		{"OptimumLow", Window{Min: mm2s(20), OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(1000)}},
		{"OptimumHigh", Window{Min: mm2s(10), OptimumLow: mm2s(36), OptimumHigh: mm2s(16), Max: mm2s(1000)}},
		{"Max", Window{Min: mm2s(10), OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(20)}},
		{"Max", Window{Min: mm2s(10), OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(math.NaN())}},
	} {
		wantRangeError(t, c.w.Validate(), c.param)
		c0, _ := CurveFromVI(mm2s(46), 100)
		s, err := c0.Span(c.w)
		wantRangeError(t, err, "w."+c.param)
		if s != (Span{}) {
			t.Errorf("Span(%+v) = %+v with an error", c.w, s)
		}
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
		if !checktest.Close(float64(v), float64(p.v), 1e-11) {
			t.Errorf("ν(%v) = %v, want %v", p.t, v, p.v)
		}
	}
	if !(s.Cold < s.OptimumFrom && s.OptimumFrom < s.OptimumTo && s.OptimumTo < s.Hot) {
		t.Errorf("span out of order: %+v", s)
	}
	if _, err := (Curve{}).Span(w); !errors.Is(err, units.ErrRange) {
		t.Errorf("zero Curve: err = %v", err)
	}
}

// Fluid.Span raises every temperature below the pour point to it, so the
// span stays in order; a pour point at or above the hot end leaves no span
// and is an error naming w.Min, never an inverted span. Own check values
// built on a VG 22 HM preset's curve, whose optimum band starts below 40 °C.
func TestFluidSpanPourPoint(t *testing.T) {
	base, err := Typical(HM, VG22)
	if err != nil {
		t.Fatal(err)
	}
	w := DefaultWindow()
	cs, _ := base.Curve().Span(w)
	fs, err := base.Span(w)
	if err != nil || fs != cs {
		t.Fatalf("Fluid.Span = %+v, %v; want Curve.Span %+v (pour point %v below Cold)", fs, err, cs, base.PourPoint())
	}
	withPour := func(pp units.Temperature) Fluid {
		d := base.DataSheet()
		d.PourPoint = pp
		f, err := FromDataSheet(d)
		if err != nil {
			t.Fatalf("pour point %v: %v", pp, err)
		}
		return f
	}
	// Between Cold and OptimumFrom: only Cold moves.
	f := withPour(cs.Cold.Add(5 * units.DeltaKelvin))
	if s, err := f.Span(w); err != nil || s != (Span{Cold: f.PourPoint(), OptimumFrom: cs.OptimumFrom, OptimumTo: cs.OptimumTo, Hot: cs.Hot}) {
		t.Errorf("pour point %v: %+v, %v; want Cold at the pour point, rest as %+v", f.PourPoint(), s, err, cs)
	}
	// Inside the optimum band: the band starts at the pour point.
	mid := cs.OptimumFrom.Add(units.DeltaKelvin)
	if mid >= t40 || mid >= cs.OptimumTo {
		t.Fatalf("test setup: %v not inside the optimum band and below 40 °C (%+v)", mid, cs)
	}
	f = withPour(mid)
	if s, err := f.Span(w); err != nil || s != (Span{Cold: mid, OptimumFrom: mid, OptimumTo: cs.OptimumTo, Hot: cs.Hot}) {
		t.Errorf("pour point %v: %+v, %v", mid, s, err)
	}
	// At or above the hot end: no span. A VG 10-like oil thins to 10 mm²/s
	// below 40 °C, where a pour point may still lie.
	thin, err := FromDataSheet(DataSheet{Class: HM, V40: mm2s(9), V100: mm2s(2.5), Density15: 850, PourPoint: celsius(39)})
	if err != nil {
		t.Fatal(err)
	}
	if ts, _ := thin.Curve().Span(w); !(ts.Hot < thin.PourPoint()) {
		t.Fatalf("test setup: hot end %v not below the pour point %v", ts.Hot, thin.PourPoint())
	}
	s, err := thin.Span(w)
	wantRangeError(t, err, "w.Min")
	if s != (Span{}) {
		t.Errorf("span %+v with an error", s)
	}
	if _, err := base.Span(Window{}); !errors.Is(err, units.ErrRange) {
		t.Errorf("Fluid.Span(Window{}) err = %v, want ErrRange", err)
	}
	if _, err := (Fluid{}).Span(w); !errors.Is(err, units.ErrRange) {
		t.Errorf("zero Fluid: err = %v, want ErrRange", err)
	}
}
