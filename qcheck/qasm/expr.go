package qasm

import (
	"math"
	"strconv"
)

// expr is an arithmetic expression over a gate's parameters. Constant subexpressions are folded
// while parsing, in the order the source gives, so folding never changes a result's rounding.
type expr struct {
	op    byte    // 'n' number, 'p' parameter, 'u' unary minus, 'f' function, or + - * / ^
	val   float64 // the number, for 'n'
	idx   int     // the parameter's index for 'p'; the function's index in functions for 'f'
	depth int     // the height of the tree, bounded to keep evaluation's recursion shallow
	a, b  *expr
}

// functions are the built-in real functions of OpenQASM expressions: the first six are those of
// 2.0; OpenQASM 3 spells ln as log and adds the inverse functions and rounding.
var functions = []struct {
	name string
	f    func(float64) float64
}{
	{"sin", math.Sin}, {"cos", math.Cos}, {"tan", math.Tan},
	{"exp", math.Exp}, {"ln", math.Log}, {"sqrt", math.Sqrt},
	{"log", math.Log}, {"arcsin", math.Asin}, {"arccos", math.Acos}, {"arctan", math.Atan},
	{"ceiling", math.Ceil}, {"floor", math.Floor},
}

// functions2 is how many of functions OpenQASM 2.0 has.
const functions2 = 6

func functionIndex(name []byte) int {
	for i, f := range functions[:functions2] {
		if f.name == string(name) {
			return i
		}
	}
	return -1
}

// functionIndex3 is functionIndex for OpenQASM 3, which has no ln.
func functionIndex3(name string) int {
	for i, f := range functions {
		if f.name == name && name != "ln" {
			return i
		}
	}
	return -1
}

const (
	maxNesting   = 200   // parentheses, unary minus and powers nested in one expression
	maxExprDepth = 10000 // height of an expression tree
)

// eval evaluates the tree; the parser uses it only to fold constants, and compiles every
// expression it keeps into code (see compile), which evaluates without recursion.
func (e *expr) eval(env []float64) float64 {
	switch e.op {
	case 'n':
		return e.val
	case 'p':
		return env[e.idx]
	case 'u', 'f':
		return apply(e.op, e.idx, e.a.eval(env), 0)
	}
	return apply(e.op, e.idx, e.a.eval(env), e.b.eval(env))
}

// apply computes one operator of an expression: x op y for the binary operators, -x for 'u', and
// function idx of x for 'f'. It is the one home of the arithmetic of both the tree and the code.
func apply(op byte, idx int, x, y float64) float64 {
	switch op {
	case 'u':
		return -x
	case 'f':
		return functions[idx].f(x)
	case '+':
		return x + y
	case '-':
		return x - y
	case '*':
		return x * y
	case '/':
		return x / y
	default: // '^'
		return math.Pow(x, y)
	}
}

// code is an expression compiled once, when its gate definition is read, into postfix
// instructions over the gate's parameters: expanding a call then costs one pass over the
// instructions, with no recursion and no allocation.
type code struct {
	ins   []instr
	stack int // the deepest the evaluation stack gets
}

type instr struct {
	op  byte // as in expr
	idx int
	val float64
}

// compile turns the tree into code.
func compile(e *expr) code {
	var c code
	var walk func(e *expr, depth int)
	walk = func(e *expr, depth int) {
		c.stack = max(c.stack, depth+1)
		if e.a != nil {
			walk(e.a, depth)
		}
		if e.b != nil {
			walk(e.b, depth+1)
		}
		c.ins = append(c.ins, instr{op: e.op, idx: e.idx, val: e.val})
	}
	walk(e, 0)
	return c
}

// cost is how much work one evaluation of c is, counted against the source's expansion budget.
func (c code) cost() int { return len(c.ins) }

// eval runs the code with the given parameter values; stack is scratch space of at least
// c.stack entries.
func (c code) eval(env, stack []float64) float64 {
	sp := 0
	for _, in := range c.ins {
		switch in.op {
		case 'n':
			stack[sp] = in.val
			sp++
		case 'p':
			stack[sp] = env[in.idx]
			sp++
		case 'u', 'f':
			stack[sp-1] = apply(in.op, in.idx, stack[sp-1], 0)
		default:
			sp--
			stack[sp-1] = apply(in.op, in.idx, stack[sp-1], stack[sp])
		}
	}
	return stack[0]
}

// combine builds the node op(a, b) (b is nil for unary nodes), folding constants.
func (p *parser) combine(off int, op byte, idx int, a, b *expr) (*expr, error) {
	e := &expr{op: op, idx: idx, a: a, b: b, depth: a.depth + 1}
	if b != nil && b.depth >= a.depth {
		e.depth = b.depth + 1
	}
	if a.op == 'n' && (b == nil || b.op == 'n') {
		return &expr{op: 'n', val: e.eval(nil)}, nil
	}
	if e.depth > maxExprDepth {
		return nil, p.errorf(off, "expression too deep (more than %d levels)", maxExprDepth)
	}
	return e, nil
}

