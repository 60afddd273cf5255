package components

import "strings"

// About returns the finding with its sentence put about subject, a part of
// the machine ("press", "return filter"): the sentence begins with the
// subject and a colon, in every unit system. A family that sizes one part
// at a time writes its sentences without naming the part; a program that
// gathers the findings of many parts names each with About, so a reader
// knows which part a finding is about and Merge keeps the same finding of
// two parts apart. The severity, hazard, topic and rule are unchanged.
func (f Finding) About(subject string) Finding {
	f.format = strings.ReplaceAll(subject, "%", "%%") + ": " + f.format
	return f
}
