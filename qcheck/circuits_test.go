package qcheck

import (
	"math"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// testGates is the gate mix of the test generator: Clifford+T, rotations and two-qubit gates.
var testGates = []string{"h", "x", "z", "s", "sdg", "t", "tdg", "sx", "rz", "rx", "ry", "p", "cx", "cz", "cp", "crz", "swap"}

// circuits generates circuits of n qubits and up to maxOps ops from testGates, with angles that
// are often multiples of π/4. It stands in for gen.Circuit in this package's tests.
func circuits(n, maxOps int) *rapid.Generator[*circuit.Circuit] {
	gates := make([]string, 0, len(testGates))
	for _, name := range testGates {
		if spec, _ := circuit.Lookup(name); spec.Qubits <= n {
			gates = append(gates, name)
		}
	}
	qubits := make([]int, n)
	for i := range qubits {
		qubits[i] = i
	}
	angle := rapid.OneOf(
		rapid.Map(rapid.IntRange(-8, 8), func(k int) float64 { return float64(k) * math.Pi / 4 }),
		rapid.Float64Range(-math.Pi, math.Pi),
	)
	return rapid.Custom(func(t *rapid.T) *circuit.Circuit {
		c := circuit.New(n)
		ops := rapid.IntRange(0, maxOps).Draw(t, "ops")
		for i := 0; i < ops; i++ {
			name := rapid.SampledFrom(gates).Draw(t, "gate")
			spec, _ := circuit.Lookup(name)
			params := make([]float64, spec.Params)
			for k := range params {
				params[k] = angle.Draw(t, "angle")
			}
			g, _ := circuit.NewGate(name, params...)
			qs := rapid.Permutation(qubits).Draw(t, "qubits")[:spec.Qubits]
			c.Append(g, qs...)
		}
		return c
	})
}
