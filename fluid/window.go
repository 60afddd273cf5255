package fluid

import (
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

// Validate checks MinViscosity ≤ Min ≤ OptimumLow < OptimumHigh ≤ Max ≤
// MaxViscosity; errors match units.ErrRange and name the field.
func (w Window) Validate() error { return w.validate("fluid.Window.Validate", "") }

// validate is Validate for function fn, naming the fields prefix+field
// ("w.Min" when the window is a caller's argument w).
func (w Window) validate(fn, prefix string) error {
	if err := validate.InRange(fn, prefix+"Min", w.Min, MinViscosity, MaxViscosity); err != nil {
		return err
	}
	if err := validate.InRange(fn, prefix+"OptimumLow", w.OptimumLow, w.Min, MaxViscosity); err != nil {
		return err
	}
	if err := validate.Above(fn, prefix+"OptimumHigh", w.OptimumHigh, w.OptimumLow); err != nil {
		return err
	}
	return validate.InRange(fn, prefix+"Max", w.Max, w.OptimumHigh, MaxViscosity)
}

// Span is the temperature range over which a fluid's viscosity stays in a
// Window. Cold is where ν = Max (the coldest start), Hot where ν = Min (the
// hottest running); OptimumFrom and OptimumTo bound the optimum band
// (ν = OptimumHigh and ν = OptimumLow). A Span returned without an error is
// finite and in order: Cold ≤ OptimumFrom ≤ OptimumTo ≤ Hot and Cold < Hot
// (the optimum band is empty, OptimumFrom = OptimumTo, only when Fluid.Span
// raised both ends to the pour point).
type Span struct {
	Cold, OptimumFrom, OptimumTo, Hot units.Temperature
}

// Span returns the temperatures at which the curve crosses the window's
// viscosities (Curve.TemperatureFor at each). The window must pass
// Window.Validate (errors name w.Min, …), and the curve must be one built by
// CurveThrough, NewCurve or CurveFromVI.
func (c Curve) Span(w Window) (Span, error) { return c.span("fluid.Curve.Span", w) }

func (c Curve) span(fn string, w Window) (Span, error) {
	if err := w.validate(fn, "w."); err != nil {
		return Span{}, err
	}
	if c.b <= 0 {
		return Span{}, c.rangeError(fn, "curve", 0)
	}
	at := func(v units.KinematicViscosity) units.Temperature {
		return c.temperatureAt(v.SquareMillimetresPerSecond())
	}
	return Span{Cold: at(w.Max), OptimumFrom: at(w.OptimumHigh), OptimumTo: at(w.OptimumLow), Hot: at(w.Min)}, nil
}

// Span returns the temperatures at which the fluid's viscosity crosses the
// window's (Curve.Span), each raised to the pour point where the curve
// would put it below: below its pour point an oil does not flow as the curve
// says, whatever its viscosity. So Cold is the pour point when the curve
// alone would allow a colder start, and the optimum band starts no lower
// than the pour point. The pour point is a bound, not a safe start
// temperature; the pump maker's cold-start limit governs.
//
// When the pour point lies at or above Hot (the fluid thins below w.Min
// before it even flows) the span is empty and the error, matching
// units.ErrRange, names w.Min.
func (f Fluid) Span(w Window) (Span, error) {
	const fn = "fluid.Fluid.Span"
	s, err := f.curve.span(fn, w)
	if err != nil {
		return Span{}, err
	}
	pp := f.pourPoint
	if pp <= 0 {
		return s, nil
	}
	if pp >= s.Hot {
		nu, _ := f.curve.At(pp)
		return Span{}, validate.Fail(fn, "w.Min", w.Min,
			"at most "+nu.String()+", the viscosity at the pour point "+pp.String()+" (below it the fluid does not flow)")
	}
	s.Cold, s.OptimumFrom, s.OptimumTo = max(s.Cold, pp), max(s.OptimumFrom, pp), max(s.OptimumTo, pp)
	return s, nil
}
