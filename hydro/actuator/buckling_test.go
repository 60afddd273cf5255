package actuator

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

const (
	gpa = units.Gigapascal
	mpa = units.Megapascal
)

// TestEffectiveLengthFactor: Euler's cases, K = 0.5 fixed–fixed, 0.7
// fixed–pinned (0.699 exactly, rounded as design texts print it),
// 1 pinned–pinned, 2 fixed–free (Timoshenko and Gere, Theory of Elastic
// Stability, 2nd ed., chapter 2, from memory; the same four in any
// strength-of-materials text).
func TestEffectiveLengthFactor(t *testing.T) {
	for _, w := range []struct {
		body BodyMount
		rod  RodEnd
		k    float64
	}{
		{Flange, RodFixed, 0.5}, {Feet, RodFixed, 0.5},
		{Flange, RodPinned, 0.7}, {Feet, RodPinned, 0.7}, {Trunnion, RodFixed, 0.7}, {Clevis, RodFixed, 0.7},
		{Trunnion, RodPinned, 1}, {Clevis, RodPinned, 1},
		{Flange, RodFree, 2}, {Feet, RodFree, 2},
	} {
		k, err := EffectiveLengthFactor(w.body, w.rod)
		if err != nil || k != w.k {
			t.Errorf("EffectiveLengthFactor(%v, %v) = %v, %v; want %v", w.body, w.rod, k, err, w.k)
		}
	}
	for _, b := range []BodyMount{Trunnion, Clevis} {
		_, err := EffectiveLengthFactor(b, RodFree)
		checktest.RangeErrorIn(t, err, "actuator.EffectiveLengthFactor", "rod")
	}
	_, err := EffectiveLengthFactor(9, RodPinned)
	checktest.RangeError(t, err, "body")
	_, err = EffectiveLengthFactor(Flange, 9)
	checktest.RangeError(t, err, "rod")
}

// TestEulerClosedForm: P = π²·E·I/(K·L)², I = π·d⁴/64 (Euler's column
// formula; Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., from
// memory). A 40 mm steel rod, 2 m between pins: I = 1.2566·10⁻⁷ m⁴,
// P = 65.11 kN; λ = 200, above λ_c = 108 for 355 MPa steel. The same rod
// 3 m long under each K carries π²EI/(3K)² (λ ≥ 150: Euler throughout).
func TestEulerClosedForm(t *testing.T) {
	d, l, e, sy := 40*mm, 3*units.Metre, 210*gpa, 355*mpa
	i := math.Pi * math.Pow(0.04, 4) / 64
	for _, k := range []float64{0.5, 0.7, 1, 2} {
		want := units.Force(math.Pi * math.Pi * 210e9 * i / math.Pow(k*3, 2))
		p, m, err := CriticalLoad(d, units.Length(k)*l, e, sy)
		if err != nil || m != Euler || !checktest.Close(p, want, 1e-13) {
			t.Errorf("K %v: CriticalLoad = %v %v, %v; want %v Euler", k, p, m, err, want)
		}
	}
	if p, _, _ := CriticalLoad(d, 2*units.Metre, e, sy); !checktest.Close(p, 65.1132*units.Kilonewton, 1e-5) {
		t.Errorf("pinned–pinned 2 m: %v; want 65.11 kN", p)
	}
}

// TestJohnsonHandbook holds the Johnson branch against the handbook form of
// J. B. Johnson's parabola, written with the actual length l, the radius
// of gyration k and the end-condition constant C = 1/K² (Shigley's
// Mechanical Engineering Design, columns, from memory; the same formula as
// σ_cr = S_y − S_y²/(4π²E)·(l_e/r)², tangent to Euler's curve at
// l_e/r = √(2π²E/S_y), confirmed in "Johnson's parabolic formula",
// Wikipedia):
//
//	P/A = S_y − (S_y·l/(2π·k))²·1/(C·E)
func TestJohnsonHandbook(t *testing.T) {
	for _, w := range []struct {
		d, l units.Length
		k    float64
	}{{50 * mm, 500 * mm, 1}, {63 * mm, 900 * mm, 0.7}, {36 * mm, 300 * mm, 2}, {90 * mm, 3 * units.Metre, 0.5}} {
		sy, e := 420e6, 205e9
		gyr := float64(w.d) / 4
		c := 1 / (w.k * w.k)
		x := sy * float64(w.l) / (2 * math.Pi * gyr)
		want := units.Force(float64(units.CircleArea(w.d)) * (sy - x*x/(c*e)))
		p, m, err := CriticalLoad(w.d, units.Length(w.k)*w.l, units.Pressure(e), units.Pressure(sy))
		if err != nil || m != Johnson || !checktest.Close(p, want, 1e-12) {
			t.Errorf("d %v, l %v, K %v: %v %v, %v; want %v Johnson", w.d, w.l, w.k, p, m, err, want)
		}
	}
}

