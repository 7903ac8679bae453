package sim

import (
	"flag"
	"fmt"
	"math"
	"math/bits"
	"math/cmplx"
	"math/rand/v2"
	"strings"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

var matrixFreeWide = flag.Bool("matrixfree.wide", false, "also check the matrix-free distance against the dense engine at 10 and 12 qubits (minutes)")

// perturb returns a copy of c with the angle of `count` of its rotations shifted by delta.
func perturb(rng *rand.Rand, c *circuit.Circuit, count int, delta float64) *circuit.Circuit {
	d := c.Clone()
	for done, tries := 0, 0; done < count && tries < 10*len(d.Ops); tries++ {
		op := &d.Ops[rng.IntN(len(d.Ops))]
		if len(op.Gate.Params) > 0 {
			op.Gate.Params[0] += delta
			done++
		}
	}
	return d
}

// allOnesPhase returns a circuit of cx and p gates that multiplies |11…1⟩ by e^{iλ} and leaves
// every other basis state alone: a defect confined to one basis state, which a random input state
// sees with weight only 2^−n. It uses the Fourier expansion of AND (from memory; checked against
// the dense engine in TestAllOnesPhase),
//
//	x_0·x_1⋯x_{n−1} = 2^{1−n} Σ_{S≠∅} (−1)^{|S|+1} ⊕_{j∈S} x_j,
//
// so e^{iλ·AND} is a product of phases on parities. The subsets S whose largest element is t are
// visited in Gray-code order of S∖{t}, so that one cx(j, t) moves qubit t from one parity to the
// next; p(α) on t then applies e^{iα} when the parity is 1.
func allOnesPhase(n int, lambda float64) *circuit.Circuit {
	c := circuit.New(n)
	unit := lambda / float64(uint64(1)<<(n-1))
	for t := 0; t < n; t++ {
		prev := 0
		for k := 0; k < 1<<t; k++ {
			g := k ^ k>>1
			if diff := g ^ prev; diff != 0 {
				c.CX(bits.TrailingZeros(uint(diff)), t)
			}
			prev = g
			if bits.OnesCount(uint(g))%2 == 0 { // |S| = |g| + 1 odd
				c.P(unit, t)
			} else {
				c.P(-unit, t)
			}
		}
		if prev != 0 { // the last Gray code word has one bit set
			c.CX(bits.TrailingZeros(uint(prev)), t)
		}
	}
	return c
}

// allOnesPhase is diag(1, …, 1, e^{iλ}) by the dense engine.
func TestAllOnesPhase(t *testing.T) {
	const lambda = 0.7
	for n := 1; n <= 5; n++ {
		u := unitaryOf(t, allOnesPhase(n, lambda))
		d := 1 << n
		for i := 0; i < d; i++ {
			for j := 0; j < d; j++ {
				want := complex(0, 0)
				switch {
				case i == j && i == d-1:
					want = complex(math.Cos(lambda), math.Sin(lambda))
				case i == j:
					want = 1
				}
				if cmplx.Abs(u.At(i, j)-want) > 1e-12 {
					t.Fatalf("%d qubits: entry (%d,%d) = %v, want %v", n, i, j, u.At(i, j), want)
				}
			}
		}
	}
}

type matrixFreeCase struct {
	name string
	u, v *circuit.Circuit
	// closed is the distance in closed form, or NaN when there is none.
	closed float64
}

// matrixFreeCases are the pairs checked at width n.
func matrixFreeCases(rng *rand.Rand, n int) []matrixFreeCase {
	u := randomCircuit(rng, n, 8*n)
	flipped := func(lambda float64) *circuit.Circuit { return u.Clone().Compose(allOnesPhase(n, lambda)) }
	none := math.NaN()
	// A phase λ on one basis state: W has one eigenphase ±λ and the others 0, so D = 2·sin(|λ|/4)
	// (package metric's documentation).
	cases := []matrixFreeCase{
		{"identical", u, guard(u), 0},
		{"one angle off by 1e-3", u, guard(perturb(rng, u, 1, 1e-3)), none},
		{"three angles off by 1e-6", u, guard(perturb(rng, u, 3, 1e-6)), none},
		{"phase flip on |1…1⟩", u, guard(flipped(math.Pi)), math.Sqrt2},
		{"phase 1e-4 on |1…1⟩", guard(flipped(1e-4)), u, 2 * math.Sin(1e-4/4)},
		// Without the guard the shared ends are dropped and only the differing ops remain.
		{"one angle off by 1e-3, shared ends", u, perturb(rng, u, 1, 1e-3), none},
	}
	if n <= 4 {
		// The Krylov space then fills the whole space, so even unrelated circuits are exact.
		cases = append(cases, matrixFreeCase{"unrelated", u, randomCircuit(rng, n, 8*n), none})
	}
	return cases
}

// guard returns c with X·X added before it and Z·Z after it: the same unitary, but sharing no op
// at either end with c, so that MatrixFreeDistance must work on the whole of both circuits.
func guard(c *circuit.Circuit) *circuit.Circuit {
	n := c.Qubits()
	return circuit.New(n).X(0).X(0).Compose(c).Z(n - 1).Z(n - 1)
}

// The matrix-free distance agrees to 1e-8 with the dense phase-free distance of package metric
// (the 2·sin(θ/4) formula of package metric's documentation, from an eigendecomposition) up to 8 qubits, 10 with
// -matrixfree.wide, and with the closed form of single-state defects at 12 qubits with
// -matrixfree.wide; and its bounds bracket the reference.
func TestMatrixFreeAgreesWithDense(t *testing.T) {
	widths, denseMax := []int{1, 2, 3, 4, 6, 8}, 8
	if testing.Short() {
		widths = []int{1, 2, 3, 4, 6}
	}
	if *matrixFreeWide {
		widths, denseMax = append(widths, 10, 12), 10
	}
	rng := rand.New(rand.NewPCG(15, 24))
	for _, n := range widths {
		for _, tc := range matrixFreeCases(rng, n) {
			want := tc.closed
			if n <= denseMax {
				dense, _ := metric.PhaseAlign(unitaryOf(t, tc.u), unitaryOf(t, tc.v))
				if !math.IsNaN(want) && math.Abs(dense-want) > 1e-10 {
					t.Errorf("%d qubits, %s: dense distance %.12g, closed form %.12g", n, tc.name, dense, want)
				}
				want = dense
			}
			if math.IsNaN(want) {
				continue
			}
			res, err := MatrixFreeDistance(tc.u, tc.v, MatrixFreeOptions{Seed: uint64(n)})
			if err != nil {
				t.Fatal(err)
			}
			label := fmt.Sprintf("%d qubits, %s", n, tc.name)
			if math.Abs(res.Distance-want) > 1e-8 {
				t.Errorf("%s: Distance = %.12g, reference %.12g", label, res.Distance, want)
			}
			if res.Lower > want+1e-12 || res.Upper < want-1e-12 {
				t.Errorf("%s: bounds [%.12g, %.12g] do not hold the reference %.12g", label, res.Lower, res.Upper, want)
			}
			// A witness reaches the distance when the eigenphases lie within a half circle
			// (metric.Witness: D ≤ √2), as they do in every case here but the unrelated pair.
			if want < 1.3 && math.Abs(res.Lower-want) > 1e-8 {
				t.Errorf("%s: witness shows %.12g, reference %.12g", label, res.Lower, want)
			}
			if norm(res.Witness) < 1-1e-12 || norm(res.Witness) > 1+1e-12 {
				t.Errorf("%s: witness has norm %v", label, norm(res.Witness))
			}
			if strings.HasSuffix(tc.name, "shared ends") && res.Shared != tc.u.Len()-1 {
				t.Errorf("%s: %d shared ops, want all but the perturbed one of %d", label, res.Shared, tc.u.Len())
			}
		}
	}
}

// customGate makes a custom gate from a 2^k × 2^k matrix given by its entries.
func customGate(t *testing.T, name string, k int, entry func(i, j int) complex128) circuit.Gate {
	t.Helper()
	d := 1 << k
	m := mat.NewCDense(d, d, nil)
	for i := 0; i < d; i++ {
		for j := 0; j < d; j++ {
			m.Set(i, j, entry(i, j))
		}
	}
	g, err := circuit.Custom(name, m)
	if err != nil {
		t.Fatal(err)
	}
	return g
}

// A defect of phase λ confined to 256 of the 2^17 basis states of 17 qubits: with an extra qubit
// a, the ops "a ^= AND(q0…q7)", "phase λ if AND(q8…q15) and a", "a ^= AND(q0…q7)" multiply a
// basis state by e^{iλ} exactly when q8…q15 are all 1 and a ≠ AND(q0…q7). So W = V†U has the
// eigenphase λ on that subspace and 0 elsewhere, and D = 2·sin(|λ|/4) (package metric's documentation), while a random
// input state puts only 2^−9 of its weight there.
func TestMatrixFreeHiddenDefectAtWidth(t *testing.T) {
	if testing.Short() {
		t.Skip("17 qubits")
	}
	const n, lambda = 17, 0.5
	rng := rand.New(rand.NewPCG(17, 1))
	u := randomCircuit(rng, n, 60)
	and := customGate(t, "and8", 9, func(i, j int) complex128 {
		// Local index x0…x7 a, with a the least significant bit: swap 510 and 511.
		if (i >= 510) == (j >= 510) && (i == j) != (i >= 510) {
			return 1
		}
		return 0
	})
	phase := customGate(t, "phase8", 9, func(i, j int) complex128 {
		switch {
		case i != j:
			return 0
		case i == 511:
			return complex(math.Cos(lambda), math.Sin(lambda))
		default:
			return 1
		}
	})
	v := guard(u.Clone().
		Append(and, 0, 1, 2, 3, 4, 5, 6, 7, 16).
		Append(phase, 8, 9, 10, 11, 12, 13, 14, 15, 16).
		Append(and, 0, 1, 2, 3, 4, 5, 6, 7, 16))
	want := 2 * math.Sin(lambda/4)
	res, err := MatrixFreeDistance(u, v, MatrixFreeOptions{Seed: 3})
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(res.Distance-want) > 1e-8 || math.Abs(res.Lower-want) > 1e-8 || res.Upper < want {
		t.Errorf("Distance %.12g, Lower %.12g, Upper %.12g; closed form %.12g", res.Distance, res.Lower, res.Upper, want)
	}
}

// With a tolerance the run stops once the verdict is settled: a pair 5e-4 apart (one angle off by
// 1e-3: D = 2·sin(1e-3/4), package metric's documentation) is told apart by the witness without certification, and a
// pair equal up to rounding is certified as soon as the bound allows, in fewer steps than a full
// run.
func TestMatrixFreeStopsAtTolerance(t *testing.T) {
	const n, tol = 8, 1e-9
	u := circuit.New(n).H(0).CX(0, 1).RZ(0.3, 1).CX(1, 2).RY(0.2, 7).CZ(7, 3)
	v := guard(circuit.New(n).H(0).CX(0, 1).RZ(0.301, 1).CX(1, 2).RY(0.2, 7).CZ(7, 3))
	apart, err := MatrixFreeDistance(u, v, MatrixFreeOptions{Tolerance: tol})
	if err != nil {
		t.Fatal(err)
	}
	if want := 2 * math.Sin(1e-3/4); math.Abs(apart.Lower-want) > 1e-10 || !math.IsInf(apart.Upper, 1) {
		t.Errorf("apart: Lower %.12g (want %.12g), Upper %v (want +Inf: no certification needed)", apart.Lower, want, apart.Upper)
	}
	full, err := MatrixFreeDistance(u, guard(u), MatrixFreeOptions{})
	if err != nil {
		t.Fatal(err)
	}
	same, err := MatrixFreeDistance(u, guard(u), MatrixFreeOptions{Tolerance: tol})
	if err != nil {
		t.Fatal(err)
	}
	if same.Upper > tol || same.Steps >= full.Steps || full.Upper > tol {
		t.Errorf("equal pair: Upper %.3g in %d steps with the tolerance, %.3g in %d without", same.Upper, same.Steps, full.Upper, full.Steps)
	}
}

func TestMatrixFreeRefusesBadInput(t *testing.T) {
	cases := []struct {
		u, v *circuit.Circuit
		opts MatrixFreeOptions
		want string
	}{
		{circuit.New(2), circuit.New(3), MatrixFreeOptions{}, "different widths"},
		{circuit.New(2).H(0), circuit.New(2).Measure(0, 0), MatrixFreeOptions{}, "second circuit: circuit: op 0 (measure)"},
		{circuit.New(2).CX(0, 5), circuit.New(2), MatrixFreeOptions{}, "first circuit: circuit: op 0 (cx)"},
		{circuit.New(10), circuit.New(10), MatrixFreeOptions{MemoryLimit: 1 << 14}, "needs at least 6 statevectors"},
		{circuit.New(1), circuit.New(1), MatrixFreeOptions{Failure: 2}, "bad matrix-free options"},
	}
	for _, tc := range cases {
		_, err := MatrixFreeDistance(tc.u, tc.v, tc.opts)
		if err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("error = %v, want one containing %q", err, tc.want)
		}
	}
}

