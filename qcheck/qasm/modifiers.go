package qasm

import (
	"math"
	"math/cmplx"
	"strings"
	"sync"

	"qcheck.dev/qcheck/circuit"
)

// modifier is one OpenQASM 3 gate modifier: ctrl(n) @, negctrl(n) @, inv @ or pow(k) @.
type modifier struct {
	kind byte // 'c' ctrl, 'n' negctrl, 'i' inv, 'p' pow
	n    int  // controls of ctrl and negctrl
	pow  code // the exponent of pow, compiled over the enclosing gate's parameters
	off  int
}

// emitCtx is what the modifiers around a call have asked of it so far: the qubits that control
// it (ctrl adds them; negctrl adds them between X gates), whether it is inverted, and a qubit to
// carry a global phase when there is no control.
type emitCtx struct {
	ctrls  []int
	inv    bool
	anchor int // -1 when no qubit is at hand
}

func (c emitCtx) withControls(qs []int) emitCtx {
	c.ctrls = append(append([]int(nil), c.ctrls...), qs...)
	return c
}

// apply appends the ops of one call of def with the given angles and modifiers on the given
// flat qubits (controls first, as the modifiers take them). Modifiers are taken from the left,
// the outermost first: ctrl and negctrl move qubits into the context, inv toggles it (a body is
// then expanded last call first, each inverted), and pow(k) repeats the rest k times for an
// integer k (inverted for k < 0) or takes the principal power for other k (see fractional).
// Every step counts against the source's work limit. off is the call's source offset, for
// errors in bodies that are not the source's own.
func (p *parser) apply(def *gateDef, vals []float64, mods []modifier, qubits []int, ctx emitCtx, off int) error {
	if err := p.step(); err != nil {
		return err
	}
	if len(mods) > 0 {
		m, rest := mods[0], mods[1:]
		switch m.kind {
		case 'c':
			return p.apply(def, vals, rest, qubits[m.n:], ctx.withControls(qubits[:m.n]), off)
		case 'n':
			if err := p.flip(qubits[:m.n]); err != nil {
				return err
			}
			if err := p.apply(def, vals, rest, qubits[m.n:], ctx.withControls(qubits[:m.n]), off); err != nil {
				return err
			}
			return p.flip(qubits[:m.n])
		case 'i':
			ctx.inv = !ctx.inv
			return p.apply(def, vals, rest, qubits, ctx, off)
		}
		k := m.pow.eval(vals, p.scratch(m.pow))
		if math.IsNaN(k) || math.IsInf(k, 0) {
			return p.errorf(m.off, "the exponent of pow evaluates to %v", k)
		}
		if k != math.Trunc(k) {
			return p.fractional(def, vals, rest, qubits, k, ctx, m.off)
		}
		if k < 0 {
			ctx.inv, k = !ctx.inv, -k
		}
		// Every repetition costs at least one step: refuse at once a power the budget cannot pay.
		if k > float64(p.cfg.maxWork()-p.steps) {
			return p.errorf(m.off, "pow(%v) repeats the gate more times than the source's work limit allows (%d steps; %d × MaxOps)", k, p.cfg.maxWork(), workPerOp)
		}
		for ; k > 0; k-- {
			if err := p.apply(def, vals, rest, qubits, ctx, off); err != nil {
				return err
			}
		}
		return nil
	}
	switch {
	case def.phase:
		a := vals[0]
		if ctx.inv {
			a = -a
		}
		return p.emitPhase(a, ctx.ctrls, ctx.anchor)
	case def.native != "":
		g := circuit.Gate{Name: def.native}
		if len(vals) > 0 {
			g.Params = append([]float64(nil), vals...)
		}
		if ctx.inv {
			g = g.Inverse()
		}
		return p.emitControlled(g, qubits, ctx.ctrls)
	}
	for j := range def.body {
		b := def.body[j]
		if ctx.inv {
			b = def.body[len(def.body)-1-j]
		}
		sub := make([]int, len(b.qubits))
		for k, i := range b.qubits {
			sub[k] = qubits[i]
		}
		if b.def == nil {
			if !p.cfg.dropBarriers {
				if err := p.add(circuit.Op{Gate: circuit.Gate{Name: "barrier"}, Qubits: sub}); err != nil {
					return err
				}
			}
			continue
		}
		args := make([]float64, len(b.args))
		for k, a := range b.args {
			if args[k] = a.eval(vals, p.scratch(a)); !math.IsNaN(args[k]) && !math.IsInf(args[k], 0) {
				continue
			}
			line, col := position(p.src, off)
			if def.user {
				return p.errorf(b.at[k], "%s of %s evaluates to %v in the body of gate %s, for the call at %d:%d; angles must be finite",
					b.def.angleLabel(k), b.def.name, args[k], def.name, line, col)
			}
			return p.errorf(off, "%s of %s evaluates to %v inside gate %s; angles must be finite",
				b.def.angleLabel(k), b.def.name, args[k], def.name)
		}
		inner := ctx
		if len(sub) > 0 {
			inner.anchor = sub[0]
		}
		if err := p.apply(b.def, args, b.mods, sub, inner, off); err != nil {
			return err
		}
	}
	return nil
}

