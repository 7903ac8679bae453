package catalogue

import (
	"qcheck.dev/qcheck/circuit"
)

// The mistakes in this file are made in pattern rewrites that look at consecutive ops.

// hxh rewrites h; x; h on one qubit, three consecutive ops, into z (h·x·h = z, N&C §4.2,
// exercise 4.14). With checkX false it does not check that the x is on the h's qubit, and an x
// elsewhere disappears.
func hxh(checkX bool) func(*circuit.Circuit) (*circuit.Circuit, error) {
	return func(c *circuit.Circuit) (*circuit.Circuit, error) {
		out := c.Clone()
		out.Ops = out.Ops[:0:0]
		ops := c.Ops
		for i := 0; i < len(ops); i++ {
			if i+2 < len(ops) && isOn(ops[i], "h") && isOn(ops[i+1], "x") && isOn(ops[i+2], "h") &&
				ops[i].Qubits[0] == ops[i+2].Qubits[0] && (!checkX || ops[i+1].Qubits[0] == ops[i].Qubits[0]) {
				out.Ops = append(out.Ops, gate("z", q(ops[i].Qubits[0])))
				i += 2
				continue
			}
			out.Ops = append(out.Ops, ops[i].Clone())
		}
		return out, nil
	}
}

var (
	hxhSameQubit = hxh(true)
	hxhAnyX      = hxh(false)
)

// isOn reports whether op applies the standard gate name.
func isOn(op circuit.Op, name string) bool {
	return op.Gate.Name == name && !op.Gate.IsCustom() && op.If == nil
}

// swapFirst moves a cx that directly follows a swap in front of it, to gather swaps at the end of
// the circuit for the router: swap(a,b)·cx(c,t) = cx(σc,σt)·swap(a,b) in time order, where σ
// exchanges a and b (a swap relabels the wires it crosses, N&C §1.3.4). With relabel false the cx
// keeps its operands.
func swapFirst(relabel bool) func(*circuit.Circuit) (*circuit.Circuit, error) {
	return func(c *circuit.Circuit) (*circuit.Circuit, error) {
		out := c.Clone()
		for i := 0; i+1 < len(out.Ops); i++ {
			s, x := out.Ops[i], out.Ops[i+1]
			if !isOn(s, "swap") || !isOn(x, "cx") {
				continue
			}
			a, b := s.Qubits[0], s.Qubits[1]
			if relabel {
				for k, w := range x.Qubits {
					switch w {
					case a:
						x.Qubits[k] = b
					case b:
						x.Qubits[k] = a
					}
				}
			}
			out.Ops[i], out.Ops[i+1] = x, s
			i++
		}
		return out, nil
	}
}

var (
	swapSlide      = swapFirst(true)
	swapSlideKeeps = swapFirst(false)
)
