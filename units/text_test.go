package units

import (
	"encoding/json"
	"errors"
	"math"
	"math/rand/v2"
	"strconv"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
)

// fuzzUnmarshal fuzzes UnmarshalText of one type: it must agree with the
// typed parser, and what it accepts must marshal back to the same bits.
func fuzzUnmarshal(f *testing.F, name string) {
	c, info := caseByName(name)
	for _, s := range seedsFor(info) {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, text []byte) {
		v, err := c.unmarshal(text)
		pv, perr := c.parse(string(text))
		if (err == nil) != (perr == nil) || (err == nil && math.Float64bits(v) != math.Float64bits(pv)) {
			t.Fatalf("%s.UnmarshalText(%q) = %g, %v; Parse%s gives %g, %v", name, text, v, err, name, pv, perr)
		}
		if err != nil {
			return // the parse error was checked by the typed target's properties
		}
		checkTypedValue(t, c, info, string(text), v)
	})
}

func FuzzUnmarshalTextPressure(f *testing.F) { fuzzUnmarshal(f, "Pressure") }

func FuzzUnmarshalTextAbsolutePressure(f *testing.F) { fuzzUnmarshal(f, "AbsolutePressure") }

func FuzzUnmarshalTextFlow(f *testing.F) { fuzzUnmarshal(f, "Flow") }

func FuzzUnmarshalTextTemperature(f *testing.F) { fuzzUnmarshal(f, "Temperature") }

func FuzzUnmarshalTextKinematicViscosity(f *testing.F) {
	fuzzUnmarshal(f, "KinematicViscosity")
}

// box is a struct holding one quantity, for the JSON round trip.
type box[T any] struct {
	V T `json:"v"`
}

// marshalFallbackBroken detects a past defect of marshalText: its SI
// fallback appended the SI number to the buffer that still held the last
// trial digits, so Area(1e-7) (0.1 mm²) marshalled to
// "9.9999999999999980e-041e-07 m²". FuzzParseFlow found it (1091 m³/h).
var marshalFallbackBroken = func() bool {
	b, err := Area(1e-7).MarshalText()
	if err != nil {
		return true
	}
	var back Area
	return back.UnmarshalText(b) != nil || back != Area(1e-7)
}()

// needsSIFallback reports whether MarshalText cannot write v in the metric
// unit u and must fall back to the SI unit: no decimal of 1–17 significant
// digits of v in u reads back, through the parser's arithmetic, to v.
func needsSIFallback(v float64, u *unitDef, info *typeInfo) bool {
	x := fromSI(v, u)
	if math.IsInf(x, 0) {
		return true
	}
	for prec := 1; prec <= 17; prec++ {
		y, err := strconv.ParseFloat(strconv.FormatFloat(x, 'g', prec, 64), 64)
		back := float64(y * u.factor)
		if info.useOffset {
			back += u.offset
		}
		if err == nil && back == v {
			return false
		}
	}
	return true
}

// TestMarshalTextSIFallback checks values that MarshalText must write in the
// SI unit because no decimal in the metric unit reads back exactly.
func TestMarshalTextSIFallback(t *testing.T) {
	if marshalFallbackBroken {
		text, _ := Area(1e-7).MarshalText()
		t.Fatalf("regression: the SI fallback of marshalText appends to the last trial digits (Area(1e-7).MarshalText() = %q)", text)
	}
	for _, v := range []float64{1e-7, 9.9999999999999995e-08, 4.702378306500765e-14, 0.0002150533333333333} {
		if !needsSIFallback(v, metricUnit(&typeArea), &typeArea) {
			t.Errorf("Area(%g) does not exercise the SI fallback", v)
		}
		checkMarshal[Area](t, Area(v))
		checkJSON(t, Area(v))
	}
}

// checkMarshal: MarshalText, then UnmarshalText, restores the bits.
func checkMarshal[T quantity, P textQuantity[T]](t *testing.T, v T) {
	t.Helper()
	text, err := v.MarshalText()
	if err != nil {
		t.Errorf("%T(%g).MarshalText: %v", v, float64(v), err)
		return
	}
	var back T
	if err := P(&back).UnmarshalText(text); err != nil {
		t.Errorf("%T(%g): UnmarshalText(%q): %v", v, float64(v), text, err)
		return
	}
	if math.Float64bits(float64(back)) != math.Float64bits(float64(v)) {
		t.Errorf("%T(%.17g) → %q → %.17g: bits differ", v, float64(v), text, float64(back))
	}
}

