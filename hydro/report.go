package hydro

import (
	"reflect"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/units"
)

// Value is one number of a report with the rule it comes from: a law or
// definition (components.Physics), a family's result, a default of ours or
// of the trade, or the caller's own value. In JSON it is
// {"value": "12.5 L/min", "rule": {"kind": …, "source": …}}.
type Value[T ~float64] struct {
	Value T               `json:"value"`
	Rule  components.Rule `json:"rule"`
}

func (Value[T]) ruled() {}

// Report is what [Size] returns: the whole machine sized, every number
// with its unit and the rule it came from, in the order an engineer works.
// It marshals to JSON with the field names given on each field (stable
// within a major version); durations are written in seconds ("2.5 s") and
// quantities as strings with their unit. [Report.Text] and
// [Report.Markdown] render it for people.
type Report struct {
	Name  string `json:"name"`
	Units string `json:"units"` // "metric" or "us": the system the renderings use

	Basis Basis `json:"basis"` // the design factors used, given or defaulted
	Solve Solve `json:"solve"` // how the coupled sizing converged

	Actuators   []ActuatorResult   `json:"actuators"`
	Phases      []PhaseResult      `json:"phases"`
	Pump        PumpResult         `json:"pump"`
	Drive       DriveResult        `json:"drive"`
	Valves      ValveResult        `json:"valves"`
	Lines       []LineResult       `json:"lines"`
	Accumulator *AccumulatorResult `json:"accumulator"` // when the spec asks for one
	Heat        HeatResult         `json:"heat"`
	Fluid       FluidResult        `json:"fluid"`
	Cleanliness CleanlinessResult  `json:"cleanliness"`
	Bill        []BillItem         `json:"bill"`

	// Findings are every finding of the families and of the sizer, merged
	// without duplicates and ordered most severe first.
	Findings components.Findings `json:"findings"`
	Notes    []string            `json:"notes"` // the spec's notes
}

// Basis is the set of design factors a report was sized with, each with
// its rule: the caller's (components.CallerValue, named by its JSON path),
// a family's default, or one of ours.
type Basis struct {
	Pressure          Value[units.Pressure]        `json:"pressure"`            // working pressure the actuators are sized at
	ReliefMargin      Value[float64]               `json:"relief_margin"`       // relief above the highest working pressure
	PumpSpeed         Value[units.RotationalSpeed] `json:"pump_speed"`          // pump shaft speed
	PumpVolumetric    Value[float64]               `json:"pump_volumetric"`     // pump volumetric efficiency
	PumpMechanical    Value[float64]               `json:"pump_mechanical"`     // pump hydromechanical efficiency
	MotorVolumetric   Value[float64]               `json:"motor_volumetric"`    // hydraulic motor efficiencies, when there is a motor
	MotorMechanical   Value[float64]               `json:"motor_mechanical"`    //
	SuctionVelocity   Value[units.Velocity]        `json:"suction_velocity"`    // line velocity limits
	PressureVelocity  Value[units.Velocity]        `json:"pressure_velocity"`   //
	ReturnVelocity    Value[units.Velocity]        `json:"return_velocity"`     //
	MaxOilTemperature Value[units.Temperature]     `json:"max_oil_temperature"` // hottest oil allowed
	ReservoirDwell    time.Duration                `json:"reservoir_dwell"`     // reservoir volume in time of pump flow
	ReservoirRule     components.Rule              `json:"reservoir_rule"`
	RodYield          Value[units.Pressure]        `json:"rod_yield"`
	BoreSeries        string                       `json:"bore_series"`  // the bore series chosen from
	MotorSeries       string                       `json:"motor_series"` // the motor ratings chosen from
}

// Solve says how the sizing converged. The physics couples: the pump's
// pressure is the load's plus the losses of the lines, valves and filter,
// which depend on the oil's viscosity; the viscosity depends on the oil's
// temperature, which depends on the heat those losses make. Size repeats
// the chain from the actuators to the heat balance until the running oil
// temperature and the highest pump pressure stop moving.
type Solve struct {
	Iterations  int                                `json:"iterations"`
	Converged   bool                               `json:"converged"`
	Temperature Value[units.TemperatureDifference] `json:"temperature_residual"` // change of the running oil temperature in the last pass
	Pressure    Value[units.Pressure]              `json:"pressure_residual"`    // change of the highest pump pressure in the last pass
}

