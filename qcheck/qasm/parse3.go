package qasm

import (
	"strconv"

	"qcheck.dev/qcheck/circuit"
)

// parser3 reads OpenQASM 3. It shares the 2.0 reader's source, tokens, gate definitions, op
// list and limits, and adds scopes of classical names, which it evaluates while reading.
type parser3 struct {
	*parser
	scopes   []map[string]*symbol
	measured []bool // per classical bit: whether a measurement may have written it
	physical bool   // the source addresses physical qubits $n
	inputs   []string
	free     []string        // the free input parameters, in the order of declaration
	angles   map[int][]Angle // the angles of the ops whose angles read free parameters
	// condScope is the depth of the scope where the current condition on measured bits began;
	// names declared outside it cannot be assigned under the condition.
	condScope int
	loopDepth int
}

// symKind says what a name stands for.
type symKind uint8

const (
	sQubits symKind = iota // a quantum register (or a single qubit)
	sBits                  // a classical register (or a single bit)
	sVar                   // a classical variable
	sConst                 // a constant, or a loop variable
	sFree                  // a free input parameter (the FreeInputs option)
)

type symbol struct {
	kind   symKind
	reg    *register
	single bool // qubit q; or bit b; rather than an array
	val    value
	typ    typ
	scope  int
}

// stepsPerStatement and stepsPerIteration weigh reading a statement and running a loop
// iteration against the work limit (an expanded call or an evaluated operator is one step), by
// their measured cost: about 4 and 16 times that of a step.
const (
	stepsPerStatement = 4
	stepsPerIteration = 12
)

// parse3 reads an OpenQASM 3 program; the lexer is at its first token.
func (p *parser3) program() error {
	p.scopes = []map[string]*symbol{{}}
	p.condScope = -1
	if p.tok.is("OPENQASM") {
		if err := p.advance(); err != nil {
			return err
		}
		if p.tok.kind != tNumber {
			return p.errorf(p.tok.off, "expected the version after OPENQASM, found %s", p.tok.describe())
		}
		if err := p.advance(); err != nil {
			return err
		}
		if err := p.expect(";", "after the version"); err != nil {
			return err
		}
	}
	for p.tok.kind != tEOF {
		if err := p.statement3(); err != nil {
			return err
		}
	}
	return nil
}

// advance3 reads the next token and counts it as a step: loops read their bodies again at every
// iteration, so reading is bounded by the work limit.
func (p *parser3) next() error {
	if err := p.step(); err != nil {
		return err
	}
	return p.advance()
}

func (p *parser3) lookup(name string) *symbol {
	for i := len(p.scopes) - 1; i >= 0; i-- {
		if s, ok := p.scopes[i][name]; ok {
			return s
		}
	}
	return nil
}

// declareName adds a name to the innermost scope, refusing one taken there, a gate's name, or a
// reserved word.
func (p *parser3) declareName(t token, s *symbol) error {
	name := string(t.text)
	if reserved3[name] {
		return p.errorf(t.off, "%s is a reserved word", name)
	}
	if _, ok := p.gates[name]; ok {
		return p.errorf(t.off, "%s is already the name of a gate", name)
	}
	top := p.scopes[len(p.scopes)-1]
	if _, ok := top[name]; ok {
		return p.errorf(t.off, "%s is already declared", name)
	}
	s.scope = len(p.scopes) - 1
	top[name] = s
	return nil
}

// reserved3 are the words of OpenQASM 3 that cannot name anything.
var reserved3 = map[string]bool{
	"OPENQASM": true, "include": true, "qubit": true, "qreg": true, "bit": true, "creg": true,
	"int": true, "uint": true, "float": true, "angle": true, "bool": true, "const": true,
	"input": true, "output": true, "gate": true, "measure": true, "reset": true, "barrier": true,
	"for": true, "in": true, "if": true, "else": true, "while": true, "ctrl": true, "negctrl": true,
	"inv": true, "pow": true, "gphase": true, "U": true, "pi": true, "π": true, "tau": true,
	"τ": true, "euler": true, "ℇ": true, "true": true, "false": true, "def": true, "return": true,
	"extern": true, "defcal": true, "cal": true, "delay": true, "box": true, "duration": true,
	"stretch": true, "array": true, "switch": true, "let": true, "complex": true, "opaque": true,
}

