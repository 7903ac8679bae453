package metric

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// UnitarityDeviation by hand: a unitary gives 0 (to rounding); c·U gives |c|² − 1 on every row
// (M†M = |c|²I); diag(1+ε, 1, …) gives 2ε + ε²; a unitary with one column doubled, U·diag(2,1,…),
// has M†M = diag(4,1,…) − I = diag(3,0,…): row sum 3.
func TestUnitarityDeviationByHand(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	for _, d := range []int{1, 2, 8, 64, 300} {
		u := haar(rng, d)
		if dev := UnitarityDeviation(u); dev > 1e-12*float64(d) {
			t.Errorf("Haar %d×%d: deviation %.3g", d, d, dev)
		}
		scaled := mat.NewCDense(d, d, nil)
		for i := 0; i < d; i++ {
			for j := 0; j < d; j++ {
				scaled.Set(i, j, 1.001*u.At(i, j))
			}
		}
		if dev, want := UnitarityDeviation(scaled), 1.001*1.001-1; math.Abs(dev-want) > 1e-12*float64(d) {
			t.Errorf("1.001·U at %d: deviation %.9g, want %.9g", d, dev, want)
		}
		col := mat.NewCDense(d, d, nil)
		col.Copy(u)
		for i := 0; i < d; i++ {
			col.Set(i, 0, 2*u.At(i, 0))
		}
		if dev := UnitarityDeviation(col); math.Abs(dev-3) > 1e-12*float64(d) {
			t.Errorf("U with column 0 doubled at %d: deviation %.9g, want 3", d, dev)
		}
	}
	const eps = 1e-7
	m := mat.NewCDense(3, 3, []complex128{1 + eps, 0, 0, 0, 1, 0, 0, 0, 1})
	if dev := UnitarityDeviation(m); math.Abs(dev-(2*eps+eps*eps)) > 4e-16 {
		t.Errorf("diag(1+ε, 1, 1): %.9g, want %.9g", dev, 2*eps+eps*eps)
	}
}

// BenchmarkUnitarityDeviation times the unitarity check of circuit.Custom at 11 qubits (a
// 2048×2048 matrix), which took 84 s with a plain triple loop (issue 17, reproducer 12).
func BenchmarkUnitarityDeviation(b *testing.B) {
	u := haar(rand.New(rand.NewPCG(5, 6)), 2048)
	b.ResetTimer()
	for range b.N {
		UnitarityDeviation(u)
	}
}
