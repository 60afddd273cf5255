package components

import (
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func TestHoseSizes(t *testing.T) {
	const in = units.Inch
	// SAE J517: dash number = inside diameter in sixteenths of an inch
	// (-4 = ¼ in, -16 = 1 in); the list of dash sizes from memory.
	want := []struct {
		dash HoseSize
		id   units.Length
	}{
		{3, 0.1875 * in}, {4, 0.25 * in}, {5, 0.3125 * in}, {6, 0.375 * in}, {8, 0.5 * in},
		{10, 0.625 * in}, {12, 0.75 * in}, {16, 1 * in}, {20, 1.25 * in}, {24, 1.5 * in},
		{32, 2 * in}, {40, 2.5 * in}, {48, 3 * in}, {56, 3.5 * in}, {64, 4 * in},
	}
	s := HoseSizes()
	if s.Len() != len(want) {
		t.Fatalf("HoseSizes has %d sizes; want %d", s.Len(), len(want))
	}
	for i, w := range want {
		got, pref := s.At(i)
		// n/16 in at run time against the constant: 2 ulp (the inch is exact
		// by definition, NIST SP 811; only the float product rounds).
		if !checktest.Close(float64(got), float64(w.id), 4.5e-16) || !pref {
			t.Errorf("size %d = %v (preferred %v); want %v", i, got, pref, w.id)
		}
		if id := w.dash.ID(); id != got {
			t.Errorf("%v.ID() = %v; series has %v", w.dash, id, got)
		}
		if h, ok := HoseSizeOf(got); !ok || h != w.dash {
			t.Errorf("HoseSizeOf(%v) = %v, %v; want %v", got, h, ok, w.dash)
		}
	}
	if _, ok := HoseSizeOf(0.3 * in); ok {
		t.Error("HoseSizeOf(0.3 in) found a size")
	}
	// -8 hose: ½ in = 12.7 mm exactly.
	if got := HoseSize(8).ID().Millimetres(); got != 12.7 {
		t.Errorf("-8 ID = %v mm; want 12.7", got)
	}
}

func TestParseHoseSize(t *testing.T) {
	for _, c := range []struct {
		in   string
		want HoseSize
	}{
		// The trade's spellings.
		{"-8", 8}, {"8", 8}, {"#8", 8}, {"−8", 8}, {"-08", 8}, {"dash 8", 8}, {"DASH-8", 8},
		{"Dash  -12", 12}, {"dash8", 8},
		// Spaces around.
		{"  -16 ", 16}, {"\t#4", 4},
		// Every end of the list.
		{"-3", 3}, {"-64", 64}, {"-5", 5}, {"048", 48},
	} {
		got, err := ParseHoseSize(c.in)
		if err != nil || got != c.want {
			t.Errorf("ParseHoseSize(%q) = %v, %v; want %v", c.in, got, err, c.want)
		}
	}
}

func TestParseHoseSizeBad(t *testing.T) {
	for _, c := range []struct {
		in   string
		want error
		pos  int
	}{
		// Not a dash number.
		{"", units.ErrSyntax, 0},
		{"   ", units.ErrSyntax, 3},
		{"-", units.ErrSyntax, 1},
		{"dash", units.ErrSyntax, 4},
		{"+8", units.ErrSyntax, 0},
		{"-8.0", units.ErrSyntax, 2},
		{"-8 in", units.ErrSyntax, 2},
		{"1/2", units.ErrSyntax, 1},
		{"--8", units.ErrSyntax, 1},
		{"-1000", units.ErrSyntax, 1},
		{"½", units.ErrSyntax, 0},
		// A number that is not a dash size.
		{"-7", units.ErrRange, 1},
		{"0", units.ErrRange, 0},
		{"-000", units.ErrRange, 1},
		{"-65", units.ErrRange, 1},
		{"-999", units.ErrRange, 1},
	} {
		got, err := ParseHoseSize(c.in)
		var pe *units.ParseError
		if got != 0 || !errors.As(err, &pe) || !errors.Is(err, c.want) {
			t.Errorf("ParseHoseSize(%q) = %v, %v; want 0 and %v", c.in, got, err, c.want)
			continue
		}
		if pe.Input != c.in || pe.Pos != c.pos || pe.Func != "components.ParseHoseSize" {
			t.Errorf("ParseHoseSize(%q) error %+v; want input quoted, offset %d", c.in, pe, c.pos)
		}
	}
}

func TestHoseSizeText(t *testing.T) {
	for _, h := range hoseDashes {
		b, err := h.MarshalText()
		if err != nil {
			t.Fatal(err)
		}
		var back HoseSize
		if err := back.UnmarshalText(b); err != nil || back != h {
			t.Errorf("%v: text %q read back as %v, %v", h, b, back, err)
		}
	}
	if HoseSize(12).String() != "-12" {
		t.Errorf("String = %q", HoseSize(12).String())
	}
	var h HoseSize
	if err := h.UnmarshalText([]byte("-7")); !errors.Is(err, units.ErrRange) || h != 0 {
		t.Errorf("UnmarshalText(-7) = %v, %v", h, err)
	}
}

// TestHoseSizeMarshalRefusesWhatUnmarshalRefuses checks every HoseSize value:
// MarshalText writes a dash size only for an SAE J517 size, which
// UnmarshalText reads back, and refuses every other value with a range
// error, so that json.Marshal never writes a hose size it cannot read.
func TestHoseSizeMarshalRefusesWhatUnmarshalRefuses(t *testing.T) {
	for i := range 256 {
		h := HoseSize(i)
		b, err := h.MarshalText()
		if _, listed := HoseSizeOf(h.ID()); listed {
			var back HoseSize
			if err != nil || back.UnmarshalText(b) != nil || back != h {
				t.Errorf("%v: MarshalText = %q, %v; want text that reads back", h, b, err)
			}
			continue
		}
		if b != nil {
			t.Errorf("HoseSize(%d).MarshalText wrote %q beside its error", i, b)
		}
		checktest.RangeErrorIn(t, err, "components.HoseSize.MarshalText", "h")
	}
}

func TestParseHoseSizeAllocs(t *testing.T) {
	if n := testing.AllocsPerRun(100, func() { _, _ = ParseHoseSize("dash -12") }); n != 0 {
		t.Errorf("ParseHoseSize allocates %v times; want 0", n)
	}
}

func FuzzParseHoseSize(f *testing.F) {
	for _, s := range []string{"-8", "8", "#8", "−8", "-08", "dash 8", "DASH-8", "", "-", "-7", "-999", "-8 in", "\xff"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		h, err := ParseHoseSize(s)
		if err != nil {
			var pe *units.ParseError
			if h != 0 || !errors.As(err, &pe) || pe.Input != s || pe.Pos < 0 || pe.Pos > len(s) ||
				!(errors.Is(err, units.ErrSyntax) || errors.Is(err, units.ErrRange)) {
				t.Fatalf("ParseHoseSize(%q) = %v, %v", s, h, err)
			}
			return
		}
		if _, ok := HoseSizeOf(h.ID()); !ok {
			t.Fatalf("ParseHoseSize(%q) = %v, not a listed size", s, h)
		}
		if back, err := ParseHoseSize(h.String()); err != nil || back != h {
			t.Fatalf("%v: String %q reads back as %v, %v", h, h.String(), back, err)
		}
	})
}

func BenchmarkParseHoseSize(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		_, _ = ParseHoseSize("dash -12")
	}
}
