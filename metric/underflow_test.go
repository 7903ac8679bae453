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

// A split-off block of T far smaller than the rest, here diag(1, [[ε, ε], [ε, ε]]) with
// ε = 1e-130 (eigenvalues 1, 2ε and 0 by hand), made gonum's Dsterf panic in its rescaling step;
// its entries are now flushed to zero first, which moves the eigenvalues by less than 1e-100.
func TestTinySplitBlock(t *testing.T) {
	const eps = 1e-130
	g := []complex128{ // column-major lower triangle
		1, 0, 0,
		0, eps, eps,
		0, 0, eps,
	}
	vals := hermitianValues(g, 3)
	want := []float64{0, 2 * eps, 1}
	for i := range want {
		if math.Abs(vals[i]-want[i]) > 1e-100 {
			t.Errorf("eigenvalues %v, want %v within 1e-100", vals, want)
			break
		}
	}
}
