package metric

import (
	"math"
	"math/cmplx"

	"gonum.org/v1/gonum/mat"
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

	withVectors bool        // whether to keep what eigenvectors need
	diag, off   []float64   // copies of the tridiagonal form, for eigenvectors
	found       [][]float64 // eigenvectors of the tridiagonal form made so far
	mem         *scratch
}

// poleLimit bounds |x| for a transform accepted at once. The error of the
// computed X grows like ε·‖(I − cW)⁻¹‖·‖X‖, about ε·‖X‖²; with ‖X‖ ≤ 1e3
// (the pole at least 2e-3 from every eigenvalue) the eigenphases stay within
// about 1e-12. Beyond it the transform is built again with the pole in the
// middle of the widest gap of the spectrum found, which is as far from the
// spectrum as a pole can be, and that second result is kept.
const poleLimit = 1e3

// entryLimit bounds the entries of X before symmetrising. Beyond it the pole
// is within about 1e-6 of an eigenvalue, close enough for rounding to have
// moved part of X into its anti-Hermitian half, so the transform is not used.
const entryLimit = 1e6

// spectrumScratch returns scratch big enough for a spectrum of order n,
// including room for copies of the two inputs.
func spectrumScratch(n int, vectors bool) *scratch {
	nf := 3 * n
	if vectors {
		nf += 2 * n
	}
	return getScratch(4*n*n+n*(maxWorkers+3), nf, 2*n)
}

// compute finds the eigenphases of V†U (V = nil: of U) for n×n row-major
// unitaries, taking its memory from mem. With vectors set, eigenvectors are
// kept for vector.
func (s *spectrum) compute(u, v []complex128, n int, vectors bool, mem *scratch) {
	*s = spectrum{n: n, u: u, v: v, withVectors: vectors, mem: mem}
	var trace complex128
	if v == nil {
		for i := 0; i < n; i++ {
			trace += u[i*n+i]
		}
	} else {
		trace = inner(v, u) // tr(v†u) = Σ conj(v_ij)·u_ij
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
	m, p := mem.complexes(n*n), mem.complexes(n*n)
	s.tri = tridiagonal{
		n:    n,
		a:    p,
		diag: mem.floats(n),
		off:  mem.floats(n)[:max(n-1, 0)],
		tau:  mem.complexes(n),
		work: mem.complexes(n * (maxWorkers + 2)),
	}
	s.phases = mem.floats(n)
	s.order = mem.ints(n)
	piv := mem.ints(n)
	if vectors {
		s.diag, s.off = mem.floats(n), mem.floats(max(n-1, 0))
	}
	const attempts = 6
	inGap := false // whether the pole sits in the middle of the widest gap
	for attempt := 1; ; attempt++ {
		status := s.transform(alpha, m, p, piv)
		clear := status == transformDone && math.Abs(s.trans[0]) <= poleLimit && math.Abs(s.trans[n-1]) <= poleLimit
		if clear || status == transformDone && (inGap || attempt == attempts) {
			return
		}
		if attempt == attempts {
			// Only input that is not unitary (non-finite entries, or a
			// singular I − cW at six well-spread poles) gets here: say so
			// with NaN.
			for k := range s.phases {
				s.phases[k] = math.NaN()
				s.order[k] = k
			}
			s.trans = s.phases
			return
		}
		if status == transformDone {
			alpha = shortestArc(s.phases).middle() + math.Pi
			inGap = true
		} else {
			alpha += 2.399963229728653 // the golden angle: never repeats a direction
			inGap = false
		}
	}
}

// The outcomes of one Cayley transform.
const (
	transformDone    = iota // eigenvalues found; the caller checks them against poleLimit
	transformTooNear        // the pole is so near an eigenvalue that X is not usable
	transformFailed         // I − cW singular, non-finite entries, or no convergence
)

// transform builds and diagonalises the Cayley transform with its pole at
// e^{iα}, using m and p (n² each) and piv, and says how it went.
func (s *spectrum) transform(alpha float64, m, p []complex128, piv []int) int {
	n := s.n
	s.alpha = alpha
	c := cmplx.Exp(complex(0, -alpha))
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
		return transformFailed
	}
	swapRows(p, n, n, piv, 0)
	solveLowerUnit(n, n, m, n, p, n)
	solveUpper(n, n, m, n, p, n)
	// p now holds (X/i)ᵀ column-major, which is X/i row-major; read
	// column-major, i·p is Xᵀ = conj(X), Hermitian. Symmetrise its lower
	// triangle to remove the rounding in the anti-Hermitian part. An entry
	// above entryLimit means the pole is so near an eigenvalue that rounding
	// may have put that eigenvalue's part of X into the anti-Hermitian half,
	// where symmetrising would lose it: such a transform is rejected before
	// its eigenvalues are taken.
	largest := 0.0
	for j := 0; j < n; j++ {
		for i := j; i < n; i++ {
			lo, up := p[i+j*n], p[j+i*n]
			largest = math.Max(largest, math.Max(abs1(lo), abs1(up)))
			p[i+j*n] = complex(0, 0.5) * (lo - conj(up))
		}
	}
	if math.IsNaN(largest) || math.IsInf(largest, 0) {
		return transformFailed
	}
	if largest > entryLimit {
		return transformTooNear
	}
	s.tri.reduce()
	if s.withVectors {
		copy(s.diag, s.tri.diag)
		copy(s.off, s.tri.off)
	}
	vals, ok := s.tri.values()
	if !ok {
		return transformFailed
	}
	s.trans = vals
	// θ = α + π + 2·atan(x) increases with x over an interval of length 2π,
	// so wrapped into (−π, π] the phases form two ascending runs: rotate the
	// second run to the front instead of sorting.
	start := 0
	for k, x := range vals {
		s.phases[k] = wrapPhase(alpha + math.Pi + 2*math.Atan(x))
		if k > 0 && s.phases[k] < s.phases[k-1] {
			start = k
		}
	}
	rotate(s.phases, start)
	for k := range s.order {
		s.order[k] = (k + start) % n
	}
	// Rounding cannot break the order in exact arithmetic's place, but check
	// rather than trust it; an insertion sort repairs any stray pair.
	for k := 1; k < n; k++ {
		for j := k; j > 0 && s.phases[j] < s.phases[j-1]; j-- {
			s.phases[j], s.phases[j-1] = s.phases[j-1], s.phases[j]
			s.order[j], s.order[j-1] = s.order[j-1], s.order[j]
		}
	}
	return transformDone
}

