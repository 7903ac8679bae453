package qasm

import (
	"bytes"
	"fmt"
	"math"
	"strconv"

	"qcheck.dev/qcheck/circuit"
)

// Parse reads an OpenQASM 2.0 source and returns its circuit, registers flattened in order of
// declaration (see ParseProgram for the mapping). Errors are *Error values with the line and
// column of the problem.
func Parse(src []byte, opts ...Option) (*circuit.Circuit, error) {
	p, err := ParseProgram(src, opts...)
	if err != nil {
		return nil, err
	}
	return p.Circuit, nil
}

// ParseProgram reads an OpenQASM 2.0 or 3 source (the version is read from the header; a source
// without one is read as 3, as the 3 specification allows) and returns the circuit with its
// registers and the source line of every op. What it accepts and how each gate maps onto the
// gates of package circuit is described in the package documentation.
func ParseProgram(src []byte, opts ...Option) (*Program, error) {
	cfg := config{maxOps: DefaultMaxOps}
	for _, o := range opts {
		o(&cfg)
	}
	version, err := sourceVersion(src)
	if err != nil {
		return nil, err
	}
	p := &parser{src: src, lx: lexer{src: src, v3: version == 3}, cfg: cfg, gates: map[string]*gateDef{},
		regs: map[string]*register{}}
	// Most statements make one op: size the op list once instead of growing it.
	if n := bytes.Count(src, []byte{';'}); n <= cfg.maxOps {
		p.ops, p.offs = make([]circuit.Op, 0, n), make([]int, 0, n)
	}
	if err := p.advance(); err != nil {
		return nil, err
	}
	prog := &Program{Version: version}
	var free *parser3 // the 3 reader, when the source has free input parameters
	if version == 2 {
		for name, d := range builtins() {
			if d.keyword {
				p.gates[name] = d
			}
		}
		if err := p.program(); err != nil {
			return nil, err
		}
	} else {
		p.gates = keywords3()
		p3 := &parser3{parser: p}
		if err := p3.program(); err != nil {
			return nil, err
		}
		prog.Inputs = p3.inputs
		if len(p3.free) > 0 {
			free = p3
		}
		if p3.physical {
			prog.Qregs = []Register{{Name: "$", Size: p.nq}}
		}
	}
	c := circuit.New(p.nq)
	c.Ops = p.ops
	c.SetBits(p.nc)
	prog.Circuit, prog.Lines = c, make([]int, len(p.offs))
	for _, r := range p.order {
		reg := Register{Name: r.name, Size: r.size, Start: r.start}
		if r.quantum {
			prog.Qregs = append(prog.Qregs, reg)
		} else {
			prog.Cregs = append(prog.Cregs, reg)
		}
	}
	// Offsets never decrease, so one pass over the source numbers every op's line.
	line, at := 1, 0
	for i, off := range p.offs {
		for ; at < off; at++ {
			if src[at] == '\n' {
				line++
			}
		}
		prog.Lines[i] = line
	}
	if free != nil {
		prog.Free, prog.Angles = free.free, free.angles
	}
	return prog, nil
}

// sourceVersion reads the version from the header: 2 for OPENQASM 2.0 (or 2), 3 for OPENQASM 3
// (3.0, 3.1 …) or no header at all. An empty source is an error: it is more likely a mistake
// than a circuit of no qubits.
func sourceVersion(src []byte) (int, error) {
	lx := lexer{src: src, v3: true}
	t, err := lx.next()
	if err != nil {
		return 3, nil // the 3 reader reports it
	}
	if t.kind == tEOF {
		return 0, lx.errorf(t.off, "empty source: no OpenQASM statements")
	}
	if !t.is("OPENQASM") {
		return 3, nil
	}
	v, err := lx.next()
	if err != nil || v.kind != tNumber {
		return 3, nil
	}
	switch s := string(v.text); {
	case s == "2" || s == "2.0":
		return 2, nil
	case s == "3" || len(s) > 2 && s[:2] == "3.":
		return 3, nil
	}
	return 0, lx.errorf(v.off, "unsupported OpenQASM version %s; this reader takes 2.0 and 3", v.text)
}

type register struct {
	name        string
	quantum     bool
	start, size int
}

