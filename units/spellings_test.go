package units

import (
	"errors"
	"math"
	"strings"
	"testing"
)

// messyCase is one input as a quoting form, a data sheet or a gauge writes
// it, and the typed value it must give: x units of the unit whose SI factor
// is unit. The wanted value is x·unit computed in float64 at run time, the
// one rounding the parser makes, so the comparison is exact (==).
type messyCase struct {
	in    string
	parse func(string) (float64, error)
	x     float64
	unit  float64
}

var (
	pPressure = parseErr(ParsePressure)
	pAbs      = parseErr(ParseAbsolutePressure)
	pForce    = parseErr(ParseForce)
	pMass     = parseErr(ParseMass)
	pLength   = parseErr(ParseLength)
	pVolume   = parseErr(ParseVolume)
	pFlow     = parseErr(ParseFlow)
	pSpeed    = parseErr(ParseRotationalSpeed)
	pTorque   = parseErr(ParseTorque)
	pDynamic  = func(s string) (float64, error) { q, err := Parse(s); return q.Value(), err }
)

// messySpellings were tried as a new user would: every row failed, or gave
// a wrong value, before the spellings were added.
var messySpellings = []messyCase{
	// Differential pressure: the same factors, read as a Pressure.
	{"25 psid", pPressure, 25, float64(PSI)},
	{"25 psi(d)", pPressure, 25, float64(PSI)},
	{"1.5 bard", pPressure, 1.5, float64(Bar)},
	{"1.5 bar(d)", pPressure, 1.5, float64(Bar)},
	{"40 kPa d", pPressure, 40, float64(Kilopascal)},
	{"40 kPa(d)", pPressure, 40, float64(Kilopascal)},
	// Vacuum gauge readings: negative gauge pressures.
	{"28 inHg vac", pPressure, -28, float64(InchOfMercury)},
	{"28 inHgV", pPressure, -28, float64(InchOfMercury)},
	{"28 in Hg vacuum", pPressure, -28, float64(InchOfMercury)},
	{`28 "Hg vac`, pPressure, -28, float64(InchOfMercury)},
	{"600 mmHg vac", pPressure, -600, float64(MillimetreOfMercury)},
	{"60 kPa vac", pPressure, -60, float64(Kilopascal)},
	{"0.8 bar vac", pPressure, -0.8, float64(Bar)},
	{"5 psi vac", pPressure, -5, float64(PSI)},
	{"0 inHg vac", pPressure, 0, float64(InchOfMercury)},
	// Barometric readings: absolute.
	{"29.92 inHg", pAbs, 29.92, float64(InchOfMercury)},
	{"720 mmHg", pAbs, 720, float64(MillimetreOfMercury)},
	{"500 Torr", pAbs, 500, float64(Torr)},
	{"500 torr", pAbs, 500, float64(Torr)},
	// Gauge readings in kg/cm², as gauges print kgf/cm².
	{"7 kg/cm²", pPressure, 7, float64(KilogramForcePerSquareCentimetre)},
	{"7 kg/cm2", pPressure, 7, float64(KilogramForcePerSquareCentimetre)},
	// Loads as they are spoken.
	{"50 tf", pForce, 50, float64(TonneForce)},
	{"50 tonne-force", pForce, 50, float64(TonneForce)},
	{"50 t-force", pForce, 50, float64(TonneForce)},
	{"50 US tonf", pForce, 50, float64(ShortTonForce)},
	{"50 ton(US)", pForce, 50, float64(ShortTonForce)},
	{"50 short ton-force", pForce, 50, float64(ShortTonForce)},
	{"50 UK tonf", pForce, 50, float64(LongTonForce)},
	{"50 long ton-force", pForce, 50, float64(LongTonForce)},
	{"110000 lb", pForce, 110000, float64(PoundForce)},
	{"110000 lbs", pForce, 110000, float64(PoundForce)},
	{"110000 lbs", pMass, 110000, float64(PoundMass)},
	// Lengths, volumes and flows in words.
	{"10 microns", pLength, 10, float64(Micrometre)},
	{"5 gallons", pVolume, 5, float64(USGallon)},
	{"20 litres", pVolume, 20, float64(Litre)},
	{"5 litres/min", pFlow, 5, float64(LitrePerMinute)},
	{"5 liters per minute", pFlow, 5, float64(LitrePerMinute)},
	{"12 gph", pFlow, 12, float64(USGallon) / 3600},
	{"12 gal/hr", pFlow, 12, float64(USGallon) / 3600},
	// Shaft speeds as nameplates write them.
	{"1450 min-1", pSpeed, 1450, float64(RevolutionPerMinute)},
	{"1450 1/min", pSpeed, 1450, float64(RevolutionPerMinute)},
	{"1450 U/min", pSpeed, 1450, float64(RevolutionPerMinute)},
	// Fractions and mixed numbers, as US lengths are written.
	{"1-1/2 in", pLength, 1.5, float64(Inch)},
	{"1 1/2 in", pLength, 1.5, float64(Inch)},
	{"1/2 in", pLength, 0.5, float64(Inch)},
	{"3/8 in", pLength, 0.375, float64(Inch)},
	{"3/8in", pLength, 0.375, float64(Inch)},
	{"1/3 in", pLength, 1.0 / 3, float64(Inch)},
	{"-1/2 in", pLength, -0.5, float64(Inch)},
	{"2-3/4 inch", pLength, 2.75, float64(Inch)},
	{"1/2 gpm", pFlow, 0.5, float64(USGallonPerMinute)},
	{"3/4 hp", parseErr(ParsePower), 0.75, float64(Horsepower)},
	{"9 1/min", pSpeed, 9, float64(RevolutionPerMinute)}, // a unit 1/min, not a mixed number
	// Inch and foot marks.
	{`1.5"`, pLength, 1.5, float64(Inch)},
	{`1.5 "`, pLength, 1.5, float64(Inch)},
	{`1-1/2"`, pLength, 1.5, float64(Inch)},
	{"1.5″", pLength, 1.5, float64(Inch)},
	{"6'", pLength, 6, float64(Foot)},
	{"6′", pLength, 6, float64(Foot)},
	// Feet and inches together: (12·ft + in) inches.
	{`2' 6"`, pLength, 30, float64(Inch)},
	{`2'6"`, pLength, 30, float64(Inch)},
	{"2 ft 6 in", pLength, 30, float64(Inch)},
	{"2ft 6in", pLength, 30, float64(Inch)},
	{"2 feet 6 inches", pLength, 30, float64(Inch)},
	{"5 ft 3-1/2 in", pLength, 63.5, float64(Inch)},
	{`5' 3-1/2"`, pLength, 63.5, float64(Inch)},
	{"2 ft 6.5 in", pLength, 30.5, float64(Inch)},
	{"-2 ft 6 in", pLength, -30, float64(Inch)},
	{"2 FT 6 IN", pLength, 30, float64(Inch)},
	// Torque written with lb for lbf.
	{"35 ft.lb", pTorque, 35, float64(PoundForceFoot)},
	{"35 ft·lb", pTorque, 35, float64(PoundForceFoot)},
	{"35 lb ft", pTorque, 35, float64(PoundForceFoot)},
	{"300 in.lb", pTorque, 300, float64(PoundForceInch)},
}

