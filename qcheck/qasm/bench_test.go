package qasm

import (
	"math/rand"
	"testing"

	"qcheck.dev/qcheck/circuit"
)

// benchCircuit is a fixed 100,000-gate circuit on 20 qubits: a third two-qubit gates, a third
// rotations with full-precision angles, a third fixed single-qubit gates.
func benchCircuit() *circuit.Circuit {
	r := rand.New(rand.NewSource(1))
	c := circuit.New(20)
	for c.Len() < 100000 {
		a, b := r.Intn(20), r.Intn(19)
		if b >= a {
			b++
		}
		switch r.Intn(3) {
		case 0:
			c.CX(a, b)
		case 1:
			c.RZ(r.NormFloat64(), a).U(r.Float64(), r.Float64(), r.Float64(), b)
		default:
			c.H(a).T(b)
		}
	}
	return c
}

// BenchmarkParse100k parses a 100,000-gate source (about 2 MB).
func BenchmarkParse100k(b *testing.B) {
	src, err := Format(benchCircuit())
	if err != nil {
		b.Fatal(err)
	}
	b.SetBytes(int64(len(src)))
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Parse(src); err != nil {
			b.Fatal(err)
		}
	}
}

// BenchmarkFormat100k writes the same circuit.
func BenchmarkFormat100k(b *testing.B) {
	c := benchCircuit()
	b.ReportAllocs()
	for b.Loop() {
		if _, err := Format(c); err != nil {
			b.Fatal(err)
		}
	}
}
