package sim

import (
	"fmt"
	"math/bits"
	"strings"
)

// Pauli is a Hermitian Pauli string ±P_0⊗P_1⊗…⊗P_{n−1} with each P_q one of I, X, Y, Z: the form
// every image of X_i or Z_i under a Clifford circuit takes. It is bit-packed, 64 qubits per word:
// qubit q carries an X part when bit q of X is set and a Z part when bit q of Z is set, both set
// meaning Y (the convention of Aaronson & Gottesman, Phys. Rev. A 70, 052328 (2004), §III).
// The zero value is the empty string on no qubits.
type Pauli struct {
	n    int
	x, z []uint64
	neg  bool
}

// newPauli returns +I on n qubits.
func newPauli(n int) Pauli {
	w := (n + 63) / 64
	return Pauli{n: n, x: make([]uint64, w), z: make([]uint64, w)}
}

// PauliX returns +X_q on n qubits, one of the generators a Clifford circuit is judged by.
// It panics when q is outside [0, n), a programmer error.
func PauliX(n, q int) Pauli {
	p := newPauli(n)
	p.set(q, 'X')
	return p
}

// PauliZ returns +Z_q on n qubits. It panics when q is outside [0, n), a programmer error.
func PauliZ(n, q int) Pauli {
	p := newPauli(n)
	p.set(q, 'Z')
	return p
}

func (p *Pauli) set(q int, letter byte) {
	if q < 0 || q >= p.n {
		panic(fmt.Sprintf("sim: qubit %d outside a %d-qubit Pauli string", q, p.n))
	}
	w, b := q/64, uint(q%64)
	p.x[w] &^= 1 << b
	p.z[w] &^= 1 << b
	if letter == 'X' || letter == 'Y' {
		p.x[w] |= 1 << b
	}
	if letter == 'Z' || letter == 'Y' {
		p.z[w] |= 1 << b
	}
}

// Qubits returns the number of qubits the string acts on.
func (p Pauli) Qubits() int { return p.n }

// Negative reports whether the string carries the sign −1.
func (p Pauli) Negative() bool { return p.neg }

// At returns the factor on qubit q: 'I', 'X', 'Y' or 'Z'. It panics when q is outside [0, n).
func (p Pauli) At(q int) byte {
	if q < 0 || q >= p.n {
		panic(fmt.Sprintf("sim: qubit %d outside a %d-qubit Pauli string", q, p.n))
	}
	w, b := q/64, uint(q%64)
	return "IXZY"[p.x[w]>>b&1|p.z[w]>>b&1<<1]
}

// Equal reports whether two strings have the same width, factors and sign.
func (p Pauli) Equal(o Pauli) bool {
	if p.n != o.n || p.neg != o.neg {
		return false
	}
	for i := range p.x {
		if p.x[i] != o.x[i] || p.z[i] != o.z[i] {
			return false
		}
	}
	return true
}

// Anticommutes reports whether p and o anticommute: whether they differ, with neither the
// identity, on an odd number of qubits (single-qubit X, Y, Z anticommute pairwise, so each such
// qubit contributes a sign −1 to swapping the two). Signs do not matter. Both must act on the
// same number of qubits.
func (p Pauli) Anticommutes(o Pauli) bool {
	odd := 0
	for w := range p.x {
		// Per qubit, x·z' + z·x' (mod 2) is 1 exactly where the two factors differ and neither is I.
		odd ^= bits.OnesCount64(p.x[w]&o.z[w]^p.z[w]&o.x[w]) & 1
	}
	return odd == 1
}

// String writes the sign and the non-identity factors with their qubits, as in "+X0 Z3" or
// "−Y1"; the identity is "+I". The minus sign is U+2212.
func (p Pauli) String() string {
	var b strings.Builder
	if p.neg {
		b.WriteString("−")
	} else {
		b.WriteString("+")
	}
	first := true
	for w := range p.x {
		set := p.x[w] | p.z[w]
		for set != 0 {
			q := 64*w + bits.TrailingZeros64(set)
			set &= set - 1
			if !first {
				b.WriteByte(' ')
			}
			first = false
			fmt.Fprintf(&b, "%c%d", p.At(q), q)
		}
	}
	if first {
		b.WriteString("I")
	}
	return b.String()
}
