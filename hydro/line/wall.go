package line

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Basis is the diameter a Barlow rating is written on.
type Basis uint8

// Diameters for Barlow's formula.
const (
	// InsideDiameter: p = 2·S·t/(d_i·SF), the form of fluid power texts
	// (Esposito, Fluid Power with Applications, 7th ed., ch. on hydraulic
	// conductors, from memory). It rates a wall higher than the outside
	// form, by OD/ID.
	InsideDiameter Basis = iota + 1
	// OutsideDiameter: p = 2·S·t/(d_o·SF), the conservative form of
	// pressure-piping codes (from memory).
	OutsideDiameter
)

// String returns "inside diameter" or "outside diameter".
func (b Basis) String() string {
	switch b {
	case InsideDiameter:
		return "inside diameter"
	case OutsideDiameter:
		return "outside diameter"
	}
	return "Basis(invalid)"
}

// WallRating is the pressure a tube wall is good for.
type WallRating struct {
	Working  units.Pressure // burst / safety factor
	Burst    units.Pressure // 2·S·t/D: where the hoop stress reaches the strength
	Diameter units.Length   // the diameter the formula used
	Basis    Basis
	Safety   float64
	Rule     components.Rule
}

// Check holds working pressure p against the rating.
func (r WallRating) Check(p units.Pressure) components.Check[units.Pressure] {
	return components.Within(p, r.Working, r.Rule)
}

// Barlow returns the pressure rating of a tube of outside diameter od and
// wall thickness wall, made of a material of tensile strength strength,
// with safety factor safety, by Barlow's thin-wall hoop-stress formula
//
//	p_burst = 2·S·t/D,  p_working = p_burst/SF
//
// with D the inside or outside diameter as basis says (the result records
// which). Barlow is a thin-wall formula; for thick walls (OD/t below about
// 10) the outside-diameter form stays on the safe side, the inside form does
// not. The safety factor is the designer's: fluid power texts use 4 to 8 on
// tensile strength, higher for shock loads (from memory); tube makers'
// ratings and ISO 10763 (from memory) govern. od, wall and strength must be finite and
// > 0 with wall < od/2, and safety ≥ 1; otherwise the error matches
// units.ErrRange.
func Barlow(od, wall units.Length, strength units.Pressure, safety float64, basis Basis) (WallRating, error) {
	const fn = "line.Barlow"
	if err := validate.Positive(fn, "od", od); err != nil {
		return WallRating{}, err
	}
	if err := validate.Positive(fn, "wall", wall); err != nil {
		return WallRating{}, err
	}
	if wall >= od/2 {
		return WallRating{}, validate.Fail(fn, "wall", wall, "< od/2 ("+(od/2).String()+")")
	}
	if err := validate.Positive(fn, "strength", strength); err != nil {
		return WallRating{}, err
	}
	if err := validate.InRange(fn, "safety", safety, 1, 100); err != nil {
		return WallRating{}, err
	}
	d := od
	switch basis {
	case InsideDiameter:
		d = od - 2*wall
	case OutsideDiameter:
	default:
		return WallRating{}, validate.Fail(fn, "basis", float64(basis), "InsideDiameter or OutsideDiameter")
	}
	burst := units.Pressure(2 * float64(strength) * float64(wall/d))
	r := WallRating{Working: burst / units.Pressure(safety), Burst: burst, Diameter: d, Basis: basis, Safety: safety,
		Rule: barlowRule(basis)}
	if err := validate.Result(fn, "burst", r.Burst); err != nil {
		return WallRating{}, err
	}
	return r, nil
}

// barlowRule is the rule of Barlow's formula on the diameter basis names.
func barlowRule(basis Basis) components.Rule {
	if basis == InsideDiameter {
		return components.PhysicsRule("Barlow, p = 2·S·t/(D·SF) on the inside diameter")
	}
	return components.PhysicsRule("Barlow, p = 2·S·t/(D·SF) on the outside diameter")
}

// HoseDesignFactor is the ratio of minimum burst pressure to maximum working
// pressure of hydraulic hose, 4:1 (SAE J517).
const HoseDesignFactor = 4.0

