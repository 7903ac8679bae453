package metric

import (
	"math"
	"math/cmplx"
	"testing"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
)

// drawUnitary draws an n×n Haar-random unitary from a drawn seed.
func drawUnitary(t *rapid.T, n int, label string) *mat.CDense {
	return haar(newRand(rapid.Uint64().Draw(t, label)), n)
}

// drawNear draws a unitary u·R with R = Q·diag(e^{iε_k})·Q† close to the
// identity, |ε_k| ≤ scale: the case where the bounds below are tight enough to
// mean something.
func drawNear(t *rapid.T, u *mat.CDense, label string) *mat.CDense {
	n, _ := u.Dims()
	scale := rapid.SampledFrom([]float64{1e-9, 1e-4, 0.01, 0.3, 2}).Draw(t, label+" scale")
	eps := make([]float64, n)
	for i := range eps {
		eps[i] = rapid.Float64Range(-scale, scale).Draw(t, label+" phase")
	}
	return mul(u, diagonal(drawUnitary(t, n, label+" basis"), eps...))
}

// probabilities returns |(m·psi)_k|² for each basis state k.
func probabilities(m mat.CMatrix, psi []complex128) []float64 {
	out := apply(m, psi)
	p := make([]float64, len(out))
	for i, x := range out {
		p[i] = real(x)*real(x) + imag(x)*imag(x)
	}
	return p
}

// Nielsen & Chuang §4.5.3: if ‖U − V‖ ≤ ε then every measurement
// outcome's probability moves by at most 2ε. Probabilities ignore global
// phase, so the bound holds with PhaseDistance as well.
func TestPropertyProbabilityBound(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		n := 1 << rapid.IntRange(1, 4).Draw(t, "qubits")
		u := drawUnitary(t, n, "u")
		v := drawNear(t, u, "v")
		if rapid.Bool().Draw(t, "rephase") {
			v = scale(cmplx.Exp(complex(0, rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "phase"))), v)
		}
		psi := haarState(newRand(rapid.Uint64().Draw(t, "state")), n)
		p, q := probabilities(u, psi), probabilities(v, psi)
		d, pd := Distance(u, v), PhaseDistance(u, v)
		for k := range p {
			diff := math.Abs(p[k] - q[k])
			if diff > 2*d+1e-14 {
				t.Fatalf("outcome %d: |p − p̃| = %g > 2‖U − V‖ = %g", k, diff, 2*d)
			}
			if diff > 2*pd+1e-14 {
				t.Fatalf("outcome %d: |p − p̃| = %g > 2·PhaseDistance = %g", k, diff, 2*pd)
			}
		}
	})
}

// Nielsen & Chuang §4.5.3: ‖U_N⋯U_1 − V_N⋯V_1‖ ≤ Σ‖U_k − V_k‖, and
// the same for the phase-free distance, since each factor's phase may be
// chosen separately (the package documentation).
func TestPropertyErrorsAddUp(t *testing.T) {
	rapid.Check(t, func(t *rapid.T) {
		n := 1 << rapid.IntRange(1, 3).Draw(t, "qubits")
		steps := rapid.IntRange(1, 6).Draw(t, "steps")
		pu, pv := identity(n), identity(n)
		var sum, sumPhase float64
		for k := 0; k < steps; k++ {
			u := drawUnitary(t, n, "u")
			v := drawNear(t, u, "v")
			if rapid.Bool().Draw(t, "rephase") {
				v = scale(cmplx.Exp(complex(0, rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "phase"))), v)
			}
			sum += Distance(u, v)
			sumPhase += PhaseDistance(u, v)
			pu, pv = mul(u, pu), mul(v, pv)
		}
		if d := Distance(pu, pv); d > sum+1e-13 {
			t.Fatalf("‖∏U − ∏V‖ = %g > Σ‖U_k − V_k‖ = %g", d, sum)
		}
		if d := PhaseDistance(pu, pv); d > sumPhase+1e-13 {
			t.Fatalf("PhaseDistance of products %g > sum of PhaseDistances %g", d, sumPhase)
		}
	})
}

