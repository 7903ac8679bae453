package sim

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// Apply runs the circuit on a statevector in place. The state must have 2^n entries for a circuit
// of n qubits, indexed by Σ_q b_q·2^q; it need not be normalised (the map is linear).
func Apply(c *circuit.Circuit, state []complex128) error {
	if err := checkUnitary(c); err != nil {
		return err
	}
	n := c.Qubits()
	if n > 40 || len(state) != 1<<n {
		return fmt.Errorf("sim: state has %d entries, a %d-qubit circuit needs 2^%d", len(state), n, n)
	}
	for _, op := range c.Ops {
		if op.Gate.Name == "barrier" {
			continue
		}
		applyRows(state, n, 1, op.Gate.Elements(), op.Qubits)
	}
	return nil
}
