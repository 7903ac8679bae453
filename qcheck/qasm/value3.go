package qasm

import (
	"math"
	"math/bits"

	"qcheck.dev/qcheck/circuit"
)

// vkind is the type of an OpenQASM 3 classical value.
type vkind uint8

const (
	kInt vkind = iota
	kUint
	kFloat
	kAngle
	kBool
	kBits
)

var kindNames = [...]string{"int", "uint", "float", "angle", "bool", "bit"}

func (k vkind) String() string { return kindNames[k] }

// value is a classical value known while reading, or one that depends on measured bits: bits
// lists the classical bits a bit value reads (element 0 least significant), cond is the
// condition a boolean stands for. Such values can only become conditions of ops.
type value struct {
	kind  vkind
	width int   // the width of a sized int, uint, angle or bit value; 0 unsized
	i     int64 // int, uint (its bits), bool (0 or 1), bit values
	f     float64
	bits  []int
	cond  *circuit.Condition
}

func floatValue(f float64) value { return value{kind: kFloat, f: f} }

func b2i(b bool) int64 {
	if b {
		return 1
	}
	return 0
}

// measured reports whether the value depends on measured bits.
func (v value) measured() bool { return v.bits != nil || v.cond != nil }

// typ is a declared classical type: its kind and width (0 unsized).
type typ struct {
	kind  vkind
	width int
}

func (t typ) String() string {
	if t.width > 0 {
		return t.kind.String() + "[" + itoaInt(t.width) + "]"
	}
	return t.kind.String()
}

func itoaInt(i int) string {
	if i < 0 {
		return "-" + itoaInt(-i)
	}
	if i < 10 {
		return string(rune('0' + i))
	}
	return itoaInt(i/10) + string(rune('0'+i%10))
}

// scalarType reads a classical type at the current token (int, uint, float, angle, bool, bit,
// each with an optional [width]) and reports whether there was one; types this reader does not
// support are errors naming them.
func (p *parser3) scalarType() (typ, bool, error) {
	t := p.tok
	if t.kind != tIdent {
		return typ{}, false, nil
	}
	kinds := map[string]vkind{"int": kInt, "uint": kUint, "float": kFloat, "angle": kAngle, "bool": kBool, "bit": kBits}
	k, ok := kinds[string(t.text)]
	if !ok {
		switch string(t.text) {
		case "complex", "duration", "stretch", "array":
			return typ{}, false, p.errorf(t.off, "the type %s is not supported", t.text)
		}
		return typ{}, false, nil
	}
	if err := p.advance(); err != nil {
		return typ{}, false, err
	}
	ty := typ{kind: k}
	if p.tok.is("[") {
		if err := p.advance(); err != nil {
			return typ{}, false, err
		}
		off := p.tok.off
		e, err := p.parseExpr3()
		if err != nil {
			return typ{}, false, err
		}
		w, err := p.evalInt(e)
		if err != nil {
			return typ{}, false, err
		}
		limit := int64(64)
		if k == kBits {
			limit = MaxQubits
		}
		if k == kBool || w < 1 || w > limit {
			return typ{}, false, p.errorf(off, "width %d of %s: want 1 to %d", w, t.text, limit)
		}
		ty.width = int(w)
		if err := p.expect("]", "after the width"); err != nil {
			return typ{}, false, err
		}
	}
	return ty, true, nil
}

// eval computes an expression outside gate bodies.
func (p *parser3) eval(n *node) (value, error) {
	if err := p.step(); err != nil {
		return value{}, err
	}
	switch n.op {
	case 'l':
		return n.val, nil
	case 'n':
		return p.nameValue(n)
	case 'i':
		return p.indexValue(n)
	case 'c':
		args := make([]value, len(n.kids))
		for i, k := range n.kids {
			v, err := p.eval(k)
			if err != nil {
				return value{}, err
			}
			args[i] = v
		}
		if n.text == "cast" {
			return p.convert(args[0], n.typ, n.off)
		}
		return p.call3(n, args)
	case 'u':
		a, err := p.eval(n.kids[0])
		if err != nil {
			return value{}, err
		}
		return p.unaryValue(n, a)
	}
	a, err := p.eval(n.kids[0])
	if err != nil {
		return value{}, err
	}
	b, err := p.eval(n.kids[1])
	if err != nil {
		return value{}, err
	}
	return p.binaryValue(n, a, b)
}

