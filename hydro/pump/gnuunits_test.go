package pump

import (
	"os/exec"
	"strconv"
	"strings"
	"testing"
)

// GNU units (Debian package units) is the outside program these checks
// evaluate formulas in; .ci/run installs it.

// gnuUnitsPath finds the units program or skips the test.
func gnuUnitsPath(t *testing.T) string {
	t.Helper()
	path, err := exec.LookPath("units")
	if err != nil {
		t.Skip("GNU units (Debian package units) is not installed; .ci/run installs it")
	}
	out, err := exec.Command(path, "--version").Output()
	if err != nil || !strings.HasPrefix(string(out), "GNU Units version") {
		t.Skipf("%s is not GNU units: %v %q", path, err, out)
	}
	return path
}

// gnuUnits evaluates have in the units of want and parses the number.
func gnuUnits(t *testing.T, path, have, want string) float64 {
	t.Helper()
	out, err := exec.Command(path, "-t", "-o", "%.17g", have, want).CombinedOutput()
	if err != nil {
		t.Fatalf("units %q %q: %v: %s", have, want, err, out)
	}
	v, err := strconv.ParseFloat(strings.TrimSpace(string(out)), 64)
	if err != nil {
		t.Fatalf("units %q %q printed %q", have, want, out)
	}
	return v
}

// formatG writes v with all the digits GNU units needs to read it back.
func formatG(v float64) string { return strconv.FormatFloat(v, 'g', 17, 64) }
