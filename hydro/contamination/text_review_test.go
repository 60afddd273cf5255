package contamination

import (
	"encoding/json"
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// allNumbers is every number in normal form: plain and "≥" 0…28, ">28",
// "-" and "*".
func allNumbers() []Number {
	ns := []Number{{Mark: MarkNotMeasured}, {Mark: MarkTooMany}, {Scale: MaxScale, Mark: MarkAbove}}
	for s := range MaxScale + 1 {
		ns = append(ns, Number{Scale: s}, Number{Scale: s, Mark: MarkFewCounted})
	}
	return ns
}

// TestEveryCodeRoundTrips formats every valid code of both forms, with
// String, ASCII and MarshalText, and reads each back with ParseCode and
// UnmarshalText; every invalid combination must be refused by Validate and
// MarshalText alike.
func TestEveryCodeRoundTrips(t *testing.T) {
	ns := allNumbers()
	valid := 0
	check := func(c Code) {
		verr := c.Validate()
		text, merr := c.MarshalText()
		if (verr == nil) != (merr == nil) {
			t.Fatalf("%#v: Validate %v but MarshalText %v", c, verr, merr)
		}
		if verr != nil {
			if !errors.Is(merr, units.ErrRange) {
				t.Fatalf("%#v: MarshalText error %v does not match units.ErrRange", c, merr)
			}
			return
		}
		valid++
		for _, s := range []string{c.String(), c.ASCII(), string(text)} {
			back, err := ParseCode(s)
			if err != nil || back != c {
				t.Fatalf("ParseCode(%q) = %#v, %v; want %#v", s, back, err, c)
			}
			var u Code
			if err := u.UnmarshalText([]byte(s)); err != nil || u != c {
				t.Fatalf("UnmarshalText(%q) = %#v, %v; want %#v", s, u, err, c)
			}
		}
	}
	for _, a := range ns {
		for _, b := range ns {
			check(Code{Form: Microscope, N: [3]Number{a, b}})
			for _, c := range ns {
				check(Code{Form: Counter, N: [3]Number{a, b, c}})
			}
		}
	}
	// Counted by hand [X]: a measured number has weight w = 2 for ranks
	// 0…28 (plain or "≥") and 1 for ">28" and "*", so W = Σw = 60,
	// Σw² = 118, Σw³ = 234. Non-rising weighted sequences of k measured
	// numbers: k = 1 → W = 60; k = 2 → (W² + Σw²)/2 = 1859;
	// k = 3 → (W³ + 3W·Σw² + 2Σw³)/6 = 39618. With "-" on the other places:
	// counter 3·60 + 3·1859 + 39618 = 45375, microscope 2·60 + 1859 = 1979.
	if want := 45375 + 1979; valid != want {
		t.Errorf("%d valid codes round-tripped, want %d", valid, want)
	}
}

// TestZeroCode pins what the zero Code is: no code (a sample field left
// unset). It fails Validate and Compare, so it cannot pass a target, and it
// travels in JSON as "". The clean code 0/0/0 is a different, valid code.
func TestZeroCode(t *testing.T) {
	var z Code
	if !z.IsZero() || z.Form != NoForm || z.Len() != 0 {
		t.Fatalf("zero Code: IsZero %v, Form %v, Len %d", z.IsZero(), z.Form, z.Len())
	}
	if err := z.Validate(); !errors.Is(err, units.ErrRange) {
		t.Errorf("zero Code Validate: err = %v, want units.ErrRange", err)
	}
	clean, err := CodeFromCounts(0, 0, 0)
	if err != nil || clean.IsZero() || clean.String() != "0/0/0" {
		t.Errorf("CodeFromCounts(0, 0, 0) = %#v (%v), %v; want the valid code 0/0/0", clean, clean, err)
	}
	target, _ := ParseCode("16/14/11")
	if _, err := Compare(z, target); err == nil {
		t.Error("Compare accepted the zero Code as a sample: an unset sample would pass")
	}
	if s := z.String(); s != "" {
		t.Errorf("zero Code String() = %q, want \"\"", s)
	}
	type report struct {
		Sample Code  `json:"sample"`
		Target *Code `json:"target"`
	}
	data, err := json.Marshal(report{})
	if want := `{"sample":"","target":null}`; err != nil || string(data) != want {
		t.Errorf("json.Marshal(report{}) = %s, %v; want %s", data, err, want)
	}
	var r report
	if err := json.Unmarshal([]byte(`{"sample":"","target":null}`), &r); err != nil || !r.Sample.IsZero() || r.Target != nil {
		t.Errorf("json.Unmarshal of an empty sample = %+v, %v; want the zero Code", r, err)
	}
	if err := json.Unmarshal([]byte(`{"sample":"18/16/13","target":null}`), &r); err != nil || r.Target != nil || r.Sample.String() != "18/16/13" {
		t.Errorf("json.Unmarshal = %+v, %v", r, err)
	}
	// A hand-built invalid code does not marshal: json.Marshal fails.
	bad := report{Sample: Code{Form: Counter, N: [3]Number{{Scale: 40}}}}
	if _, err := json.Marshal(bad); !errors.Is(err, units.ErrRange) {
		t.Errorf("json.Marshal of an invalid code: err = %v, want units.ErrRange", err)
	}
}
