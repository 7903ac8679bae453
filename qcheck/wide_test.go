package qcheck

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// randomCircuit draws a circuit over rotations, T, H and controlled gates with a fixed seed.
func randomCircuit(rng *rand.Rand, n, ops int) *circuit.Circuit {
	c := circuit.New(n)
	for range ops {
		a := rng.IntN(n)
		b := (a + 1 + rng.IntN(n-1)) % n
		theta := (2*rng.Float64() - 1) * math.Pi
		switch rng.IntN(7) {
		case 0:
			c.H(a)
		case 1:
			c.T(a)
		case 2:
			c.RX(theta, a)
		case 3:
			c.U(theta, 2*theta, -theta/3, a)
		case 4:
			c.CP(theta, a, b)
		case 5:
			c.CRY(theta, a, b)
		default:
			c.CX(a, b)
		}
	}
	return c
}

// phaseFlipOnAllOnes is diag(1, …, 1, −1) on n qubits as a custom gate.
func phaseFlipOnAllOnes(t *testing.T, n int) circuit.Gate {
	d := 1 << n
	m := mat.NewCDense(d, d, nil)
	for i := 0; i < d; i++ {
		m.Set(i, i, 1)
	}
	m.Set(d-1, d-1, -1)
	g, err := circuit.Custom("flip", m)
	if err != nil {
		t.Fatal(err)
	}
	return g
}

// randomCliffordCircuit draws a circuit of h, s, sdg, x, z, cx, cz and swap with a fixed seed.
func randomCliffordCircuit(rng *rand.Rand, n, ops int) *circuit.Circuit {
	c := circuit.New(n)
	for range ops {
		a := rng.IntN(n)
		b := (a + 1 + rng.IntN(n-1)) % n
		switch rng.IntN(8) {
		case 0:
			c.H(a)
		case 1:
			c.S(a)
		case 2:
			c.Sdg(a)
		case 3:
			c.X(a)
		case 4:
			c.Z(a)
		case 5:
			c.CZ(a, b)
		case 6:
			c.SWAP(a, b)
		default:
			c.CX(a, b)
		}
	}
	return c
}

// The tableau engine against the dense one on random Clifford pairs of up to 8 qubits: the same
// verdict, and when they differ, the dense phase-free distance is at least the tableau's lower
// bound (the bound ‖A − B‖ ≤ 2‖U − e^{iφ}V‖ derived in compareTableau).
func TestTableauAgreesWithDense(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 11))
	differ := 0
	for trial := range 60 {
		n := 1 + trial%8
		if n == 1 {
			n = 2
		}
		want := randomCliffordCircuit(rng, n, 4*n)
		got := want.Clone()
		if trial%3 != 0 { // change one op so that some pairs differ and some do not
			i := rng.IntN(len(got.Ops))
			got.Ops[i] = circuit.Op{Gate: circuit.Gate{Name: []string{"s", "sdg", "h", "x", "z"}[rng.IntN(5)]}, Qubits: []int{got.Ops[i].Qubits[0]}}
		}
		tab, err := Compare(want, got, UseEngine(Tableau))
		if err != nil {
			t.Fatal(err)
		}
		dense, err := Compare(want, got, UseEngine(Dense))
		if err != nil {
			t.Fatal(err)
		}
		if tab.Equivalent != dense.Equivalent {
			t.Fatalf("trial %d: tableau says equivalent=%v, dense %v (distance %.3g)\nwant %v\ngot %v", trial, tab.Equivalent, dense.Equivalent, dense.Distance, want, got)
		}
		if !tab.Equivalent {
			differ++
			if dense.Distance < tab.Distance-1e-12 {
				t.Fatalf("trial %d: dense distance %.6g is below the tableau's lower bound %.6g", trial, dense.Distance, tab.Distance)
			}
			if tab.Pauli == nil {
				t.Fatalf("trial %d: no Pauli witness", trial)
			}
		}
	}
	if differ < 10 {
		t.Fatalf("only %d of 60 pairs differed; the test does not exercise the witness", differ)
	}
}

