package sim

import (
	"fmt"
	"math"
	"math/cmplx"
	"math/rand/v2"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// tableauOf builds the tableau or fails the test.
func tableauOf(t *testing.T, c *circuit.Circuit) *Tableau {
	t.Helper()
	tab, err := NewTableau(c)
	if err != nil {
		t.Fatalf("NewTableau: %v", err)
	}
	return tab
}

// Conjugation rules of Nielsen & Chuang, Fig. 10.7 (§10.5.2): how CNOT, H, S, X, Y, Z transform
// X and Z. CZ is from the same section's exercises; the sx and sxdg lines follow from
// sx = H S H (checked against the dense engine below) and are written from memory.
func TestTableauTextbookRules(t *testing.T) {
	cases := []struct {
		name   string
		c      *circuit.Circuit
		images []string // X_0, X_1, …, Z_0, Z_1, …
	}{
		{"H", circuit.New(1).H(0), []string{"+Z0", "+X0"}},
		{"S", circuit.New(1).S(0), []string{"+Y0", "+Z0"}},
		{"Sdg", circuit.New(1).Sdg(0), []string{"−Y0", "+Z0"}},
		{"X", circuit.New(1).X(0), []string{"+X0", "−Z0"}},
		{"Y", circuit.New(1).Y(0), []string{"−X0", "−Z0"}},
		{"Z", circuit.New(1).Z(0), []string{"−X0", "+Z0"}},
		{"SX", circuit.New(1).SX(0), []string{"+X0", "−Y0"}},
		{"SXdg", circuit.New(1).SXdg(0), []string{"+X0", "+Y0"}},
		{"CNOT(0→1)", circuit.New(2).CX(0, 1), []string{"+X0 X1", "+X1", "+Z0", "+Z0 Z1"}},
		{"CNOT(1→0)", circuit.New(2).CX(1, 0), []string{"+X0", "+X0 X1", "+Z0 Z1", "+Z1"}},
		{"CZ", circuit.New(2).CZ(0, 1), []string{"+X0 Z1", "+Z0 X1", "+Z0", "+Z1"}},
		{"SWAP", circuit.New(2).SWAP(0, 1), []string{"+X1", "+X0", "+Z1", "+Z0"}},
		// H X H = Z and S X S† = Y give H·S: X ↦ S(X)=Y ↦ H Y H = −Y (N&C ex. 4.14).
		{"S then H", circuit.New(1).S(0).H(0), []string{"−Y0", "+X0"}},
		{"identity on 3", circuit.New(3).I(1).Barrier(0, 1, 2), []string{"+X0", "+X1", "+X2", "+Z0", "+Z1", "+Z2"}},
	}
	for _, tc := range cases {
		tab := tableauOf(t, tc.c)
		n := tc.c.Qubits()
		for q := 0; q < n; q++ {
			if got := tab.ImageX(q).String(); got != tc.images[q] {
				t.Errorf("%s: X%d ↦ %s, want %s", tc.name, q, got, tc.images[q])
			}
			if got := tab.ImageZ(q).String(); got != tc.images[n+q] {
				t.Errorf("%s: Z%d ↦ %s, want %s", tc.name, q, got, tc.images[n+q])
			}
		}
	}
}

// parsePauli reads the "+X0 Z3" / "−Y1" form back into a sign and one letter per qubit, so that
// the dense check below does not rely on the tableau's own bit layout.
func parsePauli(t *testing.T, s string, n int) (neg bool, letters []byte) {
	t.Helper()
	letters = []byte(strings.Repeat("I", n))
	switch {
	case strings.HasPrefix(s, "+"):
		s = s[1:]
	case strings.HasPrefix(s, "−"):
		neg, s = true, s[len("−"):]
	default:
		t.Fatalf("Pauli %q has no sign", s)
	}
	if s == "I" {
		return neg, letters
	}
	for _, f := range strings.Fields(s) {
		q, err := strconv.Atoi(f[1:])
		if err != nil || q < 0 || q >= n || !strings.ContainsRune("XYZ", rune(f[0])) {
			t.Fatalf("bad factor %q in %q", f, s)
		}
		letters[q] = f[0]
	}
	return neg, letters
}

// applyPauliDense returns P|b⟩ = ph·|to⟩ for the Pauli string given by letters and sign, with
// X|b⟩ = |1−b⟩, Z|b⟩ = (−1)^b|b⟩, Y|b⟩ = i(−1)^b|1−b⟩ (Nielsen & Chuang §2.1.3).
func applyPauliDense(neg bool, letters []byte, b int) (to int, ph complex128) {
	to, ph = b, 1
	if neg {
		ph = -1
	}
	for q, l := range letters {
		bit := b >> q & 1
		switch l {
		case 'X':
			to ^= 1 << q
		case 'Y':
			to ^= 1 << q
			ph *= 1i
			if bit == 1 {
				ph = -ph
			}
		case 'Z':
			if bit == 1 {
				ph = -ph
			}
		}
	}
	return to, ph
}

// checkAgainstDense checks U P = P' U for every generator P and its tableau image P', with U from
// the dense engine; this is U P U† = P' without a matrix product.
func checkAgainstDense(t *testing.T, c *circuit.Circuit, u *mat.CDense) {
	t.Helper()
	if msg := denseMismatch(t, c, u); msg != "" {
		t.Fatal(msg)
	}
}

// denseMismatch describes the first generator whose tableau image disagrees with the matrix u,
// or returns "".
func denseMismatch(t *testing.T, c *circuit.Circuit, u *mat.CDense) string {
	t.Helper()
	tab := tableauOf(t, c)
	n := c.Qubits()
	d := 1 << n
	for r := 0; r < 2*n; r++ {
		gen, img := PauliX(n, r%n), tab.ImageX(r%n)
		if r >= n {
			gen, img = PauliZ(n, r-n), tab.ImageZ(r-n)
		}
		gn, gl := parsePauli(t, gen.String(), n)
		in, il := parsePauli(t, img.String(), n)
		worst := 0.0
		for b := 0; b < d; b++ {
			// Column b of U P is ph·(column `to` of U).
			to, ph := applyPauliDense(gn, gl, b)
			for i := 0; i < d; i++ {
				// Row i of P' U: (P'U)_{i,b} = ph'·U_{j,b} where P'|j⟩ = ph'|i⟩.
				j, phj := applyPauliDense(in, il, i) // P' is its own inverse up to sign: P'|i⟩ = phj|j⟩
				lhs := u.At(i, to) * ph
				rhs := u.At(j, b) * cmplx.Conj(phj)
				worst = math.Max(worst, cmplx.Abs(lhs-rhs))
			}
		}
		if worst > 1e-12 {
			return fmt.Sprintf("%v: generator %v ↦ %v by the tableau, but U P − P' U has an entry of size %.3g", c.Ops, gen, img, worst)
		}
	}
	return ""
}

// The dense check above can fail: the tableau of S against the matrix of S† (S X S† = Y but
// S† X S = −Y, Nielsen & Chuang Fig. 10.7).
func TestDenseCheckDetectsMismatch(t *testing.T) {
	if denseMismatch(t, circuit.New(1).S(0), unitaryOf(t, circuit.New(1).Sdg(0))) == "" {
		t.Error("the tableau of S matched the matrix of S†")
	}
}

// randomClifford builds a random circuit from every Clifford gate the tableau accepts, with angles
// at the multiples that make the rotations Clifford, plus two custom Clifford gates.
func randomClifford(rng *rand.Rand, n, ops int) *circuit.Circuit {
	hs, _ := circuit.Custom("hs", mat.NewCDense(2, 2, []complex128{
		complex(sqrtHalf, 0), complex(0, sqrtHalf), complex(sqrtHalf, 0), complex(0, -sqrtHalf)}))
	// A two-qubit Clifford: the matrix of CX(0,1)·H(1), as the dense engine builds it.
	cxh, _ := Unitary(circuit.New(2).H(1).CX(0, 1))
	two, _ := circuit.Custom("cxh", cxh)
	// A three-qubit Clifford, to reach the tableau's path for gates on more than two qubits.
	u3, _ := Unitary(circuit.New(3).H(0).CX(0, 2).S(1).CZ(1, 2).SX(2))
	three, _ := circuit.Custom("c3", u3)
	fixed1 := []string{"x", "y", "z", "h", "s", "sdg", "sx", "sxdg", "id"}
	fixed2 := []string{"cx", "cy", "cz", "swap", "iswap", "iswapdg"}
	quarter := func() float64 { return float64(rng.IntN(9)-4) * math.Pi / 2 }
	half := func() float64 { return float64(rng.IntN(9)-4) * math.Pi }
	c := circuit.New(n)
	for len(c.Ops) < ops {
		a := rng.IntN(n)
		b := rng.IntN(n)
		switch k := rng.IntN(10); {
		case k < 4:
			g, _ := circuit.NewGate(fixed1[rng.IntN(len(fixed1))])
			c.Append(g, a)
		case k < 6:
			name := []string{"rx", "ry", "rz", "p"}[rng.IntN(4)]
			g, _ := circuit.NewGate(name, quarter())
			c.Append(g, a)
		case k == 6:
			if rng.IntN(2) == 0 {
				c.U(quarter(), quarter(), quarter(), a)
			} else {
				c.Append(hs, a)
			}
		case b == a:
			continue
		case k == 7:
			g, _ := circuit.NewGate(fixed2[rng.IntN(len(fixed2))])
			c.Append(g, a, b)
		case k == 8:
			name := []string{"rxx", "ryy", "rzz"}[rng.IntN(3)]
			g, _ := circuit.NewGate(name, quarter())
			c.Append(g, a, b)
		default:
			if rng.IntN(5) == 0 {
				c.Append(two, a, b)
				continue
			}
			if d := rng.IntN(n); rng.IntN(4) == 0 && d != a && d != b {
				c.Append(three, a, d, b)
				continue
			}
			name := []string{"cp", "crx", "cry", "crz"}[rng.IntN(4)]
			g, _ := circuit.NewGate(name, half())
			c.Append(g, a, b)
		}
	}
	return c
}

const sqrtHalf = math.Sqrt2 / 2

// The tableau agrees with the dense engine on random Clifford circuits of 1 to 8 qubits.
func TestTableauAgreesWithDense(t *testing.T) {
	rng := rand.New(rand.NewPCG(8, 2004))
	for n := 1; n <= 8; n++ {
		trials := 12
		if n >= 7 {
			trials = 2
		}
		for trial := 0; trial < trials; trial++ {
			c := randomClifford(rng, n, 12*n)
			if err := c.Validate(); err != nil {
				t.Fatal(err)
			}
			checkAgainstDense(t, c, unitaryOf(t, c))
		}
	}
}

// Every fixed gate the library flags as Clifford is accepted; the fixed non-Clifford ones are
// refused. (t, ch, ccx, ccz, cswap are not Clifford: T X T† = (X+Y)/√2, Nielsen & Chuang §10.5.4.)
func TestTableauGateSet(t *testing.T) {
	for _, s := range circuit.Standard() {
		if s.Params != 0 || s.Qubits == 0 || s.Name == "measure" || s.Name == "reset" {
			continue
		}
		g, _ := circuit.NewGate(s.Name)
		qs := []int{0, 1, 2}[:s.Qubits]
		c := circuit.New(3).Append(g, qs...)
		if got := IsClifford(c); got != s.Clifford {
			t.Errorf("IsClifford(%s) = %v, library flag is %v", s.Name, got, s.Clifford)
		}
		if s.Clifford {
			checkAgainstDense(t, c, unitaryOf(t, c))
		}
	}
}

func TestTableauAngles(t *testing.T) {
	accept := []*circuit.Circuit{
		circuit.New(1).RZ(math.Pi/2, 0),
		circuit.New(1).RZ(math.Pi/2+1e-14, 0),
		circuit.New(1).RX(-3*math.Pi/2, 0),
		circuit.New(1).P(100*math.Pi/2, 0),
		circuit.New(1).U(math.Pi/2, math.Pi, -math.Pi/2, 0),
		// u(0, φ, λ) = p(φ+λ): Clifford although φ and λ are not multiples of π/2.
		circuit.New(1).U(0, math.Pi/8, 3*math.Pi/8, 0),
		// u(π, φ, λ) = e^{iλ}·[[0, −1], [e^{i(φ−λ)}, 0]]: Clifford when φ−λ is a multiple of π/2.
		circuit.New(1).U(math.Pi, 0.3, 0.3, 0),
		circuit.New(1).U(-math.Pi, 0.3+math.Pi/2, 0.3, 0),
		circuit.New(1).P(0x1.92843d3193e23p+13, 0), // 2π·2050 in float64, 1e-12 off 4100π
		circuit.New(2).RZZ(math.Pi/2, 0, 1),
		circuit.New(2).CP(math.Pi, 0, 1),
		circuit.New(2).CRZ(3*math.Pi, 0, 1),
	}
	for _, c := range accept {
		if !IsClifford(c) {
			t.Errorf("IsClifford(%v) = false", c.Ops)
		}
		checkAgainstDense(t, c, unitaryOf(t, c))
	}
	refuse := []*circuit.Circuit{
		circuit.New(1).RZ(math.Pi/4, 0),
		circuit.New(1).RZ(math.Pi/2+1e-9, 0),
		circuit.New(2).CP(math.Pi/2, 0, 1), // controlled-S is not Clifford
		circuit.New(2).CRZ(math.Pi/2, 0, 1),
		circuit.New(2).RXX(0.3, 0, 1),
		// 2^20·π/2 rounded to float64 is 6.4e-11 off it, too far for the tableau (issue 17; in
		// float64, x − round(x/(π/2))·π/2 is 0 here).
		circuit.New(1).RX(0x1.921fb54442d18p+20, 0),
	}
	for _, c := range refuse {
		if IsClifford(c) {
			t.Errorf("IsClifford(%v) = true", c.Ops)
		}
	}
}

func TestTableauRefusesBadInput(t *testing.T) {
	cases := []struct {
		c    *circuit.Circuit
		want string
	}{
		{circuit.New(3).H(0).CX(0, 1).T(2), "op 2 (t)"},
		{circuit.New(2).H(0).RZ(0.1, 1), "op 1 (rz)"},
		{circuit.New(2).H(0).Measure(0, 0), "op 1 (measure)"},
		{circuit.New(2).CX(0, 2), "op 0 (cx)"},
		{circuit.New(1).RZ(math.Inf(1), 0), "op 0 (rz)"},
		{circuit.New(3).CCX(0, 1, 2), "op 0 (ccx)"},
	}
	for _, tc := range cases {
		_, err := NewTableau(tc.c)
		if err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("NewTableau(%v) error = %v, want one naming %q", tc.c.Ops, err, tc.want)
		}
	}
	if _, err := CompareClifford(circuit.New(2), circuit.New(3)); err == nil {
		t.Error("CompareClifford accepted circuits of different widths")
	}
	if _, err := CompareClifford(circuit.New(2), circuit.New(2).T(1)); err == nil || !strings.Contains(err.Error(), "got circuit: circuit: op 0 (t)") {
		t.Errorf("CompareClifford error = %v, want one naming the got circuit and op 0", err)
	}
}

