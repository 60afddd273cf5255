package hydro

import (
	"bytes"
	"encoding"
	"encoding/json"
	"errors"
	"io"
	"math"
	"reflect"
	"strconv"
	"strings"
	"time"

	"github.com/hydrosize/hydrosize/units"
)

const (
	decodeFn   = "hydro.ParseSpec"
	validateFn = "hydro.Spec.Validate"
)

// ParseSpec reads a spec from JSON and validates it ([Spec.Validate]). On
// any problem it returns the zero Spec and a *[SpecError] listing every
// problem, reading and validation alike, each with its JSON path:
//
//   - text that is not JSON, with the path reached and the line and column;
//   - an unknown field (with the fields that are known there) or a field
//     given twice;
//   - a value of the wrong JSON type, such as a bare number where a
//     quantity is wanted ("stroke": 800 instead of "stroke": "800 mm") or
//     a string where a list is;
//   - a quantity whose text does not read as that quantity (an unknown
//     unit, a unit of the wrong dimension; units' own parse error, which
//     lists what it could mean);
//   - every validation problem of the decoded spec, except at a field that
//     could not be read (its problem is already listed).
//
// Quantities are strings with a unit, read by the quantity's UnmarshalText
// ("210 bar", "2 750 psi" is refused: no digit grouping); durations are
// strings with a unit of time ("2.5 s", "500 ms", "2 min", "1 h"); a JSON
// null leaves a field unset.
func ParseSpec(data []byte) (Spec, error) {
	var s Spec
	var ps problems
	if !decodeSpec(data, &s, &ps) {
		return Spec{}, ps.err()
	}
	read := len(ps.list)
	s.check(&ps)
	ps.list = append(ps.list[:read], unread(ps.list[:read], ps.list[read:])...)
	if err := ps.err(); err != nil {
		return Spec{}, err
	}
	return s, nil
}

// ReadSpec is ParseSpec on everything r holds.
func ReadSpec(r io.Reader) (Spec, error) {
	data, err := io.ReadAll(r)
	if err != nil {
		return Spec{}, &SpecError{Problems: []*FieldError{{Err: err}}}
	}
	return ParseSpec(data)
}

// UnmarshalJSON reads a spec as [ParseSpec] does, without validating it:
// json.Unmarshal(data, &spec) refuses bare numbers for quantities and lists
// every reading problem in a *[SpecError]. Call [Spec.Validate] next, or
// use ParseSpec for both.
func (s *Spec) UnmarshalJSON(data []byte) error {
	var out Spec
	var ps problems
	decodeSpec(data, &out, &ps)
	if err := ps.err(); err != nil {
		return err
	}
	*s = out
	return nil
}

// unread returns the validation problems vs that are not at, or under, a
// path in read (a field that could not be read would only be reported
// again as missing).
func unread(read, vs []*FieldError) []*FieldError {
	var out []*FieldError
	for _, v := range vs {
		covered := false
		for _, r := range read {
			if under(v.Path, r.Path) {
				covered = true
				break
			}
		}
		if !covered {
			out = append(out, v)
		}
	}
	return out
}

// under reports whether path p is at or under path q.
func under(p, q string) bool {
	if q == "" {
		return true
	}
	if !strings.HasPrefix(p, q) {
		return false
	}
	return len(p) == len(q) || p[len(q)] == '.' || p[len(q)] == '['
}

// node is one JSON value, read with the path it was found at.
type node struct {
	kind byte   // 'o' object, 'a' array, 's' string, 'n' number, 'b' bool, 'z' null
	text string // a string's value, a number's text
	b    bool
	keys []string // object keys, in order
	vals []*node  // object values or array elements
}

// decodeSpec reads data into s, adding every problem to ps. It returns
// false when data is not a JSON object at all, so that there is nothing to
// validate.
func decodeSpec(data []byte, s *Spec, ps *problems) bool {
	dec := json.NewDecoder(bytes.NewReader(data))
	dec.UseNumber()
	n, ok := readNode(dec, data, "", ps)
	if !ok {
		return false
	}
	if _, err := dec.Token(); err != io.EOF {
		off := dec.InputOffset()
		ps.syntax("", clip(string(data[min(off, int64(len(data))):])), "text after the spec's closing brace"+at(data, off))
		return false
	}
	if n.kind != 'o' {
		ps.syntax("", n.quote(), "want a JSON object, {…}")
		return false
	}
	decodeValue(n, reflect.ValueOf(s).Elem(), "", ps)
	return true
}

