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

// TestRunShowsEveryQuantityType: convert shows a quantity of every type the
// units package has, not only the ones of the demo. The values are worked by
// hand from the NIST SP 811 definitions (ft = 0.3048 m, in = 0.0254 m, lbm =
// 0.45359237 kg, lbf = 4.4482216 N, BTU = 1055.05585 J, °F = 1.8·°C + 32),
// rounded to the four digits the trade systems print.
func TestRunShowsEveryQuantityType(t *testing.T) {
	for _, c := range []struct{ in, metric, us string }{
		{"4.5 ft/s", "1.372 m/s", "4.5 ft/s, velocity"},      // 4.5 × 0.3048
		{"12 in²", "77.42 cm²", "12 in², area"},              // 12 × 6.4516 cm²
		{"20 L", "20 L", "5.283 gal, volume"},                // 20 / 3.785411784
		{"20 kg", "20 kg", "44.09 lbm, mass"},                // 20 / 0.45359237
		{"870 kg/m³", "870 kg/m³", "54.31 lbm/ft³, density"}, // 870 / 16.018463
		{"50 Hz", "50 Hz", "50 Hz, frequency"},
		{"30 cP", "30 mPa·s", "30 cP, dynamic viscosity"},                                 // 1 cP = 1 mPa·s
		{"2 ΔK", "2 K", "3.6 °F, temperature difference"},                                 // 1.8 × 2
		{"9.80665 m/s²", "9.807 m/s²", "32.17 ft/s², acceleration"},                       // 9.80665 / 0.3048
		{"5 kN/mm", "5 kN/mm", "28551 lbf/in, stiffness"},                                 // 5e6 N/m × 0.0254 / 4.4482216
		{"2 kJ/(kg·K)", "2 kJ/(kg·K)", "0.4777 BTU/(lbm·°F), specific heat capacity"},     // 2000 / 4186.8
		{"0.15 W/(m·K)", "0.15 W/(m·K)", "0.08667 BTU/(h·ft·°F), thermal conductivity"},   // 0.15 / 1.730735
		{"20 W/(m²·K)", "20 W/(m²·K)", "3.522 BTU/(h·ft²·°F), heat transfer coefficient"}, // 20 / 5.678263
	} {
		var b bytes.Buffer
		if err := run(&b, []string{c.in}); err != nil {
			t.Errorf("%q: %v", c.in, err)
			continue
		}
		if want := pad(c.metric, 16) + " " + c.us; !strings.Contains(b.String(), want) {
			t.Errorf("%q: output lacks %q:\n%s", c.in, want, b.String())
		}
	}
	// A dimension no quantity type has is reported as a dimension error.
	var b bytes.Buffer
	if err := run(&b, []string{"5 bar/s"}); !errors.Is(err, units.ErrDimension) || !strings.Contains(err.Error(), `"5 bar/s"`) {
		t.Errorf("5 bar/s: err = %v, want a units.ErrDimension naming the argument", err)
	}
}
