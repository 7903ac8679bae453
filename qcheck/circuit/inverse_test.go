package circuit

import (
	"math"
	"math/cmplx"
	"testing"

	"pgregory.net/rapid"
)

// specialAngles are the angles where rotations turn into Clifford gates or the identity, where
// sign and branch mistakes in an inverse show first (common practice, no source).
var specialAngles = []float64{0, math.Pi / 4, -math.Pi / 4, math.Pi / 2, -math.Pi / 2, math.Pi, -math.Pi,
	3 * math.Pi / 2, 2 * math.Pi, -2 * math.Pi, 4 * math.Pi, 1e-9}

func angleGen() *rapid.Generator[float64] {
	return rapid.OneOf(rapid.SampledFrom(specialAngles), rapid.Float64Range(-4*math.Pi, 4*math.Pi))
}

// unitaryGates lists the library's gates that have a matrix.
func unitaryGates() []Spec {
	var out []Spec
	for _, s := range Standard() {
		if g, _ := NewGate(s.Name, make([]float64, s.Params)...); g.Unitary() {
			out = append(out, s)
		}
	}
	return out
}

// matMul returns a·b for square row-major matrices.
func matMul(a, b []complex128) []complex128 {
	d := int(math.Sqrt(float64(len(a))))
	out := make([]complex128, d*d)
	for i := 0; i < d; i++ {
		for k := 0; k < d; k++ {
			for j := 0; j < d; j++ {
				out[i*d+j] += a[i*d+k] * b[k*d+j]
			}
		}
	}
	return out
}

// distanceFromIdentity returns the largest entry of |m − I|.
func distanceFromIdentity(m []complex128) float64 {
	d := int(math.Sqrt(float64(len(m))))
	worst := 0.0
	for i := 0; i < d; i++ {
		for j := 0; j < d; j++ {
			want := complex(0, 0)
			if i == j {
				want = 1
			}
			worst = math.Max(worst, cmplx.Abs(m[i*d+j]-want))
		}
	}
	return worst
}

// Every gate's Inverse composed with the gate is the identity matrix, in both orders (a unitary's
// inverse is two-sided: U†U = UU† = I, N&C §2.1.6), for every gate of the library and angles that
// mix special values with continuous ones.
func TestGateInverseIsIdentity(t *testing.T) {
	gates := unitaryGates()
	if len(gates) < 30 {
		t.Fatalf("only %d unitary gates in the library", len(gates))
	}
	// Each run draws angles for every gate, so that no gate is left to chance.
	rapid.Check(t, func(rt *rapid.T) {
		for _, s := range gates {
			params := make([]float64, s.Params)
			for i := range params {
				params[i] = angleGen().Draw(rt, s.Name)
			}
			g, err := NewGate(s.Name, params...)
			if err != nil {
				rt.Fatal(err)
			}
			inv := g.Inverse()
			if inv.Qubits() != g.Qubits() {
				rt.Fatalf("%v: inverse %v acts on %d qubits, not %d", g, inv, inv.Qubits(), g.Qubits())
			}
			m, mi := g.Elements(), inv.Elements()
			if d := distanceFromIdentity(matMul(mi, m)); d > 1e-12 {
				rt.Fatalf("%v then its inverse %v: off the identity by %.3g", g, inv, d)
			}
			if d := distanceFromIdentity(matMul(m, mi)); d > 1e-12 {
				rt.Fatalf("%v after its inverse %v: off the identity by %.3g", g, inv, d)
			}
			if back := inv.Inverse(); !back.Equal(g) {
				rt.Fatalf("the inverse of the inverse of %v is %v", g, back)
			}
		}
	})
}

// The same holds for a custom gate: its inverse holds the conjugate transpose, named with "dg".
func TestCustomInverse(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		th := angleGen().Draw(rt, "theta")
		ph := angleGen().Draw(rt, "phi")
		// A general unitary of U(2) up to phase: [[cos, −e^{iφ} sin], [sin, e^{iφ} cos]].
		c, s := math.Cos(th), math.Sin(th)
		e := cmplx.Exp(complex(0, ph))
		m := []complex128{complex(c, 0), -e * complex(s, 0), complex(s, 0), e * complex(c, 0)}
		g, err := Custom("mine", matrixOf(m))
		if err != nil {
			rt.Fatal(err)
		}
		inv := g.Inverse()
		if inv.Name != "minedg" || inv.Inverse().Name != "mine" {
			rt.Fatalf("inverse names %q, %q; want minedg, mine", inv.Name, inv.Inverse().Name)
		}
		if d := distanceFromIdentity(matMul(inv.Elements(), g.Elements())); d > 1e-12 {
			rt.Fatalf("custom gate then its inverse: off the identity by %.3g", d)
		}
	})
}
