// Command tour is the short tour in README.md, kept here so that it is
// compiled and its printed values are tested (tour_test.go).
package main

import (
	"fmt"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/units"
)

func main() {
	// Typed quantities: the unit is in the type and in the constant.
	p := 210 * units.Bar
	q := 38 * units.LitrePerMinute
	fmt.Println(p.TimesFlow(q))                                  // 13.3 kW
	fmt.Println(units.USCustomary().FormatPower(p.TimesFlow(q))) // 17.84 hp

	// Text from a form, a file or a sensor tag.
	relief, err := units.ParsePressure("2750 psi")
	fmt.Println(relief, err) // 189.6 bar <nil>

	// Gauge and absolute pressure are different types; crossing needs an ambient.
	abs := (90 * units.Bar).Absolute(units.StandardAtmosphere)
	fmt.Println(abs) // 91.01 bara

	// Any unit expression, checked by dimension.
	h, _ := units.Convert(12, "W/(m²·K)", "BTU/(h·ft²·°F)")
	fmt.Printf("%.4f\n", h) // 2.1133

	// Oil at temperature (ASTM D341) through two data-sheet points.
	oil, _ := fluid.CurveThrough(
		units.TemperatureFromCelsius(40), 46*units.Centistokes,
		units.TemperatureFromCelsius(100), 6.8*units.Centistokes)
	nu, _ := oil.At(units.TemperatureFromCelsius(55))
	fmt.Println(nu) // 24.71 mm²/s
	vi, _ := fluid.ViscosityIndex(46*units.Centistokes, 6.8*units.Centistokes)
	fmt.Println(fluid.RoundVI(vi)) // 102 (ASTM D2270)

	// A particle counter's reading per mL at ≥4, ≥6 and ≥14 µm(c) as an ISO 4406 code.
	code, _ := contamination.CodeFromCounts(3000, 500, 7)
	fmt.Println(code) // 19/16/10
}
