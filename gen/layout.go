package gen

import (
	"fmt"
	"math"
	"slices"

	"pgregory.net/rapid"
)

// Layout returns a generator of placements of logical qubits 0..qubits−1 on
// physical qubits 0..qubits−1: layout[l] is the physical qubit that holds
// logical qubit l. Every permutation is equally likely (rapid.Permutation's
// Fisher–Yates shuffle draws each swap unbiased), and a failure shrinks
// toward the identity placement, through placements with fewer and shorter
// swaps. With qubits < 0 every draw fails the test with an error saying so.
func Layout(qubits int) *rapid.Generator[[]int] {
	if qubits < 0 {
		return failing[[]int](fmt.Errorf("gen.Layout: qubits = %d, want ≥ 0", qubits))
	}
	identity := make([]int, qubits)
	for i := range identity {
		identity[i] = i
	}
	return rapid.Permutation(identity)
}

// Shape names a family of coupling graphs: the physical qubit pairs on which
// hardware can apply a two-qubit gate directly.
type Shape int

const (
	// Line couples qubit i with qubit i+1.
	Line Shape = iota
	// Ring is the line with its ends joined (for 3 qubits or more; a ring of
	// 1 or 2 qubits is the line).
	Ring
	// Grid places qubit i at row i/w, column i%w of a lattice w = ⌈√n⌉ wide,
	// the last row possibly short, and couples horizontal and vertical
	// neighbours.
	Grid
)

// String returns the shape's name.
func (s Shape) String() string {
	switch s {
	case Line:
		return "line"
	case Ring:
		return "ring"
	case Grid:
		return "grid"
	}
	return fmt.Sprintf("Shape(%d)", int(s))
}

// Graph returns the shape's coupling graph on the given number of qubits,
// labelled in reading order as described on each shape. It fails if qubits
// is negative or the shape unknown.
func (s Shape) Graph(qubits int) (*Graph, error) {
	if qubits < 0 {
		return nil, fmt.Errorf("gen: %v graph with %d qubits, want ≥ 0", s, qubits)
	}
	g := &Graph{Qubits: qubits}
	switch s {
	case Line:
		for i := 0; i+1 < qubits; i++ {
			g.Edges = append(g.Edges, [2]int{i, i + 1})
		}
	case Ring:
		for i := 0; i+1 < qubits; i++ {
			g.Edges = append(g.Edges, [2]int{i, i + 1})
		}
		if qubits >= 3 {
			g.Edges = append(g.Edges, [2]int{0, qubits - 1})
		}
	case Grid:
		w := int(math.Ceil(math.Sqrt(float64(qubits))))
		for i := range qubits {
			if (i+1)%w != 0 && i+1 < qubits {
				g.Edges = append(g.Edges, [2]int{i, i + 1})
			}
			if i+w < qubits {
				g.Edges = append(g.Edges, [2]int{i, i + w})
			}
		}
	default:
		return nil, fmt.Errorf("gen: unknown shape %v", s)
	}
	g.normalize()
	return g, nil
}

// Coupling returns a generator of coupling graphs of the given shape and
// size whose physical qubits are numbered at random (a Layout applied to the
// shape's reading-order labels), so that a router under test cannot rely on
// neighbours having consecutive numbers. It shrinks toward the reading-order
// labels. If qubits is negative or the shape unknown, every draw fails the
// test with an error saying so.
func Coupling(shape Shape, qubits int) *rapid.Generator[*Graph] {
	base, err := shape.Graph(qubits)
	if err != nil {
		return failing[*Graph](fmt.Errorf("gen.Coupling: %w", err))
	}
	return rapid.Map(Layout(qubits), func(relabel []int) *Graph {
		g := &Graph{Qubits: qubits, Edges: make([][2]int, len(base.Edges))}
		for i, e := range base.Edges {
			g.Edges[i] = [2]int{relabel[e[0]], relabel[e[1]]}
		}
		g.normalize()
		return g
	})
}

// Graph is an undirected coupling graph on physical qubits 0..Qubits−1.
type Graph struct {
	// Qubits is the number of physical qubits.
	Qubits int
	// Edges lists each coupled pair once, lower qubit first, in increasing
	// order.
	Edges [][2]int
}

// normalize puts every edge lower qubit first and sorts the list.
func (g *Graph) normalize() {
	for i, e := range g.Edges {
		if e[0] > e[1] {
			g.Edges[i] = [2]int{e[1], e[0]}
		}
	}
	slices.SortFunc(g.Edges, func(a, b [2]int) int {
		if a[0] != b[0] {
			return a[0] - b[0]
		}
		return a[1] - b[1]
	})
}

// Coupled reports whether a two-qubit gate may act on qubits a and b.
func (g *Graph) Coupled(a, b int) bool {
	if a > b {
		a, b = b, a
	}
	_, found := slices.BinarySearchFunc(g.Edges, [2]int{a, b}, func(e, t [2]int) int {
		if e[0] != t[0] {
			return e[0] - t[0]
		}
		return e[1] - t[1]
	})
	return found
}

// Neighbours returns the qubits coupled to q, in increasing order.
func (g *Graph) Neighbours(q int) []int {
	var out []int
	for _, e := range g.Edges {
		switch q {
		case e[0]:
			out = append(out, e[1])
		case e[1]:
			out = append(out, e[0])
		}
	}
	slices.Sort(out)
	return out
}

// Distance returns the number of edges on a shortest path from a to b (0 when
// a == b), or −1 when no path joins them. A router needs at least
// Distance(a, b) − 1 swaps before a gate on a and b.
func (g *Graph) Distance(a, b int) int {
	if a < 0 || b < 0 || a >= g.Qubits || b >= g.Qubits {
		return -1
	}
	dist := make([]int, g.Qubits)
	for i := range dist {
		dist[i] = -1
	}
	dist[a] = 0
	queue := []int{a}
	for len(queue) > 0 {
		q := queue[0]
		queue = queue[1:]
		if q == b {
			return dist[q]
		}
		for _, r := range g.Neighbours(q) {
			if dist[r] < 0 {
				dist[r] = dist[q] + 1
				queue = append(queue, r)
			}
		}
	}
	return -1
}
