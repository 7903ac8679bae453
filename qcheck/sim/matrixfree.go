package sim

import (
	"fmt"
	"math"
	"math/cmplx"
	"math/rand/v2"
	"runtime"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// MatrixFreeOptions tunes MatrixFreeDistance. The zero value asks for the defaults.
type MatrixFreeOptions struct {
	// ExploreSteps bounds the applications of W = V†U spent exploring its spectrum from a first
	// random state; exploration stops early once its Krylov space is invariant to rounding.
	// Default 12.
	ExploreSteps int
	// CertifySteps bounds the applications of W, from a second and independent random state,
	// that back the probabilistic upper bound; the bound needs about 24 at 20 qubits and
	// tightens with more. Default 40; negative skips the bound.
	CertifySteps int
	// Tolerance, when positive, lets the run stop as soon as the verdict at this distance is
	// settled: when the witness shows more than Tolerance, or the upper bound falls to Tolerance
	// or below. Zero runs every step, for the sharpest estimate and bound.
	Tolerance float64
	// Failure is the probability, over the random states, that the upper bound does not hold.
	// Default 1e-6.
	Failure float64
	// Seed chooses the random states; runs with the same seed give the same answer.
	Seed uint64
	// MemoryLimit caps the bytes held in Krylov vectors (16·2^n bytes each); the step counts
	// are lowered to fit. Default DefaultMemoryLimit.
	MemoryLimit int64
}

// MatrixFreeResult is the answer of MatrixFreeDistance about D = min over φ of ‖U − e^{iφ}V‖,
// and what is certified about it.
type MatrixFreeResult struct {
	// Distance is the estimate of D: the largest deviation ‖(U − e^{iφ}V)x‖ over the unit
	// vectors x of the Krylov spaces explored, with φ chosen to make it smallest. Up to rounding
	// it never exceeds D, and it equals D once the spaces hold the eigenvectors of W = V†U at
	// the two ends of the shortest arc holding its eigenphases.
	Distance float64
	// Phase is the φ found by the exploration, in (−π, π]: U ≈ e^{iφ}V. Upper refers to it; it
	// is also the estimate's own phase unless the certifying space saw more than the exploring one.
	Phase float64
	// Witness is a unit input state on which the circuits differ the most among those found.
	Witness []complex128
	// Lower is min over φ of ‖Uψ − e^{iφ}Vψ‖ for ψ = Witness, computed by running both circuits
	// on ψ: a certified lower bound on D (up to the rounding of those two runs). No single state
	// shows more than √2, so Lower ≤ √2 even when D is near 2.
	Lower float64
	// Upper bounds ‖U − e^{iφ}V‖ ≥ D at φ = Phase, with probability at least 1 − Failure over
	// the second random state (the Kuczyński–Woźniakowski bound on Krylov estimates), plus an
	// allowance for rounding; +Inf when the certification was skipped, stopped early, or had too
	// few steps.
	Upper float64
	// Failure is the probability that Upper does not hold; 0 when the certifying Krylov space
	// became exactly invariant, which leaves nothing unexplored.
	Failure float64
	// Steps is the number of applications of W (each one run of U and one of the inverse of V,
	// or of the parts of them that differ). Checking the witness candidates adds two runs of
	// each circuit, four when the second space shows more than the first.
	Steps int
	// Shared is the number of ops at the start and at the end that the two circuits have in
	// common; W is replaced by the similar, and cheaper, product of the parts in between.
	Shared int
}

// Exact reports whether the distance is pinned down to within tol: Upper − Lower ≤ tol. Lower is
// certified; Upper holds with probability 1 − Failure.
func (r MatrixFreeResult) Exact(tol float64) bool { return r.Upper-r.Lower <= tol }

// MatrixFreeDistance estimates D = min over φ of ‖U − e^{iφ}V‖, the operator-norm distance of two
// circuits up to global phase, without forming either matrix: it needs only statevectors of 2^n
// entries, a few dozen of them, so it serves widths of 15 to about 24 qubits where no dense
// matrix fits.
//
// W = V†U is applied to a statevector by running U and then the inverse of V. Ops the circuits
// share at the start (P) and at the end (S) are dropped first: with U = S·A·P and V = S·B·P,
// W = P†(B†A)P has the eigenvalues of B†A, so D and the phase are those of A and B, and a witness
// ψ′ for A and B gives the witness P†ψ′ for U and V.
//
// From a random state, an Arnoldi iteration builds an orthonormal basis Q of span{v, Wv, W²v, …}
// and the small matrix H with WQ = QH + (rounding). Because W is unitary (normal), the
// eigenvectors that matter, those at the two ends of the shortest arc holding its eigenphases,
// are reached as fast as a Lanczos iteration on a Hermitian part of e^{−iφ}W would reach them,
// at half the cost (a Lanczos step needs W and W†); and H gives the compressions of every
// Hermitian part at once:
//   - ‖(W − e^{iφ})x‖ over x in span Q is at most σ_max(e^{−iφ}H − I), minimised over φ for the
//     estimate and the phase;
//   - the Hermitian part (e^{−iφ}W − e^{iφ}W†)/2i, whose eigenvalues are sin(θ_k − φ), gives by
//     its extreme Ritz vectors the two ends of the arc, and their equal-weight sum is the witness.
//
// A second Krylov space from an independent random state bounds the distance from above at the
// phase found: by the bound of Kuczyński & Woźniakowski for the Lanczos method from a random start
// (SIAM J. Matrix Anal. Appl., 1992; the theorem's number and constant are as this package's
// authors read them, not re-derived here), a Krylov estimate ξ of the largest eigenvalue λ of a positive semidefinite matrix of
// order n, from a uniformly random start, satisfies ξ ≤ (1 − ε)λ with probability at most
// 1.648·√n·e^{−√ε(2k−1)} after k steps. It is applied to (e^{−iφ}W − I)†(e^{−iφ}W − I), of order
// 2·2^n as a real matrix, with k = ⌊(steps − 1)/2⌋ + 1 (the span of m powers of a unitary W holds,
// after multiplication by a power of W that changes no norm, every polynomial of degree
// ⌊(m−1)/2⌋ in W + W†). The phase comes from the first space, so it is independent of the second
// state, as the bound requires.
//
// Both circuits must have the same width and only unitary ops; the error names the circuit and op.
func MatrixFreeDistance(u, v *circuit.Circuit, opts MatrixFreeOptions) (MatrixFreeResult, error) {
	pu, pv, err := buildPair(u, v, "first", "second", Compile)
	if err != nil {
		return MatrixFreeResult{}, err
	}
	n := u.Qubits()
	opts, err = opts.settle(n)
	if err != nil {
		return MatrixFreeResult{}, err
	}
	pre, suf := circuit.CommonEnds(u, v)
	middle := span(u, pre, u.Len()-suf)
	w, err := Compile(middle.Compose(span(v, pre, v.Len()-suf).Inverse()))
	if err != nil {
		return MatrixFreeResult{}, err
	}
	back, err := Compile(span(u, 0, pre).Inverse())
	if err != nil {
		return MatrixFreeResult{}, err
	}
	check := &witnessCheck{back: back, u: pu, v: pv}
	dim := 1 << n
	rng := rand.New(rand.NewPCG(opts.Seed, 0x6d66))
	rounding := roundingAllowance(u.Len() + v.Len())
	res := MatrixFreeResult{Upper: math.Inf(1), Failure: 1, Shared: pre + suf}

	// Explore: the estimate, the phase and the witness.
	ex := newArnoldi(w, randomState(rng, dim), opts.ExploreSteps)
	if err := ex.run(exploreInvariant, nil); err != nil {
		return MatrixFreeResult{}, err
	}
	res.Phase, res.Distance = ex.bestPhase()
	res.Witness, res.Lower = ex.witness(res.Phase, check)
	res.Steps = ex.steps()
	ex = nil // free the basis before the second space is built
	if opts.CertifySteps < 0 || (opts.Tolerance > 0 && res.Lower > opts.Tolerance) {
		return res, nil
	}

	// Certify: an upper bound at the phase found, from an independent random state.
	ce := newArnoldi(w, randomState(rng, dim), opts.CertifySteps)
	// With a Tolerance the bound is tested after every step and the run stops at the first
	// success, so each test gets an equal part of the failure probability (a union bound over at
	// most CertifySteps tests) and the stated Failure holds for the run as a whole.
	perTest := opts.Failure
	if opts.Tolerance > 0 && opts.CertifySteps > 1 {
		perTest /= float64(opts.CertifySteps)
	}
	upper := func() (float64, float64) {
		xi := ce.deviation(res.Phase)
		if ce.invariant {
			return xi + rounding, 0
		}
		k := (ce.steps()-1)/2 + 1
		sq := math.Log(1.648*math.Sqrt(2*float64(dim))/perTest) / float64(2*k-1)
		if eps := sq * sq; eps < 1 {
			return xi/math.Sqrt(1-eps) + rounding, opts.Failure
		}
		return math.Inf(1), 1
	}
	settled := func() bool {
		up, _ := upper()
		return opts.Tolerance > 0 && up <= opts.Tolerance
	}
	if err := ce.run(0, settled); err != nil {
		return res, err
	}
	res.Steps += ce.steps()
	res.Upper, res.Failure = upper()
	// The second space is an independent look at the spectrum: keep its view when it saw more.
	if p2, d2 := ce.bestPhase(); d2 > res.Distance {
		if wit, low := ce.witness(p2, check); low > res.Lower {
			res.Witness, res.Lower = wit, low
		}
		res.Distance = d2
		if res.Upper < d2 { // cannot happen in exact arithmetic; keep the report consistent
			res.Upper = d2 + rounding
		}
	}
	return res, nil
}

// span returns a new circuit of c's width holding copies of c.Ops[from:to].
func span(c *circuit.Circuit, from, to int) *circuit.Circuit {
	out := circuit.New(c.Qubits())
	for _, op := range c.Ops[from:to] {
		out.AppendOp(op)
	}
	return out
}

// witnessCheck maps a candidate state for the middle parts back to the full circuits and
// measures it on them.
type witnessCheck struct {
	back, u, v *Program
}

// measure turns ψ′ into ψ = P†ψ′ (in place) and returns min over φ of ‖Uψ − e^{iφ}Vψ‖, from one
// run of each circuit: the phase that attains it is that of ⟨Vψ|Uψ⟩.
func (wc *witnessCheck) measure(psi []complex128) float64 {
	if wc.back.Apply(psi) != nil {
		return 0
	}
	a := append([]complex128(nil), psi...)
	b := append([]complex128(nil), psi...)
	if wc.u.Apply(a) != nil || wc.v.Apply(b) != nil {
		return 0
	}
	return metric.AlignedDistance(a, b)
}

// exploreInvariant is the residual below which the exploring Krylov space is taken as invariant:
// well above the rounding of a run of a few thousand gates (about 1e-13), well below any
// deviation worth reporting.
const exploreInvariant = 1e-11

// roundingAllowance is the error assumed for running a circuit of the given number of gates on a
// unit statevector: 8 units of rounding per gate, common practice for a product of unitary
// factors (each gate's rounding is a few ulps of the norm), not a proof.
func roundingAllowance(gates int) float64 { return 8 * 0x1p-53 * float64(gates+1) }

// settle fills in defaults and fits the step counts into the memory limit.
func (o MatrixFreeOptions) settle(n int) (MatrixFreeOptions, error) {
	if o.ExploreSteps == 0 {
		o.ExploreSteps = 12
	}
	if o.CertifySteps == 0 {
		o.CertifySteps = 40
	}
	if o.Failure == 0 {
		o.Failure = 1e-6
	}
	if o.MemoryLimit == 0 {
		o.MemoryLimit = DefaultMemoryLimit
	}
	if o.ExploreSteps < 0 || !(o.Failure > 0 && o.Failure < 1) || o.MemoryLimit < 0 || !(o.Tolerance >= 0) {
		return o, fmt.Errorf("sim: bad matrix-free options: ExploreSteps %d, Failure %g, Tolerance %g, MemoryLimit %d", o.ExploreSteps, o.Failure, o.Tolerance, o.MemoryLimit)
	}
	vector := complexBytes(n)
	fit := int(math.Min(float64(o.MemoryLimit)/vector, 1<<30)) - 4 // the basis, the vector being built, the witness and its two images
	if fit < 2 {
		return o, fmt.Errorf("sim: a %d-qubit matrix-free distance needs at least 6 statevectors (%s), over the limit of %s", n, bytesString(6*vector), bytesString(float64(o.MemoryLimit)))
	}
	o.ExploreSteps = min(o.ExploreSteps, fit)
	o.CertifySteps = min(o.CertifySteps, fit)
	return o, nil
}

// randomState returns a unit vector uniform on the sphere of C^dim: normalised complex Gaussians.
func randomState(rng *rand.Rand, dim int) []complex128 {
	v := make([]complex128, dim)
	for i := range v {
		v[i] = complex(rng.NormFloat64(), rng.NormFloat64())
	}
	scale(v, 1/norm(v))
	return v
}

// arnoldi is a Krylov basis of a unitary W and the Hessenberg matrix of W in it: W q_j =
// Σ_{i≤j+1} h[i][j] q_i.
type arnoldi struct {
	w         *Program
	basis     [][]complex128
	h         [][]complex128 // h[j] is column j, of length j+2
	max       int
	invariant bool
}

func newArnoldi(w *Program, start []complex128, max int) *arnoldi {
	return &arnoldi{w: w, basis: [][]complex128{start}, max: max}
}

// steps returns the number of applications of W made.
func (a *arnoldi) steps() int { return len(a.h) }

// run applies W up to max times, orthogonalising each new vector against the basis again while a
// pass removes more than 30% of its norm (Gram–Schmidt with reorthogonalisation, the DGKS
// criterion, at most three passes). It stops early when the residual falls to stop or below, or
// the basis fills the whole space (then the space is invariant), or done, when given, reports
// that enough is known.
func (a *arnoldi) run(stop float64, done func() bool) error {
	for len(a.h) < a.max && !a.invariant {
		if err := a.step(stop); err != nil {
			return err
		}
		if done != nil && done() {
			return nil
		}
	}
	return nil
}

// step applies W once and extends the basis.
func (a *arnoldi) step(stop float64) error {
	j := len(a.h)
	x := append([]complex128(nil), a.basis[j]...)
	if err := a.w.Apply(x); err != nil {
		return err
	}
	col := make([]complex128, j+2)
	before := norm(x)
	for pass := 0; pass < 3; pass++ {
		project(a.basis, x, col)
		if norm(x) > 0.7*before {
			break
		}
		before = norm(x)
	}
	beta := norm(x)
	col[j+1] = complex(beta, 0)
	a.h = append(a.h, col)
	if beta <= stop || beta < 1e-290 || len(a.basis) == len(x) {
		col[j+1] = 0
		a.invariant = true
		return nil
	}
	scale(x, 1/beta)
	a.basis = append(a.basis, x)
	return nil
}

// shifted returns e^{−iφ}H − I as a dense rows×m complex matrix (row-major), with rows = m+1
// unless the space is invariant.
func (a *arnoldi) shifted(phi float64) ([]complex128, int, int) {
	m := len(a.h)
	rows := m + 1
	if a.invariant {
		rows = m
	}
	rot := cmplx.Exp(complex(0, -phi))
	out := make([]complex128, rows*m)
	for j, col := range a.h {
		for i := 0; i < len(col) && i < rows; i++ {
			out[i*m+j] = rot * col[i]
		}
		out[j*m+j]--
	}
	return out, rows, m
}

// deviation returns max over unit x in span Q of ‖(W − e^{iφ})x‖ = σ_max(e^{−iφ}H − I).
func (a *arnoldi) deviation(phi float64) float64 {
	m, rows, cols := a.shifted(phi)
	s, _ := largestSingular(m, rows, cols, false)
	return s
}

// bestPhase minimises deviation over φ: a grid, then golden-section search around its best point.
func (a *arnoldi) bestPhase() (phi, dev float64) {
	const grid = 96
	step := 2 * math.Pi / grid
	best, bestDev := 0.0, math.Inf(1)
	for g := 0; g < grid; g++ {
		p := -math.Pi + step*float64(g+1)
		if d := a.deviation(p); d < bestDev {
			best, bestDev = p, d
		}
	}
	lo, hi := best-step, best+step
	const r = 0.6180339887498949 // (√5 − 1)/2
	x1, x2 := hi-r*(hi-lo), lo+r*(hi-lo)
	f1, f2 := a.deviation(x1), a.deviation(x2)
	for i := 0; i < 80 && hi-lo > 1e-15; i++ {
		if f1 <= f2 {
			hi, x2, f2 = x2, x1, f1
			x1 = hi - r*(hi-lo)
			f1 = a.deviation(x1)
		} else {
			lo, x1, f1 = x1, x2, f2
			x2 = lo + r*(hi-lo)
			f2 = a.deviation(x2)
		}
	}
	phi, dev = x1, f1
	if f2 < f1 {
		phi, dev = x2, f2
	}
	if bestDev < dev {
		phi, dev = best, bestDev
	}
	return math.Atan2(math.Sin(phi), math.Cos(phi)), dev // φ mapped to (−π, π]
}

// witness builds candidate states from the space at phase φ, picks the one whose deviation the
// small matrix H predicts to be largest, and runs both circuits on it to measure that deviation
// directly. The candidates are the equal-weight sum of the Ritz vectors at the two extremes of
// sin(θ − φ) (the two ends of the arc) and the vector of largest deviation at φ.
func (a *arnoldi) witness(phi float64, check *witnessCheck) ([]complex128, float64) {
	m := len(a.h)
	lo, hi := skewExtremes(a.h, m, phi)
	sum := make([]complex128, m)
	for i := range sum {
		sum[i] = lo[i] + hi[i]
	}
	mat, rows, cols := a.shifted(phi)
	_, top := largestSingular(mat, rows, cols, true)
	best, bestDev := sum, a.predictedDeviation(sum)
	if d := a.predictedDeviation(top); d > bestDev || bestDev != bestDev {
		best = top
	}
	psi := a.lift(best)
	if nrm := norm(psi); nrm > 0 {
		scale(psi, 1/nrm)
	} else {
		psi[0] = 1
	}
	return psi, check.measure(psi)
}

// predictedDeviation returns min over α of ‖(W − e^{iα})Qy‖/‖y‖ from the Arnoldi relation
// WQy = Q₊H̄y, without applying W.
func (a *arnoldi) predictedDeviation(y []complex128) float64 {
	m := len(a.h)
	z := make([]complex128, m+1)
	for j, col := range a.h {
		for i, h := range col {
			z[i] += h * y[j]
		}
	}
	yy := append(append([]complex128(nil), y...), 0)
	ny := norm(yy)
	if ny == 0 {
		return 0
	}
	return metric.AlignedDistance(z, yy) / ny
}

// lift returns Q y.
func (a *arnoldi) lift(y []complex128) []complex128 {
	out := make([]complex128, len(a.basis[0]))
	for i, c := range y {
		if i < len(a.basis) {
			axpy(c, a.basis[i], out)
		}
	}
	return out
}

// project removes from x its components along the orthonormal basis and adds them to coef:
// classical Gram–Schmidt, run over cache-sized chunks of x so that each basis vector is read once
// for the inner products and once for the update, with the chunks shared among the cores.
func project(basis [][]complex128, x []complex128, coef []complex128) {
	const chunk = 1 << 11 // 32 KiB of x, at home in a core's cache
	chunks := (len(x) + chunk - 1) / chunk
	workers := min(runtime.GOMAXPROCS(0), chunks)
	partial := make([][]complex128, workers)
	parallel(workers, workers, func(w0, w1 int) {
		for w := w0; w < w1; w++ {
			c := make([]complex128, len(basis))
			for k := chunks * w / workers; k < chunks*(w+1)/workers; k++ {
				lo, hi := k*chunk, min((k+1)*chunk, len(x))
				for i, q := range basis {
					c[i] += dot(q[lo:hi], x[lo:hi])
				}
			}
			partial[w] = c
		}
	})
	c := make([]complex128, len(basis))
	for _, p := range partial {
		for i := range c {
			c[i] += p[i]
		}
	}
	parallel(chunks, workers, func(k0, k1 int) {
		for k := k0; k < k1; k++ {
			lo, hi := k*chunk, min((k+1)*chunk, len(x))
			for i, q := range basis {
				axpy(-c[i], q[lo:hi], x[lo:hi])
			}
		}
	})
	for i := range c {
		coef[i] += c[i]
	}
}

// dot returns ⟨a|b⟩ = Σ conj(a_i) b_i.
func dot(a, b []complex128) complex128 {
	var re, im float64
	for i, x := range a {
		y := b[i]
		re += real(x)*real(y) + imag(x)*imag(y)
		im += real(x)*imag(y) - imag(x)*real(y)
	}
	return complex(re, im)
}

// axpy sets y += c·x.
func axpy(c complex128, x, y []complex128) {
	for i, v := range x {
		y[i] += c * v
	}
}

func scale(x []complex128, s float64) {
	for i := range x {
		x[i] = complex(real(x[i])*s, imag(x[i])*s)
	}
}

// norm returns the Euclidean norm; the vectors here have entries of order one or less.
func norm(x []complex128) float64 {
	s := 0.0
	for _, v := range x {
		s += real(v)*real(v) + imag(v)*imag(v)
	}
	return math.Sqrt(s)
}