// gateDef is a gate that a source can call: a gate of package circuit (native), or a definition
// whose body is expanded at each call.
type gateDef struct {
	name    string
	native  string // the circuit gate a call becomes; empty for a definition to expand
	nparams int
	nqubits int
	params  []string // the names of the angles, for errors (θ for rz, theta for a source's own)
	body    []bodyCall
	ops     int  // how many ops one call expands to, saturating at maxCount; see size
	work    int  // the expansion work of one call, saturating at maxCount; see cost
	keyword bool // U and CX, which exist without any include
	hidden  bool // a helper of the built-in library that sources cannot call
	user    bool // defined by the source itself
	phase   bool // OpenQASM 3's gphase: a global phase, one angle, no qubits of its own
}

// bodyCall is one statement in a gate body: a call (def set) or a barrier (def nil).
type bodyCall struct {
	def    *gateDef
	args   []code
	at     []int // the source offset of each argument's expression
	qubits []int // positions in the enclosing gate's qubit list
	mods   []modifier
}

// maxCount is where op counts stop growing, far above any MaxOps, so that sums and products of
// counts never overflow.
const maxCount = math.MaxInt / 2

// addCount and mulCount add and multiply op counts in [0, maxCount], saturating at maxCount.
func addCount(a, b int) int {
	if a > maxCount-b {
		return maxCount
	}
	return a + b
}

func mulCount(a, b int) int {
	if a != 0 && b > maxCount/a {
		return maxCount
	}
	return a * b
}

// size returns how many ops one call of d expands to (barriers included): 1 for a gate of
// package circuit, else the count worked out when d was defined.
func (d *gateDef) size() int {
	if d.native != "" {
		return 1
	}
	return d.ops
}

// cost returns the work of expanding one call of d: one step for the call, and for a definition
// one step for each barrier and each call in its body plus, for each call, the instructions of
// its angle expressions and the callee's own work. Unlike size, it is never 0, so that
// definitions with empty bodies still count (a doubling chain of them would otherwise be free
// to expand for ever).
func (d *gateDef) cost() int {
	if d.native != "" {
		return 1
	}
	return d.work
}

// angleLabel names angle k of d for an error, counting from 1 as package circuit does:
// "angle 1 (θ)".
func (d *gateDef) angleLabel(k int) string {
	if k < len(d.params) && d.params[k] != "" {
		return fmt.Sprintf("angle %d (%s)", k+1, d.params[k])
	}
	return fmt.Sprintf("angle %d", k+1)
}

type parser struct {
	src   []byte
	lx    lexer
	tok   token
	cfg   config
	gates map[string]*gateDef
	regs  map[string]*register
	order []*register
	nq    int
	nc    int
	ops   []circuit.Op
	offs  []int              // source offset of the statement that made each op
	work  int                // expansion work done so far, against maxWork
	steps int                // steps of reading and expanding done so far, against maxWork (see step)
	nargs int                // operands (qubits, bits and condition bits) of the ops so far, against maxOperands
	cond  *circuit.Condition // the condition of the if statement being read, or nil
	stmt  int                // offset of the statement being read
	// scratch buffers reused across statements
	argBuf []operand
	stack  []float64 // evaluation stack of compiled expressions
	seen   []bool    // qubits already in the barrier being read
}

// operand is a statement argument: a whole register or one element.
type operand struct {
	reg   *register
	index int // -1 for the whole register
	off   int
}

func (p *parser) advance() error {
	t, err := p.lx.next()
	if err != nil {
		return err
	}
	p.tok = t
	return nil
}

func (p *parser) errorf(off int, format string, args ...any) *Error {
	line, col := position(p.src, off)
	return &Error{Line: line, Col: col, Msg: fmt.Sprintf(format, args...)}
}

// expect consumes the punctuation or keyword s, or fails saying what was found instead.
func (p *parser) expect(s, why string) error {
	if !p.tok.is(s) || p.tok.kind == tString {
		return p.errorf(p.tok.off, "expected %q %s, found %s", s, why, p.tok.describe())
	}
	return p.advance()
}

func (p *parser) ident(what string) (token, error) {
	t := p.tok
	if t.kind != tIdent {
		return t, p.errorf(t.off, "expected %s, found %s", what, t.describe())
	}
	return t, p.advance()
}

