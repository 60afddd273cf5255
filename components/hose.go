package components

import (
	"strconv"
	"strings"

	"github.com/hydrosize/hydrosize/units"
)

// HoseSize is a hydraulic hose size by its SAE J517 dash number: the
// nominal inside diameter in sixteenths of an inch, so -8 is ½ in and -16 is
// 1 in. The dash numbers of SAE J517's 100R series run from -3 to -64
// (see [HoseSizes]).
//
// For most SAE 100R hose types the dash number is the nominal inside
// diameter; a few (100R5 and 100R14 among them) number their sizes after the
// tube they replace, so their true bore is smaller than [HoseSize.ID]: check
// the hose type's own table before relying on the bore of such a hose.
type HoseSize uint8

// hoseDashes are the dash numbers of SAE J517 100R-series hose (from
// memory; the rule "dash number = ID in sixteenths of an inch" is SAE J517).
var hoseDashes = [...]HoseSize{3, 4, 5, 6, 8, 10, 12, 16, 20, 24, 32, 40, 48, 56, 64}

var hoseSizes = func() Series[units.Length] {
	ids := make([]units.Length, len(hoseDashes))
	for i, h := range hoseDashes {
		ids[i] = h.ID()
	}
	return fixed("SAE J517 hose sizes", StandardRule("SAE J517, dash size"), ids, nil)
}()

// ID returns the nominal inside diameter, n/16 in for dash number n (SAE
// J517), plain float64 arithmetic.
func (h HoseSize) ID() units.Length { return units.Length(h) * (units.Inch / 16) }

// String writes the dash number: "-8".
func (h HoseSize) String() string { return "-" + strconv.Itoa(int(h)) }

// MarshalText writes the dash number, "-8". It refuses, with a
// *units.RangeError matching units.ErrRange, a number that is not one of
// the SAE J517 dash sizes of [HoseSizes], which UnmarshalText would refuse.
func (h HoseSize) MarshalText() ([]byte, error) {
	if !h.listed() {
		return nil, &units.RangeError{Func: "components.HoseSize.MarshalText", Param: "h",
			Value: h.String(), Valid: "an SAE J517 dash size:" + dashList()}
	}
	return []byte(h.String()), nil
}

// listed reports whether h is one of the SAE J517 dash sizes.
func (h HoseSize) listed() bool {
	for _, d := range hoseDashes {
		if d == h {
			return true
		}
	}
	return false
}

// UnmarshalText reads a hose size as [ParseHoseSize] does.
func (h *HoseSize) UnmarshalText(b []byte) error {
	v, err := parseHoseSize("components.HoseSize.UnmarshalText", string(b))
	if err != nil {
		return err
	}
	*h = v
	return nil
}

// HoseSizes returns the nominal inside diameters of the SAE J517 dash sizes
// -3 -4 -5 -6 -8 -10 -12 -16 -20 -24 -32 -40 -48 -56 -64, that is 3/16 in to
// 4 in (the dash-number rule is SAE J517; the list of sizes is recalled, from
// memory). Each hose type covers only part of the list. Map a chosen
// diameter back to its dash number with [HoseSizeOf].
func HoseSizes() Series[units.Length] { return hoseSizes }

// HoseSizeOf returns the dash number whose nominal inside diameter is id,
// and false when id is not one of [HoseSizes].
func HoseSizeOf(id units.Length) (HoseSize, bool) {
	for _, h := range hoseDashes {
		if h.ID() == id {
			return h, true
		}
	}
	return 0, false
}

// ParseHoseSize reads a hose dash size. The grammar, around optional spaces:
//
//	size   = [prefix] digits
//	prefix = "-" | "−" | "#" | "dash" [spaces] ["-"]   ("dash" in any case)
//	digits = one to three decimal digits ("-08" reads as -8)
//
// so "-8", "8", "#8", "−8", "-08", "dash 8" and "DASH-8" all read as -8.
// The number must be one of the SAE J517 dash sizes of [HoseSizes].
// Errors are *units.ParseError values that quote the input and the offset:
// bad text matches units.ErrSyntax, a number that is not a dash size
// matches units.ErrRange. It does not allocate on success.
func ParseHoseSize(s string) (HoseSize, error) {
	return parseHoseSize("components.ParseHoseSize", s)
}

func parseHoseSize(fn, input string) (HoseSize, error) {
	syntax := func(pos int, detail string) error {
		return &units.ParseError{Func: fn, Input: input, Pos: pos, Err: units.ErrSyntax, Detail: detail}
	}
	i := skipSpaces(input, 0)
	switch rest := input[i:]; {
	case strings.HasPrefix(rest, "-"), strings.HasPrefix(rest, "#"):
		i++
	case strings.HasPrefix(rest, "−"):
		i += len("−")
	case len(rest) >= 4 && strings.EqualFold(rest[:4], "dash"):
		i = skipSpaces(input, i+4)
		if strings.HasPrefix(input[i:], "-") {
			i++
		}
	}
	start := i
	n := 0
	for i < len(input) && input[i] >= '0' && input[i] <= '9' {
		if i-start == 3 {
			return 0, syntax(start, "want at most three digits")
		}
		n = 10*n + int(input[i]-'0')
		i++
	}
	if i == start {
		return 0, syntax(start, `want a dash number such as "-8"`)
	}
	if end := skipSpaces(input, i); end != len(input) {
		return 0, syntax(i, "unexpected text after the dash number")
	}
	if h := HoseSize(n); n <= 255 && h.listed() {
		return h, nil
	}
	return 0, &units.ParseError{Func: fn, Input: input, Pos: start, Err: units.ErrRange,
		Detail: "want an SAE J517 dash size:" + dashList()}
}

// dashList writes the dash sizes, " -3 -4 … -64", for an error message.
func dashList() string {
	var b []byte
	for _, h := range hoseDashes {
		b = append(b, " -"...)
		b = strconv.AppendInt(b, int64(h), 10)
	}
	return string(b)
}

func skipSpaces(s string, i int) int {
	for i < len(s) && (s[i] == ' ' || s[i] == '\t') {
		i++
	}
	return i
}
