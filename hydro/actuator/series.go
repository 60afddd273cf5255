package actuator

import (
	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/units"
)

// boresOr returns s, or the ISO 3320 bores when s is empty.
func boresOr(s components.Series[units.Length]) components.Series[units.Length] {
	if s.Len() > 0 {
		return s
	}
	return components.ISO3320Bores()
}

// rodsOr returns s, or the ISO 3320 rods when s is empty.
func rodsOr(s components.Series[units.Length]) components.Series[units.Length] {
	if s.Len() > 0 {
		return s
	}
	return components.ISO3320Rods()
}
