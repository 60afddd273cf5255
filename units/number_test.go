package units

import (
	"encoding/json"
	"errors"
	"math"
	"strconv"
	"strings"
	"sync"
	"testing"

	"github.com/hydrosize/hydrosize/internal/checktest"
)

// A comma is ambiguous: "3,000" is three thousand in the US and three in
// much of Europe. The package refuses it and says why; a Parser reads the
// one convention its caller names.

func TestCommaRefused(t *testing.T) {
	for _, c := range []struct {
		in     string
		detail []string
	}{
		{"3,000 psi", []string{`"3,000" is 3000 where a comma groups thousands`, "and 3.000 where it is the decimal mark", "units.Parser"}},
		{"2,5 bar", []string{`"2,5" is 2.5 where a comma is the decimal mark`, "write 2.5"}},
		{"1,234.5 L/min", []string{`"1,234.5"`}},
		{"12,500,000 Pa", []string{"12500000"}},
		{"-0,5 bar", []string{`"0,5"`}},
		{"1 1,5/2 in", nil},
	} {
		for _, parse := range []func(string) (float64, error){pPressure, pFlow, pLength, pDynamic} {
			v, err := parse(c.in)
			if !errors.Is(err, ErrAmbiguous) && !errors.Is(err, ErrDimension) && !errors.Is(err, ErrSyntax) {
				t.Errorf("parse %q = %g, %v; want an error", c.in, v, err)
			}
		}
		_, err := Parse(c.in)
		if len(c.detail) > 0 && !errors.Is(err, ErrAmbiguous) {
			t.Errorf("Parse(%q): %v; want ErrAmbiguous", c.in, err)
			continue
		}
		for _, d := range c.detail {
			if !strings.Contains(err.Error(), d) {
				t.Errorf("Parse(%q): %v; want it to say %s", c.in, err, d)
			}
		}
	}
}

func TestParserConventions(t *testing.T) {
	eu := Parser{Decimal: ','}
	us := Parser{Group: ','}
	de := Parser{Decimal: ',', Group: '.'}
	for _, c := range []struct {
		p    Parser
		in   string
		want Pressure
	}{
		{eu, "2,5 bar", 2.5 * Bar},
		{eu, "0,8 bar vac", -0.8 * Bar},
		{eu, "55 bar", 55 * Bar},
		{us, "3,000 psi", 3000 * PSI},
		{us, "3,000.5 psi", 3000.5 * PSI},
		{us, "2.5 bar", 2.5 * Bar},
		{us, "12,500,000 Pa", 12500000 * Pascal},
		{de, "1.500,5 kPa", 1500.5 * Kilopascal},
		{de, "210 bar", 210 * Bar},
		{Parser{}, "210 bar", 210 * Bar},
		{Parser{Decimal: '.'}, "2.5 bar", 2.5 * Bar},
	} {
		got, err := c.p.ParsePressure(c.in)
		if err != nil || got != c.want {
			t.Errorf("%+v.ParsePressure(%q) = %v, %v; want %v", c.p, c.in, got, err, c.want)
		}
	}
	if l, err := eu.ParseLength("2 ft 6,5 in"); err != nil || l != 30.5*Inch {
		t.Errorf("eu.ParseLength(2 ft 6,5 in) = %v, %v", l, err)
	}
	if q, err := us.Parse("1,200 L/min"); err != nil || q.Value() != float64(1200*LitrePerMinute) {
		t.Errorf("us.Parse(1,200 L/min) = %v, %v", q, err)
	}
}

