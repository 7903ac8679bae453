package sim

import (
	"math"
	"slices"
	"strings"
)

// Outcomes is the probability distribution of a program's classical bits at its end: the result
// of a program as OpenQASM 2.0 defines it (every qubit and bit starts at 0; the registers are read
// when the program ends). An outcome is written as a string of '0' and '1', bit n−1 first and bit
// 0 last, as OpenQASM prints a register.
type Outcomes struct {
	bits  int
	dense []float64          // for up to denseBits bits: the probability of outcome x at index x
	p     map[string]float64 // otherwise, by packed bits: bit i in byte i/8 at position i%8

	// Dropped is the total probability of the branches the engine dropped as impossible: each had
	// probability below PruneBelow, and they are the only mass missing from the distribution.
	Dropped float64
}

// PruneBelow is the probability under which a measurement branch counts as impossible. Rounding
// leaves about 1e-32 on a branch that is exactly impossible; a branch as unlikely as 1e-20 changes
// no distance by more than that, and Outcomes.Dropped says how much was dropped in all.
const PruneBelow = 1e-20

// Outcomes are kept in an array indexed by the outcome when there are few bits, or when there are
// up to denseBits and many of them are random (a program that measures 20 qubits at the end has
// a million outcomes, and a map of them costs seconds where an array costs milliseconds); in a
// map otherwise.
const (
	smallBits = 16
	denseBits = 24 // 128 MiB
)

// newOutcomes returns an empty distribution over the given number of bits, of which up to
// random may take both values.
func newOutcomes(bits, random int) *Outcomes {
	if bits <= smallBits || bits <= denseBits && random > smallBits {
		return &Outcomes{bits: bits, dense: make([]float64, 1<<bits)}
	}
	return &Outcomes{bits: bits, p: map[string]float64{}}
}

// add adds probability p to the outcome with packed bits key.
func (o *Outcomes) add(key []byte, p float64) {
	if o.dense != nil {
		o.dense[denseIndex(key)] += p
		return
	}
	o.p[string(key)] += p
}

func denseIndex(key []byte) int {
	x := 0
	for i, b := range key {
		x |= int(b) << (8 * i)
	}
	return x
}

// sparse returns the nonzero probabilities keyed by packed bits, the keys as long as bits need.
func (o *Outcomes) sparse(bits int) map[string]float64 {
	n := (bits + 7) / 8
	out := make(map[string]float64)
	add := func(k string, p float64) {
		if len(k) < n {
			k += strings.Repeat("\x00", n-len(k))
		}
		out[k] = p
	}
	if o.dense == nil {
		if n == (o.bits+7)/8 {
			return o.p
		}
		for k, p := range o.p {
			add(k, p)
		}
		return out
	}
	for x, p := range o.dense {
		if p != 0 {
			add(string(binaryKey(x, o.bits)), p)
		}
	}
	return out
}

// Bits returns the number of classical bits an outcome has.
func (o *Outcomes) Bits() int { return o.bits }

// Len returns the number of outcomes with nonzero probability.
func (o *Outcomes) Len() int {
	if o.dense == nil {
		return len(o.p)
	}
	n := 0
	for _, p := range o.dense {
		if p != 0 {
			n++
		}
	}
	return n
}

// Probability returns the probability of an outcome written bit n−1 first ("101" is bit 0 and
// bit 2 set). Outcomes of the wrong length or with other characters have probability 0.
func (o *Outcomes) Probability(outcome string) float64 {
	if len(outcome) != o.bits || strings.Trim(outcome, "01") != "" {
		return 0
	}
	k := make([]byte, (o.bits+7)/8)
	for i := 0; i < o.bits; i++ {
		if outcome[o.bits-1-i] == '1' {
			k[i/8] |= 1 << (i % 8)
		}
	}
	if o.dense != nil {
		return o.dense[denseIndex(k)]
	}
	return o.p[string(k)]
}

// Support returns the outcomes with nonzero probability, sorted.
func (o *Outcomes) Support() []string {
	var out []string
	for k := range o.sparse(o.bits) {
		out = append(out, bitsString(k, o.bits))
	}
	slices.Sort(out)
	return out
}

// bitsString writes packed bits, bit n−1 first.
func bitsString(k string, n int) string {
	s := make([]byte, n)
	for i := 0; i < n; i++ {
		s[n-1-i] = '0'
		if i/8 < len(k) && k[i/8]>>(i%8)&1 == 1 {
			s[n-1-i] = '1'
		}
	}
	return string(s)
}

// OutcomeGap is how far apart two outcome distributions are: their total-variation distance
//
//	TV(p, q) = ½ Σ_x |p(x) − q(x)|,
//
// the largest difference in probability the two give to any set of outcomes, and the single
// outcome whose probabilities differ most.
type OutcomeGap struct {
	// Distance is the total-variation distance, computed from every outcome (not sampled).
	Distance float64
	// Outcome is the outcome with the largest |Want − Got|, bit n−1 first; empty when the
	// distributions are equal.
	Outcome string
	// Want and Got are the probabilities the two distributions give Outcome.
	Want, Got float64
	// Rounding bounds |Distance − d| for the distance d of the programs as written, beyond
	// floating-point rounding: the stabilizer engine takes angles within CliffordTolerance of
	// multiples of π/2 at those multiples, and the branch engine drops branches below
	// PruneBelow (missing mass m in one distribution moves the distance by at most m/2). 0 when
	// neither happened, NaN when a custom gate leaves the bound unknown.
	Rounding float64
}

// TotalVariation returns the exact total-variation distance between two outcome distributions
// and the outcome whose probability differs most. A distribution with fewer bits is read as
// having the missing high bits at 0: a bit no program writes stays at its initial 0.
func TotalVariation(want, got *Outcomes) OutcomeGap {
	bits := max(want.bits, got.bits)
	var g OutcomeGap
	sum, best := 0.0, 0.0
	var bestKey string
	if want.dense != nil && got.dense != nil && want.bits == got.bits {
		bestX := 0
		for x, a := range want.dense {
			b := got.dense[x]
			d := math.Abs(a - b)
			sum += d
			if d > best {
				best, bestX, g.Want, g.Got = d, x, a, b
			}
		}
		bestKey = string(binaryKey(bestX, bits))
	} else {
		wp, gp := want.sparse(bits), got.sparse(bits)
		consider := func(k string, a, b float64) {
			d := math.Abs(a - b)
			sum += d
			if d > best || d == best && d > 0 && k < bestKey {
				best, bestKey, g.Want, g.Got = d, k, a, b
			}
		}
		for k, a := range wp {
			consider(k, a, gp[k])
		}
		for k, b := range gp {
			if _, ok := wp[k]; !ok {
				consider(k, 0, b)
			}
		}
	}
	g.Distance = min(1, sum/2)
	if best == 0 {
		return OutcomeGap{Distance: g.Distance}
	}
	g.Outcome = bitsString(bestKey, bits)
	return g
}

// binaryKey packs the low bits of x as an outcome key.
func binaryKey(x, bits int) []byte {
	k := make([]byte, (bits+7)/8)
	for i := range k {
		k[i] = byte(x >> (8 * i))
	}
	return k
}
