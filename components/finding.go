package components

import (
	"cmp"
	"encoding/json"
	"fmt"
	"reflect"
	"slices"
	"strings"

	"github.com/hydrosize/hydrosize/internal/enum"
	"github.com/hydrosize/hydrosize/units"
)

// Severity is the signal word of a finding, in rising order of consequence,
// after ANSI Z535.4 and ISO 3864-2: [Notice] (a design note, no hazard to
// people), [Caution] (minor or moderate injury, or damage, could result),
// [Warning] (death or serious injury could result), [Danger] (death or
// serious injury will result if not avoided).
type Severity uint8

// Severities, least severe first; the order is the order of consequence.
const (
	Notice Severity = iota
	Caution
	Warning
	Danger
)

var severityNames = [...]string{"notice", "caution", "warning", "danger"}

// String returns the signal word in lower case: "danger".
func (s Severity) String() string {
	if int(s) < len(severityNames) {
		return severityNames[s]
	}
	return fmt.Sprintf("Severity(%d)", uint8(s))
}

// MarshalText writes the signal word.
func (s Severity) MarshalText() ([]byte, error) {
	return enum.Marshal("components.Severity.MarshalText", s, severityNames[:])
}

// UnmarshalText reads a signal word written by MarshalText.
func (s *Severity) UnmarshalText(b []byte) error {
	return enum.Unmarshal("components.Severity.UnmarshalText", b, s, severityNames[:])
}

// Hazard is the kind of harm a finding is about; [NoHazard] marks a design
// note.
type Hazard uint8

// Hazard kinds.
const (
	NoHazard        Hazard = iota // a design note: sizing, cost, life, efficiency
	StoredEnergy                  // accumulators, trapped pressure, springs
	SuspendedLoad                 // a load that falls if pressure is lost
	OverrunningLoad               // a load that drives the actuator
	Burst                         // hose, tube, fitting or housing rupture
	HotSurface                    // hot oil and hot surfaces
	Injection                     // fluid injection through the skin from a leak
	Cavitation                    // pump inlet or actuator below vapour or air release pressure
	FilterBypass                  // unfiltered flow past a filter element
	Overpressure                  // pressure above a component's rating
	Runaway                       // uncontrolled speed of an actuator or load
	Contamination                 // particles or water beyond what a component tolerates
	ColdStart                     // sluggish or damaging flow in cold oil
	Structural                    // a part that can buckle, break or tear loose: a rod, a mount, a tie
)

var hazardNames = [...]string{
	"none", "stored energy", "suspended load", "overrunning load", "burst", "hot surface",
	"injection", "cavitation", "filter bypass", "overpressure", "runaway", "contamination", "cold start",
	"structural failure",
}

// String returns the hazard's name in words: "stored energy".
func (h Hazard) String() string {
	if int(h) < len(hazardNames) {
		return hazardNames[h]
	}
	return fmt.Sprintf("Hazard(%d)", uint8(h))
}

