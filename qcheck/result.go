package qcheck

import "qcheck.dev/qcheck/circuit"

// Result is the outcome of comparing two circuits: the verdict, the numbers behind it, and the
// evidence a person needs to act on a difference. It holds values only; Report turns it into
// text.
//
// States and outcomes are on got's register, indexed Σ_q b_q·2^q (qubit 0 is the least
// significant bit). With an output permutation, outcomes are read after undoing it, so bit i is
// logical qubit i.
type Result struct {
	// Equivalent reports whether Distance ≤ Tolerance.
	Equivalent bool
	// Distance is the distance of the two circuits in Measure. For measured distributions it
	// is certified on the side of the verdict: an upper bound on the largest total-variation
	// distance over all inputs when Equivalent, a distance found on an input when not (Certifies
	// gives both bounds).
	Distance float64
	// Measure is the measure of Distance and Tolerance.
	Measure Measure
	// Tolerance is the ε the verdict used.
	Tolerance float64
	// ExactPhase reports whether global phase counted.
	ExactPhase bool
	// Engine is the engine that answered, and Certifies says in words what its answer
	// guarantees.
	Engine    Engine
	Certifies string

	// Phase is the global phase φ that brings got closest to want: want ≈ e^{iφ}·got. It is 0
	// with ExactPhase.
	Phase float64
	// Witness is an input state that exposes the difference: a unit vector ψ for which the two
	// output states are farthest apart (for clean ancillas, with the ancillas in |0⟩). It is
	// filled in when the circuits differ, and always by Compare. WitnessGap is
	// min over φ of ‖want·ψ − e^{iφ}·got·ψ‖ (‖want·ψ − got·ψ‖ with ExactPhase), computed
	// directly from ψ: a certified lower bound on the operator-norm distance.
	Witness    []complex128
	WitnessGap float64
	// Measurement is a concrete experiment whose outcome probabilities differ most; its Input
	// is nil when no measurement can tell the circuits apart (they differ by a global phase).
	Measurement Measurement

	// OperatorDistance is the operator-norm distance (up to phase unless ExactPhase) whatever
	// the measure; 2·OperatorDistance bounds the change of any outcome probability (Nielsen &
	// Chuang §4.5.3).
	OperatorDistance float64

	// Pauli is the tableau engine's witness when it answered and the circuits differ: a Pauli
	// generator the two circuits conjugate differently. Nil otherwise.
	Pauli *PauliEvidence

	// Blame points at the ops that explain a difference, when they can be found.
	Blame Blame

	// Want and Got are the circuits as given; Options describes the non-default options in
	// words.
	Want, Got *circuit.Circuit
	Options   string
	// Qubits is the width of the register that states and outcomes refer to (got's).
	Qubits int
	// Measured lists, with Measured, the qubit of got's register (logical, after undoing an
	// output permutation) read by each bit of an outcome, else nil; outcomes are then bit
	// strings, bit 0 least significant. Bits lists the classical bits those outcome bits are
	// when the circuits measure into classical bits (an entry −1 in Measured is a bit got never
	// writes, which reads 0); nil when the outcome bits are the qubits in Measured.
	Measured []int
	Bits     []int
}

// Measurement is a concrete experiment that tells the two circuits apart: prepare Input, run the
// circuit, and measure. With Basis set, the measurement is in the computational basis and Outcome
// is the basis index seen with probability Want after want and Got after got. Without it, the
// measurement asks whether the output is want's output state (a projective measurement onto
// it): want passes with probability Want = 1 and got with probability Got; this is reported when
// the two differ only in relative phases that the computational basis cannot see.
type Measurement struct {
	// Input is the state prepared; InputBasis is its basis index when it is a computational-basis
	// state, else −1.
	Input      []complex128
	InputBasis int
	// Basis reports a computational-basis measurement with Outcome the basis index observed;
	// otherwise the measurement projects onto want's output state.
	Basis   bool
	Outcome int
	// Want and Got are the probabilities of the outcome after want and after got.
	Want, Got float64
}

// Blame points at the part of got that explains a difference.
type Blame struct {
	// Found reports whether the circuits differ as op lists at all.
	Found bool
	// FirstDiff is the first op index at which want and got differ structurally (different op,
	// or one circuit ends), or −1 when they are structurally equal.
	FirstDiff int
	// WantOps and GotOps are the half-open ranges of op indices that differ once the longest
	// common prefix and suffix are removed: want.Ops[WantOps[0]:WantOps[1]] became
	// got.Ops[GotOps[0]:GotOps[1]].
	WantOps, GotOps [2]int
	// Prefix, when positive, is the length of the shortest prefix of got that already differs
	// (beyond the tolerance) from the prefix of want of the same length, so op Prefix−1 is where
	// the meaning first changes. It is computed only when both circuits have the same length and
	// are compared on the same register without permutation, ancillas or measurement, up to 6
	// qubits.
	Prefix int
}