func ExampleMatrixFreeDistance() {
	// rz(θ) and p(θ) differ only by a global phase; rz(θ) and rz(θ + 0.01) by 2·sin(0.01/4).
	u := circuit.New(3).H(0).CX(0, 1).RZ(0.3, 2).CX(1, 2)
	v := circuit.New(3).H(0).CX(0, 1).P(0.3, 2).CX(1, 2)
	w := circuit.New(3).H(0).CX(0, 1).RZ(0.31, 2).CX(1, 2)
	same, _ := MatrixFreeDistance(u, v, MatrixFreeOptions{})
	off, _ := MatrixFreeDistance(u, w, MatrixFreeOptions{})
	fmt.Printf("%.6f %v\n", same.Distance, same.Upper < 1e-9)
	fmt.Printf("%.6f %.6f\n", off.Distance, 2*math.Sin(0.01/4))
	// Output:
	// 0.000000 true
	// 0.005000 0.005000
}

// benchmarkPair20 is a random 20-qubit circuit of 500 gates and a copy with one angle shifted by
// 1e-3 (distance about 5e-4), guarded so that the two share no op at either end.
func benchmarkPair20() (u, v *circuit.Circuit) {
	rng := rand.New(rand.NewPCG(20, 500))
	u = randomCircuit(rng, 20, 500)
	return u, guard(perturb(rng, u, 1, 1e-3))
}

