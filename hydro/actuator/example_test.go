package actuator_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/units"
)

const mm = units.Millimetre

// A baling press ram pushes 280 kN at the end of its stroke at 210 bar,
// moving an 800 kg platen on wear strips (μ 0.15) up to 0.12 m/s within
// 40 mm. The ram hangs from a rear clevis with its rod eye on the guided
// platen, 600 mm pin to pin when retracted; the relief is set at 230 bar.
func ExampleDuty_Size() {
	ram := actuator.Duty{
		Force:         280 * units.Kilonewton,
		Mass:          800 * units.Kilogram,
		Friction:      0.15,
		Speed:         0.12 * units.MetrePerSecond,
		AccelDistance: 40 * mm,
		Pressure:      210 * units.Bar,
		Stroke:        1600 * mm,
		Buckling: &actuator.Column{
			Body: actuator.Clevis, RodEnd: actuator.RodPinned,
			Retracted: 600 * mm, Relief: 230 * units.Bar, Yield: 355 * units.Megapascal,
		},
	}
	r, err := ram.Size()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("total force:", r.Forces.Total())
	fmt.Println("bore:", r.Bore.Required, "→", r.Bore.Chosen)
	fmt.Println("rod:", r.Rod.Chosen, "buckling by", r.Buckling.Method, "safety", fmt.Sprintf("%.2f", r.Buckling.Safety.Value))
	fmt.Println("needs:", r.Pressure.Value, "of", r.Pressure.Limit)
	// Output:
	// total force: 281.3 kN
	// bore: 137.7 mm → 140 mm
	// rod: 90 mm buckling by Johnson safety 3.77
	// needs: 203.1 bar of 210 bar
}

// A test-rig clamp is a 63/45 cylinder (area ratio 2.04) fed 40 L/min: on
// retract the cap side returns more than twice the pump flow, which the
// return filter must pass.
func ExampleCylinder_ReturnFlow() {
	clamp := actuator.Cylinder{Bore: 63 * mm, Rod: 45 * mm, Stroke: 150 * mm}
	phi, _ := clamp.AreaRatio()
	back, _ := clamp.ReturnFlow(actuator.Retract, 40*units.LitrePerMinute)
	v, _ := clamp.Speed(actuator.Retract, 40*units.LitrePerMinute)
	fmt.Printf("area ratio %.2f\n", phi)
	fmt.Println("return flow:", back)
	fmt.Println("retract speed:", v)
	// Output:
	// area ratio 2.04
	// return flow: 81.67 L/min
	// retract speed: 0.4366 m/s
}

// The clamp's extend stroke is metered out. With 180 bar on the cap and the
// meter-out valve closed, the annulus is intensified past the clamp's
// 250 bar rating.
func ExampleCylinder_Intensification() {
	clamp := actuator.Cylinder{Bore: 63 * mm, Rod: 45 * mm, Stroke: 150 * mm, Rating: 250 * units.Bar}
	r, _ := clamp.Intensification(actuator.Extend, 180*units.Bar, 0)
	fmt.Println(r.Pressure, r.Rating.OK())
	for _, f := range r.Findings {
		fmt.Println(f.Severity, f.Hazard)
	}
	// Output:
	// 367.5 bar false
	// danger overpressure
}

// A log splitter's wedge cylinder regenerates on its approach stroke:
// faster, with less force.
func ExampleCylinder_Regenerative() {
	splitter := actuator.Cylinder{Bore: 100 * mm, Rod: 63 * mm, Stroke: 600 * mm}
	r, _ := splitter.Regenerative(30*units.LitrePerMinute, 200*units.Bar)
	v, _ := splitter.Speed(actuator.Extend, 30*units.LitrePerMinute)
	fmt.Println("regenerative:", r.Speed, r.Force)
	fmt.Println("normal:      ", v)
	// Output:
	// regenerative: 0.1604 m/s 62.34 kN
	// normal:       0.06366 m/s
}
