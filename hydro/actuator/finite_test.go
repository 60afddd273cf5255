package actuator

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"reflect"
	"testing"
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/units"
)

// extremes are the inputs that break float arithmetic: non-finite values,
// signs, zero, denormals and values whose products overflow.
var extremes = [...]float64{math.NaN(), math.Inf(1), math.Inf(-1), 0, -1, 5e-324, 1e-300, 1e-30, 1e30, 1e300, math.MaxFloat64}

// sweep draws inputs around a typical value, one in five from extremes.
type sweep struct{ r *rand.Rand }

func (s sweep) near(typical float64) float64 {
	if s.r.IntN(5) == 0 {
		return extremes[s.r.IntN(len(extremes))]
	}
	return typical * math.Exp(s.r.NormFloat64())
}

// maybe returns near(typical) or 0 (an optional field left out).
func (s sweep) maybe(typical float64) float64 {
	if s.r.IntN(3) == 0 {
		return 0
	}
	return s.near(typical)
}

// nonFinite returns the path of the first NaN or ±Inf float in v's exported
// fields, or "".
func nonFinite(v reflect.Value, path string) string {
	switch v.Kind() {
	case reflect.Float64:
		if f := v.Float(); math.IsNaN(f) || math.IsInf(f, 0) {
			return path
		}
	case reflect.Struct:
		for i := range v.NumField() {
			if f := v.Type().Field(i); f.IsExported() {
				if p := nonFinite(v.Field(i), path+"."+f.Name); p != "" {
					return p
				}
			}
		}
	case reflect.Pointer:
		if !v.IsNil() {
			return nonFinite(v.Elem(), path)
		}
	case reflect.Slice:
		for i := range v.Len() {
			if p := nonFinite(v.Index(i), fmt.Sprintf("%s[%d]", path, i)); p != "" {
				return p
			}
		}
	}
	return ""
}

// outcome holds a function's result to the package's promise: an error is
// a *units.RangeError beside the zero value; a nil error comes with no NaN
// or ±Inf anywhere in the result (and no panic either way).
type outcome struct {
	t      *testing.T
	failed map[string]bool // one report per function and kind of failure
}

func (o outcome) of(name string, in any, f func() (any, error)) {
	o.t.Helper()
	report := func(kind, format string, args ...any) {
		if !o.failed[name+kind] {
			o.failed[name+kind] = true
			o.t.Errorf(name+": "+format, args...)
		}
	}
	defer func() {
		if p := recover(); p != nil {
			report("panic", "panics on %+v: %v", in, p)
		}
	}()
	out, err := f()
	v := reflect.ValueOf(out)
	if err != nil {
		var re *units.RangeError
		if !errors.As(err, &re) || !errors.Is(err, units.ErrRange) {
			report("error", "error %v is not a *units.RangeError (input %+v)", err, in)
		}
		if !v.IsZero() {
			report("zero", "returns %+v beside the error %v", out, err)
		}
		return
	}
	if p := nonFinite(v, "result"); p != "" {
		report("finite", "%s is not finite with a nil error: %+v from %+v", p, out, in)
	}
}

