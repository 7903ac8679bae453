package qasm

import "math"

// modifiers3 reads the modifiers in front of a gate call. params are the enclosing gate's
// parameters (nil at the top level), over which pow's exponent is compiled; ctrl(n) must be a
// known integer.
func (p *parser3) modifiers3(params []string) ([]modifier, error) {
	var mods []modifier
	for p.tok.kind == tIdent && (p.tok.is("ctrl") || p.tok.is("negctrl") || p.tok.is("inv") || p.tok.is("pow")) {
		t := p.tok
		m := modifier{kind: t.text[0], n: 1, off: t.off}
		if t.is("negctrl") {
			m.kind = 'n'
		}
		if err := p.next(); err != nil {
			return nil, err
		}
		switch {
		case t.is("pow"):
			if err := p.expect("(", "after pow"); err != nil {
				return nil, err
			}
			e, err := p.parseExpr3()
			if err != nil {
				return nil, err
			}
			x, err := p.lower(e, params)
			if err != nil {
				return nil, err
			}
			m.pow = compile(x)
			if err := p.expect(")", "to close pow("); err != nil {
				return nil, err
			}
		case (t.is("ctrl") || t.is("negctrl")) && p.tok.is("("):
			if err := p.next(); err != nil {
				return nil, err
			}
			e, err := p.parseExpr3()
			if err != nil {
				return nil, err
			}
			if uses(e, params) {
				return nil, p.errorf(e.off, "the number of controls must be known, not a gate parameter")
			}
			n, err := p.evalInt(e)
			if err != nil {
				return nil, err
			}
			if n < 1 || n > 64 {
				return nil, p.errorf(e.off, "%s(%d): want 1 to 64 controls", t.text, n)
			}
			m.n = int(n)
			if err := p.expect(")", "to close "+string(t.text)+"("); err != nil {
				return nil, err
			}
		}
		if !p.tok.is("@") {
			return nil, p.errorf(p.tok.off, "expected @ after the modifier %s, found %s", t.text, p.tok.describe())
		}
		if err := p.next(); err != nil {
			return nil, err
		}
		mods = append(mods, m)
	}
	return mods, nil
}

// controls returns how many qubits the modifiers take in front of the gate's own.
func controls(mods []modifier) int {
	n := 0
	for _, m := range mods {
		if m.kind == 'c' || m.kind == 'n' {
			n += m.n
		}
	}
	return n
}

// callee reads the gate name of a call: U, gphase, or a gate in scope.
func (p *parser3) callee() (*gateDef, token, error) {
	t := p.tok
	if t.kind != tIdent {
		return nil, t, p.errorf(t.off, "expected a gate name after the modifiers, found %s", t.describe())
	}
	def, ok := p.gates[string(t.text)]
	if !ok {
		return nil, t, p.unknownGate3(t)
	}
	return def, t, p.next()
}

