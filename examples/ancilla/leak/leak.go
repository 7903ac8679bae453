// Package leak is a variant of Fieldfare's clean-ancilla chain (ancilla.Chain) with a planted
// bug, kept so that qcheck's tests, detection-rate measurement and demo have a real ancilla bug to
// find. Do not use it to compile anything.
//
// The bug is an off-by-one in the uncompute loop: it stops before the first Toffoli of the
// ladder, so the first ancilla is left holding control_1 AND control_2 instead of returning to
// |0⟩. The target is still right, so a test that only looks at the target, or only starts from
// inputs where the first two controls are not both 1, passes; the ancilla check of qcheck does not.
package leak

import (
	"fmt"

	"qcheck.dev/examples/ancilla"
	"qcheck.dev/qcheck/circuit"
)

// Ancillas is how many clean ancillas Lower appends: enough for five controls.
const Ancillas = 3

// Chain is ancilla.Chain with the uncompute loop one step short.
func Chain(c *circuit.Circuit, controls []int, target int, work []int) error {
	k := len(controls)
	if k < 3 {
		return ancilla.Chain(c, controls, target, work)
	}
	if len(work) < k-2 {
		return fmt.Errorf("leak: the chain for %d controls needs %d clean ancillas, got %d", k, k-2, len(work))
	}
	c.CCX(controls[0], controls[1], work[0])
	for i := 2; i < k-1; i++ {
		c.CCX(controls[i], work[i-2], work[i-1])
	}
	c.CCX(controls[k-1], work[k-3], target)
	for i := k - 2; i > 1; i-- { // the bug: the last step, CCX(controls[0], controls[1], work[0]), is missing
		c.CCX(controls[i], work[i-2], work[i-1])
	}
	return nil
}

// Lower lowers every X with three to five controls with the leaky chain, appending Ancillas
// clean ancillas after the circuit's qubits.
func Lower(c *circuit.Circuit) (*circuit.Circuit, error) {
	return ancilla.Lowering{Build: Chain, Ancillas: Ancillas, Clean: true}.Apply(c)
}