// readNode reads one value from dec; on a syntax error it records the error
// at path and returns false.
func readNode(dec *json.Decoder, data []byte, path string, ps *problems) (*node, bool) {
	tok, err := dec.Token()
	if err != nil {
		syntaxErr(data, dec, path, err, ps)
		return nil, false
	}
	switch t := tok.(type) {
	case json.Delim:
		if t == '{' {
			return readObject(dec, data, path, ps)
		}
		if t == '[' {
			return readArray(dec, data, path, ps)
		}
		syntaxErr(data, dec, path, errors.New("unexpected "+string(rune(t))), ps)
		return nil, false
	case string:
		return &node{kind: 's', text: t}, true
	case json.Number:
		return &node{kind: 'n', text: string(t)}, true
	case bool:
		return &node{kind: 'b', b: t}, true
	case nil:
		return &node{kind: 'z'}, true
	}
	return nil, false
}

func readObject(dec *json.Decoder, data []byte, path string, ps *problems) (*node, bool) {
	n := &node{kind: 'o'}
	for dec.More() {
		tok, err := dec.Token()
		if err != nil {
			syntaxErr(data, dec, path, err, ps)
			return nil, false
		}
		key, _ := tok.(string)
		v, ok := readNode(dec, data, join(path, key), ps)
		if !ok {
			return nil, false
		}
		n.keys = append(n.keys, key)
		n.vals = append(n.vals, v)
	}
	if _, err := dec.Token(); err != nil {
		syntaxErr(data, dec, path, err, ps)
		return nil, false
	}
	return n, true
}

func readArray(dec *json.Decoder, data []byte, path string, ps *problems) (*node, bool) {
	n := &node{kind: 'a'}
	for dec.More() {
		v, ok := readNode(dec, data, index(path, len(n.vals)), ps)
		if !ok {
			return nil, false
		}
		n.vals = append(n.vals, v)
	}
	if _, err := dec.Token(); err != nil {
		syntaxErr(data, dec, path, err, ps)
		return nil, false
	}
	return n, true
}

// syntaxErr records a JSON syntax error at path, with its line and column.
func syntaxErr(data []byte, dec *json.Decoder, path string, err error, ps *problems) {
	off := dec.InputOffset()
	var se *json.SyntaxError
	if errors.As(err, &se) {
		off = se.Offset
	}
	msg := err.Error()
	if err == io.EOF || errors.Is(err, io.ErrUnexpectedEOF) {
		msg = "the JSON ends too soon"
	}
	msg = strings.TrimPrefix(msg, "json: ")
	ps.add(path, &units.ParseError{Func: decodeFn, Input: "JSON", Pos: int(min(max(off, 0), int64(len(data)))),
		Err: units.ErrSyntax, Detail: msg + at(data, off)})
}

// at returns " (line L, column C)" for byte offset off of data.
func at(data []byte, off int64) string {
	off = min(max(off, 0), int64(len(data)))
	before := data[:off]
	line := bytes.Count(before, []byte{'\n'}) + 1
	col := off - int64(bytes.LastIndexByte(before, '\n'))
	return " (line " + strconv.Itoa(line) + ", column " + strconv.FormatInt(col, 10) + ")"
}

// clip shortens text quoted in an error to 40 bytes, at a rune boundary.
func clip(s string) string {
	const most = 40
	if len(s) <= most {
		return s
	}
	cut := most
	for cut > 0 && s[cut]&0xC0 == 0x80 {
		cut--
	}
	return s[:cut] + "…"
}

// join returns the path of field key under path: "site.altitude", or
// `actuators[0]["odd key"]` for a key that is not a plain name.
func join(path, key string) string {
	if !plainKey(key) {
		return path + "[" + strconv.Quote(key) + "]"
	}
	if path == "" {
		return key
	}
	return path + "." + key
}

