package qcheck

import (
	"flag"
	"os"
	"strings"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/qcheck/circuit"
)

// Search's failure replays exactly: Example redraws the failing circuit from f.Seed, and Search
// from base seed f.Seed finds it at its first check and ends at the same input.
func TestSearchReplaysFromItsSeed(t *testing.T) {
	withSeed(t, 8)
	g := circuitsOf(3, 0, 20, "h", "t", "s", "rz", "cx", "cz", "swap")
	f, err := Search(dropT, g)
	if err != nil || f == nil {
		t.Fatalf("Search = %v, %v; want a failure", f, err)
	}
	cfg, err := newConfig(nil)
	if err != nil {
		t.Fatal(err)
	}
	if trial(cfg, Pass(dropT).subject(), g.Example(int(f.Seed))) == nil {
		t.Errorf("the circuit drawn from seed %d does not fail", f.Seed)
	}
	withSeed(t, f.Seed)
	again, err := Search(dropT, g)
	if err != nil || again == nil {
		t.Fatalf("replay: Search = %v, %v; want a failure", again, err)
	}
	if again.Seed != f.Seed || again.Passed != 0 || !again.Input.Equal(f.Input) || again.Kind != f.Kind {
		t.Errorf("replay found seed %d after %d checks with input %v; want seed %d at once with %v",
			again.Seed, again.Passed, again.Input.Ops, f.Seed, f.Input.Ops)
	}
}

// Search draws the circuits rapid.Check draws from the same base seed, in the same order, so
// the seed in its report also replays in a test that runs Preserves.
func TestSearchDrawsWhatRapidDraws(t *testing.T) {
	withSeed(t, 9)
	g := circuits(3, 10)
	var drawn []*circuit.Circuit
	h := &recordTB{name: "draws"}
	rapid.Check(h, func(rt *rapid.T) { drawn = append(drawn, g.Draw(rt, "circuit")) })
	if h.failed || len(drawn) == 0 {
		t.Fatalf("rapid.Check drew %d circuits and failed=%v: %q", len(drawn), h.failed, h.errors)
	}
	seed := uint64(9)
	for i, want := range drawn {
		seed += uint64(i)
		if got := g.Example(int(seed)); !got.Equal(want) {
			t.Fatalf("check %d (seed %d): Example drew %v, rapid.Check drew %v", i, seed, got.Ops, want.Ops)
		}
	}
}

// Search changes none of rapid's settings and writes no fail file.
func TestSearchLeavesRapidAlone(t *testing.T) {
	withSeed(t, 10)
	before := map[string]string{}
	flag.VisitAll(func(f *flag.Flag) {
		if strings.HasPrefix(f.Name, "rapid.") {
			before[f.Name] = f.Value.String()
		}
	})
	dir := t.TempDir()
	t.Chdir(dir)
	if f, err := Search(dropT, circuits(3, 20)); err != nil || f == nil {
		t.Fatalf("Search = %v, %v; want a failure", f, err)
	}
	flag.VisitAll(func(f *flag.Flag) {
		if old, ok := before[f.Name]; ok && f.Value.String() != old {
			t.Errorf("-%s changed from %q to %q", f.Name, old, f.Value.String())
		}
	})
	if entries, _ := os.ReadDir(dir); len(entries) != 0 {
		t.Errorf("Search wrote %d entries, such as %s, into the working directory", len(entries), entries[0].Name())
	}
}

// A generator that cannot draw a circuit is an error naming the check and its seed.
func TestSearchReportsABrokenGenerator(t *testing.T) {
	withSeed(t, 11)
	broken := rapid.Custom(func(t *rapid.T) *circuit.Circuit { panic("no circuits today") })
	_, err := Search(cancelPairs, broken)
	if err == nil || !strings.Contains(err.Error(), "check 1 (seed 11)") || !strings.Contains(err.Error(), "no circuits today") {
		t.Errorf("err = %v, want the check, its seed and the generator's panic", err)
	}
}
