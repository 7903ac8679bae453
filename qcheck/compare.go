package qcheck

import "qcheck.dev/qcheck/circuit"

// Compare computes how far got is from want and whether that is within the tolerance. By default
// it compares the unitaries of two circuits of the same width in operator norm up to a global
// phase, with tolerance DefaultTolerance; options change each of these. The Result carries the
// evidence for a difference (witness state, a distinguishing measurement, the ops to blame);
// Report turns it into text.
//
// Compare returns an error, never a panic, for bad input: a nil or ill-formed circuit (naming the
// op), circuits of different widths, options that do not fit the circuits (a permutation that is
// not one, an ancilla or measured qubit out of range), a tolerance that is not positive and
// finite, or a register too wide for the engine.
func Compare(want, got *circuit.Circuit, opts ...Option) (Result, error) {
	cfg, err := newConfig(opts)
	if err != nil {
		return Result{}, err
	}
	return compare(cfg, want, got, true)
}

// compare is Compare with the options resolved. Without full, the evidence (witness,
// measurement, blame) is gathered only when the circuits are not equivalent, which is what
// keeps property checks fast.
func compare(cfg *config, want, got *circuit.Circuit, full bool) (Result, error) {
	f, err := frameOf(cfg, want, got)
	if err != nil {
		return Result{}, err
	}
	eng, err := chooseEngine(cfg, f)
	if err != nil {
		return Result{}, err
	}
	r := Result{
		Measure:    cfg.measure,
		Tolerance:  cfg.tol,
		ExactPhase: cfg.exactPhase,
		Engine:     eng.name(),
		Certifies:  eng.certifies(cfg, f),
		Want:       want,
		Got:        got,
		Options:    cfg.describe(),
		Qubits:     f.m,
		Measured:   f.measured,
		Bits:       f.bits,
		Meaning:    f.meaning,
	}
	if err := eng.compare(cfg, f, &r, full); err != nil {
		return Result{}, err
	}
	return r, nil
}