// scratch returns an evaluation stack deep enough for c.
func (p *parser) scratch(c code) []float64 {
	if len(p.stack) < c.stack {
		p.stack = make([]float64, c.stack)
	}
	return p.stack
}

// step counts one step of reading or expanding against the source's work limit.
func (p *parser) step() error { return p.stepN(1) }

// stepN counts n steps: reading a statement or running a loop iteration costs more than
// expanding one call, and counts so (see statement3 and forLoop), so that the limit bounds time.
func (p *parser) stepN(n int) error {
	p.steps += n
	if p.steps > p.cfg.maxWork() {
		return p.errorf(p.stmt, "the source takes more than %d steps to read and expand (calls, loop iterations, arithmetic; %d × MaxOps)",
			p.cfg.maxWork(), workPerOp)
	}
	return nil
}

func (p *parser) flip(qs []int) error {
	for _, q := range qs {
		if err := p.gate("x", q); err != nil {
			return err
		}
	}
	return nil
}

// gate appends a library gate.
func (p *parser) gate(name string, qubits ...int) error {
	return p.add(circuit.Op{Gate: circuit.Gate{Name: name}, Qubits: qubits})
}

// gate1 appends a library gate of one angle, leaving it out when the angle is 0: every such
// gate (rotations, phases and their controlled forms) is then exactly the identity.
func (p *parser) gate1(name string, angle float64, qubits ...int) error {
	if angle == 0 {
		return nil
	}
	return p.add(circuit.Op{Gate: circuit.Gate{Name: name, Params: []float64{angle}}, Qubits: qubits})
}

// controlledForms are the library gates that are controlled versions of another: k controls in
// front of base.
var controlledForms = map[string]struct {
	k    int
	base string
}{
	"cx": {1, "x"}, "ccx": {2, "x"}, "cy": {1, "y"}, "cz": {1, "z"}, "ccz": {2, "z"}, "ch": {1, "h"},
	"cp": {1, "p"}, "crx": {1, "rx"}, "cry": {1, "ry"}, "crz": {1, "rz"}, "cswap": {1, "swap"},
}

// emitControlled appends g on qubits, controlled by ctrls (none: g itself). A controlled gate is
// first taken apart into its base and its own controls, so that ctrl @ cx is a Toffoli.
func (p *parser) emitControlled(g circuit.Gate, qubits, ctrls []int) error {
	if len(ctrls) == 0 {
		return p.add(circuit.Op{Gate: g, Qubits: qubits})
	}
	cs := append([]int(nil), ctrls...)
	if f, ok := controlledForms[g.Name]; ok {
		cs = append(cs, qubits[:f.k]...)
		qubits = qubits[f.k:]
		g = circuit.Gate{Name: f.base, Params: g.Params}
	}
	return p.emitBase(g, cs, qubits)
}

