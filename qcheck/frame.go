package qcheck

import (
	"fmt"
	"slices"
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
	// measured and measuredWant say what each bit of an outcome reads when comparing
	// distributions (nil otherwise): outcome bit i is the result of measuring qubit measured[i]
	// of got's register after got (with its output permutation undone, so logical qubits), and
	// qubit measuredWant[i] of got's register after want (moved onto got's register); −1 means
	// the circuit never writes that bit, which then reads 0. bits lists the classical bits the
	// outcome bits are, when the circuits measure into classical bits; nil when the outcome
	// bits are qubits named by Measured (the two lists are then equal).
	measured, measuredWant []int
	bits                   []int
	// want and got are the circuits to give meaning to: want moved onto got's register, and both
	// with their final measurements removed when comparing distributions.
	want, got *circuit.Circuit
	// meaning is what the circuits mean here: "unitary", "program" or "from zero" (program.go).
	meaning string
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
	var err error
	if f.meaning, err = meaningOf(cfg, want, got); err != nil {
		return nil, err
	}
	if f.meaning == meaningProgram {
		return f, nil // programs meet at their classical bits; qubits are not related
	}

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

// setMeasured decides what an outcome is, and removes the final measurements of both circuits.
//
// When the circuits measure (final measure ops), the outcome is the classical bits they write:
// a program's result is its classical bits, so each circuit is read through its own
// measurements, and a routed circuit that measures a different qubit into the same bit is
// compared through that bit. The bits are those want's measurements of the given qubits write
// (all of want's written bits when none are given); a bit written by the last final measure
// writing it; a bit one circuit never writes reads 0. When neither circuit measures, the
// outcome is the given qubits of want (all of them when none are given), read on the same
// logical qubits of got.
func (f *frame) setMeasured(qubits []int) error {
	if err := onlyFinalMeasurements(f.want, "want"); err != nil {
		return err
	}
	if err := onlyFinalMeasurements(f.got, "got"); err != nil {
		return err
	}
	wantW, gotW := finalWrites(f.want), finalWrites(f.got)
	if len(wantW) == 0 && len(gotW) == 0 {
		return f.setMeasuredQubits(qubits)
	}
	if len(wantW) == 0 || len(gotW) == 0 {
		which, other := "want", "got"
		if len(wantW) == 0 {
			which, other = "got", "want"
		}
		return fmt.Errorf("qcheck: Measured: %s measures into classical bits and %s measures nothing; the classical bits are the result, so both circuits must write them", which, other)
	}
	var bits []int
	if len(qubits) == 0 {
		for b := range wantW {
			bits = append(bits, b)
		}
		for b := range gotW {
			if _, ok := wantW[b]; !ok {
				bits = append(bits, b)
			}
		}
	} else {
		for _, q := range qubits {
			found := false
			for b, wq := range wantW {
				if wq == q {
					bits, found = append(bits, b), true
				}
			}
			if !found {
				return fmt.Errorf("qcheck: Measured(%v): want does not measure qubit %d at the end; with measure ops the classical bits they write are the result", qubits, q)
			}
		}
	}
	sort.Ints(bits)
	bits = slices.Compact(bits)
	// Positions of got's physical qubits among the logical qubits of the undone permutation.
	at := make([]int, f.m)
	for q := range at {
		at[q] = q
	}
	for i, p := range f.perm {
		at[p] = i
	}
	f.bits = bits
	f.measured = make([]int, len(bits))
	f.measuredWant = make([]int, len(bits))
	for i, b := range bits {
		f.measured[i], f.measuredWant[i] = -1, -1
		if q, ok := gotW[b]; ok {
			f.measured[i] = at[q]
		}
		if q, ok := wantW[b]; ok {
			if f.data != nil {
				q = f.data[q]
			}
			f.measuredWant[i] = q
		}
	}
	f.want = withoutFinalMeasurements(f.want)
	f.got = withoutFinalMeasurements(f.got)
	return nil
}

// setMeasuredQubits resolves measured qubits (given in want's register) onto got's register,
// for circuits that do not measure.
func (f *frame) setMeasuredQubits(qubits []int) error {
	if len(qubits) == 0 {
		for q := 0; q < f.n; q++ {
			qubits = append(qubits, q)
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
	f.measuredWant = f.measured
	return nil
}

// onlyFinalMeasurements returns a *circuit.OpError, naming the circuit, for the first op of c (named which) that Measured
// cannot take: a measurement followed by an op on its qubit, a reset, or a classically
// controlled op. Such a circuit is a program, whose meaning is the default without Measured.
func onlyFinalMeasurements(c *circuit.Circuit, which string) error {
	final := finalMeasurements(c)
	for i, op := range c.Ops {
		if op.Unitary() || op.Gate.Name == "barrier" || final != nil && final[i] {
			continue
		}
		var why string
		switch {
		case op.If != nil:
			why = "a classically controlled op"
		case op.Gate.Name == "measure":
			why = "the measurement is not final"
			for _, later := range c.Ops[i+1:] {
				if later.Gate.Name != "barrier" && slices.Contains(later.Qubits, op.Qubits[0]) {
					why = fmt.Sprintf("the measurement is followed by %s on the same qubit, so it is not final", later)
					break
				}
			}
		default:
			why = fmt.Sprintf("a %s", op.Gate.Name)
		}
		return &circuit.OpError{Circuit: which, Index: i, Gate: op.Gate.Name, Err: why + "; Measured takes circuits whose measurements are all final and that otherwise only apply gates. Without Measured, circuits that measure, reset or branch before the end are compared as programs, their default meaning"}
	}
	return nil
}

// finalWrites maps each classical bit that a final measurement of c writes (one after which
// nothing acts on its qubit) to the qubit whose result it holds: the last such measurement
// writing the bit, since a later write replaces an earlier one.
func finalWrites(c *circuit.Circuit) map[int]int {
	final := finalMeasurements(c)
	w := map[int]int{}
	for i, op := range c.Ops {
		if final != nil && final[i] {
			w[op.Bits[0]] = op.Qubits[0]
		}
	}
	return w
}

// withoutFinalMeasurements returns c without its final measure ops (see finalMeasurements) and
// without barriers, which carry no meaning; a measurement in the middle of the circuit is kept
// so that the engine refuses it with its position.
func withoutFinalMeasurements(c *circuit.Circuit) *circuit.Circuit {
	final := finalMeasurements(c)
	if final == nil {
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

// finalMeasurements marks the measure ops of c after which nothing acts on their qubit (barriers
// aside); nil when there are none.
func finalMeasurements(c *circuit.Circuit) []bool {
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
		return nil
	}
	return final
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
