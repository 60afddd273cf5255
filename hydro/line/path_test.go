package line

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// vg46At50 is a demo oil state: 30 mm²/s, 860 kg/m³.
var vg46At50 = Oil{Temperature: units.TemperatureFromCelsius(50), Viscosity: 30 * units.SquareMillimetrePerSecond, Density: 860}

func TestPipeLaminarIsHagenPoiseuille(t *testing.T) {
	// Hagen–Poiseuille: Δp = 128·μ·L·Q/(π·d⁴), an independent form of
	// laminar pipe flow (Darcy–Weisbach with f = 64/Re reduces to it).
	p := Pipe{Name: "drain", Length: 4, Bore: 10 * units.Millimetre}
	q := 5 * units.LitrePerMinute
	d, err := Path{Elements: []Element{p}}.Drop(q, vg46At50)
	if err != nil {
		t.Fatal(err)
	}
	mu := float64(vg46At50.Viscosity) * float64(vg46At50.Density)
	want := 128 * mu * 4 * float64(q) / (math.Pi * math.Pow(0.01, 4))
	e := d.Elements[0]
	if math.Abs(float64(d.Total)-want) > 1e-12*want || e.Regime != Laminar {
		t.Errorf("laminar drop = %v (%v, Re %g), want %g Pa", d.Total, e.Regime, e.Reynolds, want)
	}
}

func TestPipeTurbulentDarcyWeisbach(t *testing.T) {
	// Choose the flow so that Re is 1e5 and ε/D 1e-4: then f is the
	// published Colebrook value 0.0185139 and Δp = f·(L/D)·ρv²/2.
	bore := 20 * units.Millimetre
	oil := Oil{Viscosity: 2e-6, Density: 850}
	v := 1e5 * 2e-6 / 0.02 // m/s for Re 1e5
	q := units.Velocity(v).TimesArea(units.CircleArea(bore))
	d, err := Path{Elements: []Element{Pipe{Length: 10, Bore: bore, Roughness: 2 * units.Micrometre}}}.Drop(q, oil)
	if err != nil {
		t.Fatal(err)
	}
	e := d.Elements[0]
	want := 0.0185139 * (10 / 0.02) * 850 * v * v / 2
	if math.Abs(e.Reynolds-1e5) > 1e-6 || math.Abs(e.Friction-0.0185139) > 5e-8 ||
		math.Abs(float64(e.Drop)-want) > 5e-8/0.0185139*want || e.Regime != Turbulent {
		t.Errorf("Re %g f %g drop %v, want Re 1e5, f 0.0185139 (Colebrook, published), drop %g Pa", e.Reynolds, e.Friction, e.Drop, want)
	}
}

func TestRatedScaling(t *testing.T) {
	valve := Rated{Name: "valve", Drop: 5 * units.Bar, Flow: 60 * units.LitrePerMinute}
	d, _ := Path{Elements: []Element{valve}}.Drop(120*units.LitrePerMinute, vg46At50)
	if got := d.Total.Bar(); math.Abs(got-20) > 1e-12 {
		t.Errorf("orifice law: 5 bar at 60 L/min → %g bar at 120 L/min, want 20", got)
	}
	valve.Density = 880 // data sheet at 880 kg/m³: Δp ∝ ρ
	d, _ = Path{Elements: []Element{valve}}.Drop(60*units.LitrePerMinute, vg46At50)
	if got, want := d.Total.Bar(), 5*860.0/880; math.Abs(got-want) > 1e-12 {
		t.Errorf("orifice law with density: %g bar, want %g", got, want)
	}
	filter := Rated{Name: "filter", Drop: 0.4 * units.Bar, Flow: 100 * units.LitrePerMinute, Law: Viscous,
		Viscosity: 30 * units.SquareMillimetrePerSecond}
	cold := Oil{Viscosity: 600 * units.SquareMillimetrePerSecond, Density: 880}
	d, _ = Path{Elements: []Element{filter}}.Drop(50*units.LitrePerMinute, cold)
	if got := d.Total.Bar(); math.Abs(got-0.4*0.5*20) > 1e-12 {
		t.Errorf("viscous law: %g bar, want 4 (half the flow, twenty times the viscosity)", got)
	}
}