// emitBase appends the gate g, which is not itself a controlled form, controlled by the K ≥ 1
// qubits cs, exactly (global phase included) in library gates:
//
//   - x, z, y, h, p, rx, ry, rz with one control: the library's cx, cz, cy, ch, cp, crx, cry, crz;
//     x and z with two: ccx, ccz; p (and s, sdg, t, tdg, which are phases) with more: mcp;
//     x with more: mcx = H·(multiply controlled phase π)·H; z = H x H and y = S x S† likewise;
//   - sx = H S H and sxdg = H S† H: H on the target around the controlled phase;
//   - swap with one control: cswap; with more: CX(b,a)·C^K X(a→b)·CX(b,a);
//   - rzz = CX (I⊗Rz) CX, rxx = (H⊗H) rzz (H⊗H), ryy = (Rx(π/2)⊗Rx(π/2)) rzz (Rx(−π/2)⊗Rx(−π/2)),
//     iswap and iswapdg by their bodies in formatDefs: the outer gates need no control;
//   - any other single-qubit gate U = e^{iα}u(θ,φ,λ): the A·X·B·X·C construction of Nielsen &
//     Chuang §4.3 (Corollary 4.2, Fig. 4.6) with C^K X for X and the phase as a controlled phase
//     on the controls.
func (p *parser) emitBase(g circuit.Gate, cs, ts []int) error {
	K, t := len(cs), ts[0]
	angle := func() float64 { return g.Params[0] }
	switch g.Name {
	case "x":
		return p.mcx(cs, t)
	case "z":
		switch K {
		case 1:
			return p.gate("cz", cs[0], t)
		case 2:
			return p.gate("ccz", cs[0], cs[1], t)
		}
		return p.sandwich("h", t, func() error { return p.mcx(cs, t) })
	case "y":
		if K == 1 {
			return p.gate("cy", cs[0], t)
		}
		if err := p.gate("sdg", t); err != nil {
			return err
		}
		if err := p.mcx(cs, t); err != nil {
			return err
		}
		return p.gate("s", t)
	case "h", "rx", "ry", "rz":
		if K == 1 {
			if g.Name == "h" {
				return p.gate("ch", cs[0], t)
			}
			return p.gate1("c"+g.Name, angle(), cs[0], t)
		}
	case "p":
		return p.mcp(angle(), cs, t)
	case "s", "sdg", "t", "tdg":
		return p.mcp(map[string]float64{"s": math.Pi / 2, "sdg": -math.Pi / 2, "t": math.Pi / 4, "tdg": -math.Pi / 4}[g.Name], cs, t)
	case "sx", "sxdg":
		a := math.Pi / 2
		if g.Name == "sxdg" {
			a = -a
		}
		return p.sandwich("h", t, func() error { return p.mcp(a, cs, t) })
	case "id":
		return p.gate("id", t)
	case "swap":
		a, b := ts[0], ts[1]
		if K == 1 {
			return p.gate("cswap", cs[0], a, b)
		}
		if err := p.gate("cx", b, a); err != nil {
			return err
		}
		if err := p.mcx(append(append([]int(nil), cs...), a), b); err != nil {
			return err
		}
		return p.gate("cx", b, a)
	case "rzz":
		a, b := ts[0], ts[1]
		if err := p.gate("cx", a, b); err != nil {
			return err
		}
		if err := p.emitBase(circuit.Gate{Name: "rz", Params: g.Params}, cs, []int{b}); err != nil {
			return err
		}
		return p.gate("cx", a, b)
	case "rxx", "ryy":
		pre, post := func(q int) error { return p.gate("h", q) }, func(q int) error { return p.gate("h", q) }
		if g.Name == "ryy" {
			pre = func(q int) error { return p.gate1("rx", math.Pi/2, q) }
			post = func(q int) error { return p.gate1("rx", -math.Pi/2, q) }
		}
		for _, q := range ts {
			if err := pre(q); err != nil {
				return err
			}
		}
		if err := p.emitBase(circuit.Gate{Name: "rzz", Params: g.Params}, cs, ts); err != nil {
			return err
		}
		for _, q := range ts {
			if err := post(q); err != nil {
				return err
			}
		}
		return nil
	case "iswap", "iswapdg":
		for _, op := range bodyOps(g.Name) {
			sub := make([]int, len(op.Qubits))
			for i, q := range op.Qubits {
				sub[i] = ts[q]
			}
			if err := p.emitControlled(op.Gate, sub, cs); err != nil {
				return err
			}
		}
		return nil
	}
	m := g.Elements()
	if m == nil || g.Qubits() != 1 {
		return p.errorf(p.stmt, "cannot control gate %s", g.Name)
	}
	return p.emitU1(m, t, cs)
}

