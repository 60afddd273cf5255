package actuator

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

const cc = units.CubicCentimetrePerRevolution

// TestMotorTradeFormulas holds the motor against the US trade formulas,
// which follow from the unit definitions (NIST SP 811; hp = 550 ft·lbf/s,
// US gallon = 231 in³): T [lbf·in] = psi·in³/rev/(2π)·η_m,
// n [rpm] = 231·gpm·η_v/(in³/rev), hp = T [lbf·in]·rpm/63 025 =
// psi·gpm·η_v·η_m/1714.29. A 2.5 in³/rev motor at 2000 psi on 20 gpm,
// η_v 0.95, η_m 0.90: 716.2 lbf·in, 1755.6 rpm, 19.95 hp.
func TestMotorTradeFormulas(t *testing.T) {
	m := Motor{Displacement: 2.5 * units.CubicInchPerRevolution, Volumetric: 0.95, Mechanical: 0.9}
	dp, q := 2000*units.PSI, 20*units.USGallonPerMinute
	tq, err := m.Torque(dp)
	if err != nil || math.Abs(tq.In(units.PoundForceInch)-2.5*2000/(2*math.Pi)*0.9) > 1e-9 {
		t.Errorf("Torque = %v lbf·in, %v", tq.In(units.PoundForceInch), err)
	}
	n, err := m.Speed(q)
	if err != nil || math.Abs(n.RPM()-231*20*0.95/2.5) > 1e-9 {
		t.Errorf("Speed = %v rpm, %v; want 1755.6", n.RPM(), err)
	}
	p, err := m.Power(dp, q)
	if err != nil || math.Abs(p.Horsepower()-tq.In(units.PoundForceInch)*n.RPM()/63025) > 1e-3 ||
		math.Abs(p.Horsepower()-2000*20*0.95*0.9/1714.29) > 1e-3 || math.Abs(p.Horsepower()-19.95) > 0.005 {
		t.Errorf("Power = %v hp, %v; want 19.95", p.Horsepower(), err)
	}
	if shaft := tq.TimesSpeed(n); !checktest.Close(shaft, p, 1e-12) {
		t.Errorf("T·2πn = %v; want the power %v", shaft, p)
	}
}

// TestMotorRoundTrips: PressureFor inverts Torque, FlowFor inverts Speed.
func TestMotorRoundTrips(t *testing.T) {
	m := Motor{Displacement: 80 * cc, Volumetric: 0.93, Mechanical: 0.88}
	for _, dp := range []units.Pressure{5 * units.Bar, 120 * units.Bar, 350 * units.Bar} {
		tq, _ := m.Torque(dp)
		back, err := m.PressureFor(tq)
		if err != nil || !checktest.Close(back, dp, 1e-14) {
			t.Errorf("PressureFor(Torque(%v)) = %v, %v", dp, back, err)
		}
	}
	for _, n := range []units.RotationalSpeed{10 * units.RevolutionPerMinute, 3000 * units.RevolutionPerMinute} {
		q, _ := m.FlowFor(n)
		back, err := m.Speed(q)
		if err != nil || !checktest.Close(back, n, 1e-14) {
			t.Errorf("Speed(FlowFor(%v)) = %v, %v", n, back, err)
		}
	}
	// Starting torque is lower: 0.9 × η_m by default, the caller's when given.
	run, _ := m.Torque(100 * units.Bar)
	st, _ := m.StartingTorque(100 * units.Bar)
	if !checktest.Close(st, run*0.9, 1e-14) {
		t.Errorf("StartingTorque = %v; want 0.9 × %v", st, run)
	}
	m.Starting = 0.7
	if st, _ := m.StartingTorque(100 * units.Bar); !checktest.Close(st, run*0.7/0.88, 1e-14) {
		t.Errorf("StartingTorque with η_start 0.7 = %v", st)
	}
}

