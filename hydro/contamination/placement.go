package contamination

import (
	"fmt"

	"github.com/hydrosize/hydrosize/components"
)

// Placement is where a filter sits in a circuit.
type Placement uint8

const (
	// SuctionStrainer: a coarse strainer at the pump inlet.
	SuctionStrainer Placement = iota
	// PressureFilter: after the pump, ahead of sensitive components.
	PressureFilter
	// ReturnFilter: in the return line to the reservoir.
	ReturnFilter
	// OfflineFilter: an off-line (kidney loop) filter with its own pump.
	OfflineFilter
	// Breather: the reservoir air breather.
	Breather
	placementCount
)

// String returns the placement in words, e.g. "return filter".
func (p Placement) String() string {
	if p < placementCount {
		return placementAdvice[p].Name
	}
	return fmt.Sprintf("Placement(%d)", uint8(p))
}

// Advice describes one filter placement: what it is for, the usual element
// and what to watch for. The elements are common practice, not a standard;
// the target code and the component makers' limits decide the real choice.
type Advice struct {
	Placement Placement
	Name      string
	// Element is the usual element in words, e.g. "fine, about 5–10 µm(c)
	// with β ≥ 200 or better" (a typed filter rating is a Rating).
	Element string
	// Purpose says what the filter protects and why it sits there.
	Purpose string
	// Findings lists what to watch for with this placement, ending with
	// the clogging indicator every element needs (TopicIndicator).
	Findings components.Findings
	// Rule labels the advice: common practice.
	Rule components.Rule
}

// adviceRule labels every placement's advice.
var adviceRule = components.PracticeRule("filter placement and element fineness")

// note, caution and warning build the findings of the placement table.
func note(hz components.Hazard, topic, text string) components.Finding {
	return components.NewFinding(components.Notice, hz, topic, adviceRule, text)
}

func caution(hz components.Hazard, topic, text string) components.Finding {
	return components.NewFinding(components.Caution, hz, topic, adviceRule, text)
}

func warning(hz components.Hazard, topic, text string) components.Finding {
	return components.NewFinding(components.Warning, hz, topic, adviceRule, text)
}

// placementAdvice is built once and never written; PlacementAdvice returns
// copies.
var placementAdvice = [placementCount]Advice{
	SuctionStrainer: {
		Placement: SuctionStrainer,
		Name:      "suction strainer",
		Element:   "coarse, about 100–250 µm (mesh)",
		Purpose:   "keeps debris such as rags and scale out of the pump inlet; it does not clean the fluid to a target code",
		Findings: components.Findings{
			caution(components.Cavitation, TopicSuctionDrop, "Any element on the pump inlet adds pressure drop there and risks cavitation, worst with cold, thick oil and as it clogs: keep it coarse and generously sized, or leave it out where the pump maker advises."),
			note(components.Cavitation, TopicSuctionFine, "Many piston pump makers forbid fine suction filters: follow the pump's inlet pressure limit."),
			note(components.Cavitation, TopicSuctionUnseen, "A suction strainer inside the tank is out of sight: give it a vacuum gauge or switch and a bypass."),
		},
	},
	PressureFilter: {
		Placement: PressureFilter,
		Name:      "pressure filter",
		Element:   "fine, about 5–10 µm(c) with β ≥ 200 or better; about 3–5 µm(c) ahead of servo and proportional valves",
		Purpose:   "protects the components just downstream (servo and proportional valves above all) from pump wear debris and from dirt in a pump failure",
		Findings: components.Findings{
			warning(components.Burst, TopicHousingPressure, "The housing must carry the full system pressure, including pressure peaks: check its pressure and fatigue ratings."),
			caution(components.FilterBypass, TopicServoNoBypass, "Ahead of servo valves use an element without bypass (a high-collapse element), so dirt cannot pass when it loads."),
			relieveFinding(),
		},
	},
	ReturnFilter: {
		Placement: ReturnFilter,
		Name:      "return filter",
		Element:   "fine, about 5–10 µm(c) with β ≥ 200 or better",
		Purpose:   "catches the dirt the circuit and cylinders bring back before it reaches the tank; often the main system filter",
		Findings: components.Findings{
			caution(components.FilterBypass, TopicReturnFlow, "Size it for the largest return flow, which exceeds pump flow when a cylinder retracts (area ratio) or an accumulator discharges."),
			note(components.Contamination, TopicFlowSurge, "Flow surges shorten element life and can unload caught dirt."),
			coldDropFinding(),
		},
	},
	OfflineFilter: {
		Placement: OfflineFilter,
		Name:      "off-line (kidney loop) filter",
		Element:   "very fine, about 3–6 µm(c) with β ≥ 1000, often with water removal",
		Purpose:   "cleans the tank continuously at steady flow, independent of the machine's cycle, so fine elements last long and can be changed while the machine runs",
		Findings: components.Findings{
			note(components.NoHazard, TopicTurnover, "Turn the tank volume over often enough: its flow and the ingress set the steady cleanliness."),
			note(components.NoHazard, TopicShortCircuit, "Take its suction and return far apart in the tank, so that it does not short-circuit."),
		},
	},
	Breather: {
		Placement: Breather,
		Name:      "breather",
		Element:   "at least as fine as the finest system filter, about 3–10 µm; desiccant type where the air is damp",
		Purpose:   "stops airborne dust, often the largest ingress source, from entering as the fluid level falls",
		Findings: components.Findings{
			note(components.Contamination, TopicBreatherFlow, "Size it for the largest air flow: the fastest fall in tank level when cylinders extend."),
			caution(components.Cavitation, TopicBreatherBlocked, "A blocked breather pulls a vacuum in the tank and can starve the pump."),
		},
	},
}

// PlacementAdvice returns the advice for placement p, with the clogging
// indicator every element needs added to its findings and its rule set. An
// unknown p returns false. The returned findings are a fresh copy the
// caller may change.
func PlacementAdvice(p Placement) (Advice, bool) {
	if p >= placementCount {
		return Advice{}, false
	}
	a := placementAdvice[p]
	a.Findings = a.Findings.Merge(indicatorFinding())
	a.Rule = adviceRule
	return a, true
}

// AllPlacementAdvice returns the advice for every placement, from the pump
// inlet to the breather.
func AllPlacementAdvice() []Advice {
	out := make([]Advice, 0, placementCount)
	for p := range placementCount {
		a, _ := PlacementAdvice(p)
		out = append(out, a)
	}
	return out
}
