package metric

import (
	"math"

	"gonum.org/v1/gonum/lapack"
	lapackgonum "gonum.org/v1/gonum/lapack/gonum"
)

// tridiagonal is a Hermitian matrix reduced by Householder similarities to a
// real symmetric tridiagonal matrix T = Qᴴ·A·Q (Golub & Van Loan, Matrix
// Computations, 4th ed., §8.3.1; the complex reflector is the one of LAPACK's
// zlarfg, so the off-diagonal comes out real).
type tridiagonal struct {
	n    int
	a    []complex128 // column-major; column k below k+1 holds reflector k
	diag []float64    // diagonal of T
	off  []float64    // sub-diagonal of T, length n−1
	tau  []complex128 // reflector k is I − tau[k]·v·vᴴ, v = (1, a[k+2:n, k])
}

// reduce overwrites t.a (n×n, column-major, Hermitian: only the lower triangle
// is read) with the reflectors and fills diag, off and tau. work needs length n.
func (t *tridiagonal) reduce(work []complex128) {
	n, a := t.n, t.a
	for k := 0; k < n-1; k++ {
		m := n - k - 1
		col := a[k*n+k+1 : k*n+n]
		beta, tau := reflector(col)
		t.diag[k] = real(a[k*n+k])
		t.off[k] = beta
		t.tau[k] = tau
		if tau == 0 {
			continue
		}
		col[0] = 1
		trail := a[(k+1)*n+k+1:]
		x := work[:m]
		hemvLower(m, tau, trail, n, col, x)
		var dot complex128
		for i, xi := range x {
			dot += conj(xi) * col[i]
		}
		s := -0.5 * tau * dot
		for i, vi := range col {
			x[i] += s * vi
		}
		her2Lower(m, col, x, trail, n)
		col[0] = complex(beta, 0)
	}
	t.diag[n-1] = real(a[(n-1)*n+n-1])
}

// reflector turns x into the vector v of a Householder reflector
// H = I − tau·v·vᴴ with Hᴴ·x = (beta, 0, …, 0), beta real: x[0] is left for
// the caller, x[1:] becomes v[1:] (v[0] = 1). It follows LAPACK's zlarfg
// without the rescaling for tiny norms, which the unit-scale inputs of this
// package do not need.
func reflector(x []complex128) (beta float64, tau complex128) {
	alpha := x[0]
	var ss float64
	for _, z := range x[1:] {
		ss += real(z)*real(z) + imag(z)*imag(z)
	}
	ar, ai := real(alpha), imag(alpha)
	if ss == 0 && ai == 0 {
		return ar, 0
	}
	beta = -math.Copysign(math.Sqrt(ar*ar+ai*ai+ss), ar)
	tau = complex((beta-ar)/beta, -ai/beta)
	s := 1 / (alpha - complex(beta, 0))
	for i := range x[1:] {
		x[i+1] *= s
	}
	return beta, tau
}

// hemvLower sets y = alpha·A·x for the m×m Hermitian A whose lower triangle
// is stored column-major in a.
func hemvLower(m int, alpha complex128, a []complex128, lda int, x, y []complex128) {
	for i := range y[:m] {
		y[i] = 0
	}
	for j := 0; j < m; j++ {
		cj := a[j*lda+j+1 : j*lda+m]
		xj := x[j]
		below := x[j+1 : m]
		yb := y[j+1 : m]
		below = below[:len(cj)]
		yb = yb[:len(cj)]
		var s complex128
		for i, aij := range cj {
			yb[i] += aij * xj
			s += conj(aij) * below[i]
		}
		y[j] += complex(real(a[j*lda+j]), 0)*xj + s
	}
	for i := range y[:m] {
		y[i] *= alpha
	}
}

// her2Lower sets A = A − v·wᴴ − w·vᴴ on the lower triangle of the m×m
// Hermitian A stored column-major in a, keeping the diagonal real.
func her2Lower(m int, v, w, a []complex128, lda int) {
	for j := 0; j < m; j++ {
		wj, vj := conj(w[j]), conj(v[j])
		cj := a[j*lda+j : j*lda+m]
		vs := v[j:m]
		ws := w[j:m]
		vs = vs[:len(cj)]
		ws = ws[:len(cj)]
		for i := range cj {
			cj[i] -= vs[i]*wj + ws[i]*vj
		}
		cj[0] = complex(real(cj[0]), 0)
	}
}

// values returns the eigenvalues of T in ascending order, overwriting diag
// and off. It reports false if the QR iteration did not converge.
func (t *tridiagonal) values() ([]float64, bool) {
	ok := lapackgonum.Implementation{}.Dsterf(t.n, t.diag, t.off)
	return t.diag, ok
}

// vectors returns the eigenvalues of T in ascending order and the
// eigenvectors of T as the columns of a row-major n×n real matrix, overwriting
// diag and off.
func (t *tridiagonal) vectors() ([]float64, []float64, bool) {
	n := t.n
	z := make([]float64, n*n)
	work := make([]float64, max(1, 2*n-2))
	ok := lapackgonum.Implementation{}.Dsteqr(lapack.EVTridiag, n, t.diag, t.off, z, n, work)
	return t.diag, z, ok
}

// backTransform turns an eigenvector of T, given as column j of the
// row-major real matrix z, into the eigenvector Q·y of the original matrix.
func (t *tridiagonal) backTransform(z []float64, j int, dst []complex128) []complex128 {
	n := t.n
	for i := 0; i < n; i++ {
		dst[i] = complex(z[i*n+j], 0)
	}
	for k := n - 2; k >= 0; k-- {
		tau := t.tau[k]
		if tau == 0 {
			continue
		}
		tail := t.a[k*n+k+2 : k*n+n]
		seg := dst[k+1 : n]
		s := seg[0]
		for i, vi := range tail {
			s += conj(vi) * seg[i+1]
		}
		s *= tau
		seg[0] -= s
		for i, vi := range tail {
			seg[i+1] -= s * vi
		}
	}
	return dst
}

func conj(z complex128) complex128 { return complex(real(z), -imag(z)) }
