package qcheck

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// The meanings a comparison can give circuits, as Result.Meaning names them.
const (
	meaningUnitary  = "unitary"   // the unitary on every input: the default without measurements
	meaningProgram  = "program"   // the distribution of the classical bits at the end
	meaningFromZero = "from zero" // the state prepared from |0…0⟩, or its measured distribution
)

// AsProgram compares the circuits as programs, the meaning OpenQASM 2.0 gives them: every qubit
// and classical bit starts at 0, measurements, resets and classically controlled gates act as
// written, and the result is the joint distribution of the classical bits at the end. The
// distance is the exact total-variation distance of the two distributions, and the report names
// the outcome whose probability differs most. The classical bits are the interface, so the
// circuits may have different widths (a routed program on more physical qubits); options that
// relate qubits (OutputPermutation, Ancillas, Measured) do not apply. Circuits with a measure,
// reset or condition are compared this way without the option, unless Measured says otherwise.
func AsProgram() Option {
	return optionFunc(func(c *config) error {
		c.meaning = meaningProgram
		return nil
	})
}

// FromZero compares two circuits on the one input |0…0⟩, the promise a pass makes when it relies
// on qubits starting at 0: the distance is min over φ of ‖U|0⟩ − e^{iφ}V|0⟩‖, and the result
// gives the overlap ⟨0|U†V|0⟩. With Measured(qubits...), only what measuring those qubits at the
// end would show is compared: the exact total-variation distance of the two distributions, the
// unmeasured qubits ignored.
func FromZero() Option {
	return optionFunc(func(c *config) error {
		c.meaning = meaningFromZero
		return nil
	})
}

// meaningOf decides what the circuits mean for this comparison: the option given, else a program
// when either circuit measures, resets or is classically controlled (and Measured does not ask
// for its distributions of the unitary), else the unitary.
func meaningOf(cfg *config, want, got *circuit.Circuit) (string, error) {
	m := cfg.meaning
	if m == "" {
		m = meaningUnitary
		if !cfg.measuredSet && (!want.Unitary() || !got.Unitary()) {
			m = meaningProgram
		}
	}
	switch {
	case m == meaningProgram && (cfg.perm != nil || len(cfg.ancillas) > 0 || cfg.measuredSet):
		return "", fmt.Errorf("qcheck: comparing programs, which are compared through their classical bits: OutputPermutation, Ancillas and Measured do not apply")
	case m != meaningUnitary && (cfg.exactPhase || cfg.measure != OperatorNorm):
		return "", fmt.Errorf("qcheck: comparing %s: ExactPhase and UseMeasure apply to unitaries only", map[string]string{meaningProgram: "programs", meaningFromZero: "from |0…0⟩"}[m])
	case m == meaningFromZero && (cfg.perm != nil || len(cfg.ancillas) > 0):
		return "", fmt.Errorf("qcheck: FromZero takes no OutputPermutation or Ancillas")
	}
	return m, nil
}

// refuseMeaning is the refusal of engines that compare unitaries on every input.
func refuseMeaning(f *frame, e Engine) error {
	if f.meaning != meaningUnitary {
		return fmt.Errorf("the %s engine compares unitaries on every input, not %s meanings", e, f.meaning)
	}
	return nil
}

// stabilizerProgramEngine compares Clifford programs on the stabilizer tableau at any width
// (package sim's CompareCliffordPrograms): each classical bit is an affine function of fair coins,
// the distributions are uniform over affine sets, and their distance is exact.
type stabilizerProgramEngine struct{}

var _ engine = stabilizerProgramEngine{}

func (stabilizerProgramEngine) name() Engine { return "stabilizer-program" }

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

// programEngine compares programs by enumerating their measurement branches on statevectors
// (package sim's ComparePrograms).
type programEngine struct{}

var _ engine = programEngine{}

func (programEngine) name() Engine { return "program" }

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
	return outcomeVerdict(cfg, r, g, 0)
}

// outcomeVerdict fills r from the gap between two outcome distributions; rounding bounds how far
// the programs' own distance may be from the one computed.
func outcomeVerdict(cfg *config, r *Result, g sim.OutcomeGap, rounding float64) error {
	r.Measure = Distribution
	r.Distance = g.Distance
	switch {
	case g.Distance+rounding <= cfg.tol:
		r.Equivalent = true
	case g.Distance-rounding <= cfg.tol:
		r.Undecided = fmt.Sprintf("the distance %.4g is within the rounding %.2g of the tolerance", g.Distance, rounding)
	}
	if g.Outcome != "" {
		r.Outcome = &OutcomeEvidence{Bits: g.Outcome, Want: g.Want, Got: g.Got}
	}
	return nil
}

// zeroEngine compares two unitary circuits on the input |0…0⟩ (package sim's CompareFromZero),
// or the distributions of measuring some of their qubits from there.
type zeroEngine struct{}

var _ engine = zeroEngine{}

func (zeroEngine) name() Engine { return "zero-state" }

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
		return outcomeVerdict(cfg, r, g, 0)
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
