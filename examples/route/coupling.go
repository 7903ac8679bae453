package route

import "fmt"

// Coupling is the connectivity of a device: its physical qubits and the pairs of them a
// two-qubit gate may act on. Build one with Line, Grid or NewCoupling; a bad size or edge is
// recorded and reported by Validate, and by Route.
type Coupling struct {
	n    int
	adj  [][]int // neighbours of each qubit, in increasing order
	dist [][]int // hop distance between every pair; −1 when disconnected
	err  error
}

// NewCoupling returns the device on n physical qubits coupled by the given pairs. Edges are
// undirected; repeated edges are allowed.
func NewCoupling(n int, edges [][2]int) *Coupling {
	g := &Coupling{n: n}
	if n < 1 {
		g.err = fmt.Errorf("route: a device needs at least one qubit, got %d", n)
		return g
	}
	g.adj = make([][]int, n)
	for i, e := range edges {
		a, b := e[0], e[1]
		if a < 0 || a >= n || b < 0 || b >= n || a == b {
			g.err = fmt.Errorf("route: edge %d (%d, %d) is not a pair of distinct qubits in [0, %d)", i, a, b, n)
			return g
		}
		if !contains(g.adj[a], b) {
			g.adj[a] = insertSorted(g.adj[a], b)
			g.adj[b] = insertSorted(g.adj[b], a)
		}
	}
	g.dist = make([][]int, n)
	for s := range g.dist {
		g.dist[s] = g.bfs(s)
	}
	return g
}

// Line returns a line of n qubits, 0–1–2–…–(n−1): the Tarn-6 layout for n = 6.
func Line(n int) *Coupling {
	var edges [][2]int
	for i := 0; i+1 < n; i++ {
		edges = append(edges, [2]int{i, i + 1})
	}
	return NewCoupling(n, edges)
}

// Grid returns a rows × cols grid with qubit r·cols + c at row r, column c, each coupled to its
// horizontal and vertical neighbours: the Tarn-9 layout for 3 × 3.
func Grid(rows, cols int) *Coupling {
	if rows < 1 || cols < 1 {
		return &Coupling{err: fmt.Errorf("route: a grid needs at least one row and one column, got %d × %d", rows, cols)}
	}
	var edges [][2]int
	for r := 0; r < rows; r++ {
		for c := 0; c < cols; c++ {
			q := r*cols + c
			if c+1 < cols {
				edges = append(edges, [2]int{q, q + 1})
			}
			if r+1 < rows {
				edges = append(edges, [2]int{q, q + cols})
			}
		}
	}
	return NewCoupling(rows*cols, edges)
}

// Validate reports a bad size or edge given when the device was built, and a device whose
// qubits are not all connected (the router could not bring two of them together).
func (g *Coupling) Validate() error {
	if g == nil {
		return fmt.Errorf("route: nil device")
	}
	if g.err != nil {
		return g.err
	}
	for q, d := range g.dist[0] {
		if d < 0 {
			return fmt.Errorf("route: qubit %d is not connected to qubit 0", q)
		}
	}
	return nil
}

// Qubits returns the number of physical qubits.
func (g *Coupling) Qubits() int { return g.n }

// Coupled reports whether a two-qubit gate may act on physical qubits a and b.
func (g *Coupling) Coupled(a, b int) bool {
	return a >= 0 && a < g.n && g.adj != nil && contains(g.adj[a], b)
}

// Distance returns the number of couplings on a shortest path from a to b.
func (g *Coupling) Distance(a, b int) int { return g.dist[a][b] }

// bfs returns the hop distance from s to every qubit, −1 where unreachable.
func (g *Coupling) bfs(s int) []int {
	d := make([]int, g.n)
	for i := range d {
		d[i] = -1
	}
	d[s] = 0
	queue := []int{s}
	for len(queue) > 0 {
		q := queue[0]
		queue = queue[1:]
		for _, r := range g.adj[q] {
			if d[r] < 0 {
				d[r] = d[q] + 1
				queue = append(queue, r)
			}
		}
	}
	return d
}

// step returns the neighbour of a that is one hop closer to b, the lowest-numbered one when
// there are several, so that routing is deterministic.
func (g *Coupling) step(a, b int) int {
	for _, r := range g.adj[a] {
		if g.dist[r][b] == g.dist[a][b]-1 {
			return r
		}
	}
	return a
}

func contains(s []int, v int) bool {
	for _, x := range s {
		if x == v {
			return true
		}
	}
	return false
}

func insertSorted(s []int, v int) []int {
	i := 0
	for i < len(s) && s[i] < v {
		i++
	}
	s = append(s, 0)
	copy(s[i+1:], s[i:])
	s[i] = v
	return s
}