// bodyOps returns the ops of the formatDefs definition of name on qubits 0 and 1, read once.
func bodyOps(name string) []circuit.Op {
	bodyOnce.Do(func() {
		bodies = map[string][]circuit.Op{}
		for _, g := range []string{"iswap", "iswapdg"} {
			// Renamed, so that the reader expands it instead of recognising the gate itself.
			def := strings.Replace(formatDefs[g], "gate "+g+" ", "gate body ", 1)
			c, err := Parse([]byte("OPENQASM 2.0;\ninclude \"qelib1.inc\";\n" + def + "\nqreg q[2];\nbody q[0],q[1];\n"))
			if err != nil {
				panic("qasm: formatDefs: " + err.Error())
			}
			bodies[g] = c.Ops
		}
	})
	return bodies[name]
}

var (
	bodyOnce sync.Once
	bodies   map[string][]circuit.Op
)

// sandwich appends h (or another self-inverse gate) on t, then inner, then h again.
func (p *parser) sandwich(name string, t int, inner func() error) error {
	if err := p.gate(name, t); err != nil {
		return err
	}
	if err := inner(); err != nil {
		return err
	}
	return p.gate(name, t)
}

// mcx appends X on t controlled by every qubit of cs: x, cx, ccx, and beyond two controls
// H·C^K P(π)·H.
func (p *parser) mcx(cs []int, t int) error {
	switch len(cs) {
	case 0:
		return p.gate("x", t)
	case 1:
		return p.gate("cx", cs[0], t)
	case 2:
		return p.gate("ccx", cs[0], cs[1], t)
	}
	return p.sandwich("h", t, func() error { return p.mcp(math.Pi, cs, t) })
}

// mcp appends the phase e^{iλ} on the state where cs and t are all 1: p, cp, and beyond one
// control Barenco et al., Phys. Rev. A 52 (1995), Lemma 7.1 with V = P(λ/2), as the qelib1
// prelude's mcp gates do: cp(λ/2) c,t; C^{K−1}X(c); cp(−λ/2) c,t; C^{K−1}X(c); C^{K−1}P(λ/2).
func (p *parser) mcp(lambda float64, cs []int, t int) error {
	switch len(cs) {
	case 0:
		return p.gate1("p", lambda, t)
	case 1:
		return p.gate1("cp", lambda, cs[0], t)
	}
	c, rest := cs[len(cs)-1], cs[:len(cs)-1]
	for _, step := range []func() error{
		func() error { return p.gate1("cp", lambda/2, c, t) },
		func() error { return p.mcx(rest, c) },
		func() error { return p.gate1("cp", -lambda/2, c, t) },
		func() error { return p.mcx(rest, c) },
		func() error { return p.mcp(lambda/2, rest, t) },
	} {
		if err := step(); err != nil {
			return err
		}
	}
	return nil
}

// emitPhase appends the global phase e^{ia}: with controls, the phase on the state where they
// are all 1 (a phase gate on the controls); without, p(2a) rz(−2a) on the anchor qubit, which is
// e^{ia}·I exactly (p(2a) = diag(1, e^{2ia}), rz(−2a) = diag(e^{ia}, e^{−ia})).
func (p *parser) emitPhase(a float64, cs []int, anchor int) error {
	if len(cs) > 0 {
		return p.mcp(a, cs[:len(cs)-1], cs[len(cs)-1])
	}
	if a == 0 {
		return nil
	}
	if anchor < 0 {
		return p.errorf(p.stmt, "gphase needs a qubit to carry it: declare a qubit first")
	}
	if err := p.gate1("p", 2*a, anchor); err != nil {
		return err
	}
	return p.gate1("rz", -2*a, anchor)
}

