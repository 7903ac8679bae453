package gen

import "math"

// householderQR factorizes the n×n complex matrix a = Q·R by Householder
// reflections (Golub & Van Loan, Matrix Computations, 4th ed., §5.1.2 and
// §5.2.2, written out here for complex entries because gonum has no complex
// LAPACK). a is stored column by column (entry (i, j) at a[j*n+i]) and is
// overwritten. It returns Q, stored the same way, and the diagonal of R; the
// rest of R is not formed because the Haar sampler does not need it.
//
// Reflector k is H_k = I − τ_k v_k v_k^† with v_k = x + e^{i arg x_0}‖x‖ e_0,
// x the k-th column below the diagonal, so H_k x = −e^{i arg x_0}‖x‖ e_0: the
// sign is chosen so that no cancellation happens, and the diagonal of R then
// carries a phase that the caller must remove (see haarUnitary).
func householderQR(a []complex128, n int) (q, rdiag []complex128) {
	rdiag = make([]complex128, n)
	tau := make([]float64, n)
	for k := range n {
		x := a[k*n+k : (k+1)*n]
		var norm2 float64
		for _, e := range x {
			norm2 += real(e)*real(e) + imag(e)*imag(e)
		}
		if norm2 == 0 {
			continue // H_k = I, R_kk = 0 (probability zero for Gaussian input)
		}
		norm := math.Sqrt(norm2)
		abs0 := math.Hypot(real(x[0]), imag(x[0]))
		phase := complex(1, 0)
		if abs0 != 0 {
			phase = x[0] / complex(abs0, 0)
		}
		rdiag[k] = -phase * complex(norm, 0)
		x[0] += phase * complex(norm, 0)
		tau[k] = 1 / (norm * (norm + abs0)) // 2/‖v‖², ‖v‖² = 2‖x‖(‖x‖+|x_0|)
		for j := k + 1; j < n; j++ {
			reflect(x, a[j*n+k:(j+1)*n], tau[k])
		}
	}

	// Q = H_0 H_1 ⋯ H_{n−1}, accumulated backwards: H_k touches rows k.. only,
	// and columns j < k of H_k ⋯ H_{n−1} are still e_j.
	q = make([]complex128, n*n)
	for j := range n {
		q[j*n+j] = 1
	}
	for k := n - 1; k >= 0; k-- {
		if tau[k] == 0 {
			continue
		}
		v := a[k*n+k : (k+1)*n]
		for j := k; j < n; j++ {
			reflect(v, q[j*n+k:(j+1)*n], tau[k])
		}
	}
	return q, rdiag
}

// reflect applies I − τ v v^† to the vector c in place (len(c) == len(v)).
func reflect(v, c []complex128, tau float64) {
	c = c[:len(v)]
	var sr, si float64 // s = v^† c
	for i, e := range v {
		sr += real(e)*real(c[i]) + imag(e)*imag(c[i])
		si += real(e)*imag(c[i]) - imag(e)*real(c[i])
	}
	sr *= tau
	si *= tau
	for i, e := range v {
		c[i] -= complex(sr*real(e)-si*imag(e), sr*imag(e)+si*real(e))
	}
}
