package gen

import (
	"fmt"
	"math"
	"math/cmplx"
	"math/rand/v2"

	"gonum.org/v1/gonum/mat"
	"pgregory.net/rapid"
)

// MaxUnitaryQubits is the widest register Unitary accepts. A 10-qubit draw
// already costs seconds (the QR is cubic in 2^n) and a 12-qubit matrix holds
// 256 MiB.
const MaxUnitaryQubits = 12

// MaxStateQubits is the widest register State accepts (2^24 amplitudes hold
// 256 MiB).
const MaxStateQubits = 24

// Unitary returns a generator of 2^qubits × 2^qubits unitaries distributed by
// Haar measure: the QR factorization of a matrix of independent standard
// complex Gaussian entries, with the phases of R's diagonal moved into Q
// (Mezzadri, "How to generate random matrices from the classical compact
// groups", Notices AMS 54 (2007) 592–604). Without that phase fix the result
// is not Haar.
//
// The Gaussian entries come from a private generator seeded by 64 uniform bits
// drawn through rapid, not from rapid's own floats, which lean toward special
// values; so values drawn in a property test follow Haar measure exactly, and
// a failing case shrinks toward the matrix of seed 0, which is as generic as
// any other.
//
// Row and column indices follow qcheck's convention (qubit 0 is the least
// significant bit of the index). If qubits is outside [0, MaxUnitaryQubits],
// every draw fails the test with an error saying so.
func Unitary(qubits int) *rapid.Generator[*mat.CDense] {
	if err := checkQubits("Unitary", qubits, MaxUnitaryQubits); err != nil {
		return failing[*mat.CDense](err)
	}
	d := 1 << qubits
	return rapid.Custom(func(t *rapid.T) *mat.CDense {
		return haarUnitary(drawSource(t), d)
	})
}

// haarUnitary returns a d×d Haar unitary built from rng's Gaussians.
func haarUnitary(rng *rand.Rand, d int) *mat.CDense {
	a := make([]complex128, d*d)
	for i := range a {
		a[i] = complex(rng.NormFloat64(), rng.NormFloat64())
	}
	q, rdiag := householderQR(a, d)

	// Mezzadri's fix: Q·Λ with Λ = diag(R_kk/|R_kk|) is the Q of the unique
	// factorization whose R has a positive diagonal, and that Q is Haar.
	data := make([]complex128, d*d)
	for j := range d {
		phase := complex(1, 0)
		if r := cmplx.Abs(rdiag[j]); r != 0 {
			phase = rdiag[j] / complex(r, 0)
		}
		col := q[j*d : (j+1)*d]
		for i, e := range col {
			data[i*d+j] = e * phase
		}
	}
	return mat.NewCDense(d, d, data)
}

// State returns a generator of Haar-random pure states of the given number of
// qubits: unit vectors of length 2^qubits, distributed uniformly on the
// complex sphere (a vector of independent standard complex Gaussians divided
// by its norm; Mezzadri 2007, §2). As with Unitary, the Gaussians come from a
// private generator seeded through rapid, so drawn states follow the law
// exactly. Index i holds the amplitude of the basis state whose bit q is
// qubit q. If qubits is outside [0, MaxStateQubits], every draw fails the
// test with an error saying so.
func State(qubits int) *rapid.Generator[[]complex128] {
	if err := checkQubits("State", qubits, MaxStateQubits); err != nil {
		return failing[[]complex128](err)
	}
	d := 1 << qubits
	return rapid.Custom(func(t *rapid.T) []complex128 {
		return haarState(drawSource(t), d)
	})
}

// haarState returns a uniformly distributed unit vector of length d.
func haarState(rng *rand.Rand, d int) []complex128 {
	psi := make([]complex128, d)
	for {
		var norm2 float64
		for i := range psi {
			re, im := rng.NormFloat64(), rng.NormFloat64()
			psi[i] = complex(re, im)
			norm2 += re*re + im*im
		}
		if norm2 == 0 {
			continue // probability zero; draw again rather than divide by 0
		}
		s := complex(1/math.Sqrt(norm2), 0)
		for i := range psi {
			psi[i] *= s
		}
		return psi
	}
}

// checkQubits returns an error naming the generator when qubits is out of
// [0, max].
func checkQubits(name string, qubits, max int) error {
	if qubits < 0 || qubits > max {
		return fmt.Errorf("gen.%s: qubits = %d, want 0 ≤ qubits ≤ %d", name, qubits, max)
	}
	return nil
}
