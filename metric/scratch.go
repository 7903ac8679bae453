package metric

import "sync"

// scratch is working memory for one computation. It is pooled so that the
// many small calls a property test makes do not allocate afresh each time.
// Slices handed out by take are not cleared: every user writes before it
// reads.
type scratch struct {
	c  []complex128
	f  []float64
	i  []int
	nc int // complex elements handed out so far
	nf int
	ni int
}

var scratchPool sync.Pool

// getScratch returns pooled scratch with room for nc complex, nf real and
// ni integer elements.
func getScratch(nc, nf, ni int) *scratch {
	s, _ := scratchPool.Get().(*scratch)
	if s == nil {
		s = new(scratch)
	}
	if cap(s.c) < nc {
		s.c = make([]complex128, nc)
	}
	if cap(s.f) < nf {
		s.f = make([]float64, nf)
	}
	if cap(s.i) < ni {
		s.i = make([]int, ni)
	}
	s.c, s.f, s.i = s.c[:cap(s.c)], s.f[:cap(s.f)], s.i[:cap(s.i)]
	s.nc, s.nf, s.ni = 0, 0, 0
	return s
}

// release returns s to the pool; nothing taken from it may be used after.
func (s *scratch) release() { scratchPool.Put(s) }

func (s *scratch) complexes(k int) []complex128 {
	if s.nc+k > len(s.c) {
		return make([]complex128, k) // more than reserved: fall back to the heap
	}
	out := s.c[s.nc : s.nc+k : s.nc+k]
	s.nc += k
	return out
}

func (s *scratch) floats(k int) []float64 {
	if s.nf+k > len(s.f) {
		return make([]float64, k)
	}
	out := s.f[s.nf : s.nf+k : s.nf+k]
	s.nf += k
	return out
}

func (s *scratch) ints(k int) []int {
	if s.ni+k > len(s.i) {
		return make([]int, k)
	}
	out := s.i[s.ni : s.ni+k : s.ni+k]
	s.ni += k
	return out
}
