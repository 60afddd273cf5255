package contamination

import (
	"fmt"
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// ErrForm reports two codes of different forms (counter and microscope)
// that were to be compared: their sizes differ, so their numbers do not
// compare. It matches units.ErrRange, and Compare's error is a
// *units.RangeError naming target.
var ErrForm error = validate.Sentinel("codes of different forms")

// Range returns the count range, in particles per mL, that number i of c
// stands for: more than above, up to and including upTo (ISO 4406:2021,
// Table 1). A "≥" number gives the range of its scale number, though the
// true count may lie higher. For ">28", above is 2 500 000 and upTo is
// math.MaxFloat64 (no upper bound). Numbers "-" and "*" stand for no range,
// and i must be below c.Len(): otherwise the error matches units.ErrRange.
func (c Code) Range(i int) (above, upTo float64, err error) {
	const fn = "contamination.Code.Range"
	if c.Len() == 0 {
		return 0, 0, validate.Fail(fn, "i", float64(i), "none: the zero Code (no code) has no numbers")
	}
	if i < 0 || i >= c.Len() {
		return 0, 0, validate.Fail(fn, "i", float64(i), fmt.Sprintf("0 to %d", c.Len()-1))
	}
	n := c.N[i]
	switch {
	case !n.valid():
		return 0, 0, validate.Fail(fn, "scale", float64(n.Scale), "a number in normal form")
	case n.Mark == MarkAbove:
		return upper[MaxScale], math.MaxFloat64, nil
	case n.Mark == MarkNotMeasured || n.Mark == MarkTooMany:
		return 0, 0, validate.Fail(fn, "mark", float64(n.Mark), `a number with a range (not "-" or "*")`)
	}
	return ScaleRange(n.Scale)
}

// Status is the verdict for one size of a sample against a target.
type Status uint8

const (
	// NotCompared: the sample or the target does not give this size.
	NotCompared Status = iota
	// Meets: the sample's number is at or below the target's.
	Meets
	// Over: the sample's number is above the target's; the fluid is dirtier
	// than the target at this size.
	Over
)

// String returns "not compared", "meets" or "over".
func (s Status) String() string {
	switch s {
	case NotCompared:
		return "not compared"
	case Meets:
		return "meets"
	case Over:
		return "over"
	}
	return fmt.Sprintf("Status(%d)", uint8(s))
}

// SizeCheck compares one size of a sample with the target.
type SizeCheck struct {
	Size           string // e.g. "≥6 µm(c)"
	Sample, Target Number
	Status         Status
	// Check holds the upper bound of the sample number's count range
	// (Value) against that of the target number (Limit), in particles per
	// mL (ISO 4406:2021, Table 1), at most: it passes when the sample
	// meets the target, so it agrees with Status. Its Ratio is the ratio
	// of the bounds (for 19 against 16: 5000/640 = 7.8125, against the
	// nominal 8). For ">28" and "*" the sample's value is the smallest
	// count above 2 500 000 (the count is "more than" that), so the check
	// fails against every target and the ratio is a lower bound. The zero
	// Check when the size is not compared.
	Check components.Check[float64]
	// Classes is the sample's number minus the target's: positive classes
	// over the target (dirtier), negative under it (cleaner).
	Classes int
	// AtLeast tells that Classes, Factor and BoundRatio are lower bounds:
	// the sample reads ">28" or "*" and counts as 29.
	AtLeast bool
	// Uncertain tells that the sample's number carries "≥" (fewer than 20
	// particles counted): the fluid may be dirtier than it reads, so a
	// "meets" is not assured.
	Uncertain bool
	// Factor is the nominal count ratio 2^Classes: each scale number is
	// about a doubling of the count (ISO 4406).
	Factor float64
}

// Comparison is the result of Compare: one SizeCheck per number of the
// codes (Sizes[:Form.Len()]).
type Comparison struct {
	Form  Form
	Sizes [3]SizeCheck
	// Compared is the number of sizes both codes give.
	Compared int
	// Meets is true when at least one size was compared and every compared
	// size meets the target.
	Meets bool
	// Worst is the largest Classes over the compared sizes (0 when none).
	Worst int
	// Findings: a caution for each size over the target
	// (TopicOverTarget, hazard Contamination) and a notice for each "≥"
	// number that meets it only as read (TopicFewCounted).
	Findings components.Findings
}

// Compare checks sample against target size by size. A size is compared
// when both codes give it; target numbers must be plain scale numbers or
// "-" (a size the target does not limit). A "≥" sample number compares by
// its number and is flagged Uncertain; ">28" and "*" count as 29 and are
// flagged AtLeast.
//
// The codes must pass Validate and share a form (ErrForm); target numbers
// with "≥", ">28" or "*" give an error matching units.ErrRange. Errors are
// *units.RangeError values naming sample or target (and the field:
// sample.N[1], target.Form). Compare allocates only when it fails or has
// findings to report.
func Compare(sample, target Code) (Comparison, error) {
	const fn = "contamination.Compare"
	if err := sample.validate(fn, "sample."); err != nil {
		return Comparison{}, err
	}
	if err := target.validate(fn, "target."); err != nil {
		return Comparison{}, err
	}
	if sample.Form != target.Form {
		return Comparison{}, validate.Kind(codeError(fn, "target", target,
			"a "+sample.Form.String()+" code like sample = "+sample.String()), ErrForm)
	}
	r := Comparison{Form: sample.Form}
	for i := range sample.Len() {
		t := target.N[i]
		if t.Mark != MarkNone && t.Mark != MarkNotMeasured {
			return Comparison{}, &units.RangeError{Func: fn, Param: fmt.Sprintf("target.N[%d]", i), Value: t.String(),
				Valid: `a plain scale number or "-" (no ≥, >28 or *)`}
		}
		sc := compareSize(sample.N[i], t)
		sc.Size = sample.Form.SizeLabel(i)
		r.Sizes[i] = sc
		if sc.Status == NotCompared {
			continue
		}
		if f, ok := sc.finding(); ok {
			r.Findings = append(r.Findings, f)
		}
		if r.Compared == 0 || sc.Classes > r.Worst {
			r.Worst = sc.Classes
		}
		r.Compared++
	}
	r.Meets = r.Compared > 0 && r.Worst <= 0
	return r, nil
}

// targetRule is where a comparison's limit comes from: the caller's target.
var targetRule = components.CallerRule("target")

// finding says what a compared size means for the reader, if anything.
func (sc SizeCheck) finding() (components.Finding, bool) {
	switch {
	case sc.Status == Over && sc.AtLeast:
		return components.NewFinding(components.Caution, components.Contamination, TopicOverTarget, targetRule,
			"At %v the sample reads %v, above the target %v: at least about %v times the particles the target allows.",
			sc.Size, sc.Sample, sc.Target, sc.Factor), true
	case sc.Status == Over:
		return components.NewFinding(components.Caution, components.Contamination, TopicOverTarget, targetRule,
			"At %v the sample reads %v, above the target %v: about %v times the particles the target allows.",
			sc.Size, sc.Sample, sc.Target, sc.Factor), true
	case sc.Uncertain:
		return components.NewFinding(components.Notice, components.Contamination, TopicFewCounted,
			components.StandardRule("ISO 4406:2021, fewer than 20 particles counted"),
			"At %v fewer than 20 particles were counted, so the fluid may be dirtier than its %v reads and the target %v is not assured.",
			sc.Size, sc.Sample, sc.Target), true
	}
	return components.Finding{}, false
}

// compareSize compares one valid sample number with a plain or "-" target.
func compareSize(s, t Number) SizeCheck {
	sc := SizeCheck{Sample: s, Target: t}
	if s.Mark == MarkNotMeasured || t.Mark == MarkNotMeasured {
		return sc
	}
	top := upper[t.Scale]
	n := s.Scale
	bound := upper[min(n, MaxScale)]
	if s.Mark == MarkAbove || s.Mark == MarkTooMany {
		n, sc.AtLeast = AboveTable, true
		bound = math.Nextafter(upper[MaxScale], math.Inf(1)) // more than 2 500 000: a lower bound
	}
	sc.Check = components.Within(bound, top, targetRule)
	sc.Uncertain = s.Mark == MarkFewCounted
	sc.Classes = n - t.Scale
	sc.Factor = math.Ldexp(1, sc.Classes)
	sc.Status = Meets
	if sc.Classes > 0 {
		sc.Status = Over
	}
	return sc
}