// refused3 are the statements of OpenQASM 3 this reader does not take, with what to say.
var refused3 = map[string]string{
	"def":           "subroutines (def) are not supported",
	"while":         "while loops are not supported (their iteration count is not known while reading)",
	"extern":        "extern functions are not supported",
	"defcal":        "calibrations (defcal) are not supported",
	"cal":           "calibration blocks (cal) are not supported",
	"defcalgrammar": "calibration grammars (defcalgrammar) are not supported",
	"delay":         "delay is not supported: timing has no place in a circuit's meaning here",
	"box":           "box is not supported: timing has no place in a circuit's meaning here",
	"duration":      "durations are not supported",
	"stretch":       "stretch is not supported",
	"array":         "arrays beyond registers are not supported",
	"switch":        "switch is not supported",
	"let":           "aliases (let) are not supported",
	"output":        "output declarations are not supported: every bit register is the program's output",
	"return":        "return is not supported",
	"break":         "break is not supported",
	"continue":      "continue is not supported",
	"end":           "end is not supported",
	"opaque":        "opaque gates are not supported: they have no body to give them a matrix",
	"complex":       "the type complex is not supported",
}

func (p *parser3) statement3() error {
	t := p.tok
	p.stmt = t.off
	if err := p.stepN(stepsPerStatement); err != nil {
		return err
	}
	if t.is("{") {
		return p.block()
	}
	if t.is("@") {
		return p.errorf(t.off, "annotations (@name) are not supported")
	}
	if t.kind != tIdent {
		return p.errorf(t.off, "expected a statement, found %s", t.describe())
	}
	word := string(t.text)
	if msg := refused3[word]; msg != "" {
		return p.errorf(t.off, "%s", msg)
	}
	switch word {
	case "OPENQASM":
		return p.errorf(t.off, "the OPENQASM header may appear only once, at the start")
	case "include":
		return p.include3()
	case "qubit", "qreg":
		return p.declareQubits()
	case "bit", "creg":
		return p.declareBits()
	case "const", "input", "int", "uint", "float", "angle", "bool":
		return p.declareClassical()
	case "gate":
		return p.gateDecl3()
	case "measure":
		return p.measureArrow()
	case "reset":
		return p.reset3()
	case "barrier":
		return p.barrier3()
	case "for":
		return p.forLoop()
	case "if":
		return p.ifElse()
	case "else":
		return p.errorf(t.off, "else without if")
	case "ctrl", "negctrl", "inv", "pow", "gphase", "U":
		return p.callStatement()
	}
	if _, ok := p.gates[word]; ok {
		return p.callStatement()
	}
	if p.lookup(word) != nil {
		return p.assignment()
	}
	return p.unknownGate3(t)
}

func (p *parser3) unknownGate3(t token) error {
	if _, ok := stdgates()[string(t.text)]; ok {
		return p.errorf(t.off, "unknown gate %s (it is in stdgates.inc: add include \"stdgates.inc\";)", t.text)
	}
	return p.errorf(t.off, "unknown gate, name or statement %s", t.text)
}

// block reads { statements } in a scope of its own.
func (p *parser3) block() error {
	if err := p.next(); err != nil {
		return err
	}
	p.scopes = append(p.scopes, map[string]*symbol{})
	defer func() { p.scopes = p.scopes[:len(p.scopes)-1] }()
	for !p.tok.is("}") {
		if p.tok.kind == tEOF {
			return p.errorf(p.tok.off, "block not closed with }")
		}
		if err := p.statement3(); err != nil {
			return err
		}
	}
	return p.next()
}

