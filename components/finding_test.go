package components

import (
	"encoding/json"
	"errors"
	"fmt"
	"slices"
	"testing"

	"github.com/google/go-cmp/cmp"
	"github.com/hydrosize/hydrosize/units"
)

func TestFindingText(t *testing.T) {
	f := NewFinding(Warning, Cavitation, "pump.inlet", StandardRule("ISO 4413:2010"),
		"the inlet sees %v against a minimum of %v", units.AbsolutePressure(72000), units.AbsolutePressure(80000))
	// 72 000 Pa = 0.72 bar = 10.44 psi (psi = 6894.757 Pa, NIST SP 811).
	metric, us := units.Metric(), units.USCustomary()
	if got, want := f.Text(metric), "the inlet sees 0.72 bara against a minimum of 0.8 bara"; got != want {
		t.Errorf("metric text = %q; want %q", got, want)
	}
	if got, want := f.Text(us), "the inlet sees 10.44 psia against a minimum of 11.6 psia"; got != want {
		t.Errorf("US text = %q; want %q", got, want)
	}
	if got, want := f.String(), "warning (cavitation): the inlet sees 0.72 bara against a minimum of 0.8 bara"; got != want {
		t.Errorf("String = %q; want %q", got, want)
	}
	if got := f.Text(units.Metric()); got != f.Text(metric) {
		t.Errorf("nil system = %q; want the metric text", got)
	}
}

func TestFindingArgsCopied(t *testing.T) {
	args := []any{units.Pressure(1e5)}
	f := NewFinding(Notice, NoHazard, "x", Rule{}, "%v", args...)
	args[0] = units.Pressure(2e5)
	a := f.Args()
	a[0] = units.Pressure(3e5)
	metric := units.Metric()
	if got := f.Text(metric); got != "1 bar" {
		t.Errorf("Text = %q after changing the caller's slices; want 1 bar", got)
	}
}

func TestFindingsMergeFilterSort(t *testing.T) {
	r := PracticeRule("test")
	a := NewFinding(Notice, NoHazard, "a", r, "note %v", 1.0)
	b := NewFinding(Danger, StoredEnergy, "b", r, "stored")
	c := NewFinding(Warning, Burst, "c", r, "burst")
	b2 := NewFinding(Danger, StoredEnergy, "b", r, "stored") // says what b says
	fs := Findings{a, b}.Merge(c, b2, a)
	if len(fs) != 3 {
		t.Fatalf("Merge kept %d findings; want 3 without duplicates: %v", len(fs), fs)
	}
	if got := fs.Hazard(Burst); len(got) != 1 || got[0].Topic != "c" {
		t.Errorf("Hazard(Burst) = %v", got)
	}
	if got := fs.AtLeast(Warning); len(got) != 2 {
		t.Errorf("AtLeast(Warning) = %v; want b and c", got)
	}
	if got := fs.Topic("a"); len(got) != 1 {
		t.Errorf("Topic(a) = %v", got)
	}
	var order []Severity
	for _, f := range fs.Sorted() {
		order = append(order, f.Severity)
	}
	if diff := cmp.Diff([]Severity{Danger, Warning, Notice}, order); diff != "" {
		t.Errorf("Sorted order (-want +got):\n%s", diff)
	}
	if w, ok := fs.Worst(); !ok || w != Danger {
		t.Errorf("Worst = %v, %v", w, ok)
	}
	if _, ok := Findings(nil).Worst(); ok {
		t.Error("Worst of no findings reported a severity")
	}
	if fs[0].Topic != "a" {
		t.Error("Sorted changed its receiver")
	}
}

func TestFindingJSON(t *testing.T) {
	f := NewFinding(Caution, HotSurface, "thermal.steady", PracticeRule("oil at most 60 °C at the pump inlet"),
		"the oil settles at %v", units.TemperatureFromCelsius(71))
	b, err := json.Marshal(f)
	if err != nil {
		t.Fatal(err)
	}
	want := `{"severity":"caution","hazard":"hot surface","topic":"thermal.steady","text":"the oil settles at 71 °C","rule":{"kind":"common practice","source":"oil at most 60 °C at the pump inlet"}}`
	if string(b) != want {
		t.Errorf("JSON =\n%s\nwant\n%s", b, want)
	}
	var back Finding
	if err := json.Unmarshal(b, &back); err != nil {
		t.Fatal(err)
	}
	if !back.same(f) {
		t.Errorf("round trip = %v; want %v", back, f)
	}
	pct := NewFinding(Notice, NoHazard, "x", Rule{}, "100 %% sure")
	b, _ = json.Marshal(pct)
	if err := json.Unmarshal(b, &back); err != nil || back.Text(units.Metric()) != "100 % sure" {
		t.Errorf("a literal percent sign did not survive: %q, %v", back.Text(units.Metric()), err)
	}
}

