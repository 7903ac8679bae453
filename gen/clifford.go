package gen

import (
	"fmt"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Clifford returns a generator of Clifford circuits on the given number of
// qubits, uniformly distributed over the Clifford group modulo global phase
// (24 elements for one qubit, 11520 for two), written with the gates h, s, cx
// and the Paulis x, y, z.
//
// Algorithm: the pair-by-pair decomposition of Koenig & Smolin, "How to
// efficiently select an arbitrary Clifford group element", J. Math. Phys. 55,
// 122202 (2014). A Clifford is fixed, up to phase, by the Paulis it sends X_k
// and Z_k to. For k = 0, 1, …, the images of X_k and Z_k are drawn uniformly
// among the anticommuting pairs of Paulis on qubits k..n−1 (a nonzero v, then
// a w with ⟨v, w⟩ = 1 in the symplectic form), which makes the symplectic part
// uniform over Sp(2n, F_2); a uniform layer of Paulis then makes the signs
// uniform. Where Koenig & Smolin realize each step with symplectic
// transvections, this code realizes it with a short sweep of h, s and cx that
// carries (v, w) to (X_k, Z_k), applied in reverse.
//
// The randomness is drawn bit by bit through rapid without rapid's lean
// toward small values, so draws inside a property test are exactly uniform;
// a failing case shrinks toward the identity (the empty circuit) through
// Cliffords whose images are close to X_k and Z_k. A draw makes O(n²)
// draws and gates. With qubits < 1 every draw fails the test
// with an error saying so.
func Clifford(qubits int) *rapid.Generator[*circuit.Circuit] {
	if qubits < 1 {
		return failing[*circuit.Circuit](fmt.Errorf("gen.Clifford: qubits = %d, want ≥ 1", qubits))
	}
	return rapid.Custom(func(t *rapid.T) *circuit.Circuit {
		c := circuit.New(qubits)
		for _, op := range drawClifford(t, qubits) {
			c.Append(cliffordGates[op.name], op.qubits...)
		}
		return c
	})
}

// cliffordGates are the gates a drawn Clifford is written with.
var cliffordGates = map[string]circuit.Gate{}

func init() {
	for _, name := range []string{"h", "s", "cx", "x", "y", "z"} {
		g, err := circuit.NewGate(name)
		if err != nil {
			panic("gen: the standard library lacks " + name + ": " + err.Error())
		}
		cliffordGates[name] = g
	}
}
