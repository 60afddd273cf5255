// Command convert reads quantities as text and prints each in the metric and
// US customary trade units, the way hydrosize reports them.
//
// With no arguments it prints the demo data sheet of a test-rig clamp
// circuit (invented numbers, for demonstration only). With arguments, each
// argument is one quantity, such as "2750 psi" or "6.5 gal/min":
//
//	go run ./examples/convert
//	go run ./examples/convert "2750 psi" "6.5 gal/min" "120 °F"
package main

import (
	"fmt"
	"io"
	"os"
	"strings"
	"unicode/utf8"

	"github.com/hydrosize/hydrosize/units"
)

// demo is an invented data sheet for a test-rig clamp circuit.
var demo = []string{
	"180 bar",       // clamp pressure
	"2.9 gal/min",   // pump delivery
	"0.75 in^3/rev", // pump displacement
	"1750 rpm",      // motor speed
	"63 mm",         // clamp bore
	"48 °C",         // tank temperature
	"46 cSt",        // oil at 40 °C
	"14.5 psia",     // site barometric pressure
	"1.5 kW",        // drive rating
}

func main() {
	args := os.Args[1:]
	if len(args) == 0 {
		args = demo
	}
	if err := run(os.Stdout, args); err != nil {
		fmt.Fprintln(os.Stderr, err)
		os.Exit(1)
	}
}

// run prints each quantity in both systems. It stops at the first error.
func run(w io.Writer, args []string) error {
	fmt.Fprintf(w, "%-16s %-18s %-18s %s\n", "input", "metric", "US customary", "quantity")
	for _, a := range args {
		q, err := units.Parse(a)
		if err != nil {
			return err
		}
		metric, us, kind, err := show(q)
		if err != nil {
			return fmt.Errorf("%q: %w", a, err)
		}
		fmt.Fprintf(w, "%s %s %s %s\n", pad(a, 16), pad(metric, 18), pad(us, 18), kind)
	}
	return nil
}

// pad pads s with spaces to width runes (fmt pads by bytes, and units such
// as °C and cm³ have multi-byte runes).
func pad(s string, width int) string {
	if n := utf8.RuneCountInString(s); n < width {
		return s + strings.Repeat(" ", width-n)
	}
	return s
}

// show formats q in both systems, trying the quantity types in turn.
func show(q units.Quantity) (metric, us, kind string, err error) {
	m, u := units.Metric(), units.USCustomary()
	if p, err := q.Pressure(); err == nil {
		return m.FormatPressure(p), u.FormatPressure(p), "pressure (gauge)", nil
	}
	if p, err := q.AbsolutePressure(); err == nil {
		return m.FormatAbsolutePressure(p), u.FormatAbsolutePressure(p), "pressure (absolute)", nil
	}
	if f, err := q.Flow(); err == nil {
		return m.FormatFlow(f), u.FormatFlow(f), "flow", nil
	}
	if d, err := q.Displacement(); err == nil {
		return m.FormatDisplacement(d), u.FormatDisplacement(d), "displacement", nil
	}
	if n, err := q.RotationalSpeed(); err == nil {
		return m.FormatRotationalSpeed(n), u.FormatRotationalSpeed(n), "rotational speed", nil
	}
	if l, err := q.Length(); err == nil {
		return m.FormatLength(l), u.FormatLength(l), "length", nil
	}
	if t, err := q.Temperature(); err == nil {
		return m.FormatTemperature(t), u.FormatTemperature(t), "temperature", nil
	}
	if v, err := q.KinematicViscosity(); err == nil {
		return m.FormatKinematicViscosity(v), u.FormatKinematicViscosity(v), "kinematic viscosity", nil
	}
	if p, err := q.Power(); err == nil {
		return m.FormatPower(p), u.FormatPower(p), "power", nil
	}
	if f, err := q.Force(); err == nil {
		return m.FormatForce(f), u.FormatForce(f), "force", nil
	}
	if v, err := q.Volume(); err == nil {
		return m.FormatVolume(v), u.FormatVolume(v), "volume", nil
	}
	return "", "", "", fmt.Errorf("no conversion shown for dimension %v", q.Dimension())
}
