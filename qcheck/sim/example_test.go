package sim_test

import (
	"fmt"
	"math/cmplx"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// The Bell circuit's unitary: column 0 is H then CX applied to |00⟩, (|00⟩ + |11⟩)/√2.
func ExampleUnitary() {
	u, err := sim.Unitary(circuit.New(2).H(0).CX(0, 1))
	if err != nil {
		panic(err)
	}
	for i := 0; i < 4; i++ {
		fmt.Printf("%.4f\n", real(u.At(i, 0)))
	}
	// Output:
	// 0.7071
	// 0.0000
	// 0.0000
	// 0.7071
}

// A GHZ state on five qubits, prepared in place from |00000⟩.
func ExampleApply() {
	c := circuit.New(5).H(0).CX(0, 1).CX(1, 2).CX(2, 3).CX(3, 4)
	state := make([]complex128, 1<<5)
	state[0] = 1
	if err := sim.Apply(c, state); err != nil {
		panic(err)
	}
	for i, a := range state {
		if cmplx.Abs(a) > 1e-12 {
			fmt.Printf("|%05b⟩ %.4f\n", i, real(a))
		}
	}
	// Output:
	// |00000⟩ 0.7071
	// |11111⟩ 0.7071
}

// Compile once, run many times: here a circuit and its inverse, which bring a state back.
func ExampleCompile() {
	c := circuit.New(3).H(0).T(0).CX(0, 2).RY(0.3, 1).CZ(1, 2)
	forward, err := sim.Compile(c)
	if err != nil {
		panic(err)
	}
	backward, err := sim.Compile(c.Inverse())
	if err != nil {
		panic(err)
	}
	state := []complex128{0, 1, 0, 0, 0, 0, 0, 0} // |001⟩: qubit 0 set
	for range 3 {
		_ = forward.Apply(state)
		_ = backward.Apply(state)
	}
	fmt.Printf("%.6f\n", cmplx.Abs(state[1]))
	// Output:
	// 1.000000
}
