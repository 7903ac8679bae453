package peephole_test

import (
	"fmt"

	"qcheck.dev/examples/peephole"
	"qcheck.dev/qcheck/circuit"
)

// An rz slides through the control of a cx to merge with the rz after it; an x slides through the
// target of the next cx and cancels with the x after that.
func ExampleOptimize() {
	c := circuit.New(3).RZ(0.25, 0).CX(0, 1).RZ(0.5, 0).X(1).CX(2, 1).X(1)
	out, err := peephole.Optimize(c)
	if err != nil {
		fmt.Println(err)
		return
	}
	for _, op := range out.Ops {
		fmt.Println(op)
	}
	// Output:
	// cx q0,q1
	// rz(0.75) q0
	// cx q2,q1
}

// Phase gates merge into one, named where it has a name: t·t·s is p(π), which is z.
func ExampleMergeRotations() {
	out, err := peephole.MergeRotations(circuit.New(1).T(0).T(0).S(0))
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(out.Ops)
	// Output:
	// [z q0]
}
