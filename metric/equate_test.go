package metric

import (
	"math"
	"math/cmplx"
	"testing"

	"github.com/google/go-cmp/cmp"
	"gonum.org/v1/gonum/mat"
)

func TestEquateOptions(t *testing.T) {
	rng := newRand(5)
	u := haar(rng, 4)
	phased := scale(cmplx.Exp(0.4i), u)
	off := mul(u, diagonal(nil, 0, 0, 0, 1e-6)) // PhaseDistance 2 sin(1e-6/4) ≈ 5e-7
	type pair struct {
		Name string
		U    *mat.CDense
	}
	cases := []struct {
		name      string
		a, b      any
		opt       cmp.Option
		wantEqual bool
	}{
		{"phase-free, phased", u, phased, EquateUnitaries(1e-12), true},
		{"exact phase, phased", u, phased, EquateUnitariesExactPhase(1e-12), false},
		{"phase-free, 5e-7 off, eps 1e-6", u, off, EquateUnitaries(1e-6), true},
		{"phase-free, 5e-7 off, eps 1e-7", u, off, EquateUnitaries(1e-7), false},
		{"inside a struct", pair{"x", u}, pair{"x", phased}, EquateUnitaries(1e-12), true},
		{"shapes differ", u, identity(2), EquateUnitaries(1), false},
		{"non-square", mat.NewCDense(2, 3, nil), mat.NewCDense(2, 3, nil), EquateUnitaries(1), false},
		{"nil and nil", (*mat.CDense)(nil), (*mat.CDense)(nil), EquateUnitaries(1), true},
		{"nil and matrix", (*mat.CDense)(nil), u, EquateUnitaries(1), false},
		{"states, phase-free", []complex128{1, 1i}, []complex128{1i, -1}, EquateStates(1e-12), true},
		{"states, exact phase", []complex128{1, 1i}, []complex128{1i, -1}, EquateStatesExactPhase(1e-12), false},
		{"states, lengths differ", []complex128{1}, []complex128{1, 0}, EquateStates(1), false},
		{"states, close", []complex128{1, 0}, []complex128{complex(math.Cos(1e-9), 0), complex(math.Sin(1e-9), 0)}, EquateStatesExactPhase(2e-9), true},
	}
	for _, c := range cases {
		if got := cmp.Equal(c.a, c.b, c.opt); got != c.wantEqual {
			t.Errorf("%s: cmp.Equal = %v, want %v", c.name, got, c.wantEqual)
		}
		if diff := cmp.Diff(c.a, c.b, c.opt); (diff == "") != c.wantEqual {
			t.Errorf("%s: cmp.Diff = %q, want it empty iff equal (%v)", c.name, diff, c.wantEqual)
		}
	}
}