func (p *parser3) include3() error {
	if err := p.next(); err != nil {
		return err
	}
	t := p.tok
	if t.kind != tString {
		return p.errorf(t.off, "expected a file name in quotes after include, found %s", t.describe())
	}
	if string(t.text) == `"qelib1.inc"` {
		return p.errorf(t.off, "qelib1.inc is the library of OpenQASM 2.0: start the file with OPENQASM 2.0; (a source without a header is read as OpenQASM 3)")
	}
	if string(t.text) != `"stdgates.inc"` {
		return p.errorf(t.off, "cannot include %s: only \"stdgates.inc\" is known (it is built in, not read from disk)", t.text)
	}
	if len(p.scopes) > 1 {
		return p.errorf(t.off, "include must be at the top level")
	}
	for name, d := range stdgates() {
		if old, ok := p.gates[name]; ok && old.user {
			return p.errorf(t.off, "stdgates.inc defines %s, which the source has already defined", name)
		}
		p.gates[name] = d
	}
	if err := p.next(); err != nil {
		return err
	}
	return p.expect(";", "after include")
}

// global refuses a declaration that must be at the top level (quantum registers, gates).
func (p *parser3) global(t token, what string) error {
	if len(p.scopes) > 1 || p.loopDepth > 0 || p.cond != nil {
		return p.errorf(t.off, "%s must be declared at the top level, outside loops and conditions", what)
	}
	return nil
}

// width reads an optional [n] after a type word and returns n, or 0 when there is none.
func (p *parser3) width() (int, int, error) {
	if !p.tok.is("[") {
		return 0, 0, nil
	}
	if err := p.next(); err != nil {
		return 0, 0, err
	}
	off := p.tok.off
	e, err := p.parseExpr3()
	if err != nil {
		return 0, 0, err
	}
	n, err := p.evalInt(e)
	if err != nil {
		return 0, 0, err
	}
	if n < 1 || n > MaxQubits {
		return 0, 0, p.errorf(off, "size %d: want 1 to %d", n, MaxQubits)
	}
	return int(n), off, p.expect("]", "after the size")
}

// registerHead reads the head of a register declaration: word q; word[n] q; or the old form
// qreg q[n]; (creg for bits), where word is qubit or bit. It returns the name, the size, the
// offset of the size (or of the declaration), and whether the register is a single qubit or bit.
func (p *parser3) registerHead(word string) (name token, n, off int, single bool, err error) {
	t := p.tok
	if err := p.next(); err != nil {
		return token{}, 0, 0, false, err
	}
	n, off, single = 1, t.off, true
	size := func() error {
		w, o, err := p.width()
		if err == nil && w > 0 {
			n, off, single = w, o, false
		}
		return err
	}
	if t.is(word) {
		if err := size(); err != nil {
			return token{}, 0, 0, false, err
		}
	}
	if name, err = p.ident("a register name"); err != nil {
		return token{}, 0, 0, false, err
	}
	if !t.is(word) {
		if err := size(); err != nil {
			return token{}, 0, 0, false, err
		}
	}
	return name, n, off, single, nil
}

// newRegister declares a register of size n (single: a lone qubit or bit).
func (p *parser3) newRegister(name token, quantum bool, n, off int, single bool) (*symbol, error) {
	total := &p.nc
	if quantum {
		total = &p.nq
	}
	if n > MaxQubits-*total {
		return nil, p.errorf(off, "register %s makes the total size exceed %d", name.text, MaxQubits)
	}
	r := &register{name: string(name.text), quantum: quantum, start: *total, size: n}
	kind := sBits
	if quantum {
		kind = sQubits
	}
	s := &symbol{kind: kind, reg: r, single: single}
	if err := p.declareName(name, s); err != nil {
		return nil, err
	}
	*total += n
	p.regs[r.name] = r
	p.order = append(p.order, r)
	if !quantum {
		p.measured = append(p.measured, make([]bool, n)...)
	}
	return s, nil
}

// declareQubits reads qubit q; qubit[n] q; or qreg q[n];.
func (p *parser3) declareQubits() error {
	t := p.tok
	if err := p.global(t, "qubits"); err != nil {
		return err
	}
	if p.physical {
		return p.errorf(t.off, "a source that uses physical qubits ($n) cannot declare qubits")
	}
	name, n, off, single, err := p.registerHead("qubit")
	if err != nil {
		return err
	}
	if _, err := p.newRegister(name, true, n, off, single); err != nil {
		return err
	}
	return p.expect(";", "after the declaration")
}

