package actuator_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
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

// A forestry crane slews through an orbit motor: 480 N·m running and
// 560 N·m to break away on a slope, 40 rpm, 170 bar across the motor. The
// displacements are a demo range. On a slope the boom can turn the motor,
// so the result carries the brake caution.
func ExampleMotorDuty_Size() {
	cc := units.CubicCentimetrePerRevolution
	motors, _ := components.NewSeries("demo orbit motors", components.OurRule("demo data"),
		[]units.Displacement{100 * cc, 160 * cc, 200 * cc, 250 * cc, 315 * cc, 400 * cc}, nil)
	slew := actuator.MotorDuty{
		Torque: 480 * units.NewtonMetre, StartTorque: 560 * units.NewtonMetre,
		Speed: 40 * units.RevolutionPerMinute, Pressure: 170 * units.Bar,
		Volumetric: 0.92, Mechanical: 0.88, Displacements: motors, HoldsLoad: true,
	}
	r, err := slew.Size()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("running needs", r.Running, "starting needs", r.Starting)
	fmt.Println("chosen", r.Displacement.Chosen, "at", r.Pressure.Value, "taking", r.Flow)
	for _, f := range r.Findings {
		fmt.Println(f.Severity, f.Hazard)
	}
	// Output:
	// running needs 201.6 cm³/rev starting needs 261.3 cm³/rev
	// chosen 315 cm³/rev at 141 bar taking 13.7 L/min
	// warning overrunning load
}

// The test-rig clamp (63/45, 150 mm stroke) holds a 40 kg jaw under
// position control; 0.15 L of oil sits in each line. Its softest point and
// the shortest ramp the rule of thumb allows there:
func ExampleOilSpring_Lowest() {
	clamp := actuator.OilSpring{
		Cylinder: actuator.Cylinder{Bore: 63 * mm, Rod: 45 * mm, Stroke: 150 * mm},
		Mass:     40 * units.Kilogram,
		DeadCap:  0.15 * units.Litre, DeadRod: 0.15 * units.Litre,
		Bulk:        fluid.EffectiveBulk{Liquid: 1.4 * units.Gigapascal},
		CapPressure: 60 * units.BarAbsolute, RodPressure: 60 * units.BarAbsolute,
	}
	r, err := clamp.Lowest()
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(r.Frequency, "at", r.Position)
	fmt.Println("ramps of at least", r.MinRamp.Round(100_000))
	// Output:
	// 164.1 Hz at 126.2 mm
	// ramps of at least 17.5ms
}

// The baling press ram (140/90, 1600 mm stroke) closes at 0.12 m/s,
// ramping at 0.5 m/s² up and 1 m/s² down.
func ExampleCylinder_Move() {
	ram := actuator.Cylinder{Bore: 140 * mm, Rod: 90 * mm, Stroke: 1600 * mm}
	m, _ := ram.Move(actuator.Extend, actuator.Profile{Speed: 0.12, Accel: 0.5, Decel: 1})
	fmt.Println(m.Time.Round(10_000_000), "peak flow", m.PeakFlow, "return", m.PeakReturn)
	// Output:
	// 13.51s peak flow 110.8 L/min return 65.03 L/min
}

// A scissor lift table lowers 1.2 t onto its end stop through a 25 mm
// cushion at 0.15 m/s; the weight drives it into the cushion.
func ExampleCylinder_Cushioning() {
	lift := actuator.Cylinder{Bore: 80 * mm, Rod: 50 * mm, Stroke: 900 * mm, Rating: 210 * units.Bar}
	weight := (1200 * units.Kilogram).TimesAcceleration(units.StandardGravity)
	r, _ := lift.Cushioning(actuator.Retract, actuator.Cushion{
		Length: 25 * mm, Mass: 1200 * units.Kilogram, Speed: 0.15, Assist: weight,
	})
	fmt.Println(r.Pressure, r.Rating.OK())
	// Output:
	// 24.49 bar true
}
