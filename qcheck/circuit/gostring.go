package circuit

import (
	"fmt"
	"strconv"
	"strings"
)

// GoString writes Go code that rebuilds the circuit with the builder, such as
// "circuit.New(2).H(0).CX(0, 1)", with every angle written exactly. It implements fmt.GoStringer,
// so %#v, and rapid's log of a drawn circuit, show a circuit that can be pasted into a regression
// test. Custom gates have no builder method and are written as a comment naming the gate.
func (c *Circuit) GoString() string {
	if c == nil {
		return "(*circuit.Circuit)(nil)"
	}
	var b strings.Builder
	fmt.Fprintf(&b, "circuit.New(%d)", c.qubits)
	for _, op := range c.Ops {
		g := op.Gate
		if op.If != nil {
			fmt.Fprintf(&b, ".AppendOp(%#v)", op)
			continue
		}
		if g.IsCustom() {
			fmt.Fprintf(&b, ".Append(/* custom gate %q */, %s)", g.Name, joinInts(op.Qubits))
			continue
		}
		args := make([]string, 0, len(g.Params)+len(op.Qubits)+1)
		for _, p := range g.Params {
			args = append(args, strconv.FormatFloat(p, 'g', -1, 64))
		}
		for _, q := range op.Qubits {
			args = append(args, strconv.Itoa(q))
		}
		for _, cb := range op.Bits {
			args = append(args, strconv.Itoa(cb))
		}
		fmt.Fprintf(&b, ".%s(%s)", builderName(g.Name), strings.Join(args, ", "))
	}
	return b.String()
}

// builderName is the name of the builder method for a standard gate: the upper-case form of the
// OpenQASM name, with a trailing "dg" kept lower-case, as in Sdg and ISWAPdg.
func builderName(name string) string {
	if stem, ok := strings.CutSuffix(name, "dg"); ok && stem != "" {
		return strings.ToUpper(stem) + "dg"
	}
	switch name {
	case "id":
		return "I"
	case "measure":
		return "Measure"
	case "reset":
		return "Reset"
	case "barrier":
		return "Barrier"
	}
	return strings.ToUpper(name)
}

func joinInts(xs []int) string {
	s := make([]string, len(xs))
	for i, x := range xs {
		s[i] = strconv.Itoa(x)
	}
	return strings.Join(s, ", ")
}
