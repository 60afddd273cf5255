package line

import (
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Oil is the state of the oil flowing in a line: its temperature, kinematic
// viscosity and density. Build it with OilAt from a fluid.Fluid, or fill
// it from a data sheet.
type Oil struct {
	Temperature units.Temperature // for the record; the drop uses Viscosity and Density
	Viscosity   units.KinematicViscosity
	Density     units.Density
}

// OilAt returns the state of fluid f at temperature t and atmospheric
// pressure: the viscosity from its ASTM D341 curve and the density from its
// thermal expansion (fluid.Fluid.Viscosity and fluid.Fluid.Density). The
// rise of density with line pressure (about 0.7 % per 100 bar for mineral
// oil) is left out, as is the rise of viscosity with pressure. It fails as
// those methods fail (below the pour point, outside the curve's range),
// with an error that names t or the fluid's data as f.Curve, f.Density15, ….
func OilAt(f fluid.Fluid, t units.Temperature) (Oil, error) {
	const fn = "line.OilAt"
	nu, err := f.Viscosity(t)
	if err != nil {
		return Oil{}, validate.Renamed(err, fn, fluidFields("f.", "t", "p"))
	}
	rho, err := f.Density(t, 0)
	if err != nil {
		return Oil{}, validate.Renamed(err, fn, fluidFields("f.", "t", "p"))
	}
	return Oil{Temperature: t, Viscosity: nu, Density: rho}, nil
}

// fluidFields maps the parameters in an error of a fluid.Fluid method to
// the caller's: the temperature to temp, the pressure to pres, and the
// fluid's own data (its curve, Density15, Bulk.K0, …) to fields of prefix.
func fluidFields(prefix, temp, pres string) func(string) string {
	return validate.Fields(prefix, map[string]string{"t": temp, "p": pres, "curve": prefix + "Curve"})
}

func (o Oil) check(fn string) error {
	if err := validate.Positive(fn, "oil.Viscosity", o.Viscosity); err != nil {
		return err
	}
	return validate.Positive(fn, "oil.Density", o.Density)
}

// velocityHead returns ρ·v²/2, the dynamic pressure that minor losses and
// Darcy–Weisbach are written in.
func velocityHead(rho units.Density, v units.Velocity) units.Pressure {
	return units.Pressure(0.5 * float64(rho) * float64(v) * float64(v))
}