// plainKey reports whether key is a non-empty run of ASCII letters, digits
// and underscores.
func plainKey(key string) bool {
	for _, r := range key {
		if !('a' <= r && r <= 'z' || 'A' <= r && r <= 'Z' || '0' <= r && r <= '9' || r == '_') {
			return false
		}
	}
	return key != ""
}

func index(path string, i int) string { return path + "[" + strconv.Itoa(i) + "]" }

var (
	durationType  = reflect.TypeFor[time.Duration]()
	unmarshalerTy = reflect.TypeFor[encoding.TextUnmarshaler]()
	unitsPkg      = reflect.TypeFor[units.Length]().PkgPath()
)

// decodeValue reads n into v, adding every problem to ps.
func decodeValue(n *node, v reflect.Value, path string, ps *problems) {
	if n.kind == 'z' {
		return // null: not given
	}
	t := v.Type()
	switch {
	case t == durationType:
		decodeDuration(n, v, path, ps)
		return
	case reflect.PointerTo(t).Implements(unmarshalerTy):
		decodeText(n, v, path, ps)
		return
	}
	switch t.Kind() {
	case reflect.Struct:
		decodeStruct(n, v, path, ps)
	case reflect.Pointer:
		elem := reflect.New(t.Elem())
		decodeValue(n, elem.Elem(), path, ps)
		v.Set(elem)
	case reflect.Slice:
		if n.kind != 'a' {
			wrongType(n, path, "a list, […]", ps)
			return
		}
		s := reflect.MakeSlice(t, len(n.vals), len(n.vals))
		for i, e := range n.vals {
			decodeValue(e, s.Index(i), index(path, i), ps)
		}
		v.Set(s)
	case reflect.Array:
		if n.kind != 'a' || len(n.vals) != t.Len() {
			wrongType(n, path, "a list of "+strconv.Itoa(t.Len())+" numbers, for ≥4, ≥6 and ≥14 µm(c)", ps)
			return
		}
		for i, e := range n.vals {
			decodeValue(e, v.Index(i), index(path, i), ps)
		}
	case reflect.String:
		if n.kind != 's' {
			wrongType(n, path, "a string, \"…\"", ps)
			return
		}
		v.SetString(n.text)
	case reflect.Bool:
		if n.kind != 'b' {
			wrongType(n, path, "true or false", ps)
			return
		}
		v.SetBool(n.b)
	case reflect.Float64:
		decodeFloat(n, v, path, ps)
	case reflect.Int:
		decodeInt(n, v, path, ps)
	}
}

// decodeStruct reads an object into the fields of struct v by their JSON
// names.
func decodeStruct(n *node, v reflect.Value, path string, ps *problems) {
	if n.kind != 'o' {
		wrongType(n, path, "an object, {…}", ps)
		return
	}
	t := v.Type()
	seen := make(map[string]bool, len(n.keys))
	for i, key := range n.keys {
		p := join(path, key)
		if seen[key] {
			ps.syntax(p, "", "the field is given twice")
			continue
		}
		seen[key] = true
		f, ok := fieldByJSON(t, key)
		if !ok {
			ps.syntax(p, "", "unknown field; the fields here are "+fieldNames(t))
			continue
		}
		decodeValue(n.vals[i], v.FieldByIndex(f.Index), p, ps)
	}
}

// jsonName returns the JSON name of struct field f, or "" when it has none.
func jsonName(f reflect.StructField) string {
	if !f.IsExported() {
		return ""
	}
	name, _, _ := strings.Cut(f.Tag.Get("json"), ",")
	if name == "-" {
		return ""
	}
	return name
}

func fieldByJSON(t reflect.Type, key string) (reflect.StructField, bool) {
	for i := range t.NumField() {
		if f := t.Field(i); jsonName(f) == key {
			return f, true
		}
	}
	return reflect.StructField{}, false
}

func fieldNames(t reflect.Type) string {
	var names []string
	for i := range t.NumField() {
		if n := jsonName(t.Field(i)); n != "" {
			names = append(names, n)
		}
	}
	return strings.Join(names, ", ")
}

