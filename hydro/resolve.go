package hydro

import (
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/hydro/drive"
	"github.com/hydrosize/hydrosize/hydro/line"
	"github.com/hydrosize/hydrosize/hydro/thermal"
	"github.com/hydrosize/hydrosize/units"
)

// sizer is one sizing of a spec at one working pressure: what the spec and
// the defaults give, then the state the coupled passes refine.
type sizer struct {
	spec   Spec
	basis  Basis
	fl     fluid.Fluid
	win    fluid.Window
	kind   pumpKind
	sys    units.System
	bores  components.Series[units.Length]
	rods   components.Series[units.Length]
	motors components.Series[units.Power]
	seal   float64 // 0: the actuator family's default
	buckle float64 // 0: the actuator family's default
	margin *float64
	relief float64
	speed  units.RotationalSpeed
	limits [3]line.VelocityLimit // suction, pressure, return (work lines take the pressure limit)
	notes  components.Findings   // the sizer's own findings

	acts   []*act
	phases []*phase
	idle   time.Duration // per cycle, between cycles

	idleLoads []thermal.Load // the idle time's heat loads, in a buffer each pass fills again

	// The state a pass leaves for the next.
	oil      line.Oil
	tOil     units.Temperature
	reliefP  units.Pressure
	pumpP    units.Pressure // highest working pump pressure
	delivery units.Flow     // what the pump delivers

	centerValve int            // the main valve the center path was built for
	centerEls   []line.Element // the main valve's P→T path, for an unloading center
}

// newSizer resolves a validated spec, whose validation built fluid fl, at
// working pressure p.
func newSizer(s Spec, fl fluid.Fluid, p units.Pressure, pRule components.Rule) (*sizer, error) {
	z := &sizer{spec: s, sys: units.Metric()}
	if s.Units == "us" {
		z.sys = units.USCustomary()
	}
	z.fl, z.win = fl, fluid.DefaultWindow()
	if s.Fluid.Window != nil {
		z.win = s.Fluid.Window.fluid()
	}
	z.kind = pumpKindOf(s.Circuit.Pump, s.Circuit.Control)
	z.basis.Pressure = Value[units.Pressure]{p, pRule}
	z.basis.PumpVolumetric = Value[float64]{z.kind.volumetric, pumpFigures}
	z.basis.PumpMechanical = Value[float64]{z.kind.mechanical, pumpFigures}
	for _, a := range s.Actuators {
		if a.Kind == "motor" {
			z.basis.MotorVolumetric = Value[float64]{motorVolumetric, motorFigures}
			z.basis.MotorMechanical = Value[float64]{motorMechanical, motorFigures}
		}
	}
	z.resolveSeries()
	z.resolveFactors()
	if err := z.resolveSpeed(); err != nil {
		return nil, err
	}
	z.resolveLimits()
	if err := z.resolveThermal(); err != nil {
		return nil, err
	}
	return z, z.resolveCycle()
}

// resolveSeries picks the bore and motor series: ISO 3320 and IEC for
// metric output, inch bores and NEMA for US output, unless the spec says.
func (z *sizer) resolveSeries() {
	d := z.spec.Design
	inch := d.BoreSeries == "inch" || d.BoreSeries == "" && z.spec.Units == "us"
	z.bores, z.rods = components.ISO3320Bores(), components.ISO3320Rods()
	if inch {
		z.bores, z.rods = components.InchBores(), components.InchRods()
	}
	nema := d.MotorSeries == "nema" || d.MotorSeries == "" && z.spec.Units == "us"
	z.motors = components.IECMotorRatings()
	if nema {
		z.motors = components.NEMAMotorRatings()
	}
	z.basis.BoreSeries, z.basis.MotorSeries = z.bores.Name(), z.motors.Name()
}

