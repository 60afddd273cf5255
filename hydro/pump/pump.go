package pump

import (
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// Control is how a pump sets its own displacement.
type Control uint8

// Controls.
const (
	NoControl           Control = iota // full displacement always: a fixed pump, or a variable one set by hand
	PressureCompensated                // full stroke below the compensator setting; strokes back to hold it
	LoadSensing                        // holds its outlet a margin above the highest load pressure, up to a pressure cut-off
	PowerLimited                       // holds its shaft power at a limit above the corner pressure, with an optional cut-off
)

var controlNames = [...]string{"none", "pressure-compensated", "load-sensing", "power-limited"}

// String returns "none", "pressure-compensated", "load-sensing" or
// "power-limited".
func (c Control) String() string {
	if int(c) < len(controlNames) {
		return controlNames[c]
	}
	return "Control(" + strconv.Itoa(int(c)) + ")"
}

// MarshalText writes the control's name; an unknown value fails with an
// error matching units.ErrRange.
func (c Control) MarshalText() ([]byte, error) {
	if int(c) >= len(controlNames) {
		return nil, &units.RangeError{Func: "pump.Control.MarshalText", Param: "control", Value: c.String(),
			Valid: strings.Join(controlNames[:], ", ")}
	}
	return []byte(controlNames[c]), nil
}

// UnmarshalText reads a name written by MarshalText, in any letter case.
// It fails with a *units.ParseError matching units.ErrSyntax that lists the
// names.
func (c *Control) UnmarshalText(b []byte) error {
	w := strings.ToLower(strings.TrimSpace(string(b)))
	for i, n := range controlNames {
		if w == n {
			*c = Control(i)
			return nil
		}
	}
	return &units.ParseError{Func: "pump.Control.UnmarshalText", Input: string(b), Err: units.ErrSyntax,
		Detail: "want one of " + strings.Join(controlNames[:], ", ")}
}

// Pump is a positive-displacement pump at a shaft speed, with the
// efficiencies of its data sheet and, for a variable pump, its control.
//
// The model is the usual linear one. The pump displaces D_g·n, where D_g is
// the displacement in use (the full Displacement, or less when the control
// strokes it back); internal leakage Q_L is lost from that, so it delivers
// Q = D_g·n − Q_L. Q_L = D·n·(1 − η_v) at full displacement D, the same at
// any stroke (leakage follows pressure, not stroke). When LeakagePressure is
// set, leakage is taken as laminar, in proportion to pressure:
// Q_L(p) = D·n·(1 − η_v)·p/LeakagePressure; when it is zero, Q_L is the
// same at every pressure. Shaft torque is T = D_g·p/(2π·η_hm) and shaft
// power P = 2π·n·T = D_g·n·p/η_hm, so at full stroke with constant leakage
// P = p·Q/(η_v·η_hm), the overall efficiency being η_v·η_hm.
//
// Pressures are the outlet's gauge pressure, standing for the pressure
// rise across the pump (the inlet is near atmospheric). Efficiencies vary
// with pressure, speed and viscosity: take them at the working point from
// the maker's curves.
type Pump struct {
	Displacement units.Displacement    // geometric displacement per revolution; a variable pump's maximum
	Speed        units.RotationalSpeed // shaft speed
	Volumetric   float64               // volumetric efficiency η_v, in (0, 1]
	Mechanical   float64               // hydromechanical efficiency η_hm, in (0, 1]

	// LeakagePressure is the pressure at which Volumetric was measured;
	// leakage is scaled from it in proportion to pressure. Zero takes
	// Volumetric as holding at every pressure.
	LeakagePressure units.Pressure

	Variable bool    // a variable-displacement pump
	Control  Control // NoControl for a fixed pump; the others need Variable

	// Cutoff is the compensator setting of a PressureCompensated pump and
	// the pressure cut-off of a LoadSensing one (both required), and the
	// optional cut-off of a PowerLimited one (zero: none).
	Cutoff units.Pressure
	// Margin is a LoadSensing pump's margin: its outlet is held this far
	// above the highest load pressure it senses (required for LoadSensing).
	Margin units.Pressure
	// PowerLimit is the shaft power a PowerLimited pump holds above its
	// corner pressure (required for PowerLimited).
	PowerLimit units.Power
}

// Validate checks every field; errors match units.ErrRange and name the
// field. Efficiencies must be in (0, 1], Displacement and Speed finite and
// > 0, and the control's own settings given (see [Pump]).
func (p Pump) Validate() error { return p.check("pump.Pump.Validate") }

func (p Pump) check(fn string) error {
	if err := validate.Positive(fn, "Displacement", p.Displacement); err != nil {
		return err
	}
	if err := validate.Positive(fn, "Speed", p.Speed); err != nil {
		return err
	}
	if err := efficiency(fn, "Volumetric", p.Volumetric); err != nil {
		return err
	}
	if err := efficiency(fn, "Mechanical", p.Mechanical); err != nil {
		return err
	}
	if err := validate.NonNegative(fn, "LeakagePressure", p.LeakagePressure); err != nil {
		return err
	}
	return p.checkControl(fn)
}

func (p Pump) checkControl(fn string) error {
	if int(p.Control) >= len(controlNames) {
		return &units.RangeError{Func: fn, Param: "Control", Value: p.Control.String(),
			Valid: "NoControl, PressureCompensated, LoadSensing or PowerLimited"}
	}
	if p.Control != NoControl && !p.Variable {
		return &units.RangeError{Func: fn, Param: "Control", Value: p.Control.String(),
			Valid: "NoControl for a fixed pump (set Variable for a " + p.Control.String() + " pump)"}
	}
	switch p.Control {
	case PressureCompensated:
		return validate.Positive(fn, "Cutoff", p.Cutoff)
	case LoadSensing:
		if err := validate.Positive(fn, "Cutoff", p.Cutoff); err != nil {
			return err
		}
		if err := validate.Positive(fn, "Margin", p.Margin); err != nil {
			return err
		}
		if p.Margin >= p.Cutoff {
			return validate.Fail(fn, "Margin", p.Margin, "below the Cutoff ("+p.Cutoff.String()+")")
		}
	case PowerLimited:
		if err := validate.NonNegative(fn, "Cutoff", p.Cutoff); err != nil {
			return err
		}
		return validate.Positive(fn, "PowerLimit", p.PowerLimit)
	}
	return nil
}

// efficiency checks 0 < eta ≤ 1.
func efficiency(fn, param string, eta float64) error {
	if !(eta > 0 && eta <= 1) {
		return validate.Fail(fn, param, eta, "> 0 and ≤ 1")
	}
	return nil
}

// Overall returns the overall efficiency η_v·η_hm, the ratio of hydraulic
// output power to shaft input power at full stroke. It does not validate.
func (p Pump) Overall() float64 { return p.Volumetric * p.Mechanical }

// MechanicalEfficiency returns the hydromechanical efficiency
// η_hm = η_t/η_v from a data sheet's overall (total) efficiency η_t and
// volumetric efficiency η_v. Both must be in (0, 1] with overall ≤
// volumetric; errors match units.ErrRange.
func MechanicalEfficiency(overall, volumetric float64) (float64, error) {
	const fn = "pump.MechanicalEfficiency"
	if err := efficiency(fn, "volumetric", volumetric); err != nil {
		return 0, err
	}
	if !(overall > 0 && overall <= volumetric) {
		return 0, validate.Fail(fn, "overall", overall, "> 0 and ≤ volumetric ("+strconv.FormatFloat(volumetric, 'g', -1, 64)+")")
	}
	return overall / volumetric, nil
}

// DisplacementFor returns the displacement that delivers flow q at speed n
// with volumetric efficiency volumetric: D = Q/(n·η_v). q and n must be
// finite and > 0, volumetric in (0, 1], and the displacement finite and
// > 0 (not overflowed or underflowed); errors match units.ErrRange.
func DisplacementFor(q units.Flow, n units.RotationalSpeed, volumetric float64) (units.Displacement, error) {
	const fn = "pump.DisplacementFor"
	if err := validate.Positive(fn, "q", q); err != nil {
		return 0, err
	}
	if err := validate.Positive(fn, "n", n); err != nil {
		return 0, err
	}
	if err := efficiency(fn, "volumetric", volumetric); err != nil {
		return 0, err
	}
	d, err := q.PerSpeed(n)
	if err != nil {
		return 0, validate.Renamed(err, fn, validate.Param("displacement"))
	}
	d = units.Displacement(float64(d) / volumetric)
	if err := validate.Positive(fn, "displacement", d); err != nil { // overflowed, or underflowed to 0
		return 0, err
	}
	return d, nil
}

// geometric returns the full-stroke geometric flow D·n.
func (p Pump) geometric() units.Flow { return p.Displacement.TimesSpeed(p.Speed) }

// leakage returns the internal leakage at outlet pressure pr.
func (p Pump) leakage(pr units.Pressure) units.Flow {
	l := float64(p.geometric()) * (1 - p.Volumetric)
	if l != 0 && p.LeakagePressure > 0 { // a lossless pump leaks nothing, even where pr/LeakagePressure overflows
		l *= float64(pr / p.LeakagePressure)
	}
	return units.Flow(l)
}
