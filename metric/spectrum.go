package metric

import (
	"math"
	"math/cmplx"
	"sort"
)

// spectrum holds the eigenphases of a unitary W = V†U (or of W = U alone),
// found from the Hermitian Cayley transform X = i(I + cW)(I − cW)⁻¹ with
// c = e^{−iα}: an eigenvalue e^{iθ} of W becomes the eigenvalue
// x = −cot((θ − α)/2) of X and comes back as θ = α + π + 2·atan(x).
// X shares its eigenvectors with W, except that for a pair the similarity
// X = V·C·V† moves them by V.
type spectrum struct {
	n      int
	u, v   []complex128 // row-major inputs; v == nil means the identity
	alpha  float64      // the pole of the transform sits at e^{iα}
	phases []float64    // eigenphases of W in ascending order, in (−π, π]
	order  []int        // phases[i] is eigenvalue order[i] of the tridiagonal form
	tri    tridiagonal  // the reduced transform, kept for eigenvectors
	trans  []float64    // eigenvalues of X in ascending order

	withVectors bool      // whether to compute eigenvectors too
	z           []float64 // eigenvectors of the tridiagonal form, row-major
}

// poleLimit bounds |x| for an accepted transform: beyond it the pole is
// within 2e-4 of an eigenvalue and the Hermitian solver's absolute error
// ε·‖X‖ would exceed about 1e-11 in the other eigenphases, so the transform
// is built again with the pole in the widest gap of the spectrum found.
const poleLimit = 1e4

// newSpectrum computes the eigenphases of V†U (V = nil: of U) for n×n
// row-major unitaries.
// With vectors set, eigenvectors are kept for vector.
func newSpectrum(u, v []complex128, n int, vectors bool) *spectrum {
	s := &spectrum{n: n, u: u, v: v, withVectors: vectors}
	var trace complex128
	if v == nil {
		for i := 0; i < n; i++ {
			trace += u[i*n+i]
		}
	} else {
		for i, x := range u {
			trace += conj(v[i]) * x
		}
	}
	// Put the pole opposite the mean eigenvalue when the spectrum leans to
	// one side (the usual case when U and V nearly agree), nudged off the
	// special angles (multiples of π/16) that gate spectra favour; otherwise
	// start from a fixed generic angle.
	const nudge = 0.3
	alpha := 2.1
	if cmplx.Abs(trace) > float64(n)/4 {
		alpha = cmplx.Phase(trace) + math.Pi + nudge
	}
	work := make([]complex128, 2*n*n+2*n)
	piv := make([]int, n)
	for attempt := 0; ; attempt++ {
		ok := s.transform(alpha, work, piv)
		if ok && (math.Abs(s.trans[0]) <= poleLimit && math.Abs(s.trans[n-1]) <= poleLimit || attempt >= 3) {
			return s
		}
		if ok {
			widest := shortestArc(s.phases)
			alpha = widest.middle() + math.Pi
		} else {
			alpha += 2.399963229728653 // the golden angle: never repeats a direction
		}
	}
}

// transform builds and diagonalises the Cayley transform with its pole at
// e^{iα}. It reports false if I − cW was singular to working precision or the
// eigenvalue iteration failed.
func (s *spectrum) transform(alpha float64, work []complex128, piv []int) bool {
	n := s.n
	s.alpha = alpha
	c := cmplx.Exp(complex(0, -alpha))
	m := work[:n*n]
	p := work[n*n : 2*n*n]
	// M = V − cU and P = V + cU, row-major; read column-major the buffers are
	// Mᵀ and Pᵀ, and X = i·P·M⁻¹ means Mᵀ·(X/i)ᵀ = Pᵀ.
	for i, x := range s.u {
		m[i] = -c * x
		p[i] = c * x
	}
	if s.v == nil {
		for i := 0; i < n; i++ {
			m[i*n+i] += 1
			p[i*n+i] += 1
		}
	} else {
		for i, x := range s.v {
			m[i] += x
			p[i] += x
		}
	}
	if !luFactor(n, n, m, n, piv) {
		return false
	}
	swapRows(p, n, n, piv, 0)
	solveLowerUnit(n, n, m, n, p, n)
	solveUpper(n, n, m, n, p, n)
	// p now holds (X/i)ᵀ column-major, which is X/i row-major; read
	// column-major, i·p is Xᵀ = conj(X), Hermitian. Symmetrise its lower
	// triangle to remove the rounding in the anti-Hermitian part.
	for j := 0; j < n; j++ {
		for i := j; i < n; i++ {
			lo, up := p[i+j*n], p[j+i*n]
			p[i+j*n] = complex(0, 0.5) * (lo - conj(up))
		}
	}
	for _, x := range p {
		if math.IsNaN(real(x)) || math.IsInf(real(x), 0) || math.IsNaN(imag(x)) || math.IsInf(imag(x), 0) {
			return false
		}
	}
	s.tri = tridiagonal{
		n:    n,
		a:    p,
		diag: make([]float64, n),
		off:  make([]float64, n),
		tau:  make([]complex128, n),
	}
	s.tri.off = s.tri.off[:max(n-1, 0)]
	s.tri.reduce(work[2*n*n : 2*n*n+n])
	var vals []float64
	var ok bool
	if s.withVectors {
		vals, s.z, ok = s.tri.vectors()
	} else {
		vals, ok = s.tri.values()
	}
	if !ok {
		return false
	}
	s.trans = vals
	s.phases = make([]float64, n)
	s.order = make([]int, n)
	for k, x := range vals {
		s.phases[k] = wrapPhase(alpha + math.Pi + 2*math.Atan(x))
		s.order[k] = k
	}
	sort.Sort(byPhase{s.phases, s.order})
	return true
}

// vector returns a unit eigenvector of W for phases[i]. Eigenvectors for
// different i are orthonormal.
// The spectrum must have been made with vectors.
func (s *spectrum) vector(i int) []complex128 {
	n := s.n
	q := s.tri.backTransform(s.z, s.order[i], make([]complex128, n))
	// q is an eigenvector of conj(X); conj(q) one of X = V·C·V†, so V†·conj(q)
	// is one of C and hence of W.
	for k := range q {
		q[k] = conj(q[k])
	}
	if s.v == nil {
		return q
	}
	out := make([]complex128, n)
	for j := 0; j < n; j++ {
		row := s.v[j*n : j*n+n]
		qj := q[j]
		for k, x := range row {
			out[k] += conj(x) * qj
		}
	}
	return out
}

// wrapPhase maps an angle to (−π, π].
func wrapPhase(x float64) float64 {
	x = math.Remainder(x, 2*math.Pi)
	if x <= -math.Pi {
		x += 2 * math.Pi
	}
	return x
}

type byPhase struct {
	phases []float64
	order  []int
}

func (b byPhase) Len() int           { return len(b.phases) }
func (b byPhase) Less(i, j int) bool { return b.phases[i] < b.phases[j] }
func (b byPhase) Swap(i, j int) {
	b.phases[i], b.phases[j] = b.phases[j], b.phases[i]
	b.order[i], b.order[j] = b.order[j], b.order[i]
}
