package hydro

import (
	"strconv"
	"strings"
	"time"
	"unicode/utf8"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/thermal"
	"github.com/hydrosize/hydrosize/units"
)

// A rendering is built as a small document — sections of paragraphs,
// key–value lists and tables — that the text and Markdown writers lay out
// each in their own way.

type doc struct {
	title    string
	sections []section
}

type section struct {
	title  string
	blocks []block
}

// block is a paragraph (text), a list of key–value lines (pairs) or a table
// (head and rows), with notes under it.
type block struct {
	text  string
	pairs [][3]string // key, value, rule
	head  []string
	rows  [][]string
	notes []string
	items [][3]string // label, text, rule
}

func (s *section) para(text string) { s.blocks = append(s.blocks, block{text: text}) }

func (s *section) kv(pairs ...[3]string) { s.blocks = append(s.blocks, block{pairs: pairs}) }

func (s *section) list(items ...[3]string) { s.blocks = append(s.blocks, block{items: items}) }

func (s *section) table(head []string, rows [][]string, notes ...string) {
	if len(rows) > 0 {
		s.blocks = append(s.blocks, block{head: head, rows: rows, notes: notes})
	}
}

// system returns the unit system of the report's Units.
func (r Report) system() units.System {
	if r.Units == "us" {
		return units.USCustomary()
	}
	return units.Metric()
}

// Text renders the report as plain text in its own unit system.
func (r Report) Text() string { return r.TextIn(r.system()) }

// Markdown renders the report as Markdown in its own unit system.
func (r Report) Markdown() string { return r.MarkdownIn(r.system()) }

// TextIn renders the report as plain text in unit system sys.
func (r Report) TextIn(sys units.System) string { return writeText(r.doc(sys)) }

// MarkdownIn renders the report as Markdown in unit system sys.
func (r Report) MarkdownIn(sys units.System) string { return writeMarkdown(r.doc(sys)) }

// q formats a quantity in sys.
func q(sys units.System, v any) string {
	switch x := v.(type) {
	case units.Length:
		return sys.FormatLength(x)
	case units.Area:
		return sys.FormatArea(x)
	case units.Volume:
		return sys.FormatVolume(x)
	case units.Force:
		return sys.FormatForce(x)
	case units.Pressure:
		return sys.FormatPressure(x)
	case units.AbsolutePressure:
		return sys.FormatAbsolutePressure(x)
	case units.Flow:
		return sys.FormatFlow(x)
	case units.Velocity:
		return sys.FormatLineVelocity(x) // every other velocity in a report is a line's; piston speeds go through FormatPistonSpeed
	case units.Displacement:
		return sys.FormatDisplacement(x)
	case units.RotationalSpeed:
		return sys.FormatRotationalSpeed(x)
	case units.Torque:
		return sys.FormatTorque(x)
	case units.Power:
		return sys.FormatPower(x)
	case units.Energy:
		return sys.FormatEnergy(x)
	case units.Temperature:
		return sys.FormatTemperature(x)
	case units.TemperatureDifference:
		return sys.FormatTemperatureDifference(x)
	case units.KinematicViscosity:
		return sys.FormatKinematicViscosity(x)
	case float64:
		return strconv.FormatFloat(x, 'g', 4, 64)
	case time.Duration:
		return strconv.FormatFloat(x.Seconds(), 'g', 3, 64) + " s"
	}
	return "?"
}

// pct writes a fraction as a percentage: "25 %".
func pct(f float64) string { return strconv.FormatFloat(f*100, 'g', 3, 64) + " %" }

func rule(r components.Rule) string { return r.String() }

// choice writes a standard-size choice: "160 mm (needs 151.2 mm, +5.8 %)".
func choice[T ~float64](sys units.System, c components.Choice[T]) string {
	if !c.OK() {
		return "none large enough (needs " + q(sys, any(c.Required)) + ")"
	}
	return q(sys, any(c.Chosen)) + " (needs " + q(sys, any(c.Required)) + ", +" + pct(c.Margin()) + ")"
}

