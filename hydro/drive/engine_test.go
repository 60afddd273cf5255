package drive

import (
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// skidderEngine is a forestry skidder's diesel (demo data): 30 kW at
// 1500 rpm, 42 kW at 2000 rpm, 45 kW at 2400 rpm; the pump turns 1.2 ×
// engine speed through a 97 % PTO.
func skidderEngine() Engine {
	rpm, kW := units.RevolutionPerMinute, units.Kilowatt
	return Engine{Curve: []CurvePoint{{1500 * rpm, 30 * kW}, {2000 * rpm, 42 * kW}, {2400 * rpm, 45 * kW}},
		Ratio: 1.2, Efficiency: 0.97}
}

func TestEnginePowerAt(t *testing.T) {
	e := skidderEngine()
	rpm := units.RevolutionPerMinute
	for _, c := range []struct {
		n    units.RotationalSpeed
		want units.Power
	}{
		{1500 * rpm, 30e3}, {1750 * rpm, 36e3}, {2000 * rpm, 42e3}, {2200 * rpm, 43.5e3}, {2400 * rpm, 45e3},
	} {
		got, err := e.PowerAt(c.n)
		if err != nil {
			t.Fatal(err)
		}
		checktest.Near(t, "power at "+c.n.String(), got, c.want, 1e-14)
	}
	_, err := e.PowerAt(1400 * rpm)
	checktest.RangeErrorIn(t, err, "drive.Engine.PowerAt", "n")
}

// The skidder's pump needs 35 kW at its shaft. At 1800 rpm the engine
// gives 30 + 12 × 300/500 = 37.2 kW but must deliver 35/0.97 = 36.08 kW:
// it passes. At 1600 rpm it gives 32.4 kW: it lugs down.
func TestEngineLoad(t *testing.T) {
	e := skidderEngine()
	rpm := units.RevolutionPerMinute
	l, err := e.Load(35*units.Kilowatt, 1800*rpm)
	if err != nil {
		t.Fatal(err)
	}
	checktest.Near(t, "pump speed", l.PumpSpeed.RPM(), 2160, 1e-14)
	checktest.Near(t, "required at the engine", l.Required, 35e3/0.97, 1e-14)
	checktest.Near(t, "available", l.Available, 37.2e3, 1e-14)
	checktest.Near(t, "pump torque", l.PumpTorque, 35e3/(2*3.141592653589793*2160/60), 1e-14)
	if !l.Power.OK() || len(l.Findings) != 0 || l.Power.Rule.Kind != components.CallerValue {
		t.Errorf("at 1800 rpm: %+v, %v", l.Power, l.Findings)
	}
	l, _ = e.Load(35*units.Kilowatt, 1600*rpm)
	if l.Power.OK() || len(l.Findings.Topic("drive.engine-short")) != 1 {
		t.Errorf("at 1600 rpm: %+v, %v; want a failed check and a caution", l.Power, l.Findings)
	}
}

func TestEngineBadInput(t *testing.T) {
	rpm, kW := units.RevolutionPerMinute, units.Kilowatt
	for param, e := range map[string]Engine{
		"Curve":          {Curve: []CurvePoint{{1500 * rpm, 30 * kW}}, Ratio: 1, Efficiency: 1},
		"Curve[1].Speed": {Curve: []CurvePoint{{1500 * rpm, 30 * kW}, {1500 * rpm, 40 * kW}}, Ratio: 1, Efficiency: 1},
		"Curve[0].Speed": {Curve: []CurvePoint{{0, 30 * kW}, {1500 * rpm, 40 * kW}}, Ratio: 1, Efficiency: 1},
		"Curve[1].Power": {Curve: []CurvePoint{{1000 * rpm, 30 * kW}, {1500 * rpm, -1}}, Ratio: 1, Efficiency: 1},
		"Ratio":          {Curve: skidderEngine().Curve, Efficiency: 1},
		"Efficiency":     {Curve: skidderEngine().Curve, Ratio: 1, Efficiency: 1.1},
	} {
		_, err := e.PowerAt(2000 * rpm)
		checktest.RangeErrorIn(t, err, "drive.Engine.PowerAt", param)
		_, err = e.Load(1e3, 2000*rpm)
		checktest.RangeErrorIn(t, err, "drive.Engine.Load", param)
	}
	_, err := skidderEngine().Load(-1, 2000*rpm)
	checktest.RangeErrorIn(t, err, "drive.Engine.Load", "shaft")
}

// Results that would overflow are errors, not infinite or silently zero
// values: a shaft power so large that the engine's share overflows, a PTO
// ratio so small that the pump's torque overflows, and one that takes the
// pump's speed to zero.
func TestEngineLoadExtremes(t *testing.T) {
	rpm := units.RevolutionPerMinute
	e := skidderEngine()
	e.Efficiency = 0.5
	l, err := e.Load(math.MaxFloat64, 2000*rpm)
	if checktest.RangeErrorIn(t, err, "drive.Engine.Load", "Required"); l.Required != 0 || l.Findings != nil {
		t.Errorf("overflowing load: %+v beside the error", l)
	}
	e = skidderEngine()
	e.Ratio = 5e-324
	l, err = e.Load(35e3, 2000*rpm)
	if checktest.RangeErrorIn(t, err, "drive.Engine.Load", "PumpTorque"); l.PumpTorque != 0 {
		t.Errorf("overflowing pump torque: %+v beside the error", l)
	}
	e.Curve = []CurvePoint{{0.1, 1e3}, {0.4, 2e3}} // rev/s: 0.2 × 5e-324 rounds to 0
	l, err = e.Load(1e3, 0.2)
	if checktest.RangeErrorIn(t, err, "drive.Engine.Load", "PumpSpeed"); l.PumpSpeed != 0 {
		t.Errorf("pump speed of zero: %+v beside the error", l)
	}
}
