package gen

import (
	"math"
	"slices"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// A pattern is the left-hand side of a textbook circuit identity: the local
// structure a rewrite pass looks for. Circuit plants patterns whose gates are
// all in the user's set (chunkPattern), and near misses of them, in which one
// op is moved to another qubit, has its operands exchanged or its angle
// changed: where a pass's matcher forgets a check, a near miss shows it.
type pattern []patternOp

// patternOp is one op of a pattern: a standard gate on the pattern's qubits
// a, b, c (0, 1, 2) and, for a gate with an angle, which angle.
type patternOp struct {
	gate  string
	on    []int
	angle int // see the angle kinds below
}

// Angle kinds of a pattern op, in terms of the angle θ drawn for the pattern.
const (
	noAngle   = iota
	theta     // θ
	minus     // −θ, so that it undoes θ
	toTwoPi   // 2π − θ, so that it adds up with θ to 2π
	halfTheta // θ/2
)

// patterns are the identities Circuit plants, each named with its source.
var patterns = []pattern{
	// Conjugation by h exchanges x and z (N&C §4.2, exercise 4.14).
	{{"h", []int{0}, 0}, {"x", []int{0}, 0}, {"h", []int{0}, 0}},
	{{"h", []int{0}, 0}, {"z", []int{0}, 0}, {"h", []int{0}, 0}},
	// s·x·sdg = y up to phase (N&C §4.2, exercise 4.14's table).
	{{"s", []int{0}, 0}, {"x", []int{0}, 0}, {"sdg", []int{0}, 0}},
	// Phase gates compose: t·t = s, s·s = z, s·sdg = I (N&C Fig. 4.2).
	{{"t", []int{0}, 0}, {"t", []int{0}, 0}},
	{{"s", []int{0}, 0}, {"s", []int{0}, 0}},
	{{"s", []int{0}, 0}, {"sdg", []int{0}, 0}},
	// Rotations about one axis add their angles (N&C eq. 4.4–4.6).
	{{"rz", []int{0}, theta}, {"rz", []int{0}, toTwoPi}},
	{{"rx", []int{0}, theta}, {"rx", []int{0}, minus}},
	{{"p", []int{0}, theta}, {"p", []int{0}, toTwoPi}},
	// Rotations about two axes make every single-qubit unitary (the Z-Y
	// decomposition, N&C Theorem 4.1, and its Z-X form).
	{{"rz", []int{0}, theta}, {"rx", []int{0}, halfTheta}, {"rz", []int{0}, minus}},
	{{"rz", []int{0}, theta}, {"ry", []int{0}, halfTheta}, {"rz", []int{0}, minus}},
	// A Pauli on the control of cx along Z, or on its target along X,
	// passes through it (N&C §10.5.2, conjugation of Paulis by CNOT).
	{{"z", []int{0}, 0}, {"cx", []int{0, 1}, 0}, {"z", []int{0}, 0}},
	{{"x", []int{1}, 0}, {"cx", []int{0, 1}, 0}, {"x", []int{1}, 0}},
	{{"rz", []int{0}, theta}, {"cx", []int{0, 1}, 0}, {"rz", []int{0}, minus}},
	{{"rx", []int{1}, theta}, {"cx", []int{0, 1}, 0}, {"rx", []int{1}, minus}},
	// cx is self-inverse; three alternating cx make a swap (N&C Fig. 1.7).
	{{"cx", []int{0, 1}, 0}, {"cx", []int{0, 1}, 0}},
	{{"cx", []int{0, 1}, 0}, {"cx", []int{1, 0}, 0}, {"cx", []int{0, 1}, 0}},
	// h on both sides reverses a cx (N&C exercise 4.20); h on the target
	// makes it a cz (exercise 4.17).
	{{"h", []int{0}, 0}, {"h", []int{1}, 0}, {"cx", []int{0, 1}, 0}, {"h", []int{0}, 0}, {"h", []int{1}, 0}},
	{{"h", []int{1}, 0}, {"cx", []int{0, 1}, 0}, {"h", []int{1}, 0}},
	// cx·rz(θ) on the target·cx = rzz(θ) (N&C §4.7.3, Fig. 4.19).
	{{"cx", []int{0, 1}, 0}, {"rz", []int{1}, theta}, {"cx", []int{0, 1}, 0}},
	// Controlled phases: crz(θ) = cp(θ)·p(−θ/2) on the control, and crz has
	// period 4π (N&C §4.3).
	{{"cp", []int{0, 1}, theta}, {"crz", []int{0, 1}, theta}},
	{{"crz", []int{0, 1}, theta}, {"crz", []int{0, 1}, toTwoPi}},
	{{"crz", []int{0, 1}, theta}, {"p", []int{0}, halfTheta}},
	// A swap relabels the wires of the gates after it (N&C §1.3.4).
	{{"swap", []int{0, 1}, 0}, {"cx", []int{0, 1}, 0}},
	{{"swap", []int{0, 1}, 0}, {"swap", []int{1, 0}, 0}},
	// ccx is self-inverse.
	{{"ccx", []int{0, 1, 2}, 0}, {"ccx", []int{0, 1, 2}, 0}},
}

// width is the number of qubits a pattern acts on.
func (p pattern) width() int {
	n := 0
	for _, op := range p {
		for _, q := range op.on {
			n = max(n, q+1)
		}
	}
	return n
}

// available returns the patterns whose gates are all in the plan's set with a
// positive weight and that fit its register.
func (p *plan) available() []pattern {
	weight := map[string]int{}
	for _, ch := range p.choices {
		if !ch.gate.IsCustom() {
			weight[ch.name] = ch.weight
		}
	}
	var out []pattern
	for _, pat := range patterns {
		ok := pat.width() <= p.qubits
		for _, op := range pat {
			ok = ok && weight[op.gate] > 0
		}
		if ok {
			out = append(out, pat)
		}
	}
	return out
}

// Near misses, in shrinking order (none first).
const (
	missNone    = iota
	missMove    // one operand of one op moves to another qubit
	missReverse // one op's operands are reversed
	missAngle   // one op's angle moves by π
)

// missWeights make two draws in six move an op, the near miss that a matcher
// which forgets to check an operand falls for, and two in six reverse one,
// the near miss of a matcher blind to operand order. A near miss that cannot
// apply to the drawn pattern (no multi-qubit op to reverse, no angle to
// change) moves an op instead, so that no draw is a near miss in name only.
var missWeights = []int{missNone: 2, missMove: 2, missReverse: 3, missAngle: 1}

// drawPattern draws a pattern among the available ones, its qubits, its angle
// and a near miss, and returns its ops.
func (b *building) drawPattern(t *rapid.T) []circuit.Op {
	pat := b.patterns[drawBelow(t, len(b.patterns))]
	qubits := drawDistinct(t, pat.width(), nil, b.qubits)
	th := drawAngle(t)
	miss, k := drawWeighted(t, missWeights), drawBelow(t, len(pat))
	ops := make([]circuit.Op, len(pat))
	for i, po := range pat {
		op := circuit.Op{Gate: circuit.Gate{Name: po.gate}, Qubits: make([]int, len(po.on))}
		for j, q := range po.on {
			op.Qubits[j] = qubits[q]
		}
		var a float64
		switch po.angle {
		case theta:
			a = th
		case minus:
			a = -th
		case toTwoPi:
			a = 2*math.Pi - th
		case halfTheta:
			a = th / 2
		}
		if po.angle != noAngle {
			op.Gate.Params = []float64{a}
		}
		ops[i] = op
	}
	// The ops a reversal or an angle change can act on: multi-qubit ops,
	// whose operands have roles, and ops with one angle.
	var multi, angled []int
	for i, op := range ops {
		if len(op.Qubits) > 1 {
			multi = append(multi, i)
		}
		if len(op.Gate.Params) == 1 {
			angled = append(angled, i)
		}
	}
	if miss == missReverse && len(multi) == 0 || miss == missAngle && len(angled) == 0 {
		miss = missMove
	}
	switch miss {
	case missMove:
		// An inner op of a longer pattern: moving what a matcher finds
		// between two ops is the near miss that tests whether it checks
		// where that op is.
		if len(ops) >= 3 {
			k = 1 + k%(len(ops)-2)
		}
	case missReverse:
		k = multi[k%len(multi)]
	case missAngle:
		k = angled[k%len(angled)]
	}
	switch op := &ops[k]; miss {
	case missMove:
		j := drawBelow(t, len(op.Qubits))
		if free := b.qubits - len(op.Qubits); free > 0 {
			op.Qubits[j] = drawDistinct(t, 1, without(op.Qubits, b.qubits), b.qubits)[0]
		}
	case missReverse:
		for i, j := 0, len(op.Qubits)-1; i < j; i, j = i+1, j-1 {
			op.Qubits[i], op.Qubits[j] = op.Qubits[j], op.Qubits[i]
		}
	case missAngle:
		if len(op.Gate.Params) == 1 {
			op.Gate.Params[0] += math.Pi
		}
	}
	// Each op has a mark, drawn last: 0 deletes it, 1 replaces its gate by
	// the set's first gate of the same width (with angles θ), 2 gives it the
	// plain angle θ, and the other 13 values in 16 keep it as the pattern
	// wrote it. The shrinker, which lowers marks toward 0, can so delete any
	// op of a pattern, and simplify the gate or angle of those it needs.
	kept := ops[:0]
	for _, op := range ops {
		switch drawBelow(t, 16) {
		case 0:
			continue
		case 1:
			op.Gate = b.simplest(len(op.Qubits), th)
		case 2:
			if len(op.Gate.Params) == 1 {
				op.Gate.Params[0] = th
			}
		}
		kept = append(kept, op)
	}
	return kept
}

// simplest returns the first gate of the set, with a positive weight, that
// acts on k qubits, with every angle a (a pattern's gates are in the set, so
// there is one).
func (b *building) simplest(k int, a float64) circuit.Gate {
	for _, ch := range b.choices {
		if ch.qubits == k && ch.weight > 0 {
			g := ch.gate
			if ch.params > 0 {
				g.Params = slices.Repeat([]float64{a}, ch.params)
			}
			return g
		}
	}
	panic("gen: unreachable: a pattern op has no gate of its width in the set")
}

// without returns the qubits 0..width−1 not in qs, in increasing order.
func without(qs []int, width int) []int {
	var out []int
	for q := range width {
		if !contains(qs, q) {
			out = append(out, q)
		}
	}
	return out
}