// evalInt evaluates an expression that must be an integer known while reading.
func (p *parser3) evalInt(n *node) (int64, error) {
	v, err := p.eval(n)
	if err != nil {
		return 0, err
	}
	return p.toInt(v, n.off)
}

func (p *parser3) toInt(v value, off int) (int64, error) {
	switch {
	case v.measured():
		return 0, p.errorf(off, "this value depends on measured bits; an integer known while reading is needed here")
	case v.kind == kFloat || v.kind == kAngle:
		if v.f != math.Trunc(v.f) || math.Abs(v.f) > 1<<62 {
			return 0, p.errorf(off, "expected an integer, found %v", v.f)
		}
		return int64(v.f), nil
	}
	return v.i, nil
}

// toFloat gives a value as a real number, as gate angles take it.
func (p *parser3) toFloat(v value, off int) (float64, error) {
	switch {
	case v.measured():
		return 0, p.errorf(off, "an angle cannot depend on measured bits")
	case v.kind == kFloat || v.kind == kAngle:
		return v.f, nil
	case v.kind == kUint:
		return float64(uint64(v.i)), nil
	}
	return float64(v.i), nil
}

// truth gives a value as a condition: a bool known while reading (cond nil), or a condition on
// measured bits.
func (p *parser3) truth(v value, off int) (bool, *circuit.Condition, error) {
	switch {
	case v.cond != nil:
		return false, v.cond, nil
	case v.bits != nil:
		if len(v.bits) > 64 {
			return false, nil, p.errorf(off, "a condition reads at most 64 bits")
		}
		if len(v.bits) == 1 {
			return false, &circuit.Condition{Bits: v.bits, Value: 1}, nil
		}
		return false, &circuit.Condition{Bits: v.bits, Value: 0, Not: true}, nil
	case v.kind == kFloat || v.kind == kAngle:
		return v.f != 0, nil, nil
	}
	return v.i != 0, nil, nil
}

// convert casts or assigns v to type t, with the wrapping and rounding of the specification:
// int[w] and uint[w] keep the low w bits (as two's complement for int), float to int truncates
// towards zero, angle values live in [0, 2π) (angle[w] in steps of 2π/2^w), bool is v ≠ 0, and
// bit[w] takes the low w bits.
func (p *parser3) convert(v value, t typ, off int) (value, error) {
	if v.measured() {
		switch {
		case t.kind == kBool:
			_, c, err := p.truth(v, off)
			if err != nil {
				return value{}, err
			}
			return value{kind: kBool, cond: c}, nil
		case (t.kind == kBits || t.kind == kUint || t.kind == kInt) && v.bits != nil && (t.width == 0 || t.width == len(v.bits)):
			v.kind = t.kind
			return v, nil
		}
		return value{}, p.errorf(off, "a value that depends on measured bits cannot become %s (only bit values and conditions can)", t)
	}
	out := value{kind: t.kind, width: t.width}
	switch t.kind {
	case kFloat:
		f, _ := p.toFloat(v, off)
		out.f = f
	case kAngle:
		f, _ := p.toFloat(v, off)
		if math.IsNaN(f) || math.IsInf(f, 0) {
			return value{}, p.errorf(off, "angle value %v is not finite", f)
		}
		f = math.Mod(f, 2*math.Pi)
		if f < 0 {
			f += 2 * math.Pi
		}
		if t.width > 0 {
			step := 2 * math.Pi / math.Ldexp(1, t.width)
			f = math.Mod(math.Round(f/step)*step, 2*math.Pi)
		}
		out.f = f
	case kBool:
		b, _, _ := p.truth(v, off)
		out.i = b2i(b)
	default: // int, uint, bit
		var i int64
		switch v.kind {
		case kFloat, kAngle:
			if v.kind == kAngle && t.kind != kBits {
				return value{}, p.errorf(off, "an angle cannot become %s", t)
			}
			if math.IsNaN(v.f) || math.Abs(v.f) >= 1<<63 {
				return value{}, p.errorf(off, "%v does not fit in %s", v.f, t)
			}
			i = int64(v.f)
		default:
			i = v.i
		}
		w := t.width
		if w == 0 {
			w = 64
			if t.kind == kBits {
				w = 1
			}
		}
		if w < 64 {
			i &= 1<<w - 1
			if t.kind == kInt && i&(1<<(w-1)) != 0 {
				i -= 1 << w
			}
		}
		out.i = i
	}
	return out, nil
}

