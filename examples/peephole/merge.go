package peephole

import (
	"math"
	"slices"

	"qcheck.dev/qcheck/circuit"
)

// A MergeFunc says what two ops on the same set of qubits become when the second directly
// follows the first: ok is false when the rule does not apply; otherwise the ops are replaced by
// the returned list, which is empty when they cancel and holds one op when they merge. A MergeFunc
// may return at most one op, so that every rewrite shortens the circuit and the search ends.
type MergeFunc func(first, second circuit.Op) (replacement []circuit.Op, ok bool)

// angleZero is how close to a multiple of the period a merged angle must be to count as the
// identity and be dropped. Dropping rz(δ) moves the unitary by |δ|/2 in operator norm, so 1e-12
// stays far below qcheck's default tolerance of 1e-9 (common practice; no source).
const angleZero = 1e-12

// period4π lists the rotations exp(−iθP/2) and their controlled forms, which merge by adding
// angles and are the identity exactly when θ is a multiple of 4π (at 2π they are −I, or a Z on
// the control for the controlled forms).
var period4π = map[string]bool{
	"rx": true, "ry": true, "rz": true, "crx": true, "cry": true, "crz": true,
	"rxx": true, "ryy": true, "rzz": true,
}

// phaseAngle gives the λ of each single-qubit gate that is exactly p(λ) = diag(1, e^{iλ}):
// z = p(π), s = p(π/2), t = p(π/4) (N&C §4.2, Fig. 4.2), and their inverses.
var phaseAngle = map[string]float64{
	"p": math.NaN(), "z": math.Pi, "s": math.Pi / 2, "sdg": -math.Pi / 2, "t": math.Pi / 4, "tdg": -math.Pi / 4,
}

// controlledPhaseAngle does the same for the two-qubit diagonal gates cp(λ) = diag(1, 1, 1, e^{iλ})
// and cz = cp(π).
var controlledPhaseAngle = map[string]float64{"cp": math.NaN(), "cz": math.Pi}

// symmetric lists the gates whose matrix does not change when their operands are exchanged,
// with the operand positions that may be exchanged.
var symmetric = map[string][2]int{
	"cz": {0, 1}, "cp": {0, 1}, "swap": {0, 1}, "iswap": {0, 1}, "iswapdg": {0, 1},
	"rxx": {0, 1}, "ryy": {0, 1}, "rzz": {0, 1}, "ccz": {0, 1}, "ccx": {0, 1}, "cswap": {1, 2},
}

// sameOperands reports whether two ops apply their gates to the same qubits in the same roles:
// the same operand order, or an order that differs only by exchanging operands the gate is
// symmetric in. ccz is symmetric in all three operands; the table covers its first two, and
// sameOperands checks the rest.
func sameOperands(a, b circuit.Op) bool {
	if len(a.Qubits) != len(b.Qubits) {
		return false
	}
	if slices.Equal(a.Qubits, b.Qubits) {
		return true
	}
	if a.Gate.Name == "ccz" && b.Gate.Name == "ccz" {
		return sameSet(a.Qubits, b.Qubits)
	}
	sa, okA := symmetric[a.Gate.Name]
	sb, okB := symmetric[b.Gate.Name]
	if !okA || !okB || sa != sb {
		return false
	}
	swapped := append([]int(nil), b.Qubits...)
	swapped[sa[0]], swapped[sa[1]] = swapped[sa[1]], swapped[sa[0]]
	return slices.Equal(a.Qubits, swapped)
}

// CancelPair is the MergeFunc that removes a gate followed by its exact inverse on the same
// qubits: h·h, cx·cx, s·sdg, sx·sxdg, rz(θ)·rz(−θ), u·u†, and a custom gate followed by its
// conjugate transpose.
func CancelPair(first, second circuit.Op) ([]circuit.Op, bool) {
	if !first.Unitary() || !second.Unitary() || !sameOperands(first, second) {
		return nil, false
	}
	if first.Gate.Inverse().Equal(second.Gate) {
		return []circuit.Op{}, true
	}
	return nil, false
}

