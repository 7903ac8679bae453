package sim

import (
	"math"
	"math/cmplx"
	"testing"

	"gonum.org/v1/gonum/mat"
	"qcheck.dev/qcheck/circuit"
)

// dft returns the d×d discrete Fourier transform F_jk = ω^{jk}/√d, ω = e^{2πi/d}: the quantum
// Fourier transform of N&C §5.1, eq. 5.1, as a matrix on basis indices.
func dft(d int) *mat.CDense {
	m := mat.NewCDense(d, d, nil)
	for j := 0; j < d; j++ {
		for k := 0; k < d; k++ {
			m.Set(j, k, cmplx.Exp(complex(0, 2*math.Pi*float64(j*k)/float64(d)))/complex(math.Sqrt(float64(d)), 0))
		}
	}
	return m
}

// A custom gate is applied in the textbook order of its operands (package circuit's documentation): the DFT on operands
// (n−1, …, 1, 0) has local index equal to the basis index, so the circuit's unitary is the DFT
// itself; on operands (0, 1, …, n−1) it is the DFT with the bits of rows and columns reversed.
// The 3- and 4-qubit DFTs are dense, so they run through the general sparse kernel, including
// the case with more local states than its stack buffer holds.
func TestCustomGateOrder(t *testing.T) {
	for _, n := range []int{3, 4} {
		d := 1 << n
		f := dft(d)
		g, err := circuit.Custom("qft", f)
		if err != nil {
			t.Fatal(err)
		}
		down, up := make([]int, n), make([]int, n)
		for i := range n {
			down[i], up[i] = n-1-i, i
		}
		reverse := func(x int) int {
			r := 0
			for i := range n {
				r |= (x >> i & 1) << (n - 1 - i)
			}
			return r
		}
		u := unitaryOf(t, circuit.New(n).Append(g, down...))
		v := unitaryOf(t, circuit.New(n).Append(g, up...))
		worst := 0.0
		for i := 0; i < d; i++ {
			for j := 0; j < d; j++ {
				worst = math.Max(worst, cmplx.Abs(u.At(i, j)-f.At(i, j)))
				worst = math.Max(worst, cmplx.Abs(v.At(i, j)-f.At(reverse(i), reverse(j))))
			}
		}
		if worst > 1e-12 {
			t.Errorf("%d-qubit DFT as a custom gate: off by %.3g", n, worst)
		}
	}
}
