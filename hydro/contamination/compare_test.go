package contamination

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

func mustParse(t *testing.T, s string) Code {
	t.Helper()
	c, err := ParseCode(s)
	if err != nil {
		t.Fatal(err)
	}
	return c
}

func TestCompare(t *testing.T) {
	type size struct {
		status             Status
		classes            int
		factor, boundRatio float64
		atLeast, unsure    bool
	}
	cases := []struct {
		sample, target string
		meets          bool
		worst          int
		sizes          []size
	}{
		// Bound ratios from ISO 4406:2021, Table 1 [S]: 5000/640, 640/320,
		// 10/20. Factors are 2^classes, exact.
		{"19/16/10", "16/15/11", false, 3, []size{
			{Over, 3, 8, 5000.0 / 640, false, false},
			{Over, 1, 2, 2, false, false},
			{Meets, -1, 0.5, 0.5, false, false},
		}},
		{"16/14/11", "16/14/11", true, 0, []size{
			{Meets, 0, 1, 1, false, false},
			{Meets, 0, 1, 1, false, false},
			{Meets, 0, 1, 1, false, false},
		}},
		// ≥ numbers: compared by number, flagged uncertain.
		{"14/12/≥7", "16/14/11", true, -2, []size{
			{Meets, -2, 0.25, 160.0 / 640, false, false},
			{Meets, -2, 0.25, 40.0 / 160, false, false},
			{Meets, -4, 0.0625, 1.3 / 20, false, true},
		}},
		// Not measured on either side: not compared.
		{"-/16/13", "18/-/14", true, -1, []size{
			{NotCompared, 0, 0, 0, false, false},
			{NotCompared, 0, 0, 0, false, false},
			{Meets, -1, 0.5, 0.5, false, false},
		}},
		// Above the table: at least 29 − 20 = 9 classes over.
		{">28/26/20", "20/18/15", false, 9, []size{
			{Over, 9, 512, 2.5e6 / 10000, true, false},
			{Over, 8, 256, 640000.0 / 2500, false, false},
			{Over, 5, 32, 10000.0 / 320, false, false},
		}},
		{"*/*/27", "20/18/15", false, 12, []size{
			{Over, 9, 512, 2.5e6 / 10000, true, false},
			{Over, 11, 2048, 2.5e6 / 2500, true, false},
			{Over, 12, 4096, 1.3e6 / 320, false, false},
		}},
		// Microscope codes.
		{"16/13", "17/12", false, 1, []size{
			{Meets, -1, 0.5, 640.0 / 1300, false, false},
			{Over, 1, 2, 80.0 / 40, false, false},
		}},
	}
	for _, c := range cases {
		r, err := Compare(mustParse(t, c.sample), mustParse(t, c.target))
		if err != nil {
			t.Fatalf("%s vs %s: %v", c.sample, c.target, err)
		}
		if r.Meets != c.meets || r.Worst != c.worst || r.Form.Len() != len(c.sizes) {
			t.Errorf("%s vs %s: meets %v worst %d; want %v, %d", c.sample, c.target, r.Meets, r.Worst, c.meets, c.worst)
		}
		for i, w := range c.sizes {
			g := r.Sizes[i]
			// The check's ratio is the ratio of the table bounds, and its
			// verdict agrees with the status.
			if g.Status != w.status || g.Classes != w.classes || g.Factor != w.factor ||
				math.Abs(g.Check.Ratio()-w.boundRatio) > 1e-15*w.boundRatio || g.AtLeast != w.atLeast || g.Uncertain != w.unsure ||
				(g.Status != NotCompared && g.Check.OK() != (g.Status == Meets)) {
				t.Errorf("%s vs %s size %s: got %+v; want %+v", c.sample, c.target, g.Size, g, w)
			}
		}
	}
}

func TestCompareNothingInCommon(t *testing.T) {
	r, err := Compare(mustParse(t, "-/-/13"), mustParse(t, "18/16/-"))
	if err != nil || r.Meets || r.Compared != 0 {
		t.Errorf("nothing in common: %+v, %v; want not met, 0 compared", r, err)
	}
}

// Every bad comparison names sample or target and the field, and matches
// units.ErrRange and the sentinel that says more.
func TestCompareBadInput(t *testing.T) {
	ok := counter(num(18), num(16), num(13))
	cases := []struct {
		name, param    string
		sample, target Code
		err            error
	}{
		{"forms differ", "target", ok, micro(num(16), num(13)), ErrForm},
		{"target with ≥", "target.N[2]", ok, counter(num(18), num(16), few(13)), units.ErrRange},
		{"target >28", "target.N[0]", ok, counter(above28, num(16), num(13)), units.ErrRange},
		{"bad sample", "sample.N[1]", counter(num(18), num(19), num(13)), ok, ErrOrder},
		{"bad target", "target.N[0]", ok, counter(num(40), num(16), num(13)), units.ErrRange},
		{"zero sample", "sample.Form", Code{}, ok, units.ErrRange},
		{"zero target", "target.Form", ok, Code{}, units.ErrRange},
	}
	for _, c := range cases {
		r, err := Compare(c.sample, c.target)
		if !errors.Is(err, c.err) {
			t.Errorf("%s: err = %v, want %v", c.name, err, c.err)
		}
		wantRangeError(t, err, c.param)
		if r.Compared != 0 || r.Findings != nil || r.Form != NoForm {
			t.Errorf("%s: %+v with an error, want the zero Comparison", c.name, r)
		}
	}
}

