package peephole

import "qcheck.dev/qcheck/circuit"

// axis is a set of Pauli axes, one bit each; a gate "acts along" an axis on one of its operands
// when it commutes with that Pauli on that operand.
type axis uint8

const (
	alongZ axis = 1 << iota
	alongX
	alongY
	anyAxis = alongZ | alongX | alongY
)

// axes lists, for each standard gate, the Pauli axes it commutes with on each operand, in operand
// order. A gate that is not listed, or an operand whose entry is 0, commutes only with gates on
// other qubits. Each entry follows from the gate's matrix (N&C §4.2–4.3): diagonal gates and
// controls commute with Z; rx, x, sx and the target of cx and crx commute with X; ry, y and the
// targets of cy and cry commute with Y; rxx, ryy, rzz are exp(−iθP⊗P/2) and commute with P on
// each operand.
var axes = map[string][]axis{
	"id": {anyAxis},
	"z":  {alongZ}, "s": {alongZ}, "sdg": {alongZ}, "t": {alongZ}, "tdg": {alongZ},
	"p": {alongZ}, "rz": {alongZ},
	"x": {alongX}, "rx": {alongX}, "sx": {alongX}, "sxdg": {alongX},
	"y": {alongY}, "ry": {alongY},
	"cx": {alongZ, alongX}, "crx": {alongZ, alongX},
	"cy": {alongZ, alongY}, "cry": {alongZ, alongY},
	"cz": {alongZ, alongZ}, "cp": {alongZ, alongZ}, "crz": {alongZ, alongZ},
	"ch": {alongZ, 0}, "cswap": {alongZ, 0, 0},
	"rzz": {alongZ, alongZ}, "rxx": {alongX, alongX}, "ryy": {alongY, alongY},
	"ccx": {alongZ, alongZ, alongX}, "ccz": {alongZ, alongZ, alongZ},
}

// axesOn returns the axes op acts along on qubit q, or 0 when it acts on q along no single axis
// (or is not unitary, such as a barrier or measure, which nothing may cross).
func axesOn(op circuit.Op, q int) axis {
	if op.Gate.IsCustom() {
		return 0
	}
	list := axes[op.Gate.Name]
	for i, r := range op.Qubits {
		if r == q && i < len(list) {
			return list[i]
		}
	}
	return 0
}

// Commutes reports whether ops a and b commute by the axis rule: on every qubit they share, both
// act along a common Pauli axis. Ops on disjoint qubits always commute. The rule is sufficient,
// not necessary: two gates that share a qubit along no common axis are reported as not commuting
// even when they happen to (h and x·z·x, say).
//
// Why it holds: if both gates commute with the Pauli P_q on every shared qubit q, then in a basis
// that diagonalizes those Paulis both are block diagonal, each block acting on qubits the other
// does not touch, and block-diagonal operators with disjoint blocks commute.
func Commutes(a, b circuit.Op) bool {
	for _, q := range a.Qubits {
		if !touches(b, q) {
			continue
		}
		if axesOn(a, q)&axesOn(b, q) == 0 {
			return false
		}
	}
	return true
}

// touches reports whether op acts on qubit q.
func touches(op circuit.Op, q int) bool {
	for _, r := range op.Qubits {
		if r == q {
			return true
		}
	}
	return false
}
