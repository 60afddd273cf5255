package units

import (
	"errors"
	"math"
	"strconv"
	"testing"
)

// The fast paths of Parse and Convert (a plain decimal and registered
// spellings, see parseRegistered and convertRegistered) must give what the
// general paths give, bit for bit, or leave the input to them.

var fastPathValues = []float64{0, 1, -1, 55, -2.5, 1e-300, 3e300, -3e300, 0.1, math.Copysign(0, -1)}

func TestConvertFastPathAgrees(t *testing.T) {
	for i := range unitTable {
		u := &unitTable[i]
		if u.noReg {
			continue
		}
		for j := range unitTable {
			w := &unitTable[j]
			if w.noReg || w.dim != u.dim {
				continue
			}
			for _, x := range fastPathValues {
				fast, ok := convertRegistered(x, u, w)
				slow, err := convertSlow(x, u.sym, w.sym)
				if !ok {
					continue
				}
				if err != nil || math.Float64bits(fast) != math.Float64bits(slow) {
					t.Errorf("Convert(%g, %q, %q): fast path %.17g, general path %.17g, %v", x, u.sym, w.sym, fast, slow, err)
				}
			}
		}
	}
}

func TestParseFastPathAgrees(t *testing.T) {
	for s := range spellings {
		for _, x := range fastPathValues {
			in := strconv.FormatFloat(x, 'g', -1, 64) + " " + s
			fast, fastErr := Parse(in)
			slow, err := parseQuantity("units.Parse", in, numberStyle{})
			ok := fastErr == nil
			if !ok {
				continue
			}
			if err != nil || fast != slow || math.Float64bits(fast.value) != math.Float64bits(slow.value) {
				t.Errorf("Parse(%q): fast path %+v, general path %+v, %v", in, fast, slow, err)
			}
		}
	}
	// Expressions and errors: the same result and the same message.
	for _, in := range append(append([]string(nil), commonSeeds...), "2 kW·h/(m²·K)", "5 lbf/MM", "9 1/min", "3 Mpa", "7 KG/CM2") {
		fast, fastErr := Parse(in)
		slow, err := parseQuantity("units.Parse", in, numberStyle{})
		if fast != slow || (fastErr == nil) != (err == nil) || (err != nil && fastErr.Error() != err.Error()) {
			t.Errorf("Parse(%q) = %+v, %v; general path %+v, %v", in, fast, fastErr, slow, err)
		}
	}
	// What the fast path leaves alone still fails on the general path.
	for _, in := range []string{"-5 inHg vac", "-1 K", "-1 bara", "1e308 ksi"} {
		if _, err := Parse(in); !errors.Is(err, ErrRange) {
			t.Errorf("Parse(%q): %v; want ErrRange", in, err)
		}
	}
}

// TestSpellTable: the hash table of the hot paths holds exactly the
// registered spellings and the folded ones.
func TestSpellTable(t *testing.T) {
	for s, i := range spellings {
		if j, ok := fastSpellings.get(s); !ok || j != i {
			t.Errorf("fastSpellings.get(%q) = %d, %v; want %d", s, j, ok, i)
		}
	}
	for _, s := range []string{"", "x", "barr", "Bar", "kW·h", "\x00", "psi "} {
		if _, ok := spellings[s]; ok {
			continue
		}
		if _, ok := fastSpellings.get(s); ok {
			t.Errorf("fastSpellings.get(%q) found a spelling that is not registered", s)
		}
	}
	for k := range folds {
		i, ok := foldIndex.get(k)
		if !ok {
			t.Errorf("foldIndex.get(%q) not found", k)
			continue
		}
		if e := foldEntries[i]; e.unit != folds[k].unit {
			t.Errorf("foldIndex %q: unit %d, want %d", k, e.unit, folds[k].unit)
		}
		if !foldFilter.mayFold(k) {
			t.Errorf("the fold filter drops %q", k)
		}
	}
}

// TestTempScaleIndex: every temperature point spelling's scale is one of
// tempScales, so the one-byte index in a Quantity loses nothing.
func TestTempScaleIndex(t *testing.T) {
	for i := range unitTable {
		u := &unitTable[i]
		if u.ref != refPoint {
			continue
		}
		s := scaleOf(resolvedOf(u))
		if tempScales[scaleIndex(s)] != s {
			t.Errorf("%q: scale %+v is not in tempScales", u.sym, s)
		}
	}
}
