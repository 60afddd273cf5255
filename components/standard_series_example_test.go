package components_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// A log splitter's wedge needs at least 86 mm of bore. The next ISO 3320
// bore is 90 mm, a second-choice size; the next preferred one is 100 mm.
func ExampleISO3320Bores() {
	bores := components.ISO3320Bores()
	next, _ := bores.Next(86 * units.Millimetre)
	pref, _ := bores.NextPreferred(86 * units.Millimetre)
	fmt.Println(next, bores.Preferred(next))
	fmt.Println(pref, bores.Preferred(pref))
	fmt.Println(bores.Rule())
	// Output:
	// 90 mm false
	// 100 mm true
	// standard: ISO 3320:2013, clause 5
}

// A test-rig clamp's rod failed its buckling check at 36 mm: step up one
// rod size.
func ExampleSeries_Above() {
	rod, _ := components.ISO3320Rods().Above(36 * units.Millimetre)
	fmt.Println(rod)
	// Output: 40 mm
}

// A forestry crane's return line needs a hose of at least 19 mm bore.
func ExampleHoseSizeOf() {
	c, _ := components.HoseSizes().Select(19 * units.Millimetre)
	dash, _ := components.HoseSizeOf(c.Chosen)
	fmt.Printf("%v hose, %.2f mm bore\n", dash, c.Chosen.Millimetres())
	// Output: -12 hose, 19.05 mm bore
}

func ExampleParseHoseSize() {
	for _, s := range []string{"-8", "#12", "dash 16", "-7"} {
		h, err := components.ParseHoseSize(s)
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%v: %.4g in\n", h, h.ID().Inches())
	}
	// Output:
	// -8: 0.5 in
	// -12: 0.75 in
	// -16: 1 in
	// components.ParseHoseSize: parsing "-7" at offset 1: value out of range: want an SAE J517 dash size: -3 -4 -5 -6 -8 -10 -12 -16 -20 -24 -32 -40 -48 -56 -64
}

// A baling press power unit draws 12.3 kW at the shaft: the next IEC rating
// is 15 kW; the same load on a NEMA motor is about 16.5 hp, so 20 hp.
func ExampleIECMotorRatings() {
	iec, _ := components.IECMotorRatings().Select(12.3 * units.Kilowatt)
	nema, _ := components.NEMAMotorRatings().Select(12.3 * units.Kilowatt)
	fmt.Printf("%v, margin %.0f %%\n", iec.Chosen, 100*iec.Margin())
	fmt.Printf("%.0f hp\n", nema.Chosen.Horsepower())
	// Output:
	// 15 kW, margin 22 %
	// 20 hp
}

func ExampleSynchronousSpeed() {
	for _, f := range []units.Frequency{50, 60} {
		n, _ := components.SynchronousSpeed(4, f*units.Hertz)
		fmt.Printf("4 poles at %v: %.0f rev/min\n", f, n.RPM())
	}
	// Output:
	// 4 poles at 50 Hz: 1500 rev/min
	// 4 poles at 60 Hz: 1800 rev/min
}

// A scissor lift table's pressure line needs at least 8.5 mm of bore in
// heavy-series tube: the first tube that has it.
func ExampleMetricTubes() {
	for _, tb := range components.MetricTubes(components.HeavyTube) {
		if tb.ID() >= 8.5*units.Millimetre {
			fmt.Println(tb, "bore", tb.ID())
			break
		}
	}
	// Output: 14 × 2.5 mm (S) bore 9 mm
}

// A baling press pump delivers 40 L/min; three minutes of flow asks for a
// 120 L tank: 125 L is the next R10 volume, 160 L the next preferred one.
func ExampleReservoirVolumes() {
	need := 3 * 40 * units.Litre
	tanks := components.ReservoirVolumes()
	c, _ := tanks.Select(need)
	p, _ := tanks.SelectPreferred(need)
	fmt.Println(c.Chosen, p.Chosen)
	// Output: 125 L 160 L
}

// A proportional valve on a test rig asks for oil filtered to 11 µm(c) or
// finer: the coarsest listed rating that meets it is 10 µm(c).
func ExampleSeries_Floor() {
	r, _ := components.FilterRatings().Floor(11 * units.Micrometre)
	fmt.Printf("%.0f µm(c)\n", r.Micrometres())
	// Output: 10 µm(c)
}
