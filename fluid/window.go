package fluid

import (
	"cmp"
	"math"
	"slices"
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Window is the band of kinematic viscosity a pump (or a circuit) accepts:
// Min is the permissible minimum (hot, thin oil), Max the cold-start maximum,
// and OptimumLow to OptimumHigh the range for efficient running. Pump makers'
// limits differ; use theirs where known.
type Window struct {
	Min, OptimumLow, OptimumHigh, Max units.KinematicViscosity
}

// DefaultWindow returns the common-practice window for hydraulic pumps:
// permissible minimum 10 mm²/s, optimum 16–36 mm²/s, cold-start maximum
// 1000 mm²/s (common practice; gear, vane and piston pump makers state their
// own figures, which govern).
func DefaultWindow() Window {
	return Window{Min: mm2s(10), OptimumLow: mm2s(16), OptimumHigh: mm2s(36), Max: mm2s(1000)}
}

// Validate checks MinViscosity ≤ Min ≤ OptimumLow < OptimumHigh ≤ Max ≤ MaxViscosity.
func (w Window) Validate() error {
	const fn = "fluid.Window"
	if err := validate.InRange(fn, "Min", w.Min, MinViscosity, MaxViscosity); err != nil {
		return err
	}
	if err := validate.InRange(fn, "OptimumLow", w.OptimumLow, w.Min, MaxViscosity); err != nil {
		return err
	}
	if err := validate.Above(fn, "OptimumHigh", w.OptimumHigh, w.OptimumLow); err != nil {
		return err
	}
	return validate.InRange(fn, "Max", w.Max, w.OptimumHigh, MaxViscosity)
}

// Span is the temperature range over which a fluid's viscosity stays in a
// Window. Cold is where ν = Max (the coldest start), Hot where ν = Min (the
// hottest running); OptimumFrom and OptimumTo bound the optimum band
// (ν = OptimumHigh and ν = OptimumLow).
type Span struct {
	Cold, OptimumFrom, OptimumTo, Hot units.Temperature
}

// Span returns the temperatures at which the curve crosses the window's
// viscosities (Curve.TemperatureFor at each).
func (c Curve) Span(w Window) (Span, error) {
	if err := w.Validate(); err != nil {
		return Span{}, err
	}
	if c.b <= 0 {
		return Span{}, c.rangeError("fluid.Curve.Span", "curve", 0)
	}
	at := func(v units.KinematicViscosity) units.Temperature {
		return c.temperatureAt(v.SquareMillimetresPerSecond())
	}
	return Span{Cold: at(w.Max), OptimumFrom: at(w.OptimumHigh), OptimumTo: at(w.OptimumLow), Hot: at(w.Min)}, nil
}

// Site is the temperature duty of a machine: the lowest oil temperature at
// which it must start and the highest at which it runs.
type Site struct {
	MinStart, MaxRunning units.Temperature
}

// MaxPumpInlet is the highest oil temperature at a pump inlet that ISO 4413
// (general rules and safety requirements for hydraulic systems) accepts:
// 60 °C = 333.15 K. A pump maker's own limit may be lower and then governs.
const MaxPumpInlet units.Temperature = 333.15

// Cautions returns what a designer should be told about the site's duty,
// for display beside the chosen grade: running hotter than MaxPumpInlet
// (ISO 4413) ages the oil, thins it towards the pump's minimum and makes
// tank, lines and oil hot enough to burn; a start below 0 °C needs a
// warm-up at low speed and pressure before full load (common practice).
// Nil when there is nothing to say.
func (s Site) Cautions() []string {
	var out []string
	if s.MaxRunning > MaxPumpInlet {
		out = append(out, "running oil at "+s.MaxRunning.String()+" is above the "+MaxPumpInlet.String()+
			" pump inlet limit of ISO 4413: add cooling or confirm the pump maker's limit; hot oil and surfaces burn")
	}
	if s.MinStart < units.TemperatureFromCelsius(0) {
		out = append(out, "starting at "+s.MinStart.String()+
			": warm the oil at low speed and pressure before full load (cavitation and seal risk on a cold start)")
	}
	return out
}

// Candidate is one grade that suits a site, with the figures behind it.
// Viscosities are worst cases: the cold start uses the grade's upper limit
// at 40 °C (Grade.Max), the hot running its lower limit (Grade.Min).
type Candidate struct {
	Grade         Grade
	AtStart       units.KinematicViscosity    // at Site.MinStart, from Grade.Max
	AtRunning     units.KinematicViscosity    // at Site.MaxRunning, from Grade.Min
	ColdMargin    units.TemperatureDifference // Site.MinStart − coldest start allowed
	HotMargin     units.TemperatureDifference // hottest running allowed − Site.MaxRunning
	RunsInOptimum bool                        // AtRunning within the optimum band
	Reason        string                      // one line that says why
}

// SelectGrades returns the ISO 3448 grades (VG 10 to VG 150, the usual
// hydraulic range) of an oil with viscosity index vi whose viscosity stays
// in window w from the site's minimum start temperature to its maximum
// running temperature, best first.
//
// Each grade is taken at its ±10 % limits (worst case) and its curve built
// by CurveFromVI. A grade suits when ν(MinStart) ≤ w.Max at its upper limit
// and ν(MaxRunning) ≥ w.Min at its lower limit. Ranking: grades whose
// running viscosity lies in the optimum band first, then the larger of the
// smaller temperature margin (the most balanced grade). When no grade
// suits, the error matches ErrNoGrade: a wider-VI fluid, a pre-heater or a
// cooler is needed. Cold starts below the window need a warm-up procedure
// at low speed and pressure; see ISO 4413.
func SelectGrades(s Site, vi float64, w Window) ([]Candidate, error) {
	const fn = "fluid.SelectGrades"
	if err := checkTemperature(fn, "MinStart", s.MinStart); err != nil {
		return nil, err
	}
	if err := validate.Above(fn, "MaxRunning", s.MaxRunning, s.MinStart); err != nil {
		return nil, err
	}
	if err := validate.InRange(fn, "vi", vi, -100, 400); err != nil {
		return nil, err
	}
	if err := w.Validate(); err != nil {
		return nil, err
	}
	var out []Candidate
	for _, g := range []Grade{VG10, VG15, VG22, VG32, VG46, VG68, VG100, VG150} {
		c, ok := candidate(g, s, vi, w)
		if ok {
			out = append(out, c)
		}
	}
	if len(out) == 0 {
		return nil, &SelectError{Site: s, VI: vi}
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

// candidate evaluates grade g; ok is false when it does not suit or when the
// VI cannot be reached at this grade.
func candidate(g Grade, s Site, vi float64, w Window) (Candidate, bool) {
	thick, err1 := CurveFromVI(g.Max(), vi)
	thin, err2 := CurveFromVI(g.Min(), vi)
	if err1 != nil || err2 != nil {
		return Candidate{}, false
	}
	start, err1 := thick.At(s.MinStart)
	run, err2 := thin.At(s.MaxRunning)
	if err1 != nil || err2 != nil || start > w.Max || run < w.Min {
		return Candidate{}, false
	}
	cold := thick.temperatureAt(w.Max.SquareMillimetresPerSecond())
	hot := thin.temperatureAt(w.Min.SquareMillimetresPerSecond())
	c := Candidate{
		Grade: g, AtStart: start, AtRunning: run,
		ColdMargin:    s.MinStart.Sub(cold),
		HotMargin:     hot.Sub(s.MaxRunning),
		RunsInOptimum: run >= w.OptimumLow && run <= w.OptimumHigh,
	}
	c.Reason = c.reason(w)
	return c, true
}

func (c Candidate) reason(w Window) string {
	b := []byte(c.Grade.String())
	b = appendEnd(b, ": start ", c.AtStart, " (max ", w.Max, c.ColdMargin)
	b = appendEnd(b, ", running ", c.AtRunning, " (min ", w.Min, c.HotMargin)
	if c.RunsInOptimum {
		b = append(b, "; running viscosity in the optimum band"...)
	} else if c.AtRunning > w.OptimumHigh {
		b = append(b, "; running viscosity above the optimum band (more loss)"...)
	} else {
		b = append(b, "; running viscosity below the optimum band (more leakage and wear)"...)
	}
	return string(b)
}

// appendEnd appends one end of the duty: "<what>ν (<bound>limit, m K margin)".
func appendEnd(b []byte, what string, v units.KinematicViscosity, bound string, limit units.KinematicViscosity, margin units.TemperatureDifference) []byte {
	b = append(b, what...)
	b = v.Append(b)
	b = append(b, bound...)
	b = limit.Append(b)
	b = append(b, ", "...)
	b = appendK(b, margin)
	return append(b, " K margin)"...)
}

func appendK(b []byte, d units.TemperatureDifference) []byte {
	return strconv.AppendFloat(b, math.Round(d.Kelvin()*10)/10, 'f', 1, 64)
}

// SelectError reports that no grade suits a site. It unwraps to ErrNoGrade.
type SelectError struct {
	Site Site
	VI   float64
}

// Error implements the error interface.
func (e *SelectError) Error() string {
	return "fluid.SelectGrades: no grade VG 10–150 of VI " + strconv.FormatFloat(e.VI, 'f', -1, 64) +
		" stays in the viscosity window from " + e.Site.MinStart.String() + " start to " +
		e.Site.MaxRunning.String() + " running: " + ErrNoGrade.Error()
}

// Unwrap returns ErrNoGrade.
func (e *SelectError) Unwrap() error { return ErrNoGrade }

// Span returns the temperatures at which the fluid's viscosity crosses the
// window's (Curve.Span), with Cold raised to the pour point when the curve
// would allow a colder start: below its pour point an oil does not flow as
// the curve says, whatever its viscosity. The pour point is a bound, not a
// safe start temperature; the pump maker's cold-start limit governs.
func (f Fluid) Span(w Window) (Span, error) {
	s, err := f.Curve.Span(w)
	if err != nil {
		return Span{}, err
	}
	if f.PourPoint > 0 && s.Cold < f.PourPoint {
		s.Cold = f.PourPoint
	}
	return s, nil
}
