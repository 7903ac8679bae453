package qasm

import (
	"maps"
	"math/big"
	"slices"
	"strings"
)

// Free input parameters. With the FreeInputs option, an input float without a value is a named
// real parameter: the gates whose angles use it carry those angles as Angles (Program.Angles),
// from which package param's circuits are built for param.Prove to compare for every value. Only what keeps the angles affine, with rational coefficients, and exactly equal to the
// file's meaning for every real value is accepted; anything else is an error at its line and
// column:
//
//   - the parameter may appear only in the angle arguments of a call, at the top level, without
//     modifiers and outside any if, of a gate that is one gate of package circuit whose angles
//     param knows (rx, ry, rz, crx, cry, crz, p, cp, U, and rxx, ryy, rzz read from their
//     canonical definitions);
//   - there, +, −, unary −, and × or ÷ by a rational constant (integer and decimal literals,
//     exact: 0.1 is 1/10, integer constants and loop variables, and their sums, products and
//     quotients) may act on it; other constants (π, real-valued names) may be added but not
//     multiplied with it;
//   - input angle is refused: its value is reduced modulo 2π, so the file's angle is not affine in
//     the declared value; so is float[n] with n other than 64, whose value is rounded.

// freeAngleGates are the circuit gates a call with a free parameter in its angles may become.
var freeAngleGates = map[string]bool{
	"rx": true, "ry": true, "rz": true, "crx": true, "cry": true, "crz": true,
	"p": true, "cp": true, "u": true, "rxx": true, "ryy": true, "rzz": true,
}

// usesFree reports whether the expression reads a free parameter.
func (p *parser3) usesFree(n *node) bool {
	if n == nil {
		return false
	}
	if n.op == 'n' {
		if s := p.lookup(n.text); s != nil && s.kind == sFree {
			return true
		}
	}
	for _, k := range n.kids {
		if p.usesFree(k) {
			return true
		}
	}
	if ix := n.idx; ix != nil {
		for _, k := range append([]*node{ix.one, ix.lo, ix.step, ix.hi}, ix.set...) {
			if p.usesFree(k) {
				return true
			}
		}
	}
	return false
}

// freeError is the error for a use of a free parameter that this reader cannot keep exact.
func (p *parser3) freeError(n *node, what string) error {
	return p.errorf(n.off, "%s: a free input parameter may only be added to, subtracted from, negated, or multiplied or divided by a rational constant, in the angles of a gate call (give inputs values with the Inputs option, qcheck: -input NAME=VALUE)", what)
}

// affine computes an angle expression that reads free parameters as a Angle.
func (p *parser3) affine(n *node) (Angle, error) {
	if !p.usesFree(n) {
		v, err := p.eval(n)
		if err != nil {
			return Angle{}, err
		}
		f, err := p.toFloat(v, n.begin())
		if err != nil {
			return Angle{}, err
		}
		return Angle{Const: f}, nil
	}
	switch {
	case n.op == 'n':
		return Angle{Coefs: map[string]*big.Rat{n.text: big.NewRat(1, 1)}}, nil
	case n.op == 'u' && n.text == "-":
		e, err := p.affine(n.kids[0])
		return e.scale(big.NewRat(-1, 1)), err
	case n.op == 'b' && (n.text == "+" || n.text == "-"):
		a, err := p.affine(n.kids[0])
		if err != nil {
			return Angle{}, err
		}
		b, err := p.affine(n.kids[1])
		if err != nil {
			return Angle{}, err
		}
		if n.text == "-" {
			b = b.scale(big.NewRat(-1, 1))
		}
		return a.plus(b), nil
	case n.op == 'b' && n.text == "*":
		e, k := n.kids[0], n.kids[1]
		if p.usesFree(k) {
			e, k = k, e
		}
		r := p.rational(k)
		if r == nil {
			return Angle{}, p.freeError(n, "multiplication of a free parameter by something other than a rational constant")
		}
		a, err := p.affine(e)
		return a.scale(r), err
	case n.op == 'b' && n.text == "/":
		r := p.rational(n.kids[1])
		if r == nil || r.Sign() == 0 || p.usesFree(n.kids[1]) {
			return Angle{}, p.freeError(n, "division of a free parameter by something other than a nonzero rational constant")
		}
		a, err := p.affine(n.kids[0])
		return a.scale(new(big.Rat).Inv(r)), err
	}
	what := "operator " + n.text
	switch n.op {
	case 'c':
		what = n.text + "(…)"
		if n.text == "cast" {
			what = "a cast to " + n.typ.String()
		}
	case 'i':
		what = "an index"
	}
	return Angle{}, p.freeError(n, what+" on a free parameter")
}