func (p *parser3) call3(n *node, args []value) (value, error) {
	for _, a := range args {
		if a.measured() {
			return value{}, p.errorf(n.off, "%s of a value that depends on measured bits is not supported", n.text)
		}
	}
	switch n.text {
	case "mod":
		if isReal(args[0]) || isReal(args[1]) {
			x, _ := p.toFloat(args[0], n.off)
			y, _ := p.toFloat(args[1], n.off)
			return floatValue(math.Mod(x, y)), nil
		}
		if args[1].i == 0 {
			return value{}, p.errorf(n.off, "mod by zero")
		}
		return value{kind: kInt, i: args[0].i % args[1].i}, nil
	case "popcount":
		return value{kind: kInt, i: int64(bits.OnesCount64(uint64(args[0].i)))}, nil
	}
	x, _ := p.toFloat(args[0], n.off)
	return floatValue(functions[functionIndex3(n.text)].f(x)), nil
}

func isReal(v value) bool { return v.kind == kFloat || v.kind == kAngle }

func (p *parser3) unaryValue(n *node, a value) (value, error) {
	switch n.text {
	case "!":
		if a.measured() {
			_, c, err := p.truth(a, n.off)
			if err != nil {
				return value{}, err
			}
			nc := *c
			nc.Not = !nc.Not
			return value{kind: kBool, cond: &nc}, nil
		}
		b, _, _ := p.truth(a, n.off)
		return value{kind: kBool, i: b2i(!b)}, nil
	}
	if a.measured() {
		return value{}, p.errorf(n.off, "%s of a value that depends on measured bits is not supported", n.text)
	}
	if n.text == "-" {
		if isReal(a) {
			return floatValue(-a.f), nil
		}
		return value{kind: kInt, i: -a.i}, nil
	}
	// "~": bitwise not within the value's width.
	if isReal(a) || a.kind == kBool {
		return value{}, p.errorf(n.off, "~ applies to integers and bits, not %s", a.kind)
	}
	a.i = ^a.i
	if a.width > 0 && a.width < 64 && a.kind != kInt {
		a.i &= 1<<a.width - 1
	}
	return a, nil
}

// binaryValue applies a binary operator. Values that depend on measured bits may only be
// compared with known values (c == 5, c[0] != 1) and joined with && into one condition.
func (p *parser3) binaryValue(n *node, a, b value) (value, error) {
	if a.measured() || b.measured() {
		return p.symbolic(n, a, b)
	}
	op := n.text
	switch op {
	case "&&", "||":
		x, _, _ := p.truth(a, n.off)
		y, _, _ := p.truth(b, n.off)
		if op == "&&" {
			return value{kind: kBool, i: b2i(x && y)}, nil
		}
		return value{kind: kBool, i: b2i(x || y)}, nil
	case "==", "!=", "<", "<=", ">", ">=":
		var c int
		if isReal(a) || isReal(b) {
			x, _ := p.toFloat(a, n.off)
			y, _ := p.toFloat(b, n.off)
			c = cmpFloat(x, y)
			if math.IsNaN(x) || math.IsNaN(y) {
				return value{kind: kBool, i: b2i(op == "!=")}, nil
			}
		} else {
			c = cmpInt(a, b)
		}
		r := map[string]bool{"==": c == 0, "!=": c != 0, "<": c < 0, "<=": c <= 0, ">": c > 0, ">=": c >= 0}[op]
		return value{kind: kBool, i: b2i(r)}, nil
	}
	if isReal(a) || isReal(b) {
		x, _ := p.toFloat(a, n.off)
		y, _ := p.toFloat(b, n.off)
		switch op {
		case "+":
			return floatValue(x + y), nil
		case "-":
			return floatValue(x - y), nil
		case "*":
			return floatValue(x * y), nil
		case "/":
			return floatValue(x / y), nil
		case "**":
			return floatValue(math.Pow(x, y)), nil
		}
		return value{}, p.errorf(n.off, "%s applies to integers, not real numbers", op)
	}
	x, y := a.i, b.i
	out := value{kind: kInt}
	if a.kind == kUint || a.kind == kBits {
		out.kind, out.width = a.kind, a.width
	}
	switch op {
	case "+":
		out.i = x + y
	case "-":
		out.i = x - y
	case "*":
		out.i = x * y
	case "/", "%":
		if y == 0 {
			return value{}, p.errorf(n.off, "integer division by zero")
		}
		if op == "/" {
			out.i = x / y
		} else {
			out.i = x % y
		}
	case "**":
		if y < 0 {
			return floatValue(math.Pow(float64(x), float64(y))), nil
		}
		out.i = 1
		for base, e := x, y; e > 0; e >>= 1 {
			if e&1 == 1 {
				out.i *= base
			}
			base *= base
		}
	case "&":
		out.i = x & y
	case "|":
		out.i = x | y
	case "^":
		out.i = x ^ y
	case "<<", ">>":
		if y < 0 || y > 63 {
			out.i = 0
		} else if op == "<<" {
			out.i = x << y
		} else if out.kind == kInt {
			out.i = x >> y
		} else {
			out.i = int64(uint64(x) >> y)
		}
	}
	if out.width > 0 && out.width < 64 {
		out.i &= 1<<out.width - 1
	}
	return out, nil
}

