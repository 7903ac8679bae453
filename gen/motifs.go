package gen

import (
	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Motifs: short stretches of the structure that rewrite passes look for.
// Each falls back to a single op when the gate set cannot form it.

// sameRun draws 2 to 5 ops that all act within the qubits of the first, the
// input of passes that merge or resynthesize blocks on one or two qubits.
func (b *building) sameRun(t *rapid.T) {
	first := b.op(t, b.anyGate(t), nil)
	on := first.Qubits
	fits := make([]int, len(b.weights))
	for i, ch := range b.choices {
		if ch.qubits <= len(on) {
			fits[i] = ch.weight
		}
	}
	ops := []circuit.Op{first}
	for range 1 + drawBelow(t, 4) {
		ops = append(ops, b.op(t, drawWeighted(t, fits), on))
	}
	b.add(ops...)
}

// inversePair draws an op, up to two ops on other qubits, and the op's exact
// inverse on the same qubits: what cancellation passes remove.
func (b *building) inversePair(t *rapid.T) {
	invertible := make([]int, len(b.weights))
	any := false
	for i, ch := range b.choices {
		if ch.inverse >= 0 {
			invertible[i] = ch.weight
			any = true
		}
	}
	if !any {
		b.add(b.op(t, b.anyGate(t), nil))
		return
	}
	i := drawWeighted(t, invertible)
	first := b.op(t, i, nil)
	var others []int
	for q := range b.qubits {
		if !contains(first.Qubits, q) {
			others = append(others, q)
		}
	}
	fits := make([]int, len(b.weights))
	anyFits := false
	for j, ch := range b.choices {
		if ch.qubits <= len(others) && ch.weight > 0 {
			fits[j] = ch.weight
			anyFits = true
		}
	}
	ops := []circuit.Op{first}
	if anyFits {
		for range drawBelow(t, 3) {
			ops = append(ops, b.op(t, drawWeighted(t, fits), others))
		}
	}
	inv := first.Gate.Inverse()
	if first.Gate.IsCustom() {
		inv = b.choices[b.choices[i].inverse].gate
	}
	ops = append(ops, circuit.Op{Gate: inv, Qubits: append([]int(nil), first.Qubits...)})
	b.add(ops...)
}

// commutingRun draws 2 to 5 diagonal gates on any qubits: they all commute,
// so a pass may reorder or merge them freely.
func (b *building) commutingRun(t *rapid.T) {
	diagonal := make([]int, len(b.weights))
	any := false
	for i, ch := range b.choices {
		if ch.diagonal && ch.weight > 0 {
			diagonal[i] = ch.weight
			any = true
		}
	}
	if !any {
		b.add(b.op(t, b.anyGate(t), nil))
		return
	}
	n := 2 + drawBelow(t, 4)
	ops := make([]circuit.Op, n)
	for k := range ops {
		ops[k] = b.op(t, drawWeighted(t, diagonal), nil)
	}
	b.add(ops...)
}

// repeated draws a block of 1 to 3 ops and writes it two or three times, as
// in unrolled loops and Trotter steps.
func (b *building) repeated(t *rapid.T) {
	block := make([]circuit.Op, 1+drawBelow(t, 3))
	for k := range block {
		block[k] = b.op(t, b.anyGate(t), nil)
	}
	times := 2 + drawBelow(t, 2)
	for range times {
		for _, op := range block {
			b.add(op.Clone())
		}
	}
}

func contains(s []int, x int) bool {
	for _, y := range s {
		if y == x {
			return true
		}
	}
	return false
}
