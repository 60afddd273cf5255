package main

import (
	"bytes"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/units"
)

func runMonitor(t *testing.T, stdin string, args ...string) string {
	t.Helper()
	var out bytes.Buffer
	if err := run(args, strings.NewReader(stdin), &out); err != nil {
		t.Fatalf("run %q: %v", args, err)
	}
	return out.String()
}

// lineOf returns the output line that starts with stamp.
func lineOf(t *testing.T, out, stamp string) string {
	t.Helper()
	for l := range strings.Lines(out) {
		if strings.HasPrefix(l, stamp) {
			return l
		}
	}
	t.Fatalf("no line for %q in:\n%s", stamp, out)
	return ""
}

// TestDemoShift checks the demo log's story line by line: codes from ISO
// 4406:2021 Table 1 (2900/720/70 per mL: 2500 < 2900 ≤ 5000 is 19, 640 <
// 720 ≤ 1300 is 17, 40 < 70 ≤ 80 is 13), and the alarms each part of the
// shift should raise.
func TestDemoShift(t *testing.T) {
	out := runMonitor(t, "")
	for _, c := range []struct{ stamp, want string }{
		{"2025-06-02 06:00", "19/17/13  -7 °C  ν 1113 mm²/s  Δp 3.62 bar (0.1497 bar at 40 °C)  ALARM: over target 18/16/13 at ≥4 µm(c) +1, ≥6 µm(c) +1; oil too cold: viscosity above the pump's 1000 mm²/s; filter in bypass"},
		{"2025-06-02 07:00", "18/16/13  24.5 °C  ν 102.6 mm²/s  Δp 1.25 bar (0.5603 bar at 40 °C)  watch: oil cool: viscosity above the optimum 36 mm²/s\n"},
		{"2025-06-02 08:00", "18/16/13  46 °C  ν 35.29 mm²/s  Δp 0.46 bar (0.5997 bar at 40 °C)  ok\n"},
		{"2025-06-02 10:00", "19/17/14  50.5 °C  ν 29.33 mm²/s  Δp 0.92 bar (1.443 bar at 40 °C)  ALARM: over target 18/16/13 at ≥4 µm(c) +1, ≥6 µm(c) +1, ≥14 µm(c) +1\n"},
		{"2025-06-02 12:00", "watch: filter loading: in 40 °C oil Δp would be 108 % of the 3.5 bar bypass setting\n"},
		{"2025-06-02 13:00", "watch: filter loading: Δp at 75 % of the 3.5 bar bypass setting\n"},
		{"2025-06-02 13:20", "ALARM: filter in bypass: Δp at or above the 3.5 bar setting, oil passes unfiltered\n"},
		{"2025-06-02 13:40", "ok\n"},
	} {
		if l := lineOf(t, out, c.stamp); !strings.Contains(l, c.want) {
			t.Errorf("line %q\nwant it to contain %q", l, c.want)
		}
	}
	if !strings.HasSuffix(out, "25 samples, 7 with an alarm, 0 not read\n") {
		t.Errorf("summary: %q", out[strings.LastIndexByte(out[:len(out)-1], '\n')+1:])
	}
}

// TestReferenceValues checks a line against outside sources: the worked
// ISO 4406 example (3000/500/7 per mL is 19/16/10, ISO 4406:2021), the
// ISO 3448 midpoint of VG 46 at 40 °C (46 mm²/s), and the laminar element
// scaling at the same temperature (the referred Δp is the measured one).
func TestReferenceValues(t *testing.T) {
	out := runMonitor(t, "s1, 3000, 500, 7, 40, 1.2\n", "-")
	want := "s1  19/16/10  40 °C  ν 46 mm²/s  Δp 1.2 bar (1.2 bar at 40 °C)  ALARM: over target 18/16/13 at ≥4 µm(c) +1; oil cool: viscosity above the optimum 36 mm²/s\n"
	if l := lineOf(t, out, "s1"); l != want {
		t.Errorf("got  %q\nwant %q", l, want)
	}
}

