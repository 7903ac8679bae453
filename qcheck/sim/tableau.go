package sim

import (
	"fmt"
	"math"
	"math/bits"

	"qcheck.dev/qcheck/circuit"
)

// Tableau is the stabilizer tableau of a Clifford circuit U on n qubits (Aaronson & Gottesman,
// Phys. Rev. A 70, 052328 (2004)): the images U X_q U† and U Z_q U† of the 2n generators of the
// Pauli group, each a Hermitian Pauli string with a sign. Two unitaries with the same tableau are
// equal up to a global phase, because the Pauli strings span every matrix; so the tableau decides
// equivalence modulo phase exactly, in O(n) bit operations per gate, at widths far past any dense
// or statevector engine.
//
// The 2n images are the rows. Aaronson & Gottesman pack each row along the qubits, which suits
// measurement (sums of rows); conjugation by gates touches only the gate's columns, so here each
// column is packed along the rows, 64 rows per word, and a gate on k qubits updates 2k columns of
// ⌈2n/64⌉ words. ImageX and ImageZ read a row out as a Pauli, packed 64 qubits per word.
type Tableau struct {
	n     int
	words int      // words per column: ⌈2n/64⌉
	x, z  []uint64 // column q occupies [q·words, (q+1)·words); bit r of it belongs to row r
	sign  []uint64 // bit r set: row r carries the sign −1
}

// Rows 0 … n−1 hold the images of X_0 … X_{n−1}; rows n … 2n−1 those of Z_0 … Z_{n−1}.

// identityTableau returns the tableau of the identity on n qubits.
func identityTableau(n int) *Tableau {
	w := (2*n + 63) / 64
	t := &Tableau{n: n, words: w, x: make([]uint64, n*w), z: make([]uint64, n*w), sign: make([]uint64, w)}
	for q := 0; q < n; q++ {
		t.x[q*w+q/64] |= 1 << uint(q%64)
		r := n + q
		t.z[q*w+r/64] |= 1 << uint(r%64)
	}
	return t
}

// NewTableau returns the tableau of a Clifford circuit. It fails, naming the op, for an ill-formed
// circuit, a measure or reset, or a gate that is not Clifford: t, ch, ccx, ccz, cswap, any gate
// with angles that are not multiples of π/2 (multiples of π for cp, crx, cry, crz) within about
// CliffordTolerance, and custom gates on more than three qubits or that do not map Pauli strings to
// Pauli strings. Barriers and gates that act as the identity are skipped. It also fails when the
// tableau (n²/2 bytes) would need more than half of DefaultMemoryLimit: about 65,000 qubits.
func NewTableau(c *circuit.Circuit) (*Tableau, error) {
	ops, _, err := compileClifford(c)
	if err != nil {
		return nil, err
	}
	if need := tableauBytes(c.Qubits()); need > float64(DefaultMemoryLimit)/2 {
		return nil, fmt.Errorf("sim: the tableau of %d qubits needs %s, over the limit of %s (half of DefaultMemoryLimit, so that two fit)", c.Qubits(), bytesString(need), bytesString(float64(DefaultMemoryLimit)/2))
	}
	t := identityTableau(c.Qubits())
	for _, op := range ops {
		t.conjugate(op.m, op.qubits)
	}
	return t, nil
}

// IsClifford reports whether the circuit is well formed and every op is a Clifford gate the
// tableau accepts (see NewTableau), so that the tableau engine can decide its equivalence.
func IsClifford(c *circuit.Circuit) bool {
	_, _, err := compileClifford(c)
	return err == nil
}

// CliffordDeviation returns a bound, in operator norm, on how far the unitary of c is from the
// exact Clifford unitary whose tableau NewTableau builds: NewTableau accepts a gate whose angles lie
// within CliffordTolerance of multiples of π/2 and uses the gate at those multiples, and an angle
// off by δ moves its gate by at most |δ| (every library gate's derivative in each angle has norm
// at most 1), deviations that add up over a circuit (Nielsen & Chuang §4.5.3). The
// offsets are computed exactly (circuit.QuarterTurns), so the bound holds for angles of any size,
// and the sum is rounded upwards. It fails where NewTableau fails, and for a circuit with a custom
// gate other than the identity, which has no angle to measure its distance by.
func CliffordDeviation(c *circuit.Circuit) (float64, error) {
	_, dev, err := compileClifford(c)
	if err != nil {
		return 0, err
	}
	if math.IsNaN(dev) {
		for i, op := range c.Ops {
			if op.Gate.IsCustom() {
				return 0, &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: "a custom gate has no angles by which to bound its distance from the Clifford gate the tableau uses"}
			}
		}
	}
	// Each term is an exact offset rounded once, and the sum adds one rounding per term.
	return dev * (1 + float64(len(c.Ops)+2)*0x1p-52), nil
}

// cliffordOp is an op reduced to its Pauli map and operands.
type cliffordOp struct {
	m      *pauliMap
	qubits []int
}

// compileClifford validates c and returns the Pauli map of every op that is not skipped, with the
// sum of the ops' deviations from their Clifford gates (see mapCache.lookup); NaN when a custom
// gate has no such bound.
func compileClifford(c *circuit.Circuit) ([]cliffordOp, float64, error) {
	if err := c.Validate(); err != nil {
		return nil, 0, err
	}
	cache := newMapCache()
	ops := make([]cliffordOp, 0, len(c.Ops))
	dev := 0.0
	for i, op := range c.Ops {
		m, d, err := cache.lookup(i, op)
		if err != nil {
			return nil, 0, err
		}
		dev += d
		if m != nil {
			ops = append(ops, cliffordOp{m: m, qubits: op.Qubits})
		}
	}
	return ops, dev, nil
}

