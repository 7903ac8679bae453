package gen

import (
	"fmt"
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// Dense check of Clifford circuits, independent of the generator: gate
// matrices from Nielsen & Chuang (§4.2 and Fig. 4.3), the convention of
// package circuit's documentation (qubit 0 is the least significant bit of a basis index; cx's
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
var (
	pauliCache   = map[string][]complex128{}
	stringsCache = map[int][]string{}
)

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
	if stringsCache[n] == nil {
		stringsCache[n] = pauliStrings(n)
	}
	for _, s := range stringsCache[n] {
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

// cliffordClassOf checks that c is written with h, s, cx and Paulis only,
// and returns its class modulo phase (see cliffordClass).
func cliffordClassOf(c *circuit.Circuit) (string, error) {
	if err := c.Validate(); err != nil {
		return "", err
	}
	ops := make([]denseOp, len(c.Ops))
	for i, op := range c.Ops {
		if len(op.Gate.Params) != 0 || op.Gate.IsCustom() {
			return "", fmt.Errorf("op %d is %v, not h, s, cx or a Pauli", i, op)
		}
		ops[i] = denseOp{op.Gate.Name, op.Qubits}
	}
	u, err := denseOf(c.Qubits(), ops)
	if err != nil {
		return "", err
	}
	return cliffordClass(c.Qubits(), u)
}

// cliffordGroupSize is the order of the n-qubit Clifford group modulo phase,
// 4^n·|Sp(2n, F_2)| = 2^{n²+2n} ∏_{j=1}^{n} (4^j − 1) (Koenig & Smolin 2014,
// §2; 24 for n = 1, 11520 for n = 2).
func cliffordGroupSize(n int) int {
	size := 1 << (n*n + 2*n)
	for j := 1; j <= n; j++ {
		size *= 1<<(2*j) - 1
	}
	return size
}

func TestCliffordIsClifford(t *testing.T) {
	// Every drawn circuit conjugates each X_k and Z_k to ± a Pauli string
	// (the definition of the Clifford group, Nielsen & Chuang §10.5.2),
	// checked on its dense matrix built from textbook gate matrices.
	for _, c := range []struct{ qubits, draws int }{{1, 100}, {2, 200}, {3, 100}, {4, 10}} {
		for seed := range c.draws {
			circ := Clifford(c.qubits).Example(seed)
			if circ.Qubits() != c.qubits {
				t.Fatalf("Clifford(%d) drew a circuit on %d qubits", c.qubits, circ.Qubits())
			}
			if _, err := cliffordClassOf(circ); err != nil {
				t.Fatalf("Clifford(%d), seed %d: %v\n%v", c.qubits, seed, err, circ)
			}
		}
	}
}

// chiSquareUniform returns Pearson's statistic of the class counts against
// the uniform law on k classes, and the number of distinct classes seen.
func chiSquareUniform(counts map[string]int, k int) (float64, int) {
	n := 0
	for _, c := range counts {
		n += c
	}
	want := float64(n) / float64(k)
	chi2 := float64(k-len(counts)) * want // classes never seen
	for _, c := range counts {
		chi2 += (float64(c) - want) * (float64(c) - want) / want
	}
	return chi2, len(counts)
}

func TestCliffordUniformOneQubit(t *testing.T) {
	// All 24 one-qubit Cliffords modulo phase equally likely: chi-square with
	// 23 degrees of freedom, critical value chi2.isf(5e-7, 23) = 72.4834 from
	// SciPy (testdata/gen/reference.txt). Two checks (Example, rapid.Check)
	// at 5e-7 each: false failure ≤ 1e-6 per run.
	const crit = 72.4833615612303
	example, checked := drawAll(t, Clifford(1), 24*400, 1)
	for name, sample := range map[string][]*circuit.Circuit{"Example": example, "rapid.Check": checked} {
		counts := map[string]int{}
		for _, c := range sample {
			class, err := cliffordClassOf(c)
			if err != nil {
				t.Fatal(err)
			}
			counts[class]++
		}
		chi2, seen := chiSquareUniform(counts, cliffordGroupSize(1))
		if seen > 24 || chi2 > crit {
			t.Errorf("via %s: %d classes, chi-square %.1f > %.1f", name, seen, chi2, crit)
		}
	}
}

func TestCliffordUniformTwoQubits(t *testing.T) {
	// All 11520 two-qubit Cliffords modulo phase equally likely: chi-square
	// with 11519 degrees of freedom, critical value chi2.isf(1e-6, 11519) =
	// 12254.94 from SciPy (testdata/gen/reference.txt); one check, false
	// failure ≤ 1e-6 per run. Six draws per class on average (30 with -gen.long): Pearson's
	// statistic for equal cell probabilities has mean k−1 and variance
	// 2(k−1)(1−1/N) whatever the counts (Cochran, Ann. Math. Stat. 23 (1952)
	// 315–345, from memory), and with k = 11520 cells its law is close to the
	// chi-square law (skewness ≈ 0.03). Drawn with Example only, to keep the
	// run short.
	const crit = 12254.93801260624
	k := cliffordGroupSize(2)
	counts := map[string]int{}
	for seed := range sampleSize(6, 5) * k {
		class, err := cliffordClassOf(Clifford(2).Example(seed))
		if err != nil {
			t.Fatal(err)
		}
		counts[class]++
	}
	chi2, seen := chiSquareUniform(counts, k)
	if seen > k || chi2 > crit {
		t.Errorf("%d classes (of %d), chi-square %.1f > %.1f", seen, k, chi2, crit)
	}
}

func TestCliffordShrinksTowardIdentity(t *testing.T) {
	got := shrunk(t, Clifford(3), func(c *circuit.Circuit) bool { return c.Len() > 0 })
	// The shrinker lowers bits one at a time, so it may stop at a one-qubit
	// Clifford written with up to three gates (h·s·h).
	if got.Len() < 1 || got.Len() > 3 {
		t.Errorf("a nonempty Clifford shrinks to %d ops, want 1 to 3:\n%v", got.Len(), got)
	}
	if c := Clifford(3).Example(0); c.Len() == 0 {
		t.Errorf("seed 0 drew the identity; draws should be generic")
	}
}
