package metric

import (
	"math"
	"math/cmplx"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// mulAdd against the textbook triple loop, on odd shapes, sub-blocks with
// leading dimensions larger than the block, and sizes that cross the cache
// blocks and the parallel threshold.
func TestMulAdd(t *testing.T) {
	rng := newRand(1)
	randc := func(k int) []complex128 {
		x := make([]complex128, k)
		for i := range x {
			x[i] = complex(rng.NormFloat64(), rng.NormFloat64())
		}
		return x
	}
	for _, s := range [][3]int{{1, 1, 1}, {3, 5, 7}, {2, 2, 2}, {17, 4, 9}, {200, 3, 130}, {70, 70, 70}, {257, 131, 129}} {
		m, n, k := s[0], s[1], s[2]
		lda, ldb, ldc := m+3, k+1, m+2
		a, b, c := randc(lda*k), randc(ldb*n), randc(ldc*n)
		want := append([]complex128(nil), c...)
		alpha := complex(0.3, -1.1)
		for j := 0; j < n; j++ {
			for i := 0; i < m; i++ {
				var sum complex128
				for p := 0; p < k; p++ {
					sum += a[i+p*lda] * b[p+j*ldb]
				}
				want[i+j*ldc] += alpha * sum
			}
		}
		mulAdd(m, n, k, alpha, a, lda, b, ldb, c, ldc)
		for i := range c {
			if cmplx.Abs(c[i]-want[i]) > 1e-12*float64(k) {
				t.Fatalf("%d×%d×%d: element %d = %v, want %v", m, n, k, i, c[i], want[i])
			}
		}
	}
}

// The portable and (on amd64) vector forms of the inner loop agree.
func TestMulAdd2x2Forms(t *testing.T) {
	rng := newRand(2)
	for _, n := range []int{1, 2, 3, 8, 33} {
		mk := func() []complex128 {
			x := make([]complex128, n)
			for i := range x {
				x[i] = complex(rng.NormFloat64(), rng.NormFloat64())
			}
			return x
		}
		a0, a1, c0, c1 := mk(), mk(), mk(), mk()
		g0, g1 := append([]complex128(nil), c0...), append([]complex128(nil), c1...)
		b := [4]complex128{1 + 2i, -0.5i, 3, -1 + 1i}
		mulAdd2x2(c0, c1, a0, a1, b[0], b[1], b[2], b[3])
		for i := range a0 {
			g0[i] += a0[i]*b[0] + a1[i]*b[1]
			g1[i] += a0[i]*b[2] + a1[i]*b[3]
		}
		for i := range c0 {
			if cmplx.Abs(c0[i]-g0[i]) > 1e-14 || cmplx.Abs(c1[i]-g1[i]) > 1e-14 {
				t.Fatalf("n=%d, i=%d: got %v %v, want %v %v", n, i, c0[i], c1[i], g0[i], g1[i])
			}
		}
	}
}

// The portable loops give the same eigenphases as the vector kernels, at a
// size where the tridiagonal reduction shares its sweeps over goroutines
// (n ≥ parallelTridiagonal), for a spectrum with a cluster and a diagonal
// input (every reflector trivial).
func TestKernelsPortableAndLarge(t *testing.T) {
	if testing.Short() {
		t.Skip("large eigenproblem")
	}
	rng := newRand(4)
	n := parallelTridiagonal + 44
	ph := make([]float64, n)
	for i := range ph {
		ph[i] = 2*math.Pi*rng.Float64() - math.Pi
	}
	ph[1] = ph[0] + 1e-10
	q := haar(rng, n)
	for _, w := range []*mat.CDense{diagonal(q, ph...), diagonal(nil, ph...)} {
		for _, vector := range []bool{true, false} {
			saved := haveAVX2FMA
			haveAVX2FMA = haveAVX2FMA && vector
			got := Eigenphases(w)
			haveAVX2FMA = saved
			if e := phaseError(got, ph); e > 1e-12 {
				t.Errorf("n=%d, vector kernels %v: eigenphases off by %.3g", n, vector, e)
			}
		}
	}
}
