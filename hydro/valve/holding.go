package valve

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// DefaultCounterbalanceRatio is the ratio of a counterbalance valve's
// setting to the highest load-induced pressure when the caller gives none:
// 1.3, the common-practice minimum, which lets the valve reseat and hold
// the load leak-free.
const DefaultCounterbalanceRatio = 1.3

// Coupling returns how much of a pilot pressure applied to the inlet
// chamber of cylinder c on stroke dir appears in the outlet chamber, the
// one a load-holding valve holds: c = A_in/A_out, from the cylinder's own
// areas (actuator.Cylinder.Area and OutletArea). Lowering a load held on
// the cap side (dir Retract, valve on the cap port, pilot from the annulus
// line) gives 1/φ; holding it on the annulus (dir Extend, valve on the rod
// port) gives φ; a double-rod cylinder 1. Use 1 for a hydraulic motor. The
// cylinder must pass its Validate and its areas give a finite ratio; the
// error matches units.ErrRange.
func Coupling(c actuator.Cylinder, dir actuator.Direction) (float64, error) {
	if err := c.Validate(); err != nil {
		return 0, validate.Renamed(err, "valve.Coupling", nil)
	}
	return validate.Checked("valve.Coupling", "coupling", float64(c.Area(dir)/c.OutletArea(dir)))
}

// pilotRule is the form the pilot pressures are computed by.
func pilotRule() components.Rule {
	return components.PhysicsRule("force balance on the valve poppet and the actuator piston; valve makers' formulas differ")
}

// CounterbalanceNeed describes a counterbalance (over-center) valve on an
// actuator port.
type CounterbalanceNeed struct {
	Load units.Pressure // the highest load-induced pressure at the valve's load port (required, > 0)
	// Ratio is the setting over Load, from 1 to 10. Nil selects
	// DefaultCounterbalanceRatio (1.3, common practice).
	Ratio *float64
	// Setting is the valve's setting when it is already chosen (for the
	// heaviest load the valve holds), to find the pilot pressure and the
	// throttling for this Load, a lighter one: finite and above Load, with
	// Ratio nil. Zero sets it at Load × Ratio.
	Setting units.Pressure
	// PilotRatio is the valve's pilot ratio R: pilot area over the
	// relief poppet's effective area (3:1, 4.5:1, 8:1 …), > 0.
	PilotRatio float64
	// Back is the pressure at the valve's outlet while the load is lowered:
	// return-line and directional-valve losses (≥ 0).
	Back units.Pressure
	// Vented marks a valve whose spring chamber is vented to atmosphere,
	// so back pressure does not add to its setting.
	Vented bool
	// Coupling is how the pilot pressure itself raises the held pressure
	// ([Coupling]): 1/φ, φ or 1 from the actuator, or 0 to leave it out
	// (the common-practice form).
	Coupling float64
	// Joined marks a valve whose outlet is joined to its own pilot line,
	// as on a regenerative extend where the annulus oil it passes joins
	// the cap side's: the pressure past it is then the pilot pressure plus
	// Back (the drops of the oil's way across).
	Joined bool
	// Flow is the flow through the valve while lowering, for the heat; zero
	// leaves it out.
	Flow units.Flow
	// Rating is the actuator's rated pressure, which the setting must not
	// exceed (0: not checked).
	Rating units.Pressure
}

// Counterbalance is a counterbalance valve's setting and the pilot
// pressure that opens it.
type Counterbalance struct {
	Load      units.Pressure
	Setting   units.Pressure // Load × Ratio
	Ratio     float64        // always reported
	RatioRule components.Rule
	// Pilot is the pilot pressure at which the valve starts to open and the
	// load to move:
	//
	//	p_x = (p_set + k·p_back − p_load) / (R + c − k·j)
	//
	// with k = 1 (k = 0 for a Vented valve), c the Coupling, and j = 1 for
	// a Joined valve (its outlet at p_x + p_back), 0 otherwise. With c = 0
	// and no back pressure this is the common-practice
	// (setting − load)/R.
	Pilot     units.Pressure
	PilotRule components.Rule
	// Throttled is the drop the valve takes while lowering, from the held
	// pressure p_load + c·p_x down to the pressure past it (p_back, or
	// p_x + p_back when Joined), and Heat that drop times Flow.
	Throttled units.Pressure
	Heat      units.Power
	Findings  components.Findings
}