// ActuatorResult is one actuator sized: the standard size chosen and what
// it does in each move of the cycle.
type ActuatorResult struct {
	Name string `json:"name"`
	Kind string `json:"kind"` // "cylinder" or "motor"

	// Cylinders.
	Bore      components.Choice[units.Length] `json:"bore"`
	Rod       components.Choice[units.Length] `json:"rod"`
	Stroke    units.Length                    `json:"stroke"`
	AreaRatio Value[float64]                  `json:"area_ratio"` // cap over annulus of the chosen cylinder
	Buckling  *Buckling                       `json:"buckling"`   // at full extension under relief thrust

	// Motors.
	Displacement components.Choice[units.Displacement] `json:"displacement"`

	Holding   *Holding     `json:"holding"`   // the load-holding valve, for a load that can fall or run away
	Governing string       `json:"governing"` // the phase whose move set the size
	Moves     []MoveResult `json:"moves"`
}

// Holding is the counterbalance valve fitted at a cylinder port to hold a
// suspended or overrunning load (hydro/valve).
type Holding struct {
	Valve   string                `json:"valve"`
	Load    Value[units.Pressure] `json:"load"`    // the highest load-induced pressure on the held side
	Setting Value[units.Pressure] `json:"setting"` // the valve's setting
	Pilot   Value[units.Pressure] `json:"pilot"`   // the pilot pressure that opens it: the inlet pressure to lower the load
	Ratio   Value[float64]        `json:"pilot_ratio"`
}

// Buckling is the buckling check of a cylinder's rod.
type Buckling struct {
	FreeLength Value[units.Length]       `json:"free_length"` // K·L at full extension
	Critical   Value[units.Force]        `json:"critical"`    // Euler or Johnson buckling load
	Thrust     Value[units.Force]        `json:"thrust"`      // relief setting × the extend area
	Safety     components.Check[float64] `json:"safety"`      // critical over thrust, at least the factor
	Method     string                    `json:"method"`
}

// MoveResult is what an actuator does in one phase, with the size chosen.
type MoveResult struct {
	Phase        string                       `json:"phase"`
	Direction    string                       `json:"direction"`
	Regenerative bool                         `json:"regenerative"`
	Force        Value[units.Force]           `json:"force"`       // total force at the rod: process, weight, friction and acceleration (cylinders)
	Torque       Value[units.Torque]          `json:"torque"`      // load torque (motors)
	Pressure     Value[units.Pressure]        `json:"pressure"`    // at the actuator's inlet port
	Back         Value[units.Pressure]        `json:"back"`        // at its outlet port: the return path's drop
	Flow         Value[units.Flow]            `json:"flow"`        // the pump flow the move takes
	ReturnFlow   Value[units.Flow]            `json:"return"`      // what leaves the outlet port
	Speed        Value[units.Velocity]        `json:"speed"`       // rod speed (cylinders)
	ShaftSpeed   Value[units.RotationalSpeed] `json:"shaft_speed"` // motors
	Time         time.Duration                `json:"time"`        // the move's time
}

// PhaseResult is one phase of the cycle as the pump sees it, with its
// pressure budget. A phase whose moves are followed by a dwell gives two
// rows: the moves ("eject"), then the dwell with their valves centred and
// its holds still held ("eject, dwell"); the idle time between cycles is
// the last row ("idle between cycles"). The rows' times add up to the
// cycle.
type PhaseResult struct {
	Name     string                `json:"name"`
	Time     time.Duration         `json:"time"`     // how long the pump runs so
	Demand   Value[units.Flow]     `json:"demand"`   // flow the moving actuators take
	Load     Value[units.Pressure] `json:"load"`     // highest actuator inlet pressure
	Pump     Value[units.Pressure] `json:"pump"`     // pump outlet pressure
	Delivery Value[units.Flow]     `json:"delivery"` // what the pump delivers
	Relief   Value[units.Flow]     `json:"relief"`   // flow over the relief valve
	Shaft    Value[units.Power]    `json:"shaft"`    // pump shaft power
	Heat     Value[units.Power]    `json:"heat"`     // heat into the oil in this phase
	Mode     string                `json:"mode"`     // "working", "relieving", "standby" or "unloaded"
	Budget   []BudgetItem          `json:"budget"`   // the pressure budget: load and each drop on the way
}

