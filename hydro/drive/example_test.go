package drive_test

import (
	"fmt"
	"time"

	"github.com/hydrosize/hydrosize/hydro/drive"
	"github.com/hydrosize/hydrosize/units"
)

// A log splitter's pump: 2500 psi at 11 gpm with an overall efficiency of
// 0.85 (demo data), in both unit systems, and the next motor ratings.
func ExampleShaftPower() {
	p, err := drive.ShaftPower(2500*units.PSI, 11*units.USGallonPerMinute, 0.85)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%.2f hp = %.2f kW\n", p.Horsepower(), p.Kilowatts())
	nema, _ := drive.NextNEMA(p)
	iec, _ := drive.NextIEC(p)
	fmt.Printf("NEMA %.0f hp, IEC %v\n", nema.Chosen.Horsepower(), iec.Chosen)
	// Output:
	// 18.87 hp = 14.07 kW
	// NEMA 20 hp, IEC 15 kW
}

func ExampleMotorSpeeds() {
	s, err := drive.MotorSpeeds(4, 50*units.Hertz, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("synchronous %.0f rpm, full load %.0f rpm (%v)\n", s.Synchronous.RPM(), s.FullLoad.RPM(), s.SlipRule)
	// Output:
	// synchronous 1500 rpm, full load 1455 rpm (common practice: induction motor full-load slip 2–5 %, 3 % taken)
}

// A scissor lift table (demo data): a 4 s lift at 160 bar and 30 L/min,
// a 4 s lowering on the pump's idle 1 kW, and a 12 s dwell on the
// compensator's 0.4 kW standby.
func ExampleSelectMotor() {
	lpm := units.LitrePerMinute
	d, err := drive.Cycle([]drive.Phase{
		{Name: "lift", Duration: 4 * time.Second, Pressure: 160 * units.Bar, Flow: 30 * lpm, Efficiency: 0.85},
		{Name: "lower", Duration: 4 * time.Second, Power: 1 * units.Kilowatt, Efficiency: 0.85},
		{Name: "dwell", Duration: 12 * time.Second, Power: 0.4 * units.Kilowatt, Use: drive.Standby},
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("peak %.2f, average %.2f, RMS %.2f\n", d.Peak, d.Average, d.RMS)
	speeds, _ := drive.MotorSpeeds(4, 50*units.Hertz, nil)
	m, err := drive.SelectMotor(drive.MotorNeed{Duty: d, Speed: speeds.FullLoad, Breakdown: 2.3})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("%v motor for %.2f: thermal ok %v, torque ok %v (peak %.1f)\n",
		m.Rating.Chosen, m.Rating.Required, m.Thermal.OK(), m.Torque.OK(), m.PeakTorque)
	for _, f := range m.Findings {
		fmt.Println(f.Text(units.Metric()))
	}
	// Output:
	// peak 9.41 kW, average 2.32 kW, RMS 4.24 kW
	// 5.5 kW motor for 4.24 kW: thermal ok true, torque ok true (peak 61.8 N·m)
	// this cycle peaks at 9.412 kW, averages 2.322 kW and heats the motor like a steady 4.244 kW: sized on the peak it would take 11 kW (oversized), on the average 3 kW (it would overheat); 5.5 kW carries both the heating and the peak torque
}

// A forestry skidder's diesel drives its crane pump through a 1.2:1 PTO
// (demo data).
func ExampleEngine_Load() {
	rpm, kW := units.RevolutionPerMinute, units.Kilowatt
	e := drive.Engine{Curve: []drive.CurvePoint{{Speed: 1500 * rpm, Power: 30 * kW}, {Speed: 2000 * rpm, Power: 42 * kW},
		{Speed: 2400 * rpm, Power: 45 * kW}}, Ratio: 1.2, Efficiency: 0.97}
	for _, n := range []units.RotationalSpeed{1600 * rpm, 1800 * rpm} {
		l, err := e.Load(35*kW, n)
		if err != nil {
			fmt.Println(err)
			return
		}
		fmt.Printf("engine %.0f rpm, pump %.0f rpm: needs %.1f of %.1f, ok %v\n",
			n.RPM(), l.PumpSpeed.RPM(), l.Required, l.Available, l.Power.OK())
	}
	// Output:
	// engine 1600 rpm, pump 1920 rpm: needs 36.1 kW of 32.4 kW, ok false
	// engine 1800 rpm, pump 2160 rpm: needs 36.1 kW of 37.2 kW, ok true
}
