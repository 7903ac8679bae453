package sim

import (
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// unitaryOf builds the circuit's matrix or fails the test.
func unitaryOf(t *testing.T, c *circuit.Circuit) *mat.CDense {
	t.Helper()
	u, err := Unitary(c)
	if err != nil {
		t.Fatalf("Unitary: %v", err)
	}
	return u
}

// maxDiff returns the largest entry-wise difference of a and e^{iφ}b, with φ chosen from the
// largest entry of b when upToPhase is set.
func maxDiff(a, b mat.CMatrix, upToPhase bool) float64 {
	r, c := a.Dims()
	ph := complex(1, 0)
	if upToPhase {
		best := 0.0
		for i := 0; i < r; i++ {
			for j := 0; j < c; j++ {
				if v := cmplx.Abs(b.At(i, j)); v > best {
					best = v
					ph = a.At(i, j) / b.At(i, j)
					ph /= complex(cmplx.Abs(ph), 0)
				}
			}
		}
	}
	worst := 0.0
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			worst = math.Max(worst, cmplx.Abs(a.At(i, j)-ph*b.At(i, j)))
		}
	}
	return worst
}

// Textbook identities, Nielsen & Chuang §4.2–4.3 (exercises 4.13–4.20, Fig. 4.9) and the
// definitions of package circuit's documentation; each must hold to 1e-12 as matrices.
func TestTextbookIdentities(t *testing.T) {
	const tol = 1e-12
	theta := 0.7345
	cases := []struct {
		name      string
		lhs, rhs  *circuit.Circuit
		upToPhase bool
	}{
		{"HZH = X (N&C ex. 4.14)", circuit.New(1).H(0).Z(0).H(0), circuit.New(1).X(0), false},
		{"HXH = Z (N&C ex. 4.14)", circuit.New(1).H(0).X(0).H(0), circuit.New(1).Z(0), false},
		{"HYH = −Y = XYX (N&C ex. 4.14)", circuit.New(1).H(0).Y(0).H(0), circuit.New(1).X(0).Y(0).X(0), false},
		{"S² = Z", circuit.New(1).S(0).S(0), circuit.New(1).Z(0), false},
		{"T² = S", circuit.New(1).T(0).T(0), circuit.New(1).S(0), false},
		{"SX² = X", circuit.New(1).SX(0).SX(0), circuit.New(1).X(0), false},
		{"CX(1,0) = (H⊗H) CX(0,1) (H⊗H) (N&C ex. 4.20)",
			circuit.New(2).CX(1, 0),
			circuit.New(2).H(0).H(1).CX(0, 1).H(0).H(1), false},
		{"SWAP = CX(0,1) CX(1,0) CX(0,1) (N&C Fig. 1.7)",
			circuit.New(2).SWAP(0, 1),
			circuit.New(2).CX(0, 1).CX(1, 0).CX(0, 1), false},
		{"CZ symmetric", circuit.New(2).CZ(0, 1), circuit.New(2).CZ(1, 0), false},
		{"CZ = (I⊗H) CX (I⊗H) (N&C Fig. 4.6 style)", circuit.New(2).CZ(0, 1), circuit.New(2).H(1).CX(0, 1).H(1), false},
		{"Toffoli from CNOT, H, T (N&C Fig. 4.9)", circuit.New(3).CCX(0, 1, 2), toffoliFig49(), true},
		{"Rz(θ) = e^{−iθ/2} P(θ) up to phase", circuit.New(1).RZ(theta, 0), circuit.New(1).P(theta, 0), true},
		{"u(θ,−π/2,π/2) = Rx(θ) (OpenQASM 2.0 spec)", circuit.New(1).U(theta, -math.Pi/2, math.Pi/2, 0), circuit.New(1).RX(theta, 0), false},
		{"u(θ,0,0) = Ry(θ)", circuit.New(1).U(theta, 0, 0, 0), circuit.New(1).RY(theta, 0), false},
		{"RZZ(θ) = CX Rz(θ) CX (common practice)", circuit.New(2).RZZ(theta, 0, 1), circuit.New(2).CX(0, 1).RZ(theta, 1).CX(0, 1), false},
		{"RXX(θ) = (H⊗H) RZZ(θ) (H⊗H)", circuit.New(2).RXX(theta, 0, 1), circuit.New(2).H(0).H(1).RZZ(theta, 0, 1).H(0).H(1), false},
		{"CCZ = (I⊗I⊗H) CCX (I⊗I⊗H)", circuit.New(3).CCZ(0, 1, 2), circuit.New(3).H(2).CCX(0, 1, 2).H(2), false},
		{"CSWAP = CX(b,a) CCX(c,a,b) CX(b,a) (common practice)", circuit.New(3).CSWAP(0, 1, 2), circuit.New(3).CX(2, 1).CCX(0, 1, 2).CX(2, 1), false},
		{"iSWAP = (S⊗S)(H⊗I) CX(0,1) CX(1,0) (I⊗H) (from memory)", circuit.New(2).ISWAP(0, 1), circuit.New(2).S(0).S(1).H(0).CX(0, 1).CX(1, 0).H(1), false},
	}
	for _, tc := range cases {
		if d := maxDiff(unitaryOf(t, tc.lhs), unitaryOf(t, tc.rhs), tc.upToPhase); d > tol {
			t.Errorf("%s: matrices differ by %.3g", tc.name, d)
		}
	}
}