// check writes a check: "5.2 m/s ≤ 6 m/s ok" or "… FAILS".
func check[T ~float64](sys units.System, c components.Check[T]) string {
	op, verdict := " ≤ ", "ok"
	if c.Bound == components.AtLeast {
		op = " ≥ "
	}
	if !c.OK() {
		verdict = "FAILS"
	}
	return q(sys, any(c.Value)) + op + q(sys, any(c.Limit)) + " " + verdict
}

// doc lays the report out in the order an engineer reads it.
func (r Report) doc(sys units.System) doc {
	title := r.Name
	if title == "" {
		title = "Hydraulic power unit"
	}
	d := doc{title: title + " — sized at " + q(sys, r.Basis.Pressure.Value)}
	d.sections = append(d.sections, r.basisSection(sys), r.actuatorSection(sys), r.cycleSection(sys),
		r.pumpSection(sys), r.valveSection(sys), r.lineSection(sys))
	if r.Accumulator != nil {
		d.sections = append(d.sections, r.accumulatorSection(sys))
	}
	d.sections = append(d.sections, r.heatSection(sys), r.fluidSection(sys), r.cleanSection(sys),
		r.billSection(), r.findingSection(sys))
	if len(r.Notes) > 0 {
		s := section{title: "Notes"}
		for _, n := range r.Notes {
			s.para(n)
		}
		d.sections = append(d.sections, s)
	}
	s := section{title: "Before you build"}
	s.para("These figures are a first pass from round assumptions that the chosen components' data replace. " +
		"Hydraulic systems store energy and can kill or maim: design and verify to ISO 4413, the makers' ratings, local codes and licensed practice.")
	d.sections = append(d.sections, s)
	return d
}

func vq[T ~float64](sys units.System, name string, v Value[T]) [3]string {
	return [3]string{name, q(sys, any(v.Value)), rule(v.Rule)}
}

func vf(name string, v Value[float64], f func(float64) string) [3]string {
	return [3]string{name, f(v.Value), rule(v.Rule)}
}

func (r Report) basisSection(sys units.System) section {
	b := r.Basis
	s := section{title: "Basis"}
	s.kv(vq(sys, "working pressure", b.Pressure),
		vf("relief margin", b.ReliefMargin, pct),
		vq(sys, "pump speed", b.PumpSpeed),
		vf("pump volumetric efficiency", b.PumpVolumetric, pct),
		vf("pump mechanical efficiency", b.PumpMechanical, pct),
		vq(sys, "suction line velocity", b.SuctionVelocity),
		vq(sys, "pressure line velocity", b.PressureVelocity),
		vq(sys, "return line velocity", b.ReturnVelocity),
		vq(sys, "highest oil temperature", b.MaxOilTemperature),
		[3]string{"reservoir", strconv.FormatFloat(b.ReservoirDwell.Minutes(), 'g', 3, 64) + " min of pump flow", rule(b.ReservoirRule)},
		vq(sys, "rod yield strength", b.RodYield),
		[3]string{"bores from", b.BoreSeries, ""},
		[3]string{"motors from", b.MotorSeries, ""})
	if b.MotorVolumetric.Value > 0 {
		s.kv(vf("hydraulic motor volumetric efficiency", b.MotorVolumetric, pct), vf("hydraulic motor mechanical efficiency", b.MotorMechanical, pct))
	}
	v := r.Solve
	state := "converged"
	if !v.Converged {
		state = "did not converge"
	}
	s.para("The coupled sizing " + state + " in " + strconv.Itoa(v.Iterations) + " passes; in the last, the running oil temperature moved " +
		q(sys, v.Temperature.Value) + " and the highest pump pressure " + q(sys, v.Pressure.Value) + ".")
	return s
}

