package qcheck

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// denseAuto is the widest register Auto gives to the dense engine: two 2^12 × 2^12 unitaries take
// 512 MiB and a few seconds.
const denseAuto = 12

// denseEngine builds both unitaries as full matrices (package sim's Unitary) and compares them
// with package metric: every measure, exact phase, clean and dirty ancillas and measured
// distributions, exact to floating-point rounding. Its width is limited by memory (16·4^n bytes
// a matrix); Auto gives it registers up to denseAuto qubits.
type denseEngine struct{}

var _ engine = denseEngine{}

func (denseEngine) name() Engine { return Dense }

// work: k·4^m to build both unitaries (each gate runs over 2^m columns of 2^m entries), plus
// 6·8^m for the distance (a Cayley transform costs 2·8^m, up to two are built) and, with
// Measured, the product U·V†.
func (denseEngine) work(f *frame) float64 {
	return opsOf(f)*math.Exp2(2*float64(f.m)) + 6*math.Exp2(3*float64(f.m))
}

func (denseEngine) refuses(cfg *config, f *frame, auto bool) error {
	if err := refuseMeaning(f, Dense); err != nil {
		return err
	}
	if auto && f.m > denseAuto {
		return fmt.Errorf("%d qubits is wider than the dense engine takes automatically (%d)", f.m, denseAuto)
	}
	if auto && f.m >= zxAutoFrom && (zxEngine{}).refuses(cfg, f, true) == nil {
		return fmt.Errorf("at %d qubits the ZX engine answers first (and hands what it leaves undecided to the dense engine)", f.m)
	}
	return nil
}

func (denseEngine) certifies(cfg *config, f *frame) string {
	if f.measured != nil {
		return "certified from exact unitaries: the total-variation distance is an upper bound on the largest over all inputs when equivalent (from the part of U·V† that moves probability between outcomes) and a distance found on an input when not"
	}
	return "exact: both full unitaries, to floating-point rounding"
}

func (denseEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	return compareDense(cfg, f, r, full)
}

// densePair holds the two unitaries of a dense comparison on got's register: u of want (moved
// onto got's register) and v of got (with its output permutation undone), both row-major
// dim × dim.
type densePair struct {
	u, v   *mat.CDense
	ud, vd []complex128
	dim    int
	f      *frame
	exact  bool
}

// compareDense fills r from the two full unitaries.
func compareDense(cfg *config, f *frame, r *Result, full bool) error {
	wantC, gotC := f.want, f.got
	windowed := false
	if !full && f.perm == nil && f.anc == nil && f.measured == nil {
		wantC, gotC, windowed = differingWindows(f.want, f.got)
	}
	u, err := sim.Unitary(wantC)
	if err != nil {
		return fmt.Errorf("qcheck: want: %w", err)
	}
	v, err := sim.Unitary(gotC)
	if err != nil {
		return fmt.Errorf("qcheck: got: %w", err)
	}
	if f.perm != nil {
		v = undoPermutation(v, f.perm)
	}
	p := &densePair{u: u, v: v, ud: u.RawCMatrix().Data, vd: v.RawCMatrix().Data, dim: 1 << f.m, f: f, exact: cfg.exactPhase}

	var iso *isometryFit
	switch {
	case f.clean:
		iso = p.fitIsometry()
		r.OperatorDistance, r.Phase = iso.dist, iso.phase
	case cfg.exactPhase:
		r.OperatorDistance = metric.Distance(u, v)
	default:
		r.OperatorDistance, r.Phase = metric.PhaseAlign(u, v)
	}
	switch {
	case f.measured != nil:
		// Decided below from the distributions.
	case cfg.measure == Diamond:
		r.Distance = metric.Diamond(u, v)
	case cfg.measure == AverageFidelity:
		r.Distance = 1 - metric.AverageFidelity(u, v)
	default:
		r.Distance = r.OperatorDistance
	}
	if f.measured == nil {
		r.Equivalent = r.Distance <= cfg.tol
		if !full && r.Equivalent {
			return nil
		}
	}
	if windowed {
		// The evidence is about the whole circuits.
		return compareDense(cfg, f, r, true)
	}

	// The evidence: a witness input, a measurement that tells the circuits apart, and blame.
	if iso != nil {
		r.Witness = iso.witness
	} else {
		r.Phase, r.Witness = p.unitaryWitness()
	}
	r.Witness = p.simplerWitness(r.Witness)
	r.WitnessGap = p.deviation(r.Witness)
	if f.measured != nil {
		r.Measure = Distribution
		lower, upper, m := p.distributions(r.Witness)
		r.Measurement = m
		switch {
		case upper <= cfg.tol:
			r.Equivalent, r.Distance = true, upper
			r.UpperBound = lower < upper
		case lower > cfg.tol:
			r.Distance = lower
			r.LowerBound = lower < upper
		default:
			r.Distance, r.LowerBound = lower, true
			r.Undecided = fmt.Sprintf("the largest total-variation distance of the measured distributions over all inputs is at least %.4g (found on an input) and at most %.4g (certified bound); the tolerance %g lies between", lower, upper, cfg.tol)
		}
		r.Certifies += fmt.Sprintf("; the largest over all inputs lies in [%.4g, %.4g]", lower, upper)
		if !full && r.Equivalent {
			return nil
		}
	} else {
		r.Measurement = p.measurement(r.Witness)
	}
	r.Blame = blame(cfg, f, r.Want, r.Got)
	return nil
}

