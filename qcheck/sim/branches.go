package sim

import (
	"fmt"
	"math"
	"math/cmplx"

	"qcheck.dev/qcheck/circuit"
)

// ProgramOptions bound the work of the exact program engines. The zero value is useful.
type ProgramOptions struct {
	// MaxBranches is the most measurement branches held at once; 0 means 4096. A program that
	// needs more is refused, never sampled.
	MaxBranches int
	// MaxBytes bounds the memory of the statevectors held at once; 0 means 2 GiB.
	MaxBytes int64
	// Bits, when not nil, lists the classical bits a comparison reads: bit j of a compared
	// outcome is bit Bits[j] of the program's (see Outcomes.Marginal). Nil reads them all.
	Bits []int
}

func (o ProgramOptions) limits() (int, int64) {
	b, m := o.MaxBranches, o.MaxBytes
	if b <= 0 {
		b = 4096
	}
	if m <= 0 {
		m = 2 << 30
	}
	return b, m
}

// mergeGap is how close two branches with the same classical bits must be, as unit vectors
// aligned in phase, to be merged into one; merging moves no distance by more than this.
const mergeGap = 1e-11

// branch is one run of a program: the classical bits so far and the state, not normalised: its
// squared norm is the probability of the run.
type branch struct {
	bits   []byte
	state  []complex128
	weight float64
}

func (b *branch) bit(i int) bool { return b.bits[i/8]>>(i%8)&1 == 1 }

func (b *branch) setBit(i int, v bool) {
	b.bits[i/8] &^= 1 << (i % 8)
	if v {
		b.bits[i/8] |= 1 << (i % 8)
	}
}

func (b *branch) clone() *branch {
	return &branch{bits: append([]byte(nil), b.bits...), state: append([]complex128(nil), b.state...), weight: b.weight}
}

// ProgramOutcomes returns the exact distribution of a program's classical bits: every qubit and
// bit starts at 0, gates act on the statevector, a measure splits each run into its two outcomes
// with their probabilities (Born's rule; branches below PruneBelow are dropped and counted in
// Outcomes.Dropped), a reset measures without recording and flips a 1 back to 0, and a
// classically controlled op acts on the runs whose bits satisfy its condition. Runs that reach
// the same bits with the same state (within 1e-11) are merged.
//
// Final measurements, those no later op touches, reads or overwrites, do not branch: they are
// read off each run's final state as a marginal distribution, so a program that only measures at
// the end costs one statevector run. The number of bits is Circuit.Bits, or more when an op
// names a higher bit. The width is bounded by memory (16·2^n bytes per run) and the number of
// runs by opts; beyond them the program is refused with the reason.
func ProgramOutcomes(c *circuit.Circuit, opts ProgramOptions) (*Outcomes, error) {
	if c == nil {
		return nil, fmt.Errorf("sim: nil circuit")
	}
	if err := c.Validate(); err != nil {
		return nil, err
	}
	n, nbits := c.Qubits(), c.Bits()
	maxBranches, maxBytes := opts.limits()
	if n > maxStateQubits || int64(16)<<n > maxBytes {
		return nil, fmt.Errorf("sim: a %d-qubit statevector needs %s, more than the %s allowed", n, bytesString(math.Ldexp(16, n)), bytesString(float64(maxBytes)))
	}
	maxBranches = int(min(int64(maxBranches), maxBytes/(int64(16)<<n)))
	final := finalMeasures(c)
	finals := 0
	for _, f := range final {
		if f {
			finals++
		}
	}
	first := &branch{bits: make([]byte, (nbits+7)/8), state: make([]complex128, 1<<n), weight: 1}
	first.state[0] = 1
	e := &branchRun{branches: []*branch{first}, limit: maxBranches, out: newOutcomes(nbits, finals)}
	run := circuit.New(n)
	flush := func() error {
		if len(run.Ops) == 0 {
			return nil
		}
		p, err := Compile(run)
		if err != nil {
			return err
		}
		for _, b := range e.branches {
			p.Apply(b.state)
		}
		run = circuit.New(n)
		return nil
	}
	var last []circuit.Op
	for i, op := range c.Ops {
		switch {
		case final[i]:
			last = append(last, op)
			continue
		case op.Gate.Name == "barrier":
			continue
		case op.Unitary():
			run.AppendOp(op)
			continue
		}
		if err := flush(); err != nil {
			return nil, err
		}
		if err := e.step(i, op, n); err != nil {
			return nil, err
		}
	}
	if err := flush(); err != nil {
		return nil, err
	}
	for _, b := range e.branches {
		e.read(b, last)
	}
	return e.out, nil
}

