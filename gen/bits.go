package gen

import (
	"math"
	"math/bits"
	"math/rand/v2"
	"sync"

	"pgregory.net/rapid"
)

// Unbiased randomness drawn through rapid.
//
// rapid's integer generators lean on purpose toward small and boundary
// values: rapid.Uint64 (v1.3.0) first draws a bit length from a geometric
// law with mean about 17, so roughly one draw in 17 is 0 or 1 (read from
// rapid's utils.go, genUintNBiased). That is what a property test wants for
// sizes, but a sampler that must follow an exact law (Haar, uniform over the
// Clifford group, the user's gate weights) would inherit the lean and return
// the same few values again and again.
//
// This file draws without that lean from two rapid generators:
//
//   - rapid.Bool reads exactly one bit of rapid's random stream. Small ranges
//     (up to 8 values) are drawn bit by bit, with rejection.
//   - rapid.Float64Range(2^52, 2^52+n+1) spans a single binade, where the
//     float64 values are the integers. rapid fixes the exponent and draws the
//     significand unbiased, with rejection, as one block of its stream
//     (floats.go, genUfloatRange, the case minExp == maxExp) except in two
//     cases it uses to reach the ends of a range: about one draw in 9 is
//     exactly the minimum and one in 40 exactly the maximum (the overflow
//     flags of genUintNBiased for the exponent). Rejecting both ends leaves
//     an integer uniform on the n values between them. A draw then costs the
//     shrinker one group instead of one per bit.
//
// The statistical tests of this package check these claims on values drawn
// inside rapid.Check (they fail if the ends are not rejected). rapid's
// shrinker lowers recorded blocks toward zero, so every value built here
// shrinks toward index 0 or seed 0.

// bit is rapid's one-bit generator.
var bit = rapid.Bool()

// binade is 2^52: from there to 2^53 the float64 values are the integers.
const binade = 1 << 52

// below caches the generators of drawBelow by range size.
var below sync.Map // int → *rapid.Generator[float64]

// drawBelow returns an integer uniform on [0, n) for 1 ≤ n ≤ 2^52 − 2 (0 for
// n ≤ 1, with nothing drawn). It shrinks toward 0.
func drawBelow(t *rapid.T, n int) int {
	switch {
	case n <= 1:
		return 0
	case n <= 8:
		k := bits.Len(uint(n - 1))
		for {
			u := 0
			for range k {
				u <<= 1
				if bit.Draw(t, "bit") {
					u |= 1
				}
			}
			if u < n {
				return u
			}
		}
	}
	g, ok := below.Load(n)
	if !ok {
		g, _ = below.LoadOrStore(n, rapid.Float64Range(binade, binade+float64(n+1)))
	}
	for {
		v := int(g.(*rapid.Generator[float64]).Draw(t, "index") - binade)
		if v > 0 && v <= n {
			return v - 1
		}
	}
}

// drawUint64 returns 64 uniform, independent bits.
func drawUint64(t *rapid.T) uint64 {
	hi := uint64(drawBelow(t, math.MaxUint32+1))
	lo := uint64(drawBelow(t, math.MaxUint32+1))
	return hi<<32 | lo
}

// drawWeighted returns index i with probability weights[i]/Σweights, every
// weight ≥ 0 and their sum positive. Lower indices are where it shrinks to.
func drawWeighted(t *rapid.T, weights []int) int {
	total := 0
	for _, w := range weights {
		total += w
	}
	r := drawBelow(t, total)
	for i, w := range weights {
		if r < w {
			return i
		}
		r -= w
	}
	panic("gen: unreachable: weights changed during a draw")
}

// sourceStream is the second PCG word. Any fixed odd constant serves; this one
// is the 64-bit golden-ratio constant, common practice for seeding.
const sourceStream = 0x9e3779b97f4a7c15

// drawSource returns a private PCG generator seeded by 64 uniform bits drawn
// through rapid. Samplers that need many continuous variates (Gaussian
// entries of a Haar matrix) read them from it: each variate then follows its
// law exactly, whatever rapid's biases, and shrinking moves the seed toward 0,
// whose output is as Haar-distributed as any other seed's.
func drawSource(t *rapid.T) *rand.Rand {
	return rand.New(rand.NewPCG(drawUint64(t), sourceStream))
}