func TestFittingK(t *testing.T) {
	// K of a standard 90° elbow and a tee through the branch in Schedule 40
	// pipe, as Crane Technical Paper No. 410's K-factor table gives them by
	// nominal size (K = f_T·L/D with its f_T to two digits; from memory).
	// We compute f_T from the rough-pipe limit of Colebrook–White, which
	// lies up to 5 % below the table's rounded f_T at the small sizes.
	// Inside diameters of Schedule 40 pipe, ASME B36.10M (from memory).
	for _, c := range []struct {
		id           float64 // mm
		elbow, teeBr float64
	}{
		{15.80, 0.81, 1.62}, // ½ in
		{20.93, 0.75, 1.50}, // ¾ in
		{26.64, 0.69, 1.38}, // 1 in
		{35.05, 0.66, 1.32}, // 1¼ in
		{40.89, 0.63, 1.26}, // 1½ in
		{52.50, 0.57, 1.14}, // 2 in
	} {
		bore := units.Length(c.id) * units.Millimetre
		ke, rule, err := Elbow90.K(bore)
		kt, _, _ := TeeBranch.K(bore)
		if err != nil || math.Abs(ke-c.elbow) > 0.06*c.elbow || math.Abs(kt-c.teeBr) > 0.06*c.teeBr || rule.Kind != components.Handbook {
			t.Errorf("ID %g mm: elbow K %.3f (table %.2f), tee K %.3f (table %.2f), %v", c.id, ke, c.elbow, kt, c.teeBr, err)
		}
	}
	// The rough-pipe f_T needs ε/D within the friction range (ε = 0.045 mm
	// at most a tenth of the bore): at ε/(3.7·D) = 1 the formula divides by
	// log²(1) = 0, and below 0.45 mm it means nothing.
	for _, bore := range []units.Length{CommercialSteel / 3.7, 10 * units.Micrometre, 0.44 * units.Millimetre} {
		k, _, err := Elbow90.K(bore)
		if k != 0 {
			t.Errorf("Elbow90.K(%v) = %v beside %v, want 0", bore, k, err)
		}
		wantRangeError(t, "tiny bore "+bore.String(), err, "bore")
	}
	if k, _, err := Elbow90.K(0.45 * units.Millimetre); err != nil || !(k > 0) {
		t.Errorf("Elbow90.K(0.45 mm) = %v, %v; want a K", k, err)
	}
	if k, _, _ := Exit.K(0.01); k != 1 {
		t.Errorf("exit K = %g, want 1", k)
	}
	// A fitting's drop is K·n·ρv²/2.
	f := Fitting{Name: "elbows", K: 0.9, Bore: 12 * units.Millimetre, Count: 3}
	q := 20 * units.LitrePerMinute
	d, _ := Path{Elements: []Element{f}}.Drop(q, vg46At50)
	v, _ := Velocity(q, f.Bore)
	want := 3 * 0.9 * 860 * float64(v) * float64(v) / 2
	if math.Abs(float64(d.Total)-want) > 1e-12*want || d.Elements[0].Rule.Kind != components.CallerValue {
		t.Errorf("fitting drop %v (%v), want %g Pa by the caller's K", d.Total, d.Elements[0].Rule, want)
	}
}

