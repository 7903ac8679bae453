// Package shrink finishes the job of rapid's shrinker on circuits: Minimize turns a failing
// circuit into a 1-minimal one, from which removing any single op, lowering any qubit index, or
// replacing any angle by a simpler special angle makes the failure disappear.
//
// rapid shrinks the random choices a generator made, not the circuit, so it stops where no
// single choice can move: a motif whose ops were derived from one another, an angle computed
// from another, a qubit that cannot move without moving the ops drawn after it. Minimize works
// on the circuit itself, deterministically, and so ends where no single edit of the three kinds
// keeps the failure. Its result is a plain circuit, rebuilt in Go by its GoString, not a case
// rapid can replay.
package shrink

import (
	"fmt"
	"math"
	"slices"

	"qcheck.dev/qcheck/circuit"
)

// Special angles, simplest first: 0, then ±π/4, ±π/2, ±3π/4, ±π, ±2π, ±4π (the angles at which
// rotation gates become Cliffords, identities or their negatives), positive before negative.
var special = func() []float64 {
	out := []float64{0}
	for _, m := range []float64{math.Pi / 4, math.Pi / 2, 3 * math.Pi / 4, math.Pi, 2 * math.Pi, 4 * math.Pi} {
		out = append(out, m, -m)
	}
	return out
}()

// Simpler returns the special angles simpler than a, simplest first: all of them when a is not
// special, and those listed before it when it is.
func Simpler(a float64) []float64 {
	if i := slices.Index(special, a); i >= 0 {
		return special[:i]
	}
	return special
}

// Minimize returns a 1-minimal circuit for which fails holds, starting from c, for which it must
// hold (otherwise c is returned unchanged). It tries, in turn and until none applies: removing
// one op (the first that keeps the failure, from the front), moving every op on a qubit to a
// lower qubit no op uses, lowering one qubit index of one op to the lowest index, not among the
// op's other operands, that keeps it, replacing one angle by
// the simplest special angle that keeps it (Simpler), and last removing two ops at once. Each
// accepted edit makes the circuit shorter, or the sum of its qubit indices smaller, or an angle
// simpler, so the search ends. c is not modified.
//
// fails must be deterministic; it is called on circuits that pass Validate when c does.
func Minimize(c *circuit.Circuit, fails func(*circuit.Circuit) bool) *circuit.Circuit {
	if !fails(c) {
		return c
	}
	cur := c.Clone()
	for {
		next := step(cur, fails)
		if next == nil {
			return cur
		}
		cur = next
	}
}

// step returns the first single edit of c that keeps the failure or, when there is none, the
// first removal of two ops that does (a pair that only fails together, such as h·h between two
// gates that merge across it), or nil.
func step(c *circuit.Circuit, fails func(*circuit.Circuit) bool) *circuit.Circuit {
	var found *circuit.Circuit
	edits(c, func(d *circuit.Circuit, _ string) bool {
		if fails(d) {
			found = d
			return false
		}
		return true
	})
	if found != nil {
		return found
	}
	for i := range c.Ops {
		for j := i + 1; j < len(c.Ops); j++ {
			d := c.Clone()
			d.Ops = slices.Delete(d.Ops, j, j+1)
			d.Ops = slices.Delete(d.Ops, i, i+1)
			if fails(d) {
				return d
			}
		}
	}
	return nil
}

// edits calls try with every circuit one edit away from c, in Minimize's order, and a description
// of the edit, until try returns false.
func edits(c *circuit.Circuit, try func(d *circuit.Circuit, edit string) bool) {
	for i := range c.Ops {
		d := c.Clone()
		d.Ops = slices.Delete(d.Ops, i, i+1)
		if !try(d, fmt.Sprintf("remove op %d (%v)", i, c.Ops[i])) {
			return
		}
	}
	used := make([]bool, c.Qubits())
	for _, op := range c.Ops {
		for _, q := range op.Qubits {
			used[q] = true
		}
	}
	for q := range used {
		for lower := 0; lower < q && used[q]; lower++ {
			if used[lower] {
				continue
			}
			d := c.Clone()
			for i := range d.Ops {
				for k, r := range d.Ops[i].Qubits {
					if r == q {
						d.Ops[i].Qubits[k] = lower
					}
				}
			}
			if !try(d, fmt.Sprintf("qubit %d → %d in every op", q, lower)) {
				return
			}
		}
	}
	for i, op := range c.Ops {
		for k, q := range op.Qubits {
			for lower := 0; lower < q; lower++ {
				if slices.Contains(op.Qubits, lower) {
					continue
				}
				d := c.Clone()
				d.Ops[i].Qubits[k] = lower
				if !try(d, fmt.Sprintf("op %d (%v): qubit %d → %d", i, op, q, lower)) {
					return
				}
			}
		}
	}
	for i, op := range c.Ops {
		for k, a := range op.Gate.Params {
			for _, s := range Simpler(a) {
				d := c.Clone()
				d.Ops[i].Gate.Params[k] = s
				if !try(d, fmt.Sprintf("op %d (%v): angle %d %.17g → %.17g", i, op, k, a, s)) {
					return
				}
			}
		}
	}
}

// Check reports, by trying every single edit Minimize knows, whether c is 1-minimal for fails:
// nil if fails(c) holds and no edit keeps the failure, and an error naming an edit that does
// otherwise. It is the brute-force check of Minimize's promise.
func Check(c *circuit.Circuit, fails func(*circuit.Circuit) bool) error {
	if !fails(c) {
		return fmt.Errorf("shrink: the circuit does not fail")
	}
	var err error
	edits(c, func(d *circuit.Circuit, edit string) bool {
		if fails(d) {
			err = fmt.Errorf("shrink: not 1-minimal: after %s it still fails", edit)
			return false
		}
		return true
	})
	return err
}
