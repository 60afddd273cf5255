package contamination

import (
	"fmt"
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Component is a type of hydraulic component, for choosing a target code.
type Component uint8

// Component types, roughly from the most to the least sensitive to
// particles.
const (
	ServoValve Component = iota
	ProportionalValve
	VariablePistonPump
	FixedPistonPump
	PistonMotor
	VanePump
	PressureFlowControlValve
	GearPump
	GearMotor
	DirectionalValve
	Cylinder
	componentCount
)

var componentNames = [componentCount]string{
	"servo valve", "proportional valve", "variable piston pump",
	"fixed piston pump", "piston motor", "vane pump",
	"pressure or flow control valve", "gear pump", "gear motor",
	"directional valve", "cylinder",
}

// String returns the component type in words, e.g. "servo valve".
func (c Component) String() string {
	if c < componentCount {
		return componentNames[c]
	}
	return fmt.Sprintf("Component(%d)", uint8(c))
}

// commonPracticeBase holds the base target codes, ≥4/≥6/≥14 µm(c), for
// 140–210 bar, a machine of ordinary criticality and normal duty. Common
// practice: our own table from the spread of trade guidance, not a
// standard and not any maker's chart.
var commonPracticeBase = [componentCount][3]int{
	ServoValve:               {16, 14, 11},
	ProportionalValve:        {17, 15, 12},
	VariablePistonPump:       {17, 15, 13},
	FixedPistonPump:          {18, 16, 14},
	PistonMotor:              {18, 16, 14},
	VanePump:                 {18, 16, 14},
	PressureFlowControlValve: {19, 17, 14},
	GearPump:                 {19, 17, 15},
	GearMotor:                {20, 18, 15},
	DirectionalValve:         {20, 18, 15},
	Cylinder:                 {20, 18, 15},
}

// BaseTarget returns the common-practice base target code for component
// type c at 140–210 bar, ordinary criticality and normal duty:
//
//	servo valve 16/14/11 · proportional valve 17/15/12 ·
//	variable piston pump 17/15/13 · fixed piston pump, piston motor and
//	vane pump 18/16/14 · pressure or flow control valve 19/17/14 ·
//	gear pump 19/17/15 · gear motor, directional valve and cylinder 20/18/15
//
// Common practice, not a standard: the component maker's stated limit
// takes precedence. An unknown c gives an error matching units.ErrRange.
func BaseTarget(c Component) (Code, error) {
	if c >= componentCount {
		return Code{}, validate.Fail("contamination.BaseTarget", "c", float64(c), "a known Component")
	}
	b := commonPracticeBase[c]
	return Code{Form: Counter, N: [3]Number{{Scale: b[0]}, {Scale: b[1]}, {Scale: b[2]}}}, nil
}

// PressureBand is a band of working pressure for choosing a target code.
type PressureBand uint8

const (
	// BandLow: up to and including 140 bar; one class dirtier than the base
	// is allowed.
	BandLow PressureBand = iota
	// BandMedium: above 140 bar up to and including 210 bar; the base code.
	BandMedium
	// BandHigh: above 210 bar; one class cleaner than the base.
	BandHigh
)

// String returns the band with its limits, e.g. "over 210 bar".
func (b PressureBand) String() string {
	switch b {
	case BandLow:
		return "up to 140 bar"
	case BandMedium:
		return "over 140 bar up to 210 bar"
	case BandHigh:
		return "over 210 bar"
	}
	return fmt.Sprintf("PressureBand(%d)", uint8(b))
}

// steps returns the classes the band adds to the base code (common practice).
func (b PressureBand) steps() int { return 1 - int(b) }

// BandFor returns the pressure band of a highest working pressure p
// (gauge): up to and including 140 bar low, up to and including 210 bar
// medium, above that high (common practice). p must be finite and ≥ 0;
// otherwise the error matches units.ErrRange.
func BandFor(p units.Pressure) (PressureBand, error) {
	if err := validate.NonNegative("contamination.BandFor", "p", p); err != nil {
		return 0, err
	}
	switch {
	case p <= 140*units.Bar:
		return BandLow, nil
	case p <= 210*units.Bar:
		return BandMedium, nil
	}
	return BandHigh, nil
}

// ErrNoComponent reports a target request that names no component. It
// matches units.ErrRange, and RecommendTarget's error is a
// *units.RangeError naming Components.
var ErrNoComponent error = validate.Sentinel("no component given")

// TargetInput describes a circuit for RecommendTarget.
type TargetInput struct {
	// Components lists the component types on the circuit; the most
	// sensitive sets the target. At least one is needed.
	Components []Component
	// Pressure is the highest working pressure (gauge), > 0: an unset
	// pressure is refused rather than read as the low band.
	Pressure units.Pressure
	// Critical: downtime is costly or a failure is hazardous; one class
	// cleaner (common practice).
	Critical bool
	// SevereDuty: shock loads, long duty cycles, frequent cold starts, or a
	// dusty or wet site; one class cleaner (common practice).
	SevereDuty bool
	// Bases replaces the common-practice base code of the listed component
	// types with the caller's (for example a maker's stated limit at
	// 140–210 bar). Codes must be counter codes of plain numbers.
	Bases map[Component]Code
	// Override, when not nil, is the caller's target: Target.Code is set to
	// it while Target.Table still reports what the table gives.
	Override *Code
}

// Target is a recommended target code and how it was reached.
type Target struct {
	// Code is the target: Table, or the caller's override.
	Code Code
	// Table is the code from the base codes and adjustments.
	Table Code
	// Basis is the most sensitive component: the one whose base code has the
	// smallest sum of numbers (the first such in Components).
	Basis Component
	// Base is the strictest base code, size by size, over Components.
	Base Code
	// Band is the pressure band of TargetInput.Pressure.
	Band PressureBand
	// Steps is the number of classes added to Base: +1 for the low band,
	// −1 for the high band, −1 when critical, −1 for severe duty. Numbers
	// are kept within 0…28.
	Steps int
	// Overridden tells that Code is the caller's override.
	Overridden bool
	// Rule says where Code comes from: common practice (the table), the
	// caller's base codes with common-practice adjustments
	// (components.CallerValue, "Bases"), or the caller's override
	// (components.CallerValue, "Override").
	Rule components.Rule
	// Findings: a caution when the override is dirtier than the table at
	// some size (TopicOverrideLooser).
	Findings components.Findings
}

// RecommendTarget returns a target ISO 4406 code (≥4/≥6/≥14 µm(c)) for a
// circuit: the strictest base code, size by size, of its components
// (BaseTarget, or the caller's Bases), moved by Steps classes for the
// pressure band, criticality and duty, each number kept within 0…28.
//
// This is common practice, not a standard. The component makers' limits
// take precedence; a sample that meets the target is no warranty of life.
//
// Errors are *units.RangeError values matching units.ErrRange that name
// the TargetInput field: no component (Components, also ErrNoComponent), an
// unknown component (Components[i]), a pressure that is not finite and > 0
// (Pressure), or a bad base or override code (Bases[servo valve].N[1],
// Override.Form, …).
func RecommendTarget(in TargetInput) (Target, error) {
	const fn = "contamination.RecommendTarget"
	if len(in.Components) == 0 {
		return Target{}, validate.Kind(&units.RangeError{Func: fn, Param: "Components", Value: "none",
			Valid: "at least one component"}, ErrNoComponent)
	}
	if err := validate.Positive(fn, "Pressure", in.Pressure); err != nil {
		return Target{}, err
	}
	band, err := BandFor(in.Pressure)
	if err != nil {
		return Target{}, err
	}
	t := Target{Band: band, Steps: band.steps(), Base: Code{Form: Counter},
		Rule: components.PracticeRule("target code from the most sensitive component, pressure band, criticality and duty")}
	bestSum := -1
	for k, c := range in.Components {
		base, err := baseFor(fn, "Components["+strconv.Itoa(k)+"]", in.Bases, c)
		if err != nil {
			return Target{}, err
		}
		sum := base.N[0].Scale + base.N[1].Scale + base.N[2].Scale
		if bestSum < 0 || sum < bestSum {
			bestSum, t.Basis = sum, c
		}
		for i := range 3 {
			if k == 0 || base.N[i].Scale < t.Base.N[i].Scale {
				t.Base.N[i] = base.N[i]
			}
		}
	}
	if in.Critical {
		t.Steps--
	}
	if in.SevereDuty {
		t.Steps--
	}
	t.Table = t.Base
	for i := range 3 {
		t.Table.N[i].Scale = min(max(t.Base.N[i].Scale+t.Steps, 0), MaxScale)
	}
	t.Code = t.Table
	if len(in.Bases) > 0 {
		t.Rule = components.CallerRule("Bases, with common-practice adjustments for pressure, criticality and duty")
	}
	if in.Override != nil {
		if err := checkTarget(fn, "Override", *in.Override); err != nil {
			return Target{}, err
		}
		t.Code, t.Overridden, t.Rule = *in.Override, true, components.CallerRule("Override")
		t.Findings = overrideFindings(t.Code, t.Table)
	}
	return t, nil
}

// overrideFindings cautions about each size at which the override is
// dirtier than the table's code.
func overrideFindings(override, table Code) components.Findings {
	var out components.Findings
	for i := range 3 {
		if override.N[i].Scale > table.N[i].Scale {
			out = append(out, components.NewFinding(components.Caution, components.Contamination, TopicOverrideLooser,
				components.CallerRule("Override"),
				"At %v the override %v allows %v where the common-practice target %v asks for %v: confirm it with the component makers' limits.",
				Counter.SizeLabel(i), override, override.N[i], table, table.N[i]))
		}
	}
	return out
}

// baseFor returns the caller's base code for c if given, else the table's;
// param names c in the caller's input (Components[2]).
func baseFor(fn, param string, bases map[Component]Code, c Component) (Code, error) {
	if c >= componentCount {
		return Code{}, validate.Fail(fn, param, float64(c), "a known Component")
	}
	if b, ok := bases[c]; ok {
		if err := checkTarget(fn, "Bases["+c.String()+"]", b); err != nil {
			return Code{}, err
		}
		return b, nil
	}
	return BaseTarget(c)
}

// checkTarget accepts a valid counter code of plain numbers; errors name
// param and the field (Bases[gear pump].N[1]).
func checkTarget(fn, param string, c Code) error {
	if err := c.validate(fn, param+"."); err != nil {
		return err
	}
	if c.Form != Counter {
		return codeError(fn, param, c, "a counter (three-number) code")
	}
	for i := range 3 {
		if c.N[i].Mark != MarkNone {
			return &units.RangeError{Func: fn, Param: fmt.Sprintf("%s.N[%d]", param, i), Value: c.N[i].String(),
				Valid: "a plain scale number (no -, ≥, >28 or *)"}
		}
	}
	return nil
}

// codeError reports a code that a function cannot take as param.
func codeError(fn, param string, c Code, valid string) error {
	return &units.RangeError{Func: fn, Param: param, Value: c.String(), Valid: valid}
}
