package pump

import (
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// The troposphere formula against the standard atmosphere's values.
//
//   - ISO 2533:1975 / ICAO Doc 7488 table values (from memory): 89 875 Pa
//     at 1000 m, 79 495 Pa at 2000 m, 70 109 Pa at 3000 m, 22 632 Pa at the
//     tropopause, 11 000 m.
//   - The formula's constants as printed, p = 101 325·(1 − 2.25577·10⁻⁵·h)^5.25588,
//     and the exponent 5.255876 of the U.S. Standard Atmosphere, 1976
//     (NOAA/NASA/USAF), layer 1, which must follow from T₀, L, g₀, M and R*.
//
// Tolerance: ±1 Pa for the tables, which print whole pascals; the printed
// constants to their last digit.
func TestAtmosphere(t *testing.T) {
	for _, c := range []struct {
		h    units.Length
		want float64
	}{
		{0, 101325}, {1000, 89875}, {2000, 79495}, {3000, 70109}, {11000, 22632},
	} {
		p, err := Atmosphere(c.h)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(p.Pascals()-c.want) > 1 {
			t.Errorf("Atmosphere(%v) = %.1f Pa; want %v Pa ± 1", c.h, p.Pascals(), c.want)
		}
	}
	if k := lapseKPerM / seaLevelK; math.Abs(k-2.25577e-5) > 0.000005e-5 {
		t.Errorf("L/T₀ = %.8g /m; want 2.25577e-5", k)
	}
	if e := gravityMPerS2 * airMolarKg / (gasConstant * lapseKPerM); math.Abs(e-5.255876) > 0.0000005 {
		t.Errorf("g₀·M/(R*·L) = %.8g; want 5.255876", e)
	}
	// Below sea level the pressure rises, and it falls monotonically with height.
	prev := units.AbsolutePressure(math.Inf(1))
	for h := LowestAltitude; h <= HighestAltitude; h += 250 {
		p, err := Atmosphere(h)
		if err != nil || p >= prev {
			t.Fatalf("Atmosphere(%v) = %v, %v; not below %v", h, p, err, prev)
		}
		prev = p
	}
	for _, h := range []units.Length{-2001, 11001, units.Length(math.NaN()), units.Length(math.Inf(1))} {
		if p, err := Atmosphere(h); !errors.Is(err, units.ErrRange) || p != 0 {
			t.Errorf("Atmosphere(%v) = %v, %v; want 0 and ErrRange", h, p, err)
		}
	}
}

func TestSiteAmbient(t *testing.T) {
	a, err := SiteAltitude(1500)
	if err != nil || a.Rule.Kind != components.Standard || a.Pressure < 84e3 || a.Pressure > 85e3 {
		t.Errorf("SiteAltitude(1500 m) = %+v, %v; want about 84.6 kPa under ISO 2533", a, err)
	}
	m, err := SitePressure(96 * units.KilopascalAbsolute)
	if err != nil || m.Pressure != 96e3 || m.Rule.Kind != components.CallerValue {
		t.Errorf("SitePressure = %+v, %v", m, err)
	}
	if _, err := SitePressure(0); !errors.Is(err, units.ErrRange) {
		t.Errorf("SitePressure(0) error = %v; want ErrRange", err)
	}
}

// A log splitter's pump sits 0.4 m above the lowest oil level at a site
// 1800 m up (demo data): the oil column of 870 kg/m³ pulls
// 870 × 9.80665 × 0.4 = 3412.7 Pa below the ambient, and the cold suction
// line loses 0.12 bar. GNU units 2.22 evaluates the same balance:
//
//	units -t -o %.17g 'P1800 + 870 kg/m^3 * gravity * (-0.4 m) - 0.12 bar' Pa
//
// with P1800 the ISO 2533 pressure at 1800 m (81 489.2 Pa).
func TestCheckInlet(t *testing.T) {
	amb, err := SiteAltitude(1800)
	if err != nil {
		t.Fatal(err)
	}
	in := Inlet{Ambient: amb, Head: -0.4, Density: 870, Loss: 0.12 * units.Bar, Minimum: 0.8 * units.BarAbsolute}
	r, err := CheckInlet(in)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "static head", r.Static, -870*9.80665*0.4, 1e-15)
	want := float64(amb.Pressure) - 870*9.80665*0.4 - 0.12e5
	checktest.Near(t, "inlet pressure", float64(r.Pressure), want, 1e-15)
	path := checktest.GNUUnits(t)
	got := checktest.GNUUnitsValue(t, path, formatG(amb.Pressure.Pascals())+" Pa + 870 kg/m^3 * gravity * (-0.4 m) - 0.12 bar", "Pa")
	checktest.Near(t, "inlet pressure vs GNU units", float64(r.Pressure), got, 1e-14)
	// 0.66 bar(a) is below the 0.8 bar(a) minimum: a cavitation warning.
	if r.Check.OK() || len(r.Findings.Hazard(components.Cavitation)) != 1 || r.Findings[0].Severity != components.Warning {
		t.Errorf("check %+v, findings %v; want a failed check and one cavitation warning", r.Check, r.Findings)
	}
	// Flooded inlet, sea level: passes, no finding.
	sea, _ := SiteAltitude(0)
	in.Ambient, in.Head = sea, 0.5
	r, err = CheckInlet(in)
	if err != nil || !r.Check.OK() || len(r.Findings) != 0 {
		t.Errorf("flooded inlet at sea level: %+v, %v; want a pass", r, err)
	}
	if r.Check.Rule.Kind != components.CallerValue || r.Ambient.Rule.Kind != components.Standard {
		t.Errorf("rules: check %v, ambient %v", r.Check.Rule, r.Ambient.Rule)
	}
}

func TestCheckInletBadInput(t *testing.T) {
	amb, _ := SiteAltitude(0)
	good := Inlet{Ambient: amb, Head: 0.3, Density: 870, Loss: 1e4, Minimum: 8e4}
	for name, mut := range map[string]func(*Inlet){
		"unset ambient":    func(in *Inlet) { in.Ambient = Ambient{} },
		"negative tank":    func(in *Inlet) { in.Tank = -1 },
		"NaN head":         func(in *Inlet) { in.Head = units.Length(math.NaN()) },
		"zero density":     func(in *Inlet) { in.Density = 0 },
		"negative loss":    func(in *Inlet) { in.Loss = -1 },
		"no minimum":       func(in *Inlet) { in.Minimum = 0 },
		"infinite minimum": func(in *Inlet) { in.Minimum = units.AbsolutePressure(math.Inf(1)) },
	} {
		in := good
		mut(&in)
		r, err := CheckInlet(in)
		if !errors.Is(err, units.ErrRange) || r.Pressure != 0 || r.Findings != nil {
			t.Errorf("%s: CheckInlet = %+v, %v; want the zero result and ErrRange", name, r, err)
		}
	}
}
