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
// [Series] is an ordered, immutable list of standard sizes with a name and a
// [Rule], each size marked preferred or second choice. [Series.Next] finds
// the smallest size at or above a requirement (an error naming the largest
// when there is none), [Series.Above] the next larger size, [Series.Below]
// the next smaller, [Series.Floor] the largest at or below a limit and
// [Series.Nearest] the closest on a ratio scale; [Series.Select] returns the
// pick as a [Choice], and [Series.NextPreferred] and [Series.SelectPreferred]
// skip second-choice sizes. [Series.All] iterates; a Series reads and writes
// JSON, so a caller can load a catalog series of its own. Lookups do not
// allocate.
//
// # Standard series
//
// Each function returns the same immutable Series on every call; its doc
// gives the values and the source, and says which values were recalled
// rather than confirmed in the source text:
//
//   - [ISO3320Bores] and [ISO3320Rods]: metric cylinder bores (second-choice
//     sizes marked) and piston rods, ISO 3320.
//   - [InchBores] and [InchRods]: inch bores and rods of North American
//     practice (common practice).
//   - [ISO4393Strokes]: the basic series of cylinder strokes, ISO 4393.
//   - [MetricTubes]: metric tube outside diameter × wall, in the light (L)
//     and heavy (S) series of ISO 8434-1, walls by common practice.
//   - [HoseSizes], [HoseSize] and [ParseHoseSize]: hose bores by SAE J517
//     dash number (ID in sixteenths of an inch).
//   - [IECMotorRatings] (IEC 60072-1, kW) and [NEMAMotorRatings] (NEMA MG 1,
//     hp); [SynchronousSpeed] gives n = 120·f/p for a pole count.
//   - [ReservoirVolumes] (ISO 3 R10 litres) and [ReservoirVolumesUS] (US
//     gallons), common practice.
//   - [FilterRatings]: filter ratings in µm(c), common practice.
//
// A standard size is where a quote starts, not a promise that a maker
// builds it: check the maker's catalog, and design to ISO 4413.
package components
