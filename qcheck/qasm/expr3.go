package qasm

import (
	"math"
	"strconv"
	"strings"
)

// node is an OpenQASM 3 expression as read: a literal, a name, an index into a register, a
// function call or cast, or an operator applied to its kids. Expressions are evaluated where they
// stand (eval) or, in gate bodies, lowered to the arithmetic of 2.0 over the gate's parameters
// (lower), which is then compiled once like a 2.0 body's.
type node struct {
	op   byte // 'l' literal, 'n' name, 'i' index, 'c' call or cast, 'u' unary, 'b' binary
	off  int
	text string // the name, function, operator, cast's base type, or a number's digits
	val  value  // the literal
	typ  typ    // the cast's type
	kids []*node
	idx  *index // for 'i'
}

// begin returns the offset where the expression starts (a binary node's own offset is its
// operator's, for errors about the operation).
func (n *node) begin() int {
	for n.op == 'b' || n.op == 'i' {
		n = n.kids[0]
	}
	return n.off
}

// index is a subscript: one expression, a range lo:step:hi (parts may be nil), or a set {a, b}.
type index struct {
	one          *node
	lo, step, hi *node
	isRange      bool
	set          []*node
	off          int
}

// binary operators of OpenQASM 3 by precedence, loosest first (the specification's table).
var binaryLevels = [][]string{
	{"||"}, {"&&"}, {"|"}, {"^"}, {"&"}, {"==", "!="}, {"<", "<=", ">", ">="},
	{"<<", ">>"}, {"+", "-"}, {"*", "/", "%"},
}

// binaryLevel gives each binary operator its index in binaryLevels plus one.
var binaryLevel = func() map[string]int {
	m := map[string]int{}
	for i, ops := range binaryLevels {
		for _, o := range ops {
			m[o] = i + 1
		}
	}
	return m
}()

// expression reads an expression and evaluates it.
func (p *parser3) expression() (*node, value, error) {
	e, err := p.parseExpr3()
	if err != nil {
		return nil, value{}, err
	}
	v, err := p.eval(e)
	return e, v, err
}

// parseExpr3 reads an expression.
func (p *parser3) parseExpr3() (*node, error) { return p.binary3(0, 0) }

func (p *parser3) binary3(level, nest int) (*node, error) {
	if nest > maxNesting {
		return nil, p.errorf(p.tok.off, "expression nested more than %d deep", maxNesting)
	}
	if level == len(binaryLevels) {
		return p.unary3(nest)
	}
	a, err := p.binary3(level+1, nest)
	if err != nil {
		return nil, err
	}
	for depth := 0; ; depth++ {
		if p.tok.kind != tPunct || binaryLevel[string(p.tok.text)] != level+1 {
			return a, nil
		}
		op := string(p.tok.text)
		if depth > maxExprDepth {
			return nil, p.errorf(p.tok.off, "expression too long (more than %d operators in a row)", maxExprDepth)
		}
		off := p.tok.off
		if err := p.advance(); err != nil {
			return nil, err
		}
		b, err := p.binary3(level+1, nest)
		if err != nil {
			return nil, err
		}
		a = &node{op: 'b', off: off, text: op, kids: []*node{a, b}}
	}
}

// unary3 reads -x, !x, ~x, and powers, which bind tighter than the sign: -2**2 is -4.
func (p *parser3) unary3(nest int) (*node, error) {
	if nest > maxNesting {
		return nil, p.errorf(p.tok.off, "expression nested more than %d deep", maxNesting)
	}
	if p.tok.kind == tPunct && (p.tok.is("-") || p.tok.is("!") || p.tok.is("~")) {
		op, off := string(p.tok.text), p.tok.off
		if err := p.advance(); err != nil {
			return nil, err
		}
		a, err := p.unary3(nest + 1)
		if err != nil {
			return nil, err
		}
		return &node{op: 'u', off: off, text: op, kids: []*node{a}}, nil
	}
	a, err := p.postfix3(nest)
	if err != nil {
		return nil, err
	}
	if p.tok.kind == tPunct && p.tok.is("**") {
		off := p.tok.off
		if err := p.advance(); err != nil {
			return nil, err
		}
		b, err := p.unary3(nest + 1)
		if err != nil {
			return nil, err
		}
		return &node{op: 'b', off: off, text: "**", kids: []*node{a, b}}, nil
	}
	return a, nil
}

// postfix3 reads a primary followed by subscripts.
func (p *parser3) postfix3(nest int) (*node, error) {
	a, err := p.primary3(nest)
	if err != nil {
		return nil, err
	}
	for p.tok.kind == tPunct && p.tok.is("[") {
		ix, err := p.index3()
		if err != nil {
			return nil, err
		}
		a = &node{op: 'i', off: ix.off, kids: []*node{a}, idx: ix}
	}
	return a, nil
}