// Known identity pairs, each embedded between a random Clifford context R and its inverse at a
// width of 1200 qubits, so that words, not single bits, carry the difference.
func TestTableauIdentitiesAtWidth(t *testing.T) {
	const n = 1200
	rng := rand.New(rand.NewPCG(1200, 52328))
	a, b := 3, 1100
	pairs := []struct {
		name       string
		lhs, rhs   *circuit.Circuit
		equivalent bool
	}{
		{"SWAP = three CNOTs (N&C Fig. 1.7)", circuit.New(n).SWAP(a, b), circuit.New(n).CX(a, b).CX(b, a).CX(a, b), true},
		{"CX(b,a) = H⊗H CX(a,b) H⊗H (N&C ex. 4.20)", circuit.New(n).CX(b, a), circuit.New(n).H(a).H(b).CX(a, b).H(a).H(b), true},
		{"CZ = H CX H (N&C Fig. 4.6 style)", circuit.New(n).CZ(a, b), circuit.New(n).H(b).CX(a, b).H(b), true},
		{"(SH)³ = e^{iπ/4} I (from memory)", circuit.New(n).H(a).S(a).H(a).S(a).H(a).S(a), circuit.New(n), true},
		{"S² = Z", circuit.New(n).S(a).S(a), circuit.New(n).Z(a), true},
		{"rz(π/2) = S up to phase", circuit.New(n).RZ(math.Pi/2, b), circuit.New(n).S(b), true},
		{"S ≠ S†", circuit.New(n).S(a), circuit.New(n).Sdg(a), false},
		{"CX(a,b) ≠ CX(b,a)", circuit.New(n).CX(a, b), circuit.New(n).CX(b, a), false},
		{"CZ ≠ CZ·Z", circuit.New(n).CZ(a, b), circuit.New(n).CZ(a, b).Z(b), false},
	}
	for _, p := range pairs {
		ctx := randomClifford(rng, n, 3000)
		wrap := func(core *circuit.Circuit) *circuit.Circuit {
			return ctx.Clone().Compose(core).Compose(ctx.Inverse())
		}
		res, err := CompareClifford(wrap(p.lhs), wrap(p.rhs))
		if err != nil {
			t.Fatal(err)
		}
		if res.Equivalent != p.equivalent {
			t.Errorf("%s: Equivalent = %v, want %v (witness %v: %v vs %v)", p.name, res.Equivalent, p.equivalent, res.Generator, res.Want, res.Got)
		}
		if !p.equivalent && res.Want.Equal(res.Got) {
			t.Errorf("%s: witness %v has equal images %v", p.name, res.Generator, res.Want)
		}
	}
}

