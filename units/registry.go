package units

// The unit registry: every registered unit (unitTable, generated from gen.go
// into tables_gen.go), the references a pressure or temperature spelling can
// carry, the descriptions of the quantity types, and the map from every
// accepted spelling to its unit.

import "strings"

// reference says what a pressure or temperature spelling is measured from.
type reference uint8

const (
	refNone     reference = 1 << iota // a plain unit, or a difference
	refGauge                          // measured from ambient: psi, psig, bar, barg
	refAbsolute                       // measured from vacuum: psia, bara, atm
	refPoint                          // a temperature on a scale (K, °C, °F, °R)
	refDiff                           // a difference of two pressures: psid, bard
)

// unitDef is one registered unit. SI value = number·factor + offset; the
// offset applies only to a temperature read as a point on its scale.
type unitDef struct {
	sym     string
	factor  float64
	offset  float64
	dim     Dimension
	ref     reference
	noReg   bool     // sym belongs to another unit's spelling
	aliases []string // other spellings
}

// typeInfo describes a typed quantity for parsing and conversion.
type typeInfo struct {
	name      string // Go type name
	kind      string // lower-case name for messages
	dim       Dimension
	accept    reference // references the type accepts
	useOffset bool      // apply the unit's offset (Temperature)
	hasMin    bool
	min       float64 // inclusive lower bound, SI
	minText   string
	examples  string            // unit spellings for messages
	context   []contextSpelling // spellings only this type's parser reads
}

// contextSpelling is a spelling with a meaning for one type's parser only
// (written in the table of gen.go): the unit of that type it reads as, or,
// with unit −1, an error that says what to write instead.
type contextSpelling struct {
	spelling string
	unit     int   // index in unitTable, or −1 to refuse
	err      error // the sentinel of a refusal
	detail   string
}

// contextOf returns the context spelling of t that spelling matches,
// letter case ignored, or nil.
func (t *typeInfo) contextOf(spelling string) *contextSpelling {
	for i := range t.context {
		if c := &t.context[i]; len(c.spelling) == len(spelling) && strings.EqualFold(c.spelling, spelling) {
			return c
		}
	}
	return nil
}

// isVacuum reports whether u is a vacuum gauge reading ("inHg vac"): a
// depth below ambient, whose negative factor gives a negative gauge pressure.
func (u *unitDef) isVacuum() bool { return u.factor < 0 }

// valid describes the values of t a RangeError wants: "a finite pressure",
// "a finite temperature ≥ 0 K (absolute zero)".
func (t *typeInfo) valid() string {
	if t.hasMin {
		return "a finite " + t.kind + " " + t.minText
	}
	return "a finite " + t.kind
}

// spellings maps every accepted spelling to its index in unitTable. It is
// built once at start-up and never changed.
var spellings = buildSpellings()

func buildSpellings() map[string]int {
	m := make(map[string]int, 4*len(unitTable))
	for i := range unitTable {
		u := &unitTable[i]
		if !u.noReg {
			m[u.sym] = i
		}
		for _, a := range u.aliases {
			m[a] = i
		}
	}
	return m
}