func (r Report) actuatorSection(sys units.System) section {
	s := section{title: "Actuators"}
	for _, a := range r.Actuators {
		if a.Kind == "cylinder" {
			pairs := [][3]string{
				{a.Name + " bore", choice(sys, a.Bore), rule(a.Bore.Rule)},
				{a.Name + " rod", choice(sys, a.Rod), rule(a.Rod.Rule)},
				{a.Name + " stroke", q(sys, a.Stroke), "caller: actuators[].stroke"},
			}
			if a.AreaRatio.Value > 0 {
				pairs = append(pairs, vf(a.Name+" area ratio", a.AreaRatio, func(f float64) string { return strconv.FormatFloat(f, 'f', 2, 64) }))
			}
			if h := a.Holding; h != nil {
				pairs = append(pairs, [3]string{a.Name + " load holding", h.Valve + " set at " + q(sys, h.Setting.Value) + " for " + q(sys, h.Load.Value) +
					" of load, pilot " + strconv.FormatFloat(h.Ratio.Value, 'g', 3, 64) + ":1 opening at " + q(sys, h.Pilot.Value), rule(h.Setting.Rule)})
			}
			if b := a.Buckling; b != nil {
				pairs = append(pairs, [3]string{a.Name + " buckling", strconv.FormatFloat(b.Safety.Value, 'f', 2, 64) + " × the relief thrust " +
					q(sys, b.Thrust.Value) + ", at least " + strconv.FormatFloat(b.Safety.Limit, 'g', 3, 64) + " (" + b.Method + ", free length " +
					q(sys, b.FreeLength.Value) + ")", rule(b.Safety.Rule)})
			}
			s.kv(pairs...)
		} else {
			s.kv([3]string{a.Name + " displacement", choice(sys, a.Displacement), rule(a.Displacement.Rule)})
		}
		var rows [][]string
		for _, m := range a.Moves {
			dir := m.Direction
			if m.Regenerative {
				dir += ", regenerative"
			}
			load := q(sys, m.Force.Value)
			speed := sys.FormatPistonSpeed(m.Speed.Value)
			if a.Kind == "motor" {
				load, speed = q(sys, m.Torque.Value), q(sys, m.ShaftSpeed.Value)
			}
			rows = append(rows, []string{m.Phase, dir, load, q(sys, m.Pressure.Value), q(sys, m.Back.Value), q(sys, m.Flow.Value),
				q(sys, m.ReturnFlow.Value), speed, q(sys, m.Time)})
		}
		s.table([]string{"phase", "move", "load", "inlet", "outlet", "pump flow", "return", "speed", "time"}, rows,
			"load: "+rule(forceRule), "inlet: "+rule(portRule), "outlet: "+rule(dropRule), "flows: "+rule(flowRule))
		if a.Governing != "" {
			s.para(a.Name + " is sized by its move in \"" + a.Governing + "\".")
		}
	}
	return s
}

func (r Report) cycleSection(sys units.System) section {
	s := section{title: "Duty cycle and pressure budget"}
	var rows [][]string
	for _, p := range r.Phases {
		rows = append(rows, []string{p.Name, q(sys, p.Time), q(sys, p.Demand.Value), q(sys, p.Load.Value), q(sys, p.Pump.Value),
			q(sys, p.Delivery.Value), q(sys, p.Relief.Value), q(sys, p.Shaft.Value), q(sys, p.Heat.Value), p.Mode})
	}
	s.table([]string{"phase", "time", "demand", "load", "pump", "delivery", "relief", "shaft", "heat", "pump runs"}, rows,
		"load: the highest inlet port pressure plus its valve and work line", "pump, delivery, shaft: "+rule(opRule))
	for _, p := range r.Phases {
		var brows [][]string
		total := units.Pressure(0)
		for _, b := range p.Budget {
			brows = append(brows, []string{b.Path, b.Name, q(sys, b.Drop.Value)})
			if b.Path != "return" {
				total += b.Drop.Value
			}
		}
		if len(brows) > 1 {
			brows = append(brows, []string{"", "at the pump, before the control's margin", q(sys, total)})
			s.para("Pressure budget of \"" + p.Name + "\":")
			s.table([]string{"path", "item", "pressure"}, brows)
		}
	}
	return s
}

