package pump

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// baler is a fixed gear pump of a baling press power unit (demo data):
// 45 cm³/rev at 1450 rpm, η_v 0.95, η_hm 0.92.
func baler() Pump {
	return Pump{Displacement: 45 * units.CubicCentimetrePerRevolution, Speed: 1450 * units.RevolutionPerMinute,
		Volumetric: 0.95, Mechanical: 0.92}
}

// Esposito, Fluid Power with Applications, 7th ed., the metric pump
// efficiency example of chapter 5 (from memory): a pump of 100 cm³
// displacement delivers 0.0015 m³/s at 1000 rpm and 70 bar with an input
// torque of 120 N·m. By the book's method η_v = 0.0015/(100 cm³ × 1000 rpm)
// = 90 %, the theoretical torque V_D·p/(2π) = 111.4 N·m, η_m = 111.4/120 =
// 92.8 %, η_o = 83.6 %. Tolerance: the book's printed digits.
func TestPumpTextbookEfficiencies(t *testing.T) {
	p := Pump{Displacement: 100 * units.CubicCentimetrePerRevolution, Speed: 1000 * units.RevolutionPerMinute,
		Volumetric: 0.9, Mechanical: 1}
	pt, err := p.At(70 * units.Bar)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "delivered flow", pt.Flow, 0.0015, 1e-12)
	checktest.Near(t, "theoretical torque (η_hm = 1)", pt.Torque, 111.4, 0.05/111.4)
	p.Mechanical = float64(pt.Torque) / 120
	checktest.Near(t, "η_m", p.Mechanical, 0.928, 0.0005/0.928)
	checktest.Near(t, "η_o", p.Overall(), 0.836, 0.0006/0.836)
	pt, err = p.At(70 * units.Bar)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "input torque", pt.Torque, 120, 1e-12)
	// Shaft power 2π·n·T = 2π × (1000/60) × 120 = 12 566 W; hydraulic
	// power p·Q = 7 MPa × 0.0015 = 10 500 W; their ratio is η_o.
	checktest.Near(t, "shaft power", pt.Shaft, 2*math.Pi*1000.0/60*120, 1e-12)
	checktest.Near(t, "hydraulic power", pt.Hydraulic, 10500, 1e-12)
	checktest.Near(t, "η_o from the powers", float64(pt.Hydraulic/pt.Shaft), p.Overall(), 1e-12)
}

// The trade's shaft-power formula of the fixed pump: P = p·Q/η_o with Q
// the delivered flow, which in US units is hp = psi·gpm/(1714.29·η_o) by
// the unit definitions (NIST SP 811: hp = 550 ft·lbf/s, gal = 231 in³):
// 1714.285714… = 550·12·60/231 exactly.
func TestPumpShaftPowerTradeForm(t *testing.T) {
	p := baler()
	pt, err := p.At(3000 * units.PSI)
	if err != nil {
		t.Fatal(err)
	}
	gpm := pt.Flow.USGallonsPerMinute()
	hp := 3000 * gpm / (550.0 * 12 * 60 / 231) / p.Overall()
	checktest.Near(t, "shaft power, hp", pt.Shaft.Horsepower(), hp, 1e-13)
	// Torque from the same point, lbf·in = 63 025·hp/rpm, where
	// 63 025 = 550·12·60/(2π) from the definitions.
	checktest.Near(t, "torque, lbf·in", pt.Torque.PoundForceInches(), 550.0*12*60/(2*math.Pi)*pt.Shaft.Horsepower()/1450, 1e-13)
}

