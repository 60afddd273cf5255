package actuator

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

const mm = units.Millimetre

// textbookCylinder is the cylinder of Esposito, Fluid Power with
// Applications, 7th ed., Example 6-1 (inputs; from memory): 2 in bore,
// 1 in rod. The stroke is not part of the example.
func textbookCylinder() Cylinder {
	return Cylinder{Bore: 2 * units.Inch, Rod: 1 * units.Inch, Stroke: 10 * units.Inch}
}

// TestTextbookExtendRetract reproduces Esposito, Fluid Power with
// Applications, 7th ed., Example 6-1 (inputs [S]; results by the book's
// method; from memory): 20 gpm, a 1000 lb load both ways → extend 318.3 psi,
// 2.042 ft/s, 3.71 hp; retract 424.4 psi, 2.722 ft/s, 4.95 hp. The
// tolerances are half a unit in the last printed digit, except the retract
// speed: 2.7233 ft/s computed exactly against the 2.722 printed, which
// follows from rounded intermediate values (2.042 ft/s × 3.1416/2.356 =
// 2.7228), so it is held to ±0.002 ft/s.
func TestTextbookExtendRetract(t *testing.T) {
	c := textbookCylinder()
	q := 20 * units.USGallonPerMinute
	load := 1000 * units.PoundForce
	for _, w := range []struct {
		dir                  Direction
		psi, fts, hp         float64
		psiTol, ftsTol, hpTl float64
	}{
		{Extend, 318.3, 2.042, 3.71, 0.05, 0.0005, 0.005},
		{Retract, 424.4, 2.722, 4.95, 0.05, 0.002, 0.005},
	} {
		p, err := c.PressureFor(w.dir, load, 0)
		if err != nil || math.Abs(p.PSI()-w.psi) > w.psiTol {
			t.Errorf("%v: PressureFor = %.4f psi, %v; want %v", w.dir, p.PSI(), err, w.psi)
		}
		v, err := c.Speed(w.dir, q)
		if err != nil || math.Abs(v.FeetPerSecond()-w.fts) > w.ftsTol {
			t.Errorf("%v: Speed = %.5f ft/s, %v; want %v", w.dir, v.FeetPerSecond(), err, w.fts)
		}
		if hp := p.TimesFlow(q).Horsepower(); math.Abs(hp-w.hp) > w.hpTl {
			t.Errorf("%v: power = %.4f hp; want %v", w.dir, hp, w.hp)
		}
		f, err := c.Force(w.dir, p, 0)
		if err != nil || !checktest.Close(f, load, 1e-14) {
			t.Errorf("%v: Force(PressureFor(load)) = %v, %v; want %v back", w.dir, f, err, load)
		}
	}
}

func TestAreas(t *testing.T) {
	// 100 mm bore, 70 mm rod: A₁ = π/4·0.1² = 7853.98 mm², A_rod = 3848.45 mm²,
	// A₂ = 4005.53 mm², φ = 1.9608 (hand arithmetic from π·d²/4 [X]).
	c := Cylinder{Bore: 100 * mm, Rod: 70 * mm, Stroke: 500 * mm}
	for _, w := range []struct {
		name      string
		got, want units.Area
	}{
		{"CapArea", c.CapArea(), 7853.981634e-6},
		{"RodArea", c.RodArea(), 3848.451001e-6},
		{"AnnulusArea", c.AnnulusArea(), 4005.530633e-6},
		{"Area(Extend)", c.Area(Extend), 7853.981634e-6},
		{"Area(Retract)", c.Area(Retract), 4005.530633e-6},
		{"OutletArea(Extend)", c.OutletArea(Extend), 4005.530633e-6},
		{"OutletArea(Retract)", c.OutletArea(Retract), 7853.981634e-6},
	} {
		if !checktest.Close(w.got, w.want, 1e-9) {
			t.Errorf("%s = %.9g m²; want %.9g", w.name, float64(w.got), float64(w.want))
		}
	}
	if phi, err := c.AreaRatio(); err != nil || math.Abs(phi-1/(1-0.49)) > 1e-12 {
		t.Errorf("AreaRatio = %v, %v; want 1/(1 − 0.7²) = 1.96078", phi, err)
	}
	if v := c.Volume(Extend); !checktest.Close(v, 3.926990817*units.Litre, 1e-9) {
		t.Errorf("Volume(Extend) = %v; want 3.927 L", v)
	}
	d := c
	d.Ends = DoubleRod
	if phi, err := d.AreaRatio(); err != nil || phi != 1 {
		t.Errorf("double rod AreaRatio = %v, %v; want 1", phi, err)
	}
	if d.Area(Extend) != d.AnnulusArea() || d.OutletArea(Retract) != d.AnnulusArea() {
		t.Error("a double-rod cylinder works on its annulus both ways")
	}
}

