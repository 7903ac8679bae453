// Package synthesis is an approximate synthesis pass with its error accounted for: it replaces
// every single-qubit rotation of a circuit (rx, ry, rz, p, u) by a word over {H, S, T} and their
// inverses, within a share of a total error budget ε, and records each replacement in a
// budget.Ledger so that a test can certify the whole circuit's error without simulating it.
//
// The method is the Solovay–Kitaev algorithm as written by Dawson & Nielsen, "The
// Solovay–Kitaev algorithm" (2006):
//
//   - the basic approximations come from an ε-net of words, found by breadth-first enumeration
//     of words over the gate set, identified modulo global phase and deduplicated, with a
//     nearest-neighbour look-up (a k-d tree over SU(2) seen as the unit quaternions);
//   - each level of the recursion corrects the previous approximation U_{n−1} of U by writing
//     the residual Δ = U·U_{n−1}† as a balanced group commutator V·W·V†·W† (their algorithm and its analysis;
//     V and W are rotations by the same angle φ about perpendicular axes, with
//     sin(θ/2) = 2·sin²(φ/2)·√(1 − sin⁴(φ/2)) for a residual rotation by θ, then conjugated so
//     that the commutator's axis is Δ's), approximating V and W one level down, and returning
//     V_{n−1}·W_{n−1}·V_{n−1}†·W_{n−1}†·U_{n−1}.
//
// The pass stops refining a rotation as soon as its word is within the rotation's share, so the
// number of levels adapts to the budget.
package synthesis