func TestParserRefusals(t *testing.T) {
	eu := Parser{Decimal: ','}
	us := Parser{Group: ','}
	for _, c := range []struct {
		p      Parser
		in     string
		want   error
		detail string
	}{
		{eu, "2.5 bar", ErrAmbiguous, "reads ',' as the decimal mark"},
		{us, "3,00 psi", ErrSyntax, "groups of three digits"},
		{us, "3000,000 psi", ErrSyntax, "at most three digits before"},
		{us, "3,0000 psi", ErrSyntax, "groups of three digits"},
		{Parser{}, "3,000 psi", ErrAmbiguous, "a comma in a number is ambiguous"},
	} {
		v, err := c.p.ParsePressure(c.in)
		if !errors.Is(err, c.want) || v != 0 || !strings.Contains(err.Error(), c.detail) {
			t.Errorf("%+v.ParsePressure(%q) = %v, %v; want %v saying %q", c.p, c.in, v, err, c.want, c.detail)
		}
		var pe *ParseError
		if errors.As(err, &pe) && (pe.Func != "units.Parser.ParsePressure" || pe.Input != c.in) {
			t.Errorf("%+v.ParsePressure(%q): ParseError{Func: %q, Input: %q}", c.p, c.in, pe.Func, pe.Input)
		}
	}
	// A Parser with a mark it cannot use names the field.
	for _, c := range []struct {
		p     Parser
		param string
	}{
		{Parser{Decimal: ';'}, "p.Decimal"},
		{Parser{Group: ' '}, "p.Group"},
		{Parser{Decimal: ',', Group: ','}, "p.Group"},
		{Parser{Group: '.'}, "p.Group"},
	} {
		v, err := c.p.ParsePressure("1 bar")
		checktest.RangeError(t, err, c.param)
		if v != 0 {
			t.Errorf("%+v.ParsePressure = %v with an error", c.p, v)
		}
		_, err = c.p.Parse("1 bar")
		checktest.RangeError(t, err, c.param)
	}
}

// TestParserConcurrent: a Parser is a value without state; many goroutines
// read with one at once (run with -race).
func TestParserConcurrent(t *testing.T) {
	eu := Parser{Decimal: ','}
	var wg sync.WaitGroup
	for range 8 {
		wg.Go(func() {
			for range 200 {
				if p, err := eu.ParsePressure("2,5 bar"); err != nil || p != 2.5*Bar {
					t.Errorf("ParsePressure = %v, %v", p, err)
					return
				}
			}
		})
	}
	wg.Wait()
}

// TestJSONBareNumberRefused: a quantity in JSON is a string with its unit;
// a bare number is refused with the text to write, and null leaves a value.
func TestJSONBareNumberRefused(t *testing.T) {
	var box struct {
		P Pressure
		Q Flow
	}
	err := json.Unmarshal([]byte(`{"P": 210}`), &box)
	if !errors.Is(err, ErrSyntax) || !strings.Contains(err.Error(), `"210 bar"`) || box.P != 0 {
		t.Errorf("json 210 into a Pressure = %v, %v; want ErrSyntax showing \"210 bar\"", box.P, err)
	}
	err = json.Unmarshal([]byte(`{"Q": 1.5e1}`), &box)
	if !errors.Is(err, ErrSyntax) || !strings.Contains(err.Error(), `"1.5e1 L/min"`) {
		t.Errorf("json 1.5e1 into a Flow: %v", err)
	}
	for _, bad := range []string{`{"P": true}`, `{"P": [1]}`, `{"P": {"v": 1}}`} {
		if err := json.Unmarshal([]byte(bad), &box); !errors.Is(err, ErrSyntax) {
			t.Errorf("json %s into a Pressure: %v; want ErrSyntax", bad, err)
		}
	}
	box.P = 3 * Bar
	if err := json.Unmarshal([]byte(`{"P": null}`), &box); err != nil || box.P != 3*Bar {
		t.Errorf("json null into a Pressure = %v, %v; want it unchanged", box.P, err)
	}
	if err := json.Unmarshal([]byte(`{"P": "210 bar", "Q": "12,5 L/min"}`), &box); !errors.Is(err, ErrAmbiguous) {
		t.Errorf("json with a comma: %v; want ErrAmbiguous", err)
	}
	if err := json.Unmarshal([]byte(`{"P": "3000 PSI"}`), &box); err != nil || box.P != 3000*PSI {
		t.Errorf("json 3000 PSI = %v, %v", box.P, err)
	}
	var pe *ParseError
	if err := json.Unmarshal([]byte(`{"P": 5}`), &box); !errors.As(err, &pe) || pe.Func != "units.Pressure.UnmarshalJSON" {
		t.Errorf("json 5: %#v; want a ParseError from units.Pressure.UnmarshalJSON", err)
	}
}

