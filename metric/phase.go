package metric

import (
	"math"

	"gonum.org/v1/gonum/mat"
)

// Eigenphases returns the eigenphases θ_k of the n×n unitary w, the angles of
// its eigenvalues e^{iθ_k}, in ascending order in (−π, π], each repeated as
// often as it occurs. They come from a Hermitian eigenproblem, the Cayley
// transform described in the package comment, so degenerate and tightly
// clustered spectra (the identity, −identity, eigenvalues within 1e-10 of
// each other) keep their accuracy: each phase is within a small multiple of
// n·1e-16 of the truth. w is trusted to be unitary; for other matrices the
// result has no meaning.
func Eigenphases(w mat.CMatrix) []float64 {
	n := squareSize("Eigenphases", "matrix", w)
	mem := spectrumScratch(n, false)
	defer mem.release()
	var s spectrum
	s.compute(rowMajor(w, mem.complexes(n*n)), nil, n, false, mem)
	return append([]float64(nil), s.phases...)
}

// PhaseDistance returns min over φ of ‖u − e^{iφ}v‖ for two n×n unitaries: the
// operator-norm distance with the global phase taken out. With θ the length
// of the shortest arc of the unit circle that holds every eigenphase of v†u,
// it is exactly 2·sin(θ/4); no search over φ is made. Like Distance it adds
// up linearly over products, since the phase may be chosen per factor
// (Nielsen & Chuang §4.5.3).
func PhaseDistance(u, v mat.CMatrix) float64 {
	d, _ := PhaseAlign(u, v)
	return d
}

// PhaseAlign returns PhaseDistance(u, v) together with the global phase φ in
// (−π, π] that attains it, so that u ≈ e^{iφ}·v with ‖u − e^{iφ}v‖ = dist.
// φ is the midpoint of the shortest arc holding the eigenphases of v†u.
// When two arcs tie (for instance eigenphases 0 and π) either midpoint is
// optimal and one of them is returned.
func PhaseAlign(u, v mat.CMatrix) (dist, phase float64) {
	n := pairSize("PhaseAlign", u, v)
	a := pairArc(u, v, n)
	return 2 * math.Sin(a.length/4), a.middle()
}

// Diamond returns the diamond-norm distance between the unitary channels
// ρ ↦ uρu† and ρ ↦ vρv†: 2·sqrt(1 − ν²), with ν the distance from 0 to the
// convex hull of the eigenvalues of u†v (Watrous, The Theory of Quantum
// Information, 2018, chapter 3, the theorem on the diamond distance of two
// unitary channels). With θ the shortest arc holding the eigenphases,
// ν = cos(θ/2) when θ < π, so the distance is 2·sin(θ/2); otherwise the hull
// holds 0 and the channels can be told apart perfectly: the distance is 2.
// It ignores global phase, as channels do.
func Diamond(u, v mat.CMatrix) float64 {
	n := pairSize("Diamond", u, v)
	a := pairArc(u, v, n)
	if a.length >= math.Pi {
		return 2
	}
	return 2 * math.Sin(a.length/2)
}
