package gen

import (
	"encoding/binary"
	"hash/fnv"
	"math/rand/v2"
	"testing"

	"pgregory.net/rapid"
)

// Fuzz returns a fuzz target for (*testing.F).Fuzz that runs prop, as rapid.MakeFuzz does, on
// draws as long and varied as under rapid.Check:
//
//	func FuzzMergeRotations(f *testing.F) {
//		f.Fuzz(gen.Fuzz(qcheck.Property(peephole.MergeRotations, gen.Circuit(gen.Options{}))))
//	}
//
// Under rapid.MakeFuzz every draw reads the next 8 bytes of the fuzzer's input, and a draw past
// its end makes rapid skip the input. A circuit costs a few hundred draws, while Go's fuzzer
// starts from short inputs and lengthens them slowly, so the circuits that run are the few that
// stop early: a few ops on average, against about three quarters of MaxOps under rapid.Check.
// Fuzz reads the fuzzer's input first, so its bytes steer the first choices, and continues with
// a stream of fuzzBytes pseudo-random bytes seeded by a hash of the input, so every circuit is
// drawn to its end. The same input gives the same circuit, so a failing input Go saves under
// testdata/fuzz/ replays.
func Fuzz(prop func(*rapid.T)) func(*testing.T, []byte) {
	target := rapid.MakeFuzz(prop)
	return func(t *testing.T, input []byte) {
		t.Helper()
		target(t, extend(input))
	}
}

// fuzzBytes is how many bytes Fuzz appends to the fuzzer's input: 4096 draws, an order of
// magnitude more than a 30-op circuit on 5 qubits takes.
const fuzzBytes = 8 * 4096

// extend returns input, padded with zeros to a whole number of 8-byte words (rapid reads words),
// followed by fuzzBytes bytes of a PCG stream seeded by the FNV-1a hash of input.
func extend(input []byte) []byte {
	n := (len(input) + 7) / 8 * 8
	out := make([]byte, n+fuzzBytes)
	copy(out, input)
	h := fnv.New64a()
	h.Write(input)
	rng := rand.NewPCG(h.Sum64(), sourceStream)
	for i := n; i < len(out); i += 8 {
		binary.LittleEndian.PutUint64(out[i:], rng.Uint64())
	}
	return out
}
