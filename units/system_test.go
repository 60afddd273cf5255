package units

import (
	"math"
	"reflect"
	"strings"
	"testing"
)

// checkSystem formats v with a System whose unit for the type is u (through
// reflection, so that one helper covers every type) and parses it back.
func checkSystem[T quantity](t *testing.T, parse func(string) (T, error), info *typeInfo, u *unitDef, v T) {
	t.Helper()
	s := USCustomary
	s.Name = "test"
	sv := reflect.ValueOf(&s)
	sv.Elem().FieldByName(info.name).SetString(u.sym)
	if err := s.Check(); err != nil {
		t.Errorf("System with %s = %q: %v", info.name, u.sym, err)
		return
	}
	out := sv.MethodByName("Format" + info.name).Call([]reflect.Value{reflect.ValueOf(v)})[0].String()
	appended := sv.MethodByName("Append" + info.name).Call([]reflect.Value{reflect.ValueOf([]byte("x")), reflect.ValueOf(v)})[0].Bytes()
	if string(appended) != "x"+out {
		t.Errorf("Append%s = %q, Format%s = %q", info.name, appended, info.name, out)
	}
	if !strings.HasSuffix(out, " "+u.sym) {
		t.Errorf("Format%s(%.17g) in %s = %q", info.name, float64(v), u.sym, out)
	}
	back, err := parse(out)
	if err != nil {
		t.Errorf("Format%s(%.17g) in %s = %q does not parse: %v", info.name, float64(v), u.sym, out, err)
		return
	}
	if a, b := fromSI(float64(v), u), fromSI(float64(back), u); !within4(a, b, float64(v), u) {
		t.Errorf("Format%s(%.17g) = %q reads back as %.17g %s", info.name, float64(v), out, b, u.sym)
	}
}

// TestSystemFormatAbsoluteZero: every temperature a System prints reads back.
func TestSystemFormatAbsoluteZero(t *testing.T) {
	for _, s := range []System{Metric, USCustomary} {
		for _, v := range []Temperature{0, 1e-9, 0.01} {
			out := s.FormatTemperature(v)
			back, err := ParseTemperature(out)
			if err != nil {
				t.Errorf("%s.FormatTemperature(%g K) = %q: %v", s.Name, float64(v), out, err)
				continue
			}
			if math.Abs(float64(back-v)) > 0.06 { // half a unit in the 4th digit of 459.7 °F, in K
				t.Errorf("%s.FormatTemperature(%g K) = %q reads back as %g K", s.Name, float64(v), out, float64(back))
			}
		}
	}
}

// TestSystemFormatReadsBack: a System whose unit for a type is u formats a
// value in u (Format and Append agree) and the typed parser reads it back
// within 4 significant digits, for every unit of every type.
func TestSystemFormatReadsBack(t *testing.T) {
	eachUnitValue(t, func(t *testing.T, c typedCase, info *typeInfo, u *unitDef, _, v float64) { c.system(t, info, u, v) })
}
