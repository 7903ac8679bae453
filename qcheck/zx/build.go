package zx

import (
	"fmt"

	"qcheck.dev/qcheck/circuit"
)

// builder lays a circuit's gates into a graph wire by wire. last[q] is the vertex at the end of
// wire q and pend[q] whether a Hadamard waits on the wire after it.
type builder struct {
	g    *graph
	last []int
	pend []bool
}

func newBuilder(n int, tol float64) *builder {
	b := &builder{g: &graph{tol: tol, origin: -1}, last: make([]int, n), pend: make([]bool, n)}
	b.g.in = make([]int, n)
	for q := range n {
		b.g.in[q] = b.g.add(boundary, phase{})
		b.last[q] = b.g.in[q]
	}
	return b
}

// finish joins every wire to its output.
func (b *builder) finish() *graph {
	g := b.g
	g.out = make([]int, len(b.last))
	for q := range b.last {
		g.out[q] = g.add(boundary, phase{})
		g.connect(b.last[q], g.out[q], b.wire(q))
	}
	return g
}

func (b *builder) wire(q int) edge {
	if b.pend[q] {
		return hadamard
	}
	return plain
}

// z returns a Z spider at the end of wire q that further Z phases and controls may join: the last
// vertex when it is a spider with no Hadamard after it, otherwise a new one.
func (b *builder) z(q int) int {
	if !b.pend[q] && b.g.isSpider(b.last[q]) {
		return b.last[q]
	}
	v := b.g.add(spider, phase{})
	b.g.connect(b.last[q], v, b.wire(q))
	b.last[q], b.pend[q] = v, false
	return v
}

func (b *builder) h(q int)     { b.pend[q] = !b.pend[q] }
func (b *builder) zk(q, k int) { v := b.z(q); b.g.v[v].ph = b.g.v[v].ph.add(exact(k), b.g) }
func (b *builder) za(q int, a float64) {
	v := b.z(q)
	b.g.v[v].ph = b.g.v[v].ph.add(angleToPhase(a, b.g), b.g)
}
func (b *builder) xk(q, k int)         { b.h(q); b.zk(q, k); b.h(q) }
func (b *builder) xa(q int, a float64) { b.h(q); b.za(q, a); b.h(q) }

func (b *builder) cz(c, t int) {
	vc, vt := b.z(c), b.z(t)
	b.g.v[vc].from = max(b.g.v[vc].from, b.g.origin)
	b.g.v[vt].from = max(b.g.v[vt].from, b.g.origin)
	b.g.connect(vc, vt, hadamard)
}

func (b *builder) cx(c, t int) {
	vc := b.z(c)
	b.h(t)
	vt := b.z(t)
	b.h(t)
	b.g.v[vc].from = max(b.g.v[vc].from, b.g.origin)
	b.g.v[vt].from = max(b.g.v[vt].from, b.g.origin)
	b.g.connect(vc, vt, hadamard)
}

func (b *builder) swap(p, q int) {
	b.last[p], b.last[q] = b.last[q], b.last[p]
	b.pend[p], b.pend[q] = b.pend[q], b.pend[p]
}

func (b *builder) ry(q int, a float64) { b.zk(q, 6); b.xa(q, a); b.zk(q, 2) }

func (b *builder) rzz(p, q int, a float64) { b.cx(p, q); b.za(q, a); b.cx(p, q) }

// ccx is the Toffoli gate in Clifford+T, Nielsen & Chuang Fig. 4.9.
func (b *builder) ccx(a, c, t int) {
	b.h(t)
	b.cx(c, t)
	b.zk(t, 7)
	b.cx(a, t)
	b.zk(t, 1)
	b.cx(c, t)
	b.zk(t, 7)
	b.cx(a, t)
	b.zk(c, 1)
	b.zk(t, 1)
	b.h(t)
	b.cx(a, c)
	b.zk(a, 1)
	b.zk(c, 7)
	b.cx(a, c)
}

