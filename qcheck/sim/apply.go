package sim

import (
	"qcheck.dev/qcheck/circuit"
)

// Apply runs the circuit on a statevector in place. The state must have 2^n entries for a circuit
// of n qubits, indexed by Σ_q b_q·2^q; it need not be normalised (the map is linear). It needs no
// memory beyond the state, so the width is bounded by what the caller can allocate: 2^28
// amplitudes take 4 GiB. Gates are fused first, and large states run on all cores.
//
// To apply the inverse of a circuit, apply its inverse circuit: Apply(c.Inverse(), state), which
// costs the same as Apply(c, state) because circuit.Inverse only reverses and inverts gates. To
// run one circuit on many states, Compile it once and call Program.Apply.
func Apply(c *circuit.Circuit, state []complex128) error {
	p, err := Compile(c)
	if err != nil {
		return err
	}
	return p.Apply(state)
}
