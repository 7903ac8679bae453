package param

import (
	"fmt"
	"math"
	"math/big"
	"slices"
	"strings"
	"unicode"

	"qcheck.dev/qcheck/circuit"
)

// Expr is an angle in radians that is affine in named real parameters: a sum of parameters with
// rational coefficients plus a constant, such as a, a+b, 2a−π/2 or −a/2. Exprs are values;
// their methods return new Exprs and never change the receiver. The zero Expr is the constant 0.
//
// Bad arguments (a zero denominator, a name that is not an identifier, a non-finite constant) are
// recorded in the Expr and reported by Circuit.Validate, as the circuit builder does.
type Expr struct {
	terms []term  // sorted by name; no zero coefficients; shared, never changed
	shift float64 // the constant, in radians
	bad   string  // the first bad argument, or ""
}

// term is one parameter with its coefficient; the coefficient is never changed once made.
type term struct {
	name string
	coef *big.Rat
}

// Var returns the parameter with the given name, which must be an identifier: a letter or
// underscore followed by letters, digits or underscores (θ and φ are letters).
func Var(name string) Expr {
	if !isIdentifier(name) {
		return Expr{bad: fmt.Sprintf("parameter name %q is not an identifier", name)}
	}
	return Expr{terms: []term{{name, big.NewRat(1, 1)}}}
}

// Const returns the constant angle x in radians.
func Const(x float64) Expr {
	e := Expr{shift: x}
	if math.IsNaN(x) || math.IsInf(x, 0) {
		e.bad = fmt.Sprintf("constant %v is not finite", x)
	}
	return e
}

// Pi returns the constant angle num/den·π, such as Pi(-1, 2) for −π/2.
func Pi(num, den int64) Expr {
	if den == 0 {
		return Expr{bad: fmt.Sprintf("Pi(%d, %d) has a zero denominator", num, den)}
	}
	return Expr{shift: float64(num) / float64(den) * math.Pi}
}

// Plus returns e + f.
func (e Expr) Plus(f Expr) Expr { return e.combine(f, 1) }

// Minus returns e − f.
func (e Expr) Minus(f Expr) Expr { return e.combine(f, -1) }

// Neg returns −e.
func (e Expr) Neg() Expr { return e.Times(-1, 1) }

// Times returns (num/den)·e, such as a.Times(-1, 2) for −a/2.
func (e Expr) Times(num, den int64) Expr {
	if den == 0 {
		return Expr{bad: fmt.Sprintf("Times(%d, %d) has a zero denominator", num, den)}
	}
	return e.TimesRat(big.NewRat(num, den))
}

// TimesRat returns r·e for any rational r, such as the exact value of a decimal literal (0.1 is
// 1/10); a nil r is recorded as an error.
func (e Expr) TimesRat(r *big.Rat) Expr {
	if r == nil {
		return Expr{bad: "TimesRat(nil)"}
	}
	f, _ := r.Float64()
	out := Expr{shift: e.shift * f, bad: e.bad}
	if r.Sign() == 0 {
		out.shift = 0
		return out
	}
	for _, t := range e.terms {
		out.terms = append(out.terms, term{t.name, new(big.Rat).Mul(t.coef, r)})
	}
	return out
}

// combine returns e + sign·f.
func (e Expr) combine(f Expr, sign int64) Expr {
	out := Expr{shift: e.shift + float64(sign)*f.shift, bad: e.bad}
	if out.bad == "" {
		out.bad = f.bad
	}
	i, j := 0, 0
	for i < len(e.terms) || j < len(f.terms) {
		switch {
		case j == len(f.terms) || (i < len(e.terms) && e.terms[i].name < f.terms[j].name):
			out.terms = append(out.terms, e.terms[i])
			i++
		case i == len(e.terms) || f.terms[j].name < e.terms[i].name:
			c := f.terms[j].coef
			if sign < 0 {
				c = new(big.Rat).Neg(c)
			}
			out.terms = append(out.terms, term{f.terms[j].name, c})
			j++
		default:
			c := new(big.Rat).Set(f.terms[j].coef)
			if sign < 0 {
				c.Neg(c)
			}
			c.Add(c, e.terms[i].coef)
			if c.Sign() != 0 {
				out.terms = append(out.terms, term{e.terms[i].name, c})
			}
			i++
			j++
		}
	}
	return out
}

