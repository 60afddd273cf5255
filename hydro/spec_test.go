package hydro

import (
	"encoding/json"
	"errors"
	"os"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/google/go-cmp/cmp"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// demoJSON is the baling press of the examples, a machine of our own.
func demoJSON(t testing.TB) []byte {
	t.Helper()
	b, err := os.ReadFile("../examples/size/baler.json")
	if err != nil {
		t.Fatal(err)
	}
	return b
}

func demoSpec(t testing.TB) Spec {
	t.Helper()
	s, err := ParseSpec(demoJSON(t))
	if err != nil {
		t.Fatalf("demo spec: %v", err)
	}
	return s
}

func TestParseSpecDemo(t *testing.T) {
	s := demoSpec(t)
	press, ejector := s.Actuators[0], s.Actuators[1]
	if press.Name != "press" || press.Kind != "cylinder" || press.Stroke != 950*units.Millimetre ||
		press.Mass != 1800*units.Kilogram || !press.Suspended || press.AreaRatio != 2 {
		t.Errorf("press = %+v", press)
	}
	if ejector.Friction != 0.45 || ejector.LineLength != 4*units.Metre {
		t.Errorf("ejector = %+v", ejector)
	}
	ph := s.Cycle.Phases
	if len(ph) != 6 || ph[2].Dwell != 3*time.Second || ph[1].Moves[0].Force != 250*units.Kilonewton ||
		ph[1].Moves[0].Speed != 25*units.MillimetrePerSecond || !ph[0].Moves[0].Regenerative ||
		ph[0].Moves[0].AccelTime != 300*time.Millisecond {
		t.Errorf("phases = %+v", ph)
	}
	if s.Supply.Mains != 50*units.Hertz || s.Site.AmbientMin != units.TemperatureFromCelsius(-5) ||
		s.Fluid.Grade != fluid.VG46 || s.Design.Pressure != 180*units.Bar ||
		s.Cleanliness.Ingress.PerMinute != [3]float64{8e6, 2e6, 1.5e5} {
		t.Errorf("spec = %+v", s)
	}
}

// specOptions compares specs with durations to the nanosecond and
// quantities exactly (MarshalText reads back to the identical float64).
var specOptions = cmp.Options{}

func TestSpecJSONRoundTrip(t *testing.T) {
	s := demoSpec(t)
	margin := 0.0
	s.Design.PumpMargin = &margin // an explicit zero survives the trip
	s.Cycle.Phases[0].Dwell = 1234567891 * time.Nanosecond
	b, err := json.Marshal(s)
	if err != nil {
		t.Fatal(err)
	}
	back, err := ParseSpec(b)
	if err != nil {
		t.Fatalf("%s\n%v", b, err)
	}
	if d := cmp.Diff(s, back, specOptions); d != "" {
		t.Errorf("round trip (-want +got):\n%s", d)
	}
	var viaUnmarshal Spec
	if err := json.Unmarshal(b, &viaUnmarshal); err != nil {
		t.Fatal(err)
	}
	if d := cmp.Diff(s, viaUnmarshal, specOptions); d != "" {
		t.Errorf("json.Unmarshal (-want +got):\n%s", d)
	}
}

// TestUnmarshalJSONRefusesBareNumbers checks that json.Unmarshal goes
// through the spec's reader, which refuses a quantity without a unit.
func TestUnmarshalJSONRefusesBareNumbers(t *testing.T) {
	var s Spec
	err := json.Unmarshal([]byte(`{"design": {"pressure": 210}}`), &s)
	fe := onlyProblem(t, err)
	if fe.Path != "design.pressure" || !errors.Is(err, units.ErrSyntax) || !strings.Contains(err.Error(), `"210 bar"`) {
		t.Errorf("err = %v", err)
	}
}

// onlyProblem returns the one problem of a *SpecError.
func onlyProblem(t *testing.T, err error) *FieldError {
	t.Helper()
	var se *SpecError
	if !errors.As(err, &se) || len(se.Problems) != 1 {
		t.Fatalf("err = %v, want a *SpecError with one problem", err)
	}
	return se.Problems[0]
}

// replaceOnce replaces old by new in the demo JSON, failing when old is not
// there exactly once.
func replaceOnce(t *testing.T, data []byte, old, new string) []byte {
	t.Helper()
	if n := strings.Count(string(data), old); n != 1 {
		t.Fatalf("%q occurs %d times in the demo spec", old, n)
	}
	return []byte(strings.Replace(string(data), old, new, 1))
}

// TestParseSpecBadJSON: every kind of mistake in the JSON text gets its own
// problem, at its path, matching its sentinel.
func TestParseSpecBadJSON(t *testing.T) {
	cases := []struct {
		name, old, new string
		paths          []string // every problem, in order
		want           error
	}{
		// Quantities.
		{"bare number", `"stroke": "950 mm"`, `"stroke": 950`, []string{"actuators[0].stroke"}, units.ErrSyntax},
		{"unknown unit", `"stroke": "950 mm"`, `"stroke": "950 mmm"`, []string{"actuators[0].stroke"}, units.ErrUnknownUnit},
		{"wrong dimension", `"stroke": "950 mm"`, `"stroke": "950 bar"`, []string{"actuators[0].stroke"}, units.ErrDimension},
		{"quantity as object", `"stroke": "950 mm"`, `"stroke": {"value": 950}`, []string{"actuators[0].stroke"}, units.ErrSyntax},
		{"bare number time", `"dwell": "3 s"`, `"dwell": 3`, []string{"cycle.phases[2].dwell"}, units.ErrSyntax},
		{"time in metres", `"dwell": "3 s"`, `"dwell": "3 m"`, []string{"cycle.phases[2].dwell"}, units.ErrDimension},
		{"time unknown unit", `"dwell": "3 s"`, `"dwell": "3 sek"`, []string{"cycle.phases[2].dwell"}, units.ErrUnknownUnit},
		{"grade not in ISO 3448", `"VG 46"`, `"VG 47"`, []string{"fluid.grade"}, units.ErrRange},
		// Fields.
		{"unknown field", `"stroke": "950 mm"`, `"strok": "950 mm"`, []string{"actuators[0].strok", "actuators[0].stroke"}, units.ErrSyntax},
		{"odd key", `"stroke": "950 mm"`, `"stroke": "950 mm", "a.b": 1`, []string{`actuators[0]["a.b"]`}, units.ErrSyntax},
		{"field twice", `"kind": "cylinder",
      "stroke": "950 mm"`, `"kind": "cylinder", "kind": "motor",
      "stroke": "950 mm"`, []string{"actuators[0].kind"}, units.ErrSyntax},
		// JSON types.
		{"string for bool", `"suspended": true`, `"suspended": "yes"`, []string{"actuators[0].suspended"}, units.ErrSyntax},
		{"string for number", `"guide_friction": 0.45`, `"guide_friction": "0.45"`, []string{"actuators[1].guide_friction"}, units.ErrSyntax},
		{"number overflows", `"guide_friction": 0.45`, `"guide_friction": 1e999`, []string{"actuators[1].guide_friction"}, units.ErrRange},
		{"fraction for whole number", `"poles": 4`, `"poles": 4.5`, []string{"supply.poles"}, units.ErrSyntax},
		{"string for list", `"notes": [`, `"notes": "x", "n": [`, []string{"notes", "n"}, units.ErrSyntax},
		{"short count list", `[8e6, 2e6, 1.5e5]`, `[8e6, 2e6]`, []string{"cleanliness.ingress.per_minute"}, units.ErrSyntax},
		{"number for object", `"site": {"ambient_min": "-5 °C", "ambient_max": "35 °C", "altitude": "300 m"}`, `"site": 3`,
			[]string{"site"}, units.ErrSyntax}, // and not again as ambient temperatures missing
		// Text that is not JSON.
		{"syntax", `"stroke": "950 mm",`, `"stroke": "950 mm",,`, []string{"actuators[0]"}, units.ErrSyntax},
		{"cut short", `"units": "metric",`, `"units": "metric`, []string{"units"}, units.ErrSyntax},
		{"text after", `Demo machine of our own: a vertical baling press with a regenerative fast approach, a slow pressing stroke with a hold, and a horizontal ejector whose platen runs on guides."]
}`, `x"]} {}`, []string{""}, units.ErrSyntax},
	}
	data := demoJSON(t)
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			_, err := ParseSpec(replaceOnce(t, data, c.old, c.new))
			checkProblems(t, err, c.paths)
			if !errors.Is(err, c.want) {
				t.Errorf("err = %v: does not match %v", err, c.want)
			}
			if fe := firstProblem(err); fe == nil || !errors.Is(fe, c.want) {
				t.Errorf("first problem %v does not match %v", fe, c.want)
			}
		})
	}
}

