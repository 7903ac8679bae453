package ancilla

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// A Construction appends to c an X on target controlled by every qubit of controls, built from
// Toffoli, cx and x gates. work lists the qubits it may use besides the gate's own, in order of
// preference: first the ancillas a Lowering appended (clean or dirty, as the Lowering says), then
// the circuit's other qubits, whose state is unknown. A construction that needs clean work
// qubits must use only the leading ancillas. It returns an error when work is too short.
type Construction func(c *circuit.Circuit, controls []int, target int, work []int) error

// direct appends the gate itself when it has at most two controls and reports whether it did.
func direct(c *circuit.Circuit, controls []int, target int) bool {
	switch len(controls) {
	case 0:
		c.X(target)
	case 1:
		c.CX(controls[0], target)
	case 2:
		c.CCX(controls[0], controls[1], target)
	default:
		return false
	}
	return true
}

// Chain is the clean-ancilla ladder of N&C Fig. 4.10 for an X target: Toffolis compute the AND
// of the controls into work[0], work[1], …, work[k−3], one Toffoli applies it to the target, and
// the ladder is undone. It needs the first k−2 work qubits in |0⟩ and leaves them there.
func Chain(c *circuit.Circuit, controls []int, target int, work []int) error {
	if direct(c, controls, target) {
		return nil
	}
	k := len(controls)
	if len(work) < k-2 {
		return fmt.Errorf("ancilla: the chain for %d controls needs %d clean ancillas, got %d", k, k-2, len(work))
	}
	a := work[:k-2]
	ladder := circuit.New(c.Qubits()).CCX(controls[0], controls[1], a[0])
	for i := 2; i < k-1; i++ {
		ladder.CCX(controls[i], a[i-2], a[i-1])
	}
	c.Compose(ladder)
	c.CCX(controls[k-1], a[k-3], target)
	c.Compose(ladder.Inverse())
	return nil
}

// Borrowed builds the gate with dirty work qubits, which it restores. With at least k−2 of them
// it is Barenco et al. (1995) Lemma 7.2: 4(k−2) Toffolis on work[:k−2]. With fewer but at least
// one, it is the split of Lemma 7.3 with work[0] as the single extra qubit: each half is a
// Lemma 7.2 block that borrows the other half's qubits, applied in the order first, second,
// first, second.
func Borrowed(c *circuit.Circuit, controls []int, target int, work []int) error {
	if direct(c, controls, target) {
		return nil
	}
	k := len(controls)
	if len(work) >= k-2 {
		lemma72(c, controls, target, work[:k-2])
		return nil
	}
	if len(work) == 0 {
		return fmt.Errorf("ancilla: X with %d controls needs at least one work qubit, got none", k)
	}
	first, second := split(controls, target, work[0])
	first(c)
	second(c)
	first(c)
	second(c)
	return nil
}

// OneClean builds the gate with a single clean ancilla, work[0], which it returns to |0⟩: the
// split of Barenco et al. (1995) Lemma 7.3 in the order first, second, first (with a clean
// ancilla the fourth block of Borrowed is not needed).
func OneClean(c *circuit.Circuit, controls []int, target int, work []int) error {
	if direct(c, controls, target) {
		return nil
	}
	if len(work) == 0 {
		return fmt.Errorf("ancilla: X with %d controls needs one clean ancilla, got none", len(controls))
	}
	first, second := split(controls, target, work[0])
	first(c)
	second(c)
	first(c)
	return nil
}

// split divides the k controls as Lemma 7.3 does for its n = k + 2 qubits: the first
// m1 = ⌈n/2⌉ controls are ANDed onto the ancilla a, borrowing the other controls and the target;
// the remaining controls and a are ANDed onto the target, borrowing the first m1 controls. Both
// blocks have enough borrowed qubits for Lemma 7.2 (m1 − 2 ≤ k − m1 + 1 and k − m1 − 1 ≤ m1).
func split(controls []int, target, a int) (first, second func(*circuit.Circuit)) {
	k := len(controls)
	m1 := (k + 3) / 2
	head := append([]int(nil), controls[:m1]...)
	tail := append(append([]int(nil), controls[m1:]...), a)
	borrowHead := append(append([]int(nil), controls[m1:]...), target)
	first = func(c *circuit.Circuit) { block(c, head, a, borrowHead) }
	second = func(c *circuit.Circuit) { block(c, tail, target, head) }
	return first, second
}

// block appends an X on target controlled by controls: directly for up to two controls, by
// Lemma 7.2 on the dirty qubits otherwise (split guarantees there are enough).
func block(c *circuit.Circuit, controls []int, target int, dirty []int) {
	if !direct(c, controls, target) {
		lemma72(c, controls, target, dirty[:len(controls)-2])
	}
}

// lemma72 appends Barenco et al. (1995) Lemma 7.2 for k ≥ 3 controls x and dirty qubits d,
// len(d) = k − 2: the sequence
//
//	T(x_k, d_{k−2}, y), T(x_{k−1}, d_{k−3}, d_{k−2}), …, T(x_3, d_1, d_2), T(x_1, x_2, d_1),
//	T(x_3, d_1, d_2), …, T(x_{k−1}, d_{k−3}, d_{k−2})
//
// applied twice (T is a Toffoli with two controls and a target): the first pass flips y by
// x_k·(d_{k−2} ⊕ AND of the rest) and toggles the d's, the second undoes the d's and the spurious
// part of y.
func lemma72(c *circuit.Circuit, x []int, y int, d []int) {
	k := len(x)
	for range 2 {
		c.CCX(x[k-1], d[k-3], y)
		for i := k - 2; i >= 2; i-- {
			c.CCX(x[i], d[i-2], d[i-1])
		}
		c.CCX(x[0], x[1], d[0])
		for i := 2; i <= k-2; i++ {
			c.CCX(x[i], d[i-2], d[i-1])
		}
	}
}
