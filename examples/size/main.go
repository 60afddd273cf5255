// Command size sizes a whole hydraulic power unit and circuit from one
// spec and prints the report: actuators, duty cycle and pressure budget,
// pump and drive, valves, lines, heat balance, fluid, cleanliness, the bill
// of components and the findings.
//
// Usage:
//
//	go run ./examples/size                        # the embedded demo: a two-ram baling press
//	go run ./examples/size -spec crane.json       # a spec of your own (see crane.json beside this file)
//	go run ./examples/size -markdown              # the report as Markdown
//	go run ./examples/size -json                  # the report as JSON
//	go run ./examples/size -units us              # in US customary units (and inch bores, NEMA motors)
//	go run ./examples/size -sweep                 # the machine at 100 to 250 bar, side by side
//	go run ./examples/size -sweep -speeds "1000 rpm,1500 rpm"
//
// A spec with mistakes is refused with every problem listed, each with its
// JSON path, and the exit status 1; a bad flag exits with status 2.
//
// The demo (baler.json) and the sample (crane.json) are machines of our
// own with invented figures. The report is a first pass: design and verify
// to ISO 4413, the makers' data, local codes and licensed practice.
package main

import (
	_ "embed"
	"encoding/json"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"strings"

	"github.com/hydrosize/hydrosize/hydro"
	"github.com/hydrosize/hydrosize/units"
)

// demo is the embedded demo machine, a two-ram baling press.
//
//go:embed baler.json
var demo []byte

// errSpec marks an error in the spec, for the exit status.
var errSpec = errors.New("the spec has problems")

func main() {
	err := run(os.Args[1:], os.Stdout)
	switch {
	case err == nil:
	case errors.Is(err, errSpec):
		fmt.Fprintln(os.Stderr, err)
		os.Exit(1)
	default:
		fmt.Fprintln(os.Stderr, err)
		os.Exit(2)
	}
}

// options are the command's flags.
type options struct {
	spec     string
	json, md bool
	units    string
	sweep    bool
	speeds   string
}

func parseFlags(args []string) (options, error) {
	var o options
	fs := flag.NewFlagSet("size", flag.ContinueOnError)
	fs.StringVar(&o.spec, "spec", "", "a spec file in JSON (default: the embedded baling press)")
	fs.BoolVar(&o.json, "json", false, "print the report as JSON")
	fs.BoolVar(&o.md, "markdown", false, "print the report as Markdown")
	fs.StringVar(&o.units, "units", "", "metric or us (default: the spec's)")
	fs.BoolVar(&o.sweep, "sweep", false, "size the machine over a range of working pressures (the spec's pressure_range, or 100 to 250 bar in 25 bar steps)")
	fs.StringVar(&o.speeds, "speeds", "", "with -sweep, pump speeds to try, comma-separated with units")
	if err := fs.Parse(args); err != nil {
		return o, err
	}
	if fs.NArg() > 0 {
		return o, fmt.Errorf("size: unexpected argument %q; give the spec with -spec", fs.Arg(0))
	}
	if o.json && o.md {
		return o, errors.New("size: give -json or -markdown, not both")
	}
	if o.units != "" && o.units != "metric" && o.units != "us" {
		return o, fmt.Errorf("size: -units %q: want metric or us", o.units)
	}
	if o.speeds != "" && !o.sweep {
		return o, errors.New("size: -speeds goes with -sweep")
	}
	return o, nil
}

func run(args []string, out io.Writer) error {
	o, err := parseFlags(args)
	if err != nil {
		return err
	}
	data := demo
	if o.spec != "" {
		if data, err = os.ReadFile(o.spec); err != nil {
			return err
		}
	}
	spec, err := hydro.ParseSpec(data)
	if err != nil {
		return fmt.Errorf("%w: %s\n%v", errSpec, name(o.spec), err)
	}
	if o.units != "" {
		spec.Units = o.units
	}
	if o.sweep {
		return sweep(spec, o, out)
	}
	r, err := hydro.Size(spec)
	if err != nil {
		return fmt.Errorf("%w: %s\n%v", errSpec, name(o.spec), err)
	}
	return write(out, o, r, func() string { return r.Text() }, func() string { return r.Markdown() })
}

// name is how errors name the spec.
func name(path string) string {
	if path == "" {
		return "the embedded demo"
	}
	return path
}

// sweep sizes the spec over its pressure range (or the default one) and
// the speeds asked for.
func sweep(spec hydro.Spec, o options, out io.Writer) error {
	var pressures []units.Pressure
	r := hydro.PressureRange{From: 100 * units.Bar, To: 250 * units.Bar, Step: 25 * units.Bar}
	if pr := spec.Design.PressureRange; pr != nil {
		r = *pr
	}
	for p := r.From; p <= r.To*(1+1e-12); p += r.Step {
		pressures = append(pressures, p)
	}
	var speeds []units.RotationalSpeed
	if o.speeds != "" {
		for _, s := range strings.Split(o.speeds, ",") {
			n, err := units.ParseRotationalSpeed(strings.TrimSpace(s))
			if err != nil {
				return fmt.Errorf("size: -speeds: %w", err)
			}
			speeds = append(speeds, n)
		}
	}
	c, err := hydro.Sweep(spec, pressures, speeds...)
	if err != nil {
		return fmt.Errorf("%w: %s\n%v", errSpec, name(o.spec), err)
	}
	return write(out, o, c, func() string { return c.Text() }, func() string { return c.Markdown() })
}

// write prints v as JSON, Markdown or text.
func write(out io.Writer, o options, v any, text, md func() string) error {
	switch {
	case o.json:
		b, err := json.MarshalIndent(v, "", "  ")
		if err != nil {
			return err
		}
		_, err = fmt.Fprintf(out, "%s\n", b)
		return err
	case o.md:
		_, err := io.WriteString(out, md())
		return err
	}
	_, err := io.WriteString(out, text())
	return err
}