// callStatement reads [modifiers] gate[(angles)] operands; at the top level.
func (p *parser3) callStatement() error {
	mods, err := p.modifiers3(nil)
	if err != nil {
		return err
	}
	def, name, err := p.callee()
	if err != nil {
		return err
	}
	var vals []float64
	var angles []Angle // set when an angle reads a free parameter
	if p.tok.is("(") {
		if err := p.next(); err != nil {
			return err
		}
		for !p.tok.is(")") {
			at := p.tok.off
			e, err := p.parseExpr3()
			if err != nil {
				return err
			}
			if p.usesFree(e) {
				if err := p.freeCall(def, name, mods, at); err != nil {
					return err
				}
				a, err := p.affine(e)
				if err != nil {
					return err
				}
				for len(angles) < len(vals) {
					angles = append(angles, Angle{Const: vals[len(angles)]})
				}
				angles = append(angles, a)
				vals = append(vals, a.Const)
				if !p.tok.is(",") {
					break
				}
				if err := p.next(); err != nil {
					return err
				}
				continue
			}
			v, err := p.eval(e)
			if err != nil {
				return err
			}
			f, err := p.toFloat(v, at)
			if err != nil {
				return err
			}
			if math.IsNaN(f) || math.IsInf(f, 0) {
				return p.errorf(at, "%s of %s evaluates to %v; angles must be finite", def.angleLabel(len(vals)), name.text, f)
			}
			vals = append(vals, f)
			if !p.tok.is(",") {
				break
			}
			if err := p.next(); err != nil {
				return err
			}
		}
		if err := p.expect(")", "after the angles"); err != nil {
			return err
		}
	}
	if len(vals) != def.nparams {
		return p.errorf(name.off, "gate %s takes %d angle(s), got %d", name.text, def.nparams, len(vals))
	}
	want := def.nqubits + controls(mods)
	var args []qubitOperand
	if !(want == 0 && p.tok.is(";")) {
		if args, err = p.qubitOperands(); err != nil {
			return err
		}
	}
	if err := p.expect(";", "after the call"); err != nil {
		return err
	}
	if len(args) != want {
		return p.errorf(name.off, "gate %s acts on %d qubit(s) here, got %d operand(s)", name.text, want, len(args))
	}
	n, err := p.broadcast3(args)
	if err != nil {
		return err
	}
	if err := p.condRoom(n); err != nil {
		return err
	}
	for i := 0; i < n; i++ {
		qubits := make([]int, len(args))
		for k, a := range args {
			qubits[k] = a.at(i)
			for j := 0; j < k; j++ {
				if qubits[j] == qubits[k] {
					return p.errorf(a.off, "gate %s uses one qubit twice", name.text)
				}
			}
		}
		ctx := emitCtx{anchor: -1}
		if len(qubits) > 0 {
			ctx.anchor = qubits[0]
		} else if p.nq > 0 {
			ctx.anchor = 0
		}
		before := len(p.ops)
		if err := p.apply(def, vals, mods, qubits, ctx, name.off); err != nil {
			return err
		}
		if angles != nil {
			if len(p.ops) != before+1 || p.ops[before].Gate.Name != def.native {
				return p.errorf(name.off, "gate %s with a free input parameter did not become one %s gate", name.text, def.native)
			}
			for len(angles) < len(vals) {
				angles = append(angles, Angle{Const: vals[len(angles)]})
			}
			if p.angles == nil {
				p.angles = map[int][]Angle{}
			}
			p.angles[before] = angles
		}
	}
	return nil
}

// gateDecl3 reads gate name[(params)] qubits { body }. A body holds gate calls with modifiers,
// gphase and barriers; its angles are compiled once over the parameters.
func (p *parser3) gateDecl3() error {
	start := p.tok.off
	if err := p.global(p.tok, "gates"); err != nil {
		return err
	}
	if err := p.next(); err != nil {
		return err
	}
	name, err := p.ident("a gate name")
	if err != nil {
		return err
	}
	if reserved3[string(name.text)] {
		return p.errorf(name.off, "%s is a reserved word and cannot name a gate", name.text)
	}
	if _, ok := p.gates[string(name.text)]; ok {
		return p.errorf(name.off, "gate %s is already defined", name.text)
	}
	if p.lookup(string(name.text)) != nil {
		return p.errorf(name.off, "%s is already declared", name.text)
	}
	def := &gateDef{name: string(name.text), user: true, work: 1}
	params, qubits, err := p.signature(reserved3)
	if err != nil {
		return err
	}
	end, err := p.gateBody(def, params, qubits, func() (bodyCall, error) { return p.bodyStatement3(def.name, params, qubits) })
	if err != nil {
		return err
	}
	if native := canonicalFor(def.name, p.src[start:end], formatDefs3); native != "" {
		def.native, def.body = native, nil
	}
	p.gates[def.name] = def
	return nil
}

