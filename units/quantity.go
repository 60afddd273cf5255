package units

import (
	"math"
	"strconv"

	"github.com/hydrosize/hydrosize/internal/validate"
)

// Quantity is a value with a run-time dimension, for units that arrive as
// text: forms, files, sensor tags. Parse reads one; the typed methods
// (q.Pressure(), q.Flow(), …) convert it to a typed value when the dimension
// matches. Use typed values everywhere else: they cost nothing at run time.
//
// The zero Quantity is a dimensionless zero.
type Quantity struct {
	value   float64   // SI value, offset applied for a temperature point
	offset  float64   // the offset applied (temperature points only)
	reading float64   // a temperature point's number on its own scale
	scale   uint8     // and that scale, an index in tempScales
	dim     Dimension // SI dimension
	ref     reference // gauge, absolute or temperature point of a lone spelling
}

// Parse reads a number followed by a unit expression, such as "1.3 gal/min",
// "750 in^3/rev", "12 kW/(m²·K)" or "55 barg", by the grammar in the package
// documentation (under Parsing), where every spelling is listed. A lone
// registered spelling keeps its meaning: °C and °F are points on their
// scales, psia and bara absolute, psi and bar gauge; inside a longer
// expression, temperature units count as intervals (BTU/(lbm·°F)).
func Parse(s string) (Quantity, error) {
	const fn = "units.Parse"
	in := trimRight(s)
	if num, n, ok := fastNumber(in); ok && !continues(in, n) {
		at := n
		for at < len(in) && in[at] == ' ' {
			at++
		}
		if i, found := fastSpellings.get(in[at:]); found {
			u := &unitTable[i]
			if v := float64(num * u.factor); v-v == 0 && u.ref != refPoint && (num >= 0 || (u.factor > 0 && u.ref&refAbsolute == 0)) {
				return Quantity{value: v, dim: u.dim, ref: u.ref}, nil // quantityOf, built in place
			}
			if q, ok := registeredQuantity(num, u); ok {
				return q, nil
			}
		} else if at < len(in) {
			// The general path would read the same number and miss the
			// same look-up: go on from there.
			r, f := resolveInexact(in[at:])
			if f != nil {
				return finishQuantity(fn, s, in, num, at, r, *f)
			}
			return finishQuantity(fn, s, in, num, at, r, failure{})
		}
	}
	return parseQuantity(fn, s, numberStyle{})
}

// registeredQuantity is Parse's fast path: num of the registered unit u,
// with the general path's arithmetic. It reports false for everything the
// general path must look at (a value that is not finite, a point below
// absolute zero, an absolute pressure below vacuum, a negative vacuum
// reading) and leaves it to that path.
func registeredQuantity(num float64, u *unitDef) (Quantity, bool) {
	if num < 0 && (u.factor < 0 || u.ref&(refPoint|refAbsolute) != 0) {
		return Quantity{}, false
	}
	q := quantityOf(num, resolvedOf(u))
	return q, q.value-q.value == 0
}

// parseQuantity is Parse for the function fn, reading numbers in style st.
func parseQuantity(fn, s string, st numberStyle) (Quantity, error) {
	in := trimRight(s)
	num, at, f := splitNumber(in, st)
	if f.err != nil {
		return Quantity{}, f.at(fn, s, 0)
	}
	if at == len(in) {
		return Quantity{}, &ParseError{Func: fn, Input: s, Pos: at, Err: ErrSyntax, Detail: "missing unit"}
	}
	r, f := resolveUnit(in[at:])
	return finishQuantity(fn, s, in, num, at, r, f)
}

// finishQuantity makes the Quantity of num in the resolved unit r of
// in[at:] (or reports the failure f), checking the sign of a vacuum
// reading and the bounds of temperatures and absolute pressures.
func finishQuantity(fn, s, in string, num float64, at int, r resolved, f failure) (Quantity, error) {
	if f.err == nil && num < 0 && r.factor < 0 {
		f = negativeVacuum()
	}
	if f.err == ErrUnknownUnit && f.word == in[at:] {
		f.detail += contextHint(f.word)
	}
	if f.err != nil {
		return Quantity{}, f.at(fn, s, at)
	}
	if v := float64(num * r.factor); v-v == 0 && r.ref != refPoint && (v >= 0 || r.ref&refAbsolute == 0) {
		return Quantity{value: v, dim: r.dim, ref: r.ref}, nil // quantityOf, built in place
	}
	q := quantityOf(num, r)
	if math.IsInf(q.value, 0) || math.IsNaN(q.value) {
		return Quantity{}, &ParseError{Func: fn, Input: s, Pos: 0, Err: ErrRange, Detail: "value is not finite"}
	}
	if t := belowZero(q.value, r.ref); t != nil {
		return Quantity{}, &ParseError{Func: fn, Input: s, Pos: at, Err: ErrRange, Detail: "want " + t.kind + " " + t.minText}
	}
	return q, nil
}

