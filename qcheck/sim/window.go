package sim

import (
	"fmt"
	"slices"

	"qcheck.dev/qcheck/circuit"
)

// Window is what remains of two circuits once the ops they share at their ends are cancelled:
// the positions of the ops left in each, and the qubits those ops touch.
//
// An op is cancelled when it stands, in both circuits, at the start (or at the end) of what is
// left, or can be brought there by exchanging it with ops that act on other qubits only, and the
// two are the same op (circuit.Op.Equal: same gate, same angles bit for bit, same qubits).
// Operators on disjoint sets of qubits commute exactly, so each exchange leaves each circuit's
// unitary unchanged; then U = U'·x and V = V'·x (or x·U' and x·V') for the unitary x of the
// cancelled op, and since the operator norm is unitarily invariant,
//
//	min_φ ‖U − e^{iφ}V‖ = min_φ ‖(U' − e^{iφ}V')·x‖ = min_φ ‖U' − e^{iφ}V'‖.
//
// By induction the distance of the two circuits equals, exactly and at any width, the distance
// of the two windows, which act as the identity outside Support; so it equals the distance of
// the windows restricted to Support, a 2^k-dimensional computation for k = len(Support).
type Window struct {
	// A and B are the positions, in increasing order, of the ops left in each circuit.
	A, B []int
	// Support is the sorted list of qubits that an op left in either circuit acts on.
	Support []int
}

// Empty reports whether every op was cancelled: the circuits are then equal as unitaries, with
// no tolerance involved.
func (w Window) Empty() bool { return len(w.A) == 0 && len(w.B) == 0 }

// DifferenceWindow cancels the ops two circuits share at their ends, commuting ops past ops on
// other qubits where that brings equal ops together, and returns what is left. Barriers take
// part like gates (they block exchanges on their qubits). It fails for a nil or ill-formed
// circuit, different widths, or an op that is not unitary.
func DifferenceWindow(a, b *circuit.Circuit) (Window, error) {
	if a == nil || b == nil {
		return Window{}, fmt.Errorf("sim: nil circuit")
	}
	for k, c := range []*circuit.Circuit{a, b} {
		if err := c.Validate(); err != nil {
			return Window{}, err
		}
		for i, op := range c.Ops {
			if !op.Unitary() && op.Gate.Name != "barrier" {
				return Window{}, fmt.Errorf("sim: op %d (%s) of circuit %d is not unitary; difference windows need unitary circuits", i, op, k+1)
			}
		}
	}
	if a.Qubits() != b.Qubits() {
		return Window{}, fmt.Errorf("sim: circuits of %d and %d qubits", a.Qubits(), b.Qubits())
	}
	la, lb := newLayers(a), newLayers(b)
	for _, back := range []bool{false, true} {
		for {
			fa := la.front(back)
			keyed := map[string][]int{}
			for _, i := range fa {
				k := a.Ops[i].String()
				keyed[k] = append(keyed[k], i)
			}
			matched := false
			for _, j := range lb.front(back) {
				k := b.Ops[j].String()
				for n, i := range keyed[k] {
					if a.Ops[i].Equal(b.Ops[j]) {
						la.drop(i)
						lb.drop(j)
						keyed[k] = slices.Delete(keyed[k], n, n+1)
						matched = true
						break
					}
				}
			}
			if !matched {
				break
			}
		}
	}
	w := Window{A: la.left(), B: lb.left()}
	seen := map[int]bool{}
	for _, l := range []struct {
		c   *circuit.Circuit
		ops []int
	}{{a, w.A}, {b, w.B}} {
		for _, i := range l.ops {
			for _, q := range l.c.Ops[i].Qubits {
				if !seen[q] {
					seen[q] = true
					w.Support = append(w.Support, q)
				}
			}
		}
	}
	slices.Sort(w.Support)
	return w, nil
}

// Circuits returns the two windows as circuits on len(w.Support) qubits, qubit w.Support[k]
// becoming qubit k.
func (w Window) Circuits(a, b *circuit.Circuit) (*circuit.Circuit, *circuit.Circuit) {
	index := make(map[int]int, len(w.Support))
	for k, q := range w.Support {
		index[q] = k
	}
	restrict := func(c *circuit.Circuit, ops []int) *circuit.Circuit {
		out := circuit.New(len(w.Support))
		for _, i := range ops {
			op := c.Ops[i].Clone()
			for k, q := range op.Qubits {
				op.Qubits[k] = index[q]
			}
			out.AppendOp(op)
		}
		return out
	}
	return restrict(a, w.A), restrict(b, w.B)
}

// layers tracks, for each qubit, the ops of a circuit not yet cancelled that act on it, in order.
type layers struct {
	c    *circuit.Circuit
	onq  [][]int // onq[q]: positions of the live ops on q, in order
	dead []bool
}

func newLayers(c *circuit.Circuit) *layers {
	l := &layers{c: c, onq: make([][]int, c.Qubits()), dead: make([]bool, len(c.Ops))}
	for i, op := range c.Ops {
		for _, q := range op.Qubits {
			l.onq[q] = append(l.onq[q], i)
		}
	}
	return l
}

// front returns the live ops that are first (or, with back, last) on every qubit they touch:
// the ops that commute to the start (end) past ops on other qubits.
func (l *layers) front(back bool) []int {
	var out []int
	seen := map[int]bool{}
	for _, ops := range l.onq {
		if len(ops) == 0 {
			continue
		}
		i := ops[0]
		if back {
			i = ops[len(ops)-1]
		}
		if seen[i] {
			continue
		}
		seen[i] = true
		ok := true
		for _, q := range l.c.Ops[i].Qubits {
			e := l.onq[q][0]
			if back {
				e = l.onq[q][len(l.onq[q])-1]
			}
			if e != i {
				ok = false
				break
			}
		}
		if ok {
			out = append(out, i)
		}
	}
	slices.Sort(out)
	return out
}

func (l *layers) drop(i int) {
	l.dead[i] = true
	for _, q := range l.c.Ops[i].Qubits {
		ops := l.onq[q]
		if ops[0] == i {
			l.onq[q] = ops[1:]
		} else {
			l.onq[q] = ops[:len(ops)-1]
		}
	}
}

func (l *layers) left() []int {
	var out []int
	for i, d := range l.dead {
		if !d {
			out = append(out, i)
		}
	}
	return out
}
