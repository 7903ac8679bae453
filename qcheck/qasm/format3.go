package qasm

import (
	"bytes"
	"strconv"

	"qcheck.dev/qcheck/circuit"
)

// names3 are the gates of package circuit that OpenQASM 3 writes other than by their own name:
// u is the built-in U (the same matrix), and sxdg and ccz, which stdgates.inc lacks, are written
// with modifiers that the reader turns back into them.
var names3 = map[string]string{"u": "U", "sxdg": "inv @ sx", "ccz": "ctrl(2) @ z"}

// writeOp3 writes one op as an OpenQASM 3 statement; qn and cn name the flat qubits and bits.
func writeOp3(b *bytes.Buffer, op circuit.Op, qn, cn []string, cregs []Register) {
	if op.If != nil {
		b.WriteString("if (")
		writeCondition3(b, op.If, cn, cregs)
		b.WriteString(") ")
	}
	switch op.Gate.Name {
	case "measure":
		b.WriteString(cn[op.Bits[0]])
		b.WriteString(" = measure ")
		b.WriteString(qn[op.Qubits[0]])
		b.WriteString(";\n")
		return
	case "barrier", "reset":
		b.WriteString(op.Gate.Name)
	default:
		name := op.Gate.Name
		if n, ok := names3[name]; ok && !op.Gate.IsCustom() {
			name = n
		}
		b.WriteString(name)
		if len(op.Gate.Params) > 0 && !op.Gate.IsCustom() {
			b.WriteByte('(')
			for k, v := range op.Gate.Params {
				if k > 0 {
					b.WriteString(", ")
				}
				b.Write(appendAngle(nil, v))
			}
			b.WriteByte(')')
		}
	}
	for k, q := range op.Qubits {
		if k == 0 {
			b.WriteByte(' ')
		} else {
			b.WriteString(", ")
		}
		b.WriteString(qn[q])
	}
	b.WriteString(";\n")
}

// writeCondition3 writes a condition: reg == v (or !=) for a whole register, else the equality
// of each bit joined by &&, negated with !( … ) for an else branch. The reader reads each form
// back to the same condition, bits in the same order.
func writeCondition3(b *bytes.Buffer, c *circuit.Condition, cn []string, cregs []Register) {
	if r, ok := wholeRegister(&circuit.Condition{Bits: c.Bits, Value: c.Value}, cregs); ok && len(c.Bits) > 1 {
		b.WriteString(r.Name)
		if c.Not {
			b.WriteString(" != ")
		} else {
			b.WriteString(" == ")
		}
		b.WriteString(strconv.FormatUint(c.Value, 10))
		return
	}
	if c.Not {
		b.WriteString("!(")
	}
	for i, bit := range c.Bits {
		if i > 0 {
			b.WriteString(" && ")
		}
		b.WriteString(cn[bit])
		b.WriteString(" == ")
		b.WriteString(strconv.FormatUint(c.Value>>i&1, 10))
	}
	if c.Not {
		b.WriteByte(')')
	}
}

// Format3 writes the circuit as OpenQASM 3 with one qubit register q and, when the circuit has
// classical bits, one bit register c; see FormatProgram for what is written and how.
func Format3(c *circuit.Circuit) ([]byte, error) {
	if c == nil {
		return nil, errorString("qasm: Format3 of a nil circuit")
	}
	q, cr := soleRegisters(c)
	p := &Program{Circuit: c, Version: 3, Qregs: q, Cregs: cr}
	return FormatProgram(p)
}

// validIdent3 reports whether s is one OpenQASM 3 name (Unicode letters allowed) that is not a
// reserved word of 3 or of 2.0.
// With std, the name must not be a gate of stdgates.inc either.
func validIdent3(s string, std bool) bool {
	lx := lexer{src: []byte(s), v3: true}
	t, err := lx.next()
	if err != nil || t.kind != tIdent || string(t.text) != s || s[0] == '$' || reserved3[s] || reserved[s] {
		return false
	}
	_, ok := stdgates()[s]
	return !ok || !std
}

// needsStdgates reports whether writing c as OpenQASM 3 calls a gate of stdgates.inc: every op
// but U (u), measure, reset, barrier and single-qubit custom gates (written with U and gphase).
func needsStdgates(c *circuit.Circuit) bool {
	for _, op := range c.Ops {
		switch op.Gate.Name {
		case "u", "measure", "reset", "barrier":
		default:
			if !op.Gate.IsCustom() {
				return true
			}
		}
	}
	return false
}
