package actuator

import (
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// MotorDuty is what a hydraulic motor must do, the input to sizing it: the
// running and breakaway torques at its shaft, its running speed, the
// pressure difference available across it, the efficiencies of the motor
// type, and the displacements to choose from.
type MotorDuty struct {
	Torque        units.Torque                          // running torque at the shaft, > 0
	StartTorque   units.Torque                          // breakaway torque at the shaft, ≥ 0; 0 means equal to Torque
	Speed         units.RotationalSpeed                 // running speed, ≥ 0 (0: no flow is computed)
	Pressure      units.Pressure                        // pressure difference available across the motor, > 0
	Volumetric    float64                               // volumetric efficiency, (0, 1]
	Mechanical    float64                               // running mechanical efficiency, (0, 1]
	Starting      float64                               // starting mechanical efficiency, (0, 1]; 0 means DefaultStartingShare × Mechanical
	Displacements components.Series[units.Displacement] // the displacements offered (a maker's range), not empty
	HoldsLoad     bool                                  // the load can turn the motor when it stops: a winch, a slew on a slope, a travel drive on a grade
}

// MotorSize is the result of sizing a motor for a [MotorDuty].
type MotorSize struct {
	Running      units.Displacement                    // displacement the running torque needs
	Starting     units.Displacement                    // displacement the breakaway torque needs
	Displacement components.Choice[units.Displacement] // Required is the larger of the two
	Motor        Motor                                 // the chosen motor; zero when no displacement is large enough
	Pressure     components.Check[units.Pressure]      // the pressure difference the chosen motor needs (start or run, the larger), at most Pressure
	Flow         units.Flow                            // the flow at Speed, D·n/η_v (0 when Speed is 0 or no motor was chosen)
	StartRule    components.Rule                       // where the starting efficiency comes from
	Findings     components.Findings
}

// Size sizes the motor displacement for the duty, running and starting:
//
//	D_run = 2π·T/(Δp·η_m),  D_start = 2π·T_start/(Δp·η_start)
//
// the inverse of [Motor.Torque] and [Motor.StartingTorque], and chooses the
// smallest of Displacements at or above the larger; then the pressure the
// chosen motor needs and the flow for the running speed. A requirement above
// the largest displacement is a failed choice with a finding, not an error.
// With HoldsLoad set the result carries the holding caution: a motor leaks
// past its ports, so it cannot hold a load still; hold it with a brake.
// Errors match units.ErrRange and name the field.
func (d MotorDuty) Size() (MotorSize, error) {
	const fn = "actuator.MotorDuty.Size"
	if err := d.validate(fn); err != nil {
		return MotorSize{}, err
	}
	m := Motor{Volumetric: d.Volumetric, Mechanical: d.Mechanical, Starting: d.Starting}
	etaS, rule := m.starting()
	start := d.StartTorque
	if start == 0 {
		start = d.Torque
	}
	r := MotorSize{StartRule: rule,
		Running:  displacementFor(d.Torque, d.Pressure, d.Mechanical),
		Starting: displacementFor(start, d.Pressure, etaS)}
	if err := validate.Result(fn, "Running", r.Running); err != nil {
		return MotorSize{}, err
	}
	if err := validate.Result(fn, "Starting", r.Starting); err != nil {
		return MotorSize{}, err
	}
	var err error
	if r.Displacement, err = d.Displacements.Select(max(r.Running, r.Starting)); err != nil {
		return MotorSize{}, validate.Renamed(err, fn, nil)
	}
	if r.Displacement.OK() {
		m.Displacement = r.Displacement.Chosen
		r.Motor = m
		p := units.Pressure(max(float64(d.Pressure)*float64(r.Running/m.Displacement),
			float64(d.Pressure)*float64(r.Starting/m.Displacement)))
		r.Pressure = components.Within(p, d.Pressure, components.CallerRule("MotorDuty.Pressure"))
		if d.Speed > 0 {
			r.Flow = m.Displacement.TimesSpeed(d.Speed) / units.Flow(m.Volumetric)
		}
	} else {
		r.Pressure = components.Within(units.Pressure(float64(d.Pressure)*float64(r.Displacement.Required/d.Displacements.Largest())),
			d.Pressure, components.CallerRule("MotorDuty.Pressure"))
	}
	if err := finite(fn, output{"Pressure", float64(r.Pressure.Value)}, output{"Flow", float64(r.Flow)}); err != nil {
		return MotorSize{}, err
	}
	r.Findings = d.findings(r)
	return r, nil
}

// displacementFor returns D = 2π·T/(Δp·η).
func displacementFor(t units.Torque, dp units.Pressure, eta float64) units.Displacement {
	return units.Displacement(2 * math.Pi * float64(t) / (float64(dp) * eta))
}

func (d MotorDuty) validate(fn string) error {
	if err := validate.Positive(fn, "MotorDuty.Torque", d.Torque); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "MotorDuty.StartTorque", d.StartTorque); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "MotorDuty.Speed", d.Speed); err != nil {
		return err
	}
	if err := validate.Positive(fn, "MotorDuty.Pressure", d.Pressure); err != nil {
		return err
	}
	if err := efficiencies(fn, d.Volumetric, d.Mechanical, d.Starting); err != nil {
		return prefixed(err, "MotorDuty.")
	}
	if d.Displacements.Len() == 0 {
		return &units.RangeError{Func: fn, Param: "MotorDuty.Displacements", Value: "an empty series",
			Valid: "the displacements offered, at least one"}
	}
	return nil
}

func (d MotorDuty) findings(r MotorSize) components.Findings {
	var fs components.Findings
	if !r.Displacement.OK() {
		fs = append(fs, components.NewFinding(components.Notice, components.NoHazard, "actuator.no-motor",
			d.Displacements.Rule(), "no displacement up to %v in %v gives the torque at %v; %v is needed",
			d.Displacements.Largest(), d.Displacements.Name(), d.Pressure, r.Displacement.Required))
	}
	if d.HoldsLoad {
		fs = append(fs, components.NewFinding(components.Warning, components.OverrunningLoad, "actuator.motor-holding",
			ruleISO4413(),
			"a hydraulic motor leaks past its ports and creeps under load, so it cannot hold the load still: hold it with a spring-applied, pressure-released brake and control an overrunning load with a counterbalance valve"))
	}
	return fs
}
