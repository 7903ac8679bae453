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

// BenchmarkParse3100k parses the same circuit written as OpenQASM 3 (Format3). cpu-ns/op is
// the process's CPU time per read (see reportCPU).
func BenchmarkParse3100k(b *testing.B) {
	src, err := Format3(benchCircuit())
	if err != nil {
		b.Fatal(err)
	}
	b.SetBytes(int64(len(src)))
	b.ReportAllocs()
	reportCPU(b, func() {
		if _, err := Parse(src); err != nil {
			b.Fatal(err)
		}
	})
}

// BenchmarkParse3Loop reads a for loop of 100,000 iterations, each a gate whose angle and qubit
// are computed from the loop variable.
func BenchmarkParse3Loop(b *testing.B) {
	src := []byte("include \"stdgates.inc\";\nqubit[20] q;\nfor int i in [0:99999] { rz(i * pi / 7) q[i % 20]; }\n")
	b.ReportAllocs()
	reportCPU(b, func() {
		c, err := Parse(src)
		if err != nil || c.Len() != 100000 {
			b.Fatal(err)
		}
	})
}
