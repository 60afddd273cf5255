package contamination

import (
	"encoding/json"
	"errors"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// allNumbers is every number in normal form: plain and "≥" 0…28, ">28",
// "-" and "*".
func allNumbers() []Number {
	ns := []Number{{Mark: MarkNotMeasured}, {Mark: MarkTooMany}, {Scale: MaxScale, Mark: MarkAbove}}
	for s := range MaxScale + 1 {
		ns = append(ns, Number{Scale: s}, Number{Scale: s, Mark: MarkFewCounted})
	}
	return ns
}

// TestEveryCodeRoundTrips formats every valid code of both forms, with
// String, ASCII and MarshalText, and reads each back with ParseCode and
// UnmarshalText; every invalid combination must be refused by Validate and
// MarshalText alike.
func TestEveryCodeRoundTrips(t *testing.T) {
	ns := allNumbers()
	valid := 0
	check := func(c Code) {
		verr := c.Validate()
		text, merr := c.MarshalText()
		if (verr == nil) != (merr == nil) {
			t.Fatalf("%#v: Validate %v but MarshalText %v", c, verr, merr)
		}
		if verr != nil {
			if !errors.Is(merr, units.ErrRange) {
				t.Fatalf("%#v: MarshalText error %v does not match units.ErrRange", c, merr)
			}
			return
		}
		valid++
		for _, s := range []string{c.String(), c.ASCII(), string(text)} {
			back, err := ParseCode(s)
			if err != nil || back != c {
				t.Fatalf("ParseCode(%q) = %#v, %v; want %#v", s, back, err, c)
			}
			var u Code
			if err := u.UnmarshalText([]byte(s)); err != nil || u != c {
				t.Fatalf("UnmarshalText(%q) = %#v, %v; want %#v", s, u, err, c)
			}
		}
	}
	for _, a := range ns {
		for _, b := range ns {
			check(Code{Form: Microscope, N: [3]Number{a, b}})
			for _, c := range ns {
				check(Code{Form: Counter, N: [3]Number{a, b, c}})
			}
		}
	}
	// Counted by hand [X]: a measured number has weight w = 2 for ranks
	// 0…28 (plain or "≥") and 1 for ">28" and "*", so W = Σw = 60,
	// Σw² = 118, Σw³ = 234. Non-rising weighted sequences of k measured
	// numbers: k = 1 → W = 60; k = 2 → (W² + Σw²)/2 = 1859;
	// k = 3 → (W³ + 3W·Σw² + 2Σw³)/6 = 39618. With "-" on the other places:
	// counter 3·60 + 3·1859 + 39618 = 45375, microscope 2·60 + 1859 = 1979.
	if want := 45375 + 1979; valid != want {
		t.Errorf("%d valid codes round-tripped, want %d", valid, want)
	}
}

// TestZeroCode pins what the zero Code is: no code (a sample field left
// unset). It fails Validate and Compare, so it cannot pass a target, and it
// travels in JSON as "". The clean code 0/0/0 is a different, valid code.
func TestZeroCode(t *testing.T) {
	var z Code
	if !z.IsZero() || z.Form != NoForm || z.Len() != 0 {
		t.Fatalf("zero Code: IsZero %v, Form %v, Len %d", z.IsZero(), z.Form, z.Len())
	}
	if err := z.Validate(); !errors.Is(err, units.ErrRange) {
		t.Errorf("zero Code Validate: err = %v, want units.ErrRange", err)
	}
	clean, err := CodeFromCounts(0, 0, 0)
	if err != nil || clean.IsZero() || clean.String() != "0/0/0" {
		t.Errorf("CodeFromCounts(0, 0, 0) = %#v (%v), %v; want the valid code 0/0/0", clean, clean, err)
	}
	target, _ := ParseCode("16/14/11")
	if _, err := Compare(z, target); err == nil {
		t.Error("Compare accepted the zero Code as a sample: an unset sample would pass")
	}
	if s := z.String(); s != "" {
		t.Errorf("zero Code String() = %q, want \"\"", s)
	}
	type report struct {
		Sample Code  `json:"sample"`
		Target *Code `json:"target"`
	}
	data, err := json.Marshal(report{})
	if want := `{"sample":"","target":null}`; err != nil || string(data) != want {
		t.Errorf("json.Marshal(report{}) = %s, %v; want %s", data, err, want)
	}
	var r report
	if err := json.Unmarshal([]byte(`{"sample":"","target":null}`), &r); err != nil || !r.Sample.IsZero() || r.Target != nil {
		t.Errorf("json.Unmarshal of an empty sample = %+v, %v; want the zero Code", r, err)
	}
	if err := json.Unmarshal([]byte(`{"sample":"18/16/13","target":null}`), &r); err != nil || r.Target != nil || r.Sample.String() != "18/16/13" {
		t.Errorf("json.Unmarshal = %+v, %v", r, err)
	}
	// A hand-built invalid code does not marshal: json.Marshal fails.
	bad := report{Sample: Code{Form: Counter, N: [3]Number{{Scale: 40}}}}
	if _, err := json.Marshal(bad); !errors.Is(err, units.ErrRange) {
		t.Errorf("json.Marshal of an invalid code: err = %v, want units.ErrRange", err)
	}
}

// TestParseCodeReplacementChar: U+FFFD written correctly is valid UTF-8; it
// is refused as "want a scale number", and only broken bytes as invalid
// UTF-8.
func TestParseCodeReplacementChar(t *testing.T) {
	for _, c := range []struct{ in, detail string }{
		{"18/16/\uFFFD", "want a scale number"},
		{"18/16/\xff", "invalid UTF-8"},
	} {
		_, err := ParseCode(c.in)
		var pe *units.ParseError
		if !errors.As(err, &pe) || pe.Detail != c.detail || !errors.Is(err, units.ErrSyntax) {
			t.Errorf("ParseCode(%q): err = %v; want detail %q", c.in, err, c.detail)
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

// TestCodeTextRefusesInvalid checks that AppendText and MarshalText refuse a
// code that fails Validate with the zero value beside the error, a range
// error naming the method called and the field.
func TestCodeTextRefusesInvalid(t *testing.T) {
	bad := counter(num(16), num(18), num(13)) // grows with size
	buf := []byte("tank: ")
	b, err := bad.AppendText(buf)
	if b != nil {
		t.Errorf("AppendText returned %q beside its error, want nil", b)
	}
	checktest.RangeErrorIn(t, err, "contamination.Code.AppendText", "N[1]")
	b, err = bad.MarshalText()
	if b != nil {
		t.Errorf("MarshalText returned %q beside its error, want nil", b)
	}
	checktest.RangeErrorIn(t, err, "contamination.Code.MarshalText", "N[1]")
	if !errors.Is(err, ErrOrder) {
		t.Errorf("MarshalText error %v does not match ErrOrder", err)
	}
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

var fuzzSeeds = []string{
	"18/16/13", "-/16/13", "14/12/≥7", "14/12/>=7", ">28/26/20", "*/>28/28",
	"16/13", " 18 / 16 /13 ", "13/16/18", "29/1/1", "", "/", "≥", ">", "18/16/\xff",
	"18//13", "18/16/13/", "≥≥7", "１８/16/13", "18／16/13", "18/16/⩾7", "18/16/\uFFFD",
}

// checkParsed holds for any input: an error is a *units.ParseError matching a
// documented sentinel; a code passes Validate and reads back from String and
// ASCII.
func checkParsed(t *testing.T, s string, c Code, err error) {
	if err != nil {
		var pe *units.ParseError
		if !errors.As(err, &pe) || pe.Pos < 0 || pe.Pos > len(s) {
			t.Fatalf("%q: error %v is not a *units.ParseError within the input", s, err)
		}
		if !errors.Is(err, units.ErrSyntax) && !errors.Is(err, units.ErrRange) {
			t.Fatalf("%q: error %v matches no sentinel", s, err)
		}
		return
	}
	if verr := c.Validate(); verr != nil {
		t.Fatalf("%q parsed to invalid %#v: %v", s, c, verr)
	}
	for _, out := range []string{c.String(), c.ASCII()} {
		back, err := ParseCode(out)
		if err != nil || back != c {
			t.Fatalf("%q → %#v → %q → %#v, %v", s, c, out, back, err)
		}
	}
}

func FuzzParseCode(f *testing.F) {
	for _, s := range fuzzSeeds {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		c, err := ParseCode(s)
		checkParsed(t, s, c, err)
	})
}

func FuzzCodeUnmarshalText(f *testing.F) {
	for _, s := range fuzzSeeds {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, b []byte) {
		var c Code
		err := c.UnmarshalText(b)
		if len(b) == 0 {
			// "" is the zero Code (no code), and it marshals back to "".
			text, merr := c.MarshalText()
			if err != nil || !c.IsZero() || merr != nil || len(text) != 0 {
				t.Fatalf(`UnmarshalText("") = %#v, %v; MarshalText = %q, %v`, c, err, text, merr)
			}
			return
		}
		checkParsed(t, string(b), c, err)
		if err == nil {
			text, merr := c.MarshalText()
			if merr != nil || string(text) != c.String() {
				t.Fatalf("MarshalText(%v) = %q, %v", c, text, merr)
			}
		}
	})
}

// TestPlainCodeAgrees: ParseCode's fast path reads what the general parser
// reads, for every code of plain and "≥" numbers up to 29 and many others,
// and leaves the rest to it.
func TestPlainCodeAgrees(t *testing.T) {
	nums := []string{"0", "7", "13", "28", "29", "≥7", "≥28", "07", "-", "*", ">28", "123", "", "≥", " 5"}
	var ins []string
	for _, a := range nums {
		for _, b := range nums {
			ins = append(ins, a+"/"+b)
			for _, c := range nums {
				ins = append(ins, a+"/"+b+"/"+c)
			}
		}
	}
	ins = append(ins, "18/16/13/5", "18/16/", "/16/13", "18//13", "18 /16/13", "18/16/13 ", "1/2/3")
	for _, in := range ins {
		slow, slowErr := parseCode("ParseCode", in)
		var fast Code
		ok := plainCode(&fast, in)
		if !ok {
			continue
		}
		if slowErr != nil || fast != slow {
			t.Errorf("plainCode(%q) = %v; parseCode gives %v, %v", in, fast, slow, slowErr)
		}
	}
	if !plainCode(new(Code), "14/12/≥7") {
		t.Error(`plainCode("14/12/≥7") left a plain code to the general path`)
	}
}