func TestPathBudgetAndChecks(t *testing.T) {
	// A return path: valve, cooler, filter with bypass, into the tank.
	p := Path{Name: "return", Elements: []Element{
		Rated{Name: "valve", Drop: 3 * units.Bar, Flow: 80 * units.LitrePerMinute},
		Rated{Name: "cooler", Drop: 1 * units.Bar, Flow: 80 * units.LitrePerMinute, Rating: 10 * units.Bar},
		Rated{Name: "filter", Drop: 1 * units.Bar, Flow: 80 * units.LitrePerMinute, Law: Viscous, Bypass: 2.5 * units.Bar,
			Viscosity: 30 * units.SquareMillimetrePerSecond},
		Fitting{Name: "tank exit", Kind: Exit, Bore: 25 * units.Millimetre},
	}}
	q := 80 * units.LitrePerMinute
	d, err := p.Drop(q, vg46At50)
	if err != nil {
		t.Fatal(err)
	}
	// Inlet pressures accumulate from the tank back.
	sum := units.Pressure(0)
	for i := len(d.Elements) - 1; i >= 0; i-- {
		sum += d.Elements[i].Drop
		if math.Abs(float64(d.Elements[i].Inlet-sum)) > 1e-9 {
			t.Errorf("element %d inlet %v, want %v", i, d.Elements[i].Inlet, sum)
		}
	}
	if d.Inlet() != sum || d.Total != sum || len(d.Checks) != 2 || len(d.Findings) != 0 {
		t.Errorf("warm: inlet %v total %v, %d checks, findings %v", d.Inlet(), d.Total, len(d.Checks), d.Findings)
	}
	// Cold oil: the filter's drop exceeds its bypass and is capped.
	cold := Oil{Viscosity: 900 * units.SquareMillimetrePerSecond, Density: 880}
	d, _ = p.Drop(q, cold)
	f := d.Elements[2]
	if !f.Bypassed || f.Drop != 2.5*units.Bar || len(d.Findings.Hazard(components.FilterBypass)) != 1 {
		t.Errorf("cold filter: drop %v bypassed %v, findings %v", f.Drop, f.Bypassed, d.Findings)
	}
	// A cooler rated below the pressure it sees fails its check.
	p.Elements[1] = Rated{Name: "cooler", Drop: 1 * units.Bar, Flow: 80 * units.LitrePerMinute, Rating: 2 * units.Bar}
	d, _ = p.Drop(q, cold)
	if ws := d.Findings.Hazard(components.Burst); len(ws) != 1 || ws[0].Severity != components.Warning || d.Checks[0].OK() {
		t.Errorf("cooler rating: checks %v findings %v", d.Checks, d.Findings)
	}
	if pw := d.Power(); math.Abs(float64(pw)-float64(d.Total)*float64(q)) > 1e-9 {
		t.Errorf("Power = %v, want Δp·Q", pw)
	}
}

func TestPathNotes(t *testing.T) {
	// Transitional pipe and laminar fitting each get a notice.
	oil := Oil{Viscosity: 46 * units.SquareMillimetrePerSecond, Density: 870}
	bore := 20 * units.Millimetre
	q := units.Velocity(3000 * 46e-6 / 0.02).TimesArea(units.CircleArea(bore)) // Re 3000
	d, _ := Path{Elements: []Element{Pipe{Name: "hose", Length: 2, Bore: bore}}}.Drop(q, oil)
	if len(d.Findings.Topic("line.transitional")) != 1 {
		t.Errorf("Re 3000 pipe: findings %v", d.Findings)
	}
	d, _ = Path{Elements: []Element{Fitting{Kind: Elbow90, Bore: bore}}}.Drop(q/2, oil)
	if n := d.Findings.Topic("line.fitting-laminar"); len(n) != 1 || d.Elements[0].Name != "element 1" {
		t.Errorf("laminar fitting: findings %v, name %q", d.Findings, d.Elements[0].Name)
	}
}

