package drive

import (
	"math"
	"math/big"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// The trade's constants come out of the unit definitions (NIST SP 811,
// Appendix B: bar = 10⁵ Pa, L = 10⁻³ m³, in = 0.0254 m, gal = 231 in³,
// lbf = 0.45359237 kg × 9.80665 m/s², hp = 550 ft·lbf/s), evaluated here
// exactly with math/big:
//
//	bar·(L/min) = 10⁵ × 10⁻³/60 W = 1/600 kW                  → 600 exactly
//	psi·gpm     = (lbf/in²)·(231 in³/60 s) = 3.85 in·lbf/s
//	hp          = 550 × 12 in·lbf/s = 6600 in·lbf/s            → 6600/3.85 = 1714.2857…
//
// ShaftPower must give 1/600 kW and 1/1714.2857 hp for one unit of each to
// 1 ulp or so: no constant is typed in the code.
func TestTradeConstants(t *testing.T) {
	kw, err := ShaftPower(units.Bar, units.LitrePerMinute, 1)
	if err != nil {
		t.Fatal(err)
	}
	if want := 1.0 / 600; math.Abs(kw.Kilowatts()-want) > 2*ulp(want) {
		t.Errorf("1 bar × 1 L/min = %.17g kW; want 1/600 = %.17g", kw.Kilowatts(), want)
	}
	hpPerPsiGpm, _ := new(big.Rat).SetString("231/396000") // 3.85/6600: 231 in³/60 s over 6600 in·lbf/s
	want, _ := hpPerPsiGpm.Float64()
	hp, err := ShaftPower(units.PSI, units.USGallonPerMinute, 1)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(hp.Horsepower()-want) > 4*ulp(want) {
		t.Errorf("1 psi × 1 gpm = %.17g hp; want 1/%.10g = %.17g", hp.Horsepower(), 1/want, want)
	}
	if c := 1 / hp.Horsepower(); math.Abs(c-1714.29) > 0.005 {
		t.Errorf("the hp constant is %.6g; the trade prints 1714 (1714.29)", c)
	}
	// GNU units 2.22 agrees: units -t 'psi*gal/min' hp → 0.00058333333333333327.
	checktest.Near(t, "1 psi·gpm in hp (GNU units)", hp.Horsepower(), 0.00058333333333333327, 1e-15)
}

func ulp(x float64) float64 { return math.Nextafter(x, math.Inf(1)) - x }

// Properties of P = Δp·Q/η: it rises with pressure and with flow, and any
// efficiency below 1 raises it above the hydraulic power.
func TestShaftPowerProperties(t *testing.T) {
	lpm := units.LitrePerMinute
	prev := units.Power(0)
	for bar := 10.0; bar <= 350; bar += 10 {
		p, err := ShaftPower(units.Pressure(bar)*units.Bar, 40*lpm, 0.85)
		if err != nil || p <= prev {
			t.Fatalf("at %v bar: %v, %v; not above %v", bar, p, err, prev)
		}
		prev = p
	}
	prev = 0
	for q := 5.0; q <= 300; q += 5 {
		p, err := ShaftPower(150*units.Bar, units.Flow(q)*lpm, 0.85)
		if err != nil || p <= prev {
			t.Fatalf("at %v L/min: %v, %v; not above %v", q, p, err, prev)
		}
		prev = p
	}
	ideal, _ := ShaftPower(150*units.Bar, 40*lpm, 1)
	checktest.Near(t, "ideal shaft power", ideal, (150 * units.Bar).TimesFlow(40*lpm), 0)
	for _, eta := range []float64{0.999, 0.9, 0.5, 0.01} {
		if p, _ := ShaftPower(150*units.Bar, 40*lpm, eta); p <= ideal {
			t.Errorf("η %v: %v not above the ideal %v", eta, p, ideal)
		}
	}
}

func TestShaftPowerBadInput(t *testing.T) {
	for _, c := range []struct {
		p     units.Pressure
		q     units.Flow
		eta   float64
		param string
	}{
		{-1, 1e-3, 0.9, "p"}, {units.Pressure(math.NaN()), 1e-3, 0.9, "p"}, {1e7, -1e-3, 0.9, "q"},
		{1e7, 1e-3, 0, "overall"}, {1e7, 1e-3, 1.1, "overall"}, {1e7, 1e-3, math.NaN(), "overall"},
		{1e300, 1e300, 0.5, "power"},
	} {
		p, err := ShaftPower(c.p, c.q, c.eta)
		if checktest.RangeErrorIn(t, err, "drive.ShaftPower", c.param); p != 0 {
			t.Errorf("ShaftPower(%v, %v, %v) = %v; want 0 beside the error", c.p, c.q, c.eta, p)
		}
	}
}

// IEC 60072-1 and NEMA MG 1 selections at and between ratings.
func TestNextRating(t *testing.T) {
	kW, hp := units.Kilowatt, units.Horsepower
	for _, c := range []struct {
		need, want units.Power
	}{
		{0.01 * kW, 0.06 * kW}, // below the smallest
		{7.5 * kW, 7.5 * kW},   // at a rating
		{7.51 * kW, 11 * kW},   // just above
		{16 * kW, 18.5 * kW},   // between
		{315 * kW, 315 * kW},   // the largest
	} {
		ch, err := NextIEC(c.need)
		if err != nil || ch.Chosen != c.want || !ch.OK() || ch.Rule.Kind != components.Standard {
			t.Errorf("NextIEC(%v) = %+v, %v; want %v", c.need, ch, err, c.want)
		}
	}
	if ch, err := NextIEC(316 * kW); err != nil || ch.OK() || ch.Chosen != 0 {
		t.Errorf("NextIEC above 315 kW = %+v, %v; want a failed choice", ch, err)
	}
	for _, c := range []struct {
		need, want units.Power
	}{
		{10 * hp, 10 * hp}, {10.01 * hp, 15 * hp}, {7.457 * kW, 15 * hp}, {7.456 * kW, 10 * hp}, {0.1 * hp, 0.5 * hp},
	} {
		ch, err := NextNEMA(c.need)
		if err != nil || ch.Chosen != c.want {
			t.Errorf("NextNEMA(%v) = %v, %v; want %v", c.need, ch.Chosen, err, c.want)
		}
	}
	_, err := NextIEC(0)
	checktest.RangeErrorIn(t, err, "drive.NextIEC", "p")
}

// Synchronous speed n = 120·f/p (IEC 60034-1 and every machines text): 4
// poles at 50 Hz 1500 rpm, at 60 Hz 1800 rpm; 2 poles at 60 Hz 3600 rpm.
func TestMotorSpeeds(t *testing.T) {
	for _, c := range []struct {
		poles        int
		hz           units.Frequency
		sync, loaded float64 // rpm, loaded at the 3 % typical slip
	}{{4, 50, 1500, 1455}, {4, 60, 1800, 1746}, {2, 60, 3600, 3492}, {6, 50, 1000, 970}} {
		s, err := MotorSpeeds(c.poles, c.hz*units.Hertz, nil)
		if err != nil {
			t.Fatal(err)
		}
		checktest.Near(t, "synchronous", s.Synchronous.RPM(), c.sync, 1e-15)
		checktest.Near(t, "full load", s.FullLoad.RPM(), c.loaded, 1e-14)
		if s.SlipRule.Kind != components.CommonPractice || s.Slip != TypicalSlip {
			t.Errorf("slip %v (%v); want the typical slip, common practice", s.Slip, s.SlipRule)
		}
	}
	// A nameplate of 1465 rpm on a 4-pole 50 Hz motor: slip 35/1500.
	s, err := MotorSpeeds(4, 50*units.Hertz, new(35.0/1500))
	if err != nil || s.SlipRule.Kind != components.CallerValue {
		t.Fatalf("MotorSpeeds with a slip: %+v, %v", s, err)
	}
	checktest.Near(t, "nameplate speed", s.FullLoad.RPM(), 1465, 1e-14)

	_, err = MotorSpeeds(3, 50*units.Hertz, nil)
	checktest.RangeErrorIn(t, err, "drive.MotorSpeeds", "poles")
	_, err = MotorSpeeds(4, 0, nil)
	checktest.RangeErrorIn(t, err, "drive.MotorSpeeds", "mains")
	_, err = MotorSpeeds(4, 50*units.Hertz, new(1.0))
	checktest.RangeErrorIn(t, err, "drive.MotorSpeeds", "slip")
	_, err = MotorSpeeds(4, 50*units.Hertz, new(-0.01))
	checktest.RangeErrorIn(t, err, "drive.MotorSpeeds", "slip")
}

func TestDriveAllocations(t *testing.T) {
	phases := workedCycle()
	e := skidderEngine()
	if n := testing.AllocsPerRun(100, func() {
		_, _ = ShaftPower(2e7, 1e-3, 0.9)
		_, _ = NextIEC(9e3)
		_, _ = MotorSpeeds(4, 50, nil)
		_, _ = Cycle(phases)
		_, _ = e.PowerAt(30)
		_, _ = e.Load(2e4, 30)
	}); n != 0 {
		t.Errorf("the drive calls allocate %v times per run; want 0", n)
	}
}

// workedCycle is the cycle of TestCycleWorked.
func workedCycle() []Phase {
	kW := units.Kilowatt
	return []Phase{
		{Name: "press", Duration: 2 * time.Second, Power: 30 * kW, Efficiency: 0.85},
		{Name: "return", Duration: 8 * time.Second, Power: 10 * kW, Efficiency: 0.85},
		{Name: "dwell", Duration: 10 * time.Second, Power: 2 * kW, Efficiency: 0.85},
	}
}

// The rating selections name the function the caller called and its
// parameter, not the series helper they use.
func TestNextRatingBadInput(t *testing.T) {
	for _, p := range []units.Power{0, -1, units.Power(math.NaN()), units.Power(math.Inf(1))} {
		ch, err := NextIEC(p)
		if checktest.RangeErrorIn(t, err, "drive.NextIEC", "p"); ch.Required != 0 {
			t.Errorf("NextIEC(%v) = %+v beside the error", p, ch)
		}
		_, err = NextNEMA(p)
		checktest.RangeErrorIn(t, err, "drive.NextNEMA", "p")
	}
}
