package units

import (
	"encoding/json"
	"math"
	"strconv"
	"strings"
	"testing"
)

// Safety: a vacuum gauge at a pump inlet reads "28 inHg"; read as a gauge
// pressure of +28 inHg (+0.948 bar) it turns a cavitation check upside down.
// These tests hold that a mercury column without a vacuum word never gives a
// gauge pressure at all, and that a vacuum reading is always at or below
// ambient.

// TestVacuumSpellingsReadBack: every spelling of every vacuum unit reads, in
// ParsePressure, Parse and Convert, as minus the reading in the unit's
// positive counterpart; vacuum units are not display units (a pressure above
// ambient would print as a negative vacuum reading).
func TestVacuumSpellingsReadBack(t *testing.T) {
	n := 0
	for i := range unitTable {
		u := &unitTable[i]
		if !u.isVacuum() {
			continue
		}
		n++
		if fits(u, &typePressure) {
			t.Errorf("%q is a display unit of Pressure", u.sym)
		}
		for _, sp := range append([]string{u.sym}, u.aliases...) {
			for _, x := range []float64{0, 1, 28, 0.5, 1e-3} {
				s := strconv.FormatFloat(x, 'g', -1, 64) + " " + sp
				want := x * u.factor
				if p, err := ParsePressure(s); err != nil || float64(p) != want || (x > 0 && p >= 0) {
					t.Errorf("ParsePressure(%q) = %v, %v; want %.17g Pa", s, float64(p), err, want)
				}
				if q, err := Parse(s); err != nil || q.Value() != want {
					t.Errorf("Parse(%q) = %v, %v", s, q, err)
				}
				if back, err := Convert(want, "Pa", sp); err != nil || math.Abs(back-x) > 1e-15*x {
					t.Errorf("Convert(%g Pa, %q) = %.17g, %v; want %g", want, sp, back, err, x)
				}
			}
		}
	}
	if n != 5 {
		t.Errorf("%d vacuum units, want 5 (inHg, mmHg, kPa, bar, psi)", n)
	}
}

// mercurySpellings are the plain mercury-column and torr spellings, as
// typed, in other letter cases and with decorations an expression allows.
func mercurySpellings() []string {
	var out []string
	for _, sym := range []string{"inHg", "mmHg", "Torr"} {
		for i := range unitTable {
			u := &unitTable[i]
			if u.sym != sym {
				continue
			}
			for _, sp := range append([]string{u.sym}, u.aliases...) {
				out = append(out, sp, strings.ToUpper(sp), strings.ToLower(sp),
					"("+sp+")", sp+"^1", sp+"·Pa/Pa", "kPa·"+sp+"/kPa", sp+"*1", "1*"+sp, sp+"/1")
			}
		}
	}
	return out
}

// TestPlainMercuryNeverGauge: no plain inHg, mmHg or Torr reading, in any
// spelling, case or expression, gives a positive gauge Pressure through
// ParsePressure, UnmarshalText, JSON or Parse(...).Pressure(); each is an
// error (ErrReference, or a refusal of the spelling).
func TestPlainMercuryNeverGauge(t *testing.T) {
	for _, sp := range mercurySpellings() {
		for _, num := range []string{"28", "29.92", "0.5", "760", "1e3"} {
			s := num + " " + sp
			if p, err := ParsePressure(s); err == nil || p != 0 {
				t.Errorf("ParsePressure(%q) = %v, %v; want an error", s, p, err)
			}
			var p Pressure
			if err := p.UnmarshalText([]byte(s)); err == nil || p != 0 {
				t.Errorf("Pressure.UnmarshalText(%q) = %v, %v; want an error", s, p, err)
			}
			var box struct{ P Pressure }
			if err := json.Unmarshal([]byte(`{"P":"`+strings.ReplaceAll(s, `"`, `\"`)+`"}`), &box); err == nil || box.P != 0 {
				t.Errorf("json %q into a Pressure = %v, %v; want an error", s, box.P, err)
			}
			if q, err := Parse(s); err == nil {
				if p, err := q.Pressure(); err == nil || p != 0 {
					t.Errorf("Parse(%q).Pressure() = %v, %v; want an error", s, p, err)
				}
			}
		}
	}
}

// FuzzParsePressureMercury: whatever the text, a Pressure read from it is
// never positive when the text names mercury or torr without a vacuum word.
func FuzzParsePressureMercury(f *testing.F) {
	for _, sp := range mercurySpellings() {
		f.Add("28 " + sp)
	}
	for _, s := range []string{"28 inHg vac", "28 inHgV", "600 mmHg vacuum", "-5 inHg vac", "28 inHg vac/s", "1 psi·inHg/inHg"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		p, err := ParsePressure(s)
		if err != nil || p <= 0 {
			return
		}
		low := strings.ToLower(s)
		if (strings.Contains(low, "hg") || strings.Contains(low, "torr")) && !strings.Contains(low, "vac") && !strings.Contains(low, "hgv") {
			t.Fatalf("ParsePressure(%q) = %v: a plain mercury column read as a positive gauge pressure", s, p)
		}
	})
}
