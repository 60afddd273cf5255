package components

import (
	"slices"
	"strconv"

	"github.com/hydrosize/hydrosize/units"
)

// TubeClass is a series of metric hydraulic tube: the light (L) and heavy
// (S) series of the 24° cone connectors of ISO 8434-1, each with its own
// outside diameters.
type TubeClass uint8

// Tube classes.
const (
	LightTube TubeClass = iota // ISO 8434-1 L series: 6 8 10 12 15 18 22 28 35 42 mm OD
	HeavyTube                  // ISO 8434-1 S series: 6 8 10 12 14 16 20 25 30 38 mm OD
)

// String returns the ISO 8434-1 series letter, "L" or "S".
func (c TubeClass) String() string {
	switch c {
	case LightTube:
		return "L"
	case HeavyTube:
		return "S"
	}
	return "TubeClass(" + strconv.Itoa(int(c)) + ")"
}

// Tube is a metric hydraulic tube: outside diameter, wall thickness and the
// ISO 8434-1 series whose connectors fit it.
type Tube struct {
	OD, Wall units.Length
	Class    TubeClass
}

// ID returns the inside diameter OD − 2·Wall, plain float64 arithmetic.
func (t Tube) ID() units.Length { return t.OD - 2*t.Wall }

// String writes the tube as the trade orders it: "12 × 1.5 mm (L)".
func (t Tube) String() string {
	b := strconv.AppendFloat(nil, t.OD.Millimetres(), 'g', 4, 64)
	b = append(b, " × "...)
	b = strconv.AppendFloat(b, t.Wall.Millimetres(), 'g', 4, 64)
	return string(b) + " mm (" + t.Class.String() + ")"
}

var (
	lightTubes = []Tube{
		{6 * mm, 1 * mm, LightTube}, {8 * mm, 1 * mm, LightTube}, {10 * mm, 1.5 * mm, LightTube},
		{10 * mm, 1 * mm, LightTube}, {12 * mm, 1.5 * mm, LightTube}, {12 * mm, 1 * mm, LightTube},
		{15 * mm, 1.5 * mm, LightTube}, {18 * mm, 2 * mm, LightTube}, {18 * mm, 1.5 * mm, LightTube},
		{22 * mm, 2 * mm, LightTube}, {22 * mm, 1.5 * mm, LightTube}, {28 * mm, 2.5 * mm, LightTube},
		{28 * mm, 2 * mm, LightTube}, {35 * mm, 3 * mm, LightTube}, {35 * mm, 2.5 * mm, LightTube},
		{42 * mm, 3 * mm, LightTube},
	}
	heavyTubes = []Tube{
		{6 * mm, 1.5 * mm, HeavyTube}, {8 * mm, 2 * mm, HeavyTube}, {8 * mm, 1.5 * mm, HeavyTube},
		{10 * mm, 2 * mm, HeavyTube}, {10 * mm, 1.5 * mm, HeavyTube}, {12 * mm, 2 * mm, HeavyTube},
		{14 * mm, 2.5 * mm, HeavyTube}, {14 * mm, 2 * mm, HeavyTube}, {16 * mm, 3 * mm, HeavyTube},
		{16 * mm, 2.5 * mm, HeavyTube}, {20 * mm, 3 * mm, HeavyTube}, {20 * mm, 2.5 * mm, HeavyTube},
		{25 * mm, 4 * mm, HeavyTube}, {25 * mm, 3 * mm, HeavyTube}, {30 * mm, 5 * mm, HeavyTube},
		{30 * mm, 4 * mm, HeavyTube}, {38 * mm, 6 * mm, HeavyTube}, {38 * mm, 5 * mm, HeavyTube},
	}
)

// MetricTubes returns the metric tubes of a class as a fresh copy (the
// caller may change it), ascending by inside diameter and, for one inside
// diameter, by outside diameter. It returns nil for an unknown class.
//
// The outside diameters are the L and S series of ISO 8434-1 (24° cone
// connectors for tube of 4 mm to 42 mm outside diameter, ISO 8434-1:2018,
// clause 1; the series values recalled, from memory); its extra-light LL
// series (4 mm to 12 mm) is left out. ISO 8434-1 does not
// fix wall thicknesses: the one or two walls listed for each diameter are
// the common stock sizes of cold-drawn precision steel hydraulic tube
// (EN 10305-4 practice), common practice. Light-series walls run 1–3 mm,
// heavy-series 1.5–6 mm. A wall's pressure rating depends on the material
// and the design rule (see hydro/line); a tube is chosen here for its bore
// and its connector series only.
func MetricTubes(class TubeClass) []Tube {
	switch class {
	case LightTube:
		return slices.Clone(lightTubes)
	case HeavyTube:
		return slices.Clone(heavyTubes)
	}
	return nil
}
