package circuit

import (
	"fmt"
	"math"
	"slices"
	"strconv"
	"strings"
)

// Op is one operation of a circuit: a gate and the qubits it acts on, in the gate's operand order.
// Bits is used only by measure, which records the classical bit it writes. If, when not nil, makes
// the op classically controlled: it takes effect only when its Condition holds at that point of
// the program.
type Op struct {
	Gate   Gate
	Qubits []int
	Bits   []int
	If     *Condition
}

// Condition is a test on classical bits, as OpenQASM's if statement makes: the bits, read as an
// unsigned integer with Bits[0] least significant, equal Value (or, with Not, differ from it).
// Not expresses an else branch.
type Condition struct {
	Bits  []int
	Value uint64
	Not   bool
}

// Holds reports whether the condition is true of the classical bits, given as a function from a
// bit's index to its value.
func (c *Condition) Holds(bit func(int) bool) bool {
	var v uint64
	for i, b := range c.Bits {
		if bit(b) {
			v |= 1 << i
		}
	}
	return (v == c.Value) != c.Not
}

// Unitary reports whether the op acts by a unitary matrix on its qubits: a unitary gate that no
// classical condition controls.
func (o Op) Unitary() bool { return o.If == nil && o.Gate.Unitary() }

// Clone returns a deep copy of the op.
func (o Op) Clone() Op {
	o.Gate = o.Gate.Clone()
	o.Qubits = append([]int(nil), o.Qubits...)
	if o.Bits != nil {
		o.Bits = append([]int(nil), o.Bits...)
	}
	if o.If != nil {
		c := *o.If
		c.Bits = append([]int(nil), c.Bits...)
		o.If = &c
	}
	return o
}

// Equal reports whether two ops are the same gate on the same qubits and bits.
func (o Op) Equal(p Op) bool {
	if (o.If == nil) != (p.If == nil) {
		return false
	}
	if o.If != nil && (o.If.Value != p.If.Value || o.If.Not != p.If.Not || !slices.Equal(o.If.Bits, p.If.Bits)) {
		return false
	}
	return o.Gate.Equal(p.Gate) && slices.Equal(o.Qubits, p.Qubits) && slices.Equal(o.Bits, p.Bits)
}

// String writes the op as in a gate list: "cx q0,q1", "rz(π/4) q2", "measure q0 -> c0",
// "if c0,c1==2: x q0".
func (o Op) String() string {
	s := o.Gate.String()
	if o.If != nil {
		s = o.If.text() + ": " + s
	}
	if len(o.Qubits) > 0 {
		s += bitList(" ", "q", o.Qubits)
	}
	if len(o.Bits) > 0 {
		s += bitList(" -> ", "c", o.Bits)
	}
	return s
}

// text writes the condition as "if c0,c1==2" (or "!=" with Not), the bits in their order.
func (c *Condition) text() string {
	cmp := "=="
	if c.Not {
		cmp = "!="
	}
	return "if" + bitList(" ", "c", c.Bits) + cmp + strconv.FormatUint(c.Value, 10)
}

// bitList writes bits as prefix followed by "q0,q2" (with the given letter).
func bitList(prefix, letter string, bits []int) string {
	parts := make([]string, len(bits))
	for i, b := range bits {
		parts[i] = letter + strconv.Itoa(b)
	}
	return prefix + strings.Join(parts, ",")
}

// Circuit is a register of qubits and the ops that act on it, first op first. Passes may read and
// rewrite Ops directly; Validate tells whether the result is well formed.
type Circuit struct {
	qubits int
	bits   int
	// Ops are the circuit's operations in the order they are applied.
	Ops []Op
}

// New returns an empty circuit on the given number of qubits. A negative width is reported by
// Validate.
func New(qubits int) *Circuit { return &Circuit{qubits: qubits} }

// Qubits returns the width of the circuit's register (0 for a nil circuit).
func (c *Circuit) Qubits() int {
	if c == nil {
		return 0
	}
	return c.qubits
}

// Bits returns the number of classical bits: one more than the highest bit a measure writes or a
// condition reads, or the number set by SetBits, whichever is larger (0 for a nil circuit). It
// reads the ops each time, so ops set directly into Ops count too.
func (c *Circuit) Bits() int {
	if c == nil {
		return 0
	}
	n := c.bits
	for _, op := range c.Ops {
		for _, b := range op.Bits {
			n = max(n, b+1)
		}
		if op.If != nil {
			for _, b := range op.If.Bits {
				n = max(n, b+1)
			}
		}
	}
	return n
}

