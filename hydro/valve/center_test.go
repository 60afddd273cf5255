package valve

import (
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// The port connections of the five centers as the trade draws them in the
// ISO 1219-1 graphic symbols of a 4/3 directional valve (from memory).
func TestCenterTraits(t *testing.T) {
	for _, c := range []struct {
		center                           Center
		pump, actuator                   Path
		unloads, deadheads, holds, vents bool
	}{
		{ClosedCenter, Blocked, Blocked, false, true, true, false},
		{OpenCenter, ToTank, ToTank, true, false, false, true},
		{TandemCenter, ToTank, Blocked, true, false, true, false},
		{FloatCenter, Blocked, ToTank, false, true, false, true},
		{RegenerativeCenter, Joined, Joined, false, false, false, false},
	} {
		tr, err := c.center.Traits()
		if err != nil {
			t.Fatalf("%v: %v", c.center, err)
		}
		if tr.Pump != c.pump || tr.Actuator != c.actuator {
			t.Errorf("%v: pump %v, actuator %v; want %v, %v", c.center, tr.Pump, tr.Actuator, c.pump, c.actuator)
		}
		if tr.Unloads() != c.unloads || tr.Deadheads() != c.deadheads || tr.Holds() != c.holds || tr.Vents() != c.vents {
			t.Errorf("%v: unloads %v deadheads %v holds %v vents %v", c.center, tr.Unloads(), tr.Deadheads(), tr.Holds(), tr.Vents())
		}
	}
}

func TestCenterInvalid(t *testing.T) {
	for _, c := range []Center{0, 6, 255} {
		if err := c.Validate(); !errors.Is(err, units.ErrRange) {
			t.Errorf("Center(%d).Validate() = %v; want ErrRange", c, err)
		}
		if _, err := c.MarshalText(); !errors.Is(err, units.ErrRange) {
			t.Errorf("Center(%d).MarshalText() error = %v; want ErrRange", c, err)
		}
	}
	if s := Center(0).String(); s != "Center(0)" {
		t.Errorf("Center(0).String() = %q", s)
	}
}

func TestParseCenter(t *testing.T) {
	for in, want := range map[string]Center{
		"closed":         ClosedCenter,
		"Blocked center": ClosedCenter,
		"open":           OpenCenter,
		" OPEN CENTRE ":  OpenCenter,
		"tandem-center":  TandemCenter,
		"float":          FloatCenter,
		"regen":          RegenerativeCenter,
		"regenerative":   RegenerativeCenter,
	} {
		got, err := ParseCenter(in)
		if err != nil || got != want {
			t.Errorf("ParseCenter(%q) = %v, %v; want %v", in, got, err, want)
		}
	}
	for _, in := range []string{"", "center", "closed open", "motor spool", "Center(1)"} {
		_, err := ParseCenter(in)
		var pe *units.ParseError
		if !errors.As(err, &pe) || !errors.Is(err, units.ErrSyntax) || pe.Input != in {
			t.Errorf("ParseCenter(%q) error = %v; want a ParseError quoting the input", in, err)
		}
	}
}

func TestCenterTextRoundTrip(t *testing.T) {
	for c := ClosedCenter; c <= RegenerativeCenter; c++ {
		b, err := c.MarshalText()
		if err != nil {
			t.Fatal(err)
		}
		var back Center
		if err := back.UnmarshalText(b); err != nil || back != c {
			t.Errorf("%v: round trip %q → %v, %v", c, b, back, err)
		}
	}
}

func FuzzParseCenter(f *testing.F) {
	for _, s := range []string{"closed", "Tandem center", "regen", "float-centre", "", "x"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		c, err := ParseCenter(s)
		if err != nil {
			if !errors.Is(err, units.ErrSyntax) {
				t.Fatalf("ParseCenter(%q) error %v does not match ErrSyntax", s, err)
			}
			return
		}
		if c.Validate() != nil {
			t.Fatalf("ParseCenter(%q) = %d, not a valid center", s, c)
		}
		b, _ := c.MarshalText()
		if back, err := ParseCenter(string(b)); err != nil || back != c {
			t.Fatalf("%q → %v → %q → %v, %v", s, c, b, back, err)
		}
	})
}
