package qcheck

import (
	"fmt"
	"math"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// stabilizerProgramEngine compares Clifford programs on the stabilizer tableau at any width
// (package sim's CompareCliffordPrograms): each classical bit is an affine function of fair coins,
// the distributions are uniform over affine sets, and their distance is exact.
type stabilizerProgramEngine struct{}

var _ engine = stabilizerProgramEngine{}

func (stabilizerProgramEngine) name() Engine { return "stabilizer-program" }

// work: at most k·2m·⌈2m/64⌉ words, as if every op were a measurement, which updates every row
// of the tableau.
func (stabilizerProgramEngine) work(f *frame) float64 {
	words := math.Ceil(2 * float64(f.m) / 64)
	return opsOf(f) * 2 * float64(f.m) * words
}

func (stabilizerProgramEngine) refuses(cfg *config, f *frame, auto bool) error {
	if f.meaning != meaningProgram {
		return fmt.Errorf("the stabilizer-program engine compares programs only")
	}
	for _, c := range []*circuit.Circuit{f.want, f.got} {
		if err := sim.CliffordProgram(c); err != nil {
			return fmt.Errorf("not a Clifford program: %v", err)
		}
	}
	return nil
}

func (stabilizerProgramEngine) certifies(cfg *config, f *frame) string {
	return "exact: the classical bits as affine functions of fair coins on the stabilizer tableau; total variation from the two affine sets"
}

func (stabilizerProgramEngine) compare(cfg *config, f *frame, r *Result, full bool) error {
	g, err := sim.CompareCliffordPrograms(f.want, f.got, sim.ProgramOptions{})
	if err != nil {
		return fmt.Errorf("qcheck: %v", err)
	}
	if g.Rounding > 0 {
		r.Certifies += fmt.Sprintf("; angles off Clifford ones move the distance by at most %.2g", g.Rounding)
	}
	return outcomeVerdict(cfg, r, g, g.Rounding)
}
