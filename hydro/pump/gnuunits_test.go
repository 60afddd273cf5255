package pump

import (
	"strconv"
)

// GNU units (Debian package units) is the outside program these checks
// evaluate formulas in; .ci/run installs it.

// formatG writes v with all the digits GNU units needs to read it back.
func formatG(v float64) string { return strconv.FormatFloat(v, 'g', 17, 64) }
