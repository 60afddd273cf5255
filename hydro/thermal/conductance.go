package thermal

import (
	"strconv"

	"github.com/hydrosize/hydrosize/units"
)

// Conductance is a heat flow per kelvin of temperature difference, in W/K:
// the h·A of a reservoir's walls, or the specific duty an oil cooler is
// rated by (its heat flow per kelvin of entering temperature difference).
// Arithmetic on it is plain float64 arithmetic.
type Conductance float64

// Units of Conductance. BTUPerHourFahrenheit is exact by the definitions of
// the International Table BTU, the hour and the degree Fahrenheit (NIST SP
// 811): 1055.05585262 J / 3600 s / (5/9 K) = 0.52752792631 W/K.
const (
	WattPerKelvin        Conductance = 1
	KilowattPerKelvin    Conductance = 1000
	BTUPerHourFahrenheit Conductance = Conductance(float64(units.BTUPerHour) / float64(units.DeltaFahrenheit))
)

// WattsPerKelvin returns c in W/K.
func (c Conductance) WattsPerKelvin() float64 { return float64(c) }

// KilowattsPerKelvin returns c in kW/K.
func (c Conductance) KilowattsPerKelvin() float64 { return float64(c / KilowattPerKelvin) }

// BTUPerHourFahrenheit returns c in BTU/(h·°F).
func (c Conductance) BTUPerHourFahrenheit() float64 { return float64(c / BTUPerHourFahrenheit) }

// Times returns the heat flow across temperature difference d: P = c·ΔT.
func (c Conductance) Times(d units.TemperatureDifference) units.Power {
	return units.Power(float64(c) * float64(d))
}

// String writes c to four significant digits in W/K, or in kW/K from
// 1000 W/K: "35.2 W/K", "1.25 kW/K".
func (c Conductance) String() string {
	v, u := float64(c), " W/K"
	if v >= 1000 || v <= -1000 {
		v, u = v/1000, " kW/K"
	}
	return strconv.FormatFloat(v, 'g', 4, 64) + u
}
