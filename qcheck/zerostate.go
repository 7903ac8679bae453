package qcheck

import (
	"fmt"
	"math"

	"qcheck.dev/qcheck/sim"
)

// zeroEngine compares two unitary circuits on the input |0…0⟩ (package sim's CompareFromZero),
// or the distributions of measuring some of their qubits from there.
type zeroEngine struct{}

var _ engine = zeroEngine{}

func (zeroEngine) name() Engine { return "zero-state" }

// work: k·2^m, one statevector run of each circuit.
func (zeroEngine) work(f *frame) float64 {
	return opsOf(f) * math.Exp2(float64(f.m))
}

func (zeroEngine) refuses(cfg *config, f *frame, auto bool) error {
	if f.meaning != meaningFromZero {
		return fmt.Errorf("the zero-state engine compares circuits from |0…0⟩ only")
	}
	if f.m > programMaxQubits {
		return fmt.Errorf("%d qubits is wider than the zero-state engine's statevectors take (%d)", f.m, programMaxQubits)
	}
	return nil
}

func (zeroEngine) certifies(cfg *config, f *frame) string {
	if f.measured != nil {
		return "exact distributions of the measured qubits from |0…0⟩, to floating-point rounding"
	}
	return "exact: both states prepared from |0…0⟩, to floating-point rounding"
}

func (zeroEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	if f.measured != nil {
		g, err := sim.ComparePrograms(sim.MeasureAtEnd(f.want, f.measured...), sim.MeasureAtEnd(f.got, f.measured...), sim.ProgramOptions{})
		if err != nil {
			return fmt.Errorf("qcheck: %v", err)
		}
		return outcomeVerdict(cfg, r, g, g.Rounding)
	}
	g, err := sim.CompareFromZero(f.want, f.got)
	if err != nil {
		return fmt.Errorf("qcheck: %v", err)
	}
	r.Measure = ZeroState
	r.Distance = g.Distance
	r.Equivalent = g.Distance <= cfg.tol
	r.Overlap = g.Overlap
	return nil
}
