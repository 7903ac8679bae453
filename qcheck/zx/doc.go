// Package zx decides whether two circuits are equal up to a global phase by rewriting the
// ZX-diagram of V†·U with the rules of the ZX-calculus, as published by Duncan, Kissinger, Perdrix
// & van de Wetering ("Graph-theoretic simplification of quantum circuits with the ZX-calculus",
// Quantum 4, 279 (2020)) with the phase-gadget rules of Kissinger & van de Wetering ("Reducing
// the number of non-Clifford gates in quantum circuits", Phys. Rev. A 102, 022406 (2020)). It
// works at any width: the cost follows the number of gates, not 2^n.
//
// Compare first cancels the ops the circuits share at their ends ([sim.DifferenceWindow], exact);
// a small remainder is measured with dense matrices, a large one goes to [Check].
//
// # Why this method
//
// The pairs a compiler's tests compare are a circuit and its own rewrite: basis translation,
// commuting reorders, routing swaps, peephole rewrites. In V†U the two halves meet in the middle
// and cancel by local rules, whatever the gate order and gate set, since the diagram does not
// depend on how the gates were aligned (a SWAP is a crossing of wires, a reorder of commuting
// gates is the same diagram). Decision diagrams would need numerical tolerances on every node and
// depend on the alternation schedule, and a DD's size for random circuits grows with the part of
// V†U not yet cancelled; path sums need the same Hadamard eliminations the ZX pivots perform, with
// phases kept as polynomials. Only the ZX engine was built and measured; on our own corpora
// (BenchmarkQFT, BenchmarkAdder, BenchmarkVolume, figures in the README) it proves translated,
// reordered and routed QFTs and adders at 64 and 128 qubits and random two-qubit-block circuits at
// 32 and 40 qubits in 0.1 to 3 CPU seconds, and refutes one-gate changes in the latter with the
// exact distance in under a CPU second.
//
// # What is proved
//
// Each gate is written as Z phases, Hadamards and CZ or CNOT (a decomposition equal to the gate up
// to a global phase, checked against every library gate's matrix in the tests; Toffoli as in
// Nielsen & Chuang Fig. 4.9). Every rewrite rule used — spider fusion, identity removal, the Hopf
// law for parallel Hadamard edges, local complementation, pivoting, and the fusion and removal of
// phase gadgets — turns a diagram D into D' with D = c·D' for a non-zero scalar c. If the result
// is bare wires, each input joined by a plain wire to the output of its own qubit, then
//
//	V†U = c·I  for some c ≠ 0,
//
// and since V†U is unitary, |c| = 1: U = e^{iφ}V. That is why scalars are never tracked: the
// only scalar that could break the argument is zero, and a diagram of a unitary never equals zero
// times anything. (Parts of the diagram cut off from every wire are such scalars and are
// dropped.)
//
// Rules apply only at particular phases: local complementation at ±π/2, pivoting at 0 or π,
// identity removal at 0. A phase is k·π/4 + r with k exact and r the floating-point residual of
// the circuits' angles; it is treated as the multiple of π/4 nearest to it when |r − m·π/4| ≤ Tol
// (default 1e-12), and the dropped residual δ is recorded. Such a step is exact for a circuit in
// which one phase gate of the decomposition is rotated by δ; every angle of the decomposed
// circuits lives in exactly one spider at any time, rules only move, negate and add phases. A phase
// gate rotated by δ differs from the original, phase aside, by
//
//	min_φ ‖diag(1, e^{iα}) − e^{iφ}·diag(1, e^{i(α+δ)})‖ = 2·|sin(δ/4)| ≤ |δ|/2,
//
// and conjugation by unitaries does not change operator norms, so the proof covers circuits U',
// V' with min_φ ‖U − e^{iφ}U'‖ + min_φ ‖V − e^{iφ}V'‖ ≤ Σ|δ|/2 (distances with the phase taken
// out satisfy the triangle inequality). Adding the rounding of the residual sums (each
// floating-point addition off by at most 2^-53 of its result, summed as it happens), Check proves
//
//	min_φ ‖U − e^{iφ}V‖ ≤ Bound = (Σ|δ| + rounding)/2.
//
// Bound is reported; it is typically about 1e-13, a few 1e-10 where angles below Tol are dropped
// (a 128-qubit QFT has controlled phases down to π/2^127), and far below any deliberate change of
// an angle, which stays a non-Clifford phase and blocks the proof.
//
// # Distances and undecided pairs
//
// When the simplified diagram leaves plain wires on all but some wires, and what remains on those
// falls into connected parts each joining at most MaxSupport wires, then
//
//	V†U = c·(I ⊗ W_1 ⊗ … ⊗ W_m)
//
// and each W_j's matrix is computed from its part by summing out the spiders one at a time (a
// ZX-diagram is a sum over the values of its spiders: a phase α contributes e^{iαx}, a Hadamard
// edge (−1)^{xy}). Scaling to unit column norm removes the unknown scalar. The eigenphases of
// V†U are, up to the global phase, the sums of one eigenphase of each W_j; with θ the shortest
// arc of the circle holding them all (metric.TensorPhaseDistance),
//
//	min_φ ‖U − e^{iφ}V‖ = 2·sin(θ/4),
//
// the same closed form as metric.PhaseDistance. The value is the distance of U and V to within
// Bound plus rounding; above that it is a certified difference (Result.Lower).
//
// A change deep inside a wide circuit is conjugated by everything before it, so V†U itself does
// not shrink. Check then cuts U after the latest of its ops still present in the remainder, at k,
// and simplifies U[:k]·V†·U[k:] (the ops of U from k, the inverse of V, then the first k ops of U),
// which equals U1·(V†U)·U1† for U1 the first k ops: the same spectrum, hence the same distance,
// and both halves of each circuit now meet their partner. Because fusion can carry a later op's
// mark into the remainder, a few further cuts, at quantiles of the ops of U still present, are
// tried; the same cuts let an equivalent pair whose middle did not cancel first be proved.
// Otherwise the answer is Undecided with
// the size of what is left; the package never says "different" without the computed distance.
package zx
