package components

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// testBores is a short geometric series with two second-choice sizes, in
// the pattern of ISO 3320's bores (the values here are only test data).
func testBores(t *testing.T) Series[units.Length] {
	t.Helper()
	mm := units.Millimetre
	s, err := NewSeries("test bores", StandardRule("test"),
		[]units.Length{40 * mm, 50 * mm, 63 * mm, 80 * mm, 90 * mm, 100 * mm}, []units.Length{90 * mm})
	if err != nil {
		t.Fatal(err)
	}
	return s
}

func TestSeriesNext(t *testing.T) {
	s := testBores(t)
	mm := units.Millimetre
	for _, c := range []struct{ min, want units.Length }{
		{1 * mm, 40 * mm},      // below the smallest: the smallest
		{40 * mm, 40 * mm},     // at a size: that size
		{40.001 * mm, 50 * mm}, // just above: the next
		{85 * mm, 90 * mm},     // a second-choice size is a size
		{100 * mm, 100 * mm},   // the largest
	} {
		got, err := s.Next(c.min)
		if err != nil || got != c.want {
			t.Errorf("Next(%v) = %v, %v; want %v", c.min, got, err, c.want)
		}
	}
	_, err := s.Next(101 * mm)
	var re *units.RangeError
	if !errors.As(err, &re) || !errors.Is(err, units.ErrRange) || re.Param != "min" || re.Valid != "≤ 100 mm, the largest of test bores" {
		t.Errorf("Next(101 mm) error = %v; want a RangeError naming the largest", err)
	}
}

func TestSeriesBelowNearest(t *testing.T) {
	s := testBores(t)
	mm := units.Millimetre
	if got, err := s.Below(63 * mm); err != nil || got != 50*mm {
		t.Errorf("Below(63 mm) = %v, %v; want 50 mm", got, err)
	}
	if _, err := s.Below(40 * mm); !errors.Is(err, units.ErrRange) {
		t.Errorf("Below(40 mm) error = %v; want ErrRange", err)
	}
	for _, c := range []struct{ v, want units.Length }{
		{56 * mm, 50 * mm},   // ln(56/50) = 0.113 < ln(63/56) = 0.118
		{57 * mm, 63 * mm},   // ln(57/50) = 0.131 > ln(63/57) = 0.100
		{10 * mm, 40 * mm},   // below the smallest
		{900 * mm, 100 * mm}, // above the largest
	} {
		if got, err := s.Nearest(c.v); err != nil || got != c.want {
			t.Errorf("Nearest(%v) = %v, %v; want %v", c.v, got, err, c.want)
		}
	}
}

func TestSeriesPreferred(t *testing.T) {
	s := testBores(t)
	mm := units.Millimetre
	if !s.Preferred(80*mm) || s.Preferred(90*mm) || s.Preferred(85*mm) {
		t.Error("Preferred: want 80 mm preferred, 90 mm second choice, 85 mm not a size")
	}
	p := s.PreferredOnly()
	if p.Len() != 5 || p.Contains(90*mm) {
		t.Errorf("PreferredOnly has %d sizes (90 mm: %v); want 5 without 90 mm", p.Len(), p.Contains(90*mm))
	}
	n := 0
	for v, pref := range s.All() {
		n++
		if pref == (v == 90*mm) {
			t.Errorf("All: %v preferred = %v", v, pref)
		}
	}
	if n != 6 || s.Smallest() != 40*mm || s.Largest() != 100*mm {
		t.Errorf("All gave %d sizes, smallest %v, largest %v", n, s.Smallest(), s.Largest())
	}
}

func TestSeriesSelect(t *testing.T) {
	s := testBores(t)
	mm := units.Millimetre
	c, err := s.Select(56 * mm)
	if err != nil || c.Chosen != 63*mm || !c.OK() || c.Series != "test bores" {
		t.Fatalf("Select(56 mm) = %+v, %v", c, err)
	}
	if m := c.Margin(); m < 0.12499 || m > 0.12501 { // 63/56 − 1 = 0.125
		t.Errorf("Margin = %v; want 0.125", m)
	}
	c, err = s.Select(120 * mm)
	if err != nil || c.OK() || c.Chosen != 0 || c.Margin() != 0 {
		t.Errorf("Select beyond the largest = %+v, %v; want a failed choice and no error", c, err)
	}
}

func TestSeriesBadInput(t *testing.T) {
	s := testBores(t)
	nan := units.Length(math.NaN())
	for name, err := range map[string]error{
		"Next(NaN)":     second(s.Next(nan)),
		"Next(0)":       second(s.Next(0)),
		"Below(-1)":     second(s.Below(-1)),
		"Nearest(NaN)":  second(s.Nearest(nan)),
		"Select(0)":     second(s.Select(0)),
		"Nearest empty": second(Series[units.Length]{}.Nearest(1)),
		"descending":    second(NewSeries("x", Rule{}, []units.Length{2, 1}, nil)),
		"zero size":     second(NewSeries("x", Rule{}, []units.Length{0, 1}, nil)),
		"second absent": second(NewSeries("x", Rule{}, []units.Length{1, 2}, []units.Length{3})),
	} {
		if !errors.Is(err, units.ErrRange) {
			t.Errorf("%s: error = %v; want ErrRange", name, err)
		}
	}
}

func TestSeriesCopiesInput(t *testing.T) {
	in := []units.Length{1, 2, 3}
	s, err := NewSeries("x", Rule{}, in, nil)
	if err != nil {
		t.Fatal(err)
	}
	in[0] = 99
	if v, _ := s.At(0); v != 1 {
		t.Errorf("series changed with its input slice: At(0) = %v", v)
	}
	if v, ok := s.At(7); v != 0 || ok {
		t.Errorf("At(7) = %v, %v; want 0, false", v, ok)
	}
}

func second[T any](_ T, err error) error { return err }
