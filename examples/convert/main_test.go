package main

import (
	"bytes"
	"errors"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

// TestDemo checks the demo sheet and what follows from it against values
// worked by hand from the NIST SP 811 definitions (psi = 6894.757 Pa, in³ =
// 16.387064 cm³, US gallon = 231 in³, lbf = 4.4482216 N, hp = 745.69987 W)
// and the trade's own formulas, rounded to the four significant digits the
// trade systems print.
func TestDemo(t *testing.T) {
	var b bytes.Buffer
	if err := demo(&b); err != nil {
		t.Fatal(err)
	}
	for _, want := range []string{
		"180 bar          2611 psi",     // 180e5 / 6894.757 = 2610.68
		"2.458 cm³/rev    0.15 in³/rev", // 0.15 × 16.387064 = 2.4581
		"0.9997 bara      14.5 psia",    // 14.5 × 6894.757 Pa = 0.99974 bar
		"1.5 kW           2.012 hp",     // 1500 / 745.69987
		"48 °C            118.4 °F",     // 1.8 × 48 + 32
		// Q = D·n: 0.15 in³ × 1450 /min = 217.5 in³/min = 0.94156 gpm = 3.5642 L/min.
		"3.564 L/min      0.9416 gpm",
		// F = p·πd²/4 = 180e5 Pa × 3.11725e-3 m² = 56 110 N = 12 614 lbf.
		"56.11 kN         12614 lbf",
		// Trade formula hp = psi × gpm / 1714.29: 2610.68 × 0.94156 / 1714.29 = 1.4339.
		"1.069 kW         1.434 hp",
		// 1.0693 kW / 0.85.
		"1.258 kW         1.687 hp",
		// Trade formula lbf·in = psi × in³/rev / 2π: 2610.68 × 0.15 / 2π = 62.33 lbf·in = 5.194 lbf·ft.
		"7.042 N·m        5.194 lbf·ft",
		// Trade formula N·m = 9549 × kW / rpm (9549 ≈ 60 000/2π): 9549 × 1.5 / 1450 = 9.878.
		"9.879 N·m        7.286 lbf·ft",
		"the drive rating covers the shaft power (84 % of rating).",
	} {
		if !strings.Contains(b.String(), want) {
			t.Errorf("output lacks %q:\n%s", want, b.String())
		}
	}
}

// TestDemoIsConsistent: the drive rating fits the shaft power the demo's
// pressure and flow need, with the margin a designer would look for.
func TestDemoIsConsistent(t *testing.T) {
	p, _ := units.ParsePressure(demoPressure)
	d, _ := units.ParseDisplacement(demoDisplacement)
	n, _ := units.ParseRotationalSpeed(demoSpeed)
	drive, _ := units.ParsePower(demoDrive)
	shaft := float64(p.TimesFlow(d.TimesSpeed(n))) / demoEfficiency
	if ratio := shaft / float64(drive); ratio < 0.6 || ratio > 1 {
		t.Errorf("shaft power is %.0f %% of the drive rating; the demo should need 60–100 %%", 100*ratio)
	}
}

// TestRunReportsEveryBadArgument: run prints every argument it can read and
// reports each one it cannot, not only the first.
func TestRunReportsEveryBadArgument(t *testing.T) {
	var b bytes.Buffer
	err := run(&b, []string{"12 furlongs", "55 bar", "x", "5 bara/s", "40 lbf·ft", "1 kWh"})
	if !errors.Is(err, units.ErrUnknownUnit) || !errors.Is(err, units.ErrSyntax) {
		t.Errorf("err = %v, want both the unknown unit and the syntax error", err)
	}
	for _, want := range []string{`"12 furlongs"`, `"x"`, `"5 bara/s"`} {
		if err == nil || !strings.Contains(err.Error(), want) {
			t.Errorf("err = %v, want it to name %s", err, want)
		}
	}
	for _, want := range []string{
		"55 bar", "797.7 psi, pressure (gauge)", // 55e5 / 6894.757
		"54.23 N·m        40 lbf·ft, torque", // 40 × 1.3558179 N·m
		"3600 kJ          3412 BTU, energy",  // 3.6 MJ / 1055.05585 J
	} {
		if !strings.Contains(b.String(), want) {
			t.Errorf("output lacks %q:\n%s", want, b.String())
		}
	}
}
