package qcheck

import (
	"encoding/json"
	"math"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// Issue 17, reproducer 3: u(1e308, 1e308, 1e308) once gave NaN matrices (φ+λ overflowed), then a
// LAPACK panic, an index out of range with clean ancillas, "operator norm NaN" and unencodable
// JSON. Angles are now reduced modulo 4π exactly (checked against mpmath in package circuit), so
// the gate is an ordinary unitary: equal to itself, and at distance 2 sin(δ/4) from the gate with
// φ moved by δ (up to phase, u(θ, φ+δ, λ) = diag(1, e^{iδ})·u(θ, φ, λ); the distance of
// diag(1, e^{iδ}) from I up to phase is 2 sin(δ/4), N&C §4.5.3 with the phase halfway).
func TestHugeAnglesGiveNoNaN(t *testing.T) {
	const huge = 1e308
	for _, n := range []int{1, 2, 14} {
		c := circuit.New(n).U(huge, huge, huge, 0)
		opts := [][]Option{{}}
		if n > 1 {
			c.CX(0, n-1)
		}
		if n == 2 { // clean ancillas and measured distributions need the dense engine
			opts = append(opts, []Option{Ancillas([]int{1}, Clean)}, []Option{Measured()})
		}
		for _, o := range opts {
			r, err := Compare(c, c, o...)
			if err != nil {
				t.Fatalf("%d qubits, options %v: %v", n, o, err)
			}
			if !r.Equivalent || math.IsNaN(r.Distance) || math.IsNaN(r.OperatorDistance) {
				t.Errorf("%d qubits, options %v: %s", n, r.Options, r.Headline())
			}
			if _, err := json.Marshal(struct{ D, O, P float64 }{r.Distance, r.OperatorDistance, r.Phase}); err != nil {
				t.Errorf("%d qubits: %v", n, err)
			}
		}
	}
	const delta = 1e-3
	r, err := Compare(circuit.New(1).U(huge, huge, huge, 0), circuit.New(1).U(huge, huge, huge, 0).P(delta, 0))
	if err != nil {
		t.Fatal(err)
	}
	if want := 2 * math.Sin(delta/4); r.Equivalent || math.Abs(r.Distance-want) > 1e-12 {
		t.Errorf("p(%g) after u(1e308, 1e308, 1e308): %s, want distance %.6g", delta, r.Headline(), want)
	}
}
