package checktest

import (
	"os/exec"
	"strconv"
	"strings"
	"testing"
)

// GNUUnits returns the path of GNU units (Debian package units), the outside
// program the unit checks evaluate formulas in, and logs its version; it
// skips t where the program is not installed or is not GNU units (.ci/run
// installs it, so the checks always run in CI).
func GNUUnits(t testing.TB) string {
	t.Helper()
	path, err := exec.LookPath("units")
	if err != nil {
		t.Skip("GNU units (Debian package units) is not installed; .ci/run installs it")
	}
	out, err := exec.Command(path, "--version").Output()
	if err != nil || !strings.HasPrefix(string(out), "GNU Units version") {
		t.Skipf("%s is not GNU units: %v %q", path, err, out)
	}
	t.Logf("%s", strings.SplitN(string(out), "\n", 2)[0])
	return path
}

// GNUUnitsValue evaluates have in the units of want with the GNU units at
// path (units -t -o %.17g -- have want) and returns the number it prints,
// failing t when it prints anything else.
func GNUUnitsValue(t testing.TB, path, have, want string) float64 {
	t.Helper()
	out, err := exec.Command(path, "-t", "-o", "%.17g", "--", have, want).CombinedOutput()
	if err != nil {
		t.Fatalf("units %q %q: %v: %s", have, want, err, out)
	}
	s := strings.TrimSpace(string(out))
	v, err := strconv.ParseFloat(s, 64)
	if err != nil {
		t.Fatalf("units %q %q printed %q", have, want, s)
	}
	return v
}