func benchmarkMatrixFree(b *testing.B, u, v *circuit.Circuit, opts MatrixFreeOptions) {
	for b.Loop() {
		res, err := MatrixFreeDistance(u, v, opts)
		if err != nil {
			b.Fatal(err)
		}
		b.ReportMetric(float64(res.Steps), "applications")
		b.ReportMetric(res.Distance, "distance")
		b.ReportMetric(res.Lower, "lower")
		b.ReportMetric(res.Upper, "upper")
	}
}

// BenchmarkMatrixFree20 runs every step: exploration and a 40-step certification.
func BenchmarkMatrixFree20(b *testing.B) {
	u, v := benchmarkPair20()
	benchmarkMatrixFree(b, u, v, MatrixFreeOptions{})
}

// BenchmarkMatrixFree20Verdict stops once the verdict at 1e-9 is settled: here the witness shows
// the difference after exploration.
func BenchmarkMatrixFree20Verdict(b *testing.B) {
	u, v := benchmarkPair20()
	benchmarkMatrixFree(b, u, v, MatrixFreeOptions{Tolerance: 1e-9})
}

// BenchmarkMatrixFree20Equivalent certifies at 1e-9 that a circuit equals its guarded copy.
func BenchmarkMatrixFree20Equivalent(b *testing.B) {
	u, _ := benchmarkPair20()
	benchmarkMatrixFree(b, u, guard(u), MatrixFreeOptions{Tolerance: 1e-9})
}

// BenchmarkApplyW20 measures one application of W = V†U for the pair of BenchmarkMatrixFree20,
// the unit of cost of the matrix-free distance.
func BenchmarkApplyW20(b *testing.B) {
	u, v := benchmarkPair20()
	w, err := Compile(u.Clone().Compose(v.Inverse()))
	if err != nil {
		b.Fatal(err)
	}
	state := randomState(rand.New(rand.NewPCG(1, 2)), 1<<20)
	for b.Loop() {
		if err := w.Apply(state); err != nil {
			b.Fatal(err)
		}
	}
}