// Wide Clifford circuits go to the tableau automatically: CX(1,0) = (H⊗H) CX(0,1) (H⊗H)
// (Nielsen & Chuang ex. 4.20) embedded in a 300-qubit random Clifford context, and the near miss
// S in place of S† there.
func TestAutoTableauAtWidth(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 5))
	const n = 300
	pre, post := randomCliffordCircuit(rng, n, 2000), randomCliffordCircuit(rng, n, 2000)
	a, b := 17, 203
	want := pre.Clone().CX(b, a).Sdg(a).Compose(post)
	got := pre.Clone().H(a).H(b).CX(a, b).H(a).H(b).Sdg(a).Compose(post)
	r, err := Compare(want, got)
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine != Tableau || !r.Equivalent {
		t.Fatalf("engine %v, equivalent %v; want the tableau to accept the identity", r.Engine, r.Equivalent)
	}
	bad := pre.Clone().H(a).H(b).CX(a, b).H(a).H(b).S(a).Compose(post)
	r, err = Compare(want, bad)
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent || r.Pauli == nil {
		t.Fatalf("S in place of S† passed the tableau: %+v", r)
	}
	if !strings.Contains(r.Report(), "witness Pauli") {
		t.Errorf("report does not show the Pauli witness:\n%s", r.Report())
	}
}

// The matrix-free engine against the dense one at 6 and 8 qubits: random pairs, a single-angle
// perturbation, and a defect confined to one basis state (a phase flip on |11…1⟩ built from a
// doubly controlled Z), which random inputs alone rarely see.
func TestMatrixFreeAgreesWithDense(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	for _, n := range []int{6, 8} {
		base := randomCircuit(rng, n, 6*n)
		// X·X in front shares no op with base's start, so the engine cannot drop the common
		// circuit and must work with the whole of both.
		guarded := func() *circuit.Circuit { return circuit.New(n).X(0).X(0).Compose(base) }
		near := guarded().RZ(1e-3, n-1)
		defect := guarded().CCZ(0, 1, 2)
		if n == 8 { // a phase flip on the single basis state |1…1⟩ of the whole register
			defect = guarded().Append(phaseFlipOnAllOnes(t, n), 0, 1, 2, 3, 4, 5, 6, 7)
		}
		unrelated := randomCircuit(rng, n, 6*n)
		for _, got := range []*circuit.Circuit{near, defect, unrelated} {
			mf, err := Compare(base, got, UseEngine(MatrixFree))
			if err != nil {
				t.Fatal(err)
			}
			d, err := Compare(base, got, UseEngine(Dense))
			if err != nil {
				t.Fatal(err)
			}
			// The Krylov estimate is exact once its space holds the extreme eigenvectors of V†U,
			// which a handful of steps reach for a few distinct eigenphases (near and defect
			// pairs) but not for the spread spectrum of unrelated circuits; there it may only
			// fall short, never exceed.
			switch {
			case got == unrelated && mf.Distance > d.Distance+1e-9:
				t.Errorf("%d qubits, unrelated: matrix-free estimate %.10g exceeds dense %.10g", n, mf.Distance, d.Distance)
			case got != unrelated && math.Abs(mf.Distance-d.Distance) > 1e-8:
				t.Errorf("%d qubits: matrix-free %.10g, dense %.10g", n, mf.Distance, d.Distance)
			}
			if mf.WitnessGap > d.Distance+1e-9 {
				t.Errorf("%d qubits: certified lower bound %.10g exceeds the dense distance %.10g", n, mf.WitnessGap, d.Distance)
			}
			if mf.Equivalent != d.Equivalent {
				t.Errorf("%d qubits: verdicts differ", n)
			}
		}
	}
}

// Circuits wider than the dense engine's automatic limit, and not Clifford, go to the matrix-free
// engine; it accepts a routed circuit with its output permutation and rejects a T† in place of T.
func TestAutoMatrixFreeAtWidth(t *testing.T) {
	if testing.Short() {
		t.Skip("14-qubit statevector runs")
	}
	rng := rand.New(rand.NewPCG(9, 9))
	const n = 14
	want := randomCircuit(rng, n, 40).T(3).CX(3, 9)
	// got runs the same circuit and then swaps qubits 3 and 9, reporting that layout.
	got := want.Clone().SWAP(3, 9)
	perm := make([]int, n)
	for i := range perm {
		perm[i] = i
	}
	perm[3], perm[9] = 9, 3
	r, err := Compare(want, got, OutputPermutation(perm))
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine != MatrixFree || !r.Equivalent {
		t.Fatalf("engine %v, equivalent %v, distance %.3g; want the matrix-free engine to accept it", r.Engine, r.Equivalent, r.Distance)
	}
	bad := want.Clone()
	bad.Ops[len(bad.Ops)-2] = circuit.Op{Gate: circuit.Gate{Name: "tdg"}, Qubits: []int{3}}
	r, err = Compare(want, bad)
	if err != nil {
		t.Fatal(err)
	}
	// T versus T† differ by diag(1, e^{iπ/2}) on one qubit: 2 sin(π/8) up to phase.
	if r.Equivalent || math.Abs(r.Distance-2*math.Sin(math.Pi/8)) > 1e-8 {
		t.Fatalf("T† for T: equivalent %v, distance %.10g, want %.10g", r.Equivalent, r.Distance, 2*math.Sin(math.Pi/8))
	}
}

