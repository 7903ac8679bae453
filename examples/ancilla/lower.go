package ancilla

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// Lowering is a pass that replaces every X gate with three or more controls (made by MCX) by a
// Construction, and keeps every other op.
type Lowering struct {
	// Build is the construction used for each gate.
	Build Construction
	// Ancillas is how many qubits the pass appends after the circuit's own for Build's use: they
	// are the qubits c.Qubits(), …, c.Qubits()+Ancillas−1 of the result.
	Ancillas int
	// Clean says that Build needs the appended ancillas in |0⟩ (and returns them so). When it is
	// false, Build may also borrow the circuit's own qubits outside the gate, in any state.
	Clean bool
}

// Apply returns the lowered circuit, Ancillas qubits wider than c; c is not modified. It fails on
// an ill-formed circuit and when a gate has more controls than Build can handle with the work
// qubits it has, naming the op.
func (l Lowering) Apply(c *circuit.Circuit) (*circuit.Circuit, error) {
	if l.Build == nil || l.Ancillas < 0 {
		return nil, fmt.Errorf("ancilla: a lowering needs a construction and a non-negative ancilla count")
	}
	if err := c.Validate(); err != nil {
		return nil, fmt.Errorf("ancilla: %w", err)
	}
	n := c.Qubits()
	out := circuit.New(n + l.Ancillas).SetBits(c.Bits())
	for i, op := range c.Ops {
		k := controlsOf(op)
		if k == 0 {
			out.AppendOp(op)
			continue
		}
		work := make([]int, 0, l.Ancillas+n)
		for a := n; a < n+l.Ancillas; a++ {
			work = append(work, a)
		}
		if !l.Clean {
			for q := 0; q < n; q++ {
				if !touchesQubit(op, q) {
					work = append(work, q)
				}
			}
		}
		if err := l.Build(out, op.Qubits[:k], op.Qubits[k], work); err != nil {
			return nil, &circuit.OpError{Index: i, Gate: op.Gate.Name, Err: err.Error()}
		}
	}
	return out, nil
}

func touchesQubit(op circuit.Op, q int) bool {
	for _, r := range op.Qubits {
		if r == q {
			return true
		}
	}
	return false
}

// Lower is Fieldfare's default lowering: OneClean with one clean ancilla appended as qubit
// c.Qubits() of the result, which must start in |0⟩ and is returned to it.
func Lower(c *circuit.Circuit) (*circuit.Circuit, error) {
	return Lowering{Build: OneClean, Ancillas: 1, Clean: true}.Apply(c)
}

// LowerBorrowed lowers with dirty work qubits: one appended qubit, qubit c.Qubits() of the
// result, in any state, plus the circuit's own qubits outside each gate; all are restored.
func LowerBorrowed(c *circuit.Circuit) (*circuit.Circuit, error) {
	return Lowering{Build: Borrowed, Ancillas: 1}.Apply(c)
}
