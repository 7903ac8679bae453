package gen

import "pgregory.net/rapid"

// pauli is a Pauli operator up to sign, as a vector over F_2: X on qubit q
// when x[q], Z when z[q], Y when both.
type pauli struct{ x, z []bool }

func newPauli(n int) pauli { return pauli{x: make([]bool, n), z: make([]bool, n)} }

// symplectic returns ⟨p, r⟩ = Σ_q p.x[q]·r.z[q] + p.z[q]·r.x[q] mod 2:
// 1 when the two Paulis anticommute.
func symplectic(p, r pauli) bool {
	var s bool
	for q := range p.x {
		s = s != (p.x[q] && r.z[q]) != (p.z[q] && r.x[q])
	}
	return s
}

// cliffordOp is one gate of a Clifford circuit: h, s or cx (symplectic
// sweeps) or a Pauli x, y, z.
type cliffordOp struct {
	name   string
	qubits []int
}

// cliffordOps is a gate list in time order.
type cliffordOps []cliffordOp

// conjugate updates p to the Pauli that op sends it to (up to sign), by the
// conjugation rules of Aaronson & Gottesman, Phys. Rev. A 70, 052328 (2004),
// §III: h swaps x and z; s adds x into z; cx(c, t) adds x_c into x_t and
// z_t into z_c. Paulis change signs only, so they leave p alone.
func conjugate(p pauli, op cliffordOp) {
	switch op.name {
	case "h":
		q := op.qubits[0]
		p.x[q], p.z[q] = p.z[q], p.x[q]
	case "s":
		q := op.qubits[0]
		p.z[q] = p.z[q] != p.x[q]
	case "cx":
		c, t := op.qubits[0], op.qubits[1]
		p.x[t] = p.x[t] != p.x[c]
		p.z[c] = p.z[c] != p.z[t]
	}
}

// drawClifford draws a uniform Clifford on n qubits (see Clifford) and
// returns its gates in time order.
func drawClifford(t *rapid.T, n int) cliffordOps {
	var paulis cliffordOps
	for q := range n {
		x, z := bit.Draw(t, "x"), bit.Draw(t, "z")
		switch {
		case x && z:
			paulis = append(paulis, cliffordOp{"y", []int{q}})
		case x:
			paulis = append(paulis, cliffordOp{"x", []int{q}})
		case z:
			paulis = append(paulis, cliffordOp{"z", []int{q}})
		}
	}
	sweeps := make([]cliffordOps, n)
	for k := range n {
		v, w := drawPair(t, n, k)
		sweeps[k] = sweep(v, w, k)
	}
	// U = B_0^† B_1^† ⋯ B_{n−1}^† · P: the Paulis act first, then the inverse
	// sweeps from the last qubit back to the first. Every sweep gate is its
	// own inverse as a symplectic map, and signs are left to the Pauli layer,
	// so B_k^† is B_k's gates reversed.
	ops := paulis
	for k := n - 1; k >= 0; k-- {
		for i := len(sweeps[k]) - 1; i >= 0; i-- {
			ops = append(ops, sweeps[k][i])
		}
	}
	return ops
}

// drawPair draws an anticommuting pair (v, w) of Paulis supported on qubits
// k..n−1, uniform over all such pairs, mapping all-zero bits to (X_k, Z_k).
func drawPair(t *rapid.T, n, k int) (v, w pauli) {
	for {
		v = drawPauli(t, n, k)
		v.x[k] = !v.x[k] // XOR with X_k: zero bits give X_k
		if !isIdentity(v) {
			break
		}
	}
	w = drawPauli(t, n, k)
	w.z[k] = !w.z[k] // XOR with Z_k: zero bits give Z_k
	if !symplectic(v, w) {
		// XOR with a partner f of v (⟨v, f⟩ = 1) flips the form: u ↦ w is
		// two-to-one onto the pairs, so w stays uniform.
		for q := k; q < n; q++ {
			if v.x[q] {
				w.z[q] = !w.z[q]
				break
			}
			if v.z[q] {
				w.x[q] = !w.x[q]
				break
			}
		}
	}
	return v, w
}

// drawPauli draws a uniform Pauli on qubits k..n−1 (identity elsewhere).
func drawPauli(t *rapid.T, n, k int) pauli {
	p := newPauli(n)
	for q := k; q < n; q++ {
		p.x[q] = bit.Draw(t, "x")
		p.z[q] = bit.Draw(t, "z")
	}
	return p
}

func isIdentity(p pauli) bool {
	for q := range p.x {
		if p.x[q] || p.z[q] {
			return false
		}
	}
	return true
}

// sweep returns gates on qubits k..n−1 that carry the anticommuting pair
// (v, w) to (X_k, Z_k) up to sign. v and w are overwritten.
func sweep(v, w pauli, k int) cliffordOps {
	n := len(v.x)
	var ops cliffordOps
	apply := func(name string, qubits ...int) {
		op := cliffordOp{name, qubits}
		conjugate(v, op)
		conjugate(w, op)
		ops = append(ops, op)
	}
	// v: turn every factor into X (Z by h, Y by s) …
	for q := k; q < n; q++ {
		switch {
		case v.z[q] && !v.x[q]:
			apply("h", q)
		case v.z[q] && v.x[q]:
			apply("s", q)
		}
	}
	// … bring an X onto qubit k, then clear the others with cx from k.
	if !v.x[k] {
		for q := k + 1; q < n; q++ {
			if v.x[q] {
				apply("cx", q, k)
				break
			}
		}
	}
	for q := k + 1; q < n; q++ {
		if v.x[q] {
			apply("cx", k, q)
		}
	}
	// w anticommutes with v = X_k, so it has Z or Y on qubit k. Turn its other
	// factors into Z, clear them with cx onto k (which fixes X_k), and turn a
	// Y_k into Z_k with h·s·h, which fixes X_k.
	for q := k + 1; q < n; q++ {
		switch {
		case w.x[q] && !w.z[q]:
			apply("h", q)
		case w.x[q] && w.z[q]:
			apply("s", q)
			apply("h", q)
		}
	}
	for q := k + 1; q < n; q++ {
		if w.z[q] {
			apply("cx", q, k)
		}
	}
	if w.x[k] {
		apply("h", k)
		apply("s", k)
		apply("h", k)
	}
	return ops
}