// A single X on qubit 1037 of 1500: X Z X† = −Z (N&C Fig. 10.7), so the witness is Z1037 with
// images +Z1037 and −Z1037, and every X_q agrees.
func TestTableauWitness(t *testing.T) {
	const n = 1500
	res, err := CompareClifford(circuit.New(n), circuit.New(n).X(1037))
	if err != nil {
		t.Fatal(err)
	}
	if res.Equivalent || res.Generator.String() != "+Z1037" || res.Want.String() != "+Z1037" || res.Got.String() != "−Z1037" {
		t.Errorf("witness %v: %v vs %v, want +Z1037: +Z1037 vs −Z1037", res.Generator, res.Want, res.Got)
	}
	// H on qubit 64 (the first qubit of the second word): X64 ↦ Z64.
	res, err = CompareClifford(circuit.New(n).H(64), circuit.New(n))
	if err != nil {
		t.Fatal(err)
	}
	if res.Generator.String() != "+X64" || res.Want.String() != "+Z64" || res.Got.String() != "+X64" {
		t.Errorf("witness %v: %v vs %v, want +X64: +Z64 vs +X64", res.Generator, res.Want, res.Got)
	}
}

// S² = Z (Nielsen & Chuang §4.2) as tableaux, and S ≠ Z.
func TestTableauEqual(t *testing.T) {
	ss, z, s := tableauOf(t, circuit.New(3).S(2).S(2)), tableauOf(t, circuit.New(3).Z(2)), tableauOf(t, circuit.New(3).S(2))
	if !ss.Equal(z) || z.Equal(s) || ss.Qubits() != 3 {
		t.Errorf("Equal: S² vs Z = %v, Z vs S = %v, width %d", ss.Equal(z), z.Equal(s), ss.Qubits())
	}
}

