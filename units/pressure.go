package units

// Absolute returns the absolute pressure of gauge pressure p where the
// ambient (barometric) pressure is ambient: p + ambient. There is no default
// ambient on purpose; pass StandardAtmosphere when no site value is known,
// and say so in the result. The result is not clamped: a gauge pressure below
// −ambient gives a negative value that no real fluid can reach; check it with
// AbsolutePressure.Valid where that matters.
func (p Pressure) Absolute(ambient AbsolutePressure) AbsolutePressure {
	return AbsolutePressure(p) + ambient
}

// Gauge returns the gauge pressure of absolute pressure a where the ambient
// pressure is ambient: a − ambient (negative below ambient: a vacuum).
func (a AbsolutePressure) Gauge(ambient AbsolutePressure) Pressure {
	return Pressure(a - ambient)
}

// Valid reports whether a is a physically meaningful absolute pressure:
// finite and not below absolute vacuum.
func (a AbsolutePressure) Valid() bool {
	return a >= 0 && a < AbsolutePressure(maxFloat)
}

const maxFloat = 1.79769313486231570814527423731704356798070e+308
