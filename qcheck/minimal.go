package qcheck

import (
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/shrink"
)

// minimized returns the failure of a 1-minimal input that fails the same way as f's:
// shrink.Minimize works on the circuit itself, until removing any op, lowering any qubit or
// simplifying any angle makes the failure go away. The result keeps f's Seed and Passed, which
// describe the search. It is f itself when f's
// input is already 1-minimal.
func minimized(cfg *config, s subject, f *Failure) *Failure {
	fails := func(c *circuit.Circuit) bool {
		g := trial(cfg, s, c)
		return g != nil && g.Kind == f.Kind
	}
	m := shrink.Minimize(f.Input, fails)
	if m.Equal(f.Input) {
		return f
	}
	g := trial(cfg, s, m)
	g.Seed, g.Passed = f.Seed, f.Passed
	return g
}
