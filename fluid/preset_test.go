package fluid

import (
	"errors"
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func TestTypicalPresets(t *testing.T) {
	for c, fam := range families {
		for _, g := range fam.grades {
			f, err := Typical(c, g)
			if err != nil {
				t.Fatalf("%v %v: %v", c, g, err)
			}
			if gg, err := f.Grade(); err != nil || gg != g {
				t.Errorf("%s: grade %v, %v", f.Name(), gg, err)
			}
			if vi, err := f.VI(); err != nil || math.Abs(vi-fam.vi) > 1e-8 {
				t.Errorf("%s: VI %v, %v; want %g", f.Name(), vi, err, fam.vi)
			}
			v40, _ := f.Viscosity(celsius(40))
			v100, _ := f.Viscosity(celsius(100))
			if !checktest.Close(float64(v40), float64(g.Mid()), 1e-12) || !checktest.Close(float64(v100), float64(f.V100()), 1e-12) {
				t.Errorf("%s: ν40 %v ν100 %v", f.Name(), v40, v100)
			}
			if _, err := f.Viscosity(f.PourPoint() - 1); !errors.Is(err, units.ErrRange) {
				t.Errorf("%s: below pour point err = %v", f.Name(), err)
			}
			// The data sheet rebuilds the same fluid.
			if back, err := FromDataSheet(f.DataSheet()); err != nil || back != f {
				t.Errorf("%s: FromDataSheet(DataSheet()) = %+v, %v; want %+v", f.Name(), back, err, f)
			}
		}
	}
	for _, c := range []struct {
		c     Class
		g     Grade
		param string
	}{{HM, VG1500, "g"}, {HFC, VG100, "g"}, {Class(0), VG46, "c"}, {HV, Grade(47), "g"}} {
		f, err := Typical(c.c, c.g)
		if !errors.Is(err, ErrNoPreset) || f != (Fluid{}) {
			t.Errorf("Typical(%v, %v) = %+v, %v; want ErrNoPreset", c.c, c.g, f, err)
		}
		wantRangeError(t, err, c.param)
	}
}

func TestFromDataSheet(t *testing.T) {
	// Demo data for a made-up HV 32 from a supplier's sheet.
	d := DataSheet{Name: "demo HV 32", Class: HV, V40: mm2s(32.5), V100: mm2s(6.3), Density15: 862,
		PourPoint: celsius(-42)}
	f, err := FromDataSheet(d)
	if err != nil {
		t.Fatal(err)
	}
	v100, _ := f.Viscosity(celsius(100))
	if !checktest.Close(float64(v100), float64(d.V100), 1e-12) || f.Density15() != 862 || f.Bulk() != mineralBulk ||
		f.Expansion() != families[HV].expansion || f.PourPoint() != d.PourPoint || f.Name() != d.Name || f.Class() != HV {
		t.Errorf("fluid %+v", f)
	}
	// The curve passes through both data-sheet points, so Grade and
	// Viscosity(40 °C) agree.
	if v40, _ := f.Curve().At(t40); !checktest.Close(float64(v40), float64(f.V40()), 1e-12) {
		t.Errorf("curve at 40 °C %v, V40 %v", v40, f.V40())
	}
	d.V100, d.VI = 0, 155
	f, err = FromDataSheet(d)
	if vi, _ := f.VI(); err != nil || math.Abs(vi-155) > 1e-8 {
		t.Errorf("from VI: %v, %v", vi, err)
	}
	// The figures a data sheet rarely gives override the class's.
	own := BulkModel{K0: 1.6 * units.Gigapascal, M: 11, C: 0.006, Gamma: 1.17}
	heat := ThermalModel{C40: 1950, CSlope: 3.5, K40: 0.13, KSlope: -1e-4}
	f, err = FromDataSheet(DataSheet{Class: HM, V40: mm2s(46), V100: mm2s(6.8), Density15: 870,
		Expansion: 7e-4, Bulk: own, Thermal: heat})
	if err != nil || f.Bulk() != own || f.Thermal() != heat || f.Expansion() != 7e-4 {
		t.Errorf("overrides: %+v, %v", f, err)
	}
}

// Every bad data sheet gives the zero Fluid and an error from
// fluid.FromDataSheet that names the DataSheet field, never a parameter of
// the functions FromDataSheet calls (CurveThrough's v1, v2 or t2).
// A VI printed beside V100 that agrees with them (ASTM D2270 example: U
// 22.83, Y 5.05 → VI 156) is accepted.
func TestFromDataSheetAgreeingVI(t *testing.T) {
	d := DataSheet{Class: HM, V40: mm2s(22.83), V100: mm2s(5.05), VI: 156, Density15: 870}
	if _, err := FromDataSheet(d); err != nil {
		t.Errorf("FromDataSheet with VI 156 beside V40 22.83 and V100 5.05: %v", err)
	}
}

func TestFromDataSheetBadInput(t *testing.T) {
	ok := DataSheet{Class: HM, V40: mm2s(32), V100: mm2s(6), Density15: 870}
	with := func(change func(*DataSheet)) DataSheet { d := ok; change(&d); return d }
	for _, c := range []struct {
		param string
		d     DataSheet
	}{
		{"Class", with(func(d *DataSheet) { d.Class = 0 })},
		{"Density15", with(func(d *DataSheet) { d.Density15 = 0 })},
		// A density near the float64 limit made Density and
		// DynamicViscosity return +Inf with a nil error when a caller
		// could set it on a Fluid; a data sheet refuses it.
		{"Density15", with(func(d *DataSheet) { d.Density15 = 1.79e308 })},
		{"PourPoint", with(func(d *DataSheet) { d.PourPoint = -1 })},
		{"PourPoint", with(func(d *DataSheet) { d.PourPoint = units.Temperature(math.Inf(1)) })},
		{"PourPoint", with(func(d *DataSheet) { d.PourPoint = units.Temperature(math.NaN()) })},
		{"PourPoint", with(func(d *DataSheet) { d.PourPoint = celsius(40) })},
		{"Expansion", with(func(d *DataSheet) { d.Expansion = -1e-4 })},
		{"Expansion", with(func(d *DataSheet) { d.Expansion = 1 })},
		{"Bulk.K0", with(func(d *DataSheet) { d.Bulk = BulkModel{M: 10, C: 0.005, Gamma: 1.1} })},
		{"Bulk.Gamma", with(func(d *DataSheet) { d.Bulk = BulkModel{K0: 1e9, M: 10, C: 0.005, Gamma: 0.9} })},
		{"Thermal.C40", with(func(d *DataSheet) { d.Thermal = ThermalModel{K40: 0.13} })},
		{"Thermal.CSlope", with(func(d *DataSheet) { d.Thermal = ThermalModel{C40: 1900, CSlope: -20, K40: 0.13} })},
		{"Thermal.KSlope", with(func(d *DataSheet) { d.Thermal = ThermalModel{C40: 1900, K40: 0.13, KSlope: math.Inf(1)} })},
		{"V40", with(func(d *DataSheet) { d.V40 = 0 })},
		{"V40", with(func(d *DataSheet) { d.V40 = mm2s(3e7) })},
		{"V100", with(func(d *DataSheet) { d.V100 = mm2s(40) })},
		{"V100", with(func(d *DataSheet) { d.V100 = mm2s(-1) })},
		{"V100", with(func(d *DataSheet) { d.V40, d.V100 = mm2s(46), mm2s(46*(1-1e-12)) })},
		{"vi", with(func(d *DataSheet) { d.V100, d.VI = 0, math.NaN() })},
		// A VI beside V100 must agree with them: ASTM D2270 example, U 22.83,
		// Y 5.05 → VI 156; a sheet that says 150 contradicts itself.
		{"VI", with(func(d *DataSheet) { d.V40, d.V100, d.VI = mm2s(22.83), mm2s(5.05), 150 })},
		{"VI", with(func(d *DataSheet) { d.VI = math.NaN() })},
	} {
		f, err := FromDataSheet(c.d)
		wantRangeError(t, err, c.param)
		if c.param != "vi" && !strings.Contains(err.Error(), "fluid.FromDataSheet") {
			t.Errorf("error %q does not name fluid.FromDataSheet", err)
		}
		if f != (Fluid{}) {
			t.Errorf("fluid %+v with an error", f)
		}
	}
}