// Metric axioms (common practice; for the operator norm they follow from its
// being a norm, and for the phase-free distance from taking a minimum over a
// group acting by isometries): symmetry, the triangle inequality, invariance
// under multiplying both sides by a unitary, and zero exactly for equality up
// to phase.
func TestPropertyMetricAxioms(t *testing.T) {
	type distance struct {
		name string
		f    func(u, v mat.CMatrix) float64
	}
	distances := []distance{{"Distance", Distance}, {"PhaseDistance", PhaseDistance}, {"Diamond", Diamond}}
	rapid.Check(t, func(t *rapid.T) {
		n := 1 << rapid.IntRange(1, 4).Draw(t, "qubits")
		u := drawUnitary(t, n, "u")
		v := drawNear(t, u, "v")
		w := drawNear(t, v, "w")
		g := drawUnitary(t, n, "g")
		const slack = 1e-13
		for _, d := range distances {
			uv, vu := d.f(u, v), d.f(v, u)
			if math.Abs(uv-vu) > slack {
				t.Fatalf("%s not symmetric: %g vs %g", d.name, uv, vu)
			}
			if uw, vw := d.f(u, w), d.f(v, w); uw > uv+vw+slack {
				t.Fatalf("%s breaks the triangle inequality: d(u,w) = %g > %g + %g", d.name, uw, uv, vw)
			}
			if l := d.f(mul(g, u), mul(g, v)); math.Abs(l-uv) > slack {
				t.Fatalf("%s changes under left multiplication: %g vs %g", d.name, l, uv)
			}
			if r := d.f(mul(u, g), mul(v, g)); math.Abs(r-uv) > slack {
				t.Fatalf("%s changes under right multiplication: %g vs %g", d.name, r, uv)
			}
			if z := d.f(u, u); z > slack {
				t.Fatalf("%s(u, u) = %g, want 0", d.name, z)
			}
		}
		gamma := rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "gamma")
		if z := PhaseDistance(u, scale(cmplx.Exp(complex(0, gamma)), u)); z > 1e-14 {
			t.Fatalf("PhaseDistance(u, e^{iγ}u) = %g, want 0", z)
		}
		// Not equal up to phase ⇒ positive: u·diag(1, e^{iδ}, 1, …) in a random
		// basis has eigenphases {0, δ}, so the distance is 2 sin(δ/4) > 0.
		delta := rapid.Float64Range(1e-6, math.Pi).Draw(t, "delta")
		ph := make([]float64, n)
		ph[n-1] = delta
		x := mul(u, diagonal(g, ph...))
		if pd := PhaseDistance(u, x); math.Abs(pd-2*math.Sin(delta/4)) > 1e-13 || pd <= 0 {
			t.Fatalf("PhaseDistance with one eigenphase moved by δ=%g is %g, want 2 sin(δ/4) = %g", delta, pd, 2*math.Sin(delta/4))
		}
	})
}

// Average and process fidelity agree with each other as Nielsen, Phys. Lett.
// A 303 (2002) says, F_avg = (d·F_pro + 1)/(d + 1), and the average fidelity
// matches its definition, the mean of |⟨ψ|u†v|ψ⟩|² over Haar-random ψ:
// checked by Monte Carlo on 20000 states with a 6σ margin (the variance of
// |⟨ψ|W|ψ⟩|² is at most 1/4, so σ ≤ 0.5/√20000 = 0.0035; a false failure has
// probability below 2e-9 per case under the central limit approximation).
func TestAverageFidelityDefinition(t *testing.T) {
	rng := newRand(99)
	for _, n := range []int{2, 4, 8} {
		u, v := haar(rng, n), haar(rng, n)
		fa, fp := AverageFidelity(u, v), ProcessFidelity(u, v)
		d := float64(n)
		near(t, "F_avg vs F_pro", fa, (d*fp+1)/(d+1), 1e-14)
		w := mul(adjoint(u), v)
		const samples = 20000
		sum := 0.0
		for s := 0; s < samples; s++ {
			psi := haarState(rng, n)
			x := inner(psi, apply(w, psi))
			sum += real(x)*real(x) + imag(x)*imag(x)
		}
		near(t, "Monte Carlo average fidelity", sum/samples, fa, 6*0.5/math.Sqrt(samples))
	}
}

// Eigenphases of q·diag(e^{iθ})·q† give back θ, for spectra drawn to be
// hard: repeated special angles (multiples of π/4, ±π, the solver's own
// first pole 2.1 and its antipode), tight clusters (offsets down to 1e-12)
// and arbitrary angles, in a random basis or none. The check is the
// definition of an eigenvalue; the tolerance allows n·1e-16 with margin.
func TestPropertyEigenphasesHard(t *testing.T) {
	special := []float64{0, math.Pi, -math.Pi + 1e-12, math.Pi / 4, math.Pi / 2, -3 * math.Pi / 4, 2.1, 2.1 - math.Pi, 1.0}
	rapid.Check(t, func(t *rapid.T) {
		n := rapid.IntRange(1, 16).Draw(t, "n")
		ph := make([]float64, n)
		for i := range ph {
			base := rapid.OneOf(rapid.SampledFrom(special), rapid.Float64Range(-math.Pi, math.Pi)).Draw(t, "angle")
			off := rapid.SampledFrom([]float64{0, 0, 1e-12, -1e-10, 1e-7}).Draw(t, "offset")
			ph[i] = wrapPhase(base + off)
		}
		var q *mat.CDense
		if rapid.Bool().Draw(t, "rotate") {
			q = drawUnitary(t, n, "basis")
		}
		got := Eigenphases(diagonal(q, ph...))
		if e := phaseError(got, ph); e > 1e-12 {
			t.Fatalf("eigenphases %v, want %v: error %.3g", got, ph, e)
		}
	})
}
