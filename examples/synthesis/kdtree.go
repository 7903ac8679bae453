package synthesis

import "sort"

// kdTree finds the nearest of a fixed set of points of R⁴ in Euclidean distance. For unit
// quaternions ‖p − q‖² = 2 − 2·p·q, so the Euclidean nearest of ±q is the phase-free nearest.
type kdTree struct {
	points []quat
	// order is a permutation of the points laid out as an implicit balanced tree: the median of
	// order[lo:hi] sits at mid = (lo+hi)/2 and splits on axis depth mod 4.
	order []int
}

func newKDTree(points []quat) kdTree {
	t := kdTree{points: points, order: make([]int, len(points))}
	for i := range t.order {
		t.order[i] = i
	}
	t.build(0, len(points), 0)
	return t
}

func (t *kdTree) build(lo, hi, depth int) {
	if hi-lo <= 1 {
		return
	}
	axis := depth % 4
	part := t.order[lo:hi]
	sort.Slice(part, func(i, j int) bool { return t.points[part[i]][axis] < t.points[part[j]][axis] })
	mid := (lo + hi) / 2
	t.build(lo, mid, depth+1)
	t.build(mid+1, hi, depth+1)
}

// nearest returns the index of the point closest to q and the squared distance, or −1 when no
// point is closer than the squared distance bound (start with 5: unit quaternions are at most 2
// apart, so 4 is the largest squared distance).
func (t *kdTree) nearest(q quat, bound float64) (int, float64) {
	best, bestD := -1, bound
	var search func(lo, hi, depth int)
	search = func(lo, hi, depth int) {
		if lo >= hi {
			return
		}
		mid := (lo + hi) / 2
		p := t.points[t.order[mid]]
		d := 0.0
		for k := range q {
			x := q[k] - p[k]
			d += x * x
		}
		if d < bestD {
			best, bestD = t.order[mid], d
		}
		axis := depth % 4
		diff := q[axis] - p[axis]
		near, far := [2]int{lo, mid}, [2]int{mid + 1, hi}
		if diff > 0 {
			near, far = far, near
		}
		search(near[0], near[1], depth+1)
		if diff*diff < bestD {
			search(far[0], far[1], depth+1)
		}
	}
	search(0, len(t.order), 0)
	return best, bestD
}
