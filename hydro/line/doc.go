// Package line sizes and checks hydraulic lines: the mean velocity in a
// bore, the least bore for a service at its velocity limit, the Reynolds
// number and the Darcy friction factor, the pressure drop of straight runs
// (Darcy–Weisbach), fittings (K factors) and components known by a
// data-sheet point, a path's pressure budget element by element, the path
// at cold start, the pressure rating of tube walls (Barlow) and hoses (SAE
// J517), and the pressure surge of a sudden valve closure (Joukowsky).
//
// # Friction
//
// FrictionFactor is the Darcy factor: 64/Re up to Re 2000, the
// Colebrook–White equation solved to full double precision above, with the
// transition band 2000–4000 taken as turbulent (the higher value, so a drop
// errs high). SwameeJain, Haaland and Blasius give the usual explicit
// approximations by name, within their published ranges.
//
// # Paths
//
// A Path is a list of elements — Pipe, Fitting, Rated — that one flow
// passes through. Path.Drop gives each element's drop, Reynolds number and
// regime, the gauge pressure at each inlet, the total, and checks of each
// rated component's pressure rating and bypass setting; Path.TotalDrop gives
// the total alone, without allocating, for a loop that needs no more.
// ColdStart runs the
// same path at the minimum start temperature beside the running one. Oil
// properties come from package fluid at the oil temperature (OilAt).
//
// # Cautions
//
// Lines hold oil at pressure: a hose or fitting that lets go whips, and a
// pinhole leak injects oil through the skin. HoseRun.Assess, Closure.Surge
// and Path.Drop carry these as findings. The velocity limits are rules of
// thumb of the trade; the K factors are for turbulent flow; the surge is an
// upper bound. Tube, hose and fitting makers' ratings govern, and these
// results support, and do not replace, ISO 4413, local codes and licensed
// practice.
//
// Every function validates its input and returns an error matching
// units.ErrRange that names the parameter (and field); none panics on
// caller input or returns NaN or ±Inf. All functions are safe for
// concurrent use; FrictionFactor does not allocate.
package line
