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
	if !r.Equivalent {
		// Rounding can carry a sum of branch probabilities a hair past 1; a probability is
		// reported within [0, 1].
		r.Outcome, r.OutcomeWant, r.OutcomeGot = g.Outcome, min(max(g.Want, 0), 1), min(max(g.Got, 0), 1)
	}
	return nil
}
