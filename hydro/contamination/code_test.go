package contamination

import (
	"encoding/json"
	"errors"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

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

func TestParseCode(t *testing.T) {
	cases := []struct {
		in   string
		want Code
		out  string // String; "" means the input itself
	}{
		// Plain counter codes [S].
		{"18/16/13", counter(num(18), num(16), num(13)), ""},
		{"19/16/10", counter(num(19), num(16), num(10)), ""},
		{"0/0/0", counter(num(0), num(0), num(0)), ""},
		{"28/28/28", counter(num(28), num(28), num(28)), ""},
		// Sizes not measured [M], few counted [S] in both spellings.
		{"-/16/13", counter(notMeasured, num(16), num(13)), ""},
		{"14/12/≥7", counter(num(14), num(12), few(7)), ""},
		{"14/12/>=7", counter(num(14), num(12), few(7)), "14/12/≥7"},
		{"≥3/≥1/≥0", counter(few(3), few(1), few(0)), ""},
		// Above the table and too many to count [M].
		{">28/26/20", counter(above28, num(26), num(20)), ""},
		{"*/>28/28", counter(tooMany, above28, num(28)), ""},
		// Two-number microscope codes [S].
		{"16/13", micro(num(16), num(13)), ""},
		{"-/≥3", micro(notMeasured, few(3)), ""},
		// Spaces, leading zeros.
		{" 18 / 16 /13\t", counter(num(18), num(16), num(13)), "18/16/13"},
		{"08/07/06", counter(num(8), num(7), num(6)), "8/7/6"},
	}
	for _, c := range cases {
		got, err := ParseCode(c.in)
		if err != nil || got != c.want {
			t.Errorf("ParseCode(%q) = %#v, %v; want %#v", c.in, got, err, c.want)
			continue
		}
		want := c.out
		if want == "" {
			want = c.in
		}
		if s := got.String(); s != want {
			t.Errorf("ParseCode(%q).String() = %q, want %q", c.in, s, want)
		}
		if a := got.ASCII(); strings.ContainsRune(a, '≥') || strings.ReplaceAll(a, ">=", "≥") != want {
			t.Errorf("ParseCode(%q).ASCII() = %q", c.in, a)
		}
	}
}

func TestParseCodeBadInput(t *testing.T) {
	cases := []struct {
		in  string
		pos int
		err error
	}{
		// Malformed.
		{"", 0, units.ErrSyntax},
		{"18", 2, units.ErrSyntax},
		{"18/", 3, units.ErrSyntax},
		{"/16/13", 0, units.ErrSyntax},
		{"18/16/13/10", 9, units.ErrSyntax},
		{"18-16-13", 2, units.ErrSyntax},
		{"18/16/13 x", 9, units.ErrSyntax},
		{"18/16/1 3", 8, units.ErrSyntax},
		{"a/16/13", 0, units.ErrSyntax},
		{"18/16/≥", 9, units.ErrSyntax},
		{"18/16/>27", 6, units.ErrSyntax},
		{">280/20/10", 0, units.ErrSyntax},
		{"118/16/13", 0, units.ErrSyntax},
		{"18/+16/13", 3, units.ErrSyntax},
		{"18/16/\xff", 6, units.ErrSyntax},
		{"-/-/-", 0, units.ErrSyntax},
		{"ISO 18/16/13", 0, units.ErrSyntax},
		{"18//13", 3, units.ErrSyntax},
		{"18/16/13/", 9, units.ErrSyntax},
		{"14/12/≥≥7", 9, units.ErrSyntax},
		{"18/16/13\n", 8, units.ErrSyntax},
		// Look-alike characters: fullwidth digits and slash, ⩾ and ≧ for ≥,
		// a no-break space.
		{"１８/16/13", 0, units.ErrSyntax},
		{"18／16/13", 2, units.ErrSyntax},
		{"18/16/⩾7", 6, units.ErrSyntax},
		{"18/16/≧7", 6, units.ErrSyntax},
		{"18/16/\u00a013", 6, units.ErrSyntax},
		// Out of the table.
		{"29/16/13", 0, units.ErrRange},
		{"29/1/0", 0, units.ErrRange},
		{"18/16/99", 6, units.ErrRange},
		// Numbers growing with size.
		{"13/16/18", 3, ErrOrder},
		{"18/16/*", 6, ErrOrder},
		{"13/-/ 16", 6, ErrOrder},
		{"13/16", 3, ErrOrder},
	}
	for _, c := range cases {
		_, err := ParseCode(c.in)
		var pe *units.ParseError
		if !errors.As(err, &pe) || !errors.Is(err, c.err) || pe.Pos != c.pos || pe.Input != c.in {
			t.Errorf("ParseCode(%q): err = %v; want *units.ParseError at %d matching %v", c.in, err, c.pos, c.err)
			continue
		}
		if !strings.Contains(err.Error(), `"`) || !strings.HasPrefix(err.Error(), "contamination.ParseCode: ") {
			t.Errorf("ParseCode(%q): message %q does not quote the input", c.in, err)
		}
		if c.err == ErrOrder && !errors.Is(err, units.ErrRange) {
			t.Errorf("ParseCode(%q): order error does not match units.ErrRange", c.in)
		}
	}
}

// TestCodeRoundTrip formats every plain counter code and many marked ones
// and parses them back.
func TestCodeRoundTrip(t *testing.T) {
	marks := []Number{notMeasured, above28, tooMany}
	for a := range 29 {
		for b := 0; b <= a; b += 3 {
			for c := 0; c <= b; c += 2 {
				codes := []Code{
					counter(num(a), num(b), num(c)),
					counter(num(a), few(b), few(c)),
					micro(few(a), num(b)),
				}
				for _, m := range marks {
					codes = append(codes, counter(m, num(b), num(c)))
				}
				for _, code := range codes {
					roundTrip(t, code)
				}
			}
		}
	}
}

func roundTrip(t *testing.T, code Code) {
	t.Helper()
	if err := code.Validate(); err != nil {
		t.Fatalf("%#v: %v", code, err)
	}
	for _, s := range []string{code.String(), code.ASCII()} {
		back, err := ParseCode(s)
		if err != nil || back != code {
			t.Fatalf("ParseCode(%q) = %#v, %v; want %#v", s, back, err, code)
		}
	}
	text, err := code.MarshalText()
	if err != nil || string(text) != code.String() {
		t.Fatalf("MarshalText(%v) = %q, %v", code, text, err)
	}
	var back Code
	if err := back.UnmarshalText(text); err != nil || back != code {
		t.Fatalf("UnmarshalText(%q) = %v, %v", text, back, err)
	}
}

func TestCodeJSON(t *testing.T) {
	type sample struct {
		Tank   Code `json:"tank"`
		Target Code `json:"target"`
	}
	in := sample{counter(num(19), num(16), few(10)), micro(num(16), num(13))}
	data, err := json.Marshal(in)
	if err != nil {
		t.Fatal(err)
	}
	if want := `{"tank":"19/16/≥10","target":"16/13"}`; string(data) != want {
		t.Errorf("json = %s, want %s", data, want)
	}
	var out sample
	if err := json.Unmarshal(data, &out); err != nil || out != in {
		t.Errorf("json round trip = %v, %v; want %v", out, err, in)
	}
	err = json.Unmarshal([]byte(`{"tank":"19/21/10"}`), &out)
	if !errors.Is(err, ErrOrder) || !strings.Contains(err.Error(), "Code.UnmarshalText") {
		t.Errorf("json bad code: err = %v", err)
	}
	keep := out
	if err := out.Tank.UnmarshalText([]byte("nonsense")); err == nil || out != keep {
		t.Errorf("UnmarshalText changed the code on error: %v", out)
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

func BenchmarkParseCode(b *testing.B) {
	b.ReportAllocs()
	var sink Code
	for b.Loop() {
		sink, _ = ParseCode("14/12/≥7")
	}
	_ = sink
}

func BenchmarkCodeAppendText(b *testing.B) {
	b.ReportAllocs()
	code := counter(num(19), num(16), few(10))
	var buf [32]byte
	for b.Loop() {
		_, _ = code.AppendText(buf[:0])
	}
}
