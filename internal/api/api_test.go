package api

import (
	"bufio"
	"flag"
	"os"
	"path/filepath"
	"regexp"
	"slices"
	"strings"
	"testing"
)

var update = flag.Bool("update", false, "append new exported identifiers to api.txt")

// TestAPI is the stability gate. The committed listing api.txt is
// append-only: every line in it must still describe the exported API,
// unless the line is also in except.txt and CHANGELOG.md names the
// identifier under a breaking-change heading. New identifiers must be
// appended (go test ./internal/api -update).
func TestAPI(t *testing.T) {
	root, err := filepath.Abs("../..")
	if err != nil {
		t.Fatal(err)
	}
	current, err := Lines(root)
	if err != nil {
		t.Fatal(err)
	}
	listed := readLines(t, "api.txt")
	except := readLines(t, "except.txt")
	changelog, err := os.ReadFile(filepath.Join(root, "CHANGELOG.md"))
	if err != nil {
		t.Fatal(err)
	}
	for _, line := range listed {
		if slices.Contains(current, line) {
			continue
		}
		if !slices.Contains(except, line) {
			t.Errorf("removed or changed: %s\n\tbreaking change: add the line to internal/api/except.txt and record it in CHANGELOG.md under \"Removed\" or \"Changed\" (breaking)", line)
			continue
		}
		if !breakingRecorded(string(changelog), identifier(line)) {
			t.Errorf("except.txt lists %q but CHANGELOG.md does not name %s under a Removed or Changed heading marked breaking", line, identifier(line))
		}
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
		{"pkg m/units, const Bar Pressure", "Bar"},
		{"pkg m/units, type System struct, Name string", "System"},
		{"pkg m/units, var Metric System", "Metric"},
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
