// Package peephole is the peephole optimizer of Fieldfare, the compiler that an invented team at
// an invented lab (Thistlewick Qubit Foundry) writes for its Tarn devices: small superconducting chips whose
// native two-qubit gate is cx and whose single-qubit gates are rz, sx and x.
//
// Fieldfare runs the optimizer after every lowering step, so it must be fast, local and exact.
// It looks at one op at a time and searches forward for a partner on the same qubits: a partner
// that undoes the op cancels with it, and a partner that rotates about the same axis merges with
// it into one rotation. On the way, the op may slide past gates it commutes with; the rule used
// is that two gates commute when, on every qubit they share, both act along the same Pauli axis
// (both commute with Z there, as diagonal gates and controls do; or both with X, as rx and cx
// targets do; or both with Y). So rz slides through a cx control and rx through a cx target,
// which is where most of the savings on Tarn circuits come from.
//
// Every pass has the signature func(*circuit.Circuit) (*circuit.Circuit, error), never modifies
// its input, keeps the unitary exactly (global phase included), and iterates to a fixed point.
// The rules are values (Rules), so that a variant of the optimizer can reuse the search with
// rules of its own; the sibling package shortcut is such a variant, and it is wrong on purpose.
package peephole
