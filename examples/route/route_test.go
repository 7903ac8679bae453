package route_test

import (
	"math"
	"math/cmplx"
	"strings"
	"testing"

	"pgregory.net/rapid"
	"qcheck.dev/examples/route"
	"qcheck.dev/qcheck/circuit"
	"qcheck.dev/qcheck/sim"
)

// unpermute returns the SWAP network that moves what physical qubit perm[i] holds back to qubit i;
// written in the test, independent of the router.
func unpermute(perm []int) *circuit.Circuit {
	n := len(perm)
	holder := make([]int, n) // holder[p]: logical qubit now on physical p
	for l, p := range perm {
		holder[p] = l
	}
	c := circuit.New(n)
	for p := 0; p < n; p++ {
		if holder[p] == p {
			continue
		}
		q := p + 1
		for holder[q] != p {
			q++
		}
		c.SWAP(p, q)
		holder[p], holder[q] = holder[q], holder[p]
	}
	return c
}

// maxEntryGap returns the largest entrywise |U_ij − V_ij| of the two circuits' unitaries.
func maxEntryGap(t testing.TB, a, b *circuit.Circuit) float64 {
	u, err := sim.Unitary(a)
	if err != nil {
		t.Fatal(err)
	}
	v, err := sim.Unitary(b)
	if err != nil {
		t.Fatal(err)
	}
	d, _ := u.Dims()
	gap := 0.0
	for i := 0; i < d; i++ {
		for k := 0; k < d; k++ {
			gap = math.Max(gap, cmplx.Abs(u.At(i, k)-v.At(i, k)))
		}
	}
	return gap
}

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

func randomCircuit(n, maxOps int) *rapid.Generator[*circuit.Circuit] {
	names := []string{"h", "t", "rz", "sx", "cx", "cz", "cp", "crz", "swap", "rzz"}
	return rapid.Custom(func(t *rapid.T) *circuit.Circuit {
		c := circuit.New(n)
		for i, ops := 0, rapid.IntRange(0, maxOps).Draw(t, "ops"); i < ops; i++ {
			spec, _ := circuit.Lookup(rapid.SampledFrom(names).Draw(t, "gate"))
			qs := rapid.SliceOfNDistinct(rapid.IntRange(0, n-1), spec.Qubits, spec.Qubits, rapid.ID[int]).Draw(t, "qubits")
			ps := make([]float64, spec.Params)
			for k := range ps {
				ps[k] = rapid.Float64Range(-math.Pi, math.Pi).Draw(t, "angle")
			}
			g, _ := circuit.NewGate(spec.Name, ps...)
			c.Append(g, qs...)
		}
		return c
	})
}

func TestRoutedCircuitIsTheOriginalThenTheLayout(t *testing.T) {
	for _, dev := range []struct {
		name   string
		g      *route.Coupling
		qubits int
	}{{"line of 5", route.Line(5), 5}, {"line of 5, 4 used", route.Line(5), 4}, {"2×3 grid", route.Grid(2, 3), 6}} {
		t.Run(dev.name, func(t *testing.T) {
			rapid.Check(t, func(rt *rapid.T) {
				c := randomCircuit(dev.qubits, 25).Draw(rt, "circuit")
				keep := c.Clone()
				routed, perm, err := route.Route(c, dev.g)
				if err != nil {
					rt.Fatal(err)
				}
				if !c.Equal(keep) {
					rt.Fatal("Route modified its input")
				}
				for i, op := range routed.Ops {
					if len(op.Qubits) == 2 && !dev.g.Coupled(op.Qubits[0], op.Qubits[1]) {
						rt.Fatalf("op %d (%s) acts on uncoupled qubits", i, op)
					}
				}
				wide := circuit.New(dev.g.Qubits()).Compose(c)
				back := routed.Clone().Compose(unpermute(perm))
				// SWAP networks are exact permutations (N&C Fig. 1.7), so the undone routing must
				// match the widened original entry for entry, global phase included.
				if gap := maxEntryGap(t, wide, back); gap > 1e-12 {
					rt.Fatalf("routed circuit with layout %v differs by %g:\n%v", perm, gap, routed)
				}
			})
		})
	}
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
