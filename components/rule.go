package components

import (
	"encoding/json"
	"errors"
	"fmt"

	"github.com/hydrosize/hydrosize/internal/enum"
	"github.com/hydrosize/hydrosize/units"
)

// RuleKind says what kind of authority a [Rule] carries.
type RuleKind uint8

// Kinds of rule. The zero value, [Unstated], marks a rule nobody filled in;
// families never return it.
const (
	Unstated       RuleKind = iota // no rule given
	Standard                       // a published standard, with its clause or table
	Handbook                       // a handbook or textbook, with edition and table or example
	CommonPractice                 // a rule of thumb of the trade with no single source
	CallerValue                    // a value the caller supplied
	OurChoice                      // a documented choice of hydrosize's
	Physics                        // a law or exact definition (Pascal's law, NIST SP 811)
)

var ruleKindNames = [...]string{"unstated", "standard", "handbook", "common practice", "caller", "our choice", "physics"}

// String returns the kind's name in words: "standard", "common practice", ….
func (k RuleKind) String() string {
	if int(k) < len(ruleKindNames) {
		return ruleKindNames[k]
	}
	return fmt.Sprintf("RuleKind(%d)", uint8(k))
}

// MarshalText writes the kind's name.
func (k RuleKind) MarshalText() ([]byte, error) {
	return enum.Marshal("components.RuleKind.MarshalText", k, ruleKindNames[:])
}

// UnmarshalText reads a name written by MarshalText.
func (k *RuleKind) UnmarshalText(b []byte) error {
	return enum.Unmarshal("components.RuleKind.UnmarshalText", b, k, ruleKindNames[:])
}

// Rule says where a number or a limit comes from: its kind and, for a
// standard or handbook, the document and clause ("ISO 3320:2013, Table 1");
// for common practice or our choice, a few words naming the rule.
type Rule struct {
	Kind   RuleKind `json:"kind"`
	Source string   `json:"source"`
}

// StandardRule returns a rule citing a standard: "ISO 4413:2010, 5.4.3".
func StandardRule(source string) Rule { return Rule{Kind: Standard, Source: source} }

// HandbookRule returns a rule citing a handbook or textbook by title,
// edition and table or example.
func HandbookRule(source string) Rule { return Rule{Kind: Handbook, Source: source} }

// PracticeRule returns a rule of thumb of the trade, named in a few words.
func PracticeRule(what string) Rule { return Rule{Kind: CommonPractice, Source: what} }

// CallerRule returns a rule for a value the caller supplied, named by the
// parameter or field it came from.
func CallerRule(param string) Rule { return Rule{Kind: CallerValue, Source: param} }

// OurRule returns a rule for a documented choice of hydrosize's.
func OurRule(what string) Rule { return Rule{Kind: OurChoice, Source: what} }

// PhysicsRule returns a rule for a law or an exact definition.
func PhysicsRule(what string) Rule { return Rule{Kind: Physics, Source: what} }

// String returns "kind: source", or the kind alone when there is no source.
func (r Rule) String() string {
	if r.Source == "" {
		return r.Kind.String()
	}
	return r.Kind.String() + ": " + r.Source
}

// decodeJSON is json.Unmarshal for the UnmarshalJSON method fn. An error
// that already matches a units sentinel (a quantity's or a name's own text)
// is returned as it is; any other (malformed JSON, a field of the wrong JSON
// type) becomes a *units.ParseError quoting the input and matching
// units.ErrSyntax.
func decodeJSON(fn string, b []byte, v any) error {
	err := json.Unmarshal(b, v)
	if err == nil || matchesSentinel(err) {
		return err
	}
	return &units.ParseError{Func: fn, Input: string(b), Err: units.ErrSyntax, Detail: err.Error()}
}

func matchesSentinel(err error) bool {
	for _, s := range [...]error{units.ErrSyntax, units.ErrUnknownUnit, units.ErrDimension, units.ErrRange,
		units.ErrReference, units.ErrAmbiguous} {
		if errors.Is(err, s) {
			return true
		}
	}
	return false
}