// conjugate replaces every row R by G R G† for the gate G with map m on the given qubits. Each
// row's factors on the operands form a local string p, which G sends to ±image[p] while leaving
// the other factors alone. The rows are handled 64 at a time: the new bits are GF(2) sums of the
// old ones, and the sign flips on the rows whose local string is one of m.negated, found by
// masks built from each operand's four possible factors.
func (t *Tableau) conjugate(m *pauliMap, qubits []int) {
	switch m.k {
	case 1:
		t.conjugate1(m, qubits[0])
	case 2:
		t.conjugate2(m, qubits[0], qubits[1])
	default:
		t.conjugateAny(m, qubits)
	}
}

// factorMasks returns, for one operand's X and Z words, the masks of rows whose factor there is
// I, X, Z and Y, in the order of the local encoding.
func factorMasks(x, z uint64) [4]uint64 {
	return [4]uint64{^(x | z), x &^ z, z &^ x, x & z}
}

func (t *Tableau) conjugate1(m *pauliMap, a int) {
	w := t.words
	xa, za := t.x[a*w:a*w+w], t.z[a*w:a*w+w]
	l := &m.linear
	for i := range xa {
		x, z := xa[i], za[i]
		xa[i] = x&l[0][0] ^ z&l[0][1]
		za[i] = x&l[1][0] ^ z&l[1][1]
		f := factorMasks(x, z)
		var neg uint64
		for _, p := range m.negated {
			neg |= f[p]
		}
		t.sign[i] ^= neg
	}
}

func (t *Tableau) conjugate2(m *pauliMap, a, b int) {
	w := t.words
	xa, za := t.x[a*w:a*w+w], t.z[a*w:a*w+w]
	xb, zb := t.x[b*w:b*w+w], t.z[b*w:b*w+w]
	l := &m.linear
	for i := range xa {
		in := [4]uint64{xa[i], za[i], xb[i], zb[i]}
		var out [4]uint64
		for o := range out {
			out[o] = in[0]&l[o][0] ^ in[1]&l[o][1] ^ in[2]&l[o][2] ^ in[3]&l[o][3]
		}
		xa[i], za[i], xb[i], zb[i] = out[0], out[1], out[2], out[3]
		fa, fb := factorMasks(in[0], in[1]), factorMasks(in[2], in[3])
		var neg uint64
		for _, p := range m.negated {
			neg |= fa[p&3] & fb[p>>2]
		}
		t.sign[i] ^= neg
	}
}

// conjugateAny handles gates on up to maxCliffordQubits operands.
func (t *Tableau) conjugateAny(m *pauliMap, qubits []int) {
	k, w := m.k, t.words
	var in, out [2 * maxCliffordQubits]uint64
	var f [maxCliffordQubits][4]uint64
	for i := 0; i < w; i++ {
		for j, q := range qubits {
			in[2*j], in[2*j+1] = t.x[q*w+i], t.z[q*w+i]
			f[j] = factorMasks(in[2*j], in[2*j+1])
		}
		for o := 0; o < 2*k; o++ {
			var acc uint64
			for b := 0; b < 2*k; b++ {
				acc ^= in[b] & m.linear[o][b]
			}
			out[o] = acc
		}
		for j, q := range qubits {
			t.x[q*w+i], t.z[q*w+i] = out[2*j], out[2*j+1]
		}
		var neg uint64
		for _, p := range m.negated {
			mask := ^uint64(0)
			for j := 0; j < k; j++ {
				mask &= f[j][p>>(2*j)&3]
			}
			neg |= mask
		}
		t.sign[i] ^= neg
	}
}

// Qubits returns the width of the circuit the tableau describes.
func (t *Tableau) Qubits() int { return t.n }

// ImageX returns U X_q U†. It panics when q is outside [0, n), a programmer error.
func (t *Tableau) ImageX(q int) Pauli { return t.row(t.checkQubit(q)) }

// ImageZ returns U Z_q U†. It panics when q is outside [0, n), a programmer error.
func (t *Tableau) ImageZ(q int) Pauli { return t.row(t.n + t.checkQubit(q)) }

func (t *Tableau) checkQubit(q int) int {
	if q < 0 || q >= t.n {
		panic(fmt.Sprintf("sim: qubit %d outside a %d-qubit tableau", q, t.n))
	}
	return q
}

// row reads row r out as a Pauli string.
func (t *Tableau) row(r int) Pauli {
	p := newPauli(t.n)
	wr, br := r/64, uint(r%64)
	for q := 0; q < t.n; q++ {
		p.x[q/64] |= (t.x[q*t.words+wr] >> br & 1) << uint(q%64)
		p.z[q/64] |= (t.z[q*t.words+wr] >> br & 1) << uint(q%64)
	}
	p.neg = t.sign[wr]>>br&1 == 1
	return p
}

// Equal reports whether two tableaux have the same width and the same images, signs included:
// whether their circuits are equal up to a global phase.
func (t *Tableau) Equal(u *Tableau) bool {
	_, same := t.firstDifference(u)
	return same
}

// firstDifference returns the lowest row in which two tableaux of equal width differ, and whether
// they agree everywhere.
func (t *Tableau) firstDifference(u *Tableau) (int, bool) {
	if t.n != u.n {
		return 0, false
	}
	w := t.words
	for i := 0; i < w; i++ {
		diff := t.sign[i] ^ u.sign[i]
		for q := 0; q < t.n; q++ {
			diff |= t.x[q*w+i] ^ u.x[q*w+i]
			diff |= t.z[q*w+i] ^ u.z[q*w+i]
		}
		if diff != 0 {
			return 64*i + bits.TrailingZeros64(diff), false
		}
	}
	return 0, true
}
