package validate

// Sentinel returns a package sentinel error with message msg that also
// matches units.ErrRange with errors.Is, so a family's own sentinel
// (contamination.ErrOrder, fluid.ErrNoGrade, …) keeps the promise that
// every input error matches a units sentinel.
func Sentinel(msg string) error { return &sentinel{msg} }

type sentinel struct{ msg string }

func (e *sentinel) Error() string { return e.msg }

// Is reports whether target is ErrRange (units.ErrRange).
func (e *sentinel) Is(target error) bool { return target == ErrRange }

// Kind returns err, a *RangeError (units.RangeError), marked also as kind (a sentinel):
// the result matches both with errors.Is, errors.As finds the
// *RangeError, and its text is err's followed by kind's. A nil err
// gives nil.
func Kind(err, kind error) error {
	if err == nil {
		return nil
	}
	return &kindError{err: err, kind: kind}
}

type kindError struct{ err, kind error }

func (e *kindError) Error() string { return e.err.Error() + ": " + e.kind.Error() }

// Unwrap returns the range error and the kind.
func (e *kindError) Unwrap() []error { return []error{e.err, e.kind} }

// PositiveResult checks that a computed result that must be > 0 is finite
// and > 0: one that underflowed to 0 (or overflowed) is an error naming the
// result, not a silent 0.
func PositiveResult[T ~float64](fn, name string, v T) error {
	if bad(float64(v)) || v <= 0 {
		return Fail(fn, name, v, "a finite result > 0 (inputs too extreme: the result under- or overflows)")
	}
	return nil
}
