package sim

import (
	"fmt"
	"math/bits"
	"slices"

	"qcheck.dev/qcheck/circuit"
)

// StabilizerOutcomes is the outcome distribution of a Clifford program, found by the stabilizer
// engine: a mixture of uniform distributions, each over an affine set of bit strings (a set
// x0 + span{v1, …, vd} over GF(2)). A program whose conditions read bits that are fixed, or test
// one random bit at a time on Pauli gates, has a single set; other feed-forward splits the run
// into parts of probability 2^−k.
type StabilizerOutcomes struct {
	bits  int
	parts []affinePart

	// Deviation bounds how far, in total variation, this distribution may be from the
	// program's: gates with angles are taken at the multiples of π/2 they lie within
	// CliffordTolerance of, and a gate moved by δ in operator norm moves any distribution that
	// follows by at most δ (trace distance contracts under every later operation, N&C §9.2.1),
	// so the bound is the sum of the gates' offsets (see CliffordDeviation). It is 0 when no
	// angle was rounded, NaN when a custom gate leaves it unknown.
	Deviation float64
}

type affinePart struct {
	set    *affineSet
	weight float64
}

// Bits returns the number of classical bits an outcome has.
func (s *StabilizerOutcomes) Bits() int { return s.bits }

// Uniform reports whether the distribution is uniform over a single affine set, and its
// dimension: the set holds 2^dim outcomes, each with probability 2^−dim.
func (s *StabilizerOutcomes) Uniform() (dim int, ok bool) {
	if len(s.parts) != 1 {
		return 0, false
	}
	return s.parts[0].set.dim(), true
}

// Outcomes lists the distribution outcome by outcome, refusing more than limit outcomes.
func (s *StabilizerOutcomes) Outcomes(limit int) (*Outcomes, error) {
	total := 0
	for _, p := range s.parts {
		if p.set.dim() > 30 || total+1<<p.set.dim() > limit {
			return nil, fmt.Errorf("sim: the distribution has more than %d outcomes", limit)
		}
		total += 1 << p.set.dim()
	}
	o := newOutcomes(s.bits, min(s.bits, bits.Len(uint(total))))
	for _, p := range s.parts {
		d := p.set.dim()
		each := p.weight / float64(int(1)<<d)
		x := make([]uint64, len(p.set.offset))
		for k := 0; k < 1<<d; k++ {
			copy(x, p.set.offset)
			for j := 0; j < d; j++ {
				if k>>j&1 == 1 {
					xorInto(x, p.set.basis[j])
				}
			}
			o.add(wordsKey(x, s.bits), each)
		}
	}
	return o, nil
}

