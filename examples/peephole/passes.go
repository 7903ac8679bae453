package peephole

import "qcheck.dev/qcheck/circuit"

// CancelInverses removes every gate that meets its exact inverse on the same qubits, sliding
// gates past those they commute with to find more pairs (x·cx·x on the target, z·cx·z on the
// control). It returns a new circuit and never modifies c.
func CancelInverses(c *circuit.Circuit) (*circuit.Circuit, error) {
	return Rules{Commutes: Commutes, Merge: CancelPair}.Apply(c)
}

// MergeRotations merges rotations about the same axis on the same qubits into one (rz+rz, rx+rx,
// p+s+t, cp+cz, crz+crz, rzz+rzz...) and drops those that come to the identity, sliding
// Z-rotations through cx controls and X-rotations through cx targets to meet their partners. It
// returns a new circuit and never modifies c.
func MergeRotations(c *circuit.Circuit) (*circuit.Circuit, error) {
	return Rules{Commutes: Commutes, Merge: MergePair}.Apply(c)
}

// Optimize does both at once, to a fixed point: Fieldfare's peephole stage.
func Optimize(c *circuit.Circuit) (*circuit.Circuit, error) {
	return Standard().Apply(c)
}
