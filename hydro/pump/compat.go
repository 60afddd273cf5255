package pump

import (
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Demand is one actuator's duty as the pump sees it.
type Demand struct {
	Name     string         // how findings name it: "clamp cylinder"
	Pressure units.Pressure // pressure at the valve's port to the actuator while it moves
	Flow     units.Flow     // flow it takes while it moves
}

// Circuit is what a pump feeds: the directional valves' center, the main
// relief, and the actuators' demands.
type Circuit struct {
	Center valve.Center   // center condition of the directional valves (required)
	Relief units.Pressure // main relief setting (required)
	// CenterDrop is the P→T pressure drop through an open or tandem center
	// at the pump's flow, from the valve's data sheet. Zero means not known:
	// the findings then name the flow but not its heat.
	CenterDrop units.Pressure
	// Unloading says a fixed pump is unloaded to tank at low pressure
	// (vented relief, unloading valve) whenever every valve is centred.
	Unloading bool
	Demands   []Demand // the actuators on this pump
	Together  bool     // the demands move at the same time
	// Series says the valves are piped in series, each valve's center
	// passage feeding the next valve's pump port; it needs an open or
	// tandem center.
	Series bool
}

// heatRule is the rule behind every heat figure here: flow throttled from a
// higher to a lower pressure, or passed over a relief, turns its power
// Δp·Q into heat.
var heatRule = components.PhysicsRule("energy balance: throttled flow turns Δp·Q into heat")

// Compatibility judges the pump and its control against the circuit it
// feeds and returns findings, not a verdict: what happens with every valve
// centred (deadhead over the relief, flow to tank at low pressure, standby
// on the compensator, a regenerative creep) and while the actuators move
// (surplus flow over the relief, or bled through an open center metered
// by its spool; throttling from the compensator or the load-sensing
// pressure, starving of the heavier loads, saturation), each
// quoting the flows and pressures involved and the heat it costs. Heat
// figures are the throttled hydraulic power Δp·Q (plus, where the whole
// shaft power ends as heat, the pump's own losses); line and valve losses
// come on top.
//
// The pump must pass [Pump.Validate]; the circuit needs a valid Center, a
// Relief > 0, a CenterDrop ≥ 0, and for each demand a Pressure ≥ 0 and a
// Flow > 0; Series needs an open or tandem center. Errors match
// units.ErrRange and name the field; demands whose sums or heat overflow
// fail with an error naming the finding's topic.
func (p Pump) Compatibility(c Circuit) (components.Findings, error) {
	const fn = "pump.Pump.Compatibility"
	tr, err := p.checkCircuit(fn, c)
	if err != nil {
		return nil, err
	}
	var fs components.Findings
	fs = append(fs, p.settings(c)...)
	centred, err := p.centred(c, tr)
	if err != nil {
		return nil, err
	}
	fs = append(fs, centred...)
	fs = append(fs, p.stalls(c)...)
	var moving components.Findings
	switch {
	case len(c.Demands) > 1 && c.Together && c.Series:
		moving, err = p.inSeries(c)
	case len(c.Demands) > 1 && c.Together:
		moving, err = p.sharing(c)
	default:
		moving, err = p.oneAtATime(c)
	}
	if err != nil {
		return nil, err
	}
	fs = fs.Merge(moving...)
	if err := quoted(fn, fs); err != nil {
		return nil, err
	}
	return fs, nil
}

// quoted checks that every quantity the findings quote is finite: with
// every input finite, a sum of demands or a heat product can still
// overflow. The error names the finding's topic as the result.
func quoted(fn string, fs components.Findings) error {
	for _, f := range fs {
		for _, a := range f.Args() {
			var err error
			switch v := a.(type) {
			case units.Pressure:
				err = validate.Result(fn, f.Topic, v)
			case units.Flow:
				err = validate.Result(fn, f.Topic, v)
			case units.Power:
				err = validate.Result(fn, f.Topic, v)
			}
			if err != nil {
				return err
			}
		}
	}
	return nil
}

func (p Pump) checkCircuit(fn string, c Circuit) (valve.CenterTraits, error) {
	if err := p.check(fn); err != nil {
		return valve.CenterTraits{}, err
	}
	tr, err := c.Center.Traits()
	if err != nil {
		return valve.CenterTraits{}, &units.RangeError{Func: fn, Param: "Center", Value: c.Center.String(),
			Valid: "closed, open, tandem, float or regenerative"}
	}
	if err := validate.Positive(fn, "Relief", c.Relief); err != nil {
		return tr, err
	}
	if err := validate.NonNegative(fn, "CenterDrop", c.CenterDrop); err != nil {
		return tr, err
	}
	for i, d := range c.Demands {
		at := "Demands[" + strconv.Itoa(i) + "]."
		if err := validate.NonNegative(fn, at+"Pressure", d.Pressure); err != nil {
			return tr, err
		}
		if err := validate.Positive(fn, at+"Flow", d.Flow); err != nil {
			return tr, err
		}
	}
	if c.Series && !tr.Unloads() {
		return tr, &units.RangeError{Func: fn, Param: "Series", Value: "true",
			Valid: "false unless Center is open or tandem (a " + c.Center.String() + " center passes no flow to the next valve)"}
	}
	return tr, nil
}

// limit returns the highest pressure the pump can reach: the relief, or a
// lower cut-off.
func (p Pump) limit(c Circuit) units.Pressure {
	if p.Control != NoControl && p.Cutoff > 0 {
		return min(c.Relief, p.Cutoff)
	}
	return c.Relief
}

// settings checks a cut-off against the relief.
func (p Pump) settings(c Circuit) components.Findings {
	if p.Control == NoControl || p.Cutoff == 0 || p.Cutoff < c.Relief {
		return nil
	}
	return components.Findings{components.NewFinding(components.Caution, components.HotSurface, "pump.cutoff-above-relief",
		components.PracticeRule("compensator or cut-off set below the relief"),
		"the pump's %v setting of %v is not below the relief at %v: the relief, not the pump's control, limits the pressure and passes the flow as heat; set the control below the relief",
		p.Control.String(), p.Cutoff, c.Relief)}
}

// centred returns what happens with every valve in its center.
func (p Pump) centred(c Circuit, tr valve.CenterTraits) (components.Findings, error) {
	var fs components.Findings
	if tr.Pump == valve.Joined {
		fs = append(fs, components.NewFinding(components.Warning, components.Runaway, "pump.regenerative-center",
			components.PhysicsRule("a single-rod cylinder with both ports at one pressure extends"),
			"the regenerative center joins the pump to both cylinder ports: whenever the valve is centred and the pump delivers, a single-rod cylinder creeps out; hold it with a load-holding valve or unload the pump"))
	}
	switch {
	case tr.Unloads():
		f, err := p.throughCenter(c)
		return append(fs, f), err
	case p.Control == NoControl && c.Unloading:
		return fs, nil
	case p.Control == NoControl || p.Control == PowerLimited && p.Cutoff == 0:
		f, err := p.overRelief(c)
		return append(fs, f), err
	}
	st, err := p.Standby()
	if err != nil {
		return nil, err
	}
	return append(fs, components.NewFinding(components.Notice, components.NoHazard, "pump.standby", heatRule,
		"with every valve centred the %v pump strokes back to standby at %v: about %v of heat from its own leakage",
		p.Control.String(), st.Pressure, st.Shaft)), nil
}

// overRelief is a pump with nowhere to go but the relief.
func (p Pump) overRelief(c Circuit) (components.Finding, error) {
	pt, err := p.At(c.Relief)
	if err != nil {
		return components.Finding{}, err
	}
	what := "fixed pump's"
	if p.Control == PowerLimited {
		what = "power-limited pump, which has no pressure cut-off, sends its"
	}
	return components.NewFinding(components.Warning, components.HotSurface, "pump.deadhead", heatRule,
		"with every valve centred the "+what+" %v has nowhere to go but over the relief at %v: all %v of shaft power becomes heat and the oil overheats; use an open or tandem center, an unloading valve, or a pressure-compensated pump",
		pt.Flow, c.Relief, pt.Shaft), nil
}

// throughCenter is a pump whose flow passes to tank through the center.
func (p Pump) throughCenter(c Circuit) (components.Finding, error) {
	drop := c.CenterDrop
	if p.Control == LoadSensing {
		drop = max(drop, p.Margin) // no load signal: the pump holds its margin over nothing
	}
	pt, err := p.At(min(drop, p.limit(c)))
	if err != nil {
		return components.Finding{}, err
	}
	switch {
	case p.Control == LoadSensing:
		return components.NewFinding(components.Caution, components.HotSurface, "pump.open-center-load-sensing", heatRule,
			"a load-sensing pump needs closed-center load-sensing valves: through this %v center it senses no load and passes up to %v to tank at %v or more, about %v of heat",
			c.Center.String(), pt.Flow, pt.Pressure, pt.Shaft), nil
	case p.Control == PressureCompensated:
		st, err := p.Standby()
		if err != nil {
			return components.Finding{}, err
		}
		if c.CenterDrop == 0 {
			return components.NewFinding(components.Caution, components.NoHazard, "pump.open-center-compensated", heatRule,
				"the %v center keeps the pressure-compensated pump at full stroke: its %v passes to tank and the compensator never acts (give the center's P→T pressure drop to quote the heat); a closed-center valve would let it stroke back to about %v",
				c.Center.String(), pt.Flow, st.Shaft), nil
		}
		return components.NewFinding(components.Caution, components.NoHazard, "pump.open-center-compensated", heatRule,
			"the %v center keeps the pressure-compensated pump at full stroke: its %v passes to tank at %v, about %v of heat, and the compensator never acts; a closed-center valve would let it stroke back to about %v",
			c.Center.String(), pt.Flow, pt.Pressure, pt.Shaft, st.Shaft), nil
	case c.CenterDrop == 0:
		return components.NewFinding(components.Notice, components.NoHazard, "pump.through-center", heatRule,
			"with every valve centred the pump's %v passes to tank through the %v center; give the center's P→T pressure drop to quote its heat",
			pt.Flow, c.Center.String()), nil
	}
	return components.NewFinding(components.Notice, components.NoHazard, "pump.through-center", heatRule,
		"with every valve centred the pump's %v passes to tank through the %v center at %v: about %v of heat",
		pt.Flow, c.Center.String(), pt.Pressure, pt.Shaft), nil
}

// stalls names the demands the pump cannot reach.
func (p Pump) stalls(c Circuit) components.Findings {
	var fs components.Findings
	lim := p.limit(c)
	for _, d := range c.Demands {
		if d.Pressure >= lim {
			fs = append(fs, components.NewFinding(components.Caution, components.NoHazard, "pump.stall",
				components.PhysicsRule("an actuator moves only below the supply pressure"),
				"%v needs %v, at or above the %v the pump can reach: it stalls", d.Name, d.Pressure, lim))
		}
	}
	return fs
}

// oneAtATime judges each demand alone on the pump.
func (p Pump) oneAtATime(c Circuit) (components.Findings, error) {
	var fs components.Findings
	for _, d := range c.Demands {
		if d.Pressure >= p.limit(c) {
			continue // stalls: said already
		}
		f, ok, err := p.alone(c, d)
		if err != nil {
			return nil, err
		}
		if ok {
			fs = append(fs, f)
		}
	}
	return fs, nil
}

// alone is one demand moving by itself.
func (p Pump) alone(c Circuit, d Demand) (components.Finding, bool, error) {
	if p.Control == NoControl || p.Control == PowerLimited && p.Cutoff == 0 {
		return p.surplus(c, d)
	}
	supply := p.limit(c)
	if p.Control == LoadSensing {
		supply = min(d.Pressure+p.Margin, supply)
	}
	if most := p.capacity(supply); d.Flow > most {
		return components.NewFinding(components.Notice, components.NoHazard, "pump.short",
			components.PhysicsRule("flow continuity"),
			"%v asks %v, more than the %v the pump gives at %v: it moves slower", d.Name, d.Flow, most, supply), true, nil
	}
	heat := (supply - d.Pressure).TimesFlow(d.Flow)
	return components.NewFinding(components.Notice, components.NoHazard, "pump.metering", heatRule,
		"while %v moves, its valve throttles the pump's %v down to the load's %v: %v of heat at %v",
		d.Name, supply, d.Pressure, heat, d.Flow), true, nil
}

// surplus is a full-stroke pump feeding one demand: what the demand does
// not take passes the relief, so the pump runs at the relief pressure and
// the demand's valve throttles from there; or, through an open center
// metered by its spool (bleedsOff), it bleeds to tank at the load's
// pressure.
func (p Pump) surplus(c Circuit, d Demand) (components.Finding, bool, error) {
	if bleedsOff(c) {
		return p.bleed(d)
	}
	pt, err := p.At(c.Relief)
	if err != nil {
		return components.Finding{}, false, err
	}
	if d.Flow >= pt.Flow {
		f, ok := short(d, pt)
		return f, ok, nil
	}
	heat := c.Relief.TimesFlow(pt.Flow) - d.Pressure.TimesFlow(d.Flow)
	return components.NewFinding(components.Caution, components.HotSurface, "pump.surplus", heatRule,
		"while %v moves at %v it takes %v of the pump's %v: the other %v passes the relief at %v, and with the valve throttling the rest that is %v of heat",
		d.Name, d.Pressure, d.Flow, pt.Flow, pt.Flow-d.Flow, c.Relief, heat), true, nil
}

// short is a demand that takes the whole pump flow: a notice when it asks
// more, nothing when it takes exactly all of it.
func short(d Demand, pt Point) (components.Finding, bool) {
	if d.Flow == pt.Flow {
		return components.Finding{}, false
	}
	return components.NewFinding(components.Notice, components.NoHazard, "pump.short",
		components.PhysicsRule("flow continuity"),
		"%v asks %v, more than the pump's %v: it moves slower", d.Name, d.Flow, pt.Flow), true
}

// bleedsOff reports a circuit whose valves meter a fixed pump by bleeding
// its surplus through an open center: the spool of an open-center valve,
// the mobile kind, is moved part way, and the center passage it leaves
// open takes what the actuator does not, at about the load's pressure
// (common practice). A tandem or closed center shifts fully, and the
// surplus passes the relief.
func bleedsOff(c Circuit) bool { return c.Center == valve.OpenCenter }

// bleed is one demand metered by bleed-off: the pump runs at the load's
// pressure and the surplus passes to tank at it.
func (p Pump) bleed(d Demand) (components.Finding, bool, error) {
	pt, err := p.At(d.Pressure)
	if err != nil {
		return components.Finding{}, false, err
	}
	if d.Flow >= pt.Flow {
		f, ok := short(d, pt)
		return f, ok, nil
	}
	heat := d.Pressure.TimesFlow(pt.Flow - d.Flow)
	return components.NewFinding(components.Caution, components.HotSurface, "pump.bleed-off", heatRule,
		"while %v moves at %v it takes %v of the pump's %v: the other %v bleeds to tank through the open center at about that pressure, %v of heat",
		d.Name, d.Pressure, d.Flow, pt.Flow, pt.Flow-d.Flow, heat), true, nil
}

// inSeries is valves in series moving together: the loads add up. Stalled,
// the whole shaft power becomes heat (over the relief for a fixed pump, in
// the pump's own losses for one held at its cut-off); moving, the pump's
// own loss at the summed pressure is quoted, the valves' drops coming on
// top.
func (p Pump) inSeries(c Circuit) (components.Findings, error) {
	var sum units.Pressure
	for _, d := range c.Demands {
		sum += d.Pressure
	}
	rule := components.PhysicsRule("pressures add along a series path")
	if lim := p.limit(c); sum >= lim {
		pt, err := p.At(lim)
		if err != nil {
			return nil, err
		}
		return components.Findings{components.NewFinding(components.Caution, components.HotSurface, "pump.series-stall", rule,
			"moving together through valves in series the loads add up to %v, at or above the %v the pump can reach: the last in line stalls and the pump's %v of shaft power all becomes heat",
			sum, lim, pt.Shaft)}, nil
	}
	pt, err := p.At(sum)
	if err != nil {
		return nil, err
	}
	return components.Findings{components.NewFinding(components.Notice, components.NoHazard, "pump.series", rule,
		"moving together through valves in series the pump works at the sum of the loads, %v, and each actuator passes the same flow; the pump itself turns %v into heat there, the valves' drops come on top",
		sum, pt.Loss())}, nil
}

// sharing is several demands moving together on valves in parallel. When
// they ask more than the pump gives, the heat is taken on the flow it does
// give, shared in proportion to the asks (as flow-sharing valves split
// it), so the heat never exceeds the pump's hydraulic output.
func (p Pump) sharing(c Circuit) (components.Findings, error) {
	lo, hi := c.Demands[0], c.Demands[0]
	var want units.Flow
	for _, d := range c.Demands {
		want += d.Flow
		if d.Pressure < lo.Pressure {
			lo = d
		}
		if d.Pressure > hi.Pressure {
			hi = d
		}
	}
	supply := p.limit(c)
	fixed := p.Control == NoControl || p.Control == PowerLimited && p.Cutoff == 0
	switch {
	case fixed:
		supply = hi.Pressure
	case p.Control == LoadSensing:
		supply = min(hi.Pressure+p.Margin, supply)
	}
	most := p.capacity(supply)
	var fs components.Findings
	if fixed && lo.Pressure < hi.Pressure {
		fs = append(fs, components.NewFinding(components.Caution, components.NoHazard, "pump.parallel-starve",
			components.PhysicsRule("flow takes the path of least pressure"),
			"moving together on valves in parallel the flow takes the easiest path: %v at %v moves first and %v at %v is starved until the first stalls or reaches its end, unless the valves are throttled to share",
			lo.Name, lo.Pressure, hi.Name, hi.Pressure))
	}
	if want > most {
		fs = append(fs, components.NewFinding(components.Caution, components.NoHazard, "pump.saturated",
			components.PhysicsRule("flow continuity"),
			"together the actuators ask %v, more than the %v the pump gives at %v: they slow down, and without flow-sharing valves %v, the highest load, slows or stops first",
			want, most, supply, hi.Name))
	}
	if fixed && want < most && !bleedsOff(c) {
		supply = c.Relief // the surplus lifts the pump to the relief
	}
	share := 1.0 // the fraction of its ask each actuator gets
	if want > most {
		share = float64(most / want) // saturated: the pump's flow, shared in proportion to the asks
	}
	var heat units.Power
	for _, d := range c.Demands {
		heat += (supply - d.Pressure).TimesFlow(units.Flow(share * float64(d.Flow)))
	}
	if fixed && want < most {
		heat += supply.TimesFlow(most - want) // over the relief, or bled through an open center at the highest load
	}
	fs = append(fs, components.NewFinding(components.Notice, components.NoHazard, "pump.sharing-heat", heatRule,
		"sharing one pump, the valves throttle every actuator down from the %v supply to its own load: %v of heat while they move together",
		supply, heat))
	return fs, nil
}
