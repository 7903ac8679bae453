package qcheck

import (
	"math/rand/v2"
	"os"
	"os/exec"
	"strconv"
	"strings"
	"testing"

	"pgregory.net/rapid"
)

// Every property is also a go test -fuzz target through rapid.MakeFuzz, which reads the fuzzer's
// bytes as rapid's random choices. A long campaign on one core:
//
//	go test ./qcheck -run '^$' -fuzz FuzzMergeRZRule -fuzztime 1h -parallel 1
//
// Inputs that fail are saved by Go under testdata/fuzz/<target>/ and from then on run with
// every go test, as a regression corpus. testdata/fuzz/FuzzMergeRZRule/ holds one such input: an
// input on which the rule with mergeRZAnyQubit (the pass whose matcher ignores qubits) fails and
// the fixed pass does not, found again by a search over random byte strings when gen's circuits
// changed (issue 16), since an entry holds rapid's choices and not the circuit;
// TestFuzzCorpusCatchesTheMatcherBug checks that it still exposes the bug.

//
// rapid reads eight bytes per choice and skips an input that runs out of bytes before the
// property has drawn everything, so the seeds include long inputs: mutating those reaches
// circuits of every size, while short seeds would leave the fuzzer skipping.

func FuzzCancelPairs(f *testing.F) {
	addSeeds(f)
	f.Fuzz(rapid.MakeFuzz(Property(cancelPairs, circuits(3, 20))))
}

func FuzzMergeRZRule(f *testing.F) {
	addSeeds(f)
	f.Fuzz(rapid.MakeFuzz(RuleProperty(mergeRZ, mergeRZPass)))
}

// addSeeds adds an empty input and a few long pseudo-random ones from a fixed seed.
func addSeeds(f *testing.F) {
	f.Add([]byte{})
	rng := rand.New(rand.NewPCG(1, 2))
	for _, n := range []int{256, 512, 1024} {
		data := make([]byte, n)
		for i := range data {
			data[i] = byte(rng.Uint32())
		}
		f.Add(data)
	}
}

// readCorpusEntry reads a file of Go's fuzz corpus format holding one []byte value.
func readCorpusEntry(t *testing.T, path string) []byte {
	t.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(strings.TrimSpace(string(data)), "\n")
	if len(lines) != 2 || lines[0] != "go test fuzz v1" || !strings.HasPrefix(lines[1], "[]byte(") {
		t.Fatalf("%s is not a corpus entry of one []byte", path)
	}
	s, err := strconv.Unquote(strings.TrimSuffix(strings.TrimPrefix(lines[1], "[]byte("), ")"))
	if err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	return []byte(s)
}

// The corpus entry passes with the fixed pass (go test runs it as part of FuzzMergeRZRule) and
// still fails with the buggy one. A failing run would fail this test too, so it runs in a child
// process (the test binary itself, with an environment variable), whose failure is the
// expected outcome.
func TestFuzzCorpusCatchesTheMatcherBug(t *testing.T) {
	entry := readCorpusEntry(t, "testdata/fuzz/FuzzMergeRZRule/matcher-ignores-qubits")
	if os.Getenv("QCHECK_REPLAY_BUGGY_MATCHER") == "1" {
		rapid.MakeFuzz(RuleProperty(mergeRZ, mergeRZAnyQubit))(t, entry)
		return
	}
	if testing.Short() {
		t.Skip("runs a child test process")
	}
	cmd := exec.Command(os.Args[0], "-test.run=^TestFuzzCorpusCatchesTheMatcherBug$", "-test.v")
	cmd.Env = append(os.Environ(), "QCHECK_REPLAY_BUGGY_MATCHER=1", "RAPID_NOFAILFILE=true")
	out, err := cmd.CombinedOutput()
	if err == nil {
		t.Fatalf("the corpus entry no longer exposes the matcher bug:\n%s", out)
	}
	if !strings.Contains(string(out), "the pass changes a") {
		t.Errorf("the child failed for another reason:\n%s", out)
	}
}
