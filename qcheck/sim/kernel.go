package sim

import (
	"slices"
)

// The engines share one kernel design. Amplitudes live in a flat array whose index holds basis
// states bit by bit; a k-qubit gate acts on k bit positions of that index. A statevector of n
// qubits is such an array with qubit q at bit q. A block of B = 2^b columns of a unitary being
// built is the same thing: rows are basis states and the B columns of a row are contiguous, so the
// row index starts at bit b and qubit q sits at bit q + b. One set of kernels serves both.
//
// A kernel walks the "groups" of the array: the 2^k amplitudes whose indices differ only in the
// gate's bits. Group g has its base index made by inserting zero bits into g at the gate's bit
// positions; consecutive groups have consecutive bases in runs of 2^(lowest bit), so the inner
// loops run over contiguous slices. Kernels work in place and never allocate while they run.

// kernelKind selects the inner loop that a gate's matrix allows.
type kernelKind uint8

const (
	// pairKind: 2×2 blocks, each mixing two local states, every other local state left alone
	// (a one-qubit gate, a controlled one-qubit gate, rxx and ryy).
	pairKind kernelKind = iota
	// diagonalKind: each moved local state is multiplied by a phase (rz, p, cz, cp, crz, rzz, t, …).
	diagonalKind
	// swapKind: local states exchanged in pairs, each with a phase, others scaled (x, cx, swap,
	// iswap, ccx, cswap, …).
	swapKind
	// dense2Kind: a full 4×4 matrix on two qubits.
	dense2Kind
	// sparseKind: any other matrix, row by row over its nonzero entries.
	sparseKind
)

// kernel is one gate of a compiled program, fixed to its bit positions.
type kernel struct {
	kind   kernelKind
	qubits int          // k, the number of bits the gate acts on
	sorted []uint       // the gate's bit positions in ascending order, for building group bases
	offs   []int        // offs[a] is the index offset of local state a within a group
	m      []complex128 // the gate's matrix, row-major 2^k × 2^k in local order

	// pairKind: the 2×2 blocks.
	pairs []pairBlock
	// diagonalKind and swapKind: local states multiplied by a phase in place.
	scale []scaled
	// swapKind: pairs of local states exchanged with phases.
	swaps []swapped
	// sparseKind: the local states read, and the rows that are not identity rows.
	reads []int
	rows  []sparseRow
	// scratchLen is the length of the per-call buffer the sparse kernel needs.
	scratchLen int
}

// pairBlock mixes the amplitudes at index offsets o0 and o1 of each group by a 2×2 matrix.
type pairBlock struct {
	o0, o1             int
	m00, m01, m10, m11 complex128
}

// scaled multiplies the amplitude at index offset off of each group by v.
type scaled struct {
	off int
	v   complex128
}

// swapped exchanges the amplitudes at index offsets a and b of each group:
// new[a] = va·old[b], new[b] = vb·old[a].
type swapped struct {
	a, b   int
	va, vb complex128
}

// sparseRow writes the amplitude at index offset a of each group as Σ vals[t]·old[cols[t]], with
// cols in local states.
type sparseRow struct {
	a    int
	cols []int
	vals []complex128
}