// GNU units 2.22 (Debian package units) evaluates the ideal pump relations
// in its own definitions:
//
//	units -t -o %.17g '45 cm^3 * 1450/min * 0.95' 'L/min'        → 61.987499999999997
//	units -t -o %.17g '45 cm^3 * 210 bar / (2 pi) / 0.92' 'N m' → 163.47980567591426
func TestPumpAgainstGNUUnits(t *testing.T) {
	pt, err := baler().At(210 * units.Bar)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "flow, L/min", pt.Flow.LitresPerMinute(), 61.987499999999997, 1e-14)
	checktest.Near(t, "torque, N·m", pt.Torque, 163.47980567591426, 1e-14)
	path := checktest.GNUUnits(t)
	checktest.Near(t, "flow vs GNU units", pt.Flow.LitresPerMinute(), checktest.GNUUnitsValue(t, path, "45 cm^3 * 1450/min * 0.95", "L/min"), 1e-14)
	checktest.Near(t, "torque vs GNU units", float64(pt.Torque), checktest.GNUUnitsValue(t, path, "45 cm^3 * 210 bar / (2 pi) / 0.92", "N m"), 1e-14)
}

func TestDisplacementFor(t *testing.T) {
	// 62 L/min at 1450 rpm with η_v 0.95 needs 62/(1450 × 0.95) L/rev = 45.01 cm³/rev.
	d, err := DisplacementFor(62*units.LitrePerMinute, 1450*units.RevolutionPerMinute, 0.95)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "displacement, cm³/rev", d.CubicCentimetresPerRevolution(), 62e3/(1450*0.95), 1e-14)
	// Round trip: that displacement at that speed delivers the flow.
	pt, err := Pump{Displacement: d, Speed: 1450 * units.RevolutionPerMinute, Volumetric: 0.95, Mechanical: 1}.At(0)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "round-trip flow", pt.Flow, 62*units.LitrePerMinute, 1e-14)
}

func TestMechanicalEfficiency(t *testing.T) {
	m, err := MechanicalEfficiency(0.85, 0.94)
	if err != nil || math.Abs(m-0.85/0.94) > 1e-15 {
		t.Errorf("MechanicalEfficiency(0.85, 0.94) = %v, %v", m, err)
	}
	for _, c := range [][2]float64{{0.95, 0.94}, {0, 0.9}, {0.5, 0}, {0.5, 1.01}, {math.NaN(), 0.9}} {
		if _, err := MechanicalEfficiency(c[0], c[1]); !errors.Is(err, units.ErrRange) {
			t.Errorf("MechanicalEfficiency(%v, %v) error = %v; want ErrRange", c[0], c[1], err)
		}
	}
}

// Leakage in proportion to pressure: with η_v 0.95 measured at 200 bar,
// the leakage at 100 bar is half, so the pump delivers 97.5 % of D·n.
func TestPumpLeakageScaling(t *testing.T) {
	p := baler()
	p.LeakagePressure = 200 * units.Bar
	geometric := 45e-6 * 1450 / 60
	for _, c := range []struct {
		pr   units.Pressure
		frac float64
	}{{0, 1}, {100 * units.Bar, 0.975}, {200 * units.Bar, 0.95}, {300 * units.Bar, 0.925}} {
		pt, err := p.At(c.pr)
		if err != nil {
			t.Fatal(err)
		}
		checktest.Near(t, "flow at "+c.pr.String(), float64(pt.Flow), geometric*c.frac, 1e-14)
	}
	// Leakage takes the whole flow at 200 bar / 0.05 = 4000 bar: the model
	// refuses a fixed pump beyond that.
	if _, err := p.At(4001 * units.Bar); !errors.Is(err, units.ErrRange) {
		t.Errorf("At beyond the leakage limit: error = %v; want ErrRange", err)
	}
}

