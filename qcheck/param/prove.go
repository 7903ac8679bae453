package param

import (
	"fmt"
	"math"
	"math/big"
	"math/rand/v2"
	"slices"
	"strings"
)

// DefaultTolerance is the tolerance used when Options.Tolerance is 0; it is the default of package
// qcheck too.
const DefaultTolerance = 1e-9

// DefaultMaxPoints is the largest grid Prove evaluates when Options.MaxPoints is 0; beyond it
// Prove uses the randomized test.
const DefaultMaxPoints = 1 << 16

// MaxQubits is the widest pair Prove accepts: each evaluation builds two dense unitaries.
const MaxQubits = 10

// randomPoints is the number of points of the randomized test, and randomLevels the number of
// equally spaced values each parameter's t is drawn from.
const (
	randomPoints = 16
	randomLevels = 1 << 32
)

// Options configure Prove. The zero value compares up to global phase with DefaultTolerance.
type Options struct {
	// ExactPhase makes a global phase count as a difference: the distance is ‖U − V‖ instead of
	// min over φ of ‖U − e^{iφ}V‖.
	ExactPhase bool
	// Tolerance is the largest distance, for every value of the parameters, at which the pair is
	// still proved equivalent; 0 means DefaultTolerance.
	Tolerance float64
	// MaxPoints is the largest grid Prove evaluates; 0 means DefaultMaxPoints.
	MaxPoints int
	// Seed seeds the randomized test and nothing else.
	Seed uint64
}

// Verdict is what Prove concluded.
type Verdict int

const (
	// Undecided: no point was found where the pair differs by more than the tolerance, but the
	// certified bound is above it.
	Undecided Verdict = iota
	// Proved: for every value of every parameter the distance is at most Result.Bound, which is at
	// most the tolerance (the grid method).
	Proved
	// Probable: the randomized test passed; Result.ErrorProbability bounds the chance that a pair
	// that differs passes it (see the package documentation for what that covers).
	Probable
	// Refuted: Result.Failure holds values at which the distance exceeds the tolerance.
	Refuted
)

func (v Verdict) String() string {
	switch v {
	case Proved:
		return "proved"
	case Probable:
		return "probable"
	case Refuted:
		return "refuted"
	}
	return "undecided"
}

// Method is how the pair was evaluated.
type Method int

const (
	// Grid evaluates the pair on the tensor grid of 2D_k+1 points per parameter; its verdicts
	// are certified.
	Grid Method = iota
	// Random evaluates the pair at random points; its passing verdict is probabilistic.
	Random
)

func (m Method) String() string {
	if m == Random {
		return "random"
	}
	return "grid"
}

// Result is what Prove found and what it certifies.
type Result struct {
	Verdict    Verdict
	Method     Method
	ExactPhase bool
	Tolerance  float64
	// Degrees describes each parameter, sorted by name.
	Degrees []Degree
	// Points is the number of parameter values at which the pair was evaluated for the verdict.
	Points int
	// Residual is the largest computed value of the conditions (package doc) at those points.
	Residual float64
	// Lebesgue is the product over parameters of the bounds on the Lebesgue constants: how much
	// a trigonometric polynomial of the stated degrees can exceed its largest value on the grid.
	Lebesgue float64
	// Bound, for the grid method, is certified: for every value of the parameters the distance
	// (PhaseDistance, or ‖U − V‖ with ExactPhase) is at most Bound. It is +Inf for the random
	// method, which certifies no bound.
	Bound float64
	// ErrorProbability, for the random method, bounds the probability that a pair whose
	// conditions are not identically zero vanishes at every random point; 0 for the grid method.
	ErrorProbability float64
	// Failure holds the counterexample when the verdict is Refuted, and the worst distance found
	// when it is Refuted or Undecided.
	Failure *Failure
}

