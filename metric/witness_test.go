package metric

import (
	"math"
	"math/cmplx"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// The witness's deviation equals PhaseDistance when the eigenphases of v†u
// fit in a half circle and √2 otherwise (issue 3; for a unit ψ the squared
// phase-free deviation is 2 − 2|⟨ψ|v†u|ψ⟩|, a two-line computation).
func TestWitnessDeviation(t *testing.T) {
	rng := newRand(11)
	for _, c := range []struct {
		name   string
		phases []float64
	}{
		{"T-like", []float64{0, math.Pi / 4}},
		{"small arc", []float64{0.1, 0.2, 0.15, 0.1, 0.3, 0.25, 0.2, 0.12}},
		{"half circle", []float64{-math.Pi / 2, math.Pi / 2, 0}},
		{"beyond half", []float64{0, 2, 4}},
		{"antipodal pair", []float64{0, math.Pi, 0, math.Pi}},
		{"identity", []float64{0.4, 0.4, 0.4, 0.4}},
		{"clusters 1e-10 at both ends", []float64{0.1, 0.1 + 1e-10, 0.1 - 1e-10, 0.5, 0.9, 0.9 + 1e-10, 0.9 + 2e-10, 0.3}},
		{"clusters 1e-10 beyond half", []float64{0, 1e-10, 2, 2 + 1e-10, 4, 4 - 1e-10}},
	} {
		q := haar(rng, len(c.phases))
		u := diagonal(q, c.phases...)
		v := identity(len(c.phases))
		psi, dist := Witness(u, v)
		if n := norm2(psi); math.Abs(n-1) > 1e-13 {
			t.Errorf("%s: witness has norm %v", c.name, n)
		}
		pd := PhaseDistance(u, v)
		want := pd
		if pd > math.Sqrt2 {
			want = math.Sqrt2
		}
		near(t, c.name+": witness deviation", dist, want, 1e-13)
		// Check the deviation from its definition with a brute-force scan of φ.
		up, vp := apply(u, psi), apply(v, psi)
		best := math.Inf(1)
		for k := 0; k < 20000; k++ {
			phi := 2 * math.Pi * float64(k) / 20000
			d := 0.0
			for i := range up {
				x := up[i] - cmplx.Exp(complex(0, phi))*vp[i]
				d += real(x)*real(x) + imag(x)*imag(x)
			}
			best = math.Min(best, math.Sqrt(d))
		}
		near(t, c.name+": scanned deviation", best, dist, 1e-3)
	}
}

func TestWitnessRandom(t *testing.T) {
	rng := newRand(12)
	for _, n := range []int{2, 4, 8, 16} {
		u, v := haar(rng, n), haar(rng, n)
		psi, dist := Witness(u, v)
		pd := PhaseDistance(u, v)
		near(t, "witness deviation", dist, math.Min(pd, math.Sqrt2), 1e-12)
		if d := StateDistance(apply(u, psi), apply(v, psi)); d < 0 || d > 1 {
			t.Errorf("state distance %v out of range", d)
		}
	}
}

func apply(m mat.CMatrix, x []complex128) []complex128 {
	r, c := m.Dims()
	y := make([]complex128, r)
	for i := 0; i < r; i++ {
		for j := 0; j < c; j++ {
			y[i] += m.At(i, j) * x[j]
		}
	}
	return y
}

// One-dimensional "unitaries" are phases: every distance up to phase is 0,
// and the witness is the only unit vector there is (up to phase).
func TestOneByOne(t *testing.T) {
	u := mat.NewCDense(1, 1, []complex128{cmplx.Exp(0.7i)})
	v := mat.NewCDense(1, 1, []complex128{1})
	near(t, "PhaseDistance 1×1", PhaseDistance(u, v), 0, 0)
	near(t, "Diamond 1×1", Diamond(u, v), 0, 0)
	near(t, "Distance 1×1", Distance(u, v), 2*math.Sin(0.35), 1e-15)
	psi, dist := Witness(u, v)
	near(t, "|witness|", cmplx.Abs(psi[0]), 1, 1e-15)
	near(t, "witness deviation 1×1", dist, 0, 1e-15)
	if got := Eigenphases(u); len(got) != 1 || math.Abs(got[0]-0.7) > 1e-15 {
		t.Errorf("Eigenphases of e^{0.7i} = %v", got)
	}
}