// emitU1 appends the single-qubit unitary m on t controlled by cs. Write m = e^{iα'}
// Rz(φ)Ry(θ)Rz(λ) (from e^{iα}u(θ,φ,λ), α' = α + (φ+λ)/2); then with A = Rz(φ)Ry(θ/2),
// B = Ry(−θ/2)Rz(−(φ+λ)/2), C = Rz((λ−φ)/2), ABC = I and AXBXC = Rz(φ)Ry(θ)Rz(λ) (Nielsen &
// Chuang, Corollary 4.2), and the controlled gate is C, C^K X, B, C^K X, A on t and the phase α'
// on the controls. Without controls it is u(θ,φ,λ) and the global phase α.
func (p *parser) emitU1(m []complex128, t int, cs []int) error {
	alpha, theta, phi, lambda := eulerAngles(m[0], m[1], m[2], m[3])
	if len(cs) == 0 {
		if err := p.add(circuit.Op{Gate: circuit.Gate{Name: "u", Params: []float64{theta, phi, lambda}}, Qubits: []int{t}}); err != nil {
			return err
		}
		return p.emitPhase(alpha, nil, t)
	}
	for _, step := range []func() error{
		func() error { return p.gate1("rz", (lambda-phi)/2, t) },
		func() error { return p.mcx(cs, t) },
		func() error { return p.gate1("rz", -(lambda+phi)/2, t) },
		func() error { return p.gate1("ry", -theta/2, t) },
		func() error { return p.mcx(cs, t) },
		func() error { return p.gate1("ry", theta/2, t) },
		func() error { return p.gate1("rz", phi, t) },
	} {
		if err := step(); err != nil {
			return err
		}
	}
	return p.emitPhase(alpha+(phi+lambda)/2, cs, t)
}

