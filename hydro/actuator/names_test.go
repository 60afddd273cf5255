package actuator

import (
	"encoding"
	"encoding/json"
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// enums lists one value of each enumeration with every name it can take.
func enums() []struct {
	v     interface{ String() string }
	ptr   func() encoding.TextUnmarshaler
	names []string
} {
	return []struct {
		v     interface{ String() string }
		ptr   func() encoding.TextUnmarshaler
		names []string
	}{
		{Extend, func() encoding.TextUnmarshaler { return new(Direction) }, directionNames[:]},
		{SingleRod, func() encoding.TextUnmarshaler { return new(RodEnds) }, rodEndsNames[:]},
		{DoubleActing, func() encoding.TextUnmarshaler { return new(Action) }, actionNames[:]},
		{Euler, func() encoding.TextUnmarshaler { return new(BucklingMethod) }, methodNames[:]},
		{Flange, func() encoding.TextUnmarshaler { return new(BodyMount) }, bodyNames[:]},
		{RodPinned, func() encoding.TextUnmarshaler { return new(RodEnd) }, rodEndNames[:]},
	}
}

func TestNamesRoundTrip(t *testing.T) {
	for _, e := range enums() {
		for _, n := range e.names {
			p := e.ptr()
			if err := p.UnmarshalText([]byte(n)); err != nil {
				t.Errorf("UnmarshalText(%q): %v", n, err)
				continue
			}
			b, err := p.(encoding.TextMarshaler).MarshalText()
			if err != nil || string(b) != n || p.(interface{ String() string }).String() != n {
				t.Errorf("%q round trip: %q, %v", n, b, err)
			}
		}
		err := e.ptr().UnmarshalText([]byte("sideways"))
		var pe *units.ParseError
		if !errors.As(err, &pe) || !errors.Is(err, units.ErrSyntax) || pe.Input != "sideways" {
			t.Errorf("%T: UnmarshalText(sideways) = %v; want a ParseError quoting the input", e.v, err)
		}
	}
	if s := Direction(9).String(); s != "Direction(9)" {
		t.Errorf("Direction(9).String() = %q", s)
	}
	if _, err := RodEnd(9).MarshalText(); !errors.Is(err, units.ErrRange) {
		t.Errorf("RodEnd(9).MarshalText error = %v; want ErrRange", err)
	}
}

// TestDutyJSON: a duty travels in JSON with its enumerations by name and
// its quantities with their units, and reads back the same.
func TestDutyJSON(t *testing.T) {
	d := Duty{Direction: Retract, Force: 12 * units.Kilonewton, Pressure: 160 * units.Bar, Stroke: 400 * mm,
		Ends: DoubleRod, Action: DoubleActing,
		Buckling: &Column{Body: Trunnion, RodEnd: RodPinned, Retracted: 300 * mm, Relief: 180 * units.Bar, Yield: 355e6}}
	b, err := json.Marshal(d)
	if err != nil {
		t.Fatal(err)
	}
	var back Duty
	if err := json.Unmarshal(b, &back); err != nil {
		t.Fatalf("%s: %v", b, err)
	}
	if back.Direction != Retract || back.Ends != DoubleRod || back.Buckling == nil || back.Buckling.Body != Trunnion ||
		back.Force != d.Force || back.Stroke != d.Stroke {
		t.Errorf("round trip of %s = %+v", b, back)
	}
}

func FuzzEnumUnmarshalText(f *testing.F) {
	for _, e := range enums() {
		for _, n := range e.names {
			f.Add(n)
		}
	}
	f.Add("")
	f.Add("EXTEND")
	f.Fuzz(func(t *testing.T, s string) {
		for _, e := range enums() {
			p := e.ptr()
			if err := p.UnmarshalText([]byte(s)); err != nil {
				if !errors.Is(err, units.ErrSyntax) {
					t.Fatalf("%T(%q): %v does not match ErrSyntax", p, s, err)
				}
				continue
			}
			b, err := p.(encoding.TextMarshaler).MarshalText()
			if err != nil || string(b) != s {
				t.Fatalf("%T(%q) wrote back %q, %v", p, s, b, err)
			}
		}
	})
}