func (r Report) pumpSection(sys units.System) section {
	p, d := r.Pump, r.Drive
	s := section{title: "Pump and drive"}
	pairs := [][3]string{
		{"pump", p.Kind + ", " + p.Control, ""},
		vq(sys, "peak flow", p.Flow), vq(sys, "highest working pressure", p.Pressure),
		vf("margin", p.Margin, pct), vq(sys, "rated flow", p.RatedFlow), vq(sys, "rated pressure", p.RatedPressure),
		{"displacement", choice(sys, p.Displacement), rule(p.Displacement.Rule)},
		vq(sys, "delivered", p.Delivered),
	}
	if p.Cutoff.Value > 0 {
		pairs = append(pairs, vq(sys, "compensator cut-off", p.Cutoff))
	}
	if p.Inlet.Limit > 0 {
		pairs = append(pairs, [3]string{"inlet at the cold start", check(sys, p.Inlet), rule(p.Inlet.Rule)})
	}
	pairs = append(pairs, [3]string{"drive", d.Kind, ""}, vq(sys, "speed", d.Speed), vq(sys, "peak shaft power", d.Peak),
		vq(sys, "RMS shaft power", d.RMS), vq(sys, "average shaft power", d.Average))
	if d.Rating.Series != "" {
		pairs = append(pairs, [3]string{"motor rating", choice(sys, d.Rating), rule(d.Rating.Rule)},
			[3]string{"motor heating", check(sys, d.Thermal), rule(d.Thermal.Rule)},
			[3]string{"peak torque", check(sys, d.Torque), rule(d.Torque.Rule)})
	}
	s.kv(pairs...)
	return s
}

func (r Report) valveSection(sys units.System) section {
	v := r.Valves
	s := section{title: "Valves"}
	s.kv(vq(sys, "main relief setting", v.Relief), [3]string{"directional valve center", v.Center, "caller: circuit.center"})
	var rows [][]string
	for _, d := range v.Directional {
		size := d.Size
		if size == "" {
			size = "none listed large enough"
		}
		rows = append(rows, []string{d.Actuator, size, q(sys, d.Flow.Value), q(sys, d.Listed.Value)})
	}
	s.table([]string{"actuator", "directional valve", "peak flow", "listed flow"}, rows, "sizes: "+rule(valveFigures))
	return s
}

func (r Report) lineSection(sys units.System) section {
	s := section{title: "Lines"}
	var rows [][]string
	for _, l := range r.Lines {
		size := l.Size
		if size == "" {
			size = "none in the series (needs " + q(sys, l.Bore.Required) + " bore)"
		}
		rating := ""
		if l.Rating.Limit > 0 {
			rating = check(sys, l.Rating)
		}
		rows = append(rows, []string{l.Name, size, q(sys, l.Flow.Value), check(sys, l.Velocity), q(sys, l.Length), q(sys, l.Drop.Value), rating})
	}
	s.table([]string{"line", "size", "flow", "velocity", "length", "drop", "wall rating"}, rows,
		"drop: "+rule(dropRule), "velocity limits: the basis above", "wall rating: Barlow on the outside diameter, E235 tube at a safety factor of 4 (our choice)")
	return s
}

func (r Report) accumulatorSection(sys units.System) section {
	a := r.Accumulator
	s := section{title: "Accumulator"}
	pairs := [][3]string{{"use", a.Use, "caller: circuit.accumulator.use"}, vq(sys, "oil to deliver", a.Need),
		{"gas volume", choice(sys, a.Volume), rule(a.Volume.Rule)},
		vq(sys, "precharge (at 20 °C)", a.Precharge), vq(sys, "lowest working pressure", a.Min), vq(sys, "highest working pressure", a.Max),
		vq(sys, "energy stored", a.Energy)}
	if a.PumpFlow.Value > 0 {
		pairs = append(pairs, vq(sys, "pump flow with it", a.PumpFlow))
	}
	s.kv(pairs...)
	return s
}

