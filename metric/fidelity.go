package metric

import (
	"math/cmplx"

	"gonum.org/v1/gonum/mat"
)

// AverageFidelity returns the average gate fidelity of v against u for two
// n×n unitaries: the mean over Haar-random pure inputs ψ of |⟨uψ|vψ⟩|²,
// which equals (d + |tr u†v|²)/(d(d+1)) with d = n (Nielsen, Phys. Lett. A
// 303 (2002) 249). It is 1 exactly when u and v agree up to global phase and
// never below 1/(d+1).
func AverageFidelity(u, v mat.CMatrix) float64 {
	n := pairSize("AverageFidelity", u, v)
	d := float64(n)
	t := cmplx.Abs(traceInner(rowMajor(u, nil), rowMajor(v, nil)))
	return (d + t*t) / (d * (d + 1))
}

// ProcessFidelity returns the process (entanglement) fidelity of the unitary
// channels of u and v, |tr u†v|²/d² for n×n unitaries, d = n: the overlap of
// their Choi states. It relates to the average fidelity by
// F_avg = (d·F_pro + 1)/(d + 1) (Nielsen, Phys. Lett. A 303 (2002) 249).
func ProcessFidelity(u, v mat.CMatrix) float64 {
	n := pairSize("ProcessFidelity", u, v)
	d := float64(n)
	t := cmplx.Abs(traceInner(rowMajor(u, nil), rowMajor(v, nil)))
	return t * t / (d * d)
}

// traceInner returns tr(u†v) = Σ conj(u_ij)·v_ij for equal-size buffers.
func traceInner(u, v []complex128) complex128 {
	var t complex128
	v = v[:len(u)]
	for i, x := range u {
		t += conj(x) * v[i]
	}
	return t
}
