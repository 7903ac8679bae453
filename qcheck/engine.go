package qcheck

import "fmt"

// denseAuto is the widest register Auto gives to the dense engine: two 2^12 × 2^12 unitaries take
// 512 MiB and a few seconds; wider circuits need the engines of issue 8.
const denseAuto = 12

// chooseEngine decides which engine answers a comparison: the one asked for with UseEngine, or
// for Auto the cheapest exact one for the register. This is the one place that knows which
// engines exist; a new engine is added here and in Compare's switch.
func chooseEngine(cfg *config, f *frame) (Engine, error) {
	switch cfg.engine {
	case Dense:
		return Dense, nil
	case Auto:
		if f.m <= denseAuto {
			return Dense, nil
		}
		return 0, fmt.Errorf("qcheck: %d qubits is wider than the dense engine handles automatically (%d); no wider engine is available yet (UseEngine(Dense) tries anyway, within sim's memory limit)", f.m, denseAuto)
	}
	return 0, fmt.Errorf("qcheck: unknown engine %v", cfg.engine)
}

// certifies says in words what an engine's verdict guarantees.
func certifies(e Engine, f *frame) string {
	switch {
	case e == Dense && f.measured != nil:
		return "exact unitaries; distributions from every basis input, the witness and 4 fixed random inputs, so a lower bound on the largest over all inputs"
	case e == Dense:
		return "exact: both full unitaries, to floating-point rounding"
	}
	return ""
}
