package actuator

import (
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// DefaultStartingShare is the starting (breakaway) mechanical efficiency as
// a share of the running one when Motor.Starting is 0: 0.9, so a motor of
// running efficiency 0.90 starts at 0.81 (common practice; piston motors
// start better, gear and orbit motors can start worse: use the maker's
// starting torque where it is given).
const DefaultStartingShare = 0.9

// Motor is a hydraulic motor: its geometric displacement per revolution
// and its efficiencies. Volumetric efficiency η_v is the share of the flow
// that turns the shaft (the rest leaks past it); mechanical efficiency η_m
// the share of the ideal torque D·Δp/(2π) that reaches it when running;
// the starting efficiency the share at breakaway, lower because friction
// at rest is higher.
type Motor struct {
	Displacement units.Displacement // geometric displacement, > 0
	Volumetric   float64            // volumetric efficiency, (0, 1]
	Mechanical   float64            // running mechanical efficiency, (0, 1]
	Starting     float64            // starting mechanical efficiency, (0, 1]; 0 means DefaultStartingShare × Mechanical
}

// efficiency checks that v is in (0, 1].
func efficiency(fn, param string, v float64) error {
	if !(v > 0 && v <= 1) {
		return validate.Fail(fn, param, v, "in (0, 1]")
	}
	return nil
}

func (m Motor) validate(fn string) error {
	if err := validate.Positive(fn, "Motor.Displacement", m.Displacement); err != nil {
		return err
	}
	return prefixed(efficiencies(fn, m.Volumetric, m.Mechanical, m.Starting), "Motor.")
}

// efficiencies checks a motor's volumetric, running and starting
// efficiencies (the starting one may be 0, for the default); the error names
// the field without its struct.
func efficiencies(fn string, vol, mech, start float64) error {
	if err := efficiency(fn, "Volumetric", vol); err != nil {
		return err
	}
	if err := efficiency(fn, "Mechanical", mech); err != nil {
		return err
	}
	if start != 0 {
		return efficiency(fn, "Starting", start)
	}
	return nil
}

// starting returns the starting efficiency and its rule.
func (m Motor) starting() (float64, components.Rule) {
	if m.Starting == 0 {
		return DefaultStartingShare * m.Mechanical,
			components.PracticeRule("starting torque efficiency 0.9 × the running one")
	}
	return m.Starting, components.CallerRule("Motor.Starting")
}

// Torque returns the running shaft torque at pressure difference dp
// (finite, > 0): T = D·Δp·η_m/(2π), the ideal torque of
// units.Displacement.TimesPressure times the mechanical efficiency.
func (m Motor) Torque(dp units.Pressure) (units.Torque, error) {
	const fn = "actuator.Motor.Torque"
	if err := checkMotor(m, fn, "dp", dp); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "T", m.Displacement.TimesPressure(dp)*units.Torque(m.Mechanical))
}

// StartingTorque returns the breakaway torque at pressure difference dp
// (finite, > 0): T = D·Δp·η_start/(2π).
func (m Motor) StartingTorque(dp units.Pressure) (units.Torque, error) {
	const fn = "actuator.Motor.StartingTorque"
	if err := checkMotor(m, fn, "dp", dp); err != nil {
		return 0, err
	}
	eta, _ := m.starting()
	return validate.Checked(fn, "T", m.Displacement.TimesPressure(dp)*units.Torque(eta))
}

// PressureFor returns the pressure difference that gives running torque t
// (finite, > 0): Δp = 2π·T/(D·η_m), the inverse of [Motor.Torque].
func (m Motor) PressureFor(t units.Torque) (units.Pressure, error) {
	const fn = "actuator.Motor.PressureFor"
	if err := checkMotor(m, fn, "t", t); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "dp", units.Pressure(2*math.Pi*float64(t)/(float64(m.Displacement)*m.Mechanical)))
}

// Speed returns the shaft speed on flow q (finite, > 0): n = Q·η_v/D.
func (m Motor) Speed(q units.Flow) (units.RotationalSpeed, error) {
	const fn = "actuator.Motor.Speed"
	if err := checkMotor(m, fn, "q", q); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "n", units.RotationalSpeed(float64(q)*m.Volumetric/float64(m.Displacement)))
}

// FlowFor returns the flow that turns the shaft at speed n (finite, > 0):
// Q = D·n/η_v, the geometric flow of units.Displacement.TimesSpeed plus the
// leakage.
func (m Motor) FlowFor(n units.RotationalSpeed) (units.Flow, error) {
	const fn = "actuator.Motor.FlowFor"
	if err := checkMotor(m, fn, "n", n); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "Q", m.Displacement.TimesSpeed(n)/units.Flow(m.Volumetric))
}

// Power returns the shaft power with pressure difference dp and flow q
// (both finite, > 0): P = Δp·Q·η_v·η_m, the hydraulic power of
// units.Pressure.TimesFlow times the overall efficiency (equal to T·2π·n
// with T from [Motor.Torque] and n from [Motor.Speed]).
func (m Motor) Power(dp units.Pressure, q units.Flow) (units.Power, error) {
	const fn = "actuator.Motor.Power"
	if err := checkMotor(m, fn, "dp", dp); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	return validate.Checked(fn, "P", dp.TimesFlow(q)*units.Power(m.Volumetric*m.Mechanical))
}

// checkMotor validates the motor and one positive argument.
func checkMotor[T ~float64](m Motor, fn, param string, v T) error {
	if err := m.validate(fn); err != nil {
		return err
	}
	return validate.Positive(fn, param, v)
}