func TestPauliString(t *testing.T) {
	p := PauliX(70, 3)
	p.set(69, 'Y')
	p.set(0, 'Z')
	p.neg = true
	if got := p.String(); got != "−Z0 X3 Y69" {
		t.Errorf("String = %q", got)
	}
	if got := newPauli(2).String(); got != "+I" {
		t.Errorf("identity String = %q", got)
	}
	if p.At(69) != 'Y' || p.At(1) != 'I' || !p.Negative() || p.Qubits() != 70 {
		t.Errorf("accessors disagree with %v", p)
	}
}

func ExampleCompareClifford() {
	// CNOT with its operands exchanged by Hadamards (Nielsen & Chuang ex. 4.20), versus a wrong
	// rewrite that forgets the Hadamards on the target.
	want := circuit.New(2).CX(1, 0)
	good := circuit.New(2).H(0).H(1).CX(0, 1).H(0).H(1)
	bad := circuit.New(2).H(0).CX(0, 1).H(0)
	r, _ := CompareClifford(want, good)
	fmt.Println(r.Equivalent)
	r, _ = CompareClifford(want, bad)
	fmt.Printf("%v: %v ↦ %v, but the rewrite gives %v\n", r.Equivalent, r.Generator, r.Want, r.Got)
	// Output:
	// true
	// false: +X1 ↦ +X0 X1, but the rewrite gives +X1
}