// bodyStatement3 reads one statement of a gate body.
func (p *parser3) bodyStatement3(gate string, params, qubits []string) (bodyCall, error) {
	var b bodyCall
	t := p.tok
	if t.kind != tIdent {
		return b, p.errorf(t.off, "expected a gate call in the body of %s, found %s", gate, t.describe())
	}
	want := -1
	if t.is("barrier") {
		if err := p.next(); err != nil {
			return b, err
		}
	} else {
		if _, ok := p.gates[string(t.text)]; !ok && !t.is("ctrl") && !t.is("negctrl") && !t.is("inv") && !t.is("pow") {
			if string(t.text) == gate {
				return b, p.errorf(t.off, "gate %s calls itself; a gate can only call gates defined before it", gate)
			}
			if msg := refused3[string(t.text)]; msg != "" {
				return b, p.errorf(t.off, "%s", msg)
			}
			if reserved3[string(t.text)] {
				return b, p.errorf(t.off, "%s is not allowed in a gate body", t.text)
			}
			return b, p.unknownGate3(t)
		}
		mods, err := p.modifiers3(params)
		if err != nil {
			return b, err
		}
		def, name, err := p.callee()
		if err != nil {
			return b, err
		}
		if p.tok.is("(") {
			if err := p.next(); err != nil {
				return b, err
			}
			for !p.tok.is(")") {
				b.at = append(b.at, p.tok.off)
				e, err := p.parseExpr3()
				if err != nil {
					return b, err
				}
				x, err := p.lower(e, params)
				if err != nil {
					return b, err
				}
				b.args = append(b.args, compile(x))
				if !p.tok.is(",") {
					break
				}
				if err := p.next(); err != nil {
					return b, err
				}
			}
			if err := p.expect(")", "after the angles"); err != nil {
				return b, err
			}
		}
		if len(b.args) != def.nparams {
			return b, p.errorf(name.off, "gate %s takes %d angle(s), got %d", name.text, def.nparams, len(b.args))
		}
		b.def, b.mods, want = def, mods, def.nqubits+controls(mods)
		if want == 0 && p.tok.is(";") {
			return b, p.next()
		}
	}
	qs, err := p.bodyQubits(gate, qubits)
	if err != nil {
		return b, err
	}
	b.qubits = qs
	if want >= 0 && len(b.qubits) != want {
		return b, p.errorf(t.off, "gate %s acts on %d qubit(s) here, got %d operand(s)", b.def.name, want, len(b.qubits))
	}
	return b, p.expect(";", "after the call")
}

// maxIterations returns how many times one for loop may run: MaxOps/32 (32,768 at the
// default). Every iteration also counts against the work limit, so nested loops are bounded too.
func (p *parser3) maxIterations() int64 { return int64(max(p.cfg.maxOps/32, 1)) }

