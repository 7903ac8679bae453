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
// independent fair coin, a uniform distribution over 2^500 outcomes, compared exactly.
func ExampleCompareCliffordPrograms() {
	c := circuit.New(500)
	for q := 0; q < 500; q++ {
		c.H(q).Measure(q, q).Reset(q)
	}
	st, _ := sim.StabilizerProgramOutcomes(c, sim.ProgramOptions{})
	dim, ok := st.Uniform()
	fmt.Println("uniform:", ok, "over 2 ^", dim)
	d := c.Clone()
	d.Ops[len(d.Ops)-3] = circuit.Op{Gate: d.Ops[0].Gate, Qubits: []int{499}}  // h → h on q499: same
	d.Ops = append(d.Ops[:len(d.Ops)-3:len(d.Ops)-3], d.Ops[len(d.Ops)-2:]...) // drop the last h
	g, _ := sim.CompareCliffordPrograms(c, d, sim.ProgramOptions{})
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
