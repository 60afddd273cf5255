package contamination

import (
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
)

// wantRangeError checks that err is a range error for param, with the
// shared checks of internal/checktest, and stops the test when there is
// none.
func wantRangeError(t *testing.T, err error, param string) {
	t.Helper()
	if checktest.RangeError(t, err, param) == nil {
		t.FailNow()
	}
}
