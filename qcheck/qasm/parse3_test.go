package qasm

import (
	"errors"
	"math"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

const std = "OPENQASM 3.0;\ninclude \"stdgates.inc\";\n"

// withIf returns c with op i conditioned.
func withIf(c *circuit.Circuit, i int, cond *circuit.Condition) *circuit.Circuit {
	c.Ops[i].If = cond
	return c
}

// The expected circuits are written by hand from the OpenQASM 3 specification (Cross et al.,
// ACM TQC 3(3), 2022): §2 (the version line may be left out), §3.1–3.2 (qubit and bit
// declarations, the built-in U, physical qubits $n), §4 (measure forms, reset, barrier), §5
// (classical types, casts, the operators' precedence), §6 (ranges include their end; for
// loops over ranges and sets; if/else), and the stdgates.inc mapping of the package
// documentation.
func TestParse3Statements(t *testing.T) {
	measured := func(c *circuit.Circuit) *circuit.Circuit { return c.SetBits(2) }
	e := math.E
	cases := []struct {
		name string
		src  string
		want *circuit.Circuit
	}{
		{"no version line, built-in U", "qubit q;\nU(1, 2, 3) q;", circuit.New(1).U(1, 2, 3, 0)},
		{"version 3 without .0, qreg", "OPENQASM 3;\nqreg q[2];\nU(0.5, 0, 0) q;",
			circuit.New(2).U(0.5, 0, 0, 0).U(0.5, 0, 0, 1)},
		{"constants π τ ℇ and their names", std + "qubit q;\nrz(π + pi) q;\nrz(τ - tau) q;\nrz(ℇ * euler) q;",
			circuit.New(1).RZ(2*math.Pi, 0).RZ(0, 0).RZ(e*e, 0)}, // e*e rounded as float64 arithmetic, not as a Go constant
		{"block comments", std + "qubit /* one */ q; /* a\nb */ x q;", circuit.New(1).X(0)},
		{"measure forms", std + "qubit[3] q;\nbit[3] c;\nc = measure q;\nc[0] = measure q[2];\nmeasure q[0:1] -> c[1:2];\nbit b = measure q[1];",
			circuit.New(3).Measure(0, 0).Measure(1, 1).Measure(2, 2).Measure(2, 0).Measure(0, 1).Measure(1, 2).Measure(1, 3)},
		{"slices, steps, negative index, sets", std + "qubit[5] q;\nh q[0:2:4];\nx q[-1];\nz q[{3, 1}];",
			circuit.New(5).H(0).H(2).H(4).X(4).Z(3).Z(1)},
		{"broadcast of a slice with a qubit", std + "qubit[3] q;\ncx q[0], q[1:2];",
			circuit.New(3).CX(0, 1).CX(0, 2)},
		{"for over a range includes its end; negative steps; sets", std + "qubit[3] q;\nfor int i in [0:2] { rx(i) q[i]; }\nfor i in [2:-2:0] { h q[i]; }\nfor uint j in {1, 1} { z q[j]; }",
			circuit.New(3).RX(0, 0).RX(1, 1).RX(2, 2).H(2).H(0).Z(1).Z(1)},
		{"classical arithmetic, casts, comparisons", std + "const int n = 5;\nint[4] k = n * 3;\nuint[3] u = 9;\nfloat f = n / 2;\nfloat g = n / 2.0;\nbool b = bool(k) && u == 1 && f == 2;\nqubit q;\nif (b) rz(g) q;\nif (!b) x q;\nrz(int[4](k + 1)) q;\nrz(k >> 1) q;\nrz(2 ** 3 ** 2 - -2 ** 2) q;",
			circuit.New(1).RZ(2.5, 0).RZ(0, 0).RZ(-1, 0).RZ(516, 0)},
		{"angles wrap to [0, 2π)", std + "angle a = -π/2;\nangle[2] b = 1;\nqubit q;\nrz(a) q;\nrz(b) q;",
			circuit.New(1).RZ(3*math.Pi/2, 0).RZ(math.Pi/2, 0)},
		{"bits of integers", std + "int m = 6;\nqubit q;\nif (bool(m[1]) && !bool(m[0])) h q;",
			circuit.New(1).H(0)},
		{"compound assignment in a loop", std + "int sum = 0;\nfor i in [1:4] { sum += i; }\nqubit q;\nrz(sum) q;",
			circuit.New(1).RZ(10, 0)},
		{"if on a measured bit, else", std + "qubit[2] q;\nbit[2] c;\nc[0] = measure q[0];\nif (c[0]) x q[1]; else { y q[1]; z q[1]; }",
			func() *circuit.Circuit {
				c := measured(circuit.New(2).Measure(0, 0).X(1).Y(1).Z(1))
				c.Ops[1].If = &circuit.Condition{Bits: []int{0}, Value: 1}
				c.Ops[2].If = &circuit.Condition{Bits: []int{0}, Value: 1, Not: true}
				c.Ops[3].If = &circuit.Condition{Bits: []int{0}, Value: 1, Not: true}
				return c
			}()},
		{"register conditions ==, !=, casts, && of bits", std + "qubit[2] q;\nbit[2] c;\nif (c == 2) x q[0];\nif (int[2](c) != 1) x q[0];\nif (c[1] == 0 && c[0] == 1) x q[0];\nif (!c[1]) x q[0];",
			func() *circuit.Circuit {
				c := measured(circuit.New(2).X(0).X(0).X(0).X(0))
				c.Ops[0].If = &circuit.Condition{Bits: []int{0, 1}, Value: 2}
				c.Ops[1].If = &circuit.Condition{Bits: []int{0, 1}, Value: 1, Not: true}
				c.Ops[2].If = &circuit.Condition{Bits: []int{1, 0}, Value: 2}
				c.Ops[3].If = &circuit.Condition{Bits: []int{1}, Value: 1, Not: true}
				return c
			}()},
		{"physical qubits", std + "h $2;\ncx $2, $0;", circuit.New(3).H(2).CX(2, 0)},
		{"gphase is p(2γ) rz(−2γ): e^{iγ} exactly", std + "qubit[2] q;\ngphase(0.25);\nctrl @ gphase(0.5) q[1];",
			circuit.New(2).P(0.5, 0).RZ(-0.5, 0).P(0.5, 1)},
		{"reset, barrier of all qubits", std + "qubit[2] q;\nreset q;\nbarrier;\nbarrier q[1];",
			circuit.New(2).Reset(0).Reset(1).Barrier(0, 1).Barrier(1)},
		{"gate definitions with modifiers and parameters", std + "gate g(a) x, y { ctrl @ rz(a/2) x, y; inv @ s y; }\nqubit[2] q;\ng(0.5) q[1], q[0];\ninv @ g(1) q[0], q[1];",
			circuit.New(2).CRZ(0.25, 1, 0).Sdg(0).S(1).CRZ(-0.5, 0, 1)},
		{"u2 and u3 carry the specification's phase", std + "qubit q;\nu3(1, 2, 3) q;\nu2(2, 3) q;",
			circuit.New(1).RZ(3, 0).RY(1, 0).RZ(2, 0).RZ(3, 0).RY(math.Pi/2, 0).RZ(2, 0)},
	}
	for _, tc := range cases {
		p, err := ParseProgram([]byte(tc.src))
		if err != nil {
			t.Errorf("%s: %v", tc.name, err)
			continue
		}
		if !p.Circuit.Equal(tc.want) || p.Circuit.Qubits() != tc.want.Qubits() {
			t.Errorf("%s:\n got %v\nwant %v", tc.name, p.Circuit.Ops, tc.want.Ops)
		}
	}
}

// Inputs: input angle θ; takes its value from the Inputs option, and is recorded.
func TestParse3Inputs(t *testing.T) {
	src := std + "input angle θ;\ninput float[64] φ;\nqubit q;\nrz(θ + φ) q;"
	p, err := ParseProgram([]byte(src), Inputs(map[string]float64{"θ": 0.5, "φ": -1}))
	if err != nil {
		t.Fatal(err)
	}
	if !p.Circuit.Equal(circuit.New(1).RZ(-0.5, 0)) || strings.Join(p.Inputs, ",") != "θ,φ" {
		t.Errorf("got %v, inputs %v", p.Circuit.Ops, p.Inputs)
	}
	_, err = ParseProgram([]byte(src), Inputs(map[string]float64{"θ": 0.5}))
	if err == nil || !strings.Contains(err.Error(), "4:17: input φ has no value") {
		t.Errorf("missing input: %v", err)
	}
}

// Everything outside the subset is refused at its line and column, naming the construct; so are
// conditions that bits == value cannot express, and loops past the limit.
func TestParse3Errors(t *testing.T) {
	cases := []struct {
		src       string
		line, col int
		words     string
	}{
		{std + "def f(qubit a) { h a; }", 3, 1, "subroutines (def)"},
		{std + "qubit q;\nwhile (true) { x q; }", 4, 1, "while loops are not supported"},
		{std + "extern f(int) -> int;", 3, 1, "extern"},
		{std + "defcal x $0 { }", 3, 1, "calibrations (defcal)"},
		{std + "cal { }", 3, 1, "calibration blocks (cal)"},
		{std + "qubit q;\ndelay[100ns] q;", 4, 1, "delay is not supported"},
		{std + "qubit q;\nbox { x q; }", 4, 1, "box is not supported"},
		{std + "duration d = 10ns;", 3, 1, "durations are not supported"},
		{std + "qubit q;\nrz(10ns) q;", 4, 4, "durations (10ns) are not supported"},
		{std + "stretch s;", 3, 1, "stretch"},
		{std + "array[int[8], 4] a;", 3, 1, "arrays beyond registers"},
		{std + "int i = 1;\nswitch (i) { }", 4, 1, "switch"},
		{std + "qubit[2] q;\nlet a = q[0];", 4, 1, "aliases (let)"},
		{std + "output bit c;", 3, 1, "output declarations"},
		{std + "#pragma foo", 3, 1, "pragmas"},
		{std + "qubit q;\n@mark x q;", 4, 1, "annotations"},
		{std + "complex z;", 3, 1, "complex"},
		{std + "qubit q;\nopaque g a;", 4, 1, "opaque"},
		{"OPENQASM 3;\nqubit q;\nx q;", 3, 1, "add include \"stdgates.inc\""},
		{std + "qubit q;\nfoo q;", 4, 1, "unknown gate, name or statement foo"},
		{std + "include \"other.inc\";", 3, 9, "only \"stdgates.inc\""},
		{"include \"qelib1.inc\";\nqreg q[1];", 1, 9, "start the file with OPENQASM 2.0;"},
		{std + "qubit[2] q;\nfor int i in [0:999999] { x q[0]; }", 4, 1, "for loop of 1000000 iterations: at most 32768"},
		{std + "qubit[2] q;\nbit[2] c;\nif (c[0] || c[1]) x q[0];", 5, 10, "cannot be written as bits == value"},
		{std + "qubit[2] q;\nbit[2] c;\nif (c[0]) { if (c[1]) x q[0]; }", 5, 13, "inside another"},
		{std + "qubit[2] q;\nbit[2] c;\nint k = 0;\nif (c[0]) k = 1;", 6, 11, "cannot be assigned under a condition on measured bits"},
		{std + "qubit q;\nbit c;\nint k = c;", 5, 9, "cannot hold a value that depends on measured bits"},
		{std + "bit[2] c = \"01\";", 3, 12, "other than 0"},
		{std + "qubit q;\nbit c;\nc = measure q;\nc = 0;", 6, 5, "cannot be set again"},
		{std + "qubit q;\nrz(1.0/0) q;", 4, 4, "angle 1 (θ) of rz evaluates to +Inf"},
		{std + "qubit q;\nrz(1/0) q;", 4, 5, "integer division by zero"},
		{std + "int x = 1 / 0;", 3, 11, "division by zero"},
		{std + "qubit[2] q;\nh q[2];", 4, 5, "index 2 out of range"},
		{std + "qubit[2] q;\ncx q[0], q[0];", 4, 10, "uses one qubit twice"},
		{std + "qubit q;\nctrl @ x q;", 4, 8, "acts on 2 qubit(s) here, got 1"},
		{std + "qubit[2] q;\npow(0.5) @ cx q[0], q[1];\npow(0.5) @ swap q[0], q[1];\npow(0.5) @ cu(1,2,3,4) q[0], q[1];", 6, 1, "applies to a single gate; gate cu has 2 statements"},
		{std + "qubit q;\nqubit q;", 4, 7, "already declared"},
		{std + "gate x a { }", 3, 6, "already defined"},
		{std + "qubit q;\n$0;", 4, 1, "unknown gate, name or statement $0"},
		{std + "qubit q;\nh $0;", 4, 3, "cannot use physical qubits"},
		{std + "const int n;", 3, 12, "needs a value"},
		{std + "qubit q;\nint[8] v;\nv[0] = 1;", 5, 2, "assigning to part of v"},
		{std + "qubit q;\nfor i in [0:1] { qubit r; }", 4, 18, "top level"},
		{"OPENQASM 3;\n/* open", 2, 1, "block comment not closed"},
		{std + "qubit q;\nrz(" + strings.Repeat("(", 300) + "1" + strings.Repeat(")", 300) + ") q;", 4, 205, "nested"},
	}
	for _, tc := range cases {
		_, err := ParseProgram([]byte(tc.src))
		var e *Error
		if !errors.As(err, &e) {
			t.Errorf("%q: error %v, want an *Error", tc.src, err)
			continue
		}
		if e.Line != tc.line || e.Col != tc.col || !strings.Contains(e.Msg, tc.words) {
			t.Errorf("%q:\n got %v\nwant %d:%d: …%s…", tc.src, err, tc.line, tc.col, tc.words)
		}
	}
}