// BudgetItem is one line of a phase's pressure budget: the load pressure
// at the actuator, or the drop of one element of its supply or return path
// at the phase's flow and the oil's running viscosity.
type BudgetItem struct {
	Path string                `json:"path"` // "load", "supply", "return"
	Name string                `json:"name"`
	Drop Value[units.Pressure] `json:"drop"`
}

// PumpResult is the pump chosen.
type PumpResult struct {
	Kind          string                                   `json:"kind"`
	Control       string                                   `json:"control"`
	Flow          Value[units.Flow]                        `json:"flow"`           // the flow the circuit takes at once
	Pressure      Value[units.Pressure]                    `json:"pressure"`       // the highest working pressure at the pump
	Margin        Value[float64]                           `json:"margin"`         // put on both by the pump family
	RatedFlow     Value[units.Flow]                        `json:"rated_flow"`     //
	RatedPressure Value[units.Pressure]                    `json:"rated_pressure"` // the continuous rating to ask for
	Displacement  components.Choice[units.Displacement]    `json:"displacement"`
	Delivered     Value[units.Flow]                        `json:"delivered"` // what the chosen size gives at its speed
	Cutoff        Value[units.Pressure]                    `json:"cutoff"`    // compensator or cut-off setting
	Inlet         components.Check[units.AbsolutePressure] `json:"inlet"`     // absolute inlet pressure at a cold start against the pump's minimum
}

// DriveResult is what turns the pump.
type DriveResult struct {
	Kind    string                         `json:"kind"` // "electric" or "engine"
	Speed   Value[units.RotationalSpeed]   `json:"speed"`
	Peak    Value[units.Power]             `json:"peak"`
	RMS     Value[units.Power]             `json:"rms"`
	Average Value[units.Power]             `json:"average"`
	Rating  components.Choice[units.Power] `json:"rating"` // the motor rating (electric)
	Thermal components.Check[units.Power]  `json:"thermal"`
	Torque  components.Check[units.Torque] `json:"torque"`
}

// ValveResult holds the valves and their settings.
type ValveResult struct {
	Relief      Value[units.Pressure] `json:"relief"`      // main relief setting
	Directional []DirectionalValve    `json:"directional"` // one per actuator
	Center      string                `json:"center"`
}

// DirectionalValve is the directional valve of one actuator.
type DirectionalValve struct {
	Actuator string            `json:"actuator"`
	Size     string            `json:"size"`
	Flow     Value[units.Flow] `json:"flow"` // the peak flow through it
	Listed   Value[units.Flow] `json:"listed"`
}

// LineResult is one line sized: its bore, the velocity and the largest
// drop over the cycle.
type LineResult struct {
	Name     string                           `json:"name"`
	Service  string                           `json:"service"` // "suction", "pressure", "return", "work"
	Size     string                           `json:"size"`    // tube OD × wall or hose dash size
	Bore     components.Choice[units.Length]  `json:"bore"`
	Flow     Value[units.Flow]                `json:"flow"`
	Velocity components.Check[units.Velocity] `json:"velocity"`
	Length   units.Length                     `json:"length"`
	Drop     Value[units.Pressure]            `json:"drop"` // at Flow and the running viscosity
	Rating   components.Check[units.Pressure] `json:"rating"`
}

// AccumulatorResult is the accumulator, when the spec asks for one.
type AccumulatorResult struct {
	Use       string                          `json:"use"`
	Need      Value[units.Volume]             `json:"need"`
	Volume    components.Choice[units.Volume] `json:"volume"`
	Precharge Value[units.AbsolutePressure]   `json:"precharge"`
	Min       Value[units.AbsolutePressure]   `json:"min"`
	Max       Value[units.AbsolutePressure]   `json:"max"`
	Energy    Value[units.Energy]             `json:"energy"`
	PumpFlow  Value[units.Flow]               `json:"pump_flow"` // for "cycle": the pump flow with the accumulator
}

