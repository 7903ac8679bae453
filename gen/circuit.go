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
	for len(b.c.Ops) < p.maxOps && chunk.Draw(t, "chunk") {
	}
	return b.c
}

// building is the state of one draw.
type building struct {
	*plan
	c *circuit.Circuit
}

// Kinds of chunk, in shrinking order.
const (
	chunkOp       = iota // one op
	chunkSameRun         // ops confined to the qubits of the first
	chunkInverse         // an op, up to two ops elsewhere, the op's inverse
	chunkCommute         // diagonal gates, which all commute
	chunkRepeat          // a block of ops written two or three times
)

// chunk draws whether to go on and, if so, the next chunk. The stop marker
// comes first so that deleting a chunk's group deletes its marker too, and a
// marker shrunk to 0 cuts the circuit there. Stopping with probability
// 1/(remaining+1) spreads lengths evenly over [MinOps, MaxOps].
func (b *building) chunk(t *rapid.T) bool {
	n := len(b.c.Ops)
	stop := drawBelow(t, b.maxOps-n+1) == 0
	if stop && n >= b.minOps {
		return false
	}
	switch drawWeighted(t, b.chunkWeights) {
	case chunkOp:
		b.add(b.op(t, b.anyGate(t), nil))
	case chunkSameRun:
		b.sameRun(t)
	case chunkInverse:
		b.inversePair(t)
	case chunkCommute:
		b.commutingRun(t)
	case chunkRepeat:
		b.repeated(t)
	}
	return true
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

// anyGate draws a gate index by weight.
func (b *building) anyGate(t *rapid.T) int {
	return drawWeighted(t, b.weights)
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
