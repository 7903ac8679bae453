// Package inverted is Fieldfare's router (package route) with a planted bug, kept so that
// qcheck's tests, detection-rate measurement and demo have a routing bug to find. Do not use it
// to compile anything.
//
// The bug is the classic mix-up of a layout with its inverse: Route reports, for each physical
// qubit, the logical qubit it holds (physical → logical), where the contract is logical qubit i
// ends on physical qubit perm[i] (logical → physical). The two agree whenever the permutation is
// its own inverse (no SWAPs, or disjoint pairs of exchanged qubits), so hand-written tests with
// one or two SWAPs pass; a checker that undoes the reported layout does not.
package inverted

import (
	"qcheck.dev/examples/route"
	"qcheck.dev/qcheck/circuit"
)

// Route is route.Route with the final layout inverted.
func Route(c *circuit.Circuit, g *route.Coupling) (*circuit.Circuit, []int, error) {
	out, perm, err := route.Route(c, g)
	if err != nil {
		return nil, nil, err
	}
	inv := make([]int, len(perm))
	for logical, physical := range perm {
		inv[physical] = logical // the bug: this is the physical → logical map
	}
	return out, inv, nil
}
