package metric

import (
	"math"
	"math/cmplx"
	"sort"
	"testing"

	"gonum.org/v1/gonum/mat"
)

func near(t *testing.T, what string, got, want, tol float64) {
	t.Helper()
	if math.Abs(got-want) > tol || math.IsNaN(got) {
		t.Errorf("%s = %.17g, want %.17g (tolerance %g)", what, got, want, tol)
	}
}

// Rz(θ) = diag(e^{−iθ/2}, e^{iθ/2}) against I: eigenphases ±θ/2, so
// PhaseDistance = 2 sin(|θ|/4) for |θ| ≤ π (the package documentation; issue 3). For
// π < |θ| ≤ 2π the other arc between the two eigenphases, 2π − |θ|, is the
// shorter one, so the value is 2 sin((2π − |θ|)/4): Rz(2π) = −I is I up to
// phase. (Issue 3 states the first form up to 2π; worked by hand, it holds
// only up to π.)
func TestPhaseDistanceRz(t *testing.T) {
	for _, theta := range []float64{0, 1e-12, 1e-9, 1e-3, 0.5, 1, math.Pi / 2, 3, math.Pi, -0.7, -math.Pi} {
		near(t, "PhaseDistance(Rz(θ), I)", PhaseDistance(rz(theta), gateI), 2*math.Sin(math.Abs(theta)/4), 1e-15)
	}
	for _, theta := range []float64{4, 5.5, 2*math.Pi - 1e-9, 2 * math.Pi, -6} {
		near(t, "PhaseDistance(Rz(θ), I)", PhaseDistance(rz(theta), gateI), 2*math.Sin((2*math.Pi-math.Abs(theta))/4), 1e-15)
	}
}

// Pairs worked by hand from the eigenphases of V†U (common knowledge of the
// gates' spectra, Nielsen & Chuang §4.2):
//   - X vs Y: Y†X = diag(−i, i) up to basis, arc π → 2 sin(π/4) = √2.
//   - H vs I: eigenvalues ±1, arc π → √2.
//   - T vs I: eigenphases 0, π/4 → 2 sin(π/16).
//   - S vs I: 0, π/2 → 2 sin(π/8).
//   - Z vs I: 0, π → √2.
func TestPhaseDistanceByHand(t *testing.T) {
	cases := []struct {
		name string
		u, v *mat.CDense
		want float64
	}{
		{"X,Y", gateX, gateY, math.Sqrt2},
		{"H,I", gateH, gateI, math.Sqrt2},
		{"T,I", gateT, gateI, 2 * math.Sin(math.Pi/16)},
		{"S,I", gateS, gateI, 2 * math.Sin(math.Pi/8)},
		{"Z,I", gateZ, gateI, math.Sqrt2},
		{"I,I", gateI, gateI, 0},
		{"iX,X", scale(1i, gateX), gateX, 0},
	}
	for _, c := range cases {
		near(t, "PhaseDistance("+c.name+")", PhaseDistance(c.u, c.v), c.want, 1e-15)
	}
}

// The operator-norm distances of the same pairs with phase counted, from
// the singular values of U − V worked by hand: ‖X − Y‖ = ‖[[0,1+i],[1−i,0]]‖ = √2,
// ‖Z − I‖ = 2, ‖T − I‖ = |e^{iπ/4} − 1| = 2 sin(π/8), ‖iX − X‖ = |i − 1| = √2.
func TestDistanceByHand(t *testing.T) {
	near(t, "Distance(X,Y)", Distance(gateX, gateY), math.Sqrt2, 1e-15)
	near(t, "Distance(Z,I)", Distance(gateZ, gateI), 2, 1e-15)
	near(t, "Distance(T,I)", Distance(gateT, gateI), 2*math.Sin(math.Pi/8), 1e-15)
	near(t, "Distance(iX,X)", Distance(scale(1i, gateX), gateX), math.Sqrt2, 1e-15)
	// A rectangular matrix: [[3, 0], [4, 0], [0, 1]] has singular values 5 and 1.
	near(t, "OperatorNorm(3×2)", OperatorNorm(mat.NewCDense(3, 2, []complex128{3, 0, 4, 0, 0, 1})), 5, 1e-14)
	near(t, "OperatorNorm(2×3)", OperatorNorm(mat.NewCDense(2, 3, []complex128{3, 4i, 0, 0, 0, 1})), 5, 1e-14)
}

