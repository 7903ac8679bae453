package metric

import (
	"math"

	"github.com/google/go-cmp/cmp"
	"gonum.org/v1/gonum/mat"
)

// EquateUnitaries returns a go-cmp option under which two *mat.CDense values
// are equal when they are square, of the same size, and within eps of each
// other in operator norm up to global phase (PhaseDistance ≤ eps). Use it in
// cmp.Equal and cmp.Diff to compare unitaries, or structures holding them, the
// way a circuit's meaning is compared. Matrices of different shapes are
// unequal; two nil pointers are equal.
func EquateUnitaries(eps float64) cmp.Option {
	return cmp.Comparer(func(a, b *mat.CDense) bool {
		return matricesClose(a, b, func() bool { return PhaseDistance(a, b) <= eps })
	})
}

// EquateUnitariesExactPhase is EquateUnitaries with the global phase
// counted: matrices are equal when ‖a − b‖ ≤ eps.
func EquateUnitariesExactPhase(eps float64) cmp.Option {
	return cmp.Comparer(func(a, b *mat.CDense) bool {
		return matricesClose(a, b, func() bool { return Distance(a, b) <= eps })
	})
}

// EquateStates returns a go-cmp option under which two []complex128 values
// of the same length, read as state vectors, are equal when
// min over φ of ‖a − e^{iφ}b‖ ≤ eps: the vector distance with the global
// phase taken out, the state analogue of PhaseDistance. It applies to every
// []complex128 in the compared values. Two empty or nil slices are equal.
func EquateStates(eps float64) cmp.Option {
	return cmp.Comparer(func(a, b []complex128) bool {
		return len(a) == len(b) && phaseFreeNorm(a, b) <= eps
	})
}

// EquateStatesExactPhase is EquateStates with the global phase counted:
// states are equal when ‖a − b‖ ≤ eps.
func EquateStatesExactPhase(eps float64) cmp.Option {
	return cmp.Comparer(func(a, b []complex128) bool {
		return len(a) == len(b) && differenceNorm(a, b, 1) <= eps
	})
}

// matricesClose handles nil and shape checks for the matrix comparers before
// calling near, so that a comparer never panics.
func matricesClose(a, b *mat.CDense, near func() bool) bool {
	if a == nil || b == nil {
		return a == b
	}
	if a.IsEmpty() || b.IsEmpty() {
		return a.IsEmpty() && b.IsEmpty()
	}
	ra, ca := a.Dims()
	rb, cb := b.Dims()
	if ra != ca || ra != rb || ca != cb {
		return false
	}
	return near()
}

// phaseFreeNorm returns min over φ of ‖a − e^{iφ}b‖; the best phase is that
// of ⟨b|a⟩.
func phaseFreeNorm(a, b []complex128) float64 {
	p := inner(b, a)
	rot := complex(1, 0)
	if p != 0 {
		rot = p / complex(math.Hypot(real(p), imag(p)), 0)
	}
	return differenceNorm(a, b, rot)
}

// differenceNorm returns ‖a − rot·b‖.
func differenceNorm(a, b []complex128, rot complex128) float64 {
	var s float64
	b = b[:len(a)]
	for i, x := range a {
		d := x - rot*b[i]
		s += real(d)*real(d) + imag(d)*imag(d)
	}
	return math.Sqrt(s)
}
