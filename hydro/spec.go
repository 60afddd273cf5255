package hydro

import (
	"time"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/units"
)

// Spec is a machine to size: its actuators and what they must do, the duty
// cycle, the supply, the site, the fluid, the cleanliness it needs, the
// circuit preferences and the design factors. Build it in Go with typed
// quantities, or read it from JSON with [ParseSpec] (or json.Unmarshal),
// where every quantity is a string with its unit ("210 bar", "800 mm",
// "2.5 s"): a bare number is refused, because a number without a unit is a
// guess.
//
// Optional fields are marked; their zero value means "not given" and, for a
// design factor, the default documented on the field. Words that pick one
// of a few choices ("cylinder", "tandem", "HM") are plain strings, listed on
// each field; [Spec.Validate] refuses any other.
type Spec struct {
	Name        string      `json:"name"`        // what the machine is, for the report's heading (optional)
	Actuators   []Actuator  `json:"actuators"`   // at least one
	Cycle       Cycle       `json:"cycle"`       // the duty cycle
	Supply      Supply      `json:"supply"`      // what turns the pump
	Site        Site        `json:"site"`        // where the machine runs
	Fluid       Fluid       `json:"fluid"`       // the hydraulic fluid
	Cleanliness Cleanliness `json:"cleanliness"` // what the oil must be kept clean enough for
	Circuit     Circuit     `json:"circuit"`     // valve center, pump, lines, accumulator
	Design      Design      `json:"design"`      // design factors, all optional
	Units       string      `json:"units"`       // output unit system: "metric" (default) or "us"
	Notes       []string    `json:"notes"`       // free text carried into the report (optional)
}

// Actuator is one cylinder or hydraulic motor of the machine and what it
// carries. What each stroke or turn must do is in the cycle's [Move]s.
type Actuator struct {
	Name string `json:"name"` // unique; the cycle's moves name it
	Kind string `json:"kind"` // "cylinder" or "motor"

	// Cylinders.
	Stroke          units.Length `json:"stroke"`           // full stroke, > 0 (cylinders)
	Orientation     string       `json:"orientation"`      // "horizontal" (default), "vertical" (extending raises the load), "vertical-down" (extending lowers it) or "inclined"
	InclineDegrees  float64      `json:"incline_deg"`      // for "inclined": the angle the extend stroke climbs, −90 to 90 degrees
	Mount           string       `json:"mount"`            // body mounting for buckling: "flange", "feet", "trunnion" or "clevis" (default)
	RodEnd          string       `json:"rod_end"`          // rod end for buckling: "pinned" (default, pinned and guided), "fixed" (fixed and guided) or "free"
	RetractedLength units.Length `json:"retracted_length"` // mount-to-load length with the rod in (optional; default stroke + 200 mm, our choice)
	AreaRatio       float64      `json:"area_ratio"`       // least cap/annulus area ratio, > 1 (optional; 2 suits a regenerative cylinder)

	Mass     units.Mass `json:"moving_mass"`    // moving mass of load, rod and piston, ≥ 0 (optional; cylinders)
	Friction float64    `json:"guide_friction"` // coefficient of friction of the load on its guide, 0 to 1 (optional; cylinders)

	// Both.
	Suspended   bool         `json:"suspended"`   // the load falls if pressure is lost: needs a load-holding valve
	Overrunning bool         `json:"overrunning"` // the load can drive the actuator: needs a counterbalance valve
	LineLength  units.Length `json:"line_length"` // length of each work line, valve to actuator (optional; default 3 m, our choice)

	// Motors.
	BreakawayTorque units.Torque `json:"breakaway_torque"` // torque to start the load from rest, ≥ 0 (optional; motors)
}

// Cycle is the machine's duty: phases run one after another, then the cycle
// repeats.
type Cycle struct {
	Phases []Phase `json:"phases"` // at least one, in order

	// CyclesPerHour is how often the cycle runs, in cycles per hour, > 0;
	// 0 (the default) means back to back, with no idle time. The phases of
	// CyclesPerHour cycles must fit in an hour; the rest of the hour the
	// machine idles with the pump unloaded (or stroked back).
	CyclesPerHour float64 `json:"cycles_per_hour"`
}

// Phase is one step of the cycle: the actuators that move together, then
// an optional dwell. A phase with no moves, or only holds, lasts its dwell.
type Phase struct {
	Name  string        `json:"name"`  // unique within the cycle (optional; default "phase 1", …)
	Moves []Move        `json:"moves"` // what moves at once
	Dwell time.Duration `json:"dwell"` // pause after the moves, ≥ 0 (optional); holds keep their load through it
}