func TestPathBadInput(t *testing.T) {
	good := Pipe{Length: 1, Bore: 0.01}
	for _, c := range []struct {
		name  string
		p     Path
		q     units.Flow
		o     Oil
		param string
	}{
		{"no flow", Path{Elements: []Element{good}}, 0, vg46At50, "q"},
		{"no elements", Path{}, 1e-3, vg46At50, "Elements"},
		{"nil element", Path{Elements: []Element{good, nil}}, 1e-3, vg46At50, "Elements[1]"},
		{"no viscosity", Path{Elements: []Element{good}}, 1e-3, Oil{Density: 860}, "oil.Viscosity"},
		{"no density", Path{Elements: []Element{good}}, 1e-3, Oil{Viscosity: 1e-5}, "oil.Density"},
		{"outlet", Path{Elements: []Element{good}, Outlet: -1}, 1e-3, vg46At50, "Outlet"},
		{"pipe length", Path{Elements: []Element{good, Pipe{Bore: 0.01}}}, 1e-3, vg46At50, "Elements[1].Length"},
		{"pipe bore", Path{Elements: []Element{Pipe{Length: 1}}}, 1e-3, vg46At50, "Elements[0].Bore"},
		{"rough", Path{Elements: []Element{Pipe{Length: 1, Bore: 0.01, Roughness: 0.002}}}, 1e-3, vg46At50, "Elements[0].Roughness"},
		{"fitting custom", Path{Elements: []Element{Fitting{Bore: 0.01}}}, 1e-3, vg46At50, "Elements[0].Kind"},
		{"fitting tiny bore", Path{Elements: []Element{Fitting{Kind: Elbow90, Bore: 1e-5}}}, 1e-3, vg46At50, "Elements[0].Bore"},
		{"fitting K", Path{Elements: []Element{Fitting{Bore: 0.01, K: -1}}}, 1e-3, vg46At50, "Elements[0].K"},
		{"fitting count", Path{Elements: []Element{Fitting{Bore: 0.01, K: 1, Count: -2}}}, 1e-3, vg46At50, "Elements[0].Count"},
		{"rated drop", Path{Elements: []Element{Rated{Flow: 1}}}, 1e-3, vg46At50, "Elements[0].Drop"},
		{"rated flow", Path{Elements: []Element{Rated{Drop: 1}}}, 1e-3, vg46At50, "Elements[0].Flow"},
		{"rated law", Path{Elements: []Element{Rated{Drop: 1, Flow: 1, Law: 7}}}, 1e-3, vg46At50, "Elements[0].Law"},
		{"rated bypass", Path{Elements: []Element{Rated{Drop: 1, Flow: 1, Bypass: -1}}}, 1e-3, vg46At50, "Elements[0].Bypass"},
	} {
		d, err := c.p.Drop(c.q, c.o)
		if d.Total != 0 || d.Elements != nil {
			t.Errorf("%s: non-zero result beside the error", c.name)
		}
		wantRangeErrorIn(t, c.name, err, "line.Path.Drop", c.param)
		total, err := c.p.TotalDrop(c.q, c.o)
		if total != 0 {
			t.Errorf("%s: TotalDrop %v beside the error", c.name, total)
		}
		wantRangeErrorIn(t, c.name+" total", err, "line.Path.TotalDrop", c.param)
	}
}

// returnPath is a four-element return path: tube, elbows, a filter with a
// bypass and a rating, and the tank inlet.
func returnPath() Path {
	mm := units.Millimetre
	return Path{Name: "return", Elements: []Element{
		Pipe{Name: "tube", Length: 6, Bore: 19 * mm, Roughness: DrawnTubing},
		Fitting{Name: "elbows", Kind: Elbow90, Bore: 19 * mm, Count: 3},
		Rated{Name: "filter", Drop: 0.5 * units.Bar, Flow: 60 * units.LitrePerMinute, Law: Viscous,
			Viscosity: 32 * units.SquareMillimetrePerSecond, Bypass: 2.5 * units.Bar, Rating: 10 * units.Bar},
		Fitting{Name: "exit", Kind: Exit, Bore: 19 * mm},
	}}
}

// TestTotalDropIsDropTotal: TotalDrop gives Drop's Total bit for bit, in
// laminar, transitional and turbulent flow, with the filter below and above
// its bypass setting and with a square-law valve.
func TestTotalDropIsDropTotal(t *testing.T) {
	p := returnPath()
	p.Elements = append(p.Elements, Rated{Name: "valve", Drop: 4 * units.Bar, Flow: 100 * units.LitrePerMinute})
	for _, q := range []units.Flow{0.5 * units.LitrePerMinute, 20 * units.LitrePerMinute, 60 * units.LitrePerMinute, 400 * units.LitrePerMinute} {
		d, err := p.Drop(q, vg46At50)
		if err != nil {
			t.Fatal(err)
		}
		total, err := p.TotalDrop(q, vg46At50)
		if err != nil || total != d.Total {
			t.Errorf("at %v: TotalDrop = %v, %v; Drop's Total %v", q, total, err, d.Total)
		}
	}
}

func TestTotalDropAllocations(t *testing.T) {
	p := returnPath()
	if n := testing.AllocsPerRun(100, func() { _, _ = p.TotalDrop(60*units.LitrePerMinute, vg46At50) }); n != 0 {
		t.Errorf("TotalDrop allocates %v times; want 0", n)
	}
}

// BenchmarkPathDrop takes the budget of a four-element return path.
func BenchmarkPathDrop(b *testing.B) {
	p := returnPath()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := p.Drop(60*units.LitrePerMinute, vg46At50); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkPathTotalDrop takes only the total of the same path.
func BenchmarkPathTotalDrop(b *testing.B) {
	p := returnPath()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := p.TotalDrop(60*units.LitrePerMinute, vg46At50); err != nil {
			b.Fatal(err)
		}
	}
}
