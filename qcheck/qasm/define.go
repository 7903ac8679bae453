package qasm

import "qcheck.dev/qcheck/circuit"

// reserved are the words a gate, parameter or qubit name may not take.
var reserved = map[string]bool{
	"OPENQASM": true, "include": true, "qreg": true, "creg": true, "gate": true, "opaque": true,
	"if": true, "barrier": true, "measure": true, "reset": true, "U": true, "CX": true, "pi": true,
	"sin": true, "cos": true, "tan": true, "exp": true, "ln": true, "sqrt": true,
}

// gateDecl reads gate name[(params)] qubits { body } and records the definition. A definition
// may replace a qelib1 gate (libraries differ between toolchains) but not U, CX or an earlier
// definition of the source. A definition that is token for token the one Format writes for a
// gate of package circuit outside qelib1 (iswap, iswapdg, ccz, ryy) is read as that gate, so
// that Parse(Format(c)) gives back c.
func (p *parser) gateDecl() error {
	start := p.tok.off
	if err := p.advance(); err != nil {
		return err
	}
	name, err := p.ident("a gate name")
	if err != nil {
		return err
	}
	if reserved[string(name.text)] {
		return p.errorf(name.off, "%s is a reserved word and cannot name a gate", name.text)
	}
	if old, ok := p.gates[string(name.text)]; ok && old.user {
		return p.errorf(name.off, "gate %s is already defined", name.text)
	}
	def := &gateDef{name: string(name.text), user: true, work: 1}
	params, qubits, err := p.signature(reserved)
	if err != nil {
		return err
	}
	end, err := p.gateBody(def, params, qubits, func() (bodyCall, error) { return p.bodyStatement(def.name, params, qubits) })
	if err != nil {
		return err
	}
	if native := canonicalFor(def.name, p.src[start:end], formatDefs); native != "" {
		def.native, def.body = native, nil
	}
	p.gates[def.name] = def
	return nil
}

// signature reads the [(params)] qubits { of a gate definition; words are the version's reserved
// words.
func (p *parser) signature(words map[string]bool) (params, qubits []string, err error) {
	if p.tok.is("(") {
		if err := p.advance(); err != nil {
			return nil, nil, err
		}
		if !p.tok.is(")") {
			if params, err = p.names("parameter", nil, words); err != nil {
				return nil, nil, err
			}
		}
		if err := p.expect(")", "after the parameters"); err != nil {
			return nil, nil, err
		}
	}
	if qubits, err = p.names("qubit argument", params, words); err != nil {
		return nil, nil, err
	}
	return params, qubits, p.expect("{", "to open the gate body")
}

// gateBody reads the statements of a gate body with read, up to and past the closing brace,
// counting the definition's size and work as it goes, and returns the offset just past the
// brace.
func (p *parser) gateBody(def *gateDef, params, qubits []string, read func() (bodyCall, error)) (int, error) {
	def.nparams, def.nqubits, def.params = len(params), len(qubits), params
	for !p.tok.is("}") {
		if p.tok.kind == tEOF {
			return 0, p.errorf(p.tok.off, "gate %s: body not closed with }", def.name)
		}
		b, err := read()
		if err != nil {
			return 0, err
		}
		def.body = append(def.body, b)
		switch {
		case b.def != nil:
			def.ops = addCount(def.ops, b.def.size())
			def.work = addCount(def.work, b.def.cost())
			for _, a := range b.args {
				def.work = addCount(def.work, a.cost())
			}
		case !p.cfg.dropBarriers:
			def.ops = addCount(def.ops, 1)
		}
		def.work = addCount(def.work, 1)
	}
	end := p.tok.off + 1
	return end, p.advance()
}

