package thermal

import (
	"math"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

func celsius(c float64) units.Temperature { return units.TemperatureFromCelsius(c) }

func TestThrottleRiseEsposito(t *testing.T) {
	// Esposito, Fluid Power with Applications, 7th ed., Example 11-2
	// (inputs): 1000 psi across a relief valve, oil at 120 °F; the book's
	// oil properties 7.42 lb/gal and 0.42 BTU/(lb·°F) (from memory); result
	// 127.9 °F downstream, printed to 0.1 °F after the book's rounded
	// constants (1714, 42.4): ±0.1 °F.
	d, err := ThrottleRise(1000*units.PSI, 7.42*units.PoundPerUSGallon, 0.42*units.BTUPerPoundFahrenheit)
	if got := celsius(0).Add(d).Fahrenheit() - 32 + 120; err != nil || math.Abs(got-127.9) > 0.1 {
		t.Errorf("Ex. 11-2: downstream %.3f °F, %v; want 127.9 °F", got, err)
	}
	// Example 11-3 (inputs): 70 bar, oil at 50 °C, the book's 895 kg/m³
	// and 1.8 kJ/(kg·K) (from memory): 54.3 °C, printed to 0.1 °C.
	d, err = ThrottleRise(70*units.Bar, 895, 1.8*units.KilojoulePerKilogramKelvin)
	if got := celsius(50).Add(d).Celsius(); err != nil || math.Abs(got-54.3) > 0.05 {
		t.Errorf("Ex. 11-3: downstream %.3f °C, %v; want 54.3 °C", got, err)
	}
	// With a fluid's own properties the rise is Δp/(ρ·c) at that state.
	oil, _ := fluid.Typical(fluid.HM, fluid.VG46)
	d, _ = ThrottleRiseOf(100*units.Bar, oil, celsius(50))
	rho, _ := oil.Density(celsius(50), 0)
	c, _ := oil.SpecificHeat(celsius(50))
	if want := 1e7 / (float64(rho) * float64(c)); math.Abs(float64(d)-want) > 1e-12*want || d < 5 || d > 7 {
		t.Errorf("VG 46 at 50 °C: %v per 100 bar, want %g K (about 6)", d, want)
	}
}

func TestCoolerDuty(t *testing.T) {
	// By hand: 5 kW load, surfaces of 60 W/K, oil at most 55 °C, air up to
	// 35 °C: ETD 20 K, the surfaces shed 1.2 kW, the cooler takes 3.8 kW,
	// 0.19 kW/K, 3800 W / 0.29307107 W per BTU/h = 12 966.1 BTU/h; without
	// it the oil would settle at 35 + 5000/60 = 118.33 °C.
	c, err := CoolerNeed{Load: 5 * units.Kilowatt, Dissipation: 60, MaxOil: celsius(55), MaxAmbient: celsius(35)}.Size()
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(c.Duty.Kilowatts()-3.8) > 1e-12 || math.Abs(c.Specific.KilowattsPerKelvin()-0.19) > 1e-12 ||
		math.Abs(c.BTUPerHour()-12966.1) > 0.05 || math.Abs(c.Steady.Celsius()-118.333) > 5e-4 || c.Check.OK() {
		t.Errorf("duty %v, specific %v, %v BTU/h, steady %v, check %v", c.Duty, c.Specific, c.BTUPerHour(), c.Steady, c.Check)
	}
	if len(c.Findings.Topic("thermal.cooler")) != 1 || len(c.Findings.Topic("thermal.pump-inlet")) != 0 {
		t.Errorf("findings %v", c.Findings)
	}
	// No load and no surfaces: the oil sits at the ambient, no cooler.
	c, err = CoolerNeed{MaxOil: celsius(55), MaxAmbient: celsius(35)}.Size()
	if err != nil || c.Duty != 0 || c.Steady != celsius(35) || !c.Check.OK() ||
		strings.Contains(c.Findings[0].Text(units.Metric()), "-273") {
		t.Errorf("no load: steady %v, check %v, findings %v, %v", c.Steady, c.Check, c.Findings, err)
	}
	// Enough surface: no cooler, and a notice says so; 65 °C oil is above
	// ISO 4413's pump-inlet limit.
	c, _ = CoolerNeed{Load: 1 * units.Kilowatt, Dissipation: 60, MaxOil: celsius(65), MaxAmbient: celsius(35)}.Size()
	if c.Duty != 0 || c.Specific != 0 || !c.Check.OK() || len(c.Findings.Topic("thermal.no-cooler")) != 1 ||
		len(c.Findings.Hazard(components.HotSurface)) != 1 {
		t.Errorf("no cooler: %v, findings %v", c.Duty, c.Findings)
	}
}

func TestCoolerBadInput(t *testing.T) {
	ok := CoolerNeed{Load: 1000, Dissipation: 50, MaxOil: celsius(55), MaxAmbient: celsius(35)}
	bad := func(f func(*CoolerNeed)) error { n := ok; f(&n); _, err := n.Size(); return err }
	for _, c := range []struct {
		name  string
		err   error
		param string
	}{
		{"ambient at max", bad(func(n *CoolerNeed) { n.MaxAmbient = n.MaxOil }), "MaxAmbient"},
		{"ambient above", bad(func(n *CoolerNeed) { n.MaxAmbient = celsius(60) }), "MaxAmbient"},
		{"load", bad(func(n *CoolerNeed) { n.Load = -1 }), "Load"},
		{"dissipation", bad(func(n *CoolerNeed) { n.Dissipation = Conductance(math.NaN()) }), "Dissipation"},
		{"max oil", bad(func(n *CoolerNeed) { n.MaxOil = 0 }), "MaxOil"},
		// Results that overflow are errors, not +Inf beside nil.
		{"natural overflows", bad(func(n *CoolerNeed) { n.Dissipation = math.MaxFloat64 }), "Natural"},
		{"steady overflows", bad(func(n *CoolerNeed) { n.Load, n.Dissipation = 1e300, 1e-300 }), "Steady"},
		{"throttle dp", second(ThrottleRise(-1, 870, 1900)), "dp"},
		{"throttle rho", second(ThrottleRise(1e7, 0, 1900)), "rho"},
		{"throttle c", second(ThrottleRise(1e7, 870, 0)), "c"},
	} {
		t.Run(c.name, func(t *testing.T) { checktest.RangeError(t, c.err, c.param) })
	}
	// ThrottleRiseOf names itself and its own parameters, not fluid's.
	oil, _ := fluid.Typical(fluid.HM, fluid.VG46)
	for _, c := range []struct {
		name, param string
		f           fluid.Fluid
		dp          units.Pressure
		t           units.Temperature
	}{
		{"too hot", "t", oil, 1e7, celsius(400)},
		{"zero fluid", "f.Density15", fluid.Fluid{}, 1e7, celsius(40)},
		{"dp", "dp", oil, -1, celsius(40)},
	} {
		_, err := ThrottleRiseOf(c.dp, c.f, c.t)
		t.Run("of "+c.name, func(t *testing.T) { checktest.RangeErrorIn(t, err, "thermal.ThrottleRiseOf", c.param) })
	}
}

func second[T any](_ T, err error) error { return err }