// TestBackPressure: back pressure on the outlet side subtracts p_b·A_out.
// 2:1 cylinder (rod = bore/√2), 100 bar in, 10 bar back: extend
// F = p·A₁ − p_b·A₁/2 = 95 bar·A₁; retract F = 100 bar·A₁/2 − 10 bar·A₁
// = 40 bar·A₁ (force balance [X]).
func TestBackPressure(t *testing.T) {
	c := Cylinder{Bore: 100 * mm, Rod: 100 * mm / math.Sqrt2, Stroke: 1}
	a1 := c.CapArea()
	for _, w := range []struct {
		dir  Direction
		want units.Force
	}{{Extend, (95 * units.Bar).TimesArea(a1)}, {Retract, (40 * units.Bar).TimesArea(a1)}} {
		f, err := c.Force(w.dir, 100*units.Bar, 10*units.Bar)
		if err != nil || !checktest.Close(f, w.want, 1e-12) {
			t.Errorf("%v: Force = %v, %v; want %v", w.dir, f, err, w.want)
		}
		p, err := c.PressureFor(w.dir, w.want, 10*units.Bar)
		if err != nil || !checktest.Close(p, 100*units.Bar, 1e-12) {
			t.Errorf("%v: PressureFor = %v, %v; want 100 bar", w.dir, p, err)
		}
	}
	// The back pressure can win: 10 bar in, 30 bar on the cap side.
	if f, err := c.Force(Retract, 10*units.Bar, 30*units.Bar); err != nil || f >= 0 {
		t.Errorf("Force against a larger back pressure = %v, %v; want < 0", f, err)
	}
}

// TestReturnFlow: continuity, Q_out = Q·A_out/A_in [X]. A 2:1 cylinder
// retracting on 40 L/min returns 80 L/min from the cap side; extending, it
// returns 20 L/min.
func TestReturnFlow(t *testing.T) {
	c := Cylinder{Bore: 100 * mm, Rod: 100 * mm / math.Sqrt2, Stroke: 1}
	q := 40 * units.LitrePerMinute
	for _, w := range []struct {
		dir  Direction
		want units.Flow
	}{{Retract, 80 * units.LitrePerMinute}, {Extend, 20 * units.LitrePerMinute}} {
		r, err := c.ReturnFlow(w.dir, q)
		if err != nil || !checktest.Close(r, w.want, 1e-12) {
			t.Errorf("%v: ReturnFlow = %v, %v; want %v", w.dir, r, err, w.want)
		}
	}
	s := c
	s.Action = SingleActing
	if r, err := s.ReturnFlow(Extend, q); err != nil || r != 0 {
		t.Errorf("single-acting ReturnFlow = %v, %v; want 0 (the rod side breathes air)", r, err)
	}
}

func TestSpeedFlowTime(t *testing.T) {
	// 63 mm bore at 0.1 m/s: Q = 0.1·π/4·0.063² m³/s = 18.70 L/min [X].
	c := Cylinder{Bore: 63 * mm, Rod: 36 * mm, Stroke: 400 * mm}
	q, err := c.FlowFor(Extend, 0.1*units.MetrePerSecond)
	if err != nil || !checktest.Close(q, 0.1*math.Pi/4*0.063*0.063*units.CubicMetrePerSecond, 1e-14) {
		t.Errorf("FlowFor = %v, %v", q, err)
	}
	v, err := c.Speed(Extend, q)
	if err != nil || !checktest.Close(v, 0.1, 1e-14) {
		t.Errorf("Speed(FlowFor(0.1 m/s)) = %v, %v", v, err)
	}
	// 0.4 m at 0.1 m/s: 4 s.
	d, err := c.StrokeTime(Extend, q)
	if err != nil || (d-4*time.Second).Abs() > time.Microsecond {
		t.Errorf("StrokeTime = %v, %v; want 4s", d, err)
	}
	// Retract speed over extend speed at one flow is φ [X].
	vr, _ := c.Speed(Retract, q)
	if phi, _ := c.AreaRatio(); !checktest.Close(float64(vr/v), phi, 1e-14) {
		t.Errorf("retract/extend speed = %v; want φ = %v", vr/v, phi)
	}
}

