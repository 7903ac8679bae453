package param

import (
	"fmt"
	"math"
	"math/big"
	"slices"
	"strings"
)

// Failure describes where a pair differs: a counterexample and the worst distance found.
type Failure struct {
	// At is the counterexample: a value for every parameter, at which the distance exceeds the
	// tolerance. It is set only when the verdict is Refuted.
	At Values
	// Pi gives each value of At exactly as a multiple of π, when it is one (values from the grid,
	// the random points and the special values of shrinking are).
	Pi map[string]*big.Rat
	// Distance is the distance at At, computed by the dense engine on the bound circuits:
	// metric.PhaseDistance, or metric.Distance with ExactPhase.
	Distance float64
	// Needs lists the parameters that shrinking could not fix to a special value (0, π, π/2,
	// −π/2, 2π) while the pair still failed; the other parameters of At hold special values.
	Needs []string
	// Worst is the largest distance found over one period of every parameter, at WorstAt;
	// Search says how it was searched. It is a value found, not a bound: Result.Bound is the
	// certified upper bound.
	Worst   float64
	WorstAt Values
	Search  string
}

// specialValues are the multiples of π shrinking tries for a parameter, simplest first.
var specialValues = []*big.Rat{big.NewRat(0, 1), big.NewRat(1, 1), big.NewRat(1, 2), big.NewRat(-1, 2), big.NewRat(2, 1)}

// Golden-section refinement of the worst point: sweeps over all parameters, steps per parameter.
const (
	refineSweeps = 2
	refineSteps  = 30
)

// refute searches the pair for its worst distance and, when that exceeds tol, a counterexample
// with as few free parameters as shrinking can leave.
func refute(p *pair, tol float64, maxPoints int, seed uint64) (*Failure, error) {
	best, err := worstOn(p.left, p.right, p.exact, maxPoints, seed, math.Inf(1))
	if err != nil {
		return nil, err
	}
	f := &Failure{Worst: best.dist, WorstAt: best.pt.values(best.names)}
	how := fmt.Sprintf("the %d points of the grid", best.points)
	if best.random {
		how = fmt.Sprintf("%d random points", best.points)
	}
	theta := slices.Clone(best.pt.theta)
	refined := best.dist
	for range refineSweeps {
		for k, d := range p.degrees {
			h := d.Period() / float64(d.Points())
			x, v, err := goldenMax(func(x float64) (float64, error) {
				old := theta[k]
				theta[k] = x
				v, err := p.distance(theta)
				theta[k] = old
				return v, err
			}, theta[k]-h, theta[k]+h)
			if err != nil {
				return nil, err
			}
			if v > refined {
				refined, theta[k] = v, x
			}
		}
	}
	if refined > f.Worst {
		f.Worst, f.WorstAt = refined, point{theta: theta}.values(p.names)
	}
	f.Search = fmt.Sprintf("the dense engine at %s over one period [0, 2π·L) of each parameter, then %d sweeps of golden-section search along each parameter within one grid step of the worst point",
		how, refineSweeps)
	switch {
	case best.dist > tol:
		at, pi, needs, err := shrink(p, tol, maxPoints, seed)
		if err != nil {
			return nil, err
		}
		f.At, f.Pi, f.Needs = at, pi, needs
	case f.Worst > tol:
		f.At, f.Needs = f.WorstAt, slices.Clone(p.names)
	default:
		return f, nil
	}
	d, err := distanceAt(p.left, p.right, f.At, p.exact)
	if err != nil {
		return nil, err
	}
	f.Distance = d
	if d > f.Worst {
		f.Worst, f.WorstAt = d, f.At
	}
	return f, nil
}

// worst is the point of largest distance among the points of a pair.
type worst struct {
	names  []string
	pt     point
	dist   float64
	points int
	random bool
}

// worstOn evaluates the distance of left and right at every point of their grid (or at random
// points when the grid has more than maxPoints) and returns the worst, or the first above stop.
func worstOn(left, right *Circuit, exact bool, maxPoints int, seed uint64, stop float64) (worst, error) {
	p, err := newPair(left, right, exact)
	if err != nil {
		return worst{}, err
	}
	pts := p.points(maxPoints, seed)
	w := worst{names: p.names, dist: -1, points: pts.count(), random: pts.random}
	for pt := range pts.all() {
		d, err := p.distance(pt.theta)
		if err != nil {
			return worst{}, err
		}
		if d > w.dist {
			w.dist = d
			w.pt = pt.clone()
		}
		if d > stop {
			break
		}
	}
	return w, nil
}

