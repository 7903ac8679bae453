package synthesis

import (
	"math"
	"math/cmplx"
	"math/rand"
	"testing"

	"gonum.org/v1/gonum/mat"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// The gate set written out from Nielsen & Chuang Fig. 4.2, independently of the code under test
// and of the circuit library: H = (1/√2)[[1, 1], [1, −1]], S = diag(1, i), T = diag(1, e^{iπ/4}).
var textbook = map[string][]complex128{
	"h":   {complex(1/math.Sqrt2, 0), complex(1/math.Sqrt2, 0), complex(1/math.Sqrt2, 0), complex(-1/math.Sqrt2, 0)},
	"s":   {1, 0, 0, 1i},
	"sdg": {1, 0, 0, -1i},
	"t":   {1, 0, 0, cmplx.Exp(complex(0, math.Pi/4))},
	"tdg": {1, 0, 0, cmplx.Exp(complex(0, -math.Pi/4))},
}

// mul2 returns the 2×2 product a·b, row-major.
func mul2(a, b []complex128) []complex128 {
	return []complex128{
		a[0]*b[0] + a[1]*b[2], a[0]*b[1] + a[1]*b[3],
		a[2]*b[0] + a[3]*b[2], a[2]*b[1] + a[3]*b[3],
	}
}

func dense2(m []complex128) *mat.CDense { return mat.NewCDense(2, 2, append([]complex128(nil), m...)) }

// randomSU2 draws a uniformly random element of SU(2): a normalised 4-vector of independent
// normals is uniform on the 3-sphere (Muller's method, Comm. ACM 2 (1959)).
func randomSU2(r *rand.Rand) quat {
	q := quat{r.NormFloat64(), r.NormFloat64(), r.NormFloat64(), r.NormFloat64()}
	n := math.Sqrt(q.dot(q))
	return quat{q[0] / n, q[1] / n, q[2] / n, q[3] / n}
}

func TestLettersAreTheTextbookGates(t *testing.T) {
	for l := letter(0); l < letters; l++ {
		if d := metric.PhaseDistance(dense2(elements[l].matrix()), dense2(textbook[names[l]])); d > 1e-15 {
			t.Errorf("letter %s is %.3g from the textbook gate", names[l], d)
		}
		if d := elements[l].mul(elements[inverses[l]]).distance(quat{1, 0, 0, 0}); d > 1e-15 {
			t.Errorf("letter %s times its inverse is %.3g from I", names[l], d)
		}
	}
}

// Quaternion products are matrix products, distance is the phase-free operator-norm distance,
// and fromMatrix inverts matrix up to phase.
func TestQuaternionsAreSU2(t *testing.T) {
	r := rand.New(rand.NewSource(7))
	for i := 0; i < 200; i++ {
		p, q := randomSU2(r), randomSU2(r)
		if d := metric.Distance(dense2(p.mul(q).matrix()), dense2(mul2(p.matrix(), q.matrix()))); d > 1e-14 {
			t.Fatalf("product of quaternions is %.3g from the product of matrices", d)
		}
		if got, want := p.distance(q), metric.PhaseDistance(dense2(p.matrix()), dense2(q.matrix())); math.Abs(got-want) > 1e-9 {
			t.Fatalf("distance %.15g, metric.PhaseDistance %.15g", got, want)
		}
		phase := cmplx.Exp(complex(0, r.Float64()*7))
		m := p.matrix()
		for k := range m {
			m[k] *= phase
		}
		if d := fromMatrix(m).distance(p); d > 1e-7 {
			t.Fatalf("fromMatrix(e^{iφ}·P) is %.3g from P", d)
		}
	}
	// A rotation gate of the library read as a quaternion: rz(θ) = cos(θ/2) I − i sin(θ/2) Z,
	// N&C eq. 4.6.
	g, _ := circuit.NewGate("rz", 0.7)
	if d := fromMatrix(g.Elements()).distance(rotation(0.7, [3]float64{0, 0, 1})); d > 1e-7 {
		t.Errorf("rz(0.7) read as %v", fromMatrix(g.Elements()))
	}
}

// Dawson & Nielsen (2006), §4 (section number from memory): the balanced group commutator reproduces Δ exactly, with V and W
// rotations by the same angle φ, sin(θ/2) = 2 sin²(φ/2) √(1 − sin⁴(φ/2)).
func TestGroupCommutator(t *testing.T) {
	r := rand.New(rand.NewSource(11))
	for i := 0; i < 300; i++ {
		delta := randomSU2(r)
		if i%3 == 0 { // residuals in the recursion are close to the identity
			_, axis := randomSU2(r).angleAxis()
			delta = rotation(math.Pow(10, -1-4*r.Float64()), axis)
		}
		v, w := groupCommutator(delta)
		c := v.mul(w).mul(v.inv()).mul(w.inv())
		if d := c.distance(delta); d > 1e-9 {
			t.Fatalf("V·W·V†·W† is %.3g from Δ", d)
		}
		theta, _ := delta.angleAxis()
		phiV, _ := v.angleAxis()
		phiW, _ := w.angleAxis()
		s := math.Sin(phiV / 2)
		if math.Abs(phiV-phiW) > 1e-9 || math.Abs(math.Sin(theta/2)-2*s*s*math.Sqrt(1-s*s*s*s)) > 1e-9 {
			t.Fatalf("θ = %g: V turns by %g, W by %g, not the balanced angle", theta, phiV, phiW)
		}
	}
}

// simplify keeps the exact operator, global phase included: compare the textbook matrix products.
func TestSimplifyIsExact(t *testing.T) {
	r := rand.New(rand.NewSource(3))
	for i := 0; i < 500; i++ {
		w := make(word, r.Intn(30))
		for k := range w {
			w[k] = letter(r.Intn(int(letters)))
		}
		s := w.simplify()
		if len(s) > len(w) {
			t.Fatalf("simplify lengthened %v to %v", w, s)
		}
		if d := metric.Distance(dense2(product(w)), dense2(product(s))); d > 1e-12 {
			t.Fatalf("simplify changed the operator of %v (now %v) by %.3g", w, s, d)
		}
		for k := 1; k < len(s); k++ {
			if s[k] == letterH && s[k-1] == letterH {
				t.Fatalf("simplify left H·H in %v", s)
			}
		}
	}
}

// product multiplies the textbook matrices of a word's letters, first letter applied first.
func product(w word) []complex128 {
	m := []complex128{1, 0, 0, 1}
	for _, l := range w {
		m = mul2(textbook[names[l]], m)
	}
	return m
}
