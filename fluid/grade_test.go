package fluid

import (
	"encoding/json"
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// ISO 3448:1992 Table 1 [S]: min / mid / max at 40 °C, mm²/s.
// Compared exactly: the package stores the printed figures.
func TestGradesISO3448(t *testing.T) {
	want := []struct {
		g             Grade
		min, mid, max float64
	}{
		{VG2, 1.98, 2.2, 2.42}, {VG3, 2.88, 3.2, 3.52}, {VG5, 4.14, 4.6, 5.06},
		{VG7, 6.12, 6.8, 7.48}, {VG10, 9.0, 10, 11.0}, {VG15, 13.5, 15, 16.5},
		{VG22, 19.8, 22, 24.2}, {VG32, 28.8, 32, 35.2}, {VG46, 41.4, 46, 50.6},
		{VG68, 61.2, 68, 74.8}, {VG100, 90, 100, 110}, {VG150, 135, 150, 165},
		{VG220, 198, 220, 242}, {VG320, 288, 320, 352}, {VG460, 414, 460, 506},
		{VG680, 612, 680, 748}, {VG1000, 900, 1000, 1100}, {VG1500, 1350, 1500, 1650},
	}
	gs := Grades()
	if len(gs) != len(want) {
		t.Fatalf("%d grades, want %d", len(gs), len(want))
	}
	for i, w := range want {
		g := gs[i]
		if g != w.g || g.Min() != mm2s(w.min) || g.Mid() != mm2s(w.mid) || g.Max() != mm2s(w.max) {
			t.Errorf("%v: %v / %v / %v, want %g / %g / %g", g, g.Min(), g.Mid(), g.Max(), w.min, w.mid, w.max)
		}
		// ±10 % of the midpoint (ISO 3448), to the printed rounding.
		if !checktest.Close(float64(g.Min()), 0.9*float64(g.Mid()), 1e-12) || !checktest.Close(float64(g.Max()), 1.1*float64(g.Mid()), 1e-12) {
			t.Errorf("%v: limits not ±10 %% of midpoint", g)
		}
	}
	if Grade(47).Valid() || Grade(47).Mid() != 0 || Grade(0).Valid() {
		t.Error("VG 47 or 0 reported valid")
	}
}

func TestGradeOf(t *testing.T) {
	cases := []struct {
		v    float64
		want Grade
	}{
		// midpoints
		{46, VG46}, {2.2, VG2}, {1500, VG1500},
		// limits are inside the grade
		{41.4, VG46}, {50.6, VG46}, {1.98, VG2}, {1650, VG1500}, {28.8, VG32}, {35.2, VG32},
	}
	for _, c := range cases {
		g, err := GradeOf(mm2s(c.v))
		if err != nil || g != c.want {
			t.Errorf("GradeOf(%g) = %v, %v; want %v", c.v, g, err, c.want)
		}
	}
	gaps := []struct {
		v    float64
		text string
	}{
		{38, "between VG 32 (max 35.2 mm²/s) and VG 46 (min 41.4 mm²/s)"},
		{35.3, "between VG 32"},
		{1.5, "below VG 2"},
		{2000, "above VG 1500"},
	}
	for _, c := range gaps {
		_, err := GradeOf(mm2s(c.v))
		if !errors.Is(err, ErrNoGrade) || !strings.Contains(err.Error(), c.text) {
			t.Errorf("GradeOf(%g) err = %v, want ErrNoGrade mentioning %q", c.v, err, c.text)
		}
	}
	for _, v := range []float64{0, -46, math.NaN(), math.Inf(1)} {
		_, err := GradeOf(mm2s(v))
		wantRangeError(t, err, "v40")
	}
}

func TestParseGrade(t *testing.T) {
	good := []struct {
		in   string
		want Grade
	}{
		// plain forms
		{"VG 46", VG46}, {"ISO VG 46", VG46}, {"VG46", VG46}, {"ISO VG46", VG46},
		// case, separators and surrounding spaces
		{"iso vg 68", VG68}, {"ISO-VG-32", VG32}, {"  VG 1500 ", VG1500}, {"ISO  VG  2", VG2},
		// as data sheets also write them: without VG, or the number alone
		{"ISO 46", VG46}, {"iso-68", VG68}, {"46", VG46}, {" 220 ", VG220},
	}
	for _, c := range good {
		g, err := ParseGrade(c.in)
		if err != nil || g != c.want {
			t.Errorf("ParseGrade(%q) = %v, %v; want %v", c.in, g, err, c.want)
		}
	}
	bad := []struct {
		in  string
		pos int
		err error
	}{
		// malformed
		{"", 0, units.ErrSyntax},
		{"ISO", 3, units.ErrSyntax},
		{"ISO46", 3, units.ErrSyntax},
		{"46 VG", 3, units.ErrSyntax},
		{"VG", 2, units.ErrSyntax},
		{"VG -46", 3, units.ErrSyntax},
		{"VG 046", 3, units.ErrSyntax},
		{"VG 46 cSt", 6, units.ErrSyntax},
		{"ISOVG 46", 3, units.ErrSyntax},
		{"VG 4.6", 4, units.ErrSyntax},
		{"SAE 10W", 0, units.ErrSyntax},
		// well formed, not a grade
		{"VG 47", 3, ErrNoGrade},
		{"47", 0, ErrNoGrade},
		{"ISO 47", 4, ErrNoGrade},
		{"VG 0", 3, units.ErrSyntax},
		{"VG 99999999999999999999", 3, ErrNoGrade},
	}
	for _, c := range bad {
		_, err := ParseGrade(c.in)
		var pe *units.ParseError
		if !errors.As(err, &pe) || !errors.Is(err, c.err) || pe.Pos != c.pos || pe.Input != c.in {
			t.Errorf("ParseGrade(%q) err = %#v, want %v at %d", c.in, err, c.err, c.pos)
			continue
		}
		if !strings.Contains(err.Error(), `"`+c.in+`"`) {
			t.Errorf("error %q does not quote the input", err)
		}
	}
}

func TestGradeTextRoundTrip(t *testing.T) {
	for _, g := range Grades() {
		back, err := ParseGrade(g.String())
		if err != nil || back != g {
			t.Errorf("%v → %q → %v, %v", g, g.String(), back, err)
		}
	}
	type doc struct{ Oil Grade }
	b, err := json.Marshal(doc{VG46})
	if err != nil || string(b) != `{"Oil":"VG 46"}` {
		t.Fatalf("json = %s, %v", b, err)
	}
	var d doc
	if err := json.Unmarshal([]byte(`{"Oil":"ISO VG 68"}`), &d); err != nil || d.Oil != VG68 {
		t.Errorf("unmarshal = %v, %v", d.Oil, err)
	}
	if err := json.Unmarshal([]byte(`{"Oil":"VG 47"}`), &d); !errors.Is(err, ErrNoGrade) {
		t.Errorf("unmarshal VG 47: %v", err)
	}
	if _, err := Grade(47).MarshalText(); !errors.Is(err, ErrNoGrade) {
		t.Errorf("MarshalText(47): %v", err)
	}
	if s := Grade(47).String(); s != "Grade(47)" {
		t.Errorf("String = %q", s)
	}
}

func FuzzParseGrade(f *testing.F) {
	for _, s := range []string{"VG 46", "ISO VG 46", "iso-vg-1500", "VG 47", "VG", "", "ISO VG 0046", "VG 9999999999999999"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		g, err := ParseGrade(s)
		if err != nil {
			var pe *units.ParseError
			if !errors.As(err, &pe) || pe.Pos < 0 || pe.Pos > len(s) {
				t.Fatalf("ParseGrade(%q): bad error %#v", s, err)
			}
			if !errors.Is(err, units.ErrSyntax) && !errors.Is(err, ErrNoGrade) {
				t.Fatalf("ParseGrade(%q): error %v matches no sentinel", s, err)
			}
			return
		}
		if !g.Valid() {
			t.Fatalf("ParseGrade(%q) = invalid %d", s, g)
		}
		if back, err := ParseGrade(g.String()); err != nil || back != g {
			t.Fatalf("round trip %v: %v, %v", g, back, err)
		}
	})
}

