package qcheck

import (
	"fmt"
	"math"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// matrixFreeAuto is the widest register Auto gives to the matrix-free engine: the widest at which
// its default 4 GiB of Krylov vectors (64 MiB each at 22 qubits) holds the few dozen steps its
// probabilistic upper bound needs to settle an equivalence.
const matrixFreeAuto = 22

// matrixFreeEngine estimates the phase-free operator-norm distance with package sim's
// MatrixFreeDistance, a Krylov iteration on V†U that runs both circuits on statevectors and forms
// neither matrix. Its witness certifies a lower bound; its upper bound holds with a stated
// probability over the random start; a pair that neither bound settles is undecided, and not
// counted as equivalent.
type matrixFreeEngine struct{}

var _ engine = matrixFreeEngine{}

func (matrixFreeEngine) name() Engine { return MatrixFree }

// work: 60·k·2^m, about 52 Krylov steps, each running both circuits over a statevector.
func (matrixFreeEngine) work(f *frame) float64 {
	return 60 * opsOf(f) * math.Exp2(float64(f.m))
}

func (matrixFreeEngine) refuses(cfg *config, f *frame, auto bool) error {
	if err := unitaryUpToPhase(cfg, f, MatrixFree); err != nil {
		return err
	}
	if auto && f.m > matrixFreeAuto {
		return fmt.Errorf("%d qubits is wider than the matrix-free engine takes automatically (%d)", f.m, matrixFreeAuto)
	}
	return nil
}

func (matrixFreeEngine) certifies(cfg *config, f *frame) string {
	return "estimate from a Krylov iteration on V†U; the witness certifies a lower bound, the upper bound holds with the stated probability"
}

// compare fills r from the matrix-free estimate of the phase-free distance. The verdict is certain
// when the witness already shows more than the tolerance (Lower > tol) and holds with probability
// 1 − Failure when the upper bound is within it; otherwise the circuits are not counted as
// equivalent, since the estimate alone may fall short of the true distance, and Undecided says so.
func (matrixFreeEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	got := undoLayout(f.got, f.perm)
	opts := sim.MatrixFreeOptions{Seed: 1}
	if !full {
		opts.Tolerance = cfg.tol
	}
	res, err := sim.MatrixFreeDistance(f.want, got, opts)
	if err != nil {
		return err
	}
	r.Distance, r.OperatorDistance, r.Phase = res.Distance, res.Distance, res.Phase
	switch {
	case res.Lower > cfg.tol:
		r.Equivalent = false
		r.LowerBound = true // the Krylov estimate never exceeds the distance
		r.Certifies = fmt.Sprintf("certain: the witness shows %.4g > tolerance (a certified lower bound)", res.Lower)
	case res.Upper <= cfg.tol:
		r.Equivalent = true
		r.Certifies = fmt.Sprintf("upper bound %.3g ≤ tolerance with probability ≥ 1 − %.0e over the random start", res.Upper, res.Failure)
	default:
		// The estimate never exceeds the true distance, so it cannot vouch for equivalence.
		r.Equivalent = false
		r.Undecided = fmt.Sprintf("the estimate is %.3g, the certified lower bound %.3g and the upper bound %.3g (probability ≥ 1 − %.0e); neither bound settles the tolerance; try the dense engine or a looser tolerance", res.Distance, res.Lower, res.Upper, res.Failure)
		r.Certifies = "unsettled, so not counted as equivalent: " + r.Undecided
	}
	if r.Equivalent && !full {
		return nil
	}
	r.Witness, r.WitnessGap = res.Witness, res.Lower
	if res.Witness != nil {
		m, err := wideMeasurement(f.want, got, res.Witness)
		if err != nil {
			return err
		}
		r.Measurement = m
	}
	r.Blame = blame(cfg, f, r.Want, r.Got)
	return nil
}

// wideMeasurement runs both circuits on the witness and picks the measurement of their outputs
// that tells them apart best.
func wideMeasurement(want, got *circuit.Circuit, psi []complex128) (Measurement, error) {
	a := append([]complex128(nil), psi...)
	b := append([]complex128(nil), psi...)
	if err := sim.Apply(want, a); err != nil {
		return Measurement{}, err
	}
	if err := sim.Apply(got, b); err != nil {
		return Measurement{}, err
	}
	gap := newLargestGap()
	return outputMeasurement(psi, a, b, &gap), nil
}
