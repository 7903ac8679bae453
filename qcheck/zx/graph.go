package zx

// kind tells a boundary (an input or output wire end) from a Z spider. Every spider of the
// graph-like diagrams used here is a Z spider; an X spider is written as a Z spider between
// Hadamards.
type kind uint8

const (
	boundary kind = iota
	spider
)

// edge is the type of a connection: a plain wire or a wire through a Hadamard gate.
type edge uint8

const (
	plain edge = iota + 1
	hadamard
)

type vertex struct {
	kind  kind
	alive bool
	ph    phase
	nbr   map[int]edge
	// from is the latest op of the first circuit whose gate laid part of this spider, or −1.
	from int
}

// graph is a ZX-diagram: Z spiders and boundaries joined by plain and Hadamard edges, no two
// spiders joined by a plain edge once fused (graph-like in the sense of Duncan et al.). It
// records the rounding (slack) and the residuals dropped when a phase was treated as a multiple
// of π/4 (snapped); see the package documentation for how they bound the distance.
type graph struct {
	v       []vertex
	in, out []int
	tol     float64
	snapped float64
	slack   float64
	steps   int
	// origin is the op of the first circuit being laid, −1 while laying the second; new spiders
	// record it in from.
	origin int
	// fuseQ lists the plain edges made, which may join two spiders that should fuse.
	fuseQ [][2]int
}

func (g *graph) add(k kind, p phase) int {
	g.v = append(g.v, vertex{kind: k, alive: true, ph: p, nbr: map[int]edge{}, from: g.origin})
	return len(g.v) - 1
}

func (g *graph) remove(v int) {
	for w := range g.v[v].nbr {
		delete(g.v[w].nbr, v)
	}
	g.v[v].alive = false
	g.v[v].nbr = nil
}

func (g *graph) isSpider(v int) bool { return g.v[v].kind == spider }

// connect adds an edge of type t between u and w and applies what parallel edges between two Z
// spiders mean: two plain edges are one (they fuse to the same spider), two Hadamard edges cancel
// (the Hopf law), and a plain edge beside a Hadamard edge becomes, after fusion, a Hadamard
// self-loop, which is a phase π. All hold up to a non-zero scalar.
func (g *graph) connect(u, w int, t edge) {
	if u == w {
		if t == hadamard {
			g.v[u].ph = g.v[u].ph.add(exact(4), g)
		}
		return
	}
	old, ok := g.v[u].nbr[w]
	switch {
	case !ok:
		g.v[u].nbr[w], g.v[w].nbr[u] = t, t
		if t == plain {
			g.fuseQ = append(g.fuseQ, [2]int{u, w})
		}
	case old == plain && t == plain:
	case old == hadamard && t == hadamard:
		delete(g.v[u].nbr, w)
		delete(g.v[w].nbr, u)
	default:
		g.v[u].nbr[w], g.v[w].nbr[u] = plain, plain
		g.fuseQ = append(g.fuseQ, [2]int{u, w})
		g.v[u].ph = g.v[u].ph.add(exact(4), g)
	}
}

// fuse merges spider v into spider u, to which it is joined by a plain edge: phases add.
func (g *graph) fuse(u, v int) {
	g.v[u].ph = g.v[u].ph.add(g.v[v].ph, g)
	g.v[u].from = max(g.v[u].from, g.v[v].from)
	nbr := g.v[v].nbr
	g.remove(v)
	for w, t := range nbr {
		if w != u {
			g.connect(u, w, t)
		}
	}
	g.steps++
}

// snap treats the phase of v as the exact multiple k of π/4 it is within tol of, recording the
// residual dropped.
func (g *graph) snap(v int) (k int, ok bool) {
	p := g.v[v].ph
	k, ok = p.class(g.tol)
	if !ok {
		return 0, false
	}
	if p.r != 0 {
		m, d := p.near()
		g.snapped += abs(d)
		g.slack += 2 * eps * (abs(p.r) + abs(float64(m))*quarter)
		g.v[v].ph = exact(k)
	}
	return k, true
}

func abs(x float64) float64 {
	if x < 0 {
		return -x
	}
	return x
}

// interior reports whether v is a spider all of whose neighbours are spiders.
func (g *graph) interior(v int) bool {
	if !g.isSpider(v) {
		return false
	}
	for w := range g.v[v].nbr {
		if !g.isSpider(w) {
			return false
		}
	}
	return true
}

// pauli reports whether v's phase is 0 or π within tolerance, snapping it if so.
func (g *graph) pauli(v int) bool {
	k, ok := g.v[v].ph.class(g.tol)
	if !ok || k%4 != 0 {
		return false
	}
	g.snap(v)
	return true
}

// properClifford reports whether v's phase is ±π/2 within tolerance, snapping it if so.
func (g *graph) properClifford(v int) bool {
	k, ok := g.v[v].ph.class(g.tol)
	if !ok || k%4 != 2 {
		return false
	}
	g.snap(v)
	return true
}

// clifford reports whether v's phase is a multiple of π/2 within tolerance, without snapping.
func (g *graph) clifford(v int) bool {
	k, ok := g.v[v].ph.class(g.tol)
	return ok && k%2 == 0
}

// zero reports whether v's phase is 0 within tolerance, snapping it if so.
func (g *graph) zero(v int) bool {
	k, ok := g.v[v].ph.class(g.tol)
	if !ok || k != 0 {
		return false
	}
	g.snap(v)
	return true
}

// leaf reports whether v is a spider with exactly one neighbour.
func (g *graph) leaf(v int) bool { return g.isSpider(v) && len(g.v[v].nbr) == 1 }

// hasLeaf reports whether a neighbour of v is a leaf spider (v is then the axle of a gadget).
func (g *graph) hasLeaf(v int) bool {
	for w := range g.v[v].nbr {
		if g.leaf(w) {
			return true
		}
	}
	return false
}
