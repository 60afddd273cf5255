// Command convert reads quantities as text and prints each in the metric and
// US customary trade units, the way hydrosize reports them.
//
// With no arguments it prints the demo data sheet of a test-rig clamp
// circuit (invented numbers, for demonstration only), then what follows from
// it: the pump's flow (displacement × speed), the clamp force, the hydraulic
// power, the shaft power the drive must give and the torques. With arguments,
// each argument is one quantity, such as "2750 psi" or "6.5 gal/min"; every
// argument that cannot be read is reported, not only the first:
//
//	go run ./examples/convert
//	go run ./examples/convert "2750 psi" "6.5 gal/min" "120 °F" "40 lbf·ft"
package main

import (
	"errors"
	"fmt"
	"io"
	"os"
	"strings"
	"unicode/utf8"

	"github.com/hydrosize/hydrosize/units"
)

// The demo data sheet of a test-rig clamp circuit, as text from a form,
// in the mix of spellings such sheets use. Invented numbers.
const (
	demoPressure     = "180 bar"       // clamp pressure (relief setting)
	demoDisplacement = "0.15 in^3/rev" // pump displacement
	demoSpeed        = "1450 rpm"      // drive motor speed (4-pole, 50 Hz)
	demoDrive        = "1.5 kW"        // drive motor rating
	demoBore         = "63 mm"         // clamp cylinder bore
	demoTank         = "48 °C"         // tank temperature
	demoOil          = "46 cSt"        // oil viscosity at 40 °C
	demoAmbient      = "14.5 psia"     // site barometric pressure
)

// demoEfficiency is the assumed overall efficiency of the pump (volumetric ×
// mechanical), a demo value: 0.85 is a common figure for a small gear pump
// near its rated speed (common practice).
const demoEfficiency = 0.85

func main() {
	var err error
	if len(os.Args) > 1 {
		err = run(os.Stdout, os.Args[1:])
	} else {
		err = demo(os.Stdout)
	}
	if err != nil {
		fmt.Fprintln(os.Stderr, err)
		os.Exit(1)
	}
}

// row writes one line of the table: a label, the metric and the US text.
func row(w io.Writer, label, metric, us string) {
	fmt.Fprintf(w, "%s %s %s\n", pad(label, 34), pad(metric, 16), us)
}

// demo prints the demo data sheet and what follows from it.
func demo(w io.Writer) error {
	m, us := units.Metric(), units.USCustomary()
	var errs []error
	p, err := units.ParsePressure(demoPressure)
	errs = append(errs, err)
	d, err := units.ParseDisplacement(demoDisplacement)
	errs = append(errs, err)
	n, err := units.ParseRotationalSpeed(demoSpeed)
	errs = append(errs, err)
	drive, err := units.ParsePower(demoDrive)
	errs = append(errs, err)
	bore, err := units.ParseLength(demoBore)
	errs = append(errs, err)
	tank, err := units.ParseTemperature(demoTank)
	errs = append(errs, err)
	oil, err := units.ParseKinematicViscosity(demoOil)
	errs = append(errs, err)
	ambient, err := units.ParseAbsolutePressure(demoAmbient)
	errs = append(errs, err)
	if err := errors.Join(errs...); err != nil {
		return err
	}

	row(w, "test-rig clamp (demo data)", "metric", "US customary")
	row(w, "clamp pressure", m.FormatPressure(p), us.FormatPressure(p))
	row(w, "pump displacement", m.FormatDisplacement(d), us.FormatDisplacement(d))
	row(w, "drive speed", m.FormatRotationalSpeed(n), us.FormatRotationalSpeed(n))
	row(w, "drive rating", m.FormatPower(drive), us.FormatPower(drive))
	row(w, "clamp bore", m.FormatLength(bore), us.FormatLength(bore))
	row(w, "tank temperature", m.FormatTemperature(tank), us.FormatTemperature(tank))
	row(w, "oil at 40 °C", m.FormatKinematicViscosity(oil), us.FormatKinematicViscosity(oil))
	row(w, "site barometric pressure", m.FormatAbsolutePressure(ambient), us.FormatAbsolutePressure(ambient))

	flow := d.TimesSpeed(n)                      // Q = D·n
	force := p.TimesArea(units.CircleArea(bore)) // F = p·π·d²/4
	hydraulic := p.TimesFlow(flow)               // P = Δp·Q
	shaft := units.Power(float64(hydraulic) / demoEfficiency)
	pumpTorque := d.TimesPressure(p) // T = D·Δp/(2π), ideal
	ratedTorque, err := drive.PerSpeed(n)
	if err != nil {
		return err
	}
	fmt.Fprintln(w)
	row(w, "what follows", "metric", "US customary")
	row(w, "pump flow (displacement × speed)", m.FormatFlow(flow), us.FormatFlow(flow))
	row(w, "clamp force at full pressure", m.FormatForce(force), us.FormatForce(force))
	row(w, "hydraulic power (pressure × flow)", m.FormatPower(hydraulic), us.FormatPower(hydraulic))
	row(w, fmt.Sprintf("shaft power at %.0f %% efficiency", 100*demoEfficiency), m.FormatPower(shaft), us.FormatPower(shaft))
	row(w, "pump torque, ideal (D·Δp/2π)", m.FormatTorque(pumpTorque), us.FormatTorque(pumpTorque))
	row(w, "drive rated torque (P/2πn)", m.FormatTorque(ratedTorque), us.FormatTorque(ratedTorque))
	verdict := "the drive rating covers the shaft power"
	if shaft > drive {
		verdict = "the drive rating is below the shaft power"
	}
	fmt.Fprintf(w, "\n%s (%.0f %% of rating).\n", verdict, 100*float64(shaft/drive))
	return nil
}

