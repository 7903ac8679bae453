package metric

import "math"

// circleArc is the shortest arc of the unit circle that holds a set of
// eigenphases: it runs counter-clockwise from phases[first] over length
// radians to phases[last]. Its complement is the widest gap between
// neighbouring phases.
type circleArc struct {
	first, last int
	start       float64 // phases[first]
	length      float64 // in [0, 2π)
}

// shortestArc finds the shortest arc holding all of phases, which must be
// sorted ascending in (−π, π] and non-empty.
func shortestArc(phases []float64) circleArc {
	n := len(phases)
	// The gap that wraps around from the last phase to the first.
	best := phases[0] + 2*math.Pi - phases[n-1]
	first, last := 0, n-1
	for i := 1; i < n; i++ {
		if g := phases[i] - phases[i-1]; g > best {
			best, first, last = g, i, i-1
		}
	}
	// Measure the arc from its own ends, not as 2π − gap, so that a tight
	// cluster keeps its full relative precision.
	length := phases[last] - phases[first]
	if length < 0 {
		length += 2 * math.Pi
	}
	return circleArc{first: first, last: last, start: phases[first], length: length}
}

// middle is the phase halfway along the arc, in (−π, π].
func (a circleArc) middle() float64 { return wrapPhase(a.start + a.length/2) }
