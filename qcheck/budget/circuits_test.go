package budget

import (
	"pgregory.net/rapid"

	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
)

// drawCircuit draws a circuit of n qubits with between 1 and maxOps ops from gen.Circuit (the
// default gate set up to two-qubit gates: Cliffords, T, rotations, controlled rotations).
func drawCircuit(t *rapid.T, n, maxOps int, label string) *circuit.Circuit {
	var set []string
	for _, name := range gen.DefaultGateSet() {
		if s, ok := circuit.Lookup(name); ok && s.Qubits <= 2 {
			set = append(set, name)
		}
	}
	return gen.Circuit(gen.Options{Qubits: n, MinOps: 1, MaxOps: maxOps, GateSet: set}).Draw(t, label)
}

func allQubits(n int) []int {
	qs := make([]int, n)
	for i := range qs {
		qs[i] = i
	}
	return qs
}

// drawAngle draws an angle in [lo, hi], tiny and subnormal magnitudes included (rapid favours
// them), which metric handles at any scale.
func drawAngle(t *rapid.T, lo, hi float64, label string) float64 {
	return rapid.Float64Range(lo, hi).Draw(t, label)
}
