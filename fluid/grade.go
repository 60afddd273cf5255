package fluid

import (
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ErrNoGrade reports that no ISO 3448 grade fits: a 40 °C viscosity between
// two grades' limits, a grade number that ISO 3448 does not define, or no
// grade whose window covers a site. It also matches units.ErrRange: the
// value given lies outside what the function accepts.
var ErrNoGrade error = validate.Sentinel("no matching ISO 3448 viscosity grade")

// Grade is an ISO 3448 viscosity grade, identified by its number: VG46 is
// ISO VG 46. The zero Grade is not a grade (Valid reports false).
//
// Each grade has a midpoint kinematic viscosity at 40 °C and limits of
// ±10 % of it (ISO 3448:1992, Table 1).
type Grade uint16

// The ISO 3448 viscosity grades.
const (
	VG2    Grade = 2
	VG3    Grade = 3
	VG5    Grade = 5
	VG7    Grade = 7
	VG10   Grade = 10
	VG15   Grade = 15
	VG22   Grade = 22
	VG32   Grade = 32
	VG46   Grade = 46
	VG68   Grade = 68
	VG100  Grade = 100
	VG150  Grade = 150
	VG220  Grade = 220
	VG320  Grade = 320
	VG460  Grade = 460
	VG680  Grade = 680
	VG1000 Grade = 1000
	VG1500 Grade = 1500
)

// gradeRow is one row of ISO 3448:1992 Table 1, mm²/s at 40 °C, as printed.
type gradeRow struct {
	g             Grade
	min, mid, max float64
}

// iso3448 is ISO 3448:1992 Table 1 in ascending order.
var iso3448 = [...]gradeRow{
	{VG2, 1.98, 2.2, 2.42}, {VG3, 2.88, 3.2, 3.52}, {VG5, 4.14, 4.6, 5.06},
	{VG7, 6.12, 6.8, 7.48}, {VG10, 9.0, 10, 11.0}, {VG15, 13.5, 15, 16.5},
	{VG22, 19.8, 22, 24.2}, {VG32, 28.8, 32, 35.2}, {VG46, 41.4, 46, 50.6},
	{VG68, 61.2, 68, 74.8}, {VG100, 90, 100, 110}, {VG150, 135, 150, 165},
	{VG220, 198, 220, 242}, {VG320, 288, 320, 352}, {VG460, 414, 460, 506},
	{VG680, 612, 680, 748}, {VG1000, 900, 1000, 1100}, {VG1500, 1350, 1500, 1650},
}

// Grades returns the ISO 3448 grades in ascending order, VG 2 to VG 1500.
func Grades() []Grade {
	gs := make([]Grade, len(iso3448))
	for i, r := range iso3448 {
		gs[i] = r.g
	}
	return gs
}

func (g Grade) row() (gradeRow, bool) {
	for _, r := range iso3448 {
		if r.g == g {
			return r, true
		}
	}
	return gradeRow{}, false
}

// Valid reports whether g is one of the 18 ISO 3448 grades.
func (g Grade) Valid() bool { _, ok := g.row(); return ok }

// Mid returns the grade's midpoint kinematic viscosity at 40 °C (ISO 3448),
// or 0 when g is not a valid grade.
func (g Grade) Mid() units.KinematicViscosity { r, _ := g.row(); return mm2s(r.mid) }

// Min returns the grade's lower limit at 40 °C (midpoint − 10 %, ISO 3448),
// or 0 when g is not a valid grade.
func (g Grade) Min() units.KinematicViscosity { r, _ := g.row(); return mm2s(r.min) }

// Max returns the grade's upper limit at 40 °C (midpoint + 10 %, ISO 3448),
// or 0 when g is not a valid grade.
func (g Grade) Max() units.KinematicViscosity { r, _ := g.row(); return mm2s(r.max) }

func mm2s(v float64) units.KinematicViscosity {
	return units.KinematicViscosity(v) * units.SquareMillimetrePerSecond
}

// String returns "VG 46", or "Grade(47)" when g is not a valid grade.
func (g Grade) String() string {
	if !g.Valid() {
		return "Grade(" + strconv.Itoa(int(g)) + ")"
	}
	return "VG " + strconv.Itoa(int(g))
}

// MarshalText encodes g as "VG 46". It fails with ErrNoGrade when g is not
// a valid grade.
func (g Grade) MarshalText() ([]byte, error) {
	if !g.Valid() {
		return nil, &units.ParseError{Func: "fluid.Grade.MarshalText", Input: strconv.Itoa(int(g)), Err: ErrNoGrade}
	}
	return []byte(g.String()), nil
}

// UnmarshalText decodes any form ParseGrade accepts.
func (g *Grade) UnmarshalText(text []byte) error {
	v, err := parseGrade("Grade.UnmarshalText", string(text))
	if err != nil {
		return err
	}
	*g = v
	return nil
}

// GradeOf returns the ISO 3448 grade whose limits contain v40, the kinematic
// viscosity at 40 °C. ISO 3448's ±10 % bands leave gaps between grades
// (35.2 to 41.4 mm²/s between VG 32 and VG 46, for example); a viscosity in
// a gap, or outside 1.98–1650 mm²/s, gives an error matching ErrNoGrade that
// names the neighbouring grades. The limits belong to their grade (to
// round-off). Bad input matches units.ErrRange.
func GradeOf(v40 units.KinematicViscosity) (Grade, error) {
	return gradeOf("fluid.GradeOf", "v40", v40)
}

// gradeOf is GradeOf for function fn, naming the viscosity param.
func gradeOf(fn, param string, v40 units.KinematicViscosity) (Grade, error) {
	if err := validate.Positive(fn, param, v40); err != nil {
		return 0, err
	}
	v := v40.SquareMillimetresPerSecond()
	var below *gradeRow
	for i := range iso3448 {
		r := &iso3448[i]
		lo, hi := r.min*(1-limitSlack), r.max*(1+limitSlack)
		if v >= lo && v <= hi {
			return r.g, nil
		}
		if v > hi {
			below = r
		}
	}
	return 0, &GradeError{V40: v40, below: below, fn: fn, param: param}
}

// limitSlack widens each grade's limits by a relative 10⁻¹², far below the
// three digits ISO 3448 prints, so that a limit written in another unit
// (50.6e-6 m²/s is 50.60000000000001 mm²/s in float64) still counts as the
// limit, which ISO 3448 includes in the grade.
const limitSlack = 1e-12

// GradeError reports a 40 °C viscosity that lies in no ISO 3448 grade. It
// unwraps to ErrNoGrade and to a *units.RangeError naming v40, so it
// matches units.ErrRange.
type GradeError struct {
	V40       units.KinematicViscosity
	below     *gradeRow
	fn, param string // the function and parameter named; "" for GradeOf's
}

// names returns the function and the parameter the error names: GradeOf's
// v40 unless a method of Fluid failed.
func (e *GradeError) names() (fn, param string) {
	if e.fn == "" {
		return "fluid.GradeOf", "v40"
	}
	return e.fn, e.param
}

// Error implements the error interface.
func (e *GradeError) Error() string {
	fn, param := e.names()
	s := fn + ": " + param + " = " + e.V40.String() + " at 40 °C lies "
	switch {
	case e.below == nil:
		s += "below VG 2 (min 1.98 mm²/s)"
	case e.below.g == VG1500:
		s += "above VG 1500 (max 1650 mm²/s)"
	default:
		next := e.below.g.next()
		s += "between " + e.below.g.String() + " (max " + e.below.g.Max().String() +
			") and " + next.String() + " (min " + next.Min().String() + ")"
	}
	return s + ": " + ErrNoGrade.Error()
}

// Unwrap returns ErrNoGrade and the range error for v40.
func (e *GradeError) Unwrap() []error {
	fn, param := e.names()
	return []error{ErrNoGrade, validate.Fail(fn, param, e.V40, "within the limits of an ISO 3448 grade")}
}

func (g Grade) next() Grade {
	for i, r := range iso3448[:len(iso3448)-1] {
		if r.g == g {
			return iso3448[i+1].g
		}
	}
	return 0
}

// ParseGrade reads an ISO 3448 grade as data sheets write it. The grammar,
// letters in any case, surrounding spaces ignored:
//
//	grade = [ "ISO" sep ] [ "VG" [ sep ] ] number
//	sep   = one or more spaces, or one "-"
//
// so "VG 46", "ISO VG 46", "VG46", "iso vg 46", "ISO-VG-46", "ISO 46" and a
// bare "46" all give VG46. The number is plain decimal digits without sign
// or leading zero, and must be one of the 18 grades (ErrNoGrade).
func ParseGrade(s string) (Grade, error) { return parseGrade("ParseGrade", s) }

func parseGrade(fn, s string) (Grade, error) {
	p := gradeParser{s: s}
	p.spaces()
	return p.grade(fn)
}

// ParseClassGrade reads a hydraulic fluid as data sheets name it: an
// ISO 6743-4 class and an ISO 3448 grade. The grammar, letters in any case,
// surrounding spaces ignored:
//
//	fluid = [ "ISO" sep ] class [ sep ] grade
//
// with grade as in ParseGrade and class one of the classes this package
// knows (HM, HV, HFC, HFDU, HEES), so "HM 46", "HM46", "hv-68", "ISO HM 46"
// and "HM ISO VG 46" all read. An unknown class is an error matching
// units.ErrSyntax that lists the known ones; a grade ISO 3448 does not
// define matches ErrNoGrade. On error both results are zero.
func ParseClassGrade(s string) (Class, Grade, error) {
	const fn = "ParseClassGrade"
	p := gradeParser{s: s}
	p.spaces()
	if p.word("ISO") && !p.sep() {
		return 0, 0, p.fail(fn, units.ErrSyntax)
	}
	start := p.i
	for p.i < len(s) && (s[p.i]|0x20 >= 'a' && s[p.i]|0x20 <= 'z') {
		p.i++
	}
	c := classNamed(s[start:p.i])
	if c == 0 {
		p.i = start
		e := p.fail(fn, units.ErrSyntax)
		e.Detail = "want an ISO 6743-4 class: HM, HV, HFC, HFDU or HEES, then the ISO 3448 grade, as in HM 46"
		return 0, 0, e
	}
	p.sep()
	g, err := p.grade(fn)
	if err != nil {
		return 0, 0, err
	}
	return c, g, nil
}

// classNamed returns the class whose ISO 6743-4 symbol is name, letter case
// ignored, or 0.
func classNamed(name string) Class {
	for _, c := range []Class{HM, HV, HFC, HFDU, HEES} {
		if strings.EqualFold(c.String(), name) {
			return c
		}
	}
	return 0
}

// grade reads the grade production of ParseGrade from p.i to the end of
// the text (trailing spaces allowed).
func (p *gradeParser) grade(fn string) (Grade, error) {
	s := p.s
	if p.word("ISO") && !p.sep() {
		return 0, p.fail(fn, units.ErrSyntax)
	}
	if p.word("VG") {
		p.sep()
	}
	start := p.i
	n := 0
	for p.i < len(s) && s[p.i] >= '0' && s[p.i] <= '9' {
		n = min(n*10+int(s[p.i]-'0'), 100000) // saturate: no grade is that large
		p.i++
	}
	if p.i == start || (s[start] == '0') {
		p.i = start
		return 0, p.fail(fn, units.ErrSyntax)
	}
	p.spaces()
	if p.i != len(s) {
		return 0, p.fail(fn, units.ErrSyntax)
	}
	g := Grade(n)
	if n > 1500 || !g.Valid() {
		p.i = start
		return 0, p.fail(fn, ErrNoGrade)
	}
	return g, nil
}

type gradeParser struct {
	s string
	i int
}

func (p *gradeParser) spaces() bool {
	j := p.i
	for p.i < len(p.s) && p.s[p.i] == ' ' {
		p.i++
	}
	return p.i > j
}

func (p *gradeParser) sep() bool {
	if p.i < len(p.s) && p.s[p.i] == '-' {
		p.i++
		return true
	}
	return p.spaces()
}

func (p *gradeParser) word(w string) bool {
	if len(p.s)-p.i >= len(w) && strings.EqualFold(p.s[p.i:p.i+len(w)], w) {
		p.i += len(w)
		return true
	}
	return false
}

func (p *gradeParser) fail(fn string, err error) *units.ParseError {
	return &units.ParseError{Func: "fluid." + fn, Input: p.s, Pos: p.i, Err: err}
}

// Designation returns the grade as ISO 3448 designates it, "ISO VG 46", or
// "Grade(47)" when g is not a valid grade. ParseGrade reads it back.
func (g Grade) Designation() string {
	if !g.Valid() {
		return g.String()
	}
	return "ISO " + g.String()
}