func (r Report) heatSection(sys units.System) section {
	h := r.Heat
	s := section{title: "Heat balance"}
	var rows [][]string
	for _, i := range h.Items {
		src := i.Source
		if src == "motor" {
			src = "actuators" // hydro/thermal's motor: seal friction and hydraulic motors' losses
		}
		rows = append(rows, []string{src, q(sys, i.Heat.Value)})
	}
	rows = append(rows, []string{"total", q(sys, h.Load.Value)})
	s.table([]string{"heat from", "mean over the cycle"}, rows, "itemised by hydro/thermal, time-weighted over the cycle and the idle time")
	pairs := [][3]string{vq(sys, "mean input, shaft and loads lowered", h.Input),
		{"reservoir", choice(sys, h.Reservoir), rule(h.Reservoir.Rule)},
		vq(sys, "wetted area", h.Area), vq(sys, "shed by the tank at the highest oil temperature", h.Dissipation),
		vq(sys, "steady oil temperature without a cooler", h.Steady), vq(sys, "running oil temperature", h.Running)}
	if h.Cooler.Value > 0 {
		pairs = append(pairs, vq(sys, "cooler duty", h.Cooler),
			[3]string{"cooler rating", coolerRate(sys, h.CoolerRate.Value) + " of entering temperature difference", rule(h.CoolerRate.Rule)})
	} else {
		pairs = append(pairs, [3]string{"cooler", "none needed", ""})
	}
	s.kv(pairs...)
	return s
}

// coolerRate writes a cooler's rating, w W/K, in W/K, or in BTU/(h·°F)
// for US customary output.
func coolerRate(sys units.System, w float64) string {
	if sys.Name() == units.USCustomary().Name() {
		return strconv.FormatFloat(thermal.Conductance(w).BTUPerHourFahrenheit(), 'g', 4, 64) + " BTU/(h·°F)"
	}
	return strconv.FormatFloat(w, 'g', 4, 64) + " W/K"
}

func (r Report) fluidSection(sys units.System) section {
	f := r.Fluid
	s := section{title: "Fluid"}
	pairs := [][3]string{{"fluid", f.Name, ""}, {"grade", f.Grade, "ISO 3448"}, vf("viscosity index", f.VI, func(v float64) string { return strconv.FormatFloat(v, 'f', 0, 64) })}
	if f.Cold.Limit > 0 {
		pairs = append(pairs, [3]string{"at the cold start, " + q(sys, f.ColdStart.Value), check(sys, f.Cold), rule(f.Cold.Rule)})
	}
	pairs = append(pairs, [3]string{"running, " + q(sys, r.Heat.Running.Value), check(sys, f.Hot), rule(f.Hot.Rule)})
	if len(f.Suits) > 0 {
		pairs = append(pairs, [3]string{"grades that would suit the site", strings.Join(f.Suits, ", "), "fluid.SelectGrades, best first"})
	}
	s.kv(pairs...)
	return s
}