// newKernel fixes the gate matrix m (row-major, textbook operand order: bits[0] is the most
// significant bit of the local index) to the given bit positions and chooses its inner loop.
func newKernel(m []complex128, bits []uint) *kernel {
	k := len(bits)
	d := 1 << k
	kn := &kernel{qubits: k, m: m, offs: make([]int, d)}
	for a := 0; a < d; a++ {
		off := 0
		for j, b := range bits {
			if a>>(k-1-j)&1 == 1 {
				off |= 1 << b
			}
		}
		kn.offs[a] = off
	}
	kn.sorted = append([]uint(nil), bits...)
	slices.Sort(kn.sorted)

	// Active rows are the local states the gate moves: rows other than e_a.
	var active []int
	for a := 0; a < d; a++ {
		row := m[a*d : a*d+d]
		identity := true
		for b, v := range row {
			if (b == a && v != 1) || (b != a && v != 0) {
				identity = false
			}
		}
		if !identity {
			active = append(active, a)
		}
	}
	// single returns the column of the one nonzero entry of row a, or −1.
	single := func(a int) int {
		col := -1
		for b, v := range m[a*d : a*d+d] {
			if v != 0 {
				if col >= 0 {
					return -1
				}
				col = b
			}
		}
		return col
	}

	monomial, diagonal := true, true
	for _, a := range active {
		switch c := single(a); {
		case c < 0:
			monomial, diagonal = false, false
		case c != a:
			diagonal = false
			if single(c) != a || !slices.Contains(active, c) { // only exchanges of two states
				monomial = false
			}
		}
	}
	switch {
	case diagonal:
		kn.kind = diagonalKind
		for _, a := range active {
			kn.scale = append(kn.scale, scaled{kn.offs[a], m[a*d+a]})
		}
	case monomial:
		kn.kind = swapKind
		for _, a := range active {
			c := single(a)
			if c == a {
				kn.scale = append(kn.scale, scaled{kn.offs[a], m[a*d+a]})
			} else if a < c {
				kn.swaps = append(kn.swaps, swapped{kn.offs[a], kn.offs[c], m[a*d+c], m[c*d+a]})
			}
		}
	case pairUp(m, d, active) != nil:
		kn.kind = pairKind
		for _, ab := range pairUp(m, d, active) {
			a, b := ab[0], ab[1]
			kn.pairs = append(kn.pairs, pairBlock{kn.offs[a], kn.offs[b],
				m[a*d+a], m[a*d+b], m[b*d+a], m[b*d+b]})
		}
	case k == 2:
		kn.kind = dense2Kind // zeros cost less than the sparse kernel's indirection
	default:
		kn.kind = sparseKind
		read := make([]bool, d)
		for _, a := range active {
			r := sparseRow{a: kn.offs[a]}
			for b, v := range m[a*d : a*d+d] {
				if v != 0 {
					r.cols = append(r.cols, b)
					r.vals = append(r.vals, v)
					read[b] = true
				}
			}
			kn.rows = append(kn.rows, r)
		}
		for b, ok := range read {
			if ok {
				kn.reads = append(kn.reads, b)
			}
		}
		kn.scratchLen = d
	}
	return kn
}

// cost estimates the time of the kernel per amplitude of the register, in units of one complex
// multiply-add: the share of amplitudes it moves times sweepCost (the price of streaming them
// through memory), plus the arithmetic of its inner loop.
func (kn *kernel) cost(sweepCost float64) float64 {
	d := float64(int(1) << kn.qubits)
	switch kn.kind {
	case pairKind:
		return float64(len(kn.pairs)) * (2*sweepCost + 4) / d
	case diagonalKind:
		return float64(len(kn.scale)) * (sweepCost + 1) / d
	case swapKind:
		c := float64(len(kn.scale)) * (sweepCost + 1)
		for _, s := range kn.swaps {
			c += 2 * sweepCost
			if s.va != 1 || s.vb != 1 {
				c += 2
			}
		}
		return c / d
	case dense2Kind:
		return (4*sweepCost + 16) / d
	}
	c := 0.0
	for _, r := range kn.rows {
		c += sweepCost + 1.5*float64(len(r.cols)) // the sparse loop's indirection costs extra
	}
	return c / d
}

// pairUp splits the active rows of m into pairs {a, b} whose rows have their nonzero entries in
// columns a and b only, each row with one off-diagonal entry; it returns nil when they do not
// split so.
func pairUp(m []complex128, d int, active []int) [][2]int {
	// partner returns the one column off the diagonal where row a is nonzero, or −1.
	partner := func(a int) int {
		p := -1
		for c, v := range m[a*d : a*d+d] {
			if v != 0 && c != a {
				if p >= 0 {
					return -1
				}
				p = c
			}
		}
		return p
	}
	var out [][2]int
	for _, a := range active {
		b := partner(a)
		if b < 0 || partner(b) != a {
			return nil
		}
		if a < b {
			out = append(out, [2]int{a, b})
		}
	}
	return out
}

// groups returns the number of groups in an array of the given length.
func (kn *kernel) groups(length int) int { return length >> kn.qubits }

// apply applies the gate to groups [g0, g1) of data in place.
func (kn *kernel) apply(data []complex128, g0, g1 int) {
	if kn.kind == pairKind && kn.sorted[0] == 0 && kn.qubits == 1 && len(kn.pairs) == 1 {
		kn.applyLowPair(data, g0, g1)
		return
	}
	var scratch []complex128
	if kn.kind == sparseKind {
		var local [8]complex128
		if kn.scratchLen <= len(local) {
			scratch = local[:kn.scratchLen]
		} else {
			scratch = make([]complex128, kn.scratchLen) // once per call, not per group
		}
	}
	// The base of group g0 has zeros inserted at the gate's bits; each later run starts at the
	// next index with zeros there, found without redoing the insertion.
	base := g0
	mask := 0
	for _, b := range kn.sorted {
		base = (base>>b)<<(b+1) | base&(1<<b-1)
		mask |= 1 << b
	}
	run := 1 << kn.sorted[0]
	if run == 1 && kn.kind == pairKind {
		kn.pairGroups(data, base, mask, g1-g0)
		return
	}
	for g := g0; g < g1; {
		r := min(run-g&(run-1), g1-g)
		switch kn.kind {
		case pairKind:
			kn.pairRun(data, base, r)
		case diagonalKind:
			kn.scaleRun(data, base, r)
		case swapKind:
			kn.scaleRun(data, base, r)
			kn.swapRun(data, base, r)
		case dense2Kind:
			kn.dense2Run(data, base, r)
		default:
			kn.sparseRun(data, base, r, scratch)
		}
		g += r
		base = (((base + r - 1) | mask) + 1) &^ mask
	}
}

