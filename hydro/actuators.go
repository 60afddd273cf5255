package hydro

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/units"
)

// sizeActuators sizes every actuator at the pressure left for it after the
// losses of the last pass, then works out each move with the size chosen.
func (z *sizer) sizeActuators() error {
	for _, a := range z.acts {
		var err error
		if a.cylinder() {
			err = z.sizeCylinder(a)
		} else {
			err = z.sizeMotor(a)
		}
		if err != nil {
			return &FieldError{Path: index("actuators", a.index), Err: err}
		}
	}
	return nil
}

// available is the pressure left at an actuator's port for move m: the
// working pressure less the supply losses of the last pass.
func (z *sizer) available(m *mv) units.Pressure {
	p := z.basis.Pressure.Value - m.supplyDrop - m.phase.lineDrop
	if z.kind.control == pump.LoadSensing {
		p -= lsMargin // the pump's margin over the load is not the actuator's
	}
	return max(p, z.basis.Pressure.Value/10)
}

// incline returns the angle the load climbs on a move of actuator a in
// direction dir, in degrees: the extend stroke's angle, negated on a retract.
func incline(a Actuator, dir actuator.Direction) float64 {
	deg := 0.0
	switch a.Orientation {
	case "vertical":
		deg = 90
	case "vertical-down":
		deg = -90
	case "inclined":
		deg = a.InclineDegrees
	}
	if dir == actuator.Retract {
		return -deg
	}
	return deg
}

// holdDirection is the side a hold keeps pressure on: the direction of the
// actuator's last travelling move before it in the cycle (extend when
// there is none).
func (z *sizer) holdDirection(m *mv) actuator.Direction {
	moves := m.act.moves
	for i := range moves {
		if moves[i] != m {
			continue
		}
		for k := 1; k < len(moves); k++ {
			if prev := moves[(i-k+len(moves))%len(moves)]; !prev.hold() {
				return prev.dir
			}
		}
	}
	return actuator.Extend
}

// duty is the cylinder family's duty for move m at available pressure p.
func (z *sizer) duty(m *mv, p units.Pressure) actuator.Duty {
	a := m.act.spec
	dir := m.dir
	if m.hold() {
		dir = z.holdDirection(m)
		m.dir = dir
	}
	back := m.back
	if m.spec.Regenerative {
		back = 0 // the annulus oil crosses to the cap side: hydro/actuator's Cylinder.RegenerativeFor
	}
	return actuator.Duty{
		Direction: dir, Force: m.spec.Force, Mass: a.Mass, InclineDegrees: incline(a, dir), Friction: a.Friction,
		Speed: m.speed, AccelTime: m.spec.AccelTime, Pressure: p, BackPressure: back,
		SealEfficiency: z.seal, AreaRatio: a.AreaRatio, Stroke: a.Stroke, Bores: z.bores, Rods: z.rods,
	}
}

// column is the buckling setup of a cylinder, with the relief of the last
// pass.
func (z *sizer) column(a *act) *actuator.Column {
	retracted := a.spec.RetractedLength
	if retracted == 0 {
		retracted = a.spec.Stroke + deadLength
	}
	return &actuator.Column{Body: bodyMount(a.spec.Mount), RodEnd: rodEnd(a.spec.RodEnd), Retracted: retracted,
		Relief: z.reliefP, Yield: z.basis.RodYield.Value, Factor: z.buckle}
}

// deadLength is the retracted length beyond the stroke when the spec gives
// none: 200 mm, for buckling (our choice: the ends, piston and guide of a
// mid-size cylinder).
const deadLength = 200 * units.Millimetre