// A size over the target is a caution about contamination that quotes the
// numbers; a "≥" number that meets the target is a notice; a clean sample
// has no findings.
func TestCompareFindings(t *testing.T) {
	cases := []struct {
		sample, target string
		topics         []string // in size order
	}{
		{"16/14/11", "16/14/11", nil},
		{"19/16/10", "16/15/11", []string{TopicOverTarget, TopicOverTarget}},
		{"14/12/≥7", "16/14/11", []string{TopicFewCounted}},
		{">28/26/20", "20/18/15", []string{TopicOverTarget, TopicOverTarget, TopicOverTarget}},
		{"-/16/13", "18/-/14", nil},
	}
	for _, c := range cases {
		r, err := Compare(mustParse(t, c.sample), mustParse(t, c.target))
		if err != nil {
			t.Fatal(err)
		}
		if len(r.Findings) != len(c.topics) {
			t.Errorf("%s vs %s: findings %v, want topics %v", c.sample, c.target, r.Findings, c.topics)
			continue
		}
		for i, f := range r.Findings {
			sev := components.Caution
			if c.topics[i] == TopicFewCounted {
				sev = components.Notice
			}
			if f.Topic != c.topics[i] || f.Severity != sev || f.Hazard != components.Contamination || f.Rule.Kind == components.Unstated {
				t.Errorf("%s vs %s: finding %d = %v (%s, %v), want %s, %v", c.sample, c.target, i, f, f.Topic, f.Rule, c.topics[i], sev)
			}
		}
	}
	// The over-target finding quotes the size, the numbers and the nominal
	// factor as values.
	r, _ := Compare(mustParse(t, "19/16/10"), mustParse(t, "16/15/11"))
	args := r.Findings[0].Args()
	if len(args) != 4 || args[0] != "≥4 µm(c)" || args[1] != num(19) || args[2] != num(16) || args[3] != 8.0 {
		t.Errorf("finding quotes %v", args)
	}
}

func TestCodeRange(t *testing.T) {
	c := mustParse(t, ">28/≥16/10")
	cases := []struct {
		i         int
		above, to float64
	}{
		{0, 2.5e6, math.MaxFloat64}, // ">28": no upper bound
		{1, 320, 640},               // ISO 4406:2021, Table 1 [S]
		{2, 5, 10},
	}
	for _, w := range cases {
		a, b, err := c.Range(w.i)
		if err != nil || a != w.above || b != w.to {
			t.Errorf("Range(%d) = %g, %g, %v; want %g, %g", w.i, a, b, err, w.above, w.to)
		}
	}
	// Bad input: no range for "-" or "*", index out of the form.
	bad := []struct {
		c Code
		i int
	}{
		{c, 3}, {c, -1}, {micro(num(5), num(3)), 2},
		{mustParse(t, "-/16/13"), 0}, {mustParse(t, "*/16/13"), 0},
		{counter(num(40), num(1), num(1)), 0},
	}
	for _, b := range bad {
		if _, _, err := b.c.Range(b.i); !errors.Is(err, units.ErrRange) {
			t.Errorf("%v.Range(%d): err = %v, want ErrRange", b.c, b.i, err)
		}
	}
}

func TestStatusString(t *testing.T) {
	if Meets.String() != "meets" || Over.String() != "over" || NotCompared.String() != "not compared" || Status(9).String() != "Status(9)" {
		t.Error("Status.String")
	}
}

func BenchmarkCompare(b *testing.B) {
	b.ReportAllocs()
	s, _ := ParseCode("19/16/≥10")
	tg, _ := ParseCode("17/15/12")
	for b.Loop() {
		_, _ = Compare(s, tg)
	}
}

// A sample that meets its target has nothing to report, and Compare then
// allocates nothing (a monitoring loop compares a reading every few
// seconds).
func TestCompareAllocs(t *testing.T) {
	s, _ := ParseCode("16/14/10")
	tg, _ := ParseCode("17/15/12")
	if a := testing.AllocsPerRun(100, func() { _, _ = Compare(s, tg) }); a != 0 {
		t.Errorf("Compare allocates %v times, want 0", a)
	}
}

// TestZeroCodeRangeError: the zero Code has no numbers; the error says so
// instead of asking for an index "from 0 to -1".
func TestZeroCodeRangeError(t *testing.T) {
	_, _, err := Code{}.Range(0)
	if !errors.Is(err, units.ErrRange) || strings.Contains(err.Error(), "-1") || !strings.Contains(err.Error(), "zero Code") {
		t.Errorf("Code{}.Range(0): err = %v; want an error naming the zero Code", err)
	}
}
