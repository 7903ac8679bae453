package ancilla

import (
	"fmt"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// MaxControls is the largest number of controls MCX makes a gate for: its matrix has
// 2^(k+1) × 2^(k+1) entries, 16 MiB at k = 9.
const MaxControls = 9

// MCX returns the X gate with k controls, for operands (control_1, …, control_k, target): x for
// k = 0, cx for 1, ccx for 2, and for k ≥ 3 a custom gate named "c<k>x" (c3x, c4x, … as in the
// OpenQASM 2.0 standard library's names) whose matrix flips the target exactly when every control
// is 1.
func MCX(k int) (circuit.Gate, error) {
	switch {
	case k < 0 || k > MaxControls:
		return circuit.Gate{}, fmt.Errorf("ancilla: MCX with %d controls; want 0 to %d", k, MaxControls)
	case k <= 2:
		return circuit.NewGate([]string{"x", "cx", "ccx"}[k])
	}
	return circuit.Custom(fmt.Sprintf("c%dx", k), mat.NewCDense(1<<(k+1), 1<<(k+1), mcxElements(k)))
}

// mcxElements returns the row-major matrix of X with k controls in textbook operand order: the
// target is the least significant bit of the local index, so the permutation exchanges the last
// two basis states.
func mcxElements(k int) []complex128 {
	d := 1 << (k + 1)
	m := make([]complex128, d*d)
	for i := 0; i < d; i++ {
		j := i
		if i >= d-2 {
			j = i ^ 1
		}
		m[i*d+j] = 1
	}
	return m
}

// controlsOf returns k when op is an X gate with k ≥ 3 controls made by MCX, and 0 for any other
// op. The name alone is not trusted: the matrix must be MCX's.
func controlsOf(op circuit.Op) int {
	k := len(op.Qubits) - 1
	if !op.Gate.IsCustom() || k < 3 || k > MaxControls || op.Gate.Name != fmt.Sprintf("c%dx", k) {
		return 0
	}
	got, want := op.Gate.Elements(), mcxElements(k)
	for i := range want {
		if got[i] != want[i] {
			return 0
		}
	}
	return k
}