// Prove decides whether left and right, two parametric circuits of the same width, are equal for
// every value of their parameters, up to global phase (which may depend on the parameters) or
// exactly with Options.ExactPhase. The package documentation derives what each verdict
// certifies. It fails for ill-formed circuits, different widths, more than MaxQubits qubits, or
// a bad option.
func Prove(left, right *Circuit, opts Options) (*Result, error) {
	if err := left.Validate(); err != nil {
		return nil, fmt.Errorf("left: %w", err)
	}
	if err := right.Validate(); err != nil {
		return nil, fmt.Errorf("right: %w", err)
	}
	if left.qubits != right.qubits {
		return nil, fmt.Errorf("param: left has %d qubit(s) and right %d", left.qubits, right.qubits)
	}
	if left.qubits > MaxQubits {
		return nil, fmt.Errorf("param: %d qubits is above the limit of %d for Prove", left.qubits, MaxQubits)
	}
	tol := opts.Tolerance
	if tol == 0 {
		tol = DefaultTolerance
	}
	if !(tol > 0) || math.IsInf(tol, 0) {
		return nil, fmt.Errorf("param: tolerance %v must be positive and finite", opts.Tolerance)
	}
	maxPoints := opts.MaxPoints
	if maxPoints == 0 {
		maxPoints = DefaultMaxPoints
	}
	if maxPoints < 0 {
		return nil, fmt.Errorf("param: MaxPoints %d is negative", opts.MaxPoints)
	}
	p, err := newPair(left, right, opts.ExactPhase)
	if err != nil {
		return nil, err
	}
	res := &Result{ExactPhase: opts.ExactPhase, Tolerance: tol, Degrees: p.degrees, Lebesgue: 1}
	for _, d := range p.degrees {
		res.Lebesgue *= lebesgue(d.Degree)
	}
	pts := p.points(maxPoints, opts.Seed)
	if pts.random {
		res.Method = Random
	}
	res.Points = pts.count()
	worst := 0.0 // of residual + η
	for pt := range pts.all() {
		r, eta, err := p.residual(pt.theta)
		if err != nil {
			return nil, err
		}
		res.Residual = math.Max(res.Residual, r)
		worst = math.Max(worst, r+eta)
	}
	factor := float64(p.dim)
	if !opts.ExactPhase {
		factor *= 2
	}
	if res.Method == Grid {
		res.Bound = factor * res.Lebesgue * worst
		if res.Bound <= tol {
			res.Verdict = Proved
			return res, nil
		}
	} else {
		res.Bound = math.Inf(1)
		res.ErrorProbability = errorProbability(p.degrees)
		if factor*res.Residual <= tol {
			res.Verdict = Probable
			return res, nil
		}
	}
	f, err := refute(p, tol, maxPoints, opts.Seed)
	if err != nil {
		return nil, err
	}
	res.Failure = f
	if f.At != nil && f.Distance > tol {
		res.Verdict = Refuted
	} else {
		f.At, f.Pi, f.Needs = nil, nil, nil
	}
	return res, nil
}

// errorProbability is (d/s)^K with d = Σ 2D_k the total degree of z^D·f, s the number of levels
// and K the number of random points (Schwartz–Zippel, package doc).
func errorProbability(deg []Degree) float64 {
	d := 0.0
	for _, x := range deg {
		d += 2 * float64(x.Degree)
	}
	return math.Min(1, math.Pow(d/randomLevels, randomPoints))
}

