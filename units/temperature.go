package units

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
