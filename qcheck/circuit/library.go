package circuit

import (
	"math"
	"math/cmplx"
)

// gateDef is one entry of the standard library.
type gateDef struct {
	spec Spec
	// matrix returns the row-major textbook matrix for the given angles; nil for directives.
	matrix func(p []float64) []complex128
	// inverse returns the name and angles of the inverse gate; nil for self-inverse gates.
	inverse func(p []float64) (string, []float64)
	// angles names the gate's angles in order, as the textbook writes them (θ, φ, λ).
	angles []string
}

// The standard library. Each matrix is the textbook one, written out with its source:
// N&C is Nielsen & Chuang, Quantum Computation and Quantum Information (10th anniversary ed.),
// §4.2 (single-qubit gates, rotations eq. 4.4–4.6) and §4.3 (controlled operations, Fig. 4.4);
// the u gate is the general single-qubit gate of the OpenQASM 2.0 specification (Cross et al.,
// arXiv:1707.03429, eq. 2) written with its phase as in the package documentation:
// u(θ,φ,λ) = [[cos(θ/2), −e^{iλ}sin(θ/2)], [e^{iφ}sin(θ/2), e^{i(φ+λ)}cos(θ/2)]].
var library = map[string]gateDef{}

const sqrt1_2 = math.Sqrt2 / 2

func init() {
	self := func(name string, qubits int, clifford bool, m []complex128) {
		library[name] = gateDef{spec: Spec{Name: name, Qubits: qubits, Clifford: clifford},
			matrix: func([]float64) []complex128 { return append([]complex128(nil), m...) }}
	}
	pair := func(a, b string, qubits int, clifford bool, ma, mb []complex128) {
		library[a] = gateDef{spec: Spec{Name: a, Qubits: qubits, Clifford: clifford},
			matrix:  func([]float64) []complex128 { return append([]complex128(nil), ma...) },
			inverse: func([]float64) (string, []float64) { return b, nil }}
		library[b] = gateDef{spec: Spec{Name: b, Qubits: qubits, Clifford: clifford},
			matrix:  func([]float64) []complex128 { return append([]complex128(nil), mb...) },
			inverse: func([]float64) (string, []float64) { return a, nil }}
	}
	// rotation defines a gate of angles whose inverse negates every angle.
	rotation := func(name string, qubits int, angles []string, m func(p []float64) []complex128) {
		library[name] = gateDef{spec: Spec{Name: name, Qubits: qubits, Params: len(angles)}, matrix: m, angles: angles,
			inverse: func(p []float64) (string, []float64) {
				q := make([]float64, len(p))
				for i := range p {
					q[i] = -p[i]
				}
				return name, q
			}}
	}
	theta, lambda := []string{"θ"}, []string{"λ"}
	directive := func(name string, qubits int) {
		library[name] = gateDef{spec: Spec{Name: name, Qubits: qubits}}
	}

	// Pauli matrices, Hadamard, phase and π/8 gates: N&C §4.2 and Fig. 4.2.
	self("id", 1, true, []complex128{1, 0, 0, 1})
	self("x", 1, true, pauliX)
	self("y", 1, true, pauliY)
	self("z", 1, true, pauliZ)
	self("h", 1, true, hadamard)
	pair("s", "sdg", 1, true, []complex128{1, 0, 0, 1i}, []complex128{1, 0, 0, -1i})
	t := cmplx.Exp(complex(0, math.Pi/4))
	pair("t", "tdg", 1, false, []complex128{1, 0, 0, t}, []complex128{1, 0, 0, cmplx.Conj(t)})
	// √X = (1/2)[[1+i, 1−i], [1−i, 1+i]]; its square is X (N&C exercise 4.2 style identity,
	// checked in the tests).
	pair("sx", "sxdg", 1, true, sqrtX, conjugate(sqrtX))

	// Rotations exp(−iθP/2): N&C eqs. 4.4–4.6.
	rotation("rx", 1, theta, func(p []float64) []complex128 { return rx(p[0]) })
	rotation("ry", 1, theta, func(p []float64) []complex128 { return ry(p[0]) })
	rotation("rz", 1, theta, func(p []float64) []complex128 { return rz(p[0]) })
	// Phase gate p(λ) = diag(1, e^{iλ}); differs from rz(λ) by the global phase e^{iλ/2}.
	rotation("p", 1, lambda, func(p []float64) []complex128 { return phase(p[0]) })
	library["u"] = gateDef{spec: Spec{Name: "u", Qubits: 1, Params: 3}, angles: []string{"θ", "φ", "λ"},
		matrix: func(p []float64) []complex128 { return general(p[0], p[1], p[2]) },
		// u(θ,φ,λ)† = u(−θ,−λ,−φ): transpose-conjugate the matrix above entry by entry.
		inverse: func(p []float64) (string, []float64) { return "u", []float64{-p[0], -p[2], -p[1]} }}

	// Controlled gates: block diag(I, U) with the control as the first (most significant)
	// operand, N&C §4.3 Fig. 4.4.
	self("cx", 2, true, controlled(pauliX))
	self("cy", 2, true, controlled(pauliY))
	self("cz", 2, true, controlled(pauliZ))
	self("ch", 2, false, controlled(hadamard))
	rotation("cp", 2, lambda, func(p []float64) []complex128 { return controlled(phase(p[0])) })
	rotation("crx", 2, theta, func(p []float64) []complex128 { return controlled(rx(p[0])) })
	rotation("cry", 2, theta, func(p []float64) []complex128 { return controlled(ry(p[0])) })
	rotation("crz", 2, theta, func(p []float64) []complex128 { return controlled(rz(p[0])) })

	// SWAP exchanges the two qubits (N&C Fig. 1.7); iSWAP maps |01⟩ → i|10⟩ and |10⟩ → i|01⟩.
	self("swap", 2, true, []complex128{1, 0, 0, 0, 0, 0, 1, 0, 0, 1, 0, 0, 0, 0, 0, 1})
	pair("iswap", "iswapdg", 2, true,
		[]complex128{1, 0, 0, 0, 0, 0, 1i, 0, 0, 1i, 0, 0, 0, 0, 0, 1},
		[]complex128{1, 0, 0, 0, 0, 0, -1i, 0, 0, -1i, 0, 0, 0, 0, 0, 1})
	// Two-qubit Pauli rotations exp(−iθ P⊗P/2) = cos(θ/2) I − i sin(θ/2) P⊗P (P⊗P squares to I).
	rotation("rxx", 2, theta, func(p []float64) []complex128 { return pauliRotation(p[0], kron(pauliX, pauliX)) })
	rotation("ryy", 2, theta, func(p []float64) []complex128 { return pauliRotation(p[0], kron(pauliY, pauliY)) })
	rotation("rzz", 2, theta, func(p []float64) []complex128 { return pauliRotation(p[0], kron(pauliZ, pauliZ)) })

	// Toffoli, doubly controlled Z and Fredkin: N&C §1.4.1 and Fig. 4.9.
	self("ccx", 3, false, controlled(controlled(pauliX)))
	self("ccz", 3, false, controlled(controlled(pauliZ)))
	self("cswap", 3, false, controlled(library["swap"].matrix(nil)))

	// Directives: recorded in circuits, skipped (barrier) or refused (measure, reset) by the
	// unitary engines. A barrier may span any number of qubits; its Qubits is 0.
	directive("barrier", 0)
	directive("measure", 1)
	directive("reset", 1)
}

