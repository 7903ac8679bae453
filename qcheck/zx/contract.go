package zx

import (
	"math"
	"math/cmplx"
	"slices"
)

// factor is a tensor over binary variables: entry i holds the value at the assignment whose bit j
// is the value of vars[j].
type factor struct {
	vars []int
	data []complex128
}

func (f factor) at(assign func(int) int) complex128 {
	i := 0
	for j, x := range f.vars {
		i |= assign(x) << j
	}
	return f.data[i]
}

// maxScope caps the variables of an intermediate tensor (2^maxScope entries).
const maxScope = 22

// maxComponent caps the vertices of the part of the diagram matrix contracts.
const maxComponent = 2000

// matrix returns, up to a non-zero scalar, the matrix of the part of the diagram that joins the
// inputs and outputs of the given wires, rows indexed by the outputs and columns by the inputs
// (wires[0] the least significant bit). Every other wire must be a plain wire from its input to
// its own output. The diagram is read as a sum over the values of its spiders (each spider one
// binary variable, a Hadamard edge the factor (−1)^{xy}, a phase α the factor e^{iαx}, a plain
// edge an equality), and summed out one variable at a time, always the one whose removal makes
// the smallest tensor. It reports false when a tensor would exceed 2^maxScope entries.
func (g *graph) matrix(wires []int) ([]complex128, bool) {
	// Collect the component of the given boundaries.
	var starts []int
	for _, q := range wires {
		starts = append(starts, g.in[q], g.out[q])
	}
	seen := map[int]bool{}
	g.reach(starts, nil, seen)
	if len(seen) > maxComponent {
		return nil, false
	}
	// Plain edges merge variables.
	parent := map[int]int{}
	var find func(int) int
	find = func(x int) int {
		p, ok := parent[x]
		if !ok || p == x {
			return x
		}
		r := find(p)
		parent[x] = r
		return r
	}
	var fs []factor
	for v := range seen {
		if g.isSpider(v) {
			if p := g.v[v].ph; p.k != 0 || p.r != 0 {
				a := float64(p.k)*quarter + p.r
				fs = append(fs, factor{vars: []int{v}, data: []complex128{1, cmplx.Exp(complex(0, a))}})
			}
		}
		for w, t := range g.v[v].nbr {
			if w < v {
				continue
			}
			if t == plain {
				parent[find(w)] = find(v)
			} else {
				fs = append(fs, factor{vars: []int{v, w}, data: []complex128{1, 1, 1, -1}})
			}
		}
	}
	for i := range fs {
		for j, x := range fs[i].vars {
			fs[i].vars[j] = find(x)
		}
		fs[i] = dedupe(fs[i])
	}
	open := map[int]bool{}
	for _, q := range wires {
		open[find(g.in[q])] = true
		open[find(g.out[q])] = true
	}
	// Eliminate the closed variables.
	for {
		best, bestSize := -1, math.MaxInt
		scopes := map[int]map[int]bool{}
		for _, f := range fs {
			for _, x := range f.vars {
				if open[x] {
					continue
				}
				sc := scopes[x]
				if sc == nil {
					sc = map[int]bool{}
					scopes[x] = sc
				}
				for _, y := range f.vars {
					sc[y] = true
				}
			}
		}
		if len(scopes) == 0 {
			break
		}
		for x, sc := range scopes {
			if len(sc) < bestSize || len(sc) == bestSize && x < best {
				best, bestSize = x, len(sc)
			}
		}
		if bestSize > maxScope {
			return nil, false
		}
		var with, rest []factor
		for _, f := range fs {
			if slices.Contains(f.vars, best) {
				with = append(with, f)
			} else {
				rest = append(rest, f)
			}
		}
		fs = append(rest, sumOut(with, best))
	}
	// Multiply what is left into the matrix.
	k := len(wires)
	if 2*k > maxScope {
		return nil, false
	}
	all := product(fs)
	pos := make([]int, len(all.vars))
	for j, x := range all.vars {
		pos[j] = -1
		for i, q := range wires {
			if find(g.in[q]) == x {
				pos[j] = i
			} else if find(g.out[q]) == x {
				pos[j] = k + i
			}
		}
	}
	inC, outC := make([]int, k), make([]int, k)
	for i, q := range wires {
		inC[i], outC[i] = find(g.in[q]), find(g.out[q])
	}
	m := make([]complex128, 1<<(2*k))
	for idx := range m {
		col, row := idx&(1<<k-1), idx>>k
		// Every wire end reads its bit; ends merged into one variable must agree.
		ok := true
		for j := range k {
			for i := range k {
				if inC[i] == inC[j] && col>>i&1 != col>>j&1 || outC[i] == inC[j] && row>>i&1 != col>>j&1 ||
					outC[i] == outC[j] && row>>i&1 != row>>j&1 {
					ok = false
				}
			}
		}
		if !ok {
			continue
		}
		e := 0
		for j, p := range pos {
			if p >= 0 && idx>>p&1 == 1 {
				e |= 1 << j
			}
		}
		m[row<<k|col] = all.data[e]
	}
	return m, true
}

// product multiplies factors into one.
func product(fs []factor) factor {
	var vars []int
	for _, f := range fs {
		for _, y := range f.vars {
			if !slices.Contains(vars, y) {
				vars = append(vars, y)
			}
		}
	}
	out := factor{vars: vars, data: make([]complex128, 1<<len(vars))}
	for i := range out.data {
		out.data[i] = 1
	}
	for _, f := range fs {
		pos := make([]int, len(f.vars))
		for j, y := range f.vars {
			pos[j] = slices.Index(vars, y)
		}
		for i := range out.data {
			idx := 0
			for j, p := range pos {
				idx |= (i >> p & 1) << j
			}
			out.data[i] *= f.data[idx]
		}
	}
	return out
}

// dedupe merges repeated variables of a factor (two ends of an edge joined by plain edges), keeping
// the diagonal.
func dedupe(f factor) factor {
	var vars []int
	for _, x := range f.vars {
		if !slices.Contains(vars, x) {
			vars = append(vars, x)
		}
	}
	if len(vars) == len(f.vars) {
		return f
	}
	out := factor{vars: vars, data: make([]complex128, 1<<len(vars))}
	for i := range out.data {
		out.data[i] = f.at(func(x int) int { return i >> slices.Index(vars, x) & 1 })
	}
	return out
}

// sumOut multiplies the factors and sums variable x out.
func sumOut(fs []factor, x int) factor {
	var vars []int
	for _, f := range fs {
		for _, y := range f.vars {
			if y != x && !slices.Contains(vars, y) {
				vars = append(vars, y)
			}
		}
	}
	out := factor{vars: vars, data: make([]complex128, 1<<len(vars))}
	// Precompute, per factor, where each of its variables sits in vars (−1 for x).
	pos := make([][]int, len(fs))
	for i, f := range fs {
		pos[i] = make([]int, len(f.vars))
		for j, y := range f.vars {
			pos[i][j] = slices.Index(vars, y)
		}
	}
	for i := range out.data {
		var s complex128
		for b := 0; b < 2; b++ {
			e := complex(1, 0)
			for fi, f := range fs {
				idx := 0
				for j, p := range pos[fi] {
					bit := b
					if p >= 0 {
						bit = i >> p & 1
					}
					idx |= bit << j
				}
				e *= f.data[idx]
			}
			s += e
		}
		out.data[i] = s
	}
	return out
}