func TestWideEnginesRefuseWhatTheyCannotAnswer(t *testing.T) {
	c := circuit.New(3).H(0).T(1)
	if _, err := Compare(c, c, UseEngine(Tableau)); err == nil {
		t.Error("the tableau accepted a T gate")
	}
	if _, err := Compare(c, c, UseEngine(MatrixFree), Measured(0)); err == nil {
		t.Error("the matrix-free engine accepted Measured")
	}
	if _, err := Compare(c, c, UseEngine(MatrixFree), ExactPhase()); err == nil {
		t.Error("the matrix-free engine accepted ExactPhase")
	}
	wide := circuit.New(30).Append(phaseFlipOnAllOnes(t, 1), 0).T(1)
	if _, err := Compare(wide, wide); err == nil {
		t.Error("a 30-qubit non-Clifford comparison with a custom gate did not say that no engine takes it")
	}
	if r, err := Compare(circuit.New(30).T(0), circuit.New(30).T(0)); err != nil || r.Engine != ZX || !r.Equivalent {
		t.Errorf("a 30-qubit non-Clifford pair: %v, %+v; want the zx engine's proof", err, r.Engine)
	}
}

// undoLayout composes got with the swaps that undo its layout: checked against the dense engine's
// relabelling of the matrix on a 5-qubit cyclic layout.
func TestUndoLayoutMatchesDenseRelabelling(t *testing.T) {
	rng := rand.New(rand.NewPCG(4, 4))
	want := randomCircuit(rng, 5, 20)
	perm := []int{2, 4, 0, 1, 3}
	// got moves logical i to physical perm[i] with explicit swaps after want.
	got := want.Clone()
	moved := undoLayout(circuit.New(5), invert(perm))
	got.Compose(moved)
	r, err := Compare(want, got, OutputPermutation(perm))
	if err != nil {
		t.Fatal(err)
	}
	if !r.Equivalent {
		t.Fatalf("dense: the routed circuit with its layout differs by %.3g", r.Distance)
	}
	r, err = Compare(want, got, OutputPermutation(perm), UseEngine(MatrixFree))
	if err != nil {
		t.Fatal(err)
	}
	if !r.Equivalent {
		t.Fatalf("matrix-free: the routed circuit with its layout differs by %.3g", r.Distance)
	}
}

func invert(p []int) []int {
	q := make([]int, len(p))
	for i, v := range p {
		q[v] = i
	}
	return q
}

// Ancillas above qubit 63 keep their place: a dirty ancilla on qubit 65 of a 70-qubit register
// moves want's qubits 65–68 up by one (the tableau engine answers at this width).
func TestAncillasBeyondAWord(t *testing.T) {
	want := circuit.New(69).X(68)
	good := circuit.New(70).X(69)
	bad := circuit.New(70).X(68)
	r, err := Compare(want, good, Ancillas([]int{65}, Dirty))
	if err != nil {
		t.Fatal(err)
	}
	if !r.Equivalent {
		t.Errorf("X on want's qubit 68, which is got's 69, was not accepted (engine %v, distance %.3g)", r.Engine, r.Distance)
	}
	r, err = Compare(want, bad, Ancillas([]int{65}, Dirty))
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent {
		t.Errorf("X on got's qubit 68, which carries want's 67, was accepted")
	}
}

func TestEmptyPermutationIsRefused(t *testing.T) {
	c := circuit.New(2).H(0)
	if _, err := Compare(c, c, OutputPermutation([]int{})); err == nil {
		t.Error("an empty output permutation on 2 qubits was accepted")
	}
}

