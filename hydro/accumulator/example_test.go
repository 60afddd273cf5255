package accumulator_test

import (
	"fmt"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/accumulator"
	"github.com/hydrosize/hydrosize/units"
)

// bladders is a demo range of nominal gas volumes, not any maker's.
func bladders() components.Series[units.Volume] {
	l := units.Litre
	s, _ := components.NewSeries("demo bladder range", components.CallerRule("demo range"),
		[]units.Volume{1 * l, 2.5 * l, 4 * l, 6 * l, 10 * l, 20 * l, 32 * l, 50 * l}, nil)
	return s
}

func ExampleCycle_Size() {
	// 3 L between 110 and 180 bar abs, precharged to 99 bar abs.
	bara := units.BarAbsolute
	for _, n := range []float64{accumulator.Isothermal, accumulator.Adiabatic} {
		v0, _ := accumulator.Polytropic(99*bara, 110*bara, 180*bara, n).Size(3 * units.Litre)
		fmt.Printf("n = %.1f: %.2f L\n", n, v0.Litres())
	}
	// Output:
	// n = 1.0: 8.57 L
	// n = 1.4: 10.91 L
}

func ExampleEmergency_Size() {
	// A baling press gate (63 mm bore, 400 mm stroke) must close when the
	// power fails: charged slowly to 160 bar abs, it may fall to 90 bar abs
	// by the end of the stroke.
	bara := units.BarAbsolute
	e := accumulator.Emergency{Area: units.CircleArea(63 * units.Millimetre), Stroke: 400 * units.Millimetre, Margin: 0.15,
		Cycle: accumulator.Cycle{Precharge: 81 * bara, Min: 90 * bara, Max: 160 * bara,
			Charge: accumulator.Isothermal, Discharge: accumulator.Adiabatic},
		Sizes: bladders()}
	s, _ := e.Size()
	fmt.Printf("need %.2f L: %v required, %v chosen, delivering %.2f L\n",
		s.Need.Litres(), s.Volume.Required, s.Volume.Chosen, s.Delivered.Litres())
	for _, f := range s.Findings {
		fmt.Println(f.Severity, f.Hazard)
	}
	// Output:
	// need 1.43 L: 5.573 L required, 6 L chosen, delivering 1.54 L
	// danger stored energy
	// warning stored energy
}

func ExampleSupplement_Size() {
	// A test-rig clamp closes at 60 L/min for 4 s, then holds for 26 s: a
	// pump at the mean demand and an accumulator replace a 60 L/min pump.
	bara := units.BarAbsolute
	s := accumulator.Supplement{
		Phases: []accumulator.Phase{{Name: "close", Duration: 4 * time.Second, Flow: 60 * units.LitrePerMinute},
			{Name: "hold", Duration: 26 * time.Second}},
		Pump:  10 * units.LitrePerMinute,
		Cycle: accumulator.Polytropic(108*bara, 121*bara, 181*bara, accumulator.Adiabatic),
		Sizes: bladders()}
	r, _ := s.Size()
	fmt.Printf("mean %v, peak %v, pump %v, swing %.2f L, accumulator %v\n",
		r.Mean, r.Peak, r.Pump, r.Swing.Litres(), r.Volume.Chosen)
	// Output: mean 8 L/min, peak 60 L/min, pump 10 L/min, swing 3.33 L, accumulator 20 L
}

func ExampleCharging_Recommend() {
	// A forestry crane's pilot accumulator sees −25 °C to 65 °C gas.
	bara := units.BarAbsolute
	c := accumulator.Charging{Kind: accumulator.Diaphragm, Min: 31 * bara, Max: 41 * bara,
		Fill: units.TemperatureFromCelsius(20), Working: units.TemperatureFromCelsius(45),
		Coldest: units.TemperatureFromCelsius(-25), Hottest: units.TemperatureFromCelsius(65)}
	p, _ := c.Recommend()
	for _, q := range p.Points {
		fmt.Println(q.Temperature, q.Pressure)
	}
	fmt.Println(p.Hot.OK(), p.Ratio.OK())
	// Output:
	// -25 °C 21.76 bara
	// 20 °C 25.71 bara
	// 45 °C 27.9 bara
	// 65 °C 29.65 bara
	// true true
}