// StabilizerProgramOutcomes runs a Clifford program on the stabilizer tableau, at any width, with
// every measurement outcome kept as a symbol instead of drawn: a measurement of Z_a either has a
// fixed value, an affine function of earlier outcomes, or a fresh uniform bit (Aaronson &
// Gottesman, Phys. Rev. A 70, 052328 (2004), §III), and the signs of the stabilizers stay affine
// functions of those bits. So each classical bit ends as an affine function of independent
// uniform bits, and the distribution is uniform over the image: an affine set, exactly.
//
// A reset is a measurement followed by X controlled by its outcome. A Pauli gate controlled by a
// condition that reduces to one affine function of the outcomes flips signs by that function
// and keeps the set affine. Other controlled ops (a non-Pauli Clifford gate, a measurement or
// reset under a random condition, or a condition on several independent random bits) split the
// run on the value of one affine function at a time, each half with probability ½; more than
// opts.MaxBranches parts are refused. Non-Clifford gates are refused with the op named.
func StabilizerProgramOutcomes(c *circuit.Circuit, opts ProgramOptions) (*StabilizerOutcomes, error) {
	if c == nil {
		return nil, fmt.Errorf("sim: nil circuit")
	}
	if err := c.Validate(); err != nil {
		return nil, err
	}
	limit, _ := opts.limits()
	nbits := c.Bits()
	first := &symbolicRun{t: identityTableau(c.Qubits()), bits: make([]affineBit, nbits), weight: 1}
	runs := []*symbolicRun{first}
	cache := newMapCache()
	deviation := 0.0
	for i, op := range c.Ops {
		var m *pauliMap
		if g := op.Gate.Name; g != "measure" && g != "reset" {
			plain := op
			plain.If = nil
			var err error
			var d float64
			if m, d, err = cache.lookup(i, plain); err != nil {
				return nil, err
			}
			deviation += d
			if m == nil {
				continue
			}
		}
		var next []*symbolicRun
		for len(runs) > 0 {
			r := runs[len(runs)-1]
			runs = runs[:len(runs)-1]
			cond, split := r.condition(op.If)
			if split != nil {
				a, b := r.split(*split)
				runs = append(runs, a, b)
				if len(runs)+len(next) > limit {
					return nil, &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: fmt.Sprintf("the feed-forward splits the program into more than %d parts; the stabilizer engine refuses it", limit)}
				}
				continue
			}
			switch {
			case cond.zero():
			case !cond.one() && (m == nil || !isPauliMap(m)):
				a, b := r.split(cond)
				runs = append(runs, a, b)
				if len(runs)+len(next) > limit {
					return nil, &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: fmt.Sprintf("the feed-forward splits the program into more than %d parts; the stabilizer engine refuses it", limit)}
				}
				continue
			case op.Gate.Name == "measure":
				r.bits[op.Bits[0]] = r.measure(op.Qubits[0])
			case op.Gate.Name == "reset":
				out := r.measure(op.Qubits[0])
				r.flipSigns(fixedMaps()["x"], op.Qubits[:1], out)
			case cond.one():
				r.t.conjugate(m, op.Qubits)
			default: // a Pauli gate under one random affine condition
				r.flipSigns(m, op.Qubits, cond)
			}
			next = append(next, r)
		}
		runs = next
	}
	// Each term is an exact offset rounded once, and the sum adds one rounding per term, as
	// CliffordDeviation rounds.
	out := &StabilizerOutcomes{bits: nbits, Deviation: deviation * (1 + float64(len(c.Ops)+2)*0x1p-52)}
	for _, r := range runs {
		out.addPart(r.outcomeSet(), r.weight)
	}
	return out, nil
}

// addPart adds a set with its probability, merging it with an equal set already there.
func (s *StabilizerOutcomes) addPart(set *affineSet, weight float64) {
	for k := range s.parts {
		if s.parts[k].set.equal(set) {
			s.parts[k].weight += weight
			return
		}
	}
	s.parts = append(s.parts, affinePart{set: set, weight: weight})
}

// CliffordProgram returns nil when StabilizerProgramOutcomes takes the program, as far as its
// gates go (it may still refuse feed-forward that splits into too many parts), or an error
// naming the first op that is not a Clifford gate.
func CliffordProgram(c *circuit.Circuit) error {
	if c == nil {
		return fmt.Errorf("sim: nil circuit")
	}
	if err := c.Validate(); err != nil {
		return err
	}
	cache := newMapCache()
	for i, op := range c.Ops {
		if g := op.Gate.Name; g == "measure" || g == "reset" {
			continue
		}
		op.If = nil
		if _, _, err := cache.lookup(i, op); err != nil {
			return err
		}
	}
	return nil
}

// isPauliMap reports whether a gate conjugates every Pauli string to ± itself: a Pauli gate (up
// to phase), whose only effect on a tableau is on signs.
func isPauliMap(m *pauliMap) bool {
	for p := 1; p < len(m.image); p++ {
		if int(m.image[p])&(1<<(2*m.k)-1) != p {
			return false
		}
	}
	return true
}

// affineBit is a bit as an affine function of the outcome symbols: c + Σ_{v ∈ vars} s_v.
type affineBit struct {
	c    bool
	vars []uint64
}

func (a affineBit) has(v int) bool { return v/64 < len(a.vars) && a.vars[v/64]>>(v%64)&1 == 1 }

func (a affineBit) constant() bool { return lowestBit(a.vars) < 0 }

func (a affineBit) zero() bool { return a.constant() && !a.c }

func (a affineBit) one() bool { return a.constant() && a.c }

func (a affineBit) equal(b affineBit) bool {
	if a.c != b.c {
		return false
	}
	n := max(len(a.vars), len(b.vars))
	for i := 0; i < n; i++ {
		var x, y uint64
		if i < len(a.vars) {
			x = a.vars[i]
		}
		if i < len(b.vars) {
			y = b.vars[i]
		}
		if x != y {
			return false
		}
	}
	return true
}

