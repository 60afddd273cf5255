package validate

// Renamed returns err as the caller of fn sees it, when err is a *RangeError
// from a function that fn called with the caller's values: a copy with Func
// set to fn and Param mapped by param (line.Barlow's "strength" is
// line.SelectTube's "Strength"). Any other error, and nil, come back
// unchanged; err itself is never modified. It allocates only on error.
func Renamed(err error, fn string, param func(string) string) error {
	re, ok := err.(*RangeError)
	if !ok {
		return err
	}
	c := *re
	c.Func, c.Param = fn, param(c.Param)
	return &c
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
