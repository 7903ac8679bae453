package qasm

import (
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// textbookU is u(θ,φ,λ) as package circuit's documentation and the OpenQASM 2.0 paper (arXiv:1707.03429, eq. 2,
// with the phase that makes u(0,0,λ) = diag(1, e^{iλ})) write it.
func textbookU(theta, phi, lambda float64) []complex128 {
	c, s := complex(math.Cos(theta/2), 0), complex(math.Sin(theta/2), 0)
	e := func(x float64) complex128 { return cmplx.Exp(complex(0, x)) }
	return []complex128{c, -e(lambda) * s, e(phi) * s, e(phi+lambda) * c}
}

// controlledBy returns the matrix of m with k controls in front (N&C §4.3: identity unless
// every control is 1).
func controlledBy(k int, m []complex128) []complex128 {
	d := int(math.Sqrt(float64(len(m))))
	n := d << k
	out := make([]complex128, n*n)
	for i := 0; i < n-d; i++ {
		out[i*n+i] = 1
	}
	for i := 0; i < d; i++ {
		for j := 0; j < d; j++ {
			out[(n-d+i)*n+n-d+j] = m[i*d+j]
		}
	}
	return out
}

// unitaryOfSource parses src and returns its dense unitary.
func unitaryOfSource(t *testing.T, src string) *mat.CDense {
	t.Helper()
	c := mustParse(t, src).Circuit
	u, err := sim.Unitary(c)
	if err != nil {
		t.Fatalf("sim.Unitary: %v", err)
	}
	return u
}

// maxEntryDiff is the largest |a_ij − b_ij|: no phase is forgiven.
func maxEntryDiff(a *mat.CDense, b []complex128) float64 {
	n, _ := a.Dims()
	worst := 0.0
	for i := 0; i < n; i++ {
		for j := 0; j < n; j++ {
			worst = math.Max(worst, cmplx.Abs(a.At(i, j)-b[i*n+j]))
		}
	}
	return worst
}

// operands lists q[n-1], …, q[0], so that the gate's first operand is the circuit's most
// significant qubit and the circuit's matrix is the gate's textbook matrix.
func operands(n int) string {
	var parts []string
	for q := n - 1; q >= 0; q-- {
		parts = append(parts, "q["+string(rune('0'+q))+"]")
	}
	return strings.Join(parts, ",")
}

// The qelib1 gates that Parse expands must have the exact textbook matrix, global phase
// included: controlled-U as in N&C §4.3, multiply controlled X as in N&C §4.3 Fig. 4.10's
// definition, √X = HSH (N&C exercise 4.2 style: (HSH)² = HZH = X).
func TestQelib1Expansions(t *testing.T) {
	const tol = 1e-12
	sx := []complex128{0.5 + 0.5i, 0.5 - 0.5i, 0.5 - 0.5i, 0.5 + 0.5i}
	x := []complex128{0, 1, 1, 0}
	th, ph, la, ga := 0.7, -1.3, 2.9, 0.4
	withPhase := func(g complex128, m []complex128) []complex128 {
		out := make([]complex128, len(m))
		for i := range m {
			out[i] = g * m[i]
		}
		return out
	}
	cases := []struct {
		call  string
		width int
		want  []complex128
	}{
		{"u3(0.7,-1.3,2.9)", 1, textbookU(th, ph, la)},
		{"u2(-1.3,2.9)", 1, textbookU(math.Pi/2, ph, la)},
		{"u1(2.9)", 1, textbookU(0, 0, la)},
		{"U(0.7,-1.3,2.9)", 1, textbookU(th, ph, la)},
		{"u0(3)", 1, []complex128{1, 0, 0, 1}},
		{"cu1(2.9)", 2, controlledBy(1, textbookU(0, 0, la))},
		{"cu3(0.7,-1.3,2.9)", 2, controlledBy(1, textbookU(th, ph, la))},
		{"cu(0.7,-1.3,2.9,0.4)", 2, controlledBy(1, withPhase(cmplx.Exp(complex(0, ga)), textbookU(th, ph, la)))},
		{"csx", 2, controlledBy(1, sx)},
		{"c3x", 4, controlledBy(3, x)},
		{"c3sqrtx", 4, controlledBy(3, sx)},
		{"c4x", 5, controlledBy(4, x)},
	}
	for _, tc := range cases {
		src := head + "qreg q[" + string(rune('0'+tc.width)) + "];\n" + tc.call + " " + operands(tc.width) + ";"
		if d := maxEntryDiff(unitaryOfSource(t, src), tc.want); d > tol {
			t.Errorf("%s: largest entry off by %.3g from the textbook matrix", tc.call, d)
		}
	}
}

// The definitions Format writes for gates outside qelib1 must have exactly the matrix of the
// gate in package circuit (and they agree with NumPy: testdata/qasm/format_defs.py). Renamed so
// that Parse expands the body instead of recognising it.
func TestFormatDefinitionsExact(t *testing.T) {
	for name, def := range formatDefs {
		g, _ := circuit.Lookup(name)
		params := make([]float64, g.Params)
		call := "mine"
		for i := range params {
			params[i] = 0.81 * float64(i+1)
			call += "(0.81)"
		}
		gate, err := circuit.NewGate(name, params...)
		if err != nil {
			t.Fatal(err)
		}
		body := strings.Replace(def, "gate "+name, "gate mine", 1)
		src := head + body + "\nqreg q[" + string(rune('0'+g.Qubits)) + "];\n" + call + " " + operands(g.Qubits) + ";"
		if d := maxEntryDiff(unitaryOfSource(t, src), gate.Elements()); d > 1e-12 {
			t.Errorf("%s: definition off by %.3g", name, d)
		}
		// Unrenamed, Parse reads the definition back as the gate itself.
		src = head + def + "\nqreg q[" + string(rune('0'+g.Qubits)) + "];\n" + strings.Replace(call, "mine", name, 1) + " " + operands(g.Qubits) + ";"
		c := mustParse(t, src).Circuit
		if len(c.Ops) != 1 || c.Ops[0].Gate.Name != name {
			t.Errorf("%s: canonical definition read as %v", name, c.Ops)
		}
	}
}

// A changed body, even by one token, must not be taken for the gate: it is expanded instead.
func TestNearCanonicalDefinitionExpanded(t *testing.T) {
	src := head + "gate ccz a,b,c { h c; ccx a,b,c; h b; }\nqreg q[3];\nccz q[0],q[1],q[2];"
	c := mustParse(t, src).Circuit
	if !c.Equal(circuit.New(3).H(2).CCX(0, 1, 2).H(1)) {
		t.Errorf("got %v", c.Ops)
	}
}