func (a affineBit) clone() affineBit { return affineBit{c: a.c, vars: slices.Clone(a.vars)} }

func (a *affineBit) xorVar(v int) {
	for len(a.vars) <= v/64 {
		a.vars = append(a.vars, 0)
	}
	a.vars[v/64] ^= 1 << (v % 64)
}

// symbolicRun is a Clifford program in progress with symbolic outcomes: the tableau of the state
// (rows 0 … n−1 destabilizers, n … 2n−1 stabilizers, Aaronson & Gottesman's layout, which the
// images of X_q and Z_q under the circuit so far form when the input is |0…0⟩), the constant part
// of each row's sign in the tableau's sign words, and for each symbol a column of the rows whose
// sign contains it.
type symbolicRun struct {
	t      *Tableau
	syms   [][]uint64 // syms[v]: words like t.sign, bit r set when row r's sign contains s_v
	bits   []affineBit
	weight float64
}

// condition evaluates a condition as an affine bit when it is one. The condition holds when
// every read bit equals its value: a product of affine literals, affine when at most one distinct
// non-constant literal remains (or two that are complements, whose product is 0). Otherwise it
// returns a literal to split the run on.
func (r *symbolicRun) condition(cond *circuit.Condition) (affineBit, *affineBit) {
	if cond == nil {
		return affineBit{c: true}, nil
	}
	var lit *affineBit
	result := affineBit{c: true}
	for i, b := range cond.Bits {
		l := r.bits[b].clone()
		l.c = l.c != (cond.Value>>i&1 == 1) // l is 0 exactly when bit b equals its value
		l.c = !l.c                          // … so flip it: l is 1 when the bit matches
		switch {
		case l.one():
			continue
		case l.zero():
			result = affineBit{}
			lit = nil
		case lit == nil:
			lit = &l
			result = l
			continue
		case lit.equal(l):
			continue
		default:
			comp := l.clone()
			comp.c = !comp.c
			if lit.equal(comp) {
				result, lit = affineBit{}, nil
			} else {
				return affineBit{}, lit
			}
		}
		if result.zero() {
			break
		}
	}
	if cond.Not {
		result = result.clone()
		result.c = !result.c
	}
	return result, nil
}

// split returns the two runs in which the non-constant affine bit a is 0 and 1, each with half
// the probability: a is a sum of independent uniform symbols.
func (r *symbolicRun) split(a affineBit) (*symbolicRun, *symbolicRun) {
	other := r.clone()
	r.fix(a, false)
	other.fix(a, true)
	return r, other
}

func (r *symbolicRun) clone() *symbolicRun {
	t := *r.t
	t.x, t.z, t.sign = slices.Clone(r.t.x), slices.Clone(r.t.z), slices.Clone(r.t.sign)
	o := &symbolicRun{t: &t, syms: make([][]uint64, len(r.syms)), bits: make([]affineBit, len(r.bits)), weight: r.weight}
	for v, s := range r.syms {
		o.syms[v] = slices.Clone(s)
	}
	for i, b := range r.bits {
		o.bits[i] = b.clone()
	}
	return o
}

// fix restricts the run to the outcomes where a = value, by solving a = value for its lowest
// symbol and substituting everywhere; the run's probability halves.
func (r *symbolicRun) fix(a affineBit, value bool) {
	a = a.clone()
	v := lowestBit(a.vars)
	a.xorVar(v) // a now holds the other symbols: s_v = value + a.c + Σ a.vars
	shift := value != a.c
	col := r.syms[v]
	if shift {
		xorInto(r.t.sign, col)
	}
	for u := range r.syms {
		if a.has(u) {
			xorInto(r.syms[u], col)
		}
	}
	r.syms[v] = make([]uint64, len(col))
	for i := range r.bits {
		b := &r.bits[i]
		if b.has(v) {
			b.xorVar(v)
			b.c = b.c != shift
			for u := 0; u < len(a.vars)*64; u++ {
				if a.has(u) {
					b.xorVar(u)
				}
			}
		}
	}
	r.weight /= 2
}

