package sim

import (
	"fmt"
	"math/rand/v2"
	"slices"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

func randomOps(n, count int, rng *rand.Rand) *circuit.Circuit {
	c := circuit.New(n)
	for range count {
		p := rng.Perm(n)
		switch rng.IntN(4) {
		case 0:
			c.H(p[0])
		case 1:
			c.Append(mustGate("rz", rng.Float64()*6), p[0])
		case 2:
			c.Append(mustGate("u", rng.Float64()*6, rng.Float64()*6, rng.Float64()*6), p[0])
		default:
			c.CX(p[0], p[1])
		}
	}
	return c
}

func mustGate(name string, params ...float64) circuit.Gate {
	g, err := circuit.NewGate(name, params...)
	if err != nil {
		panic(err)
	}
	return g
}

// shuffleDisjoint exchanges adjacent ops on disjoint qubits at random: a rewrite that keeps the
// unitary exactly, because operators on different qubits commute.
func shuffleDisjoint(c *circuit.Circuit, rng *rand.Rand) *circuit.Circuit {
	d := c.Clone()
	for range 10 * len(d.Ops) {
		i := rng.IntN(len(d.Ops) - 1)
		a, b := d.Ops[i], d.Ops[i+1]
		if !slices.ContainsFunc(a.Qubits, func(q int) bool { return slices.Contains(b.Qubits, q) }) {
			d.Ops[i], d.Ops[i+1] = b, a
		}
	}
	return d
}

// The distance of two circuits equals the distance of their difference windows (unitary
// invariance of the operator norm, Nielsen & Chuang §4.5.3 / Window's doc): checked with the dense
// engine on random pairs of up to 8 qubits that share most ops, reordered on disjoint qubits, with
// one op changed or not.
func TestWindowDistance(t *testing.T) {
	rng := rand.New(rand.NewPCG(21, 22))
	for trial := range 60 {
		n := 2 + trial%7
		a := randomOps(n, 40, rng)
		b := a.Clone()
		if trial%4 != 0 {
			i := rng.IntN(len(b.Ops))
			b.Ops[i] = randomOps(n, 1, rng).Ops[0]
		}
		b = shuffleDisjoint(b, rng)
		w, err := DifferenceWindow(a, b)
		if err != nil {
			t.Fatal(err)
		}
		wa, wb := w.Circuits(a, b)
		ua, ub := unitaryOf(t, a), unitaryOf(t, b)
		full := metric.PhaseDistance(ua, ub)
		var win float64
		if !w.Empty() {
			win = metric.PhaseDistance(unitaryOf(t, wa), unitaryOf(t, wb))
		}
		if d := full - win; d > 1e-12 || d < -1e-12 {
			t.Errorf("trial %d: circuits at distance %.15g, windows at %.15g", trial, full, win)
		}
		if trial%4 == 0 && !w.Empty() {
			t.Errorf("trial %d: a reordering on disjoint qubits left a window of %d and %d ops", trial, len(w.A), len(w.B))
		}
	}
}

// A one-op change in a 60-qubit circuit leaves a window on that op's qubits only.
func TestWindowWide(t *testing.T) {
	rng := rand.New(rand.NewPCG(23, 24))
	a := randomOps(60, 3000, rng)
	b := shuffleDisjoint(a, rng)
	i := 1500
	b.Ops[i] = circuit.Op{Gate: mustGate("rz", 0.25), Qubits: []int{b.Ops[i].Qubits[0]}}
	w, err := DifferenceWindow(a, b)
	if err != nil {
		t.Fatal(err)
	}
	if len(w.Support) > 2 || len(w.B) != 1 {
		t.Errorf("window %v on qubits %v, want the changed op alone", w, w.Support)
	}
}

func ExampleDifferenceWindow() {
	a := circuit.New(40).H(0).CX(0, 1).T(1).CX(5, 6).H(39)
	b := circuit.New(40).CX(5, 6).H(0).CX(0, 1).Tdg(1).H(39)
	w, _ := DifferenceWindow(a, b)
	fmt.Println(w.A, w.B, w.Support)
	// Output: [2] [3] [1]
}