// parseExpr reads expr := term {(+|-) term}. params names the parameters in scope (nil outside
// gate definitions).
func (p *parser) parseExpr(params []string, nest int) (*expr, error) {
	if nest > maxNesting {
		return nil, p.errorf(p.tok.off, "expression nested more than %d deep", maxNesting)
	}
	a, err := p.parseTerm(params, nest)
	if err != nil {
		return nil, err
	}
	for p.tok.is("+") || p.tok.is("-") {
		op, off := p.tok.text[0], p.tok.off
		if err := p.advance(); err != nil {
			return nil, err
		}
		b, err := p.parseTerm(params, nest)
		if err != nil {
			return nil, err
		}
		if a, err = p.combine(off, op, 0, a, b); err != nil {
			return nil, err
		}
	}
	return a, nil
}

// parseTerm reads term := unary {(*|/) unary}.
func (p *parser) parseTerm(params []string, nest int) (*expr, error) {
	a, err := p.parseUnary(params, nest)
	if err != nil {
		return nil, err
	}
	for p.tok.is("*") || p.tok.is("/") {
		op, off := p.tok.text[0], p.tok.off
		if err := p.advance(); err != nil {
			return nil, err
		}
		b, err := p.parseUnary(params, nest)
		if err != nil {
			return nil, err
		}
		if a, err = p.combine(off, op, 0, a, b); err != nil {
			return nil, err
		}
	}
	return a, nil
}

// parseUnary reads unary := - unary | power. Powers bind tighter than the sign: -2^2 is -4.
func (p *parser) parseUnary(params []string, nest int) (*expr, error) {
	if nest > maxNesting {
		return nil, p.errorf(p.tok.off, "expression nested more than %d deep", maxNesting)
	}
	if p.tok.is("-") {
		off := p.tok.off
		if err := p.advance(); err != nil {
			return nil, err
		}
		a, err := p.parseUnary(params, nest+1)
		if err != nil {
			return nil, err
		}
		return p.combine(off, 'u', 0, a, nil)
	}
	return p.parsePower(params, nest)
}

// parsePower reads power := primary [^ unary], right-associative.
func (p *parser) parsePower(params []string, nest int) (*expr, error) {
	a, err := p.parsePrimary(params, nest)
	if err != nil {
		return nil, err
	}
	if !p.tok.is("^") {
		return a, nil
	}
	off := p.tok.off
	if err := p.advance(); err != nil {
		return nil, err
	}
	b, err := p.parseUnary(params, nest+1)
	if err != nil {
		return nil, err
	}
	return p.combine(off, '^', 0, a, b)
}

// parsePrimary reads a number, pi, a parameter, a function call or a parenthesised expression.
func (p *parser) parsePrimary(params []string, nest int) (*expr, error) {
	t := p.tok
	switch {
	case t.kind == tNumber:
		v, err := strconv.ParseFloat(string(t.text), 64)
		if err != nil && !isRangeErr(err) {
			return nil, p.errorf(t.off, "malformed number %s", t.text)
		}
		if math.IsInf(v, 0) {
			return nil, p.errorf(t.off, "number %s is too large", t.text)
		}
		return &expr{op: 'n', val: v}, p.advance()
	case t.is("("):
		if err := p.advance(); err != nil {
			return nil, err
		}
		e, err := p.parseExpr(params, nest+1)
		if err != nil {
			return nil, err
		}
		return e, p.expect(")", "to close the parenthesis")
	case t.kind == tIdent:
		if t.is("pi") {
			return &expr{op: 'n', val: math.Pi}, p.advance()
		}
		if f := functionIndex(t.text); f >= 0 {
			if err := p.advance(); err != nil {
				return nil, err
			}
			if err := p.expect("(", "after function "+functions[f].name); err != nil {
				return nil, err
			}
			a, err := p.parseExpr(params, nest+1)
			if err != nil {
				return nil, err
			}
			if err := p.expect(")", "to close "+functions[f].name+"("); err != nil {
				return nil, err
			}
			return p.combine(t.off, 'f', f, a, nil)
		}
		for i, name := range params {
			if name == string(t.text) {
				return &expr{op: 'p', idx: i}, p.advance()
			}
		}
		if params == nil {
			return nil, p.errorf(t.off, "unknown name %s in an angle (only pi and numbers outside gate definitions)", t.text)
		}
		return nil, p.errorf(t.off, "unknown parameter %s", t.text)
	}
	return nil, p.errorf(t.off, "expected an angle expression, found %s", t.describe())
}

func isRangeErr(err error) bool {
	ne, ok := err.(*strconv.NumError)
	return ok && ne.Err == strconv.ErrRange
}