func (p *parser) program() error {
	if !p.tok.is("OPENQASM") {
		return p.errorf(p.tok.off, "expected the header OPENQASM 2.0; found %s", p.tok.describe())
	}
	if err := p.advance(); err != nil {
		return err
	}
	if p.tok.kind != tNumber || (string(p.tok.text) != "2.0" && string(p.tok.text) != "2") {
		return p.errorf(p.tok.off, "unsupported OpenQASM version %s; this reader takes 2.0", p.tok.describe())
	}
	if err := p.advance(); err != nil {
		return err
	}
	if err := p.expect(";", "after the version"); err != nil {
		return err
	}
	for p.tok.kind != tEOF {
		if err := p.statement(); err != nil {
			return err
		}
	}
	return nil
}

func (p *parser) statement() error {
	t := p.tok
	p.stmt = t.off
	if t.kind != tIdent {
		return p.errorf(t.off, "expected a statement, found %s", t.describe())
	}
	switch string(t.text) {
	case "include":
		return p.include()
	case "qreg", "creg":
		return p.declare(string(t.text) == "qreg")
	case "gate":
		return p.gateDecl()
	case "opaque":
		return p.errorf(t.off, "opaque gates are not supported: they have no body to give them a matrix")
	case "if":
		return p.ifStatement()
	case "OPENQASM":
		return p.errorf(t.off, "the OPENQASM header may appear only once, at the start")
	case "measure":
		return p.measure()
	case "reset":
		return p.reset()
	case "barrier":
		return p.barrier()
	}
	return p.call()
}

// ifStatement reads if(creg==n) op; where op is a gate call, measure or reset, as OpenQASM 2.0
// defines it. Every op the statement makes carries the condition: the register's bits, its
// element 0 least significant, equal n.
func (p *parser) ifStatement() error {
	if err := p.advance(); err != nil {
		return err
	}
	if err := p.expect("(", "after if"); err != nil {
		return err
	}
	name, err := p.ident("a classical register")
	if err != nil {
		return err
	}
	r, ok := p.regs[string(name.text)]
	switch {
	case !ok:
		return p.errorf(name.off, "unknown register %s", name.text)
	case r.quantum:
		return p.errorf(name.off, "%s is not a classical register; if compares a creg with an integer", name.text)
	case r.size > 64:
		return p.errorf(name.off, "if on register %s of %d bits: at most 64 bits can be compared", name.text, r.size)
	}
	if p.tok.is("[") {
		return p.errorf(p.tok.off, "OpenQASM 2.0 compares a whole register in if, not an element")
	}
	if err := p.expect("==", "in the condition"); err != nil {
		return err
	}
	t := p.tok
	v, err := strconv.ParseUint(string(t.text), 10, 64)
	if t.kind != tNumber || err != nil {
		return p.errorf(t.off, "expected a non-negative integer of at most 64 bits to compare %s with, found %s", r.name, t.describe())
	}
	if err := p.advance(); err != nil {
		return err
	}
	if err := p.expect(")", "to close the condition"); err != nil {
		return err
	}
	bits := make([]int, r.size)
	for i := range bits {
		bits[i] = r.start + i
	}
	p.cond = &circuit.Condition{Bits: bits, Value: v}
	defer func() { p.cond = nil }()
	t = p.tok
	if t.kind == tIdent {
		switch string(t.text) {
		case "measure":
			return p.measure()
		case "reset":
			return p.reset()
		case "if", "barrier", "gate", "opaque", "qreg", "creg", "include", "OPENQASM":
		default:
			return p.call()
		}
	}
	return p.errorf(t.off, "if must be followed by a gate call, measure or reset, found %s", t.describe())
}

func (p *parser) include() error {
	if err := p.advance(); err != nil {
		return err
	}
	t := p.tok
	if t.kind != tString {
		return p.errorf(t.off, "expected a file name in quotes after include, found %s", t.describe())
	}
	if string(t.text) != `"qelib1.inc"` {
		return p.errorf(t.off, "cannot include %s: only \"qelib1.inc\" is known (it is built in, not read from disk)", t.text)
	}
	if err := p.advance(); err != nil {
		return err
	}
	for name, d := range builtins() {
		if !d.hidden && !d.keyword {
			if old, ok := p.gates[name]; !ok || !old.user {
				p.gates[name] = d
			}
		}
	}
	return p.expect(";", "after include")
}

