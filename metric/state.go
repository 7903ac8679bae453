package metric

import (
	"math"

	"gonum.org/v1/gonum/mat"
)

// StateDistance returns the trace distance ½‖|a⟩⟨a| − |b⟩⟨b|‖₁ of two pure
// states, sqrt(1 − |⟨a|b⟩|²): the difference of the two projectors has rank
// two and, in the plane of a and b, eigenvalues ±sqrt(1 − |⟨a|b⟩|²). It bounds how much
// any measurement's outcome probabilities can differ between the two states.
// The vectors are normalised first, so only their directions matter; global
// phase does not count. It is computed as the length of the part of b̂
// orthogonal to â, which keeps full accuracy for nearly equal states.
// a and b must have equal, non-zero length and be non-zero vectors.
func StateDistance(a, b []complex128) float64 {
	statePair("StateDistance", a, b)
	na, nb := stateNorms("StateDistance", a, b)
	s := unitInner(a, b, na, nb)
	var r2 float64
	for i, x := range b {
		d := x/complex(nb, 0) - s*a[i]/complex(na, 0)
		r2 += real(d)*real(d) + imag(d)*imag(d)
	}
	return math.Min(math.Sqrt(r2), 1)
}

// StateFidelity returns |⟨a|b⟩|², the fidelity of two pure states, after
// normalising both; 1 means equal up to global phase. a and b must have equal,
// non-zero length and be non-zero vectors.
func StateFidelity(a, b []complex128) float64 {
	statePair("StateFidelity", a, b)
	na, nb := stateNorms("StateFidelity", a, b)
	s := unitInner(a, b, na, nb)
	f := real(s)*real(s) + imag(s)*imag(s)
	return math.Min(f, 1)
}

// TraceDistance returns ½‖ρ − σ‖₁, half the sum of the absolute eigenvalues
// of ρ − σ, for two n×n density matrices (the trace distance of Nielsen &
// Chuang's chapter on distance measures). It is the
// largest difference in probability that any measurement can show between
// them. Both are trusted to be Hermitian; their difference is symmetrised
// before its eigenvalues are taken.
func TraceDistance(rho, sigma mat.CMatrix) float64 {
	n := pairSize("TraceDistance", rho, sigma)
	d, k := difference(rho, sigma)
	// Read column-major the buffer is (ρ − σ)ᵀ, Hermitian with the same
	// eigenvalues; average it with its adjoint on the lower triangle.
	for j := 0; j < n; j++ {
		for i := j; i < n; i++ {
			d[i+j*n] = (d[i+j*n] + conj(d[j+i*n])) / 2
		}
	}
	var sum float64
	for _, x := range hermitianValues(d, n) {
		sum += math.Abs(x)
	}
	return math.Ldexp(sum/2, k)
}

// inner returns ⟨a|b⟩ = Σ conj(a_i)·b_i; for two matrices stored the same
// way it is tr(a†b).
func inner(a, b []complex128) complex128 {
	var s complex128
	b = b[:len(a)]
	for i, x := range a {
		s += conj(x) * b[i]
	}
	return s
}

// unitInner returns ⟨â|b̂⟩ for the unit vectors â = a/na and b̂ = b/nb: each
// entry is divided by its vector's length before the product, so that
// states of any scale neither underflow nor overflow.
func unitInner(a, b []complex128, na, nb float64) complex128 {
	var s complex128
	b = b[:len(a)]
	for i, x := range a {
		y := b[i]
		s += complex(real(x)/na, -imag(x)/na) * complex(real(y)/nb, imag(y)/nb)
	}
	return s
}

// norm2 returns the Euclidean length of a. The sum of squares is taken with
// a scaled by a power of two into [0.5, 1) (see scaleExponent), so that it
// neither underflows for tiny vectors, which would make them look like the
// zero vector, nor overflows for huge ones.
func norm2(a []complex128) float64 {
	big := largestPart(a)
	if big == 0 || math.IsNaN(big) || math.IsInf(big, 0) {
		return big
	}
	e := scaleExponent(big)
	p, q := powerFactors(-e)
	var s float64
	for _, x := range a {
		re, im := real(x)*p*q, imag(x)*p*q
		s += re*re + im*im
	}
	return math.Ldexp(math.Sqrt(s), e)
}

// stateNorms returns the lengths of a and b, panicking if either is zero.
func stateNorms(fn string, a, b []complex128) (float64, float64) {
	na, nb := norm2(a), norm2(b)
	if na == 0 {
		inputPanic(fn, "first state is the zero vector")
	}
	if nb == 0 {
		inputPanic(fn, "second state is the zero vector")
	}
	return na, nb
}