func (r Report) cleanSection(sys units.System) section {
	c := r.Cleanliness
	s := section{title: "Cleanliness"}
	pairs := [][3]string{{"target code", c.Target.String(), rule(c.Rule)}, {"set by", c.Basis, ""}}
	if !c.Held.IsZero() {
		verdict := "meets the target"
		if !c.Meets {
			verdict = "does NOT meet the target"
		}
		beta := make([]string, 3)
		for i, b := range c.Required {
			beta[i] = strconv.FormatFloat(b, 'g', 3, 64)
		}
		pairs = append(pairs, vq(sys, "mean flow through the return filter", c.Flow),
			[3]string{"β needed at ≥4/≥6/≥14 µm(c)", strings.Join(beta, " / "), rule(c.RequiredRule)},
			[3]string{"code the filtration holds", c.Held.String() + ", " + verdict, "hydro/contamination steady state"})
	}
	s.kv(pairs...)
	var rows [][]string
	for _, f := range c.Filters {
		clean, cold := "", ""
		if f.Clean.Limit > 0 {
			clean = check(sys, f.Clean)
		}
		if f.Cold.Limit > 0 {
			cold = check(sys, f.Cold)
		}
		rows = append(rows, []string{f.Placement, f.Rating, q(sys, f.Size.Value), q(sys, f.Flow.Value), clean, cold})
	}
	s.table([]string{"filter", "element", "rated flow", "peak flow", "clean drop, running", "clean drop, cold start"}, rows,
		"element sizes and drops: "+rule(filterFigures))
	return s
}

func (r Report) billSection() section {
	s := section{title: "Bill of components"}
	var rows [][]string
	for _, b := range r.Bill {
		rows = append(rows, []string{b.Item, b.What, strconv.Itoa(b.Count)})
	}
	s.table([]string{"item", "what", "count"}, rows)
	return s
}

func (r Report) findingSection(sys units.System) section {
	s := section{title: "Findings"}
	if len(r.Findings) == 0 {
		s.para("None.")
		return s
	}
	var items [][3]string
	for _, f := range r.Findings {
		head := strings.ToUpper(f.Severity.String())
		if f.Hazard != components.NoHazard {
			head += " (" + f.Hazard.String() + ")"
		}
		items = append(items, [3]string{head, f.Text(sys), rule(f.Rule)})
	}
	s.list(items...)
	return s
}

// width is a string's width in runes.
func width(s string) int { return utf8.RuneCountInString(s) }

// Text renders the comparison as a plain-text table in its unit system.
func (c Comparison) Text() string { return writeText(c.doc()) }

// Markdown renders the comparison as a Markdown table.
func (c Comparison) Markdown() string { return writeMarkdown(c.doc()) }

func (c Comparison) doc() doc {
	sys := Report{Units: c.Units}.system()
	title := c.Name
	if title == "" {
		title = "Hydraulic power unit"
	}
	d := doc{title: title + " — the design at each working pressure"}
	s := section{title: "Comparison"}
	var rows [][]string
	var errs []string
	for _, r := range c.Rows {
		if r.Error != "" {
			errs = append(errs, q(sys, r.Pressure)+": "+r.Error)
			continue
		}
		var sizes []string
		for _, a := range r.Actuators {
			if a.Displacement > 0 {
				sizes = append(sizes, a.Name+" "+q(sys, a.Displacement))
			} else {
				sizes = append(sizes, a.Name+" "+q(sys, a.Bore)+"/"+q(sys, a.Rod))
			}
		}
		motor := "-"
		if r.Motor > 0 {
			motor = q(sys, r.Motor)
		}
		line := ""
		for _, l := range r.Lines {
			if l.Name == "pressure line" {
				line = l.Size
			}
		}
		rows = append(rows, []string{q(sys, r.Pressure), q(sys, r.PumpSpeed), strings.Join(sizes, ", "), q(sys, r.Pump),
			motor, q(sys, r.RMS), q(sys, r.Heat), q(sys, r.Cooler), q(sys, r.Reservoir), q(sys, r.Oil), line,
			strconv.Itoa(r.Findings) + " (" + r.Worst + ")"})
	}
	s.table([]string{"pressure", "pump speed", "actuators", "pump", "motor", "RMS", "heat", "cooler", "reservoir", "oil", "pressure line", "findings"}, rows,
		"each row is the whole sizing at that working pressure (hydro.Size); oil is the running temperature, held at the highest allowed where a cooler is needed")
	for _, e := range errs {
		s.para(e)
	}
	d.sections = append(d.sections, s)
	return d
}
