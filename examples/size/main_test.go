package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func runSize(t *testing.T, args ...string) string {
	t.Helper()
	var b bytes.Buffer
	if err := run(args, &b); err != nil {
		t.Fatalf("run %q: %v", args, err)
	}
	return b.String()
}

// TestDemo: with no flags the demo baling press is sized and every
// section of the report is printed, with the numbers the hydro tests check.
func TestDemo(t *testing.T) {
	out := runSize(t)
	for _, want := range []string{
		"Two-ram baling press, 250 kN — sized at 180 bar",
		"1. Basis", "2. Actuators", "3. Duty cycle and pressure budget", "4. Pump and drive", "5. Valves", "6. Lines",
		"7. Heat balance", "8. Fluid", "9. Cleanliness", "10. Bill of components", "11. Findings",
		"press bore", "160 mm (needs", "cylinder 160 mm bore × 125 mm rod × 950 mm stroke",
		"WARNING (overrunning load)", "ISO 4413",
	} {
		if !strings.Contains(out, want) {
			t.Errorf("output lacks %q", want)
		}
	}
}

func TestFormats(t *testing.T) {
	md := runSize(t, "-markdown")
	if !strings.HasPrefix(md, "# Two-ram baling press") || !strings.Contains(md, "\n## Findings\n") || !strings.Contains(md, "|---|") {
		t.Errorf("markdown:\n%.400s", md)
	}
	var j struct {
		Name      string
		Actuators []struct{ Name string }
		Findings  []struct{ Severity string }
	}
	if err := json.Unmarshal([]byte(runSize(t, "-json")), &j); err != nil || j.Name == "" || len(j.Actuators) != 2 || len(j.Findings) == 0 {
		t.Errorf("json: %+v, %v", j, err)
	}
	us := runSize(t, "-units", "us")
	if !strings.Contains(us, " psi") || !strings.Contains(us, "inch cylinder bores") {
		t.Errorf("-units us:\n%.600s", us)
	}
}

func TestSampleSpec(t *testing.T) {
	out := runSize(t, "-spec", "crane.json")
	if !strings.Contains(out, "Forestry crane, slew and boom") || !strings.Contains(out, "slew displacement") {
		t.Errorf("crane:\n%.600s", out)
	}
}

func TestSweep(t *testing.T) {
	out := runSize(t, "-sweep")
	for _, want := range []string{"the design at each working pressure", "100 bar", "250 bar", "press 160 mm/125 mm"} {
		if !strings.Contains(out, want) {
			t.Errorf("sweep lacks %q:\n%s", want, out)
		}
	}
	out = runSize(t, "-sweep", "-speeds", "1200 rpm, 1750 rpm", "-markdown")
	if !strings.Contains(out, "1200 rpm") || !strings.Contains(out, "1750 rpm") {
		t.Errorf("speeds:\n%s", out)
	}
}

// TestBadSpec: a spec with mistakes is refused with every problem listed,
// each with its path, as a spec error (exit status 1).
func TestBadSpec(t *testing.T) {
	path := filepath.Join(t.TempDir(), "bad.json")
	spec := `{"actuators": [{"name": "lift", "kind": "cylindre", "stroke": 900}],
	  "cycle": {"phases": [{"moves": [{"actuator": "lift", "direction": "extend", "speed": "0.1 m/s"}]}]},
	  "supply": {"mains": "55 Hz"}, "site": {"ambient_min": "5 °C", "ambient_max": "30 °C"}, "fluid": {"grade": "VG 46"}}`
	if err := os.WriteFile(path, []byte(spec), 0o600); err != nil {
		t.Fatal(err)
	}
	var b bytes.Buffer
	err := run([]string{"-spec", path}, &b)
	if !errors.Is(err, errSpec) {
		t.Fatalf("err = %v, want a spec error", err)
	}
	for _, want := range []string{"actuators[0].stroke", `"900 mm"`, "actuators[0].kind", "supply.mains", "3 problems"} {
		if !strings.Contains(err.Error(), want) {
			t.Errorf("error lacks %q:\n%v", want, err)
		}
	}
}

func TestBadFlags(t *testing.T) {
	for _, args := range [][]string{
		{"-json", "-markdown"}, {"-units", "imperial"}, {"-speeds", "1000 rpm"}, {"extra"}, {"-sweep", "-speeds", "fast"},
		{"-spec", filepath.Join(t.TempDir(), "none.json")}, {"-nonsense"},
	} {
		var b bytes.Buffer
		if err := run(args, &b); err == nil || errors.Is(err, errSpec) {
			t.Errorf("run %q: err = %v, want a usage error", args, err)
		}
	}
}
