package qcheck

import (
	"fmt"
	"math"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// PauliEvidence is the tableau engine's witness: a generator of the Pauli group that the two
// circuits conjugate differently, written as Pauli strings such as "+X0 Z3" (qubits with I are
// left out).
type PauliEvidence struct {
	// Generator is X_q or Z_q; Want and Got are its images U·P·U† and V·P·V†.
	Generator, Want, Got string
	// Anticommute reports whether the two images anticommute. Then, on any input that P leaves
	// unchanged, measuring the observable Want gives +1 with certainty after want and with
	// probability exactly 1/2 after got.
	Anticommute bool
}

// compareTableau fills r from the stabilizer tableaux of both circuits. A difference in how they
// conjugate a generator P bounds the phase-free distance from below: with W = V†U and images
// A = UPU†, B = VPV†, for every phase φ, ‖A − B‖ = ‖WP − PW‖ = ‖(W − e^{−iφ})P − P(W − e^{−iφ})‖
// ≤ 2‖W − e^{−iφ}‖ = 2‖U − e^{−iφ}V‖. Distinct Hermitian Paulis have ‖A − B‖ = √2 when they
// anticommute ((A − B)² = 2I) and 2 when they commute (a common eigenvector has A = 1, B = −1),
// so the reported Distance is that lower bound, 1/√2 or 1, and the verdict is exact for any
// tolerance below 1/√2.
func compareTableau(cfg *config, f *frame, r *Result) error {
	got := undoLayout(f.got, f.perm)
	res, err := sim.CompareClifford(f.want, got)
	if err != nil {
		return err
	}
	// Angles within rounding of Clifford ones move each circuit by at most rounding from the
	// exact Clifford circuit the tableau compared (wideEngineFits keeps it below the tolerance).
	rounding, err := cliffordRounding(f.want, got)
	if err != nil {
		return fmt.Errorf("qcheck: %v", err)
	}
	if rounding > 0 {
		r.Certifies += fmt.Sprintf("; angles off Clifford ones by %.2g in total, which bounds the distance of equivalent circuits", rounding)
	}
	if res.Equivalent {
		r.Equivalent = true
		return nil
	}
	anti := anticommute(res.Want, res.Got)
	bound := 1.0
	if anti {
		bound = math.Sqrt2 / 2
	}
	bound -= rounding
	if cfg.tol >= bound {
		return fmt.Errorf("qcheck: the tableau engine shows the circuits differ, with a distance of at least %.4g, which does not settle a tolerance of %g; use a tolerance below 1/√2 or the dense engine", bound, cfg.tol)
	}
	r.Distance, r.OperatorDistance, r.WitnessGap = bound, bound, bound
	r.Pauli = &PauliEvidence{
		Generator:   res.Generator.String(),
		Want:        res.Want.String(),
		Got:         res.Got.String(),
		Anticommute: anti,
	}
	r.Blame = blame(cfg, f, r.Want, r.Got)
	return nil
}

// anticommute reports whether two Pauli strings anticommute: whether they differ, with neither
// the identity, on an odd number of qubits.
func anticommute(a, b sim.Pauli) bool {
	odd := false
	for q := 0; q < a.Qubits(); q++ {
		x, y := a.At(q), b.At(q)
		if x != 'I' && y != 'I' && x != y {
			odd = !odd
		}
	}
	return odd
}

// compareMatrixFree fills r from the matrix-free estimate of the phase-free distance. The verdict
// is certain when the witness already shows more than the tolerance (Lower > tol) and holds with
// probability 1 − Failure when the upper bound is within it; otherwise the circuits are not
// counted as equivalent, since the estimate alone may fall short of the true distance, and
// Certifies says so.
func compareMatrixFree(cfg *config, f *frame, r *Result, full bool) error {
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
	r.Equivalent = res.Distance <= cfg.tol
	switch {
	case res.Lower > cfg.tol:
		r.Equivalent = false
		r.Certifies = fmt.Sprintf("certain: the witness shows %.4g > tolerance (a certified lower bound)", res.Lower)
	case res.Upper <= cfg.tol:
		r.Equivalent = true
		r.Certifies = fmt.Sprintf("upper bound %.3g ≤ tolerance with probability ≥ 1 − %.0e over the random start", res.Upper, res.Failure)
	default:
		// The estimate never exceeds the true distance, so it cannot vouch for equivalence.
		r.Equivalent = false
		r.Certifies = fmt.Sprintf("unsettled, so not counted as equivalent: the estimate is %.3g, the certified lower bound %.3g and the upper bound %.3g (probability ≥ 1 − %.0e); neither bound settles the tolerance; try the dense engine or a looser tolerance", res.Distance, res.Lower, res.Upper, res.Failure)
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
	return outputMeasurement(psi, a, b, Measurement{InputBasis: -1}, -1), nil
}

// undoLayout returns got followed by the SWAPs that bring logical qubit i, which got leaves on
// physical qubit perm[i], back to qubit i; got itself when perm is nil. The wide engines compare
// that circuit with want, as the dense engine compares want with the relabelled matrix of got.
func undoLayout(got *circuit.Circuit, perm []int) *circuit.Circuit {
	if perm == nil {
		return got
	}
	c := got.Clone()
	pos := append([]int(nil), perm...) // pos[i]: where logical i is now
	at := make([]int, len(perm))       // at[p]: which logical qubit is on physical p
	for i, p := range perm {
		at[p] = i
	}
	for i := range pos {
		if p := pos[i]; p != i {
			j := at[i] // the logical qubit now on physical i moves to p
			c.SWAP(i, p)
			pos[i], pos[j] = i, p
			at[i], at[p] = i, j
		}
	}
	return c
}