// belowZero returns the type whose lower bound the SI value v breaks when v
// is a temperature point below absolute zero or an absolute pressure below
// vacuum, and nil otherwise. Gauge pressures and differences may be negative.
func belowZero(v float64, ref reference) *typeInfo {
	switch {
	case v >= 0:
		return nil
	case ref&refPoint != 0:
		return &typeTemperature
	case ref&refAbsolute != 0:
		return &typeAbsolutePressure
	}
	return nil
}

// Value returns q's value in coherent SI units (the unit of its dimension
// built from m, kg, s, K and rev). A temperature point is in kelvins.
func (q Quantity) Value() float64 { return q.value }

// Dimension returns q's dimension.
func (q Quantity) Dimension() Dimension { return q.dim }

// String formats q as its SI value and dimension, such as "689475.7 kg·m^-1·s^-2".
func (q Quantity) String() string {
	b := strconv.AppendFloat(nil, q.value, 'g', 7, 64)
	if !q.dim.IsDimensionless() {
		b = append(b, ' ')
		b = append(b, q.dim.String()...)
	}
	return string(b)
}

// In returns q as a number of the unit expression unit, such as "gpm" or
// "kW/(m²·K)". Temperature points convert between scales with their offsets;
// a temperature point converts to a difference spelling (ΔK) as the interval
// above its scale's zero, but a difference does not convert to a point
// spelling (°C, K): that is ErrReference. A result that would be a
// temperature below absolute zero or an absolute pressure below vacuum is
// ErrRange.
func (q Quantity) In(unit string) (float64, error) {
	const fn = "units.Quantity.In"
	v, bound, err := q.in(fn, unit)
	if bound != nil {
		return 0, &RangeError{Func: fn, Param: "q", Value: q.String(), Valid: bound.valid()}
	}
	return v, err
}

// in converts q to unit for In and Convert (fn). When q is a temperature
// below absolute zero or an absolute pressure below vacuum, or would be read
// as one in unit, it returns the type whose bound is broken, for the caller's
// RangeError.
func (q Quantity) in(fn, unit string) (float64, *typeInfo, error) {
	r, f := resolveUnit(trimRight(unit))
	if f.err != nil {
		return 0, nil, &ParseError{Func: fn, Input: unit, Pos: f.pos, Err: f.err, Detail: f.detail}
	}
	if r.dim != q.dim {
		return 0, nil, &ConversionError{Func: fn, From: q.dim.String(), To: unit + " (" + r.dim.String() + ")", Err: ErrDimension}
	}
	switch {
	case (q.ref|r.ref)&refAbsolute != 0 && (q.ref|r.ref)&(refGauge|refDiff) != 0:
		return 0, nil, &ConversionError{Func: fn, From: refName(q.ref), To: refName(r.ref) + " " + unit, Err: ErrReference}
	case q.ref == refNone && r.ref == refPoint:
		return 0, nil, &ConversionError{Func: fn, From: "temperature difference", To: "temperature " + unit, Err: ErrReference}
	}
	if t := belowZero(q.value, q.ref|r.ref); t != nil {
		return 0, t, nil
	}
	v := q.value
	if q.ref == refPoint && r.ref == refPoint {
		v = convertScale(q.reading, tempScales[q.scale], scaleOf(r))
	} else {
		v = (v - q.offset) / r.factor
	}
	if math.IsInf(v, 0) || math.IsNaN(v) {
		return 0, nil, &ConversionError{Func: fn, From: q.String(), To: unit, Err: ErrRange}
	}
	return v, nil, nil
}

// Convert converts value from one unit expression to another, such as
// Convert(1, "gpm", "L/min") or Convert(20, "°C", "°F"). Lone temperature
// spellings are points on their scales (with offsets), converted from scale
// to scale in one correctly rounded step (20 °C is 68 °F exactly); a
// difference (ΔK, Δ°F) converts to another difference, not to a point
// (ErrReference). Gauge and absolute pressure spellings do not mix
// (ErrReference): cross with an explicit ambient. A temperature below
// absolute zero or an absolute pressure below vacuum, given or asked for, is
// ErrRange.
func Convert(value float64, from, to string) (float64, error) {
	if i, ok := fastSpellings.get(from); ok {
		if j, ok := fastSpellings.get(to); ok {
			if v, ok := convertRegistered(value, &unitTable[i], &unitTable[j]); ok {
				return v, nil
			}
		}
	}
	return convertSlow(value, from, to)
}

