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
	return circuitsOf(n, 0, maxOps, testGates...)
}

// circuitsOf is circuits of minOps to maxOps ops over the given gates (those that fit on n
// qubits). The ops are drawn as a rapid slice, so that shrinking deletes ops anywhere in the
// circuit; rapid's slices average minOps + 5 elements.
func circuitsOf(n, minOps, maxOps int, names ...string) *rapid.Generator[*circuit.Circuit] {
	var gates []circuit.Spec
	for _, name := range names {
		if spec, _ := circuit.Lookup(name); spec.Qubits <= n {
			gates = append(gates, spec)
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
	op := rapid.Custom(func(t *rapid.T) circuit.Op {
		spec := rapid.SampledFrom(gates).Draw(t, "gate")
		params := make([]float64, spec.Params)
		for k := range params {
			params[k] = angle.Draw(t, "angle")
		}
		g, _ := circuit.NewGate(spec.Name, params...)
		qs := rapid.Permutation(qubits).Draw(t, "qubits")[:spec.Qubits]
		return circuit.Op{Gate: g, Qubits: qs}
	})
	return rapid.Custom(func(t *rapid.T) *circuit.Circuit {
		c := circuit.New(n)
		c.Ops = rapid.SliceOfN(op, minOps, maxOps).Draw(t, "ops")
		return c
	})
}
