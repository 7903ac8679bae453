package peephole_test

import (
	"strings"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/examples/campaign"
	"qcheck.dev/examples/peephole"
	"qcheck.dev/examples/peephole/shortcut"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

// passes are the optimizer's exported passes.
var passes = map[string]qcheck.Pass{
	"CancelInverses": peephole.CancelInverses,
	"MergeRotations": peephole.MergeRotations,
	"Optimize":       peephole.Optimize,
}

// Every pass is exact (global phase included) on circuits from the optimizer's usual gates and
// from gen's default gate set, which adds u, y, ry, sx, cy, ch, crx, cry, swap, iswap, rxx, ryy,
// ccx and more that the optimizer must leave alone or handle right.
func TestPassesPreserveTheUnitary(t *testing.T) {
	sets := map[string]gen.Options{
		"fieldfare gates": {Qubits: 3, MaxOps: 30, GateSet: []string{"h", "x", "z", "s", "sdg", "t", "tdg", "rz", "rx", "p", "cx", "cz", "cp", "crz", "rzz"}},
		"default gates":   {Qubits: 4, MaxOps: 30},
	}
	for setName, opts := range sets {
		for name, pass := range passes {
			t.Run(setName+"/"+name, func(t *testing.T) {
				qcheck.Preserves(t, pass, gen.Circuit(opts), qcheck.ExactPhase())
			})
		}
	}
}

// rule turns a catalogue entry into a qcheck rule whose angles come from gen.Angle, which
// reaches 0, ±π, ±2π, ±4π and tiny offsets from them where angle reduction goes wrong.
func rule(rw peephole.Rewrite) func(*rapid.T) (left, right *circuit.Circuit) {
	return func(t *rapid.T) (*circuit.Circuit, *circuit.Circuit) {
		angles := make([]float64, rw.Angles)
		for i := range angles {
			angles[i] = gen.Angle().Draw(t, "angle")
		}
		return rw.Build(angles)
	}
}

func TestCatalogueRules(t *testing.T) {
	for _, rw := range peephole.Catalogue() {
		t.Run(rw.Name, func(t *testing.T) {
			qcheck.CheckRule(t, rule(rw), peephole.Optimize, qcheck.ExactPhase())
		})
	}
}

func TestOptimizeMakesEachCatalogueRewrite(t *testing.T) {
	for _, rw := range peephole.Catalogue() {
		// Angles whose sums stay in (−π, π), where no angle is reduced, so that the right side
		// is exactly what Optimize writes.
		angles := []float64{0.3, -1.2}[:rw.Angles]
		before, after := rw.Build(angles)
		got, err := peephole.Optimize(before)
		if err != nil {
			t.Fatalf("%s: %v", rw.Name, err)
		}
		if !got.Equal(after) {
			t.Errorf("%s: Optimize gave\n%vwant\n%v", rw.Name, got, after)
		}
	}
}

// toffoliNetwork is N&C Fig. 4.9: ccx with controls 0, 1 and target 2 from H, T, T† and six CNOTs,
// followed here by an extra h·h and t·tdg that the optimizer must remove.
func toffoliNetwork() *circuit.Circuit {
	return circuit.New(3).
		H(2).CX(1, 2).Tdg(2).CX(0, 2).T(2).CX(1, 2).Tdg(2).CX(0, 2).T(1).T(2).H(2).
		CX(0, 1).T(0).Tdg(1).CX(0, 1).H(2).H(2).T(0).Tdg(0)
}

// The optimized network is still the textbook Toffoli (N&C Fig. 4.9: the network equals ccx
// exactly) and has lost the four gates added after it.
func TestToffoliNetworkStaysToffoli(t *testing.T) {
	for name, pass := range passes {
		got, err := pass(toffoliNetwork())
		if err != nil {
			t.Fatalf("%s: %v", name, err)
		}
		qcheck.Equivalent(t, circuit.New(3).CCX(0, 1, 2), got, qcheck.ExactPhase())
	}
	got, _ := peephole.Optimize(toffoliNetwork())
	if got.Len() > 15 {
		t.Errorf("Optimize left %d ops, want at most the network's 15:\n%v", got.Len(), got)
	}
}

// huntSeed is a fixed seed for the campaigns below; the detection-rate measurement in package
// campaign shows that almost every seed finds each bug.
const huntSeed = 20261201

// The checker catches each shortcut, and the shrunk circuit it reports is made of the gates the
// bug is about (see package shortcut's documentation for the smallest failing circuits).
func TestShortcutsAreCaught(t *testing.T) {
	for _, target := range campaign.Planted()[:2] {
		f, err := campaign.Hunt(target, huntSeed, campaign.DefaultChecks)
		if err != nil {
			t.Fatalf("%s: %v", target.Name, err)
		}
		if f == nil {
			t.Fatalf("%s: no failure found in %d checks", target.Name, campaign.DefaultChecks)
		}
		if f.Kind != qcheck.NotEquivalent {
			t.Fatalf("%s: failure of kind %v, want %v:\n%s", target.Name, f.Kind, qcheck.NotEquivalent, f.Report())
		}
		// The correct optimizer keeps the same circuit's meaning: the failure is the shortcut's.
		good, err := peephole.Optimize(f.Input)
		if err != nil {
			t.Fatal(err)
		}
		qcheck.Equivalent(t, f.Input, good, qcheck.ExactPhase())

		report := f.Report()
		switch target.Name {
		case "shortcut.ZThroughTarget":
			if !hasZOnTarget(f.Input) {
				t.Errorf("shrunk input has no Z-rotation on a cx target:\n%s", report)
			}
			if !strings.Contains(report, "cx q") {
				t.Errorf("report does not name the cx:\n%s", report)
			}
		case "shortcut.CPAsCRZ":
			if !hasPair(f.Input, "cp", "crz") {
				t.Errorf("shrunk input has no cp and crz on the same control and target:\n%s", report)
			}
			if !strings.Contains(report, "cp(") || !strings.Contains(report, "crz(") {
				t.Errorf("report does not name cp and crz:\n%s", report)
			}
		}
	}
}

var zFamily = map[string]bool{"rz": true, "p": true, "z": true, "s": true, "sdg": true, "t": true, "tdg": true}

// hasZOnTarget reports whether c has a cx and a single-qubit diagonal gate on its target: the
// bug slides one past the other, whichever way (z·cx·z loses the z's; cx·z·cx loses the cx's).
func hasZOnTarget(c *circuit.Circuit) bool {
	for _, op := range c.Ops {
		if op.Gate.Name != "cx" {
			continue
		}
		for _, other := range c.Ops {
			if zFamily[other.Gate.Name] && other.Qubits[0] == op.Qubits[1] {
				return true
			}
		}
	}
	return false
}

// hasPair reports whether c has gates a and b on the same control and target.
func hasPair(c *circuit.Circuit, a, b string) bool {
	for _, x := range c.Ops {
		for _, y := range c.Ops {
			if x.Gate.Name == a && y.Gate.Name == b && x.Qubits[0] == y.Qubits[0] && x.Qubits[1] == y.Qubits[1] {
				return true
			}
		}
	}
	return false
}

// On their smallest circuits, the shortcuts are off by exactly the factor package shortcut's
// documentation names, and the correct optimizer is exact.
func TestShortcutsOnTheirSmallestCircuits(t *testing.T) {
	const alpha, theta = 0.3, 0.4
	cases := []struct {
		name string
		pass qcheck.Pass
		c    *circuit.Circuit
		// missing is what the shortcut drops, up to global phase: rz(α) moved past the cx target
		// should have become rzz(α) (cx·(I⊗Z)·cx = Z⊗Z, N&C §4.3); crz(θ) = cp(θ)·p(−θ/2) on
		// the control.
		missing *circuit.Circuit
	}{
		{"ZThroughTarget", shortcut.ZThroughTarget, circuit.New(2).RZ(alpha, 1).CX(0, 1).RZ(theta, 1),
			circuit.New(2).RZ(-alpha, 1).RZZ(alpha, 0, 1)},
		{"CPAsCRZ", shortcut.CPAsCRZ, circuit.New(2).CP(alpha, 0, 1).CRZ(theta, 0, 1), circuit.New(2).P(-theta/2, 0)},
	}
	for _, tc := range cases {
		good, err := peephole.Optimize(tc.c)
		if err != nil {
			t.Fatal(err)
		}
		qcheck.Equivalent(t, tc.c, good, qcheck.ExactPhase())
		bad, err := tc.pass(tc.c)
		if err != nil {
			t.Fatal(err)
		}
		r, err := qcheck.Compare(tc.c, bad)
		if err != nil {
			t.Fatal(err)
		}
		if r.Equivalent {
			t.Errorf("%s: the planted bug went unseen on %v", tc.name, tc.c.Ops)
		}
		// Putting the missing factor back repairs the output (it commutes with everything in
		// these circuits' last layer, so it may be appended).
		qcheck.Equivalent(t, tc.c, bad.Clone().Compose(tc.missing))
	}
}

func TestBadInputIsAnError(t *testing.T) {
	c := circuit.New(2).H(0).CX(0, 2)
	if _, err := peephole.Optimize(c); err == nil || !strings.Contains(err.Error(), "op 1 (cx)") {
		t.Errorf("Optimize on a cx to qubit 2 of a 2-qubit circuit: got %v", err)
	}
	bad := peephole.Rules{Commutes: peephole.Commutes, Merge: func(a, b circuit.Op) ([]circuit.Op, bool) {
		return []circuit.Op{a, b}, true
	}}
	if _, err := bad.Apply(circuit.New(1).H(0).H(0)); err == nil {
		t.Error("Apply accepted a rule that lengthens the circuit")
	}
}

func TestBarriersAndMeasurementsAreNotCrossed(t *testing.T) {
	c := circuit.New(2).H(0).Barrier(0, 1).H(0).RZ(0.2, 1).Measure(1, 0).RZ(0.3, 1)
	got, err := peephole.Optimize(c)
	if err != nil {
		t.Fatal(err)
	}
	if !got.Equal(c) {
		t.Errorf("Optimize moved a gate across a barrier or measurement:\n%v", got)
	}
}

// FuzzOptimize is the optimizer's property as a go test -fuzz target; findings are kept by Go
// under testdata/fuzz/FuzzOptimize as a regression corpus:
//
//	go test -run='^$' -fuzz=FuzzOptimize -fuzztime=10m ./examples/peephole/
//
// The seed below (all zero bits: rapid's simplest draw, the empty circuit) runs in the normal
// test run; the fuzzer mutates from it.
func FuzzOptimize(f *testing.F) {
	f.Add(make([]byte, 1024))
	f.Fuzz(rapid.MakeFuzz(qcheck.Property(peephole.Optimize,
		gen.Circuit(gen.Options{Qubits: 3, MaxOps: 30}), qcheck.ExactPhase())))
}
