package zx

import (
	"math"
	"math/rand/v2"

	"qcheck.dev/qcheck/circuit"
)

// The circuits of the tests and benchmarks: textbook algorithms, random "volume" circuits, and
// compiler-style rewrites of them. All are generated here; none is copied from elsewhere.

func gate(name string, params ...float64) circuit.Gate {
	g, err := circuit.NewGate(name, params...)
	if err != nil {
		panic(err)
	}
	return g
}

// qft is the quantum Fourier transform of Nielsen & Chuang §5.1 (Fig. 5.1), qubit n−1 the most
// significant, with the final swaps that reverse the qubits.
func qft(n int) *circuit.Circuit {
	c := circuit.New(n)
	for j := n - 1; j >= 0; j-- {
		c.Append(gate("h"), j)
		for k := j - 1; k >= 0; k-- {
			c.Append(gate("cp", math.Pi/math.Pow(2, float64(j-k))), k, j)
		}
	}
	for i := 0; i < n/2; i++ {
		c.Append(gate("swap"), i, n-1-i)
	}
	return c
}

// adder is the ripple-carry adder of Cuccaro, Draper, Kutin & Moulton (quant-ph/0410184, Fig. 4)
// on n-bit numbers: qubit 0 the carry in (|0⟩), a_i = 1+2i, b_i = 2+2i, and qubit 2n+1 the carry
// out. It maps |a, b, z⟩ to |a, a+b mod 2^n, z ⊕ carry⟩.
func adder(n int) *circuit.Circuit {
	c := circuit.New(2*n + 2)
	a := func(i int) int { return 1 + 2*i }
	b := func(i int) int { return 2 + 2*i }
	maj := func(x, y, z int) {
		c.Append(gate("cx"), z, y)
		c.Append(gate("cx"), z, x)
		c.Append(gate("ccx"), x, y, z)
	}
	uma := func(x, y, z int) {
		c.Append(gate("ccx"), x, y, z)
		c.Append(gate("cx"), z, x)
		c.Append(gate("cx"), x, y)
	}
	maj(0, b(0), a(0))
	for i := 1; i < n; i++ {
		maj(a(i-1), b(i), a(i))
	}
	c.Append(gate("cx"), a(n-1), 2*n+1)
	for i := n - 1; i >= 1; i-- {
		uma(a(i-1), b(i), a(i))
	}
	uma(0, b(0), a(0))
	return c
}

// volume is a random circuit of two-qubit blocks: depth layers, each pairing the qubits at random
// and applying to each pair a block of three CNOTs between general single-qubit gates (the
// shape of a generic two-qubit unitary).
func volume(n, depth int, rng *rand.Rand) *circuit.Circuit {
	c := circuit.New(n)
	ang := func() float64 { return (rng.Float64()*2 - 1) * math.Pi }
	for range depth {
		perm := rng.Perm(n)
		for i := 0; i+1 < n; i += 2 {
			p, q := perm[i], perm[i+1]
			c.Append(gate("u", ang(), ang(), ang()), p)
			c.Append(gate("u", ang(), ang(), ang()), q)
			c.Append(gate("cx"), p, q)
			c.Append(gate("ry", ang()), p)
			c.Append(gate("rz", ang()), q)
			c.Append(gate("cx"), q, p)
			c.Append(gate("ry", ang()), p)
			c.Append(gate("cx"), p, q)
			c.Append(gate("u", ang(), ang(), ang()), p)
			c.Append(gate("u", ang(), ang(), ang()), q)
		}
	}
	return c
}

// translate rewrites a circuit into the basis {rz, sx, cz} as a compiler's basis translation
// does, each gate equal to the original up to a global phase: h = rz(π/2)·sx·rz(π/2),
// u(θ,φ,λ) = rz(φ+π)·sx·rz(θ+π)·sx·rz(λ), cx = (I⊗H)·CZ·(I⊗H), cp and the Toffoli through CNOTs
// (Nielsen & Chuang Fig. 4.9), swap as three CNOTs.
func translate(c *circuit.Circuit) *circuit.Circuit {
	out := circuit.New(c.Qubits())
	var emit func(name string, q []int, p ...float64)
	emit = func(name string, q []int, p ...float64) {
		switch name {
		case "h":
			emit("rz", q, math.Pi/2)
			out.Append(gate("sx"), q[0])
			emit("rz", q, math.Pi/2)
		case "u":
			emit("rz", q, p[2])
			out.Append(gate("sx"), q[0])
			emit("rz", q, p[0]+math.Pi)
			out.Append(gate("sx"), q[0])
			emit("rz", q, p[1]+math.Pi)
		case "ry":
			emit("u", q, p[0], 0, 0)
		case "rx":
			emit("u", q, p[0], -math.Pi/2, math.Pi/2)
		case "t":
			emit("rz", q, math.Pi/4)
		case "tdg":
			emit("rz", q, -math.Pi/4)
		case "s":
			emit("rz", q, math.Pi/2)
		case "sdg":
			emit("rz", q, -math.Pi/2)
		case "z":
			emit("rz", q, math.Pi)
		case "x":
			out.Append(gate("sx"), q[0])
			out.Append(gate("sx"), q[0])
		case "p":
			emit("rz", q, p[0])
		case "cx":
			emit("h", q[1:])
			out.Append(gate("cz"), q[0], q[1])
			emit("h", q[1:])
		case "cp":
			emit("rz", q[:1], p[0]/2)
			emit("cx", q)
			emit("rz", q[1:], -p[0]/2)
			emit("cx", q)
			emit("rz", q[1:], p[0]/2)
		case "swap":
			emit("cx", q)
			emit("cx", []int{q[1], q[0]})
			emit("cx", q)
		case "ccx":
			a, b, t := q[0], q[1], q[2]
			emit("h", []int{t})
			emit("cx", []int{b, t})
			emit("tdg", []int{t})
			emit("cx", []int{a, t})
			emit("t", []int{t})
			emit("cx", []int{b, t})
			emit("tdg", []int{t})
			emit("cx", []int{a, t})
			emit("t", []int{b})
			emit("t", []int{t})
			emit("h", []int{t})
			emit("cx", []int{a, b})
			emit("t", []int{a})
			emit("tdg", []int{b})
			emit("cx", []int{a, b})
		default:
			out.Append(gate(name, p...), q...)
		}
	}
	for _, op := range c.Ops {
		emit(op.Gate.Name, op.Qubits, op.Gate.Params...)
	}
	return out
}

