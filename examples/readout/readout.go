package readout

import "qcheck.dev/qcheck/circuit"

// diagonal names the standard gates whose matrices are diagonal in the computational basis.
var diagonal = map[string]bool{
	"id": true, "z": true, "s": true, "sdg": true, "t": true, "tdg": true, "rz": true, "p": true,
	"cz": true, "cp": true, "crz": true, "rzz": true, "ccz": true,
}

// IsDiagonal reports whether the op is a standard gate with a diagonal matrix and no condition.
func IsDiagonal(op circuit.Op) bool {
	return op.If == nil && !op.Gate.IsCustom() && diagonal[op.Gate.Name]
}

// droppable marks the diagonal gates that, on every one of their qubits, only unconditioned
// measurements and other droppable gates follow.
func droppable(c *circuit.Circuit) []bool {
	tail := make([]bool, c.Qubits()) // qubit q: every later op on q is a measure or a dropped gate
	for q := range tail {
		tail[q] = true
	}
	drop := make([]bool, len(c.Ops))
	for i := len(c.Ops) - 1; i >= 0; i-- {
		op := c.Ops[i]
		switch {
		case op.Gate.Name == "barrier":
		case op.Gate.Name == "measure" && op.If == nil:
			// a measurement keeps its qubit in the tail
		case IsDiagonal(op) && all(tail, op.Qubits):
			drop[i] = true
		default:
			for _, q := range op.Qubits {
				tail[q] = false
			}
		}
	}
	return drop
}

func all(set []bool, qubits []int) bool {
	for _, q := range qubits {
		if !set[q] {
			return false
		}
	}
	return true
}

// DropDiagonals returns the program without the diagonal gates that are followed, on every one
// of their qubits, only by measurements and other such gates. A diagonal D leaves the diagonal
// of the density matrix, ⟨x|DρD†|x⟩ = ⟨x|ρ|x⟩, so no later measurement in the computational
// basis can tell it was there. The input is not modified.
func DropDiagonals(c *circuit.Circuit) *circuit.Circuit {
	drop := droppable(c)
	out := circuit.New(c.Qubits()).SetBits(c.Bits())
	for i, op := range c.Ops {
		if !drop[i] {
			out.AppendOp(op)
		}
	}
	return out
}

// RelabelSwaps returns the program without the SWAPs that are followed, on both their qubits,
// only by measurements: every later measurement of one of the two qubits reads the other
// instead, into the same bit. Measuring SWAP|ψ⟩ on qubit a is measuring |ψ⟩ on qubit b, so the
// classical bits receive the same values with the same probabilities. The input is not modified.
func RelabelSwaps(c *circuit.Circuit) *circuit.Circuit {
	out := c.Clone()
	measuredOnly := make([]bool, c.Qubits())
	for q := range measuredOnly {
		measuredOnly[q] = true
	}
	var keep []circuit.Op
	for i := len(out.Ops) - 1; i >= 0; i-- {
		op := out.Ops[i]
		switch {
		case op.Gate.Name == "barrier":
		case op.Gate.Name == "measure" && op.If == nil:
		case op.Gate.Name == "swap" && op.If == nil && all(measuredOnly, op.Qubits):
			a, b := op.Qubits[0], op.Qubits[1]
			for k := range keep {
				if m := &keep[k]; m.Gate.Name == "measure" || m.Gate.Name == "barrier" {
					for j, q := range m.Qubits {
						switch q {
						case a:
							m.Qubits[j] = b
						case b:
							m.Qubits[j] = a
						}
					}
				}
			}
			continue
		default:
			for _, q := range op.Qubits {
				measuredOnly[q] = false
			}
		}
		keep = append(keep, op)
	}
	out.Ops = out.Ops[:0]
	for k := len(keep) - 1; k >= 0; k-- {
		out.Ops = append(out.Ops, keep[k])
	}
	return out
}
