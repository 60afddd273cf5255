package units

import (
	"testing"

	"gonum.org/v1/gonum/unit"
)

// The SI dimension of every quantity type, checked against
// gonum.org/v1/gonum/unit v0.17.0 (a general-purpose reference library).
// Where gonum has a typed quantity (unit.Pressure, unit.Torque, …) its
// Unit() gives the dimensions; otherwise the gonum unit is built as a
// product or quotient of gonum quantities, the way a textbook writes the
// coherent SI unit (kinematic viscosity = m²/s, specific heat = J/(kg·K)).
// Our eighth base, the revolution, maps to gonum's AngleDim (gonum counts
// angle in radians; 1 rev = 2π rad changes the factor, not the dimension).
//
// Our side of each check parses the type's SI unit as text with Parse and
// reads the dimension vector with Dimension.Exponent, and also compares it
// with the dimension the typed parser enforces.

func one[T unit.Uniter](x T) *unit.Unit { return x.Unit() }

var gonumDims = []struct {
	typ    string     // our type name
	siUnit string     // its coherent SI unit, as text
	gonum  *unit.Unit // the same unit built from gonum
}{
	{"Length", "1 m", one(unit.Length(1))},
	{"Area", "1 m²", one(unit.Area(1))},
	{"Volume", "1 m³", one(unit.Volume(1))},
	{"Mass", "1 kg", one(unit.Mass(1))},
	{"Force", "1 N", one(unit.Force(1))},
	{"Pressure", "1 Pa", one(unit.Pressure(1))},
	{"AbsolutePressure", "1 Pa", one(unit.Pressure(1))},
	{"Flow", "1 m³/s", one(unit.Volume(1)).Div(unit.Time(1))},
	{"Velocity", "1 m/s", one(unit.Velocity(1))},
	{"Displacement", "1 m³/rev", one(unit.Volume(1)).Div(unit.Angle(1))},
	{"RotationalSpeed", "1 rev/s", one(unit.Angle(1)).Div(unit.Time(1))},
	{"Torque", "1 N·m", one(unit.Torque(1))},
	{"Power", "1 W", one(unit.Power(1))},
	{"Energy", "1 J", one(unit.Energy(1))},
	{"Temperature", "1 K", one(unit.Temperature(1))},
	{"TemperatureDifference", "1 ΔK", one(unit.Temperature(1))},
	{"KinematicViscosity", "1 m²/s", one(unit.Area(1)).Div(unit.Time(1))},
	{"DynamicViscosity", "1 Pa·s", one(unit.Pressure(1)).Mul(unit.Time(1))},
	{"Density", "1 kg/m³", one(unit.Mass(1)).Div(unit.Volume(1))},
	{"SpecificHeatCapacity", "1 J/(kg·K)", one(unit.Energy(1)).Div(unit.Mass(1)).Div(unit.Temperature(1))},
	{"HeatTransferCoefficient", "1 W/(m²·K)", one(unit.Power(1)).Div(unit.Area(1)).Div(unit.Temperature(1))},
	{"ThermalConductivity", "1 W/(m·K)", one(unit.Power(1)).Div(unit.Length(1)).Div(unit.Temperature(1))},
	{"Stiffness", "1 N/m", one(unit.Force(1)).Div(unit.Length(1))},
	{"Frequency", "1 Hz", one(unit.Frequency(1))},
	{"Acceleration", "1 m/s²", one(unit.Acceleration(1))},
}

// gonumBase maps our bases to gonum's.
var gonumBase = map[Base]unit.Dimension{
	BaseLength:      unit.LengthDim,
	BaseMass:        unit.MassDim,
	BaseTime:        unit.TimeDim,
	BaseCurrent:     unit.CurrentDim,
	BaseTemperature: unit.TemperatureDim,
	BaseAmount:      unit.MoleDim,
	BaseLuminous:    unit.LuminousIntensityDim,
	BaseAngle:       unit.AngleDim,
}

// toGonum writes our dimension vector as a gonum unit of value 1.
func toGonum(d Dimension) *unit.Unit {
	dims := unit.Dimensions{}
	for b, g := range gonumBase {
		if n := d.Exponent(b); n != 0 {
			dims[g] = n
		}
	}
	return unit.New(1, dims)
}

func TestGonumDimensions(t *testing.T) {
	seen := make(map[string]bool)
	for _, c := range gonumDims {
		seen[c.typ] = true
		q, err := Parse(c.siUnit)
		if err != nil {
			t.Errorf("%s: Parse(%q): %v", c.typ, c.siUnit, err)
			continue
		}
		if q.Value() != 1 {
			t.Errorf("%s: Parse(%q).Value() = %g, want 1 (a coherent SI unit)", c.typ, c.siUnit, q.Value())
		}
		ours := toGonum(q.Dimension())
		if !unit.DimensionsMatch(ours, c.gonum) {
			t.Errorf("%s: our dimension %v (%v) ≠ gonum %v", c.typ, q.Dimension(), ours.Dimensions(), c.gonum.Dimensions())
		}
		info := typeByName(c.typ)
		if info == nil {
			t.Errorf("%s: no such quantity type", c.typ)
			continue
		}
		if info.dim != q.Dimension() {
			t.Errorf("%s: the typed parser wants %v, but %q has %v", c.typ, info.dim, c.siUnit, q.Dimension())
		}
	}
	for _, info := range allTypes {
		if !seen[info.name] {
			t.Errorf("quantity type %s has no gonum dimension check", info.name)
		}
	}
}

// TestGonumDimensionsDiffer makes sure the check can fail: quantities that
// engineers confuse have different dimensions in both libraries, except
// torque and energy, which SI itself does not tell apart.
func TestGonumDimensionsDiffer(t *testing.T) {
	for _, c := range []struct{ a, b string }{
		{"1 Pa", "1 N"},
		{"1 m³/s", "1 m³/rev"},
		{"1 rev/s", "1 Hz"},
		{"1 m²/s", "1 Pa·s"},
		{"1 W", "1 J"},
	} {
		qa, errA := Parse(c.a)
		qb, errB := Parse(c.b)
		if errA != nil || errB != nil {
			t.Fatalf("Parse: %v, %v", errA, errB)
		}
		if unit.DimensionsMatch(toGonum(qa.Dimension()), toGonum(qb.Dimension())) {
			t.Errorf("%s and %s should differ in dimension", c.a, c.b)
		}
	}
	torque, _ := Parse("1 N·m")
	energy, _ := Parse("1 J")
	if !unit.DimensionsMatch(one(unit.Torque(1)), one(unit.Energy(1))) || torque.Dimension() != energy.Dimension() {
		t.Errorf("torque and energy: gonum %v/%v, ours %v/%v", one(unit.Torque(1)).Dimensions(), one(unit.Energy(1)).Dimensions(), torque.Dimension(), energy.Dimension())
	}
}
