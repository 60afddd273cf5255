package hydro

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/units"
)

// cleanliness works out the target code (contamination.RecommendTarget),
// the filters, the β their elements need against the ingress with the mean
// flow through the return filter over the cycle, and the code the
// filtration holds (contamination.SteadyState), with each filter's clean
// drop against its bypass setting running and at a cold start
// (contamination.CheckBypass).
func (z *sizer) cleanliness(ml mainLines, hs []phaseHeat, nuRun, nuCold units.KinematicViscosity) (CleanlinessResult, components.Findings, error) {
	cl := z.spec.Cleanliness
	comp := z.kind.component
	if c, ok := componentNamed(cl.MostSensitive); ok {
		comp = c
	}
	in := contamination.TargetInput{Components: []contamination.Component{comp}, Pressure: max(z.pumpP, units.Bar),
		Critical: cl.Critical, SevereDuty: cl.SevereDuty}
	if !cl.Target.IsZero() {
		t := cl.Target
		in.Override = &t
	}
	t, err := contamination.RecommendTarget(in)
	if err != nil {
		return CleanlinessResult{}, nil, &FieldError{Path: "cleanliness", Err: err}
	}
	r := CleanlinessResult{Target: t.Code, Basis: t.Basis.String(), Rule: t.Rule}
	fs := t.Findings
	if in.Override != nil { // the family's Override is the spec's target
		r.Rule = components.CallerRule("cleanliness.target")
		fs = ours(fs, t.Rule, r.Rule)
	}
	ingress, known, err := z.ingress()
	if err != nil {
		return r, nil, &FieldError{Path: "cleanliness.sample", Err: err}
	}
	rating := ""
	if known {
		r.Flow = Value[units.Flow]{returnFiltered(hs), filterFlowRule}
		var f components.Findings
		rating, _, f, err = z.filtration(&r, ingress, t.Code)
		if err != nil {
			return r, nil, &FieldError{Path: "cleanliness", Err: err}
		}
		fs = fs.Merge(ours(f, components.CallerRule("target"), r.Rule)...) // contamination.Compare's "target" is the one chosen above
	}
	for _, f := range z.filters(ml) {
		fr, ff, err := z.filterCheck(f, rating, nuRun, nuCold)
		if err != nil {
			return r, nil, &FieldError{Path: "cleanliness", Err: err}
		}
		r.Filters = append(r.Filters, fr)
		fs = fs.Merge(ff...)
	}
	return r, fs, nil
}

// ingress returns the particles entering per minute at ≥4, ≥6, ≥14 µm(c):
// the spec's, or worked back from a sample (contamination.IngressFrom).
func (z *sizer) ingress() ([3]float64, bool, error) {
	cl := z.spec.Cleanliness
	switch {
	case cl.Ingress != nil:
		return cl.Ingress.PerMinute, true, nil
	case cl.Sample != nil:
		var r [3]float64
		for i, c := range cl.Sample.PerML {
			var err error
			if r[i], err = contamination.IngressFrom(c, cl.Sample.Flow, cl.Sample.Beta[i]); err != nil {
				return [3]float64{}, false, err
			}
		}
		return r, true, nil
	}
	return [3]float64{}, false, nil
}

// filtration chooses the element rating for a known ingress: the β needed
// at each size for the target with the pump's flow through a full-flow
// filter (contamination.BetaForTarget), then the coarsest rating of
// components.FilterRatings that gives it, an element rated β_x(c) ≥ 200
// (or 1000 where 200 is not enough) being credited with that β at sizes at
// or above x and with belowRatingBeta below x; and the code that holds
// (contamination.SteadyState).
func (z *sizer) filtration(r *CleanlinessResult, ingress [3]float64, target contamination.Code) (string, float64, components.Findings, error) {
	var fs components.Findings
	sizes := [3]units.Length{4 * units.Micrometre, 6 * units.Micrometre, 14 * units.Micrometre}
	beta := filterBeta
	for i := range 3 {
		b, err := contamination.BetaForTarget(ingress[i], r.Flow.Value, target.N[i].Scale)
		if err != nil {
			fs = fs.Merge(components.NewFinding(components.Caution, components.Contamination, "hydro.target-unreachable",
				components.PhysicsRule("particle balance of a full-flow filter"),
				"No full-flow filter at %v holds the target %v at %v against this ingress: add an off-line filter or cut the ingress.",
				r.Flow.Value, target.String(), contamination.Counter.SizeLabel(i)))
			b = 1000
		}
		r.Required[i] = b
		r.RequiredRule = betaRule
		if b > beta {
			beta = 1000
		}
	}
	ratings := components.FilterRatings()
	x := ratings.Smallest()
	for rt := range ratings.All() {
		if creditOK(rt, sizes, r.Required, beta) {
			x = rt // ascending: the last that passes is the coarsest
		}
	}
	var held [3]float64
	for i := range 3 {
		c, err := contamination.SteadyState(ingress[i], r.Flow.Value, credit(x, sizes[i], beta))
		if err != nil {
			return "", 0, nil, err
		}
		held[i] = c
	}
	code, err := contamination.CodeFromCounts(held[0], held[1], held[2])
	if err != nil {
		return "", 0, nil, err
	}
	cmp, err := contamination.Compare(code, target)
	if err != nil {
		return "", 0, nil, err
	}
	r.Held, r.Meets = code, cmp.Meets
	return contamination.Rating{Size: x, Beta: beta}.String(), beta, fs.Merge(cmp.Findings...), nil
}

