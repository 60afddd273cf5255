package valve

import (
	"fmt"
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/units"
)

// Center is how a directional valve connects its pump (P), tank (T) and
// actuator (A, B) ports in its center (neutral) position. What each center
// does is data, returned by [Center.Traits]; hydro/pump reads it to judge a
// pump against the valve, and [LoadHolding] reads it to judge whether a
// load-holding valve's pilot can vent.
//
// The zero Center is no center: a field left unset. It fails
// [Center.Validate], so a circuit cannot be judged against a center nobody
// chose.
type Center uint8

// Center conditions. The names are the trade's.
const (
	ClosedCenter       Center = iota + 1 // P, T, A and B all blocked (also "blocked center")
	OpenCenter                           // P, T, A and B all connected
	TandemCenter                         // P to T; A and B blocked
	FloatCenter                          // P blocked; A and B to T
	RegenerativeCenter                   // P, A and B connected; T blocked
)

var centerNames = [...]string{"", "closed", "open", "tandem", "float", "regenerative"}

// Path is where a port group leads in a valve's center position.
type Path uint8

// Paths.
const (
	Blocked Path = iota // the ports are blocked
	ToTank              // the ports are connected to tank
	Joined              // the pump port and both actuator ports are connected to each other (regenerative)
)

var pathNames = [...]string{"blocked", "to tank", "joined"}

// String returns "blocked", "to tank" or "joined".
func (p Path) String() string {
	if int(p) < len(pathNames) {
		return pathNames[p]
	}
	return "Path(" + strconv.Itoa(int(p)) + ")"
}

// CenterTraits is what a center condition does, as data.
//
//	center        Pump     Actuator  the pump, centred          the actuator, centred
//	closed        blocked  blocked   deadheads (or strokes back) held (spool leakage aside)
//	open          to tank  to tank   unloads to tank             free: floats
//	tandem        to tank  blocked   unloads to tank             held (spool leakage aside)
//	float         blocked  to tank   deadheads (or strokes back) free: floats
//	regenerative  joined   joined    feeds both actuator ports   a single-rod cylinder creeps out
//
// A spool valve leaks past its lands even with its ports blocked: a held
// actuator drifts under load unless a load-holding valve at its port
// holds it.
type CenterTraits struct {
	Pump     Path // where P goes: Blocked, ToTank or Joined (to A and B)
	Actuator Path // where A and B go: Blocked, ToTank or Joined (to P)
}

// Unloads reports whether the pump port is open to tank in the center, so
// a fixed pump's flow passes to tank at the valve's P→T pressure drop and
// can feed a valve downstream (open and tandem centers).
func (t CenterTraits) Unloads() bool { return t.Pump == ToTank }

// Deadheads reports whether the pump port is blocked in the center, so the
// pump's flow has nowhere to go but a relief, an unloading valve or the
// pump's own control (closed and float centers).
func (t CenterTraits) Deadheads() bool { return t.Pump == Blocked }

// Holds reports whether the actuator ports are blocked in the center
// (closed and tandem centers); the spool still leaks.
func (t CenterTraits) Holds() bool { return t.Actuator == Blocked }

// Vents reports whether the actuator ports are open to tank in the center
// (open and float centers), which drains the pilot of a load-holding valve
// so it closes.
func (t CenterTraits) Vents() bool { return t.Actuator == ToTank }

// Traits returns what the center does. It fails with an error matching
// units.ErrRange for a Center that is not one of the named constants.
func (c Center) Traits() (CenterTraits, error) {
	switch c {
	case ClosedCenter:
		return CenterTraits{Pump: Blocked, Actuator: Blocked}, nil
	case OpenCenter:
		return CenterTraits{Pump: ToTank, Actuator: ToTank}, nil
	case TandemCenter:
		return CenterTraits{Pump: ToTank, Actuator: Blocked}, nil
	case FloatCenter:
		return CenterTraits{Pump: Blocked, Actuator: ToTank}, nil
	case RegenerativeCenter:
		return CenterTraits{Pump: Joined, Actuator: Joined}, nil
	}
	return CenterTraits{}, c.invalid("valve.Center.Traits")
}

// Validate reports whether c is one of the named centers; the error matches
// units.ErrRange and names the valid values.
func (c Center) Validate() error {
	_, err := c.Traits()
	return err
}

func (c Center) invalid(fn string) error {
	return &units.RangeError{Func: fn, Param: "center", Value: strconv.Itoa(int(c)),
		Valid: "one of " + strings.Join(centerNames[1:], ", ")}
}

// String returns the center's name: "closed", "open", "tandem", "float" or
// "regenerative"; "Center(0)" for the unset zero value.
func (c Center) String() string {
	if c > 0 && int(c) < len(centerNames) {
		return centerNames[c]
	}
	return fmt.Sprintf("Center(%d)", uint8(c))
}

// MarshalText writes the center's name; the unset zero value and unknown
// values fail with an error matching units.ErrRange.
func (c Center) MarshalText() ([]byte, error) {
	if err := c.Validate(); err != nil {
		return nil, c.invalid("valve.Center.MarshalText")
	}
	return []byte(centerNames[c]), nil
}

// UnmarshalText reads a name written by MarshalText, in any letter case,
// with or without a trailing " center" ("tandem", "Tandem center"). It fails
// with a *units.ParseError matching units.ErrSyntax that lists the names.
func (c *Center) UnmarshalText(b []byte) error {
	v, err := ParseCenter(string(b))
	if err != nil {
		return err
	}
	*c = v
	return nil
}

// ParseCenter reads a center's name: "closed" (or "blocked"), "open",
// "tandem", "float" or "regenerative" (or "regen"), in any letter case, with
// or without a trailing " center" or " centre". It fails with a
// *units.ParseError matching units.ErrSyntax that lists the names.
func ParseCenter(s string) (Center, error) {
	w := strings.ToLower(strings.TrimSpace(s))
	for _, suffix := range []string{" center", " centre", "-center", "-centre"} {
		w = strings.TrimSuffix(w, suffix)
	}
	switch w {
	case "blocked":
		return ClosedCenter, nil
	case "regen":
		return RegenerativeCenter, nil
	}
	for i, n := range centerNames[1:] {
		if w == n {
			return Center(i + 1), nil
		}
	}
	return 0, &units.ParseError{Func: "valve.ParseCenter", Input: s, Err: units.ErrSyntax,
		Detail: "want one of " + strings.Join(centerNames[1:], ", ")}
}
