package campaign

import (
	"qcheck.dev/examples/ancilla"
	"qcheck.dev/examples/ancilla/leak"
	"qcheck.dev/examples/peephole/shortcut"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

// peepholeGates are the gates the peephole campaigns draw: Fieldfare's front-end gates, the
// simplest first so that failures shrink toward them.
var peepholeGates = []string{"h", "x", "z", "s", "t", "rz", "rx", "cx", "cp", "crz"}

// Peephole is the demo's target: the contributor's patched optimizer, with both shortcuts, on
// 3-qubit circuits of up to 30 ops.
func Peephole() Target {
	return Target{
		Name:     "shortcut.Optimize",
		Bug:      "Z-rotations slide through cx targets, and cp merges with crz as if they were the same gate",
		Pass:     shortcut.Optimize,
		Circuits: gen.Circuit(gen.Options{Qubits: 3, MaxOps: 30, GateSet: peepholeGates}),
	}
}

// Planted returns every planted bug of the examples with the circuits it is hunted on: the two
// shortcuts of package shortcut one at a time, and the leaky ancilla chain of package leak.
func Planted() []Target {
	circuits := gen.Circuit(gen.Options{Qubits: 3, MaxOps: 30, GateSet: peepholeGates})
	return []Target{
		{
			Name:     "shortcut.ZThroughTarget",
			Bug:      "Z-rotations slide through cx targets",
			Pass:     shortcut.ZThroughTarget,
			Circuits: circuits,
		},
		{
			Name:     "shortcut.CPAsCRZ",
			Bug:      "cp merges with crz as if they were the same gate",
			Pass:     shortcut.CPAsCRZ,
			Circuits: circuits,
		},
		Leak(),
	}
}

// leakQubits is the width of the circuits the leak campaign lowers; leak.Lower appends its
// ancillas after them.
const leakQubits = 5

// Leak is the target of the ancilla bug: 5-qubit circuits with X gates of three and four controls
// among ordinary gates, lowered by the leaky chain, whose ancillas must come back clean.
func Leak() Target {
	c3x, _ := ancilla.MCX(3) // 3 and 4 are within [0, ancilla.MaxControls]: no error
	c4x, _ := ancilla.MCX(4)
	anc := make([]int, leak.Ancillas)
	for i := range anc {
		anc[i] = leakQubits + i
	}
	return Target{
		Name: "leak.Lower",
		Bug:  "the uncompute ladder stops one Toffoli short and leaves the first ancilla dirty",
		Pass: leak.Lower,
		Circuits: gen.Circuit(gen.Options{Qubits: leakQubits, MaxOps: 12,
			GateSet: []string{"h", "x", "t", "cx"}, Custom: []circuit.Gate{c3x, c4x}}),
		Options: []qcheck.Option{qcheck.Ancillas(anc, qcheck.Clean)},
	}
}
