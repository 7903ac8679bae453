package synthesis_test

import (
	"fmt"

	"qcheck.dev/examples/synthesis"
	"qcheck.dev/qcheck/budget"
	"qcheck.dev/qcheck/circuit"
)

func ExamplePass() {
	net, err := synthesis.NewNet(12)
	if err != nil {
		panic(err)
	}
	c := circuit.New(2).H(0).RZ(0.3, 0).CX(0, 1).RX(-1.1, 1)
	var l budget.Ledger
	out, err := synthesis.Pass{Net: net, Epsilon: 0.05}.Run(c, &l)
	if err != nil {
		panic(err)
	}
	if err := l.Covers(c, out); err != nil {
		panic(err)
	}
	only := true
	for _, op := range out.Ops {
		switch op.Gate.Name {
		case "h", "s", "sdg", "t", "tdg", "cx":
		default:
			only = false
		}
	}
	fmt.Printf("%d rotations replaced; only Clifford+T gates left: %v\n", l.Len(), only)
	fmt.Printf("certified within ε = 0.05: %v\n", l.Bound() <= 0.05)
	// Output:
	// 2 rotations replaced; only Clifford+T gates left: true
	// certified within ε = 0.05: true
}
