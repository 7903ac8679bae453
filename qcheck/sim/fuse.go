package sim

import (
	"slices"

	"qcheck.dev/qcheck/circuit"
)

// Fusion multiplies consecutive gates on the same qubits into one matrix before any amplitude is
// touched, so that a run of one-qubit gates on a qubit costs one sweep, and one-qubit gates beside
// a two-qubit gate on the same pair ride along with it. A merge is kept only where the cost model
// says the fused gate is no dearer than its parts.

// block is a fused gate: its qubits in the operand order of its matrix (first = most significant
// bit of the local index) and the matrix itself.
type block struct {
	qubits []int
	m      []complex128
	gone   bool // merged into a later block
}

// maxFusedQubits bounds the blocks that absorb other gates, so that fusing a matrix costs little.
const maxFusedQubits = 3

// fuse turns the unitary ops of a valid circuit into fused blocks, first to apply first.
// sweepCost weighs one pass over the amplitudes against one complex multiply per amplitude: about
// 1 when the data sit in cache, several times more for a statevector that streams from memory.
func fuse(c *circuit.Circuit, sweepCost float64) []*block {
	var blocks []*block
	last := make([]*block, c.Qubits()) // the latest block that touches each qubit
	for _, op := range c.Ops {
		if op.Gate.Name == "barrier" {
			continue
		}
		g := &block{qubits: append([]int(nil), op.Qubits...), m: op.Gate.Elements()}
		holder := mergeInto(g, last, sweepCost)
		if holder == nil {
			holder = g
		}
		if holder == g {
			blocks = append(blocks, g)
		}
		// Only g's qubits change hands: a block that absorbed g must not claim its other
		// qubits back from later blocks.
		for _, q := range g.qubits {
			last[q] = holder
		}
	}
	out := blocks[:0]
	for _, b := range blocks {
		if !b.gone {
			out = append(out, b)
		}
	}
	return out
}

// unfused turns the unitary ops of a valid circuit into one block each, with no merging.
func unfused(c *circuit.Circuit) []*block {
	blocks := make([]*block, 0, len(c.Ops))
	for _, op := range c.Ops {
		if op.Gate.Name != "barrier" {
			blocks = append(blocks, &block{qubits: op.Qubits, m: op.Gate.Elements()})
		}
	}
	return blocks
}

// mergeInto tries the two merges that keep the order of operations on every qubit:
//   - g's qubits all lie in one earlier block b that is still the latest on each of them: then g
//     is multiplied into b (nothing between b and g touches g's qubits, and what touches b's other
//     qubits commutes with g);
//   - every latest block on g's qubits lies within g's qubits and is the latest on all of its own:
//     then those blocks are moved forward and multiplied into g.
//
// It returns the block that now holds g (b, or g itself after absorbing), or nil to keep g apart.
func mergeInto(g *block, last []*block, sweepCost float64) *block {
	var prev []*block
	for _, q := range g.qubits {
		if b := last[q]; b != nil && !slices.Contains(prev, b) {
			prev = append(prev, b)
		}
	}
	if len(prev) == 0 {
		return nil
	}
	if len(prev) == 1 && subset(g.qubits, prev[0].qubits) && len(prev[0].qubits) <= maxFusedQubits {
		b := prev[0]
		m := mul(embed(g.m, g.qubits, b.qubits), b.m, 1<<len(b.qubits))
		if cost(m, len(b.qubits), sweepCost) <= cost(b.m, len(b.qubits), sweepCost)+cost(g.m, len(g.qubits), sweepCost) {
			b.m = m
			return b
		}
		return nil
	}
	if len(g.qubits) > maxFusedQubits {
		return nil
	}
	parts := cost(g.m, len(g.qubits), sweepCost)
	m := g.m
	for _, b := range prev {
		if !subset(b.qubits, g.qubits) {
			return nil
		}
		for _, q := range b.qubits {
			if last[q] != b {
				return nil
			}
		}
		parts += cost(b.m, len(b.qubits), sweepCost)
		m = mul(m, embed(b.m, b.qubits, g.qubits), 1<<len(g.qubits))
	}
	if cost(m, len(g.qubits), sweepCost) > parts {
		return nil
	}
	g.m = m
	for _, b := range prev {
		b.gone = true
	}
	return g
}

// cost estimates the time of applying the k-qubit matrix m per amplitude of the register, with
// the inner loop the kernels would choose for it.
func cost(m []complex128, k int, sweepCost float64) float64 {
	bits := make([]uint, k)
	for i := range bits {
		bits[i] = uint(k - 1 - i)
	}
	return newKernel(m, bits).cost(sweepCost)
}

// embed writes the matrix m on qubits sub as a matrix on qubits all (sub ⊆ all), identity on the
// others, both in textbook operand order.
func embed(m []complex128, sub, all []int) []complex128 {
	if slices.Equal(sub, all) {
		return m
	}
	k, ks := len(all), len(sub)
	d, ds := 1<<k, 1<<ks
	pos := make([]int, ks) // bit of all's local index that holds sub[j]
	for j, q := range sub {
		for i, r := range all {
			if r == q {
				pos[j] = k - 1 - i
			}
		}
	}
	subMask := 0
	for _, p := range pos {
		subMask |= 1 << p
	}
	local := func(a int) int {
		s := 0
		for j, p := range pos {
			s |= (a >> p & 1) << (ks - 1 - j)
		}
		return s
	}
	out := make([]complex128, d*d)
	for a := 0; a < d; a++ {
		for b := 0; b < d; b++ {
			if a&^subMask == b&^subMask {
				out[a*d+b] = m[local(a)*ds+local(b)]
			}
		}
	}
	return out
}

// mul returns the product a·b of two row-major d × d matrices.
func mul(a, b []complex128, d int) []complex128 {
	out := make([]complex128, d*d)
	for i := 0; i < d; i++ {
		for l := 0; l < d; l++ {
			v := a[i*d+l]
			if v == 0 {
				continue
			}
			for j := 0; j < d; j++ {
				out[i*d+j] += v * b[l*d+j]
			}
		}
	}
	return out
}

// subset reports whether every element of a is in b.
func subset(a, b []int) bool {
	for _, x := range a {
		if !slices.Contains(b, x) {
			return false
		}
	}
	return true
}
