package gen

import (
	"math/bits"
	"math/rand/v2"

	"pgregory.net/rapid"
)

// Unbiased randomness drawn through rapid.
//
// rapid's integer and float generators lean on purpose toward small and
// boundary values: rapid.Uint64 (v1.3.0) first draws a bit length from a
// geometric law with mean about 17, so roughly one draw in 17 is 0 or 1
// (read from rapid's utils.go, genUintNBiased). That is what a property test
// wants for sizes and indices, but a sampler that must follow an exact law
// (Haar, uniform over the Clifford group, user weights) would inherit the lean
// and return the same few values again and again.
//
// rapid.Bool reads exactly one bit of rapid's random stream, so a run of Bool
// draws is a uniform bit string; and rapid's shrinker lowers recorded bits
// toward zero, so the values built here still shrink (toward index 0, seed 0).

// bit is the one-bit generator every unbiased draw is built from.
var bit = rapid.Bool()

// drawBits returns an n-bit unsigned integer (n ≤ 64) whose bits are uniform
// and independent, most significant bit drawn first.
func drawBits(t *rapid.T, n int) uint64 {
	var u uint64
	for range n {
		u <<= 1
		if bit.Draw(t, "bit") {
			u |= 1
		}
	}
	return u
}

// drawBelow returns an integer uniform on [0, n) for n ≥ 1, by rejection from
// the smallest power of two that holds n values. It shrinks toward 0.
func drawBelow(t *rapid.T, n int) int {
	if n <= 1 {
		return 0
	}
	k := bits.Len(uint(n - 1))
	for {
		if u := drawBits(t, k); u < uint64(n) {
			return int(u)
		}
	}
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
	return rand.New(rand.NewPCG(drawBits(t, 64), sourceStream))
}