// TestViscosityThroughDataSheet feeds a fluid through two data-sheet
// points: 32 mm²/s at 40 °C and 5.4 mm²/s at 100 °C give 8.533 mm²/s at
// 80 °C by ASTM D341-20 (A = 9.53082, B = 3.74658; worked from the
// standard's equations), printed to four figures. At 80 °C the viscosity
// is 8.533/32 of the 40 °C one, so the referred Δp is Δp·32/8.533.
func TestViscosityThroughDataSheet(t *testing.T) {
	c, _, err := configure(nil)
	if err != nil {
		t.Fatal(err)
	}
	c.fluid, err = fluid.FromDataSheet(fluid.DataSheet{Class: fluid.HM, V40: 32 * units.Centistokes, V100: 5.4 * units.Centistokes, Density15: 870})
	if err != nil {
		t.Fatal(err)
	}
	m := newMonitor(c)
	out, err := m.line(nil, []byte("hot, 1000, 300, 30, 80, 0.4"))
	if err != nil {
		t.Fatal(err)
	}
	// 0.4 bar × 32 / 8.533 = 1.500 bar.
	want := "hot  17/15/12  80 °C  ν 8.533 mm²/s  Δp 0.4 bar (1.5 bar at 40 °C)  ALARM: oil too hot: viscosity below the pump's 10 mm²/s\n"
	if string(out) != want {
		t.Errorf("got  %q\nwant %q", out, want)
	}
}

// TestUSUnits reads °F and psi and prints in US customary units: 104 °F is
// 40 °C exactly, and 50 psi is 3.447 bar (psi = 6894.757 Pa, NIST SP 811).
func TestUSUnits(t *testing.T) {
	out := runMonitor(t, "stamp,ge4,ge6,ge14,oil,dp\nu1, 1500, 400, 50, 104, 50\n", "-temp", "°F", "-dp", "psi", "-units", "us", "-bypass", "50 psi", "-")
	want := "u1  18/16/13  104 °F  ν 46 cSt  Δp 50 psi (50 psi at 40 °C)  ALARM: oil cool: viscosity above the optimum 36 cSt; filter in bypass: Δp at or above the 50 psi setting, oil passes unfiltered\n"
	if l := lineOf(t, out, "u1"); l != want {
		t.Errorf("got  %q\nwant %q", l, want)
	}
}

func TestBadLines(t *testing.T) {
	in := "# a comment\nstamp,ge4,ge6,ge14,oil,dp\n\na, 1, 2\nb, 100, 50, x, 40, 1\nc, 100, 50, 10, 40, 1, 9\nd, 100, 200, 10, 40, 1\ne, 100, 50, 10, 40, 1\n"
	out := runMonitor(t, in, "-")
	for _, want := range []string{
		"line 4: cannot read: want 6 columns",
		`line 5: cannot read: column 4: strconv.ParseFloat: parsing "x": invalid syntax`,
		"line 6: cannot read: want 6 columns",
		"line 7: cannot read: contamination.CodeFromCounts",
		"e  14/13/10  40 °C",
		"1 samples, 0 with an alarm, 4 not read\n",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
}

// TestImpossibleValues: a temperature or Δp that cannot be (not a number,
// infinite, below absolute zero, a negative drop) is refused with its
// column, never printed as "NaN °C" or "+Inf bar".
func TestImpossibleValues(t *testing.T) {
	in := "a, 100, 50, 10, NaN, 0.5\nb, 100, 50, 10, 40, Inf\nc, 100, 50, 10, -300, 0.5\nd, 100, 50, 10, 40, -0.5\ne, 100, 50, 10, 40, 0.5\n"
	out := runMonitor(t, in, "-")
	for _, want := range []string{"line 1: cannot read: column 5", "line 2: cannot read: column 6", "line 3: cannot read: column 5",
		"line 4: cannot read: column 6", "1 samples, 0 with an alarm, 4 not read\n"} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q:\n%s", want, out)
		}
	}
	if strings.Contains(out, "NaN") || strings.Contains(out, "Inf") {
		t.Errorf("output quotes a number that is none:\n%s", out)
	}
}

