package metric

import (
	"math"
	"math/cmplx"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// The Pauli matrices have eigenvalues ±1, worked by hand: X·(1, −1) = (−1, 1), Y·(1, −i) =
// (−1, i) and Z·(0, 1) = (0, −1), so those are the lowest eigenvectors, up to phase. For random Hermitian matrices the answer
// is checked by its definition: ‖H·x − λx‖ small, x a unit vector, and λ no larger than the
// Rayleigh quotient of any other unit vector tried.
func TestLowestEigen(t *testing.T) {
	for _, c := range []struct {
		name string
		h    []complex128
		vec  []complex128
	}{
		{"X", []complex128{0, 1, 1, 0}, []complex128{1 / math.Sqrt2, -1 / math.Sqrt2}},
		{"Y", []complex128{0, -1i, 1i, 0}, []complex128{1 / math.Sqrt2, -1i / math.Sqrt2}},
		{"Z", []complex128{1, 0, 0, -1}, []complex128{0, 1}},
	} {
		lam, x := LowestEigen(mat.NewCDense(2, 2, c.h))
		overlap := cmplx.Abs(x[0]*cmplx.Conj(c.vec[0]) + x[1]*cmplx.Conj(c.vec[1]))
		if math.Abs(lam+1) > 1e-15 || math.Abs(overlap-1) > 1e-14 {
			t.Errorf("%s: λ = %g, vector %v (overlap %g with %v)", c.name, lam, x, overlap, c.vec)
		}
	}
	rng := rand.New(rand.NewPCG(3, 4))
	for _, n := range []int{1, 3, 8, 17} {
		h := mat.NewCDense(n, n, nil)
		for i := 0; i < n; i++ {
			h.Set(i, i, complex(rng.NormFloat64(), 0))
			for j := 0; j < i; j++ {
				z := complex(rng.NormFloat64(), rng.NormFloat64())
				h.Set(i, j, z)
				h.Set(j, i, cmplx.Conj(z))
			}
		}
		lam, x := LowestEigen(h)
		rayleigh := func(v []complex128) float64 {
			var num complex128
			den := 0.0
			for i := range v {
				for j := range v {
					num += cmplx.Conj(v[i]) * h.At(i, j) * v[j]
				}
				den += real(v[i])*real(v[i]) + imag(v[i])*imag(v[i])
			}
			return real(num) / den
		}
		res, norm := 0.0, 0.0
		for i := 0; i < n; i++ {
			var s complex128
			for j := 0; j < n; j++ {
				s += h.At(i, j) * x[j]
			}
			d := s - complex(lam, 0)*x[i]
			res += real(d)*real(d) + imag(d)*imag(d)
			norm += real(x[i])*real(x[i]) + imag(x[i])*imag(x[i])
		}
		if math.Sqrt(res) > 1e-12*float64(n) || math.Abs(norm-1) > 1e-13 {
			t.Errorf("n = %d: residual %g, norm² %g", n, math.Sqrt(res), norm)
		}
		for k := 0; k < 50; k++ {
			v := make([]complex128, n)
			for i := range v {
				v[i] = complex(rng.NormFloat64(), rng.NormFloat64())
			}
			if q := rayleigh(v); q < lam-1e-12 {
				t.Fatalf("n = %d: Rayleigh quotient %g below λ_min = %g", n, q, lam)
			}
		}
	}
}
