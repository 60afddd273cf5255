// Package contamination codes and controls solid particle contamination in
// hydraulic fluid: ISO 4406 cleanliness codes from particle counts,
// comparison with a target code, common-practice target codes from the most
// sensitive component, filter beta ratios per ISO 16889, the steady-state
// cleanliness a filter holds, and filter placement advice.
//
// # ISO 4406 codes
//
// A scale number stands for a range of cumulative particle counts per mL:
// "more than" one bound "up to and including" the next, with the rounded
// bounds of ISO 4406:2021, Table 1 (…, 640, 1300, 2500, 5000 …), so each
// number is about a doubling of the count. An automatic counter calibrated
// per ISO 11171 reports three numbers for ≥4/≥6/≥14 µm(c) (e.g. 18/16/13);
// microscope counting (ISO 4407) reports two for ≥5/≥15 µm. A number from
// fewer than 20 counted particles carries "≥" (14/12/≥7). "-" marks a size
// not measured, ">28" a count above the table and "*" too many to count:
// these three marks are recalled from practice (from memory), not confirmed
// in the text of the standard. A count of exactly zero is reported as scale
// number 0, the lowest row of the table (our choice: the row is "more than
// 0", so the standard leaves zero open).
//
// The zero Code is no code: a sample field left unset. It fails Validate and
// Compare, so it can never pass a target, and travels in JSON as "". The
// clean code 0/0/0 is what CodeFromCounts(0, 0, 0) returns.
//
// # Targets and filtration
//
// The target table is common practice of the trade, not a standard: the
// most sensitive component sets a base code, made stricter for high
// pressure, critical machines and severe duty. Component makers' own limits
// take precedence; callers can replace the table or the result.
//
// Filter performance follows ISO 16889: β_x(c) = upstream count ≥x ÷
// downstream count ≥x, efficiency E = (1 − 1/β)·100 % (beta.go). The clean
// element's pressure drop and its check against the bypass setting are in
// element.go, the population balance in balance.go.
//
// # Population balance
//
// SteadyState, RequiredBeta, BetaForTarget and TimeConstant use the particle
// balance of a well-mixed system of fluid volume V holding N particles of
// size ≥x, concentration C = N/V. Particles enter at R per minute (ingress
// and wear, all ≥x); a full-flow filter passes flow Q and catches the
// fraction 1 − 1/β of the particles that reach it (the definition of β,
// ISO 16889):
//
//	dN/dt = R − Q·C·(1 − 1/β)
//
// Steady state: C = R / (Q·(1 − 1/β)); with R in particles per minute and Q
// in mL/min, C is in particles per mL. A step from C₀ settles as
// C(t) = C + (C₀ − C)·exp(−t/τ), τ = V / (Q·(1 − 1/β)). This is the
// textbook mass balance of a stirred tank with a separator, written out here
// from the definition of β; no published source is cited for it. It ignores
// settling in the tank, particles made inside the filter, the change of β as
// the element loads, flow surges and imperfect mixing: treat the results as
// estimates and confirm them with samples.
//
// # Results that explain themselves
//
// Results speak the vocabulary of package components. A Target says where
// its code comes from with a components.Rule (common practice, the caller's
// base codes, or the caller's override) and cautions when an override is
// dirtier than the table; each SizeCheck of a Comparison holds the sample's
// count bound against the target's as a components.Check, and the
// Comparison carries a finding for each size over the target; a BypassCheck
// holds the clean drop against the bypass setting and against a third of it
// as checks, with findings; placement Advice lists its findings and rule.
// Findings have a severity, a hazard kind (filter bypass, stored energy, hot
// surface, cavitation, contamination) and a stable topic key (the Topic…
// constants) a program can act on; their sentences quote numbers as typed
// quantities, so they read in metric or US customary units.
//
// # Errors
//
// Every error for bad input is a *units.RangeError (errors.As) matching
// units.ErrRange, naming the function, the parameter or field (sample.N[1],
// Bases[servo valve].N[0], at.Drop), the value and the valid range; parse
// errors are *units.ParseError values. The package's sentinels ErrOrder,
// ErrForm, ErrNoComponent and ErrUnreachable say more about a range error
// and match units.ErrRange themselves. On error every function returns the
// zero value; a result that must be positive but underflows to 0 is an
// error.
//
// # Cautions
//
// Hydraulic systems store energy: fluid under pressure, accumulators and
// raised loads. Change elements and take samples only with the system
// depressurised or through a proper sampling valve per ISO 4021, and keep
// clear of pinhole leaks, which can inject fluid through the skin. Hot oil
// burns. A filter in bypass passes unfiltered fluid. These results support,
// and do not replace, ISO 4413, the component makers' data, local codes and
// licensed practice.
//
// All functions are safe for concurrent use. ScaleNumber, CodeFromCounts,
// CodeFromSample and ParseCode allocate nothing unless they fail.
package contamination
