package components

import (
	"slices"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func TestMetricTubes(t *testing.T) {
	const mm = units.Millimetre
	type odWall struct{ od, wall units.Length }
	// Outside diameters: ISO 8434-1 L series 6 8 10 12 15 18 22 28 35 42 and
	// S series 6 8 10 12 14 16 20 25 30 38 (from memory); walls: common
	// stock sizes of precision steel hydraulic tube (common practice).
	for _, c := range []struct {
		class TubeClass
		want  []odWall
	}{
		{LightTube, []odWall{{6, 1}, {8, 1}, {10, 1.5}, {10, 1}, {12, 1.5}, {12, 1}, {15, 1.5}, {18, 2},
			{18, 1.5}, {22, 2}, {22, 1.5}, {28, 2.5}, {28, 2}, {35, 3}, {35, 2.5}, {42, 3}}},
		{HeavyTube, []odWall{{6, 1.5}, {8, 2}, {8, 1.5}, {10, 2}, {10, 1.5}, {12, 2}, {14, 2.5}, {14, 2},
			{16, 3}, {16, 2.5}, {20, 3}, {20, 2.5}, {25, 4}, {25, 3}, {30, 5}, {30, 4}, {38, 6}, {38, 5}}},
	} {
		got := MetricTubes(c.class)
		if len(got) != len(c.want) {
			t.Fatalf("%v: %d tubes; want %d", c.class, len(got), len(c.want))
		}
		for i, w := range c.want {
			g := got[i]
			if g.OD != w.od*mm || g.Wall != w.wall*mm || g.Class != c.class {
				t.Errorf("%v tube %d = %v; want %v × %v mm", c.class, i, g, w.od, w.wall)
			}
		}
		ascending := slices.IsSortedFunc(got, func(a, b Tube) int {
			if a.ID() != b.ID() {
				return compare(a.ID(), b.ID())
			}
			return compare(a.OD, b.OD)
		})
		if !ascending {
			t.Errorf("%v: tubes not ascending by ID, then OD", c.class)
		}
	}
	// A fresh copy each call.
	a := MetricTubes(LightTube)
	a[0].OD = 99 * mm
	if MetricTubes(LightTube)[0].OD != 6*mm {
		t.Error("MetricTubes returned shared storage")
	}
	if MetricTubes(TubeClass(7)) != nil {
		t.Error("unknown class: want nil")
	}
}

func TestTubeID(t *testing.T) {
	const mm = units.Millimetre
	tb := Tube{OD: 12 * mm, Wall: 1.5 * mm, Class: LightTube}
	// 12 − 2·1.5 = 9 mm, to 1e-15 relative (two float operations).
	if got := tb.ID().Millimetres(); !checktest.Close(got, 9, 1e-15) {
		t.Errorf("ID = %v mm; want 9", got)
	}
	if s := tb.String(); s != "12 × 1.5 mm (L)" {
		t.Errorf("String = %q", s)
	}
	if HeavyTube.String() != "S" || TubeClass(9).String() != "TubeClass(9)" {
		t.Errorf("class names %q %q", HeavyTube.String(), TubeClass(9).String())
	}
}

func compare(a, b units.Length) int {
	switch {
	case a < b:
		return -1
	case a > b:
		return 1
	}
	return 0
}
