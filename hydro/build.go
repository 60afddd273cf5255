package hydro

import (
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/drive"
	"github.com/hydrosize/hydrosize/hydro/line"
	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

// Rules of the figures the sizer works out itself.
var (
	forceRule    = components.PhysicsRule("F = F_process + m·g·sin θ + μ·m·g·cos θ + m·a (hydro/actuator)")
	portRule     = components.PhysicsRule("inlet pressure for the force with seal friction and back pressure (hydro/actuator)")
	flowRule     = components.PhysicsRule("Q = v·A, or D·n/η_v for a motor (hydro/actuator)")
	dropRule     = components.PhysicsRule("Darcy–Weisbach, K factors and data-sheet points at the running viscosity (hydro/line)")
	sumRule      = components.PhysicsRule("sum over the phase's moves")
	reliefRule   = components.PracticeRule("relief set above the highest working pressure")
	speedRule    = components.PhysicsRule("distance over time, or the spec's speed")
	pressureRule = components.PhysicsRule("load pressure plus the supply path's drops")
)

// report gathers the last pass into the report.
func (z *sizer) report(res *result) (Report, error) {
	s := z.spec
	r := Report{Name: s.Name, Units: "metric", Basis: z.basis, Solve: res.solve, Notes: s.Notes}
	if s.Units == "us" {
		r.Units = "us"
	}
	fs := make(components.Findings, len(z.notes), len(z.notes)+64) // gathered, then merged once: Merge copies
	copy(fs, z.notes)
	if len(z.acts) > 0 {
		r.Actuators = make([]ActuatorResult, 0, len(z.acts))
	}
	for _, a := range z.acts {
		ar, f := z.actuatorResult(a)
		r.Actuators = append(r.Actuators, ar)
		fs = append(fs, f...)
	}
	fs = append(fs, res.sizing.Findings...)
	r.Lines = z.lineResults(res.lines)
	valves, f, err := z.valveResult(res)
	if err != nil {
		return Report{}, err
	}
	r.Valves = valves
	fs = append(fs, f...)
	for _, l := range z.allLines(res.lines) {
		fs = append(fs, l.findings...)
	}
	if !res.pumped {
		r.Pump = z.pumpResult(res)
		r.Findings = components.Findings(nil).Merge(fs...).Sorted()
		return r, nil
	}
	if len(res.heats) > 0 {
		r.Phases = make([]PhaseResult, 0, len(res.heats))
	}
	for _, h := range res.heats { // the phases, the dwells after moves, the idle time
		ph := h.ph
		if ph == nil {
			ph = &phase{name: h.name}
		}
		r.Phases = append(r.Phases, z.phaseResult(ph, h))
	}
	if r.Pump, f, err = z.pumpDetails(res); err != nil {
		return Report{}, err
	}
	fs = append(fs, f...)
	if r.Drive, f, err = z.driveResult(res); err != nil {
		return Report{}, err
	}
	fs = append(fs, f...)
	if r.Accumulator, f, err = z.accumulatorResult(); err != nil {
		return Report{}, &FieldError{Path: "circuit.accumulator", Err: err}
	}
	fs = append(fs, f...)
	r.Heat, f = z.heatResult(res.bal)
	fs = append(fs, f...)
	var nuRun, nuCold units.KinematicViscosity
	if r.Fluid, nuRun, nuCold, f, err = z.fluidResult(); err != nil {
		return Report{}, err
	}
	fs = append(fs, f...)
	if r.Cleanliness, f, err = z.cleanliness(res.lines, res.heats, nuRun, nuCold); err != nil {
		return Report{}, err
	}
	fs = append(fs, f...)
	r.Bill = z.bill(&r)
	r.Findings = components.Findings(nil).Merge(fs...).Sorted()
	return r, nil
}

func (z *sizer) actuatorResult(a *act) (ActuatorResult, components.Findings) {
	r := ActuatorResult{Name: a.spec.Name, Kind: a.spec.Kind, Governing: a.governing}
	var fs, sized components.Findings
	if a.cylinder() {
		r.Bore, r.Rod, r.Stroke = a.fit.size.Bore, a.fit.size.Rod, a.spec.Stroke
		sized = about(a.fit.findings(), a.spec.Name)
		fs = sized
		if a.ok {
			phi, _ := a.cyl.AreaRatio()
			r.AreaRatio = Value[float64]{phi, components.PhysicsRule("φ = A_cap/A_annulus of the chosen bore and rod")}
		}
		if b := a.fit.size.Buckling; b != nil {
			r.Buckling = &Buckling{
				FreeLength: Value[units.Length]{b.FreeLength, b.KRule}, Critical: Value[units.Force]{b.Critical, b.ERule},
				Thrust: Value[units.Force]{b.Thrust, reliefRule}, Safety: b.Safety, Method: b.Method.String(),
			}
		}
	} else {
		r.Displacement = a.msize.Displacement
		sized = about(a.msize.Findings, a.spec.Name)
		fs = sized
	}
	fs = fs.Merge(z.holdingFindings(a, sized)...)
	if h, f, err := z.holdingResult(a); err == nil {
		r.Holding = h
		fs = fs.Merge(f...)
	}
	for _, m := range a.moves {
		r.Moves = append(r.Moves, moveResult(a, m))
	}
	return r, fs
}

// about puts the findings of a family that sizes one part at a time,
// whose sentences do not name the part, about the part they are for
// (components.Finding.About).
func about(fs components.Findings, name string) components.Findings {
	out := make(components.Findings, len(fs))
	for i, f := range fs {
		out[i] = f.About(name)
	}
	return out
}

func moveResult(a *act, m *mv) MoveResult {
	r := MoveResult{Phase: m.phase.name, Direction: m.spec.Direction, Regenerative: m.spec.Regenerative, Time: m.time,
		Pressure: Value[units.Pressure]{m.port, portRule}, Back: Value[units.Pressure]{m.back, dropRule},
		Flow: Value[units.Flow]{m.flow, flowRule}, ReturnFlow: Value[units.Flow]{m.ret, flowRule}}
	if m.hold() {
		r.Time = m.phase.spec.Dwell
		if a.cylinder() {
			r.Direction = "hold (" + m.dir.String() + ")"
		}
	}
	if a.cylinder() {
		r.Force = Value[units.Force]{m.forces.Total(), forceRule}
		r.Speed = Value[units.Velocity]{m.speed, speedRule}
	} else {
		r.Torque = Value[units.Torque]{m.spec.Torque, components.CallerRule("cycle.phases[].moves[].torque")}
		r.ShaftSpeed = Value[units.RotationalSpeed]{m.shaft, speedRule}
	}
	return r
}

// holdingFindings are the family's cautions for each move (its findings
// about a hazard), and the load-holding caution the spec's flags call for
// where the families gave none, in the moves or in sized, the findings of
// the actuator's sizing (a load the cylinder family does not see as
// suspended, a motor).
func (z *sizer) holdingFindings(a *act, sized components.Findings) components.Findings {
	var fs components.Findings
	hazard := func(f components.Finding) bool { return f.Hazard != components.NoHazard }
	for _, m := range a.moves {
		fs = fs.Merge(about(m.fit.findings().Filter(hazard), a.spec.Name)...)
	}
	held := func(f components.Finding) bool {
		return f.Hazard == components.SuspendedLoad || f.Hazard == components.OverrunningLoad
	}
	if (a.spec.Suspended || a.spec.Overrunning) && len(fs.Filter(held))+len(sized.Filter(held)) == 0 {
		fs = fs.Merge(components.NewFinding(components.Warning, components.SuspendedLoad, "hydro.load-holding",
			components.StandardRule("ISO 4413:2010, load holding"),
			"%v carries a load that can fall or run away: hold it with a load-holding valve at the actuator port, or a brake on a motor, and keep people clear of it.",
			a.spec.Name))
	}
	return fs
}

func (z *sizer) phaseResult(ph *phase, h phaseHeat) PhaseResult {
	op := h.op
	var heat units.Power
	for _, l := range h.loads {
		heat += l.Power
	}
	r := PhaseResult{Name: h.name, Time: h.time, Mode: op.mode,
		Demand:   Value[units.Flow]{ph.demand, sumRule},
		Load:     Value[units.Pressure]{ph.load, pressureRule},
		Pump:     Value[units.Pressure]{op.point.Pressure, opRule},
		Delivery: Value[units.Flow]{op.point.Flow, opRule},
		Relief:   Value[units.Flow]{op.relief, opRule},
		Shaft:    Value[units.Power]{op.point.Shaft, opRule},
		Heat:     Value[units.Power]{heat, components.PhysicsRule("sum of the phase's heat loads (hydro/thermal)")},
	}
	var gov *mv
	for _, m := range ph.moves {
		if gov == nil || m.port+m.supplyDrop > gov.port+gov.supplyDrop {
			gov = m
		}
	}
	if gov != nil {
		l := &gov.act.labels
		r.Budget = make([]BudgetItem, 0, 5)
		r.Budget = append(r.Budget, BudgetItem{Path: "load", Name: l.port, Drop: Value[units.Pressure]{gov.port, portRule}})
		if gov.capFlow > 0 {
			r.Budget = append(r.Budget,
				BudgetItem{Path: "supply", Name: l.supply, Drop: Value[units.Pressure]{gov.supplyDrop, dropRule}},
				BudgetItem{Path: "supply", Name: "pressure line", Drop: Value[units.Pressure]{ph.lineDrop, dropRule}})
		}
		if gov.ret > 0 {
			r.Budget = append(r.Budget,
				BudgetItem{Path: "return", Name: l.back, Drop: Value[units.Pressure]{gov.returnDrop, dropRule}},
				BudgetItem{Path: "return", Name: "return line and filter", Drop: Value[units.Pressure]{ph.retDrop, dropRule}})
		}
	}
	return r
}

func (z *sizer) pumpResult(res *result) PumpResult {
	s := res.sizing
	ctl := "fixed"
	if z.kind.variable {
		ctl = z.kind.control.String()
	}
	kind := z.spec.Circuit.Pump
	if kind == "" {
		kind = "gear"
	}
	return PumpResult{Kind: kind, Control: ctl,
		Flow:          Value[units.Flow]{s.Flow, components.PhysicsRule("the highest flow the cycle takes at once")},
		Pressure:      Value[units.Pressure]{s.Pressure, pressureRule},
		Margin:        Value[float64]{s.Margin, s.MarginRule},
		RatedFlow:     Value[units.Flow]{s.RatedFlow, s.MarginRule},
		RatedPressure: Value[units.Pressure]{s.RatedPressure, s.MarginRule},
		Displacement:  s.Displacement,
		Delivered:     Value[units.Flow]{s.Delivered, components.PhysicsRule("Q = D·n·η_v (hydro/pump)")},
		Cutoff:        Value[units.Pressure]{res.model.Cutoff, components.OurRule("compensator halfway between the highest working pressure and the relief")},
	}
}

// pumpDetails adds the pump's fit with the circuit (pump.Pump.Compatibility)
// and its inlet at a cold start (pump.CheckInlet) to the pump's result.
func (z *sizer) pumpDetails(res *result) (PumpResult, components.Findings, error) {
	r := z.pumpResult(res)
	cd, err := z.drop(z.centerEls, z.delivery)
	if err != nil {
		return r, nil, err
	}
	c := pump.Circuit{Center: z.center(), Relief: z.reliefP, CenterDrop: cd}
	for _, a := range z.acts {
		var d pump.Demand
		for _, m := range a.moves {
			if m.flow > 0 && m.port+m.supplyDrop >= d.Pressure {
				d = pump.Demand{Name: a.spec.Name, Pressure: m.port + m.supplyDrop, Flow: m.flow}
			}
		}
		if d.Flow > 0 {
			c.Demands = append(c.Demands, d)
		}
	}
	for _, ph := range z.phases {
		moving := 0
		for _, m := range ph.moves {
			if m.flow > 0 {
				moving++
			}
		}
		c.Together = c.Together || moving > 1
	}
	fs, err := res.model.Compatibility(c)
	if err != nil {
		return r, nil, &FieldError{Path: "circuit", Err: err}
	}
	inlet, f, err := z.inlet(res)
	if err != nil {
		return r, nil, err
	}
	r.Inlet = inlet.Check
	from := r.Inlet.Rule
	r.Inlet.Rule = pumpFigures // the family's minimum is the sizer's figure by pump type
	return r, fs.Merge(f...).Merge(ours(inlet.Findings, from, pumpFigures)...), nil
}

// inlet checks the pump inlet at a cold start: the suction line's drop at
// the coldest ambient (line.ColdStart) taken into pump.CheckInlet.
func (z *sizer) inlet(res *result) (pump.InletResult, components.Findings, error) {
	amb, err := z.ambient()
	if err != nil {
		return pump.InletResult{}, nil, &FieldError{Path: "site.altitude", Err: err}
	}
	cold := z.spec.Site.AmbientMin
	rho, err := z.fl.Density(cold, 0)
	if err != nil {
		return pump.InletResult{}, nil, &FieldError{Path: "site.ambient_min", Err: err}
	}
	var fs components.Findings
	loss := units.Pressure(0)
	if els := res.lines.suction.els; len(els) > 0 {
		st, err := line.ColdStart(line.Path{Name: "suction", Elements: els}, z.delivery, z.fl, cold, z.tOil)
		if err != nil {
			fs = fs.Merge(components.NewFinding(components.Caution, components.ColdStart, "hydro.cold-suction",
				components.OurRule("suction line checked at the coldest ambient"),
				"The suction line could not be checked at %v: the oil does not flow as its curve says there (%v).", cold, err.Error()))
		} else {
			loss, fs = st.Cold.Total, fs.Merge(st.Findings...)
		}
	}
	in, err := pump.CheckInlet(pump.Inlet{Ambient: amb, Head: suctionHead, Density: rho, Loss: loss, Minimum: z.kind.minInlet})
	if err != nil {
		return pump.InletResult{}, nil, &FieldError{Path: "circuit.suction", Err: err}
	}
	return in, fs, nil
}

// driveResult picks the electric motor for the duty (drive.SelectMotor), or
// reports the engine's load.
func (z *sizer) driveResult(res *result) (DriveResult, components.Findings, error) {
	duty, err := z.driveDuty(res.heats)
	if err != nil {
		return DriveResult{}, nil, &FieldError{Path: "cycle", Err: err}
	}
	r := DriveResult{Kind: "electric", Speed: z.basis.PumpSpeed,
		Peak:    Value[units.Power]{duty.Peak, components.PhysicsRule("the highest phase's shaft power (hydro/drive)")},
		RMS:     Value[units.Power]{duty.RMS, duty.RMSRule},
		Average: Value[units.Power]{duty.Average, components.PhysicsRule("time-weighted mean (hydro/drive)")},
	}
	fs := duty.Findings
	if z.spec.Supply.EngineSpeed != 0 {
		r.Kind = "engine"
		fs = fs.Merge(components.NewFinding(components.Notice, components.NoHazard, "hydro.engine-curve",
			components.OurRule("an engine is checked against its power curve"),
			"The engine must give %v at %v at the pump shaft, plus its other loads: check its power curve (drive.Engine.Load).",
			duty.Peak, z.speed))
		return r, fs, nil
	}
	m, err := drive.SelectMotor(drive.MotorNeed{Duty: duty, Speed: z.speed, Breakdown: breakdownTorque, Ratings: z.motors})
	if err != nil {
		return r, nil, &FieldError{Path: "supply", Err: err}
	}
	r.Rating, r.Thermal, r.Torque = m.Rating, m.Thermal, m.Torque
	from := r.Torque.Rule
	r.Torque.Rule = breakdownRule // the family's Breakdown is the sizer's figure
	fs = fs.Merge(ours(m.Findings, from, breakdownRule)...)
	if z.spec.Site.Altitude > 1000*units.Metre {
		fs = fs.Merge(components.NewFinding(components.Notice, components.NoHazard, "hydro.altitude",
			components.StandardRule("IEC 60034-1, site altitude"),
			"The site is at %v, above the 1000 m for which motors are rated: ask the maker for the derating.", z.spec.Site.Altitude))
	}
	return r, fs, nil
}

// valveResult sets the main relief with the ratings of what it protects
// (valve.ReliefSetting), checks that a relief reaches every rated part
// (valve.Protection), and lists each actuator's directional valve.
func (z *sizer) valveResult(res *result) (ValveResult, components.Findings, error) {
	ml := res.lines
	work := func(l *lineRun) units.Pressure {
		if l.rating.Limit > 0 && l.inner > 0 {
			return l.rating.Limit
		}
		return 0
	}
	ratings := []units.Pressure{res.sizing.RatedPressure, work(ml.pressure)}
	for _, a := range z.acts {
		ratings = append(ratings, work(a.lineA), work(a.lineB))
	}
	relief, err := z.setRelief(ratings...)
	if err != nil {
		return ValveResult{}, nil, &FieldError{Path: "design.relief_margin", Err: err}
	}
	rule := relief.MarginRule
	if z.spec.Design.ReliefMargin != nil {
		rule = components.CallerRule("design.relief_margin")
	}
	r := ValveResult{Relief: Value[units.Pressure]{relief.Setting, rule}, Center: z.center().String()}
	parts := []valve.Part{}
	part := func(name string, rating, relief units.Pressure) {
		if rating > 0 {
			parts = append(parts, valve.Part{Name: name, Rating: rating, Relief: relief})
		}
	}
	part("pump", res.sizing.RatedPressure, relief.FullFlow)
	part(ml.pressure.name, work(ml.pressure), relief.FullFlow)
	traits, _ := z.centerTraits()
	for _, a := range z.acts {
		v := DirectionalValve{Actuator: a.spec.Name}
		var q units.Flow
		for _, m := range a.moves {
			q = max(q, m.flow, m.capFlow, m.ret)
		}
		v.Flow = Value[units.Flow]{q, components.PhysicsRule("the highest flow through it")}
		if a.valve >= 0 {
			v.Size, v.Listed = valveSizes[a.valve].name, Value[units.Flow]{valveSizes[a.valve].flow, valveFigures}
		}
		r.Directional = append(r.Directional, v)
		// A center that blocks the actuator ports traps the work lines:
		// only a counterbalance valve's relief function reaches them.
		reach := relief.FullFlow
		if traits.Holds() {
			reach = 0
			if a.holder != nil {
				reach = a.holder.cb.Setting
			}
		}
		part(a.lineA.name, work(a.lineA), reach)
		part(a.lineB.name, work(a.lineB), reach)
	}
	fs := relief.Findings
	if len(parts) > 0 {
		f, err := valve.Protection(parts)
		if err != nil {
			return ValveResult{}, nil, &FieldError{Path: "circuit", Err: err}
		}
		fs = fs.Merge(f...)
	}
	return r, fs, nil
}

// allLines lists every line: the main lines, then each actuator's.
func (z *sizer) allLines(ml mainLines) []*lineRun {
	out := []*lineRun{ml.suction, ml.pressure, ml.ret}
	for _, a := range z.acts {
		out = append(out, a.lineA, a.lineB)
	}
	return out
}

func (z *sizer) lineResults(ml mainLines) []LineResult {
	var out []LineResult
	for _, l := range z.allLines(ml) {
		if l.flow <= 0 {
			continue
		}
		drop, err := z.drop(l.els, l.flow)
		if err != nil {
			drop = 0
		}
		out = append(out, LineResult{Name: l.name, Service: l.service, Size: l.size, Bore: l.bore,
			Flow: Value[units.Flow]{l.flow, components.PhysicsRule("the highest flow through it")}, Velocity: l.velocity,
			Length: l.length, Drop: Value[units.Pressure]{drop, dropRule}, Rating: l.rating})
	}
	return out
}

func (z *sizer) heatResult(b balance) (HeatResult, components.Findings) {
	top := z.basis.MaxOilTemperature.Value
	amb := z.spec.Site.AmbientMax
	r := HeatResult{
		Load:        Value[units.Power]{b.load.Mean, components.PhysicsRule("itemised heat, time-weighted over the cycle (hydro/thermal)")},
		Input:       Value[units.Power]{b.load.Input, components.PhysicsRule("pump shaft input and the power of loads lowered, time-weighted (hydro/thermal)")},
		Reservoir:   b.reservoir.Volume,
		Area:        Value[units.Area]{b.area, components.OurRule("tank twice as long as wide and deep, 80 % full: its wetted area")},
		Dissipation: Value[units.Power]{b.ua.Times(top.Sub(amb)), components.PracticeRule("still air on the tank walls, 10 W/(m²·K)")},
		Steady:      Value[units.Temperature]{b.steady, heatRule},
		Running:     Value[units.Temperature]{b.running, heatRule},
		Check:       components.Within(b.steady, top, z.basis.MaxOilTemperature.Rule),
	}
	for _, s := range b.load.Sources {
		r.Items = append(r.Items, HeatItem{Source: s.Source.String(), Heat: Value[units.Power]{s.Mean, components.PhysicsRule("hydro/thermal")}})
	}
	fs := b.load.Findings
	if b.cooler != nil {
		r.Cooler = Value[units.Power]{b.cooler.Duty, heatRule}
		r.CoolerRate = Value[float64]{b.cooler.Specific.WattsPerKelvin(), heatRule}
		fs = fs.Merge(b.cooler.Findings...)
	}
	return r, fs
}

// fluidResult checks the grade at the site's extremes: the viscosity at the
// coldest start against the pump's maximum and at the running temperature
// against its minimum, and the grades that suit (fluid.SelectGrades).
func (z *sizer) fluidResult() (FluidResult, units.KinematicViscosity, units.KinematicViscosity, components.Findings, error) {
	r := FluidResult{Name: z.fl.Name(), ColdStart: Value[units.Temperature]{z.spec.Site.AmbientMin, components.CallerRule("site.ambient_min")}}
	if g, err := z.fl.Grade(); err == nil {
		r.Grade = g.String()
	}
	vi, err := z.fl.VI()
	if err == nil {
		r.VI = Value[float64]{fluid.RoundVI(vi), components.StandardRule("ASTM D2270")}
	}
	site := fluid.Site{MinStart: z.spec.Site.AmbientMin, MaxRunning: z.tOil}
	fs := site.Findings()
	curve := components.StandardRule("ASTM D341 viscosity–temperature curve")
	nuCold, errCold := z.fl.Viscosity(site.MinStart)
	if errCold != nil {
		fs = fs.Merge(components.NewFinding(components.Warning, components.ColdStart, "hydro.below-pour-point",
			curve, "At the coldest ambient, %v, %v does not flow as its curve says: heat the tank before a start or choose a fluid with a lower pour point.",
			site.MinStart, z.fl.Name()))
		nuCold = 0
	} else {
		r.Cold = components.Within(nuCold, z.win.Max, components.PracticeRule("pump's cold-start maximum viscosity"))
	}
	nuRun, err := z.fl.Viscosity(z.tOil)
	if err != nil {
		return r, 0, 0, nil, &FieldError{Path: "fluid", Err: err}
	}
	r.Hot = components.Reaches(nuRun, z.win.Min, components.PracticeRule("pump's permissible minimum viscosity"))
	if (!r.Hot.OK() || errCold != nil || !r.Cold.OK()) && vi > 0 { // the grades that would suit instead
		if cs, err := fluid.SelectGrades(site, vi, z.win); err == nil {
			for _, c := range cs {
				r.Suits = append(r.Suits, c.Grade.String())
			}
		}
	}
	if !r.Hot.OK() {
		fs = fs.Merge(components.NewFinding(components.Warning, components.HotSurface, "hydro.thin-oil",
			r.Hot.Rule, "At %v the oil thins to %v, below the pump's %v: cool the oil further or choose a heavier grade.",
			z.tOil, nuRun, z.win.Min))
	}
	if errCold == nil && !r.Cold.OK() {
		fs = fs.Merge(components.NewFinding(components.Caution, components.ColdStart, "hydro.thick-oil",
			r.Cold.Rule, "At %v the oil thickens to %v, above the pump's %v: warm the tank before a start or choose a lighter grade or a higher VI.",
			site.MinStart, nuCold, z.win.Max))
	}
	return r, nuRun, nuCold, fs, nil
}

// bill lists the sized components.
func (z *sizer) bill(r *Report) []BillItem {
	var b []BillItem
	add := func(item, what string) { b = append(b, BillItem{Item: item, What: what, Count: 1}) }
	sys := z.sys
	for i, a := range z.acts {
		ar := r.Actuators[i]
		switch {
		case !a.ok:
			add(a.spec.Name, "no standard size meets the duty")
		case a.cylinder():
			add(a.spec.Name, "cylinder "+sys.FormatLength(ar.Bore.Chosen)+" bore × "+sys.FormatLength(ar.Rod.Chosen)+" rod × "+sys.FormatLength(ar.Stroke)+" stroke")
		default:
			add(a.spec.Name, "hydraulic motor "+sys.FormatDisplacement(ar.Displacement.Chosen))
		}
	}
	p := r.Pump
	add("pump", p.Kind+" pump, "+p.Control+", "+sys.FormatDisplacement(p.Displacement.Chosen)+", rated "+sys.FormatPressure(p.RatedPressure.Value))
	if r.Drive.Kind == "electric" && r.Drive.Rating.OK() {
		poles := z.spec.Supply.Poles
		if poles == 0 {
			poles = defaultPoles
		}
		add("motor", "electric motor "+sys.FormatPower(r.Drive.Rating.Chosen)+", "+strconv.Itoa(poles)+"-pole")
	}
	add("relief valve", "set at "+sys.FormatPressure(r.Valves.Relief.Value))
	for _, a := range r.Actuators {
		if h := a.Holding; h != nil {
			add("counterbalance valve", "at the "+a.Name+" port, set at "+sys.FormatPressure(h.Setting.Value)+", pilot "+strconv.FormatFloat(h.Ratio.Value, 'g', 3, 64)+":1")
		}
	}
	for _, v := range r.Valves.Directional {
		if v.Size != "" {
			add("directional valve", v.Size+" for "+v.Actuator+", "+r.Valves.Center+" center")
		}
	}
	for _, l := range r.Lines {
		if l.Size != "" {
			add(l.Name, l.Size+", "+sys.FormatLength(l.Length))
		}
	}
	for _, f := range r.Cleanliness.Filters {
		what := f.Rating
		if f.Size.Value > 0 {
			what += ", element for " + sys.FormatFlow(f.Size.Value)
		}
		add(f.Placement, what)
	}
	if v := r.Heat.Reservoir.Chosen; v > 0 {
		add("reservoir", sys.FormatVolume(v))
	}
	if r.Heat.Cooler.Value > 0 {
		add("oil cooler", sys.FormatPower(r.Heat.Cooler.Value)+" at "+sys.FormatTemperatureDifference(z.basis.MaxOilTemperature.Value.Sub(z.spec.Site.AmbientMax))+" entering difference")
	}
	if acc := r.Accumulator; acc != nil && acc.Volume.OK() {
		add("accumulator", "bladder "+sys.FormatVolume(acc.Volume.Chosen)+", precharge "+sys.FormatAbsolutePressure(acc.Precharge.Value))
	}
	return b
}