func firstProblem(err error) *FieldError {
	var se *SpecError
	if errors.As(err, &se) && len(se.Problems) > 0 {
		return se.Problems[0]
	}
	return nil
}

// checkProblems checks that err lists exactly the problems at paths, each
// a *FieldError matching a units sentinel, with its path in its message.
func checkProblems(t *testing.T, err error, paths []string) {
	t.Helper()
	var se *SpecError
	if !errors.As(err, &se) {
		t.Fatalf("err = %v (%T), want a *SpecError", err, err)
	}
	var got []string
	for _, p := range se.Problems {
		got = append(got, p.Path)
		if !matchesSentinel(p) {
			t.Errorf("%v matches no units sentinel", p)
		}
		if p.Path != "" && !strings.HasPrefix(p.Error(), p.Path+": ") {
			t.Errorf("%q does not start with its path", p.Error())
		}
		if !strings.Contains(err.Error(), p.Error()) {
			t.Errorf("the SpecError's message leaves out %q", p.Error())
		}
	}
	if d := cmp.Diff(paths, got); d != "" {
		t.Errorf("problem paths (-want +got):\n%s\n%v", d, err)
	}
}

func matchesSentinel(err error) bool {
	for _, s := range []error{units.ErrSyntax, units.ErrUnknownUnit, units.ErrDimension, units.ErrRange, units.ErrReference, units.ErrAmbiguous} {
		if errors.Is(err, s) {
			return true
		}
	}
	return false
}

