package fluid_test

import (
	"errors"
	"fmt"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/units"
)

// An outdoor log loader starts at −20 °C and runs up to 70 °C. With the
// common-practice window no HV grade spans the duty; the pump maker allows
// 1600 mm²/s at a low-speed cold start, and with that limit VG 32 fits,
// with a few kelvins of margin at either end.
func ExampleSelectGrades() {
	site := fluid.Site{
		MinStart:   units.TemperatureFromCelsius(-20),
		MaxRunning: units.TemperatureFromCelsius(70),
	}
	const vi = 160 // HV oil from the data sheet
	_, err := fluid.SelectGrades(site, vi, fluid.DefaultWindow())
	fmt.Println(errors.Is(err, fluid.ErrNoGrade))

	w := fluid.DefaultWindow()
	w.Max = 1600 * units.SquareMillimetrePerSecond // pump maker's cold-start limit
	cs, err := fluid.SelectGrades(site, vi, w)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, c := range cs {
		fmt.Println(c.Reason)
	}
	// Output:
	// true
	// VG 32: start 1259 mm²/s (max 1600 mm²/s, 2.6 K margin), running 11.52 mm²/s (min 10 mm²/s, 5.7 K margin); running viscosity below the optimum band (more leakage and wear)
}

// A service beside a PLC reads the tank temperature and needs the oil's
// viscosity there, from the two viscosities on the data sheet.
func ExampleCurve_At() {
	c, err := fluid.CurveThrough(
		units.TemperatureFromCelsius(40), 46.3*units.SquareMillimetrePerSecond,
		units.TemperatureFromCelsius(100), 7.9*units.SquareMillimetrePerSecond)
	if err != nil {
		fmt.Println(err)
		return
	}
	tank := units.TemperatureFromCelsius(52.5) // the PLC's reading
	v, err := c.At(tank)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.1f mm²/s at %v\n", v.SquareMillimetresPerSecond(), tank)
	// Output:
	// 28.7 mm²/s at 52.5 °C
}

// The VI of an oil from the 40 °C and 100 °C viscosities on its data sheet.
func ExampleViscosityIndex() {
	vi, err := fluid.ViscosityIndex(68.4*units.SquareMillimetrePerSecond, 9.05*units.SquareMillimetrePerSecond)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("VI %.2f, reported %v\n", vi, fluid.RoundVI(vi))
	// Output:
	// VI 107.03, reported 107
}

// The temperature at which a test-rig clamp's oil reaches 16 mm²/s, the
// low end of the optimum band.
func ExampleCurve_TemperatureFor() {
	c, _ := fluid.CurveFromVI(fluid.VG32.Mid(), 105)
	t, err := c.TemperatureFor(16 * units.SquareMillimetrePerSecond)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.1f °C\n", t.Celsius())
	// Output:
	// 58.5 °C
}

func ExampleGradeOf() {
	g, err := fluid.GradeOf(44.8 * units.SquareMillimetrePerSecond)
	fmt.Println(g, err)
	_, err = fluid.GradeOf(38 * units.SquareMillimetrePerSecond)
	fmt.Println(err)
	// Output:
	// VG 46 <nil>
	// fluid.GradeOf: 38 mm²/s at 40 °C lies between VG 32 (max 35.2 mm²/s) and VG 46 (min 41.4 mm²/s): no matching ISO 3448 viscosity grade
}

func ExampleParseGrade() {
	g, err := fluid.ParseGrade("ISO VG 68")
	fmt.Println(g, g.Min(), g.Max(), err)
	_, err = fluid.ParseGrade("VG 50")
	fmt.Println(err)
	// Output:
	// VG 68 61.2 mm²/s 74.8 mm²/s <nil>
	// fluid.ParseGrade: parsing "VG 50" at offset 3: no matching ISO 3448 viscosity grade
}

func ExampleSayboltSeconds() {
	s, _ := fluid.SayboltSeconds(32 * units.SquareMillimetrePerSecond)
	v, _ := fluid.ViscosityFromSaybolt(215)
	fmt.Printf("%.1f SUS; 215 SUS = %.2f mm²/s\n", s, v.SquareMillimetresPerSecond())
	// Output:
	// 150.5 SUS; 215 SUS = 46.18 mm²/s
}

// A baling press's oil, from its data sheet, at working temperature and
// pressure.
func ExampleFromDataSheet() {
	f, err := fluid.FromDataSheet(fluid.DataSheet{
		Name:      "baling press oil",
		Class:     fluid.HM,
		V40:       45.6 * units.SquareMillimetrePerSecond,
		V100:      6.9 * units.SquareMillimetrePerSecond,
		Density15: 872 * units.KilogramPerCubicMetre,
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	t, p := units.TemperatureFromCelsius(55), 210*units.Bar
	v, _ := f.Viscosity(t)
	rho, _ := f.Density(t, p)
	mu, _ := f.DynamicViscosity(t, p)
	k, _ := f.BulkModulus(fluid.IsentropicTangent, t, p)
	vi, _ := f.VI()
	fmt.Printf("VI %v; at %v and %v: %v, %v, %v, K %.2f GPa\n",
		fluid.RoundVI(vi), t, p, v, rho, mu, k.Megapascals()/1000)
	// Output:
	// VI 107; at 55 °C and 210 bar: 24.72 mm²/s, 862 kg/m³, 21.31 mPa·s, K 1.83 GPa
}

// A forestry crane slew: 0.5 % entrained air and a hose whose volumetric
// expansion gives a container modulus of 2500 bar (hose maker's figure).
func ExampleEffectiveBulk_At() {
	f, _ := fluid.Typical(fluid.HV, fluid.VG46)
	t, p := units.TemperatureFromCelsius(50), 120*units.Bar
	kl, _ := f.BulkModulus(fluid.IsentropicTangent, t, p)
	e := fluid.EffectiveBulk{
		Liquid:    kl,
		Container: 2500 * units.Bar,
		Air:       fluid.EntrainedAir{Fraction: 0.005, N: 1.4},
	}
	ke, err := e.At(p.Absolute(units.StandardAtmosphere))
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("liquid %.0f bar, effective %.0f bar\n", kl.Bar(), ke.Bar())
	// Output:
	// liquid 17707 bar, effective 2186 bar
}

// A log loader parked outdoors starts at −20 °C and its oil runs at 70 °C in
// summer; the site's cautions go on the report beside the grade.
func ExampleSite_Cautions() {
	site := fluid.Site{
		MinStart:   units.TemperatureFromCelsius(-20),
		MaxRunning: units.TemperatureFromCelsius(70),
	}
	for _, c := range site.Cautions() {
		fmt.Println(c)
	}
	// Output:
	// running oil at 70 °C is above the 60 °C pump inlet limit of ISO 4413: add cooling or confirm the pump maker's limit; hot oil and surfaces burn
	// starting at -20 °C: warm the oil at low speed and pressure before full load (cavitation and seal risk on a cold start)
}