// TestJohnsonEulerContinuity: at λ_c the two meet at half the yield load
// (tangent), and just either side of it they agree to first order.
func TestJohnsonEulerContinuity(t *testing.T) {
	d, e, sy := 50*mm, 210*gpa, 355*mpa
	lamC := math.Pi * math.Sqrt(2*float64(e/sy))
	lkC := units.Length(lamC) * d / 4
	half := units.CircleArea(d).TimesLength(1) // A·1 m: a volume only to carry A
	py := units.Force(float64(half) * float64(sy))
	at, m, _ := CriticalLoad(d, lkC, e, sy)
	if !checktest.Close(at, py/2, 1e-12) || m != Euler {
		t.Errorf("at λ_c: %v %v; want σ_y·A/2 = %v (Euler from λ_c on)", at, m, py/2)
	}
	below, mb, _ := CriticalLoad(d, lkC*(1-1e-7), e, sy)
	above, ma, _ := CriticalLoad(d, lkC*(1+1e-7), e, sy)
	if mb != Johnson || ma != Euler || !checktest.Close(below, at, 1e-6) || !checktest.Close(above, at, 1e-6) {
		t.Errorf("around λ_c: %v %v, %v %v; want both near %v", below, mb, above, ma, at)
	}
	// Tangency: the slopes dP/dlk either side agree.
	h := lkC * 1e-4
	lo, _, _ := CriticalLoad(d, lkC-h, e, sy)
	hi, _, _ := CriticalLoad(d, lkC+h, e, sy)
	sl, sh := float64(at-lo)/float64(h), float64(hi-at)/float64(h)
	if math.Abs(sl-sh) > 1e-3*math.Abs(sl) {
		t.Errorf("slopes at λ_c: Johnson %v, Euler %v; want tangent", sl, sh)
	}
}

// TestBucklingFallsWithLengthSquared: in the Euler range, doubling the free
// length quarters the critical load (property).
func TestBucklingFallsWithLengthSquared(t *testing.T) {
	d, e, sy := 45*mm, 210*gpa, 355*mpa
	for l := 2.0; l < 20; l *= 1.37 {
		p1, m1, _ := CriticalLoad(d, units.Length(l), e, sy)
		p2, m2, _ := CriticalLoad(d, units.Length(2*l), e, sy)
		if m1 != Euler || m2 != Euler || !checktest.Close(p2, p1/4, 1e-13) {
			t.Errorf("l %v m: %v, 2l: %v; want a quarter", l, p1, p2)
		}
	}
	// Johnson too never rises with length.
	last := units.Force(math.Inf(1))
	for l := 0.05; l < 3; l += 0.05 {
		p, _, _ := CriticalLoad(d, units.Length(l), e, sy)
		if p > last {
			t.Errorf("critical load rose from %v to %v at %v m", last, p, l)
		}
		last = p
	}
}

// balerColumn is a demo column: a 100/56 cylinder with 1200 mm stroke on a
// rear clevis, rod eye on a guided pin, relief 250 bar.
func balerColumn() Column {
	return Column{
		Cylinder: Cylinder{Bore: 100 * mm, Rod: 56 * mm, Stroke: 1200 * mm},
		Body:     Clevis, RodEnd: RodPinned,
		Retracted: 450 * mm, Relief: 250 * units.Bar, Yield: 355 * mpa,
	}
}