// Move is what one actuator does in a phase.
//
// A cylinder extends or retracts over Distance (default the full stroke)
// at Speed, or in Time; a motor turns "forward" or "reverse" at
// ShaftSpeed for Turns revolutions or for Time. Direction "hold" keeps the
// actuator still against Force or Torque for the phase's dwell (a press
// holding its tonnage). Force and Torque are the process load opposing the
// motion (pressing, cutting, winding); the weight, guide friction and
// acceleration of the moving mass are added from the actuator.
type Move struct {
	Actuator  string `json:"actuator"`  // name of an actuator
	Direction string `json:"direction"` // "extend" or "retract" (cylinders), "forward" or "reverse" (motors), or "hold"

	Force        units.Force    `json:"force"`        // process force at the rod, ≥ 0 (cylinders)
	Speed        units.Velocity `json:"speed"`        // rod speed, > 0 (cylinders; or Time)
	Distance     units.Length   `json:"distance"`     // travel, ≤ the stroke (optional; default the full stroke)
	Regenerative bool           `json:"regenerative"` // extend with the annulus oil joined to the cap side (fast approach)

	Torque     units.Torque          `json:"torque"`      // load torque at the shaft, ≥ 0 (motors)
	ShaftSpeed units.RotationalSpeed `json:"shaft_speed"` // motor speed, > 0 (motors; or Time)
	Turns      float64               `json:"turns"`       // revolutions turned, > 0 (motors; with ShaftSpeed or Time)

	Time      time.Duration `json:"time"`       // time the move takes (instead of a speed)
	AccelTime time.Duration `json:"accel_time"` // time to reach speed from rest, ≥ 0 (optional)
}

// Supply is what turns the pump: an electric motor on the mains, or an
// engine. Give Mains or EngineSpeed, not both.
type Supply struct {
	Mains       units.Frequency       `json:"mains"`        // mains frequency, 50 Hz or 60 Hz (electric drive)
	Poles       int                   `json:"poles"`        // poles of the electric motor, 2 to 12 and even (optional; default 4)
	EngineSpeed units.RotationalSpeed `json:"engine_speed"` // pump shaft speed from an engine (engine drive)
}

// Site is where the machine runs.
type Site struct {
	AmbientMin units.Temperature `json:"ambient_min"` // coldest ambient at a start
	AmbientMax units.Temperature `json:"ambient_max"` // hottest ambient while running
	Altitude   units.Length      `json:"altitude"`    // height above sea level, ≥ 0 (optional; derates motors and air cooling)
	Mobile     bool              `json:"mobile"`      // a mobile machine (small reservoir, no mains)
}

// Fluid names the hydraulic fluid in one of three ways:
//
//   - a preset: Class and Grade ("HM", "VG 46"), typical data from
//     fluid.Typical;
//   - a grade and viscosity index: Grade and VI, with Class for density
//     and heat data (default "HM");
//   - data-sheet values: V40 and V100 (or V40 and VI) and Density, with
//     PourPoint when known, through fluid.FromDataSheet.
//
// Window overrides the pump's viscosity limits (default
// fluid.DefaultWindow).
type Fluid struct {
	Name      string                   `json:"name"`       // the product, for the report (optional)
	Class     string                   `json:"class"`      // ISO 6743-4 class: "HM", "HV", "HFC", "HFDU" or "HEES"
	Grade     fluid.Grade              `json:"grade"`      // ISO 3448 grade, "VG 46"
	VI        float64                  `json:"vi"`         // viscosity index (optional)
	V40       units.KinematicViscosity `json:"v40"`        // data sheet: kinematic viscosity at 40 °C
	V100      units.KinematicViscosity `json:"v100"`       // data sheet: kinematic viscosity at 100 °C
	Density   units.Density            `json:"density_15"` // data sheet: density at 15 °C
	PourPoint units.Temperature        `json:"pour_point"` // data sheet: pour point (optional)
	Window    *Window                  `json:"window"`     // pump viscosity limits (optional)
}

// Window is the band of kinematic viscosity the pump accepts; see
// fluid.Window. Every field is required when a Window is given.
type Window struct {
	Min         units.KinematicViscosity `json:"min"`          // permissible minimum, hot running
	OptimumLow  units.KinematicViscosity `json:"optimum_low"`  // optimum band, lower end
	OptimumHigh units.KinematicViscosity `json:"optimum_high"` // optimum band, upper end
	Max         units.KinematicViscosity `json:"max"`          // cold-start maximum
}

// Cleanliness is what sets the oil's cleanliness target, and how dirt gets
// in. Give the ingress, or a sample from a machine like this one with the
// filter that produced it (the ingress is worked back from it), or neither
// (the filters are then chosen for the target alone).
type Cleanliness struct {
	// MostSensitive is the most dirt-sensitive component: "servo valve",
	// "proportional valve", "variable piston pump", "fixed piston pump",
	// "piston motor", "vane pump", "pressure or flow control valve",
	// "gear pump", "gear motor", "directional valve" or "cylinder"
	// (optional; default the pump chosen).
	MostSensitive string             `json:"most_sensitive"`
	Critical      bool               `json:"critical"`    // downtime is costly or unsafe: one step cleaner
	SevereDuty    bool               `json:"severe_duty"` // shock loads, high duty, hot or wet site: one step cleaner
	Target        contamination.Code `json:"target"`      // ISO 4406 code to hold instead of the recommended one (optional)
	Ingress       *Ingress           `json:"ingress"`     // particles entering the oil (optional)
	Sample        *Sample            `json:"sample"`      // a sample with the filter that produced it (optional)
}

