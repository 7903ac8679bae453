package peephole

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// Rules is what a peephole search knows: when an op may slide past another, and what two ops on
// the same qubits become when they meet. The zero Rules is not usable; start from Standard.
type Rules struct {
	// Commutes reports whether op a may be moved past op b.
	Commutes func(a, b circuit.Op) bool
	// Merge rewrites an op and the next op on the same qubits.
	Merge MergeFunc
}

// Standard returns Fieldfare's rules: the axis rule of Commutes and MergeOrCancel.
func Standard() Rules { return Rules{Commutes: Commutes, Merge: MergeOrCancel} }

// Apply runs the search to a fixed point and returns the optimized circuit; c is not modified.
//
// For each op in turn it looks forward, past ops on other qubits and ops it commutes with, for
// the first op that acts on exactly the same qubits; if Merge rewrites the pair, the replacement
// takes the later op's place (the earlier op slid forward to meet it) and the search goes on. An
// op it cannot slide past ends the look. Barriers, measurements and resets are never moved,
// merged or crossed. Apply returns an error for an ill-formed circuit and for a Merge that
// returns more than one op.
func (r Rules) Apply(c *circuit.Circuit) (*circuit.Circuit, error) {
	if r.Commutes == nil || r.Merge == nil {
		return nil, fmt.Errorf("peephole: rules need both Commutes and Merge")
	}
	if err := c.Validate(); err != nil {
		return nil, fmt.Errorf("peephole: %w", err)
	}
	ops := make([]circuit.Op, len(c.Ops))
	for i, op := range c.Ops {
		ops[i] = op.Clone()
	}
	for {
		next, changed, err := r.sweep(ops)
		if err != nil {
			return nil, err
		}
		ops = next
		if !changed {
			break
		}
	}
	out := circuit.New(c.Qubits()).SetBits(c.Bits())
	out.Ops = ops
	return out, nil
}

// sweep makes one pass over ops and returns the rewritten list and whether anything changed.
func (r Rules) sweep(ops []circuit.Op) ([]circuit.Op, bool, error) {
	dead := make([]bool, len(ops))
	changed := false
	for i := range ops {
		if dead[i] || !ops[i].Unitary() {
			continue
		}
		j := r.partner(ops, dead, i)
		if j < 0 {
			continue
		}
		repl, ok := r.Merge(ops[i], ops[j])
		if !ok {
			continue
		}
		if len(repl) > 1 {
			return nil, false, fmt.Errorf("peephole: rule turned %s; %s into %d ops; a rule may return at most one", ops[i], ops[j], len(repl))
		}
		changed = true
		dead[i] = true
		if len(repl) == 0 {
			dead[j] = true
		} else {
			ops[j] = repl[0]
		}
	}
	if !changed {
		return ops, false, nil
	}
	kept := ops[:0]
	for i, op := range ops {
		if !dead[i] {
			kept = append(kept, op)
		}
	}
	return kept, true, nil
}

// partner returns the index of the first live op after i that acts on the same set of qubits as
// ops[i] and that Merge accepts, or −1 when an op that ops[i] does not commute with comes first.
func (r Rules) partner(ops []circuit.Op, dead []bool, i int) int {
	a := ops[i]
	for j := i + 1; j < len(ops); j++ {
		b := ops[j]
		if dead[j] || !overlaps(a, b) {
			continue
		}
		if b.Unitary() && sameSet(a.Qubits, b.Qubits) {
			if _, ok := r.Merge(a, b); ok {
				return j
			}
		}
		if !b.Unitary() || !r.Commutes(a, b) {
			return -1
		}
	}
	return -1
}

func overlaps(a, b circuit.Op) bool {
	for _, q := range a.Qubits {
		if touches(b, q) {
			return true
		}
	}
	return false
}
