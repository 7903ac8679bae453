package catalogue

import (
	"math"

	"qcheck.dev/qcheck/circuit"
)

// The mistakes in this file are made in Quillfen's lowering passes, which replace each op of one
// kind by a short network of simpler ops. A lowering is a function from one op to its
// replacement; ok is false for the ops it leaves alone.
type lowering func(op circuit.Op) (ops []circuit.Op, ok bool)

// apply lowers every op of c that l accepts and returns the new circuit.
func (l lowering) apply(c *circuit.Circuit) (*circuit.Circuit, error) {
	out := circuit.New(c.Qubits()).SetBits(c.Bits())
	for _, op := range c.Ops {
		if !op.Unitary() {
			out.AppendOp(op.Clone())
			continue
		}
		if repl, ok := l(op); ok {
			out.Ops = append(out.Ops, repl...)
			continue
		}
		out.AppendOp(op.Clone())
	}
	return out, nil
}

// gate returns the op of a standard gate with angles on qubits.
func gate(name string, qubits []int, params ...float64) circuit.Op {
	return circuit.Op{Gate: circuit.Gate{Name: name, Params: params}, Qubits: qubits}
}

func q(qs ...int) []int { return qs }

// cpNetwork lowers cp(λ) on control c and target t to
//
//	p(λ/2) c; cx c,t; p(−λ/2) t; cx c,t; p(λ/2) t
//
// and, with control false, leaves out the p(λ/2) on the control. Both networks apply e^{iλ(2t−1)/2}
// on the target when the control is 1; only the p on the control turns that into cp's
// diag(1, 1, 1, e^{iλ}) (N&C §4.3, exercise 4.20's phase kickback; checked by the tests).
func cpNetwork(control bool) lowering {
	return func(op circuit.Op) ([]circuit.Op, bool) {
		if op.Gate.Name != "cp" {
			return nil, false
		}
		l, c, t := op.Gate.Params[0], op.Qubits[0], op.Qubits[1]
		var ops []circuit.Op
		if control {
			ops = append(ops, gate("p", q(c), l/2))
		}
		return append(ops, gate("cx", q(c, t)), gate("p", q(t), -l/2), gate("cx", q(c, t)), gate("p", q(t), l/2)), true
	}
}

var (
	cpLowering           = cpNetwork(true)
	cpLoweringDropsPhase = cpNetwork(false)
)

// cxThroughCZ lowers cx(c,t) to h t; cz c,t; h t (N&C §4.3, exercise 4.17), or, with closing
// false, forgets the last h.
func cxThroughCZ(closing bool) lowering {
	return func(op circuit.Op) ([]circuit.Op, bool) {
		if op.Gate.Name != "cx" {
			return nil, false
		}
		c, t := op.Qubits[0], op.Qubits[1]
		ops := []circuit.Op{gate("h", q(t)), gate("cz", q(c, t))}
		if closing {
			ops = append(ops, gate("h", q(t)))
		}
		return ops, true
	}
}

var (
	cxToCZ         = cxThroughCZ(true)
	cxToCZMissingH = cxThroughCZ(false)
)

// eulerZYZ lowers u(θ,φ,λ) to rotations. As a matrix u(θ,φ,λ) = rz(φ)·ry(θ)·rz(λ) up to a
// global phase (the OpenQASM u gate, Cross et al. 2017, eq. 2; N&C Theorem 4.1's Z-Y
// decomposition), so in time order rz(λ) comes first. With reversed true the angles are written
// in the order the matrix product reads, which is the mistake.
func eulerZYZ(reversed bool) lowering {
	return func(op circuit.Op) ([]circuit.Op, bool) {
		if op.Gate.Name != "u" {
			return nil, false
		}
		theta, phi, lambda := op.Gate.Params[0], op.Gate.Params[1], op.Gate.Params[2]
		first, last := lambda, phi
		if reversed {
			first, last = phi, lambda
		}
		w := op.Qubits[0]
		return []circuit.Op{gate("rz", q(w), first), gate("ry", q(w), theta), gate("rz", q(w), last)}, true
	}
}

