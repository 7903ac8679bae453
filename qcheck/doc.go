// Package qcheck checks that quantum circuit transformations keep a circuit's meaning: that a
// compiler pass, optimizer, router or synthesis step returns a circuit with the same unitary
// within a tolerance in operator norm, by default up to a global phase.
//
// The entry points:
//
//   - [Compare](want, got, opts...) computes the distance and the verdict, with the evidence for
//     a difference: a witness input state, a measurement whose probabilities differ, and the
//     ops to blame. [Equivalent] is the same as a test helper.
//   - [Preserves](t, pass, g, opts...) runs a rapid property: it draws circuits from g, runs the
//     pass, and checks each output. A pass error, a panic, a change to the input circuit, an
//     ill-formed output or a difference fails the test once, with the smallest failing circuit
//     rapid can shrink to. [PreservesLayout] does the same for a router that reports its final
//     layout; [Search] runs the campaign outside a test and returns the [Failure] as a value.
//   - [CheckRule](t, rule, pass, opts...) checks a local rewrite rule, and the pass that applies
//     it inside random circuits on wider registers. A rule whose sides are parametric circuits
//     of package qcheck/param is proved for every value of its parameters.
//   - [Property] and [RuleProperty] return the properties themselves, for rapid.MakeFuzz and go
//     test -fuzz.
//
// Error budgets of approximate passes (a ledger of rewrites and their certified errors) are in
// package qcheck/budget.
//
// # Options
//
// Options are values that compose, in the manner of go-cmp's: [Tolerance], [ExactPhase],
// [OutputPermutation], [Ancillas], [Measured], [UseMeasure] and [UseEngine]. Options that
// contradict each other are refused with an error by Compare, whatever the engine.
//
// # Distances
//
// The default measure is the phase-free operator-norm distance of the two unitaries U (want)
// and V (got),
//
//	min over φ of ‖U − e^{iφ}·V‖,
//
// or ‖U − V‖ with ExactPhase; [Result.OperatorDistance] always holds it, and twice it bounds the
// change of any measurement outcome's probability (Nielsen & Chuang §4.5.3). Package metric's
// documentation gives the closed forms. A witness ψ certifies a lower bound on it by itself:
//
//	min over φ of ‖U·ψ − e^{iφ}·V·ψ‖ ≤ min over φ of ‖U − e^{iφ}·V‖.
//
// # Engines
//
// An engine gives the circuits their meaning: [Dense] (both unitaries as matrices, exact to
// rounding), [Tableau] (stabilizer tableaux, exact, Clifford circuits of any width) and
// [MatrixFree] (a Krylov estimate from statevector runs, 13 to 22 qubits). [Auto], the default,
// takes the first of them, in that order, that accepts the comparison; the [Result] names the
// engine and says in [Result.Certifies] what its verdict guarantees. A witness always certifies a
// lower bound on the distance; an engine whose bounds straddle the tolerance says so in
// [Result.Undecided] and does not count the circuits as equivalent.
//
// # Reports
//
// [Result.Report] and [Failure.Report] write text for people, built from the same sections
// (verdict, settings, circuits, their difference, blame, evidence, replay); the text may change
// between versions. A Result's JSON encoding ([Result.MarshalJSON]) is for programs, and its keys
// do not change.
//
// # Conventions
//
// A basis state's index is Σ_q b_q·2^q, qubit 0 the least-significant bit, and kets are written
// |q_{n−1} … q1 q0⟩ with qubit 0 rightmost ([Ket]). Gate definitions are package circuit's. qcheck
// checks the mathematics of ideal gates: no noise model, no pulses.
package qcheck