// A pressure-compensated pump is at full stroke below its setting and
// deadheaded at it; at standby it strokes to make up leakage only:
// Q_L = 45 cm³ × 1450 rpm × 0.05 = 3.2625 L/min, and the shaft power is
// p·Q_L/η_hm = 250 bar × 3.2625 L/min / 0.92 = 1477.6 W, all heat.
func TestPumpPressureCompensated(t *testing.T) {
	p := baler()
	p.Variable, p.Control, p.Cutoff = true, PressureCompensated, 250*units.Bar
	below, err := p.At(249 * units.Bar)
	if err != nil || below.Deadheaded {
		t.Fatalf("At(249 bar) = %+v, %v", below, err)
	}
	checktest.Near(t, "full-stroke flow", below.Flow.LitresPerMinute(), 61.9875, 1e-14)
	st, err := p.Standby()
	if err != nil {
		t.Fatal(err)
	}
	at, _ := p.At(250 * units.Bar)
	if st != at || !st.Deadheaded || st.Flow != 0 || st.Hydraulic != 0 {
		t.Errorf("Standby = %+v; At(setting) = %+v", st, at)
	}
	checktest.Near(t, "standby power", st.Shaft, 250e5*45e-6*1450/60*0.05/0.92, 1e-14)
	checktest.Near(t, "standby heat", st.Loss(), st.Shaft, 0)
	// At the setting the compensator delivers what the circuit takes.
	d, err := p.Delivering(250*units.Bar, 30*units.LitrePerMinute)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "stroke for 30 L/min", d.Displacement.CubicCentimetresPerRevolution(), (30+3.2625)*1e3/1450, 1e-13)
	if _, err := p.Delivering(200*units.Bar, 30*units.LitrePerMinute); !errors.Is(err, units.ErrRange) {
		t.Errorf("Delivering below the setting: error = %v; want ErrRange (the pump is on its curve)", err)
	}
	if _, err := p.Delivering(250*units.Bar, 70*units.LitrePerMinute); !errors.Is(err, units.ErrRange) {
		t.Errorf("Delivering more than the pump gives: error = %v; want ErrRange", err)
	}
}

// A load-sensing pump holds load + margin up to its cut-off and idles at
// its margin with the load signal vented.
func TestPumpLoadSensing(t *testing.T) {
	p := baler()
	p.Variable, p.Control, p.Cutoff, p.Margin = true, LoadSensing, 250*units.Bar, 20*units.Bar
	for _, c := range []struct{ load, want units.Pressure }{
		{0, 20 * units.Bar}, {150 * units.Bar, 170 * units.Bar}, {240 * units.Bar, 250 * units.Bar},
	} {
		got, err := p.LoadSensingPressure(c.load)
		if err != nil || got != c.want {
			t.Errorf("LoadSensingPressure(%v) = %v, %v; want %v", c.load, got, err, c.want)
		}
	}
	st, err := p.Standby()
	if err != nil || st.Pressure != 20*units.Bar {
		t.Fatalf("Standby = %+v, %v", st, err)
	}
	// Standby at 20 bar costs 20/250 of the compensator's 1477.6 W.
	checktest.Near(t, "standby power", st.Shaft, 20e5*45e-6*1450/60*0.05/0.92, 1e-14)
	if _, err := p.Delivering(170*units.Bar, 40*units.LitrePerMinute); err != nil {
		t.Errorf("Delivering(170 bar, 40 L/min): %v", err)
	}
}

// A power-limited pump: full stroke up to the corner pressure, then shaft
// power equal to the limit, so p·Q_g is constant (the hyperbola of its
// data sheet). 15 kW, η_hm 0.92, D·n = 65.25 L/min: corner at
// 15 kW × 0.92 / 65.25 L/min = 126.9 bar.
func TestPumpPowerLimited(t *testing.T) {
	p := baler()
	p.Variable, p.Control, p.PowerLimit = true, PowerLimited, 15*units.Kilowatt
	corner, err := p.CornerPressure()
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "corner pressure", corner, 15e3*0.92/(45e-6*1450/60), 1e-14)
	prev := units.Flow(math.Inf(1))
	for bar := 0.0; bar <= 300; bar += 10 {
		pt, err := p.At(units.Pressure(bar) * units.Bar)
		if err != nil {
			t.Fatal(err)
		}
		if pt.Flow > prev {
			t.Errorf("flow rose from %v to %v at %v bar", prev, pt.Flow, bar)
		}
		prev = pt.Flow
		if pt.Pressure > corner {
			checktest.Near(t, "shaft power above the corner", pt.Shaft, 15e3, 1e-13)
		} else if pt.Shaft > 15e3*(1+1e-13) {
			t.Errorf("shaft power %v above the limit at %v bar", pt.Shaft, bar)
		}
	}
	if _, err := p.Standby(); !errors.Is(err, units.ErrRange) {
		t.Errorf("Standby without a cut-off: error = %v; want ErrRange", err)
	}
}