// declareBits reads bit c; bit[n] c; creg c[n]; with an optional initializer (= measure q or a
// value known to be zero: bits start at 0 and the circuit cannot set them).
func (p *parser3) declareBits() error {
	name, n, off, single, err := p.registerHead("bit")
	if err != nil {
		return err
	}
	s, err := p.newRegister(name, false, n, off, single)
	if err != nil {
		return err
	}
	if p.tok.is("=") {
		if err := p.next(); err != nil {
			return err
		}
		if p.tok.is("measure") {
			return p.measureInto(bitTarget{bits: regBits(s.reg), off: name.off, single: single})
		}
		if err := p.assignBits(bitTarget{bits: regBits(s.reg), off: name.off, single: single}); err != nil {
			return err
		}
		return nil
	}
	return p.expect(";", "after the declaration")
}

func regBits(r *register) []int {
	out := make([]int, r.size)
	for i := range out {
		out[i] = r.start + i
	}
	return out
}

// declareClassical reads [const|input] type name [= expression];.
func (p *parser3) declareClassical() error {
	t := p.tok
	isConst, isInput := t.is("const"), t.is("input")
	if isConst || isInput {
		if err := p.next(); err != nil {
			return err
		}
	}
	if isInput && len(p.scopes) > 1 {
		return p.errorf(t.off, "input must be declared at the top level")
	}
	tt := p.tok
	ty, ok, err := p.scalarType()
	if err != nil {
		return err
	}
	if !ok {
		return p.errorf(p.tok.off, "expected a type, found %s", p.tok.describe())
	}
	if ty.kind == kBits {
		return p.errorf(tt.off, "bit declarations after const or input are not supported")
	}
	name, err := p.ident("a variable name")
	if err != nil {
		return err
	}
	s := &symbol{kind: sVar, typ: ty}
	if isConst {
		s.kind = sConst
	}
	v := value{kind: ty.kind, width: ty.width}
	switch {
	case isInput:
		x, ok := p.cfg.inputs[string(name.text)]
		if !ok && p.cfg.freeInputs {
			if ty.kind != kFloat || ty.width != 0 && ty.width != 64 {
				return p.errorf(tt.off, "input %s of type %s cannot be a free parameter (only float or float[64] can: an angle is reduced modulo 2π and a narrower float is rounded, so the gate's angle would not be affine in it); declare it float or give its value (qcheck: -input %s=VALUE)", name.text, ty, name.text)
			}
			if err := p.declareName(name, &symbol{kind: sFree, typ: ty}); err != nil {
				return err
			}
			p.free = append(p.free, string(name.text))
			return p.expect(";", "after the declaration")
		}
		if !ok {
			return p.errorf(name.off, "input %s has no value: give its value with the Inputs option (qcheck: -input %s=VALUE), or leave it free with the FreeInputs option", name.text, name.text)
		}
		if v, err = p.convert(floatValue(x), ty, name.off); err != nil {
			return err
		}
		p.inputs = append(p.inputs, string(name.text))
	case p.tok.is("="):
		if err := p.next(); err != nil {
			return err
		}
		e, x, err := p.expression()
		if err != nil {
			return err
		}
		if v, err = p.convert(x, ty, e.begin()); err != nil {
			return err
		}
		if v.measured() {
			return p.errorf(e.begin(), "%s cannot hold a value that depends on measured bits", name.text)
		}
	case isConst:
		return p.errorf(p.tok.off, "const %s needs a value", name.text)
	}
	s.val = v
	if err := p.declareName(name, s); err != nil {
		return err
	}
	return p.expect(";", "after the declaration")
}

