package metric

// luFactor factors the m×n (m ≥ n) column-major block a in place as
// P·A = L·U with partial pivoting: L is unit lower trapezoidal, U upper
// triangular, and row j was swapped with row piv[j] (both relative to the
// block). It reports false if a pivot was exactly zero (A singular).
//
// The factorisation recurses on halves of the columns (Toledo, SIAM J.
// Matrix Anal. Appl. 18 (1997)), so almost all of the work lands in mulAdd.
func luFactor(m, n int, a []complex128, lda int, piv []int) bool {
	if n <= 16 {
		return luFactorSmall(m, n, a, lda, piv)
	}
	n1 := n / 2
	n2 := n - n1
	ok := luFactor(m, n1, a, lda, piv[:n1])
	right := a[n1*lda:]
	swapRows(right, lda, n2, piv[:n1], 0)
	solveLowerUnit(n1, n2, a, lda, right, lda)
	mulAdd(m-n1, n2, n1, -1, a[n1:], lda, right, lda, right[n1:], lda)
	ok = luFactor(m-n1, n2, right[n1:], lda, piv[n1:]) && ok
	for i := n1; i < n; i++ {
		piv[i] += n1
	}
	swapRows(a, lda, n1, piv[n1:], n1)
	return ok
}

// luFactorSmall is luFactor for a narrow panel, one column at a time.
func luFactorSmall(m, n int, a []complex128, lda int, piv []int) bool {
	ok := true
	for j := 0; j < n; j++ {
		col := a[j*lda : j*lda+m]
		p, best := j, abs1(col[j])
		for i := j + 1; i < m; i++ {
			if x := abs1(col[i]); x > best {
				p, best = i, x
			}
		}
		piv[j] = p
		if best == 0 {
			ok = false
			continue
		}
		if p != j {
			for k := 0; k < n; k++ {
				a[k*lda+j], a[k*lda+p] = a[k*lda+p], a[k*lda+j]
			}
		}
		inv := 1 / col[j]
		below := col[j+1:]
		for i := range below {
			below[i] *= inv
		}
		for k := j + 1; k < n; k++ {
			ck := a[k*lda+j+1 : k*lda+m]
			s := a[k*lda+j]
			if s == 0 {
				continue
			}
			ck = ck[:len(below)]
			for i, l := range below {
				ck[i] -= s * l
			}
		}
	}
	return ok
}

// abs1 is |re z| + |im z|, the cheap magnitude used to choose pivots.
func abs1(z complex128) float64 {
	r, i := real(z), imag(z)
	if r < 0 {
		r = -r
	}
	if i < 0 {
		i = -i
	}
	return r + i
}

// swapRows interchanges row from+t with row piv[t], for t = 0, 1, … in
// order, in the first ncols columns of a. Row numbers are relative to a.
func swapRows(a []complex128, lda, ncols int, piv []int, from int) {
	for t, q := range piv {
		r := from + t
		if q == r {
			continue
		}
		for k := 0; k < ncols; k++ {
			a[k*lda+r], a[k*lda+q] = a[k*lda+q], a[k*lda+r]
		}
	}
}
