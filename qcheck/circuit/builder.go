package circuit

// The builder methods add one standard gate each and return the circuit, so calls chain:
// circuit.New(3).H(0).CX(0, 1).RZ(0.25, 2). Angles come first, qubits after, in the operand
// order of the gate's textbook matrix. Bad arguments are recorded and reported by Validate.

func (c *Circuit) add(name string, params []float64, qubits ...int) *Circuit {
	mustExist(c, name)
	c.Ops = append(c.Ops, Op{Gate: Gate{Name: name, Params: params}, Qubits: qubits})
	return c
}

// I adds the identity gate id on q.
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
func (c *Circuit) RX(theta float64, q int) *Circuit { return c.add("rx", []float64{theta}, q) }

// RY adds the rotation exp(−iθY/2) on q.
func (c *Circuit) RY(theta float64, q int) *Circuit { return c.add("ry", []float64{theta}, q) }

// RZ adds the rotation exp(−iθZ/2) = diag(e^{−iθ/2}, e^{iθ/2}) on q.
func (c *Circuit) RZ(theta float64, q int) *Circuit { return c.add("rz", []float64{theta}, q) }

// P adds the phase gate diag(1, e^{iλ}) on q; it equals RZ(λ) up to the global phase e^{iλ/2}.
func (c *Circuit) P(lambda float64, q int) *Circuit { return c.add("p", []float64{lambda}, q) }

// U adds the general single-qubit gate u(θ, φ, λ) on q.
func (c *Circuit) U(theta, phi, lambda float64, q int) *Circuit {
	return c.add("u", []float64{theta, phi, lambda}, q)
}

// CX adds the controlled-X (CNOT) gate with the given control and target.
func (c *Circuit) CX(control, target int) *Circuit { return c.add("cx", nil, control, target) }

// CY adds the controlled-Y gate.
func (c *Circuit) CY(control, target int) *Circuit { return c.add("cy", nil, control, target) }

// CZ adds the controlled-Z gate; it is symmetric in its operands.
func (c *Circuit) CZ(control, target int) *Circuit { return c.add("cz", nil, control, target) }

// CH adds the controlled-Hadamard gate.
func (c *Circuit) CH(control, target int) *Circuit { return c.add("ch", nil, control, target) }

// CP adds the controlled phase gate, diag(1, 1, 1, e^{iλ}); symmetric in its operands.
func (c *Circuit) CP(lambda float64, control, target int) *Circuit {
	return c.add("cp", []float64{lambda}, control, target)
}

// CRX adds the controlled rotation about X.
func (c *Circuit) CRX(theta float64, control, target int) *Circuit {
	return c.add("crx", []float64{theta}, control, target)
}

// CRY adds the controlled rotation about Y.
func (c *Circuit) CRY(theta float64, control, target int) *Circuit {
	return c.add("cry", []float64{theta}, control, target)
}

// CRZ adds the controlled rotation about Z, diag(1, 1, e^{−iθ/2}, e^{iθ/2}); unlike CP it puts
// a relative phase on the control.
func (c *Circuit) CRZ(theta float64, control, target int) *Circuit {
	return c.add("crz", []float64{theta}, control, target)
}

// SWAP adds the gate that exchanges two qubits.
func (c *Circuit) SWAP(a, b int) *Circuit { return c.add("swap", nil, a, b) }

// ISWAP adds the gate that maps |01⟩ → i|10⟩ and |10⟩ → i|01⟩.
func (c *Circuit) ISWAP(a, b int) *Circuit { return c.add("iswap", nil, a, b) }

// ISWAPdg adds the inverse of ISWAP, which maps |01⟩ → −i|10⟩ and |10⟩ → −i|01⟩; it is what
// Inverse makes of an iswap.
func (c *Circuit) ISWAPdg(a, b int) *Circuit { return c.add("iswapdg", nil, a, b) }

// RXX adds exp(−iθ X⊗X/2) on a and b.
func (c *Circuit) RXX(theta float64, a, b int) *Circuit { return c.add("rxx", []float64{theta}, a, b) }

// RYY adds exp(−iθ Y⊗Y/2) on a and b.
func (c *Circuit) RYY(theta float64, a, b int) *Circuit { return c.add("ryy", []float64{theta}, a, b) }

// RZZ adds exp(−iθ Z⊗Z/2) on a and b.
func (c *Circuit) RZZ(theta float64, a, b int) *Circuit { return c.add("rzz", []float64{theta}, a, b) }

// CCX adds the Toffoli gate with two controls and a target.
func (c *Circuit) CCX(c1, c2, target int) *Circuit { return c.add("ccx", nil, c1, c2, target) }

// CCZ adds the doubly controlled Z gate; symmetric in its operands.
func (c *Circuit) CCZ(a, b, d int) *Circuit { return c.add("ccz", nil, a, b, d) }

// CSWAP adds the Fredkin gate: swaps a and b when control is |1⟩.
func (c *Circuit) CSWAP(control, a, b int) *Circuit { return c.add("cswap", nil, control, a, b) }

// Barrier adds a barrier on the given qubits; engines skip it, and passes should not move gates
// across it.
func (c *Circuit) Barrier(qubits ...int) *Circuit {
	return c.add("barrier", nil, append([]int(nil), qubits...)...)
}

// Measure adds a measurement of q in the computational basis into classical bit b.
func (c *Circuit) Measure(q, b int) *Circuit {
	c.Ops = append(c.Ops, Op{Gate: Gate{Name: "measure"}, Qubits: []int{q}, Bits: []int{b}})
	if b >= c.bits {
		c.bits = b + 1
	}
	return c
}

// Reset adds a reset of q to |0⟩.
func (c *Circuit) Reset(q int) *Circuit { return c.add("reset", nil, q) }
