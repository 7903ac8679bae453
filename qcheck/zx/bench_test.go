package zx

import (
	"fmt"
	"math/rand/v2"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// The wide benchmarks need -zx.wide:
//
//	go test ./qcheck/zx -run '^$' -bench . -zx.wide
//
// Each proves a compiler-style rewrite (basis translation, commuting reorder, routing swaps)
// equivalent to the original, or refutes a one-gate bug.

func benchPair(b *testing.B, u, v *circuit.Circuit, want Verdict) {
	if !*wide {
		b.Skip("needs -zx.wide")
	}
	b.ReportAllocs()
	start := processCPU()
	defer func() { b.ReportMetric((processCPU()-start)/float64(b.N), "cpu-s/op") }()
	for b.Loop() {
		r, err := Compare(u, v, Options{})
		if err != nil {
			b.Fatal(err)
		}
		if r.Verdict != want {
			b.Fatalf("verdict %v (%s), want %v", r.Verdict, r.Reason, want)
		}
	}
}

func rewritten(c *circuit.Circuit, seed uint64) *circuit.Circuit {
	rng := rand.New(rand.NewPCG(seed, 7))
	return route(reorder(translate(c), 20*len(c.Ops), rng), rng)
}

func BenchmarkQFT(b *testing.B) {
	for _, n := range []int{64, 128} {
		b.Run(fmt.Sprint(n), func(b *testing.B) {
			c := qft(n)
			benchPair(b, c, rewritten(c, 1), Equivalent)
		})
	}
}

func BenchmarkAdder(b *testing.B) {
	for _, n := range []int{64, 128} {
		b.Run(fmt.Sprint(n), func(b *testing.B) {
			c := adder((n - 2) / 2)
			benchPair(b, c, rewritten(c, 2), Equivalent)
		})
	}
}

func BenchmarkVolume(b *testing.B) {
	for _, n := range []int{32, 40} {
		c := volume(n, n, rand.New(rand.NewPCG(uint64(n), 9)))
		v := rewritten(c, 3)
		b.Run(fmt.Sprint(n, "/equivalent"), func(b *testing.B) { benchPair(b, c, v, Equivalent) })
		for kind, name := range []string{"angle", "flip", "drop"} {
			w := rewritten(bug(c, kind, 0.3, rand.New(rand.NewPCG(uint64(kind), 11))), 3)
			b.Run(fmt.Sprint(n, "/", name), func(b *testing.B) { benchPair(b, c, w, Different) })
		}
	}
}

// BenchmarkMidWidth: random two-qubit-block circuits of about 1,000 gates at 12 to 22 qubits, the
// range where the dense and matrix-free engines are slow, rewritten, and with one changed angle.
func BenchmarkMidWidth(b *testing.B) {
	for _, n := range []int{12, 16, 22} {
		depth := 1000 / (5 * n)
		c := volume(n, depth, rand.New(rand.NewPCG(uint64(n), 10)))
		v := rewritten(c, 8)
		b.Run(fmt.Sprint(n, "/equivalent"), func(b *testing.B) { benchPair(b, c, v, Equivalent) })
		w := rewritten(bug(c, 0, 0.3, rand.New(rand.NewPCG(uint64(n), 12))), 8)
		b.Run(fmt.Sprint(n, "/angle"), func(b *testing.B) { benchPair(b, c, w, Different) })
	}
}