// op lays one op, each gate written, up to a global phase, in Z phases, Hadamards, CZ and CNOT
// (the decompositions are checked against the gates' matrices in the tests).
func (b *builder) op(i int, o circuit.Op) error {
	if !o.Unitary() {
		if o.Gate.Name == "barrier" {
			return nil
		}
		return fmt.Errorf("zx: op %d (%s) is not unitary", i, o)
	}
	if o.Gate.IsCustom() {
		return fmt.Errorf("zx: op %d (%s) is a custom gate, which has no ZX-diagram here", i, o)
	}
	q, p := o.Qubits, o.Gate.Params
	switch o.Gate.Name {
	case "id":
	case "x":
		b.xk(q[0], 4)
	case "y":
		b.zk(q[0], 4)
		b.xk(q[0], 4)
	case "z":
		b.zk(q[0], 4)
	case "h":
		b.h(q[0])
	case "s":
		b.zk(q[0], 2)
	case "sdg":
		b.zk(q[0], 6)
	case "t":
		b.zk(q[0], 1)
	case "tdg":
		b.zk(q[0], 7)
	case "sx":
		b.xk(q[0], 2)
	case "sxdg":
		b.xk(q[0], 6)
	case "rx":
		b.xa(q[0], p[0])
	case "ry":
		b.ry(q[0], p[0])
	case "rz", "p":
		b.za(q[0], p[0])
	case "u":
		b.za(q[0], p[2])
		b.ry(q[0], p[0])
		b.za(q[0], p[1])
	case "cx":
		b.cx(q[0], q[1])
	case "cz":
		b.cz(q[0], q[1])
	case "cy":
		b.zk(q[1], 6)
		b.cx(q[0], q[1])
		b.zk(q[1], 2)
	case "ch":
		// ry(π/4)·Z·ry(−π/4) = H, so CH = (I⊗ry(π/4))·CZ·(I⊗ry(−π/4)).
		b.zk(q[1], 6)
		b.xk(q[1], 7)
		b.zk(q[1], 2)
		b.cz(q[0], q[1])
		b.zk(q[1], 6)
		b.xk(q[1], 1)
		b.zk(q[1], 2)
	case "cp":
		b.za(q[0], p[0]/2)
		b.cx(q[0], q[1])
		b.za(q[1], -p[0]/2)
		b.cx(q[0], q[1])
		b.za(q[1], p[0]/2)
	case "crz":
		b.za(q[1], p[0]/2)
		b.cx(q[0], q[1])
		b.za(q[1], -p[0]/2)
		b.cx(q[0], q[1])
	case "crx":
		b.h(q[1])
		b.za(q[1], p[0]/2)
		b.cx(q[0], q[1])
		b.za(q[1], -p[0]/2)
		b.cx(q[0], q[1])
		b.h(q[1])
	case "cry":
		b.ry(q[1], p[0]/2)
		b.cx(q[0], q[1])
		b.ry(q[1], -p[0]/2)
		b.cx(q[0], q[1])
	case "swap":
		b.swap(q[0], q[1])
	case "rzz":
		b.rzz(q[0], q[1], p[0])
	case "rxx":
		b.h(q[0])
		b.h(q[1])
		b.rzz(q[0], q[1], p[0])
		b.h(q[0])
		b.h(q[1])
	case "ryy":
		b.xk(q[0], 6)
		b.xk(q[1], 6)
		b.rzz(q[0], q[1], p[0])
		b.xk(q[0], 2)
		b.xk(q[1], 2)
	case "iswap", "iswapdg":
		// iSWAP = exp(iπ/4 (XX + YY)) = rxx(−π/2)·ryy(−π/2); the two terms commute.
		s := -2
		if o.Gate.Name == "iswapdg" {
			s = 2
		}
		b.h(q[0])
		b.h(q[1])
		b.cx(q[0], q[1])
		b.zk(q[1], s)
		b.cx(q[0], q[1])
		b.h(q[0])
		b.h(q[1])
		b.xk(q[0], 6)
		b.xk(q[1], 6)
		b.cx(q[0], q[1])
		b.zk(q[1], s)
		b.cx(q[0], q[1])
		b.xk(q[0], 2)
		b.xk(q[1], 2)
	case "ccx":
		b.ccx(q[0], q[1], q[2])
	case "ccz":
		b.h(q[2])
		b.ccx(q[0], q[1], q[2])
		b.h(q[2])
	case "cswap":
		b.cx(q[2], q[1])
		b.ccx(q[0], q[1], q[2])
		b.cx(q[2], q[1])
	default:
		return fmt.Errorf("zx: op %d (%s): no ZX-diagram for gate %q", i, o, o.Gate.Name)
	}
	return nil
}

// miter returns the diagram of U[:cut]·V†·U[cut:], ops applied left to right: the ops of U from
// cut on, the inverse of V, then the first cut ops of U. It is U1·(V†U)·U1† for U1 the first cut
// ops, so it has the spectrum of V†U, and cut = 0 gives V†U itself.
func miter(u, v *circuit.Circuit, cut int, tol float64) (*graph, error) {
	b := newBuilder(u.Qubits(), tol)
	lay := func(from, to int) error {
		for i := from; i < to; i++ {
			b.g.origin = i
			if err := b.op(i, u.Ops[i]); err != nil {
				return fmt.Errorf("%w (first circuit)", err)
			}
		}
		b.g.origin = -1
		return nil
	}
	if err := lay(cut, len(u.Ops)); err != nil {
		return nil, err
	}
	inv := v.Inverse()
	for i, o := range inv.Ops {
		if err := b.op(len(v.Ops)-1-i, o); err != nil {
			return nil, fmt.Errorf("%w (second circuit)", err)
		}
	}
	if err := lay(0, cut); err != nil {
		return nil, err
	}
	return b.finish(), nil
}
