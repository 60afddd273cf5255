package components_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// A baling press ram needs at least 71.3 mm of bore; the next size of a
// short demo series is 80 mm, 12 % over.
func ExampleSeries_Select() {
	mm := units.Millimetre
	bores, _ := components.NewSeries("demo bores", components.OurRule("demo data"),
		[]units.Length{50 * mm, 63 * mm, 80 * mm, 100 * mm}, nil)
	c, _ := bores.Select(71.3 * mm)
	fmt.Println(c.Chosen, c.OK())
	fmt.Printf("margin %.1f %%\n", 100*c.Margin())
	// Output:
	// 80 mm true
	// margin 12.2 %
}

func ExampleFinding_Text() {
	f := components.NewFinding(components.Danger, components.StoredEnergy, "demo.accumulator",
		components.StandardRule("ISO 4413:2010"),
		"the accumulator holds %v after shutdown; vent it or isolate it automatically", 180*units.Bar)
	metric, us := units.Metric(), units.USCustomary()
	fmt.Println(f.Text(metric))
	fmt.Println(f.Text(us))
	fmt.Println(f.Severity, f.Hazard, f.Rule)
	// Output:
	// the accumulator holds 180 bar after shutdown; vent it or isolate it automatically
	// the accumulator holds 2611 psi after shutdown; vent it or isolate it automatically
	// danger stored energy standard: ISO 4413:2010
}

func ExampleFindings_Merge() {
	r := components.PracticeRule("demo")
	hot := components.NewFinding(components.Caution, components.HotSurface, "demo.hot", r, "the tank runs hot")
	fs := components.Findings{hot}.Merge(
		components.NewFinding(components.Warning, components.Burst, "demo.hose", r, "restrain the hose"),
		hot, // already there: not added again
	)
	for _, f := range fs.Sorted() {
		fmt.Println(f)
	}
	fmt.Println(len(fs.AtLeast(components.Warning)))
	// Output:
	// warning (burst): restrain the hose
	// caution (hot surface): the tank runs hot
	// 1
}

func ExampleReaches() {
	c := components.Reaches(3.1, 4.0, components.PracticeRule("buckling safety factor 4"))
	fmt.Println(c.OK(), c.Ratio())
	// Output: false 0.775
}
