package components

import "github.com/hydrosize/hydrosize/units"

const (
	mm   = units.Millimetre
	inch = units.Inch
)

var (
	iso3320Bores = fixed("ISO 3320 cylinder bores", StandardRule("ISO 3320:2013, clause 5"),
		[]units.Length{8 * mm, 10 * mm, 12 * mm, 16 * mm, 20 * mm, 25 * mm, 32 * mm, 40 * mm, 50 * mm, 63 * mm,
			80 * mm, 90 * mm, 100 * mm, 110 * mm, 125 * mm, 140 * mm, 160 * mm, 180 * mm, 200 * mm, 220 * mm,
			250 * mm, 280 * mm, 320 * mm, 360 * mm, 400 * mm, 450 * mm, 500 * mm},
		[]units.Length{90 * mm, 110 * mm, 140 * mm, 180 * mm, 220 * mm, 280 * mm, 360 * mm, 450 * mm})

	iso3320Rods = fixed("ISO 3320 piston rods", StandardRule("ISO 3320:2013, clause 5"),
		[]units.Length{4 * mm, 5 * mm, 6 * mm, 8 * mm, 10 * mm, 12 * mm, 14 * mm, 16 * mm, 18 * mm, 20 * mm,
			22 * mm, 25 * mm, 28 * mm, 32 * mm, 36 * mm, 40 * mm, 45 * mm, 50 * mm, 56 * mm, 63 * mm,
			70 * mm, 80 * mm, 90 * mm, 100 * mm, 110 * mm, 125 * mm, 140 * mm, 160 * mm, 180 * mm, 200 * mm,
			220 * mm, 250 * mm, 280 * mm, 320 * mm, 360 * mm},
		nil)

	inchBores = fixed("inch cylinder bores (North American practice)",
		PracticeRule("North American tie-rod cylinder bores"),
		[]units.Length{1.5 * inch, 2 * inch, 2.5 * inch, 3.25 * inch, 4 * inch, 5 * inch, 6 * inch,
			7 * inch, 8 * inch, 10 * inch, 12 * inch, 14 * inch},
		nil)

	inchRods = fixed("inch piston rods (North American practice)",
		PracticeRule("North American tie-rod cylinder rods"),
		[]units.Length{0.625 * inch, 1 * inch, 1.375 * inch, 1.75 * inch, 2 * inch, 2.5 * inch, 3 * inch,
			3.5 * inch, 4 * inch, 4.5 * inch, 5 * inch, 5.5 * inch, 7 * inch, 8 * inch, 10 * inch},
		nil)

	iso4393Strokes = fixed("ISO 4393 cylinder strokes", StandardRule("ISO 4393, basic series of piston strokes"),
		[]units.Length{25 * mm, 50 * mm, 80 * mm, 100 * mm, 125 * mm, 160 * mm, 200 * mm, 250 * mm, 320 * mm,
			400 * mm, 500 * mm, 630 * mm, 800 * mm, 1000 * mm, 1250 * mm, 1600 * mm, 2000 * mm, 2500 * mm,
			3200 * mm, 4000 * mm},
		nil)
)

// ISO3320Bores returns the metric cylinder bores of ISO 3320:2013, clause 5,
// 8 mm to 500 mm: 8 10 12 16 20 25 32 40 50 63 80 (90) 100 (110) 125 (140)
// 160 (180) 200 (220) 250 (280) 320 (360) 400 (450) 500, the sizes in
// parentheses marked second choice ([Series.Preferred] reports false; use
// [Series.NextPreferred] or [Series.SelectPreferred] to skip them). The
// values are recalled from the standard (from memory): confirm against
// ISO 3320 before relying on a second-choice size.
//
// The same Series is returned on every call; a Series cannot be changed.
func ISO3320Bores() Series[units.Length] { return iso3320Bores }

// ISO3320Rods returns the metric piston-rod diameters of ISO 3320:2013,
// clause 5, 4 mm to 360 mm: 4 5 6 8 10 12 14 16 18 20 22 25 28 32 36 40 45
// 50 56 63 70 80 90 100 110 125 140 160 180 200 220 250 280 320 360, all
// preferred (the values are recalled from the standard, from memory).
func ISO3320Rods() Series[units.Length] { return iso3320Rods }

// InchBores returns the inch cylinder bores of North American practice (the
// tie-rod cylinders built to NFPA interchangeability): 1½ 2 2½ 3¼ 4 5 6 7 8
// 10 12 14 in. No single published table governs them: common practice
// (from memory).
func InchBores() Series[units.Length] { return inchBores }

// InchRods returns the inch piston-rod diameters of North American practice:
// ⅝ 1 1⅜ 1¾ 2 2½ 3 3½ 4 4½ 5 5½ 7 8 10 in. Common practice (from memory);
// which rods a maker offers with which bore varies.
func InchRods() Series[units.Length] { return inchRods }

// ISO4393Strokes returns the basic series of cylinder piston strokes of
// ISO 4393, 25 mm to 4000 mm: 25 50 80 100 125 160 200 250 320 400 500 630
// 800 1000 1250 1600 2000 2500 3200 4000 (recalled from the standard, from
// memory). Makers build any stroke to order; the series is where stock
// cylinders and quoting start.
func ISO4393Strokes() Series[units.Length] { return iso4393Strokes }
