package param

import "qcheck.dev/qcheck/circuit"

// The builder methods mirror those of circuit.Circuit with Exprs in place of angles, and return
// the circuit so calls chain: param.New(2).RZ(a.Plus(b), 0).CX(0, 1). Angles come first, qubits
// after, in the operand order of the gate's textbook matrix. Bad arguments are recorded and
// reported by Validate.

func (c *Circuit) add(name string, angles []Expr, qubits ...int) *Circuit {
	return c.Gate(circuit.Gate{Name: name}, angles, qubits...)
}

// I adds the identity gate on q.
func (c *Circuit) I(q int) *Circuit { return c.add("id", nil, q) }

// X adds the Pauli X gate on q.
func (c *Circuit) X(q int) *Circuit { return c.add("x", nil, q) }

// Y adds the Pauli Y gate on q.
func (c *Circuit) Y(q int) *Circuit { return c.add("y", nil, q) }

// Z adds the Pauli Z gate on q.
func (c *Circuit) Z(q int) *Circuit { return c.add("z", nil, q) }

// H adds the Hadamard gate on q.
func (c *Circuit) H(q int) *Circuit { return c.add("h", nil, q) }

// S adds the phase gate diag(1, i) on q.
func (c *Circuit) S(q int) *Circuit { return c.add("s", nil, q) }

// Sdg adds the inverse of S on q.
func (c *Circuit) Sdg(q int) *Circuit { return c.add("sdg", nil, q) }

// T adds the π/8 gate diag(1, e^{iπ/4}) on q.
func (c *Circuit) T(q int) *Circuit { return c.add("t", nil, q) }

// Tdg adds the inverse of T on q.
func (c *Circuit) Tdg(q int) *Circuit { return c.add("tdg", nil, q) }

// SX adds √X on q.
func (c *Circuit) SX(q int) *Circuit { return c.add("sx", nil, q) }

// SXdg adds the inverse of √X on q.
func (c *Circuit) SXdg(q int) *Circuit { return c.add("sxdg", nil, q) }

// RX adds the rotation exp(−iθX/2) on q.
func (c *Circuit) RX(theta Expr, q int) *Circuit { return c.add("rx", []Expr{theta}, q) }

// RY adds the rotation exp(−iθY/2) on q.
func (c *Circuit) RY(theta Expr, q int) *Circuit { return c.add("ry", []Expr{theta}, q) }

// RZ adds the rotation exp(−iθZ/2) on q.
func (c *Circuit) RZ(theta Expr, q int) *Circuit { return c.add("rz", []Expr{theta}, q) }

// P adds the phase gate diag(1, e^{iλ}) on q.
func (c *Circuit) P(lambda Expr, q int) *Circuit { return c.add("p", []Expr{lambda}, q) }

// U adds the general single-qubit gate u(θ, φ, λ) on q.
func (c *Circuit) U(theta, phi, lambda Expr, q int) *Circuit {
	return c.add("u", []Expr{theta, phi, lambda}, q)
}

// CX adds the controlled-X (CNOT) gate.
func (c *Circuit) CX(control, target int) *Circuit { return c.add("cx", nil, control, target) }

// CY adds the controlled-Y gate.
func (c *Circuit) CY(control, target int) *Circuit { return c.add("cy", nil, control, target) }

// CZ adds the controlled-Z gate.
func (c *Circuit) CZ(control, target int) *Circuit { return c.add("cz", nil, control, target) }

// CH adds the controlled-Hadamard gate.
func (c *Circuit) CH(control, target int) *Circuit { return c.add("ch", nil, control, target) }

// CP adds the controlled phase gate diag(1, 1, 1, e^{iλ}).
func (c *Circuit) CP(lambda Expr, control, target int) *Circuit {
	return c.add("cp", []Expr{lambda}, control, target)
}

// CRX adds the controlled rotation about X.
func (c *Circuit) CRX(theta Expr, control, target int) *Circuit {
	return c.add("crx", []Expr{theta}, control, target)
}

// CRY adds the controlled rotation about Y.
func (c *Circuit) CRY(theta Expr, control, target int) *Circuit {
	return c.add("cry", []Expr{theta}, control, target)
}

// CRZ adds the controlled rotation about Z, diag(1, 1, e^{−iθ/2}, e^{iθ/2}).
func (c *Circuit) CRZ(theta Expr, control, target int) *Circuit {
	return c.add("crz", []Expr{theta}, control, target)
}

// SWAP adds the gate that exchanges two qubits.
func (c *Circuit) SWAP(a, b int) *Circuit { return c.add("swap", nil, a, b) }

// ISWAP adds the gate that maps |01⟩ → i|10⟩ and |10⟩ → i|01⟩.
func (c *Circuit) ISWAP(a, b int) *Circuit { return c.add("iswap", nil, a, b) }

// ISWAPdg adds the inverse of ISWAP.
func (c *Circuit) ISWAPdg(a, b int) *Circuit { return c.add("iswapdg", nil, a, b) }

// RXX adds exp(−iθ X⊗X/2) on a and b.
func (c *Circuit) RXX(theta Expr, a, b int) *Circuit { return c.add("rxx", []Expr{theta}, a, b) }

// RYY adds exp(−iθ Y⊗Y/2) on a and b.
func (c *Circuit) RYY(theta Expr, a, b int) *Circuit { return c.add("ryy", []Expr{theta}, a, b) }

// RZZ adds exp(−iθ Z⊗Z/2) on a and b.
func (c *Circuit) RZZ(theta Expr, a, b int) *Circuit { return c.add("rzz", []Expr{theta}, a, b) }

// CCX adds the Toffoli gate.
func (c *Circuit) CCX(c1, c2, target int) *Circuit { return c.add("ccx", nil, c1, c2, target) }

// CCZ adds the doubly controlled Z gate.
func (c *Circuit) CCZ(a, b, d int) *Circuit { return c.add("ccz", nil, a, b, d) }

// CSWAP adds the Fredkin gate.
func (c *Circuit) CSWAP(control, a, b int) *Circuit { return c.add("cswap", nil, control, a, b) }

// Barrier adds a barrier on the given qubits; engines skip it.
func (c *Circuit) Barrier(qubits ...int) *Circuit { return c.add("barrier", nil, qubits...) }
