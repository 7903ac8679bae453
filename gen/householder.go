package gen

import (
	"math"
	"runtime"
	"sync"
)

// householderBlock is how many reflectors are applied to a column while it is
// in cache. Any value gives the same result; 32 keeps the reflectors of a
// block of a 1024×1024 factorization (32 × 16 KiB) in L2 cache.
const householderBlock = 32

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
//
// Reflectors are applied in blocks of householderBlock to one column at a
// time, the same arithmetic in the same order per column as one at a time,
// with a fraction of the memory traffic.
func householderQR(a []complex128, n int) (q, rdiag []complex128) {
	rdiag = make([]complex128, n)
	tau := make([]float64, n)
	for k0 := 0; k0 < n; k0 += householderBlock {
		k1 := min(k0+householderBlock, n)
		for k := k0; k < k1; k++ {
			rdiag[k], tau[k] = reflector(a[k*n+k : (k+1)*n])
			for j := k + 1; j < k1; j++ {
				reflect(a[k*n+k:(k+1)*n], a[j*n+k:(j+1)*n], tau[k])
			}
		}
		columns(k1, n, func(j int) {
			for k := k0; k < k1; k++ {
				reflect(a[k*n+k:(k+1)*n], a[j*n+k:(j+1)*n], tau[k])
			}
		})
	}

	// Q = H_0 H_1 ⋯ H_{n−1}, accumulated backwards: H_k touches rows k.. only,
	// and columns j < k of H_k ⋯ H_{n−1} are still e_j, which H_k leaves alone.
	q = make([]complex128, n*n)
	for j := range n {
		q[j*n+j] = 1
	}
	for k1 := n; k1 > 0; k1 -= householderBlock {
		k0 := max(k1-householderBlock, 0)
		columns(k0, n, func(j int) {
			for k := min(k1, j+1) - 1; k >= k0; k-- {
				reflect(a[k*n+k:(k+1)*n], q[j*n+k:(j+1)*n], tau[k])
			}
		})
	}
	return q, rdiag
}

// parallelColumns is the number of columns from which columns spreads the
// work over all cores; below it goroutines cost more than they save.
const parallelColumns = 64

// columns calls update(j) for j in [from, to), on all cores when there are
// many columns. Columns are independent, so the result does not depend on
// how they are shared out.
func columns(from, to int, update func(j int)) {
	workers := runtime.GOMAXPROCS(0)
	if to-from < parallelColumns || workers == 1 {
		for j := from; j < to; j++ {
			update(j)
		}
		return
	}
	var wg sync.WaitGroup
	for w := range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for j := from + w; j < to; j += workers {
				update(j)
			}
		}()
	}
	wg.Wait()
}

// reflector turns the column x in place into the vector v of its Householder
// reflector and returns R_kk = −e^{i arg x_0}‖x‖ and τ = 2/‖v‖² (τ = 0 and
// R_kk = 0 for x = 0, which has probability zero for Gaussian input).
func reflector(x []complex128) (rkk complex128, tau float64) {
	var norm2 float64
	for _, e := range x {
		norm2 += real(e)*real(e) + imag(e)*imag(e)
	}
	if norm2 == 0 {
		return 0, 0
	}
	norm := math.Sqrt(norm2)
	abs0 := math.Hypot(real(x[0]), imag(x[0]))
	phase := complex(1, 0)
	if abs0 != 0 {
		phase = x[0] / complex(abs0, 0)
	}
	x[0] += phase * complex(norm, 0)
	return -phase * complex(norm, 0), 1 / (norm * (norm + abs0)) // ‖v‖² = 2‖x‖(‖x‖+|x_0|)
}

// reflect applies I − τ v v^† to the vector c in place (len(c) == len(v)).
func reflect(v, c []complex128, tau float64) {
	if tau == 0 {
		return
	}
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
