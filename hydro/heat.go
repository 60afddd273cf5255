package hydro

import (
	"math"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/drive"
	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/hydro/thermal"
	"github.com/hydrosize/hydrosize/units"
)

// phaseHeat is one phase's working point and heat, for the drive and the
// heat balance.
type phaseHeat struct {
	ph      *phase // the phase, a dwell after its moves, or nil for the idle time
	name    string
	time    time.Duration
	op      operating
	loads   []thermal.Load
	driving units.Power // power of loads that drive their actuators, which ends as heat too
}

// heats works out every phase's working point and heat loads, with the
// dwell after a phase's moves as a phase of its own (the moves' valves
// centred, its holds held) and the idle time between cycles as a last
// phase.
func (z *sizer) heats(model pump.Pump) ([]phaseHeat, error) {
	out := make([]phaseHeat, 0, 2*len(z.phases)+1) // each phase and its dwell, and the idle time
	for _, ph := range z.phases {
		parts, n := [2]*phase{ph}, 1
		if ph.working() && ph.spec.Dwell > 0 {
			parts[1], n = z.dwell(ph), 2
		}
		for i, p := range parts[:n] {
			op, err := z.operate(p, model)
			if err != nil {
				return nil, err
			}
			loads, driving, err := z.phaseLoads(p, op, p.loads[:0])
			if err != nil {
				return nil, err
			}
			p.loads = loads
			t := p.time
			if i == 0 && n > 1 {
				t = ph.move
			}
			out = append(out, phaseHeat{ph: p, name: p.name, time: t, op: op, loads: loads, driving: driving})
		}
	}
	if z.idle > 0 {
		op, err := z.operate(nil, model)
		if err != nil {
			return nil, err
		}
		loads, _, err := z.phaseLoads(nil, op, z.idleLoads[:0])
		if err != nil {
			return nil, err
		}
		z.idleLoads = loads
		out = append(out, phaseHeat{name: "idle between cycles", time: z.idle, op: op, loads: loads})
	}
	return out, nil
}

// phaseLoads lists a phase's heat: the pump's own loss, the relief flow,
// the flow control's throttling, the line and valve drops, the center's
// drop when unloading, and the actuators' friction; and the power of loads
// that drive their actuators (a lowered weight), which the counterbalance
// valve turns into heat as well. It appends the loads to loads, the
// phase's buffer from the last pass (whose loads the last pass no longer
// needs).
func (z *sizer) phaseLoads(ph *phase, op operating, loads []thermal.Load) ([]thermal.Load, units.Power, error) {
	if loads == nil {
		n := 4 // pump, relief, center, bleed-off
		if ph != nil {
			n += 2 + 4*len(ph.moves) // the lines; each move's flow control, ways in and out, and its own
		}
		loads = make([]thermal.Load, 0, n)
	}
	add := func(l thermal.Load, err error) error {
		if err == nil && l.Power > 0 {
			loads = append(loads, l)
		}
		return err
	}
	// The pump's own loss at its working point, from the pump family's
	// model (stroked back, deadheaded or at full stroke), as a pump load.
	pl := thermal.Load{Source: thermal.FromPump, Name: "pump losses", Power: max(op.point.Loss(), 0), Input: op.point.Shaft, Rule: opRule}
	if err := add(pl, nil); err != nil {
		return nil, 0, err
	}
	if err := add(thermal.ReliefFlow("relief valve", z.reliefP, op.relief)); err != nil {
		return nil, 0, err
	}
	if err := add(thermal.LineLoss("unloading center", op.center, op.point.Flow)); err != nil {
		return nil, 0, err
	}
	if err := add(thermal.Throttling("center bleed-off", op.point.Pressure, op.bleed)); err != nil {
		return nil, 0, err
	}
	if ph == nil {
		return loads, 0, nil
	}
	if ph.working() {
		// The share of each move's flow that passes its valve: all of it,
		// or when the pump falls short the pump's share (an accumulator
		// that supplements the pump makes up the rest through the valves).
		share := 1.0
		if ph.demand > op.point.Flow && z.spec.Circuit.Accumulator.Use != "cycle" {
			share = float64(op.point.Flow / ph.demand)
		}
		for _, m := range ph.moves {
			// Each valve throttles from what the highest load leaves at
			// the valves down to its own actuator's pressure.
			dp := op.throttle + ph.load - (m.port + m.supplyDrop)
			if err := add(thermal.Throttling(m.act.labels.control, max(dp, 0), m.flow*units.Flow(share))); err != nil {
				return nil, 0, err
			}
		}
		if err := add(thermal.LineLoss("pressure line", ph.lineDrop, ph.demand)); err != nil {
			return nil, 0, err
		}
		if err := add(thermal.LineLoss("return line and filter", ph.retDrop, ph.ret)); err != nil {
			return nil, 0, err
		}
	}
	var driving units.Power
	if z.spec.Circuit.Accumulator.Use == "cycle" && ph.demand > op.point.Flow {
		// The accumulator gives the flow the pump does not, at about the
		// pump's pressure: stored energy, which ends as heat like the rest.
		driving += z.chargeTo().TimesFlow(ph.demand - op.point.Flow)
	}
	for _, m := range ph.moves {
		p, err := z.moveLoads(m, add)
		if err != nil {
			return nil, 0, err
		}
		driving += p
	}
	return loads, driving, nil
}