// run prints each quantity in both systems. It reports every argument that
// cannot be read or shown, joined in one error, after printing the others.
func run(w io.Writer, args []string) error {
	row(w, "input", "metric", "US customary, quantity")
	var errs []error
	for _, a := range args {
		q, err := units.Parse(a)
		if err != nil {
			errs = append(errs, err)
			continue
		}
		metric, us, kind, err := show(q, a)
		if err != nil {
			errs = append(errs, fmt.Errorf("%q: %w", a, err))
			continue
		}
		row(w, a, metric, us+", "+kind)
	}
	return errors.Join(errs...)
}

// pad pads s with spaces to width runes (fmt pads by bytes, and units such
// as °C and cm³ have multi-byte runes).
func pad(s string, width int) string {
	if n := utf8.RuneCountInString(s); n < width {
		return s + strings.Repeat(" ", width-n)
	}
	return s
}

// show formats q in both systems as the first quantity type whose
// dimension and reference it has. Torque and energy share a dimension (N·m
// = J); the unit as written tells them apart: the energy spellings end in J,
// h (kWh) or BTU/Btu. A plain SI pressure spelling (Pa, MPa) reads as either
// reference and is shown as gauge. A dimension no type has is an error
// matching units.ErrDimension.
func show(q units.Quantity, text string) (metric, us, kind string, err error) {
	m, u := units.Metric(), units.USCustomary()
	var energy []func() (shown, bool)
	if strings.ContainsAny(lastLetter(text), "JhUu") {
		energy = append(energy, as(q.Energy, m.FormatEnergy, u.FormatEnergy, "energy"))
	}
	tries := append(energy,
		as(q.Pressure, m.FormatPressure, u.FormatPressure, "pressure (gauge)"),
		as(q.AbsolutePressure, m.FormatAbsolutePressure, u.FormatAbsolutePressure, "pressure (absolute)"),
		as(q.Flow, m.FormatFlow, u.FormatFlow, "flow"),
		as(q.Displacement, m.FormatDisplacement, u.FormatDisplacement, "displacement"),
		as(q.RotationalSpeed, m.FormatRotationalSpeed, u.FormatRotationalSpeed, "rotational speed"),
		as(q.Torque, m.FormatTorque, u.FormatTorque, "torque"),
		as(q.Force, m.FormatForce, u.FormatForce, "force"),
		as(q.Power, m.FormatPower, u.FormatPower, "power"),
		as(q.Length, m.FormatLength, u.FormatLength, "length"),
		as(q.Area, m.FormatArea, u.FormatArea, "area"),
		as(q.Volume, m.FormatVolume, u.FormatVolume, "volume"),
		as(q.Mass, m.FormatMass, u.FormatMass, "mass"),
		as(q.Velocity, m.FormatVelocity, u.FormatVelocity, "velocity"),
		as(q.Acceleration, m.FormatAcceleration, u.FormatAcceleration, "acceleration"),
		as(q.Temperature, m.FormatTemperature, u.FormatTemperature, "temperature"),
		as(q.TemperatureDifference, m.FormatTemperatureDifference, u.FormatTemperatureDifference, "temperature difference"),
		as(q.KinematicViscosity, m.FormatKinematicViscosity, u.FormatKinematicViscosity, "kinematic viscosity"),
		as(q.DynamicViscosity, m.FormatDynamicViscosity, u.FormatDynamicViscosity, "dynamic viscosity"),
		as(q.Density, m.FormatDensity, u.FormatDensity, "density"),
		as(q.SpecificHeatCapacity, m.FormatSpecificHeatCapacity, u.FormatSpecificHeatCapacity, "specific heat capacity"),
		as(q.HeatTransferCoefficient, m.FormatHeatTransferCoefficient, u.FormatHeatTransferCoefficient, "heat transfer coefficient"),
		as(q.ThermalConductivity, m.FormatThermalConductivity, u.FormatThermalConductivity, "thermal conductivity"),
		as(q.Stiffness, m.FormatStiffness, u.FormatStiffness, "stiffness"),
		as(q.Frequency, m.FormatFrequency, u.FormatFrequency, "frequency"),
	)
	for _, try := range tries {
		if s, ok := try(); ok {
			return s.metric, s.us, s.kind, nil
		}
	}
	return "", "", "", fmt.Errorf("%w: no quantity type has dimension %v", units.ErrDimension, q.Dimension())
}

// shown is a quantity written in both systems, with its kind.
type shown struct{ metric, us, kind string }

// as returns a try that converts a quantity with conv and, when it fits,
// writes it with the metric and the US customary formatter.
func as[T any](conv func() (T, error), metric, us func(T) string, kind string) func() (shown, bool) {
	return func() (shown, bool) {
		v, err := conv()
		if err != nil {
			return shown{}, false
		}
		return shown{metric(v), us(v), kind}, true
	}
}

// lastLetter returns the last character of s, spaces left out.
func lastLetter(s string) string {
	s = strings.TrimRight(s, " ")
	_, n := utf8.DecodeLastRuneInString(s)
	return s[len(s)-n:]
}