// SetBits declares the size of the classical register.
func (c *Circuit) SetBits(n int) *Circuit {
	mustExist(c, "SetBits")
	if n > c.bits {
		c.bits = n
	}
	return c
}

// Len returns the number of ops (0 for a nil circuit).
func (c *Circuit) Len() int {
	if c == nil {
		return 0
	}
	return len(c.Ops)
}

// Append adds the gate on the given qubits and returns the circuit for chaining. Bad operands are
// recorded as given and reported by Validate.
func (c *Circuit) Append(g Gate, qubits ...int) *Circuit {
	mustExist(c, "Append")
	c.Ops = append(c.Ops, Op{Gate: g.Clone(), Qubits: append([]int(nil), qubits...)})
	return c
}

// AppendOp adds a copy of op.
func (c *Circuit) AppendOp(op Op) *Circuit {
	mustExist(c, "AppendOp")
	op = op.Clone()
	for _, b := range op.Bits {
		if b >= c.bits {
			c.bits = b + 1
		}
	}
	if op.If != nil {
		for _, b := range op.If.Bits {
			if b >= c.bits {
				c.bits = b + 1
			}
		}
	}
	c.Ops = append(c.Ops, op)
	return c
}

// Compose appends every op of d, whose width must not exceed c's (Validate reports out-of-range
// qubits otherwise). A nil d is the empty circuit and adds nothing.
func (c *Circuit) Compose(d *Circuit) *Circuit {
	mustExist(c, "Compose")
	if d == nil {
		return c
	}
	for _, op := range d.Ops {
		c.AppendOp(op)
	}
	c.SetBits(d.bits)
	return c
}

// Clone returns a deep copy of the circuit (nil for a nil circuit).
func (c *Circuit) Clone() *Circuit {
	if c == nil {
		return nil
	}
	d := &Circuit{qubits: c.qubits, bits: c.bits, Ops: make([]Op, len(c.Ops))}
	for i, op := range c.Ops {
		d.Ops[i] = op.Clone()
	}
	return d
}

// Equal reports whether two circuits have the same width and the same ops in the same order. A
// nil circuit equals only a nil circuit.
func (c *Circuit) Equal(d *Circuit) bool {
	if c == nil || d == nil {
		return c == d
	}
	if c.qubits != d.qubits || len(c.Ops) != len(d.Ops) {
		return false
	}
	for i := range c.Ops {
		if !c.Ops[i].Equal(d.Ops[i]) {
			return false
		}
	}
	return true
}

// Inverse returns the circuit that undoes c: the ops in reverse order, each replaced by its exact
// inverse. Barriers are kept in place; a circuit with measure, reset or classically controlled ops
// has no inverse and those ops are kept as they are, so Validate still accepts it but unitary
// engines refuse it. The inverse of a nil circuit is nil.
func (c *Circuit) Inverse() *Circuit {
	if c == nil {
		return nil
	}
	d := &Circuit{qubits: c.qubits, bits: c.bits, Ops: make([]Op, 0, len(c.Ops))}
	for i := len(c.Ops) - 1; i >= 0; i-- {
		op := c.Ops[i].Clone()
		if op.Unitary() {
			op.Gate = op.Gate.Inverse()
		}
		d.Ops = append(d.Ops, op)
	}
	return d
}

// Unitary reports whether every op is a unitary gate without a classical condition, or a barrier,
// so that the circuit has a unitary matrix. A nil circuit has no ops and is unitary.
func (c *Circuit) Unitary() bool {
	if c == nil {
		return true
	}
	for _, op := range c.Ops {
		if !op.Unitary() && op.Gate.Name != "barrier" {
			return false
		}
	}
	return true
}

// OpError is the error Validate returns for a bad op: which op, which gate, and what is wrong.
type OpError struct {
	Circuit string // which circuit, where a caller works on several ("want", "got"); empty otherwise
	Index   int    // the op's position in Ops
	Gate    string // the gate's name
	Err     string // what is wrong
}

func (e *OpError) Error() string {
	if e.Circuit != "" {
		return fmt.Sprintf("%s's op %d (%s): %s", e.Circuit, e.Index, e.Gate, e.Err)
	}
	return fmt.Sprintf("circuit: op %d (%s): %s", e.Index, e.Gate, e.Err)
}

