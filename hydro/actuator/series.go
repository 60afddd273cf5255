package actuator

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// The standard series sizing falls back on when the caller gives none.
// Until package components carries ISO 3320, these are stand-ins with the
// same values; they are reached only through the two functions below.

var (
	stdBores = mustSeries("ISO 3320 cylinder bores", []units.Length{8, 10, 12, 16, 20, 25, 32, 40, 50, 63,
		80, 90, 100, 110, 125, 140, 160, 180, 200, 220, 250, 280, 320, 360, 400, 450, 500},
		[]units.Length{90, 110, 140, 180, 220, 280, 360, 450})
	stdRods = mustSeries("ISO 3320 piston rods", []units.Length{4, 5, 6, 8, 10, 12, 14, 16, 18, 20,
		22, 25, 28, 32, 36, 40, 45, 50, 56, 63, 70, 80, 90, 100, 110, 125, 140, 160, 180, 200,
		220, 250, 280, 320, 360}, nil)
)

func mustSeries(name string, mm, second []units.Length) components.Series[units.Length] {
	for i := range mm {
		mm[i] *= units.Millimetre
	}
	for i := range second {
		second[i] *= units.Millimetre
	}
	s, err := components.NewSeries(name, components.StandardRule("ISO 3320:2013, clause 5"), mm, second)
	if err != nil {
		panic(err) // a fixed table: a programming error, never caller input
	}
	return s
}

// boresOr returns s, or the ISO 3320 bores when s is empty.
func boresOr(s components.Series[units.Length]) components.Series[units.Length] {
	if s.Len() > 0 {
		return s
	}
	return stdBores
}

// rodsOr returns s, or the ISO 3320 rods when s is empty.
func rodsOr(s components.Series[units.Length]) components.Series[units.Length] {
	if s.Len() > 0 {
		return s
	}
	return stdRods
}