// sizeCylinder chooses the cylinder that meets every move, then works out
// each move with it.
func (z *sizer) sizeCylinder(a *act) error {
	var governs fitted // the governing move's sizing
	found, failed := false, false
	for _, m := range a.moves {
		d := z.duty(m, z.available(m))
		f, err := d.Forces()
		if err != nil {
			return err
		}
		m.forces = f
		if f.Total() <= 0 || m.spec.Regenerative {
			continue // the load drives it, or regeneration: checked with the size chosen
		}
		if d.Direction == actuator.Extend {
			d.Buckling = z.column(a)
		}
		r, err := d.Fit()
		if err != nil {
			return err
		}
		if !r.Bore.OK() {
			if !failed {
				governs, a.governing = fitted{d, r, true}, m.phase.name
			}
			failed = true
			continue
		}
		if !failed && (!found || larger(r.Cylinder, governs.size.Cylinder)) {
			governs, a.governing, found = fitted{d, r, true}, m.phase.name, true
		}
	}
	a.fit, a.ok = governs, found && !failed
	if !a.ok {
		a.cyl = actuator.Cylinder{}
		return nil
	}
	a.cyl = governs.size.Cylinder
	if a.cyl.Stroke == 0 {
		a.cyl.Stroke = a.spec.Stroke
	}
	if a.chosen.bores.Len() == 0 || a.chosen.cyl != a.cyl {
		a.chosen = chosenSeries{a.cyl, only("chosen bore", a.cyl.Bore), only("chosen rod", a.cyl.Rod)}
	}
	return z.workMoves(a)
}

// chosenSeries holds the chosen cylinder's bore and rod as one-size
// series, which restrict the family's sizing to that cylinder; they are
// built again when the choice changes.
type chosenSeries struct {
	cyl         actuator.Cylinder
	bores, rods components.Series[units.Length]
}

// workMoves works out every move of actuator a with the size chosen, at
// the back pressures of the last drops: port pressures and flows, and a
// cylinder's load-holding valve.
func (z *sizer) workMoves(a *act) error {
	if !a.ok {
		return nil
	}
	if !a.cylinder() {
		return z.motorMoves(a)
	}
	for _, m := range a.moves {
		if err := z.cylinderMove(a, m); err != nil {
			return err
		}
		if err := timeMove(a.cyl, m); err != nil {
			return err
		}
	}
	return z.fitHolder(a)
}

// larger orders cylinders by bore, then rod.
func larger(c, d actuator.Cylinder) bool {
	return c.Bore > d.Bore || c.Bore == d.Bore && c.Rod > d.Rod
}

// only returns a series holding the one size v.
func only(name string, v units.Length) components.Series[units.Length] {
	s, _ := components.NewSeries(name, components.OurRule("the size chosen for the governing move"), []units.Length{v}, nil)
	return s
}

// timeMove times a cylinder move that ramps up to its speed on the chosen
// cylinder's motion profile (actuator.Cylinder.Move: ramps up and down at
// the acceleration the ramp time gives), instead of distance over speed.
func timeMove(c actuator.Cylinder, m *mv) error {
	if m.hold() || m.speed <= 0 || m.spec.AccelTime <= 0 || m.spec.Time > 0 {
		return nil
	}
	acc := units.Acceleration(float64(m.speed) / m.spec.AccelTime.Seconds())
	mo, err := c.Move(m.dir, actuator.Profile{Speed: m.speed, Accel: acc, Distance: m.dist})
	if err != nil {
		return err
	}
	m.time = mo.Time
	return nil
}

// cylinderMove works out move m with the chosen cylinder: the inlet port
// pressure (through the family's sizing restricted to the chosen bore and
// rod, so seal friction and back pressure count as they do in sizing), the
// pump flow and the return flow.
func (z *sizer) cylinderMove(a *act, m *mv) error {
	c := a.cyl
	eta := a.fit.size.SealEfficiency
	m.port, m.flow, m.capFlow, m.ret, m.holding, m.fit = 0, 0, 0, 0, nil, fitted{}
	switch {
	case m.spec.Regenerative:
		return z.regenerative(c, m, eta)
	case m.forces.Total() <= 0: // no load, or overrunning: a counterbalance valve holds the load back
		if m.forces.Total() == 0 {
			p, err := c.PressureFor(m.dir, 0, m.back) // only the back pressure to push out
			if err != nil {
				return err
			}
			m.port = p
		}
		if m.speed > 0 {
			q, err := c.FlowFor(m.dir, m.speed)
			if err != nil {
				return err
			}
			m.flow, m.capFlow = q, q
			if m.ret, err = c.ReturnFlow(m.dir, q); err != nil {
				return err
			}
		}
		return nil
	}
	d := z.duty(m, highestPressure*100)
	d.Bores, d.Rods, d.AreaRatio = a.chosen.bores, a.chosen.rods, 0
	r, err := d.Fit()
	if err != nil {
		return err
	}
	m.port = r.Pressure.Value
	m.flow, m.capFlow, m.ret = r.Flow, r.Flow, r.ReturnFlow
	m.fit = fitted{d, r, true}
	return nil
}

