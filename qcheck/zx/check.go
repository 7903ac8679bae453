package zx

import (
	"fmt"
	"math"
	"slices"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// Verdict is what Check concluded.
type Verdict int

const (
	// Undecided: the diagram did not reduce far enough; Result.Reason says how far it got.
	Undecided Verdict = iota
	// Equivalent: proved, within Result.Bound; see the package documentation.
	Equivalent
	// Different: the distance computed from the remainder exceeds its uncertainty.
	Different
)

func (v Verdict) String() string {
	switch v {
	case Equivalent:
		return "equivalent"
	case Different:
		return "different"
	}
	return "undecided"
}

// Options tune Check. The zero value is useful.
type Options struct {
	// Tol is how far, in radians, a phase may be from a multiple of π/4 and still be treated as
	// that multiple; each such step adds what it dropped to the bound. Zero means DefaultTol.
	Tol float64
	// MaxSupport is the largest number of wires on which a remainder's matrix is computed to give
	// the exact distance. Zero means 10.
	MaxSupport int
	// Budget caps the rewriting, counted in edge operations per vertex of the initial diagram.
	// Zero means 200.
	Budget int
}

// DefaultTol is the default phase tolerance: far above the rounding of angles that compilers
// write as floating-point multiples of π, far below any angle a pass changes on purpose.
const DefaultTol = 1e-12

// Result is the answer of Check about D = min over φ of ‖U − e^{iφ}V‖, the operator-norm distance
// with the global phase taken out.
type Result struct {
	Verdict Verdict
	// Bound is the proved uncertainty: for Equivalent, D ≤ Bound; for Different, |D − Distance|
	// ≤ Bound plus the rounding of 2^k-dimensional matrix computations (roundingAllowance, 1e-12,
	// for k ≤ 10), so that D ≥ Lower().
	Bound float64
	// Distance is D computed from the remainder's matrix, when Known.
	Distance float64
	Known    bool
	// Support lists the wires on which V†U does not reduce to a plain wire, when it was found.
	Support []int
	// Spiders is the number of spiders left in the simplified diagram (scalar parts included).
	Spiders int
	// Cut is the number of ops of U (of U's window, from Compare) moved to the end of the product
	// when V†U itself did not reduce (see Check); Support is then in the frame of
	// U[:Cut]·V†·U[Cut:], which has the spectrum of V†U.
	Cut int
	// Reason says why the verdict is Undecided.
	Reason string
}

// Check simplifies the ZX-diagram of V†U. If it becomes plain wires, each input joined to the
// output of its own wire, U and V are proved equal up to a global phase within Result.Bound. If the
// wires that remain are at most MaxSupport, the remainder's matrix gives the distance. Otherwise the
// answer is Undecided. It fails for ill-formed circuits, different widths, non-unitary ops and
// custom gates.
func Check(u, v *circuit.Circuit, opts Options) (Result, error) {
	if u == nil || v == nil {
		return Result{}, fmt.Errorf("zx: nil circuit")
	}
	if err := u.Validate(); err != nil {
		return Result{}, fmt.Errorf("zx: first circuit: %w", err)
	}
	if err := v.Validate(); err != nil {
		return Result{}, fmt.Errorf("zx: second circuit: %w", err)
	}
	if u.Qubits() != v.Qubits() {
		return Result{}, fmt.Errorf("zx: circuits of %d and %d qubits", u.Qubits(), v.Qubits())
	}
	if opts.Tol == 0 {
		opts.Tol = DefaultTol
	}
	if opts.MaxSupport == 0 {
		opts.MaxSupport = 10
	}
	if opts.Budget == 0 {
		opts.Budget = 200
	}
	r, from, err := check(u, v, 0, opts)
	if err != nil || r.Verdict != Undecided || len(from) == 0 {
		return r, err
	}
	// V†U did not reduce. If the circuits differ by a local change at op i of U, the diagram of V†U
	// keeps U's ops before i (and V's), conjugating the change; the latest op of U still present,
	// hi, is about i. Cutting U there puts both halves of each circuit next to their partner, and
	// U[:cut]·V†·U[cut:] has the spectrum, hence the distance, of V†U. Fusion can carry later ops'
	// marks into the remainder, so a few cuts at quantiles of the ops still present follow.
	hi := from[len(from)-1]
	tried := map[int]bool{}
	for _, cut := range []int{hi, hi + 1, from[len(from)/2], from[len(from)/4], from[3*len(from)/4], from[len(from)/10]} {
		if cut <= 0 || cut > len(u.Ops) || tried[cut] {
			continue
		}
		tried[cut] = true
		rc, _, err := check(u, v, cut, opts)
		if err != nil {
			return r, err
		}
		if rc.Verdict != Undecided {
			rc.Cut = cut
			return rc, nil
		}
	}
	return r, nil
}

// check simplifies the diagram of U[:cut]·V†·U[cut:] and returns the verdict and, sorted, the
// latest op of U that each spider still joined to the wires came from.
func check(u, v *circuit.Circuit, cut int, opts Options) (Result, []int, error) {
	g, err := miter(u, v, cut, opts.Tol)
	if err != nil {
		return Result{}, nil, err
	}
	done := g.simplify(opts.Budget * (len(g.v) + 1))
	r := Result{Bound: g.bound()}
	var hi []int
	for _, x := range g.alive() {
		if g.isSpider(x) {
			r.Spiders++
		}
	}
	for q := range g.in {
		if t, ok := g.v[g.in[q]].nbr[g.out[q]]; !ok || t != plain {
			r.Support = append(r.Support, q)
		}
	}
	if len(r.Support) == 0 {
		r.Verdict = Equivalent
		return r, hi, nil
	}
	hi = g.origins(r.Support)
	groups := g.components(r.Support)
	var spectra [][]float64
	for _, wires := range groups {
		if len(wires) > opts.MaxSupport {
			r.Reason = fmt.Sprintf("V†U reduced to %d spiders on %d wires, in a part joining %d wires, more than %d", r.Spiders, len(r.Support), len(wires), opts.MaxSupport)
			if !done {
				r.Reason += " (rewriting budget exhausted)"
			}
			return r, hi, nil
		}
		m, ok := g.matrix(wires)
		if !ok {
			r.Reason = fmt.Sprintf("the part of the remainder on %d wires is too large to contract", len(wires))
			return r, hi, nil
		}
		w, ok := unitaryFromScaled(m, len(wires))
		if !ok {
			r.Reason = "the remainder's matrix is not a multiple of a unitary to 1e-9; the contraction lost accuracy"
			return r, hi, nil
		}
		spectra = append(spectra, metric.Eigenphases(w))
	}
	d, ok := metric.TensorPhaseDistance(spectra...)
	if !ok {
		r.Reason = fmt.Sprintf("the remainder is a product of %d parts whose spectra combine into too many eigenphases", len(groups))
		return r, hi, nil
	}
	r.Distance, r.Known = d, true
	r.decide()
	return r, hi, nil
}

// decide sets the verdict from a known distance: different when it exceeds its uncertainty;
// otherwise equivalent, with Bound widened to cover the distance found.
func (r *Result) decide() {
	if r.Distance > r.Bound+roundingAllowance {
		r.Verdict = Different
		return
	}
	r.Verdict = Equivalent
	r.Bound += r.Distance + roundingAllowance
}

// Lower returns the certified lower bound on D: Distance less its uncertainty, or 0 when the
// distance is not known.
func (r Result) Lower() float64 {
	if !r.Known {
		return 0
	}
	return max(0, r.Distance-r.Bound-roundingAllowance)
}

// Upper returns the proved upper bound on D: Bound for Equivalent, Distance plus its uncertainty
// when the distance is known, and +Inf otherwise.
func (r Result) Upper() float64 {
	switch {
	case r.Verdict == Equivalent:
		return r.Bound
	case r.Known:
		return r.Distance + r.Bound + roundingAllowance
	}
	return math.Inf(1)
}

// components splits the wires by the connected parts of the remainder that join them. If
// V†U = c·(W_1 ⊗ … ⊗ W_m) on those parts, the eigenphases of V†U are, up to the global phase,
// the sums of one eigenphase of each W_j.
func (g *graph) components(wires []int) [][]int {
	// The two ends of a wire count as joined, so that a part that takes the input of one wire to
	// the output of another (a permutation) lands in one group with both wires; each group then
	// maps its wires' inputs to the same wires' outputs.
	end := map[int]int{}
	for _, q := range wires {
		end[g.in[q]], end[g.out[q]] = g.out[q], g.in[q]
	}
	seen, assigned := map[int]bool{}, map[int]bool{}
	var out [][]int
	for _, q := range wires {
		if seen[g.in[q]] {
			continue
		}
		var group []int
		g.reach([]int{g.in[q]}, end, seen)
		for _, p := range wires {
			if seen[g.in[p]] && !assigned[p] {
				assigned[p] = true
				group = append(group, p)
			}
		}
		out = append(out, group)
	}
	return out
}

// origins returns, sorted, the from marks (≥ 0) of the spiders joined to the given wires.
func (g *graph) origins(wires []int) []int {
	var starts, out []int
	for _, q := range wires {
		starts = append(starts, g.in[q], g.out[q])
	}
	seen := map[int]bool{}
	g.reach(starts, nil, seen)
	for x := range seen {
		if g.isSpider(x) && g.v[x].from >= 0 {
			out = append(out, g.v[x].from)
		}
	}
	slices.Sort(out)
	return out
}

// reach adds to seen every vertex joined to starts by edges of the graph or by the extra links
// also (a map from a vertex to one more it counts as joined to).
func (g *graph) reach(starts []int, also map[int]int, seen map[int]bool) {
	stack := append([]int(nil), starts...)
	for len(stack) > 0 {
		x := stack[len(stack)-1]
		stack = stack[:len(stack)-1]
		if seen[x] {
			continue
		}
		seen[x] = true
		if o, ok := also[x]; ok {
			stack = append(stack, o)
		}
		for w := range g.v[x].nbr {
			stack = append(stack, w)
		}
	}
}

// bound is the proved bound on the distance the rewriting may have hidden: half the residuals
// dropped and half the rounding slack (package documentation).
func (g *graph) bound() float64 { return (g.snapped + g.slack) / 2 }

// unitaryFromScaled scales m, which is c·W for an unknown c ≠ 0 and unitary W, to W. It reports
// false when m is not close to a multiple of a unitary.
func unitaryFromScaled(m []complex128, k int) (*mat.CDense, bool) {
	n := 1 << k
	var fro float64
	for _, x := range m {
		fro += real(x)*real(x) + imag(x)*imag(x)
	}
	if fro == 0 {
		return nil, false
	}
	s := complex(math.Sqrt(float64(n)/fro), 0)
	for i := range m {
		m[i] *= s
	}
	// W is unitary by construction (the diagram is c·V†U on these wires); its columns having unit
	// norm is a cheap check that the contraction kept its accuracy.
	for j := range n {
		var c float64
		for i := range n {
			c += real(m[i*n+j])*real(m[i*n+j]) + imag(m[i*n+j])*imag(m[i*n+j])
		}
		if math.Abs(c-1) > 1e-9 {
			return nil, false
		}
	}
	return mat.NewCDense(n, n, m), true
}
