package metric

import (
	"math"
	"runtime"
	"sync"

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
	wbuf []complex128 // the vector w of the current rank-2 update
	work []complex128 // n·(maxWorkers+2) elements for reduce, or nil to allocate
}

// maxWorkers caps the goroutines one reduction or product uses.
const maxWorkers = 8

// reduce overwrites t.a (n×n, column-major, Hermitian: only the lower triangle
// is read) with the reflectors and fills diag, off and tau.
//
// The lower triangle is first scaled by a power of two into [0.5, 1) and its
// negligible parts set to zero (see negligible); diag and off are scaled
// back at the end, so T is that of the matrix given.
func (t *tridiagonal) reduce() {
	n, a := t.n, t.a
	big := 0.0
	for j := 0; j < n; j++ {
		big = math.Max(big, largestPart(a[j*n+j:j*n+n]))
	}
	e := scaleExponent(big)
	for j := 0; j < n; j++ {
		scaleParts(a[j*n+j:j*n+n], -e)
	}
	t.reduceScaled()
	if e != 0 {
		scaleFloats(t.diag, e, false)
		scaleFloats(t.off, e, false)
	}
}

// reduceScaled is reduce on a matrix already scaled.
//
// Each step k applies reflector k to the trailing block as the rank-2 update
// A −= v·wᴴ + w·vᴴ and, in the same pass over memory, multiplies the updated
// block by reflector k+1 (which needs only the block's first column, updated
// beforehand). One sweep of the block per step instead of two; for large
// blocks the columns are shared out over the cores.
func (t *tridiagonal) reduceScaled() {
	n, a := t.n, t.a
	t.diag[0] = real(a[0])
	if n == 1 {
		return
	}
	workers := 1
	if n >= parallelTridiagonal {
		workers = max(1, min(runtime.GOMAXPROCS(0), maxWorkers))
	}
	if len(t.work) < n*(workers+1) {
		t.work = make([]complex128, n*(workers+1))
	}
	x := t.work[:n]
	var yarr [maxWorkers][]complex128
	ys := yarr[:workers]
	for w := range ys {
		ys[w] = t.work[n*(w+1) : n*(w+2)]
	}
	t.wbuf = x

	// Reflector 0 and its product with the trailing block.
	t.off[0], t.tau[0] = reflector(a[1:n])
	if t.tau[0] != 0 {
		a[1] = 1
		hemvLower(n-1, t.tau[0], a[n+1:], n, a[1:n], x[:n-1])
	}
	for k := 0; k < n-1; k++ {
		m := n - k - 1
		v := a[k*n+k+1 : k*n+n]
		trail := a[(k+1)*n+k+1:]
		tau := t.tau[k]
		first := trail[:m]
		if tau != 0 {
			// w = x − ½·τ·(xᴴv)·v, then update the trailing block's first column.
			w := x[:m]
			var dot complex128
			for i, xi := range w {
				dot += conj(xi) * v[i]
			}
			s := -0.5 * tau * dot
			for i, vi := range v {
				w[i] += s * vi
			}
			v0, w0 := conj(v[0]), conj(w[0])
			for i := range first {
				first[i] -= v[i]*w0 + w[i]*v0
			}
		}
		t.diag[k+1] = real(first[0])
		if m == 1 {
			v[0] = complex(t.off[k], 0)
			break
		}
		next := first[1:m]
		t.off[k+1], t.tau[k+1] = reflector(next)
		if t.tau[k+1] != 0 {
			next[0] = 1
		}
		t.sweep(k, workers, ys)
		if t.tau[k+1] != 0 {
			xs := x[:m-1]
			for i := range xs {
				var s complex128
				for _, y := range ys {
					s += y[i]
				}
				xs[i] = t.tau[k+1] * s
			}
		}
		v[0] = complex(t.off[k], 0)
	}
}

// parallelTridiagonal is the order from which reduce shares its sweeps out
// over goroutines.
const parallelTridiagonal = 256

// sweep applies step k's rank-2 update to columns 1… of the trailing block
// and accumulates, into ys (one buffer per worker, summed by the caller), the
// product of the next trailing block with reflector k+1.
func (t *tridiagonal) sweep(k, workers int, ys [][]complex128) {
	n := t.n
	m := n - k - 1
	if workers == 1 || m < parallelTridiagonal/2 {
		t.sweepColumns(k, 1, m, ys[0])
		for _, y := range ys[1:] {
			clear(y[:m-1])
		}
		return
	}
	// Column j holds m − j entries: cut where the remaining area is shared
	// equally.
	var wg sync.WaitGroup
	lo := 1
	for w := 0; w < workers; w++ {
		hi := m
		if w < workers-1 {
			hi = max(lo, int(float64(m)*(1-math.Sqrt(1-float64(w+1)/float64(workers)))))
		}
		wg.Add(1)
		go func(lo, hi int, y []complex128) {
			defer wg.Done()
			t.sweepColumns(k, lo, hi, y)
		}(lo, hi, ys[w])
		lo = hi
	}
	wg.Wait()
}

