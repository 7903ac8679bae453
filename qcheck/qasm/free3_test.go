package qasm

import (
	"math"
	"math/big"
	"strings"
	"testing"
)

// FreeInputs: an input float without a value is a free parameter, and the angles that read it
// come out as the affine expressions the source writes, with exact rational coefficients
// (common practice: 0.1 in a source means one tenth, not the nearest double).
func TestFreeInputsAngles(t *testing.T) {
	src := std + `input float a;
input float[64] b;
qubit[2] q;
const int k = 3;
rz(2*a - pi/2) q[0];
rx(0.1*a) q[1];
cp(-a/3 + b) q[0], q[1];
U(a, b + 0.5, 1.0) q[0];
for int i in [1:2] { ry(i*b) q[1]; }
h q[0];
rz(k*a/4) q[0];
rz(a*(1/2) + a/(1/2.0)) q[0];
`
	p, err := ParseProgram([]byte(src), FreeInputs())
	if err != nil {
		t.Fatal(err)
	}
	// Each angle as the source writes it: constant, then the coefficients of a and b.
	type angle struct {
		c    float64
		a, b *big.Rat
	}
	r := big.NewRat
	want := map[int][]angle{
		0: {{-math.Pi / 2, r(2, 1), r(0, 1)}},
		1: {{0, r(1, 10), r(0, 1)}},
		2: {{0, r(-1, 3), r(1, 1)}},
		3: {{0, r(1, 1), r(0, 1)}, {0.5, r(0, 1), r(1, 1)}, {1, r(0, 1), r(0, 1)}},
		4: {{0, r(0, 1), r(1, 1)}},
		5: {{0, r(0, 1), r(2, 1)}},
		7: {{0, r(3, 4), r(0, 1)}},
		8: {{0, r(2, 1), r(0, 1)}}, // 1/2 is integer division, 0 (OpenQASM 3 specification)
	}
	names := []string{"rz", "rx", "cp", "u", "ry", "ry", "h", "rz", "rz"}
	if strings.Join(p.Free, ",") != "a,b" || len(p.Circuit.Ops) != len(names) || len(p.Angles) != len(want) {
		t.Fatalf("free %v, ops %v, angles %v", p.Free, p.Circuit.Ops, p.Angles)
	}
	coef := func(a Angle, name string) *big.Rat {
		if c, ok := a.Coefs[name]; ok {
			return c
		}
		return new(big.Rat)
	}
	for i, op := range p.Circuit.Ops {
		if op.Gate.Name != names[i] {
			t.Errorf("op %d: %v, want %s", i, op, names[i])
		}
		got := p.Angles[i]
		if len(got) != len(want[i]) {
			t.Fatalf("op %d: angles %v, want %v", i, got, want[i])
		}
		for k, w := range want[i] {
			g := got[k]
			if g.Const != w.c || coef(g, "a").Cmp(w.a) != 0 || coef(g, "b").Cmp(w.b) != 0 || len(g.Params()) > 2 {
				t.Errorf("op %d angle %d: got %v, want %v", i, k, g, w)
			}
		}
	}
	// The angles at given values are those the numeric reader computes from the same values.
	vals := map[string]float64{"a": 0.7, "b": -1.3}
	num, err := ParseProgram([]byte(src), Inputs(vals))
	if err != nil {
		t.Fatal(err)
	}
	for i, angles := range p.Angles {
		for k, g := range angles {
			x := g.Const
			for name, c := range g.Coefs {
				f, _ := c.Float64()
				x += f * vals[name]
			}
			if y := num.Circuit.Ops[i].Gate.Params[k]; math.Abs(x-y) > 1e-12 {
				t.Errorf("op %d angle %d: %v at %v, numeric reader %v", i, k, x, vals, y)
			}
		}
	}
	// Without free inputs the program has no parametric form, and without the option an input
	// still needs a value.
	if p, err := ParseProgram([]byte(std+"qubit q;\nrz(0.5) q;"), FreeInputs()); err != nil || p.Angles != nil || p.Free != nil {
		t.Errorf("no inputs: %v, %v", err, p)
	}
	if _, err := ParseProgram([]byte(src)); err == nil || !strings.Contains(err.Error(), "input a has no value") {
		t.Errorf("without FreeInputs: %v", err)
	}
}

// Every use of a free parameter that would not keep the angle affine with rational coefficients,
// or exactly the file's meaning, is refused at its line and column.
func TestFreeInputsRefused(t *testing.T) {
	head := std + "input float a;\nqubit[2] q;\n" // the body starts on line 5
	cases := []struct{ body, want string }{
		{"rz(a*a) q[0];", "5:5: multiplication of a free parameter"},
		{"rz(a*pi) q[0];", "5:5: multiplication of a free parameter"},
		{"rz(2/a) q[0];", "5:5: division of a free parameter"},
		{"rz(sin(a)) q[0];", "5:4: sin(…) on a free parameter"},
		{"rz(a**2) q[0];", "5:5: operator ** on a free parameter"},
		{"rz(float[32](a)) q[0];", "5:4: a cast to float[32] on a free parameter"},
		{"float b = a;", "5:11: input a used outside the angles of a gate call"},
		{"bit c;\nif (a > 0) { x q[0]; }", "6:5: input a used outside the angles"},
		{"for int i in [0:a] { x q[0]; }", "5:17: input a used outside"},
		{"a = 1.0;", "5:1: a is a free input parameter and cannot be assigned"},
		{"ctrl @ rz(a) q[0], q[1];", "5:8: gate rz with modifiers"},
		{"inv @ rz(a) q[0];", "5:7: gate rz with modifiers"},
		{"pow(a) @ rz(0.5) q[0];", "5:5: input a used outside"},
		{"u3(a, 0, 0) q[0];", "5:4: gate u3 takes a free input parameter"},
		{"gphase(a);", "5:8: gate gphase takes a free input parameter"},
		{"gate g(t) r { rz(t) r; }\ng(a) q[0];", "6:3: gate g takes a free input parameter"},
		{"gate g r { rz(a) r; }", "5:15: input a used outside"},
		{"bit c;\nc = measure q[0];\nif (c) { rz(a) q[1]; }", "7:10: gate rz under an if"},
	}
	for _, c := range cases {
		_, err := ParseProgram([]byte(head+c.body), FreeInputs())
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: got %v, want %q", c.body, err, c.want)
		}
	}
	for _, c := range []struct{ decl, want string }{
		{"input angle a;", "3:7: input a of type angle cannot be a free parameter"},
		{"input angle[8] a;", "3:7: input a of type angle[8] cannot be a free parameter"},
		{"input float[32] a;", "3:7: input a of type float[32] cannot be a free parameter"},
		{"input int a;", "3:7: input a of type int cannot be a free parameter"},
	} {
		_, err := ParseProgram([]byte(std+c.decl+"\nqubit q;\nrz(a) q;"), FreeInputs())
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: got %v, want %q", c.decl, err, c.want)
		}
	}
}
