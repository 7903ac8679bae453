package gen

import (
	"fmt"
	"slices"
	"strings"
	"testing"
)

func TestLayoutUniform(t *testing.T) {
	// All 24 permutations of 4 qubits equally likely: chi-square with 23
	// degrees of freedom. Critical value chi2.isf(5e-7, 23) = 72.4834 from
	// SciPy (testdata/gen/reference.txt). Two checks (Example, rapid.Check)
	// at 5e-7 each: false failure ≤ 1e-6 per run.
	const crit = 72.4833615612303
	const n = 24 * 200
	example, checked := drawAll(t, Layout(4), n, 1)
	for name, sample := range map[string][][]int{"Example": example, "rapid.Check": checked} {
		counts := map[string]int{}
		for _, p := range sample {
			sorted := slices.Sorted(slices.Values(p))
			if !slices.Equal(sorted, []int{0, 1, 2, 3}) {
				t.Fatalf("Layout(4) drew %v, not a permutation of 0..3", p)
			}
			counts[fmt.Sprint(p)]++
		}
		want := float64(len(sample)) / 24
		chi2 := (24 - float64(len(counts))) * want // classes never drawn
		for _, c := range counts {
			chi2 += (float64(c) - want) * (float64(c) - want) / want
		}
		if chi2 > crit {
			t.Errorf("via %s: permutation counts give chi-square %.1f > %.1f", name, chi2, crit)
		}
	}
}

func TestLayoutShrinksTowardIdentity(t *testing.T) {
	got := shrunk(t, Layout(5), func(p []int) bool { return p[0] != 0 })
	if !slices.Equal(got, []int{1, 0, 2, 3, 4}) {
		t.Errorf("a layout that moves qubit 0 shrinks to %v, want the single swap [1 0 2 3 4]", got)
	}
	if got := Layout(0).Example(1); len(got) != 0 {
		t.Errorf("Layout(0) drew %v, want the empty placement", got)
	}
}

func TestShapeGraphs(t *testing.T) {
	// Elementary graph facts: a path on n vertices has n−1 edges and
	// distance |a−b|; a cycle has n edges and distance min(|a−b|, n−|a−b|);
	// a full r×c grid has r(c−1)+c(r−1) edges and Manhattan distances.
	abs := func(x int) int { return max(x, -x) }
	for _, n := range []int{1, 2, 3, 7} {
		line, ring := mustGraph(t, Line, n), mustGraph(t, Ring, n)
		if len(line.Edges) != max(n-1, 0) {
			t.Errorf("line of %d has %d edges", n, len(line.Edges))
		}
		wantRing := n
		if n < 3 {
			wantRing = max(n-1, 0)
		}
		if len(ring.Edges) != wantRing {
			t.Errorf("ring of %d has %d edges, want %d", n, len(ring.Edges), wantRing)
		}
		for a := range n {
			for b := range n {
				if d := line.Distance(a, b); d != abs(a-b) {
					t.Errorf("line of %d: distance(%d,%d) = %d", n, a, b, d)
				}
				if d := ring.Distance(a, b); n >= 3 && d != min(abs(a-b), n-abs(a-b)) {
					t.Errorf("ring of %d: distance(%d,%d) = %d", n, a, b, d)
				}
			}
		}
	}
	grid := mustGraph(t, Grid, 9) // 3×3
	if len(grid.Edges) != 12 {
		t.Errorf("3×3 grid has %d edges, want 12", len(grid.Edges))
	}
	for a := range 9 {
		for b := range 9 {
			if d := grid.Distance(a, b); d != abs(a/3-b/3)+abs(a%3-b%3) {
				t.Errorf("3×3 grid: distance(%d,%d) = %d", a, b, d)
			}
		}
	}
	// 7 qubits: a 3-wide grid with rows 0-1-2, 3-4-5 and 6: four horizontal
	// and four vertical edges; qubit 6 is coupled only to qubit 3 above it.
	g7 := mustGraph(t, Grid, 7)
	if !g7.Coupled(3, 6) || g7.Coupled(5, 6) || len(g7.Edges) != 4+4 {
		t.Errorf("7-qubit grid edges %v", g7.Edges)
	}
	if d := mustGraph(t, Line, 4).Distance(0, 9); d != -1 {
		t.Errorf("distance to a qubit outside the graph = %d, want −1", d)
	}
}

func mustGraph(t *testing.T, s Shape, n int) *Graph {
	t.Helper()
	g, err := s.Graph(n)
	if err != nil {
		t.Fatal(err)
	}
	return g
}

func TestShapeGraphErrors(t *testing.T) {
	if _, err := Line.Graph(-1); err == nil || !strings.Contains(err.Error(), "-1") {
		t.Errorf("Line.Graph(-1) error = %v, want one naming -1", err)
	}
	if _, err := Shape(7).Graph(3); err == nil || !strings.Contains(err.Error(), "Shape(7)") {
		t.Errorf("Shape(7).Graph error = %v, want one naming the shape", err)
	}
}

// distanceProfile returns the sorted degree sequence and the sorted list of
// all pairwise distances: equal for isomorphic graphs.
func distanceProfile(g *Graph) string {
	var degrees, dists []int
	for a := range g.Qubits {
		degrees = append(degrees, len(g.Neighbours(a)))
		for b := range g.Qubits {
			dists = append(dists, g.Distance(a, b))
		}
	}
	slices.Sort(degrees)
	slices.Sort(dists)
	return fmt.Sprint(degrees, dists)
}

func TestCouplingRelabels(t *testing.T) {
	for _, shape := range []Shape{Line, Ring, Grid} {
		base := mustGraph(t, shape, 8)
		relabelled := 0
		for seed := range 20 {
			g := Coupling(shape, 8).Example(seed)
			if distanceProfile(g) != distanceProfile(base) {
				t.Fatalf("%v: drawn graph %v is not a relabelled %v", shape, g.Edges, base.Edges)
			}
			if !slices.Equal(g.Edges, base.Edges) {
				relabelled++
			}
		}
		if relabelled == 0 {
			t.Errorf("%v: 20 draws all kept the reading-order labels", shape)
		}
	}
}