func TestNamesRoundTrip(t *testing.T) {
	for s := Notice; s <= Danger; s++ {
		roundTrip(t, s)
	}
	for h := NoHazard; int(h) < len(hazardNames); h++ {
		roundTrip(t, h)
	}
	for k := Unstated; int(k) < len(ruleKindNames); k++ {
		roundTrip(t, k)
	}
	roundTrip(t, AtMost)
	roundTrip(t, AtLeast)
	var s Severity
	err := s.UnmarshalText([]byte("DANGER!"))
	var pe *units.ParseError
	if !errors.As(err, &pe) || !errors.Is(err, units.ErrSyntax) || pe.Func != "components.Severity.UnmarshalText" {
		t.Errorf("bad severity error = %v", err)
	}
	if _, err := Severity(9).MarshalText(); !errors.Is(err, units.ErrRange) {
		t.Errorf("Severity(9).MarshalText error = %v; want ErrRange", err)
	}
	if Hazard(200).String() != "Hazard(200)" || Severity(9).String() != "Severity(9)" {
		t.Error("String of an unnamed value")
	}
}

func roundTrip[T interface {
	~uint8
	MarshalText() ([]byte, error)
}](t *testing.T, v T) {
	t.Helper()
	b, err := v.MarshalText()
	if err != nil {
		t.Fatalf("%v: %v", v, err)
	}
	var back T
	if err := any(&back).(interface{ UnmarshalText([]byte) error }).UnmarshalText(b); err != nil || back != v {
		t.Errorf("%q read back as %v, %v", b, back, err)
	}
}

func TestRuleString(t *testing.T) {
	for _, c := range []struct {
		r    Rule
		want string
	}{
		{StandardRule("ISO 3320:2013, Table 1"), "standard: ISO 3320:2013, Table 1"},
		{HandbookRule("a handbook"), "handbook: a handbook"},
		{PracticeRule("pump 25 % over flow"), "common practice: pump 25 % over flow"},
		{CallerRule("Spec.Margin"), "caller: Spec.Margin"},
		{OurRule("laminar below Re 2300"), "our choice: laminar below Re 2300"},
		{PhysicsRule("Pascal's law"), "physics: Pascal's law"},
		{Rule{}, "unstated"},
	} {
		if got := c.r.String(); got != c.want {
			t.Errorf("%#v.String() = %q; want %q", c.r, got, c.want)
		}
	}
}

// TestMergeSaysSameAsSentence: Merge drops a finding whose sentence reads
// the same as one before it even when it is built differently — values
// that round to the same text, a finding read back from JSON, a value ==
// cannot compare — and keeps findings whose sentences differ.
func TestMergeSaysSameAsSentence(t *testing.T) {
	r := PracticeRule("test")
	p := NewFinding(Caution, Overpressure, "p", r, "the line sees %v", units.Pressure(100.00001e5))
	close := NewFinding(Caution, Overpressure, "p", r, "the line sees %v", units.Pressure(100.00002e5)) // also "100 bar"
	other := NewFinding(Caution, Overpressure, "p", r, "the line sees %v", units.Pressure(120e5))
	b, err := json.Marshal(p)
	if err != nil {
		t.Fatal(err)
	}
	var decoded Finding
	if err := json.Unmarshal(b, &decoded); err != nil {
		t.Fatal(err)
	}
	press, ejector := other.About("press"), other.About("ejector") // open apart: kept without writing them
	list := NewFinding(Notice, NoHazard, "l", r, "sizes %v", []int{1, 2})
	list2 := NewFinding(Notice, NoHazard, "l", r, "sizes %v", []int{1, 2})
	fs := Findings{p}.Merge(close, decoded, other, list, list2, other, press, ejector, press)
	var got []string
	for _, f := range fs {
		got = append(got, f.Text(units.Metric()))
	}
	want := []string{"the line sees 100 bar", "the line sees 120 bar", "sizes [1 2]",
		"press: the line sees 120 bar", "ejector: the line sees 120 bar"}
	if diff := cmp.Diff(want, got); diff != "" {
		t.Errorf("Merge (-want +got):\n%s", diff)
	}
	for i, f := range []Finding{close, decoded} {
		if !p.same(f) || p.opensApart(f) {
			t.Errorf("finding %d does not say what p says: %q", i, f.Text(units.Metric()))
		}
	}
	if !press.opensApart(ejector) || !press.opensApart(other) || press.opensApart(press) {
		t.Error("opensApart does not tell the two subjects apart by their opening words")
	}
	if Findings(nil).Merge() != nil || Findings(nil).Merge(p).Merge() == nil {
		t.Error("Merge changed whether the list is nil")
	}
}

// BenchmarkMerge merges forty findings, ten of them said twice, the way a
// report gathers its families' findings.
func BenchmarkMerge(b *testing.B) {
	r := PracticeRule("test")
	var fs Findings
	for i := range 40 {
		fs = append(fs, NewFinding(Caution, Overpressure, "line.rating", r, "%v sees %v", "line", units.Pressure(i)*units.Bar))
	}
	fs = append(fs, fs[:10]...)
	b.ReportAllocs()
	for b.Loop() {
		_ = Findings(nil).Merge(fs...)
	}
}

