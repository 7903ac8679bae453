package metric

import (
	"math"
	"slices"
)

// maxTensorPhases caps the distinct eigenphases TensorPhaseDistance keeps while combining factors.
const maxTensorPhases = 1 << 14

// tensorPhaseMerge is how close two eigenphases must be to count as one when combining factors:
// far above their rounding for the sizes PhaseDistance handles, far below any gap that matters.
const tensorPhaseMerge = 1e-11

// TensorPhaseDistance returns min over φ of ‖W − e^{iφ}I‖ for W = W_1 ⊗ … ⊗ W_m, given the
// eigenphases of each unitary factor (as Eigenphases returns them). The eigenphases of W are the
// sums of one eigenphase of each factor; with θ the length of the shortest arc of the unit circle
// holding them all, the distance is 2·sin(θ/4), as in PhaseDistance. Sums within 1e-11 of each
// other are merged; ok is false when more than 16,384 distinct sums remain.
func TensorPhaseDistance(eigenphases ...[]float64) (d float64, ok bool) {
	var set []float64
	for i, ph := range eigenphases {
		if i == 0 {
			set = distinctPhases(ph)
			continue
		}
		sums := make([]float64, 0, len(set)*len(ph))
		for _, a := range set {
			for _, b := range ph {
				sums = append(sums, a+b)
			}
		}
		if set = distinctPhases(sums); len(set) > maxTensorPhases {
			return 0, false
		}
	}
	if len(set) == 0 {
		return 0, true
	}
	return 2 * math.Sin(shortestArc(set).length/4), true
}

// distinctPhases returns the phases reduced to (−π, π], sorted, with near-equal ones merged.
func distinctPhases(ph []float64) []float64 {
	out := make([]float64, 0, len(ph))
	for _, p := range ph {
		out = append(out, wrapPhase(p))
	}
	slices.Sort(out)
	k := 0
	for _, p := range out {
		if k > 0 && p-out[k-1] < tensorPhaseMerge {
			continue
		}
		out[k] = p
		k++
	}
	out = out[:k]
	if k > 1 && out[0]+2*math.Pi-out[k-1] < tensorPhaseMerge {
		out = out[:k-1]
	}
	return out
}
