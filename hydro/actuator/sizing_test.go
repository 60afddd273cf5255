package actuator

import (
	"math"
	"testing"
	"time"

	"github.com/google/go-cmp/cmp"
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// TestForces: the terms of F = F_p + m·g·sin θ + μ·m·g·cos θ + m·a [X].
func TestForces(t *testing.T) {
	g := float64(units.StandardGravity)
	for _, w := range []struct {
		name                 string
		d                    Duty
		grav, fric, acc, tot float64 // N
	}{
		{"horizontal slide", Duty{Force: 1000, Mass: 500, Friction: 0.2}, 0, 0.2 * 500 * g, 0, 1000 + 0.2*500*g},
		{"vertical lift", Duty{Mass: 1000, InclineDegrees: 90, Friction: 0.3}, 1000 * g, 0.3 * 1000 * g * math.Cos(math.Pi/2), 0, 1000*g + 0.3*1000*g*math.Cos(math.Pi/2)},
		{"30° ramp up", Duty{Mass: 200, InclineDegrees: 30, Friction: 0.1}, 100 * g, 0.1 * 200 * g * math.Sqrt(3) / 2, 0, 100*g + 0.1*200*g*math.Sqrt(3)/2},
		{"30° ramp down", Duty{Force: 5000, Mass: 200, InclineDegrees: -30, Friction: 0.1}, -100 * g, 0.1 * 200 * g * math.Sqrt(3) / 2, 0, 5000 - 100*g + 0.1*200*g*math.Sqrt(3)/2},
		// a = v²/(2s) = 0.25/0.1 = 2.5 m/s²; a = v/t = 0.5/0.2 = 2.5 m/s².
		{"accelerate over a distance", Duty{Mass: 400, Speed: 0.5, AccelDistance: 50 * mm}, 0, 0, 1000, 1000},
		{"accelerate over a time", Duty{Mass: 400, Speed: 0.5, AccelTime: 200 * time.Millisecond}, 0, 0, 1000, 1000},
	} {
		w.d.Pressure, w.d.Stroke = 100*units.Bar, 1
		f, err := w.d.Forces()
		if err != nil {
			t.Errorf("%s: %v", w.name, err)
			continue
		}
		for _, c := range []struct {
			term      string
			got, want float64
		}{{"Gravity", float64(f.Gravity), w.grav}, {"Friction", float64(f.Friction), w.fric},
			{"Acceleration", float64(f.Acceleration), w.acc}, {"Total", float64(f.Total()), w.tot}} {
			if math.Abs(c.got-c.want) > 1e-9*max(1, math.Abs(c.want)) {
				t.Errorf("%s: %s = %.10g N; want %.10g", w.name, c.term, c.got, c.want)
			}
		}
	}
}

// TestSizePush: 100 kN push at 160 bar with the default 10 % seal friction:
// A₁ = 100 kN/(0.9·160 bar) = 6.944·10⁻³ m², D = 94.03 mm → ISO 3320 100 mm;
// rod ≥ 100·√(1 − 1/1.25) = 44.72 mm → 45 mm; the 100 mm bore needs
// 100 kN/0.9/7.854·10⁻³ m² = 141.47 bar (hand arithmetic [X]).
func TestSizePush(t *testing.T) {
	d := Duty{Force: 100 * units.Kilonewton, Pressure: 160 * units.Bar, Stroke: 500 * mm}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if !checktest.Close(r.Bore.Required, 94.0316*mm, 1e-5) || r.Bore.Chosen != 100*mm || !r.Bore.OK() {
		t.Errorf("Bore = %+v; want 94.03 mm → 100 mm", r.Bore)
	}
	if !checktest.Close(r.Rod.Required, 44.7214*mm, 1e-5) || r.Rod.Chosen != 45*mm {
		t.Errorf("Rod = %+v; want 44.72 mm → 45 mm", r.Rod)
	}
	if !checktest.Close(r.Pressure.Value, 141.471*units.Bar, 1e-5) || r.Pressure.Limit != 160*units.Bar || !r.Pressure.OK() {
		t.Errorf("Pressure = %+v; want 141.47 bar within 160 bar", r.Pressure)
	}
	if r.Cylinder != (Cylinder{Bore: 100 * mm, Rod: 45 * mm, Stroke: 500 * mm}) {
		t.Errorf("Cylinder = %+v", r.Cylinder)
	}
	if r.SealEfficiency != 0.9 || r.SealRule.Kind != components.CommonPractice || r.AreaRatioRule.Kind != components.OurChoice {
		t.Errorf("assumptions: η %v (%v), φ rule %v", r.SealEfficiency, r.SealRule, r.AreaRatioRule)
	}
	if len(r.Findings) != 0 {
		t.Errorf("a horizontal push with no mass: findings %v; want none", r.Findings)
	}
}

// TestSizePullStepsUp: 50 kN pull at 200 bar, 5 bar on the cap side, least
// area ratio 2. A₁ = 50 kN/(0.9·100 bar − 5 bar) → D = 86.54 mm → 90 mm,
// whose least rod 63.6 mm rounds up to 70 mm and needs
// (50 kN + 5 bar·A₁)/(0.9·A₂) = 235.1 bar; 100 mm (rod 80 mm) needs
// 211.9 bar; 110 mm (rod 80 mm) needs 135.89 bar and is chosen, a
// second-choice size (hand arithmetic [X]).
func TestSizePullStepsUp(t *testing.T) {
	d := Duty{Direction: Retract, Force: 50 * units.Kilonewton, Pressure: 200 * units.Bar,
		BackPressure: 5 * units.Bar, AreaRatio: 2, Stroke: 300 * mm}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if !checktest.Close(r.Bore.Required, 86.5427*mm, 1e-5) || r.Bore.Chosen != 110*mm || r.Rod.Chosen != 80*mm {
		t.Errorf("Bore %+v, Rod %+v; want 86.54 mm → 110 mm with an 80 mm rod", r.Bore, r.Rod)
	}
	if !checktest.Close(r.Pressure.Value, 135.8908*units.Bar, 1e-5) || !r.Pressure.OK() {
		t.Errorf("Pressure = %+v; want 135.89 bar", r.Pressure)
	}
	if len(r.Findings.Topic("actuator.second-choice-bore")) != 1 {
		t.Errorf("findings %v; want the second-choice notice for 110 mm", r.Findings)
	}
	// At 0.1 m/s the 110/80 annulus takes 0.1·4476.8 mm² = 26.86 L/min and
	// the cap side returns 0.1·9503.3 mm² = 57.02 L/min.
	d.Speed = 0.1
	r, _ = d.Size()
	if !checktest.Close(r.Flow, 26.861*units.LitrePerMinute, 1e-4) || !checktest.Close(r.ReturnFlow, 57.020*units.LitrePerMinute, 1e-4) {
		t.Errorf("flows %v, %v; want 26.86 and 57.02 L/min", r.Flow, r.ReturnFlow)
	}
}

// TestSizeSealFrictionAndBackPressure: seal friction takes its share of the
// driving force p·A_in and never helps against the back pressure, which
// opposes the motion in full: η·p·A_in − p_b·A_out ≥ F (common-practice
// friction allowance on the inlet force; force balance [X]). 100 kN push
// at 160 bar against 40 bar of meter-out back pressure, φ ≥ 1.25:
// A₁ = 100 kN/(0.9·160 bar − 40 bar/1.25) = 8.929·10⁻³ m², D = 106.62 mm
// → 110 mm, rod ≥ 49.19 mm → 50 mm; that cylinder needs
// (100 kN + 40 bar·A₂)/(0.9·A₁) = 152.18 bar (hand arithmetic [X]).
func TestSizeSealFrictionAndBackPressure(t *testing.T) {
	d := Duty{Force: 100 * units.Kilonewton, Pressure: 160 * units.Bar, BackPressure: 40 * units.Bar, Stroke: 500 * mm}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if !checktest.Close(r.Bore.Required, 106.6218*mm, 1e-6) || r.Bore.Chosen != 110*mm || r.Rod.Chosen != 50*mm {
		t.Errorf("bore %+v, rod %+v; want 106.62 mm → 110 mm with a 50 mm rod", r.Bore, r.Rod)
	}
	if !checktest.Close(r.Pressure.Value, 152.17994*units.Bar, 1e-6) {
		t.Errorf("pressure %v; want 152.18 bar", r.Pressure.Value)
	}
	c := r.Cylinder
	net := float64(r.Pressure.Value.TimesArea(c.CapArea()))*r.SealEfficiency - float64(d.BackPressure.TimesArea(c.AnnulusArea()))
	if !checktest.Close(net, float64(d.Force), 1e-12) {
		t.Errorf("at the pressure it needs the chosen cylinder gives η·p·A₁ − p_b·A₂ = %v N; want %v", net, d.Force)
	}
}

// TestSizeRoundTrip: for a spread of duties, the chosen cylinder delivers at
// least the total force at the available pressure after seal friction, and
// the pressure it needs is at most the available one (round trip).
func TestSizeRoundTrip(t *testing.T) {
	for _, f := range []units.Force{500, 4e3, 37e3, 120e3, 900e3} {
		for _, dir := range []Direction{Extend, Retract} {
			for _, ends := range []RodEnds{SingleRod, DoubleRod} {
				d := Duty{Direction: dir, Force: f, Mass: 300, Friction: 0.15, Speed: 0.2, AccelDistance: 20 * mm,
					Pressure: 180 * units.Bar, BackPressure: 3 * units.Bar, AreaRatio: 1.6, Stroke: 800 * mm, Ends: ends}
				r, err := d.Size()
				if err != nil || !r.Bore.OK() {
					t.Errorf("%v %v %v: %+v, %v", f, dir, ends, r.Bore, err)
					continue
				}
				got := delivered(r.Cylinder, dir, d.Pressure, d.BackPressure, r.SealEfficiency)
				if got < r.Forces.Total()*(1-1e-12) {
					t.Errorf("%v %v %v: the chosen %+v gives %v after friction, want ≥ %v", f, dir, ends, r.Cylinder, got, r.Forces.Total())
				}
				if !r.Pressure.OK() || r.Bore.Chosen < r.Bore.Required {
					t.Errorf("%v %v %v: pressure %+v, bore %+v", f, dir, ends, r.Pressure, r.Bore)
				}
				// The bore below the chosen one, with its rod, does not do the job.
				b, err := components.ISO3320Bores().Below(r.Bore.Chosen)
				if err != nil {
					continue
				}
				lower := r.Cylinder
				lower.Bore = b
				if lower.Rod >= b {
					continue
				}
				if low := delivered(lower, dir, d.Pressure, d.BackPressure, r.SealEfficiency); low >= r.Forces.Total() {
					t.Errorf("%v %v %v: the smaller bore %v would do (%v)", f, dir, ends, b, low)
				}
			}
		}
	}
}

func TestSizeFindings(t *testing.T) {
	base := Duty{Mass: 2000, Pressure: 160 * units.Bar, Stroke: 1}
	lift := base
	lift.InclineDegrees = 90
	r, err := lift.Size()
	if err != nil || len(r.Findings.Hazard(components.SuspendedLoad).AtLeast(components.Warning)) != 1 {
		t.Errorf("a vertical lift: findings %v, %v; want a suspended-load warning", r.Findings, err)
	}
	// Lowering on a 60° ramp with μ 0.1: the weight along the path, 0.866·m·g,
	// is more than the friction, 0.05·m·g: the load overruns. A pressing force
	// keeps the total positive.
	lower := base
	lower.InclineDegrees, lower.Friction, lower.Force = -60, 0.1, 40*units.Kilonewton
	r, err = lower.Size()
	if err != nil || len(r.Findings.Hazard(components.OverrunningLoad)) != 1 {
		t.Errorf("lowering: findings %v, %v; want an overrunning-load warning", r.Findings, err)
	}
	// A 10° ramp with μ 0.3: friction (0.295·m·g) holds the load (0.174·m·g).
	held := base
	held.InclineDegrees, held.Friction = 10, 0.3
	r, err = held.Size()
	if err != nil || len(r.Findings.AtLeast(components.Warning)) != 0 {
		t.Errorf("friction holds the load: findings %v, %v; want no warning", r.Findings, err)
	}
	// Speed without a ramp: a notice that acceleration is left out.
	fast := base
	fast.Speed = 0.3
	fast.Force = 1000
	r, _ = fast.Size()
	if len(r.Findings.Topic("actuator.no-acceleration")) != 1 {
		t.Errorf("findings %v; want the no-acceleration notice", r.Findings)
	}
}

// TestSizeBeyondSeries: 20 MN at 100 bar needs a 1.68 m bore, beyond
// ISO 3320's 500 mm: a failed choice and a finding, not an error.
func TestSizeBeyondSeries(t *testing.T) {
	d := Duty{Force: 20e6, Pressure: 100 * units.Bar, Stroke: 1}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if r.Bore.OK() || r.Bore.Chosen != 0 || r.Cylinder != (Cylinder{}) || r.Pressure.OK() {
		t.Errorf("beyond the series: bore %+v, cylinder %+v, pressure %+v", r.Bore, r.Cylinder, r.Pressure)
	}
	if len(r.Findings.Topic("actuator.no-standard-size")) != 1 {
		t.Errorf("findings %v; want the no-standard-size notice", r.Findings)
	}
	// The failed pressure check quotes the 500 mm bore with a 1.25 rod:
	// 20 MN/0.9/(π/4·0.5²) = 1131.8 bar.
	if !checktest.Close(r.Pressure.Value, 1131.77*units.Bar, 1e-4) {
		t.Errorf("largest bore needs %v; want 1131.8 bar", r.Pressure.Value)
	}
}

// TestSizeNoBoreNoRod: the minimum bore, 499 mm, is within ISO 3320, but
// the 500 mm bore with the 360 mm rod its least area ratio 2 asks for needs
// 880 kN/(0.9·π/4·(0.5² − 0.36²)) = 114.9 bar for the pull, more than the
// 100 bar available (hand arithmetic [X]): no cylinder is chosen, so no rod
// is chosen either.
func TestSizeNoBoreNoRod(t *testing.T) {
	d := Duty{Direction: Retract, Force: 880 * units.Kilonewton, Pressure: 100 * units.Bar, AreaRatio: 2, Stroke: 1}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if !checktest.Close(r.Bore.Required, 499.0*mm, 1e-3) || r.Bore.Chosen != 0 || r.Cylinder != (Cylinder{}) {
		t.Errorf("bore %+v, cylinder %+v; want 499 mm required and none chosen", r.Bore, r.Cylinder)
	}
	if r.Rod.Chosen != 0 || r.Rod.OK() {
		t.Errorf("rod %+v; want no rod chosen when no bore is", r.Rod)
	}
	if r.Pressure.OK() || len(r.Findings.Topic("actuator.no-standard-size")) != 1 {
		t.Errorf("pressure %+v, findings %v; want a failed check and the no-standard-size notice", r.Pressure, r.Findings)
	}
}

func TestSizeCallerSeries(t *testing.T) {
	in := units.Inch
	bores, _ := components.NewSeries("test inch bores", components.PracticeRule("test"),
		[]units.Length{1.5 * in, 2 * in, 2.5 * in, 3.25 * in, 4 * in}, nil)
	rods, _ := components.NewSeries("test inch rods", components.PracticeRule("test"),
		[]units.Length{0.625 * in, 1 * in, 1.375 * in, 1.75 * in}, nil)
	// 5000 lbf at 2000 psi, η 0.95: A₁ = 2.632 in², D = 1.830 in → 2 in;
	// rod ≥ 2·√0.2 = 0.894 in → 1 in (hand arithmetic [X]).
	d := Duty{Force: 5000 * units.PoundForce, Pressure: 2000 * units.PSI, SealEfficiency: 0.95,
		Stroke: 12 * in, Bores: bores, Rods: rods}
	r, err := d.Size()
	if err != nil || r.Bore.Chosen != 2*in || r.Rod.Chosen != 1*in || r.Bore.Series != "test inch bores" {
		t.Errorf("inch sizing: %+v %+v, %v", r.Bore, r.Rod, err)
	}
	if !checktest.Close(r.Bore.Required, 1.8305*in, 1e-4) || r.SealRule.Kind != components.CallerValue {
		t.Errorf("required %v in, rule %v", r.Bore.Required.Inches(), r.SealRule)
	}
}

func TestDutyBadInput(t *testing.T) {
	ok := Duty{Force: 1000, Pressure: 100 * units.Bar, Stroke: 1}
	nan := math.NaN()
	for _, w := range []struct {
		param string
		edit  func(*Duty)
	}{
		{"Duty.Direction", func(d *Duty) { d.Direction = 9 }},
		{"Duty.Force", func(d *Duty) { d.Force = -1 }},
		{"Duty.Force", func(d *Duty) { d.Force = units.Force(nan) }},
		{"Duty.Force", func(d *Duty) { d.Force = 0 }}, // nothing to size
		{"Duty.Mass", func(d *Duty) { d.Mass = -1 }},
		{"Duty.Friction", func(d *Duty) { d.Friction = math.Inf(1) }},
		{"Duty.Speed", func(d *Duty) { d.Speed = -1 }},
		{"Duty.AccelDistance", func(d *Duty) { d.AccelDistance = units.Length(nan) }},
		{"Duty.AccelTime", func(d *Duty) { d.AccelTime = -time.Second }},
		{"Duty.AccelTime", func(d *Duty) { d.AccelTime, d.AccelDistance = time.Second, 1 }},
		{"Duty.BackPressure", func(d *Duty) { d.BackPressure = -1 }},
		{"Duty.BackPressure", func(d *Duty) { d.BackPressure = 90 * units.Bar }}, // above p/φ = 80 bar: no net pull
		{"Duty.InclineDegrees", func(d *Duty) { d.InclineDegrees = 91 }},
		{"Duty.Pressure", func(d *Duty) { d.Pressure = 0 }},
		{"Duty.SealEfficiency", func(d *Duty) { d.SealEfficiency = 1.1 }},
		{"Duty.SealEfficiency", func(d *Duty) { d.SealEfficiency = -0.1 }},
		{"Duty.AreaRatio", func(d *Duty) { d.AreaRatio = 1 }},
		{"Duty.Stroke", func(d *Duty) { d.Stroke = 0 }},
		{"Duty.Ends", func(d *Duty) { d.Ends = 3 }},
		{"Duty.Action", func(d *Duty) { d.Action = 3 }},
		{"Duty.Direction", func(d *Duty) { d.Action, d.Direction = SingleActing, Retract }},
		{"Duty.Buckling.Yield", func(d *Duty) { d.Buckling = &Column{Retracted: 1, Relief: 1} }},
		{"Duty.Buckling.RodEnd", func(d *Duty) {
			d.Buckling = &Column{Body: Trunnion, RodEnd: RodFree, Retracted: 1, Relief: 1, Yield: 1}
		}},
	} {
		d := ok
		d.Direction = Retract // the pull stroke, so a large back pressure leaves no net force
		w.edit(&d)
		_, err := d.Size()
		checktest.RangeErrorIn(t, err, "actuator.Duty.Size", w.param)
		if w.param == "Duty.Buckling.Yield" || w.param == "Duty.Buckling.RodEnd" {
			continue
		}
		_, err = d.MinimumBore()
		checktest.RangeErrorIn(t, err, "actuator.Duty.MinimumBore", w.param)
	}
}

// pressDuty is a horizontal press stroke that lands on a preferred bore,
// so sizing returns no findings.
func pressDuty() Duty {
	return Duty{Force: 70 * units.Kilonewton, Mass: 300, Friction: 0.1, Speed: 0.2, AccelDistance: 30 * mm,
		Pressure: 160 * units.Bar, Stroke: 600 * mm}
}

func TestSizeAllocations(t *testing.T) {
	d := pressDuty()
	if n := testing.AllocsPerRun(100, func() { _, _ = d.MinimumBore() }); n != 0 {
		t.Errorf("MinimumBore allocates %v times; want 0", n)
	}
	if n := testing.AllocsPerRun(100, func() { _, _ = d.Size() }); n != 0 {
		t.Errorf("Size without findings allocates %v times; want 0", n)
	}
}

func BenchmarkDutyMinimumBore(b *testing.B) {
	d := pressDuty()
	b.ReportAllocs()
	for b.Loop() {
		_, _ = d.MinimumBore()
	}
}

func BenchmarkDutySize(b *testing.B) {
	d := pressDuty()
	b.ReportAllocs()
	for b.Loop() {
		_, _ = d.Size()
	}
}

// TestSizeLandsOnISO3320: a duty whose minimum bore is just under each
// ISO 3320 bore chooses that bore, and the second-choice sizes are marked
// (ISO 3320 bores, mm, from memory: 8 10 12 16 20 25 32 40 50 63 80 (90) 100
// (110) 125 (140) 160 (180) 200 (220) 250 (280) 320 (360) 400 (450) 500).
func TestSizeLandsOnISO3320(t *testing.T) {
	bores := []float64{8, 10, 12, 16, 20, 25, 32, 40, 50, 63, 80, 90, 100, 110, 125, 140, 160, 180, 200,
		220, 250, 280, 320, 360, 400, 450, 500}
	second := map[float64]bool{90: true, 110: true, 140: true, 180: true, 220: true, 280: true, 360: true, 450: true}
	p := 100 * units.Bar
	for _, b := range bores {
		want := units.Length(b) * mm
		f := p.TimesArea(units.CircleArea(want)) * units.Force(DefaultSealEfficiency*(1-1e-9))
		r, err := Duty{Force: f, Pressure: p, Stroke: 1}.Size()
		if err != nil || r.Bore.Chosen != want {
			t.Errorf("minimum bore just under %v mm: chose %v, %v", b, r.Bore.Chosen, err)
			continue
		}
		if got := len(r.Findings.Topic("actuator.second-choice-bore")) == 1; got != second[b] {
			t.Errorf("%v mm: second-choice notice %v; want %v", b, got, second[b])
		}
	}
}

// delivered is the force at the rod after seal friction, η·p·A_in −
// p_b·A_out, written out here from the areas (the force balance [X]).
func delivered(c Cylinder, dir Direction, p, back units.Pressure, eta float64) units.Force {
	return p.TimesArea(c.Area(dir))*units.Force(eta) - back.TimesArea(c.OutletArea(dir))
}

// TestFitIsSizeWithoutFindings: Fit gives Size's result, field for field,
// with no findings, and Findings of the fit gives Size's findings, for duties that land on a preferred and a second-choice
// bore, need a thicker rod for buckling, find no rod that does not buckle,
// are beyond every standard size and pull against a back pressure; and its
// errors are Size's, naming Fit.
func TestFitIsSizeWithoutFindings(t *testing.T) {
	col := balerColumn()
	long := balerColumn()
	long.Retracted = 20 * units.Metre
	press := pressDuty()
	second := pressDuty()
	second.Force = 100 * units.Bar.TimesArea(units.CircleArea(140*mm)) * DefaultSealEfficiency * 0.999
	second.Pressure, second.Mass = 100*units.Bar, 0
	buckles := Duty{Force: 150 * units.Kilonewton, Pressure: 230 * units.Bar, Stroke: 1200 * mm, Buckling: &col}
	noRod := buckles
	noRod.Buckling = &long
	beyond := pressDuty()
	beyond.Force = 80000 * units.Kilonewton
	pull := pressDuty()
	pull.Direction, pull.BackPressure, pull.Mass, pull.InclineDegrees = Retract, 12*units.Bar, 2000, 60
	for name, d := range map[string]Duty{"preferred": press, "second choice": second, "buckling": buckles,
		"no rod": noRod, "beyond": beyond, "pull": pull} {
		want, err := d.Size()
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if name != "preferred" && name != "buckling" && len(want.Findings) == 0 {
			t.Errorf("%s: Size has no findings; the case tests nothing", name)
		}
		got, err := d.Fit()
		if err != nil || got.Findings != nil {
			t.Errorf("%s: Fit error %v, findings %v; want none", name, err, got.Findings)
		}
		if diff := cmp.Diff(want.Findings, d.Findings(got), cmp.Comparer(sameText)); diff != "" {
			t.Errorf("%s: Findings of the fit differ from Size's (-Size +Findings):\n%s", name, diff)
		}
		want.Findings = nil
		if diff := cmp.Diff(want, got); diff != "" {
			t.Errorf("%s: Fit differs from Size (-Size +Fit):\n%s", name, diff)
		}
	}
	bad := pressDuty()
	bad.Stroke = 0
	r, err := bad.Fit()
	checktest.RangeErrorIn(t, err, "actuator.Duty.Fit", "Duty.Stroke")
	if !cmp.Equal(r, CylinderSize{}) {
		t.Errorf("Fit beside an error = %+v; want the zero CylinderSize", r)
	}
}

func TestFitAllocations(t *testing.T) {
	d := pressDuty()
	if n := testing.AllocsPerRun(100, func() { _, _ = d.Fit() }); n != 0 {
		t.Errorf("Fit allocates %v times; want 0", n)
	}
	col := balerColumn()
	d = Duty{Force: 150 * units.Kilonewton, Pressure: 230 * units.Bar, Stroke: 1200 * mm, Buckling: &col}
	if n := testing.AllocsPerRun(100, func() { _, _ = d.Fit() }); n != 1 {
		t.Errorf("Fit with buckling allocates %v times; want 1, the check it points to", n)
	}
}

// BenchmarkDutyFit sizes the baler's press stroke with its buckling check,
// without the findings.
func BenchmarkDutyFit(b *testing.B) {
	col := balerColumn()
	d := Duty{Force: 150 * units.Kilonewton, Pressure: 230 * units.Bar, Stroke: 1200 * mm, Buckling: &col}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := d.Fit(); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkDutySizeBuckling is the same with the findings.
func BenchmarkDutySizeBuckling(b *testing.B) {
	col := balerColumn()
	d := Duty{Force: 150 * units.Kilonewton, Pressure: 230 * units.Bar, Stroke: 1200 * mm, Buckling: &col}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := d.Size(); err != nil {
			b.Fatal(err)
		}
	}
}

// TestRodLeavesAnAnnulus: a long, lightly loaded stroke on a clevis needs
// a thick rod against buckling (the baler's ejector: 9.4 kN at 180 bar,
// 1200 mm, pinned both ends); its bore then grows with the rod instead of
// staying at the least bore around it: no rod above 0.8 × its bore (our
// choice: catalogue cylinders pair rods up to about 0.7 × the bore, and a
// rod of 70 mm in an 80 mm bore leaves a 5 mm annulus for seals and
// guide). Each choice is checked on its own: the rod is no thinner than
// buckling asks (the check passes) and no thicker than 0.8 × the bore.
func TestRodLeavesAnAnnulus(t *testing.T) {
	col := Column{Body: Clevis, RodEnd: RodPinned, Retracted: 1400 * mm, Relief: 163 * units.Bar, Yield: 300 * units.Megapascal}
	d := Duty{Force: 9.4 * units.Kilonewton, Pressure: 180 * units.Bar, Stroke: 1200 * mm, Buckling: &col}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if r.Rod.Chosen > 0.8*r.Bore.Chosen || r.Buckling == nil || !r.Buckling.Safety.OK() {
		t.Errorf("bore %v, rod %v (%.3g of the bore), buckling %+v", r.Bore.Chosen, r.Rod.Chosen,
			float64(r.Rod.Chosen/r.Bore.Chosen), r.Buckling)
	}
	// A least area ratio that asks for a thick rod still gets it.
	d = pressDuty()
	d.AreaRatio = 3 // rod ≥ 0.816 × bore
	if r, err := d.Size(); err != nil || !r.Bore.OK() || r.AreaRatio != 3 {
		t.Errorf("area ratio 3: %+v, %v", r.Bore, err)
	}
}

// sameText compares findings by what they say: severity, hazard, topic,
// rule and sentence.
func sameText(f, g components.Finding) bool {
	m := units.Metric()
	return f.Severity == g.Severity && f.Hazard == g.Hazard && f.Topic == g.Topic && f.Rule == g.Rule && f.Text(m) == g.Text(m)
}
