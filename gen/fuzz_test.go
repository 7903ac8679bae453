package gen

import (
	"bytes"
	"math/rand/v2"
	"testing"

	"pgregory.net/rapid"
)

// Under Fuzz, circuits drawn from fuzzer-like inputs (random bytes, 0 to 512 of them, as Go's
// fuzzer makes early on) are as long as under rapid.Check: their mean length is within 15% of
// the mean over Example's draws; under rapid.MakeFuzz most inputs are skipped and the rest are
// short (logged for comparison, the 2.6 ops against 26.6).
func TestFuzzDrawsWholeCircuits(t *testing.T) {
	g := Circuit(Options{Qubits: 3, MaxOps: 30})
	const n = 300
	checkMean := 0.0
	for i := range n {
		checkMean += float64(g.Example(i).Len()) / n
	}
	rng := rand.New(rand.NewPCG(1, 2))
	inputs := make([][]byte, n)
	for i := range inputs {
		inputs[i] = make([]byte, rng.IntN(513))
		for k := range inputs[i] {
			inputs[i][k] = byte(rng.Uint32())
		}
	}
	lengths := func(wrap func(func(*rapid.T)) func(*testing.T, []byte)) (mean float64, ran int) {
		sum := 0
		for _, in := range inputs {
			length := -1
			target := wrap(func(rt *rapid.T) { length = g.Draw(rt, "circuit").Len() })
			t.Run("input", func(t *testing.T) { target(t, in) })
			if length >= 0 {
				sum += length
				ran++
			}
		}
		if ran == 0 {
			return 0, 0
		}
		return float64(sum) / float64(ran), ran
	}
	fuzzMean, fuzzRan := lengths(Fuzz)
	plainMean, plainRan := lengths(rapid.MakeFuzz)
	t.Logf("mean length: rapid.Check %.1f; Fuzz %.1f (%d of %d inputs ran); rapid.MakeFuzz %.1f (%d ran)",
		checkMean, fuzzMean, fuzzRan, n, plainMean, plainRan)
	if fuzzRan != n || fuzzMean < 0.85*checkMean {
		t.Errorf("under Fuzz %d of %d inputs ran, mean length %.1f; want all, and at least 85%% of rapid.Check's %.1f",
			fuzzRan, n, fuzzMean, checkMean)
	}
}

// The fuzzer's bytes steer the draws: two inputs that differ give different circuits, and the
// same input gives the same circuit.
func TestFuzzInputSteers(t *testing.T) {
	g := Circuit(Options{Qubits: 3, MaxOps: 30})
	draw := func(in []byte) string {
		var s string
		target := Fuzz(func(rt *rapid.T) { s = g.Draw(rt, "circuit").String() })
		t.Run("input", func(t *testing.T) { target(t, in) })
		return s
	}
	a, b := bytes.Repeat([]byte{7}, 64), bytes.Repeat([]byte{9}, 64)
	if draw(a) != draw(a) {
		t.Error("the same input drew two circuits")
	}
	if draw(a) == draw(b) {
		t.Error("two inputs drew the same circuit")
	}
}