// index3 reads [e], [lo:hi], [lo:step:hi] (parts may be left out) or [{a, b}].
func (p *parser3) index3() (*index, error) {
	ix := &index{off: p.tok.off}
	if err := p.advance(); err != nil {
		return nil, err
	}
	if p.tok.is("{") {
		set, err := p.set3()
		if err != nil {
			return nil, err
		}
		ix.set = set
		return ix, p.expect("]", "to close the index")
	}
	var parts []*node
	for {
		var e *node
		if !p.tok.is(":") && !p.tok.is("]") {
			var err error
			if e, err = p.parseExpr3(); err != nil {
				return nil, err
			}
		}
		parts = append(parts, e)
		if p.tok.is(",") {
			return nil, p.errorf(p.tok.off, "multi-dimensional indexing is not supported (arrays beyond registers)")
		}
		if !p.tok.is(":") {
			break
		}
		if len(parts) == 3 {
			return nil, p.errorf(p.tok.off, "a range has at most three parts, lo:step:hi")
		}
		if err := p.advance(); err != nil {
			return nil, err
		}
	}
	switch len(parts) {
	case 1:
		if parts[0] == nil {
			return nil, p.errorf(p.tok.off, "empty index")
		}
		ix.one = parts[0]
	case 2:
		ix.isRange, ix.lo, ix.hi = true, parts[0], parts[1]
	default:
		ix.isRange, ix.lo, ix.step, ix.hi = true, parts[0], parts[1], parts[2]
	}
	return ix, p.expect("]", "to close the index")
}

// set3 reads {a, b, ...}.
func (p *parser3) set3() ([]*node, error) {
	if err := p.expect("{", "to open the set"); err != nil {
		return nil, err
	}
	var out []*node
	for !p.tok.is("}") {
		e, err := p.parseExpr3()
		if err != nil {
			return nil, err
		}
		out = append(out, e)
		if !p.tok.is(",") {
			break
		}
		if err := p.advance(); err != nil {
			return nil, err
		}
	}
	return out, p.expect("}", "to close the set")
}

// functions3 are the built-in functions of OpenQASM 3 expressions and their arity.
var functions3 = map[string]int{
	"sin": 1, "cos": 1, "tan": 1, "arcsin": 1, "arccos": 1, "arctan": 1, "exp": 1, "log": 1,
	"sqrt": 1, "ceiling": 1, "floor": 1, "mod": 2, "popcount": 1,
}

func (p *parser3) primary3(nest int) (*node, error) {
	t := p.tok
	switch {
	case t.kind == tNumber:
		v, err := numberValue(t.text)
		if err != nil {
			return nil, p.errorf(t.off, "%v", err)
		}
		return &node{op: 'l', off: t.off, val: v, text: string(t.text)}, p.advance()
	case t.kind == tString:
		// A bit string literal "0101": the first character is the most significant bit.
		s := string(t.text[1 : len(t.text)-1])
		s = strings.ReplaceAll(s, "_", "")
		if len(s) == 0 || len(s) > 64 || strings.Trim(s, "01") != "" {
			return nil, p.errorf(t.off, "a bit string literal holds 1 to 64 digits 0 and 1, found %s", t.text)
		}
		u, _ := strconv.ParseUint(s, 2, 64)
		return &node{op: 'l', off: t.off, val: value{kind: kBits, width: len(s), i: int64(u)}}, p.advance()
	case t.is("("):
		if err := p.advance(); err != nil {
			return nil, err
		}
		e, err := p.binary3(0, nest+1)
		if err != nil {
			return nil, err
		}
		return e, p.expect(")", "to close the parenthesis")
	case t.kind == tIdent:
		name := string(t.text)
		switch name {
		case "true", "false":
			return &node{op: 'l', off: t.off, val: value{kind: kBool, i: b2i(name == "true")}}, p.advance()
		case "pi", "π":
			return &node{op: 'l', off: t.off, val: floatValue(math.Pi)}, p.advance()
		case "tau", "τ":
			return &node{op: 'l', off: t.off, val: floatValue(2 * math.Pi)}, p.advance()
		case "euler", "ℇ":
			return &node{op: 'l', off: t.off, val: floatValue(math.E)}, p.advance()
		case "measure":
			return nil, p.errorf(t.off, "measure is not an expression here; write c = measure q;")
		case "sizeof", "durationof", "real", "imag":
			return nil, p.errorf(t.off, "%s is not supported", name)
		}
		if ty, ok, err := p.scalarType(); err != nil {
			return nil, err
		} else if ok {
			// A cast: type(expression).
			if !p.tok.is("(") {
				return nil, p.errorf(p.tok.off, "expected ( after the type %s of a cast", name)
			}
			if err := p.advance(); err != nil {
				return nil, err
			}
			a, err := p.binary3(0, nest+1)
			if err != nil {
				return nil, err
			}
			return &node{op: 'c', off: t.off, text: "cast", typ: ty, kids: []*node{a}}, p.expect(")", "to close the cast")
		}
		if err := p.advance(); err != nil {
			return nil, err
		}
		if arity, ok := functions3[name]; ok && p.tok.is("(") {
			if err := p.advance(); err != nil {
				return nil, err
			}
			n := &node{op: 'c', off: t.off, text: name}
			for {
				a, err := p.binary3(0, nest+1)
				if err != nil {
					return nil, err
				}
				n.kids = append(n.kids, a)
				if !p.tok.is(",") {
					break
				}
				if err := p.advance(); err != nil {
					return nil, err
				}
			}
			if len(n.kids) != arity {
				return nil, p.errorf(t.off, "%s takes %d argument(s), got %d", name, arity, len(n.kids))
			}
			return n, p.expect(")", "to close "+name+"(")
		}
		return &node{op: 'n', off: t.off, text: name}, nil
	}
	return nil, p.errorf(t.off, "expected an expression, found %s", t.describe())
}

