package actuator_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/units"
)

// Example_textbookCylinder is a check, not a demo: Esposito, Fluid Power
// with Applications, 7th ed., Example 6-1 (inputs; results by the book's
// method; from memory), in US customary units. A 2 in bore, 1 in rod
// cylinder on 20 gpm against a 1000 lb load both ways. The book prints
// extend 318.3 psi, 2.042 ft/s, 3.71 hp and retract 424.4 psi, 2.722 ft/s,
// 4.95 hp; its retract speed comes from rounded intermediate values, the
// exact arithmetic gives 2.723 ft/s.
func Example_textbookCylinder() {
	c := actuator.Cylinder{Bore: 2 * units.Inch, Rod: 1 * units.Inch, Stroke: 10 * units.Inch}
	q, load := 20*units.USGallonPerMinute, 1000*units.PoundForce
	for _, dir := range []actuator.Direction{actuator.Extend, actuator.Retract} {
		p, _ := c.PressureFor(dir, load, 0)
		v, _ := c.Speed(dir, q)
		fmt.Printf("%s: %.1f psi, %.3f ft/s, %.2f hp\n", dir, p.PSI(), v.FeetPerSecond(), p.TimesFlow(q).Horsepower())
	}
	// Output:
	// extend: 318.3 psi, 2.042 ft/s, 3.71 hp
	// retract: 424.4 psi, 2.723 ft/s, 4.95 hp
}