// assignment reads name = expression; name[i] = …; name op= expression; and the measure forms
// c = measure q; c[i] = measure q[j];.
func (p *parser3) assignment() error {
	name := p.tok
	s := p.lookup(string(name.text))
	if err := p.next(); err != nil {
		return err
	}
	switch s.kind {
	case sQubits:
		return p.errorf(name.off, "%s is a qubit register; expected a gate call or statement", name.text)
	case sConst:
		return p.errorf(name.off, "%s is a constant and cannot be assigned", name.text)
	case sFree:
		return p.errorf(name.off, "%s is a free input parameter and cannot be assigned", name.text)
	case sBits:
		target := bitTarget{bits: regBits(s.reg), off: name.off, single: s.single}
		if p.tok.is("[") {
			ix, err := p.index3()
			if err != nil {
				return err
			}
			sel, scalar, err := p.selectIndex(ix, s.reg.size)
			if err != nil {
				return err
			}
			bits := make([]int, len(sel))
			for i, k := range sel {
				bits[i] = s.reg.start + k
			}
			target = bitTarget{bits: bits, off: name.off, single: scalar}
		}
		if err := p.expect("=", "in the assignment"); err != nil {
			return err
		}
		if p.tok.is("measure") {
			return p.measureInto(target)
		}
		return p.assignBits(target)
	}
	if p.condScope >= 0 && s.scope < p.condScope {
		return p.errorf(name.off, "%s cannot be assigned under a condition on measured bits (its value would depend on them)", name.text)
	}
	op := p.tok
	if p.tok.is("[") {
		return p.errorf(p.tok.off, "assigning to part of %s is not supported", name.text)
	}
	if op.kind != tPunct || len(op.text) < 1 || op.text[len(op.text)-1] != '=' || op.is("==") || op.is("!=") || op.is("<=") || op.is(">=") {
		return p.errorf(op.off, "expected = or a compound assignment after %s, found %s", name.text, op.describe())
	}
	if err := p.next(); err != nil {
		return err
	}
	e, err := p.parseExpr3()
	if err != nil {
		return err
	}
	if !op.is("=") {
		bin := string(op.text[:len(op.text)-1])
		e = &node{op: 'b', off: op.off, text: bin, kids: []*node{{op: 'l', off: name.off, val: s.val}, e}}
	}
	x, err := p.eval(e)
	if err != nil {
		return err
	}
	v, err := p.convert(x, s.typ, e.begin())
	if err != nil {
		return err
	}
	if v.measured() {
		return p.errorf(e.begin(), "%s cannot hold a value that depends on measured bits", name.text)
	}
	s.val = v
	return p.expect(";", "after the assignment")
}

// bitTarget is where a measurement or assignment writes: classical bits in order, and whether
// the target is one bit rather than a register.
type bitTarget struct {
	bits   []int
	off    int
	single bool
}

// assignBits reads the expression of c = expression; bits start at 0 and a circuit has no way
// to set them, so only a value that leaves every bit 0 where it is known to be 0 is accepted.
func (p *parser3) assignBits(t bitTarget) error {
	e, v, err := p.expression()
	if err != nil {
		return err
	}
	if v.measured() {
		return p.errorf(e.off, "copying measured bits into other bits is not supported")
	}
	w := len(t.bits)
	x, err := p.convert(v, typ{kind: kBits, width: min(w, 64)}, e.off)
	if err != nil {
		return err
	}
	for _, b := range t.bits {
		if p.measured[b] {
			return p.errorf(e.off, "bits written by a measurement cannot be set again: the circuit has no classical write")
		}
	}
	if x.i != 0 {
		return p.errorf(e.off, "setting bits to a value other than 0 is not supported: bits start at 0 and only measurements write them")
	}
	return p.expect(";", "after the assignment")
}

// physicalQubit returns the flat index of $n, widening the register of physical qubits.
func (p *parser3) physicalQubit(t token) (int, error) {
	if len(p.order) > 0 {
		for _, r := range p.order {
			if r.quantum {
				return 0, p.errorf(t.off, "a source that declares qubits cannot use physical qubits ($n)")
			}
		}
	}
	n, err := strconv.Atoi(string(t.text[1:]))
	if err != nil || n >= MaxQubits {
		return 0, p.errorf(t.off, "physical qubit %s is beyond %d", t.text, MaxQubits-1)
	}
	p.physical = true
	p.nq = max(p.nq, n+1)
	return n, nil
}

// qubitOperand is a gate or statement argument: its flat qubits, and whether it is one qubit
// (which broadcasting repeats) rather than a register or slice.
type qubitOperand struct {
	qubits []int
	scalar bool
	off    int
}

