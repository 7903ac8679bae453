package sim

import (
	"math/rand/v2"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// benchProgram draws a fixed random program: gates from names on random qubits (angles for the
// rotations), a measurement of a random qubit into a random bit after every gatesPerMeasure
// gates, and a final measurement of every qubit q into bit q when final is set.
func benchProgram(seed uint64, qubits, gates, gatesPerMeasure int, names []string, final bool) *circuit.Circuit {
	rng := rand.New(rand.NewPCG(seed, 7))
	c := circuit.New(qubits).SetBits(qubits)
	for i := 0; i < gates; i++ {
		a := rng.IntN(qubits)
		b := (a + 1 + rng.IntN(qubits-1)) % qubits
		switch names[rng.IntN(len(names))] {
		case "h":
			c.H(a)
		case "s":
			c.S(a)
		case "x":
			c.X(a)
		case "cx":
			c.CX(a, b)
		case "cz":
			c.CZ(a, b)
		case "t":
			c.T(a)
		case "ry":
			c.RY(rng.Float64()*6, a)
		case "rzz":
			c.RZZ(rng.Float64()*6, a, b)
		}
		if gatesPerMeasure > 0 && i%gatesPerMeasure == gatesPerMeasure-1 {
			c.Measure(rng.IntN(qubits), rng.IntN(qubits))
		}
	}
	if final {
		for q := 0; q < qubits; q++ {
			c.Measure(q, q)
		}
	}
	return c
}

// BenchmarkComparePrograms compares two 20-qubit programs of 1,000 gates that measure every
// qubit at the end (the second with one gate changed): two statevector runs, two marginal
// distributions over 2^20 outcomes and their exact total-variation distance.
func BenchmarkComparePrograms(b *testing.B) {
	names := []string{"h", "cx", "t", "ry", "rzz", "s", "cz"}
	want := benchProgram(1, 20, 1000, 0, names, true)
	got := want.Clone()
	got.Ops[500] = circuit.Op{Gate: got.Ops[500].Gate.Inverse(), Qubits: got.Ops[500].Qubits}
	cpu := processCPU()
	for b.Loop() {
		if _, err := ComparePrograms(want, got, ProgramOptions{}); err != nil {
			b.Fatal(err)
		}
	}
	reportCPU(b, cpu)
}

// BenchmarkCompareCliffordPrograms compares two Clifford programs on 1,000 qubits with 2,000
// gates and 1,000 mid-circuit measurements each (one every other gate), on the stabilizer engine.
func BenchmarkCompareCliffordPrograms(b *testing.B) {
	names := []string{"h", "s", "cx", "cz", "x"}
	want := benchProgram(2, 1000, 2000, 2, names, false)
	got := benchProgram(3, 1000, 2000, 2, names, false)
	cpu := processCPU()
	for b.Loop() {
		if _, err := CompareCliffordPrograms(want, got, ProgramOptions{}); err != nil {
			b.Fatal(err)
		}
	}
	reportCPU(b, cpu)
}
