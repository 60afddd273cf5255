package units

import (
	"errors"
	"strings"
	"testing"
	"unicode"
	"unicode/utf8"
)

// Letter case: an exact spelling wins; otherwise a spelling that folds to
// one unit is accepted, and one that folds to more is refused.

var caseSpellings = []messyCase{
	{"3000 PSI", pPressure, 3000, float64(PSI)},
	{"3000 Psi", pPressure, 3000, float64(PSI)},
	{"3000 PSIG", pPressure, 3000, float64(PSI)},
	{"210 Bar", pPressure, 210, float64(Bar)},
	{"210 BAR", pPressure, 210, float64(Bar)},
	{"210 BARG", pPressure, 210, float64(Bar)},
	{"14.7 PSIA", pAbs, 14.7, float64(PSIAbsolute)},
	{"15 KW", parseErr(ParsePower), 15, float64(Kilowatt)},
	{"15 kw", parseErr(ParsePower), 15, float64(Kilowatt)},
	{"20 Hp", parseErr(ParsePower), 20, float64(Horsepower)},
	{"40 LPM", pFlow, 40, float64(LitrePerMinute)},
	{"40 Lpm", pFlow, 40, float64(LitrePerMinute)},
	{"10 Gpm", pFlow, 10, float64(USGallonPerMinute)},
	{"10 GAL/MIN", pFlow, 10, float64(USGallonPerMinute)},
	{"5 Liters Per Minute", pFlow, 5, float64(LitrePerMinute)},
	{"25 KN", pForce, 25, float64(Kilonewton)},
	{"1500 RPM", pSpeed, 1500, float64(RevolutionPerMinute)},
	{"1500 Rpm", pSpeed, 1500, float64(RevolutionPerMinute)},
	{"7 KG/CM2", pPressure, 7, float64(KilogramForcePerSquareCentimetre)},
	{"46 CST", parseErr(ParseKinematicViscosity), 46, float64(Centistokes)},
	{"5000 LBS", pForce, 5000, float64(PoundForce)},
	{"5000 LB", pForce, 5000, float64(PoundForce)},
	{"100 Microns", pLength, 100, float64(Micrometre)},
	// An exact spelling keeps its meaning, whatever folds with it.
	{"5 mPa·s", parseErr(ParseDynamicViscosity), 5, float64(MillipascalSecond)},
	{"5 MPa", pPressure, 5, float64(Megapascal)},
	{"5 mbar", pPressure, 5, float64(Millibar)},
	{"5 mm", pLength, 5, float64(Millimetre)},
	// A registered compound spelling folds as a whole.
	{"2 KN/MM", parseErr(ParseStiffness), 2, float64(KilonewtonPerMillimetre)},
	{"2 N/MM²", pPressure, 2, float64(Megapascal)},
}

func TestCaseFallback(t *testing.T) {
	for _, c := range caseSpellings {
		got, err := c.parse(c.in)
		x := c.x
		if want := x * c.unit; err != nil || got != want {
			t.Errorf("parse %q = %.17g, %v; want %.17g", c.in, got, err, want)
		}
	}
	for _, c := range []struct{ in, celsius string }{{"20 °c", "20"}, {"20 Celsius", "20"}, {"68 Fahrenheit", "20"}, {"20 DEGC", "20"}} {
		got, err := ParseTemperature(c.in)
		if err != nil || got.Celsius() < 19.999999 || got.Celsius() > 20.000001 {
			t.Errorf("ParseTemperature(%q) = %v, %v; want %s °C", c.in, got, err, c.celsius)
		}
	}
}

// caseAmbiguous fold to more than one unit; the error names each.
var caseAmbiguous = []struct {
	in    string
	could []string
}{
	{"5 Mpa", []string{`"MPa"`, `"mPa"`, "milli", "mega"}},
	{"5 MPA", []string{`"MPa"`, `"mPa"`}},
	{"5 mpa", []string{`"MPa"`, `"mPa"`}},
	{"5 MM", []string{`"mm"`, `"Mm"`}},
	{"5 MBAR", []string{`"mbar"`, `"Mbar"`}},
	{"5 MPA·S", []string{`"MPa·s"`, `"mPa·s"`}},
	{"5 lbf/MM", []string{`"mm"`, `"Mm"`}}, // a name inside an expression
}

func TestCaseAmbiguous(t *testing.T) {
	for _, c := range caseAmbiguous {
		q, err := Parse(c.in)
		if !errors.Is(err, ErrAmbiguous) || q != (Quantity{}) {
			t.Errorf("Parse(%q) = %v, %v; want ErrAmbiguous", c.in, q, err)
			continue
		}
		for _, w := range c.could {
			if !strings.Contains(err.Error(), w) {
				t.Errorf("Parse(%q): %v; want it to name %s", c.in, err, w)
			}
		}
	}
	// A prefix twin is no unit: "mPa" and "ML" are unknown, suggesting the
	// registered spelling, not ambiguous.
	for _, c := range []struct{ in, suggest string }{{"55 mPa", `"MPa"`}, {"5 ML", `"mL"`}} {
		if _, err := Parse(c.in); !errors.Is(err, ErrUnknownUnit) || !strings.Contains(err.Error(), c.suggest) {
			t.Errorf("Parse(%q): %v; want ErrUnknownUnit suggesting %s", c.in, err, c.suggest)
		}
	}
}

// TestCaseVariantsOfEverySpelling: the upper- and lower-case forms of every
// registered spelling either are registered themselves, or read as the same
// unit, or are refused as ambiguous with the spelling among the readings.
func TestCaseVariantsOfEverySpelling(t *testing.T) {
	for s, i := range spellings {
		r0, n := utf8.DecodeRuneInString(s)
		for _, v := range []string{strings.ToUpper(s), strings.ToLower(s), string(unicode.ToUpper(r0)) + s[n:]} {
			if _, exact := spellings[v]; exact || isTwin(v) {
				continue // a registered spelling, or a prefix twin ("Mm"), which reads literally
			}
			r, f := resolveUnit(v)
			u := &unitTable[i]
			switch {
			case f.err == ErrAmbiguous:
				if !strings.Contains(f.detail, `"`+s+`"`) && !strings.Contains(f.detail, `"`+u.sym+`"`) {
					t.Errorf("%q (of %q): %s; want %q among the readings", v, s, f.detail, s)
				}
			case f.err != nil:
				t.Errorf("%q (of %q): %v %s", v, s, f.err, f.detail)
			case r != resolvedOf(u):
				t.Errorf("%q (of %q) reads as %+v, want %+v", v, s, r, resolvedOf(u))
			}
		}
	}
}

// isTwin reports whether v is the m/M prefix twin of a registered spelling.
func isTwin(v string) bool {
	var buf [maxFold]byte
	for _, t := range folds[string(appendFold(buf[:0], v))].twins {
		if t == v {
			return true
		}
	}
	return false
}

// BenchmarkParseCaseFallback: the fallback runs only when the exact look-up
// misses, so "55 bar" costs what it did before the fallback existed (compare
// with BenchmarkParsePressure/55_bar and strconv in the same run), and a
// folded spelling costs one more look-up on the general path.
func BenchmarkParseCaseFallback(b *testing.B) {
	for _, s := range []string{"55 bar", "55 BAR", "3000 PSI"} {
		b.Run(s, func(b *testing.B) {
			b.ReportAllocs()
			for b.Loop() {
				sinkPressure, sinkErr = ParsePressure(s)
			}
		})
	}
}
