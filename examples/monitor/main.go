// Command monitor is a condition monitor of the kind that runs beside a
// PLC: it reads one line per sample of particle counts, oil temperature and
// filter pressure drop, and prints per line the ISO 4406 code, the oil's
// viscosity at that temperature and what needs attention.
//
// Usage:
//
//	go run ./examples/monitor                   # the demo log of a baling press shift
//	go run ./examples/monitor log.csv           # a file
//	plc-export | go run ./examples/monitor -    # standard input
//
// # Input
//
// A CSV line per sample, six columns separated by commas:
//
//	stamp, ge4, ge6, ge14, oil, dp
//	2025-06-02 06:00, 2450, 610, 41, 8.5, 2.90
//
// stamp is any text without a comma, printed back as it is; ge4, ge6 and
// ge14 are the cumulative particle counts per mL at ≥4, ≥6 and ≥14 µm(c)
// of an automatic counter calibrated to ISO 11171; oil is the oil
// temperature in the unit of -temp (°C unless told); dp the pressure drop
// across the filter element in the unit of -dp (bar unless told). Spaces
// around a value are ignored. Empty lines, lines starting with '#', and a
// header (the first other line, when it starts with "stamp") are skipped.
//
// # Output
//
// One line per sample:
//
//	stamp  code  oil temperature  ν viscosity  Δp drop (drop at 40 °C)  verdict: reasons
//
// The code is the ISO 4406 code of the counts; ν the fluid's kinematic
// viscosity at the oil temperature (ASTM D341, hydrosize/fluid); Δp the
// measured drop and, in brackets, the drop the element would show at the
// fluid's 40 °C viscosity (laminar element scaling, Δp ∝ ν, from
// hydro/contamination), so that a filter loading shows through a warm-up.
// The verdict is "ok", "watch" or "ALARM", with the reasons:
//
//   - ALARM when a size of the code is over the target (-target), when the
//     viscosity is outside the pump's window (fluid.DefaultWindow: colder
//     than its cold-start maximum or hotter than its permissible minimum),
//     or when Δp reaches the filter's bypass setting (-bypass: oil passes
//     unfiltered);
//   - watch when the viscosity is outside the optimum band, or when Δp —
//     measured, or referred to 40 °C oil, the drop a cooler start would
//     show — reaches the -watch share of the bypass setting (the element
//     is loading; our choice of 75 % as the default).
//
// A line that cannot be read — a column that is not a finite number, a
// temperature below absolute zero, a negative Δp — is reported with its
// number, and the monitor goes on. A summary line ends the output. After its first sight of a code
// the monitor allocates nothing per line.
//
// This is a monitor, not a protection: it does not replace the filter's
// own clogging indicator, the pump's protection or the machine's safety
// functions. Take samples only through a proper sampling valve (ISO 4021),
// keep clear of pinhole leaks, and mind hot oil.
package main

import (
	"bufio"
	"bytes"
	_ "embed"
	"errors"
	"flag"
	"fmt"
	"io"
	"os"
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/units"
)

// shift is the demo log: one shift of a baling press, invented for the
// demonstration (a cold start, a dusty spell, a filter loading up, an
// element change).
//
//go:embed shift.csv
var shift []byte

func main() {
	if err := run(os.Args[1:], os.Stdin, os.Stdout); err != nil {
		fmt.Fprintln(os.Stderr, err)
		os.Exit(2)
	}
}

// run parses the flags, reads the log and writes the judged lines.
func run(args []string, stdin io.Reader, stdout io.Writer) error {
	c, rest, err := configure(args)
	if err != nil {
		return err
	}
	var in io.Reader = bytes.NewReader(shift)
	switch {
	case len(rest) > 1:
		return errors.New("monitor: give at most one log file (or - for standard input)")
	case len(rest) == 1 && rest[0] == "-":
		in = stdin
	case len(rest) == 1:
		f, err := os.Open(rest[0])
		if err != nil {
			return err
		}
		defer f.Close()
		in = f
	}
	w := bufio.NewWriter(stdout)
	m := newMonitor(c)
	if err := m.read(in, w); err != nil {
		return err
	}
	return w.Flush()
}

