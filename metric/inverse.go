package metric

import "math"

// inverseIteration returns a unit eigenvector of the real symmetric
// tridiagonal matrix T with diagonal d and off-diagonal e for its eigenvalue
// lambda (computed beforehand, to working accuracy), orthogonal to every
// vector in prev. It is Wilkinson's inverse iteration as LAPACK's dstein does
// it (Golub & Van Loan, Matrix Computations, 4th ed., §8.2.2): factor
// T − λI = P·L·U with partial pivoting once, then solve with it a few times
// from a fixed start, projecting out prev each time so that vectors for
// equal or clustered eigenvalues come out orthonormal.
func inverseIteration(d, e []float64, lambda float64, prev [][]float64) []float64 {
	n := len(d)
	y := make([]float64, n)
	if n == 1 {
		y[0] = 1
		return y
	}
	norm := 0.0
	for i := range d {
		r := math.Abs(d[i])
		if i > 0 {
			r += math.Abs(e[i-1])
		}
		if i < n-1 {
			r += math.Abs(e[i])
		}
		norm = math.Max(norm, r)
	}
	tiny := 0x1p-52 * math.Max(norm, 0x1p-1000)
	// Gaussian elimination with row interchanges on the tridiagonal T − λI:
	// U has two super-diagonals, L one multiplier per step.
	band := make([]float64, 4*n)
	u0, u1, u2, mult := band[:n], band[n:2*n], band[2*n:3*n], band[3*n:]
	swapped := make([]bool, n)
	a, b := d[0]-lambda, e[0]
	for k := 0; k < n-1; k++ {
		c, next := e[k], d[k+1]-lambda
		after := 0.0
		if k+2 < n {
			after = e[k+1]
		}
		if math.Abs(a) >= math.Abs(c) {
			if a == 0 {
				a = tiny
			}
			m := c / a
			u0[k], u1[k], u2[k], mult[k] = a, b, 0, m
			a, b = next-m*b, after
		} else {
			m := a / c
			u0[k], u1[k], u2[k], mult[k], swapped[k] = c, next, after, m, true
			a, b = b-m*next, -m*after
		}
	}
	if math.Abs(a) < tiny {
		a = math.Copysign(tiny, a)
	}
	u0[n-1] = a
	for i := range y {
		y[i] = 1 + float64((i*7919)%97)/97 // a fixed start with no structure to be orthogonal to
	}
	for iter := 0; iter < 5; iter++ {
		project(y, prev)
		for k := 0; k < n-1; k++ {
			if swapped[k] {
				y[k], y[k+1] = y[k+1], y[k]
			}
			y[k+1] -= mult[k] * y[k]
		}
		for k := n - 1; k >= 0; k-- {
			s := y[k]
			if k+1 < n {
				s -= u1[k] * y[k+1]
			}
			if k+2 < n {
				s -= u2[k] * y[k+2]
			}
			if u0[k] == 0 {
				y[k] = s / tiny
			} else {
				y[k] = s / u0[k]
			}
		}
		normalize(y)
	}
	// The last solve makes y nearly parallel to prev when λ sits in a
	// cluster, so one projection cancels most of y and leaves its rounding
	// along prev; a second one removes that (Parlett's "twice is enough"
	// for Gram–Schmidt, from his book The Symmetric Eigenvalue Problem; the
	// tests of Witness check the orthogonality it gives).
	for range 2 {
		project(y, prev)
		normalize(y)
	}
	return y
}

// project removes from y its components along the orthonormal vectors prev.
func project(y []float64, prev [][]float64) {
	for _, p := range prev {
		var s float64
		for i, x := range p {
			s += x * y[i]
		}
		for i, x := range p {
			y[i] -= s * x
		}
	}
}

// normalize scales y to unit length, first by its largest entry so that the
// sum of squares cannot overflow.
func normalize(y []float64) {
	big := 0.0
	for _, x := range y {
		big = math.Max(big, math.Abs(x))
	}
	if big == 0 || math.IsInf(big, 0) || math.IsNaN(big) {
		return
	}
	var s float64
	for i := range y {
		y[i] /= big
		s += y[i] * y[i]
	}
	s = math.Sqrt(s)
	for i := range y {
		y[i] /= s
	}
}