// finalMeasures marks the measurements that no later op touches, reads or overwrites, and that
// no condition controls: they commute with everything after them, so they can be taken last.
func finalMeasures(c *circuit.Circuit) []bool {
	final := make([]bool, len(c.Ops))
	touched := map[int]bool{}
	read, written := map[int]bool{}, map[int]bool{}
	for i := len(c.Ops) - 1; i >= 0; i-- {
		op := c.Ops[i]
		if op.Gate.Name == "barrier" {
			continue
		}
		if op.Gate.Name == "measure" && op.If == nil && !touched[op.Qubits[0]] && !read[op.Bits[0]] && !written[op.Bits[0]] {
			final[i] = true
		}
		for _, q := range op.Qubits {
			touched[q] = true
		}
		for _, b := range op.Bits {
			written[b] = true
		}
		if op.If != nil {
			for _, b := range op.If.Bits {
				read[b] = true
			}
		}
	}
	return final
}

// branchRun holds the runs of a program in progress.
type branchRun struct {
	branches []*branch
	limit    int
	out      *Outcomes
	gates    map[int]*Program // conditioned gates, compiled once
}

// step applies op i, which is not a plain unitary gate, to every run.
func (e *branchRun) step(i int, op circuit.Op, n int) error {
	var next []*branch
	for _, b := range e.branches {
		if op.If != nil && !op.If.Holds(b.bit) {
			next = append(next, b)
			continue
		}
		switch op.Gate.Name {
		case "measure":
			b0, b1 := e.split(b, op.Qubits[0])
			if b0 != nil {
				b0.setBit(op.Bits[0], false)
				next = append(next, b0)
			}
			if b1 != nil {
				b1.setBit(op.Bits[0], true)
				next = append(next, b1)
			}
		case "reset":
			b0, b1 := e.split(b, op.Qubits[0])
			if b1 != nil {
				flipDown(b1.state, op.Qubits[0])
			}
			switch {
			case b0 == nil:
				next = append(next, b1)
			case b1 == nil:
				next = append(next, b0)
			default:
				next = append(next, b0, b1)
			}
		default:
			p := e.gates[i]
			if p == nil {
				plain := op.Clone()
				plain.If = nil
				var err error
				if p, err = Compile(circuit.New(n).AppendOp(plain)); err != nil {
					return &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: err.Error()}
				}
				if e.gates == nil {
					e.gates = map[int]*Program{}
				}
				e.gates[i] = p
			}
			p.Apply(b.state)
			next = append(next, b)
		}
		if len(next) > e.limit {
			return &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: fmt.Sprintf("the program has more than %d measurement branches here; the statevector engine refuses it rather than sample", e.limit)}
		}
	}
	e.branches = merge(next)
	return nil
}

// split measures qubit q of a run: the two runs that follow, either nil when its probability is
// below PruneBelow. The run itself is reused for one of them.
func (e *branchRun) split(b *branch, q int) (b0, b1 *branch) {
	mask := 1 << q
	p1 := 0.0
	for i, a := range b.state {
		if i&mask != 0 {
			p1 += real(a)*real(a) + imag(a)*imag(a)
		}
	}
	p0 := max(0, b.weight-p1)
	keep := func(one bool) {
		for i := range b.state {
			if (i&mask != 0) != one {
				b.state[i] = 0
			}
		}
	}
	switch {
	case p1 < PruneBelow:
		e.out.Dropped += p1
		keep(false)
		b.weight = p0
		return b, nil
	case p0 < PruneBelow:
		e.out.Dropped += p0
		keep(true)
		b.weight = p1
		return nil, b
	}
	c := b.clone()
	keep(false)
	b.weight = p0
	for i := range c.state {
		if i&mask == 0 {
			c.state[i] = 0
		}
	}
	c.weight = p1
	return b, c
}

