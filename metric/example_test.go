package metric_test

import (
	"fmt"
	"math"
	"math/cmplx"

	"github.com/google/go-cmp/cmp"
	"gonum.org/v1/gonum/mat"

	"qcheck.dev/metric"
)

// rz(θ) and p(θ) = diag(1, e^{iθ}) differ only by the global phase e^{−iθ/2}:
// with the phase counted they are 2·sin(θ/4) apart, without it 0.
func ExamplePhaseDistance() {
	theta := 0.3
	rz := mat.NewCDense(2, 2, []complex128{cmplx.Exp(complex(0, -theta/2)), 0, 0, cmplx.Exp(complex(0, theta/2))})
	p := mat.NewCDense(2, 2, []complex128{1, 0, 0, cmplx.Exp(complex(0, theta))})
	fmt.Printf("with phase:    %.4f\n", metric.Distance(rz, p))
	fmt.Printf("phase removed: %.4f\n", metric.PhaseDistance(rz, p))
	_, phase := metric.PhaseAlign(rz, p)
	fmt.Printf("rz = e^{iφ}·p with φ = %.4f\n", phase)
	// Output:
	// with phase:    0.1499
	// phase removed: 0.0000
	// rz = e^{iφ}·p with φ = -0.1500
}

// T against S: the input that shows the difference best is an equal
// superposition of |0⟩ and |1⟩, where the relative phases π/4 and π/2 differ.
func ExampleWitness() {
	t := mat.NewCDense(2, 2, []complex128{1, 0, 0, cmplx.Exp(1i * math.Pi / 4)})
	s := mat.NewCDense(2, 2, []complex128{1, 0, 0, 1i})
	psi, dist := metric.Witness(t, s)
	fmt.Printf("|amplitudes| = %.4f %.4f\n", cmplx.Abs(psi[0]), cmplx.Abs(psi[1]))
	fmt.Printf("deviation %.4f = PhaseDistance %.4f\n", dist, metric.PhaseDistance(t, s))
	// Output:
	// |amplitudes| = 0.7071 0.7071
	// deviation 0.3902 = PhaseDistance 0.3902
}

// X and Z are perfectly distinguishable as channels; T and I are not.
func ExampleDiamond() {
	x := mat.NewCDense(2, 2, []complex128{0, 1, 1, 0})
	z := mat.NewCDense(2, 2, []complex128{1, 0, 0, -1})
	t := mat.NewCDense(2, 2, []complex128{1, 0, 0, cmplx.Exp(1i * math.Pi / 4)})
	id := mat.NewCDense(2, 2, []complex128{1, 0, 0, 1})
	fmt.Printf("X,Z: %.4f\n", metric.Diamond(x, z))
	fmt.Printf("T,I: %.4f\n", metric.Diamond(t, id))
	fmt.Printf("average fidelity T,I: %.4f\n", metric.AverageFidelity(t, id))
	// Output:
	// X,Z: 2.0000
	// T,I: 0.7654
	// average fidelity T,I: 0.9024
}

// In a test, cmp.Diff with EquateUnitaries treats matrices that agree up to
// global phase within the tolerance as equal.
func ExampleEquateUnitaries() {
	h := mat.NewCDense(2, 2, []complex128{1 / math.Sqrt2, 1 / math.Sqrt2, 1 / math.Sqrt2, -1 / math.Sqrt2})
	ih := mat.NewCDense(2, 2, []complex128{1i / math.Sqrt2, 1i / math.Sqrt2, 1i / math.Sqrt2, -1i / math.Sqrt2})
	fmt.Println(cmp.Equal(h, ih, metric.EquateUnitaries(1e-9)))
	fmt.Println(cmp.Equal(h, ih, metric.EquateUnitariesExactPhase(1e-9)))
	// Output:
	// true
	// false
}

// The trace distance of two pure states bounds how far any measurement's
// probabilities can move.
func ExampleStateDistance() {
	zero := []complex128{1, 0}
	plus := []complex128{1 / math.Sqrt2, 1 / math.Sqrt2}
	fmt.Printf("%.4f\n", metric.StateDistance(zero, plus))
	// Output:
	// 0.7071
}

// A diagonal unitary's eigenphases are the angles of its diagonal, sorted.
func ExampleEigenphases() {
	w := mat.NewCDense(3, 3, []complex128{
		1i, 0, 0,
		0, -1, 0,
		0, 0, complex(math.Sqrt2/2, math.Sqrt2/2),
	})
	for _, p := range metric.Eigenphases(w) {
		fmt.Printf("%.4f ", p)
	}
	fmt.Println()
	// Output:
	// 0.7854 1.5708 3.1416
}

// EquateStates compares state vectors up to global phase.
func ExampleEquateStates() {
	a := []complex128{1 / math.Sqrt2, 1i / math.Sqrt2}
	b := []complex128{-1 / math.Sqrt2, -1i / math.Sqrt2}
	fmt.Println(cmp.Equal(a, b, metric.EquateStates(1e-12)))
	fmt.Println(cmp.Equal(a, b, metric.EquateStatesExactPhase(1e-12)))
	// Output:
	// true
	// false
}

// Measuring after rx(θ) against measuring after nothing: the distributions differ by at most
// sin(θ/2) over all inputs (the Bloch vector turns by θ about x, so P(0) = (1 + z)/2 moves by at
// most sin(θ/2)), and a state on the y axis shows it. DistributionGap brackets that value.
func ExampleDistributionGap() {
	theta := 0.01
	c, s := math.Cos(theta/2), math.Sin(theta/2)
	rx := mat.NewCDense(2, 2, []complex128{complex(c, 0), complex(0, -s), complex(0, -s), complex(c, 0)})
	id := mat.NewCDense(2, 2, []complex128{1, 0, 0, 1})
	out := []int{0, 1} // basis state z reads as outcome z
	g := metric.DistributionGap(rx, id, out, out)
	fmt.Printf("sin(θ/2) = %.6f\n", s)
	fmt.Printf("found on an input: %.6f\n", g.Lower)
	fmt.Printf("certified bound:   %.6f\n", g.Upper)
	// Output:
	// sin(θ/2) = 0.005000
	// found on an input: 0.005000
	// certified bound:   0.005025
}
