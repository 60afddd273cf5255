package api

import (
	"bufio"
	"flag"
	"os"
	"path/filepath"
	"regexp"
	"slices"
	"strings"
	"sync"
	"testing"
)

// moduleLines lists the module's API once for all the tests.
var moduleLines = sync.OnceValues(func() ([]string, error) {
	root, err := filepath.Abs("../..")
	if err != nil {
		return nil, err
	}
	return Lines(root)
})

var update = flag.Bool("update", false, "append new exported identifiers to api.txt (and migrate format-1 constant lines)")

// TestAPI is the stability gate. The committed listing api.txt is
// append-only: every line in it must still describe the exported API,
// unless the line is also in except.txt and CHANGELOG.md names the
// identifier under a breaking-change heading. New identifiers must be
// appended (go test ./internal/api -update).
//
// Two changes are not breaking and pass without an exception: a method
// whose receiver changed from *T to T (it is still in the method set of
// *T), and a constant line of format 1 ("const X T", no value) whose
// identifier is now listed in format 2 with the same type, or with any type
// where format 1 wrote "untyped". -update drops such format-1 lines.
func TestAPI(t *testing.T) {
	root, err := filepath.Abs("../..")
	if err != nil {
		t.Fatal(err)
	}
	current, err := moduleLines()
	if err != nil {
		t.Fatal(err)
	}
	listed := readLines(t, "api.txt")
	except := readLines(t, "except.txt")
	changelog, err := os.ReadFile(filepath.Join(root, "CHANGELOG.md"))
	if err != nil {
		t.Fatal(err)
	}
	var migrated []string
	for _, line := range listed {
		switch {
		case slices.Contains(current, line), valueReceiver(line, current):
			continue
		case formatOne(line, current):
			migrated = append(migrated, line)
			if !*update {
				t.Errorf("format-1 line: %s\n\tthe listing now records constants with their value: run go test ./internal/api -update", line)
			}
			continue
		case !slices.Contains(except, line):
			t.Errorf("removed or changed: %s\n\tbreaking change: add the line to internal/api/except.txt and record it in CHANGELOG.md under \"Removed\" or \"Changed\" (breaking)", line)
		case !breakingRecorded(string(changelog), identifier(line)):
			t.Errorf("except.txt lists %q but CHANGELOG.md does not name %s under a Removed or Changed heading marked breaking", line, identifier(line))
		}
	}
	if *update && len(migrated) > 0 {
		dropLines(t, "api.txt", migrated)
	}
	var added []string
	for _, line := range current {
		if !slices.Contains(listed, line) {
			added = append(added, line)
		}
	}
	if len(added) == 0 {
		return
	}
	if *update {
		appendLines(t, "api.txt", added)
		return
	}
	t.Errorf("%d exported identifiers are not in internal/api/api.txt (run go test ./internal/api -update), first: %s", len(added), added[0])
}

// valueReceiver reports whether line lists a method of *T that current
// lists, with the same signature, as a method of T.
func valueReceiver(line string, current []string) bool {
	pkg, rest, _ := strings.Cut(line, ", ")
	recv, ok := strings.CutPrefix(rest, "method (*")
	return ok && slices.Contains(current, pkg+", method ("+recv)
}

// formatOne reports whether line is a format-1 constant line ("const X T",
// no value) whose constant current lists in format 2 with type T, or with
// any type where format 1 wrote "untyped".
func formatOne(line string, current []string) bool {
	pkg, rest, _ := strings.Cut(line, ", ")
	f := strings.Fields(rest)
	if len(f) != 3 || f[0] != "const" {
		return false
	}
	for _, c := range current {
		cp, crest, _ := strings.Cut(c, ", ")
		typ, ok := strings.CutPrefix(crest, "const "+f[1]+" ")
		if cp != pkg || !ok || !strings.Contains(typ, " = ") {
			continue
		}
		typ, _, _ = strings.Cut(typ, " = ")
		return typ == f[2] || f[2] == "untyped"
	}
	return false
}

// identifier returns the Go name a listing line is about.
func identifier(line string) string {
	_, rest, _ := strings.Cut(line, ", ")
	fields := strings.Fields(rest)
	if len(fields) < 2 {
		return rest
	}
	switch fields[0] {
	case "method":
		recv := strings.Trim(fields[1], "()*")
		name, _, _ := strings.Cut(fields[2], "(")
		return recv + "." + name
	case "func":
		name, _, _ := strings.Cut(fields[1], "(")
		name, _, _ = strings.Cut(name, "[")
		return name
	}
	return strings.TrimSuffix(fields[1], ",")
}

var breakingHeading = regexp.MustCompile(`(?m)^###\s+(Removed|Changed).*$`)

// breakingRecorded reports whether changelog names id in a section headed
// Removed or Changed that says "breaking".
func breakingRecorded(changelog, id string) bool {
	locs := breakingHeading.FindAllStringIndex(changelog, -1)
	for _, loc := range locs {
		section := changelog[loc[0]:]
		if end := strings.Index(section[3:], "\n#"); end >= 0 {
			section = section[:end+3]
		}
		if strings.Contains(strings.ToLower(section), "breaking") && strings.Contains(section, id) {
			return true
		}
	}
	return false
}

