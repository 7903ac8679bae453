package zx

import (
	"maps"
	"slices"
)

// simplify rewrites the graph with the rules of Duncan, Kissinger, Perdrix & van de Wetering
// (identity removal, spider fusion, local complementation, pivoting, including pivots that turn
// a non-Clifford spider into a phase gadget or move a spider off a boundary) and the fusion of
// phase gadgets on the same support (Kissinger & van de Wetering), until none applies or the
// step budget runs out. It reports false when the budget ran out.
func (g *graph) simplify(budget int) bool {
	for {
		if g.steps > budget {
			return false
		}
		if g.basic() || g.lcompAll() || g.pivotAll() {
			continue
		}
		if g.gadgets() || g.pivotGadgets() || g.pivotBoundaries() {
			continue
		}
		return true
	}
}

// sorted returns the neighbours of v in increasing order, so that the rewriting is the same on
// every run.
func (g *graph) sorted(v int) []int {
	return slices.Sorted(maps.Keys(g.v[v].nbr))
}

func (g *graph) alive() []int {
	out := make([]int, 0, len(g.v))
	for v := range g.v {
		if g.v[v].alive {
			out = append(out, v)
		}
	}
	return out
}

// basic fuses spiders joined by plain edges and removes phase-free spiders of degree two.
func (g *graph) basic() bool {
	changed := false
	for len(g.fuseQ) > 0 {
		e := g.fuseQ[len(g.fuseQ)-1]
		g.fuseQ = g.fuseQ[:len(g.fuseQ)-1]
		u, w := e[0], e[1]
		if !g.v[u].alive || !g.v[w].alive || !g.isSpider(u) || !g.isSpider(w) {
			continue
		}
		if t, ok := g.v[u].nbr[w]; ok && t == plain {
			g.fuse(min(u, w), max(u, w))
			changed = true
		}
	}
	for _, v := range g.alive() {
		if !g.v[v].alive || !g.isSpider(v) || len(g.v[v].nbr) != 2 || !g.zero(v) {
			continue
		}
		var ns [2]int
		var ts [2]edge
		i := 0
		for w, t := range g.v[v].nbr {
			ns[i], ts[i] = w, t
			i++
		}
		t := plain
		if ts[0] != ts[1] {
			t = hadamard
		}
		g.remove(v)
		g.connect(ns[0], ns[1], t)

		g.steps++
		changed = true
	}
	return changed
}

// lcompAll removes every interior spider of phase ±π/2 by local complementation: its neighbours'
// connections are complemented and its phase subtracted from theirs.
func (g *graph) lcompAll() bool {
	changed := false
	for _, v := range g.alive() {
		if !g.v[v].alive || !g.isSpider(v) || !g.clifford(v) || !g.interior(v) || !g.properClifford(v) {
			continue
		}
		ph := g.v[v].ph.neg()
		ns := slices.Collect(maps.Keys(g.v[v].nbr))
		g.remove(v)
		for i, a := range ns {
			g.v[a].ph = g.v[a].ph.add(ph, g)
			for _, c := range ns[i+1:] {
				g.connect(a, c, hadamard)
			}
		}
		g.steps += 1 + len(ns)*len(ns)/2
		changed = true
	}
	return changed
}

// pivotAll removes every pair of adjacent interior spiders whose phases are 0 or π.
func (g *graph) pivotAll() bool {
	changed := false
	for _, u := range g.alive() {
		if !g.v[u].alive || !g.isSpider(u) || !g.clifford(u) || !g.interior(u) || !g.pauli(u) {
			continue
		}
		for _, v := range g.sorted(u) {
			if g.clifford(v) && g.interior(v) && g.pauli(v) {
				g.pivot(u, v)
				changed = true
				break
			}
		}
	}
	return changed
}

// pivot applies the pivot rule to adjacent interior spiders u and v of phase 0 or π: with U, V
// the neighbours of u only and of v only and W the shared ones, the connections between U, V and
// W are complemented; U gains v's phase, V gains u's, W gains both and π; u and v go.
func (g *graph) pivot(u, v int) {
	pu, pv := g.v[u].ph, g.v[v].ph
	var U, V, W []int
	for w := range g.v[u].nbr {
		if w == v {
			continue
		}
		if _, ok := g.v[v].nbr[w]; ok {
			W = append(W, w)
		} else {
			U = append(U, w)
		}
	}
	for w := range g.v[v].nbr {
		if _, ok := g.v[u].nbr[w]; !ok && w != u {
			V = append(V, w)
		}
	}
	g.remove(u)
	g.remove(v)
	for _, a := range U {
		for _, b := range V {
			g.connect(a, b, hadamard)
		}
		for _, c := range W {
			g.connect(a, c, hadamard)
		}
		g.v[a].ph = g.v[a].ph.add(pv, g)
	}
	for _, b := range V {
		for _, c := range W {
			g.connect(b, c, hadamard)
		}
		g.v[b].ph = g.v[b].ph.add(pu, g)
	}
	both := pu.add(pv, g).add(exact(4), g)
	for _, c := range W {
		g.v[c].ph = g.v[c].ph.add(both, g)
	}
	g.steps += 1 + len(U)*len(V) + len(U)*len(W) + len(V)*len(W)
}

