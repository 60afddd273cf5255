package checktest

import (
	"errors"
	"fmt"
	"testing"

	"github.com/hydrosize/hydrosize/internal/validate"
)

// recorder is a testing.TB that records failures instead of failing.
type recorder struct {
	testing.TB
	failed []string
}

func (r *recorder) Helper() {}
func (r *recorder) Errorf(format string, args ...any) {
	r.failed = append(r.failed, fmt.Sprintf(format, args...))
}

func TestRangeError(t *testing.T) {
	good := validate.Positive("fluid.CurveThrough", "v40", -1.0)
	for _, c := range []struct {
		name  string
		err   error
		fn    string
		param string
		fails bool
	}{
		{"good", good, "fluid.CurveThrough", "v40", false},
		{"wrapped", fmt.Errorf("sizing: %w", good), "fluid.CurveThrough", "v40", false},
		{"method", &validate.RangeError{Func: "units.Force.PerArea", Param: "a", Value: "0 cm²", Valid: "> 0"}, "units.Force.PerArea", "a", false},
		{"nil", nil, "fluid.CurveThrough", "v40", true},
		{"other parameter", good, "fluid.CurveThrough", "v100", true},
		{"other function", good, "fluid.Other", "v40", true},
		{"not a RangeError", fmt.Errorf("v40: %w", validate.ErrRange), "f.F", "v40", true},
		{"no sentinel", errors.New("v40 is bad"), "f.F", "v40", true},
		{"unqualified", &validate.RangeError{Func: "CurveThrough", Param: "v40", Value: "1", Valid: "> 2"}, "CurveThrough", "v40", true},
		{"no valid range", &validate.RangeError{Func: "fluid.F", Param: "v40", Value: "1"}, "fluid.F", "v40", true},
	} {
		r := &recorder{TB: t}
		RangeErrorIn(r, c.err, c.fn, c.param)
		if failed := len(r.failed) > 0; failed != c.fails {
			t.Errorf("%s: failed = %v %q, want failed = %v", c.name, failed, r.failed, c.fails)
		}
	}
}
