package hydro_test

import (
	"errors"
	"fmt"
	"os"

	"github.com/hydrosize/hydrosize/hydro"
	"github.com/hydrosize/hydrosize/units"
)

// A spec with mistakes gets every problem at once, each with its JSON path.
func ExampleParseSpec() {
	_, err := hydro.ParseSpec([]byte(`{
	  "actuators": [{"name": "clamp", "kind": "cylinder", "stroke": 120}],
	  "cycle": {"phases": [{"moves": [{"actuator": "clamp", "direction": "extend", "speed": "50 mm/s", "force": "18 kN"}]}]},
	  "supply": {"mains": "50 Hz"},
	  "site": {"ambient_min": "5 °C", "ambient_max": "30 °C"},
	  "fluid": {"grade": "VG 32"},
	  "design": {"pressure": "900 bar"}
	}`))
	fmt.Println(err)
	var fe *hydro.FieldError
	fmt.Println(errors.As(err, &fe), fe.Path, errors.Is(err, units.ErrRange))
	// Output:
	// hydro: the spec has 2 problems:
	//   actuators[0].stroke: 120: a number without a unit: write the quantity as a string with its unit, such as "120 mm"
	//   design.pressure: 900 bar is out of range: want from 10 bar to 700 bar
	// true actuators[0].stroke true
}

// A spec built in Go is validated the same way, with the same JSON paths.
func ExampleSpec_Validate() {
	s := hydro.Spec{
		Actuators: []hydro.Actuator{{Name: "clamp", Kind: "cylinder", Stroke: 120 * units.Millimetre}},
		Cycle: hydro.Cycle{Phases: []hydro.Phase{{Moves: []hydro.Move{
			{Actuator: "clamp", Direction: "extend", Force: 18 * units.Kilonewton},
		}}}},
		Supply: hydro.Supply{Mains: 60 * units.Hertz},
		Site:   hydro.Site{AmbientMin: units.TemperatureFromCelsius(5), AmbientMax: units.TemperatureFromCelsius(30)},
		Fluid:  hydro.Fluid{Class: "HM", Grade: 32},
	}
	fmt.Println(s.Validate())
	// Output:
	// hydro: the spec has 1 problem:
	//   cycle.phases[0].moves[0].speed: missing: want a speed > 0, such as "0.1 m/s", or a time, such as "4 s"
}

// Size sizes a whole machine; every number comes with its rule.
func ExampleSize() {
	data, _ := os.ReadFile("../examples/size/baler.json")
	spec, err := hydro.ParseSpec(data)
	if err != nil {
		fmt.Println(err)
		return
	}
	r, err := hydro.Size(spec)
	if err != nil {
		fmt.Println(err)
		return
	}
	press := r.Actuators[0]
	fmt.Println("press:", press.Bore.Chosen, "×", press.Rod.Chosen, "by", press.Bore.Rule)
	fmt.Println("pump:", r.Pump.Displacement.Chosen, r.Pump.Control)
	fmt.Println("motor:", r.Drive.Rating.Chosen)
	fmt.Println("converged:", r.Solve.Converged)
	worst, _ := r.Findings.Worst()
	fmt.Println("worst finding:", worst)
	// Output:
	// press: 160 mm × 125 mm by standard: ISO 3320:2013, clause 5
	// pump: 100 cm³/rev load-sensing
	// motor: 5.5 kW
	// converged: true
	// worst finding: warning
}

// Sweep shows what the working pressure changes.
func ExampleSweep() {
	data, _ := os.ReadFile("../examples/size/baler.json")
	spec, _ := hydro.ParseSpec(data)
	c, err := hydro.Sweep(spec, []units.Pressure{125 * units.Bar, 200 * units.Bar})
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, row := range c.Rows {
		fmt.Println(row.Pressure, "press", row.Actuators[0].Bore, "pump", row.Pump, "motor", row.Motor)
	}
	// Output:
	// 125 bar press 180 mm pump 140 cm³/rev motor 5.5 kW
	// 200 bar press 140 mm pump 71 cm³/rev motor 5.5 kW
}
