package pump

import (
	"testing"

	"github.com/hydrosize/hydrosize/hydro/valve"
	"github.com/hydrosize/hydrosize/units"
)

func BenchmarkPumpAt(b *testing.B) {
	p := baler()
	p.Variable, p.Control, p.PowerLimit = true, PowerLimited, 15*units.Kilowatt
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if _, err := p.At(units.Pressure(i%300) * units.Bar); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkPumpStandby(b *testing.B) {
	p := compensated()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := p.Standby(); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkAtmosphere(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if _, err := Atmosphere(units.Length(i % 4000)); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkCheckInlet(b *testing.B) {
	amb, _ := SiteAltitude(300)
	in := Inlet{Ambient: amb, Head: 0.3, Density: 870, Loss: 0.1 * units.Bar, Minimum: 0.8 * units.BarAbsolute}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := CheckInlet(in); err != nil {
			b.Fatal(err)
		}
	}
}

// Size builds the default displacement list on each call: it allocates.
func BenchmarkSize(b *testing.B) {
	need := Need{Flow: 55 * units.LitrePerMinute, Pressure: 180 * units.Bar, Speed: 1450 * units.RevolutionPerMinute, Volumetric: 0.95}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Size(need); err != nil {
			b.Fatal(err)
		}
	}
}

// Compatibility returns findings: it allocates.
func BenchmarkCompatibility(b *testing.B) {
	c := Circuit{Center: valve.ClosedCenter, Relief: 270 * units.Bar, Together: true, Demands: []Demand{
		{Name: "slew", Pressure: 80 * units.Bar, Flow: 20 * units.LitrePerMinute},
		{Name: "boom", Pressure: 160 * units.Bar, Flow: 35 * units.LitrePerMinute}}}
	p := loadSensing()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := p.Compatibility(c); err != nil {
			b.Fatal(err)
		}
	}
}
