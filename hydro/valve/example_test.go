package valve_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/hydro/valve"
)

// The scissor lift table's directional valve has a float center: in
// neutral the pump port is blocked and both cylinder ports drain to tank.
func ExampleCenter_Traits() {
	tr, err := valve.FloatCenter.Traits()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("pump port:", tr.Pump, "| cylinder ports:", tr.Actuator)
	fmt.Println("deadheads a fixed pump:", tr.Deadheads(), "| vents a load-holding pilot:", tr.Vents())
	// Output:
	// pump port: blocked | cylinder ports: to tank
	// deadheads a fixed pump: true | vents a load-holding pilot: true
}

func ExampleParseCenter() {
	c, err := valve.ParseCenter("Tandem center")
	fmt.Println(c, err)
	_, err = valve.ParseCenter("motor spool")
	fmt.Println(err)
	// Output:
	// tandem <nil>
	// valve.ParseCenter: parsing "motor spool" at offset 0: invalid syntax: want one of closed, open, tandem, float, regenerative
}