// FuzzParserConventions fuzzes the number conventions a Parser names (a
// decimal comma, a thousands mark): every error matches a sentinel and
// quotes the input, every success is finite, and its SI value and dimension
// read back through the package's own Parse.
func FuzzParserConventions(f *testing.F) {
	for _, s := range []string{"2,5 bar", "3,000 psi", "3,000.5 psi", "1.500,5 kPa", "12,500,000 Pa", "2 ft 6,5 in",
		"1,2,3 bar", ",5 bar", "5, bar", "1.2.3 bar", "1,5e3 Pa", "1 1/2,5 in", "0,8 bar vac", "1.5 N.m", "2,5"} {
		f.Add(s)
	}
	parsers := []Parser{{Decimal: ','}, {Group: ','}, {Decimal: ',', Group: '.'}, {Decimal: '.', Group: ','}}
	f.Fuzz(func(t *testing.T, s string) {
		for _, p := range parsers {
			q, err := p.Parse(s)
			if err != nil {
				checkParseError(t, "Parser.Parse", s, q.Value(), err)
				continue
			}
			v := q.Value()
			if math.IsNaN(v) || math.IsInf(v, 0) {
				t.Fatalf("%+v.Parse(%q) = %g with no error", p, s, v)
			}
			si := strconv.FormatFloat(v, 'g', -1, 64) + " (" + q.Dimension().String() + ")"
			if back, err := Parse(si); err != nil || back.Value() != v || back.Dimension() != q.Dimension() {
				t.Fatalf("%+v.Parse(%q) = %v; %q reads back as %v, %v", p, s, q, si, back, err)
			}
			if l, err := p.ParseLength(s); err == nil && (math.IsNaN(float64(l)) || math.IsInf(float64(l), 0)) {
				t.Fatalf("%+v.ParseLength(%q) = %v with no error", p, s, l)
			}
		}
	})
}

// commaInNumber reports whether s has one comma and only spaces, a sign
// and digits before it, so that the comma can only be the number's decimal
// separator.
func commaInNumber(s string) bool {
	i := strings.IndexByte(s, ',')
	if i < 0 || strings.Count(s, ",") != 1 {
		return false
	}
	return strings.Trim(s[:i], " +-0123456789") == ""
}

// FuzzParser fuzzes the Parser conventions: a success is finite and its
// error-free reading agrees across conventions where the text allows only
// one reading (a decimal-comma Parser reads "2,5" as the package reads
// "2.5"); an error matches a sentinel and quotes the input.
func FuzzParser(f *testing.F) {
	for _, s := range append(append([]string(nil), commonSeeds...), "2,5 bar", "3,000 psi", "1.500,5 kPa", "3,00 psi", "1,2,3 bar", ",5 bar", "2 ft 6,5 in", "1-1/2 in") {
		f.Add(s)
	}
	eu, us, de := Parser{Decimal: ','}, Parser{Group: ','}, Parser{Decimal: ',', Group: '.'}
	f.Fuzz(func(t *testing.T, s string) {
		for _, p := range []Parser{eu, us, de} {
			v, err := p.ParsePressure(s)
			if err != nil {
				checkParseError(t, "Parser.ParsePressure", s, float64(v), err)
				continue
			}
			if math.IsNaN(float64(v)) || math.IsInf(float64(v), 0) {
				t.Fatalf("%+v.ParsePressure(%q) = %v", p, s, v)
			}
		}
		if strings.Contains(s, ".") || !commaInNumber(s) {
			return // in a unit expression "." is a product ("0C0.psi" is C⁰·psi): no one reading to compare
		}
		a, errA := eu.ParsePressure(s)
		b, errB := ParsePressure(strings.ReplaceAll(s, ",", "."))
		if (errA == nil) != (errB == nil) || a != b {
			t.Fatalf("Parser{Decimal: ','} reads %q as %v, %v; the package reads the point form as %v, %v", s, a, errA, b, errB)
		}
	})
}