// rotate moves a[start:] to the front of a, in place.
func rotate(a []float64, start int) {
	reverse(a[:start])
	reverse(a[start:])
	reverse(a)
}

func reverse(a []float64) {
	for i, j := 0, len(a)-1; i < j; i, j = i+1, j-1 {
		a[i], a[j] = a[j], a[i]
	}
}

// vector returns a unit eigenvector of W for phases[i], by inverse
// iteration on the tridiagonal form. Vectors returned by successive calls are
// orthonormal, also for equal phases. The spectrum must have been computed
// with vectors.
func (s *spectrum) vector(i int) []complex128 {
	n := s.n
	y := inverseIteration(s.diag, s.off, s.trans[s.order[i]], s.found)
	s.found = append(s.found, y)
	q := s.tri.backTransform(y, make([]complex128, n))
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

// pairArc returns the shortest arc holding the eigenphases of v†u for two
// n×n matrices.
func pairArc(u, v mat.CMatrix, n int) circleArc {
	mem := spectrumScratch(n, false)
	defer mem.release()
	ur, vr := rowMajor(u, mem.complexes(n*n)), rowMajor(v, mem.complexes(n*n))
	var s spectrum
	s.compute(ur, vr, n, false, mem)
	return shortestArc(s.phases)
}

// wrapPhase maps an angle to (−π, π].
func wrapPhase(x float64) float64 {
	x = math.Remainder(x, 2*math.Pi)
	if x <= -math.Pi {
		x += 2 * math.Pi
	}
	return x
}
