// Package circuit is qcheck's circuit representation: a register of qubits, a list of operations,
// and the standard gate library with the textbook matrix of every gate.
//
// # Conventions
//
// Qubit 0 is the least-significant bit of a basis-state index: index = Σ_q b_q·2^q. A gate's own
// matrix is written in the textbook order of its operands: the first operand is the most
// significant bit of the gate's local index. So CX(0, 1) (control 0, target 1) has the textbook
// 4×4 matrix on (control, target), and on a two-qubit register it maps basis index 1 (q0=1, q1=0)
// to index 3 and back, leaving 0 and 2 alone.
//
// Angles are radians. Gate names are the lower-case names of the OpenQASM standard library; the
// builder methods are their upper-case forms with angles first and qubits after, so
// `rz(θ) q[2];` is c.RZ(θ, 2).
//
// # Gate definitions
//
// Every gate's matrix is the textbook one (Nielsen & Chuang §4.2–4.3), written out with its
// source in library.go. The rotations, the phase gate and u, whose global phases ExactPhase
// sees, are
//
//	rx(θ) = exp(−iθX/2),  ry(θ) = exp(−iθY/2),  rz(θ) = exp(−iθZ/2) = diag(e^{−iθ/2}, e^{iθ/2})
//	p(λ)  = diag(1, e^{iλ}) = e^{iλ/2}·rz(λ)
//	u(θ, φ, λ) = [[cos(θ/2), −e^{iλ}·sin(θ/2)], [e^{iφ}·sin(θ/2), e^{i(φ+λ)}·cos(θ/2)]]
//
// so p and rz of the same angle agree up to a global phase only, and u is the general
// single-qubit gate of the OpenQASM 2.0 paper (Cross et al., arXiv:1707.03429, eq. 2). A custom
// gate ([Custom]) is applied in the same textbook order of its operands as the library's gates.
//
// # Errors
//
// Builder methods never panic and never fail on the spot: they record what they are given, and
// Validate reports the first bad operation (qubit out of range, repeated operand, wrong arity,
// non-finite angle) with its index. Every engine validates before it computes, so a bad builder
// call surfaces as an error there too. Gate methods never panic either: an ill-formed Gate
// literal has no Matrix and is its own Inverse, and Validate reports it.
//
// A nil *Circuit reads as an empty circuit on no qubits (Qubits, Bits and Len are 0, Clone and
// Inverse return nil, String and GoString say nil, Compose(nil) adds nothing) and Validate
// reports it. Adding ops to a nil *Circuit (a builder method, Append, AppendOp, Compose, SetBits)
// is a programmer error, as gonum treats a dimension mismatch: it panics with a message naming
// the method, since there is nowhere to record the op.
package circuit