// ISO 3448:1992 [S]: VG 2 starts at 1.98 mm²/s and VG 1500
// ends at 1650 mm²/s; the limits belong to the grade, beyond them no grade.
func TestGradeOfEnds(t *testing.T) {
	for _, c := range []struct {
		v    units.KinematicViscosity
		want Grade
	}{
		{mm2s(1.98), VG2}, {mm2s(1650), VG1500},
		{mm2s(1.98 * (1 - 1e-9)), 0}, {mm2s(1650 * (1 + 1e-9)), 0},
	} {
		g, err := GradeOf(c.v)
		if g != c.want || (c.want == 0) != errors.Is(err, ErrNoGrade) {
			t.Errorf("GradeOf(%v) = %v, %v; want %v", c.v, g, err, c.want)
		}
	}
}

// ISO 3448 designates a grade "ISO VG 46"; ParseGrade read that form but
// nothing wrote it.
func TestGradeDesignation(t *testing.T) {
	for _, g := range Grades() {
		s := g.Designation()
		if s != "ISO "+g.String() {
			t.Errorf("%v: Designation %q", g, s)
		}
		if back, err := ParseGrade(s); err != nil || back != g {
			t.Errorf("ParseGrade(%q) = %v, %v", s, back, err)
		}
	}
	if s := Grade(47).Designation(); s != "Grade(47)" {
		t.Errorf("invalid grade: %q", s)
	}
}