// flipSigns applies the Pauli gate with map m on the given qubits when the affine bit a is 1:
// each row's sign gains a times whether the gate negates the row.
func (r *symbolicRun) flipSigns(m *pauliMap, qubits []int, a affineBit) {
	t, w := r.t, r.t.words
	for i := 0; i < w; i++ {
		var f [maxCliffordQubits][4]uint64
		for j, q := range qubits {
			f[j] = factorMasks(t.x[q*w+i], t.z[q*w+i])
		}
		var neg uint64
		for _, p := range m.negated {
			mask := ^uint64(0)
			for j := 0; j < m.k; j++ {
				mask &= f[j][p>>(2*j)&3]
			}
			neg |= mask
		}
		if a.c {
			t.sign[i] ^= neg
		}
		for v := range r.syms {
			if a.has(v) {
				r.syms[v][i] ^= neg
			}
		}
	}
}

// measure measures Z on qubit a and returns the outcome as an affine bit, updating the tableau
// as Aaronson & Gottesman's measurement rule does, with the random outcome a fresh symbol.
func (r *symbolicRun) measure(a int) affineBit {
	t := r.t
	n, w := t.n, t.words
	xa := t.x[a*w : a*w+w]
	p := -1
	for i := n / 64; i < w && p < 0; i++ {
		word := xa[i]
		if i == n/64 {
			word &^= 1<<(n%64) - 1
		}
		if word != 0 {
			p = 64*i + bits.TrailingZeros64(word)
		}
	}
	if p < 0 {
		return r.fixedOutcome(a)
	}
	// Random outcome: multiply row p into every other row that anticommutes with Z_a (except
	// its destabilizer partner, which row p then replaces), and make row p ±Z_a with a new sign.
	mask := slices.Clone(xa)
	mask[p/64] &^= 1 << (p % 64)
	mask[(p-n)/64] &^= 1 << ((p - n) % 64)
	r.multiplyRows(mask, p)
	r.copyRow(p-n, p)
	r.setZ(p, a)
	v := len(r.syms)
	col := make([]uint64, w)
	col[p/64] = 1 << (p % 64)
	r.syms = append(r.syms, col)
	out := affineBit{}
	out.xorVar(v)
	return out
}

func rowBit(col []uint64, r int) bool { return col[r/64]>>(r%64)&1 == 1 }

func wordMask(b bool) uint64 {
	if b {
		return ^uint64(0)
	}
	return 0
}

// multiplyRows replaces every row h in mask by row h · row p, 64 rows at a time. The sign follows
// Aaronson & Gottesman's rowsum: 2r_h + 2r_p + Σ_q g(x_pq, z_pq, x_hq, z_hq) mod 4, with g
// the power of i that multiplying the single-qubit factors gives; it is counted per row in two
// bit planes.
func (r *symbolicRun) multiplyRows(mask []uint64, p int) {
	t := r.t
	w := t.words
	lo, hi := make([]uint64, w), make([]uint64, w)
	for q := 0; q < t.n; q++ {
		xc, zc := t.x[q*w:q*w+w], t.z[q*w:q*w+w]
		x1, z1 := rowBit(xc, p), rowBit(zc, p)
		if !x1 && !z1 {
			continue
		}
		bx, bz := wordMask(x1), wordMask(z1)
		for i, m := range mask {
			if m == 0 {
				continue
			}
			x2, z2 := xc[i], zc[i]
			var plus, minus uint64
			switch {
			case x1 && z1: // Y·P: +1 for Z, −1 for X
				plus, minus = z2&^x2, x2&^z2
			case x1: // X·P: +1 for Y, −1 for Z
				plus, minus = x2&z2, z2&^x2
			default: // Z·P: +1 for X, −1 for Y
				plus, minus = x2&^z2, x2&z2
			}
			plus, minus = plus&m, minus&m
			carry := lo[i] & plus
			lo[i] ^= plus
			hi[i] ^= carry
			borrow := ^lo[i] & minus
			lo[i] ^= minus
			hi[i] ^= borrow
			xc[i] ^= m & bx
			zc[i] ^= m & bz
		}
	}
	sp := wordMask(rowBit(t.sign, p))
	for i, m := range mask {
		t.sign[i] ^= m & (sp ^ hi[i])
	}
	for _, s := range r.syms {
		sp := wordMask(rowBit(s, p))
		for i, m := range mask {
			s[i] ^= m & sp
		}
	}
}