// BenchmarkTableauCompare compares two random Clifford circuits of 1,000 qubits and 100,000 gates
// each (h, s, sdg, x, z, cx, cz, swap), differing in one gate.
func BenchmarkTableauCompare(b *testing.B) {
	const n, ops = 1000, 100000
	rng := rand.New(rand.NewPCG(1000, 100000))
	want := circuit.New(n)
	for want.Len() < ops {
		q, r := rng.IntN(n), rng.IntN(n)
		switch k := rng.IntN(8); {
		case k == 0:
			want.H(q)
		case k == 1:
			want.S(q)
		case k == 2:
			want.Sdg(q)
		case k == 3:
			want.X(q).Z(r)
		case q == r:
		case k == 4:
			want.CZ(q, r)
		case k == 5:
			want.SWAP(q, r)
		default:
			want.CX(q, r)
		}
	}
	got := want.Clone()
	for i, op := range got.Ops {
		if i > ops/2 && op.Gate.Name == "s" {
			got.Ops[i].Gate.Name = "sdg"
			break
		}
	}
	b.ResetTimer()
	for b.Loop() {
		res, err := CompareClifford(want, got)
		if err != nil || res.Equivalent {
			b.Fatalf("CompareClifford = %v, %v; the circuits differ in one gate", res.Equivalent, err)
		}
	}
}

