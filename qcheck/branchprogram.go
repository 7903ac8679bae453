package qcheck

import (
	"fmt"
	"math"

	"qcheck.dev/qcheck/sim"
)

// programEngine compares programs by enumerating their measurement branches on statevectors
// (package sim's ComparePrograms).
type programEngine struct{}

var _ engine = programEngine{}

func (programEngine) name() Engine { return "program" }

// work: k·2^m for one run of each program over a statevector; each further measurement branch
// repeats the ops after it, which the engine's own branch limit bounds.
func (programEngine) work(f *frame) float64 {
	return opsOf(f) * math.Exp2(float64(f.m))
}

func (programEngine) refuses(cfg *config, f *frame, auto bool) error {
	if f.meaning != meaningProgram {
		return fmt.Errorf("the program engine compares programs only")
	}
	if w := max(f.want.Qubits(), f.got.Qubits()); w > programMaxQubits {
		return fmt.Errorf("%d qubits is wider than the program engine's statevectors take (%d)", w, programMaxQubits)
	}
	return nil
}

// programMaxQubits is the widest program the statevector branches take: 256 MiB a branch.
const programMaxQubits = 24

func (programEngine) certifies(cfg *config, f *frame) string {
	return "exact distributions of the classical bits: every measurement branch with its probability (branches below 1e-20 dropped), to floating-point rounding"
}

func (programEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	g, err := sim.ComparePrograms(f.want, f.got, sim.ProgramOptions{})
	if err != nil {
		return fmt.Errorf("qcheck: %v", err)
	}
	return outcomeVerdict(cfg, r, g, g.Rounding)
}
