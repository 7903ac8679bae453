//go:build !amd64

package metric

// mulAdd2x2 sets c0[i] += a0[i]·b00 + a1[i]·b10 and c1[i] += a0[i]·b01 +
// a1[i]·b11 for every i of a0; the other slices must be at least as long.
func mulAdd2x2(c0, c1, a0, a1 []complex128, b00, b10, b01, b11 complex128) {
	mulAdd2x2Go(c0, c1, a0, a1, b00, b10, b01, b11)
}

// sweepKernel does, for every i of col, col[i] += v[i]·p + w[i]·q and
// y[i] += col[i]·r, and returns Σ conj(col[i])·x[i] over the updated col.
// The other slices must be at least as long as col.
func sweepKernel(col, v, w, y, x []complex128, p, q, r complex128) complex128 {
	return sweepKernelGo(col, v, w, y, x, p, q, r)
}

// haveAVX2FMA is false off amd64: the portable loops always run.
var haveAVX2FMA = false
