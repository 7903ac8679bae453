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
	t := cmplx.Abs(inner(rowMajor(u, nil), rowMajor(v, nil)))
	return (d + t*t) / (d * (d + 1))
}

// ProcessFidelity returns the process (entanglement) fidelity of the unitary
// channels of u and v, |tr u†v|²/d² for n×n unitaries, d = n: the overlap of
// their Choi states. It relates to the average fidelity by
// F_avg = (d·F_pro + 1)/(d + 1) (Nielsen, Phys. Lett. A 303 (2002) 249).
func ProcessFidelity(u, v mat.CMatrix) float64 {
	n := pairSize("ProcessFidelity", u, v)
	d := float64(n)
	t := cmplx.Abs(inner(rowMajor(u, nil), rowMajor(v, nil)))
	return t * t / (d * d)
}
