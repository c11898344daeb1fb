// Package timber checks wood columns under concentric axial load by the
// ANSI/AWC National Design Specification for Wood Construction, 2018 edition
// (NDS 2018) and its Supplement: sawn dimension-lumber posts (4x4, 4x6, 4x8),
// sawn posts and timbers (5x5 and larger) and structural glued laminated
// timber (glulam), by ASD or LRFD, with an optional Chapter 16 fire check.
//
// Units inside the package are US customary, because the NDS tabulates in
// them: lengths in inches, forces in pounds, stresses in psi. Sizes are also
// reported in millimetres and mass per metre in kg/m; everything else is
// converted at the caller's edge.
//
// Design values in this package were entered from memory of the NDS 2018
// Supplement tables and are labelled so beside each value; check them against
// the published tables before relying on a result.
//
// Two entry points evaluate a prepared Candidate: Fast (no allocation, for
// sweeping lengths) and Full (with the calculation trace in the order
// NDS 2018 3.7.1 gives it).
package timber