// TestValidateProblems: every kind of mistake in a spec built in Go gets
// its own problem at its JSON path, matching units.ErrRange; range
// problems name the path as the parameter.
func TestValidateProblems(t *testing.T) {
	inclined := func(s *Spec) { s.Actuators[1].Orientation = "inclined" }
	cases := []struct {
		name   string
		change func(*Spec)
		paths  []string
	}{
		// Actuators.
		{"no actuators", func(s *Spec) { s.Actuators = nil; s.Cycle.Phases = nil },
			[]string{"actuators", "cycle.phases"}},
		{"kind missing", func(s *Spec) { s.Actuators[1].Kind = "" }, []string{"actuators[1].kind"}},
		{"kind unknown", func(s *Spec) { s.Actuators[1].Kind = "ram" }, []string{"actuators[1].kind"}},
		{"name missing", func(s *Spec) { s.Actuators[1].Name = ""; s.Cycle.Phases = s.Cycle.Phases[:4] }, []string{"actuators[1].name"}},
		{"name twice", func(s *Spec) { s.Actuators[1].Name = "press"; s.Cycle.Phases = s.Cycle.Phases[:4] }, []string{"actuators[1].name"}},
		{"never moves", func(s *Spec) { s.Cycle.Phases = s.Cycle.Phases[:4] }, []string{"actuators[1].name"}},
		{"stroke missing", func(s *Spec) { s.Actuators[0].Stroke = 0 }, []string{"actuators[0].stroke"}},
		{"stroke negative", func(s *Spec) { s.Actuators[0].Stroke = -1 * units.Metre }, []string{"actuators[0].stroke"}},
		{"orientation unknown", func(s *Spec) { s.Actuators[0].Orientation = "upside-down" }, []string{"actuators[0].orientation"}},
		{"incline without inclined", func(s *Spec) { s.Actuators[1].InclineDegrees = 10 }, []string{"actuators[1].incline_deg"}},
		{"incline too steep", func(s *Spec) { inclined(s); s.Actuators[1].InclineDegrees = 120 }, []string{"actuators[1].incline_deg"}},
		{"mount unknown", func(s *Spec) { s.Actuators[0].Mount = "glue" }, []string{"actuators[0].mount"}},
		{"free rod on a clevis", func(s *Spec) { s.Actuators[1].Mount, s.Actuators[1].RodEnd = "clevis", "free" }, []string{"actuators[1].rod_end"}},
		{"area ratio below 1", func(s *Spec) { s.Actuators[0].AreaRatio = 0.9 }, []string{"actuators[0].area_ratio"}},
		{"friction above 1", func(s *Spec) { s.Actuators[1].Friction = 1.5 }, []string{"actuators[1].guide_friction"}},
		{"mass negative", func(s *Spec) { s.Actuators[1].Mass = -1 }, []string{"actuators[1].moving_mass"}},
		{"breakaway on a cylinder", func(s *Spec) { s.Actuators[1].BreakawayTorque = units.NewtonMetre }, []string{"actuators[1].breakaway_torque"}},
		{"stroke on a motor", func(s *Spec) { motorEjector(s); s.Actuators[1].Stroke = units.Metre }, []string{"actuators[1].stroke"}},
		{"mount on a motor", func(s *Spec) { motorEjector(s); s.Actuators[1].Mount = "flange" }, []string{"actuators[1].mount"}},
		{"mass on a motor", func(s *Spec) { motorEjector(s); s.Actuators[1].Mass = 300 }, []string{"actuators[1].moving_mass"}},
		// Moves.
		{"no phases", func(s *Spec) { s.Cycle.Phases = nil }, []string{"cycle.phases"}},
		{"unknown actuator", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Actuator = "ram" }, []string{"cycle.phases[1].moves[0].actuator"}},
		{"actuator missing", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Actuator = "" }, []string{"cycle.phases[1].moves[0].actuator"}},
		{"twice in a phase", func(s *Spec) {
			s.Cycle.Phases[4].Moves = append(s.Cycle.Phases[4].Moves, s.Cycle.Phases[4].Moves[0])
		}, []string{"cycle.phases[4].moves[1].actuator"}},
		{"motor direction for a cylinder", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Direction = "forward" }, []string{"cycle.phases[1].moves[0].direction"}},
		{"direction missing", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Direction = "" }, []string{"cycle.phases[1].moves[0].direction"}},
		{"speed and time", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Time = 8 * time.Second }, []string{"cycle.phases[1].moves[0].time"}},
		{"neither speed nor time", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Speed = 0 }, []string{"cycle.phases[1].moves[0].speed"}},
		{"speed negative", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Speed = -0.1 }, []string{"cycle.phases[1].moves[0].speed"}},
		{"time negative", func(s *Spec) { m := &s.Cycle.Phases[1].Moves[0]; m.Speed, m.Time = 0, -time.Second }, []string{"cycle.phases[1].moves[0].time"}},
		{"distance beyond stroke", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Distance = 2 * units.Metre }, []string{"cycle.phases[1].moves[0].distance"}},
		{"regenerative retract", func(s *Spec) { s.Cycle.Phases[3].Moves[0].Regenerative = true }, []string{"cycle.phases[3].moves[0].regenerative"}},
		{"torque on a cylinder", func(s *Spec) { s.Cycle.Phases[1].Moves[0].Torque = units.NewtonMetre }, []string{"cycle.phases[1].moves[0].torque"}},
		{"accel longer than move", func(s *Spec) { s.Cycle.Phases[0].Moves[0].AccelTime = 10 * time.Second }, []string{"cycle.phases[0].moves[0].accel_time"}},
		{"hold without dwell", func(s *Spec) { s.Cycle.Phases[2].Dwell = 0 }, []string{"cycle.phases[2].dwell"}},
		{"hold with speed", func(s *Spec) { s.Cycle.Phases[2].Moves[0].Speed = 0.1 }, []string{"cycle.phases[2].moves[0].speed"}},
		{"hold with time", func(s *Spec) { s.Cycle.Phases[2].Moves[0].Time = time.Second }, []string{"cycle.phases[2].moves[0].time"}},
		{"dwell negative", func(s *Spec) { s.Cycle.Phases[5].Dwell = -time.Second }, []string{"cycle.phases[5].dwell"}},
		{"empty phase", func(s *Spec) { s.Cycle.Phases = append(s.Cycle.Phases, Phase{Name: "idle"}) }, []string{"cycle.phases[6].dwell"}},
		{"phase name twice", func(s *Spec) { s.Cycle.Phases[5].Name = "eject" }, []string{"cycle.phases[5].name"}},
		{"too many cycles", func(s *Spec) { s.Cycle.CyclesPerHour = 400 }, []string{"cycle.cycles_per_hour"}},
		{"negative cycles", func(s *Spec) { s.Cycle.CyclesPerHour = -1 }, []string{"cycle.cycles_per_hour"}},
		{"motor needs two of three", func(s *Spec) { motorEjector(s); s.Cycle.Phases[4].Moves[0].Turns = 0 }, []string{"cycle.phases[4].moves[0].turns"}},
		{"motor all three", func(s *Spec) { motorEjector(s); s.Cycle.Phases[4].Moves[0].Time = 5 * time.Second }, []string{"cycle.phases[4].moves[0].time"}},
		{"speed on a motor", func(s *Spec) { motorEjector(s); s.Cycle.Phases[4].Moves[0].Speed = 0.1 }, []string{"cycle.phases[4].moves[0].speed"}},
		// Supply and site.
		{"no supply", func(s *Spec) { s.Supply = Supply{} }, []string{"supply.mains"}},
		{"mains and engine", func(s *Spec) { s.Supply.EngineSpeed = 1800 * units.RevolutionPerMinute }, []string{"supply.engine_speed"}},
		{"mains 55 Hz", func(s *Spec) { s.Supply.Mains = 55 * units.Hertz }, []string{"supply.mains"}},
		{"mains 55 Hz and an engine", func(s *Spec) {
			s.Supply.Mains, s.Supply.EngineSpeed = 55*units.Hertz, 1800*units.RevolutionPerMinute
		}, []string{"supply.engine_speed", "supply.mains"}},
		{"odd poles", func(s *Spec) { s.Supply.Poles = 3 }, []string{"supply.poles"}},
		{"poles on an engine", func(s *Spec) { s.Supply.Mains = 0; s.Supply.EngineSpeed = 1800 * units.RevolutionPerMinute }, []string{"supply.poles"}},
		{"engine too fast", func(s *Spec) { s.Supply = Supply{EngineSpeed: 9000 * units.RevolutionPerMinute} }, []string{"supply.engine_speed"}},
		{"ambient missing", func(s *Spec) { s.Site.AmbientMin = 0 }, []string{"site.ambient_min"}},
		{"ambient reversed", func(s *Spec) { s.Site.AmbientMax = units.TemperatureFromCelsius(-10) }, []string{"site.ambient_max"}},
		{"ambient too hot", func(s *Spec) { s.Site.AmbientMax = units.TemperatureFromCelsius(80) }, []string{"site.ambient_max"}},
		{"altitude too high", func(s *Spec) { s.Site.Altitude = 9000 * units.Metre }, []string{"site.altitude"}},
		// Fluid.
		{"no fluid", func(s *Spec) { s.Fluid = Fluid{} }, []string{"fluid.grade"}},
		{"class unknown", func(s *Spec) { s.Fluid.Class = "HX" }, []string{"fluid.class"}},
		{"no typical data", func(s *Spec) { s.Fluid.Class = "HFC"; s.Fluid.Grade = fluid.VG100 }, []string{"fluid.grade"}},
		{"grade and v40", func(s *Spec) {
			s.Fluid.V40 = 46 * units.Centistokes
			s.Fluid.V100 = 6.8 * units.Centistokes
			s.Fluid.Density = 870
		}, []string{"fluid.grade"}},
		{"v40 alone", func(s *Spec) { s.Fluid = Fluid{V40: 46 * units.Centistokes, Density: 870} }, []string{"fluid.v100"}},
		{"v40 without density", func(s *Spec) { s.Fluid = Fluid{V40: 46 * units.Centistokes, V100: 6.8 * units.Centistokes} }, []string{"fluid.density_15"}},
		{"v100 and vi", func(s *Spec) {
			s.Fluid = Fluid{V40: 46 * units.Centistokes, V100: 6.8 * units.Centistokes, VI: 100, Density: 870}
		}, []string{"fluid.vi"}},
		{"v100 above v40", func(s *Spec) {
			s.Fluid = Fluid{V40: 46 * units.Centistokes, V100: 60 * units.Centistokes, Density: 870}
		}, []string{"fluid.v100"}},
		{"window incomplete", func(s *Spec) { s.Fluid.Window = &Window{Min: 10 * units.Centistokes} }, []string{"fluid.window.optimum_low"}},
		{"window reversed", func(s *Spec) {
			s.Fluid.Window = &Window{Min: 10 * units.Centistokes, OptimumLow: 16 * units.Centistokes, OptimumHigh: 36 * units.Centistokes, Max: 20 * units.Centistokes}
		}, []string{"fluid.window.max"}},
		// Cleanliness.
		{"component unknown", func(s *Spec) { s.Cleanliness.MostSensitive = "gear" }, []string{"cleanliness.most_sensitive"}},
		{"ingress rises with size", func(s *Spec) { s.Cleanliness.Ingress.PerMinute[1] = 9e6 }, []string{"cleanliness.ingress.per_minute[1]"}},
		{"ingress negative", func(s *Spec) { s.Cleanliness.Ingress.PerMinute[2] = -1 }, []string{"cleanliness.ingress.per_minute[2]"}},
		{"ingress and sample", func(s *Spec) {
			s.Cleanliness.Sample = &Sample{PerML: [3]float64{400, 100, 10}, Flow: 60 * units.LitrePerMinute, Beta: [3]float64{2, 10, 200}}
		}, []string{"cleanliness.sample"}},
		{"sample beta 1", func(s *Spec) {
			s.Cleanliness.Ingress = nil
			s.Cleanliness.Sample = &Sample{PerML: [3]float64{400, 100, 10}, Flow: 60 * units.LitrePerMinute, Beta: [3]float64{2, 10, 1}}
		}, []string{"cleanliness.sample.beta[2]"}},
		{"sample without flow", func(s *Spec) {
			s.Cleanliness.Ingress = nil
			s.Cleanliness.Sample = &Sample{PerML: [3]float64{400, 100, 10}, Beta: [3]float64{2, 10, 200}}
		}, []string{"cleanliness.sample.flow"}},
		// Circuit.
		{"center unknown", func(s *Spec) { s.Circuit.Center = "middle" }, []string{"circuit.center"}},
		{"pump unknown", func(s *Spec) { s.Circuit.Pump, s.Circuit.Control = "screw", "" }, []string{"circuit.pump"}},
		{"control on a gear pump", func(s *Spec) { s.Circuit.Pump = "gear" }, []string{"circuit.control"}},
		{"control unknown", func(s *Spec) { s.Circuit.Pump = "variable piston"; s.Circuit.Control = "manual" }, []string{"circuit.control"}},
		{"conductor unknown", func(s *Spec) { s.Circuit.Conductor = "pipe" }, []string{"circuit.conductor"}},
		{"negative bends", func(s *Spec) { s.Circuit.Return.Bends = -1 }, []string{"circuit.return.bends"}},
		{"negative length", func(s *Spec) { s.Circuit.Suction.Length = -units.Metre }, []string{"circuit.suction.length"}},
		{"accumulator use unknown", func(s *Spec) { s.Circuit.Accumulator.Use = "always" }, []string{"circuit.accumulator.use"}},
		{"emergency without move", func(s *Spec) { s.Circuit.Accumulator.Use = "emergency" }, []string{"circuit.accumulator.emergency"}},
		{"move without emergency", func(s *Spec) {
			s.Circuit.Accumulator.Emergency = &Move{Actuator: "press", Direction: "retract", Speed: 0.05}
		}, []string{"circuit.accumulator.emergency"}},
		{"emergency hold", func(s *Spec) {
			s.Circuit.Accumulator = Accumulator{Use: "emergency", Emergency: &Move{Actuator: "press", Direction: "hold"}}
		}, []string{"circuit.accumulator.emergency.direction"}},
		{"emergency unknown actuator", func(s *Spec) {
			s.Circuit.Accumulator = Accumulator{Use: "emergency", Emergency: &Move{Actuator: "ram", Direction: "retract", Speed: 0.05}}
		}, []string{"circuit.accumulator.emergency.actuator"}},
		// Design.
		{"pressure too low", func(s *Spec) { s.Design.Pressure = 5 * units.Bar }, []string{"design.pressure"}},
		{"pressure and range", func(s *Spec) {
			s.Design.PressureRange = &PressureRange{From: 100 * units.Bar, To: 200 * units.Bar, Step: 20 * units.Bar}
		}, []string{"design.pressure_range"}},
		{"pressure and a reversed range", func(s *Spec) {
			s.Design.PressureRange = &PressureRange{From: 200 * units.Bar, To: 100 * units.Bar, Step: 20 * units.Bar}
		}, []string{"design.pressure_range", "design.pressure_range.to"}},
		{"range reversed", func(s *Spec) {
			s.Design.Pressure = 0
			s.Design.PressureRange = &PressureRange{From: 200 * units.Bar, To: 100 * units.Bar, Step: 20 * units.Bar}
		}, []string{"design.pressure_range.to"}},
		{"range too fine", func(s *Spec) {
			s.Design.Pressure = 0
			s.Design.PressureRange = &PressureRange{From: 100 * units.Bar, To: 200 * units.Bar, Step: units.Bar}
		}, []string{"design.pressure_range.step"}},
		{"range without step", func(s *Spec) {
			s.Design.Pressure = 0
			s.Design.PressureRange = &PressureRange{From: 100 * units.Bar, To: 200 * units.Bar}
		}, []string{"design.pressure_range.step"}},
		{"margin above 1", func(s *Spec) { m := 1.5; s.Design.PumpMargin = &m }, []string{"design.pump_margin"}},
		{"relief margin negative", func(s *Spec) { m := -0.1; s.Design.ReliefMargin = &m }, []string{"design.relief_margin"}},
		{"seal efficiency above 1", func(s *Spec) { s.Design.SealEfficiency = 1.2 }, []string{"design.seal_efficiency"}},
		{"buckling factor below 1", func(s *Spec) { s.Design.BucklingFactor = 0.5 }, []string{"design.buckling_factor"}},
		{"oil cooler than air", func(s *Spec) { s.Design.MaxOilTemperature = units.TemperatureFromCelsius(32) }, []string{"design.max_oil_temperature"}},
		{"reservoir minutes", func(s *Spec) { s.Design.ReservoirMinutes = 20 }, []string{"design.reservoir_minutes"}},
		{"bore series unknown", func(s *Spec) { s.Design.BoreSeries = "din" }, []string{"design.bore_series"}},
		{"motor series on an engine", func(s *Spec) {
			s.Supply = Supply{EngineSpeed: 1800 * units.RevolutionPerMinute}
			s.Design.MotorSeries = "iec"
		}, []string{"design.motor_series"}},
		{"units unknown", func(s *Spec) { s.Units = "imperial" }, []string{"units"}},
	}
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			s := demoSpec(t)
			c.change(&s)
			err := s.Validate()
			checkProblems(t, err, c.paths)
			if !errors.Is(err, units.ErrRange) {
				t.Errorf("err = %v: does not match units.ErrRange", err)
			}
			// A problem of our own names its path as the range error's parameter.
			var re *units.RangeError
			if fe := firstProblem(err); fe != nil && errors.As(fe, &re) && re.Func == validateFn {
				checktest.RangeErrorIn(t, fe, validateFn, fe.Path)
			}
		})
	}
}

