package zx

import (
	"fmt"
	"math"

	"qcheck.dev/metric"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// roundingAllowance is the allowance for the rounding of a dense distance computed from 2^k-
// dimensional matrices with k ≤ 12 (metric's eigenphases are accurate to about 1e-14 there).
const roundingAllowance = 1e-12

// Compare decides whether U and V are equal up to a global phase, in two steps. First the
// difference window (sim.DifferenceWindow) cancels the ops the circuits share at their ends,
// exactly; when what is left touches at most MaxSupport qubits, the distance of the windows'
// dense matrices is the distance of the circuits (Result.Known), within a rounding allowance that
// grows with the windows' length (Result.Bound). Otherwise Check simplifies the
// ZX-diagram of the windows. Result.Support is given in the qubits of U and V.
func Compare(u, v *circuit.Circuit, opts Options) (Result, error) {
	if opts.MaxSupport == 0 {
		opts.MaxSupport = 10
	}
	w, err := sim.DifferenceWindow(u, v)
	if err != nil {
		return Result{}, fmt.Errorf("zx: %w", err)
	}
	if w.Empty() {
		return Result{Verdict: Equivalent, Known: true}, nil
	}
	a, b := w.Circuits(u, v)
	if len(w.Support) <= opts.MaxSupport {
		ua, err := sim.Unitary(a)
		if err != nil {
			return Result{}, err
		}
		ub, err := sim.Unitary(b)
		if err != nil {
			return Result{}, err
		}
		d := metric.PhaseDistance(ua, ub)
		// The products of the windows' gate matrices carry rounding that grows with their length.
		ops := float64(len(w.A) + len(w.B))
		r := Result{Distance: d, Known: true, Support: w.Support, Bound: ops * 1e-15 * math.Sqrt(float64(int(1)<<len(w.Support)))}
		r.decide()
		return r, nil
	}
	r, err := Check(a, b, opts)
	if err != nil {
		return Result{}, err
	}
	for i, q := range r.Support {
		r.Support[i] = w.Support[q]
	}
	return r, nil
}
