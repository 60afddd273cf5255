package components

import (
	"fmt"

	"github.com/hydrosize/hydrosize/units"
)

// metric is the metric trade system findings are written in by default.
func metric() units.System { return units.Metric() }

// quote formats a finding's value: a typed quantity in the units of sys,
// anything else with fmt's %v.
func quote(sys units.System, a any) string {
	switch v := a.(type) {
	case units.Length:
		return sys.FormatLength(v)
	case units.Area:
		return sys.FormatArea(v)
	case units.Volume:
		return sys.FormatVolume(v)
	case units.Mass:
		return sys.FormatMass(v)
	case units.Force:
		return sys.FormatForce(v)
	case units.Pressure:
		return sys.FormatPressure(v)
	case units.AbsolutePressure:
		return sys.FormatAbsolutePressure(v)
	case units.Flow:
		return sys.FormatFlow(v)
	case units.Velocity:
		return sys.FormatVelocity(v)
	case units.Displacement:
		return sys.FormatDisplacement(v)
	case units.RotationalSpeed:
		return sys.FormatRotationalSpeed(v)
	case units.Torque:
		return sys.FormatTorque(v)
	case units.Power:
		return sys.FormatPower(v)
	case units.Energy:
		return sys.FormatEnergy(v)
	case units.Temperature:
		return sys.FormatTemperature(v)
	case units.TemperatureDifference:
		return sys.FormatTemperatureDifference(v)
	case units.KinematicViscosity:
		return sys.FormatKinematicViscosity(v)
	case units.DynamicViscosity:
		return sys.FormatDynamicViscosity(v)
	case units.Density:
		return sys.FormatDensity(v)
	case units.SpecificHeatCapacity:
		return sys.FormatSpecificHeatCapacity(v)
	case units.HeatTransferCoefficient:
		return sys.FormatHeatTransferCoefficient(v)
	case units.ThermalConductivity:
		return sys.FormatThermalConductivity(v)
	case units.Stiffness:
		return sys.FormatStiffness(v)
	case units.Frequency:
		return sys.FormatFrequency(v)
	case units.Acceleration:
		return sys.FormatAcceleration(v)
	case float64:
		return fmt.Sprintf("%.4g", v)
	}
	return fmt.Sprint(a)
}
