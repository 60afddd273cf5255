package thermal

import (
	"math"
	"time"

	"github.com/hydrosize/hydrosize/fluid"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// CarbonSteel is the specific heat capacity of carbon steel near room
// temperature, 490 J/(kg·K) (typical handbook value; alloy and stainless
// steels lie between about 460 and 510 J/(kg·K), from memory).
const CarbonSteel units.SpecificHeatCapacity = 490

// Lumped is a power unit taken as one body at one temperature: the oil
// (Volume of Fluid) and the steel that warms with it (tank, pump, valves,
// pipes), shedding heat through Dissipation to Ambient while Load heats
// it:
//
//	(m_oil·c_oil + m_steel·c_steel)·dT/dt = P − h·A·(T − T_amb)
//
// Load 0 is a cool-down.
type Lumped struct {
	Fluid       fluid.Fluid
	Oil         units.Volume
	Steel       units.Mass
	SteelHeat   units.SpecificHeatCapacity // 0 means CarbonSteel
	Dissipation Conductance                // h·A of the surfaces
	Ambient     units.Temperature
	Load        units.Power
}

// Response is how a Lumped body moves from a start temperature.
type Response struct {
	Steady       units.Temperature // T_amb + P/(h·A)
	TimeConstant time.Duration     // τ = C/(h·A)
	Capacity     float64           // C = m_oil·c_oil + m_steel·c_steel, J/K
}

// Response returns the steady temperature and the time constant of the
// body started at start. The oil's density and specific heat are taken
// from Fluid at the mean of start and the steady temperature
// (fluid.Fluid.Density at atmospheric pressure, fluid.Fluid.SpecificHeat)
// and held constant, so the closed form of At applies. Oil must be finite
// and > 0, Steel and Load finite and ≥ 0, Dissipation finite and > 0,
// Ambient and start finite and above absolute zero, and the fluid's models
// valid at the mean temperature (an error there names start, the fluid's
// data Fluid.…).
func (l Lumped) Response(start units.Temperature) (Response, error) {
	const fn = "thermal.Lumped.Response"
	if err := l.validate(fn); err != nil {
		return Response{}, err
	}
	if err := validate.Positive(fn, "start", start); err != nil {
		return Response{}, err
	}
	steady, err := SteadyTemperature(l.Load, l.Dissipation, l.Ambient)
	if err != nil {
		return Response{}, err
	}
	mean := start + (steady-start)/2
	rho, err := l.Fluid.Density(mean, 0)
	if err != nil {
		return Response{}, validate.Renamed(err, fn, fluidFields)
	}
	c, err := l.Fluid.SpecificHeat(mean)
	if err != nil {
		return Response{}, validate.Renamed(err, fn, fluidFields)
	}
	ch := l.SteelHeat
	if ch == 0 {
		ch = CarbonSteel
	}
	capacity := float64(rho)*float64(l.Oil)*float64(c) + float64(l.Steel)*float64(ch)
	if err := validate.PositiveResult(fn, "Capacity", capacity); err != nil {
		return Response{}, err
	}
	tau := capacity / float64(l.Dissipation)
	if err := validate.Result(fn, "τ", tau); err != nil {
		return Response{}, err
	}
	if tau > float64(math.MaxInt64)/1e9 {
		return Response{}, validate.Fail(fn, "Dissipation", l.Dissipation, "large enough for a time constant within 292 years")
	}
	return Response{Steady: steady, TimeConstant: time.Duration(tau * 1e9), Capacity: capacity}, nil
}

// fluidFields maps the parameters of a fluid.Fluid error to Lumped's: the
// temperature (the mean of start and the steady temperature) to start, the
// fluid's data to Fluid.….
var fluidFields = validate.Fields("Fluid.", map[string]string{"t": "start"})

func (l Lumped) validate(fn string) error {
	if err := validate.Positive(fn, "Oil", l.Oil); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "Steel", l.Steel); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "SteelHeat", l.SteelHeat); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Dissipation", l.Dissipation); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "Load", l.Load); err != nil {
		return err
	}
	return validate.Positive(fn, "Ambient", l.Ambient)
}

// At returns the temperature after d from start, by the closed form of the
// lumped balance: T(t) = T_ss + (T₀ − T_ss)·exp(−t/τ) (Response gives T_ss
// and τ). d must be ≥ 0; the rest as Response needs.
func (l Lumped) At(start units.Temperature, d time.Duration) (units.Temperature, error) {
	const fn = "thermal.Lumped.At"
	if d < 0 {
		return 0, validate.Fail(fn, "d", d.Seconds(), "≥ 0 s")
	}
	r, err := l.Response(start)
	if err != nil {
		return 0, err
	}
	// τ from the capacity, not TimeConstant, which rounds to whole
	// nanoseconds (to 0 for a tiny body).
	x := math.Exp(-d.Seconds() * float64(l.Dissipation) / r.Capacity)
	return r.Steady + (start-r.Steady)*units.Temperature(x), nil
}

// TimeTo returns how long the body takes from start to reach target:
// t = τ·ln((T₀ − T_ss)/(T − T_ss)), for a warm-up (target between start
// and a higher steady temperature) or a cool-down (between start and a
// lower one). A target at or beyond the steady temperature is never
// reached: the error names target and the steady temperature.
func (l Lumped) TimeTo(start, target units.Temperature) (time.Duration, error) {
	const fn = "thermal.Lumped.TimeTo"
	r, err := l.Response(start)
	if err != nil {
		return 0, err
	}
	lo, hi := min(start, r.Steady), max(start, r.Steady)
	if target == start {
		return 0, nil
	}
	if !(target > lo && target < hi) {
		return 0, validate.Fail(fn, "target", target, "between the start "+start.String()+" and the steady "+r.Steady.String()+", not at it")
	}
	t := r.Capacity / float64(l.Dissipation) * math.Log(float64((start-r.Steady)/(target-r.Steady)))
	if err := validate.Result(fn, "t", t); err != nil || t > float64(math.MaxInt64)/1e9 {
		return 0, validate.Fail(fn, "target", target, "reached within 292 years")
	}
	return time.Duration(t * 1e9), nil
}
