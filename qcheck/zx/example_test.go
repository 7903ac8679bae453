package zx_test

import (
	"fmt"
	"math"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/zx"
)

// A Hadamard translated into the rz/sx basis, at qubit 70 of a wide register, is proved equal to
// the original; a T where an S belongs is refuted with the exact distance 2·sin(π/16), on the two qubits
// the CNOT joins.
func ExampleCheck() {
	u := circuit.New(80).H(70).CX(70, 3).S(3)
	v := circuit.New(80).RZ(math.Pi/2, 70).SX(70).RZ(math.Pi/2, 70).CX(70, 3).S(3)
	r, _ := zx.Check(u, v, zx.Options{})
	fmt.Println(r.Verdict, r.Bound < 1e-12)

	w := circuit.New(80).H(70).CX(70, 3).T(3)
	r, _ = zx.Check(u, w, zx.Options{})
	fmt.Printf("%v %.12f %.12f %v\n", r.Verdict, r.Distance, 2*math.Sin(math.Pi/16), r.Support)
	// Output:
	// equivalent true
	// different 0.390180644032 0.390180644032 [3 70]
}