// CounterbalanceSetting returns a counterbalance valve's setting,
// p_set = ratio × p_load (1.3 unless the caller gives a ratio: common
// practice) or the Setting given, and the pilot pressure that opens it for
// its pilot ratio, with back pressure and the actuator's coupling (see
// [Counterbalance.Pilot]; the form is a force balance, and valve makers'
// own formulas differ: where the maker gives one, use it). A ratio below
// 1.3 draws a Warning (hazard OverrunningLoad): the valve may not reseat,
// and the load creeps or runs away. A setting above Rating draws a Warning
// (hazard Overpressure). Errors match units.ErrRange and name the field.
func CounterbalanceSetting(n CounterbalanceNeed) (Counterbalance, error) {
	const fn = "valve.CounterbalanceSetting"
	if err := validate.Positive(fn, "Load", n.Load); err != nil {
		return Counterbalance{}, err
	}
	if err := validate.Positive(fn, "PilotRatio", n.PilotRatio); err != nil {
		return Counterbalance{}, err
	}
	if err := validate.NonNegative(fn, "Back", n.Back); err != nil {
		return Counterbalance{}, err
	}
	if err := validate.NonNegative(fn, "Coupling", n.Coupling); err != nil {
		return Counterbalance{}, err
	}
	if err := validate.NonNegative(fn, "Flow", n.Flow); err != nil {
		return Counterbalance{}, err
	}
	if err := validate.NonNegative(fn, "Rating", n.Rating); err != nil {
		return Counterbalance{}, err
	}
	ratio, rule, err := counterbalanceRatio(fn, n)
	if err != nil {
		return Counterbalance{}, err
	}
	cb := Counterbalance{Load: n.Load, Setting: units.Pressure(float64(n.Load) * ratio), Ratio: ratio, RatioRule: rule,
		PilotRule: pilotRule()}
	if n.Setting != 0 {
		cb.Setting = n.Setting
	}
	effective, opening := cb.Setting, n.PilotRatio+n.Coupling
	if !n.Vented {
		effective += n.Back
		if n.Joined {
			opening-- // the pilot pressure past the poppet holds it shut as much
		}
	}
	if !(opening > 0) {
		return Counterbalance{}, validate.Fail(fn, "PilotRatio", n.PilotRatio, "above 1 − Coupling for a Joined valve: its pilot could never open it")
	}
	cb.Pilot = units.Pressure(float64(effective-n.Load) / opening)
	past := n.Back
	if n.Joined {
		past += cb.Pilot
	}
	cb.Throttled = n.Load + units.Pressure(n.Coupling*float64(cb.Pilot)) - past
	cb.Heat = cb.Throttled.TimesFlow(n.Flow)
	if err := validate.Result(fn, "Heat", cb.Heat); err != nil {
		return Counterbalance{}, err
	}
	if ratio < DefaultCounterbalanceRatio {
		cb.Findings = append(cb.Findings, components.NewFinding(components.Warning, components.OverrunningLoad, "valve.counterbalance-low",
			components.PracticeRule("counterbalance set at least 1.3 × the load-induced pressure"),
			"a counterbalance set at %v, only %v × the %v the load induces, may not reseat: the load can creep or run away; set it at least 1.3 ×",
			cb.Setting, ratio, n.Load))
	}
	if n.Rating > 0 && cb.Setting > n.Rating {
		cb.Findings = append(cb.Findings, components.NewFinding(components.Warning, components.Overpressure, "valve.counterbalance-above-rating",
			ruleISO4413(), "the counterbalance setting of %v is above the actuator's %v rating: the trapped side can burst before the valve relieves",
			cb.Setting, n.Rating))
	}
	return cb, nil
}

// counterbalanceRatio is the setting over the load: the caller's Ratio,
// the default, or a given Setting over Load.
func counterbalanceRatio(fn string, n CounterbalanceNeed) (float64, components.Rule, error) {
	if n.Setting == 0 {
		return marginOf(fn, "Ratio", n.Ratio, 1, 10, DefaultCounterbalanceRatio,
			components.PracticeRule("counterbalance set at least 1.3 × the load-induced pressure"))
	}
	if n.Ratio != nil {
		return 0, components.Rule{}, validate.Fail(fn, "Setting", n.Setting, "0 when Ratio is given: one way to set the valve")
	}
	if err := validate.Above(fn, "Setting", n.Setting, n.Load); err != nil {
		return 0, components.Rule{}, err
	}
	return float64(n.Setting / n.Load), components.CallerRule("Setting"), nil
}

