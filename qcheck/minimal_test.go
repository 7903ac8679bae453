package qcheck

import (
	"testing"

	"qcheck.dev/gen"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/shrink"
)

// Search's counterexample is 1-minimal, checked by brute force: a pass that drops every t gate
// (t is diag(1, e^{iπ/4}), not the identity: N&C Fig. 4.2) fails on a lone t on qubit 0, which is
// where any failure it finds must end.
func TestSearchCounterexampleIsOneMinimal(t *testing.T) {
	dropT := func(c *circuit.Circuit) (*circuit.Circuit, error) {
		out := circuit.New(c.Qubits())
		for _, op := range c.Ops {
			if op.Gate.Name != "t" {
				out.AppendOp(op.Clone())
			}
		}
		return out, nil
	}
	f, err := Search(dropT, gen.Circuit(gen.Options{Qubits: 4, MaxOps: 30}))
	if err != nil || f == nil {
		t.Fatalf("Search = %v, %v; want a failure", f, err)
	}
	cfg, _ := newConfig(nil)
	fails := func(c *circuit.Circuit) bool {
		g := trial(cfg, Pass(dropT).subject(), c)
		return g != nil && g.Kind == NotEquivalent
	}
	if err := shrink.Check(f.Input, fails); err != nil {
		t.Errorf("%v: %#v", err, f.Input)
	}
	if want := circuit.New(4).T(0); !f.Input.Equal(want) {
		t.Errorf("Search's input = %#v, want %#v", f.Input, want)
	}
}
