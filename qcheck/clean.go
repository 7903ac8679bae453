package qcheck

import (
	"math"
	"math/cmplx"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
)

// isometryFit is the comparison of two circuits on inputs whose clean ancillas are |0⟩.
type isometryFit struct {
	dist    float64      // min over φ of ‖Y − e^{iφ}X‖ (φ = 0 with exact phase)
	phase   float64      // the best φ, in Result's convention (want ≈ e^{iφ}·got)
	witness []complex128 // on got's register, ancillas in |0⟩
}

// fitIsometry compares want and got as isometries from the data qubits (ancillas in |0⟩) into
// the whole register: Y = U·J and X = V·J, where J embeds the states with the ancillas in |0⟩.
// Any amplitude that got leaves outside |0⟩ on the ancillas counts in the distance, because it
// is a difference between the columns of X and Y.
//
// For isometries, (X − e^{iθ}Y)†(X − e^{iθ}Y) = 2I − (e^{−iθ}M + e^{iθ}M†) with M = Y†X, so
// ‖X − e^{iθ}Y‖² = 2 − 2·λ_min(H(θ)), H(θ) = (e^{−iθ}M + e^{iθ}M†)/2. When M is unitary this is
// the eigenphase formula of package metric (PhaseAlign); when got leaks into the ancillas M is not even normal, so
// θ is found by maximising λ_min(H(θ)): a grid, a golden-section search in the best cell, and
// then the fixed point θ = arg(x†Mx) of the minimising eigenvector x, which holds at the optimum
// (there x†Mx is the point of M's numerical range nearest to 0). Every θ tried gives an upper
// bound on the distance; the smallest is kept. When neither circuit leaks, M is unitary and the
// eigenphase formula answers directly.
func (p *densePair) fitIsometry() *isometryFit {
	var cols []int
	for x := 0; x < p.dim; x++ {
		if p.allowed(x) {
			cols = append(cols, x)
		}
	}
	d := len(cols)
	// M[a][b] = Σ_y conj(U[y, cols[a]])·V[y, cols[b]].
	m := make([]complex128, d*d)
	for a, xa := range cols {
		for b, xb := range cols {
			var s complex128
			for y := 0; y < p.dim; y++ {
				s += cmplx.Conj(p.ud[y*p.dim+xa]) * p.vd[y*p.dim+xb]
			}
			m[a*d+b] = s
		}
	}
	if leak := p.leak(cols); !p.exact && leak <= leakNegligible {
		fit := p.fitUnitaryRestriction(m, cols)
		fit.dist += leak
		return fit
	}
	h := newHermitianMin(d)
	best := math.Inf(-1)
	var bestTheta float64
	var bestVec []complex128
	try := func(theta float64) float64 {
		lam, vec := h.min(m, theta)
		if lam > best {
			best, bestTheta, bestVec = lam, theta, vec
		}
		return lam
	}
	if p.exact {
		try(0)
	} else {
		const grid = 16
		for k := 0; k < grid; k++ {
			try(2 * math.Pi * float64(k) / grid)
		}
		// Golden section on [best − step, best + step], where λ_min(H(θ)) is unimodal once the
		// circuits are close (its superlevel sets above 0 are arcs).
		lo, hi := bestTheta-2*math.Pi/grid, bestTheta+2*math.Pi/grid
		g := (math.Sqrt(5) - 1) / 2
		a, b := hi-g*(hi-lo), lo+g*(hi-lo)
		fa, fb := try(a), try(b)
		for hi-lo > 1e-6 {
			if fa > fb {
				hi, b, fb = b, a, fa
				a = hi - g*(hi-lo)
				fa = try(a)
			} else {
				lo, a, fa = a, b, fb
				b = lo + g*(hi-lo)
				fb = try(b)
			}
		}
		// The fixed point θ = arg(x†Mx): λ_min is flat at its maximum, so the search above pins θ
		// down only to about √ε, while the argument of a complex number is well conditioned.
		theta := bestTheta
		vec := bestVec
		for i := 0; i < 20; i++ {
			z := quadForm(m, vec)
			if z == 0 {
				break
			}
			next := cmplx.Phase(z)
			_, vec = h.min(m, next)
			if math.Abs(next-theta) < 1e-15 {
				theta = next
				break
			}
			theta = next
		}
		// Distances near the tolerance are lost in 2 − 2λ, so the candidates are measured
		// directly as ‖X − e^{iθ}Y‖.
		dBest, dFixed := p.isometryDistance(cols, bestTheta), p.isometryDistance(cols, theta)
		fit := &isometryFit{dist: dBest, phase: -bestTheta, witness: p.embedColumns(cols, bestVec)}
		if dFixed < dBest {
			fit.dist, fit.phase, fit.witness = dFixed, -theta, p.embedColumns(cols, vec)
		}
		return fit
	}
	return &isometryFit{dist: p.isometryDistance(cols, 0), witness: p.embedColumns(cols, bestVec)}
}

