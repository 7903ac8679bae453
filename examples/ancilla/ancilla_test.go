package ancilla_test

import (
	"strings"
	"testing"

	"qcheck.dev/examples/ancilla"
	"qcheck.dev/examples/ancilla/leak"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// mcxImage returns where X on target controlled by controls sends basis index i: the target bit
// flips when every control bit is 1 (the definition of a multiply controlled X, N&C §4.3).
func mcxImage(i int, controls []int, target int) int {
	for _, q := range controls {
		if i>>q&1 == 0 {
			return i
		}
	}
	return i ^ 1<<target
}

// checkMCX checks that c acts as X on target controlled by controls, on every basis input whose
// bits on the clean qubits are 0, and leaves every other qubit (dirty ones included) unchanged.
// A Toffoli network is a permutation of basis states, so its columns are exact basis vectors.
func checkMCX(t *testing.T, c *circuit.Circuit, controls []int, target int, clean []int) {
	t.Helper()
	u, err := sim.Unitary(c)
	if err != nil {
		t.Fatal(err)
	}
	dim := 1 << c.Qubits()
	cleanMask := 0
	for _, q := range clean {
		cleanMask |= 1 << q
	}
	for i := 0; i < dim; i++ {
		if i&cleanMask != 0 {
			continue
		}
		want := mcxImage(i, controls, target)
		if u.At(want, i) != 1 {
			for j := 0; j < dim; j++ {
				if u.At(j, i) != 0 {
					t.Fatalf("input |%0*b⟩ (index %d) goes to index %d, want %d", c.Qubits(), i, i, j, want)
				}
			}
			t.Fatalf("input index %d does not go to %d", i, want)
		}
	}
}

func seq(from, to int) []int {
	var s []int
	for q := from; q < to; q++ {
		s = append(s, q)
	}
	return s
}

func TestChainIsMCXWithCleanAncillas(t *testing.T) {
	for k := 1; k <= 5; k++ {
		n := k + 1 + max(0, k-2)
		c := circuit.New(n)
		if err := ancilla.Chain(c, seq(0, k), k, seq(k+1, n)); err != nil {
			t.Fatal(err)
		}
		checkMCX(t, c, seq(0, k), k, seq(k+1, n))
		// Toffoli count of the ladder: 2(k−2)+1 (N&C Fig. 4.10 with the last work qubit dropped).
		if k >= 3 && c.Len() != 2*(k-2)+1 {
			t.Errorf("k = %d: %d Toffolis, want %d", k, c.Len(), 2*(k-2)+1)
		}
	}
}

func TestLemma72IsMCXWithDirtyQubits(t *testing.T) {
	for k := 3; k <= 5; k++ {
		n := 2*k - 1 // k controls, the target, k−2 dirty qubits
		c := circuit.New(n)
		if err := ancilla.Borrowed(c, seq(0, k), k, seq(k+1, n)); err != nil {
			t.Fatal(err)
		}
		checkMCX(t, c, seq(0, k), k, nil) // dirty: every input, all restored
		// Barenco et al. (1995) Lemma 7.2: 4(m−2) Toffoli gates for m controls.
		if c.Len() != 4*(k-2) {
			t.Errorf("k = %d: %d Toffolis, want 4(k−2) = %d", k, c.Len(), 4*(k-2))
		}
	}
}

func TestOneWorkQubit(t *testing.T) {
	for k := 3; k <= 6; k++ {
		n := k + 2 // k controls, the target, one work qubit: the setting of Lemma 7.3
		dirty := circuit.New(n)
		if err := ancilla.Borrowed(dirty, seq(0, k), k, []int{k + 1}); err != nil {
			t.Fatal(err)
		}
		checkMCX(t, dirty, seq(0, k), k, nil)
		clean := circuit.New(n)
		if err := ancilla.OneClean(clean, seq(0, k), k, []int{k + 1}); err != nil {
			t.Fatal(err)
		}
		checkMCX(t, clean, seq(0, k), k, []int{k + 1})
	}
}

func TestLowerPasses(t *testing.T) {
	g4, err := ancilla.MCX(4)
	if err != nil {
		t.Fatal(err)
	}
	g3, _ := ancilla.MCX(3)
	// X with four controls on 0–3, target 4, then with three controls 4, 2, 0 onto 1.
	c := circuit.New(5).Append(g4, 0, 1, 2, 3, 4).Append(g3, 4, 2, 0, 1)
	for name, pass := range map[string]func(*circuit.Circuit) (*circuit.Circuit, error){
		"Lower": ancilla.Lower, "LowerBorrowed": ancilla.LowerBorrowed,
	} {
		got, err := pass(c)
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		if got.Qubits() != 6 {
			t.Fatalf("%s: width %d, want 6", name, got.Qubits())
		}
		for i, op := range got.Ops {
			if op.Gate.IsCustom() {
				t.Fatalf("%s: op %d (%s) was not lowered", name, i, op)
			}
		}
		// The two gates in a row, on basis states with the ancilla (qubit 5) clean.
		u, err := sim.Unitary(got)
		if err != nil {
			t.Fatal(err)
		}
		for i := 0; i < 32; i++ {
			want := mcxImage(mcxImage(i, []int{0, 1, 2, 3}, 4), []int{4, 2, 0}, 1)
			if u.At(want, i) != 1 {
				t.Errorf("%s: input index %d does not go to %d", name, i, want)
			}
		}
	}
}

func TestMCXMatrixRecognised(t *testing.T) {
	g, _ := ancilla.MCX(3)
	m := g.Matrix()
	// An impostor with MCX's name and a different matrix (a phase on the last entry) is kept.
	m.Set(15, 14, -1)
	fake, err := circuit.Custom("c3x", m)
	if err != nil {
		t.Fatal(err)
	}
	c := circuit.New(4).Append(fake, 0, 1, 2, 3)
	got, err := ancilla.Lower(c)
	if err != nil {
		t.Fatal(err)
	}
	if got.Len() != 1 || got.Ops[0].Gate.Name != "c3x" {
		t.Errorf("Lower rewrote a c3x whose matrix is not MCX's:\n%v", got)
	}
}

func TestLeakLeavesTheFirstAncillaDirty(t *testing.T) {
	c := circuit.New(7)
	if err := leak.Chain(c, seq(0, 4), 4, []int{5, 6}); err != nil {
		t.Fatal(err)
	}
	u, err := sim.Unitary(c)
	if err != nil {
		t.Fatal(err)
	}
	// Input |x⟩ with the first two controls set and ancillas 5, 6 clean: the planted bug leaves
	// ancilla 5 holding x_0·x_1 = 1 (see package leak).
	in := 0b00011
	if u.At(in|1<<5, in) != 1 {
		t.Errorf("the planted bug did not leave ancilla 5 set on input index %d", in)
	}
}

func TestBadInput(t *testing.T) {
	if _, err := ancilla.MCX(ancilla.MaxControls + 1); err == nil || !strings.Contains(err.Error(), "controls") {
		t.Errorf("MCX(%d): got %v", ancilla.MaxControls+1, err)
	}
	g5, _ := ancilla.MCX(5)
	c := circuit.New(6).H(0).Append(g5, 0, 1, 2, 3, 4, 5)
	_, err := ancilla.Lowering{Build: ancilla.Chain, Ancillas: 2, Clean: true}.Apply(c)
	if err == nil || !strings.Contains(err.Error(), "op 1 (c5x)") || !strings.Contains(err.Error(), "needs 3 clean ancillas") {
		t.Errorf("chain with too few ancillas: got %v", err)
	}
	if _, err := ancilla.Lower(circuit.New(2).CX(0, 0)); err == nil {
		t.Error("Lower accepted a cx with a repeated operand")
	}
}
