package thermal_test

import (
	"fmt"
	"time"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/thermal"
	"github.com/hydrosize/hydrosize/units"
)

func ExampleBudget() {
	// A baling press on a fixed pump: 12 s pressing through a flow control,
	// then 18 s with the pump relieving while the bale is tied.
	q := 45 * units.LitrePerMinute
	pump, _ := thermal.PumpLoss("pump", 180*units.Bar, q, 0.87)
	flow, _ := thermal.Throttling("flow control", 35*units.Bar, q)
	lines, _ := thermal.LineLoss("lines", 6*units.Bar, q)
	ram, _ := thermal.MotorLoss("ram", 139*units.Bar, q, 0.95)
	relief, _ := thermal.ReliefFlow("relief", 180*units.Bar, q)
	h, _ := thermal.Budget([]thermal.Phase{
		{Name: "press", Duration: 12 * time.Second, Loads: []thermal.Load{pump, flow, lines, ram}},
		{Name: "tie", Duration: 18 * time.Second, Loads: []thermal.Load{pump, relief}},
	})
	for _, s := range h.Sources {
		fmt.Printf("%-10s %v\n", s.Source, s.Mean)
	}
	fmt.Println(h.Findings[0])
	// Output:
	// pump       2.017 kW
	// motor      0.2085 kW
	// throttling 1.05 kW
	// relief     8.1 kW
	// lines      0.18 kW
	// notice: the itemised heat load is 11.56 kW, 74.47 % of the input power; a quarter to a third of the input would give 3.879 kW to 5.172 kW: the share guess understates the heat of this circuit
}

func ExampleCoolerNeed_Size() {
	// The baling press tank: 1.2 × 0.8 m, 0.55 m of oil, in still air; the
	// oil must stay at or below 55 °C on a 35 °C day.
	tank := thermal.Tank{Length: 1.2, Width: 0.8, Height: 0.7, Level: 0.55}
	a, _ := tank.WettedArea()
	ua, _ := thermal.Dissipation(thermal.StillAir, a)
	c, _ := thermal.CoolerNeed{Load: 11.56 * units.Kilowatt, Dissipation: ua,
		MaxOil: units.TemperatureFromCelsius(55), MaxAmbient: units.TemperatureFromCelsius(35)}.Size()
	fmt.Printf("surfaces %v: shed %v; cooler %v = %.0f BTU/h, %v at %v ETD\n",
		ua, c.Natural, c.Duty, c.BTUPerHour(), c.Specific, c.ETD)
	// Output: surfaces 31.6 W/K: shed 0.632 kW; cooler 10.93 kW = 37288 BTU/h, 546.4 W/K at 20 K ETD
}

func ExampleSizeReservoir() {
	// A scissor lift table's mobile power pack with a 12 L/min pump.
	r, _ := thermal.SizeReservoir(12*units.LitrePerMinute, thermal.Mobile.Dwell())
	fmt.Println(r.Volume.Required, r.Volume.Chosen, r.Dwell.Rule)
	// Output: 12 L 12.5 L common practice: mobile reservoir 1–2 × pump flow per minute, lower end
}

func ExampleLumped_TimeTo() {
	// A log splitter's 60 L tank and 40 kg of steel warm from a 5 °C
	// morning under a 1.2 kW load, shedding 14 W/K.
	oil, _ := fluid.Typical(fluid.HM, fluid.VG32)
	l := thermal.Lumped{Fluid: oil, Oil: 60 * units.Litre, Steel: 40, Dissipation: 14,
		Ambient: units.TemperatureFromCelsius(5), Load: 1.2 * units.Kilowatt}
	r, _ := l.Response(units.TemperatureFromCelsius(5))
	d, _ := l.TimeTo(units.TemperatureFromCelsius(5), units.TemperatureFromCelsius(40))
	fmt.Printf("steady %v, τ %v, 40 °C after %v\n", r.Steady, r.TimeConstant.Round(time.Minute), d.Round(time.Minute))
	// Output: steady 90.71 °C, τ 2h24m0s, 40 °C after 1h15m0s
}

func ExampleThrottleRise() {
	// Oil relieved across 160 bar at the log splitter's end of stroke.
	d, _ := thermal.ThrottleRise(160*units.Bar, 870, 1.9*units.KilojoulePerKilogramKelvin)
	fmt.Println(d)
	// Output: 9.679 K
}