// Distinct Pauli operators are perfectly distinguishable channels: the
// eigenvalues of P†Q are ±1 or ±i pairs whose hull holds 0, so the diamond
// distance is 2 (Watrous 2018, chapter 3, the unitary-channel theorem, 3.55 from memory,
// applied to anticommuting Paulis).
func TestDiamondPaulis(t *testing.T) {
	paulis := map[string]*mat.CDense{"I": gateI, "X": gateX, "Y": gateY, "Z": gateZ}
	for a, p := range paulis {
		for b, q := range paulis {
			want := 2.0
			if a == b {
				want = 0
			}
			near(t, "Diamond("+a+","+b+")", Diamond(p, q), want, 1e-15)
		}
	}
	// T against I: arc π/4 < π, ν = cos(π/8), distance 2 sin(π/8).
	near(t, "Diamond(T,I)", Diamond(gateT, gateI), 2*math.Sin(math.Pi/8), 1e-15)
}

// Average gate fidelity (d + |tr U†V|²)/(d(d+1)) (Nielsen, Phys. Lett. A 303
// (2002) 249, its formula for unitary channels): for T against I, tr = 1 + e^{iπ/4},
// |tr|² = 2 + √2, d = 2.
func TestFidelityByHand(t *testing.T) {
	want := (2 + 2 + math.Sqrt2) / 6
	near(t, "AverageFidelity(T,I)", AverageFidelity(gateT, gateI), want, 1e-15)
	near(t, "ProcessFidelity(T,I)", ProcessFidelity(gateT, gateI), (2+math.Sqrt2)/4, 1e-15)
	// X against Z: tr(XZ) = 0, so the average fidelity is its floor 1/(d+1).
	near(t, "AverageFidelity(X,Z)", AverageFidelity(gateX, gateZ), 1.0/3, 1e-15)
}

// Eigenphases of diagonal unitaries in a random basis come back sorted.
func TestEigenphasesHardSpectra(t *testing.T) {
	rng := newRand(7)
	cases := map[string][]float64{
		"identity":       {0, 0, 0, 0, 0, 0, 0, 0},
		"minus identity": {math.Pi, math.Pi, math.Pi, math.Pi, math.Pi, math.Pi},
		"cluster 1e-10":  {0.3, 0.3 + 1e-10, 0.3 - 1e-10, 0.3 + 2e-10, -2, -2 + 1e-10, 1, 1.0000000001},
		"wide":           {-3, -2, -1, 0, 1, 2, 3, 3.1},
		"around -1":      {math.Pi - 1e-11, -math.Pi + 1e-11, math.Pi, math.Pi - 3e-11},
		"pauli":          {1, -1, 1, -1},
		// Traceless, so the first pole is the fixed angle 2.1, which here is
		// an eigenphase: the transform is singular and must be rebuilt.
		"on the first pole": {2.1, 2.1 - math.Pi},
		// A pole 1e-6 from an eigenphase: accepted by the singularity check
		// but beyond the |x| limit, so it is moved into the widest gap.
		"near the first pole": {2.1 + 1e-6, 2.1 - math.Pi, 2.1 + math.Pi/2, 2.1 - math.Pi/2},
		"trace pole":          tracePoleSpectrum(),
	}
	for name, ph := range cases {
		for _, q := range []*mat.CDense{nil, haar(rng, len(ph))} {
			got := Eigenphases(diagonal(q, ph...))
			if !sort.Float64sAreSorted(got) || got[0] <= -math.Pi || got[len(got)-1] > math.Pi {
				t.Errorf("%s: eigenphases %v are not sorted in (−π, π]", name, got)
			}
			if e := phaseError(got, ph); e > 1e-13 {
				t.Errorf("%s (rotated %v): eigenphases %v, want %v (error %.3g)", name, q != nil, got, ph, e)
			}
		}
	}
}

// tracePoleSpectrum returns eigenphases (0, 0, 0, x) where x is exactly the
// first pole chosen from the trace, arg(3 + e^{ix}) + π + 0.3, found by
// fixed-point iteration (the map is a contraction here).
func tracePoleSpectrum() []float64 {
	x := 3.0
	for i := 0; i < 200; i++ {
		x = wrapPhase(cmplx.Phase(complex(3, 0)+cmplx.Exp(complex(0, x))) + math.Pi + 0.3)
	}
	return []float64{0, 0, 0, x}
}
