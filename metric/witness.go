package metric

import (
	"math"

	"gonum.org/v1/gonum/mat"
)

// Witness returns a unit input state psi on which the n×n unitaries u and v
// differ the most, global phase aside, and dist, its phase-free deviation
// min over φ of ‖(u − e^{iφ}v)·psi‖, computed from psi itself.
//
// psi minimises |⟨ψ|v†u|ψ⟩| and so maximises the trace distance between the
// output states u·psi and v·psi. It is built from eigenvectors of v†u: the
// two at the ends of the shortest arc holding the eigenphases, in equal
// weight, or, when that arc exceeds a half circle, three whose eigenvalues
// surround 0, weighted so that ⟨ψ|v†u|ψ⟩ = 0.
//
// dist is a certified lower bound on PhaseDistance(u, v). It equals
// PhaseDistance when the eigenphases of v†u lie within a half circle (that
// is, when PhaseDistance ≤ √2) and is √2 otherwise. No single input state can
// show more: for a unit ψ the squared deviation is 2 − 2|⟨ψ|v†u|ψ⟩| ≤ 2, and
// psi reaches 2 by making ⟨ψ|v†u|ψ⟩ vanish.
func Witness(u, v mat.CMatrix) (psi []complex128, dist float64) {
	n := pairSize("Witness", u, v)
	mem := spectrumScratch(n, true)
	defer mem.release()
	ur, vr := rowMajor(u, mem.complexes(n*n)), rowMajor(v, mem.complexes(n*n))
	var s spectrum
	s.compute(ur, vr, n, true, mem)
	a := shortestArc(s.phases)
	psi = make([]complex128, n)
	if a.length <= math.Pi || n < 3 {
		if a.first == a.last {
			copy(psi, s.vector(a.first))
		} else {
			x, y := s.vector(a.first), s.vector(a.last)
			for i := range psi {
				psi[i] = (x[i] + y[i]) / math.Sqrt2
			}
		}
	} else {
		idx, w := surround(s.phases)
		for k, i := range idx {
			x := s.vector(i)
			c := complex(math.Sqrt(w[k]), 0)
			for j := range psi {
				psi[j] += c * x[j]
			}
		}
	}
	return psi, phaseFreeDeviation(ur, vr, n, psi)
}

// surround picks three of the sorted phases whose points on the unit circle
// hold 0 in their triangle, and the barycentric weights of 0 in it. It needs
// the phases not to fit in any half circle. With the first phase p₀, the two
// neighbours of the opposite point p₀ + π close the triangle: each of its
// three arcs is at most π.
func surround(phases []float64) ([3]int, [3]float64) {
	n := len(phases)
	j := 0
	for j+1 < n && phases[j+1]-phases[0] <= math.Pi {
		j++
	}
	k := (j + 1) % n
	idx := [3]int{0, j, k}
	t := [3]float64{phases[0], phases[j], phases[k]}
	// The weight of each corner is proportional to the area of the triangle
	// spanned by 0 and the other two corners (barycentric coordinates).
	w := [3]float64{
		math.Sin(t[2] - t[1]),
		math.Sin(t[0] - t[2]),
		math.Sin(t[1] - t[0]),
	}
	sum := 0.0
	for i := range w {
		w[i] = math.Max(w[i], 0)
		sum += w[i]
	}
	for i := range w {
		w[i] /= sum
	}
	return idx, w
}

// phaseFreeDeviation returns min over φ of ‖(u − e^{iφ}v)·psi‖ for row-major
// n×n u and v: with a = u·psi and b = v·psi the best phase is that of ⟨b|a⟩.
func phaseFreeDeviation(u, v []complex128, n int, psi []complex128) float64 {
	a := make([]complex128, n)
	b := make([]complex128, n)
	for i := 0; i < n; i++ {
		var sa, sb complex128
		ur, vr := u[i*n:i*n+n], v[i*n:i*n+n]
		for j, x := range psi {
			sa += ur[j] * x
			sb += vr[j] * x
		}
		a[i], b[i] = sa, sb
	}
	return phaseFreeNorm(a, b)
}