var (
	euler         = eulerZYZ(false)
	eulerReversed = eulerZYZ(true)
)

// rzzNetwork lowers rzz(θ) a,b to cx a,b; rz(θ) b; cx a,b: conjugation by cx maps Z on the
// target to Z⊗Z (N&C §10.5.2). With onControl the rz is written on a, which cx leaves alone.
func rzzNetwork(onControl bool) lowering {
	return func(op circuit.Op) ([]circuit.Op, bool) {
		if op.Gate.Name != "rzz" {
			return nil, false
		}
		a, b := op.Qubits[0], op.Qubits[1]
		w := b
		if onControl {
			w = a
		}
		return []circuit.Op{gate("cx", q(a, b)), gate("rz", q(w), op.Gate.Params[0]), gate("cx", q(a, b))}, true
	}
}

var (
	rzzLowering  = rzzNetwork(false)
	rzzOnControl = rzzNetwork(true)
)

// Mistakes a ccx network can carry.
const (
	ccxRight     = iota
	ccxNoLastTdg // the last tdg (on operand 1) is left out
	ccxTOnOne    // the t on operand 0 is written on operand 1
)

// toffoli lowers ccx(a,b,c) to the network of N&C Fig. 4.9: six cx, seven t or tdg and two h.
func toffoli(mistake int) lowering {
	return func(op circuit.Op) ([]circuit.Op, bool) {
		if op.Gate.Name != "ccx" {
			return nil, false
		}
		a, b, c := op.Qubits[0], op.Qubits[1], op.Qubits[2]
		tA := a
		if mistake == ccxTOnOne {
			tA = b
		}
		ops := []circuit.Op{
			gate("h", q(c)), gate("cx", q(b, c)), gate("tdg", q(c)), gate("cx", q(a, c)),
			gate("t", q(c)), gate("cx", q(b, c)), gate("tdg", q(c)), gate("cx", q(a, c)),
			gate("t", q(b)), gate("t", q(c)), gate("h", q(c)), gate("cx", q(a, b)),
			gate("t", q(tA)),
		}
		if mistake != ccxNoLastTdg {
			ops = append(ops, gate("tdg", q(b)))
		}
		return append(ops, gate("cx", q(a, b))), true
	}
}

var (
	ccxNetwork    = toffoli(ccxRight)
	ccxMissingTdg = toffoli(ccxNoLastTdg)
	ccxOffByOne   = toffoli(ccxTOnOne)
)

// rotations lists the rotations exp(−iθP/2) and their controlled forms.
var rotations = map[string]bool{"rx": true, "ry": true, "rz": true, "crx": true, "cry": true, "crz": true, "rxx": true, "ryy": true, "rzz": true}

// dropRotations returns the lowering that deletes each rotation whose angle is a multiple of
// period, and with controlled false leaves controlled rotations out of it. exp(−iθP/2) is −I at
// θ = 2π, a global phase for an uncontrolled rotation (N&C §4.2, eq. 4.4–4.6) but a z on the
// control of a controlled one; every rotation is I at 4π.
func dropRotations(period float64, controlled bool) lowering {
	return func(op circuit.Op) ([]circuit.Op, bool) {
		name := op.Gate.Name
		if !rotations[name] || op.Gate.IsCustom() {
			return nil, false
		}
		theta := op.Gate.Params[0]
		isControlled := name[0] == 'c'
		switch {
		case math.Abs(math.Remainder(theta, 4*math.Pi)) < 1e-12:
			return []circuit.Op{}, true
		case math.Abs(math.Remainder(theta, period)) < 1e-12 && (controlled || !isControlled):
			return []circuit.Op{}, true
		}
		return nil, false
	}
}

var (
	dropRotation2Pi = dropRotations(2*math.Pi, true)
	dropRotation4Pi = dropRotations(2*math.Pi, false)
)
