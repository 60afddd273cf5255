package line

import (
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// FittingKind is a common fitting whose loss coefficient this package
// knows.
type FittingKind uint8

// Fittings with a known loss coefficient. The zero FittingKind,
// CustomFitting, has none: give Fitting.K.
const (
	CustomFitting FittingKind = iota
	Elbow90                   // standard 90° elbow, L/D 30
	Elbow45                   // standard 45° elbow, L/D 16
	ReturnBend                // close-pattern 180° return bend, L/D 50
	TeeRun                    // standard tee, flow through the run, L/D 20
	TeeBranch                 // standard tee, flow through the branch, L/D 60
	BallValve                 // full-bore ball valve, fully open, L/D 3
	GateValve                 // gate valve, fully open, L/D 8
	GlobeValve                // globe valve, fully open, L/D 340
	AngleValve                // angle valve, fully open, L/D 150
	Entrance                  // sharp-edged entrance from a reservoir, K 0.5
	Exit                      // exit into a reservoir, K 1.0 (the velocity head is lost)
)

type fittingRow struct {
	name string
	ld   float64 // equivalent length L/D; 0 for a fixed K
	k    float64 // fixed K when ld is 0
}

var fittingRows = [...]fittingRow{
	CustomFitting: {name: "custom fitting"},
	Elbow90:       {name: "90° elbow", ld: 30},
	Elbow45:       {name: "45° elbow", ld: 16},
	ReturnBend:    {name: "180° return bend", ld: 50},
	TeeRun:        {name: "tee, through the run", ld: 20},
	TeeBranch:     {name: "tee, through the branch", ld: 60},
	BallValve:     {name: "ball valve, open", ld: 3},
	GateValve:     {name: "gate valve, open", ld: 8},
	GlobeValve:    {name: "globe valve, open", ld: 340},
	AngleValve:    {name: "angle valve, open", ld: 150},
	Entrance:      {name: "sharp-edged entrance", k: 0.5},
	Exit:          {name: "exit into a reservoir", k: 1.0},
}

// String returns the fitting's name: "90° elbow".
func (k FittingKind) String() string {
	if int(k) < len(fittingRows) {
		return fittingRows[k].name
	}
	return "FittingKind(invalid)"
}

// craneRule is the source of the fitting table.
var craneRule = components.HandbookRule("Crane Technical Paper No. 410, Flow of Fluids Through Valves, Fittings, and Pipe: K = f_T·L/D (from memory)")

// K returns the loss coefficient of the fitting in a bore of inside
// diameter bore, by the two-factor method of Crane Technical Paper No. 410
// (Flow of Fluids Through Valves, Fittings, and Pipe; the method and the
// equivalent lengths L/D listed with the constants are from memory):
//
//	K = f_T·(L/D),  f_T = 0.25 / log₁₀²(ε/(3.7·D))
//
// where f_T is the friction factor of clean commercial steel pipe
// (ε = 0.045 mm, CommercialSteel) in fully turbulent flow, the
// rough-pipe limit of Colebrook–White, in the bore of the fitting. Crane
// tabulates f_T by nominal pipe size to two digits, a few percent above
// this formula below 1 in. The entrance (0.5) and exit (1.0) are fixed
// coefficients of the same text. It fails for CustomFitting, an unknown
// kind, a bore that is not finite and > 0, or, for the L/D kinds, a bore
// below 0.45 mm, where ε/D would exceed MaxRelativeRoughness.
func (k FittingKind) K(bore units.Length) (float64, components.Rule, error) {
	const fn = "line.FittingKind.K"
	if k == CustomFitting || int(k) >= len(fittingRows) {
		return 0, components.Rule{}, validate.Fail(fn, "kind", float64(k), "one of the FittingKind constants other than CustomFitting (or give Fitting.K)")
	}
	if err := validate.Positive(fn, "bore", bore); err != nil {
		return 0, components.Rule{}, err
	}
	row := fittingRows[k]
	if row.ld == 0 {
		return row.k, craneRule, nil
	}
	rr := float64(CommercialSteel / bore)
	if rr > MaxRelativeRoughness {
		return 0, components.Rule{}, validate.Fail(fn, "bore", bore,
			"≥ "+(CommercialSteel/MaxRelativeRoughness).String()+" (the roughness of commercial steel at most a tenth of the bore)")
	}
	return fullyRough(rr) * row.ld, craneRule, nil
}

// fullyRough returns the Colebrook–White friction factor as Re → ∞:
// f = 0.25 / log₁₀²(ε/(3.7·D)). rr must be in (0, MaxRelativeRoughness].
func fullyRough(rr float64) float64 {
	l := math.Log10(rr / 3.7)
	return 0.25 / (l * l)
}
