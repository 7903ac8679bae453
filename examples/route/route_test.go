package route_test

import (
	"math"
	"strings"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/examples/campaign"
	"qcheck.dev/examples/route"
	"qcheck.dev/examples/route/inverted"
	"qcheck.dev/gen"
	"qcheck.dev/qcheck"
	"qcheck.dev/qcheck/circuit"
)

func TestRouteHandExample(t *testing.T) {
	// cx(0, 2) on a line of three: one SWAP brings qubit 0 next to qubit 2.
	c := circuit.New(3).H(0).CX(0, 2)
	got, perm, err := route.Route(c, route.Line(3))
	if err != nil {
		t.Fatal(err)
	}
	want := circuit.New(3).H(0).SWAP(0, 1).CX(1, 2)
	if !got.Equal(want) {
		t.Errorf("routed\n%vwant\n%v", got, want)
	}
	if perm[0] != 1 || perm[1] != 0 || perm[2] != 2 {
		t.Errorf("layout %v, want [1 0 2]", perm)
	}
}

// The router keeps the meaning of circuits up to the layout it reports, on Tarn-6 (a line of
// six) and a 2×3 grid, for gen's default gates on two qubits or fewer. (Tarn-9, the 3×3 grid,
// takes most of a second per check with dense 512×512 unitaries, too slow for the default run.)
func TestRouterPreservesUpToItsLayout(t *testing.T) {
	for _, dev := range []struct {
		name string
		g    *route.Coupling
	}{{"Tarn-6 line", route.Line(6)}, {"2×3 grid", route.Grid(2, 3)}} {
		t.Run(dev.name, func(t *testing.T) {
			pass := func(c *circuit.Circuit) (*circuit.Circuit, []int, error) { return route.Route(c, dev.g) }
			qcheck.PreservesLayout(t, pass, gen.Circuit(gen.Options{Qubits: dev.g.Qubits(), MaxOps: 30, GateSet: twoQubitGates}))
		})
	}
}

// twoQubitGates is gen's default gate set without the three-qubit gates the router refuses.
var twoQubitGates = func() []string {
	var out []string
	for _, name := range gen.DefaultGateSet() {
		if spec, ok := circuit.Lookup(name); ok && spec.Qubits <= 2 {
			out = append(out, name)
		}
	}
	return out
}()

// On coupling graphs of every shape gen draws, with physical qubits numbered at random, every
// two-qubit gate of the routed circuit is on coupled qubits, and the routed circuit is the input
// followed by the reported layout.
func TestRoutedGatesAreOnCoupledQubits(t *testing.T) {
	rapid.Check(t, func(rt *rapid.T) {
		shape := rapid.SampledFrom([]gen.Shape{gen.Line, gen.Ring, gen.Grid}).Draw(rt, "shape")
		n := rapid.IntRange(2, 6).Draw(rt, "qubits")
		graph := gen.Coupling(shape, n).Draw(rt, "graph")
		dev := route.NewCoupling(graph.Qubits, graph.Edges)
		c := gen.Circuit(gen.Options{Qubits: n, MaxOps: 25, GateSet: twoQubitGates}).Draw(rt, "circuit")
		routed, perm, err := route.Route(c, dev)
		if err != nil {
			rt.Fatal(err)
		}
		for i, op := range routed.Ops {
			if len(op.Qubits) == 2 && !graph.Coupled(op.Qubits[0], op.Qubits[1]) {
				rt.Fatalf("op %d (%s) acts on qubits that %v does not couple", i, op, graph.Edges)
			}
		}
		qcheck.Equivalent(rt, c, routed, qcheck.OutputPermutation(perm))
	})
}

func TestRouteBadInput(t *testing.T) {
	cases := []struct {
		name string
		c    *circuit.Circuit
		g    *route.Coupling
		want string
	}{
		{"three-qubit gate", circuit.New(3).H(0).CCX(0, 1, 2), route.Line(3), "op 1 (ccx)"},
		{"too wide", circuit.New(4), route.Line(3), "4 qubits"},
		{"bad grid", circuit.New(1), route.Grid(0, 3), "0 × 3"},
		{"bad edge", circuit.New(2), route.NewCoupling(2, [][2]int{{0, 2}}), "edge 0"},
		{"disconnected", circuit.New(3), route.NewCoupling(3, [][2]int{{0, 1}}), "qubit 2"},
		{"bad circuit", circuit.New(2).RZ(math.NaN(), 0), route.Line(2), "op 0 (rz)"},
	}
	for _, tc := range cases {
		_, _, err := route.Route(tc.c, tc.g)
		if err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("%s: got error %v, want one mentioning %q", tc.name, err, tc.want)
		}
	}
}

// The inverted layout of package inverted is caught by the layout check. A cx between the ends of
// Tarn-6 leaves the layout [2 0 1 4 5 3] (ExampleRoute), two 3-cycles, which are not their own
// inverses; a single SWAP, as in most hand-written router tests, would not show the bug.
func TestInvertedLayoutIsCaught(t *testing.T) {
	c := circuit.New(6).H(0).CX(0, 5)
	out, perm, err := inverted.Route(c, route.Line(6))
	if err != nil {
		t.Fatal(err)
	}
	r, err := qcheck.Compare(c, out, qcheck.OutputPermutation(perm))
	if err != nil {
		t.Fatal(err)
	}
	if r.Equivalent {
		t.Errorf("the inverted layout %v passed:\n%v", perm, out)
	}
	f, err := campaign.Hunt(campaign.Inverted(), 20261201, campaign.DefaultChecks)
	if err != nil {
		t.Fatal(err)
	}
	if f == nil || f.Kind != qcheck.NotEquivalent {
		t.Fatalf("the campaign did not catch the inverted layout: %v", f)
	}
}
