package zx

import (
	"math"
	"math/rand/v2"
	"testing"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
)

// nearCliffordAngle draws k·π/4 plus an offset around the phase tolerance: exact, far below it,
// just above it, or well above it.
func nearCliffordAngle(rng *rand.Rand) float64 {
	off := []float64{0, 1e-15, -3e-13, 2e-12, -5e-12, 1e-9, -1e-7, 0.3}[rng.IntN(8)]
	return float64(rng.IntN(16)-8)*math.Pi/4 + off
}

// Circuits of every library gate with angles near multiples of π/4, where the rules' phase tests
// decide what is snapped: against the dense engine, a proof holds within its Bound and every
// distance matches (the proof's tolerance argument in the package documentation).
func TestSnappingAgainstDense(t *testing.T) {
	rng := rand.New(rand.NewPCG(51, 52))
	var specs []circuit.Spec
	for _, s := range circuit.Standard() {
		if s.Name != "barrier" && s.Name != "measure" && s.Name != "reset" {
			specs = append(specs, s)
		}
	}
	trials := 200
	if testing.Short() {
		trials = 60
	}
	proved := 0
	for trial := range trials {
		n := 3 + trial%3
		c := circuit.New(n)
		for range 25 {
			s := specs[rng.IntN(len(specs))]
			p := make([]float64, s.Params)
			for i := range p {
				p[i] = nearCliffordAngle(rng)
			}
			c.Append(gate(s.Name, p...), rng.Perm(n)[:s.Qubits]...)
		}
		v := rewritten(c, uint64(trial))
		if trial%2 == 1 {
			if b := bug(v, 0, []float64{1e-13, 3e-12, 1e-9}[trial%3], rng); b != nil {
				v = b
			}
		}
		r, err := Check(c, v, Options{})
		if err != nil {
			t.Fatal(err)
		}
		want := metric.PhaseDistance(dense(t, c), dense(t, v))
		if r.Verdict == Equivalent {
			proved++
			if want > r.Bound+1e-12 {
				t.Errorf("trial %d: proved within %g, dense distance %g", trial, r.Bound, want)
			}
		}
		if r.Known && math.Abs(r.Distance-want) > r.Bound+1e-9 {
			t.Errorf("trial %d: distance %g, dense %g (bound %g)", trial, r.Distance, want, r.Bound)
		}
	}
	t.Logf("%d of %d proved", proved, trials)
}