// checkJSON: a struct field marshals as a JSON string and reads back.
func checkJSON[T quantity](t *testing.T, v T) {
	t.Helper()
	b, err := json.Marshal(box[T]{v})
	if err != nil {
		t.Errorf("json.Marshal(%T(%g)): %v", v, float64(v), err)
		return
	}
	if !strings.HasPrefix(string(b), `{"v":"`) {
		t.Errorf("json.Marshal(%T(%g)) = %s, want the value as a JSON string", v, float64(v), b)
	}
	var back box[T]
	if err := json.Unmarshal(b, &back); err != nil {
		t.Errorf("json.Unmarshal(%s): %v", b, err)
		return
	}
	if math.Float64bits(float64(back.V)) != math.Float64bits(float64(v)) {
		t.Errorf("%T(%.17g) → %s → %.17g: bits differ", v, float64(v), b, float64(back.V))
	}
}

// TestTemperatureNegativeZeroText: −0 K is a valid Temperature (not below
// absolute zero), so its text form should restore the sign bit too.
func TestTemperatureNegativeZeroText(t *testing.T) {
	negZero := Temperature(math.Copysign(0, -1))
	text, _ := negZero.MarshalText()
	var back Temperature
	if err := back.UnmarshalText(text); err == nil && !math.Signbit(float64(back)) {
		t.Fatalf("regression: Temperature(-0).MarshalText() = %q reads back as +0 K", text)
	}
	checkMarshal[Temperature](t, negZero)
}

// TestTextRoundTrip: for every unit of every type and a spread of values,
// and for the extremes and signed zero, MarshalText → UnmarshalText and a
// JSON struct field restore the identical float64.
func TestTextRoundTrip(t *testing.T) {
	eachUnitValue(t, func(t *testing.T, c typedCase, _ *typeInfo, _ *unitDef, _, v float64) { c.text(t, v) })
	for i, c := range typedCases {
		info := allTypes[i]
		for _, v := range []float64{math.MaxFloat64, -math.MaxFloat64, math.SmallestNonzeroFloat64, -math.SmallestNonzeroFloat64, 0, math.Copysign(0, -1)} {
			if info.hasMin && v < info.min {
				continue
			}
			c.text(t, v)
		}
	}
}

// TestMarshalTextRefusesWhatUnmarshalRefuses: MarshalText of a value that
// UnmarshalText would refuse (NaN, ±Inf, a temperature below 0 K, a negative
// absolute pressure) is a *RangeError, so json.Marshal fails instead of
// writing a document that cannot be read back.
func TestMarshalTextRefusesWhatUnmarshalRefuses(t *testing.T) {
	for i, c := range typedCases {
		info := allTypes[i]
		bad := []float64{math.NaN(), math.Inf(1), math.Inf(-1)}
		if info.hasMin {
			bad = append(bad, -math.SmallestNonzeroFloat64, -1, -1e300, -math.MaxFloat64)
		}
		for _, v := range bad {
			text, err := c.marshal(v)
			checktest.RangeErrorIn(t, err, "units."+c.name+".MarshalText", "q")
			if text != nil {
				t.Errorf("%s(%g).MarshalText() = %q beside its error, want nil", c.name, v, text)
			}
		}
	}
	if b, err := json.Marshal(box[Temperature]{Temperature(-1)}); err == nil || !errors.Is(err, ErrRange) {
		t.Errorf("json.Marshal of -1 K = %s, %v; want an error matching ErrRange", b, err)
	}
	if b, err := json.Marshal(box[AbsolutePressure]{AbsolutePressure(-5)}); err == nil || !errors.Is(err, ErrRange) {
		t.Errorf("json.Marshal of -5 Pa absolute = %s, %v; want an error matching ErrRange", b, err)
	}
}

// TestMarshalTextAgreesWithUnmarshalText: for every type and values of every
// kind (random bit patterns included), MarshalText succeeds exactly when its
// text reads back, and then to the same bits.
func TestMarshalTextAgreesWithUnmarshalText(t *testing.T) {
	r := rand.New(rand.NewPCG(3, 4))
	values := []float64{0, math.Copysign(0, -1), 1, -1, math.MaxFloat64, -math.MaxFloat64, 5e-324, -5e-324, math.NaN(), math.Inf(1)}
	for range 2000 {
		values = append(values, math.Float64frombits(r.Uint64()))
	}
	for _, c := range typedCases {
		for _, v := range values {
			text, err := c.marshal(v)
			if err != nil {
				if _, uerr := c.unmarshal([]byte(strconv.FormatFloat(v, 'g', -1, 64) + " " + siUnit(typeByName(c.name)).sym)); uerr == nil {
					t.Errorf("%s(%g).MarshalText: %v, but its SI text reads back", c.name, v, err)
				}
				continue
			}
			back, err := c.unmarshal(text)
			if err != nil || math.Float64bits(back) != math.Float64bits(v) {
				t.Errorf("%s(%.17g) → %q → %.17g, %v", c.name, v, text, back, err)
			}
		}
	}
}
