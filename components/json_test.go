package components

import (
	"encoding/json"
	"errors"
	"math"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
	"github.com/hydrosize/hydrosize/units"
)

// sentinels are the units sentinels every input error matches one of.
var sentinels = []error{units.ErrSyntax, units.ErrUnknownUnit, units.ErrDimension, units.ErrRange,
	units.ErrReference, units.ErrAmbiguous}

func isUnitsError(err error) bool {
	for _, s := range sentinels {
		if errors.Is(err, s) {
			return true
		}
	}
	return false
}

// TestMarshalJSONRefusesNonFinite checks that a check or choice holding a
// value JSON cannot write (NaN, ±Inf, or a ratio or margin that overflows)
// fails with a range error naming the field, not with encoding/json's own
// error, which matches no units sentinel.
func TestMarshalJSONRefusesNonFinite(t *testing.T) {
	r := CallerRule("limit")
	for _, c := range []struct {
		name, fn, param string
		v               json.Marshaler
	}{
		{"NaN value", "components.Check.MarshalJSON", "Value", Within(math.NaN(), 1.0, r)},
		{"infinite limit", "components.Check.MarshalJSON", "Limit", Reaches(1.0, math.Inf(1), r)},
		{"ratio overflows", "components.Check.MarshalJSON", "Ratio", Within(1e300*units.Bar, 1e-300*units.Bar, r)},
		{"infinite required", "components.Choice.MarshalJSON", "Required", Choice[units.Length]{Required: units.Length(math.Inf(1))}},
		{"NaN chosen", "components.Choice.MarshalJSON", "Chosen", Choice[float64]{Required: 1, Chosen: math.NaN()}},
		{"margin overflows", "components.Choice.MarshalJSON", "Margin", Choice[units.Length]{Required: 1e-300, Chosen: 1e300}},
	} {
		b, err := json.Marshal(c.v)
		if b != nil {
			t.Errorf("%s: json.Marshal wrote %s", c.name, b)
		}
		checktest.RangeErrorIn(t, err, c.fn, c.param)
	}
}

// TestUnmarshalJSONErrorsMatchSentinels checks that JSON a caller hands to
// UnmarshalJSON directly, malformed or of the wrong JSON type, fails with a
// *units.ParseError that names the method and matches units.ErrSyntax, and
// that the receiver is left unchanged.
func TestUnmarshalJSONErrorsMatchSentinels(t *testing.T) {
	for _, in := range []string{`{"value":`, `[1,2]`, `{"rule":true}`, `"18/16/13"`, `{"rule":{"kind":7}}`, ``} {
		var c Check[float64]
		wantSyntax(t, "components.Check.UnmarshalJSON", in, c.UnmarshalJSON([]byte(in)))
		var ch Choice[units.Length]
		wantSyntax(t, "components.Choice.UnmarshalJSON", in, ch.UnmarshalJSON([]byte(in)))
		var f Finding
		wantSyntax(t, "components.Finding.UnmarshalJSON", in, f.UnmarshalJSON([]byte(in)))
		var s Series[units.Length]
		wantSyntax(t, "components.Series.UnmarshalJSON", in, s.UnmarshalJSON([]byte(in)))
		if c != (Check[float64]{}) || ch != (Choice[units.Length]{}) || s.Len() != 0 || f.Topic != "" {
			t.Errorf("%q: a receiver changed on error", in)
		}
	}
	// An error of a field's own text keeps its sentinel.
	var c Check[units.Pressure]
	if err := c.UnmarshalJSON([]byte(`{"value":"5 furlongs"}`)); !errors.Is(err, units.ErrUnknownUnit) {
		t.Errorf("unknown unit in a check: err = %v; want units.ErrUnknownUnit", err)
	}
}

func wantSyntax(t *testing.T, fn, in string, err error) {
	t.Helper()
	var pe *units.ParseError
	if !errors.As(err, &pe) || !errors.Is(err, units.ErrSyntax) || pe.Func != fn || pe.Input != in {
		t.Errorf("%s(%q): err = %v; want a *units.ParseError from %s matching units.ErrSyntax", fn, in, err, fn)
	}
}

// FuzzUnmarshalJSON reads arbitrary JSON into each type of the vocabulary:
// no panic, every error matches a units sentinel, and what reads writes
// back.
func FuzzUnmarshalJSON(f *testing.F) {
	for _, s := range []string{
		`{"value":"210 bar","limit":"250 bar","bound":"at most","rule":{"kind":"caller","source":"rating"}}`,
		`{"required":"56 mm","chosen":"63 mm","series":"bores","rule":{"kind":"standard","source":"ISO 3320"}}`,
		`{"severity":"caution","hazard":"hot surface","topic":"t","text":"100 % sure","rule":{"kind":"physics"}}`,
		`{"name":"x","sizes":["1 mm","2 mm"],"second":["2 mm"]}`, `{"sizes":["2 mm","1 mm"]}`,
		`{"value":"1e400 bar"}`, `{"bound":"sideways"}`, `null`, `{`, `"`, `[]`,
	} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		var c Check[units.Pressure]
		var ch Choice[units.Length]
		var fd Finding
		var sr Series[units.Length]
		for _, v := range []interface {
			json.Unmarshaler
			json.Marshaler
		}{&c, &ch, &fd, &sr} {
			if err := v.UnmarshalJSON([]byte(s)); err != nil {
				if !isUnitsError(err) {
					t.Fatalf("%T.UnmarshalJSON(%q): %v matches no units sentinel", v, s, err)
				}
				continue
			}
			if _, err := v.MarshalJSON(); err != nil && !isUnitsError(err) {
				t.Fatalf("%T read %q but MarshalJSON fails: %v", v, s, err)
			}
		}
	})
}

// FuzzEnumUnmarshalText reads arbitrary text as each enumeration: a name
// reads back as written, anything else is a *units.ParseError matching
// units.ErrSyntax.
func FuzzEnumUnmarshalText(f *testing.F) {
	for _, s := range []string{"danger", "hot surface", "common practice", "at least", "", "DANGER", "none "} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		var sev Severity
		var hz Hazard
		var k RuleKind
		var b Bound
		for _, v := range []interface {
			UnmarshalText([]byte) error
			MarshalText() ([]byte, error)
		}{&sev, &hz, &k, &b} {
			if err := v.UnmarshalText([]byte(s)); err != nil {
				var pe *units.ParseError
				if !errors.As(err, &pe) || !errors.Is(err, units.ErrSyntax) || pe.Input != s {
					t.Fatalf("%T.UnmarshalText(%q): %v", v, s, err)
				}
				continue
			}
			if back, err := v.MarshalText(); err != nil || string(back) != s {
				t.Fatalf("%T read %q but writes %q, %v", v, s, back, err)
			}
		}
	})
}
