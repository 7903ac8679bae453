package qcheck

import (
	"pgregory.net/rapid"

	"qcheck.dev/qcheck/circuit"
)

// Test-only generators of small circuits for the ledger's properties. They draw from a fixed
// mix of standard gates with arbitrary angles; the gen package serves users, these serve only the
// ledger's own tests.

var ledgerGates = []struct {
	name   string
	qubits int
	params int
}{
	{"h", 1, 0}, {"s", 1, 0}, {"t", 1, 0}, {"x", 1, 0}, {"sx", 1, 0},
	{"rx", 1, 1}, {"ry", 1, 1}, {"rz", 1, 1}, {"p", 1, 1}, {"u", 1, 3},
	{"cx", 2, 0}, {"cz", 2, 0}, {"crz", 2, 1}, {"rzz", 2, 1}, {"swap", 2, 0},
}

// drawOp draws one gate on distinct qubits of an n-qubit register (n ≥ 2).
func drawOp(t *rapid.T, n int, label string) circuit.Op {
	g := ledgerGates[rapid.IntRange(0, len(ledgerGates)-1).Draw(t, label+" gate")]
	params := make([]float64, g.params)
	for i := range params {
		params[i] = drawAngle(t, -7, 7, label+" angle")
	}
	gate, err := circuit.NewGate(g.name, params...)
	if err != nil {
		t.Fatalf("test generator: %v", err)
	}
	qs := rapid.Permutation(allQubits(n)).Draw(t, label+" qubits")[:g.qubits]
	return circuit.Op{Gate: gate, Qubits: qs}
}

func allQubits(n int) []int {
	qs := make([]int, n)
	for i := range qs {
		qs[i] = i
	}
	return qs
}

// drawCircuit draws a circuit of n qubits with between 1 and maxOps ops.
func drawCircuit(t *rapid.T, n, maxOps int, label string) *circuit.Circuit {
	c := circuit.New(n)
	ops := rapid.IntRange(1, maxOps).Draw(t, label+" length")
	for i := 0; i < ops; i++ {
		c.AppendOp(drawOp(t, n, label))
	}
	return c
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
