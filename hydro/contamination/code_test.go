package contamination

import (
	"errors"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func num(s int) Number            { return Number{Scale: s} }
func few(s int) Number            { return Number{Scale: s, Mark: MarkFewCounted} }
func counter(a, b, c Number) Code { return Code{Form: Counter, N: [3]Number{a, b, c}} }
func micro(a, b Number) Code      { return Code{Form: Microscope, N: [3]Number{a, b}} }

var (
	notMeasured = Number{Mark: MarkNotMeasured}
	above28     = Number{Scale: 28, Mark: MarkAbove}
	tooMany     = Number{Mark: MarkTooMany}
)

func TestCodeFromCounts(t *testing.T) {
	cases := []struct {
		name        string
		c4, c6, c14 float64
		want        Code
	}{
		// Worked check, ISO 4406 [S]: 300 000 / 50 000 / 700 per 100 mL
		// = 3000 / 500 / 7 per mL → 19/16/10.
		{"worked check", 3000, 500, 7, counter(num(19), num(16), num(10))},
		// Row bounds belong to their row ("up to and including") [S].
		{"all on bounds", 2500, 640, 80, counter(num(18), num(16), num(13))},
		{"clean", 0.5, 0.1, 0, counter(num(6), num(4), num(0))},
		{"equal counts", 40, 40, 40, counter(num(12), num(12), num(12))},
		// Above 2 500 000 per mL → >28 [M].
		{"above table", 3e6, 2.6e6, 1e6, counter(above28, above28, num(27))},
	}
	for _, c := range cases {
		got, err := CodeFromCounts(c.c4, c.c6, c.c14)
		if err != nil || got != c.want {
			t.Errorf("%s: CodeFromCounts(%g, %g, %g) = %v, %v; want %v", c.name, c.c4, c.c6, c.c14, got, err, c.want)
		}
	}
	got, err := MicroscopeCodeFromCounts(500, 7)
	if want := micro(num(16), num(10)); err != nil || got != want {
		t.Errorf("MicroscopeCodeFromCounts(500, 7) = %v, %v; want %v", got, err, want)
	}
}

func TestCodeFromSample(t *testing.T) {
	cases := []struct {
		name        string
		n4, n6, n14 float64
		vol         units.Volume
		want        Code
	}{
		// Worked check, ISO 4406 [S], as raw counts in a 100 mL sample.
		{"worked check", 300000, 50000, 700, 100 * units.Millilitre, counter(num(19), num(16), num(10))},
		// Fewer than 20 counted → "≥" [S]. 19 in 10 mL = 1.9/mL → 8.
		{"19 counted", 50000, 8000, 19, 10 * units.Millilitre, counter(num(19), num(17), few(8))},
		{"20 counted", 50000, 8000, 20, 10 * units.Millilitre, counter(num(19), num(17), num(8))},
		{"none counted", 30, 0, 0, 10 * units.Millilitre, counter(num(9), few(0), few(0))},
		// A tiny sample with few particles still gives >28, not ≥.
		{"tiny sample", 10, 5, 1, 1e-9 * units.Millilitre, counter(above28, above28, above28)},
	}
	for _, c := range cases {
		got, err := CodeFromSample(c.n4, c.n6, c.n14, c.vol)
		if err != nil || got != c.want {
			t.Errorf("%s: CodeFromSample = %v, %v; want %v", c.name, got, err, c.want)
		}
	}
	got, err := MicroscopeCodeFromSample(500, 7, units.Millilitre)
	if want := micro(num(16), few(10)); err != nil || got != want {
		t.Errorf("MicroscopeCodeFromSample(500, 7, 1 mL) = %v, %v; want %v", got, err, want)
	}
}

func TestCodeBadInput(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	counts := []struct {
		name        string
		c4, c6, c14 float64
		order       bool // the error must match ErrOrder too
	}{
		// Not a count.
		{"negative", -1, 0, 0, false},
		{"NaN", 10, nan, 1, false},
		{"Inf", inf, 10, 1, false},
		{"negative 14", 10, 5, -1, false},
		// Counts growing with size.
		{"c4 < c6", 10, 20, 1, true},
		{"c6 < c14", 10, 5, 6, true},
		{"c4 < c6 < c14", 1, 2, 3, true},
	}
	for _, c := range counts {
		_, err := CodeFromCounts(c.c4, c.c6, c.c14)
		if !errors.Is(err, units.ErrRange) || errors.Is(err, ErrOrder) != c.order {
			t.Errorf("%s: CodeFromCounts err = %v; want ErrRange, ErrOrder %v", c.name, err, c.order)
		}
		_, err = CodeFromSample(c.c4, c.c6, c.c14, units.Millilitre)
		if !errors.Is(err, units.ErrRange) || errors.Is(err, ErrOrder) != c.order {
			t.Errorf("%s: CodeFromSample err = %v; want ErrRange, ErrOrder %v", c.name, err, c.order)
		}
	}
	if _, err := MicroscopeCodeFromCounts(1, 2); !errors.Is(err, ErrOrder) {
		t.Errorf("MicroscopeCodeFromCounts(1, 2): err = %v, want ErrOrder", err)
	}
	if _, err := MicroscopeCodeFromSample(2, 1, 0); !errors.Is(err, units.ErrRange) {
		t.Errorf("MicroscopeCodeFromSample zero volume: err = %v, want ErrRange", err)
	}
	// Bad sample volumes.
	for _, v := range []units.Volume{0, -units.Millilitre, units.Volume(nan), units.Volume(inf)} {
		if _, err := CodeFromSample(3, 2, 1, v); !errors.Is(err, units.ErrRange) {
			t.Errorf("CodeFromSample volume %g: err = %v, want ErrRange", float64(v), err)
		}
	}
	// Bad scale numbers.
	for _, n := range [][3]int{{-1, 0, 0}, {29, 1, 1}, {16, 18, 13}, {16, 13, 14}} {
		if _, err := MakeCode(n[0], n[1], n[2]); !errors.Is(err, units.ErrRange) {
			t.Errorf("MakeCode%v: err = %v, want ErrRange", n, err)
		}
	}
	if _, err := MakeMicroscopeCode(10, 11); !errors.Is(err, ErrOrder) {
		t.Errorf("MakeMicroscopeCode(10, 11): err = %v, want ErrOrder", err)
	}
	// Hand-built codes that Validate refuses.
	for _, c := range []Code{
		{Form: 7},
		counter(num(29), num(1), num(1)),
		counter(Number{Scale: 3, Mark: MarkNotMeasured}, num(1), num(1)),
		counter(Number{Scale: 20, Mark: MarkAbove}, num(1), num(1)),
		counter(Number{Mark: 9}, num(1), num(1)),
		counter(notMeasured, notMeasured, notMeasured),
		counter(num(10), num(12), notMeasured),
		counter(num(10), notMeasured, num(12)),
		counter(num(28), above28, num(1)),
		{Form: Microscope, N: [3]Number{num(5), num(3), num(1)}},
	} {
		if err := c.Validate(); !errors.Is(err, units.ErrRange) {
			t.Errorf("%#v.Validate() = %v, want ErrRange", c, err)
		}
		if _, err := c.MarshalText(); err == nil {
			t.Errorf("%#v.MarshalText() did not fail", c)
		}
		_ = c.String() // must not panic
	}
}

// TestMoreParticlesNeverLowerCode: a property of any monotone coding
// (ISO 4406 numbers rise with the count). Random counts, scaled up by a
// random factor ≥ 1, never give a lower number; ranks include >28.
func TestMoreParticlesNeverLowerCode(t *testing.T) {
	r := rand.New(rand.NewPCG(4406, 1))
	for range 20000 {
		c14 := math.Pow(10, r.Float64()*9-3)
		c6 := c14 * (1 + r.Float64()*50)
		c4 := c6 * (1 + r.Float64()*50)
		k := 1 + r.Float64()*r.Float64()*10
		a, err1 := CodeFromCounts(c4, c6, c14)
		b, err2 := CodeFromCounts(c4*k, c6*k, c14*k)
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		for i := range 3 {
			if b.N[i].rank() < a.N[i].rank() {
				t.Fatalf("counts %g,%g,%g ×%g: %v → %v is lower", c4, c6, c14, k, a, b)
			}
		}
		// Along the sizes too: numbers never grow with size.
		if err := a.Validate(); err != nil {
			t.Fatalf("%v from %g,%g,%g: %v", a, c4, c6, c14, err)
		}
	}
}

func TestCodeLabels(t *testing.T) {
	if Counter.SizeLabel(2) != "≥14 µm(c)" || Microscope.SizeLabel(0) != "≥5 µm" || Microscope.SizeLabel(2) != "" || Form(9).SizeLabel(0) != "" {
		t.Error("SizeLabel")
	}
	if Counter.String() != "counter" || Microscope.String() != "microscope" || Form(9).String() != "Form(9)" {
		t.Error("Form.String")
	}
	if few(7).String() != "≥7" || above28.String() != ">28" || (Number{Scale: 40}).String() != "?" {
		t.Error("Number.String")
	}
}

func TestCodeAllocs(t *testing.T) {
	sink, _ := ParseCode("19/16/10")
	checks := map[string]func(){
		"CodeFromCounts": func() { sink, _ = CodeFromCounts(3000, 500, 7) },
		"CodeFromSample": func() { sink, _ = CodeFromSample(300000, 50000, 19, 100*units.Millilitre) },
		"ParseCode":      func() { sink, _ = ParseCode("14/12/≥7") },
		"AppendText": func() {
			var buf [32]byte
			b, _ := sink.AppendText(buf[:0])
			_ = b
		},
	}
	for name, f := range checks {
		if a := testing.AllocsPerRun(100, f); a != 0 {
			t.Errorf("%s allocates %v times per call, want 0", name, a)
		}
	}
	_ = sink
}

func BenchmarkCodeFromCounts(b *testing.B) {
	b.ReportAllocs()
	var sink Code
	for i := 0; b.Loop(); i++ {
		c := benchCounts[i%len(benchCounts)]
		sink, _ = CodeFromCounts(c*30, c*5, c)
	}
	_ = sink
}

// An ordering error is a range error for the number at the larger size:
// it names that parameter and its value with its size, and the smaller
// size's parameter and value in the valid range, and matches ErrOrder.
func TestOrderErrorsNameNumbers(t *testing.T) {
	mk := func(c Code, err error) error { return err }
	cases := []struct {
		name, fn, param, value, valid string
		err                           error
	}{
		{"MakeCode", "contamination.MakeCode", "n6", "16 (≥6 µm(c))", "≤ n4 = 13 (≥4 µm(c))", mk(MakeCode(13, 16, 18))},
		{"MakeMicroscopeCode", "contamination.MakeMicroscopeCode", "n15", "11 (≥15 µm)", "≤ n5 = 10 (≥5 µm)", mk(MakeMicroscopeCode(10, 11))},
		{"Validate", "contamination.Code.Validate", "N[1]", "12 (≥6 µm(c))", "≤ N[0] = 10 (≥4 µm(c))", counter(num(10), num(12), num(1)).Validate()},
		{"Validate marks", "contamination.Code.Validate", "N[1]", ">28 (≥6 µm(c))", "≤ N[0] = 28 (≥4 µm(c))", counter(num(28), above28, num(1)).Validate()},
		{"Validate across -", "contamination.Code.Validate", "N[2]", "12 (≥14 µm(c))", "≤ N[0] = 10 (≥4 µm(c))", counter(num(10), notMeasured, num(12)).Validate()},
		// Counts: the order error on counts says what is wanted, as the
		// errors on codes do.
		{"CodeFromCounts", "contamination.CodeFromCounts", "c6", "20", "≤ c4 = 10", mk(CodeFromCounts(10, 20, 1))},
		{"CodeFromSample", "contamination.CodeFromSample", "n14", "6", "≤ n6 = 5", mk(CodeFromSample(10, 5, 6, units.Millilitre))},
		{"MicroscopeCodeFromCounts", "contamination.MicroscopeCodeFromCounts", "c15", "2", "≤ c5 = 1", mk(MicroscopeCodeFromCounts(1, 2))},
	}
	for _, c := range cases {
		if !errors.Is(c.err, ErrOrder) {
			t.Errorf("%s: err = %v, want ErrOrder", c.name, c.err)
		}
		re := checktest.RangeErrorIn(t, c.err, c.fn, c.param)
		if re != nil && (re.Value != c.value || re.Valid != c.valid) {
			t.Errorf("%s: value %q, valid %q; want %q, %q", c.name, re.Value, re.Valid, c.value, c.valid)
		}
	}
	// A constructor that fails returns the zero Code.
	if c, _ := MakeCode(13, 16, 18); c != (Code{}) {
		t.Errorf("MakeCode with an error = %#v, want the zero Code", c)
	}
	if c, _ := MakeMicroscopeCode(30, 1); c != (Code{}) {
		t.Errorf("MakeMicroscopeCode with an error = %#v, want the zero Code", c)
	}
}

// TestBadNumberErrorsShowMark: a number refused for its mark is shown with
// its mark, not as a bare scale that looks valid.
func TestBadNumberErrorsShowMark(t *testing.T) {
	for _, c := range []Code{
		micro(num(10), num(2)).with(2, Number{Mark: MarkAbove}),
		counter(Number{Scale: 3, Mark: MarkNotMeasured}, num(1), num(1)),
	} {
		err := c.Validate()
		if !errors.Is(err, units.ErrRange) || !strings.Contains(err.Error(), "Mark:") {
			t.Errorf("%#v.Validate() = %v; want an error that shows the mark", c, err)
		}
	}
}

func (c Code) with(i int, n Number) Code { c.N[i] = n; return c }
