package fluid_test

import (
	"errors"
	"fmt"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/units"
)

// An outdoor log loader starts at −20 °C and runs up to 70 °C. With the
// common-practice window no HV grade spans the duty; the pump maker allows
// 1600 mm²/s at a low-speed cold start, and with that limit VG 32 fits,
// with a few kelvins of margin at either end: too few at the cold end, so
// the candidate carries a caution a report can show in either unit system.
func ExampleSelectGrades() {
	site := fluid.Site{
		MinStart:   units.TemperatureFromCelsius(-20),
		MaxRunning: units.TemperatureFromCelsius(70),
	}
	const vi = 160 // HV oil from the data sheet
	_, err := fluid.SelectGrades(site, vi, fluid.DefaultWindow())
	fmt.Println(errors.Is(err, fluid.ErrNoGrade))
	fmt.Println(err)

	w := fluid.DefaultWindow()
	w.Max = 1600 * units.SquareMillimetrePerSecond // pump maker's cold-start limit
	cs, err := fluid.SelectGrades(site, vi, w)
	if err != nil {
		fmt.Println(err)
		return
	}
	us := units.USCustomary()
	for _, c := range cs {
		fmt.Printf("%v: start %v (≤ %v), running %v (≥ %v)\n",
			c.Grade, c.Start.Value, c.Start.Limit, c.Running.Value, c.Running.Limit)
		for _, f := range c.Findings {
			fmt.Println(f)
			fmt.Println(f.Text(us))
		}
	}
	// Output:
	// true
	// fluid.SelectGrades: no grade VG 10–150 of VI 160 stays in the viscosity window from -20 °C start to 70 °C running; the nearest, VG 32, misses the start by 2.567 K: no matching ISO 3448 viscosity grade
	// VG 32: start 1259 mm²/s (≤ 1600 mm²/s), running 11.52 mm²/s (≥ 10 mm²/s)
	// caution (cold start): The -20 °C start is only 2.567 K above the temperature at which VG 32 reaches the cold-start limit of 1600 mm²/s.
	// The -4 °F start is only 4.62 °F above the temperature at which VG 32 reaches the cold-start limit of 1600 cSt.
	// notice: At 70 °C running, VG 32 is at 11.52 mm²/s, below the optimum band of 16 mm²/s to 36 mm²/s: expect more leakage and wear.
	// At 158 °F running, VG 32 is at 11.52 cSt, below the optimum band of 16 cSt to 36 cSt: expect more leakage and wear.
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
	// fluid.GradeOf: v40 = 38 mm²/s at 40 °C lies between VG 32 (max 35.2 mm²/s) and VG 46 (min 41.4 mm²/s): no matching ISO 3448 viscosity grade
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
// summer; the site's findings go on the report beside the grade, and a
// program can act on their hazard kinds without reading the text.
func ExampleSite_Findings() {
	site := fluid.Site{
		MinStart:   units.TemperatureFromCelsius(-20),
		MaxRunning: units.TemperatureFromCelsius(70),
	}
	fs := site.Findings()
	for _, f := range fs {
		fmt.Println(f)
	}
	fmt.Println(len(fs.Hazard(components.HotSurface)), fs[0].Rule)
	// Output:
	// caution (hot surface): Oil running at 70 °C is above the 60 °C pump inlet limit: add cooling or confirm the pump maker's limit, and guard against burns from hot oil, tank and lines.
	// caution (cold start): A start at -20 °C needs a warm-up at low speed and pressure before full load, against pump cavitation and seal damage.
	// 1 standard: ISO 4413:2010, fluid temperature at the pump inlet
}

// A test-rig clamp's oil is a typical HV 46 whose supplier states a pour
// point of −39 °C: the fluid is rebuilt from its data sheet with that
// figure, so its span can never disagree with it.
func ExampleFluid_DataSheet() {
	f, _ := fluid.Typical(fluid.HV, fluid.VG46)
	d := f.DataSheet()
	d.Name, d.PourPoint = "test-rig clamp oil", units.TemperatureFromCelsius(-39)
	f, err := fluid.FromDataSheet(d)
	if err != nil {
		fmt.Println(err)
		return
	}
	s, _ := f.Span(fluid.DefaultWindow())
	g, _ := f.Grade()
	fmt.Printf("%s, %v, pour point %v: start from %v, run up to %v\n", f.Name(), g, f.PourPoint(), s.Cold, s.Hot)

	d.PourPoint = units.TemperatureFromCelsius(45) // a slip: above 40 °C
	_, err = fluid.FromDataSheet(d)
	fmt.Println(err)
	// Output:
	// test-rig clamp oil, VG 46, pour point -39 °C: start from -11.7 °C, run up to 90.24 °C
	// fluid.FromDataSheet: PourPoint = 45 °C is out of range: want 0 (not known), or above 0 K and below 40 °C (V40 is measured on the flowing fluid)
}

// A data sheet's "HM 46": the ISO 6743-4 class and the ISO 3448 grade.
func ExampleParseClassGrade() {
	class, grade, err := fluid.ParseClassGrade("HM 46")
	fmt.Println(class, grade, err)
	g, _ := fluid.ParseGrade("ISO 68")
	fmt.Println(g.Designation(), g.Mid())
	// Output:
	// HM VG 46 <nil>
	// ISO VG 68 68 mm²/s
}
