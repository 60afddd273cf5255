package actuator

import (
	"math"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func within(got, want, tol time.Duration) bool { return (got - want).Abs() <= tol }

// TestProfileTime: uniform acceleration (kinematics [X]). 0.5 m at
// 0.2 m/s with 1 m/s² up and 2 m/s² down: ramps 0.02 m and 0.01 m,
// cruise 0.47 m in 2.35 s, total 0.2 + 2.35 + 0.1 = 2.65 s. 10 mm is too
// short: v_p = √(2·0.01·1·1/2) = 0.1 m/s, 0.1 + 0.1 = 0.2 s.
func TestProfileTime(t *testing.T) {
	m, err := Profile{Speed: 0.2, Accel: 1, Decel: 2, Distance: 0.5}.Time()
	if err != nil || m.Triangular || !within(m.Time, 2650*time.Millisecond, time.Microsecond) ||
		!within(m.AccelTime, 200*time.Millisecond, time.Microsecond) || !within(m.CruiseTime, 2350*time.Millisecond, time.Microsecond) ||
		!within(m.DecelTime, 100*time.Millisecond, time.Microsecond) || m.PeakSpeed != 0.2 {
		t.Errorf("trapezoid: %+v, %v", m, err)
	}
	m, err = Profile{Speed: 0.2, Accel: 1, Distance: 0.01}.Time()
	if err != nil || !m.Triangular || !checktest.Close(m.PeakSpeed, 0.1, 1e-14) || !within(m.Time, 200*time.Millisecond, time.Microsecond) {
		t.Errorf("triangle: %+v, %v", m, err)
	}
	// At the boundary (ramps exactly fill the travel) the two cases meet.
	edge := Profile{Speed: 0.2, Accel: 1, Decel: 2, Distance: 0.03}
	m1, _ := edge.Time()
	edge.Distance = 0.03 * (1 - 1e-12)
	m2, _ := edge.Time()
	if !within(m1.Time, 300*time.Millisecond, time.Microsecond) || !within(m2.Time, m1.Time, time.Microsecond) {
		t.Errorf("at the boundary: %v and %v; want 0.3 s both", m1.Time, m2.Time)
	}
}

// TestMovePeakFlow: the peak flows are v_peak times the inlet and outlet
// areas; with very steep ramps the time tends to stroke/speed, which
// StrokeTime gives for the flow of that speed (round trip).
func TestMovePeakFlow(t *testing.T) {
	c := Cylinder{Bore: 80 * mm, Rod: 56 * mm, Stroke: 900 * mm}
	r, err := c.Move(Retract, Profile{Speed: 0.25, Accel: 2.5})
	if err != nil {
		t.Fatal(err)
	}
	if !checktest.Close(r.PeakFlow, (0.25*units.MetrePerSecond).TimesArea(c.AnnulusArea()), 1e-14) ||
		!checktest.Close(r.PeakReturn, (0.25*units.MetrePerSecond).TimesArea(c.CapArea()), 1e-14) {
		t.Errorf("peak flows %v, %v", r.PeakFlow, r.PeakReturn)
	}
	// 0.9 m at 0.25 m/s with 0.0125 m ramps each way: 0.1 + 3.5 + 0.1 = 3.7 s.
	if !within(r.Time, 3700*time.Millisecond, time.Microsecond) {
		t.Errorf("time %v; want 3.7 s", r.Time)
	}
	steep, _ := c.Move(Extend, Profile{Speed: 0.25, Accel: 1e6})
	q, _ := c.FlowFor(Extend, 0.25)
	st, _ := c.StrokeTime(Extend, q)
	if !within(steep.Time, st, 10*time.Microsecond) || !within(st, 3600*time.Millisecond, time.Microsecond) {
		t.Errorf("steep ramps %v; StrokeTime %v; want 3.6 s", steep.Time, st)
	}
	s := c
	s.Action = SingleActing
	if r, _ := s.Move(Extend, Profile{Speed: 0.1, Accel: 1}); r.PeakReturn != 0 {
		t.Errorf("single-acting PeakReturn = %v; want 0", r.PeakReturn)
	}
}

// TestRampCheck: a ramp shorter than the oil spring's MinRamp fails.
func TestRampCheck(t *testing.T) {
	r := Resonance{MinRamp: 150 * time.Millisecond, RampRule: components.PracticeRule("test")}
	if c := r.Ramp(100 * time.Millisecond); c.OK() || !checktest.Close(c.Ratio(), 2.0/3, 1e-12) {
		t.Errorf("100 ms against 150 ms: %+v", c)
	}
	if c := r.Ramp(200 * time.Millisecond); !c.OK() {
		t.Errorf("200 ms against 150 ms: %+v", c)
	}
}

// TestCushioning: a 100/56 cylinder stopping 1000 kg from 0.3 m/s in
// 30 mm: a = 0.09/0.06 = 1.5 m/s², 1500 N on the 5391 mm² annulus,
// 2.78 bar; with 200 bar still on the cap, 158.6 kN, 294.2 bar, above a
// 250 bar rating; the energy 45 J + 157.08 kN·0.03 m = 4757 J (force
// balance at uniform deceleration [X]).
func TestCushioning(t *testing.T) {
	c := Cylinder{Bore: 100 * mm, Rod: 56 * mm, Stroke: 1, Rating: 250 * units.Bar}
	cu := Cushion{Length: 30 * mm, Mass: 1000, Speed: 0.3}
	r, err := c.Cushioning(Extend, cu)
	if err != nil || !checktest.Close(r.Decel, 1.5, 1e-14) || !checktest.Close(r.Force, 1500, 1e-14) || !checktest.Close(r.Pressure, 2.7823*units.Bar, 1e-4) ||
		!r.Rating.OK() || len(r.Findings) != 0 {
		t.Errorf("undriven: %+v, %v", r, err)
	}
	cu.Drive = 200 * units.Bar
	r, err = c.Cushioning(Extend, cu)
	if err != nil || !checktest.Close(r.Pressure, 294.16*units.Bar, 1e-4) || r.Rating.OK() || !checktest.Close(r.Energy, 4757.4, 1e-4) {
		t.Errorf("driven: %+v, %v", r, err)
	}
	if len(r.Findings.Hazard(components.Overpressure).AtLeast(components.Warning)) != 1 {
		t.Errorf("findings %v; want an overpressure warning", r.Findings)
	}
	// A smaller cushion chamber raises the pressure in proportion.
	cu.Area = c.AnnulusArea() / 2
	r2, _ := c.Cushioning(Extend, cu)
	if !checktest.Close(r2.Pressure, 2*r.Pressure, 1e-12) {
		t.Errorf("half the area: %v; want %v", r2.Pressure, 2*r.Pressure)
	}
	// Friction that stops the mass on its own needs no cushion pressure.
	cu = Cushion{Length: 30 * mm, Mass: 10, Speed: 0.1, Assist: -1e5}
	if r, err := c.Cushioning(Extend, cu); err != nil || r.Pressure != 0 || r.Energy != 0 {
		t.Errorf("friction stops it: %+v, %v", r, err)
	}
}

func TestCycleBadInput(t *testing.T) {
	c := Cylinder{Bore: 100 * mm, Rod: 56 * mm, Stroke: 1, Rating: 250 * units.Bar}
	p := Profile{Speed: 0.2, Accel: 1}
	for _, w := range []struct {
		param string
		err   error
	}{
		{"Profile.Speed", second(Profile{Accel: 1, Distance: 1}.Time())},
		{"Profile.Accel", second(Profile{Speed: 1, Accel: -1, Distance: 1}.Time())},
		{"Profile.Decel", second(Profile{Speed: 1, Accel: 1, Decel: units.Acceleration(math.NaN()), Distance: 1}.Time())},
		{"Profile.Distance", second(p.Time())},
		{"Profile.Distance", second(c.Move(Extend, Profile{Speed: 0.2, Accel: 1, Distance: 2}))},
		{"Profile.Distance", second(c.Move(Extend, Profile{Speed: 0.2, Accel: 1, Distance: -1}))},
		{"time (s)", second(Profile{Speed: 1e-300, Accel: 1, Distance: 1}.Time())},
		{"Cushion.Length", second(c.Cushioning(Extend, Cushion{Mass: 1, Speed: 1}))},
		{"Cushion.Mass", second(c.Cushioning(Extend, Cushion{Length: 1, Speed: 1}))},
		{"Cushion.Speed", second(c.Cushioning(Extend, Cushion{Length: 1, Mass: 1}))},
		{"Cushion.Drive", second(c.Cushioning(Extend, Cushion{Length: 1, Mass: 1, Speed: 1, Drive: -1}))},
		{"Cushion.Assist", second(c.Cushioning(Extend, Cushion{Length: 1, Mass: 1, Speed: 1, Assist: units.Force(math.Inf(-1))}))},
		{"Cushion.Area", second(c.Cushioning(Extend, Cushion{Length: 1, Mass: 1, Speed: 1, Area: 1}))},
		{"Cylinder.Rating", second(Cylinder{Bore: 1, Rod: 0.5, Stroke: 1}.Cushioning(Extend, Cushion{Length: 1, Mass: 1, Speed: 1}))},
	} {
		checktest.RangeError(t, w.err, w.param)
	}
}

func TestMoveAllocations(t *testing.T) {
	c := Cylinder{Bore: 80 * mm, Rod: 56 * mm, Stroke: 900 * mm}
	if n := testing.AllocsPerRun(100, func() { _, _ = c.Move(Extend, Profile{Speed: 0.25, Accel: 2.5}) }); n != 0 {
		t.Errorf("Move allocates %v times; want 0", n)
	}
}
