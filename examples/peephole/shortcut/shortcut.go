// Package shortcut is a variant of Fieldfare's peephole optimizer (package peephole) with two
// shortcuts that a contributor proposed to save more gates on Tarn circuits. Both are wrong, on
// purpose: the package exists so that qcheck's tests, its detection-rate measurement and its demo
// have real bugs to find. Do not use it to compile anything.
//
// Bug 1, "Z-rotations commute with cx" (ZThroughTarget): the patch lets rz, p, z, s, sdg, t and
// tdg slide through a cx on either operand. They commute with the control only. On the target,
// cx·(I⊗Z)·cx = Z⊗Z (N&C §4.3, conjugation of Paulis by CNOT), so rz(θ) moved past a cx target
// turns into rzz(θ), not rz(θ): the smallest failing circuit is rz(α) q1; cx q0,q1; rz(β) q1.
//
// Bug 2, "cp and crz are the same controlled Z-rotation" (CPAsCRZ): the patch merges a cp and a
// crz on the same control and target into one cp with the angles added. But
// crz(θ) = cp(θ)·(p(−θ/2) on the control), from the matrices diag(1, 1, e^{−iθ/2}, e^{iθ/2}) and
// diag(1, 1, 1, e^{iθ}): the merge drops a phase on the control that is relative, not global.
// The smallest failing circuit is cp(λ) q0,q1; crz(θ) q0,q1.
package shortcut

import (
	"qcheck.dev/examples/peephole"
	"qcheck.dev/qcheck/circuit"
)

// zFamily are the single-qubit diagonal gates bug 1 lets through a cx target.
var zFamily = map[string]bool{"rz": true, "p": true, "z": true, "s": true, "sdg": true, "t": true, "tdg": true}

// commutesThroughTarget is peephole.Commutes plus bug 1: a single-qubit diagonal gate is said to
// commute with any cx it shares a qubit with.
func commutesThroughTarget(a, b circuit.Op) bool {
	if a.Gate.Name == "cx" {
		a, b = b, a
	}
	if b.Gate.Name == "cx" && zFamily[a.Gate.Name] && len(a.Qubits) == 1 {
		return true // wrong when a acts on b's target
	}
	return peephole.Commutes(a, b)
}

// mergeCPWithCRZ is peephole.MergeOrCancel plus bug 2: cp and crz on the same pair, in either
// order, are merged into cp with the angles added.
func mergeCPWithCRZ(first, second circuit.Op) ([]circuit.Op, bool) {
	f, s := first.Gate.Name, second.Gate.Name
	if (f == "cp" && s == "crz" || f == "crz" && s == "cp") && sameOrder(first.Qubits, second.Qubits) {
		lambda := first.Gate.Params[0] + second.Gate.Params[0] // wrong: crz(θ) is not cp(θ)
		return []circuit.Op{{Gate: circuit.Gate{Name: "cp", Params: []float64{lambda}}, Qubits: append([]int(nil), first.Qubits...)}}, true
	}
	return peephole.MergeOrCancel(first, second)
}

func sameOrder(a, b []int) bool { return len(a) == 2 && len(b) == 2 && a[0] == b[0] && a[1] == b[1] }

// ZThroughTarget is Optimize with bug 1 only.
func ZThroughTarget(c *circuit.Circuit) (*circuit.Circuit, error) {
	return peephole.Rules{Commutes: commutesThroughTarget, Merge: peephole.MergeOrCancel}.Apply(c)
}

// CPAsCRZ is Optimize with bug 2 only.
func CPAsCRZ(c *circuit.Circuit) (*circuit.Circuit, error) {
	return peephole.Rules{Commutes: peephole.Commutes, Merge: mergeCPWithCRZ}.Apply(c)
}

// Optimize is the contributor's patched optimizer, with both bugs.
func Optimize(c *circuit.Circuit) (*circuit.Circuit, error) {
	return peephole.Rules{Commutes: commutesThroughTarget, Merge: mergeCPWithCRZ}.Apply(c)
}
