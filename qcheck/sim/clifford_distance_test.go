package sim

import (
	"flag"
	"math"
	"math/rand/v2"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

var cliffordWide = flag.Bool("clifford.wide", false, "check Clifford distances against dense up to 10 qubits")

func randomCliffordCircuit(n, count int, rng *rand.Rand) *circuit.Circuit {
	c := circuit.New(n)
	names := []string{"h", "s", "sdg", "x", "y", "z", "sx", "cx", "cz", "swap", "iswap"}
	for range count {
		g := mustGate(names[rng.IntN(len(names))])
		c.Append(g, rng.Perm(n)[:g.Qubits()]...)
	}
	return c
}

// Clifford distances from the tableau against the dense engine (Unitary, metric.PhaseDistance)
// up to 8 qubits (10 with -clifford.wide): exact where known, never a lower bound above the true
// distance.
func TestCliffordDistanceAgainstDense(t *testing.T) {
	rng := rand.New(rand.NewPCG(41, 42))
	known := 0
	for trial := range 60 {
		n := 2 + trial%7
		if *cliffordWide {
			n = 2 + trial%9
		}
		u := randomCliffordCircuit(n, 3*n, rng)
		v := u.Clone()
		switch trial % 3 {
		case 0:
			v.Compose(randomCliffordCircuit(n, 1+rng.IntN(3), rng))
		case 1:
			v = randomCliffordCircuit(n, 3*n, rng)
		}
		r, err := CliffordDistance(u, v)
		if err != nil {
			t.Fatal(err)
		}
		want := metric.PhaseDistance(unitaryOf(t, u), unitaryOf(t, v))
		if r.Known {
			known++
			if math.Abs(r.Exact-want) > 1e-10 {
				t.Errorf("trial %d (%d qubits): exact %g, dense %g", trial, n, r.Exact, want)
			}
		}
		if r.Lower > want+1e-10 {
			t.Errorf("trial %d (%d qubits): lower bound %g above the dense distance %g", trial, n, r.Lower, want)
		}
	}
	if known == 0 {
		t.Error("no distance known")
	}
}

// At 200 qubits, a Pauli X on every qubit (eigenvalues ±1: distance √2), S on three qubits far
// apart (eigenphases sums of {0, π/2}: arc 3π/2, distance 2·sin(3π/8)) and a SWAP (eigenvalues
// ±1: √2), appended to or (the SWAP) put before a wide random Clifford circuit.
func TestCliffordDistanceWide(t *testing.T) {
	rng := rand.New(rand.NewPCG(43, 44))
	u := randomCliffordCircuit(200, 2000, rng)
	xs, ss, sw := u.Clone(), u.Clone(), circuit.New(200)
	for q := range 200 {
		xs.X(q)
	}
	ss.S(3).S(100).S(190)
	sw.Append(mustGate("swap"), 7, 150).Compose(u)
	for _, tc := range []struct {
		name string
		v    *circuit.Circuit
		want float64
	}{{"X everywhere", xs, math.Sqrt2}, {"three S", ss, 2 * math.Sin(3*math.Pi/8)}, {"swap", sw, math.Sqrt2}} {
		r, err := CliffordDistance(u, tc.v)
		if err != nil {
			t.Fatal(err)
		}
		if !r.Known || math.Abs(r.Exact-tc.want) > 1e-12 {
			t.Errorf("%s: %+v, want exact %g", tc.name, r, tc.want)
		}
	}
}
