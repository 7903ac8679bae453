package metric

import (
	"math"

	"gonum.org/v1/gonum/mat"
)

// OperatorNorm returns ‖a‖, the largest singular value of a, which may be any
// non-empty r×c matrix. It is the square root of the largest eigenvalue of
// the Hermitian Gram matrix a†a (or aa†, whichever is smaller), which keeps
// the relative accuracy of the largest singular value.
func OperatorNorm(a mat.CMatrix) float64 {
	r, c := a.Dims()
	if r == 0 || c == 0 {
		inputPanic("OperatorNorm", "matrix is %d×%d, want a non-empty matrix", r, c)
	}
	return operatorNorm(rowMajor(a, nil), r, c)
}

// Distance returns ‖u − v‖, the operator norm of the difference of two square
// matrices of equal size. For unitaries it is at most 2, and if
// ‖U_k − V_k‖ ≤ δ_k for each factor of two products then the products differ
// by at most Σδ_k (Nielsen & Chuang §4.5.3). The global phase counts here;
// PhaseDistance takes it out.
func Distance(u, v mat.CMatrix) float64 {
	n := pairSize("Distance", u, v)
	d, k := difference(u, v)
	return math.Ldexp(operatorNorm(d, n, n), k)
}

// difference returns (a − b)/2^k row-major, for matrices of equal size, with
// k = 0 unless a − b overflows, when k = 1.
func difference(a, b mat.CMatrix) ([]complex128, int) {
	d := subtract(a, b, 1)
	if math.IsInf(largestPart(d), 0) {
		return subtract(a, b, 0.5), 1
	}
	return d, 0
}

// subtract returns s·a − s·b row-major.
func subtract(a, b mat.CMatrix, s float64) []complex128 {
	d := rowMajor(a, nil)
	r, c := b.Dims()
	if s != 1 {
		for i, x := range d {
			d[i] = complex(s*real(x), s*imag(x))
		}
	}
	if m, ok := b.(*mat.CDense); ok {
		raw := m.RawCMatrix()
		for i := 0; i < r; i++ {
			row := raw.Data[i*raw.Stride : i*raw.Stride+c]
			for j, x := range row {
				d[i*c+j] -= complex(s*real(x), s*imag(x))
			}
		}
		return d
	}
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			x := b.At(i, j)
			d[i*c+j] -= complex(s*real(x), s*imag(x))
		}
	}
	return d
}

// operatorNorm is OperatorNorm of the r×c row-major matrix a, which it
// overwrites.
//
// a is first scaled by a power of two into [0.5, 1) and its negligible parts
// set to zero (see negligible): the Gram matrix then neither overflows nor
// underflows, whatever the scale of a, and the norm is scaled back at the end.
func operatorNorm(a []complex128, r, c int) float64 {
	big := largestPart(a)
	if math.IsNaN(big) || math.IsInf(big, 0) {
		return math.NaN()
	}
	e := scaleExponent(big)
	scaleParts(a, -e)
	// Read column-major, a is B = aᵀ (c×r). Both B·Bᴴ = (a†a)ᵀ and
	// Bᴴ·B = (aa†)ᵀ have the eigenvalues of the Gram matrices; Bᴴ stored
	// column-major is conj(a) element by element.
	h := make([]complex128, r*c)
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			h[i+j*r] = conj(a[i*c+j])
		}
	}
	var g []complex128
	var k int
	if c <= r {
		k = c
		g = make([]complex128, c*c)
		mulAdd(c, c, r, 1, a, c, h, r, g, c)
	} else {
		k = r
		g = make([]complex128, r*r)
		mulAdd(r, r, c, 1, h, r, a, c, g, r)
	}
	vals := hermitianValues(g, k)
	top := vals[k-1]
	if top < 0 {
		return 0
	}
	return math.Ldexp(math.Sqrt(top), e)
}

// hermitianValues returns the eigenvalues, ascending, of the k×k Hermitian
// matrix whose lower triangle is stored column-major in g (g is overwritten).
func hermitianValues(g []complex128, k int) []float64 {
	t := tridiagonal{n: k, a: g, diag: make([]float64, k), off: make([]float64, max(k-1, 0)), tau: make([]complex128, k)}
	t.reduce()
	vals, ok := t.values()
	if !ok {
		// Dsterf gives up only after 30·k QR sweeps, which a Hermitian
		// matrix of finite numbers does not need: the input held NaN or ±Inf.
		for i := range vals {
			vals[i] = math.NaN()
		}
	}
	return vals
}