// gadgets simplifies phase gadgets: a leaf spider (the gadget's phase) on a Hadamard edge to an
// axle spider of phase 0 or π. An axle of phase π is moved into the leaf's sign; gadgets whose
// axles have the same other neighbours fuse, adding phases; a gadget of phase 0 is the identity
// and goes, one of phase π goes after adding π to every spider of its support.
func (g *graph) gadgets() bool {
	changed := false
	seen := map[string]int{}
	for _, p := range g.alive() {
		if !g.v[p].alive || !g.leaf(p) {
			continue
		}
		var a int
		var t edge
		for w, e := range g.v[p].nbr {
			a, t = w, e
		}
		if t != hadamard || !g.interior(a) || len(g.v[a].nbr) < 2 || !g.pauli(a) || g.clifford(p) && !g.zero(p) && !g.pauli(p) {
			continue
		}
		if g.v[a].ph.k == 4 {
			g.v[a].ph = exact(0)
			g.v[p].ph = g.v[p].ph.neg()
		}
		if g.zero(p) || g.pauli(p) {
			pi := g.v[p].ph.k == 4
			support := g.support(a, p)
			g.remove(p)
			g.remove(a)
			if pi {
				for _, w := range support {
					g.v[w].ph = g.v[w].ph.add(exact(4), g)
				}
			}
			g.steps++
			changed = true
			continue
		}
		key := supportKey(g.support(a, p))
		// A gadget seen earlier in this pass may have lost or changed its support since; merge only
		// when it still hangs off an axle with exactly this support.
		if q, ok := seen[key]; ok && g.v[q].alive && g.leaf(q) && g.sameGadget(q, key) {
			g.v[q].ph = g.v[q].ph.add(g.v[p].ph, g)
			g.remove(p)
			g.remove(a)
			g.steps++
			changed = true
			continue
		}
		seen[key] = p
	}
	return changed
}

func (g *graph) sameGadget(q int, key string) bool {
	var a int
	for w := range g.v[q].nbr {
		a = w
	}
	return g.v[a].alive && g.isSpider(a) && g.v[a].ph.k == 0 && g.v[a].ph.r == 0 && supportKey(g.support(a, q)) == key
}

func (g *graph) support(a, p int) []int {
	out := make([]int, 0, len(g.v[a].nbr)-1)
	for w := range g.v[a].nbr {
		if w != p {
			out = append(out, w)
		}
	}
	slices.Sort(out)
	return out
}

func supportKey(s []int) string {
	b := make([]byte, 0, 4*len(s))
	for _, x := range s {
		b = append(b, byte(x), byte(x>>8), byte(x>>16), byte(x>>24))
	}
	return string(b)
}

// pivotGadgets pivots an interior spider u of phase 0 or π with an interior non-Clifford
// neighbour v, after moving v's phase onto a new phase gadget, so that both go.
func (g *graph) pivotGadgets() bool {
	changed := false
	for _, u := range g.alive() {
		if !g.v[u].alive || !g.isSpider(u) || !g.clifford(u) || !g.interior(u) || g.hasLeaf(u) || g.leaf(u) || !g.pauli(u) {
			continue
		}
		for _, v := range g.sorted(u) {
			if !g.interior(v) || g.leaf(v) || g.hasLeaf(v) || g.clifford(v) {
				continue
			}
			g.gadgetize(v)
			g.pivot(u, v)
			changed = true
			break
		}
	}
	return changed
}

// gadgetize moves the phase of v onto a new gadget: an axle of phase 0 joined to v and a leaf
// holding the phase, both by Hadamard edges (two Hadamards in a row are a plain wire, which fuses
// back).
func (g *graph) gadgetize(v int) {
	a := g.add(spider, phase{})
	p := g.add(spider, g.v[v].ph)
	g.v[a].from, g.v[p].from = g.v[v].from, g.v[v].from
	g.v[v].ph = phase{}
	g.connect(v, a, hadamard)
	g.connect(a, p, hadamard)
}

// pivotBoundaries pivots an interior spider u of phase 0 or π with a neighbour v of phase 0 or π
// that touches a boundary, after putting a phase-free spider between v and each boundary.
func (g *graph) pivotBoundaries() bool {
	changed := false
	for _, u := range g.alive() {
		if !g.v[u].alive || !g.isSpider(u) || !g.clifford(u) || !g.interior(u) || g.hasLeaf(u) || g.leaf(u) || !g.pauli(u) {
			continue
		}
		for _, v := range g.sorted(u) {
			if g.interior(v) || g.hasLeaf(v) || !g.pauli(v) {
				continue
			}
			for w, t := range g.v[v].nbr {
				if g.isSpider(w) {
					continue
				}
				s := g.add(spider, phase{})
				delete(g.v[v].nbr, w)
				delete(g.v[w].nbr, v)
				other := hadamard
				if t == hadamard {
					other = plain
				}
				g.connect(w, s, other)
				g.connect(s, v, hadamard)
			}
			g.pivot(u, v)
			changed = true
			break
		}
	}
	return changed
}
