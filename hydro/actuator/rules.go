package actuator

import (
	"errors"
	"math"

	"github.com/hydrosize/hydrosize/components"
	"github.com/hydrosize/hydrosize/internal/validate"
	"github.com/hydrosize/hydrosize/units"
)

// The rules the package's results cite. They are functions, not variables,
// so no caller can change them.

// ruleISO4413 is the safety standard for hydraulic systems, the basis of
// the load-holding and rated-pressure findings.
func ruleISO4413() components.Rule {
	return components.StandardRule("ISO 4413:2010, safety requirements for hydraulic systems and their components")
}

// prefixed returns err with prefix put before the parameter it names
// ("Column." + "Relief"), built only when there is an error. A parameter
// that is not a field (a lower-case parameter) is left as it is.
func prefixed(err error, prefix string) error {
	if err == nil {
		return nil
	}
	var re *units.RangeError
	if !errors.As(err, &re) || re.Param == "" || re.Param[0] < 'A' || re.Param[0] > 'Z' {
		return err
	}
	c := *re
	c.Param = prefix + c.Param
	return &c
}

// diameterOf returns the diameter of a circle of area a, d = √(4A/π), the
// inverse of units.CircleArea.
func diameterOf(a units.Area) units.Length { return units.Length(math.Sqrt(4 * float64(a) / math.Pi)) }

// output is one number of a result, named for the error that reports it.
type output struct {
	name string
	v    float64
}

// finite returns an error naming the first output that is NaN or ±Inf.
func finite(fn string, outs ...output) error {
	for _, o := range outs {
		if err := validate.Result(fn, o.name, o.v); err != nil {
			return err
		}
	}
	return nil
}
