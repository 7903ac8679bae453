package readout_test

import (
	"flag"
	"testing"

	"qcheck.dev/examples/readout"
	"qcheck.dev/examples/readout/careless"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

// asPass turns a readout pass into a qcheck.Pass.
func asPass(p pass) qcheck.Pass {
	return func(c *circuit.Circuit) (*circuit.Circuit, error) { return p(c), nil }
}

// The passes keep the meaning of programs, checked the way a Quillwort engineer would: qcheck
// compares programs through their classical bits, and shrinks any counterexample.
func TestPreservesPrograms(t *testing.T) {
	qcheck.Preserves(t, asPass(readout.DropDiagonals), programs, qcheck.AsProgram())
	qcheck.Preserves(t, asPass(readout.RelabelSwaps), sedgePrograms(map[string]int{"swap": 8}), qcheck.AsProgram())
}

// Search finds each careless variant's bug and shrinks it to a small program. The programs are
// those the bugs need, on two qubits: a cz whose second qubit is rotated afterwards, a SWAP of
// qubits in different states. The first is often missing from rapid's 100 draws, so the seed is fixed
// (rapid's -rapid.seed, which Search reads) to keep the test from depending on luck; it was chosen
// again when gen.Circuit's draws changed (issue 16).
func TestSearchCatchesCareless(t *testing.T) {
	seed := flag.Lookup("rapid.seed")
	old := seed.Value.String()
	if err := seed.Value.Set("2"); err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { seed.Value.Set(old) })
	// Search makes a fifth of the checks under -short, as rapid.Check does; the seed was chosen
	// for 100 checks, so that is what it makes either way.
	checks := flag.Lookup("rapid.checks")
	oldChecks, n := checks.Value.String(), "100"
	if testing.Short() {
		n = "500"
	}
	if err := checks.Value.Set(n); err != nil {
		t.Fatal(err)
	}
	t.Cleanup(func() { checks.Value.Set(oldChecks) })
	for _, tc := range []struct {
		name  string
		pass  pass
		gates []string
	}{
		{"DropDiagonals", careless.DropDiagonals, []string{"h", "cz"}},
		{"RelabelSwaps", careless.RelabelSwaps, []string{"x", "swap"}},
	} {
		g := gen.Program(gen.ProgramOptions{
			Options: gen.Options{Qubits: 2, MaxOps: 8, Motifs: -1, GateSet: tc.gates},
			Measure: -1, Reset: -1, If: -1,
		})
		f, err := qcheck.Search(asPass(tc.pass), g, qcheck.AsProgram())
		if err != nil {
			t.Fatalf("%s: %v", tc.name, err)
		}
		if f == nil || f.Kind != qcheck.NotEquivalent || f.Result.Meaning != "program" {
			t.Fatalf("careless.%s: %+v; want a program the pass changes", tc.name, f)
		}
		if f.Input.Len() > 8 {
			t.Errorf("careless.%s: shrunk only to %d ops:\n%s", tc.name, f.Input.Len(), f.Report())
		}
		t.Logf("careless.%s:\n%s", tc.name, f.Report())
	}
}
