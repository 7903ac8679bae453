package metric

// AlignedDistance returns the distance of two vectors up to a global phase,
//
//	min over φ of ‖a − e^{iφ}·b‖,
//
// which the phase of ⟨b|a⟩ attains. The difference is formed at that phase rather than read from
// √(‖a‖² + ‖b‖² − 2|⟨a|b⟩|), which loses every digit of distances near 1e-8. Applied to the
// outputs U·ψ and V·ψ of two circuits on one input ψ, it is a certified lower bound on the
// phase-free operator-norm distance of U and V (min over φ of a maximum over ψ is at least the
// maximum over ψ of the minimum over φ). a and b must have equal length; unlike the state
// measures, they are not normalised.
func AlignedDistance(a, b []complex128) float64 {
	if len(a) != len(b) {
		inputPanic("AlignedDistance", "vectors of lengths %d and %d", len(a), len(b))
	}
	return phaseFreeNorm(a, b)
}
