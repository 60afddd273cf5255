package fluid

import (
	"math"
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ErrNoPreset reports a class and grade for which Typical has no data. It
// also matches units.ErrRange.
var ErrNoPreset error = validate.Sentinel("no typical data for this class and grade")

// family holds the typical figures of one ISO 6743-4 class. All values are
// typical of the class as recalled from suppliers' literature in general
// (from memory), not of any product: the supplier's data sheet governs.
type family struct {
	vi        float64
	grades    []Grade
	density   func(Grade) float64 // kg/m³ at 15 °C
	pourPoint func(Grade) float64 // °C
	expansion float64             // 1/K
	bulk      BulkModel
	thermal   func(sg float64) ThermalModel
}

var mineralBulk = BulkModel{K0: 1.5 * units.Gigapascal, M: 10, C: 0.0055, Gamma: 1.15}

var families = map[Class]family{
	HM: {vi: 100, grades: []Grade{VG15, VG22, VG32, VG46, VG68, VG100},
		density: mineralDensity, pourPoint: func(g Grade) float64 { return -33 + 3*float64(gradeStep(g)) },
		expansion: 6.5e-4, bulk: mineralBulk, thermal: cragoeThermal},
	HV: {vi: 150, grades: []Grade{VG15, VG22, VG32, VG46, VG68, VG100},
		density: func(g Grade) float64 { return mineralDensity(g) - 5 }, pourPoint: func(g Grade) float64 { return -45 + 3*float64(gradeStep(g)) },
		expansion: 6.5e-4, bulk: mineralBulk, thermal: cragoeThermal},
	HFC: {vi: 190, grades: []Grade{VG22, VG32, VG46, VG68},
		density: func(Grade) float64 { return 1080 }, pourPoint: func(Grade) float64 { return -40 },
		expansion: 6.5e-4, bulk: BulkModel{K0: 3 * units.Gigapascal, M: 6, C: 0.002, Gamma: 1.05},
		thermal: func(float64) ThermalModel { return ThermalModel{C40: 3300, CSlope: 2, K40: 0.42, KSlope: 0.0005} }},
	HFDU: {vi: 185, grades: []Grade{VG32, VG46, VG68},
		density: func(Grade) float64 { return 920 }, pourPoint: func(Grade) float64 { return -30 },
		expansion: 7.5e-4, bulk: esterBulk, thermal: esterThermal},
	HEES: {vi: 180, grades: []Grade{VG32, VG46, VG68},
		density: func(Grade) float64 { return 920 }, pourPoint: func(Grade) float64 { return -36 },
		expansion: 7.5e-4, bulk: esterBulk, thermal: esterThermal},
}

var esterBulk = BulkModel{K0: 1.7 * units.Gigapascal, M: 10, C: 0.005, Gamma: 1.15}

func esterThermal(float64) ThermalModel {
	return ThermalModel{C40: 2000, CSlope: 3, K40: 0.15, KSlope: -0.0001}
}

// mineralDensity is a typical density at 15 °C of a mineral hydraulic oil.
func mineralDensity(g Grade) float64 { return 860 + 5*float64(gradeStep(g)) }

// gradeStep counts grades from VG 15 (0) upward.
func gradeStep(g Grade) int {
	for i, h := range []Grade{VG15, VG22, VG32, VG46, VG68, VG100} {
		if g == h {
			return i
		}
	}
	return 0
}

// cragoeThermal is Cragoe's linear correlations (see CragoeSpecificHeat and
// CragoeConductivity) written about 40 °C for specific gravity sg.
func cragoeThermal(sg float64) ThermalModel {
	t41 := t40.Add(units.DeltaKelvin)
	c40, _ := CragoeSpecificHeat(sg, t40)
	c41, _ := CragoeSpecificHeat(sg, t41)
	k40, _ := CragoeConductivity(sg, t40)
	k41, _ := CragoeConductivity(sg, t41)
	return ThermalModel{C40: c40, CSlope: float64(c41 - c40), K40: k40, KSlope: float64(k41 - k40)}
}

// Typical returns a fluid of class c and grade g with typical properties:
//
//	class  VI   ρ₁₅ kg/m³   pour point  K₀ (40 °C)  grades
//	HM     100  860–885     −33…−18 °C  1.5 GPa     VG 15–100
//	HV     150  855–880     −45…−30 °C  1.5 GPa     VG 15–100
//	HFC    190  1080        −40 °C      3.0 GPa     VG 22–68
//	HFDU   185  920         −30 °C      1.7 GPa     VG 32–68
//	HEES   180  920         −36 °C      1.7 GPa     VG 32–68
//
// with ν₄₀ at the grade midpoint and ν₁₀₀ from the VI (V100ForVI). Within
// the mineral classes, density and pour point step evenly from the lightest
// to the heaviest grade across the ranges shown: a simplification of ours,
// not data for each grade. The values are typical of each class (from
// memory), not of any product; the
// supplier's data sheet governs, and FromDataSheet builds a fluid from it.
// Mineral oils take specific heat and conductivity from Cragoe's
// correlations; the others typical constants. Water-glycols (HFC) hold
// 35–50 % water: keep them below about 50 °C, watch the water content, and
// treat their D341 curve as a rough guide. An error matching ErrNoPreset
// means no typical data for that class and grade.
func Typical(c Class, g Grade) (Fluid, error) {
	fam, ok := families[c]
	if !ok || !hasGrade(fam.grades, g) {
		return Fluid{}, &PresetError{Class: c, Grade: g}
	}
	v100, err := V100ForVI(g.Mid(), fam.vi)
	if err != nil {
		return Fluid{}, err
	}
	return build(DataSheet{Name: c.String() + " " + g.String() + " (typical)", Class: c, V40: g.Mid(),
		Density15: units.Density(fam.density(g)), PourPoint: units.TemperatureFromCelsius(fam.pourPoint(g))}, v100)
}

func hasGrade(gs []Grade, g Grade) bool {
	for _, h := range gs {
		if h == g {
			return true
		}
	}
	return false
}

// PresetError reports a class and grade without typical data. It unwraps
// to ErrNoPreset and to a *units.RangeError naming the parameter (c for an
// unknown class, g for a grade the class has no data for), so it matches
// units.ErrRange.
type PresetError struct {
	Class Class
	Grade Grade
}

// Error implements the error interface.
func (e *PresetError) Error() string {
	return "fluid.Typical: " + e.Class.String() + " " + e.Grade.String() + ": " + ErrNoPreset.Error()
}

// Unwrap returns ErrNoPreset and the range error.
func (e *PresetError) Unwrap() []error { return []error{ErrNoPreset, e.rangeError()} }

func (e *PresetError) rangeError() error {
	const fn = "fluid.Typical"
	fam, ok := families[e.Class]
	if !ok {
		return validate.Fail(fn, "c", float64(e.Class), "HM, HV, HFC, HFDU or HEES")
	}
	names := make([]string, len(fam.grades))
	for i, g := range fam.grades {
		names[i] = g.String()
	}
	return &units.RangeError{Func: fn, Param: "g", Value: e.Grade.String(),
		Valid: "a grade with typical " + e.Class.String() + " data: " + strings.Join(names, ", ")}
}

// DataSheet holds the figures a supplier prints for a hydraulic fluid.
// Give V100, or leave it 0 and give VI (then V100 = V100ForVI(V40, VI)); a
// VI given beside V100 must agree with it (ASTM D2270, within ±1).
// PourPoint may be 0 when not known. Expansion, Bulk and Thermal, which a
// data sheet rarely gives, take the typical values of Class when left zero.
type DataSheet struct {
	Name      string
	Class     Class // for the properties a data sheet rarely gives (bulk modulus, heat)
	V40, V100 units.KinematicViscosity
	VI        float64 // with V100 0, sets V100; beside V100, must agree with it to ±1
	Density15 units.Density
	PourPoint units.Temperature
	Expansion float64      // volumetric thermal expansion, 1/K; 0 for the class's typical value
	Bulk      BulkModel    // the zero BulkModel for the class's typical model
	Thermal   ThermalModel // the zero ThermalModel for the class's typical model
}

// FromDataSheet builds a Fluid from a data sheet: the D341 curve through
// V40 at 40 °C and V100 at 100 °C, the density at 15 °C, the pour point, and
// for the figures left zero (expansion, bulk modulus, heat) the typical
// values of the class. V40 and V100 must lie within [MinViscosity,
// MaxViscosity], V100 below V40; Density15 from 500 to 2000 kg/m³; PourPoint
// 0 (not known) or above 0 K and below 40 °C; Expansion from 0 to
// 2·10⁻³ 1/K; Bulk and Thermal within the limits of BulkModel and
// ThermalModel. Errors match units.ErrRange and name the DataSheet field
// (Bulk.K0 for a field of Bulk); the Fluid is then the zero Fluid.
func FromDataSheet(d DataSheet) (Fluid, error) {
	const fn = "fluid.FromDataSheet"
	if err := checkSheet(fn, d); err != nil {
		return Fluid{}, err
	}
	v100 := d.V100
	if v100 == 0 {
		var err error
		if v100, err = V100ForVI(d.V40, d.VI); err != nil {
			return Fluid{}, err
		}
	} else if err := checkV100(fn, d.V40, v100); err != nil {
		return Fluid{}, err
	} else if err := checkVI(fn, d); err != nil {
		return Fluid{}, err
	}
	f, err := build(d, v100)
	if err != nil { // V100 so close to V40 that the curve is nearly flat
		return Fluid{}, validate.Fail(fn, "V100", v100,
			"below V40 = "+d.V40.String()+" by enough that the D341 curve spans 0.21–2·10⁷ mm²/s at finite temperatures")
	}
	return f, nil
}

// checkSheet checks every field of a data sheet but V100 and VI.
func checkSheet(fn string, d DataSheet) error {
	if _, ok := families[d.Class]; !ok {
		return validate.Fail(fn, "Class", float64(d.Class), "HM, HV, HFC, HFDU or HEES")
	}
	if err := validate.InRange(fn, "Density15", d.Density15, minDensity15, maxDensity15); err != nil {
		return err
	}
	if pp := d.PourPoint; pp != 0 && !(pp > 0 && pp < maxPourPoint) {
		return validate.Fail(fn, "PourPoint", pp, "0 (not known), or above 0 K and below 40 °C (V40 is measured on the flowing fluid)")
	}
	if d.Expansion != 0 {
		if err := validate.InRange(fn, "Expansion", d.Expansion, 0, maxExpansion); err != nil {
			return err
		}
	}
	if d.Bulk != (BulkModel{}) {
		if err := d.Bulk.validate(fn, "Bulk."); err != nil {
			return err
		}
	}
	if d.Thermal != (ThermalModel{}) {
		if err := d.Thermal.validate(fn, "Thermal."); err != nil {
			return err
		}
	}
	return validate.InRange(fn, "V40", d.V40, MinViscosity, MaxViscosity)
}

// checkVI checks that a VI given beside V100 agrees with the viscosity index
// of V40 and V100 (ASTM D2270) to within one unit (data sheets print it
// rounded); a VI of 0 means not given.
func checkVI(fn string, d DataSheet) error {
	if d.VI == 0 {
		return nil
	}
	vi, err := ViscosityIndex(d.V40, d.V100)
	if err != nil || !(math.Abs(vi-d.VI) <= 1) { // a NaN VI fails too
		want := "0 (not given) or the viscosity index of V40 and V100"
		if err == nil {
			want += ", " + strconv.FormatFloat(RoundVI(vi), 'f', 0, 64) + " ± 1"
		}
		return validate.Fail(fn, "VI", d.VI, want)
	}
	return nil
}

// checkV100 checks a data sheet's 100 °C viscosity against D341's limits
// and its 40 °C viscosity.
func checkV100(fn string, v40, v100 units.KinematicViscosity) error {
	if err := validate.InRange(fn, "V100", v100, MinViscosity, MaxViscosity); err != nil {
		return err
	}
	if v100 >= v40 {
		return validate.Fail(fn, "V100", v100, "< V40 = "+v40.String())
	}
	return nil
}

// build makes the fluid of a checked data sheet with 100 °C viscosity v100,
// filling the zero figures from the class.
func build(d DataSheet, v100 units.KinematicViscosity) (Fluid, error) {
	curve, err := CurveThrough(t40, d.V40, t100, v100)
	if err != nil {
		return Fluid{}, err
	}
	fam := families[d.Class]
	f := Fluid{
		name: d.Name, class: d.Class, curve: curve, v40: d.V40, v100: v100, pourPoint: d.PourPoint,
		density15: d.Density15, expansion: d.Expansion, bulk: d.Bulk, thermal: d.Thermal,
	}
	if f.expansion == 0 {
		f.expansion = fam.expansion
	}
	if f.bulk == (BulkModel{}) {
		f.bulk = fam.bulk
	}
	if f.thermal == (ThermalModel{}) {
		// Specific gravity against water at 60 °F, 999.0 kg/m³ (ρ₁₅ stands
		// in for ρ at 60 °F), kept in Cragoe's range; only mineral classes
		// use it.
		sg := float64(d.Density15) / 999.0
		f.thermal = fam.thermal(min(max(sg, minCragoeSG), maxCragoeSG))
	}
	return f, nil
}