// fractional appends pow(k) @ (mods) @ def for a k that is not an integer: the principal power,
// whose eigenphases are k times those of the gate taken in (−π, π] (the reading under which the
// standard library's s = pow(1/2) @ z, t = pow(1/2) @ s and sx = pow(1/2) @ x hold). It is
// defined here for a single gate: a library gate, gphase, or a source gate whose body is one
// call, under ctrl, negctrl and inv modifiers (ctrl commutes with the power: a controlled gate's
// power is the controlled power).
func (p *parser) fractional(def *gateDef, vals []float64, mods []modifier, qubits []int, k float64, ctx emitCtx, off int) error {
	var neg []int
	for len(mods) > 0 && mods[0].kind == 'n' {
		neg = append(neg, qubits[:mods[0].n]...)
		ctx = ctx.withControls(qubits[:mods[0].n])
		qubits, mods = qubits[mods[0].n:], mods[1:]
	}
	if len(neg) > 0 {
		if err := p.flip(neg); err != nil {
			return err
		}
		if err := p.fractional(def, vals, mods, qubits, k, ctx, off); err != nil {
			return err
		}
		return p.flip(neg)
	}
	innerInv := false
peel:
	for len(mods) > 0 {
		m := mods[0]
		switch m.kind {
		case 'n':
			// Negative controls after other modifiers: start again with them in front.
			return p.fractional(def, vals, append([]modifier{m}, append(append([]modifier(nil), mods[1:]...), invIf(innerInv)...)...), qubits, k, ctx, off)
		case 'c':
			ctx = ctx.withControls(qubits[:m.n])
			qubits = qubits[m.n:]
		case 'i':
			innerInv = !innerInv
		default:
			break peel
		}
		mods = mods[1:]
	}
	if len(qubits) == 1 {
		// A single-qubit target, whatever its definition: take its matrix and its power.
		m, err := p.matrix1(def, vals, mods, innerInv)
		if err != nil {
			return err
		}
		m = principalPower(m, k)
		if ctx.inv {
			m = []complex128{cmplx.Conj(m[0]), cmplx.Conj(m[2]), cmplx.Conj(m[1]), cmplx.Conj(m[3])}
		}
		return p.emitU1(m, qubits[0], ctx.ctrls)
	}
	if len(mods) > 0 {
		return p.errorf(mods[0].off, "pow(%v) @ pow(…) @ on a gate of %d qubits is not supported: write one power", k, len(qubits))
	}
	for def.native == "" && !def.phase {
		if len(def.body) != 1 || def.body[0].def == nil {
			return p.errorf(p.stmt, "pow(%v) @ with a power that is not an integer applies to a single gate; gate %s has %d statements", k, def.name, len(def.body))
		}
		b := def.body[0]
		args := make([]float64, len(b.args))
		for i, a := range b.args {
			args[i] = a.eval(vals, p.scratch(a))
		}
		sub := make([]int, len(b.qubits))
		for i, q := range b.qubits {
			sub[i] = qubits[q]
		}
		if innerInv {
			b.mods = append([]modifier{{kind: 'i'}}, b.mods...)
		}
		return p.fractional(b.def, args, b.mods, sub, k, ctx, off)
	}
	if def.phase {
		a := vals[0]
		if innerInv {
			a = -a
		}
		a = principalPhase(a) * k
		if ctx.inv {
			a = -a
		}
		return p.emitPhase(a, ctx.ctrls, ctx.anchor)
	}
	g := circuit.Gate{Name: def.native, Params: append([]float64(nil), vals...)}
	if innerInv {
		g = g.Inverse()
	}
	if f, ok := controlledForms[g.Name]; ok {
		ctx = ctx.withControls(qubits[:f.k])
		qubits = qubits[f.k:]
		g = circuit.Gate{Name: f.base, Params: g.Params}
	}
	power := func(g circuit.Gate, t int) error {
		m := principalPower(g.Elements(), k)
		if ctx.inv {
			m = []complex128{cmplx.Conj(m[0]), cmplx.Conj(m[2]), cmplx.Conj(m[1]), cmplx.Conj(m[3])}
		}
		return p.emitU1(m, t, ctx.ctrls)
	}
	switch g.Name {
	case "rzz", "rxx", "ryy":
		// Conjugation keeps eigenvalues, so the power of W·(I⊗Rz)·W† is W·(I⊗Rz^k)·W†.
		a, b := qubits[0], qubits[1]
		pre := map[string][]circuit.Op{
			"rzz": {{Gate: circuit.Gate{Name: "cx"}, Qubits: []int{a, b}}},
			"rxx": {{Gate: circuit.Gate{Name: "h"}, Qubits: []int{a}}, {Gate: circuit.Gate{Name: "h"}, Qubits: []int{b}}, {Gate: circuit.Gate{Name: "cx"}, Qubits: []int{a, b}}},
			"ryy": {{Gate: circuit.Gate{Name: "rx", Params: []float64{math.Pi / 2}}, Qubits: []int{a}}, {Gate: circuit.Gate{Name: "rx", Params: []float64{math.Pi / 2}}, Qubits: []int{b}}, {Gate: circuit.Gate{Name: "cx"}, Qubits: []int{a, b}}},
		}[g.Name]
		for _, op := range pre {
			if err := p.add(op); err != nil {
				return err
			}
		}
		if err := power(circuit.Gate{Name: "rz", Params: g.Params}, b); err != nil {
			return err
		}
		for i := len(pre) - 1; i >= 0; i-- {
			if err := p.add(circuit.Op{Gate: pre[i].Gate.Inverse(), Qubits: pre[i].Qubits}); err != nil {
				return err
			}
		}
		return nil
	case "swap":
		// swap = CX(b,a)·CX(a,b)·CX(b,a), a conjugation of CX(a,b), itself a controlled X.
		a, b := qubits[0], qubits[1]
		if err := p.gate("cx", b, a); err != nil {
			return err
		}
		ctx = ctx.withControls([]int{a})
		if err := power(circuit.Gate{Name: "x"}, b); err != nil {
			return err
		}
		return p.gate("cx", b, a)
	case "iswap", "iswapdg":
		// iswap = exp(iπ/4 (XX+YY)), whose eigenphases 0, ±π/2 are principal: iswap^k =
		// rxx(−kπ/2)·ryy(−kπ/2) (XX and YY commute).
		a := -k * math.Pi / 2
		if (g.Name == "iswapdg") != ctx.inv {
			a = -a
		}
		for _, name := range []string{"rxx", "ryy"} {
			if err := p.emitControlled(circuit.Gate{Name: name, Params: []float64{a}}, qubits, ctx.ctrls); err != nil {
				return err
			}
		}
		return nil
	}
	if g.Qubits() != 1 || g.Elements() == nil {
		return p.errorf(p.stmt, "pow(%v) @ %s: the power of this gate is not supported", k, g.Name)
	}
	return power(g, qubits[0])
}