// rational returns the exact value of a constant expression that rational multiples may use, or
// nil when it is not one. Integer-valued expressions take the value the reader computes (so 1/2
// is 0, integer division, as OpenQASM 3 defines it); real-valued ones are built exactly from
// decimal literals (0.1 is 1/10) and rational parts with + − × ÷; anything else (π, a real
// variable, a function, a cast) is not rational here.
func (p *parser3) rational(n *node) *big.Rat {
	if p.usesFree(n) {
		return nil
	}
	v, err := p.eval(n)
	if err != nil || v.measured() {
		return nil
	}
	switch {
	case v.kind == kInt:
		return big.NewRat(v.i, 1)
	case v.kind == kUint:
		return new(big.Rat).SetInt(new(big.Int).SetUint64(uint64(v.i)))
	case v.kind != kFloat || v.width != 0:
		return nil
	}
	switch n.op {
	case 'l':
		r, ok := new(big.Rat).SetString(strings.ReplaceAll(n.text, "_", ""))
		if ok {
			return r
		}
	case 'u':
		if r := p.rational(n.kids[0]); r != nil && n.text == "-" {
			return r.Neg(r)
		}
	case 'b':
		a, b := p.rational(n.kids[0]), p.rational(n.kids[1])
		if a == nil || b == nil {
			return nil
		}
		switch n.text {
		case "+":
			return a.Add(a, b)
		case "-":
			return a.Sub(a, b)
		case "*":
			return a.Mul(a, b)
		case "/":
			if b.Sign() != 0 {
				return a.Quo(a, b)
			}
		}
	}
	return nil
}

// freeCall checks that a call whose angles read free parameters can carry them exactly.
func (p *parser3) freeCall(def *gateDef, name token, mods []modifier, at int) error {
	switch {
	case len(mods) > 0:
		return p.errorf(name.off, "gate %s with modifiers takes a free input parameter in its angles: not supported; give the inputs values (qcheck: -input NAME=VALUE)", name.text)
	case def.native == "" || !freeAngleGates[def.native]:
		return p.errorf(at, "gate %s takes a free input parameter in its angles: only the rotation and phase gates rx, ry, rz, crx, cry, crz, p, cp, U (and rxx, ryy, rzz) accept one; give the inputs values (qcheck: -input NAME=VALUE)", name.text)
	case p.cond != nil:
		return p.errorf(name.off, "gate %s under an if takes a free input parameter: not supported", name.text)
	}
	return nil
}

// Angle is a gate angle that reads free input parameters: Const + Σ Coefs[name]·name, in
// radians, with exact rational coefficients.
type Angle struct {
	Coefs map[string]*big.Rat
	Const float64
}

// Params returns the names of the parameters the angle reads, sorted.
func (a Angle) Params() []string { return slices.Sorted(maps.Keys(a.Coefs)) }

func (a Angle) plus(b Angle) Angle {
	out := Angle{Coefs: map[string]*big.Rat{}, Const: a.Const + b.Const}
	for _, m := range []map[string]*big.Rat{a.Coefs, b.Coefs} {
		for name, c := range m {
			if old, ok := out.Coefs[name]; ok {
				c = new(big.Rat).Add(old, c)
			}
			out.Coefs[name] = c
		}
	}
	maps.DeleteFunc(out.Coefs, func(_ string, c *big.Rat) bool { return c.Sign() == 0 })
	return out
}

func (a Angle) scale(r *big.Rat) Angle {
	f, _ := r.Float64()
	out := Angle{Coefs: map[string]*big.Rat{}, Const: a.Const * f}
	if r.Sign() != 0 {
		for name, c := range a.Coefs {
			out.Coefs[name] = new(big.Rat).Mul(c, r)
		}
	}
	return out
}
