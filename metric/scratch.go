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

func (s *scratch) complexes(k int) []complex128 { return take(s.c, &s.nc, k) }
func (s *scratch) floats(k int) []float64       { return take(s.f, &s.nf, k) }
func (s *scratch) ints(k int) []int             { return take(s.i, &s.ni, k) }

// take hands out the next k elements of buf, counting them in *used, or
// fresh memory if buf has no room left.
func take[T any](buf []T, used *int, k int) []T {
	if *used+k > len(buf) {
		return make([]T, k)
	}
	out := buf[*used : *used+k : *used+k]
	*used += k
	return out
}