// PilotCheckNeed describes a pilot-operated check valve holding a load.
type PilotCheckNeed struct {
	Load units.Pressure // pressure trapped on the load side (> 0)
	Back units.Pressure // pressure on the outlet side as it opens (≥ 0)
	// Ratio is the valve's area ratio: pilot piston area over poppet seat
	// area (> 0).
	Ratio    float64
	Cracking units.Pressure // the check spring's cracking pressure (≥ 0)
	// ExternalDrain marks a valve whose pilot piston's back side drains
	// to tank by its own port; otherwise it sees the outlet pressure.
	ExternalDrain bool
	// Coupling is how the pilot pressure itself raises the held pressure
	// ([Coupling]): φ for a valve on the annulus port piloted from the cap
	// line, 1/φ for the reverse, 0 to leave it out.
	Coupling float64
}

// PilotCheck is the pilot pressure that opens a pilot-operated check.
type PilotCheck struct {
	// Pilot is the pilot pressure at which the poppet lifts:
	//
	//	externally drained   p_x = (p_load + p_crack − p_back) / (R − c)
	//	internally drained   p_x = (p_load + p_crack + (R − 1)·p_back) / (R − c)
	//
	// the force balance with the pilot piston's back side at tank or at
	// the outlet pressure. It is 0 with Opens false when R ≤ c.
	Pilot     units.Pressure
	Opens     bool // false when the pilot can never open it: the pilot raises the held pressure faster than it lifts the poppet
	PilotRule components.Rule
	Findings  components.Findings
}

// PilotCheckPressure returns the pilot pressure that opens a
// pilot-operated check of area ratio R against a trapped load pressure
// (see [PilotCheck.Pilot]). With c = 0 and no back pressure it is the
// familiar p_load/R: a 4:1 valve holding 3000 psi opens at 750 psi. On the
// annulus port of a 2:1 cylinder piloted from the cap line (c = φ = 2) the
// pilot pressure is intensified into the held side, so a ratio of 2 or
// less never opens it: a Warning (hazard SuspendedLoad) says so. A
// pilot-operated check holds a load but does not control it coming down:
// use a counterbalance valve for an overrunning load ([LoadHolding]).
// Errors match units.ErrRange and name the field.
func PilotCheckPressure(n PilotCheckNeed) (PilotCheck, error) {
	const fn = "valve.PilotCheckPressure"
	if err := validate.Positive(fn, "Load", n.Load); err != nil {
		return PilotCheck{}, err
	}
	if err := validate.NonNegative(fn, "Back", n.Back); err != nil {
		return PilotCheck{}, err
	}
	if err := validate.Positive(fn, "Ratio", n.Ratio); err != nil {
		return PilotCheck{}, err
	}
	if err := validate.NonNegative(fn, "Cracking", n.Cracking); err != nil {
		return PilotCheck{}, err
	}
	if err := validate.NonNegative(fn, "Coupling", n.Coupling); err != nil {
		return PilotCheck{}, err
	}
	pc := PilotCheck{PilotRule: pilotRule()}
	if n.Ratio <= n.Coupling {
		pc.Findings = components.Findings{components.NewFinding(components.Warning, components.SuspendedLoad, "valve.pilot-check-locked",
			pilotRule(), "a pilot ratio of %v cannot open this check: the pilot raises the held pressure by %v of itself, so the load stays locked; choose a ratio well above %v",
			n.Ratio, n.Coupling, n.Coupling)}
		return pc, nil
	}
	num := float64(n.Load + n.Cracking - n.Back)
	if !n.ExternalDrain {
		num = float64(n.Load+n.Cracking) + (n.Ratio-1)*float64(n.Back)
	}
	pc.Pilot, pc.Opens = units.Pressure(max(num, 0)/(n.Ratio-n.Coupling)), true
	if err := validate.Result(fn, "Pilot", pc.Pilot); err != nil {
		return PilotCheck{}, err
	}
	return pc, nil
}
