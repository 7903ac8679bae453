package qcheck

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// denseAuto is the widest register Auto gives to the dense engine: two 2^12 × 2^12 unitaries take
// 512 MiB and a few seconds.
const denseAuto = 12

// matrixFreeAuto is the widest register Auto gives to the matrix-free engine: the widest at which
// its default 4 GiB of Krylov vectors (64 MiB each at 22 qubits) holds the few dozen steps its
// probabilistic upper bound needs to settle an equivalence.
const matrixFreeAuto = 22

// chooseEngine decides which engine answers a comparison: the one asked for with UseEngine, or
// for Auto the cheapest one that answers exactly: dense up to denseAuto qubits, the tableau for
// wider Clifford circuits, the matrix-free estimate for other circuits up to matrixFreeAuto.
// This is the one place that knows which engines exist; a new engine is added here and in
// compare's switch.
func chooseEngine(cfg *config, f *frame) (Engine, error) {
	switch cfg.engine {
	case Dense:
		return Dense, nil
	case Tableau, MatrixFree:
		return cfg.engine, wideEngineFits(cfg, f, cfg.engine)
	case Auto:
		if f.m <= denseAuto {
			return Dense, nil
		}
		tabErr := wideEngineFits(cfg, f, Tableau)
		if tabErr == nil {
			return Tableau, nil
		}
		if err := wideEngineFits(cfg, f, MatrixFree); err != nil {
			return 0, fmt.Errorf("qcheck: %d qubits is wider than the dense engine handles automatically (%d), and %v", f.m, denseAuto, err)
		}
		if f.m > matrixFreeAuto {
			return 0, fmt.Errorf("qcheck: %d qubits is too wide for the dense engine (up to %d) and the matrix-free engine (up to %d), and the tableau engine cannot answer: %v", f.m, denseAuto, matrixFreeAuto, tabErr)
		}
		return MatrixFree, nil
	}
	return 0, fmt.Errorf("qcheck: unknown engine %v", cfg.engine)
}

// wideEngineFits reports why the tableau or matrix-free engine cannot answer this comparison, or
// nil when it can. Both compare unitaries up to a global phase in operator norm; clean ancillas
// and measured distributions need the dense engine.
func wideEngineFits(cfg *config, f *frame, e Engine) error {
	switch {
	case f.measured != nil:
		return fmt.Errorf("the %v engine does not compare measured distributions; they need the dense engine", e)
	case f.clean:
		return fmt.Errorf("the %v engine does not compare with clean ancillas; they need the dense engine (dirty ancillas work)", e)
	case cfg.exactPhase:
		return fmt.Errorf("the %v engine compares up to global phase only; ExactPhase needs the dense engine", e)
	case cfg.measure != OperatorNorm:
		return fmt.Errorf("the %v engine reports the operator-norm distance only, not %v", e, cfg.measure)
	}
	if e == Tableau {
		b, err := cliffordRounding(f.want, f.got)
		if err != nil {
			return err
		}
		if b >= cfg.tol {
			return fmt.Errorf("the angles are off exact Clifford angles by up to %.3g in operator norm in total, not below the tolerance %g, so the tableau's exact answer would not settle it", b, cfg.tol)
		}
	}
	return nil
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

// certifies says in words what an engine's verdict guarantees.
func certifies(e Engine, f *frame) string {
	switch {
	case e == Dense && f.measured != nil:
		return "certified from exact unitaries: the total-variation distance is an upper bound on the largest over all inputs when equivalent (from the part of U·V† that moves probability between outcomes) and a distance found on an input when not"
	case e == Dense:
		return "exact: both full unitaries, to floating-point rounding"
	case e == Tableau:
		return "exact: how both circuits conjugate every Pauli generator; a difference means a distance of at least 1/√2"
	case e == MatrixFree:
		return "estimate from a Krylov iteration on V†U; the witness certifies a lower bound, the upper bound holds with the stated probability"
	}
	return ""
}