// messyTemperatures are temperature points, read with their offsets.
var messyTemperatures = []struct {
	in   string
	want Temperature
}{
	{"40 ºC", TemperatureFromCelsius(40)}, // º is the ordinal indicator, not the degree sign
	{"40 ° C", TemperatureFromCelsius(40)},
	{"104 ° F", TemperatureFromFahrenheit(104)},
	{"104 ºF", TemperatureFromFahrenheit(104)},
}

// TestSayboltSeconds: "150 SUS" reads through ASTM D2161 at 100 °F, the
// equation shared with fluid.ViscosityFromSaybolt (internal/saybolt).
// ASTM D2161, Appendix X1: 700 SUS is 151.0891 mm²/s, to the printed 4
// decimals; the trade's 150 SUS for an ISO VG 32 oil is 31.89 mm²/s by the
// equation (to the 2 decimals of its check, 32 mm²/s → 150.49 SUS).
func TestSayboltSeconds(t *testing.T) {
	for _, c := range []struct {
		in   string
		want float64 // mm²/s
		tol  float64
	}{
		{"700 SUS", 151.0891, 5e-5},
		{"700 SSU", 151.0891, 5e-5},
		{"150 SUS", 31.8915, 5e-5},
		{"150 sus", 31.8915, 5e-5},
		{"150 SUS at 100 °F", 31.8915, 5e-5},
		{"4632 SUS", 1000, 1e-9}, // the linear form above 500 mm²/s: SUS = 4.632ν
	} {
		v, err := ParseKinematicViscosity(c.in)
		if err != nil || math.Abs(v.SquareMillimetresPerSecond()-c.want) > c.tol {
			t.Errorf("ParseKinematicViscosity(%q) = %.6f mm²/s, %v; want %g", c.in, v.SquareMillimetresPerSecond(), err, c.want)
		}
	}
	for _, c := range []struct {
		in     string
		parse  func(string) (float64, error)
		want   error
		detail string
	}{
		{"20 SUS", parseErr(ParseKinematicViscosity), ErrRange, "31.95 SUS"},
		{"-150 SUS", parseErr(ParseKinematicViscosity), ErrRange, "ASTM D2161"},
		{"150 SUS", pDynamic, ErrUnknownUnit, "ParseKinematicViscosity reads it"},
		{"50 ton", pDynamic, ErrUnknownUnit, "a ton is ambiguous"},
		{"150 SUS", pPressure, ErrUnknownUnit, ""},
	} {
		v, err := c.parse(c.in)
		if !errors.Is(err, c.want) || v != 0 || !strings.Contains(err.Error(), c.detail) {
			t.Errorf("parse %q = %g, %v; want %v saying %q", c.in, v, err, c.want, c.detail)
		}
	}
}

