package units

import "strconv"

// Base is one base dimension of a [Dimension] vector.
type Base int

// The base dimensions. The first seven are the SI base quantities; Angle is
// kept as an eighth base so that revolution-based quantities (displacement per
// revolution, rotational speed) are not confused with volume or frequency.
const (
	BaseLength      Base = iota // metre, m
	BaseMass                    // kilogram, kg
	BaseTime                    // second, s
	BaseCurrent                 // ampere, A
	BaseTemperature             // kelvin, K
	BaseAmount                  // mole, mol
	BaseLuminous                // candela, cd
	BaseAngle                   // revolution, rev (1 rev = 2π rad)
	numBases
)

var baseSymbols = [numBases]string{"m", "kg", "s", "A", "K", "mol", "cd", "rev"}

// Dimension is a vector of integer exponents of the base dimensions, in the
// order of the Base constants. The zero value is dimensionless. Dimensions are
// comparable with ==.
type Dimension struct {
	e [numBases]int8
}

// Exponent returns the exponent of base b in d (0 for an unknown b).
func (d Dimension) Exponent(b Base) int {
	if b < 0 || b >= numBases {
		return 0
	}
	return int(d.e[b])
}

// dim builds a Dimension from exponents of length, mass, time, temperature
// and angle (the only bases hydraulic quantities use).
func dim(l, m, t, k, a int8) Dimension {
	var d Dimension
	d.e[BaseLength], d.e[BaseMass], d.e[BaseTime] = l, m, t
	d.e[BaseTemperature], d.e[BaseAngle] = k, a
	return d
}

// IsDimensionless reports whether every exponent of d is zero.
func (d Dimension) IsDimensionless() bool { return d == Dimension{} }

// String writes d in base SI symbols with integer powers, for example
// "kg·m^-1·s^-2" for pressure, or "1" when dimensionless.
func (d Dimension) String() string {
	if d.IsDimensionless() {
		return "1"
	}
	// Print mass first, as SI derived units are usually written.
	order := [...]Base{BaseMass, BaseLength, BaseTime, BaseCurrent, BaseTemperature, BaseAmount, BaseLuminous, BaseAngle}
	var b []byte
	for _, base := range order {
		n := d.e[base]
		if n == 0 {
			continue
		}
		if len(b) > 0 {
			b = append(b, "·"...)
		}
		b = append(b, baseSymbols[base]...)
		if n != 1 {
			b = append(b, '^')
			b = strconv.AppendInt(b, int64(n), 10)
		}
	}
	return string(b)
}
