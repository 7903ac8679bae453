package qcheck

import (
	"fmt"
	"strconv"
	"strings"

	"qcheck.dev/qcheck/circuit"
)

// GoCode writes Go code that rebuilds the circuit with package circuit's builder, such as
// "circuit.New(2).H(0).CX(0, 1)", with every angle written exactly, so that a counterexample found
// by a property test can be pasted into a regression test. Custom gates have no builder method and
// are written as a comment naming the gate.
func GoCode(c *circuit.Circuit) string {
	if c == nil {
		return "(*circuit.Circuit)(nil)"
	}
	var b strings.Builder
	fmt.Fprintf(&b, "circuit.New(%d)", c.Qubits())
	for _, op := range c.Ops {
		g := op.Gate
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
		for _, cb := range op.Clbits {
			args = append(args, strconv.Itoa(cb))
		}
		fmt.Fprintf(&b, ".%s(%s)", builderName(g.Name), strings.Join(args, ", "))
	}
	return b.String()
}

// builderName is the name of the builder method for a standard gate (DESIGN.md: the upper-case
// form of the OpenQASM name, with a trailing "dg" kept lower-case, as in Sdg and ISWAPdg).
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

// drawn wraps a drawn circuit so that rapid's log of the draw shows Go code that rebuilds it
// instead of the IR's fields.
type drawn struct{ c *circuit.Circuit }

// GoString implements fmt.GoStringer, which rapid uses to log what it drew.
func (d drawn) GoString() string { return GoCode(d.c) }