func TestMessySpellings(t *testing.T) {
	for _, c := range messySpellings {
		got, err := c.parse(c.in)
		x := c.x
		if want := x * c.unit; err != nil || got != want {
			t.Errorf("parse %q = %.17g, %v; want %.17g", c.in, got, err, want)
		}
	}
	for _, c := range messyTemperatures {
		got, err := ParseTemperature(c.in)
		if err != nil || math.Abs(float64(got-c.want)) > 1e-13 {
			t.Errorf("ParseTemperature(%q) = %.17g K, %v; want %.17g K", c.in, float64(got), err, float64(c.want))
		}
	}
}

// messyRefusals are spellings that could mean more than one thing, or that
// name the wrong kind of quantity: each error says what to write.
var messyRefusals = []struct {
	in     string
	parse  func(string) (float64, error)
	want   error
	detail []string // pieces of the message
}{
	// A plain mercury column is barometric: never a gauge reading.
	{"28 inHg", pPressure, ErrReference, []string{"barometric", `"inHg vac"`, "AbsolutePressure"}},
	{"28 in Hg", pPressure, ErrReference, []string{`"inHg vac"`}},
	{`28 "Hg`, pPressure, ErrReference, []string{`"inHg vac"`}},
	{"720 mmHg", pPressure, ErrReference, []string{`"mmHg vac"`}},
	{"500 Torr", pPressure, ErrReference, []string{"AbsolutePressure"}},
	// A vacuum reading is not absolute, not negative, and stands alone.
	{"28 inHg vac", pAbs, ErrReference, []string{"gauge pressure spelling"}},
	{"-5 inHg vac", pPressure, ErrRange, []string{"never negative"}},
	{"5 inHg vac/s", pDynamic, ErrSyntax, []string{"stands alone"}},
	// A difference has no reference to vacuum.
	{"25 psid", pAbs, ErrReference, []string{"differential"}},
	// Mixed references in one expression.
	{"2 psia·bar/psi", pDynamic, ErrReference, []string{"mixes absolute and gauge"}},
	{"2 (psia)", pPressure, ErrReference, []string{"absolute pressure spelling"}},
	// Tons and kilograms are not forces until they say which.
	{"50 ton", pForce, ErrAmbiguous, []string{`"tf"`, `"US tonf"`, "2000 lbf", "1000 kgf"}},
	{"50 t", pForce, ErrAmbiguous, []string{`"tf"`, `"US tonf"`}},
	{"50 tons", pForce, ErrAmbiguous, []string{`"tf"`}},
	{"50 tonf", pForce, ErrAmbiguous, []string{`"US tonf"`}},
	{"50 TON", pForce, ErrAmbiguous, []string{`"tf"`}},
	{"50 ton", pMass, ErrAmbiguous, []string{`"t"`, "2000 lb"}},
	{"500 kg", pForce, ErrDimension, []string{`"kgf"`}},
	// Fractions: whole numbers, a denominator, a proper fraction in a mixed number.
	{"1/0 in", pLength, ErrRange, []string{"denominator 0"}},
	{"1 3/2 in", pLength, ErrSyntax, []string{"less than one"}},
	{"1.5/2 in", pLength, ErrSyntax, []string{"whole numbers"}},
	{"12345678/2 in", pLength, ErrRange, []string{"more than 7 digits"}},
	{"1/12345678 in", pLength, ErrRange, []string{"more than 7 digits"}},
	// Feet without inches after them, or inches with a sign.
	{"2 ft 6", pLength, ErrSyntax, []string{"want inches after the feet"}},
	{"2 ft 6 mm", pLength, ErrSyntax, []string{"want inches after the feet"}},
	{"2 ft -6 in", pLength, ErrSyntax, nil},
	{"2 ft 6 in", pDynamic, ErrSyntax, nil}, // feet and inches are a Length only
}

func TestMessyRefusals(t *testing.T) {
	for _, c := range messyRefusals {
		v, err := c.parse(c.in)
		if !errors.Is(err, c.want) || v != 0 {
			t.Errorf("parse %q = %g, %v; want 0 and %v", c.in, v, err, c.want)
			continue
		}
		for _, d := range c.detail {
			if !strings.Contains(err.Error(), d) {
				t.Errorf("parse %q: %v; want the message to say %s", c.in, err, d)
			}
		}
	}
}
