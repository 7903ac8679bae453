package ancilla_test

import (
	"strings"
	"testing"

	"qcheck.dev/examples/ancilla"
	"qcheck.dev/examples/campaign"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

// circuitsWithMCX draws circuits on n qubits mixing ordinary gates with X gates of three and
// four controls.
func circuitsWithMCX(t *testing.T, n int) gen.Options {
	t.Helper()
	var custom []circuit.Gate
	for k := 3; k <= min(4, n-1); k++ {
		g, err := ancilla.MCX(k)
		if err != nil {
			t.Fatal(err)
		}
		custom = append(custom, g)
	}
	return gen.Options{Qubits: n, MaxOps: 12, GateSet: []string{"h", "x", "t", "cx", "ccx", "rz"}, Custom: custom}
}

// Each lowering keeps the circuit's meaning on the data qubits and returns its ancillas as the
// qcheck Ancillas option demands: clean ones to |0⟩ from |0⟩, dirty ones to whatever they held.
func TestLoweringsPreserveWithTheirAncillas(t *testing.T) {
	const n = 5
	cases := []struct {
		name     string
		pass     qcheck.Pass
		ancillas []int
		state    qcheck.AncillaState
	}{
		{"Lower (one clean)", ancilla.Lower, []int{n}, qcheck.Clean},
		{"LowerBorrowed (one dirty)", ancilla.LowerBorrowed, []int{n}, qcheck.Dirty},
		{"Chain (two clean)", ancilla.Lowering{Build: ancilla.Chain, Ancillas: 2, Clean: true}.Apply, []int{n, n + 1}, qcheck.Clean},
	}
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			qcheck.Preserves(t, tc.pass, gen.Circuit(circuitsWithMCX(t, n)), qcheck.Ancillas(tc.ancillas, tc.state))
		})
	}
}

// The clean-ancilla constructions are not dirty-safe: Lower's ancilla must start in |0⟩. The
// checker must see that when told the ancilla is dirty (a check that can fail, on the smallest
// case: with the ancilla in |1⟩, the AND of the first controls is toggled into a value that is
// wrong whenever the last control and the ancilla are 1).
func TestCleanLoweringIsNotDirtySafe(t *testing.T) {
	g, _ := ancilla.MCX(3)
	c := circuit.New(4).Append(g, 0, 1, 2, 3)
	got, err := ancilla.Lower(c)
	if err != nil {
		t.Fatal(err)
	}
	r, err := qcheck.Compare(c, got, qcheck.Ancillas([]int{4}, qcheck.Dirty))
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent {
		t.Errorf("Lower's output passed as dirty-safe:\n%v", got)
	}
	qcheck.Equivalent(t, c, got, qcheck.Ancillas([]int{4}, qcheck.Clean))
}

// The leaky chain of package leak is caught by the clean-ancilla check, and the report points at
// an ancilla qubit left set.
func TestLeakIsCaught(t *testing.T) {
	target := campaign.Leak()
	f, err := campaign.Hunt(target, 20261201, campaign.DefaultChecks)
	if err != nil {
		t.Fatal(err)
	}
	if f == nil {
		t.Fatalf("no failure in %d checks", campaign.DefaultChecks)
	}
	if f.Kind != qcheck.NotEquivalent {
		t.Fatalf("failure of kind %v, want %v:\n%s", f.Kind, qcheck.NotEquivalent, f.Report())
	}
	hasMCX := false
	for _, op := range f.Input.Ops {
		hasMCX = hasMCX || strings.HasPrefix(op.Gate.Name, "c") && strings.HasSuffix(op.Gate.Name, "x") && len(op.Qubits) >= 4
	}
	if !hasMCX {
		t.Errorf("shrunk input has no X with three or more controls:\n%s", f.Report())
	}
	// The correct chain, given the same ancillas, is right on the same input.
	good, err := ancilla.Lowering{Build: ancilla.Chain, Ancillas: 3, Clean: true}.Apply(f.Input)
	if err != nil {
		t.Fatal(err)
	}
	qcheck.Equivalent(t, f.Input, good, target.Options...)
	if !strings.Contains(f.Report(), "ancilla") {
		t.Errorf("report does not mention the ancillas:\n%s", f.Report())
	}
}
