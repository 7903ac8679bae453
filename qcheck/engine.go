package qcheck

import (
	"fmt"
	"math"

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
		if err := wideEngineFits(cfg, f, Tableau); err == nil {
			return Tableau, nil
		}
		if err := wideEngineFits(cfg, f, MatrixFree); err != nil {
			return 0, fmt.Errorf("qcheck: %d qubits is wider than the dense engine handles automatically (%d), and %v", f.m, denseAuto, err)
		}
		if f.m > matrixFreeAuto {
			return 0, fmt.Errorf("qcheck: %d qubits is too wide for every engine that handles non-Clifford circuits (dense up to %d, matrix-free up to %d); only Clifford circuits are compared at this width", f.m, denseAuto, matrixFreeAuto)
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
		if !sim.IsClifford(f.want) {
			return fmt.Errorf("want is not a Clifford circuit, which the tableau engine needs")
		}
		if !sim.IsClifford(f.got) {
			return fmt.Errorf("got is not a Clifford circuit, which the tableau engine needs")
		}
		b, ok := cliffordRounding(f.want, f.got)
		if !ok {
			return fmt.Errorf("the tableau engine cannot bound how far custom gates are from the Cliffords it computes with")
		}
		if b >= cfg.tol {
			return fmt.Errorf("the angles are off exact Clifford angles by %.3g in total, not below the tolerance %g, so the tableau's exact answer would not settle it", b, cfg.tol)
		}
	}
	return nil
}

// cliffordRounding bounds how far the circuits the tableau accepts are, in operator norm, from
// the exact Clifford circuits it computes with. The tableau accepts a gate whose angles lie within
// sim.CliffordTolerance of Clifford ones; an angle off by δ moves its gate by at most |δ| (every
// gate's derivative in each of its angles has norm at most 1: ½ for the rotations exp(−iθP/2),
// 1 for p, cp and u), and such deviations add up over a circuit (Nielsen & Chuang §4.5.3). It
// reports false for custom gates, which have no angle to measure by.
func cliffordRounding(cs ...*circuit.Circuit) (float64, bool) {
	const quarter = math.Pi / 2
	b := 0.0
	for _, c := range cs {
		for _, op := range c.Ops {
			if op.Gate.IsCustom() {
				return 0, false
			}
			for _, p := range op.Gate.Params {
				b += math.Abs(p - math.Round(p/quarter)*quarter)
			}
		}
	}
	return b, true
}

// certifies says in words what an engine's verdict guarantees.
func certifies(e Engine, f *frame) string {
	switch {
	case e == Dense && f.measured != nil:
		return "exact unitaries; distributions from every basis input, the witness and 4 fixed random inputs, so a lower bound on the largest over all inputs"
	case e == Dense:
		return "exact: both full unitaries, to floating-point rounding"
	case e == Tableau:
		return "exact: how both circuits conjugate every Pauli generator; a difference means a distance of at least 1/√2"
	case e == MatrixFree:
		return "estimate from a Krylov iteration on V†U; the witness certifies a lower bound, the upper bound holds with the stated probability"
	}
	return ""
}
