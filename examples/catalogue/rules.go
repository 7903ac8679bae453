package catalogue

import (
	"math"
	"slices"

	"qcheck.dev/examples/peephole"
	"qcheck.dev/qcheck/circuit"
)

// The mistakes in this file are made in the two rules of Quillfen's peephole search
// (peephole.Rules): when an op may slide past another, and what two ops on the same qubits
// become. Each wrong pass is peephole.Optimize with one rule bent; its correct twin is
// peephole.Optimize itself.

// withCommutes is peephole.Optimize with the commutation rule replaced.
func withCommutes(commutes func(a, b circuit.Op) bool) func(*circuit.Circuit) (*circuit.Circuit, error) {
	return peephole.Rules{Commutes: commutes, Merge: peephole.MergeOrCancel}.Apply
}

// withMerge is peephole.Optimize with an extra merge rule tried first.
func withMerge(extra peephole.MergeFunc) func(*circuit.Circuit) (*circuit.Circuit, error) {
	return peephole.Rules{Commutes: peephole.Commutes, Merge: func(a, b circuit.Op) ([]circuit.Op, bool) {
		if r, ok := extra(a, b); ok {
			return r, true
		}
		return peephole.MergeOrCancel(a, b)
	}}.Apply
}

// slidesThrough returns peephole.Commutes with one mistake: a gate of family is taken to commute
// with every op of the gate through that it shares a qubit with.
func slidesThrough(family map[string]bool, through string) func(a, b circuit.Op) bool {
	return func(a, b circuit.Op) bool {
		if a.Gate.Name == through {
			a, b = b, a
		}
		if b.Gate.Name == through && family[a.Gate.Name] {
			return true
		}
		return peephole.Commutes(a, b)
	}
}

// xFamily are the single-qubit gates that commute with X.
var xFamily = map[string]bool{"x": true, "rx": true, "sx": true, "sxdg": true}

// xThroughControl lets X-like gates through a cx on either operand. They commute with the
// target only: cx·(X⊗I)·cx = X⊗X (N&C §10.5.2, conjugation of Paulis by CNOT; control first).
var xThroughControl = withCommutes(slidesThrough(xFamily, "cx"))

// zFamily are the single-qubit diagonal gates.
var zFamily = map[string]bool{"z": true, "s": true, "sdg": true, "t": true, "tdg": true, "rz": true, "p": true}

// hAsDiagonal lets h slide past diagonal gates; but h·z·h = x (N&C §4.2, exercise 4.14).
var hAsDiagonal = withCommutes(slidesThrough(zFamily, "h"))

// cxCancelBlind cancels two cx on the same pair of qubits whatever their orientation; but
// cx(a,b)·cx(b,a) is not the identity (three alternating cx make a swap, N&C §1.3.4, Fig. 1.7).
var cxCancelBlind = withMerge(func(a, b circuit.Op) ([]circuit.Op, bool) {
	if a.Gate.Name == "cx" && b.Gate.Name == "cx" {
		return []circuit.Op{}, true // the qubit sets are equal: the search only pairs such ops
	}
	return nil, false
})

// sSelfInverse cancels s·s; but s·s = z (N&C §4.2, Fig. 4.2: s² = z).
var sSelfInverse = withMerge(func(a, b circuit.Op) ([]circuit.Op, bool) {
	if a.Gate.Name == "s" && b.Gate.Name == "s" {
		return []circuit.Op{}, true
	}
	return nil, false
})

// rzRXMerge adds the angles of an rz and an rx on the same qubit; rotations about different axes
// do not compose by adding angles.
var rzRXMerge = withMerge(func(a, b circuit.Op) ([]circuit.Op, bool) {
	if a.Gate.Name == "rz" && b.Gate.Name == "rx" || a.Gate.Name == "rx" && b.Gate.Name == "rz" {
		return []circuit.Op{{Gate: circuit.Gate{Name: "rz", Params: []float64{a.Gate.Params[0] + b.Gate.Params[0]}}, Qubits: slices.Clone(a.Qubits)}}, true
	}
	return nil, false
})

// phaseGate gives the λ of each gate equal to p(λ) (N&C §4.2, Fig. 4.2); p itself is NaN.
var phaseGate = map[string]float64{"p": math.NaN(), "z": math.Pi, "s": math.Pi / 2, "sdg": -math.Pi / 2, "t": math.Pi / 4, "tdg": -math.Pi / 4}

// mergePhases returns a rule that merges two phase gates on one qubit into p with their angles
// added and reduced by period (dropped at 0), with the angles of table.
func mergePhases(table map[string]float64, period float64) peephole.MergeFunc {
	return func(a, b circuit.Op) ([]circuit.Op, bool) {
		la, okA := phaseAngle(table, a.Gate)
		lb, okB := phaseAngle(table, b.Gate)
		if !okA || !okB {
			return nil, false
		}
		lambda := math.Remainder(la+lb, period)
		if math.Abs(lambda) < 1e-12 {
			return []circuit.Op{}, true
		}
		return []circuit.Op{{Gate: circuit.Gate{Name: "p", Params: []float64{lambda}}, Qubits: slices.Clone(a.Qubits)}}, true
	}
}

func phaseAngle(table map[string]float64, g circuit.Gate) (float64, bool) {
	l, ok := table[g.Name]
	if !ok || g.IsCustom() {
		return 0, false
	}
	if len(g.Params) == 1 {
		return g.Params[0], true
	}
	return l, true
}

// phaseModPi merges phase gates with the angle reduced mod π; p(λ) has period 2π, and
// p(π) = z is not the identity.
var phaseModPi = withMerge(mergePhases(phaseGate, math.Pi))

// sdgAsS merges phase gates with a table that gives sdg the angle of s.
var sdgAsS = withMerge(mergePhases(map[string]float64{"p": math.NaN(), "z": math.Pi, "s": math.Pi / 2, "sdg": math.Pi / 2, "t": math.Pi / 4, "tdg": -math.Pi / 4}, 2*math.Pi))

// controlledPeriod2Pi merges controlled rotations with the angle reduced mod 2π; but
// crz(2π) = diag(1, 1, −1, −1), a z on the control, not the identity: the period of
// exp(−iθZ/2) is 4π (N&C §4.2, eq. 4.6), and in a controlled context the −1 is a relative phase.
var controlledPeriod2Pi = withMerge(func(a, b circuit.Op) ([]circuit.Op, bool) {
	name := a.Gate.Name
	if name != b.Gate.Name || (name != "crz" && name != "crx" && name != "cry") || !slices.Equal(a.Qubits, b.Qubits) {
		return nil, false
	}
	theta := math.Remainder(a.Gate.Params[0]+b.Gate.Params[0], 2*math.Pi)
	if math.Abs(theta) < 1e-12 {
		return []circuit.Op{}, true
	}
	return []circuit.Op{{Gate: circuit.Gate{Name: name, Params: []float64{theta}}, Qubits: slices.Clone(a.Qubits)}}, true
})
