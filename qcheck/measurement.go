package qcheck

import (
	"math"
	"math/cmplx"
)

// largestGap keeps, among the measurements offered, the one whose outcome probabilities after
// want and after got differ most. Every engine that looks for a distinguishing measurement
// offers its candidates here.
type largestGap struct {
	best Measurement
	gap  float64
}

func newLargestGap() largestGap { return largestGap{best: Measurement{InputBasis: -1}, gap: -1} }

// offer considers measuring in the computational basis and seeing outcome, with probability pu
// after want and pv after got, on input (or on basis state basis, with input nil until
// fillBasisInput; basis is −1 for other inputs). A later offer replaces the best only when it
// is larger by more than 1e-12, so that rounding does not move the answer between equal gaps.
func (l *largestGap) offer(input []complex128, basis, outcome int, pu, pv float64) {
	if g := math.Abs(pu - pv); g > l.gap+1e-12 {
		l.gap = g
		l.best = Measurement{Input: input, InputBasis: basis, Basis: true, Outcome: outcome, Want: pu, Got: pv}
	}
}

// fillBasisInput writes out the best measurement's input when it is a basis state.
func (l *largestGap) fillBasisInput(dim int) {
	if l.best.InputBasis >= 0 && l.best.Input == nil {
		l.best.Input = basisState(dim, l.best.InputBasis)
	}
}

// outputMeasurement improves on the best measurement so far with the measurements of a and b,
// the outputs of want and got on the input psi: the computational-basis outcome whose
// probabilities differ most, or the test whether the output is want's output state when that
// tells them apart better. When nothing tells them apart (only a global phase separates the
// circuits), it returns a Measurement with no Input.
func outputMeasurement(psi, a, b []complex128, gap *largestGap) Measurement {
	for y := range a {
		gap.offer(psi, -1, y, abs2(a[y]), abs2(b[y]))
	}
	best, bestGap := gap.best, gap.gap
	var overlap complex128
	for y := range a {
		overlap += cmplx.Conj(a[y]) * b[y]
	}
	norm := 0.0
	for _, z := range a {
		norm += abs2(z)
	}
	if proj := abs2(overlap) / norm; 1-proj > 2*bestGap {
		best, bestGap = Measurement{Input: psi, InputBasis: -1, Want: 1, Got: proj}, 1-proj
	}
	if bestGap < indistinguishable {
		return Measurement{InputBasis: -1}
	}
	return best
}

// indistinguishable is the probability difference below which no measurement is reported.
const indistinguishable = 1e-12