// flipDown moves the amplitudes with qubit q at 1 to q at 0, for a run known to have q at 1.
func flipDown(state []complex128, q int) {
	mask := 1 << q
	for i := range state {
		if i&mask != 0 {
			state[i^mask], state[i] = state[i], 0
		}
	}
}

// merge joins runs with the same bits whose states are the same up to phase and scale; the
// joined run carries both probabilities. Only a few candidates per bit pattern are tried.
func merge(bs []*branch) []*branch {
	if len(bs) < 2 {
		return bs
	}
	const tries = 4
	seen := map[string][]*branch{}
	out := bs[:0]
	for _, b := range bs {
		k := string(b.bits)
		merged := false
		for j, a := range seen[k] {
			if j >= tries {
				break
			}
			if sameState(a, b) {
				s := math.Sqrt((a.weight + b.weight) / a.weight)
				for i := range a.state {
					a.state[i] *= complex(s, 0)
				}
				a.weight += b.weight
				merged = true
				break
			}
		}
		if !merged {
			seen[k] = append(seen[k], b)
			out = append(out, b)
		}
	}
	return out
}

// sameState reports whether two runs' states, normalised and aligned in phase, lie within
// mergeGap of each other.
func sameState(a, b *branch) bool {
	z := dot(b.state, a.state)
	if cmplx.Abs(z) == 0 {
		return false
	}
	rot := z / complex(cmplx.Abs(z), 0)
	sa, sb := 1/math.Sqrt(a.weight), 1/math.Sqrt(b.weight)
	sum := 0.0
	for i, x := range a.state {
		d := complex(sa, 0)*x - complex(sb, 0)*rot*b.state[i]
		sum += real(d)*real(d) + imag(d)*imag(d)
	}
	return sum <= mergeGap*mergeGap
}

// read adds a run's outcomes to the distribution: its bits, with the final measurements read
// off its state as a marginal distribution.
func (e *branchRun) read(b *branch, finals []circuit.Op) {
	if len(finals) == 0 {
		e.out.add(b.bits, b.weight)
		return
	}
	probs := marginal(b.state, finals)
	if e.out.dense != nil {
		// Outcome index = the run's bits with the final ones cleared, or'ed with k's bits
		// moved to their places, a byte of k at a time.
		base := &branch{bits: append([]byte(nil), b.bits...)}
		tables := make([][256]int, (len(finals)+7)/8)
		for j, op := range finals {
			base.setBit(op.Bits[0], false)
			for v := 0; v < 256; v++ {
				if v>>(j%8)&1 == 1 {
					tables[j/8][v] |= 1 << op.Bits[0]
				}
			}
		}
		x0 := denseIndex(base.bits)
		for k, p := range probs {
			if p != 0 {
				x := x0
				for t := range tables {
					x |= tables[t][k>>(8*t)&255]
				}
				e.out.dense[x] += p
			}
		}
		return
	}
	out := &branch{bits: make([]byte, len(b.bits))}
	for k, p := range probs {
		if p == 0 {
			continue
		}
		copy(out.bits, b.bits)
		for j, op := range finals {
			out.setBit(op.Bits[0], k>>j&1 == 1)
		}
		e.out.add(out.bits, p)
	}
}

// marginal returns the distribution of measuring the qubits of the measurements on state: entry k
// holds the probability that measurement j reads bit j of k. The index of each amplitude is
// mapped to k a byte at a time, through tables.
func marginal(state []complex128, measures []circuit.Op) []float64 {
	n := 0
	for len(state) > 1<<n {
		n++
	}
	tables := make([][256]int, (n+7)/8)
	for j, op := range measures {
		q := op.Qubits[0]
		for v := 0; v < 256; v++ {
			if v>>(q%8)&1 == 1 {
				tables[q/8][v] |= 1 << j
			}
		}
	}
	probs := make([]float64, 1<<len(measures))
	for i, a := range state {
		k := 0
		for t := range tables {
			k |= tables[t][i>>(8*t)&255]
		}
		probs[k] += real(a)*real(a) + imag(a)*imag(a)
	}
	return probs
}
