package contamination

import "github.com/hydrosize/hydrosize/components"

// Topic keys of the findings this package returns: stable, for a program to
// switch on (components.Findings.Topic).
const (
	// Filter elements and housings (CheckBypass, PlacementAdvice).
	TopicBypassOpen      = "contamination.bypass-open"      // the clean element alone reaches the bypass setting
	TopicBypassRoom      = "contamination.bypass-room"      // the clean element uses more than CleanShareLimit of the setting
	TopicIndicator       = "contamination.indicator"        // fit a clogging indicator
	TopicRelievePressure = "contamination.relieve-pressure" // relieve pressure before opening a housing
	TopicHotOil          = "contamination.hot-oil"          // hot oil and housings burn
	TopicColdDrop        = "contamination.cold-drop"        // check the clean drop at cold start

	// Placement advice.
	TopicSuctionDrop     = "contamination.suction-drop"     // an inlet element risks cavitation
	TopicSuctionFine     = "contamination.suction-fine"     // pump makers forbid fine inlet filters
	TopicSuctionUnseen   = "contamination.suction-unseen"   // an in-tank strainer needs a gauge and bypass
	TopicHousingPressure = "contamination.housing-pressure" // a pressure housing carries full pressure and peaks
	TopicServoNoBypass   = "contamination.servo-no-bypass"  // no bypass ahead of servo valves
	TopicReturnFlow      = "contamination.return-flow"      // return flow exceeds pump flow
	TopicFlowSurge       = "contamination.flow-surge"       // surges shorten element life
	TopicTurnover        = "contamination.turnover"         // an off-line loop must turn the tank over
	TopicShortCircuit    = "contamination.short-circuit"    // off-line suction and return apart
	TopicBreatherFlow    = "contamination.breather-flow"    // size a breather for the air flow
	TopicBreatherBlocked = "contamination.breather-blocked" // a blocked breather starves the pump

	// Targets and comparisons.
	TopicOverTarget     = "contamination.over-target"     // a sample dirtier than its target at a size
	TopicFewCounted     = "contamination.few-counted"     // a "≥" number meets the target but is uncertain
	TopicOverrideLooser = "contamination.override-looser" // the caller's override is dirtier than the table
)

// The findings that more than one result carries, each written once.

// indicatorFinding: every element needs a clogging indicator.
func indicatorFinding() components.Finding {
	return components.NewFinding(components.Caution, components.FilterBypass, TopicIndicator,
		components.PracticeRule("clogging indicator set below the bypass setting"),
		"Fit a clogging indicator, visual or electrical, set below the bypass setting, and change the element when it trips: an element in bypass passes unfiltered fluid.")
}

// relieveFinding: trapped pressure in a housing.
func relieveFinding() components.Finding {
	return components.NewFinding(components.Warning, components.StoredEnergy, TopicRelievePressure,
		components.PracticeRule("relieve pressure before opening a circuit"),
		"Relieve the pressure, including any accumulator, before opening a filter housing: a pressurised housing can spray or inject oil.")
}

// hotOilFinding: hot oil and housings burn.
func hotOilFinding() components.Finding {
	return components.NewFinding(components.Caution, components.HotSurface, TopicHotOil,
		components.PracticeRule("hot oil burns"),
		"Let the oil cool or wear protection before changing an element: hot oil and housings burn.")
}

// coldDropFinding: a cold start can open the bypass of a clean element.
func coldDropFinding() components.Finding {
	return components.NewFinding(components.Notice, components.FilterBypass, TopicColdDrop,
		components.PracticeRule("check the clean drop at the coldest start"),
		"Check the clean element's drop at the coldest start-up viscosity against the bypass setting, not only at working temperature.")
}
