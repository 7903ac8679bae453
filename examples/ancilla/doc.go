// Package ancilla is the multi-controlled X lowering of Fieldfare, the compiler an invented team
// at Thistlewick Qubit Foundry writes for its invented Tarn devices. Tarn chips run one- and two-qubit gates
// only, and Fieldfare's front end accepts X gates with any number of controls (made by MCX); this
// package rewrites each into Toffoli gates, borrowing extra qubits as work space, before the
// Toffolis themselves are decomposed further.
//
// Three constructions, each cited to what it implements:
//
//   - Chain: the compute–apply–uncompute ladder of Nielsen & Chuang, Quantum Computation and
//     Quantum Information, §4.3, Fig. 4.10, with the last work qubit replaced by the target since
//     the gate applied is X (common practice): k controls, k−2 clean ancillas, 2(k−2)+1 Toffolis.
//   - Borrowed (dirty work qubits): Barenco et al., "Elementary gates for quantum computation",
//     Phys. Rev. A 52, 3457 (1995), §7, Lemma 7.2: k controls, k−2 work qubits in any state that
//     are restored, 4(k−2) Toffolis. When fewer than k−2 are free, it splits the controls in two
//     and uses a single work qubit, as in Lemma 7.3 of the same paper (the construction behind
//     Corollary 7.4), with four Lemma 7.2 blocks.
//   - OneClean: the split of Lemma 7.3 with its one work qubit known to start in |0⟩, which saves
//     the fourth block: compute the first half's AND into the ancilla, apply the second half
//     controlled also on the ancilla, uncompute.
//
// The passes (Lowering.Apply, Lower, LowerBorrowed) append their ancillas after the circuit's
// qubits. A clean ancilla must start in |0⟩ and is returned to |0⟩; a dirty one may start in any
// state and is returned to it. That is exactly what qcheck's Ancillas option checks.
package ancilla
