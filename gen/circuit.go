package gen

import (
	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Circuit returns a generator of random circuits configured by opts (see
// Options; the zero value is useful). Gates, operands and angles are drawn
// so that a failing circuit shrinks toward fewer ops, lower qubit indices,
// gates listed earlier in the set and special angles (Angle): ops are
// removed one at a time or cut from the end, a motif collapses to a single
// op, and each choice moves toward its first option.
//
// Every drawn circuit passes Validate. If opts are impossible (an unknown
// gate name, a gate wider than the register, MinOps > MaxOps, all weights
// zero), every draw fails the test with an error naming the field at fault.
func Circuit(opts Options) *rapid.Generator[*circuit.Circuit] {
	p, err := opts.resolve()
	if err != nil {
		return failing[*circuit.Circuit](err)
	}
	return rapid.Custom(p.draw)
}

// draw draws one circuit: a sequence of chunks, each a single op or a motif,
// each its own rapid group so that the shrinker can delete it whole.
func (p *plan) draw(t *rapid.T) *circuit.Circuit {
	b := &building{plan: p, c: circuit.New(p.qubits)}
	b.c.Ops = make([]circuit.Op, 0, p.maxOps)
	chunk := rapid.Custom(func(t *rapid.T) bool { return b.chunk(t) })
	b.extra = rapid.Custom(func(t *rapid.T) extraOp { return b.drawExtra(t) })
	for len(b.c.Ops) < p.maxOps && chunk.Draw(t, "chunk") {
	}
	return b.c
}

// building is the state of one draw.
type building struct {
	*plan
	c *circuit.Circuit

	// extra draws one op of a chunk, behind its "go on" mark, as its own
	// rapid group, so that the shrinker can delete any op of a motif.
	extra *rapid.Generator[extraOp]
	// first, pool and pick say what the op being drawn may be: the chunk's
	// first op (drawn whatever its mark says), its qubits (nil: any) and its
	// gates' weights (nil: no more ops in this chunk).
	first bool
	pool  []int
	pick  []int
}

// extraOp is one op of a chunk, or the mark that ends the chunk.
type extraOp struct {
	op     circuit.Op
	choice int
	more   bool
}

// Kinds of chunk, in shrinking order.
const (
	chunkOp      = iota // one op
	chunkSameRun        // ops confined to the qubits of the first
	chunkInverse        // an op, ops elsewhere, the op's inverse
	chunkCommute        // diagonal gates, which all commute
	chunkRepeat         // a block of ops written twice or three times
)

// maxMotif is the most ops a motif draws (before repetition or the closing
// inverse).
const maxMotif = 5

// chunk draws whether to go on and, if so, the next chunk. The stop mark
// comes first so that deleting a chunk's group deletes its mark too, and a
// mark shrunk to 0 cuts the circuit there. Stopping with probability
// 1/(remaining+1) spreads lengths evenly over [MinOps, MaxOps] when every
// chunk is one op.
//
// Every chunk has the same shape whatever its kind: kind, a repeat count,
// then its ops, each drawn as its own group behind a "go on" mark (see
// drawExtra), and a final mark. A plain op reads that final mark and ignores
// it. So shrinking deletes any op of a motif, the first included, and once
// one op is left, lowering the kind to chunkOp keeps every later draw
// aligned: the motif becomes a plain op.
func (b *building) chunk(t *rapid.T) bool {
	n := len(b.c.Ops)
	stop := drawBelow(t, b.maxOps-n+1) == 0
	if stop && n >= b.minOps {
		return false
	}
	kind := drawWeighted(t, b.chunkWeights)
	times := 2 + drawBelow(t, 2)
	b.first, b.pool, b.pick = true, nil, b.weights
	switch kind {
	case chunkInverse:
		if inv := b.invertible(); inv != nil {
			b.pick = inv
		} else {
			kind = chunkOp
		}
	case chunkCommute:
		if diagonal := b.diagonal(); diagonal != nil {
			b.pick = diagonal
		} else {
			kind = chunkOp
		}
	}
	var ops []circuit.Op
	firstChoice := -1
	for len(ops) < maxMotif {
		e := b.extra.Draw(t, "op")
		if !b.first && !e.more {
			break
		}
		ops = append(ops, e.op)
		if b.first {
			b.first, firstChoice = false, e.choice
			b.pool, b.pick = b.extrasFor(kind, e.op)
		}
	}
	switch kind {
	case chunkInverse:
		if i := b.choices[firstChoice].inverse; i >= 0 {
			inv := ops[0].Gate.Inverse()
			if inv.IsCustom() {
				inv = b.choices[i].gate
			}
			ops = append(ops, circuit.Op{Gate: inv, Qubits: append([]int(nil), ops[0].Qubits...)})
		}
	case chunkRepeat:
		block := ops
		for range times - 1 {
			for _, op := range block {
				ops = append(ops, op.Clone())
			}
		}
	}
	b.add(ops...)
	return true
}

// extrasFor returns the qubits and gate weights for the ops of a chunk of the
// given kind after its first op.
func (b *building) extrasFor(kind int, first circuit.Op) (pool, pick []int) {
	switch kind {
	case chunkSameRun:
		return first.Qubits, b.fitting(len(first.Qubits))
	case chunkInverse:
		for q := range b.qubits {
			if !contains(first.Qubits, q) {
				pool = append(pool, q)
			}
		}
		return pool, b.fitting(len(pool))
	case chunkCommute:
		return nil, b.diagonal()
	case chunkRepeat:
		return nil, b.weights
	}
	return nil, nil // a plain op: no more ops
}

// drawExtra draws a "go on" mark (on with probability 3/4; 0 stops) and then
// one op under the current pool and pick, if this is the chunk's first op or
// the mark is on and the chunk takes more.
func (b *building) drawExtra(t *rapid.T) extraOp {
	more := drawBelow(t, 4) != 0
	if !b.first && (!more || b.pick == nil) {
		return extraOp{}
	}
	i := drawWeighted(t, b.pick)
	return extraOp{op: b.op(t, i, b.pool), choice: i, more: more}
}

// invertible returns the weights of the gates whose inverse is in the set,
// or nil if there are none.
func (b *building) invertible() []int {
	w := make([]int, len(b.weights))
	any := false
	for i, ch := range b.choices {
		if ch.inverse >= 0 && ch.weight > 0 {
			w[i] = ch.weight
			any = true
		}
	}
	if !any {
		return nil
	}
	return w
}

// fitting returns the weights of the gates that fit on k qubits, or nil if
// none does.
func (b *building) fitting(k int) []int {
	w := make([]int, len(b.weights))
	any := false
	for i, ch := range b.choices {
		if ch.qubits <= k && ch.weight > 0 {
			w[i] = ch.weight
			any = true
		}
	}
	if !any {
		return nil
	}
	return w
}

// diagonal returns the weights of the diagonal gates, or nil if there are
// none.
func (b *building) diagonal() []int {
	w := make([]int, len(b.weights))
	any := false
	for i, ch := range b.choices {
		if ch.diagonal && ch.weight > 0 {
			w[i] = ch.weight
			any = true
		}
	}
	if !any {
		return nil
	}
	return w
}

// add appends ops while the circuit has room.
func (b *building) add(ops ...circuit.Op) {
	for _, op := range ops {
		if len(b.c.Ops) == b.maxOps {
			return
		}
		b.c.Ops = append(b.c.Ops, op)
	}
}

// op draws the operands and angles of gate i. With on == nil the operands are
// any distinct qubits; otherwise they are distinct qubits taken from on,
// which must hold at least the gate's arity.
func (b *building) op(t *rapid.T, i int, on []int) circuit.Op {
	ch := &b.choices[i]
	g := ch.gate
	if ch.params > 0 {
		g.Params = make([]float64, ch.params)
		for k := range g.Params {
			g.Params[k] = drawAngle(t)
		}
	}
	return circuit.Op{Gate: g, Qubits: drawDistinct(t, ch.qubits, on, b.qubits)}
}

// drawDistinct draws k distinct qubits, from pool if it is not nil and from
// 0..width−1 otherwise. Each is drawn among those not yet taken, in
// increasing order, so that every choice shrinks toward the lowest free one.
func drawDistinct(t *rapid.T, k int, pool []int, width int) []int {
	out := make([]int, 0, k)
	n := width
	if pool != nil {
		n = len(pool)
	}
	for range k {
		r := drawBelow(t, n-len(out))
		// the r-th index not yet taken
		idx := 0
		for ; ; idx++ {
			taken := false
			for _, o := range out {
				if pick(pool, idx) == o {
					taken = true
					break
				}
			}
			if !taken {
				if r == 0 {
					break
				}
				r--
			}
		}
		out = append(out, pick(pool, idx))
	}
	return out
}

// pick returns pool[i], or i when pool is nil.
func pick(pool []int, i int) int {
	if pool == nil {
		return i
	}
	return pool[i]
}

func contains(s []int, x int) bool {
	for _, y := range s {
		if y == x {
			return true
		}
	}
	return false
}