// configure reads the flags; every bad flag is reported, not only the first.
func configure(args []string) (config, []string, error) {
	fs := flag.NewFlagSet("monitor", flag.ContinueOnError)
	fluidFlag := fs.String("fluid", "HM VG 46", "the fluid: an ISO 6743-4 class and an ISO 3448 grade, typical data")
	target := fs.String("target", "18/16/13", "the ISO 4406 target code, ≥4/≥6/≥14 µm(c)")
	bypass := fs.String("bypass", "3.5 bar", "the filter's bypass valve setting")
	watch := fs.Float64("watch", 0.75, "share of the bypass setting at which a loading filter is flagged, 0.1 to 1")
	temp := fs.String("temp", "°C", "unit of the oil temperature column: °C, °F or K")
	dp := fs.String("dp", "bar", "unit of the filter Δp column: bar, psi, kPa, …")
	sys := fs.String("units", "metric", "units to print in: metric or us")
	if err := fs.Parse(args); err != nil {
		return config{}, nil, err
	}
	var c config
	var errs []error
	note := func(err error) {
		if err != nil {
			errs = append(errs, err)
		}
	}
	var err error
	c.fluid, err = presetFluid(*fluidFlag)
	note(err)
	c.window = fluid.DefaultWindow()
	c.target, err = contamination.ParseCode(*target)
	note(err)
	if err == nil && c.target.Form != contamination.Counter {
		note(errors.New("monitor: -target " + *target + ": want a three-number code for ≥4/≥6/≥14 µm(c), such as 18/16/13"))
	}
	c.bypass, err = units.ParsePressure(*bypass)
	note(err)
	if err == nil && !(c.bypass > 0) {
		note(errors.New("monitor: -bypass " + *bypass + ": want a setting above 0"))
	}
	c.watch = *watch
	if !(c.watch >= 0.1 && c.watch <= 1) {
		note(errors.New("monitor: -watch " + strconv.FormatFloat(*watch, 'g', -1, 64) + ": want 0.1 to 1"))
	}
	c.temp, err = temperatureUnit(*temp)
	note(err)
	c.dp, err = pressureUnit(*dp)
	note(err)
	switch *sys {
	case "metric":
		c.out = units.Metric()
	case "us":
		c.out = units.USCustomary()
	default:
		note(errors.New("monitor: -units " + *sys + ": want metric or us"))
	}
	if len(errs) > 0 {
		return config{}, nil, errors.Join(errs...)
	}
	return c, fs.Args(), nil
}

// presetFluid reads "HM VG 46": a class and a grade, built by fluid.Typical.
func presetFluid(s string) (fluid.Fluid, error) {
	class, grade, _ := strings.Cut(strings.TrimSpace(s), " ")
	for c := fluid.HM; c <= fluid.HEES; c++ {
		if c.String() != class {
			continue
		}
		g, err := fluid.ParseGrade(grade)
		if err != nil {
			return fluid.Fluid{}, err
		}
		return fluid.Typical(c, g)
	}
	return fluid.Fluid{}, errors.New("monitor: -fluid " + s + ": want a class (HM, HV, HFC, HFDU or HEES) and a grade, such as \"HM VG 46\"")
}

// read judges every line of in and writes the results to w, then a summary.
func (m *monitor) read(in io.Reader, w io.Writer) error {
	sc := bufio.NewScanner(in)
	out := make([]byte, 0, 512)
	bad := 0
	header := true // the first line that is not a comment may be a header
	for n := 1; sc.Scan(); n++ {
		line := bytes.TrimSpace(sc.Bytes())
		if len(line) == 0 || line[0] == '#' {
			continue
		}
		if header {
			header = false
			if bytes.HasPrefix(line, []byte("stamp")) {
				continue
			}
		}
		var err error
		out, err = m.line(out[:0], line)
		if err != nil {
			bad++
			out = fmt.Appendf(out[:0], "line %d: cannot read: %v\n", n, err)
		}
		if _, err := w.Write(out); err != nil {
			return err
		}
	}
	if err := sc.Err(); err != nil {
		return err
	}
	_, err := fmt.Fprintf(w, "%d samples, %d with an alarm, %d not read\n", m.lines, m.alarms, bad)
	return err
}

// line judges one line of the log.
func (m *monitor) line(out, line []byte) ([]byte, error) {
	r, err := m.parse(line)
	if err != nil {
		return out, err
	}
	return m.judge(out, r)
}
