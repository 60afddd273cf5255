package units

// JSON input for every quantity type: a quantity is a string with its unit.
// A bare JSON number would otherwise be stored as a number of SI units
// without a word (encoding/json sets a float64 kind directly), so it is
// refused with the text to write instead.

import (
	"encoding/json"
	"strconv"
)

// unmarshalJSON reads the JSON value data into the SI value of type t, for
// the method fn, whose metric unit is metric: a string as the typed parser
// reads it; null leaves the
// value as it was (set is false); a number, or any other JSON value, is an
// ErrSyntax error that shows the quantity written with its unit.
func unmarshalJSON(fn string, data []byte, metric *unitDef, t *typeInfo) (v float64, set bool, err error) {
	switch {
	case string(data) == "null":
		return 0, false, nil
	case len(data) > 0 && data[0] == '"':
		var s string
		if err := json.Unmarshal(data, &s); err != nil {
			return 0, false, &ParseError{Func: fn, Input: string(data), Err: ErrSyntax, Detail: "not a JSON string"}
		}
		v, err := parseTyped(fn, s, t)
		return v, err == nil, err
	}
	text := string(data)
	e := &ParseError{Func: fn, Input: text, Pos: len(text), Err: ErrSyntax,
		Detail: "want a string with a unit, such as " + strconv.Quote("1 "+metric.sym)}
	if _, n, f := readNumber(text, numberStyle{}); f.err == nil && n == len(text) {
		e.Detail = "a number without a unit: write the quantity as a string with its unit, such as " +
			strconv.Quote(text+" "+metric.sym)
	}
	return 0, false, e
}
