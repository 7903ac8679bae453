// Package budget accounts for the error of approximate passes: a [Ledger] records each
// approximate rewrite a pass makes (the piece it took out, the circuit it put in, and where), and
// certifies, without simulating the whole circuit, how far the circuit after the pass is from
// the circuit before.
//
// Each [Entry] has the error δ_k of its rewrite, the phase-free operator-norm distance of the
// piece P_k and its replacement R_k, computed exactly (in floating point) on the piece's own
// qubits:
//
//	δ_k = min over φ of ‖P_k − e^{iφ}·R_k‖
//
// Errors of unitary factors add at most linearly (Nielsen & Chuang §4.5.3), and the phase of each
// factor may be chosen on its own, so for the whole circuits U before and V after
//
//	min over φ of ‖U − e^{iφ}·V‖ ≤ Σ_k δ_k = [Ledger.Bound]
//
// provided the rewrites account for every difference between the two circuits, which
// [Ledger.Covers] checks; and for any input state and measurement, each outcome's probability
// changes by at most 2·Σ_k δ_k (the same section). The bound holds for unitary pieces only, so
// the ledger refuses measure and reset.
//
// A pass divides a total budget ε among its rewrites with [EvenSplit] or [WeightedSplit], records
// each share with its rewrite, and a test checks the whole with [Within]. A pass that reports
// only the windows it replaced is checked with [FromWindows]. Places are op spans of package
// circuit ([circuit.Span]): a [Window] names the span taken out of the circuit before, the span
// put into the circuit after, and the qubits of the piece.
package budget