// motorEjector turns the demo's ejector into a hydraulic motor turning a
// drum, with valid moves.
func motorEjector(s *Spec) {
	a := &s.Actuators[1]
	a.Kind, a.Stroke, a.Mount, a.RodEnd, a.Mass, a.Friction = "motor", 0, "", "", 0, 0
	for _, i := range []int{4, 5} {
		s.Cycle.Phases[i].Moves[0] = Move{Actuator: "ejector", Direction: []string{"forward", "reverse"}[i-4],
			Torque: 300 * units.NewtonMetre, ShaftSpeed: 40 * units.RevolutionPerMinute, Turns: 2}
	}
}

func TestValidateDemoAndMotor(t *testing.T) {
	s := demoSpec(t)
	if err := s.Validate(); err != nil {
		t.Fatal(err)
	}
	motorEjector(&s)
	if err := s.Validate(); err != nil {
		t.Errorf("motor: %v", err)
	}
}

// TestParseSpecListsEveryProblem: reading and validation problems come back
// together, and a field that could not be read is not reported again.
func TestParseSpecListsEveryProblem(t *testing.T) {
	data := demoJSON(t)
	data = replaceOnce(t, data, `"stroke": "950 mm"`, `"stroke": 950`)
	data = replaceOnce(t, data, `"kind": "cylinder",
      "stroke": "1200 mm"`, `"kind": "cilinder",
      "stroke": "1200 mm"`)
	data = replaceOnce(t, data, `"mains": "50 Hz"`, `"mains": "55 Hz"`)
	data = replaceOnce(t, data, `"speed": "25 mm/s"`, `"speed": "25 mm/s", "time": "10 s"`)
	_, err := ParseSpec(data)
	checkProblems(t, err, []string{"actuators[0].stroke", "actuators[1].kind", "cycle.phases[1].moves[0].time", "supply.mains"})
	for _, want := range []string{`write the quantity as a string with its unit, such as "950 mm"`, `want "cylinder" or "motor"`, "want 50 Hz or 60 Hz"} {
		if !strings.Contains(err.Error(), want) {
			t.Errorf("error does not say %q:\n%v", want, err)
		}
	}
}

