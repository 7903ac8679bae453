package metric

import (
	"math"

	"gonum.org/v1/gonum/mat"
)

// LowestEigen returns the smallest eigenvalue of the n×n Hermitian matrix h and a unit
// eigenvector for it. Only h's lower triangle is read. It is the Householder reduction to a
// real tridiagonal matrix, QR iteration for the eigenvalues and inverse iteration for the vector
// (Golub & Van Loan, Matrix Computations, 4th ed., §8.3.1 and §8.2.2), the solver behind
// [Eigenphases] and [Witness]. Non-finite entries give NaN and a zero vector.
func LowestEigen(h mat.CMatrix) (float64, []complex128) {
	n := squareSize("LowestEigen", "matrix", h)
	g := make([]complex128, n*n)
	for j := 0; j < n; j++ {
		for i := j; i < n; i++ {
			g[i+j*n] = h.At(i, j)
		}
	}
	t := tridiagonal{n: n, a: g, diag: make([]float64, n), off: make([]float64, max(n-1, 0)), tau: make([]complex128, n)}
	t.reduce()
	d, e := append([]float64(nil), t.diag...), append([]float64(nil), t.off...)
	vals, ok := t.values()
	if !ok || math.IsNaN(vals[0]) {
		return math.NaN(), make([]complex128, n)
	}
	y := inverseIteration(d, e, vals[0], nil)
	return vals[0], t.backTransform(y, make([]complex128, n))
}