var (
	pauliX   = []complex128{0, 1, 1, 0}
	pauliY   = []complex128{0, -1i, 1i, 0}
	pauliZ   = []complex128{1, 0, 0, -1}
	hadamard = []complex128{sqrt1_2, sqrt1_2, sqrt1_2, -sqrt1_2}
	sqrtX    = []complex128{0.5 + 0.5i, 0.5 - 0.5i, 0.5 - 0.5i, 0.5 + 0.5i}
)

func rx(theta float64) []complex128 {
	c, s := math.Cos(theta/2), math.Sin(theta/2)
	return []complex128{complex(c, 0), complex(0, -s), complex(0, -s), complex(c, 0)}
}

func ry(theta float64) []complex128 {
	c, s := math.Cos(theta/2), math.Sin(theta/2)
	return []complex128{complex(c, 0), complex(-s, 0), complex(s, 0), complex(c, 0)}
}

func rz(theta float64) []complex128 {
	return []complex128{expi(-theta / 2), 0, 0, expi(theta / 2)}
}

func phase(lambda float64) []complex128 { return []complex128{1, 0, 0, expi(lambda)} }

func general(theta, phi, lambda float64) []complex128 {
	c, s := math.Cos(theta/2), math.Sin(theta/2)
	return []complex128{
		complex(c, 0), -expi(lambda) * complex(s, 0),
		expi(phi) * complex(s, 0), expi(phi+lambda) * complex(c, 0),
	}
}

// expi returns e^{ix}, exact at x = 0.
func expi(x float64) complex128 {
	s, c := math.Sincos(x)
	return complex(c, s)
}

// controlled returns block diag(I, u) for a 2^k × 2^k matrix u.
func controlled(u []complex128) []complex128 {
	d := isqrt(len(u))
	n := 2 * d
	out := make([]complex128, n*n)
	for i := 0; i < d; i++ {
		out[i*n+i] = 1
		for j := 0; j < d; j++ {
			out[(d+i)*n+d+j] = u[i*d+j]
		}
	}
	return out
}

// kron returns the Kronecker product a ⊗ b of two square row-major matrices.
func kron(a, b []complex128) []complex128 {
	da, db := isqrt(len(a)), isqrt(len(b))
	n := da * db
	out := make([]complex128, n*n)
	for i := 0; i < da; i++ {
		for j := 0; j < da; j++ {
			for k := 0; k < db; k++ {
				for l := 0; l < db; l++ {
					out[(i*db+k)*n+j*db+l] = a[i*da+j] * b[k*db+l]
				}
			}
		}
	}
	return out
}

// pauliRotation returns cos(θ/2) I − i sin(θ/2) P for a Pauli product P.
func pauliRotation(theta float64, p []complex128) []complex128 {
	c, s := math.Cos(theta/2), math.Sin(theta/2)
	d := isqrt(len(p))
	out := make([]complex128, len(p))
	for i := range p {
		out[i] = complex(0, -s) * p[i]
	}
	for i := 0; i < d; i++ {
		out[i*d+i] += complex(c, 0)
	}
	return out
}

func conjugate(m []complex128) []complex128 {
	out := make([]complex128, len(m))
	for i, v := range m {
		out[i] = cmplx.Conj(v)
	}
	return out
}

func isqrt(n int) int {
	d := 1
	for d*d < n {
		d++
	}
	return d
}
