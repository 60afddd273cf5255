package contamination_test

import (
	"fmt"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/hydro/contamination"
	"github.com/hydrosize/hydrosize/units"
)

// A particle counter reads a 10 mL bottle sample from a baling press
// (demo data): cumulative counts at ≥4, ≥6 and ≥14 µm(c).
func ExampleCodeFromSample() {
	code, err := contamination.CodeFromSample(12840, 3210, 14, 10*units.Millilitre)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println("ISO 4406:", code)
	fmt.Println("ASCII:   ", code.ASCII())
	above, upTo, _ := code.Range(1)
	fmt.Printf("≥6 µm(c): more than %g up to %g per mL\n", above, upTo)
	// Output:
	// ISO 4406: 17/16/≥8
	// ASCII:    17/16/>=8
	// ≥6 µm(c): more than 320 up to 640 per mL
}

// A test-rig clamp circuit with a proportional valve at 230 bar (demo
// data): choose a target, then check a sample against it.
func ExampleCompare() {
	target, err := contamination.RecommendTarget(contamination.TargetInput{
		Components: []contamination.Component{contamination.GearPump, contamination.ProportionalValve, contamination.Cylinder},
		Pressure:   230 * units.Bar,
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("target %v (%v, set by the %v, %v)\n", target.Code, target.Rule.Kind, target.Basis, target.Band)

	sample, _ := contamination.ParseCode("17/16/10")
	r, _ := contamination.Compare(sample, target.Code)
	for _, s := range r.Sizes[:r.Form.Len()] {
		fmt.Printf("%-9s %-5v %+d classes, about ×%g (bounds ×%.3g)\n", s.Size, s.Status, s.Classes, s.Factor, s.Check.Ratio())
	}
	fmt.Println("meets target:", r.Meets)
	for _, f := range r.Findings {
		fmt.Println(f)
	}
	// Output:
	// target 16/14/11 (common practice, set by the proportional valve, over 210 bar)
	// ≥4 µm(c)  over  +1 classes, about ×2 (bounds ×2.03)
	// ≥6 µm(c)  over  +2 classes, about ×4 (bounds ×4)
	// ≥14 µm(c) meets -1 classes, about ×0.5 (bounds ×0.5)
	// meets target: false
	// caution (contamination): At ≥4 µm(c) the sample reads 17, above the target 16: about 2 times the particles the target allows.
	// caution (contamination): At ≥6 µm(c) the sample reads 16, above the target 14: about 4 times the particles the target allows.
}

// A sawmill log turner's power unit (demo data): 160 L/min through the
// return filter, a 600 L tank, and a dusty site letting in an estimated
// 1.5×10⁸ particles ≥4 µm(c) per minute. Which β at 4 µm(c) holds 17 at
// ≥4 µm(c), and what does a β_4(c) ≥ 200 element hold?
func ExampleBetaForTarget() {
	const ingress = 1.5e8 // particles ≥4 µm(c) per minute
	q := 160 * units.LitrePerMinute

	beta, err := contamination.BetaForTarget(ingress, q, 17)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("least β_4(c) to hold 17: %.2f\n", beta)

	r := contamination.Rating{Size: 4 * units.Micrometre, Beta: 200}
	c, _ := contamination.SteadyState(ingress, q, r.Beta)
	n, _ := contamination.ScaleNumber(c)
	tau, _ := contamination.TimeConstant(600*units.Litre, q, r.Beta)
	fmt.Printf("%v holds %.0f per mL (number %d), time constant %.1f min\n", r, c, n, tau.Minutes())

	// Below the least flow a perfect filter needs, no β is enough.
	_, err = contamination.BetaForTarget(ingress, 100*units.LitrePerMinute, 17)
	fmt.Println(err != nil)
	// Output:
	// least β_4(c) to hold 17: 3.59
	// β_4(c) ≥ 200 holds 942 per mL (number 17), time constant 3.8 min
	// true
}

func ExampleScaleNumber() {
	for _, perML := range []float64{0, 7, 640, 640.5, 3e6} {
		n, _ := contamination.ScaleNumber(perML)
		fmt.Println(perML, "per mL →", n)
	}
	// Output:
	// 0 per mL → 0
	// 7 per mL → 10
	// 640 per mL → 16
	// 640.5 per mL → 17
	// 3e+06 per mL → 29
}

func ExampleParseCode() {
	for _, s := range []string{"18/16/13", "-/16/13", "14/12/>=7", ">28/26/20", "16/13", "13/16/18"} {
		c, err := contamination.ParseCode(s)
		if err != nil {
			fmt.Println(err)
			continue
		}
		fmt.Printf("%-9s %-10v %d numbers\n", s, c.Form, c.Len())
	}
	// Output:
	// 18/16/13  counter    3 numbers
	// -/16/13   counter    3 numbers
	// 14/12/>=7 counter    3 numbers
	// >28/26/20 counter    3 numbers
	// 16/13     microscope 2 numbers
	// contamination.ParseCode: parsing "13/16/18" at offset 3: cumulative counts grow with particle size: the number at ≥6 µm(c) is above the number at ≥4 µm(c)
}

func ExampleEfficiency() {
	for _, beta := range []float64{2, 75, 200, 1000} {
		e, _ := contamination.Efficiency(beta)
		fmt.Printf("β %4g → %.2f %%\n", beta, e)
	}
	// Output:
	// β    2 → 50.00 %
	// β   75 → 98.67 %
	// β  200 → 99.50 %
	// β 1000 → 99.90 %
}

// A forestry crane's pressure filter (demo data): data sheet 0.25 bar at
// 60 L/min and 30 mm²/s; bypass 3.5 bar; cold start at 900 mm²/s.
func ExampleCheckBypass() {
	at := contamination.ElementPoint{Drop: 0.25 * units.Bar, Flow: 60 * units.LitrePerMinute, Viscosity: 30 * units.Centistokes}
	us := units.USCustomary()
	for _, nu := range []units.KinematicViscosity{46 * units.Centistokes, 900 * units.Centistokes} {
		r, _ := contamination.CheckBypass(at, 80*units.LitrePerMinute, nu, 3.5*units.Bar)
		fmt.Printf("%v: clean drop %v, %.0f %% of bypass, stays shut %v\n", nu, r.Setting.Value, 100*r.Setting.Ratio(), r.Setting.OK())
		for _, f := range r.Findings.Hazard(components.FilterBypass).AtLeast(components.Caution) {
			fmt.Println(" ", f.Text(us))
		}
	}
	// Output:
	// 46 mm²/s: clean drop 0.5111 bar, 15 % of bypass, stays shut true
	//   Fit a clogging indicator, visual or electrical, set below the bypass setting, and change the element when it trips: an element in bypass passes unfiltered fluid.
	// 900 mm²/s: clean drop 10 bar, 286 % of bypass, stays shut false
	//   The clean element's drop of 145 psi at 21.13 gpm and 900 cSt is above the 50.76 psi bypass setting: fluid passes unfiltered; choose a larger element or a lower flow, or warm the fluid before load.
	//   Fit a clogging indicator, visual or electrical, set below the bypass setting, and change the element when it trips: an element in bypass passes unfiltered fluid.
}

func ExamplePlacementAdvice() {
	a, _ := contamination.PlacementAdvice(contamination.SuctionStrainer)
	fmt.Println(a.Name+":", a.Element, "("+a.Rule.String()+")")
	for _, f := range a.Findings.AtLeast(components.Caution) {
		fmt.Println(f)
	}
	// Output:
	// suction strainer: coarse, about 100–250 µm (mesh) (common practice: filter placement and element fineness)
	// caution (cavitation): Any element on the pump inlet adds pressure drop there and risks cavitation, worst with cold, thick oil and as it clogs: keep it coarse and generously sized, or leave it out where the pump maker advises.
	// caution (filter bypass): Fit a clogging indicator, visual or electrical, set below the bypass setting, and change the element when it trips: an element in bypass passes unfiltered fluid.
}
