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
	Generator string `json:"generator"`
	Want      string `json:"want"`
	Got       string `json:"got"`
	// Anticommute reports whether the two images anticommute. Then, on any input that P leaves
	// unchanged, measuring the observable Want gives +1 with certainty after want and with
	// probability exactly 1/2 after got.
	Anticommute bool `json:"anticommute"`
}

// tableauEngine compares how two Clifford circuits conjugate the Pauli generators X_q and Z_q
// (stabilizer tableaux, package sim's CompareClifford): exact, for thousands of qubits, and for
// Clifford circuits only, up to a global phase in operator norm.
type tableauEngine struct{}

var _ engine = tableauEngine{}

func (tableauEngine) name() Engine { return Tableau }

// work: k·⌈2m/64⌉ words for the gates, and 2m·⌈2m/64⌉ to compare the tableaux.
func (tableauEngine) work(f *frame) float64 {
	words := math.Ceil(2 * float64(f.m) / 64)
	return opsOf(f)*words + 2*float64(f.m)*words
}

func (tableauEngine) refuses(cfg *config, f *frame, auto bool) error {
	if err := unitaryUpToPhase(cfg, f, Tableau); err != nil {
		return err
	}
	b, err := cliffordRounding(f.want, f.got)
	if err != nil {
		return err
	}
	if b >= cfg.tol {
		return fmt.Errorf("the angles are off exact Clifford angles by up to %.3g in operator norm in total, not below the tolerance %g, so the tableau's exact answer would not settle it", b, cfg.tol)
	}
	return nil
}

func (tableauEngine) certifies(cfg *config, f *frame) string {
	return "exact: how both circuits conjugate every Pauli generator; a difference means a distance of at least 1/√2"
}

func (tableauEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	return compareTableau(cfg, f, r)
}

// cliffordRounding bounds, in operator norm, how far want and got are from the exact Clifford
// circuits the tableau computes with (sim.CliffordDeviation), or says why the tableau cannot
// answer for them.
func cliffordRounding(want, got *circuit.Circuit) (float64, error) {
	a, err := sim.CliffordDeviation(want)
	if err != nil {
		return 0, fmt.Errorf("want is not a circuit the tableau engine can answer for: %v", err)
	}
	b, err := sim.CliffordDeviation(got)
	if err != nil {
		return 0, fmt.Errorf("got is not a circuit the tableau engine can answer for: %v", err)
	}
	return a + b, nil
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
	// exact Clifford circuit the tableau compared (refuses keeps it below the tolerance).
	rounding, err := cliffordRounding(f.want, got)
	if err != nil {
		return fmt.Errorf("qcheck: %v", err)
	}
	if rounding > 0 {
		r.Certifies += fmt.Sprintf("; angles off Clifford ones by %.2g in total, which bounds the distance of equivalent circuits", rounding)
	}
	if res.Equivalent {
		// The exact Cliffords agree, so the circuits are at most rounding apart: the distance
		// reported is that bound (0 when no angle was rounded).
		r.Equivalent = true
		r.Distance, r.OperatorDistance = rounding, rounding
		return nil
	}
	anti := res.Want.Anticommutes(res.Got)
	bound := 1.0
	if anti {
		bound = math.Sqrt2 / 2
	}
	bound -= rounding
	if cfg.tol >= bound {
		return fmt.Errorf("qcheck: the tableau engine shows the circuits differ, with a distance of at least %.4g, which does not settle a tolerance of %g; use a tolerance below 1/√2 or the dense engine", bound, cfg.tol)
	}
	r.Distance, r.OperatorDistance, r.WitnessGap = bound, bound, bound
	r.LowerBound = true
	// Where V†U splits into small tensor factors, their matrices give the distance itself.
	if cd, err := sim.CliffordDistance(f.want, got); err == nil && cd.Known && cd.Exact-rounding > cfg.tol {
		r.Distance, r.OperatorDistance = cd.Exact, cd.Exact
		r.LowerBound = rounding > 0
		if rounding > 0 {
			// The rounded circuits are cd.Exact apart, the circuits themselves within rounding of
			// that; the lower end is what is certain.
			r.Distance, r.OperatorDistance = cd.Exact-rounding, cd.Exact-rounding
		}
		r.Certifies = fmt.Sprintf("exact: how both circuits conjugate every Pauli generator; V†U splits into tensor factors of at most %d qubits, whose matrices give the distance", cd.Largest)
	} else {
		r.Certifies = "exact: how both circuits conjugate every Pauli generator; the distance reported is the lower bound a differing Pauli image certifies (V†U does not split into factors small enough to give the distance itself)"
	}
	r.Pauli = &PauliEvidence{
		Generator:   res.Generator.String(),
		Want:        res.Want.String(),
		Got:         res.Got.String(),
		Anticommute: anti,
	}
	r.Blame = blame(cfg, f, r.Want, r.Got)
	return nil
}
