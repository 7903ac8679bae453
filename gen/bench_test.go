package gen

import (
	"math/rand/v2"
	"testing"

	"pgregory.net/rapid"
)

// Benchmarks. Run briefly on a shared machine, e.g.
//
//	go test -run='^$' -bench=. -benchtime=1x ./gen/        (the 10-qubit pair)
//	go test -run='^$' -bench=Circuit -benchtime=2000x ./gen/

// BenchmarkHaarUnitary10 draws a 10-qubit Haar unitary through rapid: seed
// bits, 2^21 Gaussian variates, the QR and the phase fix.
func BenchmarkHaarUnitary10(b *testing.B) {
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
	for b.Loop() {
		copy(work, a)
		householderQR(work, d)
	}
}

// BenchmarkCircuit3x30 draws a 3-qubit circuit of exactly 30 ops from the
// default gate set with motifs.
func BenchmarkCircuit3x30(b *testing.B) {
	g := Circuit(Options{Qubits: 3, MinOps: 30, MaxOps: 30})
	for i := 0; b.Loop(); i++ {
		g.Example(i)
	}
}

// BenchmarkCircuit3x30InCheck is the same draw inside rapid.Check, where
// rapid also records every draw for shrinking.
func BenchmarkCircuit3x30InCheck(b *testing.B) {
	g := Circuit(Options{Qubits: 3, MinOps: 30, MaxOps: 30})
	n := 0
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
	for i := 0; b.Loop(); i++ {
		g.Example(i)
	}
}