// Properties: input power rises with pressure, and any efficiency below 1
// raises it.
func TestPumpPowerProperties(t *testing.T) {
	p := baler()
	prev := units.Power(-1)
	for bar := 0.0; bar <= 350; bar += 25 {
		pt, err := p.At(units.Pressure(bar) * units.Bar)
		if err != nil {
			t.Fatal(err)
		}
		if pt.Shaft <= prev && bar > 0 {
			t.Errorf("shaft power fell to %v at %v bar", pt.Shaft, bar)
		}
		if pt.Shaft < pt.Hydraulic {
			t.Errorf("shaft power %v below hydraulic power %v at %v bar", pt.Shaft, pt.Hydraulic, bar)
		}
		prev = pt.Shaft
	}
	ideal := Pump{Displacement: p.Displacement, Speed: p.Speed, Volumetric: 1, Mechanical: 1}
	a, _ := ideal.At(200 * units.Bar)
	for _, eta := range []float64{0.99, 0.9, 0.7} {
		lossy := ideal
		lossy.Mechanical = eta
		b, _ := lossy.At(200 * units.Bar)
		if b.Shaft <= a.Shaft {
			t.Errorf("η_hm %v: shaft power %v not above the ideal %v", eta, b.Shaft, a.Shaft)
		}
	}
}

func TestPumpBadInput(t *testing.T) {
	nan := math.NaN()
	good := baler()
	for _, c := range []struct {
		param string
		p     Pump
	}{
		{"Displacement", Pump{Speed: 10, Volumetric: 0.9, Mechanical: 0.9}},
		{"Speed", Pump{Displacement: 1e-5, Speed: -1, Volumetric: 0.9, Mechanical: 0.9}},
		{"Volumetric", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 1.01, Mechanical: 0.9}},
		{"Mechanical", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9}},
		{"Mechanical", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9, Mechanical: nan}},
		{"Control", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9, Mechanical: 0.9, Control: PressureCompensated, Cutoff: 1e7}},
		{"Cutoff", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9, Mechanical: 0.9, Variable: true, Control: PressureCompensated}},
		{"Margin", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9, Mechanical: 0.9, Variable: true, Control: LoadSensing, Cutoff: 1e6, Margin: 2e6}},
		{"PowerLimit", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9, Mechanical: 0.9, Variable: true, Control: PowerLimited}},
		{"Control", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9, Mechanical: 0.9, Variable: true, Control: 9}},
		{"LeakagePressure", Pump{Displacement: 1e-5, Speed: 10, Volumetric: 0.9, Mechanical: 0.9, LeakagePressure: -1}},
	} {
		checktest.RangeErrorIn(t, c.p.Validate(), "pump.Pump.Validate", c.param)
		pt, err := c.p.At(1e7)
		if checktest.RangeErrorIn(t, err, "pump.Pump.At", c.param); pt != (Point{}) {
			t.Errorf("%s: At = %+v; want the zero Point beside the error", c.param, pt)
		}
	}
	var re *units.RangeError
	if _, err := good.At(-1); !errors.As(err, &re) || re.Param != "pr" || re.Func != "pump.Pump.At" {
		t.Errorf("At(-1 Pa) error = %v; want a RangeError naming pump.Pump.At and pr", err)
	}
	if _, err := good.Delivering(1e7, 1e-3); !errors.Is(err, units.ErrRange) {
		t.Errorf("Delivering on a fixed pump: error = %v; want ErrRange", err)
	}
	if _, err := good.CornerPressure(); !errors.Is(err, units.ErrRange) {
		t.Errorf("CornerPressure on a fixed pump: error = %v", err)
	}
	if _, err := good.LoadSensingPressure(1e7); !errors.Is(err, units.ErrRange) {
		t.Errorf("LoadSensingPressure on a fixed pump: error = %v", err)
	}
	for _, c := range []struct {
		q   units.Flow
		n   units.RotationalSpeed
		eta float64
	}{{0, 10, 0.9}, {1e-3, 0, 0.9}, {1e-3, 10, 0}, {1e-3, 10, 1.5}, {units.Flow(math.Inf(1)), 10, 0.9}} {
		if d, err := DisplacementFor(c.q, c.n, c.eta); !errors.Is(err, units.ErrRange) || d != 0 {
			t.Errorf("DisplacementFor(%v, %v, %v) = %v, %v; want 0 and ErrRange", c.q, c.n, c.eta, d, err)
		}
	}
}