// fitted is a cylinder sizing the passes ran without its findings
// (actuator.Duty.Fit): the duty and its sizing, kept so that the report can
// ask the family for the findings of the last one (actuator.Duty.Findings).
type fitted struct {
	duty actuator.Duty
	size actuator.CylinderSize
	ok   bool // a sizing was run
}

// findings returns the sizing's findings; none when no sizing was run.
func (f fitted) findings() components.Findings {
	if !f.ok {
		return nil
	}
	return f.duty.Findings(f.size)
}

// regenerative works out a regenerative extend through the family's
// Cylinder.RegenerativeFor: the pump and cap flows for the move's speed,
// and, for a load that opposes it, the cap pressure with the sizing's seal
// efficiency and the annulus oil's drops on its way across (the last
// pass's). A load that drives the stroke is the counterbalance valve's to
// meter (fitHolder).
func (z *sizer) regenerative(c actuator.Cylinder, m *mv, eta float64) error {
	f := m.forces.Total()
	r, err := c.RegenerativeFor(m.speed, max(f, 0), m.supplyDrop+m.returnDrop, eta)
	if err != nil {
		return err
	}
	m.flow, m.capFlow = r.Flow, r.CapFlow
	if f >= 0 {
		m.port = r.Pressure
		m.back = m.port + m.supplyDrop + m.returnDrop
	}
	return nil
}

// sizeMotor chooses the motor displacement that meets every move, then
// works out each move with it.
func (z *sizer) sizeMotor(a *act) error {
	var best actuator.MotorSize
	found, failed := false, false
	for _, m := range a.moves {
		if m.spec.Torque <= 0 && (!m.hold() || a.spec.BreakawayTorque <= 0) {
			continue
		}
		d := actuator.MotorDuty{Torque: m.spec.Torque, StartTorque: max(a.spec.BreakawayTorque, m.spec.Torque),
			Speed: m.shaft, Pressure: z.available(m) - m.back, Volumetric: motorVolumetric, Mechanical: motorMechanical,
			Displacements: pump.CommonDisplacements(), HoldsLoad: a.spec.Suspended || a.spec.Overrunning}
		if d.Torque <= 0 {
			d.Torque = a.spec.BreakawayTorque
		}
		r, err := d.Size()
		if err != nil {
			return err
		}
		if !r.Displacement.OK() {
			if !failed {
				best, a.governing = r, m.phase.name
			}
			failed = true
			continue
		}
		if !failed && (!found || r.Displacement.Chosen > best.Displacement.Chosen) {
			best, a.governing, found = r, m.phase.name, true
		}
	}
	a.msize, a.ok = best, found && !failed
	if a.ok {
		a.motor = best.Motor
	}
	return z.workMoves(a)
}

// motorMoves works out each move of a motor: the pressure for its torque
// over the back pressure, and its flow.
func (z *sizer) motorMoves(a *act) error {
	for _, m := range a.moves {
		m.port, m.flow, m.capFlow, m.ret = 0, 0, 0, 0
		if m.spec.Torque > 0 {
			dp, err := a.motor.PressureFor(m.spec.Torque)
			if err != nil {
				return err
			}
			m.port = dp + m.back
		}
		if !m.hold() && m.shaft > 0 {
			q, err := a.motor.FlowFor(m.shaft)
			if err != nil {
				return err
			}
			m.flow, m.capFlow, m.ret = q, q, q
		}
	}
	return nil
}