// GradeOf put the upper limit of nine grades in the gap above them when the
// viscosity was written in m²/s: 50.6e-6 m²/s is 50.60000000000001 mm²/s in
// float64. ISO 3448:1992, Table 1: limits are midpoint ± 10 % and belong to
// the grade [S].
func TestGradeLimitsInSI(t *testing.T) {
	for _, r := range iso3448 {
		for _, x := range []float64{r.min, r.max} {
			for _, v := range []units.KinematicViscosity{
				units.KinematicViscosity(x * 1e-6),
				units.KinematicViscosity(x / 1e6),
				units.KinematicViscosity(x) * units.Centistokes,
			} {
				if g, err := GradeOf(v); g != r.g || err != nil {
					t.Errorf("GradeOf(%v m²/s) = %v, %v; want %v", float64(v), g, err, r.g)
				}
			}
		}
	}
	// Just outside a limit (1 part in 10⁹) is still in the gap.
	for _, v := range []float64{35.2 * (1 + 1e-9), 41.4 * (1 - 1e-9)} {
		if g, err := GradeOf(units.KinematicViscosity(v) * units.SquareMillimetrePerSecond); !errors.Is(err, ErrNoGrade) {
			t.Errorf("GradeOf(%v mm²/s) = %v, %v; want ErrNoGrade", v, g, err)
		}
	}
}

// TestParseClassGrade: a class with a grade, as data sheets write them.
func TestParseClassGrade(t *testing.T) {
	for _, c := range []struct {
		in    string
		class Class
		grade Grade
	}{
		{"HM 46", HM, VG46}, {"HM46", HM, VG46}, {"hm 46", HM, VG46}, {"HV-68", HV, VG68},
		{"ISO HM 46", HM, VG46}, {"HM ISO VG 46", HM, VG46}, {"HM VG46", HM, VG46},
		{"HFC 46", HFC, VG46}, {"HFDU 68", HFDU, VG68}, {"  HEES 46 ", HEES, VG46},
	} {
		class, grade, err := ParseClassGrade(c.in)
		if err != nil || class != c.class || grade != c.grade {
			t.Errorf("ParseClassGrade(%q) = %v, %v, %v; want %v, %v", c.in, class, grade, err, c.class, c.grade)
		}
	}
	for _, c := range []struct {
		in     string
		pos    int
		err    error
		detail string
	}{
		{"HLP 46", 0, units.ErrSyntax, "HM, HV, HFC, HFDU or HEES"},
		{"46", 0, units.ErrSyntax, "ISO 6743-4 class"},
		{"HM", 2, units.ErrSyntax, ""},
		{"HM 47", 3, ErrNoGrade, ""},
		{"HM 46 extra", 6, units.ErrSyntax, ""},
		{"ISOHM 46", 3, units.ErrSyntax, ""},
	} {
		class, grade, err := ParseClassGrade(c.in)
		var pe *units.ParseError
		if !errors.As(err, &pe) || !errors.Is(err, c.err) || pe.Pos != c.pos || pe.Func != "fluid.ParseClassGrade" ||
			!strings.Contains(err.Error(), c.detail) || class != 0 || grade != 0 {
			t.Errorf("ParseClassGrade(%q) = %v, %v, %#v; want %v at %d", c.in, class, grade, err, c.err, c.pos)
		}
	}
}

func FuzzParseClassGrade(f *testing.F) {
	for _, s := range []string{"HM 46", "HV-68", "ISO HM 46", "HM ISO VG 46", "HLP 46", "HM", "", "HM 47", "hfdu 1500"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		class, grade, err := ParseClassGrade(s)
		if err != nil {
			var pe *units.ParseError
			if !errors.As(err, &pe) || pe.Pos < 0 || pe.Pos > len(s) || (!errors.Is(err, units.ErrSyntax) && !errors.Is(err, ErrNoGrade)) {
				t.Fatalf("ParseClassGrade(%q): bad error %#v", s, err)
			}
			if class != 0 || grade != 0 {
				t.Fatalf("ParseClassGrade(%q) = %v, %v with an error", s, class, grade)
			}
			return
		}
		if !grade.Valid() || classNamed(class.String()) != class {
			t.Fatalf("ParseClassGrade(%q) = %v, %v", s, class, grade)
		}
		if c2, g2, err := ParseClassGrade(class.String() + " " + grade.Designation()); err != nil || c2 != class || g2 != grade {
			t.Fatalf("ParseClassGrade(%q) does not read back: %v %v %v", s, c2, g2, err)
		}
	})
}