// qubitOperands reads a comma-separated list of qubit arguments: q, q[i], q[a:b], q[{i, j}],
// $n.
func (p *parser3) qubitOperands() ([]qubitOperand, error) {
	var out []qubitOperand
	for {
		t := p.tok
		if t.kind != tIdent {
			return nil, p.errorf(t.off, "expected a qubit, found %s", t.describe())
		}
		if t.text[0] == '$' {
			q, err := p.physicalQubit(t)
			if err != nil {
				return nil, err
			}
			if err := p.next(); err != nil {
				return nil, err
			}
			out = append(out, qubitOperand{qubits: []int{q}, scalar: true, off: t.off})
		} else {
			s := p.lookup(string(t.text))
			if s == nil || s.kind != sQubits {
				if s != nil {
					return nil, p.errorf(t.off, "%s is not a qubit register", t.text)
				}
				return nil, p.errorf(t.off, "unknown qubit register %s", t.text)
			}
			if err := p.next(); err != nil {
				return nil, err
			}
			op := qubitOperand{scalar: s.single, off: t.off}
			if !p.tok.is("[") {
				op.qubits = regBits(s.reg)
			} else {
				if s.single {
					return nil, p.errorf(p.tok.off, "%s is a single qubit and cannot be indexed", t.text)
				}
				ix, err := p.index3()
				if err != nil {
					return nil, err
				}
				sel, scalar, err := p.selectIndex(ix, s.reg.size)
				if err != nil {
					return nil, err
				}
				for i := range sel {
					sel[i] += s.reg.start
				}
				op.qubits, op.scalar = sel, scalar
			}
			out = append(out, op)
		}
		if !p.tok.is(",") {
			return out, nil
		}
		if err := p.next(); err != nil {
			return nil, err
		}
	}
}

// selectIndex evaluates an index into a register of the given size: the positions it selects,
// and whether it was a single index. Negative indices count from the end, as the specification
// allows.
func (p *parser3) selectIndex(ix *index, size int) ([]int, bool, error) {
	at := func(n *node) (int, error) {
		v, err := p.evalInt(n)
		if err != nil {
			return 0, err
		}
		if v < 0 {
			v += int64(size)
		}
		if v < 0 || v >= int64(size) {
			return 0, p.errorf(n.off, "index %d out of range: the register has size %d", v, size)
		}
		return int(v), nil
	}
	switch {
	case ix.one != nil:
		i, err := at(ix.one)
		return []int{i}, true, err
	case ix.set != nil:
		var out []int
		for _, n := range ix.set {
			i, err := at(n)
			if err != nil {
				return nil, false, err
			}
			out = append(out, i)
		}
		return out, false, nil
	}
	lo, hi, step := 0, size-1, 1
	var err error
	if ix.lo != nil {
		if lo, err = at(ix.lo); err != nil {
			return nil, false, err
		}
	}
	if ix.hi != nil {
		if hi, err = at(ix.hi); err != nil {
			return nil, false, err
		}
	}
	if ix.step != nil {
		s, err := p.evalInt(ix.step)
		if err != nil {
			return nil, false, err
		}
		if s == 0 || s > int64(size) || s < -int64(size) {
			return nil, false, p.errorf(ix.step.off, "step %d of a slice: want a nonzero step within the register", s)
		}
		step = int(s)
	}
	var out []int
	for i := lo; step > 0 && i <= hi || step < 0 && i >= hi; i += step {
		out = append(out, i)
	}
	if len(out) == 0 {
		return nil, false, p.errorf(ix.off, "the slice selects nothing")
	}
	return out, false, nil
}

// broadcast3 returns how many times a statement over the operands applies: 1 when all are
// single qubits, else the common length of the registers and slices.
func (p *parser3) broadcast3(ops []qubitOperand) (int, error) {
	n, first := 1, -1
	for i, o := range ops {
		if o.scalar {
			continue
		}
		if first < 0 {
			first, n = i, len(o.qubits)
		} else if len(o.qubits) != n {
			return 0, p.errorf(o.off, "operands of different lengths in one statement: %d and %d", n, len(o.qubits))
		}
	}
	return n, nil
}

func (o qubitOperand) at(i int) int {
	if o.scalar {
		return o.qubits[0]
	}
	return o.qubits[i]
}

