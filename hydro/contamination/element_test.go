package contamination

import (
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

func TestCleanDropDarcy(t *testing.T) {
	// [X] Darcy's law for laminar flow through a porous medium:
	// Δp = μ·Q·L/(k·A), μ = ρ·ν. Demo element: k = 2e-13 m², L = 0.6 mm,
	// A = 0.35 m², ρ = 870 kg/m³.
	darcy := func(q units.Flow, nu units.KinematicViscosity) units.Pressure {
		const k, l, a, rho = 2e-13, 0.6e-3, 0.35, 870.0
		return units.Pressure(rho * float64(nu) * float64(q) * l / (k * a))
	}
	q0, nu0 := 100*units.LitrePerMinute, 32*units.Centistokes
	at := ElementPoint{Drop: darcy(q0, nu0), Flow: q0, Viscosity: nu0}
	for _, c := range []struct {
		q  units.Flow
		nu units.KinematicViscosity
	}{
		{150 * units.LitrePerMinute, 32 * units.Centistokes},
		{100 * units.LitrePerMinute, 400 * units.Centistokes},
		{40 * units.LitrePerMinute, 15 * units.Centistokes},
	} {
		got, err := CleanDrop(at, c.q, c.nu)
		want := darcy(c.q, c.nu)
		if err != nil || math.Abs(float64(got-want)) > 1e-12*float64(want) {
			t.Errorf("CleanDrop(%v, %v) = %v, %v; Darcy gives %v", c.q, c.nu, got, err, want)
		}
	}
}

func TestCheckBypass(t *testing.T) {
	at := ElementPoint{Drop: 0.3 * units.Bar, Flow: 100 * units.LitrePerMinute, Viscosity: 30 * units.Centistokes}
	cases := []struct {
		name       string
		nu         units.KinematicViscosity
		drop       units.Pressure // scaled by viscosity: Δp₀·ν/ν₀ [X]
		opens, low bool           // the bypass opens; little room for dirt
		topic      string         // the finding about the bypass, if any
		sev        components.Severity
	}{
		{"working", 30 * units.Centistokes, 0.3 * units.Bar, false, false, "", 0},                               // 0.1 of 3 bar
		{"cool", 120 * units.Centistokes, 1.2 * units.Bar, false, true, TopicBypassRoom, components.Notice},     // 0.4 of 3 bar
		{"cold start", 600 * units.Centistokes, 6 * units.Bar, true, true, TopicBypassOpen, components.Caution}, // 2 × 3 bar
	}
	for _, c := range cases {
		r, err := CheckBypass(at, 100*units.LitrePerMinute, c.nu, 3*units.Bar)
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		if math.Abs(float64(r.Setting.Value-c.drop)) > 1e-12*float64(c.drop) || r.Setting.Limit != 3*units.Bar ||
			r.Setting.OK() == c.opens || r.Room.OK() == c.low || r.Setting.Rule.Kind != components.CallerValue ||
			r.Room.Rule.Kind != components.CommonPractice || math.Abs(float64(r.Room.Limit)-1e5) > 1e-9 {
			t.Errorf("%s: %+v", c.name, r)
		}
		if math.Abs(r.Setting.Ratio()-float64(c.drop/(3*units.Bar))) > 1e-12 {
			t.Errorf("%s: share %g", c.name, r.Setting.Ratio())
		}
		// Every result tells the reader about the indicator, the stored
		// pressure and hot oil; the bypass findings follow the checks.
		for _, want := range []struct {
			topic string
			sev   components.Severity
			hz    components.Hazard
		}{
			{TopicIndicator, components.Caution, components.FilterBypass},
			{TopicRelievePressure, components.Warning, components.StoredEnergy},
			{TopicHotOil, components.Caution, components.HotSurface},
		} {
			if f := r.Findings.Topic(want.topic); len(f) != 1 || f[0].Severity != want.sev || f[0].Hazard != want.hz {
				t.Errorf("%s: %s findings %v", c.name, want.topic, f)
			}
		}
		open, room := r.Findings.Topic(TopicBypassOpen), r.Findings.Topic(TopicBypassRoom)
		switch {
		case c.topic == "" && (len(open) != 0 || len(room) != 0):
			t.Errorf("%s: bypass findings %v %v, want none", c.name, open, room)
		case c.topic != "":
			f := r.Findings.Topic(c.topic)
			if len(f) != 1 || f[0].Severity != c.sev || f[0].Hazard != components.FilterBypass || len(open)+len(room) != 1 {
				t.Errorf("%s: findings %v, want one %s", c.name, r.Findings, c.topic)
			}
		}
	}
	// The bypass finding quotes the drop, flow, viscosity and setting as
	// typed values, so it reads in psi and gpm too.
	r, _ := CheckBypass(at, 100*units.LitrePerMinute, 600*units.Centistokes, 3*units.Bar)
	f := r.Findings.Topic(TopicBypassOpen)[0]
	if args := f.Args(); len(args) != 4 || args[1] != 100*units.LitrePerMinute || args[3] != 3*units.Bar {
		t.Errorf("bypass finding quotes %v", args)
	}
	us := units.USCustomary()
	if txt := f.Text(us); !strings.Contains(txt, "psi") || !strings.Contains(txt, "gpm") {
		t.Errorf("US text %q", txt)
	}
}

func TestElementBadInput(t *testing.T) {
	nan := math.NaN()
	q := 100 * units.LitrePerMinute
	at := ElementPoint{Drop: units.Bar, Flow: q, Viscosity: 30 * units.Centistokes}
	cases := []struct {
		name, param string
		f           func() (units.Pressure, error)
	}{
		{"drop 0", "at.Drop", func() (units.Pressure, error) { return CleanDrop(ElementPoint{Flow: q, Viscosity: 1}, q, 1) }},
		{"point flow 0", "at.Flow", func() (units.Pressure, error) { return CleanDrop(ElementPoint{Drop: 1, Viscosity: 1}, q, 1) }},
		{"point nu 0", "at.Viscosity", func() (units.Pressure, error) { return CleanDrop(ElementPoint{Drop: 1, Flow: q}, q, 1) }},
		{"nu NaN", "nu", func() (units.Pressure, error) { return CleanDrop(at, q, units.KinematicViscosity(nan)) }},
		{"q < 0", "q", func() (units.Pressure, error) { return CleanDrop(at, -q, 1) }},
		{"drop overflow", "drop", func() (units.Pressure, error) { return CleanDrop(at, units.Flow(1e300), 1e300) }},
		// A subnormal result: 10⁵ Pa × 10⁻³⁰⁰ × 10⁻³⁰⁰ … underflowed to
		// 0 and was returned with a nil error.
		{"drop underflow", "drop", func() (units.Pressure, error) {
			return CleanDrop(ElementPoint{Drop: 1e5, Flow: 1, Viscosity: 1}, 1e-200, 1e-200)
		}},
		{"bypass 0", "bypass", func() (units.Pressure, error) { r, err := CheckBypass(at, q, 1, 0); return r.Setting.Value, err }},
		{"bypass, bad point", "at.Drop", func() (units.Pressure, error) {
			r, err := CheckBypass(ElementPoint{}, q, 1, units.Bar)
			return r.Setting.Value, err
		}},
		// A finite drop over a tiny bypass setting gave a share of +Inf
		// with a nil error; now it is an error naming the ratio.
		{"share overflow", "drop ÷ bypass", func() (units.Pressure, error) {
			r, err := CheckBypass(ElementPoint{Drop: 1e5, Flow: 1e-3, Viscosity: 46e-6}, 1e300, 46e-6, 1e-10)
			return r.Setting.Value, err
		}},
	}
	for _, c := range cases {
		v, err := c.f()
		wantRangeError(t, err, c.param)
		if v != 0 {
			t.Errorf("%s: %v with an error, want 0", c.name, v)
		}
	}
}

// CleanDrop: Q/Q₀ = 10³¹⁰ overflowed to +Inf and gave an error, though the
// drop, 10⁵ Pa × 10³¹⁰ × 10⁻²⁹⁵ = 10²⁰ Pa, is finite [X].
func TestCleanDropExtremeRatios(t *testing.T) {
	at := ElementPoint{Drop: 1e5, Flow: 1e-300, Viscosity: 1e-5}
	if dp, err := CleanDrop(at, 1e10, 1e-300); err != nil || math.Abs(float64(dp)/1e20-1) > 1e-12 {
		t.Errorf("CleanDrop = %v, %v; want 1e20 Pa", dp, err)
	}
}