// diagonal reports whether an op's matrix is diagonal in the computational basis.
func diagonal(op circuit.Op) bool {
	switch op.Gate.Name {
	case "rz", "p", "t", "tdg", "s", "sdg", "z", "cz", "cp", "crz", "rzz", "ccz":
		return true
	}
	return false
}

// commute reports whether two ops commute for a reason that holds exactly: disjoint qubits, both
// diagonal, or a single-qubit diagonal op on the control of a CNOT.
func commute(x, y circuit.Op) bool {
	shared := false
	for _, p := range x.Qubits {
		for _, q := range y.Qubits {
			if p == q {
				shared = true
			}
		}
	}
	if !shared || diagonal(x) && diagonal(y) {
		return true
	}
	ctl := func(d, c circuit.Op) bool {
		return diagonal(d) && len(d.Qubits) == 1 && c.Gate.Name == "cx" && d.Qubits[0] == c.Qubits[0]
	}
	return ctl(x, y) || ctl(y, x)
}

// reorder exchanges adjacent commuting ops at random, swaps times.
func reorder(c *circuit.Circuit, swaps int, rng *rand.Rand) *circuit.Circuit {
	out := c.Clone()
	if len(out.Ops) < 2 {
		return out
	}
	for range swaps {
		i := rng.IntN(len(out.Ops) - 1)
		if commute(out.Ops[i], out.Ops[i+1]) {
			out.Ops[i], out.Ops[i+1] = out.Ops[i+1], out.Ops[i]
		}
	}
	return out
}

// route inserts SWAP gates as a router does: after a random op it exchanges two qubits and
// renames every later op accordingly; a final SWAP undoes the exchange, so the circuit keeps its
// meaning and its output order.
func route(c *circuit.Circuit, rng *rand.Rand) *circuit.Circuit {
	out := circuit.New(c.Qubits())
	if c.Qubits() < 2 {
		return c.Clone()
	}
	p := rng.IntN(c.Qubits())
	q := (p + 1 + rng.IntN(c.Qubits()-1)) % c.Qubits()
	at := rng.IntN(len(c.Ops) + 1)
	for i, op := range c.Ops {
		if i == at {
			out.Append(gate("swap"), p, q)
		}
		op = op.Clone()
		if i >= at {
			for k, x := range op.Qubits {
				switch x {
				case p:
					op.Qubits[k] = q
				case q:
					op.Qubits[k] = p
				}
			}
		}
		out.AppendOp(op)
	}
	if at < len(c.Ops) {
		out.Append(gate("swap"), p, q)
	} else {
		out.Append(gate("swap"), p, q)
		out.Append(gate("swap"), p, q)
	}
	return out
}

// bug returns c with one op changed as a slip would: kind 0 changes an angle by delta, kind 1
// exchanges the control and target of a CNOT, kind 2 drops an op. It returns nil when c has no op
// of the kind.
func bug(c *circuit.Circuit, kind int, delta float64, rng *rand.Rand) *circuit.Circuit {
	var cands []int
	for i, op := range c.Ops {
		switch {
		case kind == 0 && len(op.Gate.Params) > 0,
			kind == 1 && op.Gate.Name == "cx",
			kind == 2 && op.Gate.Name != "barrier":
			cands = append(cands, i)
		}
	}
	if len(cands) == 0 {
		return nil
	}
	i := cands[rng.IntN(len(cands))]
	out := c.Clone()
	switch kind {
	case 0:
		out.Ops[i].Gate.Params[0] += delta
	case 1:
		q := out.Ops[i].Qubits
		q[0], q[1] = q[1], q[0]
	case 2:
		out.Ops = append(out.Ops[:i], out.Ops[i+1:]...)
	}
	return out
}