// forLoop reads for [type] name in [lo:hi] | [lo:step:hi] | {a, b, …} statement. The range
// includes hi, as the specification says; the body is read again for every value, with the
// name bound to it, and skipped (checked only for balance) when there is none.
func (p *parser3) forLoop() error {
	forTok := p.tok
	if err := p.next(); err != nil {
		return err
	}
	ty := typ{kind: kInt}
	if t, ok, err := p.scalarType(); err != nil {
		return err
	} else if ok {
		ty = t
	}
	name, err := p.ident("the loop variable")
	if err != nil {
		return err
	}
	if !p.tok.is("in") {
		return p.errorf(p.tok.off, "expected in after the loop variable, found %s", p.tok.describe())
	}
	if err := p.next(); err != nil {
		return err
	}
	// The loop runs n times with the value at(i).
	var n int
	var at func(int) (value, error)
	switch {
	case p.tok.is("["):
		ix, err := p.index3()
		if err != nil {
			return err
		}
		if !ix.isRange || ix.lo == nil || ix.hi == nil {
			return p.errorf(ix.off, "a loop range is [lo:hi] or [lo:step:hi]")
		}
		lo, err := p.evalInt(ix.lo)
		if err != nil {
			return err
		}
		hi, err := p.evalInt(ix.hi)
		if err != nil {
			return err
		}
		step := int64(1)
		if ix.step != nil {
			if step, err = p.evalInt(ix.step); err != nil {
				return err
			}
			if step == 0 {
				return p.errorf(ix.step.off, "a loop range's step cannot be 0")
			}
		}
		var count uint64
		switch {
		case step > 0 && lo <= hi:
			count = (uint64(hi)-uint64(lo))/uint64(step) + 1
		case step < 0 && lo >= hi:
			count = (uint64(lo)-uint64(hi))/uint64(-step) + 1
		}
		if count > uint64(p.maxIterations()) {
			return p.errorf(forTok.off, "for loop of %d iterations: at most %d are read (MaxOps/32; see MaxOps)", count, p.maxIterations())
		}
		n = int(count)
		at = func(i int) (value, error) { return value{kind: kInt, i: lo + int64(i)*step}, nil }
	case p.tok.is("{"):
		set, err := p.set3()
		if err != nil {
			return err
		}
		n = len(set)
		at = func(i int) (value, error) { return p.eval(set[i]) }
	default:
		return p.errorf(p.tok.off, "a loop runs over a range [lo:step:hi] or a set {a, b}; found %s", p.tok.describe())
	}
	bodyPos, bodyTok := p.lx.pos, p.tok
	if n == 0 {
		return p.skipStatement()
	}
	p.loopDepth++
	defer func() { p.loopDepth-- }()
	scope := map[string]*symbol{}
	for i := 0; i < n; i++ {
		if err := p.stepN(stepsPerIteration); err != nil {
			return err
		}
		v, err := at(i)
		if err != nil {
			return err
		}
		x, err := p.convert(v, ty, name.off)
		if err != nil {
			return err
		}
		p.lx.pos, p.tok = bodyPos, bodyTok
		clear(scope)
		p.scopes = append(p.scopes, scope)
		if err := p.declareName(name, &symbol{kind: sConst, typ: ty, val: x}); err != nil {
			return err
		}
		err = p.statement3()
		p.scopes = p.scopes[:len(p.scopes)-1]
		if err != nil {
			return err
		}
	}
	return nil
}

// ifElse reads if (condition) statement [else statement]. A condition known while reading
// chooses a branch (the other is skipped, checked only for balance); a condition on measured
// bits becomes the circuit.Condition of every op of the first branch, and its negation that of
// every op of the else branch.
func (p *parser3) ifElse() error {
	ifTok := p.tok
	if err := p.next(); err != nil {
		return err
	}
	if err := p.expect("(", "after if"); err != nil {
		return err
	}
	e, err := p.parseExpr3()
	if err != nil {
		return err
	}
	if err := p.expect(")", "to close the condition"); err != nil {
		return err
	}
	v, err := p.eval(e)
	if err != nil {
		return err
	}
	known, cond, err := p.truth(v, e.off)
	if err != nil {
		return err
	}
	branch := func(run bool) error {
		if run {
			return p.statement3()
		}
		return p.skipStatement()
	}
	if cond != nil {
		if p.cond != nil {
			return p.errorf(ifTok.off, "an if on measured bits inside another is not supported (the conditions would have to be joined)")
		}
		if len(cond.Bits) > 64 {
			return p.errorf(e.off, "a condition reads at most 64 bits")
		}
		p.cond, p.condScope = cond, len(p.scopes)
		defer func() { p.cond, p.condScope = nil, -1 }()
		known = true
	}
	if err := branch(known); err != nil {
		return err
	}
	if !p.tok.is("else") {
		return nil
	}
	if err := p.next(); err != nil {
		return err
	}
	if cond != nil {
		neg := *cond
		neg.Not = !neg.Not
		p.cond = &neg
		return branch(true)
	}
	return branch(!known)
}

