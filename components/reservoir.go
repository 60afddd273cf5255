package components

import "github.com/hydrosize/hydrosize/units"

const (
	litre  = units.Litre
	gallon = units.USGallon
	micron = units.Micrometre
)

var (
	// R10 from 4 L to 4000 L; the R10 values that are not also R5 values
	// are second choice, as ISO 3 prefers the coarser series.
	reservoirVolumes = fixed("reservoir volumes (R10 litres)",
		PracticeRule("reservoir nominal volumes on the ISO 3 R10 preferred numbers"),
		[]units.Volume{4 * litre, 5 * litre, 6.3 * litre, 8 * litre, 10 * litre, 12.5 * litre, 16 * litre,
			20 * litre, 25 * litre, 31.5 * litre, 40 * litre, 50 * litre, 63 * litre, 80 * litre, 100 * litre,
			125 * litre, 160 * litre, 200 * litre, 250 * litre, 315 * litre, 400 * litre, 500 * litre,
			630 * litre, 800 * litre, 1000 * litre, 1250 * litre, 1600 * litre, 2000 * litre, 2500 * litre,
			3150 * litre, 4000 * litre},
		[]units.Volume{5 * litre, 8 * litre, 12.5 * litre, 20 * litre, 31.5 * litre, 50 * litre, 80 * litre,
			125 * litre, 200 * litre, 315 * litre, 500 * litre, 800 * litre, 1250 * litre, 2000 * litre,
			3150 * litre})

	reservoirVolumesUS = fixed("reservoir volumes (US gallons)",
		PracticeRule("US reservoir nominal volumes in gallons"),
		[]units.Volume{1 * gallon, 2 * gallon, 3 * gallon, 5 * gallon, 10 * gallon, 15 * gallon, 20 * gallon,
			30 * gallon, 40 * gallon, 50 * gallon, 60 * gallon, 80 * gallon, 100 * gallon, 120 * gallon,
			150 * gallon, 200 * gallon, 250 * gallon, 300 * gallon, 400 * gallon, 500 * gallon},
		nil)

	filterRatings = fixed("filter ratings (µm(c))",
		PracticeRule("filter ratings in µm(c) at a stated ISO 16889 beta ratio"),
		[]units.Length{3 * micron, 5 * micron, 7 * micron, 10 * micron, 12 * micron, 15 * micron,
			20 * micron, 25 * micron},
		nil)
)

// ReservoirVolumes returns nominal reservoir volumes in litres on the R10
// preferred numbers of ISO 3, 4 L to 4000 L: 4 (5) 6.3 (8) 10 (12.5) 16 (20)
// 25 (31.5) 40 (50) 63 (80) 100 (125) 160 (200) 250 (315) 400 (500) 630
// (800) 1000 (1250) 1600 (2000) 2500 (3150) 4000. The values are ISO 3's R10
// series; that tanks are built to it is common practice. The values in
// parentheses are marked second choice, being R10 but not R5 values (ISO 3
// prefers the coarser series): [Series.SelectPreferred] steps through
// 4, 6.3, 10, 16 … only.
func ReservoirVolumes() Series[units.Volume] { return reservoirVolumes }

// ReservoirVolumesUS returns nominal reservoir volumes in US gallons, 1 gal
// to 500 gal: 1 2 3 5 10 15 20 30 40 50 60 80 100 120 150 200 250 300 400 500
// (1 gal = 231 in³, [units.USGallon]). Common practice, with no single
// published table.
func ReservoirVolumesUS() Series[units.Volume] { return reservoirVolumesUS }

// FilterRatings returns the ratings in µm(c) that hydraulic pressure and
// return filters are commonly offered in: 3 5 7 10 12 15 20 25 µm(c). A
// rating x µm(c) means a stated beta ratio β_x(c) (200 or 1000, say) in the
// ISO 16889 multi-pass test with particle counters calibrated per ISO 11171.
// The list is common practice; suction strainers, rated in nominal µm or
// mesh (about 100–250 µm), are not in it. To stay no coarser than a
// required rating, use [Series.Floor].
func FilterRatings() Series[units.Length] { return filterRatings }