// decodeText reads a string into a type with UnmarshalText (a quantity, a
// grade, a code); a bare number for a quantity is refused with the unit it
// needs.
func decodeText(n *node, v reflect.Value, path string, ps *problems) {
	t := v.Type()
	if n.kind == 'n' && t.PkgPath() == unitsPkg && t.Kind() == reflect.Float64 {
		ps.add(path, &units.ParseError{Func: decodeFn, Input: n.text, Pos: len(n.text), Err: units.ErrSyntax,
			Detail: "a number without a unit: write the quantity as a string with its unit, such as " +
				strconv.Quote(n.text+" "+exampleUnit(t))})
		return
	}
	if n.kind != 's' {
		want := "a string"
		if t.PkgPath() == unitsPkg {
			want = "a string with a unit, such as " + strconv.Quote("1 "+exampleUnit(t))
		}
		wrongType(n, path, want, ps)
		return
	}
	if err := v.Addr().Interface().(encoding.TextUnmarshaler).UnmarshalText([]byte(n.text)); err != nil {
		ps.add(path, err)
	}
}

// exampleUnit returns the unit quantity type t prints in (its metric
// trade unit: mm, bar, L/min), for hints.
func exampleUnit(t reflect.Type) string {
	if s, ok := reflect.Zero(t).Interface().(interface{ String() string }); ok {
		if _, unit, ok := strings.Cut(s.String(), " "); ok {
			return unit
		}
	}
	return "unit"
}

// decodeDuration reads a time with its unit: "2.5 s", "500 ms", "2 min".
func decodeDuration(n *node, v reflect.Value, path string, ps *problems) {
	const want = "a time with its unit, such as \"2.5 s\", \"500 ms\" or \"2 min\""
	if n.kind == 'n' {
		ps.add(path, &units.ParseError{Func: decodeFn, Input: n.text, Pos: len(n.text), Err: units.ErrSyntax,
			Detail: "a number without a unit: write it as " + strconv.Quote(n.text+" s")})
		return
	}
	if n.kind != 's' {
		wrongType(n, path, want, ps)
		return
	}
	d, err := parseDuration(n.text)
	if err != nil {
		ps.add(path, err)
		return
	}
	v.SetInt(int64(d))
}

// parseDuration reads a duration through units.Parse: a number and a unit
// of time (s, ms, min, h).
func parseDuration(s string) (time.Duration, error) {
	q, err := units.Parse(s)
	if err != nil {
		return 0, err
	}
	sec, err := q.In("s")
	if err != nil {
		return 0, &units.ParseError{Func: decodeFn, Input: s, Err: units.ErrDimension,
			Detail: "want a time, such as \"2.5 s\", \"500 ms\" or \"2 min\""}
	}
	ns := math.Round(sec * 1e9)
	if math.IsNaN(ns) || math.Abs(ns) >= math.MaxInt64 {
		return 0, &units.ParseError{Func: decodeFn, Input: s, Err: units.ErrRange,
			Detail: "want a time within ±292 years"}
	}
	return time.Duration(ns), nil
}

func decodeFloat(n *node, v reflect.Value, path string, ps *problems) {
	if n.kind != 'n' {
		wrongType(n, path, "a number", ps)
		return
	}
	f, err := strconv.ParseFloat(n.text, 64)
	if err != nil {
		ps.add(path, &units.ParseError{Func: decodeFn, Input: n.text, Err: units.ErrRange, Detail: "want a finite number"})
		return
	}
	v.SetFloat(f)
}

func decodeInt(n *node, v reflect.Value, path string, ps *problems) {
	if n.kind != 'n' {
		wrongType(n, path, "a whole number", ps)
		return
	}
	i, err := strconv.ParseInt(n.text, 10, 32)
	if err != nil {
		ps.add(path, &units.ParseError{Func: decodeFn, Input: n.text, Err: units.ErrSyntax, Detail: "want a whole number"})
		return
	}
	v.SetInt(i)
}

// wrongType records a JSON value of the wrong type.
func wrongType(n *node, path, want string, ps *problems) {
	ps.syntax(path, n.quote(), "want "+want)
}

// quote returns the value as the error quotes it.
func (n *node) quote() string {
	switch n.kind {
	case 'o':
		return "{…}"
	case 'a':
		return "[…]"
	case 's':
		return clip(strconv.Quote(n.text))
	case 'b':
		return strconv.FormatBool(n.b)
	}
	return clip(n.text)
}