// Params returns the names of the parameters e depends on, sorted.
func (e Expr) Params() []string {
	out := make([]string, len(e.terms))
	for i, t := range e.terms {
		out[i] = t.name
	}
	return out
}

// Coef returns the coefficient of the named parameter in e, 0 when e does not depend on it.
func (e Expr) Coef(name string) *big.Rat {
	for _, t := range e.terms {
		if t.name == name {
			return new(big.Rat).Set(t.coef)
		}
	}
	return new(big.Rat)
}

// Constant returns the constant part of e in radians.
func (e Expr) Constant() float64 { return e.shift }

// Value returns e at the given parameter values; it fails when a parameter of e has no value or
// its value is not finite.
func (e Expr) Value(values Values) (float64, error) {
	if e.bad != "" {
		return 0, fmt.Errorf("param: %s", e.bad)
	}
	v := e.shift
	for _, t := range e.terms {
		x, ok := values[t.name]
		if !ok {
			return 0, fmt.Errorf("param: no value for parameter %s", t.name)
		}
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return 0, fmt.Errorf("param: parameter %s = %v is not finite", t.name, x)
		}
		f, _ := t.coef.Float64()
		v += f * x
	}
	return v, nil
}

// Substitute returns e with the named parameter replaced by the constant x.
func (e Expr) Substitute(name string, x float64) Expr {
	out := Expr{shift: e.shift, bad: e.bad}
	for _, t := range e.terms {
		if t.name == name {
			f, _ := t.coef.Float64()
			out.shift += f * x
			continue
		}
		out.terms = append(out.terms, t)
	}
	return out
}

// Equal reports whether e and f have the same coefficients and the same constant.
func (e Expr) Equal(f Expr) bool {
	return e.shift == f.shift && e.bad == f.bad && slices.EqualFunc(e.terms, f.terms, func(a, b term) bool {
		return a.name == b.name && a.coef.Cmp(b.coef) == 0
	})
}

// String writes e as people write angles: "a", "a + b", "2a - π/2", "-a/2", "3a/4 + 0.25".
// Constants that are multiples of π/8 up to ±4π are written with π (see circuit.FormatAngle).
func (e Expr) String() string {
	if e.bad != "" {
		return "!(" + e.bad + ")"
	}
	var b strings.Builder
	for i, t := range e.terms {
		num, den := new(big.Int).Set(t.coef.Num()), t.coef.Denom()
		switch {
		case i == 0 && num.Sign() < 0:
			b.WriteString("-")
		case i > 0 && num.Sign() < 0:
			b.WriteString(" - ")
		case i > 0:
			b.WriteString(" + ")
		}
		num.Abs(num)
		if num.Cmp(big.NewInt(1)) != 0 {
			b.WriteString(num.String())
		}
		b.WriteString(t.name)
		if !den.IsInt64() || den.Int64() != 1 {
			b.WriteString("/" + den.String())
		}
	}
	switch {
	case len(e.terms) == 0:
		b.WriteString(circuit.FormatAngle(e.shift))
	case e.shift < 0:
		b.WriteString(" - " + circuit.FormatAngle(-e.shift))
	case e.shift > 0:
		b.WriteString(" + " + circuit.FormatAngle(e.shift))
	}
	return b.String()
}

// isIdentifier reports whether name is a letter or underscore followed by letters, digits and
// underscores.
func isIdentifier(name string) bool {
	if name == "" {
		return false
	}
	for i, r := range name {
		if r == '_' || unicode.IsLetter(r) || (i > 0 && unicode.IsDigit(r)) {
			continue
		}
		return false
	}
	return true
}
