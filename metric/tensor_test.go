package metric

import (
	"math/cmplx"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// kronDense returns a ⊗ b.
func kronDense(a, b *mat.CDense) *mat.CDense {
	ra, _ := a.Dims()
	rb, _ := b.Dims()
	out := mat.NewCDense(ra*rb, ra*rb, nil)
	for i := range ra {
		for j := range ra {
			for k := range rb {
				for l := range rb {
					out.Set(i*rb+k, j*rb+l, a.At(i, j)*b.At(k, l))
				}
			}
		}
	}
	return out
}

// The distance of a tensor product from the identity, from its factors' eigenphases, equals
// PhaseDistance of the product's matrix: random unitaries of 2 to 8 dimensions, up to three factors.
func TestTensorPhaseDistance(t *testing.T) {
	rng := rand.New(rand.NewPCG(31, 32))
	for trial := range 30 {
		var spectra [][]float64
		var w *mat.CDense
		for range 1 + trial%3 {
			f := spreadUnitary(rng, 2<<rng.IntN(2), 0.3+rng.Float64()*float64(trial%4))
			spectra = append(spectra, Eigenphases(f))
			if w == nil {
				w = f
			} else {
				w = kronDense(w, f)
			}
		}
		n, _ := w.Dims()
		id := mat.NewCDense(n, n, nil)
		for i := range n {
			id.Set(i, i, 1)
		}
		want := PhaseDistance(w, id)
		got, ok := TensorPhaseDistance(spectra...)
		if !ok || got-want > 1e-12 || want-got > 1e-12 {
			t.Errorf("trial %d: %g, PhaseDistance of the product %g", trial, got, want)
		}
	}
}

// spreadUnitary returns Q·diag(e^{iθ_k})·Q† for a Haar Q and phases θ_k drawn from [0, spread].
func spreadUnitary(rng *rand.Rand, n int, spread float64) *mat.CDense {
	q := haar(rng, n)
	out := mat.NewCDense(n, n, nil)
	theta := make([]float64, n)
	for k := range theta {
		theta[k] = rng.Float64() * spread
	}
	for i := range n {
		for j := range n {
			var s complex128
			for k := range n {
				s += q.At(i, k) * cmplx.Exp(complex(0, theta[k])) * cmplx.Conj(q.At(j, k))
			}
			out.Set(i, j, s)
		}
	}
	return out
}
