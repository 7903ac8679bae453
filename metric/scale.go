package metric

import "math"

// negligible is the size, relative to the largest entry of a matrix scaled
// into [0.5, 1), below which a real or imaginary part is set to zero before
// the matrix is reduced or handed to gonum's LAPACK.
//
// Why: entries hundreds of orders of magnitude below the rest (a rotation by
// 1e-300 in a circuit, a subnormal rounding residue) break the eigenvalue
// routines on their way through. A Householder reflector built on a column
// of them divides by its subnormal length and overflows to NaN, and gonum's
// Dsterf rescales a block whose norm is below sqrt(safe minimum)/ε² (about
// 1e-122) through Dlascl with a leading dimension the block's storage cannot
// satisfy, which panics ("insufficient length of a"). With the matrix scaled
// into [0.5, 1) and every part below 2^-300 (about 5e-91) set to zero, every
// block Dsterf sees has norm at least 2^-300, products of two surviving parts
// stay in the normal range, and neither path is taken.
//
// Why it changes nothing beyond rounding: setting parts below δ·max|a_ij| to
// zero perturbs the matrix by E with ‖E‖₂ ≤ ‖E‖_F ≤ √2·n·δ·max|a_ij| ≤
// √2·n·δ·‖A‖₂, so by Weyl's inequality (Golub & Van Loan, Matrix
// Computations, 4th ed., Cor. 8.1.6) no eigenvalue moves by more than that,
// and a singular value no more either (Theorem 8.6.2 there). With δ = 2^-300
// this is below 2^-280·‖A‖ for any n up to 2^19, some 2^228 times smaller
// than the rounding ε·‖A‖ the Householder reduction already commits
// (backward stable, §8.3.1 there). Scaling by a power of two is exact.
const negligible = 0x1p-300

// largestPart returns the largest |real| or |imaginary| part in z, NaN if
// z holds a NaN, +Inf if it holds an infinity.
func largestPart(z []complex128) float64 {
	big := 0.0
	for _, x := range z {
		re, im := math.Abs(real(x)), math.Abs(imag(x))
		if re > big {
			big = re
		}
		if im > big {
			big = im
		}
		if re != re || im != im {
			return math.NaN()
		}
	}
	return big
}

// largestAbs returns the largest |x| in x, NaN if x holds a NaN.
func largestAbs(x []float64) float64 {
	big := 0.0
	for _, v := range x {
		if v != v {
			return math.NaN()
		}
		big = math.Max(big, math.Abs(v))
	}
	return big
}

// scaleExponent returns e with big = f·2^e, f in [0.5, 1), so that
// multiplying by 2^-e brings big into [0.5, 1); 0 for zero, NaN or ±Inf,
// which are left as they are.
func scaleExponent(big float64) int {
	if big == 0 || math.IsNaN(big) || math.IsInf(big, 0) {
		return 0
	}
	_, e := math.Frexp(big)
	return e
}

// powerFactors splits 2^k into two finite factors, for any k an exponent
// of scaleExponent can give (|k| ≤ 1075): multiplying by one and then the
// other is exact wherever the result is a normal number.
func powerFactors(k int) (p, q float64) {
	return math.Ldexp(1, k/2), math.Ldexp(1, k-k/2)
}

// scaleParts multiplies every entry of z by 2^k and then sets each part
// below negligible to zero.
func scaleParts(z []complex128, k int) {
	p, q := powerFactors(k)
	for i, x := range z {
		re, im := real(x), imag(x)
		if k != 0 {
			re, im = re*p*q, im*p*q
		}
		if math.Abs(re) < negligible {
			re = 0
		}
		if math.Abs(im) < negligible {
			im = 0
		}
		z[i] = complex(re, im)
	}
}

// scaleFloats multiplies every element of x by 2^k; with flush set it then
// sets those below negligible to zero.
func scaleFloats(x []float64, k int, flush bool) {
	p, q := powerFactors(k)
	for i, v := range x {
		if k != 0 {
			v = v * p * q
		}
		if flush && math.Abs(v) < negligible {
			v = 0
		}
		x[i] = v
	}
}