// measureArrow reads measure q -> c;.
func (p *parser3) measureArrow() error {
	q, err := p.measured1()
	if err != nil {
		return err
	}
	if !p.tok.is("->") {
		return p.errorf(p.tok.off, "a measurement must write bits: measure q -> c; or c = measure q;")
	}
	if err := p.next(); err != nil {
		return err
	}
	t, err := p.bitOperand()
	if err != nil {
		return err
	}
	if err := p.measureOps(q, t); err != nil {
		return err
	}
	return p.expect(";", "after the measurement")
}

// measureInto reads the measure q; part of c = measure q;.
func (p *parser3) measureInto(t bitTarget) error {
	q, err := p.measured1()
	if err != nil {
		return err
	}
	if err := p.measureOps(q, t); err != nil {
		return err
	}
	return p.expect(";", "after the measurement")
}

// measured1 reads measure and the one qubit, register or slice it measures.
func (p *parser3) measured1() (qubitOperand, error) {
	if err := p.next(); err != nil {
		return qubitOperand{}, err
	}
	qs, err := p.qubitOperands()
	if err != nil {
		return qubitOperand{}, err
	}
	if len(qs) != 1 {
		return qubitOperand{}, p.errorf(qs[1].off, "measure takes one qubit or register")
	}
	return qs[0], nil
}

// bitOperand reads c, c[i] or c[a:b] as a measurement's target.
func (p *parser3) bitOperand() (bitTarget, error) {
	t := p.tok
	s := p.lookup(string(t.text))
	if t.kind != tIdent || s == nil || s.kind != sBits {
		return bitTarget{}, p.errorf(t.off, "expected a bit register, found %s", t.describe())
	}
	if err := p.next(); err != nil {
		return bitTarget{}, err
	}
	out := bitTarget{bits: regBits(s.reg), off: t.off, single: s.single}
	if p.tok.is("[") {
		ix, err := p.index3()
		if err != nil {
			return bitTarget{}, err
		}
		sel, scalar, err := p.selectIndex(ix, s.reg.size)
		if err != nil {
			return bitTarget{}, err
		}
		out.bits, out.single = make([]int, len(sel)), scalar
		for i, k := range sel {
			out.bits[i] = s.reg.start + k
		}
	}
	return out, nil
}

// measureOps appends one measure op for each qubit, pairing qubits with bits in order.
func (p *parser3) measureOps(q qubitOperand, t bitTarget) error {
	n := len(q.qubits)
	if q.scalar {
		n = 1
	}
	if len(t.bits) != n {
		return p.errorf(t.off, "measure pairs %d qubit(s) with %d bit(s)", n, len(t.bits))
	}
	if err := p.condRoom(n); err != nil {
		return err
	}
	for i := 0; i < n; i++ {
		if err := p.add(circuit.Op{Gate: circuit.Gate{Name: "measure"}, Qubits: []int{q.qubits[i]}, Bits: []int{t.bits[i]}}); err != nil {
			return err
		}
		p.measured[t.bits[i]] = true
	}
	return nil
}

func (p *parser3) reset3() error {
	if err := p.next(); err != nil {
		return err
	}
	qs, err := p.qubitOperands()
	if err != nil {
		return err
	}
	if err := p.condRoom(len(qs)); err != nil {
		return err
	}
	for _, o := range qs {
		for _, q := range o.qubits {
			if err := p.gate("reset", q); err != nil {
				return err
			}
		}
	}
	return p.expect(";", "after reset")
}

// barrier3 reads barrier; (every qubit) or barrier with operands.
func (p *parser3) barrier3() error {
	if err := p.next(); err != nil {
		return err
	}
	var qubits []int
	if p.tok.is(";") {
		for q := 0; q < p.nq; q++ {
			qubits = append(qubits, q)
		}
	} else {
		qs, err := p.qubitOperands()
		if err != nil {
			return err
		}
		seen := map[int]bool{}
		for _, o := range qs {
			for _, q := range o.qubits {
				if !seen[q] {
					seen[q] = true
					qubits = append(qubits, q)
				}
			}
		}
	}
	if err := p.expect(";", "after barrier"); err != nil {
		return err
	}
	if p.cfg.dropBarriers || len(qubits) == 0 {
		return nil
	}
	if err := p.operandRoom(len(qubits)); err != nil {
		return err
	}
	return p.add(circuit.Op{Gate: circuit.Gate{Name: "barrier"}, Qubits: qubits})
}