// shrink fixes parameters one at a time, in name order, to the first special value at which the
// pair still fails somewhere on the grid of the remaining parameters, and returns the worst
// point of what is left together with the fixed values.
func shrink(p *pair, tol float64, maxPoints int, seed uint64) (Values, map[string]*big.Rat, []string, error) {
	left, right := p.left, p.right
	fixed := map[string]*big.Rat{}
	for _, name := range p.names {
		for _, s := range specialValues {
			f, _ := s.Float64()
			l, r := left.Substitute(name, f*math.Pi), right.Substitute(name, f*math.Pi)
			w, err := worstOn(l, r, p.exact, maxPoints, seed, tol)
			if err != nil {
				return nil, nil, nil, err
			}
			if w.dist > tol {
				left, right, fixed[name] = l, r, s
				break
			}
		}
	}
	w, err := worstOn(left, right, p.exact, maxPoints, seed, math.Inf(1))
	if err != nil {
		return nil, nil, nil, err
	}
	at, pi := Values{}, map[string]*big.Rat{}
	for name, s := range fixed {
		f, _ := s.Float64()
		at[name], pi[name] = f*math.Pi, s
	}
	for i, name := range w.names {
		at[name], pi[name] = w.pt.theta[i], w.pt.pi(i)
	}
	return at, pi, w.names, nil
}

// goldenMax searches [a, b] for a maximum of f by golden-section search and returns the best
// point it evaluated and its value.
func goldenMax(f func(float64) (float64, error), a, b float64) (float64, float64, error) {
	g := (math.Sqrt(5) - 1) / 2
	x1, x2 := b-g*(b-a), a+g*(b-a)
	f1, err := f(x1)
	if err != nil {
		return 0, 0, err
	}
	f2, err := f(x2)
	if err != nil {
		return 0, 0, err
	}
	for range refineSteps {
		if f1 >= f2 {
			b, x2, f2 = x2, x1, f1
			x1 = b - g*(b-a)
			if f1, err = f(x1); err != nil {
				return 0, 0, err
			}
		} else {
			a, x1, f1 = x1, x2, f2
			x2 = a + g*(b-a)
			if f2, err = f(x2); err != nil {
				return 0, 0, err
			}
		}
	}
	if f1 >= f2 {
		return x1, f1, nil
	}
	return x2, f2, nil
}

// String gives the counterexample, its distance, the parameters it needs and the worst distance
// found.
func (f *Failure) String() string {
	if f == nil {
		return "no failure"
	}
	var b strings.Builder
	if f.At != nil {
		fmt.Fprintf(&b, "at %s the distance is %.6g (dense engine); ", f.valuesString(f.At, f.Pi), f.Distance)
		if len(f.Needs) == 0 {
			b.WriteString("it fails with every parameter fixed to a special value; ")
		} else {
			fmt.Fprintf(&b, "it needs %s to vary (the other parameters are fixed to special values); ", strings.Join(f.Needs, ", "))
		}
	}
	b.WriteString(f.worstString())
	return b.String()
}

func (f *Failure) worstString() string {
	if f == nil {
		return ""
	}
	return fmt.Sprintf("worst distance found %.6g at %s, searched by %s", f.Worst, f.valuesString(f.WorstAt, nil), f.Search)
}

// valuesString writes values in name order, as multiples of π where known exactly.
func (f *Failure) valuesString(v Values, pi map[string]*big.Rat) string {
	names := make([]string, 0, len(v))
	for n := range v {
		names = append(names, n)
	}
	slices.Sort(names)
	if len(names) == 0 {
		return "(no parameters)"
	}
	parts := make([]string, len(names))
	for i, n := range names {
		if r, ok := pi[n]; ok {
			parts[i] = n + " = " + piString(r)
		} else {
			parts[i] = fmt.Sprintf("%s = %.17g", n, v[n])
		}
	}
	return strings.Join(parts, ", ")
}

// piString writes r·π as "0", "π", "-π/2", "12π/7".
func piString(r *big.Rat) string {
	if r.Sign() == 0 {
		return "0"
	}
	num := new(big.Int).Set(r.Num())
	s := ""
	if num.Sign() < 0 {
		s = "-"
		num.Abs(num)
	}
	if num.Cmp(big.NewInt(1)) != 0 {
		s += num.String()
	}
	s += "π"
	if !r.IsInt() {
		s += "/" + r.Denom().String()
	}
	return s
}
