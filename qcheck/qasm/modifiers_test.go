package qasm

import (
	"fmt"
	"math"
	"math/cmplx"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
	"qcheck.dev/qcheck/sim"
)

// powerByEigenvectors returns the principal power m^k of a 2×2 unitary from its eigenvectors,
// written here independently of the reader's formula: m = V diag(λ1, λ2) V⁻¹ with V's columns
// the eigenvectors (b, λ−a) or (λ−d, c), and λ^k = e^{ik·arg λ} with arg in (−π, π].
func powerByEigenvectors(m mat2, k float64) mat2 {
	a, b, c, d := m[0], m[1], m[2], m[3]
	tr, det := a+d, a*d-b*c
	disc := cmplx.Sqrt(tr*tr - 4*det)
	l := []complex128{(tr + disc) / 2, (tr - disc) / 2}
	pw := func(x complex128) complex128 {
		th := cmplx.Phase(x)
		if th < -math.Pi+1e-12 {
			th = math.Pi
		}
		return cmplx.Exp(complex(0, k*th))
	}
	if cmplx.Abs(l[0]-l[1]) < 1e-9 { // m is a multiple of I
		return scale(pw(l[0]), ident(2))
	}
	if b == 0 && c == 0 { // diagonal: the eigenvectors are the basis
		return mat2{pw(a), 0, 0, pw(d)}
	}
	vec := func(x complex128) (complex128, complex128) {
		if cmplx.Abs(b) > cmplx.Abs(c) {
			return b, x - a
		}
		return x - d, c
	}
	v00, v10 := vec(l[0])
	v01, v11 := vec(l[1])
	v := mat2{v00, v01, v10, v11}
	vdet := v00*v11 - v01*v10
	vinv := mat2{v11 / vdet, -v01 / vdet, -v10 / vdet, v00 / vdet}
	return matMul(matMul(v, mat2{pw(l[0]), 0, 0, pw(l[1])}), vinv)
}

// intPower returns m^k for an integer k, inverting for k < 0.
func intPower(m mat2, k int) mat2 {
	if k < 0 {
		m, k = dagger(m), -k
	}
	d := int(math.Sqrt(float64(len(m))))
	out := ident(d)
	for ; k > 0; k-- {
		out = matMul(out, m)
	}
	return out
}

// negControlled returns negctrl @ m: m applies when the control, the first operand, is 0.
func negControlled(m mat2) mat2 {
	d := int(math.Sqrt(float64(len(m))))
	x := kron2(mat2{0, 1, 1, 0}, ident(d))
	return matMul(matMul(x, controlledBy(1, m)), x)
}

// Modifiers as the specification defines them (Cross et al. 2022, §3.4: ctrl @ adds a control,
// negctrl @ a control on 0, inv @ reverses and inverts, pow(k) @ composes k times, or for
// non-integer k takes the principal power) give the dense matrix built here from the
// specification's definition of each gate, global phase included, for random chains of
// modifiers on random gates of stdgates.inc.
func TestModifiersMatchDefinitions(t *testing.T) {
	cases := stdgatesCases()
	rapid.Check(t, func(t *rapid.T) {
		tc := rapid.SampledFrom(cases).Draw(t, "gate")
		m, width := tc.want, tc.width
		var mods []string
		for range rapid.IntRange(0, 3).Draw(t, "modifiers") {
			switch rapid.IntRange(0, 4).Draw(t, "modifier") {
			case 0:
				if width >= 5 {
					continue
				}
				m, width = controlledBy(1, m), width+1
				mods = append(mods, "ctrl @ ")
			case 1:
				if width >= 5 {
					continue
				}
				m, width = negControlled(m), width+1
				mods = append(mods, "negctrl @ ")
			case 2:
				m = dagger(m)
				mods = append(mods, "inv @ ")
			case 3:
				k := rapid.IntRange(-3, 3).Draw(t, "k")
				m = intPower(m, k)
				mods = append(mods, "pow("+strconv.Itoa(k)+") @ ")
			default:
				if width != 1 {
					continue
				}
				k := rapid.SampledFrom([]float64{0.5, -0.5, 0.25, 1.0 / 3, 2.5, -1.75}).Draw(t, "fraction")
				m = powerByEigenvectors(m, k)
				mods = append(mods, "pow("+strconv.FormatFloat(k, 'g', -1, 64)+") @ ")
			}
		}
		// The modifier written first is applied last.
		var b strings.Builder
		for i := len(mods) - 1; i >= 0; i-- {
			b.WriteString(mods[i])
		}
		src := "include \"stdgates.inc\";\nqubit[" + strconv.Itoa(width) + "] q;\n" + b.String() + tc.call + " " + operands(width) + ";\n"
		c, err := ParseProgram([]byte(src))
		if err != nil {
			t.Fatalf("%v\n%s", err, src)
		}
		if d := maxEntryDiff(unitaryOfCircuit(t, c), m); d > 1e-10 {
			t.Fatalf("%s: largest entry off by %.3g\nread as %v", src, d, c.Circuit.Ops)
		}
	})
}

