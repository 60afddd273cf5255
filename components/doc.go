// Package components holds what every hydrosize family shares: the standard
// size series a sizing lands on, and the small vocabulary in which every
// sizing result explains itself.
//
// # The vocabulary of a result
//
// A reviewer can ask of any number in a hydrosize result where it came from,
// and a program can act on a result without parsing its text:
//
//   - [Rule] says where a number or a limit comes from: a standard with its
//     clause, a handbook, common practice, the caller's own value, or a
//     choice of ours that the documentation states.
//   - [Choice] is a standard size picked for a computed requirement: the
//     required value, the chosen one, the series it came from and the margin.
//   - [Check] is a computed value held against a limit: the value, the
//     limit, which side of it passes, the ratio and the verdict.
//   - [Finding] is a statement for the reader: a severity (the ANSI Z535 /
//     ISO 3864 signal words notice, caution, warning, danger), a hazard kind
//     (stored energy, suspended load, burst, …, or none for a design note),
//     a stable topic key, one plain sentence and the rule behind it.
//     [Findings] merge without duplicates, filter by hazard or severity, and
//     sort with the most severe first.
//
// A finding's sentence quotes numbers as typed quantities, so the same
// finding reads in metric or US customary units ([Finding.Text]); its
// citation is its [Rule], never part of the sentence.
//
// Findings support, but do not replace, the judgement of a qualified
// engineer: design and verify to ISO 4413, the component makers' ratings,
// local codes and licensed practice.
//
// # Series
//
// [Series] is an ordered list of standard sizes with a name and a [Rule];
// [Series.Next] finds the smallest size at or above a requirement and
// [Series.Select] returns that pick as a [Choice].
package components