// toffoliFig49 is the Toffoli circuit of Nielsen & Chuang Fig. 4.9: controls q0, q1, target q2.
func toffoliFig49() *circuit.Circuit {
	return circuit.New(3).
		H(2).CX(1, 2).Tdg(2).CX(0, 2).T(2).CX(1, 2).Tdg(2).CX(0, 2).
		T(1).T(2).H(2).CX(0, 1).T(0).Tdg(1).CX(0, 1)
}

// The qubit-order convention of package circuit's documentation: CX(0,1) on two qubits swaps basis indices 1 and 3.
func TestQubitOrder(t *testing.T) {
	u := unitaryOf(t, circuit.New(2).CX(0, 1))
	want := [4]int{0, 3, 2, 1} // column j maps to row want[j]
	for j, i := range want {
		if u.At(i, j) != 1 {
			t.Errorf("CX(0,1): column %d should map to row %d; matrix column is %v %v %v %v", j, i, u.At(0, j), u.At(1, j), u.At(2, j), u.At(3, j))
		}
	}
	// X on qubit 0 flips the least-significant bit: |0⟩ (index 0) → index 1.
	state := []complex128{1, 0, 0, 0}
	if err := Apply(circuit.New(2).X(0), state); err != nil {
		t.Fatal(err)
	}
	if state[1] != 1 {
		t.Errorf("X(0)|00⟩ = %v, want index 1", state)
	}
}

func TestUnitaryRefusesBadInput(t *testing.T) {
	for _, c := range []*circuit.Circuit{
		circuit.New(2).CX(0, 2),
		circuit.New(2).CX(1, 1),
		circuit.New(1).RZ(math.NaN(), 0),
		circuit.New(1).H(0).Measure(0, 0),
	} {
		if _, err := Unitary(c); err == nil {
			t.Errorf("Unitary accepted ill-formed circuit %v", c.Ops)
		}
	}
	if _, err := UnitaryWithin(circuit.New(15), 1<<30); err == nil {
		t.Error("UnitaryWithin accepted a 15-qubit matrix under a 1 GiB limit")
	}
	// Issue 17, reproducer 4: 16·4^n bytes overflowed int64 at 30 qubits (2^64 B = 16 EiB, by
	// hand), passed the check and panicked in make; at 31 the message said "needs 0 B".
	for n, size := range map[int]string{30: "needs 16.0 EiB", 31: "needs 64.0 EiB", 40: "needs 16.0 YiB", 29: "needs 4.0 EiB"} {
		_, err := UnitaryWithin(circuit.New(n).H(0), math.MaxInt64)
		if err == nil || !strings.Contains(err.Error(), size) {
			t.Errorf("UnitaryWithin(%d qubits, MaxInt64): %v, want a refusal that %s", n, err, size)
		}
	}
	if err := Apply(circuit.New(2).H(0), make([]complex128, 3)); err == nil {
		t.Error("Apply accepted a state of the wrong length")
	}
}