func (p *parser) declare(quantum bool) error {
	if err := p.advance(); err != nil {
		return err
	}
	name, err := p.ident("a register name")
	if err != nil {
		return err
	}
	if err := p.expect("[", "before the register size"); err != nil {
		return err
	}
	size, err := p.integer("register size")
	if err != nil {
		return err
	}
	if err := p.expect("]", "after the register size"); err != nil {
		return err
	}
	if _, dup := p.regs[string(name.text)]; dup {
		return p.errorf(name.off, "register %s is already declared", name.text)
	}
	if size.val == 0 {
		return p.errorf(size.off, "register %s has size 0", name.text)
	}
	total := &p.nc
	if quantum {
		total = &p.nq
	}
	if size.val > MaxQubits-*total {
		return p.errorf(size.off, "register %s makes the total size exceed %d", name.text, MaxQubits)
	}
	r := &register{name: string(name.text), quantum: quantum, start: *total, size: size.val}
	*total += size.val
	p.regs[r.name] = r
	p.order = append(p.order, r)
	return p.expect(";", "after the register declaration")
}

type intTok struct {
	val, off int
}

// integer reads a non-negative integer literal of at most MaxQubits.
func (p *parser) integer(what string) (intTok, error) {
	t := p.tok
	if t.kind != tNumber {
		return intTok{}, p.errorf(t.off, "expected the %s as an integer, found %s", what, t.describe())
	}
	for _, c := range t.text {
		if !isDigit(c) {
			return intTok{}, p.errorf(t.off, "the %s must be an integer, found %s", what, t.text)
		}
	}
	v, err := strconv.Atoi(string(t.text))
	if err != nil || v > MaxQubits {
		return intTok{}, p.errorf(t.off, "the %s %s is too large (at most %d)", what, t.text, MaxQubits)
	}
	return intTok{val: v, off: t.off}, p.advance()
}

// operands reads a comma-separated list of registers and elements, at least one.
func (p *parser) operands(quantum bool, stop string) ([]operand, error) {
	args := p.argBuf[:0]
	for {
		name, err := p.ident("a register or register element")
		if err != nil {
			return nil, err
		}
		r, ok := p.regs[string(name.text)]
		if !ok {
			return nil, p.errorf(name.off, "unknown register %s", name.text)
		}
		if r.quantum != quantum {
			kind := "quantum"
			if !quantum {
				kind = "classical"
			}
			return nil, p.errorf(name.off, "%s is not a %s register", name.text, kind)
		}
		a := operand{reg: r, index: -1, off: name.off}
		if p.tok.is("[") {
			if err := p.advance(); err != nil {
				return nil, err
			}
			i, err := p.integer("index")
			if err != nil {
				return nil, err
			}
			if i.val >= r.size {
				return nil, p.errorf(i.off, "index %s[%d] out of range: %s has size %d", r.name, i.val, r.name, r.size)
			}
			a.index = i.val
			if err := p.expect("]", "after the index"); err != nil {
				return nil, err
			}
		}
		args = append(args, a)
		if !p.tok.is(",") {
			break
		}
		if err := p.advance(); err != nil {
			return nil, err
		}
	}
	p.argBuf = args
	if stop != "" {
		return args, p.expect(stop, "after the operands")
	}
	return args, nil
}

// broadcast returns how many times a statement over args applies: 1 when every operand is an
// element, else the common size of the whole registers.
func (p *parser) broadcast(args []operand) (int, error) {
	n := 1
	var first *operand
	for k := range args {
		a := &args[k]
		if a.index >= 0 {
			continue
		}
		if first == nil {
			first, n = a, a.reg.size
		} else if a.reg.size != n {
			return 0, p.errorf(a.off, "registers of different sizes in one statement: %s has %d, %s has %d",
				first.reg.name, first.reg.size, a.reg.name, a.reg.size)
		}
	}
	return n, nil
}

func (a operand) at(i int) int {
	if a.index >= 0 {
		return a.reg.start + a.index
	}
	return a.reg.start + i
}

func (p *parser) add(op circuit.Op) error {
	if len(p.ops) >= p.cfg.maxOps {
		return p.errorf(p.stmt, "the source expands to more than %d ops (see MaxOps)", p.cfg.maxOps)
	}
	n := len(op.Qubits) + len(op.Bits)
	// A barrier does nothing, so a condition on it means nothing: it is left off.
	if p.cond != nil && op.Gate.Name != "barrier" {
		n += len(p.cond.Bits)
		c := *p.cond
		c.Bits = append([]int(nil), c.Bits...)
		op.If = &c
	}
	if err := p.operandRoom(n); err != nil {
		return err
	}
	p.nargs += n
	p.ops = append(p.ops, op)
	p.offs = append(p.offs, p.stmt)
	return nil
}