// HoseRating returns the maximum working pressure of a hose of minimum burst
// pressure burst: burst/4 (SAE J517's 4:1 design factor). The maker's rated
// working pressure governs; a hose assembly is rated no higher than its
// lowest-rated part (hose or fitting). burst must be finite and > 0.
func HoseRating(burst units.Pressure) (WallRating, error) {
	if err := validate.Positive("line.HoseRating", "burst", burst); err != nil {
		return WallRating{}, err
	}
	return WallRating{Working: burst / HoseDesignFactor, Burst: burst, Safety: HoseDesignFactor,
		Rule: components.StandardRule("SAE J517: minimum burst pressure 4 × maximum working pressure")}, nil
}

// HoseRun is a hose as installed: its working pressure, its rating and
// where it runs.
type HoseRun struct {
	Name       string
	Pressure   units.Pressure // highest working pressure in service, surges included
	Burst      units.Pressure // the hose assembly's minimum burst pressure (maker's figure); 0 if unknown
	NearPeople bool           // within reach of an operator, a maintainer or a passer-by
	Restrained bool           // fitted with whip restraints or behind a guard that contains a burst
}

// HoseAssessment is what Assess says about a hose run.
type HoseAssessment struct {
	Rating   WallRating                       // from Burst by the 4:1 factor (zero when Burst is 0)
	Check    components.Check[units.Pressure] // Pressure against Rating.Working (zero when Burst is 0)
	Findings components.Findings
}

// Assess rates the hose from its burst pressure (HoseRating) and returns
// the findings a hose in service carries:
//
//   - a warning (injection) for every pressurised hose: a pinhole leak
//     injects oil through the skin; never feel for a leak by hand;
//   - a warning (burst) for a hose near people without restraint: a hose
//     or fitting that lets go whips; restrain or guard it (ISO 4413 asks
//     that hoses be restrained where their failure is a hazard);
//   - a warning (overpressure) when the working pressure exceeds the 4:1
//     rating;
//   - a notice on routing: keep hoses as short and as few as the motion
//     allows, free of twist, above their minimum bend radius and away from
//     abrasion and heat (ISO 4413; SAE J1273);
//   - a notice when no burst pressure is given, so the rating is unchecked.
//
// Pressure must be finite and > 0, Burst finite and ≥ 0.
func (h HoseRun) Assess() (HoseAssessment, error) {
	const fn = "line.HoseRun.Assess"
	if err := validate.Positive(fn, "Pressure", h.Pressure); err != nil {
		return HoseAssessment{}, err
	}
	if err := validate.NonNegative(fn, "Burst", h.Burst); err != nil {
		return HoseAssessment{}, err
	}
	name := h.Name
	if name == "" {
		name = "the hose"
	}
	iso := components.StandardRule("ISO 4413:2010")
	var a HoseAssessment
	a.Findings = components.Findings{components.NewFinding(components.Warning, components.Injection, "line.hose-injection", iso,
		"%v carries %v: a pinhole leak can inject oil through the skin, so never feel for a leak by hand", name, h.Pressure)}
	if h.NearPeople && !h.Restrained {
		a.Findings = a.Findings.Merge(components.NewFinding(components.Warning, components.Burst, "line.hose-restraint", iso,
			"%v runs near people without restraint: fit whip restraints or a guard, since a hose that lets go at %v whips", name, h.Pressure))
	}
	if h.Burst > 0 {
		r, err := HoseRating(h.Burst)
		if err != nil {
			return HoseAssessment{}, err
		}
		a.Rating, a.Check = r, r.Check(h.Pressure)
		if !a.Check.OK() {
			a.Findings = a.Findings.Merge(components.NewFinding(components.Warning, components.Overpressure, "line.hose-rating", r.Rule,
				"%v works at %v, above the %v its burst pressure of %v allows", name, h.Pressure, r.Working, h.Burst))
		}
	} else {
		a.Findings = a.Findings.Merge(components.NewFinding(components.Notice, components.NoHazard, "line.hose-unrated",
			components.StandardRule("SAE J517"), "%v has no burst pressure given, so its rating is not checked", name))
	}
	a.Findings = a.Findings.Merge(components.NewFinding(components.Notice, components.NoHazard, "line.hose-routing",
		components.StandardRule("ISO 4413:2010; SAE J1273"),
		"keep %v short, free of twist, above its minimum bend radius and clear of abrasion and heat", name))
	return a, nil
}