// TestColumnCheck: K = 1, L = 1.65 m, λ = 4·1.65/0.056 = 117.9 > λ_c =
// 108.0: Euler, P = π³·210 GPa·0.056⁴/(64·1.65²) = 367.5 kN; thrust
// 250 bar·π/4·0.1² = 196.3 kN: safety 1.87, below 3.5 (hand
// arithmetic [X]).
func TestColumnCheck(t *testing.T) {
	c := balerColumn()
	r, err := c.Check()
	if err != nil {
		t.Fatal(err)
	}
	wantP := units.Force(math.Pow(math.Pi, 3) * 210e9 * math.Pow(0.056, 4) / (64 * 1.65 * 1.65))
	if r.Method != Euler || !checktest.Close(r.Critical, wantP, 1e-12) || !checktest.Close(r.Slenderness, 117.857, 1e-5) ||
		!checktest.Close(r.Thrust, 196.35*units.Kilonewton, 1e-4) || r.K != 1 || !checktest.Close(r.Length, 1650*mm, 1e-15) {
		t.Errorf("check = %+v; want Euler %v", r, wantP)
	}
	if r.Safety.OK() || r.Safety.Limit != 3.5 || r.Safety.Rule.Kind != components.CommonPractice ||
		!checktest.Close(r.Safety.Value, float64(wantP/r.Thrust), 1e-12) {
		t.Errorf("safety = %+v; want a failed check against 3.5 (common practice)", r.Safety)
	}
	if len(r.Findings.AtLeast(components.Warning).Topic("actuator.buckling").Hazard(components.Structural)) != 1 {
		t.Errorf("findings %v; want a buckling warning", r.Findings)
	}
	// Passing: a short stocky rod.
	c.Cylinder.Stroke, c.Retracted, c.Cylinder.Rod = 100*mm, 200*mm, 70*mm
	r, err = c.Check()
	if err != nil || !r.Safety.OK() || r.Method != Johnson || len(r.Findings) != 0 {
		t.Errorf("stocky rod: %+v, %v; want a pass by Johnson", r, err)
	}
	// Caller's K and factor are used and labelled.
	c.K, c.Factor, c.E = 0.8, 2, 200*gpa
	r, _ = c.Check()
	if r.K != 0.8 || r.KRule.Kind != components.CallerValue || r.Safety.Limit != 2 ||
		r.Safety.Rule.Kind != components.CallerValue || r.E != 200*gpa || r.ERule.Kind != components.CallerValue {
		t.Errorf("caller's values: %+v", r)
	}
}

// TestMinimumRod: the least diameter gives exactly the factor (Euler and
// Johnson regimes, single- and double-rod); the chosen standard rod passes
// and the next smaller one does not.
func TestMinimumRod(t *testing.T) {
	for _, w := range []struct {
		name            string
		bore, retracted units.Length
		relief          units.Pressure
		ends            RodEnds
		method          BucklingMethod
	}{
		// 100 bar on a 100 mm bore, 3 m + 1.2 m: d ≈ 70 mm, λ ≈ 171.
		{"long, Euler", 100 * mm, 3 * units.Metre, 100 * units.Bar, SingleRod, Euler},
		{"long double rod", 100 * mm, 3 * units.Metre, 100 * units.Bar, DoubleRod, Euler},
		// 250 bar on a 200 mm bore, 0.45 m + 1.2 m: d ≈ 108 mm, λ ≈ 61.
		{"short, Johnson", 200 * mm, 450 * mm, 250 * units.Bar, SingleRod, Johnson},
		{"short double rod", 200 * mm, 450 * mm, 250 * units.Bar, DoubleRod, Johnson},
	} {
		c := balerColumn()
		c.Cylinder.Bore, c.Cylinder.Ends, c.Retracted, c.Relief = w.bore, w.ends, w.retracted, w.relief
		r, err := c.MinimumRod(components.Series[units.Length]{})
		if err != nil || !r.Rod.OK() || !r.Check.Safety.OK() {
			t.Errorf("%s: %+v, %v", w.name, r, err)
			continue
		}
		exact := c
		exact.Cylinder.Rod = r.Rod.Required
		x := exact.check()
		if x.Method != w.method || !checktest.Close(x.Safety.Value, 3.5, 1e-9) {
			t.Errorf("%s: the least rod %v gives %v by %v; want 3.5 by %v", w.name, r.Rod.Required, x.Safety.Value, x.Method, w.method)
		}
		if smaller, err := components.ISO3320Rods().Below(r.Rod.Chosen); err == nil {
			c.Cylinder.Rod = smaller
			if s := c.check(); s.Safety.OK() {
				t.Errorf("%s: the smaller rod %v passes too (%v)", w.name, smaller, s.Safety.Value)
			}
		}
	}
	// No standard rod below the bore passes: a failed choice and a warning.
	c := balerColumn()
	c.Retracted = 3 * units.Metre
	r, err := c.MinimumRod(components.Series[units.Length]{})
	if err != nil || r.Rod.OK() || r.Rod.Chosen != 0 || len(r.Findings.Topic("actuator.buckling-no-rod").Hazard(components.Structural)) != 1 {
		t.Errorf("no rod passes: %+v, %v", r, err)
	}
}

