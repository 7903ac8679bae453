package zx

import (
	"math/rand/v2"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

func randomClifford(n, count int, rng *rand.Rand) *circuit.Circuit {
	c := circuit.New(n)
	names := []string{"h", "s", "sdg", "x", "z", "sx", "cx", "cz", "swap"}
	for range count {
		g := gate(names[rng.IntN(len(names))])
		c.Append(g, rng.Perm(n)[:g.Qubits()]...)
	}
	return c
}

// Clifford pairs up to 8 qubits: every distance Check reports matches the dense engine's.
func TestCliffordDistancesAgainstDense(t *testing.T) {
	rng := rand.New(rand.NewPCG(14, 15))
	known := 0
	for trial := range 40 {
		n := 2 + trial%7
		u := randomClifford(n, 6*n, rng)
		v := u.Clone().Compose(randomClifford(n, 1+trial%3, rng))
		if trial%5 == 0 {
			v = randomClifford(n, 6*n, rng)
		}
		r, err := Check(u, translate(v), Options{})
		if err != nil {
			t.Fatal(err)
		}
		want := metric.PhaseDistance(dense(t, u), dense(t, v))
		if r.Verdict == Equivalent && want > r.Bound+1e-12 || r.Known && abs(r.Distance-want) > 1e-9 {
			t.Errorf("trial %d (%d qubits): %v, distance %g (known %v); dense %g", trial, n, r.Verdict, r.Distance, r.Known, want)
		}
		if r.Known {
			known++
		}
	}
	if known < 35 {
		t.Errorf("distance known for %d of 40 pairs", known)
	}
}

// A product of local changes far apart in a 40-qubit circuit: the remainder falls into parts,
// and the distance from the sums of their eigenphases matches the dense distance of the local
// gates' tensor product from the identity (unitary invariance).
func TestProductOfLocalChanges(t *testing.T) {
	rng := rand.New(rand.NewPCG(16, 17))
	u := volume(40, 4, rng)
	for _, tail := range [][]string{{"x", "x", "x", "x"}, {"s", "s", "s"}, {"t", "t", "t"}, {"z", "t", "sx"}, {"h"}} {
		v := u.Clone()
		local := circuit.New(len(tail))
		for k, name := range tail {
			v.Append(gate(name), 3+9*k)
			local.Append(gate(name), k)
		}
		want := metric.PhaseDistance(dense(t, local), dense(t, circuit.New(len(tail))))
		r, err := Check(u, rewritten(v, 5), Options{})
		if err != nil {
			t.Fatal(err)
		}
		if !r.Known || abs(r.Distance-want) > r.Bound+1e-9 {
			t.Errorf("%v: %v, distance %g (known %v, %s), want %g", tail, r.Verdict, r.Distance, r.Known, r.Reason, want)
		}
	}
}