// copyRow sets row dst to row src, sign and symbols included.
func (r *symbolicRun) copyRow(dst, src int) {
	t := r.t
	set := func(col []uint64) {
		col[dst/64] &^= 1 << (dst % 64)
		if rowBit(col, src) {
			col[dst/64] |= 1 << (dst % 64)
		}
	}
	w := t.words
	for q := 0; q < t.n; q++ {
		set(t.x[q*w : q*w+w])
		set(t.z[q*w : q*w+w])
	}
	set(t.sign)
	for _, s := range r.syms {
		set(s)
	}
}

// setZ makes row p the string +Z_a with no symbols.
func (r *symbolicRun) setZ(p, a int) {
	t := r.t
	w := t.words
	clear := func(col []uint64) { col[p/64] &^= 1 << (p % 64) }
	for q := 0; q < t.n; q++ {
		clear(t.x[q*w : q*w+w])
		clear(t.z[q*w : q*w+w])
	}
	t.z[a*w+p/64] |= 1 << (p % 64)
	clear(t.sign)
	for _, s := range r.syms {
		clear(s)
	}
}

// fixedOutcome returns the outcome of measuring Z_a when Z_a is ± a product of stabilizers: the
// product of the stabilizers whose destabilizers anticommute with Z_a, whose sign is the outcome.
// For rows P_j = (−1)^{s_j} i^{w_j} X^{x_j} Z^{z_j} (w_j the number of Y factors), moving every
// X^{x_l} left past the Z^{z_j} with j < l gives
//
//	Π_j P_j = (−1)^{Σ s_j + Σ_{j<l} z_j·x_l} i^{Σ w_j} X^{Σ x_j} Z^{Σ z_j},
//
// and the product is ±Z_a, so Σ w_j is even and the sign is Σ s_j + Σ_{j<l} z_j·x_l + Σ w_j / 2.
func (r *symbolicRun) fixedOutcome(a int) affineBit {
	t := r.t
	n, w := t.n, t.words
	sel := make([]uint64, w)
	xa := t.x[a*w : a*w+w]
	for i := 0; i < n; i++ {
		if rowBit(xa, i) {
			sel[(i+n)/64] |= 1 << ((i + n) % 64)
		}
	}
	parity := 0
	ys := 0
	for q := 0; q < n; q++ {
		xc, zc := t.x[q*w:q*w+w], t.z[q*w:q*w+w]
		var before uint64 // parity of the selected z bits in earlier words
		for i, m := range sel {
			if m == 0 {
				continue
			}
			xm, zm := xc[i]&m, zc[i]&m
			ys += bits.OnesCount64(xm & zm)
			// earlier[l] = parity of zm's bits below l, plus those of earlier words.
			e := zm << 1
			e ^= e << 1
			e ^= e << 2
			e ^= e << 4
			e ^= e << 8
			e ^= e << 16
			e ^= e << 32
			e ^= before
			parity ^= bits.OnesCount64(xm & e)
			before ^= wordMask(bits.OnesCount64(zm)&1 == 1)
		}
	}
	out := affineBit{c: (parity+ys/2)&1 == 1}
	for i, m := range sel {
		if bits.OnesCount64(t.sign[i]&m)&1 == 1 {
			out.c = !out.c
		}
	}
	for v, s := range r.syms {
		k := 0
		for i, m := range sel {
			k += bits.OnesCount64(s[i] & m)
		}
		if k&1 == 1 {
			out.xorVar(v)
		}
	}
	return out
}

// outcomeSet returns the set of values the classical bits take: the offset of constants plus
// the span of, for each symbol, the bits that contain it.
func (r *symbolicRun) outcomeSet() *affineSet {
	nb := len(r.bits)
	ww := (nb + 63) / 64
	offset := make([]uint64, ww)
	gens := make([][]uint64, len(r.syms))
	for v := range gens {
		gens[v] = make([]uint64, ww)
	}
	for i, b := range r.bits {
		if b.c {
			offset[i/64] |= 1 << (i % 64)
		}
		for v := range gens {
			if b.has(v) {
				gens[v][i/64] |= 1 << (i % 64)
			}
		}
	}
	return newAffineSet(nb, offset, gens)
}
