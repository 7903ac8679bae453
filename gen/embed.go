package gen

import (
	"fmt"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Embedding is a circuit placed on some of the qubits of a wider register.
type Embedding struct {
	// Circuit is the wide circuit: the small circuit's ops on their new
	// qubits, in the same order.
	Circuit *circuit.Circuit
	// Qubits[i] is the qubit of the wide register that carries qubit i of the
	// small circuit; the wide qubits not listed are idle.
	Qubits []int
}

// Embed returns a generator that places the circuit c on width qubits,
// choosing which wide qubit carries each of c's qubits uniformly among all
// one-to-one placements. A pass that must leave idle qubits alone, or must
// not care where a circuit sits, is tested on the embedding; a failure
// shrinks toward the placement of qubit i on qubit i. c is not modified. If
// c is nil or ill formed, or wider than width, every draw fails the test
// with an error saying so.
func Embed(c *circuit.Circuit, width int) *rapid.Generator[Embedding] {
	switch {
	case c == nil:
		return failing[Embedding](fmt.Errorf("gen.Embed: the circuit is nil"))
	case c.Qubits() > width:
		return failing[Embedding](fmt.Errorf("gen.Embed: a %d-qubit circuit does not fit in width %d", c.Qubits(), width))
	}
	if err := c.Validate(); err != nil {
		return failing[Embedding](fmt.Errorf("gen.Embed: %w", err))
	}
	small := c.Clone()
	return rapid.Map(Layout(width), func(layout []int) Embedding {
		e := Embedding{Circuit: circuit.New(width), Qubits: layout[:small.Qubits()]}
		e.Circuit.SetBits(small.Bits())
		for _, op := range small.Ops {
			op = op.Clone()
			for k, q := range op.Qubits {
				op.Qubits[k] = e.Qubits[q]
			}
			e.Circuit.AppendOp(op)
		}
		return e
	})
}