// The standard library's own uses of pow: pow(1/2) @ z is s, pow(1/2) @ s is t, pow(1/2) @ x is
// sx, and ctrl @ with pow and inv on the library gates give the library's controlled gates.
func TestModifiersNamedCases(t *testing.T) {
	cases := []struct {
		src  string
		want string
	}{
		{"pow(1/2) @ z q[0];", "s q0"},
		{"pow(1/2) @ s q[0];", "t q0"},
		{"pow(1/2) @ x q[0];", "sx q0"},
		{"ctrl @ x q[0], q[1];", "cx q0,q1"},
		{"ctrl @ ctrl @ x q[0], q[1], q[2];", "ccx q0,q1,q2"},
		{"ctrl(2) @ z q[2], q[0], q[1];", "ccz q2,q0,q1"},
		{"ctrl @ cx q[1], q[2], q[0];", "ccx q1,q2,q0"},
		{"ctrl @ s q[0], q[1];", "cp(π/2) q0,q1"},
		{"ctrl @ rz(0.5) q[0], q[1];", "crz(0.5) q0,q1"},
		{"ctrl @ gphase(0.5) q[1];", "p(0.5) q1"},
		{"ctrl @ swap q[0], q[1], q[2];", "cswap q0,q1,q2"},
		{"inv @ sx q[0];", "sxdg q0"},
		{"inv @ U(1, 2, 3) q[0];", "u(-1,-3,-2) q0"},
		{"pow(3) @ t q[0];", "t q0 t q0 t q0"},
		{"pow(-2) @ s q[0];", "sdg q0 sdg q0"},
		{"negctrl @ x q[0], q[1];", "x q0 cx q0,q1 x q0"},
	}
	for _, tc := range cases {
		p, err := ParseProgram([]byte("include \"stdgates.inc\";\nqubit[3] q;\n" + tc.src))
		if err != nil {
			t.Errorf("%s: %v", tc.src, err)
			continue
		}
		var got []string
		for _, op := range p.Circuit.Ops {
			got = append(got, op.String())
		}
		if tc.src[:4] == "pow(" && len(got) == 3 && strings.HasPrefix(got[0], "u(") {
			// A fractional power is written u(θ,φ,λ) and its phase: check the matrix instead.
			name := strings.Fields(tc.want)[0]
			want := map[string]mat2{"s": specS, "t": specT, "sx": specSX}[name]
			c := p.Circuit
			c2 := c.Clone()
			c2.Ops = c2.Ops[:0]
			for _, op := range c.Ops {
				if op.Qubits[0] == 0 {
					c2.Ops = append(c2.Ops, op)
				}
			}
			one := mustParse(t, "qubit q;\n"+fmt.Sprintf("%s", "U(0,0,0) q;")).Circuit
			one.Ops = c2.Ops
			if d := maxEntryDiff(unitaryOfCircuit(t, &Program{Circuit: one}), want); d > 1e-12 {
				t.Errorf("%s: off by %.3g from %s", tc.src, d, name)
			}
			continue
		}
		if strings.Join(got, " ") != tc.want {
			t.Errorf("%s: read as %q, want %q", tc.src, strings.Join(got, " "), tc.want)
		}
	}
}

// unitaryOfCircuit returns the dense unitary of a read program's circuit.
func unitaryOfCircuit(t interface {
	Helper()
	Fatalf(string, ...any)
}, p *Program) *mat.CDense {
	t.Helper()
	u, err := sim.Unitary(p.Circuit)
	if err != nil {
		t.Fatalf("sim.Unitary: %v", err)
	}
	return u
}
