package enum

import (
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

type color uint8

var colorNames = []string{"red", "green"}

func TestRoundTrip(t *testing.T) {
	for c := color(0); c < 2; c++ {
		b, err := Marshal("pkg.Color.MarshalText", c, colorNames)
		var back color
		if err != nil || Unmarshal("pkg.Color.UnmarshalText", b, &back, colorNames) != nil || back != c || Name("Color", c, colorNames) != string(b) {
			t.Errorf("%d: %q, %v, back %d", c, b, err, back)
		}
	}
	if Name("Color", color(7), colorNames) != "Color(7)" {
		t.Error("Name of an unnamed value")
	}
}

func TestErrors(t *testing.T) {
	_, err := Marshal("pkg.Color.MarshalText", color(2), colorNames)
	var re *units.RangeError
	if !errors.As(err, &re) || !errors.Is(err, units.ErrRange) || re.Func != "pkg.Color.MarshalText" {
		t.Errorf("Marshal(2) error = %v", err)
	}
	var c color = 1
	err = Unmarshal("pkg.Color.UnmarshalText", []byte("Red"), &c, colorNames)
	var pe *units.ParseError
	if !errors.As(err, &pe) || !errors.Is(err, units.ErrSyntax) || pe.Func != "pkg.Color.UnmarshalText" || c != 1 {
		t.Errorf("Unmarshal(Red) = %v, left %d", err, c)
	}
}
