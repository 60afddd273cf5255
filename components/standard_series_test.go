package components

import (
	"errors"
	"slices"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// checkTable compares a table with the source list written out in the test,
// size by size and exactly (table look-ups are exact), and its second-choice
// marks with the source's.
func checkTable[T ~float64](t *testing.T, s Series[T], want, second []T) {
	t.Helper()
	got := slices.Collect(func(yield func(T) bool) {
		for v := range s.All() {
			if !yield(v) {
				return
			}
		}
	})
	if !slices.Equal(got, want) {
		t.Errorf("%s: sizes\n got %v\nwant %v", s.Name(), got, want)
	}
	for v, p := range s.All() {
		if p == slices.Contains(second, v) {
			t.Errorf("%s: %v preferred = %v; want %v", s.Name(), v, p, !p)
		}
	}
	if s.Rule().Kind == Unstated || s.Rule().Source == "" || s.Name() == "" {
		t.Errorf("%s: rule %v; want a named rule", s.Name(), s.Rule())
	}
}

func TestISO3320Bores(t *testing.T) {
	const mm = units.Millimetre
	// ISO 3320:2013, clause 5 (from memory): 8 … 500 mm, the sizes in
	// parentheses there second choice.
	checkTable(t, ISO3320Bores(),
		[]units.Length{8 * mm, 10 * mm, 12 * mm, 16 * mm, 20 * mm, 25 * mm, 32 * mm, 40 * mm, 50 * mm,
			63 * mm, 80 * mm, 90 * mm, 100 * mm, 110 * mm, 125 * mm, 140 * mm, 160 * mm, 180 * mm,
			200 * mm, 220 * mm, 250 * mm, 280 * mm, 320 * mm, 360 * mm, 400 * mm, 450 * mm, 500 * mm},
		[]units.Length{90 * mm, 110 * mm, 140 * mm, 180 * mm, 220 * mm, 280 * mm, 360 * mm, 450 * mm})
	if k := ISO3320Bores().Rule().Kind; k != Standard {
		t.Errorf("rule kind %v; want standard", k)
	}
}

func TestISO3320Rods(t *testing.T) {
	const mm = units.Millimetre
	// ISO 3320:2013, clause 5 (from memory): 4 … 360 mm.
	checkTable(t, ISO3320Rods(),
		[]units.Length{4 * mm, 5 * mm, 6 * mm, 8 * mm, 10 * mm, 12 * mm, 14 * mm, 16 * mm, 18 * mm,
			20 * mm, 22 * mm, 25 * mm, 28 * mm, 32 * mm, 36 * mm, 40 * mm, 45 * mm, 50 * mm, 56 * mm,
			63 * mm, 70 * mm, 80 * mm, 90 * mm, 100 * mm, 110 * mm, 125 * mm, 140 * mm, 160 * mm,
			180 * mm, 200 * mm, 220 * mm, 250 * mm, 280 * mm, 320 * mm, 360 * mm},
		nil)
}

func TestInchBoresRods(t *testing.T) {
	const in = units.Inch
	// North American tie-rod cylinder practice (common practice, from memory).
	checkTable(t, InchBores(),
		[]units.Length{1.5 * in, 2 * in, 2.5 * in, 3.25 * in, 4 * in, 5 * in, 6 * in, 7 * in, 8 * in,
			10 * in, 12 * in, 14 * in}, nil)
	checkTable(t, InchRods(),
		[]units.Length{0.625 * in, 1 * in, 1.375 * in, 1.75 * in, 2 * in, 2.5 * in, 3 * in, 3.5 * in,
			4 * in, 4.5 * in, 5 * in, 5.5 * in, 7 * in, 8 * in, 10 * in}, nil)
	for _, s := range []Series[units.Length]{InchBores(), InchRods()} {
		if s.Rule().Kind != CommonPractice {
			t.Errorf("%s: rule kind %v; want common practice", s.Name(), s.Rule().Kind)
		}
	}
	// A 2 in bore is 50.8 mm exactly (inch = 25.4 mm, NIST SP 811).
	if got := InchBores().Sizes()[1].Millimetres(); got != 50.8 {
		t.Errorf("2 in bore = %v mm; want 50.8", got)
	}
}

func TestISO4393Strokes(t *testing.T) {
	const mm = units.Millimetre
	// ISO 4393, basic series of piston strokes (from memory).
	checkTable(t, ISO4393Strokes(),
		[]units.Length{25 * mm, 50 * mm, 80 * mm, 100 * mm, 125 * mm, 160 * mm, 200 * mm, 250 * mm,
			320 * mm, 400 * mm, 500 * mm, 630 * mm, 800 * mm, 1000 * mm, 1250 * mm, 1600 * mm,
			2000 * mm, 2500 * mm, 3200 * mm, 4000 * mm}, nil)
}

func TestIECMotorRatings(t *testing.T) {
	const kW = units.Kilowatt
	// IEC 60072-1, preferred rated outputs: to 55 kW confirmed; 75 kW and
	// up from memory.
	checkTable(t, IECMotorRatings(),
		[]units.Power{0.06 * kW, 0.09 * kW, 0.12 * kW, 0.18 * kW, 0.25 * kW, 0.37 * kW, 0.55 * kW,
			0.75 * kW, 1.1 * kW, 1.5 * kW, 2.2 * kW, 3 * kW, 4 * kW, 5.5 * kW, 7.5 * kW, 11 * kW, 15 * kW,
			18.5 * kW, 22 * kW, 30 * kW, 37 * kW, 45 * kW, 55 * kW,
			75 * kW, 90 * kW, 110 * kW, 132 * kW, 160 * kW, 200 * kW, 250 * kW, 315 * kW}, nil)
}

func TestNEMAMotorRatings(t *testing.T) {
	const hp = units.Horsepower
	// NEMA MG 1: ½ … 150 hp confirmed; 200 … 500 hp by 50 from memory.
	// Cross-check: the horsepower column of NFPA 70 (NEC) Table 430.250, as
	// reproduced in a public reference table, lists ½ … 200, 400, 450 and
	// 500 hp; 250, 300 and 350 hp were not legible there.
	checkTable(t, NEMAMotorRatings(),
		[]units.Power{0.5 * hp, 0.75 * hp, 1 * hp, 1.5 * hp, 2 * hp, 3 * hp, 5 * hp, 7.5 * hp, 10 * hp,
			15 * hp, 20 * hp, 25 * hp, 30 * hp, 40 * hp, 50 * hp, 60 * hp, 75 * hp, 100 * hp, 125 * hp,
			150 * hp, 200 * hp, 250 * hp, 300 * hp, 350 * hp, 400 * hp, 450 * hp, 500 * hp}, nil)
	// 10 hp = 7456.9987 W (hp = 550 ft·lbf/s, NIST SP 811), to 1e-9 relative.
	if got := NEMAMotorRatings().Sizes()[8]; !checktest.Close(float64(got), 7456.9987158227, 1e-12) {
		t.Errorf("10 hp = %v W", float64(got))
	}
}

func TestReservoirVolumes(t *testing.T) {
	const L = units.Litre
	// ISO 3, R10 preferred numbers 4 … 4000; the R10 values that are not R5
	// values are second choice (common practice for tank volumes).
	checkTable(t, ReservoirVolumes(),
		[]units.Volume{4 * L, 5 * L, 6.3 * L, 8 * L, 10 * L, 12.5 * L, 16 * L, 20 * L, 25 * L, 31.5 * L,
			40 * L, 50 * L, 63 * L, 80 * L, 100 * L, 125 * L, 160 * L, 200 * L, 250 * L, 315 * L, 400 * L,
			500 * L, 630 * L, 800 * L, 1000 * L, 1250 * L, 1600 * L, 2000 * L, 2500 * L, 3150 * L, 4000 * L},
		[]units.Volume{5 * L, 8 * L, 12.5 * L, 20 * L, 31.5 * L, 50 * L, 80 * L, 125 * L, 200 * L,
			315 * L, 500 * L, 800 * L, 1250 * L, 2000 * L, 3150 * L})
	const gal = units.USGallon
	// Common practice.
	checkTable(t, ReservoirVolumesUS(),
		[]units.Volume{1 * gal, 2 * gal, 3 * gal, 5 * gal, 10 * gal, 15 * gal, 20 * gal, 30 * gal, 40 * gal,
			50 * gal, 60 * gal, 80 * gal, 100 * gal, 120 * gal, 150 * gal, 200 * gal, 250 * gal, 300 * gal,
			400 * gal, 500 * gal}, nil)
	// A 10 gal tank holds 37.85411784 L (US gallon = 231 in³, NIST SP 811).
	if got := ReservoirVolumesUS().Sizes()[4].Litres(); !checktest.Close(got, 37.85411784, 1e-14) {
		t.Errorf("10 gal = %v L", got)
	}
}

func TestFilterRatings(t *testing.T) {
	const um = units.Micrometre
	// Common practice.
	checkTable(t, FilterRatings(),
		[]units.Length{3 * um, 5 * um, 7 * um, 10 * um, 12 * um, 15 * um, 20 * um, 25 * um}, nil)
	// The coarsest rating no coarser than a required 11 µm is 10 µm.
	if got, err := FilterRatings().Floor(11 * um); err != nil || got != 10*um {
		t.Errorf("Floor(11 µm) = %v, %v; want 10 µm", got, err)
	}
}

// TestTablesPassNewSeries holds every table built with fixed to the checks
// of NewSeries: finite, > 0, strictly ascending, second choices among the
// sizes.
func TestTablesPassNewSeries(t *testing.T) {
	lengths := []Series[units.Length]{ISO3320Bores(), ISO3320Rods(), InchBores(), InchRods(),
		ISO4393Strokes(), HoseSizes(), FilterRatings()}
	for _, s := range lengths {
		revalidate(t, s)
	}
	revalidate(t, IECMotorRatings())
	revalidate(t, NEMAMotorRatings())
	revalidate(t, ReservoirVolumes())
	revalidate(t, ReservoirVolumesUS())
}

func revalidate[T ~float64](t *testing.T, s Series[T]) {
	t.Helper()
	var second []T
	for v, p := range s.All() {
		if !p {
			second = append(second, v)
		}
	}
	if _, err := NewSeries(s.Name(), s.Rule(), s.Sizes(), second); err != nil {
		t.Errorf("%s: %v", s.Name(), err)
	}
}

func TestStandardSeriesLookups(t *testing.T) {
	const mm = units.Millimetre
	bores := ISO3320Bores()
	for _, c := range []struct {
		name       string
		got        func() (units.Length, error)
		want       units.Length
		wantErrors bool
	}{
		{"Next at a size", func() (units.Length, error) { return bores.Next(63 * mm) }, 63 * mm, false},
		{"Next between sizes", func() (units.Length, error) { return bores.Next(64 * mm) }, 80 * mm, false},
		{"Next onto a second choice", func() (units.Length, error) { return bores.Next(85 * mm) }, 90 * mm, false},
		{"NextPreferred skips it", func() (units.Length, error) { return bores.NextPreferred(85 * mm) }, 100 * mm, false},
		{"Next below the smallest", func() (units.Length, error) { return bores.Next(1 * mm) }, 8 * mm, false},
		{"Next above the largest", func() (units.Length, error) { return bores.Next(501 * mm) }, 0, true},
		{"Below at a size", func() (units.Length, error) { return bores.Below(100 * mm) }, 90 * mm, false},
		{"Below between sizes", func() (units.Length, error) { return bores.Below(95 * mm) }, 90 * mm, false},
		{"Below the smallest", func() (units.Length, error) { return bores.Below(8 * mm) }, 0, true},
		{"Above at a size", func() (units.Length, error) { return bores.Above(63 * mm) }, 80 * mm, false},
		{"Above between sizes", func() (units.Length, error) { return bores.Above(70 * mm) }, 80 * mm, false},
		{"Above the largest", func() (units.Length, error) { return bores.Above(500 * mm) }, 0, true},
		{"Floor at a size", func() (units.Length, error) { return bores.Floor(125 * mm) }, 125 * mm, false},
		{"Floor between sizes", func() (units.Length, error) { return bores.Floor(130 * mm) }, 125 * mm, false},
		{"Floor below the smallest", func() (units.Length, error) { return bores.Floor(7 * mm) }, 0, true},
		// ln(71/63) = 0.1196 > ln(80/71) = 0.1194: 80 is nearer on a ratio scale.
		{"Nearest between sizes, upper", func() (units.Length, error) { return bores.Nearest(71 * mm) }, 80 * mm, false},
		// ln(70/63) = 0.1054 < ln(80/70) = 0.1335.
		{"Nearest between sizes, lower", func() (units.Length, error) { return bores.Nearest(70 * mm) }, 63 * mm, false},
		{"Nearest at a size", func() (units.Length, error) { return bores.Nearest(250 * mm) }, 250 * mm, false},
		{"Nearest above the largest", func() (units.Length, error) { return bores.Nearest(900 * mm) }, 500 * mm, false},
		{"Rod Next between sizes", func() (units.Length, error) { return ISO3320Rods().Next(33 * mm) }, 36 * mm, false},
		{"Stroke Next between sizes", func() (units.Length, error) { return ISO4393Strokes().Next(700 * mm) }, 800 * mm, false},
	} {
		got, err := c.got()
		if c.wantErrors {
			if !errors.Is(err, units.ErrRange) || got != 0 {
				t.Errorf("%s: %v, %v; want 0 and ErrRange", c.name, got, err)
			}
			continue
		}
		if err != nil || got != c.want {
			t.Errorf("%s: %v, %v; want %v", c.name, got, err, c.want)
		}
	}
}

func TestStandardSeriesSelect(t *testing.T) {
	const kW = units.Kilowatt
	c, err := IECMotorRatings().Select(12.3 * kW)
	if err != nil || c.Chosen != 15*kW || !c.OK() || c.Series != "IEC 60072-1 motor ratings" {
		t.Fatalf("Select(12.3 kW) = %+v, %v; want 15 kW", c, err)
	}
	if m := c.Margin(); !checktest.Close(m, 15/12.3-1, 1e-15) {
		t.Errorf("margin %v; want %v", m, 15/12.3-1)
	}
	c, err = IECMotorRatings().Select(400 * kW)
	if err != nil || c.OK() || c.Chosen != 0 {
		t.Errorf("Select(400 kW) = %+v, %v; want a failed choice", c, err)
	}
	const L = units.Litre
	c2, err := ReservoirVolumes().SelectPreferred(105 * L)
	if err != nil || c2.Chosen != 160*L {
		t.Errorf("SelectPreferred(105 L) = %+v, %v; want 160 L (125 L is second choice)", c2, err)
	}
}
