package sim

import "testing"

// pauliOf builds a Pauli string from letters, qubit 0 first.
func pauliOf(letters string) Pauli {
	p := newPauli(len(letters))
	for q := range letters {
		p.set(q, letters[q])
	}
	return p
}

// Pauli products by hand from the single-qubit table XY = iZ, YZ = iX, ZX = iY (and the
// reverse orders with −i): two strings anticommute exactly when an odd number of qubits carry
// two different non-identity factors.
func TestPauliAnticommutes(t *testing.T) {
	cases := []struct {
		a, b string
		want bool
	}{
		{"X", "Z", true},
		{"X", "Y", true},
		{"Y", "Z", true},
		{"X", "X", false},
		{"I", "Z", false},
		{"XX", "ZZ", false}, // two sign flips cancel: XX and ZZ commute (the Bell stabilizers)
		{"XZ", "ZX", false},
		{"XI", "ZZ", true},
		{"XYZ", "ZZZ", false},
		{"XYZ", "ZZX", true},
	}
	for _, c := range cases {
		if got := pauliOf(c.a).Anticommutes(pauliOf(c.b)); got != c.want {
			t.Errorf("%s, %s: anticommute %v, want %v", c.a, c.b, got, c.want)
		}
	}
	// Across a word boundary: X on qubit 70 against Z on qubit 70.
	x, z := PauliX(130, 70), PauliZ(130, 70)
	if !x.Anticommutes(z) || x.Anticommutes(PauliZ(130, 69)) {
		t.Error("qubit 70 of 130: wrong answer across words")
	}
}