// String says what was proved, refuted or left open, with the figures that support it.
func (r *Result) String() string {
	var b strings.Builder
	what := "up to a global phase that may depend on the parameters"
	measure := "phase distance min_φ ‖U − e^{iφ}V‖"
	if r.ExactPhase {
		what, measure = "exactly, global phase included", "distance ‖U − V‖"
	}
	names := make([]string, len(r.Degrees))
	degs := make([]string, len(r.Degrees))
	for i, d := range r.Degrees {
		names[i] = d.Name
		degs[i] = fmt.Sprintf("%s = %d·t (degree %d, %d points)", d.Name, d.Scale, d.Degree, d.Points())
	}
	params := "no parameters"
	if len(names) > 0 {
		params = "every value of " + strings.Join(names, ", ")
	}
	switch r.Verdict {
	case Proved:
		fmt.Fprintf(&b, "proved for %s, %s: at the %d grid points the conditions are within %.3g; ", params, what, r.Points, r.Residual)
		fmt.Fprintf(&b, "by trigonometric interpolation (%s; Lebesgue bound %.4g) the %s is at most %.3g ≤ tolerance %g for every value",
			strings.Join(degs, ", "), r.Lebesgue, measure, r.Bound, r.Tolerance)
	case Probable:
		fmt.Fprintf(&b, "probably equal for %s, %s (randomized test, not a proof): at %d random points the conditions are within %.3g; ", params, what, r.Points, r.Residual)
		fmt.Fprintf(&b, "a pair whose conditions are not identically zero vanishes at all of them with probability at most %.3g (%s)",
			r.ErrorProbability, strings.Join(degs, ", "))
	case Refuted:
		fmt.Fprintf(&b, "refuted (%s): %s", what, r.Failure)
	default:
		fmt.Fprintf(&b, "undecided (%s): the certified bound %.3g is above the tolerance %g, and no value was found where the %s exceeds it; %s",
			what, r.Bound, r.Tolerance, measure, r.Failure.worstString())
	}
	return b.String()
}

// point is one assignment of the pair's parameters: theta in radians, and its exact value as a
// multiple of π, num[k]/den[k] (den nil when not known).
type point struct {
	theta    []float64
	num, den []int64
}

// clone returns a copy of the point that later yields do not change.
func (pt point) clone() point {
	return point{theta: slices.Clone(pt.theta), num: slices.Clone(pt.num), den: slices.Clone(pt.den)}
}

// pi returns parameter k's value as a multiple of π.
func (pt point) pi(k int) *big.Rat { return big.NewRat(pt.num[k], pt.den[k]) }

// values returns the point as Values.
func (pt point) values(names []string) Values {
	v := make(Values, len(names))
	for i, n := range names {
		v[n] = pt.theta[i]
	}
	return v
}

// pointSet is the grid of a pair, or its random points when the grid is too large.
type pointSet struct {
	deg    []Degree
	random bool
	draws  [][]uint64 // random: one t index per parameter for each point
}

// points returns the grid when it has at most maxPoints points, otherwise randomPoints random
// points drawn with the seed.
func (p *pair) points(maxPoints int, seed uint64) pointSet {
	s := pointSet{deg: p.degrees}
	size := 1
	for _, d := range p.degrees {
		if size > maxPoints/d.Points() {
			s.random = true
			break
		}
		size *= d.Points()
	}
	if s.random {
		rng := rand.New(rand.NewPCG(seed, 0x9e3779b97f4a7c15))
		for range randomPoints {
			row := make([]uint64, len(p.degrees))
			for k := range row {
				row[k] = rng.Uint64() % randomLevels
			}
			s.draws = append(s.draws, row)
		}
	}
	return s
}

func (s pointSet) count() int {
	if s.random {
		return len(s.draws)
	}
	n := 1
	for _, d := range s.deg {
		n *= d.Points()
	}
	return n
}

// all yields every point; the point's slices are reused between yields.
func (s pointSet) all() func(func(point) bool) {
	return func(yield func(point) bool) {
		n := len(s.deg)
		pt := point{theta: make([]float64, n), num: make([]int64, n), den: make([]int64, n)}
		set := func(k int, j, levels int64) {
			// θ = 2π·L·j/levels, exactly π·(2·L·j/levels).
			pt.num[k], pt.den[k] = 2*s.deg[k].Scale*j, levels
			pt.theta[k] = math.Pi * (float64(pt.num[k]) / float64(levels))
		}
		if s.random {
			for _, row := range s.draws {
				for k, j := range row {
					// 2·L·j stays below 2^21·2^32, far inside int64.
					set(k, int64(j), randomLevels)
				}
				if !yield(pt) {
					return
				}
			}
			return
		}
		idx := make([]int, n)
		for {
			for k := range n {
				set(k, int64(idx[k]), int64(s.deg[k].Points()))
			}
			if !yield(pt) {
				return
			}
			k := 0
			for k < n {
				idx[k]++
				if idx[k] < s.deg[k].Points() {
					break
				}
				idx[k] = 0
				k++
			}
			if k == n {
				return
			}
		}
	}
}
