package validate

import (
	"errors"
	"math"
	"testing"
)

var errSyntax = errors.New("invalid syntax")

func TestSentinelMatchesErrRange(t *testing.T) {
	s := Sentinel("no such thing")
	if !errors.Is(s, ErrRange) || s.Error() != "no such thing" {
		t.Errorf("Sentinel: Is(ErrRange) %v, text %q", errors.Is(s, ErrRange), s)
	}
	if errors.Is(s, errSyntax) || errors.Is(Sentinel("other"), s) {
		t.Error("a sentinel matches an unrelated error")
	}
}

func TestKind(t *testing.T) {
	kind := Sentinel("counts grow with size")
	err := Kind(Fail("pkg.F", "c6", 20.0, "≤ c4 = 10"), kind)
	var re *RangeError
	if !errors.Is(err, kind) || !errors.Is(err, ErrRange) || !errors.As(err, &re) || re.Param != "c6" {
		t.Fatalf("Kind: %v does not match its kind, ErrRange and *RangeError for c6", err)
	}
	if want := "pkg.F: c6 = 20 is out of range: want ≤ c4 = 10: counts grow with size"; err.Error() != want {
		t.Errorf("text %q, want %q", err, want)
	}
	if Kind(nil, kind) != nil {
		t.Error("Kind(nil, kind) is not nil")
	}
}

func TestPositiveResult(t *testing.T) {
	for _, v := range []float64{0, math.Copysign(0, -1), -1, math.Inf(1), math.NaN()} {
		err := PositiveResult("pkg.F", "drop", v)
		var re *RangeError
		if !errors.As(err, &re) || re.Param != "drop" {
			t.Errorf("PositiveResult(%g) = %v, want a range error naming drop", v, err)
		}
	}
	if err := PositiveResult("pkg.F", "drop", 5e-324); err != nil {
		t.Errorf("PositiveResult(5e-324) = %v, want nil", err)
	}
}

// TestRenamedKeepsKind: Renamed renames the range error inside a Kind and
// keeps the kind; a nil param mapping keeps the parameter names.
func TestRenamedKeepsKind(t *testing.T) {
	kind := Sentinel("no steady state")
	err := Kind(Fail("pkg.Inner", "q", 1.0, "> 3"), kind)
	got := Renamed(err, "pkg.Outer", nil)
	var re *RangeError
	if !errors.As(got, &re) || re.Func != "pkg.Outer" || re.Param != "q" || !errors.Is(got, kind) || !errors.Is(got, ErrRange) {
		t.Errorf("Renamed(Kind(...)) = %v; want pkg.Outer naming q, still matching the kind", got)
	}
	if errors.As(err, &re); re.Func != "pkg.Inner" {
		t.Errorf("Renamed changed the error it was given: %v", err)
	}
	got = Renamed(err, "pkg.Outer", Fields("Need.", nil))
	if errors.As(got, &re); re.Param != "Need.q" {
		t.Errorf("Renamed(Kind(...)) with Fields: param %q, want Need.q", re.Param)
	}
}
