package synthesis

import (
	"flag"
	"math"
	"math/rand"
	"strings"
	"sync"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/budget"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// long turns on the longer runs: more dense checks, the 40-qubit scenario at a tighter budget,
// and the T-count table with a larger net.
var long = flag.Bool("long", false, "run the long synthesis checks and the T-count table")

// smallNet is the net of the default test run: words of up to 12 letters, 2350 operators, built
// in milliseconds; a measured covering radius of about 0.15.
var smallNet = sync.OnceValue(func() *Net {
	n, err := NewNet(12)
	if err != nil {
		panic(err)
	}
	return n
})

// randomCircuit returns a circuit of n qubits with the given number of ops, mixing rotations
// (with arbitrary angles) and Clifford gates, from a seeded source.
func randomCircuit(r *rand.Rand, n, ops int) *circuit.Circuit {
	c := circuit.New(n)
	for i := 0; i < ops; i++ {
		q := r.Intn(n)
		a := (r.Float64()*2 - 1) * math.Pi
		switch r.Intn(8) {
		case 0:
			c.RZ(a, q)
		case 1:
			c.RX(a, q)
		case 2:
			c.RY(a, q)
		case 3:
			c.P(a, q)
		case 4:
			c.U(a, r.Float64()*6, r.Float64()*6, q)
		case 5:
			c.H(q)
		default:
			p := (q + 1 + r.Intn(n-1)) % n
			c.CX(q, p)
		}
	}
	return c
}

// The words are exact products of the gate set: each replacement holds only h, s, sdg, t and tdg,
// and the product of their textbook matrices (multiplied here, not by the code under test) is
// within the recorded δ of the rotation, which is within its share.
func TestWordsAreProductsOfTheGateSet(t *testing.T) {
	r := rand.New(rand.NewSource(1))
	before := randomCircuit(r, 3, 40)
	orig := before.Clone()
	var l budget.Ledger
	after, err := Pass{Net: smallNet(), Epsilon: 0.2, MaxLevels: 3}.Run(before, &l)
	if err != nil {
		t.Fatal(err)
	}
	if !before.Equal(orig) {
		t.Fatal("the pass modified its input")
	}
	if l.Len() == 0 {
		t.Fatal("no rotation was replaced")
	}
	for _, e := range l.Entries() {
		m := []complex128{1, 0, 0, 1}
		tcount := 0
		for _, op := range e.Replacement.Ops {
			g, ok := textbook[op.Gate.Name]
			if !ok || len(op.Qubits) != 1 || op.Qubits[0] != 0 {
				t.Fatalf("entry %d: replacement op %s is not in the gate set", e.Seq, op)
			}
			if op.Gate.Name == "t" || op.Gate.Name == "tdg" {
				tcount++
			}
			m = mul2(g, m)
		}
		rot := e.Piece.Ops[0].Gate.Elements()
		d := metric.PhaseDistance(dense2(rot), dense2(m))
		if math.Abs(d-e.Delta) > 1e-9 {
			t.Errorf("entry %d: the textbook product is %.12g from the rotation, the ledger says %.12g", e.Seq, d, e.Delta)
		}
		if d > e.Share {
			t.Errorf("entry %d: δ = %.3g over its share %.3g", e.Seq, d, e.Share)
		}
	}
	if err := l.Covers(before, after); err != nil {
		t.Fatal(err)
	}
	budget.Within(t, &l, 0.2)
}

// On 8 qubits the dense distance of the whole circuits is at most the certified bound
// (Nielsen & Chuang §4.5.3). Three seeded circuits of 60 ops in the default run, twenty with -long.
func TestDenseDistanceWithinBound(t *testing.T) {
	seeds := int64(3)
	if *long {
		seeds = 20
	}
	for seed := int64(1); seed <= seeds; seed++ {
		r := rand.New(rand.NewSource(seed))
		before := randomCircuit(r, 8, 60)
		var l budget.Ledger
		const eps = 0.3
		after, err := Pass{Net: smallNet(), Epsilon: eps}.Run(before, &l)
		if err != nil {
			t.Fatal(err)
		}
		u, err := sim.Unitary(before)
		if err != nil {
			t.Fatal(err)
		}
		v, err := sim.Unitary(after)
		if err != nil {
			t.Fatal(err)
		}
		truth := metric.PhaseDistance(u, v)
		// Slack for rounding in the dense products of a few thousand gates (common practice).
		if truth > l.Bound()+1e-9 {
			t.Errorf("seed %d: dense distance %.6g exceeds the certified bound %.6g", seed, truth, l.Bound())
		}
		budget.Within(t, &l, eps)
		if seed == 1 {
			// The same through the public check: equivalent within the certified bound.
			qcheck.Equivalent(t, before, after, qcheck.Tolerance(l.Bound()+1e-9))
		}
		t.Logf("seed %d: %d rotations → %d ops; dense distance %.4g ≤ certified %.4g ≤ ε = %g",
			seed, l.Len(), after.Len(), truth, l.Bound(), eps)
	}
}

func TestPassRefuses(t *testing.T) {
	c := circuit.New(2).H(0).RZ(0.1234, 1)
	for _, tc := range []struct {
		name string
		pass Pass
		c    *circuit.Circuit
		want string
	}{
		{"no net", Pass{Epsilon: 0.1}, c, "no net"},
		{"bad budget", Pass{Net: smallNet(), Epsilon: -1}, c, "ε = -1"},
		{"unreachable", Pass{Net: smallNet(), Epsilon: 1e-9, MaxLevels: 1}, c, "op 1 (rz(0.1234) q1): after 1 levels"},
		{"invalid", Pass{Net: smallNet(), Epsilon: 0.1}, circuit.New(1).RZ(math.Inf(1), 0), "op 0 (rz)"},
	} {
		if _, err := tc.pass.Run(tc.c, nil); err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("%s: Run = %v, want an error containing %q", tc.name, err, tc.want)
		}
	}
}

// The pass leaves its input alone and non-rotations in place.
func TestPassKeepsTheRest(t *testing.T) {
	c := circuit.New(2).H(0).CX(0, 1).Measure(1, 0)
	orig := c.Clone()
	out, err := Pass{Net: smallNet(), Epsilon: 0.1}.Run(c, nil)
	if err != nil {
		t.Fatal(err)
	}
	if !c.Equal(orig) || !out.Equal(orig) {
		t.Errorf("a circuit with no rotation changed: %v → %v", orig.Ops, out.Ops)
	}
}
