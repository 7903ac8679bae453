package sim

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// CliffordResult is the verdict of the tableau engine on two Clifford circuits: whether they are
// equal up to a global phase and, when they are not, a witness: a generator X_q or Z_q of the
// Pauli group that the two circuits conjugate differently, with both images. The verdict is exact
// (no tolerance) for the Clifford gates the tableau used; gates with angles were accepted only
// within CliffordTolerance of those gates.
type CliffordResult struct {
	// Equivalent reports whether want and got are equal up to a global phase.
	Equivalent bool
	// Generator is the witness, X_q or Z_q, when the circuits differ; the zero Pauli otherwise.
	Generator Pauli
	// Want and Got are the images of Generator under the two circuits, U P U† and V P V†.
	Want, Got Pauli
}

// CompareClifford decides whether two Clifford circuits of the same width are equal up to a
// global phase, by comparing how each conjugates the 2n generators X_q and Z_q, signs included.
// It fails when the widths differ or either circuit is refused by NewTableau; the error says
// which circuit and which op. It cannot decide equality including the global phase: a tableau
// does not record it.
func CompareClifford(want, got *circuit.Circuit) (CliffordResult, error) {
	tw, tg, err := buildPair(want, got, "want", "got", NewTableau)
	if err != nil {
		return CliffordResult{}, err
	}
	return tw.Compare(tg), nil
}

// Compare returns the verdict for the circuits of two tableaux: equivalent when every image
// agrees, otherwise the lowest generator (X_0 … X_{n−1}, then Z_0 … Z_{n−1}) whose images differ.
// It panics when the widths differ, a programmer error.
func (t *Tableau) Compare(u *Tableau) CliffordResult {
	if t.n != u.n {
		panic(fmt.Sprintf("sim: comparing tableaux of %d and %d qubits", t.n, u.n))
	}
	r, same := t.firstDifference(u)
	if same {
		return CliffordResult{Equivalent: true}
	}
	gen := PauliX(t.n, r%t.n)
	if r >= t.n {
		gen = PauliZ(t.n, r-t.n)
	}
	return CliffordResult{Generator: gen, Want: t.row(r), Got: u.row(r)}
}

// buildPair refuses a pair of circuits that cannot be compared (a missing one, or different
// widths), then builds each with build, concurrently; an error names the circuit by its role.
func buildPair[T any](a, b *circuit.Circuit, roleA, roleB string, build func(*circuit.Circuit) (T, error)) (ta, tb T, err error) {
	if a == nil || b == nil {
		return ta, tb, fmt.Errorf("sim: nil circuit")
	}
	if a.Qubits() != b.Qubits() {
		return ta, tb, fmt.Errorf("sim: circuits have different widths: %d and %d qubits", a.Qubits(), b.Qubits())
	}
	var errB error
	done := make(chan struct{})
	go func() { // the two builds are independent: run them on two cores
		defer close(done)
		tb, errB = build(b)
	}()
	ta, err = build(a)
	<-done
	if err != nil {
		return ta, tb, fmt.Errorf("sim: %s circuit: %w", roleA, err)
	}
	if errB != nil {
		return ta, tb, fmt.Errorf("sim: %s circuit: %w", roleB, errB)
	}
	return ta, tb, nil
}