func TestPumpAllocations(t *testing.T) {
	p := baler()
	p.Variable, p.Control, p.Cutoff = true, PressureCompensated, 250*units.Bar
	if n := testing.AllocsPerRun(100, func() {
		_, _ = p.At(200 * units.Bar)
		_, _ = p.Standby()
		_, _ = p.Delivering(250*units.Bar, 1e-4)
		_, _ = Atmosphere(1200)
		_, _ = Size(Need{Flow: 1e-3, Pressure: 1e7, Speed: 25, Volumetric: 0.9})
	}); n != 0 {
		t.Errorf("At, Standby, Delivering, Atmosphere, Size allocate %v times per run; want 0", n)
	}
}

func TestCheckInletAllocations(t *testing.T) {
	amb, _ := SiteAltitude(300)
	in := Inlet{Ambient: amb, Head: 0.3, Density: 870, Loss: 0.1 * units.Bar, Minimum: 0.8 * units.BarAbsolute}
	if n := testing.AllocsPerRun(100, func() { _, _ = CheckInlet(in) }); n != 0 {
		t.Errorf("CheckInlet with no finding allocates %v times; want 0", n)
	}
}

func TestDisplacementForOverflow(t *testing.T) {
	d, err := DisplacementFor(1e300, 1e-300, 0.5)
	if !errors.Is(err, units.ErrRange) || d != 0 {
		t.Errorf("DisplacementFor overflowing = %v, %v; want 0 and ErrRange", d, err)
	}
}

// A displacement that overflows or underflows to zero is an error of
// DisplacementFor (naming its result), not of a helper, and never 0 beside
// nil.
func TestDisplacementForExtremes(t *testing.T) {
	for _, c := range []struct {
		q units.Flow
		n units.RotationalSpeed
	}{{math.MaxFloat64, 0.5}, {1e-300, math.MaxFloat64}} {
		d, err := DisplacementFor(c.q, c.n, 0.5)
		if checktest.RangeErrorIn(t, err, "pump.DisplacementFor", "displacement"); d != 0 {
			t.Errorf("DisplacementFor(%v, %v) = %v beside the error", c.q, c.n, d)
		}
	}
}

// A lossless pump (η_v = 1) leaks nothing at any pressure, however small
// the LeakagePressure it was measured at: 0 × (p/p_L) is 0 even when p/p_L
// overflows.
func TestPumpLossless(t *testing.T) {
	p := baler()
	p.Volumetric, p.LeakagePressure = 1, 5e-324
	pt, err := p.At(100 * units.Bar)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "lossless flow", pt.Flow, 45e-6*1450/60, 1e-15)
	checktest.Near(t, "hydraulic power", pt.Hydraulic, 100e5*45e-6*1450/60, 1e-15)
}
