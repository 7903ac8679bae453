package qcheck

import (
	"math"
	"math/cmplx"

	"gonum.org/v1/gonum/mat"
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
// the eigenphase formula of DESIGN.md; when got leaks into the ancillas M is not even normal, so
// θ is found by maximising λ_min(H(θ)): a grid, a golden-section search in the best cell, and
// then the fixed point θ = arg(x†Mx) of the minimising eigenvector x, which holds at the optimum
// (there x†Mx is the point of M's numerical range nearest to 0). Every θ tried gives an upper
// bound on the distance; the smallest is kept.
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
		for i := 0; i < 20; i++ {
			z := quadForm(m, bestVec)
			if z == 0 {
				break
			}
			theta := cmplx.Phase(z)
			prev := best
			try(theta)
			if best-prev <= 1e-16 {
				break
			}
		}
	}
	fit := &isometryFit{dist: math.Sqrt(math.Max(0, 2-2*best)), phase: -bestTheta}
	if p.exact {
		fit.phase = 0
	}
	fit.witness = make([]complex128, p.dim)
	for a, x := range cols {
		fit.witness[x] = bestVec[a]
	}
	return fit
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

// hermitianMin finds the smallest eigenvalue and an eigenvector of H(θ) = (e^{−iθ}M + e^{iθ}M†)/2
// with gonum's symmetric eigensolver on the real embedding [[A, −B], [B, A]] of H = A + iB,
// which has each eigenvalue of H twice (DESIGN.md, "Numerics").
type hermitianMin struct {
	d   int
	sym *mat.SymDense
	eig mat.EigenSym
	vec mat.Dense
}

func newHermitianMin(d int) *hermitianMin {
	return &hermitianMin{d: d, sym: mat.NewSymDense(2*d, nil)}
}

func (h *hermitianMin) min(m []complex128, theta float64) (float64, []complex128) {
	d := h.d
	ph := cmplx.Exp(complex(0, -theta))
	for a := 0; a < d; a++ {
		for b := a; b < d; b++ {
			z := (ph*m[a*d+b] + cmplx.Conj(ph*m[b*d+a])) / 2
			re, im := real(z), imag(z)
			h.sym.SetSym(a, b, re)
			h.sym.SetSym(d+a, d+b, re)
			// Off-diagonal block B at (d+a, b) and −B at (a, d+b); B is antisymmetric.
			h.sym.SetSym(d+a, b, im)
			h.sym.SetSym(a, d+b, -im)
			if a != b {
				h.sym.SetSym(d+b, a, -im)
				h.sym.SetSym(b, d+a, im)
			}
		}
	}
	if !h.eig.Factorize(h.sym, true) {
		return math.Inf(-1), make([]complex128, d)
	}
	vals := h.eig.Values(nil)
	h.eig.VectorsTo(&h.vec)
	// The real embedding's eigenvector (r; s) is the complex eigenvector r + i·s.
	x := make([]complex128, d)
	norm := 0.0
	for a := 0; a < d; a++ {
		x[a] = complex(h.vec.At(a, 0), h.vec.At(d+a, 0))
		norm += abs2(x[a])
	}
	norm = math.Sqrt(norm)
	for a := range x {
		x[a] /= complex(norm, 0)
	}
	return vals[0], x
}
