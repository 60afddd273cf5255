package contamination

import (
	"errors"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

var fuzzSeeds = []string{
	"18/16/13", "-/16/13", "14/12/≥7", "14/12/>=7", ">28/26/20", "*/>28/28",
	"16/13", " 18 / 16 /13 ", "13/16/18", "29/1/1", "", "/", "≥", ">", "18/16/\xff",
	"18//13", "18/16/13/", "≥≥7", "１８/16/13", "18／16/13", "18/16/⩾7", "18/16/\uFFFD",
}

// checkParsed holds for any input: an error is a *units.ParseError matching a
// documented sentinel; a code passes Validate and reads back from String and
// ASCII.
func checkParsed(t *testing.T, s string, c Code, err error) {
	if err != nil {
		var pe *units.ParseError
		if !errors.As(err, &pe) || pe.Pos < 0 || pe.Pos > len(s) {
			t.Fatalf("%q: error %v is not a *units.ParseError within the input", s, err)
		}
		if !errors.Is(err, units.ErrSyntax) && !errors.Is(err, units.ErrRange) {
			t.Fatalf("%q: error %v matches no sentinel", s, err)
		}
		return
	}
	if verr := c.Validate(); verr != nil {
		t.Fatalf("%q parsed to invalid %#v: %v", s, c, verr)
	}
	for _, out := range []string{c.String(), c.ASCII()} {
		back, err := ParseCode(out)
		if err != nil || back != c {
			t.Fatalf("%q → %#v → %q → %#v, %v", s, c, out, back, err)
		}
	}
}

func FuzzParseCode(f *testing.F) {
	for _, s := range fuzzSeeds {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		c, err := ParseCode(s)
		checkParsed(t, s, c, err)
	})
}

func FuzzCodeUnmarshalText(f *testing.F) {
	for _, s := range fuzzSeeds {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, b []byte) {
		var c Code
		err := c.UnmarshalText(b)
		if len(b) == 0 {
			// "" is the zero Code (no code), and it marshals back to "".
			text, merr := c.MarshalText()
			if err != nil || !c.IsZero() || merr != nil || len(text) != 0 {
				t.Fatalf(`UnmarshalText("") = %#v, %v; MarshalText = %q, %v`, c, err, text, merr)
			}
			return
		}
		checkParsed(t, string(b), c, err)
		if err == nil {
			text, merr := c.MarshalText()
			if merr != nil || string(text) != c.String() {
				t.Fatalf("MarshalText(%v) = %q, %v", c, text, merr)
			}
		}
	})
}