// skipStatement passes over a statement that is not run (a branch not taken, a loop over
// nothing), checking only that its brackets balance.
func (p *parser3) skipStatement() error {
	switch {
	case p.tok.is("{"):
		return p.skipBalanced()
	case p.tok.is("if"):
		if err := p.next(); err != nil {
			return err
		}
		if !p.tok.is("(") {
			return p.errorf(p.tok.off, "expected ( after if")
		}
		if err := p.skipBalanced(); err != nil {
			return err
		}
		if err := p.skipStatement(); err != nil {
			return err
		}
		if p.tok.is("else") {
			if err := p.next(); err != nil {
				return err
			}
			return p.skipStatement()
		}
		return nil
	case p.tok.is("for"):
		for !p.tok.is("in") {
			if p.tok.kind == tEOF {
				return p.errorf(p.tok.off, "for loop without in")
			}
			if err := p.next(); err != nil {
				return err
			}
		}
		if err := p.next(); err != nil {
			return err
		}
		if err := p.skipBalanced(); err != nil {
			return err
		}
		return p.skipStatement()
	}
	for !p.tok.is(";") {
		if p.tok.kind == tEOF {
			return p.errorf(p.tok.off, "statement not ended with ;")
		}
		if p.tok.is("(") || p.tok.is("[") || p.tok.is("{") {
			if err := p.skipBalanced(); err != nil {
				return err
			}
			continue
		}
		if err := p.next(); err != nil {
			return err
		}
	}
	return p.next()
}

// skipBalanced passes over a bracketed group: ( … ), [ … ] or { … }, nested.
func (p *parser3) skipBalanced() error {
	var stack []string
	closer := map[string]string{"(": ")", "[": "]", "{": "}"}
	for {
		t := p.tok
		switch {
		case t.kind == tEOF:
			return p.errorf(t.off, "brackets not closed")
		case t.kind == tPunct && closer[string(t.text)] != "":
			stack = append(stack, closer[string(t.text)])
		case t.kind == tPunct && (t.is(")") || t.is("]") || t.is("}")):
			if len(stack) == 0 || stack[len(stack)-1] != string(t.text) {
				return p.errorf(t.off, "unbalanced %s", t.text)
			}
			stack = stack[:len(stack)-1]
		}
		if err := p.next(); err != nil {
			return err
		}
		if len(stack) == 0 {
			return nil
		}
	}
}

// nameValue reads a classical name's value: a variable or constant, or a bit register, whose
// value is known (every bit still 0) or depends on measured bits.
func (p *parser3) nameValue(n *node) (value, error) {
	s := p.lookup(n.text)
	if s == nil {
		if _, ok := p.gates[n.text]; ok {
			return value{}, p.errorf(n.off, "%s is a gate, not a value", n.text)
		}
		return value{}, p.errorf(n.off, "unknown name %s", n.text)
	}
	switch s.kind {
	case sQubits:
		return value{}, p.errorf(n.off, "%s is a qubit register, not a classical value", n.text)
	case sBits:
		return p.bitsValue(regBits(s.reg), n.off)
	case sFree:
		return value{}, p.freeError(n, "input "+n.text+" used outside the angles of a gate call")
	}
	return s.val, nil
}

// bitsValue is the value of the given classical bits, element 0 least significant. Bits are
// never evaluated while reading, even before any measurement (when they are 0): a condition on
// them stays a condition of its ops, as in OpenQASM 2.0, so that reading and writing agree.
func (p *parser3) bitsValue(bits []int, off int) (value, error) {
	return value{kind: kBits, width: len(bits), bits: bits}, nil
}

// indexValue reads c[i], c[a:b] of a bit register, or bit i of an integer.
func (p *parser3) indexValue(n *node) (value, error) {
	base := n.kids[0]
	if base.op == 'n' {
		if s := p.lookup(base.text); s != nil && s.kind == sBits {
			sel, _, err := p.selectIndex(n.idx, s.reg.size)
			if err != nil {
				return value{}, err
			}
			bits := make([]int, len(sel))
			for i, k := range sel {
				bits[i] = s.reg.start + k
			}
			return p.bitsValue(bits, n.off)
		}
	}
	v, err := p.eval(base)
	if err != nil {
		return value{}, err
	}
	if v.measured() || isReal(v) || n.idx.one == nil {
		return value{}, p.errorf(n.off, "only bit registers and integers known while reading can be indexed (one bit at a time for integers)")
	}
	i, err := p.evalInt(n.idx.one)
	if err != nil {
		return value{}, err
	}
	if i < 0 || i > 63 {
		return value{}, p.errorf(n.idx.one.off, "bit %d of an integer is out of range", i)
	}
	return value{kind: kBits, width: 1, i: (v.i >> i) & 1}, nil
}
