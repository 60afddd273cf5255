package valve

import (
	"testing"

	"github.com/hydrosize/hydrosize/hydro/actuator"
	"github.com/hydrosize/hydrosize/units"
)

func BenchmarkOrificeFlow(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if _, err := OrificeFlow(SharpEdgedCd, 1e-5, units.Pressure(1+i%300)*units.Bar, 870); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkKvDrop(b *testing.B) {
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Kv(2.4).Drop(60*units.LitrePerMinute, 870); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkScaleDrop(b *testing.B) {
	ref := DropPoint{Flow: 40 * units.LitrePerMinute, Drop: 5 * units.Bar, Density: 870, Viscosity: 32e-6}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := ScaleDrop(ref, Laminar, 60*units.LitrePerMinute, 880, 300e-6); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkCounterbalanceSetting(b *testing.B) {
	n := CounterbalanceNeed{Load: 150 * units.Bar, PilotRatio: 4.5, Back: 5 * units.Bar, Coupling: 0.69, Flow: 1e-3}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := CounterbalanceSetting(n); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkPilotCheckPressure(b *testing.B) {
	n := PilotCheckNeed{Load: 90 * units.Bar, Ratio: 4, Back: 3 * units.Bar}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := PilotCheckPressure(n); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkCheckMetering(b *testing.B) {
	mm := units.Millimetre
	n := MeteringNeed{Metering: MeterOut, Cylinder: actuator.Cylinder{Bore: 125 * mm, Rod: 90 * mm, Stroke: 900 * mm, Rating: 250 * units.Bar},
		Stroke: actuator.Retract, Supply: 210 * units.Bar}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := CheckMetering(n); err != nil {
			b.Fatal(err)
		}
	}
}
