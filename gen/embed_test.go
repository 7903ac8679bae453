package gen

import (
	"fmt"
	"math/cmplx"
	"slices"
	"strings"
	"testing"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

func TestEmbedMapsEveryOp(t *testing.T) {
	small := circuit.New(3).H(0).CX(0, 1).RZ(0.25, 2).CCX(2, 0, 1)
	before := small.Clone()
	for seed := range 50 {
		e := Embed(small, 7).Example(seed)
		if e.Circuit.Qubits() != 7 || len(e.Qubits) != 3 || e.Circuit.Len() != small.Len() {
			t.Fatalf("seed %d: width %d, placement %v, %d ops", seed, e.Circuit.Qubits(), e.Qubits, e.Circuit.Len())
		}
		if err := e.Circuit.Validate(); err != nil {
			t.Fatalf("seed %d: %v", seed, err)
		}
		if distinct := slices.Compact(slices.Sorted(slices.Values(e.Qubits))); len(distinct) != 3 || distinct[2] >= 7 {
			t.Fatalf("seed %d: placement %v repeats a qubit", seed, e.Qubits)
		}
		for i, op := range e.Circuit.Ops {
			want := small.Ops[i]
			if !op.Gate.Equal(want.Gate) || len(op.Qubits) != len(want.Qubits) {
				t.Fatalf("seed %d: op %d is %v, want %v placed", seed, i, op, want)
			}
			for k, q := range want.Qubits {
				if op.Qubits[k] != e.Qubits[q] {
					t.Fatalf("seed %d: op %d is %v, want %v on %v", seed, i, op, want, e.Qubits)
				}
			}
		}
	}
	if !small.Equal(before) {
		t.Fatal("Embed modified the circuit it was given")
	}
}

func TestEmbedActsOnItsQubitsOnly(t *testing.T) {
	// The embedded circuit's matrix is the small one on the chosen qubits
	// tensored with the identity on the idle ones (Nielsen & Chuang §2.1.7):
	// entry (i, j) is U_small(s(i), s(j)) when i and j agree on every idle
	// qubit and 0 otherwise, s reading the chosen qubits' bits in order.
	small := circuit.New(2).H(0).CX(0, 1).RY(0.3, 1).CP(0.7, 1, 0)
	us, err := sim.Unitary(small)
	if err != nil {
		t.Fatal(err)
	}
	for seed := range 5 {
		e := Embed(small, 4).Example(seed)
		uw, err := sim.Unitary(e.Circuit)
		if err != nil {
			t.Fatal(err)
		}
		sub := func(i int) int {
			s := 0
			for k, q := range e.Qubits {
				s |= (i >> q & 1) << k
			}
			return s
		}
		idle := 0
		for q := range 4 {
			if !slices.Contains(e.Qubits, q) {
				idle |= 1 << q
			}
		}
		for i := range 16 {
			for j := range 16 {
				want := complex(0, 0)
				if i&idle == j&idle {
					want = us.At(sub(i), sub(j))
				}
				if cmplx.Abs(uw.At(i, j)-want) > 1e-12 {
					t.Fatalf("seed %d, placement %v: U[%d,%d] = %v, want %v", seed, e.Qubits, i, j, uw.At(i, j), want)
				}
			}
		}
	}
}

func TestEmbedUniform(t *testing.T) {
	// The 12 placements of 2 qubits on 4 equally likely: chi-square with 11
	// degrees of freedom, critical value chi2.isf(5e-7, 11) = 50.54 from SciPy
	// (testdata/gen/reference.txt). Two checks (Example, rapid.Check) at 5e-7
	// each: false failure ≤ 1e-6 per run.
	const crit = 50.54211384208565
	example, checked := drawAll(t, Embed(circuit.New(2).CX(0, 1), 4), 12*300, 1)
	for name, sample := range map[string][]Embedding{"Example": example, "rapid.Check": checked} {
		counts := map[string]int{}
		for _, e := range sample {
			counts[fmt.Sprint(e.Qubits)]++
		}
		if chi2, seen := chiSquareUniform(counts, 12); seen > 12 || chi2 > crit {
			t.Errorf("via %s: placements %v give chi-square %.1f > %.1f", name, counts, chi2, crit)
		}
	}
}

func TestEmbedShrinksToIdentityPlacement(t *testing.T) {
	got := shrunk(t, Embed(circuit.New(2).CX(0, 1), 5), func(e Embedding) bool { return true })
	if !slices.Equal(got.Qubits, []int{0, 1}) {
		t.Errorf("placement shrinks to %v, want [0 1]", got.Qubits)
	}
}

func TestEmbedErrors(t *testing.T) {
	bad := circuit.New(2).CX(0, 0)
	for _, c := range []struct {
		name string
		g    func() (bool, string)
		want string
	}{
		{"nil", func() (bool, string) { return report(t, Embed(nil, 3)) }, "gen.Embed: the circuit is nil"},
		{"too wide", func() (bool, string) { return report(t, Embed(circuit.New(4), 3)) }, "a 4-qubit circuit does not fit in width 3"},
		{"ill formed", func() (bool, string) { return report(t, Embed(bad, 3)) }, "gen.Embed: "},
	} {
		failed, out := c.g()
		if !failed || !strings.Contains(out, c.want) {
			t.Errorf("%s: failed=%v, report %q; want a failure containing %q", c.name, failed, out, c.want)
		}
	}
}