// Angles a hair off Clifford ones (review): the tableau rounds them to exact Cliffords, so it may
// answer only while their total offset is below the tolerance. 4000 rz(π/2 + 9e-13) are 3.6e-9
// off in total, far above 1e-9: Auto must not trust the tableau, and the matrix-free engine finds
// the accumulated difference from the identity.
func TestTableauRefusesRoundedAnglesBeyondTolerance(t *testing.T) {
	const n = 14
	want := circuit.New(n)
	got := circuit.New(n)
	for range 4000 {
		got.RZ(math.Pi/2+9e-13, 0)
	}
	if _, err := Compare(want, got, UseEngine(Tableau)); err == nil {
		t.Fatal("the tableau answered although the angles are off Clifford ones by more than the tolerance")
	}
	r, err := Compare(want, got)
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine == Tableau {
		t.Fatalf("Auto chose the tableau")
	}
	// rz(π/2 + δ)^4000 = rz(2000π + 4000δ) = rz(4000δ) up to phase: distance 2 sin(4000δ/4).
	if want := 2 * math.Sin(4000*9e-13/4); r.Equivalent || math.Abs(r.Distance-want) > 1e-12 {
		t.Errorf("engine %v: equivalent %v, distance %.4g, want %.4g", r.Engine, r.Equivalent, r.Distance, want)
	}
	// A few such gates stay well below the tolerance: the tableau answers and says so.
	few := circuit.New(n).RZ(math.Pi/2+1e-13, 0).RZ(-math.Pi/2, 0)
	r, err = Compare(circuit.New(n), few)
	if err != nil {
		t.Fatal(err)
	}
	if r.Engine != Tableau || !r.Equivalent || !strings.Contains(r.Certifies, "off Clifford") {
		t.Errorf("engine %v, equivalent %v, certifies %q", r.Engine, r.Equivalent, r.Certifies)
	}
	// The distance reported is the rounding bound, not 0: the offsets of the float64 values of
	// the Go constants π/2 + 1e-13 (0x1.921fb54442edbp+00) and −π/2 from multiples of π/2 are
	// 1.00081e-13 and 6.12323e-17 (mpmath at 300 bits), 1.00142e-13 in total.
	if math.Abs(r.Distance-1.0014211682118912e-13) > 1e-20 {
		t.Errorf("tableau distance %.6g, want the rounding bound 1.00142e-13", r.Distance)
	}
}

// Issue 17, reproducer 1: angles far from 0 whose offsets from multiples of 2π float64 cannot
// see. 4,096 × rz(2π·2050) (each 9.995e-13 rad below 4100π) and 8,000 × rz(6697.8755374534385)
// (each 7.016e-13 below 4264π) add up to rz(Nδ), at distance 2 sin(N|δ|/4) from the identity
// up to phase: 2.0469e-9 and 2.8065e-9, from δ computed by mpmath at 2,000 bits
// (testdata/circuit/angles.py). The tableau, which once rounded the offsets to 0, must not call
// these equivalent at the default tolerance.
func TestLargeCliffordAnglesAreNotRoundedAway(t *testing.T) {
	cases := []struct {
		n     int
		angle float64
		want  float64
	}{
		{4096, 0x1.92843d3193e23p+13, 2.046945490293729e-09}, // 2π·2050 evaluated in float64, as a QASM file's 2*pi*2050
		{8000, 6697.8755374534385, 2.806524774997911e-09},
	}
	for _, c := range cases {
		got := circuit.New(13)
		for range c.n {
			got.RZ(c.angle, 0)
		}
		if _, err := Compare(circuit.New(13), got, UseEngine(Tableau)); err == nil {
			t.Errorf("%d × rz(%v): the tableau answered although the angles are off Clifford ones by more than the tolerance", c.n, c.angle)
		}
		r, err := Compare(circuit.New(13), got)
		if err != nil {
			t.Fatal(err)
		}
		if r.Equivalent || math.Abs(r.Distance-c.want) > 1e-12 {
			t.Errorf("%d × rz(%v), engine %v: equivalent %v, distance %.5g, want %.5g", c.n, c.angle, r.Engine, r.Equivalent, r.Distance, c.want)
		}
	}
}

// Issue 17, reproducer 13: a Clifford pair too wide for the dense engine, whose angles' offsets
// exceed the tolerance, is refused by the tableau for that reason, with the bound; Auto gives it
// to the ZX engine, which finds the distance rz(4000δ) has from the identity (as above).
func TestWideRefusalSaysTheRoundingBound(t *testing.T) {
	got := circuit.New(30)
	for range 4000 {
		got.RZ(math.Pi/2+9e-13, 0)
	}
	_, err := Compare(circuit.New(30), got, UseEngine(Tableau))
	if err == nil {
		t.Fatal("the tableau answered")
	}
	// 4000 offsets of 9e-13 (to float64 rounding of π/2 + 9e-13): a bound of 3.6e-9.
	if msg := err.Error(); !strings.Contains(msg, "off exact Clifford angles by up to 3.6e-09") || !strings.Contains(msg, "tolerance 1e-09") {
		t.Errorf("the refusal does not give the reason and the bound: %v", err)
	}
	r, err := Compare(circuit.New(30), got)
	if err != nil {
		t.Fatal(err)
	}
	_, off := circuit.QuarterTurns(math.Pi/2 + 9e-13)
	if want := 2 * math.Sin(4000*off/4); r.Engine != ZX || r.Equivalent || math.Abs(r.Distance-want) > 1e-12 {
		t.Errorf("engine %v: equivalent %v, distance %.6g, want %.6g", r.Engine, r.Equivalent, r.Distance, want)
	}
}