// MarshalText writes the hazard's name.
func (h Hazard) MarshalText() ([]byte, error) {
	return enum.Marshal("components.Hazard.MarshalText", h, hazardNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (h *Hazard) UnmarshalText(b []byte) error {
	return enum.Unmarshal("components.Hazard.UnmarshalText", b, h, hazardNames[:])
}

// Finding is one statement for the reader of a result: how serious, about
// what hazard, under a stable topic key a program can switch on
// ("fluid.cold-margin"), one plain sentence, and the rule behind it.
//
// The sentence is a format with one %v verb per quoted value; the values
// are typed quantities (units.Pressure, units.Flow, …), plain numbers or
// strings, and [Finding.Text] writes each quantity in the unit system asked
// for, so a finding reads the same in bar and in psi. Build findings with
// [NewFinding]; the zero Finding is an empty notice.
type Finding struct {
	Severity Severity
	Hazard   Hazard
	Topic    string // stable key, "pkg.what": safe to switch on
	Rule     Rule
	format   string
	args     []any
}

// NewFinding returns a finding whose sentence is format with args quoted in
// it. Only the %v verb is meant; args are typed quantities, numbers or
// strings. The args slice is copied.
func NewFinding(sev Severity, hz Hazard, topic string, rule Rule, format string, args ...any) Finding {
	return Finding{Severity: sev, Hazard: hz, Topic: topic, Rule: rule, format: format, args: slices.Clone(args)}
}

// Args returns a copy of the values the sentence quotes, in order.
func (f Finding) Args() []any { return slices.Clone(f.args) }

// Text writes the sentence with every quantity in the units of sys
// (units.Metric(), units.USCustomary(), or a caller's own system); the zero
// System is metric.
func (f Finding) Text(sys units.System) string {
	if b, ok := f.appendPlain(make([]byte, 0, len(f.format)+16*len(f.args)), sys); ok {
		return string(b)
	}
	out := make([]any, len(f.args))
	for i, a := range f.args {
		out[i] = quote(sys, a)
	}
	return fmt.Sprintf(f.format, out...)
}

// appendPlain appends the sentence to b when its format has only %v verbs,
// one per value, and %% (as a finding's format is meant to), writing what
// fmt.Sprintf would: the text, each %v replaced by its quoted value and %%
// by %. For any other format it returns false and Text leaves it to fmt.
func (f Finding) appendPlain(b []byte, sys units.System) ([]byte, bool) {
	next, format := 0, f.format
	for {
		i := strings.IndexByte(format, '%')
		if i < 0 || i+1 == len(format) {
			if i >= 0 || next != len(f.args) {
				return nil, false // a lone % at the end, or values left over
			}
			return append(b, format...), true
		}
		b = append(b, format[:i]...)
		switch format[i+1] {
		case '%':
			b = append(b, '%')
		case 'v':
			if next == len(f.args) {
				return nil, false // more verbs than values
			}
			b = appendQuote(b, sys, f.args[next])
			next++
		default:
			return nil, false
		}
		format = format[i+2:]
	}
}

// String returns the severity, the hazard when there is one, and the
// sentence in metric units: "warning (cavitation): …".
func (f Finding) String() string {
	head := f.Severity.String()
	if f.Hazard != NoHazard {
		head += " (" + f.Hazard.String() + ")"
	}
	return head + ": " + f.Text(metric())
}

// opensApart reports whether two findings' sentences differ in their
// opening words: the text of each format before its first verb, which
// every rendering begins with. When it is true the sentences differ in any
// unit system; when it is false they may or may not.
func (f Finding) opensApart(g Finding) bool {
	a, b := f.format, g.format
	if i := strings.IndexByte(a, '%'); i >= 0 {
		a = a[:i]
	}
	if i := strings.IndexByte(b, '%'); i >= 0 {
		b = b[:i]
	}
	n := min(len(a), len(b))
	return a[:n] != b[:n]
}

// byValues compares two findings of one format by their values, without
// writing the sentences: same when every value is the same (then so are
// the sentences); apart when the first value that differs is a string in
// both (a part's name, most often) and neither string begins the other,
// in a format of %v verbs and %% (the sentences agree up to that value and
// differ in it). When neither is true the sentences must be written to
// tell.
func (f Finding) byValues(g Finding) (apart, same bool) {
	if f.format != g.format || len(f.args) != len(g.args) {
		return false, false
	}
	for i, a := range f.args {
		b := g.args[i]
		if sameValue(a, b) {
			continue
		}
		p, ok := a.(string)
		q, ok2 := b.(string)
		if !ok || !ok2 || !plainFormat(f.format, len(f.args)) {
			return false, false
		}
		n := min(len(p), len(q))
		return p[:n] != q[:n], false
	}
	return false, true
}

// sameValue reports whether a and b are the same value of a type that ==
// compares (and so are written the same).
func sameValue(a, b any) bool {
	t := reflect.TypeOf(a)
	return t == reflect.TypeOf(b) && (t == nil || t.Comparable()) && a == b
}

// plainFormat reports whether format has only %v verbs, n of them, and %%.
func plainFormat(format string, n int) bool {
	for {
		i := strings.IndexByte(format, '%')
		if i < 0 {
			return n == 0
		}
		if i+1 == len(format) {
			return false
		}
		switch format[i+1] {
		case '%':
		case 'v':
			n--
		default:
			return false
		}
		format = format[i+2:]
	}
}

// same reports whether two findings say the same thing: same severity,
// hazard, topic, rule and sentence (in metric units).
func (f Finding) same(g Finding) bool {
	if !f.sameHead(g) {
		return false
	}
	if apart, same := f.byValues(g); apart || same {
		return same
	}
	return !f.opensApart(g) && f.Text(metric()) == g.Text(metric())
}

// sameHead reports whether two findings have the same severity, hazard,
// topic and rule: whether they say the same thing if their sentences are
// the same.
func (f Finding) sameHead(g Finding) bool {
	return f.Severity == g.Severity && f.Hazard == g.Hazard && f.Topic == g.Topic && f.Rule == g.Rule
}

// findingJSON is the stable JSON form of a finding.
type findingJSON struct {
	Severity Severity `json:"severity"`
	Hazard   Hazard   `json:"hazard"`
	Topic    string   `json:"topic"`
	Text     string   `json:"text"`
	Rule     Rule     `json:"rule"`
}

// MarshalJSON writes {"severity","hazard","topic","text","rule"}, the text
// in metric units. Use [Finding.Text] for another unit system.
func (f Finding) MarshalJSON() ([]byte, error) {
	return json.Marshal(findingJSON{f.Severity, f.Hazard, f.Topic, f.Text(metric()), f.Rule})
}

// UnmarshalJSON reads the form MarshalJSON writes; the sentence comes back
// as fixed text.
func (f *Finding) UnmarshalJSON(b []byte) error {
	var j findingJSON
	if err := decodeJSON("components.Finding.UnmarshalJSON", b, &j); err != nil {
		return err
	}
	*f = Finding{Severity: j.Severity, Hazard: j.Hazard, Topic: j.Topic, Rule: j.Rule,
		format: strings.ReplaceAll(j.Text, "%", "%%")}
	return nil
}

// Findings is a list of findings. Its methods never change the receiver.
type Findings []Finding

// Merge returns fs followed by every finding of more that fs does not yet
// say, in order, without duplicates. Two findings say the same thing when
// they have the same severity, hazard, topic, rule and sentence (in metric
// units).
func (fs Findings) Merge(more ...Finding) Findings {
	if len(more) == 0 {
		return slices.Clone(fs)
	}
	out := make(Findings, len(fs), len(fs)+len(more))
	copy(out, fs)
	var m merger
	for _, f := range more {
		if said, text := m.says(out, f); !said {
			out = append(out, f)
			m.keep(out, len(out)-1, text)
		}
	}
	return out
}

// merger tells, for Merge, whether findings say the same thing (as
// Finding.same does), writing each sentence at most once and only where
// the heads are the same and neither the values nor the opening words
// tell the sentences apart.
type merger struct {
	texts []sentence // of out[i]
}

type sentence struct {
	text    string
	written bool
}

// says reports whether a finding of out says what f says, and f's
// sentence if it had to write it.
func (m *merger) says(out Findings, f Finding) (bool, sentence) {
	var text sentence
	for i, g := range out {
		if !g.sameHead(f) {
			continue
		}
		if apart, same := g.byValues(f); same {
			return true, text
		} else if apart || g.opensApart(f) {
			continue
		}
		if !text.written {
			text = sentence{f.Text(metric()), true}
		}
		if m.text(out, i) == text.text {
			return true, text
		}
	}
	return false, text
}

// text returns the metric sentence of out[i], writing it the first time.
func (m *merger) text(out Findings, i int) string {
	m.grow(len(out), cap(out))
	if s := &m.texts[i]; !s.written {
		*s = sentence{out[i].Text(metric()), true}
	}
	return m.texts[i].text
}

// keep keeps the sentence of out[i], when says wrote it.
func (m *merger) keep(out Findings, i int, s sentence) {
	if s.written {
		m.grow(i+1, cap(out))
		m.texts[i] = s
	}
}

// grow makes room for the sentences of n findings (of at most max).
func (m *merger) grow(n, max int) {
	if m.texts == nil {
		m.texts = make([]sentence, n, max)
	}
	for len(m.texts) < n {
		m.texts = append(m.texts, sentence{})
	}
}

// Hazard returns the findings about hazard h, in order.
func (fs Findings) Hazard(h Hazard) Findings {
	return fs.Filter(func(f Finding) bool { return f.Hazard == h })
}

// AtLeast returns the findings of severity s or worse, in order.
func (fs Findings) AtLeast(s Severity) Findings {
	return fs.Filter(func(f Finding) bool { return f.Severity >= s })
}

// Topic returns the findings under topic key, in order.
func (fs Findings) Topic(key string) Findings {
	return fs.Filter(func(f Finding) bool { return f.Topic == key })
}

// Filter returns the findings for which keep is true, in order.
func (fs Findings) Filter(keep func(Finding) bool) Findings {
	var out Findings
	for _, f := range fs {
		if keep(f) {
			out = append(out, f)
		}
	}
	return out
}

// Worst returns the highest severity in fs, and false when fs is empty.
func (fs Findings) Worst() (Severity, bool) {
	if len(fs) == 0 {
		return Notice, false
	}
	w := fs[0].Severity
	for _, f := range fs[1:] {
		w = max(w, f.Severity)
	}
	return w, true
}

// Sorted returns a copy ordered most severe first; findings of one severity
// keep their order.
func (fs Findings) Sorted() Findings {
	out := slices.Clone(fs)
	slices.SortStableFunc(out, func(a, b Finding) int { return cmp.Compare(b.Severity, a.Severity) })
	return out
}