// HeatResult is the heat balance.
type HeatResult struct {
	Items       []HeatItem                          `json:"items"` // the mean heat by source
	Load        Value[units.Power]                  `json:"load"`  // mean heat into the oil
	Input       Value[units.Power]                  `json:"input"` // mean input: the pump's shaft and the loads lowered
	Reservoir   components.Choice[units.Volume]     `json:"reservoir"`
	Area        Value[units.Area]                   `json:"area"`        // wetted area of the tank
	Dissipation Value[units.Power]                  `json:"dissipation"` // shed by the tank at the highest oil temperature
	Steady      Value[units.Temperature]            `json:"steady"`      // oil temperature at the hottest ambient without a cooler
	Running     Value[units.Temperature]            `json:"running"`     // oil temperature the sizing converged on
	Cooler      Value[units.Power]                  `json:"cooler"`      // cooler duty (0 when none is needed)
	CoolerRate  Value[float64]                      `json:"cooler_w_per_k"`
	Check       components.Check[units.Temperature] `json:"check"`
}

// HeatItem is the mean heat of one source.
type HeatItem struct {
	// Source is hydro/thermal's name of the source: "pump", "motor" (the
	// actuators' own losses: cylinder seal friction, hydraulic motors),
	// "throttling", "relief", "standby", "lines" or "other".
	Source string             `json:"source"`
	Heat   Value[units.Power] `json:"heat"`
}

// FluidResult is the fluid and how it fares at the site's extremes.
type FluidResult struct {
	Name      string                                     `json:"name"`
	Grade     string                                     `json:"grade"`
	VI        Value[float64]                             `json:"vi"`
	ColdStart Value[units.Temperature]                   `json:"cold_start"`
	Cold      components.Check[units.KinematicViscosity] `json:"cold"`  // at the cold start against the pump's maximum
	Hot       components.Check[units.KinematicViscosity] `json:"hot"`   // at the running temperature against the pump's minimum
	Suits     []string                                   `json:"suits"` // grades that suit the site, best first
}

// CleanlinessResult is the cleanliness plan.
type CleanlinessResult struct {
	Target       contamination.Code `json:"target"`
	Basis        string             `json:"basis"` // the component that sets it
	Rule         components.Rule    `json:"rule"`
	Filters      []FilterResult     `json:"filters"`
	Held         contamination.Code `json:"held"`               // the code the filtration holds (with a known ingress)
	Meets        bool               `json:"meets"`              //
	Flow         Value[units.Flow]  `json:"flow"`               // the mean flow through the return filter over the cycle, which the particle balance runs on
	Required     [3]float64         `json:"required_beta"`      // β needed at ≥4, ≥6, ≥14 µm(c)
	RequiredRule components.Rule    `json:"required_beta_rule"` // the rule of Required
}

// FilterResult is one filter of the plan.
type FilterResult struct {
	Placement string                           `json:"placement"`
	Rating    string                           `json:"rating"` // β_x(c) ≥ …
	Size      Value[units.Flow]                `json:"size"`   // the element's rated flow
	Flow      Value[units.Flow]                `json:"flow"`   // the highest flow through it
	Clean     components.Check[units.Pressure] `json:"clean"`  // clean drop at the running viscosity against the bypass setting
	Cold      components.Check[units.Pressure] `json:"cold"`   // the same at the cold start
}

// BillItem is one line of the bill of sized components.
type BillItem struct {
	Item  string `json:"item"`
	What  string `json:"what"`
	Count int    `json:"count"`
}

// MarshalJSON writes the report with the field names of its types:
// quantities as strings with their unit (each quantity's MarshalText, which
// reads back to the identical value), durations in seconds ("2.5 s"),
// choices, checks and findings in the components vocabulary's own JSON, and
// fields at their zero value (a number with no rule, an empty list) left
// out; a number with its rule is written even when it is zero ("0 bar").
func (r Report) MarshalJSON() ([]byte, error) { return encodeJSON(reflect.ValueOf(r)) }

// MarshalJSON writes the comparison as Report.MarshalJSON writes a report.
func (c Comparison) MarshalJSON() ([]byte, error) { return encodeJSON(reflect.ValueOf(c)) }
