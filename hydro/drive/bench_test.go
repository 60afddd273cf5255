package drive

import (
	"testing"

	"github.com/hydrosize/hydrosize/units"
)

func BenchmarkShaftPower(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if _, err := ShaftPower(units.Pressure(i%300)*units.Bar, 40*units.LitrePerMinute, 0.87); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkNextIEC(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		if _, err := NextIEC(units.Power(1 + i%300000)); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkCycle(b *testing.B) {
	phases := workedCycle()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Cycle(phases); err != nil {
			b.Fatal(err)
		}
	}
}

// SelectMotor returns a finding on this cycle: it allocates.
func BenchmarkSelectMotor(b *testing.B) {
	d, _ := Cycle(workedCycle())
	need := MotorNeed{Duty: d, Speed: 1455 * units.RevolutionPerMinute, Breakdown: 2.5}
	b.ReportAllocs()
	for b.Loop() {
		if _, err := SelectMotor(need); err != nil {
			b.Fatal(err)
		}
	}
}

func BenchmarkEngineLoad(b *testing.B) {
	e := skidderEngine()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := e.Load(35*units.Kilowatt, 1800*units.RevolutionPerMinute); err != nil {
			b.Fatal(err)
		}
	}
}
