package fluid

import (
	"cmp"
	"math"
	"slices"
	"strconv"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Site is the temperature duty of a machine: the lowest oil temperature at
// which it must start and the highest at which it runs.
type Site struct {
	MinStart, MaxRunning units.Temperature
}

// MaxPumpInlet is the highest oil temperature at a pump inlet that ISO 4413
// (general rules and safety requirements for hydraulic systems) accepts:
// 60 °C = 333.15 K. A pump maker's own limit may be lower and then governs.
const MaxPumpInlet units.Temperature = 333.15

// Topic keys of the findings this package returns: stable, for a program to
// switch on (components.Findings.Topic).
const (
	TopicInletTemperature = "fluid.inlet-temperature" // running oil above MaxPumpInlet
	TopicColdStart        = "fluid.cold-start"        // a start below 0 °C
	TopicColdMargin       = "fluid.cold-margin"       // a grade's cold-start margin under MinTemperatureMargin
	TopicHotMargin        = "fluid.hot-margin"        // a grade's running margin under MinTemperatureMargin
	TopicAboveOptimum     = "fluid.above-optimum"     // running viscosity above the optimum band
	TopicBelowOptimum     = "fluid.below-optimum"     // running viscosity below the optimum band
)

// freezing is 0 °C, below which a start needs a warm-up (common practice).
const freezing units.Temperature = 273.15

// Findings returns what a designer should be told about the site's duty,
// for display beside the chosen grade, most severe first:
//
//   - running hotter than MaxPumpInlet (ISO 4413) ages the oil, thins it
//     towards the pump's minimum and makes tank, lines and oil hot enough to
//     burn: a caution about hot surfaces (TopicInletTemperature);
//   - a start below 0 °C needs a warm-up at low speed and pressure before
//     full load (common practice): a caution about cold starts
//     (TopicColdStart).
//
// Nil when there is nothing to say. The sentences quote the temperatures as
// typed quantities, so they read in °C or °F (components.Finding.Text).
func (s Site) Findings() components.Findings {
	var out components.Findings
	if s.MaxRunning > MaxPumpInlet {
		out = append(out, components.NewFinding(components.Caution, components.HotSurface, TopicInletTemperature,
			components.StandardRule("ISO 4413:2010, fluid temperature at the pump inlet"),
			"Oil running at %v is above the %v pump inlet limit: add cooling or confirm the pump maker's limit, and guard against burns from hot oil, tank and lines.",
			s.MaxRunning, MaxPumpInlet))
	}
	if s.MinStart < freezing {
		out = append(out, components.NewFinding(components.Caution, components.ColdStart, TopicColdStart,
			components.PracticeRule("warm-up before full load below 0 °C"),
			"A start at %v needs a warm-up at low speed and pressure before full load, against pump cavitation and seal damage.",
			s.MinStart))
	}
	return out
}

// MinTemperatureMargin is the least distance, in kelvins, between a site's
// temperatures and those at which a grade reaches the window's limits,
// below which SelectGrades adds a finding to the candidate: 5 K. Our choice:
// a site's stated temperatures are estimates, tank and pump inlet differ by
// a few kelvins, and pump makers state their viscosity limits to one or two
// figures, so a grade closer than that to a limit may meet it in service.
const MinTemperatureMargin = 5 * units.DeltaKelvin

// Candidate is one grade that suits a site, with the figures behind it.
// Viscosities are worst cases: the cold start uses the grade's upper limit
// at 40 °C (Grade.Max), the hot running its lower limit (Grade.Min).
type Candidate struct {
	Grade Grade
	// Start holds the viscosity at Site.MinStart (from Grade.Max) against
	// the window's cold-start maximum (at most).
	Start components.Check[units.KinematicViscosity]
	// Running holds the viscosity at Site.MaxRunning (from Grade.Min)
	// against the window's permissible minimum (at least).
	Running components.Check[units.KinematicViscosity]
	// ColdMargin is Site.MinStart less the coldest start the grade allows
	// (where it reaches the window's Max); HotMargin the hottest running
	// it allows (where it thins to the window's Min) less Site.MaxRunning.
	ColdMargin, HotMargin units.TemperatureDifference
	// RunsInOptimum: the running viscosity lies in the optimum band.
	RunsInOptimum bool
	// Findings: a margin under MinTemperatureMargin (TopicColdMargin,
	// TopicHotMargin) and a running viscosity outside the optimum band
	// (TopicAboveOptimum, TopicBelowOptimum). The site's own findings are
	// Site.Findings.
	Findings components.Findings
}

// selectable are the grades SelectGrades considers: the usual hydraulic
// range, VG 10 to VG 150.
var selectable = [...]Grade{VG10, VG15, VG22, VG32, VG46, VG68, VG100, VG150}

// SelectGrades returns the ISO 3448 grades (VG 10 to VG 150, the usual
// hydraulic range) of an oil with viscosity index vi whose viscosity stays
// in window w from the site's minimum start temperature to its maximum
// running temperature, best first.
//
// Each grade is taken at its ±10 % limits (worst case) and its curve built
// by CurveFromVI. A grade suits when ν(MinStart) ≤ w.Max at its upper limit
// and ν(MaxRunning) ≥ w.Min at its lower limit. Ranking: grades whose
// running viscosity lies in the optimum band first, then the larger of the
// smaller temperature margin (the most balanced grade). A candidate within
// MinTemperatureMargin of either limit carries a finding.
//
// When no grade suits, the error is a *SelectError matching ErrNoGrade and
// units.ErrRange that names the grade missing by the fewest kelvins and by
// how much each end misses: a wider-VI fluid, a pre-heater or a cooler is
// needed. Cold starts below the window need a warm-up procedure at low speed
// and pressure; see ISO 4413 and Site.Findings.
//
// MinStart must be above 0 K, MaxRunning above MinStart, vi from −100 to 400
// and w must pass Window.Validate (errors name w.Min, …).
func SelectGrades(s Site, vi float64, w Window) ([]Candidate, error) {
	const fn = "fluid.SelectGrades"
	if err := checkTemperature(fn, "MinStart", s.MinStart); err != nil {
		return nil, err
	}
	if err := validate.Above(fn, "MaxRunning", s.MaxRunning, s.MinStart); err != nil {
		return nil, err
	}
	if err := validate.InRange(fn, "vi", vi, minSelectVI, maxSelectVI); err != nil {
		return nil, err
	}
	if err := w.validate(fn, "w."); err != nil {
		return nil, err
	}
	rules := rulesOf(w)
	var out []Candidate
	miss := &SelectError{Site: s, VI: vi}
	least := math.Inf(1)
	for _, g := range selectable {
		f, ok := fit(g, s, vi, w)
		if !ok {
			continue
		}
		if c := f.candidate(s, w, rules); c.Start.OK() && c.Running.OK() {
			out = append(out, c)
			continue
		}
		cold, hot := max(-f.coldMargin, 0), max(-f.hotMargin, 0)
		if total := float64(cold + hot); total < least {
			least, miss.Nearest, miss.ColdMiss, miss.HotMiss = total, g, cold, hot
		}
	}
	if len(out) == 0 {
		return nil, miss
	}
	slices.SortStableFunc(out, func(a, b Candidate) int {
		if a.RunsInOptimum != b.RunsInOptimum {
			if a.RunsInOptimum {
				return -1
			}
			return 1
		}
		return cmp.Compare(b.minMargin(), a.minMargin())
	})
	return out, nil
}

func (c Candidate) minMargin() units.TemperatureDifference { return min(c.ColdMargin, c.HotMargin) }

// windowRules are where a window's limits come from.
type windowRules struct{ max, min, optimum components.Rule }

// rulesOf returns common practice for DefaultWindow and the caller's
// fields otherwise.
func rulesOf(w Window) windowRules {
	if w == DefaultWindow() {
		return windowRules{
			max:     components.PracticeRule("pump cold-start maximum 1000 mm²/s (DefaultWindow)"),
			min:     components.PracticeRule("pump permissible minimum 10 mm²/s (DefaultWindow)"),
			optimum: components.PracticeRule("pump optimum band 16–36 mm²/s (DefaultWindow)"),
		}
	}
	return windowRules{
		max: components.CallerRule("w.Max"), min: components.CallerRule("w.Min"),
		optimum: components.CallerRule("w.OptimumLow, w.OptimumHigh"),
	}
}

// gradeFit is a grade's worst-case curves and its margins to a site.
type gradeFit struct {
	g                     Grade
	thick, thin           Curve // at Grade.Max and Grade.Min
	coldMargin, hotMargin units.TemperatureDifference
}

// fit evaluates grade g; ok is false when the VI cannot be reached at this
// grade.
func fit(g Grade, s Site, vi float64, w Window) (gradeFit, bool) {
	thick, err1 := CurveFromVI(g.Max(), vi)
	thin, err2 := CurveFromVI(g.Min(), vi)
	if err1 != nil || err2 != nil {
		return gradeFit{}, false
	}
	cold := thick.temperatureAt(w.Max.SquareMillimetresPerSecond())
	hot := thin.temperatureAt(w.Min.SquareMillimetresPerSecond())
	return gradeFit{g: g, thick: thick, thin: thin, coldMargin: s.MinStart.Sub(cold), hotMargin: hot.Sub(s.MaxRunning)}, true
}

// candidate returns the grade's checks and findings; a check that fails
// (or a viscosity off the curve) means the grade does not suit.
func (f gradeFit) candidate(s Site, w Window, r windowRules) Candidate {
	start, err1 := f.thick.At(s.MinStart)
	run, err2 := f.thin.At(s.MaxRunning)
	if err1 != nil {
		start = units.KinematicViscosity(math.Inf(1)) // colder than the curve: thicker than any limit
	}
	if err2 != nil {
		run = 0 // hotter than the curve: thinner than any limit
	}
	c := Candidate{
		Grade:         f.g,
		Start:         components.Within(start, w.Max, r.max),
		Running:       components.Reaches(run, w.Min, r.min),
		ColdMargin:    f.coldMargin,
		HotMargin:     f.hotMargin,
		RunsInOptimum: run >= w.OptimumLow && run <= w.OptimumHigh,
	}
	if c.Start.OK() && c.Running.OK() {
		c.Findings = c.findings(s, w, r)
	}
	return c
}

// findings says what a designer should know of a suitable grade.
func (c Candidate) findings(s Site, w Window, r windowRules) components.Findings {
	var out components.Findings
	margin := components.OurRule("temperature margin of at least 5 K to a viscosity limit (MinTemperatureMargin)")
	if c.ColdMargin < MinTemperatureMargin {
		out = append(out, components.NewFinding(components.Caution, components.ColdStart, TopicColdMargin, margin,
			"The %v start is only %v above the temperature at which %v reaches the cold-start limit of %v.",
			s.MinStart, c.ColdMargin, c.Grade, w.Max))
	}
	if c.HotMargin < MinTemperatureMargin {
		out = append(out, components.NewFinding(components.Caution, components.NoHazard, TopicHotMargin, margin,
			"The %v running temperature is only %v below the temperature at which %v thins to the minimum of %v.",
			s.MaxRunning, c.HotMargin, c.Grade, w.Min))
	}
	run := c.Running.Value
	switch {
	case run > w.OptimumHigh:
		out = append(out, components.NewFinding(components.Notice, components.NoHazard, TopicAboveOptimum, r.optimum,
			"At %v running, %v is at %v, above the optimum band of %v to %v: expect more pressure loss and heat.",
			s.MaxRunning, c.Grade, run, w.OptimumLow, w.OptimumHigh))
	case run < w.OptimumLow:
		out = append(out, components.NewFinding(components.Notice, components.NoHazard, TopicBelowOptimum, r.optimum,
			"At %v running, %v is at %v, below the optimum band of %v to %v: expect more leakage and wear.",
			s.MaxRunning, c.Grade, run, w.OptimumLow, w.OptimumHigh))
	}
	return out
}

// SelectError reports that no grade suits a site, and how close the nearest
// came. It unwraps to ErrNoGrade and to a *units.RangeError naming the site
// s, so it matches units.ErrRange.
type SelectError struct {
	Site Site
	VI   float64
	// Nearest is the grade that misses the duty by the fewest kelvins in
	// all, or 0 when no grade VG 10–150 can have this VI.
	Nearest Grade
	// ColdMiss is how far Site.MinStart lies below the coldest start
	// Nearest allows (0 when its cold end holds); HotMiss how far
	// Site.MaxRunning lies above the hottest running it allows (0 when its
	// hot end holds).
	ColdMiss, HotMiss units.TemperatureDifference
}

// Error implements the error interface.
func (e *SelectError) Error() string {
	s := "fluid.SelectGrades: no grade VG 10–150 of VI " + strconv.FormatFloat(e.VI, 'f', -1, 64) +
		" stays in the viscosity window from " + e.Site.MinStart.String() + " start to " +
		e.Site.MaxRunning.String() + " running"
	switch {
	case e.Nearest == 0:
		s += "; none of them can have this VI"
	default:
		s += "; the nearest, " + e.Nearest.String() + ", misses"
		if e.ColdMiss > 0 {
			s += " the start by " + e.ColdMiss.String()
		}
		if e.ColdMiss > 0 && e.HotMiss > 0 {
			s += " and"
		}
		if e.HotMiss > 0 {
			s += " the running by " + e.HotMiss.String()
		}
	}
	return s + ": " + ErrNoGrade.Error()
}

// Unwrap returns ErrNoGrade and the range error for the site.
func (e *SelectError) Unwrap() []error {
	return []error{ErrNoGrade, &units.RangeError{Func: "fluid.SelectGrades", Param: "s",
		Value: e.Site.MinStart.String() + " to " + e.Site.MaxRunning.String(),
		Valid: "a duty that one grade VG 10–150 of VI " + strconv.FormatFloat(e.VI, 'f', -1, 64) + " spans in the window"}}
}