// names reads a comma-separated list of distinct identifiers, none of the reserved words and
// none in taken.
func (p *parser) names(what string, taken []string, words map[string]bool) ([]string, error) {
	var out []string
	for {
		t, err := p.ident("a " + what)
		if err != nil {
			return nil, err
		}
		s := string(t.text)
		if words[s] || s[0] == '$' {
			return nil, p.errorf(t.off, "%s is a reserved word and cannot name a %s", s, what)
		}
		for _, o := range append(out, taken...) {
			if o == s {
				return nil, p.errorf(t.off, "%s is used twice in the gate's signature", s)
			}
		}
		out = append(out, s)
		if !p.tok.is(",") {
			return out, nil
		}
		if err := p.advance(); err != nil {
			return nil, err
		}
	}
}

// bodyStatement reads one call or barrier inside a gate body; operands are the gate's own qubit
// arguments, without indices.
func (p *parser) bodyStatement(gate string, params, qubits []string) (bodyCall, error) {
	t := p.tok
	if t.kind != tIdent {
		return bodyCall{}, p.errorf(t.off, "expected a gate call in the body of %s, found %s", gate, t.describe())
	}
	var b bodyCall
	want := -1
	switch string(t.text) {
	case "barrier":
		if err := p.advance(); err != nil {
			return b, err
		}
	case "measure", "reset", "if", "opaque", "gate", "qreg", "creg", "include":
		return b, p.errorf(t.off, "%s is not allowed in a gate body", t.text)
	default:
		def, ok := p.gates[string(t.text)]
		if !ok {
			if string(t.text) == gate {
				return b, p.errorf(t.off, "gate %s calls itself; a gate can only call gates defined before it", gate)
			}
			return b, p.unknownGate(t)
		}
		if err := p.advance(); err != nil {
			return b, err
		}
		args, at, err := p.angles(params)
		if err != nil {
			return b, err
		}
		if len(args) != def.nparams {
			return b, p.errorf(t.off, "gate %s takes %d angle(s), got %d", t.text, def.nparams, len(args))
		}
		b.def, b.at, want = def, at, def.nqubits
		for _, a := range args {
			b.args = append(b.args, compile(a))
		}
	}
	qs, err := p.bodyQubits(gate, qubits)
	if err != nil {
		return b, err
	}
	b.qubits = qs
	if want >= 0 && len(b.qubits) != want {
		return b, p.errorf(t.off, "gate %s acts on %d qubit(s), got %d operand(s)", t.text, want, len(b.qubits))
	}
	return b, p.expect(";", "after the call")
}

// bodyQubits reads the operands of a call in the body of gate: names among the gate's qubit
// arguments, without indices, none twice; it returns their positions.
func (p *parser) bodyQubits(gate string, qubits []string) ([]int, error) {
	var out []int
	for {
		q, err := p.ident("a qubit argument of " + gate)
		if err != nil {
			return nil, err
		}
		k := -1
		for i, name := range qubits {
			if name == string(q.text) {
				k = i
			}
		}
		if p.tok.is("[") {
			return nil, p.errorf(p.tok.off, "indexing is not allowed in a gate body; use the gate's qubit arguments")
		}
		if k < 0 {
			return nil, p.errorf(q.off, "%s is not a qubit argument of gate %s", q.text, gate)
		}
		for _, j := range out {
			if j == k {
				return nil, p.errorf(q.off, "qubit %s used twice in one call", q.text)
			}
		}
		out = append(out, k)
		if !p.tok.is(",") {
			return out, nil
		}
		if err := p.advance(); err != nil {
			return nil, err
		}
	}
}

// canonicalFor returns the circuit gate that the definition text def stands for, when name is a
// gate the writer defines (defs holds its definitions) and def is token for token the writer's
// definition; else "".
func canonicalFor(name string, def []byte, defs map[string]string) string {
	want, ok := defs[name]
	if !ok {
		return ""
	}
	if _, ok := circuit.Lookup(name); !ok {
		return ""
	}
	a, b := lexer{src: def, v3: true}, lexer{src: []byte(want), v3: true}
	for {
		x, errx := a.next()
		y, erry := b.next()
		if errx != nil || erry != nil || x.kind != y.kind || string(x.text) != string(y.text) {
			return ""
		}
		if x.kind == tEOF {
			return name
		}
	}
}
