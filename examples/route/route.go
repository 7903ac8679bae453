package route

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// Route returns c routed onto device g: a circuit on all of g's physical qubits in which every
// two-qubit gate acts on coupled qubits, and the final layout perm, with logical qubit i ending on
// physical qubit perm[i]. Logical qubits beyond c's width (when the device is larger) are idle
// and are moved like the others; perm has one entry per physical qubit.
//
// The routed circuit equals c, widened to the device, followed by the permutation perm: for
// every input, physical qubit perm[i] of the output holds what logical qubit i held.
//
// The router is greedy: for each two-qubit gate on qubits that are not coupled, it swaps the two
// ends toward each other along a shortest path, one hop from each end in turn, until they meet.
// It does not look ahead and never undoes the permutation at the end. Gates on three or more
// qubits are refused with an error: decompose them first. c is not modified.
func Route(c *circuit.Circuit, g *Coupling) (*circuit.Circuit, []int, error) {
	if err := g.Validate(); err != nil {
		return nil, nil, err
	}
	if err := c.Validate(); err != nil {
		return nil, nil, fmt.Errorf("route: %w", err)
	}
	n := g.Qubits()
	if c.Qubits() > n {
		return nil, nil, fmt.Errorf("route: circuit has %d qubits, device only %d", c.Qubits(), n)
	}
	phys := make([]int, n) // phys[l]: physical qubit holding logical qubit l
	logi := make([]int, n) // logi[p]: logical qubit on physical qubit p
	for i := range phys {
		phys[i], logi[i] = i, i
	}
	swap := func(out *circuit.Circuit, p, q int) {
		out.SWAP(p, q)
		lp, lq := logi[p], logi[q]
		logi[p], logi[q] = lq, lp
		phys[lp], phys[lq] = q, p
	}
	out := circuit.New(n).SetBits(c.Bits())
	for i, op := range c.Ops {
		if op.Gate.Name != "barrier" && len(op.Qubits) > 2 {
			return nil, nil, &circuit.OpError{Index: i, Gate: op.Gate.Name,
				Err: fmt.Sprintf("acts on %d qubits; the router couples pairs only, decompose it first", len(op.Qubits))}
		}
		if len(op.Qubits) == 2 && op.Gate.Name != "barrier" {
			a, b := phys[op.Qubits[0]], phys[op.Qubits[1]]
			for moveA := true; !g.Coupled(a, b); moveA = !moveA {
				if moveA {
					next := g.step(a, b)
					swap(out, a, next)
					a = next
				} else {
					next := g.step(b, a)
					swap(out, b, next)
					b = next
				}
			}
		}
		mapped := op.Clone()
		for k, q := range mapped.Qubits {
			mapped.Qubits[k] = phys[q]
		}
		out.AppendOp(mapped)
	}
	return out, phys, nil
}
