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
// Qubits that no gate of either circuit touches are the identity in both, so the tableaux are
// built on the touched qubits only (barriers do not count) and the witness is put back on the
// full register; a million-qubit register with a few gates costs what those gates cost. It fails
// when the widths differ, either circuit is refused by NewTableau (the error says which circuit
// and which op), or the two tableaux would need more than DefaultMemoryLimit. It cannot decide
// equality including the global phase: a tableau does not record it.
func CompareClifford(want, got *circuit.Circuit) (CliffordResult, error) {
	if want == nil || got == nil {
		return CliffordResult{}, fmt.Errorf("sim: nil circuit")
	}
	if err := want.Validate(); err != nil {
		return CliffordResult{}, fmt.Errorf("sim: want circuit: %w", err)
	}
	if err := got.Validate(); err != nil {
		return CliffordResult{}, fmt.Errorf("sim: got circuit: %w", err)
	}
	n := want.Qubits()
	touched := touchedQubits(n, want, got)
	if need := 2 * tableauBytes(len(touched)); need > float64(DefaultMemoryLimit) && n == got.Qubits() {
		return CliffordResult{}, fmt.Errorf("sim: the tableaux of %d touched qubits need %s, over the limit of %s", len(touched), bytesString(need), bytesString(float64(DefaultMemoryLimit)))
	}
	if len(touched) == 0 && n == got.Qubits() {
		return CliffordResult{Equivalent: true}, nil // barriers only: both are the identity
	}
	a, b := want, got
	if len(touched) < n && n == got.Qubits() {
		a, b = onQubits(want, touched), onQubits(got, touched)
	}
	tw, tg, err := buildPair(a, b, "want", "got", NewTableau)
	if err != nil {
		return CliffordResult{}, err
	}
	r := tw.Compare(tg)
	if !r.Equivalent && a != want {
		r.Generator, r.Want, r.Got = spread(r.Generator, touched, n), spread(r.Want, touched, n), spread(r.Got, touched, n)
	}
	return r, nil
}

// touchedQubits lists, in increasing order, the qubits of an n-qubit register that some op of
// the circuits other than a barrier acts on.
func touchedQubits(n int, cs ...*circuit.Circuit) []int {
	seen := make([]bool, n)
	for _, c := range cs {
		for _, op := range c.Ops {
			if op.Gate.Name == "barrier" {
				continue
			}
			for _, q := range op.Qubits {
				if q >= 0 && q < n {
					seen[q] = true
				}
			}
		}
	}
	var qs []int
	for q, s := range seen {
		if s {
			qs = append(qs, q)
		}
	}
	return qs
}

// onQubits returns c on a register of len(qubits) qubits, qubit qubits[i] becoming qubit i, with
// the same ops in the same places (so errors name the same op); barriers keep only the listed
// qubits (qubit 0 when none is left). Every other op must act on listed qubits only, and qubits
// must not be empty.
func onQubits(c *circuit.Circuit, qubits []int) *circuit.Circuit {
	to := make(map[int]int, len(qubits))
	for i, q := range qubits {
		to[q] = i
	}
	d := circuit.New(len(qubits))
	d.Ops = make([]circuit.Op, len(c.Ops))
	for i, op := range c.Ops {
		qs := make([]int, 0, len(op.Qubits))
		for _, q := range op.Qubits {
			if k, ok := to[q]; ok {
				qs = append(qs, k)
			}
		}
		if len(qs) == 0 { // a barrier on untouched qubits only: keep its place
			qs = []int{0}
		}
		op.Qubits = qs
		d.Ops[i] = op
	}
	return d
}

// spread returns p, a string on the listed qubits, on the full n-qubit register.
func spread(p Pauli, qubits []int, n int) Pauli {
	out := newPauli(n)
	for i, q := range qubits {
		out.set(q, p.At(i))
	}
	out.neg = p.neg
	return out
}

// tableauBytes is the memory of the tableau of n qubits: two bit matrices of n columns of
// ⌈2n/64⌉ words.
func tableauBytes(n int) float64 {
	return 2 * float64(n) * float64((2*n+63)/64) * 8
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
