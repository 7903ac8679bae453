// Package gen holds rapid generators for testing quantum circuit
// transformations: random circuits that reach the places where compiler bugs
// hide and shrink to something a person can read, exactly distributed random
// unitaries, states and Cliffords, angles, qubit placements and coupling
// graphs.
//
// Every generator is a *rapid.Generator (pgregory.net/rapid), drawn inside a
// property test:
//
//	func TestMergeRotations(t *testing.T) {
//		g := gen.Circuit(gen.Options{Qubits: 4, MaxOps: 40, GateSet: []string{"rz", "rx", "cx", "h"}})
//		rapid.Check(t, func(t *rapid.T) {
//			c := g.Draw(t, "circuit")
//			out, err := mergeRotations(c.Clone())
//			// ... compare out with c
//		})
//	}
//
// # Circuits
//
// Circuit draws circuits configured by Options, whose zero value is useful
// (3 qubits, up to 20 ops, DefaultGateSet). Angles come from Angle, which
// favours the special values 0, ±π/4, ±π/2, ±π, ±2π, ±4π and values a hair
// away from 0, ±π/2, ±π, ±2π, ±4π. Motifs (Options.Motifs) plant the structure rewrite
// passes look for, with the user's gates only: left-hand sides of textbook
// identities and near misses of them, sandwiches (an op, ops sharing its
// qubits in every role, then the op again, its inverse, its operands
// reversed or a sibling gate), runs of gates on the same qubits, runs of
// commuting diagonal gates, repeated blocks. How fast this finds pass bugs
// is measured on a catalogue of nineteen realistic ones (examples/catalogue,
// table in testdata/catalogue/detection.txt). A failing circuit shrinks
// toward fewer ops, lower qubit indices, gates listed earlier in the set and
// special angles; where a motif derived ops from one another rapid can stop
// a few ops short, and package qcheck/shrink finishes the job (qcheck.Search
// uses it).
//
// # Fuzzing
//
// Fuzz turns a property into a go test -fuzz target whose circuits are as
// long as under rapid.Check, with the fuzzer's bytes steering the first
// choices; under rapid.MakeFuzz every choice eats eight bytes of the input,
// and circuits stop after a few ops.
//
// # Exact distributions
//
// Unitary draws Haar-distributed unitaries (QR of a complex Gaussian matrix
// with Mezzadri's phase fix), State Haar-random pure states, Clifford
// circuits uniform over the Clifford group modulo phase (Koenig & Smolin's
// pair-by-pair decomposition). rapid's own integer generators lean toward
// small values on purpose; these samplers draw their randomness without that
// lean, so values drawn inside rapid.Check follow the stated law exactly. The
// package's statistical tests check that on values drawn through rapid, each
// with a false-failure probability of at most 1e-6 per run.
//
// # Compiler helpers
//
// Layout draws a placement of logical qubits on physical ones, Embed places
// a small circuit on some qubits of a wider register, and Coupling draws a
// coupling graph of a given Shape (Line, Ring, Grid) with its qubits numbered
// at random, for routing tests.
//
// # Bad arguments
//
// A generator asked for something impossible (a negative width, an unknown
// gate name) does not panic: each draw fails the test with an error naming
// the argument at fault.
//
// # Conventions
//
// Qubit 0 is the least-significant bit of a basis index, as everywhere in
// qcheck; gate names are the lower-case OpenQASM names of package circuit.
package gen
