package units

import "math"

// TemperatureFromCelsius returns the temperature c degrees Celsius:
// T = c + 273.15 K (exact by definition, SI Brochure 9th ed., 2.3.1).
func TemperatureFromCelsius(c float64) Temperature {
	return Temperature(c + celsiusZeroK)
}

// TemperatureFromFahrenheit returns the temperature f degrees Fahrenheit:
// T = (f − 32)·5/9 + 273.15 K (exact by definition, NIST SP 811, B.9).
func TemperatureFromFahrenheit(f float64) Temperature {
	return Temperature(float64((f-32)*fahrenheitK) + celsiusZeroK)
}

// Celsius returns t in degrees Celsius: t/K − 273.15.
func (t Temperature) Celsius() float64 { return float64(t) - celsiusZeroK }

// Fahrenheit returns t in degrees Fahrenheit: (t/K − 273.15)·9/5 + 32.
func (t Temperature) Fahrenheit() float64 { return (float64(t)-celsiusZeroK)*1.8 + 32 }

// Sub returns the interval t − u.
func (t Temperature) Sub(u Temperature) TemperatureDifference {
	return TemperatureDifference(t - u)
}

// Add returns the temperature d above t (below it when d is negative).
func (t Temperature) Add(d TemperatureDifference) Temperature {
	return t + Temperature(d)
}

// tempScale is a temperature scale as its reading of t °C:
// reading = (a·t + b)/d with small integers a, b and d, exact by definition
// (NIST SP 811, B.9): °C 1, 0, 1; °F 9, 160, 5 (1.8·t + 32);
// K 100, 27315, 100 (t + 273.15); °R 180, 49167, 100 (1.8·t + 491.67).
type tempScale struct{ a, b, d float64 }

// scaleOf returns the scale of the lone temperature spelling r.
func scaleOf(r resolved) tempScale {
	switch {
	case r.offset == celsiusZeroK:
		return tempScale{1, 0, 1}
	case r.offset == fahrenheitZeroK:
		return tempScale{9, 160, 5}
	case r.factor == fahrenheitK:
		return tempScale{180, 49167, 100}
	}
	return tempScale{100, 27315, 100} // K
}

// convertScale converts reading x from one temperature scale to another in
// one step, x′ = (p·x + q)/r with integers p, q and r, carrying the rounding
// error of p·x + q (math.FMA and Knuth's two-sum) into the division, so that
// 20 °C is 68 °F exactly: going through kelvins (x·f + o, then (v − o′)/f′)
// gives 67.99999999999993.
func convertScale(x float64, from, to tempScale) float64 {
	p := to.a * from.d
	q := from.a*to.b - to.a*from.b
	r := from.a * to.d
	hi := p * x
	if math.IsInf(hi, 0) {
		return x*(p/r) + q/r
	}
	lo := math.FMA(p, x, -hi)
	s := hi + q
	bb := s - hi
	lo += (hi - (s - bb)) + (q - bb)
	quo := s / r
	rem := math.FMA(-quo, r, s)
	return quo + (rem+lo)/r
}