// moveLoads adds a move's branch drops and its actuator's own losses; for
// a load that drives its actuator, the load's own power F·v, which the
// counterbalance valve and the outlet path turn into heat, which it
// returns.
func (z *sizer) moveLoads(m *mv, add func(thermal.Load, error) error) (units.Power, error) {
	name := &m.act.labels
	if err := add(thermal.LineLoss(name.in, m.supplyDrop, m.capFlow)); err != nil {
		return 0, err
	}
	if m.overruns() {
		p := (-m.forces.Total()).TimesVelocity(m.speed)
		if m.holding == nil {
			return p, add(thermal.Other(name.lowered, p, components.PhysicsRule("P = F·v of the load driving the actuator")))
		}
		if err := add(thermal.LineLoss(name.out, m.returnDrop, m.outFlow())); err != nil {
			return 0, err
		}
		return p, add(thermal.Throttling(name.holder, m.holding.Throttled, m.outFlow()))
	}
	if err := add(thermal.LineLoss(name.out, m.returnDrop, m.outFlow())); err != nil {
		return 0, err
	}
	if m.hold() || m.port <= 0 || m.capFlow <= 0 {
		return 0, nil
	}
	if m.act.cylinder() {
		if m.forces.Total() <= 0 {
			return 0, nil // no load: the port pressure only pushes the outlet oil out
		}
		// (1 − η) of the pressure's force on the pump's flow: the cap flow,
		// or on a regenerative extend the rod section's (RegenerativeFor).
		return 0, add(thermal.MotorLoss(name.seal, m.port, m.flow, m.act.fit.size.SealEfficiency))
	}
	return 0, add(thermal.MotorLoss(name.motor, m.port-m.back, m.capFlow, motorVolumetric*motorMechanical))
}

// balance is the heat balance of a pass.
type balance struct {
	load      thermal.HeatLoad
	reservoir thermal.ReservoirSize
	area      units.Area
	ua        thermal.Conductance
	steady    units.Temperature
	running   units.Temperature
	cooler    *thermal.Cooler
}

// balanceHeat sums the cycle's heat (thermal.Budget), sizes the reservoir
// for the pump's delivery (thermal.SizeReservoir) and finds the steady oil
// temperature at the hottest ambient; when it is above the highest oil
// temperature allowed, the cooler that holds it there.
func (z *sizer) balanceHeat(hs []phaseHeat) (balance, error) {
	var b balance
	phases := make([]thermal.Phase, len(hs))
	for i, h := range hs {
		// Input counts the power of a load driving its actuator beside the
		// pump's shaft power: thermal.Budget holds a phase's heat to its
		// input, and a lowered weight heats the oil too.
		// A phase whose items are consistent adds up exactly to its input
		// (every watt in ends as heat or work); the 1e-9 headroom covers
		// the rounding of the sum, which thermal.Budget would refuse.
		in := h.op.point.Shaft + h.driving
		phases[i] = thermal.Phase{Name: h.name, Duration: h.time, Loads: h.loads, Input: in + in*1e-9}
	}
	var err error
	if b.load, err = thermal.Budget(phases); err != nil {
		return b, err
	}
	if b.reservoir, err = thermal.SizeReservoir(z.delivery, thermal.Dwell{Time: z.basis.ReservoirDwell, Rule: z.basis.ReservoirRule}); err != nil {
		return b, err
	}
	v := b.reservoir.Volume.Chosen
	if v == 0 {
		v = b.reservoir.Volume.Required
	}
	if b.area, err = tank(v).WettedArea(); err != nil {
		return b, err
	}
	if b.ua, err = thermal.Dissipation(thermal.StillAir, b.area); err != nil {
		return b, err
	}
	site := z.spec.Site
	if b.steady, err = thermal.SteadyTemperature(b.load.Mean, b.ua, site.AmbientMax); err != nil {
		return b, err
	}
	b.running = b.steady
	if top := z.basis.MaxOilTemperature.Value; b.steady > top {
		c, err := thermal.CoolerNeed{Load: b.load.Mean, Dissipation: b.ua, MaxOil: top, MaxAmbient: site.AmbientMax}.Size()
		if err != nil {
			return b, err
		}
		b.cooler, b.running = &c, top
	}
	return b, nil
}

// tank is the box of oil volume v in the proportions of a first pass: twice
// as long as wide and deep, filled to tankFill of its depth.
func tank(v units.Volume) thermal.Tank {
	w := units.Length(math.Cbrt(float64(v) / (tankLengthRatio * tankFill)))
	return thermal.Tank{Length: w * tankLengthRatio, Width: w, Height: w, Level: w * tankFill}
}

// driveDuty reduces the phases to the drive's duty (hydro/drive).
func (z *sizer) driveDuty(hs []phaseHeat) (drive.Duty, error) {
	phases := make([]drive.Phase, len(hs))
	eta := z.kind.volumetric * z.kind.mechanical
	for i, h := range hs {
		phases[i] = drive.Phase{Name: h.name, Duration: h.time, Power: h.op.point.Shaft, Efficiency: eta, Use: h.op.use}
	}
	return drive.Cycle(phases)
}

// heatRule is the rule of the heat balance's figures.
var heatRule = components.PhysicsRule("lumped heat balance: T = T_amb + P/(h·A)")
