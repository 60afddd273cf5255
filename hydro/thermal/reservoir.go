package thermal

import (
	"time"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Installation is where a power unit works; it sets the usual reservoir
// size.
type Installation uint8

// Installations.
const (
	Stationary Installation = iota + 1 // an industrial power unit on the floor
	Mobile                             // a machine that carries its tank: space and mass are dear
)

// String returns "stationary" or "mobile".
func (i Installation) String() string {
	switch i {
	case Stationary:
		return "stationary"
	case Mobile:
		return "mobile"
	}
	return "Installation(invalid)"
}

// Dwell is how many minutes of pump flow the reservoir holds, and where
// that figure comes from. Build one with Installation.Dwell, or set Time
// and Rule (components.CallerRule) to use your own.
type Dwell struct {
	Time time.Duration
	Rule components.Rule
}

// Dwell returns the usual reservoir size as minutes of pump flow: 3 for a
// stationary unit and 1 for a mobile one, the lower ends of the trade's
// ranges (3–5 × and 1–2 × the pump flow per minute, common practice).
// A larger tank settles air and dirt better and cools more; the lower end
// is the least the rule allows. The zero Dwell comes back for an unknown
// installation.
func (i Installation) Dwell() Dwell {
	switch i {
	case Stationary:
		return Dwell{3 * time.Minute, components.PracticeRule("stationary reservoir 3–5 × pump flow per minute, lower end")}
	case Mobile:
		return Dwell{time.Minute, components.PracticeRule("mobile reservoir 1–2 × pump flow per minute, lower end")}
	}
	return Dwell{}
}

// ReservoirSize is a reservoir's nominal volume, required and chosen.
type ReservoirSize struct {
	Volume components.Choice[units.Volume] // Q × dwell, and the next standard volume
	Dwell  Dwell
}

// reservoirVolumes is where the standard volumes come from.
func reservoirVolumes() components.Series[units.Volume] { return components.ReservoirVolumes() }

// SizeReservoir returns the nominal volume V = Q·t for pump flow q and
// dwell d, and the next volume of components.ReservoirVolumes (R10 litres,
// common practice); components.Tolerance lets 80 L/min for a minute select
// 80 L despite binary rounding. A volume above the series comes back
// unchosen (Volume.OK() false). q must be finite and > 0, d.Time > 0.
func SizeReservoir(q units.Flow, d Dwell) (ReservoirSize, error) {
	const fn = "thermal.SizeReservoir"
	if err := validate.Positive(fn, "q", q); err != nil {
		return ReservoirSize{}, err
	}
	if d.Time <= 0 {
		return ReservoirSize{}, validate.Fail(fn, "d.Time", d.Time.Seconds(), "> 0 s")
	}
	v := q.TimesDuration(d.Time)
	if err := validate.Positive(fn, "volume", v); err != nil {
		return ReservoirSize{}, err
	}
	ch, err := reservoirVolumes().Select(v)
	if err != nil {
		return ReservoirSize{}, err
	}
	return ReservoirSize{Volume: ch, Dwell: d}, nil
}

// Tank is a rectangular reservoir: inside length, width and height, and
// the depth of oil in it.
type Tank struct {
	Length, Width, Height units.Length
	Level                 units.Length // oil depth, at most Height
}

func (t Tank) validate(fn string) error {
	for _, d := range []struct {
		name string
		v    units.Length
	}{{"Length", t.Length}, {"Width", t.Width}, {"Height", t.Height}} {
		if err := validate.Positive(fn, d.name, d.v); err != nil {
			return err
		}
	}
	if err := validate.InRange(fn, "Level", t.Level, 0, t.Height); err != nil {
		return err
	}
	return validate.Positive(fn, "Level", t.Level)
}

// OilVolume returns the oil held: L·W·level.
func (t Tank) OilVolume() (units.Volume, error) {
	const fn = "thermal.Tank.OilVolume"
	if err := t.validate(fn); err != nil {
		return 0, err
	}
	v := units.Volume(float64(t.Length) * float64(t.Width) * float64(t.Level))
	return validate.Checked(fn, "volume", v)
}

// WettedArea returns the wall area the oil touches, through which it gives
// up most of its heat: the bottom and the sides up to the oil level,
// L·W + 2·(L + W)·level. The air-filled top and upper sides pass much
// less; counting them (SurfaceArea) overstates the dissipation.
func (t Tank) WettedArea() (units.Area, error) {
	const fn = "thermal.Tank.WettedArea"
	if err := t.validate(fn); err != nil {
		return 0, err
	}
	l, w := float64(t.Length), float64(t.Width)
	a := units.Area(l*w + 2*(l+w)*float64(t.Level))
	return validate.Checked(fn, "area", a)
}

// SurfaceArea returns the whole outside area of the box, 2·(LW + LH + WH),
// the basis some texts rate a tank's dissipation on.
func (t Tank) SurfaceArea() (units.Area, error) {
	const fn = "thermal.Tank.SurfaceArea"
	if err := t.validate(fn); err != nil {
		return 0, err
	}
	l, w, h := float64(t.Length), float64(t.Width), float64(t.Height)
	a := units.Area(2 * (l*w + l*h + w*h))
	return validate.Checked(fn, "area", a)
}

// StillAir is the usual heat-transfer coefficient of a steel reservoir wall
// to still air, natural convection and radiation together: 10 W/(m²·K), the
// lower end of the trade's 10–12 W/(m²·K) (common practice; US texts use
// 2 BTU/(h·ft²·°F) ≈ 11.4 W/(m²·K) with good air circulation, from
// memory). A tank in a corner or behind panels gives less; a fan gives
// much more.
const StillAir units.HeatTransferCoefficient = 10

// Dissipation returns the conductance h·A of a surface of area a with
// heat-transfer coefficient h (StillAir for a tank in still air): the heat
// it passes per kelvin between oil and air. h and a must be finite and > 0.
func Dissipation(h units.HeatTransferCoefficient, a units.Area) (Conductance, error) {
	const fn = "thermal.Dissipation"
	if err := validate.Positive(fn, "h", h); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "a", a); err != nil {
		return 0, err
	}
	c := Conductance(float64(h) * float64(a))
	return validate.Checked(fn, "h·A", c)
}

// SteadyTemperature returns the oil temperature at which surfaces of
// conductance ua shed heat load at ambient: T = T_amb + P/(h·A), the steady
// state of the lumped balance (m·c)·dT/dt = P − h·A·(T − T_amb). load must
// be finite and ≥ 0, ua finite and > 0, ambient finite and > 0 K.
func SteadyTemperature(load units.Power, ua Conductance, ambient units.Temperature) (units.Temperature, error) {
	const fn = "thermal.SteadyTemperature"
	if err := validate.NonNegative(fn, "load", load); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "ua", ua); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "ambient", ambient); err != nil {
		return 0, err
	}
	t := ambient.Add(units.TemperatureDifference(float64(load) / float64(ua)))
	return validate.Checked(fn, "T", t)
}
