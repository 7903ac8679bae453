package metric

import (
	"math"
	"math/cmplx"
	"math/rand/v2"
	"sort"

	"gonum.org/v1/gonum/mat"
)

// haar returns an n×n Haar-random unitary: the Q factor of a matrix of
// independent standard complex Gaussians, with the phases of R's diagonal
// moved into Q (Mezzadri, Notices AMS 54 (2007) 592). Gram–Schmidt with
// positive norms gives that R directly; it runs twice per column to keep Q
// unitary to rounding. Test-only: the gen package has the real sampler, and
// metric must not depend on it.
func haar(rng *rand.Rand, n int) *mat.CDense {
	cols := make([][]complex128, n)
	for j := range cols {
		c := make([]complex128, n)
		for i := range c {
			c[i] = complex(rng.NormFloat64(), rng.NormFloat64()) / math.Sqrt2
		}
		for pass := 0; pass < 2; pass++ {
			for _, q := range cols[:j] {
				var p complex128
				for i := range q {
					p += cmplx.Conj(q[i]) * c[i]
				}
				for i := range q {
					c[i] -= p * q[i]
				}
			}
		}
		var s float64
		for _, x := range c {
			s += real(x)*real(x) + imag(x)*imag(x)
		}
		s = math.Sqrt(s)
		for i := range c {
			c[i] /= complex(s, 0)
		}
		cols[j] = c
	}
	m := mat.NewCDense(n, n, nil)
	for j, c := range cols {
		for i, x := range c {
			m.Set(i, j, x)
		}
	}
	return m
}

// haarState returns a Haar-random unit vector of length n: a normalised
// vector of independent standard complex Gaussians (Mezzadri 2007, §2).
func haarState(rng *rand.Rand, n int) []complex128 {
	v := make([]complex128, n)
	var s float64
	for i := range v {
		v[i] = complex(rng.NormFloat64(), rng.NormFloat64())
		s += real(v[i])*real(v[i]) + imag(v[i])*imag(v[i])
	}
	s = math.Sqrt(s)
	for i := range v {
		v[i] /= complex(s, 0)
	}
	return v
}

// diagonal returns the diagonal unitary with the given eigenphases, rotated
// into a random basis by q when q is not nil: q·diag(e^{iθ})·q†.
func diagonal(q *mat.CDense, phases ...float64) *mat.CDense {
	n := len(phases)
	d := mat.NewCDense(n, n, nil)
	for i, p := range phases {
		d.Set(i, i, cmplx.Exp(complex(0, p)))
	}
	if q == nil {
		return d
	}
	return mul(mul(q, d), adjoint(q))
}

// mul returns a·b with a plain triple loop, independent of the package's
// own kernels.
func mul(a, b mat.CMatrix) *mat.CDense {
	r, k := a.Dims()
	_, c := b.Dims()
	m := mat.NewCDense(r, c, nil)
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			var s complex128
			for l := 0; l < k; l++ {
				s += a.At(i, l) * b.At(l, j)
			}
			m.Set(i, j, s)
		}
	}
	return m
}

// adjoint returns a†.
func adjoint(a mat.CMatrix) *mat.CDense {
	r, c := a.Dims()
	m := mat.NewCDense(c, r, nil)
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			m.Set(j, i, cmplx.Conj(a.At(i, j)))
		}
	}
	return m
}

// scale returns s·a.
func scale(s complex128, a mat.CMatrix) *mat.CDense {
	r, c := a.Dims()
	m := mat.NewCDense(r, c, nil)
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			m.Set(i, j, s*a.At(i, j))
		}
	}
	return m
}

// kron returns a⊗b.
func kron(a, b mat.CMatrix) *mat.CDense {
	ra, ca := a.Dims()
	rb, cb := b.Dims()
	m := mat.NewCDense(ra*rb, ca*cb, nil)
	for i := 0; i < ra; i++ {
		for j := 0; j < ca; j++ {
			for k := 0; k < rb; k++ {
				for l := 0; l < cb; l++ {
					m.Set(i*rb+k, j*cb+l, a.At(i, j)*b.At(k, l))
				}
			}
		}
	}
	return m
}

// identity returns the n×n identity.
func identity(n int) *mat.CDense {
	m := mat.NewCDense(n, n, nil)
	for i := 0; i < n; i++ {
		m.Set(i, i, 1)
	}
	return m
}

// gate builds a 2×2 matrix from its rows.
func gate(a, b, c, d complex128) *mat.CDense {
	return mat.NewCDense(2, 2, []complex128{a, b, c, d})
}

// Textbook gates (Nielsen & Chuang §4.2; rz as exp(−iθZ/2) as in package circuit's conventions).
var (
	gateX = gate(0, 1, 1, 0)
	gateY = gate(0, -1i, 1i, 0)
	gateZ = gate(1, 0, 0, -1)
	gateH = gate(1/math.Sqrt2, 1/math.Sqrt2, 1/math.Sqrt2, -1/math.Sqrt2)
	gateS = gate(1, 0, 0, 1i)
	gateT = gate(1, 0, 0, cmplx.Exp(1i*math.Pi/4))
	gateI = identity(2)
)

func rz(theta float64) *mat.CDense {
	return gate(cmplx.Exp(complex(0, -theta/2)), 0, 0, cmplx.Exp(complex(0, theta/2)))
}

func newRand(seed uint64) *rand.Rand { return rand.New(rand.NewPCG(seed, 0x9e3779b97f4a7c15)) }

// phaseError returns the largest distance on the circle between matched
// elements of two lists of eigenphases, matching them in order after cutting
// the circle in the widest gap of want (found here by brute force over
// candidate cuts, independently of the package's arc code).
func phaseError(got, want []float64) float64 {
	if len(got) != len(want) {
		return math.Inf(1)
	}
	cut, best := 0.0, -1.0
	for _, c := range want {
		// The gap that opens counter-clockwise from c.
		gap := 2 * math.Pi
		for _, d := range want {
			if g := math.Mod(d-c+4*math.Pi, 2*math.Pi); g > 0 && g < gap {
				gap = g
			}
		}
		if gap > best {
			best, cut = gap, c+gap/2
		}
	}
	shift := func(ph []float64) []float64 {
		out := make([]float64, len(ph))
		for i, p := range ph {
			out[i] = math.Mod(p-cut+8*math.Pi, 2*math.Pi)
		}
		sort.Float64s(out)
		return out
	}
	g, w := shift(got), shift(want)
	worst := 0.0
	for i := range g {
		worst = math.Max(worst, math.Abs(g[i]-w[i]))
	}
	return worst
}