// matrix1 returns the 2×2 matrix of a single-qubit gate with its modifiers (inverted when inv),
// global phase included, by expanding it on qubit 0 into a scratch list of ops that is then
// taken back out of the circuit.
func (p *parser) matrix1(def *gateDef, vals []float64, mods []modifier, inv bool) ([]complex128, error) {
	nops, noffs, nargs, cond := len(p.ops), len(p.offs), p.nargs, p.cond
	p.cond = nil
	err := p.apply(def, vals, mods, []int{0}, emitCtx{inv: inv, anchor: 0}, p.stmt)
	ops := p.ops[nops:]
	p.ops, p.offs, p.nargs, p.cond = p.ops[:nops], p.offs[:noffs], nargs, cond
	if err != nil {
		return nil, err
	}
	m := []complex128{1, 0, 0, 1}
	for _, op := range ops {
		g := op.Gate.Elements()
		if g == nil || len(g) != 4 {
			return nil, p.errorf(p.stmt, "pow: gate %s is not a single-qubit unitary", def.name)
		}
		m = []complex128{
			g[0]*m[0] + g[1]*m[2], g[0]*m[1] + g[1]*m[3],
			g[2]*m[0] + g[3]*m[2], g[2]*m[1] + g[3]*m[3],
		}
	}
	return m, nil
}

// invIf returns an inv modifier when inv is set.
func invIf(inv bool) []modifier {
	if inv {
		return []modifier{{kind: 'i'}}
	}
	return nil
}

// principalPhase returns a reduced to (−π, π].
func principalPhase(a float64) float64 {
	a = math.Remainder(a, 2*math.Pi)
	if a <= -math.Pi {
		a += 2 * math.Pi
	}
	return a
}

// principalPower returns m^k for a 2×2 unitary m: with eigenvalues λj = e^{iθj}, θj in (−π, π]
// (a phase within 1e-12 of −π is taken as π, the end the principal branch includes),
//
//	m^k = λ2^k I + (λ1^k − λ2^k)/(λ1 − λ2) (m − λ2 I),
//
// where the divided difference is computed as e^{i(k−1)(θ1+θ2)/2} sin(kδ)/sin(δ), δ = (θ1−θ2)/2,
// which stays accurate when the eigenvalues meet (its limit is k λ^{k−1}).
func principalPower(m []complex128, k float64) []complex128 {
	tr, det := m[0]+m[3], m[0]*m[3]-m[1]*m[2]
	disc := cmplx.Sqrt(tr*tr - 4*det)
	l1, l2 := (tr+disc)/2, (tr-disc)/2
	phase := func(l complex128) float64 {
		th := cmplx.Phase(l)
		if th < -math.Pi+1e-12 {
			th = math.Pi
		}
		return th
	}
	t1, t2 := phase(l1), phase(l2)
	d := (t1 - t2) / 2
	ratio := complex(k, 0)
	if math.Abs(math.Sin(d)) > 1e-12 {
		ratio = complex(math.Sin(k*d)/math.Sin(d), 0)
	}
	ratio *= cmplx.Exp(complex(0, (k-1)*(t1+t2)/2))
	p2 := cmplx.Exp(complex(0, k*t2))
	return []complex128{
		p2 + ratio*(m[0]-l2), ratio * m[1],
		ratio * m[2], p2 + ratio*(m[3]-l2),
	}
}