// slewMotors is a demo displacement range (cm³/rev) of our own.
func slewMotors(t testing.TB) components.Series[units.Displacement] {
	s, err := components.NewSeries("demo orbit motors", components.OurRule("demo data"),
		[]units.Displacement{100 * cc, 160 * cc, 200 * cc, 250 * cc, 315 * cc, 400 * cc}, nil)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

// TestMotorDutySize: 480 N·m running and 560 N·m breakaway at 170 bar,
// η_m 0.88 (start 0.792): D_run = 2π·480/(170 bar·0.88) = 201.6 cm³,
// D_start = 2π·560/(170 bar·0.792) = 261.3 cm³ → 315 cm³, which needs
// 170·261.3/315 = 141.0 bar; 40 rpm at η_v 0.92 takes 13.70 L/min (hand
// arithmetic [X]).
func TestMotorDutySize(t *testing.T) {
	d := MotorDuty{Torque: 480, StartTorque: 560, Speed: 40 * units.RevolutionPerMinute, Pressure: 170 * units.Bar,
		Volumetric: 0.92, Mechanical: 0.88, Displacements: slewMotors(t)}
	r, err := d.Size()
	if err != nil {
		t.Fatal(err)
	}
	if !checktest.Close(r.Running, 201.60*cc, 1e-4) || !checktest.Close(r.Starting, 261.33*cc, 1e-4) || r.Displacement.Chosen != 315*cc ||
		r.Displacement.Required != r.Starting || r.Motor.Displacement != 315*cc {
		t.Errorf("displacements: run %v, start %v, choice %+v", r.Running, r.Starting, r.Displacement)
	}
	if !checktest.Close(r.Pressure.Value, 141.03*units.Bar, 1e-4) || !r.Pressure.OK() || !checktest.Close(r.Flow, 13.696*units.LitrePerMinute, 1e-4) {
		t.Errorf("pressure %+v, flow %v", r.Pressure, r.Flow)
	}
	// The chosen motor gives the breakaway torque at the pressure it needs.
	if st, _ := r.Motor.StartingTorque(r.Pressure.Value); !checktest.Close(st, 560, 1e-12) {
		t.Errorf("chosen motor starts with %v at %v; want 560 N·m", st, r.Pressure.Value)
	}
	if r.StartRule.Kind != components.CommonPractice || len(r.Findings) != 0 {
		t.Errorf("rule %v, findings %v", r.StartRule, r.Findings)
	}
	d.HoldsLoad = true
	r, _ = d.Size()
	if len(r.Findings.Topic("actuator.motor-holding").AtLeast(components.Warning)) != 1 {
		t.Errorf("a motor holding a load: findings %v; want the brake warning", r.Findings)
	}
	d.HoldsLoad, d.Torque, d.StartTorque = false, 2000, 0
	r, err = d.Size()
	if err != nil || r.Displacement.OK() || r.Motor != (Motor{}) || r.Pressure.OK() || r.Flow != 0 ||
		len(r.Findings.Topic("actuator.no-motor")) != 1 {
		t.Errorf("beyond the range: %+v, %v", r, err)
	}
}

func TestMotorBadInput(t *testing.T) {
	m := Motor{Displacement: 50 * cc, Volumetric: 0.9, Mechanical: 0.9}
	for _, w := range []struct {
		param string
		edit  func(*Motor)
	}{
		{"Motor.Displacement", func(m *Motor) { m.Displacement = 0 }},
		{"Motor.Volumetric", func(m *Motor) { m.Volumetric = 0 }},
		{"Motor.Volumetric", func(m *Motor) { m.Volumetric = 1.01 }},
		{"Motor.Mechanical", func(m *Motor) { m.Mechanical = math.NaN() }},
		{"Motor.Starting", func(m *Motor) { m.Starting = -0.5 }},
	} {
		b := m
		w.edit(&b)
		_, err := b.Torque(units.Bar)
		checktest.RangeErrorIn(t, err, "actuator.Motor.Torque", w.param)
		_, err = b.FlowFor(1)
		checktest.RangeErrorIn(t, err, "actuator.Motor.FlowFor", w.param)
	}
	for _, w := range []struct {
		param string
		err   error
	}{
		{"dp", second(m.Torque(0))}, {"dp", second(m.StartingTorque(-1))}, {"t", second(m.PressureFor(0))},
		{"q", second(m.Speed(units.Flow(math.Inf(1))))}, {"n", second(m.FlowFor(0))},
		{"dp", second(m.Power(0, 1))}, {"q", second(m.Power(1, 0))},
	} {
		checktest.RangeError(t, w.err, w.param)
	}
	ok := MotorDuty{Torque: 100, Pressure: 100 * units.Bar, Volumetric: 0.9, Mechanical: 0.9, Displacements: slewMotors(t)}
	for _, w := range []struct {
		param string
		edit  func(*MotorDuty)
	}{
		{"MotorDuty.Torque", func(d *MotorDuty) { d.Torque = 0 }},
		{"MotorDuty.StartTorque", func(d *MotorDuty) { d.StartTorque = -1 }},
		{"MotorDuty.Speed", func(d *MotorDuty) { d.Speed = -1 }},
		{"MotorDuty.Pressure", func(d *MotorDuty) { d.Pressure = 0 }},
		{"MotorDuty.Volumetric", func(d *MotorDuty) { d.Volumetric = 2 }},
		{"MotorDuty.Mechanical", func(d *MotorDuty) { d.Mechanical = 0 }},
		{"MotorDuty.Starting", func(d *MotorDuty) { d.Starting = 1.5 }},
		{"MotorDuty.Displacements", func(d *MotorDuty) { d.Displacements = components.Series[units.Displacement]{} }},
	} {
		d := ok
		w.edit(&d)
		_, err := d.Size()
		checktest.RangeErrorIn(t, err, "actuator.MotorDuty.Size", w.param)
	}
}

func TestMotorAllocations(t *testing.T) {
	d := MotorDuty{Torque: 480, StartTorque: 560, Speed: 40 * units.RevolutionPerMinute, Pressure: 170 * units.Bar,
		Volumetric: 0.92, Mechanical: 0.88, Displacements: slewMotors(t)}
	if n := testing.AllocsPerRun(100, func() { _, _ = d.Size() }); n != 0 {
		t.Errorf("MotorDuty.Size allocates %v times; want 0", n)
	}
}

func BenchmarkMotorDutySize(b *testing.B) {
	d := MotorDuty{Torque: 480, StartTorque: 560, Speed: 40 * units.RevolutionPerMinute, Pressure: 170 * units.Bar,
		Volumetric: 0.92, Mechanical: 0.88, Displacements: slewMotors(b)}
	b.ReportAllocs()
	for b.Loop() {
		_, _ = d.Size()
	}
}
