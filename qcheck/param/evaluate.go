package param

import (
	"math"
	"math/cmplx"
	"slices"

	"gonum.org/v1/gonum/mat"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// side is one circuit of a pair, ready to be bound many times: a bound copy whose angles are
// overwritten in place, and for each angle its coefficients over the pair's parameters.
type side struct {
	c     *circuit.Circuit
	forms []form
}

// form is one angle of one op: Σ_k coef[k]·θ_k + shift.
type form struct {
	op, k int
	coef  []float64
	shift float64
}

func newSide(c *Circuit, names []string) side {
	s := side{c: circuit.New(c.qubits)}
	s.c.Ops = make([]circuit.Op, len(c.Ops))
	for i, op := range c.Ops {
		g := op.Gate.Clone()
		if len(op.Angles) > 0 {
			g.Params = make([]float64, len(op.Angles))
		}
		s.c.Ops[i] = circuit.Op{Gate: g, Qubits: op.Qubits}
		for k, a := range op.Angles {
			f := form{op: i, k: k, coef: make([]float64, len(names)), shift: a.shift}
			for n, name := range names {
				f.coef[n], _ = a.Coef(name).Float64()
			}
			s.forms = append(s.forms, f)
		}
	}
	return s
}

// bind sets the angles for the parameter values theta (in the order of the pair's names) and
// returns the sum of their magnitudes, which the rounding allowance uses.
func (s side) bind(theta []float64) float64 {
	total := 0.0
	for _, f := range s.forms {
		v := f.shift
		for n, c := range f.coef {
			v += c * theta[n]
		}
		s.c.Ops[f.op].Gate.Params[f.k] = v
		total += math.Abs(v)
	}
	return total
}

// pair is two parametric circuits prepared for evaluation at many parameter values.
type pair struct {
	left, right *Circuit
	names       []string
	degrees     []Degree
	l, r        side
	exact       bool
	dim         int
	gates       int
	m           []complex128 // V†U at the last point
}

func newPair(left, right *Circuit, exact bool) (*pair, error) {
	names := mergeNames(left.Params(), right.Params())
	deg, err := degrees(names, left, right)
	if err != nil {
		return nil, err
	}
	dim := 1 << left.qubits
	return &pair{left: left, right: right, names: names, degrees: deg,
		l: newSide(left, names), r: newSide(right, names), exact: exact, dim: dim,
		gates: left.Len() + right.Len(), m: make([]complex128, dim*dim)}, nil
}

// residual evaluates V(θ)†U(θ) with the dense engine and returns the largest absolute value of
// the conditions at θ (off-diagonal entries and M_ii − M_00, or the entries of M − I when the
// phase counts), together with the rounding allowance η for that evaluation (package doc).
func (p *pair) residual(theta []float64) (res, eta float64, err error) {
	size := p.l.bind(theta) + p.r.bind(theta)
	u, v, err := unitaries(p.l.c, p.r.c)
	if err != nil {
		return 0, 0, err
	}
	ud, vd, n := u.RawCMatrix().Data, v.RawCMatrix().Data, p.dim
	for i := range n {
		for j := range n {
			var s complex128
			for k := range n {
				s += cmplx.Conj(vd[k*n+i]) * ud[k*n+j]
			}
			p.m[i*n+j] = s
		}
	}
	ref := complex(1, 0)
	if !p.exact {
		ref = p.m[0]
	}
	for i := range n {
		for j := range n {
			e := p.m[i*n+j]
			if i == j {
				e -= ref
			}
			res = math.Max(res, cmplx.Abs(e))
		}
	}
	return res, roundingAllowance(p.gates, n, size), nil
}

// roundingAllowance is η, the allowance for rounding in one evaluation of a condition, derived
// in the package documentation.
func roundingAllowance(gates, dim int, angles float64) float64 {
	return 0x1p-52 * (8*float64(gates+dim) + 2*angles)
}

// distance binds the pair at theta and returns the distance of its sides from the dense engine,
// as distanceAt does.
func (p *pair) distance(theta []float64) (float64, error) {
	p.l.bind(theta)
	p.r.bind(theta)
	return denseDistance(p.l.c, p.r.c, p.exact)
}

// distanceAt binds both circuits at the values and returns their distance from the dense engine.
func distanceAt(left, right *Circuit, values Values, exact bool) (float64, error) {
	lc, err := left.Bind(values)
	if err != nil {
		return 0, err
	}
	rc, err := right.Bind(values)
	if err != nil {
		return 0, err
	}
	return denseDistance(lc, rc, exact)
}

// denseDistance returns metric.PhaseDistance of the dense unitaries of two circuits, or
// metric.Distance when the phase counts.
func denseDistance(left, right *circuit.Circuit, exact bool) (float64, error) {
	u, v, err := unitaries(left, right)
	if err != nil {
		return 0, err
	}
	if exact {
		return metric.Distance(u, v), nil
	}
	return metric.PhaseDistance(u, v), nil
}

// unitaries returns the dense unitaries of two circuits.
func unitaries(left, right *circuit.Circuit) (u, v *mat.CDense, err error) {
	if u, err = sim.Unitary(left); err != nil {
		return nil, nil, err
	}
	if v, err = sim.Unitary(right); err != nil {
		return nil, nil, err
	}
	return u, v, nil
}

// mergeNames returns the sorted union of two lists of names.
func mergeNames(a, b []string) []string {
	out := append(slices.Clone(a), b...)
	slices.Sort(out)
	return slices.Compact(out)
}
