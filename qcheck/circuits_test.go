package qcheck

import (
	"pgregory.net/rapid"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
)

// testGates is the gate mix of the tests: Clifford+T, rotations and two-qubit gates.
var testGates = []string{"h", "x", "z", "s", "sdg", "t", "tdg", "sx", "rz", "rx", "ry", "p", "cx", "cz", "cp", "crz", "swap"}

// circuits generates circuits of n qubits and up to maxOps ops from testGates, with gen's motifs
// (inverse pairs, runs, repeated blocks), which give passes something to do.
func circuits(n, maxOps int) *rapid.Generator[*circuit.Circuit] {
	return gen.Circuit(gen.Options{Qubits: n, MaxOps: maxOps, GateSet: testGates})
}

// circuitsOf generates circuits of n qubits and minOps to maxOps ops from the given gates,
// without motifs: tests that look at the shrunk counterexample get there faster.
func circuitsOf(n, minOps, maxOps int, names ...string) *rapid.Generator[*circuit.Circuit] {
	return gen.Circuit(gen.Options{Qubits: n, MinOps: minOps, MaxOps: maxOps, GateSet: names, Motifs: -1})
}