func ExampleNewTableau() {
	// The Bell circuit conjugates X0 to Z0 and Z0 to X0 X1 (Nielsen & Chuang Fig. 10.7, H then CNOT).
	bell, err := NewTableau(circuit.New(2).H(0).CX(0, 1))
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Println(bell.ImageX(0), "|", bell.ImageZ(0), "|", bell.ImageX(1), "|", bell.ImageZ(1))
	_, err = NewTableau(circuit.New(2).H(0).T(1))
	fmt.Println(err)
	// Output:
	// +Z0 | +X0 X1 | +X1 | +Z0 Z1
	// circuit: op 1 (t): not a Clifford gate; the tableau engine needs a Clifford circuit
}

// Issue 17, reproducer 1: CliffordDeviation bounds the distance to the exact Clifford circuit for
// angles whose offsets float64 arithmetic cannot see. 4,096 × rz(2π·2050), with 2π·2050 evaluated
// in float64, is rz(4096·δ) up to phase with δ = −9.99485e-13 (mpmath at 2,000 bits,
// testdata/circuit/angles.py), at distance 2 sin(4096|δ|/4) = 2.04695e-9 from the identity; the
// bound, 4096|δ|, must not be smaller, and is twice it.
func TestCliffordDeviationOfLargeAngles(t *testing.T) {
	c := circuit.New(13)
	for range 4096 {
		c.RZ(0x1.92843d3193e23p+13, 0)
	}
	b, err := CliffordDeviation(c)
	if err != nil {
		t.Fatal(err)
	}
	const distance, delta = 2.046945490293729e-09, 9.99485102682485e-13
	if b < distance || math.Abs(b-4096*delta) > 1e-20 {
		t.Errorf("CliffordDeviation = %.6g, want 4096·|δ| = %.6g ≥ the distance %.6g", b, 4096*delta, distance)
	}
	if r, err := CompareClifford(circuit.New(13), c); err != nil || !r.Equivalent {
		t.Errorf("the rounded circuit is the identity: %+v, %v", r, err)
	}
	custom, _ := circuit.Custom("sq", mat.NewCDense(2, 2, []complex128{1, 0, 0, 1i}))
	if _, err := CliffordDeviation(circuit.New(1).Append(custom, 0)); err == nil {
		t.Error("CliffordDeviation bounded a custom gate")
	}
}

// Issue 17, reproducer 7: h q[0] on a register of 2^20 qubits once asked for a 256 GiB tableau.
// Untouched qubits are the identity in both circuits, so only touched qubits are tableau columns;
// the verdicts are the textbook ones (HSH ≠ S: H conjugates X to Z, N&C §4.2), with the witness
// back on the full register.
func TestTableauOfTouchedQubitsOnly(t *testing.T) {
	const n = 1 << 20
	r, err := CompareClifford(circuit.New(n).H(0), circuit.New(n).H(0))
	if err != nil || !r.Equivalent {
		t.Fatalf("h q[0] against itself on 2^20 qubits: %+v, %v", r, err)
	}
	r, err = CompareClifford(circuit.New(n).H(700000).S(700000).H(700000).Barrier(1, 2, 3), circuit.New(n).S(700000))
	if err != nil || r.Equivalent {
		t.Fatalf("HSH against S on qubit 700000: %+v, %v", r, err)
	}
	// HSH maps X to H·S·Z·S†·H = H·Z·H = X, while S maps X to Y: X_700000 is the first generator
	// whose images differ.
	if r.Generator.Qubits() != n || r.Generator.String() != "+X700000" {
		t.Errorf("witness generator %v on %d qubits, want +X700000 on %d", r.Generator, r.Generator.Qubits(), n)
	}
	if _, err := NewTableau(circuit.New(100000)); err == nil || !strings.Contains(err.Error(), "over the limit") {
		t.Errorf("a 100,000-qubit tableau (5 GB): %v", err)
	}
	// Only barriers: both are the identity.
	if r, err := CompareClifford(circuit.New(n).Barrier(0, 1), circuit.New(n)); err != nil || !r.Equivalent {
		t.Errorf("barriers only: %+v, %v", r, err)
	}
}