// numberValue reads an integer (decimal, 0x, 0o or 0b, underscores allowed) or a real literal.
func numberValue(text []byte) (value, error) {
	s := strings.ReplaceAll(string(text), "_", "")
	if strings.ContainsAny(s, ".eE") && !strings.HasPrefix(s, "0x") && !strings.HasPrefix(s, "0X") {
		v, err := strconv.ParseFloat(s, 64)
		if err != nil && !isRangeErr(err) || math.IsInf(v, 0) {
			if math.IsInf(v, 0) {
				return value{}, errorString("number " + s + " is too large")
			}
			return value{}, errorString("malformed number " + s)
		}
		return floatValue(v), nil
	}
	u, err := strconv.ParseUint(s, 0, 64)
	if err != nil {
		if isRangeErr(err) {
			return value{}, errorString("integer " + s + " does not fit in 64 bits")
		}
		return value{}, errorString("malformed number " + s)
	}
	if u > math.MaxInt64 {
		return value{kind: kUint, i: int64(u)}, nil
	}
	return value{kind: kInt, i: int64(u)}, nil
}

type errorString string

func (e errorString) Error() string { return string(e) }

// lower turns an expression in a gate body into the arithmetic tree of 2.0 over the gate's
// parameters (params), folding names of constants: a gate's angles are real numbers, so only
// + - * / ** (and ^ is not a power here), unary minus, and the real functions are allowed.
func (p *parser3) lower(n *node, params []string) (*expr, error) {
	switch n.op {
	case 'l':
		v, err := p.toFloat(n.val, n.off)
		if err != nil {
			return nil, err
		}
		return &expr{op: 'n', val: v}, nil
	case 'n':
		for i, name := range params {
			if name == n.text {
				return &expr{op: 'p', idx: i}, nil
			}
		}
	case 'u':
		if n.text != "-" {
			break
		}
		a, err := p.lower(n.kids[0], params)
		if err != nil {
			return nil, err
		}
		return p.combine(n.off, 'u', 0, a, nil)
	case 'b':
		ops := map[string]byte{"+": '+', "-": '-', "*": '*', "/": '/', "**": '^'}
		op, ok := ops[n.text]
		if !ok {
			break
		}
		a, err := p.lower(n.kids[0], params)
		if err != nil {
			return nil, err
		}
		b, err := p.lower(n.kids[1], params)
		if err != nil {
			return nil, err
		}
		return p.combine(n.off, op, 0, a, b)
	case 'c':
		if f := functionIndex3(n.text); f >= 0 {
			a, err := p.lower(n.kids[0], params)
			if err != nil {
				return nil, err
			}
			return p.combine(n.off, 'f', f, a, nil)
		}
	}
	// Anything else must not depend on the parameters: evaluate it now.
	if uses(n, params) {
		return nil, p.errorf(n.off, "in a gate body, angles are real arithmetic (+ - * / **, sin, cos, tan, arcsin, arccos, arctan, exp, log, sqrt) of the parameters")
	}
	v, err := p.eval(n)
	if err != nil {
		return nil, err
	}
	f, err := p.toFloat(v, n.off)
	if err != nil {
		return nil, err
	}
	return &expr{op: 'n', val: f}, nil
}

// uses reports whether the expression names one of params.
func uses(n *node, params []string) bool {
	if n.op == 'n' {
		for _, s := range params {
			if s == n.text {
				return true
			}
		}
	}
	for _, k := range n.kids {
		if uses(k, params) {
			return true
		}
	}
	if ix := n.idx; ix != nil {
		for _, k := range append([]*node{ix.one, ix.lo, ix.step, ix.hi}, ix.set...) {
			if k != nil && uses(k, params) {
				return true
			}
		}
	}
	return false
}
