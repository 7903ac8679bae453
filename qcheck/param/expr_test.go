package param

import (
	"math"
	"math/big"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

func TestExprString(t *testing.T) {
	a, b := Var("a"), Var("b")
	for _, tc := range []struct {
		e    Expr
		want string
	}{
		{a, "a"},
		{a.Plus(b), "a + b"},
		{a.Times(2, 1).Minus(Pi(1, 2)), "2a - π/2"},
		{a.Times(-1, 2), "-a/2"},
		{a.Times(3, 4).Plus(Const(0.25)), "3a/4 + 0.25"},
		{b.Minus(a), "-a + b"},
		{a.Minus(a), "0"},
		{a.Plus(b).Minus(b), "a"},
		{Pi(-3, 4), "-3π/4"},
		{Var("θ").Times(1, 3), "θ/3"},
	} {
		if got := tc.e.String(); got != tc.want {
			t.Errorf("got %q, want %q", got, tc.want)
		}
	}
}

func TestExprArithmetic(t *testing.T) {
	a, b := Var("a"), Var("b")
	// (2a − π/2) − (−a/2 + b) + 3b/2 = 5a/2 + b/2 − π/2
	e := a.Times(2, 1).Minus(Pi(1, 2)).Minus(a.Times(-1, 2).Plus(b)).Plus(b.Times(3, 2))
	if e.Coef("a").Cmp(big.NewRat(5, 2)) != 0 || e.Coef("b").Cmp(big.NewRat(1, 2)) != 0 || e.Coef("c").Sign() != 0 {
		t.Errorf("coefficients of %v", e)
	}
	if math.Abs(e.Constant()+math.Pi/2) > 1e-15 {
		t.Errorf("constant %v", e.Constant())
	}
	v, err := e.Value(Values{"a": 0.4, "b": -2})
	if want := 2.5*0.4 + 0.5*-2 - math.Pi/2; err != nil || math.Abs(v-want) > 1e-15 {
		t.Errorf("value %v (%v), want %v", v, err, want)
	}
	if _, err := e.Value(Values{"a": 1}); err == nil || !strings.Contains(err.Error(), "parameter b") {
		t.Errorf("missing value: %v", err)
	}
	if _, err := e.Value(Values{"a": 1, "b": math.NaN()}); err == nil {
		t.Error("NaN value accepted")
	}
	if got := e.Substitute("a", 2); got.Coef("a").Sign() != 0 || math.Abs(got.Constant()-(5-math.Pi/2)) > 1e-15 {
		t.Errorf("substitute: %v", got)
	}
	if !a.Plus(b).Equal(b.Plus(a)) || a.Equal(b) || !a.Neg().Neg().Equal(a) {
		t.Error("Equal")
	}
	tenth, _ := new(big.Rat).SetString("0.1")
	if got := a.Plus(Pi(1, 1)).TimesRat(tenth); got.Coef("a").Cmp(big.NewRat(1, 10)) != 0 || math.Abs(got.Constant()-math.Pi/10) > 1e-16 {
		t.Errorf("0.1·(a + π) = %v", got)
	}
	if a.Times(0, 5).String() != "0" {
		t.Errorf("0·a = %v", a.Times(0, 5))
	}
}

func TestCircuitBind(t *testing.T) {
	a, b := Var("a"), Var("b")
	c := New(2).H(0).RZ(a.Plus(b), 0).CP(a.Times(-1, 2), 0, 1).U(a, b, Pi(1, 4), 1)
	if got := c.Params(); len(got) != 2 || got[0] != "a" || got[1] != "b" {
		t.Errorf("params %v", got)
	}
	bound, err := c.Bind(Values{"a": 1, "b": 2, "unused": 3})
	if err != nil {
		t.Fatal(err)
	}
	want := []string{"h q0", "rz(3) q0", "cp(-0.5) q0,q1", "u(1,2,π/4) q1"}
	for i, op := range bound.Ops {
		if op.String() != want[i] {
			t.Errorf("op %d: %s, want %s", i, op, want[i])
		}
	}
	if _, err := c.Bind(Values{"a": 1}); err == nil || !strings.Contains(err.Error(), "op 1") {
		t.Errorf("missing b: %v", err)
	}
	if err := c.Validate(); err != nil {
		t.Error(err)
	}
	if s := c.String(); !strings.Contains(s, "cp(-a/2) q0,q1") || !strings.Contains(s, "u(a, b, π/4) q1") {
		t.Errorf("String:\n%s", s)
	}
}

func TestFromCircuit(t *testing.T) {
	c := circuit.New(2).H(0).RZ(0.5, 1).U(1, 2, 3, 0).CX(0, 1)
	p, err := FromCircuit(c)
	if err != nil {
		t.Fatal(err)
	}
	if len(p.Params()) != 0 {
		t.Errorf("params %v", p.Params())
	}
	back, err := p.Bind(nil)
	if err != nil || !back.Equal(c) {
		t.Errorf("bound back to %v (%v), want %v", back, err, c)
	}
	if _, err := FromCircuit(circuit.New(1).Measure(0, 0)); err == nil {
		t.Error("a measurement was accepted")
	}
}
