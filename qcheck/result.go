package qcheck

import (
	"encoding/json"

	"qcheck.dev/qcheck/circuit"
)

// Result is the outcome of comparing two circuits: the verdict, the numbers behind it, and the
// evidence a person needs to act on a difference. It holds values only; Report turns it into
// text.
//
// MarshalJSON gives a Result its JSON encoding, which the qcheck command writes with -json; its
// keys, unlike the text of Report, stay the same between versions.
//
// States and outcomes are on got's register, indexed Σ_q b_q·2^q (qubit 0 is the least
// significant bit). With an output permutation, outcomes are read after undoing it, so bit i is
// logical qubit i.
type Result struct {
	// Equivalent reports whether Distance ≤ Tolerance, as the engine certifies it.
	Equivalent bool
	// Undecided, when not empty, says why the engine's answer settles neither way (its bounds
	// straddle the tolerance); Equivalent is then false, meaning "not shown equivalent".
	Undecided string
	// Distance is the distance of the two circuits in Measure. For measured distributions it
	// is certified on the side of the verdict: an upper bound on the largest total-variation
	// distance over all inputs when Equivalent, a distance found on an input when not (Certifies
	// gives both bounds); from the tableau engine it is, when Equivalent, the bound on how far
	// angles rounded to Clifford ones move the circuits (0 when none was rounded).
	Distance float64
	// LowerBound reports that Distance is a certified lower bound, not the distance itself: the
	// engine showed the circuits differ by at least Distance without computing how far apart
	// they are (the tableau for Clifford circuits too entangled to split into small factors, the
	// matrix-free engine's estimate).
	LowerBound bool
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

	// Meaning is what the circuits were taken to mean: "unitary" (the unitary on every input),
	// "program" (the distribution of the classical bits at the end, see AsProgram) or
	// "from zero" (the input |0…0⟩ only, see FromZero).
	Meaning string
	// Outcome, when programs or measured states from |0…0⟩ differ, is the outcome of the
	// classical bits whose probability differs most, bit n−1 first as OpenQASM writes a
	// register ("10" is bit 1 set); empty otherwise. OutcomeWant and OutcomeGot are its
	// probabilities after want and after got.
	Outcome                 string
	OutcomeWant, OutcomeGot float64
	// Overlap is ⟨0|U†V|0⟩ when FromZero compared states; its squared modulus is their fidelity.
	Overlap complex128
}

// outcomeJSON is the JSON form of Result.Outcome and its probabilities.
type outcomeJSON struct {
	Bits string  `json:"bits"`
	Want float64 `json:"want"`
	Got  float64 `json:"got"`
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
	Found bool `json:"found"`
	// FirstDiff is the first op index at which want and got differ structurally (different op,
	// or one circuit ends), or −1 when they are structurally equal.
	FirstDiff int `json:"first_diff"`
	// WantOps and GotOps are the spans of ops that differ once the longest common start and
	// end are removed (circuit.CommonEnds): want's ops in WantOps became got's ops in GotOps.
	WantOps circuit.Span `json:"want_ops"`
	GotOps  circuit.Span `json:"got_ops"`
	// Prefix, when positive, is the length of the shortest prefix of got that already differs
	// (beyond the tolerance) from the prefix of want of the same length, so op Prefix−1 is where
	// the meaning first changes. It is computed only when both circuits have the same length and
	// are compared on the same register without permutation, ancillas or measurement, up to 6
	// qubits.
	Prefix int `json:"prefix"`
}

// resultJSON is the JSON form of a Result. Amplitudes are [re, im] pairs; the circuits and the
// options in words are left out (the caller has them).
type resultJSON struct {
	Equivalent       bool           `json:"equivalent"`
	Undecided        string         `json:"undecided,omitempty"`
	Distance         float64        `json:"distance"`
	LowerBound       bool           `json:"lower_bound,omitempty"`
	Measure          Measure        `json:"measure"`
	Tolerance        float64        `json:"tolerance"`
	ExactPhase       bool           `json:"exact_phase"`
	Phase            float64        `json:"phase"`
	OperatorDistance float64        `json:"operator_distance"`
	Witness          [][2]float64   `json:"witness"`
	WitnessGap       float64        `json:"witness_gap"`
	Engine           Engine         `json:"engine"`
	Certifies        string         `json:"certifies"`
	Measurement      *Measurement   `json:"measurement,omitempty"`
	Pauli            *PauliEvidence `json:"pauli,omitempty"`
	Blame            *Blame         `json:"blame,omitempty"`
	Qubits           int            `json:"qubits"`
	Measured         []int          `json:"measured,omitempty"`
	Bits             []int          `json:"bits,omitempty"`
	Meaning          string         `json:"meaning"`
	Outcome          *outcomeJSON   `json:"outcome,omitempty"`
	Overlap          *[2]float64    `json:"overlap,omitempty"`
}

// maxJSONWitness is the most amplitudes of a witness the JSON form carries: a 12-qubit state,
// about 200 KB of text.
const maxJSONWitness = 1 << 12

// MarshalJSON writes the result as one JSON object; see the Result type for its keys' meaning.
// The witness is written when it shows a gap and has at most 4,096 amplitudes ([] otherwise).
// The measurement is left out when there is none (Measurement.Input nil), and the blame when
// the circuits have the same ops.
func (r Result) MarshalJSON() ([]byte, error) {
	v := resultJSON{
		Equivalent: r.Equivalent, Undecided: r.Undecided, Distance: r.Distance, LowerBound: r.LowerBound, Measure: r.Measure,
		Tolerance: r.Tolerance, ExactPhase: r.ExactPhase, Phase: r.Phase,
		OperatorDistance: r.OperatorDistance,
		WitnessGap:       r.WitnessGap, Engine: r.Engine, Certifies: r.Certifies, Pauli: r.Pauli,
		Qubits: r.Qubits, Measured: r.Measured, Bits: r.Bits, Meaning: r.Meaning,
	}
	if r.Outcome != "" {
		v.Outcome = &outcomeJSON{Bits: r.Outcome, Want: r.OutcomeWant, Got: r.OutcomeGot}
	}
	if r.Measure == ZeroState {
		v.Overlap = &[2]float64{real(r.Overlap), imag(r.Overlap)}
	}
	// The witness is written only when it witnesses something, and only up to maxJSONWitness
	// amplitudes, so that a wide comparison never writes megabytes of state.
	if r.WitnessGap > 0 && !r.Equivalent && len(r.Witness) <= maxJSONWitness {
		v.Witness = make([][2]float64, len(r.Witness))
		for i, a := range r.Witness {
			v.Witness[i] = [2]float64{real(a), imag(a)}
		}
	} else {
		v.Witness = [][2]float64{}
	}
	if r.Measurement.Input != nil {
		v.Measurement = &r.Measurement
	}
	if r.Blame.Found {
		v.Blame = &r.Blame
	}
	return json.Marshal(v)
}

// MarshalJSON writes the measurement without its input state: input_basis (null when the input
// is not a basis state), basis, outcome (null without basis), want and got.
func (m Measurement) MarshalJSON() ([]byte, error) {
	v := struct {
		InputBasis *int    `json:"input_basis"`
		Basis      bool    `json:"basis"`
		Outcome    *int    `json:"outcome"`
		Want       float64 `json:"want"`
		Got        float64 `json:"got"`
	}{Basis: m.Basis, Want: m.Want, Got: m.Got}
	if m.InputBasis >= 0 {
		v.InputBasis = &m.InputBasis
	}
	if m.Basis {
		v.Outcome = &m.Outcome
	}
	return json.Marshal(v)
}