// isometryDistance returns ‖X − e^{iθ}Y‖ for X and Y the columns cols of v and u.
func (p *densePair) isometryDistance(cols []int, theta float64) float64 {
	d := len(cols)
	ph := cmplx.Exp(complex(0, theta))
	diff := make([]complex128, p.dim*d)
	for y := 0; y < p.dim; y++ {
		for a, x := range cols {
			diff[y*d+a] = p.vd[y*p.dim+x] - ph*p.ud[y*p.dim+x]
		}
	}
	return metric.OperatorNorm(mat.NewCDense(p.dim, d, diff))
}

// embedColumns places a vector over the allowed inputs cols into the whole register.
func (p *densePair) embedColumns(cols []int, x []complex128) []complex128 {
	w := make([]complex128, p.dim)
	for a, c := range cols {
		w[c] = x[a]
	}
	return w
}

// fitUnitaryRestriction handles the common case where neither circuit leaves amplitude on the
// ancillas, so that X = Y·M with M = Y†X unitary: then ‖X − e^{iθ}Y‖ = ‖M − e^{iθ}I‖, and the
// eigenphase formula of package metric applies to M against the identity, with its witness.
func (p *densePair) fitUnitaryRestriction(m []complex128, cols []int) *isometryFit {
	d := len(cols)
	mm := mat.NewCDense(d, d, m)
	id := mat.NewCDense(d, d, nil)
	for i := 0; i < d; i++ {
		id.Set(i, i, 1)
	}
	dist, theta := metric.PhaseAlign(mm, id)
	fit := &isometryFit{dist: dist, phase: -theta, witness: make([]complex128, p.dim)}
	if dist > 0 {
		psi, _ := metric.Witness(mm, id)
		for a, x := range cols {
			fit.witness[x] = psi[a]
		}
	} else {
		fit.witness[cols[0]] = 1
	}
	return fit
}

// leakNegligible is the amplitude, in Frobenius norm over all allowed inputs, that both circuits
// together may leave outside |0⟩ on the ancillas for the unitary shortcut: rounding noise of
// exact decompositions, far below any tolerance. It is added to the distance the shortcut
// reports, which keeps that distance an upper bound.
const leakNegligible = 1e-14

// leak returns the Frobenius norm of the amplitudes that u and v send from the allowed inputs
// to states with an ancilla in |1⟩, added for the two.
func (p *densePair) leak(cols []int) float64 {
	su, sv := 0.0, 0.0
	for y := 0; y < p.dim; y++ {
		if y&p.f.ancMask == 0 {
			continue
		}
		for _, x := range cols {
			su += abs2(p.ud[y*p.dim+x])
			sv += abs2(p.vd[y*p.dim+x])
		}
	}
	return math.Sqrt(su) + math.Sqrt(sv)
}

// quadForm returns x†·M·x for a row-major d × d matrix.
func quadForm(m, x []complex128) complex128 {
	d := len(x)
	var s complex128
	for a := 0; a < d; a++ {
		var row complex128
		for b := 0; b < d; b++ {
			row += m[a*d+b] * x[b]
		}
		s += cmplx.Conj(x[a]) * row
	}
	return s
}

// hermitianMin finds the smallest eigenvalue and a unit eigenvector of
//
//	H(θ) = (e^{−iθ}·M + e^{iθ}·M†)/2
//
// for a row-major d × d matrix M, with package metric's Hermitian solver.
type hermitianMin struct {
	d int
	h *mat.CDense
}

func newHermitianMin(d int) *hermitianMin {
	return &hermitianMin{d: d, h: mat.NewCDense(d, d, nil)}
}

func (h *hermitianMin) min(m []complex128, theta float64) (float64, []complex128) {
	d := h.d
	ph := cmplx.Exp(complex(0, -theta))
	for a := 0; a < d; a++ {
		for b := 0; b <= a; b++ {
			h.h.Set(a, b, (ph*m[a*d+b]+cmplx.Conj(ph*m[b*d+a]))/2)
		}
	}
	lam, x := metric.LowestEigen(h.h)
	if math.IsNaN(lam) {
		return math.Inf(-1), x
	}
	return lam, x
}
