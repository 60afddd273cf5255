package contamination

import "fmt"

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

// Advice describes one filter placement: what it is for, the usual rating
// and the cautions. The ratings are common practice, not a standard; the
// target code and the component makers' limits decide the real choice.
type Advice struct {
	Placement Placement
	Name      string
	// Rating is the usual rating in words, e.g. "about 5–10 µm(c)".
	Rating string
	// Purpose says what the filter protects and why it sits there.
	Purpose string
	// Cautions lists what to watch for with this placement.
	Cautions []string
	// Source labels the ratings: "common practice".
	Source string
}

// indicator is the caution that holds for every element.
const indicator = "fit a clogging indicator (visual or electrical) and change the element when it trips; an element in bypass passes unfiltered fluid"

var placementAdvice = [placementCount]Advice{
	SuctionStrainer: {
		Placement: SuctionStrainer,
		Name:      "suction strainer",
		Rating:    "coarse, about 100–250 µm (mesh)",
		Purpose:   "keeps debris such as rags and scale out of the pump inlet; it does not clean the fluid to a target code",
		Cautions: []string{
			"any element on the pump inlet adds pressure drop there and risks cavitation, worst with cold, thick oil and as it clogs: keep it coarse and generously sized, or leave it out where the pump maker advises",
			"many piston pump makers forbid fine suction filters: follow the pump's inlet pressure limit",
			"a suction strainer inside the tank is out of sight: give it a vacuum gauge or switch and a bypass",
		},
		Source: "common practice",
	},
	PressureFilter: {
		Placement: PressureFilter,
		Name:      "pressure filter",
		Rating:    "fine, about 5–10 µm(c) with β ≥ 200 or better; about 3–5 µm(c) ahead of servo and proportional valves",
		Purpose:   "protects the components just downstream (servo and proportional valves above all) from pump wear debris and from dirt in a pump failure",
		Cautions: []string{
			"the housing must carry the full system pressure, including pressure peaks; check its fatigue rating",
			"ahead of servo valves use an element without bypass (high-collapse element) so dirt cannot pass when it loads",
			"relieve the pressure before opening the housing",
		},
		Source: "common practice",
	},
	ReturnFilter: {
		Placement: ReturnFilter,
		Name:      "return filter",
		Rating:    "fine, about 5–10 µm(c) with β ≥ 200 or better",
		Purpose:   "catches the dirt the circuit and cylinders bring back before it reaches the tank; often the main system filter",
		Cautions: []string{
			"size it for the largest return flow, which exceeds pump flow when a cylinder retracts (area ratio) or an accumulator discharges",
			"flow surges shorten element life and can unload caught dirt",
			"check the clean drop at cold start against the bypass setting",
		},
		Source: "common practice",
	},
	OfflineFilter: {
		Placement: OfflineFilter,
		Name:      "off-line (kidney loop) filter",
		Rating:    "very fine, about 3–6 µm(c) with β ≥ 1000, often with water removal",
		Purpose:   "cleans the tank continuously at steady flow, independent of the machine's cycle, so fine elements last long and can be changed while the machine runs",
		Cautions: []string{
			"turn the tank volume over often enough (its flow sets the steady cleanliness with the ingress)",
			"take its suction and return far apart in the tank so it does not short-circuit",
		},
		Source: "common practice",
	},
	Breather: {
		Placement: Breather,
		Name:      "breather",
		Rating:    "at least as fine as the finest system filter, about 3–10 µm; desiccant type where the air is damp",
		Purpose:   "stops airborne dust, often the largest ingress source, from entering as the fluid level falls",
		Cautions: []string{
			"size it for the largest air flow: the fastest fall in tank level when cylinders extend",
			"a blocked breather pulls a vacuum in the tank and can starve the pump",
		},
		Source: "common practice",
	},
}

// PlacementAdvice returns the advice for placement p, with the caution that
// every element needs a clogging indicator added. An unknown p returns
// false. The returned slices are fresh copies the caller may change.
func PlacementAdvice(p Placement) (Advice, bool) {
	if p >= placementCount {
		return Advice{}, false
	}
	a := placementAdvice[p]
	a.Cautions = append(append([]string(nil), a.Cautions...), indicator)
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
