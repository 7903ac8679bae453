package metric

import (
	"runtime"
	"sync"
)

// The dense kernels of this package store matrices column by column: element
// (i, j) of a matrix with leading dimension ld is at index i + j·ld. A gonum
// CDense is stored row by row, so its buffer read column by column is the
// transpose; callers account for that where it matters.

// parallelWork is the number of complex multiply-adds above which a product
// is split over goroutines; below it the cost of starting them dominates.
const parallelWork = 1 << 17

// mulAdd computes C += alpha·A·B for A m×k, B k×n and C m×n (column-major,
// leading dimensions lda, ldb, ldc), splitting the columns of C over the
// available cores when the product is large enough to profit.
func mulAdd(m, n, k int, alpha complex128, a []complex128, lda int, b []complex128, ldb int, c []complex128, ldc int) {
	if m == 0 || n == 0 || k == 0 {
		return
	}
	workers := runtime.GOMAXPROCS(0)
	if workers > n/2 {
		workers = n / 2
	}
	if workers < 2 || m*n*k < parallelWork {
		mulAddSerial(m, n, k, alpha, a, lda, b, ldb, c, ldc)
		return
	}
	var wg sync.WaitGroup
	per := (n + workers - 1) / workers
	per += per & 1 // keep column pairs together
	for j0 := 0; j0 < n; j0 += per {
		w := min(per, n-j0)
		wg.Add(1)
		go func() {
			defer wg.Done()
			mulAddSerial(m, w, k, alpha, a, lda, b[j0*ldb:], ldb, c[j0*ldc:], ldc)
		}()
	}
	wg.Wait()
}

// mulAddSerial is mulAdd on one goroutine. It walks A in blocks that stay in
// cache and updates two columns of C with two columns of A at a time, so each
// element of C is loaded and stored once per four multiply-adds.
func mulAddSerial(m, n, k int, alpha complex128, a []complex128, lda int, b []complex128, ldb int, c []complex128, ldc int) {
	const kBlock, mBlock = 128, 192
	for p0 := 0; p0 < k; p0 += kBlock {
		p1 := min(p0+kBlock, k)
		for i0 := 0; i0 < m; i0 += mBlock {
			i1 := min(i0+mBlock, m)
			j := 0
			for ; j+1 < n; j += 2 {
				c0 := c[j*ldc+i0 : j*ldc+i1]
				c1 := c[(j+1)*ldc+i0 : (j+1)*ldc+i1]
				c1 = c1[:len(c0)]
				p := p0
				for ; p+1 < p1; p += 2 {
					b00, b10 := alpha*b[j*ldb+p], alpha*b[j*ldb+p+1]
					b01, b11 := alpha*b[(j+1)*ldb+p], alpha*b[(j+1)*ldb+p+1]
					mulAdd2x2(c0, c1, a[p*lda+i0:p*lda+i1], a[(p+1)*lda+i0:(p+1)*lda+i1], b00, b10, b01, b11)
				}
				if p < p1 {
					b00, b01 := alpha*b[j*ldb+p], alpha*b[(j+1)*ldb+p]
					a0 := a[p*lda+i0 : p*lda+i1]
					c0 := c0[:len(a0)]
					c1 := c1[:len(a0)]
					for i, x0 := range a0 {
						c0[i] += x0 * b00
						c1[i] += x0 * b01
					}
				}
			}
			if j < n {
				c0 := c[j*ldc+i0 : j*ldc+i1]
				for p := p0; p < p1; p++ {
					s := alpha * b[j*ldb+p]
					a0 := a[p*lda+i0 : p*lda+i1]
					c0 := c0[:len(a0)]
					for i, x := range a0 {
						c0[i] += x * s
					}
				}
			}
		}
	}
}

// mulAdd2x2Go is the portable form of mulAdd2x2.
func mulAdd2x2Go(c0, c1, a0, a1 []complex128, b00, b10, b01, b11 complex128) {
	a1 = a1[:len(a0)]
	c0 = c0[:len(a0)]
	c1 = c1[:len(a0)]
	for i, x0 := range a0 {
		x1 := a1[i]
		c0[i] += x0*b00 + x1*b10
		c1[i] += x0*b01 + x1*b11
	}
}
