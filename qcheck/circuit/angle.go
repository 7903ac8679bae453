package circuit

import (
	"math"
	"math/big"
	"sync"
)

// Angles of any size. A float64 angle is an exact rational number, but floating-point arithmetic
// on it is not exact: x − round(x/(π/2))·π/2 computed in float64 loses every digit of the offset
// once x passes about 10³ rad, and cos(φ+λ) overflows to NaN for angles near 1e308. The functions
// here reduce an angle against π exactly enough: with x < 2^e they work with e + 192 bits, so the
// offset carries an absolute error below 2^−190 before it is rounded once to float64, and π is
// held to 1,344 bits, more than the 1,024 + 192 the largest float64 needs. The tests check the
// offsets against mpmath at 2,000 bits (testdata/angles.py).

// piPrec is the precision, in bits, of the π used to reduce angles.
const piPrec = 1344

// bigPi is π to piPrec bits, from Machin's formula π = 16·atan(1/5) − 4·atan(1/239) (Beckmann, A
// History of π, ch. 13), each arctangent summed from its Taylor series until the terms vanish.
var bigPi = sync.OnceValue(func() *big.Float {
	const work = piPrec + 64
	atanInv := func(n int64) *big.Float {
		// atan(1/n) = Σ_k (−1)^k / ((2k+1)·n^(2k+1)).
		sum := new(big.Float).SetPrec(work)
		pow := new(big.Float).SetPrec(work).Quo(big.NewFloat(1).SetPrec(work), new(big.Float).SetPrec(work).SetInt64(n))
		n2 := new(big.Float).SetPrec(work).SetInt64(n * n)
		term := new(big.Float).SetPrec(work)
		eps := new(big.Float).SetPrec(work).SetMantExp(big.NewFloat(1), -work)
		for k := int64(0); ; k++ {
			term.Quo(pow, new(big.Float).SetPrec(work).SetInt64(2*k+1))
			if term.Cmp(eps) < 0 {
				break
			}
			if k%2 == 0 {
				sum.Add(sum, term)
			} else {
				sum.Sub(sum, term)
			}
			pow.Quo(pow, n2)
		}
		return sum
	}
	a := atanInv(5)
	a.Mul(a, big.NewFloat(16))
	b := atanInv(239)
	b.Mul(b, big.NewFloat(4))
	return new(big.Float).SetPrec(piPrec).Sub(a, b)
})

// QuarterTurns writes the exact sum x of the given finite angles (usually one) as
// x = K·π/2 + offset with K the nearest integer to x/(π/2). The offset is the exact value rounded
// once to float64, so it is right to within half an ulp even when x is 1e308. It returns K mod 8,
// in 0…7, which is all of K that matters: every gate of the library is periodic with period
// 4π = 8·π/2 in each angle. For a NaN or infinite angle it returns 0 and NaN.
func QuarterTurns(angles ...float64) (k int, offset float64) {
	// Any sum of float64s is exact with 2,200 bits: their bits span 2^1024 down to 2^−1074.
	x := new(big.Float).SetPrec(2200)
	for _, a := range angles {
		if math.IsNaN(a) || math.IsInf(a, 0) {
			return 0, math.NaN()
		}
		x.Add(x, big.NewFloat(a))
	}
	if x.Sign() == 0 {
		return 0, 0
	}
	neg := x.Signbit()
	x.Abs(x)
	e := x.MantExp(nil) // x < 2^e
	prec := uint(max(e, 0)) + 192
	halfPi := new(big.Float).SetPrec(prec).SetMantExp(bigPi(), -1)
	q := new(big.Float).SetPrec(prec).Quo(x, halfPi)
	q.Add(q, big.NewFloat(0.5))
	kk, _ := q.Int(nil) // floor(x/(π/2) + ½), x > 0
	r := new(big.Float).SetPrec(prec).SetInt(kk)
	r.Mul(r, halfPi)
	r.Sub(x, r)
	offset, _ = r.Float64()
	k = int(new(big.Int).And(kk, big.NewInt(7)).Int64())
	if neg {
		k, offset = (8-k)%8, -offset
	}
	return k, offset
}

// ReduceAngle returns an angle equal to x modulo 4π, in [−4π, 4π], computed exactly and rounded
// once: it is x itself when |x| ≤ 4π, and otherwise K·π/2 + offset with K and offset from
// QuarterTurns and K brought to −3…4. Gate matrices are computed from reduced angles, so that an
// angle of any finite size gives the right matrix (and never NaN).
func ReduceAngle(x float64) float64 {
	if math.Abs(x) <= 4*math.Pi || math.IsNaN(x) || math.IsInf(x, 0) {
		return x
	}
	k, offset := QuarterTurns(x)
	if k > 4 {
		k -= 8
	}
	return float64(k)*(math.Pi/2) + offset
}

// reduceAngles returns the angles reduced by ReduceAngle, sharing p when none changes.
func reduceAngles(p []float64) []float64 {
	out := p
	for i, x := range p {
		if r := ReduceAngle(x); r != x {
			if &out[0] == &p[0] {
				out = append([]float64(nil), p...)
			}
			out[i] = r
		}
	}
	return out
}