// operandRoom fails when n more operands would pass the source's limit, maxOperands: a wide
// register makes each barrier or broadcast condition over it as large as the register, so the
// op limit alone does not bound memory.
func (p *parser) operandRoom(n int) error {
	if limit := p.cfg.maxOperands(); n > limit-p.nargs {
		return p.errorf(p.stmt, "the source's ops have more than %d operands in all (qubits, bits and condition bits; %d × MaxOps)",
			limit, operandsPerOp)
	}
	return nil
}

// condRoom fails when ops more ops under the current if condition would pass the operand limit
// with the condition's bits alone, so that a broadcast under a wide condition is refused before
// it starts.
func (p *parser) condRoom(ops int) error {
	if p.cond == nil {
		return nil
	}
	return p.operandRoom(mulCount(ops, len(p.cond.Bits)))
}

func (p *parser) measure() error {
	if err := p.advance(); err != nil {
		return err
	}
	qs, err := p.operands(true, "")
	if err != nil {
		return err
	}
	if len(qs) != 1 {
		return p.errorf(qs[1].off, "measure takes one qubit or register")
	}
	q := qs[0]
	if err := p.expect("->", "between the measured qubit and the classical bit"); err != nil {
		return err
	}
	bs, err := p.operands(false, ";")
	if err != nil {
		return err
	}
	if len(bs) != 1 {
		return p.errorf(bs[1].off, "measure writes one bit or register")
	}
	b := bs[0]
	if (q.index < 0) != (b.index < 0) || q.index < 0 && q.reg.size != b.reg.size {
		return p.errorf(b.off, "measure needs a qubit and a bit, or two registers of the same size")
	}
	n := 1
	if q.index < 0 {
		n = q.reg.size
	}
	if err := p.condRoom(n); err != nil {
		return err
	}
	for i := 0; i < n; i++ {
		if err := p.add(circuit.Op{Gate: circuit.Gate{Name: "measure"}, Qubits: []int{q.at(i)}, Bits: []int{b.at(i)}}); err != nil {
			return err
		}
	}
	return nil
}

func (p *parser) reset() error {
	if err := p.advance(); err != nil {
		return err
	}
	qs, err := p.operands(true, ";")
	if err != nil {
		return err
	}
	if len(qs) != 1 {
		return p.errorf(qs[1].off, "reset takes one qubit or register")
	}
	n, _ := p.broadcast(qs)
	if err := p.condRoom(n); err != nil {
		return err
	}
	for i := 0; i < n; i++ {
		if err := p.add(circuit.Op{Gate: circuit.Gate{Name: "reset"}, Qubits: []int{qs[0].at(i)}}); err != nil {
			return err
		}
	}
	return nil
}

func (p *parser) barrier() error {
	if err := p.advance(); err != nil {
		return err
	}
	qs, err := p.operands(true, ";")
	if err != nil {
		return err
	}
	if p.cfg.dropBarriers {
		return nil
	}
	width := 0
	for _, a := range qs {
		if a.index < 0 {
			width = addCount(width, a.reg.size)
		} else {
			width++
		}
	}
	// Check the limit before building the list, however wide the registers.
	if err := p.operandRoom(min(width, p.nq)); err != nil {
		return err
	}
	if len(p.seen) < p.nq {
		p.seen = make([]bool, p.nq)
	}
	seen := p.seen
	qubits := make([]int, 0, min(width, p.nq))
	for _, a := range qs {
		lo, hi := a.index, a.index+1
		if a.index < 0 {
			lo, hi = 0, a.reg.size
		}
		for i := lo; i < hi; i++ {
			if q := a.reg.start + i; !seen[q] {
				seen[q] = true
				qubits = append(qubits, q)
			}
		}
	}
	for _, q := range qubits {
		seen[q] = false
	}
	return p.add(circuit.Op{Gate: circuit.Gate{Name: "barrier"}, Qubits: qubits})
}

