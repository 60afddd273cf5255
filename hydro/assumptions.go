package hydro

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/hydro/pump"
	"github.com/hydrosize/hydrosize/units"
)

// The figures a first pass needs that a spec does not give and no family
// holds: round values of ours, each reported with its rule where it shaped
// a result. The makers' data for the chosen components replace every one
// of them.

// pumpKind is what the sizer assumes of a pump type.
type pumpKind struct {
	volumetric, mechanical float64 // at the working point
	variable               bool
	control                pump.Control
	component              contamination.Component // for the cleanliness target
	minInlet               units.AbsolutePressure  // lowest absolute inlet pressure
}

// pumpKinds gives round first-pass efficiencies and inlet limits by pump
// type (our choice: mid-range figures for a pump near its rated speed and
// pressure; gear pumps commonly ask for at least 0.8 bar absolute at the
// inlet, piston pumps for about the same with a flooded inlet, from
// memory).
func pumpKindOf(name, control string) pumpKind {
	switch name {
	case "vane":
		return pumpKind{volumetric: 0.92, mechanical: 0.90, component: contamination.VanePump, minInlet: 0.8 * units.BarAbsolute}
	case "piston":
		return pumpKind{volumetric: 0.95, mechanical: 0.92, component: contamination.FixedPistonPump, minInlet: 0.8 * units.BarAbsolute}
	case "variable piston":
		k := pumpKind{volumetric: 0.95, mechanical: 0.92, variable: true, control: pump.PressureCompensated,
			component: contamination.VariablePistonPump, minInlet: 0.8 * units.BarAbsolute}
		if control == "load-sensing" {
			k.control = pump.LoadSensing
		}
		return k
	}
	return pumpKind{volumetric: 0.92, mechanical: 0.88, component: contamination.GearPump, minInlet: 0.8 * units.BarAbsolute}
}

var pumpFigures = components.OurRule("first-pass pump efficiencies and inlet limit by pump type; use the maker's data")

// Hydraulic motor efficiencies for a first pass (our choice: mid-range
// figures for gear and orbital motors; use the maker's).
const (
	motorVolumetric = 0.92
	motorMechanical = 0.88
)

var motorFigures = components.OurRule("first-pass hydraulic motor efficiencies; use the maker's data")

// breakdownTorque is the electric motor's breakdown torque as a multiple
// of its rated torque (our choice: at the low end of induction motors',
// which lie about 2 to 3 times rated, from memory, leaving room for a
// voltage dip).
const breakdownTorque = 2.0

var breakdownRule = components.OurRule("electric motor breakdown torque 2 × rated, the low end of induction motors'")

// lsMargin is a load-sensing pump's margin over the highest load (our
// choice, within the 15–30 bar makers commonly set, from memory).
const lsMargin = 20 * units.Bar

// Tube material for the wall rating of pressure lines: cold-drawn steel of
// tensile strength 340 MPa (E235 to EN 10305-4, from memory) with a safety
// factor of 4 (the low end of the 4 to 8 fluid power texts use, from
// memory).
const (
	tubeStrength = 340 * units.Megapascal
	tubeSafety   = 4.0
)

// suctionHead is the oil level above the pump inlet at the lowest working
// level: 0.3 m, a flooded inlet under a tank beside the pump (our choice).
const suctionHead = 0.3 * units.Metre

// The reservoir is taken as a box twice as long as it is wide and as deep,
// filled to 80 % of its depth (our choice), for its wetted area.
const (
	tankLengthRatio = 2.0
	tankFill        = 0.8
)

// The directional valves are taken from ISO 4401 mounting sizes, each known
// by one data-sheet point P→A (and B→T): a drop of 6 bar at the flow listed
// (our choice: round figures typical of makers' catalogues, from memory;
// the chosen valve's Δp–Q curve governs). A valve is chosen so that its
// listed flow covers the peak flow through it.
var valveSizes = []struct {
	name string
	flow units.Flow
}{
	{"ISO 4401-03 (NG 6)", 60 * units.LitrePerMinute},
	{"ISO 4401-05 (NG 10)", 120 * units.LitrePerMinute},
	{"ISO 4401-07 (NG 16)", 300 * units.LitrePerMinute},
	{"ISO 4401-08 (NG 25)", 600 * units.LitrePerMinute},
	{"ISO 4401-10 (NG 32)", 1100 * units.LitrePerMinute},
}

const valveDrop = 6 * units.Bar

var valveFigures = components.OurRule("directional valve of ISO 4401 size, 6 bar P→A at its listed flow; use the maker's curve")

// Filter elements are taken in sizes of the ISO 3 R10 preferred numbers of
// rated flow, each with a clean drop of 0.5 bar at that flow and 32 mm²/s,
// and chosen at no more than two thirds of the rated flow (our choice: a
// round data-sheet point; the maker's element curve governs). Bypass
// settings: 3 bar for a return filter, 6 bar for a pressure filter (our
// choice, within makers' common settings, from memory).
var filterFlows = []float64{25, 40, 63, 100, 160, 250, 400, 630, 1000} // L/min

const (
	filterDrop      = 0.5 * units.Bar
	filterViscosity = 32 * units.SquareMillimetrePerSecond
	filterLoad      = 2.0 / 3
	returnBypass    = 3 * units.Bar
	pressureBypass  = 6 * units.Bar
	filterBeta      = 200.0 // β_x(c) at the rating, the usual class of a fine element (common practice)
)

var filterFigures = components.OurRule("filter element sized at ⅔ of its rated flow, 0.5 bar clean at rated flow and 32 mm²/s; use the maker's curve")

var bypassRule = components.OurRule("filter bypass set at 3 bar (return) or 6 bar (pressure); use the maker's setting")

// ours returns fs with every finding under rule from — a family's
// "the caller's" for a figure the sizer chose itself — put under rule to,
// the sizer's own.
func ours(fs components.Findings, from, to components.Rule) components.Findings {
	out := make(components.Findings, len(fs))
	for i, f := range fs {
		if f.Rule == from {
			f.Rule = to
		}
		out[i] = f
	}
	return out
}

// accumulatorSizes are nominal gas volumes of bladder accumulators in
// litres as commonly offered (common practice, from memory).
var accumulatorSizes = []units.Volume{0.2, 0.5, 1, 1.5, 2.5, 4, 5, 6, 10, 13, 20, 24, 32, 50}

func accumulatorSeries() components.Series[units.Volume] {
	sizes := make([]units.Volume, len(accumulatorSizes))
	for i, v := range accumulatorSizes {
		sizes[i] = v * units.Litre
	}
	s, _ := components.NewSeries("bladder accumulators, 0.2–50 L", components.PracticeRule("bladder accumulator sizes as commonly offered"), sizes, nil)
	return s
}
