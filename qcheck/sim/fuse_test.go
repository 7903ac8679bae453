package sim

import (
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// Fusion does what the statevector engine needs for speed: a run of one-qubit gates on a qubit
// becomes one gate, one-qubit gates on both sides of a two-qubit gate ride along with it, and a
// gate on another qubit in between does not stop either. The matrices it builds are checked by
// the NumPy agreement tests; here only the number of sweeps is counted.
func TestFusionMerges(t *testing.T) {
	cases := []struct {
		name string
		c    *circuit.Circuit
		want int
	}{
		{"run on one qubit", circuit.New(2).H(0).T(0).RX(0.3, 0).S(0).SX(0).U(0.1, 0.2, 0.3, 0), 1},
		{"one-qubit gates around a two-qubit gate", circuit.New(3).H(0).RY(0.2, 1).CX(0, 1).RZ(0.4, 1).T(0), 1},
		{"interleaved qubits", circuit.New(3).H(0).H(2).T(0).CZ(0, 1).X(2).S(1).CRX(0.5, 1, 0), 2},
		{"different pairs stay apart", circuit.New(3).CX(0, 1).CX(1, 2).CX(0, 1), 3},
		{"barrier is skipped", circuit.New(1).H(0).Barrier(0).H(0), 1},
		{"three-qubit gate absorbs its neighbours", circuit.New(3).H(2).CCX(0, 1, 2).H(2), 1},
	}
	for _, tc := range cases {
		if got := len(fuse(tc.c, statevectorSweepCost)); got != tc.want {
			t.Errorf("%s: %d fused gates, want %d", tc.name, got, tc.want)
		}
	}
}