func TestFile(t *testing.T) {
	path := filepath.Join(t.TempDir(), "log.csv")
	if err := os.WriteFile(path, []byte("f1, 1500, 400, 50, 50, 0.5\n"), 0o600); err != nil {
		t.Fatal(err)
	}
	if out := runMonitor(t, "", path); !strings.Contains(out, "f1  18/16/13  50 °C") {
		t.Errorf("output: %s", out)
	}
	var b bytes.Buffer
	if err := run([]string{filepath.Join(t.TempDir(), "none.csv")}, nil, &b); !errors.Is(err, os.ErrNotExist) {
		t.Errorf("missing file: err = %v", err)
	}
	if err := run([]string{"a", "b"}, nil, &b); err == nil {
		t.Error("two files: no error")
	}
}

// TestBadFlags: every bad flag is reported at once.
func TestBadFlags(t *testing.T) {
	var b bytes.Buffer
	err := run([]string{"-fluid", "HX VG 46", "-target", "17/15", "-bypass", "3.5", "-watch", "2", "-temp", "°Q", "-dp", "mm", "-units", "si"}, nil, &b)
	if err == nil {
		t.Fatal("no error")
	}
	for _, want := range []string{"-fluid HX VG 46", "-target 17/15", `parsing "3.5"`, "-watch 2", `"°Q"`, "mm", "-units si"} {
		if !strings.Contains(err.Error(), want) {
			t.Errorf("error lacks %q:\n%v", want, err)
		}
	}
	if !errors.Is(err, units.ErrSyntax) || !errors.Is(err, units.ErrDimension) {
		t.Errorf("error does not match the units sentinels: %v", err)
	}
}

func demoLines(t testing.TB) [][]byte {
	var lines [][]byte
	for l := range bytes.Lines(shift) {
		l = bytes.TrimSpace(l)
		if len(l) > 0 && l[0] != '#' && !bytes.HasPrefix(l, []byte("stamp")) {
			lines = append(lines, l)
		}
	}
	return lines
}

func demoMonitor(t testing.TB) *monitor {
	c, _, err := configure(nil)
	if err != nil {
		t.Fatal(err)
	}
	return newMonitor(c)
}

// TestLineAllocations: once a code has been seen, a line costs no
// allocation, alarms and all.
func TestLineAllocations(t *testing.T) {
	m := demoMonitor(t)
	lines := demoLines(t)
	out := make([]byte, 0, 512)
	for _, l := range lines { // first sight of each code
		if _, err := m.line(out[:0], l); err != nil {
			t.Fatal(err)
		}
	}
	i := 0
	allocs := testing.AllocsPerRun(200, func() {
		out, _ = m.line(out[:0], lines[i%len(lines)])
		i++
	})
	if allocs != 0 {
		t.Errorf("%v allocations per line, want 0", allocs)
	}
}

func BenchmarkLine(b *testing.B) {
	m := demoMonitor(b)
	lines := demoLines(b)
	out := make([]byte, 0, 512)
	b.ReportAllocs()
	i := 0
	for b.Loop() {
		out, _ = m.line(out[:0], lines[i%len(lines)])
		i++
	}
}

// FuzzLine: any line is judged or refused, never a panic, and a judged
// line ends in a newline, with no line break but those the stamp brings.
func FuzzLine(f *testing.F) {
	for _, l := range demoLines(f) {
		f.Add(l)
	}
	for _, s := range []string{"", ",,,,,", "a,1e400,1,1,1,1", "a,NaN,1,1,1,1", "a,1,1,1,-300,1", "a,1,1,1,40,-1", "a,-1,1,1,40,1", "a,1,1,1,1e9,1", "\n,1,0,0,0,0"} {
		f.Add([]byte(s))
	}
	m := demoMonitor(f)
	f.Fuzz(func(t *testing.T, line []byte) {
		out, err := m.line(nil, line)
		if err != nil {
			return
		}
		if bytes.Count(out, []byte{'\n'}) > 1+bytes.Count(line, []byte{'\n'}) || out[len(out)-1] != '\n' {
			t.Fatalf("%q gave %q", line, out)
		}
		if rest := out[len(stampOf(line)):]; bytes.Contains(rest, []byte("NaN")) || bytes.Contains(rest, []byte("Inf")) {
			t.Fatalf("%q gave %q: a number that is none", line, out)
		}
	})
}

// stampOf is a line's first column, as the monitor echoes it.
func stampOf(line []byte) []byte {
	if i := bytes.IndexByte(line, ','); i >= 0 {
		line = line[:i]
	}
	return bytes.TrimSpace(line)
}
