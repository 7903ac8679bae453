package sim

import (
	"math/cmplx"

	"gonum.org/v1/gonum/mat"
)

// The small dense problems of the matrix-free distance, on matrices of a few dozen rows. gonum
// has no complex decompositions, so each works on the real embedding of a complex matrix
// A = B + iC as [[B, −C], [C, B]]: its singular values are those of A, each twice, and for a
// Hermitian A its eigenvalues likewise; a real vector [x; y] of the embedding is the complex
// vector x + iy.

// realEmbedding returns the real embedding of a rows×cols row-major complex matrix.
func realEmbedding(a []complex128, rows, cols int) *mat.Dense {
	r := mat.NewDense(2*rows, 2*cols, nil)
	for i := 0; i < rows; i++ {
		for j := 0; j < cols; j++ {
			v := a[i*cols+j]
			r.Set(i, j, real(v))
			r.Set(i, cols+j, -imag(v))
			r.Set(rows+i, j, imag(v))
			r.Set(rows+i, cols+j, real(v))
		}
	}
	return r
}

// unembed reads column c of a real embedding of n complex rows back as a complex vector.
func unembed(v mat.Matrix, c, n int) []complex128 {
	out := make([]complex128, n)
	for i := range out {
		out[i] = complex(v.At(i, c), v.At(n+i, c))
	}
	return out
}

// largestSingular returns the largest singular value of the rows×cols complex matrix a and, when
// asked, a unit right singular vector for it.
func largestSingular(a []complex128, rows, cols int, vector bool) (float64, []complex128) {
	var svd mat.SVD
	kind := mat.SVDNone
	if vector {
		kind = mat.SVDThinV
	}
	if !svd.Factorize(realEmbedding(a, rows, cols), kind) {
		return 0, nil
	}
	s := svd.Values(nil)[0]
	if !vector {
		return s, nil
	}
	var v mat.Dense
	svd.VTo(&v)
	return s, unembed(&v, 0, cols)
}

// skewExtremes returns unit eigenvectors for the smallest and largest eigenvalue of the Hermitian
// matrix (e^{−iφ}H − e^{iφ}H†)/2i, H the leading m×m block of the Hessenberg columns h.
func skewExtremes(h [][]complex128, m int, phi float64) (lo, hi []complex128) {
	hm := make([]complex128, m*m)
	for j, col := range h {
		for i := 0; i < len(col) && i < m; i++ {
			hm[i*m+j] = col[i]
		}
	}
	rot := cmplx.Exp(complex(0, -phi))
	b := make([]complex128, m*m)
	for i := 0; i < m; i++ {
		for j := 0; j < m; j++ {
			b[i*m+j] = (rot*hm[i*m+j] - cmplx.Conj(rot*hm[j*m+i])) / 2i
		}
	}
	r := realEmbedding(b, m, m)
	sym := mat.NewSymDense(2*m, nil)
	for i := 0; i < 2*m; i++ {
		for j := i; j < 2*m; j++ {
			sym.SetSym(i, j, (r.At(i, j)+r.At(j, i))/2)
		}
	}
	var eig mat.EigenSym
	if !eig.Factorize(sym, true) {
		return make([]complex128, m), make([]complex128, m)
	}
	var vecs mat.Dense
	eig.VectorsTo(&vecs)
	// Eigenvalues ascend; each appears twice.
	return unembed(&vecs, 0, m), unembed(&vecs, 2*m-1, m)
}