func readLines(t *testing.T, name string) []string {
	t.Helper()
	f, err := os.Open(name)
	if os.IsNotExist(err) {
		return nil
	}
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	var out []string
	s := bufio.NewScanner(f)
	for s.Scan() {
		if line := strings.TrimSpace(s.Text()); line != "" && !strings.HasPrefix(line, "#") {
			out = append(out, line)
		}
	}
	if err := s.Err(); err != nil {
		t.Fatal(err)
	}
	return out
}

// dropLines removes lines from file name, keeping its comments and order.
func dropLines(t *testing.T, name string, lines []string) {
	t.Helper()
	b, err := os.ReadFile(name)
	if err != nil {
		t.Fatal(err)
	}
	var keep []string
	for _, l := range strings.SplitAfter(string(b), "\n") {
		if !slices.Contains(lines, strings.TrimSpace(l)) {
			keep = append(keep, l)
		}
	}
	if err := os.WriteFile(name, []byte(strings.Join(keep, "")), 0o644); err != nil {
		t.Fatal(err)
	}
}

func appendLines(t *testing.T, name string, lines []string) {
	t.Helper()
	f, err := os.OpenFile(name, os.O_APPEND|os.O_CREATE|os.O_WRONLY, 0o644)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	if _, err := f.WriteString(strings.Join(lines, "\n") + "\n"); err != nil {
		t.Fatal(err)
	}
}

func TestIdentifier(t *testing.T) {
	for _, c := range []struct{ line, want string }{
		{"pkg m/units, func ParsePressure(string) (Pressure, error)", "ParsePressure"},
		{"pkg m/units, method (Pressure) Bar() float64", "Pressure.Bar"},
		{"pkg m/units, method (*System) AppendFlow([]byte, Flow) []byte", "System.AppendFlow"},
		{"pkg m/units, const Bar Pressure = 100000", "Bar"},
		{"pkg m/units, const Bar Pressure", "Bar"},
		{"pkg m/units, type System struct, Name string", "System"},
		{"pkg m/units, var ErrRange error", "ErrRange"},
		{"pkg m/units, func Metric() System", "Metric"},
	} {
		if got := identifier(c.line); got != c.want {
			t.Errorf("identifier(%q) = %q, want %q", c.line, got, c.want)
		}
	}
}

func TestBreakingRecorded(t *testing.T) {
	log := "## [Unreleased]\n### Removed (breaking)\n- `Pressure.Foo` is gone.\n### Added\n- `Bar`.\n"
	if !breakingRecorded(log, "Pressure.Foo") {
		t.Error("a removal under '### Removed (breaking)' was not found")
	}
	if breakingRecorded(log, "Bar") {
		t.Error("an addition counted as a recorded breaking change")
	}
}

func TestCompatibleChanges(t *testing.T) {
	current := []string{
		"pkg m/units, method (System) FormatPressure(Pressure) string",
		"pkg m/units, const Bar Pressure = 100000",
		"pkg m/fluid, const MaxViscosity units.KinematicViscosity = 20",
	}
	if !valueReceiver("pkg m/units, method (*System) FormatPressure(Pressure) string", current) {
		t.Error("a method moved from *T to T counted as removed")
	}
	if valueReceiver("pkg m/units, method (*System) FormatPressure(Flow) string", current) {
		t.Error("a changed signature passed as a receiver change")
	}
	for _, c := range []struct {
		line string
		want bool
	}{
		{"pkg m/units, const Bar Pressure", true},
		{"pkg m/fluid, const MaxViscosity untyped", true},
		{"pkg m/units, const Bar Force", false},             // a changed type is breaking
		{"pkg m/units, const Bar Pressure = 100001", false}, // a changed value is breaking
		{"pkg m/units, const PSI Pressure", false},          // gone
		{"pkg m/other, const Bar Pressure", false},          // another package
		{"pkg m/units, func Bar() Pressure", false},         // not a constant
	} {
		if got := formatOne(c.line, current); got != c.want {
			t.Errorf("formatOne(%q) = %v, want %v", c.line, got, c.want)
		}
	}
}

// TestListingFromTypes: the listing records real types and constant
// values, sees through build constraints (gen.go is a generator) and lists
// an alias of an internal type as the type a caller sees.
func TestListingFromTypes(t *testing.T) {
	lines, err := moduleLines()
	if err != nil {
		t.Fatal(err)
	}
	const u = "pkg " + Module + "/units, "
	for _, want := range []string{
		u + "const Bar Pressure = 100000",
		u + "const Inch Length = 0.0254",
		u + "const BaseAngle Base = 7",
		u + "type Pressure float64",
		u + "func ParsePressure(string) (Pressure, error)",
		u + "method (Pressure) Bar() float64",
		u + "method (*Pressure) UnmarshalText([]byte) error",
		u + "var ErrRange error",
		u + "type RangeError struct",
		u + "type RangeError struct, Param string",
		u + "method (*RangeError) Error() string",
		"pkg " + Module + "/fluid, const MaxViscosity units.KinematicViscosity = 20",
	} {
		if !slices.Contains(lines, want) {
			t.Errorf("listing lacks %q", want)
		}
	}
	for _, line := range lines {
		if strings.Contains(line, "validate.") || strings.Contains(line, " untyped\n") || strings.HasSuffix(line, " untyped") {
			t.Errorf("listing names an internal package or an untyped constant without its kind: %s", line)
		}
		if strings.Contains(line, ", func main(") {
			t.Errorf("listing includes a generator or main package: %s", line)
		}
	}
}
