package main

import (
	"bytes"
	"errors"
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/units"
)

// config is what the monitor is told before the first line.
type config struct {
	fluid  fluid.Fluid
	window fluid.Window
	target contamination.Code
	bypass units.Pressure // the filter's bypass valve setting
	watch  float64        // share of the bypass setting at which a loading filter is flagged
	temp   linear         // the temperature column's unit
	dp     linear         // the pressure-drop column's unit
	out    units.System   // the units lines are printed in
}

// linear converts a column's number to SI: si = offset + scale·x, found
// once from the unit's spelling ("°C", "°F", "bar", "psi").
type linear struct{ offset, scale float64 }

func (l linear) si(x float64) float64 { return l.offset + l.scale*x }

// temperatureUnit finds the linear map of a temperature unit by reading
// "0 unit" and "1 unit" through units.ParseTemperature.
func temperatureUnit(unit string) (linear, error) {
	t0, err := units.ParseTemperature("0 " + unit)
	if err != nil {
		return linear{}, err
	}
	t1, err := units.ParseTemperature("1 " + unit)
	if err != nil {
		return linear{}, err
	}
	return linear{offset: float64(t0), scale: float64(t1 - t0)}, nil
}

// pressureUnit finds the factor of a gauge pressure unit through
// units.ParsePressure.
func pressureUnit(unit string) (linear, error) {
	p, err := units.ParsePressure("1 " + unit)
	if err != nil {
		return linear{}, err
	}
	return linear{scale: float64(p)}, nil
}

// reading is one line of the log.
type reading struct {
	stamp  []byte            // the first column, echoed as it is
	counts [3]float64        // particles per mL at ≥4, ≥6, ≥14 µm(c)
	temp   units.Temperature // oil temperature
	dp     units.Pressure    // pressure drop across the filter
}

// errColumns reports a line without six columns.
var errColumns = errors.New("want 6 columns: stamp, ≥4, ≥6 and ≥14 µm(c) counts per mL, oil temperature, filter Δp")

// parse reads one line: six comma-separated columns. It does not allocate
// unless the line is bad.
func (c *config) parse(line []byte) (reading, error) {
	var r reading
	var cols [6][]byte
	for n := 0; ; n++ {
		i := bytes.IndexByte(line, ',')
		if i < 0 {
			if n != len(cols)-1 {
				return r, errColumns
			}
			cols[n] = line
			break
		}
		if n == len(cols)-1 {
			return r, errColumns
		}
		cols[n], line = line[:i], line[i+1:]
	}
	r.stamp = bytes.TrimSpace(cols[0])
	var x [5]float64
	for i := range x {
		v, err := strconv.ParseFloat(string(bytes.TrimSpace(cols[i+1])), 64)
		if err != nil {
			return r, &columnError{col: i + 2, err: err}
		}
		if math.IsNaN(v) || math.IsInf(v, 0) {
			return r, &columnError{col: i + 2, err: errNotFinite}
		}
		x[i] = v
	}
	r.counts = [3]float64{x[0], x[1], x[2]}
	r.temp = units.Temperature(c.temp.si(x[3]))
	r.dp = units.Pressure(c.dp.si(x[4]))
	switch {
	case !(r.temp >= 0) || math.IsInf(float64(r.temp), 0):
		return r, &columnError{col: 5, err: errColdest}
	case !(r.dp >= 0) || math.IsInf(float64(r.dp), 0):
		return r, &columnError{col: 6, err: errNegativeDrop}
	}
	return r, nil
}

// Values no sample can have.
var (
	errNotFinite    = errors.New("want a finite number")
	errColdest      = errors.New("want a temperature above absolute zero")
	errNegativeDrop = errors.New("want a pressure drop of 0 or more")
)

// columnError reports a column that is not a number.
type columnError struct {
	col int
	err error
}

func (e *columnError) Error() string { return "column " + strconv.Itoa(e.col) + ": " + e.err.Error() }
func (e *columnError) Unwrap() error { return e.err }

// monitor judges readings against the configuration. Comparisons with the
// target are kept per code, so that a code seen before costs no allocation
// (contamination.Compare allocates the findings of a code over target).
type monitor struct {
	config
	seen    map[contamination.Code]contamination.Comparison
	scratch []byte                   // a line's reasons, reused
	refNu   units.KinematicViscosity // the viscosity Δp is referred to: the fluid's at 40 °C
	alarms  int                      // lines with an alarm
	lines   int                      // lines judged
}

// mostCodes bounds the comparisons kept; codes beyond it are compared
// afresh each time.
const mostCodes = 4096

func newMonitor(c config) *monitor {
	return &monitor{config: c, seen: map[contamination.Code]contamination.Comparison{}, refNu: c.fluid.V40()}
}

// compare returns the comparison of code with the target.
func (m *monitor) compare(code contamination.Code) (contamination.Comparison, error) {
	if r, ok := m.seen[code]; ok {
		return r, nil
	}
	r, err := contamination.Compare(code, m.target)
	if err == nil && len(m.seen) < mostCodes {
		m.seen[code] = r
	}
	return r, err
}