func cmpFloat(x, y float64) int {
	switch {
	case x < y:
		return -1
	case x > y:
		return 1
	}
	return 0
}

func cmpInt(a, b value) int {
	if a.kind == kUint || b.kind == kUint {
		x, y := uint64(a.i), uint64(b.i)
		switch {
		case x < y:
			return -1
		case x > y:
			return 1
		}
		return 0
	}
	switch {
	case a.i < b.i:
		return -1
	case a.i > b.i:
		return 1
	}
	return 0
}

// symbolic combines values where one depends on measured bits: bits == known, bits != known,
// bool == known bool, and && of equality conditions on different bits.
func (p *parser3) symbolic(n *node, a, b value) (value, error) {
	fail := func() (value, error) {
		return value{}, p.errorf(n.off, "this condition on measured bits cannot be written as bits == value or its negation (only ==, != with a known value, !, and && of equalities are)")
	}
	switch n.text {
	case "==", "!=":
		if !a.measured() {
			a, b = b, a
		}
		if b.measured() {
			return fail()
		}
		var c *circuit.Condition
		switch {
		case a.bits != nil:
			if len(a.bits) > 64 {
				return value{}, p.errorf(n.off, "a condition reads at most 64 bits")
			}
			if isReal(b) {
				return fail()
			}
			want := uint64(b.i)
			if len(a.bits) < 64 && (b.i < 0 || want>>len(a.bits) != 0) {
				// The bits can never equal a value outside their range.
				return value{kind: kBool, i: b2i(n.text == "!=")}, nil
			}
			c = &circuit.Condition{Bits: a.bits, Value: want}
		default:
			bv, _, _ := p.truth(b, n.off)
			nc := *a.cond
			nc.Not = nc.Not != !bv
			c = &nc
		}
		if n.text == "!=" {
			c.Not = !c.Not
		}
		return value{kind: kBool, cond: c}, nil
	case "&&", "||":
		if !a.measured() {
			a, b = b, a
		}
		if !b.measured() {
			known, _, _ := p.truth(b, n.off)
			if known == (n.text == "&&") {
				_, c, err := p.truth(a, n.off)
				return value{kind: kBool, cond: c}, err
			}
			return value{kind: kBool, i: b2i(known)}, nil
		}
		if n.text == "||" {
			return fail()
		}
		_, x, err := p.truth(a, n.off)
		if err != nil {
			return value{}, err
		}
		_, y, err := p.truth(b, n.off)
		if err != nil {
			return value{}, err
		}
		if x.Not || y.Not || len(x.Bits)+len(y.Bits) > 64 {
			return fail()
		}
		out := &circuit.Condition{Bits: append(append([]int(nil), x.Bits...), y.Bits...), Value: x.Value | y.Value<<len(x.Bits)}
		for _, bit := range x.Bits {
			for _, other := range y.Bits {
				if bit == other {
					return fail()
				}
			}
		}
		return value{kind: kBool, cond: out}, nil
	}
	return fail()
}
