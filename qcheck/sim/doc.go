// Package sim gives circuits their meaning: engines that compute a circuit's unitary matrix or
// apply it to a state, in the qubit order of package circuit (qubit 0 is the least-significant
// bit of a basis index).
//
// Every engine validates the circuit first and returns an error, never a panic, for an ill-formed
// circuit, a non-unitary op (measure, reset), or a size it cannot hold.
//
// # Engines
//
// Unitary builds the dense 2^n × 2^n matrix, refusing sizes over a memory limit (UnitaryWithin)
// with an error that says how much it would need. Apply runs a circuit on a statevector in place;
// Compile prepares a circuit once for many statevectors, and Apply(c.Inverse(), state) applies
// the inverse.
//
// DifferenceWindow cancels the ops two circuits share at their ends, commuting ops past ops on
// other qubits; the distance of the circuits is exactly that of what is left (see Window).
// CliffordDistance gives the exact distance of two Clifford circuits from the tableau of V†U when
// it splits into small tensor factors, and a certified lower bound otherwise.
//
// # Programs
//
// A circuit with measurements, resets and classically controlled ops is a program. Its meaning,
// as OpenQASM 2.0 defines it, is the distribution of its classical bits at the end, every qubit
// and bit starting at 0; two programs are compared through their bits (Outcomes), by the exact
// total-variation distance and the outcome whose probability differs most (OutcomeGap):
//
//	TV(p, q) = ½ Σ_x |p(x) − q(x)|.
//
// ProgramOutcomes and ComparePrograms enumerate the measurement branches on statevectors, with
// their probabilities; final measurements are read off the final state without branching.
// StabilizerProgramOutcomes and CompareCliffordPrograms handle Clifford programs at any width,
// each measurement outcome a symbol: the bits end as affine functions over GF(2) of independent
// fair coins, so the distribution is uniform over an affine set A, and for two such sets
//
//	TV = 1 − |A ∩ B| / max(|A|, |B|).
//
// CompareFromZero compares two unitary circuits on the input |0…0⟩ alone, and MeasureAtEnd
// turns a unitary circuit into the program that measures some of its qubits.
//
// # How the work is done
//
// Both engines share one set of kernels (kernel.go). Gates are first fused: consecutive gates on
// the same qubits are multiplied into one matrix (fuse.go). Each fused gate then runs in place
// over strided index sets, with an inner loop chosen from its matrix: a 2×2 block, a diagonal, an
// exchange of amplitudes, a full 4×4, or a sparse row-by-row loop. The dense engine builds blocks
// of columns that fit in a core's cache, one block per goroutine at a time, running every gate
// over a block before moving on; the statevector engine runs gates on low qubits chunk by chunk
// in cache and splits every other gate across all cores.
package sim
