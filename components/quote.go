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
	var buf [40]byte
	return string(appendQuote(buf[:0], sys, a))
}

// appendQuote appends a finding's value to b as quote writes it.
func appendQuote(b []byte, sys units.System, a any) []byte {
	switch v := a.(type) {
	case units.Length:
		return sys.AppendLength(b, v)
	case units.Area:
		return sys.AppendArea(b, v)
	case units.Volume:
		return sys.AppendVolume(b, v)
	case units.Mass:
		return sys.AppendMass(b, v)
	case units.Force:
		return sys.AppendForce(b, v)
	case units.Pressure:
		return sys.AppendPressure(b, v)
	case units.AbsolutePressure:
		return sys.AppendAbsolutePressure(b, v)
	case units.Flow:
		return sys.AppendFlow(b, v)
	case units.Velocity:
		return sys.AppendVelocity(b, v)
	case units.Displacement:
		return sys.AppendDisplacement(b, v)
	case units.RotationalSpeed:
		return sys.AppendRotationalSpeed(b, v)
	case units.Torque:
		return sys.AppendTorque(b, v)
	case units.Power:
		return sys.AppendPower(b, v)
	case units.Energy:
		return sys.AppendEnergy(b, v)
	case units.Temperature:
		return sys.AppendTemperature(b, v)
	case units.TemperatureDifference:
		return sys.AppendTemperatureDifference(b, v)
	case units.KinematicViscosity:
		return sys.AppendKinematicViscosity(b, v)
	case units.DynamicViscosity:
		return sys.AppendDynamicViscosity(b, v)
	case units.Density:
		return sys.AppendDensity(b, v)
	case units.SpecificHeatCapacity:
		return sys.AppendSpecificHeatCapacity(b, v)
	case units.HeatTransferCoefficient:
		return sys.AppendHeatTransferCoefficient(b, v)
	case units.ThermalConductivity:
		return sys.AppendThermalConductivity(b, v)
	case units.Stiffness:
		return sys.AppendStiffness(b, v)
	case units.Frequency:
		return sys.AppendFrequency(b, v)
	case units.Acceleration:
		return sys.AppendAcceleration(b, v)
	case float64:
		return fmt.Appendf(b, "%.4g", v)
	case string:
		return append(b, v...) // as %v writes it
	}
	return fmt.Append(b, a)
}