func (z *sizer) resolveFactors() {
	d := z.spec.Design
	z.seal, z.buckle, z.margin = d.SealEfficiency, d.BucklingFactor, d.PumpMargin
	z.relief = DefaultReliefMargin
	z.basis.ReliefMargin = Value[float64]{DefaultReliefMargin, components.PracticeRule("relief set 10 % above the highest working pressure")}
	if d.ReliefMargin != nil {
		z.relief = *d.ReliefMargin
		z.basis.ReliefMargin = Value[float64]{z.relief, components.CallerRule("design.relief_margin")}
	}
	z.basis.RodYield = Value[units.Pressure]{defaultRodYield, components.OurRule("rod yield strength below common rod steels")}
	if d.RodYield != 0 {
		z.basis.RodYield = Value[units.Pressure]{d.RodYield, components.CallerRule("design.rod_yield")}
	}
	z.basis.MaxOilTemperature = Value[units.Temperature]{fluid.MaxPumpInlet, components.StandardRule("ISO 4413:2010, fluid temperature at the pump inlet")}
	if d.MaxOilTemperature != 0 {
		z.basis.MaxOilTemperature = Value[units.Temperature]{d.MaxOilTemperature, components.CallerRule("design.max_oil_temperature")}
	}
}

// resolveSpeed finds the pump speed: the spec's, the engine's, or an
// induction motor's full-load speed on the mains (hydro/drive).
func (z *sizer) resolveSpeed() error {
	s := z.spec
	switch {
	case s.Design.PumpSpeed != 0:
		z.speed = s.Design.PumpSpeed
		z.basis.PumpSpeed = Value[units.RotationalSpeed]{z.speed, components.CallerRule("design.pump_speed")}
	case s.Supply.EngineSpeed != 0:
		z.speed = s.Supply.EngineSpeed
		z.basis.PumpSpeed = Value[units.RotationalSpeed]{z.speed, components.CallerRule("supply.engine_speed")}
	default:
		poles := s.Supply.Poles
		if poles == 0 {
			poles = defaultPoles
		}
		sp, err := drive.MotorSpeeds(poles, s.Supply.Mains, nil)
		if err != nil {
			return &FieldError{Path: "supply", Err: err}
		}
		z.speed = sp.FullLoad
		z.basis.PumpSpeed = Value[units.RotationalSpeed]{z.speed, sp.SlipRule}
	}
	return nil
}

func (z *sizer) resolveLimits() {
	d := z.spec.Design
	for i, f := range []struct {
		svc  line.Service
		v    units.Velocity
		path string
		out  *Value[units.Velocity]
	}{
		{line.SuctionLine, d.SuctionVelocity, "design.suction_velocity", &z.basis.SuctionVelocity},
		{line.PressureLine, d.PressureVelocity, "design.pressure_velocity", &z.basis.PressureVelocity},
		{line.ReturnLine, d.ReturnVelocity, "design.return_velocity", &z.basis.ReturnVelocity},
	} {
		l := f.svc.Limit()
		if f.v != 0 {
			l = line.VelocityLimit{Max: f.v, Rule: components.CallerRule(f.path)}
		}
		z.limits[i] = l
		*f.out = Value[units.Velocity]{l.Max, l.Rule}
	}
}

func (z *sizer) resolveThermal() error {
	inst := thermal.Stationary
	if z.spec.Site.Mobile {
		inst = thermal.Mobile
	}
	dw := inst.Dwell()
	if m := z.spec.Design.ReservoirMinutes; m != 0 {
		dw = thermal.Dwell{Time: time.Duration(m * float64(time.Minute)), Rule: components.CallerRule("design.reservoir_minutes")}
	}
	z.basis.ReservoirDwell, z.basis.ReservoirRule = dw.Time, dw.Rule
	return nil
}

// defaultRodYield is the piston rod yield strength when the spec gives none.
const defaultRodYield = 300 * units.Megapascal

// defaultPoles is the electric motor's pole count when the spec gives
// none: 4, the usual pump motor (about 1450 rpm at 50 Hz; common practice).
const defaultPoles = 4

// direction maps a move's direction to the cylinder family's.
func direction(d string) actuator.Direction {
	if d == "retract" {
		return actuator.Retract
	}
	return actuator.Extend
}

// bodyMount and rodEnd map the spec's mounting words to the family's.
func bodyMount(m string) actuator.BodyMount {
	switch m {
	case "flange":
		return actuator.Flange
	case "feet":
		return actuator.Feet
	case "trunnion":
		return actuator.Trunnion
	}
	return actuator.Clevis
}

func rodEnd(e string) actuator.RodEnd {
	switch e {
	case "fixed":
		return actuator.RodFixed
	case "free":
		return actuator.RodFree
	}
	return actuator.RodPinned
}