// sweepColumns does sweep's work for columns [lo, hi) of the trailing block
// of step k, writing its share of the next product into y (length m−1,
// cleared here).
func (t *tridiagonal) sweepColumns(k, lo, hi int, y []complex128) {
	n, a := t.n, t.a
	m := n - k - 1
	y = y[:m-1]
	clear(y)
	v := a[k*n+k+1 : k*n+n]
	trail := a[(k+1)*n+k+1:]
	tau := t.tau[k]
	next := trail[1:m] // reflector k+1, indexed by the rows of the next block
	product := t.tau[k+1] != 0
	w := v // with tau = 0 the update has zero coefficients and w is not used
	if tau != 0 {
		w = t.wbuf[:m]
	}
	for j := lo; j < hi; j++ {
		col := trail[j*n+j : j*n+m]
		var vj, wj complex128
		if tau != 0 {
			vj, wj = conj(v[j]), conj(w[j])
			col[0] -= v[j]*wj + w[j]*vj
		}
		col[0] = complex(real(col[0]), 0)
		if !product {
			if tau != 0 {
				sweepUpdate(col[1:], v[j+1:m], w[j+1:m], -wj, -vj)
			}
			continue
		}
		// Column j of this block is column j−1 of the next one.
		xj := next[j-1]
		s := sweepKernel(col[1:], v[j+1:m], w[j+1:m], y[j:m-1], next[j:m-1], -wj, -vj, xj)
		y[j-1] += complex(real(col[0]), 0)*xj + s
	}
}

// sweepUpdate does col[i] += v[i]·p + w[i]·q for every i of col.
func sweepUpdate(col, v, w []complex128, p, q complex128) {
	v = v[:len(col)]
	w = w[:len(col)]
	for i := range col {
		col[i] += v[i]*p + w[i]*q
	}
}

// sweepKernelGo is the portable form of sweepKernel.
func sweepKernelGo(col, v, w, y, x []complex128, p, q, r complex128) complex128 {
	v = v[:len(col)]
	w = w[:len(col)]
	y = y[:len(col)]
	x = x[:len(col)]
	var s complex128
	for i := range col {
		c := col[i] + v[i]*p + w[i]*q
		col[i] = c
		y[i] += c * r
		s += conj(c) * x[i]
	}
	return s
}

// reflector turns x into the vector v of a Householder reflector
// H = I − tau·v·vᴴ with Hᴴ·x = (beta, 0, …, 0), beta real: x[0] is left for
// the caller, x[1:] becomes v[1:] (v[0] = 1). It follows LAPACK's zlarfg,
// with the norm summed over entries scaled by the largest one instead of
// zlarfg's repeated rescaling.
func reflector(x []complex128) (beta float64, tau complex128) {
	alpha := x[0]
	ar, ai := real(alpha), imag(alpha)
	// The norm is summed scaled by the largest part, so that tiny entries (a rounding error
	// beside a 1e-98 term, say) do not square to zero and leave beta = 0 to divide by.
	scale := math.Max(math.Abs(ar), math.Abs(ai))
	for _, z := range x[1:] {
		scale = math.Max(scale, math.Max(math.Abs(real(z)), math.Abs(imag(z))))
	}
	if scale == 0 {
		return 0, 0
	}
	var ss float64
	for _, z := range x[1:] {
		zr, zi := real(z)/scale, imag(z)/scale
		ss += zr*zr + zi*zi
	}
	if ss == 0 && ai == 0 {
		return ar, 0
	}
	sr, si := ar/scale, ai/scale
	beta = -math.Copysign(scale*math.Sqrt(sr*sr+si*si+ss), ar)
	tau = complex((beta-ar)/beta, -ai/beta)
	// |alpha − beta| = |ar| + |beta| (in the real part) is at least |beta|,
	// which is at least every part of x: each quotient is at most about 1.
	// Its reciprocal overflows when beta is subnormal, so then divide.
	d := alpha - complex(beta, 0)
	if math.Abs(beta) >= 0x1p-1000 {
		s := 1 / d
		for i := range x[1:] {
			x[i+1] *= s
		}
	} else {
		for i := range x[1:] {
			x[i+1] /= d
		}
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

// values returns the eigenvalues of T in ascending order, overwriting diag
// and off. It reports false if the QR iteration did not converge, which for
// finite entries it does not.
//
// T is handed to Dsterf scaled by a power of two into [0.5, 1) with its
// negligible entries set to zero (see negligible), so that Dsterf never
// rescales a block itself; the eigenvalues are scaled back.
func (t *tridiagonal) values() ([]float64, bool) {
	e := scaleExponent(math.Max(largestAbs(t.diag), largestAbs(t.off)))
	scaleFloats(t.diag, -e, true)
	scaleFloats(t.off, -e, true)
	ok := lapackgonum.Implementation{}.Dsterf(t.n, t.diag, t.off)
	if e != 0 {
		scaleFloats(t.diag, e, false)
	}
	return t.diag, ok
}

// backTransform turns an eigenvector y of T into the eigenvector Q·y of the
// original matrix, written to dst.
func (t *tridiagonal) backTransform(y []float64, dst []complex128) []complex128 {
	n := t.n
	for i := 0; i < n; i++ {
		dst[i] = complex(y[i], 0)
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
