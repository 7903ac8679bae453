package metric

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/mat"
)

// A difference of two nearly equal unitaries can hold a rounding error beside a term hundreds of
// orders of magnitude smaller (found by the peephole example's rule check: rx(4.5e-131) before
// t·t against s). Its norm is the rounding error, to double precision: the tiny terms move it by
// about 1e-147 (first-order perturbation of a singular value, common practice). The tridiagonal
// reduction used to square the 1e-147 term to zero, divide by the zero norm of its column, and
// hand NaN to Dsterf.
func TestOperatorNormOfWidelyScaledEntries(t *testing.T) {
	a := mat.NewCDense(4, 4, []complex128{
		0, 0, 0, 0,
		-5.0052077379577523e-147i, 2.220446049250313e-16, 0, 0,
		0, 0, 0, 0,
		0, 0, -5.0052077379577523e-147i, 2.220446049250313e-16,
	})
	got := OperatorNorm(a)
	if want := 2.220446049250313e-16; math.Abs(got-want) > 1e-30 {
		t.Errorf("OperatorNorm = %g, want %g", got, want)
	}
}