// MergePair is the MergeFunc that adds the angles of two rotations about the same axis on the
// same qubits: rx+rx, ry+ry, rz+rz and their controlled and two-qubit forms; and the phase gates
// p, z, s, sdg, t, tdg with each other (all are p(λ)), and cp with cz (cz = cp(π)). The result
// is dropped when it is the identity and named z, s, sdg, t, tdg or cz when its angle is theirs.
// It never merges gates that differ by a phase, such as rz with p or crz with cp.
func MergePair(first, second circuit.Op) ([]circuit.Op, bool) {
	if !sameOperands(first, second) {
		return nil, false
	}
	a, b := first.Gate, second.Gate
	switch {
	case a.Name == b.Name && period4π[a.Name]:
		theta := math.Remainder(a.Params[0]+b.Params[0], 4*math.Pi)
		if math.Abs(theta) <= angleZero {
			return []circuit.Op{}, true
		}
		return []circuit.Op{{Gate: circuit.Gate{Name: a.Name, Params: []float64{theta}}, Qubits: clone(first.Qubits)}}, true
	case isIn(phaseAngle, a) && isIn(phaseAngle, b):
		return phaseOp(angleOf(phaseAngle, a)+angleOf(phaseAngle, b), "p", map[float64]string{
			math.Pi: "z", math.Pi / 2: "s", -math.Pi / 2: "sdg", math.Pi / 4: "t", -math.Pi / 4: "tdg",
		}, first.Qubits), true
	case isIn(controlledPhaseAngle, a) && isIn(controlledPhaseAngle, b):
		return phaseOp(angleOf(controlledPhaseAngle, a)+angleOf(controlledPhaseAngle, b), "cp",
			map[float64]string{math.Pi: "cz"}, first.Qubits), true
	}
	return nil, false
}

// MergeOrCancel tries MergePair, then CancelPair: the rule set of Optimize.
func MergeOrCancel(first, second circuit.Op) ([]circuit.Op, bool) {
	if r, ok := MergePair(first, second); ok {
		return r, true
	}
	return CancelPair(first, second)
}

func isIn(table map[string]float64, g circuit.Gate) bool {
	_, ok := table[g.Name]
	return ok && !g.IsCustom()
}

// angleOf returns the phase angle of a gate in table: its parameter when it has one, its fixed
// angle otherwise.
func angleOf(table map[string]float64, g circuit.Gate) float64 {
	if len(g.Params) == 1 {
		return g.Params[0]
	}
	return table[g.Name]
}

// phaseOp returns the replacement for a phase gate of angle lambda (period 2π) on qubits: nothing
// for the identity, a named gate where the angle is one of named's, the general gate otherwise.
func phaseOp(lambda float64, general string, named map[float64]string, qubits []int) []circuit.Op {
	lambda = math.Remainder(lambda, 2*math.Pi)
	if math.Abs(lambda) <= angleZero {
		return []circuit.Op{}
	}
	if math.Abs(math.Abs(lambda)-math.Pi) <= angleZero {
		lambda = math.Pi // −π and π are the same phase
	}
	for angle, name := range named {
		if math.Abs(lambda-angle) <= angleZero {
			return []circuit.Op{{Gate: circuit.Gate{Name: name}, Qubits: clone(qubits)}}
		}
	}
	return []circuit.Op{{Gate: circuit.Gate{Name: general, Params: []float64{lambda}}, Qubits: clone(qubits)}}
}

func clone(q []int) []int { return append([]int(nil), q...) }

func sameSet(a, b []int) bool {
	if len(a) != len(b) {
		return false
	}
	for _, q := range a {
		found := false
		for _, r := range b {
			found = found || q == r
		}
		if !found {
			return false
		}
	}
	return true
}
