package units

import (
	"strconv"
	"testing"
)

// fastNumber must agree bit for bit with strconv.ParseFloat, the reference,
// whenever it claims an input, and must leave every odd form to the general
// path.
func TestFastNumberAgreesWithStrconv(t *testing.T) {
	for _, s := range []string{
		"0", "-0", "+0", "55", "55.", ".5", "0.1", "0.3", "1.3", "-12.75", "123456789012345",
		"1e22", "1e-22", "9007199254740991", "3.14159e2", "2.5E-3", "0.000001", "7e+5",
		"100000000000000000000000", "1e23", "1.7976931348623157e308", "5e-324",
		"", "-", ".", "e5", "1e", "1e+", "0x10", "1_0", "1..2", "NaN", "Inf",
	} {
		f, n, ok := fastNumber(s)
		if !ok {
			continue
		}
		want, err := strconv.ParseFloat(s[:n], 64)
		if err != nil || f != want || (f == 0 && (1/f > 0) != (1/want > 0)) {
			t.Errorf("fastNumber(%q) = %v (%d bytes), strconv says %v, %v", s, f, n, want, err)
		}
		if n != len(s) {
			t.Errorf("fastNumber(%q) read %d bytes of %d", s, n, len(s))
		}
	}
}

func FuzzFastNumber(f *testing.F) {
	for _, s := range []string{"55", "1.3", "-0.25e3", "123456789012345", ".5", "5.", "1e-22"} {
		f.Add(s)
	}
	f.Fuzz(func(t *testing.T, s string) {
		v, n, ok := fastNumber(s)
		if !ok {
			return
		}
		want, err := strconv.ParseFloat(s[:n], 64)
		if err != nil || v != want {
			t.Fatalf("fastNumber(%q) = %v over %d bytes; strconv.ParseFloat = %v, %v", s, v, n, want, err)
		}
	})
}