// TestRegenerative: with both sides at one pressure the net area is the rod
// section: v = Q/A_rod, F = p·A_rod (the regenerative circuit of Esposito,
// Fluid Power with Applications, 7th ed., chapter 9, from memory). A 2:1
// cylinder regenerates at its retract speed with half its extend force.
func TestRegenerative(t *testing.T) {
	c := Cylinder{Bore: 80 * mm, Rod: 80 * mm / math.Sqrt2, Stroke: 1}
	q, p := 50*units.LitrePerMinute, 160*units.Bar
	r, err := c.Regenerative(q, p)
	if err != nil {
		t.Fatal(err)
	}
	vr, _ := c.Speed(Retract, q)
	fe, _ := c.Force(Extend, p, 0)
	if !checktest.Close(r.Speed, vr, 1e-12) || !checktest.Close(r.Force, fe/2, 1e-12) {
		t.Errorf("regenerative speed %v, force %v; want the retract speed %v and half the extend force %v", r.Speed, r.Force, vr, fe/2)
	}
	if !checktest.Close(r.CapFlow, 2*q, 1e-12) || !checktest.Close(r.RodFlow, q, 1e-12) || !checktest.Close(r.CapFlow-r.RodFlow, q, 1e-12) {
		t.Errorf("flows cap %v rod %v; want 2Q and Q", r.CapFlow, r.RodFlow)
	}
	d := c
	d.Ends = DoubleRod
	_, err = d.Regenerative(q, p)
	checktest.RangeErrorIn(t, err, "actuator.Cylinder.Regenerative", "Cylinder.Ends")
	s := c
	s.Action = SingleActing
	_, err = s.Regenerative(q, p)
	checktest.RangeError(t, err, "Cylinder.Action")
}

// TestRegenerativeFor: the pump flow and inlet pressure a regenerative
// extend needs, the inverse of TestRegenerative's v = Q/A_rod, F = p·A_rod
// (Esposito, Fluid Power with Applications, 7th ed., chapter 9, from
// memory), with the annulus oil Δp above the cap pressure on its way
// across and seal friction taking 1 − η of the pressure's force, as
// Duty.Size's p = (F + p_back·A_out)/(η·A_in) takes it: checked against
// the piston's force balance written out with both areas, the net force
// p·A_cap − (p + Δp)·A_ann = p·A_rod − Δp·A_ann, so η·p·A_rod − Δp·A_ann
// = F; not against the formula.
func TestRegenerativeFor(t *testing.T) {
	c := Cylinder{Bore: 160 * mm, Rod: 125 * mm, Stroke: 1}
	v, f, dp, eta := 0.15*units.MetrePerSecond, 20*units.Kilonewton, 3*units.Bar, 0.9
	r, err := c.RegenerativeFor(v, f, dp, eta)
	if err != nil {
		t.Fatal(err)
	}
	a1, a2 := units.CircleArea(160*mm), units.CircleArea(160*mm)-units.CircleArea(125*mm)
	net := float64(r.Pressure)*float64(a1) - float64(r.Pressure+dp)*float64(a2) // the piston's net force
	if !checktest.Close(eta*(net+float64(dp)*float64(a2))-float64(dp)*float64(a2), float64(f), 1e-12) {
		t.Errorf("p = %v: η·p·A_rod − Δp·A_ann = %v N, want F = %v", r.Pressure,
			eta*(net+float64(dp)*float64(a2))-float64(dp)*float64(a2), f)
	}
	back, err := c.Regenerative(r.Flow, r.Pressure)
	if err != nil || !checktest.Close(back.Speed, v, 1e-12) || !checktest.Close(r.CapFlow, back.CapFlow, 1e-12) ||
		!checktest.Close(r.RodFlow, back.RodFlow, 1e-12) {
		t.Errorf("flows %+v; Regenerative at that flow gives %+v (%v)", r, back, err)
	}
	// No load, no crossing drop: no pressure; no speed: no flow.
	if r, err := c.RegenerativeFor(0, 0, 0, 1); err != nil || r != (RegenerativeNeed{}) {
		t.Errorf("still and unloaded: %+v, %v", r, err)
	}
	for _, bad := range []struct {
		param string
		err   error
	}{
		{"v", second(c.RegenerativeFor(-1, f, dp, eta))},
		{"f", second(c.RegenerativeFor(v, units.Force(math.NaN()), dp, eta))},
		{"dp", second(c.RegenerativeFor(v, f, -1, eta))},
		{"eta", second(c.RegenerativeFor(v, f, dp, 0))},
	} {
		checktest.RangeErrorIn(t, bad.err, "actuator.Cylinder.RegenerativeFor", bad.param)
	}
	d := c
	d.Ends = DoubleRod
	_, err = d.RegenerativeFor(v, f, dp, eta)
	checktest.RangeErrorIn(t, err, "actuator.Cylinder.RegenerativeFor", "Cylinder.Ends")
}

