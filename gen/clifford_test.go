package gen

import (
	"fmt"
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"pgregory.net/rapid"
)

// Dense check of Clifford circuits, independent of the generator: gate
// matrices from Nielsen & Chuang (§4.2 and Fig. 4.3), the convention of
// DESIGN.md (qubit 0 is the least significant bit of a basis index; cx's
// first operand is the control).

var oneQubit = map[string][4]complex128{ // row-major 2×2
	"h": {complex(1/math.Sqrt2, 0), complex(1/math.Sqrt2, 0), complex(1/math.Sqrt2, 0), complex(-1/math.Sqrt2, 0)},
	"s": {1, 0, 0, 1i},
	"x": {0, 1, 1, 0},
	"y": {0, -1i, 1i, 0},
	"z": {1, 0, 0, -1},
}

// denseOf returns the 2^n × 2^n matrix of a gate list (time order) as
// row-major data, by applying each gate to the columns of the identity.
func denseOf(n int, ops []denseOp) ([]complex128, error) {
	d := 1 << n
	u := make([]complex128, d*d)
	for i := range d {
		u[i*d+i] = 1
	}
	for _, op := range ops {
		if op.name == "cx" {
			c, t := op.qubits[0], op.qubits[1]
			for i := range d {
				if i>>c&1 == 1 && i>>t&1 == 0 { // swap rows i and i+2^t
					j := i | 1<<t
					for col := range d {
						u[i*d+col], u[j*d+col] = u[j*d+col], u[i*d+col]
					}
				}
			}
			continue
		}
		g, ok := oneQubit[op.name]
		if !ok || len(op.qubits) != 1 {
			return nil, fmt.Errorf("gate %s%v is not h, s, cx or a Pauli", op.name, op.qubits)
		}
		q := op.qubits[0]
		for i := range d {
			if i>>q&1 == 1 {
				continue
			}
			j := i | 1<<q
			for col := range d {
				a, b := u[i*d+col], u[j*d+col]
				u[i*d+col] = g[0]*a + g[1]*b
				u[j*d+col] = g[2]*a + g[3]*b
			}
		}
	}
	return u, nil
}

type denseOp struct {
	name   string
	qubits []int
}

// pauliMatrix returns the matrix of the Pauli string (letter k on qubit k).
func pauliMatrix(s string) []complex128 {
	n := len(s)
	d := 1 << n
	m := make([]complex128, d*d)
	for col := range d {
		row, amp := col, complex(1, 0)
		for q := range n {
			b := col >> q & 1
			switch s[q] {
			case 'X':
				row ^= 1 << q
			case 'Y':
				row ^= 1 << q
				amp *= []complex128{1i, -1i}[b]
			case 'Z':
				amp *= []complex128{1, -1}[b]
			}
		}
		m[row*d+col] = amp
	}
	return m
}

// pauliCache holds the matrices of Pauli strings already built (tests in this
// package do not run in parallel).
var pauliCache = map[string][]complex128{}

// pauliStrings lists all 4^n Pauli strings on n qubits.
func pauliStrings(n int) []string {
	out := []string{""}
	for range n {
		var next []string
		for _, s := range out {
			for _, c := range "IXYZ" {
				next = append(next, s+string(c))
			}
		}
		out = next
	}
	return out
}

// cliffordClass returns the images, with signs, of X_k and Z_k under the
// unitary u (row-major, 2^n × 2^n): the class of u in the Clifford group
// modulo phase (a Clifford is fixed up to phase by its action on these
// generators; Nielsen & Chuang §10.5.2). It fails if some image is not ± a
// Pauli string: then u is not Clifford.
func cliffordClass(n int, u []complex128) (string, error) {
	d := 1 << n
	var parts []string
	for k := range n {
		for _, letter := range "XZ" {
			gen := []byte(strings.Repeat("I", n))
			gen[k] = byte(letter)
			img := conjugateDense(u, pauliMatrix(string(gen)), d)
			s, err := asPauli(img, n)
			if err != nil {
				return "", fmt.Errorf("U %s U†: %v", gen, err)
			}
			parts = append(parts, s)
		}
	}
	return strings.Join(parts, " "), nil
}

// conjugateDense returns U·P·U† for row-major d×d matrices.
func conjugateDense(u, p []complex128, d int) []complex128 {
	up := make([]complex128, d*d)
	for i := range d {
		for k := range d {
			if x := u[i*d+k]; x != 0 {
				for j := range d {
					up[i*d+j] += x * p[k*d+j]
				}
			}
		}
	}
	out := make([]complex128, d*d)
	for i := range d {
		for j := range d {
			var s complex128
			for k := range d {
				s += up[i*d+k] * cmplx.Conj(u[j*d+k])
			}
			out[i*d+j] = s
		}
	}
	return out
}

// asPauli names the Hermitian matrix m as "±" and a Pauli string if it is
// one (within 1e-9), else returns an error. Decomposition: m = Σ_s c_s P_s
// with c_s = tr(P_s m)/d (the Pauli strings are an orthogonal basis under the
// trace inner product; Nielsen & Chuang §2.1.8); m is ± a Pauli string
// exactly when one coefficient is ±1.
func asPauli(m []complex128, n int) (string, error) {
	d := 1 << n
	for _, s := range pauliStrings(n) {
		p := pauliCache[s]
		if p == nil {
			p = pauliMatrix(s)
			pauliCache[s] = p
		}
		var c complex128 // tr(P m) = Σ_ij P_ij m_ji
		for i := range d {
			for j := range d {
				if p[i*d+j] != 0 {
					c += p[i*d+j] * m[j*d+i]
				}
			}
		}
		c /= complex(float64(d), 0)
		switch {
		case cmplx.Abs(c-1) < 1e-9:
			return "+" + s, nil
		case cmplx.Abs(c+1) < 1e-9:
			return "-" + s, nil
		case cmplx.Abs(c) > 1e-9:
			return "", fmt.Errorf("has a component %.3g on %s, not ±1", c, s)
		}
	}
	return "", fmt.Errorf("is zero")
}

func opsOf(c cliffordOps) []denseOp {
	out := make([]denseOp, len(c))
	for i, op := range c {
		out[i] = denseOp{op.name, op.qubits}
	}
	return out
}

func TestCliffordGeneratorInternal(t *testing.T) {
	g := rapid.Custom(func(t *rapid.T) cliffordOps { return drawClifford(t, 2) })
	seen := map[string]int{}
	for seed := range 20000 {
		u, err := denseOf(2, opsOf(g.Example(seed)))
		if err != nil {
			t.Fatal(err)
		}
		class, err := cliffordClass(2, u)
		if err != nil {
			t.Fatal(err)
		}
		seen[class]++
	}
	t.Logf("%d classes", len(seen))
}
