package catalogue_test

import (
	"flag"
	"fmt"
	"strings"
	"testing"

	"qcheck.dev/examples/campaign"
	"qcheck.dev/examples/catalogue"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/shrink"
)

// minimal runs TestCounterexamplesAreOneMinimal, which shrinks with rapid (minutes on a loaded
// machine).
var minimal = flag.Bool("catalogue.minimal", false, "shrink each bug's counterexample with rapid, then Minimize, and check it is 1-minimal")

// Every bug's counterexample, as rapid shrinks it and then shrink.Minimize finishes it, is
// 1-minimal: checked by brute force (shrink.Check tries every single op removal, qubit lowering
// and simpler special angle). The test logs the sizes before and after Minimize; the smallest
// circuits of TestWrongPassesFailOnTheirSmallestCircuit bound what Minimize can reach. It runs
// with -catalogue.minimal:
//
//	go test ./examples/catalogue -run TestCounterexamplesAreOneMinimal -catalogue.minimal -v
func TestCounterexamplesAreOneMinimal(t *testing.T) {
	if !*minimal || testing.Short() {
		t.Skip("slow; run with -catalogue.minimal, without -short")
	}
	g := gen.Circuit(settings[1].opts)
	var summary strings.Builder
	for _, b := range catalogue.Bugs() {
		f, err := campaign.Hunt(campaign.Target{Name: b.Name, Pass: b.Wrong, Circuits: g}, 1, campaign.DefaultChecks)
		if err != nil {
			t.Fatalf("%s: %v", b.Name, err)
		}
		if f == nil || f.Kind != qcheck.NotEquivalent {
			t.Errorf("%s: seed 1 found no meaning change: %v", b.Name, f)
			continue
		}
		fails := func(c *circuit.Circuit) bool {
			exposed, err := catalogue.Exposes(b, c)
			return err == nil && exposed
		}
		if !fails(f.Input) {
			t.Errorf("%s: rapid's counterexample %#v does not expose the bug", b.Name, f.Input)
			continue
		}
		m := shrink.Minimize(f.Input, fails)
		if err := shrink.Check(m, fails); err != nil {
			t.Errorf("%s: %v\n%#v", b.Name, err, m)
		}
		fmt.Fprintf(&summary, "%-24s rapid %2d ops → %d ops: %#v\n", b.Name, f.Input.Len(), m.Len(), m)
	}
	t.Logf("counterexamples (seed 1):\n%s", summary.String())
}

// The quick form of the same check: each bug's smallest circuit, buried among the ops of generated
// circuits on 5 qubits, is minimized back to a 1-minimal circuit, checked by brute force.
func TestMinimizeBuriedCounterexamples(t *testing.T) {
	noise := gen.Circuit(gen.Options{Qubits: 5, MaxOps: 12, GateSet: []string{"h", "x", "t", "rz", "cx", "cz"}})
	for _, b := range catalogue.Bugs() {
		fails := func(c *circuit.Circuit) bool {
			exposed, err := catalogue.Exposes(b, c)
			return err == nil && exposed
		}
		var buried *circuit.Circuit
		for seed := 0; seed < 50 && buried == nil; seed++ {
			before, after := noise.Example(2*seed), noise.Example(2*seed+1)
			c := circuit.New(5).Compose(before)
			for _, op := range smallest[b.Name].Ops {
				op = op.Clone()
				for i := range op.Qubits {
					op.Qubits[i] += 2 // away from the lowest qubits, which Minimize must come back to
				}
				c.AppendOp(op)
			}
			if c = c.Compose(after); fails(c) {
				buried = c
			}
		}
		if buried == nil {
			t.Errorf("%s: no noise kept the bug visible", b.Name)
			continue
		}
		m := shrink.Minimize(buried, fails)
		if err := shrink.Check(m, fails); err != nil {
			t.Errorf("%s: %v\n%#v", b.Name, err, m)
		}
		t.Logf("%-24s %2d ops → %d: %#v", b.Name, buried.Len(), m.Len(), m)
	}
}