var betaRule = components.PhysicsRule("particle balance of a full-flow filter: β = 1/(1 − R/(Q·C)) (hydro/contamination)")

// returnFiltered is the mean flow through the return filter over the
// cycle: what the actuators send back while they move, what passes the
// relief, and what a center or bleed-off sends to tank; a pump stroked
// back to standby sends almost none. The particle balance is linear in the
// flow through the filter, so with a reservoir that smooths the
// concentration the mean flow is the one to hold it with.
func returnFiltered(hs []phaseHeat) units.Flow {
	var oil, total float64 // m³ and s a cycle
	for _, h := range hs {
		q := h.op.relief + h.op.bleed
		if h.op.center > 0 {
			q += h.op.point.Flow // unloaded through the center
		}
		if h.ph != nil {
			q += h.ph.ret
		}
		oil += float64(q) * h.time.Seconds()
		total += h.time.Seconds()
	}
	if total == 0 {
		return 0
	}
	return units.Flow(oil / total)
}

var filterFlowRule = components.PhysicsRule("mean flow to tank through the return filter over the cycle")

// belowRatingBeta is the β credited to an element below its rated size: 2,
// half the particles caught (our choice, conservative: makers' β curves
// fall off below the rated size but stay well above 2 near it).
const belowRatingBeta = 2.0

// credit is the β an element rated β_x(c) ≥ beta is credited with at size s.
func credit(x, s units.Length, beta float64) float64 {
	if s >= x {
		return beta
	}
	return belowRatingBeta
}

// creditOK reports whether a rating x meets the required β at every size.
func creditOK(x units.Length, sizes [3]units.Length, need [3]float64, beta float64) bool {
	for i, s := range sizes {
		if need[i] > credit(x, s, beta) {
			return false
		}
	}
	return true
}

// filterPlace is one filter of the circuit.
type filterPlace struct {
	placement contamination.Placement
	rated     units.Flow
	flow      units.Flow
	bypass    units.Pressure
}

func (z *sizer) filters(ml mainLines) []filterPlace {
	out := []filterPlace{{contamination.ReturnFilter, ml.returnFilter, ml.ret.flow, returnBypass}}
	if ml.pressureFilter > 0 {
		out = append(out, filterPlace{contamination.PressureFilter, ml.pressureFilter, z.delivery, pressureBypass})
	}
	return out
}

// filterCheck reports one filter: the placement advice, the rating, and its
// clean drop against the bypass setting running and at a cold start.
func (z *sizer) filterCheck(f filterPlace, rating string, nuRun, nuCold units.KinematicViscosity) (FilterResult, components.Findings, error) {
	adv, _ := contamination.PlacementAdvice(f.placement)
	r := FilterResult{Placement: adv.Name, Rating: rating, Flow: Value[units.Flow]{f.flow, components.PhysicsRule("the highest flow through it")}}
	if rating == "" {
		r.Rating = adv.Element
	}
	fs := about(adv.Findings, adv.Name)
	if f.rated == 0 {
		fs = fs.Merge(components.NewFinding(components.Notice, components.NoHazard, "hydro.filter-size",
			filterFigures, "No element of the sizes considered passes %v: use filters in parallel.", f.flow))
		return r, fs, nil
	}
	r.Size = Value[units.Flow]{f.rated, filterFigures}
	at := contamination.ElementPoint{Drop: filterDrop, Flow: f.rated, Viscosity: filterViscosity}
	for _, c := range []struct {
		nu  units.KinematicViscosity
		out *components.Check[units.Pressure]
	}{{nuRun, &r.Clean}, {nuCold, &r.Cold}} {
		if c.nu <= 0 || f.flow <= 0 {
			continue
		}
		b, err := contamination.CheckBypass(at, f.flow, c.nu, f.bypass)
		if err != nil {
			return r, nil, err
		}
		// The bypass setting is the sizer's figure, not the caller's.
		*c.out = b.Setting
		c.out.Rule = bypassRule
		fs = fs.Merge(about(ours(b.Findings, b.Setting.Rule, bypassRule), adv.Name)...)
	}
	return r, fs, nil
}
