// Package careless holds two wrong versions of the readout passes (package readout), written the
// way a hurried reading of "only measurements follow" gets them wrong; the tests of package
// readout must catch both. Do not use them to compile anything.
//
// DropDiagonals drops a diagonal gate as soon as the next op on its first qubit is a
// measurement, forgetting its other qubits: cz(0,1) then h(1) then measurements loses a cz the
// h turns into a visible cx. RelabelSwaps drops a SWAP when the next op on its first qubit is a
// measurement, relabelling only that measurement: the other qubit's value is lost.
package careless

import (
	"qcheck.dev/examples/readout"
	"qcheck.dev/qcheck/circuit"
)

// nextOn returns the index of the first op after i that acts on qubit q, or −1.
func nextOn(c *circuit.Circuit, i, q int) int {
	for j := i + 1; j < len(c.Ops); j++ {
		for _, r := range c.Ops[j].Qubits {
			if r == q && c.Ops[j].Gate.Name != "barrier" {
				return j
			}
		}
	}
	return -1
}

func measures(c *circuit.Circuit, j int) bool {
	return j >= 0 && c.Ops[j].Gate.Name == "measure" && c.Ops[j].If == nil
}

// DropDiagonals is readout.DropDiagonals with the bug described above.
func DropDiagonals(c *circuit.Circuit) *circuit.Circuit {
	out := circuit.New(c.Qubits()).SetBits(c.Bits())
	for i, op := range c.Ops {
		if readout.IsDiagonal(op) && measures(c, nextOn(c, i, op.Qubits[0])) {
			continue
		}
		out.AppendOp(op)
	}
	return out
}

// RelabelSwaps is readout.RelabelSwaps with the bug described above.
func RelabelSwaps(c *circuit.Circuit) *circuit.Circuit {
	out := c.Clone()
	drop := map[int]bool{}
	for i, op := range out.Ops {
		if op.Gate.Name != "swap" || op.If != nil {
			continue
		}
		if j := nextOn(out, i, op.Qubits[0]); measures(out, j) {
			out.Ops[j].Qubits[0] = op.Qubits[1]
			drop[i] = true
		}
	}
	kept := out.Ops[:0]
	for i, op := range out.Ops {
		if !drop[i] {
			kept = append(kept, op)
		}
	}
	out.Ops = kept
	return out
}
