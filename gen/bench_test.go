package gen

import (
	"math/rand/v2"
	"testing"

	"pgregory.net/rapid"
)

// Benchmarks. Run briefly on a shared machine, e.g.
//
//	go test -run='^$' -bench='Unitary10|QR10' -benchtime=1x -count=3 ./gen/
//	go test -run='^$' -bench='Circuit|Clifford' -benchtime=3000x -count=3 ./gen/
//
// Each also reports cpu-ns/op, the process's CPU time per op, which a busy
// machine inflates far less than ns/op (the QR uses all cores, so its
// cpu-ns/op is summed over them).

// BenchmarkHaarUnitary10 draws a 10-qubit Haar unitary through rapid: seed
// bits, 2^21 Gaussian variates, the QR and the phase fix.
func BenchmarkHaarUnitary10(b *testing.B) {
	defer reportCPU(b)()
	g := Unitary(10)
	for i := 0; b.Loop(); i++ {
		g.Example(i)
	}
}

// BenchmarkHouseholderQR10 is the QR alone on a 1024×1024 complex Gaussian
// matrix, the cost BenchmarkHaarUnitary10 rests on.
func BenchmarkHouseholderQR10(b *testing.B) { benchmarkQR(b, 1024) }

// BenchmarkHouseholderQR8 is the QR on a 256×256 matrix, quick enough to
// compare code changes on a busy machine.
func BenchmarkHouseholderQR8(b *testing.B) { benchmarkQR(b, 256) }

func benchmarkQR(b *testing.B, d int) {
	rng := rand.New(rand.NewPCG(1, 1))
	a := make([]complex128, d*d)
	work := make([]complex128, d*d)
	for i := range a {
		a[i] = complex(rng.NormFloat64(), rng.NormFloat64())
	}
	defer reportCPU(b)()
	for b.Loop() {
		copy(work, a)
		householderQR(work, d)
	}
}

// BenchmarkCircuit3x30 draws a 3-qubit circuit of exactly 30 ops from the
// default gate set with motifs.
func BenchmarkCircuit3x30(b *testing.B) {
	g := Circuit(Options{Qubits: 3, MinOps: 30, MaxOps: 30})
	defer reportCPU(b)()
	for i := 0; b.Loop(); i++ {
		g.Example(i)
	}
}

// BenchmarkCircuit3x30InCheck is the same draw inside rapid.Check, where
// rapid also records every draw for shrinking.
func BenchmarkCircuit3x30InCheck(b *testing.B) {
	g := Circuit(Options{Qubits: 3, MinOps: 30, MaxOps: 30})
	n := 0
	defer reportCPU(b)()
	rapid.Check(b, func(t *rapid.T) {
		for range b.N / 100 {
			g.Draw(t, "c")
			n++
		}
	})
}

// BenchmarkClifford5 draws a uniform 5-qubit Clifford circuit.
func BenchmarkClifford5(b *testing.B) {
	g := Clifford(5)
	defer reportCPU(b)()
	for i := 0; b.Loop(); i++ {
		g.Example(i)
	}
}