// applyLowPair is the one-qubit gate on bit 0, where the two amplitudes of a group are adjacent.
func (kn *kernel) applyLowPair(data []complex128, g0, g1 int) {
	p := kn.pairs[0]
	m00, m01, m10, m11 := p.m00, p.m01, p.m10, p.m11
	if p.o0 != 0 { // the block is stored the other way round
		m00, m01, m10, m11 = m11, m10, m01, m00
	}
	x := data[2*g0 : 2*g1]
	for i := 0; i+1 < len(x); i += 2 {
		a, b := x[i], x[i+1]
		x[i] = m00*a + m01*b
		x[i+1] = m10*a + m11*b
	}
}

func (kn *kernel) pairRun(data []complex128, base, r int) {
	for _, p := range kn.pairs {
		x := data[base+p.o0 : base+p.o0+r]
		y := data[base+p.o1 : base+p.o1+r]
		y = y[:len(x)]
		m00, m01, m10, m11 := p.m00, p.m01, p.m10, p.m11
		for j, a := range x {
			b := y[j]
			x[j] = m00*a + m01*b
			y[j] = m10*a + m11*b
		}
	}
}

// pairGroups is pairRun for a gate on bit 0 and others, where runs are single groups: it walks
// count groups from base one by one, indexing amplitudes directly.
func (kn *kernel) pairGroups(data []complex128, base, mask, count int) {
	for ; count > 0; count-- {
		for _, p := range kn.pairs {
			i, j := base+p.o0, base+p.o1
			a, b := data[i], data[j]
			data[i] = p.m00*a + p.m01*b
			data[j] = p.m10*a + p.m11*b
		}
		base = ((base | mask) + 1) &^ mask
	}
}

func (kn *kernel) scaleRun(data []complex128, base, r int) {
	for _, s := range kn.scale {
		x := data[base+s.off : base+s.off+r]
		v := s.v
		for j := range x {
			x[j] *= v
		}
	}
}

func (kn *kernel) swapRun(data []complex128, base, r int) {
	for _, s := range kn.swaps {
		x := data[base+s.a : base+s.a+r]
		y := data[base+s.b : base+s.b+r]
		y = y[:len(x)]
		if s.va == 1 && s.vb == 1 {
			for j, a := range x {
				x[j], y[j] = y[j], a
			}
			continue
		}
		va, vb := s.va, s.vb
		for j, a := range x {
			x[j], y[j] = va*y[j], vb*a
		}
	}
}

func (kn *kernel) dense2Run(data []complex128, base, r int) {
	o := kn.offs
	x0 := data[base+o[0] : base+o[0]+r]
	x1 := data[base+o[1] : base+o[1]+r]
	x2 := data[base+o[2] : base+o[2]+r]
	x3 := data[base+o[3] : base+o[3]+r]
	x1, x2, x3 = x1[:len(x0)], x2[:len(x0)], x3[:len(x0)]
	m := kn.m[:16]
	for j, a0 := range x0 {
		a1, a2, a3 := x1[j], x2[j], x3[j]
		x0[j] = m[0]*a0 + m[1]*a1 + m[2]*a2 + m[3]*a3
		x1[j] = m[4]*a0 + m[5]*a1 + m[6]*a2 + m[7]*a3
		x2[j] = m[8]*a0 + m[9]*a1 + m[10]*a2 + m[11]*a3
		x3[j] = m[12]*a0 + m[13]*a1 + m[14]*a2 + m[15]*a3
	}
}

func (kn *kernel) sparseRun(data []complex128, base, r int, in []complex128) {
	for i := base; i < base+r; i++ {
		for _, a := range kn.reads {
			in[a] = data[i+kn.offs[a]]
		}
		for _, row := range kn.rows {
			var s complex128
			for t, b := range row.cols {
				s += row.vals[t] * in[b]
			}
			data[i+row.a] = s
		}
	}
}
