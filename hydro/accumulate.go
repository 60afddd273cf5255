package hydro

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/accumulator"
	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/units"
)

// chargeBand is how far above the lowest working pressure an accumulator
// that supplements the pump is charged at least: 20 % (our choice); it is
// charged up to the design's working pressure where that is higher, for
// more oil per litre of gas.
const chargeBand = 1.2

// chargeTo is the pressure a supplementing accumulator is charged to.
func (z *sizer) chargeTo() units.Pressure {
	return max(units.Pressure(float64(z.pumpP)*chargeBand), z.basis.Pressure.Value)
}

// fillTemperature is where a precharge is set: 20 °C, a workshop (our
// choice).
var fillTemperature = units.TemperatureFromCelsius(20)

// ambient is the site's atmospheric pressure (the standard atmosphere at
// its altitude, hydro/pump).
func (z *sizer) ambient() (pump.Ambient, error) { return pump.SiteAltitude(z.spec.Site.Altitude) }

// accCycle is the gas cycle of an accumulator working between gauge
// pressures lo and hi: precharge by the family's recommendation at the
// running gas temperature, charged slowly and discharged fast.
func (z *sizer) accCycle(lo, hi units.Pressure) (accumulator.Cycle, accumulator.Precharge, error) {
	amb, err := z.ambient()
	if err != nil {
		return accumulator.Cycle{}, accumulator.Precharge{}, err
	}
	minP, maxP := lo.Absolute(amb.Pressure), hi.Absolute(amb.Pressure)
	pc, err := accumulator.Charging{Kind: accumulator.Bladder, Min: minP, Max: maxP, Fill: fillTemperature,
		Working: z.tOil, Coldest: z.spec.Site.AmbientMin, Hottest: max(z.tOil, fillTemperature)}.Recommend()
	if err != nil {
		return accumulator.Cycle{}, accumulator.Precharge{}, err
	}
	return accumulator.Cycle{Precharge: pc.Working, Min: minP, Max: maxP,
		Charge: accumulator.Isothermal, Discharge: accumulator.Adiabatic}, pc, nil
}

// supplement sizes a pump and accumulator that together meet the cycle's
// flows (accumulator.Supplement), the accumulator charged between the
// highest working pressure and chargeBand above it.
func (z *sizer) supplement() (accumulator.SupplementSizing, error) {
	var phases []accumulator.Phase
	for _, ph := range z.phases {
		if !ph.working() || ph.spec.Dwell == 0 {
			phases = append(phases, accumulator.Phase{Name: ph.name, Duration: ph.time, Flow: ph.demand})
			continue
		}
		// The moves draw their flow; the dwell after them draws none.
		phases = append(phases, accumulator.Phase{Name: ph.name, Duration: ph.move, Flow: ph.demand},
			accumulator.Phase{Name: ph.name + ", dwell", Duration: ph.spec.Dwell})
	}
	if z.idle > 0 {
		phases = append(phases, accumulator.Phase{Name: "idle", Duration: z.idle})
	}
	c, _, err := z.accCycle(z.pumpP, z.chargeTo())
	if err != nil {
		return accumulator.SupplementSizing{}, err
	}
	return accumulator.Supplement{Phases: phases, Cycle: c, Sizes: accumulatorSeries()}.Size()
}

// accumulatorResult sizes the accumulator the spec asks for, with its
// findings.
func (z *sizer) accumulatorResult() (*AccumulatorResult, components.Findings, error) {
	use := z.spec.Circuit.Accumulator.Use
	switch use {
	case "cycle":
		s, err := z.supplement()
		if err != nil {
			return nil, nil, err
		}
		c, pc, err := z.accCycle(z.pumpP, z.chargeTo())
		if err != nil {
			return nil, nil, err
		}
		r := accResult(use, s.Sizing, c, pc)
		r.PumpFlow = Value[units.Flow]{s.Pump, components.PhysicsRule("the cycle's mean flow: the least pump that keeps up with the accumulator")}
		return r, s.Findings.Merge(pc.Findings...), nil
	case "emergency":
		return z.emergency()
	}
	return nil, nil, nil
}

// emergency sizes the accumulator that makes the spec's emergency move with
// the pump stopped (accumulator.Emergency).
func (z *sizer) emergency() (*AccumulatorResult, components.Findings, error) {
	em := *z.spec.Circuit.Accumulator.Emergency
	var a *act
	for _, x := range z.acts {
		if x.spec.Name == em.Actuator {
			a = x
		}
	}
	if a == nil || !a.cylinder() || !a.ok {
		return nil, components.Findings{components.NewFinding(components.Notice, components.NoHazard, "hydro.emergency-not-sized",
			components.OurRule("emergency accumulators are sized for cylinders"),
			"The emergency move of %v was not sized: it needs a sized cylinder.", em.Actuator)}, nil
	}
	m := &mv{spec: em, act: a, dir: direction(em.Direction), phase: &phase{name: "emergency"}}
	m.timeIt()
	d := z.duty(m, z.basis.Pressure.Value)
	f, err := d.Forces()
	if err != nil {
		return nil, nil, err
	}
	m.forces = f
	if err := z.cylinderMove(a, m); err != nil {
		return nil, nil, err
	}
	need := max(m.port, units.Bar)
	if float64(need) >= 0.9*float64(z.pumpP) {
		return nil, components.Findings{components.NewFinding(components.Warning, components.StoredEnergy, "hydro.emergency-pressure",
			components.OurRule("an accumulator delivers between its charge and the least pressure the move needs"),
			"The emergency move of %v needs %v, too close to the %v the pump charges to: raise the working pressure or give the move less load.",
			a.spec.Name, need, z.pumpP)}, nil
	}
	c, pc, err := z.accCycle(need, z.pumpP)
	if err != nil {
		return nil, nil, err
	}
	dist := m.dist
	if dist == 0 {
		dist = a.spec.Stroke
	}
	s, err := accumulator.Emergency{Area: a.cyl.Area(m.dir), Stroke: dist, Margin: 0.1, Cycle: c, Sizes: accumulatorSeries()}.Size()
	if err != nil {
		return nil, nil, err
	}
	return accResult("emergency", s, c, pc), s.Findings.Merge(pc.Findings...), nil
}

func accResult(use string, s accumulator.Sizing, c accumulator.Cycle, pc accumulator.Precharge) *AccumulatorResult {
	rule := components.PhysicsRule("gas law p·Vⁿ = constant (hydro/accumulator)")
	band := components.OurRule("accumulator working between the least pressure the duty needs and what the pump charges it to")
	return &AccumulatorResult{
		Use: use, Need: Value[units.Volume]{s.Need, rule}, Volume: s.Volume,
		Precharge: Value[units.AbsolutePressure]{pc.Fill, pc.Rule},
		Min:       Value[units.AbsolutePressure]{c.Min, band},
		Max:       Value[units.AbsolutePressure]{c.Max, band},
		Energy:    Value[units.Energy]{s.Energy, rule},
	}
}
