package ancilla_test

import (
	"fmt"

	"qcheck.dev/examples/ancilla"
	"qcheck.dev/qcheck/circuit"
)

// An X with four controls becomes nine Toffolis: Lower appends one clean ancilla, qubit 5; the
// first three controls are ANDed onto it by a Lemma 7.2 block that borrows qubit 3, a
// Toffoli applies it with control 3 to the target, and the block runs again to clear it.
func ExampleLower() {
	g, err := ancilla.MCX(4)
	if err != nil {
		fmt.Println(err)
		return
	}
	out, err := ancilla.Lower(circuit.New(5).Append(g, 0, 1, 2, 3, 4))
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(out.Qubits(), "qubits,", out.Len(), "Toffolis")
	fmt.Println(out.Ops[0], "…", out.Ops[out.Len()-1])
	// Output:
	// 6 qubits, 9 Toffolis
	// ccx q2,q3,q5 … ccx q0,q1,q3
}

// The ladder of N&C Fig. 4.10 for three controls with one clean ancilla, qubit 4.
func ExampleChain() {
	c := circuit.New(5)
	if err := ancilla.Chain(c, []int{0, 1, 2}, 3, []int{4}); err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(c.Ops)
	// Output:
	// [ccx q0,q1,q4 ccx q2,q4,q3 ccx q0,q1,q4]
}