// TestSizeWithBuckling: sizing picks a rod thick enough for buckling when
// the area ratio alone would give a thinner one.
func TestSizeWithBuckling(t *testing.T) {
	col := balerColumn()
	d := Duty{Force: 150 * units.Kilonewton, Pressure: 230 * units.Bar, Stroke: 1200 * mm, Buckling: &col}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	plain := d
	plain.Buckling = nil
	p, _ := plain.Size()
	if r.Buckling == nil || !r.Buckling.Safety.OK() || r.Rod.Chosen <= p.Rod.Chosen || r.Cylinder.Rod != r.Rod.Chosen {
		t.Fatalf("with buckling: rod %+v (without: %v), check %+v", r.Rod, p.Rod.Chosen, r.Buckling)
	}
	if r.Buckling.Thrust != (250 * units.Bar).TimesArea(r.Cylinder.CapArea()) {
		t.Errorf("thrust %v; want the relief setting on the cap area", r.Buckling.Thrust)
	}
}

// TestSizeBucklingNoRod: 21.2 m pin to pin at full extension is too long for
// any standard rod below any bore at 250 bar relief (the 500 mm bore would
// need d⁴ = 64·lk²·3.5·T/(π³·E), d = 525 mm; hand arithmetic [X]): sizing
// fails, and says it is the buckling, with a warning, not only that no size
// was found.
func TestSizeBucklingNoRod(t *testing.T) {
	col := balerColumn()
	col.Retracted = 20 * units.Metre
	d := Duty{Force: 150 * units.Kilonewton, Pressure: 230 * units.Bar, Stroke: 1200 * mm, Buckling: &col}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if r.Bore.Chosen != 0 || r.Rod.Chosen != 0 || r.Cylinder != (Cylinder{}) || r.Buckling != nil {
		t.Errorf("bore %+v, rod %+v, cylinder %+v, buckling %v; want nothing chosen", r.Bore, r.Rod, r.Cylinder, r.Buckling)
	}
	if len(r.Findings.Topic("actuator.buckling-no-rod").AtLeast(components.Warning).Hazard(components.Structural)) != 1 {
		t.Errorf("findings %v; want the buckling warning of the largest bore", r.Findings)
	}
	if !checktest.Close(r.Rod.Required, 525*mm, 2e-3) {
		t.Errorf("rod required %v; want about 525 mm, the buckling need at the 500 mm bore", r.Rod.Required)
	}
}

func TestColumnBadInput(t *testing.T) {
	for _, w := range []struct {
		param string
		edit  func(*Column)
	}{
		{"Column.Cylinder.Rod", func(c *Column) { c.Cylinder.Rod = c.Cylinder.Bore }},
		{"Column.Retracted", func(c *Column) { c.Retracted = 0 }},
		{"Column.Relief", func(c *Column) { c.Relief = units.Pressure(math.NaN()) }},
		{"Column.Yield", func(c *Column) { c.Yield = -1 }},
		{"Column.E", func(c *Column) { c.E = -1 }},
		{"Column.K", func(c *Column) { c.K = 20 }},
		{"Column.Factor", func(c *Column) { c.Factor = 0.5 }},
		{"Column.Body", func(c *Column) { c.Body = 9 }},
		{"Column.RodEnd", func(c *Column) { c.RodEnd = 9 }},
		{"Column.RodEnd", func(c *Column) { c.RodEnd = RodFree }}, // clevis body with a free rod end: the field, not EffectiveLengthFactor's "rod"
	} {
		c := balerColumn()
		w.edit(&c)
		_, err := c.Check()
		checktest.RangeErrorIn(t, err, "actuator.Column.Check", w.param)
		_, err = c.MinimumRod(components.Series[units.Length]{})
		checktest.RangeErrorIn(t, err, "actuator.Column.MinimumRod", w.param)
	}
	for _, p := range []string{"d", "lk", "e", "yield"} {
		args := map[string]float64{"d": 0.05, "lk": 1, "e": 2e11, "yield": 3e8}
		args[p] = 0
		_, _, err := CriticalLoad(units.Length(args["d"]), units.Length(args["lk"]), units.Pressure(args["e"]), units.Pressure(args["yield"]))
		checktest.RangeErrorIn(t, err, "actuator.CriticalLoad", p)
	}
}

func TestColumnAllocations(t *testing.T) {
	c := balerColumn()
	c.Cylinder.Rod = 90 * mm
	if n := testing.AllocsPerRun(100, func() { _, _ = c.Check() }); n != 0 {
		t.Errorf("a passing Check allocates %v times; want 0", n)
	}
	if n := testing.AllocsPerRun(100, func() { _, _ = c.MinimumRod(components.Series[units.Length]{}) }); n != 0 {
		t.Errorf("MinimumRod allocates %v times; want 0", n)
	}
}

func BenchmarkColumnMinimumRod(b *testing.B) {
	c := balerColumn()
	b.ReportAllocs()
	for b.Loop() {
		_, _ = c.MinimumRod(components.Series[units.Length]{})
	}
}