// TestIntensification: the force balance p·A_in = p_out·A_out + F_resist
// [X]. A 2:1 cylinder at 200 bar against a blocked annulus holds 400 bar; a
// resisting load lowers it, an overrunning load raises it, and a load more
// than p·A_in stalls the piston (0).
func TestIntensification(t *testing.T) {
	c := Cylinder{Bore: 100 * mm, Rod: 100 * mm / math.Sqrt2, Stroke: 1, Rating: 250 * units.Bar}
	a1 := c.CapArea()
	p := 200 * units.Bar
	for _, w := range []struct {
		name   string
		resist units.Force
		want   units.Pressure
	}{
		{"no load", 0, 400 * units.Bar},
		{"resisting", (100 * units.Bar).TimesArea(a1), 200 * units.Bar},
		{"overrunning", -(50 * units.Bar).TimesArea(a1), 500 * units.Bar},
		{"stalled", (300 * units.Bar).TimesArea(a1), 0},
	} {
		got, err := IntensifiedPressure(p, a1, c.AnnulusArea(), w.resist)
		if err != nil || !checktest.Close(got, w.want, 1e-12) {
			t.Errorf("%s: IntensifiedPressure = %v, %v; want %v", w.name, got, err, w.want)
		}
	}
	r, err := c.Intensification(Extend, p, 0)
	if err != nil || !checktest.Close(r.Pressure, 400*units.Bar, 1e-12) || !checktest.Close(r.Ratio, 2, 1e-12) {
		t.Fatalf("Intensification = %+v, %v", r, err)
	}
	if r.Rating.OK() || len(r.Findings.AtLeast(components.Danger).Hazard(components.Overpressure)) != 1 {
		t.Errorf("400 bar against a 250 bar rating: check %+v, findings %v; want a failed check and a danger finding", r.Rating, r.Findings)
	}
	r, err = c.Intensification(Retract, p, 0) // the cap side sees p/φ = 100 bar
	if err != nil || !checktest.Close(r.Pressure, 100*units.Bar, 1e-12) || !r.Rating.OK() || len(r.Findings) != 0 {
		t.Errorf("retract Intensification = %+v, %v; want 100 bar, within the rating, no finding", r, err)
	}
	c.Rating = 0
	_, err = c.Intensification(Extend, p, 0)
	checktest.RangeError(t, err, "Cylinder.Rating")
}

// An inlet pressure so small that the outlet over it overflows: the
// ratio is an error, not +Inf beside nil. 5e-324 Pa at the inlet and an
// overrunning 1 kN put about 255 kPa on the annulus.
func TestIntensificationRatioOverflow(t *testing.T) {
	c := Cylinder{Bore: 100 * mm, Rod: 70 * mm, Stroke: 1, Rating: 250 * units.Bar}
	r, err := c.Intensification(Extend, 5e-324, -1e3)
	if checktest.RangeErrorIn(t, err, "actuator.Cylinder.Intensification", "Ratio"); r.Pressure != 0 || r.Findings != nil {
		t.Errorf("Intensification = %+v beside the error; want the zero value", r)
	}
}

