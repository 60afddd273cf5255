package units

import (
	"errors"
	"math"
	"reflect"
	"strings"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
)

// checkSystem formats v with a System whose unit for the type is u (through
// reflection, so that one helper covers every type) and parses it back.
func checkSystem[T quantity](t *testing.T, parse func(string) (T, error), info *typeInfo, u *unitDef, v T) {
	t.Helper()
	res := reflect.ValueOf(USCustomary().WithName("test")).MethodByName("With" + info.name).Call([]reflect.Value{reflect.ValueOf(u.sym)})
	if err, _ := res[1].Interface().(error); err != nil {
		t.Errorf("System.With%s(%q): %v", info.name, u.sym, err)
		return
	}
	sv := res[0]
	if got := sv.MethodByName(info.name + "Unit").Call(nil)[0].String(); got != u.sym {
		t.Errorf("System.With%s(%q).%sUnit() = %q", info.name, u.sym, info.name, got)
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
	for _, s := range []System{Metric(), USCustomary()} {
		for _, v := range []Temperature{0, 1e-9, 0.01} {
			out := s.FormatTemperature(v)
			back, err := ParseTemperature(out)
			if err != nil {
				t.Errorf("%s.FormatTemperature(%g K) = %q: %v", s.Name(), float64(v), out, err)
				continue
			}
			if math.Abs(float64(back-v)) > 0.06 { // half a unit in the 4th digit of 459.7 °F, in K
				t.Errorf("%s.FormatTemperature(%g K) = %q reads back as %g K", s.Name(), float64(v), out, float64(back))
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

// TestSystemsCannotBeChangedByACaller: Metric and USCustomary return a fresh
// copy each time; a caller's adjusted copy changes nothing for anyone else.
func TestSystemsCannotBeChangedByACaller(t *testing.T) {
	mine, err := Metric().WithPressure("psi")
	if err != nil {
		t.Fatal(err)
	}
	mine = mine.WithName("mine")
	if got := mine.FormatPressure(2 * Bar); got != "29.01 psi" {
		t.Errorf("adjusted copy: FormatPressure(2 bar) = %q, want 29.01 psi", got)
	}
	if got := Metric().FormatPressure(2 * Bar); got != "2 bar" || Metric().Name() != "metric" {
		t.Errorf("Metric() after a caller adjusted a copy: %q, name %q; want 2 bar, metric", got, Metric().Name())
	}
	us := USCustomary()
	if _, err := us.WithFlow("L/min"); err != nil || us.FlowUnit() != "gpm" {
		t.Errorf("WithFlow changed its receiver: FlowUnit() = %q, %v", us.FlowUnit(), err)
	}
}

// TestSystemZeroValue: the zero System writes metric units with 4 digits.
func TestSystemZeroValue(t *testing.T) {
	var zero System
	m := Metric()
	for i, c := range typedCases {
		info := allTypes[i]
		for _, v := range []float64{1, 0.001234567, 98765.4321} {
			got := reflect.ValueOf(zero).MethodByName("Format" + info.name).Call([]reflect.Value{reflect.ValueOf(v).Convert(reflect.TypeOf(c.zero))})[0].String()
			want := reflect.ValueOf(m).MethodByName("Format" + info.name).Call([]reflect.Value{reflect.ValueOf(v).Convert(reflect.TypeOf(c.zero))})[0].String()
			if got != want {
				t.Errorf("System{}.Format%s(%g) = %q, Metric() gives %q", info.name, v, got, want)
			}
		}
	}
	if zero.Digits() != 4 || zero.Name() != "" {
		t.Errorf("System{}: Digits() = %d, Name() = %q", zero.Digits(), zero.Name())
	}
}

// TestSystemTradeUnits: the units each system writes (the tables in gen.go).
func TestSystemTradeUnits(t *testing.T) {
	m, us := Metric(), USCustomary()
	for _, c := range []struct{ got, want string }{
		{m.PressureUnit(), "bar"}, {us.PressureUnit(), "psi"},
		{m.FlowUnit(), "L/min"}, {us.FlowUnit(), "gpm"},
		{m.TemperatureUnit(), "°C"}, {us.TemperatureUnit(), "°F"},
		{m.TemperatureDifferenceUnit(), "K"}, {us.TemperatureDifferenceUnit(), "°F"},
		{us.FormatTemperatureDifference(10), "18 °F"},
		{us.FormatAbsolutePressure(StandardAtmosphere), "14.7 psia"},
	} {
		if c.got != c.want {
			t.Errorf("got %q, want %q", c.got, c.want)
		}
	}
}

// TestSystemWithRefuses: a With method takes only a registered unit of its
// type, and WithDigits 1 to 17; on error it returns the zero System.
func TestSystemWithRefuses(t *testing.T) {
	us := USCustomary()
	for _, c := range []struct {
		name string
		do   func() (System, error)
		want error
		fn   string
	}{
		{"absolute spelling for a gauge pressure", func() (System, error) { return us.WithPressure("psia") }, ErrReference, "units.System.WithPressure"},
		{"gauge spelling for an absolute pressure", func() (System, error) { return us.WithAbsolutePressure("psi") }, ErrReference, "units.System.WithAbsolutePressure"},
		{"flow unit for a pressure", func() (System, error) { return us.WithPressure("L/min") }, ErrDimension, "units.System.WithPressure"},
		{"unknown spelling", func() (System, error) { return us.WithPressure("bra") }, ErrUnknownUnit, "units.System.WithPressure"},
		{"expression, not a registered unit", func() (System, error) { return us.WithPressure("kN/cm²") }, ErrUnknownUnit, "units.System.WithPressure"},
		{"empty", func() (System, error) { return us.WithFlow("") }, ErrUnknownUnit, "units.System.WithFlow"},
		{"Δ spelling is a difference", func() (System, error) { return us.WithTemperature("Δ°F") }, ErrReference, "units.System.WithTemperature"},
	} {
		s, err := c.do()
		var pe *ParseError
		if !errors.Is(err, c.want) || !errors.As(err, &pe) || pe.Func != c.fn || s != (System{}) {
			t.Errorf("%s: %v, %v; want the zero System and a *ParseError from %s matching %v", c.name, s, err, c.fn, c.want)
		}
	}
	if _, err := us.WithPressure("bra"); err == nil || !strings.Contains(err.Error(), `"bar"`) {
		t.Errorf("WithPressure(bra): %v; want a suggestion of bar", err)
	}
	for _, n := range []int{0, -1, 18} {
		s, err := us.WithDigits(n)
		checktest.RangeErrorIn(t, err, "units.System.WithDigits", "n")
		if s != (System{}) {
			t.Errorf("WithDigits(%d) returned %v beside its error", n, s)
		}
	}
	if s, err := us.WithDigits(6); err != nil || s.FormatPressure(1234.5678*PSI) != "1234.57 psi" {
		t.Errorf("WithDigits(6): %v, %v", s.FormatPressure(1234.5678*PSI), err)
	}
}

// TestSystemPurposes: the US trade writes a cylinder's speed in in/s and a
// line's velocity in ft/s; metric writes both in m/s. A purpose a System
// sets no unit for follows the type's unit.
func TestSystemPurposes(t *testing.T) {
	piston, line := Velocity(0.1), Velocity(4.5) // 0.1 m/s = 3.937 in/s; 4.5 m/s = 14.76 ft/s
	us, metric := USCustomary(), Metric()
	for _, c := range []struct {
		name, got, want string
	}{
		{"US piston", us.FormatPistonSpeed(piston), "3.937 in/s"},
		{"US line", us.FormatLineVelocity(line), "14.76 ft/s"},
		{"US velocity", us.FormatVelocity(line), "14.76 ft/s"},
		{"metric piston", metric.FormatPistonSpeed(piston), "0.1 m/s"},
		{"metric line", metric.FormatLineVelocity(line), "4.5 m/s"},
		{"zero System piston", System{}.FormatPistonSpeed(piston), "0.1 m/s"},
		{"US piston unit", us.PistonSpeedUnit(), "in/s"},
		{"US line unit", us.LineVelocityUnit(), "ft/s"},
		{"metric piston unit", metric.PistonSpeedUnit(), "m/s"},
	} {
		if c.got != c.want {
			t.Errorf("%s = %q, want %q", c.name, c.got, c.want)
		}
	}
	// Setting a purpose changes only that purpose; an unset purpose follows
	// the type.
	shop, err := metric.WithPistonSpeed("mm/s")
	if err != nil || shop.FormatPistonSpeed(piston) != "100 mm/s" || shop.FormatLineVelocity(line) != "4.5 m/s" {
		t.Errorf("metric with piston speeds in mm/s: %q, %q, %v", shop.FormatPistonSpeed(piston), shop.FormatLineVelocity(line), err)
	}
	fps, err := metric.WithVelocity("ft/s")
	if err != nil || fps.FormatPistonSpeed(piston) != "0.3281 ft/s" {
		t.Errorf("metric with velocities in ft/s: piston %q, %v", fps.FormatPistonSpeed(piston), err)
	}
	if mps, _ := us.WithVelocity("m/s"); mps.FormatPistonSpeed(piston) != "3.937 in/s" {
		t.Errorf("US with velocities in m/s: piston %q, want it still in in/s", mps.FormatPistonSpeed(piston))
	}
	if metric.FormatPistonSpeed(piston) != "0.1 m/s" {
		t.Error("WithPistonSpeed changed the system it was called on")
	}
	for _, bad := range []struct {
		unit string
		want error
	}{{"bar", ErrDimension}, {"furlong/s", ErrUnknownUnit}} {
		s, err := us.WithLineVelocity(bad.unit)
		if !errors.Is(err, bad.want) || s.Name() != "" {
			t.Errorf("WithLineVelocity(%q) = %v, %v; want the zero System and %v", bad.unit, s.Name(), err, bad.want)
		}
	}
	buf := make([]byte, 0, 64)
	if n := testing.AllocsPerRun(100, func() { sinkBytes = us.AppendPistonSpeed(buf[:0], piston) }); n != 0 {
		t.Errorf("AppendPistonSpeed: %v allocs, want 0", n)
	}
	// Each purpose reads back through ParseVelocity, to the four significant
	// digits written.
	for _, c := range []struct {
		s    string
		want Velocity
	}{{us.FormatPistonSpeed(piston), piston}, {us.FormatLineVelocity(line), line}} {
		if v, err := ParseVelocity(c.s); err != nil || math.Abs(float64(v-c.want)) > 5e-4*float64(c.want) {
			t.Errorf("ParseVelocity(%q) = %v, %v; want %v", c.s, v, err, c.want)
		}
	}
}
