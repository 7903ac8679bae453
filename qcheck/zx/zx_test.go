package zx

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

func dense(t testing.TB, c *circuit.Circuit) *mat.CDense {
	t.Helper()
	u, err := sim.Unitary(c)
	if err != nil {
		t.Fatal(err)
	}
	return u
}

// diagramMatrix returns the matrix of a circuit's own diagram, unsimplified, scaled to unit
// column norm.
func diagramMatrix(t *testing.T, c *circuit.Circuit) *mat.CDense {
	t.Helper()
	b := newBuilder(c.Qubits(), DefaultTol)
	for i, op := range c.Ops {
		if err := b.op(i, op); err != nil {
			t.Fatal(err)
		}
	}
	g := b.finish()
	wires := make([]int, c.Qubits())
	for q := range wires {
		wires[q] = q
	}
	m, ok := g.matrix(wires)
	if !ok {
		t.Fatal("contraction too large")
	}
	n := 1 << c.Qubits()
	var fro float64
	for _, x := range m {
		fro += real(x)*real(x) + imag(x)*imag(x)
	}
	s := complex(math.Sqrt(float64(n)/fro), 0)
	for i := range m {
		m[i] *= s
	}
	return mat.NewCDense(n, n, m)
}

// Every gate of the standard library, laid into a diagram, has the gate's textbook matrix up to
// a global phase (the library's matrices cite Nielsen & Chuang §4.2–4.3).
func TestGateDiagrams(t *testing.T) {
	rng := rand.New(rand.NewPCG(1, 2))
	for _, s := range circuit.Standard() {
		if s.Name == "barrier" || s.Name == "measure" || s.Name == "reset" {
			continue
		}
		for range 3 {
			p := make([]float64, s.Params)
			for i := range p {
				p[i] = rng.Float64()*7 - 3.5
			}
			c := circuit.New(3)
			q := rng.Perm(3)[:s.Qubits]
			c.Append(gate(s.Name, p...), q...)
			if d := metric.PhaseDistance(diagramMatrix(t, c), dense(t, c)); d > 1e-12 {
				t.Errorf("%s: diagram differs from the gate's matrix by %g", c.Ops[0], d)
			}
		}
	}
}

// The generators' rewrites keep the meaning: checked with the dense engine.
func TestRewritesKeepMeaning(t *testing.T) {
	rng := rand.New(rand.NewPCG(3, 4))
	for _, c := range []*circuit.Circuit{qft(5), adder(2), volume(5, 3, rng)} {
		for name, r := range map[string]*circuit.Circuit{
			"translate": translate(c),
			"reorder":   reorder(c, 200, rng),
			"route":     route(c, rng),
		} {
			if d := metric.PhaseDistance(dense(t, c), dense(t, r)); d > 1e-12 {
				t.Errorf("%s changed the meaning by %g", name, d)
			}
		}
	}
}

// The QFT generator against the textbook matrix F_{yx} = e^{2πixy/N}/√N (Nielsen & Chuang §5.1,
// eq. 5.1), up to 10 qubits.
func TestQFTMatrix(t *testing.T) {
	top := 10
	if testing.Short() {
		top = 8
	}
	for n := 1; n <= top; n++ {
		N := 1 << n
		f := mat.NewCDense(N, N, nil)
		for y := range N {
			for x := range N {
				a := 2 * math.Pi * float64(x*y%N) / float64(N)
				f.Set(y, x, complex(math.Cos(a), math.Sin(a))/complex(math.Sqrt(float64(N)), 0))
			}
		}
		if d := metric.Distance(dense(t, qft(n)), f); d > 1e-10 {
			t.Errorf("qft(%d) differs from the textbook matrix by %g", n, d)
		}
	}
}
