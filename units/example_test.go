package units_test

import (
	"encoding/json"
	"errors"
	"fmt"
	"time"

	"github.com/hydrosize/hydrosize/units"
)

// A baling press's main pump: typed values, trade units, derived power.
func Example() {
	p := 210 * units.Bar
	q := 38 * units.LitrePerMinute
	fmt.Printf("%.0f psi, %.2f gpm\n", p.PSI(), q.USGallonsPerMinute())
	fmt.Println(p.TimesFlow(q))                                  // metric trade unit
	fmt.Println(units.USCustomary().FormatPower(p.TimesFlow(q))) // US customary
	// Output:
	// 3046 psi, 10.04 gpm
	// 13.3 kW
	// 17.84 hp
}

func ExamplePressure_In() {
	relief := 172 * units.Bar
	fmt.Printf("%.1f\n", relief.In(units.Megapascal))
	// Output: 17.2
}

func ExampleParsePressure() {
	p, err := units.ParsePressure("2500 psi")
	fmt.Printf("%.4f %v\n", p.Bar(), err)
	_, err = units.ParsePressure("2.5 bara")
	fmt.Println(errors.Is(err, units.ErrReference))
	_, err = units.ParsePressure("25 L/min")
	fmt.Println(errors.Is(err, units.ErrDimension))
	_, err = units.ParsePressure("25 bra")
	fmt.Println(err)
	// Output:
	// 172.3689 <nil>
	// true
	// true
	// units.ParsePressure: parsing "25 bra" at offset 3: unknown unit: no registered unit "bra"; did you mean "bar", "bara"?; want a unit of pressure such as bar, psi, Pa, kPa
}

func ExampleParse() {
	q, err := units.Parse("1.3 gal/min")
	if err != nil {
		fmt.Println(err)
		return
	}
	flow, err := q.Flow()
	fmt.Printf("%.3f L/min %v\n", flow.LitresPerMinute(), err)
	_, err = q.Pressure()
	fmt.Println(err)
	// Output:
	// 4.921 L/min <nil>
	// units.Quantity.Pressure: cannot convert m^3·s^-1 (volume flow) to Pressure (kg·m^-1·s^-2): dimension mismatch
}

func ExampleConvert() {
	h, _ := units.Convert(12, "W/(m²·K)", "BTU/(h·ft²·°F)")
	t, _ := units.Convert(60, "°C", "°F")
	d, _ := units.Convert(2.5, "in^3/rev", "cm³/rev")
	fmt.Printf("%.4f %.0f %.3f\n", h, t, d)
	// Output: 2.1133 140 40.968
}

func ExampleTemperature_Sub() {
	tank := units.TemperatureFromCelsius(55)
	ambient := units.TemperatureFromFahrenheit(77)
	rise := tank.Sub(ambient)
	fmt.Println(rise, units.USCustomary().FormatTemperatureDifference(rise))
	fmt.Println(ambient.Add(rise))
	// Output:
	// 30 K 54 °F
	// 55 °C
}

func ExamplePressure_Absolute() {
	precharge := 90 * units.Bar
	abs := precharge.Absolute(units.StandardAtmosphere) // say which ambient you assume
	fmt.Println(abs)
	fmt.Println(abs.Gauge(units.StandardAtmosphere))
	// Output:
	// 91.01 bara
	// 90 bar
}

// A test-rig clamp's report for a US shop that quotes torque in lbf·in, to
// three digits. The adjusted system is the caller's own copy: every other
// caller of USCustomary still gets lbf·ft.
func ExampleSystem() {
	shop, err := units.USCustomary().WithTorque("lbf·in")
	if err != nil {
		fmt.Println(err)
		return
	}
	shop, _ = shop.WithDigits(3)
	fmt.Println(shop.FormatTorque(85 * units.NewtonMetre))
	fmt.Println(shop.FormatFlow(60 * units.LitrePerMinute))
	fmt.Println(units.USCustomary().FormatTorque(85 * units.NewtonMetre))
	_, err = shop.WithPressure("psia")
	fmt.Println(err != nil)
	// Output:
	// 752 lbf·in
	// 15.9 gpm
	// 62.69 lbf·ft
	// true
}

func ExamplePressure_Format() {
	p := 137.5 * units.Bar
	fmt.Printf("%v|%.1f|%10.0f|%#v\n", p, p, p, 2*units.Bar)
	// Output: 137.5 bar|137.5 bar|   138 bar|200000 * units.Pascal
}

func ExamplePressure_MarshalText() {
	type setting struct {
		Relief units.Pressure `json:"relief"`
		Flow   units.Flow     `json:"flow"`
	}
	b, _ := json.Marshal(setting{Relief: 190 * units.Bar, Flow: 24 * units.LitrePerMinute})
	fmt.Println(string(b))
	var s setting
	err := json.Unmarshal([]byte(`{"relief":"2750 psi","flow":"6.5 gpm"}`), &s)
	fmt.Println(s.Relief, s.Flow, err)
	// Output:
	// {"relief":"190 bar","flow":"24 L/min"}
	// 189.6 bar 24.61 L/min <nil>
}

func ExampleDisplacement_TimesSpeed() {
	d := 28 * units.CubicCentimetrePerRevolution
	n := 1460 * units.RevolutionPerMinute
	fmt.Println(d.TimesSpeed(n))
	fmt.Println(d.TimesPressure(160 * units.Bar)) // ideal torque
	// Output:
	// 40.88 L/min
	// 71.3 N·m
}

func ExampleVolume_PerDuration() {
	stroke := units.CircleArea(80 * units.Millimetre).TimesLength(600 * units.Millimetre)
	q, err := stroke.PerDuration(4 * time.Second)
	fmt.Println(stroke, q, err)
	// Output: 3.016 L 45.24 L/min <nil>
}

// Reading what a quoting form and a gauge say: a comma is refused unless a
// Parser names the convention; a vacuum gauge reading is a negative gauge
// pressure; letter case is forgiven where it is not ambiguous.
func ExampleParser() {
	_, err := units.ParsePressure("2,5 bar")
	fmt.Println(errors.Is(err, units.ErrAmbiguous))
	eu := units.Parser{Decimal: ','}
	p, _ := eu.ParsePressure("2,5 bar")
	fmt.Println(p)
	inlet, _ := units.ParsePressure("28 inHg vac")
	fmt.Printf("%.2f psi\n", inlet.PSI())
	relief, _ := units.ParsePressure("3000 PSI")
	fmt.Println(units.USCustomary().FormatPressure(relief))
	_, err = units.ParsePressure("28 inHg")
	fmt.Println(errors.Is(err, units.ErrReference))
	// Output:
	// true
	// 2.5 bar
	// -13.75 psi
	// 3000 psi
	// true
}

// A log splitter's cylinder extends at 0.12 m/s while its pressure line
// carries oil at 4.2 m/s: the US trade writes the first in in/s and the
// second in ft/s.
func ExampleSystem_FormatPistonSpeed() {
	us := units.USCustomary()
	fmt.Println(us.FormatPistonSpeed(0.12*units.MetrePerSecond), us.FormatLineVelocity(4.2*units.MetrePerSecond))
	fmt.Println(units.Metric().FormatPistonSpeed(0.12 * units.MetrePerSecond))
	// Output:
	// 4.724 in/s 13.78 ft/s
	// 0.12 m/s
}