func TestReadSpec(t *testing.T) {
	s, err := ReadSpec(strings.NewReader(string(demoJSON(t))))
	if err != nil || s.Name != "Two-ram baling press, 250 kN" {
		t.Errorf("ReadSpec = %q, %v", s.Name, err)
	}
	_, err = ReadSpec(strings.NewReader(""))
	checkProblems(t, err, []string{""})
}

func TestMarshalJSONRefusesNaN(t *testing.T) {
	s := demoSpec(t)
	s.Actuators[1].Friction = nanValue()
	_, err := s.MarshalJSON()
	var fe *FieldError
	if !errors.As(err, &fe) || fe.Path != "actuators[1].guide_friction" || !errors.Is(err, units.ErrRange) {
		t.Errorf("err = %v", err)
	}
}

func nanValue() float64 { var z float64; return z / z }

// pathPattern is the form of a problem's path: JSON names and indices,
// with odd keys quoted in brackets.
var pathPattern = regexp.MustCompile(`^(?:[A-Za-z0-9_]+|\[\d+\]|\["(?:[^"\\]|\\.)*"\]|\.)*$`)

func FuzzParseSpec(f *testing.F) {
	demo := demoJSON(f)
	f.Add(demo)
	for _, seed := range []string{
		`{}`, `[]`, `null`, `{"actuators": [{}]}`, `{"design": {"pressure": 210}}`,
		`{"cycle": {"phases": [{"moves": [{"actuator": "x", "time": "1e300 h"}]}]}}`,
		`{"fluid": {"v40": "46 cSt", "v100": "1e30 cSt", "density_15": "870 kg/m3"}}`,
		`{"a": {"b": [1, 2, {"c": null}]}}`, `{"actuators": [{"stroke": "-0 mm"}]}`, `{"units": "us"} x`,
	} {
		f.Add([]byte(seed))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		s, err := ParseSpec(data)
		if err != nil {
			var se *SpecError
			if !errors.As(err, &se) || len(se.Problems) == 0 {
				t.Fatalf("err = %v (%T), want a *SpecError", err, err)
			}
			for _, p := range se.Problems {
				if !pathPattern.MatchString(p.Path) || !matchesSentinel(p) {
					t.Fatalf("problem %q (path %q) has no path or matches no sentinel", p, p.Path)
				}
			}
			if d := cmp.Diff(Spec{}, s, specOptions); d != "" {
				t.Fatalf("spec beside an error is not zero:\n%s", d)
			}
			return
		}
		// A valid spec sizes, or fails with a path; never a panic.
		if r, err := Size(s); err != nil {
			var fe *FieldError
			if !errors.As(err, &fe) || !matchesSentinel(err) {
				t.Fatalf("Size: %v (%T)", err, err)
			}
		} else if _, err := json.Marshal(r); err != nil {
			t.Fatalf("report does not marshal: %v", err)
		}
		out, err := json.Marshal(s)
		if err != nil {
			t.Fatalf("valid spec does not marshal: %v", err)
		}
		back, err := ParseSpec(out)
		if err != nil {
			t.Fatalf("marshalled spec does not read back: %v\n%s", err, out)
		}
		if d := cmp.Diff(s, back, specOptions); d != "" {
			t.Fatalf("round trip (-want +got):\n%s", d)
		}
	})
}
