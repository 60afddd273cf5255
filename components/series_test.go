package components

import (
	"encoding/json"
	"errors"
	"math"
	"slices"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/internal/checktest"
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
	if re := checktest.RangeErrorIn(t, err, "components.Series.Next", "min"); re != nil && re.Valid != "≤ 100 mm, the largest of test bores" {
		t.Errorf("Next(101 mm) error = %v; want a RangeError naming the largest", err)
	}
}

func TestSeriesBelowNearest(t *testing.T) {
	s := testBores(t)
	mm := units.Millimetre
	if got, err := s.Below(63 * mm); err != nil || got != 50*mm {
		t.Errorf("Below(63 mm) = %v, %v; want 50 mm", got, err)
	}
	_, err := s.Below(40 * mm)
	checktest.RangeErrorIn(t, err, "components.Series.Below", "v")
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
	// A requirement so small that Chosen/Required overflows would give an
	// infinite margin, which JSON cannot carry: an error naming required.
	for name, sel := range map[string]func(units.Length) (Choice[units.Length], error){
		"Select": s.Select, "SelectPreferred": s.SelectPreferred,
	} {
		c, err := sel(5e-324)
		var re *units.RangeError
		if !errors.As(err, &re) || re.Param != "required" || c != (Choice[units.Length]{}) {
			t.Errorf("%s(5e-324 m) = %+v, %v; want the zero Choice and a RangeError naming required", name, c, err)
		}
		if c, err := sel(1e-300); err != nil || math.IsInf(c.Margin(), 0) {
			t.Errorf("%s(1e-300 m) = %+v (margin %v), %v; want a finite margin", name, c, c.Margin(), err)
		}
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

func TestSeriesAboveFloor(t *testing.T) {
	s := testBores(t)
	mm := units.Millimetre
	for _, c := range []struct {
		name      string
		got, want units.Length
		err       error
	}{
		{"Above(63)", first(s.Above(63 * mm)), 80 * mm, second(s.Above(63 * mm))},
		{"Above(64)", first(s.Above(64 * mm)), 80 * mm, second(s.Above(64 * mm))},
		{"Above(1)", first(s.Above(1 * mm)), 40 * mm, second(s.Above(1 * mm))},
		{"Floor(63)", first(s.Floor(63 * mm)), 63 * mm, second(s.Floor(63 * mm))},
		{"Floor(79)", first(s.Floor(79 * mm)), 63 * mm, second(s.Floor(79 * mm))},
		{"Floor(900)", first(s.Floor(900 * mm)), 100 * mm, second(s.Floor(900 * mm))},
	} {
		if c.err != nil || c.got != c.want {
			t.Errorf("%s = %v, %v; want %v", c.name, c.got, c.err, c.want)
		}
	}
	_, err := s.Floor(39 * mm)
	if re := checktest.RangeErrorIn(t, err, "components.Series.Floor", "max"); re != nil && re.Valid != "≥ 40 mm, the smallest of test bores" {
		t.Errorf("Floor(39 mm) error = %v; want a RangeError naming the smallest", err)
	}
	_, err = s.Above(100 * mm)
	if re := checktest.RangeErrorIn(t, err, "components.Series.Above", "v"); re != nil && re.Valid != "< 100 mm, the largest of test bores" {
		t.Errorf("Above(100 mm) error = %v; want a RangeError naming the largest", err)
	}
}

func TestSeriesNextPreferred(t *testing.T) {
	mm := units.Millimetre
	s, err := NewSeries("tail", StandardRule("test"), []units.Length{40 * mm, 50 * mm, 63 * mm, 70 * mm},
		[]units.Length{50 * mm, 70 * mm})
	if err != nil {
		t.Fatal(err)
	}
	if got, err := s.NextPreferred(41 * mm); err != nil || got != 63*mm {
		t.Errorf("NextPreferred(41 mm) = %v, %v; want 63 mm", got, err)
	}
	// 70 mm is a size but second choice: above 63 mm no preferred size is left.
	_, err = s.NextPreferred(64 * mm)
	if re := checktest.RangeErrorIn(t, err, "components.Series.NextPreferred", "min"); re != nil && re.Valid != "≤ 63 mm, the largest preferred size of tail" {
		t.Errorf("NextPreferred(64 mm) error = %v", err)
	}
	c, err := s.SelectPreferred(64 * mm)
	if err != nil || c.OK() || c.Chosen != 0 || c.Series != "tail" {
		t.Errorf("SelectPreferred(64 mm) = %+v, %v; want a failed choice", c, err)
	}
	if c, err := s.Select(64 * mm); err != nil || c.Chosen != 70*mm {
		t.Errorf("Select(64 mm) = %+v, %v; want 70 mm", c, err)
	}
	for name, err := range map[string]error{
		"NextPreferred(NaN)":  second(s.NextPreferred(units.Length(math.NaN()))),
		"SelectPreferred(-1)": second(s.SelectPreferred(-1)),
		"Above(0)":            second(s.Above(0)),
		"Floor(Inf)":          second(s.Floor(units.Length(math.Inf(1)))),
		"Floor empty":         second(Series[units.Length]{}.Floor(1)),
		"NextPreferred empty": second(Series[units.Length]{}.NextPreferred(1)),
	} {
		if !errors.Is(err, units.ErrRange) {
			t.Errorf("%s: error = %v; want ErrRange", name, err)
		}
	}
}

func TestSeriesJSON(t *testing.T) {
	s := testBores(t)
	b, err := json.Marshal(s)
	if err != nil {
		t.Fatal(err)
	}
	const want = `{"name":"test bores","rule":{"kind":"standard","source":"test"},` +
		`"sizes":["40 mm","50 mm","63 mm","80 mm","90 mm","100 mm"],"second":["90 mm"]}`
	if string(b) != want {
		t.Errorf("JSON\n got %s\nwant %s", b, want)
	}
	var back Series[units.Length]
	if err := json.Unmarshal(b, &back); err != nil {
		t.Fatal(err)
	}
	if back.Name() != s.Name() || back.Rule() != s.Rule() || !slices.Equal(back.Sizes(), s.Sizes()) || back.Preferred(90*units.Millimetre) {
		t.Errorf("read back %+v", back)
	}
	if err := json.Unmarshal([]byte(`{"name":"x","sizes":["2 mm","1 mm"]}`), &back); !errors.Is(err, units.ErrRange) {
		t.Errorf("descending sizes: error = %v; want ErrRange", err)
	}
	if b, err := json.Marshal(Series[units.Length]{}); err != nil || string(b) != `{"name":"","rule":{"kind":"unstated","source":""},"sizes":[]}` {
		t.Errorf("empty series JSON %s, %v", b, err)
	}
}

func TestSeriesSizesIsACopy(t *testing.T) {
	s := ISO3320Bores()
	v := s.Sizes()
	v[0] = 1
	if s.Smallest() != 8*units.Millimetre || ISO3320Bores().Smallest() != 8*units.Millimetre {
		t.Error("Sizes returned shared storage")
	}
}

func TestSeriesLookupAllocs(t *testing.T) {
	s := ISO3320Bores()
	req := 71.3 * units.Millimetre
	for name, f := range map[string]func(){
		"Next":            func() { _, _ = s.Next(req) },
		"NextPreferred":   func() { _, _ = s.NextPreferred(req) },
		"Select":          func() { _, _ = s.Select(req) },
		"SelectPreferred": func() { _, _ = s.SelectPreferred(req) },
		"Nearest":         func() { _, _ = s.Nearest(req) },
		"Below":           func() { _, _ = s.Below(req) },
		"Above":           func() { _, _ = s.Above(req) },
		"Floor":           func() { _, _ = s.Floor(req) },
		"ISO3320Bores":    func() { _ = ISO3320Bores() },
	} {
		if n := testing.AllocsPerRun(100, f); n != 0 {
			t.Errorf("%s allocates %v times; want 0", name, n)
		}
	}
}

func BenchmarkSeriesNext(b *testing.B) {
	s := ISO3320Bores()
	req := 71.3 * units.Millimetre
	b.ReportAllocs()
	for b.Loop() {
		_, _ = s.Next(req)
	}
}

func BenchmarkSeriesSelect(b *testing.B) {
	s := ISO3320Bores()
	req := 71.3 * units.Millimetre
	b.ReportAllocs()
	for b.Loop() {
		_, _ = s.Select(req)
	}
}

func BenchmarkSeriesSelectPreferred(b *testing.B) {
	s := ISO3320Bores()
	req := 85 * units.Millimetre
	b.ReportAllocs()
	for b.Loop() {
		_, _ = s.SelectPreferred(req)
	}
}

func first[T any](v T, _ error) T { return v }

func TestSeriesAboveEmpty(t *testing.T) {
	if _, err := (Series[units.Length]{}).Above(1); !errors.Is(err, units.ErrRange) {
		t.Errorf("Above on an empty series: error = %v; want ErrRange", err)
	}
}

// Binary arithmetic leaves 80 L/min for one minute at 80.000000000000014 L:
// the 80 L size must meet it (Tolerance), and a real excess must not.
func TestSeriesTolerance(t *testing.T) {
	l := units.Litre
	s, err := NewSeries("tanks", Rule{}, []units.Volume{63 * l, 80 * l, 100 * l}, nil)
	if err != nil {
		t.Fatal(err)
	}
	v := (80 * units.LitrePerMinute).TimesDuration(time.Minute)
	if v == 80*l {
		t.Skip("the product rounded exactly; the case this test guards did not arise")
	}
	c, err := s.Select(v)
	if err != nil || c.Chosen != 80*l || !c.OK() || c.Margin() != 0 {
		t.Errorf("Select(%v) = %+v (OK %v, margin %g), %v; want 80 L, OK, margin 0", float64(v), c, c.OK(), c.Margin(), err)
	}
	if n, _ := s.Next(v); n != 80*l {
		t.Errorf("Next = %v; want 80 L", n)
	}
	if f, _ := s.Floor(v); f != 80*l {
		t.Errorf("Floor = %v; want 80 L", f)
	}
	if a, _ := s.Above(v); a != 100*l {
		t.Errorf("Above = %v; want 100 L", a)
	}
	if b, _ := s.Below(v); b != 63*l {
		t.Errorf("Below = %v; want 63 L", b)
	}
	if n, _ := s.Next(80.001 * l); n != 100*l {
		t.Errorf("Next(80.001 L) = %v; want 100 L (a real excess)", n)
	}
}