// TestTextAsSprintf: a finding's sentence is what fmt.Sprintf writes with
// each value quoted, for formats of %v verbs and %% that Text writes
// itself and for the others (other verbs, too many or too few values, a
// lone % at the end) that it leaves to fmt.
func TestTextAsSprintf(t *testing.T) {
	p, q := units.Pressure(183.4e5), units.Flow(1.5e-3)
	for _, c := range []struct {
		format string
		args   []any
	}{
		{"", nil}, {"plain text", nil}, {"100 %% sure", nil}, {"%v", []any{p}},
		{"%v at %v, %v %% of %v: %v", []any{p, q, 42.125, "the pump", 7}},
		{"%v%v", []any{"a", "b"}}, {"ends in %v", []any{[]int{1, 2}}},
		{"%d items", []any{3}}, {"%5v wide", []any{p}}, {"%v and %v", []any{p}},
		{"%v", []any{p, q}}, {"lone %", nil}, {"lone % at %v", []any{p}},
	} {
		f := NewFinding(Notice, NoHazard, "t", Rule{}, c.format, c.args...)
		for _, sys := range []units.System{units.Metric(), units.USCustomary()} {
			quoted := make([]any, len(c.args))
			for i, a := range c.args {
				quoted[i] = quote(sys, a)
			}
			if got, want := f.Text(sys), fmt.Sprintf(c.format, quoted...); got != want {
				t.Errorf("%q in %s: Text = %q; want %q", c.format, sys.Name(), got, want)
			}
		}
	}
}

func BenchmarkFindingText(b *testing.B) {
	f := NewFinding(Caution, FilterBypass, "line.bypass", PracticeRule("test"),
		"%v would drop %v at this flow, above its bypass setting of %v: the bypass opens and unfiltered oil passes",
		"return filter", units.Pressure(6.925e5), units.Pressure(3e5))
	sys := units.Metric()
	b.ReportAllocs()
	for b.Loop() {
		_ = f.Text(sys)
	}
}

// TestSameIsSentenceEquality: for every pair of a set of findings built to
// trip the shortcuts — names that begin one another, values that round to
// one text, formats with other verbs, findings read back from JSON, a
// subject put before the sentence — same is true exactly when the heads
// match and the metric sentences read the same.
func TestSameIsSentenceEquality(t *testing.T) {
	r := PracticeRule("test")
	mk := func(format string, args ...any) Finding { return NewFinding(Caution, Burst, "t", r, format, args...) }
	fs := []Finding{
		mk("the flow through %v is laminar (Re %v)", "tank outlet", 1200.0),
		mk("the flow through %v is laminar (Re %v)", "suction line bends", 1200.0),
		mk("the flow through %v is laminar (Re %v)", "press", 1200.0),
		mk("the flow through %v is laminar (Re %v)", "press 2", 1200.0),
		mk("the flow through %v is laminar (Re %v)", "press", 1200.00001),
		mk("%v%v", "ab", "c"), mk("%v%v", "a", "bc"), mk("%v%v", "a", "b"),
		mk("%s at %v", "press", units.Pressure(1e7)), mk("%s at %v", "press", units.Pressure(1.00000001e7)),
		mk("press at %v", units.Pressure(1e7)), mk("press at 100 bar"),
		mk("100 %% sure"), mk("100 %% %v", "sure"),
		mk("the line sees %v", units.Pressure(100.00001e5)), mk("the line sees %v", units.Pressure(100.00002e5)),
		mk("the line sees %v", units.Pressure(120e5)).About("press"), mk("the line sees %v", units.Pressure(120e5)).About("ejector"),
		mk("sizes %v", []int{1, 2}), mk("sizes %v", []int{1, 2}), mk("sizes %v", []int{1, 3}),
	}
	for _, f := range slices.Clone(fs) {
		b, err := json.Marshal(f)
		if err != nil {
			t.Fatal(err)
		}
		var back Finding
		if err := json.Unmarshal(b, &back); err != nil {
			t.Fatal(err)
		}
		fs = append(fs, back)
	}
	metric := units.Metric()
	for i, f := range fs {
		for j, g := range fs {
			want := f.Text(metric) == g.Text(metric)
			if got := f.same(g); got != want {
				t.Errorf("same(%d %q, %d %q) = %v; want %v", i, f.Text(metric), j, g.Text(metric), got, want)
			}
		}
	}
	var merged []string
	for _, f := range Findings(nil).Merge(fs...) {
		merged = append(merged, f.Text(metric))
	}
	var want []string
	for _, f := range fs {
		if !slices.Contains(want, f.Text(metric)) {
			want = append(want, f.Text(metric))
		}
	}
	if diff := cmp.Diff(want, merged); diff != "" {
		t.Errorf("Merge keeps (-want +got):\n%s", diff)
	}
}
