package metric

import (
	"math"
	"math/cmplx"
	"testing"
)

// Closed forms: for unit vectors ‖a − e^{iφ}b‖² = 2 − 2·Re(e^{−iφ}⟨a|b⟩), smallest at the phase
// of ⟨b|a⟩, where it is 2 − 2|⟨a|b⟩|; so (1, 0) against (cos t, sin t) is √(2 − 2|cos t|) =
// 2 sin(t′/2) with t′ = min(t, π − t) (past π/2 the phase −1 is nearer), orthogonal unit vectors
// are √2 apart, and a phase alone costs nothing.
func TestAlignedDistance(t *testing.T) {
	for _, tt := range []float64{1e-9, 1e-4, 0.3, 1, math.Pi / 2, 3} {
		a := []complex128{1, 0}
		b := []complex128{complex(math.Cos(tt), 0) * cmplx.Exp(0.7i), complex(math.Sin(tt), 0) * cmplx.Exp(0.7i)}
		want := 2 * math.Sin(math.Min(tt, math.Pi-tt)/2)
		if got := AlignedDistance(a, b); math.Abs(got-want) > 1e-15+1e-12*want {
			t.Errorf("t = %g: %.17g, want 2 sin(t′/2) = %.17g", tt, got, want)
		}
	}
	if got := AlignedDistance([]complex128{0, 1i}, []complex128{0, -1}); got > 1e-16 {
		t.Errorf("a global phase: %g, want 0", got)
	}
	defer func() {
		if _, ok := recover().(*InputError); !ok {
			t.Error("lengths 1 and 2 accepted")
		}
	}()
	AlignedDistance([]complex128{1}, []complex128{1, 0})
}
