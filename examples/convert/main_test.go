package main

import (
	"bytes"
	"errors"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

func TestRunDemo(t *testing.T) {
	var b bytes.Buffer
	if err := run(&b, demo); err != nil {
		t.Fatal(err)
	}
	// Expected conversions: NIST SP 811 definitions (psi, US gallon, in³),
	// rounded to the four significant digits the Metric and USCustomary
	// systems print.
	for _, want := range []string{
		"180 bar            2611 psi", // 180e5 Pa / 6894.757 Pa/psi = 2610.68
		"10.98 L/min        2.9 gpm",  // 2.9 × 3.785411784 L = 10.978
		"12.29 cm³/rev      0.75 in³/rev ",
		"63 mm              2.48 in",
		"48 °C              118.4 °F           temperature",
		"0.9997 bara        14.5 psia", // 14.5 × 6894.757 Pa = 0.99974 bar
		"1.5 kW             2.012 hp",  // 1500 W / 745.69987 W/hp
	} {
		if !strings.Contains(b.String(), want) {
			t.Errorf("output lacks %q:\n%s", want, b.String())
		}
	}
}

func TestRunBadInput(t *testing.T) {
	err := run(&bytes.Buffer{}, []string{"12 furlongs"})
	if !errors.Is(err, units.ErrUnknownUnit) {
		t.Fatalf("err = %v, want ErrUnknownUnit", err)
	}
}
