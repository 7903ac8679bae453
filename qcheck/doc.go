// Package qcheck checks that quantum circuit transformations keep a circuit's meaning: that a
// compiler pass, optimizer, router or synthesis step returns a circuit with the same unitary
// within a tolerance in operator norm, by default up to a global phase.
//
// The entry points:
//
//   - Compare(want, got, opts...) computes the distance and the verdict, with the evidence for
//     a difference: a witness input state, a measurement whose probabilities differ, and the
//     ops to blame. Equivalent is the same as a test helper.
//   - Preserves(t, pass, g, opts...) runs a rapid property: it draws circuits from g, runs the
//     pass, and checks each output. A pass error, a panic, a change to the input circuit, an
//     ill-formed output or a difference fails the test once, with the smallest failing circuit
//     rapid can shrink to. PreservesLayout does the same for a router that reports its final
//     layout; Search runs the campaign outside a test and returns the Failure as a value.
//   - CheckRule(t, rule, pass, opts...) checks a local rewrite rule, and the pass that applies
//     it inside random circuits on wider registers.
//   - Property and RuleProperty return the properties themselves, for rapid.MakeFuzz and go test
//     -fuzz.
//
// Options are values that compose, in the manner of go-cmp's: Tolerance, ExactPhase,
// OutputPermutation, Ancillas, Measured, UseMeasure and UseEngine. Reports (Result.Report,
// Failure.Report) are built from values and never by the checks themselves.
//
// Conventions: a basis state's index is Σ_q b_q·2^q, qubit 0 the least-significant bit, and kets
// are written |q_{n−1} … q1 q0⟩ with qubit 0 rightmost. What a verdict certifies depends on the
// engine, named in the Result: the dense engine is exact to floating-point rounding; a witness
// always certifies a lower bound on the distance. qcheck checks the mathematics of ideal gates:
// no noise model, no pulses.
package qcheck
