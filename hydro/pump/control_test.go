package pump

import (
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

func TestControlText(t *testing.T) {
	for c := NoControl; c <= PowerLimited; c++ {
		b, err := c.MarshalText()
		if err != nil {
			t.Fatal(err)
		}
		var back Control
		if err := back.UnmarshalText(b); err != nil || back != c {
			t.Errorf("%v: %q → %v, %v", c, b, back, err)
		}
	}
	var c Control
	if err := c.UnmarshalText([]byte(" Load-Sensing ")); err != nil || c != LoadSensing {
		t.Errorf("UnmarshalText(Load-Sensing) = %v, %v", c, err)
	}
	if err := c.UnmarshalText([]byte("servo")); !errors.Is(err, units.ErrSyntax) {
		t.Errorf("UnmarshalText(servo) error = %v; want ErrSyntax", err)
	}
	if _, err := Control(7).MarshalText(); !errors.Is(err, units.ErrRange) {
		t.Errorf("Control(7).MarshalText() error = %v; want ErrRange", err)
	}
}

func FuzzControlUnmarshalText(f *testing.F) {
	for _, s := range []string{"none", "pressure-compensated", "Load-Sensing", "power-limited", "", "servo"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		var c Control
		if err := c.UnmarshalText([]byte(s)); err != nil {
			if !errors.Is(err, units.ErrSyntax) {
				t.Fatalf("%q: error %v does not match ErrSyntax", s, err)
			}
			return
		}
		b, err := c.MarshalText()
		var back Control
		if err != nil || back.UnmarshalText(b) != nil || back != c {
			t.Fatalf("%q → %v → %q, %v → %v", s, c, b, err, back)
		}
	})
}
