package thermal

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ThrottleRise returns the temperature rise of oil of density rho and
// specific heat c throttled across pressure drop dp with no work done and
// no heat lost (a relief valve, a flow control): ΔT = Δp/(ρ·c), from the
// steady-flow energy balance (the pressure energy Δp per unit volume
// becomes heat in ρ·c per kelvin). For mineral oil (ρ ≈ 870 kg/m³,
// c ≈ 1.9 kJ/(kg·K), common practice) that is about 6 K per 100 bar. dp must be finite and ≥ 0, rho and c finite and > 0.
func ThrottleRise(dp units.Pressure, rho units.Density, c units.SpecificHeatCapacity) (units.TemperatureDifference, error) {
	const fn = "thermal.ThrottleRise"
	if err := validate.NonNegative(fn, "dp", dp); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "rho", rho); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "c", c); err != nil {
		return 0, err
	}
	d := units.TemperatureDifference(float64(dp) / (float64(rho) * float64(c)))
	return validate.Checked(fn, "ΔT", d)
}

// ThrottleRiseOf returns ThrottleRise with the density and specific heat
// of fluid f at temperature t (fluid.Fluid.Density at atmospheric
// pressure, downstream of the throttle; fluid.Fluid.SpecificHeat).
func ThrottleRiseOf(dp units.Pressure, f fluid.Fluid, t units.Temperature) (units.TemperatureDifference, error) {
	const fn = "thermal.ThrottleRiseOf"
	names := validate.Fields("f.", map[string]string{"t": "t", "dp": "dp", "ΔT": "ΔT"})
	rho, err := f.Density(t, 0)
	if err != nil {
		return 0, validate.Renamed(err, fn, names)
	}
	c, err := f.SpecificHeat(t)
	if err != nil {
		return 0, validate.Renamed(err, fn, names)
	}
	d, err := ThrottleRise(dp, rho, c)
	return d, validate.Renamed(err, fn, names)
}

// CoolerNeed is what a cooler must do: hold the oil at or below MaxOil
// while the circuit makes Load of heat at the hottest ambient MaxAmbient,
// with the reservoir's surfaces (conductance Dissipation, 0 for none)
// shedding part of it.
type CoolerNeed struct {
	Load        units.Power // mean heat load (HeatLoad.Mean)
	Dissipation Conductance // natural dissipation of the reservoir and lines (h·A)
	MaxOil      units.Temperature
	MaxAmbient  units.Temperature
}

// Cooler is the duty a cooler must meet.
type Cooler struct {
	Duty     units.Power                         // heat the cooler must remove, ≥ 0
	Specific Conductance                         // Duty per kelvin of entering temperature difference: what its rating must reach
	ETD      units.TemperatureDifference         // entering temperature difference MaxOil − MaxAmbient
	Natural  units.Power                         // what the surfaces shed with the oil at MaxOil
	Steady   units.Temperature                   // the oil's steady temperature at MaxAmbient without a cooler (0 with a load and no dissipation: it has none)
	Check    components.Check[units.Temperature] // Steady against MaxOil; the zero Check (none made) when Steady is 0
	Findings components.Findings
}

// BTUPerHour returns the duty in BTU/h (International Table BTU).
func (c Cooler) BTUPerHour() float64 { return c.Duty.In(units.BTUPerHour) }

// Size returns the cooler duty: the load less what the surfaces shed with
// the oil at MaxOil and the air at MaxAmbient, P_c = P − h·A·(T_max − T_amb)
// (none when that is negative), and the specific duty P_c/ETD that coolers
// are rated by, the entering temperature difference ETD = T_oil,in − T_air,in
// taken as MaxOil − MaxAmbient (the oil enters the cooler at its hottest
// allowed temperature; a cooler in the return line sees a little more).
// The check holds the steady temperature without a cooler against MaxOil
// (with no load that is MaxAmbient; with a load and no dissipation there is
// none, and no check is made);
// a notice gives the duty, a caution hot oil where a cooler is needed, and
// a notice ISO 4413's 60 °C pump-inlet limit where MaxOil is above it.
// MaxAmbient must be below MaxOil (an air cooler cannot cool oil to below
// the air: this is an error); Load and Dissipation finite and ≥ 0. A
// natural dissipation or steady temperature that overflows is an error
// naming Natural or Steady.
func (n CoolerNeed) Size() (Cooler, error) {
	const fn = "thermal.CoolerNeed.Size"
	if err := validate.NonNegative(fn, "Load", n.Load); err != nil {
		return Cooler{}, err
	}
	if err := validate.NonNegative(fn, "Dissipation", n.Dissipation); err != nil {
		return Cooler{}, err
	}
	if err := validate.Positive(fn, "MaxOil", n.MaxOil); err != nil {
		return Cooler{}, err
	}
	if err := validate.InRange(fn, "MaxAmbient", n.MaxAmbient, 1e-9, n.MaxOil); err != nil || n.MaxAmbient == n.MaxOil {
		return Cooler{}, validate.Fail(fn, "MaxAmbient", n.MaxAmbient, "above 0 K and below MaxOil ("+n.MaxOil.String()+")")
	}
	c := Cooler{ETD: n.MaxOil.Sub(n.MaxAmbient)}
	var err error
	if c.Natural, err = validate.Checked(fn, "Natural", n.Dissipation.Times(c.ETD)); err != nil {
		return Cooler{}, err
	}
	c.Duty = max(0, n.Load-c.Natural)
	c.Specific = Conductance(float64(c.Duty) / float64(c.ETD))
	if err := validate.Result(fn, "Specific", c.Specific); err != nil {
		return Cooler{}, err
	}
	switch {
	case n.Dissipation > 0:
		steady, err := SteadyTemperature(n.Load, n.Dissipation, n.MaxAmbient)
		if err != nil {
			return Cooler{}, validate.Renamed(err, fn, validate.Fields("", map[string]string{"T": "Steady"}))
		}
		c.Steady = steady
	case n.Load == 0:
		c.Steady = n.MaxAmbient // no heat: the oil settles at the air's temperature
	}
	if c.Steady > 0 {
		c.Check = components.Within(c.Steady, n.MaxOil, components.CallerRule("CoolerNeed.MaxOil"))
	}
	rule := components.PhysicsRule("heat balance: P = h·A·(T − T_amb) + cooler duty")
	if c.Duty > 0 {
		c.Findings = components.Findings{components.NewFinding(components.Caution, components.HotSurface, "thermal.cooler", rule,
			"the surfaces shed %v at %v with %v air, short of the %v load: a cooler of %v (%v at %v ETD) holds the oil at %v",
			c.Natural, n.MaxOil, n.MaxAmbient, n.Load, c.Duty, c.Specific, c.ETD, n.MaxOil)}
	} else {
		c.Findings = components.Findings{components.NewFinding(components.Notice, components.NoHazard, "thermal.no-cooler", rule,
			"the surfaces shed the %v load at %v with %v air, so no cooler is needed", n.Load, c.Steady, n.MaxAmbient)}
	}
	if n.MaxOil > pumpInletLimit {
		c.Findings = c.Findings.Merge(components.NewFinding(components.Notice, components.HotSurface, "thermal.pump-inlet",
			components.StandardRule("ISO 4413:2010, fluid temperature at the pump inlet"),
			"a maximum oil temperature of %v is above the %v ISO 4413 sets for the pump inlet", n.MaxOil, pumpInletLimit))
	}
	return c, nil
}

// pumpInletLimit is the pump-inlet oil temperature ISO 4413 asks not to
// exceed.
var pumpInletLimit = units.TemperatureFromCelsius(60)
