package param

import (
	"fmt"
	"slices"
	"strings"

	"qcheck.dev/qcheck/circuit"
)

// Values assigns a real value, in radians, to each named parameter.
type Values map[string]float64

// Op is one gate of a parametric circuit: a gate of package circuit, its angles as Exprs (in the
// gate's order, as circuit.Gate.Params), and the qubits it acts on. Gate.Params is ignored; Bind
// fills it from Angles. A gate without angles (cx, a custom gate) has no Angles.
type Op struct {
	Gate   circuit.Gate
	Angles []Expr
	Qubits []int
}

// Circuit is a circuit whose angles are affine expressions of named real parameters. Bind turns it
// into a *circuit.Circuit for given values; Prove compares two of them for every value.
type Circuit struct {
	qubits int
	// Ops are the circuit's gates in the order they are applied.
	Ops []Op
}

// New returns an empty parametric circuit on the given number of qubits. A negative width is
// reported by Validate.
func New(qubits int) *Circuit { return &Circuit{qubits: qubits} }

// FromCircuit returns c as a parametric circuit with constant angles. It fails for an op that is
// not a unitary gate or carries a classical condition.
func FromCircuit(c *circuit.Circuit) (*Circuit, error) {
	p := New(c.Qubits())
	for i, op := range c.Ops {
		if !op.Unitary() {
			return nil, fmt.Errorf("param: op %d (%s) is not a unitary gate", i, op.Gate.Name)
		}
		p.Append(op.Gate, op.Qubits...)
	}
	return p, nil
}

// Qubits returns the width of the circuit's register.
func (c *Circuit) Qubits() int { return c.qubits }

// Len returns the number of ops.
func (c *Circuit) Len() int { return len(c.Ops) }

// Params returns the names of the parameters the circuit's angles depend on, sorted.
func (c *Circuit) Params() []string {
	var names []string
	for _, op := range c.Ops {
		for _, a := range op.Angles {
			names = append(names, a.Params()...)
		}
	}
	slices.Sort(names)
	return slices.Compact(names)
}

// Append adds a gate with constant angles (its own Params), such as a custom gate or one taken
// from a circuit.Circuit, on the given qubits.
func (c *Circuit) Append(g circuit.Gate, qubits ...int) *Circuit { return c.Gate(g, nil, qubits...) }

// Gate adds the gate with the given angles on the given qubits; the builder methods call it. With
// no angles the gate keeps its own Params, as constant angles.
func (c *Circuit) Gate(g circuit.Gate, angles []Expr, qubits ...int) *Circuit {
	g = g.Clone()
	if len(angles) == 0 {
		angles = nil
		for _, x := range g.Params {
			angles = append(angles, Const(x))
		}
	}
	g.Params = nil
	c.Ops = append(c.Ops, Op{Gate: g, Angles: slices.Clone(angles), Qubits: slices.Clone(qubits)})
	return c
}

// Substitute returns a copy of c with the named parameter replaced by the constant x.
func (c *Circuit) Substitute(name string, x float64) *Circuit {
	d := &Circuit{qubits: c.qubits, Ops: make([]Op, len(c.Ops))}
	for i, op := range c.Ops {
		angles := make([]Expr, len(op.Angles))
		for k, a := range op.Angles {
			angles[k] = a.Substitute(name, x)
		}
		if len(angles) == 0 {
			angles = nil
		}
		d.Ops[i] = Op{Gate: op.Gate.Clone(), Angles: angles, Qubits: slices.Clone(op.Qubits)}
	}
	return d
}

// Bind returns the circuit with every parameter set to its value. Values of parameters the
// circuit does not use are ignored. It fails when a parameter has no value or a non-finite one,
// or an expression is ill formed; the bound circuit is not validated (Validate does that).
func (c *Circuit) Bind(values Values) (*circuit.Circuit, error) {
	out := circuit.New(c.qubits)
	out.Ops = make([]circuit.Op, len(c.Ops))
	for i, op := range c.Ops {
		g := op.Gate.Clone()
		if len(op.Angles) > 0 {
			g.Params = make([]float64, len(op.Angles))
		}
		for k, a := range op.Angles {
			v, err := a.Value(values)
			if err != nil {
				return nil, fmt.Errorf("%w (op %d, %s angle %d)", err, i, g.Name, k+1)
			}
			g.Params[k] = v
		}
		out.Ops[i] = circuit.Op{Gate: g, Qubits: slices.Clone(op.Qubits)}
	}
	return out, nil
}

// Validate reports the first problem that makes the circuit ill formed: a bad expression or
// parameter name, or any problem circuit.Circuit.Validate reports once every parameter is bound
// (an unknown gate, the wrong number of angles or operands, a qubit out of range or repeated).
// It returns nil for a well-formed circuit.
func (c *Circuit) Validate() error {
	if c == nil {
		return fmt.Errorf("param: nil circuit")
	}
	zero := Values{}
	for i, op := range c.Ops {
		for k, a := range op.Angles {
			if a.bad != "" {
				return fmt.Errorf("param: op %d (%s): angle %d: %s", i, op.Gate.Name, k+1, a.bad)
			}
			for _, name := range a.Params() {
				zero[name] = 0
			}
		}
		if op.Gate.IsCustom() && len(op.Angles) > 0 {
			return fmt.Errorf("param: op %d (%s): a custom gate takes no angles", i, op.Gate.Name)
		}
	}
	b, err := c.Bind(zero)
	if err != nil {
		return err
	}
	if err := b.Validate(); err != nil {
		return fmt.Errorf("param: %w", err)
	}
	for i, op := range b.Ops {
		if !op.Unitary() && op.Gate.Name != "barrier" {
			return fmt.Errorf("param: op %d (%s) is not a unitary gate", i, op.Gate.Name)
		}
	}
	return nil
}

// String writes the circuit as a gate list, one op per line: "rz(a + b) q0".
func (c *Circuit) String() string {
	var b strings.Builder
	fmt.Fprintf(&b, "%d qubit(s)\n", c.qubits)
	for _, op := range c.Ops {
		b.WriteString(op.String())
		b.WriteString("\n")
	}
	return b.String()
}

// String writes the op as in a gate list: "cx q0,q1", "rz(2a - π/2) q2".
func (o Op) String() string {
	var b strings.Builder
	b.WriteString(o.Gate.Name)
	if len(o.Angles) > 0 {
		parts := make([]string, len(o.Angles))
		for i, a := range o.Angles {
			parts[i] = a.String()
		}
		b.WriteString("(" + strings.Join(parts, ", ") + ")")
	}
	for i, q := range o.Qubits {
		if i == 0 {
			b.WriteString(" ")
		} else {
			b.WriteString(",")
		}
		fmt.Fprintf(&b, "q%d", q)
	}
	return b.String()
}
