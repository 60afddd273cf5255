package hydro

import (
	"github.com/hydrosize/hydrosize/fluid"
)

// class returns the fluid's ISO 6743-4 class: HM when none is given.
func (f Fluid) class() fluid.Class {
	for c := fluid.HM; c <= fluid.HEES; c++ {
		if c.String() == f.Class {
			return c
		}
	}
	return fluid.HM
}

// build makes the fluid the spec names: data-sheet values through
// fluid.FromDataSheet, a grade and VI through the class's typical figures
// with the VI replaced, or a preset through fluid.Typical.
func (f Fluid) build() (fluid.Fluid, error) {
	switch {
	case f.V40 != 0:
		return fluid.FromDataSheet(fluid.DataSheet{Name: f.Name, Class: f.class(), V40: f.V40, V100: f.V100,
			VI: f.VI, Density15: f.Density, PourPoint: f.PourPoint})
	case f.VI != 0:
		typ, err := fluid.Typical(f.class(), f.Grade)
		if err != nil {
			return fluid.Fluid{}, err
		}
		d := typ.DataSheet()
		d.V100, d.VI = 0, f.VI
		d.Name = f.class().String() + " " + f.Grade.String() + ", VI " + format(f.VI)
		if f.Name != "" {
			d.Name = f.Name
		}
		return fluid.FromDataSheet(d)
	}
	typ, err := fluid.Typical(f.class(), f.Grade)
	if err != nil || f.Name == "" {
		return typ, err
	}
	d := typ.DataSheet()
	d.Name = f.Name
	return fluid.FromDataSheet(d)
}

// fluid converts the spec's window to fluid's.
func (w Window) fluid() fluid.Window {
	return fluid.Window{Min: w.Min, OptimumLow: w.OptimumLow, OptimumHigh: w.OptimumHigh, Max: w.Max}
}