// Validate reports the first problem that makes the circuit ill formed: a negative width, an
// unknown gate, the wrong number of angles or operands, a qubit out of range or repeated, a NaN or
// infinite angle, or a bad classical bit. It returns nil for a well-formed circuit.
func (c *Circuit) Validate() error {
	if c == nil {
		return fmt.Errorf("circuit: nil circuit")
	}
	if c.qubits < 0 {
		return fmt.Errorf("circuit: negative width %d", c.qubits)
	}
	for i, op := range c.Ops {
		if err := c.validateOp(op); err != "" {
			return &OpError{Index: i, Gate: op.Gate.Name, Err: err}
		}
	}
	return nil
}

func (c *Circuit) validateOp(op Op) string {
	g := op.Gate
	if g.custom == nil {
		d, ok := library[g.Name]
		if !ok {
			if g.Name == "" {
				return "gate has no name"
			}
			return "unknown gate"
		}
		if len(g.Params) != d.spec.Params {
			return fmt.Sprintf("takes %d angle(s), got %d", d.spec.Params, len(g.Params))
		}
	}
	for k, p := range g.Params {
		if math.IsNaN(p) || math.IsInf(p, 0) {
			// Angles are counted from 1 in messages, as package qasm counts them.
			if name := (Spec{Name: g.Name}).AngleName(k); name != "" && g.custom == nil {
				return fmt.Sprintf("angle %d (%s) is %v; angles must be finite", k+1, name, p)
			}
			return fmt.Sprintf("angle %d is %v; angles must be finite", k+1, p)
		}
	}
	if want := g.Qubits(); g.Name != "barrier" && len(op.Qubits) != want {
		return fmt.Sprintf("acts on %d qubit(s), got %d operand(s) %v", want, len(op.Qubits), op.Qubits)
	}
	if g.Name == "barrier" && len(op.Qubits) == 0 {
		return "barrier on no qubits"
	}
	// Wide ops (a barrier over a large register) use a set: comparing every pair is quadratic.
	var seen map[int]bool
	if len(op.Qubits) > 16 {
		seen = make(map[int]bool, len(op.Qubits))
	}
	for k, q := range op.Qubits {
		if q < 0 || q >= c.qubits {
			return fmt.Sprintf("qubit %d out of range [0, %d)", q, c.qubits)
		}
		if seen != nil {
			if seen[q] {
				return fmt.Sprintf("qubit %d repeated in operands %v", q, op.Qubits)
			}
			seen[q] = true
			continue
		}
		for _, r := range op.Qubits[:k] {
			if r == q {
				return fmt.Sprintf("qubit %d repeated in operands %v", q, op.Qubits)
			}
		}
	}
	switch {
	case g.Name == "measure" && len(op.Bits) != 1:
		return fmt.Sprintf("measure writes one classical bit, got %d", len(op.Bits))
	case g.Name != "measure" && len(op.Bits) != 0:
		return "only measure writes classical bits"
	}
	for _, b := range op.Bits {
		if b < 0 {
			return fmt.Sprintf("classical bit %d out of range", b)
		}
	}
	if cond := op.If; cond != nil {
		switch {
		case g.Name == "barrier":
			return "a barrier cannot be classically controlled"
		case len(cond.Bits) == 0:
			return "condition reads no classical bits"
		case len(cond.Bits) > 64:
			return fmt.Sprintf("condition reads %d classical bits, more than 64", len(cond.Bits))
		case len(cond.Bits) < 64 && cond.Value>>len(cond.Bits) != 0:
			return fmt.Sprintf("condition compares %d bit(s) with %d, which they cannot hold", len(cond.Bits), cond.Value)
		}
		for k, b := range cond.Bits {
			if b < 0 {
				return fmt.Sprintf("condition reads classical bit %d, out of range", b)
			}
			if slices.Contains(cond.Bits[:k], b) {
				return fmt.Sprintf("condition reads classical bit %d twice", b)
			}
		}
	}
	return ""
}

// mustExist panics on a nil circuit in a method that adds to it: there is nowhere to record the
// op for Validate, so this is a programmer error, reported as gonum reports bad dimensions.
func mustExist(c *Circuit, method string) {
	if c == nil {
		panic("circuit: " + method + " on a nil *Circuit; make circuits with New")
	}
}
