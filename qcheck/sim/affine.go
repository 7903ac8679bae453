package sim

import (
	"math"
	"math/bits"
	"slices"
)

// affineSet is a set of bit strings x0 + span(basis) over GF(2), kept in reduced echelon form so
// that equal sets have equal representations: each basis vector has a pivot (its lowest set bit)
// that no other vector and not the offset has, and the basis is sorted by pivot.
type affineSet struct {
	bits   int
	offset []uint64
	basis  [][]uint64
	pivots []int
}

// newAffineSet returns offset + span(gens) in reduced form; it keeps none of its arguments.
func newAffineSet(nbits int, offset []uint64, gens [][]uint64) *affineSet {
	s := &affineSet{bits: nbits, offset: slices.Clone(offset)}
	for _, g := range gens {
		s.add(slices.Clone(g))
	}
	s.offset = s.reduce(s.offset)
	return s
}

// add puts v into the span, keeping the form reduced. v is reused.
func (s *affineSet) add(v []uint64) {
	v = s.reduce(v)
	p := lowestBit(v)
	if p < 0 {
		return
	}
	for _, b := range s.basis {
		if b[p/64]>>(p%64)&1 == 1 {
			xorInto(b, v)
		}
	}
	i, _ := slices.BinarySearch(s.pivots, p)
	s.pivots = slices.Insert(s.pivots, i, p)
	s.basis = slices.Insert(s.basis, i, v)
}

// reduce clears v's bits at every pivot, in place, and returns it.
func (s *affineSet) reduce(v []uint64) []uint64 {
	for i, p := range s.pivots {
		if v[p/64]>>(p%64)&1 == 1 {
			xorInto(v, s.basis[i])
		}
	}
	return v
}

func (s *affineSet) dim() int { return len(s.basis) }

// inSpan reports whether v lies in the span of the basis.
func (s *affineSet) inSpan(v []uint64) bool { return lowestBit(s.reduce(slices.Clone(v))) < 0 }

// contains reports whether x is in the set.
func (s *affineSet) contains(x []uint64) bool {
	d := slices.Clone(x)
	xorInto(d, s.offset)
	return s.inSpan(d)
}

// equal reports whether two sets (of the same length of strings) are the same set.
func (s *affineSet) equal(t *affineSet) bool {
	if !slices.Equal(s.pivots, t.pivots) || !slices.Equal(s.offset, t.offset) {
		return false
	}
	for i := range s.basis {
		if !slices.Equal(s.basis[i], t.basis[i]) {
			return false
		}
	}
	return true
}

// subset reports whether every point of s is in t.
func (s *affineSet) subset(t *affineSet) bool {
	if !t.contains(s.offset) {
		return false
	}
	for _, b := range s.basis {
		if !t.inSpan(b) {
			return false
		}
	}
	return true
}

// outside returns a point of s that is not in t, or nil when s ⊆ t.
func (s *affineSet) outside(t *affineSet) []uint64 {
	if !t.contains(s.offset) {
		return slices.Clone(s.offset)
	}
	for _, b := range s.basis {
		if !t.inSpan(b) {
			x := slices.Clone(s.offset)
			xorInto(x, b)
			return x
		}
	}
	return nil
}

// intersectionDim returns the dimension of s ∩ t, or −1 when they are disjoint. Two affine sets
// meet exactly when the difference of their offsets lies in the sum of their spans, and then
// their intersection is a coset of the intersection of the spans, whose dimension is
// dim s + dim t − dim(span s + span t).
func (s *affineSet) intersectionDim(t *affineSet) int {
	sum := newAffineSet(s.bits, make([]uint64, len(s.offset)), append(slices.Clone(s.basis), t.basis...))
	d := slices.Clone(s.offset)
	xorInto(d, t.offset)
	if !sum.inSpan(d) {
		return -1
	}
	return s.dim() + t.dim() - sum.dim()
}

// uniformGap returns the gap between the uniform distributions on two sets of strings: with
// |A| = 2^a ≥ |B| = 2^b,
//
//	TV = ½ (|A∖B|·2^−a + |B∖A|·2^−b + |A∩B|·(2^−b − 2^−a)) = 1 − |A∩B| / |A|,
//
// and the outcome with the largest gap: a point of the smaller set outside the larger (gap
// 2^−b), else one of the larger outside the smaller (2^−a) or one of the smaller, which then lies
// in both (2^−b − 2^−a), whichever is larger.
func uniformGap(a, b *affineSet) OutcomeGap {
	if a.equal(b) {
		return OutcomeGap{}
	}
	pa, pb := math.Ldexp(1, -a.dim()), math.Ldexp(1, -b.dim())
	var g OutcomeGap
	if d := a.intersectionDim(b); d < 0 {
		g.Distance = 1
	} else {
		g.Distance = 1 - math.Ldexp(1, d-max(a.dim(), b.dim()))
	}
	best := -1.0
	try := func(x []uint64, gap float64) {
		if x != nil && gap > best {
			best = gap
			g.Outcome = bitsString(string(wordsKey(x, a.bits)), a.bits)
			g.Want, g.Got = 0, 0
			if a.contains(x) {
				g.Want = pa
			}
			if b.contains(x) {
				g.Got = pb
			}
		}
	}
	try(a.outside(b), pa)
	try(b.outside(a), pb)
	if a.subset(b) {
		try(a.offset, math.Abs(pa-pb))
	}
	if b.subset(a) {
		try(b.offset, math.Abs(pa-pb))
	}
	return g
}

// wordsKey packs a string of bits held 64 to a word as an outcome key, 8 to a byte.
func wordsKey(x []uint64, bits int) []byte {
	key := make([]byte, (bits+7)/8)
	for i := range key {
		key[i] = byte(x[i/8] >> (8 * (i % 8)))
	}
	return key
}

func xorInto(dst, src []uint64) {
	for i := range dst {
		dst[i] ^= src[i]
	}
}

func lowestBit(v []uint64) int {
	for i, w := range v {
		if w != 0 {
			return 64*i + bits.TrailingZeros64(w)
		}
	}
	return -1
}
