package readout_test

import (
	"fmt"

	"qcheck.dev/examples/readout"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// A Bell pair read out after a phase and a SWAP: the SWAP goes, then the phase, the measurements trade qubits, and the
// distribution of the two bits is unchanged.
func Example() {
	c := circuit.New(2).H(0).CX(0, 1).T(1).SWAP(0, 1).Measure(0, 0).Measure(1, 1)
	out := readout.DropDiagonals(readout.RelabelSwaps(c))
	for _, op := range out.Ops {
		fmt.Println(op)
	}
	g, err := sim.ComparePrograms(c, out, sim.ProgramOptions{})
	fmt.Println("distance:", g.Distance, err)
	// Output:
	// h q0
	// cx q0,q1
	// measure q1 -> c0
	// measure q0 -> c1
	// distance: 0 <nil>
}
