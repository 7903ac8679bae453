package metric

// On amd64 the innermost product loop runs in AVX2 with fused multiply-add
// when the processor and operating system support them (checked once, with
// CPUID and XGETBV as Intel's Software Developer's Manual, vol. 1 §14.3,
// prescribes); otherwise the portable Go loop runs.

func cpuid(leaf, sub uint32) (eax, ebx, ecx, edx uint32)
func xgetbv() (eax uint32)

//go:noescape
func mulAdd2x2AVX(c0, c1, a0, a1 *complex128, pairs int, coef *[32]float64)

//go:noescape
func sweepAVX(col, v, w, y, x *complex128, pairs int, coef *[24]float64, acc *[8]float64)

var haveAVX2FMA = detectAVX2FMA()

func detectAVX2FMA() bool {
	maxLeaf, _, _, _ := cpuid(0, 0)
	if maxLeaf < 7 {
		return false
	}
	_, _, ecx, _ := cpuid(1, 0)
	const fma, osxsave, avx = 1 << 12, 1 << 27, 1 << 28
	if ecx&fma == 0 || ecx&osxsave == 0 || ecx&avx == 0 {
		return false
	}
	if xgetbv()&6 != 6 { // the OS saves XMM and YMM state
		return false
	}
	_, ebx, _, _ := cpuid(7, 0)
	return ebx&(1<<5) != 0 // AVX2
}

// mulAdd2x2 sets c0[i] += a0[i]·b00 + a1[i]·b10 and c1[i] += a0[i]·b01 +
// a1[i]·b11 for every i of a0; the other slices must be at least as long.
func mulAdd2x2(c0, c1, a0, a1 []complex128, b00, b10, b01, b11 complex128) {
	n := len(a0)
	i := 0
	if haveAVX2FMA && n >= 2 {
		var coef [32]float64
		spread(coef[:], b00, b10, b01, b11)
		_, _, _ = c0[n-1], c1[n-1], a1[n-1]
		mulAdd2x2AVX(&c0[0], &c1[0], &a0[0], &a1[0], n/2, &coef)
		i = n &^ 1
	}
	mulAdd2x2Go(c0[i:n], c1[i:n], a0[i:n], a1[i:n], b00, b10, b01, b11)
}

// sweepKernel does, for every i of col, col[i] += v[i]·p + w[i]·q and
// y[i] += col[i]·r, and returns Σ conj(col[i])·x[i] over the updated col.
// The other slices must be at least as long as col.
func sweepKernel(col, v, w, y, x []complex128, p, q, r complex128) complex128 {
	n := len(col)
	i := 0
	var s complex128
	if haveAVX2FMA && n >= 2 {
		var coef [24]float64
		var acc [8]float64
		spread(coef[:], p, q, r)
		_, _, _, _ = v[n-1], w[n-1], y[n-1], x[n-1]
		sweepAVX(&col[0], &v[0], &w[0], &y[0], &x[0], n/2, &coef, &acc)
		s = complex(acc[0]+acc[1]+acc[2]+acc[3], acc[4]-acc[5]+acc[6]-acc[7])
		i = n &^ 1
	}
	return s + sweepKernelGo(col[i:n], v[i:n], w[i:n], y[i:n], x[i:n], p, q, r)
}

// spread lays out coefficients for the vector kernels: for each b, four
// copies of its real part, then (−im, im, −im, im).
func spread(dst []float64, bs ...complex128) {
	for k, b := range bs {
		re, im := real(b), imag(b)
		dst[8*k], dst[8*k+1], dst[8*k+2], dst[8*k+3] = re, re, re, re
		dst[8*k+4], dst[8*k+5], dst[8*k+6], dst[8*k+7] = -im, im, -im, im
	}
}