// call reads a gate application: name[(angles)] operands;
func (p *parser) call() error {
	name := p.tok
	def, ok := p.gates[string(name.text)]
	if !ok {
		return p.unknownGate(name)
	}
	if err := p.advance(); err != nil {
		return err
	}
	angles, at, err := p.angles(nil)
	if err != nil {
		return err
	}
	if len(angles) != def.nparams {
		return p.errorf(name.off, "gate %s takes %d angle(s), got %d", name.text, def.nparams, len(angles))
	}
	vals := make([]float64, len(angles))
	for i, a := range angles {
		// Every angle of a call must be finite, even one the gate's body ignores. Outside gate
		// definitions every expression folds to a number.
		if vals[i] = a.val; math.IsNaN(vals[i]) || math.IsInf(vals[i], 0) {
			return p.errorf(at[i], "%s of %s evaluates to %v; angles must be finite", def.angleLabel(i), name.text, vals[i])
		}
	}
	args, err := p.operands(true, ";")
	if err != nil {
		return err
	}
	if len(args) != def.nqubits {
		return p.errorf(name.off, "gate %s acts on %d qubit(s), got %d operand(s)", name.text, def.nqubits, len(args))
	}
	n, err := p.broadcast(args)
	if err != nil {
		return err
	}
	// Refuse a call that would pass the op limit before expanding it: nested definitions can
	// make one call worth billions of ops.
	if need := mulCount(n, def.size()); addCount(len(p.ops), need) > p.cfg.maxOps {
		count := strconv.Itoa(need)
		if need == maxCount {
			count = "at least " + strconv.Itoa(maxCount)
		}
		return p.errorf(name.off, "gate %s expands to %s ops here; with the %d before it the source expands to more than %d ops (see MaxOps)",
			name.text, count, len(p.ops), p.cfg.maxOps)
	}
	if err := p.condRoom(mulCount(n, def.size())); err != nil {
		return err
	}
	// Count the work of expanding, not only the ops it makes: definitions with empty bodies
	// make no ops however deep they nest, and long angle expressions in bodies cost time at
	// every expansion.
	if need := mulCount(n, def.cost()); addCount(p.work, need) > p.cfg.maxWork() {
		count := strconv.Itoa(need)
		if need == maxCount {
			count = "at least " + strconv.Itoa(maxCount)
		}
		return p.errorf(name.off, "gate %s takes %s steps to expand here (calls, barriers and angle arithmetic in its body); with the %d before it the source takes more than %d (%d × MaxOps)",
			name.text, count, p.work, p.cfg.maxWork(), workPerOp)
	} else {
		p.work += need
	}
	for i := 0; i < n; i++ {
		qubits := make([]int, len(args))
		for k, a := range args {
			qubits[k] = a.at(i)
			for j := 0; j < k; j++ {
				if qubits[j] == qubits[k] {
					return p.errorf(a.off, "gate %s uses qubit %s[%d] twice", name.text, a.reg.name, qubits[k]-a.reg.start)
				}
			}
		}
		if err := p.apply(def, vals, nil, qubits, emitCtx{anchor: qubits[0]}, name.off); err != nil {
			return err
		}
	}
	return nil
}

func (p *parser) unknownGate(t token) error {
	if s := string(t.text); s == "rccx" || s == "rc3x" {
		return p.errorf(t.off, "%s (a relative-phase Toffoli of some qelib1.inc versions) is not supported; define it with gate", s)
	}
	if _, ok := builtins()[string(t.text)]; ok && !builtins()[string(t.text)].hidden {
		return p.errorf(t.off, "unknown gate %s (it is in qelib1.inc: add include \"qelib1.inc\";)", t.text)
	}
	if _, ok := circuit.Lookup(string(t.text)); ok {
		return p.errorf(t.off, "unknown gate %s: it is not in qelib1.inc, so the source must define it with gate", t.text)
	}
	return p.errorf(t.off, "unknown gate or statement %s", t.text)
}

// angles reads an optional parenthesised, comma-separated list of expressions, and returns the
// source offset where each begins.
func (p *parser) angles(params []string) ([]*expr, []int, error) {
	if !p.tok.is("(") {
		return nil, nil, nil
	}
	if err := p.advance(); err != nil {
		return nil, nil, err
	}
	var out []*expr
	var at []int
	if p.tok.is(")") {
		return nil, nil, p.advance()
	}
	for {
		at = append(at, p.tok.off)
		e, err := p.parseExpr(params, 0)
		if err != nil {
			return nil, nil, err
		}
		out = append(out, e)
		if p.tok.is(")") {
			return out, at, p.advance()
		}
		if err := p.expect(",", "between angles"); err != nil {
			return nil, nil, err
		}
	}
}