// TestResultsFiniteOrError drives every exported function with inputs
// drawn around typical values and, one field in five, from extremes
// (property): it never panics, an error comes beside the zero value, and a
// nil error never comes with NaN or ±Inf in the result.
func TestResultsFiniteOrError(t *testing.T) {
	s := sweep{rand.New(rand.NewPCG(9, 9))}
	o := outcome{t, map[string]bool{}}
	motors := slewMotors(t)
	for range 5000 {
		c := Cylinder{Bore: units.Length(s.near(0.1)), Rod: units.Length(s.near(0.05)), Stroke: units.Length(s.near(1)),
			Ends: RodEnds(s.r.IntN(2)), Action: Action(s.r.IntN(2)), Rating: units.Pressure(s.maybe(3e7))}
		dir := Direction(s.r.IntN(2))
		p, back := units.Pressure(s.near(1e7)), units.Pressure(s.maybe(1e5))
		q, f := units.Flow(s.near(1e-3)), units.Force(s.near(1e5))
		o.of("Cylinder.AreaRatio", c, func() (any, error) { return c.AreaRatio() })
		o.of("Cylinder.Force", c, func() (any, error) { return c.Force(dir, p, back) })
		o.of("Cylinder.PressureFor", c, func() (any, error) { return c.PressureFor(dir, f, back) })
		o.of("Cylinder.Speed", c, func() (any, error) { return c.Speed(dir, q) })
		o.of("Cylinder.FlowFor", c, func() (any, error) { return c.FlowFor(dir, units.Velocity(s.near(0.1))) })
		o.of("Cylinder.ReturnFlow", c, func() (any, error) { return c.ReturnFlow(dir, q) })
		o.of("Cylinder.StrokeTime", c, func() (any, error) { return c.StrokeTime(dir, q) })
		o.of("Cylinder.Regenerative", c, func() (any, error) { return c.Regenerative(q, p) })
		o.of("Cylinder.Intensification", c, func() (any, error) {
			return c.Intensification(dir, p, units.Force(s.near(1e4)*float64(s.r.IntN(3)-1)))
		})
		o.of("IntensifiedPressure", p, func() (any, error) {
			return IntensifiedPressure(p, units.Area(s.near(1e-2)), units.Area(s.near(5e-3)), units.Force(s.near(1e4)*float64(s.r.IntN(3)-1)))
		})
		pr := Profile{Speed: units.Velocity(s.near(0.1)), Accel: units.Acceleration(s.near(1)),
			Decel: units.Acceleration(s.maybe(1)), Distance: units.Length(s.near(0.5))}
		o.of("Profile.Time", pr, func() (any, error) { return pr.Time() })
		pr.Distance = units.Length(s.maybe(0.5))
		o.of("Cylinder.Move", c, func() (any, error) { return c.Move(dir, pr) })
		cu := Cushion{Length: units.Length(s.near(0.03)), Mass: units.Mass(s.near(500)), Speed: units.Velocity(s.near(0.3)),
			Drive: units.Pressure(s.maybe(1e7)), Assist: units.Force(s.near(1e3) * float64(s.r.IntN(3)-1)),
			Area: units.Area(s.maybe(1e-3))}
		o.of("Cylinder.Cushioning", c, func() (any, error) { return c.Cushioning(dir, cu) })
		o.of("CriticalLoad", c, func() (any, error) {
			f, _, err := CriticalLoad(units.Length(s.near(0.05)), units.Length(s.near(1)), units.Pressure(s.near(2e11)), units.Pressure(s.near(3e8)))
			return f, err
		})
		col := Column{Cylinder: c, Body: BodyMount(s.r.IntN(4)), RodEnd: RodEnd(s.r.IntN(2)), Retracted: units.Length(s.near(0.5)),
			Relief: units.Pressure(s.near(2e7)), Yield: units.Pressure(s.near(3e8)), E: units.Pressure(s.maybe(2e11)),
			K: s.maybe(1), Factor: s.maybe(3)}
		o.of("Column.Check", col, func() (any, error) { return col.Check() })
		o.of("Column.MinimumRod", col, func() (any, error) { return col.MinimumRod(components.Series[units.Length]{}) })
		sp := OilSpring{Cylinder: c, Mass: units.Mass(s.near(100)), DeadCap: units.Volume(s.near(1e-4)), DeadRod: units.Volume(s.near(1e-4)),
			Bulk: fluid.EffectiveBulk{Liquid: units.Pressure(s.near(1.4e9))}, CapPressure: units.AbsolutePressure(s.near(1e7)),
			RodPressure: units.AbsolutePressure(s.near(1e7)), RampFactor: s.maybe(18)}
		x := units.Length(s.near(0.3))
		o.of("OilSpring.Stiffness", sp, func() (any, error) { return sp.Stiffness(x) })
		o.of("OilSpring.NaturalFrequency", sp, func() (any, error) { return sp.NaturalFrequency(x) })
		o.of("OilSpring.Lowest", sp, func() (any, error) { return sp.Lowest() })
		d := Duty{Direction: Direction(s.r.IntN(2)), Force: units.Force(s.near(1e5)), Mass: units.Mass(s.maybe(500)),
			InclineDegrees: s.maybe(30) * float64(s.r.IntN(3)-1), Friction: s.maybe(0.1), Speed: units.Velocity(s.maybe(0.1)),
			Pressure: units.Pressure(s.near(2e7)), BackPressure: units.Pressure(s.maybe(1e5)),
			SealEfficiency: s.maybe(0.9), AreaRatio: s.maybe(1.5), Stroke: units.Length(s.near(1)),
			Ends: RodEnds(s.r.IntN(2)), Action: Action(s.r.IntN(2))}
		if s.r.IntN(2) == 0 {
			d.AccelDistance = units.Length(s.maybe(0.05))
		} else {
			d.AccelTime = time.Duration(s.maybe(1e8))
		}
		if s.r.IntN(3) == 0 {
			bc := col
			d.Buckling = &bc
		}
		o.of("Duty.Forces", d, func() (any, error) { return d.Forces() })
		o.of("Duty.MinimumBore", d, func() (any, error) { return d.MinimumBore() })
		o.of("Duty.Size", d, func() (any, error) { return d.Size() })
		m := Motor{Displacement: units.Displacement(s.near(1e-4)), Volumetric: s.near(0.9), Mechanical: s.near(0.9), Starting: s.maybe(0.8)}
		o.of("Motor.Torque", m, func() (any, error) { return m.Torque(p) })
		o.of("Motor.StartingTorque", m, func() (any, error) { return m.StartingTorque(p) })
		o.of("Motor.PressureFor", m, func() (any, error) { return m.PressureFor(units.Torque(s.near(100))) })
		o.of("Motor.Speed", m, func() (any, error) { return m.Speed(q) })
		o.of("Motor.FlowFor", m, func() (any, error) { return m.FlowFor(units.RotationalSpeed(s.near(10))) })
		o.of("Motor.Power", m, func() (any, error) { return m.Power(p, q) })
		md := MotorDuty{Torque: units.Torque(s.near(500)), StartTorque: units.Torque(s.maybe(500)),
			Speed: units.RotationalSpeed(s.maybe(1)), Pressure: p, Volumetric: s.near(0.9), Mechanical: s.near(0.9),
			Starting: s.maybe(0.8), Displacements: motors}
		o.of("MotorDuty.Size", md, func() (any, error) { return md.Size() })
	}
}
