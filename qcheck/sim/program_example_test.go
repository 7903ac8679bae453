package sim_test

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// A program and its routed form: the routed one runs on three qubits and measures qubit 2 into
// bit 0. Compared through their classical bits they agree; measuring into swapped bits does not.
func ExampleComparePrograms() {
	want := circuit.New(2).X(0).H(1).Measure(0, 0).Measure(1, 1)
	routed := circuit.New(3).X(2).H(1).Measure(2, 0).Measure(1, 1)
	g, _ := sim.ComparePrograms(want, routed, sim.ProgramOptions{})
	fmt.Println("routed:", g.Distance)
	swapped := circuit.New(2).X(0).H(1).Measure(0, 1).Measure(1, 0)
	g, _ = sim.ComparePrograms(want, swapped, sim.ProgramOptions{})
	fmt.Printf("swapped bits: %.6f, outcome %s: %.6f against %.6f\n", g.Distance, g.Outcome, g.Want, g.Got)
	// Output:
	// routed: 0
	// swapped bits: 0.500000, outcome 01: 0.500000 against 0.000000
}

// A Clifford program on 500 qubits with a measurement and a reset on each: every bit is an
// independent fair coin, a uniform distribution over 2^500 outcomes, compared exactly. Without
// the last h, bit 499 always reads 0: the smaller set is half of the larger, at distance
// 1 − 2^499/2^500 = ½.
func ExampleCompareCliffordPrograms() {
	coins := func(n, h int) *circuit.Circuit {
		c := circuit.New(n)
		for q := 0; q < n; q++ {
			if q < h {
				c.H(q)
			}
			c.Measure(q, q).Reset(q)
		}
		return c
	}
	st, _ := sim.StabilizerProgramOutcomes(coins(500, 500), sim.ProgramOptions{})
	dim, ok := st.Uniform()
	fmt.Println("uniform:", ok, "over 2 ^", dim)
	g, _ := sim.CompareCliffordPrograms(coins(500, 500), coins(500, 499), sim.ProgramOptions{})
	fmt.Println("without the last h:", g.Distance)
	// Output:
	// uniform: true over 2 ^ 500
	// without the last h: 0.5
}

// Two preparations that differ by a cz, which acts only on |11⟩: from |00⟩ after h on qubit 0
// alone the state never reaches |11⟩, so the zero-input meaning sees no difference.
func ExampleCompareFromZero() {
	g, _ := sim.CompareFromZero(circuit.New(2).H(0), circuit.New(2).H(0).CZ(0, 1))
	fmt.Printf("distance %.3g, fidelity %.6f\n", g.Distance, g.Fidelity())
	// Output:
	// distance 0, fidelity 1.000000
}
