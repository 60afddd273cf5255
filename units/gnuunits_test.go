package units

import (
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
)

// GNU units (Debian package units), version 2.22 with its bundled
// definitions.units, is an independent implementation of the same
// definitions. Each row converts a value with Convert (or a typed parser
// and accessor) and with `units -t -o %.17g FROM TO`, and compares.
//
// GNU spellings differ from ours: its plain gallon is the US gallon,
// brgallon the imperial one, btu the International Table BTU, hp the
// mechanical horsepower (550 ft·lbf/s), psi is pound force / inch², Hg in
// inHg is the conventional 13.5951 g/cm³ column, and temperatures on a
// scale are functions: tempC(20), tempF(68).
//
// Tolerance: relative 1e-14 (about 45 ulp), or 1e-12 absolute for
// temperature points. GNU units evaluates its definition chains in double
// precision with several roundings per chain (its 1 gallon is
// 0.0037854117840000006 m³); a wrong factor digit would differ by 1e-10 or
// more, so the tolerance cannot hide one.

// gnuUnitsRow is one conversion.
type gnuUnitsRow struct {
	value    float64
	from, to string // our spellings
	gnuFrom  string // GNU units "have" expression, the value included
	gnuTo    string // GNU units "want" expression
}

var gnuUnitsTable = []gnuUnitsRow{
	// Pressure.
	{1, "psi", "Pa", "1 psi", "Pa"},
	{3000, "psi", "bar", "3000 psi", "bar"},
	{210, "bar", "psi", "210 bar", "psi"},
	{1, "ksi", "MPa", "1 ksi", "MPa"},
	{1, "kgf/cm²", "bar", "1 kgf/cm^2", "bar"},
	{29.92, "inHg", "kPa", "29.92 inHg", "kPa"},
	{1, "atm", "psia", "1 atm", "psi"},
	{14.7, "psia", "bara", "14.7 psi", "bar"},
	{720, "mmHg", "kPa", "720 mmHg", "kPa"},
	{500, "Torr", "Pa", "500 torr", "Pa"},
	{28, "inHg vac", "psi", "-28 inHg", "psi"},   // a vacuum reading is negative gauge
	{600, "mmHg vac", "kPa", "-600 mmHg", "kPa"}, // GNU has no vacuum words
	{2, "kg/cm²", "psi", "2 kgf/cm^2", "psi"},    // kg/cm² read as kgf/cm²
	{25, "psid", "bar", "25 psi", "bar"},
	// Volume and flow.
	{1, "gal", "L", "1 gallon", "L"},
	{1, "UK gal", "L", "1 brgallon", "L"},
	{1, "in³", "cm³", "1 in^3", "cm^3"},
	{1, "gpm", "L/min", "1 gpm", "L/min"},
	{100, "L/min", "gpm", "100 L/min", "gallon/min"},
	{1, "in³/s", "L/min", "1 in^3/s", "L/min"},
	{30, "m³/h", "L/min", "30 m^3/hr", "L/min"},
	{12, "gph", "L/min", "12 gallon/hr", "L/min"},
	// Displacement and speed.
	{2.5, "in³/rev", "cm³/rev", "2.5 in^3/rev", "cm^3/rev"},
	{1800, "rpm", "rad/s", "1800 rpm", "radian/s"},
	// Force, mass, torque.
	{1, "lbf", "N", "1 lbf", "N"},
	{1, "kgf", "lbf", "1 kgf", "lbf"},
	{1, "lbm", "kg", "1 lb", "kg"},
	{50, "tf", "kN", "50 tonne force", "kN"},
	{50, "US tonf", "kN", "50 shortton force", "kN"},
	{50, "UK tonf", "lbf", "50 longton force", "lbf"},
	{1, "t", "lbm", "1 tonne", "lb"},
	{100, "lbf·ft", "N·m", "100 lbf ft", "N m"},
	{1, "lbf·in", "N·m", "1 lbf in", "N m"},
	// Power and energy.
	{1, "hp", "W", "1 hp", "W"},
	{1, "PS", "W", "1 metrichorsepower", "W"},
	{1, "hp", "psi*gpm", "1 hp", "psi gallon/min"},
	{12000, "BTU/h", "kW", "12000 btu/hr", "kW"},
	{1, "BTU", "J", "1 btu", "J"},
	{1, "kWh", "BTU", "1 kWh", "btu"},
	// Velocity and acceleration.
	{15, "ft/s", "m/s", "15 ft/s", "m/s"},
	{4, "in/s", "mm/s", "4 in/s", "mm/s"},
	{1, "g₀", "ft/s²", "1 gravity", "ft/s^2"},
	// Viscosity, density, thermal.
	{46, "cSt", "St", "46 centistokes", "stokes"},
	{32, "cP", "Pa·s", "32 centipoise", "Pa s"},
	{1, "lbm/ft³", "kg/m³", "1 lb/ft^3", "kg/m^3"},
	{7.2, "lbm/gal", "g/cm³", "7.2 lb/gallon", "g/cm^3"},
	{1, "BTU/(lbm·°F)", "J/(kg·K)", "1 btu/(lb degF)", "J/(kg K)"},
	{1, "BTU/(h·ft²·°F)", "W/(m²·K)", "1 btu/(hr ft^2 degF)", "W/(m^2 K)"},
	{1, "BTU/(h·ft·°F)", "W/(m·K)", "1 btu/(hr ft degF)", "W/(m K)"},
	{1, "lbf/in", "N/mm", "1 lbf/in", "N/mm"},
	// Temperature points (functions in GNU units) and intervals.
	{20, "°C", "°F", "tempC(20)", "tempF"},
	{140, "°F", "°C", "tempF(140)", "tempC"},
	{-40, "°F", "K", "tempF(-40)", "K"},
	{671.67, "°R", "°C", "671.67 degR", "tempC"},
	{10, "Δ°C", "Δ°F", "10 degC", "degF"},
}

