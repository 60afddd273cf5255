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

func TestRenamed(t *testing.T) {
	kind := Sentinel("no steady state")
	for _, c := range []struct {
		name string
		err  error
	}{
		{"range error", Fail("pkg.Inner", "count", -1.0, "≥ 0")},
		{"range error with a kind", Kind(Fail("pkg.Inner", "count", -1.0, "≥ 0"), kind)},
	} {
		got := Renamed(c.err, "pkg.Outer", "count", "Sample.Count")
		var re *RangeError
		if !errors.As(got, &re) || re.Func != "pkg.Outer" || re.Param != "Sample.Count" || re.Value != "-1" || re.Valid != "≥ 0" {
			t.Errorf("%s: Renamed = %v; want pkg.Outer naming Sample.Count", c.name, got)
		}
		if !errors.Is(got, ErrRange) || errors.Is(c.err, kind) != errors.Is(got, kind) {
			t.Errorf("%s: Renamed lost a sentinel: %v", c.name, got)
		}
		var orig *RangeError
		if errors.As(c.err, &orig); orig.Func != "pkg.Inner" || orig.Param != "count" {
			t.Errorf("%s: Renamed changed the error it was given: %v", c.name, c.err)
		}
	}
	// A parameter not in the list keeps its name; other errors and nil pass through.
	var re *RangeError
	if errors.As(Renamed(Fail("pkg.Inner", "q", 0.0, "> 0"), "pkg.Outer", "count", "n"), &re); re.Param != "q" || re.Func != "pkg.Outer" {
		t.Errorf("unlisted parameter: %+v", re)
	}
	if Renamed(nil, "pkg.Outer") != nil || Renamed(errSyntax, "pkg.Outer") != errSyntax {
		t.Error("Renamed changed nil or a non-range error")
	}
}