// differingWindows returns the parts of want and got left when their longest common start and
// end (equal ops) are removed, and whether anything was removed. With U = S·A·P and V = S·B·P,
// ‖U − e^{iφ}V‖ = ‖A − e^{iφ}B‖ because the operator norm is unitarily invariant, and V†U is
// similar to B†A, so the diamond distance and the average fidelity are unchanged too: a verdict
// on the windows is a verdict on the circuits, at the cost of the ops a pass actually changed.
// It applies on one register without output permutation, ancillas or measurement.
func differingWindows(want, got *circuit.Circuit) (*circuit.Circuit, *circuit.Circuit, bool) {
	pre, suf := circuit.CommonEnds(want, got)
	if pre == 0 && suf == 0 {
		return want, got, false
	}
	a, b := circuit.New(want.Qubits()), circuit.New(got.Qubits())
	a.Ops, b.Ops = want.Ops[pre:want.Len()-suf], got.Ops[pre:got.Len()-suf]
	return a, b, true
}

// undoPermutation returns the unitary of got followed by the relabelling that puts logical qubit
// i, found on physical qubit perm[i], back on qubit i: row x of v becomes row y, where bit i of y
// is bit perm[i] of x.
func undoPermutation(v *mat.CDense, perm []int) *mat.CDense {
	dim, _ := v.Dims()
	src := v.RawCMatrix().Data
	dst := make([]complex128, len(src))
	for x := 0; x < dim; x++ {
		y := 0
		for i, p := range perm {
			y |= (x >> p & 1) << i
		}
		copy(dst[y*dim:(y+1)*dim], src[x*dim:(x+1)*dim])
	}
	return mat.NewCDense(dim, dim, dst)
}

// unitaryWitness returns the optimal global phase and the witness of two full unitaries.
func (p *densePair) unitaryWitness() (phase float64, psi []complex128) {
	if p.exact {
		// With the phase fixed, the witness is the eigenvector of V†U whose eigenphase is
		// farthest from 0, which is the isometry fit with every input allowed.
		return 0, p.fitIsometry().witness
	}
	psi, _ = metric.Witness(p.u, p.v)
	_, phase = metric.PhaseAlign(p.u, p.v)
	return phase, psi
}

// apply returns m·psi for a row-major dim × dim matrix.
func apply(m []complex128, dim int, psi []complex128) []complex128 {
	out := make([]complex128, dim)
	for y := 0; y < dim; y++ {
		var s complex128
		row := m[y*dim : (y+1)*dim]
		for x, a := range psi {
			s += row[x] * a
		}
		out[y] = s
	}
	return out
}

