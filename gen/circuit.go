package gen

import (
	"math"
	"slices"

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
	// touch holds the qubits of a sandwich's or a commuting run's first op,
	// which the ops after it share: diagonal gates on disjoint qubits commute
	// trivially, and only those that overlap test a pass's reordering and
	// merging of them. Nil in other chunks.
	touch []int
	// touchChoice is the choice of the op whose qubits touch holds, or −1.
	touchChoice int
}

// extraOp is one op of a chunk, or the mark that ends the chunk.
type extraOp struct {
	op     circuit.Op
	choice int
	more   bool
}

// Kinds of chunk, in shrinking order.
const (
	chunkOp       = iota // one op
	chunkSameRun         // ops confined to the qubits of the first
	chunkSandwich        // an op, then ops on its qubits or elsewhere, each followed by the op again
	chunkCommute         // diagonal gates, which all commute
	chunkRepeat          // a block of ops written twice or three times
	chunkPattern         // a textbook identity's left-hand side, or a near miss of it
	chunkKinds
)

// Forms in which a sandwich repeats its first op, in shrinking order.
const (
	formSame     = iota // the same op
	formInverse         // its inverse, when the set has it
	formReversed        // the same gate on its qubits in reverse order
	formSibling         // another gate of the same width on the same qubits
	formToTwoPi         // the same gate with angles 2π − θ: the two add up to 2π
	formToPi            // the same gate with angles π − θ
	formKinds
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
// Every chunk but a pattern has the same shape whatever its kind: kind, a
// repeat count, a form and a sibling gate, then its ops, each drawn as its
// own group behind a "go on" mark (see drawExtra), and a final mark. A plain
// op reads that final mark and ignores it. So shrinking deletes any op of a
// motif, the first included, and once one op is left, lowering the kind to
// chunkOp keeps every later draw aligned: the motif becomes a plain op.
func (b *building) chunk(t *rapid.T) bool {
	n := len(b.c.Ops)
	stop := drawBelow(t, b.stopRange(b.maxOps-n)) == 0
	if stop && n >= b.minOps {
		return false
	}
	kind := drawWeighted(t, b.chunkWeights)
	if kind == chunkPattern {
		b.add(b.drawPattern(t)...)
		return true
	}
	times := 2 + drawBelow(t, 2)
	form := drawBelow(t, formKinds)
	sibling := 8*drawBelow(t, 8) + drawBelow(t, 8)
	b.first, b.pool, b.pick, b.touch, b.touchChoice = true, nil, b.weights, nil, -1
	if kind == chunkCommute {
		if diagonal := b.diagonal(); diagonal != nil {
			b.pick = diagonal
		} else {
			kind = chunkOp
		}
	}
	var ops []circuit.Op
	var first circuit.Op
	firstChoice := -1
	for len(ops) < maxMotif {
		e := b.extra.Draw(t, "op")
		if !b.first && !e.more {
			break
		}
		ops = append(ops, e.op)
		if b.first {
			b.first, firstChoice, first = false, e.choice, e.op
			b.pool, b.pick = b.extrasFor(kind, e.choice, e.op)
			if kind == chunkSandwich || kind == chunkCommute {
				b.touch, b.touchChoice = e.op.Qubits, e.choice
			}
		}
		if kind == chunkSandwich {
			ops = append(ops, b.again(firstChoice, first, form, sibling))
		}
	}
	if kind == chunkRepeat {
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

// stopRange returns the range of the stop mark with room for left more ops:
// left+1 without motifs, so that lengths are even over [MinOps, MaxOps];
// 2·left+1 with them, which leans lengths toward MaxOps, where more
// structure fits (a failure still shrinks to the shortest circuit).
func (b *building) stopRange(left int) int {
	if b.motifs {
		return 2*left + 1
	}
	return left + 1
}

// again returns the sandwich's first op, choice i of the set, written again
// in the given form; for formSibling, sibling (below 64, drawn whatever the
// first op so that the draws after it keep their meaning when shrinking
// changes it, and as six bits, which rapid shrinks fast) picks by weight,
// modulo their total, the gate of the same width written instead.
func (b *building) again(i int, op circuit.Op, form, sibling int) circuit.Op {
	out := op.Clone()
	switch form {
	case formInverse:
		if j := b.choices[i].inverse; j >= 0 {
			inv := op.Gate.Inverse()
			if inv.IsCustom() {
				inv = b.choices[j].gate
			}
			out.Gate = inv
		}
	case formReversed:
		slices.Reverse(out.Qubits)
	case formSibling:
		w := b.fitting(len(op.Qubits))
		total := 0
		for j, ch := range b.choices {
			if ch.qubits != len(op.Qubits) {
				w[j] = 0
			}
			total += w[j]
		}
		r := sibling % total // the first op's own gate has width len(op.Qubits): total > 0
		j := 0
		for ; r >= w[j]; j++ {
			r -= w[j]
		}
		ch := b.choices[j]
		out.Gate = ch.gate
		if ch.params > 0 {
			out.Gate.Params = make([]float64, ch.params)
			for k := range out.Gate.Params {
				out.Gate.Params[k] = math.Pi / 2
				if len(op.Gate.Params) > 0 {
					out.Gate.Params[k] = op.Gate.Params[k%len(op.Gate.Params)]
				}
			}
		}
	}
	return out
}

// extrasFor returns the qubits and gate weights for the ops of a chunk of the
// given kind after its first op.
func (b *building) extrasFor(kind, i int, first circuit.Op) (pool, pick []int) {
	switch kind {
	case chunkSameRun:
		return first.Qubits, b.sameWidth(len(first.Qubits))
	case chunkSandwich:
		return nil, b.roleDependent(i, b.otherWidth(len(first.Qubits)))
	case chunkCommute:
		return nil, b.diagonalLike(len(first.Qubits))
	case chunkRepeat:
		return nil, b.weights
	}
	return nil, nil // a plain op: no more ops
}

// drawExtra draws a "go on" mark (on with probability 3/4; 0 stops) and then
// one op under the current pool and pick, if this is the chunk's first op or
// the mark is on and the chunk takes more. In a sandwich or a commuting run
// (touch not nil) the op acts elsewhere one time in four; two times in four,
// if it has the first op's width, it acts on the first op's qubits in the
// same order, sharing every role; otherwise it shares one qubit with the
// first op, in a role drawn by role.
func (b *building) drawExtra(t *rapid.T) extraOp {
	more := drawBelow(t, 4) != 0
	if !b.first && (!more || b.pick == nil) {
		return extraOp{}
	}
	i := drawWeighted(t, b.pick)
	if b.touch == nil {
		return extraOp{op: b.op(t, i, b.pool), choice: i, more: more}
	}
	share := drawBelow(t, 4)
	if rest := without(b.touch, b.qubits); share == shareNone && len(rest) >= b.choices[i].qubits {
		return extraOp{op: b.op(t, i, rest), choice: i, more: more}
	}
	op := b.op(t, i, nil)
	if share != shareOne && len(op.Qubits) == len(b.touch) {
		copy(op.Qubits, b.touch)
		return extraOp{op: op, choice: i, more: more}
	}
	pos, shared := b.role(t, i, len(op.Qubits)), b.touch[drawBelow(t, len(b.touch))]
	if k := slices.Index(op.Qubits, shared); k >= 0 {
		op.Qubits[k], op.Qubits[pos] = op.Qubits[pos], op.Qubits[k]
	} else {
		op.Qubits[pos] = shared
	}
	return extraOp{op: op, choice: i, more: more}
}

// role draws the operand of gate i that a sandwich's or commuting run's
// first op shares. After a single-qubit first op, the operands in which it
// does not commute with gate i weigh three times the others: a sandwich
// whose middle blocks its bread is where a wrong commutation rule changes
// the meaning, and a multi-qubit gate usually blocks in some roles only (a
// Pauli X passes a cx on its target, not on its control).
func (b *building) role(t *rapid.T, i, k int) int {
	w := slices.Repeat([]int{1}, k)
	if b.touchChoice >= 0 && b.choices[b.touchChoice].qubits == 1 {
		for pos, blocked := range b.blocks[b.touchChoice][i] {
			if blocked {
				w[pos] = 3
			}
		}
	}
	return drawWeighted(t, w)
}

// How an op of a sandwich or a commuting run shares the first op's qubits,
// in shrinking order; the value 2 too shares all of them.
const (
	shareNone = iota // it acts on other qubits
	shareAll         // it acts on the same qubits, in the same roles
	_
	shareOne // it shares one qubit
)

// roleDependent returns the weights w with those of the gates that single-
// qubit choice i passes in some of their roles and not in others counted
// three times: a commutation rule that forgets to check the role (whether
// the first op sits on a control or a target) is wrong only around such
// gates. w is returned as is after a wider first op.
func (b *building) roleDependent(i int, w []int) []int {
	if b.blocks[i] == nil {
		return w
	}
	for j, bl := range b.blocks[i] {
		if slices.Contains(bl, true) && slices.Contains(bl, false) {
			w[j] *= 3
		}
	}
	return w
}

// otherWidth returns the weights of the gates, those of a width other than k
// counted twice, so that the ops a single-qubit gate is sandwiched
// around are as often multi-qubit gates, in each of their roles, as
// single-qubit ones.
func (b *building) otherWidth(k int) []int {
	w := slices.Clone(b.weights)
	for i, ch := range b.choices {
		if ch.qubits != k {
			w[i] *= 2
		}
	}
	return w
}

// sameWidth returns the weights of the gates that fit on k qubits, those of
// exactly k qubits counted three times, so that a run on the qubits of a
// two-qubit gate holds other two-qubit gates as often as single-qubit ones.
func (b *building) sameWidth(k int) []int {
	w := b.fitting(k)
	for i, ch := range b.choices {
		if w != nil && ch.qubits == k {
			w[i] *= 3
		}
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

// diagonalLike returns the weights of the diagonal gates, those acting on
// exactly k qubits counted three times, so that a commuting run after a
// two-qubit diagonal gate holds other two-qubit ones (which may land on the
// same pair) as often as single-qubit ones; nil if there are none.
func (b *building) diagonalLike(k int) []int {
	w := b.diagonal()
	for i, ch := range b.choices {
		if w != nil && ch.qubits == k {
			w[i] *= 3
		}
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
