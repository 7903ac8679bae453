package qcheck

import (
	"fmt"
	"sort"

	"qcheck.dev/qcheck/circuit"
)

// frame says how got's register relates to want's, resolved from the options and checked
// against the circuits. Every comparison happens on got's register of m qubits.
type frame struct {
	n, m int
	// data[i] is the qubit of got's register that carries want's qubit i; nil when want is as
	// wide as got and used as it is.
	data []int
	// anc lists the ancilla qubits of got's register, sorted; ancMask has their bits set (those below
	// 63, which covers every register the dense engine holds).
	anc     []int
	ancMask int
	clean   bool
	// perm is the output permutation (logical i on physical perm[i]) or nil.
	perm []int
	// measured lists the measured qubits of got's register, or nil when not comparing
	// distributions.
	measured []int
	// want and got are the circuits to give meaning to: want moved onto got's register, and both
	// with their final measurements removed when comparing distributions.
	want, got *circuit.Circuit
}

// frameOf checks the circuits and the options against each other.
func frameOf(cfg *config, want, got *circuit.Circuit) (*frame, error) {
	if want == nil || got == nil {
		return nil, fmt.Errorf("qcheck: Compare(want, got): %s is nil", map[bool]string{true: "want", false: "got"}[want == nil])
	}
	if err := want.Validate(); err != nil {
		return nil, fmt.Errorf("qcheck: want is ill formed: %w", err)
	}
	if err := got.Validate(); err != nil {
		return nil, fmt.Errorf("qcheck: got is ill formed: %w", err)
	}
	f := &frame{n: want.Qubits(), m: got.Qubits(), want: want, got: got}

	if err := f.setAncillas(cfg); err != nil {
		return nil, err
	}
	if cfg.perm != nil {
		if err := checkPermutation(cfg.perm, f.m); err != nil {
			return nil, err
		}
		f.perm = cfg.perm
	}
	if cfg.measuredSet {
		if err := f.setMeasured(cfg.measured); err != nil {
			return nil, err
		}
	}
	if f.data != nil {
		f.want = relabel(f.want, f.data, f.m)
	}
	return f, nil
}

// setAncillas checks the ancillas and the widths, and maps want's qubits onto got's register.
func (f *frame) setAncillas(cfg *config) error {
	k := len(cfg.ancillas)
	if k == 0 {
		if f.n != f.m {
			return fmt.Errorf("qcheck: want has %d qubit(s) and got has %d; compare circuits of the same width, or declare got's extra qubits with Ancillas", f.n, f.m)
		}
		return nil
	}
	f.clean = cfg.ancillaState == Clean
	f.anc = append([]int(nil), cfg.ancillas...)
	sort.Ints(f.anc)
	for i, q := range f.anc {
		if q < 0 || q >= f.m {
			return fmt.Errorf("qcheck: ancilla qubit %d is outside got's register [0, %d)", q, f.m)
		}
		if i > 0 && f.anc[i-1] == q {
			return fmt.Errorf("qcheck: ancilla qubit %d is declared twice", q)
		}
		if q < 63 { // the mask serves the dense engine, whose registers are far narrower
			f.ancMask |= 1 << q
		}
	}
	switch f.n {
	case f.m:
		// Same register: both circuits see the same ancillas.
	case f.m - k:
		f.data = make([]int, 0, f.n)
		for q, a := 0, 0; q < f.m; q++ {
			if a < k && f.anc[a] == q {
				a++
				continue
			}
			f.data = append(f.data, q)
		}
	default:
		return fmt.Errorf("qcheck: want has %d qubit(s) and got has %d with %d ancilla(s) %v; want must have %d qubits (got's without the ancillas) or %d (the same register)", f.n, f.m, k, f.anc, f.m-k, f.m)
	}
	if k == f.m {
		return fmt.Errorf("qcheck: every qubit of got's register %v is an ancilla; nothing is left to compare", f.anc)
	}
	return nil
}