func TestCylinderBadInput(t *testing.T) {
	good := Cylinder{Bore: 50 * mm, Rod: 28 * mm, Stroke: 200 * mm}
	nan := math.NaN()
	for _, w := range []struct {
		name  string
		c     Cylinder
		param string
	}{
		{"rod equal to bore", Cylinder{Bore: 50 * mm, Rod: 50 * mm, Stroke: 1}, "Cylinder.Rod"},
		{"rod above bore", Cylinder{Bore: 50 * mm, Rod: 60 * mm, Stroke: 1}, "Cylinder.Rod"},
		{"zero bore", Cylinder{Rod: 1 * mm, Stroke: 1}, "Cylinder.Bore"},
		{"NaN bore", Cylinder{Bore: units.Length(nan), Rod: 1 * mm, Stroke: 1}, "Cylinder.Bore"},
		{"negative rod", Cylinder{Bore: 50 * mm, Rod: -1, Stroke: 1}, "Cylinder.Rod"},
		{"infinite stroke", Cylinder{Bore: 50 * mm, Rod: 28 * mm, Stroke: units.Length(math.Inf(1))}, "Cylinder.Stroke"},
		{"bad ends", Cylinder{Bore: 50 * mm, Rod: 28 * mm, Stroke: 1, Ends: 7}, "Cylinder.Ends"},
		{"bad action", Cylinder{Bore: 50 * mm, Rod: 28 * mm, Stroke: 1, Action: 7}, "Cylinder.Action"},
		{"negative rating", Cylinder{Bore: 50 * mm, Rod: 28 * mm, Stroke: 1, Rating: -1}, "Cylinder.Rating"},
	} {
		checktest.RangeErrorIn(t, w.c.Validate(), "actuator.Cylinder.Validate", w.param)
		_, err := w.c.Force(Extend, units.Bar, 0)
		checktest.RangeErrorIn(t, err, "actuator.Cylinder.Force", w.param)
	}
	p := 100 * units.Bar
	q := 10 * units.LitrePerMinute
	for _, w := range []struct {
		name, param string
		err         error
	}{
		{"zero pressure", "p", second(good.Force(Extend, 0, 0))},
		{"NaN pressure", "p", second(good.Force(Extend, units.Pressure(nan), 0))},
		{"negative back", "back", second(good.Force(Extend, p, -1))},
		{"bad direction", "dir", second(good.Force(5, p, 0))},
		{"negative load", "load", second(good.PressureFor(Extend, -1, 0))},
		{"infinite load", "load", second(good.PressureFor(Extend, units.Force(math.Inf(1)), 0))},
		{"zero flow", "q", second(good.Speed(Extend, 0))},
		{"negative speed", "v", second(good.FlowFor(Retract, -1))},
		{"NaN return flow", "q", second(good.ReturnFlow(Retract, units.Flow(nan)))},
		{"zero stroke-time flow", "q", second(good.StrokeTime(Extend, 0))},
		{"regenerative zero flow", "q", second(good.Regenerative(0, p))},
		{"regenerative zero pressure", "p", second(good.Regenerative(q, 0))},
		{"intensified NaN resist", "resist", second(IntensifiedPressure(p, 1, 1, units.Force(nan)))},
		{"intensified zero outlet", "outlet", second(IntensifiedPressure(p, 1, 0, 0))},
		{"intensified zero inlet", "inlet", second(IntensifiedPressure(p, 0, 1, 0))},
		{"intensified zero p", "p", second(IntensifiedPressure(0, 1, 1, 0))},
	} {
		if checktest.RangeError(t, w.err, w.param) == nil {
			t.Errorf("%s: no range error", w.name)
		}
	}
	single := good
	single.Action = SingleActing
	for _, err := range []error{
		second(single.Force(Retract, p, 0)), second(single.Speed(Retract, q)),
		second(single.FlowFor(Retract, 1)), second(single.PressureFor(Retract, 1, 0)),
		second(single.StrokeTime(Retract, q)),
	} {
		checktest.RangeError(t, err, "dir")
	}
	// Overflow: a huge flow through a tiny bore gives an error, not +Inf.
	tiny := Cylinder{Bore: 1e-300, Rod: 1e-301, Stroke: 1}
	if _, err := tiny.Speed(Extend, 1e300); err == nil {
		t.Error("Speed overflow: want an error")
	}
	if _, err := tiny.PressureFor(Extend, 1e300, 0); err == nil {
		t.Error("PressureFor overflow: want an error")
	}
}

func second[T any](_ T, err error) error { return err }

// TestLargerBoreNeverLessForce: at one pressure and back pressure a larger
// bore (same rod) never gives less extend force, and a larger bore with a
// rod in the same proportion never gives less retract force (property).
func TestLargerBoreNeverLessForce(t *testing.T) {
	p, back := 160*units.Bar, 5*units.Bar
	var lastE, lastR units.Force
	for b := range components.ISO3320Bores().All() {
		c := Cylinder{Bore: b, Rod: b * 0.5, Stroke: 1}
		fe, err1 := c.Force(Extend, p, back)
		fr, err2 := c.Force(Retract, p, back)
		if err1 != nil || err2 != nil || fe < lastE || fr < lastR {
			t.Errorf("bore %v: forces %v, %v after %v, %v (%v, %v)", b, fe, fr, lastE, lastR, err1, err2)
		}
		lastE, lastR = fe, fr
	}
}
