package hydro

import (
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/line"
	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/units"
)

// Size sizes the machine a spec describes and returns the report.
//
// It validates the whole spec first ([Spec.Validate]: every problem, with
// its JSON path, in a *[SpecError]), then works in the order an engineer
// does:
//
//  1. each actuator: the standard bore and rod (or motor displacement)
//     that meets its hardest move at the working pressure less the losses
//     on its way (hydro/actuator), then every move with that size: force,
//     port pressure, flows;
//  2. each phase: the pump flow the moves take and the pressure they need;
//  3. the directional valves and the lines (hydro/line) for the highest
//     flows, and the pressure budget of every phase at the oil's running
//     viscosity: pump pressure = load + supply losses, with the return
//     losses as back pressure on the actuators;
//  4. the relief setting above the highest working pressure, and the pump
//     (hydro/pump) for the peak flow at that pressure, with its margin;
//  5. each phase's working point — full flow, surplus over the relief,
//     stroked back, standby or unloaded through the center — and its heat,
//     item by item (hydro/thermal);
//  6. the heat balance: the reservoir for the pump's flow, its natural
//     dissipation, the steady oil temperature at the hottest ambient, and a
//     cooler when that is above the highest oil temperature allowed.
//
// Steps 1–6 repeat, each pass at the oil temperature the last one reached,
// until the running oil temperature and the highest pump pressure stop
// moving (by less than 0.05 K and 0.05 bar; at most 30 passes): the report's
// Solve gives the passes and the last residuals. Then come the drive for the
// duty cycle's RMS and peak (hydro/drive), the pump's fit with the valve
// center and its inlet at a cold start, the grade's viscosity at the cold
// start and hot running (fluid), the accumulator when the spec asks for
// one (hydro/accumulator), the cleanliness target, the filters and the
// code they hold (hydro/contamination), the bill of components, and every
// finding merged and ordered most severe first.
//
// With Design.PressureRange, Size sizes the machine at every pressure of
// the range (as [Sweep] does) and returns the report of the one with the
// smallest drive rating, the lowest pressure among equals.
//
// A requirement no standard size meets is a finding in the report, not an
// error. Errors are for a spec that fails validation (a *SpecError) or,
// rarely, a combination the families refuse (a *FieldError naming the part
// of the spec concerned); the report is then the zero Report.
func Size(s Spec) (Report, error) {
	fl, err := s.validated()
	if err != nil {
		return Report{}, err
	}
	if r := s.Design.PressureRange; r != nil && s.Design.Pressure == 0 {
		return sizeBest(s, fl, *r)
	}
	p, rule := s.Design.Pressure, components.CallerRule("design.pressure")
	if p == 0 {
		p, rule = DefaultPressure, components.OurRule("working pressure of the ISO 6020-2 16 MPa cylinder series")
	}
	return sizeAt(s, fl, p, rule)
}

// sizeAt sizes a validated spec, whose validation built fluid fl, at
// working pressure p.
func sizeAt(s Spec, fl fluid.Fluid, p units.Pressure, rule components.Rule) (Report, error) {
	z, err := newSizer(s, fl, p, rule)
	if err != nil {
		return Report{}, err
	}
	r, err := z.run()
	if err != nil {
		return Report{}, err
	}
	return r, nil
}

// Convergence limits of the coupled passes.
const (
	maxPasses   = 30
	tempTol     = 0.05 * units.DeltaKelvin
	pressureTol = 0.05 * units.Bar
)

// result is what the last pass leaves for the report.
type result struct {
	lines  mainLines
	sizing pump.Sizing
	model  pump.Pump
	heats  []phaseHeat
	bal    balance
	solve  Solve
	pumped bool // a pump was found
}

// run makes the coupled passes and builds the report.
func (z *sizer) run() (Report, error) {
	var res result
	res.lines = z.newLines()
	site := z.spec.Site
	z.tOil = min(site.AmbientMax+20, z.basis.MaxOilTemperature.Value)
	z.reliefP = units.Pressure(float64(z.basis.Pressure.Value) * (1 + z.relief))
	prevP := units.Pressure(math.Inf(1))
	for pass := 1; pass <= maxPasses; pass++ {
		done, err := z.pass(&res, pass, prevP)
		if err != nil {
			return Report{}, err
		}
		prevP = z.pumpP
		if done {
			break
		}
	}
	return z.report(&res)
}

// pass runs steps 1–6 once; it reports whether the sizing has converged
// (or cannot go further).
func (z *sizer) pass(res *result, n int, prevP units.Pressure) (bool, error) {
	oil, err := line.OilAt(z.fl, z.tOil)
	if err != nil {
		return false, &FieldError{Path: "fluid", Err: err}
	}
	z.oil = oil
	if err := z.sizeActuators(); err != nil {
		return false, err
	}
	z.retime() // the moves that ramp are timed on the chosen cylinders
	z.flows()
	if z.delivery == 0 {
		z.delivery = z.peakDemand()
	}
	if err := z.sizeValvesAndLines(&res.lines); err != nil {
		return false, &FieldError{Path: "circuit", Err: err}
	}
	if err := z.drops(&res.lines); err != nil {
		return false, &FieldError{Path: "circuit", Err: err}
	}
	for _, a := range z.acts { // again, with this pass's back pressures
		if err := z.workMoves(a); err != nil {
			return false, &FieldError{Path: index("actuators", a.index), Err: err}
		}
	}
	z.loads()
	if _, err := z.setRelief(); err != nil {
		return false, &FieldError{Path: "design.relief_margin", Err: err}
	}
	flow := z.pumpFlow()
	res.solve.Iterations = n
	if flow <= 0 {
		z.notes = z.notes.Merge(components.NewFinding(components.Warning, components.NoHazard, "hydro.no-flow",
			components.OurRule("sizing order"), "No move of the cycle takes pump flow with the sizes found, so no pump was sized."))
		return true, nil
	}
	res.sizing, res.model, err = z.sizePump(flow)
	if err != nil {
		return false, &FieldError{Path: "circuit.pump", Err: err}
	}
	if res.pumped = res.sizing.Displacement.OK(); !res.pumped {
		return true, nil
	}
	z.delivery = res.sizing.Delivered
	if res.heats, err = z.heats(res.model); err != nil {
		return false, &FieldError{Path: "cycle", Err: err}
	}
	if res.bal, err = z.balanceHeat(res.heats); err != nil {
		return false, &FieldError{Path: "site", Err: err}
	}
	dT := units.TemperatureDifference(math.Abs(float64(res.bal.running - z.tOil)))
	dp := units.Pressure(math.Abs(float64(z.pumpP - prevP)))
	if n == 1 {
		dp = z.pumpP
	}
	res.solve.Temperature = Value[units.TemperatureDifference]{dT, solveRule}
	res.solve.Pressure = Value[units.Pressure]{dp, solveRule}
	res.solve.Converged = n > 1 && dT < tempTol && dp < pressureTol
	z.tOil = res.bal.running
	return res.solve.Converged, nil
}

var solveRule = components.OurRule("passes repeated until the oil temperature moves < 0.05 K and the pump pressure < 0.05 bar")

// pumpFlow is the flow the pump is sized for: the peak demand, or with an
// accumulator that covers the peaks, less.
func (z *sizer) pumpFlow() units.Flow {
	q := z.peakDemand()
	if z.spec.Circuit.Accumulator.Use == "cycle" {
		if s, err := z.supplement(); err == nil && s.Pump > 0 {
			return s.Pump
		}
	}
	return q
}
