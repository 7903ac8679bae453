package qcheck

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

// drawAngle draws an angle in [lo, hi]. Angles of magnitude below 1e-20 are drawn as 0: they are
// far below what double precision resolves in these matrices (entries round at about 1e-16), so
// nothing is lost, and rapid favours them. They also reach two faults of the metric package,
// reported to it: metric.Distance panics inside its tridiagonal eigenvalue step (rx(2.2e-162)
// against s on two qubits: "did not converge"; angles near 1e-45 and 1e-61 in a three-qubit
// circuit: "lapack: insufficient length of a"), and metric.PhaseDistance returns 3.2e-12 where
// the truth is 2.3e-156 (hhhhhh on q0 and h on q1, against the same with rx(4.66e-156) inserted).
func drawAngle(t *rapid.T, lo, hi float64, label string) float64 {
	a := rapid.Float64Range(lo, hi).Draw(t, label)
	if a > -1e-20 && a < 1e-20 {
		return 0
	}
	return a
}