// judge appends the line for reading r to out: stamp, ISO 4406 code,
// viscosity at the oil temperature, filter Δp and what it comes to, then
// the verdict and its reasons. It does not allocate once the reading's code
// has been seen.
func (m *monitor) judge(out []byte, r reading) ([]byte, error) {
	code, err := contamination.CodeFromCounts(r.counts[0], r.counts[1], r.counts[2])
	if err != nil {
		return out, err
	}
	cmp, err := m.compare(code)
	if err != nil {
		return out, err
	}
	nu, nuErr := m.fluid.Viscosity(r.temp)

	out = append(out, r.stamp...)
	out = append(out, "  "...)
	out, _ = code.AppendText(out) // a code from counts is always valid
	out = append(out, "  "...)
	out = m.out.AppendTemperature(out, r.temp)
	out = append(out, "  ν "...)
	if nuErr == nil {
		out = m.out.AppendKinematicViscosity(out, nu)
	} else {
		out = append(out, '-')
	}
	out = append(out, "  Δp "...)
	out = m.out.AppendPressure(out, r.dp)
	ref, refOK := m.referred(r.dp, nu, nuErr)
	if refOK {
		out = append(out, " ("...)
		out = m.out.AppendPressure(out, ref)
		out = append(out, " at 40 °C)"...)
	}

	v := verdict{reasons: m.scratch[:0]}
	m.codeReasons(&v, cmp)
	m.viscosityReasons(&v, nu, nuErr)
	m.filterReasons(&v, r.dp, ref, refOK)
	out = append(out, "  "...)
	out = append(out, levelWords[v.level]...)
	if v.any {
		out = append(out, ": "...)
		out = append(out, v.reasons...)
	}
	m.scratch = v.reasons[:0]
	m.lines++
	if v.level == levelAlarm {
		m.alarms++
	}
	return append(out, '\n'), nil
}

// referred returns the Δp the element would show at the fluid's 40 °C
// viscosity, through the laminar element scaling of
// contamination.CleanDrop (Δp ∝ ν at one flow), so that a loading trend
// shows through warm-up. Not when Δp is 0 or the viscosity is unknown.
func (m *monitor) referred(dp units.Pressure, nu units.KinematicViscosity, nuErr error) (units.Pressure, bool) {
	if nuErr != nil || dp <= 0 {
		return 0, false
	}
	const q = units.LitrePerMinute // any flow: it is the same at both viscosities
	ref, err := contamination.CleanDrop(contamination.ElementPoint{Drop: dp, Flow: q, Viscosity: nu}, q, m.refNu)
	return ref, err == nil
}

// Verdict levels, least to most pressing, and their words.
const (
	levelOK = iota
	levelWatch
	levelAlarm
)

var levelWords = [...]string{"ok", "watch", "ALARM"}

// verdict gathers a line's level and its reasons. The reasons grow in the
// monitor's scratch buffer, reused line after line.
type verdict struct {
	level   int
	any     bool
	reasons []byte
}

// raise starts a reason at level and returns the reasons to append it to.
func (v *verdict) raise(level int) []byte {
	if v.any {
		v.reasons = append(v.reasons, "; "...)
	}
	v.any = true
	v.level = max(v.level, level)
	return v.reasons
}

// codeReasons names the sizes over the target, with how many scale numbers
// over: "over target 18/16/13 at ≥4 µm(c) +1, ≥6 µm(c) +1".
func (m *monitor) codeReasons(v *verdict, cmp contamination.Comparison) {
	first := true
	for i := range cmp.Form.Len() {
		sc := cmp.Sizes[i]
		if sc.Status != contamination.Over {
			continue
		}
		var b []byte
		if first {
			b = append(v.raise(levelAlarm), "over target "...)
			b, _ = m.target.AppendText(b)
			b = append(b, " at "...)
			first = false
		} else {
			b = append(v.reasons, ", "...)
		}
		b = append(b, sc.Size...)
		b = append(b, " +"...)
		v.reasons = strconv.AppendInt(b, int64(sc.Classes), 10)
	}
}

func (m *monitor) viscosityReasons(v *verdict, nu units.KinematicViscosity, nuErr error) {
	w := m.window
	switch {
	case nuErr != nil:
		v.reasons = append(v.raise(levelAlarm), "no viscosity at this temperature (below the pour point or off the curve)"...)
	case nu > w.Max:
		v.reasons = m.out.AppendKinematicViscosity(append(v.raise(levelAlarm), "oil too cold: viscosity above the pump's "...), w.Max)
	case nu < w.Min:
		v.reasons = m.out.AppendKinematicViscosity(append(v.raise(levelAlarm), "oil too hot: viscosity below the pump's "...), w.Min)
	case nu > w.OptimumHigh:
		v.reasons = m.out.AppendKinematicViscosity(append(v.raise(levelWatch), "oil cool: viscosity above the optimum "...), w.OptimumHigh)
	case nu < w.OptimumLow:
		v.reasons = m.out.AppendKinematicViscosity(append(v.raise(levelWatch), "oil warm: viscosity below the optimum "...), w.OptimumLow)
	}
}

// filterReasons holds Δp against the bypass setting, and the Δp referred
// to 40 °C oil against the watch share: a loaded element that a cold start
// would put in bypass.
func (m *monitor) filterReasons(v *verdict, dp, ref units.Pressure, refOK bool) {
	switch share := float64(dp / m.bypass); {
	case share >= 1:
		b := append(v.raise(levelAlarm), "filter in bypass: Δp at or above the "...)
		v.reasons = append(m.out.AppendPressure(b, m.bypass), " setting, oil passes unfiltered"...)
	case share >= m.watch:
		b := append(v.raise(levelWatch), "filter loading: Δp at "...)
		b = strconv.AppendInt(b, int64(share*100), 10)
		b = append(b, " % of the "...)
		v.reasons = append(m.out.AppendPressure(b, m.bypass), " bypass setting"...)
	case refOK && float64(ref/m.bypass) >= m.watch:
		b := append(v.raise(levelWatch), "filter loading: in 40 °C oil Δp would be "...)
		b = strconv.AppendInt(b, int64(float64(ref/m.bypass)*100), 10)
		b = append(b, " % of the "...)
		v.reasons = append(m.out.AppendPressure(b, m.bypass), " bypass setting"...)
	}
}
