package validate

// Renamed returns err as the caller of fn sees it, when err is a *RangeError
// from a function that fn called with the caller's values: a copy with Func
// set to fn and Param mapped by param (line.Barlow's "strength" is
// line.SelectTube's "Strength"); a nil param keeps the names. A range error
// carried by Kind is renamed the same way and keeps its kind. Any other
// error, and nil, come back unchanged; err itself is never modified. It
// allocates only on error.
func Renamed(err error, fn string, param func(string) string) error {
	switch e := err.(type) {
	case *RangeError:
		c := *e
		c.Func = fn
		if param != nil {
			c.Param = param(c.Param)
		}
		return &c
	case *kindError:
		return &kindError{err: Renamed(e.err, fn, param), kind: e.kind}
	}
	return err
}

// Fields returns a param mapping for Renamed: a parameter named in names
// becomes its value there, any other gets prefix put before it ("Bulk.K0"
// → "Fluid.Bulk.K0").
func Fields(prefix string, names map[string]string) func(string) string {
	return func(p string) string {
		if n, ok := names[p]; ok {
			return n
		}
		return prefix + p
	}
}

// Param returns a param mapping for Renamed that names every parameter
// name: a helper's error reported under the caller's own argument or field.
// An empty name keeps the helper's parameter.
func Param(name string) func(string) string {
	if name == "" {
		return nil
	}
	return func(string) string { return name }
}
