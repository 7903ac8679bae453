package route_test

import (
	"fmt"

	"qcheck.dev/examples/route"
	"qcheck.dev/qcheck/circuit"
)

// A cx between the two ends of Tarn-6, a line of six qubits: the router swaps both ends inward
// until they meet and reports where each logical qubit ended.
func ExampleRoute() {
	c := circuit.New(6).H(0).CX(0, 5)
	routed, perm, err := route.Route(c, route.Line(6))
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, op := range routed.Ops {
		fmt.Println(op)
	}
	fmt.Println("layout:", perm)
	// Output:
	// h q0
	// swap q0,q1
	// swap q5,q4
	// swap q1,q2
	// swap q4,q3
	// cx q2,q3
	// layout: [2 0 1 4 5 3]
}
