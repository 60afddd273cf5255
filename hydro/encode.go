package hydro

import (
	"bytes"
	"encoding"
	"encoding/json"
	"math"
	"reflect"
	"strconv"
	"time"

	"github.com/hydrosize/hydrosize/units"
)

// MarshalJSON writes the spec in the form [ParseSpec] reads: quantities as
// strings with their unit (each quantity's MarshalText, which reads back to
// the identical value), durations as seconds ("2.5 s"), and fields left at
// their zero value left out.
func (s Spec) MarshalJSON() ([]byte, error) {
	return encodeJSON(reflect.ValueOf(s))
}

// encodeJSON writes struct v as JSON, field by field.
func encodeJSON(v reflect.Value) ([]byte, error) {
	var b bytes.Buffer
	if err := encodeStruct(&b, v, ""); err != nil {
		return nil, err
	}
	return b.Bytes(), nil
}

var (
	marshalerTy = reflect.TypeFor[encoding.TextMarshaler]()
	jsonTy      = reflect.TypeFor[json.Marshaler]()
)

// encodeValue writes v as JSON; path names it in errors.
func encodeValue(b *bytes.Buffer, v reflect.Value, path string) error {
	t := v.Type()
	switch {
	case t == durationType:
		writeDuration(b, time.Duration(v.Int()))
		return nil
	case t.Implements(jsonTy):
		j, err := v.Interface().(json.Marshaler).MarshalJSON()
		if err != nil {
			return &FieldError{Path: path, Err: err}
		}
		b.Write(j)
		return nil
	case t.Implements(marshalerTy):
		text, err := v.Interface().(encoding.TextMarshaler).MarshalText()
		if err != nil {
			return &FieldError{Path: path, Err: err}
		}
		writeString(b, string(text))
		return nil
	}
	switch t.Kind() {
	case reflect.Struct:
		return encodeStruct(b, v, path)
	case reflect.Pointer:
		return encodeValue(b, v.Elem(), path)
	case reflect.Slice, reflect.Array:
		b.WriteByte('[')
		for i := range v.Len() {
			if i > 0 {
				b.WriteByte(',')
			}
			if err := encodeValue(b, v.Index(i), index(path, i)); err != nil {
				return err
			}
		}
		b.WriteByte(']')
	case reflect.String:
		writeString(b, v.String())
	case reflect.Bool:
		b.WriteString(strconv.FormatBool(v.Bool()))
	case reflect.Float64:
		f := v.Float()
		if math.IsNaN(f) || math.IsInf(f, 0) {
			return &FieldError{Path: path, Err: &units.RangeError{Func: "hydro.Spec.MarshalJSON", Param: path,
				Value: strconv.FormatFloat(f, 'g', -1, 64), Valid: "a finite number"}}
		}
		b.WriteString(strconv.FormatFloat(f, 'g', -1, 64))
	case reflect.Int:
		b.WriteString(strconv.FormatInt(v.Int(), 10))
	}
	return nil
}

// valueTy is the interface of the report's Value types, whose number is
// written even when it is zero: it has a rule, so it was worked out.
var valueTy = reflect.TypeFor[interface{ ruled() }]()

// encodeStruct writes the fields of v that are not zero, by JSON name, and
// a Value's number always.
func encodeStruct(b *bytes.Buffer, v reflect.Value, path string) error {
	b.WriteByte('{')
	first := true
	ruled := v.Type().Implements(valueTy)
	for i := range v.NumField() {
		name := jsonName(v.Type().Field(i))
		f := v.Field(i)
		if name == "" || f.IsZero() && !(ruled && name == "value") {
			continue
		}
		if !first {
			b.WriteByte(',')
		}
		first = false
		writeString(b, name)
		b.WriteByte(':')
		if err := encodeValue(b, f, join(path, name)); err != nil {
			return err
		}
	}
	b.WriteByte('}')
	return nil
}

// writeDuration writes d in seconds, "2.5 s".
func writeDuration(b *bytes.Buffer, d time.Duration) {
	writeString(b, strconv.FormatFloat(d.Seconds(), 'g', -1, 64)+" s")
}

func writeString(b *bytes.Buffer, s string) {
	q, _ := json.Marshal(s) // a string always marshals
	b.Write(q)
}