func TestGNUUnits(t *testing.T) {
	path := checktest.GNUUnits(t)
	if len(gnuUnitsTable) < 25 {
		t.Fatalf("only %d cross-checks; keep at least 25 (one per quantity type and more for the trade units)", len(gnuUnitsTable))
	}
	for _, r := range gnuUnitsTable {
		want := checktest.GNUUnitsValue(t, path, r.gnuFrom, r.gnuTo)
		got, err := Convert(r.value, r.from, r.to)
		if err != nil {
			t.Errorf("Convert(%g, %q, %q): %v", r.value, r.from, r.to, err)
			continue
		}
		tol := 1e-14 * math.Abs(want)
		if strings.HasPrefix(r.gnuFrom, "temp") || strings.HasPrefix(r.gnuTo, "temp") {
			tol = 1e-12
		}
		if math.Abs(got-want) > tol {
			t.Errorf("%g %s = %.17g %s; GNU units %q → %q gives %.17g", r.value, r.from, got, r.to, r.gnuFrom, r.gnuTo, want)
		}
	}
}

// TestGNUUnitsTyped checks typed parsing and accessors, not only Convert,
// against GNU units: the value a form field gives and the number a report
// shows.
func TestGNUUnitsTyped(t *testing.T) {
	path := checktest.GNUUnits(t)
	rel := func(got, want float64) bool { return math.Abs(got-want) <= 1e-14*math.Abs(want) }

	p, err := ParsePressure("3000 psig")
	if want := checktest.GNUUnitsValue(t, path, "3000 psi", "bar"); err != nil || !rel(p.Bar(), want) {
		t.Errorf("ParsePressure(3000 psig).Bar() = %.17g, %v; GNU units %.17g", p.Bar(), err, want)
	}
	q, err := ParseFlow("1.3 gal/min")
	if want := checktest.GNUUnitsValue(t, path, "1.3 gallon/min", "L/min"); err != nil || !rel(q.LitresPerMinute(), want) {
		t.Errorf("ParseFlow(1.3 gal/min).LitresPerMinute() = %.17g, %v; GNU units %.17g", q.LitresPerMinute(), err, want)
	}
	d, err := ParseDisplacement("1.95 in^3/rev")
	if want := checktest.GNUUnitsValue(t, path, "1.95 in^3", "cm^3"); err != nil || !rel(d.CubicCentimetresPerRevolution(), want) {
		t.Errorf("ParseDisplacement(1.95 in^3/rev) = %.17g cm³/rev, %v; GNU units %.17g", d.CubicCentimetresPerRevolution(), err, want)
	}
	w := 7.5 * Kilowatt
	if want := checktest.GNUUnitsValue(t, path, "7.5 kW", "hp"); !rel(w.Horsepower(), want) {
		t.Errorf("7.5 kW = %.17g hp; GNU units %.17g", w.Horsepower(), want)
	}
	temp, err := ParseTemperature("120 °F")
	if want := checktest.GNUUnitsValue(t, path, "tempF(120)", "tempC"); err != nil || math.Abs(temp.Celsius()-want) > 1e-12 {
		t.Errorf("ParseTemperature(120 °F).Celsius() = %.17g, %v; GNU units %.17g", temp.Celsius(), err, want)
	}
}
