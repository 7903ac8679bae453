package gen

import (
	"fmt"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// ProgramOptions configure Program: the gates as Options configure Circuit, and how often the
// steps that make a circuit a program appear. The zero value is useful: programs on 3 qubits and
// 3 classical bits of up to 20 steps, about one in eight of them a mid-circuit measurement, a
// reset or a classically controlled gate, with every qubit measured at the end.
type ProgramOptions struct {
	// Options configure the gates, as for Circuit, except that MinOps and MaxOps count every
	// step (gates, measurements and resets) and that no motifs are drawn.
	Options

	// Bits is the number of classical bits; 0 means as many as qubits.
	Bits int

	// Measure, Reset and If weigh a mid-circuit measurement (of a random qubit into a random
	// bit), a reset (of a random qubit) and a classical condition on a gate (the bits read as
	// an integer equal or differ from a value, over one or two random bits) against a plain
	// gate, which weighs 10. 0 means 1 for each; a negative weight means never.
	Measure, Reset, If int

	// Unmeasured leaves out the final measurement of qubit q into bit q (for q below Bits)
	// that Program otherwise appends.
	Unmeasured bool
}

// Program returns a generator of programs: circuits with mid-circuit measurements, resets and
// classically controlled gates, configured by opts (see ProgramOptions). A program is a list of
// steps, each a gate drawn as Circuit draws one, a measurement or a reset; a failing program
// shrinks toward fewer steps (each can be removed on its own), gates rather than measurements
// and resets, unconditioned gates, lower qubits and bits, and conditions on fewer bits. Every
// drawn program passes Validate; impossible options fail every draw with an error naming the
// field.
func Program(opts ProgramOptions) *rapid.Generator[*circuit.Circuit] {
	p, err := opts.resolve()
	if err != nil {
		return failing[*circuit.Circuit](err)
	}
	one := opts.Options
	one.MinOps, one.MaxOps, one.Motifs = 1, 1, -1
	gates := Circuit(one)
	step := rapid.Custom(func(t *rapid.T) circuit.Op {
		switch drawWeighted(t, []int{10, p.weights[0], p.weights[1]}) {
		case 1:
			g, _ := circuit.NewGate("measure")
			return circuit.Op{Gate: g, Qubits: []int{drawBelow(t, p.qubits)}, Bits: []int{drawBelow(t, p.bits)}}
		case 2:
			g, _ := circuit.NewGate("reset")
			return circuit.Op{Gate: g, Qubits: []int{drawBelow(t, p.qubits)}}
		}
		op := gates.Draw(t, "gate").Ops[0]
		if p.weights[2] > 0 && op.Gate.Name != "barrier" && drawWeighted(t, []int{10, p.weights[2]}) == 1 {
			op.If = p.condition(t)
		}
		return op
	})
	steps := rapid.SliceOfN(step, p.minOps, p.maxOps)
	return rapid.Custom(func(t *rapid.T) *circuit.Circuit {
		c := circuit.New(p.qubits).SetBits(p.bits)
		for _, op := range steps.Draw(t, "steps") {
			c.AppendOp(op)
		}
		if !opts.Unmeasured {
			for q := 0; q < min(p.qubits, p.bits); q++ {
				c.Measure(q, q)
			}
		}
		return c
	})
}

// programPlan is ProgramOptions resolved.
type programPlan struct {
	qubits, bits   int
	minOps, maxOps int
	weights        [3]int // measure, reset, if
}

func (o ProgramOptions) resolve() (*programPlan, error) {
	gates, err := o.Options.resolve()
	if err != nil {
		return nil, err
	}
	p := &programPlan{qubits: gates.qubits, bits: o.Bits, minOps: gates.minOps, maxOps: gates.maxOps}
	if p.bits == 0 {
		p.bits = p.qubits
	}
	if p.bits < 0 {
		return nil, fmt.Errorf("gen.ProgramOptions: Bits = %d, want ≥ 0", o.Bits)
	}
	for i, w := range []int{o.Measure, o.Reset, o.If} {
		switch {
		case w == 0:
			p.weights[i] = 1
		case w > 0:
			p.weights[i] = w
		}
	}
	return p, nil
}

// condition draws a test of one or two distinct bits against a value, or its negation.
func (p *programPlan) condition(t *rapid.T) *circuit.Condition {
	cond := &circuit.Condition{Bits: []int{drawBelow(t, p.bits)}}
	if p.bits > 1 && rapid.Bool().Draw(t, "two bits") {
		other := drawBelow(t, p.bits-1)
		if other >= cond.Bits[0] {
			other++
		}
		cond.Bits = append(cond.Bits, other)
	}
	cond.Value = uint64(drawBelow(t, 1<<len(cond.Bits)))
	cond.Not = rapid.Bool().Draw(t, "else")
	return cond
}