// convertRegistered is Convert's fast path, for two registered spellings
// whose conversion is a multiply and a divide, value·u.factor/w.factor, or
// a temperature scale to another, with the general path's arithmetic. It
// reports false for everything the general path must look at (a point and a
// difference, a temperature below absolute zero, a reference that does not
// cross, a value that is not finite or breaks a bound, a vacuum reading
// below zero) and leaves it to that path.
func convertRegistered(value float64, u, w *unitDef) (float64, bool) {
	refs := u.ref | w.ref
	if u.ref == refPoint && w.ref == refPoint && value-value == 0 && float64(value*u.factor)+u.offset >= 0 {
		// Temperature scale to scale, as Quantity.in does it.
		v := convertScale(value, scaleOf(resolvedOf(u)), scaleOf(resolvedOf(w)))
		return v, v-v == 0
	}
	if u.dim != w.dim || refs&refPoint != 0 || value-value != 0 ||
		(value < 0 && (u.factor < 0 || refs&refAbsolute != 0)) ||
		(refs&refAbsolute != 0 && refs&(refGauge|refDiff) != 0) {
		return 0, false
	}
	v := float64(value*u.factor) / w.factor
	return v, v-v == 0
}

// convertSlow is the general path of Convert, with full error reports.
func convertSlow(value float64, from, to string) (float64, error) {
	const fn = "units.Convert"
	if err := validate.Finite(fn, "value", value); err != nil {
		return 0, err
	}
	r, f := resolveUnit(trimRight(from))
	if f.err != nil {
		return 0, &ParseError{Func: fn, Input: from, Pos: f.pos, Err: f.err, Detail: f.detail}
	}
	if value < 0 && r.factor < 0 {
		return 0, &RangeError{Func: fn, Param: "value", Value: strconv.FormatFloat(value, 'g', -1, 64) + " " + from,
			Valid: "≥ 0: a vacuum reading is a depth below ambient"}
	}
	v, bound, err := quantityOf(value, r).in(fn, to)
	if bound != nil {
		return 0, &RangeError{Func: fn, Param: "value", Value: strconv.FormatFloat(value, 'g', -1, 64) + " " + from, Valid: bound.valid()}
	}
	return v, err
}

// quantityOf returns x of the resolved unit r. A temperature point also
// keeps its reading and scale, so that conversions between scales do not
// round through kelvins.
func quantityOf(x float64, r resolved) Quantity {
	q := Quantity{value: float64(x * r.factor), dim: r.dim, ref: r.ref}
	if r.ref == refPoint {
		q.value += r.offset
		q.offset = r.offset
		q.reading, q.scale = x, scaleIndex(scaleOf(r))
	}
	return q
}

func refName(r reference) string {
	switch r {
	case refGauge:
		return "gauge pressure"
	case refAbsolute:
		return "absolute pressure"
	case refPoint:
		return "temperature"
	case refDiff:
		return "differential pressure"
	}
	return "difference"
}

// as converts q to the SI value of type t, for the method Quantity.<t.name>.
func (q Quantity) as(t *typeInfo) (float64, error) {
	fn := "units.Quantity." + t.name
	if q.dim != t.dim {
		return 0, &ConversionError{Func: fn, From: q.dim.String() + " (" + dimName(q.dim) + ")", To: t.name + " (" + t.dim.String() + ")", Err: ErrDimension}
	}
	if q.ref&t.accept == 0 {
		return 0, &ConversionError{Func: fn, From: refName(q.ref), To: t.name, Err: ErrReference}
	}
	v := q.value
	if !t.useOffset {
		v -= q.offset
	}
	v, f := checkValue(v, t)
	if f.err != nil {
		return 0, &RangeError{Func: fn, Param: "q", Value: q.String(), Valid: t.valid()}
	}
	return v, nil
}

// tempScales lists the temperature scales a Quantity's scale index names
// (K, °C, °F, °R; see tempScale), so that a Quantity carries one byte for
// its scale rather than three numbers. Built at start-up, never changed.
var tempScales = [...]tempScale{{100, 27315, 100}, {1, 0, 1}, {9, 160, 5}, {180, 49167, 100}}

func scaleIndex(t tempScale) uint8 {
	for i, u := range tempScales {
		if u == t {
			return uint8(i)
		}
	}
	return 0 // unreachable: scaleOf returns one of tempScales
}