// Ingress is the particles entering the oil per minute, from the air,
// seals and wear, counted at ≥4, ≥6 and ≥14 µm(c).
type Ingress struct {
	PerMinute [3]float64 `json:"per_minute"` // particles per minute at ≥4, ≥6, ≥14 µm(c), each ≥ 0, not rising with size
}

// Sample is a steady particle count from a machine like this one, with the
// full-flow filter that held it there; the ingress is worked back from the
// steady-state particle balance (see hydro/contamination).
type Sample struct {
	PerML [3]float64 `json:"per_ml"` // particles per mL at ≥4, ≥6, ≥14 µm(c)
	Flow  units.Flow `json:"flow"`   // flow through the filter, > 0
	Beta  [3]float64 `json:"beta"`   // the filter's β at ≥4, ≥6, ≥14 µm(c), each > 1
}

// Circuit holds the circuit preferences.
type Circuit struct {
	Center      string      `json:"center"`      // directional valve center: "tandem" (default), "open", "closed" or "float"
	Pump        string      `json:"pump"`        // "gear" (default), "vane", "piston" or "variable piston"
	Control     string      `json:"control"`     // for "variable piston": "pressure-compensated" (default) or "load-sensing"
	Conductor   string      `json:"conductor"`   // lines: "tube" (default) or "hose"
	Suction     Line        `json:"suction"`     // tank to pump inlet (optional; default 1 m, 1 bend)
	Pressure    Line        `json:"pressure"`    // pump to valve (optional; default 4 m, 4 bends)
	Return      Line        `json:"return"`      // valve to tank through the return filter (optional; default 4 m, 4 bends)
	Accumulator Accumulator `json:"accumulator"` // when to add one (optional)
}

// Line is the run of one line; the sizer picks its bore.
type Line struct {
	Length units.Length `json:"length"` // length of the run, > 0
	Bends  int          `json:"bends"`  // 90° bends or elbows, ≥ 0
}

// Accumulator says when the circuit gets an accumulator.
type Accumulator struct {
	// Use is "none" (the default), "cycle" (store oil in the dwells to
	// meet the peak flow, for a smaller pump) or "emergency" (enough oil
	// for the Emergency move with the pump stopped).
	Use       string `json:"use"`
	Emergency *Move  `json:"emergency"` // for "emergency": the move the stored oil must make
}

// Design holds the design factors. Every one is optional; the default is
// on each field and in the package documentation, and the report says for
// each whether it was given or defaulted.
type Design struct {
	// Pressure is the working pressure the actuators are sized at
	// (default DefaultPressure, 160 bar). PressureRange searches a range
	// instead.
	Pressure      units.Pressure `json:"pressure"`
	PressureRange *PressureRange `json:"pressure_range"`

	PumpSpeed      units.RotationalSpeed `json:"pump_speed"`      // pump shaft speed (default from the supply)
	PumpMargin     *float64              `json:"pump_margin"`     // margin on the pump's flow and pressure, 0 to 1 (default the pump family's)
	ReliefMargin   *float64              `json:"relief_margin"`   // relief setting above the highest working pressure, 0 to 1 (default 0.10)
	SealEfficiency float64               `json:"seal_efficiency"` // share of p·A left after seal friction, (0, 1] (default the actuator family's)
	BucklingFactor float64               `json:"buckling_factor"` // buckling safety factor, ≥ 1 (default the actuator family's)
	RodYield       units.Pressure        `json:"rod_yield"`       // piston rod yield strength (default 300 MPa, our choice)

	SuctionVelocity  units.Velocity `json:"suction_velocity"`  // line velocity limits (default the line family's)
	PressureVelocity units.Velocity `json:"pressure_velocity"` //
	ReturnVelocity   units.Velocity `json:"return_velocity"`   //

	MaxOilTemperature units.Temperature `json:"max_oil_temperature"` // hottest oil allowed (default 60 °C, ISO 4413's pump inlet limit)
	ReservoirMinutes  float64           `json:"reservoir_minutes"`   // reservoir volume in minutes of pump flow (default 3, or 1 when mobile)

	BoreSeries  string `json:"bore_series"`  // "iso" (ISO 3320) or "inch" (default: follows Units)
	MotorSeries string `json:"motor_series"` // "iec" (kW) or "nema" (hp) (default: follows Units)
}

// PressureRange is a range of working pressures to search: From, From +
// Step, … up to To.
type PressureRange struct {
	From units.Pressure `json:"from"` // lowest pressure, > 0
	To   units.Pressure `json:"to"`   // highest pressure, ≥ From
	Step units.Pressure `json:"step"` // > 0; at most 64 pressures in all
}