// deviation returns how far apart the outputs of the two circuits are for input ψ: with a = u·ψ
// and b = v·ψ, ‖a − b‖ with exact phase, else min over φ of ‖a − e^{iφ}b‖ = √(2 − 2|⟨a|b⟩|). It
// is computed directly from ψ, so it is a certified lower bound on the operator-norm distance
// whatever the eigen-solver did (for the phase-free distance by the minimax inequality
// max_ψ min_φ ≤ min_φ max_ψ).
func (p *densePair) deviation(psi []complex128) float64 {
	if psi == nil {
		return 0
	}
	a, b := apply(p.ud, p.dim, psi), apply(p.vd, p.dim, psi)
	return p.deviationOf(a, b)
}

func (p *densePair) deviationOf(a, b []complex128) float64 {
	if !p.exact {
		return metric.AlignedDistance(a, b)
	}
	s := 0.0
	for i := range a {
		s += abs2(a[i] - b[i])
	}
	return math.Sqrt(s)
}

// simpleWitnessDim is the largest register dimension for which simpler witnesses are sought.
const simpleWitnessDim = 32

// simplerWitness looks for a witness a person can read, a basis state |x⟩ or an equal
// superposition (|x⟩ + c|y⟩)/√2 with c ∈ {1, i, −1, −i}, that exposes the difference as well as
// psi does (to 1e-12 relative); it returns psi when there is none. Eigenvectors of degenerate
// eigenspaces are otherwise arbitrary mixtures.
func (p *densePair) simplerWitness(psi []complex128) []complex128 {
	if psi == nil || p.dim > simpleWitnessDim {
		return psi
	}
	target := p.deviation(psi) * (1 - 1e-12)
	if target <= 0 {
		return psi
	}
	var cols []int
	for x := 0; x < p.dim; x++ {
		if p.allowed(x) {
			cols = append(cols, x)
		}
	}
	a, b := make([]complex128, p.dim), make([]complex128, p.dim)
	for _, x := range cols {
		for y := 0; y < p.dim; y++ {
			a[y], b[y] = p.ud[y*p.dim+x], p.vd[y*p.dim+x]
		}
		if p.deviationOf(a, b) >= target {
			return basisState(p.dim, x)
		}
	}
	s := complex(1/math.Sqrt2, 0)
	for i, x := range cols {
		for _, y := range cols[i+1:] {
			for _, c := range []complex128{1, 1i, -1, -1i} {
				for r := 0; r < p.dim; r++ {
					a[r] = s * (p.ud[r*p.dim+x] + c*p.ud[r*p.dim+y])
					b[r] = s * (p.vd[r*p.dim+x] + c*p.vd[r*p.dim+y])
				}
				if p.deviationOf(a, b) >= target {
					w := make([]complex128, p.dim)
					w[x], w[y] = s, s*c
					return w
				}
			}
		}
	}
	return psi
}

// allowed reports whether basis input x may be prepared: with clean ancillas only those with the
// ancillas in |0⟩.
func (p *densePair) allowed(x int) bool { return !p.f.clean || x&p.f.ancMask == 0 }

// measurement finds a concrete experiment that tells the circuits apart: the computational-basis
// input and outcome whose probabilities differ most, the witness input with the outcome whose
// probabilities differ most, or, when relative phases hide the difference from the
// computational basis, the projection of the witness's output onto want's output.
func (p *densePair) measurement(psi []complex128) Measurement {
	gap := newLargestGap()
	for x := 0; x < p.dim; x++ {
		if !p.allowed(x) {
			continue
		}
		for y := 0; y < p.dim; y++ {
			gap.offer(nil, x, y, abs2(p.ud[y*p.dim+x]), abs2(p.vd[y*p.dim+x]))
		}
	}
	gap.fillBasisInput(p.dim)
	if psi == nil {
		return gap.best
	}
	return outputMeasurement(psi, apply(p.ud, p.dim, psi), apply(p.vd, p.dim, psi), &gap)
}

func abs2(z complex128) float64 { return real(z)*real(z) + imag(z)*imag(z) }

func basisState(dim, x int) []complex128 {
	s := make([]complex128, dim)
	s[x] = 1
	return s
}
