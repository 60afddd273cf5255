package hydro

import (
	"errors"
	"math"
	"slices"
	"strconv"
	"strings"
	"time"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Validate checks the whole spec and returns nil, or a *[SpecError] that
// lists every problem, each a *[FieldError] with its JSON path and what
// would be valid, matching units.ErrRange (missing, out of range, or
// contradicting another field). [Size] validates first; call Validate to
// check a spec without sizing it.
func (s Spec) Validate() error {
	_, err := s.validated()
	return err
}

// validated validates s and returns the fluid its check built, which the
// sizing takes rather than building it again.
func (s Spec) validated() (fluid.Fluid, error) {
	var ps problems
	fl := s.check(&ps)
	if err := ps.err(); err != nil {
		return fluid.Fluid{}, err
	}
	return fl, nil
}

// check adds every problem of s to ps, and returns the fluid it built.
func (s Spec) check(ps *problems) fluid.Fluid {
	names := s.checkActuators(ps)
	s.Cycle.check(ps, s.Actuators, names)
	s.Supply.check(ps)
	s.Site.check(ps)
	fl := s.Fluid.check(ps)
	s.Cleanliness.check(ps)
	s.Circuit.check(ps, s.Actuators, names)
	s.Design.check(ps, s.Site, s.Supply)
	oneOf(ps, "units", s.Units, unitSystems)
	return fl
}

// The words a spec's string fields accept; the first is the default where a
// field has one.
var (
	unitSystems  = []string{"metric", "us"}
	kinds        = []string{"cylinder", "motor"}
	orientations = []string{"horizontal", "vertical", "vertical-down", "inclined"}
	mounts       = []string{"clevis", "trunnion", "flange", "feet"}
	rodEnds      = []string{"pinned", "fixed", "free"}
	cylinderDirs = []string{"extend", "retract", "hold"}
	motorDirs    = []string{"forward", "reverse", "hold"}
	centers      = []string{"tandem", "open", "closed", "float"}
	pumps        = []string{"gear", "vane", "piston", "variable piston"}
	controls     = []string{"pressure-compensated", "load-sensing"}
	conductors   = []string{"tube", "hose"}
	accumUses    = []string{"none", "cycle", "emergency"}
	boreSeries   = []string{"iso", "inch"}
	motorSeries  = []string{"iec", "nema"}
	fluidClasses = []string{"HM", "HV", "HFC", "HFDU", "HEES"}
)

// oneOf checks that v is empty or one of words.
func oneOf(ps *problems, path, v string, words []string) {
	if v != "" && !slices.Contains(words, v) {
		ps.rangeErr(path, strconv.Quote(v), wordList(words))
	}
}

// wordList writes words as `"a", "b" or "c"`.
func wordList(words []string) string {
	q := make([]string, len(words))
	for i, w := range words {
		q[i] = strconv.Quote(w)
	}
	if len(q) == 1 {
		return q[0]
	}
	return strings.Join(q[:len(q)-1], ", ") + " or " + q[len(q)-1]
}

// add records err (from internal/validate) at its path.
func add(ps *problems, err error) {
	if err == nil {
		return
	}
	var re *units.RangeError
	if errors.As(err, &re) {
		ps.add(re.Param, err)
		return
	}
	ps.add("", err)
}

// positive checks v > 0, or records it as missing when it is 0.
func positive[T ~float64](ps *problems, path string, v T, example string) {
	if v == 0 {
		ps.missing(path, "> 0, such as "+strconv.Quote(example))
		return
	}
	add(ps, validate.Positive(validateFn, path, v))
}

// optional checks v ≥ 0 (0 being "not given").
func optional[T ~float64](ps *problems, path string, v T) {
	add(ps, validate.NonNegative(validateFn, path, v))
}

// unused records a field given where it means nothing.
func unused[T ~float64](ps *problems, path string, v T, why string) {
	if v != 0 {
		ps.rangeErr(path, format(v), "not given: "+why)
	}
}

// format writes v with its unit when it has one.
func format[T ~float64](v T) string {
	if s, ok := any(v).(interface{ String() string }); ok {
		return s.String()
	}
	return strconv.FormatFloat(float64(v), 'g', -1, 64)
}

func (s Spec) checkActuators(ps *problems) map[string]int {
	if len(s.Actuators) == 0 {
		ps.missing("actuators", "at least one actuator, [{\"name\": …, \"kind\": \"cylinder\", …}]")
	}
	names := make(map[string]int, len(s.Actuators))
	for i, a := range s.Actuators {
		p := index("actuators", i)
		switch _, dup := names[a.Name]; {
		case a.Name == "":
			ps.missing(p+".name", "a name the cycle's moves refer to, such as \"press\"")
		case dup:
			ps.rangeErr(p+".name", strconv.Quote(a.Name), "a name no other actuator has")
		default:
			names[a.Name] = i
		}
		a.check(ps, p)
	}
	return names
}

func (a Actuator) check(ps *problems, p string) {
	switch a.Kind {
	case "cylinder":
		a.checkCylinder(ps, p)
	case "motor":
		a.checkMotor(ps, p)
	case "":
		ps.missing(p+".kind", wordList(kinds))
	default:
		oneOf(ps, p+".kind", a.Kind, kinds)
	}
	optional(ps, p+".line_length", a.LineLength)
}

func (a Actuator) checkCylinder(ps *problems, p string) {
	positive(ps, p+".stroke", a.Stroke, "800 mm")
	optional(ps, p+".moving_mass", a.Mass)
	add(ps, validate.InRange(validateFn, p+".guide_friction", a.Friction, 0, 1))
	oneOf(ps, p+".orientation", a.Orientation, orientations)
	if a.Orientation == "inclined" {
		add(ps, validate.InRange(validateFn, p+".incline_deg", a.InclineDegrees, -90, 90))
	} else {
		unused(ps, p+".incline_deg", a.InclineDegrees, "the incline is for orientation \"inclined\"")
	}
	oneOf(ps, p+".mount", a.Mount, mounts)
	oneOf(ps, p+".rod_end", a.RodEnd, rodEnds)
	if a.RodEnd == "free" && (a.Mount == "" || a.Mount == "clevis" || a.Mount == "trunnion") {
		ps.rangeErr(p+".rod_end", `"free"`, `"pinned" or "fixed" with a clevis or trunnion mount (a pinned body with a free rod end swings), or a "flange" or "feet" mount`)
	}
	optional(ps, p+".retracted_length", a.RetractedLength)
	if a.AreaRatio != 0 {
		add(ps, validate.InRange(validateFn, p+".area_ratio", a.AreaRatio, 1.01, 10))
	}
	unused(ps, p+".breakaway_torque", a.BreakawayTorque, "breakaway torque is for motors")
}

func (a Actuator) checkMotor(ps *problems, p string) {
	const why = "for cylinders only"
	unused(ps, p+".stroke", a.Stroke, "a motor has no stroke; give turns in its moves")
	unused(ps, p+".incline_deg", a.InclineDegrees, why)
	unused(ps, p+".retracted_length", a.RetractedLength, why)
	unused(ps, p+".area_ratio", a.AreaRatio, why)
	unused(ps, p+".moving_mass", a.Mass, "give a motor's load as torque in its moves, and its breakaway_torque")
	unused(ps, p+".guide_friction", a.Friction, "give a motor's load as torque in its moves")
	for _, f := range []struct{ name, v string }{{"orientation", a.Orientation}, {"mount", a.Mount}, {"rod_end", a.RodEnd}} {
		if f.v != "" {
			ps.rangeErr(p+"."+f.name, strconv.Quote(f.v), "not given: "+why)
		}
	}
	optional(ps, p+".breakaway_torque", a.BreakawayTorque)
}

// check checks the cycle against the actuators (names maps a name to its
// index).
func (c Cycle) check(ps *problems, acts []Actuator, names map[string]int) {
	if len(c.Phases) == 0 {
		ps.missing("cycle.phases", "at least one phase, [{\"name\": …, \"moves\": […]}]")
	}
	moved := make([]bool, len(acts))
	seen := map[string]bool{}
	var total time.Duration
	for i, ph := range c.Phases {
		p := index("cycle.phases", i)
		if ph.Name != "" && seen[ph.Name] {
			ps.rangeErr(p+".name", strconv.Quote(ph.Name), "a name no other phase has")
		}
		seen[ph.Name] = true
		total += ph.check(ps, p, acts, names, moved)
	}
	for i, m := range moved {
		if j, ok := names[acts[i].Name]; !m && ok && j == i && len(c.Phases) > 0 {
			ps.rangeErr(index("actuators", i)+".name", strconv.Quote(acts[i].Name), "an actuator that a move of the cycle names")
		}
	}
	if c.CyclesPerHour != 0 {
		add(ps, validate.Positive(validateFn, "cycle.cycles_per_hour", c.CyclesPerHour))
		if c.CyclesPerHour > 0 && total > 0 {
			if most := float64(time.Hour) / float64(total); c.CyclesPerHour > most {
				ps.rangeErr("cycle.cycles_per_hour", format(c.CyclesPerHour),
					"at most "+strconv.FormatFloat(math.Floor(most*10)/10, 'f', -1, 64)+": the phases take "+seconds(total)+" a cycle")
			}
		}
	}
}

// check checks one phase and returns the time it takes (0 when a move's
// time cannot be worked out).
func (ph Phase) check(ps *problems, p string, acts []Actuator, names map[string]int, moved []bool) time.Duration {
	if ph.Dwell < 0 {
		ps.rangeErr(p+".dwell", seconds(ph.Dwell), "≥ 0")
	}
	var longest time.Duration
	holds := false
	inPhase := map[string]bool{}
	for j, m := range ph.Moves {
		mp := index(p+".moves", j)
		if m.Actuator != "" && inPhase[m.Actuator] {
			ps.rangeErr(mp+".actuator", strconv.Quote(m.Actuator), "an actuator not already moving in this phase")
		}
		inPhase[m.Actuator] = true
		i, ok := m.checkActuator(ps, mp, acts, names)
		if !ok {
			continue
		}
		moved[i] = true
		if m.Direction == "hold" {
			holds = true
		}
		longest = max(longest, m.check(ps, mp, acts[i]))
	}
	switch {
	case len(ph.Moves) == 0 && ph.Dwell == 0:
		ps.missing(p+".dwell", "a dwell > 0, such as \"2 s\", for a phase without moves")
	case holds && longest == 0 && ph.Dwell == 0:
		ps.missing(p+".dwell", "a dwell > 0, such as \"3 s\": how long the hold lasts")
	}
	return longest + max(ph.Dwell, 0)
}

// checkActuator checks the move's actuator name and returns its index.
func (m Move) checkActuator(ps *problems, mp string, acts []Actuator, names map[string]int) (int, bool) {
	if m.Actuator == "" {
		ps.missing(mp+".actuator", "the name of an actuator: "+actuatorNames(acts))
		return 0, false
	}
	i, ok := names[m.Actuator]
	if !ok {
		ps.rangeErr(mp+".actuator", strconv.Quote(m.Actuator), "the name of an actuator: "+actuatorNames(acts))
	}
	return i, ok
}

func actuatorNames(acts []Actuator) string {
	var names []string
	for _, a := range acts {
		if a.Name != "" {
			names = append(names, a.Name)
		}
	}
	if len(names) == 0 {
		return "none is named"
	}
	return wordList(names)
}

// check checks a move of actuator a and returns the time it takes (0 for a
// hold, or when it cannot be worked out).
func (m Move) check(ps *problems, mp string, a Actuator) time.Duration {
	switch a.Kind {
	case "cylinder":
		return m.checkCylinder(ps, mp, a)
	case "motor":
		return m.checkMotor(ps, mp)
	}
	return 0
}

func (m Move) checkCylinder(ps *problems, mp string, a Actuator) time.Duration {
	const why = "for motors only"
	unused(ps, mp+".torque", m.Torque, why)
	unused(ps, mp+".shaft_speed", m.ShaftSpeed, why)
	unused(ps, mp+".turns", m.Turns, why)
	optional(ps, mp+".force", m.Force)
	switch m.Direction {
	case "extend", "retract":
	case "hold":
		m.checkHold(ps, mp)
		return 0
	case "":
		ps.missing(mp+".direction", wordList(cylinderDirs))
		return 0
	default:
		ps.rangeErr(mp+".direction", strconv.Quote(m.Direction), wordList(cylinderDirs)+" for a cylinder")
		return 0
	}
	if m.Regenerative && m.Direction != "extend" {
		ps.rangeErr(mp+".regenerative", "true", "false: only an extend stroke can be regenerative")
	}
	optional(ps, mp+".distance", m.Distance)
	if a.Stroke > 0 && m.Distance > a.Stroke {
		ps.rangeErr(mp+".distance", m.Distance.String(), "at most the stroke, "+a.Stroke.String())
	}
	dist := a.Stroke
	if m.Distance > 0 {
		dist = min(m.Distance, a.Stroke)
	}
	var t time.Duration
	switch {
	case m.Speed != 0 && m.Time != 0:
		ps.rangeErr(mp+".time", seconds(m.Time), "not given with a speed: give the speed or the time")
	case m.Speed != 0:
		add(ps, validate.Positive(validateFn, mp+".speed", m.Speed))
		if m.Speed > 0 && dist > 0 {
			t = time.Duration(float64(dist/units.Length(m.Speed)) * float64(time.Second))
		}
	case m.Time != 0:
		t = m.checkTime(ps, mp)
	default:
		ps.missing(mp+".speed", "a speed > 0, such as \"0.1 m/s\", or a time, such as \"4 s\"")
	}
	m.checkAccel(ps, mp, t)
	return t
}

func (m Move) checkMotor(ps *problems, mp string) time.Duration {
	const why = "for cylinders only"
	unused(ps, mp+".force", m.Force, why)
	unused(ps, mp+".speed", m.Speed, why)
	unused(ps, mp+".distance", m.Distance, why)
	if m.Regenerative {
		ps.rangeErr(mp+".regenerative", "true", "false: "+why)
	}
	optional(ps, mp+".torque", m.Torque)
	switch m.Direction {
	case "forward", "reverse":
	case "hold":
		m.checkHold(ps, mp)
		return 0
	case "":
		ps.missing(mp+".direction", wordList(motorDirs))
		return 0
	default:
		ps.rangeErr(mp+".direction", strconv.Quote(m.Direction), wordList(motorDirs)+" for a motor")
		return 0
	}
	given := 0
	for _, v := range []float64{float64(m.ShaftSpeed), m.Turns, float64(m.Time)} {
		if v != 0 {
			given++
		}
	}
	if m.ShaftSpeed != 0 {
		add(ps, validate.Positive(validateFn, mp+".shaft_speed", m.ShaftSpeed))
	}
	if m.Turns != 0 {
		add(ps, validate.Positive(validateFn, mp+".turns", m.Turns))
	}
	var t time.Duration
	if m.Time != 0 {
		t = m.checkTime(ps, mp)
	}
	switch {
	case given < 2:
		ps.missing(mp+".turns", "two of shaft_speed, turns and time, such as \"shaft_speed\": \"40 rpm\" and \"turns\": 0.75")
		return 0
	case given == 3:
		ps.rangeErr(mp+".time", seconds(m.Time), "not given with both a shaft speed and turns: give two of the three")
		return 0
	case m.Time == 0 && m.ShaftSpeed > 0 && m.Turns > 0:
		t = time.Duration(m.Turns / float64(m.ShaftSpeed) * float64(time.Second))
	}
	m.checkAccel(ps, mp, t)
	return t
}

// checkTime checks a move's time and returns it.
func (m Move) checkTime(ps *problems, mp string) time.Duration {
	if m.Time <= 0 {
		ps.rangeErr(mp+".time", seconds(m.Time), "> 0")
		return 0
	}
	return m.Time
}

// checkAccel checks that the acceleration time fits in the move's time t.
func (m Move) checkAccel(ps *problems, mp string, t time.Duration) {
	switch {
	case m.AccelTime < 0:
		ps.rangeErr(mp+".accel_time", seconds(m.AccelTime), "≥ 0")
	case t > 0 && m.AccelTime >= t:
		ps.rangeErr(mp+".accel_time", seconds(m.AccelTime), "less than the move's time, "+seconds(t))
	}
}

// checkHold checks a hold: a load and no motion.
func (m Move) checkHold(ps *problems, mp string) {
	const why = "a hold does not move"
	unused(ps, mp+".speed", m.Speed, why)
	unused(ps, mp+".distance", m.Distance, why)
	unused(ps, mp+".shaft_speed", m.ShaftSpeed, why)
	unused(ps, mp+".turns", m.Turns, why)
	if m.Time != 0 {
		ps.rangeErr(mp+".time", seconds(m.Time), "not given: a hold lasts the phase's dwell")
	}
	if m.AccelTime != 0 {
		ps.rangeErr(mp+".accel_time", seconds(m.AccelTime), "not given: "+why)
	}
	if m.Regenerative {
		ps.rangeErr(mp+".regenerative", "true", "false: "+why)
	}
}

func (s Supply) check(ps *problems) {
	switch {
	case s.Mains != 0:
		if s.EngineSpeed != 0 {
			ps.rangeErr("supply.engine_speed", s.EngineSpeed.String(), "not given with mains: give the mains frequency or the engine speed")
		}
		if math.Abs(s.Mains.Hertz()-50) > 0.5 && math.Abs(s.Mains.Hertz()-60) > 0.5 {
			ps.rangeErr("supply.mains", s.Mains.String(), "50 Hz or 60 Hz")
		}
	case s.EngineSpeed != 0:
		add(ps, validate.InRange(validateFn, "supply.engine_speed", s.EngineSpeed, 100*units.RevolutionPerMinute, 6000*units.RevolutionPerMinute))
		if s.Poles != 0 {
			ps.rangeErr("supply.poles", strconv.Itoa(s.Poles), "not given: poles are for an electric motor")
		}
		return
	default:
		ps.missing("supply.mains", "the mains frequency, \"50 Hz\" or \"60 Hz\", or an engine_speed such as \"1800 rpm\"")
	}
	if s.Poles != 0 && (s.Poles < 2 || s.Poles > 12 || s.Poles%2 != 0) {
		ps.rangeErr("supply.poles", strconv.Itoa(s.Poles), "2, 4, 6, 8, 10 or 12")
	}
}

// The ambient temperatures a site may give: −60 °C to 60 °C (our choice:
// beyond them a machine needs engineering this package does not do).
var (
	coldestAmbient = units.TemperatureFromCelsius(-60)
	hottestAmbient = units.TemperatureFromCelsius(60)
)

func (s Site) check(ps *problems) {
	for _, f := range []struct {
		path string
		t    units.Temperature
	}{{"site.ambient_min", s.AmbientMin}, {"site.ambient_max", s.AmbientMax}} {
		if f.t == 0 {
			ps.missing(f.path, "a temperature such as \"-10 °C\"")
			continue
		}
		add(ps, validate.InRange(validateFn, f.path, f.t, coldestAmbient, hottestAmbient))
	}
	if s.AmbientMin != 0 && s.AmbientMax != 0 && s.AmbientMax <= s.AmbientMin {
		ps.rangeErr("site.ambient_max", s.AmbientMax.String(), "above ambient_min, "+s.AmbientMin.String())
	}
	add(ps, validate.InRange(validateFn, "site.altitude", s.Altitude, 0, 5000*units.Metre))
}

// check adds the fluid's problems to ps, and returns the fluid built from
// it (the zero Fluid when it has problems).
func (f Fluid) check(ps *problems) fluid.Fluid {
	before := len(ps.list)
	oneOf(ps, "fluid.class", f.Class, fluidClasses)
	if f.Window != nil {
		f.Window.check(ps)
	}
	switch {
	case f.V40 != 0:
		if f.Grade != 0 {
			ps.rangeErr("fluid.grade", f.Grade.String(), "not given with v40: give a grade or data-sheet viscosities")
		}
		if f.V100 != 0 && f.VI != 0 {
			ps.rangeErr("fluid.vi", format(f.VI), "not given with v100: the two together could disagree")
		}
		if f.V100 == 0 && f.VI == 0 {
			ps.missing("fluid.v100", "the viscosity at 100 °C, such as \"6.8 mm²/s\", or a vi")
		}
		if f.Density == 0 {
			ps.missing("fluid.density_15", "the data sheet's density at 15 °C, such as \"870 kg/m³\"")
		}
	case f.Grade != 0:
		unused(ps, "fluid.v100", f.V100, "v100 goes with v40 (data-sheet values)")
	default:
		ps.missing("fluid.grade", "an ISO 3448 grade such as \"VG 46\", or data-sheet v40 and v100")
		return fluid.Fluid{}
	}
	if len(ps.list) > before {
		return fluid.Fluid{} // the fluid cannot be built from missing or contradicting fields
	}
	fl, err := f.build()
	if err != nil {
		ps.add(fluidPath(err), err)
	}
	return fl
}

// fluidPath returns the spec path of a field fluid names in err.
func fluidPath(err error) string {
	var re *units.RangeError
	if !errors.As(err, &re) {
		return "fluid"
	}
	switch re.Param {
	case "V40":
		return "fluid.v40"
	case "V100":
		return "fluid.v100"
	case "VI", "vi":
		return "fluid.vi"
	case "Density15":
		return "fluid.density_15"
	case "PourPoint":
		return "fluid.pour_point"
	case "g":
		return "fluid.grade"
	}
	return "fluid"
}

func (w Window) check(ps *problems) {
	fw := w.fluid()
	for _, f := range []struct {
		path string
		v    units.KinematicViscosity
	}{{"fluid.window.min", fw.Min}, {"fluid.window.optimum_low", fw.OptimumLow}, {"fluid.window.optimum_high", fw.OptimumHigh}, {"fluid.window.max", fw.Max}} {
		if f.v == 0 {
			ps.missing(f.path, "a viscosity such as \"10 mm²/s\"")
			return
		}
	}
	if err := fw.Validate(); err != nil {
		var re *units.RangeError
		path := "fluid.window"
		if errors.As(err, &re) {
			path += "." + snake(re.Param)
		}
		ps.add(path, err)
	}
}

// snake writes a Go field name in the spec's JSON spelling: OptimumLow →
// optimum_low.
func snake(s string) string {
	var b strings.Builder
	for i, r := range s {
		if 'A' <= r && r <= 'Z' {
			if i > 0 {
				b.WriteByte('_')
			}
			r += 'a' - 'A'
		}
		b.WriteRune(r)
	}
	return b.String()
}

func (c Cleanliness) check(ps *problems) {
	if c.MostSensitive != "" {
		if _, ok := componentNamed(c.MostSensitive); !ok {
			ps.rangeErr("cleanliness.most_sensitive", strconv.Quote(c.MostSensitive), wordList(componentNames()))
		}
	}
	if !c.Target.IsZero() {
		if err := c.Target.Validate(); err != nil {
			ps.add("cleanliness.target", err)
		} else if c.Target.Form != contamination.Counter {
			ps.rangeErr("cleanliness.target", strconv.Quote(c.Target.String()), "a three-number code for ≥4/≥6/≥14 µm(c), such as \"17/15/12\"")
		}
	}
	if c.Ingress != nil && c.Sample != nil {
		ps.rangeErr("cleanliness.sample", "{…}", "not given with ingress: give the ingress or a sample to work it back from")
	}
	if c.Ingress != nil {
		counts(ps, "cleanliness.ingress.per_minute", c.Ingress.PerMinute)
	}
	if s := c.Sample; s != nil {
		counts(ps, "cleanliness.sample.per_ml", s.PerML)
		positive(ps, "cleanliness.sample.flow", s.Flow, "40 L/min")
		for i, b := range s.Beta {
			add(ps, validate.Above(validateFn, index("cleanliness.sample.beta", i), b, 1))
		}
	}
}

// counts checks cumulative particle counts at ≥4, ≥6, ≥14 µm(c): each ≥ 0
// and none above the count at a smaller size.
func counts(ps *problems, path string, n [3]float64) {
	for i, v := range n {
		p := index(path, i)
		if err := validate.NonNegative(validateFn, p, v); err != nil {
			add(ps, err)
			continue
		}
		if i > 0 && v > n[i-1] {
			ps.rangeErr(p, format(v), "at most "+format(n[i-1])+": counts are cumulative, so a larger size never counts more")
		}
	}
}

// componentNamed finds the contamination component type called name.
func componentNamed(name string) (contamination.Component, bool) {
	for c := range contamination.Component(255) {
		if s := c.String(); strings.HasPrefix(s, "Component(") {
			break
		} else if s == name {
			return c, true
		}
	}
	return 0, false
}

// componentNames lists the names of the contamination component types.
func componentNames() []string {
	var names []string
	for c := range contamination.Component(255) {
		s := c.String()
		if strings.HasPrefix(s, "Component(") {
			break
		}
		names = append(names, s)
	}
	return names
}

func (c Circuit) check(ps *problems, acts []Actuator, names map[string]int) {
	oneOf(ps, "circuit.center", c.Center, centers)
	oneOf(ps, "circuit.pump", c.Pump, pumps)
	oneOf(ps, "circuit.conductor", c.Conductor, conductors)
	if c.Control != "" {
		if c.Pump != "variable piston" {
			ps.rangeErr("circuit.control", strconv.Quote(c.Control), "not given: a control is for a \"variable piston\" pump")
		} else {
			oneOf(ps, "circuit.control", c.Control, controls)
		}
	}
	for _, l := range []struct {
		path string
		line Line
	}{{"circuit.suction", c.Suction}, {"circuit.pressure", c.Pressure}, {"circuit.return", c.Return}} {
		optional(ps, l.path+".length", l.line.Length)
		if l.line.Bends < 0 || l.line.Bends > 50 {
			ps.rangeErr(l.path+".bends", strconv.Itoa(l.line.Bends), "from 0 to 50")
		}
	}
	c.Accumulator.check(ps, acts, names)
}

func (a Accumulator) check(ps *problems, acts []Actuator, names map[string]int) {
	oneOf(ps, "circuit.accumulator.use", a.Use, accumUses)
	const p = "circuit.accumulator.emergency"
	switch {
	case a.Use == "emergency" && a.Emergency == nil:
		ps.missing(p, "the move the stored oil must make, {\"actuator\": …, \"direction\": \"retract\"}")
	case a.Use != "emergency" && a.Emergency != nil:
		ps.rangeErr(p, "{…}", "not given: an emergency move goes with \"use\": \"emergency\"")
	case a.Emergency != nil:
		m := *a.Emergency
		i, ok := m.checkActuator(ps, p, acts, names)
		if !ok {
			return
		}
		if m.Direction == "hold" {
			ps.rangeErr(p+".direction", `"hold"`, "a move that travels: the accumulator must supply its oil")
			return
		}
		m.check(ps, p, acts[i])
	}
}

// The working pressures a design may ask for: up to 700 bar (our choice:
// the top of common industrial cylinder and pump ratings; above it is
// high-pressure work beyond this package).
const highestPressure = 700 * units.Bar

// mostPressures is the most pressures a range may hold.
const mostPressures = 64

func (d Design) check(ps *problems, site Site, supply Supply) {
	const p = "design."
	if d.Pressure != 0 {
		add(ps, validate.InRange(validateFn, p+"pressure", d.Pressure, 10*units.Bar, highestPressure))
		if d.PressureRange != nil {
			ps.rangeErr(p+"pressure_range", "{…}", "not given with pressure: give one pressure or a range to search")
		}
	}
	if r := d.PressureRange; r != nil {
		r.check(ps)
	}
	optional(ps, p+"pump_speed", d.PumpSpeed)
	for _, m := range []struct {
		name string
		v    *float64
	}{{"pump_margin", d.PumpMargin}, {"relief_margin", d.ReliefMargin}} {
		if m.v != nil {
			add(ps, validate.InRange(validateFn, p+m.name, *m.v, 0, 1))
		}
	}
	if d.SealEfficiency != 0 {
		add(ps, validate.InRange(validateFn, p+"seal_efficiency", d.SealEfficiency, 0.5, 1))
	}
	if d.BucklingFactor != 0 {
		add(ps, validate.InRange(validateFn, p+"buckling_factor", d.BucklingFactor, 1, 100))
	}
	optional(ps, p+"rod_yield", d.RodYield)
	optional(ps, p+"suction_velocity", d.SuctionVelocity)
	optional(ps, p+"pressure_velocity", d.PressureVelocity)
	optional(ps, p+"return_velocity", d.ReturnVelocity)
	if t := d.MaxOilTemperature; t != 0 {
		add(ps, validate.InRange(validateFn, p+"max_oil_temperature", t, units.TemperatureFromCelsius(30), units.TemperatureFromCelsius(100)))
		if site.AmbientMax != 0 && t <= site.AmbientMax {
			ps.rangeErr(p+"max_oil_temperature", t.String(), "above the hottest ambient, "+site.AmbientMax.String()+": oil cooled by air runs above the air")
		}
	}
	if d.ReservoirMinutes != 0 {
		add(ps, validate.InRange(validateFn, p+"reservoir_minutes", d.ReservoirMinutes, 0.5, 10))
	}
	oneOf(ps, p+"bore_series", d.BoreSeries, boreSeries)
	oneOf(ps, p+"motor_series", d.MotorSeries, motorSeries)
	if d.MotorSeries != "" && supply.EngineSpeed != 0 {
		ps.rangeErr(p+"motor_series", strconv.Quote(d.MotorSeries), "not given: an engine drive has no motor series")
	}
}

func (r PressureRange) check(ps *problems) {
	const p = "design.pressure_range."
	positive(ps, p+"from", r.From, "100 bar")
	positive(ps, p+"to", r.To, "250 bar")
	positive(ps, p+"step", r.Step, "25 bar")
	if r.From > 0 && r.To > 0 {
		add(ps, validate.InRange(validateFn, p+"from", r.From, 10*units.Bar, highestPressure))
		add(ps, validate.InRange(validateFn, p+"to", r.To, r.From, highestPressure))
	}
	if r.From > 0 && r.To >= r.From && r.Step > 0 {
		if n := math.Floor(float64((r.To-r.From)/r.Step)) + 1; n > mostPressures {
			ps.rangeErr(p+"step", r.Step.String(), "a step that gives at most "+strconv.Itoa(mostPressures)+" pressures")
		}
	}
}

// seconds writes d in seconds to 4 figures: "102.6 s".
func seconds(d time.Duration) string {
	return strconv.FormatFloat(d.Seconds(), 'g', 4, 64) + " s"
}