// checkPermutation reports whether perm is a permutation of 0..m−1, naming the first bad entry.
func checkPermutation(perm []int, m int) error {
	if len(perm) != m {
		return fmt.Errorf("qcheck: OutputPermutation has %d entries for got's %d qubits; give one physical qubit per logical qubit", len(perm), m)
	}
	seen := make([]int, m)
	for i, p := range perm {
		if p < 0 || p >= m {
			return fmt.Errorf("qcheck: OutputPermutation[%d] = %d is outside got's register [0, %d)", i, p, m)
		}
		if seen[p] != 0 {
			return fmt.Errorf("qcheck: OutputPermutation[%d] = %d repeats OutputPermutation[%d]; each physical qubit must appear once", i, p, seen[p]-1)
		}
		seen[p] = i + 1
	}
	return nil
}

// setMeasured resolves the measured qubits (given in want's register) onto got's register and
// removes the final measurements of both circuits.
func (f *frame) setMeasured(qubits []int) error {
	if len(qubits) == 0 {
		qubits = measuredQubits(f.want)
		if len(qubits) == 0 {
			for q := 0; q < f.n; q++ {
				qubits = append(qubits, q)
			}
		}
	}
	seen := make(map[int]bool, len(qubits))
	for _, q := range qubits {
		if q < 0 || q >= f.n {
			return fmt.Errorf("qcheck: measured qubit %d is outside want's register [0, %d)", q, f.n)
		}
		if seen[q] {
			return fmt.Errorf("qcheck: measured qubit %d is listed twice", q)
		}
		seen[q] = true
		if f.data != nil {
			q = f.data[q]
		}
		f.measured = append(f.measured, q)
	}
	f.want = withoutFinalMeasurements(f.want)
	f.got = withoutFinalMeasurements(f.got)
	return nil
}

// measuredQubits lists, in increasing order, the qubits that c measures.
func measuredQubits(c *circuit.Circuit) []int {
	var qs []int
	seen := map[int]bool{}
	for _, op := range c.Ops {
		if op.Gate.Name == "measure" && !seen[op.Qubits[0]] {
			seen[op.Qubits[0]] = true
			qs = append(qs, op.Qubits[0])
		}
	}
	sort.Ints(qs)
	return qs
}

// withoutFinalMeasurements returns c without the measure ops after which nothing acts on their
// qubit (and without barriers, which carry no meaning); a measurement in the middle of the
// circuit is kept so that the engine refuses it with its position.
func withoutFinalMeasurements(c *circuit.Circuit) *circuit.Circuit {
	final := make([]bool, len(c.Ops))
	later := make([]bool, c.Qubits())
	found := false
	for i := len(c.Ops) - 1; i >= 0; i-- {
		op := c.Ops[i]
		if op.Gate.Name == "measure" && !later[op.Qubits[0]] {
			final[i], found = true, true
		}
		if op.Gate.Name != "barrier" {
			for _, q := range op.Qubits {
				later[q] = true
			}
		}
	}
	if !found {
		return c
	}
	d := circuit.New(c.Qubits())
	for i, op := range c.Ops {
		if !final[i] {
			d.Ops = append(d.Ops, op)
		}
	}
	return d
}

// relabel returns c moved onto a register of m qubits, its qubit i becoming qubit to[i]. The ops
// share their gates with c, which is not changed.
func relabel(c *circuit.Circuit, to []int, m int) *circuit.Circuit {
	d := circuit.New(m)
	d.Ops = make([]circuit.Op, len(c.Ops))
	for i, op := range c.Ops {
		qs := make([]int, len(op.Qubits))
		for k, q := range op.Qubits {
			qs[k] = to[q]
		}
		d.Ops[i] = circuit.Op{Gate: op.Gate, Qubits: qs, Bits: op.Bits}
	}
	return d
}

// undoLayout returns got followed by the SWAPs that bring logical qubit i, which got leaves on
// physical qubit perm[i], back to qubit i; got itself when perm is nil. The wide engines compare
// that circuit with want, as the dense engine compares want with the relabelled matrix of got.
func undoLayout(got *circuit.Circuit, perm []int) *circuit.Circuit {
	if perm == nil {
		return got
	}
	c := got.Clone()
	pos := append([]int(nil), perm...) // pos[i]: where logical i is now
	at := make([]int, len(perm))       // at[p]: which logical qubit is on physical p
	for i, p := range perm {
		at[p] = i
	}
	for i := range pos {
		if p := pos[i]; p != i {
			j := at[i] // the logical qubit now on physical i moves to p
			c.SWAP(i, p)
			pos[i], pos[j] = i, p
			at[i], at[p] = i, j
		}
	}
	return c
}
